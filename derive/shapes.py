"""Shape functions: construction from nodes and a monomial basis, and their checks.

Every element's shape functions, catalogue or user-defined, come from the same
mechanism: given reference-space node coordinates and a monomial basis
{m_1, ..., m_n}, the generalised Vandermonde matrix V[i, k] = m_k(node_i) is inverted and
N_i = sum_k m_k (V^-1)[k, i], so that N_i(node_j) = delta_ij.  A basis that is not
unisolvent on the nodes makes V singular and is refused.
"""
from __future__ import annotations

from dataclasses import dataclass, field
from functools import cached_property
from typing import Sequence

import sympy as sp

from . import reference
from .errors import SpecError
from .symbols import eta, xi


@dataclass(frozen=True)
class ShapeSet:
    """Shape functions of one element on its reference domain.

    ``nodes`` are exact reference coordinates; ``basis`` the monomials the functions span;
    ``functions`` the N_i in ``xi``, ``eta`` (node order: corners counter-clockwise first,
    then mid-side nodes, then interior nodes).
    """

    name: str
    domain: str
    nodes: tuple[tuple[sp.Expr, sp.Expr], ...]
    basis: tuple[sp.Expr, ...]
    functions: tuple[sp.Expr, ...] = field(compare=False)

    @property
    def n(self) -> int:
        return len(self.nodes)

    @cached_property
    def derivatives(self) -> tuple[tuple[sp.Expr, ...], tuple[sp.Expr, ...]]:
        """(dN/dxi, dN/deta) as tuples over the nodes, expanded polynomials."""
        dxi = tuple(sp.expand(sp.diff(f, xi)) for f in self.functions)
        deta = tuple(sp.expand(sp.diff(f, eta)) for f in self.functions)
        return dxi, deta

    def partition_of_unity(self) -> bool:
        """True when sum N_i == 1 identically."""
        return sp.expand(sum(self.functions) - 1) == 0

    def kronecker(self) -> bool:
        """True when N_i(node_j) == delta_ij at every node."""
        for i, f in enumerate(self.functions):
            for j, (px, py) in enumerate(self.nodes):
                value = sp.nsimplify(f.subs({xi: px, eta: py}))
                if value != (1 if i == j else 0):
                    return False
        return True

    def reproduces(self, monomial: sp.Expr) -> bool:
        """True when sum N_i m(node_i) == m identically (the space contains m)."""
        interp = sum(f * monomial.subs({xi: px, eta: py}) for f, (px, py) in zip(self.functions, self.nodes))
        return sp.expand(interp - monomial) == 0

    def completeness(self) -> int:
        """Highest total degree p such that every monomial xi^i eta^j, i + j <= p, is reproduced."""
        degree = -1
        for p in range(0, 8):
            if all(self.reproduces(xi ** i * eta ** (p - i)) for i in range(p + 1)):
                degree = p
            else:
                break
        return degree

    def checks(self) -> dict:
        """The automatic checks shown to the user."""
        return {
            "partition_of_unity": self.partition_of_unity(),
            "kronecker_delta": self.kronecker(),
            "completeness": self.completeness(),
        }


def from_nodes(name: str, domain: str, nodes: Sequence[Sequence], basis: Sequence[sp.Expr]) -> ShapeSet:
    """Build shape functions by inverting the generalised Vandermonde matrix.

    Raises :class:`SpecError` (one line) for a wrong number of monomials, a node off the
    reference domain, repeated monomials or nodes, or a basis that is not unisolvent.
    """
    if domain not in reference.DOMAINS:
        raise SpecError(f"element {name}: unknown reference domain {domain!r}; allowed: {', '.join(reference.DOMAINS)}")
    exact_nodes = []
    for k, node in enumerate(nodes, start=1):
        if len(node) != 2:
            raise SpecError(f"element {name}: node {k} has {len(node)} coordinates; 2 (xi, eta) are required")
        p = tuple(sp.nsimplify(v, rational=True) if not isinstance(v, sp.Basic) else v for v in node)
        if not reference.contains(domain, p):
            raise SpecError(f"element {name}: node {k} at ({p[0]}, {p[1]}) lies outside the {domain} reference domain")
        exact_nodes.append(p)
    if len(set(exact_nodes)) != len(exact_nodes):
        raise SpecError(f"element {name}: two nodes share the same reference coordinates")
    basis = tuple(sp.expand(m) for m in basis)
    if len(basis) != len(exact_nodes):
        raise SpecError(f"element {name}: {len(basis)} monomials for {len(exact_nodes)} nodes; "
                        "the basis needs exactly one monomial per node")
    if len(set(basis)) != len(basis):
        raise SpecError(f"element {name}: the basis lists a monomial twice")
    for m in basis:
        if not m.free_symbols <= {xi, eta} or not m.is_polynomial(xi, eta):
            raise SpecError(f"element {name}: basis entry {m} is not a polynomial in xi, eta")
    V = sp.Matrix([[m.subs({xi: px, eta: py}) for m in basis] for (px, py) in exact_nodes])
    if V.det() == 0:
        raise SpecError(f"element {name}: the basis {{{', '.join(map(str, basis))}}} is not unisolvent on these "
                        "nodes (singular Vandermonde matrix); choose other monomials or nodes")
    Vinv = V.inv()
    m_row = sp.Matrix([list(basis)])
    functions = tuple(sp.factor(sp.expand((m_row * Vinv[:, i])[0, 0])) for i in range(len(basis)))
    return ShapeSet(name=name, domain=domain, nodes=tuple(exact_nodes), basis=basis, functions=functions)


def monomials(text: str) -> tuple[sp.Expr, ...]:
    """Parse a comma-separated monomial list such as ``"1, xi, eta, xi*eta"`` safely.

    Only products of ``xi`` and ``eta`` powers and the constant 1 are allowed (no general
    expression evaluation), e.g. ``xi^2*eta`` or ``xi**2*eta``.
    """
    out = []
    for k, raw in enumerate(text.split(","), start=1):
        item = raw.strip().replace("**", "^")
        if not item:
            raise SpecError(f"basis entry {k} is empty")
        out.append(_monomial(item, k))
    return tuple(out)


def _monomial(item: str, k: int) -> sp.Expr:
    if item == "1":
        return sp.Integer(1)
    value = sp.Integer(1)
    for factor in item.split("*"):
        factor = factor.strip()
        base, _, power = factor.partition("^")
        base = base.strip()
        if base not in ("xi", "eta"):
            raise SpecError(f"basis entry {k} ({item!r}): factor {factor!r} is not xi or eta (allowed: 1, xi, eta, "
                            "products and integer powers such as xi^2*eta)")
        exponent = 1
        if power:
            if not power.strip().isdigit() or int(power) > 12:
                raise SpecError(f"basis entry {k} ({item!r}): exponent {power!r} must be an integer 0..12")
            exponent = int(power)
        value *= (xi if base == "xi" else eta) ** exponent
    return value


def degree_monomials(p: int, domain: str = "triangle") -> tuple[sp.Expr, ...]:
    """All monomials of total degree <= p in Pascal-triangle order (1, xi, eta, xi^2, ...)."""
    return tuple(xi ** (d - j) * eta ** j for d in range(p + 1) for j in range(d + 1))
