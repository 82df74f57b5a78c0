"""The canonical sympy symbols of derive.

All symbols are plain ``sympy.Symbol`` objects with no assumptions and with the exact
names of the conventions (README, notes/architecture.md), so printed output parses back with sympy
(``sympy.parse_expr(text, local_dict=derive.symbols.by_name())``) and with derive's own
safe parser.  Do not create same-named symbols with assumptions elsewhere: sympy treats
``Symbol('a')`` and ``Symbol('a', positive=True)`` as different objects.
"""
from __future__ import annotations

import sympy as sp

xi, eta, zeta = sp.symbols("xi eta zeta")
x, y, z = sp.symbols("x y z")
#: half-width (along x) and half-height (along y) of the rectangle / parallelogram
a, b = sp.symbols("a b")
#: skew parameter of the parallelogram: horizontal shift of the top edge's centre
c = sp.symbols("c")
#: aspect ratio a/b
r = sp.symbols("r")
#: mean radius of an axisymmetric element's reference rectangle
R = sp.symbols("R")
#: skew parameter of the parallelepiped: shift in x of the face y = +b (x = a X + s Y)
s = sp.symbols("s")
E, nu, t = sp.symbols("E nu t")

REFERENCE = (xi, eta)
MATERIAL = (E, nu, t)
GEOMETRY = (a, b, c, R, s)


def nodal(n: int) -> tuple[tuple[sp.Symbol, ...], tuple[sp.Symbol, ...]]:
    """Symbolic nodal coordinates x1..xn, y1..yn (1-based names, as in textbooks)."""
    xs = tuple(sp.Symbol(f"x{i}") for i in range(1, n + 1))
    ys = tuple(sp.Symbol(f"y{i}") for i in range(1, n + 1))
    return xs, ys


def nodal_axes(n: int, dim: int) -> tuple[tuple[sp.Symbol, ...], ...]:
    """Symbolic nodal coordinates per axis: (x1..xn,), (x.., y..) or (x.., y.., z1..zn)."""
    return tuple(tuple(sp.Symbol(f"{axis}{i}") for i in range(1, n + 1)) for axis in "xyz"[:dim])


def by_name() -> dict[str, sp.Symbol]:
    """Map of every fixed convention symbol name to its canonical symbol."""
    table = {sym.name: sym for sym in (xi, eta, zeta, x, y, z, a, b, c, r, R, s, E, nu, t)}
    return table


def lookup(name: str) -> sp.Symbol | None:
    """Canonical symbol for a convention name, including nodal x<i>/y<i>/z<i> (i >= 1); else None."""
    fixed = by_name()
    if name in fixed:
        return fixed[name]
    if len(name) >= 2 and name[0] in "xyz" and name[1:].isdigit() and name[1] != "0":
        return sp.Symbol(name)
    return None
