"""
derive generated kernel: T6 full plane-stress

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      T6, 6 nodes, 12 DOFs interleaved u1, v1, u2, v2, ...
formulation  displacement element, full integration [standard displacement formulation]
integration  B^T D B: triangle-d2 (3 points)
flops        stiffness 1294, validity 114, recovery 384 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 6, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior)
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu <= 0.5), scalar
  t       thickness t (the out-of-plane thickness)
  u       nodal displacements for recovery, shape (n, 12), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 12, 12), DOFs interleaved u1, v1, u2, v2, ...; symmetric
  detJ_min validity: min det J over the points of triangle-d2, shape (n,); <= 0 means an
           inverted or degenerate element
  strain  recovery: strain at the 3 points of triangle-d2, shape (n, 3, 3), Voigt [eps_xx,
          eps_yy, gamma_xy] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 3, 3), [sigma_xx, sigma_yy,
          tau_xy]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel T6 --variant full --state plane-stress --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "T6"
VARIANT = "full"
STATE = "plane-stress"
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
_R1_c0 = np.array([0.3333333333333333, 1.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c1 = 2*eta at the points of triangle-d2
_R1_c1 = np.array([0.3333333333333333, 0.3333333333333333, 1.3333333333333333]).reshape(3, 1)
# c2 = 4*eta + 4*xi - 3 at the points of triangle-d2
_R1_c2 = np.array([-1.6666666666666667, 0.3333333333333333, 0.3333333333333333]).reshape(3, 1)
# c3 = 4*xi - 1 at the points of triangle-d2
_R1_c3 = np.array([-0.3333333333333333, 1.6666666666666667, -0.3333333333333333]).reshape(3, 1)
# c4 = 4*eta - 1 at the points of triangle-d2
_R1_c4 = np.array([-0.3333333333333333, -0.3333333333333333, 1.6666666666666667]).reshape(3, 1)
# c5 = -4*eta - 8*xi + 4 at the points of triangle-d2
_R1_c5 = np.array([2.0, -2.0, 0.0]).reshape(3, 1)
# c6 = -4*xi at the points of triangle-d2
_R1_c6 = np.array([-0.6666666666666666, -2.6666666666666665, -0.6666666666666666]).reshape(3, 1)
# c7 = 4*eta at the points of triangle-d2
_R1_c7 = np.array([0.6666666666666666, 0.6666666666666666, 2.6666666666666665]).reshape(3, 1)
# c8 = 4*xi at the points of triangle-d2
_R1_c8 = np.array([0.6666666666666666, 2.6666666666666665, 0.6666666666666666]).reshape(3, 1)
# c9 = -4*eta at the points of triangle-d2
_R1_c9 = np.array([-0.6666666666666666, -0.6666666666666666, -2.6666666666666665]).reshape(3, 1)
# c10 = -8*eta - 4*xi + 4 at the points of triangle-d2
_R1_c10 = np.array([2.0, 0.0, -2.0]).reshape(3, 1)
# eta = eta at the points of triangle-d2
_R1_eta = np.array([0.16666666666666666, 0.16666666666666666, 0.6666666666666666]).reshape(3, 1)
# xi = xi at the points of triangle-d2
_R1_xi = np.array([0.16666666666666666, 0.6666666666666666, 0.16666666666666666]).reshape(3, 1)


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
    t = mat[2]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
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
    buf[12] = buf[1]
    buf[13] = K_1_1
    buf[14] = K_1_2
    buf[15] = K_1_3
    buf[16] = K_1_4
    buf[17] = K_1_5
    buf[18] = K_1_6
    buf[19] = K_1_7
    buf[20] = K_1_8
    buf[21] = K_1_9
    buf[22] = K_1_10
    buf[23] = K_1_11
    buf[24] = buf[2]
    buf[25] = buf[14]
    buf[26] = K_2_2
    buf[27] = K_2_3
    buf[28] = K_2_4
    buf[29] = K_2_5
    buf[30] = K_2_6
    buf[31] = K_2_7
    buf[32] = K_2_8
    buf[33] = K_2_9
    buf[34] = K_2_10
    buf[35] = K_2_11
    buf[36] = buf[3]
    buf[37] = buf[15]
    buf[38] = buf[27]
    buf[39] = K_3_3
    buf[40] = K_3_4
    buf[41] = K_3_5
    buf[42] = K_3_6
    buf[43] = K_3_7
    buf[44] = K_3_8
    buf[45] = K_3_9
    buf[46] = K_3_10
    buf[47] = K_3_11
    buf[48] = buf[4]
    buf[49] = buf[16]
    buf[50] = buf[28]
    buf[51] = buf[40]
    buf[52] = K_4_4
    buf[53] = K_4_5
    buf[54] = K_4_6
    buf[55] = K_4_7
    buf[56] = K_4_8
    buf[57] = K_4_9
    buf[58] = K_4_10
    buf[59] = K_4_11
    buf[60] = buf[5]
    buf[61] = buf[17]
    buf[62] = buf[29]
    buf[63] = buf[41]
    buf[64] = buf[53]
    buf[65] = K_5_5
    buf[66] = K_5_6
    buf[67] = K_5_7
    buf[68] = K_5_8
    buf[69] = K_5_9
    buf[70] = K_5_10
    buf[71] = K_5_11
    buf[72] = buf[6]
    buf[73] = buf[18]
    buf[74] = buf[30]
    buf[75] = buf[42]
    buf[76] = buf[54]
    buf[77] = buf[66]
    buf[78] = K_6_6
    buf[79] = K_6_7
    buf[80] = K_6_8
    buf[81] = K_6_9
    buf[82] = K_6_10
    buf[83] = K_6_11
    buf[84] = buf[7]
    buf[85] = buf[19]
    buf[86] = buf[31]
    buf[87] = buf[43]
    buf[88] = buf[55]
    buf[89] = buf[67]
    buf[90] = buf[79]
    buf[91] = K_7_7
    buf[92] = K_7_8
    buf[93] = K_7_9
    buf[94] = K_7_10
    buf[95] = K_7_11
    buf[96] = buf[8]
    buf[97] = buf[20]
    buf[98] = buf[32]
    buf[99] = buf[44]
    buf[100] = buf[56]
    buf[101] = buf[68]
    buf[102] = buf[80]
    buf[103] = buf[92]
    buf[104] = K_8_8
    buf[105] = K_8_9
    buf[106] = K_8_10
    buf[107] = K_8_11
    buf[108] = buf[9]
    buf[109] = buf[21]
    buf[110] = buf[33]
    buf[111] = buf[45]
    buf[112] = buf[57]
    buf[113] = buf[69]
    buf[114] = buf[81]
    buf[115] = buf[93]
    buf[116] = buf[105]
    buf[117] = K_9_9
    buf[118] = K_9_10
    buf[119] = K_9_11
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
    buf[130] = K_10_10
    buf[131] = K_10_11
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
    buf[143] = K_11_11


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
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
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
    eta = _R1_eta
    xi = _R1_xi
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
    eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11
    eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12
    eps42 = (dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1 + dNdy2*u3
        + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11)
    strain[0] = eps40
    strain[1] = eps41
    strain[2] = eps42
    stress[0] = eps40*m0 + eps41*m1
    stress[1] = eps40*m1 + eps41*m0
    stress[2] = eps42*m2


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
