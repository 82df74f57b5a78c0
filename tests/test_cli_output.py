"""Output paths, strict JSON and stdout failures of the command line (one rule for every command).

The rule (derive/output.py): a file output needs an existing, writable folder, is never a
folder, and replaces an existing file only with --force; a folder output is created when its
parent exists and refuses a folder holding files derive did not write unless --force.  Every
refusal is one line on stderr with exit status 2, before any work, leaving nothing behind.
"""
import json
import os
import subprocess
import sys
from pathlib import Path

import numpy as np
import pytest

from derive import output
from derive.cli import main

ROOT = Path(__file__).resolve().parents[1]


def run(args, capsys):
    code = main(args)
    out, err = capsys.readouterr()
    return code, out, err


def strict_loads(text: str):
    """json.loads that refuses NaN / Infinity / -Infinity (as a browser's JSON.parse does)."""
    def refuse(name):
        raise ValueError(f"non-standard JSON constant {name}")
    return json.loads(text, parse_constant=refuse)


def _listing(folder: Path) -> list[str]:
    return sorted(p.relative_to(folder).as_posix() for p in folder.rglob("*"))


# --- one rule for every file output ------------------------------------------------------------

FILE_OUTPUTS = [
    (["chart", "locking", "-o"], "{}", "chart.png"),
    (["bench", "cantilever", "--mesh", "rectangular", "--plot"], "{}", "bench.png"),
    (["bench", "cantilever", "--mesh", "rectangular", "--table"], "{}", "bench.md"),
    (["bench", "cantilever", "--mesh", "rectangular", "--vtu"], "{}", "bench.vtu"),
    (["modes", "Q4", "--plot"], "{}", "modes.png"),
]


@pytest.mark.parametrize("cmd,_fmt,name", FILE_OUTPUTS)
@pytest.mark.parametrize("case", ["missing-parent", "parent-is-file", "is-folder", "exists", "read-only"])
def test_file_output_refused_with_one_line(cmd, _fmt, name, case, tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    if case == "missing-parent":
        target = f"no-such-folder/{name}"
        fragment = "folder no-such-folder does not exist"
    elif case == "parent-is-file":
        Path("plain").write_text("user data")
        target = f"plain/{name}"
        fragment = "plain is a file, not a folder"
    elif case == "is-folder":
        Path(name).mkdir()
        target = name
        fragment = "is a folder"
    elif case == "exists":
        Path(name).write_text("the user's own file")
        target = name
        fragment = "file exists; add --force"
    else:
        Path("ro").mkdir()
        target = f"ro/{name}"
        fragment = "not writable"
        real_access = os.access
        # the suite may run as root, which ignores permission bits: report the folder read-only
        monkeypatch.setattr(output.os, "access", lambda p, m: False if str(p) == "ro" else real_access(p, m))
    before = _listing(tmp_path)
    code, out, err = run(cmd + [target], capsys)
    assert code == 2, err
    assert fragment in err and err.count("\n") == 1 and "Traceback" not in err
    assert _listing(tmp_path) == before                       # nothing written, nothing created
    if case == "exists":
        assert Path(name).read_text() == "the user's own file"


def test_chart_force_replaces_and_missing_folder_is_not_created(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    Path("chart.png").write_text("old")
    code, _, err = run(["chart", "locking", "-o", "chart.png", "--force"], capsys)
    assert code == 0, err
    assert Path("chart.png").read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"   # PNG signature (PNG specification)
    code, _, err = run(["chart", "locking", "-o", "a/b/chart.png"], capsys)
    assert code == 2 and not Path("a").exists()


def test_write_atomic_leaves_nothing_on_failure(tmp_path, monkeypatch):
    target = tmp_path / "out.txt"
    target.write_text("previous")

    def failing_fdopen(fd, *a, **k):
        os.close(fd)
        raise OSError(28, "No space left on device")
    monkeypatch.setattr(output.os, "fdopen", failing_fdopen)
    with pytest.raises(output.OutputError, match="no space left on device"):
        output.write_atomic(target, "new contents")
    assert target.read_text() == "previous" and _listing(tmp_path) == ["out.txt"]


# --- folder outputs (demo -o) ------------------------------------------------------------------

def test_demo_output_is_a_file(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    Path("report").write_text("mine")
    code, _, err = run(["demo", "-o", "report"], capsys)
    assert code == 2 and "is a file; give a folder name" in err and err.count("\n") == 1
    assert Path("report").read_text() == "mine"


def test_demo_folder_with_users_files_needs_force(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    Path("mine").mkdir()
    (Path("mine") / "notes.txt").write_text("keep me")
    code, _, err = run(["demo", "-o", "mine"], capsys)
    assert code == 2 and "notes.txt" in err and "--force" in err
    assert _listing(tmp_path) == ["mine", "mine/notes.txt"]


def test_demo_missing_parent(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    code, _, err = run(["demo", "-o", "x/y"], capsys)
    assert code == 2 and "folder x does not exist" in err and not Path("x").exists()


def test_output_folder_manifest_and_force(tmp_path):
    folder = output.OutputFolder(tmp_path / "out")
    folder.write("a.txt", "1")
    folder.write("sub/b.txt", "2")
    # a second run in the same folder is allowed: the manifest lists derive's files
    again = output.OutputFolder(tmp_path / "out")
    again.write("a.txt", "3")
    (tmp_path / "out" / "user.txt").write_text("user")
    with pytest.raises(output.OutputError, match="user.txt"):
        output.OutputFolder(tmp_path / "out")
    forced = output.OutputFolder(tmp_path / "out", force=True)
    forced.write("a.txt", "4")
    assert (tmp_path / "out" / "user.txt").read_text() == "user"        # never deleted, never listed
    manifest = strict_loads((tmp_path / "out" / output.MANIFEST).read_text())
    assert manifest["files"] == ["a.txt", "sub/b.txt"]
    with pytest.raises(output.OutputError, match="not a file name inside"):
        forced.target("../escape.txt")


def test_output_folder_refuses_to_replace_a_users_file_by_name(tmp_path):
    folder = output.OutputFolder(tmp_path / "out")
    folder.write("a.txt", "derive")
    (tmp_path / "out" / "b.txt").write_text("user")     # the user adds a file after derive's run
    with pytest.raises(output.OutputError, match="b.txt exists and derive did not write it"):
        folder.write("b.txt", "derive")
    assert (tmp_path / "out" / "b.txt").read_text() == "user"


# --- stdout on a full device or a closed pipe ---------------------------------------------------

def _derive(args, **kw):
    env = {**os.environ, "PYTHONPATH": str(ROOT)}
    return subprocess.run([sys.executable, "-m", "derive", *args], env=env, timeout=120, **kw)


@pytest.mark.skipif(not os.path.exists("/dev/full"), reason="needs /dev/full (Linux)")
def test_stdout_on_a_full_device():
    with open("/dev/full", "w") as full:
        proc = _derive(["stiffness", "Q4"], stdout=full, stderr=subprocess.PIPE, text=True)
    assert proc.returncode == 2
    assert proc.stderr.strip().splitlines() == ["derive stiffness: error: cannot write to standard output: "
                                                "no space left on device"]


def test_stdout_closed_pipe():
    proc = subprocess.Popen([sys.executable, "-m", "derive", "stiffness", "Q8"], stdout=subprocess.PIPE,
                            stderr=subprocess.PIPE, env={**os.environ, "PYTHONPATH": str(ROOT)})
    proc.stdout.read(10)
    proc.stdout.close()                     # the reader goes away (as `| head -c 10` does)
    err = proc.stderr.read().decode()
    assert proc.wait(timeout=120) == 2
    assert "Traceback" not in err and len(err.strip().splitlines()) == 1 and "pipe was closed" in err


# --- strict JSON --------------------------------------------------------------------------------

def test_emit_json_has_no_nonfinite_numbers():
    text = output.emit_json({"limit": float("inf"), "low": -np.inf, "bad": np.float32("nan"),
                             "rows": [1.0, float("inf")], "ok": np.float64(2.5)})
    data = strict_loads(text)
    assert data["limit"] is None and data["limit_note"] == "infinite: unbounded"
    assert data["low"] is None and data["bad"] is None and data["bad_note"] == "not a number"
    assert data["rows"] == [1.0, None] and data["ok"] == 2.5


JSON_COMMANDS = [
    ["list", "--json"],
    ["shapes", "Q8", "--json"],
    ["stiffness", "T3", "--json"],
    ["stiffness", "Q4", "--set", "a=1,b=1,E=1,nu=0.3,t=1", "--json"],
    ["locking", "Q4", "--variant", "eas4", "--tolerance", "0.05", "--nu", "0,0.3", "--json"],
    ["locking", "Q4", "--tolerance", "0.05", "--nu", "0.3", "--json"],
    ["modes", "Q4", "--variant", "reduced", "--json"],
    ["patch", "Q4", "--json"],
    ["bench", "cantilever", "--mesh", "rectangular", "--load", "shear", "--json"],
    ["kernel", "Q4", "--lang", "numpy", "--json"],
]


@pytest.mark.parametrize("args", JSON_COMMANDS, ids=lambda a: " ".join(a[:2]))
def test_every_json_output_is_strict(args, capsys):
    code, out, err = run(args, capsys)
    assert code in (0, 1), err
    assert "Infinity" not in out and "NaN" not in out
    strict_loads(out)


def test_locking_limits_json_says_why_null(capsys):
    code, out, _ = run(["locking", "Q4", "--variant", "eas4", "--tolerance", "0.05", "--nu", "0.3", "--json"], capsys)
    lim = strict_loads(out)["tolerance"]["limits"][0]
    # eas4 passes pure bending exactly (Simo & Rifai 1990, from memory): no aspect limit
    assert lim["aspect_limit"] is None and lim["aspect_limit_note"].startswith("infinite")


def test_chart_json_and_written_locking_table_are_strict(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    code, out, err = run(["chart", "locking", "--elements", "Q4:eas4", "-o", "c.svg", "--json"], capsys)
    assert code == 0, err
    strict_loads(out)
    from derive.locking import aspect_limit
    table = [{"limit_5pct": aspect_limit("Q4", "eas4", "plane-stress", 0.2, 0.05)}]
    data = strict_loads(output.emit_json(table))          # the demo's locking-table.json is written this way
    assert data[0]["limit_5pct"]["aspect_limit"] is None


# --- headers describe the matrix shown --------------------------------------------------------

def test_B_header_is_not_called_symmetric(capsys):
    code, out, _ = run(["stiffness", "T6", "--what", "B"], capsys)
    head = [line for line in out.splitlines() if line.startswith("#")]
    entries = [line for line in out.splitlines() if line.startswith("B[")]
    assert code == 0 and "upper triangle" not in out and "every entry shown" in out
    assert any("3 x 12" in line for line in head) and len(entries) == 3 * 12   # T6: 6 nodes x 2 DOFs
    assert "right triangle with legs 2a along x and 2b along y" in head[0]      # not "geometry rectangle"


def test_D_header_has_no_dof_note(capsys):
    code, out, _ = run(["stiffness", "Q4", "--what", "D"], capsys)
    assert code == 0 and "DOFs" not in out and "constitutive" in out and "upper triangle shown" in out
    code, out, _ = run(["stiffness", "Q4", "--what", "D", "--json"], capsys)
    assert "dof_order" not in strict_loads(out)


def test_caution_in_stiffness_and_shapes_text(capsys):
    for args in (["stiffness", "Q4"], ["stiffness", "T3", "--nodes", "0,0 2,0 0,1", "--set", "E=1,nu=0.25,t=1"],
                 ["shapes", "Q4"], ["shapes", "Q4", "--format", "latex"], ["stiffness", "Q4", "--format", "latex"]):
        code, out, _ = run(args, capsys)
        assert code == 0 and output.CAUTION in out, args


# --- locking text -------------------------------------------------------------------------------

def test_locking_method_sentence_is_complete_and_parts_are_named(capsys):
    code, out, _ = run(["locking", "T3", "--json"], capsys)
    src = strict_loads(out)["source"]
    assert src.endswith(")") and "continuum's strain energy under the same load" in src
    code, out, _ = run(["locking", "T3"], capsys)
    assert code == 0 and " | " not in out
    assert "lower-right triangle" in out and "upper-left triangle" in out


# --- help -----------------------------------------------------------------------------------------

@pytest.mark.parametrize("cmd", ["locking", "modes", "patch", "bench"])
def test_element_help_mentions_spec_files(cmd, capsys):
    with pytest.raises(SystemExit):
        main([cmd, "--help"] if cmd != "bench" else ["bench", "--help"])
    assert ".toml" in capsys.readouterr().out


@pytest.mark.parametrize("cmd", ["list", "locking", "chart", "modes", "patch", "bench", "perf", "demo", "shapes",
                                 "stiffness", "samples", "check", "kernel"])
def test_json_help_and_examples(cmd, capsys):
    with pytest.raises(SystemExit):
        main([cmd, "--help"])
    text = capsys.readouterr().out
    assert "alias of" not in text
    if "--format" not in text:
        assert "same as --format" not in text
    assert "example" in text and f"derive {cmd}" in text.split("example", 1)[1]


def test_nu_range_help_counts_values():
    from derive.commands.locking_cmd import parse_nus
    assert len(parse_nus("0:0.45")) == 11          # 10 steps, both ends: 11 values (common practice)


def test_nu_range_help_text(capsys):
    with pytest.raises(SystemExit):
        main(["locking", "--help"])
    assert "11 values" in " ".join(capsys.readouterr().out.split())


# --- --digits -----------------------------------------------------------------------------------

def test_digits_option(capsys):
    args = ["stiffness", "Q4", "--set", "a=1,b=1,E=1,nu=0.3,t=1"]
    code, out, _ = run(args + ["--digits", "3"], capsys)
    # K[0,0] of the unit square Q4, E = 1, nu = 0.3: (1/(1 - nu^2)) (1/3 + (1 - nu)/6) = 0.4945054945...
    # (Cook et al. 4th ed. closed form, from memory)
    assert code == 0 and "[[0.495," in out.replace(" ", "")
    code, out, _ = run(args + ["--digits", "12"], capsys)
    assert "0.494505494505" in out
    code, _, err = run(args + ["--digits", "0"], capsys)
    assert code == 2 and "--digits" in err
    code, out, _ = run(["locking", "Q4", "--aspect", "2", "--nu", "0.3", "--digits", "3"], capsys)
    # Q4 ratio (1 - nu^2)/(1 + (1 - nu) r^2/2) at r = 2, nu = 0.3: 0.91/2.4 = 0.379166... (Cook et al., from memory)
    assert "nu = 0.3: 0.379\n" in out


# --- symbolic readability -------------------------------------------------------------------------

def test_natural_sign_and_common_factor_parse_back(capsys):
    import sympy as sp
    from derive.symbols import by_name
    import derive
    K = derive.element("Q4").stiffness("rectangle")
    code, out, _ = run(["stiffness", "Q4"], capsys)
    assert "# common factor: K = E*t/(24*a*b*(1 - nu**2))" in out
    assert "nu - 1" not in out and "(nu - 1)*(nu + 1)" not in out
    for line in out.splitlines():
        if line.startswith("K["):
            lhs, rhs = line.split(" = ", 1)
            i, j = (int(v) for v in lhs[2:-1].split(","))
            # each printed entry is the derived entry (reference library: sympy)
            assert sp.cancel(sp.parse_expr(rhs, local_dict=by_name()) - K[i, j]) == 0, line
    assert str(output.display(derive.locking_ratio("Q4", "full", "plane-stress"))).startswith("2*(1 - nu**2)/")


def test_large_latex_matrix_is_a_list_a_document_can_include(capsys):
    code, out, _ = run(["stiffness", "Q8", "--format", "latex"], capsys)
    lines = out.splitlines()
    assert code == 0 and lines[0].startswith("% K of Q8") and "\\begin{align*}" in lines
    entries = [line for line in lines if line.startswith("K_{")]
    assert len(entries) == 16 * 17 // 2 and all("&=" in line for line in entries)  # upper triangle of 16 x 16
    code, out, _ = run(["stiffness", "Q4", "--format", "latex"], capsys)
    assert "K = \\frac{E t}{24 a b \\left(1 - \\nu^{2}\\right)} \\begin{bmatrix}" in out


# --- progress -------------------------------------------------------------------------------------

def test_progress_quiet_when_not_a_terminal_and_shown_on_one(capsys):
    import time
    with output.working("long job"):             # pytest's stderr is not a terminal
        time.sleep(0.05)
    assert capsys.readouterr().err == ""
    with output.working("long job", enabled=False, after=0):
        time.sleep(0.05)
    assert capsys.readouterr().err == ""
    with output.working("long job", enabled=True, after=0):
        time.sleep(1.5)                           # generous: the first tick is immediate
    err = capsys.readouterr().err
    assert "long job ... " in err and err.endswith("\r")    # the line is erased at the end


def test_demo_json_is_quiet_on_stderr_refusal(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    Path("taken").mkdir()
    (Path("taken") / "x").write_text("")
    code, out, err = run(["demo", "-o", "taken", "--json"], capsys)
    assert code == 2 and out == "" and err.count("\n") == 1


# --- samples --------------------------------------------------------------------------------------

def test_samples_are_copied_and_never_overwritten_without_force(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    code, out, _ = run(["samples"], capsys)
    assert code == 0 and sorted(p.name for p in tmp_path.iterdir()) == ["my-k.txt", "solver-k.csv"]
    Path("my-k.txt").write_text("mine")
    code, _, err = run(["samples"], capsys)
    assert code == 2 and "file exists" in err and Path("my-k.txt").read_text() == "mine"
    code, _, _ = run(["samples", "--force"], capsys)
    assert code == 0 and Path("my-k.txt").read_text().startswith("# My hand derivation")
    code, _, err = run(["samples", "-o", "nowhere"], capsys)
    assert code == 2 and "does not exist" in err


def test_digits_reach_the_library_reports(capsys):
    code, out, _ = run(["patch", "Q4", "--digits", "3"], capsys)
    # the published patch stresses sigma_x = sigma_y = 1333.33, tau_xy = 400 (MacNeal & Harder 1985, from memory)
    assert code == 0 and "sigma_x 1.33e+03" in out and "tau_xy 400)" in out
    code, out, _ = run(["patch", "Q4"], capsys)
    assert "sigma_x 1333.33" in out                     # without --digits each report keeps its own format
    code, out, _ = run(["modes", "Q4", "--variant", "reduced", "--digits", "2"], capsys)
    assert code == 0 and ", 1\n" in out                  # the largest eigenvalue over itself: 1
    code, _, err = run(["bench", "cantilever", "--digits", "99"], capsys)
    assert code == 2 and "--digits" in err


def test_rule_is_refused_where_it_cannot_apply(capsys):
    for what in ("B", "D"):
        code, out, err = run(["stiffness", "Q4", "--what", what, "--rule", "gauss-1x1"], capsys)
        assert code == 2 and out == "" and "--rule applies to K only" in err


def test_demo_matrix_files_say_what_they_hold_and_parse_back(tmp_path, capsys):
    from derive.demo import core_section
    core_section(tmp_path)
    for name, element in (("q4-rectangle-stiffness.txt", "Q4"), ("q4-rectangle-stiffness.tex", "Q4"),
                          ("q8-rectangle-stiffness.txt", "Q8")):
        text = (tmp_path / name).read_text()
        assert text.startswith(("# K of " + element, "% K of " + element)) and output.CAUTION in text
        assert main(["check", str(tmp_path / name), "--element", element]) == 0, name   # derive's own output
    capsys.readouterr()


def test_samples_and_check_json_are_strict(tmp_path, monkeypatch, capsys):
    monkeypatch.chdir(tmp_path)
    code, out, _ = run(["samples", "--json"], capsys)
    assert code == 0 and len(strict_loads(out)["files"]) == 2
    code, out, _ = run(["check", "solver-k.csv", "--element", "Q4", "--nodes", "0,0 2,0 2.5,1 0,1.5",
                        "--set", "E=210e9,nu=0.3,t=0.01", "--json"], capsys)
    assert code == 0 and strict_loads(out)["match"] is True
    code, out, _ = run(["check", "my-k.txt", "--element", "Q4", "--json"], capsys)
    assert code == 1 and strict_loads(out)["match"] is False
