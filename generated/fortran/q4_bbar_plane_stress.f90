! derive generated kernel: Q4 bbar plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
! formulation  B-bar, dilatation projected on a constant pressure (mean dilatation): K_dev + kappa
!              g^T M_p^-1 g [Hughes (1980); Nagtegaal, Parks & Rice (1974)]
! integration  B^T D_dev B: gauss-2x2 (4 points); B^T m pi (g): gauss-2x2 (4 points); -pi^T pi /
!              kappa (-M_p / kappa): gauss-2x2 (4 points)
! internal     1 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
!              (unrolled factorisation of K_aa, no pivoting)
! flops        stiffness 1144, validity 142, recovery 807 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 1
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
!              derive kernel Q4 --variant bbar --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c q4_bbar_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 4, n) is the same memory as C xy[n][4][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_q4_bbar_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: q4_bbar_plane_stress_stiffness, q4_bbar_plane_stress_stiffness_batch, &
            q4_bbar_plane_stress_validity, q4_bbar_plane_stress_recovery

contains

  pure subroutine q4_bbar_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_q4_bbar_plane_stress_stiffness_f")
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
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, m0, m1, m2, m3, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0
    real(dp) :: gy_1_1, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_1_1, K_1_2, K_1_3
    real(dp) :: K_1_4, K_1_5, K_1_6, K_1_7, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_3_3, K_3_4
    real(dp) :: K_3_5, K_3_6, K_3_7, K_4_4, K_4_5, K_4_6, K_4_7, K_5_5, K_5_6, K_5_7, K_6_6, K_6_7
    real(dp) :: K_7_7, A_0_0, A_1_0, A_2_0, A_3_0, A_4_0, A_5_0, A_6_0, A_7_0, H_0_0, cid0, cz0_0
    real(dp) :: cz0_1, cz0_2, cz0_3, cz0_4, cz0_5, cz0_6, cz0_7
    integer :: p
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    m0 = 2.0_dp*E/(3.0_dp + 3.0_dp*nu)
    m1 = -E/(3.0_dp + 3.0_dp*nu)
    m2 = E/(2.0_dp + 2.0_dp*nu)
    m3 = -(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    K_0_0 = 0.0_dp
    K_0_1 = 0.0_dp
    K_0_2 = 0.0_dp
    K_0_3 = 0.0_dp
    K_0_4 = 0.0_dp
    K_0_5 = 0.0_dp
    K_0_6 = 0.0_dp
    K_0_7 = 0.0_dp
    K_1_1 = 0.0_dp
    K_1_2 = 0.0_dp
    K_1_3 = 0.0_dp
    K_1_4 = 0.0_dp
    K_1_5 = 0.0_dp
    K_1_6 = 0.0_dp
    K_1_7 = 0.0_dp
    K_2_2 = 0.0_dp
    K_2_3 = 0.0_dp
    K_2_4 = 0.0_dp
    K_2_5 = 0.0_dp
    K_2_6 = 0.0_dp
    K_2_7 = 0.0_dp
    K_3_3 = 0.0_dp
    K_3_4 = 0.0_dp
    K_3_5 = 0.0_dp
    K_3_6 = 0.0_dp
    K_3_7 = 0.0_dp
    K_4_4 = 0.0_dp
    K_4_5 = 0.0_dp
    K_4_6 = 0.0_dp
    K_4_7 = 0.0_dp
    K_5_5 = 0.0_dp
    K_5_6 = 0.0_dp
    K_5_7 = 0.0_dp
    K_6_6 = 0.0_dp
    K_6_7 = 0.0_dp
    K_7_7 = 0.0_dp
    A_0_0 = 0.0_dp
    A_1_0 = 0.0_dp
    A_2_0 = 0.0_dp
    A_3_0 = 0.0_dp
    A_4_0 = 0.0_dp
    A_5_0 = 0.0_dp
    A_6_0 = 0.0_dp
    A_7_0 = 0.0_dp
    H_0_0 = 0.0_dp
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
        real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, s1, s2, s3
        real(dp) :: T4, T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22
        real(dp) :: T23, T24, T25, T26, T27, s28
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
        s28 = m3*sc0
        K_0_0 = K_0_0 + (T4*dNdx1 + T6*dNdy1)
        K_0_1 = K_0_1 + (T7*dNdx1 + T9*dNdy1)
        K_0_2 = K_0_2 + (T10*dNdx1 + T12*dNdy1)
        K_0_3 = K_0_3 + (T13*dNdx1 + T15*dNdy1)
        K_0_4 = K_0_4 + (T16*dNdx1 + T18*dNdy1)
        K_0_5 = K_0_5 + (T19*dNdx1 + T21*dNdy1)
        K_0_6 = K_0_6 + (T22*dNdx1 + T24*dNdy1)
        K_0_7 = K_0_7 + (T25*dNdx1 + T27*dNdy1)
        K_1_1 = K_1_1 + (T8*dNdy1 + T9*dNdx1)
        K_1_2 = K_1_2 + (T11*dNdy1 + T12*dNdx1)
        K_1_3 = K_1_3 + (T14*dNdy1 + T15*dNdx1)
        K_1_4 = K_1_4 + (T17*dNdy1 + T18*dNdx1)
        K_1_5 = K_1_5 + (T20*dNdy1 + T21*dNdx1)
        K_1_6 = K_1_6 + (T23*dNdy1 + T24*dNdx1)
        K_1_7 = K_1_7 + (T26*dNdy1 + T27*dNdx1)
        K_2_2 = K_2_2 + (T10*dNdx2 + T12*dNdy2)
        K_2_3 = K_2_3 + (T13*dNdx2 + T15*dNdy2)
        K_2_4 = K_2_4 + (T16*dNdx2 + T18*dNdy2)
        K_2_5 = K_2_5 + (T19*dNdx2 + T21*dNdy2)
        K_2_6 = K_2_6 + (T22*dNdx2 + T24*dNdy2)
        K_2_7 = K_2_7 + (T25*dNdx2 + T27*dNdy2)
        K_3_3 = K_3_3 + (T14*dNdy2 + T15*dNdx2)
        K_3_4 = K_3_4 + (T17*dNdy2 + T18*dNdx2)
        K_3_5 = K_3_5 + (T20*dNdy2 + T21*dNdx2)
        K_3_6 = K_3_6 + (T23*dNdy2 + T24*dNdx2)
        K_3_7 = K_3_7 + (T26*dNdy2 + T27*dNdx2)
        K_4_4 = K_4_4 + (T16*dNdx3 + T18*dNdy3)
        K_4_5 = K_4_5 + (T19*dNdx3 + T21*dNdy3)
        K_4_6 = K_4_6 + (T22*dNdx3 + T24*dNdy3)
        K_4_7 = K_4_7 + (T25*dNdx3 + T27*dNdy3)
        K_5_5 = K_5_5 + (T20*dNdy3 + T21*dNdx3)
        K_5_6 = K_5_6 + (T23*dNdy3 + T24*dNdx3)
        K_5_7 = K_5_7 + (T26*dNdy3 + T27*dNdx3)
        K_6_6 = K_6_6 + (T22*dNdx4 + T24*dNdy4)
        K_6_7 = K_6_7 + (T25*dNdx4 + T27*dNdy4)
        K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
        A_0_0 = A_0_0 + (dNdx1*sc0)
        A_1_0 = A_1_0 + (dNdy1*sc0)
        A_2_0 = A_2_0 + (dNdx2*sc0)
        A_3_0 = A_3_0 + (dNdy2*sc0)
        A_4_0 = A_4_0 + (dNdx3*sc0)
        A_5_0 = A_5_0 + (dNdy3*sc0)
        A_6_0 = A_6_0 + (dNdx4*sc0)
        A_7_0 = A_7_0 + (dNdy4*sc0)
        H_0_0 = H_0_0 + (s28)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cz0_0 = A_0_0*cid0
    cz0_1 = A_1_0*cid0
    cz0_2 = A_2_0*cid0
    cz0_3 = A_3_0*cid0
    cz0_4 = A_4_0*cid0
    cz0_5 = A_5_0*cid0
    cz0_6 = A_6_0*cid0
    cz0_7 = A_7_0*cid0
    K(1, 1) = K_0_0 - A_0_0*cz0_0
    K(1, 2) = K_0_1 - A_1_0*cz0_0
    K(1, 3) = K_0_2 - A_2_0*cz0_0
    K(1, 4) = K_0_3 - A_3_0*cz0_0
    K(1, 5) = K_0_4 - A_4_0*cz0_0
    K(1, 6) = K_0_5 - A_5_0*cz0_0
    K(1, 7) = K_0_6 - A_6_0*cz0_0
    K(1, 8) = K_0_7 - A_7_0*cz0_0
    K(2, 1) = K_0_1 - A_1_0*cz0_0
    K(2, 2) = K_1_1 - A_1_0*cz0_1
    K(2, 3) = K_1_2 - A_2_0*cz0_1
    K(2, 4) = K_1_3 - A_3_0*cz0_1
    K(2, 5) = K_1_4 - A_4_0*cz0_1
    K(2, 6) = K_1_5 - A_5_0*cz0_1
    K(2, 7) = K_1_6 - A_6_0*cz0_1
    K(2, 8) = K_1_7 - A_7_0*cz0_1
    K(3, 1) = K_0_2 - A_2_0*cz0_0
    K(3, 2) = K_1_2 - A_2_0*cz0_1
    K(3, 3) = K_2_2 - A_2_0*cz0_2
    K(3, 4) = K_2_3 - A_3_0*cz0_2
    K(3, 5) = K_2_4 - A_4_0*cz0_2
    K(3, 6) = K_2_5 - A_5_0*cz0_2
    K(3, 7) = K_2_6 - A_6_0*cz0_2
    K(3, 8) = K_2_7 - A_7_0*cz0_2
    K(4, 1) = K_0_3 - A_3_0*cz0_0
    K(4, 2) = K_1_3 - A_3_0*cz0_1
    K(4, 3) = K_2_3 - A_3_0*cz0_2
    K(4, 4) = K_3_3 - A_3_0*cz0_3
    K(4, 5) = K_3_4 - A_4_0*cz0_3
    K(4, 6) = K_3_5 - A_5_0*cz0_3
    K(4, 7) = K_3_6 - A_6_0*cz0_3
    K(4, 8) = K_3_7 - A_7_0*cz0_3
    K(5, 1) = K_0_4 - A_4_0*cz0_0
    K(5, 2) = K_1_4 - A_4_0*cz0_1
    K(5, 3) = K_2_4 - A_4_0*cz0_2
    K(5, 4) = K_3_4 - A_4_0*cz0_3
    K(5, 5) = K_4_4 - A_4_0*cz0_4
    K(5, 6) = K_4_5 - A_5_0*cz0_4
    K(5, 7) = K_4_6 - A_6_0*cz0_4
    K(5, 8) = K_4_7 - A_7_0*cz0_4
    K(6, 1) = K_0_5 - A_5_0*cz0_0
    K(6, 2) = K_1_5 - A_5_0*cz0_1
    K(6, 3) = K_2_5 - A_5_0*cz0_2
    K(6, 4) = K_3_5 - A_5_0*cz0_3
    K(6, 5) = K_4_5 - A_5_0*cz0_4
    K(6, 6) = K_5_5 - A_5_0*cz0_5
    K(6, 7) = K_5_6 - A_6_0*cz0_5
    K(6, 8) = K_5_7 - A_7_0*cz0_5
    K(7, 1) = K_0_6 - A_6_0*cz0_0
    K(7, 2) = K_1_6 - A_6_0*cz0_1
    K(7, 3) = K_2_6 - A_6_0*cz0_2
    K(7, 4) = K_3_6 - A_6_0*cz0_3
    K(7, 5) = K_4_6 - A_6_0*cz0_4
    K(7, 6) = K_5_6 - A_6_0*cz0_5
    K(7, 7) = K_6_6 - A_6_0*cz0_6
    K(7, 8) = K_6_7 - A_7_0*cz0_6
    K(8, 1) = K_0_7 - A_7_0*cz0_0
    K(8, 2) = K_1_7 - A_7_0*cz0_1
    K(8, 3) = K_2_7 - A_7_0*cz0_2
    K(8, 4) = K_3_7 - A_7_0*cz0_3
    K(8, 5) = K_4_7 - A_7_0*cz0_4
    K(8, 6) = K_5_7 - A_7_0*cz0_5
    K(8, 7) = K_6_7 - A_7_0*cz0_6
    K(8, 8) = K_7_7 - A_7_0*cz0_7
  end subroutine q4_bbar_plane_stress_stiffness

  pure subroutine q4_bbar_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_q4_bbar_plane_stress_stiffness_batch_f")
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
    real(dp) :: m0, m1, m2, m3
    m0 = 2.0_dp*E/(3.0_dp + 3.0_dp*nu)
    m1 = -E/(3.0_dp + 3.0_dp*nu)
    m2 = E/(2.0_dp + 2.0_dp*nu)
    m3 = -(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
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
          real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, K_0_0
          real(dp) :: K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5
          real(dp) :: K_1_6, K_1_7, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_3_3, K_3_4, K_3_5, K_3_6
          real(dp) :: K_3_7, K_4_4, K_4_5, K_4_6, K_4_7, K_5_5, K_5_6, K_5_7, K_6_6, K_6_7, K_7_7, A_0_0
          real(dp) :: A_1_0, A_2_0, A_3_0, A_4_0, A_5_0, A_6_0, A_7_0, H_0_0, cid0, cz0_0, cz0_1, cz0_2
          real(dp) :: cz0_3, cz0_4, cz0_5, cz0_6, cz0_7
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
          K_0_0 = 0.0_dp
          K_0_1 = 0.0_dp
          K_0_2 = 0.0_dp
          K_0_3 = 0.0_dp
          K_0_4 = 0.0_dp
          K_0_5 = 0.0_dp
          K_0_6 = 0.0_dp
          K_0_7 = 0.0_dp
          K_1_1 = 0.0_dp
          K_1_2 = 0.0_dp
          K_1_3 = 0.0_dp
          K_1_4 = 0.0_dp
          K_1_5 = 0.0_dp
          K_1_6 = 0.0_dp
          K_1_7 = 0.0_dp
          K_2_2 = 0.0_dp
          K_2_3 = 0.0_dp
          K_2_4 = 0.0_dp
          K_2_5 = 0.0_dp
          K_2_6 = 0.0_dp
          K_2_7 = 0.0_dp
          K_3_3 = 0.0_dp
          K_3_4 = 0.0_dp
          K_3_5 = 0.0_dp
          K_3_6 = 0.0_dp
          K_3_7 = 0.0_dp
          K_4_4 = 0.0_dp
          K_4_5 = 0.0_dp
          K_4_6 = 0.0_dp
          K_4_7 = 0.0_dp
          K_5_5 = 0.0_dp
          K_5_6 = 0.0_dp
          K_5_7 = 0.0_dp
          K_6_6 = 0.0_dp
          K_6_7 = 0.0_dp
          K_7_7 = 0.0_dp
          A_0_0 = 0.0_dp
          A_1_0 = 0.0_dp
          A_2_0 = 0.0_dp
          A_3_0 = 0.0_dp
          A_4_0 = 0.0_dp
          A_5_0 = 0.0_dp
          A_6_0 = 0.0_dp
          A_7_0 = 0.0_dp
          H_0_0 = 0.0_dp
          do p = 1, 4   ! gauss-2x2: loop over the 4 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
              real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, s1, s2, s3
              real(dp) :: T4, T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22
              real(dp) :: T23, T24, T25, T26, T27, s28
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
              s28 = m3*sc0
              K_0_0 = K_0_0 + (T4*dNdx1 + T6*dNdy1)
              K_0_1 = K_0_1 + (T7*dNdx1 + T9*dNdy1)
              K_0_2 = K_0_2 + (T10*dNdx1 + T12*dNdy1)
              K_0_3 = K_0_3 + (T13*dNdx1 + T15*dNdy1)
              K_0_4 = K_0_4 + (T16*dNdx1 + T18*dNdy1)
              K_0_5 = K_0_5 + (T19*dNdx1 + T21*dNdy1)
              K_0_6 = K_0_6 + (T22*dNdx1 + T24*dNdy1)
              K_0_7 = K_0_7 + (T25*dNdx1 + T27*dNdy1)
              K_1_1 = K_1_1 + (T8*dNdy1 + T9*dNdx1)
              K_1_2 = K_1_2 + (T11*dNdy1 + T12*dNdx1)
              K_1_3 = K_1_3 + (T14*dNdy1 + T15*dNdx1)
              K_1_4 = K_1_4 + (T17*dNdy1 + T18*dNdx1)
              K_1_5 = K_1_5 + (T20*dNdy1 + T21*dNdx1)
              K_1_6 = K_1_6 + (T23*dNdy1 + T24*dNdx1)
              K_1_7 = K_1_7 + (T26*dNdy1 + T27*dNdx1)
              K_2_2 = K_2_2 + (T10*dNdx2 + T12*dNdy2)
              K_2_3 = K_2_3 + (T13*dNdx2 + T15*dNdy2)
              K_2_4 = K_2_4 + (T16*dNdx2 + T18*dNdy2)
              K_2_5 = K_2_5 + (T19*dNdx2 + T21*dNdy2)
              K_2_6 = K_2_6 + (T22*dNdx2 + T24*dNdy2)
              K_2_7 = K_2_7 + (T25*dNdx2 + T27*dNdy2)
              K_3_3 = K_3_3 + (T14*dNdy2 + T15*dNdx2)
              K_3_4 = K_3_4 + (T17*dNdy2 + T18*dNdx2)
              K_3_5 = K_3_5 + (T20*dNdy2 + T21*dNdx2)
              K_3_6 = K_3_6 + (T23*dNdy2 + T24*dNdx2)
              K_3_7 = K_3_7 + (T26*dNdy2 + T27*dNdx2)
              K_4_4 = K_4_4 + (T16*dNdx3 + T18*dNdy3)
              K_4_5 = K_4_5 + (T19*dNdx3 + T21*dNdy3)
              K_4_6 = K_4_6 + (T22*dNdx3 + T24*dNdy3)
              K_4_7 = K_4_7 + (T25*dNdx3 + T27*dNdy3)
              K_5_5 = K_5_5 + (T20*dNdy3 + T21*dNdx3)
              K_5_6 = K_5_6 + (T23*dNdy3 + T24*dNdx3)
              K_5_7 = K_5_7 + (T26*dNdy3 + T27*dNdx3)
              K_6_6 = K_6_6 + (T22*dNdx4 + T24*dNdy4)
              K_6_7 = K_6_7 + (T25*dNdx4 + T27*dNdy4)
              K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
              A_0_0 = A_0_0 + (dNdx1*sc0)
              A_1_0 = A_1_0 + (dNdy1*sc0)
              A_2_0 = A_2_0 + (dNdx2*sc0)
              A_3_0 = A_3_0 + (dNdy2*sc0)
              A_4_0 = A_4_0 + (dNdx3*sc0)
              A_5_0 = A_5_0 + (dNdy3*sc0)
              A_6_0 = A_6_0 + (dNdx4*sc0)
              A_7_0 = A_7_0 + (dNdy4*sc0)
              H_0_0 = H_0_0 + (s28)
            end block
          end do
          ! static condensation of the internal unknowns
          cid0 = 1.0_dp/H_0_0
          cz0_0 = A_0_0*cid0
          cz0_1 = A_1_0*cid0
          cz0_2 = A_2_0*cid0
          cz0_3 = A_3_0*cid0
          cz0_4 = A_4_0*cid0
          cz0_5 = A_5_0*cid0
          cz0_6 = A_6_0*cid0
          cz0_7 = A_7_0*cid0
          kl(lane, 1, 1) = K_0_0 - A_0_0*cz0_0
          kl(lane, 1, 2) = K_0_1 - A_1_0*cz0_0
          kl(lane, 1, 3) = K_0_2 - A_2_0*cz0_0
          kl(lane, 1, 4) = K_0_3 - A_3_0*cz0_0
          kl(lane, 1, 5) = K_0_4 - A_4_0*cz0_0
          kl(lane, 1, 6) = K_0_5 - A_5_0*cz0_0
          kl(lane, 1, 7) = K_0_6 - A_6_0*cz0_0
          kl(lane, 1, 8) = K_0_7 - A_7_0*cz0_0
          kl(lane, 2, 1) = K_0_1 - A_1_0*cz0_0
          kl(lane, 2, 2) = K_1_1 - A_1_0*cz0_1
          kl(lane, 2, 3) = K_1_2 - A_2_0*cz0_1
          kl(lane, 2, 4) = K_1_3 - A_3_0*cz0_1
          kl(lane, 2, 5) = K_1_4 - A_4_0*cz0_1
          kl(lane, 2, 6) = K_1_5 - A_5_0*cz0_1
          kl(lane, 2, 7) = K_1_6 - A_6_0*cz0_1
          kl(lane, 2, 8) = K_1_7 - A_7_0*cz0_1
          kl(lane, 3, 1) = K_0_2 - A_2_0*cz0_0
          kl(lane, 3, 2) = K_1_2 - A_2_0*cz0_1
          kl(lane, 3, 3) = K_2_2 - A_2_0*cz0_2
          kl(lane, 3, 4) = K_2_3 - A_3_0*cz0_2
          kl(lane, 3, 5) = K_2_4 - A_4_0*cz0_2
          kl(lane, 3, 6) = K_2_5 - A_5_0*cz0_2
          kl(lane, 3, 7) = K_2_6 - A_6_0*cz0_2
          kl(lane, 3, 8) = K_2_7 - A_7_0*cz0_2
          kl(lane, 4, 1) = K_0_3 - A_3_0*cz0_0
          kl(lane, 4, 2) = K_1_3 - A_3_0*cz0_1
          kl(lane, 4, 3) = K_2_3 - A_3_0*cz0_2
          kl(lane, 4, 4) = K_3_3 - A_3_0*cz0_3
          kl(lane, 4, 5) = K_3_4 - A_4_0*cz0_3
          kl(lane, 4, 6) = K_3_5 - A_5_0*cz0_3
          kl(lane, 4, 7) = K_3_6 - A_6_0*cz0_3
          kl(lane, 4, 8) = K_3_7 - A_7_0*cz0_3
          kl(lane, 5, 1) = K_0_4 - A_4_0*cz0_0
          kl(lane, 5, 2) = K_1_4 - A_4_0*cz0_1
          kl(lane, 5, 3) = K_2_4 - A_4_0*cz0_2
          kl(lane, 5, 4) = K_3_4 - A_4_0*cz0_3
          kl(lane, 5, 5) = K_4_4 - A_4_0*cz0_4
          kl(lane, 5, 6) = K_4_5 - A_5_0*cz0_4
          kl(lane, 5, 7) = K_4_6 - A_6_0*cz0_4
          kl(lane, 5, 8) = K_4_7 - A_7_0*cz0_4
          kl(lane, 6, 1) = K_0_5 - A_5_0*cz0_0
          kl(lane, 6, 2) = K_1_5 - A_5_0*cz0_1
          kl(lane, 6, 3) = K_2_5 - A_5_0*cz0_2
          kl(lane, 6, 4) = K_3_5 - A_5_0*cz0_3
          kl(lane, 6, 5) = K_4_5 - A_5_0*cz0_4
          kl(lane, 6, 6) = K_5_5 - A_5_0*cz0_5
          kl(lane, 6, 7) = K_5_6 - A_6_0*cz0_5
          kl(lane, 6, 8) = K_5_7 - A_7_0*cz0_5
          kl(lane, 7, 1) = K_0_6 - A_6_0*cz0_0
          kl(lane, 7, 2) = K_1_6 - A_6_0*cz0_1
          kl(lane, 7, 3) = K_2_6 - A_6_0*cz0_2
          kl(lane, 7, 4) = K_3_6 - A_6_0*cz0_3
          kl(lane, 7, 5) = K_4_6 - A_6_0*cz0_4
          kl(lane, 7, 6) = K_5_6 - A_6_0*cz0_5
          kl(lane, 7, 7) = K_6_6 - A_6_0*cz0_6
          kl(lane, 7, 8) = K_6_7 - A_7_0*cz0_6
          kl(lane, 8, 1) = K_0_7 - A_7_0*cz0_0
          kl(lane, 8, 2) = K_1_7 - A_7_0*cz0_1
          kl(lane, 8, 3) = K_2_7 - A_7_0*cz0_2
          kl(lane, 8, 4) = K_3_7 - A_7_0*cz0_3
          kl(lane, 8, 5) = K_4_7 - A_7_0*cz0_4
          kl(lane, 8, 6) = K_5_7 - A_7_0*cz0_5
          kl(lane, 8, 7) = K_6_7 - A_7_0*cz0_6
          kl(lane, 8, 8) = K_7_7 - A_7_0*cz0_7
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine q4_bbar_plane_stress_stiffness_batch

  pure subroutine q4_bbar_plane_stress_validity_one(xy, detJ_min)
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
  end subroutine q4_bbar_plane_stress_validity_one

  pure subroutine q4_bbar_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_q4_bbar_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_bbar_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine q4_bbar_plane_stress_validity

  pure subroutine q4_bbar_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 4), u(8)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 4), stress(3, 4)
    real(dp), parameter :: t = 1.0_dp
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, u1, u2, u3, u4, u5, u6, u7, u8, m3, m4, m5, m6, m7
    real(dp) :: gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, A_0_0, A_1_0, A_2_0, A_3_0, A_4_0
    real(dp) :: A_5_0, A_6_0, A_7_0, H_0_0, cid0, cb0, alpha1
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
    m3 = -(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    m4 = 0.5_dp*(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    m5 = E/(1.0_dp - nu*nu)
    m6 = E*nu/(1.0_dp - nu*nu)
    m7 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    block   ! gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, s28
      q0 = -0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = -0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.39433756729740643_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy1 = -0.39433756729740643_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx2 = 0.39433756729740643_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy2 = 0.39433756729740643_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji00 + 0.10566243270259355_dp*Ji01
      dNdy3 = 0.10566243270259355_dp*Ji10 + 0.10566243270259355_dp*Ji11
      dNdx4 = 0.39433756729740643_dp*Ji01 - 0.10566243270259355_dp*Ji00
      dNdy4 = 0.39433756729740643_dp*Ji11 - 0.10566243270259355_dp*Ji10
      sc0 = detJ*t
      s28 = m3*sc0
      A_0_0 = dNdx1*sc0
      A_1_0 = dNdy1*sc0
      A_2_0 = dNdx2*sc0
      A_3_0 = dNdy2*sc0
      A_4_0 = dNdx3*sc0
      A_5_0 = dNdy3*sc0
      A_6_0 = dNdx4*sc0
      A_7_0 = dNdy4*sc0
      H_0_0 = s28
    end block
    block   ! gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, sc0, s28
      J00 = gx_1_0 - 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 - 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 + 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 + 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy1 = -0.10566243270259355_dp*Ji11 - 0.39433756729740643_dp*Ji10
      dNdx2 = 0.39433756729740643_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy2 = 0.39433756729740643_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji00 + 0.39433756729740643_dp*Ji01
      dNdy3 = 0.10566243270259355_dp*Ji10 + 0.39433756729740643_dp*Ji11
      dNdx4 = 0.10566243270259355_dp*Ji01 - 0.10566243270259355_dp*Ji00
      dNdy4 = 0.10566243270259355_dp*Ji11 - 0.10566243270259355_dp*Ji10
      sc0 = detJ*t
      s28 = m3*sc0
      A_0_0 = A_0_0 + (dNdx1*sc0)
      A_1_0 = A_1_0 + (dNdy1*sc0)
      A_2_0 = A_2_0 + (dNdx2*sc0)
      A_3_0 = A_3_0 + (dNdy2*sc0)
      A_4_0 = A_4_0 + (dNdx3*sc0)
      A_5_0 = A_5_0 + (dNdy3*sc0)
      A_6_0 = A_6_0 + (dNdx4*sc0)
      A_7_0 = A_7_0 + (dNdy4*sc0)
      H_0_0 = H_0_0 + (s28)
    end block
    block   ! gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, sc0, s28
      J00 = gx_1_0 + 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 + 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 - 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 - 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy1 = -0.10566243270259355_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx2 = 0.10566243270259355_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy2 = 0.10566243270259355_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji01 + 0.39433756729740643_dp*Ji00
      dNdy3 = 0.10566243270259355_dp*Ji11 + 0.39433756729740643_dp*Ji10
      dNdx4 = 0.39433756729740643_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy4 = 0.39433756729740643_dp*Ji11 - 0.39433756729740643_dp*Ji10
      sc0 = detJ*t
      s28 = m3*sc0
      A_0_0 = A_0_0 + (dNdx1*sc0)
      A_1_0 = A_1_0 + (dNdy1*sc0)
      A_2_0 = A_2_0 + (dNdx2*sc0)
      A_3_0 = A_3_0 + (dNdy2*sc0)
      A_4_0 = A_4_0 + (dNdx3*sc0)
      A_5_0 = A_5_0 + (dNdy3*sc0)
      A_6_0 = A_6_0 + (dNdx4*sc0)
      A_7_0 = A_7_0 + (dNdy4*sc0)
      H_0_0 = H_0_0 + (s28)
    end block
    block   ! gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0, s28
      q0 = 0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = 0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy1 = -0.10566243270259355_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx2 = 0.10566243270259355_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy2 = 0.10566243270259355_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx3 = 0.39433756729740643_dp*Ji00 + 0.39433756729740643_dp*Ji01
      dNdy3 = 0.39433756729740643_dp*Ji10 + 0.39433756729740643_dp*Ji11
      dNdx4 = 0.10566243270259355_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy4 = 0.10566243270259355_dp*Ji11 - 0.39433756729740643_dp*Ji10
      sc0 = detJ*t
      s28 = m3*sc0
      A_0_0 = A_0_0 + (dNdx1*sc0)
      A_1_0 = A_1_0 + (dNdy1*sc0)
      A_2_0 = A_2_0 + (dNdx2*sc0)
      A_3_0 = A_3_0 + (dNdy2*sc0)
      A_4_0 = A_4_0 + (dNdx3*sc0)
      A_5_0 = A_5_0 + (dNdy3*sc0)
      A_6_0 = A_6_0 + (dNdx4*sc0)
      A_7_0 = A_7_0 + (dNdy4*sc0)
      H_0_0 = H_0_0 + (s28)
    end block
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cb0 = -A_0_0*u1 - A_1_0*u2 - A_2_0*u3 - A_3_0*u4 - A_4_0*u5 - A_5_0*u6 - A_6_0*u7 - A_7_0*u8
    alpha1 = cb0*cid0
    block   ! gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, q2, eps29, eps30, eps31
      q0 = -0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = -0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.39433756729740643_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy1 = -0.39433756729740643_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx2 = 0.39433756729740643_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy2 = 0.39433756729740643_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji00 + 0.10566243270259355_dp*Ji01
      dNdy3 = 0.10566243270259355_dp*Ji10 + 0.10566243270259355_dp*Ji11
      dNdx4 = 0.39433756729740643_dp*Ji01 - 0.10566243270259355_dp*Ji00
      dNdy4 = 0.39433756729740643_dp*Ji11 - 0.10566243270259355_dp*Ji10
      q2 = alpha1*m4
      eps29 = q2 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8
      eps30 = q2 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7
      eps31 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
      strain(1, 1) = eps29
      strain(2, 1) = eps30
      strain(3, 1) = eps31
      stress(1, 1) = eps29*m5 + eps30*m6
      stress(2, 1) = eps29*m6 + eps30*m5
      stress(3, 1) = eps31*m7
    end block
    block   ! gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, q0, eps29, eps30, eps31
      J00 = gx_1_0 - 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 - 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 + 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 + 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy1 = -0.10566243270259355_dp*Ji11 - 0.39433756729740643_dp*Ji10
      dNdx2 = 0.39433756729740643_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy2 = 0.39433756729740643_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji00 + 0.39433756729740643_dp*Ji01
      dNdy3 = 0.10566243270259355_dp*Ji10 + 0.39433756729740643_dp*Ji11
      dNdx4 = 0.10566243270259355_dp*Ji01 - 0.10566243270259355_dp*Ji00
      dNdy4 = 0.10566243270259355_dp*Ji11 - 0.10566243270259355_dp*Ji10
      q0 = alpha1*m4
      eps29 = q0 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8
      eps30 = q0 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7
      eps31 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
      strain(1, 2) = eps29
      strain(2, 2) = eps30
      strain(3, 2) = eps31
      stress(1, 2) = eps29*m5 + eps30*m6
      stress(2, 2) = eps29*m6 + eps30*m5
      stress(3, 2) = eps31*m7
    end block
    block   ! gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, q0, eps29, eps30, eps31
      J00 = gx_1_0 + 0.5773502691896257_dp*gx_1_1
      J01 = gy_1_0 + 0.5773502691896257_dp*gy_1_1
      J10 = gx_0_1 - 0.5773502691896257_dp*gx_1_1
      J11 = gy_0_1 - 0.5773502691896257_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy1 = -0.10566243270259355_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx2 = 0.10566243270259355_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy2 = 0.10566243270259355_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx3 = 0.10566243270259355_dp*Ji01 + 0.39433756729740643_dp*Ji00
      dNdy3 = 0.10566243270259355_dp*Ji11 + 0.39433756729740643_dp*Ji10
      dNdx4 = 0.39433756729740643_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy4 = 0.39433756729740643_dp*Ji11 - 0.39433756729740643_dp*Ji10
      q0 = alpha1*m4
      eps29 = q0 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8
      eps30 = q0 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7
      eps31 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
      strain(1, 3) = eps29
      strain(2, 3) = eps30
      strain(3, 3) = eps31
      stress(1, 3) = eps29*m5 + eps30*m6
      stress(2, 3) = eps29*m6 + eps30*m5
      stress(3, 3) = eps31*m7
    end block
    block   ! gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, q2, eps29, eps30, eps31
      q0 = 0.5773502691896257_dp*gx_1_1
      J00 = gx_1_0 + q0
      q1 = 0.5773502691896257_dp*gy_1_1
      J01 = gy_1_0 + q1
      J10 = gx_0_1 + q0
      J11 = gy_0_1 + q1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.10566243270259355_dp*Ji00 - 0.10566243270259355_dp*Ji01
      dNdy1 = -0.10566243270259355_dp*Ji10 - 0.10566243270259355_dp*Ji11
      dNdx2 = 0.10566243270259355_dp*Ji00 - 0.39433756729740643_dp*Ji01
      dNdy2 = 0.10566243270259355_dp*Ji10 - 0.39433756729740643_dp*Ji11
      dNdx3 = 0.39433756729740643_dp*Ji00 + 0.39433756729740643_dp*Ji01
      dNdy3 = 0.39433756729740643_dp*Ji10 + 0.39433756729740643_dp*Ji11
      dNdx4 = 0.10566243270259355_dp*Ji01 - 0.39433756729740643_dp*Ji00
      dNdy4 = 0.10566243270259355_dp*Ji11 - 0.39433756729740643_dp*Ji10
      q2 = alpha1*m4
      eps29 = q2 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8
      eps30 = q2 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7
      eps31 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7
      strain(1, 4) = eps29
      strain(2, 4) = eps30
      strain(3, 4) = eps31
      stress(1, 4) = eps29*m5 + eps30*m6
      stress(2, 4) = eps29*m6 + eps30*m5
      stress(3, 4) = eps31*m7
    end block
  end subroutine q4_bbar_plane_stress_recovery_one

  pure subroutine q4_bbar_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_q4_bbar_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n), u(8, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 4, n)
    real(dp), intent(out) :: stress(3, 4, n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_bbar_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine q4_bbar_plane_stress_recovery

end module derive_q4_bbar_plane_stress
