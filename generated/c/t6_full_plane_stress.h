/*
 * derive generated kernel: T6 full plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      T6, 6 nodes, 12 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  displacement element, full integration [standard displacement formulation]
 * integration  B^T D B: triangle-d2 (3 points)
 * flops        stiffness 1294, validity 114, recovery 384 per element (add, mul, div, sqrt)
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
 *              derive kernel T6 --variant full --state plane-stress --lang c
 */
#ifndef DERIVE_T6_FULL_PLANE_STRESS_H
#define DERIVE_T6_FULL_PLANE_STRESS_H

#ifdef __cplusplus
extern "C" {
#endif

/* stiffness of one element: xy[6][2], K[12][12] (row-major) */
void derive_t6_full_plane_stress_stiffness(const double *xy, double E, double nu, double t, double *K);

/* stiffness of n elements: xy[n][6][2], K[n][12][12] */
void derive_t6_full_plane_stress_stiffness_batch(long n, const double *xy, double E, double nu, double t, double *K);

/* validity of n elements: detJ_min[n] = min det J over the full rule's points (<= 0: inverted) */
void derive_t6_full_plane_stress_validity(long n, const double *xy, double *detJ_min);

/* recovery for n elements: u[n][12] -> strain[n][3][3], stress[n][3][3] */
void derive_t6_full_plane_stress_recovery(long n, const double *xy, const double *u, double E, double nu,
                           double *strain, double *stress);

#ifdef __cplusplus
}
#endif

#endif /* DERIVE_T6_FULL_PLANE_STRESS_H */
