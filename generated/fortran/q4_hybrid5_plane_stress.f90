! derive generated kernel: Q4 hybrid5 plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
! formulation  assumed-stress hybrid, 5 stress parameters: K = G^T H^-1 G [Pian & Sumihara (1984)]
! integration  B^T P (G^T): gauss-2x2 (4 points); -P^T D^-1 P (-H): gauss-2x2 (4 points)
! internal     5 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
!              (unrolled factorisation of K_aa, no pivoting)
! flops        stiffness 1599, validity 125, recovery 1309 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 5
!           internal unknowns are condensed
!   detJ_min validity: min det J over the points of gauss-2x2, shape (n,); <= 0 means an inverted
!            or degenerate element
!   strain  recovery: strain at the 4 points of gauss-2x2, shape (n, 4, 3), Voigt [eps_xx, eps_yy,
!           gamma_xy] (engineering shear)
!   stress  recovery: stress D strain at the same points, shape (n, 4, 3), [sigma_xx, sigma_yy,
!           tau_xy]
!
! The kernels do not check their inputs; derive.kernel() checks shapes, finite
! coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
! generator    derive.codegen 1.0; regenerate with
!              derive kernel Q4 --variant hybrid5 --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c q4_hybrid5_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 4, n) is the same memory as C xy[n][4][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_q4_hybrid5_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: q4_hybrid5_plane_stress_stiffness, q4_hybrid5_plane_stress_stiffness_batch, &
            q4_hybrid5_plane_stress_validity, q4_hybrid5_plane_stress_recovery

contains

  pure subroutine q4_hybrid5_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_q4_hybrid5_plane_stress_stiffness_f")
    real(dp), intent(in) :: xy(2, 4)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(8, 8)
    ! c0 = eta/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c0(4) = [-0.39433756729740643_dp, -0.39433756729740643_dp, &
        -0.10566243270259355_dp, -0.10566243270259355_dp]
    ! c1 = xi/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c1(4) = [-0.39433756729740643_dp, -0.10566243270259355_dp, &
        -0.39433756729740643_dp, -0.10566243270259355_dp]
    ! c2 = 1/4 - eta/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c2(4) = [0.39433756729740643_dp, 0.39433756729740643_dp, &
        0.10566243270259355_dp, 0.10566243270259355_dp]
    ! c3 = -xi/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c3(4) = [-0.10566243270259355_dp, -0.39433756729740643_dp, &
        -0.10566243270259355_dp, -0.39433756729740643_dp]
    ! c4 = eta/4 + 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c4(4) = [0.10566243270259355_dp, 0.10566243270259355_dp, &
        0.39433756729740643_dp, 0.39433756729740643_dp]
    ! c5 = xi/4 + 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c5(4) = [0.10566243270259355_dp, 0.39433756729740643_dp, &
        0.10566243270259355_dp, 0.39433756729740643_dp]
    ! c6 = -eta/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c6(4) = [-0.10566243270259355_dp, -0.10566243270259355_dp, &
        -0.39433756729740643_dp, -0.39433756729740643_dp]
    ! c7 = 1/4 - xi/4 at the points of gauss-2x2
    real(dp), parameter :: KS0_c7(4) = [0.39433756729740643_dp, 0.10566243270259355_dp, &
        0.39433756729740643_dp, 0.10566243270259355_dp]
    ! eta = eta at the points of gauss-2x2
    real(dp), parameter :: KS0_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
        0.5773502691896257_dp, 0.5773502691896257_dp]
    ! w = the point weight at the points of gauss-2x2
    real(dp), parameter :: KS0_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
    ! xi = xi at the points of gauss-2x2
    real(dp), parameter :: KS0_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
        -0.5773502691896257_dp, 0.5773502691896257_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, m0, m1, m2, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0
    real(dp) :: gy_1_1, e0, e1, e2, e3, e4, e5, A_0_0, A_0_2, A_0_3, A_0_4, A_1_1, A_1_2, A_1_3, A_1_4
    real(dp) :: A_2_0, A_2_2, A_2_3, A_2_4, A_3_1, A_3_2, A_3_3, A_3_4, A_4_0, A_4_2, A_4_3, A_4_4
    real(dp) :: A_5_1, A_5_2, A_5_3, A_5_4, A_6_0, A_6_2, A_6_3, A_6_4, A_7_1, A_7_2, A_7_3, A_7_4
    real(dp) :: H_0_0, H_0_1, H_0_3, H_0_4, H_1_1, H_1_3, H_1_4, H_2_2, H_2_3, H_2_4, H_3_3, H_3_4
    real(dp) :: H_4_4, cid0, cL1_0, cL3_0, cL4_0, cd1, cid1, cL3_1, cL4_1, cid2, cL3_2, cL4_2, cd3
    real(dp) :: cid3, cL4_3, cd4, cid4, cy1_0, cy3_0, cy4_0, cy3_1, cy4_1, cy1_2, cy3_2, cy4_2, cy3_3
    real(dp) :: cy4_3, cy1_4, cy3_4, cy4_4, cy3_5, cy4_5, cy1_6, cy3_6, cy4_6, cy3_7, cy4_7, cz0_0
    real(dp) :: cz1_0, cz2_0, cz3_0, cz4_0, cz1_1, cz2_1, cz3_1, cz4_1, cz0_2, cz1_2, cz2_2, cz3_2
    real(dp) :: cz4_2, cz1_3, cz2_3, cz3_3, cz4_3, cz0_4, cz1_4, cz2_4, cz3_4, cz4_4, cz1_5, cz2_5
    real(dp) :: cz3_5, cz4_5, cz0_6, cz1_6, cz2_6, cz3_6, cz4_6, cz1_7, cz2_7, cz3_7, cz4_7
    integer :: p
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    m0 = -1.0_dp/E
    m1 = nu/E
    m2 = -(2.0_dp + 2.0_dp*nu)/E
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    e0 = gx_1_0*gx_1_0
    e1 = gx_0_1*gx_0_1
    e2 = gy_1_0*gy_1_0
    e3 = gy_0_1*gy_0_1
    e4 = gx_1_0*gy_1_0
    e5 = gx_0_1*gy_0_1
    A_0_0 = 0.0_dp
    A_0_2 = 0.0_dp
    A_0_3 = 0.0_dp
    A_0_4 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_1_3 = 0.0_dp
    A_1_4 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_2 = 0.0_dp
    A_2_3 = 0.0_dp
    A_2_4 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_3_3 = 0.0_dp
    A_3_4 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_2 = 0.0_dp
    A_4_3 = 0.0_dp
    A_4_4 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_5_3 = 0.0_dp
    A_5_4 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_2 = 0.0_dp
    A_6_3 = 0.0_dp
    A_6_4 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_7_3 = 0.0_dp
    A_7_4 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_3 = 0.0_dp
    H_0_4 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_3 = 0.0_dp
    H_1_4 = 0.0_dp
    H_2_2 = 0.0_dp
    H_2_3 = 0.0_dp
    H_2_4 = 0.0_dp
    H_3_3 = 0.0_dp
    H_3_4 = 0.0_dp
    H_4_4 = 0.0_dp
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
        real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, T1, T2, T3
        real(dp) :: T4, T5, T6, s7, s8, s9, T10, T11, T12, T13, T14, T15, q0, q1, q2, q3, q4, q5, q6, q7
        c0 = KS0_c0(p)
        c1 = KS0_c1(p)
        c2 = KS0_c2(p)
        c3 = KS0_c3(p)
        c4 = KS0_c4(p)
        c5 = KS0_c5(p)
        c6 = KS0_c6(p)
        c7 = KS0_c7(p)
        eta = KS0_eta(p)
        w = KS0_w(p)
        xi = KS0_xi(p)
        J00 = gx_1_0 + eta*gx_1_1
        J01 = gy_1_0 + eta*gy_1_1
        J10 = gx_0_1 + gx_1_1*xi
        J11 = gy_0_1 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
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
        A_0_0 = A_0_0 + (q0)
        A_0_2 = A_0_2 + (q1)
        A_0_3 = A_0_3 + (T1*dNdx1 + T3*dNdy1)
        A_0_4 = A_0_4 + (T4*dNdx1 + T6*dNdy1)
        A_1_1 = A_1_1 + (q1)
        A_1_2 = A_1_2 + (q0)
        A_1_3 = A_1_3 + (T2*dNdy1 + T3*dNdx1)
        A_1_4 = A_1_4 + (T5*dNdy1 + T6*dNdx1)
        A_2_0 = A_2_0 + (q2)
        A_2_2 = A_2_2 + (q3)
        A_2_3 = A_2_3 + (T1*dNdx2 + T3*dNdy2)
        A_2_4 = A_2_4 + (T4*dNdx2 + T6*dNdy2)
        A_3_1 = A_3_1 + (q3)
        A_3_2 = A_3_2 + (q2)
        A_3_3 = A_3_3 + (T2*dNdy2 + T3*dNdx2)
        A_3_4 = A_3_4 + (T5*dNdy2 + T6*dNdx2)
        A_4_0 = A_4_0 + (q4)
        A_4_2 = A_4_2 + (q5)
        A_4_3 = A_4_3 + (T1*dNdx3 + T3*dNdy3)
        A_4_4 = A_4_4 + (T4*dNdx3 + T6*dNdy3)
        A_5_1 = A_5_1 + (q5)
        A_5_2 = A_5_2 + (q4)
        A_5_3 = A_5_3 + (T2*dNdy3 + T3*dNdx3)
        A_5_4 = A_5_4 + (T5*dNdy3 + T6*dNdx3)
        A_6_0 = A_6_0 + (q6)
        A_6_2 = A_6_2 + (q7)
        A_6_3 = A_6_3 + (T1*dNdx4 + T3*dNdy4)
        A_6_4 = A_6_4 + (T4*dNdx4 + T6*dNdy4)
        A_7_1 = A_7_1 + (q7)
        A_7_2 = A_7_2 + (q6)
        A_7_3 = A_7_3 + (T2*dNdy4 + T3*dNdx4)
        A_7_4 = A_7_4 + (T5*dNdy4 + T6*dNdx4)
        H_0_0 = H_0_0 + (s7)
        H_0_1 = H_0_1 + (s8)
        H_0_3 = H_0_3 + (T10)
        H_0_4 = H_0_4 + (T13)
        H_1_1 = H_1_1 + (s7)
        H_1_3 = H_1_3 + (T11)
        H_1_4 = H_1_4 + (T14)
        H_2_2 = H_2_2 + (s9)
        H_2_3 = H_2_3 + (T12)
        H_2_4 = H_2_4 + (T15)
        H_3_3 = H_3_3 + (T10*e0*eta + T11*e2*eta + T12*e4*eta)
        H_3_4 = H_3_4 + (T13*e0*eta + T14*e2*eta + T15*e4*eta)
        H_4_4 = H_4_4 + (T13*e1*xi + T14*e3*xi + T15*e5*xi)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL3_0 = H_0_3*cid0
    cL4_0 = H_0_4*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0)
    cid2 = 1.0_dp/H_2_2
    cL3_2 = H_2_3*cid2
    cL4_2 = H_2_4*cid2
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1
    cid3 = 1.0_dp/cd3
    cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1)
    cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3
    cid4 = 1.0_dp/cd4
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
    K(1, 1) = -A_0_0*cz0_0 - A_0_2*cz2_0 - cy1_0*cz1_0 - cy3_0*cz3_0 - cy4_0*cz4_0
    K(1, 2) = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0
    K(1, 3) = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0
    K(1, 4) = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0
    K(1, 5) = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0
    K(1, 6) = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0
    K(1, 7) = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0
    K(1, 8) = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0
    K(2, 1) = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0
    K(2, 2) = -A_1_1*cz1_1 - A_1_2*cz2_1 - cy3_1*cz3_1 - cy4_1*cz4_1
    K(2, 3) = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1
    K(2, 4) = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1
    K(2, 5) = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1
    K(2, 6) = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1
    K(2, 7) = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1
    K(2, 8) = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1
    K(3, 1) = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0
    K(3, 2) = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1
    K(3, 3) = -A_2_0*cz0_2 - A_2_2*cz2_2 - cy1_2*cz1_2 - cy3_2*cz3_2 - cy4_2*cz4_2
    K(3, 4) = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2
    K(3, 5) = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2
    K(3, 6) = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2
    K(3, 7) = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2
    K(3, 8) = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2
    K(4, 1) = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0
    K(4, 2) = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1
    K(4, 3) = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2
    K(4, 4) = -A_3_1*cz1_3 - A_3_2*cz2_3 - cy3_3*cz3_3 - cy4_3*cz4_3
    K(4, 5) = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3
    K(4, 6) = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3
    K(4, 7) = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3
    K(4, 8) = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3
    K(5, 1) = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0
    K(5, 2) = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1
    K(5, 3) = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2
    K(5, 4) = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3
    K(5, 5) = -A_4_0*cz0_4 - A_4_2*cz2_4 - cy1_4*cz1_4 - cy3_4*cz3_4 - cy4_4*cz4_4
    K(5, 6) = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4
    K(5, 7) = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4
    K(5, 8) = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4
    K(6, 1) = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0
    K(6, 2) = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1
    K(6, 3) = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2
    K(6, 4) = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3
    K(6, 5) = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4
    K(6, 6) = -A_5_1*cz1_5 - A_5_2*cz2_5 - cy3_5*cz3_5 - cy4_5*cz4_5
    K(6, 7) = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5
    K(6, 8) = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5
    K(7, 1) = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0
    K(7, 2) = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1
    K(7, 3) = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2
    K(7, 4) = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3
    K(7, 5) = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4
    K(7, 6) = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5
    K(7, 7) = -A_6_0*cz0_6 - A_6_2*cz2_6 - cy1_6*cz1_6 - cy3_6*cz3_6 - cy4_6*cz4_6
    K(7, 8) = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6
    K(8, 1) = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0
    K(8, 2) = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1
    K(8, 3) = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2
    K(8, 4) = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3
    K(8, 5) = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4
    K(8, 6) = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5
    K(8, 7) = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6
    K(8, 8) = -A_7_1*cz1_7 - A_7_2*cz2_7 - cy3_7*cz3_7 - cy4_7*cz4_7
  end subroutine q4_hybrid5_plane_stress_stiffness

  pure subroutine q4_hybrid5_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_q4_hybrid5_plane_stress_stiffness_batch_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(8, 8, n)
    ! blocks of 8 elements: copied into lane-first scratch (xl(lane, :, :)), the body
    ! runs in a loop over the lanes that gfortran vectorises (one SIMD lane per element),
    ! then K is copied back; a short last block repeats its first element in the spare lanes
    integer, parameter :: lanes = 8
    real(dp) :: xl(lanes, 2, 4), kl(lanes, 8, 8)
    integer(c_long) :: ib, iel
    integer :: lane, mlan
    real(dp) :: m0, m1, m2
    m0 = -1.0_dp/E
    m1 = nu/E
    m2 = -(2.0_dp + 2.0_dp*nu)/E
    do ib = 1, n, lanes
      mlan = int(min(int(lanes, c_long), n - ib + 1))
      do lane = 1, lanes
        iel = ib + merge(lane - 1, 0, lane <= mlan)
        xl(lane, :, :) = xy(:, :, iel)
      end do
      do lane = 1, lanes
        block
          ! c0 = eta/4 - 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c0(4) = [-0.39433756729740643_dp, -0.39433756729740643_dp, &
              -0.10566243270259355_dp, -0.10566243270259355_dp]
          ! c1 = xi/4 - 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c1(4) = [-0.39433756729740643_dp, -0.10566243270259355_dp, &
              -0.39433756729740643_dp, -0.10566243270259355_dp]
          ! c2 = 1/4 - eta/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c2(4) = [0.39433756729740643_dp, 0.39433756729740643_dp, &
              0.10566243270259355_dp, 0.10566243270259355_dp]
          ! c3 = -xi/4 - 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c3(4) = [-0.10566243270259355_dp, -0.39433756729740643_dp, &
              -0.10566243270259355_dp, -0.39433756729740643_dp]
          ! c4 = eta/4 + 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c4(4) = [0.10566243270259355_dp, 0.10566243270259355_dp, &
              0.39433756729740643_dp, 0.39433756729740643_dp]
          ! c5 = xi/4 + 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c5(4) = [0.10566243270259355_dp, 0.39433756729740643_dp, &
              0.10566243270259355_dp, 0.39433756729740643_dp]
          ! c6 = -eta/4 - 1/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c6(4) = [-0.10566243270259355_dp, -0.10566243270259355_dp, &
              -0.39433756729740643_dp, -0.39433756729740643_dp]
          ! c7 = 1/4 - xi/4 at the points of gauss-2x2
          real(dp), parameter :: KS0_c7(4) = [0.39433756729740643_dp, 0.10566243270259355_dp, &
              0.39433756729740643_dp, 0.10566243270259355_dp]
          ! eta = eta at the points of gauss-2x2
          real(dp), parameter :: KS0_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
              0.5773502691896257_dp, 0.5773502691896257_dp]
          ! w = the point weight at the points of gauss-2x2
          real(dp), parameter :: KS0_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
          ! xi = xi at the points of gauss-2x2
          real(dp), parameter :: KS0_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
              -0.5773502691896257_dp, 0.5773502691896257_dp]
          real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, e0
          real(dp) :: e1, e2, e3, e4, e5, A_0_0, A_0_2, A_0_3, A_0_4, A_1_1, A_1_2, A_1_3, A_1_4, A_2_0
          real(dp) :: A_2_2, A_2_3, A_2_4, A_3_1, A_3_2, A_3_3, A_3_4, A_4_0, A_4_2, A_4_3, A_4_4, A_5_1
          real(dp) :: A_5_2, A_5_3, A_5_4, A_6_0, A_6_2, A_6_3, A_6_4, A_7_1, A_7_2, A_7_3, A_7_4, H_0_0
          real(dp) :: H_0_1, H_0_3, H_0_4, H_1_1, H_1_3, H_1_4, H_2_2, H_2_3, H_2_4, H_3_3, H_3_4, H_4_4
          real(dp) :: cid0, cL1_0, cL3_0, cL4_0, cd1, cid1, cL3_1, cL4_1, cid2, cL3_2, cL4_2, cd3, cid3
          real(dp) :: cL4_3, cd4, cid4, cy1_0, cy3_0, cy4_0, cy3_1, cy4_1, cy1_2, cy3_2, cy4_2, cy3_3, cy4_3
          real(dp) :: cy1_4, cy3_4, cy4_4, cy3_5, cy4_5, cy1_6, cy3_6, cy4_6, cy3_7, cy4_7, cz0_0, cz1_0
          real(dp) :: cz2_0, cz3_0, cz4_0, cz1_1, cz2_1, cz3_1, cz4_1, cz0_2, cz1_2, cz2_2, cz3_2, cz4_2
          real(dp) :: cz1_3, cz2_3, cz3_3, cz4_3, cz0_4, cz1_4, cz2_4, cz3_4, cz4_4, cz1_5, cz2_5, cz3_5
          real(dp) :: cz4_5, cz0_6, cz1_6, cz2_6, cz3_6, cz4_6, cz1_7, cz2_7, cz3_7, cz4_7
          integer :: p
          x1 = xl(lane, 1, 1)
          y1 = xl(lane, 2, 1)
          x2 = xl(lane, 1, 2)
          y2 = xl(lane, 2, 2)
          x3 = xl(lane, 1, 3)
          y3 = xl(lane, 2, 3)
          x4 = xl(lane, 1, 4)
          y4 = xl(lane, 2, 4)
          gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
          gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
          gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
          gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
          gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
          gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
          e0 = gx_1_0*gx_1_0
          e1 = gx_0_1*gx_0_1
          e2 = gy_1_0*gy_1_0
          e3 = gy_0_1*gy_0_1
          e4 = gx_1_0*gy_1_0
          e5 = gx_0_1*gy_0_1
          A_0_0 = 0.0_dp
          A_0_2 = 0.0_dp
          A_0_3 = 0.0_dp
          A_0_4 = 0.0_dp
          A_1_1 = 0.0_dp
          A_1_2 = 0.0_dp
          A_1_3 = 0.0_dp
          A_1_4 = 0.0_dp
          A_2_0 = 0.0_dp
          A_2_2 = 0.0_dp
          A_2_3 = 0.0_dp
          A_2_4 = 0.0_dp
          A_3_1 = 0.0_dp
          A_3_2 = 0.0_dp
          A_3_3 = 0.0_dp
          A_3_4 = 0.0_dp
          A_4_0 = 0.0_dp
          A_4_2 = 0.0_dp
          A_4_3 = 0.0_dp
          A_4_4 = 0.0_dp
          A_5_1 = 0.0_dp
          A_5_2 = 0.0_dp
          A_5_3 = 0.0_dp
          A_5_4 = 0.0_dp
          A_6_0 = 0.0_dp
          A_6_2 = 0.0_dp
          A_6_3 = 0.0_dp
          A_6_4 = 0.0_dp
          A_7_1 = 0.0_dp
          A_7_2 = 0.0_dp
          A_7_3 = 0.0_dp
          A_7_4 = 0.0_dp
          H_0_0 = 0.0_dp
          H_0_1 = 0.0_dp
          H_0_3 = 0.0_dp
          H_0_4 = 0.0_dp
          H_1_1 = 0.0_dp
          H_1_3 = 0.0_dp
          H_1_4 = 0.0_dp
          H_2_2 = 0.0_dp
          H_2_3 = 0.0_dp
          H_2_4 = 0.0_dp
          H_3_3 = 0.0_dp
          H_3_4 = 0.0_dp
          H_4_4 = 0.0_dp
          do p = 1, 4   ! gauss-2x2: loop over the 4 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
              real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, T1, T2, T3
              real(dp) :: T4, T5, T6, s7, s8, s9, T10, T11, T12, T13, T14, T15, q0, q1, q2, q3, q4, q5, q6, q7
              c0 = KS0_c0(p)
              c1 = KS0_c1(p)
              c2 = KS0_c2(p)
              c3 = KS0_c3(p)
              c4 = KS0_c4(p)
              c5 = KS0_c5(p)
              c6 = KS0_c6(p)
              c7 = KS0_c7(p)
              eta = KS0_eta(p)
              w = KS0_w(p)
              xi = KS0_xi(p)
              J00 = gx_1_0 + eta*gx_1_1
              J01 = gy_1_0 + eta*gy_1_1
              J10 = gx_0_1 + gx_1_1*xi
              J11 = gy_0_1 + gy_1_1*xi
              detJ = J00*J11 - J01*J10
              idet = 1.0_dp/detJ
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
              A_0_0 = A_0_0 + (q0)
              A_0_2 = A_0_2 + (q1)
              A_0_3 = A_0_3 + (T1*dNdx1 + T3*dNdy1)
              A_0_4 = A_0_4 + (T4*dNdx1 + T6*dNdy1)
              A_1_1 = A_1_1 + (q1)
              A_1_2 = A_1_2 + (q0)
              A_1_3 = A_1_3 + (T2*dNdy1 + T3*dNdx1)
              A_1_4 = A_1_4 + (T5*dNdy1 + T6*dNdx1)
              A_2_0 = A_2_0 + (q2)
              A_2_2 = A_2_2 + (q3)
              A_2_3 = A_2_3 + (T1*dNdx2 + T3*dNdy2)
              A_2_4 = A_2_4 + (T4*dNdx2 + T6*dNdy2)
              A_3_1 = A_3_1 + (q3)
              A_3_2 = A_3_2 + (q2)
              A_3_3 = A_3_3 + (T2*dNdy2 + T3*dNdx2)
              A_3_4 = A_3_4 + (T5*dNdy2 + T6*dNdx2)
              A_4_0 = A_4_0 + (q4)
              A_4_2 = A_4_2 + (q5)
              A_4_3 = A_4_3 + (T1*dNdx3 + T3*dNdy3)
              A_4_4 = A_4_4 + (T4*dNdx3 + T6*dNdy3)
              A_5_1 = A_5_1 + (q5)
              A_5_2 = A_5_2 + (q4)
              A_5_3 = A_5_3 + (T2*dNdy3 + T3*dNdx3)
              A_5_4 = A_5_4 + (T5*dNdy3 + T6*dNdx3)
              A_6_0 = A_6_0 + (q6)
              A_6_2 = A_6_2 + (q7)
              A_6_3 = A_6_3 + (T1*dNdx4 + T3*dNdy4)
              A_6_4 = A_6_4 + (T4*dNdx4 + T6*dNdy4)
              A_7_1 = A_7_1 + (q7)
              A_7_2 = A_7_2 + (q6)
              A_7_3 = A_7_3 + (T2*dNdy4 + T3*dNdx4)
              A_7_4 = A_7_4 + (T5*dNdy4 + T6*dNdx4)
              H_0_0 = H_0_0 + (s7)
              H_0_1 = H_0_1 + (s8)
              H_0_3 = H_0_3 + (T10)
              H_0_4 = H_0_4 + (T13)
              H_1_1 = H_1_1 + (s7)
              H_1_3 = H_1_3 + (T11)
              H_1_4 = H_1_4 + (T14)
              H_2_2 = H_2_2 + (s9)
              H_2_3 = H_2_3 + (T12)
              H_2_4 = H_2_4 + (T15)
              H_3_3 = H_3_3 + (T10*e0*eta + T11*e2*eta + T12*e4*eta)
              H_3_4 = H_3_4 + (T13*e0*eta + T14*e2*eta + T15*e4*eta)
              H_4_4 = H_4_4 + (T13*e1*xi + T14*e3*xi + T15*e5*xi)
            end block
          end do
          ! static condensation of the internal unknowns
          cid0 = 1.0_dp/H_0_0
          cL1_0 = H_0_1*cid0
          cL3_0 = H_0_3*cid0
          cL4_0 = H_0_4*cid0
          cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
          cid1 = 1.0_dp/cd1
          cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
          cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0)
          cid2 = 1.0_dp/H_2_2
          cL3_2 = H_2_3*cid2
          cL4_2 = H_2_4*cid2
          cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1
          cid3 = 1.0_dp/cd3
          cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1)
          cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3
          cid4 = 1.0_dp/cd4
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
          kl(lane, 1, 1) = -A_0_0*cz0_0 - A_0_2*cz2_0 - cy1_0*cz1_0 - cy3_0*cz3_0 - cy4_0*cz4_0
          kl(lane, 1, 2) = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0
          kl(lane, 1, 3) = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0
          kl(lane, 1, 4) = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0
          kl(lane, 1, 5) = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0
          kl(lane, 1, 6) = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0
          kl(lane, 1, 7) = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0
          kl(lane, 1, 8) = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0
          kl(lane, 2, 1) = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0
          kl(lane, 2, 2) = -A_1_1*cz1_1 - A_1_2*cz2_1 - cy3_1*cz3_1 - cy4_1*cz4_1
          kl(lane, 2, 3) = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1
          kl(lane, 2, 4) = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1
          kl(lane, 2, 5) = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1
          kl(lane, 2, 6) = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1
          kl(lane, 2, 7) = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1
          kl(lane, 2, 8) = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1
          kl(lane, 3, 1) = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0
          kl(lane, 3, 2) = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1
          kl(lane, 3, 3) = -A_2_0*cz0_2 - A_2_2*cz2_2 - cy1_2*cz1_2 - cy3_2*cz3_2 - cy4_2*cz4_2
          kl(lane, 3, 4) = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2
          kl(lane, 3, 5) = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2
          kl(lane, 3, 6) = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2
          kl(lane, 3, 7) = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2
          kl(lane, 3, 8) = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2
          kl(lane, 4, 1) = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0
          kl(lane, 4, 2) = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1
          kl(lane, 4, 3) = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2
          kl(lane, 4, 4) = -A_3_1*cz1_3 - A_3_2*cz2_3 - cy3_3*cz3_3 - cy4_3*cz4_3
          kl(lane, 4, 5) = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3
          kl(lane, 4, 6) = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3
          kl(lane, 4, 7) = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3
          kl(lane, 4, 8) = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3
          kl(lane, 5, 1) = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0
          kl(lane, 5, 2) = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1
          kl(lane, 5, 3) = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2
          kl(lane, 5, 4) = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3
          kl(lane, 5, 5) = -A_4_0*cz0_4 - A_4_2*cz2_4 - cy1_4*cz1_4 - cy3_4*cz3_4 - cy4_4*cz4_4
          kl(lane, 5, 6) = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4
          kl(lane, 5, 7) = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4
          kl(lane, 5, 8) = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4
          kl(lane, 6, 1) = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0
          kl(lane, 6, 2) = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1
          kl(lane, 6, 3) = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2
          kl(lane, 6, 4) = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3
          kl(lane, 6, 5) = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4
          kl(lane, 6, 6) = -A_5_1*cz1_5 - A_5_2*cz2_5 - cy3_5*cz3_5 - cy4_5*cz4_5
          kl(lane, 6, 7) = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5
          kl(lane, 6, 8) = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5
          kl(lane, 7, 1) = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0
          kl(lane, 7, 2) = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1
          kl(lane, 7, 3) = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2
          kl(lane, 7, 4) = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3
          kl(lane, 7, 5) = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4
          kl(lane, 7, 6) = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5
          kl(lane, 7, 7) = -A_6_0*cz0_6 - A_6_2*cz2_6 - cy1_6*cz1_6 - cy3_6*cz3_6 - cy4_6*cz4_6
          kl(lane, 7, 8) = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6
          kl(lane, 8, 1) = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0
          kl(lane, 8, 2) = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1
          kl(lane, 8, 3) = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2
          kl(lane, 8, 4) = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3
          kl(lane, 8, 5) = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4
          kl(lane, 8, 6) = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5
          kl(lane, 8, 7) = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6
          kl(lane, 8, 8) = -A_7_1*cz1_7 - A_7_2*cz2_7 - cy3_7*cz3_7 - cy4_7*cz4_7
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine q4_hybrid5_plane_stress_stiffness_batch

  pure subroutine q4_hybrid5_plane_stress_validity_one(xy, detJ_min)
    real(dp), intent(in) :: xy(2, 4)
    real(dp), intent(out) :: detJ_min
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, dmin
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    block   ! gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ
      q0 = -0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = -0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      dmin = detJ
    end block
    block   ! gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 - 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 - 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 + 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 + 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 + 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 - 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 - 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ
      q0 = 0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = 0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    detJ_min = dmin
  end subroutine q4_hybrid5_plane_stress_validity_one

  pure subroutine q4_hybrid5_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_q4_hybrid5_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_hybrid5_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine q4_hybrid5_plane_stress_validity

  pure subroutine q4_hybrid5_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 4), u(8)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 4), stress(3, 4)
    real(dp), parameter :: t = 1.0_dp
    ! c0 = eta/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c0(4) = [-0.39433756729740643_dp, -0.39433756729740643_dp, &
        -0.10566243270259355_dp, -0.10566243270259355_dp]
    ! c1 = xi/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c1(4) = [-0.39433756729740643_dp, -0.10566243270259355_dp, &
        -0.39433756729740643_dp, -0.10566243270259355_dp]
    ! c2 = 1/4 - eta/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c2(4) = [0.39433756729740643_dp, 0.39433756729740643_dp, &
        0.10566243270259355_dp, 0.10566243270259355_dp]
    ! c3 = -xi/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c3(4) = [-0.10566243270259355_dp, -0.39433756729740643_dp, &
        -0.10566243270259355_dp, -0.39433756729740643_dp]
    ! c4 = eta/4 + 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c4(4) = [0.10566243270259355_dp, 0.10566243270259355_dp, &
        0.39433756729740643_dp, 0.39433756729740643_dp]
    ! c5 = xi/4 + 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c5(4) = [0.10566243270259355_dp, 0.39433756729740643_dp, &
        0.10566243270259355_dp, 0.39433756729740643_dp]
    ! c6 = -eta/4 - 1/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c6(4) = [-0.10566243270259355_dp, -0.10566243270259355_dp, &
        -0.39433756729740643_dp, -0.39433756729740643_dp]
    ! c7 = 1/4 - xi/4 at the points of gauss-2x2
    real(dp), parameter :: KR0_c7(4) = [0.39433756729740643_dp, 0.10566243270259355_dp, &
        0.39433756729740643_dp, 0.10566243270259355_dp]
    ! eta = eta at the points of gauss-2x2
    real(dp), parameter :: KR0_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
        0.5773502691896257_dp, 0.5773502691896257_dp]
    ! w = the point weight at the points of gauss-2x2
    real(dp), parameter :: KR0_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
    ! xi = xi at the points of gauss-2x2
    real(dp), parameter :: KR0_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
        -0.5773502691896257_dp, 0.5773502691896257_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, u1, u2, u3, u4, u5, u6, u7, u8, m0, m1, m2, m3, m4
    real(dp) :: m5, m6, m7, m8, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, e0, e1, e2, e3, e4
    real(dp) :: e5, e6, e7, e8, e9, e10, e11, e12, e13, e14, e15, A_0_0, A_0_2, A_0_3, A_0_4, A_1_1
    real(dp) :: A_1_2, A_1_3, A_1_4, A_2_0, A_2_2, A_2_3, A_2_4, A_3_1, A_3_2, A_3_3, A_3_4, A_4_0
    real(dp) :: A_4_2, A_4_3, A_4_4, A_5_1, A_5_2, A_5_3, A_5_4, A_6_0, A_6_2, A_6_3, A_6_4, A_7_1
    real(dp) :: A_7_2, A_7_3, A_7_4, H_0_0, H_0_1, H_0_3, H_0_4, H_1_1, H_1_3, H_1_4, H_2_2, H_2_3
    real(dp) :: H_2_4, H_3_3, H_3_4, H_4_4, cid0, cL1_0, cL3_0, cL4_0, cd1, cid1, cL3_1, cL4_1, cid2
    real(dp) :: cL3_2, cL4_2, cd3, cid3, cL4_3, cd4, cid4, cb0, cb1, cb2, cb3, cb4, cy1_0, cy3_0, cy4_0
    real(dp) :: alpha5, alpha4, alpha3, alpha2, alpha1
    integer :: p
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    u1 = u(1)
    u2 = u(2)
    u3 = u(3)
    u4 = u(4)
    u5 = u(5)
    u6 = u(6)
    u7 = u(7)
    u8 = u(8)
    m0 = -1.0_dp/E
    m1 = nu/E
    m2 = -(2.0_dp + 2.0_dp*nu)/E
    m3 = 1.0_dp/E
    m4 = -nu/E
    m5 = (2.0_dp + 2.0_dp*nu)/E
    m6 = E/(1.0_dp - nu*nu)
    m7 = E*nu/(1.0_dp - nu*nu)
    m8 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
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
    A_0_0 = 0.0_dp
    A_0_2 = 0.0_dp
    A_0_3 = 0.0_dp
    A_0_4 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_1_3 = 0.0_dp
    A_1_4 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_2 = 0.0_dp
    A_2_3 = 0.0_dp
    A_2_4 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_3_3 = 0.0_dp
    A_3_4 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_2 = 0.0_dp
    A_4_3 = 0.0_dp
    A_4_4 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_5_3 = 0.0_dp
    A_5_4 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_2 = 0.0_dp
    A_6_3 = 0.0_dp
    A_6_4 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_7_3 = 0.0_dp
    A_7_4 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_3 = 0.0_dp
    H_0_4 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_3 = 0.0_dp
    H_1_4 = 0.0_dp
    H_2_2 = 0.0_dp
    H_2_3 = 0.0_dp
    H_2_4 = 0.0_dp
    H_3_3 = 0.0_dp
    H_3_4 = 0.0_dp
    H_4_4 = 0.0_dp
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
        real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, T1, T2, T3
        real(dp) :: T4, T5, T6, s7, s8, s9, T10, T11, T12, T13, T14, T15, q0, q1, q2, q3, q4, q5, q6, q7
        c0 = KR0_c0(p)
        c1 = KR0_c1(p)
        c2 = KR0_c2(p)
        c3 = KR0_c3(p)
        c4 = KR0_c4(p)
        c5 = KR0_c5(p)
        c6 = KR0_c6(p)
        c7 = KR0_c7(p)
        eta = KR0_eta(p)
        w = KR0_w(p)
        xi = KR0_xi(p)
        J00 = gx_1_0 + eta*gx_1_1
        J01 = gy_1_0 + eta*gy_1_1
        J10 = gx_0_1 + gx_1_1*xi
        J11 = gy_0_1 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
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
        A_0_0 = A_0_0 + (q0)
        A_0_2 = A_0_2 + (q1)
        A_0_3 = A_0_3 + (T1*dNdx1 + T3*dNdy1)
        A_0_4 = A_0_4 + (T4*dNdx1 + T6*dNdy1)
        A_1_1 = A_1_1 + (q1)
        A_1_2 = A_1_2 + (q0)
        A_1_3 = A_1_3 + (T2*dNdy1 + T3*dNdx1)
        A_1_4 = A_1_4 + (T5*dNdy1 + T6*dNdx1)
        A_2_0 = A_2_0 + (q2)
        A_2_2 = A_2_2 + (q3)
        A_2_3 = A_2_3 + (T1*dNdx2 + T3*dNdy2)
        A_2_4 = A_2_4 + (T4*dNdx2 + T6*dNdy2)
        A_3_1 = A_3_1 + (q3)
        A_3_2 = A_3_2 + (q2)
        A_3_3 = A_3_3 + (T2*dNdy2 + T3*dNdx2)
        A_3_4 = A_3_4 + (T5*dNdy2 + T6*dNdx2)
        A_4_0 = A_4_0 + (q4)
        A_4_2 = A_4_2 + (q5)
        A_4_3 = A_4_3 + (T1*dNdx3 + T3*dNdy3)
        A_4_4 = A_4_4 + (T4*dNdx3 + T6*dNdy3)
        A_5_1 = A_5_1 + (q5)
        A_5_2 = A_5_2 + (q4)
        A_5_3 = A_5_3 + (T2*dNdy3 + T3*dNdx3)
        A_5_4 = A_5_4 + (T5*dNdy3 + T6*dNdx3)
        A_6_0 = A_6_0 + (q6)
        A_6_2 = A_6_2 + (q7)
        A_6_3 = A_6_3 + (T1*dNdx4 + T3*dNdy4)
        A_6_4 = A_6_4 + (T4*dNdx4 + T6*dNdy4)
        A_7_1 = A_7_1 + (q7)
        A_7_2 = A_7_2 + (q6)
        A_7_3 = A_7_3 + (T2*dNdy4 + T3*dNdx4)
        A_7_4 = A_7_4 + (T5*dNdy4 + T6*dNdx4)
        H_0_0 = H_0_0 + (s7)
        H_0_1 = H_0_1 + (s8)
        H_0_3 = H_0_3 + (T10)
        H_0_4 = H_0_4 + (T13)
        H_1_1 = H_1_1 + (s7)
        H_1_3 = H_1_3 + (T11)
        H_1_4 = H_1_4 + (T14)
        H_2_2 = H_2_2 + (s9)
        H_2_3 = H_2_3 + (T12)
        H_2_4 = H_2_4 + (T15)
        H_3_3 = H_3_3 + (T10*e0*eta + T11*e2*eta + T12*e4*eta)
        H_3_4 = H_3_4 + (T13*e0*eta + T14*e2*eta + T15*e4*eta)
        H_4_4 = H_4_4 + (T13*e1*xi + T14*e3*xi + T15*e5*xi)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL3_0 = H_0_3*cid0
    cL4_0 = H_0_4*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0)
    cid2 = 1.0_dp/H_2_2
    cL3_2 = H_2_3*cid2
    cL4_2 = H_2_4*cid2
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1
    cid3 = 1.0_dp/cd3
    cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1)
    cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3
    cid4 = 1.0_dp/cd4
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
    block   ! gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: eps16, eps17, eps18
      eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257_dp*e7 - 0.5773502691896257_dp*e6) &
          + alpha5*(0.5773502691896257_dp*e9 - 0.5773502691896257_dp*e8)
      eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257_dp*e11 &
          - 0.5773502691896257_dp*e10) + alpha5*(0.5773502691896257_dp*e13 &
          - 0.5773502691896257_dp*e12)
      eps18 = alpha3*m5 - 0.5773502691896257_dp*alpha4*e14 - 0.5773502691896257_dp*alpha5*e15
      strain(1, 1) = eps16
      strain(2, 1) = eps17
      strain(3, 1) = eps18
      stress(1, 1) = eps16*m6 + eps17*m7
      stress(2, 1) = eps16*m7 + eps17*m6
      stress(3, 1) = eps18*m8
    end block
    block   ! gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: eps16, eps17, eps18
      eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257_dp*e7 - 0.5773502691896257_dp*e6) &
          + alpha5*(0.5773502691896257_dp*e8 - 0.5773502691896257_dp*e9)
      eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257_dp*e11 &
          - 0.5773502691896257_dp*e10) + alpha5*(0.5773502691896257_dp*e12 &
          - 0.5773502691896257_dp*e13)
      eps18 = alpha3*m5 + 0.5773502691896257_dp*alpha5*e15 - 0.5773502691896257_dp*alpha4*e14
      strain(1, 2) = eps16
      strain(2, 2) = eps17
      strain(3, 2) = eps18
      stress(1, 2) = eps16*m6 + eps17*m7
      stress(2, 2) = eps16*m7 + eps17*m6
      stress(3, 2) = eps18*m8
    end block
    block   ! gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: eps16, eps17, eps18
      eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257_dp*e6 - 0.5773502691896257_dp*e7) &
          + alpha5*(0.5773502691896257_dp*e9 - 0.5773502691896257_dp*e8)
      eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257_dp*e10 &
          - 0.5773502691896257_dp*e11) + alpha5*(0.5773502691896257_dp*e13 &
          - 0.5773502691896257_dp*e12)
      eps18 = alpha3*m5 + 0.5773502691896257_dp*alpha4*e14 - 0.5773502691896257_dp*alpha5*e15
      strain(1, 3) = eps16
      strain(2, 3) = eps17
      strain(3, 3) = eps18
      stress(1, 3) = eps16*m6 + eps17*m7
      stress(2, 3) = eps16*m7 + eps17*m6
      stress(3, 3) = eps18*m8
    end block
    block   ! gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: eps16, eps17, eps18
      eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257_dp*e6 - 0.5773502691896257_dp*e7) &
          + alpha5*(0.5773502691896257_dp*e8 - 0.5773502691896257_dp*e9)
      eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257_dp*e10 &
          - 0.5773502691896257_dp*e11) + alpha5*(0.5773502691896257_dp*e12 &
          - 0.5773502691896257_dp*e13)
      eps18 = alpha3*m5 + 0.5773502691896257_dp*alpha4*e14 + 0.5773502691896257_dp*alpha5*e15
      strain(1, 4) = eps16
      strain(2, 4) = eps17
      strain(3, 4) = eps18
      stress(1, 4) = eps16*m6 + eps17*m7
      stress(2, 4) = eps16*m7 + eps17*m6
      stress(3, 4) = eps18*m8
    end block
  end subroutine q4_hybrid5_plane_stress_recovery_one

  pure subroutine q4_hybrid5_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_q4_hybrid5_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n), u(8, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 4, n)
    real(dp), intent(out) :: stress(3, 4, n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_hybrid5_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine q4_hybrid5_plane_stress_recovery

end module derive_q4_hybrid5_plane_stress
