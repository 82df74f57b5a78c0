"""Each mistake `derive check` diagnoses, built independently of derive and of the checker.

The users' matrices come from tests/fem_reference.py and tests/test_kernels_ref.py (numpy
only, written from the textbook definitions) with one mistake made the way a user's own code
makes it (a D with the tensor shear term, t left out, nodes listed clockwise with det J kept
signed, ...), or are typed as text from the textbook formulas.  None of them uses the
checker's own mistake generators, so a wrong generator fails here.
"""
from __future__ import annotations

import json
import re

import numpy as np
import pytest
import sympy as sp

import fem_reference as ref
import test_kernels_ref as vref
from derive.check import CODES, Target, check
from derive.cli import main
from derive.element import element
from derive.output import CAUTION

E_, NU_, T_ = 1000.0, 0.25, 0.1
MAT = {"E": sp.Integer(1000), "nu": sp.Rational(1, 4), "t": sp.Rational(1, 10)}
NODES = {  # counter-clockwise, distorted (exact rationals for derive, floats for the references)
    "Q4": [(0, 0), (2, 0), (sp.Rational(5, 2), 1), (0, sp.Rational(3, 2))],
    "T3": [(0, 0), (2, sp.Rational(1, 4)), (sp.Rational(1, 2), sp.Rational(3, 2))],
}


def xy_of(name):
    return np.array([[float(x), float(y)] for x, y in NODES[name]])


def ref_k(name, xy, D, t=T_, full=True):
    """K = sum_g w_g B^T D B det J t with the given D (signed det J, as a user's code has it)."""
    n = xy.shape[0]
    K = np.zeros((2 * n, 2 * n))
    for (s, q), w in zip(*ref.rule(name, full)):
        N, ds, dt = ref.shape(name, s, q)
        J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
        dxy = np.linalg.solve(J, np.vstack([ds, dt]))
        B = np.zeros((3, 2 * n))
        B[0, 0::2] = dxy[0]; B[1, 1::2] = dxy[1]; B[2, 0::2] = dxy[1]; B[2, 1::2] = dxy[0]
        K += w * np.linalg.det(J) * t * B.T @ D @ B
    return K


def D_stress(shear_factor=1.0):
    """Plane-stress D (Timoshenko & Goodier, from memory) with the shear entry scaled."""
    D = ref.D_matrix("plane-stress", E_, NU_).copy()
    D[2, 2] *= shear_factor
    return D


def nodes_permuted(xy, order):
    return xy[list(order)]


def mistake(name, code):
    """(user's K, expected extra fields) for one mistake, built from the references only."""
    xy = xy_of(name)
    good = ref_k(name, xy, D_stress())
    n = xy.shape[0]
    if code == "node-order":  # the user's node 1 is derive's node 2: the list starts one node later
        order = list(range(1, n)) + [0]
        return ref_k(name, nodes_permuted(xy, order), D_stress()), {"permutation": [o + 1 for o in order]}
    if code == "clockwise":  # same first node, opposite orientation, signed det J < 0
        order = [0] + list(range(n - 1, 0, -1))
        return ref_k(name, nodes_permuted(xy, order), D_stress()), {"permutation": [o + 1 for o in order]}
    if code == "thickness":
        return ref_k(name, xy, D_stress(), t=1.0), {}
    if code == "shear-convention":  # tensor shear strain eps_xy: the shear part of D over 4
        return ref_k(name, xy, D_stress(0.25)), {}
    if code == "plane-state":
        return ref_k(name, xy, ref.D_matrix("plane-strain", E_, NU_)), {}
    if code == "sign":
        return -good, {}
    if code == "scale":
        return 1.5 * good, {"factor": "3/2"}
    if code == "quadrature":  # 1 x 1 Gauss point for the bilinear quadrilateral
        return ref_k(name, xy, D_stress(), full=False), {}
    if code == "dof-order":  # u1..un, v1..vn
        blocked = list(range(0, 2 * n, 2)) + list(range(1, 2 * n, 2))
        return good[np.ix_(blocked, blocked)], {}
    raise KeyError(code)


K_CODES = ["node-order", "clockwise", "thickness", "shear-convention", "plane-state", "sign", "scale",
           "quadrature", "dof-order"]
CASES = [("Q4", c) for c in K_CODES] + [("T3", c) for c in K_CODES if c != "quadrature"]


def test_every_code_has_an_independent_case_here():
    covered = set(K_CODES) | {"transposed"}  # transposed: B and N below (K is symmetric)
    assert covered == set(CODES)  # common practice, no source


@pytest.mark.parametrize("name,code", CASES)
def test_independent_mistake_is_diagnosed(name, code):
    G, extra = mistake(name, code)
    target = Target(element(name), NODES[name], dict(MAT))
    res = check(target, given_numeric=G)
    assert res.match is False
    assert res.codes == [code], res.diagnosis  # the one mistake made, nothing else (common practice, no source)
    for key, value in extra.items():
        assert res.diagnosis[0][key] == value
    if code == "quadrature":
        assert "gauss-1x1" in res.diagnosis[0]["explanation"]


@pytest.mark.parametrize("name", ["Q4", "T3"])
def test_reference_without_mistake_matches(name):
    # the textbook routine itself (Cook et al. 4th ed., from memory) agrees with derive
    target = Target(element(name), NODES[name], dict(MAT))
    assert check(target, given_numeric=ref_k(name, xy_of(name), D_stress())).match is True


@pytest.mark.parametrize("factor,why", [(2.0, "(1 - nu) written for (1 - nu)/2"),
                                        (0.5, "tensor shear strain and (1 - nu)")])
def test_other_shear_conventions(factor, why):
    target = Target(element("Q4"), NODES["Q4"], dict(MAT))
    res = check(target, given_numeric=ref_k("Q4", xy_of("Q4"), D_stress(factor)))
    assert res.codes == ["shear-convention"] and why in res.diagnosis[0]["explanation"]  # common practice


# --- B and N typed as text from the textbook formulas (Q4 on the 2a x 2b rectangle) ----------
# N_i = (1 + xi xi_i)(1 + eta eta_i)/4, x = a xi, y = b eta, corners counter-clockwise from
# (-1, -1) (Zienkiewicz & Taylor, from memory); B rows [du/dx, dv/dy, du/dy + dv/dx].
CORNERS = [(-1, -1), (1, -1), (1, 1), (-1, 1)]


def _dx(xi_i, eta_i):
    return f"({xi_i})*(1+({eta_i})*eta)/(4*a)"


def _dy(xi_i, eta_i):
    return f"({eta_i})*(1+({xi_i})*xi)/(4*b)"


def b_rows():
    r1, r2, r3 = [], [], []
    for xi_i, eta_i in CORNERS:
        r1 += [_dx(xi_i, eta_i), "0"]
        r2 += ["0", _dy(xi_i, eta_i)]
        r3 += [_dy(xi_i, eta_i), _dx(xi_i, eta_i)]
    return [r1, r2, r3]


def as_text(rows):
    return "\n".join(", ".join(r) for r in rows) + "\n"


def run_json(tmp_path, capsys, text, *args):
    p = tmp_path / "m.txt"
    p.write_text(text)
    code = main(["check", str(p), *args, "--json"])
    out, err = capsys.readouterr()
    return code, json.loads(out) if out.strip() else None, err


def test_textbook_b_matches(tmp_path, capsys):
    code, data, err = run_json(tmp_path, capsys, as_text(b_rows()), "--element", "Q4", "--what", "B")
    assert code == 0 and data["match"] is True, err  # textbook Q4 B, from memory


def test_transposed_b_reports_the_shapes_and_the_diagnosis_only(tmp_path, capsys):
    rows = b_rows()
    transposed = [[rows[r][c] for r in range(3)] for c in range(8)]
    p = tmp_path / "bt.txt"
    p.write_text(as_text(transposed))
    assert main(["check", str(p), "--element", "Q4", "--what", "B"]) == 1
    out = capsys.readouterr().out
    assert "your matrix is 8 x 3; derive's B is 3 x 8" in out  # common practice, no source
    assert "transposed: your matrix is derive's transposed" in out
    assert "entries differ" not in out and "mismatched entries" not in out
    code, data, _ = run_json(tmp_path, capsys, as_text(transposed), "--element", "Q4", "--what", "B")
    assert code == 1 and data["diagnosis"] == ["transposed"] and data["mismatched"] == []
    assert data["shape"] == {"given": [8, 3], "expected": [3, 8]}


def test_shape_functions_typed_in_another_order_and_in_order(tmp_path, capsys):
    N = [f"(1+({p})*xi)*(1+({q})*eta)/4" for p, q in CORNERS]
    code, data, err = run_json(tmp_path, capsys, ", ".join(N) + "\n", "--element", "Q4", "--what", "shape")
    assert code == 0 and data["match"] is True, err  # textbook bilinear N, from memory
    swapped = [N[0], N[1], N[3], N[2]]  # a Z-numbering of the corners
    code, data, err = run_json(tmp_path, capsys, ", ".join(swapped) + "\n", "--element", "Q4", "--what", "shape")
    assert code == 1 and data["diagnosis"] == ["node-order"]
    assert data["explanations"][0]["permutation"] == [1, 2, 4, 3]  # common practice, no source


# --- text output: one number format, difference, relative difference, caution ---------------

FLOAT = r"-?\d(?:\.\d+)?(?:e[+-]\d+)?|-?\d+(?:\.\d+)?"


def _numeric_file(tmp_path, K):
    p = tmp_path / "k.csv"
    np.savetxt(p, K, delimiter=",", fmt="%.17g")
    return str(p)


def _nodes_arg(name):
    return " ".join(f"{float(x)},{float(y)}" for x, y in NODES[name])


def test_numeric_mismatch_prints_both_values_alike_with_difference(tmp_path, capsys):
    K = ref_k("Q4", xy_of("Q4"), D_stress())
    G = K.copy()
    G[0, 0] *= 1 + 1e-3
    path = _numeric_file(tmp_path, G)
    assert main(["check", path, "--element", "Q4", "--nodes", _nodes_arg("Q4"), "--set", "E=1000,nu=0.25,t=0.1"]) == 1
    out = capsys.readouterr().out
    m = re.search(rf"\[0,0\]  expected ({FLOAT})   given ({FLOAT})   difference ({FLOAT})   relative ({FLOAT})", out)
    assert m, out
    e, g, d, r = (float(v) for v in m.groups())
    # expected from the textbook routine, the user's value as written (numpy reference, 12 digits shown)
    np.testing.assert_allclose([e, g], [K[0, 0], G[0, 0]], rtol=1e-11, atol=0)
    np.testing.assert_allclose(d, G[0, 0] - K[0, 0], rtol=1e-2, atol=0)
    np.testing.assert_allclose(r, 1e-3, rtol=1e-2, atol=0)
    assert len(m.group(1).replace("-", "").replace(".", "")) <= 12 + 4  # same %g form for both
    assert CAUTION in out


def test_symbolic_mismatch_prints_both_alike_with_difference(tmp_path, capsys):
    # K[1,1] of the Q4 rectangle with b/(3a) written as b/(2a) (Cook et al. 4th ed., from memory)
    text = "K[1,1] = E*t/(1-nu^2)*(b/(2*a) + (1-nu)*a/(6*b))\n"
    p = tmp_path / "k.txt"
    p.write_text(text)
    assert main(["check", str(p), "--element", "Q4"]) == 1
    out = capsys.readouterr().out
    line = next(ln for ln in out.splitlines() if ln.startswith("  [0,0]"))
    assert "difference" in line and "relative" in line
    code, data, _ = run_json(tmp_path, capsys, text, "--element", "Q4")
    row = data["entries"][0]
    a, b, E, nu, t = sp.symbols("a b E nu t")
    diff = sp.sympify(row["difference"], locals={"E": E})  # derive's own output read back (sympy, reference library)
    assert sp.cancel(diff - E * t * b / (6 * a * (1 - nu ** 2))) == 0  # b/(2a) - b/(3a) = b/(6a)
    assert row["relative_difference"] > 0


def test_caution_also_on_a_match(tmp_path, capsys):
    K = ref_k("Q4", xy_of("Q4"), D_stress())
    assert main(["check", _numeric_file(tmp_path, K), "--element", "Q4", "--nodes", _nodes_arg("Q4"),
                 "--set", "E=1000,nu=0.25,t=0.1"]) == 0
    out = capsys.readouterr().out
    assert "MATCH" in out and CAUTION in out  # common practice, no source


def test_clockwise_through_the_command(tmp_path, capsys):
    G, extra = mistake("Q4", "clockwise")
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, G)).read(), "--element", "Q4",
                               "--nodes", _nodes_arg("Q4"), "--set", "E=1000,nu=0.25,t=0.1")
    assert code == 1 and data["diagnosis"] == ["clockwise"], err
    assert "negative det J" in data["explanations"][0]["explanation"]  # common practice, no source


# --- options: --tolerance, --geometry, --state axisymmetric, variants ----------------------------

def test_tolerance_decides(tmp_path, capsys):
    K = ref_k("Q4", xy_of("Q4"), D_stress())
    G = K.copy()
    G[2, 3] += 1e-6 * np.linalg.norm(K)
    G[3, 2] = G[2, 3]
    path = _numeric_file(tmp_path, G)
    base = ["check", path, "--element", "Q4", "--nodes", _nodes_arg("Q4"), "--set", "E=1000,nu=0.25,t=0.1"]
    assert main(base) == 1  # 1e-6 ||K|| off: beyond the default 1e-8 (common practice, no source)
    assert main(base + ["--tolerance", "1e-5"]) == 0
    capsys.readouterr()


def test_parallelogram_geometry_numeric(tmp_path, capsys):
    # x = a X + c Y, y = b Y on the corners X, Y = +-1 (derive's documented parallelogram)
    a, b, c = 2.0, 1.0, 0.5
    xy = np.array([[a * X + c * Y, b * Y] for X, Y in CORNERS])
    K = ref.stiffness("Q4", xy, E_, NU_, T_)
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, K)).read(), "--element", "Q4",
                               "--geometry", "parallelogram", "--set", "E=1000,nu=0.25,t=0.1,a=2,b=1,c=0.5")
    assert code == 0 and data["match"] is True, err  # textbook Q4 quadrature (numpy leggauss)


def test_general_geometry_cst_entry(tmp_path, capsys):
    # CST: K11 = t (D11 b1^2 + D33 c1^2) / (4 A), b1 = y2 - y3, c1 = x3 - x2, 2A = the cross product
    # (Cook et al. 4th ed., from memory)
    text = ("K[1,1] = E*t/(1-nu^2)*((y2-y3)^2 + (1-nu)/2*(x3-x2)^2)"
            " / (2*((x2-x1)*(y3-y1) - (x3-x1)*(y2-y1)))\n")
    code, data, err = run_json(tmp_path, capsys, text, "--element", "T3", "--geometry", "general")
    assert code == 0 and data["match"] is True, err
    wrong = text.replace("(1-nu)/2", "(1-nu)")
    code, data, err = run_json(tmp_path, capsys, wrong, "--element", "T3", "--geometry", "general")
    assert code == 1 and data["diagnosis"] == ["shear-convention"], err


def test_axisymmetric_numeric(tmp_path, capsys):
    xy = np.array([[1.0, 0.0], [2.0, 0.0], [2.5, 1.0], [1.0, 1.5]])
    K = ref.stiffness("Q4", xy, E_, NU_, T_, state="axisymmetric")  # t -> 2 pi r, 2 x 2 Gauss
    nodes = " ".join(f"{x},{y}" for x, y in xy)
    args = ["--element", "Q4", "--state", "axisymmetric", "--nodes", nodes, "--set", "E=1000,nu=0.25,t=0.1"]
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, K)).read(), *args)
    assert code == 0 and data["match"] is True, err  # textbook axisymmetric Q4 (Zienkiewicz & Taylor, from memory)
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, 2 * K)).read(), *args)
    assert code == 1 and data["diagnosis"] == ["scale"], err


@pytest.mark.parametrize("variant", ["incompatible", "incompatible-centred", "eas4", "hybrid5", "selective", "bbar"])
def test_variants_against_their_published_methods(tmp_path, capsys, variant):
    X = xy_of("Q4")[None]
    K = vref.stiffness("Q4", variant, "plane-stress", X, E_, NU_, T_)[0]  # numpy, from the published method
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, K)).read(), "--element", "Q4",
                               "--variant", variant, "--nodes", _nodes_arg("Q4"), "--set", "E=1000,nu=0.25,t=0.1")
    assert code == 0 and data["match"] is True, err
    code, data, err = run_json(tmp_path, capsys, open(_numeric_file(tmp_path, -K)).read(), "--element", "Q4",
                               "--variant", variant, "--nodes", _nodes_arg("Q4"), "--set", "E=1000,nu=0.25,t=0.1")
    assert code == 1 and data["diagnosis"] == ["sign"], err
