"""A spec path that is not a regular file is refused before it is opened (a FIFO used to hang)."""
import os
import subprocess
import sys

import pytest


@pytest.mark.skipif(not hasattr(os, "mkfifo"), reason="no FIFOs on this platform")
def test_fifo_spec_is_refused_without_opening_it(tmp_path):
    fifo = tmp_path / "element.toml"
    os.mkfifo(fifo)
    # hang guard only: before the fix the command blocked in open() for ever
    res = subprocess.run([sys.executable, "-m", "derive", "shapes", str(fifo)],
                         capture_output=True, text=True, timeout=60)
    assert res.returncode == 2
    lines = res.stderr.strip().splitlines()
    assert len(lines) == 1 and "FIFO" in lines[0] and "spec file" in lines[0]


def test_device_spec_is_refused(tmp_path):
    res = subprocess.run([sys.executable, "-m", "derive", "shapes", "/dev/null"],
                         capture_output=True, text=True, timeout=60)
    assert res.returncode == 2
    assert len(res.stderr.strip().splitlines()) == 1
