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
"""
from __future__ import annotations

from functools import lru_cache

import sympy as sp

from .. import material
from ..errors import InputError
from .base import B_op, Formulation, Term


def P_op(p) -> sp.Matrix:
    J0 = p.J0
    a1, b1, a2, b2 = J0[0, 0], J0[0, 1], J0[1, 0], J0[1, 1]
    X, Y = p.p, p.q
    return sp.Matrix([
        [1, 0, 0, a1 ** 2 * Y, a2 ** 2 * X],
        [0, 1, 0, b1 ** 2 * Y, b2 ** 2 * X],
        [0, 0, 1, a1 * b1 * Y, a2 * b2 * X],
    ])


@lru_cache(maxsize=None)
def compliance(state, E, nu) -> sp.Matrix:
    """C = D^-1 for the plane state (entries cancelled)."""
    return material.D(state, E, nu).inv().applyfunc(sp.cancel)


def identity_op(p) -> sp.Matrix:
    return sp.eye(3)


def minus_C_op(p) -> sp.Matrix:
    return -compliance(p.state, p.E, p.nu)


def hybrid5(info, state: str) -> Formulation:
    if info.domain != "square" or info.n_nodes != 4:
        raise InputError("variant 'hybrid5' is defined for the 4-node quadrilateral only")
    if state == "axisymmetric":
        raise InputError("variant 'hybrid5' is offered in the plane states only (plane-stress, plane-strain)")

    def strain(p):
        return sp.zeros(3, 2 * info.n_nodes), compliance(p.state, p.E, p.nu) * P_op(p)

    return Formulation(
        variant="hybrid5",
        terms=(Term("ua", B_op, identity_op, P_op, rule="full", label="B^T P (G^T)"),
               Term("aa", P_op, minus_C_op, P_op, rule="full", symmetric=True, label="-P^T D^-1 P (-H)")),
        n_internal=5,
        description="assumed-stress hybrid, 5 stress parameters: K = G^T H^-1 G",
        source="Pian & Sumihara (1984)",
        strain=strain,
    )
