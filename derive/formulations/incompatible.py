"""Incompatible modes: bubble displacements (1 - xi_a^2) added in every field and condensed.

    u = sum N_i u_i + sum_a (1 - xi_a^2) alpha_a     (xi_a = xi, eta[, zeta]; same for v[, w])
    eps = B u + G alpha,   internal unknowns ordered per bubble, then per field
    (2-D: alpha_1u, alpha_1v, alpha_2u, alpha_2v; 3-D: the nine modes of Wilson et al., 1973)
    K_uu = int B^T D B,  K_ua = int B^T D G,  K_aa = int G^T D G,   K = K_uu - K_ua K_aa^-1 K_ua^T

``incompatible`` (Wilson, Taylor, Doherty and Ghaboussi, 1973): G from the bubble
derivatives through the point's own Jacobian, [dP/dx] = J^-1 [dP/dxi].  int G dV vanishes
only on parallelograms / parallelepipeds, so the element fails the patch test on other
shapes (it does not reproduce a constant strain state).

``incompatible-centred`` (Taylor, Beresford and Wilson, 1976): the derivatives are taken
through the Jacobian at the element centre and scaled by det J0 / det J,
G_c = (det J0 / det J) J0^-1 [dP/dxi] = adj(J0) [dP/dxi] / det J, so that
int G_c dV = adj(J0) int [dP/dxi] dxi = 0 on any shape: the patch test is passed.  Plane
states and solid only (with the axisymmetric hoop term the integral does not vanish).

On a rectangle (brick) both reproduce pure bending exactly (the bubble modes supply the
missing quadratic displacements).  The same code serves Q4 and H8: the bubbles, their
derivatives and the strain operator come from the element's dimension and model.
"""
from __future__ import annotations

import sympy as sp

from ..errors import InputError
from ..geometry import adjugate
from .base import B_op, D_op, Formulation, Term, physical_derivatives


def _bubbles(p):
    """Bubble values and reference derivatives at the point: N[a], dref[b][a] = d(1 - xi_a^2)/dxi_b."""
    N = tuple(p.at(1 - s ** 2) for s in p.coords)
    dref = tuple(tuple(p.at(-2 * s) if a == b else sp.Integer(0) for a, s in enumerate(p.coords))
                 for b in range(len(p.coords)))
    return N, dref


def G_op(p) -> sp.Matrix:
    """Strain of the bubble modes, derivatives through the point's own Jacobian."""
    N, dref = _bubbles(p)
    return p.strain_matrix(N, p.physical(*dref))


def G_centred_op(p) -> sp.Matrix:
    """Strain of the bubble modes through J0, scaled by det J0 / det J (plane states, solid)."""
    N, dref = _bubbles(p)
    return p.strain_matrix(N, physical_derivatives(adjugate(p.J0), p.detJ, dref))


_CORNERS = {"square": 4, "cube": 8}


def _check_shape(info, variant):
    if _CORNERS.get(info.domain) != info.n_nodes:
        raise InputError(f"variant {variant!r} is defined for the 4-node quadrilateral and the 8-node hexahedron only")


def _build(variant: str, G, description: str, source: str, info, state: str) -> Formulation:
    from .. import models
    n_modes = info.dim * models.get(state).nfields

    def strain(p):
        return p.B, G(p)

    return Formulation(
        variant=variant,
        terms=(Term("uu", B_op, D_op, B_op, rule="full", symmetric=True, label="B^T D B"),
               Term("ua", B_op, D_op, G, rule="full", label="B^T D G"),
               Term("aa", G, D_op, G, rule="full", symmetric=True, label="G^T D G")),
        n_internal=n_modes,
        description=description,
        source=source,
        notes=(("bubble modes 1 - xi^2, 1 - eta^2 in u and v, condensed statically",) if info.dim == 2 else
               ("bubble modes 1 - xi^2, 1 - eta^2, 1 - zeta^2 in u, v and w (nine modes), condensed statically",)),
        strain=strain,
    )


def incompatible(info, state: str) -> Formulation:
    _check_shape(info, "incompatible")
    return _build("incompatible", G_op,
                  "incompatible bubble modes, own Jacobian (fails the patch test off parallelograms)",
                  "Wilson, Taylor, Doherty & Ghaboussi (1973)", info, state)


def incompatible_centred(info, state: str) -> Formulation:
    _check_shape(info, "incompatible-centred")
    if state == "axisymmetric":
        raise InputError("variant 'incompatible-centred' is offered in the plane states and solid only "
                         "(plane-stress, plane-strain, solid)")
    return _build("incompatible-centred", G_centred_op,
                  "incompatible modes through the centre Jacobian, scaled det J0/det J (passes the patch test)",
                  "Taylor, Beresford & Wilson (1976)", info, state)
