"""The one representation every formulation variant is written in.

A formulation is a set of integrals ("terms") accumulated into at most three blocks and
one static condensation:

    block "uu", "ua", "aa":  sum over its terms of  factor * integral( L^T M R  detJ  thick )
    K = K_uu - K_ua K_aa^-1 K_ua^T            (just K_uu when there are no internal unknowns)

where L, M, R are matrices evaluated at a point of the element (a :class:`Point`), thick
is the kinematic model's measure (t in the plane states, 2 pi r axisymmetric, 1 in 3-D), and each term names the
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

from .. import models, reference
from ..geometry import IsoMap, adjugate, determinant
from ..symbols import E as E_sym
from ..symbols import nu as nu_sym, t as t_sym

BLOCKS = ("uu", "ua", "aa")


class Point:
    """Everything a term may need at one point of one element, in any dimension.

    ``Point(imap, state, *coordinates, E=, nu=, t=, D=)``: as many coordinates as the element's
    reference domain has (they may be followed by E, nu, t positionally).  The point may be
    symbolic (the reference coordinates themselves: used for exact integration on affine
    geometry) or exact numbers from a rule.  Physical derivatives are formed as
    adj(J) [dN/dxi, dN/deta, dN/dzeta] / det J without simplification.  ``D`` replaces the
    model's isotropic D(E, nu) (an anisotropic material, :func:`derive.material.orthotropic`).
    """

    def __init__(self, imap: IsoMap, state: str, *args, E=E_sym, nu=nu_sym, t=t_sym, D=None):
        dim = imap.shapes.dim
        if len(args) < dim:
            raise TypeError(f"Point needs {dim} reference coordinates, got {len(args)}")
        point, rest = tuple(args[:dim]), args[dim:]
        if len(rest) > 3:
            raise TypeError("Point takes at most E, nu, t after the coordinates")
        E, nu, t = (tuple(rest) + (E, nu, t)[len(rest):])
        self.imap = imap
        self.shapes = imap.shapes
        self.state = state
        self.model = models.get(state)
        self.coords = imap.shapes.coords
        self.point = point
        self.p = point[0]
        self.q = point[1] if dim > 1 else None
        self.E, self.nu, self.t = E, nu, t
        self.D_given = D
        self._sub = dict(zip(self.coords, point))
        self._coordset = set(self.coords)

    @property
    def dim(self) -> int:
        return len(self.coords)

    def at(self, expr):
        """Evaluate a reference-space expression at this point."""
        if isinstance(expr, sp.MatrixBase):
            return expr.subs(self._sub) if expr.free_symbols & self._coordset else expr
        return expr.subs(self._sub) if getattr(expr, "free_symbols", None) and expr.free_symbols & self._coordset else expr

    @cached_property
    def N(self) -> tuple:
        return tuple(self.at(f) for f in self.shapes.functions)

    @cached_property
    def dN_ref(self) -> tuple[tuple, ...]:
        return tuple(tuple(self.at(f) for f in d) for d in self.shapes.derivatives)

    @property
    def symbolic(self) -> bool:
        """True at the symbolic point (the reference coordinates themselves)."""
        return self.point == self.coords

    @cached_property
    def J(self) -> sp.Matrix:
        return self.imap.jacobian if self.symbolic else self.imap.jacobian_at(*self.point)

    @cached_property
    def detJ(self) -> sp.Expr:
        return sp.expand(determinant(self.J))

    @cached_property
    def adjJ(self) -> sp.Matrix:
        return adjugate(self.J)

    def physical(self, *ref_vals) -> tuple[tuple, ...]:
        """Map reference derivatives to physical ones: [d/dx, d/dy, d/dz] = J^-1 [d/dxi, d/deta, d/dzeta]
        (one sequence of values per reference coordinate in, one per physical axis out)."""
        return physical_derivatives(self.adjJ, self.detJ, ref_vals)

    @cached_property
    def dN(self) -> tuple[tuple, ...]:
        return self.physical(*self.dN_ref)

    @cached_property
    def radius(self) -> sp.Expr:
        return self.at(self.imap.x)

    def strain_matrix(self, N, dN) -> sp.Matrix:
        """B of the model for any interpolated field (shape functions, bubble modes, ...)."""
        return self.model.B(N, dN, self.radius if self.model.needs_radius else None)

    @cached_property
    def B(self) -> sp.Matrix:
        """The standard displacement B matrix at this point."""
        return self.strain_matrix(self.N, self.dN)

    @cached_property
    def thick(self) -> sp.Expr:
        return self.model.thickness(self.t, self.radius if self.model.measure == "2 pi r" else None)

    @cached_property
    def D(self) -> sp.Matrix:
        return self.model.D(self.E, self.nu) if self.D_given is None else self.D_given

    @cached_property
    def centre(self) -> tuple:
        return reference.centre(self.shapes.domain)

    @cached_property
    def J0(self) -> sp.Matrix:
        return self.imap.jacobian_at(*self.centre)

    @cached_property
    def detJ0(self) -> sp.Expr:
        return sp.expand(determinant(self.J0))


def physical_derivatives(adj: sp.Matrix, det, ref_vals) -> tuple[tuple, ...]:
    """[d/dx_k]_i = sum_a adj[k, a] ref_vals[a][i] / det, expanded numerators (any dimension)."""
    out = []
    for k in range(adj.rows):
        row = []
        for vals in zip(*ref_vals):
            num = adj[k, 0] * vals[0]
            for a in range(1, len(vals)):
                num = num + adj[k, a] * vals[a]
            row.append(sp.expand(num) / det)
        out.append(tuple(row))
    return tuple(out)


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
