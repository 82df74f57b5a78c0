! derive generated kernel: Q8 bbar plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      Q8, 8 nodes, 16 DOFs interleaved u1, v1, u2, v2, ...
! formulation  B-bar, dilatation projected on a linear pressure {1, xi, eta}: K_dev + kappa g^T
!              M_p^-1 g [Hughes (1980); Nagtegaal, Parks & Rice (1974)]
! integration  B^T D_dev B: gauss-3x3 (9 points); B^T m pi (g): gauss-3x3 (9 points); -pi^T pi /
!              kappa (-M_p / kappa): gauss-3x3 (9 points)
! internal     3 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
!              (unrolled factorisation of K_aa, no pivoting)
! flops        stiffness 8787, validity 392, recovery 3985 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 8, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 16), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 16, 16), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 3
!           internal unknowns are condensed
!   detJ_min validity: min det J over the points of gauss-3x3, shape (n,); <= 0 means an inverted
!            or degenerate element
!   strain  recovery: strain at the 9 points of gauss-3x3, shape (n, 9, 3), Voigt [eps_xx, eps_yy,
!           gamma_xy] (engineering shear)
!   stress  recovery: stress D strain at the same points, shape (n, 9, 3), [sigma_xx, sigma_yy,
!           tau_xy]
!
! The kernels do not check their inputs; derive.kernel() checks shapes, finite
! coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
! generator    derive.codegen 1.0; regenerate with
!              derive kernel Q8 --variant bbar --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c q8_bbar_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 8, n) is the same memory as C xy[n][8][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_q8_bbar_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: q8_bbar_plane_stress_stiffness, q8_bbar_plane_stress_stiffness_batch, &
            q8_bbar_plane_stress_validity, q8_bbar_plane_stress_recovery

contains

  pure subroutine q8_bbar_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_q8_bbar_plane_stress_stiffness_f")
    real(dp), intent(in) :: xy(2, 8)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(16, 16)
    ! c0 = eta^2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c0(9) = [0.6_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.6_dp, &
        0.6_dp, 0.6_dp]
    ! c1 = 2*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c1(9) = [-1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp, &
        -1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp, -1.5491933384829668_dp, 0.0_dp, &
        1.5491933384829668_dp]
    ! c2 = 2*eta*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c2(9) = [1.2_dp, 0.0_dp, -1.2_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.2_dp, &
        0.0_dp, 1.2_dp]
    ! c3 = 2*eta at the points of gauss-3x3
    real(dp), parameter :: KS0_c3(9) = [-1.5491933384829668_dp, -1.5491933384829668_dp, &
        -1.5491933384829668_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.5491933384829668_dp, &
        1.5491933384829668_dp, 1.5491933384829668_dp]
    ! c4 = xi^2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c4(9) = [0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, &
        0.0_dp, 0.6_dp]
    ! c5 = -eta^2/4 - eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c5(9) = [-1.0309475019311125_dp, -0.3436491673103708_dp, &
        0.3436491673103708_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.04364916731037084_dp, 0.04364916731037084_dp, 0.13094750193111254_dp]
    ! c6 = -eta*xi/2 + eta/2 - xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c6(9) = [-1.0309475019311125_dp, -0.3872983346207417_dp, &
        -0.04364916731037084_dp, -0.3436491673103708_dp, 0.0_dp, 0.04364916731037084_dp, &
        0.3436491673103708_dp, 0.3872983346207417_dp, 0.13094750193111254_dp]
    ! c7 = eta^2/4 - eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c7(9) = [-0.3436491673103708_dp, 0.3436491673103708_dp, &
        1.0309475019311125_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.13094750193111254_dp, -0.04364916731037084_dp, 0.04364916731037084_dp]
    ! c8 = eta*xi/2 + eta/2 - xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c8(9) = [-0.04364916731037084_dp, -0.3872983346207417_dp, &
        -1.0309475019311125_dp, 0.04364916731037084_dp, 0.0_dp, -0.3436491673103708_dp, &
        0.13094750193111254_dp, 0.3872983346207417_dp, 0.3436491673103708_dp]
    ! c9 = eta^2/4 + eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c9(9) = [-0.13094750193111254_dp, -0.04364916731037084_dp, &
        0.04364916731037084_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.3436491673103708_dp, 0.3436491673103708_dp, 1.0309475019311125_dp]
    ! c10 = eta*xi/2 + eta/2 + xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c10(9) = [-0.13094750193111254_dp, -0.3872983346207417_dp, &
        -0.3436491673103708_dp, -0.04364916731037084_dp, 0.0_dp, 0.3436491673103708_dp, &
        0.04364916731037084_dp, 0.3872983346207417_dp, 1.0309475019311125_dp]
    ! c11 = -eta^2/4 + eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c11(9) = [-0.04364916731037084_dp, 0.04364916731037084_dp, &
        0.13094750193111254_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -1.0309475019311125_dp, -0.3436491673103708_dp, 0.3436491673103708_dp]
    ! c12 = -eta*xi/2 + eta/2 + xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c12(9) = [-0.3436491673103708_dp, -0.3872983346207417_dp, &
        -0.13094750193111254_dp, 0.3436491673103708_dp, 0.0_dp, -0.04364916731037084_dp, &
        1.0309475019311125_dp, 0.3872983346207417_dp, 0.04364916731037084_dp]
    ! c13 = eta*xi - xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c13(9) = [1.3745966692414833_dp, 0.0_dp, -1.3745966692414833_dp, &
        0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, 0.17459666924148337_dp, 0.0_dp, &
        -0.17459666924148337_dp]
    ! c14 = xi^2/2 - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c14(9) = [-0.2_dp, -0.5_dp, -0.2_dp, -0.2_dp, -0.5_dp, -0.2_dp, &
        -0.2_dp, -0.5_dp, -0.2_dp]
    ! c15 = 1/2 - eta^2/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c15(9) = [0.2_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.5_dp, 0.5_dp, 0.2_dp, &
        0.2_dp, 0.2_dp]
    ! c16 = -eta*xi - eta at the points of gauss-3x3
    real(dp), parameter :: KS0_c16(9) = [0.17459666924148337_dp, 0.7745966692414834_dp, &
        1.3745966692414833_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.17459666924148337_dp, &
        -0.7745966692414834_dp, -1.3745966692414833_dp]
    ! c17 = -eta*xi - xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c17(9) = [0.17459666924148337_dp, 0.0_dp, -0.17459666924148337_dp, &
        0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, 1.3745966692414833_dp, 0.0_dp, &
        -1.3745966692414833_dp]
    ! c18 = 1/2 - xi^2/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c18(9) = [0.2_dp, 0.5_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.2_dp, 0.2_dp, &
        0.5_dp, 0.2_dp]
    ! c19 = eta^2/2 - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c19(9) = [-0.2_dp, -0.2_dp, -0.2_dp, -0.5_dp, -0.5_dp, -0.5_dp, &
        -0.2_dp, -0.2_dp, -0.2_dp]
    ! c20 = eta*xi - eta at the points of gauss-3x3
    real(dp), parameter :: KS0_c20(9) = [1.3745966692414833_dp, 0.7745966692414834_dp, &
        0.17459666924148337_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.3745966692414833_dp, &
        -0.7745966692414834_dp, -0.17459666924148337_dp]
    ! eta = eta at the points of gauss-3x3
    real(dp), parameter :: KS0_eta(9) = [-0.7745966692414834_dp, -0.7745966692414834_dp, &
        -0.7745966692414834_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.7745966692414834_dp, &
        0.7745966692414834_dp, 0.7745966692414834_dp]
    ! w = the point weight at the points of gauss-3x3
    real(dp), parameter :: KS0_w(9) = [0.30864197530864196_dp, 0.49382716049382713_dp, &
        0.30864197530864196_dp, 0.49382716049382713_dp, 0.7901234567901234_dp, &
        0.49382716049382713_dp, 0.30864197530864196_dp, 0.49382716049382713_dp, &
        0.30864197530864196_dp]
    ! xi = xi at the points of gauss-3x3
    real(dp), parameter :: KS0_xi(9) = [-0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp, &
        -0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp, -0.7745966692414834_dp, 0.0_dp, &
        0.7745966692414834_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, m0, m1, m2, m3, gx_0_1
    real(dp) :: gx_0_2, gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2
    real(dp) :: gy_2_0, gy_2_1, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_0_8, K_0_9
    real(dp) :: K_0_10, K_0_11, K_0_12, K_0_13, K_0_14, K_0_15, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5
    real(dp) :: K_1_6, K_1_7, K_1_8, K_1_9, K_1_10, K_1_11, K_1_12, K_1_13, K_1_14, K_1_15, K_2_2
    real(dp) :: K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_2_8, K_2_9, K_2_10, K_2_11, K_2_12, K_2_13, K_2_14
    real(dp) :: K_2_15, K_3_3, K_3_4, K_3_5, K_3_6, K_3_7, K_3_8, K_3_9, K_3_10, K_3_11, K_3_12, K_3_13
    real(dp) :: K_3_14, K_3_15, K_4_4, K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11, K_4_12, K_4_13
    real(dp) :: K_4_14, K_4_15, K_5_5, K_5_6, K_5_7, K_5_8, K_5_9, K_5_10, K_5_11, K_5_12, K_5_13
    real(dp) :: K_5_14, K_5_15, K_6_6, K_6_7, K_6_8, K_6_9, K_6_10, K_6_11, K_6_12, K_6_13, K_6_14
    real(dp) :: K_6_15, K_7_7, K_7_8, K_7_9, K_7_10, K_7_11, K_7_12, K_7_13, K_7_14, K_7_15, K_8_8
    real(dp) :: K_8_9, K_8_10, K_8_11, K_8_12, K_8_13, K_8_14, K_8_15, K_9_9, K_9_10, K_9_11, K_9_12
    real(dp) :: K_9_13, K_9_14, K_9_15, K_10_10, K_10_11, K_10_12, K_10_13, K_10_14, K_10_15, K_11_11
    real(dp) :: K_11_12, K_11_13, K_11_14, K_11_15, K_12_12, K_12_13, K_12_14, K_12_15, K_13_13, K_13_14
    real(dp) :: K_13_15, K_14_14, K_14_15, K_15_15, A_0_0, A_0_1, A_0_2, A_1_0, A_1_1, A_1_2, A_2_0
    real(dp) :: A_2_1, A_2_2, A_3_0, A_3_1, A_3_2, A_4_0, A_4_1, A_4_2, A_5_0, A_5_1, A_5_2, A_6_0
    real(dp) :: A_6_1, A_6_2, A_7_0, A_7_1, A_7_2, A_8_0, A_8_1, A_8_2, A_9_0, A_9_1, A_9_2, A_10_0
    real(dp) :: A_10_1, A_10_2, A_11_0, A_11_1, A_11_2, A_12_0, A_12_1, A_12_2, A_13_0, A_13_1, A_13_2
    real(dp) :: A_14_0, A_14_1, A_14_2, A_15_0, A_15_1, A_15_2, H_0_0, H_0_1, H_0_2, H_1_1, H_1_2
    real(dp) :: H_2_2, cid0, cL1_0, cL2_0, cd1, cid1, cL2_1, cd2, cid2, cy1_0, cy2_0, cy1_1, cy2_1
    real(dp) :: cy1_2, cy2_2, cy1_3, cy2_3, cy1_4, cy2_4, cy1_5, cy2_5, cy1_6, cy2_6, cy1_7, cy2_7
    real(dp) :: cy1_8, cy2_8, cy1_9, cy2_9, cy1_10, cy2_10, cy1_11, cy2_11, cy1_12, cy2_12, cy1_13
    real(dp) :: cy2_13, cy1_14, cy2_14, cy1_15, cy2_15, cz0_0, cz1_0, cz2_0, cz0_1, cz1_1, cz2_1, cz0_2
    real(dp) :: cz1_2, cz2_2, cz0_3, cz1_3, cz2_3, cz0_4, cz1_4, cz2_4, cz0_5, cz1_5, cz2_5, cz0_6
    real(dp) :: cz1_6, cz2_6, cz0_7, cz1_7, cz2_7, cz0_8, cz1_8, cz2_8, cz0_9, cz1_9, cz2_9, cz0_10
    real(dp) :: cz1_10, cz2_10, cz0_11, cz1_11, cz2_11, cz0_12, cz1_12, cz2_12, cz0_13, cz1_13, cz2_13
    real(dp) :: cz0_14, cz1_14, cz2_14, cz0_15, cz1_15, cz2_15
    integer :: p
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
    x7 = xy(1, 7)
    y7 = xy(2, 7)
    x8 = xy(1, 8)
    y8 = xy(2, 8)
    m0 = 2.0_dp*E/(3.0_dp + 3.0_dp*nu)
    m1 = -E/(3.0_dp + 3.0_dp*nu)
    m2 = E/(2.0_dp + 2.0_dp*nu)
    m3 = -(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = -0.5_dp*x6 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = -0.5_dp*x5 - 0.5_dp*x7 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = -0.5_dp*y6 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = -0.5_dp*y5 - 0.5_dp*y7 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    K_0_0 = 0.0_dp
    K_0_1 = 0.0_dp
    K_0_2 = 0.0_dp
    K_0_3 = 0.0_dp
    K_0_4 = 0.0_dp
    K_0_5 = 0.0_dp
    K_0_6 = 0.0_dp
    K_0_7 = 0.0_dp
    K_0_8 = 0.0_dp
    K_0_9 = 0.0_dp
    K_0_10 = 0.0_dp
    K_0_11 = 0.0_dp
    K_0_12 = 0.0_dp
    K_0_13 = 0.0_dp
    K_0_14 = 0.0_dp
    K_0_15 = 0.0_dp
    K_1_1 = 0.0_dp
    K_1_2 = 0.0_dp
    K_1_3 = 0.0_dp
    K_1_4 = 0.0_dp
    K_1_5 = 0.0_dp
    K_1_6 = 0.0_dp
    K_1_7 = 0.0_dp
    K_1_8 = 0.0_dp
    K_1_9 = 0.0_dp
    K_1_10 = 0.0_dp
    K_1_11 = 0.0_dp
    K_1_12 = 0.0_dp
    K_1_13 = 0.0_dp
    K_1_14 = 0.0_dp
    K_1_15 = 0.0_dp
    K_2_2 = 0.0_dp
    K_2_3 = 0.0_dp
    K_2_4 = 0.0_dp
    K_2_5 = 0.0_dp
    K_2_6 = 0.0_dp
    K_2_7 = 0.0_dp
    K_2_8 = 0.0_dp
    K_2_9 = 0.0_dp
    K_2_10 = 0.0_dp
    K_2_11 = 0.0_dp
    K_2_12 = 0.0_dp
    K_2_13 = 0.0_dp
    K_2_14 = 0.0_dp
    K_2_15 = 0.0_dp
    K_3_3 = 0.0_dp
    K_3_4 = 0.0_dp
    K_3_5 = 0.0_dp
    K_3_6 = 0.0_dp
    K_3_7 = 0.0_dp
    K_3_8 = 0.0_dp
    K_3_9 = 0.0_dp
    K_3_10 = 0.0_dp
    K_3_11 = 0.0_dp
    K_3_12 = 0.0_dp
    K_3_13 = 0.0_dp
    K_3_14 = 0.0_dp
    K_3_15 = 0.0_dp
    K_4_4 = 0.0_dp
    K_4_5 = 0.0_dp
    K_4_6 = 0.0_dp
    K_4_7 = 0.0_dp
    K_4_8 = 0.0_dp
    K_4_9 = 0.0_dp
    K_4_10 = 0.0_dp
    K_4_11 = 0.0_dp
    K_4_12 = 0.0_dp
    K_4_13 = 0.0_dp
    K_4_14 = 0.0_dp
    K_4_15 = 0.0_dp
    K_5_5 = 0.0_dp
    K_5_6 = 0.0_dp
    K_5_7 = 0.0_dp
    K_5_8 = 0.0_dp
    K_5_9 = 0.0_dp
    K_5_10 = 0.0_dp
    K_5_11 = 0.0_dp
    K_5_12 = 0.0_dp
    K_5_13 = 0.0_dp
    K_5_14 = 0.0_dp
    K_5_15 = 0.0_dp
    K_6_6 = 0.0_dp
    K_6_7 = 0.0_dp
    K_6_8 = 0.0_dp
    K_6_9 = 0.0_dp
    K_6_10 = 0.0_dp
    K_6_11 = 0.0_dp
    K_6_12 = 0.0_dp
    K_6_13 = 0.0_dp
    K_6_14 = 0.0_dp
    K_6_15 = 0.0_dp
    K_7_7 = 0.0_dp
    K_7_8 = 0.0_dp
    K_7_9 = 0.0_dp
    K_7_10 = 0.0_dp
    K_7_11 = 0.0_dp
    K_7_12 = 0.0_dp
    K_7_13 = 0.0_dp
    K_7_14 = 0.0_dp
    K_7_15 = 0.0_dp
    K_8_8 = 0.0_dp
    K_8_9 = 0.0_dp
    K_8_10 = 0.0_dp
    K_8_11 = 0.0_dp
    K_8_12 = 0.0_dp
    K_8_13 = 0.0_dp
    K_8_14 = 0.0_dp
    K_8_15 = 0.0_dp
    K_9_9 = 0.0_dp
    K_9_10 = 0.0_dp
    K_9_11 = 0.0_dp
    K_9_12 = 0.0_dp
    K_9_13 = 0.0_dp
    K_9_14 = 0.0_dp
    K_9_15 = 0.0_dp
    K_10_10 = 0.0_dp
    K_10_11 = 0.0_dp
    K_10_12 = 0.0_dp
    K_10_13 = 0.0_dp
    K_10_14 = 0.0_dp
    K_10_15 = 0.0_dp
    K_11_11 = 0.0_dp
    K_11_12 = 0.0_dp
    K_11_13 = 0.0_dp
    K_11_14 = 0.0_dp
    K_11_15 = 0.0_dp
    K_12_12 = 0.0_dp
    K_12_13 = 0.0_dp
    K_12_14 = 0.0_dp
    K_12_15 = 0.0_dp
    K_13_13 = 0.0_dp
    K_13_14 = 0.0_dp
    K_13_15 = 0.0_dp
    K_14_14 = 0.0_dp
    K_14_15 = 0.0_dp
    K_15_15 = 0.0_dp
    A_0_0 = 0.0_dp
    A_0_1 = 0.0_dp
    A_0_2 = 0.0_dp
    A_1_0 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_1 = 0.0_dp
    A_2_2 = 0.0_dp
    A_3_0 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_1 = 0.0_dp
    A_4_2 = 0.0_dp
    A_5_0 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_1 = 0.0_dp
    A_6_2 = 0.0_dp
    A_7_0 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_8_0 = 0.0_dp
    A_8_1 = 0.0_dp
    A_8_2 = 0.0_dp
    A_9_0 = 0.0_dp
    A_9_1 = 0.0_dp
    A_9_2 = 0.0_dp
    A_10_0 = 0.0_dp
    A_10_1 = 0.0_dp
    A_10_2 = 0.0_dp
    A_11_0 = 0.0_dp
    A_11_1 = 0.0_dp
    A_11_2 = 0.0_dp
    A_12_0 = 0.0_dp
    A_12_1 = 0.0_dp
    A_12_2 = 0.0_dp
    A_13_0 = 0.0_dp
    A_13_1 = 0.0_dp
    A_13_2 = 0.0_dp
    A_14_0 = 0.0_dp
    A_14_1 = 0.0_dp
    A_14_2 = 0.0_dp
    A_15_0 = 0.0_dp
    A_15_1 = 0.0_dp
    A_15_2 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_2 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_2 = 0.0_dp
    H_2_2 = 0.0_dp
    do p = 1, 9   ! gauss-3x3: loop over the 9 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
        real(dp) :: c19, c20, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1
        real(dp) :: dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7
        real(dp) :: dNdy7, dNdx8, dNdy8, sc0, s1, s2, s3, T4, T6, T7, T8, T9, T10, T11, T12, T13, T14
        real(dp) :: T15, T16, T17, T18, T19, T20, T21, T22, T23, T24, T25, T26, T27, T28, T29, T30, T31
        real(dp) :: T32, T33, T34, T35, T36, T37, T38, T39, T40, T41, T42, T43, T44, T45, T46, T47, T48
        real(dp) :: T49, T50, T51, T52, T53, s54, T55, T56
        c0 = KS0_c0(p)
        c1 = KS0_c1(p)
        c2 = KS0_c2(p)
        c3 = KS0_c3(p)
        c4 = KS0_c4(p)
        c5 = KS0_c5(p)
        c6 = KS0_c6(p)
        c7 = KS0_c7(p)
        c8 = KS0_c8(p)
        c9 = KS0_c9(p)
        c10 = KS0_c10(p)
        c11 = KS0_c11(p)
        c12 = KS0_c12(p)
        c13 = KS0_c13(p)
        c14 = KS0_c14(p)
        c15 = KS0_c15(p)
        c16 = KS0_c16(p)
        c17 = KS0_c17(p)
        c18 = KS0_c18(p)
        c19 = KS0_c19(p)
        c20 = KS0_c20(p)
        eta = KS0_eta(p)
        w = KS0_w(p)
        xi = KS0_xi(p)
        J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
        J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
        J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
        J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
        Ji00 = J11*idet
        Ji01 = -J01*idet
        Ji10 = -J10*idet
        Ji11 = J00*idet
        dNdx1 = Ji00*c5 + Ji01*c6
        dNdy1 = Ji10*c5 + Ji11*c6
        dNdx2 = Ji00*c7 + Ji01*c8
        dNdy2 = Ji10*c7 + Ji11*c8
        dNdx3 = Ji00*c9 + Ji01*c10
        dNdy3 = Ji10*c9 + Ji11*c10
        dNdx4 = Ji00*c11 + Ji01*c12
        dNdy4 = Ji10*c11 + Ji11*c12
        dNdx5 = Ji00*c13 + Ji01*c14
        dNdy5 = Ji10*c13 + Ji11*c14
        dNdx6 = Ji00*c15 + Ji01*c16
        dNdy6 = Ji10*c15 + Ji11*c16
        dNdx7 = Ji00*c17 + Ji01*c18
        dNdy7 = Ji10*c17 + Ji11*c18
        dNdx8 = Ji00*c19 + Ji01*c20
        dNdy8 = Ji10*c19 + Ji11*c20
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
        T40 = dNdx7*s1
        T41 = dNdx7*s2
        T42 = dNdy7*s3
        T43 = dNdy7*s2
        T44 = dNdy7*s1
        T45 = dNdx7*s3
        T46 = dNdx8*s1
        T47 = dNdx8*s2
        T48 = dNdy8*s3
        T49 = dNdy8*s2
        T50 = dNdy8*s1
        T51 = dNdx8*s3
        T52 = sc0*xi
        T53 = eta*sc0
        s54 = m3*sc0
        T55 = s54*xi
        T56 = eta*s54
        K_0_0 = K_0_0 + (T4*dNdx1 + T6*dNdy1)
        K_0_1 = K_0_1 + (T7*dNdx1 + T9*dNdy1)
        K_0_2 = K_0_2 + (T10*dNdx1 + T12*dNdy1)
        K_0_3 = K_0_3 + (T13*dNdx1 + T15*dNdy1)
        K_0_4 = K_0_4 + (T16*dNdx1 + T18*dNdy1)
        K_0_5 = K_0_5 + (T19*dNdx1 + T21*dNdy1)
        K_0_6 = K_0_6 + (T22*dNdx1 + T24*dNdy1)
        K_0_7 = K_0_7 + (T25*dNdx1 + T27*dNdy1)
        K_0_8 = K_0_8 + (T28*dNdx1 + T30*dNdy1)
        K_0_9 = K_0_9 + (T31*dNdx1 + T33*dNdy1)
        K_0_10 = K_0_10 + (T34*dNdx1 + T36*dNdy1)
        K_0_11 = K_0_11 + (T37*dNdx1 + T39*dNdy1)
        K_0_12 = K_0_12 + (T40*dNdx1 + T42*dNdy1)
        K_0_13 = K_0_13 + (T43*dNdx1 + T45*dNdy1)
        K_0_14 = K_0_14 + (T46*dNdx1 + T48*dNdy1)
        K_0_15 = K_0_15 + (T49*dNdx1 + T51*dNdy1)
        K_1_1 = K_1_1 + (T8*dNdy1 + T9*dNdx1)
        K_1_2 = K_1_2 + (T11*dNdy1 + T12*dNdx1)
        K_1_3 = K_1_3 + (T14*dNdy1 + T15*dNdx1)
        K_1_4 = K_1_4 + (T17*dNdy1 + T18*dNdx1)
        K_1_5 = K_1_5 + (T20*dNdy1 + T21*dNdx1)
        K_1_6 = K_1_6 + (T23*dNdy1 + T24*dNdx1)
        K_1_7 = K_1_7 + (T26*dNdy1 + T27*dNdx1)
        K_1_8 = K_1_8 + (T29*dNdy1 + T30*dNdx1)
        K_1_9 = K_1_9 + (T32*dNdy1 + T33*dNdx1)
        K_1_10 = K_1_10 + (T35*dNdy1 + T36*dNdx1)
        K_1_11 = K_1_11 + (T38*dNdy1 + T39*dNdx1)
        K_1_12 = K_1_12 + (T41*dNdy1 + T42*dNdx1)
        K_1_13 = K_1_13 + (T44*dNdy1 + T45*dNdx1)
        K_1_14 = K_1_14 + (T47*dNdy1 + T48*dNdx1)
        K_1_15 = K_1_15 + (T50*dNdy1 + T51*dNdx1)
        K_2_2 = K_2_2 + (T10*dNdx2 + T12*dNdy2)
        K_2_3 = K_2_3 + (T13*dNdx2 + T15*dNdy2)
        K_2_4 = K_2_4 + (T16*dNdx2 + T18*dNdy2)
        K_2_5 = K_2_5 + (T19*dNdx2 + T21*dNdy2)
        K_2_6 = K_2_6 + (T22*dNdx2 + T24*dNdy2)
        K_2_7 = K_2_7 + (T25*dNdx2 + T27*dNdy2)
        K_2_8 = K_2_8 + (T28*dNdx2 + T30*dNdy2)
        K_2_9 = K_2_9 + (T31*dNdx2 + T33*dNdy2)
        K_2_10 = K_2_10 + (T34*dNdx2 + T36*dNdy2)
        K_2_11 = K_2_11 + (T37*dNdx2 + T39*dNdy2)
        K_2_12 = K_2_12 + (T40*dNdx2 + T42*dNdy2)
        K_2_13 = K_2_13 + (T43*dNdx2 + T45*dNdy2)
        K_2_14 = K_2_14 + (T46*dNdx2 + T48*dNdy2)
        K_2_15 = K_2_15 + (T49*dNdx2 + T51*dNdy2)
        K_3_3 = K_3_3 + (T14*dNdy2 + T15*dNdx2)
        K_3_4 = K_3_4 + (T17*dNdy2 + T18*dNdx2)
        K_3_5 = K_3_5 + (T20*dNdy2 + T21*dNdx2)
        K_3_6 = K_3_6 + (T23*dNdy2 + T24*dNdx2)
        K_3_7 = K_3_7 + (T26*dNdy2 + T27*dNdx2)
        K_3_8 = K_3_8 + (T29*dNdy2 + T30*dNdx2)
        K_3_9 = K_3_9 + (T32*dNdy2 + T33*dNdx2)
        K_3_10 = K_3_10 + (T35*dNdy2 + T36*dNdx2)
        K_3_11 = K_3_11 + (T38*dNdy2 + T39*dNdx2)
        K_3_12 = K_3_12 + (T41*dNdy2 + T42*dNdx2)
        K_3_13 = K_3_13 + (T44*dNdy2 + T45*dNdx2)
        K_3_14 = K_3_14 + (T47*dNdy2 + T48*dNdx2)
        K_3_15 = K_3_15 + (T50*dNdy2 + T51*dNdx2)
        K_4_4 = K_4_4 + (T16*dNdx3 + T18*dNdy3)
        K_4_5 = K_4_5 + (T19*dNdx3 + T21*dNdy3)
        K_4_6 = K_4_6 + (T22*dNdx3 + T24*dNdy3)
        K_4_7 = K_4_7 + (T25*dNdx3 + T27*dNdy3)
        K_4_8 = K_4_8 + (T28*dNdx3 + T30*dNdy3)
        K_4_9 = K_4_9 + (T31*dNdx3 + T33*dNdy3)
        K_4_10 = K_4_10 + (T34*dNdx3 + T36*dNdy3)
        K_4_11 = K_4_11 + (T37*dNdx3 + T39*dNdy3)
        K_4_12 = K_4_12 + (T40*dNdx3 + T42*dNdy3)
        K_4_13 = K_4_13 + (T43*dNdx3 + T45*dNdy3)
        K_4_14 = K_4_14 + (T46*dNdx3 + T48*dNdy3)
        K_4_15 = K_4_15 + (T49*dNdx3 + T51*dNdy3)
        K_5_5 = K_5_5 + (T20*dNdy3 + T21*dNdx3)
        K_5_6 = K_5_6 + (T23*dNdy3 + T24*dNdx3)
        K_5_7 = K_5_7 + (T26*dNdy3 + T27*dNdx3)
        K_5_8 = K_5_8 + (T29*dNdy3 + T30*dNdx3)
        K_5_9 = K_5_9 + (T32*dNdy3 + T33*dNdx3)
        K_5_10 = K_5_10 + (T35*dNdy3 + T36*dNdx3)
        K_5_11 = K_5_11 + (T38*dNdy3 + T39*dNdx3)
        K_5_12 = K_5_12 + (T41*dNdy3 + T42*dNdx3)
        K_5_13 = K_5_13 + (T44*dNdy3 + T45*dNdx3)
        K_5_14 = K_5_14 + (T47*dNdy3 + T48*dNdx3)
        K_5_15 = K_5_15 + (T50*dNdy3 + T51*dNdx3)
        K_6_6 = K_6_6 + (T22*dNdx4 + T24*dNdy4)
        K_6_7 = K_6_7 + (T25*dNdx4 + T27*dNdy4)
        K_6_8 = K_6_8 + (T28*dNdx4 + T30*dNdy4)
        K_6_9 = K_6_9 + (T31*dNdx4 + T33*dNdy4)
        K_6_10 = K_6_10 + (T34*dNdx4 + T36*dNdy4)
        K_6_11 = K_6_11 + (T37*dNdx4 + T39*dNdy4)
        K_6_12 = K_6_12 + (T40*dNdx4 + T42*dNdy4)
        K_6_13 = K_6_13 + (T43*dNdx4 + T45*dNdy4)
        K_6_14 = K_6_14 + (T46*dNdx4 + T48*dNdy4)
        K_6_15 = K_6_15 + (T49*dNdx4 + T51*dNdy4)
        K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
        K_7_8 = K_7_8 + (T29*dNdy4 + T30*dNdx4)
        K_7_9 = K_7_9 + (T32*dNdy4 + T33*dNdx4)
        K_7_10 = K_7_10 + (T35*dNdy4 + T36*dNdx4)
        K_7_11 = K_7_11 + (T38*dNdy4 + T39*dNdx4)
        K_7_12 = K_7_12 + (T41*dNdy4 + T42*dNdx4)
        K_7_13 = K_7_13 + (T44*dNdy4 + T45*dNdx4)
        K_7_14 = K_7_14 + (T47*dNdy4 + T48*dNdx4)
        K_7_15 = K_7_15 + (T50*dNdy4 + T51*dNdx4)
        K_8_8 = K_8_8 + (T28*dNdx5 + T30*dNdy5)
        K_8_9 = K_8_9 + (T31*dNdx5 + T33*dNdy5)
        K_8_10 = K_8_10 + (T34*dNdx5 + T36*dNdy5)
        K_8_11 = K_8_11 + (T37*dNdx5 + T39*dNdy5)
        K_8_12 = K_8_12 + (T40*dNdx5 + T42*dNdy5)
        K_8_13 = K_8_13 + (T43*dNdx5 + T45*dNdy5)
        K_8_14 = K_8_14 + (T46*dNdx5 + T48*dNdy5)
        K_8_15 = K_8_15 + (T49*dNdx5 + T51*dNdy5)
        K_9_9 = K_9_9 + (T32*dNdy5 + T33*dNdx5)
        K_9_10 = K_9_10 + (T35*dNdy5 + T36*dNdx5)
        K_9_11 = K_9_11 + (T38*dNdy5 + T39*dNdx5)
        K_9_12 = K_9_12 + (T41*dNdy5 + T42*dNdx5)
        K_9_13 = K_9_13 + (T44*dNdy5 + T45*dNdx5)
        K_9_14 = K_9_14 + (T47*dNdy5 + T48*dNdx5)
        K_9_15 = K_9_15 + (T50*dNdy5 + T51*dNdx5)
        K_10_10 = K_10_10 + (T34*dNdx6 + T36*dNdy6)
        K_10_11 = K_10_11 + (T37*dNdx6 + T39*dNdy6)
        K_10_12 = K_10_12 + (T40*dNdx6 + T42*dNdy6)
        K_10_13 = K_10_13 + (T43*dNdx6 + T45*dNdy6)
        K_10_14 = K_10_14 + (T46*dNdx6 + T48*dNdy6)
        K_10_15 = K_10_15 + (T49*dNdx6 + T51*dNdy6)
        K_11_11 = K_11_11 + (T38*dNdy6 + T39*dNdx6)
        K_11_12 = K_11_12 + (T41*dNdy6 + T42*dNdx6)
        K_11_13 = K_11_13 + (T44*dNdy6 + T45*dNdx6)
        K_11_14 = K_11_14 + (T47*dNdy6 + T48*dNdx6)
        K_11_15 = K_11_15 + (T50*dNdy6 + T51*dNdx6)
        K_12_12 = K_12_12 + (T40*dNdx7 + T42*dNdy7)
        K_12_13 = K_12_13 + (T43*dNdx7 + T45*dNdy7)
        K_12_14 = K_12_14 + (T46*dNdx7 + T48*dNdy7)
        K_12_15 = K_12_15 + (T49*dNdx7 + T51*dNdy7)
        K_13_13 = K_13_13 + (T44*dNdy7 + T45*dNdx7)
        K_13_14 = K_13_14 + (T47*dNdy7 + T48*dNdx7)
        K_13_15 = K_13_15 + (T50*dNdy7 + T51*dNdx7)
        K_14_14 = K_14_14 + (T46*dNdx8 + T48*dNdy8)
        K_14_15 = K_14_15 + (T49*dNdx8 + T51*dNdy8)
        K_15_15 = K_15_15 + (T50*dNdy8 + T51*dNdx8)
        A_0_0 = A_0_0 + (dNdx1*sc0)
        A_0_1 = A_0_1 + (T52*dNdx1)
        A_0_2 = A_0_2 + (T53*dNdx1)
        A_1_0 = A_1_0 + (dNdy1*sc0)
        A_1_1 = A_1_1 + (T52*dNdy1)
        A_1_2 = A_1_2 + (T53*dNdy1)
        A_2_0 = A_2_0 + (dNdx2*sc0)
        A_2_1 = A_2_1 + (T52*dNdx2)
        A_2_2 = A_2_2 + (T53*dNdx2)
        A_3_0 = A_3_0 + (dNdy2*sc0)
        A_3_1 = A_3_1 + (T52*dNdy2)
        A_3_2 = A_3_2 + (T53*dNdy2)
        A_4_0 = A_4_0 + (dNdx3*sc0)
        A_4_1 = A_4_1 + (T52*dNdx3)
        A_4_2 = A_4_2 + (T53*dNdx3)
        A_5_0 = A_5_0 + (dNdy3*sc0)
        A_5_1 = A_5_1 + (T52*dNdy3)
        A_5_2 = A_5_2 + (T53*dNdy3)
        A_6_0 = A_6_0 + (dNdx4*sc0)
        A_6_1 = A_6_1 + (T52*dNdx4)
        A_6_2 = A_6_2 + (T53*dNdx4)
        A_7_0 = A_7_0 + (dNdy4*sc0)
        A_7_1 = A_7_1 + (T52*dNdy4)
        A_7_2 = A_7_2 + (T53*dNdy4)
        A_8_0 = A_8_0 + (dNdx5*sc0)
        A_8_1 = A_8_1 + (T52*dNdx5)
        A_8_2 = A_8_2 + (T53*dNdx5)
        A_9_0 = A_9_0 + (dNdy5*sc0)
        A_9_1 = A_9_1 + (T52*dNdy5)
        A_9_2 = A_9_2 + (T53*dNdy5)
        A_10_0 = A_10_0 + (dNdx6*sc0)
        A_10_1 = A_10_1 + (T52*dNdx6)
        A_10_2 = A_10_2 + (T53*dNdx6)
        A_11_0 = A_11_0 + (dNdy6*sc0)
        A_11_1 = A_11_1 + (T52*dNdy6)
        A_11_2 = A_11_2 + (T53*dNdy6)
        A_12_0 = A_12_0 + (dNdx7*sc0)
        A_12_1 = A_12_1 + (T52*dNdx7)
        A_12_2 = A_12_2 + (T53*dNdx7)
        A_13_0 = A_13_0 + (dNdy7*sc0)
        A_13_1 = A_13_1 + (T52*dNdy7)
        A_13_2 = A_13_2 + (T53*dNdy7)
        A_14_0 = A_14_0 + (dNdx8*sc0)
        A_14_1 = A_14_1 + (T52*dNdx8)
        A_14_2 = A_14_2 + (T53*dNdx8)
        A_15_0 = A_15_0 + (dNdy8*sc0)
        A_15_1 = A_15_1 + (T52*dNdy8)
        A_15_2 = A_15_2 + (T53*dNdy8)
        H_0_0 = H_0_0 + (s54)
        H_0_1 = H_0_1 + (T55)
        H_0_2 = H_0_2 + (T56)
        H_1_1 = H_1_1 + (T55*xi)
        H_1_2 = H_1_2 + (T56*xi)
        H_2_2 = H_2_2 + (T56*eta)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0_dp/cd2
    cy1_0 = A_0_1 - A_0_0*cL1_0
    cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0
    cy1_1 = A_1_1 - A_1_0*cL1_0
    cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1
    cy1_2 = A_2_1 - A_2_0*cL1_0
    cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2
    cy1_3 = A_3_1 - A_3_0*cL1_0
    cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3
    cy1_4 = A_4_1 - A_4_0*cL1_0
    cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4
    cy1_5 = A_5_1 - A_5_0*cL1_0
    cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5
    cy1_6 = A_6_1 - A_6_0*cL1_0
    cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6
    cy1_7 = A_7_1 - A_7_0*cL1_0
    cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7
    cy1_8 = A_8_1 - A_8_0*cL1_0
    cy2_8 = A_8_2 - A_8_0*cL2_0 - cL2_1*cy1_8
    cy1_9 = A_9_1 - A_9_0*cL1_0
    cy2_9 = A_9_2 - A_9_0*cL2_0 - cL2_1*cy1_9
    cy1_10 = A_10_1 - A_10_0*cL1_0
    cy2_10 = A_10_2 - A_10_0*cL2_0 - cL2_1*cy1_10
    cy1_11 = A_11_1 - A_11_0*cL1_0
    cy2_11 = A_11_2 - A_11_0*cL2_0 - cL2_1*cy1_11
    cy1_12 = A_12_1 - A_12_0*cL1_0
    cy2_12 = A_12_2 - A_12_0*cL2_0 - cL2_1*cy1_12
    cy1_13 = A_13_1 - A_13_0*cL1_0
    cy2_13 = A_13_2 - A_13_0*cL2_0 - cL2_1*cy1_13
    cy1_14 = A_14_1 - A_14_0*cL1_0
    cy2_14 = A_14_2 - A_14_0*cL2_0 - cL2_1*cy1_14
    cy1_15 = A_15_1 - A_15_0*cL1_0
    cy2_15 = A_15_2 - A_15_0*cL2_0 - cL2_1*cy1_15
    cz0_0 = A_0_0*cid0
    cz1_0 = cid1*cy1_0
    cz2_0 = cid2*cy2_0
    cz0_1 = A_1_0*cid0
    cz1_1 = cid1*cy1_1
    cz2_1 = cid2*cy2_1
    cz0_2 = A_2_0*cid0
    cz1_2 = cid1*cy1_2
    cz2_2 = cid2*cy2_2
    cz0_3 = A_3_0*cid0
    cz1_3 = cid1*cy1_3
    cz2_3 = cid2*cy2_3
    cz0_4 = A_4_0*cid0
    cz1_4 = cid1*cy1_4
    cz2_4 = cid2*cy2_4
    cz0_5 = A_5_0*cid0
    cz1_5 = cid1*cy1_5
    cz2_5 = cid2*cy2_5
    cz0_6 = A_6_0*cid0
    cz1_6 = cid1*cy1_6
    cz2_6 = cid2*cy2_6
    cz0_7 = A_7_0*cid0
    cz1_7 = cid1*cy1_7
    cz2_7 = cid2*cy2_7
    cz0_8 = A_8_0*cid0
    cz1_8 = cid1*cy1_8
    cz2_8 = cid2*cy2_8
    cz0_9 = A_9_0*cid0
    cz1_9 = cid1*cy1_9
    cz2_9 = cid2*cy2_9
    cz0_10 = A_10_0*cid0
    cz1_10 = cid1*cy1_10
    cz2_10 = cid2*cy2_10
    cz0_11 = A_11_0*cid0
    cz1_11 = cid1*cy1_11
    cz2_11 = cid2*cy2_11
    cz0_12 = A_12_0*cid0
    cz1_12 = cid1*cy1_12
    cz2_12 = cid2*cy2_12
    cz0_13 = A_13_0*cid0
    cz1_13 = cid1*cy1_13
    cz2_13 = cid2*cy2_13
    cz0_14 = A_14_0*cid0
    cz1_14 = cid1*cy1_14
    cz2_14 = cid2*cy2_14
    cz0_15 = A_15_0*cid0
    cz1_15 = cid1*cy1_15
    cz2_15 = cid2*cy2_15
    K(1, 1) = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0
    K(1, 2) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0
    K(1, 3) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0
    K(1, 4) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0
    K(1, 5) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0
    K(1, 6) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0
    K(1, 7) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0
    K(1, 8) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0
    K(1, 9) = K_0_8 - A_8_0*cz0_0 - cy1_8*cz1_0 - cy2_8*cz2_0
    K(1, 10) = K_0_9 - A_9_0*cz0_0 - cy1_9*cz1_0 - cy2_9*cz2_0
    K(1, 11) = K_0_10 - A_10_0*cz0_0 - cy1_10*cz1_0 - cy2_10*cz2_0
    K(1, 12) = K_0_11 - A_11_0*cz0_0 - cy1_11*cz1_0 - cy2_11*cz2_0
    K(1, 13) = K_0_12 - A_12_0*cz0_0 - cy1_12*cz1_0 - cy2_12*cz2_0
    K(1, 14) = K_0_13 - A_13_0*cz0_0 - cy1_13*cz1_0 - cy2_13*cz2_0
    K(1, 15) = K_0_14 - A_14_0*cz0_0 - cy1_14*cz1_0 - cy2_14*cz2_0
    K(1, 16) = K_0_15 - A_15_0*cz0_0 - cy1_15*cz1_0 - cy2_15*cz2_0
    K(2, 1) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0
    K(2, 2) = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1
    K(2, 3) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1
    K(2, 4) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1
    K(2, 5) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1
    K(2, 6) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1
    K(2, 7) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1
    K(2, 8) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1
    K(2, 9) = K_1_8 - A_8_0*cz0_1 - cy1_8*cz1_1 - cy2_8*cz2_1
    K(2, 10) = K_1_9 - A_9_0*cz0_1 - cy1_9*cz1_1 - cy2_9*cz2_1
    K(2, 11) = K_1_10 - A_10_0*cz0_1 - cy1_10*cz1_1 - cy2_10*cz2_1
    K(2, 12) = K_1_11 - A_11_0*cz0_1 - cy1_11*cz1_1 - cy2_11*cz2_1
    K(2, 13) = K_1_12 - A_12_0*cz0_1 - cy1_12*cz1_1 - cy2_12*cz2_1
    K(2, 14) = K_1_13 - A_13_0*cz0_1 - cy1_13*cz1_1 - cy2_13*cz2_1
    K(2, 15) = K_1_14 - A_14_0*cz0_1 - cy1_14*cz1_1 - cy2_14*cz2_1
    K(2, 16) = K_1_15 - A_15_0*cz0_1 - cy1_15*cz1_1 - cy2_15*cz2_1
    K(3, 1) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0
    K(3, 2) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1
    K(3, 3) = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2
    K(3, 4) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2
    K(3, 5) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2
    K(3, 6) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2
    K(3, 7) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2
    K(3, 8) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2
    K(3, 9) = K_2_8 - A_8_0*cz0_2 - cy1_8*cz1_2 - cy2_8*cz2_2
    K(3, 10) = K_2_9 - A_9_0*cz0_2 - cy1_9*cz1_2 - cy2_9*cz2_2
    K(3, 11) = K_2_10 - A_10_0*cz0_2 - cy1_10*cz1_2 - cy2_10*cz2_2
    K(3, 12) = K_2_11 - A_11_0*cz0_2 - cy1_11*cz1_2 - cy2_11*cz2_2
    K(3, 13) = K_2_12 - A_12_0*cz0_2 - cy1_12*cz1_2 - cy2_12*cz2_2
    K(3, 14) = K_2_13 - A_13_0*cz0_2 - cy1_13*cz1_2 - cy2_13*cz2_2
    K(3, 15) = K_2_14 - A_14_0*cz0_2 - cy1_14*cz1_2 - cy2_14*cz2_2
    K(3, 16) = K_2_15 - A_15_0*cz0_2 - cy1_15*cz1_2 - cy2_15*cz2_2
    K(4, 1) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0
    K(4, 2) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1
    K(4, 3) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2
    K(4, 4) = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3
    K(4, 5) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3
    K(4, 6) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3
    K(4, 7) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3
    K(4, 8) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3
    K(4, 9) = K_3_8 - A_8_0*cz0_3 - cy1_8*cz1_3 - cy2_8*cz2_3
    K(4, 10) = K_3_9 - A_9_0*cz0_3 - cy1_9*cz1_3 - cy2_9*cz2_3
    K(4, 11) = K_3_10 - A_10_0*cz0_3 - cy1_10*cz1_3 - cy2_10*cz2_3
    K(4, 12) = K_3_11 - A_11_0*cz0_3 - cy1_11*cz1_3 - cy2_11*cz2_3
    K(4, 13) = K_3_12 - A_12_0*cz0_3 - cy1_12*cz1_3 - cy2_12*cz2_3
    K(4, 14) = K_3_13 - A_13_0*cz0_3 - cy1_13*cz1_3 - cy2_13*cz2_3
    K(4, 15) = K_3_14 - A_14_0*cz0_3 - cy1_14*cz1_3 - cy2_14*cz2_3
    K(4, 16) = K_3_15 - A_15_0*cz0_3 - cy1_15*cz1_3 - cy2_15*cz2_3
    K(5, 1) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0
    K(5, 2) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1
    K(5, 3) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2
    K(5, 4) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3
    K(5, 5) = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4
    K(5, 6) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4
    K(5, 7) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4
    K(5, 8) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4
    K(5, 9) = K_4_8 - A_8_0*cz0_4 - cy1_8*cz1_4 - cy2_8*cz2_4
    K(5, 10) = K_4_9 - A_9_0*cz0_4 - cy1_9*cz1_4 - cy2_9*cz2_4
    K(5, 11) = K_4_10 - A_10_0*cz0_4 - cy1_10*cz1_4 - cy2_10*cz2_4
    K(5, 12) = K_4_11 - A_11_0*cz0_4 - cy1_11*cz1_4 - cy2_11*cz2_4
    K(5, 13) = K_4_12 - A_12_0*cz0_4 - cy1_12*cz1_4 - cy2_12*cz2_4
    K(5, 14) = K_4_13 - A_13_0*cz0_4 - cy1_13*cz1_4 - cy2_13*cz2_4
    K(5, 15) = K_4_14 - A_14_0*cz0_4 - cy1_14*cz1_4 - cy2_14*cz2_4
    K(5, 16) = K_4_15 - A_15_0*cz0_4 - cy1_15*cz1_4 - cy2_15*cz2_4
    K(6, 1) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0
    K(6, 2) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1
    K(6, 3) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2
    K(6, 4) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3
    K(6, 5) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4
    K(6, 6) = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5
    K(6, 7) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5
    K(6, 8) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5
    K(6, 9) = K_5_8 - A_8_0*cz0_5 - cy1_8*cz1_5 - cy2_8*cz2_5
    K(6, 10) = K_5_9 - A_9_0*cz0_5 - cy1_9*cz1_5 - cy2_9*cz2_5
    K(6, 11) = K_5_10 - A_10_0*cz0_5 - cy1_10*cz1_5 - cy2_10*cz2_5
    K(6, 12) = K_5_11 - A_11_0*cz0_5 - cy1_11*cz1_5 - cy2_11*cz2_5
    K(6, 13) = K_5_12 - A_12_0*cz0_5 - cy1_12*cz1_5 - cy2_12*cz2_5
    K(6, 14) = K_5_13 - A_13_0*cz0_5 - cy1_13*cz1_5 - cy2_13*cz2_5
    K(6, 15) = K_5_14 - A_14_0*cz0_5 - cy1_14*cz1_5 - cy2_14*cz2_5
    K(6, 16) = K_5_15 - A_15_0*cz0_5 - cy1_15*cz1_5 - cy2_15*cz2_5
    K(7, 1) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0
    K(7, 2) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1
    K(7, 3) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2
    K(7, 4) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3
    K(7, 5) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4
    K(7, 6) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5
    K(7, 7) = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6
    K(7, 8) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6
    K(7, 9) = K_6_8 - A_8_0*cz0_6 - cy1_8*cz1_6 - cy2_8*cz2_6
    K(7, 10) = K_6_9 - A_9_0*cz0_6 - cy1_9*cz1_6 - cy2_9*cz2_6
    K(7, 11) = K_6_10 - A_10_0*cz0_6 - cy1_10*cz1_6 - cy2_10*cz2_6
    K(7, 12) = K_6_11 - A_11_0*cz0_6 - cy1_11*cz1_6 - cy2_11*cz2_6
    K(7, 13) = K_6_12 - A_12_0*cz0_6 - cy1_12*cz1_6 - cy2_12*cz2_6
    K(7, 14) = K_6_13 - A_13_0*cz0_6 - cy1_13*cz1_6 - cy2_13*cz2_6
    K(7, 15) = K_6_14 - A_14_0*cz0_6 - cy1_14*cz1_6 - cy2_14*cz2_6
    K(7, 16) = K_6_15 - A_15_0*cz0_6 - cy1_15*cz1_6 - cy2_15*cz2_6
    K(8, 1) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0
    K(8, 2) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1
    K(8, 3) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2
    K(8, 4) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3
    K(8, 5) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4
    K(8, 6) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5
    K(8, 7) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6
    K(8, 8) = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7
    K(8, 9) = K_7_8 - A_8_0*cz0_7 - cy1_8*cz1_7 - cy2_8*cz2_7
    K(8, 10) = K_7_9 - A_9_0*cz0_7 - cy1_9*cz1_7 - cy2_9*cz2_7
    K(8, 11) = K_7_10 - A_10_0*cz0_7 - cy1_10*cz1_7 - cy2_10*cz2_7
    K(8, 12) = K_7_11 - A_11_0*cz0_7 - cy1_11*cz1_7 - cy2_11*cz2_7
    K(8, 13) = K_7_12 - A_12_0*cz0_7 - cy1_12*cz1_7 - cy2_12*cz2_7
    K(8, 14) = K_7_13 - A_13_0*cz0_7 - cy1_13*cz1_7 - cy2_13*cz2_7
    K(8, 15) = K_7_14 - A_14_0*cz0_7 - cy1_14*cz1_7 - cy2_14*cz2_7
    K(8, 16) = K_7_15 - A_15_0*cz0_7 - cy1_15*cz1_7 - cy2_15*cz2_7
    K(9, 1) = K_0_8 - A_8_0*cz0_0 - cy1_8*cz1_0 - cy2_8*cz2_0
    K(9, 2) = K_1_8 - A_8_0*cz0_1 - cy1_8*cz1_1 - cy2_8*cz2_1
    K(9, 3) = K_2_8 - A_8_0*cz0_2 - cy1_8*cz1_2 - cy2_8*cz2_2
    K(9, 4) = K_3_8 - A_8_0*cz0_3 - cy1_8*cz1_3 - cy2_8*cz2_3
    K(9, 5) = K_4_8 - A_8_0*cz0_4 - cy1_8*cz1_4 - cy2_8*cz2_4
    K(9, 6) = K_5_8 - A_8_0*cz0_5 - cy1_8*cz1_5 - cy2_8*cz2_5
    K(9, 7) = K_6_8 - A_8_0*cz0_6 - cy1_8*cz1_6 - cy2_8*cz2_6
    K(9, 8) = K_7_8 - A_8_0*cz0_7 - cy1_8*cz1_7 - cy2_8*cz2_7
    K(9, 9) = K_8_8 - A_8_0*cz0_8 - cy1_8*cz1_8 - cy2_8*cz2_8
    K(9, 10) = K_8_9 - A_9_0*cz0_8 - cy1_9*cz1_8 - cy2_9*cz2_8
    K(9, 11) = K_8_10 - A_10_0*cz0_8 - cy1_10*cz1_8 - cy2_10*cz2_8
    K(9, 12) = K_8_11 - A_11_0*cz0_8 - cy1_11*cz1_8 - cy2_11*cz2_8
    K(9, 13) = K_8_12 - A_12_0*cz0_8 - cy1_12*cz1_8 - cy2_12*cz2_8
    K(9, 14) = K_8_13 - A_13_0*cz0_8 - cy1_13*cz1_8 - cy2_13*cz2_8
    K(9, 15) = K_8_14 - A_14_0*cz0_8 - cy1_14*cz1_8 - cy2_14*cz2_8
    K(9, 16) = K_8_15 - A_15_0*cz0_8 - cy1_15*cz1_8 - cy2_15*cz2_8
    K(10, 1) = K_0_9 - A_9_0*cz0_0 - cy1_9*cz1_0 - cy2_9*cz2_0
    K(10, 2) = K_1_9 - A_9_0*cz0_1 - cy1_9*cz1_1 - cy2_9*cz2_1
    K(10, 3) = K_2_9 - A_9_0*cz0_2 - cy1_9*cz1_2 - cy2_9*cz2_2
    K(10, 4) = K_3_9 - A_9_0*cz0_3 - cy1_9*cz1_3 - cy2_9*cz2_3
    K(10, 5) = K_4_9 - A_9_0*cz0_4 - cy1_9*cz1_4 - cy2_9*cz2_4
    K(10, 6) = K_5_9 - A_9_0*cz0_5 - cy1_9*cz1_5 - cy2_9*cz2_5
    K(10, 7) = K_6_9 - A_9_0*cz0_6 - cy1_9*cz1_6 - cy2_9*cz2_6
    K(10, 8) = K_7_9 - A_9_0*cz0_7 - cy1_9*cz1_7 - cy2_9*cz2_7
    K(10, 9) = K_8_9 - A_9_0*cz0_8 - cy1_9*cz1_8 - cy2_9*cz2_8
    K(10, 10) = K_9_9 - A_9_0*cz0_9 - cy1_9*cz1_9 - cy2_9*cz2_9
    K(10, 11) = K_9_10 - A_10_0*cz0_9 - cy1_10*cz1_9 - cy2_10*cz2_9
    K(10, 12) = K_9_11 - A_11_0*cz0_9 - cy1_11*cz1_9 - cy2_11*cz2_9
    K(10, 13) = K_9_12 - A_12_0*cz0_9 - cy1_12*cz1_9 - cy2_12*cz2_9
    K(10, 14) = K_9_13 - A_13_0*cz0_9 - cy1_13*cz1_9 - cy2_13*cz2_9
    K(10, 15) = K_9_14 - A_14_0*cz0_9 - cy1_14*cz1_9 - cy2_14*cz2_9
    K(10, 16) = K_9_15 - A_15_0*cz0_9 - cy1_15*cz1_9 - cy2_15*cz2_9
    K(11, 1) = K_0_10 - A_10_0*cz0_0 - cy1_10*cz1_0 - cy2_10*cz2_0
    K(11, 2) = K_1_10 - A_10_0*cz0_1 - cy1_10*cz1_1 - cy2_10*cz2_1
    K(11, 3) = K_2_10 - A_10_0*cz0_2 - cy1_10*cz1_2 - cy2_10*cz2_2
    K(11, 4) = K_3_10 - A_10_0*cz0_3 - cy1_10*cz1_3 - cy2_10*cz2_3
    K(11, 5) = K_4_10 - A_10_0*cz0_4 - cy1_10*cz1_4 - cy2_10*cz2_4
    K(11, 6) = K_5_10 - A_10_0*cz0_5 - cy1_10*cz1_5 - cy2_10*cz2_5
    K(11, 7) = K_6_10 - A_10_0*cz0_6 - cy1_10*cz1_6 - cy2_10*cz2_6
    K(11, 8) = K_7_10 - A_10_0*cz0_7 - cy1_10*cz1_7 - cy2_10*cz2_7
    K(11, 9) = K_8_10 - A_10_0*cz0_8 - cy1_10*cz1_8 - cy2_10*cz2_8
    K(11, 10) = K_9_10 - A_10_0*cz0_9 - cy1_10*cz1_9 - cy2_10*cz2_9
    K(11, 11) = K_10_10 - A_10_0*cz0_10 - cy1_10*cz1_10 - cy2_10*cz2_10
    K(11, 12) = K_10_11 - A_11_0*cz0_10 - cy1_11*cz1_10 - cy2_11*cz2_10
    K(11, 13) = K_10_12 - A_12_0*cz0_10 - cy1_12*cz1_10 - cy2_12*cz2_10
    K(11, 14) = K_10_13 - A_13_0*cz0_10 - cy1_13*cz1_10 - cy2_13*cz2_10
    K(11, 15) = K_10_14 - A_14_0*cz0_10 - cy1_14*cz1_10 - cy2_14*cz2_10
    K(11, 16) = K_10_15 - A_15_0*cz0_10 - cy1_15*cz1_10 - cy2_15*cz2_10
    K(12, 1) = K_0_11 - A_11_0*cz0_0 - cy1_11*cz1_0 - cy2_11*cz2_0
    K(12, 2) = K_1_11 - A_11_0*cz0_1 - cy1_11*cz1_1 - cy2_11*cz2_1
    K(12, 3) = K_2_11 - A_11_0*cz0_2 - cy1_11*cz1_2 - cy2_11*cz2_2
    K(12, 4) = K_3_11 - A_11_0*cz0_3 - cy1_11*cz1_3 - cy2_11*cz2_3
    K(12, 5) = K_4_11 - A_11_0*cz0_4 - cy1_11*cz1_4 - cy2_11*cz2_4
    K(12, 6) = K_5_11 - A_11_0*cz0_5 - cy1_11*cz1_5 - cy2_11*cz2_5
    K(12, 7) = K_6_11 - A_11_0*cz0_6 - cy1_11*cz1_6 - cy2_11*cz2_6
    K(12, 8) = K_7_11 - A_11_0*cz0_7 - cy1_11*cz1_7 - cy2_11*cz2_7
    K(12, 9) = K_8_11 - A_11_0*cz0_8 - cy1_11*cz1_8 - cy2_11*cz2_8
    K(12, 10) = K_9_11 - A_11_0*cz0_9 - cy1_11*cz1_9 - cy2_11*cz2_9
    K(12, 11) = K_10_11 - A_11_0*cz0_10 - cy1_11*cz1_10 - cy2_11*cz2_10
    K(12, 12) = K_11_11 - A_11_0*cz0_11 - cy1_11*cz1_11 - cy2_11*cz2_11
    K(12, 13) = K_11_12 - A_12_0*cz0_11 - cy1_12*cz1_11 - cy2_12*cz2_11
    K(12, 14) = K_11_13 - A_13_0*cz0_11 - cy1_13*cz1_11 - cy2_13*cz2_11
    K(12, 15) = K_11_14 - A_14_0*cz0_11 - cy1_14*cz1_11 - cy2_14*cz2_11
    K(12, 16) = K_11_15 - A_15_0*cz0_11 - cy1_15*cz1_11 - cy2_15*cz2_11
    K(13, 1) = K_0_12 - A_12_0*cz0_0 - cy1_12*cz1_0 - cy2_12*cz2_0
    K(13, 2) = K_1_12 - A_12_0*cz0_1 - cy1_12*cz1_1 - cy2_12*cz2_1
    K(13, 3) = K_2_12 - A_12_0*cz0_2 - cy1_12*cz1_2 - cy2_12*cz2_2
    K(13, 4) = K_3_12 - A_12_0*cz0_3 - cy1_12*cz1_3 - cy2_12*cz2_3
    K(13, 5) = K_4_12 - A_12_0*cz0_4 - cy1_12*cz1_4 - cy2_12*cz2_4
    K(13, 6) = K_5_12 - A_12_0*cz0_5 - cy1_12*cz1_5 - cy2_12*cz2_5
    K(13, 7) = K_6_12 - A_12_0*cz0_6 - cy1_12*cz1_6 - cy2_12*cz2_6
    K(13, 8) = K_7_12 - A_12_0*cz0_7 - cy1_12*cz1_7 - cy2_12*cz2_7
    K(13, 9) = K_8_12 - A_12_0*cz0_8 - cy1_12*cz1_8 - cy2_12*cz2_8
    K(13, 10) = K_9_12 - A_12_0*cz0_9 - cy1_12*cz1_9 - cy2_12*cz2_9
    K(13, 11) = K_10_12 - A_12_0*cz0_10 - cy1_12*cz1_10 - cy2_12*cz2_10
    K(13, 12) = K_11_12 - A_12_0*cz0_11 - cy1_12*cz1_11 - cy2_12*cz2_11
    K(13, 13) = K_12_12 - A_12_0*cz0_12 - cy1_12*cz1_12 - cy2_12*cz2_12
    K(13, 14) = K_12_13 - A_13_0*cz0_12 - cy1_13*cz1_12 - cy2_13*cz2_12
    K(13, 15) = K_12_14 - A_14_0*cz0_12 - cy1_14*cz1_12 - cy2_14*cz2_12
    K(13, 16) = K_12_15 - A_15_0*cz0_12 - cy1_15*cz1_12 - cy2_15*cz2_12
    K(14, 1) = K_0_13 - A_13_0*cz0_0 - cy1_13*cz1_0 - cy2_13*cz2_0
    K(14, 2) = K_1_13 - A_13_0*cz0_1 - cy1_13*cz1_1 - cy2_13*cz2_1
    K(14, 3) = K_2_13 - A_13_0*cz0_2 - cy1_13*cz1_2 - cy2_13*cz2_2
    K(14, 4) = K_3_13 - A_13_0*cz0_3 - cy1_13*cz1_3 - cy2_13*cz2_3
    K(14, 5) = K_4_13 - A_13_0*cz0_4 - cy1_13*cz1_4 - cy2_13*cz2_4
    K(14, 6) = K_5_13 - A_13_0*cz0_5 - cy1_13*cz1_5 - cy2_13*cz2_5
    K(14, 7) = K_6_13 - A_13_0*cz0_6 - cy1_13*cz1_6 - cy2_13*cz2_6
    K(14, 8) = K_7_13 - A_13_0*cz0_7 - cy1_13*cz1_7 - cy2_13*cz2_7
    K(14, 9) = K_8_13 - A_13_0*cz0_8 - cy1_13*cz1_8 - cy2_13*cz2_8
    K(14, 10) = K_9_13 - A_13_0*cz0_9 - cy1_13*cz1_9 - cy2_13*cz2_9
    K(14, 11) = K_10_13 - A_13_0*cz0_10 - cy1_13*cz1_10 - cy2_13*cz2_10
    K(14, 12) = K_11_13 - A_13_0*cz0_11 - cy1_13*cz1_11 - cy2_13*cz2_11
    K(14, 13) = K_12_13 - A_13_0*cz0_12 - cy1_13*cz1_12 - cy2_13*cz2_12
    K(14, 14) = K_13_13 - A_13_0*cz0_13 - cy1_13*cz1_13 - cy2_13*cz2_13
    K(14, 15) = K_13_14 - A_14_0*cz0_13 - cy1_14*cz1_13 - cy2_14*cz2_13
    K(14, 16) = K_13_15 - A_15_0*cz0_13 - cy1_15*cz1_13 - cy2_15*cz2_13
    K(15, 1) = K_0_14 - A_14_0*cz0_0 - cy1_14*cz1_0 - cy2_14*cz2_0
    K(15, 2) = K_1_14 - A_14_0*cz0_1 - cy1_14*cz1_1 - cy2_14*cz2_1
    K(15, 3) = K_2_14 - A_14_0*cz0_2 - cy1_14*cz1_2 - cy2_14*cz2_2
    K(15, 4) = K_3_14 - A_14_0*cz0_3 - cy1_14*cz1_3 - cy2_14*cz2_3
    K(15, 5) = K_4_14 - A_14_0*cz0_4 - cy1_14*cz1_4 - cy2_14*cz2_4
    K(15, 6) = K_5_14 - A_14_0*cz0_5 - cy1_14*cz1_5 - cy2_14*cz2_5
    K(15, 7) = K_6_14 - A_14_0*cz0_6 - cy1_14*cz1_6 - cy2_14*cz2_6
    K(15, 8) = K_7_14 - A_14_0*cz0_7 - cy1_14*cz1_7 - cy2_14*cz2_7
    K(15, 9) = K_8_14 - A_14_0*cz0_8 - cy1_14*cz1_8 - cy2_14*cz2_8
    K(15, 10) = K_9_14 - A_14_0*cz0_9 - cy1_14*cz1_9 - cy2_14*cz2_9
    K(15, 11) = K_10_14 - A_14_0*cz0_10 - cy1_14*cz1_10 - cy2_14*cz2_10
    K(15, 12) = K_11_14 - A_14_0*cz0_11 - cy1_14*cz1_11 - cy2_14*cz2_11
    K(15, 13) = K_12_14 - A_14_0*cz0_12 - cy1_14*cz1_12 - cy2_14*cz2_12
    K(15, 14) = K_13_14 - A_14_0*cz0_13 - cy1_14*cz1_13 - cy2_14*cz2_13
    K(15, 15) = K_14_14 - A_14_0*cz0_14 - cy1_14*cz1_14 - cy2_14*cz2_14
    K(15, 16) = K_14_15 - A_15_0*cz0_14 - cy1_15*cz1_14 - cy2_15*cz2_14
    K(16, 1) = K_0_15 - A_15_0*cz0_0 - cy1_15*cz1_0 - cy2_15*cz2_0
    K(16, 2) = K_1_15 - A_15_0*cz0_1 - cy1_15*cz1_1 - cy2_15*cz2_1
    K(16, 3) = K_2_15 - A_15_0*cz0_2 - cy1_15*cz1_2 - cy2_15*cz2_2
    K(16, 4) = K_3_15 - A_15_0*cz0_3 - cy1_15*cz1_3 - cy2_15*cz2_3
    K(16, 5) = K_4_15 - A_15_0*cz0_4 - cy1_15*cz1_4 - cy2_15*cz2_4
    K(16, 6) = K_5_15 - A_15_0*cz0_5 - cy1_15*cz1_5 - cy2_15*cz2_5
    K(16, 7) = K_6_15 - A_15_0*cz0_6 - cy1_15*cz1_6 - cy2_15*cz2_6
    K(16, 8) = K_7_15 - A_15_0*cz0_7 - cy1_15*cz1_7 - cy2_15*cz2_7
    K(16, 9) = K_8_15 - A_15_0*cz0_8 - cy1_15*cz1_8 - cy2_15*cz2_8
    K(16, 10) = K_9_15 - A_15_0*cz0_9 - cy1_15*cz1_9 - cy2_15*cz2_9
    K(16, 11) = K_10_15 - A_15_0*cz0_10 - cy1_15*cz1_10 - cy2_15*cz2_10
    K(16, 12) = K_11_15 - A_15_0*cz0_11 - cy1_15*cz1_11 - cy2_15*cz2_11
    K(16, 13) = K_12_15 - A_15_0*cz0_12 - cy1_15*cz1_12 - cy2_15*cz2_12
    K(16, 14) = K_13_15 - A_15_0*cz0_13 - cy1_15*cz1_13 - cy2_15*cz2_13
    K(16, 15) = K_14_15 - A_15_0*cz0_14 - cy1_15*cz1_14 - cy2_15*cz2_14
    K(16, 16) = K_15_15 - A_15_0*cz0_15 - cy1_15*cz1_15 - cy2_15*cz2_15
  end subroutine q8_bbar_plane_stress_stiffness

  pure subroutine q8_bbar_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_q8_bbar_plane_stress_stiffness_batch_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 8, n)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(16, 16, n)
    ! blocks of 8 elements: copied into lane-first scratch (xl(lane, :, :)), the body
    ! runs in a loop over the lanes that gfortran vectorises (one SIMD lane per element),
    ! then K is copied back; a short last block repeats its first element in the spare lanes
    integer, parameter :: lanes = 8
    real(dp) :: xl(lanes, 2, 8), kl(lanes, 16, 16)
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
          ! c0 = eta^2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c0(9) = [0.6_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.0_dp, 0.0_dp, &
              0.6_dp, 0.6_dp, 0.6_dp]
          ! c1 = 2*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c1(9) = [-1.5491933384829668_dp, 0.0_dp, &
              1.5491933384829668_dp, -1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp, &
              -1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp]
          ! c2 = 2*eta*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c2(9) = [1.2_dp, 0.0_dp, -1.2_dp, 0.0_dp, 0.0_dp, 0.0_dp, &
              -1.2_dp, 0.0_dp, 1.2_dp]
          ! c3 = 2*eta at the points of gauss-3x3
          real(dp), parameter :: KS0_c3(9) = [-1.5491933384829668_dp, -1.5491933384829668_dp, &
              -1.5491933384829668_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.5491933384829668_dp, &
              1.5491933384829668_dp, 1.5491933384829668_dp]
          ! c4 = xi^2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c4(9) = [0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.6_dp, &
              0.6_dp, 0.0_dp, 0.6_dp]
          ! c5 = -eta^2/4 - eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c5(9) = [-1.0309475019311125_dp, -0.3436491673103708_dp, &
              0.3436491673103708_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
              -0.04364916731037084_dp, 0.04364916731037084_dp, 0.13094750193111254_dp]
          ! c6 = -eta*xi/2 + eta/2 - xi^2/4 + xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c6(9) = [-1.0309475019311125_dp, -0.3872983346207417_dp, &
              -0.04364916731037084_dp, -0.3436491673103708_dp, 0.0_dp, 0.04364916731037084_dp, &
              0.3436491673103708_dp, 0.3872983346207417_dp, 0.13094750193111254_dp]
          ! c7 = eta^2/4 - eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c7(9) = [-0.3436491673103708_dp, 0.3436491673103708_dp, &
              1.0309475019311125_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
              -0.13094750193111254_dp, -0.04364916731037084_dp, 0.04364916731037084_dp]
          ! c8 = eta*xi/2 + eta/2 - xi^2/4 - xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c8(9) = [-0.04364916731037084_dp, -0.3872983346207417_dp, &
              -1.0309475019311125_dp, 0.04364916731037084_dp, 0.0_dp, -0.3436491673103708_dp, &
              0.13094750193111254_dp, 0.3872983346207417_dp, 0.3436491673103708_dp]
          ! c9 = eta^2/4 + eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c9(9) = [-0.13094750193111254_dp, -0.04364916731037084_dp, &
              0.04364916731037084_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
              -0.3436491673103708_dp, 0.3436491673103708_dp, 1.0309475019311125_dp]
          ! c10 = eta*xi/2 + eta/2 + xi^2/4 + xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c10(9) = [-0.13094750193111254_dp, -0.3872983346207417_dp, &
              -0.3436491673103708_dp, -0.04364916731037084_dp, 0.0_dp, 0.3436491673103708_dp, &
              0.04364916731037084_dp, 0.3872983346207417_dp, 1.0309475019311125_dp]
          ! c11 = -eta^2/4 + eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c11(9) = [-0.04364916731037084_dp, 0.04364916731037084_dp, &
              0.13094750193111254_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
              -1.0309475019311125_dp, -0.3436491673103708_dp, 0.3436491673103708_dp]
          ! c12 = -eta*xi/2 + eta/2 + xi^2/4 - xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c12(9) = [-0.3436491673103708_dp, -0.3872983346207417_dp, &
              -0.13094750193111254_dp, 0.3436491673103708_dp, 0.0_dp, -0.04364916731037084_dp, &
              1.0309475019311125_dp, 0.3872983346207417_dp, 0.04364916731037084_dp]
          ! c13 = eta*xi - xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c13(9) = [1.3745966692414833_dp, 0.0_dp, &
              -1.3745966692414833_dp, 0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, &
              0.17459666924148337_dp, 0.0_dp, -0.17459666924148337_dp]
          ! c14 = xi^2/2 - 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c14(9) = [-0.2_dp, -0.5_dp, -0.2_dp, -0.2_dp, -0.5_dp, &
              -0.2_dp, -0.2_dp, -0.5_dp, -0.2_dp]
          ! c15 = 1/2 - eta^2/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c15(9) = [0.2_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.5_dp, 0.5_dp, &
              0.2_dp, 0.2_dp, 0.2_dp]
          ! c16 = -eta*xi - eta at the points of gauss-3x3
          real(dp), parameter :: KS0_c16(9) = [0.17459666924148337_dp, 0.7745966692414834_dp, &
              1.3745966692414833_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.17459666924148337_dp, &
              -0.7745966692414834_dp, -1.3745966692414833_dp]
          ! c17 = -eta*xi - xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c17(9) = [0.17459666924148337_dp, 0.0_dp, &
              -0.17459666924148337_dp, 0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, &
              1.3745966692414833_dp, 0.0_dp, -1.3745966692414833_dp]
          ! c18 = 1/2 - xi^2/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c18(9) = [0.2_dp, 0.5_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.2_dp, &
              0.2_dp, 0.5_dp, 0.2_dp]
          ! c19 = eta^2/2 - 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c19(9) = [-0.2_dp, -0.2_dp, -0.2_dp, -0.5_dp, -0.5_dp, &
              -0.5_dp, -0.2_dp, -0.2_dp, -0.2_dp]
          ! c20 = eta*xi - eta at the points of gauss-3x3
          real(dp), parameter :: KS0_c20(9) = [1.3745966692414833_dp, 0.7745966692414834_dp, &
              0.17459666924148337_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.3745966692414833_dp, &
              -0.7745966692414834_dp, -0.17459666924148337_dp]
          ! eta = eta at the points of gauss-3x3
          real(dp), parameter :: KS0_eta(9) = [-0.7745966692414834_dp, -0.7745966692414834_dp, &
              -0.7745966692414834_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.7745966692414834_dp, &
              0.7745966692414834_dp, 0.7745966692414834_dp]
          ! w = the point weight at the points of gauss-3x3
          real(dp), parameter :: KS0_w(9) = [0.30864197530864196_dp, 0.49382716049382713_dp, &
              0.30864197530864196_dp, 0.49382716049382713_dp, 0.7901234567901234_dp, &
              0.49382716049382713_dp, 0.30864197530864196_dp, 0.49382716049382713_dp, &
              0.30864197530864196_dp]
          ! xi = xi at the points of gauss-3x3
          real(dp), parameter :: KS0_xi(9) = [-0.7745966692414834_dp, 0.0_dp, &
              0.7745966692414834_dp, -0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp, &
              -0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp]
          real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, gx_0_1, gx_0_2, gx_1_0
          real(dp) :: gx_1_1, gx_1_2, gx_2_0, gx_2_1, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2, gy_2_0, gy_2_1
          real(dp) :: K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_0_8, K_0_9, K_0_10, K_0_11
          real(dp) :: K_0_12, K_0_13, K_0_14, K_0_15, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_1_6, K_1_7, K_1_8
          real(dp) :: K_1_9, K_1_10, K_1_11, K_1_12, K_1_13, K_1_14, K_1_15, K_2_2, K_2_3, K_2_4, K_2_5
          real(dp) :: K_2_6, K_2_7, K_2_8, K_2_9, K_2_10, K_2_11, K_2_12, K_2_13, K_2_14, K_2_15, K_3_3
          real(dp) :: K_3_4, K_3_5, K_3_6, K_3_7, K_3_8, K_3_9, K_3_10, K_3_11, K_3_12, K_3_13, K_3_14, K_3_15
          real(dp) :: K_4_4, K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11, K_4_12, K_4_13, K_4_14, K_4_15
          real(dp) :: K_5_5, K_5_6, K_5_7, K_5_8, K_5_9, K_5_10, K_5_11, K_5_12, K_5_13, K_5_14, K_5_15
          real(dp) :: K_6_6, K_6_7, K_6_8, K_6_9, K_6_10, K_6_11, K_6_12, K_6_13, K_6_14, K_6_15, K_7_7
          real(dp) :: K_7_8, K_7_9, K_7_10, K_7_11, K_7_12, K_7_13, K_7_14, K_7_15, K_8_8, K_8_9, K_8_10
          real(dp) :: K_8_11, K_8_12, K_8_13, K_8_14, K_8_15, K_9_9, K_9_10, K_9_11, K_9_12, K_9_13, K_9_14
          real(dp) :: K_9_15, K_10_10, K_10_11, K_10_12, K_10_13, K_10_14, K_10_15, K_11_11, K_11_12, K_11_13
          real(dp) :: K_11_14, K_11_15, K_12_12, K_12_13, K_12_14, K_12_15, K_13_13, K_13_14, K_13_15, K_14_14
          real(dp) :: K_14_15, K_15_15, A_0_0, A_0_1, A_0_2, A_1_0, A_1_1, A_1_2, A_2_0, A_2_1, A_2_2, A_3_0
          real(dp) :: A_3_1, A_3_2, A_4_0, A_4_1, A_4_2, A_5_0, A_5_1, A_5_2, A_6_0, A_6_1, A_6_2, A_7_0
          real(dp) :: A_7_1, A_7_2, A_8_0, A_8_1, A_8_2, A_9_0, A_9_1, A_9_2, A_10_0, A_10_1, A_10_2, A_11_0
          real(dp) :: A_11_1, A_11_2, A_12_0, A_12_1, A_12_2, A_13_0, A_13_1, A_13_2, A_14_0, A_14_1, A_14_2
          real(dp) :: A_15_0, A_15_1, A_15_2, H_0_0, H_0_1, H_0_2, H_1_1, H_1_2, H_2_2, cid0, cL1_0, cL2_0
          real(dp) :: cd1, cid1, cL2_1, cd2, cid2, cy1_0, cy2_0, cy1_1, cy2_1, cy1_2, cy2_2, cy1_3, cy2_3
          real(dp) :: cy1_4, cy2_4, cy1_5, cy2_5, cy1_6, cy2_6, cy1_7, cy2_7, cy1_8, cy2_8, cy1_9, cy2_9
          real(dp) :: cy1_10, cy2_10, cy1_11, cy2_11, cy1_12, cy2_12, cy1_13, cy2_13, cy1_14, cy2_14, cy1_15
          real(dp) :: cy2_15, cz0_0, cz1_0, cz2_0, cz0_1, cz1_1, cz2_1, cz0_2, cz1_2, cz2_2, cz0_3, cz1_3
          real(dp) :: cz2_3, cz0_4, cz1_4, cz2_4, cz0_5, cz1_5, cz2_5, cz0_6, cz1_6, cz2_6, cz0_7, cz1_7
          real(dp) :: cz2_7, cz0_8, cz1_8, cz2_8, cz0_9, cz1_9, cz2_9, cz0_10, cz1_10, cz2_10, cz0_11, cz1_11
          real(dp) :: cz2_11, cz0_12, cz1_12, cz2_12, cz0_13, cz1_13, cz2_13, cz0_14, cz1_14, cz2_14, cz0_15
          real(dp) :: cz1_15, cz2_15
          integer :: p
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
          x7 = xl(lane, 1, 7)
          y7 = xl(lane, 2, 7)
          x8 = xl(lane, 1, 8)
          y8 = xl(lane, 2, 8)
          gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
          gx_0_2 = -0.5_dp*x6 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
          gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
          gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
          gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
          gx_2_0 = -0.5_dp*x5 - 0.5_dp*x7 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
          gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
          gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
          gy_0_2 = -0.5_dp*y6 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
          gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
          gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
          gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
          gy_2_0 = -0.5_dp*y5 - 0.5_dp*y7 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
          gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
          K_0_0 = 0.0_dp
          K_0_1 = 0.0_dp
          K_0_2 = 0.0_dp
          K_0_3 = 0.0_dp
          K_0_4 = 0.0_dp
          K_0_5 = 0.0_dp
          K_0_6 = 0.0_dp
          K_0_7 = 0.0_dp
          K_0_8 = 0.0_dp
          K_0_9 = 0.0_dp
          K_0_10 = 0.0_dp
          K_0_11 = 0.0_dp
          K_0_12 = 0.0_dp
          K_0_13 = 0.0_dp
          K_0_14 = 0.0_dp
          K_0_15 = 0.0_dp
          K_1_1 = 0.0_dp
          K_1_2 = 0.0_dp
          K_1_3 = 0.0_dp
          K_1_4 = 0.0_dp
          K_1_5 = 0.0_dp
          K_1_6 = 0.0_dp
          K_1_7 = 0.0_dp
          K_1_8 = 0.0_dp
          K_1_9 = 0.0_dp
          K_1_10 = 0.0_dp
          K_1_11 = 0.0_dp
          K_1_12 = 0.0_dp
          K_1_13 = 0.0_dp
          K_1_14 = 0.0_dp
          K_1_15 = 0.0_dp
          K_2_2 = 0.0_dp
          K_2_3 = 0.0_dp
          K_2_4 = 0.0_dp
          K_2_5 = 0.0_dp
          K_2_6 = 0.0_dp
          K_2_7 = 0.0_dp
          K_2_8 = 0.0_dp
          K_2_9 = 0.0_dp
          K_2_10 = 0.0_dp
          K_2_11 = 0.0_dp
          K_2_12 = 0.0_dp
          K_2_13 = 0.0_dp
          K_2_14 = 0.0_dp
          K_2_15 = 0.0_dp
          K_3_3 = 0.0_dp
          K_3_4 = 0.0_dp
          K_3_5 = 0.0_dp
          K_3_6 = 0.0_dp
          K_3_7 = 0.0_dp
          K_3_8 = 0.0_dp
          K_3_9 = 0.0_dp
          K_3_10 = 0.0_dp
          K_3_11 = 0.0_dp
          K_3_12 = 0.0_dp
          K_3_13 = 0.0_dp
          K_3_14 = 0.0_dp
          K_3_15 = 0.0_dp
          K_4_4 = 0.0_dp
          K_4_5 = 0.0_dp
          K_4_6 = 0.0_dp
          K_4_7 = 0.0_dp
          K_4_8 = 0.0_dp
          K_4_9 = 0.0_dp
          K_4_10 = 0.0_dp
          K_4_11 = 0.0_dp
          K_4_12 = 0.0_dp
          K_4_13 = 0.0_dp
          K_4_14 = 0.0_dp
          K_4_15 = 0.0_dp
          K_5_5 = 0.0_dp
          K_5_6 = 0.0_dp
          K_5_7 = 0.0_dp
          K_5_8 = 0.0_dp
          K_5_9 = 0.0_dp
          K_5_10 = 0.0_dp
          K_5_11 = 0.0_dp
          K_5_12 = 0.0_dp
          K_5_13 = 0.0_dp
          K_5_14 = 0.0_dp
          K_5_15 = 0.0_dp
          K_6_6 = 0.0_dp
          K_6_7 = 0.0_dp
          K_6_8 = 0.0_dp
          K_6_9 = 0.0_dp
          K_6_10 = 0.0_dp
          K_6_11 = 0.0_dp
          K_6_12 = 0.0_dp
          K_6_13 = 0.0_dp
          K_6_14 = 0.0_dp
          K_6_15 = 0.0_dp
          K_7_7 = 0.0_dp
          K_7_8 = 0.0_dp
          K_7_9 = 0.0_dp
          K_7_10 = 0.0_dp
          K_7_11 = 0.0_dp
          K_7_12 = 0.0_dp
          K_7_13 = 0.0_dp
          K_7_14 = 0.0_dp
          K_7_15 = 0.0_dp
          K_8_8 = 0.0_dp
          K_8_9 = 0.0_dp
          K_8_10 = 0.0_dp
          K_8_11 = 0.0_dp
          K_8_12 = 0.0_dp
          K_8_13 = 0.0_dp
          K_8_14 = 0.0_dp
          K_8_15 = 0.0_dp
          K_9_9 = 0.0_dp
          K_9_10 = 0.0_dp
          K_9_11 = 0.0_dp
          K_9_12 = 0.0_dp
          K_9_13 = 0.0_dp
          K_9_14 = 0.0_dp
          K_9_15 = 0.0_dp
          K_10_10 = 0.0_dp
          K_10_11 = 0.0_dp
          K_10_12 = 0.0_dp
          K_10_13 = 0.0_dp
          K_10_14 = 0.0_dp
          K_10_15 = 0.0_dp
          K_11_11 = 0.0_dp
          K_11_12 = 0.0_dp
          K_11_13 = 0.0_dp
          K_11_14 = 0.0_dp
          K_11_15 = 0.0_dp
          K_12_12 = 0.0_dp
          K_12_13 = 0.0_dp
          K_12_14 = 0.0_dp
          K_12_15 = 0.0_dp
          K_13_13 = 0.0_dp
          K_13_14 = 0.0_dp
          K_13_15 = 0.0_dp
          K_14_14 = 0.0_dp
          K_14_15 = 0.0_dp
          K_15_15 = 0.0_dp
          A_0_0 = 0.0_dp
          A_0_1 = 0.0_dp
          A_0_2 = 0.0_dp
          A_1_0 = 0.0_dp
          A_1_1 = 0.0_dp
          A_1_2 = 0.0_dp
          A_2_0 = 0.0_dp
          A_2_1 = 0.0_dp
          A_2_2 = 0.0_dp
          A_3_0 = 0.0_dp
          A_3_1 = 0.0_dp
          A_3_2 = 0.0_dp
          A_4_0 = 0.0_dp
          A_4_1 = 0.0_dp
          A_4_2 = 0.0_dp
          A_5_0 = 0.0_dp
          A_5_1 = 0.0_dp
          A_5_2 = 0.0_dp
          A_6_0 = 0.0_dp
          A_6_1 = 0.0_dp
          A_6_2 = 0.0_dp
          A_7_0 = 0.0_dp
          A_7_1 = 0.0_dp
          A_7_2 = 0.0_dp
          A_8_0 = 0.0_dp
          A_8_1 = 0.0_dp
          A_8_2 = 0.0_dp
          A_9_0 = 0.0_dp
          A_9_1 = 0.0_dp
          A_9_2 = 0.0_dp
          A_10_0 = 0.0_dp
          A_10_1 = 0.0_dp
          A_10_2 = 0.0_dp
          A_11_0 = 0.0_dp
          A_11_1 = 0.0_dp
          A_11_2 = 0.0_dp
          A_12_0 = 0.0_dp
          A_12_1 = 0.0_dp
          A_12_2 = 0.0_dp
          A_13_0 = 0.0_dp
          A_13_1 = 0.0_dp
          A_13_2 = 0.0_dp
          A_14_0 = 0.0_dp
          A_14_1 = 0.0_dp
          A_14_2 = 0.0_dp
          A_15_0 = 0.0_dp
          A_15_1 = 0.0_dp
          A_15_2 = 0.0_dp
          H_0_0 = 0.0_dp
          H_0_1 = 0.0_dp
          H_0_2 = 0.0_dp
          H_1_1 = 0.0_dp
          H_1_2 = 0.0_dp
          H_2_2 = 0.0_dp
          do p = 1, 9   ! gauss-3x3: loop over the 9 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
              real(dp) :: c19, c20, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1
              real(dp) :: dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7
              real(dp) :: dNdy7, dNdx8, dNdy8, sc0, s1, s2, s3, T4, T6, T7, T8, T9, T10, T11, T12, T13, T14
              real(dp) :: T15, T16, T17, T18, T19, T20, T21, T22, T23, T24, T25, T26, T27, T28, T29, T30, T31
              real(dp) :: T32, T33, T34, T35, T36, T37, T38, T39, T40, T41, T42, T43, T44, T45, T46, T47, T48
              real(dp) :: T49, T50, T51, T52, T53, s54, T55, T56
              c0 = KS0_c0(p)
              c1 = KS0_c1(p)
              c2 = KS0_c2(p)
              c3 = KS0_c3(p)
              c4 = KS0_c4(p)
              c5 = KS0_c5(p)
              c6 = KS0_c6(p)
              c7 = KS0_c7(p)
              c8 = KS0_c8(p)
              c9 = KS0_c9(p)
              c10 = KS0_c10(p)
              c11 = KS0_c11(p)
              c12 = KS0_c12(p)
              c13 = KS0_c13(p)
              c14 = KS0_c14(p)
              c15 = KS0_c15(p)
              c16 = KS0_c16(p)
              c17 = KS0_c17(p)
              c18 = KS0_c18(p)
              c19 = KS0_c19(p)
              c20 = KS0_c20(p)
              eta = KS0_eta(p)
              w = KS0_w(p)
              xi = KS0_xi(p)
              J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
              J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
              J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
              J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
              detJ = J00*J11 - J01*J10
              idet = 1.0_dp/detJ
              Ji00 = J11*idet
              Ji01 = -J01*idet
              Ji10 = -J10*idet
              Ji11 = J00*idet
              dNdx1 = Ji00*c5 + Ji01*c6
              dNdy1 = Ji10*c5 + Ji11*c6
              dNdx2 = Ji00*c7 + Ji01*c8
              dNdy2 = Ji10*c7 + Ji11*c8
              dNdx3 = Ji00*c9 + Ji01*c10
              dNdy3 = Ji10*c9 + Ji11*c10
              dNdx4 = Ji00*c11 + Ji01*c12
              dNdy4 = Ji10*c11 + Ji11*c12
              dNdx5 = Ji00*c13 + Ji01*c14
              dNdy5 = Ji10*c13 + Ji11*c14
              dNdx6 = Ji00*c15 + Ji01*c16
              dNdy6 = Ji10*c15 + Ji11*c16
              dNdx7 = Ji00*c17 + Ji01*c18
              dNdy7 = Ji10*c17 + Ji11*c18
              dNdx8 = Ji00*c19 + Ji01*c20
              dNdy8 = Ji10*c19 + Ji11*c20
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
              T40 = dNdx7*s1
              T41 = dNdx7*s2
              T42 = dNdy7*s3
              T43 = dNdy7*s2
              T44 = dNdy7*s1
              T45 = dNdx7*s3
              T46 = dNdx8*s1
              T47 = dNdx8*s2
              T48 = dNdy8*s3
              T49 = dNdy8*s2
              T50 = dNdy8*s1
              T51 = dNdx8*s3
              T52 = sc0*xi
              T53 = eta*sc0
              s54 = m3*sc0
              T55 = s54*xi
              T56 = eta*s54
              K_0_0 = K_0_0 + (T4*dNdx1 + T6*dNdy1)
              K_0_1 = K_0_1 + (T7*dNdx1 + T9*dNdy1)
              K_0_2 = K_0_2 + (T10*dNdx1 + T12*dNdy1)
              K_0_3 = K_0_3 + (T13*dNdx1 + T15*dNdy1)
              K_0_4 = K_0_4 + (T16*dNdx1 + T18*dNdy1)
              K_0_5 = K_0_5 + (T19*dNdx1 + T21*dNdy1)
              K_0_6 = K_0_6 + (T22*dNdx1 + T24*dNdy1)
              K_0_7 = K_0_7 + (T25*dNdx1 + T27*dNdy1)
              K_0_8 = K_0_8 + (T28*dNdx1 + T30*dNdy1)
              K_0_9 = K_0_9 + (T31*dNdx1 + T33*dNdy1)
              K_0_10 = K_0_10 + (T34*dNdx1 + T36*dNdy1)
              K_0_11 = K_0_11 + (T37*dNdx1 + T39*dNdy1)
              K_0_12 = K_0_12 + (T40*dNdx1 + T42*dNdy1)
              K_0_13 = K_0_13 + (T43*dNdx1 + T45*dNdy1)
              K_0_14 = K_0_14 + (T46*dNdx1 + T48*dNdy1)
              K_0_15 = K_0_15 + (T49*dNdx1 + T51*dNdy1)
              K_1_1 = K_1_1 + (T8*dNdy1 + T9*dNdx1)
              K_1_2 = K_1_2 + (T11*dNdy1 + T12*dNdx1)
              K_1_3 = K_1_3 + (T14*dNdy1 + T15*dNdx1)
              K_1_4 = K_1_4 + (T17*dNdy1 + T18*dNdx1)
              K_1_5 = K_1_5 + (T20*dNdy1 + T21*dNdx1)
              K_1_6 = K_1_6 + (T23*dNdy1 + T24*dNdx1)
              K_1_7 = K_1_7 + (T26*dNdy1 + T27*dNdx1)
              K_1_8 = K_1_8 + (T29*dNdy1 + T30*dNdx1)
              K_1_9 = K_1_9 + (T32*dNdy1 + T33*dNdx1)
              K_1_10 = K_1_10 + (T35*dNdy1 + T36*dNdx1)
              K_1_11 = K_1_11 + (T38*dNdy1 + T39*dNdx1)
              K_1_12 = K_1_12 + (T41*dNdy1 + T42*dNdx1)
              K_1_13 = K_1_13 + (T44*dNdy1 + T45*dNdx1)
              K_1_14 = K_1_14 + (T47*dNdy1 + T48*dNdx1)
              K_1_15 = K_1_15 + (T50*dNdy1 + T51*dNdx1)
              K_2_2 = K_2_2 + (T10*dNdx2 + T12*dNdy2)
              K_2_3 = K_2_3 + (T13*dNdx2 + T15*dNdy2)
              K_2_4 = K_2_4 + (T16*dNdx2 + T18*dNdy2)
              K_2_5 = K_2_5 + (T19*dNdx2 + T21*dNdy2)
              K_2_6 = K_2_6 + (T22*dNdx2 + T24*dNdy2)
              K_2_7 = K_2_7 + (T25*dNdx2 + T27*dNdy2)
              K_2_8 = K_2_8 + (T28*dNdx2 + T30*dNdy2)
              K_2_9 = K_2_9 + (T31*dNdx2 + T33*dNdy2)
              K_2_10 = K_2_10 + (T34*dNdx2 + T36*dNdy2)
              K_2_11 = K_2_11 + (T37*dNdx2 + T39*dNdy2)
              K_2_12 = K_2_12 + (T40*dNdx2 + T42*dNdy2)
              K_2_13 = K_2_13 + (T43*dNdx2 + T45*dNdy2)
              K_2_14 = K_2_14 + (T46*dNdx2 + T48*dNdy2)
              K_2_15 = K_2_15 + (T49*dNdx2 + T51*dNdy2)
              K_3_3 = K_3_3 + (T14*dNdy2 + T15*dNdx2)
              K_3_4 = K_3_4 + (T17*dNdy2 + T18*dNdx2)
              K_3_5 = K_3_5 + (T20*dNdy2 + T21*dNdx2)
              K_3_6 = K_3_6 + (T23*dNdy2 + T24*dNdx2)
              K_3_7 = K_3_7 + (T26*dNdy2 + T27*dNdx2)
              K_3_8 = K_3_8 + (T29*dNdy2 + T30*dNdx2)
              K_3_9 = K_3_9 + (T32*dNdy2 + T33*dNdx2)
              K_3_10 = K_3_10 + (T35*dNdy2 + T36*dNdx2)
              K_3_11 = K_3_11 + (T38*dNdy2 + T39*dNdx2)
              K_3_12 = K_3_12 + (T41*dNdy2 + T42*dNdx2)
              K_3_13 = K_3_13 + (T44*dNdy2 + T45*dNdx2)
              K_3_14 = K_3_14 + (T47*dNdy2 + T48*dNdx2)
              K_3_15 = K_3_15 + (T50*dNdy2 + T51*dNdx2)
              K_4_4 = K_4_4 + (T16*dNdx3 + T18*dNdy3)
              K_4_5 = K_4_5 + (T19*dNdx3 + T21*dNdy3)
              K_4_6 = K_4_6 + (T22*dNdx3 + T24*dNdy3)
              K_4_7 = K_4_7 + (T25*dNdx3 + T27*dNdy3)
              K_4_8 = K_4_8 + (T28*dNdx3 + T30*dNdy3)
              K_4_9 = K_4_9 + (T31*dNdx3 + T33*dNdy3)
              K_4_10 = K_4_10 + (T34*dNdx3 + T36*dNdy3)
              K_4_11 = K_4_11 + (T37*dNdx3 + T39*dNdy3)
              K_4_12 = K_4_12 + (T40*dNdx3 + T42*dNdy3)
              K_4_13 = K_4_13 + (T43*dNdx3 + T45*dNdy3)
              K_4_14 = K_4_14 + (T46*dNdx3 + T48*dNdy3)
              K_4_15 = K_4_15 + (T49*dNdx3 + T51*dNdy3)
              K_5_5 = K_5_5 + (T20*dNdy3 + T21*dNdx3)
              K_5_6 = K_5_6 + (T23*dNdy3 + T24*dNdx3)
              K_5_7 = K_5_7 + (T26*dNdy3 + T27*dNdx3)
              K_5_8 = K_5_8 + (T29*dNdy3 + T30*dNdx3)
              K_5_9 = K_5_9 + (T32*dNdy3 + T33*dNdx3)
              K_5_10 = K_5_10 + (T35*dNdy3 + T36*dNdx3)
              K_5_11 = K_5_11 + (T38*dNdy3 + T39*dNdx3)
              K_5_12 = K_5_12 + (T41*dNdy3 + T42*dNdx3)
              K_5_13 = K_5_13 + (T44*dNdy3 + T45*dNdx3)
              K_5_14 = K_5_14 + (T47*dNdy3 + T48*dNdx3)
              K_5_15 = K_5_15 + (T50*dNdy3 + T51*dNdx3)
              K_6_6 = K_6_6 + (T22*dNdx4 + T24*dNdy4)
              K_6_7 = K_6_7 + (T25*dNdx4 + T27*dNdy4)
              K_6_8 = K_6_8 + (T28*dNdx4 + T30*dNdy4)
              K_6_9 = K_6_9 + (T31*dNdx4 + T33*dNdy4)
              K_6_10 = K_6_10 + (T34*dNdx4 + T36*dNdy4)
              K_6_11 = K_6_11 + (T37*dNdx4 + T39*dNdy4)
              K_6_12 = K_6_12 + (T40*dNdx4 + T42*dNdy4)
              K_6_13 = K_6_13 + (T43*dNdx4 + T45*dNdy4)
              K_6_14 = K_6_14 + (T46*dNdx4 + T48*dNdy4)
              K_6_15 = K_6_15 + (T49*dNdx4 + T51*dNdy4)
              K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
              K_7_8 = K_7_8 + (T29*dNdy4 + T30*dNdx4)
              K_7_9 = K_7_9 + (T32*dNdy4 + T33*dNdx4)
              K_7_10 = K_7_10 + (T35*dNdy4 + T36*dNdx4)
              K_7_11 = K_7_11 + (T38*dNdy4 + T39*dNdx4)
              K_7_12 = K_7_12 + (T41*dNdy4 + T42*dNdx4)
              K_7_13 = K_7_13 + (T44*dNdy4 + T45*dNdx4)
              K_7_14 = K_7_14 + (T47*dNdy4 + T48*dNdx4)
              K_7_15 = K_7_15 + (T50*dNdy4 + T51*dNdx4)
              K_8_8 = K_8_8 + (T28*dNdx5 + T30*dNdy5)
              K_8_9 = K_8_9 + (T31*dNdx5 + T33*dNdy5)
              K_8_10 = K_8_10 + (T34*dNdx5 + T36*dNdy5)
              K_8_11 = K_8_11 + (T37*dNdx5 + T39*dNdy5)
              K_8_12 = K_8_12 + (T40*dNdx5 + T42*dNdy5)
              K_8_13 = K_8_13 + (T43*dNdx5 + T45*dNdy5)
              K_8_14 = K_8_14 + (T46*dNdx5 + T48*dNdy5)
              K_8_15 = K_8_15 + (T49*dNdx5 + T51*dNdy5)
              K_9_9 = K_9_9 + (T32*dNdy5 + T33*dNdx5)
              K_9_10 = K_9_10 + (T35*dNdy5 + T36*dNdx5)
              K_9_11 = K_9_11 + (T38*dNdy5 + T39*dNdx5)
              K_9_12 = K_9_12 + (T41*dNdy5 + T42*dNdx5)
              K_9_13 = K_9_13 + (T44*dNdy5 + T45*dNdx5)
              K_9_14 = K_9_14 + (T47*dNdy5 + T48*dNdx5)
              K_9_15 = K_9_15 + (T50*dNdy5 + T51*dNdx5)
              K_10_10 = K_10_10 + (T34*dNdx6 + T36*dNdy6)
              K_10_11 = K_10_11 + (T37*dNdx6 + T39*dNdy6)
              K_10_12 = K_10_12 + (T40*dNdx6 + T42*dNdy6)
              K_10_13 = K_10_13 + (T43*dNdx6 + T45*dNdy6)
              K_10_14 = K_10_14 + (T46*dNdx6 + T48*dNdy6)
              K_10_15 = K_10_15 + (T49*dNdx6 + T51*dNdy6)
              K_11_11 = K_11_11 + (T38*dNdy6 + T39*dNdx6)
              K_11_12 = K_11_12 + (T41*dNdy6 + T42*dNdx6)
              K_11_13 = K_11_13 + (T44*dNdy6 + T45*dNdx6)
              K_11_14 = K_11_14 + (T47*dNdy6 + T48*dNdx6)
              K_11_15 = K_11_15 + (T50*dNdy6 + T51*dNdx6)
              K_12_12 = K_12_12 + (T40*dNdx7 + T42*dNdy7)
              K_12_13 = K_12_13 + (T43*dNdx7 + T45*dNdy7)
              K_12_14 = K_12_14 + (T46*dNdx7 + T48*dNdy7)
              K_12_15 = K_12_15 + (T49*dNdx7 + T51*dNdy7)
              K_13_13 = K_13_13 + (T44*dNdy7 + T45*dNdx7)
              K_13_14 = K_13_14 + (T47*dNdy7 + T48*dNdx7)
              K_13_15 = K_13_15 + (T50*dNdy7 + T51*dNdx7)
              K_14_14 = K_14_14 + (T46*dNdx8 + T48*dNdy8)
              K_14_15 = K_14_15 + (T49*dNdx8 + T51*dNdy8)
              K_15_15 = K_15_15 + (T50*dNdy8 + T51*dNdx8)
              A_0_0 = A_0_0 + (dNdx1*sc0)
              A_0_1 = A_0_1 + (T52*dNdx1)
              A_0_2 = A_0_2 + (T53*dNdx1)
              A_1_0 = A_1_0 + (dNdy1*sc0)
              A_1_1 = A_1_1 + (T52*dNdy1)
              A_1_2 = A_1_2 + (T53*dNdy1)
              A_2_0 = A_2_0 + (dNdx2*sc0)
              A_2_1 = A_2_1 + (T52*dNdx2)
              A_2_2 = A_2_2 + (T53*dNdx2)
              A_3_0 = A_3_0 + (dNdy2*sc0)
              A_3_1 = A_3_1 + (T52*dNdy2)
              A_3_2 = A_3_2 + (T53*dNdy2)
              A_4_0 = A_4_0 + (dNdx3*sc0)
              A_4_1 = A_4_1 + (T52*dNdx3)
              A_4_2 = A_4_2 + (T53*dNdx3)
              A_5_0 = A_5_0 + (dNdy3*sc0)
              A_5_1 = A_5_1 + (T52*dNdy3)
              A_5_2 = A_5_2 + (T53*dNdy3)
              A_6_0 = A_6_0 + (dNdx4*sc0)
              A_6_1 = A_6_1 + (T52*dNdx4)
              A_6_2 = A_6_2 + (T53*dNdx4)
              A_7_0 = A_7_0 + (dNdy4*sc0)
              A_7_1 = A_7_1 + (T52*dNdy4)
              A_7_2 = A_7_2 + (T53*dNdy4)
              A_8_0 = A_8_0 + (dNdx5*sc0)
              A_8_1 = A_8_1 + (T52*dNdx5)
              A_8_2 = A_8_2 + (T53*dNdx5)
              A_9_0 = A_9_0 + (dNdy5*sc0)
              A_9_1 = A_9_1 + (T52*dNdy5)
              A_9_2 = A_9_2 + (T53*dNdy5)
              A_10_0 = A_10_0 + (dNdx6*sc0)
              A_10_1 = A_10_1 + (T52*dNdx6)
              A_10_2 = A_10_2 + (T53*dNdx6)
              A_11_0 = A_11_0 + (dNdy6*sc0)
              A_11_1 = A_11_1 + (T52*dNdy6)
              A_11_2 = A_11_2 + (T53*dNdy6)
              A_12_0 = A_12_0 + (dNdx7*sc0)
              A_12_1 = A_12_1 + (T52*dNdx7)
              A_12_2 = A_12_2 + (T53*dNdx7)
              A_13_0 = A_13_0 + (dNdy7*sc0)
              A_13_1 = A_13_1 + (T52*dNdy7)
              A_13_2 = A_13_2 + (T53*dNdy7)
              A_14_0 = A_14_0 + (dNdx8*sc0)
              A_14_1 = A_14_1 + (T52*dNdx8)
              A_14_2 = A_14_2 + (T53*dNdx8)
              A_15_0 = A_15_0 + (dNdy8*sc0)
              A_15_1 = A_15_1 + (T52*dNdy8)
              A_15_2 = A_15_2 + (T53*dNdy8)
              H_0_0 = H_0_0 + (s54)
              H_0_1 = H_0_1 + (T55)
              H_0_2 = H_0_2 + (T56)
              H_1_1 = H_1_1 + (T55*xi)
              H_1_2 = H_1_2 + (T56*xi)
              H_2_2 = H_2_2 + (T56*eta)
            end block
          end do
          ! static condensation of the internal unknowns
          cid0 = 1.0_dp/H_0_0
          cL1_0 = H_0_1*cid0
          cL2_0 = H_0_2*cid0
          cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
          cid1 = 1.0_dp/cd1
          cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
          cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
          cid2 = 1.0_dp/cd2
          cy1_0 = A_0_1 - A_0_0*cL1_0
          cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0
          cy1_1 = A_1_1 - A_1_0*cL1_0
          cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1
          cy1_2 = A_2_1 - A_2_0*cL1_0
          cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2
          cy1_3 = A_3_1 - A_3_0*cL1_0
          cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3
          cy1_4 = A_4_1 - A_4_0*cL1_0
          cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4
          cy1_5 = A_5_1 - A_5_0*cL1_0
          cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5
          cy1_6 = A_6_1 - A_6_0*cL1_0
          cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6
          cy1_7 = A_7_1 - A_7_0*cL1_0
          cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7
          cy1_8 = A_8_1 - A_8_0*cL1_0
          cy2_8 = A_8_2 - A_8_0*cL2_0 - cL2_1*cy1_8
          cy1_9 = A_9_1 - A_9_0*cL1_0
          cy2_9 = A_9_2 - A_9_0*cL2_0 - cL2_1*cy1_9
          cy1_10 = A_10_1 - A_10_0*cL1_0
          cy2_10 = A_10_2 - A_10_0*cL2_0 - cL2_1*cy1_10
          cy1_11 = A_11_1 - A_11_0*cL1_0
          cy2_11 = A_11_2 - A_11_0*cL2_0 - cL2_1*cy1_11
          cy1_12 = A_12_1 - A_12_0*cL1_0
          cy2_12 = A_12_2 - A_12_0*cL2_0 - cL2_1*cy1_12
          cy1_13 = A_13_1 - A_13_0*cL1_0
          cy2_13 = A_13_2 - A_13_0*cL2_0 - cL2_1*cy1_13
          cy1_14 = A_14_1 - A_14_0*cL1_0
          cy2_14 = A_14_2 - A_14_0*cL2_0 - cL2_1*cy1_14
          cy1_15 = A_15_1 - A_15_0*cL1_0
          cy2_15 = A_15_2 - A_15_0*cL2_0 - cL2_1*cy1_15
          cz0_0 = A_0_0*cid0
          cz1_0 = cid1*cy1_0
          cz2_0 = cid2*cy2_0
          cz0_1 = A_1_0*cid0
          cz1_1 = cid1*cy1_1
          cz2_1 = cid2*cy2_1
          cz0_2 = A_2_0*cid0
          cz1_2 = cid1*cy1_2
          cz2_2 = cid2*cy2_2
          cz0_3 = A_3_0*cid0
          cz1_3 = cid1*cy1_3
          cz2_3 = cid2*cy2_3
          cz0_4 = A_4_0*cid0
          cz1_4 = cid1*cy1_4
          cz2_4 = cid2*cy2_4
          cz0_5 = A_5_0*cid0
          cz1_5 = cid1*cy1_5
          cz2_5 = cid2*cy2_5
          cz0_6 = A_6_0*cid0
          cz1_6 = cid1*cy1_6
          cz2_6 = cid2*cy2_6
          cz0_7 = A_7_0*cid0
          cz1_7 = cid1*cy1_7
          cz2_7 = cid2*cy2_7
          cz0_8 = A_8_0*cid0
          cz1_8 = cid1*cy1_8
          cz2_8 = cid2*cy2_8
          cz0_9 = A_9_0*cid0
          cz1_9 = cid1*cy1_9
          cz2_9 = cid2*cy2_9
          cz0_10 = A_10_0*cid0
          cz1_10 = cid1*cy1_10
          cz2_10 = cid2*cy2_10
          cz0_11 = A_11_0*cid0
          cz1_11 = cid1*cy1_11
          cz2_11 = cid2*cy2_11
          cz0_12 = A_12_0*cid0
          cz1_12 = cid1*cy1_12
          cz2_12 = cid2*cy2_12
          cz0_13 = A_13_0*cid0
          cz1_13 = cid1*cy1_13
          cz2_13 = cid2*cy2_13
          cz0_14 = A_14_0*cid0
          cz1_14 = cid1*cy1_14
          cz2_14 = cid2*cy2_14
          cz0_15 = A_15_0*cid0
          cz1_15 = cid1*cy1_15
          cz2_15 = cid2*cy2_15
          kl(lane, 1, 1) = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0
          kl(lane, 1, 2) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0
          kl(lane, 1, 3) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0
          kl(lane, 1, 4) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0
          kl(lane, 1, 5) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0
          kl(lane, 1, 6) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0
          kl(lane, 1, 7) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0
          kl(lane, 1, 8) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0
          kl(lane, 1, 9) = K_0_8 - A_8_0*cz0_0 - cy1_8*cz1_0 - cy2_8*cz2_0
          kl(lane, 1, 10) = K_0_9 - A_9_0*cz0_0 - cy1_9*cz1_0 - cy2_9*cz2_0
          kl(lane, 1, 11) = K_0_10 - A_10_0*cz0_0 - cy1_10*cz1_0 - cy2_10*cz2_0
          kl(lane, 1, 12) = K_0_11 - A_11_0*cz0_0 - cy1_11*cz1_0 - cy2_11*cz2_0
          kl(lane, 1, 13) = K_0_12 - A_12_0*cz0_0 - cy1_12*cz1_0 - cy2_12*cz2_0
          kl(lane, 1, 14) = K_0_13 - A_13_0*cz0_0 - cy1_13*cz1_0 - cy2_13*cz2_0
          kl(lane, 1, 15) = K_0_14 - A_14_0*cz0_0 - cy1_14*cz1_0 - cy2_14*cz2_0
          kl(lane, 1, 16) = K_0_15 - A_15_0*cz0_0 - cy1_15*cz1_0 - cy2_15*cz2_0
          kl(lane, 2, 1) = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0
          kl(lane, 2, 2) = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1
          kl(lane, 2, 3) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1
          kl(lane, 2, 4) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1
          kl(lane, 2, 5) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1
          kl(lane, 2, 6) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1
          kl(lane, 2, 7) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1
          kl(lane, 2, 8) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1
          kl(lane, 2, 9) = K_1_8 - A_8_0*cz0_1 - cy1_8*cz1_1 - cy2_8*cz2_1
          kl(lane, 2, 10) = K_1_9 - A_9_0*cz0_1 - cy1_9*cz1_1 - cy2_9*cz2_1
          kl(lane, 2, 11) = K_1_10 - A_10_0*cz0_1 - cy1_10*cz1_1 - cy2_10*cz2_1
          kl(lane, 2, 12) = K_1_11 - A_11_0*cz0_1 - cy1_11*cz1_1 - cy2_11*cz2_1
          kl(lane, 2, 13) = K_1_12 - A_12_0*cz0_1 - cy1_12*cz1_1 - cy2_12*cz2_1
          kl(lane, 2, 14) = K_1_13 - A_13_0*cz0_1 - cy1_13*cz1_1 - cy2_13*cz2_1
          kl(lane, 2, 15) = K_1_14 - A_14_0*cz0_1 - cy1_14*cz1_1 - cy2_14*cz2_1
          kl(lane, 2, 16) = K_1_15 - A_15_0*cz0_1 - cy1_15*cz1_1 - cy2_15*cz2_1
          kl(lane, 3, 1) = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0
          kl(lane, 3, 2) = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1
          kl(lane, 3, 3) = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2
          kl(lane, 3, 4) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2
          kl(lane, 3, 5) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2
          kl(lane, 3, 6) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2
          kl(lane, 3, 7) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2
          kl(lane, 3, 8) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2
          kl(lane, 3, 9) = K_2_8 - A_8_0*cz0_2 - cy1_8*cz1_2 - cy2_8*cz2_2
          kl(lane, 3, 10) = K_2_9 - A_9_0*cz0_2 - cy1_9*cz1_2 - cy2_9*cz2_2
          kl(lane, 3, 11) = K_2_10 - A_10_0*cz0_2 - cy1_10*cz1_2 - cy2_10*cz2_2
          kl(lane, 3, 12) = K_2_11 - A_11_0*cz0_2 - cy1_11*cz1_2 - cy2_11*cz2_2
          kl(lane, 3, 13) = K_2_12 - A_12_0*cz0_2 - cy1_12*cz1_2 - cy2_12*cz2_2
          kl(lane, 3, 14) = K_2_13 - A_13_0*cz0_2 - cy1_13*cz1_2 - cy2_13*cz2_2
          kl(lane, 3, 15) = K_2_14 - A_14_0*cz0_2 - cy1_14*cz1_2 - cy2_14*cz2_2
          kl(lane, 3, 16) = K_2_15 - A_15_0*cz0_2 - cy1_15*cz1_2 - cy2_15*cz2_2
          kl(lane, 4, 1) = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0
          kl(lane, 4, 2) = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1
          kl(lane, 4, 3) = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2
          kl(lane, 4, 4) = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3
          kl(lane, 4, 5) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3
          kl(lane, 4, 6) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3
          kl(lane, 4, 7) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3
          kl(lane, 4, 8) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3
          kl(lane, 4, 9) = K_3_8 - A_8_0*cz0_3 - cy1_8*cz1_3 - cy2_8*cz2_3
          kl(lane, 4, 10) = K_3_9 - A_9_0*cz0_3 - cy1_9*cz1_3 - cy2_9*cz2_3
          kl(lane, 4, 11) = K_3_10 - A_10_0*cz0_3 - cy1_10*cz1_3 - cy2_10*cz2_3
          kl(lane, 4, 12) = K_3_11 - A_11_0*cz0_3 - cy1_11*cz1_3 - cy2_11*cz2_3
          kl(lane, 4, 13) = K_3_12 - A_12_0*cz0_3 - cy1_12*cz1_3 - cy2_12*cz2_3
          kl(lane, 4, 14) = K_3_13 - A_13_0*cz0_3 - cy1_13*cz1_3 - cy2_13*cz2_3
          kl(lane, 4, 15) = K_3_14 - A_14_0*cz0_3 - cy1_14*cz1_3 - cy2_14*cz2_3
          kl(lane, 4, 16) = K_3_15 - A_15_0*cz0_3 - cy1_15*cz1_3 - cy2_15*cz2_3
          kl(lane, 5, 1) = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0
          kl(lane, 5, 2) = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1
          kl(lane, 5, 3) = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2
          kl(lane, 5, 4) = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3
          kl(lane, 5, 5) = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4
          kl(lane, 5, 6) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4
          kl(lane, 5, 7) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4
          kl(lane, 5, 8) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4
          kl(lane, 5, 9) = K_4_8 - A_8_0*cz0_4 - cy1_8*cz1_4 - cy2_8*cz2_4
          kl(lane, 5, 10) = K_4_9 - A_9_0*cz0_4 - cy1_9*cz1_4 - cy2_9*cz2_4
          kl(lane, 5, 11) = K_4_10 - A_10_0*cz0_4 - cy1_10*cz1_4 - cy2_10*cz2_4
          kl(lane, 5, 12) = K_4_11 - A_11_0*cz0_4 - cy1_11*cz1_4 - cy2_11*cz2_4
          kl(lane, 5, 13) = K_4_12 - A_12_0*cz0_4 - cy1_12*cz1_4 - cy2_12*cz2_4
          kl(lane, 5, 14) = K_4_13 - A_13_0*cz0_4 - cy1_13*cz1_4 - cy2_13*cz2_4
          kl(lane, 5, 15) = K_4_14 - A_14_0*cz0_4 - cy1_14*cz1_4 - cy2_14*cz2_4
          kl(lane, 5, 16) = K_4_15 - A_15_0*cz0_4 - cy1_15*cz1_4 - cy2_15*cz2_4
          kl(lane, 6, 1) = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0
          kl(lane, 6, 2) = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1
          kl(lane, 6, 3) = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2
          kl(lane, 6, 4) = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3
          kl(lane, 6, 5) = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4
          kl(lane, 6, 6) = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5
          kl(lane, 6, 7) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5
          kl(lane, 6, 8) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5
          kl(lane, 6, 9) = K_5_8 - A_8_0*cz0_5 - cy1_8*cz1_5 - cy2_8*cz2_5
          kl(lane, 6, 10) = K_5_9 - A_9_0*cz0_5 - cy1_9*cz1_5 - cy2_9*cz2_5
          kl(lane, 6, 11) = K_5_10 - A_10_0*cz0_5 - cy1_10*cz1_5 - cy2_10*cz2_5
          kl(lane, 6, 12) = K_5_11 - A_11_0*cz0_5 - cy1_11*cz1_5 - cy2_11*cz2_5
          kl(lane, 6, 13) = K_5_12 - A_12_0*cz0_5 - cy1_12*cz1_5 - cy2_12*cz2_5
          kl(lane, 6, 14) = K_5_13 - A_13_0*cz0_5 - cy1_13*cz1_5 - cy2_13*cz2_5
          kl(lane, 6, 15) = K_5_14 - A_14_0*cz0_5 - cy1_14*cz1_5 - cy2_14*cz2_5
          kl(lane, 6, 16) = K_5_15 - A_15_0*cz0_5 - cy1_15*cz1_5 - cy2_15*cz2_5
          kl(lane, 7, 1) = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0
          kl(lane, 7, 2) = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1
          kl(lane, 7, 3) = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2
          kl(lane, 7, 4) = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3
          kl(lane, 7, 5) = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4
          kl(lane, 7, 6) = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5
          kl(lane, 7, 7) = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6
          kl(lane, 7, 8) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6
          kl(lane, 7, 9) = K_6_8 - A_8_0*cz0_6 - cy1_8*cz1_6 - cy2_8*cz2_6
          kl(lane, 7, 10) = K_6_9 - A_9_0*cz0_6 - cy1_9*cz1_6 - cy2_9*cz2_6
          kl(lane, 7, 11) = K_6_10 - A_10_0*cz0_6 - cy1_10*cz1_6 - cy2_10*cz2_6
          kl(lane, 7, 12) = K_6_11 - A_11_0*cz0_6 - cy1_11*cz1_6 - cy2_11*cz2_6
          kl(lane, 7, 13) = K_6_12 - A_12_0*cz0_6 - cy1_12*cz1_6 - cy2_12*cz2_6
          kl(lane, 7, 14) = K_6_13 - A_13_0*cz0_6 - cy1_13*cz1_6 - cy2_13*cz2_6
          kl(lane, 7, 15) = K_6_14 - A_14_0*cz0_6 - cy1_14*cz1_6 - cy2_14*cz2_6
          kl(lane, 7, 16) = K_6_15 - A_15_0*cz0_6 - cy1_15*cz1_6 - cy2_15*cz2_6
          kl(lane, 8, 1) = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0
          kl(lane, 8, 2) = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1
          kl(lane, 8, 3) = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2
          kl(lane, 8, 4) = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3
          kl(lane, 8, 5) = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4
          kl(lane, 8, 6) = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5
          kl(lane, 8, 7) = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6
          kl(lane, 8, 8) = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7
          kl(lane, 8, 9) = K_7_8 - A_8_0*cz0_7 - cy1_8*cz1_7 - cy2_8*cz2_7
          kl(lane, 8, 10) = K_7_9 - A_9_0*cz0_7 - cy1_9*cz1_7 - cy2_9*cz2_7
          kl(lane, 8, 11) = K_7_10 - A_10_0*cz0_7 - cy1_10*cz1_7 - cy2_10*cz2_7
          kl(lane, 8, 12) = K_7_11 - A_11_0*cz0_7 - cy1_11*cz1_7 - cy2_11*cz2_7
          kl(lane, 8, 13) = K_7_12 - A_12_0*cz0_7 - cy1_12*cz1_7 - cy2_12*cz2_7
          kl(lane, 8, 14) = K_7_13 - A_13_0*cz0_7 - cy1_13*cz1_7 - cy2_13*cz2_7
          kl(lane, 8, 15) = K_7_14 - A_14_0*cz0_7 - cy1_14*cz1_7 - cy2_14*cz2_7
          kl(lane, 8, 16) = K_7_15 - A_15_0*cz0_7 - cy1_15*cz1_7 - cy2_15*cz2_7
          kl(lane, 9, 1) = K_0_8 - A_8_0*cz0_0 - cy1_8*cz1_0 - cy2_8*cz2_0
          kl(lane, 9, 2) = K_1_8 - A_8_0*cz0_1 - cy1_8*cz1_1 - cy2_8*cz2_1
          kl(lane, 9, 3) = K_2_8 - A_8_0*cz0_2 - cy1_8*cz1_2 - cy2_8*cz2_2
          kl(lane, 9, 4) = K_3_8 - A_8_0*cz0_3 - cy1_8*cz1_3 - cy2_8*cz2_3
          kl(lane, 9, 5) = K_4_8 - A_8_0*cz0_4 - cy1_8*cz1_4 - cy2_8*cz2_4
          kl(lane, 9, 6) = K_5_8 - A_8_0*cz0_5 - cy1_8*cz1_5 - cy2_8*cz2_5
          kl(lane, 9, 7) = K_6_8 - A_8_0*cz0_6 - cy1_8*cz1_6 - cy2_8*cz2_6
          kl(lane, 9, 8) = K_7_8 - A_8_0*cz0_7 - cy1_8*cz1_7 - cy2_8*cz2_7
          kl(lane, 9, 9) = K_8_8 - A_8_0*cz0_8 - cy1_8*cz1_8 - cy2_8*cz2_8
          kl(lane, 9, 10) = K_8_9 - A_9_0*cz0_8 - cy1_9*cz1_8 - cy2_9*cz2_8
          kl(lane, 9, 11) = K_8_10 - A_10_0*cz0_8 - cy1_10*cz1_8 - cy2_10*cz2_8
          kl(lane, 9, 12) = K_8_11 - A_11_0*cz0_8 - cy1_11*cz1_8 - cy2_11*cz2_8
          kl(lane, 9, 13) = K_8_12 - A_12_0*cz0_8 - cy1_12*cz1_8 - cy2_12*cz2_8
          kl(lane, 9, 14) = K_8_13 - A_13_0*cz0_8 - cy1_13*cz1_8 - cy2_13*cz2_8
          kl(lane, 9, 15) = K_8_14 - A_14_0*cz0_8 - cy1_14*cz1_8 - cy2_14*cz2_8
          kl(lane, 9, 16) = K_8_15 - A_15_0*cz0_8 - cy1_15*cz1_8 - cy2_15*cz2_8
          kl(lane, 10, 1) = K_0_9 - A_9_0*cz0_0 - cy1_9*cz1_0 - cy2_9*cz2_0
          kl(lane, 10, 2) = K_1_9 - A_9_0*cz0_1 - cy1_9*cz1_1 - cy2_9*cz2_1
          kl(lane, 10, 3) = K_2_9 - A_9_0*cz0_2 - cy1_9*cz1_2 - cy2_9*cz2_2
          kl(lane, 10, 4) = K_3_9 - A_9_0*cz0_3 - cy1_9*cz1_3 - cy2_9*cz2_3
          kl(lane, 10, 5) = K_4_9 - A_9_0*cz0_4 - cy1_9*cz1_4 - cy2_9*cz2_4
          kl(lane, 10, 6) = K_5_9 - A_9_0*cz0_5 - cy1_9*cz1_5 - cy2_9*cz2_5
          kl(lane, 10, 7) = K_6_9 - A_9_0*cz0_6 - cy1_9*cz1_6 - cy2_9*cz2_6
          kl(lane, 10, 8) = K_7_9 - A_9_0*cz0_7 - cy1_9*cz1_7 - cy2_9*cz2_7
          kl(lane, 10, 9) = K_8_9 - A_9_0*cz0_8 - cy1_9*cz1_8 - cy2_9*cz2_8
          kl(lane, 10, 10) = K_9_9 - A_9_0*cz0_9 - cy1_9*cz1_9 - cy2_9*cz2_9
          kl(lane, 10, 11) = K_9_10 - A_10_0*cz0_9 - cy1_10*cz1_9 - cy2_10*cz2_9
          kl(lane, 10, 12) = K_9_11 - A_11_0*cz0_9 - cy1_11*cz1_9 - cy2_11*cz2_9
          kl(lane, 10, 13) = K_9_12 - A_12_0*cz0_9 - cy1_12*cz1_9 - cy2_12*cz2_9
          kl(lane, 10, 14) = K_9_13 - A_13_0*cz0_9 - cy1_13*cz1_9 - cy2_13*cz2_9
          kl(lane, 10, 15) = K_9_14 - A_14_0*cz0_9 - cy1_14*cz1_9 - cy2_14*cz2_9
          kl(lane, 10, 16) = K_9_15 - A_15_0*cz0_9 - cy1_15*cz1_9 - cy2_15*cz2_9
          kl(lane, 11, 1) = K_0_10 - A_10_0*cz0_0 - cy1_10*cz1_0 - cy2_10*cz2_0
          kl(lane, 11, 2) = K_1_10 - A_10_0*cz0_1 - cy1_10*cz1_1 - cy2_10*cz2_1
          kl(lane, 11, 3) = K_2_10 - A_10_0*cz0_2 - cy1_10*cz1_2 - cy2_10*cz2_2
          kl(lane, 11, 4) = K_3_10 - A_10_0*cz0_3 - cy1_10*cz1_3 - cy2_10*cz2_3
          kl(lane, 11, 5) = K_4_10 - A_10_0*cz0_4 - cy1_10*cz1_4 - cy2_10*cz2_4
          kl(lane, 11, 6) = K_5_10 - A_10_0*cz0_5 - cy1_10*cz1_5 - cy2_10*cz2_5
          kl(lane, 11, 7) = K_6_10 - A_10_0*cz0_6 - cy1_10*cz1_6 - cy2_10*cz2_6
          kl(lane, 11, 8) = K_7_10 - A_10_0*cz0_7 - cy1_10*cz1_7 - cy2_10*cz2_7
          kl(lane, 11, 9) = K_8_10 - A_10_0*cz0_8 - cy1_10*cz1_8 - cy2_10*cz2_8
          kl(lane, 11, 10) = K_9_10 - A_10_0*cz0_9 - cy1_10*cz1_9 - cy2_10*cz2_9
          kl(lane, 11, 11) = K_10_10 - A_10_0*cz0_10 - cy1_10*cz1_10 - cy2_10*cz2_10
          kl(lane, 11, 12) = K_10_11 - A_11_0*cz0_10 - cy1_11*cz1_10 - cy2_11*cz2_10
          kl(lane, 11, 13) = K_10_12 - A_12_0*cz0_10 - cy1_12*cz1_10 - cy2_12*cz2_10
          kl(lane, 11, 14) = K_10_13 - A_13_0*cz0_10 - cy1_13*cz1_10 - cy2_13*cz2_10
          kl(lane, 11, 15) = K_10_14 - A_14_0*cz0_10 - cy1_14*cz1_10 - cy2_14*cz2_10
          kl(lane, 11, 16) = K_10_15 - A_15_0*cz0_10 - cy1_15*cz1_10 - cy2_15*cz2_10
          kl(lane, 12, 1) = K_0_11 - A_11_0*cz0_0 - cy1_11*cz1_0 - cy2_11*cz2_0
          kl(lane, 12, 2) = K_1_11 - A_11_0*cz0_1 - cy1_11*cz1_1 - cy2_11*cz2_1
          kl(lane, 12, 3) = K_2_11 - A_11_0*cz0_2 - cy1_11*cz1_2 - cy2_11*cz2_2
          kl(lane, 12, 4) = K_3_11 - A_11_0*cz0_3 - cy1_11*cz1_3 - cy2_11*cz2_3
          kl(lane, 12, 5) = K_4_11 - A_11_0*cz0_4 - cy1_11*cz1_4 - cy2_11*cz2_4
          kl(lane, 12, 6) = K_5_11 - A_11_0*cz0_5 - cy1_11*cz1_5 - cy2_11*cz2_5
          kl(lane, 12, 7) = K_6_11 - A_11_0*cz0_6 - cy1_11*cz1_6 - cy2_11*cz2_6
          kl(lane, 12, 8) = K_7_11 - A_11_0*cz0_7 - cy1_11*cz1_7 - cy2_11*cz2_7
          kl(lane, 12, 9) = K_8_11 - A_11_0*cz0_8 - cy1_11*cz1_8 - cy2_11*cz2_8
          kl(lane, 12, 10) = K_9_11 - A_11_0*cz0_9 - cy1_11*cz1_9 - cy2_11*cz2_9
          kl(lane, 12, 11) = K_10_11 - A_11_0*cz0_10 - cy1_11*cz1_10 - cy2_11*cz2_10
          kl(lane, 12, 12) = K_11_11 - A_11_0*cz0_11 - cy1_11*cz1_11 - cy2_11*cz2_11
          kl(lane, 12, 13) = K_11_12 - A_12_0*cz0_11 - cy1_12*cz1_11 - cy2_12*cz2_11
          kl(lane, 12, 14) = K_11_13 - A_13_0*cz0_11 - cy1_13*cz1_11 - cy2_13*cz2_11
          kl(lane, 12, 15) = K_11_14 - A_14_0*cz0_11 - cy1_14*cz1_11 - cy2_14*cz2_11
          kl(lane, 12, 16) = K_11_15 - A_15_0*cz0_11 - cy1_15*cz1_11 - cy2_15*cz2_11
          kl(lane, 13, 1) = K_0_12 - A_12_0*cz0_0 - cy1_12*cz1_0 - cy2_12*cz2_0
          kl(lane, 13, 2) = K_1_12 - A_12_0*cz0_1 - cy1_12*cz1_1 - cy2_12*cz2_1
          kl(lane, 13, 3) = K_2_12 - A_12_0*cz0_2 - cy1_12*cz1_2 - cy2_12*cz2_2
          kl(lane, 13, 4) = K_3_12 - A_12_0*cz0_3 - cy1_12*cz1_3 - cy2_12*cz2_3
          kl(lane, 13, 5) = K_4_12 - A_12_0*cz0_4 - cy1_12*cz1_4 - cy2_12*cz2_4
          kl(lane, 13, 6) = K_5_12 - A_12_0*cz0_5 - cy1_12*cz1_5 - cy2_12*cz2_5
          kl(lane, 13, 7) = K_6_12 - A_12_0*cz0_6 - cy1_12*cz1_6 - cy2_12*cz2_6
          kl(lane, 13, 8) = K_7_12 - A_12_0*cz0_7 - cy1_12*cz1_7 - cy2_12*cz2_7
          kl(lane, 13, 9) = K_8_12 - A_12_0*cz0_8 - cy1_12*cz1_8 - cy2_12*cz2_8
          kl(lane, 13, 10) = K_9_12 - A_12_0*cz0_9 - cy1_12*cz1_9 - cy2_12*cz2_9
          kl(lane, 13, 11) = K_10_12 - A_12_0*cz0_10 - cy1_12*cz1_10 - cy2_12*cz2_10
          kl(lane, 13, 12) = K_11_12 - A_12_0*cz0_11 - cy1_12*cz1_11 - cy2_12*cz2_11
          kl(lane, 13, 13) = K_12_12 - A_12_0*cz0_12 - cy1_12*cz1_12 - cy2_12*cz2_12
          kl(lane, 13, 14) = K_12_13 - A_13_0*cz0_12 - cy1_13*cz1_12 - cy2_13*cz2_12
          kl(lane, 13, 15) = K_12_14 - A_14_0*cz0_12 - cy1_14*cz1_12 - cy2_14*cz2_12
          kl(lane, 13, 16) = K_12_15 - A_15_0*cz0_12 - cy1_15*cz1_12 - cy2_15*cz2_12
          kl(lane, 14, 1) = K_0_13 - A_13_0*cz0_0 - cy1_13*cz1_0 - cy2_13*cz2_0
          kl(lane, 14, 2) = K_1_13 - A_13_0*cz0_1 - cy1_13*cz1_1 - cy2_13*cz2_1
          kl(lane, 14, 3) = K_2_13 - A_13_0*cz0_2 - cy1_13*cz1_2 - cy2_13*cz2_2
          kl(lane, 14, 4) = K_3_13 - A_13_0*cz0_3 - cy1_13*cz1_3 - cy2_13*cz2_3
          kl(lane, 14, 5) = K_4_13 - A_13_0*cz0_4 - cy1_13*cz1_4 - cy2_13*cz2_4
          kl(lane, 14, 6) = K_5_13 - A_13_0*cz0_5 - cy1_13*cz1_5 - cy2_13*cz2_5
          kl(lane, 14, 7) = K_6_13 - A_13_0*cz0_6 - cy1_13*cz1_6 - cy2_13*cz2_6
          kl(lane, 14, 8) = K_7_13 - A_13_0*cz0_7 - cy1_13*cz1_7 - cy2_13*cz2_7
          kl(lane, 14, 9) = K_8_13 - A_13_0*cz0_8 - cy1_13*cz1_8 - cy2_13*cz2_8
          kl(lane, 14, 10) = K_9_13 - A_13_0*cz0_9 - cy1_13*cz1_9 - cy2_13*cz2_9
          kl(lane, 14, 11) = K_10_13 - A_13_0*cz0_10 - cy1_13*cz1_10 - cy2_13*cz2_10
          kl(lane, 14, 12) = K_11_13 - A_13_0*cz0_11 - cy1_13*cz1_11 - cy2_13*cz2_11
          kl(lane, 14, 13) = K_12_13 - A_13_0*cz0_12 - cy1_13*cz1_12 - cy2_13*cz2_12
          kl(lane, 14, 14) = K_13_13 - A_13_0*cz0_13 - cy1_13*cz1_13 - cy2_13*cz2_13
          kl(lane, 14, 15) = K_13_14 - A_14_0*cz0_13 - cy1_14*cz1_13 - cy2_14*cz2_13
          kl(lane, 14, 16) = K_13_15 - A_15_0*cz0_13 - cy1_15*cz1_13 - cy2_15*cz2_13
          kl(lane, 15, 1) = K_0_14 - A_14_0*cz0_0 - cy1_14*cz1_0 - cy2_14*cz2_0
          kl(lane, 15, 2) = K_1_14 - A_14_0*cz0_1 - cy1_14*cz1_1 - cy2_14*cz2_1
          kl(lane, 15, 3) = K_2_14 - A_14_0*cz0_2 - cy1_14*cz1_2 - cy2_14*cz2_2
          kl(lane, 15, 4) = K_3_14 - A_14_0*cz0_3 - cy1_14*cz1_3 - cy2_14*cz2_3
          kl(lane, 15, 5) = K_4_14 - A_14_0*cz0_4 - cy1_14*cz1_4 - cy2_14*cz2_4
          kl(lane, 15, 6) = K_5_14 - A_14_0*cz0_5 - cy1_14*cz1_5 - cy2_14*cz2_5
          kl(lane, 15, 7) = K_6_14 - A_14_0*cz0_6 - cy1_14*cz1_6 - cy2_14*cz2_6
          kl(lane, 15, 8) = K_7_14 - A_14_0*cz0_7 - cy1_14*cz1_7 - cy2_14*cz2_7
          kl(lane, 15, 9) = K_8_14 - A_14_0*cz0_8 - cy1_14*cz1_8 - cy2_14*cz2_8
          kl(lane, 15, 10) = K_9_14 - A_14_0*cz0_9 - cy1_14*cz1_9 - cy2_14*cz2_9
          kl(lane, 15, 11) = K_10_14 - A_14_0*cz0_10 - cy1_14*cz1_10 - cy2_14*cz2_10
          kl(lane, 15, 12) = K_11_14 - A_14_0*cz0_11 - cy1_14*cz1_11 - cy2_14*cz2_11
          kl(lane, 15, 13) = K_12_14 - A_14_0*cz0_12 - cy1_14*cz1_12 - cy2_14*cz2_12
          kl(lane, 15, 14) = K_13_14 - A_14_0*cz0_13 - cy1_14*cz1_13 - cy2_14*cz2_13
          kl(lane, 15, 15) = K_14_14 - A_14_0*cz0_14 - cy1_14*cz1_14 - cy2_14*cz2_14
          kl(lane, 15, 16) = K_14_15 - A_15_0*cz0_14 - cy1_15*cz1_14 - cy2_15*cz2_14
          kl(lane, 16, 1) = K_0_15 - A_15_0*cz0_0 - cy1_15*cz1_0 - cy2_15*cz2_0
          kl(lane, 16, 2) = K_1_15 - A_15_0*cz0_1 - cy1_15*cz1_1 - cy2_15*cz2_1
          kl(lane, 16, 3) = K_2_15 - A_15_0*cz0_2 - cy1_15*cz1_2 - cy2_15*cz2_2
          kl(lane, 16, 4) = K_3_15 - A_15_0*cz0_3 - cy1_15*cz1_3 - cy2_15*cz2_3
          kl(lane, 16, 5) = K_4_15 - A_15_0*cz0_4 - cy1_15*cz1_4 - cy2_15*cz2_4
          kl(lane, 16, 6) = K_5_15 - A_15_0*cz0_5 - cy1_15*cz1_5 - cy2_15*cz2_5
          kl(lane, 16, 7) = K_6_15 - A_15_0*cz0_6 - cy1_15*cz1_6 - cy2_15*cz2_6
          kl(lane, 16, 8) = K_7_15 - A_15_0*cz0_7 - cy1_15*cz1_7 - cy2_15*cz2_7
          kl(lane, 16, 9) = K_8_15 - A_15_0*cz0_8 - cy1_15*cz1_8 - cy2_15*cz2_8
          kl(lane, 16, 10) = K_9_15 - A_15_0*cz0_9 - cy1_15*cz1_9 - cy2_15*cz2_9
          kl(lane, 16, 11) = K_10_15 - A_15_0*cz0_10 - cy1_15*cz1_10 - cy2_15*cz2_10
          kl(lane, 16, 12) = K_11_15 - A_15_0*cz0_11 - cy1_15*cz1_11 - cy2_15*cz2_11
          kl(lane, 16, 13) = K_12_15 - A_15_0*cz0_12 - cy1_15*cz1_12 - cy2_15*cz2_12
          kl(lane, 16, 14) = K_13_15 - A_15_0*cz0_13 - cy1_15*cz1_13 - cy2_15*cz2_13
          kl(lane, 16, 15) = K_14_15 - A_15_0*cz0_14 - cy1_15*cz1_14 - cy2_15*cz2_14
          kl(lane, 16, 16) = K_15_15 - A_15_0*cz0_15 - cy1_15*cz1_15 - cy2_15*cz2_15
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine q8_bbar_plane_stress_stiffness_batch

  pure subroutine q8_bbar_plane_stress_validity_one(xy, detJ_min)
    real(dp), intent(in) :: xy(2, 8)
    real(dp), intent(out) :: detJ_min
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, gx_0_1, gx_0_2, gx_1_0
    real(dp) :: gx_1_1, gx_1_2, gx_2_0, gx_2_1, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2, gy_2_0, gy_2_1
    real(dp) :: dmin
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
    x7 = xy(1, 7)
    y7 = xy(2, 7)
    x8 = xy(1, 8)
    y8 = xy(2, 8)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = -0.5_dp*x6 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = -0.5_dp*x5 - 0.5_dp*x7 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = -0.5_dp*y6 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = -0.5_dp*y5 - 0.5_dp*y7 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    block   ! gauss-3x3 point 1 of 9: xi = -0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ
      q0 = -0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 - 1.5491933384829668_dp*gx_2_0
      q1 = -0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = detJ
    end block
    block   ! gauss-3x3 point 2 of 9: xi = 0, eta = -0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 0.6_dp*gx_1_2 - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 + 0.6_dp*gy_1_2 - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 3 of 9: xi = 0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 1.5491933384829668_dp*gx_2_0 &
          - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 1.5491933384829668_dp*gy_2_0 &
          - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1 &
          - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1 &
          - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 4 of 9: xi = -0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + 0.6_dp*gx_2_1 - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 + 0.6_dp*gy_2_1 - 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 5 of 9: xi = 0, eta = 0, weight = 64/81
      real(dp) :: detJ
      detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 6 of 9: xi = 0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 7 of 9: xi = -0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 0.7745966692414834_dp*gx_1_1 &
          - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1 &
          - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 1.5491933384829668_dp*gx_0_2 &
          - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 1.5491933384829668_dp*gy_0_2 &
          - 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 8 of 9: xi = 0, eta = 0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ
      J00 = gx_1_0 + 0.6_dp*gx_1_2 + 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    block   ! gauss-3x3 point 9 of 9: xi = 0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ
      q0 = 0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 + 1.5491933384829668_dp*gx_2_0
      q1 = 0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    detJ_min = dmin
  end subroutine q8_bbar_plane_stress_validity_one

  pure subroutine q8_bbar_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_q8_bbar_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 8, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call q8_bbar_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine q8_bbar_plane_stress_validity

  pure subroutine q8_bbar_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 8), u(16)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 9), stress(3, 9)
    real(dp), parameter :: t = 1.0_dp
    ! c0 = eta^2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c0(9) = [0.6_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.6_dp, &
        0.6_dp, 0.6_dp]
    ! c1 = 2*xi at the points of gauss-3x3
    real(dp), parameter :: KR0_c1(9) = [-1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp, &
        -1.5491933384829668_dp, 0.0_dp, 1.5491933384829668_dp, -1.5491933384829668_dp, 0.0_dp, &
        1.5491933384829668_dp]
    ! c2 = 2*eta*xi at the points of gauss-3x3
    real(dp), parameter :: KR0_c2(9) = [1.2_dp, 0.0_dp, -1.2_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.2_dp, &
        0.0_dp, 1.2_dp]
    ! c3 = 2*eta at the points of gauss-3x3
    real(dp), parameter :: KR0_c3(9) = [-1.5491933384829668_dp, -1.5491933384829668_dp, &
        -1.5491933384829668_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.5491933384829668_dp, &
        1.5491933384829668_dp, 1.5491933384829668_dp]
    ! c4 = xi^2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c4(9) = [0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, &
        0.0_dp, 0.6_dp]
    ! c5 = -eta^2/4 - eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c5(9) = [-1.0309475019311125_dp, -0.3436491673103708_dp, &
        0.3436491673103708_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.04364916731037084_dp, 0.04364916731037084_dp, 0.13094750193111254_dp]
    ! c6 = -eta*xi/2 + eta/2 - xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KR0_c6(9) = [-1.0309475019311125_dp, -0.3872983346207417_dp, &
        -0.04364916731037084_dp, -0.3436491673103708_dp, 0.0_dp, 0.04364916731037084_dp, &
        0.3436491673103708_dp, 0.3872983346207417_dp, 0.13094750193111254_dp]
    ! c7 = eta^2/4 - eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c7(9) = [-0.3436491673103708_dp, 0.3436491673103708_dp, &
        1.0309475019311125_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.13094750193111254_dp, -0.04364916731037084_dp, 0.04364916731037084_dp]
    ! c8 = eta*xi/2 + eta/2 - xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KR0_c8(9) = [-0.04364916731037084_dp, -0.3872983346207417_dp, &
        -1.0309475019311125_dp, 0.04364916731037084_dp, 0.0_dp, -0.3436491673103708_dp, &
        0.13094750193111254_dp, 0.3872983346207417_dp, 0.3436491673103708_dp]
    ! c9 = eta^2/4 + eta*xi/2 + eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c9(9) = [-0.13094750193111254_dp, -0.04364916731037084_dp, &
        0.04364916731037084_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -0.3436491673103708_dp, 0.3436491673103708_dp, 1.0309475019311125_dp]
    ! c10 = eta*xi/2 + eta/2 + xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KR0_c10(9) = [-0.13094750193111254_dp, -0.3872983346207417_dp, &
        -0.3436491673103708_dp, -0.04364916731037084_dp, 0.0_dp, 0.3436491673103708_dp, &
        0.04364916731037084_dp, 0.3872983346207417_dp, 1.0309475019311125_dp]
    ! c11 = -eta^2/4 + eta*xi/2 - eta/4 + xi/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c11(9) = [-0.04364916731037084_dp, 0.04364916731037084_dp, &
        0.13094750193111254_dp, -0.3872983346207417_dp, 0.0_dp, 0.3872983346207417_dp, &
        -1.0309475019311125_dp, -0.3436491673103708_dp, 0.3436491673103708_dp]
    ! c12 = -eta*xi/2 + eta/2 + xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KR0_c12(9) = [-0.3436491673103708_dp, -0.3872983346207417_dp, &
        -0.13094750193111254_dp, 0.3436491673103708_dp, 0.0_dp, -0.04364916731037084_dp, &
        1.0309475019311125_dp, 0.3872983346207417_dp, 0.04364916731037084_dp]
    ! c13 = eta*xi - xi at the points of gauss-3x3
    real(dp), parameter :: KR0_c13(9) = [1.3745966692414833_dp, 0.0_dp, -1.3745966692414833_dp, &
        0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, 0.17459666924148337_dp, 0.0_dp, &
        -0.17459666924148337_dp]
    ! c14 = xi^2/2 - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c14(9) = [-0.2_dp, -0.5_dp, -0.2_dp, -0.2_dp, -0.5_dp, -0.2_dp, &
        -0.2_dp, -0.5_dp, -0.2_dp]
    ! c15 = 1/2 - eta^2/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c15(9) = [0.2_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.5_dp, 0.5_dp, 0.2_dp, &
        0.2_dp, 0.2_dp]
    ! c16 = -eta*xi - eta at the points of gauss-3x3
    real(dp), parameter :: KR0_c16(9) = [0.17459666924148337_dp, 0.7745966692414834_dp, &
        1.3745966692414833_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.17459666924148337_dp, &
        -0.7745966692414834_dp, -1.3745966692414833_dp]
    ! c17 = -eta*xi - xi at the points of gauss-3x3
    real(dp), parameter :: KR0_c17(9) = [0.17459666924148337_dp, 0.0_dp, -0.17459666924148337_dp, &
        0.7745966692414834_dp, 0.0_dp, -0.7745966692414834_dp, 1.3745966692414833_dp, 0.0_dp, &
        -1.3745966692414833_dp]
    ! c18 = 1/2 - xi^2/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c18(9) = [0.2_dp, 0.5_dp, 0.2_dp, 0.2_dp, 0.5_dp, 0.2_dp, 0.2_dp, &
        0.5_dp, 0.2_dp]
    ! c19 = eta^2/2 - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KR0_c19(9) = [-0.2_dp, -0.2_dp, -0.2_dp, -0.5_dp, -0.5_dp, -0.5_dp, &
        -0.2_dp, -0.2_dp, -0.2_dp]
    ! c20 = eta*xi - eta at the points of gauss-3x3
    real(dp), parameter :: KR0_c20(9) = [1.3745966692414833_dp, 0.7745966692414834_dp, &
        0.17459666924148337_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.3745966692414833_dp, &
        -0.7745966692414834_dp, -0.17459666924148337_dp]
    ! eta = eta at the points of gauss-3x3
    real(dp), parameter :: KR0_eta(9) = [-0.7745966692414834_dp, -0.7745966692414834_dp, &
        -0.7745966692414834_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.7745966692414834_dp, &
        0.7745966692414834_dp, 0.7745966692414834_dp]
    ! w = the point weight at the points of gauss-3x3
    real(dp), parameter :: KR0_w(9) = [0.30864197530864196_dp, 0.49382716049382713_dp, &
        0.30864197530864196_dp, 0.49382716049382713_dp, 0.7901234567901234_dp, &
        0.49382716049382713_dp, 0.30864197530864196_dp, 0.49382716049382713_dp, &
        0.30864197530864196_dp]
    ! xi = xi at the points of gauss-3x3
    real(dp), parameter :: KR0_xi(9) = [-0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp, &
        -0.7745966692414834_dp, 0.0_dp, 0.7745966692414834_dp, -0.7745966692414834_dp, 0.0_dp, &
        0.7745966692414834_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, u1, u2, u3, u4, u5
    real(dp) :: u6, u7, u8, u9, u10, u11, u12, u13, u14, u15, u16, m3, m4, m5, m6, m7, m8, gx_0_1
    real(dp) :: gx_0_2, gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2
    real(dp) :: gy_2_0, gy_2_1, A_0_0, A_0_1, A_0_2, A_1_0, A_1_1, A_1_2, A_2_0, A_2_1, A_2_2, A_3_0
    real(dp) :: A_3_1, A_3_2, A_4_0, A_4_1, A_4_2, A_5_0, A_5_1, A_5_2, A_6_0, A_6_1, A_6_2, A_7_0
    real(dp) :: A_7_1, A_7_2, A_8_0, A_8_1, A_8_2, A_9_0, A_9_1, A_9_2, A_10_0, A_10_1, A_10_2, A_11_0
    real(dp) :: A_11_1, A_11_2, A_12_0, A_12_1, A_12_2, A_13_0, A_13_1, A_13_2, A_14_0, A_14_1, A_14_2
    real(dp) :: A_15_0, A_15_1, A_15_2, H_0_0, H_0_1, H_0_2, H_1_1, H_1_2, H_2_2, cid0, cL1_0, cL2_0
    real(dp) :: cd1, cid1, cL2_1, cd2, cid2, cb0, cb1, cb2, cy1_0, cy2_0, alpha3, alpha2, alpha1
    integer :: p
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
    x7 = xy(1, 7)
    y7 = xy(2, 7)
    x8 = xy(1, 8)
    y8 = xy(2, 8)
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
    u13 = u(13)
    u14 = u(14)
    u15 = u(15)
    u16 = u(16)
    m3 = -(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    m4 = 0.5_dp*(-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    m5 = (-3.0_dp + 3.0_dp*nu*nu)/(-E - 2.0_dp*E*nu)
    m6 = E/(1.0_dp - nu*nu)
    m7 = E*nu/(1.0_dp - nu*nu)
    m8 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = -0.5_dp*x6 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = -0.5_dp*x5 - 0.5_dp*x7 + 0.25_dp*x1 + 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = -0.5_dp*y6 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = -0.5_dp*y5 - 0.5_dp*y7 + 0.25_dp*y1 + 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    A_0_0 = 0.0_dp
    A_0_1 = 0.0_dp
    A_0_2 = 0.0_dp
    A_1_0 = 0.0_dp
    A_1_1 = 0.0_dp
    A_1_2 = 0.0_dp
    A_2_0 = 0.0_dp
    A_2_1 = 0.0_dp
    A_2_2 = 0.0_dp
    A_3_0 = 0.0_dp
    A_3_1 = 0.0_dp
    A_3_2 = 0.0_dp
    A_4_0 = 0.0_dp
    A_4_1 = 0.0_dp
    A_4_2 = 0.0_dp
    A_5_0 = 0.0_dp
    A_5_1 = 0.0_dp
    A_5_2 = 0.0_dp
    A_6_0 = 0.0_dp
    A_6_1 = 0.0_dp
    A_6_2 = 0.0_dp
    A_7_0 = 0.0_dp
    A_7_1 = 0.0_dp
    A_7_2 = 0.0_dp
    A_8_0 = 0.0_dp
    A_8_1 = 0.0_dp
    A_8_2 = 0.0_dp
    A_9_0 = 0.0_dp
    A_9_1 = 0.0_dp
    A_9_2 = 0.0_dp
    A_10_0 = 0.0_dp
    A_10_1 = 0.0_dp
    A_10_2 = 0.0_dp
    A_11_0 = 0.0_dp
    A_11_1 = 0.0_dp
    A_11_2 = 0.0_dp
    A_12_0 = 0.0_dp
    A_12_1 = 0.0_dp
    A_12_2 = 0.0_dp
    A_13_0 = 0.0_dp
    A_13_1 = 0.0_dp
    A_13_2 = 0.0_dp
    A_14_0 = 0.0_dp
    A_14_1 = 0.0_dp
    A_14_2 = 0.0_dp
    A_15_0 = 0.0_dp
    A_15_1 = 0.0_dp
    A_15_2 = 0.0_dp
    H_0_0 = 0.0_dp
    H_0_1 = 0.0_dp
    H_0_2 = 0.0_dp
    H_1_1 = 0.0_dp
    H_1_2 = 0.0_dp
    H_2_2 = 0.0_dp
    do p = 1, 9   ! gauss-3x3: loop over the 9 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
        real(dp) :: c19, c20, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1
        real(dp) :: dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7
        real(dp) :: dNdy7, dNdx8, dNdy8, sc0, T52, T53, s54, T55, T56
        c0 = KR0_c0(p)
        c1 = KR0_c1(p)
        c2 = KR0_c2(p)
        c3 = KR0_c3(p)
        c4 = KR0_c4(p)
        c5 = KR0_c5(p)
        c6 = KR0_c6(p)
        c7 = KR0_c7(p)
        c8 = KR0_c8(p)
        c9 = KR0_c9(p)
        c10 = KR0_c10(p)
        c11 = KR0_c11(p)
        c12 = KR0_c12(p)
        c13 = KR0_c13(p)
        c14 = KR0_c14(p)
        c15 = KR0_c15(p)
        c16 = KR0_c16(p)
        c17 = KR0_c17(p)
        c18 = KR0_c18(p)
        c19 = KR0_c19(p)
        c20 = KR0_c20(p)
        eta = KR0_eta(p)
        w = KR0_w(p)
        xi = KR0_xi(p)
        J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + eta*gx_1_1
        J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + eta*gy_1_1
        J10 = gx_0_1 + c2*gx_1_2 + c3*gx_0_2 + c4*gx_2_1 + gx_1_1*xi
        J11 = gy_0_1 + c2*gy_1_2 + c3*gy_0_2 + c4*gy_2_1 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
        Ji00 = J11*idet
        Ji01 = -J01*idet
        Ji10 = -J10*idet
        Ji11 = J00*idet
        dNdx1 = Ji00*c5 + Ji01*c6
        dNdy1 = Ji10*c5 + Ji11*c6
        dNdx2 = Ji00*c7 + Ji01*c8
        dNdy2 = Ji10*c7 + Ji11*c8
        dNdx3 = Ji00*c9 + Ji01*c10
        dNdy3 = Ji10*c9 + Ji11*c10
        dNdx4 = Ji00*c11 + Ji01*c12
        dNdy4 = Ji10*c11 + Ji11*c12
        dNdx5 = Ji00*c13 + Ji01*c14
        dNdy5 = Ji10*c13 + Ji11*c14
        dNdx6 = Ji00*c15 + Ji01*c16
        dNdy6 = Ji10*c15 + Ji11*c16
        dNdx7 = Ji00*c17 + Ji01*c18
        dNdy7 = Ji10*c17 + Ji11*c18
        dNdx8 = Ji00*c19 + Ji01*c20
        dNdy8 = Ji10*c19 + Ji11*c20
        sc0 = detJ*t*w
        T52 = sc0*xi
        T53 = eta*sc0
        s54 = m3*sc0
        T55 = s54*xi
        T56 = eta*s54
        A_0_0 = A_0_0 + (dNdx1*sc0)
        A_0_1 = A_0_1 + (T52*dNdx1)
        A_0_2 = A_0_2 + (T53*dNdx1)
        A_1_0 = A_1_0 + (dNdy1*sc0)
        A_1_1 = A_1_1 + (T52*dNdy1)
        A_1_2 = A_1_2 + (T53*dNdy1)
        A_2_0 = A_2_0 + (dNdx2*sc0)
        A_2_1 = A_2_1 + (T52*dNdx2)
        A_2_2 = A_2_2 + (T53*dNdx2)
        A_3_0 = A_3_0 + (dNdy2*sc0)
        A_3_1 = A_3_1 + (T52*dNdy2)
        A_3_2 = A_3_2 + (T53*dNdy2)
        A_4_0 = A_4_0 + (dNdx3*sc0)
        A_4_1 = A_4_1 + (T52*dNdx3)
        A_4_2 = A_4_2 + (T53*dNdx3)
        A_5_0 = A_5_0 + (dNdy3*sc0)
        A_5_1 = A_5_1 + (T52*dNdy3)
        A_5_2 = A_5_2 + (T53*dNdy3)
        A_6_0 = A_6_0 + (dNdx4*sc0)
        A_6_1 = A_6_1 + (T52*dNdx4)
        A_6_2 = A_6_2 + (T53*dNdx4)
        A_7_0 = A_7_0 + (dNdy4*sc0)
        A_7_1 = A_7_1 + (T52*dNdy4)
        A_7_2 = A_7_2 + (T53*dNdy4)
        A_8_0 = A_8_0 + (dNdx5*sc0)
        A_8_1 = A_8_1 + (T52*dNdx5)
        A_8_2 = A_8_2 + (T53*dNdx5)
        A_9_0 = A_9_0 + (dNdy5*sc0)
        A_9_1 = A_9_1 + (T52*dNdy5)
        A_9_2 = A_9_2 + (T53*dNdy5)
        A_10_0 = A_10_0 + (dNdx6*sc0)
        A_10_1 = A_10_1 + (T52*dNdx6)
        A_10_2 = A_10_2 + (T53*dNdx6)
        A_11_0 = A_11_0 + (dNdy6*sc0)
        A_11_1 = A_11_1 + (T52*dNdy6)
        A_11_2 = A_11_2 + (T53*dNdy6)
        A_12_0 = A_12_0 + (dNdx7*sc0)
        A_12_1 = A_12_1 + (T52*dNdx7)
        A_12_2 = A_12_2 + (T53*dNdx7)
        A_13_0 = A_13_0 + (dNdy7*sc0)
        A_13_1 = A_13_1 + (T52*dNdy7)
        A_13_2 = A_13_2 + (T53*dNdy7)
        A_14_0 = A_14_0 + (dNdx8*sc0)
        A_14_1 = A_14_1 + (T52*dNdx8)
        A_14_2 = A_14_2 + (T53*dNdx8)
        A_15_0 = A_15_0 + (dNdy8*sc0)
        A_15_1 = A_15_1 + (T52*dNdy8)
        A_15_2 = A_15_2 + (T53*dNdy8)
        H_0_0 = H_0_0 + (s54)
        H_0_1 = H_0_1 + (T55)
        H_0_2 = H_0_2 + (T56)
        H_1_1 = H_1_1 + (T55*xi)
        H_1_2 = H_1_2 + (T56*xi)
        H_2_2 = H_2_2 + (T56*eta)
      end block
    end do
    ! static condensation of the internal unknowns
    cid0 = 1.0_dp/H_0_0
    cL1_0 = H_0_1*cid0
    cL2_0 = H_0_2*cid0
    cd1 = H_1_1 - H_0_0*cL1_0*cL1_0
    cid1 = 1.0_dp/cd1
    cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0)
    cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1
    cid2 = 1.0_dp/cd2
    cb0 = -A_0_0*u1 - A_10_0*u11 - A_11_0*u12 - A_12_0*u13 - A_13_0*u14 - A_14_0*u15 - A_15_0*u16 &
        - A_1_0*u2 - A_2_0*u3 - A_3_0*u4 - A_4_0*u5 - A_5_0*u6 - A_6_0*u7 - A_7_0*u8 - A_8_0*u9 &
        - A_9_0*u10
    cb1 = -A_0_1*u1 - A_10_1*u11 - A_11_1*u12 - A_12_1*u13 - A_13_1*u14 - A_14_1*u15 - A_15_1*u16 &
        - A_1_1*u2 - A_2_1*u3 - A_3_1*u4 - A_4_1*u5 - A_5_1*u6 - A_6_1*u7 - A_7_1*u8 - A_8_1*u9 &
        - A_9_1*u10
    cb2 = -A_0_2*u1 - A_10_2*u11 - A_11_2*u12 - A_12_2*u13 - A_13_2*u14 - A_14_2*u15 - A_15_2*u16 &
        - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6 - A_6_2*u7 - A_7_2*u8 - A_8_2*u9 &
        - A_9_2*u10
    cy1_0 = cb1 - cL1_0*cb0
    cy2_0 = cb2 - cL2_0*cb0 - cL2_1*cy1_0
    alpha3 = cid2*cy2_0
    alpha2 = cid1*cy1_0 - alpha3*cL2_1
    alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha3*cL2_0
    block   ! gauss-3x3 point 1 of 9: xi = -0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8
      real(dp) :: dNdy8, q2, q3, q4, eps57, eps58, eps59
      q0 = -0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 - 1.5491933384829668_dp*gx_2_0
      q1 = -0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -1.0309475019311125_dp*Ji00 - 1.0309475019311125_dp*Ji01
      dNdy1 = -1.0309475019311125_dp*Ji10 - 1.0309475019311125_dp*Ji11
      dNdx2 = -0.04364916731037084_dp*Ji01 - 0.3436491673103708_dp*Ji00
      dNdy2 = -0.04364916731037084_dp*Ji11 - 0.3436491673103708_dp*Ji10
      dNdx3 = -0.13094750193111254_dp*Ji00 - 0.13094750193111254_dp*Ji01
      dNdy3 = -0.13094750193111254_dp*Ji10 - 0.13094750193111254_dp*Ji11
      dNdx4 = -0.04364916731037084_dp*Ji00 - 0.3436491673103708_dp*Ji01
      dNdy4 = -0.04364916731037084_dp*Ji10 - 0.3436491673103708_dp*Ji11
      dNdx5 = -0.2_dp*Ji01 + 1.3745966692414833_dp*Ji00
      dNdy5 = -0.2_dp*Ji11 + 1.3745966692414833_dp*Ji10
      dNdx6 = 0.2_dp*Ji00 + 0.17459666924148337_dp*Ji01
      dNdy6 = 0.2_dp*Ji10 + 0.17459666924148337_dp*Ji11
      dNdx7 = 0.2_dp*Ji01 + 0.17459666924148337_dp*Ji00
      dNdy7 = 0.2_dp*Ji11 + 0.17459666924148337_dp*Ji10
      dNdx8 = -0.2_dp*Ji00 + 1.3745966692414833_dp*Ji01
      dNdy8 = -0.2_dp*Ji10 + 1.3745966692414833_dp*Ji11
      q2 = alpha1*m4
      q3 = -0.3872983346207417_dp*alpha2*m5
      q4 = -0.3872983346207417_dp*alpha3*m5
      eps57 = q2 + q3 + q4 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q2 + q3 + q4 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 1) = eps57
      strain(2, 1) = eps58
      strain(3, 1) = eps59
      stress(1, 1) = eps57*m6 + eps58*m7
      stress(2, 1) = eps57*m7 + eps58*m6
      stress(3, 1) = eps59*m8
    end block
    block   ! gauss-3x3 point 2 of 9: xi = 0, eta = -0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, q0, dNdx1, q1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, q2, dNdx6, q3, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, q4, q5, eps57, eps58, eps59
      J00 = gx_1_0 + 0.6_dp*gx_1_2 - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 + 0.6_dp*gy_1_2 - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      q0 = -0.3872983346207417_dp*Ji01
      dNdx1 = q0 - 0.3436491673103708_dp*Ji00
      q1 = -0.3872983346207417_dp*Ji11
      dNdy1 = q1 - 0.3436491673103708_dp*Ji10
      dNdx2 = q0 + 0.3436491673103708_dp*Ji00
      dNdy2 = q1 + 0.3436491673103708_dp*Ji10
      dNdx3 = q0 - 0.04364916731037084_dp*Ji00
      dNdy3 = q1 - 0.04364916731037084_dp*Ji10
      dNdx4 = q0 + 0.04364916731037084_dp*Ji00
      dNdy4 = q1 + 0.04364916731037084_dp*Ji10
      dNdx5 = -0.5_dp*Ji01
      dNdy5 = -0.5_dp*Ji11
      q2 = 0.7745966692414834_dp*Ji01
      dNdx6 = q2 + 0.2_dp*Ji00
      q3 = 0.7745966692414834_dp*Ji11
      dNdy6 = q3 + 0.2_dp*Ji10
      dNdx7 = 0.5_dp*Ji01
      dNdy7 = 0.5_dp*Ji11
      dNdx8 = q2 - 0.2_dp*Ji00
      dNdy8 = q3 - 0.2_dp*Ji10
      q4 = alpha1*m4
      q5 = -0.3872983346207417_dp*alpha3*m5
      eps57 = q4 + q5 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q4 + q5 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 2) = eps57
      strain(2, 2) = eps58
      strain(3, 2) = eps59
      stress(1, 2) = eps57*m6 + eps58*m7
      stress(2, 2) = eps57*m7 + eps58*m6
      stress(3, 2) = eps59*m8
    end block
    block   ! gauss-3x3 point 3 of 9: xi = 0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: q0, q1, q2, eps57, eps58, eps59
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 1.5491933384829668_dp*gx_2_0 &
          - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 1.5491933384829668_dp*gy_2_0 &
          - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1 &
          - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1 &
          - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.3436491673103708_dp*Ji00 - 0.04364916731037084_dp*Ji01
      dNdy1 = 0.3436491673103708_dp*Ji10 - 0.04364916731037084_dp*Ji11
      dNdx2 = 1.0309475019311125_dp*Ji00 - 1.0309475019311125_dp*Ji01
      dNdy2 = 1.0309475019311125_dp*Ji10 - 1.0309475019311125_dp*Ji11
      dNdx3 = 0.04364916731037084_dp*Ji00 - 0.3436491673103708_dp*Ji01
      dNdy3 = 0.04364916731037084_dp*Ji10 - 0.3436491673103708_dp*Ji11
      dNdx4 = 0.13094750193111254_dp*Ji00 - 0.13094750193111254_dp*Ji01
      dNdy4 = 0.13094750193111254_dp*Ji10 - 0.13094750193111254_dp*Ji11
      dNdx5 = -0.2_dp*Ji01 - 1.3745966692414833_dp*Ji00
      dNdy5 = -0.2_dp*Ji11 - 1.3745966692414833_dp*Ji10
      dNdx6 = 0.2_dp*Ji00 + 1.3745966692414833_dp*Ji01
      dNdy6 = 0.2_dp*Ji10 + 1.3745966692414833_dp*Ji11
      dNdx7 = 0.2_dp*Ji01 - 0.17459666924148337_dp*Ji00
      dNdy7 = 0.2_dp*Ji11 - 0.17459666924148337_dp*Ji10
      dNdx8 = -0.2_dp*Ji00 + 0.17459666924148337_dp*Ji01
      dNdy8 = -0.2_dp*Ji10 + 0.17459666924148337_dp*Ji11
      q0 = alpha1*m4
      q1 = 0.3872983346207417_dp*alpha2*m5
      q2 = -0.3872983346207417_dp*alpha3*m5
      eps57 = q0 + q1 + q2 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q0 + q1 + q2 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 3) = eps57
      strain(2, 3) = eps58
      strain(3, 3) = eps59
      stress(1, 3) = eps57*m6 + eps58*m7
      stress(2, 3) = eps57*m7 + eps58*m6
      stress(3, 3) = eps59*m8
    end block
    block   ! gauss-3x3 point 4 of 9: xi = -0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, q0, dNdx1, q1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, q2, dNdx5, q3, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, q4, q5, eps57, eps58, eps59
      J00 = gx_1_0 - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + 0.6_dp*gx_2_1 - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 + 0.6_dp*gy_2_1 - 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      q0 = -0.3872983346207417_dp*Ji00
      dNdx1 = q0 - 0.3436491673103708_dp*Ji01
      q1 = -0.3872983346207417_dp*Ji10
      dNdy1 = q1 - 0.3436491673103708_dp*Ji11
      dNdx2 = q0 + 0.04364916731037084_dp*Ji01
      dNdy2 = q1 + 0.04364916731037084_dp*Ji11
      dNdx3 = q0 - 0.04364916731037084_dp*Ji01
      dNdy3 = q1 - 0.04364916731037084_dp*Ji11
      dNdx4 = q0 + 0.3436491673103708_dp*Ji01
      dNdy4 = q1 + 0.3436491673103708_dp*Ji11
      q2 = 0.7745966692414834_dp*Ji00
      dNdx5 = q2 - 0.2_dp*Ji01
      q3 = 0.7745966692414834_dp*Ji10
      dNdy5 = q3 - 0.2_dp*Ji11
      dNdx6 = 0.5_dp*Ji00
      dNdy6 = 0.5_dp*Ji10
      dNdx7 = q2 + 0.2_dp*Ji01
      dNdy7 = q3 + 0.2_dp*Ji11
      dNdx8 = -0.5_dp*Ji00
      dNdy8 = -0.5_dp*Ji10
      q4 = alpha1*m4
      q5 = -0.3872983346207417_dp*alpha2*m5
      eps57 = q4 + q5 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q4 + q5 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 4) = eps57
      strain(2, 4) = eps58
      strain(3, 4) = eps59
      stress(1, 4) = eps57*m6 + eps58*m7
      stress(2, 4) = eps57*m7 + eps58*m6
      stress(3, 4) = eps59*m8
    end block
    block   ! gauss-3x3 point 5 of 9: xi = 0, eta = 0, weight = 64/81
      real(dp) :: detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8
      real(dp) :: dNdy8, q0, eps57, eps58, eps59
      detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0
      idet = 1.0_dp/detJ
      Ji00 = gy_0_1*idet
      Ji01 = -gy_1_0*idet
      Ji10 = -gx_0_1*idet
      Ji11 = gx_1_0*idet
      dNdx5 = -0.5_dp*Ji01
      dNdy5 = -0.5_dp*Ji11
      dNdx6 = 0.5_dp*Ji00
      dNdy6 = 0.5_dp*Ji10
      dNdx7 = 0.5_dp*Ji01
      dNdy7 = 0.5_dp*Ji11
      dNdx8 = -0.5_dp*Ji00
      dNdy8 = -0.5_dp*Ji10
      q0 = alpha1*m4
      eps57 = q0 + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q0 + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx5*u10 + dNdx6*u12 + dNdx7*u14 + dNdx8*u16 + dNdy5*u9 + dNdy6*u11 + dNdy7*u13 &
          + dNdy8*u15
      strain(1, 5) = eps57
      strain(2, 5) = eps58
      strain(3, 5) = eps59
      stress(1, 5) = eps57*m6 + eps58*m7
      stress(2, 5) = eps57*m7 + eps58*m6
      stress(3, 5) = eps59*m8
    end block
    block   ! gauss-3x3 point 6 of 9: xi = 0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, q0, dNdx1, q1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, q2, dNdx5, q3, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, q4, q5, eps57, eps58, eps59
      J00 = gx_1_0 + 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      q0 = 0.3872983346207417_dp*Ji00
      dNdx1 = q0 + 0.04364916731037084_dp*Ji01
      q1 = 0.3872983346207417_dp*Ji10
      dNdy1 = q1 + 0.04364916731037084_dp*Ji11
      dNdx2 = q0 - 0.3436491673103708_dp*Ji01
      dNdy2 = q1 - 0.3436491673103708_dp*Ji11
      dNdx3 = q0 + 0.3436491673103708_dp*Ji01
      dNdy3 = q1 + 0.3436491673103708_dp*Ji11
      dNdx4 = q0 - 0.04364916731037084_dp*Ji01
      dNdy4 = q1 - 0.04364916731037084_dp*Ji11
      q2 = -0.7745966692414834_dp*Ji00
      dNdx5 = q2 - 0.2_dp*Ji01
      q3 = -0.7745966692414834_dp*Ji10
      dNdy5 = q3 - 0.2_dp*Ji11
      dNdx6 = 0.5_dp*Ji00
      dNdy6 = 0.5_dp*Ji10
      dNdx7 = q2 + 0.2_dp*Ji01
      dNdy7 = q3 + 0.2_dp*Ji11
      dNdx8 = -0.5_dp*Ji00
      dNdy8 = -0.5_dp*Ji10
      q4 = alpha1*m4
      q5 = 0.3872983346207417_dp*alpha2*m5
      eps57 = q4 + q5 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q4 + q5 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 6) = eps57
      strain(2, 6) = eps58
      strain(3, 6) = eps59
      stress(1, 6) = eps57*m6 + eps58*m7
      stress(2, 6) = eps57*m7 + eps58*m6
      stress(3, 6) = eps59*m8
    end block
    block   ! gauss-3x3 point 7 of 9: xi = -0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: q0, q1, q2, eps57, eps58, eps59
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 0.7745966692414834_dp*gx_1_1 &
          - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1 &
          - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 1.5491933384829668_dp*gx_0_2 &
          - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 1.5491933384829668_dp*gy_0_2 &
          - 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.3436491673103708_dp*Ji01 - 0.04364916731037084_dp*Ji00
      dNdy1 = 0.3436491673103708_dp*Ji11 - 0.04364916731037084_dp*Ji10
      dNdx2 = 0.13094750193111254_dp*Ji01 - 0.13094750193111254_dp*Ji00
      dNdy2 = 0.13094750193111254_dp*Ji11 - 0.13094750193111254_dp*Ji10
      dNdx3 = 0.04364916731037084_dp*Ji01 - 0.3436491673103708_dp*Ji00
      dNdy3 = 0.04364916731037084_dp*Ji11 - 0.3436491673103708_dp*Ji10
      dNdx4 = 1.0309475019311125_dp*Ji01 - 1.0309475019311125_dp*Ji00
      dNdy4 = 1.0309475019311125_dp*Ji11 - 1.0309475019311125_dp*Ji10
      dNdx5 = -0.2_dp*Ji01 + 0.17459666924148337_dp*Ji00
      dNdy5 = -0.2_dp*Ji11 + 0.17459666924148337_dp*Ji10
      dNdx6 = 0.2_dp*Ji00 - 0.17459666924148337_dp*Ji01
      dNdy6 = 0.2_dp*Ji10 - 0.17459666924148337_dp*Ji11
      dNdx7 = 0.2_dp*Ji01 + 1.3745966692414833_dp*Ji00
      dNdy7 = 0.2_dp*Ji11 + 1.3745966692414833_dp*Ji10
      dNdx8 = -0.2_dp*Ji00 - 1.3745966692414833_dp*Ji01
      dNdy8 = -0.2_dp*Ji10 - 1.3745966692414833_dp*Ji11
      q0 = alpha1*m4
      q1 = 0.3872983346207417_dp*alpha3*m5
      q2 = -0.3872983346207417_dp*alpha2*m5
      eps57 = q0 + q1 + q2 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q0 + q1 + q2 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 7) = eps57
      strain(2, 7) = eps58
      strain(3, 7) = eps59
      stress(1, 7) = eps57*m6 + eps58*m7
      stress(2, 7) = eps57*m7 + eps58*m6
      stress(3, 7) = eps59*m8
    end block
    block   ! gauss-3x3 point 8 of 9: xi = 0, eta = 0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, q0, dNdx1, q1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, q2, dNdx6, q3, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, q4, q5, eps57, eps58, eps59
      J00 = gx_1_0 + 0.6_dp*gx_1_2 + 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      q0 = 0.3872983346207417_dp*Ji01
      dNdx1 = q0 + 0.04364916731037084_dp*Ji00
      q1 = 0.3872983346207417_dp*Ji11
      dNdy1 = q1 + 0.04364916731037084_dp*Ji10
      dNdx2 = q0 - 0.04364916731037084_dp*Ji00
      dNdy2 = q1 - 0.04364916731037084_dp*Ji10
      dNdx3 = q0 + 0.3436491673103708_dp*Ji00
      dNdy3 = q1 + 0.3436491673103708_dp*Ji10
      dNdx4 = q0 - 0.3436491673103708_dp*Ji00
      dNdy4 = q1 - 0.3436491673103708_dp*Ji10
      dNdx5 = -0.5_dp*Ji01
      dNdy5 = -0.5_dp*Ji11
      q2 = -0.7745966692414834_dp*Ji01
      dNdx6 = q2 + 0.2_dp*Ji00
      q3 = -0.7745966692414834_dp*Ji11
      dNdy6 = q3 + 0.2_dp*Ji10
      dNdx7 = 0.5_dp*Ji01
      dNdy7 = 0.5_dp*Ji11
      dNdx8 = q2 - 0.2_dp*Ji00
      dNdy8 = q3 - 0.2_dp*Ji10
      q4 = alpha1*m4
      q5 = 0.3872983346207417_dp*alpha3*m5
      eps57 = q4 + q5 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q4 + q5 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 8) = eps57
      strain(2, 8) = eps58
      strain(3, 8) = eps59
      stress(1, 8) = eps57*m6 + eps58*m7
      stress(2, 8) = eps57*m7 + eps58*m6
      stress(3, 8) = eps59*m8
    end block
    block   ! gauss-3x3 point 9 of 9: xi = 0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: q0, J00, q1, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2
      real(dp) :: dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8
      real(dp) :: dNdy8, q2, q3, q4, eps57, eps58, eps59
      q0 = 0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 + 1.5491933384829668_dp*gx_2_0
      q1 = 0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q1 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q1 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.13094750193111254_dp*Ji00 + 0.13094750193111254_dp*Ji01
      dNdy1 = 0.13094750193111254_dp*Ji10 + 0.13094750193111254_dp*Ji11
      dNdx2 = 0.04364916731037084_dp*Ji00 + 0.3436491673103708_dp*Ji01
      dNdy2 = 0.04364916731037084_dp*Ji10 + 0.3436491673103708_dp*Ji11
      dNdx3 = 1.0309475019311125_dp*Ji00 + 1.0309475019311125_dp*Ji01
      dNdy3 = 1.0309475019311125_dp*Ji10 + 1.0309475019311125_dp*Ji11
      dNdx4 = 0.04364916731037084_dp*Ji01 + 0.3436491673103708_dp*Ji00
      dNdy4 = 0.04364916731037084_dp*Ji11 + 0.3436491673103708_dp*Ji10
      dNdx5 = -0.2_dp*Ji01 - 0.17459666924148337_dp*Ji00
      dNdy5 = -0.2_dp*Ji11 - 0.17459666924148337_dp*Ji10
      dNdx6 = 0.2_dp*Ji00 - 1.3745966692414833_dp*Ji01
      dNdy6 = 0.2_dp*Ji10 - 1.3745966692414833_dp*Ji11
      dNdx7 = 0.2_dp*Ji01 - 1.3745966692414833_dp*Ji00
      dNdy7 = 0.2_dp*Ji11 - 1.3745966692414833_dp*Ji10
      dNdx8 = -0.2_dp*Ji00 - 0.17459666924148337_dp*Ji01
      dNdy8 = -0.2_dp*Ji10 - 0.17459666924148337_dp*Ji11
      q2 = alpha1*m4
      q3 = 0.3872983346207417_dp*alpha2*m5
      q4 = 0.3872983346207417_dp*alpha3*m5
      eps57 = q2 + q3 + q4 + 0.5_dp*dNdx1*u1 + 0.5_dp*dNdx2*u3 + 0.5_dp*dNdx3*u5 + 0.5_dp*dNdx4*u7 &
          + 0.5_dp*dNdx5*u9 + 0.5_dp*dNdx6*u11 + 0.5_dp*dNdx7*u13 + 0.5_dp*dNdx8*u15 &
          - 0.5_dp*dNdy1*u2 - 0.5_dp*dNdy2*u4 - 0.5_dp*dNdy3*u6 - 0.5_dp*dNdy4*u8 &
          - 0.5_dp*dNdy5*u10 - 0.5_dp*dNdy6*u12 - 0.5_dp*dNdy7*u14 - 0.5_dp*dNdy8*u16
      eps58 = q2 + q3 + q4 + 0.5_dp*dNdy1*u2 + 0.5_dp*dNdy2*u4 + 0.5_dp*dNdy3*u6 + 0.5_dp*dNdy4*u8 &
          + 0.5_dp*dNdy5*u10 + 0.5_dp*dNdy6*u12 + 0.5_dp*dNdy7*u14 + 0.5_dp*dNdy8*u16 &
          - 0.5_dp*dNdx1*u1 - 0.5_dp*dNdx2*u3 - 0.5_dp*dNdx3*u5 - 0.5_dp*dNdx4*u7 &
          - 0.5_dp*dNdx5*u9 - 0.5_dp*dNdx6*u11 - 0.5_dp*dNdx7*u13 - 0.5_dp*dNdx8*u15
      eps59 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11 &
          + dNdy7*u13 + dNdy8*u15
      strain(1, 9) = eps57
      strain(2, 9) = eps58
      strain(3, 9) = eps59
      stress(1, 9) = eps57*m6 + eps58*m7
      stress(2, 9) = eps57*m7 + eps58*m6
      stress(3, 9) = eps59*m8
    end block
  end subroutine q8_bbar_plane_stress_recovery_one

  pure subroutine q8_bbar_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_q8_bbar_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 8, n), u(16, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 9, n)
    real(dp), intent(out) :: stress(3, 9, n)
    integer(c_long) :: iel
    do iel = 1, n
      call q8_bbar_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine q8_bbar_plane_stress_recovery

end module derive_q8_bbar_plane_stress
