"""
derive generated kernel: Q4 selective plane-strain

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
formulation  selective integration: volumetric part of D with the reduced rule [Doherty, Wilson
             & Taylor (1969); Hughes (1987) Sec. 4.4]
integration  B^T D_dev B: gauss-2x2 (4 points); B^T D_vol B (reduced rule): gauss-1x1 (1 point)
flops        stiffness 987, validity 89, recovery 382 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior)
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu < 0.5), scalar
  t       thickness t (the out-of-plane thickness)
  u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric
  detJ_min validity: min det J over the points of gauss-2x2, shape (n,); <= 0 means an inverted
           or degenerate element
  strain  recovery: strain at the 4 points of gauss-2x2, shape (n, 4, 3), Voigt [eps_xx, eps_yy,
          gamma_xy] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 4, 3), [sigma_xx, sigma_yy,
          tau_xy]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel Q4 --variant selective --state plane-strain --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "Q4"
VARIANT = "selective"
STATE = "plane-strain"
NODES = 4
NDOF = 8
NSTRAIN = 3
NPOINTS = 4
GENERATOR = "derive.codegen 1.0"
_CHUNK = 2048

# point constants (shape-function derivatives, monomials, weights) per rule, (points, 1)
# c0 = eta/4 - 1/4 at the points of gauss-2x2
_S0_c0 = np.array([-0.39433756729740643, -0.39433756729740643, -0.10566243270259355, -0.10566243270259355]).reshape(4, 1)
# c1 = xi/4 - 1/4 at the points of gauss-2x2
_S0_c1 = np.array([-0.39433756729740643, -0.10566243270259355, -0.39433756729740643, -0.10566243270259355]).reshape(4, 1)
# c2 = 1/4 - eta/4 at the points of gauss-2x2
_S0_c2 = np.array([0.39433756729740643, 0.39433756729740643, 0.10566243270259355, 0.10566243270259355]).reshape(4, 1)
# c3 = -xi/4 - 1/4 at the points of gauss-2x2
_S0_c3 = np.array([-0.10566243270259355, -0.39433756729740643, -0.10566243270259355, -0.39433756729740643]).reshape(4, 1)
# c4 = eta/4 + 1/4 at the points of gauss-2x2
_S0_c4 = np.array([0.10566243270259355, 0.10566243270259355, 0.39433756729740643, 0.39433756729740643]).reshape(4, 1)
# c5 = xi/4 + 1/4 at the points of gauss-2x2
_S0_c5 = np.array([0.10566243270259355, 0.39433756729740643, 0.10566243270259355, 0.39433756729740643]).reshape(4, 1)
# c6 = -eta/4 - 1/4 at the points of gauss-2x2
_S0_c6 = np.array([-0.10566243270259355, -0.10566243270259355, -0.39433756729740643, -0.39433756729740643]).reshape(4, 1)
# c7 = 1/4 - xi/4 at the points of gauss-2x2
_S0_c7 = np.array([0.39433756729740643, 0.10566243270259355, 0.39433756729740643, 0.10566243270259355]).reshape(4, 1)
# eta = eta at the points of gauss-2x2
_S0_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# w = the point weight at the points of gauss-2x2
_S0_w = np.array([1.0, 1.0, 1.0, 1.0]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_S0_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# c0 = eta/4 - 1/4 at the points of gauss-1x1
_S1_c0 = np.array([-0.25]).reshape(1, 1)
# c1 = xi/4 - 1/4 at the points of gauss-1x1
_S1_c1 = np.array([-0.25]).reshape(1, 1)
# c2 = 1/4 - eta/4 at the points of gauss-1x1
_S1_c2 = np.array([0.25]).reshape(1, 1)
# c3 = -xi/4 - 1/4 at the points of gauss-1x1
_S1_c3 = np.array([-0.25]).reshape(1, 1)
# c4 = eta/4 + 1/4 at the points of gauss-1x1
_S1_c4 = np.array([0.25]).reshape(1, 1)
# c5 = xi/4 + 1/4 at the points of gauss-1x1
_S1_c5 = np.array([0.25]).reshape(1, 1)
# c6 = -eta/4 - 1/4 at the points of gauss-1x1
_S1_c6 = np.array([-0.25]).reshape(1, 1)
# c7 = 1/4 - xi/4 at the points of gauss-1x1
_S1_c7 = np.array([0.25]).reshape(1, 1)
# eta = eta at the points of gauss-1x1
_S1_eta = np.array([0.0]).reshape(1, 1)
# w = the point weight at the points of gauss-1x1
_S1_w = np.array([4.0]).reshape(1, 1)
# xi = xi at the points of gauss-1x1
_S1_xi = np.array([0.0]).reshape(1, 1)
# eta = eta at the points of gauss-2x2
_V0_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_V0_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# c0 = eta/4 - 1/4 at the points of gauss-2x2
_R1_c0 = np.array([-0.39433756729740643, -0.39433756729740643, -0.10566243270259355, -0.10566243270259355]).reshape(4, 1)
# c1 = xi/4 - 1/4 at the points of gauss-2x2
_R1_c1 = np.array([-0.39433756729740643, -0.10566243270259355, -0.39433756729740643, -0.10566243270259355]).reshape(4, 1)
# c2 = 1/4 - eta/4 at the points of gauss-2x2
_R1_c2 = np.array([0.39433756729740643, 0.39433756729740643, 0.10566243270259355, 0.10566243270259355]).reshape(4, 1)
# c3 = -xi/4 - 1/4 at the points of gauss-2x2
_R1_c3 = np.array([-0.10566243270259355, -0.39433756729740643, -0.10566243270259355, -0.39433756729740643]).reshape(4, 1)
# c4 = eta/4 + 1/4 at the points of gauss-2x2
_R1_c4 = np.array([0.10566243270259355, 0.10566243270259355, 0.39433756729740643, 0.39433756729740643]).reshape(4, 1)
# c5 = xi/4 + 1/4 at the points of gauss-2x2
_R1_c5 = np.array([0.10566243270259355, 0.39433756729740643, 0.10566243270259355, 0.39433756729740643]).reshape(4, 1)
# c6 = -eta/4 - 1/4 at the points of gauss-2x2
_R1_c6 = np.array([-0.10566243270259355, -0.10566243270259355, -0.39433756729740643, -0.39433756729740643]).reshape(4, 1)
# c7 = 1/4 - xi/4 at the points of gauss-2x2
_R1_c7 = np.array([0.39433756729740643, 0.10566243270259355, 0.39433756729740643, 0.10566243270259355]).reshape(4, 1)
# eta = eta at the points of gauss-2x2
_R1_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_R1_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)


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
    m3 = -E/(-3.0 + 6.0*nu)
    m4 = E*(1.0 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
    m5 = E*nu/((1.0 + nu)*(1.0 - 2.0*nu))
    m6 = E*(0.5 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
    return (E, nu, t, m0, m1, m2, m3, m4, m5, m6,)


def _stiffness_chunk(X, mat, buf):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    x4 = X[6]
    y4 = X[7]
    t = mat[2]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    m3 = mat[6]
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    # gauss-2x2: all 4 points at once
    c0 = _S0_c0
    c1 = _S0_c1
    c2 = _S0_c2
    c3 = _S0_c3
    c4 = _S0_c4
    c5 = _S0_c5
    c6 = _S0_c6
    c7 = _S0_c7
    eta = _S0_eta
    w = _S0_w
    xi = _S0_xi
    J00 = gx_1_0 + eta*gx_1_1
    J01 = gy_1_0 + eta*gy_1_1
    J10 = gx_0_1 + gx_1_1*xi
    J11 = gy_0_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c0 + Ji01*c1
    dNdy1 = Ji10*c0 + Ji11*c1
    dNdx2 = Ji00*c2 + Ji01*c3
    dNdy2 = Ji10*c2 + Ji11*c3
    dNdx3 = Ji00*c4 + Ji01*c5
    dNdy3 = Ji10*c4 + Ji11*c5
    dNdx4 = Ji00*c6 + Ji01*c7
    dNdy4 = Ji10*c6 + Ji11*c7
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
    K_0_0 = _psum(T4*dNdx1 + T6*dNdy1, 4)
    K_0_1 = _psum(T7*dNdx1 + T9*dNdy1, 4)
    K_0_2 = _psum(T10*dNdx1 + T12*dNdy1, 4)
    K_0_3 = _psum(T13*dNdx1 + T15*dNdy1, 4)
    K_0_4 = _psum(T16*dNdx1 + T18*dNdy1, 4)
    K_0_5 = _psum(T19*dNdx1 + T21*dNdy1, 4)
    K_0_6 = _psum(T22*dNdx1 + T24*dNdy1, 4)
    K_0_7 = _psum(T25*dNdx1 + T27*dNdy1, 4)
    K_1_1 = _psum(T8*dNdy1 + T9*dNdx1, 4)
    K_1_2 = _psum(T11*dNdy1 + T12*dNdx1, 4)
    K_1_3 = _psum(T14*dNdy1 + T15*dNdx1, 4)
    K_1_4 = _psum(T17*dNdy1 + T18*dNdx1, 4)
    K_1_5 = _psum(T20*dNdy1 + T21*dNdx1, 4)
    K_1_6 = _psum(T23*dNdy1 + T24*dNdx1, 4)
    K_1_7 = _psum(T26*dNdy1 + T27*dNdx1, 4)
    K_2_2 = _psum(T10*dNdx2 + T12*dNdy2, 4)
    K_2_3 = _psum(T13*dNdx2 + T15*dNdy2, 4)
    K_2_4 = _psum(T16*dNdx2 + T18*dNdy2, 4)
    K_2_5 = _psum(T19*dNdx2 + T21*dNdy2, 4)
    K_2_6 = _psum(T22*dNdx2 + T24*dNdy2, 4)
    K_2_7 = _psum(T25*dNdx2 + T27*dNdy2, 4)
    K_3_3 = _psum(T14*dNdy2 + T15*dNdx2, 4)
    K_3_4 = _psum(T17*dNdy2 + T18*dNdx2, 4)
    K_3_5 = _psum(T20*dNdy2 + T21*dNdx2, 4)
    K_3_6 = _psum(T23*dNdy2 + T24*dNdx2, 4)
    K_3_7 = _psum(T26*dNdy2 + T27*dNdx2, 4)
    K_4_4 = _psum(T16*dNdx3 + T18*dNdy3, 4)
    K_4_5 = _psum(T19*dNdx3 + T21*dNdy3, 4)
    K_4_6 = _psum(T22*dNdx3 + T24*dNdy3, 4)
    K_4_7 = _psum(T25*dNdx3 + T27*dNdy3, 4)
    K_5_5 = _psum(T20*dNdy3 + T21*dNdx3, 4)
    K_5_6 = _psum(T23*dNdy3 + T24*dNdx3, 4)
    K_5_7 = _psum(T26*dNdy3 + T27*dNdx3, 4)
    K_6_6 = _psum(T22*dNdx4 + T24*dNdy4, 4)
    K_6_7 = _psum(T25*dNdx4 + T27*dNdy4, 4)
    K_7_7 = _psum(T26*dNdy4 + T27*dNdx4, 4)
    # gauss-1x1: all 1 points at once
    c0 = _S1_c0
    c1 = _S1_c1
    c2 = _S1_c2
    c3 = _S1_c3
    c4 = _S1_c4
    c5 = _S1_c5
    c6 = _S1_c6
    c7 = _S1_c7
    eta = _S1_eta
    w = _S1_w
    xi = _S1_xi
    J00 = gx_1_0 + eta*gx_1_1
    J01 = gy_1_0 + eta*gy_1_1
    J10 = gx_0_1 + gx_1_1*xi
    J11 = gy_0_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c0 + Ji01*c1
    dNdy1 = Ji10*c0 + Ji11*c1
    dNdx2 = Ji00*c2 + Ji01*c3
    dNdy2 = Ji10*c2 + Ji11*c3
    dNdx3 = Ji00*c4 + Ji01*c5
    dNdy3 = Ji10*c4 + Ji11*c5
    dNdx4 = Ji00*c6 + Ji01*c7
    dNdy4 = Ji10*c6 + Ji11*c7
    sc28 = detJ*t*w
    s29 = m3*sc28
    T30 = dNdx1*s29
    T31 = dNdy1*s29
    T32 = dNdx2*s29
    T33 = dNdy2*s29
    T34 = dNdx3*s29
    T35 = dNdy3*s29
    T36 = dNdx4*s29
    T37 = dNdy4*s29
    K_0_0 = K_0_0 + _psum(T30*dNdx1, 1)
    K_0_1 = K_0_1 + _psum(T31*dNdx1, 1)
    K_0_2 = K_0_2 + _psum(T32*dNdx1, 1)
    K_0_3 = K_0_3 + _psum(T33*dNdx1, 1)
    K_0_4 = K_0_4 + _psum(T34*dNdx1, 1)
    K_0_5 = K_0_5 + _psum(T35*dNdx1, 1)
    K_0_6 = K_0_6 + _psum(T36*dNdx1, 1)
    K_0_7 = K_0_7 + _psum(T37*dNdx1, 1)
    K_1_1 = K_1_1 + _psum(T31*dNdy1, 1)
    K_1_2 = K_1_2 + _psum(T32*dNdy1, 1)
    K_1_3 = K_1_3 + _psum(T33*dNdy1, 1)
    K_1_4 = K_1_4 + _psum(T34*dNdy1, 1)
    K_1_5 = K_1_5 + _psum(T35*dNdy1, 1)
    K_1_6 = K_1_6 + _psum(T36*dNdy1, 1)
    K_1_7 = K_1_7 + _psum(T37*dNdy1, 1)
    K_2_2 = K_2_2 + _psum(T32*dNdx2, 1)
    K_2_3 = K_2_3 + _psum(T33*dNdx2, 1)
    K_2_4 = K_2_4 + _psum(T34*dNdx2, 1)
    K_2_5 = K_2_5 + _psum(T35*dNdx2, 1)
    K_2_6 = K_2_6 + _psum(T36*dNdx2, 1)
    K_2_7 = K_2_7 + _psum(T37*dNdx2, 1)
    K_3_3 = K_3_3 + _psum(T33*dNdy2, 1)
    K_3_4 = K_3_4 + _psum(T34*dNdy2, 1)
    K_3_5 = K_3_5 + _psum(T35*dNdy2, 1)
    K_3_6 = K_3_6 + _psum(T36*dNdy2, 1)
    K_3_7 = K_3_7 + _psum(T37*dNdy2, 1)
    K_4_4 = K_4_4 + _psum(T34*dNdx3, 1)
    K_4_5 = K_4_5 + _psum(T35*dNdx3, 1)
    K_4_6 = K_4_6 + _psum(T36*dNdx3, 1)
    K_4_7 = K_4_7 + _psum(T37*dNdx3, 1)
    K_5_5 = K_5_5 + _psum(T35*dNdy3, 1)
    K_5_6 = K_5_6 + _psum(T36*dNdy3, 1)
    K_5_7 = K_5_7 + _psum(T37*dNdy3, 1)
    K_6_6 = K_6_6 + _psum(T36*dNdx4, 1)
    K_6_7 = K_6_7 + _psum(T37*dNdx4, 1)
    K_7_7 = K_7_7 + _psum(T37*dNdy4, 1)
    buf[0] = K_0_0
    buf[1] = K_0_1
    buf[2] = K_0_2
    buf[3] = K_0_3
    buf[4] = K_0_4
    buf[5] = K_0_5
    buf[6] = K_0_6
    buf[7] = K_0_7
    buf[8] = buf[1]
    buf[9] = K_1_1
    buf[10] = K_1_2
    buf[11] = K_1_3
    buf[12] = K_1_4
    buf[13] = K_1_5
    buf[14] = K_1_6
    buf[15] = K_1_7
    buf[16] = buf[2]
    buf[17] = buf[10]
    buf[18] = K_2_2
    buf[19] = K_2_3
    buf[20] = K_2_4
    buf[21] = K_2_5
    buf[22] = K_2_6
    buf[23] = K_2_7
    buf[24] = buf[3]
    buf[25] = buf[11]
    buf[26] = buf[19]
    buf[27] = K_3_3
    buf[28] = K_3_4
    buf[29] = K_3_5
    buf[30] = K_3_6
    buf[31] = K_3_7
    buf[32] = buf[4]
    buf[33] = buf[12]
    buf[34] = buf[20]
    buf[35] = buf[28]
    buf[36] = K_4_4
    buf[37] = K_4_5
    buf[38] = K_4_6
    buf[39] = K_4_7
    buf[40] = buf[5]
    buf[41] = buf[13]
    buf[42] = buf[21]
    buf[43] = buf[29]
    buf[44] = buf[37]
    buf[45] = K_5_5
    buf[46] = K_5_6
    buf[47] = K_5_7
    buf[48] = buf[6]
    buf[49] = buf[14]
    buf[50] = buf[22]
    buf[51] = buf[30]
    buf[52] = buf[38]
    buf[53] = buf[46]
    buf[54] = K_6_6
    buf[55] = K_6_7
    buf[56] = buf[7]
    buf[57] = buf[15]
    buf[58] = buf[23]
    buf[59] = buf[31]
    buf[60] = buf[39]
    buf[61] = buf[47]
    buf[62] = buf[55]
    buf[63] = K_7_7


def _validity_chunk(X):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    x4 = X[6]
    y4 = X[7]
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    # gauss-2x2: all 4 points at once
    eta = _V0_eta
    xi = _V0_xi
    J00 = gx_1_0 + eta*gx_1_1
    J01 = gy_1_0 + eta*gy_1_1
    J10 = gx_0_1 + gx_1_1*xi
    J11 = gy_0_1 + gy_1_1*xi
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
    u1 = U[0]
    u2 = U[1]
    u3 = U[2]
    u4 = U[3]
    u5 = U[4]
    u6 = U[5]
    u7 = U[6]
    u8 = U[7]
    m4 = mat[7]
    m5 = mat[8]
    m6 = mat[9]
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    # gauss-2x2: all 4 points at once
    c0 = _R1_c0
    c1 = _R1_c1
    c2 = _R1_c2
    c3 = _R1_c3
    c4 = _R1_c4
    c5 = _R1_c5
    c6 = _R1_c6
    c7 = _R1_c7
    eta = _R1_eta
    xi = _R1_xi
    J00 = gx_1_0 + eta*gx_1_1
    J01 = gy_1_0 + eta*gy_1_1
    J10 = gx_0_1 + gx_1_1*xi
    J11 = gy_0_1 + gy_1_1*xi
    detJ = J00*J11 - J01*J10
    idet = 1.0/detJ
    Ji00 = J11*idet
    Ji01 = -J01*idet
    Ji10 = -J10*idet
    Ji11 = J00*idet
    dNdx1 = Ji00*c0 + Ji01*c1
    dNdy1 = Ji10*c0 + Ji11*c1
    dNdx2 = Ji00*c2 + Ji01*c3
    dNdy2 = Ji10*c2 + Ji11*c3
    dNdx3 = Ji00*c4 + Ji01*c5
    dNdy3 = Ji10*c4 + Ji11*c5
    dNdx4 = Ji00*c6 + Ji01*c7
    dNdy4 = Ji10*c6 + Ji11*c7
    eps38 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7
    eps39 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8
    eps40 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
    strain[0] = eps38
    strain[1] = eps39
    strain[2] = eps40
    stress[0] = eps38*m4 + eps39*m5
    stress[1] = eps38*m5 + eps39*m4
    stress[2] = eps40*m6


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
