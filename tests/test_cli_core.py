"""CLI of the symbolic core: outputs parse back, bad input exits 2 with one line."""
import json
import subprocess
import sys

import pytest
import sympy as sp

from derive.cli import main
from derive.symbols import by_name


def run(args, capsys):
    code = main(args)
    out, err = capsys.readouterr()
    return code, out, err


def test_list_json(capsys):
    code, out, _ = run(["list", "--json"], capsys)
    data = json.loads(out)
    assert code == 0 and {e["name"] for e in data["elements"]} >= {"T3", "T6", "Q4", "Q8", "Q9"}
    assert "q8-serendipity.toml" in data["specs"]


def test_stiffness_json_parses_back(capsys):
    code, out, _ = run(["stiffness", "Q4", "--json"], capsys)
    data = json.loads(out)
    k00 = sp.parse_expr(data["entries"][0][0], local_dict=by_name())
    E, nu, t, a, b = (by_name()[k] for k in ("E", "nu", "t", "a", "b"))
    # K[0,0] of the 2a x 2b Q4 (standard result, Cook et al. 4th ed., from memory)
    assert sp.cancel(k00 - E * t / (1 - nu ** 2) * (b / (3 * a) + (1 - nu) * a / (6 * b))) == 0


def test_stiffness_numeric_set(capsys):
    code, out, _ = run(["stiffness", "T3", "--nodes", "0,0 2,0 0,1", "--set", "E=1,nu=1/4,t=1", "--json"], capsys)
    K = json.loads(out)["values"]
    # CST with b = (-1, 1, 0), c = (-2, 0, 2), A = 1: K[0,0] = t/(4A) E/(1-nu^2) (b1^2 + (1-nu)/2 c1^2)
    # = (1/4)(16/15)(1 + 0.375*4) = 2/3 (Cook et al. 4th ed., CST formula, from memory)
    assert K[0][0] == pytest.approx(2 / 3, rel=1e-14)


def test_shapes_spec_file(capsys):
    code, out, _ = run(["shapes", "q12-cubic-serendipity.toml", "--json"], capsys)
    assert code == 0 and json.loads(out)["checks"]["completeness"] == 3  # cubic serendipity (from memory)


@pytest.mark.parametrize("args,fragment", [
    (["stiffness", "Q5"], "unknown element"),
    (["stiffness", "Q4", "--variant", "nope"], "unknown variant"),
    (["stiffness", "Q4", "--state", "plane"], "unknown state"),
    (["stiffness", "Q4", "--set", "a=2,zz=1"], "unknown name 'zz'"),
    (["stiffness", "Q4", "--set", "a2"], "malformed"),
    (["stiffness", "Q4", "--set", "a=two"], "not a number"),
    (["stiffness", "Q4", "--state", "plane-strain", "--set", "nu=0.5"], "singular"),
    (["stiffness", "Q4", "--set", "E=0"], "E must be"),
    (["stiffness", "Q4", "--nodes", "0,0 0,1 2,1 2,0", "--set", "E=1,nu=0.3,t=1"], "clockwise"),
    (["stiffness", "T3", "--nodes", "0,0 1,1 2,2", "--set", "E=1,nu=0.3,t=1"], "zero area"),
    (["stiffness", "Q4", "--nodes", "0,0 2,0 0.4,0.4 0,2", "--set", "E=1,nu=0.3,t=1"], "changes sign"),
    (["stiffness", "Q4", "--rule", "gauss-99x2"], "rule"),
    (["shapes", "missing-file.toml"], "not found"),
])
def test_bad_input_exit_2_one_line(args, fragment, capsys):
    code, out, err = run(args, capsys)
    assert code == 2
    assert fragment in err
    assert len(err.strip().splitlines()) == 1 and "Traceback" not in err


def test_python_m_derive_runs():
    res = subprocess.run([sys.executable, "-m", "derive", "stiffness", "Q4", "--what", "D"], capture_output=True,
                         text=True, timeout=120)
    assert res.returncode == 0 and "D[0,0]" in res.stdout


def test_argparse_errors_are_one_line_exit_2(capsys):
    with pytest.raises(SystemExit) as exc:
        main(["stiffness", "Q4", "--geometry", "blob"])
    err = capsys.readouterr().err
    assert exc.value.code == 2 and "invalid choice: 'blob'" in err
    assert len(err.strip().splitlines()) == 1  # one line, no usage block (common practice)
