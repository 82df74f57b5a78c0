"""Input files: one check that a user's path is a regular file before derive opens it.

Opening a FIFO or a device can block for ever or never end, and a folder gives a raw OSError, so
every reader of a user's file (matrix files for the checker, element spec files) asks this first.
"""
from __future__ import annotations

import stat
from pathlib import Path

from .errors import InputError

_NOT_REGULAR = ((stat.S_ISDIR, "a folder"), (stat.S_ISFIFO, "a FIFO (named pipe)"),
                (stat.S_ISCHR, "a character device"), (stat.S_ISBLK, "a block device"),
                (stat.S_ISSOCK, "a socket"))


def regular_file_size(p: Path, kind: str, allowed: str, error: type[InputError] = InputError) -> int:
    """Size of the regular file ``p`` (never opened here); otherwise ``error`` saying what ``p`` is.

    ``kind`` names the file in messages ("matrix file"), ``allowed`` says what to give instead.
    """
    try:
        st = p.stat()
    except FileNotFoundError:
        raise error(f"{kind} not found: {p}") from None
    except PermissionError:
        raise error(f"{p}: permission denied: a folder on the path is not accessible") from None
    except OSError as exc:
        raise error(f"{p}: cannot access the {kind} ({exc.strerror or type(exc).__name__})") from None
    for test, what in _NOT_REGULAR:
        if test(st.st_mode):
            raise error(f"{p} is {what}, not a {kind}; give {allowed}")
    if not stat.S_ISREG(st.st_mode):
        raise error(f"{p} is not a regular file; give {allowed}")
    return st.st_size
