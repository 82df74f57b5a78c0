"""Strain-displacement (B) matrices per state.

DOFs are interleaved per node (u1, v1, u2, v2, ...).  Voigt order [xx, yy, xy] with
engineering shear strain gamma_xy = du/dy + dv/dx; axisymmetric [rr, zz, tt, rz] with
x = r, y = z, u = radial and v = axial displacement, eps_tt = u / r.
"""
from __future__ import annotations

from typing import Sequence

import sympy as sp


def strain_rows(state: str) -> int:
    return 4 if state == "axisymmetric" else 3


def B_matrix(state: str, N: Sequence[sp.Expr], dNdx: Sequence[sp.Expr], dNdy: Sequence[sp.Expr],
             radius: sp.Expr | None = None) -> sp.Matrix:
    """Assemble B from the shape functions and their physical derivatives.

    ``radius`` (the x coordinate of the point) is needed for the axisymmetric hoop strain.
    """
    n = len(dNdx)
    rows = strain_rows(state)
    B = sp.zeros(rows, 2 * n)
    for i in range(n):
        B[0, 2 * i] = dNdx[i]
        B[1, 2 * i + 1] = dNdy[i]
        if state == "axisymmetric":
            if radius is None:
                raise ValueError("axisymmetric B needs the radius")
            B[2, 2 * i] = N[i] / radius
            B[3, 2 * i] = dNdy[i]
            B[3, 2 * i + 1] = dNdx[i]
        else:
            B[2, 2 * i] = dNdy[i]
            B[2, 2 * i + 1] = dNdx[i]
    return B


def rigid_body_modes(xs: Sequence, ys: Sequence, state: str = "plane-stress") -> list[list]:
    """Nodal displacement vectors of the rigid-body modes (plane: 2 translations + rotation;
    axisymmetric: the axial translation only)."""
    n = len(xs)
    tx = [v for _ in range(n) for v in (1, 0)]
    ty = [v for _ in range(n) for v in (0, 1)]
    rot = [v for i in range(n) for v in (-ys[i], xs[i])]
    if state == "axisymmetric":
        return [ty]
    return [tx, ty, rot]
