"""
derive generated kernel: T3 full axisymmetric

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      T3, 3 nodes, 6 DOFs interleaved u1, v1, u2, v2, ...
formulation  displacement element, full integration [standard displacement formulation]
integration  B^T D B: triangle-d1 (1 point)
flops        stiffness 180, validity 12, recovery 100 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 3, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior); x is the
          radius r > 0
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu < 0.5), scalar
  t       ignored: axisymmetric kernels integrate over the full ring, thick = 2 pi r
  u       nodal displacements for recovery, shape (n, 6), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 6, 6), DOFs interleaved u1, v1, u2, v2, ...; symmetric
  detJ_min validity: min det J over the points of triangle-d1, shape (n,); <= 0 means an
           inverted or degenerate element
  strain  recovery: strain at the 1 points of triangle-d1, shape (n, 1, 4), Voigt [eps_rr,
          eps_zz, eps_tt, gamma_rz] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 1, 4), [sigma_rr, sigma_zz,
          sigma_tt, tau_rz]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel T3 --variant full --state axisymmetric --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "T3"
VARIANT = "full"
STATE = "axisymmetric"
NODES = 3
NDOF = 6
NSTRAIN = 4
NPOINTS = 1
GENERATOR = "derive.codegen 1.0"
_CHUNK = 2048

# point constants (shape-function derivatives, monomials, weights) per rule, (points, 1)
# c0 = -eta - xi + 1 at the points of triangle-d1
_S0_c0 = np.array([0.3333333333333333]).reshape(1, 1)
# c1 = 2*pi*w at the points of triangle-d1
_S0_c1 = np.array([3.141592653589793]).reshape(1, 1)
# eta = eta at the points of triangle-d1
_S0_eta = np.array([0.3333333333333333]).reshape(1, 1)
# xi = xi at the points of triangle-d1
_S0_xi = np.array([0.3333333333333333]).reshape(1, 1)
# c0 = -eta - xi + 1 at the points of triangle-d1
_R1_c0 = np.array([0.3333333333333333]).reshape(1, 1)
# eta = eta at the points of triangle-d1
_R1_eta = np.array([0.3333333333333333]).reshape(1, 1)
# xi = xi at the points of triangle-d1
_R1_xi = np.array([0.3333333333333333]).reshape(1, 1)


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
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    # triangle-d1: all 1 points at once
    c0 = _S0_c0
    c1 = _S0_c1
    eta = _S0_eta
    xi = _S0_xi
    detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
    idet = 1.0/detJ
    Ji00 = gy_0_1*idet
    Ji01 = -gy_1_0*idet
    Ji10 = -gx_0_1*idet
    Ji11 = gx_1_0*idet
    dNdx1 = -Ji00 - Ji01
    dNdy1 = -Ji10 - Ji11
    r = x1 + eta*gx_0_1 + gx_1_0*xi
    sc0 = c1*detJ*r
    s1 = m0*sc0
    s2 = m1*sc0
    s3 = m2*sc0
    q0 = 1.0/r
    q1 = c0*q0*s2
    T4 = q1 + dNdx1*s1
    q2 = dNdx1*s2
    T6 = q2 + c0*q0*s1
    T7 = dNdy1*s3
    T8 = dNdy1*s2
    T9 = dNdy1*s1
    T10 = dNdx1*s3
    q3 = q0*s2*xi
    T11 = q3 + Ji00*s1
    q4 = Ji00*s2
    T12 = q3 + q4
    T13 = q4 + q0*s1*xi
    T14 = Ji10*s3
    T15 = Ji10*s2
    T16 = Ji10*s1
    T17 = Ji00*s3
    q5 = eta*q0*s2
    T18 = q5 + Ji01*s1
    q6 = Ji01*s2
    T19 = q5 + q6
    T20 = q6 + eta*q0*s1
    T21 = Ji11*s3
    T22 = Ji11*s2
    T23 = Ji11*s1
    T24 = Ji01*s3
    K_0_0 = _psum(T4*dNdx1 + T7*dNdy1 + T6*c0*q0, 1)
    K_0_1 = _psum(T10*dNdy1 + T8*dNdx1 + T8*c0*q0, 1)
    K_0_2 = _psum(T11*dNdx1 + T14*dNdy1 + T13*c0*q0, 1)
    K_0_3 = _psum(T15*dNdx1 + T17*dNdy1 + T15*c0*q0, 1)
    K_0_4 = _psum(T18*dNdx1 + T21*dNdy1 + T20*c0*q0, 1)
    K_0_5 = _psum(T22*dNdx1 + T24*dNdy1 + T22*c0*q0, 1)
    K_1_1 = _psum(T10*dNdx1 + T9*dNdy1, 1)
    K_1_2 = _psum(T12*dNdy1 + T14*dNdx1, 1)
    K_1_3 = _psum(T16*dNdy1 + T17*dNdx1, 1)
    K_1_4 = _psum(T19*dNdy1 + T21*dNdx1, 1)
    K_1_5 = _psum(T23*dNdy1 + T24*dNdx1, 1)
    K_2_2 = _psum(Ji00*T11 + Ji10*T14 + T13*q0*xi, 1)
    K_2_3 = _psum(Ji00*T15 + Ji10*T17 + T15*q0*xi, 1)
    K_2_4 = _psum(Ji00*T18 + Ji10*T21 + T20*q0*xi, 1)
    K_2_5 = _psum(Ji00*T22 + Ji10*T24 + T22*q0*xi, 1)
    K_3_3 = _psum(Ji00*T17 + Ji10*T16, 1)
    K_3_4 = _psum(Ji00*T21 + Ji10*T19, 1)
    K_3_5 = _psum(Ji00*T24 + Ji10*T23, 1)
    K_4_4 = _psum(Ji01*T18 + Ji11*T21 + T20*eta*q0, 1)
    K_4_5 = _psum(Ji01*T22 + Ji11*T24 + T22*eta*q0, 1)
    K_5_5 = _psum(Ji01*T24 + Ji11*T23, 1)
    buf[0] = K_0_0
    buf[1] = K_0_1
    buf[2] = K_0_2
    buf[3] = K_0_3
    buf[4] = K_0_4
    buf[5] = K_0_5
    buf[6] = buf[1]
    buf[7] = K_1_1
    buf[8] = K_1_2
    buf[9] = K_1_3
    buf[10] = K_1_4
    buf[11] = K_1_5
    buf[12] = buf[2]
    buf[13] = buf[8]
    buf[14] = K_2_2
    buf[15] = K_2_3
    buf[16] = K_2_4
    buf[17] = K_2_5
    buf[18] = buf[3]
    buf[19] = buf[9]
    buf[20] = buf[15]
    buf[21] = K_3_3
    buf[22] = K_3_4
    buf[23] = K_3_5
    buf[24] = buf[4]
    buf[25] = buf[10]
    buf[26] = buf[16]
    buf[27] = buf[22]
    buf[28] = K_4_4
    buf[29] = K_4_5
    buf[30] = buf[5]
    buf[31] = buf[11]
    buf[32] = buf[17]
    buf[33] = buf[23]
    buf[34] = buf[29]
    buf[35] = K_5_5


def _validity_chunk(X):
    x1 = X[0]
    y1 = X[1]
    x2 = X[2]
    y2 = X[3]
    x3 = X[4]
    y3 = X[5]
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    # triangle-d1: all 1 points at once
    detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
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
    u1 = U[0]
    u2 = U[1]
    u3 = U[2]
    u4 = U[3]
    u5 = U[4]
    u6 = U[5]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    # triangle-d1: all 1 points at once
    c0 = _R1_c0
    eta = _R1_eta
    xi = _R1_xi
    detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
    idet = 1.0/detJ
    Ji00 = gy_0_1*idet
    Ji01 = -gy_1_0*idet
    Ji10 = -gx_0_1*idet
    Ji11 = gx_1_0*idet
    dNdx1 = -Ji00 - Ji01
    dNdy1 = -Ji10 - Ji11
    r = x1 + eta*gx_0_1 + gx_1_0*xi
    eps25 = Ji00*u3 + Ji01*u5 + dNdx1*u1
    eps26 = Ji10*u4 + Ji11*u6 + dNdy1*u2
    q0 = 1.0/r
    eps27 = c0*q0*u1 + eta*q0*u5 + q0*u3*xi
    eps28 = Ji00*u4 + Ji01*u6 + Ji10*u3 + Ji11*u5 + dNdx1*u2 + dNdy1*u1
    q1 = eps26*m1
    q2 = eps27*m1
    q3 = eps25*m1
    strain[0] = eps25
    strain[1] = eps26
    strain[2] = eps27
    strain[3] = eps28
    stress[0] = q1 + q2 + eps25*m0
    stress[1] = q2 + q3 + eps26*m0
    stress[2] = q1 + q3 + eps27*m0
    stress[3] = eps28*m2


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
