"""B-bar (Hughes, 1980), written as a condensation of an element pressure field.

With D = D_dev + kappa m m^T (the split of :func:`derive.formulations.selective.split`:
three-dimensional deviatoric form, D_dev positive definite in the plane states), B-bar
replaces the volumetric strain m^T B u by its L2 projection on the element's pressure space
pi (a row of polynomials in xi, eta):

    theta_bar = pi M_p^-1 g u,   M_p = int pi^T pi dV,   g = int pi^T m^T B dV
    K = int B^T D_dev B dV + kappa g^T M_p^-1 g.

The same matrix is the condensation of the pressure parameters (internal unknowns):

    K_uu = int B^T D_dev B dV,   K_ua = int B^T m pi dV = g^T,   K_aa = -M_p / kappa
    K = K_uu - K_ua K_aa^-1 K_ua^T,

which is how it is stated here, so it reaches the exact, point, numeric and kernel routes
like any other formulation.  Pressure spaces: constant for Q4 (the mean-dilatation element of
Nagtegaal, Parks & Rice, 1974; likewise H8, T4), linear {1, xi, eta[, zeta]} for Q8, Q9, T6 (and H20, H27, T10) (the 3-parameter
pressure of the quadratic mixed elements; with a constant pressure those elements keep two
purely dilatational zero-energy modes, u = (x^2 - y^2, 2xy) and (-2xy, x^2 - y^2), and are too
flexible in bending by 2(1 + nu)).  All integrals use the element's full rule.  kappa per
state: lambda + 2 mu / 3 (plane strain, axisymmetric), lambda* + 2 mu / 3 with
lambda* = E nu / (1 - nu^2) (plane stress).

The strain the element works with is eps_bar = (I - m m^T / n) B u + m pi alpha / (n kappa),
n = m^T m (2 in the plane states, 3 axisymmetric and solid), alpha the pressure parameters.

Axisymmetric: Q4 only.

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


def _linear_element(info) -> bool:
    """True when no reference coordinate appears squared in the shape basis (T3, Q4, T4, H8, W6)."""
    from .. import reference
    coords = reference.coordinates(info.domain)
    return all(sp.degree(sp.sympify(m), s) <= 1 for m in info.basis for s in coords)


def pressure_basis(info) -> tuple[str, ...]:
    """The pressure space the dilatation is projected onto: constant for the linear elements
    (mean dilatation), linear in the reference coordinates for the quadratic ones."""
    from .. import reference
    if _linear_element(info):
        return ("1",)
    return ("1",) + tuple(s.name for s in reference.coordinates(info.domain))


def linear_pressure_op(p) -> sp.Matrix:
    return sp.Matrix([[1, *p.point]])


def minus_compliance_op(p) -> sp.Matrix:
    kappa = split(p.state, p.E, p.nu)[2]
    return sp.Matrix([[-1 / kappa]])


def _strain_with(pi_op):
    def strain(p):
        m = material.volumetric_vector(p.state)
        n = (m.T * m)[0, 0]
        kappa = split(p.state, p.E, p.nu)[2]
        P = sp.eye(m.rows) - m * m.T / n
        return P * p.B, m * pi_op(p) / (n * kappa)
    return strain


def bbar(info, state: str) -> Formulation:
    linear = len(pressure_basis(info)) > 1
    if state == "axisymmetric" and linear:
        raise InputError(f"variant 'bbar' of {info.name} is offered in the plane states only (the axisymmetric "
                         "quadratic elements are not verified with a projected pressure here)")
    pi_op = linear_pressure_op if linear else one_op
    npress = len(pressure_basis(info))
    what = f"linear pressure {{{', '.join(pressure_basis(info))}}}" if linear else "constant pressure (mean dilatation)"
    return Formulation(
        variant="bbar",
        terms=(Term("uu", B_op, D_dev_op, B_op, rule="full", symmetric=True, label="B^T D_dev B"),
               Term("ua", B_op, m_op, pi_op, rule="full", label="B^T m pi (g)"),
               Term("aa", pi_op, minus_compliance_op, pi_op, rule="full", symmetric=True,
                    label="-pi^T pi / kappa (-M_p / kappa)")),
        n_internal=npress,
        description=f"B-bar, dilatation projected on a {what}: K_dev + kappa g^T M_p^-1 g",
        source="Hughes (1980); Nagtegaal, Parks & Rice (1974)",
        notes=("split D = D_dev + kappa m m^T, 3-D deviatoric form (derive.formulations.selective.split)",),
        strain=_strain_with(pi_op),
    )
