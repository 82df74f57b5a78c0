"""Rendering of derived objects (text, LaTeX, JSON), numeric substitution and atomic writes."""
from __future__ import annotations

import json
import os
import sys
import tempfile
from pathlib import Path
from typing import Iterable

import numpy as np
import sympy as sp

from . import symbols
from .errors import InputError

CAUTION = ("Caution: derive is a verification aid, not a design check. Defer to the governing local codes "
           "and to licensed engineering practice before relying on any result.")

FORMATS = ("text", "latex", "json")

#: entries with more operations than this are printed as derived, not factored
DISPLAY_FACTOR_LIMIT = 300

# names accepted by --set, beyond nodal x<i>/y<i>
SETTABLE = ("a", "b", "c", "R", "E", "nu", "t", "r")


def parse_set(text: str | None) -> dict[sp.Symbol, sp.Expr]:
    """Parse ``--set a=2,b=0.5,E=210e9`` into exact values keyed by canonical symbols.

    Numbers only (decimal, exponent, or p/q); values are kept exact as rationals.
    """
    out: dict[sp.Symbol, sp.Expr] = {}
    if not text:
        return out
    for k, item in enumerate(text.split(","), start=1):
        item = item.strip()
        if not item:
            continue
        name, eq, value = item.partition("=")
        name, value = name.strip(), value.strip()
        if not eq or not name or not value:
            raise InputError(f"--set item {k} ({item!r}) is malformed; write name=value, e.g. --set a=2,b=0.5,E=210e9")
        sym = symbols.lookup(name)
        if sym is None or (name not in SETTABLE and not (name[0] in "xy" and name[1:].isdigit())):
            raise InputError(f"--set: unknown name {name!r}; allowed: {', '.join(SETTABLE)}, x1.., y1..")
        out[sym] = parse_number(value, f"--set {name}")
    return out


def parse_number(value: str, where: str) -> sp.Rational:
    """A decimal, exponent or p/q literal as an exact rational; InputError otherwise."""
    v = value.strip()
    try:
        if "/" in v:
            p, q = v.split("/", 1)
            num = sp.Rational(int(p.strip()), int(q.strip()))
        else:
            f = float(v)
            if not np.isfinite(f):
                raise ValueError
            num = sp.Rational(v) if len(v) < 40 else sp.Rational(f)
    except (ValueError, TypeError, ZeroDivisionError):
        raise InputError(f"{where}: {value!r} is not a number (write e.g. 0.3, 210e9 or 1/3)") from None
    return num


def check_unknown(values: dict, free: Iterable[sp.Symbol], what: str) -> None:
    """Refuse --set names that do not occur in the result (likely typos)."""
    free = set(free)
    extra = [s.name for s in values if s not in free]
    if extra:
        allowed = ", ".join(sorted(s.name for s in free)) or "none"
        raise InputError(f"--set: {', '.join(extra)} does not occur in {what}; names in it: {allowed}")


def display(expr: sp.Expr) -> sp.Expr:
    """Compact form for display only (factor, never simplify)."""
    if not isinstance(expr, sp.Basic) or expr.is_number:
        return expr
    if _larger_than(expr, DISPLAY_FACTOR_LIMIT):
        return expr  # factoring a very large entry (general geometry) costs minutes and gains nothing
    try:
        return sp.factor(expr)
    except Exception:  # factor can refuse radicals-heavy input; fall back to the raw form
        return expr


def _larger_than(expr: sp.Expr, limit: int) -> bool:
    """True when the expression tree has more than ``limit`` nodes (stops counting early)."""
    for k, _ in enumerate(sp.preorder_traversal(expr)):
        if k > limit:
            return True
    return False


def matrix_text(M: sp.Matrix, name: str = "K", symmetric: bool = False) -> str:
    lines = []
    big = M.rows * M.cols > 64 and any(_larger_than(M[i, i], DISPLAY_FACTOR_LIMIT) for i in range(min(M.rows, M.cols)))
    progress = Progress(M.rows, f"printing {name}") if big else None
    for i in range(M.rows):
        if progress:
            progress.step()
        for j in range(M.cols):
            if symmetric and j < i:
                continue
            lines.append(f"{name}[{i},{j}] = {display(M[i, j])}")
    if progress:
        progress.close()
    return "\n".join(lines)


def numeric_text(A: np.ndarray) -> str:
    with np.printoptions(precision=6, linewidth=160, suppress=False):
        return np.array2string(np.asarray(A, dtype=float), separator=", ")


def matrix_latex(M: sp.Matrix, name: str = "K") -> str:
    rows = [" & ".join(sp.latex(display(M[i, j])) for j in range(M.cols)) for i in range(M.rows)]
    body = " \\\\\n".join(rows)
    return f"{name} = \\begin{{bmatrix}}\n{body}\n\\end{{bmatrix}}"


def to_float_matrix(M: sp.Matrix) -> np.ndarray:
    free = M.free_symbols
    if free:
        names = ", ".join(sorted(s.name for s in free))
        raise InputError(f"cannot evaluate numerically: {names} still symbolic; give them with --set")
    return np.array(M.evalf(17).tolist(), dtype=float)


def emit_json(obj) -> str:
    return json.dumps(obj, indent=2, sort_keys=False, default=_json_default)


def _json_default(o):
    if isinstance(o, (np.floating, np.integer)):
        return o.item()
    if isinstance(o, np.ndarray):
        return o.tolist()
    if isinstance(o, sp.Basic):
        return str(o)
    raise TypeError(type(o).__name__)


def write_atomic(path: str | os.PathLike, data: str | bytes) -> Path:
    """Write a file atomically (temporary file in the same folder, then rename)."""
    path = Path(path)
    path.parent.mkdir(parents=True, exist_ok=True)
    mode = "wb" if isinstance(data, bytes) else "w"
    fd, tmp = tempfile.mkstemp(prefix=f".{path.name}.", dir=str(path.parent))
    try:
        with os.fdopen(fd, mode, **({} if mode == "wb" else {"encoding": "utf-8"})) as fh:
            fh.write(data)
        os.chmod(tmp, 0o666 & ~_umask())  # mkstemp creates 0600; give the file the usual mode
        os.replace(tmp, path)
    except BaseException:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        raise
    return path


def _umask() -> int:
    mask = os.umask(0)
    os.umask(mask)
    return mask


class Progress:
    """A one-line progress display on a terminal; silent under --json or when piped."""

    def __init__(self, total: int, label: str, enabled: bool | None = None):
        self.total, self.label, self.done = total, label, 0
        self.enabled = sys.stderr.isatty() if enabled is None else enabled

    def step(self, what: str = "") -> None:
        self.done += 1
        if self.enabled:
            sys.stderr.write(f"\r{self.label}: {self.done}/{self.total} {what[:50]:<50}")
            sys.stderr.flush()

    def close(self) -> None:
        if self.enabled:
            sys.stderr.write("\r" + " " * 80 + "\r")
            sys.stderr.flush()
