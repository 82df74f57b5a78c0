"""Mean-dilatation B-bar (Hughes, 1980), written as a one-parameter condensation.

With D = D_dev + kappa m m^T (the split of :func:`derive.formulations.selective.split`:
three-dimensional deviatoric form, D_dev positive definite in the plane states), the mean-dilatation element
replaces the volumetric strain m^T B u by its element mean theta = g^T u / V,
g = int m^T B dV, V = int dV:

    K = int B^T D_dev B dV + kappa g g^T / V.

The same matrix is the condensation of a constant pressure p (one internal unknown):

    K_uu = int B^T D_dev B dV,   K_ua = int B^T m dV = g,   K_aa = -int dV / kappa = -V / kappa
    K = K_uu - K_ua K_aa^-1 K_ua^T = K_dev + kappa g g^T / V,

which is how it is stated here, so it reaches the exact, point and numeric routes like any
other formulation (p = kappa theta is recovered as the internal unknown).  All integrals use
the element's full rule.  kappa per state: lambda + 2 mu / 3 (plane strain, axisymmetric),
lambda* + 2 mu / 3 with lambda* = E nu / (1 - nu^2) (plane stress).

The strain the element works with is eps_bar = (I - m m^T / n) B u + m p / (n kappa),
n = m^T m (2 in the plane states, 3 axisymmetric).

Axisymmetric: Q4 only.  A quadratic axisymmetric element with one constant pressure keeps
a zero-energy mode (u_r = r (z - z0), u_z = (z^2 - r^2)/2 - z0 z is purely dilatational with a
dilatation linear in z, whose volume mean can vanish), so that combination is refused.

Sources: Hughes (1980), Generalization of selective integration procedures to anisotropic
and nonlinear media, IJNME 15; Nagtegaal, Parks and Rice (1974) for the mean-dilatation idea.
"""
from __future__ import annotations

import sympy as sp

from .. import material
from ..errors import InputError
from .base import B_op, Formulation, Term
from .selective import D_dev_op, split


def m_op(p) -> sp.Matrix:
    return material.volumetric_vector(p.state)


def one_op(p) -> sp.Matrix:
    return sp.Matrix([[1]])


def minus_compliance_op(p) -> sp.Matrix:
    kappa = split(p.state, p.E, p.nu)[2]
    return sp.Matrix([[-1 / kappa]])


def _strain(p):
    m = material.volumetric_vector(p.state)
    n = (m.T * m)[0, 0]
    kappa = split(p.state, p.E, p.nu)[2]
    P = sp.eye(m.rows) - m * m.T / n
    return P * p.B, m / (n * kappa)


def bbar(info, state: str) -> Formulation:
    if state == "axisymmetric" and info.n_nodes > 4:
        raise InputError(f"variant 'bbar' of {info.name} is offered in the plane states only: with one constant "
                         "pressure the quadratic axisymmetric element keeps a zero-energy mode "
                         "(u = r z, w = (z^2 - r^2)/2 about the element centre has no deviatoric strain and zero "
                         "mean dilatation)")
    return Formulation(
        variant="bbar",
        terms=(Term("uu", B_op, D_dev_op, B_op, rule="full", symmetric=True, label="B^T D_dev B"),
               Term("ua", B_op, m_op, one_op, rule="full", label="B^T m (g)"),
               Term("aa", one_op, minus_compliance_op, one_op, rule="full", symmetric=True,
                    label="-1/kappa (-V/kappa)")),
        n_internal=1,
        description="mean-dilatation B-bar: K_dev + kappa g g^T / V (constant pressure condensed)",
        source="Hughes (1980); Nagtegaal, Parks & Rice (1974)",
        notes=("split D = D_dev + kappa m m^T, 3-D deviatoric form (derive.formulations.selective.split)",),
        strain=_strain,
    )
