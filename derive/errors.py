from __future__ import annotations
"""Typed exceptions of derive.

Every error a user can cause is an :class:`InputError` (CLI exit status 2) with a
one-line message saying what was wrong, where, and what is allowed.  A check that
ran and found a mismatch is not an exception; it is a result with ``passed=False``
(CLI exit status 1).
"""


class DeriveError(Exception):
    """Base class of all errors raised deliberately by derive."""


class InputError(DeriveError, ValueError):
    """Bad user input: unknown name, malformed value, invalid geometry or material.

    The message is a single line: what, where, what is allowed.
    """


class GeometryError(InputError):
    """Invalid element geometry (zero area, clockwise numbering, det J sign change)."""


class MaterialError(InputError):
    """Invalid material constants (E <= 0, nu outside its admissible range)."""


class OutputError(InputError):
    """An output path derive cannot or must not write (missing folder, a file where a folder
    is expected, read-only, an existing file without --force, a full device)."""


class SpecError(InputError):
    """Invalid user-defined element specification (TOML file)."""


class ParseError(InputError):
    """User text (expression, matrix file) that the safe parser refuses.

    Carries the line and column (1-based) and the offending token when known.
    """

    def __init__(self, message: str, line: int | None = None, column: int | None = None,
                 token: str | None = None):
        self.line = line
        self.column = column
        self.token = token
        where = ""
        if line is not None:
            where = f"line {line}"
            if column is not None:
                where += f", column {column}"
            where += ": "
        super().__init__(where + message)
