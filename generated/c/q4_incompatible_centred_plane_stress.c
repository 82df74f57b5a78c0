/*
 * derive generated kernel: Q4 incompatible-centred plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  incompatible modes through the centre Jacobian, scaled det J0/det J (passes the
 *              patch test) [Taylor, Beresford & Wilson (1976)]
 * integration  B^T D B: gauss-2x2 (4 points); B^T D G: gauss-2x2 (4 points); G^T D G: gauss-2x2 (4
 *              points)
 * internal     4 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
 *              (unrolled factorisation of K_aa, no pivoting)
 * flops        stiffness 2555, validity 89, recovery 1851 per element (add, mul, div, sqrt)
 *
 * arguments (units-agnostic; any consistent set of units):
 *   xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
 *           node i+1 (counter-clockwise corners first, then mid-side, then interior)
 *   E       Young's modulus (> 0), scalar
 *   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
 *   t       thickness t (the out-of-plane thickness)
 *   u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
 *   K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 4
 *           internal unknowns are condensed
 *   detJ_min validity: min det J over the points of gauss-2x2, shape (n,); <= 0 means an inverted
 *            or degenerate element
 *   strain  recovery: strain at the 4 points of gauss-2x2, shape (n, 4, 3), Voigt [eps_xx, eps_yy,
 *           gamma_xy] (engineering shear)
 *   stress  recovery: stress D strain at the same points, shape (n, 4, 3), [sigma_xx, sigma_yy,
 *           tau_xy]
 *
 * The kernels do not check their inputs; derive.kernel() checks shapes, finite
 * coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
 * generator    derive.codegen 1.0; regenerate with
 *              derive kernel Q4 --variant incompatible-centred --state plane-stress --lang c
 *
 * C99.  Compile e.g. with: cc -O3 -march=native -c q4_incompatible_centred_plane_stress.c
 * (with GCC add -fno-tree-slp-vectorize: same speed, much shorter compile times).
 * Data layout: every array is dense, row-major (C order), float64.  The batch kernel
 * copies 8 elements at a time into element-innermost scratch arrays so that the
 * per-element body is vectorised across elements (one SIMD lane per element).
 */
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <string.h>
#include "q4_incompatible_centred_plane_stress.h"

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

#define NIN 8
#define NK 64
#define NMAT 6
#define LANES 8
#if defined(__GNUC__)
/* inlined into the lane loop so that the loop over elements vectorises */
#define DERIVE_INLINE static inline __attribute__((always_inline))
#else
#define DERIVE_INLINE static inline
#endif

/* point tables of the rules evaluated in a loop: shape-function derivatives, weights, ... */
/* c0 = eta/4 - 1/4 at the points of gauss-2x2 */
static const double KS0_c0[4] = {
    -0.39433756729740643, -0.39433756729740643, -0.10566243270259355, -0.10566243270259355
};
/* c1 = xi/4 - 1/4 at the points of gauss-2x2 */
static const double KS0_c1[4] = {
    -0.39433756729740643, -0.10566243270259355, -0.39433756729740643, -0.10566243270259355
};
/* c2 = 1/4 - eta/4 at the points of gauss-2x2 */
static const double KS0_c2[4] = {
    0.39433756729740643, 0.39433756729740643, 0.10566243270259355, 0.10566243270259355
};
/* c3 = -xi/4 - 1/4 at the points of gauss-2x2 */
static const double KS0_c3[4] = {
    -0.10566243270259355, -0.39433756729740643, -0.10566243270259355, -0.39433756729740643
};
/* c4 = eta/4 + 1/4 at the points of gauss-2x2 */
static const double KS0_c4[4] = {
    0.10566243270259355, 0.10566243270259355, 0.39433756729740643, 0.39433756729740643
};
/* c5 = xi/4 + 1/4 at the points of gauss-2x2 */
static const double KS0_c5[4] = {
    0.10566243270259355, 0.39433756729740643, 0.10566243270259355, 0.39433756729740643
};
/* c6 = -eta/4 - 1/4 at the points of gauss-2x2 */
static const double KS0_c6[4] = {
    -0.10566243270259355, -0.10566243270259355, -0.39433756729740643, -0.39433756729740643
};
/* c7 = 1/4 - xi/4 at the points of gauss-2x2 */
static const double KS0_c7[4] = {
    0.39433756729740643, 0.10566243270259355, 0.39433756729740643, 0.10566243270259355
};
/* c9 = -2*xi at the points of gauss-2x2 */
static const double KS0_c9[4] = {
    1.1547005383792515, -1.1547005383792515, 1.1547005383792515, -1.1547005383792515
};
/* c10 = 2*eta at the points of gauss-2x2 */
static const double KS0_c10[4] = {
    -1.1547005383792515, -1.1547005383792515, 1.1547005383792515, 1.1547005383792515
};
/* c11 = 2*xi at the points of gauss-2x2 */
static const double KS0_c11[4] = {
    -1.1547005383792515, 1.1547005383792515, -1.1547005383792515, 1.1547005383792515
};
/* c12 = -2*eta at the points of gauss-2x2 */
static const double KS0_c12[4] = {
    1.1547005383792515, 1.1547005383792515, -1.1547005383792515, -1.1547005383792515
};
/* eta = eta at the points of gauss-2x2 */
static const double KS0_eta[4] = {
    -0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257
};
/* w = the point weight at the points of gauss-2x2 */
static const double KS0_w[4] = {
    1.0, 1.0, 1.0, 1.0
};
/* xi = xi at the points of gauss-2x2 */
static const double KS0_xi[4] = {
    -0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257
};
/* c0 = eta/4 - 1/4 at the points of gauss-2x2 */
static const double KR0_c0[4] = {
    -0.39433756729740643, -0.39433756729740643, -0.10566243270259355, -0.10566243270259355
};
/* c1 = xi/4 - 1/4 at the points of gauss-2x2 */
static const double KR0_c1[4] = {
    -0.39433756729740643, -0.10566243270259355, -0.39433756729740643, -0.10566243270259355
};
/* c2 = 1/4 - eta/4 at the points of gauss-2x2 */
static const double KR0_c2[4] = {
    0.39433756729740643, 0.39433756729740643, 0.10566243270259355, 0.10566243270259355
};
/* c3 = -xi/4 - 1/4 at the points of gauss-2x2 */
static const double KR0_c3[4] = {
    -0.10566243270259355, -0.39433756729740643, -0.10566243270259355, -0.39433756729740643
};
/* c4 = eta/4 + 1/4 at the points of gauss-2x2 */
static const double KR0_c4[4] = {
    0.10566243270259355, 0.10566243270259355, 0.39433756729740643, 0.39433756729740643
};
/* c5 = xi/4 + 1/4 at the points of gauss-2x2 */
static const double KR0_c5[4] = {
    0.10566243270259355, 0.39433756729740643, 0.10566243270259355, 0.39433756729740643
};
/* c6 = -eta/4 - 1/4 at the points of gauss-2x2 */
static const double KR0_c6[4] = {
    -0.10566243270259355, -0.10566243270259355, -0.39433756729740643, -0.39433756729740643
};
/* c7 = 1/4 - xi/4 at the points of gauss-2x2 */
static const double KR0_c7[4] = {
    0.39433756729740643, 0.10566243270259355, 0.39433756729740643, 0.10566243270259355
};
/* c9 = -2*xi at the points of gauss-2x2 */
static const double KR0_c9[4] = {
    1.1547005383792515, -1.1547005383792515, 1.1547005383792515, -1.1547005383792515
};
/* c10 = 2*eta at the points of gauss-2x2 */
static const double KR0_c10[4] = {
    -1.1547005383792515, -1.1547005383792515, 1.1547005383792515, 1.1547005383792515
};
/* c11 = 2*xi at the points of gauss-2x2 */
static const double KR0_c11[4] = {
    -1.1547005383792515, 1.1547005383792515, -1.1547005383792515, 1.1547005383792515
};
/* c12 = -2*eta at the points of gauss-2x2 */
static const double KR0_c12[4] = {
    1.1547005383792515, 1.1547005383792515, -1.1547005383792515, -1.1547005383792515
};
/* eta = eta at the points of gauss-2x2 */
static const double KR0_eta[4] = {
    -0.5773502691896257, -0.5773502691896257, 0.5773502691896257, 0.5773502691896257
};
/* w = the point weight at the points of gauss-2x2 */
static const double KR0_w[4] = {
    1.0, 1.0, 1.0, 1.0
};
/* xi = xi at the points of gauss-2x2 */
static const double KR0_xi[4] = {
    -0.5773502691896257, 0.5773502691896257, -0.5773502691896257, 0.5773502691896257
};

/* material table: E, nu, t, then the material constants the kernels use */
static inline void q4_incompatible_centred_plane_stress_material(double E, double nu, double t, double *restrict mat)
{
    mat[0] = E;
    mat[1] = nu;
    mat[2] = t;
    mat[3] = E/(1.0 - nu*nu);   /* m0 */
    mat[4] = E*nu/(1.0 - nu*nu);   /* m1 */
    mat[5] = E*(0.5 - 0.5*nu)/(1.0 - nu*nu);   /* m2 */
}

/* stiffness of one element; xy[k * sx] is input k, K[k * sk] output k (row-major) */
DERIVE_INLINE void q4_incompatible_centred_plane_stress_stiffness_body(const double *restrict xy, const ptrdiff_t sx,
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
    const double t = mat[2];
    const double m0 = mat[3];
    const double m1 = mat[4];
    const double m2 = mat[5];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4;
    const double gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3;
    const double gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3;
    const double gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4;
    const double gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3;
    const double gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3;
    double K_0_0 = 0.0, K_0_1 = 0.0, K_0_2 = 0.0, K_0_3 = 0.0, K_0_4 = 0.0, K_0_5 = 0.0, K_0_6 = 0.0;
    double K_0_7 = 0.0, K_1_1 = 0.0, K_1_2 = 0.0, K_1_3 = 0.0, K_1_4 = 0.0, K_1_5 = 0.0, K_1_6 = 0.0;
    double K_1_7 = 0.0, K_2_2 = 0.0, K_2_3 = 0.0, K_2_4 = 0.0, K_2_5 = 0.0, K_2_6 = 0.0, K_2_7 = 0.0;
    double K_3_3 = 0.0, K_3_4 = 0.0, K_3_5 = 0.0, K_3_6 = 0.0, K_3_7 = 0.0, K_4_4 = 0.0, K_4_5 = 0.0;
    double K_4_6 = 0.0, K_4_7 = 0.0, K_5_5 = 0.0, K_5_6 = 0.0, K_5_7 = 0.0, K_6_6 = 0.0, K_6_7 = 0.0;
    double K_7_7 = 0.0, A_0_0 = 0.0, A_0_1 = 0.0, A_0_2 = 0.0, A_0_3 = 0.0, A_1_0 = 0.0, A_1_1 = 0.0;
    double A_1_2 = 0.0, A_1_3 = 0.0, A_2_0 = 0.0, A_2_1 = 0.0, A_2_2 = 0.0, A_2_3 = 0.0, A_3_0 = 0.0;
    double A_3_1 = 0.0, A_3_2 = 0.0, A_3_3 = 0.0, A_4_0 = 0.0, A_4_1 = 0.0, A_4_2 = 0.0, A_4_3 = 0.0;
    double A_5_0 = 0.0, A_5_1 = 0.0, A_5_2 = 0.0, A_5_3 = 0.0, A_6_0 = 0.0, A_6_1 = 0.0, A_6_2 = 0.0;
    double A_6_3 = 0.0, A_7_0 = 0.0, A_7_1 = 0.0, A_7_2 = 0.0, A_7_3 = 0.0, H_0_0 = 0.0, H_0_1 = 0.0;
    double H_0_2 = 0.0, H_0_3 = 0.0, H_1_1 = 0.0, H_1_2 = 0.0, H_1_3 = 0.0, H_2_2 = 0.0, H_2_3 = 0.0;
    double H_3_3 = 0.0;
    for (int p = 0; p < 4; ++p) {   /* gauss-2x2: loop over the 4 points */
        const double c0 = KS0_c0[p];
        const double c1 = KS0_c1[p];
        const double c2 = KS0_c2[p];
        const double c3 = KS0_c3[p];
        const double c4 = KS0_c4[p];
        const double c5 = KS0_c5[p];
        const double c6 = KS0_c6[p];
        const double c7 = KS0_c7[p];
        const double c9 = KS0_c9[p];
        const double c10 = KS0_c10[p];
        const double c11 = KS0_c11[p];
        const double c12 = KS0_c12[p];
        const double eta = KS0_eta[p];
        const double w = KS0_w[p];
        const double xi = KS0_xi[p];
        const double J00 = gx_1_0 + eta*gx_1_1;
        const double J01 = gy_1_0 + eta*gy_1_1;
        const double J10 = gx_0_1 + gx_1_1*xi;
        const double J11 = gy_0_1 + gy_1_1*xi;
        const double detJ = J00*J11 - J01*J10;
        const double q0 = 1.0/detJ;
        const double Ji00 = J11*q0;
        const double Ji01 = -J01*q0;
        const double Ji10 = -J10*q0;
        const double Ji11 = J00*q0;
        const double dNdx1 = Ji00*c0 + Ji01*c1;
        const double dNdy1 = Ji10*c0 + Ji11*c1;
        const double dNdx2 = Ji00*c2 + Ji01*c3;
        const double dNdy2 = Ji10*c2 + Ji11*c3;
        const double dNdx3 = Ji00*c4 + Ji01*c5;
        const double dNdy3 = Ji10*c4 + Ji11*c5;
        const double dNdx4 = Ji00*c6 + Ji01*c7;
        const double dNdy4 = Ji10*c6 + Ji11*c7;
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
        const double T28 = c9*gy_0_1*q0*s1;
        const double T29 = c9*gy_0_1*q0*s2;
        const double T30 = c11*gx_0_1*q0*s3;
        const double T31 = c11*gx_0_1*q0*s2;
        const double T32 = c11*gx_0_1*q0*s1;
        const double T33 = c9*gy_0_1*q0*s3;
        const double T34 = c10*gy_1_0*q0*s1;
        const double T35 = c10*gy_1_0*q0*s2;
        const double T36 = c12*gx_1_0*q0*s3;
        const double T37 = c12*gx_1_0*q0*s2;
        const double T38 = c12*gx_1_0*q0*s1;
        const double T39 = c10*gy_1_0*q0*s3;
        K_0_0 += T4*dNdx1 + T6*dNdy1;
        K_0_1 += T7*dNdx1 + T9*dNdy1;
        K_0_2 += T10*dNdx1 + T12*dNdy1;
        K_0_3 += T13*dNdx1 + T15*dNdy1;
        K_0_4 += T16*dNdx1 + T18*dNdy1;
        K_0_5 += T19*dNdx1 + T21*dNdy1;
        K_0_6 += T22*dNdx1 + T24*dNdy1;
        K_0_7 += T25*dNdx1 + T27*dNdy1;
        K_1_1 += T8*dNdy1 + T9*dNdx1;
        K_1_2 += T11*dNdy1 + T12*dNdx1;
        K_1_3 += T14*dNdy1 + T15*dNdx1;
        K_1_4 += T17*dNdy1 + T18*dNdx1;
        K_1_5 += T20*dNdy1 + T21*dNdx1;
        K_1_6 += T23*dNdy1 + T24*dNdx1;
        K_1_7 += T26*dNdy1 + T27*dNdx1;
        K_2_2 += T10*dNdx2 + T12*dNdy2;
        K_2_3 += T13*dNdx2 + T15*dNdy2;
        K_2_4 += T16*dNdx2 + T18*dNdy2;
        K_2_5 += T19*dNdx2 + T21*dNdy2;
        K_2_6 += T22*dNdx2 + T24*dNdy2;
        K_2_7 += T25*dNdx2 + T27*dNdy2;
        K_3_3 += T14*dNdy2 + T15*dNdx2;
        K_3_4 += T17*dNdy2 + T18*dNdx2;
        K_3_5 += T20*dNdy2 + T21*dNdx2;
        K_3_6 += T23*dNdy2 + T24*dNdx2;
        K_3_7 += T26*dNdy2 + T27*dNdx2;
        K_4_4 += T16*dNdx3 + T18*dNdy3;
        K_4_5 += T19*dNdx3 + T21*dNdy3;
        K_4_6 += T22*dNdx3 + T24*dNdy3;
        K_4_7 += T25*dNdx3 + T27*dNdy3;
        K_5_5 += T20*dNdy3 + T21*dNdx3;
        K_5_6 += T23*dNdy3 + T24*dNdx3;
        K_5_7 += T26*dNdy3 + T27*dNdx3;
        K_6_6 += T22*dNdx4 + T24*dNdy4;
        K_6_7 += T25*dNdx4 + T27*dNdy4;
        K_7_7 += T26*dNdy4 + T27*dNdx4;
        A_0_0 += T28*dNdx1 + T30*dNdy1;
        A_0_1 += T31*dNdx1 + T33*dNdy1;
        A_0_2 += T34*dNdx1 + T36*dNdy1;
        A_0_3 += T37*dNdx1 + T39*dNdy1;
        A_1_0 += T29*dNdy1 + T30*dNdx1;
        A_1_1 += T32*dNdy1 + T33*dNdx1;
        A_1_2 += T35*dNdy1 + T36*dNdx1;
        A_1_3 += T38*dNdy1 + T39*dNdx1;
        A_2_0 += T28*dNdx2 + T30*dNdy2;
        A_2_1 += T31*dNdx2 + T33*dNdy2;
        A_2_2 += T34*dNdx2 + T36*dNdy2;
        A_2_3 += T37*dNdx2 + T39*dNdy2;
        A_3_0 += T29*dNdy2 + T30*dNdx2;
        A_3_1 += T32*dNdy2 + T33*dNdx2;
        A_3_2 += T35*dNdy2 + T36*dNdx2;
        A_3_3 += T38*dNdy2 + T39*dNdx2;
        A_4_0 += T28*dNdx3 + T30*dNdy3;
        A_4_1 += T31*dNdx3 + T33*dNdy3;
        A_4_2 += T34*dNdx3 + T36*dNdy3;
        A_4_3 += T37*dNdx3 + T39*dNdy3;
        A_5_0 += T29*dNdy3 + T30*dNdx3;
        A_5_1 += T32*dNdy3 + T33*dNdx3;
        A_5_2 += T35*dNdy3 + T36*dNdx3;
        A_5_3 += T38*dNdy3 + T39*dNdx3;
        A_6_0 += T28*dNdx4 + T30*dNdy4;
        A_6_1 += T31*dNdx4 + T33*dNdy4;
        A_6_2 += T34*dNdx4 + T36*dNdy4;
        A_6_3 += T37*dNdx4 + T39*dNdy4;
        A_7_0 += T29*dNdy4 + T30*dNdx4;
        A_7_1 += T32*dNdy4 + T33*dNdx4;
        A_7_2 += T35*dNdy4 + T36*dNdx4;
        A_7_3 += T38*dNdy4 + T39*dNdx4;
        H_0_0 += T28*c9*gy_0_1*q0 + T30*c11*gx_0_1*q0;
        H_0_1 += T31*c9*gy_0_1*q0 + T33*c11*gx_0_1*q0;
        H_0_2 += T34*c9*gy_0_1*q0 + T36*c11*gx_0_1*q0;
        H_0_3 += T37*c9*gy_0_1*q0 + T39*c11*gx_0_1*q0;
        H_1_1 += T32*c11*gx_0_1*q0 + T33*c9*gy_0_1*q0;
        H_1_2 += T35*c11*gx_0_1*q0 + T36*c9*gy_0_1*q0;
        H_1_3 += T38*c11*gx_0_1*q0 + T39*c9*gy_0_1*q0;
        H_2_2 += T34*c10*gy_1_0*q0 + T36*c12*gx_1_0*q0;
        H_2_3 += T37*c10*gy_1_0*q0 + T39*c12*gx_1_0*q0;
        H_3_3 += T38*c12*gx_1_0*q0 + T39*c10*gy_1_0*q0;
    }
    /* static condensation of the internal unknowns */
    const double cid0 = 1.0/H_0_0;
    const double cL1_0 = H_0_1*cid0;
    const double cL2_0 = H_0_2*cid0;
    const double cL3_0 = H_0_3*cid0;
    const double cd1 = H_1_1 - H_0_0*cL1_0*cL1_0;
    const double cid1 = 1.0/cd1;
    const double cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0);
    const double cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0);
    const double cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1;
    const double cid2 = 1.0/cd2;
    const double cL3_2 = cid2*(H_2_3 - H_0_0*cL2_0*cL3_0 - cL2_1*cL3_1*cd1);
    const double cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - cd1*cL3_1*cL3_1 - cd2*cL3_2*cL3_2;
    const double cid3 = 1.0/cd3;
    const double cy1_0 = A_0_1 - A_0_0*cL1_0;
    const double cy2_0 = A_0_2 - A_0_0*cL2_0 - cL2_1*cy1_0;
    const double cy3_0 = A_0_3 - A_0_0*cL3_0 - cL3_1*cy1_0 - cL3_2*cy2_0;
    const double cy1_1 = A_1_1 - A_1_0*cL1_0;
    const double cy2_1 = A_1_2 - A_1_0*cL2_0 - cL2_1*cy1_1;
    const double cy3_1 = A_1_3 - A_1_0*cL3_0 - cL3_1*cy1_1 - cL3_2*cy2_1;
    const double cy1_2 = A_2_1 - A_2_0*cL1_0;
    const double cy2_2 = A_2_2 - A_2_0*cL2_0 - cL2_1*cy1_2;
    const double cy3_2 = A_2_3 - A_2_0*cL3_0 - cL3_1*cy1_2 - cL3_2*cy2_2;
    const double cy1_3 = A_3_1 - A_3_0*cL1_0;
    const double cy2_3 = A_3_2 - A_3_0*cL2_0 - cL2_1*cy1_3;
    const double cy3_3 = A_3_3 - A_3_0*cL3_0 - cL3_1*cy1_3 - cL3_2*cy2_3;
    const double cy1_4 = A_4_1 - A_4_0*cL1_0;
    const double cy2_4 = A_4_2 - A_4_0*cL2_0 - cL2_1*cy1_4;
    const double cy3_4 = A_4_3 - A_4_0*cL3_0 - cL3_1*cy1_4 - cL3_2*cy2_4;
    const double cy1_5 = A_5_1 - A_5_0*cL1_0;
    const double cy2_5 = A_5_2 - A_5_0*cL2_0 - cL2_1*cy1_5;
    const double cy3_5 = A_5_3 - A_5_0*cL3_0 - cL3_1*cy1_5 - cL3_2*cy2_5;
    const double cy1_6 = A_6_1 - A_6_0*cL1_0;
    const double cy2_6 = A_6_2 - A_6_0*cL2_0 - cL2_1*cy1_6;
    const double cy3_6 = A_6_3 - A_6_0*cL3_0 - cL3_1*cy1_6 - cL3_2*cy2_6;
    const double cy1_7 = A_7_1 - A_7_0*cL1_0;
    const double cy2_7 = A_7_2 - A_7_0*cL2_0 - cL2_1*cy1_7;
    const double cy3_7 = A_7_3 - A_7_0*cL3_0 - cL3_1*cy1_7 - cL3_2*cy2_7;
    const double cz0_0 = A_0_0*cid0;
    const double cz1_0 = cid1*cy1_0;
    const double cz2_0 = cid2*cy2_0;
    const double cz3_0 = cid3*cy3_0;
    const double cz0_1 = A_1_0*cid0;
    const double cz1_1 = cid1*cy1_1;
    const double cz2_1 = cid2*cy2_1;
    const double cz3_1 = cid3*cy3_1;
    const double cz0_2 = A_2_0*cid0;
    const double cz1_2 = cid1*cy1_2;
    const double cz2_2 = cid2*cy2_2;
    const double cz3_2 = cid3*cy3_2;
    const double cz0_3 = A_3_0*cid0;
    const double cz1_3 = cid1*cy1_3;
    const double cz2_3 = cid2*cy2_3;
    const double cz3_3 = cid3*cy3_3;
    const double cz0_4 = A_4_0*cid0;
    const double cz1_4 = cid1*cy1_4;
    const double cz2_4 = cid2*cy2_4;
    const double cz3_4 = cid3*cy3_4;
    const double cz0_5 = A_5_0*cid0;
    const double cz1_5 = cid1*cy1_5;
    const double cz2_5 = cid2*cy2_5;
    const double cz3_5 = cid3*cy3_5;
    const double cz0_6 = A_6_0*cid0;
    const double cz1_6 = cid1*cy1_6;
    const double cz2_6 = cid2*cy2_6;
    const double cz3_6 = cid3*cy3_6;
    const double cz0_7 = A_7_0*cid0;
    const double cz1_7 = cid1*cy1_7;
    const double cz2_7 = cid2*cy2_7;
    const double cz3_7 = cid3*cy3_7;
    K[0 * sk] = K_0_0 - A_0_0*cz0_0 - cy1_0*cz1_0 - cy2_0*cz2_0 - cy3_0*cz3_0;
    K[1 * sk] = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0;
    K[2 * sk] = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0;
    K[3 * sk] = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0;
    K[4 * sk] = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0;
    K[5 * sk] = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0;
    K[6 * sk] = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0;
    K[7 * sk] = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0;
    K[8 * sk] = K_0_1 - A_1_0*cz0_0 - cy1_1*cz1_0 - cy2_1*cz2_0 - cy3_1*cz3_0;
    K[9 * sk] = K_1_1 - A_1_0*cz0_1 - cy1_1*cz1_1 - cy2_1*cz2_1 - cy3_1*cz3_1;
    K[10 * sk] = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1;
    K[11 * sk] = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1;
    K[12 * sk] = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1;
    K[13 * sk] = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1;
    K[14 * sk] = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1;
    K[15 * sk] = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1;
    K[16 * sk] = K_0_2 - A_2_0*cz0_0 - cy1_2*cz1_0 - cy2_2*cz2_0 - cy3_2*cz3_0;
    K[17 * sk] = K_1_2 - A_2_0*cz0_1 - cy1_2*cz1_1 - cy2_2*cz2_1 - cy3_2*cz3_1;
    K[18 * sk] = K_2_2 - A_2_0*cz0_2 - cy1_2*cz1_2 - cy2_2*cz2_2 - cy3_2*cz3_2;
    K[19 * sk] = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2;
    K[20 * sk] = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2;
    K[21 * sk] = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2;
    K[22 * sk] = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2;
    K[23 * sk] = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2;
    K[24 * sk] = K_0_3 - A_3_0*cz0_0 - cy1_3*cz1_0 - cy2_3*cz2_0 - cy3_3*cz3_0;
    K[25 * sk] = K_1_3 - A_3_0*cz0_1 - cy1_3*cz1_1 - cy2_3*cz2_1 - cy3_3*cz3_1;
    K[26 * sk] = K_2_3 - A_3_0*cz0_2 - cy1_3*cz1_2 - cy2_3*cz2_2 - cy3_3*cz3_2;
    K[27 * sk] = K_3_3 - A_3_0*cz0_3 - cy1_3*cz1_3 - cy2_3*cz2_3 - cy3_3*cz3_3;
    K[28 * sk] = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3;
    K[29 * sk] = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3;
    K[30 * sk] = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3;
    K[31 * sk] = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3;
    K[32 * sk] = K_0_4 - A_4_0*cz0_0 - cy1_4*cz1_0 - cy2_4*cz2_0 - cy3_4*cz3_0;
    K[33 * sk] = K_1_4 - A_4_0*cz0_1 - cy1_4*cz1_1 - cy2_4*cz2_1 - cy3_4*cz3_1;
    K[34 * sk] = K_2_4 - A_4_0*cz0_2 - cy1_4*cz1_2 - cy2_4*cz2_2 - cy3_4*cz3_2;
    K[35 * sk] = K_3_4 - A_4_0*cz0_3 - cy1_4*cz1_3 - cy2_4*cz2_3 - cy3_4*cz3_3;
    K[36 * sk] = K_4_4 - A_4_0*cz0_4 - cy1_4*cz1_4 - cy2_4*cz2_4 - cy3_4*cz3_4;
    K[37 * sk] = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4;
    K[38 * sk] = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4;
    K[39 * sk] = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4;
    K[40 * sk] = K_0_5 - A_5_0*cz0_0 - cy1_5*cz1_0 - cy2_5*cz2_0 - cy3_5*cz3_0;
    K[41 * sk] = K_1_5 - A_5_0*cz0_1 - cy1_5*cz1_1 - cy2_5*cz2_1 - cy3_5*cz3_1;
    K[42 * sk] = K_2_5 - A_5_0*cz0_2 - cy1_5*cz1_2 - cy2_5*cz2_2 - cy3_5*cz3_2;
    K[43 * sk] = K_3_5 - A_5_0*cz0_3 - cy1_5*cz1_3 - cy2_5*cz2_3 - cy3_5*cz3_3;
    K[44 * sk] = K_4_5 - A_5_0*cz0_4 - cy1_5*cz1_4 - cy2_5*cz2_4 - cy3_5*cz3_4;
    K[45 * sk] = K_5_5 - A_5_0*cz0_5 - cy1_5*cz1_5 - cy2_5*cz2_5 - cy3_5*cz3_5;
    K[46 * sk] = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5;
    K[47 * sk] = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5;
    K[48 * sk] = K_0_6 - A_6_0*cz0_0 - cy1_6*cz1_0 - cy2_6*cz2_0 - cy3_6*cz3_0;
    K[49 * sk] = K_1_6 - A_6_0*cz0_1 - cy1_6*cz1_1 - cy2_6*cz2_1 - cy3_6*cz3_1;
    K[50 * sk] = K_2_6 - A_6_0*cz0_2 - cy1_6*cz1_2 - cy2_6*cz2_2 - cy3_6*cz3_2;
    K[51 * sk] = K_3_6 - A_6_0*cz0_3 - cy1_6*cz1_3 - cy2_6*cz2_3 - cy3_6*cz3_3;
    K[52 * sk] = K_4_6 - A_6_0*cz0_4 - cy1_6*cz1_4 - cy2_6*cz2_4 - cy3_6*cz3_4;
    K[53 * sk] = K_5_6 - A_6_0*cz0_5 - cy1_6*cz1_5 - cy2_6*cz2_5 - cy3_6*cz3_5;
    K[54 * sk] = K_6_6 - A_6_0*cz0_6 - cy1_6*cz1_6 - cy2_6*cz2_6 - cy3_6*cz3_6;
    K[55 * sk] = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6;
    K[56 * sk] = K_0_7 - A_7_0*cz0_0 - cy1_7*cz1_0 - cy2_7*cz2_0 - cy3_7*cz3_0;
    K[57 * sk] = K_1_7 - A_7_0*cz0_1 - cy1_7*cz1_1 - cy2_7*cz2_1 - cy3_7*cz3_1;
    K[58 * sk] = K_2_7 - A_7_0*cz0_2 - cy1_7*cz1_2 - cy2_7*cz2_2 - cy3_7*cz3_2;
    K[59 * sk] = K_3_7 - A_7_0*cz0_3 - cy1_7*cz1_3 - cy2_7*cz2_3 - cy3_7*cz3_3;
    K[60 * sk] = K_4_7 - A_7_0*cz0_4 - cy1_7*cz1_4 - cy2_7*cz2_4 - cy3_7*cz3_4;
    K[61 * sk] = K_5_7 - A_7_0*cz0_5 - cy1_7*cz1_5 - cy2_7*cz2_5 - cy3_7*cz3_5;
    K[62 * sk] = K_6_7 - A_7_0*cz0_6 - cy1_7*cz1_6 - cy2_7*cz2_6 - cy3_7*cz3_6;
    K[63 * sk] = K_7_7 - A_7_0*cz0_7 - cy1_7*cz1_7 - cy2_7*cz2_7 - cy3_7*cz3_7;
}

void derive_q4_incompatible_centred_plane_stress_stiffness(const double *restrict xy, double E, double nu, double t, double *restrict K)
{
    double mat[NMAT];
    q4_incompatible_centred_plane_stress_material(E, nu, t, mat);
    q4_incompatible_centred_plane_stress_stiffness_body(xy, 1, mat, K, 1);
}

/* copy count doubles to dst, streaming (non-temporal) where dst is vector-aligned */
static inline void q4_incompatible_centred_plane_stress_store(double *restrict dst, const double *restrict src, long count, int stream)
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
static inline void q4_incompatible_centred_plane_stress_transpose(const double *restrict out, double *restrict rows, long m)
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

void derive_q4_incompatible_centred_plane_stress_stiffness_batch(long n, const double *restrict xy, double E, double nu, double t,
                                  double *restrict K)
{
    double mat[NMAT];
    double in[NIN * LANES];
    double out[NK * LANES];
    double rows[NK * LANES];
    /* stream only when K is much larger than the caches it would otherwise fill */
    const int stream = (double)n * NK * sizeof(double) > 8.0e6;
    q4_incompatible_centred_plane_stress_material(E, nu, t, mat);
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
            q4_incompatible_centred_plane_stress_stiffness_body(in + l, LANES, mat, out + l, LANES);
        q4_incompatible_centred_plane_stress_transpose(out, rows, m);
        q4_incompatible_centred_plane_stress_store(K + (size_t)b * NK, rows, m * NK, stream);
    }
#ifdef DERIVE_VEC
    if (stream)
        _mm_sfence();
#endif
}

/* minimum of det J over the points of the full rule, one element */
static inline void q4_incompatible_centred_plane_stress_validity_body(const double *restrict xy, double *restrict detJ_min)
{
    const double x1 = xy[0];
    const double y1 = xy[1];
    const double x2 = xy[2];
    const double y2 = xy[3];
    const double x3 = xy[4];
    const double y3 = xy[5];
    const double x4 = xy[6];
    const double y4 = xy[7];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4;
    const double gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3;
    const double gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3;
    const double gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4;
    const double gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3;
    const double gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3;
    double dmin;
    {   /* gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double q0 = -0.5773502691896257*gx_1_1;
        const double J00 = gx_1_0 + q0;
        const double q1 = -0.5773502691896257*gy_1_1;
        const double J01 = gy_1_0 + q1;
        const double J10 = gx_0_1 + q0;
        const double J11 = gy_0_1 + q1;
        const double detJ = J00*J11 - J01*J10;
        dmin = detJ;
    }
    {   /* gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double J00 = gx_1_0 - 0.5773502691896257*gx_1_1;
        const double J01 = gy_1_0 - 0.5773502691896257*gy_1_1;
        const double J10 = gx_0_1 + 0.5773502691896257*gx_1_1;
        const double J11 = gy_0_1 + 0.5773502691896257*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        dmin = fmin(dmin, detJ);
    }
    {   /* gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double J00 = gx_1_0 + 0.5773502691896257*gx_1_1;
        const double J01 = gy_1_0 + 0.5773502691896257*gy_1_1;
        const double J10 = gx_0_1 - 0.5773502691896257*gx_1_1;
        const double J11 = gy_0_1 - 0.5773502691896257*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        dmin = fmin(dmin, detJ);
    }
    {   /* gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double q0 = 0.5773502691896257*gx_1_1;
        const double J00 = gx_1_0 + q0;
        const double q1 = 0.5773502691896257*gy_1_1;
        const double J01 = gy_1_0 + q1;
        const double J10 = gx_0_1 + q0;
        const double J11 = gy_0_1 + q1;
        const double detJ = J00*J11 - J01*J10;
        dmin = fmin(dmin, detJ);
    }
    *detJ_min = dmin;
}

void derive_q4_incompatible_centred_plane_stress_validity(long n, const double *restrict xy, double *restrict detJ_min)
{
    for (long e = 0; e < n; ++e)
        q4_incompatible_centred_plane_stress_validity_body(xy + (size_t)e * NIN, detJ_min + e);
}

/* strain and stress at the 4 points of the full rule, one element */
static inline void q4_incompatible_centred_plane_stress_recovery_body(const double *restrict xy, const double *restrict u,
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
    const double u1 = u[0];
    const double u2 = u[1];
    const double u3 = u[2];
    const double u4 = u[3];
    const double u5 = u[4];
    const double u6 = u[5];
    const double u7 = u[6];
    const double u8 = u[7];
    const double t = mat[2];
    const double m0 = mat[3];
    const double m1 = mat[4];
    const double m2 = mat[5];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4;
    const double gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3;
    const double gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3;
    const double gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4;
    const double gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3;
    const double gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3;
    double A_0_0 = 0.0, A_0_1 = 0.0, A_0_2 = 0.0, A_0_3 = 0.0, A_1_0 = 0.0, A_1_1 = 0.0, A_1_2 = 0.0;
    double A_1_3 = 0.0, A_2_0 = 0.0, A_2_1 = 0.0, A_2_2 = 0.0, A_2_3 = 0.0, A_3_0 = 0.0, A_3_1 = 0.0;
    double A_3_2 = 0.0, A_3_3 = 0.0, A_4_0 = 0.0, A_4_1 = 0.0, A_4_2 = 0.0, A_4_3 = 0.0, A_5_0 = 0.0;
    double A_5_1 = 0.0, A_5_2 = 0.0, A_5_3 = 0.0, A_6_0 = 0.0, A_6_1 = 0.0, A_6_2 = 0.0, A_6_3 = 0.0;
    double A_7_0 = 0.0, A_7_1 = 0.0, A_7_2 = 0.0, A_7_3 = 0.0, H_0_0 = 0.0, H_0_1 = 0.0, H_0_2 = 0.0;
    double H_0_3 = 0.0, H_1_1 = 0.0, H_1_2 = 0.0, H_1_3 = 0.0, H_2_2 = 0.0, H_2_3 = 0.0, H_3_3 = 0.0;
    for (int p = 0; p < 4; ++p) {   /* gauss-2x2: loop over the 4 points */
        const double c0 = KR0_c0[p];
        const double c1 = KR0_c1[p];
        const double c2 = KR0_c2[p];
        const double c3 = KR0_c3[p];
        const double c4 = KR0_c4[p];
        const double c5 = KR0_c5[p];
        const double c6 = KR0_c6[p];
        const double c7 = KR0_c7[p];
        const double c9 = KR0_c9[p];
        const double c10 = KR0_c10[p];
        const double c11 = KR0_c11[p];
        const double c12 = KR0_c12[p];
        const double eta = KR0_eta[p];
        const double w = KR0_w[p];
        const double xi = KR0_xi[p];
        const double J00 = gx_1_0 + eta*gx_1_1;
        const double J01 = gy_1_0 + eta*gy_1_1;
        const double J10 = gx_0_1 + gx_1_1*xi;
        const double J11 = gy_0_1 + gy_1_1*xi;
        const double detJ = J00*J11 - J01*J10;
        const double q0 = 1.0/detJ;
        const double Ji00 = J11*q0;
        const double Ji01 = -J01*q0;
        const double Ji10 = -J10*q0;
        const double Ji11 = J00*q0;
        const double dNdx1 = Ji00*c0 + Ji01*c1;
        const double dNdy1 = Ji10*c0 + Ji11*c1;
        const double dNdx2 = Ji00*c2 + Ji01*c3;
        const double dNdy2 = Ji10*c2 + Ji11*c3;
        const double dNdx3 = Ji00*c4 + Ji01*c5;
        const double dNdy3 = Ji10*c4 + Ji11*c5;
        const double dNdx4 = Ji00*c6 + Ji01*c7;
        const double dNdy4 = Ji10*c6 + Ji11*c7;
        const double sc0 = detJ*t*w;
        const double s1 = m0*sc0;
        const double s2 = m1*sc0;
        const double s3 = m2*sc0;
        const double T28 = c9*gy_0_1*q0*s1;
        const double T29 = c9*gy_0_1*q0*s2;
        const double T30 = c11*gx_0_1*q0*s3;
        const double T31 = c11*gx_0_1*q0*s2;
        const double T32 = c11*gx_0_1*q0*s1;
        const double T33 = c9*gy_0_1*q0*s3;
        const double T34 = c10*gy_1_0*q0*s1;
        const double T35 = c10*gy_1_0*q0*s2;
        const double T36 = c12*gx_1_0*q0*s3;
        const double T37 = c12*gx_1_0*q0*s2;
        const double T38 = c12*gx_1_0*q0*s1;
        const double T39 = c10*gy_1_0*q0*s3;
        A_0_0 += T28*dNdx1 + T30*dNdy1;
        A_0_1 += T31*dNdx1 + T33*dNdy1;
        A_0_2 += T34*dNdx1 + T36*dNdy1;
        A_0_3 += T37*dNdx1 + T39*dNdy1;
        A_1_0 += T29*dNdy1 + T30*dNdx1;
        A_1_1 += T32*dNdy1 + T33*dNdx1;
        A_1_2 += T35*dNdy1 + T36*dNdx1;
        A_1_3 += T38*dNdy1 + T39*dNdx1;
        A_2_0 += T28*dNdx2 + T30*dNdy2;
        A_2_1 += T31*dNdx2 + T33*dNdy2;
        A_2_2 += T34*dNdx2 + T36*dNdy2;
        A_2_3 += T37*dNdx2 + T39*dNdy2;
        A_3_0 += T29*dNdy2 + T30*dNdx2;
        A_3_1 += T32*dNdy2 + T33*dNdx2;
        A_3_2 += T35*dNdy2 + T36*dNdx2;
        A_3_3 += T38*dNdy2 + T39*dNdx2;
        A_4_0 += T28*dNdx3 + T30*dNdy3;
        A_4_1 += T31*dNdx3 + T33*dNdy3;
        A_4_2 += T34*dNdx3 + T36*dNdy3;
        A_4_3 += T37*dNdx3 + T39*dNdy3;
        A_5_0 += T29*dNdy3 + T30*dNdx3;
        A_5_1 += T32*dNdy3 + T33*dNdx3;
        A_5_2 += T35*dNdy3 + T36*dNdx3;
        A_5_3 += T38*dNdy3 + T39*dNdx3;
        A_6_0 += T28*dNdx4 + T30*dNdy4;
        A_6_1 += T31*dNdx4 + T33*dNdy4;
        A_6_2 += T34*dNdx4 + T36*dNdy4;
        A_6_3 += T37*dNdx4 + T39*dNdy4;
        A_7_0 += T29*dNdy4 + T30*dNdx4;
        A_7_1 += T32*dNdy4 + T33*dNdx4;
        A_7_2 += T35*dNdy4 + T36*dNdx4;
        A_7_3 += T38*dNdy4 + T39*dNdx4;
        H_0_0 += T28*c9*gy_0_1*q0 + T30*c11*gx_0_1*q0;
        H_0_1 += T31*c9*gy_0_1*q0 + T33*c11*gx_0_1*q0;
        H_0_2 += T34*c9*gy_0_1*q0 + T36*c11*gx_0_1*q0;
        H_0_3 += T37*c9*gy_0_1*q0 + T39*c11*gx_0_1*q0;
        H_1_1 += T32*c11*gx_0_1*q0 + T33*c9*gy_0_1*q0;
        H_1_2 += T35*c11*gx_0_1*q0 + T36*c9*gy_0_1*q0;
        H_1_3 += T38*c11*gx_0_1*q0 + T39*c9*gy_0_1*q0;
        H_2_2 += T34*c10*gy_1_0*q0 + T36*c12*gx_1_0*q0;
        H_2_3 += T37*c10*gy_1_0*q0 + T39*c12*gx_1_0*q0;
        H_3_3 += T38*c12*gx_1_0*q0 + T39*c10*gy_1_0*q0;
    }
    /* static condensation of the internal unknowns */
    const double cid0 = 1.0/H_0_0;
    const double cL1_0 = H_0_1*cid0;
    const double cL2_0 = H_0_2*cid0;
    const double cL3_0 = H_0_3*cid0;
    const double cd1 = H_1_1 - H_0_0*cL1_0*cL1_0;
    const double cid1 = 1.0/cd1;
    const double cL2_1 = cid1*(H_1_2 - H_0_0*cL1_0*cL2_0);
    const double cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0);
    const double cd2 = H_2_2 - H_0_0*cL2_0*cL2_0 - cd1*cL2_1*cL2_1;
    const double cid2 = 1.0/cd2;
    const double cL3_2 = cid2*(H_2_3 - H_0_0*cL2_0*cL3_0 - cL2_1*cL3_1*cd1);
    const double cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - cd1*cL3_1*cL3_1 - cd2*cL3_2*cL3_2;
    const double cid3 = 1.0/cd3;
    const double cb0 = -A_0_0*u1 - A_1_0*u2 - A_2_0*u3 - A_3_0*u4 - A_4_0*u5 - A_5_0*u6 - A_6_0*u7 - A_7_0*u8;
    const double cb1 = -A_0_1*u1 - A_1_1*u2 - A_2_1*u3 - A_3_1*u4 - A_4_1*u5 - A_5_1*u6 - A_6_1*u7 - A_7_1*u8;
    const double cb2 = -A_0_2*u1 - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6 - A_6_2*u7 - A_7_2*u8;
    const double cb3 = -A_0_3*u1 - A_1_3*u2 - A_2_3*u3 - A_3_3*u4 - A_4_3*u5 - A_5_3*u6 - A_6_3*u7 - A_7_3*u8;
    const double cy1_0 = cb1 - cL1_0*cb0;
    const double cy2_0 = cb2 - cL2_0*cb0 - cL2_1*cy1_0;
    const double cy3_0 = cb3 - cL3_0*cb0 - cL3_1*cy1_0 - cL3_2*cy2_0;
    const double alpha4 = cid3*cy3_0;
    const double alpha3 = cid2*cy2_0 - alpha4*cL3_2;
    const double alpha2 = cid1*cy1_0 - alpha3*cL2_1 - alpha4*cL3_1;
    const double alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha3*cL2_0 - alpha4*cL3_0;
    {   /* gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double q0 = -0.5773502691896257*gx_1_1;
        const double J00 = gx_1_0 + q0;
        const double q1 = -0.5773502691896257*gy_1_1;
        const double J01 = gy_1_0 + q1;
        const double J10 = gx_0_1 + q0;
        const double J11 = gy_0_1 + q1;
        const double detJ = J00*J11 - J01*J10;
        const double q2 = 1.0/detJ;
        const double Ji00 = J11*q2;
        const double Ji01 = -J01*q2;
        const double Ji10 = -J10*q2;
        const double Ji11 = J00*q2;
        const double dNdx1 = -0.39433756729740643*Ji00 - 0.39433756729740643*Ji01;
        const double dNdy1 = -0.39433756729740643*Ji10 - 0.39433756729740643*Ji11;
        const double dNdx2 = 0.39433756729740643*Ji00 - 0.10566243270259355*Ji01;
        const double dNdy2 = 0.39433756729740643*Ji10 - 0.10566243270259355*Ji11;
        const double dNdx3 = 0.10566243270259355*Ji00 + 0.10566243270259355*Ji01;
        const double dNdy3 = 0.10566243270259355*Ji10 + 0.10566243270259355*Ji11;
        const double dNdx4 = 0.39433756729740643*Ji01 - 0.10566243270259355*Ji00;
        const double dNdy4 = 0.39433756729740643*Ji11 - 0.10566243270259355*Ji10;
        const double eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515*alpha1*gy_0_1*q2
            - 1.1547005383792515*alpha3*gy_1_0*q2;
        const double eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515*alpha4*gx_1_0*q2
            - 1.1547005383792515*alpha2*gx_0_1*q2;
        const double eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5
            + dNdy4*u7 + 1.1547005383792515*alpha2*gy_0_1*q2 + 1.1547005383792515*alpha3*gx_1_0*q2
            - 1.1547005383792515*alpha1*gx_0_1*q2 - 1.1547005383792515*alpha4*gy_1_0*q2;
        strain[0] = eps40;
        strain[1] = eps41;
        strain[2] = eps42;
        stress[0] = eps40*m0 + eps41*m1;
        stress[1] = eps40*m1 + eps41*m0;
        stress[2] = eps42*m2;
    }
    {   /* gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double J00 = gx_1_0 - 0.5773502691896257*gx_1_1;
        const double J01 = gy_1_0 - 0.5773502691896257*gy_1_1;
        const double J10 = gx_0_1 + 0.5773502691896257*gx_1_1;
        const double J11 = gy_0_1 + 0.5773502691896257*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        const double q0 = 1.0/detJ;
        const double Ji00 = J11*q0;
        const double Ji01 = -J01*q0;
        const double Ji10 = -J10*q0;
        const double Ji11 = J00*q0;
        const double dNdx1 = -0.10566243270259355*Ji01 - 0.39433756729740643*Ji00;
        const double dNdy1 = -0.10566243270259355*Ji11 - 0.39433756729740643*Ji10;
        const double dNdx2 = 0.39433756729740643*Ji00 - 0.39433756729740643*Ji01;
        const double dNdy2 = 0.39433756729740643*Ji10 - 0.39433756729740643*Ji11;
        const double dNdx3 = 0.10566243270259355*Ji00 + 0.39433756729740643*Ji01;
        const double dNdy3 = 0.10566243270259355*Ji10 + 0.39433756729740643*Ji11;
        const double dNdx4 = 0.10566243270259355*Ji01 - 0.10566243270259355*Ji00;
        const double dNdy4 = 0.10566243270259355*Ji11 - 0.10566243270259355*Ji10;
        const double eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 - 1.1547005383792515*alpha1*gy_0_1*q0
            - 1.1547005383792515*alpha3*gy_1_0*q0;
        const double eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515*alpha2*gx_0_1*q0
            + 1.1547005383792515*alpha4*gx_1_0*q0;
        const double eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5
            + dNdy4*u7 + 1.1547005383792515*alpha1*gx_0_1*q0 + 1.1547005383792515*alpha3*gx_1_0*q0
            - 1.1547005383792515*alpha2*gy_0_1*q0 - 1.1547005383792515*alpha4*gy_1_0*q0;
        strain[3] = eps40;
        strain[4] = eps41;
        strain[5] = eps42;
        stress[3] = eps40*m0 + eps41*m1;
        stress[4] = eps40*m1 + eps41*m0;
        stress[5] = eps42*m2;
    }
    {   /* gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double J00 = gx_1_0 + 0.5773502691896257*gx_1_1;
        const double J01 = gy_1_0 + 0.5773502691896257*gy_1_1;
        const double J10 = gx_0_1 - 0.5773502691896257*gx_1_1;
        const double J11 = gy_0_1 - 0.5773502691896257*gy_1_1;
        const double detJ = J00*J11 - J01*J10;
        const double q0 = 1.0/detJ;
        const double Ji00 = J11*q0;
        const double Ji01 = -J01*q0;
        const double Ji10 = -J10*q0;
        const double Ji11 = J00*q0;
        const double dNdx1 = -0.10566243270259355*Ji00 - 0.39433756729740643*Ji01;
        const double dNdy1 = -0.10566243270259355*Ji10 - 0.39433756729740643*Ji11;
        const double dNdx2 = 0.10566243270259355*Ji00 - 0.10566243270259355*Ji01;
        const double dNdy2 = 0.10566243270259355*Ji10 - 0.10566243270259355*Ji11;
        const double dNdx3 = 0.10566243270259355*Ji01 + 0.39433756729740643*Ji00;
        const double dNdy3 = 0.10566243270259355*Ji11 + 0.39433756729740643*Ji10;
        const double dNdx4 = 0.39433756729740643*Ji01 - 0.39433756729740643*Ji00;
        const double dNdy4 = 0.39433756729740643*Ji11 - 0.39433756729740643*Ji10;
        const double eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515*alpha1*gy_0_1*q0
            + 1.1547005383792515*alpha3*gy_1_0*q0;
        const double eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 - 1.1547005383792515*alpha2*gx_0_1*q0
            - 1.1547005383792515*alpha4*gx_1_0*q0;
        const double eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5
            + dNdy4*u7 + 1.1547005383792515*alpha2*gy_0_1*q0 + 1.1547005383792515*alpha4*gy_1_0*q0
            - 1.1547005383792515*alpha1*gx_0_1*q0 - 1.1547005383792515*alpha3*gx_1_0*q0;
        strain[6] = eps40;
        strain[7] = eps41;
        strain[8] = eps42;
        stress[6] = eps40*m0 + eps41*m1;
        stress[7] = eps40*m1 + eps41*m0;
        stress[8] = eps42*m2;
    }
    {   /* gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double q0 = 0.5773502691896257*gx_1_1;
        const double J00 = gx_1_0 + q0;
        const double q1 = 0.5773502691896257*gy_1_1;
        const double J01 = gy_1_0 + q1;
        const double J10 = gx_0_1 + q0;
        const double J11 = gy_0_1 + q1;
        const double detJ = J00*J11 - J01*J10;
        const double q2 = 1.0/detJ;
        const double Ji00 = J11*q2;
        const double Ji01 = -J01*q2;
        const double Ji10 = -J10*q2;
        const double Ji11 = J00*q2;
        const double dNdx1 = -0.10566243270259355*Ji00 - 0.10566243270259355*Ji01;
        const double dNdy1 = -0.10566243270259355*Ji10 - 0.10566243270259355*Ji11;
        const double dNdx2 = 0.10566243270259355*Ji00 - 0.39433756729740643*Ji01;
        const double dNdy2 = 0.10566243270259355*Ji10 - 0.39433756729740643*Ji11;
        const double dNdx3 = 0.39433756729740643*Ji00 + 0.39433756729740643*Ji01;
        const double dNdy3 = 0.39433756729740643*Ji10 + 0.39433756729740643*Ji11;
        const double dNdx4 = 0.10566243270259355*Ji01 - 0.39433756729740643*Ji00;
        const double dNdy4 = 0.10566243270259355*Ji11 - 0.39433756729740643*Ji10;
        const double eps40 = dNdx1*u1 + dNdx2*u3 + dNdx3*u5 + dNdx4*u7 + 1.1547005383792515*alpha3*gy_1_0*q2
            - 1.1547005383792515*alpha1*gy_0_1*q2;
        const double eps41 = dNdy1*u2 + dNdy2*u4 + dNdy3*u6 + dNdy4*u8 + 1.1547005383792515*alpha2*gx_0_1*q2
            - 1.1547005383792515*alpha4*gx_1_0*q2;
        const double eps42 = dNdx1*u2 + dNdx2*u4 + dNdx3*u6 + dNdx4*u8 + dNdy1*u1 + dNdy2*u3 + dNdy3*u5
            + dNdy4*u7 + 1.1547005383792515*alpha1*gx_0_1*q2 + 1.1547005383792515*alpha4*gy_1_0*q2
            - 1.1547005383792515*alpha2*gy_0_1*q2 - 1.1547005383792515*alpha3*gx_1_0*q2;
        strain[9] = eps40;
        strain[10] = eps41;
        strain[11] = eps42;
        stress[9] = eps40*m0 + eps41*m1;
        stress[10] = eps40*m1 + eps41*m0;
        stress[11] = eps42*m2;
    }
}

void derive_q4_incompatible_centred_plane_stress_recovery(long n, const double *restrict xy, const double *restrict u, double E, double nu,
                           double *restrict strain, double *restrict stress)
{
    double mat[NMAT];
    q4_incompatible_centred_plane_stress_material(E, nu, 1.0, mat);
    for (long e = 0; e < n; ++e)
        q4_incompatible_centred_plane_stress_recovery_body(xy + (size_t)e * NIN, u + (size_t)e * 8, mat,
                                 strain + (size_t)e * 12, stress + (size_t)e * 12);
}
