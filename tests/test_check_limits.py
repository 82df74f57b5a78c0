"""`derive check` on short inputs that would expand to huge expressions, and the hard limits.

Each command runs in a subprocess under a hang guard (60 s) and an address-space cap, so a
regression shows as a failed test, never as a hung or swapped-out machine.  No speed is
asserted here; only that the command ends with the right verdict and exit status.
"""
from __future__ import annotations

import json
import os
import resource
import subprocess
import sys
import time
from pathlib import Path

import pytest

from derive.bounded import Limits, run_bounded
from derive.check_equality import MAX_DEGREE
from derive.errors import InputError

ROOT = Path(__file__).resolve().parents[1]
HANG_GUARD = 60          # seconds: only a hang reaches this (common practice, no source)
MEMORY_CAP = 3 << 30     # bytes of address space for the whole command (common practice, no source)
TEN = "(a+b+c+E+nu+t+x+y+z+r)"
SIX = "(a+b+c+E+nu+t)"


def _cap_memory():
    resource.setrlimit(resource.RLIMIT_AS, (MEMORY_CAP, MEMORY_CAP))


def derive_cli(*args):
    """(exit status, stdout, stderr) of `python -m derive ...` under the hang guard and memory cap."""
    env = dict(os.environ, PYTHONPATH=str(ROOT))
    proc = subprocess.run([sys.executable, "-m", "derive", *args], capture_output=True, text=True,
                          timeout=HANG_GUARD, preexec_fn=_cap_memory, cwd=ROOT, env=env)
    return proc.returncode, proc.stdout, proc.stderr


def _file(tmp_path, name, text):
    p = tmp_path / name
    p.write_text(text)
    return str(p)


BLOW_UPS = {
    # the inputs of the report: each hung in sp.cancel (3.5 GB in 110 s for the first)
    "ten-symbols-64": ("K[1,1] = " + TEN + "^64\n", "stiffness"),
    "six-symbols-20": ("K[1,1] = " + SIX + "^20\n", "stiffness"),
    "64-entries-12": ("".join(f"K[{i // 8 + 1},{i % 8 + 1}] = (a+b+E+nu+t)^12\n" for i in range(64)), "stiffness"),
    "40-rational-factors": ("K[1,1] = " + "*".join(f"(a+{k})/(b+{k + 1})" for k in range(40)) + "\n", "stiffness"),
    "B-ten-symbols-64": ("B[1,1] = " + TEN + "^64\n", "B"),
}


@pytest.mark.parametrize("case", sorted(BLOW_UPS))
def test_short_inputs_that_expand_hugely_end_with_a_verdict(tmp_path, case):
    text, what = BLOW_UPS[case]
    code, out, err = derive_cli("check", _file(tmp_path, "k.txt", text), "--element", "Q4", "--what", what, "--json")
    assert code == 1, err  # none equals a Q4 entry: evaluation at an exact point shows it (common practice, no source)
    data = json.loads(out)
    assert data["match"] is False and data["counterexample"] is not None
    assert data["diagnosis"] == []  # no single textbook mistake explains it (common practice, no source)


def test_a_large_entry_equal_to_derives_is_accepted_at_the_points(tmp_path):
    # K[1,2] of the Q4 rectangle is E t / (8 (1 - nu)) (Cook et al. 4th ed., from memory); the added
    # terms cancel mathematically (s^20 - s^19 a - s^19 (b+c+E+nu+t) = 0) but expand to 10^5 terms
    text = f"K[1,2] = E*t/(8*(1-nu)) + {SIX}^20 - {SIX}^19*a - {SIX}^19*(b+c+E+nu+t)\n"
    code, out, err = derive_cli("check", _file(tmp_path, "k.txt", text), "--element", "Q4", "--json")
    assert code == 0, err
    data = json.loads(out)
    assert data["match"] is True and "random rational points for 1" in data["method"]


def test_values_beyond_the_float_range_are_reported_not_crashed(tmp_path):
    text = "K[1,1] = ((a+b+c+E)^64+1)^14\n"  # degree 896: about 1e1400 at the sample point
    code, out, err = derive_cli("check", _file(tmp_path, "k.txt", text), "--element", "Q4", "--json")
    assert code == 1, err
    data = json.loads(out, parse_constant=lambda c: pytest.fail(f"non-JSON constant {c}"))  # strict JSON
    row = data["entries"][0]
    assert row["relative_difference"] is None and "e+14" in row["at_point"]["given"]  # common practice, no source


def test_an_entry_of_absurd_degree_is_refused(tmp_path):
    text = "K[1,1] = (((a+1)^64+1)^64+1)^2\n"  # degree 8192
    code, out, err = derive_cli("check", _file(tmp_path, "k.txt", text), "--element", "Q4")
    assert code == 2 and out == ""
    assert len(err.strip().splitlines()) == 1 and f"limit {MAX_DEGREE}" in err  # common practice, no source


def test_cpu_time_limit_is_enforced_with_a_one_line_error(tmp_path):
    code, printed, err = derive_cli("stiffness", "Q9")
    assert code == 0, err
    path = _file(tmp_path, "k9.txt", printed)
    code, out, err = derive_cli("check", path, "--element", "Q9", "--time-limit", "0.05")
    assert code == 2 and out == ""  # 171 entries cannot be compared in 0.05 s of CPU (common practice, no source)
    assert len(err.strip().splitlines()) == 1 and "took more than 0.05 s" in err and "--time-limit" in err
    code, out, err = derive_cli("check", path, "--element", "Q9", "--time-limit", "120")
    assert code == 0 and "MATCH" in out, err  # derive's printed matrix parses back (common practice)


@pytest.mark.parametrize("option,value", [("--time-limit", "0"), ("--time-limit", "nan"), ("--memory-limit", "1"),
                                          ("--tolerance", "0"), ("--tolerance", "2")])
def test_limit_options_are_bounded(tmp_path, option, value):
    code, out, err = derive_cli("check", _file(tmp_path, "k.txt", "K[1,1] = a\n"), "--element", "Q4", option, value)
    assert code == 2 and option in err and len(err.strip().splitlines()) == 1  # common practice, no source


# --- the bounded runner itself -----------------------------------------------------------------

def _allocate():
    return len(bytearray(4 << 30))


def _spin():
    while True:
        pass


def _refuse():
    raise InputError("refused inside")


def test_runner_memory_limit():
    with pytest.raises(InputError, match="needed more than 64 MB"):
        run_bounded(_allocate, Limits(seconds=30, memory=64 << 20, what="allocating"))


def test_runner_cpu_limit():
    with pytest.raises(InputError, match="took more than 0.2 s"):
        run_bounded(_spin, Limits(seconds=0.2, what="spinning"))


def test_runner_wall_clock_limit():
    start = time.monotonic()
    with pytest.raises(InputError, match="wall clock"):
        run_bounded(lambda: time.sleep(HANG_GUARD), Limits(seconds=0.1, what="sleeping"))
    assert time.monotonic() - start < HANG_GUARD  # the child was stopped (hang guard, common practice)


def test_runner_passes_results_and_input_errors_through():
    value, used = run_bounded(lambda: {"x": [1, 2]}, Limits())
    assert value == {"x": [1, 2]} and used >= 0
    with pytest.raises(InputError, match="refused inside"):
        run_bounded(_refuse, Limits())
    with pytest.raises(RuntimeError, match="ZeroDivisionError"):
        run_bounded(lambda: 1 / 0, Limits())
