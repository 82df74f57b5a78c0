"""Guards for mistakes that once survived the whole suite (notes/testing.md lists each).

* the patch-test verdict must use both the displacement and the stress error;
* the taper distortion must build the published shape at its full size;
* a tiny change in one exact moment must show in the printed closed forms and in the
  variant equivalences, so they are compared here with independent numpy quadrature.
"""
from __future__ import annotations

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import fem_reference as fr
from derive import locking as L
from derive import mesh as M
from derive import patch
from derive.cli import main
from derive.element import element
from derive.symbols import E, a, b, c, nu, t
from derive.userinput import parse_matrix_text
from test_formulations import q4_textbook


# ------------------------------------------------------------------------------------------------
# patch test: the verdict uses displacements AND stresses

def test_patch_right_displacements_wrong_stresses_fails():
    # 8-node serendipity element, pure bending on the distorted patch: its nodal displacements
    # are near the field (measured 1.4e-2) while its stresses are far off (measured 0.49), because
    # the element loses quadratic completeness off parallelograms (Lee & Bathe 1993, from memory).
    # With the tolerance between the two, only the stress error can fail the test.
    res = patch.run_one("Q8", "full", order="higher", patch="distorted", tol=0.05)
    assert res["displacement_error"] < 0.05 < res["stress_error"]
    assert res["passed"] is False


def test_patch_exact_displacements_with_perturbed_stresses_fails(monkeypatch):
    # exact nodal displacements (Q4 reproduces the constant strain field; MacNeal & Harder 1985,
    # from memory) but stresses recovered 1e-4 too large: must fail at the default 1e-6
    original = M.Solution.point_stresses

    def wrong(self, rule=None):
        pos, sig = original(self, rule)
        return pos, sig * (1 + 1e-4)

    monkeypatch.setattr(M.Solution, "point_stresses", wrong)
    res = patch.run_one("Q4", "full")
    assert res["displacement_error"] < 1e-12 and res["stress_error"] > 1e-5
    assert res["passed"] is False


def test_patch_rigid_offset_displacements_with_exact_stresses_fails(monkeypatch):
    # the other way round: a rigid translation added to the solution leaves every strain (and so
    # every stress) exact but the displacements wrong by 1e-4 of the field (elementary kinematics)
    original = patch.analyse

    def shifted(*args, **kwargs):
        sol = original(*args, **kwargs)
        sol.u = sol.u + 1e-4 * np.abs(sol.u).max() * np.tile([1.0, 0.0], sol.u.size // 2)
        return sol

    monkeypatch.setattr(patch, "analyse", shifted)
    res = patch.run_one("Q4", "full")
    assert res["stress_error"] < 1e-12 and res["displacement_error"] > 5e-5
    assert res["passed"] is False


# ------------------------------------------------------------------------------------------------
# taper: the shape and the ratio from an independent solve

def _tapered_nodes(name: str, tau: float, aspect: float) -> np.ndarray:
    # the definition of the taper (notes/locking.md, MacNeal 1987 tapered element): b = 1,
    # x = a X, y = Y (1 + tau X) on the reference nodes (X, Y), so the depth is 2(1 - tau) at
    # X = -1 and 2(1 + tau) at X = 1
    ref = np.array(fr.REF_NODES[name], dtype=float)
    return np.column_stack([aspect * ref[:, 0], ref[:, 1] * (1 + tau * ref[:, 0])])


def _tapered_triangles(name: str, tau: float, aspect: float) -> list:
    # the rectangle split along the diagonal from (-a, -b) to (a, b) (derive locking --help),
    # corners tapered as above, straight sides (T6 mid-side nodes at the side midpoints)
    corners = {(X, Y): (aspect * X, Y * (1 + tau * X)) for X in (-1, 1) for Y in (-1, 1)}
    out = []
    for tri in (((-1, -1), (1, -1), (1, 1)), ((-1, -1), (1, 1), (-1, 1))):
        P = np.array([corners[k] for k in tri])
        if name == "T6":
            P = np.vstack([P, (P[0] + P[1]) / 2, (P[1] + P[2]) / 2, (P[2] + P[0]) / 2])
        out.append(P)
    return out


def test_distorted_nodes_are_the_tapered_shape():
    # the geometry itself, at its full size (definition above)
    for name in ("Q4", "Q8", "Q9"):
        assert_allclose(L.distorted_nodes(name, "taper", 0.3, 2.0), _tapered_nodes(name, 0.3, 2.0), rtol=0, atol=1e-15)


@pytest.mark.parametrize("name,variant", [("Q4", "full"), ("Q8", "full"), ("Q9", "full"), ("T3", "full"),
                                          ("T6", "full"), ("Q4", "incompatible"),
                                          ("Q4", "eas4"), ("Q4", "hybrid5")])
@pytest.mark.parametrize("tau", [0.3, 0.6])
def test_taper_ratio_against_an_independent_energy_solve(name, variant, tau):
    if variant == "full":      # textbook quadrature (numpy leggauss; Strang & Fix triangle rule)
        def stiffness(xy):
            return fr.stiffness(name, xy, 1.0, 0.3, 1.0)
    else:                      # numpy, written from the cited papers
        def stiffness(xy):
            return q4_textbook(variant, xy, 1.0, 0.3, "plane-stress")
    elements = _tapered_triangles(name, tau, 1.5) if name[0] == "T" else [_tapered_nodes(name, tau, 1.5)]
    expected = fr.bending_energy_ratio(name, elements, stiffness)
    got = L.distortion(name, variant, "plane-stress", "taper", tau, 1.5, 0.3)["ratio"]
    # float64 on both sides (eigen-solve vs direct solve): 1e-10 relative (common practice, no source)
    assert_allclose(got, expected, rtol=1e-10, atol=0)


def test_hybrid5_taper_ratio_is_one_over_one_plus_tau_squared():
    # closed form observed for the Pian-Sumihara element on the tapered segment, independent of
    # the aspect ratio and nu; cross-checked above against the numpy hybrid element written
    # from Pian & Sumihara (1984) (common practice, no published source for the formula)
    for tau, aspect, nu_v in [(0.2, 1.0, 0.3), (0.5, 2.0, 0.25), (0.8, 0.5, 0.0)]:
        got = L.distortion("Q4", "hybrid5", "plane-stress", "taper", tau, aspect, nu_v)["ratio"]
        assert_allclose(got, 1 / (1 + tau ** 2), rtol=1e-10, atol=0)


# ------------------------------------------------------------------------------------------------
# exact moments: printed closed forms and the variant equivalences against numpy quadrature

VALUES = {a: sp.Rational(3, 2), b: sp.Rational(7, 10), c: sp.Rational(2, 5), E: 1000, nu: sp.Rational(3, 10), t: 2}


def _rect_nodes(name: str, skew: float) -> np.ndarray:
    # the documented geometry (README / derive stiffness --help): 2a x 2b centred at the origin,
    # x = a X + c Y, y = b Y; triangles: the lower-left half with vertices (-a,-b), (a,-b), (-a,b)
    ref = np.array(fr.REF_NODES[name], dtype=float)
    if name[0] == "T":
        ref = 2 * ref - 1
    av, bv = 1.5, 0.7
    return np.column_stack([av * ref[:, 0] + skew * ref[:, 1], bv * ref[:, 1]])


@pytest.mark.parametrize("name,state,fmt", [("T3", "plane-stress", "text"), ("T6", "plane-strain", "latex"),
                                            ("Q4", "plane-stress", "text"), ("Q4", "plane-strain", "latex"),
                                            ("Q8", "plane-stress", "text"), ("Q9", "plane-strain", "latex")])
def test_printed_closed_form_reads_back_to_the_textbook_matrix(capsys, name, state, fmt):
    assert main(["stiffness", name, "--state", state, "--geometry", "parallelogram", "--format", fmt]) == 0
    printed = capsys.readouterr().out
    m = parse_matrix_text(printed)
    n = 2 * len(fr.REF_NODES[name])
    K = np.zeros((n, n))
    if m.kind == "full":           # LaTeX prints the whole matrix
        K[:] = [[float(e.subs(VALUES)) for e in row] for row in m.data]
    else:                          # text prints the upper triangle as K[i,j] = ...
        for (i, j), expr in m.entries.items():
            K[i, j] = K[j, i] = float(expr.subs(VALUES))
    # independent textbook quadrature (numpy leggauss; Strang & Fix triangle rule)
    Kr = fr.stiffness(name, _rect_nodes(name, 0.4), 1000.0, 0.3, 2.0, state)
    # exact rationals printed, float64 reference: 1e-12 of the largest entry (common practice)
    assert_allclose(K, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


@pytest.mark.parametrize("variant", ["incompatible", "incompatible-centred", "eas4", "hybrid5"])
def test_equivalent_q4_variants_equal_the_numpy_textbook_element(variant):
    # the symbolic parallelogram matrix of each patch-test-passing variant against the numpy
    # element written from its paper (Wilson et al. 1973; Taylor, Beresford & Wilson 1976;
    # Simo & Rifai 1990; Pian & Sumihara 1984)
    K = element("Q4", variant, "plane-stress").stiffness("parallelogram")
    Kn = np.array(K.subs(VALUES).evalf(30).tolist(), dtype=float)
    Kr = q4_textbook(variant, _rect_nodes("Q4", 0.4), 1000.0, 0.3, "plane-stress", 2.0)
    assert_allclose(Kn, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


def test_selective_and_bbar_parallelogram_equal_mean_dilatation():
    # one-point selective = mean dilatation on a parallelogram (Malkus & Hughes 1978); numpy
    # mean dilatation written from Hughes (1980)
    from test_formulations import q4_mean_dilatation
    xy = _rect_nodes("Q4", 0.4)
    for variant in ("selective", "bbar"):
        K = element("Q4", variant, "plane-strain").stiffness("parallelogram")
        Kn = np.array(K.subs(VALUES).evalf(30).tolist(), dtype=float)
        Kr = q4_mean_dilatation(xy, 1000.0, 0.3, 2.0, selective=variant == "selective")
        assert_allclose(Kn, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())
