"""Benchmark size limits (a memory estimate before any work, a documented limit, an override),
progress of long runs, and where the membrane reference value comes from."""
from __future__ import annotations

import os
import resource
import subprocess
import sys
from pathlib import Path

import pytest

from derive import benchmarks as B
from derive.errors import InputError

ROOT = Path(__file__).resolve().parents[1]


def _derive(*args, memory_bytes=3_000_000_000):
    """Run the CLI in a child process with an address-space cap (a run that started the huge
    mesh would fail instead of taking the machine) and a generous hang guard."""
    def cap():
        resource.setrlimit(resource.RLIMIT_AS, (memory_bytes, memory_bytes))
    env = {**os.environ, "PYTHONPATH": str(ROOT)}
    return subprocess.run([sys.executable, "-m", "derive", *args], capture_output=True, text=True, cwd=ROOT,
                          env=env, preexec_fn=cap, timeout=60)


@pytest.mark.parametrize("args, gb", [(("membrane", "--mesh", "4096"), "268.6"), (("cylinder", "--mesh", "1024"), "16.9")])
def test_huge_meshes_are_refused_before_any_work(args, gb):
    p = _derive("bench", *args)
    err = p.stderr.strip().splitlines()
    # estimate: 150 MB + 250 B x elements x (2 x 4)^2 for Q4 (derive's own measurement, notes/verification.md)
    assert p.returncode == 2 and len(err) == 1, p.stderr
    assert f"about {gb} GB" in err[0] and "limit of 8 GB" in err[0] and "--memory-limit" in err[0]
    assert p.stdout == ""


def test_estimate_and_override():
    est = B.estimate("Q4", 4096 * 4096)
    # 16 777 216 elements x 64 entries x 250 B + 150 MB (the documented rule, common practice, no source)
    assert est["entries"] == 4096 * 4096 * 64 and est["bytes"] == 150e6 + 250.0 * 4096 * 4096 * 64
    with pytest.raises(InputError, match="limit of 8 GB"):
        B.membrane_study("Q4", "full", levels=(2, 4096))      # refused before the 2 x 2 run
    assert B.check_size("membrane", "Q4", 4096 * 4096, limit_gb=300)["elements"] == 4096 * 4096
    with pytest.raises(InputError, match="limit of 0.001 GB"):
        B.run_membrane("Q4", "full", 2, memory_limit=0.001)
    for bad in (0, -1, float("nan"), float("inf"), "x"):
        with pytest.raises(InputError, match="memory-limit"):
            B.check_memory_limit(bad)
    # triangles: two elements per cell
    assert B.estimate("T6", 2 * 100)["entries"] == 200 * 144
    with pytest.raises(InputError, match="T6"):
        B.cylinder_study("T6", "full", levels=(1024,), nus=(0.3,))


def test_cli_override_and_bad_limit():
    p = _derive("bench", "membrane", "--mesh", "4", "--memory-limit", "0")
    assert p.returncode == 2 and p.stderr.count("\n") == 1 and "--memory-limit" in p.stderr
    p = _derive("bench", "membrane", "--mesh", "4", "--memory-limit", "0.5", "--json")
    assert p.returncode == 0, p.stderr


def test_progress_names_the_stage_of_each_run(capsys):
    stages = []
    B.run_membrane("Q4", "full", 4, stage=stages.append)
    assert stages == ["assembly", "solve", "check"]
    B.membrane_study("Q4", "full", levels=(2, 4), show_progress=True)
    err = capsys.readouterr().err
    assert "4 x 4: assembly" in err and "4 x 4: solve" in err and "4 x 4: check" in err


def test_membrane_reference_says_where_it_comes_from():
    lines = "\n".join(B.membrane_study("Q4", "full", levels=(2, 4, 8))["lines"])
    assert "often-quoted" not in lines and "from memory): 23.96" not in lines
    assert "derive's own converged computation" in lines and "256 x 256" in lines and "Richardson" in lines
    assert "Cook, R. D. (1974)" in lines                       # the published source of the problem
