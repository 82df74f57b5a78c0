"""Strain-displacement (B) matrices and rigid-body modes, by kinematic model.

The models themselves (fields, strain tables, measure) live in :mod:`derive.models`; this
module keeps the historical 2-D entry points.  DOFs are interleaved per node (u1, v1, u2, v2,
...; solid u1, v1, w1, ...).  Voigt order [xx, yy, xy] with engineering shear strain
gamma_xy = du/dy + dv/dx; axisymmetric [rr, zz, tt, rz] with x = r, y = z, u = radial and
v = axial displacement, eps_tt = u / r; solid [xx, yy, zz, yz, zx, xy].
"""
from __future__ import annotations

from typing import Sequence

import sympy as sp

from . import models


def strain_rows(state: str) -> int:
    """Number of strain components of the model."""
    return len(models.get(state).strains)


def B_matrix(state: str, N: Sequence[sp.Expr], dNdx: Sequence[sp.Expr], dNdy: Sequence[sp.Expr],
             radius: sp.Expr | None = None) -> sp.Matrix:
    """B of a 2-D model from N and the physical derivatives (see :meth:`derive.models.Model.B`).

    ``radius`` (the x coordinate of the point) is needed for the axisymmetric hoop strain.
    """
    return models.get(state).B(N, (dNdx, dNdy), radius)


def rigid_body_modes(xs: Sequence, ys: Sequence, state: str = "plane-stress", zs: Sequence | None = None) -> list[list]:
    """Nodal displacement vectors of the rigid-body modes (plane: 2 translations + rotation;
    axisymmetric: the axial translation only; solid: 3 translations + 3 rotations)."""
    coords = (xs, ys) if zs is None else (xs, ys, zs)
    return models.get(state).rigid_body_modes(coords)
