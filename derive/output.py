"""Rendering of derived objects (text, LaTeX, JSON), numeric substitution and atomic writes."""
from __future__ import annotations

import contextvars
import json
import math
import os
import sys
import tempfile
import threading
import time
from contextlib import contextmanager
from pathlib import Path
from typing import Iterable

import numpy as np
import sympy as sp

from . import limits, symbols
from .errors import InputError, OutputError

CAUTION = ("Caution: derive is a verification aid, not a design check. Defer to the governing local codes "
           "and to licensed engineering practice before relying on any result.")

FORMATS = ("text", "latex", "json")

#: entries with more operations than this are printed as derived, not factored
DISPLAY_FACTOR_LIMIT = 300

# names accepted by --set, beyond nodal x<i>/y<i>
SETTABLE = ("a", "b", "c", "R", "E", "nu", "t", "r")


#: --set names that must be > 0 when given a number (c, the skew, may have either sign)
POSITIVE = ("a", "b", "R", "E", "t", "r")


def parse_set(text: str | None) -> dict[sp.Symbol, sp.Expr]:
    """Parse ``--set a=2,b=0.5,E=210e9`` into exact values keyed by canonical symbols.

    Numbers only (decimal, exponent, or p/q, within :mod:`derive.limits`); values are kept
    exact as rationals.  a, b, R, E, t and r must be > 0; a name may be given once.
    """
    out: dict[sp.Symbol, sp.Expr] = {}
    if text is None:
        return out
    if not text.strip():
        raise InputError("--set is empty; write name=value, e.g. --set a=2,b=0.5,E=210e9")
    for k, item in enumerate(text.split(","), start=1):
        item = item.strip()
        if not item:
            continue
        name, eq, value = item.partition("=")
        name, value = name.strip(), value.strip()
        if not eq or not name or not value:
            raise InputError(f"--set item {k} ({limits.echo(item)}) is malformed; write name=value, "
                             "e.g. --set a=2,b=0.5,E=210e9")
        sym = symbols.lookup(name)
        if sym is None or (name not in SETTABLE and not (name[0] in "xy" and name[1:].isdigit())):
            raise InputError(f"--set: unknown name {limits.echo(name)}; allowed: {', '.join(SETTABLE)}, x1.., y1..")
        if sym in out:
            raise InputError(f"--set: {name} is given twice; give each name once")
        out[sym] = parse_number(value, f"--set {name}")
        if name in POSITIVE:
            limits.check_positive(out[sym], name, "--set")
    return out


def parse_number(value: str, where: str) -> sp.Rational:
    """A decimal, exponent or p/q literal as an exact rational; InputError otherwise.

    The limits (digits, exponent, magnitude; no ``_``, inf or nan) are those of
    :func:`derive.limits.parse_literal`.
    """
    return limits.parse_literal(value, where)


def check_unknown(values: dict, free: Iterable[sp.Symbol], what: str) -> None:
    """Refuse --set names that do not occur in the result (likely typos)."""
    free = set(free)
    extra = [s.name for s in values if s not in free]
    if extra:
        allowed = ", ".join(sorted(s.name for s in free)) or "none"
        raise InputError(f"--set: {', '.join(extra)} does not occur in {what}; names in it: {allowed}")


def display(expr: sp.Expr) -> sp.Expr:
    """Compact form for display only (factored in the natural sign, never simplify)."""
    if not isinstance(expr, sp.Basic) or expr.is_number:
        return expr
    if _larger_than(expr, DISPLAY_FACTOR_LIMIT):
        return expr  # factoring a very large entry (general geometry) costs minutes and gains nothing
    try:
        return natural_form(expr)
    except Exception:  # factor can refuse radicals-heavy input; fall back to the raw form
        return expr


def natural_form(expr: sp.Expr) -> sp.Expr:
    """Factored form in the natural sign, for reading: each factor with a positive constant
    term (1 - nu, not nu - 1) or, without one, with more positive than negative terms;
    univariate factors multiplied out where that is shorter ((1 - nu)(1 + nu) -> 1 - nu^2,
    while (1 + nu)(1 - 2 nu) stays); signs and numbers collected in one coefficient.

    Display only: the result is the same rational function (``sp.cancel`` of the difference
    is 0) and its ``str`` parses back with ``parse_expr``.
    """
    expr = sp.cancel(sp.together(expr))
    if expr.is_number:
        return expr
    num, den = sp.fraction(expr)
    cn, pn = _tidy(num)
    cd, pd = _tidy(den)
    coeff = sp.Rational(cn, cd) if cn.is_Rational and cd.is_Rational else cn / cd
    factors = list(pn) + [f ** -1 for f in pd]
    if not factors:
        return coeff
    if len(factors) == 1 and isinstance(factors[0], sp.Add) and coeff != 1:
        return sp.Mul(coeff, factors[0], evaluate=False)   # 2*(1 - nu), not 2 - 2*nu
    return sp.Mul(coeff, *factors)


def _tidy(e: sp.Expr) -> tuple[sp.Expr, list[sp.Expr]]:
    """(numeric coefficient, factors in the natural sign) of a polynomial expression."""
    c, facs = sp.factor_list(e)
    parts: list[tuple[sp.Expr, int]] = []
    for f, k in facs:
        if _flip(f):
            f = sp.expand(-f)
            c *= (-1) ** k
        parts.append((f, k))
    parts = _merge_univariate(parts)
    return c, [f ** k if k > 1 else f for f, k in parts]


def _flip(f: sp.Expr) -> bool:
    terms = sp.Add.make_args(sp.expand(f))
    if len(terms) < 2:
        return bool(f.could_extract_minus_sign())
    const = sum((t for t in terms if t.is_number), sp.Integer(0))
    if const != 0:
        return bool(const < 0)
    neg = sum(1 for t in terms if t.could_extract_minus_sign())
    return neg > len(terms) - neg


def _merge_univariate(parts: list[tuple[sp.Expr, int]]) -> list[tuple[sp.Expr, int]]:
    """Multiply out simple factors in one symbol when the product has no more terms than the
    longest factor ((1 - nu)(1 + nu) -> 1 - nu^2)."""
    out = list(parts)
    changed = True
    while changed:
        changed = False
        for i in range(len(out)):
            for j in range(i + 1, len(out)):
                (f, k), (g, m) = out[i], out[j]
                if k != m or len(f.free_symbols) != 1 or f.free_symbols != g.free_symbols:
                    continue
                prod = sp.expand(f * g)
                longest = max(len(sp.Add.make_args(f)), len(sp.Add.make_args(g)))
                if len(sp.Add.make_args(prod)) <= longest:
                    if _flip(prod):  # cannot happen for a product of natural factors; keep the sign honest
                        continue
                    out[i] = (prod, k)
                    del out[j]
                    changed = True
                    break
            if changed:
                break
    return out


def common_factor(M: sp.Matrix) -> tuple[sp.Expr, sp.Matrix]:
    """Pull the common factor out of a matrix: ``M = factor * rest`` with ``factor`` the gcd of
    the entries' numerators over the lcm of their denominators (so ``rest`` is polynomial),
    in the natural sign.  Returns ``(1, M)`` when there is nothing to pull or the entries are
    too large to factor quickly (general geometry)."""
    entries = [v for v in M if v != 0]
    if not entries or any(_larger_than(v, DISPLAY_FACTOR_LIMIT) for v in entries) \
            or all(getattr(v, "is_number", True) for v in entries):
        return sp.Integer(1), M
    try:
        fracs = [sp.fraction(sp.cancel(v)) for v in entries]
        g = sp.Integer(0)
        for n, _ in fracs:
            g = sp.gcd(g, n)
        lcm = sp.Integer(1)
        for _, d in fracs:
            lcm = sp.lcm(lcm, d)
        factor = sp.cancel(g / lcm)
        if factor.could_extract_minus_sign():
            factor = -factor
        _, den = sp.fraction(factor)
        cd, _ = _tidy(den)
        if cd < 0:
            factor = -factor
        if factor == 1 or factor.is_number:
            return sp.Integer(1), M
        rest = M.applyfunc(lambda v: sp.expand(sp.cancel(v / factor)) if v != 0 else v)
    except (sp.PolynomialError, NotImplementedError, ZeroDivisionError):
        return sp.Integer(1), M
    return factor, rest


def _larger_than(expr: sp.Expr, limit: int) -> bool:
    """True when the expression tree has more than ``limit`` nodes (stops counting early)."""
    for k, _ in enumerate(sp.preorder_traversal(expr)):
        if k > limit:
            return True
    return False


def matrix_header(M: sp.Matrix, label: str, element, geometry: str, rule: str | None = None,
                  comment: str = "#", full: bool = False) -> str:
    """Header lines (``comment``-prefixed) naming the matrix, its element, geometry and layout,
    and the caution: for files derive writes, so they say what they hold (``full``: every entry
    is written, not the upper triangle)."""
    title = f"{label} of {element.name} ({element.variant}, {element.state})"
    if label != "D":
        title += f", geometry: {describe_geometry(geometry, element.shapes.domain, element.state == 'axisymmetric')}"
        if label == "K" and rule:
            title += f", rule {rule}"
    notes = matrix_notes(label, element.state, M.rows, M.cols)
    if full and label != "B":
        notes = [notes[0], "symmetric; full matrix shown"]
    lines = [title, *notes, CAUTION]
    return "\n".join(f"{comment} {line}" for line in lines)


def matrix_text(M: sp.Matrix, name: str = "K", symmetric: bool = False, pull_factor: bool = True) -> str:
    """``name[i,j] = expr`` lines (0-based; upper triangle when ``symmetric``), each entry in
    the natural sign.  With a common factor (see :func:`common_factor`) a header line names it
    and every entry is written ``factor * (rest)``, so each line still parses back alone."""
    factor, rest = common_factor(M) if pull_factor else (sp.Integer(1), M)
    lines = []
    fac = str(display(factor))
    if factor != 1:
        lines.append(f"# common factor: {name} = {fac} * (the bracket of each entry)")
    big = M.rows * M.cols > 64 and any(_larger_than(M[i, i], DISPLAY_FACTOR_LIMIT) for i in range(min(M.rows, M.cols)))
    progress = Progress(M.rows, f"printing {name}") if big else None
    for i in range(M.rows):
        if progress:
            progress.step()
        for j in range(M.cols):
            if symmetric and j < i:
                continue
            v = rest[i, j]
            if factor != 1 and v != 0:
                lines.append(f"{name}[{i},{j}] = {fac} * {_wrapped(display(v), '(', ')', str)}")
            else:
                lines.append(f"{name}[{i},{j}] = {display(M[i, j]) if factor == 1 else 0}")
    if progress:
        progress.close()
    return "\n".join(lines)


def _wrapped(e: sp.Expr, left: str, right: str, render) -> str:
    """The rendered expression, bracketed when it is a sum or starts with a sign or a digit
    (LaTeX \\frac{..}{..} 3 a would read as a number joined to the fraction)."""
    text = render(e)
    bare = text.lstrip()
    return f"{left}{text}{right}" if isinstance(e, sp.Add) or bare[:1] == "-" or bare[:1].isdigit() else text


def describe_geometry(kind: str, domain: str, axisymmetric: bool = False) -> str:
    """What the geometry kind is for this element's domain (headers name the shape shown)."""
    at = " centred at radius R" if axisymmetric else " centred at the origin"
    if kind == "nodes":
        return "the given nodal coordinates"
    if kind == "general":
        if domain in ("cube", "tetrahedron", "wedge"):
            return "general (nodal coordinates x1, y1, z1, ..., xn, yn, zn)"
        return "general (nodal coordinates x1, y1, ..., xn, yn)"
    if kind in ("brick", "parallelepiped"):
        shape = ("brick 2a x 2b x 2c centred at the origin" if kind == "brick" else
                 "parallelepiped x = aX + sY, y = bY, z = cZ (skew parameter s) centred at the origin")
        if domain == "tetrahedron":
            return "corner tetrahedron (-a,-b,-c), (a,-b,-c), (-a,b,-c), (-a,-b,c) of the " + shape
        if domain == "wedge":
            return "triangular prism over the lower-left half of the " + shape
        return shape
    if kind == "segment":
        return "segment of length 2a along x centred at the origin"
    if domain == "triangle":
        if kind == "rectangle":
            return ("right triangle with legs 2a along x and 2b along y, right angle at (-a, -b) "
                    "(the lower-left half of the 2a x 2b rectangle" + at + ")")
        return ("triangle with base 2a along y = -b and apex skewed by c (the lower-left half of the "
                "parallelogram x = aX + cY, y = bY" + at + ")")
    if kind == "rectangle":
        return "rectangle 2a x 2b" + at
    return "parallelogram x = aX + cY, y = bY (skew parameter c)" + at


def matrix_notes(label: str, state: str, rows: int, cols: int) -> list[str]:
    """Header lines that describe the matrix printed: its shape, row/column meaning, symmetry."""
    from . import models
    strains = {"axisymmetric": "rr, zz, tt (hoop), rz", "solid": "xx, yy, zz, yz, zx, xy (engineering shear)"}.get(
        state, "xx, yy, xy (engineering shear)")
    dofs = "interleaved " + ", ".join(models.get(state).dof_names(2)) + ", ..." if state in models.MODELS else \
        "interleaved u1, v1, u2, v2, ..."
    if label == "K":
        return [f"{rows} x {cols}; rows and columns are the DOFs {dofs}",
                "symmetric: upper triangle shown (K[j,i] = K[i,j])"]
    if label == "B":
        return [f"{rows} x {cols}; rows are the strains {strains}; columns the DOFs {dofs}",
                "every entry shown (B is not symmetric)"]
    return [f"{rows} x {cols} constitutive matrix; rows and columns are the stresses/strains {strains}",
            "symmetric: upper triangle shown (D[j,i] = D[i,j])"]


#: matrices with more columns than this are written to LaTeX as a list of entries (align*)
LATEX_MATRIX_COLUMNS = 8


def matrix_latex(M: sp.Matrix, name: str = "K", title: str | None = None, notes: Iterable[str] = (),
                 symmetric: bool = False) -> str:
    """LaTeX a document can include: ``%`` header lines (what the matrix is), then either
    ``name = factor \\begin{bmatrix} ... \\end{bmatrix}`` (up to LATEX_MATRIX_COLUMNS columns)
    or, for wider matrices, an ``align*`` list of entries ``name_{i,j} &= ...`` (1-based,
    upper triangle when ``symmetric``), one per line, which breaks across pages (amsmath)."""
    factor, rest = common_factor(M)
    fac = "" if factor == 1 else sp.latex(display(factor)) + " "
    head = [f"% {title}"] if title else []
    head += [f"% {line}" for line in notes]
    if M.cols <= LATEX_MATRIX_COLUMNS:
        if symmetric:
            head.append("% symmetric; full matrix shown")
        rows = [" & ".join(sp.latex(display(rest[i, j])) for j in range(M.cols)) for i in range(M.rows)]
        body = " \\\\\n".join(rows)
        return "\n".join(head + [f"{name} = {fac}\\begin{{bmatrix}}\n{body}\n\\end{{bmatrix}}"])
    head.append(f"% {M.rows} x {M.cols}: too wide for one matrix environment, so listed entry by entry "
                "(1-based indices" + ("; upper triangle" if symmetric else "") + "; needs amsmath)")
    if factor != 1:
        head.append(f"% every entry carries the common factor {sp.latex(display(factor))}")
    lines = []
    for i in range(M.rows):
        for j in range(M.cols):
            if symmetric and j < i:
                continue
            v = rest[i, j]
            entry = "0" if v == 0 else (fac + _wrapped(display(v), r"\left(", r"\right)", sp.latex) if fac
                                        else sp.latex(display(v)))
            lines.append(f"{name}_{{{i + 1},{j + 1}}} &= {entry}")
    return "\n".join(head + ["\\begin{align*}", " \\\\\n".join(lines), "\\end{align*}"])


#: significant digits of numeric text output (``--digits``)
DEFAULT_DIGITS = 7
MAX_DIGITS = 17


def check_digits(n) -> int:
    """``--digits``: a whole number 1..17 (17 digits round-trip every float64)."""
    return limits.parse_whole(n, "--digits", 1, MAX_DIGITS)


_DIGITS: contextvars.ContextVar[int | None] = contextvars.ContextVar("derive_digits", default=None)


@contextmanager
def digits_override(n: int | None):
    """Within the block, :func:`fmt` prints every number with ``n`` significant digits (the
    CLI's ``--digits``); ``None`` keeps each caller's own format."""
    token = _DIGITS.set(n)
    try:
        yield
    finally:
        _DIGITS.reset(token)


def fmt(v, spec: str) -> str:
    """``format(v, spec)`` unless a ``--digits`` override is active (then ``.{n}g``), so the
    report lines built in the library honour the option without knowing about it."""
    n = _DIGITS.get()
    try:
        return format(float(v), f".{n}g") if n is not None else format(v, spec)
    except (TypeError, ValueError):
        return format(v, spec)


def num(v, digits: int = DEFAULT_DIGITS) -> str:
    """One number with ``digits`` significant digits (general format, as ``%.{digits}g``)."""
    return f"{float(v):.{digits}g}"


def numeric_text(A: np.ndarray, digits: int = DEFAULT_DIGITS) -> str:
    """A numeric matrix, every entry with ``digits`` significant digits, columns aligned."""
    A = np.atleast_2d(np.asarray(A, dtype=float))
    cells = [[num(v, digits) for v in row] for row in A]
    width = max((len(c) for row in cells for c in row), default=1)
    rows = ["[" + ", ".join(c.rjust(width) for c in row) + "]" for row in cells]
    return "[" + ",\n ".join(rows) + "]"


def to_float_matrix(M: sp.Matrix) -> np.ndarray:
    free = M.free_symbols
    if free:
        names = ", ".join(sorted(s.name for s in free))
        raise InputError(f"cannot evaluate numerically: {names} still symbolic; give them with --set")
    return np.array(M.evalf(17).tolist(), dtype=float)


def emit_json(obj) -> str:
    """Strict JSON (RFC 8259): no NaN or Infinity anywhere.

    A non-finite number becomes ``null``; inside an object a sibling field ``<key>_note``
    says why ("infinite: unbounded", "-infinite", "not a number"), so strict parsers (a
    browser's JSON.parse, most standard libraries) read every file derive writes.
    """
    return json.dumps(_strict(obj), indent=2, sort_keys=False, default=_json_default, allow_nan=False)


def _nonfinite_note(v: float) -> str:
    if math.isnan(v):
        return "not a number"
    return "infinite: unbounded" if v > 0 else "-infinite: unbounded below"


def _strict(o):
    if isinstance(o, (np.floating, np.integer, np.bool_)):
        o = o.item()
    if isinstance(o, float):
        return o if math.isfinite(o) else None
    if isinstance(o, dict):
        out = {}
        for k, v in o.items():
            if isinstance(v, (float, np.floating)) and not math.isfinite(float(v)):
                out[k] = None
                out[f"{k}_note"] = _nonfinite_note(float(v))
            else:
                out[k] = _strict(v)
        return out
    if isinstance(o, (list, tuple)):
        return [_strict(v) for v in o]
    if isinstance(o, np.ndarray):
        return _strict(o.tolist())
    return o


def _json_default(o):
    if isinstance(o, (np.floating, np.integer)):
        return o.item()
    if isinstance(o, np.ndarray):
        return o.tolist()
    if isinstance(o, sp.Basic):
        return str(o)
    raise TypeError(type(o).__name__)


def write_atomic(path: str | os.PathLike, data: str | bytes, make_folder: bool = False) -> Path:
    """Write a file atomically (temporary file in the same folder, then rename).

    The parent folder must exist (``make_folder=True`` creates that one folder when *its*
    parent exists; used for a folder derive owns, such as ``kernels/`` inside an output
    folder).  Every OS failure becomes a one-line :class:`OutputError`; the temporary file
    is removed, so no half-written file is left behind.
    """
    path = Path(path)
    if make_folder and not path.parent.exists():
        _check_parent(path.parent, str(path.parent))
        _os_call(lambda: path.parent.mkdir(), path.parent)
    _check_parent(path, str(path))
    if path.is_dir():
        raise OutputError(f"{path}: is a folder; give a file name")
    mode = "wb" if isinstance(data, bytes) else "w"
    fd, tmp = _os_call(lambda: tempfile.mkstemp(prefix=f".{path.name}.", dir=str(path.parent)), path)
    try:
        with os.fdopen(fd, mode, **({} if mode == "wb" else {"encoding": "utf-8"})) as fh:
            fh.write(data)
        os.chmod(tmp, 0o666 & ~_umask())  # mkstemp creates 0600; give the file the usual mode
        os.replace(tmp, path)
    except BaseException as exc:
        try:
            os.unlink(tmp)
        except OSError:
            pass
        if isinstance(exc, OSError):
            raise OutputError(f"{path}: cannot write: {_reason(exc)}") from None
        raise
    return path


# --- output paths: one rule for every command ------------------------------------------------
#
# A FILE output (chart -o, bench --plot/--table/--vtu, modes --plot, ...) is checked with
# ``check_output_file`` before any work starts:
#   * its folder must exist and be a writable folder (derive never creates a file's folder:
#     the message names the missing folder and the user creates it);
#   * the path must not be a folder or a non-regular file (FIFO, device);
#   * an existing file is replaced only with ``--force`` (the message says so).
# A FOLDER output (demo -o, kernel -o DIR) is opened with ``OutputFolder``:
#   * the path must not be a file; its parent must exist (the folder itself is created);
#   * a folder that exists and holds files derive did not write (no manifest
#     ``.derive-manifest.json`` lists them) is refused without ``--force``;
#   * derive replaces only the file names it writes and never deletes anything; the
#     manifest records what it wrote so later runs (and clean-ups) know derive's files.
# Every failure is an OutputError (an InputError: one line, CLI exit status 2).

MANIFEST = ".derive-manifest.json"


def _reason(exc: OSError) -> str:
    return (exc.strerror or type(exc).__name__).lower() if isinstance(exc, OSError) else str(exc)


def _os_call(fn, path):
    try:
        return fn()
    except OSError as exc:
        raise OutputError(f"{path}: cannot write: {_reason(exc)}") from None


def _check_parent(path: Path, shown: str, option: str = "") -> None:
    """The folder that will hold ``path`` exists, is a folder and is writable."""
    where = f"{option} {shown}" if option else shown
    parent = path.parent if str(path.parent) else Path(".")
    probe = parent
    while not probe.exists() and probe != probe.parent:
        probe = probe.parent
    if not parent.exists():
        if probe.exists() and not probe.is_dir():
            raise OutputError(f"{where}: {probe} is a file, not a folder")
        raise OutputError(f"{where}: folder {parent} does not exist; create it first")
    if not parent.is_dir():
        raise OutputError(f"{where}: {parent} is a file, not a folder")
    if not os.access(parent, os.W_OK | os.X_OK):
        raise OutputError(f"{where}: folder {parent} is not writable")


def check_output_file(path: str | os.PathLike, option: str = "-o", force: bool = False) -> Path:
    """Validate a file derive is about to write (before the work); returns the path.

    Refuses (OutputError, exit 2) a missing, non-folder or read-only parent, a path that is
    a folder or a special file, and an existing file unless ``force``.
    """
    p = Path(path)
    shown = str(path)
    if not p.name or shown.endswith(("/", os.sep)):
        raise OutputError(f"{option} {shown}: give a file name, not a folder")
    if p.is_dir():
        raise OutputError(f"{option} {shown}: is a folder; give a file name inside it")
    _check_parent(p, shown, option)
    if p.exists() or p.is_symlink():
        if not p.is_file():
            raise OutputError(f"{option} {shown}: exists and is not a regular file")
        if not force:
            raise OutputError(f"{option} {shown}: file exists; add --force to replace it")
        if not os.access(p, os.W_OK):
            raise OutputError(f"{option} {shown}: file is read-only")
    return p


class OutputFolder:
    """A folder derive writes several files into (see the rules above ``check_output_file``).

    ``OutputFolder(path, option, force)`` validates and creates the folder;
    ``target(name)`` checks one file name (inside the folder; an existing file derive did
    not write needs ``force``); ``write(name, data)`` writes it atomically and records it in
    the manifest; ``adopt(since)`` records files others wrote into the folder during this
    run (modified after the time ``since``, from ``time.time()``).
    """

    def __init__(self, path: str | os.PathLike, option: str = "-o", force: bool = False):
        self.path, self.option, self.force = Path(path), option, force
        shown = str(path)
        if self.path.exists() and not self.path.is_dir():
            raise OutputError(f"{option} {shown}: is a file; give a folder name (derive writes several files into it)")
        if not self.path.exists():
            _check_parent(self.path, shown, option)
            _os_call(lambda: self.path.mkdir(), self.path)
        elif not os.access(self.path, os.W_OK | os.X_OK):
            raise OutputError(f"{option} {shown}: folder is not writable")
        self.written: set[str] = set(self._read_manifest())
        if not force:
            foreign = sorted(f for f in self._files() if f not in self.written)
            if foreign:
                more = f" and {len(foreign) - 3} more" if len(foreign) > 3 else ""
                raise OutputError(f"{option} {shown}: folder holds files derive did not write ({', '.join(foreign[:3])}"
                                  f"{more}); add --force to write into it (derive replaces only its own file names "
                                  "and deletes nothing), or choose another folder")

    def _files(self) -> list[str]:
        out = []
        for p in self.path.rglob("*"):
            if p.name != MANIFEST and not p.is_dir():
                out.append(p.relative_to(self.path).as_posix())
        return out

    def _read_manifest(self) -> list[str]:
        m = self.path / MANIFEST
        try:
            data = json.loads(m.read_text(encoding="utf-8"))
            return [str(f) for f in data.get("files", [])]
        except (OSError, ValueError, AttributeError):
            return []

    def target(self, name: str) -> Path:
        rel = Path(name)
        if rel.is_absolute() or ".." in rel.parts or not rel.parts:
            raise OutputError(f"{self.option} {self.path}: {name!r} is not a file name inside the folder")
        p = self.path / rel
        if p.is_dir():
            raise OutputError(f"{self.option} {self.path}: {rel.as_posix()} is a folder; derive writes a file there")
        if p.exists() and rel.as_posix() not in self.written and not self.force:
            raise OutputError(f"{self.option} {self.path}: {rel.as_posix()} exists and derive did not write it; "
                              "add --force to replace it")
        return p

    def write(self, name: str, data: str | bytes) -> Path:
        p = write_atomic(self.target(name), data, make_folder=True)
        self.written.add(Path(name).as_posix())
        self.save_manifest()
        return p

    def adopt(self, since: float) -> None:
        for f in self._files():
            try:
                if (self.path / f).stat().st_mtime >= since - 1:
                    self.written.add(f)
            except OSError:
                pass
        self.save_manifest()

    def save_manifest(self) -> None:
        data = {"written_by": "derive", "note": "files derive wrote into this folder (it deletes none of them)",
                "files": sorted(self.written)}
        write_atomic(self.path / MANIFEST, json.dumps(data, indent=1) + "\n")


def _umask() -> int:
    mask = os.umask(0)
    os.umask(mask)
    return mask


@contextmanager
def working(label: str, enabled: bool | None = None, after: float = 2.0):
    """Show ``label ... N s`` on a terminal while the block runs, for work without steps to
    count (a long derivation, a chart, a plot, a benchmark section).

    Nothing appears for blocks shorter than ``after`` seconds, under --json (callers pass
    ``enabled=False``) or when stderr is not a terminal; the line is erased at the end.
    Use :class:`Progress` where the steps can be counted.
    """
    enabled = _stderr_tty() if enabled is None else enabled
    if not enabled:
        yield
        return
    stop = threading.Event()
    shown = threading.Event()
    t0 = time.monotonic()

    def tick():
        if stop.wait(after):
            return
        while True:
            try:
                sys.stderr.write(f"\r{label[:60]} ... {time.monotonic() - t0:.0f} s ")
                sys.stderr.flush()
            except (OSError, ValueError):
                return
            shown.set()
            if stop.wait(1.0):
                return

    thread = threading.Thread(target=tick, name="derive-progress", daemon=True)
    thread.start()
    try:
        yield
    finally:
        stop.set()
        thread.join()
        if shown.is_set():
            try:
                sys.stderr.write("\r" + " " * 80 + "\r")
                sys.stderr.flush()
            except (OSError, ValueError):
                pass


def _stderr_tty() -> bool:
    try:
        return sys.stderr.isatty()
    except (AttributeError, ValueError):
        return False


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

    def clear(self) -> None:
        """Erase the line (before printing a result on stdout); the next step redraws it."""
        if self.enabled:
            sys.stderr.write("\r" + " " * 80 + "\r")
            sys.stderr.flush()

    def close(self) -> None:
        self.clear()
