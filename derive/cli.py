"""Command-line front end: parse arguments, call the library, print.  No mechanics here.

Each command lives in ``derive/commands/<name>_cmd.py`` with ``NAME``, ``HELP``,
``EXAMPLE``, ``add_arguments(parser)`` and ``run(args) -> exit status``; add a new
command by adding its module name to ``COMMANDS``.

Exit status: 0 success; 1 a check ran and failed; 2 bad input (also an output that cannot be
written: a full device, a closed pipe, a read-only folder); 3 internal error.
"""
from __future__ import annotations

import argparse
import errno
import importlib
import os
import sys

from . import __version__
from .errors import DeriveError
from .output import CAUTION

COMMANDS = ("list", "shapes", "stiffness", "locking", "chart", "kernel", "modes", "patch", "bench", "check",
            "perf", "demo", "samples")


class _Parser(argparse.ArgumentParser):
    """argparse with a one-line error (what, where, what is allowed) and exit status 2."""

    def error(self, message: str):
        self.exit(2, f"{self.prog}: error: {message} (see {self.prog} --help)\n")


def _load(name: str):
    try:
        return importlib.import_module(f"derive.commands.{name}_cmd")
    except ModuleNotFoundError as exc:
        if exc.name == f"derive.commands.{name}_cmd":
            return None
        raise


def build_parser() -> argparse.ArgumentParser:
    parser = _Parser(
        prog="derive",
        description="Derive, audit and generate finite element routines: shape functions, Jacobians, "
                    "B matrices, stiffness, locking, kernels and verification.",
        epilog="example:\n  derive stiffness Q4 --geometry rectangle\n\n" + CAUTION,
        formatter_class=argparse.RawDescriptionHelpFormatter)
    parser.add_argument("--version", action="version", version=f"derive {__version__}")
    sub = parser.add_subparsers(dest="command", metavar="COMMAND", parser_class=_Parser)
    for name in COMMANDS:
        mod = _load(name)
        if mod is None:
            continue
        p = sub.add_parser(mod.NAME, help=mod.HELP, description=mod.HELP,
                           epilog=mod.EXAMPLE + "\n\n" + CAUTION, formatter_class=argparse.RawDescriptionHelpFormatter)
        mod.add_arguments(p)
        p.set_defaults(_run=mod.run)
    return parser


def main(argv: list[str] | None = None) -> int:
    parser = build_parser()
    args = parser.parse_args(argv)
    if not getattr(args, "command", None):
        parser.print_help()
        return 2
    try:
        from .commands.common import default_state
        default_state(args)
        status = int(args._run(args) or 0)
        sys.stdout.flush()  # a full device or a closed pipe shows here, not at interpreter exit
        return status
    except DeriveError as exc:
        print(f"derive {args.command}: error: {exc}", file=sys.stderr)
        return 2
    except KeyboardInterrupt:
        print(f"derive {args.command}: interrupted", file=sys.stderr)
        return 130
    except OSError as exc:
        return _os_error(args.command, exc)
    except Exception as exc:  # never a traceback for the user; say what failed in one line
        print(f"derive {args.command}: internal error: {type(exc).__name__}: {exc} "
              "(please report it with the command line)", file=sys.stderr)
        return 3


def _os_error(command: str, exc: OSError) -> int:
    """One line and exit 2 for an OS failure: stdout on a full device or a closed pipe, a
    file that cannot be read or written (the path is named)."""
    if exc.filename is None and exc.errno in (errno.EPIPE, errno.ENOSPC, errno.EIO, errno.EBADF, errno.EFBIG) \
            or isinstance(exc, BrokenPipeError):
        _silence_stdout()
        what = "the output pipe was closed" if exc.errno == errno.EPIPE else (exc.strerror or str(exc)).lower()
        _say(f"derive {command}: error: cannot write to standard output: {what}")
        return 2
    where = f"{exc.filename}: " if exc.filename else ""
    _say(f"derive {command}: error: {where}{(exc.strerror or str(exc)).lower()}")
    return 2


def _silence_stdout() -> None:
    """Point stdout at /dev/null so the interpreter's final flush cannot raise again."""
    try:
        fd = os.open(os.devnull, os.O_WRONLY)
        os.dup2(fd, sys.stdout.fileno())
        os.close(fd)
    except (OSError, ValueError):
        pass


def _say(line: str) -> None:
    try:
        print(line, file=sys.stderr)
    except OSError:
        pass


def entry() -> None:
    sys.exit(main())
