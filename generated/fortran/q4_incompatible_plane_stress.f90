! derive generated kernel: Q4 incompatible plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
! formulation  incompatible bubble modes, own Jacobian (fails the patch test off parallelograms)
!              [Wilson, Taylor, Doherty & Ghaboussi (1973)]
! integration  B^T D B: gauss-2x2 (4 points); B^T D G: gauss-2x2 (4 points); G^T D G: gauss-2x2 (4
!              points)
! internal     4 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
!              (unrolled factorisation of K_aa, no pivoting)
! flops        stiffness 2427, validity 108, recovery 1691 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 4
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
!              derive kernel Q4 --variant incompatible --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c q4_incompatible_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 4, n) is the same memory as C xy[n][4][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_q4_incompatible_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: q4_incompatible_plane_stress_stiffness, q4_incompatible_plane_stress_stiffness_batch, &
            q4_incompatible_plane_stress_validity, q4_incompatible_plane_stress_recovery

contains

  pure subroutine q4_incompatible_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_q4_incompatible_plane_stress_stiffness_f")
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
    ! c9 = -2*xi at the points of gauss-2x2
    real(dp), parameter :: KS0_c9(4) = [1.1547005383792515_dp, -1.1547005383792515_dp, &
        1.1547005383792515_dp, -1.1547005383792515_dp]
    ! c10 = -2*eta at the points of gauss-2x2
    real(dp), parameter :: KS0_c10(4) = [1.1547005383792515_dp, 1.1547005383792515_dp, &
        -1.1547005383792515_dp, -1.1547005383792515_dp]
    ! eta = eta at the points of gauss-2x2
    real(dp), parameter :: KS0_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
        0.5773502691896257_dp, 0.5773502691896257_dp]
    ! w = the point weight at the points of gauss-2x2
    real(dp), parameter :: KS0_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
    ! xi = xi at the points of gauss-2x2
    real(dp), parameter :: KS0_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
        -0.5773502691896257_dp, 0.5773502691896257_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, m0, m1, m2, gx_0_1, gx_1_0, gx_1_1, gy_0_1, gy_1_0
    real(dp) :: gy_1_1, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_1_1, K_1_2, K_1_3
    real(dp) :: K_1_4, K_1_5, K_1_6, K_1_7, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_3_3, K_3_4
    real(dp) :: K_3_5, K_3_6, K_3_7, K_4_4, K_4_5, K_4_6, K_4_7, K_5_5, K_5_6, K_5_7, K_6_6, K_6_7
    real(dp) :: K_7_7, A_0_0, A_0_1, A_0_2, A_0_3, A_1_0, A_1_1, A_1_2, A_1_3, A_2_0, A_2_1, A_2_2
    real(dp) :: A_2_3, A_3_0, A_3_1, A_3_2, A_3_3, A_4_0, A_4_1, A_4_2, A_4_3, A_5_0, A_5_1, A_5_2
    real(dp) :: A_5_3, A_6_0, A_6_1, A_6_2, A_6_3, A_7_0, A_7_1, A_7_2, A_7_3, H_0_0, H_0_1, H_0_2
    real(dp) :: H_0_3, H_1_1, H_1_2, H_1_3, H_2_2, H_2_3, H_3_3, cid0, cL1_0, cL2_0, cL3_0, cd1, cid1
    real(dp) :: cL2_1, cL3_1, cd2, cid2, cL3_2, cd3, cid3, cy1_0, cy2_0, cy3_0, cy1_1, cy2_1, cy3_1
    real(dp) :: cy1_2, cy2_2, cy3_2, cy1_3, cy2_3, cy3_3, cy1_4, cy2_4, cy3_4, cy1_5, cy2_5, cy3_5
    real(dp) :: cy1_6, cy2_6, cy3_6, cy1_7, cy2_7, cy3_7, cz0_0, cz1_0, cz2_0, cz3_0, cz0_1, cz1_1
    real(dp) :: cz2_1, cz3_1, cz0_2, cz1_2, cz2_2, cz3_2, cz0_3, cz1_3, cz2_3, cz3_3, cz0_4, cz1_4
    real(dp) :: cz2_4, cz3_4, cz0_5, cz1_5, cz2_5, cz3_5, cz0_6, cz1_6, cz2_6, cz3_6, cz0_7, cz1_7
    real(dp) :: cz2_7, cz3_7
    integer :: p
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
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
    A_0_1 = 0.0_dp
    A_0_2 = 0.0_dp
    A_0_3 = 0.0_dp
    A_1_0 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_1_3 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_1 = 0.0_dp
    A_2_2 = 0.0_dp
    A_2_3 = 0.0_dp
    A_3_0 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_3_3 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_1 = 0.0_dp
    A_4_2 = 0.0_dp
    A_4_3 = 0.0_dp
    A_5_0 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_5_3 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_1 = 0.0_dp
    A_6_2 = 0.0_dp
    A_6_3 = 0.0_dp
    A_7_0 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_7_3 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_2 = 0.0_dp
    H_0_3 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_2 = 0.0_dp
    H_1_3 = 0.0_dp
    H_2_2 = 0.0_dp
    H_2_3 = 0.0_dp
    H_3_3 = 0.0_dp
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c9, c10, eta, w, xi, J00, J01, J10, J11, detJ, idet
        real(dp) :: Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0
        real(dp) :: s1, s2, s3, T4, T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20
        real(dp) :: T21, T22, T23, T24, T25, T26, T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37
        real(dp) :: T38, T39
        c0 = KS0_c0(p)
        c1 = KS0_c1(p)
        c2 = KS0_c2(p)
        c3 = KS0_c3(p)
        c4 = KS0_c4(p)
        c5 = KS0_c5(p)
        c6 = KS0_c6(p)
        c7 = KS0_c7(p)
        c9 = KS0_c9(p)
        c10 = KS0_c10(p)
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
        T28 = Ji00*c9*s1
        T29 = Ji00*c9*s2
        T30 = Ji10*c9*s3
        T31 = Ji10*c9*s2
        T32 = Ji10*c9*s1
        T33 = Ji00*c9*s3
        T34 = Ji01*c10*s1
        T35 = Ji01*c10*s2
        T36 = Ji11*c10*s3
        T37 = Ji11*c10*s2
        T38 = Ji11*c10*s1
        T39 = Ji01*c10*s3
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
        A_0_0 = A_0_0 + (T28*dNdx1 + T30*dNdy1)
        A_0_1 = A_0_1 + (T31*dNdx1 + T33*dNdy1)
        A_0_2 = A_0_2 + (T34*dNdx1 + T36*dNdy1)
        A_0_3 = A_0_3 + (T37*dNdx1 + T39*dNdy1)
        A_1_0 = A_1_0 + (T29*dNdy1 + T30*dNdx1)
        A_1_1 = A_1_1 + (T32*dNdy1 + T33*dNdx1)
        A_1_2 = A_1_2 + (T35*dNdy1 + T36*dNdx1)
        A_1_3 = A_1_3 + (T38*dNdy1 + T39*dNdx1)
        A_2_0 = A_2_0 + (T28*dNdx2 + T30*dNdy2)
        A_2_1 = A_2_1 + (T31*dNdx2 + T33*dNdy2)
        A_2_2 = A_2_2 + (T34*dNdx2 + T36*dNdy2)
        A_2_3 = A_2_3 + (T37*dNdx2 + T39*dNdy2)
        A_3_0 = A_3_0 + (T29*dNdy2 + T30*dNdx2)
        A_3_1 = A_3_1 + (T32*dNdy2 + T33*dNdx2)
        A_3_2 = A_3_2 + (T35*dNdy2 + T36*dNdx2)
        A_3_3 = A_3_3 + (T38*dNdy2 + T39*dNdx2)
        A_4_0 = A_4_0 + (T28*dNdx3 + T30*dNdy3)
        A_4_1 = A_4_1 + (T31*dNdx3 + T33*dNdy3)
        A_4_2 = A_4_2 + (T34*dNdx3 + T36*dNdy3)
        A_4_3 = A_4_3 + (T37*dNdx3 + T39*dNdy3)
        A_5_0 = A_5_0 + (T29*dNdy3 + T30*dNdx3)
        A_5_1 = A_5_1 + (T32*dNdy3 + T33*dNdx3)
        A_5_2 = A_5_2 + (T35*dNdy3 + T36*dNdx3)
        A_5_3 = A_5_3 + (T38*dNdy3 + T39*dNdx3)
        A_6_0 = A_6_0 + (T28*dNdx4 + T30*dNdy4)
        A_6_1 = A_6_1 + (T31*dNdx4 + T33*dNdy4)
        A_6_2 = A_6_2 + (T34*dNdx4 + T36*dNdy4)
        A_6_3 = A_6_3 + (T37*dNdx4 + T39*dNdy4)
        A_7_0 = A_7_0 + (T29*dNdy4 + T30*dNdx4)
        A_7_1 = A_7_1 + (T32*dNdy4 + T33*dNdx4)
        A_7_2 = A_7_2 + (T35*dNdy4 + T36*dNdx4)
        A_7_3 = A_7_3 + (T38*dNdy4 + T39*dNdx4)
        H_0_0 = H_0_0 + (Ji00*T28*c9 + Ji10*T30*c9)
        H_0_1 = H_0_1 + (Ji00*T31*c9 + Ji10*T33*c9)
        H_0_2 = H_0_2 + (Ji00*T34*c9 + Ji10*T36*c9)
        H_0_3 = H_0_3 + (Ji00*T37*c9 + Ji10*T39*c9)
        H_1_1 = H_1_1 + (Ji00*T33*c9 + Ji10*T32*c9)
        H_1_2 = H_1_2 + (Ji00*T36*c9 + Ji10*T35*c9)
        H_1_3 = H_1_3 + (Ji00*T39*c9 + Ji10*T38*c9)
        H_2_2 = H_2_2 + (Ji01*T34*c10 + Ji11*T36*c10)
        H_2_3 = H_2_3 + (Ji01*T37*c10 + Ji11*T39*c10)
        H_3_3 = H_3_3 + (Ji01*T39*c10 + Ji11*T38*c10)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cL3_0 = H_0_3*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0_dp/cd2
    cL3_2 = cid2*(H_2_3 - H_0_0*cL2_0*cL3_0 - cL2_1*cL3_1*cd1)
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - cd1*cL3_1*cL3_1 - cd2*cL3_2*cL3_2
    cid3 = 1.0_dp/cd3
    cy1_0 = A_0_1 - A_0_0*cL1_0
    cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0
    cy3_0 = A_0_3 - A_0_0*cL3_0 - cL3_1*cy1_0 - cL3_2*cy2_0
    cy1_1 = A_1_1 - A_1_0*cL1_0
    cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1
    cy3_1 = A_1_3 - A_1_0*cL3_0 - cL3_1*cy1_1 - cL3_2*cy2_1
    cy1_2 = A_2_1 - A_2_0*cL1_0
    cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2
    cy3_2 = A_2_3 - A_2_0*cL3_0 - cL3_1*cy1_2 - cL3_2*cy2_2
    cy1_3 = A_3_1 - A_3_0*cL1_0
    cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3
    cy3_3 = A_3_3 - A_3_0*cL3_0 - cL3_1*cy1_3 - cL3_2*cy2_3
    cy1_4 = A_4_1 - A_4_0*cL1_0
    cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4
    cy3_4 = A_4_3 - A_4_0*cL3_0 - cL3_1*cy1_4 - cL3_2*cy2_4
    cy1_5 = A_5_1 - A_5_0*cL1_0
    cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5
    cy3_5 = A_5_3 - A_5_0*cL3_0 - cL3_1*cy1_5 - cL3_2*cy2_5
    cy1_6 = A_6_1 - A_6_0*cL1_0
    cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6
    cy3_6 = A_6_3 - A_6_0*cL3_0 - cL3_1*cy1_6 - cL3_2*cy2_6
    cy1_7 = A_7_1 - A_7_0*cL1_0
    cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7
    cy3_7 = A_7_3 - A_7_0*cL3_0 - cL3_1*cy1_7 - cL3_2*cy2_7
    cz0_0 = A_0_0*cid0
    cz1_0 = cid1*cy1_0
    cz2_0 = cid2*cy2_0
    cz3_0 = cid3*cy3_0
    cz0_1 = A_1_0*cid0
    cz1_1 = cid1*cy1_1
    cz2_1 = cid2*cy2_1
    cz3_1 = cid3*cy3_1
    cz0_2 = A_2_0*cid0
    cz1_2 = cid1*cy1_2
    cz2_2 = cid2*cy2_2
    cz3_2 = cid3*cy3_2
    cz0_3 = A_3_0*cid0
    cz1_3 = cid1*cy1_3
    cz2_3 = cid2*cy2_3
    cz3_3 = cid3*cy3_3
    cz0_4 = A_4_0*cid0
    cz1_4 = cid1*cy1_4
    cz2_4 = cid2*cy2_4
    cz3_4 = cid3*cy3_4
    cz0_5 = A_5_0*cid0
    cz1_5 = cid1*cy1_5
    cz2_5 = cid2*cy2_5
    cz3_5 = cid3*cy3_5
    cz0_6 = A_6_0*cid0
    cz1_6 = cid1*cy1_6
    cz2_6 = cid2*cy2_6
    cz3_6 = cid3*cy3_6
    cz0_7 = A_7_0*cid0
    cz1_7 = cid1*cy1_7
    cz2_7 = cid2*cy2_7
    cz3_7 = cid3*cy3_7
    K(1, 1) = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0 - cy3_0*cz3_0
    K(1, 2) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0
    K(1, 3) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0
    K(1, 4) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0
    K(1, 5) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0
    K(1, 6) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0
    K(1, 7) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0
    K(1, 8) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0
    K(2, 1) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0
    K(2, 2) = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1 - cy3_1*cz3_1
    K(2, 3) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1
    K(2, 4) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1
    K(2, 5) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1
    K(2, 6) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1
    K(2, 7) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1
    K(2, 8) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1
    K(3, 1) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0
    K(3, 2) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1
    K(3, 3) = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2 - cy3_2*cz3_2
    K(3, 4) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2
    K(3, 5) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2
    K(3, 6) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2
    K(3, 7) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2
    K(3, 8) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2
    K(4, 1) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0
    K(4, 2) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1
    K(4, 3) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2
    K(4, 4) = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3 - cy3_3*cz3_3
    K(4, 5) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3
    K(4, 6) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3
    K(4, 7) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3
    K(4, 8) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3
    K(5, 1) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0
    K(5, 2) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1
    K(5, 3) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2
    K(5, 4) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3
    K(5, 5) = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4 - cy3_4*cz3_4
    K(5, 6) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4
    K(5, 7) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4
    K(5, 8) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4
    K(6, 1) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0
    K(6, 2) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1
    K(6, 3) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2
    K(6, 4) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3
    K(6, 5) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4
    K(6, 6) = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5 - cy3_5*cz3_5
    K(6, 7) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5
    K(6, 8) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5
    K(7, 1) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0
    K(7, 2) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1
    K(7, 3) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2
    K(7, 4) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3
    K(7, 5) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4
    K(7, 6) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5
    K(7, 7) = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6 - cy3_6*cz3_6
    K(7, 8) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6
    K(8, 1) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0
    K(8, 2) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1
    K(8, 3) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2
    K(8, 4) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3
    K(8, 5) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4
    K(8, 6) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5
    K(8, 7) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6
    K(8, 8) = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7 - cy3_7*cz3_7
  end subroutine q4_incompatible_plane_stress_stiffness

  pure subroutine q4_incompatible_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_q4_incompatible_plane_stress_stiffness_batch_f")
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
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
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
          ! c9 = -2*xi at the points of gauss-2x2
          real(dp), parameter :: KS0_c9(4) = [1.1547005383792515_dp, -1.1547005383792515_dp, &
              1.1547005383792515_dp, -1.1547005383792515_dp]
          ! c10 = -2*eta at the points of gauss-2x2
          real(dp), parameter :: KS0_c10(4) = [1.1547005383792515_dp, 1.1547005383792515_dp, &
              -1.1547005383792515_dp, -1.1547005383792515_dp]
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
          real(dp) :: A_0_1, A_0_2, A_0_3, A_1_0, A_1_1, A_1_2, A_1_3, A_2_0, A_2_1, A_2_2, A_2_3, A_3_0
          real(dp) :: A_3_1, A_3_2, A_3_3, A_4_0, A_4_1, A_4_2, A_4_3, A_5_0, A_5_1, A_5_2, A_5_3, A_6_0
          real(dp) :: A_6_1, A_6_2, A_6_3, A_7_0, A_7_1, A_7_2, A_7_3, H_0_0, H_0_1, H_0_2, H_0_3, H_1_1
          real(dp) :: H_1_2, H_1_3, H_2_2, H_2_3, H_3_3, cid0, cL1_0, cL2_0, cL3_0, cd1, cid1, cL2_1, cL3_1
          real(dp) :: cd2, cid2, cL3_2, cd3, cid3, cy1_0, cy2_0, cy3_0, cy1_1, cy2_1, cy3_1, cy1_2, cy2_2
          real(dp) :: cy3_2, cy1_3, cy2_3, cy3_3, cy1_4, cy2_4, cy3_4, cy1_5, cy2_5, cy3_5, cy1_6, cy2_6
          real(dp) :: cy3_6, cy1_7, cy2_7, cy3_7, cz0_0, cz1_0, cz2_0, cz3_0, cz0_1, cz1_1, cz2_1, cz3_1
          real(dp) :: cz0_2, cz1_2, cz2_2, cz3_2, cz0_3, cz1_3, cz2_3, cz3_3, cz0_4, cz1_4, cz2_4, cz3_4
          real(dp) :: cz0_5, cz1_5, cz2_5, cz3_5, cz0_6, cz1_6, cz2_6, cz3_6, cz0_7, cz1_7, cz2_7, cz3_7
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
          A_0_1 = 0.0_dp
          A_0_2 = 0.0_dp
          A_0_3 = 0.0_dp
          A_1_0 = 0.0_dp
          A_1_1 = 0.0_dp
          A_1_2 = 0.0_dp
          A_1_3 = 0.0_dp
          A_2_0 = 0.0_dp
          A_2_1 = 0.0_dp
          A_2_2 = 0.0_dp
          A_2_3 = 0.0_dp
          A_3_0 = 0.0_dp
          A_3_1 = 0.0_dp
          A_3_2 = 0.0_dp
          A_3_3 = 0.0_dp
          A_4_0 = 0.0_dp
          A_4_1 = 0.0_dp
          A_4_2 = 0.0_dp
          A_4_3 = 0.0_dp
          A_5_0 = 0.0_dp
          A_5_1 = 0.0_dp
          A_5_2 = 0.0_dp
          A_5_3 = 0.0_dp
          A_6_0 = 0.0_dp
          A_6_1 = 0.0_dp
          A_6_2 = 0.0_dp
          A_6_3 = 0.0_dp
          A_7_0 = 0.0_dp
          A_7_1 = 0.0_dp
          A_7_2 = 0.0_dp
          A_7_3 = 0.0_dp
          H_0_0 = 0.0_dp
          H_0_1 = 0.0_dp
          H_0_2 = 0.0_dp
          H_0_3 = 0.0_dp
          H_1_1 = 0.0_dp
          H_1_2 = 0.0_dp
          H_1_3 = 0.0_dp
          H_2_2 = 0.0_dp
          H_2_3 = 0.0_dp
          H_3_3 = 0.0_dp
          do p = 1, 4   ! gauss-2x2: loop over the 4 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c9, c10, eta, w, xi, J00, J01, J10, J11, detJ, idet
              real(dp) :: Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0
              real(dp) :: s1, s2, s3, T4, T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20
              real(dp) :: T21, T22, T23, T24, T25, T26, T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37
              real(dp) :: T38, T39
              c0 = KS0_c0(p)
              c1 = KS0_c1(p)
              c2 = KS0_c2(p)
              c3 = KS0_c3(p)
              c4 = KS0_c4(p)
              c5 = KS0_c5(p)
              c6 = KS0_c6(p)
              c7 = KS0_c7(p)
              c9 = KS0_c9(p)
              c10 = KS0_c10(p)
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
              T28 = Ji00*c9*s1
              T29 = Ji00*c9*s2
              T30 = Ji10*c9*s3
              T31 = Ji10*c9*s2
              T32 = Ji10*c9*s1
              T33 = Ji00*c9*s3
              T34 = Ji01*c10*s1
              T35 = Ji01*c10*s2
              T36 = Ji11*c10*s3
              T37 = Ji11*c10*s2
              T38 = Ji11*c10*s1
              T39 = Ji01*c10*s3
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
              A_0_0 = A_0_0 + (T28*dNdx1 + T30*dNdy1)
              A_0_1 = A_0_1 + (T31*dNdx1 + T33*dNdy1)
              A_0_2 = A_0_2 + (T34*dNdx1 + T36*dNdy1)
              A_0_3 = A_0_3 + (T37*dNdx1 + T39*dNdy1)
              A_1_0 = A_1_0 + (T29*dNdy1 + T30*dNdx1)
              A_1_1 = A_1_1 + (T32*dNdy1 + T33*dNdx1)
              A_1_2 = A_1_2 + (T35*dNdy1 + T36*dNdx1)
              A_1_3 = A_1_3 + (T38*dNdy1 + T39*dNdx1)
              A_2_0 = A_2_0 + (T28*dNdx2 + T30*dNdy2)
              A_2_1 = A_2_1 + (T31*dNdx2 + T33*dNdy2)
              A_2_2 = A_2_2 + (T34*dNdx2 + T36*dNdy2)
              A_2_3 = A_2_3 + (T37*dNdx2 + T39*dNdy2)
              A_3_0 = A_3_0 + (T29*dNdy2 + T30*dNdx2)
              A_3_1 = A_3_1 + (T32*dNdy2 + T33*dNdx2)
              A_3_2 = A_3_2 + (T35*dNdy2 + T36*dNdx2)
              A_3_3 = A_3_3 + (T38*dNdy2 + T39*dNdx2)
              A_4_0 = A_4_0 + (T28*dNdx3 + T30*dNdy3)
              A_4_1 = A_4_1 + (T31*dNdx3 + T33*dNdy3)
              A_4_2 = A_4_2 + (T34*dNdx3 + T36*dNdy3)
              A_4_3 = A_4_3 + (T37*dNdx3 + T39*dNdy3)
              A_5_0 = A_5_0 + (T29*dNdy3 + T30*dNdx3)
              A_5_1 = A_5_1 + (T32*dNdy3 + T33*dNdx3)
              A_5_2 = A_5_2 + (T35*dNdy3 + T36*dNdx3)
              A_5_3 = A_5_3 + (T38*dNdy3 + T39*dNdx3)
              A_6_0 = A_6_0 + (T28*dNdx4 + T30*dNdy4)
              A_6_1 = A_6_1 + (T31*dNdx4 + T33*dNdy4)
              A_6_2 = A_6_2 + (T34*dNdx4 + T36*dNdy4)
              A_6_3 = A_6_3 + (T37*dNdx4 + T39*dNdy4)
              A_7_0 = A_7_0 + (T29*dNdy4 + T30*dNdx4)
              A_7_1 = A_7_1 + (T32*dNdy4 + T33*dNdx4)
              A_7_2 = A_7_2 + (T35*dNdy4 + T36*dNdx4)
              A_7_3 = A_7_3 + (T38*dNdy4 + T39*dNdx4)
              H_0_0 = H_0_0 + (Ji00*T28*c9 + Ji10*T30*c9)
              H_0_1 = H_0_1 + (Ji00*T31*c9 + Ji10*T33*c9)
              H_0_2 = H_0_2 + (Ji00*T34*c9 + Ji10*T36*c9)
              H_0_3 = H_0_3 + (Ji00*T37*c9 + Ji10*T39*c9)
              H_1_1 = H_1_1 + (Ji00*T33*c9 + Ji10*T32*c9)
              H_1_2 = H_1_2 + (Ji00*T36*c9 + Ji10*T35*c9)
              H_1_3 = H_1_3 + (Ji00*T39*c9 + Ji10*T38*c9)
              H_2_2 = H_2_2 + (Ji01*T34*c10 + Ji11*T36*c10)
              H_2_3 = H_2_3 + (Ji01*T37*c10 + Ji11*T39*c10)
              H_3_3 = H_3_3 + (Ji01*T39*c10 + Ji11*T38*c10)
            end block
          end do
          ! static condensation of the internal unknowns
          cid0 = 1.0_dp/H_0_0
          cL1_0 = H_0_1*cid0
          cL2_0 = H_0_2*cid0
          cL3_0 = H_0_3*cid0
          cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
          cid1 = 1.0_dp/cd1
          cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
          cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
          cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
          cid2 = 1.0_dp/cd2
          cL3_2 = cid2*(H_2_3 - H_0_0*cL2_0*cL3_0 - cL2_1*cL3_1*cd1)
          cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - cd1*cL3_1*cL3_1 - cd2*cL3_2*cL3_2
          cid3 = 1.0_dp/cd3
          cy1_0 = A_0_1 - A_0_0*cL1_0
          cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0
          cy3_0 = A_0_3 - A_0_0*cL3_0 - cL3_1*cy1_0 - cL3_2*cy2_0
          cy1_1 = A_1_1 - A_1_0*cL1_0
          cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1
          cy3_1 = A_1_3 - A_1_0*cL3_0 - cL3_1*cy1_1 - cL3_2*cy2_1
          cy1_2 = A_2_1 - A_2_0*cL1_0
          cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2
          cy3_2 = A_2_3 - A_2_0*cL3_0 - cL3_1*cy1_2 - cL3_2*cy2_2
          cy1_3 = A_3_1 - A_3_0*cL1_0
          cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3
          cy3_3 = A_3_3 - A_3_0*cL3_0 - cL3_1*cy1_3 - cL3_2*cy2_3
          cy1_4 = A_4_1 - A_4_0*cL1_0
          cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4
          cy3_4 = A_4_3 - A_4_0*cL3_0 - cL3_1*cy1_4 - cL3_2*cy2_4
          cy1_5 = A_5_1 - A_5_0*cL1_0
          cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5
          cy3_5 = A_5_3 - A_5_0*cL3_0 - cL3_1*cy1_5 - cL3_2*cy2_5
          cy1_6 = A_6_1 - A_6_0*cL1_0
          cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6
          cy3_6 = A_6_3 - A_6_0*cL3_0 - cL3_1*cy1_6 - cL3_2*cy2_6
          cy1_7 = A_7_1 - A_7_0*cL1_0
          cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7
          cy3_7 = A_7_3 - A_7_0*cL3_0 - cL3_1*cy1_7 - cL3_2*cy2_7
          cz0_0 = A_0_0*cid0
          cz1_0 = cid1*cy1_0
          cz2_0 = cid2*cy2_0
          cz3_0 = cid3*cy3_0
          cz0_1 = A_1_0*cid0
          cz1_1 = cid1*cy1_1
          cz2_1 = cid2*cy2_1
          cz3_1 = cid3*cy3_1
          cz0_2 = A_2_0*cid0
          cz1_2 = cid1*cy1_2
          cz2_2 = cid2*cy2_2
          cz3_2 = cid3*cy3_2
          cz0_3 = A_3_0*cid0
          cz1_3 = cid1*cy1_3
          cz2_3 = cid2*cy2_3
          cz3_3 = cid3*cy3_3
          cz0_4 = A_4_0*cid0
          cz1_4 = cid1*cy1_4
          cz2_4 = cid2*cy2_4
          cz3_4 = cid3*cy3_4
          cz0_5 = A_5_0*cid0
          cz1_5 = cid1*cy1_5
          cz2_5 = cid2*cy2_5
          cz3_5 = cid3*cy3_5
          cz0_6 = A_6_0*cid0
          cz1_6 = cid1*cy1_6
          cz2_6 = cid2*cy2_6
          cz3_6 = cid3*cy3_6
          cz0_7 = A_7_0*cid0
          cz1_7 = cid1*cy1_7
          cz2_7 = cid2*cy2_7
          cz3_7 = cid3*cy3_7
          kl(lane, 1, 1) = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0 - cy3_0*cz3_0
          kl(lane, 1, 2) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0
          kl(lane, 1, 3) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0
          kl(lane, 1, 4) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0
          kl(lane, 1, 5) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0
          kl(lane, 1, 6) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0
          kl(lane, 1, 7) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0
          kl(lane, 1, 8) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0
          kl(lane, 2, 1) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0
          kl(lane, 2, 2) = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1 - cy3_1*cz3_1
          kl(lane, 2, 3) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1
          kl(lane, 2, 4) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1
          kl(lane, 2, 5) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1
          kl(lane, 2, 6) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1
          kl(lane, 2, 7) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1
          kl(lane, 2, 8) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1
          kl(lane, 3, 1) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0
          kl(lane, 3, 2) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1
          kl(lane, 3, 3) = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2 - cy3_2*cz3_2
          kl(lane, 3, 4) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2
          kl(lane, 3, 5) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2
          kl(lane, 3, 6) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2
          kl(lane, 3, 7) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2
          kl(lane, 3, 8) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2
          kl(lane, 4, 1) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0
          kl(lane, 4, 2) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1
          kl(lane, 4, 3) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2
          kl(lane, 4, 4) = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3 - cy3_3*cz3_3
          kl(lane, 4, 5) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3
          kl(lane, 4, 6) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3
          kl(lane, 4, 7) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3
          kl(lane, 4, 8) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3
          kl(lane, 5, 1) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0
          kl(lane, 5, 2) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1
          kl(lane, 5, 3) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2
          kl(lane, 5, 4) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3
          kl(lane, 5, 5) = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4 - cy3_4*cz3_4
          kl(lane, 5, 6) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4
          kl(lane, 5, 7) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4
          kl(lane, 5, 8) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4
          kl(lane, 6, 1) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0
          kl(lane, 6, 2) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1
          kl(lane, 6, 3) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2
          kl(lane, 6, 4) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3
          kl(lane, 6, 5) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4
          kl(lane, 6, 6) = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5 - cy3_5*cz3_5
          kl(lane, 6, 7) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5
          kl(lane, 6, 8) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5
          kl(lane, 7, 1) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0
          kl(lane, 7, 2) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1
          kl(lane, 7, 3) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2
          kl(lane, 7, 4) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3
          kl(lane, 7, 5) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4
          kl(lane, 7, 6) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5
          kl(lane, 7, 7) = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6 - cy3_6*cz3_6
          kl(lane, 7, 8) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6
          kl(lane, 8, 1) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0
          kl(lane, 8, 2) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1
          kl(lane, 8, 3) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2
          kl(lane, 8, 4) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3
          kl(lane, 8, 5) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4
          kl(lane, 8, 6) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5
          kl(lane, 8, 7) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6
          kl(lane, 8, 8) = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7 - cy3_7*cz3_7
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine q4_incompatible_plane_stress_stiffness_batch

  pure subroutine q4_incompatible_plane_stress_validity_one(xy, detJ_min)
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
  end subroutine q4_incompatible_plane_stress_validity_one

  pure subroutine q4_incompatible_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_q4_incompatible_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_incompatible_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine q4_incompatible_plane_stress_validity

  pure subroutine q4_incompatible_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
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
    ! c9 = -2*xi at the points of gauss-2x2
    real(dp), parameter :: KR0_c9(4) = [1.1547005383792515_dp, -1.1547005383792515_dp, &
        1.1547005383792515_dp, -1.1547005383792515_dp]
    ! c10 = -2*eta at the points of gauss-2x2
    real(dp), parameter :: KR0_c10(4) = [1.1547005383792515_dp, 1.1547005383792515_dp, &
        -1.1547005383792515_dp, -1.1547005383792515_dp]
    ! eta = eta at the points of gauss-2x2
    real(dp), parameter :: KR0_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
        0.5773502691896257_dp, 0.5773502691896257_dp]
    ! w = the point weight at the points of gauss-2x2
    real(dp), parameter :: KR0_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
    ! xi = xi at the points of gauss-2x2
    real(dp), parameter :: KR0_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
        -0.5773502691896257_dp, 0.5773502691896257_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, u1, u2, u3, u4, u5, u6, u7, u8, m0, m1, m2, gx_0_1
    real(dp) :: gx_1_0, gx_1_1, gy_0_1, gy_1_0, gy_1_1, A_0_0, A_0_1, A_0_2, A_0_3, A_1_0, A_1_1, A_1_2
    real(dp) :: A_1_3, A_2_0, A_2_1, A_2_2, A_2_3, A_3_0, A_3_1, A_3_2, A_3_3, A_4_0, A_4_1, A_4_2
    real(dp) :: A_4_3, A_5_0, A_5_1, A_5_2, A_5_3, A_6_0, A_6_1, A_6_2, A_6_3, A_7_0, A_7_1, A_7_2
    real(dp) :: A_7_3, H_0_0, H_0_1, H_0_2, H_0_3, H_1_1, H_1_2, H_1_3, H_2_2, H_2_3, H_3_3, cid0
    real(dp) :: cL1_0, cL2_0, cL3_0, cd1, cid1, cL2_1, cL3_1, cd2, cid2, cL3_2, cd3, cid3, cb0, cb1
    real(dp) :: cb2, cb3, cy1_0, cy2_0, cy3_0, alpha4, alpha3, alpha2, alpha1
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
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = -0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = -0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gy_0_1 = -0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = -0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    A_0_0 = 0.0_dp
    A_0_1 = 0.0_dp
    A_0_2 = 0.0_dp
    A_0_3 = 0.0_dp
    A_1_0 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_1_3 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_1 = 0.0_dp
    A_2_2 = 0.0_dp
    A_2_3 = 0.0_dp
    A_3_0 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_3_3 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_1 = 0.0_dp
    A_4_2 = 0.0_dp
    A_4_3 = 0.0_dp
    A_5_0 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_5_3 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_1 = 0.0_dp
    A_6_2 = 0.0_dp
    A_6_3 = 0.0_dp
    A_7_0 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_7_3 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_2 = 0.0_dp
    H_0_3 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_2 = 0.0_dp
    H_1_3 = 0.0_dp
    H_2_2 = 0.0_dp
    H_2_3 = 0.0_dp
    H_3_3 = 0.0_dp
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c9, c10, eta, w, xi, J00, J01, J10, J11, detJ, idet
        real(dp) :: Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, sc0
        real(dp) :: s1, s2, s3, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37, T38, T39
        c0 = KR0_c0(p)
        c1 = KR0_c1(p)
        c2 = KR0_c2(p)
        c3 = KR0_c3(p)
        c4 = KR0_c4(p)
        c5 = KR0_c5(p)
        c6 = KR0_c6(p)
        c7 = KR0_c7(p)
        c9 = KR0_c9(p)
        c10 = KR0_c10(p)
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
        s1 = m0*sc0
        s2 = m1*sc0
        s3 = m2*sc0
        T28 = Ji00*c9*s1
        T29 = Ji00*c9*s2
        T30 = Ji10*c9*s3
        T31 = Ji10*c9*s2
        T32 = Ji10*c9*s1
        T33 = Ji00*c9*s3
        T34 = Ji01*c10*s1
        T35 = Ji01*c10*s2
        T36 = Ji11*c10*s3
        T37 = Ji11*c10*s2
        T38 = Ji11*c10*s1
        T39 = Ji01*c10*s3
        A_0_0 = A_0_0 + (T28*dNdx1 + T30*dNdy1)
        A_0_1 = A_0_1 + (T31*dNdx1 + T33*dNdy1)
        A_0_2 = A_0_2 + (T34*dNdx1 + T36*dNdy1)
        A_0_3 = A_0_3 + (T37*dNdx1 + T39*dNdy1)
        A_1_0 = A_1_0 + (T29*dNdy1 + T30*dNdx1)
        A_1_1 = A_1_1 + (T32*dNdy1 + T33*dNdx1)
        A_1_2 = A_1_2 + (T35*dNdy1 + T36*dNdx1)
        A_1_3 = A_1_3 + (T38*dNdy1 + T39*dNdx1)
        A_2_0 = A_2_0 + (T28*dNdx2 + T30*dNdy2)
        A_2_1 = A_2_1 + (T31*dNdx2 + T33*dNdy2)
        A_2_2 = A_2_2 + (T34*dNdx2 + T36*dNdy2)
        A_2_3 = A_2_3 + (T37*dNdx2 + T39*dNdy2)
        A_3_0 = A_3_0 + (T29*dNdy2 + T30*dNdx2)
        A_3_1 = A_3_1 + (T32*dNdy2 + T33*dNdx2)
        A_3_2 = A_3_2 + (T35*dNdy2 + T36*dNdx2)
        A_3_3 = A_3_3 + (T38*dNdy2 + T39*dNdx2)
        A_4_0 = A_4_0 + (T28*dNdx3 + T30*dNdy3)
        A_4_1 = A_4_1 + (T31*dNdx3 + T33*dNdy3)
        A_4_2 = A_4_2 + (T34*dNdx3 + T36*dNdy3)
        A_4_3 = A_4_3 + (T37*dNdx3 + T39*dNdy3)
        A_5_0 = A_5_0 + (T29*dNdy3 + T30*dNdx3)
        A_5_1 = A_5_1 + (T32*dNdy3 + T33*dNdx3)
        A_5_2 = A_5_2 + (T35*dNdy3 + T36*dNdx3)
        A_5_3 = A_5_3 + (T38*dNdy3 + T39*dNdx3)
        A_6_0 = A_6_0 + (T28*dNdx4 + T30*dNdy4)
        A_6_1 = A_6_1 + (T31*dNdx4 + T33*dNdy4)
        A_6_2 = A_6_2 + (T34*dNdx4 + T36*dNdy4)
        A_6_3 = A_6_3 + (T37*dNdx4 + T39*dNdy4)
        A_7_0 = A_7_0 + (T29*dNdy4 + T30*dNdx4)
        A_7_1 = A_7_1 + (T32*dNdy4 + T33*dNdx4)
        A_7_2 = A_7_2 + (T35*dNdy4 + T36*dNdx4)
        A_7_3 = A_7_3 + (T38*dNdy4 + T39*dNdx4)
        H_0_0 = H_0_0 + (Ji00*T28*c9 + Ji10*T30*c9)
        H_0_1 = H_0_1 + (Ji00*T31*c9 + Ji10*T33*c9)
        H_0_2 = H_0_2 + (Ji00*T34*c9 + Ji10*T36*c9)
        H_0_3 = H_0_3 + (Ji00*T37*c9 + Ji10*T39*c9)
        H_1_1 = H_1_1 + (Ji00*T33*c9 + Ji10*T32*c9)
        H_1_2 = H_1_2 + (Ji00*T36*c9 + Ji10*T35*c9)
        H_1_3 = H_1_3 + (Ji00*T39*c9 + Ji10*T38*c9)
        H_2_2 = H_2_2 + (Ji01*T34*c10 + Ji11*T36*c10)
        H_2_3 = H_2_3 + (Ji01*T37*c10 + Ji11*T39*c10)
        H_3_3 = H_3_3 + (Ji01*T39*c10 + Ji11*T38*c10)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cL3_0 = H_0_3*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0_dp/cd2
    cL3_2 = cid2*(H_2_3 - H_0_0*cL2_0*cL3_0 - cL2_1*cL3_1*cd1)
    cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - cd1*cL3_1*cL3_1 - cd2*cL3_2*cL3_2
    cid3 = 1.0_dp/cd3
    cb0 = -A_0_0*u1 - A_1_0*u2 - A_2_0*u3 - A_3_0*u4 - A_4_0*u5 - A_5_0*u6 - A_6_0*u7 - A_7_0*u8
    cb1 = -A_0_1*u1 - A_1_1*u2 - A_2_1*u3 - A_3_1*u4 - A_4_1*u5 - A_5_1*u6 - A_6_1*u7 - A_7_1*u8
    cb2 = -A_0_2*u1 - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6 - A_6_2*u7 - A_7_2*u8
    cb3 = -A_0_3*u1 - A_1_3*u2 - A_2_3*u3 - A_3_3*u4 - A_4_3*u5 - A_5_3*u6 - A_6_3*u7 - A_7_3*u8
    cy1_0 = cb1 - cL1_0*cb0
    cy2_0 = cb2 - cL2_0*cb0 - cL2_1*cy1_0
    cy3_0 = cb3 - cL3_0*cb0 - cL3_1*cy1_0 - cL3_2*cy2_0
    alpha4 = cid3*cy3_0
    alpha3 = cid2*cy2_0 - alpha4*cL3_2
    alpha2 = cid1*cy1_0 - alpha3*cL2_1 - alpha4*cL3_1
    alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha3*cL2_0 - alpha4*cL3_0
    block   ! gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, eps40, eps41, eps42
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
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515_dp*Ji00*alpha1 &
          + 1.1547005383792515_dp*Ji01*alpha3
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515_dp*Ji10*alpha2 &
          + 1.1547005383792515_dp*Ji11*alpha4
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 &
          + dNdy4*u7 + 1.1547005383792515_dp*Ji00*alpha2 + 1.1547005383792515_dp*Ji01*alpha4 &
          + 1.1547005383792515_dp*Ji10*alpha1 + 1.1547005383792515_dp*Ji11*alpha3
      strain(1, 1) = eps40
      strain(2, 1) = eps41
      strain(3, 1) = eps42
      stress(1, 1) = eps40*m0 + eps41*m1
      stress(2, 1) = eps40*m1 + eps41*m0
      stress(3, 1) = eps42*m2
    end block
    block   ! gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, eps40, eps41, eps42
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
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515_dp*Ji01*alpha3 &
          - 1.1547005383792515_dp*Ji00*alpha1
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515_dp*Ji11*alpha4 &
          - 1.1547005383792515_dp*Ji10*alpha2
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 &
          + dNdy4*u7 + 1.1547005383792515_dp*Ji01*alpha4 + 1.1547005383792515_dp*Ji11*alpha3 &
          - 1.1547005383792515_dp*Ji00*alpha2 - 1.1547005383792515_dp*Ji10*alpha1
      strain(1, 2) = eps40
      strain(2, 2) = eps41
      strain(3, 2) = eps42
      stress(1, 2) = eps40*m0 + eps41*m1
      stress(2, 2) = eps40*m1 + eps41*m0
      stress(3, 2) = eps42*m2
    end block
    block   ! gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, eps40, eps41, eps42
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
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515_dp*Ji00*alpha1 &
          - 1.1547005383792515_dp*Ji01*alpha3
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515_dp*Ji10*alpha2 &
          - 1.1547005383792515_dp*Ji11*alpha4
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 &
          + dNdy4*u7 + 1.1547005383792515_dp*Ji00*alpha2 + 1.1547005383792515_dp*Ji10*alpha1 &
          - 1.1547005383792515_dp*Ji01*alpha4 - 1.1547005383792515_dp*Ji11*alpha3
      strain(1, 3) = eps40
      strain(2, 3) = eps41
      strain(3, 3) = eps42
      stress(1, 3) = eps40*m0 + eps41*m1
      stress(2, 3) = eps40*m1 + eps41*m0
      stress(3, 3) = eps42*m2
    end block
    block   ! gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, eps40, eps41, eps42
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
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 - 1.1547005383792515_dp*Ji00*alpha1 &
          - 1.1547005383792515_dp*Ji01*alpha3
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 - 1.1547005383792515_dp*Ji10*alpha2 &
          - 1.1547005383792515_dp*Ji11*alpha4
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 &
          + dNdy4*u7 - 1.1547005383792515_dp*Ji00*alpha2 - 1.1547005383792515_dp*Ji01*alpha4 &
          - 1.1547005383792515_dp*Ji10*alpha1 - 1.1547005383792515_dp*Ji11*alpha3
      strain(1, 4) = eps40
      strain(2, 4) = eps41
      strain(3, 4) = eps42
      stress(1, 4) = eps40*m0 + eps41*m1
      stress(2, 4) = eps40*m1 + eps41*m0
      stress(3, 4) = eps42*m2
    end block
  end subroutine q4_incompatible_plane_stress_recovery_one

  pure subroutine q4_incompatible_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_q4_incompatible_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 4, n), u(8, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 4, n)
    real(dp), intent(out) :: stress(3, 4, n)
    integer(c_long) :: iel
    do iel = 1, n
      call q4_incompatible_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine q4_incompatible_plane_stress_recovery

end module derive_q4_incompatible_plane_stress
