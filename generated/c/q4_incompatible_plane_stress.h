/*
 * derive generated kernel: Q4 incompatible plane-stress
 *
 * Caution: derive is a verification aid, not a design check. Defer to the governing local
 * codes and to licensed engineering practice before relying on any result.
 *
 * element      Q4, 4 nodes, 8 DOFs interleaved u1, v1, u2, v2, ...
 * formulation  incompatible bubble modes, own Jacobian (fails the patch test off parallelograms)
 *              [Wilson, Taylor, Doherty & Ghaboussi (1973)]
 * integration  B^T D B: gauss-2x2 (4 points); B^T D G: gauss-2x2 (4 points); G^T D G: gauss-2x2 (4
 *              points)
 * internal     4 internal unknowns condensed inside the kernel: K = K_uu - K_ua K_aa^-1 K_ua^T
 *              (unrolled factorisation of K_aa, no pivoting)
 * flops        stiffness 2427, validity 89, recovery 1691 per element (add, mul, div, sqrt)
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
 *              derive kernel Q4 --variant incompatible --state plane-stress --lang c
 */
#ifndef DERIVE_Q4_INCOMPATIBLE_PLANE_STRESS_H
#define DERIVE_Q4_INCOMPATIBLE_PLANE_STRESS_H

#ifdef __cplusplus
extern "C" {
#endif

/* stiffness of one element: xy[4][2], K[8][8] (row-major) */
void derive_q4_incompatible_plane_stress_stiffness(const double *xy, double E, double nu, double t, double *K);

/* stiffness of n elements: xy[n][4][2], K[n][8][8] */
void derive_q4_incompatible_plane_stress_stiffness_batch(long n, const double *xy, double E, double nu, double t, double *K);

/* validity of n elements: detJ_min[n] = min det J over the full rule's points (<= 0: inverted) */
void derive_q4_incompatible_plane_stress_validity(long n, const double *xy, double *detJ_min);

/* recovery for n elements: u[n][8] -> strain[n][4][3], stress[n][4][3] */
void derive_q4_incompatible_plane_stress_recovery(long n, const double *xy, const double *u, double E, double nu,
                           double *strain, double *stress);

#ifdef __cplusplus
}
#endif

#endif /* DERIVE_Q4_INCOMPATIBLE_PLANE_STRESS_H */
