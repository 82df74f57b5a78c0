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
from .symbols import eta, xi, zeta


@dataclass(frozen=True)
class ShapeSet:
    """Shape functions of one element on its reference domain.

    ``nodes`` are exact reference coordinates (one per reference coordinate of the domain);
    ``basis`` the monomials the functions span; ``functions`` the N_i in the reference
    coordinates :attr:`coords` (node order: corners first, then mid-edge nodes, then face
    and interior nodes; see the README conventions).
    """

    name: str
    domain: str
    nodes: tuple[tuple[sp.Expr, sp.Expr], ...]
    basis: tuple[sp.Expr, ...]
    functions: tuple[sp.Expr, ...] = field(compare=False)

    @property
    def n(self) -> int:
        return len(self.nodes)

    @property
    def dim(self) -> int:
        """Number of reference coordinates (1, 2 or 3)."""
        return reference.dimension(self.domain)

    @property
    def coords(self) -> tuple[sp.Symbol, ...]:
        """The reference coordinates the functions are written in: (xi,), (xi, eta), (xi, eta, zeta)."""
        return reference.coordinates(self.domain)

    def at_node(self, expr: sp.Expr, node) -> sp.Expr:
        """``expr`` evaluated at a node (or any point) given by its reference coordinates."""
        return expr.subs(dict(zip(self.coords, node)))

    @cached_property
    def derivatives(self) -> tuple[tuple[sp.Expr, ...], ...]:
        """(dN/dxi, dN/deta[, dN/dzeta]) as tuples over the nodes, expanded polynomials."""
        return tuple(tuple(sp.expand(sp.diff(f, s)) for f in self.functions) for s in self.coords)

    def partition_of_unity(self) -> bool:
        """True when sum N_i == 1 identically."""
        return sp.expand(sum(self.functions) - 1) == 0

    def kronecker(self) -> bool:
        """True when N_i(node_j) == delta_ij at every node."""
        for i, f in enumerate(self.functions):
            for j, node in enumerate(self.nodes):
                value = sp.nsimplify(self.at_node(f, node))
                if value != (1 if i == j else 0):
                    return False
        return True

    def reproduces(self, monomial: sp.Expr) -> bool:
        """True when sum N_i m(node_i) == m identically (the space contains m)."""
        interp = sum(f * self.at_node(monomial, node) for f, node in zip(self.functions, self.nodes))
        return sp.expand(interp - monomial) == 0

    def completeness(self) -> int:
        """Highest total degree p such that every monomial of total degree <= p is reproduced."""
        degree = -1
        for p in range(0, 8):
            if all(self.reproduces(m) for m in _monomials_of_degree(p, self.coords)):
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


def _monomials_of_degree(p: int, coords: Sequence[sp.Symbol]) -> list[sp.Expr]:
    """All monomials of total degree exactly p in ``coords`` (Pascal order: first coordinate's
    power descending)."""
    if len(coords) == 1:
        return [coords[0] ** p]
    out = []
    for k in range(p, -1, -1):
        out += [coords[0] ** k * m for m in _monomials_of_degree(p - k, coords[1:])]
    return out


def from_nodes(name: str, domain: str, nodes: Sequence[Sequence], basis: Sequence[sp.Expr]) -> ShapeSet:
    """Build shape functions by inverting the generalised Vandermonde matrix.

    Works on every reference domain (1, 2 or 3 coordinates per node).  Raises
    :class:`SpecError` (one line) for a wrong number of coordinates or monomials, a node off
    the reference domain, repeated monomials or nodes, or a basis that is not unisolvent.
    """
    if domain not in reference.DOMAINS:
        raise SpecError(f"element {name}: unknown reference domain {domain!r}; allowed: {', '.join(reference.DOMAINS)}")
    coords = reference.coordinates(domain)
    dim = len(coords)
    names = ", ".join(map(str, coords))
    exact_nodes = []
    for k, node in enumerate(nodes, start=1):
        if len(node) != dim:
            raise SpecError(f"element {name}: node {k} has {len(node)} coordinates; {dim} ({names}) are required")
        p = tuple(sp.nsimplify(v, rational=True) if not isinstance(v, sp.Basic) else v for v in node)
        if not reference.contains(domain, p):
            raise SpecError(f"element {name}: node {k} at ({', '.join(map(str, p))}) lies outside the {domain} "
                            "reference domain")
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
        if not m.free_symbols <= set(coords) or not m.is_polynomial(*coords):
            raise SpecError(f"element {name}: basis entry {m} is not a polynomial in {names}")
    V = sp.Matrix([[m.subs(dict(zip(coords, node))) for m in basis] for node in exact_nodes])
    Vinv = _inverse(V)
    if Vinv is None:
        raise SpecError(f"element {name}: the basis {{{', '.join(map(str, basis))}}} is not unisolvent on these "
                        "nodes (singular Vandermonde matrix); choose other monomials or nodes")
    m_row = sp.Matrix([list(basis)])
    functions = tuple(sp.factor(sp.expand((m_row * Vinv[:, i])[0, 0])) for i in range(len(basis)))
    return ShapeSet(name=name, domain=domain, nodes=tuple(exact_nodes), basis=basis, functions=functions)


def _inverse(V: sp.Matrix) -> sp.Matrix | None:
    """Exact inverse of the Vandermonde matrix (None when singular).

    Rational nodes (every catalogue element) go through exact fraction-free arithmetic over
    QQ, which keeps 27 x 27 hexahedron matrices fast; other exact entries use sympy's own."""
    from sympy.polys.matrices import DomainMatrix
    from sympy.polys.matrices.exceptions import DMNonInvertibleMatrixError
    if all(v.is_Rational for v in V):
        dm = DomainMatrix.from_Matrix(V).convert_to(sp.QQ)
        try:
            return dm.inv().to_Matrix()
        except DMNonInvertibleMatrixError:
            return None
    if V.det() == 0:
        return None
    return V.inv()


def monomials(text: str, domain: str = "square") -> tuple[sp.Expr, ...]:
    """Parse a comma-separated monomial list such as ``"1, xi, eta, xi*eta"`` safely.

    Only products of powers of the domain's reference coordinates (xi, eta; zeta on the 3-D
    domains) and the constant 1 are allowed (no general expression evaluation), e.g.
    ``xi^2*eta`` or ``xi**2*eta*zeta``.
    """
    coords = reference.coordinates(domain) if domain in reference.DOMAINS else (xi, eta)
    out = []
    for k, raw in enumerate(text.split(","), start=1):
        item = raw.strip().replace("**", "^")
        if not item:
            raise SpecError(f"basis entry {k} is empty")
        out.append(_monomial(item, k, coords))
    return tuple(out)


def _monomial(item: str, k: int, coords: Sequence[sp.Symbol] = (xi, eta)) -> sp.Expr:
    if item == "1":
        return sp.Integer(1)
    by_name = {s.name: s for s in coords}
    value = sp.Integer(1)
    for factor in item.split("*"):
        factor = factor.strip()
        base, _, power = factor.partition("^")
        base = base.strip()
        if base not in by_name:
            names = " or ".join(by_name)
            listed = ", ".join(by_name)
            raise SpecError(f"basis entry {k} ({item!r}): factor {factor!r} is not {names} (allowed: 1, {listed}, "
                            "products and integer powers such as xi^2*eta)")
        exponent = 1
        if power:
            if not power.strip().isdigit() or int(power) > 12:
                raise SpecError(f"basis entry {k} ({item!r}): exponent {power!r} must be an integer 0..12")
            exponent = int(power)
        value *= by_name[base] ** exponent
    return value


def degree_monomials(p: int, domain: str = "triangle") -> tuple[sp.Expr, ...]:
    """All monomials of total degree <= p in Pascal order (1, xi, eta, xi^2, xi eta, eta^2, ...)
    in the domain's reference coordinates."""
    coords = reference.coordinates(domain)
    return tuple(m for d in range(p + 1) for m in _monomials_of_degree(d, coords))
