/*
 * derive generated kernel: Q4 hybrid5 plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  assumed-stress hybrid, 5 stress parameters: K = G^T H^-1 G [Pian & Sumihara (1984)]
 * integration  B^T P (G^T): gauss-2x2 (4 points); -P^T D^-1 P (-H): gauss-2x2 (4 points)
 * internal     5 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
 *              (unrolled factorisation of K_aa, no pivoting)
 * flops        stiffness 1572, validity 89, recovery 1309 per element (add, mul, div, sqrt)
 *
 * arguments (units-agnostic; any consistent set of units):
 *   xy      nodal coordinates, shape (n, 4, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
 *           node i+1 (counter-clockwise corners first, then mid-side, then interior)
 *   E       Young's modulus (> 0), scalar
 *   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
 *   t       thickness t (the out-of-plane thickness)
 *   u       nodal displacements for recovery, shape (n, 8), interleaved u1, v1, u2, v2, ...
 *   K       stiffness, shape (n, 8, 8), DOFs interleaved u1, v1, u2, v2, ...; symmetric; the 5
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
 *              derive kernel Q4 --variant hybrid5 --state plane-stress --lang c
 *
 * C99.  Compile e.g. with: cc -O3 -march=native -c q4_hybrid5_plane_stress.c
 * (with GCC add -fno-tree-slp-vectorize: same speed, much shorter compile times).
 * Data layout: every array is dense, row-major (C order), float64.  The batch kernel
 * copies 8 elements at a time into element-innermost scratch arrays so that the
 * per-element body is vectorised across elements (one SIMD lane per element).
 */
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <string.h>
#include "q4_hybrid5_plane_stress.h"

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
#define NMAT 12
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
static inline void q4_hybrid5_plane_stress_material(double E, double nu, double t, double *restrict mat)
{
    mat[0] = E;
    mat[1] = nu;
    mat[2] = t;
    mat[3] = -1.0/E;   /* m0 */
    mat[4] = nu/E;   /* m1 */
    mat[5] = -(2.0 + 2.0*nu)/E;   /* m2 */
    mat[6] = 1.0/E;   /* m3 */
    mat[7] = -nu/E;   /* m4 */
    mat[8] = (2.0 + 2.0*nu)/E;   /* m5 */
    mat[9] = E/(1.0 - nu*nu);   /* m6 */
    mat[10] = E*nu/(1.0 - nu*nu);   /* m7 */
    mat[11] = E*(0.5 - 0.5*nu)/(1.0 - nu*nu);   /* m8 */
}

/* stiffness of one element; xy[k * sx] is input k, K[k * sk] output k (row-major) */
DERIVE_INLINE void q4_hybrid5_plane_stress_stiffness_body(const double *restrict xy, const ptrdiff_t sx,
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
    const double e0 = gx_1_0*gx_1_0;
    const double e1 = gx_0_1*gx_0_1;
    const double e2 = gy_1_0*gy_1_0;
    const double e3 = gy_0_1*gy_0_1;
    const double e4 = gx_1_0*gy_1_0;
    const double e5 = gx_0_1*gy_0_1;
    double A_0_0 = 0.0, A_0_2 = 0.0, A_0_3 = 0.0, A_0_4 = 0.0, A_1_1 = 0.0, A_1_2 = 0.0, A_1_3 = 0.0;
    double A_1_4 = 0.0, A_2_0 = 0.0, A_2_2 = 0.0, A_2_3 = 0.0, A_2_4 = 0.0, A_3_1 = 0.0, A_3_2 = 0.0;
    double A_3_3 = 0.0, A_3_4 = 0.0, A_4_0 = 0.0, A_4_2 = 0.0, A_4_3 = 0.0, A_4_4 = 0.0, A_5_1 = 0.0;
    double A_5_2 = 0.0, A_5_3 = 0.0, A_5_4 = 0.0, A_6_0 = 0.0, A_6_2 = 0.0, A_6_3 = 0.0, A_6_4 = 0.0;
    double A_7_1 = 0.0, A_7_2 = 0.0, A_7_3 = 0.0, A_7_4 = 0.0, H_0_0 = 0.0, H_0_1 = 0.0, H_0_3 = 0.0;
    double H_0_4 = 0.0, H_1_1 = 0.0, H_1_3 = 0.0, H_1_4 = 0.0, H_2_2 = 0.0, H_2_3 = 0.0, H_2_4 = 0.0;
    double H_3_3 = 0.0, H_3_4 = 0.0, H_4_4 = 0.0;
    for (int p = 0; p < 4; ++p) {   /* gauss-2x2: loop over the 4 points */
        const double c0 = KS0_c0[p];
        const double c1 = KS0_c1[p];
        const double c2 = KS0_c2[p];
        const double c3 = KS0_c3[p];
        const double c4 = KS0_c4[p];
        const double c5 = KS0_c5[p];
        const double c6 = KS0_c6[p];
        const double c7 = KS0_c7[p];
        const double eta = KS0_eta[p];
        const double w = KS0_w[p];
        const double xi = KS0_xi[p];
        const double J00 = gx_1_0 + eta*gx_1_1;
        const double J01 = gy_1_0 + eta*gy_1_1;
        const double J10 = gx_0_1 + gx_1_1*xi;
        const double J11 = gy_0_1 + gy_1_1*xi;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = Ji00*c0 + Ji01*c1;
        const double dNdy1 = Ji10*c0 + Ji11*c1;
        const double dNdx2 = Ji00*c2 + Ji01*c3;
        const double dNdy2 = Ji10*c2 + Ji11*c3;
        const double dNdx3 = Ji00*c4 + Ji01*c5;
        const double dNdy3 = Ji10*c4 + Ji11*c5;
        const double dNdx4 = Ji00*c6 + Ji01*c7;
        const double dNdy4 = Ji10*c6 + Ji11*c7;
        const double sc0 = detJ*t*w;
        const double T1 = e0*eta*sc0;
        const double T2 = e2*eta*sc0;
        const double T3 = e4*eta*sc0;
        const double T4 = e1*sc0*xi;
        const double T5 = e3*sc0*xi;
        const double T6 = e5*sc0*xi;
        const double s7 = m0*sc0;
        const double s8 = m1*sc0;
        const double s9 = m2*sc0;
        const double T10 = e0*eta*s7 + e2*eta*s8;
        const double T11 = e0*eta*s8 + e2*eta*s7;
        const double T12 = e4*eta*s9;
        const double T13 = e1*s7*xi + e3*s8*xi;
        const double T14 = e1*s8*xi + e3*s7*xi;
        const double T15 = e5*s9*xi;
        const double q0 = dNdx1*sc0;
        const double q1 = dNdy1*sc0;
        const double q2 = dNdx2*sc0;
        const double q3 = dNdy2*sc0;
        const double q4 = dNdx3*sc0;
        const double q5 = dNdy3*sc0;
        const double q6 = dNdx4*sc0;
        const double q7 = dNdy4*sc0;
        A_0_0 += q0;
        A_0_2 += q1;
        A_0_3 += T1*dNdx1 + T3*dNdy1;
        A_0_4 += T4*dNdx1 + T6*dNdy1;
        A_1_1 += q1;
        A_1_2 += q0;
        A_1_3 += T2*dNdy1 + T3*dNdx1;
        A_1_4 += T5*dNdy1 + T6*dNdx1;
        A_2_0 += q2;
        A_2_2 += q3;
        A_2_3 += T1*dNdx2 + T3*dNdy2;
        A_2_4 += T4*dNdx2 + T6*dNdy2;
        A_3_1 += q3;
        A_3_2 += q2;
        A_3_3 += T2*dNdy2 + T3*dNdx2;
        A_3_4 += T5*dNdy2 + T6*dNdx2;
        A_4_0 += q4;
        A_4_2 += q5;
        A_4_3 += T1*dNdx3 + T3*dNdy3;
        A_4_4 += T4*dNdx3 + T6*dNdy3;
        A_5_1 += q5;
        A_5_2 += q4;
        A_5_3 += T2*dNdy3 + T3*dNdx3;
        A_5_4 += T5*dNdy3 + T6*dNdx3;
        A_6_0 += q6;
        A_6_2 += q7;
        A_6_3 += T1*dNdx4 + T3*dNdy4;
        A_6_4 += T4*dNdx4 + T6*dNdy4;
        A_7_1 += q7;
        A_7_2 += q6;
        A_7_3 += T2*dNdy4 + T3*dNdx4;
        A_7_4 += T5*dNdy4 + T6*dNdx4;
        H_0_0 += s7;
        H_0_1 += s8;
        H_0_3 += T10;
        H_0_4 += T13;
        H_1_1 += s7;
        H_1_3 += T11;
        H_1_4 += T14;
        H_2_2 += s9;
        H_2_3 += T12;
        H_2_4 += T15;
        H_3_3 += T10*e0*eta + T11*e2*eta + T12*e4*eta;
        H_3_4 += T13*e0*eta + T14*e2*eta + T15*e4*eta;
        H_4_4 += T13*e1*xi + T14*e3*xi + T15*e5*xi;
    }
    /* static condensation of the internal unknowns */
    const double cid0 = 1.0/H_0_0;
    const double cL1_0 = H_0_1*cid0;
    const double cL3_0 = H_0_3*cid0;
    const double cL4_0 = H_0_4*cid0;
    const double cd1 = H_1_1 - H_0_0*cL1_0*cL1_0;
    const double cid1 = 1.0/cd1;
    const double cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0);
    const double cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0);
    const double cid2 = 1.0/H_2_2;
    const double cL3_2 = H_2_3*cid2;
    const double cL4_2 = H_2_4*cid2;
    const double cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1;
    const double cid3 = 1.0/cd3;
    const double cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1);
    const double cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3;
    const double cid4 = 1.0/cd4;
    const double cy1_0 = -A_0_0*cL1_0;
    const double cy3_0 = A_0_3 - A_0_0*cL3_0 - A_0_2*cL3_2 - cL3_1*cy1_0;
    const double cy4_0 = A_0_4 - A_0_0*cL4_0 - A_0_2*cL4_2 - cL4_1*cy1_0 - cL4_3*cy3_0;
    const double cy3_1 = A_1_3 - A_1_1*cL3_1 - A_1_2*cL3_2;
    const double cy4_1 = A_1_4 - A_1_1*cL4_1 - A_1_2*cL4_2 - cL4_3*cy3_1;
    const double cy1_2 = -A_2_0*cL1_0;
    const double cy3_2 = A_2_3 - A_2_0*cL3_0 - A_2_2*cL3_2 - cL3_1*cy1_2;
    const double cy4_2 = A_2_4 - A_2_0*cL4_0 - A_2_2*cL4_2 - cL4_1*cy1_2 - cL4_3*cy3_2;
    const double cy3_3 = A_3_3 - A_3_1*cL3_1 - A_3_2*cL3_2;
    const double cy4_3 = A_3_4 - A_3_1*cL4_1 - A_3_2*cL4_2 - cL4_3*cy3_3;
    const double cy1_4 = -A_4_0*cL1_0;
    const double cy3_4 = A_4_3 - A_4_0*cL3_0 - A_4_2*cL3_2 - cL3_1*cy1_4;
    const double cy4_4 = A_4_4 - A_4_0*cL4_0 - A_4_2*cL4_2 - cL4_1*cy1_4 - cL4_3*cy3_4;
    const double cy3_5 = A_5_3 - A_5_1*cL3_1 - A_5_2*cL3_2;
    const double cy4_5 = A_5_4 - A_5_1*cL4_1 - A_5_2*cL4_2 - cL4_3*cy3_5;
    const double cy1_6 = -A_6_0*cL1_0;
    const double cy3_6 = A_6_3 - A_6_0*cL3_0 - A_6_2*cL3_2 - cL3_1*cy1_6;
    const double cy4_6 = A_6_4 - A_6_0*cL4_0 - A_6_2*cL4_2 - cL4_1*cy1_6 - cL4_3*cy3_6;
    const double cy3_7 = A_7_3 - A_7_1*cL3_1 - A_7_2*cL3_2;
    const double cy4_7 = A_7_4 - A_7_1*cL4_1 - A_7_2*cL4_2 - cL4_3*cy3_7;
    const double cz0_0 = A_0_0*cid0;
    const double cz1_0 = cid1*cy1_0;
    const double cz2_0 = A_0_2*cid2;
    const double cz3_0 = cid3*cy3_0;
    const double cz4_0 = cid4*cy4_0;
    const double cz1_1 = A_1_1*cid1;
    const double cz2_1 = A_1_2*cid2;
    const double cz3_1 = cid3*cy3_1;
    const double cz4_1 = cid4*cy4_1;
    const double cz0_2 = A_2_0*cid0;
    const double cz1_2 = cid1*cy1_2;
    const double cz2_2 = A_2_2*cid2;
    const double cz3_2 = cid3*cy3_2;
    const double cz4_2 = cid4*cy4_2;
    const double cz1_3 = A_3_1*cid1;
    const double cz2_3 = A_3_2*cid2;
    const double cz3_3 = cid3*cy3_3;
    const double cz4_3 = cid4*cy4_3;
    const double cz0_4 = A_4_0*cid0;
    const double cz1_4 = cid1*cy1_4;
    const double cz2_4 = A_4_2*cid2;
    const double cz3_4 = cid3*cy3_4;
    const double cz4_4 = cid4*cy4_4;
    const double cz1_5 = A_5_1*cid1;
    const double cz2_5 = A_5_2*cid2;
    const double cz3_5 = cid3*cy3_5;
    const double cz4_5 = cid4*cy4_5;
    const double cz0_6 = A_6_0*cid0;
    const double cz1_6 = cid1*cy1_6;
    const double cz2_6 = A_6_2*cid2;
    const double cz3_6 = cid3*cy3_6;
    const double cz4_6 = cid4*cy4_6;
    const double cz1_7 = A_7_1*cid1;
    const double cz2_7 = A_7_2*cid2;
    const double cz3_7 = cid3*cy3_7;
    const double cz4_7 = cid4*cy4_7;
    K[0 * sk] = -A_0_0*cz0_0 - A_0_2*cz2_0 - cy1_0*cz1_0 - cy3_0*cz3_0 - cy4_0*cz4_0;
    K[1 * sk] = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0;
    K[2 * sk] = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0;
    K[3 * sk] = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0;
    K[4 * sk] = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0;
    K[5 * sk] = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0;
    K[6 * sk] = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0;
    K[7 * sk] = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0;
    K[8 * sk] = -A_1_1*cz1_0 - A_1_2*cz2_0 - cy3_1*cz3_0 - cy4_1*cz4_0;
    K[9 * sk] = -A_1_1*cz1_1 - A_1_2*cz2_1 - cy3_1*cz3_1 - cy4_1*cz4_1;
    K[10 * sk] = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1;
    K[11 * sk] = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1;
    K[12 * sk] = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1;
    K[13 * sk] = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1;
    K[14 * sk] = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1;
    K[15 * sk] = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1;
    K[16 * sk] = -A_2_0*cz0_0 - A_2_2*cz2_0 - cy1_2*cz1_0 - cy3_2*cz3_0 - cy4_2*cz4_0;
    K[17 * sk] = -A_2_2*cz2_1 - cy1_2*cz1_1 - cy3_2*cz3_1 - cy4_2*cz4_1;
    K[18 * sk] = -A_2_0*cz0_2 - A_2_2*cz2_2 - cy1_2*cz1_2 - cy3_2*cz3_2 - cy4_2*cz4_2;
    K[19 * sk] = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2;
    K[20 * sk] = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2;
    K[21 * sk] = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2;
    K[22 * sk] = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2;
    K[23 * sk] = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2;
    K[24 * sk] = -A_3_1*cz1_0 - A_3_2*cz2_0 - cy3_3*cz3_0 - cy4_3*cz4_0;
    K[25 * sk] = -A_3_1*cz1_1 - A_3_2*cz2_1 - cy3_3*cz3_1 - cy4_3*cz4_1;
    K[26 * sk] = -A_3_1*cz1_2 - A_3_2*cz2_2 - cy3_3*cz3_2 - cy4_3*cz4_2;
    K[27 * sk] = -A_3_1*cz1_3 - A_3_2*cz2_3 - cy3_3*cz3_3 - cy4_3*cz4_3;
    K[28 * sk] = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3;
    K[29 * sk] = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3;
    K[30 * sk] = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3;
    K[31 * sk] = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3;
    K[32 * sk] = -A_4_0*cz0_0 - A_4_2*cz2_0 - cy1_4*cz1_0 - cy3_4*cz3_0 - cy4_4*cz4_0;
    K[33 * sk] = -A_4_2*cz2_1 - cy1_4*cz1_1 - cy3_4*cz3_1 - cy4_4*cz4_1;
    K[34 * sk] = -A_4_0*cz0_2 - A_4_2*cz2_2 - cy1_4*cz1_2 - cy3_4*cz3_2 - cy4_4*cz4_2;
    K[35 * sk] = -A_4_2*cz2_3 - cy1_4*cz1_3 - cy3_4*cz3_3 - cy4_4*cz4_3;
    K[36 * sk] = -A_4_0*cz0_4 - A_4_2*cz2_4 - cy1_4*cz1_4 - cy3_4*cz3_4 - cy4_4*cz4_4;
    K[37 * sk] = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4;
    K[38 * sk] = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4;
    K[39 * sk] = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4;
    K[40 * sk] = -A_5_1*cz1_0 - A_5_2*cz2_0 - cy3_5*cz3_0 - cy4_5*cz4_0;
    K[41 * sk] = -A_5_1*cz1_1 - A_5_2*cz2_1 - cy3_5*cz3_1 - cy4_5*cz4_1;
    K[42 * sk] = -A_5_1*cz1_2 - A_5_2*cz2_2 - cy3_5*cz3_2 - cy4_5*cz4_2;
    K[43 * sk] = -A_5_1*cz1_3 - A_5_2*cz2_3 - cy3_5*cz3_3 - cy4_5*cz4_3;
    K[44 * sk] = -A_5_1*cz1_4 - A_5_2*cz2_4 - cy3_5*cz3_4 - cy4_5*cz4_4;
    K[45 * sk] = -A_5_1*cz1_5 - A_5_2*cz2_5 - cy3_5*cz3_5 - cy4_5*cz4_5;
    K[46 * sk] = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5;
    K[47 * sk] = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5;
    K[48 * sk] = -A_6_0*cz0_0 - A_6_2*cz2_0 - cy1_6*cz1_0 - cy3_6*cz3_0 - cy4_6*cz4_0;
    K[49 * sk] = -A_6_2*cz2_1 - cy1_6*cz1_1 - cy3_6*cz3_1 - cy4_6*cz4_1;
    K[50 * sk] = -A_6_0*cz0_2 - A_6_2*cz2_2 - cy1_6*cz1_2 - cy3_6*cz3_2 - cy4_6*cz4_2;
    K[51 * sk] = -A_6_2*cz2_3 - cy1_6*cz1_3 - cy3_6*cz3_3 - cy4_6*cz4_3;
    K[52 * sk] = -A_6_0*cz0_4 - A_6_2*cz2_4 - cy1_6*cz1_4 - cy3_6*cz3_4 - cy4_6*cz4_4;
    K[53 * sk] = -A_6_2*cz2_5 - cy1_6*cz1_5 - cy3_6*cz3_5 - cy4_6*cz4_5;
    K[54 * sk] = -A_6_0*cz0_6 - A_6_2*cz2_6 - cy1_6*cz1_6 - cy3_6*cz3_6 - cy4_6*cz4_6;
    K[55 * sk] = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6;
    K[56 * sk] = -A_7_1*cz1_0 - A_7_2*cz2_0 - cy3_7*cz3_0 - cy4_7*cz4_0;
    K[57 * sk] = -A_7_1*cz1_1 - A_7_2*cz2_1 - cy3_7*cz3_1 - cy4_7*cz4_1;
    K[58 * sk] = -A_7_1*cz1_2 - A_7_2*cz2_2 - cy3_7*cz3_2 - cy4_7*cz4_2;
    K[59 * sk] = -A_7_1*cz1_3 - A_7_2*cz2_3 - cy3_7*cz3_3 - cy4_7*cz4_3;
    K[60 * sk] = -A_7_1*cz1_4 - A_7_2*cz2_4 - cy3_7*cz3_4 - cy4_7*cz4_4;
    K[61 * sk] = -A_7_1*cz1_5 - A_7_2*cz2_5 - cy3_7*cz3_5 - cy4_7*cz4_5;
    K[62 * sk] = -A_7_1*cz1_6 - A_7_2*cz2_6 - cy3_7*cz3_6 - cy4_7*cz4_6;
    K[63 * sk] = -A_7_1*cz1_7 - A_7_2*cz2_7 - cy3_7*cz3_7 - cy4_7*cz4_7;
}

void derive_q4_hybrid5_plane_stress_stiffness(const double *restrict xy, double E, double nu, double t, double *restrict K)
{
    double mat[NMAT];
    q4_hybrid5_plane_stress_material(E, nu, t, mat);
    q4_hybrid5_plane_stress_stiffness_body(xy, 1, mat, K, 1);
}

/* copy count doubles to dst, streaming (non-temporal) where dst is vector-aligned */
static inline void q4_hybrid5_plane_stress_store(double *restrict dst, const double *restrict src, long count, int stream)
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
static inline void q4_hybrid5_plane_stress_transpose(const double *restrict out, double *restrict rows, long m)
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

void derive_q4_hybrid5_plane_stress_stiffness_batch(long n, const double *restrict xy, double E, double nu, double t,
                                  double *restrict K)
{
    double mat[NMAT];
    double in[NIN * LANES];
    double out[NK * LANES];
    double rows[NK * LANES];
    /* stream only when K is much larger than the caches it would otherwise fill */
    const int stream = (double)n * NK * sizeof(double) > 8.0e6;
    q4_hybrid5_plane_stress_material(E, nu, t, mat);
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
            q4_hybrid5_plane_stress_stiffness_body(in + l, LANES, mat, out + l, LANES);
        q4_hybrid5_plane_stress_transpose(out, rows, m);
        q4_hybrid5_plane_stress_store(K + (size_t)b * NK, rows, m * NK, stream);
    }
#ifdef DERIVE_VEC
    if (stream)
        _mm_sfence();
#endif
}

/* minimum of det J over the points of the full rule, one element */
static inline void q4_hybrid5_plane_stress_validity_body(const double *restrict xy, double *restrict detJ_min)
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

void derive_q4_hybrid5_plane_stress_validity(long n, const double *restrict xy, double *restrict detJ_min)
{
    for (long e = 0; e < n; ++e)
        q4_hybrid5_plane_stress_validity_body(xy + (size_t)e * NIN, detJ_min + e);
}

/* strain and stress at the 4 points of the full rule, one element */
static inline void q4_hybrid5_plane_stress_recovery_body(const double *restrict xy, const double *restrict u,
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
    const double m3 = mat[6];
    const double m4 = mat[7];
    const double m5 = mat[8];
    const double m6 = mat[9];
    const double m7 = mat[10];
    const double m8 = mat[11];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = -0.25*x1 - 0.25*x2 + 0.25*x3 + 0.25*x4;
    const double gx_1_0 = -0.25*x1 - 0.25*x4 + 0.25*x2 + 0.25*x3;
    const double gx_1_1 = -0.25*x2 - 0.25*x4 + 0.25*x1 + 0.25*x3;
    const double gy_0_1 = -0.25*y1 - 0.25*y2 + 0.25*y3 + 0.25*y4;
    const double gy_1_0 = -0.25*y1 - 0.25*y4 + 0.25*y2 + 0.25*y3;
    const double gy_1_1 = -0.25*y2 - 0.25*y4 + 0.25*y1 + 0.25*y3;
    const double e0 = gx_1_0*gx_1_0;
    const double e1 = gx_0_1*gx_0_1;
    const double e2 = gy_1_0*gy_1_0;
    const double e3 = gy_0_1*gy_0_1;
    const double e4 = gx_1_0*gy_1_0;
    const double e5 = gx_0_1*gy_0_1;
    const double e6 = m3*gx_1_0*gx_1_0;
    const double e7 = m1*gy_1_0*gy_1_0;
    const double e8 = m3*gx_0_1*gx_0_1;
    const double e9 = m1*gy_0_1*gy_0_1;
    const double e10 = m3*gy_1_0*gy_1_0;
    const double e11 = m1*gx_1_0*gx_1_0;
    const double e12 = m3*gy_0_1*gy_0_1;
    const double e13 = m1*gx_0_1*gx_0_1;
    const double e14 = gx_1_0*gy_1_0*m5;
    const double e15 = gx_0_1*gy_0_1*m5;
    double A_0_0 = 0.0, A_0_2 = 0.0, A_0_3 = 0.0, A_0_4 = 0.0, A_1_1 = 0.0, A_1_2 = 0.0, A_1_3 = 0.0;
    double A_1_4 = 0.0, A_2_0 = 0.0, A_2_2 = 0.0, A_2_3 = 0.0, A_2_4 = 0.0, A_3_1 = 0.0, A_3_2 = 0.0;
    double A_3_3 = 0.0, A_3_4 = 0.0, A_4_0 = 0.0, A_4_2 = 0.0, A_4_3 = 0.0, A_4_4 = 0.0, A_5_1 = 0.0;
    double A_5_2 = 0.0, A_5_3 = 0.0, A_5_4 = 0.0, A_6_0 = 0.0, A_6_2 = 0.0, A_6_3 = 0.0, A_6_4 = 0.0;
    double A_7_1 = 0.0, A_7_2 = 0.0, A_7_3 = 0.0, A_7_4 = 0.0, H_0_0 = 0.0, H_0_1 = 0.0, H_0_3 = 0.0;
    double H_0_4 = 0.0, H_1_1 = 0.0, H_1_3 = 0.0, H_1_4 = 0.0, H_2_2 = 0.0, H_2_3 = 0.0, H_2_4 = 0.0;
    double H_3_3 = 0.0, H_3_4 = 0.0, H_4_4 = 0.0;
    for (int p = 0; p < 4; ++p) {   /* gauss-2x2: loop over the 4 points */
        const double c0 = KR0_c0[p];
        const double c1 = KR0_c1[p];
        const double c2 = KR0_c2[p];
        const double c3 = KR0_c3[p];
        const double c4 = KR0_c4[p];
        const double c5 = KR0_c5[p];
        const double c6 = KR0_c6[p];
        const double c7 = KR0_c7[p];
        const double eta = KR0_eta[p];
        const double w = KR0_w[p];
        const double xi = KR0_xi[p];
        const double J00 = gx_1_0 + eta*gx_1_1;
        const double J01 = gy_1_0 + eta*gy_1_1;
        const double J10 = gx_0_1 + gx_1_1*xi;
        const double J11 = gy_0_1 + gy_1_1*xi;
        const double detJ = J00*J11 - J01*J10;
        const double idet = 1.0/detJ;
        const double Ji00 = J11*idet;
        const double Ji01 = -J01*idet;
        const double Ji10 = -J10*idet;
        const double Ji11 = J00*idet;
        const double dNdx1 = Ji00*c0 + Ji01*c1;
        const double dNdy1 = Ji10*c0 + Ji11*c1;
        const double dNdx2 = Ji00*c2 + Ji01*c3;
        const double dNdy2 = Ji10*c2 + Ji11*c3;
        const double dNdx3 = Ji00*c4 + Ji01*c5;
        const double dNdy3 = Ji10*c4 + Ji11*c5;
        const double dNdx4 = Ji00*c6 + Ji01*c7;
        const double dNdy4 = Ji10*c6 + Ji11*c7;
        const double sc0 = detJ*t*w;
        const double T1 = e0*eta*sc0;
        const double T2 = e2*eta*sc0;
        const double T3 = e4*eta*sc0;
        const double T4 = e1*sc0*xi;
        const double T5 = e3*sc0*xi;
        const double T6 = e5*sc0*xi;
        const double s7 = m0*sc0;
        const double s8 = m1*sc0;
        const double s9 = m2*sc0;
        const double T10 = e0*eta*s7 + e2*eta*s8;
        const double T11 = e0*eta*s8 + e2*eta*s7;
        const double T12 = e4*eta*s9;
        const double T13 = e1*s7*xi + e3*s8*xi;
        const double T14 = e1*s8*xi + e3*s7*xi;
        const double T15 = e5*s9*xi;
        const double q0 = dNdx1*sc0;
        const double q1 = dNdy1*sc0;
        const double q2 = dNdx2*sc0;
        const double q3 = dNdy2*sc0;
        const double q4 = dNdx3*sc0;
        const double q5 = dNdy3*sc0;
        const double q6 = dNdx4*sc0;
        const double q7 = dNdy4*sc0;
        A_0_0 += q0;
        A_0_2 += q1;
        A_0_3 += T1*dNdx1 + T3*dNdy1;
        A_0_4 += T4*dNdx1 + T6*dNdy1;
        A_1_1 += q1;
        A_1_2 += q0;
        A_1_3 += T2*dNdy1 + T3*dNdx1;
        A_1_4 += T5*dNdy1 + T6*dNdx1;
        A_2_0 += q2;
        A_2_2 += q3;
        A_2_3 += T1*dNdx2 + T3*dNdy2;
        A_2_4 += T4*dNdx2 + T6*dNdy2;
        A_3_1 += q3;
        A_3_2 += q2;
        A_3_3 += T2*dNdy2 + T3*dNdx2;
        A_3_4 += T5*dNdy2 + T6*dNdx2;
        A_4_0 += q4;
        A_4_2 += q5;
        A_4_3 += T1*dNdx3 + T3*dNdy3;
        A_4_4 += T4*dNdx3 + T6*dNdy3;
        A_5_1 += q5;
        A_5_2 += q4;
        A_5_3 += T2*dNdy3 + T3*dNdx3;
        A_5_4 += T5*dNdy3 + T6*dNdx3;
        A_6_0 += q6;
        A_6_2 += q7;
        A_6_3 += T1*dNdx4 + T3*dNdy4;
        A_6_4 += T4*dNdx4 + T6*dNdy4;
        A_7_1 += q7;
        A_7_2 += q6;
        A_7_3 += T2*dNdy4 + T3*dNdx4;
        A_7_4 += T5*dNdy4 + T6*dNdx4;
        H_0_0 += s7;
        H_0_1 += s8;
        H_0_3 += T10;
        H_0_4 += T13;
        H_1_1 += s7;
        H_1_3 += T11;
        H_1_4 += T14;
        H_2_2 += s9;
        H_2_3 += T12;
        H_2_4 += T15;
        H_3_3 += T10*e0*eta + T11*e2*eta + T12*e4*eta;
        H_3_4 += T13*e0*eta + T14*e2*eta + T15*e4*eta;
        H_4_4 += T13*e1*xi + T14*e3*xi + T15*e5*xi;
    }
    /* static condensation of the internal unknowns */
    const double cid0 = 1.0/H_0_0;
    const double cL1_0 = H_0_1*cid0;
    const double cL3_0 = H_0_3*cid0;
    const double cL4_0 = H_0_4*cid0;
    const double cd1 = H_1_1 - H_0_0*cL1_0*cL1_0;
    const double cid1 = 1.0/cd1;
    const double cL3_1 = cid1*(H_1_3 - H_0_0*cL1_0*cL3_0);
    const double cL4_1 = cid1*(H_1_4 - H_0_0*cL1_0*cL4_0);
    const double cid2 = 1.0/H_2_2;
    const double cL3_2 = H_2_3*cid2;
    const double cL4_2 = H_2_4*cid2;
    const double cd3 = H_3_3 - H_0_0*cL3_0*cL3_0 - H_2_2*cL3_2*cL3_2 - cd1*cL3_1*cL3_1;
    const double cid3 = 1.0/cd3;
    const double cL4_3 = cid3*(H_3_4 - H_0_0*cL3_0*cL4_0 - H_2_2*cL3_2*cL4_2 - cL3_1*cL4_1*cd1);
    const double cd4 = H_4_4 - H_0_0*cL4_0*cL4_0 - H_2_2*cL4_2*cL4_2 - cd1*cL4_1*cL4_1 - cd3*cL4_3*cL4_3;
    const double cid4 = 1.0/cd4;
    const double cb0 = -A_0_0*u1 - A_2_0*u3 - A_4_0*u5 - A_6_0*u7;
    const double cb1 = -A_1_1*u2 - A_3_1*u4 - A_5_1*u6 - A_7_1*u8;
    const double cb2 = -A_0_2*u1 - A_1_2*u2 - A_2_2*u3 - A_3_2*u4 - A_4_2*u5 - A_5_2*u6 - A_6_2*u7 - A_7_2*u8;
    const double cb3 = -A_0_3*u1 - A_1_3*u2 - A_2_3*u3 - A_3_3*u4 - A_4_3*u5 - A_5_3*u6 - A_6_3*u7 - A_7_3*u8;
    const double cb4 = -A_0_4*u1 - A_1_4*u2 - A_2_4*u3 - A_3_4*u4 - A_4_4*u5 - A_5_4*u6 - A_6_4*u7 - A_7_4*u8;
    const double cy1_0 = cb1 - cL1_0*cb0;
    const double cy3_0 = cb3 - cL3_0*cb0 - cL3_1*cy1_0 - cL3_2*cb2;
    const double cy4_0 = cb4 - cL4_0*cb0 - cL4_1*cy1_0 - cL4_2*cb2 - cL4_3*cy3_0;
    const double alpha5 = cid4*cy4_0;
    const double alpha4 = cid3*cy3_0 - alpha5*cL4_3;
    const double alpha3 = cb2*cid2 - alpha4*cL3_2 - alpha5*cL4_2;
    const double alpha2 = cid1*cy1_0 - alpha4*cL3_1 - alpha5*cL4_1;
    const double alpha1 = cb0*cid0 - alpha2*cL1_0 - alpha4*cL3_0 - alpha5*cL4_0;
    {   /* gauss-2x2 point 1 of 4: xi = -0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257*e7 - 0.5773502691896257*e6)
            + alpha5*(0.5773502691896257*e9 - 0.5773502691896257*e8);
        const double eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257*e11 - 0.5773502691896257*e10)
            + alpha5*(0.5773502691896257*e13 - 0.5773502691896257*e12);
        const double eps18 = alpha3*m5 - 0.5773502691896257*alpha4*e14 - 0.5773502691896257*alpha5*e15;
        strain[0] = eps16;
        strain[1] = eps17;
        strain[2] = eps18;
        stress[0] = eps16*m6 + eps17*m7;
        stress[1] = eps16*m7 + eps17*m6;
        stress[2] = eps18*m8;
    }
    {   /* gauss-2x2 point 2 of 4: xi = 0.5773502691896257, eta = -0.5773502691896257, weight = 1 */
        const double eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257*e7 - 0.5773502691896257*e6)
            + alpha5*(0.5773502691896257*e8 - 0.5773502691896257*e9);
        const double eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257*e11 - 0.5773502691896257*e10)
            + alpha5*(0.5773502691896257*e12 - 0.5773502691896257*e13);
        const double eps18 = alpha3*m5 + 0.5773502691896257*alpha5*e15 - 0.5773502691896257*alpha4*e14;
        strain[3] = eps16;
        strain[4] = eps17;
        strain[5] = eps18;
        stress[3] = eps16*m6 + eps17*m7;
        stress[4] = eps16*m7 + eps17*m6;
        stress[5] = eps18*m8;
    }
    {   /* gauss-2x2 point 3 of 4: xi = -0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257*e6 - 0.5773502691896257*e7)
            + alpha5*(0.5773502691896257*e9 - 0.5773502691896257*e8);
        const double eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257*e10 - 0.5773502691896257*e11)
            + alpha5*(0.5773502691896257*e13 - 0.5773502691896257*e12);
        const double eps18 = alpha3*m5 + 0.5773502691896257*alpha4*e14 - 0.5773502691896257*alpha5*e15;
        strain[6] = eps16;
        strain[7] = eps17;
        strain[8] = eps18;
        stress[6] = eps16*m6 + eps17*m7;
        stress[7] = eps16*m7 + eps17*m6;
        stress[8] = eps18*m8;
    }
    {   /* gauss-2x2 point 4 of 4: xi = 0.5773502691896257, eta = 0.5773502691896257, weight = 1 */
        const double eps16 = alpha1*m3 + alpha2*m4 + alpha4*(0.5773502691896257*e6 - 0.5773502691896257*e7)
            + alpha5*(0.5773502691896257*e8 - 0.5773502691896257*e9);
        const double eps17 = alpha1*m4 + alpha2*m3 + alpha4*(0.5773502691896257*e10 - 0.5773502691896257*e11)
            + alpha5*(0.5773502691896257*e12 - 0.5773502691896257*e13);
        const double eps18 = alpha3*m5 + 0.5773502691896257*alpha4*e14 + 0.5773502691896257*alpha5*e15;
        strain[9] = eps16;
        strain[10] = eps17;
        strain[11] = eps18;
        stress[9] = eps16*m6 + eps17*m7;
        stress[10] = eps16*m7 + eps17*m6;
        stress[11] = eps18*m8;
    }
}

void derive_q4_hybrid5_plane_stress_recovery(long n, const double *restrict xy, const double *restrict u, double E, double nu,
                           double *restrict strain, double *restrict stress)
{
    double mat[NMAT];
    q4_hybrid5_plane_stress_material(E, nu, 1.0, mat);
    for (long e = 0; e < n; ++e)
        q4_hybrid5_plane_stress_recovery_body(xy + (size_t)e * NIN, u + (size_t)e * 8, mat,
                                 strain + (size_t)e * 12, stress + (size_t)e * 12);
}
