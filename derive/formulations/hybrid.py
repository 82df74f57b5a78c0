"""Five-parameter assumed-stress hybrid element (Pian and Sumihara, 1984).

Stress field (beta_1..beta_5), with the centre Jacobian J0 (textbook layout, so
a1 = dx/dxi, b1 = dy/dxi, a2 = dx/deta, b2 = dy/deta at xi = eta = 0):

    sigma_xx = beta_1 + a1^2 eta beta_4 + a2^2 xi beta_5
    sigma_yy = beta_2 + b1^2 eta beta_4 + b2^2 xi beta_5
    tau_xy   = beta_3 + a1 b1 eta beta_4 + a2 b2 xi beta_5

i.e. sigma = P beta, the constant stresses plus the contravariant reference stresses
tau~^11 = eta beta_4, tau~^22 = xi beta_5 mapped with J0.  With H = int P^T D^-1 P dV and
G = int P^T B dV, K = G^T H^-1 G.  In the formulation structure: no K_uu term,
K_ua = int B^T P dV = G^T and K_aa = -H, so K = 0 - K_ua K_aa^-1 K_ua^T = G^T H^-1 G.
Both integrals with the element's full rule (2 x 2).  Plane states only.

The 3-D element hybrid18 (Pian & Tong 1986; 18 parameters) is the same construction on the
hexahedron: six constant stresses plus twelve reference modes (:func:`_natural_modes`) mapped
with J0, sigma_ij = J0_ai J0_bj tau^ab, K = G^T H^-1 G with the 2 x 2 x 2 rule.
"""
from __future__ import annotations

from functools import lru_cache

import sympy as sp

from .. import material
from ..errors import InputError
from .base import B_op, Formulation, Term
from .eas import VOIGT


def voigt_stress_transform(J0: sp.Matrix) -> sp.Matrix:
    """Map from contravariant reference stress (Voigt pairs of the dimension) to physical Voigt
    stress: sigma_ij = sum_ab J0[a, i] J0[b, j] tau^ab (J0[a, i] = dx_i/dxi_a at the centre)."""
    pairs = VOIGT[J0.rows]

    def entry(ij, ab):
        (i, j), (a, b) = ij, ab
        if a == b:
            return J0[a, i] * J0[a, j]
        return J0[a, i] * J0[b, j] + J0[b, i] * J0[a, j]
    return sp.Matrix([[entry(ij, ab) for ab in pairs] for ij in pairs])


def _natural_modes(dim: int, X) -> list[tuple[int, sp.Expr]]:
    """Higher-order reference stress modes as (Voigt row, monomial), one per parameter.

    2-D (Pian & Sumihara): tau^11 = eta beta_4, tau^22 = xi beta_5.
    3-D (Pian & Tong, 18 parameters): tau^11: eta, zeta, eta zeta; tau^22: zeta, xi, zeta xi;
    tau^33: xi, eta, xi eta; tau^12: zeta; tau^23: xi; tau^31: eta.
    """
    if dim == 2:
        x, y = X
        return [(0, y), (1, x)]
    x, y, z = X
    return [(0, y), (0, z), (0, y * z), (1, z), (1, x), (1, z * x), (2, x), (2, y), (2, x * y),
            (5, z), (3, x), (4, y)]


def P_op(p) -> sp.Matrix:
    """sigma = P beta: the constant stresses, then the reference modes mapped with J0."""
    modes = _natural_modes(p.dim, p.point)
    nrows = len(VOIGT[p.dim])
    Pnat = sp.zeros(nrows, len(modes))
    for k, (row, value) in enumerate(modes):
        Pnat[row, k] = value
    T = voigt_stress_transform(p.J0)
    return sp.eye(nrows).row_join(T * Pnat)


@lru_cache(maxsize=None)
def compliance(state, E, nu) -> sp.Matrix:
    """C = D^-1 for the model (entries cancelled)."""
    return material.D(state, E, nu).inv().applyfunc(sp.cancel)


def identity_op(p) -> sp.Matrix:
    return sp.eye(len(VOIGT[p.dim]))


def minus_C_op(p) -> sp.Matrix:
    return -compliance(p.state, p.E, p.nu)


def _hybrid(variant: str, info, state: str, corners: int, states: tuple[str, ...], source: str) -> Formulation:
    shape = "4-node quadrilateral" if corners == 4 else "8-node hexahedron"
    if info.domain not in ("square", "cube") or info.n_nodes != corners:
        raise InputError(f"variant {variant!r} is defined for the {shape} only")
    if state not in states:
        raise InputError(f"variant {variant!r} is offered in the " + ("plane states only (plane-stress, plane-strain)"
                                                                      if corners == 4 else "solid model only"))
    nstress = len(VOIGT[info.dim])
    nbeta = nstress + len(_natural_modes(info.dim, (0,) * info.dim))
    ndof = info.ndof_for(state)

    def strain(p):
        return sp.zeros(nstress, ndof), compliance(p.state, p.E, p.nu) * P_op(p)

    return Formulation(
        variant=variant,
        terms=(Term("ua", B_op, identity_op, P_op, rule="full", label="B^T P (G^T)"),
               Term("aa", P_op, minus_C_op, P_op, rule="full", symmetric=True, label="-P^T D^-1 P (-H)")),
        n_internal=nbeta,
        description=f"assumed-stress hybrid, {nbeta} stress parameters: K = G^T H^-1 G",
        source=source,
        strain=strain,
    )


def hybrid5(info, state: str) -> Formulation:
    return _hybrid("hybrid5", info, state, 4, ("plane-stress", "plane-strain"), "Pian & Sumihara (1984)")


def hybrid18(info, state: str) -> Formulation:
    return _hybrid("hybrid18", info, state, 8, ("solid",), "Pian & Tong (1986)")
