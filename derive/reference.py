"""Reference domains by dimension and exact integrals of polynomials over them.

Six reference domains, one per element family, in the reference coordinates
(xi, eta, zeta) truncated to the domain's dimension (:func:`coordinates`):

``"line"``         [-1, 1] in xi; line elements (beams, edges).
``"square"``       [-1, 1] x [-1, 1] in (xi, eta); quadrilaterals.
``"triangle"``     vertices (0, 0), (1, 0), (0, 1) in (xi, eta); triangles.
                   Area coordinates L1 = 1 - xi - eta, L2 = xi, L3 = eta.
``"cube"``         [-1, 1]^3 in (xi, eta, zeta); hexahedra.
``"tetrahedron"``  vertices (0,0,0), (1,0,0), (0,1,0), (0,0,1); tetrahedra.
                   Volume coordinates L1 = 1 - xi - eta - zeta, L2 = xi, L3 = eta, L4 = zeta.
``"wedge"``        the triangle in (xi, eta) times [-1, 1] in zeta; wedges (pentahedra).

Why a monomial table: element matrices on a reference domain are polynomials in the
reference coordinates (with symbolic coefficients such as ``E``, ``nu``, ``a``, ``b``).
Their exact integral is a linear combination of the integrals of xi^p eta^q zeta^r, which
have closed forms (products of 1-D integrals on the tensor domains; the Dirichlet formula
p! q! r! / (p + q + r + d)! on the simplices).  Splitting the integrand into ``sympy.Poly``
terms and looking each monomial up in a cached table is exact and far faster than
``sympy.integrate``, which this module never calls.
"""
from __future__ import annotations

import functools
import math
import operator
from collections.abc import Sequence

import sympy as sp
from sympy.polys.polyerrors import PolynomialError

from derive.errors import InputError
from derive.symbols import eta, xi, zeta

#: the supported reference domain names
DOMAINS: tuple[str, ...] = ("line", "square", "triangle", "cube", "tetrahedron", "wedge")

_DIM = {"line": 1, "square": 2, "triangle": 2, "cube": 3, "tetrahedron": 3, "wedge": 3}
_MEASURE = {"line": sp.Integer(2), "square": sp.Integer(4), "triangle": sp.Rational(1, 2),
            "cube": sp.Integer(8), "tetrahedron": sp.Rational(1, 6), "wedge": sp.Integer(1)}
_COORDS = (xi, eta, zeta)
_R = sp.Rational
_CENTRE = {"line": (0,), "square": (0, 0), "triangle": (_R(1, 3), _R(1, 3)), "cube": (0, 0, 0),
           "tetrahedron": (_R(1, 4),) * 3, "wedge": (_R(1, 3), _R(1, 3), 0)}
_VERTICES = {
    "line": ((-1,), (1,)),
    "square": ((-1, -1), (1, -1), (1, 1), (-1, 1)),
    "triangle": ((0, 0), (1, 0), (0, 1)),
    "cube": ((-1, -1, -1), (1, -1, -1), (1, 1, -1), (-1, 1, -1), (-1, -1, 1), (1, -1, 1), (1, 1, 1), (-1, 1, 1)),
    "tetrahedron": ((0, 0, 0), (1, 0, 0), (0, 1, 0), (0, 0, 1)),
    "wedge": ((0, 0, -1), (1, 0, -1), (0, 1, -1), (0, 0, 1), (1, 0, 1), (0, 1, 1)),
}


def check_domain(domain: str) -> str:
    """Return ``domain`` if it is a known reference domain, else raise :class:`InputError`."""
    if not isinstance(domain, str) or domain not in DOMAINS:
        raise InputError(f"unknown reference domain {domain!r}; allowed: {', '.join(DOMAINS)}")
    return domain


def dimension(domain: str) -> int:
    """Number of reference coordinates of the domain (1, 2 or 3)."""
    return _DIM[check_domain(domain)]


def coordinates(domain: str) -> tuple[sp.Symbol, ...]:
    """The domain's reference coordinates: (xi,), (xi, eta) or (xi, eta, zeta)."""
    return _COORDS[:dimension(domain)]


def centre(domain: str) -> tuple[sp.Expr, ...]:
    """Exact centroid of the reference domain (where centre Jacobians J0 are taken)."""
    return tuple(sp.Integer(v) if isinstance(v, int) else v for v in _CENTRE[check_domain(domain)])


def vertices(domain: str) -> tuple[tuple[sp.Expr, ...], ...]:
    """Corner points of the domain in the catalogue's node order (see the README conventions)."""
    return tuple(tuple(sp.Integer(v) for v in p) for p in _VERTICES[check_domain(domain)])


def measure(domain: str) -> sp.Rational:
    """Exact length / area / volume of the reference domain (2, 4, 1/2, 8, 1/6, 1)."""
    return _MEASURE[check_domain(domain)]


def area(domain: str) -> sp.Rational:
    """Exact measure of the reference domain (the 2-D name of :func:`measure`)."""
    return measure(domain)


def _check_power(name: str, value: int) -> int:
    try:
        if isinstance(value, bool):
            raise TypeError
        index = operator.index(value)
    except TypeError:
        index = -1
    if index < 0:
        raise InputError(f"monomial exponent {name} must be a non-negative integer, got {value!r}")
    return index


_POWER_NAMES = ("p", "q", "r")


def monomial_integral(domain: str, *powers: int) -> sp.Rational:
    """Exact integral of xi**p * eta**q * zeta**r (as many powers as the domain has coordinates).

    square, cube, line: product of the 1-D integrals over [-1, 1]: 2/(k+1) for even k, 0 for odd k.
    triangle:     p! q! / (p + q + 2)!  (the area-coordinate formula with L2 = xi, L3 = eta).
    tetrahedron:  p! q! r! / (p + q + r + 3)!  (the volume-coordinate formula).
    wedge:        the triangle integral in (xi, eta) times the line integral in zeta.
    """
    check_domain(domain)
    checked = tuple(_check_power(_POWER_NAMES[k] if k < 3 else f"#{k + 1}", v) for k, v in enumerate(powers))
    if len(checked) != _DIM[domain]:
        raise InputError(f"monomial_integral on the {domain} needs {_DIM[domain]} exponents, got {len(checked)}")
    return _monomial_integral(domain, *checked)


def _line(k: int) -> sp.Rational:
    return sp.Integer(0) if k % 2 else sp.Rational(2, k + 1)


def _simplex(powers: tuple[int, ...]) -> sp.Rational:
    num = math.prod(math.factorial(k) for k in powers)
    return sp.Rational(num, math.factorial(sum(powers) + len(powers)))


@functools.lru_cache(maxsize=None)
def _monomial_integral(domain: str, *powers: int) -> sp.Rational:
    if domain in ("line", "square", "cube"):
        if any(k % 2 for k in powers):
            return sp.Integer(0)
        return sp.Rational(2 ** len(powers), math.prod(k + 1 for k in powers))
    if domain in ("triangle", "tetrahedron"):
        return _simplex(powers)
    return _simplex(powers[:2]) * _line(powers[2])  # wedge


def _short(expr: object, limit: int = 60) -> str:
    text = " ".join(str(expr).split())
    return text if len(text) <= limit else text[: limit - 3] + "..."


def _as_poly(expr: sp.Expr, gens: tuple[sp.Symbol, ...]) -> tuple[sp.Poly, sp.Expr]:
    """Polynomial part and a generator-free denominator of ``expr``.

    The fast path is ``sympy.Poly`` directly.  Only if that fails is the expression brought
    over a common denominator (``cancel``), which accepts e.g. ``(xi**2 - 1)/(xi - 1)`` or
    ``xi/(1 - nu)`` written in awkward forms; a denominator containing a generator is refused.
    """
    names = ", ".join(str(g) for g in gens)
    try:
        return sp.Poly(expr, *gens), sp.Integer(1)
    except (PolynomialError, sp.GeneratorsNeeded, TypeError, ValueError):
        pass
    try:
        num, den = sp.fraction(sp.cancel(sp.together(expr)))
        if not (den.free_symbols & set(gens)):
            return sp.Poly(num, *gens), den
    except (PolynomialError, sp.GeneratorsNeeded, TypeError, ValueError):
        pass
    raise InputError(f"integrate_polynomial: not a polynomial in ({names}): {_short(expr)}")


def integrate_polynomial(expr, domain: str, gens: Sequence[sp.Symbol] | None = None):
    """Exact integral over the reference domain of a polynomial in ``gens``.

    ``gens`` default to the domain's reference coordinates (:func:`coordinates`); give as many
    symbols as the domain has coordinates to integrate in other variables.

    ``expr`` may have symbolic coefficients (``E``, ``nu``, ``a`` ...); they are carried
    through untouched.  A sympy Matrix is integrated entry by entry.  The integral is the sum
    of coefficient * :func:`monomial_integral` over the ``Poly`` terms; ``sympy.integrate``
    is never called.  Non-polynomial input raises :class:`InputError`.
    """
    dim = dimension(domain)
    gens = coordinates(domain) if gens is None else tuple(gens)
    if len(gens) != dim or not all(isinstance(g, sp.Symbol) for g in gens):
        raise InputError(f"integrate_polynomial: gens must be {dim} sympy Symbols for the {domain}, got {gens!r}")
    if isinstance(expr, sp.MatrixBase):
        return expr.applyfunc(lambda e: integrate_polynomial(e, domain, gens))
    try:
        expr = sp.sympify(expr)
    except (sp.SympifyError, TypeError) as exc:
        raise InputError(f"integrate_polynomial: cannot read expression {_short(expr)!s}") from exc
    if not isinstance(expr, sp.Expr):
        raise InputError(f"integrate_polynomial: not a scalar expression: {_short(expr)}")
    if not (expr.free_symbols & set(gens)):
        return expr * area(domain)
    poly, den = _as_poly(expr, gens)
    terms = []
    for powers, coeff in poly.terms():
        value = _monomial_integral(domain, *powers)
        if value != 0:
            terms.append(coeff * value)
    total = sp.Add(*terms)
    return total / den if den != 1 else total


def _nonnegative(value: sp.Expr) -> bool:
    """Exact sign test ``value >= 0`` for a sympy number (radicals, CRootOf, rationals)."""
    known = value.is_nonnegative
    if known is not None:
        return bool(known)
    # sympy could not decide: an exact zero written in a complicated form, or a number
    # very close to zero.  Decide exactly where possible, else with a high-precision value.
    if value.equals(0):
        return True
    approx = value.evalf(60)
    if approx.is_comparable:
        return bool(approx >= 0)
    raise InputError(f"contains: cannot decide the sign of {_short(value)}")


def contains(domain: str, point: Sequence, tol=0) -> bool:
    """True if ``point`` (one coordinate per reference coordinate) lies inside the reference
    domain or on its boundary.

    Comparisons are exact for sympy numbers (e.g. ``sqrt(3)/3``); ``tol`` >= 0 widens the
    domain by that amount in each inequality (useful for floating-point points).
    """
    dim = dimension(domain)
    what = {1: "a 1-tuple (xi,)", 2: "a pair (xi, eta)", 3: "a triple (xi, eta, zeta)"}[dim]
    try:
        if len(point) != dim:
            raise TypeError
        coords = tuple(sp.sympify(v) for v in point)
        tol = sp.sympify(tol)
    except (TypeError, sp.SympifyError) as exc:
        raise InputError(f"contains: point must be {what} of numbers, got {point!r}") from exc
    for v in coords + (tol,):
        if not (isinstance(v, sp.Expr) and v.is_number and v.is_extended_real is not False):
            raise InputError(f"contains: point and tol must be real numbers, got {_short(v)}")
    if not _nonnegative(tol):
        raise InputError(f"contains: tol must be >= 0, got {tol}")
    return all(_nonnegative(c) for c in _inequalities(domain, coords, tol))


def _inequalities(domain: str, coords: tuple, tol) -> tuple:
    """Expressions that are all >= 0 exactly on the (widened) domain."""
    def box(cs):
        return tuple(v for c in cs for v in (c + 1 + tol, 1 + tol - c))

    def simplex(cs):
        return tuple(c + tol for c in cs) + (1 + tol - sum(cs),)

    if domain in ("line", "square", "cube"):
        return box(coords)
    if domain in ("triangle", "tetrahedron"):
        return simplex(coords)
    return simplex(coords[:2]) + box(coords[2:])  # wedge


# expose the lru_cache interface on the public function (the cache sits behind validation)
monomial_integral.cache_info = _monomial_integral.cache_info  # type: ignore[attr-defined]
monomial_integral.cache_clear = _monomial_integral.cache_clear  # type: ignore[attr-defined]
