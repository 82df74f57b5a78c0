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
