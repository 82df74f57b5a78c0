"""Closed-form bending locking ratios, the independent one-element route, tolerance limits,
volumetric locking, distortion and the `derive locking` command."""
from __future__ import annotations

import json
import math

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import derive
import fem_reference as fr
from derive import locking as L
from derive.cli import main
from derive.symbols import nu, r

COOK = (1 - nu ** 2) / (1 + (1 - nu) * r ** 2 / 2)


def same(a, b) -> bool:
    return sp.cancel(sp.sympify(a) - sp.sympify(b)) == 0


# ------------------------------------------------------------------------------------------------
# closed forms

def test_q4_full_plane_stress_is_the_published_formula():
    # Cook, Malkus, Plesha & Witt, Concepts and Applications of FEA, 4th ed., from memory
    assert same(derive.locking_ratio("Q4", "full", "plane-stress"), COOK)


def test_q4_full_plane_strain_closed_form():
    # the same derivation with D of plane strain and the plane-strain compliance (1 - nu^2)/E:
    # ratio = (1 - 2 nu) / ((1 - nu)^2 + (1 - nu)(1 - 2 nu) r^2 / 2), by hand from the Q4 bending
    # mode u = c x y (eps_xx = c y, gamma_xy = c x, eps_yy = 0); Cook et al. 4th ed. method, from memory
    expected = (1 - 2 * nu) / ((1 - nu) ** 2 + (1 - nu) * (1 - 2 * nu) * r ** 2 / 2)
    assert same(derive.locking_ratio("Q4", "full", "plane-strain"), expected)


@pytest.mark.parametrize("variant", ["incompatible", "incompatible-centred", "eas4", "hybrid5"])
@pytest.mark.parametrize("state", ["plane-stress", "plane-strain"])
def test_bending_exact_q4_variants(variant, state):
    # exact in pure bending on rectangles: Wilson et al. (1973); Taylor, Beresford & Wilson (1976);
    # Simo & Rifai (1990); Pian & Sumihara (1984)
    assert L.locking_ratio("Q4", variant, state) == 1


@pytest.mark.parametrize("name", ["Q8", "Q9", "T6"])
def test_quadratic_elements_represent_pure_bending(name):
    # quadratic elements contain the exact bending displacements (common practice)
    assert L.locking_ratio(name, "full", "plane-stress") == 1
    if name != "T6":
        assert L.locking_ratio(name, "full", "plane-strain") == 1


def test_q4_reduced_bending_is_a_zero_energy_mode():
    # u = xi eta is the hourglass mode of one-point Q4 (Cook et al. 4th ed., from memory)
    assert L.locking_ratio("Q4", "reduced", "plane-stress") is sp.oo
    rep = L.report("Q4", "reduced", "plane-stress", aspect=2, nu_value=0.3)
    assert rep["ratio"] is None and rep["zero_energy"] is True and rep["formula"] is None


def test_independent_route_one_element_with_nodal_couples_against_beam_theory():
    # textbook Q4 stiffness (numpy, tests/fem_reference.py), loaded by nodal force couples
    # +-F at the corners of each end, solved with numpy; the end rotation difference compared with
    # beam theory theta = M L / (E I) (Timoshenko, Strength of Materials, from memory)
    for state in ("plane-stress", "plane-strain"):
        expr = L.locking_ratio("Q4", "full", state)
        for a, b, nv in ((1.0, 1.0, 0.3), (2.0, 0.5, 0.25), (0.5, 1.0, 0.0), (3.0, 1.0, 0.45)):
            Ev, t = 210.0, 0.2
            xy = np.array([[-a, -b], [a, -b], [a, b], [-a, b]])
            K = fr.stiffness("Q4", xy, Ev, nv, t, state)
            F = 1.0
            # x-forces of the two end couples (tension on top): (-a,-b) +F, (a,-b) -F, (a,b) +F, (-a,b) -F
            f = np.array([F, 0, -F, 0, F, 0, -F, 0])
            free = [2, 4, 5, 6, 7]                  # u1, v1, v2 held (statically determinate)
            u = np.zeros(8)
            u[free] = np.linalg.solve(K[np.ix_(free, free)], f[free])
            theta = (u[4] - u[2]) / (2 * b) - (u[6] - u[0]) / (2 * b)
            M = 2 * F * b
            Eeff = Ev if state == "plane-stress" else Ev / (1 - nv ** 2)
            theta_beam = M * 2 * a / (Eeff * t * (2 * b) ** 3 / 12)
            assert math.isclose(theta / theta_beam, float(expr.subs({r: a / b, nu: nv})), rel_tol=1e-10)


def test_selective_and_bbar_do_not_lock_volumetrically_while_full_does():
    # Hughes (1980); Doherty, Wilson & Taylor (1969): the mean-dilatation/selective Q4 keeps a finite
    # plane-strain bending ratio as nu -> 1/2, the fully integrated one goes to zero (Cook et al.)
    full = L.volumetric_index("Q4", "full")
    assert full["limit"] == "0" and full["locks"] and full["curve"][-1][1] < 1e-3
    for variant in ("selective", "bbar"):
        vol = L.volumetric_index("Q4", variant, aspect=2.0)
        assert not vol["locks"] and vol["limit_at_aspect"] > 0.3
        assert same(vol["limit"], 12 / (3 * r ** 2 + 4))
        # by hand: the bending mode u = c x y has no volumetric strain at the one point / in the mean,
        # so only mu (4/3 eps_xx^2 + gamma^2) resists: ratio = 1 / (C_xx mu (4/3 + r^2))
        # = 6 / ((1 - nu)(3 r^2 + 4)) (3-D split, Hughes 1987 Sec. 4.5, from memory)
        assert same(L.locking_ratio("Q4", variant, "plane-strain"), 6 / ((1 - nu) * (3 * r ** 2 + 4)))
    for name in ("Q8", "Q9"):
        assert not L.volumetric_index(name, "selective")["locks"]


def test_spurious_strain_report():
    # Q4 in bending: u = c x y gives gamma_xy = c x, which pure bending does not have, and no
    # eps_yy (the continuum's -nu eps_xx needs v ~ y^2) (Cook et al. 4th ed., from memory)
    an = L.analyse("Q4", "full", "plane-stress")
    assert an.strain["spurious"] == ["gamma_xy"] and an.strain["missing"] == ["eps_yy"]
    assert an.strain["components"]["gamma_xy"]["spurious_terms"] == ["x"]
    for variant in ("eas4", "hybrid5"):
        st = L.analyse("Q4", variant, "plane-strain").strain
        assert st["spurious"] == [] and st["missing"] == []
        assert same(st["components"]["eps_yy"]["element"], -nu * sp.Symbol("y") / (1 - nu))


# ------------------------------------------------------------------------------------------------
# tolerance

def test_tolerance_limit_from_the_closed_form():
    # solving Cook's formula (1 - nu^2)/(1 + (1 - nu) r^2/2) = 1 - tol by hand:
    # r* = sqrt(2 (tol - nu^2) / ((1 - nu)(1 - tol)))
    lim = L.aspect_limit("Q4", "full", "plane-stress", 0.2, 0.05)
    assert math.isclose(lim["aspect_limit"], math.sqrt(2 * (0.05 - 0.04) / (0.8 * 0.95)), rel_tol=1e-12)
    tol_sym = sp.Symbol("tol")
    closed = sp.sympify(lim["closed_form"], locals={"nu": nu, "tol": tol_sym})
    assert math.isclose(float(closed.subs({nu: sp.Rational(1, 5), tol_sym: sp.Rational(1, 20)})),
                        lim["aspect_limit"], rel_tol=1e-12)
    # nu = 0.3: 1 - nu^2 = 0.91 < 0.95 already at r -> 0
    assert L.aspect_limit("Q4", "full", "plane-stress", 0.3, 0.05)["aspect_limit"] == 0.0
    assert L.aspect_limit("Q4", "eas4", "plane-stress", 0.3, 0.05)["unlimited"] is True
    assert L.aspect_limit("Q4", "reduced", "plane-stress", 0.3, 0.05)["aspect_limit"] is None


# ------------------------------------------------------------------------------------------------
# distortion

@pytest.mark.parametrize("variant", ["full", "bbar"])
def test_skew_exact_and_numeric_routes_agree(variant):
    # two routes: exact field arithmetic symbolic in c, and the float64 numeric batch with its own
    # load integration (internal consistency, no outside source)
    exact, _ = L.distortion_curve("Q4", variant, "plane-stress", "skew", [15.0, 40.0], 2.0, 0.3)
    xy = np.stack([L.distorted_nodes("Q4", "skew", v, 2.0) for v in (15.0, 40.0)])
    assert_allclose(exact, L.numeric_ratio("Q4", variant, "plane-stress", xy, 0.3), rtol=1e-12, atol=0)


def test_q4_skew_formula_in_r_nu_and_c():
    expr = L.skew_formula("Q4", "full", "plane-stress")
    assert same(expr.subs(L.c_sym, 0), COOK)        # Cook et al. (4th ed.) on the rectangle, from memory
    # the symbolic parallelogram formula against the numeric route at 25 degrees (internal consistency)
    c = math.tan(math.radians(25.0))
    num = L.numeric_ratio("Q4", "full", "plane-stress", L.distorted_nodes("Q4", "skew", 25.0, 1.5), 0.2)[0]
    assert math.isclose(float(expr.subs({L.c_sym: c, r: 1.5, nu: 0.2})), num, rel_tol=1e-12)
    assert L.skew_formula("Q4", "eas4", "plane-strain") == 1    # Simo & Rifai (1990): exact on parallelograms


def test_symmetry_reduction_changes_nothing():
    # the reduced solve against the direct supported solve (internal consistency)
    for variant in ("full", "eas4", "bbar"):
        red = L._solve_exact("Q4", variant, "plane-strain").ratio
        direct = L._solve_exact("Q4", variant, "plane-strain", symmetry=False).ratio
        assert same(red, direct)
    assert L._solve_exact("Q4", "reduced", "plane-stress", symmetry=False).zero_energy


def test_taper_locks_patch_test_passing_q4_and_keeps_q9_exact():
    vals = {v: L.distortion("Q4", v, "plane-stress", "taper", 0.3, 1.0, 0.3)["ratio"]
            for v in ("full", "incompatible-centred", "eas4", "hybrid5")}
    # a 4-node membrane element that passes the patch test locks in bending when tapered
    # (MacNeal 1987, A theorem regarding the locking of tapered four-noded membrane elements)
    for v in ("incompatible-centred", "eas4", "hybrid5"):
        assert vals["full"] < vals[v] < 0.99
    # Q9 on a bilinear map keeps quadratic completeness, Q8 does not (Lee & Bathe 1993, from memory)
    assert math.isclose(L.distortion("Q9", "full", "plane-stress", "taper", 0.3)["ratio"], 1.0, rel_tol=1e-10)
    assert L.distortion("Q8", "full", "plane-stress", "taper", 0.5)["ratio"] < 1 - 1e-4


def test_trapezoid_keeps_the_stress_exact_elements_exact():
    # with y = eta the bending stress sigma_xx = y lies in the Pian-Sumihara stress space (derivation:
    # a1^2 eta beta_4 with b1 = dy/dxi = 0), so the hybrid element is exact (Pian & Sumihara 1984)
    assert math.isclose(L.distortion("Q4", "hybrid5", "plane-stress", "trapezoid", 0.4, 2.0)["ratio"], 1.0,
                        rel_tol=1e-10)
    assert L.distortion("Q4", "full", "plane-stress", "trapezoid", 0.4, 2.0)["ratio"] < 0.5


def test_triangle_patch_distortion_is_exact_and_symbolic():
    d = L.distortion("T6", "full", "plane-stress", "taper", 0.4)
    assert d["ratio"] == pytest.approx(1.0, abs=1e-12) and d["method"].startswith("exact")  # common practice


# ------------------------------------------------------------------------------------------------
# CLI

def run_cli(capsys, *argv):
    code = main(list(argv))
    out = capsys.readouterr()
    return code, out.out, out.err


def test_cli_json_keys_and_formula_parses_back(capsys):
    code, out, _ = run_cli(capsys, "locking", "Q4", "--variant", "full", "--state", "plane-stress",
                           "--aspect", "2", "--nu", "0.3", "--json")
    data = json.loads(out)
    assert code == 0
    for key in ("element", "variant", "state", "aspect", "nu", "ratio", "formula", "zero_energy"):
        assert key in data
    assert same(sp.parse_expr(data["formula"], local_dict={"r": r, "nu": nu}), COOK)
    assert math.isclose(data["ratio"], float(COOK.subs({r: 2, nu: sp.Rational(3, 10)})), rel_tol=1e-12)


def test_cli_zero_energy_json(capsys):
    code, out, _ = run_cli(capsys, "locking", "Q4", "--variant", "reduced", "--aspect", "1", "--nu", "0.3", "--json")
    data = json.loads(out)
    assert code == 0 and data["ratio"] is None and data["zero_energy"] is True


def test_cli_tolerance_range_volumetric_and_distortion(capsys):
    code, out, _ = run_cli(capsys, "locking", "Q4", "--state", "plane-strain", "--tolerance", "0.05",
                           "--nu", "0:0.4:4", "--distortion", "skew=30", "--json")
    data = json.loads(out)
    assert code == 0 and len(data["tolerance"]["limits"]) == 5
    assert data["volumetric"]["locks"] is True
    assert data["distortion"]["kind"] == "skew" and 0 < data["distortion"]["ratio"] < 1
    code, out, _ = run_cli(capsys, "locking", "Q4", "--aspect", "2", "--nu", "0.3", "--tolerance", "0.05")
    assert code == 0 and "gamma_xy" in out and "Caution" in out


@pytest.mark.parametrize("argv,needle", [
    (["locking", "Q4", "--state", "axisymmetric"], "plane states"),
    (["locking", "Q4", "--variant", "nope"], "unknown variant"),
    (["locking", "Q4", "--nu", "0.6"], "Poisson"),
    (["locking", "Q4", "--aspect", "-1"], "positive"),
    (["locking", "Q4", "--tolerance", "2"], "tolerance"),
    (["locking", "Q4", "--distortion", "bend=3"], "skew=DEGREES"),
    (["locking", "Q4", "--distortion", "taper=1.2"], "taper"),
    (["locking", "Q5"], "unknown element"),
])
def test_cli_bad_input_is_one_line_exit_2(capsys, argv, needle):
    code, out, err = run_cli(capsys, *argv)
    assert code == 2 and needle in err and err.count("\n") == 1


def test_cli_help_has_example_and_caution(capsys):
    with pytest.raises(SystemExit):
        main(["locking", "--help"])
    out = capsys.readouterr().out
    assert "derive locking Q4" in out and "Caution" in out


def test_benchmark_quick_smoke():
    res = L.benchmark(quick=True)
    assert res["lines"] and all(row["seconds"] > 0 for row in res["rows"])
    assert all(row["agree"] for row in res["symmetry"])
    # the benchmark clears the caches: the closed forms are recomputed identically afterwards
    assert same(L.locking_ratio("Q4", "full", "plane-stress"), COOK)
