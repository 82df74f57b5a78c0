"""The documented limits on values a user gives, and the checks that enforce them.

Why one module: every command and library entry point that takes a number from a user
refuses the same things with the same one-line message (what, where, what is allowed), so
the limits are stated once here, in the help texts and in README's limits section.

* Number literals (``--set``, ``--nodes``, ``--aspect``, tolerances, ...): a decimal
  ``[+-]digits[.digits][e[+-]digits]`` or a fraction ``p/q`` of whole numbers; at most
  :data:`MAX_DIGITS` digits, an exponent of at most :data:`MAX_EXPONENT_DIGITS` digits, no
  ``_`` separators, no ``inf``/``nan``.  Parsing is then linear in the length of the text
  (``1e-9999999`` used to make an exact rational with ten million digits).
* Magnitudes: a value is 0 or between :data:`MAGNITUDE` [0] and [1] in absolute value.  The
  float64 work downstream squares and cubes lengths (det J, D, K); inside this range it
  neither overflows nor underflows.
* Element dimensions a, b, the thickness t, Young's modulus E and the radius R are > 0;
  an axisymmetric element lies at r = x >= 0 (the axis is x = 0), so R >= a + |c|.
* Tolerances are open intervals (:data:`TOLERANCES`): outside them the answer is decided
  by round-off (too small) or by the tolerance itself (too large).
* The bending aspect ratio r = a/b is within :data:`ASPECT_RANGE`.
* Symbolic integration by rule points is refused beyond :data:`SYMBOLIC_POINT_LIMIT` rule
  points per term (or the element's own full rule, when larger) on symbolic geometry where
  the exact polynomial route does not apply (axisymmetric, general), and beyond
  :data:`SYMBOLIC_MATERIAL_POINT_LIMIT` with numeric nodes but a symbolic material: each
  point adds a full unsimplified copy of the integrand.
"""
from __future__ import annotations

import math
import re

import numpy as np
import sympy as sp

from .errors import InputError

#: most digits in one number literal (mantissa, or each of p and q in p/q)
MAX_DIGITS = 40
#: most digits of a decimal exponent (so |exponent| <= 999; the magnitude check does the rest)
MAX_EXPONENT_DIGITS = 3
#: allowed magnitude of a non-zero value
MAGNITUDE = (1e-30, 1e30)
#: bending aspect ratio range of ``derive locking`` and ``derive chart``
ASPECT_RANGE = (1e-6, 1e6)
#: open intervals of the tolerances: (low, high) exclusive
TOLERANCES = {
    # zero eigenvalue threshold relative to the largest eigenvalue: round-off of a zero
    # eigenvalue is ~5e-16, the smallest genuine one of the catalogue ~8e-3 (T6 selective)
    "modes": (1e-13, 1e-3),
    # relative error allowed for passing a patch test: round-off of passing variants is up
    # to ~5e-14; a patch test is passed exactly, so a per-cent tolerance tests nothing
    "patch": (1e-12, 1e-3),
}
#: most rule points per term by the point route with symbolic geometry, beyond the element's
#: own rule (measured: Q8 axisymmetric 3x3 12 s, 4x4 100 s; Q4 general 4x4 78 s)
SYMBOLIC_POINT_LIMIT = 9
#: the same with numeric nodes but symbolic E, nu or t (measured: Q9 6x6 28 s, 10x10 142 s;
#: with numeric material too, 10x10 takes about 10 s and is not limited)
SYMBOLIC_MATERIAL_POINT_LIMIT = 25
#: longest piece of user text echoed in a message
ECHO_LIMIT = 40

_DECIMAL = re.compile(r"[+-]?(?:(\d+)(?:\.(\d*))?|\.(\d+))(?:[eE]([+-]?)(\d+))?")
_FRACTION = re.compile(r"([+-]?\d+)\s*/\s*([+-]?\d+)")
_LITERAL_HELP = "write e.g. 0.3, 210e9 or 1/3"


def echo(text: str, limit: int = ECHO_LIMIT) -> str:
    """User text for a message: repr, shortened in the middle when long (never the whole of a huge line)."""
    text = str(text)
    if len(text) <= limit:
        return repr(text)
    head, tail = text[: limit * 2 // 3], text[-(limit // 3):]
    return repr(head + "..." + tail) + f" ({len(text)} characters)"


def magnitude_text() -> str:
    return f"0 or between {_sci(MAGNITUDE[0])} and {_sci(MAGNITUDE[1])} in magnitude"


def _sci(v: float) -> str:
    """1e-30, 1e30, 1e-06 -> 1e-6 (no '+' or leading zeros in the exponent)."""
    text = f"{v:g}"
    if "e" in text:
        mant, exp = text.split("e")
        text = f"{mant}e{int(exp)}"
    return text


def parse_literal(value: str, where: str, magnitude: bool = True) -> sp.Rational:
    """A decimal, exponent or p/q literal as an exact rational within the documented limits
    (``magnitude=False``: the caller checks the range itself, e.g. a tolerance's interval)."""
    v = str(value).strip()
    m = _FRACTION.fullmatch(v)
    if m:
        p, q = m.group(1), m.group(2)
        if max(len(p.lstrip("+-")), len(q.lstrip("+-"))) > MAX_DIGITS:
            raise InputError(f"{where}: {echo(value)} has too many digits (at most {MAX_DIGITS} in p and in q)")
        if int(q) == 0:
            raise InputError(f"{where}: {echo(value)} divides by zero; the denominator must not be 0")
        num = sp.Rational(int(p), int(q))
    else:
        m = _DECIMAL.fullmatch(v)
        if not m:
            hint = " (no '_' separators)" if "_" in v else ""
            raise InputError(f"{where}: {echo(value)} is not a number{hint}; {_LITERAL_HELP}")
        digits = len(m.group(1) or "") + len(m.group(2) or "") + len(m.group(3) or "")
        if digits > MAX_DIGITS:
            raise InputError(f"{where}: {echo(value)} has too many digits (at most {MAX_DIGITS})")
        if m.group(5) is not None and len(m.group(5).lstrip("0")) > MAX_EXPONENT_DIGITS:
            raise InputError(f"{where}: {echo(value)} has too large an exponent (at most {MAX_EXPONENT_DIGITS} "
                             f"digits); values must be {magnitude_text()}")
        num = sp.Rational(v.lower().replace("e+", "e"))
    return check_magnitude(num, where, value) if magnitude else num


_WHOLE = re.compile(r"[+-]?\d{1,9}")


def parse_whole(text, where: str, low: int = 1, high: int = 4096) -> int:
    """A whole number written with digits only (no '_', at most 9 digits) within [low, high]."""
    v = str(text).strip()
    if not _WHOLE.fullmatch(v):
        raise InputError(f"{where}: {echo(text)} is not a whole number (digits only, e.g. 4)")
    n = int(v)
    if not low <= n <= high:
        raise InputError(f"{where} must be between {low} and {high}; got {n}")
    return n


def whole_number(text: str) -> int:
    """argparse ``type=`` for a positive whole number (the range is the caller's to check)."""
    import argparse
    v = str(text).strip()
    if not _WHOLE.fullmatch(v):
        raise argparse.ArgumentTypeError(f"{echo(text)} is not a whole number (digits only, e.g. 2)")
    return int(v)


def check_magnitude(num, where: str, shown=None):
    """Refuse a non-zero value outside :data:`MAGNITUDE` (and anything not finite)."""
    shown = num if shown is None else shown
    if isinstance(num, sp.Basic):
        if not num.is_finite or not num.is_real:
            raise InputError(f"{where}: {echo(shown)} is not a finite number")
        if num != 0 and not (sp.Rational(repr(MAGNITUDE[0])) <= abs(num) <= sp.Rational(repr(MAGNITUDE[1]))):
            raise InputError(f"{where}: {echo(shown)} is out of range; values must be {magnitude_text()}")
        return num
    f = float(num)
    if not math.isfinite(f):
        raise InputError(f"{where}: {echo(shown)} is not a finite number")
    if f != 0 and not MAGNITUDE[0] <= abs(f) <= MAGNITUDE[1]:
        raise InputError(f"{where}: {echo(shown)} is out of range; values must be {magnitude_text()}")
    return num


def check_positive(value, name: str, what: str = "") -> None:
    """A numeric value that must be finite and > 0 (symbols pass: they are checked when given)."""
    if value is None or not _is_number(value):
        return
    try:
        f = float(value)
    except (TypeError, ValueError):
        raise InputError(f"{name} = {echo(value)} is not a real number") from None
    if not math.isfinite(f) or f <= 0:
        label = f"{what} {name}" if what else name
        raise InputError(f"{label.strip()} = {_fmt(value)} is not allowed; {name} must be a finite number > 0")


def check_array_positive(value, name: str, what: str = "") -> None:
    """Like :func:`check_positive` for a scalar or an array of values (batch arguments)."""
    if value is None or isinstance(value, sp.Basic):
        check_positive(value, name, what)
        return
    if isinstance(value, (bool, np.bool_)) or isinstance(value, (str, bytes)):
        raise InputError(f"{name} must be a real number, got {type(value).__name__}")
    try:
        arr = np.asarray(value, dtype=float)
    except (TypeError, ValueError):
        raise InputError(f"{name} must be a real number (or an array of them), got {type(value).__name__}") from None
    bad = ~np.isfinite(arr) | (arr <= 0)
    if np.any(bad):
        first = arr.ravel()[int(np.argmax(bad.ravel()))]
        label = f"{what} {name}" if what else name
        raise InputError(f"{label.strip()} = {first:g} is not allowed; {name} must be a finite number > 0")


def check_tolerance(value, kind: str, option: str = "--tol") -> float:
    """A tolerance (a number, or the text of one) inside its open interval :data:`TOLERANCES` [kind]."""
    lo, hi = TOLERANCES[kind]
    if isinstance(value, str):
        value = parse_literal(value, option, magnitude=False)
    try:
        f = float(value)
    except (TypeError, ValueError):
        raise InputError(f"{option}: {echo(value)} is not a number") from None
    if not (math.isfinite(f) and lo < f < hi):
        raise InputError(f"{option} = {_fmt(value)} is outside the allowed open interval "
                         f"({_sci(lo)}, {_sci(hi)})")
    return f


def tolerance_help(kind: str) -> str:
    lo, hi = TOLERANCES[kind]
    return f"{_sci(lo)} < tol < {_sci(hi)}"


def check_aspect(value, where: str = "aspect ratio") -> float:
    """The bending aspect ratio r = a/b within :data:`ASPECT_RANGE` (inclusive)."""
    lo, hi = ASPECT_RANGE
    try:
        f = float(value)
    except (TypeError, ValueError, OverflowError):
        raise InputError(f"{where}: {echo(value)} is not a number") from None
    if not (math.isfinite(f) and lo <= f <= hi):
        raise InputError(f"{where} r = {_fmt(value)} is out of range; allowed: {_sci(lo)} <= r <= {_sci(hi)}")
    return f


def check_symbolic_points(npoints: int, rule: str, where: str, own: int = 0, geometry_symbolic: bool = True) -> None:
    """Refuse symbolic point-route integration beyond :data:`SYMBOLIC_POINT_LIMIT` points per
    term with symbolic geometry, :data:`SYMBOLIC_MATERIAL_POINT_LIMIT` with numeric nodes and a
    symbolic material (or the element's own rule's ``own`` points, when larger)."""
    limit = max(SYMBOLIC_POINT_LIMIT if geometry_symbolic else SYMBOLIC_MATERIAL_POINT_LIMIT, own)
    if npoints > limit:
        what = "symbolic geometry" if geometry_symbolic else "numeric nodes with a symbolic material"
        hint = ("give numeric nodes (--nodes) and material (--set E=..,nu=..,t=..)" if geometry_symbolic
                else "give the material as numbers (--set E=..,nu=..,t=..)")
        raise InputError(f"{where}: rule {rule} has {npoints} points; on {what} the limit is {limit} points per term "
                         f"(each point adds an unsimplified copy of the integrand); {hint} or use a rule with "
                         "fewer points")


def _is_number(v) -> bool:
    if isinstance(v, sp.Basic):
        return bool(v.is_number)
    return isinstance(v, (int, float, np.integer, np.floating)) and not isinstance(v, bool)


def _fmt(v) -> str:
    try:
        f = float(v)
    except (TypeError, ValueError, OverflowError):
        return echo(v)
    return f"{f:g}" if math.isfinite(f) or isinstance(v, float) else echo(v)
