"""Constitutive matrices D(E, nu) for the plane and axisymmetric states, with input checks.

Voigt order [xx, yy, xy] with engineering shear strain (axisymmetric: [rr, zz, tt, rz]).
D is isotropic linear elastic; the deviatoric/volumetric split used by selective
integration and B-bar is in :func:`split`.
"""
from __future__ import annotations

import math

import sympy as sp

from .errors import InputError, MaterialError
from .limits import check_array_positive
from .symbols import E as E_sym
from .symbols import nu as nu_sym

STATES = ("plane-stress", "plane-strain", "axisymmetric")


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
    return f * sp.Matrix([[1 - nu, nu, nu, 0], [nu, 1 - nu, nu, 0], [nu, nu, 1 - nu, 0], [0, 0, 0, (1 - 2 * nu) / 2]])


def lame(E=E_sym, nu=nu_sym) -> tuple[sp.Expr, sp.Expr]:
    """Lame constants (lambda, mu) of the 3-D material."""
    return E * nu / ((1 + nu) * (1 - 2 * nu)), E / (2 * (1 + nu))


def volumetric_vector(state: str) -> sp.Matrix:
    """m with m^T eps = the in-plane (or 3-D) volumetric strain for the state's Voigt order."""
    if state == "axisymmetric":
        return sp.Matrix([1, 1, 1, 0])
    return sp.Matrix([1, 1, 0])


def split(state: str = "plane-stress", E=E_sym, nu=nu_sym) -> tuple[sp.Matrix, sp.Matrix, sp.Expr]:
    """Split D = D_dev + D_vol with D_vol = kappa m m^T, returning (D_dev, D_vol, kappa).

    The three-dimensional deviatoric/volumetric split of the state's isotropic material, with
    m the state's volumetric vector (:func:`volumetric_vector`):

    * plane strain and axisymmetric: kappa = lambda + 2 mu / 3 (the 3-D bulk modulus; in plane
      strain m^T eps is the 3-D volume change because eps_zz = 0);
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
