/*
 * derive generated kernel: Q8 selective plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      Q8, 8 nodes, 16 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  selective integration: volumetric part of D with the reduced rule [Doherty, Wilson
 *              & Taylor (1969); Hughes (1987) Sec. 4.4]
 * integration  B^T D_dev B: gauss-3x3 (9 points); B^T D_vol B (reduced rule): gauss-2x2 (4 points)
 * flops        stiffness 7848, validity 330, recovery 1312 per element (add, mul, div, sqrt)
 *
 * arguments (units-agnostic; any consistent set of units):
 *   xy      nodal coordinates, shape (n, 8, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of
 *           node i+1 (counter-clockwise corners first, then mid-side, then interior)
 *   E       Young's modulus (> 0), scalar
 *   nu      Poisson's ratio (-1 < nu <= 0.5), scalar
 *   t       thickness t (the out-of-plane thickness)
 *   u       nodal displacements for recovery, shape (n, 16), interleaved u1, v1, u2, v2, ...
 *   K       stiffness, shape (n, 16, 16), DOFs interleaved u1, v1, u2, v2, ...; symmetric
 *   detJ_min validity: min det J over the points of gauss-3x3, shape (n,); <= 0 means an inverted
 *            or degenerate element
 *   strain  recovery: strain at the 9 points of gauss-3x3, shape (n, 9, 3), Voigt [eps_xx, eps_yy,
 *           gamma_xy] (engineering shear)
 *   stress  recovery: stress D strain at the same points, shape (n, 9, 3), [sigma_xx, sigma_yy,
 *           tau_xy]
 *
 * The kernels do not check their inputs; derive.kernel() checks shapes, finite
 * coordinates and E, nu before calling them.  Screen meshes with the validity kernel.
 * generator    derive.codegen 1.0; regenerate with
 *              derive kernel Q8 --variant selective --state plane-stress --lang c
 */
#ifndef DERIVE_Q8_SELECTIVE_PLANE_STRESS_H
#define DERIVE_Q8_SELECTIVE_PLANE_STRESS_H

#ifdef __cplusplus
extern "C" {
#endif

/* stiffness of one element: xy[8][2], K[16][16] (row-major) */
void derive_q8_selective_plane_stress_stiffness(const double *xy, double E, double nu, double t, double *K);

/* stiffness of n elements: xy[n][8][2], K[n][16][16] */
void derive_q8_selective_plane_stress_stiffness_batch(long n, const double *xy, double E, double nu, double t, double *K);

/* validity of n elements: detJ_min[n] = min det J over the full rule's points (<= 0: inverted) */
void derive_q8_selective_plane_stress_validity(long n, const double *xy, double *detJ_min);

/* recovery for n elements: u[n][16] -> strain[n][9][3], stress[n][9][3] */
void derive_q8_selective_plane_stress_recovery(long n, const double *xy, const double *u, double E, double nu,
                           double *strain, double *stress);

#ifdef __cplusplus
}
#endif

#endif /* DERIVE_Q8_SELECTIVE_PLANE_STRESS_H */
