"""What `derive check` says when its input path is not a readable regular file."""
from __future__ import annotations

import os
import stat

import pytest

import derive.userinput.matrix as matrix_module
from derive.cli import main
from derive.errors import InputError
from derive.userinput import load_matrix_file


def one_line_exit_2(path, capsys) -> str:
    assert main(["check", str(path), "--element", "Q4"]) == 2
    out, err = capsys.readouterr()
    assert out == "" and len(err.strip().splitlines()) == 1 and "Traceback" not in err
    return err


def test_directory(tmp_path, capsys):
    err = one_line_exit_2(tmp_path, capsys)
    assert "is a folder" in err and "not found" not in err  # common practice, no source


@pytest.mark.skipif(not hasattr(os, "mkfifo"), reason="no FIFOs on this platform")
def test_fifo_is_refused_without_opening_it(tmp_path, capsys):
    fifo = tmp_path / "pipe"
    os.mkfifo(fifo)
    err = one_line_exit_2(fifo, capsys)  # opening a FIFO with no writer would block: the call returned
    assert "FIFO" in err  # common practice, no source


@pytest.mark.skipif(not os.path.exists("/dev/null"), reason="no /dev/null")
def test_device(capsys):
    err = one_line_exit_2("/dev/null", capsys)
    assert "character device" in err  # common practice, no source


def test_missing_file(tmp_path, capsys):
    err = one_line_exit_2(tmp_path / "nope.txt", capsys)
    assert "not found" in err  # common practice, no source


def test_unreadable_file(tmp_path, capsys, monkeypatch):
    path = tmp_path / "k.txt"
    path.write_text("K[1,1] = a\n")
    if os.geteuid() != 0:  # a real permission bit (root reads anything)
        path.chmod(0)
    else:
        def denied(*args, **kwargs):
            raise PermissionError(13, "Permission denied")
        monkeypatch.setattr(matrix_module, "open", denied, raising=False)
    try:
        err = one_line_exit_2(path, capsys)
    finally:
        path.chmod(stat.S_IRUSR | stat.S_IWUSR)
    assert "permission denied" in err  # common practice, no source


def test_library_raises_input_error_for_a_directory(tmp_path):
    with pytest.raises(InputError, match="is a folder"):
        load_matrix_file(tmp_path)
