"""Incompatible modes: bubble displacements (1 - xi^2), (1 - eta^2) added and condensed.

    u = sum N_i u_i + (1 - xi^2) alpha_1 + (1 - eta^2) alpha_2       (same for v: alpha_3, alpha_4)
    eps = B u + G alpha,   internal unknowns ordered (alpha_1u, alpha_1v, alpha_2u, alpha_2v)
    K_uu = int B^T D B,  K_ua = int B^T D G,  K_aa = int G^T D G,   K = K_uu - K_ua K_aa^-1 K_ua^T

``incompatible`` (Wilson, Taylor, Doherty and Ghaboussi, 1973): G from the bubble
derivatives through the point's own Jacobian, [dP/dx, dP/dy] = J^-1 [dP/dxi, dP/deta].
int G dV vanishes only on parallelograms, so the element fails the patch test on other
shapes (it does not reproduce a constant strain state).

``incompatible-centred`` (Taylor, Beresford and Wilson, 1976): the derivatives are taken
through the Jacobian at the element centre and scaled by det J0 / det J,
G_c = (det J0 / det J) J0^-1 [dP/dxi, dP/deta] = adj(J0) [dP/dxi, dP/deta] / det J, so that
int G_c dV = t adj(J0) int [dP/dxi, dP/deta] dxi deta = 0 on any shape: the patch test is
passed.  Plane states only (with the axisymmetric hoop term the integral does not vanish).

On a rectangle both reproduce pure bending exactly (the bubble modes supply the missing
quadratic displacements), in plane stress and plane strain.
"""
from __future__ import annotations

import sympy as sp

from .. import kinematics
from ..errors import InputError
from ..symbols import eta, xi
from .base import B_op, D_op, Formulation, Term

BUBBLES = (1 - xi ** 2, 1 - eta ** 2)
BUBBLE_DXI = (-2 * xi, sp.Integer(0))
BUBBLE_DETA = (sp.Integer(0), -2 * eta)


def _bubble_values(p):
    N = tuple(p.at(f) for f in BUBBLES)
    dxi = tuple(p.at(f) for f in BUBBLE_DXI)
    deta = tuple(p.at(f) for f in BUBBLE_DETA)
    return N, dxi, deta


def G_op(p) -> sp.Matrix:
    """Strain of the bubble modes, derivatives through the point's own Jacobian."""
    N, dxi, deta = _bubble_values(p)
    dx, dy = p.physical(dxi, deta)
    return kinematics.B_matrix(p.state, N, dx, dy, p.radius if p.state == "axisymmetric" else None)


def G_centred_op(p) -> sp.Matrix:
    """Strain of the bubble modes through J0, scaled by det J0 / det J (plane states)."""
    N, dxi, deta = _bubble_values(p)
    J0 = p.J0
    A0 = sp.Matrix([[J0[1, 1], -J0[0, 1]], [-J0[1, 0], J0[0, 0]]])
    d = p.detJ
    dx = tuple(sp.expand(A0[0, 0] * u + A0[0, 1] * v) / d for u, v in zip(dxi, deta))
    dy = tuple(sp.expand(A0[1, 0] * u + A0[1, 1] * v) / d for u, v in zip(dxi, deta))
    return kinematics.B_matrix(p.state, N, dx, dy)


def _check_square(info, variant):
    if info.domain != "square" or info.n_nodes != 4:
        raise InputError(f"variant {variant!r} is defined for the 4-node quadrilateral only")


def _build(variant: str, G, description: str, source: str) -> Formulation:
    def strain(p):
        return p.B, G(p)

    return Formulation(
        variant=variant,
        terms=(Term("uu", B_op, D_op, B_op, rule="full", symmetric=True, label="B^T D B"),
               Term("ua", B_op, D_op, G, rule="full", label="B^T D G"),
               Term("aa", G, D_op, G, rule="full", symmetric=True, label="G^T D G")),
        n_internal=4,
        description=description,
        source=source,
        notes=("bubble modes 1 - xi^2, 1 - eta^2 in u and v, condensed statically",),
        strain=strain,
    )


def incompatible(info, state: str) -> Formulation:
    _check_square(info, "incompatible")
    return _build("incompatible", G_op,
                  "incompatible bubble modes, own Jacobian (fails the patch test off parallelograms)",
                  "Wilson, Taylor, Doherty & Ghaboussi (1973)")


def incompatible_centred(info, state: str) -> Formulation:
    _check_square(info, "incompatible-centred")
    if state == "axisymmetric":
        raise InputError("variant 'incompatible-centred' is offered in the plane states only "
                         "(plane-stress, plane-strain)")
    return _build("incompatible-centred", G_centred_op,
                  "incompatible modes through the centre Jacobian, scaled det J0/det J (passes the patch test)",
                  "Taylor, Beresford & Wilson (1976)")
