"""Bad input values: refused with one line and exit 2 (CLI) or InputError (library), never a
wrong number, a NaN, an internal error or unbounded work.

The sweep (``SWEEP``) tries the same hostile values on every command option that takes a
number; it is the script that found the exit-3 and silent cases, kept as a test.  A few
cases run through a subprocess (``python -m derive``) to check the real exit status and
stderr; the sweep calls ``derive.cli.main`` in-process to stay fast.
"""
from __future__ import annotations

import os
import subprocess
import sys
import warnings

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import derive
from derive import limits
from derive.cli import main
from derive.errors import GeometryError, InputError
from derive.output import parse_number, parse_set
from derive.stiffness import SingularInternalBlock, gauss_moment_1d, rule_moment

SQUARE = [[0, 0], [2, 0], [2, 2], [0, 2]]
SQUARE_TEXT = "0,0 2,0 2,2 0,2"
LONG = "1" + "0" * 4000


def cli(capsys, *argv):
    code = main(list(argv))
    out, err = capsys.readouterr()
    return code, out, err


def subprocess_cli(*argv, timeout=120):
    return subprocess.run([sys.executable, "-m", "derive", *argv], capture_output=True, text=True, timeout=timeout)


def assert_refused(code, err, *words):
    assert code == 2, err
    assert err.count("\n") == 1 and "internal error" not in err and "Traceback" not in err, err
    for w in words:
        assert w in err, err


# ---------------------------------------------------------------------------------------------
# the number parser

@pytest.mark.parametrize("text, words", [
    ("1/0", ["divides by zero"]),
    ("1_0", ["'_'"]),
    ("1e-9999999", ["exponent", "at most 3 digits"]),
    (LONG, ["too many digits", "at most 40", "4001 characters"]),
    ("1e308", ["out of range", "1e30"]),
    ("1e-40", ["out of range", "1e-30"]),
    ("nan", ["not a number"]),
    ("inf", ["not a number"]),
    ("", ["not a number"]),
    ("0x10", ["not a number"]),
    ("1e3.5", ["not a number"]),
])
def test_parse_number_refuses(text, words):
    with pytest.raises(InputError) as exc:
        parse_number(text, "--set E")
    msg = str(exc.value)
    assert "\n" not in msg and len(msg) < 200, msg   # a shortened echo, never the 4000-digit line
    for w in words:
        assert w in msg, msg


@pytest.mark.parametrize("text, value", [
    ("0.3", sp.Rational(3, 10)), ("210e9", sp.Integer(210 * 10 ** 9)), ("1/3", sp.Rational(1, 3)),
    ("-2.5E-3", sp.Rational(-25, 10000)), ("+.5", sp.Rational(1, 2)), ("0", sp.Integer(0)), ("7.", sp.Integer(7)),
    ("1e+3", sp.Integer(1000)), ("-3/-6", sp.Rational(1, 2)),
])
def test_parse_number_exact(text, value):
    # exact decimal arithmetic (common practice, no source)
    assert parse_number(text, "x") == value


def test_parse_number_is_fast_on_hostile_exponents():
    # hang guard only (60 s); the refusal itself is what is asserted
    for text in ("1e-9999999", "1e9999999999", "9" * 100000):
        with pytest.raises(InputError):
            parse_number(text, "--nodes")


def test_parse_set_positive_and_duplicates():
    for item, word in (("t=-1", "t must be a finite number > 0"), ("t=0", "t must be"), ("a=-1", "a must be"),
                       ("b=0", "b must be"), ("E=0", "E must be"), ("R=-2", "R must be"),
                       ("a=1,a=2", "given twice")):
        with pytest.raises(InputError, match=word):
            parse_set(item)
    with pytest.raises(InputError, match="empty"):
        parse_set("  ")
    assert parse_set("c=-1")[derive.symbols.c] == -1   # the skew may be negative


# ---------------------------------------------------------------------------------------------
# library entry points

@pytest.mark.parametrize("t", [-1, 0, float("inf"), float("nan"), -0.5])
def test_library_refuses_bad_thickness(t):
    el = derive.element("Q4")
    with pytest.raises(InputError, match="t"):
        el.stiffness(SQUARE, E=1, nu=0.3, t=t)
    with pytest.raises(InputError, match="t"):
        el.numeric_stiffness(SQUARE, 1.0, 0.3, t)


def test_library_refuses_bad_thickness_in_a_batch():
    el = derive.element("Q4")
    xy = np.array([SQUARE, SQUARE], float)
    with pytest.raises(InputError, match="t = -1"):
        el.numeric_stiffness(xy, 1.0, 0.3, np.array([1.0, -1.0]))


def test_positive_thickness_still_gives_a_positive_semidefinite_K():
    # Q4 unit-modulus square: 3 zero (rigid-body) eigenvalues, 5 positive (common practice, no source)
    K = derive.element("Q4").numeric_stiffness(SQUARE, 1.0, 0.3, 0.5)
    w = np.linalg.eigvalsh(K)
    assert np.sum(np.abs(w) <= 1e-12 * w.max()) == 3 and w.min() > -1e-12 * w.max()


@pytest.mark.parametrize("xy, word", [
    ([[0, 0], [1e160, 0], [1, 1], [0, 1]], "out of range"),
    ([[0, 0], [np.inf, 0], [1, 1], [0, 1]], "finite"),
    ("0,0 1,0", "string"),
])
def test_library_refuses_bad_coordinates(xy, word):
    el = derive.element("Q4")
    with pytest.raises(InputError, match=word):
        el.numeric_stiffness(xy, 1.0, 0.3, 1.0)
    if not isinstance(xy, str):
        with pytest.raises(InputError, match=word):
            el.stiffness(xy, E=1, nu=0.3, t=1)


def test_library_refuses_wrong_node_count():
    with pytest.raises(InputError, match="needs 4 nodes"):
        derive.element("Q4").numeric_stiffness([[0, 0], [1, 0], [0, 1]], 1.0, 0.3, 1.0)


def test_axisymmetric_element_across_the_axis_is_refused():
    el = derive.element("Q4", state="axisymmetric")
    nodes = [[-1, 0], [1, 0], [1, 1], [-1, 1]]
    for call in (lambda: el.stiffness(nodes, E=1, nu=0.3), lambda: el.numeric_stiffness(nodes, 1.0, 0.3)):
        with pytest.raises(GeometryError, match="node 1 is at radius r = x = -1 < 0"):
            call()


def test_axisymmetric_element_touching_the_axis_is_allowed():
    # an element next to the axis (nodes at r = 0) is ordinary practice; K is finite and has
    # one rigid-body mode (axial translation) in the axisymmetric state (Cook et al., from memory)
    K = derive.element("Q4", state="axisymmetric").numeric_stiffness([[0, 0], [1, 0], [1, 1], [0, 1]], 1.0, 0.3)
    w = np.linalg.eigvalsh(0.5 * (K + K.T))
    assert np.all(np.isfinite(K)) and np.sum(np.abs(w) <= 1e-10 * w.max()) == 1


def test_bow_tie_is_named_self_intersecting():
    el = derive.element("Q4")
    for nodes in ([[0, 0], [1, 0], [0, 1], [1, 1]], [[0, 0], [2, 0], [0, 1], [1, 1]]):
        with pytest.raises(GeometryError) as exc:
            el.validity(nodes)
        msg = str(exc.value)
        assert "self-intersecting" in msg and "edge 2-3 crosses edge 4-1" in msg and "det J" in msg, msg
        assert "collinear" not in msg and "most negative at node" in msg
    # a genuinely collinear element keeps the zero-area message
    with pytest.raises(GeometryError, match="collinear"):
        el.validity([[0, 0], [1, 0], [2, 0], [3, 0]])


def test_bow_tie_det_values_in_the_message():
    # the message carries the most negative corner det J; checked against an independent numpy
    # evaluation of the bilinear map (textbook Q4 shape functions, Cook et al., from memory)
    nodes = np.array([[0, 0], [1, 0], [0, 1], [1, 1]], float)
    with pytest.raises(GeometryError) as exc:
        derive.element("Q4").validity(nodes)

    def detj(s, e):
        dNs = np.array([-(1 - e), (1 - e), (1 + e), -(1 + e)]) / 4
        dNe = np.array([-(1 - s), -(1 + s), (1 + s), (1 - s)]) / 4
        J = np.array([[dNs @ nodes[:, 0], dNs @ nodes[:, 1]], [dNe @ nodes[:, 0], dNe @ nodes[:, 1]]])
        return np.linalg.det(J)
    corners = [detj(s, e) for s, e in ((-1, -1), (1, -1), (1, 1), (-1, 1))]
    k = int(np.argmin(corners))
    assert corners[k] < 0
    assert f"most negative at node {k + 1}, det J = {corners[k]:.6g}" in str(exc.value)


# ---------------------------------------------------------------------------------------------
# singular internal blocks (a rule too weak for the internal modes)

@pytest.mark.parametrize("element, variant, rank, n", [
    ("Q4", "eas4", 0, 4), ("Q4", "incompatible", 0, 4), ("Q4", "incompatible-centred", 0, 4),
    ("Q4", "hybrid5", 3, 5), ("Q8", "bbar", 1, 3),
])
def test_weak_rule_names_the_singular_block(element, variant, rank, n):
    # ranks: at the single centre point the enhanced/bubble strains (xi, eta, ...) vanish
    # (rank 0); hybrid5's 3 constant stress modes survive (rank 3); the linear pressure
    # {1, xi, eta} keeps only its constant (rank 1) -- hand count, common practice, no source
    el = derive.element(element, variant)
    for geometry in ("rectangle", [[0, 0], [2, 0], [2.2, 1], [0, 1.1]] if element == "Q4" else
                     [[0, 0], [2, 0], [2, 2], [0, 2], [1, 0], [2, 1], [1, 2], [0, 1]]):
        with pytest.raises(SingularInternalBlock) as exc:
            el.stiffness(geometry, rule="gauss-1x1")
        msg = str(exc.value)
        assert f"K_aa ({n} x {n}" in msg and f"rank {rank} of {n}" in msg and "gauss-1x1" in msg, msg
        assert "too weak" in msg


def test_bbar_q4_with_one_point_is_fine():
    # the mean-dilatation block is the element volume (1 x 1): any rule keeps it regular; the 2a x 2b
    # square's K is finite and symmetric (common practice, no source)
    K = derive.element("Q4", "bbar").stiffness("rectangle", rule="gauss-1x1", E=1, nu=sp.Rational(3, 10), t=1)
    assert K.free_symbols == {derive.symbols.a, derive.symbols.b} and (K - K.T).is_zero_matrix


def test_numeric_path_names_the_singular_block_by_element_index():
    # the numeric route uses the element's own rule; a collapsed element (every node at one
    # point) divides by det J = 0, and the refusal names its index in the batch (no NaN K, no
    # RuntimeWarning)
    el = derive.element("Q4", "eas4")
    ok = np.array([SQUARE, [[0, 0], [1, 0], [1, 1], [0, 1]]], float)
    K = el.numeric_stiffness(ok, 1.0, 0.3, 1.0)
    assert K.shape == (2, 8, 8) and np.all(np.isfinite(K))
    bad = np.array([SQUARE, [[0, 0], [0, 0], [0, 0], [0, 0]]], float)
    with warnings.catch_warnings():
        warnings.simplefilter("error", RuntimeWarning)
        with pytest.raises(GeometryError, match="element 1 of the batch"):
            el.numeric_stiffness(bad, 1.0, 0.3, 1.0)


def test_cli_eas4_gauss1x1_exit_2():
    res = subprocess_cli("stiffness", "Q4", "--rule", "gauss-1x1", "--variant", "eas4")
    assert res.returncode == 2, res.stderr
    assert res.stderr.count("\n") == 1 and "K_aa (4 x 4" in res.stderr and "singular" in res.stderr


# ---------------------------------------------------------------------------------------------
# tolerances, aspect ratios, rule sizes

@pytest.mark.parametrize("tol", [-1, 0, 2, 1e308, 1e-20, float("nan")])
def test_modes_tolerance_interval(tol):
    from derive.modes import zero_energy_modes
    with pytest.raises(InputError, match=r"open interval \(1e-13, 0.001\)"):
        zero_energy_modes("Q4", tol=tol)


@pytest.mark.parametrize("tol", [-1, 0, 0.5, 1e308])
def test_patch_tolerance_interval(tol):
    from derive.patch import patch_test
    with pytest.raises(InputError, match=r"open interval \(1e-12, 0.001\)"):
        patch_test("Q4", "incompatible", tol=tol)


def test_modes_sound_element_at_the_interval_edges():
    # Q4 full: 3 rigid-body modes and no spurious ones at both ends of the interval (Cook et al.,
    # from memory: the bilinear element has exactly the three rigid-body modes)
    from derive.modes import zero_energy_modes
    for tol in (2e-13, 9e-4):
        res = zero_energy_modes("Q4", tol=tol)
        assert (res["zero_energy"], res["rigid"]) == (3, 3)


@pytest.mark.parametrize("aspect", [1e308, 1e7, 1e-7, 0, -1, float("inf")])
def test_locking_aspect_range(aspect):
    from derive.locking import evaluate
    with pytest.raises(InputError, match="1e-6 <= r <= 1e6|positive|range"):
        evaluate("Q4", "full", "plane-stress", aspect, 0.3)


def test_locking_ratio_finite_over_the_whole_range():
    # no NaN or infinity at the ends of the documented range; Q4 full locks more the more
    # elongated the element and completely as r -> infinity (Cook et al., from memory)
    from derive.locking import evaluate
    vals = [evaluate("Q4", "full", "plane-stress", r, 0.3) for r in (1e-6, 1.0, 1e6)]
    assert all(np.isfinite(vals))
    assert 0 < vals[2] < 1e-9 < vals[1] < vals[0] <= 1


def test_rule_point_limit_on_symbolic_geometry():
    el = derive.element("Q8", state="axisymmetric")
    with pytest.raises(InputError, match="limit is 9 points per term"):
        el.stiffness("rectangle", rule="gauss-5")
    el4 = derive.element("Q4")
    with pytest.raises(InputError, match="limit is 25 points per term"):
        el4.stiffness([[0, 0], [2, 0], [2.2, 1], [0, 1.1]], rule="gauss-6")


def test_large_rule_allowed_with_numeric_material():
    # 100 points with numeric nodes and material: allowed, and equal to an independent numpy
    # evaluation with numpy's 10-point Gauss-Legendre rule (numpy.polynomial.legendre.leggauss)
    # of the textbook shape functions in tests/fem_reference.py
    import fem_reference as ref
    nodes = np.array([[0, 0], [2, 0], [2.2, 1], [0, 1.1]], float)
    K = derive.element("Q4").stiffness(nodes.tolist(), rule="gauss-10", E=1, nu=sp.Rational(3, 10), t=1)
    g, w = np.polynomial.legendre.leggauss(10)
    D = ref.D_matrix("plane-stress", 1.0, 0.3)
    Kref = np.zeros((8, 8))
    for s_, ws in zip(g, w):
        for q, wq in zip(g, w):
            _, ds, dt = ref.shape("Q4", s_, q)
            J = np.array([[ds @ nodes[:, 0], ds @ nodes[:, 1]], [dt @ nodes[:, 0], dt @ nodes[:, 1]]])
            dxy = np.linalg.solve(J, np.vstack([ds, dt]))
            B = np.zeros((3, 8))
            B[0, 0::2] = dxy[0]; B[1, 1::2] = dxy[1]; B[2, 0::2] = dxy[1]; B[2, 1::2] = dxy[0]
            Kref += ws * wq * np.linalg.det(J) * B.T @ D @ B
    assert_allclose(np.array(K.evalf(17).tolist(), dtype=float), Kref, rtol=1e-12, atol=1e-13)


@pytest.mark.parametrize("n", [1, 2, 3, 6, 10])
def test_gauss_moment_1d_against_numpy(n):
    # numpy.polynomial.legendre.leggauss points and weights (general reference library)
    x, w = np.polynomial.legendre.leggauss(n)
    got = [float(gauss_moment_1d(n, p)) for p in range(26)]
    assert_allclose(got, [np.sum(w * x ** p) for p in range(26)], rtol=1e-13, atol=1e-15)


def test_rule_moment_tensor_matches_direct_sum():
    # the direct exact sum over the radical points (the former implementation) for a 2 x 3 rule
    rl = derive.quadrature.rule("gauss-2x3")
    for p, q in ((4, 0), (0, 6), (3, 5), (6, 6), (2, 8)):
        direct = sp.nsimplify(sp.radsimp(sp.expand(sum(w * a ** p * b ** q
                                                       for (a, b), w in zip(rl.points, rl.weights)))))
        assert rule_moment("gauss-2x3", p, q) == direct


# ---------------------------------------------------------------------------------------------
# CLI: specific cases through a subprocess

@pytest.mark.parametrize("argv, words", [
    (["stiffness", "Q4", "--set", "a=1,b=1,E=1,nu=0.3,t=-1"], ["t = -1"]),
    (["stiffness", "Q4", "--set", "a=-1,b=1"], ["a = -1"]),
    (["stiffness", "Q4", "--state", "axisymmetric", "--set", "R=0.5,a=1,b=1"], ["cross the axis", "R >= a"]),
    (["stiffness", "Q4", "--geometry", "parallelogram", "--state", "axisymmetric", "--set", "R=1.5,a=1,c=1"],
     ["R >= a + |c|"]),
    (["stiffness", "Q4", "--set", "E=1/0"], ["divides by zero"]),
    (["stiffness", "Q4", "--set", "E=1_0"], ["'_'"]),
    (["stiffness", "Q4", "--nodes", ""], ["--nodes is empty"]),
    (["stiffness", "Q4", "--nodes", "0,0 1e160,0 1,1 0,1"], ["out of range"]),
    (["stiffness", "Q4", "--set", "E=1e-9999999"], ["exponent"]),
    (["stiffness", "Q4", "--set", "E=" + LONG], ["too many digits", "..."]),
    (["stiffness", "Q4", "--nodes", "0,0 1,0 0,1 1,1"], ["self-intersecting"]),
    (["locking", "Q4", "--aspect", "1e308"], ["out of range"]),
    (["locking", "Q4", "--aspect", "1e7"], ["1e-6 <= r <= 1e6"]),
    (["modes", "Q4", "--tol", "-1"], ["open interval"]),
    (["modes", "Q4", "--tol", "2"], ["open interval"]),
    (["patch", "Q4", "--variant", "incompatible", "--tol", "1e308"], ["open interval"]),
    (["stiffness", "Q8", "--state", "axisymmetric", "--rule", "gauss-10"], ["limit is 9 points"]),
])
def test_cli_refuses_in_one_line(argv, words):
    res = subprocess_cli(*argv)
    assert_refused(res.returncode, res.stderr, *words)
    assert res.stdout == ""
    assert "RuntimeWarning" not in res.stderr


def test_cli_axisymmetric_touching_the_axis_runs():
    res = subprocess_cli("stiffness", "Q4", "--state", "axisymmetric", "--set", "R=1,a=1,b=1,E=1,nu=0.3")
    assert res.returncode == 0 and "nan" not in res.stdout.lower() and "zoo" not in res.stdout, res.stderr


def test_locking_never_prints_nan(capsys):
    for r in ("1e-6", "1e6"):
        code, out, err = cli(capsys, "locking", "Q4", "--aspect", r, "--nu", "0.3")
        assert code == 0 and "nan" not in out.lower() and "inf" not in out.lower(), out


# ---------------------------------------------------------------------------------------------
# the sweep: hostile values on every command option that takes a number

HOSTILE = ["1/0", "1e308", "-1e308", "1e-9999999", "1_0", "nan", "inf", "", "1e160", LONG, "abc"]
NEGATIVE = ["-1", "0"]  # refused where the quantity must be positive


def _sweep_cases(tmp, inputs):
    png = str(tmp / "c.png")
    kfile = inputs / "k.txt"
    kfile.write_text("\n".join(" ".join(["0"] * 8) for _ in range(8)) + "\n", encoding="utf-8")
    q4 = "{v},0 1,0 1,1 0,1"
    rows = [  # (argv template with {v}, extra bad values)
        (["stiffness", "Q4", "--set", "a={v}"], NEGATIVE),
        (["stiffness", "Q4", "--set", "b={v}"], NEGATIVE),
        (["stiffness", "Q4", "--geometry", "parallelogram", "--set", "c={v}"], []),
        (["stiffness", "Q4", "--state", "axisymmetric", "--set", "R={v}"], NEGATIVE),
        (["stiffness", "Q4", "--set", "E={v}"], NEGATIVE),
        (["stiffness", "Q4", "--set", "nu={v}"], ["-1", "0.6"]),
        (["stiffness", "Q4", "--set", "t={v}"], NEGATIVE),
        (["stiffness", "T3", "--geometry", "general", "--set", "x1={v}"], []),
        (["stiffness", "Q4", "--nodes", q4], []),
        (["stiffness", "Q4", "--nodes", "{v}"], ["0,0", "0,0 1,0 1,1"]),
        (["shapes", "Q4", "--nodes", q4], []),
        (["modes", "Q4", "--nodes", q4], []),
        (["modes", "Q4", "--nu", "{v}"], ["0.6", "-1"]),
        (["modes", "Q4", "--tol", "{v}"], NEGATIVE + ["2", "1e-20"]),
        (["patch", "Q4", "--tol", "{v}"], NEGATIVE + ["2"]),
        (["locking", "Q4", "--aspect", "{v}"], NEGATIVE + ["1e7"]),
        (["locking", "Q4", "--nu", "{v}"], ["0.6", "-1", "0:{v}".replace("{v}", "0.7")]),
        (["locking", "Q4", "--tolerance", "{v}"], NEGATIVE + ["2"]),
        (["locking", "Q4", "--distortion", "taper={v}"], ["0.99"]),
        (["locking", "Q4", "--distortion", "skew={v}"], ["90"]),
        (["chart", "locking", "--aspect", "1:{v}", "-o", png], NEGATIVE + ["1e7"]),
        (["chart", "locking", "--nu", "{v}", "-o", png], ["0.6"]),
        (["chart", "locking", "--tolerance", "{v}", "-o", png], NEGATIVE + ["2"]),
        (["chart", "contour", "--aspect", "1:{v}", "-o", png], NEGATIVE + ["1e7"]),
        (["chart", "contour", "--nu", "0:{v}", "-o", png], ["0.6"]),
        (["chart", "distortion", "--aspect", "{v}", "-o", png], NEGATIVE + ["1e7"]),
        (["chart", "distortion", "--nu", "{v}", "-o", png], ["0.6"]),
        (["chart", "distortion", "--distortion", "taper=0:{v}", "-o", png], ["0.99"]),
        (["bench", "membrane", "--mesh", "{v}"], NEGATIVE + ["1.5"]),
        (["bench", "membrane", "--refine", "{v}"], NEGATIVE),
        (["bench", "cantilever", "--refine", "{v}"], NEGATIVE),
        (["bench", "cylinder", "--mesh", "2", "--nu", "{v}"], ["0.6"]),
        (["bench", "locking-mesh", "--depths", "{v}"], NEGATIVE),
        (["bench", "locking-mesh", "--accuracy", "{v}"], NEGATIVE + ["3"]),
        (["bench", "membrane", "--mesh", "2", "--vtu", str(tmp / "m.vtu"), "--scale", "{v}"], []),
        (["kernel", "--check", "--jobs", "{v}"], NEGATIVE),
        (["bench", "membrane", "--mesh", "2", "--memory-limit", "{v}"], NEGATIVE),
        (["bench", "membrane", "--mesh", "2", "--digits", "{v}"], NEGATIVE + ["18"]),
        (["stiffness", "Q4", "--set", "a=1,b=1,E=1,nu=0.3,t=1", "--digits", "{v}"], NEGATIVE + ["18"]),
        (["modes", "Q4", "--dpi", "{v}"], NEGATIVE + ["1_00"]),
        (["check", str(kfile), "--element", "Q4", "--nodes", SQUARE_TEXT, "--set", "E={v}"], NEGATIVE),
        (["check", str(kfile), "--element", "Q4", "--nodes", SQUARE_TEXT, "--tolerance", "{v}"], NEGATIVE),
    ]
    for template, extra in rows:
        for v in HOSTILE + extra:
            yield [a.replace("{v}", v) for a in template]


def test_sweep_every_numeric_option(capsys, tmp_path, tmp_path_factory):
    failures = []
    inputs = tmp_path_factory.mktemp("inputs")
    with warnings.catch_warnings():
        warnings.simplefilter("error", RuntimeWarning)   # a leaked RuntimeWarning fails the case
        for argv in _sweep_cases(tmp_path, inputs):
            try:
                code = main(argv)
            except SystemExit as exc:        # argparse refusals exit 2 through SystemExit
                code = exc.code
            except RuntimeWarning as exc:
                code = f"RuntimeWarning {exc}"
            out, err = capsys.readouterr()
            lines = [ln for ln in err.splitlines() if ln.strip()]
            if code != 2 or len(lines) != 1 or "internal error" in err:
                failures.append((argv[:4] + ["..."] if len(" ".join(argv)) > 120 else argv, code, err[:200]))
    assert not failures, "\n".join(map(str, failures))
    assert not list(tmp_path.iterdir())  # nothing written for refused input


# ---------------------------------------------------------------------------------------------
# paths: a folder where a file is expected, and every PermissionError, are one line and exit 2

def test_folder_as_spec_table_vtu(capsys, tmp_path):
    folder = tmp_path / "adir.toml"
    folder.mkdir()
    assert_refused(*cli(capsys, "stiffness", str(folder))[::2], "is a folder")
    assert_refused(*cli(capsys, "shapes", str(folder))[::2], "is a folder")
    for opt in ("--table", "--vtu"):
        assert_refused(*cli(capsys, "bench", "membrane", "--mesh", "2", opt, str(tmp_path))[::2], "folder")
    assert_refused(*cli(capsys, "modes", "Q4", "--mesh-file", str(tmp_path))[::2])


def test_unreadable_spec_is_one_line(capsys, monkeypatch, tmp_path):
    # the process may run as root (chmod cannot make a file unreadable then): raise the
    # PermissionError the operating system would give
    import builtins

    import derive.spec as spec
    real_open = builtins.open

    def denied(path, *args, **kwargs):
        if str(path).endswith("locked.toml"):
            raise PermissionError(13, "Permission denied", str(path))
        return real_open(path, *args, **kwargs)
    locked = tmp_path / "locked.toml"   # a real regular file: only opening it is denied
    locked.write_text("name = 'X'\n")
    monkeypatch.setattr(spec, "open", denied, raising=False)
    assert_refused(*cli(capsys, "stiffness", str(locked))[::2], "locked.toml", "ermission denied")


@pytest.mark.parametrize("argv", [
    ["bench", "membrane", "--mesh", "2", "--table", "{dir}/t.md"],
    ["bench", "membrane", "--mesh", "2", "--vtu", "{dir}/m.vtu"],
    ["chart", "locking", "-o", "{dir}/c.png"],
    ["modes", "Q4", "--variant", "reduced", "--plot", "{dir}/m.png"],
])
def test_unwritable_folder_is_one_line(capsys, monkeypatch, tmp_path, argv):
    # a read-only folder, as the OS reports it to an unprivileged user (see above)
    import tempfile

    def denied(*args, **kwargs):
        raise PermissionError(13, "Permission denied", kwargs.get("dir"))
    monkeypatch.setattr(tempfile, "mkstemp", denied)
    code, _, err = cli(capsys, *[a.replace("{dir}", str(tmp_path)) for a in argv])
    assert_refused(code, err, "ermission denied")
    assert not list(tmp_path.iterdir())


@pytest.mark.skipif(not hasattr(os, "geteuid") or os.geteuid() == 0, reason="root can write a read-only folder")
def test_read_only_folder_for_real(tmp_path):
    ro = tmp_path / "ro"
    ro.mkdir()
    ro.chmod(0o555)
    try:
        res = subprocess_cli("bench", "membrane", "--mesh", "2", "--table", str(ro / "t.md"))
        assert_refused(res.returncode, res.stderr)
    finally:
        ro.chmod(0o755)


def test_unusable_kernel_cache_falls_back_to_numpy(tmp_path):
    # a cache folder that cannot be created (its parent is a file): the library warns and uses the
    # NumPy kernel, whose K equals the textbook routine of tests/fem_reference.py
    blocker = tmp_path / "file"
    blocker.write_text("x", encoding="utf-8")
    code = ("import warnings, numpy as np, derive, sys; sys.path.insert(0, 'tests'); import fem_reference as ref\n"
            "with warnings.catch_warnings(record=True) as w:\n"
            "    warnings.simplefilter('always')\n"
            "    k = derive.kernel('Q4', lang='c')\n"
            "xy = np.array([[[0, 0], [2, 0], [2.2, 1], [0, 1.1]]], float)\n"
            "K = k(xy, 1.0, 0.3, 1.0)[0]\n"
            "Kr = ref.stiffness('Q4', xy[0], 1.0, 0.3, 1.0)\n"
            "np.testing.assert_allclose(K, Kr, rtol=1e-12, atol=1e-12)\n"
            "print(k.lang, any('cache' in str(x.message) for x in w))\n")
    env = dict(os.environ, DERIVE_CACHE_DIR=str(blocker / "sub"))
    res = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, timeout=300, env=env)
    assert res.returncode == 0, res.stderr
    assert res.stdout.split() == ["numpy", "True"]
