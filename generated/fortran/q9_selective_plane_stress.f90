! derive generated kernel: Q9 selective plane-stress
!
! Caution: derive is a verification aid, not a design check. Defer to the governing local
! codes and to licensed engineering practice before relying on any result.
!
! element      Q9, 9 nodes, 18 DOFs interleaved u1, v1, u2, v2, ...
! formulation  selective integration: volumetric part of D with the reduced rule [Doherty, Wilson
!              & Taylor (1969); Hughes (1987) Sec. 4.4]
! integration  B^T D_dev B: gauss-3x3 (9 points); B^T D_vol B (reduced rule): gauss-2x2 (4 points)
! flops        stiffness 9659, validity 408, recovery 1403 per element (add, mul, div, sqrt)
!
! arguments (units-agnostic; any consistent set of units):
!   xy      nodal coordinates, shape (n, 9, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
!           node i+1 (counter-clockwise corners first, then mid-side, then interior)
!   E       Young's modulus (> 0), scalar
!   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
!   t       thickness t (the out-of-plane thickness)
!   u       nodal displacements for recovery, shape (n, 18), interleaved u1, v1, u2, v2, ...
!   K       stiffness, shape (n, 18, 18), DOFs interleaved u1, v1, u2, v2, ...; symmetric
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
!              derive kernel Q9 --variant selective --state plane-stress --lang fortran
!
! Fortran 2008.  Compile e.g. with: gfortran -O3 -march=native -c q9_selective_plane_stress.f90
! (on x86 add -mprefer-vector-width=512 for the batch routine's lane loop, and
! -fno-tree-slp-vectorize: same speed, much shorter compile times).
! Every procedure is bind(C) (callable from C or Python through ctypes/cffi); the link
! names end in _f so they never clash with the C kernels of the same element.
! Array layout: Fortran column-major xy(2, 9, n) is the same memory as C xy[n][9][2];
! K(ndof, ndof, n) is symmetric, so both orders agree; strain(nstrain, npoints, n).
module derive_q9_selective_plane_stress
  use, intrinsic :: iso_c_binding, only: c_double, c_long
  implicit none
  private
  integer, parameter :: dp = c_double
  public :: q9_selective_plane_stress_stiffness, q9_selective_plane_stress_stiffness_batch, &
            q9_selective_plane_stress_validity, q9_selective_plane_stress_recovery

contains

  pure subroutine q9_selective_plane_stress_stiffness(xy, E, nu, t, K) &
      bind(C, name="derive_q9_selective_plane_stress_stiffness_f")
    real(dp), intent(in) :: xy(2, 9)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(18, 18)
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
    ! c3 = 2*eta^2*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c3(9) = [-0.9295160030897801_dp, 0.0_dp, 0.9295160030897801_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, -0.9295160030897801_dp, 0.0_dp, 0.9295160030897801_dp]
    ! c4 = 2*eta at the points of gauss-3x3
    real(dp), parameter :: KS0_c4(9) = [-1.5491933384829668_dp, -1.5491933384829668_dp, &
        -1.5491933384829668_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.5491933384829668_dp, &
        1.5491933384829668_dp, 1.5491933384829668_dp]
    ! c5 = xi^2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c5(9) = [0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, &
        0.0_dp, 0.6_dp]
    ! c6 = 2*eta*xi^2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c6(9) = [-0.9295160030897801_dp, 0.0_dp, -0.9295160030897801_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, 0.9295160030897801_dp, 0.0_dp, 0.9295160030897801_dp]
    ! c7 = eta^2*xi/2 - eta^2/4 - eta*xi/2 + eta/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c7(9) = [-0.8760281680828158_dp, -0.3436491673103708_dp, &
        0.18872983346207417_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.11127016653792583_dp, &
        0.04364916731037084_dp, -0.023971831917184144_dp]
    ! c8 = eta*xi^2/2 - eta*xi/2 - xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c8(9) = [-0.8760281680828158_dp, 0.0_dp, 0.11127016653792583_dp, &
        -0.3436491673103708_dp, 0.0_dp, 0.04364916731037084_dp, 0.18872983346207417_dp, 0.0_dp, &
        -0.023971831917184144_dp]
    ! c9 = eta^2*xi/2 + eta^2/4 - eta*xi/2 - eta/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c9(9) = [-0.18872983346207417_dp, 0.3436491673103708_dp, &
        0.8760281680828158_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.023971831917184144_dp, &
        -0.04364916731037084_dp, -0.11127016653792583_dp]
    ! c10 = eta*xi^2/2 + eta*xi/2 - xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c10(9) = [0.11127016653792583_dp, 0.0_dp, -0.8760281680828158_dp, &
        0.04364916731037084_dp, 0.0_dp, -0.3436491673103708_dp, -0.023971831917184144_dp, 0.0_dp, &
        0.18872983346207417_dp]
    ! c11 = eta^2*xi/2 + eta^2/4 + eta*xi/2 + eta/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c11(9) = [0.023971831917184144_dp, -0.04364916731037084_dp, &
        -0.11127016653792583_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.18872983346207417_dp, &
        0.3436491673103708_dp, 0.8760281680828158_dp]
    ! c12 = eta*xi^2/2 + eta*xi/2 + xi^2/4 + xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c12(9) = [0.023971831917184144_dp, 0.0_dp, &
        -0.18872983346207417_dp, -0.04364916731037084_dp, 0.0_dp, 0.3436491673103708_dp, &
        -0.11127016653792583_dp, 0.0_dp, 0.8760281680828158_dp]
    ! c13 = eta^2*xi/2 - eta^2/4 + eta*xi/2 - eta/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c13(9) = [0.11127016653792583_dp, 0.04364916731037084_dp, &
        -0.023971831917184144_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.8760281680828158_dp, &
        -0.3436491673103708_dp, 0.18872983346207417_dp]
    ! c14 = eta*xi^2/2 - eta*xi/2 + xi^2/4 - xi/4 at the points of gauss-3x3
    real(dp), parameter :: KS0_c14(9) = [-0.18872983346207417_dp, 0.0_dp, &
        0.023971831917184144_dp, 0.3436491673103708_dp, 0.0_dp, -0.04364916731037084_dp, &
        0.8760281680828158_dp, 0.0_dp, -0.11127016653792583_dp]
    ! c15 = -eta^2*xi + eta*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c15(9) = [1.06475800154489_dp, 0.0_dp, -1.06475800154489_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, -0.13524199845510998_dp, 0.0_dp, 0.13524199845510998_dp]
    ! c16 = -eta*xi^2 + eta + xi^2/2 - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c16(9) = [-0.5098386676965934_dp, -1.2745966692414834_dp, &
        -0.5098386676965934_dp, -0.2_dp, -0.5_dp, -0.2_dp, 0.10983866769659335_dp, &
        0.2745966692414834_dp, 0.10983866769659335_dp]
    ! c17 = -eta^2*xi - eta^2/2 + xi + 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c17(9) = [-0.10983866769659335_dp, 0.2_dp, 0.5098386676965934_dp, &
        -0.2745966692414834_dp, 0.5_dp, 1.2745966692414834_dp, -0.10983866769659335_dp, 0.2_dp, &
        0.5098386676965934_dp]
    ! c18 = -eta*xi^2 - eta*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c18(9) = [-0.13524199845510998_dp, 0.0_dp, 1.06475800154489_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, 0.13524199845510998_dp, 0.0_dp, -1.06475800154489_dp]
    ! c19 = -eta^2*xi - eta*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c19(9) = [-0.13524199845510998_dp, 0.0_dp, 0.13524199845510998_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, 1.06475800154489_dp, 0.0_dp, -1.06475800154489_dp]
    ! c20 = -eta*xi^2 + eta - xi^2/2 + 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c20(9) = [-0.10983866769659335_dp, -0.2745966692414834_dp, &
        -0.10983866769659335_dp, 0.2_dp, 0.5_dp, 0.2_dp, 0.5098386676965934_dp, &
        1.2745966692414834_dp, 0.5098386676965934_dp]
    ! c21 = -eta^2*xi + eta^2/2 + xi - 1/2 at the points of gauss-3x3
    real(dp), parameter :: KS0_c21(9) = [-0.5098386676965934_dp, -0.2_dp, 0.10983866769659335_dp, &
        -1.2745966692414834_dp, -0.5_dp, 0.2745966692414834_dp, -0.5098386676965934_dp, -0.2_dp, &
        0.10983866769659335_dp]
    ! c22 = -eta*xi^2 + eta*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c22(9) = [1.06475800154489_dp, 0.0_dp, -0.13524199845510998_dp, &
        0.0_dp, 0.0_dp, 0.0_dp, -1.06475800154489_dp, 0.0_dp, 0.13524199845510998_dp]
    ! c23 = 2*eta^2*xi - 2*xi at the points of gauss-3x3
    real(dp), parameter :: KS0_c23(9) = [0.6196773353931867_dp, 0.0_dp, -0.6196773353931867_dp, &
        1.5491933384829668_dp, 0.0_dp, -1.5491933384829668_dp, 0.6196773353931867_dp, 0.0_dp, &
        -0.6196773353931867_dp]
    ! c24 = 2*eta*xi^2 - 2*eta at the points of gauss-3x3
    real(dp), parameter :: KS0_c24(9) = [0.6196773353931867_dp, 1.5491933384829668_dp, &
        0.6196773353931867_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.6196773353931867_dp, &
        -1.5491933384829668_dp, -0.6196773353931867_dp]
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
    ! c0 = eta^2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c0(4) = [0.3333333333333333_dp, 0.3333333333333333_dp, &
        0.3333333333333333_dp, 0.3333333333333333_dp]
    ! c1 = 2*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c1(4) = [-1.1547005383792515_dp, 1.1547005383792515_dp, &
        -1.1547005383792515_dp, 1.1547005383792515_dp]
    ! c2 = 2*eta*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c2(4) = [0.6666666666666666_dp, -0.6666666666666666_dp, &
        -0.6666666666666666_dp, 0.6666666666666666_dp]
    ! c3 = 2*eta^2*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c3(4) = [-0.3849001794597505_dp, 0.3849001794597505_dp, &
        -0.3849001794597505_dp, 0.3849001794597505_dp]
    ! c4 = 2*eta at the points of gauss-2x2
    real(dp), parameter :: KS1_c4(4) = [-1.1547005383792515_dp, -1.1547005383792515_dp, &
        1.1547005383792515_dp, 1.1547005383792515_dp]
    ! c5 = xi^2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c5(4) = [0.3333333333333333_dp, 0.3333333333333333_dp, &
        0.3333333333333333_dp, 0.3333333333333333_dp]
    ! c6 = 2*eta*xi^2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c6(4) = [-0.3849001794597505_dp, -0.3849001794597505_dp, &
        0.3849001794597505_dp, 0.3849001794597505_dp]
    ! c7 = eta^2*xi/2 - eta^2/4 - eta*xi/2 + eta/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c7(4) = [-0.4905626121623441_dp, 0.03522081090086452_dp, &
        0.13144585576580214_dp, -0.009437387837655931_dp]
    ! c8 = eta*xi^2/2 - eta*xi/2 - xi^2/4 + xi/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c8(4) = [-0.4905626121623441_dp, 0.13144585576580214_dp, &
        0.03522081090086452_dp, -0.009437387837655931_dp]
    ! c9 = eta^2*xi/2 + eta^2/4 - eta*xi/2 - eta/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c9(4) = [-0.03522081090086452_dp, 0.4905626121623441_dp, &
        0.009437387837655931_dp, -0.13144585576580214_dp]
    ! c10 = eta*xi^2/2 + eta*xi/2 - xi^2/4 - xi/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c10(4) = [0.13144585576580214_dp, -0.4905626121623441_dp, &
        -0.009437387837655931_dp, 0.03522081090086452_dp]
    ! c11 = eta^2*xi/2 + eta^2/4 + eta*xi/2 + eta/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c11(4) = [0.009437387837655931_dp, -0.13144585576580214_dp, &
        -0.03522081090086452_dp, 0.4905626121623441_dp]
    ! c12 = eta*xi^2/2 + eta*xi/2 + xi^2/4 + xi/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c12(4) = [0.009437387837655931_dp, -0.03522081090086452_dp, &
        -0.13144585576580214_dp, 0.4905626121623441_dp]
    ! c13 = eta^2*xi/2 - eta^2/4 + eta*xi/2 - eta/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c13(4) = [0.13144585576580214_dp, -0.009437387837655931_dp, &
        -0.4905626121623441_dp, 0.03522081090086452_dp]
    ! c14 = eta*xi^2/2 - eta*xi/2 + xi^2/4 - xi/4 at the points of gauss-2x2
    real(dp), parameter :: KS1_c14(4) = [-0.03522081090086452_dp, 0.009437387837655931_dp, &
        0.4905626121623441_dp, -0.13144585576580214_dp]
    ! c15 = -eta^2*xi + eta*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c15(4) = [0.5257834230632086_dp, -0.5257834230632086_dp, &
        -0.14088324360345808_dp, 0.14088324360345808_dp]
    ! c16 = -eta*xi^2 + eta + xi^2/2 - 1/2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c16(4) = [-0.7182335127930839_dp, -0.7182335127930839_dp, &
        0.051566846126417175_dp, 0.051566846126417175_dp]
    ! c17 = -eta^2*xi - eta^2/2 + xi + 1/2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c17(4) = [-0.051566846126417175_dp, 0.7182335127930839_dp, &
        -0.051566846126417175_dp, 0.7182335127930839_dp]
    ! c18 = -eta*xi^2 - eta*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c18(4) = [-0.14088324360345808_dp, 0.5257834230632086_dp, &
        0.14088324360345808_dp, -0.5257834230632086_dp]
    ! c19 = -eta^2*xi - eta*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c19(4) = [-0.14088324360345808_dp, 0.14088324360345808_dp, &
        0.5257834230632086_dp, -0.5257834230632086_dp]
    ! c20 = -eta*xi^2 + eta - xi^2/2 + 1/2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c20(4) = [-0.051566846126417175_dp, -0.051566846126417175_dp, &
        0.7182335127930839_dp, 0.7182335127930839_dp]
    ! c21 = -eta^2*xi + eta^2/2 + xi - 1/2 at the points of gauss-2x2
    real(dp), parameter :: KS1_c21(4) = [-0.7182335127930839_dp, 0.051566846126417175_dp, &
        -0.7182335127930839_dp, 0.051566846126417175_dp]
    ! c22 = -eta*xi^2 + eta*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c22(4) = [0.5257834230632086_dp, -0.14088324360345808_dp, &
        -0.5257834230632086_dp, 0.14088324360345808_dp]
    ! c23 = 2*eta^2*xi - 2*xi at the points of gauss-2x2
    real(dp), parameter :: KS1_c23(4) = [0.769800358919501_dp, -0.769800358919501_dp, &
        0.769800358919501_dp, -0.769800358919501_dp]
    ! c24 = 2*eta*xi^2 - 2*eta at the points of gauss-2x2
    real(dp), parameter :: KS1_c24(4) = [0.769800358919501_dp, 0.769800358919501_dp, &
        -0.769800358919501_dp, -0.769800358919501_dp]
    ! eta = eta at the points of gauss-2x2
    real(dp), parameter :: KS1_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
        0.5773502691896257_dp, 0.5773502691896257_dp]
    ! w = the point weight at the points of gauss-2x2
    real(dp), parameter :: KS1_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
    ! xi = xi at the points of gauss-2x2
    real(dp), parameter :: KS1_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
        -0.5773502691896257_dp, 0.5773502691896257_dp]
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, x9, y9, m0, m1, m2
    real(dp) :: m3, gx_0_1, gx_0_2, gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gx_2_2, gy_0_1, gy_0_2
    real(dp) :: gy_1_0, gy_1_1, gy_1_2, gy_2_0, gy_2_1, gy_2_2, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4
    real(dp) :: K_0_5, K_0_6, K_0_7, K_0_8, K_0_9, K_0_10, K_0_11, K_0_12, K_0_13, K_0_14, K_0_15
    real(dp) :: K_0_16, K_0_17, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_1_6, K_1_7, K_1_8, K_1_9, K_1_10
    real(dp) :: K_1_11, K_1_12, K_1_13, K_1_14, K_1_15, K_1_16, K_1_17, K_2_2, K_2_3, K_2_4, K_2_5
    real(dp) :: K_2_6, K_2_7, K_2_8, K_2_9, K_2_10, K_2_11, K_2_12, K_2_13, K_2_14, K_2_15, K_2_16
    real(dp) :: K_2_17, K_3_3, K_3_4, K_3_5, K_3_6, K_3_7, K_3_8, K_3_9, K_3_10, K_3_11, K_3_12, K_3_13
    real(dp) :: K_3_14, K_3_15, K_3_16, K_3_17, K_4_4, K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11
    real(dp) :: K_4_12, K_4_13, K_4_14, K_4_15, K_4_16, K_4_17, K_5_5, K_5_6, K_5_7, K_5_8, K_5_9
    real(dp) :: K_5_10, K_5_11, K_5_12, K_5_13, K_5_14, K_5_15, K_5_16, K_5_17, K_6_6, K_6_7, K_6_8
    real(dp) :: K_6_9, K_6_10, K_6_11, K_6_12, K_6_13, K_6_14, K_6_15, K_6_16, K_6_17, K_7_7, K_7_8
    real(dp) :: K_7_9, K_7_10, K_7_11, K_7_12, K_7_13, K_7_14, K_7_15, K_7_16, K_7_17, K_8_8, K_8_9
    real(dp) :: K_8_10, K_8_11, K_8_12, K_8_13, K_8_14, K_8_15, K_8_16, K_8_17, K_9_9, K_9_10, K_9_11
    real(dp) :: K_9_12, K_9_13, K_9_14, K_9_15, K_9_16, K_9_17, K_10_10, K_10_11, K_10_12, K_10_13
    real(dp) :: K_10_14, K_10_15, K_10_16, K_10_17, K_11_11, K_11_12, K_11_13, K_11_14, K_11_15, K_11_16
    real(dp) :: K_11_17, K_12_12, K_12_13, K_12_14, K_12_15, K_12_16, K_12_17, K_13_13, K_13_14, K_13_15
    real(dp) :: K_13_16, K_13_17, K_14_14, K_14_15, K_14_16, K_14_17, K_15_15, K_15_16, K_15_17, K_16_16
    real(dp) :: K_16_17, K_17_17
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
    x9 = xy(1, 9)
    y9 = xy(2, 9)
    m0 = 2.0_dp*E/(3.0_dp + 3.0_dp*nu)
    m1 = -E/(3.0_dp + 3.0_dp*nu)
    m2 = E/(2.0_dp + 2.0_dp*nu)
    m3 = (-E - 2.0_dp*E*nu)/(-3.0_dp + 3.0_dp*nu*nu)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = 0.5_dp*x5 + 0.5_dp*x7 - x9
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = 0.5_dp*x6 + 0.5_dp*x8 - x9
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_2 = x9 - 0.5_dp*x5 - 0.5_dp*x6 - 0.5_dp*x7 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 &
        + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = 0.5_dp*y5 + 0.5_dp*y7 - y9
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = 0.5_dp*y6 + 0.5_dp*y8 - y9
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_2 = y9 - 0.5_dp*y5 - 0.5_dp*y6 - 0.5_dp*y7 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 &
        + 0.25_dp*y3 + 0.25_dp*y4
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
    K_0_16 = 0.0_dp
    K_0_17 = 0.0_dp
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
    K_1_16 = 0.0_dp
    K_1_17 = 0.0_dp
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
    K_2_16 = 0.0_dp
    K_2_17 = 0.0_dp
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
    K_3_16 = 0.0_dp
    K_3_17 = 0.0_dp
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
    K_4_16 = 0.0_dp
    K_4_17 = 0.0_dp
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
    K_5_16 = 0.0_dp
    K_5_17 = 0.0_dp
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
    K_6_16 = 0.0_dp
    K_6_17 = 0.0_dp
    K_7_7 = 0.0_dp
    K_7_8 = 0.0_dp
    K_7_9 = 0.0_dp
    K_7_10 = 0.0_dp
    K_7_11 = 0.0_dp
    K_7_12 = 0.0_dp
    K_7_13 = 0.0_dp
    K_7_14 = 0.0_dp
    K_7_15 = 0.0_dp
    K_7_16 = 0.0_dp
    K_7_17 = 0.0_dp
    K_8_8 = 0.0_dp
    K_8_9 = 0.0_dp
    K_8_10 = 0.0_dp
    K_8_11 = 0.0_dp
    K_8_12 = 0.0_dp
    K_8_13 = 0.0_dp
    K_8_14 = 0.0_dp
    K_8_15 = 0.0_dp
    K_8_16 = 0.0_dp
    K_8_17 = 0.0_dp
    K_9_9 = 0.0_dp
    K_9_10 = 0.0_dp
    K_9_11 = 0.0_dp
    K_9_12 = 0.0_dp
    K_9_13 = 0.0_dp
    K_9_14 = 0.0_dp
    K_9_15 = 0.0_dp
    K_9_16 = 0.0_dp
    K_9_17 = 0.0_dp
    K_10_10 = 0.0_dp
    K_10_11 = 0.0_dp
    K_10_12 = 0.0_dp
    K_10_13 = 0.0_dp
    K_10_14 = 0.0_dp
    K_10_15 = 0.0_dp
    K_10_16 = 0.0_dp
    K_10_17 = 0.0_dp
    K_11_11 = 0.0_dp
    K_11_12 = 0.0_dp
    K_11_13 = 0.0_dp
    K_11_14 = 0.0_dp
    K_11_15 = 0.0_dp
    K_11_16 = 0.0_dp
    K_11_17 = 0.0_dp
    K_12_12 = 0.0_dp
    K_12_13 = 0.0_dp
    K_12_14 = 0.0_dp
    K_12_15 = 0.0_dp
    K_12_16 = 0.0_dp
    K_12_17 = 0.0_dp
    K_13_13 = 0.0_dp
    K_13_14 = 0.0_dp
    K_13_15 = 0.0_dp
    K_13_16 = 0.0_dp
    K_13_17 = 0.0_dp
    K_14_14 = 0.0_dp
    K_14_15 = 0.0_dp
    K_14_16 = 0.0_dp
    K_14_17 = 0.0_dp
    K_15_15 = 0.0_dp
    K_15_16 = 0.0_dp
    K_15_17 = 0.0_dp
    K_16_16 = 0.0_dp
    K_16_17 = 0.0_dp
    K_17_17 = 0.0_dp
    do p = 1, 9   ! gauss-3x3: loop over the 9 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
        real(dp) :: c19, c20, c21, c22, c23, c24, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
        real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6
        real(dp) :: dNdy6, dNdx7, dNdy7, dNdx8, dNdy8, dNdx9, dNdy9, sc0, s1, s2, s3, T4, T6, T7, T8, T9
        real(dp) :: T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22, T23, T24, T25, T26
        real(dp) :: T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37, T38, T39, T40, T41, T42, T43
        real(dp) :: T44, T45, T46, T47, T48, T49, T50, T51, T52, T53, T54, T55, T56, T57
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
        c21 = KS0_c21(p)
        c22 = KS0_c22(p)
        c23 = KS0_c23(p)
        c24 = KS0_c24(p)
        eta = KS0_eta(p)
        w = KS0_w(p)
        xi = KS0_xi(p)
        J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + c3*gx_2_2 + eta*gx_1_1
        J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + c3*gy_2_2 + eta*gy_1_1
        J10 = gx_0_1 + c2*gx_1_2 + c4*gx_0_2 + c5*gx_2_1 + c6*gx_2_2 + gx_1_1*xi
        J11 = gy_0_1 + c2*gy_1_2 + c4*gy_0_2 + c5*gy_2_1 + c6*gy_2_2 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
        Ji00 = J11*idet
        Ji01 = -J01*idet
        Ji10 = -J10*idet
        Ji11 = J00*idet
        dNdx1 = Ji00*c7 + Ji01*c8
        dNdy1 = Ji10*c7 + Ji11*c8
        dNdx2 = Ji00*c9 + Ji01*c10
        dNdy2 = Ji10*c9 + Ji11*c10
        dNdx3 = Ji00*c11 + Ji01*c12
        dNdy3 = Ji10*c11 + Ji11*c12
        dNdx4 = Ji00*c13 + Ji01*c14
        dNdy4 = Ji10*c13 + Ji11*c14
        dNdx5 = Ji00*c15 + Ji01*c16
        dNdy5 = Ji10*c15 + Ji11*c16
        dNdx6 = Ji00*c17 + Ji01*c18
        dNdy6 = Ji10*c17 + Ji11*c18
        dNdx7 = Ji00*c19 + Ji01*c20
        dNdy7 = Ji10*c19 + Ji11*c20
        dNdx8 = Ji00*c21 + Ji01*c22
        dNdy8 = Ji10*c21 + Ji11*c22
        dNdx9 = Ji00*c23 + Ji01*c24
        dNdy9 = Ji10*c23 + Ji11*c24
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
        T52 = dNdx9*s1
        T53 = dNdx9*s2
        T54 = dNdy9*s3
        T55 = dNdy9*s2
        T56 = dNdy9*s1
        T57 = dNdx9*s3
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
        K_0_16 = K_0_16 + (T52*dNdx1 + T54*dNdy1)
        K_0_17 = K_0_17 + (T55*dNdx1 + T57*dNdy1)
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
        K_1_16 = K_1_16 + (T53*dNdy1 + T54*dNdx1)
        K_1_17 = K_1_17 + (T56*dNdy1 + T57*dNdx1)
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
        K_2_16 = K_2_16 + (T52*dNdx2 + T54*dNdy2)
        K_2_17 = K_2_17 + (T55*dNdx2 + T57*dNdy2)
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
        K_3_16 = K_3_16 + (T53*dNdy2 + T54*dNdx2)
        K_3_17 = K_3_17 + (T56*dNdy2 + T57*dNdx2)
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
        K_4_16 = K_4_16 + (T52*dNdx3 + T54*dNdy3)
        K_4_17 = K_4_17 + (T55*dNdx3 + T57*dNdy3)
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
        K_5_16 = K_5_16 + (T53*dNdy3 + T54*dNdx3)
        K_5_17 = K_5_17 + (T56*dNdy3 + T57*dNdx3)
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
        K_6_16 = K_6_16 + (T52*dNdx4 + T54*dNdy4)
        K_6_17 = K_6_17 + (T55*dNdx4 + T57*dNdy4)
        K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
        K_7_8 = K_7_8 + (T29*dNdy4 + T30*dNdx4)
        K_7_9 = K_7_9 + (T32*dNdy4 + T33*dNdx4)
        K_7_10 = K_7_10 + (T35*dNdy4 + T36*dNdx4)
        K_7_11 = K_7_11 + (T38*dNdy4 + T39*dNdx4)
        K_7_12 = K_7_12 + (T41*dNdy4 + T42*dNdx4)
        K_7_13 = K_7_13 + (T44*dNdy4 + T45*dNdx4)
        K_7_14 = K_7_14 + (T47*dNdy4 + T48*dNdx4)
        K_7_15 = K_7_15 + (T50*dNdy4 + T51*dNdx4)
        K_7_16 = K_7_16 + (T53*dNdy4 + T54*dNdx4)
        K_7_17 = K_7_17 + (T56*dNdy4 + T57*dNdx4)
        K_8_8 = K_8_8 + (T28*dNdx5 + T30*dNdy5)
        K_8_9 = K_8_9 + (T31*dNdx5 + T33*dNdy5)
        K_8_10 = K_8_10 + (T34*dNdx5 + T36*dNdy5)
        K_8_11 = K_8_11 + (T37*dNdx5 + T39*dNdy5)
        K_8_12 = K_8_12 + (T40*dNdx5 + T42*dNdy5)
        K_8_13 = K_8_13 + (T43*dNdx5 + T45*dNdy5)
        K_8_14 = K_8_14 + (T46*dNdx5 + T48*dNdy5)
        K_8_15 = K_8_15 + (T49*dNdx5 + T51*dNdy5)
        K_8_16 = K_8_16 + (T52*dNdx5 + T54*dNdy5)
        K_8_17 = K_8_17 + (T55*dNdx5 + T57*dNdy5)
        K_9_9 = K_9_9 + (T32*dNdy5 + T33*dNdx5)
        K_9_10 = K_9_10 + (T35*dNdy5 + T36*dNdx5)
        K_9_11 = K_9_11 + (T38*dNdy5 + T39*dNdx5)
        K_9_12 = K_9_12 + (T41*dNdy5 + T42*dNdx5)
        K_9_13 = K_9_13 + (T44*dNdy5 + T45*dNdx5)
        K_9_14 = K_9_14 + (T47*dNdy5 + T48*dNdx5)
        K_9_15 = K_9_15 + (T50*dNdy5 + T51*dNdx5)
        K_9_16 = K_9_16 + (T53*dNdy5 + T54*dNdx5)
        K_9_17 = K_9_17 + (T56*dNdy5 + T57*dNdx5)
        K_10_10 = K_10_10 + (T34*dNdx6 + T36*dNdy6)
        K_10_11 = K_10_11 + (T37*dNdx6 + T39*dNdy6)
        K_10_12 = K_10_12 + (T40*dNdx6 + T42*dNdy6)
        K_10_13 = K_10_13 + (T43*dNdx6 + T45*dNdy6)
        K_10_14 = K_10_14 + (T46*dNdx6 + T48*dNdy6)
        K_10_15 = K_10_15 + (T49*dNdx6 + T51*dNdy6)
        K_10_16 = K_10_16 + (T52*dNdx6 + T54*dNdy6)
        K_10_17 = K_10_17 + (T55*dNdx6 + T57*dNdy6)
        K_11_11 = K_11_11 + (T38*dNdy6 + T39*dNdx6)
        K_11_12 = K_11_12 + (T41*dNdy6 + T42*dNdx6)
        K_11_13 = K_11_13 + (T44*dNdy6 + T45*dNdx6)
        K_11_14 = K_11_14 + (T47*dNdy6 + T48*dNdx6)
        K_11_15 = K_11_15 + (T50*dNdy6 + T51*dNdx6)
        K_11_16 = K_11_16 + (T53*dNdy6 + T54*dNdx6)
        K_11_17 = K_11_17 + (T56*dNdy6 + T57*dNdx6)
        K_12_12 = K_12_12 + (T40*dNdx7 + T42*dNdy7)
        K_12_13 = K_12_13 + (T43*dNdx7 + T45*dNdy7)
        K_12_14 = K_12_14 + (T46*dNdx7 + T48*dNdy7)
        K_12_15 = K_12_15 + (T49*dNdx7 + T51*dNdy7)
        K_12_16 = K_12_16 + (T52*dNdx7 + T54*dNdy7)
        K_12_17 = K_12_17 + (T55*dNdx7 + T57*dNdy7)
        K_13_13 = K_13_13 + (T44*dNdy7 + T45*dNdx7)
        K_13_14 = K_13_14 + (T47*dNdy7 + T48*dNdx7)
        K_13_15 = K_13_15 + (T50*dNdy7 + T51*dNdx7)
        K_13_16 = K_13_16 + (T53*dNdy7 + T54*dNdx7)
        K_13_17 = K_13_17 + (T56*dNdy7 + T57*dNdx7)
        K_14_14 = K_14_14 + (T46*dNdx8 + T48*dNdy8)
        K_14_15 = K_14_15 + (T49*dNdx8 + T51*dNdy8)
        K_14_16 = K_14_16 + (T52*dNdx8 + T54*dNdy8)
        K_14_17 = K_14_17 + (T55*dNdx8 + T57*dNdy8)
        K_15_15 = K_15_15 + (T50*dNdy8 + T51*dNdx8)
        K_15_16 = K_15_16 + (T53*dNdy8 + T54*dNdx8)
        K_15_17 = K_15_17 + (T56*dNdy8 + T57*dNdx8)
        K_16_16 = K_16_16 + (T52*dNdx9 + T54*dNdy9)
        K_16_17 = K_16_17 + (T55*dNdx9 + T57*dNdy9)
        K_17_17 = K_17_17 + (T56*dNdy9 + T57*dNdx9)
      end block
    end do
    do p = 1, 4   ! gauss-2x2: loop over the 4 points
      block
        real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
        real(dp) :: c19, c20, c21, c22, c23, c24, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
        real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6
        real(dp) :: dNdy6, dNdx7, dNdy7, dNdx8, dNdy8, dNdx9, dNdy9, sc58, s59, T60, T61, T62, T63, T64
        real(dp) :: T65, T66, T67, T68, T69, T70, T71, T72, T73, T74, T75, T76, T77
        c0 = KS1_c0(p)
        c1 = KS1_c1(p)
        c2 = KS1_c2(p)
        c3 = KS1_c3(p)
        c4 = KS1_c4(p)
        c5 = KS1_c5(p)
        c6 = KS1_c6(p)
        c7 = KS1_c7(p)
        c8 = KS1_c8(p)
        c9 = KS1_c9(p)
        c10 = KS1_c10(p)
        c11 = KS1_c11(p)
        c12 = KS1_c12(p)
        c13 = KS1_c13(p)
        c14 = KS1_c14(p)
        c15 = KS1_c15(p)
        c16 = KS1_c16(p)
        c17 = KS1_c17(p)
        c18 = KS1_c18(p)
        c19 = KS1_c19(p)
        c20 = KS1_c20(p)
        c21 = KS1_c21(p)
        c22 = KS1_c22(p)
        c23 = KS1_c23(p)
        c24 = KS1_c24(p)
        eta = KS1_eta(p)
        w = KS1_w(p)
        xi = KS1_xi(p)
        J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + c3*gx_2_2 + eta*gx_1_1
        J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + c3*gy_2_2 + eta*gy_1_1
        J10 = gx_0_1 + c2*gx_1_2 + c4*gx_0_2 + c5*gx_2_1 + c6*gx_2_2 + gx_1_1*xi
        J11 = gy_0_1 + c2*gy_1_2 + c4*gy_0_2 + c5*gy_2_1 + c6*gy_2_2 + gy_1_1*xi
        detJ = J00*J11 - J01*J10
        idet = 1.0_dp/detJ
        Ji00 = J11*idet
        Ji01 = -J01*idet
        Ji10 = -J10*idet
        Ji11 = J00*idet
        dNdx1 = Ji00*c7 + Ji01*c8
        dNdy1 = Ji10*c7 + Ji11*c8
        dNdx2 = Ji00*c9 + Ji01*c10
        dNdy2 = Ji10*c9 + Ji11*c10
        dNdx3 = Ji00*c11 + Ji01*c12
        dNdy3 = Ji10*c11 + Ji11*c12
        dNdx4 = Ji00*c13 + Ji01*c14
        dNdy4 = Ji10*c13 + Ji11*c14
        dNdx5 = Ji00*c15 + Ji01*c16
        dNdy5 = Ji10*c15 + Ji11*c16
        dNdx6 = Ji00*c17 + Ji01*c18
        dNdy6 = Ji10*c17 + Ji11*c18
        dNdx7 = Ji00*c19 + Ji01*c20
        dNdy7 = Ji10*c19 + Ji11*c20
        dNdx8 = Ji00*c21 + Ji01*c22
        dNdy8 = Ji10*c21 + Ji11*c22
        dNdx9 = Ji00*c23 + Ji01*c24
        dNdy9 = Ji10*c23 + Ji11*c24
        sc58 = detJ*t*w
        s59 = m3*sc58
        T60 = dNdx1*s59
        T61 = dNdy1*s59
        T62 = dNdx2*s59
        T63 = dNdy2*s59
        T64 = dNdx3*s59
        T65 = dNdy3*s59
        T66 = dNdx4*s59
        T67 = dNdy4*s59
        T68 = dNdx5*s59
        T69 = dNdy5*s59
        T70 = dNdx6*s59
        T71 = dNdy6*s59
        T72 = dNdx7*s59
        T73 = dNdy7*s59
        T74 = dNdx8*s59
        T75 = dNdy8*s59
        T76 = dNdx9*s59
        T77 = dNdy9*s59
        K_0_0 = K_0_0 + (T60*dNdx1)
        K_0_1 = K_0_1 + (T61*dNdx1)
        K_0_2 = K_0_2 + (T62*dNdx1)
        K_0_3 = K_0_3 + (T63*dNdx1)
        K_0_4 = K_0_4 + (T64*dNdx1)
        K_0_5 = K_0_5 + (T65*dNdx1)
        K_0_6 = K_0_6 + (T66*dNdx1)
        K_0_7 = K_0_7 + (T67*dNdx1)
        K_0_8 = K_0_8 + (T68*dNdx1)
        K_0_9 = K_0_9 + (T69*dNdx1)
        K_0_10 = K_0_10 + (T70*dNdx1)
        K_0_11 = K_0_11 + (T71*dNdx1)
        K_0_12 = K_0_12 + (T72*dNdx1)
        K_0_13 = K_0_13 + (T73*dNdx1)
        K_0_14 = K_0_14 + (T74*dNdx1)
        K_0_15 = K_0_15 + (T75*dNdx1)
        K_0_16 = K_0_16 + (T76*dNdx1)
        K_0_17 = K_0_17 + (T77*dNdx1)
        K_1_1 = K_1_1 + (T61*dNdy1)
        K_1_2 = K_1_2 + (T62*dNdy1)
        K_1_3 = K_1_3 + (T63*dNdy1)
        K_1_4 = K_1_4 + (T64*dNdy1)
        K_1_5 = K_1_5 + (T65*dNdy1)
        K_1_6 = K_1_6 + (T66*dNdy1)
        K_1_7 = K_1_7 + (T67*dNdy1)
        K_1_8 = K_1_8 + (T68*dNdy1)
        K_1_9 = K_1_9 + (T69*dNdy1)
        K_1_10 = K_1_10 + (T70*dNdy1)
        K_1_11 = K_1_11 + (T71*dNdy1)
        K_1_12 = K_1_12 + (T72*dNdy1)
        K_1_13 = K_1_13 + (T73*dNdy1)
        K_1_14 = K_1_14 + (T74*dNdy1)
        K_1_15 = K_1_15 + (T75*dNdy1)
        K_1_16 = K_1_16 + (T76*dNdy1)
        K_1_17 = K_1_17 + (T77*dNdy1)
        K_2_2 = K_2_2 + (T62*dNdx2)
        K_2_3 = K_2_3 + (T63*dNdx2)
        K_2_4 = K_2_4 + (T64*dNdx2)
        K_2_5 = K_2_5 + (T65*dNdx2)
        K_2_6 = K_2_6 + (T66*dNdx2)
        K_2_7 = K_2_7 + (T67*dNdx2)
        K_2_8 = K_2_8 + (T68*dNdx2)
        K_2_9 = K_2_9 + (T69*dNdx2)
        K_2_10 = K_2_10 + (T70*dNdx2)
        K_2_11 = K_2_11 + (T71*dNdx2)
        K_2_12 = K_2_12 + (T72*dNdx2)
        K_2_13 = K_2_13 + (T73*dNdx2)
        K_2_14 = K_2_14 + (T74*dNdx2)
        K_2_15 = K_2_15 + (T75*dNdx2)
        K_2_16 = K_2_16 + (T76*dNdx2)
        K_2_17 = K_2_17 + (T77*dNdx2)
        K_3_3 = K_3_3 + (T63*dNdy2)
        K_3_4 = K_3_4 + (T64*dNdy2)
        K_3_5 = K_3_5 + (T65*dNdy2)
        K_3_6 = K_3_6 + (T66*dNdy2)
        K_3_7 = K_3_7 + (T67*dNdy2)
        K_3_8 = K_3_8 + (T68*dNdy2)
        K_3_9 = K_3_9 + (T69*dNdy2)
        K_3_10 = K_3_10 + (T70*dNdy2)
        K_3_11 = K_3_11 + (T71*dNdy2)
        K_3_12 = K_3_12 + (T72*dNdy2)
        K_3_13 = K_3_13 + (T73*dNdy2)
        K_3_14 = K_3_14 + (T74*dNdy2)
        K_3_15 = K_3_15 + (T75*dNdy2)
        K_3_16 = K_3_16 + (T76*dNdy2)
        K_3_17 = K_3_17 + (T77*dNdy2)
        K_4_4 = K_4_4 + (T64*dNdx3)
        K_4_5 = K_4_5 + (T65*dNdx3)
        K_4_6 = K_4_6 + (T66*dNdx3)
        K_4_7 = K_4_7 + (T67*dNdx3)
        K_4_8 = K_4_8 + (T68*dNdx3)
        K_4_9 = K_4_9 + (T69*dNdx3)
        K_4_10 = K_4_10 + (T70*dNdx3)
        K_4_11 = K_4_11 + (T71*dNdx3)
        K_4_12 = K_4_12 + (T72*dNdx3)
        K_4_13 = K_4_13 + (T73*dNdx3)
        K_4_14 = K_4_14 + (T74*dNdx3)
        K_4_15 = K_4_15 + (T75*dNdx3)
        K_4_16 = K_4_16 + (T76*dNdx3)
        K_4_17 = K_4_17 + (T77*dNdx3)
        K_5_5 = K_5_5 + (T65*dNdy3)
        K_5_6 = K_5_6 + (T66*dNdy3)
        K_5_7 = K_5_7 + (T67*dNdy3)
        K_5_8 = K_5_8 + (T68*dNdy3)
        K_5_9 = K_5_9 + (T69*dNdy3)
        K_5_10 = K_5_10 + (T70*dNdy3)
        K_5_11 = K_5_11 + (T71*dNdy3)
        K_5_12 = K_5_12 + (T72*dNdy3)
        K_5_13 = K_5_13 + (T73*dNdy3)
        K_5_14 = K_5_14 + (T74*dNdy3)
        K_5_15 = K_5_15 + (T75*dNdy3)
        K_5_16 = K_5_16 + (T76*dNdy3)
        K_5_17 = K_5_17 + (T77*dNdy3)
        K_6_6 = K_6_6 + (T66*dNdx4)
        K_6_7 = K_6_7 + (T67*dNdx4)
        K_6_8 = K_6_8 + (T68*dNdx4)
        K_6_9 = K_6_9 + (T69*dNdx4)
        K_6_10 = K_6_10 + (T70*dNdx4)
        K_6_11 = K_6_11 + (T71*dNdx4)
        K_6_12 = K_6_12 + (T72*dNdx4)
        K_6_13 = K_6_13 + (T73*dNdx4)
        K_6_14 = K_6_14 + (T74*dNdx4)
        K_6_15 = K_6_15 + (T75*dNdx4)
        K_6_16 = K_6_16 + (T76*dNdx4)
        K_6_17 = K_6_17 + (T77*dNdx4)
        K_7_7 = K_7_7 + (T67*dNdy4)
        K_7_8 = K_7_8 + (T68*dNdy4)
        K_7_9 = K_7_9 + (T69*dNdy4)
        K_7_10 = K_7_10 + (T70*dNdy4)
        K_7_11 = K_7_11 + (T71*dNdy4)
        K_7_12 = K_7_12 + (T72*dNdy4)
        K_7_13 = K_7_13 + (T73*dNdy4)
        K_7_14 = K_7_14 + (T74*dNdy4)
        K_7_15 = K_7_15 + (T75*dNdy4)
        K_7_16 = K_7_16 + (T76*dNdy4)
        K_7_17 = K_7_17 + (T77*dNdy4)
        K_8_8 = K_8_8 + (T68*dNdx5)
        K_8_9 = K_8_9 + (T69*dNdx5)
        K_8_10 = K_8_10 + (T70*dNdx5)
        K_8_11 = K_8_11 + (T71*dNdx5)
        K_8_12 = K_8_12 + (T72*dNdx5)
        K_8_13 = K_8_13 + (T73*dNdx5)
        K_8_14 = K_8_14 + (T74*dNdx5)
        K_8_15 = K_8_15 + (T75*dNdx5)
        K_8_16 = K_8_16 + (T76*dNdx5)
        K_8_17 = K_8_17 + (T77*dNdx5)
        K_9_9 = K_9_9 + (T69*dNdy5)
        K_9_10 = K_9_10 + (T70*dNdy5)
        K_9_11 = K_9_11 + (T71*dNdy5)
        K_9_12 = K_9_12 + (T72*dNdy5)
        K_9_13 = K_9_13 + (T73*dNdy5)
        K_9_14 = K_9_14 + (T74*dNdy5)
        K_9_15 = K_9_15 + (T75*dNdy5)
        K_9_16 = K_9_16 + (T76*dNdy5)
        K_9_17 = K_9_17 + (T77*dNdy5)
        K_10_10 = K_10_10 + (T70*dNdx6)
        K_10_11 = K_10_11 + (T71*dNdx6)
        K_10_12 = K_10_12 + (T72*dNdx6)
        K_10_13 = K_10_13 + (T73*dNdx6)
        K_10_14 = K_10_14 + (T74*dNdx6)
        K_10_15 = K_10_15 + (T75*dNdx6)
        K_10_16 = K_10_16 + (T76*dNdx6)
        K_10_17 = K_10_17 + (T77*dNdx6)
        K_11_11 = K_11_11 + (T71*dNdy6)
        K_11_12 = K_11_12 + (T72*dNdy6)
        K_11_13 = K_11_13 + (T73*dNdy6)
        K_11_14 = K_11_14 + (T74*dNdy6)
        K_11_15 = K_11_15 + (T75*dNdy6)
        K_11_16 = K_11_16 + (T76*dNdy6)
        K_11_17 = K_11_17 + (T77*dNdy6)
        K_12_12 = K_12_12 + (T72*dNdx7)
        K_12_13 = K_12_13 + (T73*dNdx7)
        K_12_14 = K_12_14 + (T74*dNdx7)
        K_12_15 = K_12_15 + (T75*dNdx7)
        K_12_16 = K_12_16 + (T76*dNdx7)
        K_12_17 = K_12_17 + (T77*dNdx7)
        K_13_13 = K_13_13 + (T73*dNdy7)
        K_13_14 = K_13_14 + (T74*dNdy7)
        K_13_15 = K_13_15 + (T75*dNdy7)
        K_13_16 = K_13_16 + (T76*dNdy7)
        K_13_17 = K_13_17 + (T77*dNdy7)
        K_14_14 = K_14_14 + (T74*dNdx8)
        K_14_15 = K_14_15 + (T75*dNdx8)
        K_14_16 = K_14_16 + (T76*dNdx8)
        K_14_17 = K_14_17 + (T77*dNdx8)
        K_15_15 = K_15_15 + (T75*dNdy8)
        K_15_16 = K_15_16 + (T76*dNdy8)
        K_15_17 = K_15_17 + (T77*dNdy8)
        K_16_16 = K_16_16 + (T76*dNdx9)
        K_16_17 = K_16_17 + (T77*dNdx9)
        K_17_17 = K_17_17 + (T77*dNdy9)
      end block
    end do
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
    K(1, 13) = K_0_12
    K(1, 14) = K_0_13
    K(1, 15) = K_0_14
    K(1, 16) = K_0_15
    K(1, 17) = K_0_16
    K(1, 18) = K_0_17
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
    K(2, 13) = K_1_12
    K(2, 14) = K_1_13
    K(2, 15) = K_1_14
    K(2, 16) = K_1_15
    K(2, 17) = K_1_16
    K(2, 18) = K_1_17
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
    K(3, 13) = K_2_12
    K(3, 14) = K_2_13
    K(3, 15) = K_2_14
    K(3, 16) = K_2_15
    K(3, 17) = K_2_16
    K(3, 18) = K_2_17
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
    K(4, 13) = K_3_12
    K(4, 14) = K_3_13
    K(4, 15) = K_3_14
    K(4, 16) = K_3_15
    K(4, 17) = K_3_16
    K(4, 18) = K_3_17
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
    K(5, 13) = K_4_12
    K(5, 14) = K_4_13
    K(5, 15) = K_4_14
    K(5, 16) = K_4_15
    K(5, 17) = K_4_16
    K(5, 18) = K_4_17
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
    K(6, 13) = K_5_12
    K(6, 14) = K_5_13
    K(6, 15) = K_5_14
    K(6, 16) = K_5_15
    K(6, 17) = K_5_16
    K(6, 18) = K_5_17
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
    K(7, 13) = K_6_12
    K(7, 14) = K_6_13
    K(7, 15) = K_6_14
    K(7, 16) = K_6_15
    K(7, 17) = K_6_16
    K(7, 18) = K_6_17
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
    K(8, 13) = K_7_12
    K(8, 14) = K_7_13
    K(8, 15) = K_7_14
    K(8, 16) = K_7_15
    K(8, 17) = K_7_16
    K(8, 18) = K_7_17
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
    K(9, 13) = K_8_12
    K(9, 14) = K_8_13
    K(9, 15) = K_8_14
    K(9, 16) = K_8_15
    K(9, 17) = K_8_16
    K(9, 18) = K_8_17
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
    K(10, 13) = K_9_12
    K(10, 14) = K_9_13
    K(10, 15) = K_9_14
    K(10, 16) = K_9_15
    K(10, 17) = K_9_16
    K(10, 18) = K_9_17
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
    K(11, 13) = K_10_12
    K(11, 14) = K_10_13
    K(11, 15) = K_10_14
    K(11, 16) = K_10_15
    K(11, 17) = K_10_16
    K(11, 18) = K_10_17
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
    K(12, 13) = K_11_12
    K(12, 14) = K_11_13
    K(12, 15) = K_11_14
    K(12, 16) = K_11_15
    K(12, 17) = K_11_16
    K(12, 18) = K_11_17
    K(13, 1) = K_0_12
    K(13, 2) = K_1_12
    K(13, 3) = K_2_12
    K(13, 4) = K_3_12
    K(13, 5) = K_4_12
    K(13, 6) = K_5_12
    K(13, 7) = K_6_12
    K(13, 8) = K_7_12
    K(13, 9) = K_8_12
    K(13, 10) = K_9_12
    K(13, 11) = K_10_12
    K(13, 12) = K_11_12
    K(13, 13) = K_12_12
    K(13, 14) = K_12_13
    K(13, 15) = K_12_14
    K(13, 16) = K_12_15
    K(13, 17) = K_12_16
    K(13, 18) = K_12_17
    K(14, 1) = K_0_13
    K(14, 2) = K_1_13
    K(14, 3) = K_2_13
    K(14, 4) = K_3_13
    K(14, 5) = K_4_13
    K(14, 6) = K_5_13
    K(14, 7) = K_6_13
    K(14, 8) = K_7_13
    K(14, 9) = K_8_13
    K(14, 10) = K_9_13
    K(14, 11) = K_10_13
    K(14, 12) = K_11_13
    K(14, 13) = K_12_13
    K(14, 14) = K_13_13
    K(14, 15) = K_13_14
    K(14, 16) = K_13_15
    K(14, 17) = K_13_16
    K(14, 18) = K_13_17
    K(15, 1) = K_0_14
    K(15, 2) = K_1_14
    K(15, 3) = K_2_14
    K(15, 4) = K_3_14
    K(15, 5) = K_4_14
    K(15, 6) = K_5_14
    K(15, 7) = K_6_14
    K(15, 8) = K_7_14
    K(15, 9) = K_8_14
    K(15, 10) = K_9_14
    K(15, 11) = K_10_14
    K(15, 12) = K_11_14
    K(15, 13) = K_12_14
    K(15, 14) = K_13_14
    K(15, 15) = K_14_14
    K(15, 16) = K_14_15
    K(15, 17) = K_14_16
    K(15, 18) = K_14_17
    K(16, 1) = K_0_15
    K(16, 2) = K_1_15
    K(16, 3) = K_2_15
    K(16, 4) = K_3_15
    K(16, 5) = K_4_15
    K(16, 6) = K_5_15
    K(16, 7) = K_6_15
    K(16, 8) = K_7_15
    K(16, 9) = K_8_15
    K(16, 10) = K_9_15
    K(16, 11) = K_10_15
    K(16, 12) = K_11_15
    K(16, 13) = K_12_15
    K(16, 14) = K_13_15
    K(16, 15) = K_14_15
    K(16, 16) = K_15_15
    K(16, 17) = K_15_16
    K(16, 18) = K_15_17
    K(17, 1) = K_0_16
    K(17, 2) = K_1_16
    K(17, 3) = K_2_16
    K(17, 4) = K_3_16
    K(17, 5) = K_4_16
    K(17, 6) = K_5_16
    K(17, 7) = K_6_16
    K(17, 8) = K_7_16
    K(17, 9) = K_8_16
    K(17, 10) = K_9_16
    K(17, 11) = K_10_16
    K(17, 12) = K_11_16
    K(17, 13) = K_12_16
    K(17, 14) = K_13_16
    K(17, 15) = K_14_16
    K(17, 16) = K_15_16
    K(17, 17) = K_16_16
    K(17, 18) = K_16_17
    K(18, 1) = K_0_17
    K(18, 2) = K_1_17
    K(18, 3) = K_2_17
    K(18, 4) = K_3_17
    K(18, 5) = K_4_17
    K(18, 6) = K_5_17
    K(18, 7) = K_6_17
    K(18, 8) = K_7_17
    K(18, 9) = K_8_17
    K(18, 10) = K_9_17
    K(18, 11) = K_10_17
    K(18, 12) = K_11_17
    K(18, 13) = K_12_17
    K(18, 14) = K_13_17
    K(18, 15) = K_14_17
    K(18, 16) = K_15_17
    K(18, 17) = K_16_17
    K(18, 18) = K_17_17
  end subroutine q9_selective_plane_stress_stiffness

  pure subroutine q9_selective_plane_stress_stiffness_batch(n, xy, E, nu, t, K) &
      bind(C, name="derive_q9_selective_plane_stress_stiffness_batch_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 9, n)
    real(dp), value, intent(in) :: E, nu, t
    real(dp), intent(out) :: K(18, 18, n)
    ! blocks of 8 elements: copied into lane-first scratch (xl(lane, :, :)), the body
    ! runs in a loop over the lanes that gfortran vectorises (one SIMD lane per element),
    ! then K is copied back; a short last block repeats its first element in the spare lanes
    integer, parameter :: lanes = 8
    real(dp) :: xl(lanes, 2, 9), kl(lanes, 18, 18)
    integer(c_long) :: ib, iel
    integer :: lane, mlan
    real(dp) :: m0, m1, m2, m3
    m0 = 2.0_dp*E/(3.0_dp + 3.0_dp*nu)
    m1 = -E/(3.0_dp + 3.0_dp*nu)
    m2 = E/(2.0_dp + 2.0_dp*nu)
    m3 = (-E - 2.0_dp*E*nu)/(-3.0_dp + 3.0_dp*nu*nu)
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
          ! c3 = 2*eta^2*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c3(9) = [-0.9295160030897801_dp, 0.0_dp, &
              0.9295160030897801_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.9295160030897801_dp, 0.0_dp, &
              0.9295160030897801_dp]
          ! c4 = 2*eta at the points of gauss-3x3
          real(dp), parameter :: KS0_c4(9) = [-1.5491933384829668_dp, -1.5491933384829668_dp, &
              -1.5491933384829668_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.5491933384829668_dp, &
              1.5491933384829668_dp, 1.5491933384829668_dp]
          ! c5 = xi^2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c5(9) = [0.6_dp, 0.0_dp, 0.6_dp, 0.6_dp, 0.0_dp, 0.6_dp, &
              0.6_dp, 0.0_dp, 0.6_dp]
          ! c6 = 2*eta*xi^2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c6(9) = [-0.9295160030897801_dp, 0.0_dp, &
              -0.9295160030897801_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.9295160030897801_dp, 0.0_dp, &
              0.9295160030897801_dp]
          ! c7 = eta^2*xi/2 - eta^2/4 - eta*xi/2 + eta/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c7(9) = [-0.8760281680828158_dp, -0.3436491673103708_dp, &
              0.18872983346207417_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.11127016653792583_dp, &
              0.04364916731037084_dp, -0.023971831917184144_dp]
          ! c8 = eta*xi^2/2 - eta*xi/2 - xi^2/4 + xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c8(9) = [-0.8760281680828158_dp, 0.0_dp, &
              0.11127016653792583_dp, -0.3436491673103708_dp, 0.0_dp, 0.04364916731037084_dp, &
              0.18872983346207417_dp, 0.0_dp, -0.023971831917184144_dp]
          ! c9 = eta^2*xi/2 + eta^2/4 - eta*xi/2 - eta/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c9(9) = [-0.18872983346207417_dp, 0.3436491673103708_dp, &
              0.8760281680828158_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.023971831917184144_dp, &
              -0.04364916731037084_dp, -0.11127016653792583_dp]
          ! c10 = eta*xi^2/2 + eta*xi/2 - xi^2/4 - xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c10(9) = [0.11127016653792583_dp, 0.0_dp, &
              -0.8760281680828158_dp, 0.04364916731037084_dp, 0.0_dp, -0.3436491673103708_dp, &
              -0.023971831917184144_dp, 0.0_dp, 0.18872983346207417_dp]
          ! c11 = eta^2*xi/2 + eta^2/4 + eta*xi/2 + eta/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c11(9) = [0.023971831917184144_dp, -0.04364916731037084_dp, &
              -0.11127016653792583_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.18872983346207417_dp, &
              0.3436491673103708_dp, 0.8760281680828158_dp]
          ! c12 = eta*xi^2/2 + eta*xi/2 + xi^2/4 + xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c12(9) = [0.023971831917184144_dp, 0.0_dp, &
              -0.18872983346207417_dp, -0.04364916731037084_dp, 0.0_dp, 0.3436491673103708_dp, &
              -0.11127016653792583_dp, 0.0_dp, 0.8760281680828158_dp]
          ! c13 = eta^2*xi/2 - eta^2/4 + eta*xi/2 - eta/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c13(9) = [0.11127016653792583_dp, 0.04364916731037084_dp, &
              -0.023971831917184144_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.8760281680828158_dp, &
              -0.3436491673103708_dp, 0.18872983346207417_dp]
          ! c14 = eta*xi^2/2 - eta*xi/2 + xi^2/4 - xi/4 at the points of gauss-3x3
          real(dp), parameter :: KS0_c14(9) = [-0.18872983346207417_dp, 0.0_dp, &
              0.023971831917184144_dp, 0.3436491673103708_dp, 0.0_dp, -0.04364916731037084_dp, &
              0.8760281680828158_dp, 0.0_dp, -0.11127016653792583_dp]
          ! c15 = -eta^2*xi + eta*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c15(9) = [1.06475800154489_dp, 0.0_dp, -1.06475800154489_dp, &
              0.0_dp, 0.0_dp, 0.0_dp, -0.13524199845510998_dp, 0.0_dp, 0.13524199845510998_dp]
          ! c16 = -eta*xi^2 + eta + xi^2/2 - 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c16(9) = [-0.5098386676965934_dp, -1.2745966692414834_dp, &
              -0.5098386676965934_dp, -0.2_dp, -0.5_dp, -0.2_dp, 0.10983866769659335_dp, &
              0.2745966692414834_dp, 0.10983866769659335_dp]
          ! c17 = -eta^2*xi - eta^2/2 + xi + 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c17(9) = [-0.10983866769659335_dp, 0.2_dp, &
              0.5098386676965934_dp, -0.2745966692414834_dp, 0.5_dp, 1.2745966692414834_dp, &
              -0.10983866769659335_dp, 0.2_dp, 0.5098386676965934_dp]
          ! c18 = -eta*xi^2 - eta*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c18(9) = [-0.13524199845510998_dp, 0.0_dp, &
              1.06475800154489_dp, 0.0_dp, 0.0_dp, 0.0_dp, 0.13524199845510998_dp, 0.0_dp, &
              -1.06475800154489_dp]
          ! c19 = -eta^2*xi - eta*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c19(9) = [-0.13524199845510998_dp, 0.0_dp, &
              0.13524199845510998_dp, 0.0_dp, 0.0_dp, 0.0_dp, 1.06475800154489_dp, 0.0_dp, &
              -1.06475800154489_dp]
          ! c20 = -eta*xi^2 + eta - xi^2/2 + 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c20(9) = [-0.10983866769659335_dp, -0.2745966692414834_dp, &
              -0.10983866769659335_dp, 0.2_dp, 0.5_dp, 0.2_dp, 0.5098386676965934_dp, &
              1.2745966692414834_dp, 0.5098386676965934_dp]
          ! c21 = -eta^2*xi + eta^2/2 + xi - 1/2 at the points of gauss-3x3
          real(dp), parameter :: KS0_c21(9) = [-0.5098386676965934_dp, -0.2_dp, &
              0.10983866769659335_dp, -1.2745966692414834_dp, -0.5_dp, 0.2745966692414834_dp, &
              -0.5098386676965934_dp, -0.2_dp, 0.10983866769659335_dp]
          ! c22 = -eta*xi^2 + eta*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c22(9) = [1.06475800154489_dp, 0.0_dp, &
              -0.13524199845510998_dp, 0.0_dp, 0.0_dp, 0.0_dp, -1.06475800154489_dp, 0.0_dp, &
              0.13524199845510998_dp]
          ! c23 = 2*eta^2*xi - 2*xi at the points of gauss-3x3
          real(dp), parameter :: KS0_c23(9) = [0.6196773353931867_dp, 0.0_dp, &
              -0.6196773353931867_dp, 1.5491933384829668_dp, 0.0_dp, -1.5491933384829668_dp, &
              0.6196773353931867_dp, 0.0_dp, -0.6196773353931867_dp]
          ! c24 = 2*eta*xi^2 - 2*eta at the points of gauss-3x3
          real(dp), parameter :: KS0_c24(9) = [0.6196773353931867_dp, 1.5491933384829668_dp, &
              0.6196773353931867_dp, 0.0_dp, 0.0_dp, 0.0_dp, -0.6196773353931867_dp, &
              -1.5491933384829668_dp, -0.6196773353931867_dp]
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
          ! c0 = eta^2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c0(4) = [0.3333333333333333_dp, 0.3333333333333333_dp, &
              0.3333333333333333_dp, 0.3333333333333333_dp]
          ! c1 = 2*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c1(4) = [-1.1547005383792515_dp, 1.1547005383792515_dp, &
              -1.1547005383792515_dp, 1.1547005383792515_dp]
          ! c2 = 2*eta*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c2(4) = [0.6666666666666666_dp, -0.6666666666666666_dp, &
              -0.6666666666666666_dp, 0.6666666666666666_dp]
          ! c3 = 2*eta^2*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c3(4) = [-0.3849001794597505_dp, 0.3849001794597505_dp, &
              -0.3849001794597505_dp, 0.3849001794597505_dp]
          ! c4 = 2*eta at the points of gauss-2x2
          real(dp), parameter :: KS1_c4(4) = [-1.1547005383792515_dp, -1.1547005383792515_dp, &
              1.1547005383792515_dp, 1.1547005383792515_dp]
          ! c5 = xi^2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c5(4) = [0.3333333333333333_dp, 0.3333333333333333_dp, &
              0.3333333333333333_dp, 0.3333333333333333_dp]
          ! c6 = 2*eta*xi^2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c6(4) = [-0.3849001794597505_dp, -0.3849001794597505_dp, &
              0.3849001794597505_dp, 0.3849001794597505_dp]
          ! c7 = eta^2*xi/2 - eta^2/4 - eta*xi/2 + eta/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c7(4) = [-0.4905626121623441_dp, 0.03522081090086452_dp, &
              0.13144585576580214_dp, -0.009437387837655931_dp]
          ! c8 = eta*xi^2/2 - eta*xi/2 - xi^2/4 + xi/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c8(4) = [-0.4905626121623441_dp, 0.13144585576580214_dp, &
              0.03522081090086452_dp, -0.009437387837655931_dp]
          ! c9 = eta^2*xi/2 + eta^2/4 - eta*xi/2 - eta/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c9(4) = [-0.03522081090086452_dp, 0.4905626121623441_dp, &
              0.009437387837655931_dp, -0.13144585576580214_dp]
          ! c10 = eta*xi^2/2 + eta*xi/2 - xi^2/4 - xi/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c10(4) = [0.13144585576580214_dp, -0.4905626121623441_dp, &
              -0.009437387837655931_dp, 0.03522081090086452_dp]
          ! c11 = eta^2*xi/2 + eta^2/4 + eta*xi/2 + eta/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c11(4) = [0.009437387837655931_dp, -0.13144585576580214_dp, &
              -0.03522081090086452_dp, 0.4905626121623441_dp]
          ! c12 = eta*xi^2/2 + eta*xi/2 + xi^2/4 + xi/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c12(4) = [0.009437387837655931_dp, -0.03522081090086452_dp, &
              -0.13144585576580214_dp, 0.4905626121623441_dp]
          ! c13 = eta^2*xi/2 - eta^2/4 + eta*xi/2 - eta/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c13(4) = [0.13144585576580214_dp, -0.009437387837655931_dp, &
              -0.4905626121623441_dp, 0.03522081090086452_dp]
          ! c14 = eta*xi^2/2 - eta*xi/2 + xi^2/4 - xi/4 at the points of gauss-2x2
          real(dp), parameter :: KS1_c14(4) = [-0.03522081090086452_dp, 0.009437387837655931_dp, &
              0.4905626121623441_dp, -0.13144585576580214_dp]
          ! c15 = -eta^2*xi + eta*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c15(4) = [0.5257834230632086_dp, -0.5257834230632086_dp, &
              -0.14088324360345808_dp, 0.14088324360345808_dp]
          ! c16 = -eta*xi^2 + eta + xi^2/2 - 1/2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c16(4) = [-0.7182335127930839_dp, -0.7182335127930839_dp, &
              0.051566846126417175_dp, 0.051566846126417175_dp]
          ! c17 = -eta^2*xi - eta^2/2 + xi + 1/2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c17(4) = [-0.051566846126417175_dp, 0.7182335127930839_dp, &
              -0.051566846126417175_dp, 0.7182335127930839_dp]
          ! c18 = -eta*xi^2 - eta*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c18(4) = [-0.14088324360345808_dp, 0.5257834230632086_dp, &
              0.14088324360345808_dp, -0.5257834230632086_dp]
          ! c19 = -eta^2*xi - eta*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c19(4) = [-0.14088324360345808_dp, 0.14088324360345808_dp, &
              0.5257834230632086_dp, -0.5257834230632086_dp]
          ! c20 = -eta*xi^2 + eta - xi^2/2 + 1/2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c20(4) = [-0.051566846126417175_dp, &
              -0.051566846126417175_dp, 0.7182335127930839_dp, 0.7182335127930839_dp]
          ! c21 = -eta^2*xi + eta^2/2 + xi - 1/2 at the points of gauss-2x2
          real(dp), parameter :: KS1_c21(4) = [-0.7182335127930839_dp, 0.051566846126417175_dp, &
              -0.7182335127930839_dp, 0.051566846126417175_dp]
          ! c22 = -eta*xi^2 + eta*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c22(4) = [0.5257834230632086_dp, -0.14088324360345808_dp, &
              -0.5257834230632086_dp, 0.14088324360345808_dp]
          ! c23 = 2*eta^2*xi - 2*xi at the points of gauss-2x2
          real(dp), parameter :: KS1_c23(4) = [0.769800358919501_dp, -0.769800358919501_dp, &
              0.769800358919501_dp, -0.769800358919501_dp]
          ! c24 = 2*eta*xi^2 - 2*eta at the points of gauss-2x2
          real(dp), parameter :: KS1_c24(4) = [0.769800358919501_dp, 0.769800358919501_dp, &
              -0.769800358919501_dp, -0.769800358919501_dp]
          ! eta = eta at the points of gauss-2x2
          real(dp), parameter :: KS1_eta(4) = [-0.5773502691896257_dp, -0.5773502691896257_dp, &
              0.5773502691896257_dp, 0.5773502691896257_dp]
          ! w = the point weight at the points of gauss-2x2
          real(dp), parameter :: KS1_w(4) = [1.0_dp, 1.0_dp, 1.0_dp, 1.0_dp]
          ! xi = xi at the points of gauss-2x2
          real(dp), parameter :: KS1_xi(4) = [-0.5773502691896257_dp, 0.5773502691896257_dp, &
              -0.5773502691896257_dp, 0.5773502691896257_dp]
          real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, x9, y9, gx_0_1, gx_0_2
          real(dp) :: gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gx_2_2, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2
          real(dp) :: gy_2_0, gy_2_1, gy_2_2, K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_0_6, K_0_7, K_0_8
          real(dp) :: K_0_9, K_0_10, K_0_11, K_0_12, K_0_13, K_0_14, K_0_15, K_0_16, K_0_17, K_1_1, K_1_2
          real(dp) :: K_1_3, K_1_4, K_1_5, K_1_6, K_1_7, K_1_8, K_1_9, K_1_10, K_1_11, K_1_12, K_1_13, K_1_14
          real(dp) :: K_1_15, K_1_16, K_1_17, K_2_2, K_2_3, K_2_4, K_2_5, K_2_6, K_2_7, K_2_8, K_2_9, K_2_10
          real(dp) :: K_2_11, K_2_12, K_2_13, K_2_14, K_2_15, K_2_16, K_2_17, K_3_3, K_3_4, K_3_5, K_3_6
          real(dp) :: K_3_7, K_3_8, K_3_9, K_3_10, K_3_11, K_3_12, K_3_13, K_3_14, K_3_15, K_3_16, K_3_17
          real(dp) :: K_4_4, K_4_5, K_4_6, K_4_7, K_4_8, K_4_9, K_4_10, K_4_11, K_4_12, K_4_13, K_4_14, K_4_15
          real(dp) :: K_4_16, K_4_17, K_5_5, K_5_6, K_5_7, K_5_8, K_5_9, K_5_10, K_5_11, K_5_12, K_5_13
          real(dp) :: K_5_14, K_5_15, K_5_16, K_5_17, K_6_6, K_6_7, K_6_8, K_6_9, K_6_10, K_6_11, K_6_12
          real(dp) :: K_6_13, K_6_14, K_6_15, K_6_16, K_6_17, K_7_7, K_7_8, K_7_9, K_7_10, K_7_11, K_7_12
          real(dp) :: K_7_13, K_7_14, K_7_15, K_7_16, K_7_17, K_8_8, K_8_9, K_8_10, K_8_11, K_8_12, K_8_13
          real(dp) :: K_8_14, K_8_15, K_8_16, K_8_17, K_9_9, K_9_10, K_9_11, K_9_12, K_9_13, K_9_14, K_9_15
          real(dp) :: K_9_16, K_9_17, K_10_10, K_10_11, K_10_12, K_10_13, K_10_14, K_10_15, K_10_16, K_10_17
          real(dp) :: K_11_11, K_11_12, K_11_13, K_11_14, K_11_15, K_11_16, K_11_17, K_12_12, K_12_13, K_12_14
          real(dp) :: K_12_15, K_12_16, K_12_17, K_13_13, K_13_14, K_13_15, K_13_16, K_13_17, K_14_14, K_14_15
          real(dp) :: K_14_16, K_14_17, K_15_15, K_15_16, K_15_17, K_16_16, K_16_17, K_17_17
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
          x9 = xl(lane, 1, 9)
          y9 = xl(lane, 2, 9)
          gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
          gx_0_2 = 0.5_dp*x5 + 0.5_dp*x7 - x9
          gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
          gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
          gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
          gx_2_0 = 0.5_dp*x6 + 0.5_dp*x8 - x9
          gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
          gx_2_2 = x9 - 0.5_dp*x5 - 0.5_dp*x6 - 0.5_dp*x7 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 &
              + 0.25_dp*x3 + 0.25_dp*x4
          gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
          gy_0_2 = 0.5_dp*y5 + 0.5_dp*y7 - y9
          gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
          gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
          gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
          gy_2_0 = 0.5_dp*y6 + 0.5_dp*y8 - y9
          gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
          gy_2_2 = y9 - 0.5_dp*y5 - 0.5_dp*y6 - 0.5_dp*y7 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 &
              + 0.25_dp*y3 + 0.25_dp*y4
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
          K_0_16 = 0.0_dp
          K_0_17 = 0.0_dp
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
          K_1_16 = 0.0_dp
          K_1_17 = 0.0_dp
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
          K_2_16 = 0.0_dp
          K_2_17 = 0.0_dp
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
          K_3_16 = 0.0_dp
          K_3_17 = 0.0_dp
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
          K_4_16 = 0.0_dp
          K_4_17 = 0.0_dp
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
          K_5_16 = 0.0_dp
          K_5_17 = 0.0_dp
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
          K_6_16 = 0.0_dp
          K_6_17 = 0.0_dp
          K_7_7 = 0.0_dp
          K_7_8 = 0.0_dp
          K_7_9 = 0.0_dp
          K_7_10 = 0.0_dp
          K_7_11 = 0.0_dp
          K_7_12 = 0.0_dp
          K_7_13 = 0.0_dp
          K_7_14 = 0.0_dp
          K_7_15 = 0.0_dp
          K_7_16 = 0.0_dp
          K_7_17 = 0.0_dp
          K_8_8 = 0.0_dp
          K_8_9 = 0.0_dp
          K_8_10 = 0.0_dp
          K_8_11 = 0.0_dp
          K_8_12 = 0.0_dp
          K_8_13 = 0.0_dp
          K_8_14 = 0.0_dp
          K_8_15 = 0.0_dp
          K_8_16 = 0.0_dp
          K_8_17 = 0.0_dp
          K_9_9 = 0.0_dp
          K_9_10 = 0.0_dp
          K_9_11 = 0.0_dp
          K_9_12 = 0.0_dp
          K_9_13 = 0.0_dp
          K_9_14 = 0.0_dp
          K_9_15 = 0.0_dp
          K_9_16 = 0.0_dp
          K_9_17 = 0.0_dp
          K_10_10 = 0.0_dp
          K_10_11 = 0.0_dp
          K_10_12 = 0.0_dp
          K_10_13 = 0.0_dp
          K_10_14 = 0.0_dp
          K_10_15 = 0.0_dp
          K_10_16 = 0.0_dp
          K_10_17 = 0.0_dp
          K_11_11 = 0.0_dp
          K_11_12 = 0.0_dp
          K_11_13 = 0.0_dp
          K_11_14 = 0.0_dp
          K_11_15 = 0.0_dp
          K_11_16 = 0.0_dp
          K_11_17 = 0.0_dp
          K_12_12 = 0.0_dp
          K_12_13 = 0.0_dp
          K_12_14 = 0.0_dp
          K_12_15 = 0.0_dp
          K_12_16 = 0.0_dp
          K_12_17 = 0.0_dp
          K_13_13 = 0.0_dp
          K_13_14 = 0.0_dp
          K_13_15 = 0.0_dp
          K_13_16 = 0.0_dp
          K_13_17 = 0.0_dp
          K_14_14 = 0.0_dp
          K_14_15 = 0.0_dp
          K_14_16 = 0.0_dp
          K_14_17 = 0.0_dp
          K_15_15 = 0.0_dp
          K_15_16 = 0.0_dp
          K_15_17 = 0.0_dp
          K_16_16 = 0.0_dp
          K_16_17 = 0.0_dp
          K_17_17 = 0.0_dp
          do p = 1, 9   ! gauss-3x3: loop over the 9 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
              real(dp) :: c19, c20, c21, c22, c23, c24, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
              real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6
              real(dp) :: dNdy6, dNdx7, dNdy7, dNdx8, dNdy8, dNdx9, dNdy9, sc0, s1, s2, s3, T4, T6, T7, T8, T9
              real(dp) :: T10, T11, T12, T13, T14, T15, T16, T17, T18, T19, T20, T21, T22, T23, T24, T25, T26
              real(dp) :: T27, T28, T29, T30, T31, T32, T33, T34, T35, T36, T37, T38, T39, T40, T41, T42, T43
              real(dp) :: T44, T45, T46, T47, T48, T49, T50, T51, T52, T53, T54, T55, T56, T57
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
              c21 = KS0_c21(p)
              c22 = KS0_c22(p)
              c23 = KS0_c23(p)
              c24 = KS0_c24(p)
              eta = KS0_eta(p)
              w = KS0_w(p)
              xi = KS0_xi(p)
              J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + c3*gx_2_2 + eta*gx_1_1
              J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + c3*gy_2_2 + eta*gy_1_1
              J10 = gx_0_1 + c2*gx_1_2 + c4*gx_0_2 + c5*gx_2_1 + c6*gx_2_2 + gx_1_1*xi
              J11 = gy_0_1 + c2*gy_1_2 + c4*gy_0_2 + c5*gy_2_1 + c6*gy_2_2 + gy_1_1*xi
              detJ = J00*J11 - J01*J10
              idet = 1.0_dp/detJ
              Ji00 = J11*idet
              Ji01 = -J01*idet
              Ji10 = -J10*idet
              Ji11 = J00*idet
              dNdx1 = Ji00*c7 + Ji01*c8
              dNdy1 = Ji10*c7 + Ji11*c8
              dNdx2 = Ji00*c9 + Ji01*c10
              dNdy2 = Ji10*c9 + Ji11*c10
              dNdx3 = Ji00*c11 + Ji01*c12
              dNdy3 = Ji10*c11 + Ji11*c12
              dNdx4 = Ji00*c13 + Ji01*c14
              dNdy4 = Ji10*c13 + Ji11*c14
              dNdx5 = Ji00*c15 + Ji01*c16
              dNdy5 = Ji10*c15 + Ji11*c16
              dNdx6 = Ji00*c17 + Ji01*c18
              dNdy6 = Ji10*c17 + Ji11*c18
              dNdx7 = Ji00*c19 + Ji01*c20
              dNdy7 = Ji10*c19 + Ji11*c20
              dNdx8 = Ji00*c21 + Ji01*c22
              dNdy8 = Ji10*c21 + Ji11*c22
              dNdx9 = Ji00*c23 + Ji01*c24
              dNdy9 = Ji10*c23 + Ji11*c24
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
              T52 = dNdx9*s1
              T53 = dNdx9*s2
              T54 = dNdy9*s3
              T55 = dNdy9*s2
              T56 = dNdy9*s1
              T57 = dNdx9*s3
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
              K_0_16 = K_0_16 + (T52*dNdx1 + T54*dNdy1)
              K_0_17 = K_0_17 + (T55*dNdx1 + T57*dNdy1)
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
              K_1_16 = K_1_16 + (T53*dNdy1 + T54*dNdx1)
              K_1_17 = K_1_17 + (T56*dNdy1 + T57*dNdx1)
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
              K_2_16 = K_2_16 + (T52*dNdx2 + T54*dNdy2)
              K_2_17 = K_2_17 + (T55*dNdx2 + T57*dNdy2)
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
              K_3_16 = K_3_16 + (T53*dNdy2 + T54*dNdx2)
              K_3_17 = K_3_17 + (T56*dNdy2 + T57*dNdx2)
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
              K_4_16 = K_4_16 + (T52*dNdx3 + T54*dNdy3)
              K_4_17 = K_4_17 + (T55*dNdx3 + T57*dNdy3)
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
              K_5_16 = K_5_16 + (T53*dNdy3 + T54*dNdx3)
              K_5_17 = K_5_17 + (T56*dNdy3 + T57*dNdx3)
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
              K_6_16 = K_6_16 + (T52*dNdx4 + T54*dNdy4)
              K_6_17 = K_6_17 + (T55*dNdx4 + T57*dNdy4)
              K_7_7 = K_7_7 + (T26*dNdy4 + T27*dNdx4)
              K_7_8 = K_7_8 + (T29*dNdy4 + T30*dNdx4)
              K_7_9 = K_7_9 + (T32*dNdy4 + T33*dNdx4)
              K_7_10 = K_7_10 + (T35*dNdy4 + T36*dNdx4)
              K_7_11 = K_7_11 + (T38*dNdy4 + T39*dNdx4)
              K_7_12 = K_7_12 + (T41*dNdy4 + T42*dNdx4)
              K_7_13 = K_7_13 + (T44*dNdy4 + T45*dNdx4)
              K_7_14 = K_7_14 + (T47*dNdy4 + T48*dNdx4)
              K_7_15 = K_7_15 + (T50*dNdy4 + T51*dNdx4)
              K_7_16 = K_7_16 + (T53*dNdy4 + T54*dNdx4)
              K_7_17 = K_7_17 + (T56*dNdy4 + T57*dNdx4)
              K_8_8 = K_8_8 + (T28*dNdx5 + T30*dNdy5)
              K_8_9 = K_8_9 + (T31*dNdx5 + T33*dNdy5)
              K_8_10 = K_8_10 + (T34*dNdx5 + T36*dNdy5)
              K_8_11 = K_8_11 + (T37*dNdx5 + T39*dNdy5)
              K_8_12 = K_8_12 + (T40*dNdx5 + T42*dNdy5)
              K_8_13 = K_8_13 + (T43*dNdx5 + T45*dNdy5)
              K_8_14 = K_8_14 + (T46*dNdx5 + T48*dNdy5)
              K_8_15 = K_8_15 + (T49*dNdx5 + T51*dNdy5)
              K_8_16 = K_8_16 + (T52*dNdx5 + T54*dNdy5)
              K_8_17 = K_8_17 + (T55*dNdx5 + T57*dNdy5)
              K_9_9 = K_9_9 + (T32*dNdy5 + T33*dNdx5)
              K_9_10 = K_9_10 + (T35*dNdy5 + T36*dNdx5)
              K_9_11 = K_9_11 + (T38*dNdy5 + T39*dNdx5)
              K_9_12 = K_9_12 + (T41*dNdy5 + T42*dNdx5)
              K_9_13 = K_9_13 + (T44*dNdy5 + T45*dNdx5)
              K_9_14 = K_9_14 + (T47*dNdy5 + T48*dNdx5)
              K_9_15 = K_9_15 + (T50*dNdy5 + T51*dNdx5)
              K_9_16 = K_9_16 + (T53*dNdy5 + T54*dNdx5)
              K_9_17 = K_9_17 + (T56*dNdy5 + T57*dNdx5)
              K_10_10 = K_10_10 + (T34*dNdx6 + T36*dNdy6)
              K_10_11 = K_10_11 + (T37*dNdx6 + T39*dNdy6)
              K_10_12 = K_10_12 + (T40*dNdx6 + T42*dNdy6)
              K_10_13 = K_10_13 + (T43*dNdx6 + T45*dNdy6)
              K_10_14 = K_10_14 + (T46*dNdx6 + T48*dNdy6)
              K_10_15 = K_10_15 + (T49*dNdx6 + T51*dNdy6)
              K_10_16 = K_10_16 + (T52*dNdx6 + T54*dNdy6)
              K_10_17 = K_10_17 + (T55*dNdx6 + T57*dNdy6)
              K_11_11 = K_11_11 + (T38*dNdy6 + T39*dNdx6)
              K_11_12 = K_11_12 + (T41*dNdy6 + T42*dNdx6)
              K_11_13 = K_11_13 + (T44*dNdy6 + T45*dNdx6)
              K_11_14 = K_11_14 + (T47*dNdy6 + T48*dNdx6)
              K_11_15 = K_11_15 + (T50*dNdy6 + T51*dNdx6)
              K_11_16 = K_11_16 + (T53*dNdy6 + T54*dNdx6)
              K_11_17 = K_11_17 + (T56*dNdy6 + T57*dNdx6)
              K_12_12 = K_12_12 + (T40*dNdx7 + T42*dNdy7)
              K_12_13 = K_12_13 + (T43*dNdx7 + T45*dNdy7)
              K_12_14 = K_12_14 + (T46*dNdx7 + T48*dNdy7)
              K_12_15 = K_12_15 + (T49*dNdx7 + T51*dNdy7)
              K_12_16 = K_12_16 + (T52*dNdx7 + T54*dNdy7)
              K_12_17 = K_12_17 + (T55*dNdx7 + T57*dNdy7)
              K_13_13 = K_13_13 + (T44*dNdy7 + T45*dNdx7)
              K_13_14 = K_13_14 + (T47*dNdy7 + T48*dNdx7)
              K_13_15 = K_13_15 + (T50*dNdy7 + T51*dNdx7)
              K_13_16 = K_13_16 + (T53*dNdy7 + T54*dNdx7)
              K_13_17 = K_13_17 + (T56*dNdy7 + T57*dNdx7)
              K_14_14 = K_14_14 + (T46*dNdx8 + T48*dNdy8)
              K_14_15 = K_14_15 + (T49*dNdx8 + T51*dNdy8)
              K_14_16 = K_14_16 + (T52*dNdx8 + T54*dNdy8)
              K_14_17 = K_14_17 + (T55*dNdx8 + T57*dNdy8)
              K_15_15 = K_15_15 + (T50*dNdy8 + T51*dNdx8)
              K_15_16 = K_15_16 + (T53*dNdy8 + T54*dNdx8)
              K_15_17 = K_15_17 + (T56*dNdy8 + T57*dNdx8)
              K_16_16 = K_16_16 + (T52*dNdx9 + T54*dNdy9)
              K_16_17 = K_16_17 + (T55*dNdx9 + T57*dNdy9)
              K_17_17 = K_17_17 + (T56*dNdy9 + T57*dNdx9)
            end block
          end do
          do p = 1, 4   ! gauss-2x2: loop over the 4 points
            block
              real(dp) :: c0, c1, c2, c3, c4, c5, c6, c7, c8, c9, c10, c11, c12, c13, c14, c15, c16, c17, c18
              real(dp) :: c19, c20, c21, c22, c23, c24, eta, w, xi, J00, J01, J10, J11, detJ, idet, Ji00, Ji01
              real(dp) :: Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6
              real(dp) :: dNdy6, dNdx7, dNdy7, dNdx8, dNdy8, dNdx9, dNdy9, sc58, s59, T60, T61, T62, T63, T64
              real(dp) :: T65, T66, T67, T68, T69, T70, T71, T72, T73, T74, T75, T76, T77
              c0 = KS1_c0(p)
              c1 = KS1_c1(p)
              c2 = KS1_c2(p)
              c3 = KS1_c3(p)
              c4 = KS1_c4(p)
              c5 = KS1_c5(p)
              c6 = KS1_c6(p)
              c7 = KS1_c7(p)
              c8 = KS1_c8(p)
              c9 = KS1_c9(p)
              c10 = KS1_c10(p)
              c11 = KS1_c11(p)
              c12 = KS1_c12(p)
              c13 = KS1_c13(p)
              c14 = KS1_c14(p)
              c15 = KS1_c15(p)
              c16 = KS1_c16(p)
              c17 = KS1_c17(p)
              c18 = KS1_c18(p)
              c19 = KS1_c19(p)
              c20 = KS1_c20(p)
              c21 = KS1_c21(p)
              c22 = KS1_c22(p)
              c23 = KS1_c23(p)
              c24 = KS1_c24(p)
              eta = KS1_eta(p)
              w = KS1_w(p)
              xi = KS1_xi(p)
              J00 = gx_1_0 + c0*gx_1_2 + c1*gx_2_0 + c2*gx_2_1 + c3*gx_2_2 + eta*gx_1_1
              J01 = gy_1_0 + c0*gy_1_2 + c1*gy_2_0 + c2*gy_2_1 + c3*gy_2_2 + eta*gy_1_1
              J10 = gx_0_1 + c2*gx_1_2 + c4*gx_0_2 + c5*gx_2_1 + c6*gx_2_2 + gx_1_1*xi
              J11 = gy_0_1 + c2*gy_1_2 + c4*gy_0_2 + c5*gy_2_1 + c6*gy_2_2 + gy_1_1*xi
              detJ = J00*J11 - J01*J10
              idet = 1.0_dp/detJ
              Ji00 = J11*idet
              Ji01 = -J01*idet
              Ji10 = -J10*idet
              Ji11 = J00*idet
              dNdx1 = Ji00*c7 + Ji01*c8
              dNdy1 = Ji10*c7 + Ji11*c8
              dNdx2 = Ji00*c9 + Ji01*c10
              dNdy2 = Ji10*c9 + Ji11*c10
              dNdx3 = Ji00*c11 + Ji01*c12
              dNdy3 = Ji10*c11 + Ji11*c12
              dNdx4 = Ji00*c13 + Ji01*c14
              dNdy4 = Ji10*c13 + Ji11*c14
              dNdx5 = Ji00*c15 + Ji01*c16
              dNdy5 = Ji10*c15 + Ji11*c16
              dNdx6 = Ji00*c17 + Ji01*c18
              dNdy6 = Ji10*c17 + Ji11*c18
              dNdx7 = Ji00*c19 + Ji01*c20
              dNdy7 = Ji10*c19 + Ji11*c20
              dNdx8 = Ji00*c21 + Ji01*c22
              dNdy8 = Ji10*c21 + Ji11*c22
              dNdx9 = Ji00*c23 + Ji01*c24
              dNdy9 = Ji10*c23 + Ji11*c24
              sc58 = detJ*t*w
              s59 = m3*sc58
              T60 = dNdx1*s59
              T61 = dNdy1*s59
              T62 = dNdx2*s59
              T63 = dNdy2*s59
              T64 = dNdx3*s59
              T65 = dNdy3*s59
              T66 = dNdx4*s59
              T67 = dNdy4*s59
              T68 = dNdx5*s59
              T69 = dNdy5*s59
              T70 = dNdx6*s59
              T71 = dNdy6*s59
              T72 = dNdx7*s59
              T73 = dNdy7*s59
              T74 = dNdx8*s59
              T75 = dNdy8*s59
              T76 = dNdx9*s59
              T77 = dNdy9*s59
              K_0_0 = K_0_0 + (T60*dNdx1)
              K_0_1 = K_0_1 + (T61*dNdx1)
              K_0_2 = K_0_2 + (T62*dNdx1)
              K_0_3 = K_0_3 + (T63*dNdx1)
              K_0_4 = K_0_4 + (T64*dNdx1)
              K_0_5 = K_0_5 + (T65*dNdx1)
              K_0_6 = K_0_6 + (T66*dNdx1)
              K_0_7 = K_0_7 + (T67*dNdx1)
              K_0_8 = K_0_8 + (T68*dNdx1)
              K_0_9 = K_0_9 + (T69*dNdx1)
              K_0_10 = K_0_10 + (T70*dNdx1)
              K_0_11 = K_0_11 + (T71*dNdx1)
              K_0_12 = K_0_12 + (T72*dNdx1)
              K_0_13 = K_0_13 + (T73*dNdx1)
              K_0_14 = K_0_14 + (T74*dNdx1)
              K_0_15 = K_0_15 + (T75*dNdx1)
              K_0_16 = K_0_16 + (T76*dNdx1)
              K_0_17 = K_0_17 + (T77*dNdx1)
              K_1_1 = K_1_1 + (T61*dNdy1)
              K_1_2 = K_1_2 + (T62*dNdy1)
              K_1_3 = K_1_3 + (T63*dNdy1)
              K_1_4 = K_1_4 + (T64*dNdy1)
              K_1_5 = K_1_5 + (T65*dNdy1)
              K_1_6 = K_1_6 + (T66*dNdy1)
              K_1_7 = K_1_7 + (T67*dNdy1)
              K_1_8 = K_1_8 + (T68*dNdy1)
              K_1_9 = K_1_9 + (T69*dNdy1)
              K_1_10 = K_1_10 + (T70*dNdy1)
              K_1_11 = K_1_11 + (T71*dNdy1)
              K_1_12 = K_1_12 + (T72*dNdy1)
              K_1_13 = K_1_13 + (T73*dNdy1)
              K_1_14 = K_1_14 + (T74*dNdy1)
              K_1_15 = K_1_15 + (T75*dNdy1)
              K_1_16 = K_1_16 + (T76*dNdy1)
              K_1_17 = K_1_17 + (T77*dNdy1)
              K_2_2 = K_2_2 + (T62*dNdx2)
              K_2_3 = K_2_3 + (T63*dNdx2)
              K_2_4 = K_2_4 + (T64*dNdx2)
              K_2_5 = K_2_5 + (T65*dNdx2)
              K_2_6 = K_2_6 + (T66*dNdx2)
              K_2_7 = K_2_7 + (T67*dNdx2)
              K_2_8 = K_2_8 + (T68*dNdx2)
              K_2_9 = K_2_9 + (T69*dNdx2)
              K_2_10 = K_2_10 + (T70*dNdx2)
              K_2_11 = K_2_11 + (T71*dNdx2)
              K_2_12 = K_2_12 + (T72*dNdx2)
              K_2_13 = K_2_13 + (T73*dNdx2)
              K_2_14 = K_2_14 + (T74*dNdx2)
              K_2_15 = K_2_15 + (T75*dNdx2)
              K_2_16 = K_2_16 + (T76*dNdx2)
              K_2_17 = K_2_17 + (T77*dNdx2)
              K_3_3 = K_3_3 + (T63*dNdy2)
              K_3_4 = K_3_4 + (T64*dNdy2)
              K_3_5 = K_3_5 + (T65*dNdy2)
              K_3_6 = K_3_6 + (T66*dNdy2)
              K_3_7 = K_3_7 + (T67*dNdy2)
              K_3_8 = K_3_8 + (T68*dNdy2)
              K_3_9 = K_3_9 + (T69*dNdy2)
              K_3_10 = K_3_10 + (T70*dNdy2)
              K_3_11 = K_3_11 + (T71*dNdy2)
              K_3_12 = K_3_12 + (T72*dNdy2)
              K_3_13 = K_3_13 + (T73*dNdy2)
              K_3_14 = K_3_14 + (T74*dNdy2)
              K_3_15 = K_3_15 + (T75*dNdy2)
              K_3_16 = K_3_16 + (T76*dNdy2)
              K_3_17 = K_3_17 + (T77*dNdy2)
              K_4_4 = K_4_4 + (T64*dNdx3)
              K_4_5 = K_4_5 + (T65*dNdx3)
              K_4_6 = K_4_6 + (T66*dNdx3)
              K_4_7 = K_4_7 + (T67*dNdx3)
              K_4_8 = K_4_8 + (T68*dNdx3)
              K_4_9 = K_4_9 + (T69*dNdx3)
              K_4_10 = K_4_10 + (T70*dNdx3)
              K_4_11 = K_4_11 + (T71*dNdx3)
              K_4_12 = K_4_12 + (T72*dNdx3)
              K_4_13 = K_4_13 + (T73*dNdx3)
              K_4_14 = K_4_14 + (T74*dNdx3)
              K_4_15 = K_4_15 + (T75*dNdx3)
              K_4_16 = K_4_16 + (T76*dNdx3)
              K_4_17 = K_4_17 + (T77*dNdx3)
              K_5_5 = K_5_5 + (T65*dNdy3)
              K_5_6 = K_5_6 + (T66*dNdy3)
              K_5_7 = K_5_7 + (T67*dNdy3)
              K_5_8 = K_5_8 + (T68*dNdy3)
              K_5_9 = K_5_9 + (T69*dNdy3)
              K_5_10 = K_5_10 + (T70*dNdy3)
              K_5_11 = K_5_11 + (T71*dNdy3)
              K_5_12 = K_5_12 + (T72*dNdy3)
              K_5_13 = K_5_13 + (T73*dNdy3)
              K_5_14 = K_5_14 + (T74*dNdy3)
              K_5_15 = K_5_15 + (T75*dNdy3)
              K_5_16 = K_5_16 + (T76*dNdy3)
              K_5_17 = K_5_17 + (T77*dNdy3)
              K_6_6 = K_6_6 + (T66*dNdx4)
              K_6_7 = K_6_7 + (T67*dNdx4)
              K_6_8 = K_6_8 + (T68*dNdx4)
              K_6_9 = K_6_9 + (T69*dNdx4)
              K_6_10 = K_6_10 + (T70*dNdx4)
              K_6_11 = K_6_11 + (T71*dNdx4)
              K_6_12 = K_6_12 + (T72*dNdx4)
              K_6_13 = K_6_13 + (T73*dNdx4)
              K_6_14 = K_6_14 + (T74*dNdx4)
              K_6_15 = K_6_15 + (T75*dNdx4)
              K_6_16 = K_6_16 + (T76*dNdx4)
              K_6_17 = K_6_17 + (T77*dNdx4)
              K_7_7 = K_7_7 + (T67*dNdy4)
              K_7_8 = K_7_8 + (T68*dNdy4)
              K_7_9 = K_7_9 + (T69*dNdy4)
              K_7_10 = K_7_10 + (T70*dNdy4)
              K_7_11 = K_7_11 + (T71*dNdy4)
              K_7_12 = K_7_12 + (T72*dNdy4)
              K_7_13 = K_7_13 + (T73*dNdy4)
              K_7_14 = K_7_14 + (T74*dNdy4)
              K_7_15 = K_7_15 + (T75*dNdy4)
              K_7_16 = K_7_16 + (T76*dNdy4)
              K_7_17 = K_7_17 + (T77*dNdy4)
              K_8_8 = K_8_8 + (T68*dNdx5)
              K_8_9 = K_8_9 + (T69*dNdx5)
              K_8_10 = K_8_10 + (T70*dNdx5)
              K_8_11 = K_8_11 + (T71*dNdx5)
              K_8_12 = K_8_12 + (T72*dNdx5)
              K_8_13 = K_8_13 + (T73*dNdx5)
              K_8_14 = K_8_14 + (T74*dNdx5)
              K_8_15 = K_8_15 + (T75*dNdx5)
              K_8_16 = K_8_16 + (T76*dNdx5)
              K_8_17 = K_8_17 + (T77*dNdx5)
              K_9_9 = K_9_9 + (T69*dNdy5)
              K_9_10 = K_9_10 + (T70*dNdy5)
              K_9_11 = K_9_11 + (T71*dNdy5)
              K_9_12 = K_9_12 + (T72*dNdy5)
              K_9_13 = K_9_13 + (T73*dNdy5)
              K_9_14 = K_9_14 + (T74*dNdy5)
              K_9_15 = K_9_15 + (T75*dNdy5)
              K_9_16 = K_9_16 + (T76*dNdy5)
              K_9_17 = K_9_17 + (T77*dNdy5)
              K_10_10 = K_10_10 + (T70*dNdx6)
              K_10_11 = K_10_11 + (T71*dNdx6)
              K_10_12 = K_10_12 + (T72*dNdx6)
              K_10_13 = K_10_13 + (T73*dNdx6)
              K_10_14 = K_10_14 + (T74*dNdx6)
              K_10_15 = K_10_15 + (T75*dNdx6)
              K_10_16 = K_10_16 + (T76*dNdx6)
              K_10_17 = K_10_17 + (T77*dNdx6)
              K_11_11 = K_11_11 + (T71*dNdy6)
              K_11_12 = K_11_12 + (T72*dNdy6)
              K_11_13 = K_11_13 + (T73*dNdy6)
              K_11_14 = K_11_14 + (T74*dNdy6)
              K_11_15 = K_11_15 + (T75*dNdy6)
              K_11_16 = K_11_16 + (T76*dNdy6)
              K_11_17 = K_11_17 + (T77*dNdy6)
              K_12_12 = K_12_12 + (T72*dNdx7)
              K_12_13 = K_12_13 + (T73*dNdx7)
              K_12_14 = K_12_14 + (T74*dNdx7)
              K_12_15 = K_12_15 + (T75*dNdx7)
              K_12_16 = K_12_16 + (T76*dNdx7)
              K_12_17 = K_12_17 + (T77*dNdx7)
              K_13_13 = K_13_13 + (T73*dNdy7)
              K_13_14 = K_13_14 + (T74*dNdy7)
              K_13_15 = K_13_15 + (T75*dNdy7)
              K_13_16 = K_13_16 + (T76*dNdy7)
              K_13_17 = K_13_17 + (T77*dNdy7)
              K_14_14 = K_14_14 + (T74*dNdx8)
              K_14_15 = K_14_15 + (T75*dNdx8)
              K_14_16 = K_14_16 + (T76*dNdx8)
              K_14_17 = K_14_17 + (T77*dNdx8)
              K_15_15 = K_15_15 + (T75*dNdy8)
              K_15_16 = K_15_16 + (T76*dNdy8)
              K_15_17 = K_15_17 + (T77*dNdy8)
              K_16_16 = K_16_16 + (T76*dNdx9)
              K_16_17 = K_16_17 + (T77*dNdx9)
              K_17_17 = K_17_17 + (T77*dNdy9)
            end block
          end do
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
          kl(lane, 1, 13) = K_0_12
          kl(lane, 1, 14) = K_0_13
          kl(lane, 1, 15) = K_0_14
          kl(lane, 1, 16) = K_0_15
          kl(lane, 1, 17) = K_0_16
          kl(lane, 1, 18) = K_0_17
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
          kl(lane, 2, 13) = K_1_12
          kl(lane, 2, 14) = K_1_13
          kl(lane, 2, 15) = K_1_14
          kl(lane, 2, 16) = K_1_15
          kl(lane, 2, 17) = K_1_16
          kl(lane, 2, 18) = K_1_17
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
          kl(lane, 3, 13) = K_2_12
          kl(lane, 3, 14) = K_2_13
          kl(lane, 3, 15) = K_2_14
          kl(lane, 3, 16) = K_2_15
          kl(lane, 3, 17) = K_2_16
          kl(lane, 3, 18) = K_2_17
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
          kl(lane, 4, 13) = K_3_12
          kl(lane, 4, 14) = K_3_13
          kl(lane, 4, 15) = K_3_14
          kl(lane, 4, 16) = K_3_15
          kl(lane, 4, 17) = K_3_16
          kl(lane, 4, 18) = K_3_17
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
          kl(lane, 5, 13) = K_4_12
          kl(lane, 5, 14) = K_4_13
          kl(lane, 5, 15) = K_4_14
          kl(lane, 5, 16) = K_4_15
          kl(lane, 5, 17) = K_4_16
          kl(lane, 5, 18) = K_4_17
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
          kl(lane, 6, 13) = K_5_12
          kl(lane, 6, 14) = K_5_13
          kl(lane, 6, 15) = K_5_14
          kl(lane, 6, 16) = K_5_15
          kl(lane, 6, 17) = K_5_16
          kl(lane, 6, 18) = K_5_17
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
          kl(lane, 7, 13) = K_6_12
          kl(lane, 7, 14) = K_6_13
          kl(lane, 7, 15) = K_6_14
          kl(lane, 7, 16) = K_6_15
          kl(lane, 7, 17) = K_6_16
          kl(lane, 7, 18) = K_6_17
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
          kl(lane, 8, 13) = K_7_12
          kl(lane, 8, 14) = K_7_13
          kl(lane, 8, 15) = K_7_14
          kl(lane, 8, 16) = K_7_15
          kl(lane, 8, 17) = K_7_16
          kl(lane, 8, 18) = K_7_17
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
          kl(lane, 9, 13) = K_8_12
          kl(lane, 9, 14) = K_8_13
          kl(lane, 9, 15) = K_8_14
          kl(lane, 9, 16) = K_8_15
          kl(lane, 9, 17) = K_8_16
          kl(lane, 9, 18) = K_8_17
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
          kl(lane, 10, 13) = K_9_12
          kl(lane, 10, 14) = K_9_13
          kl(lane, 10, 15) = K_9_14
          kl(lane, 10, 16) = K_9_15
          kl(lane, 10, 17) = K_9_16
          kl(lane, 10, 18) = K_9_17
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
          kl(lane, 11, 13) = K_10_12
          kl(lane, 11, 14) = K_10_13
          kl(lane, 11, 15) = K_10_14
          kl(lane, 11, 16) = K_10_15
          kl(lane, 11, 17) = K_10_16
          kl(lane, 11, 18) = K_10_17
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
          kl(lane, 12, 13) = K_11_12
          kl(lane, 12, 14) = K_11_13
          kl(lane, 12, 15) = K_11_14
          kl(lane, 12, 16) = K_11_15
          kl(lane, 12, 17) = K_11_16
          kl(lane, 12, 18) = K_11_17
          kl(lane, 13, 1) = K_0_12
          kl(lane, 13, 2) = K_1_12
          kl(lane, 13, 3) = K_2_12
          kl(lane, 13, 4) = K_3_12
          kl(lane, 13, 5) = K_4_12
          kl(lane, 13, 6) = K_5_12
          kl(lane, 13, 7) = K_6_12
          kl(lane, 13, 8) = K_7_12
          kl(lane, 13, 9) = K_8_12
          kl(lane, 13, 10) = K_9_12
          kl(lane, 13, 11) = K_10_12
          kl(lane, 13, 12) = K_11_12
          kl(lane, 13, 13) = K_12_12
          kl(lane, 13, 14) = K_12_13
          kl(lane, 13, 15) = K_12_14
          kl(lane, 13, 16) = K_12_15
          kl(lane, 13, 17) = K_12_16
          kl(lane, 13, 18) = K_12_17
          kl(lane, 14, 1) = K_0_13
          kl(lane, 14, 2) = K_1_13
          kl(lane, 14, 3) = K_2_13
          kl(lane, 14, 4) = K_3_13
          kl(lane, 14, 5) = K_4_13
          kl(lane, 14, 6) = K_5_13
          kl(lane, 14, 7) = K_6_13
          kl(lane, 14, 8) = K_7_13
          kl(lane, 14, 9) = K_8_13
          kl(lane, 14, 10) = K_9_13
          kl(lane, 14, 11) = K_10_13
          kl(lane, 14, 12) = K_11_13
          kl(lane, 14, 13) = K_12_13
          kl(lane, 14, 14) = K_13_13
          kl(lane, 14, 15) = K_13_14
          kl(lane, 14, 16) = K_13_15
          kl(lane, 14, 17) = K_13_16
          kl(lane, 14, 18) = K_13_17
          kl(lane, 15, 1) = K_0_14
          kl(lane, 15, 2) = K_1_14
          kl(lane, 15, 3) = K_2_14
          kl(lane, 15, 4) = K_3_14
          kl(lane, 15, 5) = K_4_14
          kl(lane, 15, 6) = K_5_14
          kl(lane, 15, 7) = K_6_14
          kl(lane, 15, 8) = K_7_14
          kl(lane, 15, 9) = K_8_14
          kl(lane, 15, 10) = K_9_14
          kl(lane, 15, 11) = K_10_14
          kl(lane, 15, 12) = K_11_14
          kl(lane, 15, 13) = K_12_14
          kl(lane, 15, 14) = K_13_14
          kl(lane, 15, 15) = K_14_14
          kl(lane, 15, 16) = K_14_15
          kl(lane, 15, 17) = K_14_16
          kl(lane, 15, 18) = K_14_17
          kl(lane, 16, 1) = K_0_15
          kl(lane, 16, 2) = K_1_15
          kl(lane, 16, 3) = K_2_15
          kl(lane, 16, 4) = K_3_15
          kl(lane, 16, 5) = K_4_15
          kl(lane, 16, 6) = K_5_15
          kl(lane, 16, 7) = K_6_15
          kl(lane, 16, 8) = K_7_15
          kl(lane, 16, 9) = K_8_15
          kl(lane, 16, 10) = K_9_15
          kl(lane, 16, 11) = K_10_15
          kl(lane, 16, 12) = K_11_15
          kl(lane, 16, 13) = K_12_15
          kl(lane, 16, 14) = K_13_15
          kl(lane, 16, 15) = K_14_15
          kl(lane, 16, 16) = K_15_15
          kl(lane, 16, 17) = K_15_16
          kl(lane, 16, 18) = K_15_17
          kl(lane, 17, 1) = K_0_16
          kl(lane, 17, 2) = K_1_16
          kl(lane, 17, 3) = K_2_16
          kl(lane, 17, 4) = K_3_16
          kl(lane, 17, 5) = K_4_16
          kl(lane, 17, 6) = K_5_16
          kl(lane, 17, 7) = K_6_16
          kl(lane, 17, 8) = K_7_16
          kl(lane, 17, 9) = K_8_16
          kl(lane, 17, 10) = K_9_16
          kl(lane, 17, 11) = K_10_16
          kl(lane, 17, 12) = K_11_16
          kl(lane, 17, 13) = K_12_16
          kl(lane, 17, 14) = K_13_16
          kl(lane, 17, 15) = K_14_16
          kl(lane, 17, 16) = K_15_16
          kl(lane, 17, 17) = K_16_16
          kl(lane, 17, 18) = K_16_17
          kl(lane, 18, 1) = K_0_17
          kl(lane, 18, 2) = K_1_17
          kl(lane, 18, 3) = K_2_17
          kl(lane, 18, 4) = K_3_17
          kl(lane, 18, 5) = K_4_17
          kl(lane, 18, 6) = K_5_17
          kl(lane, 18, 7) = K_6_17
          kl(lane, 18, 8) = K_7_17
          kl(lane, 18, 9) = K_8_17
          kl(lane, 18, 10) = K_9_17
          kl(lane, 18, 11) = K_10_17
          kl(lane, 18, 12) = K_11_17
          kl(lane, 18, 13) = K_12_17
          kl(lane, 18, 14) = K_13_17
          kl(lane, 18, 15) = K_14_17
          kl(lane, 18, 16) = K_15_17
          kl(lane, 18, 17) = K_16_17
          kl(lane, 18, 18) = K_17_17
        end block
      end do
      do lane = 1, mlan
        K(:, :, ib + lane - 1) = kl(lane, :, :)
      end do
    end do
  end subroutine q9_selective_plane_stress_stiffness_batch

  pure subroutine q9_selective_plane_stress_validity_one(xy, detJ_min)
    real(dp), intent(in) :: xy(2, 9)
    real(dp), intent(out) :: detJ_min
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, x9, y9, gx_0_1, gx_0_2
    real(dp) :: gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gx_2_2, gy_0_1, gy_0_2, gy_1_0, gy_1_1, gy_1_2
    real(dp) :: gy_2_0, gy_2_1, gy_2_2, dmin
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
    x9 = xy(1, 9)
    y9 = xy(2, 9)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = 0.5_dp*x5 + 0.5_dp*x7 - x9
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = 0.5_dp*x6 + 0.5_dp*x8 - x9
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_2 = x9 - 0.5_dp*x5 - 0.5_dp*x6 - 0.5_dp*x7 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 &
        + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = 0.5_dp*y5 + 0.5_dp*y7 - y9
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = 0.5_dp*y6 + 0.5_dp*y8 - y9
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_2 = y9 - 0.5_dp*y5 - 0.5_dp*y6 - 0.5_dp*y7 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 &
        + 0.25_dp*y3 + 0.25_dp*y4
    block   ! gauss-3x3 point 1 of 9: xi = -0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: q0, q1, J00, q2, q3, J01, J10, J11, detJ
      q0 = -0.9295160030897801_dp*gx_2_2
      q1 = -0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + q1 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 - 1.5491933384829668_dp*gx_2_0
      q2 = -0.9295160030897801_dp*gy_2_2
      q3 = -0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q2 + q3 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + q1 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q2 + q3 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 - 1.5491933384829668_dp*gy_0_2
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
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 0.9295160030897801_dp*gx_2_2 &
          + 1.5491933384829668_dp*gx_2_0 - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.9295160030897801_dp*gy_2_2 &
          + 1.5491933384829668_dp*gy_2_0 - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1 &
          - 0.9295160030897801_dp*gx_2_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1 &
          - 0.9295160030897801_dp*gy_2_2 - 1.5491933384829668_dp*gy_0_2
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
          - 0.9295160030897801_dp*gx_2_2 - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1 &
          - 0.9295160030897801_dp*gy_2_2 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.9295160030897801_dp*gx_2_2 &
          + 1.5491933384829668_dp*gx_0_2 - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.9295160030897801_dp*gy_2_2 &
          + 1.5491933384829668_dp*gy_0_2 - 0.7745966692414834_dp*gy_1_1
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
      real(dp) :: q0, q1, J00, q2, q3, J01, J10, J11, detJ
      q0 = 0.9295160030897801_dp*gx_2_2
      q1 = 0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + q1 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 + 1.5491933384829668_dp*gx_2_0
      q2 = 0.9295160030897801_dp*gy_2_2
      q3 = 0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q2 + q3 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + q1 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q2 + q3 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      dmin = min(dmin, detJ)
    end block
    detJ_min = dmin
  end subroutine q9_selective_plane_stress_validity_one

  pure subroutine q9_selective_plane_stress_validity(n, xy, detJ_min) &
      bind(C, name="derive_q9_selective_plane_stress_validity_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 9, n)
    real(dp), intent(out) :: detJ_min(n)
    integer(c_long) :: iel
    do iel = 1, n
      call q9_selective_plane_stress_validity_one(xy(:, :, iel), detJ_min(iel))
    end do
  end subroutine q9_selective_plane_stress_validity

  pure subroutine q9_selective_plane_stress_recovery_one(xy, u, E, nu, strain, stress)
    real(dp), intent(in) :: xy(2, 9), u(18)
    real(dp), intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 9), stress(3, 9)
    real(dp), parameter :: t = 1.0_dp
    real(dp) :: x1, y1, x2, y2, x3, y3, x4, y4, x5, y5, x6, y6, x7, y7, x8, y8, x9, y9, u1, u2, u3
    real(dp) :: u4, u5, u6, u7, u8, u9, u10, u11, u12, u13, u14, u15, u16, u17, u18, m4, m5, m6, gx_0_1
    real(dp) :: gx_0_2, gx_1_0, gx_1_1, gx_1_2, gx_2_0, gx_2_1, gx_2_2, gy_0_1, gy_0_2, gy_1_0, gy_1_1
    real(dp) :: gy_1_2, gy_2_0, gy_2_1, gy_2_2
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
    x9 = xy(1, 9)
    y9 = xy(2, 9)
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
    u17 = u(17)
    u18 = u(18)
    m4 = E/(1.0_dp - nu*nu)
    m5 = E*nu/(1.0_dp - nu*nu)
    m6 = E*(0.5_dp - 0.5_dp*nu)/(1.0_dp - nu*nu)
    gx_0_1 = 0.5_dp*x7 - 0.5_dp*x5
    gx_0_2 = 0.5_dp*x5 + 0.5_dp*x7 - x9
    gx_1_0 = 0.5_dp*x6 - 0.5_dp*x8
    gx_1_1 = -0.25_dp*x2 - 0.25_dp*x4 + 0.25_dp*x1 + 0.25_dp*x3
    gx_1_2 = 0.5_dp*x8 - 0.5_dp*x6 - 0.25_dp*x1 - 0.25_dp*x4 + 0.25_dp*x2 + 0.25_dp*x3
    gx_2_0 = 0.5_dp*x6 + 0.5_dp*x8 - x9
    gx_2_1 = 0.5_dp*x5 - 0.5_dp*x7 - 0.25_dp*x1 - 0.25_dp*x2 + 0.25_dp*x3 + 0.25_dp*x4
    gx_2_2 = x9 - 0.5_dp*x5 - 0.5_dp*x6 - 0.5_dp*x7 - 0.5_dp*x8 + 0.25_dp*x1 + 0.25_dp*x2 &
        + 0.25_dp*x3 + 0.25_dp*x4
    gy_0_1 = 0.5_dp*y7 - 0.5_dp*y5
    gy_0_2 = 0.5_dp*y5 + 0.5_dp*y7 - y9
    gy_1_0 = 0.5_dp*y6 - 0.5_dp*y8
    gy_1_1 = -0.25_dp*y2 - 0.25_dp*y4 + 0.25_dp*y1 + 0.25_dp*y3
    gy_1_2 = 0.5_dp*y8 - 0.5_dp*y6 - 0.25_dp*y1 - 0.25_dp*y4 + 0.25_dp*y2 + 0.25_dp*y3
    gy_2_0 = 0.5_dp*y6 + 0.5_dp*y8 - y9
    gy_2_1 = 0.5_dp*y5 - 0.5_dp*y7 - 0.25_dp*y1 - 0.25_dp*y2 + 0.25_dp*y3 + 0.25_dp*y4
    gy_2_2 = y9 - 0.5_dp*y5 - 0.5_dp*y6 - 0.5_dp*y7 - 0.5_dp*y8 + 0.25_dp*y1 + 0.25_dp*y2 &
        + 0.25_dp*y3 + 0.25_dp*y4
    block   ! gauss-3x3 point 1 of 9: xi = -0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: q0, q1, J00, q2, q3, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1
      real(dp) :: dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, dNdx9, dNdy9, eps78, eps79, eps80
      q0 = -0.9295160030897801_dp*gx_2_2
      q1 = -0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + q1 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 - 1.5491933384829668_dp*gx_2_0
      q2 = -0.9295160030897801_dp*gy_2_2
      q3 = -0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q2 + q3 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + q1 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q2 + q3 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.8760281680828158_dp*Ji00 - 0.8760281680828158_dp*Ji01
      dNdy1 = -0.8760281680828158_dp*Ji10 - 0.8760281680828158_dp*Ji11
      dNdx2 = 0.11127016653792583_dp*Ji01 - 0.18872983346207417_dp*Ji00
      dNdy2 = 0.11127016653792583_dp*Ji11 - 0.18872983346207417_dp*Ji10
      dNdx3 = 0.023971831917184144_dp*Ji00 + 0.023971831917184144_dp*Ji01
      dNdy3 = 0.023971831917184144_dp*Ji10 + 0.023971831917184144_dp*Ji11
      dNdx4 = 0.11127016653792583_dp*Ji00 - 0.18872983346207417_dp*Ji01
      dNdy4 = 0.11127016653792583_dp*Ji10 - 0.18872983346207417_dp*Ji11
      dNdx5 = 1.06475800154489_dp*Ji00 - 0.5098386676965934_dp*Ji01
      dNdy5 = 1.06475800154489_dp*Ji10 - 0.5098386676965934_dp*Ji11
      dNdx6 = -0.13524199845510998_dp*Ji01 - 0.10983866769659335_dp*Ji00
      dNdy6 = -0.13524199845510998_dp*Ji11 - 0.10983866769659335_dp*Ji10
      dNdx7 = -0.13524199845510998_dp*Ji00 - 0.10983866769659335_dp*Ji01
      dNdy7 = -0.13524199845510998_dp*Ji10 - 0.10983866769659335_dp*Ji11
      dNdx8 = 1.06475800154489_dp*Ji01 - 0.5098386676965934_dp*Ji00
      dNdy8 = 1.06475800154489_dp*Ji11 - 0.5098386676965934_dp*Ji10
      dNdx9 = 0.6196773353931867_dp*Ji00 + 0.6196773353931867_dp*Ji01
      dNdy9 = 0.6196773353931867_dp*Ji10 + 0.6196773353931867_dp*Ji11
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 1) = eps78
      strain(2, 1) = eps79
      strain(3, 1) = eps80
      stress(1, 1) = eps78*m4 + eps79*m5
      stress(2, 1) = eps78*m5 + eps79*m4
      stress(3, 1) = eps80*m6
    end block
    block   ! gauss-3x3 point 2 of 9: xi = 0, eta = -0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
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
      dNdx1 = -0.3436491673103708_dp*Ji00
      dNdy1 = -0.3436491673103708_dp*Ji10
      dNdx2 = 0.3436491673103708_dp*Ji00
      dNdy2 = 0.3436491673103708_dp*Ji10
      dNdx3 = -0.04364916731037084_dp*Ji00
      dNdy3 = -0.04364916731037084_dp*Ji10
      dNdx4 = 0.04364916731037084_dp*Ji00
      dNdy4 = 0.04364916731037084_dp*Ji10
      dNdx5 = -1.2745966692414834_dp*Ji01
      dNdy5 = -1.2745966692414834_dp*Ji11
      dNdx6 = 0.2_dp*Ji00
      dNdy6 = 0.2_dp*Ji10
      dNdx7 = -0.2745966692414834_dp*Ji01
      dNdy7 = -0.2745966692414834_dp*Ji11
      dNdx8 = -0.2_dp*Ji00
      dNdy8 = -0.2_dp*Ji10
      dNdx9 = 1.5491933384829668_dp*Ji01
      dNdy9 = 1.5491933384829668_dp*Ji11
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 2) = eps78
      strain(2, 2) = eps79
      strain(3, 2) = eps80
      stress(1, 2) = eps78*m4 + eps79*m5
      stress(2, 2) = eps78*m5 + eps79*m4
      stress(3, 2) = eps80*m6
    end block
    block   ! gauss-3x3 point 3 of 9: xi = 0.7745966692414834, eta = -0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 0.9295160030897801_dp*gx_2_2 &
          + 1.5491933384829668_dp*gx_2_0 - 0.7745966692414834_dp*gx_1_1
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.9295160030897801_dp*gy_2_2 &
          + 1.5491933384829668_dp*gy_2_0 - 0.7745966692414834_dp*gy_1_1
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.7745966692414834_dp*gx_1_1 &
          - 0.9295160030897801_dp*gx_2_2 - 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.7745966692414834_dp*gy_1_1 &
          - 0.9295160030897801_dp*gy_2_2 - 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.18872983346207417_dp*Ji00 + 0.11127016653792583_dp*Ji01
      dNdy1 = 0.18872983346207417_dp*Ji10 + 0.11127016653792583_dp*Ji11
      dNdx2 = 0.8760281680828158_dp*Ji00 - 0.8760281680828158_dp*Ji01
      dNdy2 = 0.8760281680828158_dp*Ji10 - 0.8760281680828158_dp*Ji11
      dNdx3 = -0.18872983346207417_dp*Ji01 - 0.11127016653792583_dp*Ji00
      dNdy3 = -0.18872983346207417_dp*Ji11 - 0.11127016653792583_dp*Ji10
      dNdx4 = 0.023971831917184144_dp*Ji01 - 0.023971831917184144_dp*Ji00
      dNdy4 = 0.023971831917184144_dp*Ji11 - 0.023971831917184144_dp*Ji10
      dNdx5 = -0.5098386676965934_dp*Ji01 - 1.06475800154489_dp*Ji00
      dNdy5 = -0.5098386676965934_dp*Ji11 - 1.06475800154489_dp*Ji10
      dNdx6 = 0.5098386676965934_dp*Ji00 + 1.06475800154489_dp*Ji01
      dNdy6 = 0.5098386676965934_dp*Ji10 + 1.06475800154489_dp*Ji11
      dNdx7 = 0.13524199845510998_dp*Ji00 - 0.10983866769659335_dp*Ji01
      dNdy7 = 0.13524199845510998_dp*Ji10 - 0.10983866769659335_dp*Ji11
      dNdx8 = 0.10983866769659335_dp*Ji00 - 0.13524199845510998_dp*Ji01
      dNdy8 = 0.10983866769659335_dp*Ji10 - 0.13524199845510998_dp*Ji11
      dNdx9 = 0.6196773353931867_dp*Ji01 - 0.6196773353931867_dp*Ji00
      dNdy9 = 0.6196773353931867_dp*Ji11 - 0.6196773353931867_dp*Ji10
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 3) = eps78
      strain(2, 3) = eps79
      strain(3, 3) = eps80
      stress(1, 3) = eps78*m4 + eps79*m5
      stress(2, 3) = eps78*m5 + eps79*m4
      stress(3, 3) = eps80*m6
    end block
    block   ! gauss-3x3 point 4 of 9: xi = -0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
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
      dNdx1 = -0.3436491673103708_dp*Ji01
      dNdy1 = -0.3436491673103708_dp*Ji11
      dNdx2 = 0.04364916731037084_dp*Ji01
      dNdy2 = 0.04364916731037084_dp*Ji11
      dNdx3 = -0.04364916731037084_dp*Ji01
      dNdy3 = -0.04364916731037084_dp*Ji11
      dNdx4 = 0.3436491673103708_dp*Ji01
      dNdy4 = 0.3436491673103708_dp*Ji11
      dNdx5 = -0.2_dp*Ji01
      dNdy5 = -0.2_dp*Ji11
      dNdx6 = -0.2745966692414834_dp*Ji00
      dNdy6 = -0.2745966692414834_dp*Ji10
      dNdx7 = 0.2_dp*Ji01
      dNdy7 = 0.2_dp*Ji11
      dNdx8 = -1.2745966692414834_dp*Ji00
      dNdy8 = -1.2745966692414834_dp*Ji10
      dNdx9 = 1.5491933384829668_dp*Ji00
      dNdy9 = 1.5491933384829668_dp*Ji10
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 4) = eps78
      strain(2, 4) = eps79
      strain(3, 4) = eps80
      stress(1, 4) = eps78*m4 + eps79*m5
      stress(2, 4) = eps78*m5 + eps79*m4
      stress(3, 4) = eps80*m6
    end block
    block   ! gauss-3x3 point 5 of 9: xi = 0, eta = 0, weight = 64/81
      real(dp) :: detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8
      real(dp) :: dNdy8, eps78, eps79, eps80
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
      eps78 = dNdx5*u9 + dNdx6*u11 + dNdx7*u13 + dNdx8*u15
      eps79 = dNdy5*u10 + dNdy6*u12 + dNdy7*u14 + dNdy8*u16
      eps80 = dNdx5*u10 + dNdx6*u12 + dNdx7*u14 + dNdx8*u16 + dNdy5*u9 + dNdy6*u11 + dNdy7*u13 &
          + dNdy8*u15
      strain(1, 5) = eps78
      strain(2, 5) = eps79
      strain(3, 5) = eps80
      stress(1, 5) = eps78*m4 + eps79*m5
      stress(2, 5) = eps78*m5 + eps79*m4
      stress(3, 5) = eps80*m6
    end block
    block   ! gauss-3x3 point 6 of 9: xi = 0.7745966692414834, eta = 0, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
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
      dNdx1 = 0.04364916731037084_dp*Ji01
      dNdy1 = 0.04364916731037084_dp*Ji11
      dNdx2 = -0.3436491673103708_dp*Ji01
      dNdy2 = -0.3436491673103708_dp*Ji11
      dNdx3 = 0.3436491673103708_dp*Ji01
      dNdy3 = 0.3436491673103708_dp*Ji11
      dNdx4 = -0.04364916731037084_dp*Ji01
      dNdy4 = -0.04364916731037084_dp*Ji11
      dNdx5 = -0.2_dp*Ji01
      dNdy5 = -0.2_dp*Ji11
      dNdx6 = 1.2745966692414834_dp*Ji00
      dNdy6 = 1.2745966692414834_dp*Ji10
      dNdx7 = 0.2_dp*Ji01
      dNdy7 = 0.2_dp*Ji11
      dNdx8 = 0.2745966692414834_dp*Ji00
      dNdy8 = 0.2745966692414834_dp*Ji10
      dNdx9 = -1.5491933384829668_dp*Ji00
      dNdy9 = -1.5491933384829668_dp*Ji10
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 6) = eps78
      strain(2, 6) = eps79
      strain(3, 6) = eps80
      stress(1, 6) = eps78*m4 + eps79*m5
      stress(2, 6) = eps78*m5 + eps79*m4
      stress(3, 6) = eps80*m6
    end block
    block   ! gauss-3x3 point 7 of 9: xi = -0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
      J00 = gx_1_0 - 1.2_dp*gx_2_1 + 0.6_dp*gx_1_2 + 0.7745966692414834_dp*gx_1_1 &
          - 0.9295160030897801_dp*gx_2_2 - 1.5491933384829668_dp*gx_2_0
      J01 = gy_1_0 - 1.2_dp*gy_2_1 + 0.6_dp*gy_1_2 + 0.7745966692414834_dp*gy_1_1 &
          - 0.9295160030897801_dp*gy_2_2 - 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 - 1.2_dp*gx_1_2 + 0.6_dp*gx_2_1 + 0.9295160030897801_dp*gx_2_2 &
          + 1.5491933384829668_dp*gx_0_2 - 0.7745966692414834_dp*gx_1_1
      J11 = gy_0_1 - 1.2_dp*gy_1_2 + 0.6_dp*gy_2_1 + 0.9295160030897801_dp*gy_2_2 &
          + 1.5491933384829668_dp*gy_0_2 - 0.7745966692414834_dp*gy_1_1
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = 0.18872983346207417_dp*Ji01 + 0.11127016653792583_dp*Ji00
      dNdy1 = 0.18872983346207417_dp*Ji11 + 0.11127016653792583_dp*Ji10
      dNdx2 = 0.023971831917184144_dp*Ji00 - 0.023971831917184144_dp*Ji01
      dNdy2 = 0.023971831917184144_dp*Ji10 - 0.023971831917184144_dp*Ji11
      dNdx3 = -0.18872983346207417_dp*Ji00 - 0.11127016653792583_dp*Ji01
      dNdy3 = -0.18872983346207417_dp*Ji10 - 0.11127016653792583_dp*Ji11
      dNdx4 = 0.8760281680828158_dp*Ji01 - 0.8760281680828158_dp*Ji00
      dNdy4 = 0.8760281680828158_dp*Ji11 - 0.8760281680828158_dp*Ji10
      dNdx5 = 0.10983866769659335_dp*Ji01 - 0.13524199845510998_dp*Ji00
      dNdy5 = 0.10983866769659335_dp*Ji11 - 0.13524199845510998_dp*Ji10
      dNdx6 = 0.13524199845510998_dp*Ji01 - 0.10983866769659335_dp*Ji00
      dNdy6 = 0.13524199845510998_dp*Ji11 - 0.10983866769659335_dp*Ji10
      dNdx7 = 0.5098386676965934_dp*Ji01 + 1.06475800154489_dp*Ji00
      dNdy7 = 0.5098386676965934_dp*Ji11 + 1.06475800154489_dp*Ji10
      dNdx8 = -0.5098386676965934_dp*Ji00 - 1.06475800154489_dp*Ji01
      dNdy8 = -0.5098386676965934_dp*Ji10 - 1.06475800154489_dp*Ji11
      dNdx9 = 0.6196773353931867_dp*Ji00 - 0.6196773353931867_dp*Ji01
      dNdy9 = 0.6196773353931867_dp*Ji10 - 0.6196773353931867_dp*Ji11
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 7) = eps78
      strain(2, 7) = eps79
      strain(3, 7) = eps80
      stress(1, 7) = eps78*m4 + eps79*m5
      stress(2, 7) = eps78*m5 + eps79*m4
      stress(3, 7) = eps80*m6
    end block
    block   ! gauss-3x3 point 8 of 9: xi = 0, eta = 0.7745966692414834, weight = 40/81
      real(dp) :: J00, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1, dNdx2, dNdy2
      real(dp) :: dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7, dNdx8, dNdy8
      real(dp) :: dNdx9, dNdy9, eps78, eps79, eps80
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
      dNdx1 = 0.04364916731037084_dp*Ji00
      dNdy1 = 0.04364916731037084_dp*Ji10
      dNdx2 = -0.04364916731037084_dp*Ji00
      dNdy2 = -0.04364916731037084_dp*Ji10
      dNdx3 = 0.3436491673103708_dp*Ji00
      dNdy3 = 0.3436491673103708_dp*Ji10
      dNdx4 = -0.3436491673103708_dp*Ji00
      dNdy4 = -0.3436491673103708_dp*Ji10
      dNdx5 = 0.2745966692414834_dp*Ji01
      dNdy5 = 0.2745966692414834_dp*Ji11
      dNdx6 = 0.2_dp*Ji00
      dNdy6 = 0.2_dp*Ji10
      dNdx7 = 1.2745966692414834_dp*Ji01
      dNdy7 = 1.2745966692414834_dp*Ji11
      dNdx8 = -0.2_dp*Ji00
      dNdy8 = -0.2_dp*Ji10
      dNdx9 = -1.5491933384829668_dp*Ji01
      dNdy9 = -1.5491933384829668_dp*Ji11
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 8) = eps78
      strain(2, 8) = eps79
      strain(3, 8) = eps80
      stress(1, 8) = eps78*m4 + eps79*m5
      stress(2, 8) = eps78*m5 + eps79*m4
      stress(3, 8) = eps80*m6
    end block
    block   ! gauss-3x3 point 9 of 9: xi = 0.7745966692414834, eta = 0.7745966692414834, weight = 25/81
      real(dp) :: q0, q1, J00, q2, q3, J01, J10, J11, detJ, idet, Ji00, Ji01, Ji10, Ji11, dNdx1, dNdy1
      real(dp) :: dNdx2, dNdy2, dNdx3, dNdy3, dNdx4, dNdy4, dNdx5, dNdy5, dNdx6, dNdy6, dNdx7, dNdy7
      real(dp) :: dNdx8, dNdy8, dNdx9, dNdy9, eps78, eps79, eps80
      q0 = 0.9295160030897801_dp*gx_2_2
      q1 = 0.7745966692414834_dp*gx_1_1
      J00 = gx_1_0 + q0 + q1 + 0.6_dp*gx_1_2 + 1.2_dp*gx_2_1 + 1.5491933384829668_dp*gx_2_0
      q2 = 0.9295160030897801_dp*gy_2_2
      q3 = 0.7745966692414834_dp*gy_1_1
      J01 = gy_1_0 + q2 + q3 + 0.6_dp*gy_1_2 + 1.2_dp*gy_2_1 + 1.5491933384829668_dp*gy_2_0
      J10 = gx_0_1 + q0 + q1 + 0.6_dp*gx_2_1 + 1.2_dp*gx_1_2 + 1.5491933384829668_dp*gx_0_2
      J11 = gy_0_1 + q2 + q3 + 0.6_dp*gy_2_1 + 1.2_dp*gy_1_2 + 1.5491933384829668_dp*gy_0_2
      detJ = J00*J11 - J01*J10
      idet = 1.0_dp/detJ
      Ji00 = J11*idet
      Ji01 = -J01*idet
      Ji10 = -J10*idet
      Ji11 = J00*idet
      dNdx1 = -0.023971831917184144_dp*Ji00 - 0.023971831917184144_dp*Ji01
      dNdy1 = -0.023971831917184144_dp*Ji10 - 0.023971831917184144_dp*Ji11
      dNdx2 = 0.18872983346207417_dp*Ji01 - 0.11127016653792583_dp*Ji00
      dNdy2 = 0.18872983346207417_dp*Ji11 - 0.11127016653792583_dp*Ji10
      dNdx3 = 0.8760281680828158_dp*Ji00 + 0.8760281680828158_dp*Ji01
      dNdy3 = 0.8760281680828158_dp*Ji10 + 0.8760281680828158_dp*Ji11
      dNdx4 = 0.18872983346207417_dp*Ji00 - 0.11127016653792583_dp*Ji01
      dNdy4 = 0.18872983346207417_dp*Ji10 - 0.11127016653792583_dp*Ji11
      dNdx5 = 0.13524199845510998_dp*Ji00 + 0.10983866769659335_dp*Ji01
      dNdy5 = 0.13524199845510998_dp*Ji10 + 0.10983866769659335_dp*Ji11
      dNdx6 = 0.5098386676965934_dp*Ji00 - 1.06475800154489_dp*Ji01
      dNdy6 = 0.5098386676965934_dp*Ji10 - 1.06475800154489_dp*Ji11
      dNdx7 = 0.5098386676965934_dp*Ji01 - 1.06475800154489_dp*Ji00
      dNdy7 = 0.5098386676965934_dp*Ji11 - 1.06475800154489_dp*Ji10
      dNdx8 = 0.13524199845510998_dp*Ji01 + 0.10983866769659335_dp*Ji00
      dNdy8 = 0.13524199845510998_dp*Ji11 + 0.10983866769659335_dp*Ji10
      dNdx9 = -0.6196773353931867_dp*Ji00 - 0.6196773353931867_dp*Ji01
      dNdy9 = -0.6196773353931867_dp*Ji10 - 0.6196773353931867_dp*Ji11
      eps78 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11 + dNdx7*u13 &
          + dNdx8*u15 + dNdx9*u17
      eps79 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12 + dNdy7*u14 &
          + dNdy8*u16 + dNdy9*u18
      eps80 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdx7*u14 &
          + dNdx8*u16 + dNdx9*u18 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 &
          + dNdy6*u11 + dNdy7*u13 + dNdy8*u15 + dNdy9*u17
      strain(1, 9) = eps78
      strain(2, 9) = eps79
      strain(3, 9) = eps80
      stress(1, 9) = eps78*m4 + eps79*m5
      stress(2, 9) = eps78*m5 + eps79*m4
      stress(3, 9) = eps80*m6
    end block
  end subroutine q9_selective_plane_stress_recovery_one

  pure subroutine q9_selective_plane_stress_recovery(n, xy, u, E, nu, strain, stress) &
      bind(C, name="derive_q9_selective_plane_stress_recovery_f")
    integer(c_long), value, intent(in) :: n
    real(dp), intent(in) :: xy(2, 9, n), u(18, n)
    real(dp), value, intent(in) :: E, nu
    real(dp), intent(out) :: strain(3, 9, n)
    real(dp), intent(out) :: stress(3, 9, n)
    integer(c_long) :: iel
    do iel = 1, n
      call q9_selective_plane_stress_recovery_one(xy(:, :, iel), u(:, iel), E, nu, &
                                   strain(:, :, iel), stress(:, :, iel))
    end do
  end subroutine q9_selective_plane_stress_recovery

end module derive_q9_selective_plane_stress
