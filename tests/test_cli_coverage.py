"""Command options that had no test: plain `list`, exit status 3, `shapes --nodes`,
`stiffness --what B / --geometry parallelogram / --set / --nodes / --rule`, `locking
--distortion taper= / --format latex`, `modes --geometry / --nu / --tol`, `patch --form /
--order / --patch`, `bench --scale`, `chart --tolerance none`, `kernel --jobs`, and a smoke
run of `derive demo` and `derive perf --quick`.

Numbers are checked against tests/fem_reference.py or a formula written here; no timing.
"""
from __future__ import annotations

import json
import math
import os

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import fem_reference as fr
from derive import catalog
from derive.cli import main
from derive.symbols import E, a, b, eta, nu, r, t, xi
from derive.userinput import parse_expression, parse_latex_expression

COOK = (1 - nu ** 2) / (1 + (1 - nu) * r ** 2 / 2)   # Cook, Malkus, Plesha & Witt 4th ed., from memory


def run(capsys, *argv):
    code = main([str(x) for x in argv])
    out = capsys.readouterr()
    return code, out.out, out.err


def run_json(capsys, *argv):
    code, out, err = run(capsys, *argv, "--json")
    return code, json.loads(out), err


# ------------------------------------------------------------------------------------------------
# list and the exit statuses

def test_plain_list_names_every_element_variant_and_spec(capsys):
    code, out, _ = run(capsys, "list")
    assert code == 0
    for name, info in catalog.ELEMENTS.items():
        assert name in out and all(v in out for v in info.variants)
    for state in ("plane-stress", "plane-strain", "axisymmetric"):
        assert state in out
    assert "q12-cubic-serendipity.toml" in out and "t10-cubic-triangle.toml" in out


def test_internal_error_is_exit_3_with_one_line(capsys, monkeypatch):
    from derive.commands import list_cmd

    def broken(args):
        raise RuntimeError("simulated failure")

    monkeypatch.setattr(list_cmd, "run", broken)
    code, out, err = run(capsys, "list")
    assert code == 3
    assert err.count("\n") == 1 and "internal error: RuntimeError: simulated failure" in err
    assert "Traceback" not in err and out == ""


# ------------------------------------------------------------------------------------------------
# shapes --nodes

def test_shapes_nodes_validity_report(capsys):
    code, data, _ = run_json(capsys, "shapes", "Q4", "--nodes", "0,0 2,0 2.2,1 0,1")
    assert code == 0
    v = data["validity"]
    xy = np.array([[0, 0], [2, 0], [2.2, 1], [0, 1]], float)
    area = 0.5 * abs(np.dot(xy[:, 0], np.roll(xy[:, 1], -1)) - np.dot(xy[:, 1], np.roll(xy[:, 0], -1)))
    assert math.isclose(v["area"], area, rel_tol=1e-12)              # shoelace formula (elementary)
    # by hand: x = (21 xi + xi eta + eta + 21) / 20, y = (eta + 1) / 2, so det J = (21 + eta) / 40
    assert math.isclose(v["det_min"], 0.5, rel_tol=1e-12) and math.isclose(v["det_max"], 0.55, rel_tol=1e-12)
    g = 1 / math.sqrt(3)                                              # 2 x 2 Gauss points (numpy leggauss)
    assert math.isclose(v["det_at_points_min"], (21 - g) / 40, rel_tol=1e-12)
    assert math.isclose(v["det_at_points_max"], (21 + g) / 40, rel_tol=1e-12)
    assert sp.cancel(parse_expression(data["map"]["det_jacobian"]) - (21 + eta) / 40) == 0


# ------------------------------------------------------------------------------------------------
# stiffness options

def test_stiffness_what_B_on_the_rectangle(capsys):
    code, data, _ = run_json(capsys, "stiffness", "Q8", "--what", "B")
    assert code == 0 and data["matrix"] == "B" and data["shape"] == [3, 16]
    B = sp.Matrix([[parse_expression(e) for e in row] for row in data["entries"]])
    f = sp.lambdify((a, b, xi, eta), B, "numpy")
    xy = np.array(fr.REF_NODES["Q8"], float) * [1.5, 0.7]            # 2a x 2b centred (documented geometry)
    for s, q in ((0.3, -0.2), (-0.8, 0.6)):
        N, ds, dt = fr.shape("Q8", s, q)
        J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
        dx, dy = np.linalg.solve(J, np.vstack([ds, dt]))
        ref = np.zeros((3, 16)); ref[0, 0::2] = dx; ref[1, 1::2] = dy; ref[2, 0::2] = dy; ref[2, 1::2] = dx
        # textbook B from the hand-typed Q8 (tests/fem_reference.py)
        assert_allclose(np.array(f(1.5, 0.7, s, q), float), ref, rtol=0, atol=1e-13)


def _values(data) -> np.ndarray:
    assert data["numeric"] is True
    return np.array(data["values"], dtype=float)


def test_stiffness_numeric_set_on_the_parallelogram(capsys):
    code, data, _ = run_json(capsys, "stiffness", "Q9", "--geometry", "parallelogram", "--state", "plane-strain",
                             "--set", "a=1.5,b=0.7,c=0.4,E=1000,nu=0.3,t=2")
    assert code == 0
    X = np.array(fr.REF_NODES["Q9"], float)
    xy = np.column_stack([1.5 * X[:, 0] + 0.4 * X[:, 1], 0.7 * X[:, 1]])   # x = a X + c Y, y = b Y
    Kr = fr.stiffness("Q9", xy, 1000.0, 0.3, 2.0, "plane-strain")       # textbook quadrature
    assert_allclose(_values(data), Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


def test_stiffness_nodes_and_fractions_in_set(capsys):
    code, data, _ = run_json(capsys, "stiffness", "T3", "--nodes", "0,0 2,0 0,1", "--set", "E=1,nu=1/4,t=1")
    assert code == 0
    Kr = fr.stiffness("T3", np.array([[0, 0], [2, 0], [0, 1]], float), 1.0, 0.25, 1.0)   # CST, textbook
    assert_allclose(_values(data), Kr, rtol=0, atol=1e-14)


@pytest.mark.parametrize("name,rule,full", [("Q4", "gauss-1x1", False), ("Q8", "gauss-2x2", False),
                                            ("Q4", "exact", True)])
def test_stiffness_rule_option(capsys, name, rule, full):
    code, data, _ = run_json(capsys, "stiffness", name, "--rule", rule, "--set", "a=2,b=0.5,E=10,nu=0.25,t=1")
    assert code == 0 and data["rule"] == rule
    xy = np.array(fr.REF_NODES[name], float) * [2.0, 0.5]
    # the named Gauss rule from numpy leggauss; "exact" equals the 2 x 2 rule on a rectangle, whose
    # Q4 integrands are polynomials of degree 2 per direction (textbook fact)
    Kr = fr.stiffness(name, xy, 10.0, 0.25, 1.0, full=full)
    assert_allclose(_values(data), Kr, rtol=0, atol=1e-13 * np.abs(Kr).max())


# ------------------------------------------------------------------------------------------------
# locking options

def test_locking_taper_distortion_against_an_energy_solve(capsys):
    code, data, _ = run_json(capsys, "locking", "Q4", "--distortion", "taper=0.3")
    assert code == 0
    d = data["distortion"]
    assert d["kind"] == "taper" and d["aspect"] == 1.0 and d["nu"] == 0.3
    X = np.array(fr.REF_NODES["Q4"], float)
    xy = np.column_stack([X[:, 0], X[:, 1] * (1 + 0.3 * X[:, 0])])      # y = b Y (1 + tau X), b = a = 1
    expected = fr.bending_energy_ratio("Q4", [xy], lambda e: fr.stiffness("Q4", e, 1.0, 0.3, 1.0))
    assert math.isclose(d["ratio"], expected, rel_tol=1e-10)             # independent energy solve


def test_locking_latex_format_reads_back_to_the_published_formula(capsys):
    code, out, _ = run(capsys, "locking", "Q4", "--format", "latex")
    assert code == 0
    line = next(ln for ln in out.splitlines() if "\\frac" in ln)
    rhs = line.split("=", 1)[1].strip()
    assert sp.cancel(parse_latex_expression(rhs) - COOK) == 0


# ------------------------------------------------------------------------------------------------
# modes options

def test_modes_geometry_nu_and_tol(capsys):
    code, data, _ = run_json(capsys, "modes", "Q4", "--variant", "reduced", "--geometry", "parallelogram",
                             "--nu", "0.49")
    assert code == 0 and data["geometry"] == "parallelogram" and data["nu"] == 0.49
    # one-point Q4: 3 rigid-body modes + 2 hourglass modes (Cook et al. 4th ed., from memory)
    assert (data["zero_energy"], data["rigid"], data["spurious"]) == (5, 3, 2)
    xy = np.array(data["nodes"], float)
    assert abs(xy[1, 0] - xy[0, 0] - (xy[2, 0] - xy[3, 0])) < 1e-12 and xy[0, 1] == xy[1, 1]   # a parallelogram
    w = np.linalg.eigvalsh(fr.stiffness("Q4", xy, 1.0, 0.49, 1.0, full=False))   # textbook 1-point Q4
    assert_allclose(sorted(data["eigenvalues"]), w, rtol=0, atol=1e-12 * w.max())
    # --tol is relative to the largest eigenvalue: on a 100:1 element the fully integrated Q4's
    # locked bending mode sits at 9e-5 of it (textbook quadrature below), counted by 5e-4, not by 1e-8
    slender = np.array([[0, 0], [100, 0], [100, 1], [0, 1]], float)
    w = np.linalg.eigvalsh(fr.stiffness("Q4", slender, 1.0, 0.3, 1.0))
    for tol in (1e-8, 5e-4):
        code, res, _ = run_json(capsys, "modes", "Q4", "--nodes", "0,0 100,0 100,1 0,1", "--tol", tol)
        assert code == 0 and res["zero_energy"] == int(np.sum(w < tol * w.max()))
        assert res["zero_energy"] == (3 if tol == 1e-8 else 4)


# ------------------------------------------------------------------------------------------------
# patch options

def test_patch_form_order_patch(capsys):
    code, data, _ = run_json(capsys, "patch", "Q8", "--form", "force", "--order", "higher", "--patch", "both")
    # the 8-node serendipity element keeps quadratic completeness only on parallelograms
    # (Lee & Bathe 1993, from memory): the regular patch passes, the distorted one fails
    assert code == 1
    got = {(t["patch"], t["order"], t["form"]): t["passed"] for t in data["tests"]}
    assert got == {("distorted", "higher", "force"): False, ("regular", "higher", "force"): True}
    code, data, _ = run_json(capsys, "patch", "Q4", "--form", "displacement", "--order", "constant",
                             "--patch", "regular")
    assert code == 0 and [(t["patch"], t["form"]) for t in data["tests"]] == [("regular", "displacement")]
    assert data["max_error"] < 1e-10            # constant strain is in the Q4 space: round-off only


# ------------------------------------------------------------------------------------------------
# bench --scale, chart --tolerance none, kernel --jobs

def test_bench_scale_is_the_viewer_warp_factor(tmp_path, capsys):
    # the file holds the undeformed mesh and the displacement; --scale is the warp factor printed
    # for the viewer, so both files carry the same data (meshio reads them: reference library)
    import meshio
    meshes = {}
    for scale in (1, 10):
        path = tmp_path / f"s{scale}.vtu"
        code, out, _ = run(capsys, "bench", "membrane", "--element", "Q4", "--mesh", "2", "--vtu", path,
                           "--scale", scale)
        assert code == 0 and f"factor {scale}" in out
        meshes[scale] = meshio.read(path)
    m1, m10 = meshes[1], meshes[10]
    assert_allclose(m10.points, m1.points, rtol=0, atol=0)
    assert_allclose(m10.point_data["displacement"], m1.point_data["displacement"], rtol=0, atol=0)
    # undeformed: the corners of Cook's panel (Cook 1974, from memory) are mesh points
    for corner in ((0, 0), (48, 44), (48, 60), (0, 44)):
        assert np.min(np.hypot(m1.points[:, 0] - corner[0], m1.points[:, 1] - corner[1])) < 1e-12


def test_chart_tolerance_none_omits_the_band(tmp_path, capsys):
    with_band, without = tmp_path / "band.svg", tmp_path / "none.svg"
    assert run(capsys, "chart", "locking", "--tolerance", "0.05", "-o", with_band)[0] == 0
    assert run(capsys, "chart", "locking", "--tolerance", "none", "-o", without)[0] == 0
    assert 'id="tolerance' in with_band.read_text() and 'id="tolerance' not in without.read_text()


def test_kernel_jobs_reaches_the_generator(capsys, monkeypatch):
    from derive.codegen import committed
    gen = committed.repo_generated_dir()
    if gen is None or not gen.exists():
        pytest.skip("no generated/ folder (installed copy)")
    seen = []

    def spy(jobs=None, progress=None):          # the committed files as they are: --check passes
        seen.append(jobs)
        return {p.relative_to(gen).as_posix(): p.read_text(encoding="utf-8") for p in gen.rglob("*") if p.is_file()}

    monkeypatch.setattr(committed, "render_all", spy)
    code, data, _ = run_json(capsys, "kernel", "--check", "--jobs", "1")
    assert code == 0 and data["up_to_date"] is True and seen == [1]
    code, _, err = run(capsys, "kernel", "--check", "--jobs", "999")
    assert code == 0 and "capped" in err and 1 <= seen[-1] <= (os.cpu_count() or 1)
    code, _, err = run(capsys, "kernel", "--check", "--jobs", "0")
    assert code == 2 and err.count("\n") == 1 and "--jobs" in err


# ------------------------------------------------------------------------------------------------
# smoke runs of demo and perf

def test_demo_smoke(tmp_path, capsys):
    out = tmp_path / "demo"
    code, data, _ = run_json(capsys, "demo", "-o", out)
    assert code == 0 and data["sections"] and "Caution" in data["caution"]
    for section in data["sections"]:
        for name in section["files"]:
            assert (out / name).stat().st_size > 0, name
    assert "Caution" in (out / "demo-report.md").read_text(encoding="utf-8")
    # the Q4 closed form it prints: K[0,0] = E t/(1 - nu^2) (b/(3a) + (1 - nu) a/(6b)) for the
    # 2a x 2b rectangle (Cook et al. 4th ed., from memory)
    line = next(ln for sec in data["sections"] for ln in sec["lines"] if ln.startswith("Q4 closed form: K[0,0] ="))
    k00 = parse_expression(line.split("=", 1)[1])
    assert sp.cancel(k00 - E * t / (1 - nu ** 2) * (b / (3 * a) + (1 - nu) * a / (6 * b))) == 0
    table = json.loads((out / "locking-table.json").read_text(encoding="utf-8"))
    q4 = next(row for row in table if row["element"] == "Q4" and row["variant"] == "full")
    assert math.isclose(q4["ratio"], float(COOK.subs({r: 2, nu: sp.Rational(1, 5)})), rel_tol=1e-12)


def test_perf_quick_smoke(capsys):
    # a smoke run: every section runs and its internal agreement checks hold; no timing asserted
    code, data, _ = run_json(capsys, "perf", "--quick")
    assert code == 0
    sections = {res["section"]: res for res in data["results"]}
    assert set(sections) == {"symbolic", "locking", "kernels", "mesh"}
    assert all(res["available"] and res["lines"] for res in sections.values())
    assert all(row["agree"] for row in sections["symbolic"]["rows"])         # same K as integrate+simplify
    assert all(row["agree"] for row in sections["locking"]["symmetry"])
    for row in sections["kernels"]["rows"]:
        for lang, k in row["kernels"].items():
            assert k["max_rel_diff_vs_baseline"] < 1e-12, lang               # round-off only
    assert all(route["max_rel_difference"] < 1e-10 for route in sections["mesh"]["routes"])
