/*
 * derive generated kernel: T6 selective plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      T6, 6 nodes, 12 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  selective integration: volumetric part of D with the reduced rule [Doherty, Wilson
 *              & Taylor (1969); Hughes (1987) Sec. 4.4]
 * integration  B^T D_dev B: triangle-d2 (3 points); B^T D_vol B (reduced rule): triangle-d1 (1
 *              point)
 * flops        stiffness 1514, validity 114, recovery 384 per element (add, mul, div, sqrt)
 *
 * arguments (units-agnostic; any consistent set of units):
 *   xy      nodal coordinates, shape (n, 6, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
 *           node i+1 (counter-clockwise corners first, then mid-side, then interior)
 *   E       Young's modulus (> 0), scalar
 *   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
 *   t       thickness t (the out-of-plane thickness)
 *   u       nodal displacements for recovery, shape (n, 12), interleaved u1, v1, u2, v2, ...
 *   K       stiffness, shape (n, 12, 12), DOFs interleaved u1, v1, u2, v2, ...; symmetric
 *   detJ_min validity: min det J over the points of triangle-d2, shape (n,); <= 0 means an
 *            inverted or degenerate element
 *   strain  recovery: strain at the 3 points of triangle-d2, shape (n, 3, 3), Voigt [eps_xx,
 *           eps_yy, gamma_xy] (engineering shear)
 *   stress  recovery: stress D strain at the same points, shape (n, 3, 3), [sigma_xx, sigma_yy,
 *           tau_xy]
 *
 * The kernels do not check their inputs; derive.kernel() checks shapes, finite
 * coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
 * generator    derive.codegen 1.0; regenerate with
 *              derive kernel T6 --variant selective --state plane-stress --lang c
 *
 * C99.  Compile e.g. with: cc -O3 -march=native -c t6_selective_plane_stress.c
 * (with GCC add -fno-tree-slp-vectorize: same speed, much shorter compile times).
 * Data layout: every array is dense, row-major (C order), float64.  The batch kernel
 * copies 8 elements at a time into element-innermost scratch arrays so that the
 * per-element body is vectorised across elements (one SIMD lane per element).
 */
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <string.h>
#include "t6_selective_plane_stress.h"

/* Large batches store K with non-temporal (streaming) stores on x86, which skips the
 * read-for-ownership of the output and roughly halves the memory traffic; define
 * DERIVE_NO_STREAM to use plain stores.  Other targets use memcpy. */
#if !defined(DERIVE_NO_STREAM) && defined(__AVX512F__)
#include <immintrin.h>
#define DERIVE_VEC 8
#define DERIVE_STREAM_PD(p, s) _mm512_stream_pd((p), _mm512_loadu_pd(s))
#elif !defined(DERIVE_NO_STREAM) && defined(__AVX__)
#include <immintrin.h>
#define DERIVE_VEC 4
#define DERIVE_STREAM_PD(p, s) _mm256_stream_pd((p), _mm256_loadu_pd(s))
#elif !defined(DERIVE_NO_STREAM) && defined(__SSE2__)
#include <emmintrin.h>
#define DERIVE_VEC 2
#define DERIVE_STREAM_PD(p, s) _mm_stream_pd((p), _mm_loadu_pd(s))
#endif

#define NIN 12
#define NK 144
#define NMAT 10
#define LANES 8
#if defined(__GNUC__)
/* inlined into the lane loop so that the loop over elements vectorises */
#define DERIVE_INLINE static inline __attribute__((always_inline))
#else
#define DERIVE_INLINE static inline
#endif

/* point tables of the rules evaluated in a loop: shape-function derivatives, weights, ... */
/* c0 = 2*xi at the points of triangle-d2 */
static const double KS0_c0[3] = {
    0.3333333333333333, 1.3333333333333333, 0.3333333333333333
};
/* c1 = 2*eta at the points of triangle-d2 */
static const double KS0_c1[3] = {
    0.3333333333333333, 0.3333333333333333, 1.3333333333333333
};
/* c2 = 4*eta + 4*xi - 3 at the points of triangle-d2 */
static const double KS0_c2[3] = {
    -1.6666666666666667, 0.3333333333333333, 0.3333333333333333
};
/* c3 = 4*xi - 1 at the points of triangle-d2 */
static const double KS0_c3[3] = {
    -0.3333333333333333, 1.6666666666666667, -0.3333333333333333
};
/* c4 = 4*eta - 1 at the points of triangle-d2 */
static const double KS0_c4[3] = {
    -0.3333333333333333, -0.3333333333333333, 1.6666666666666667
};
/* c5 = -4*eta - 8*xi + 4 at the points of triangle-d2 */
static const double KS0_c5[3] = {
    2.0, -2.0, 0.0
};
/* c6 = -4*xi at the points of triangle-d2 */
static const double KS0_c6[3] = {
    -0.6666666666666666, -2.6666666666666665, -0.6666666666666666
};
/* c7 = 4*eta at the points of triangle-d2 */
static const double KS0_c7[3] = {
    0.6666666666666666, 0.6666666666666666, 2.6666666666666665
};
/* c8 = 4*xi at the points of triangle-d2 */
static const double KS0_c8[3] = {
    0.6666666666666666, 2.6666666666666665, 0.6666666666666666
};
/* c9 = -4*eta at the points of triangle-d2 */
static const double KS0_c9[3] = {
    -0.6666666666666666, -0.6666666666666666, -2.6666666666666665
};
/* c10 = -8*eta - 4*xi + 4 at the points of triangle-d2 */
static const double KS0_c10[3] = {
    2.0, 0.0, -2.0
};
/* eta = eta at the points of triangle-d2 */
static const double KS0_eta[3] = {
    0.16666666666666666, 0.16666666666666666, 0.6666666666666666
};
/* w = the point weight at the points of triangle-d2 */
static const double KS0_w[3] = {
    0.16666666666666666, 0.16666666666666666, 0.16666666666666666
};
/* xi = xi at the points of triangle-d2 */
static const double KS0_xi[3] = {
    0.16666666666666666, 0.6666666666666666, 0.16666666666666666
};

/* material table: E, nu, t, then the material constants the kernels use */
static inline void t6_selective_plane_stress_material(double E, double nu, double t, double *restrict mat)
{
    mat[0] = E;
    mat[1] = nu;
    mat[2] = t;
    mat[3] = 2.0*E/(3.0 + 3.0*nu);   /* m0 */
    mat[4] = -E/(3.0 + 3.0*nu);   /* m1 */
    mat[5] = E/(2.0 + 2.0*nu);   /* m2 */
    mat[6] = (-E - 2.0*E*nu)/(-3.0 + 3.0*nu*nu);   /* m3 */
    mat[7] = E/(1.0 - nu*nu);   /* m4 */
    mat[8] = E*nu/(1.0 - nu*nu);   /* m5 */
    mat[9] = E*(0.5 - 0.5*nu)/(1.0 - nu*nu);   /* m6 */
}

/* stiffness of one element; xy[k * sx] is input k, K[k * sk] output k (row-major) */
DERIVE_INLINE void t6_selective_plane_stress_stiffness_body(const double *restrict xy, const ptrdiff_t sx,
                                             const double *restrict mat, double *restrict K,
                                             const ptrdiff_t sk)
{
    const double x1 = xy[0 * sx];
    const double y1 = xy[1 * sx];
    const double x2 = xy[2 * sx];
    const double y2 = xy[3 * sx];
    const double x3 = xy[4 * sx];
    const double y3 = xy[5 * sx];
    const double x4 = xy[6 * sx];
    const double y4 = xy[7 * sx];
    const double x5 = xy[8 * sx];
    const double y5 = xy[9 * sx];
    const double x6 = xy[10 * sx];
    const double y6 = xy[11 * sx];
    const double t = mat[2];
    const double m0 = mat[3];
    const double m1 = mat[4];
    const double m2 = mat[5];
    const double m3 = mat[6];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -x3 - 3.0*x1 + 4.0*x6;
    const double gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3;
    const double gx_1_0 = -x2 - 3.0*x1 + 4.0*x4;
    const double gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5;
    const double gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2;
    const double gy_0_1 = -y3 - 3.0*y1 + 4.0*y6;
    const double gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3;
    const double gy_1_0 = -y2 - 3.0*y1 + 4.0*y4;
    const double gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5;
    const double gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2;
    double K_0_0 = 0.0, K_0_1 = 0.0, K_0_2 = 0.0, K_0_3 = 0.0, K_0_4 = 0.0, K_0_5 = 0.0, K_0_6 = 0.0;
    double K_0_7 = 0.0, K_0_8 = 0.0, K_0_9 = 0.0, K_0_10 = 0.0, K_0_11 = 0.0, K_1_1 = 0.0;
    double K_1_2 = 0.0, K_1_3 = 0.0, K_1_4 = 0.0, K_1_5 = 0.0, K_1_6 = 0.0, K_1_7 = 0.0, K_1_8 = 0.0;
    double K_1_9 = 0.0, K_1_10 = 0.0, K_1_11 = 0.0, K_2_2 = 0.0, K_2_3 = 0.0, K_2_4 = 0.0;
    double K_2_5 = 0.0, K_2_6 = 0.0, K_2_7 = 0.0, K_2_8 = 0.0, K_2_9 = 0.0, K_2_10 = 0.0;
    double K_2_11 = 0.0, K_3_3 = 0.0, K_3_4 = 0.0, K_3_5 = 0.0, K_3_6 = 0.0, K_3_7 = 0.0;
    double K_3_8 = 0.0, K_3_9 = 0.0, K_3_10 = 0.0, K_3_11 = 0.0, K_4_4 = 0.0, K_4_5 = 0.0;
    double K_4_6 = 0.0, K_4_7 = 0.0, K_4_8 = 0.0, K_4_9 = 0.0, K_4_10 = 0.0, K_4_11 = 0.0;
    double K_5_5 = 0.0, K_5_6 = 0.0, K_5_7 = 0.0, K_5_8 = 0.0, K_5_9 = 0.0, K_5_10 = 0.0;
    double K_5_11 = 0.0, K_6_6 = 0.0, K_6_7 = 0.0, K_6_8 = 0.0, K_6_9 = 0.0, K_6_10 = 0.0;
    double K_6_11 = 0.0, K_7_7 = 0.0, K_7_8 = 0.0, K_7_9 = 0.0, K_7_10 = 0.0, K_7_11 = 0.0;
    double K_8_8 = 0.0, K_8_9 = 0.0, K_8_10 = 0.0, K_8_11 = 0.0, K_9_9 = 0.0, K_9_10 = 0.0;
    double K_9_11 = 0.0, K_10_10 = 0.0, K_10_11 = 0.0, K_11_11 = 0.0;
    for (int p = 0; p < 3; ++p) {   /* triangle-d2: loop over the 3 points */
        const double c0 = KS0_c0[p];
        const double c1 = KS0_c1[p];
        const double c2 = KS0_c2[p];
        const double c3 = KS0_c3[p];
        const double c4 = KS0_c4[p];
        const double c5 = KS0_c5[p];
        const double c6 = KS0_c6[p];
        const double c7 = KS0_c7[p];
        const double c8 = KS0_c8[p];
        const double c9 = KS0_c9[p];
        const double c10 = KS0_c10[p];
        const double eta = KS0_eta[p];
        const double w = KS0_w[p];
        const double xi = KS0_xi[p];
        const double J00 = gx_1_0 + c0*gx_2_0 + eta*gx_1_1;
        const double J01 = gy_1_0 + c0*gy_2_0 + eta*gy_1_1;
        const double J10 = gx_0_1 + c1*gx_0_2 + gx_1_1*xi;
        const double J11 = gy_0_1 + c1*gy_0_2 + gy_1_1*xi;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = Ji00*c2 + Ji01*c2;
        const double dNdy1 = Ji10*c2 + Ji11*c2;
        const double dNdx2 = Ji00*c3;
        const double dNdy2 = Ji10*c3;
        const double dNdx3 = Ji01*c4;
        const double dNdy3 = Ji11*c4;
        const double dNdx4 = Ji00*c5 + Ji01*c6;
        const double dNdy4 = Ji10*c5 + Ji11*c6;
        const double dNdx5 = Ji00*c7 + Ji01*c8;
        const double dNdy5 = Ji10*c7 + Ji11*c8;
        const double dNdx6 = Ji00*c9 + Ji01*c10;
        const double dNdy6 = Ji10*c9 + Ji11*c10;
        const double sc0 = detJ*t*w;
        const double s1 = m0*sc0;
        const double s2 = m1*sc0;
        const double s3 = m2*sc0;
        const double T4 = dNdx1*s1;
        const double T6 = dNdy1*s3;
        const double T7 = dNdy1*s2;
        const double T8 = dNdy1*s1;
        const double T9 = dNdx1*s3;
        const double T10 = dNdx2*s1;
        const double T11 = dNdx2*s2;
        const double T12 = dNdy2*s3;
        const double T13 = dNdy2*s2;
        const double T14 = dNdy2*s1;
        const double T15 = dNdx2*s3;
        const double T16 = dNdx3*s1;
        const double T17 = dNdx3*s2;
        const double T18 = dNdy3*s3;
        const double T19 = dNdy3*s2;
        const double T20 = dNdy3*s1;
        const double T21 = dNdx3*s3;
        const double T22 = dNdx4*s1;
        const double T23 = dNdx4*s2;
        const double T24 = dNdy4*s3;
        const double T25 = dNdy4*s2;
        const double T26 = dNdy4*s1;
        const double T27 = dNdx4*s3;
        const double T28 = dNdx5*s1;
        const double T29 = dNdx5*s2;
        const double T30 = dNdy5*s3;
        const double T31 = dNdy5*s2;
        const double T32 = dNdy5*s1;
        const double T33 = dNdx5*s3;
        const double T34 = dNdx6*s1;
        const double T35 = dNdx6*s2;
        const double T36 = dNdy6*s3;
        const double T37 = dNdy6*s2;
        const double T38 = dNdy6*s1;
        const double T39 = dNdx6*s3;
        K_0_0 += T4*dNdx1 + T6*dNdy1;
        K_0_1 += T7*dNdx1 + T9*dNdy1;
        K_0_2 += T10*dNdx1 + T12*dNdy1;
        K_0_3 += T13*dNdx1 + T15*dNdy1;
        K_0_4 += T16*dNdx1 + T18*dNdy1;
        K_0_5 += T19*dNdx1 + T21*dNdy1;
        K_0_6 += T22*dNdx1 + T24*dNdy1;
        K_0_7 += T25*dNdx1 + T27*dNdy1;
        K_0_8 += T28*dNdx1 + T30*dNdy1;
        K_0_9 += T31*dNdx1 + T33*dNdy1;
        K_0_10 += T34*dNdx1 + T36*dNdy1;
        K_0_11 += T37*dNdx1 + T39*dNdy1;
        K_1_1 += T8*dNdy1 + T9*dNdx1;
        K_1_2 += T11*dNdy1 + T12*dNdx1;
        K_1_3 += T14*dNdy1 + T15*dNdx1;
        K_1_4 += T17*dNdy1 + T18*dNdx1;
        K_1_5 += T20*dNdy1 + T21*dNdx1;
        K_1_6 += T23*dNdy1 + T24*dNdx1;
        K_1_7 += T26*dNdy1 + T27*dNdx1;
        K_1_8 += T29*dNdy1 + T30*dNdx1;
        K_1_9 += T32*dNdy1 + T33*dNdx1;
        K_1_10 += T35*dNdy1 + T36*dNdx1;
        K_1_11 += T38*dNdy1 + T39*dNdx1;
        K_2_2 += T10*dNdx2 + T12*dNdy2;
        K_2_3 += T13*dNdx2 + T15*dNdy2;
        K_2_4 += T16*dNdx2 + T18*dNdy2;
        K_2_5 += T19*dNdx2 + T21*dNdy2;
        K_2_6 += T22*dNdx2 + T24*dNdy2;
        K_2_7 += T25*dNdx2 + T27*dNdy2;
        K_2_8 += T28*dNdx2 + T30*dNdy2;
        K_2_9 += T31*dNdx2 + T33*dNdy2;
        K_2_10 += T34*dNdx2 + T36*dNdy2;
        K_2_11 += T37*dNdx2 + T39*dNdy2;
        K_3_3 += T14*dNdy2 + T15*dNdx2;
        K_3_4 += T17*dNdy2 + T18*dNdx2;
        K_3_5 += T20*dNdy2 + T21*dNdx2;
        K_3_6 += T23*dNdy2 + T24*dNdx2;
        K_3_7 += T26*dNdy2 + T27*dNdx2;
        K_3_8 += T29*dNdy2 + T30*dNdx2;
        K_3_9 += T32*dNdy2 + T33*dNdx2;
        K_3_10 += T35*dNdy2 + T36*dNdx2;
        K_3_11 += T38*dNdy2 + T39*dNdx2;
        K_4_4 += T16*dNdx3 + T18*dNdy3;
        K_4_5 += T19*dNdx3 + T21*dNdy3;
        K_4_6 += T22*dNdx3 + T24*dNdy3;
        K_4_7 += T25*dNdx3 + T27*dNdy3;
        K_4_8 += T28*dNdx3 + T30*dNdy3;
        K_4_9 += T31*dNdx3 + T33*dNdy3;
        K_4_10 += T34*dNdx3 + T36*dNdy3;
        K_4_11 += T37*dNdx3 + T39*dNdy3;
        K_5_5 += T20*dNdy3 + T21*dNdx3;
        K_5_6 += T23*dNdy3 + T24*dNdx3;
        K_5_7 += T26*dNdy3 + T27*dNdx3;
        K_5_8 += T29*dNdy3 + T30*dNdx3;
        K_5_9 += T32*dNdy3 + T33*dNdx3;
        K_5_10 += T35*dNdy3 + T36*dNdx3;
        K_5_11 += T38*dNdy3 + T39*dNdx3;
        K_6_6 += T22*dNdx4 + T24*dNdy4;
        K_6_7 += T25*dNdx4 + T27*dNdy4;
        K_6_8 += T28*dNdx4 + T30*dNdy4;
        K_6_9 += T31*dNdx4 + T33*dNdy4;
        K_6_10 += T34*dNdx4 + T36*dNdy4;
        K_6_11 += T37*dNdx4 + T39*dNdy4;
        K_7_7 += T26*dNdy4 + T27*dNdx4;
        K_7_8 += T29*dNdy4 + T30*dNdx4;
        K_7_9 += T32*dNdy4 + T33*dNdx4;
        K_7_10 += T35*dNdy4 + T36*dNdx4;
        K_7_11 += T38*dNdy4 + T39*dNdx4;
        K_8_8 += T28*dNdx5 + T30*dNdy5;
        K_8_9 += T31*dNdx5 + T33*dNdy5;
        K_8_10 += T34*dNdx5 + T36*dNdy5;
        K_8_11 += T37*dNdx5 + T39*dNdy5;
        K_9_9 += T32*dNdy5 + T33*dNdx5;
        K_9_10 += T35*dNdy5 + T36*dNdx5;
        K_9_11 += T38*dNdy5 + T39*dNdx5;
        K_10_10 += T34*dNdx6 + T36*dNdy6;
        K_10_11 += T37*dNdx6 + T39*dNdy6;
        K_11_11 += T38*dNdy6 + T39*dNdx6;
    }
    {   /* triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2 */
        const double q0 = 0.3333333333333333*gx_1_1;
        const double J00 = gx_1_0 + q0 + 0.6666666666666666*gx_2_0;
        const double q1 = 0.3333333333333333*gy_1_1;
        const double J01 = gy_1_0 + q1 + 0.6666666666666666*gy_2_0;
        const double J10 = gx_0_1 + q0 + 0.6666666666666666*gx_0_2;
        const double J11 = gy_0_1 + q1 + 0.6666666666666666*gy_0_2;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = -0.3333333333333333*Ji00 - 0.3333333333333333*Ji01;
        const double dNdy1 = -0.3333333333333333*Ji10 - 0.3333333333333333*Ji11;
        const double dNdx2 = 0.3333333333333333*Ji00;
        const double dNdy2 = 0.3333333333333333*Ji10;
        const double dNdx3 = 0.3333333333333333*Ji01;
        const double dNdy3 = 0.3333333333333333*Ji11;
        const double dNdx4 = -1.3333333333333333*Ji01;
        const double dNdy4 = -1.3333333333333333*Ji11;
        const double dNdx5 = 1.3333333333333333*Ji00 + 1.3333333333333333*Ji01;
        const double dNdy5 = 1.3333333333333333*Ji10 + 1.3333333333333333*Ji11;
        const double dNdx6 = -1.3333333333333333*Ji00;
        const double dNdy6 = -1.3333333333333333*Ji10;
        const double sc40 = 0.5*detJ*t;
        const double s41 = m3*sc40;
        const double T42 = dNdx1*s41;
        const double T43 = dNdy1*s41;
        const double T44 = dNdx2*s41;
        const double T45 = dNdy2*s41;
        const double T46 = dNdx3*s41;
        const double T47 = dNdy3*s41;
        const double T48 = dNdx4*s41;
        const double T49 = dNdy4*s41;
        const double T50 = dNdx5*s41;
        const double T51 = dNdy5*s41;
        const double T52 = dNdx6*s41;
        const double T53 = dNdy6*s41;
        K_0_0 += T42*dNdx1;
        K_0_1 += T43*dNdx1;
        K_0_2 += T44*dNdx1;
        K_0_3 += T45*dNdx1;
        K_0_4 += T46*dNdx1;
        K_0_5 += T47*dNdx1;
        K_0_6 += T48*dNdx1;
        K_0_7 += T49*dNdx1;
        K_0_8 += T50*dNdx1;
        K_0_9 += T51*dNdx1;
        K_0_10 += T52*dNdx1;
        K_0_11 += T53*dNdx1;
        K_1_1 += T43*dNdy1;
        K_1_2 += T44*dNdy1;
        K_1_3 += T45*dNdy1;
        K_1_4 += T46*dNdy1;
        K_1_5 += T47*dNdy1;
        K_1_6 += T48*dNdy1;
        K_1_7 += T49*dNdy1;
        K_1_8 += T50*dNdy1;
        K_1_9 += T51*dNdy1;
        K_1_10 += T52*dNdy1;
        K_1_11 += T53*dNdy1;
        K_2_2 += T44*dNdx2;
        K_2_3 += T45*dNdx2;
        K_2_4 += T46*dNdx2;
        K_2_5 += T47*dNdx2;
        K_2_6 += T48*dNdx2;
        K_2_7 += T49*dNdx2;
        K_2_8 += T50*dNdx2;
        K_2_9 += T51*dNdx2;
        K_2_10 += T52*dNdx2;
        K_2_11 += T53*dNdx2;
        K_3_3 += T45*dNdy2;
        K_3_4 += T46*dNdy2;
        K_3_5 += T47*dNdy2;
        K_3_6 += T48*dNdy2;
        K_3_7 += T49*dNdy2;
        K_3_8 += T50*dNdy2;
        K_3_9 += T51*dNdy2;
        K_3_10 += T52*dNdy2;
        K_3_11 += T53*dNdy2;
        K_4_4 += T46*dNdx3;
        K_4_5 += T47*dNdx3;
        K_4_6 += T48*dNdx3;
        K_4_7 += T49*dNdx3;
        K_4_8 += T50*dNdx3;
        K_4_9 += T51*dNdx3;
        K_4_10 += T52*dNdx3;
        K_4_11 += T53*dNdx3;
        K_5_5 += T47*dNdy3;
        K_5_6 += T48*dNdy3;
        K_5_7 += T49*dNdy3;
        K_5_8 += T50*dNdy3;
        K_5_9 += T51*dNdy3;
        K_5_10 += T52*dNdy3;
        K_5_11 += T53*dNdy3;
        K_6_6 += T48*dNdx4;
        K_6_7 += T49*dNdx4;
        K_6_8 += T50*dNdx4;
        K_6_9 += T51*dNdx4;
        K_6_10 += T52*dNdx4;
        K_6_11 += T53*dNdx4;
        K_7_7 += T49*dNdy4;
        K_7_8 += T50*dNdy4;
        K_7_9 += T51*dNdy4;
        K_7_10 += T52*dNdy4;
        K_7_11 += T53*dNdy4;
        K_8_8 += T50*dNdx5;
        K_8_9 += T51*dNdx5;
        K_8_10 += T52*dNdx5;
        K_8_11 += T53*dNdx5;
        K_9_9 += T51*dNdy5;
        K_9_10 += T52*dNdy5;
        K_9_11 += T53*dNdy5;
        K_10_10 += T52*dNdx6;
        K_10_11 += T53*dNdx6;
        K_11_11 += T53*dNdy6;
    }
    K[0 * sk] = K_0_0;
    K[1 * sk] = K_0_1;
    K[2 * sk] = K_0_2;
    K[3 * sk] = K_0_3;
    K[4 * sk] = K_0_4;
    K[5 * sk] = K_0_5;
    K[6 * sk] = K_0_6;
    K[7 * sk] = K_0_7;
    K[8 * sk] = K_0_8;
    K[9 * sk] = K_0_9;
    K[10 * sk] = K_0_10;
    K[11 * sk] = K_0_11;
    K[12 * sk] = K_0_1;
    K[13 * sk] = K_1_1;
    K[14 * sk] = K_1_2;
    K[15 * sk] = K_1_3;
    K[16 * sk] = K_1_4;
    K[17 * sk] = K_1_5;
    K[18 * sk] = K_1_6;
    K[19 * sk] = K_1_7;
    K[20 * sk] = K_1_8;
    K[21 * sk] = K_1_9;
    K[22 * sk] = K_1_10;
    K[23 * sk] = K_1_11;
    K[24 * sk] = K_0_2;
    K[25 * sk] = K_1_2;
    K[26 * sk] = K_2_2;
    K[27 * sk] = K_2_3;
    K[28 * sk] = K_2_4;
    K[29 * sk] = K_2_5;
    K[30 * sk] = K_2_6;
    K[31 * sk] = K_2_7;
    K[32 * sk] = K_2_8;
    K[33 * sk] = K_2_9;
    K[34 * sk] = K_2_10;
    K[35 * sk] = K_2_11;
    K[36 * sk] = K_0_3;
    K[37 * sk] = K_1_3;
    K[38 * sk] = K_2_3;
    K[39 * sk] = K_3_3;
    K[40 * sk] = K_3_4;
    K[41 * sk] = K_3_5;
    K[42 * sk] = K_3_6;
    K[43 * sk] = K_3_7;
    K[44 * sk] = K_3_8;
    K[45 * sk] = K_3_9;
    K[46 * sk] = K_3_10;
    K[47 * sk] = K_3_11;
    K[48 * sk] = K_0_4;
    K[49 * sk] = K_1_4;
    K[50 * sk] = K_2_4;
    K[51 * sk] = K_3_4;
    K[52 * sk] = K_4_4;
    K[53 * sk] = K_4_5;
    K[54 * sk] = K_4_6;
    K[55 * sk] = K_4_7;
    K[56 * sk] = K_4_8;
    K[57 * sk] = K_4_9;
    K[58 * sk] = K_4_10;
    K[59 * sk] = K_4_11;
    K[60 * sk] = K_0_5;
    K[61 * sk] = K_1_5;
    K[62 * sk] = K_2_5;
    K[63 * sk] = K_3_5;
    K[64 * sk] = K_4_5;
    K[65 * sk] = K_5_5;
    K[66 * sk] = K_5_6;
    K[67 * sk] = K_5_7;
    K[68 * sk] = K_5_8;
    K[69 * sk] = K_5_9;
    K[70 * sk] = K_5_10;
    K[71 * sk] = K_5_11;
    K[72 * sk] = K_0_6;
    K[73 * sk] = K_1_6;
    K[74 * sk] = K_2_6;
    K[75 * sk] = K_3_6;
    K[76 * sk] = K_4_6;
    K[77 * sk] = K_5_6;
    K[78 * sk] = K_6_6;
    K[79 * sk] = K_6_7;
    K[80 * sk] = K_6_8;
    K[81 * sk] = K_6_9;
    K[82 * sk] = K_6_10;
    K[83 * sk] = K_6_11;
    K[84 * sk] = K_0_7;
    K[85 * sk] = K_1_7;
    K[86 * sk] = K_2_7;
    K[87 * sk] = K_3_7;
    K[88 * sk] = K_4_7;
    K[89 * sk] = K_5_7;
    K[90 * sk] = K_6_7;
    K[91 * sk] = K_7_7;
    K[92 * sk] = K_7_8;
    K[93 * sk] = K_7_9;
    K[94 * sk] = K_7_10;
    K[95 * sk] = K_7_11;
    K[96 * sk] = K_0_8;
    K[97 * sk] = K_1_8;
    K[98 * sk] = K_2_8;
    K[99 * sk] = K_3_8;
    K[100 * sk] = K_4_8;
    K[101 * sk] = K_5_8;
    K[102 * sk] = K_6_8;
    K[103 * sk] = K_7_8;
    K[104 * sk] = K_8_8;
    K[105 * sk] = K_8_9;
    K[106 * sk] = K_8_10;
    K[107 * sk] = K_8_11;
    K[108 * sk] = K_0_9;
    K[109 * sk] = K_1_9;
    K[110 * sk] = K_2_9;
    K[111 * sk] = K_3_9;
    K[112 * sk] = K_4_9;
    K[113 * sk] = K_5_9;
    K[114 * sk] = K_6_9;
    K[115 * sk] = K_7_9;
    K[116 * sk] = K_8_9;
    K[117 * sk] = K_9_9;
    K[118 * sk] = K_9_10;
    K[119 * sk] = K_9_11;
    K[120 * sk] = K_0_10;
    K[121 * sk] = K_1_10;
    K[122 * sk] = K_2_10;
    K[123 * sk] = K_3_10;
    K[124 * sk] = K_4_10;
    K[125 * sk] = K_5_10;
    K[126 * sk] = K_6_10;
    K[127 * sk] = K_7_10;
    K[128 * sk] = K_8_10;
    K[129 * sk] = K_9_10;
    K[130 * sk] = K_10_10;
    K[131 * sk] = K_10_11;
    K[132 * sk] = K_0_11;
    K[133 * sk] = K_1_11;
    K[134 * sk] = K_2_11;
    K[135 * sk] = K_3_11;
    K[136 * sk] = K_4_11;
    K[137 * sk] = K_5_11;
    K[138 * sk] = K_6_11;
    K[139 * sk] = K_7_11;
    K[140 * sk] = K_8_11;
    K[141 * sk] = K_9_11;
    K[142 * sk] = K_10_11;
    K[143 * sk] = K_11_11;
}

void derive_t6_selective_plane_stress_stiffness(const double *restrict xy, double E, double nu, double t, double *restrict K)
{
    double mat[NMAT];
    t6_selective_plane_stress_material(E, nu, t, mat);
    t6_selective_plane_stress_stiffness_body(xy, 1, mat, K, 1);
}

/* copy count doubles to dst, streaming (non-temporal) where dst is vector-aligned */
static inline void t6_selective_plane_stress_store(double *restrict dst, const double *restrict src, long count, int stream)
{
#ifdef DERIVE_VEC
    if (stream) {
        long k = 0;
        while (k < count && ((uintptr_t)(dst + k) % (DERIVE_VEC * sizeof(double))) != 0) {
            dst[k] = src[k];
            ++k;
        }
        for (; k + DERIVE_VEC <= count; k += DERIVE_VEC)
            DERIVE_STREAM_PD(dst + k, src + k);
        for (; k < count; ++k)
            dst[k] = src[k];
        return;
    }
#endif
    (void)stream;
    memcpy(dst, src, (size_t)count * sizeof(double));
}

/* rows[l][k] = out[k][l]: lane-major scratch back to element-major (8 x 8 blocks in
 * registers with AVX-512, element by element otherwise) */
static inline void t6_selective_plane_stress_transpose(const double *restrict out, double *restrict rows, long m)
{
    int k0 = 0;
#if defined(DERIVE_VEC) && DERIVE_VEC == 8 && LANES == 8
    if (m == LANES) {
        const __m512i lo = _mm512_set_epi64(13, 12, 5, 4, 9, 8, 1, 0);
        const __m512i hi = _mm512_set_epi64(15, 14, 7, 6, 11, 10, 3, 2);
        const __m512i l2 = _mm512_set_epi64(11, 10, 9, 8, 3, 2, 1, 0);
        const __m512i h2 = _mm512_set_epi64(15, 14, 13, 12, 7, 6, 5, 4);
        for (; k0 + 8 <= NK; k0 += 8) {
            const double *o = out + k0 * LANES;
            const __m512d t0 = _mm512_unpacklo_pd(_mm512_loadu_pd(o), _mm512_loadu_pd(o + 8));
            const __m512d t1 = _mm512_unpackhi_pd(_mm512_loadu_pd(o), _mm512_loadu_pd(o + 8));
            const __m512d t2 = _mm512_unpacklo_pd(_mm512_loadu_pd(o + 16), _mm512_loadu_pd(o + 24));
            const __m512d t3 = _mm512_unpackhi_pd(_mm512_loadu_pd(o + 16), _mm512_loadu_pd(o + 24));
            const __m512d t4 = _mm512_unpacklo_pd(_mm512_loadu_pd(o + 32), _mm512_loadu_pd(o + 40));
            const __m512d t5 = _mm512_unpackhi_pd(_mm512_loadu_pd(o + 32), _mm512_loadu_pd(o + 40));
            const __m512d t6 = _mm512_unpacklo_pd(_mm512_loadu_pd(o + 48), _mm512_loadu_pd(o + 56));
            const __m512d t7 = _mm512_unpackhi_pd(_mm512_loadu_pd(o + 48), _mm512_loadu_pd(o + 56));
            const __m512d u0 = _mm512_permutex2var_pd(t0, lo, t2), u1 = _mm512_permutex2var_pd(t1, lo, t3);
            const __m512d u2 = _mm512_permutex2var_pd(t0, hi, t2), u3 = _mm512_permutex2var_pd(t1, hi, t3);
            const __m512d u4 = _mm512_permutex2var_pd(t4, lo, t6), u5 = _mm512_permutex2var_pd(t5, lo, t7);
            const __m512d u6 = _mm512_permutex2var_pd(t4, hi, t6), u7 = _mm512_permutex2var_pd(t5, hi, t7);
            _mm512_storeu_pd(rows + 0 * NK + k0, _mm512_permutex2var_pd(u0, l2, u4));
            _mm512_storeu_pd(rows + 1 * NK + k0, _mm512_permutex2var_pd(u1, l2, u5));
            _mm512_storeu_pd(rows + 2 * NK + k0, _mm512_permutex2var_pd(u2, l2, u6));
            _mm512_storeu_pd(rows + 3 * NK + k0, _mm512_permutex2var_pd(u3, l2, u7));
            _mm512_storeu_pd(rows + 4 * NK + k0, _mm512_permutex2var_pd(u0, h2, u4));
            _mm512_storeu_pd(rows + 5 * NK + k0, _mm512_permutex2var_pd(u1, h2, u5));
            _mm512_storeu_pd(rows + 6 * NK + k0, _mm512_permutex2var_pd(u2, h2, u6));
            _mm512_storeu_pd(rows + 7 * NK + k0, _mm512_permutex2var_pd(u3, h2, u7));
        }
    }
#endif
    for (long l = 0; l < m; ++l)
        for (int k = k0; k < NK; ++k)
            rows[l * NK + k] = out[k * LANES + l];
}

void derive_t6_selective_plane_stress_stiffness_batch(long n, const double *restrict xy, double E, double nu, double t,
                                  double *restrict K)
{
    double mat[NMAT];
    double in[NIN * LANES];
    double out[NK * LANES];
    double rows[NK * LANES];
    /* stream only when K is much larger than the caches it would otherwise fill */
    const int stream = (double)n * NK * sizeof(double) > 8.0e6;
    t6_selective_plane_stress_material(E, nu, t, mat);
    for (long b = 0; b < n; b += LANES) {
        const long m = (n - b < LANES) ? (n - b) : LANES;
        for (long l = 0; l < LANES; ++l) {
            const double *restrict src = xy + (size_t)(b + (l < m ? l : 0)) * NIN;
            for (int k = 0; k < NIN; ++k)
                in[k * LANES + l] = src[k];
        }
#if defined(__clang__)
#pragma clang loop vectorize(enable)
#elif defined(__GNUC__)
#pragma GCC ivdep
#endif
        for (int l = 0; l < LANES; ++l)
            t6_selective_plane_stress_stiffness_body(in + l, LANES, mat, out + l, LANES);
        t6_selective_plane_stress_transpose(out, rows, m);
        t6_selective_plane_stress_store(K + (size_t)b * NK, rows, m * NK, stream);
    }
#ifdef DERIVE_VEC
    if (stream)
        _mm_sfence();
#endif
}

/* minimum of det J over the points of the full rule, one element */
static inline void t6_selective_plane_stress_validity_body(const double *restrict xy, double *restrict detJ_min)
{
    const double x1 = xy[0];
    const double y1 = xy[1];
    const double x2 = xy[2];
    const double y2 = xy[3];
    const double x3 = xy[4];
    const double y3 = xy[5];
    const double x4 = xy[6];
    const double y4 = xy[7];
    const double x5 = xy[8];
    const double y5 = xy[9];
    const double x6 = xy[10];
    const double y6 = xy[11];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -x3 - 3.0*x1 + 4.0*x6;
    const double gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3;
    const double gx_1_0 = -x2 - 3.0*x1 + 4.0*x4;
    const double gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5;
    const double gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2;
    const double gy_0_1 = -y3 - 3.0*y1 + 4.0*y6;
    const double gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3;
    const double gy_1_0 = -y2 - 3.0*y1 + 4.0*y4;
    const double gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5;
    const double gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2;
    double dmin;
    {   /* triangle-d2 point 1 of 3: xi = 1/6, eta = 1/6, weight = 1/6 */
        const double q0 = 0.16666666666666666*gx_1_1;
        const double J00 = gx_1_0 + q0 + 0.3333333333333333*gx_2_0;
        const double q1 = 0.16666666666666666*gy_1_1;
        const double J01 = gy_1_0 + q1 + 0.3333333333333333*gy_2_0;
        const double J10 = gx_0_1 + q0 + 0.3333333333333333*gx_0_2;
        const double J11 = gy_0_1 + q1 + 0.3333333333333333*gy_0_2;
        const double detJ = J00*J11 - J01*J10;
        dmin = detJ;
    }
    {   /* triangle-d2 point 2 of 3: xi = 2/3, eta = 1/6, weight = 1/6 */
        const double J00 = gx_1_0 + 0.16666666666666666*gx_1_1 + 1.3333333333333333*gx_2_0;
        const double J01 = gy_1_0 + 0.16666666666666666*gy_1_1 + 1.3333333333333333*gy_2_0;
        const double J10 = gx_0_1 + 0.3333333333333333*gx_0_2 + 0.6666666666666666*gx_1_1;
        const double J11 = gy_0_1 + 0.3333333333333333*gy_0_2 + 0.6666666666666666*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        dmin = fmin(dmin, detJ);
    }
    {   /* triangle-d2 point 3 of 3: xi = 1/6, eta = 2/3, weight = 1/6 */
        const double J00 = gx_1_0 + 0.3333333333333333*gx_2_0 + 0.6666666666666666*gx_1_1;
        const double J01 = gy_1_0 + 0.3333333333333333*gy_2_0 + 0.6666666666666666*gy_1_1;
        const double J10 = gx_0_1 + 0.16666666666666666*gx_1_1 + 1.3333333333333333*gx_0_2;
        const double J11 = gy_0_1 + 0.16666666666666666*gy_1_1 + 1.3333333333333333*gy_0_2;
        const double detJ = J00*J11 - J01*J10;
        dmin = fmin(dmin, detJ);
    }
    *detJ_min = dmin;
}

void derive_t6_selective_plane_stress_validity(long n, const double *restrict xy, double *restrict detJ_min)
{
    for (long e = 0; e < n; ++e)
        t6_selective_plane_stress_validity_body(xy + (size_t)e * NIN, detJ_min + e);
}

/* strain and stress at the 3 points of the full rule, one element */
static inline void t6_selective_plane_stress_recovery_body(const double *restrict xy, const double *restrict u,
                                            const double *restrict mat, double *restrict strain,
                                            double *restrict stress)
{
    const double x1 = xy[0];
    const double y1 = xy[1];
    const double x2 = xy[2];
    const double y2 = xy[3];
    const double x3 = xy[4];
    const double y3 = xy[5];
    const double x4 = xy[6];
    const double y4 = xy[7];
    const double x5 = xy[8];
    const double y5 = xy[9];
    const double x6 = xy[10];
    const double y6 = xy[11];
    const double u1 = u[0];
    const double u2 = u[1];
    const double u3 = u[2];
    const double u4 = u[3];
    const double u5 = u[4];
    const double u6 = u[5];
    const double u7 = u[6];
    const double u8 = u[7];
    const double u9 = u[8];
    const double u10 = u[9];
    const double u11 = u[10];
    const double u12 = u[11];
    const double m4 = mat[7];
    const double m5 = mat[8];
    const double m6 = mat[9];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -x3 - 3.0*x1 + 4.0*x6;
    const double gx_0_2 = -4.0*x6 + 2.0*x1 + 2.0*x3;
    const double gx_1_0 = -x2 - 3.0*x1 + 4.0*x4;
    const double gx_1_1 = -4.0*x4 - 4.0*x6 + 4.0*x1 + 4.0*x5;
    const double gx_2_0 = -4.0*x4 + 2.0*x1 + 2.0*x2;
    const double gy_0_1 = -y3 - 3.0*y1 + 4.0*y6;
    const double gy_0_2 = -4.0*y6 + 2.0*y1 + 2.0*y3;
    const double gy_1_0 = -y2 - 3.0*y1 + 4.0*y4;
    const double gy_1_1 = -4.0*y4 - 4.0*y6 + 4.0*y1 + 4.0*y5;
    const double gy_2_0 = -4.0*y4 + 2.0*y1 + 2.0*y2;
    {   /* triangle-d2 point 1 of 3: xi = 1/6, eta = 1/6, weight = 1/6 */
        const double q0 = 0.16666666666666666*gx_1_1;
        const double J00 = gx_1_0 + q0 + 0.3333333333333333*gx_2_0;
        const double q1 = 0.16666666666666666*gy_1_1;
        const double J01 = gy_1_0 + q1 + 0.3333333333333333*gy_2_0;
        const double J10 = gx_0_1 + q0 + 0.3333333333333333*gx_0_2;
        const double J11 = gy_0_1 + q1 + 0.3333333333333333*gy_0_2;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = -1.6666666666666667*Ji00 - 1.6666666666666667*Ji01;
        const double dNdy1 = -1.6666666666666667*Ji10 - 1.6666666666666667*Ji11;
        const double dNdx2 = -0.3333333333333333*Ji00;
        const double dNdy2 = -0.3333333333333333*Ji10;
        const double dNdx3 = -0.3333333333333333*Ji01;
        const double dNdy3 = -0.3333333333333333*Ji11;
        const double dNdx4 = 2.0*Ji00 - 0.6666666666666666*Ji01;
        const double dNdy4 = 2.0*Ji10 - 0.6666666666666666*Ji11;
        const double dNdx5 = 0.6666666666666666*Ji00 + 0.6666666666666666*Ji01;
        const double dNdy5 = 0.6666666666666666*Ji10 + 0.6666666666666666*Ji11;
        const double dNdx6 = 2.0*Ji01 - 0.6666666666666666*Ji00;
        const double dNdy6 = 2.0*Ji11 - 0.6666666666666666*Ji10;
        const double eps54 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11;
        const double eps55 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12;
        const double eps56 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1
            + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11;
        strain[0] = eps54;
        strain[1] = eps55;
        strain[2] = eps56;
        stress[0] = eps54*m4 + eps55*m5;
        stress[1] = eps54*m5 + eps55*m4;
        stress[2] = eps56*m6;
    }
    {   /* triangle-d2 point 2 of 3: xi = 2/3, eta = 1/6, weight = 1/6 */
        const double J00 = gx_1_0 + 0.16666666666666666*gx_1_1 + 1.3333333333333333*gx_2_0;
        const double J01 = gy_1_0 + 0.16666666666666666*gy_1_1 + 1.3333333333333333*gy_2_0;
        const double J10 = gx_0_1 + 0.3333333333333333*gx_0_2 + 0.6666666666666666*gx_1_1;
        const double J11 = gy_0_1 + 0.3333333333333333*gy_0_2 + 0.6666666666666666*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = 0.3333333333333333*Ji00 + 0.3333333333333333*Ji01;
        const double dNdy1 = 0.3333333333333333*Ji10 + 0.3333333333333333*Ji11;
        const double dNdx2 = 1.6666666666666667*Ji00;
        const double dNdy2 = 1.6666666666666667*Ji10;
        const double dNdx3 = -0.3333333333333333*Ji01;
        const double dNdy3 = -0.3333333333333333*Ji11;
        const double dNdx4 = -2.0*Ji00 - 2.6666666666666665*Ji01;
        const double dNdy4 = -2.0*Ji10 - 2.6666666666666665*Ji11;
        const double dNdx5 = 0.6666666666666666*Ji00 + 2.6666666666666665*Ji01;
        const double dNdy5 = 0.6666666666666666*Ji10 + 2.6666666666666665*Ji11;
        const double dNdx6 = -0.6666666666666666*Ji00;
        const double dNdy6 = -0.6666666666666666*Ji10;
        const double eps54 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11;
        const double eps55 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12;
        const double eps56 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1
            + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11;
        strain[3] = eps54;
        strain[4] = eps55;
        strain[5] = eps56;
        stress[3] = eps54*m4 + eps55*m5;
        stress[4] = eps54*m5 + eps55*m4;
        stress[5] = eps56*m6;
    }
    {   /* triangle-d2 point 3 of 3: xi = 1/6, eta = 2/3, weight = 1/6 */
        const double J00 = gx_1_0 + 0.3333333333333333*gx_2_0 + 0.6666666666666666*gx_1_1;
        const double J01 = gy_1_0 + 0.3333333333333333*gy_2_0 + 0.6666666666666666*gy_1_1;
        const double J10 = gx_0_1 + 0.16666666666666666*gx_1_1 + 1.3333333333333333*gx_0_2;
        const double J11 = gy_0_1 + 0.16666666666666666*gy_1_1 + 1.3333333333333333*gy_0_2;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = 0.3333333333333333*Ji00 + 0.3333333333333333*Ji01;
        const double dNdy1 = 0.3333333333333333*Ji10 + 0.3333333333333333*Ji11;
        const double dNdx2 = -0.3333333333333333*Ji00;
        const double dNdy2 = -0.3333333333333333*Ji10;
        const double dNdx3 = 1.6666666666666667*Ji01;
        const double dNdy3 = 1.6666666666666667*Ji11;
        const double dNdx4 = -0.6666666666666666*Ji01;
        const double dNdy4 = -0.6666666666666666*Ji11;
        const double dNdx5 = 0.6666666666666666*Ji01 + 2.6666666666666665*Ji00;
        const double dNdy5 = 0.6666666666666666*Ji11 + 2.6666666666666665*Ji10;
        const double dNdx6 = -2.0*Ji01 - 2.6666666666666665*Ji00;
        const double dNdy6 = -2.0*Ji11 - 2.6666666666666665*Ji10;
        const double eps54 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + dNdx5*u9 + dNdx6*u11;
        const double eps55 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + dNdy5*u10 + dNdy6*u12;
        const double eps56 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdx5*u10 + dNdx6*u12 + dNdy1*u1
            + dNdy2*u3 + dNdy3*u5 + dNdy4*u7 + dNdy5*u9 + dNdy6*u11;
        strain[6] = eps54;
        strain[7] = eps55;
        strain[8] = eps56;
        stress[6] = eps54*m4 + eps55*m5;
        stress[7] = eps54*m5 + eps55*m4;
        stress[8] = eps56*m6;
    }
}

void derive_t6_selective_plane_stress_recovery(long n, const double *restrict xy, const double *restrict u, double E, double nu,
                           double *restrict strain, double *restrict stress)
{
    double mat[NMAT];
    t6_selective_plane_stress_material(E, nu, 1.0, mat);
    for (long e = 0; e < n; ++e)
        t6_selective_plane_stress_recovery_body(xy + (size_t)e * NIN, u + (size_t)e * 12, mat,
                                 strain + (size_t)e * 9, stress + (size_t)e * 9);
}
