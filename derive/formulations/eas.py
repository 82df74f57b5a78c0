"""Enhanced assumed strain with four modes, EAS4 (Simo and Rifai, 1990).

    eps = B u + M_tilde alpha,   M_tilde(xi, eta) = (det J0 / det J) T0^-T E(xi, eta)

    E = [[xi, 0,  0,   0 ],        reference-space (covariant) Voigt strains
         [0,  eta, 0,  0 ],
         [0,  0,  xi, eta]]

T0^-T maps covariant reference-space Voigt strain (engineering shear) to physical Voigt
strain with the Jacobian at the element centre: with G = (J0^-1)^T in the textbook layout
J = [[dx/dxi, dy/dxi], [dx/deta, dy/deta]] (so G_ai = (J0^-1)_ia = d xi_a / d x_i),
eps_ij = sum_ab G_ai G_bj eps~_ab.  The factor det J0 / det J and int E dxi deta = 0 give
int M_tilde dV = 0 on any shape (orthogonality to constant stress), hence the patch test.

    K_uu = int B^T D B,  K_ua = int B^T D M,  K_aa = int M^T D M,   K = K_uu - K_ua K_aa^-1 K_ua^T

all with the element's full rule.  Plane states only.
"""
from __future__ import annotations

import sympy as sp

from ..errors import InputError
from .base import B_op, D_op, Formulation, Term


def T0_inv_T(p) -> sp.Matrix:
    """3x3 map from reference covariant Voigt strain to physical Voigt strain (centre Jacobian)."""
    J0 = p.J0
    d0 = p.detJ0
    Jinv = sp.Matrix([[J0[1, 1], -J0[0, 1]], [-J0[1, 0], J0[0, 0]]]) / d0
    g11, g21, g12, g22 = Jinv[0, 0], Jinv[0, 1], Jinv[1, 0], Jinv[1, 1]  # G_ai = Jinv[i, a]
    return sp.Matrix([
        [g11 ** 2, g21 ** 2, g11 * g21],
        [g12 ** 2, g22 ** 2, g12 * g22],
        [2 * g11 * g12, 2 * g21 * g22, g11 * g22 + g21 * g12],
    ])


def M_op(p) -> sp.Matrix:
    X, Y = p.p, p.q
    Eref = sp.Matrix([[X, 0, 0, 0], [0, Y, 0, 0], [0, 0, X, Y]])
    M = T0_inv_T(p) * Eref
    if p.detJ != p.detJ0:  # affine shapes: det J = det J0 and the factor is 1
        M = (p.detJ0 / p.detJ) * M
    return M


def eas4(info, state: str) -> Formulation:
    if info.domain != "square" or info.n_nodes != 4:
        raise InputError("variant 'eas4' is defined for the 4-node quadrilateral only")
    if state == "axisymmetric":
        raise InputError("variant 'eas4' is offered in the plane states only (plane-stress, plane-strain)")

    def strain(p):
        return p.B, M_op(p)

    return Formulation(
        variant="eas4",
        terms=(Term("uu", B_op, D_op, B_op, rule="full", symmetric=True, label="B^T D B"),
               Term("ua", B_op, D_op, M_op, rule="full", label="B^T D M"),
               Term("aa", M_op, D_op, M_op, rule="full", symmetric=True, label="M^T D M")),
        n_internal=4,
        description="enhanced assumed strain, 4 modes (det J0/det J T0^-T E)",
        source="Simo & Rifai (1990)",
        strain=strain,
    )
