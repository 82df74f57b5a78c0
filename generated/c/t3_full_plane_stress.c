/*
 * derive generated kernel: T3 full plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      T3, 3 nodes, 6 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  displacement element, full integration [standard displacement formulation]
 * integration  B^T D B: triangle-d1 (1 point)
 * flops        stiffness 129, validity 12, recovery 72 per element (add, mul, div, sqrt)
 *
 * arguments (units-agnostic; any consistent set of units):
 *   xy      nodal coordinates, shape (n, 3, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
 *           node i+1 (counter-clockwise corners first, then mid-side, then interior)
 *   E       Young's modulus (> 0), scalar
 *   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
 *   t       thickness t (the out-of-plane thickness)
 *   u       nodal displacements for recovery, shape (n, 6), interleaved u1, v1, u2, v2, ...
 *   K       stiffness, shape (n, 6, 6), DOFs interleaved u1, v1, u2, v2, ...; symmetric
 *   detJ_min validity: min det J over the points of triangle-d1, shape (n,); <= 0 means an
 *            inverted or degenerate element
 *   strain  recovery: strain at the 1 points of triangle-d1, shape (n, 1, 3), Voigt [eps_xx,
 *           eps_yy, gamma_xy] (engineering shear)
 *   stress  recovery: stress D strain at the same points, shape (n, 1, 3), [sigma_xx, sigma_yy,
 *           tau_xy]
 *
 * The kernels do not check their inputs; derive.kernel() checks shapes, finite
 * coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
 * generator    derive.codegen 1.0; regenerate with
 *              derive kernel T3 --variant full --state plane-stress --lang c
 *
 * C99.  Compile e.g. with: cc -O3 -march=native -c t3_full_plane_stress.c
 * (with GCC add -fno-tree-slp-vectorize: same speed, much shorter compile times).
 * Data layout: every array is dense, row-major (C order), float64.  The batch kernel
 * copies 8 elements at a time into element-innermost scratch arrays so that the
 * per-element body is vectorised across elements (one SIMD lane per element).
 */
#include <math.h>
#include <stddef.h>
#include <stdint.h>
#include <string.h>
#include "t3_full_plane_stress.h"

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

#define NIN 6
#define NK 36
#define NMAT 6
#define LANES 8
#if defined(__GNUC__)
/* inlined into the lane loop so that the loop over elements vectorises */
#define DERIVE_INLINE static inline __attribute__((always_inline))
#else
#define DERIVE_INLINE static inline
#endif

/* material table: E, nu, t, then the material constants the kernels use */
static inline void t3_full_plane_stress_material(double E, double nu, double t, double *restrict mat)
{
    mat[0] = E;
    mat[1] = nu;
    mat[2] = t;
    mat[3] = E/(1.0 - nu*nu);   /* m0 */
    mat[4] = E*nu/(1.0 - nu*nu);   /* m1 */
    mat[5] = E*(0.5 - 0.5*nu)/(1.0 - nu*nu);   /* m2 */
}

/* stiffness of one element; xy[k * sx] is input k, K[k * sk] output k (row-major) */
DERIVE_INLINE void t3_full_plane_stress_stiffness_body(const double *restrict xy, const ptrdiff_t sx,
                                             const double *restrict mat, double *restrict K,
                                             const ptrdiff_t sk)
{
    const double x1 = xy[0 * sx];
    const double y1 = xy[1 * sx];
    const double x2 = xy[2 * sx];
    const double y2 = xy[3 * sx];
    const double x3 = xy[4 * sx];
    const double y3 = xy[5 * sx];
    const double t = mat[2];
    const double m0 = mat[3];
    const double m1 = mat[4];
    const double m2 = mat[5];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = x3 - x1;
    const double gx_1_0 = x2 - x1;
    const double gy_0_1 = y3 - y1;
    const double gy_1_0 = y2 - y1;
    double K_0_0, K_0_1, K_0_2, K_0_3, K_0_4, K_0_5, K_1_1, K_1_2, K_1_3, K_1_4, K_1_5, K_2_2, K_2_3;
    double K_2_4, K_2_5, K_3_3, K_3_4, K_3_5, K_4_4, K_4_5, K_5_5;
    {   /* triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2 */
        const double detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0;
        const double idet = 1.0/detJ;
        const double Ji00 = gy_0_1*idet;
        const double Ji01 = -gy_1_0*idet;
        const double Ji10 = -gx_0_1*idet;
        const double Ji11 = gx_1_0*idet;
        const double dNdx1 = -Ji00 - Ji01;
        const double dNdy1 = -Ji10 - Ji11;
        const double sc0 = 0.5*detJ*t;
        const double s1 = m0*sc0;
        const double s2 = m1*sc0;
        const double s3 = m2*sc0;
        const double T4 = dNdx1*s1;
        const double T6 = dNdy1*s3;
        const double T7 = dNdy1*s2;
        const double T8 = dNdy1*s1;
        const double T9 = dNdx1*s3;
        const double T10 = Ji00*s1;
        const double T11 = Ji00*s2;
        const double T12 = Ji10*s3;
        const double T13 = Ji10*s2;
        const double T14 = Ji10*s1;
        const double T15 = Ji00*s3;
        const double T16 = Ji01*s1;
        const double T17 = Ji01*s2;
        const double T18 = Ji11*s3;
        const double T19 = Ji11*s2;
        const double T20 = Ji11*s1;
        const double T21 = Ji01*s3;
        K_0_0 = T4*dNdx1 + T6*dNdy1;
        K_0_1 = T7*dNdx1 + T9*dNdy1;
        K_0_2 = T10*dNdx1 + T12*dNdy1;
        K_0_3 = T13*dNdx1 + T15*dNdy1;
        K_0_4 = T16*dNdx1 + T18*dNdy1;
        K_0_5 = T19*dNdx1 + T21*dNdy1;
        K_1_1 = T8*dNdy1 + T9*dNdx1;
        K_1_2 = T11*dNdy1 + T12*dNdx1;
        K_1_3 = T14*dNdy1 + T15*dNdx1;
        K_1_4 = T17*dNdy1 + T18*dNdx1;
        K_1_5 = T20*dNdy1 + T21*dNdx1;
        K_2_2 = Ji00*T10 + Ji10*T12;
        K_2_3 = Ji00*T13 + Ji10*T15;
        K_2_4 = Ji00*T16 + Ji10*T18;
        K_2_5 = Ji00*T19 + Ji10*T21;
        K_3_3 = Ji00*T15 + Ji10*T14;
        K_3_4 = Ji00*T18 + Ji10*T17;
        K_3_5 = Ji00*T21 + Ji10*T20;
        K_4_4 = Ji01*T16 + Ji11*T18;
        K_4_5 = Ji01*T19 + Ji11*T21;
        K_5_5 = Ji01*T21 + Ji11*T20;
    }
    K[0 * sk] = K_0_0;
    K[1 * sk] = K_0_1;
    K[2 * sk] = K_0_2;
    K[3 * sk] = K_0_3;
    K[4 * sk] = K_0_4;
    K[5 * sk] = K_0_5;
    K[6 * sk] = K_0_1;
    K[7 * sk] = K_1_1;
    K[8 * sk] = K_1_2;
    K[9 * sk] = K_1_3;
    K[10 * sk] = K_1_4;
    K[11 * sk] = K_1_5;
    K[12 * sk] = K_0_2;
    K[13 * sk] = K_1_2;
    K[14 * sk] = K_2_2;
    K[15 * sk] = K_2_3;
    K[16 * sk] = K_2_4;
    K[17 * sk] = K_2_5;
    K[18 * sk] = K_0_3;
    K[19 * sk] = K_1_3;
    K[20 * sk] = K_2_3;
    K[21 * sk] = K_3_3;
    K[22 * sk] = K_3_4;
    K[23 * sk] = K_3_5;
    K[24 * sk] = K_0_4;
    K[25 * sk] = K_1_4;
    K[26 * sk] = K_2_4;
    K[27 * sk] = K_3_4;
    K[28 * sk] = K_4_4;
    K[29 * sk] = K_4_5;
    K[30 * sk] = K_0_5;
    K[31 * sk] = K_1_5;
    K[32 * sk] = K_2_5;
    K[33 * sk] = K_3_5;
    K[34 * sk] = K_4_5;
    K[35 * sk] = K_5_5;
}

void derive_t3_full_plane_stress_stiffness(const double *restrict xy, double E, double nu, double t, double *restrict K)
{
    double mat[NMAT];
    t3_full_plane_stress_material(E, nu, t, mat);
    t3_full_plane_stress_stiffness_body(xy, 1, mat, K, 1);
}

/* copy count doubles to dst, streaming (non-temporal) where dst is vector-aligned */
static inline void t3_full_plane_stress_store(double *restrict dst, const double *restrict src, long count, int stream)
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
static inline void t3_full_plane_stress_transpose(const double *restrict out, double *restrict rows, long m)
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

void derive_t3_full_plane_stress_stiffness_batch(long n, const double *restrict xy, double E, double nu, double t,
                                  double *restrict K)
{
    double mat[NMAT];
    double in[NIN * LANES];
    double out[NK * LANES];
    double rows[NK * LANES];
    /* stream only when K is much larger than the caches it would otherwise fill */
    const int stream = (double)n * NK * sizeof(double) > 8.0e6;
    t3_full_plane_stress_material(E, nu, t, mat);
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
            t3_full_plane_stress_stiffness_body(in + l, LANES, mat, out + l, LANES);
        t3_full_plane_stress_transpose(out, rows, m);
        t3_full_plane_stress_store(K + (size_t)b * NK, rows, m * NK, stream);
    }
#ifdef DERIVE_VEC
    if (stream)
        _mm_sfence();
#endif
}

/* minimum of det J over the points of the full rule, one element */
static inline void t3_full_plane_stress_validity_body(const double *restrict xy, double *restrict detJ_min)
{
    const double x1 = xy[0];
    const double y1 = xy[1];
    const double x2 = xy[2];
    const double y2 = xy[3];
    const double x3 = xy[4];
    const double y3 = xy[5];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = x3 - x1;
    const double gx_1_0 = x2 - x1;
    const double gy_0_1 = y3 - y1;
    const double gy_1_0 = y2 - y1;
    double dmin;
    {   /* triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2 */
        const double detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0;
        dmin = detJ;
    }
    *detJ_min = dmin;
}

void derive_t3_full_plane_stress_validity(long n, const double *restrict xy, double *restrict detJ_min)
{
    for (long e = 0; e < n; ++e)
        t3_full_plane_stress_validity_body(xy + (size_t)e * NIN, detJ_min + e);
}

/* strain and stress at the 1 points of the full rule, one element */
static inline void t3_full_plane_stress_recovery_body(const double *restrict xy, const double *restrict u,
                                            const double *restrict mat, double *restrict strain,
                                            double *restrict stress)
{
    const double x1 = xy[0];
    const double y1 = xy[1];
    const double x2 = xy[2];
    const double y2 = xy[3];
    const double x3 = xy[4];
    const double y3 = xy[5];
    const double u1 = u[0];
    const double u2 = u[1];
    const double u3 = u[2];
    const double u4 = u[3];
    const double u5 = u[4];
    const double u6 = u[5];
    const double m0 = mat[3];
    const double m1 = mat[4];
    const double m2 = mat[5];
    /* element quantities: map coefficients, centre Jacobian */
    const double gx_0_1 = x3 - x1;
    const double gx_1_0 = x2 - x1;
    const double gy_0_1 = y3 - y1;
    const double gy_1_0 = y2 - y1;
    {   /* triangle-d1 point 1 of 1: xi = 1/3, eta = 1/3, weight = 1/2 */
        const double detJ = gx_1_0*gy_0_1 - gx_0_1*gy_1_0;
        const double idet = 1.0/detJ;
        const double Ji00 = gy_0_1*idet;
        const double Ji01 = -gy_1_0*idet;
        const double Ji10 = -gx_0_1*idet;
        const double Ji11 = gx_1_0*idet;
        const double dNdx1 = -Ji00 - Ji01;
        const double dNdy1 = -Ji10 - Ji11;
        const double eps22 = Ji00*u3 + Ji01*u5 + dNdx1*u1;
        const double eps23 = Ji10*u4 + Ji11*u6 + dNdy1*u2;
        const double eps24 = Ji00*u4 + Ji01*u6 + Ji10*u3 + Ji11*u5 + dNdx1*u2 + dNdy1*u1;
        strain[0] = eps22;
        strain[1] = eps23;
        strain[2] = eps24;
        stress[0] = eps22*m0 + eps23*m1;
        stress[1] = eps22*m1 + eps23*m0;
        stress[2] = eps24*m2;
    }
}

void derive_t3_full_plane_stress_recovery(long n, const double *restrict xy, const double *restrict u, double E, double nu,
                           double *restrict strain, double *restrict stress)
{
    double mat[NMAT];
    t3_full_plane_stress_material(E, nu, 1.0, mat);
    for (long e = 0; e < n; ++e)
        t3_full_plane_stress_recovery_body(xy + (size_t)e * NIN, u + (size_t)e * 6, mat,
                                 strain + (size_t)e * 3, stress + (size_t)e * 3);
}
