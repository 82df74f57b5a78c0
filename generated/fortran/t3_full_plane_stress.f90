! derive generated kernel: T3 full plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      T3, 3 nodes, 6 DOFs interleaved u1, v1, u2, v2, ...
! formulation  displacement element, full integration [standard displacement formulation]
! integration  B^T D B: triangle-d1 (1 point)
! flops        stiffness 129, validity 31, recovery 72 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 3, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 6), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 6, 6), DOFs interleaved u1, v1, u2, v2, ...; symmetric
!   detJ_min validity: min det J over the points of triangle-d1, shape (n,); <= 0 means an
!            inverted or degenerate element
!   strain  recovery: strain at the 1 points of triangle-d1, shape (n, 1, 3), Voigt [eps_xx,
!           eps_yy, gamma_xy] (engineering shear)
!   stress  recovery: stress D strain at the same points, shape (n, 1, 3), [sigma_xx, sigma_yy,
!           tau_xy]
!
! The kernels do not check their inputs; derive.kernel() checks shapes, finite
! coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
! generator    derive.codegen 1.0; regenerate with
!              derive kernel T3 --variant full --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c t3_full_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 3, n) is the same memory as C xy[n][3][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_t3_full_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: t3_full_plane_stress_stiffness, t3_full_plane_stress_stiffness_batch, &
            t3_full_plane_stress_validity, t3_full_plane_stress_recovery

contains

  pure subroutine t3_full_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_t3_full_plane_stress_stiffness_f")
    real(dp), intent(in) :: xy(2, 3)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(6, 6)
    real(dp) :: x1, y1, x2, y2, x3, y3, m0, m1, m2, gx_0_1, gx_1_0, gy_0_1, gy_1_0, K_0_0, K_0_1, K_0_2
    real(dp) :: K_0_3, K_0_4, K_0_5, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_2_2, K_2_3, K_2_4, K_2_5
    real(dp) :: K_3_3, K_3_4, K_3_5, K_4_4, K_4_5, K_5_5
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
      real(dp) :: detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, sc0, s1, s2, s3, T4, T6, T7, T8
      real(dp) :: T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21
      detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
      idet = 1.0_dp/detJ
      Ji00 = gy_0_1*idet
      Ji01 = -gy_1_0*idet
      Ji10 = -gx_0_1*idet
      Ji11 = gx_1_0*idet
      dNdx1 = -Ji00 - Ji01
      dNdy1 = -Ji10 - Ji11
      sc0 = 0.5_dp*detJ*t
      s1 = m0*sc0
      s2 = m1*sc0
      s3 = m2*sc0
      T4 = dNdx1*s1
      T6 = dNdy1*s3
      T7 = dNdy1*s2
      T8 = dNdy1*s1
      T9 = dNdx1*s3
      T10 = Ji00*s1
      T11 = Ji00*s2
      T12 = Ji10*s3
      T13 = Ji10*s2
      T14 = Ji10*s1
      T15 = Ji00*s3
      T16 = Ji01*s1
      T17 = Ji01*s2
      T18 = Ji11*s3
      T19 = Ji11*s2
      T20 = Ji11*s1
      T21 = Ji01*s3
      K_0_0 = T4*dNdx1 + T6*dNdy1
      K_0_1 = T7*dNdx1 + T9*dNdy1
      K_0_2 = T10*dNdx1 + T12*dNdy1
      K_0_3 = T13*dNdx1 + T15*dNdy1
      K_0_4 = T16*dNdx1 + T18*dNdy1
      K_0_5 = T19*dNdx1 + T21*dNdy1
      K_1_1 = T8*dNdy1 + T9*dNdx1
      K_1_2 = T11*dNdy1 + T12*dNdx1
      K_1_3 = T14*dNdy1 + T15*dNdx1
      K_1_4 = T17*dNdy1 + T18*dNdx1
      K_1_5 = T20*dNdy1 + T21*dNdx1
      K_2_2 = Ji00*T10 + Ji10*T12
      K_2_3 = Ji00*T13 + Ji10*T15
      K_2_4 = Ji00*T16 + Ji10*T18
      K_2_5 = Ji00*T19 + Ji10*T21
      K_3_3 = Ji00*T15 + Ji10*T14
      K_3_4 = Ji00*T18 + Ji10*T17
      K_3_5 = Ji00*T21 + Ji10*T20
      K_4_4 = Ji01*T16 + Ji11*T18
      K_4_5 = Ji01*T19 + Ji11*T21
      K_5_5 = Ji01*T21 + Ji11*T20
    end block
    K(1, 1) = K_0_0
    K(1, 2) = K_0_1
    K(1, 3) = K_0_2
    K(1, 4) = K_0_3
    K(1, 5) = K_0_4
    K(1, 6) = K_0_5
    K(2, 1) = K_0_1
    K(2, 2) = K_1_1
    K(2, 3) = K_1_2
    K(2, 4) = K_1_3
    K(2, 5) = K_1_4
    K(2, 6) = K_1_5
    K(3, 1) = K_0_2
    K(3, 2) = K_1_2
    K(3, 3) = K_2_2
    K(3, 4) = K_2_3
    K(3, 5) = K_2_4
    K(3, 6) = K_2_5
    K(4, 1) = K_0_3
    K(4, 2) = K_1_3
    K(4, 3) = K_2_3
    K(4, 4) = K_3_3
    K(4, 5) = K_3_4
    K(4, 6) = K_3_5
    K(5, 1) = K_0_4
    K(5, 2) = K_1_4
    K(5, 3) = K_2_4
    K(5, 4) = K_3_4
    K(5, 5) = K_4_4
    K(5, 6) = K_4_5
    K(6, 1) = K_0_5
    K(6, 2) = K_1_5
    K(6, 3) = K_2_5
    K(6, 4) = K_3_5
    K(6, 5) = K_4_5
    K(6, 6) = K_5_5
  end subroutine t3_full_plane_stress_stiffness

  pure subroutine t3_full_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_t3_full_plane_stress_stiffness_batch_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 3, n)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(6, 6, n)
    ! blocks of 8 elements: copied into lane-first scratch (xl(lane, :, :)), the body
    ! runs in a loop over the lanes that gfortran vectorises (one SIMD lane per element),
    ! then K is copied back; a short last block repeats its first element in the spare lanes
    integer, parameter :: lanes = 8
    real(dp) :: xl(lanes, 2, 3), kl(lanes, 6, 6)
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
          real(dp) :: x1, y1, x2, y2, x3, y3, gx_0_1, gx_1_0, gy_0_1, gy_1_0, K_0_0, K_0_1, K_0_2, K_0_3
          real(dp) :: K_0_4, K_0_5, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_2_2, K_2_3, K_2_4, K_2_5, K_3_3
          real(dp) :: K_3_4, K_3_5, K_4_4, K_4_5, K_5_5
          x1 = xl(lane, 1, 1)
          y1 = xl(lane, 2, 1)
          x2 = xl(lane, 1, 2)
          y2 = xl(lane, 2, 2)
          x3 = xl(lane, 1, 3)
          y3 = xl(lane, 2, 3)
          gx_0_1 = x3 - x1
          gx_1_0 = x2 - x1
          gy_0_1 = y3 - y1
          gy_1_0 = y2 - y1
          block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
            real(dp) :: detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, sc0, s1, s2, s3, T4, T6, T7, T8
            real(dp) :: T9, T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21
            detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
            idet = 1.0_dp/detJ
            Ji00 = gy_0_1*idet
            Ji01 = -gy_1_0*idet
            Ji10 = -gx_0_1*idet
            Ji11 = gx_1_0*idet
            dNdx1 = -Ji00 - Ji01
            dNdy1 = -Ji10 - Ji11
            sc0 = 0.5_dp*detJ*t
            s1 = m0*sc0
            s2 = m1*sc0
            s3 = m2*sc0
            T4 = dNdx1*s1
            T6 = dNdy1*s3
            T7 = dNdy1*s2
            T8 = dNdy1*s1
            T9 = dNdx1*s3
            T10 = Ji00*s1
            T11 = Ji00*s2
            T12 = Ji10*s3
            T13 = Ji10*s2
            T14 = Ji10*s1
            T15 = Ji00*s3
            T16 = Ji01*s1
            T17 = Ji01*s2
            T18 = Ji11*s3
            T19 = Ji11*s2
            T20 = Ji11*s1
            T21 = Ji01*s3
            K_0_0 = T4*dNdx1 + T6*dNdy1
            K_0_1 = T7*dNdx1 + T9*dNdy1
            K_0_2 = T10*dNdx1 + T12*dNdy1
            K_0_3 = T13*dNdx1 + T15*dNdy1
            K_0_4 = T16*dNdx1 + T18*dNdy1
            K_0_5 = T19*dNdx1 + T21*dNdy1
            K_1_1 = T8*dNdy1 + T9*dNdx1
            K_1_2 = T11*dNdy1 + T12*dNdx1
            K_1_3 = T14*dNdy1 + T15*dNdx1
            K_1_4 = T17*dNdy1 + T18*dNdx1
            K_1_5 = T20*dNdy1 + T21*dNdx1
            K_2_2 = Ji00*T10 + Ji10*T12
            K_2_3 = Ji00*T13 + Ji10*T15
            K_2_4 = Ji00*T16 + Ji10*T18
            K_2_5 = Ji00*T19 + Ji10*T21
            K_3_3 = Ji00*T15 + Ji10*T14
            K_3_4 = Ji00*T18 + Ji10*T17
            K_3_5 = Ji00*T21 + Ji10*T20
            K_4_4 = Ji01*T16 + Ji11*T18
            K_4_5 = Ji01*T19 + Ji11*T21
            K_5_5 = Ji01*T21 + Ji11*T20
          end block
          kl(lane, 1, 1) = K_0_0
          kl(lane, 1, 2) = K_0_1
          kl(lane, 1, 3) = K_0_2
          kl(lane, 1, 4) = K_0_3
          kl(lane, 1, 5) = K_0_4
          kl(lane, 1, 6) = K_0_5
          kl(lane, 2, 1) = K_0_1
          kl(lane, 2, 2) = K_1_1
          kl(lane, 2, 3) = K_1_2
          kl(lane, 2, 4) = K_1_3
          kl(lane, 2, 5) = K_1_4
          kl(lane, 2, 6) = K_1_5
          kl(lane, 3, 1) = K_0_2
          kl(lane, 3, 2) = K_1_2
          kl(lane, 3, 3) = K_2_2
          kl(lane, 3, 4) = K_2_3
          kl(lane, 3, 5) = K_2_4
          kl(lane, 3, 6) = K_2_5
          kl(lane, 4, 1) = K_0_3
          kl(lane, 4, 2) = K_1_3
          kl(lane, 4, 3) = K_2_3
          kl(lane, 4, 4) = K_3_3
          kl(lane, 4, 5) = K_3_4
          kl(lane, 4, 6) = K_3_5
          kl(lane, 5, 1) = K_0_4
          kl(lane, 5, 2) = K_1_4
          kl(lane, 5, 3) = K_2_4
          kl(lane, 5, 4) = K_3_4
          kl(lane, 5, 5) = K_4_4
          kl(lane, 5, 6) = K_4_5
          kl(lane, 6, 1) = K_0_5
          kl(lane, 6, 2) = K_1_5
          kl(lane, 6, 3) = K_2_5
          kl(lane, 6, 4) = K_3_5
          kl(lane, 6, 5) = K_4_5
          kl(lane, 6, 6) = K_5_5
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine t3_full_plane_stress_stiffness_batch

  pure subroutine t3_full_plane_stress_validity_one(xy, detJ_min)
    real(dp), intent(in) :: xy(2, 3)
    real(dp), intent(out) :: detJ_min
    real(dp) :: x1, y1, x2, y2, x3, y3, gx_0_1, gx_1_0, gy_0_1, gy_1_0, dmin
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
      real(dp) :: detJ
      detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
      dmin = detJ
    end block
    detJ_min = dmin
  end subroutine t3_full_plane_stress_validity_one

  pure subroutine t3_full_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_t3_full_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 3, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call t3_full_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine t3_full_plane_stress_validity

  pure subroutine t3_full_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 3), u(6)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 1), stress(3, 1)
    real(dp), parameter :: t = 1.0_dp
    real(dp) :: x1, y1, x2, y2, x3, y3, u1, u2, u3, u4, u5, u6, m0, m1, m2, gx_0_1, gx_1_0, gy_0_1
    real(dp) :: gy_1_0
    x1 = xy(1, 1)
    y1 = xy(2, 1)
    x2 = xy(1, 2)
    y2 = xy(2, 2)
    x3 = xy(1, 3)
    y3 = xy(2, 3)
    u1 = u(1)
    u2 = u(2)
    u3 = u(3)
    u4 = u(4)
    u5 = u(5)
    u6 = u(6)
    m0 = E/(1.0_dp - nu*nu)
    m1 = E*nu/(1.0_dp - nu*nu)
    m2 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = x3 - x1
    gx_1_0 = x2 - x1
    gy_0_1 = y3 - y1
    gy_1_0 = y2 - y1
    block   ! triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2
      real(dp) :: detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, eps22, eps23, eps24
      detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
      idet = 1.0_dp/detJ
      Ji00 = gy_0_1*idet
      Ji01 = -gy_1_0*idet
      Ji10 = -gx_0_1*idet
      Ji11 = gx_1_0*idet
      dNdx1 = -Ji00 - Ji01
      dNdy1 = -Ji10 - Ji11
      eps22 = Ji00*u3 + Ji01*u5 + dNdx1*u1
      eps23 = Ji10*u4 + Ji11*u6 + dNdy1*u2
      eps24 = Ji00*u4 + Ji01*u6 + Ji10*u3 + Ji11*u5 + dNdx1*u2 + dNdy1*u1
      strain(1, 1) = eps22
      strain(2, 1) = eps23
      strain(3, 1) = eps24
      stress(1, 1) = eps22*m0 + eps23*m1
      stress(2, 1) = eps22*m1 + eps23*m0
      stress(3, 1) = eps24*m2
    end block
  end subroutine t3_full_plane_stress_recovery_one

  pure subroutine t3_full_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_t3_full_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 3, n), u(6, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 1, n)
    real(dp), intent(out) :: stress(3, 1, n)
    integer(c_long) :: iel
    do iel = 1, n
      call t3_full_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine t3_full_plane_stress_recovery

end module derive_t3_full_plane_stress
