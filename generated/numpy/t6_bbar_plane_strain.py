"""
derive generated kernel: T6 bbar plane-strain

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      T6, 6 nodes, 12 DOFs interleaved u1, v1, u2, v2, ...
formulation  B-bar, dilatation projected on a linear pressure {1, xi, eta}: K_dev + kappa g^T
             M_p^-1 g [Hughes (1980); Nagtegaal, Parks & Rice (1974)]
integration  B^T D_dev B: triangle-d2 (3 points); B^T m pi (g): triangle-d2 (3 points); -pi^T pi
             / kappa (-M_p / kappa): triangle-d2 (3 points)
internal     3 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
             (unrolled factorisation of K_aa, no pivoting)
flops        stiffness 2419, validity 114, recovery 1101 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 6, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior)
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu < 0.5), scalar
  t       thickness t (the out-of-plane thickness)
  u       nodal displacements for recovery, shape (n, 12), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 12, 12), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 3
          internal unknowns are condensed
  detJ_min validity: min det J over the points of triangle-d2, shape (n,); <= 0 means an
           inverted or degenerate element
  strain  recovery: strain at the 3 points of triangle-d2, shape (n, 3, 3), Voigt [eps_xx,
          eps_yy, gamma_xy] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 3, 3), [sigma_xx, sigma_yy,
          tau_xy]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel T6 --variant bbar --state plane-strain --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "T6"
VARIANT = "bbar"
STATE = "plane-strain"
NODES = 6
NDOF = 12
NSTRAIN = 3
NPOINTS = 3
GENERATOR = "derive.codegen 1.0"
_CHUNK = 2048

# point constants (shape-function derivatives, monomials, weights) per rule, (points, 1)
# c0 = 2*xi at the points of triangle-d2
_S0_c0 = np.array([0.3333333333333333, 1.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c1 = 2*eta at the points of triangle-d2
_S0_c1 = np.array([0.3333333333333333, 0.3333333333333333, 1.3333333333333333]).reshape(3, 1)
# c2 = 4*eta + 4*xi - 3 at the points of triangle-d2
_S0_c2 = np.array([-1.6666666666666667, 0.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c3 = 4*xi - 1 at the points of triangle-d2
_S0_c3 = np.array([-0.3333333333333333, 1.6666666666666667, -0.3333333333333333]).reshape(3, 1)
# c4 = 4*eta - 1 at the points of triangle-d2
_S0_c4 = np.array([-0.3333333333333333, -0.3333333333333333, 1.6666666666666667]).reshape(3, 1)
# c5 = -4*eta - 8*xi + 4 at the points of triangle-d2
_S0_c5 = np.array([2.0, -2.0, 0.0]).reshape(3, 1)
# c6 = -4*xi at the points of triangle-d2
_S0_c6 = np.array([-0.6666666666666666, -2.6666666666666665, -0.6666666666666666]).reshape(3, 1)
# c7 = 4*eta at the points of triangle-d2
_S0_c7 = np.array([0.6666666666666666, 0.6666666666666666, 2.6666666666666665]).reshape(3, 1)
# c8 = 4*xi at the points of triangle-d2
_S0_c8 = np.array([0.6666666666666666, 2.6666666666666665, 0.6666666666666666]).reshape(3, 1)
# c9 = -4*eta at the points of triangle-d2
_S0_c9 = np.array([-0.6666666666666666, -0.6666666666666666, -2.6666666666666665]).reshape(3, 1)
# c10 = -8*eta - 4*xi + 4 at the points of triangle-d2
_S0_c10 = np.array([2.0, 0.0, -2.0]).reshape(3, 1)
# eta = eta at the points of triangle-d2
_S0_eta = np.array([0.16666666666666666, 0.16666666666666666, 0.6666666666666666]).reshape(3, 1)
# w = the point weight at the points of triangle-d2
_S0_w = np.array([0.16666666666666666, 0.16666666666666666, 0.16666666666666666]).reshape(3, 1)
# xi = xi at the points of triangle-d2
_S0_xi = np.array([0.16666666666666666, 0.6666666666666666, 0.16666666666666666]).reshape(3, 1)
# c0 = 2*xi at the points of triangle-d2
_V0_c0 = np.array([0.3333333333333333, 1.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c1 = 2*eta at the points of triangle-d2
_V0_c1 = np.array([0.3333333333333333, 0.3333333333333333, 1.3333333333333333]).reshape(3, 1)
# eta = eta at the points of triangle-d2
_V0_eta = np.array([0.16666666666666666, 0.16666666666666666, 0.6666666666666666]).reshape(3, 1)
# xi = xi at the points of triangle-d2
_V0_xi = np.array([0.16666666666666666, 0.6666666666666666, 0.16666666666666666]).reshape(3, 1)
# c0 = 2*xi at the points of triangle-d2
_R0_c0 = np.array([0.3333333333333333, 1.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c1 = 2*eta at the points of triangle-d2
_R0_c1 = np.array([0.3333333333333333, 0.3333333333333333, 1.3333333333333333]).reshape(3, 1)
# c2 = 4*eta + 4*xi - 3 at the points of triangle-d2
_R0_c2 = np.array([-1.6666666666666667, 0.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c3 = 4*xi - 1 at the points of triangle-d2
_R0_c3 = np.array([-0.3333333333333333, 1.6666666666666667, -0.3333333333333333]).reshape(3, 1)
# c4 = 4*eta - 1 at the points of triangle-d2
_R0_c4 = np.array([-0.3333333333333333, -0.3333333333333333, 1.6666666666666667]).reshape(3, 1)
# c5 = -4*eta - 8*xi + 4 at the points of triangle-d2
_R0_c5 = np.array([2.0, -2.0, 0.0]).reshape(3, 1)
# c6 = -4*xi at the points of triangle-d2
_R0_c6 = np.array([-0.6666666666666666, -2.6666666666666665, -0.6666666666666666]).reshape(3, 1)
# c7 = 4*eta at the points of triangle-d2
_R0_c7 = np.array([0.6666666666666666, 0.6666666666666666, 2.6666666666666665]).reshape(3, 1)
# c8 = 4*xi at the points of triangle-d2
_R0_c8 = np.array([0.6666666666666666, 2.6666666666666665, 0.6666666666666666]).reshape(3, 1)
# c9 = -4*eta at the points of triangle-d2
_R0_c9 = np.array([-0.6666666666666666, -0.6666666666666666, -2.6666666666666665]).reshape(3, 1)
# c10 = -8*eta - 4*xi + 4 at the points of triangle-d2
_R0_c10 = np.array([2.0, 0.0, -2.0]).reshape(3, 1)
# eta = eta at the points of triangle-d2
_R0_eta = np.array([0.16666666666666666, 0.16666666666666666, 0.6666666666666666]).reshape(3, 1)
# w = the point weight at the points of triangle-d2
_R0_w = np.array([0.16666666666666666, 0.16666666666666666, 0.16666666666666666]).reshape(3, 1)
# xi = xi at the points of triangle-d2
_R0_xi = np.array([0.16666666666666666, 0.6666666666666666, 0.16666666666666666]).reshape(3, 1)
# c0 = 2*xi at the points of triangle-d2
_R2_c0 = np.array([0.3333333333333333, 1.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c1 = 2*eta at the points of triangle-d2
_R2_c1 = np.array([0.3333333333333333, 0.3333333333333333, 1.3333333333333333]).reshape(3, 1)
# c2 = 4*eta + 4*xi - 3 at the points of triangle-d2
_R2_c2 = np.array([-1.6666666666666667, 0.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c3 = 4*xi - 1 at the points of triangle-d2
_R2_c3 = np.array([-0.3333333333333333, 1.6666666666666667, -0.3333333333333333]).reshape(3, 1)
# c4 = 4*eta - 1 at the points of triangle-d2
_R2_c4 = np.array([-0.3333333333333333, -0.3333333333333333, 1.6666666666666667]).reshape(3, 1)
# c5 = -4*eta - 8*xi + 4 at the points of triangle-d2
_R2_c5 = np.array([2.0, -2.0, 0.0]).reshape(3, 1)
# c6 = -4*xi at the points of triangle-d2
_R2_c6 = np.array([-0.6666666666666666, -2.6666666666666665, -0.6666666666666666]).reshape(3, 1)
# c7 = 4*eta at the points of triangle-d2
_R2_c7 = np.array([0.6666666666666666, 0.6666666666666666, 2.6666666666666665]).reshape(3, 1)
# c8 = 4*xi at the points of triangle-d2
_R2_c8 = np.array([0.6666666666666666, 2.6666666666666665, 0.6666666666666666]).reshape(3, 1)
# c9 = -4*eta at the points of triangle-d2
_R2_c9 = np.array([-0.6666666666666666, -0.6666666666666666, -2.6666666666666665]).reshape(3, 1)
# c10 = -8*eta - 4*xi + 4 at the points of triangle-d2
_R2_c10 = np.array([2.0, 0.0, -2.0]).reshape(3, 1)
# c14 = -xi/2 at the points of triangle-d2
_R2_c14 = np.array([-0.08333333333333333, -0.3333333333333333, -0.08333333333333333]).reshape(3, 1)
# c15 = -eta/2 at the points of triangle-d2
_R2_c15 = np.array([-0.08333333333333333, -0.08333333333333333, -0.3333333333333333]).reshape(3, 1)
# eta = eta at the points of triangle-d2
_R2_eta = np.array([0.16666666666666666, 0.16666666666666666, 0.6666666666666666]).reshape(3, 1)
# xi = xi at the points of triangle-d2
_R2_xi = np.array([0.16666666666666666, 0.6666666666666666, 0.16666666666666666]).reshape(3, 1)


def _psum(a, npts):
    a = np.asarray(a)
    return a.sum(axis=0) if a.ndim == 2 else npts * a


def _pmin(a):
    a = np.asarray(a)
    return a.min(axis=0) if a.ndim == 2 else a


def _material(E, nu, t):
    m0 = 2.0*E/(3.0 + 3.0*nu)
    m1 = -E/(3.0 + 3.0*nu)
    m2 = E/(2.0 + 2.0*nu)
    m3 = (-3.0 + 6.0*nu)/E
    m4 = -0.5*(-3.0 + 6.0*nu)/E
    m5 = E*(1.0 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
    m6 = E*nu/((1.0 + nu)*(1.0 - 2.0*nu))
    m7 = E*(0.5 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
    return (E, nu, t, m0, m1, m2, m3, m4, m5, m6, m7,)


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
    t = mat[2]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    m3 = mat[6]
    gx_0_1 = -x3 - 3.0*x1 + 4.0*x6
    gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3
    gx_1_0 = -x2 - 3.0*x1 + 4.0*x4
    gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5
    gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2
    gy_0_1 = -y3 - 3.0*y1 + 4.0*y6
    gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3
    gy_1_0 = -y2 - 3.0*y1 + 4.0*y4
    gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5
    gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2
    # triangle-d2: all 3 points at once
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
    eta = _S0_eta
    w = _S0_w
    xi = _S0_xi
    J00 = gx_1_0 + c0*gx_2_0 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_2_0 + eta*gy_1_1
    J10 = gx_0_1 + c1*gx_0_2 + gx_1_1*xi
    J11 = gy_0_1 + c1*gy_0_2 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c2 + Ji01*c2
    dNdy1 = Ji10*c2 + Ji11*c2
    dNdx2 = Ji00*c3
    dNdy2 = Ji10*c3
    dNdx3 = Ji01*c4
    dNdy3 = Ji11*c4
    dNdx4 = Ji00*c5 + Ji01*c6
    dNdy4 = Ji10*c5 + Ji11*c6
    dNdx5 = Ji00*c7 + Ji01*c8
    dNdy5 = Ji10*c7 + Ji11*c8
    dNdx6 = Ji00*c9 + Ji01*c10
    dNdy6 = Ji10*c9 + Ji11*c10
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
    T40 = sc0*xi
    T41 = eta*sc0
    s42 = m3*sc0
    T43 = s42*xi
    T44 = eta*s42
    K_0_0 = _psum(T4*dNdx1 + T6*dNdy1, 3)
    K_0_1 = _psum(T7*dNdx1 + T9*dNdy1, 3)
    K_0_2 = _psum(T10*dNdx1 + T12*dNdy1, 3)
    K_0_3 = _psum(T13*dNdx1 + T15*dNdy1, 3)
    K_0_4 = _psum(T16*dNdx1 + T18*dNdy1, 3)
    K_0_5 = _psum(T19*dNdx1 + T21*dNdy1, 3)
    K_0_6 = _psum(T22*dNdx1 + T24*dNdy1, 3)
    K_0_7 = _psum(T25*dNdx1 + T27*dNdy1, 3)
    K_0_8 = _psum(T28*dNdx1 + T30*dNdy1, 3)
    K_0_9 = _psum(T31*dNdx1 + T33*dNdy1, 3)
    K_0_10 = _psum(T34*dNdx1 + T36*dNdy1, 3)
    K_0_11 = _psum(T37*dNdx1 + T39*dNdy1, 3)
    K_1_1 = _psum(T8*dNdy1 + T9*dNdx1, 3)
    K_1_2 = _psum(T11*dNdy1 + T12*dNdx1, 3)
    K_1_3 = _psum(T14*dNdy1 + T15*dNdx1, 3)
    K_1_4 = _psum(T17*dNdy1 + T18*dNdx1, 3)
    K_1_5 = _psum(T20*dNdy1 + T21*dNdx1, 3)
    K_1_6 = _psum(T23*dNdy1 + T24*dNdx1, 3)
    K_1_7 = _psum(T26*dNdy1 + T27*dNdx1, 3)
    K_1_8 = _psum(T29*dNdy1 + T30*dNdx1, 3)
    K_1_9 = _psum(T32*dNdy1 + T33*dNdx1, 3)
    K_1_10 = _psum(T35*dNdy1 + T36*dNdx1, 3)
    K_1_11 = _psum(T38*dNdy1 + T39*dNdx1, 3)
    K_2_2 = _psum(T10*dNdx2 + T12*dNdy2, 3)
    K_2_3 = _psum(T13*dNdx2 + T15*dNdy2, 3)
    K_2_4 = _psum(T16*dNdx2 + T18*dNdy2, 3)
    K_2_5 = _psum(T19*dNdx2 + T21*dNdy2, 3)
    K_2_6 = _psum(T22*dNdx2 + T24*dNdy2, 3)
    K_2_7 = _psum(T25*dNdx2 + T27*dNdy2, 3)
    K_2_8 = _psum(T28*dNdx2 + T30*dNdy2, 3)
    K_2_9 = _psum(T31*dNdx2 + T33*dNdy2, 3)
    K_2_10 = _psum(T34*dNdx2 + T36*dNdy2, 3)
    K_2_11 = _psum(T37*dNdx2 + T39*dNdy2, 3)
    K_3_3 = _psum(T14*dNdy2 + T15*dNdx2, 3)
    K_3_4 = _psum(T17*dNdy2 + T18*dNdx2, 3)
    K_3_5 = _psum(T20*dNdy2 + T21*dNdx2, 3)
    K_3_6 = _psum(T23*dNdy2 + T24*dNdx2, 3)
    K_3_7 = _psum(T26*dNdy2 + T27*dNdx2, 3)
    K_3_8 = _psum(T29*dNdy2 + T30*dNdx2, 3)
    K_3_9 = _psum(T32*dNdy2 + T33*dNdx2, 3)
    K_3_10 = _psum(T35*dNdy2 + T36*dNdx2, 3)
    K_3_11 = _psum(T38*dNdy2 + T39*dNdx2, 3)
    K_4_4 = _psum(T16*dNdx3 + T18*dNdy3, 3)
    K_4_5 = _psum(T19*dNdx3 + T21*dNdy3, 3)
    K_4_6 = _psum(T22*dNdx3 + T24*dNdy3, 3)
    K_4_7 = _psum(T25*dNdx3 + T27*dNdy3, 3)
    K_4_8 = _psum(T28*dNdx3 + T30*dNdy3, 3)
    K_4_9 = _psum(T31*dNdx3 + T33*dNdy3, 3)
    K_4_10 = _psum(T34*dNdx3 + T36*dNdy3, 3)
    K_4_11 = _psum(T37*dNdx3 + T39*dNdy3, 3)
    K_5_5 = _psum(T20*dNdy3 + T21*dNdx3, 3)
    K_5_6 = _psum(T23*dNdy3 + T24*dNdx3, 3)
    K_5_7 = _psum(T26*dNdy3 + T27*dNdx3, 3)
    K_5_8 = _psum(T29*dNdy3 + T30*dNdx3, 3)
    K_5_9 = _psum(T32*dNdy3 + T33*dNdx3, 3)
    K_5_10 = _psum(T35*dNdy3 + T36*dNdx3, 3)
    K_5_11 = _psum(T38*dNdy3 + T39*dNdx3, 3)
    K_6_6 = _psum(T22*dNdx4 + T24*dNdy4, 3)
    K_6_7 = _psum(T25*dNdx4 + T27*dNdy4, 3)
    K_6_8 = _psum(T28*dNdx4 + T30*dNdy4, 3)
    K_6_9 = _psum(T31*dNdx4 + T33*dNdy4, 3)
    K_6_10 = _psum(T34*dNdx4 + T36*dNdy4, 3)
    K_6_11 = _psum(T37*dNdx4 + T39*dNdy4, 3)
    K_7_7 = _psum(T26*dNdy4 + T27*dNdx4, 3)
    K_7_8 = _psum(T29*dNdy4 + T30*dNdx4, 3)
    K_7_9 = _psum(T32*dNdy4 + T33*dNdx4, 3)
    K_7_10 = _psum(T35*dNdy4 + T36*dNdx4, 3)
    K_7_11 = _psum(T38*dNdy4 + T39*dNdx4, 3)
    K_8_8 = _psum(T28*dNdx5 + T30*dNdy5, 3)
    K_8_9 = _psum(T31*dNdx5 + T33*dNdy5, 3)
    K_8_10 = _psum(T34*dNdx5 + T36*dNdy5, 3)
    K_8_11 = _psum(T37*dNdx5 + T39*dNdy5, 3)
    K_9_9 = _psum(T32*dNdy5 + T33*dNdx5, 3)
    K_9_10 = _psum(T35*dNdy5 + T36*dNdx5, 3)
    K_9_11 = _psum(T38*dNdy5 + T39*dNdx5, 3)
    K_10_10 = _psum(T34*dNdx6 + T36*dNdy6, 3)
    K_10_11 = _psum(T37*dNdx6 + T39*dNdy6, 3)
    K_11_11 = _psum(T38*dNdy6 + T39*dNdx6, 3)
    A_0_0 = _psum(dNdx1*sc0, 3)
    A_0_1 = _psum(T40*dNdx1, 3)
    A_0_2 = _psum(T41*dNdx1, 3)
    A_1_0 = _psum(dNdy1*sc0, 3)
    A_1_1 = _psum(T40*dNdy1, 3)
    A_1_2 = _psum(T41*dNdy1, 3)
    A_2_0 = _psum(dNdx2*sc0, 3)
    A_2_1 = _psum(T40*dNdx2, 3)
    A_2_2 = _psum(T41*dNdx2, 3)
    A_3_0 = _psum(dNdy2*sc0, 3)
    A_3_1 = _psum(T40*dNdy2, 3)
    A_3_2 = _psum(T41*dNdy2, 3)
    A_4_0 = _psum(dNdx3*sc0, 3)
    A_4_1 = _psum(T40*dNdx3, 3)
    A_4_2 = _psum(T41*dNdx3, 3)
    A_5_0 = _psum(dNdy3*sc0, 3)
    A_5_1 = _psum(T40*dNdy3, 3)
    A_5_2 = _psum(T41*dNdy3, 3)
    A_6_0 = _psum(dNdx4*sc0, 3)
    A_6_1 = _psum(T40*dNdx4, 3)
    A_6_2 = _psum(T41*dNdx4, 3)
    A_7_0 = _psum(dNdy4*sc0, 3)
    A_7_1 = _psum(T40*dNdy4, 3)
    A_7_2 = _psum(T41*dNdy4, 3)
    A_8_0 = _psum(dNdx5*sc0, 3)
    A_8_1 = _psum(T40*dNdx5, 3)
    A_8_2 = _psum(T41*dNdx5, 3)
    A_9_0 = _psum(dNdy5*sc0, 3)
    A_9_1 = _psum(T40*dNdy5, 3)
    A_9_2 = _psum(T41*dNdy5, 3)
    A_10_0 = _psum(dNdx6*sc0, 3)
    A_10_1 = _psum(T40*dNdx6, 3)
    A_10_2 = _psum(T41*dNdx6, 3)
    A_11_0 = _psum(dNdy6*sc0, 3)
    A_11_1 = _psum(T40*dNdy6, 3)
    A_11_2 = _psum(T41*dNdy6, 3)
    H_0_0 = _psum(s42, 3)
    H_0_1 = _psum(T43, 3)
    H_0_2 = _psum(T44, 3)
    H_1_1 = _psum(T43*xi, 3)
    H_1_2 = _psum(T44*xi, 3)
    H_2_2 = _psum(T44*eta, 3)
    # static condensation of the internal unknowns
    cid0 = 1.0/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0/cd2
    cy1_0 = A_0_1 - A_0_0*cL1_0
    cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0
    cy1_1 = A_1_1 - A_1_0*cL1_0
    cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1
    cy1_2 = A_2_1 - A_2_0*cL1_0
    cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2
    cy1_3 = A_3_1 - A_3_0*cL1_0
    cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3
    cy1_4 = A_4_1 - A_4_0*cL1_0
    cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4
    cy1_5 = A_5_1 - A_5_0*cL1_0
    cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5
    cy1_6 = A_6_1 - A_6_0*cL1_0
    cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6
    cy1_7 = A_7_1 - A_7_0*cL1_0
    cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7
    cy1_8 = A_8_1 - A_8_0*cL1_0
    cy2_8 = A_8_2 - A_8_0*cL2_0 - cL2_1*cy1_8
    cy1_9 = A_9_1 - A_9_0*cL1_0
    cy2_9 = A_9_2 - A_9_0*cL2_0 - cL2_1*cy1_9
    cy1_10 = A_10_1 - A_10_0*cL1_0
    cy2_10 = A_10_2 - A_10_0*cL2_0 - cL2_1*cy1_10
    cy1_11 = A_11_1 - A_11_0*cL1_0
    cy2_11 = A_11_2 - A_11_0*cL2_0 - cL2_1*cy1_11
    cz0_0 = A_0_0*cid0
    cz1_0 = cid1*cy1_0
    cz2_0 = cid2*cy2_0
    cz0_1 = A_1_0*cid0
    cz1_1 = cid1*cy1_1
    cz2_1 = cid2*cy2_1
    cz0_2 = A_2_0*cid0
    cz1_2 = cid1*cy1_2
    cz2_2 = cid2*cy2_2
    cz0_3 = A_3_0*cid0
    cz1_3 = cid1*cy1_3
    cz2_3 = cid2*cy2_3
    cz0_4 = A_4_0*cid0
    cz1_4 = cid1*cy1_4
    cz2_4 = cid2*cy2_4
    cz0_5 = A_5_0*cid0
    cz1_5 = cid1*cy1_5
    cz2_5 = cid2*cy2_5
    cz0_6 = A_6_0*cid0
    cz1_6 = cid1*cy1_6
    cz2_6 = cid2*cy2_6
    cz0_7 = A_7_0*cid0
    cz1_7 = cid1*cy1_7
    cz2_7 = cid2*cy2_7
    cz0_8 = A_8_0*cid0
    cz1_8 = cid1*cy1_8
    cz2_8 = cid2*cy2_8
    cz0_9 = A_9_0*cid0
    cz1_9 = cid1*cy1_9
    cz2_9 = cid2*cy2_9
    cz0_10 = A_10_0*cid0
    cz1_10 = cid1*cy1_10
    cz2_10 = cid2*cy2_10
    cz0_11 = A_11_0*cid0
    cz1_11 = cid1*cy1_11
    cz2_11 = cid2*cy2_11
    buf[0] = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0
    buf[1] = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0
    buf[2] = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0
    buf[3] = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0
    buf[4] = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0
    buf[5] = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0
    buf[6] = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0
    buf[7] = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0
    buf[8] = K_0_8 - A_8_0*cz0_0 - cy1_8*cz1_0 - cy2_8*cz2_0
    buf[9] = K_0_9 - A_9_0*cz0_0 - cy1_9*cz1_0 - cy2_9*cz2_0
    buf[10] = K_0_10 - A_10_0*cz0_0 - cy1_10*cz1_0 - cy2_10*cz2_0
    buf[11] = K_0_11 - A_11_0*cz0_0 - cy1_11*cz1_0 - cy2_11*cz2_0
    buf[12] = buf[1]
    buf[13] = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1
    buf[14] = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1
    buf[15] = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1
    buf[16] = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1
    buf[17] = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1
    buf[18] = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1
    buf[19] = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1
    buf[20] = K_1_8 - A_8_0*cz0_1 - cy1_8*cz1_1 - cy2_8*cz2_1
    buf[21] = K_1_9 - A_9_0*cz0_1 - cy1_9*cz1_1 - cy2_9*cz2_1
    buf[22] = K_1_10 - A_10_0*cz0_1 - cy1_10*cz1_1 - cy2_10*cz2_1
    buf[23] = K_1_11 - A_11_0*cz0_1 - cy1_11*cz1_1 - cy2_11*cz2_1
    buf[24] = buf[2]
    buf[25] = buf[14]
    buf[26] = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2
    buf[27] = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2
    buf[28] = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2
    buf[29] = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2
    buf[30] = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2
    buf[31] = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2
    buf[32] = K_2_8 - A_8_0*cz0_2 - cy1_8*cz1_2 - cy2_8*cz2_2
    buf[33] = K_2_9 - A_9_0*cz0_2 - cy1_9*cz1_2 - cy2_9*cz2_2
    buf[34] = K_2_10 - A_10_0*cz0_2 - cy1_10*cz1_2 - cy2_10*cz2_2
    buf[35] = K_2_11 - A_11_0*cz0_2 - cy1_11*cz1_2 - cy2_11*cz2_2
    buf[36] = buf[3]
    buf[37] = buf[15]
    buf[38] = buf[27]
    buf[39] = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3
    buf[40] = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3
    buf[41] = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3
    buf[42] = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3
    buf[43] = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3
    buf[44] = K_3_8 - A_8_0*cz0_3 - cy1_8*cz1_3 - cy2_8*cz2_3
    buf[45] = K_3_9 - A_9_0*cz0_3 - cy1_9*cz1_3 - cy2_9*cz2_3
    buf[46] = K_3_10 - A_10_0*cz0_3 - cy1_10*cz1_3 - cy2_10*cz2_3
    buf[47] = K_3_11 - A_11_0*cz0_3 - cy1_11*cz1_3 - cy2_11*cz2_3
    buf[48] = buf[4]
    buf[49] = buf[16]
    buf[50] = buf[28]
    buf[51] = buf[40]
    buf[52] = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4
    buf[53] = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4
    buf[54] = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4
    buf[55] = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4
    buf[56] = K_4_8 - A_8_0*cz0_4 - cy1_8*cz1_4 - cy2_8*cz2_4
    buf[57] = K_4_9 - A_9_0*cz0_4 - cy1_9*cz1_4 - cy2_9*cz2_4
    buf[58] = K_4_10 - A_10_0*cz0_4 - cy1_10*cz1_4 - cy2_10*cz2_4
    buf[59] = K_4_11 - A_11_0*cz0_4 - cy1_11*cz1_4 - cy2_11*cz2_4
    buf[60] = buf[5]
    buf[61] = buf[17]
    buf[62] = buf[29]
    buf[63] = buf[41]
    buf[64] = buf[53]
    buf[65] = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5
    buf[66] = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5
    buf[67] = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5
    buf[68] = K_5_8 - A_8_0*cz0_5 - cy1_8*cz1_5 - cy2_8*cz2_5
    buf[69] = K_5_9 - A_9_0*cz0_5 - cy1_9*cz1_5 - cy2_9*cz2_5
    buf[70] = K_5_10 - A_10_0*cz0_5 - cy1_10*cz1_5 - cy2_10*cz2_5
    buf[71] = K_5_11 - A_11_0*cz0_5 - cy1_11*cz1_5 - cy2_11*cz2_5
    buf[72] = buf[6]
    buf[73] = buf[18]
    buf[74] = buf[30]
    buf[75] = buf[42]
    buf[76] = buf[54]
    buf[77] = buf[66]
    buf[78] = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6
    buf[79] = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6
    buf[80] = K_6_8 - A_8_0*cz0_6 - cy1_8*cz1_6 - cy2_8*cz2_6
    buf[81] = K_6_9 - A_9_0*cz0_6 - cy1_9*cz1_6 - cy2_9*cz2_6
    buf[82] = K_6_10 - A_10_0*cz0_6 - cy1_10*cz1_6 - cy2_10*cz2_6
    buf[83] = K_6_11 - A_11_0*cz0_6 - cy1_11*cz1_6 - cy2_11*cz2_6
    buf[84] = buf[7]
    buf[85] = buf[19]
    buf[86] = buf[31]
    buf[87] = buf[43]
    buf[88] = buf[55]
    buf[89] = buf[67]
    buf[90] = buf[79]
    buf[91] = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7
    buf[92] = K_7_8 - A_8_0*cz0_7 - cy1_8*cz1_7 - cy2_8*cz2_7
    buf[93] = K_7_9 - A_9_0*cz0_7 - cy1_9*cz1_7 - cy2_9*cz2_7
    buf[94] = K_7_10 - A_10_0*cz0_7 - cy1_10*cz1_7 - cy2_10*cz2_7
    buf[95] = K_7_11 - A_11_0*cz0_7 - cy1_11*cz1_7 - cy2_11*cz2_7
    buf[96] = buf[8]
    buf[97] = buf[20]
    buf[98] = buf[32]
    buf[99] = buf[44]
    buf[100] = buf[56]
    buf[101] = buf[68]
    buf[102] = buf[80]
    buf[103] = buf[92]
    buf[104] = K_8_8 - A_8_0*cz0_8 - cy1_8*cz1_8 - cy2_8*cz2_8
    buf[105] = K_8_9 - A_9_0*cz0_8 - cy1_9*cz1_8 - cy2_9*cz2_8
    buf[106] = K_8_10 - A_10_0*cz0_8 - cy1_10*cz1_8 - cy2_10*cz2_8
    buf[107] = K_8_11 - A_11_0*cz0_8 - cy1_11*cz1_8 - cy2_11*cz2_8
    buf[108] = buf[9]
    buf[109] = buf[21]
    buf[110] = buf[33]
    buf[111] = buf[45]
    buf[112] = buf[57]
    buf[113] = buf[69]
    buf[114] = buf[81]
    buf[115] = buf[93]
    buf[116] = buf[105]
    buf[117] = K_9_9 - A_9_0*cz0_9 - cy1_9*cz1_9 - cy2_9*cz2_9
    buf[118] = K_9_10 - A_10_0*cz0_9 - cy1_10*cz1_9 - cy2_10*cz2_9
    buf[119] = K_9_11 - A_11_0*cz0_9 - cy1_11*cz1_9 - cy2_11*cz2_9
    buf[120] = buf[10]
    buf[121] = buf[22]
    buf[122] = buf[34]
    buf[123] = buf[46]
    buf[124] = buf[58]
    buf[125] = buf[70]
    buf[126] = buf[82]
    buf[127] = buf[94]
    buf[128] = buf[106]
    buf[129] = buf[118]
    buf[130] = K_10_10 - A_10_0*cz0_10 - cy1_10*cz1_10 - cy2_10*cz2_10
    buf[131] = K_10_11 - A_11_0*cz0_10 - cy1_11*cz1_10 - cy2_11*cz2_10
    buf[132] = buf[11]
    buf[133] = buf[23]
    buf[134] = buf[35]
    buf[135] = buf[47]
    buf[136] = buf[59]
    buf[137] = buf[71]
    buf[138] = buf[83]
    buf[139] = buf[95]
    buf[140] = buf[107]
    buf[141] = buf[119]
    buf[142] = buf[131]
    buf[143] = K_11_11 - A_11_0*cz0_11 - cy1_11*cz1_11 - cy2_11*cz2_11


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
    gx_0_1 = -x3 - 3.0*x1 + 4.0*x6
    gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3
    gx_1_0 = -x2 - 3.0*x1 + 4.0*x4
    gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5
    gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2
    gy_0_1 = -y3 - 3.0*y1 + 4.0*y6
    gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3
    gy_1_0 = -y2 - 3.0*y1 + 4.0*y4
    gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5
    gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2
    # triangle-d2: all 3 points at once
    c0 = _V0_c0
    c1 = _V0_c1
    eta = _V0_eta
    xi = _V0_xi
    J00 = gx_1_0 + c0*gx_2_0 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_2_0 + eta*gy_1_1
    J10 = gx_0_1 + c1*gx_0_2 + gx_1_1*xi
    J11 = gy_0_1 + c1*gy_0_2 + gy_1_1*xi
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
    t = mat[2]
    m3 = mat[6]
    m4 = mat[7]
    m5 = mat[8]
    m6 = mat[9]
    m7 = mat[10]
    gx_0_1 = -x3 - 3.0*x1 + 4.0*x6
    gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3
    gx_1_0 = -x2 - 3.0*x1 + 4.0*x4
    gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5
    gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2
    gy_0_1 = -y3 - 3.0*y1 + 4.0*y6
    gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3
    gy_1_0 = -y2 - 3.0*y1 + 4.0*y4
    gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5
    gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2
    # triangle-d2: all 3 points at once
    c0 = _R0_c0
    c1 = _R0_c1
    c2 = _R0_c2
    c3 = _R0_c3
    c4 = _R0_c4
    c5 = _R0_c5
    c6 = _R0_c6
    c7 = _R0_c7
    c8 = _R0_c8
    c9 = _R0_c9
    c10 = _R0_c10
    eta = _R0_eta
    w = _R0_w
    xi = _R0_xi
    J00 = gx_1_0 + c0*gx_2_0 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_2_0 + eta*gy_1_1
    J10 = gx_0_1 + c1*gx_0_2 + gx_1_1*xi
    J11 = gy_0_1 + c1*gy_0_2 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c2 + Ji01*c2
    dNdy1 = Ji10*c2 + Ji11*c2
    dNdx2 = Ji00*c3
    dNdy2 = Ji10*c3
    dNdx3 = Ji01*c4
    dNdy3 = Ji11*c4
    dNdx4 = Ji00*c5 + Ji01*c6
    dNdy4 = Ji10*c5 + Ji11*c6
    dNdx5 = Ji00*c7 + Ji01*c8
    dNdy5 = Ji10*c7 + Ji11*c8
    dNdx6 = Ji00*c9 + Ji01*c10
    dNdy6 = Ji10*c9 + Ji11*c10
    sc0 = detJ*t*w
    T40 = sc0*xi
    T41 = eta*sc0
    s42 = m3*sc0
    T43 = s42*xi
    T44 = eta*s42
    A_0_0 = _psum(dNdx1*sc0, 3)
    A_0_1 = _psum(T40*dNdx1, 3)
    A_0_2 = _psum(T41*dNdx1, 3)
    A_1_0 = _psum(dNdy1*sc0, 3)
    A_1_1 = _psum(T40*dNdy1, 3)
    A_1_2 = _psum(T41*dNdy1, 3)
    A_2_0 = _psum(dNdx2*sc0, 3)
    A_2_1 = _psum(T40*dNdx2, 3)
    A_2_2 = _psum(T41*dNdx2, 3)
    A_3_0 = _psum(dNdy2*sc0, 3)
    A_3_1 = _psum(T40*dNdy2, 3)
    A_3_2 = _psum(T41*dNdy2, 3)
    A_4_0 = _psum(dNdx3*sc0, 3)
    A_4_1 = _psum(T40*dNdx3, 3)
    A_4_2 = _psum(T41*dNdx3, 3)
    A_5_0 = _psum(dNdy3*sc0, 3)
    A_5_1 = _psum(T40*dNdy3, 3)
    A_5_2 = _psum(T41*dNdy3, 3)
    A_6_0 = _psum(dNdx4*sc0, 3)
    A_6_1 = _psum(T40*dNdx4, 3)
    A_6_2 = _psum(T41*dNdx4, 3)
    A_7_0 = _psum(dNdy4*sc0, 3)
    A_7_1 = _psum(T40*dNdy4, 3)
    A_7_2 = _psum(T41*dNdy4, 3)
    A_8_0 = _psum(dNdx5*sc0, 3)
    A_8_1 = _psum(T40*dNdx5, 3)
    A_8_2 = _psum(T41*dNdx5, 3)
    A_9_0 = _psum(dNdy5*sc0, 3)
    A_9_1 = _psum(T40*dNdy5, 3)
    A_9_2 = _psum(T41*dNdy5, 3)
    A_10_0 = _psum(dNdx6*sc0, 3)
    A_10_1 = _psum(T40*dNdx6, 3)
    A_10_2 = _psum(T41*dNdx6, 3)
    A_11_0 = _psum(dNdy6*sc0, 3)
    A_11_1 = _psum(T40*dNdy6, 3)
    A_11_2 = _psum(T41*dNdy6, 3)
    H_0_0 = _psum(s42, 3)
    H_0_1 = _psum(T43, 3)
    H_0_2 = _psum(T44, 3)
    H_1_1 = _psum(T43*xi, 3)
    H_1_2 = _psum(T44*xi, 3)
    H_2_2 = _psum(T44*eta, 3)
    # static condensation of the internal unknowns
    cid0 = 1.0/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0/cd2
    cb0 = (-A_0_0*u1 - A_10_0*u11 - A_11_0*u12 - A_1_0*u2 - A_2_0*u3 - A_3_0*u4 - A_4_0*u5 - A_5_0*u6
        - A_6_0*u7 - A_7_0*u8 - A_8_0*u9 - A_9_0*u10)
    cb1 = (-A_0_1*u1 - A_10_1*u11 - A_11_1*u12 - A_1_1*u2 - A_2_1*u3 - A_3_1*u4 - A_4_1*u5 - A_5_1*u6
        - A_6_1*u7 - A_7_1*u8 - A_8_1*u9 - A_9_1*u10)
    cb2 = (-A_0_2*u1 - A_10_2*u11 - A_11_2*u12 - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6
        - A_6_2*u7 - A_7_2*u8 - A_8_2*u9 - A_9_2*u10)
    cy1_0 = cb1 - cL1_0*cb0
    cy2_0 = cb2 - cL2_0*cb0 - cL2_1*cy1_0
    alpha3 = cid2*cy2_0
    alpha2 = cid1*cy1_0 - alpha3*cL2_1
    alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha3*cL2_0
    # triangle-d2: all 3 points at once
    c0 = _R2_c0
    c1 = _R2_c1
    c2 = _R2_c2
    c3 = _R2_c3
    c4 = _R2_c4
    c5 = _R2_c5
    c6 = _R2_c6
    c7 = _R2_c7
    c8 = _R2_c8
    c9 = _R2_c9
    c10 = _R2_c10
    c14 = _R2_c14
    c15 = _R2_c15
    eta = _R2_eta
    xi = _R2_xi
    J00 = gx_1_0 + c0*gx_2_0 + eta*gx_1_1
    J01 = gy_1_0 + c0*gy_2_0 + eta*gy_1_1
    J10 = gx_0_1 + c1*gx_0_2 + gx_1_1*xi
    J11 = gy_0_1 + c1*gy_0_2 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c2 + Ji01*c2
    dNdy1 = Ji10*c2 + Ji11*c2
    dNdx2 = Ji00*c3
    dNdy2 = Ji10*c3
    dNdx3 = Ji01*c4
    dNdy3 = Ji11*c4
    dNdx4 = Ji00*c5 + Ji01*c6
    dNdy4 = Ji10*c5 + Ji11*c6
    dNdx5 = Ji00*c7 + Ji01*c8
    dNdy5 = Ji10*c7 + Ji11*c8
    dNdx6 = Ji00*c9 + Ji01*c10
    dNdy6 = Ji10*c9 + Ji11*c10
    q0 = alpha1*m4
    q1 = alpha2*c14*m3
    q2 = alpha3*c15*m3
    eps45 = (q0 + q1 + q2 + 0.5*dNdx1*u1 + 0.5*dNdx2*u3 + 0.5*dNdx3*u5 + 0.5*dNdx4*u7 + 0.5*dNdx5*u9
        + 0.5*dNdx6*u11 - 0.5*dNdy1*u2 - 0.5*dNdy2*u4 - 0.5*dNdy3*u6 - 0.5*dNdy4*u8 - 0.5*dNdy5*u10
        - 0.5*dNdy6*u12)
    eps46 = (q0 + q1 + q2 + 0.5*dNdy1*u2 + 0.5*dNdy2*u4 + 0.5*dNdy3*u6 + 0.5*dNdy4*u8 + 0.5*dNdy5*u10
        + 0.5*dNdy6*u12 - 0.5*dNdx1*u1 - 0.5*dNdx2*u3 - 0.5*dNdx3*u5 - 0.5*dNdx4*u7 - 0.5*dNdx5*u9
        - 0.5*dNdx6*u11)
    eps47 = (dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1 + dNdy2*u3
        + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11)
    strain[0] = eps45
    strain[1] = eps46
    strain[2] = eps47
    stress[0] = eps45*m5 + eps46*m6
    stress[1] = eps45*m6 + eps46*m5
    stress[2] = eps47*m7


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
