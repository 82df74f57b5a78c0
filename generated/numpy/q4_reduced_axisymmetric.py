"""
derive generated kernel: Q4 reduced axisymmetric

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
formulation  displacement element, uniformly reduced integration [standard displacement
             formulation]
integration  B^T D B: gauss-1x1 (1 point)
flops        stiffness 279, validity 89, recovery 485 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior); x is the
          radius r > 0
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu < 0.5), scalar
  t       ignored: axisymmetric kernels integrate over the full ring, thick = 2 pi r
  u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric
  detJ_min validity: min det J over the points of gauss-2x2, shape (n,); <= 0 means an inverted
           or degenerate element
  strain  recovery: strain at the 4 points of gauss-2x2, shape (n, 4, 4), Voigt [eps_rr, eps_zz,
          eps_tt, gamma_rz] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 4, 4), [sigma_rr, sigma_zz,
          sigma_tt, tau_rz]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel Q4 --variant reduced --state axisymmetric --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "Q4"
VARIANT = "reduced"
STATE = "axisymmetric"
NODES = 4
NDOF = 8
NSTRAIN = 4
NPOINTS = 4
GENERATOR = "derive.codegen 1.0"
_CHUNK = 2048

# point constants (shape-function derivatives, monomials, weights) per rule, (points, 1)
# c0 = eta/4 - 1/4 at the points of gauss-1x1
_S0_c0 = np.array([-0.25]).reshape(1, 1)
# c1 = xi/4 - 1/4 at the points of gauss-1x1
_S0_c1 = np.array([-0.25]).reshape(1, 1)
# c2 = 1/4 - eta/4 at the points of gauss-1x1
_S0_c2 = np.array([0.25]).reshape(1, 1)
# c3 = -xi/4 - 1/4 at the points of gauss-1x1
_S0_c3 = np.array([-0.25]).reshape(1, 1)
# c4 = eta/4 + 1/4 at the points of gauss-1x1
_S0_c4 = np.array([0.25]).reshape(1, 1)
# c5 = xi/4 + 1/4 at the points of gauss-1x1
_S0_c5 = np.array([0.25]).reshape(1, 1)
# c6 = -eta/4 - 1/4 at the points of gauss-1x1
_S0_c6 = np.array([-0.25]).reshape(1, 1)
# c7 = 1/4 - xi/4 at the points of gauss-1x1
_S0_c7 = np.array([0.25]).reshape(1, 1)
# c8 = eta*xi at the points of gauss-1x1
_S0_c8 = np.array([0.0]).reshape(1, 1)
# c9 = (eta - 1)*(xi - 1)/4 at the points of gauss-1x1
_S0_c9 = np.array([0.25]).reshape(1, 1)
# c10 = -(eta - 1)*(xi + 1)/4 at the points of gauss-1x1
_S0_c10 = np.array([0.25]).reshape(1, 1)
# c11 = (eta + 1)*(xi + 1)/4 at the points of gauss-1x1
_S0_c11 = np.array([0.25]).reshape(1, 1)
# c12 = -(eta + 1)*(xi - 1)/4 at the points of gauss-1x1
_S0_c12 = np.array([0.25]).reshape(1, 1)
# c13 = 2*pi*w at the points of gauss-1x1
_S0_c13 = np.array([25.132741228718345]).reshape(1, 1)
# eta = eta at the points of gauss-1x1
_S0_eta = np.array([0.0]).reshape(1, 1)
# xi = xi at the points of gauss-1x1
_S0_xi = np.array([0.0]).reshape(1, 1)
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
# c8 = eta*xi at the points of gauss-2x2
_R1_c8 = np.array([0.3333333333333333, -0.3333333333333333, -0.3333333333333333, 0.3333333333333333]).reshape(4, 1)
# c9 = (eta - 1)*(xi - 1)/4 at the points of gauss-2x2
_R1_c9 = np.array([0.6220084679281462, 0.16666666666666666, 0.16666666666666666, 0.04465819873852045]).reshape(4, 1)
# c10 = -(eta - 1)*(xi + 1)/4 at the points of gauss-2x2
_R1_c10 = np.array([0.16666666666666666, 0.6220084679281462, 0.04465819873852045, 0.16666666666666666]).reshape(4, 1)
# c11 = (eta + 1)*(xi + 1)/4 at the points of gauss-2x2
_R1_c11 = np.array([0.04465819873852045, 0.16666666666666666, 0.16666666666666666, 0.6220084679281462]).reshape(4, 1)
# c12 = -(eta + 1)*(xi - 1)/4 at the points of gauss-2x2
_R1_c12 = np.array([0.16666666666666666, 0.04465819873852045, 0.6220084679281462, 0.16666666666666666]).reshape(4, 1)
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
    m0 = E*(1.0 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
    m1 = E*nu/((1.0 + nu)*(1.0 - 2.0*nu))
    m2 = E*(0.5 - nu)/((1.0 + nu)*(1.0 - 2.0*nu))
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
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_0 = 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    # gauss-1x1: all 1 points at once
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
    eta = _S0_eta
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
    r = gx_0_0 + c8*gx_1_1 + eta*gx_0_1 + gx_1_0*xi
    sc0 = c13*detJ*r
    s1 = m0*sc0
    s2 = m1*sc0
    s3 = m2*sc0
    q0 = 1.0/r
    q1 = c9*q0*s2
    T4 = q1 + dNdx1*s1
    q2 = dNdx1*s2
    T6 = q2 + c9*q0*s1
    T7 = dNdy1*s3
    T8 = dNdy1*s2
    T9 = dNdy1*s1
    T10 = dNdx1*s3
    q3 = c10*q0*s2
    T11 = q3 + dNdx2*s1
    q4 = dNdx2*s2
    T12 = q3 + q4
    T13 = q4 + c10*q0*s1
    T14 = dNdy2*s3
    T15 = dNdy2*s2
    T16 = dNdy2*s1
    T17 = dNdx2*s3
    q5 = c11*q0*s2
    T18 = q5 + dNdx3*s1
    q6 = dNdx3*s2
    T19 = q5 + q6
    T20 = q6 + c11*q0*s1
    T21 = dNdy3*s3
    T22 = dNdy3*s2
    T23 = dNdy3*s1
    T24 = dNdx3*s3
    q7 = c12*q0*s2
    T25 = q7 + dNdx4*s1
    q8 = dNdx4*s2
    T26 = q7 + q8
    T27 = q8 + c12*q0*s1
    T28 = dNdy4*s3
    T29 = dNdy4*s2
    T30 = dNdy4*s1
    T31 = dNdx4*s3
    K_0_0 = _psum(T4*dNdx1 + T7*dNdy1 + T6*c9*q0, 1)
    K_0_1 = _psum(T10*dNdy1 + T8*dNdx1 + T8*c9*q0, 1)
    K_0_2 = _psum(T11*dNdx1 + T14*dNdy1 + T13*c9*q0, 1)
    K_0_3 = _psum(T15*dNdx1 + T17*dNdy1 + T15*c9*q0, 1)
    K_0_4 = _psum(T18*dNdx1 + T21*dNdy1 + T20*c9*q0, 1)
    K_0_5 = _psum(T22*dNdx1 + T24*dNdy1 + T22*c9*q0, 1)
    K_0_6 = _psum(T25*dNdx1 + T28*dNdy1 + T27*c9*q0, 1)
    K_0_7 = _psum(T29*dNdx1 + T31*dNdy1 + T29*c9*q0, 1)
    K_1_1 = _psum(T10*dNdx1 + T9*dNdy1, 1)
    K_1_2 = _psum(T12*dNdy1 + T14*dNdx1, 1)
    K_1_3 = _psum(T16*dNdy1 + T17*dNdx1, 1)
    K_1_4 = _psum(T19*dNdy1 + T21*dNdx1, 1)
    K_1_5 = _psum(T23*dNdy1 + T24*dNdx1, 1)
    K_1_6 = _psum(T26*dNdy1 + T28*dNdx1, 1)
    K_1_7 = _psum(T30*dNdy1 + T31*dNdx1, 1)
    K_2_2 = _psum(T11*dNdx2 + T14*dNdy2 + T13*c10*q0, 1)
    K_2_3 = _psum(T15*dNdx2 + T17*dNdy2 + T15*c10*q0, 1)
    K_2_4 = _psum(T18*dNdx2 + T21*dNdy2 + T20*c10*q0, 1)
    K_2_5 = _psum(T22*dNdx2 + T24*dNdy2 + T22*c10*q0, 1)
    K_2_6 = _psum(T25*dNdx2 + T28*dNdy2 + T27*c10*q0, 1)
    K_2_7 = _psum(T29*dNdx2 + T31*dNdy2 + T29*c10*q0, 1)
    K_3_3 = _psum(T16*dNdy2 + T17*dNdx2, 1)
    K_3_4 = _psum(T19*dNdy2 + T21*dNdx2, 1)
    K_3_5 = _psum(T23*dNdy2 + T24*dNdx2, 1)
    K_3_6 = _psum(T26*dNdy2 + T28*dNdx2, 1)
    K_3_7 = _psum(T30*dNdy2 + T31*dNdx2, 1)
    K_4_4 = _psum(T18*dNdx3 + T21*dNdy3 + T20*c11*q0, 1)
    K_4_5 = _psum(T22*dNdx3 + T24*dNdy3 + T22*c11*q0, 1)
    K_4_6 = _psum(T25*dNdx3 + T28*dNdy3 + T27*c11*q0, 1)
    K_4_7 = _psum(T29*dNdx3 + T31*dNdy3 + T29*c11*q0, 1)
    K_5_5 = _psum(T23*dNdy3 + T24*dNdx3, 1)
    K_5_6 = _psum(T26*dNdy3 + T28*dNdx3, 1)
    K_5_7 = _psum(T30*dNdy3 + T31*dNdx3, 1)
    K_6_6 = _psum(T25*dNdx4 + T28*dNdy4 + T27*c12*q0, 1)
    K_6_7 = _psum(T29*dNdx4 + T31*dNdy4 + T29*c12*q0, 1)
    K_7_7 = _psum(T30*dNdy4 + T31*dNdx4, 1)
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
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_0 = 0.25*x1 + 0.25*x2 + 0.25*x3 + 0.25*x4
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
    c8 = _R1_c8
    c9 = _R1_c9
    c10 = _R1_c10
    c11 = _R1_c11
    c12 = _R1_c12
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
    r = gx_0_0 + c8*gx_1_1 + eta*gx_0_1 + gx_1_0*xi
    eps32 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7
    eps33 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8
    q0 = 1.0/r
    eps34 = c10*q0*u3 + c11*q0*u5 + c12*q0*u7 + c9*q0*u1
    eps35 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
    q1 = eps33*m1
    q2 = eps34*m1
    q3 = eps32*m1
    strain[0] = eps32
    strain[1] = eps33
    strain[2] = eps34
    strain[3] = eps35
    stress[0] = q1 + q2 + eps32*m0
    stress[1] = q2 + q3 + eps33*m0
    stress[2] = q1 + q3 + eps34*m0
    stress[3] = eps35*m2


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
