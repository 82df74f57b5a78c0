"""The one representation every formulation variant is written in.

A formulation is a set of integrals ("terms") accumulated into at most three blocks and
one static condensation:

    block "uu", "ua", "aa":  sum over its terms of  factor * integral( L^T M R  detJ  thick )
    K = K_uu - K_ua K_aa^-1 K_ua^T            (just K_uu when there are no internal unknowns)

where L, M, R are matrices evaluated at a point of the element (a :class:`Point`), thick
is t in the plane states and 2 pi r in the axisymmetric state, and each term names the
quadrature rule it is integrated with ("full", "reduced", or an explicit rule name).
This covers plain displacement elements (one term), selective integration (two terms,
two rules), incompatible modes and enhanced strains (condensed internal strain
parameters), mean-dilatation B-bar (a one-row "ua" block: K = K_dev + kappa g g^T / V is
the condensation with K_aa = -V / kappa) and assumed-stress hybrid elements
(K_uu = 0, K_ua = G^T, K_aa = -H gives K = G^T H^-1 G).  The symbolic stiffness, the
numeric evaluation, the generated kernels and every analysis use this structure only, so
a new variant needs no code outside ``formulations/``.
"""
from __future__ import annotations

from dataclasses import dataclass, field
from functools import cached_property
from typing import Callable

import sympy as sp

from .. import kinematics, material
from ..geometry import IsoMap
from ..symbols import E as E_sym
from ..symbols import eta, nu as nu_sym, t as t_sym, xi

BLOCKS = ("uu", "ua", "aa")


class Point:
    """Everything a term may need at one point (xi_p, eta_p) of one element.

    The point may be symbolic (``xi``, ``eta``: used for exact integration on affine
    geometry) or an exact number from a rule.  Physical derivatives are formed as
    adj(J) [dN/dxi, dN/deta] / det J without simplification.
    """

    def __init__(self, imap: IsoMap, state: str, p, q, E=E_sym, nu=nu_sym, t=t_sym):
        self.imap = imap
        self.shapes = imap.shapes
        self.state = state
        self.p, self.q = p, q
        self.E, self.nu, self.t = E, nu, t
        self._sub = {xi: p, eta: q}

    def at(self, expr):
        """Evaluate a reference-space expression at this point."""
        if isinstance(expr, sp.MatrixBase):
            return expr.subs(self._sub) if expr.free_symbols & {xi, eta} else expr
        return expr.subs(self._sub) if getattr(expr, "free_symbols", None) and expr.free_symbols & {xi, eta} else expr

    @cached_property
    def N(self) -> tuple:
        return tuple(self.at(f) for f in self.shapes.functions)

    @cached_property
    def dN_ref(self) -> tuple[tuple, tuple]:
        dxi, deta = self.shapes.derivatives
        return tuple(self.at(f) for f in dxi), tuple(self.at(f) for f in deta)

    @cached_property
    def J(self) -> sp.Matrix:
        return self.imap.jacobian_at(self.p, self.q) if (self.p, self.q) != (xi, eta) else self.imap.jacobian

    @cached_property
    def detJ(self) -> sp.Expr:
        J = self.J
        return sp.expand(J[0, 0] * J[1, 1] - J[0, 1] * J[1, 0])

    @cached_property
    def adjJ(self) -> sp.Matrix:
        J = self.J
        return sp.Matrix([[J[1, 1], -J[0, 1]], [-J[1, 0], J[0, 0]]])

    def physical(self, dxi_vals, deta_vals) -> tuple[tuple, tuple]:
        """Map reference derivatives to physical ones: [d/dx, d/dy] = J^-1 [d/dxi, d/deta]."""
        A, d = self.adjJ, self.detJ
        dx = tuple(sp.expand(A[0, 0] * u + A[0, 1] * v) / d for u, v in zip(dxi_vals, deta_vals))
        dy = tuple(sp.expand(A[1, 0] * u + A[1, 1] * v) / d for u, v in zip(dxi_vals, deta_vals))
        return dx, dy

    @cached_property
    def dN(self) -> tuple[tuple, tuple]:
        return self.physical(*self.dN_ref)

    @cached_property
    def radius(self) -> sp.Expr:
        return self.at(self.imap.x)

    @cached_property
    def B(self) -> sp.Matrix:
        """The standard displacement B matrix at this point."""
        dx, dy = self.dN
        return kinematics.B_matrix(self.state, self.N, dx, dy, self.radius if self.state == "axisymmetric" else None)

    @cached_property
    def thick(self) -> sp.Expr:
        return 2 * sp.pi * self.radius if self.state == "axisymmetric" else self.t

    @cached_property
    def D(self) -> sp.Matrix:
        return material.D(self.state, self.E, self.nu)

    @cached_property
    def centre(self) -> tuple:
        return (sp.Integer(0), sp.Integer(0)) if self.shapes.domain == "square" else (sp.Rational(1, 3), sp.Rational(1, 3))

    @cached_property
    def J0(self) -> sp.Matrix:
        return self.imap.jacobian_at(*self.centre)

    @cached_property
    def detJ0(self) -> sp.Expr:
        J = self.J0
        return sp.expand(J[0, 0] * J[1, 1] - J[0, 1] * J[1, 0])


Operator = Callable[[Point], sp.Matrix]


@dataclass(frozen=True)
class Term:
    """One integral factor * int(L^T M R detJ thick) accumulated into ``block``."""

    block: str
    left: Operator
    middle: Operator
    right: Operator
    rule: str = "full"
    factor: sp.Expr = sp.Integer(1)
    symmetric: bool = False
    label: str = ""

    def __post_init__(self):
        if self.block not in BLOCKS:
            raise ValueError(f"term block must be one of {BLOCKS}")


@dataclass(frozen=True)
class Formulation:
    """A variant's terms plus the size of its condensed internal block (0: none)."""

    variant: str
    terms: tuple[Term, ...]
    n_internal: int = 0
    description: str = ""
    source: str = ""
    notes: tuple[str, ...] = field(default=())
    #: optional strain recovery for analyses: ``strain(point) -> (S_u, S_a)`` such that the
    #: strain the formulation works with is S_u u + S_a alpha (alpha: the condensed internal
    #: unknowns; S_a None when there are none).  None means the plain B u.
    strain: Callable[[Point], tuple] | None = field(default=None, compare=False)

    def rules(self) -> tuple[str, ...]:
        return tuple(dict.fromkeys(t.rule for t in self.terms))


def B_op(p: Point) -> sp.Matrix:
    return p.B


def D_op(p: Point) -> sp.Matrix:
    return p.D
