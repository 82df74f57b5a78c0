"""Every line of the README's tour runs as written in an empty folder, with the exit status the
README documents (0, or 1 where its comment says "exit 1"); the README's commands stay true."""
import re
import shlex
from pathlib import Path

import pytest

from derive.cli import main

ROOT = Path(__file__).resolve().parents[1]
README = (ROOT / "README.md").read_text(encoding="utf-8")

#: lines another test already runs exactly (too slow to run twice)
ELSEWHERE = {"derive kernel --check": "run by tests/test_kernels_api.py (derive kernel --check --json)"}


def tour_lines() -> list[tuple[str, int]]:
    section = README.split("## A short tour", 1)[1].split("\nPython:", 1)[0]
    out = []
    for line in section.splitlines():
        if not line.startswith("    derive "):
            continue
        command, _, comment = line.strip().partition("  #")
        out.append((command.strip(), 1 if "exit 1" in comment else 0))
    return out


TOUR = tour_lines()


def test_tour_found():
    assert len(TOUR) >= 15 and any(c.startswith("derive samples") for c, _ in TOUR)


@pytest.fixture(scope="module")
def tour_folder(tmp_path_factory):
    return tmp_path_factory.mktemp("tour")      # one folder, lines in README order (samples before check)


@pytest.mark.parametrize("command,expected", TOUR, ids=[c for c, _ in TOUR])
def test_tour_line(command, expected, tour_folder, monkeypatch, capsys):
    if command in ELSEWHERE:
        pytest.skip(ELSEWHERE[command])
    monkeypatch.chdir(tour_folder)
    argv = shlex.split(command)[1:]
    code = main(argv)
    out, err = capsys.readouterr()
    assert code == expected, f"{command}: exit {code}\n{err}"
    assert "Traceback" not in err


def test_readme_test_command_is_what_ci_runs():
    ci = (ROOT / ".ci" / "run").read_text(encoding="utf-8")
    test_cmd = re.search(r"^    (python3 -m venv .venv && .venv/bin/pip install -q -e '\.\[test\]'.*)$", README, re.M)
    assert test_cmd and test_cmd.group(1) in ci
    assert "apt-get install gcc gfortran" in README.split(test_cmd.group(1))[0]   # said before the command
    assert re.search(r"^    python3 -m venv .venv && .venv/bin/pip install -e \. && .venv/bin/derive demo -o demo-output$",
                     README, re.M)
