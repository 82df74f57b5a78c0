"""
derive generated kernel: Q4 hybrid5 plane-stress

Caution: derive is a verification aid, not a design check. Defer to the governing local
codes and to licensed engineering practice before relying on any result.

element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
formulation  assumed-stress hybrid, 5 stress parameters: K = G^T H^-1 G [Pian & Sumihara (1984)]
integration  B^T P (G^T): gauss-2x2 (4 points); -P^T D^-1 P (-H): gauss-2x2 (4 points)
internal     5 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
             (unrolled factorisation of K_aa, no pivoting)
flops        stiffness 1572, validity 89, recovery 1309 per element (add, mul, div, sqrt)

arguments (units-agnostic; any consistent set of units):
  xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
          node i+1 (counter-clockwise corners first, then mid-side, then interior)
  E       Young's modulus (> 0), scalar
  nu      Poisson's ratio (-1 < nu <= 0.5), scalar
  t       thickness t (the out-of-plane thickness)
  u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
  K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 5
          internal unknowns are condensed
  detJ_min validity: min det J over the points of gauss-2x2, shape (n,); <= 0 means an inverted
           or degenerate element
  strain  recovery: strain at the 4 points of gauss-2x2, shape (n, 4, 3), Voigt [eps_xx, eps_yy,
          gamma_xy] (engineering shear)
  stress  recovery: stress D strain at the same points, shape (n, 4, 3), [sigma_xx, sigma_yy,
          tau_xy]

The kernels do not check their inputs; derive.kernel() checks shapes, finite
coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
generator    derive.codegen 1.0; regenerate with
             derive kernel Q4 --variant hybrid5 --state plane-stress --lang numpy

NumPy: batched and vectorised over elements (no Python loop over elements); the
elements are processed in chunks of 2048 so the temporaries stay in cache, and all
points of a rule are evaluated at once on (points, elements) arrays.
"""
import numpy as np

ELEMENT = "Q4"
VARIANT = "hybrid5"
STATE = "plane-stress"
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
# eta = eta at the points of gauss-2x2
_V0_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_V0_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# c0 = eta/4 - 1/4 at the points of gauss-2x2
_R0_c0 = np.array([-0.39433756729740643, -0.39433756729740643, -0.10566243270259355, -0.10566243270259355]).reshape(4, 1)
# c1 = xi/4 - 1/4 at the points of gauss-2x2
_R0_c1 = np.array([-0.39433756729740643, -0.10566243270259355, -0.39433756729740643, -0.10566243270259355]).reshape(4, 1)
# c2 = 1/4 - eta/4 at the points of gauss-2x2
_R0_c2 = np.array([0.39433756729740643, 0.39433756729740643, 0.10566243270259355, 0.10566243270259355]).reshape(4, 1)
# c3 = -xi/4 - 1/4 at the points of gauss-2x2
_R0_c3 = np.array([-0.10566243270259355, -0.39433756729740643, -0.10566243270259355, -0.39433756729740643]).reshape(4, 1)
# c4 = eta/4 + 1/4 at the points of gauss-2x2
_R0_c4 = np.array([0.10566243270259355, 0.10566243270259355, 0.39433756729740643, 0.39433756729740643]).reshape(4, 1)
# c5 = xi/4 + 1/4 at the points of gauss-2x2
_R0_c5 = np.array([0.10566243270259355, 0.39433756729740643, 0.10566243270259355, 0.39433756729740643]).reshape(4, 1)
# c6 = -eta/4 - 1/4 at the points of gauss-2x2
_R0_c6 = np.array([-0.10566243270259355, -0.10566243270259355, -0.39433756729740643, -0.39433756729740643]).reshape(4, 1)
# c7 = 1/4 - xi/4 at the points of gauss-2x2
_R0_c7 = np.array([0.39433756729740643, 0.10566243270259355, 0.39433756729740643, 0.10566243270259355]).reshape(4, 1)
# eta = eta at the points of gauss-2x2
_R0_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# w = the point weight at the points of gauss-2x2
_R0_w = np.array([1.0, 1.0, 1.0, 1.0]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_R0_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# c9 = -eta at the points of gauss-2x2
_R2_c9 = np.array([0.5773502691896257, 0.5773502691896257, -0.5773502691896257, -0.5773502691896257]).reshape(4, 1)
# c10 = -xi at the points of gauss-2x2
_R2_c10 = np.array([0.5773502691896257, -0.5773502691896257, 0.5773502691896257, -0.5773502691896257]).reshape(4, 1)
# eta = eta at the points of gauss-2x2
_R2_eta = np.array([-0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257]).reshape(4, 1)
# xi = xi at the points of gauss-2x2
_R2_xi = np.array([-0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257]).reshape(4, 1)


def _psum(a, npts):
    a = np.asarray(a)
    return a.sum(axis=0) if a.ndim == 2 else npts * a


def _pmin(a):
    a = np.asarray(a)
    return a.min(axis=0) if a.ndim == 2 else a


def _material(E, nu, t):
    m0 = -1.0/E
    m1 = nu/E
    m2 = -(2.0 + 2.0*nu)/E
    m3 = 1.0/E
    m4 = -nu/E
    m5 = (2.0 + 2.0*nu)/E
    m6 = E/(1.0 - nu*nu)
    m7 = E*nu/(1.0 - nu*nu)
    m8 = E*(0.5 - 0.5*nu)/(1.0 - nu*nu)
    return (E, nu, t, m0, m1, m2, m3, m4, m5, m6, m7, m8,)


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
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    e0 = gx_1_0*gx_1_0
    e1 = gx_0_1*gx_0_1
    e2 = gy_1_0*gy_1_0
    e3 = gy_0_1*gy_0_1
    e4 = gx_1_0*gy_1_0
    e5 = gx_0_1*gy_0_1
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
    T1 = e0*eta*sc0
    T2 = e2*eta*sc0
    T3 = e4*eta*sc0
    T4 = e1*sc0*xi
    T5 = e3*sc0*xi
    T6 = e5*sc0*xi
    s7 = m0*sc0
    s8 = m1*sc0
    s9 = m2*sc0
    T10 = e0*eta*s7 + e2*eta*s8
    T11 = e0*eta*s8 + e2*eta*s7
    T12 = e4*eta*s9
    T13 = e1*s7*xi + e3*s8*xi
    T14 = e1*s8*xi + e3*s7*xi
    T15 = e5*s9*xi
    q0 = dNdx1*sc0
    q1 = dNdy1*sc0
    q2 = dNdx2*sc0
    q3 = dNdy2*sc0
    q4 = dNdx3*sc0
    q5 = dNdy3*sc0
    q6 = dNdx4*sc0
    q7 = dNdy4*sc0
    A_0_0 = _psum(q0, 4)
    A_0_2 = _psum(q1, 4)
    A_0_3 = _psum(T1*dNdx1 + T3*dNdy1, 4)
    A_0_4 = _psum(T4*dNdx1 + T6*dNdy1, 4)
    A_1_1 = _psum(q1, 4)
    A_1_2 = _psum(q0, 4)
    A_1_3 = _psum(T2*dNdy1 + T3*dNdx1, 4)
    A_1_4 = _psum(T5*dNdy1 + T6*dNdx1, 4)
    A_2_0 = _psum(q2, 4)
    A_2_2 = _psum(q3, 4)
    A_2_3 = _psum(T1*dNdx2 + T3*dNdy2, 4)
    A_2_4 = _psum(T4*dNdx2 + T6*dNdy2, 4)
    A_3_1 = _psum(q3, 4)
    A_3_2 = _psum(q2, 4)
    A_3_3 = _psum(T2*dNdy2 + T3*dNdx2, 4)
    A_3_4 = _psum(T5*dNdy2 + T6*dNdx2, 4)
    A_4_0 = _psum(q4, 4)
    A_4_2 = _psum(q5, 4)
    A_4_3 = _psum(T1*dNdx3 + T3*dNdy3, 4)
    A_4_4 = _psum(T4*dNdx3 + T6*dNdy3, 4)
    A_5_1 = _psum(q5, 4)
    A_5_2 = _psum(q4, 4)
    A_5_3 = _psum(T2*dNdy3 + T3*dNdx3, 4)
    A_5_4 = _psum(T5*dNdy3 + T6*dNdx3, 4)
    A_6_0 = _psum(q6, 4)
    A_6_2 = _psum(q7, 4)
    A_6_3 = _psum(T1*dNdx4 + T3*dNdy4, 4)
    A_6_4 = _psum(T4*dNdx4 + T6*dNdy4, 4)
    A_7_1 = _psum(q7, 4)
    A_7_2 = _psum(q6, 4)
    A_7_3 = _psum(T2*dNdy4 + T3*dNdx4, 4)
    A_7_4 = _psum(T5*dNdy4 + T6*dNdx4, 4)
    H_0_0 = _psum(s7, 4)
    H_0_1 = _psum(s8, 4)
    H_0_3 = _psum(T10, 4)
    H_0_4 = _psum(T13, 4)
    H_1_1 = _psum(s7, 4)
    H_1_3 = _psum(T11, 4)
    H_1_4 = _psum(T14, 4)
    H_2_2 = _psum(s9, 4)
    H_2_3 = _psum(T12, 4)
    H_2_4 = _psum(T15, 4)
    H_3_3 = _psum(T10*e0*eta + T11*e2*eta + T12*e4*eta, 4)
    H_3_4 = _psum(T13*e0*eta + T14*e2*eta + T15*e4*eta, 4)
    H_4_4 = _psum(T13*e1*xi + T14*e3*xi + T15*e5*xi, 4)
    # static condensation of the internal unknowns
    cid0 = 1.0/H_0_0
    cL1_0 = H_0_1*cid0
    cL3_0 = H_0_3*cid0
    cL4_0 = H_0_4*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0/cd1
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0)
    cid2 = 1.0/H_2_2
    cL3_2 = H_2_3*cid2
    cL4_2 = H_2_4*cid2
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1
    cid3 = 1.0/cd3
    cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1)
    cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3
    cid4 = 1.0/cd4
    cy1_0 = -A_0_0*cL1_0
    cy3_0 = A_0_3 - A_0_0*cL3_0 - A_0_2*cL3_2 - cL3_1*cy1_0
    cy4_0 = A_0_4 - A_0_0*cL4_0 - A_0_2*cL4_2 - cL4_1*cy1_0 - cL4_3*cy3_0
    cy3_1 = A_1_3 - A_1_1*cL3_1 - A_1_2*cL3_2
    cy4_1 = A_1_4 - A_1_1*cL4_1 - A_1_2*cL4_2 - cL4_3*cy3_1
    cy1_2 = -A_2_0*cL1_0
    cy3_2 = A_2_3 - A_2_0*cL3_0 - A_2_2*cL3_2 - cL3_1*cy1_2
    cy4_2 = A_2_4 - A_2_0*cL4_0 - A_2_2*cL4_2 - cL4_1*cy1_2 - cL4_3*cy3_2
    cy3_3 = A_3_3 - A_3_1*cL3_1 - A_3_2*cL3_2
    cy4_3 = A_3_4 - A_3_1*cL4_1 - A_3_2*cL4_2 - cL4_3*cy3_3
    cy1_4 = -A_4_0*cL1_0
    cy3_4 = A_4_3 - A_4_0*cL3_0 - A_4_2*cL3_2 - cL3_1*cy1_4
    cy4_4 = A_4_4 - A_4_0*cL4_0 - A_4_2*cL4_2 - cL4_1*cy1_4 - cL4_3*cy3_4
    cy3_5 = A_5_3 - A_5_1*cL3_1 - A_5_2*cL3_2
    cy4_5 = A_5_4 - A_5_1*cL4_1 - A_5_2*cL4_2 - cL4_3*cy3_5
    cy1_6 = -A_6_0*cL1_0
    cy3_6 = A_6_3 - A_6_0*cL3_0 - A_6_2*cL3_2 - cL3_1*cy1_6
    cy4_6 = A_6_4 - A_6_0*cL4_0 - A_6_2*cL4_2 - cL4_1*cy1_6 - cL4_3*cy3_6
    cy3_7 = A_7_3 - A_7_1*cL3_1 - A_7_2*cL3_2
    cy4_7 = A_7_4 - A_7_1*cL4_1 - A_7_2*cL4_2 - cL4_3*cy3_7
    cz0_0 = A_0_0*cid0
    cz1_0 = cid1*cy1_0
    cz2_0 = A_0_2*cid2
    cz3_0 = cid3*cy3_0
    cz4_0 = cid4*cy4_0
    cz1_1 = A_1_1*cid1
    cz2_1 = A_1_2*cid2
    cz3_1 = cid3*cy3_1
    cz4_1 = cid4*cy4_1
    cz0_2 = A_2_0*cid0
    cz1_2 = cid1*cy1_2
    cz2_2 = A_2_2*cid2
    cz3_2 = cid3*cy3_2
    cz4_2 = cid4*cy4_2
    cz1_3 = A_3_1*cid1
    cz2_3 = A_3_2*cid2
    cz3_3 = cid3*cy3_3
    cz4_3 = cid4*cy4_3
    cz0_4 = A_4_0*cid0
    cz1_4 = cid1*cy1_4
    cz2_4 = A_4_2*cid2
    cz3_4 = cid3*cy3_4
    cz4_4 = cid4*cy4_4
    cz1_5 = A_5_1*cid1
    cz2_5 = A_5_2*cid2
    cz3_5 = cid3*cy3_5
    cz4_5 = cid4*cy4_5
    cz0_6 = A_6_0*cid0
    cz1_6 = cid1*cy1_6
    cz2_6 = A_6_2*cid2
    cz3_6 = cid3*cy3_6
    cz4_6 = cid4*cy4_6
    cz1_7 = A_7_1*cid1
    cz2_7 = A_7_2*cid2
    cz3_7 = cid3*cy3_7
    cz4_7 = cid4*cy4_7
    buf[0] = -A_0_0*cz0_0 - A_0_2*cz2_0 - cy1_0*cz1_0 - cy3_0*cz3_0 - cy4_0*cz4_0
    buf[1] = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0
    buf[2] = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0
    buf[3] = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0
    buf[4] = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0
    buf[5] = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0
    buf[6] = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0
    buf[7] = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0
    buf[8] = buf[1]
    buf[9] = -A_1_1*cz1_1 - A_1_2*cz2_1 - cy3_1*cz3_1 - cy4_1*cz4_1
    buf[10] = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1
    buf[11] = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1
    buf[12] = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1
    buf[13] = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1
    buf[14] = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1
    buf[15] = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1
    buf[16] = buf[2]
    buf[17] = buf[10]
    buf[18] = -A_2_0*cz0_2 - A_2_2*cz2_2 - cy1_2*cz1_2 - cy3_2*cz3_2 - cy4_2*cz4_2
    buf[19] = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2
    buf[20] = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2
    buf[21] = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2
    buf[22] = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2
    buf[23] = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2
    buf[24] = buf[3]
    buf[25] = buf[11]
    buf[26] = buf[19]
    buf[27] = -A_3_1*cz1_3 - A_3_2*cz2_3 - cy3_3*cz3_3 - cy4_3*cz4_3
    buf[28] = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3
    buf[29] = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3
    buf[30] = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3
    buf[31] = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3
    buf[32] = buf[4]
    buf[33] = buf[12]
    buf[34] = buf[20]
    buf[35] = buf[28]
    buf[36] = -A_4_0*cz0_4 - A_4_2*cz2_4 - cy1_4*cz1_4 - cy3_4*cz3_4 - cy4_4*cz4_4
    buf[37] = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4
    buf[38] = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4
    buf[39] = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4
    buf[40] = buf[5]
    buf[41] = buf[13]
    buf[42] = buf[21]
    buf[43] = buf[29]
    buf[44] = buf[37]
    buf[45] = -A_5_1*cz1_5 - A_5_2*cz2_5 - cy3_5*cz3_5 - cy4_5*cz4_5
    buf[46] = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5
    buf[47] = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5
    buf[48] = buf[6]
    buf[49] = buf[14]
    buf[50] = buf[22]
    buf[51] = buf[30]
    buf[52] = buf[38]
    buf[53] = buf[46]
    buf[54] = -A_6_0*cz0_6 - A_6_2*cz2_6 - cy1_6*cz1_6 - cy3_6*cz3_6 - cy4_6*cz4_6
    buf[55] = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6
    buf[56] = buf[7]
    buf[57] = buf[15]
    buf[58] = buf[23]
    buf[59] = buf[31]
    buf[60] = buf[39]
    buf[61] = buf[47]
    buf[62] = buf[55]
    buf[63] = -A_7_1*cz1_7 - A_7_2*cz2_7 - cy3_7*cz3_7 - cy4_7*cz4_7


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
    t = mat[2]
    m0 = mat[3]
    m1 = mat[4]
    m2 = mat[5]
    m3 = mat[6]
    m4 = mat[7]
    m5 = mat[8]
    m6 = mat[9]
    m7 = mat[10]
    m8 = mat[11]
    gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4
    gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3
    gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3
    gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4
    gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3
    gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3
    e0 = gx_1_0*gx_1_0
    e1 = gx_0_1*gx_0_1
    e2 = gy_1_0*gy_1_0
    e3 = gy_0_1*gy_0_1
    e4 = gx_1_0*gy_1_0
    e5 = gx_0_1*gy_0_1
    e6 = m3*gx_1_0*gx_1_0
    e7 = m1*gy_1_0*gy_1_0
    e8 = m3*gx_0_1*gx_0_1
    e9 = m1*gy_0_1*gy_0_1
    e10 = m3*gy_1_0*gy_1_0
    e11 = m1*gx_1_0*gx_1_0
    e12 = m3*gy_0_1*gy_0_1
    e13 = m1*gx_0_1*gx_0_1
    e14 = gx_1_0*gy_1_0*m5
    e15 = gx_0_1*gy_0_1*m5
    # gauss-2x2: all 4 points at once
    c0 = _R0_c0
    c1 = _R0_c1
    c2 = _R0_c2
    c3 = _R0_c3
    c4 = _R0_c4
    c5 = _R0_c5
    c6 = _R0_c6
    c7 = _R0_c7
    eta = _R0_eta
    w = _R0_w
    xi = _R0_xi
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
    T1 = e0*eta*sc0
    T2 = e2*eta*sc0
    T3 = e4*eta*sc0
    T4 = e1*sc0*xi
    T5 = e3*sc0*xi
    T6 = e5*sc0*xi
    s7 = m0*sc0
    s8 = m1*sc0
    s9 = m2*sc0
    T10 = e0*eta*s7 + e2*eta*s8
    T11 = e0*eta*s8 + e2*eta*s7
    T12 = e4*eta*s9
    T13 = e1*s7*xi + e3*s8*xi
    T14 = e1*s8*xi + e3*s7*xi
    T15 = e5*s9*xi
    q0 = dNdx1*sc0
    q1 = dNdy1*sc0
    q2 = dNdx2*sc0
    q3 = dNdy2*sc0
    q4 = dNdx3*sc0
    q5 = dNdy3*sc0
    q6 = dNdx4*sc0
    q7 = dNdy4*sc0
    A_0_0 = _psum(q0, 4)
    A_0_2 = _psum(q1, 4)
    A_0_3 = _psum(T1*dNdx1 + T3*dNdy1, 4)
    A_0_4 = _psum(T4*dNdx1 + T6*dNdy1, 4)
    A_1_1 = _psum(q1, 4)
    A_1_2 = _psum(q0, 4)
    A_1_3 = _psum(T2*dNdy1 + T3*dNdx1, 4)
    A_1_4 = _psum(T5*dNdy1 + T6*dNdx1, 4)
    A_2_0 = _psum(q2, 4)
    A_2_2 = _psum(q3, 4)
    A_2_3 = _psum(T1*dNdx2 + T3*dNdy2, 4)
    A_2_4 = _psum(T4*dNdx2 + T6*dNdy2, 4)
    A_3_1 = _psum(q3, 4)
    A_3_2 = _psum(q2, 4)
    A_3_3 = _psum(T2*dNdy2 + T3*dNdx2, 4)
    A_3_4 = _psum(T5*dNdy2 + T6*dNdx2, 4)
    A_4_0 = _psum(q4, 4)
    A_4_2 = _psum(q5, 4)
    A_4_3 = _psum(T1*dNdx3 + T3*dNdy3, 4)
    A_4_4 = _psum(T4*dNdx3 + T6*dNdy3, 4)
    A_5_1 = _psum(q5, 4)
    A_5_2 = _psum(q4, 4)
    A_5_3 = _psum(T2*dNdy3 + T3*dNdx3, 4)
    A_5_4 = _psum(T5*dNdy3 + T6*dNdx3, 4)
    A_6_0 = _psum(q6, 4)
    A_6_2 = _psum(q7, 4)
    A_6_3 = _psum(T1*dNdx4 + T3*dNdy4, 4)
    A_6_4 = _psum(T4*dNdx4 + T6*dNdy4, 4)
    A_7_1 = _psum(q7, 4)
    A_7_2 = _psum(q6, 4)
    A_7_3 = _psum(T2*dNdy4 + T3*dNdx4, 4)
    A_7_4 = _psum(T5*dNdy4 + T6*dNdx4, 4)
    H_0_0 = _psum(s7, 4)
    H_0_1 = _psum(s8, 4)
    H_0_3 = _psum(T10, 4)
    H_0_4 = _psum(T13, 4)
    H_1_1 = _psum(s7, 4)
    H_1_3 = _psum(T11, 4)
    H_1_4 = _psum(T14, 4)
    H_2_2 = _psum(s9, 4)
    H_2_3 = _psum(T12, 4)
    H_2_4 = _psum(T15, 4)
    H_3_3 = _psum(T10*e0*eta + T11*e2*eta + T12*e4*eta, 4)
    H_3_4 = _psum(T13*e0*eta + T14*e2*eta + T15*e4*eta, 4)
    H_4_4 = _psum(T13*e1*xi + T14*e3*xi + T15*e5*xi, 4)
    # static condensation of the internal unknowns
    cid0 = 1.0/H_0_0
    cL1_0 = H_0_1*cid0
    cL3_0 = H_0_3*cid0
    cL4_0 = H_0_4*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0/cd1
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0)
    cid2 = 1.0/H_2_2
    cL3_2 = H_2_3*cid2
    cL4_2 = H_2_4*cid2
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1
    cid3 = 1.0/cd3
    cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1)
    cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3
    cid4 = 1.0/cd4
    cb0 = -A_0_0*u1 - A_2_0*u3 - A_4_0*u5 - A_6_0*u7
    cb1 = -A_1_1*u2 - A_3_1*u4 - A_5_1*u6 - A_7_1*u8
    cb2 = -A_0_2*u1 - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6 - A_6_2*u7 - A_7_2*u8
    cb3 = -A_0_3*u1 - A_1_3*u2 - A_2_3*u3 - A_3_3*u4 - A_4_3*u5 - A_5_3*u6 - A_6_3*u7 - A_7_3*u8
    cb4 = -A_0_4*u1 - A_1_4*u2 - A_2_4*u3 - A_3_4*u4 - A_4_4*u5 - A_5_4*u6 - A_6_4*u7 - A_7_4*u8
    cy1_0 = cb1 - cL1_0*cb0
    cy3_0 = cb3 - cL3_0*cb0 - cL3_1*cy1_0 - cL3_2*cb2
    cy4_0 = cb4 - cL4_0*cb0 - cL4_1*cy1_0 - cL4_2*cb2 - cL4_3*cy3_0
    alpha5 = cid4*cy4_0
    alpha4 = cid3*cy3_0 - alpha5*cL4_3
    alpha3 = cb2*cid2 - alpha4*cL3_2 - alpha5*cL4_2
    alpha2 = cid1*cy1_0 - alpha4*cL3_1 - alpha5*cL4_1
    alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha4*cL3_0 - alpha5*cL4_0
    # gauss-2x2: all 4 points at once
    c9 = _R2_c9
    c10 = _R2_c10
    eta = _R2_eta
    xi = _R2_xi
    eps16 = alpha1*m3 + alpha2*m4 + alpha4*(c9*e7 + e6*eta) + alpha5*(c10*e9 + e8*xi)
    eps17 = alpha1*m4 + alpha2*m3 + alpha4*(c9*e11 + e10*eta) + alpha5*(c10*e13 + e12*xi)
    eps18 = alpha3*m5 + alpha4*e14*eta + alpha5*e15*xi
    strain[0] = eps16
    strain[1] = eps17
    strain[2] = eps18
    stress[0] = eps16*m6 + eps17*m7
    stress[1] = eps16*m7 + eps17*m6
    stress[2] = eps18*m8


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
