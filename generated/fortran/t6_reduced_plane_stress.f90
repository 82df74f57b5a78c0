! derive generated kernel: T6 reduced plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      T6, 6 nodes, 12 DOFs interleaved u1, v1, u2, v2, ...
! formulation  displacement element, uniformly reduced integration [standard displacement
!              formulation]
! integration  B^T D B: triangle-d1 (1 point)
! flops        stiffness 392, validity 133, recovery 384 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 6, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 12), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 12, 12), DOFs interleaved u1, v1, u2, v2, ...; symmetric
!   detJ_min validity: min det J over the points of triangle-d2, shape (n,); <= 0 means an
!            inverted or degenerate element
!   strain  recovery: strain at the 3 points of triangle-d2, shape (n, 3, 3), Voigt [eps_xx,
!           eps_yy, gamma_xy] (engineering shear)
!   stress  recovery: stress D strain at the same points, shape (n, 3, 3), [sigma_xx, sigma_yy,
!           tau_xy]
!
! The kernels do not check their inputs; derive.kernel() checks shapes, finite
! coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
! generator    derive.codegen 1.0; regenerate with
!              derive kernel T6 --variant reduced --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c t6_reduced_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 6, n) is the same memory as C xy[n][6][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_t6_reduced_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: t6_reduced_plane_stress_stiffness, t6_reduced_plane_stress_stiffness_batch, &
            t6_reduced_plane_stress_validity, t6_reduced_plane_stress_recovery

contains

  pure subroutine t6_reduced_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_t6_reduced_plane_stress_stiffness_f")
    real(dp), intent(in) :: xy(2, 6)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(12, 12)
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, m0, m1, m2, gx_0_1, gx_0_2, gx_1_0
    real(dp) :: gx_1_1, gx_2_0, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_2_0, K_0_0, K_0_1, K_0_2, K_0_3
    real(dp) :: K_0_4, K_0_5, K_0_6, K_0_7, K_0_8, K_0_9, K_0_10, K_0_11, K_1_1, K_1_2, K_1_3, K_1_4
    real(dp) :: K_1_5, K_1_6, K_1_7, K_1_8, K_1_9, K_1_10, K_1_11, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6
    real(dp) :: K_2_7, K_2_8, K_2_9, K_2_10, K_2_11, K_3_3, K_3_4, K_3_5, K_3_6, K_3_7, K_3_8, K_3_9
    real(dp) :: K_3_10, K_3_11, K_4_4, K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11, K_5_5, K_5_6
    real(dp) :: K_5_7, K_5_8, K_5_9, K_5_10, K_5_11, K_6_6, K_6_7, K_6_8, K_6_9, K_6_10, K_6_11, K_7_7
    real(dp) :: K_7_8, K_7_9, K_7_10, K_7_11, K_8_8, K_8_9, K_8_10, K_8_11, K_9_9, K_9_10, K_9_11
    real(dp) :: K_10_10, K_10_11, K_11_11
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    x5 = xy(1, 5)
    y5 = xy(2, 5)
    x6 = xy(1, 6)
    y6 = xy(2, 6)
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = -x3 - 3.0_dp*x1 + 4.0_dp*x6
    gx_0_2 = -4.0_dp*x6 + 2.0_dp*x1 + 2.0_dp*x3
    gx_1_0 = -x2 - 3.0_dp*x1 + 4.0_dp*x4
    gx_1_1 = -4.0_dp*x4 - 4.0_dp*x6 + 4.0_dp*x1 + 4.0_dp*x5
    gx_2_0 = -4.0_dp*x4 + 2.0_dp*x1 + 2.0_dp*x2
    gy_0_1 = -y3 - 3.0_dp*y1 + 4.0_dp*y6
    gy_0_2 = -4.0_dp*y6 + 2.0_dp*y1 + 2.0_dp*y3
    gy_1_0 = -y2 - 3.0_dp*y1 + 4.0_dp*y4
    gy_1_1 = -4.0_dp*y4 - 4.0_dp*y6 + 4.0_dp*y1 + 4.0_dp*y5
    gy_2_0 = -4.0_dp*y4 + 2.0_dp*y1 + 2.0_dp*y2
    block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, sc0, s1, s2, s3, T4
      real(dp) :: T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22, T23
      real(dp) :: T24, T25, T26, T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37, T38, T39
      q0 = 0.3333333333333333_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.6666666666666666_dp*gx_2_0
      q1 = 0.3333333333333333_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.6666666666666666_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.6666666666666666_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.6666666666666666_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.3333333333333333_dp*Ji00 - 0.3333333333333333_dp*Ji01
      dNdy1 = -0.3333333333333333_dp*Ji10 - 0.3333333333333333_dp*Ji11
      dNdx2 = 0.3333333333333333_dp*Ji00
      dNdy2 = 0.3333333333333333_dp*Ji10
      dNdx3 = 0.3333333333333333_dp*Ji01
      dNdy3 = 0.3333333333333333_dp*Ji11
      dNdx4 = -1.3333333333333333_dp*Ji01
      dNdy4 = -1.3333333333333333_dp*Ji11
      dNdx5 = 1.3333333333333333_dp*Ji00 + 1.3333333333333333_dp*Ji01
      dNdy5 = 1.3333333333333333_dp*Ji10 + 1.3333333333333333_dp*Ji11
      dNdx6 = -1.3333333333333333_dp*Ji00
      dNdy6 = -1.3333333333333333_dp*Ji10
      sc0 = 0.5_dp*detJ*t
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
      K_0_0 = T4*dNdx1 + T6*dNdy1
      K_0_1 = T7*dNdx1 + T9*dNdy1
      K_0_2 = T10*dNdx1 + T12*dNdy1
      K_0_3 = T13*dNdx1 + T15*dNdy1
      K_0_4 = T16*dNdx1 + T18*dNdy1
      K_0_5 = T19*dNdx1 + T21*dNdy1
      K_0_6 = T22*dNdx1 + T24*dNdy1
      K_0_7 = T25*dNdx1 + T27*dNdy1
      K_0_8 = T28*dNdx1 + T30*dNdy1
      K_0_9 = T31*dNdx1 + T33*dNdy1
      K_0_10 = T34*dNdx1 + T36*dNdy1
      K_0_11 = T37*dNdx1 + T39*dNdy1
      K_1_1 = T8*dNdy1 + T9*dNdx1
      K_1_2 = T11*dNdy1 + T12*dNdx1
      K_1_3 = T14*dNdy1 + T15*dNdx1
      K_1_4 = T17*dNdy1 + T18*dNdx1
      K_1_5 = T20*dNdy1 + T21*dNdx1
      K_1_6 = T23*dNdy1 + T24*dNdx1
      K_1_7 = T26*dNdy1 + T27*dNdx1
      K_1_8 = T29*dNdy1 + T30*dNdx1
      K_1_9 = T32*dNdy1 + T33*dNdx1
      K_1_10 = T35*dNdy1 + T36*dNdx1
      K_1_11 = T38*dNdy1 + T39*dNdx1
      K_2_2 = T10*dNdx2 + T12*dNdy2
      K_2_3 = T13*dNdx2 + T15*dNdy2
      K_2_4 = T16*dNdx2 + T18*dNdy2
      K_2_5 = T19*dNdx2 + T21*dNdy2
      K_2_6 = T22*dNdx2 + T24*dNdy2
      K_2_7 = T25*dNdx2 + T27*dNdy2
      K_2_8 = T28*dNdx2 + T30*dNdy2
      K_2_9 = T31*dNdx2 + T33*dNdy2
      K_2_10 = T34*dNdx2 + T36*dNdy2
      K_2_11 = T37*dNdx2 + T39*dNdy2
      K_3_3 = T14*dNdy2 + T15*dNdx2
      K_3_4 = T17*dNdy2 + T18*dNdx2
      K_3_5 = T20*dNdy2 + T21*dNdx2
      K_3_6 = T23*dNdy2 + T24*dNdx2
      K_3_7 = T26*dNdy2 + T27*dNdx2
      K_3_8 = T29*dNdy2 + T30*dNdx2
      K_3_9 = T32*dNdy2 + T33*dNdx2
      K_3_10 = T35*dNdy2 + T36*dNdx2
      K_3_11 = T38*dNdy2 + T39*dNdx2
      K_4_4 = T16*dNdx3 + T18*dNdy3
      K_4_5 = T19*dNdx3 + T21*dNdy3
      K_4_6 = T22*dNdx3 + T24*dNdy3
      K_4_7 = T25*dNdx3 + T27*dNdy3
      K_4_8 = T28*dNdx3 + T30*dNdy3
      K_4_9 = T31*dNdx3 + T33*dNdy3
      K_4_10 = T34*dNdx3 + T36*dNdy3
      K_4_11 = T37*dNdx3 + T39*dNdy3
      K_5_5 = T20*dNdy3 + T21*dNdx3
      K_5_6 = T23*dNdy3 + T24*dNdx3
      K_5_7 = T26*dNdy3 + T27*dNdx3
      K_5_8 = T29*dNdy3 + T30*dNdx3
      K_5_9 = T32*dNdy3 + T33*dNdx3
      K_5_10 = T35*dNdy3 + T36*dNdx3
      K_5_11 = T38*dNdy3 + T39*dNdx3
      K_6_6 = T22*dNdx4 + T24*dNdy4
      K_6_7 = T25*dNdx4 + T27*dNdy4
      K_6_8 = T28*dNdx4 + T30*dNdy4
      K_6_9 = T31*dNdx4 + T33*dNdy4
      K_6_10 = T34*dNdx4 + T36*dNdy4
      K_6_11 = T37*dNdx4 + T39*dNdy4
      K_7_7 = T26*dNdy4 + T27*dNdx4
      K_7_8 = T29*dNdy4 + T30*dNdx4
      K_7_9 = T32*dNdy4 + T33*dNdx4
      K_7_10 = T35*dNdy4 + T36*dNdx4
      K_7_11 = T38*dNdy4 + T39*dNdx4
      K_8_8 = T28*dNdx5 + T30*dNdy5
      K_8_9 = T31*dNdx5 + T33*dNdy5
      K_8_10 = T34*dNdx5 + T36*dNdy5
      K_8_11 = T37*dNdx5 + T39*dNdy5
      K_9_9 = T32*dNdy5 + T33*dNdx5
      K_9_10 = T35*dNdy5 + T36*dNdx5
      K_9_11 = T38*dNdy5 + T39*dNdx5
      K_10_10 = T34*dNdx6 + T36*dNdy6
      K_10_11 = T37*dNdx6 + T39*dNdy6
      K_11_11 = T38*dNdy6 + T39*dNdx6
    end block
    K(1, 1) = K_0_0
    K(1, 2) = K_0_1
    K(1, 3) = K_0_2
    K(1, 4) = K_0_3
    K(1, 5) = K_0_4
    K(1, 6) = K_0_5
    K(1, 7) = K_0_6
    K(1, 8) = K_0_7
    K(1, 9) = K_0_8
    K(1, 10) = K_0_9
    K(1, 11) = K_0_10
    K(1, 12) = K_0_11
    K(2, 1) = K_0_1
    K(2, 2) = K_1_1
    K(2, 3) = K_1_2
    K(2, 4) = K_1_3
    K(2, 5) = K_1_4
    K(2, 6) = K_1_5
    K(2, 7) = K_1_6
    K(2, 8) = K_1_7
    K(2, 9) = K_1_8
    K(2, 10) = K_1_9
    K(2, 11) = K_1_10
    K(2, 12) = K_1_11
    K(3, 1) = K_0_2
    K(3, 2) = K_1_2
    K(3, 3) = K_2_2
    K(3, 4) = K_2_3
    K(3, 5) = K_2_4
    K(3, 6) = K_2_5
    K(3, 7) = K_2_6
    K(3, 8) = K_2_7
    K(3, 9) = K_2_8
    K(3, 10) = K_2_9
    K(3, 11) = K_2_10
    K(3, 12) = K_2_11
    K(4, 1) = K_0_3
    K(4, 2) = K_1_3
    K(4, 3) = K_2_3
    K(4, 4) = K_3_3
    K(4, 5) = K_3_4
    K(4, 6) = K_3_5
    K(4, 7) = K_3_6
    K(4, 8) = K_3_7
    K(4, 9) = K_3_8
    K(4, 10) = K_3_9
    K(4, 11) = K_3_10
    K(4, 12) = K_3_11
    K(5, 1) = K_0_4
    K(5, 2) = K_1_4
    K(5, 3) = K_2_4
    K(5, 4) = K_3_4
    K(5, 5) = K_4_4
    K(5, 6) = K_4_5
    K(5, 7) = K_4_6
    K(5, 8) = K_4_7
    K(5, 9) = K_4_8
    K(5, 10) = K_4_9
    K(5, 11) = K_4_10
    K(5, 12) = K_4_11
    K(6, 1) = K_0_5
    K(6, 2) = K_1_5
    K(6, 3) = K_2_5
    K(6, 4) = K_3_5
    K(6, 5) = K_4_5
    K(6, 6) = K_5_5
    K(6, 7) = K_5_6
    K(6, 8) = K_5_7
    K(6, 9) = K_5_8
    K(6, 10) = K_5_9
    K(6, 11) = K_5_10
    K(6, 12) = K_5_11
    K(7, 1) = K_0_6
    K(7, 2) = K_1_6
    K(7, 3) = K_2_6
    K(7, 4) = K_3_6
    K(7, 5) = K_4_6
    K(7, 6) = K_5_6
    K(7, 7) = K_6_6
    K(7, 8) = K_6_7
    K(7, 9) = K_6_8
    K(7, 10) = K_6_9
    K(7, 11) = K_6_10
    K(7, 12) = K_6_11
    K(8, 1) = K_0_7
    K(8, 2) = K_1_7
    K(8, 3) = K_2_7
    K(8, 4) = K_3_7
    K(8, 5) = K_4_7
    K(8, 6) = K_5_7
    K(8, 7) = K_6_7
    K(8, 8) = K_7_7
    K(8, 9) = K_7_8
    K(8, 10) = K_7_9
    K(8, 11) = K_7_10
    K(8, 12) = K_7_11
    K(9, 1) = K_0_8
    K(9, 2) = K_1_8
    K(9, 3) = K_2_8
    K(9, 4) = K_3_8
    K(9, 5) = K_4_8
    K(9, 6) = K_5_8
    K(9, 7) = K_6_8
    K(9, 8) = K_7_8
    K(9, 9) = K_8_8
    K(9, 10) = K_8_9
    K(9, 11) = K_8_10
    K(9, 12) = K_8_11
    K(10, 1) = K_0_9
    K(10, 2) = K_1_9
    K(10, 3) = K_2_9
    K(10, 4) = K_3_9
    K(10, 5) = K_4_9
    K(10, 6) = K_5_9
    K(10, 7) = K_6_9
    K(10, 8) = K_7_9
    K(10, 9) = K_8_9
    K(10, 10) = K_9_9
    K(10, 11) = K_9_10
    K(10, 12) = K_9_11
    K(11, 1) = K_0_10
    K(11, 2) = K_1_10
    K(11, 3) = K_2_10
    K(11, 4) = K_3_10
    K(11, 5) = K_4_10
    K(11, 6) = K_5_10
    K(11, 7) = K_6_10
    K(11, 8) = K_7_10
    K(11, 9) = K_8_10
    K(11, 10) = K_9_10
    K(11, 11) = K_10_10
    K(11, 12) = K_10_11
    K(12, 1) = K_0_11
    K(12, 2) = K_1_11
    K(12, 3) = K_2_11
    K(12, 4) = K_3_11
    K(12, 5) = K_4_11
    K(12, 6) = K_5_11
    K(12, 7) = K_6_11
    K(12, 8) = K_7_11
    K(12, 9) = K_8_11
    K(12, 10) = K_9_11
    K(12, 11) = K_10_11
    K(12, 12) = K_11_11
  end subroutine t6_reduced_plane_stress_stiffness

  pure subroutine t6_reduced_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_t6_reduced_plane_stress_stiffness_batch_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 6, n)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(12, 12, n)
    ! blocks of 8 elements: copied into lane-first scratch (xl(lane, :, :)), the body
    ! runs in a loop over the lanes that gfortran vectorises (one SIMD lane per element),
    ! then K is copied back; a short last block repeats its first element in the spare lanes
    integer, parameter :: lanes = 8
    real(dp) :: xl(lanes, 2, 6), kl(lanes, 12, 12)
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
          real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, gx_0_1, gx_0_2, gx_1_0, gx_1_1, gx_2_0
          real(dp) :: gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_2_0, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6
          real(dp) :: K_0_7, K_0_8, K_0_9, K_0_10, K_0_11, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_1_6, K_1_7
          real(dp) :: K_1_8, K_1_9, K_1_10, K_1_11, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_2_8, K_2_9
          real(dp) :: K_2_10, K_2_11, K_3_3, K_3_4, K_3_5, K_3_6, K_3_7, K_3_8, K_3_9, K_3_10, K_3_11, K_4_4
          real(dp) :: K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11, K_5_5, K_5_6, K_5_7, K_5_8, K_5_9
          real(dp) :: K_5_10, K_5_11, K_6_6, K_6_7, K_6_8, K_6_9, K_6_10, K_6_11, K_7_7, K_7_8, K_7_9, K_7_10
          real(dp) :: K_7_11, K_8_8, K_8_9, K_8_10, K_8_11, K_9_9, K_9_10, K_9_11, K_10_10, K_10_11, K_11_11
          x1 = xl(lane, 1, 1)
          y1 = xl(lane, 2, 1)
          x2 = xl(lane, 1, 2)
          y2 = xl(lane, 2, 2)
          x3 = xl(lane, 1, 3)
          y3 = xl(lane, 2, 3)
          x4 = xl(lane, 1, 4)
          y4 = xl(lane, 2, 4)
          x5 = xl(lane, 1, 5)
          y5 = xl(lane, 2, 5)
          x6 = xl(lane, 1, 6)
          y6 = xl(lane, 2, 6)
          gx_0_1 = -x3 - 3.0_dp*x1 + 4.0_dp*x6
          gx_0_2 = -4.0_dp*x6 + 2.0_dp*x1 + 2.0_dp*x3
          gx_1_0 = -x2 - 3.0_dp*x1 + 4.0_dp*x4
          gx_1_1 = -4.0_dp*x4 - 4.0_dp*x6 + 4.0_dp*x1 + 4.0_dp*x5
          gx_2_0 = -4.0_dp*x4 + 2.0_dp*x1 + 2.0_dp*x2
          gy_0_1 = -y3 - 3.0_dp*y1 + 4.0_dp*y6
          gy_0_2 = -4.0_dp*y6 + 2.0_dp*y1 + 2.0_dp*y3
          gy_1_0 = -y2 - 3.0_dp*y1 + 4.0_dp*y4
          gy_1_1 = -4.0_dp*y4 - 4.0_dp*y6 + 4.0_dp*y1 + 4.0_dp*y5
          gy_2_0 = -4.0_dp*y4 + 2.0_dp*y1 + 2.0_dp*y2
          block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
            real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
            real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, sc0, s1, s2, s3, T4
            real(dp) :: T6, T7, T8, T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22, T23
            real(dp) :: T24, T25, T26, T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37, T38, T39
            q0 = 0.3333333333333333_dp*gx_1_1
            J00 = gx_1_0 + q0 + 0.6666666666666666_dp*gx_2_0
            q1 = 0.3333333333333333_dp*gy_1_1
            J01 = gy_1_0 + q1 + 0.6666666666666666_dp*gy_2_0
            J10 = gx_0_1 + q0 + 0.6666666666666666_dp*gx_0_2
            J11 = gy_0_1 + q1 + 0.6666666666666666_dp*gy_0_2
            detJ = J00*J11 - J01*J10
            idet = 1.0_dp/detJ
            Ji00 = J11*idet
            Ji01 = -J01*idet
            Ji10 = -J10*idet
            Ji11 = J00*idet
            dNdx1 = -0.3333333333333333_dp*Ji00 - 0.3333333333333333_dp*Ji01
            dNdy1 = -0.3333333333333333_dp*Ji10 - 0.3333333333333333_dp*Ji11
            dNdx2 = 0.3333333333333333_dp*Ji00
            dNdy2 = 0.3333333333333333_dp*Ji10
            dNdx3 = 0.3333333333333333_dp*Ji01
            dNdy3 = 0.3333333333333333_dp*Ji11
            dNdx4 = -1.3333333333333333_dp*Ji01
            dNdy4 = -1.3333333333333333_dp*Ji11
            dNdx5 = 1.3333333333333333_dp*Ji00 + 1.3333333333333333_dp*Ji01
            dNdy5 = 1.3333333333333333_dp*Ji10 + 1.3333333333333333_dp*Ji11
            dNdx6 = -1.3333333333333333_dp*Ji00
            dNdy6 = -1.3333333333333333_dp*Ji10
            sc0 = 0.5_dp*detJ*t
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
            K_0_0 = T4*dNdx1 + T6*dNdy1
            K_0_1 = T7*dNdx1 + T9*dNdy1
            K_0_2 = T10*dNdx1 + T12*dNdy1
            K_0_3 = T13*dNdx1 + T15*dNdy1
            K_0_4 = T16*dNdx1 + T18*dNdy1
            K_0_5 = T19*dNdx1 + T21*dNdy1
            K_0_6 = T22*dNdx1 + T24*dNdy1
            K_0_7 = T25*dNdx1 + T27*dNdy1
            K_0_8 = T28*dNdx1 + T30*dNdy1
            K_0_9 = T31*dNdx1 + T33*dNdy1
            K_0_10 = T34*dNdx1 + T36*dNdy1
            K_0_11 = T37*dNdx1 + T39*dNdy1
            K_1_1 = T8*dNdy1 + T9*dNdx1
            K_1_2 = T11*dNdy1 + T12*dNdx1
            K_1_3 = T14*dNdy1 + T15*dNdx1
            K_1_4 = T17*dNdy1 + T18*dNdx1
            K_1_5 = T20*dNdy1 + T21*dNdx1
            K_1_6 = T23*dNdy1 + T24*dNdx1
            K_1_7 = T26*dNdy1 + T27*dNdx1
            K_1_8 = T29*dNdy1 + T30*dNdx1
            K_1_9 = T32*dNdy1 + T33*dNdx1
            K_1_10 = T35*dNdy1 + T36*dNdx1
            K_1_11 = T38*dNdy1 + T39*dNdx1
            K_2_2 = T10*dNdx2 + T12*dNdy2
            K_2_3 = T13*dNdx2 + T15*dNdy2
            K_2_4 = T16*dNdx2 + T18*dNdy2
            K_2_5 = T19*dNdx2 + T21*dNdy2
            K_2_6 = T22*dNdx2 + T24*dNdy2
            K_2_7 = T25*dNdx2 + T27*dNdy2
            K_2_8 = T28*dNdx2 + T30*dNdy2
            K_2_9 = T31*dNdx2 + T33*dNdy2
            K_2_10 = T34*dNdx2 + T36*dNdy2
            K_2_11 = T37*dNdx2 + T39*dNdy2
            K_3_3 = T14*dNdy2 + T15*dNdx2
            K_3_4 = T17*dNdy2 + T18*dNdx2
            K_3_5 = T20*dNdy2 + T21*dNdx2
            K_3_6 = T23*dNdy2 + T24*dNdx2
            K_3_7 = T26*dNdy2 + T27*dNdx2
            K_3_8 = T29*dNdy2 + T30*dNdx2
            K_3_9 = T32*dNdy2 + T33*dNdx2
            K_3_10 = T35*dNdy2 + T36*dNdx2
            K_3_11 = T38*dNdy2 + T39*dNdx2
            K_4_4 = T16*dNdx3 + T18*dNdy3
            K_4_5 = T19*dNdx3 + T21*dNdy3
            K_4_6 = T22*dNdx3 + T24*dNdy3
            K_4_7 = T25*dNdx3 + T27*dNdy3
            K_4_8 = T28*dNdx3 + T30*dNdy3
            K_4_9 = T31*dNdx3 + T33*dNdy3
            K_4_10 = T34*dNdx3 + T36*dNdy3
            K_4_11 = T37*dNdx3 + T39*dNdy3
            K_5_5 = T20*dNdy3 + T21*dNdx3
            K_5_6 = T23*dNdy3 + T24*dNdx3
            K_5_7 = T26*dNdy3 + T27*dNdx3
            K_5_8 = T29*dNdy3 + T30*dNdx3
            K_5_9 = T32*dNdy3 + T33*dNdx3
            K_5_10 = T35*dNdy3 + T36*dNdx3
            K_5_11 = T38*dNdy3 + T39*dNdx3
            K_6_6 = T22*dNdx4 + T24*dNdy4
            K_6_7 = T25*dNdx4 + T27*dNdy4
            K_6_8 = T28*dNdx4 + T30*dNdy4
            K_6_9 = T31*dNdx4 + T33*dNdy4
            K_6_10 = T34*dNdx4 + T36*dNdy4
            K_6_11 = T37*dNdx4 + T39*dNdy4
            K_7_7 = T26*dNdy4 + T27*dNdx4
            K_7_8 = T29*dNdy4 + T30*dNdx4
            K_7_9 = T32*dNdy4 + T33*dNdx4
            K_7_10 = T35*dNdy4 + T36*dNdx4
            K_7_11 = T38*dNdy4 + T39*dNdx4
            K_8_8 = T28*dNdx5 + T30*dNdy5
            K_8_9 = T31*dNdx5 + T33*dNdy5
            K_8_10 = T34*dNdx5 + T36*dNdy5
            K_8_11 = T37*dNdx5 + T39*dNdy5
            K_9_9 = T32*dNdy5 + T33*dNdx5
            K_9_10 = T35*dNdy5 + T36*dNdx5
            K_9_11 = T38*dNdy5 + T39*dNdx5
            K_10_10 = T34*dNdx6 + T36*dNdy6
            K_10_11 = T37*dNdx6 + T39*dNdy6
            K_11_11 = T38*dNdy6 + T39*dNdx6
          end block
          kl(lane, 1, 1) = K_0_0
          kl(lane, 1, 2) = K_0_1
          kl(lane, 1, 3) = K_0_2
          kl(lane, 1, 4) = K_0_3
          kl(lane, 1, 5) = K_0_4
          kl(lane, 1, 6) = K_0_5
          kl(lane, 1, 7) = K_0_6
          kl(lane, 1, 8) = K_0_7
          kl(lane, 1, 9) = K_0_8
          kl(lane, 1, 10) = K_0_9
          kl(lane, 1, 11) = K_0_10
          kl(lane, 1, 12) = K_0_11
          kl(lane, 2, 1) = K_0_1
          kl(lane, 2, 2) = K_1_1
          kl(lane, 2, 3) = K_1_2
          kl(lane, 2, 4) = K_1_3
          kl(lane, 2, 5) = K_1_4
          kl(lane, 2, 6) = K_1_5
          kl(lane, 2, 7) = K_1_6
          kl(lane, 2, 8) = K_1_7
          kl(lane, 2, 9) = K_1_8
          kl(lane, 2, 10) = K_1_9
          kl(lane, 2, 11) = K_1_10
          kl(lane, 2, 12) = K_1_11
          kl(lane, 3, 1) = K_0_2
          kl(lane, 3, 2) = K_1_2
          kl(lane, 3, 3) = K_2_2
          kl(lane, 3, 4) = K_2_3
          kl(lane, 3, 5) = K_2_4
          kl(lane, 3, 6) = K_2_5
          kl(lane, 3, 7) = K_2_6
          kl(lane, 3, 8) = K_2_7
          kl(lane, 3, 9) = K_2_8
          kl(lane, 3, 10) = K_2_9
          kl(lane, 3, 11) = K_2_10
          kl(lane, 3, 12) = K_2_11
          kl(lane, 4, 1) = K_0_3
          kl(lane, 4, 2) = K_1_3
          kl(lane, 4, 3) = K_2_3
          kl(lane, 4, 4) = K_3_3
          kl(lane, 4, 5) = K_3_4
          kl(lane, 4, 6) = K_3_5
          kl(lane, 4, 7) = K_3_6
          kl(lane, 4, 8) = K_3_7
          kl(lane, 4, 9) = K_3_8
          kl(lane, 4, 10) = K_3_9
          kl(lane, 4, 11) = K_3_10
          kl(lane, 4, 12) = K_3_11
          kl(lane, 5, 1) = K_0_4
          kl(lane, 5, 2) = K_1_4
          kl(lane, 5, 3) = K_2_4
          kl(lane, 5, 4) = K_3_4
          kl(lane, 5, 5) = K_4_4
          kl(lane, 5, 6) = K_4_5
          kl(lane, 5, 7) = K_4_6
          kl(lane, 5, 8) = K_4_7
          kl(lane, 5, 9) = K_4_8
          kl(lane, 5, 10) = K_4_9
          kl(lane, 5, 11) = K_4_10
          kl(lane, 5, 12) = K_4_11
          kl(lane, 6, 1) = K_0_5
          kl(lane, 6, 2) = K_1_5
          kl(lane, 6, 3) = K_2_5
          kl(lane, 6, 4) = K_3_5
          kl(lane, 6, 5) = K_4_5
          kl(lane, 6, 6) = K_5_5
          kl(lane, 6, 7) = K_5_6
          kl(lane, 6, 8) = K_5_7
          kl(lane, 6, 9) = K_5_8
          kl(lane, 6, 10) = K_5_9
          kl(lane, 6, 11) = K_5_10
          kl(lane, 6, 12) = K_5_11
          kl(lane, 7, 1) = K_0_6
          kl(lane, 7, 2) = K_1_6
          kl(lane, 7, 3) = K_2_6
          kl(lane, 7, 4) = K_3_6
          kl(lane, 7, 5) = K_4_6
          kl(lane, 7, 6) = K_5_6
          kl(lane, 7, 7) = K_6_6
          kl(lane, 7, 8) = K_6_7
          kl(lane, 7, 9) = K_6_8
          kl(lane, 7, 10) = K_6_9
          kl(lane, 7, 11) = K_6_10
          kl(lane, 7, 12) = K_6_11
          kl(lane, 8, 1) = K_0_7
          kl(lane, 8, 2) = K_1_7
          kl(lane, 8, 3) = K_2_7
          kl(lane, 8, 4) = K_3_7
          kl(lane, 8, 5) = K_4_7
          kl(lane, 8, 6) = K_5_7
          kl(lane, 8, 7) = K_6_7
          kl(lane, 8, 8) = K_7_7
          kl(lane, 8, 9) = K_7_8
          kl(lane, 8, 10) = K_7_9
          kl(lane, 8, 11) = K_7_10
          kl(lane, 8, 12) = K_7_11
          kl(lane, 9, 1) = K_0_8
          kl(lane, 9, 2) = K_1_8
          kl(lane, 9, 3) = K_2_8
          kl(lane, 9, 4) = K_3_8
          kl(lane, 9, 5) = K_4_8
          kl(lane, 9, 6) = K_5_8
          kl(lane, 9, 7) = K_6_8
          kl(lane, 9, 8) = K_7_8
          kl(lane, 9, 9) = K_8_8
          kl(lane, 9, 10) = K_8_9
          kl(lane, 9, 11) = K_8_10
          kl(lane, 9, 12) = K_8_11
          kl(lane, 10, 1) = K_0_9
          kl(lane, 10, 2) = K_1_9
          kl(lane, 10, 3) = K_2_9
          kl(lane, 10, 4) = K_3_9
          kl(lane, 10, 5) = K_4_9
          kl(lane, 10, 6) = K_5_9
          kl(lane, 10, 7) = K_6_9
          kl(lane, 10, 8) = K_7_9
          kl(lane, 10, 9) = K_8_9
          kl(lane, 10, 10) = K_9_9
          kl(lane, 10, 11) = K_9_10
          kl(lane, 10, 12) = K_9_11
          kl(lane, 11, 1) = K_0_10
          kl(lane, 11, 2) = K_1_10
          kl(lane, 11, 3) = K_2_10
          kl(lane, 11, 4) = K_3_10
          kl(lane, 11, 5) = K_4_10
          kl(lane, 11, 6) = K_5_10
          kl(lane, 11, 7) = K_6_10
          kl(lane, 11, 8) = K_7_10
          kl(lane, 11, 9) = K_8_10
          kl(lane, 11, 10) = K_9_10
          kl(lane, 11, 11) = K_10_10
          kl(lane, 11, 12) = K_10_11
          kl(lane, 12, 1) = K_0_11
          kl(lane, 12, 2) = K_1_11
          kl(lane, 12, 3) = K_2_11
          kl(lane, 12, 4) = K_3_11
          kl(lane, 12, 5) = K_4_11
          kl(lane, 12, 6) = K_5_11
          kl(lane, 12, 7) = K_6_11
          kl(lane, 12, 8) = K_7_11
          kl(lane, 12, 9) = K_8_11
          kl(lane, 12, 10) = K_9_11
          kl(lane, 12, 11) = K_10_11
          kl(lane, 12, 12) = K_11_11
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine t6_reduced_plane_stress_stiffness_batch

  pure subroutine t6_reduced_plane_stress_validity_one(xy, detJ_min)
    real(dp), intent(in) :: xy(2, 6)
    real(dp), intent(out) :: detJ_min
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, gx_0_1, gx_0_2, gx_1_0, gx_1_1, gx_2_0
    real(dp) :: gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_2_0, dmin
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    x5 = xy(1, 5)
    y5 = xy(2, 5)
    x6 = xy(1, 6)
    y6 = xy(2, 6)
    gx_0_1 = -x3 - 3.0_dp*x1 + 4.0_dp*x6
    gx_0_2 = -4.0_dp*x6 + 2.0_dp*x1 + 2.0_dp*x3
    gx_1_0 = -x2 - 3.0_dp*x1 + 4.0_dp*x4
    gx_1_1 = -4.0_dp*x4 - 4.0_dp*x6 + 4.0_dp*x1 + 4.0_dp*x5
    gx_2_0 = -4.0_dp*x4 + 2.0_dp*x1 + 2.0_dp*x2
    gy_0_1 = -y3 - 3.0_dp*y1 + 4.0_dp*y6
    gy_0_2 = -4.0_dp*y6 + 2.0_dp*y1 + 2.0_dp*y3
    gy_1_0 = -y2 - 3.0_dp*y1 + 4.0_dp*y4
    gy_1_1 = -4.0_dp*y4 - 4.0_dp*y6 + 4.0_dp*y1 + 4.0_dp*y5
    gy_2_0 = -4.0_dp*y4 + 2.0_dp*y1 + 2.0_dp*y2
    block   ! triangle-d2 point 1 of 3: xi = 1/6, eta = 1/6, weight = 1/6
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ
      q0 = 0.16666666666666666_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.3333333333333333_dp*gx_2_0
      q1 = 0.16666666666666666_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.3333333333333333_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.3333333333333333_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.3333333333333333_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = detJ
    end block
    block   ! triangle-d2 point 2 of 3: xi = 2/3, eta = 1/6, weight = 1/6
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 0.16666666666666666_dp*gx_1_1 + 1.3333333333333333_dp*gx_2_0
      J01 = gy_1_0 + 0.16666666666666666_dp*gy_1_1 + 1.3333333333333333_dp*gy_2_0
      J10 = gx_0_1 + 0.3333333333333333_dp*gx_0_2 + 0.6666666666666666_dp*gx_1_1
      J11 = gy_0_1 + 0.3333333333333333_dp*gy_0_2 + 0.6666666666666666_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! triangle-d2 point 3 of 3: xi = 1/6, eta = 2/3, weight = 1/6
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 0.3333333333333333_dp*gx_2_0 + 0.6666666666666666_dp*gx_1_1
      J01 = gy_1_0 + 0.3333333333333333_dp*gy_2_0 + 0.6666666666666666_dp*gy_1_1
      J10 = gx_0_1 + 0.16666666666666666_dp*gx_1_1 + 1.3333333333333333_dp*gx_0_2
      J11 = gy_0_1 + 0.16666666666666666_dp*gy_1_1 + 1.3333333333333333_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    detJ_min = dmin
  end subroutine t6_reduced_plane_stress_validity_one

  pure subroutine t6_reduced_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_t6_reduced_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 6, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call t6_reduced_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine t6_reduced_plane_stress_validity

  pure subroutine t6_reduced_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 6), u(12)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 3), stress(3, 3)
    real(dp), parameter :: t = 1.0_dp
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, u1, u2, u3, u4, u5, u6, u7, u8, u9
    real(dp) :: u10, u11, u12, m0, m1, m2, gx_0_1, gx_0_2, gx_1_0, gx_1_1, gx_2_0, gy_0_1, gy_0_2
    real(dp) :: gy_1_0, gy_1_1, gy_2_0
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    x4 = xy(1, 4)
    y4 = xy(2, 4)
    x5 = xy(1, 5)
    y5 = xy(2, 5)
    x6 = xy(1, 6)
    y6 = xy(2, 6)
    u1 = u(1)
    u2 = u(2)
    u3 = u(3)
    u4 = u(4)
    u5 = u(5)
    u6 = u(6)
    u7 = u(7)
    u8 = u(8)
    u9 = u(9)
    u10 = u(10)
    u11 = u(11)
    u12 = u(12)
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = -x3 - 3.0_dp*x1 + 4.0_dp*x6
    gx_0_2 = -4.0_dp*x6 + 2.0_dp*x1 + 2.0_dp*x3
    gx_1_0 = -x2 - 3.0_dp*x1 + 4.0_dp*x4
    gx_1_1 = -4.0_dp*x4 - 4.0_dp*x6 + 4.0_dp*x1 + 4.0_dp*x5
    gx_2_0 = -4.0_dp*x4 + 2.0_dp*x1 + 2.0_dp*x2
    gy_0_1 = -y3 - 3.0_dp*y1 + 4.0_dp*y6
    gy_0_2 = -4.0_dp*y6 + 2.0_dp*y1 + 2.0_dp*y3
    gy_1_0 = -y2 - 3.0_dp*y1 + 4.0_dp*y4
    gy_1_1 = -4.0_dp*y4 - 4.0_dp*y6 + 4.0_dp*y1 + 4.0_dp*y5
    gy_2_0 = -4.0_dp*y4 + 2.0_dp*y1 + 2.0_dp*y2
    block   ! triangle-d2 point 1 of 3: xi = 1/6, eta = 1/6, weight = 1/6
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, eps40, eps41, eps42
      q0 = 0.16666666666666666_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.3333333333333333_dp*gx_2_0
      q1 = 0.16666666666666666_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.3333333333333333_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.3333333333333333_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.3333333333333333_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -1.6666666666666667_dp*Ji00 - 1.6666666666666667_dp*Ji01
      dNdy1 = -1.6666666666666667_dp*Ji10 - 1.6666666666666667_dp*Ji11
      dNdx2 = -0.3333333333333333_dp*Ji00
      dNdy2 = -0.3333333333333333_dp*Ji10
      dNdx3 = -0.3333333333333333_dp*Ji01
      dNdy3 = -0.3333333333333333_dp*Ji11
      dNdx4 = 2.0_dp*Ji00 - 0.6666666666666666_dp*Ji01
      dNdy4 = 2.0_dp*Ji10 - 0.6666666666666666_dp*Ji11
      dNdx5 = 0.6666666666666666_dp*Ji00 + 0.6666666666666666_dp*Ji01
      dNdy5 = 0.6666666666666666_dp*Ji10 + 0.6666666666666666_dp*Ji11
      dNdx6 = 2.0_dp*Ji01 - 0.6666666666666666_dp*Ji00
      dNdy6 = 2.0_dp*Ji11 - 0.6666666666666666_dp*Ji10
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1 &
          + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11
      strain(1, 1) = eps40
      strain(2, 1) = eps41
      strain(3, 1) = eps42
      stress(1, 1) = eps40*m0 + eps41*m1
      stress(2, 1) = eps40*m1 + eps41*m0
      stress(3, 1) = eps42*m2
    end block
    block   ! triangle-d2 point 2 of 3: xi = 2/3, eta = 1/6, weight = 1/6
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, eps40, eps41, eps42
      J00 = gx_1_0 + 0.16666666666666666_dp*gx_1_1 + 1.3333333333333333_dp*gx_2_0
      J01 = gy_1_0 + 0.16666666666666666_dp*gy_1_1 + 1.3333333333333333_dp*gy_2_0
      J10 = gx_0_1 + 0.3333333333333333_dp*gx_0_2 + 0.6666666666666666_dp*gx_1_1
      J11 = gy_0_1 + 0.3333333333333333_dp*gy_0_2 + 0.6666666666666666_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.3333333333333333_dp*Ji00 + 0.3333333333333333_dp*Ji01
      dNdy1 = 0.3333333333333333_dp*Ji10 + 0.3333333333333333_dp*Ji11
      dNdx2 = 1.6666666666666667_dp*Ji00
      dNdy2 = 1.6666666666666667_dp*Ji10
      dNdx3 = -0.3333333333333333_dp*Ji01
      dNdy3 = -0.3333333333333333_dp*Ji11
      dNdx4 = -2.0_dp*Ji00 - 2.6666666666666665_dp*Ji01
      dNdy4 = -2.0_dp*Ji10 - 2.6666666666666665_dp*Ji11
      dNdx5 = 0.6666666666666666_dp*Ji00 + 2.6666666666666665_dp*Ji01
      dNdy5 = 0.6666666666666666_dp*Ji10 + 2.6666666666666665_dp*Ji11
      dNdx6 = -0.6666666666666666_dp*Ji00
      dNdy6 = -0.6666666666666666_dp*Ji10
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1 &
          + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11
      strain(1, 2) = eps40
      strain(2, 2) = eps41
      strain(3, 2) = eps42
      stress(1, 2) = eps40*m0 + eps41*m1
      stress(2, 2) = eps40*m1 + eps41*m0
      stress(3, 2) = eps42*m2
    end block
    block   ! triangle-d2 point 3 of 3: xi = 1/6, eta = 2/3, weight = 1/6
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, eps40, eps41, eps42
      J00 = gx_1_0 + 0.3333333333333333_dp*gx_2_0 + 0.6666666666666666_dp*gx_1_1
      J01 = gy_1_0 + 0.3333333333333333_dp*gy_2_0 + 0.6666666666666666_dp*gy_1_1
      J10 = gx_0_1 + 0.16666666666666666_dp*gx_1_1 + 1.3333333333333333_dp*gx_0_2
      J11 = gy_0_1 + 0.16666666666666666_dp*gy_1_1 + 1.3333333333333333_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.3333333333333333_dp*Ji00 + 0.3333333333333333_dp*Ji01
      dNdy1 = 0.3333333333333333_dp*Ji10 + 0.3333333333333333_dp*Ji11
      dNdx2 = -0.3333333333333333_dp*Ji00
      dNdy2 = -0.3333333333333333_dp*Ji10
      dNdx3 = 1.6666666666666667_dp*Ji01
      dNdy3 = 1.6666666666666667_dp*Ji11
      dNdx4 = -0.6666666666666666_dp*Ji01
      dNdy4 = -0.6666666666666666_dp*Ji11
      dNdx5 = 0.6666666666666666_dp*Ji01 + 2.6666666666666665_dp*Ji00
      dNdy5 = 0.6666666666666666_dp*Ji11 + 2.6666666666666665_dp*Ji10
      dNdx6 = -2.0_dp*Ji01 - 2.6666666666666665_dp*Ji00
      dNdy6 = -2.0_dp*Ji11 - 2.6666666666666665_dp*Ji10
      eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11
      eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12
      eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1 &
          + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11
      strain(1, 3) = eps40
      strain(2, 3) = eps41
      strain(3, 3) = eps42
      stress(1, 3) = eps40*m0 + eps41*m1
      stress(2, 3) = eps40*m1 + eps41*m0
      stress(3, 3) = eps42*m2
    end block
  end subroutine t6_reduced_plane_stress_recovery_one

  pure subroutine t6_reduced_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_t6_reduced_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 6, n), u(12, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 3, n)
    real(dp), intent(out) :: stress(3, 3, n)
    integer(c_long) :: iel
    do iel = 1, n
      call t6_reduced_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine t6_reduced_plane_stress_recovery

end module derive_t6_reduced_plane_stress
