"""Enhanced assumed strain: EAS4 (2-D) and EAS9 (3-D) of Simo and Rifai (1990), EAS21 (3-D) of
Andelfinger and Ramm (1993).

    eps = B u + M_tilde alpha,   M_tilde(xi) = (det J0 / det J) T0^-T E(xi)

E holds the reference-space (covariant) Voigt strain modes, one column per parameter:

    EAS4:  xx: xi;  yy: eta;  xy: xi, eta                                      (4)
    EAS9:  xx: xi;  yy: eta;  zz: zeta;  yz: eta, zeta;  zx: xi, zeta;  xy: xi, eta   (9)
    EAS21: xx: xi, xi eta, xi zeta;  yy: eta, xi eta, eta zeta;  zz: zeta, xi zeta, eta zeta;
           yz: eta, zeta, xi eta, xi zeta;  zx: xi, zeta, xi eta, eta zeta;
           xy: xi, eta, xi zeta, eta zeta                                       (21)

T0^-T maps covariant reference-space Voigt strain (engineering shear) to physical Voigt
strain with the Jacobian at the element centre: with G = (J0^-1)^T in the textbook layout
J[a, i] = dx_i / dxi_a (so G_ai = (J0^-1)_ia = d xi_a / d x_i), eps_ij = sum_ab G_ai G_bj eps~_ab
(:func:`voigt_strain_transform`, any dimension).  The factor det J0 / det J and int E dxi = 0
(every mode is odd in some coordinate) give int M_tilde dV = 0 on any shape (orthogonality to
constant stress), hence the patch test.

    K_uu = int B^T D B,  K_ua = int B^T D M,  K_aa = int M^T D M,   K = K_uu - K_ua K_aa^-1 K_ua^T

all with the element's full rule.  Plane states (Q4) and solid (H8) only.
"""
from __future__ import annotations

import sympy as sp

from ..errors import InputError
from ..geometry import adjugate
from .base import B_op, D_op, Formulation, Term

#: Voigt component order by dimension: (i, j) index pairs
VOIGT = {2: ((0, 0), (1, 1), (0, 1)), 3: ((0, 0), (1, 1), (2, 2), (1, 2), (2, 0), (0, 1))}


def voigt_strain_transform(Jinv: sp.Matrix) -> sp.Matrix:
    """Map from reference covariant Voigt strain (engineering shear) to physical Voigt strain.

    ``Jinv`` = J^-1 in the textbook layout, so G_ai = Jinv[i, a].  Row (i, j), column (a, b):
    normal rows sum_ab G_ai G_bj over the symmetric pair, shear rows twice that (engineering)."""
    d = Jinv.rows
    pairs = VOIGT[d]

    def G(a, i):
        return Jinv[i, a]

    def entry(ij, ab):
        (i, j), (a, b) = ij, ab
        if i == j:
            return G(a, i) * G(a, i) if a == b else G(a, i) * G(b, i)
        if a == b:
            return 2 * G(a, i) * G(a, j)
        return G(a, i) * G(b, j) + G(b, i) * G(a, j)
    return sp.Matrix([[entry(ij, ab) for ab in pairs] for ij in pairs])


def T0_inv_T(p) -> sp.Matrix:
    """Voigt map from reference covariant strain to physical strain with the centre Jacobian."""
    return voigt_strain_transform(adjugate(p.J0) / p.detJ0)


def _modes(variant: str, X):
    """Columns of E as (Voigt row, monomial) for the variant, X the point's coordinates."""
    if variant == "eas4":
        x, y = X
        return ((0, x), (1, y), (2, x), (2, y))
    x, y, z = X
    if variant == "eas9":
        return ((0, x), (1, y), (2, z), (3, y), (3, z), (4, x), (4, z), (5, x), (5, y))
    return ((0, x), (0, x * y), (0, x * z), (1, y), (1, x * y), (1, y * z), (2, z), (2, x * z), (2, y * z),
            (3, y), (3, z), (3, x * y), (3, x * z), (4, x), (4, z), (4, x * y), (4, y * z),
            (5, x), (5, y), (5, x * z), (5, y * z))


def _M_op(variant: str):
    def M_op(p) -> sp.Matrix:
        modes = _modes(variant, p.point)
        nrows = len(VOIGT[p.dim])
        Eref = sp.zeros(nrows, len(modes))
        for k, (row, value) in enumerate(modes):
            Eref[row, k] = value
        M = T0_inv_T(p) * Eref
        if p.detJ != p.detJ0:  # affine shapes: det J = det J0 and the factor is 1
            M = (p.detJ0 / p.detJ) * M
        return M
    M_op.__name__ = f"M_{variant}_op"
    return M_op


M_op = _M_op("eas4")
_SOURCES = {"eas4": "Simo & Rifai (1990)", "eas9": "Simo & Rifai (1990)", "eas21": "Andelfinger & Ramm (1993)"}
_OPS = {"eas4": M_op, "eas9": _M_op("eas9"), "eas21": _M_op("eas21")}


def _eas(variant: str, info, state: str, corners: int, states: tuple[str, ...]) -> Formulation:
    shape = "4-node quadrilateral" if corners == 4 else "8-node hexahedron"
    if info.domain not in ("square", "cube") or info.n_nodes != corners or info.dim != (2 if corners == 4 else 3):
        raise InputError(f"variant {variant!r} is defined for the {shape} only")
    if state not in states:
        raise InputError(f"variant {variant!r} is offered in {', '.join(states)} only")
    Mop = _OPS[variant]
    n_modes = len(_modes(variant, (0,) * info.dim))

    def strain(p):
        return p.B, Mop(p)

    return Formulation(
        variant=variant,
        terms=(Term("uu", B_op, D_op, B_op, rule="full", symmetric=True, label="B^T D B"),
               Term("ua", B_op, D_op, Mop, rule="full", label="B^T D M"),
               Term("aa", Mop, D_op, Mop, rule="full", symmetric=True, label="M^T D M")),
        n_internal=n_modes,
        description=f"enhanced assumed strain, {n_modes} modes (det J0/det J T0^-T E)",
        source=_SOURCES[variant],
        strain=strain,
    )


def eas4(info, state: str) -> Formulation:
    if info.domain != "square" or info.n_nodes != 4:
        raise InputError("variant 'eas4' is defined for the 4-node quadrilateral only")
    if state == "axisymmetric":
        raise InputError("variant 'eas4' is offered in the plane states only (plane-stress, plane-strain)")
    return _eas("eas4", info, state, 4, ("plane-stress", "plane-strain"))


def eas9(info, state: str) -> Formulation:
    return _eas("eas9", info, state, 8, ("solid",))


def eas21(info, state: str) -> Formulation:
    return _eas("eas21", info, state, 8, ("solid",))
