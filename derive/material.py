"""Constitutive matrices D(E, nu) for the plane, axisymmetric and solid models, with input checks.

Voigt order [xx, yy, xy] with engineering shear strain (axisymmetric: [rr, zz, tt, rz]; solid:
[xx, yy, zz, yz, zx, xy], engineering shear gamma_ij = 2 eps_ij).  D is isotropic linear
elastic; the deviatoric/volumetric split used by selective integration and B-bar is in
:func:`split`.  Anisotropic solids: :func:`orthotropic` and :func:`transversely_isotropic`
build D from engineering constants as the inverse of the compliance, after a
positive-definiteness check.
"""
from __future__ import annotations

import math

import sympy as sp

from .errors import InputError, MaterialError
from .limits import check_array_positive
from .symbols import E as E_sym
from .symbols import nu as nu_sym

#: the kinematic model names (``state`` in the public API); their fields, B and thickness are
#: in :mod:`derive.models`
STATES = ("plane-stress", "plane-strain", "axisymmetric", "solid")


def check_state(state: str) -> str:
    if state not in STATES:
        raise InputError(f"unknown state {state!r}; allowed: {', '.join(STATES)}")
    return state


def check_material(state: str, E=None, nu=None, t=None) -> None:
    """Refuse E <= 0 and nu outside (-1, 0.5); nu = 0.5 only in plane stress (D finite there);
    a thickness t <= 0 or not finite (a negative t gives a negative-definite K)."""
    check_state(state)
    if t is not None:
        check_array_positive(t, "t", "thickness")
    if E is not None and _is_number(E):
        if isinstance(E, sp.Basic) and not E.is_real:
            raise MaterialError(f"Young's modulus E = {E} is not allowed; E must be a finite number > 0")
        Ev = float(E)
        if not math.isfinite(Ev) or Ev <= 0:
            raise MaterialError(f"Young's modulus E = {E} is not allowed; E must be a finite number > 0")
    if nu is not None and _is_number(nu):
        if isinstance(nu, sp.Basic) and not nu.is_real:
            raise MaterialError(f"Poisson's ratio nu = {nu} is not allowed; -1 < nu < 0.5")
        nv = float(nu)
        if not math.isfinite(nv) or nv <= -1 or nv > 0.5:
            raise MaterialError(f"Poisson's ratio nu = {nu} is not allowed; -1 < nu < 0.5")
        if nv == 0.5 and state != "plane-stress":
            raise MaterialError(f"Poisson's ratio nu = 0.5 makes D singular in {state} (incompressible); "
                                "use nu < 0.5, e.g. 0.4999")


def _is_number(v) -> bool:
    if isinstance(v, sp.Basic):
        return bool(v.is_number)
    return isinstance(v, (int, float))


def D(state: str = "plane-stress", E=E_sym, nu=nu_sym) -> sp.Matrix:
    """Isotropic elasticity matrix for the state (symbolic by default)."""
    check_material(state, E, nu)
    E = sp.sympify(E) if not isinstance(E, sp.Basic) else E
    nu = sp.nsimplify(nu, rational=True) if isinstance(nu, float) else (sp.sympify(nu) if not isinstance(nu, sp.Basic) else nu)
    if state == "plane-stress":
        f = E / (1 - nu ** 2)
        return f * sp.Matrix([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])
    f = E / ((1 + nu) * (1 - 2 * nu))
    if state == "plane-strain":
        return f * sp.Matrix([[1 - nu, nu, 0], [nu, 1 - nu, 0], [0, 0, (1 - 2 * nu) / 2]])
    if state == "solid":
        g = (1 - 2 * nu) / 2
        return f * sp.Matrix([[1 - nu, nu, nu, 0, 0, 0], [nu, 1 - nu, nu, 0, 0, 0], [nu, nu, 1 - nu, 0, 0, 0],
                              [0, 0, 0, g, 0, 0], [0, 0, 0, 0, g, 0], [0, 0, 0, 0, 0, g]])
    return f * sp.Matrix([[1 - nu, nu, nu, 0], [nu, 1 - nu, nu, 0], [nu, nu, 1 - nu, 0], [0, 0, 0, (1 - 2 * nu) / 2]])


def lame(E=E_sym, nu=nu_sym) -> tuple[sp.Expr, sp.Expr]:
    """Lame constants (lambda, mu) of the 3-D material."""
    return E * nu / ((1 + nu) * (1 - 2 * nu)), E / (2 * (1 + nu))


def volumetric_vector(state: str) -> sp.Matrix:
    """m with m^T eps = the in-plane (or 3-D) volumetric strain for the state's Voigt order."""
    if state == "axisymmetric":
        return sp.Matrix([1, 1, 1, 0])
    if state == "solid":
        return sp.Matrix([1, 1, 1, 0, 0, 0])
    return sp.Matrix([1, 1, 0])


def split(state: str = "plane-stress", E=E_sym, nu=nu_sym) -> tuple[sp.Matrix, sp.Matrix, sp.Expr]:
    """Split D = D_dev + D_vol with D_vol = kappa m m^T, returning (D_dev, D_vol, kappa).

    The three-dimensional deviatoric/volumetric split of the state's isotropic material, with
    m the state's volumetric vector (:func:`volumetric_vector`):

    * solid, plane strain and axisymmetric: kappa = lambda + 2 mu / 3 (the 3-D bulk modulus; in
      plane strain m^T eps is the 3-D volume change because eps_zz = 0);
    * plane stress: the same form with lambda replaced by lambda* = 2 lambda mu / (lambda + 2 mu)
      = E nu / (1 - nu^2), so kappa = lambda* + 2 mu / 3.

    D_dev is then positive definite in the plane states.  The two-dimensional alternative
    (kappa = lambda + mu, D_dev m = 0) leaves D_dev singular on every conformal field
    (eps_xx = eps_yy, gamma_xy = 0, e.g. u = x^2 - y^2, v = 2xy), which gives the quadratic
    elements zero-energy modes under selective integration and B-bar; it is not used.
    Selective integration and B-bar (``derive.formulations``) use this split.
    """
    Dm = D(state, E, nu)
    lam, mu = lame(E, nu)
    if state == "plane-stress":
        lam = 2 * lam * mu / (lam + 2 * mu)
    kappa = sp.cancel(lam + sp.Rational(2, 3) * mu)
    m = volumetric_vector(state)
    Dvol = kappa * m * m.T
    Ddev = (Dm - Dvol).applyfunc(sp.cancel)
    return Ddev, Dvol, kappa


# --------------------------------------------------------------------------- anisotropic solids

def _value(v):
    if isinstance(v, float):
        return sp.nsimplify(v, rational=True)
    return sp.sympify(v) if not isinstance(v, sp.Basic) else v


def orthotropic(E1, E2, E3, nu12, nu13, nu23, G12, G13, G23) -> sp.Matrix:
    """Solid D (Voigt [xx, yy, zz, yz, zx, xy]) of an orthotropic material, axes 1, 2, 3 = x, y, z.

    Engineering constants: Young's moduli E_i, major Poisson's ratios nu_ij (strain in j from
    stress in i: eps_j = -nu_ij sigma_i / E_i; nu_ji = nu_ij E_j / E_i) and shear moduli G_ij.
    D = C^-1 with the compliance

        C = [[1/E1, -nu12/E1, -nu13/E1], [-nu12/E1, 1/E2, -nu23/E2], [-nu13/E1, -nu23/E2, 1/E3]]
            (+) diag(1/G23, 1/G13, 1/G12).

    Numeric constants are checked first: every modulus > 0 and C positive definite
    (1 - nu12 nu21 > 0, 1 - nu23 nu32 > 0, 1 - nu13 nu31 > 0 and
    1 - nu12 nu21 - nu23 nu32 - nu13 nu31 - 2 nu21 nu32 nu13 > 0); a violation is a one-line
    :class:`MaterialError`.  Symbolic constants are passed through unchecked.
    """
    E1, E2, E3, nu12, nu13, nu23, G12, G13, G23 = (_value(v) for v in (E1, E2, E3, nu12, nu13, nu23,
                                                                      G12, G13, G23))
    names = ("E1", "E2", "E3", "G12", "G13", "G23")
    for name, v in zip(names, (E1, E2, E3, G12, G13, G23)):
        if v.is_number and not (math.isfinite(float(v)) and float(v) > 0):
            raise MaterialError(f"orthotropic material: {name} = {v} is not allowed; moduli must be finite numbers > 0")
    normal = sp.Matrix([[1 / E1, -nu12 / E1, -nu13 / E1], [-nu12 / E1, 1 / E2, -nu23 / E2],
                        [-nu13 / E1, -nu23 / E2, 1 / E3]])
    values = (E1, E2, E3, nu12, nu13, nu23)
    if all(v.is_number for v in values):
        nu21, nu31, nu32 = nu12 * E2 / E1, nu13 * E3 / E1, nu23 * E3 / E2
        minors = (("1 - nu12 nu21", 1 - nu12 * nu21), ("1 - nu23 nu32", 1 - nu23 * nu32),
                  ("1 - nu13 nu31", 1 - nu13 * nu31),
                  ("1 - nu12 nu21 - nu23 nu32 - nu13 nu31 - 2 nu21 nu32 nu13",
                   1 - nu12 * nu21 - nu23 * nu32 - nu13 * nu31 - 2 * nu21 * nu32 * nu13))
        for text, v in minors:
            if not float(v) > 0:
                raise MaterialError(f"orthotropic material is not positive definite: {text} = {float(v):.6g} <= 0; "
                                    "check the Poisson's ratios against the moduli (|nu_ij| < sqrt(E_i/E_j))")
    Dn = normal.inv().applyfunc(sp.cancel)
    D = sp.zeros(6, 6)
    D[:3, :3] = Dn
    D[3, 3], D[4, 4], D[5, 5] = G23, G13, G12
    return D


def transversely_isotropic(E_p, E_t, nu_p, nu_tp, G_t) -> sp.Matrix:
    """Solid D of a transversely isotropic material with the z axis as its axis of symmetry.

    In-plane (x-y) modulus E_p and Poisson's ratio nu_p (shear modulus E_p / (2 (1 + nu_p))),
    transverse (z) modulus E_t, nu_tp the Poisson's ratio of in-plane strain under stress along
    z (eps_x = -nu_tp sigma_z / E_t, so nu_13 = nu_tp E_p / E_t) and G_t the transverse shear
    modulus (yz, zx).  The orthotropic constructor with E1 = E2 = E_p, E3 = E_t, nu12 = nu_p,
    nu13 = nu23 = nu_tp E_p / E_t, G12 = E_p / (2 (1 + nu_p)), G13 = G23 = G_t, and its checks.
    """
    E_p, E_t, nu_p, nu_tp, G_t = (_value(v) for v in (E_p, E_t, nu_p, nu_tp, G_t))
    if E_t.is_number and not float(E_t) > 0:
        raise MaterialError(f"transversely isotropic material: E_t = {E_t} is not allowed; moduli must be > 0")
    nu_pt = nu_tp * E_p / E_t
    return orthotropic(E_p, E_p, E_t, nu_p, nu_pt, nu_pt, E_p / (2 * (1 + nu_p)), G_t, G_t)
