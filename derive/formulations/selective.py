"""Selective integration: the volumetric part of D with the reduced rule, the rest full.

Split used (:func:`split`): D = D_dev + kappa m m^T with m the state's volumetric vector
([1, 1, 0] in the plane states, [1, 1, 1, 0] axisymmetric) and the *three-dimensional*
deviatoric/volumetric split of the state's isotropic material:

* plane strain:  kappa = lambda + 2 mu / 3 (the 3-D bulk modulus; m^T eps is the 3-D volume
  change because eps_zz = 0), D_dev = mu [[4/3, -2/3, 0], [-2/3, 4/3, 0], [0, 0, 1]];
* plane stress:  the same form with lambda replaced by the plane-stress value
  lambda* = 2 lambda mu / (lambda + 2 mu) = E nu / (1 - nu^2): kappa = lambda* + 2 mu / 3;
* axisymmetric:  kappa = lambda + 2 mu / 3, D_dev = 2 mu (I - m m^T / 3) on the normal
  strains and mu on the shear.
The split itself is :func:`derive.material.split`.

In the plane states this D_dev is positive definite.  The alternative two-dimensional split
(kappa = lambda + mu, D_dev = mu [[1, -1, 0], [-1, 1, 0], [0, 0, 1]]) leaves D_dev singular: every conformal field (eps_xx = eps_yy, gamma_xy = 0, such
as u = x^2 - y^2, v = 2 x y) has zero deviatoric energy, and the quadratic elements then get
zero-energy modes under selective integration and mean dilatation, so it is not used.

    K = int B^T D_dev B t dA   (element's full rule)
      + int B^T D_vol B t dA   (element's reduced rule)

Sources: Doherty, Wilson and Taylor (1969); Hughes, The Finite Element Method (1987), Sec. 4.4;
Malkus and Hughes (1978) for the equivalence with mixed/penalty methods.  Selective
integration of the volumetric part removes volumetric locking (nu -> 1/2 in plane strain
and axisymmetric) but not the shear locking of Q4 in bending, whose spurious shear strain
lives in the deviatoric part.

Solid T10: the one-point volumetric rule leaves the three special conformal fields
u = 2 (g.x) x - |x|^2 g (x from the centroid; zero deviatoric strain, dilatation 6 g.x, zero at
the centroid) without stiffness: 9 zero-energy modes (6 rigid).  Prefer ``bbar`` (linear
pressure) for T10.  H8, H20 and H27 keep exactly the 6 rigid-body modes.

Axisymmetric T6 is refused: its one-point volumetric rule leaves the purely dilatational
field u_r = r (z - z_c), u_z = (z^2 - r^2)/2 - z_c z (dilatation 3 (z - z_c), zero at the
centroid) without stiffness.
"""
from __future__ import annotations

from functools import lru_cache

from .. import material
from ..errors import InputError
from .base import B_op, Formulation, Term

STATES = material.STATES


@lru_cache(maxsize=None)
def split(state, E, nu):
    """(D_dev, D_vol, kappa): :func:`derive.material.split`, cached per (state, E, nu)."""
    return material.split(state, E, nu)


def D_dev_op(p):
    return split(p.state, p.E, p.nu)[0]


def D_vol_op(p):
    return split(p.state, p.E, p.nu)[1]


def selective(info, state: str) -> Formulation:
    if state == "axisymmetric" and info.domain == "triangle" and info.n_nodes > 3:
        raise InputError(f"variant 'selective' of {info.name} is offered in the plane states only: with the "
                         "one-point volumetric rule the axisymmetric element keeps a zero-energy mode")
    return Formulation(
        variant="selective",
        terms=(Term("uu", B_op, D_dev_op, B_op, rule="full", symmetric=True, label="B^T D_dev B"),
               Term("uu", B_op, D_vol_op, B_op, rule="reduced", symmetric=True, label="B^T D_vol B (reduced rule)")),
        description="selective integration: volumetric part of D with the reduced rule",
        source="Doherty, Wilson & Taylor (1969); Hughes (1987) Sec. 4.4",
        notes=("split D = D_dev + kappa m m^T, 3-D deviatoric form (derive.formulations.selective.split)",),
    )
