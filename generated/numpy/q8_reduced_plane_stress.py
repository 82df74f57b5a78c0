"""
derive generated kernel: Q8 reduced plane-stress

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      Q8, 8 nodes, 16 DOFs interleaved u1, v1, u2, v2, ...
formulation  displacement element, uniformly reduced integration [standard displacement
             formulation]
integration  B^T D B: gauss-2x2 (4 points)
flops        stiffness 2881, validity 330, recovery 1312 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 8, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior)
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu <= 0.5), scalar
  t       thickness t (the out-of-plane thickness)
  u       nodal displacements for recovery, shape (n, 16), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 16, 16), DOFs interleaved u1, v1, u2, v2, ...; symmetric
  detJ_min validity: min det J over the points of gauss-3x3, shape (n,); <= 0 means an inverted
           or degenerate element
  strain  recovery: strain at the 9 points of gauss-3x3, shape (n, 9, 3), Voigt [eps_xx, eps_yy,
          gamma_xy] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 9, 3), [sigma_xx, sigma_yy,
          tau_xy]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel Q8 --variant reduced --state plane-stress --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "Q8"
VARIANT = "reduced"
STATE = "plane-stress"
NODES = 8
NDOF = 16
NSTRAIN = 3
NPOINTS = 9
GENERATOR = "derive.codegen 1.0"
_CHUNK = 2048

# point constants (shape-function derivatives, monomials, weights) per rule, (points, 1)
# c0 = eta^2 at the points of gauss-2x2
_S0_c0 = np.array([0.3333333333333333, 0.3333333333333333, 0.3333333333333333, 0.3333333333333333]).reshape(4, 1)
# c1 = 2*xi at the points of gauss-2x2
_S0_c1 = np.array([-1.1547005383792515, 1.1547005383792515, -1.1547005383792515, 1.1547005383792515]).reshape(4, 1)
# c2 = 2*eta*xi at the points of gauss-2x2
_S0_c2 = np.array([0.6666666666666666, -0.6666666666666666, -0.6666666666666666, 0.6666666666666666]).reshape(4, 1)
# c3 = 2*eta at the points of gauss-2x2
_S0_c3 = np.array([-1.1547005383792515, -1.1547005383792515, 1.1547005383792515, 1.1547005383792515]).reshape(4, 1)
# c4 = xi^2 at the points of gauss-2x2
_S0_c4 = np.array([0.3333333333333333, 0.3333333333333333, 0.3333333333333333, 0.3333333333333333]).reshape(4, 1)
# c5 = -eta^2/4 - eta*xi/2 + eta/4 + xi/2 at the points of gauss-2x2
_S0_c5 = np.array([-0.6830127018922193, 0.22767090063073978, -0.06100423396407311, 0.18301270189221933]).reshape(4, 1)
# c6 = -eta*xi/2 + eta/2 - xi^2/4 + xi/4 at the points of gauss-2x2
_S0_c6 = np.array([-0.6830127018922193, -0.06100423396407311, 0.22767090063073978, 0.18301270189221933]).reshape(4, 1)
# c7 = eta^2/4 - eta*xi/2 - eta/4 + xi/2 at the points of gauss-2x2
_S0_c7 = np.array([-0.22767090063073978, 0.6830127018922193, -0.18301270189221933, 0.06100423396407311]).reshape(4, 1)
# c8 = eta*xi/2 + eta/2 - xi^2/4 - xi/4 at the points of gauss-2x2
_S0_c8 = np.array([-0.06100423396407311, -0.6830127018922193, 0.18301270189221933, 0.22767090063073978]).reshape(4, 1)
# c9 = eta^2/4 + eta*xi/2 + eta/4 + xi/2 at the points of gauss-2x2
_S0_c9 = np.array([-0.18301270189221933, 0.06100423396407311, -0.22767090063073978, 0.6830127018922193]).reshape(4, 1)
# c10 = eta*xi/2 + eta/2 + xi^2/4 + xi/4 at the points of gauss-2x2
_S0_c10 = np.array([-0.18301270189221933, -0.22767090063073978, 0.06100423396407311, 0.6830127018922193]).reshape(4, 1)
# c11 = -eta^2/4 + eta*xi/2 - eta/4 + xi/2 at the points of gauss-2x2
_S0_c11 = np.array([-0.06100423396407311, 0.18301270189221933, -0.6830127018922193, 0.22767090063073978]).reshape(4, 1)
# c12 = -eta*xi/2 + eta/2 + xi^2/4 - xi/4 at the points of gauss-2x2
_S0_c12 = np.array([-0.22767090063073978, -0.18301270189221933, 0.6830127018922193, 0.06100423396407311]).reshape(4, 1)
# c13 = eta*xi - xi at the points of gauss-2x2
_S0_c13 = np.array([0.9106836025229591, -0.9106836025229591, 0.24401693585629244, -0.24401693585629244]).reshape(4, 1)
# c14 = xi^2/2 - 1/2 at the points of gauss-2x2
_S0_c14 = np.array([-0.3333333333333333, -0.3333333333333333, -0.3333333333333333, -0.3333333333333333]).reshape(4, 1)
# c15 = 1/2 - eta^2/2 at the points of gauss-2x2
_S0_c15 = np.array([0.3333333333333333, 0.3333333333333333, 0.3333333333333333, 0.3333333333333333]).reshape(4, 1)
# c16 = -eta*xi - eta at the points of gauss-2x2
_S0_c16 = np.array([0.24401693585629244, 0.9106836025229591, -0.24401693585629244, -0.9106836025229591]).reshape(4, 1)
# c17 = -eta*xi - xi at the points of gauss-2x2
_S0_c17 = np.array([0.24401693585629244, -0.24401693585629244, 0.9106836025229591, -0.9106836025229591]).reshape(4, 1)
# c18 = 1/2 - xi^2/2 at the points of gauss-2x2
_S0_c18 = np.array([0.3333333333333333, 0.3333333333333333, 0.3333333333333333, 0.3333333333333333]).reshape(4, 1)
# c19 = eta^2/2 - 1/2 at the points of gauss-2x2
_S0_c19 = np.array([-0.3333333333333333, -0.3333333333333333, -0.3333333333333333, -0.3333333333333333]).reshape(4, 1)
# c20 = eta*xi - eta at the points of gauss-2x2
_S0_c20 = np.array([0.9106836025229591, 0.24401693585629244, -0.9106836025229591, -0.24401693585629244]).reshape(4, 1)
# eta = eta at the points of gauss-2x2
_S0_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# w = the point weight at the points of gauss-2x2
_S0_w = np.array([1.0, 1.0, 1.0, 1.0]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_S0_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# c0 = eta^2 at the points of gauss-3x3
_V0_c0 = np.array([0.6, 0.6, 0.6, 0.0, 0.0, 0.0, 0.6, 0.6, 0.6]).reshape(9, 1)
# c1 = 2*xi at the points of gauss-3x3
_V0_c1 = np.array([-1.5491933384829668, 0.0, 1.5491933384829668, -1.5491933384829668, 0.0, 1.5491933384829668, -1.5491933384829668, 0.0, 1.5491933384829668]).reshape(9, 1)
# c2 = 2*eta*xi at the points of gauss-3x3
_V0_c2 = np.array([1.2, 0.0, -1.2, 0.0, 0.0, 0.0, -1.2, 0.0, 1.2]).reshape(9, 1)
# c3 = 2*eta at the points of gauss-3x3
_V0_c3 = np.array([-1.5491933384829668, -1.5491933384829668, -1.5491933384829668, 0.0, 0.0, 0.0, 1.5491933384829668, 1.5491933384829668, 1.5491933384829668]).reshape(9, 1)
# c4 = xi^2 at the points of gauss-3x3
_V0_c4 = np.array([0.6, 0.0, 0.6, 0.6, 0.0, 0.6, 0.6, 0.0, 0.6]).reshape(9, 1)
# eta = eta at the points of gauss-3x3
_V0_eta = np.array([-0.7745966692414834, -0.7745966692414834, -0.7745966692414834, 0.0, 0.0, 0.0, 0.7745966692414834, 0.7745966692414834, 0.7745966692414834]).reshape(9, 1)
# xi = xi at the points of gauss-3x3
_V0_xi = np.array([-0.7745966692414834, 0.0, 0.7745966692414834, -0.7745966692414834, 0.0, 0.7745966692414834, -0.7745966692414834, 0.0, 0.7745966692414834]).reshape(9, 1)
# c0 = eta^2 at the points of gauss-3x3
_R1_c0 = np.array([0.6, 0.6, 0.6, 0.0, 0.0, 0.0, 0.6, 0.6, 0.6]).reshape(9, 1)
# c1 = 2*xi at the points of gauss-3x3
_R1_c1 = np.array([-1.5491933384829668, 0.0, 1.5491933384829668, -1.5491933384829668, 0.0, 1.5491933384829668, -1.5491933384829668, 0.0, 1.5491933384829668]).reshape(9, 1)
# c2 = 2*eta*xi at the points of gauss-3x3
_R1_c2 = np.array([1.2, 0.0, -1.2, 0.0, 0.0, 0.0, -1.2, 0.0, 1.2]).reshape(9, 1)
# c3 = 2*eta at the points of gauss-3x3
_R1_c3 = np.array([-1.5491933384829668, -1.5491933384829668, -1.5491933384829668, 0.0, 0.0, 0.0, 1.5491933384829668, 1.5491933384829668, 1.5491933384829668]).reshape(9, 1)
# c4 = xi^2 at the points of gauss-3x3
_R1_c4 = np.array([0.6, 0.0, 0.6, 0.6, 0.0, 0.6, 0.6, 0.0, 0.6]).reshape(9, 1)
# c5 = -eta^2/4 - eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
_R1_c5 = np.array([-1.0309475019311125, -0.3436491673103708, 0.3436491673103708, -0.3872983346207417, 0.0, 0.3872983346207417, -0.04364916731037084, 0.04364916731037084, 0.13094750193111254]).reshape(9, 1)
# c6 = -eta*xi/2 + eta/2 - xi^2/4 + xi/4 at the points of gauss-3x3
_R1_c6 = np.array([-1.0309475019311125, -0.3872983346207417, -0.04364916731037084, -0.3436491673103708, 0.0, 0.04364916731037084, 0.3436491673103708, 0.3872983346207417, 0.13094750193111254]).reshape(9, 1)
# c7 = eta^2/4 - eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
_R1_c7 = np.array([-0.3436491673103708, 0.3436491673103708, 1.0309475019311125, -0.3872983346207417, 0.0, 0.3872983346207417, -0.13094750193111254, -0.04364916731037084, 0.04364916731037084]).reshape(9, 1)
# c8 = eta*xi/2 + eta/2 - xi^2/4 - xi/4 at the points of gauss-3x3
_R1_c8 = np.array([-0.04364916731037084, -0.3872983346207417, -1.0309475019311125, 0.04364916731037084, 0.0, -0.3436491673103708, 0.13094750193111254, 0.3872983346207417, 0.3436491673103708]).reshape(9, 1)
# c9 = eta^2/4 + eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
_R1_c9 = np.array([-0.13094750193111254, -0.04364916731037084, 0.04364916731037084, -0.3872983346207417, 0.0, 0.3872983346207417, -0.3436491673103708, 0.3436491673103708, 1.0309475019311125]).reshape(9, 1)
# c10 = eta*xi/2 + eta/2 + xi^2/4 + xi/4 at the points of gauss-3x3
_R1_c10 = np.array([-0.13094750193111254, -0.3872983346207417, -0.3436491673103708, -0.04364916731037084, 0.0, 0.3436491673103708, 0.04364916731037084, 0.3872983346207417, 1.0309475019311125]).reshape(9, 1)
# c11 = -eta^2/4 + eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
_R1_c11 = np.array([-0.04364916731037084, 0.04364916731037084, 0.13094750193111254, -0.3872983346207417, 0.0, 0.3872983346207417, -1.0309475019311125, -0.3436491673103708, 0.3436491673103708]).reshape(9, 1)
# c12 = -eta*xi/2 + eta/2 + xi^2/4 - xi/4 at the points of gauss-3x3
_R1_c12 = np.array([-0.3436491673103708, -0.3872983346207417, -0.13094750193111254, 0.3436491673103708, 0.0, -0.04364916731037084, 1.0309475019311125, 0.3872983346207417, 0.04364916731037084]).reshape(9, 1)
# c13 = eta*xi - xi at the points of gauss-3x3
_R1_c13 = np.array([1.3745966692414833, 0.0, -1.3745966692414833, 0.7745966692414834, 0.0, -0.7745966692414834, 0.17459666924148337, 0.0, -0.17459666924148337]).reshape(9, 1)
# c14 = xi^2/2 - 1/2 at the points of gauss-3x3
_R1_c14 = np.array([-0.2, -0.5, -0.2, -0.2, -0.5, -0.2, -0.2, -0.5, -0.2]).reshape(9, 1)
# c15 = 1/2 - eta^2/2 at the points of gauss-3x3
_R1_c15 = np.array([0.2, 0.2, 0.2, 0.5, 0.5, 0.5, 0.2, 0.2, 0.2]).reshape(9, 1)
# c16 = -eta*xi - eta at the points of gauss-3x3
_R1_c16 = np.array([0.17459666924148337, 0.7745966692414834, 1.3745966692414833, 0.0, 0.0, 0.0, -0.17459666924148337, -0.7745966692414834, -1.3745966692414833]).reshape(9, 1)
# c17 = -eta*xi - xi at the points of gauss-3x3
_R1_c17 = np.array([0.17459666924148337, 0.0, -0.17459666924148337, 0.7745966692414834, 0.0, -0.7745966692414834, 1.3745966692414833, 0.0, -1.3745966692414833]).reshape(9, 1)
# c18 = 1/2 - xi^2/2 at the points of gauss-3x3
_R1_c18 = np.array([0.2, 0.5, 0.2, 0.2, 0.5, 0.2, 0.2, 0.5, 0.2]).reshape(9, 1)
# c19 = eta^2/2 - 1/2 at the points of gauss-3x3
_R1_c19 = np.array([-0.2, -0.2, -0.2, -0.5, -0.5, -0.5, -0.2, -0.2, -0.2]).reshape(9, 1)
# c20 = eta*xi - eta at the points of gauss-3x3
_R1_c20 = np.array([1.3745966692414833, 0.7745966692414834, 0.17459666924148337, 0.0, 0.0, 0.0, -1.3745966692414833, -0.7745966692414834, -0.17459666924148337]).reshape(9, 1)
# eta = eta at the points of gauss-3x3
_R1_eta = np.array([-0.7745966692414834, -0.7745966692414834, -0.7745966692414834, 0.0, 0.0, 0.0, 0.7745966692414834, 0.7745966692414834, 0.7745966692414834]).reshape(9, 1)
# xi = xi at the points of gauss-3x3
_R1_xi = np.array([-0.7745966692414834, 0.0, 0.7745966692414834, -0.7745966692414834, 0.0, 0.7745966692414834, -0.7745966692414834, 0.0, 0.7745966692414834]).reshape(9, 1)


def _psum(a, npts):
    a = np.asarray(a)
    return a.sum(axis=0) if a.ndim == 2 else npts * a


def _pmin(a):
    a = np.asarray(a)
    return a.min(axis=0) if a.ndim == 2 else a


def _material(E, nu, t):
    m0 = E/(1.0 - nu*nu)
    m1 = E*nu/(1.0 - nu*nu)
    m2 = E*(0.5 - 0.5*nu)/(1.0 - nu*nu)
    return (E, nu, t, m0, m1, m2,)


def _stiffness_chunk(X, mat, buf):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    x4 = X[6]
    y4 = X[7]
    x5 = X[8]
    y5 = X[9]
    x6 = X[10]
    y6 = X[11]
    x7 = X[12]
    y7 = X[13]
    x8 = X[14]
    y8 = X[15]
    t = mat[2]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_1 = 0.5*x7 - 0.5*x5
    gx_0_2 = -0.5*x6 - 0.5*x8 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = 0.5*x6 - 0.5*x8
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gx_1_2 = 0.5*x8 - 0.5*x6 - 0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_2_0 = -0.5*x5 - 0.5*x7 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_2_1 = 0.5*x5 - 0.5*x7 - 0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gy_0_1 = 0.5*y7 - 0.5*y5
    gy_0_2 = -0.5*y6 - 0.5*y8 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = 0.5*y6 - 0.5*y8
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    gy_1_2 = 0.5*y8 - 0.5*y6 - 0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_2_0 = -0.5*y5 - 0.5*y7 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_2_1 = 0.5*y5 - 0.5*y7 - 0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    # gauss-2x2: all 4 points at once
    c0 = _S0_c0
    c1 = _S0_c1
    c2 = _S0_c2
    c3 = _S0_c3
    c4 = _S0_c4
    c5 = _S0_c5
    c6 = _S0_c6
    c7 = _S0_c7
    c8 = _S0_c8
    c9 = _S0_c9
    c10 = _S0_c10
    c11 = _S0_c11
    c12 = _S0_c12
    c13 = _S0_c13
    c14 = _S0_c14
    c15 = _S0_c15
    c16 = _S0_c16
    c17 = _S0_c17
    c18 = _S0_c18
    c19 = _S0_c19
    c20 = _S0_c20
    eta = _S0_eta
    w = _S0_w
    xi = _S0_xi
    J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
    J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
    J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c5 + Ji01*c6
    dNdy1 = Ji10*c5 + Ji11*c6
    dNdx2 = Ji00*c7 + Ji01*c8
    dNdy2 = Ji10*c7 + Ji11*c8
    dNdx3 = Ji00*c9 + Ji01*c10
    dNdy3 = Ji10*c9 + Ji11*c10
    dNdx4 = Ji00*c11 + Ji01*c12
    dNdy4 = Ji10*c11 + Ji11*c12
    dNdx5 = Ji00*c13 + Ji01*c14
    dNdy5 = Ji10*c13 + Ji11*c14
    dNdx6 = Ji00*c15 + Ji01*c16
    dNdy6 = Ji10*c15 + Ji11*c16
    dNdx7 = Ji00*c17 + Ji01*c18
    dNdy7 = Ji10*c17 + Ji11*c18
    dNdx8 = Ji00*c19 + Ji01*c20
    dNdy8 = Ji10*c19 + Ji11*c20
    sc0 = detJ*t*w
    s1 = m0*sc0
    s2 = m1*sc0
    s3 = m2*sc0
    T4 = dNdx1*s1
    T6 = dNdy1*s3
    T7 = dNdy1*s2
    T8 = dNdy1*s1
    T9 = dNdx1*s3
    T10 = dNdx2*s1
    T11 = dNdx2*s2
    T12 = dNdy2*s3
    T13 = dNdy2*s2
    T14 = dNdy2*s1
    T15 = dNdx2*s3
    T16 = dNdx3*s1
    T17 = dNdx3*s2
    T18 = dNdy3*s3
    T19 = dNdy3*s2
    T20 = dNdy3*s1
    T21 = dNdx3*s3
    T22 = dNdx4*s1
    T23 = dNdx4*s2
    T24 = dNdy4*s3
    T25 = dNdy4*s2
    T26 = dNdy4*s1
    T27 = dNdx4*s3
    T28 = dNdx5*s1
    T29 = dNdx5*s2
    T30 = dNdy5*s3
    T31 = dNdy5*s2
    T32 = dNdy5*s1
    T33 = dNdx5*s3
    T34 = dNdx6*s1
    T35 = dNdx6*s2
    T36 = dNdy6*s3
    T37 = dNdy6*s2
    T38 = dNdy6*s1
    T39 = dNdx6*s3
    T40 = dNdx7*s1
    T41 = dNdx7*s2
    T42 = dNdy7*s3
    T43 = dNdy7*s2
    T44 = dNdy7*s1
    T45 = dNdx7*s3
    T46 = dNdx8*s1
    T47 = dNdx8*s2
    T48 = dNdy8*s3
    T49 = dNdy8*s2
    T50 = dNdy8*s1
    T51 = dNdx8*s3
    K_0_0 = _psum(T4*dNdx1 + T6*dNdy1, 4)
    K_0_1 = _psum(T7*dNdx1 + T9*dNdy1, 4)
    K_0_2 = _psum(T10*dNdx1 + T12*dNdy1, 4)
    K_0_3 = _psum(T13*dNdx1 + T15*dNdy1, 4)
    K_0_4 = _psum(T16*dNdx1 + T18*dNdy1, 4)
    K_0_5 = _psum(T19*dNdx1 + T21*dNdy1, 4)
    K_0_6 = _psum(T22*dNdx1 + T24*dNdy1, 4)
    K_0_7 = _psum(T25*dNdx1 + T27*dNdy1, 4)
    K_0_8 = _psum(T28*dNdx1 + T30*dNdy1, 4)
    K_0_9 = _psum(T31*dNdx1 + T33*dNdy1, 4)
    K_0_10 = _psum(T34*dNdx1 + T36*dNdy1, 4)
    K_0_11 = _psum(T37*dNdx1 + T39*dNdy1, 4)
    K_0_12 = _psum(T40*dNdx1 + T42*dNdy1, 4)
    K_0_13 = _psum(T43*dNdx1 + T45*dNdy1, 4)
    K_0_14 = _psum(T46*dNdx1 + T48*dNdy1, 4)
    K_0_15 = _psum(T49*dNdx1 + T51*dNdy1, 4)
    K_1_1 = _psum(T8*dNdy1 + T9*dNdx1, 4)
    K_1_2 = _psum(T11*dNdy1 + T12*dNdx1, 4)
    K_1_3 = _psum(T14*dNdy1 + T15*dNdx1, 4)
    K_1_4 = _psum(T17*dNdy1 + T18*dNdx1, 4)
    K_1_5 = _psum(T20*dNdy1 + T21*dNdx1, 4)
    K_1_6 = _psum(T23*dNdy1 + T24*dNdx1, 4)
    K_1_7 = _psum(T26*dNdy1 + T27*dNdx1, 4)
    K_1_8 = _psum(T29*dNdy1 + T30*dNdx1, 4)
    K_1_9 = _psum(T32*dNdy1 + T33*dNdx1, 4)
    K_1_10 = _psum(T35*dNdy1 + T36*dNdx1, 4)
    K_1_11 = _psum(T38*dNdy1 + T39*dNdx1, 4)
    K_1_12 = _psum(T41*dNdy1 + T42*dNdx1, 4)
    K_1_13 = _psum(T44*dNdy1 + T45*dNdx1, 4)
    K_1_14 = _psum(T47*dNdy1 + T48*dNdx1, 4)
    K_1_15 = _psum(T50*dNdy1 + T51*dNdx1, 4)
    K_2_2 = _psum(T10*dNdx2 + T12*dNdy2, 4)
    K_2_3 = _psum(T13*dNdx2 + T15*dNdy2, 4)
    K_2_4 = _psum(T16*dNdx2 + T18*dNdy2, 4)
    K_2_5 = _psum(T19*dNdx2 + T21*dNdy2, 4)
    K_2_6 = _psum(T22*dNdx2 + T24*dNdy2, 4)
    K_2_7 = _psum(T25*dNdx2 + T27*dNdy2, 4)
    K_2_8 = _psum(T28*dNdx2 + T30*dNdy2, 4)
    K_2_9 = _psum(T31*dNdx2 + T33*dNdy2, 4)
    K_2_10 = _psum(T34*dNdx2 + T36*dNdy2, 4)
    K_2_11 = _psum(T37*dNdx2 + T39*dNdy2, 4)
    K_2_12 = _psum(T40*dNdx2 + T42*dNdy2, 4)
    K_2_13 = _psum(T43*dNdx2 + T45*dNdy2, 4)
    K_2_14 = _psum(T46*dNdx2 + T48*dNdy2, 4)
    K_2_15 = _psum(T49*dNdx2 + T51*dNdy2, 4)
    K_3_3 = _psum(T14*dNdy2 + T15*dNdx2, 4)
    K_3_4 = _psum(T17*dNdy2 + T18*dNdx2, 4)
    K_3_5 = _psum(T20*dNdy2 + T21*dNdx2, 4)
    K_3_6 = _psum(T23*dNdy2 + T24*dNdx2, 4)
    K_3_7 = _psum(T26*dNdy2 + T27*dNdx2, 4)
    K_3_8 = _psum(T29*dNdy2 + T30*dNdx2, 4)
    K_3_9 = _psum(T32*dNdy2 + T33*dNdx2, 4)
    K_3_10 = _psum(T35*dNdy2 + T36*dNdx2, 4)
    K_3_11 = _psum(T38*dNdy2 + T39*dNdx2, 4)
    K_3_12 = _psum(T41*dNdy2 + T42*dNdx2, 4)
    K_3_13 = _psum(T44*dNdy2 + T45*dNdx2, 4)
    K_3_14 = _psum(T47*dNdy2 + T48*dNdx2, 4)
    K_3_15 = _psum(T50*dNdy2 + T51*dNdx2, 4)
    K_4_4 = _psum(T16*dNdx3 + T18*dNdy3, 4)
    K_4_5 = _psum(T19*dNdx3 + T21*dNdy3, 4)
    K_4_6 = _psum(T22*dNdx3 + T24*dNdy3, 4)
    K_4_7 = _psum(T25*dNdx3 + T27*dNdy3, 4)
    K_4_8 = _psum(T28*dNdx3 + T30*dNdy3, 4)
    K_4_9 = _psum(T31*dNdx3 + T33*dNdy3, 4)
    K_4_10 = _psum(T34*dNdx3 + T36*dNdy3, 4)
    K_4_11 = _psum(T37*dNdx3 + T39*dNdy3, 4)
    K_4_12 = _psum(T40*dNdx3 + T42*dNdy3, 4)
    K_4_13 = _psum(T43*dNdx3 + T45*dNdy3, 4)
    K_4_14 = _psum(T46*dNdx3 + T48*dNdy3, 4)
    K_4_15 = _psum(T49*dNdx3 + T51*dNdy3, 4)
    K_5_5 = _psum(T20*dNdy3 + T21*dNdx3, 4)
    K_5_6 = _psum(T23*dNdy3 + T24*dNdx3, 4)
    K_5_7 = _psum(T26*dNdy3 + T27*dNdx3, 4)
    K_5_8 = _psum(T29*dNdy3 + T30*dNdx3, 4)
    K_5_9 = _psum(T32*dNdy3 + T33*dNdx3, 4)
    K_5_10 = _psum(T35*dNdy3 + T36*dNdx3, 4)
    K_5_11 = _psum(T38*dNdy3 + T39*dNdx3, 4)
    K_5_12 = _psum(T41*dNdy3 + T42*dNdx3, 4)
    K_5_13 = _psum(T44*dNdy3 + T45*dNdx3, 4)
    K_5_14 = _psum(T47*dNdy3 + T48*dNdx3, 4)
    K_5_15 = _psum(T50*dNdy3 + T51*dNdx3, 4)
    K_6_6 = _psum(T22*dNdx4 + T24*dNdy4, 4)
    K_6_7 = _psum(T25*dNdx4 + T27*dNdy4, 4)
    K_6_8 = _psum(T28*dNdx4 + T30*dNdy4, 4)
    K_6_9 = _psum(T31*dNdx4 + T33*dNdy4, 4)
    K_6_10 = _psum(T34*dNdx4 + T36*dNdy4, 4)
    K_6_11 = _psum(T37*dNdx4 + T39*dNdy4, 4)
    K_6_12 = _psum(T40*dNdx4 + T42*dNdy4, 4)
    K_6_13 = _psum(T43*dNdx4 + T45*dNdy4, 4)
    K_6_14 = _psum(T46*dNdx4 + T48*dNdy4, 4)
    K_6_15 = _psum(T49*dNdx4 + T51*dNdy4, 4)
    K_7_7 = _psum(T26*dNdy4 + T27*dNdx4, 4)
    K_7_8 = _psum(T29*dNdy4 + T30*dNdx4, 4)
    K_7_9 = _psum(T32*dNdy4 + T33*dNdx4, 4)
    K_7_10 = _psum(T35*dNdy4 + T36*dNdx4, 4)
    K_7_11 = _psum(T38*dNdy4 + T39*dNdx4, 4)
    K_7_12 = _psum(T41*dNdy4 + T42*dNdx4, 4)
    K_7_13 = _psum(T44*dNdy4 + T45*dNdx4, 4)
    K_7_14 = _psum(T47*dNdy4 + T48*dNdx4, 4)
    K_7_15 = _psum(T50*dNdy4 + T51*dNdx4, 4)
    K_8_8 = _psum(T28*dNdx5 + T30*dNdy5, 4)
    K_8_9 = _psum(T31*dNdx5 + T33*dNdy5, 4)
    K_8_10 = _psum(T34*dNdx5 + T36*dNdy5, 4)
    K_8_11 = _psum(T37*dNdx5 + T39*dNdy5, 4)
    K_8_12 = _psum(T40*dNdx5 + T42*dNdy5, 4)
    K_8_13 = _psum(T43*dNdx5 + T45*dNdy5, 4)
    K_8_14 = _psum(T46*dNdx5 + T48*dNdy5, 4)
    K_8_15 = _psum(T49*dNdx5 + T51*dNdy5, 4)
    K_9_9 = _psum(T32*dNdy5 + T33*dNdx5, 4)
    K_9_10 = _psum(T35*dNdy5 + T36*dNdx5, 4)
    K_9_11 = _psum(T38*dNdy5 + T39*dNdx5, 4)
    K_9_12 = _psum(T41*dNdy5 + T42*dNdx5, 4)
    K_9_13 = _psum(T44*dNdy5 + T45*dNdx5, 4)
    K_9_14 = _psum(T47*dNdy5 + T48*dNdx5, 4)
    K_9_15 = _psum(T50*dNdy5 + T51*dNdx5, 4)
    K_10_10 = _psum(T34*dNdx6 + T36*dNdy6, 4)
    K_10_11 = _psum(T37*dNdx6 + T39*dNdy6, 4)
    K_10_12 = _psum(T40*dNdx6 + T42*dNdy6, 4)
    K_10_13 = _psum(T43*dNdx6 + T45*dNdy6, 4)
    K_10_14 = _psum(T46*dNdx6 + T48*dNdy6, 4)
    K_10_15 = _psum(T49*dNdx6 + T51*dNdy6, 4)
    K_11_11 = _psum(T38*dNdy6 + T39*dNdx6, 4)
    K_11_12 = _psum(T41*dNdy6 + T42*dNdx6, 4)
    K_11_13 = _psum(T44*dNdy6 + T45*dNdx6, 4)
    K_11_14 = _psum(T47*dNdy6 + T48*dNdx6, 4)
    K_11_15 = _psum(T50*dNdy6 + T51*dNdx6, 4)
    K_12_12 = _psum(T40*dNdx7 + T42*dNdy7, 4)
    K_12_13 = _psum(T43*dNdx7 + T45*dNdy7, 4)
    K_12_14 = _psum(T46*dNdx7 + T48*dNdy7, 4)
    K_12_15 = _psum(T49*dNdx7 + T51*dNdy7, 4)
    K_13_13 = _psum(T44*dNdy7 + T45*dNdx7, 4)
    K_13_14 = _psum(T47*dNdy7 + T48*dNdx7, 4)
    K_13_15 = _psum(T50*dNdy7 + T51*dNdx7, 4)
    K_14_14 = _psum(T46*dNdx8 + T48*dNdy8, 4)
    K_14_15 = _psum(T49*dNdx8 + T51*dNdy8, 4)
    K_15_15 = _psum(T50*dNdy8 + T51*dNdx8, 4)
    buf[0] = K_0_0
    buf[1] = K_0_1
    buf[2] = K_0_2
    buf[3] = K_0_3
    buf[4] = K_0_4
    buf[5] = K_0_5
    buf[6] = K_0_6
    buf[7] = K_0_7
    buf[8] = K_0_8
    buf[9] = K_0_9
    buf[10] = K_0_10
    buf[11] = K_0_11
    buf[12] = K_0_12
    buf[13] = K_0_13
    buf[14] = K_0_14
    buf[15] = K_0_15
    buf[16] = buf[1]
    buf[17] = K_1_1
    buf[18] = K_1_2
    buf[19] = K_1_3
    buf[20] = K_1_4
    buf[21] = K_1_5
    buf[22] = K_1_6
    buf[23] = K_1_7
    buf[24] = K_1_8
    buf[25] = K_1_9
    buf[26] = K_1_10
    buf[27] = K_1_11
    buf[28] = K_1_12
    buf[29] = K_1_13
    buf[30] = K_1_14
    buf[31] = K_1_15
    buf[32] = buf[2]
    buf[33] = buf[18]
    buf[34] = K_2_2
    buf[35] = K_2_3
    buf[36] = K_2_4
    buf[37] = K_2_5
    buf[38] = K_2_6
    buf[39] = K_2_7
    buf[40] = K_2_8
    buf[41] = K_2_9
    buf[42] = K_2_10
    buf[43] = K_2_11
    buf[44] = K_2_12
    buf[45] = K_2_13
    buf[46] = K_2_14
    buf[47] = K_2_15
    buf[48] = buf[3]
    buf[49] = buf[19]
    buf[50] = buf[35]
    buf[51] = K_3_3
    buf[52] = K_3_4
    buf[53] = K_3_5
    buf[54] = K_3_6
    buf[55] = K_3_7
    buf[56] = K_3_8
    buf[57] = K_3_9
    buf[58] = K_3_10
    buf[59] = K_3_11
    buf[60] = K_3_12
    buf[61] = K_3_13
    buf[62] = K_3_14
    buf[63] = K_3_15
    buf[64] = buf[4]
    buf[65] = buf[20]
    buf[66] = buf[36]
    buf[67] = buf[52]
    buf[68] = K_4_4
    buf[69] = K_4_5
    buf[70] = K_4_6
    buf[71] = K_4_7
    buf[72] = K_4_8
    buf[73] = K_4_9
    buf[74] = K_4_10
    buf[75] = K_4_11
    buf[76] = K_4_12
    buf[77] = K_4_13
    buf[78] = K_4_14
    buf[79] = K_4_15
    buf[80] = buf[5]
    buf[81] = buf[21]
    buf[82] = buf[37]
    buf[83] = buf[53]
    buf[84] = buf[69]
    buf[85] = K_5_5
    buf[86] = K_5_6
    buf[87] = K_5_7
    buf[88] = K_5_8
    buf[89] = K_5_9
    buf[90] = K_5_10
    buf[91] = K_5_11
    buf[92] = K_5_12
    buf[93] = K_5_13
    buf[94] = K_5_14
    buf[95] = K_5_15
    buf[96] = buf[6]
    buf[97] = buf[22]
    buf[98] = buf[38]
    buf[99] = buf[54]
    buf[100] = buf[70]
    buf[101] = buf[86]
    buf[102] = K_6_6
    buf[103] = K_6_7
    buf[104] = K_6_8
    buf[105] = K_6_9
    buf[106] = K_6_10
    buf[107] = K_6_11
    buf[108] = K_6_12
    buf[109] = K_6_13
    buf[110] = K_6_14
    buf[111] = K_6_15
    buf[112] = buf[7]
    buf[113] = buf[23]
    buf[114] = buf[39]
    buf[115] = buf[55]
    buf[116] = buf[71]
    buf[117] = buf[87]
    buf[118] = buf[103]
    buf[119] = K_7_7
    buf[120] = K_7_8
    buf[121] = K_7_9
    buf[122] = K_7_10
    buf[123] = K_7_11
    buf[124] = K_7_12
    buf[125] = K_7_13
    buf[126] = K_7_14
    buf[127] = K_7_15
    buf[128] = buf[8]
    buf[129] = buf[24]
    buf[130] = buf[40]
    buf[131] = buf[56]
    buf[132] = buf[72]
    buf[133] = buf[88]
    buf[134] = buf[104]
    buf[135] = buf[120]
    buf[136] = K_8_8
    buf[137] = K_8_9
    buf[138] = K_8_10
    buf[139] = K_8_11
    buf[140] = K_8_12
    buf[141] = K_8_13
    buf[142] = K_8_14
    buf[143] = K_8_15
    buf[144] = buf[9]
    buf[145] = buf[25]
    buf[146] = buf[41]
    buf[147] = buf[57]
    buf[148] = buf[73]
    buf[149] = buf[89]
    buf[150] = buf[105]
    buf[151] = buf[121]
    buf[152] = buf[137]
    buf[153] = K_9_9
    buf[154] = K_9_10
    buf[155] = K_9_11
    buf[156] = K_9_12
    buf[157] = K_9_13
    buf[158] = K_9_14
    buf[159] = K_9_15
    buf[160] = buf[10]
    buf[161] = buf[26]
    buf[162] = buf[42]
    buf[163] = buf[58]
    buf[164] = buf[74]
    buf[165] = buf[90]
    buf[166] = buf[106]
    buf[167] = buf[122]
    buf[168] = buf[138]
    buf[169] = buf[154]
    buf[170] = K_10_10
    buf[171] = K_10_11
    buf[172] = K_10_12
    buf[173] = K_10_13
    buf[174] = K_10_14
    buf[175] = K_10_15
    buf[176] = buf[11]
    buf[177] = buf[27]
    buf[178] = buf[43]
    buf[179] = buf[59]
    buf[180] = buf[75]
    buf[181] = buf[91]
    buf[182] = buf[107]
    buf[183] = buf[123]
    buf[184] = buf[139]
    buf[185] = buf[155]
    buf[186] = buf[171]
    buf[187] = K_11_11
    buf[188] = K_11_12
    buf[189] = K_11_13
    buf[190] = K_11_14
    buf[191] = K_11_15
    buf[192] = buf[12]
    buf[193] = buf[28]
    buf[194] = buf[44]
    buf[195] = buf[60]
    buf[196] = buf[76]
    buf[197] = buf[92]
    buf[198] = buf[108]
    buf[199] = buf[124]
    buf[200] = buf[140]
    buf[201] = buf[156]
    buf[202] = buf[172]
    buf[203] = buf[188]
    buf[204] = K_12_12
    buf[205] = K_12_13
    buf[206] = K_12_14
    buf[207] = K_12_15
    buf[208] = buf[13]
    buf[209] = buf[29]
    buf[210] = buf[45]
    buf[211] = buf[61]
    buf[212] = buf[77]
    buf[213] = buf[93]
    buf[214] = buf[109]
    buf[215] = buf[125]
    buf[216] = buf[141]
    buf[217] = buf[157]
    buf[218] = buf[173]
    buf[219] = buf[189]
    buf[220] = buf[205]
    buf[221] = K_13_13
    buf[222] = K_13_14
    buf[223] = K_13_15
    buf[224] = buf[14]
    buf[225] = buf[30]
    buf[226] = buf[46]
    buf[227] = buf[62]
    buf[228] = buf[78]
    buf[229] = buf[94]
    buf[230] = buf[110]
    buf[231] = buf[126]
    buf[232] = buf[142]
    buf[233] = buf[158]
    buf[234] = buf[174]
    buf[235] = buf[190]
    buf[236] = buf[206]
    buf[237] = buf[222]
    buf[238] = K_14_14
    buf[239] = K_14_15
    buf[240] = buf[15]
    buf[241] = buf[31]
    buf[242] = buf[47]
    buf[243] = buf[63]
    buf[244] = buf[79]
    buf[245] = buf[95]
    buf[246] = buf[111]
    buf[247] = buf[127]
    buf[248] = buf[143]
    buf[249] = buf[159]
    buf[250] = buf[175]
    buf[251] = buf[191]
    buf[252] = buf[207]
    buf[253] = buf[223]
    buf[254] = buf[239]
    buf[255] = K_15_15


def _validity_chunk(X):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    x4 = X[6]
    y4 = X[7]
    x5 = X[8]
    y5 = X[9]
    x6 = X[10]
    y6 = X[11]
    x7 = X[12]
    y7 = X[13]
    x8 = X[14]
    y8 = X[15]
    gx_0_1 = 0.5*x7 - 0.5*x5
    gx_0_2 = -0.5*x6 - 0.5*x8 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = 0.5*x6 - 0.5*x8
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gx_1_2 = 0.5*x8 - 0.5*x6 - 0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_2_0 = -0.5*x5 - 0.5*x7 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_2_1 = 0.5*x5 - 0.5*x7 - 0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gy_0_1 = 0.5*y7 - 0.5*y5
    gy_0_2 = -0.5*y6 - 0.5*y8 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = 0.5*y6 - 0.5*y8
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    gy_1_2 = 0.5*y8 - 0.5*y6 - 0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_2_0 = -0.5*y5 - 0.5*y7 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_2_1 = 0.5*y5 - 0.5*y7 - 0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    # gauss-3x3: all 9 points at once
    c0 = _V0_c0
    c1 = _V0_c1
    c2 = _V0_c2
    c3 = _V0_c3
    c4 = _V0_c4
    eta = _V0_eta
    xi = _V0_xi
    J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
    J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
    J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    dmin = _pmin(detJ)
    detJ_min = dmin
    return detJ_min


def _recovery_chunk(X, U, mat, strain, stress):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    x4 = X[6]
    y4 = X[7]
    x5 = X[8]
    y5 = X[9]
    x6 = X[10]
    y6 = X[11]
    x7 = X[12]
    y7 = X[13]
    x8 = X[14]
    y8 = X[15]
    u1 = U[0]
    u2 = U[1]
    u3 = U[2]
    u4 = U[3]
    u5 = U[4]
    u6 = U[5]
    u7 = U[6]
    u8 = U[7]
    u9 = U[8]
    u10 = U[9]
    u11 = U[10]
    u12 = U[11]
    u13 = U[12]
    u14 = U[13]
    u15 = U[14]
    u16 = U[15]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_1 = 0.5*x7 - 0.5*x5
    gx_0_2 = -0.5*x6 - 0.5*x8 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = 0.5*x6 - 0.5*x8
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gx_1_2 = 0.5*x8 - 0.5*x6 - 0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_2_0 = -0.5*x5 - 0.5*x7 + 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_2_1 = 0.5*x5 - 0.5*x7 - 0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gy_0_1 = 0.5*y7 - 0.5*y5
    gy_0_2 = -0.5*y6 - 0.5*y8 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = 0.5*y6 - 0.5*y8
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    gy_1_2 = 0.5*y8 - 0.5*y6 - 0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_2_0 = -0.5*y5 - 0.5*y7 + 0.25*y1 + 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_2_1 = 0.5*y5 - 0.5*y7 - 0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    # gauss-3x3: all 9 points at once
    c0 = _R1_c0
    c1 = _R1_c1
    c2 = _R1_c2
    c3 = _R1_c3
    c4 = _R1_c4
    c5 = _R1_c5
    c6 = _R1_c6
    c7 = _R1_c7
    c8 = _R1_c8
    c9 = _R1_c9
    c10 = _R1_c10
    c11 = _R1_c11
    c12 = _R1_c12
    c13 = _R1_c13
    c14 = _R1_c14
    c15 = _R1_c15
    c16 = _R1_c16
    c17 = _R1_c17
    c18 = _R1_c18
    c19 = _R1_c19
    c20 = _R1_c20
    eta = _R1_eta
    xi = _R1_xi
    J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
    J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
    J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c5 + Ji01*c6
    dNdy1 = Ji10*c5 + Ji11*c6
    dNdx2 = Ji00*c7 + Ji01*c8
    dNdy2 = Ji10*c7 + Ji11*c8
    dNdx3 = Ji00*c9 + Ji01*c10
    dNdy3 = Ji10*c9 + Ji11*c10
    dNdx4 = Ji00*c11 + Ji01*c12
    dNdy4 = Ji10*c11 + Ji11*c12
    dNdx5 = Ji00*c13 + Ji01*c14
    dNdy5 = Ji10*c13 + Ji11*c14
    dNdx6 = Ji00*c15 + Ji01*c16
    dNdy6 = Ji10*c15 + Ji11*c16
    dNdx7 = Ji00*c17 + Ji01*c18
    dNdy7 = Ji10*c17 + Ji11*c18
    dNdx8 = Ji00*c19 + Ji01*c20
    dNdy8 = Ji10*c19 + Ji11*c20
    eps52 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 + dNdx8*u15
    eps53 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 + dNdy8*u16
    eps54 = (dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 + dNdx8*u16
        + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 + dNdy7*u13 + dNdy8*u15)
    strain[0] = eps52
    strain[1] = eps53
    strain[2] = eps54
    stress[0] = eps52*m0 + eps53*m1
    stress[1] = eps52*m1 + eps53*m0
    stress[2] = eps54*m2


def _coords(xy):
    xy = np.asarray(xy, dtype=np.float64)
    if xy.ndim != 3 or xy.shape[1:] != (NODES, 2):
        raise ValueError(f"xy must have shape (n, {NODES}, 2); got {xy.shape}")
    return xy


def stiffness(xy, E, nu, t, out=None):
    """Element stiffness matrices, shape (n, NDOF, NDOF)."""
    xy = _coords(xy)
    n = xy.shape[0]
    if out is None:
        out = np.empty((n, NDOF, NDOF))
    elif (not isinstance(out, np.ndarray) or out.shape != (n, NDOF, NDOF) or out.dtype != np.float64
          or not out.flags.c_contiguous or not out.flags.writeable):
        raise ValueError(f"out must be a writeable, C-contiguous float64 array of shape ({n}, {NDOF}, {NDOF})")
    mat = _material(float(E), float(nu), float(t))
    for s in range(0, n, _CHUNK):
        e = min(n, s + _CHUNK)
        X = np.ascontiguousarray(xy[s:e].reshape(e - s, 2 * NODES).T)
        buf = np.empty((NDOF * NDOF, e - s))
        _stiffness_chunk(X, mat, buf)
        out[s:e] = buf.T.reshape(e - s, NDOF, NDOF)
    return out


def validity(xy):
    """Minimum det J over the points of the full rule, shape (n,)."""
    xy = _coords(xy)
    n = xy.shape[0]
    out = np.empty(n)
    for s in range(0, n, _CHUNK):
        e = min(n, s + _CHUNK)
        X = np.ascontiguousarray(xy[s:e].reshape(e - s, 2 * NODES).T)
        out[s:e] = np.broadcast_to(_validity_chunk(X), (e - s,))
    return out


def recovery(xy, u, E, nu):
    """Strain and stress at the points of the full rule, each of shape (n, NPOINTS, NSTRAIN)."""
    xy = _coords(xy)
    n = xy.shape[0]
    u = np.asarray(u, dtype=np.float64)
    if u.shape != (n, NDOF):
        raise ValueError(f"u must have shape ({n}, {NDOF}); got {u.shape}")
    strain = np.empty((n, NPOINTS, NSTRAIN))
    stress = np.empty((n, NPOINTS, NSTRAIN))
    mat = _material(float(E), float(nu), 1.0)
    for s in range(0, n, _CHUNK):
        e = min(n, s + _CHUNK)
        X = np.ascontiguousarray(xy[s:e].reshape(e - s, 2 * NODES).T)
        U = np.ascontiguousarray(u[s:e].T)
        bs = np.empty((NSTRAIN, NPOINTS, e - s))
        bt = np.empty((NSTRAIN, NPOINTS, e - s))
        _recovery_chunk(X, U, mat, bs, bt)
        strain[s:e] = bs.transpose(2, 1, 0)
        stress[s:e] = bt.transpose(2, 1, 0)
    return strain, stress
