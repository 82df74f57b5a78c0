"""Matrix input: full matrices, indexed entries, LaTeX environments, .npy/.csv/.tex files."""
from __future__ import annotations

import os
import re
from dataclasses import dataclass
from pathlib import Path
from typing import Iterable

import numpy as np
import sympy as sp

from ..errors import InputError, ParseError
from ..files import regular_file_size
from . import latex, mathexpr
from ._core import (FUNCTIONS, MAX_EXPRESSION_CHARS, MAX_FILE_BYTES, MAX_MATRIX_DIM,
                    MAX_NPY_BYTES, MAX_TEXT_CHARS, MAX_TOKENS, MAX_TOTAL_TOKENS, Builder, Token,
                    fail, guarded)

_HEADER_RE = re.compile(r"^\s*[#%]\s*index[-_ ]?base\b\s*[:=]?\s*(\S*)\s*$", re.IGNORECASE)
_NAME_ONLY_RE = re.compile(r"^\s*([A-Za-z][A-Za-z0-9]*)\s*=\s*$")
_ENTRY_RE = re.compile(r"^\s*([A-Za-z][A-Za-z0-9]*)\s*([\[(])\s*([0-9]+)\s*,\s*([0-9]+)\s*([\])])\s*=")
_LATEX_HINT_RE = re.compile(r"\\|&|\$|_\{")


@dataclass
class MatrixInput:
    """A user-supplied matrix.

    ``kind`` is ``"full"`` (``data`` holds every row) or ``"entries"`` (``entries`` maps
    0-based ``(row, col)`` to an expression; ``rows``/``cols`` are the largest index + 1, a
    lower bound).  ``index_base`` is the base the user's indices were written in (declared
    by a ``# index-base: N`` header, else detected); None for full matrices.  ``syntax`` is
    ``"math"``, ``"latex"`` or ``"numeric"`` (numbers only; for a full numeric matrix
    ``array`` holds the float64 values).  ``name`` is the matrix name if one was written.
    """
    kind: str
    rows: int | None
    cols: int | None
    data: list[list[sp.Expr]] | None
    entries: dict[tuple[int, int], sp.Expr] | None
    index_base: int | None
    syntax: str
    array: np.ndarray | None = None
    name: str | None = None
    index_base_declared: bool = False

    def to_matrix(self, *, symmetric: bool = False, fill: sp.Expr | None = None) -> sp.Matrix:
        """sympy Matrix. For ``entries``: a missing (i, j) is taken from (j, i) if
        ``symmetric``, else ``fill``; without either, a missing entry is an InputError."""
        if self.kind == "full":
            return sp.Matrix(self.data)
        rows = cols = max(self.rows or 0, self.cols or 0) if symmetric else None
        rows = rows or self.rows or 0
        cols = cols or self.cols or 0
        out = []
        missing = []
        for i in range(rows):
            row = []
            for j in range(cols):
                value = self.entries.get((i, j))
                if value is None and symmetric:
                    value = self.entries.get((j, i))
                if value is None:
                    value = fill
                if value is None:
                    missing.append((i, j))
                    value = sp.Integer(0)
                row.append(value)
            out.append(row)
        if missing:
            base = self.index_base or 0
            shown = ", ".join(f"({i + base},{j + base})" for i, j in missing[:5])
            more = "" if len(missing) <= 5 else f" and {len(missing) - 5} more"
            raise InputError(f"{len(missing)} entries of the {rows}x{cols} matrix are missing: "
                             f"{shown}{more}; give them or pass symmetric=True / fill=0")
        return sp.Matrix(out)


# --------------------------------------------------------------------------- helpers
def _preprocess(text: str) -> tuple[str, int | None]:
    """Find the index-base header, drop '#' comments (columns are preserved)."""
    if not isinstance(text, str):
        raise InputError("matrix input must be text")
    if len(text) > MAX_TEXT_CHARS:
        raise InputError(f"matrix input longer than {MAX_TEXT_CHARS} characters")
    declared = None
    declared_line = None
    lines = text.replace("\r\n", "\n").replace("\r", "\n").split("\n")
    out = []
    for lineno, line in enumerate(lines, 1):
        m = _HEADER_RE.match(line)
        if m:
            value = m.group(1)
            if value not in ("0", "1"):
                raise ParseError("index-base must be 0 or 1, as in '# index-base: 1'", lineno,
                                 m.start(1) + 1, value)
            if declared is not None and int(value) != declared:
                raise ParseError(f"conflicting index-base headers (line {declared_line} says "
                                 f"{declared})", lineno, m.start(1) + 1, value)
            declared, declared_line = int(value), lineno
            out.append("")
            continue
        hash_pos = line.find("#")
        out.append(line if hash_pos < 0 else line[:hash_pos])
    return "\n".join(out), declared


class _Budget:
    def __init__(self):
        self.used = 0

    def spend(self, count: int, tok: Token | None) -> None:
        self.used += count
        if self.used > MAX_TOTAL_TOKENS:
            raise fail(f"matrix input has more than {MAX_TOTAL_TOKENS} tokens", tok)


def _check_dims(rows: int, cols: int, tok: Token | None = None, line: int | None = None) -> None:
    if rows > MAX_MATRIX_DIM or cols > MAX_MATRIX_DIM:
        raise fail(f"matrix larger than {MAX_MATRIX_DIM}x{MAX_MATRIX_DIM}", tok, line=line)


def _check_entry(tokens: list[Token], budget: _Budget) -> None:
    if len(tokens) > MAX_TOKENS:
        raise fail(f"entry has more than {MAX_TOKENS} tokens", tokens[0])
    if tokens[-1].line == tokens[0].line and tokens[-1].end_col - tokens[0].col > MAX_EXPRESSION_CHARS:
        raise fail(f"entry longer than {MAX_EXPRESSION_CHARS} characters", tokens[0])
    budget.spend(len(tokens), tokens[0])


def _end_of(tokens: list[Token], fallback: Token | None = None) -> tuple[int, int]:
    last = tokens[-1] if tokens else fallback
    return (last.line, last.end_col) if last is not None else (1, 1)


def _all_numeric(values: Iterable[sp.Expr]) -> bool:
    return all(v.is_Rational for v in values)


def _normalise_entries(raw, declared: int | None):
    """raw: list of (i, j, expr, tok). Returns (entries, base, rows, cols)."""
    smallest = min(min(i, j) for i, j, _, _ in raw)
    if declared is not None:
        base = declared
        if declared == 1 and smallest == 0:
            tok = next(t for i, j, _, t in raw if min(i, j) == 0)
            raise fail("index 0 found but the header declares index-base 1", tok)
    else:
        base = 0 if smallest == 0 else 1
    entries: dict[tuple[int, int], sp.Expr] = {}
    where: dict[tuple[int, int], int] = {}
    for i, j, expr, tok in raw:
        key = (i - base, j - base)
        if key in entries:
            raise fail(f"entry ({i},{j}) given twice (first at line {where[key]})", tok)
        if key[0] >= MAX_MATRIX_DIM or key[1] >= MAX_MATRIX_DIM:
            raise fail(f"index ({i},{j}) beyond the {MAX_MATRIX_DIM}x{MAX_MATRIX_DIM} limit", tok)
        entries[key] = expr
        where[key] = tok.line
    rows = max(i for i, _ in entries) + 1
    cols = max(j for _, j in entries) + 1
    return entries, base, rows, cols


def _parse_index(text: str, tok: Token) -> int:
    if len(text) > 4:
        raise fail(f"index {text} beyond the {MAX_MATRIX_DIM}x{MAX_MATRIX_DIM} limit", tok)
    return int(text)


# --------------------------------------------------------------------------- math syntax
def _joins(a: Token, b: Token, c: Token | None) -> bool:
    """Whitespace between tokens a and b does NOT separate entries when this is True."""
    if a.kind == "OP":
        return True
    if b.kind == "OP" and b.value in "*/^":
        return True
    if b.kind == "OP" and b.value in "+-":
        return c is None or c.space_before
    return a.kind == "NAME" and a.text in FUNCTIONS and b.kind == "LPAR"


def _split_whitespace(tokens: list[Token]) -> list[list[Token]]:
    groups = [[tokens[0]]]
    depth = 0
    for k in range(1, len(tokens)):
        a, b = tokens[k - 1], tokens[k]
        depth += (a.kind == "LPAR") - (a.kind == "RPAR")
        c = tokens[k + 1] if k + 1 < len(tokens) else None
        if b.space_before and depth <= 0 and not _joins(a, b, c):
            groups.append([b])
        else:
            groups[-1].append(b)
    return groups


def _split_commas(tokens: list[Token]) -> list[list[Token]]:
    groups: list[list[Token]] = [[]]
    commas: list[Token] = []
    depth = 0
    for tok in tokens:
        depth += (tok.kind == "LPAR") - (tok.kind == "RPAR")
        if tok.kind == "COMMA" and depth <= 0:
            groups.append([])
            commas.append(tok)
        else:
            groups[-1].append(tok)
    if len(groups) > 1 and not groups[-1]:
        groups.pop()                                   # one trailing comma is allowed
    for k, group in enumerate(groups):
        if not group:
            at = commas[k] if k < len(commas) else commas[k - 1]
            raise fail("empty matrix entry between commas", at)
    return groups


def _parse_math_matrix(cleaned: str, declared: int | None, builder: Builder, *,
                       force_commas: bool = False) -> MatrixInput:
    lines = cleaned.split("\n")
    content = [(lineno, s) for lineno, s in enumerate(lines, 1) if s.strip()]
    if not content:
        raise InputError("no matrix found: the input is empty (only blank lines or comments)")
    name = None
    m = _NAME_ONLY_RE.match(content[0][1])
    if m and len(content) > 1:
        name = m.group(1)
        content = content[1:]
    budget = _Budget()
    if any(_ENTRY_RE.match(s) for _, s in content):
        return _parse_math_entries(content, declared, builder, budget)
    rows: list[list[sp.Expr]] = []
    row_lines: list[int] = []
    tokenized = []
    for lineno, s in content:
        toks, _ = mathexpr.tokenize(s, lineno, 1, max_chars=MAX_TEXT_CHARS,
                                    max_tokens=MAX_TOTAL_TOKENS)
        tokenized.append((lineno, toks))
    commas = force_commas or any(t.kind == "COMMA" for _, toks in tokenized for t in toks)
    for lineno, toks in tokenized:
        groups = _split_commas(toks) if commas else _split_whitespace(toks)
        row = []
        for group in groups:
            _check_entry(group, budget)
            row.append(mathexpr.parse_tokens(group, builder, _end_of(group)))
        if rows and len(row) != len(rows[0]):
            raise ParseError(f"row {len(rows) + 1} has {len(row)} entries but row 1 (line "
                             f"{row_lines[0]}) has {len(rows[0])}; all rows must have the same "
                             "length" + ("" if commas else
                                         " (entries are separated by spaces; write 1 - nu or "
                                         "1-nu, not 1 -nu, for one entry)"),
                             lineno, toks[0].col, toks[0].text)
        rows.append(row)
        row_lines.append(lineno)
        _check_dims(len(rows), len(row), line=lineno)
    syntax = "numeric" if _all_numeric(v for r in rows for v in r) else "math"
    result = MatrixInput("full", len(rows), len(rows[0]), rows, None, None, syntax, name=name,
                         index_base_declared=declared is not None)
    if syntax == "numeric":
        result.array = np.array([[float(v) for v in r] for r in rows], dtype=float)
    return result


def _parse_math_entries(content, declared, builder, budget) -> MatrixInput:
    raw = []
    name = None
    for lineno, s in content:
        m = _ENTRY_RE.match(s)
        first_col = len(s) - len(s.lstrip()) + 1
        if not m:
            word = s.split()[0]
            raise ParseError("expected 'K[i,j] = expression' (one entry per line once any line "
                             "uses this form)", lineno, first_col, word)
        head = Token("NAME", m.group(1), lineno, first_col)
        if (m.group(2), m.group(5)) not in (("[", "]"), ("(", ")")):
            raise fail("mismatched brackets around the indices; use K[i,j] or K(i,j)", head,
                       token=s[m.start(2):m.end(5)])
        if name is None:
            name = m.group(1)
        elif m.group(1) != name:
            raise fail(f"matrix name '{m.group(1)}' differs from '{name}' used before", head)
        i = _parse_index(m.group(3), head)
        j = _parse_index(m.group(4), head)
        toks, end = mathexpr.tokenize(s[m.end():], lineno, m.end() + 1)
        if not toks:
            raise ParseError("missing expression after '='", lineno, m.end(), "=")
        _check_entry(toks, budget)
        raw.append((i, j, mathexpr.parse_tokens(toks, builder, end), head))
    entries, base, rows, cols = _normalise_entries(raw, declared)
    syntax = "numeric" if _all_numeric(entries.values()) else "math"
    return MatrixInput("entries", rows, cols, None, entries, base, syntax, name=name,
                       index_base_declared=declared is not None)


# --------------------------------------------------------------------------- LaTeX syntax
def _latex_entry(tokens: list[Token], builder: Builder, end: tuple[int, int], budget: _Budget):
    _check_entry(tokens, budget)
    return latex.parse_tokens(tokens, builder, end)


def _parse_latex_matrix(cleaned: str, declared: int | None, builder: Builder) -> MatrixInput:
    tokens, end = latex.tokenize(cleaned, 1, 1, extra_names=builder.extra,
                                 max_chars=MAX_TEXT_CHARS, max_tokens=MAX_TOTAL_TOKENS)
    tokens = [t for t in tokens if t.kind not in ("DOLLAR", "MATHDELIM")
              and not (t.kind in ("BEGIN", "END") and t.value not in latex._MATRIX_ENVS)]
    if not tokens:
        raise InputError("no matrix found: the input is empty (only blank lines or comments)")
    begins = [k for k, t in enumerate(tokens) if t.kind == "BEGIN"]
    if begins:
        return _parse_latex_environment(tokens, begins, builder, end)
    return _parse_latex_entries(tokens, declared, builder, end)


def _parse_latex_environment(tokens, begins, builder, end) -> MatrixInput:
    budget = _Budget()
    k0 = begins[0]
    begin = tokens[k0]
    if len(begins) > 1:
        raise fail("only one matrix environment is allowed (nested or repeated \\begin)",
                   tokens[begins[1]])
    k1 = next((k for k in range(k0 + 1, len(tokens)) if tokens[k].kind == "END"), None)
    if k1 is None:
        raise fail(f"\\begin{{{begin.value}}} without \\end{{{begin.value}}}", begin)
    if tokens[k1].value != begin.value:
        raise fail(f"\\end{{{tokens[k1].value}}} does not match \\begin{{{begin.value}}}", tokens[k1])
    before, body, after = tokens[:k0], tokens[k0 + 1:k1], tokens[k1 + 1:]
    if len([k for k in range(k1 + 1, len(tokens)) if tokens[k].kind == "END"]):
        raise fail("unexpected \\end after the matrix", next(t for t in after if t.kind == "END"))
    eqs = [k for k, t in enumerate(before) if t.kind == "EQ"]
    name = None
    if len(eqs) > 1:
        raise fail("more than one '=' before the matrix", before[eqs[1]])
    if eqs:
        lhs = before[:eqs[0]]
        name = "".join(t.text for t in lhs) or None
        before = before[eqs[0] + 1:]
    if before and before[-1].kind == "LPAR":
        opener = before.pop()
        if not after or after[0].kind != "RPAR" or after[0].value != latex._PAIR[opener.value]:
            raise fail(f"'{opener.text}' before the matrix needs a matching closer after "
                       f"\\end{{{begin.value}}}", opener)
        after = after[1:]
    if before and before[-1].kind == "OP" and before[-1].value == "*":
        before.pop()
    if after:
        raise fail(f"unexpected '{after[0].text}' after \\end{{{begin.value}}}", after[0])
    prefactor = None
    if before:
        prefactor = _latex_entry(before, builder, (begin.line, begin.col), budget)
    body = [t for t in body if not (t.kind == "CMD" and t.value == "hline")]
    # each entry: (tokens, the token just before it: \begin, '&' or '\\')
    rows_tokens: list[list[tuple[list[Token], Token]]] = [[([], begin)]]
    for tok in body:
        if tok.kind == "ROWSEP":
            rows_tokens.append([([], tok)])
        elif tok.kind == "AMP":
            rows_tokens[-1].append(([], tok))
        else:
            rows_tokens[-1][-1][0].append(tok)
    if len(rows_tokens) > 1 and len(rows_tokens[-1]) == 1 and not rows_tokens[-1][0][0]:
        rows_tokens.pop()                       # trailing \\ before \end
    rows: list[list[sp.Expr]] = []
    for r, row_tokens in enumerate(rows_tokens, 1):
        row = []
        for entry, before_entry in row_tokens:
            if not entry:
                raise fail(f"empty entry in row {r} of the matrix (after '{before_entry.text}')",
                           before_entry)
            value = _latex_entry(entry, builder, _end_of(entry), budget)
            if prefactor is not None:
                value = builder.product([prefactor, value], entry[0])
            row.append(value)
        first = row_tokens[0][0][0]
        if rows and len(row) != len(rows[0]):
            raise fail(f"row {r} has {len(row)} entries but row 1 has {len(rows[0])}; all rows "
                       "must have the same length", first)
        rows.append(row)
        _check_dims(len(rows), len(row), first)
    return MatrixInput("full", len(rows), len(rows[0]), rows, None, None, "latex", name=name)


def _latex_lhs_at(tokens: list[Token], k: int):
    """Match 'K_{ij} =' / 'K_{i,j} &=' at position k; return (i, j, name_token, next_k) or None."""
    n = len(tokens)
    if k + 2 >= n or tokens[k].kind != "LETTER" or tokens[k + 1].kind != "OP" \
            or tokens[k + 1].value != "_":
        return None
    m = k + 2
    if tokens[m].kind == "NUM":
        inside = [tokens[m]]
        m += 1
    elif tokens[m].kind == "LBRACE":
        close = next((q for q in range(m + 1, min(n, m + 6)) if tokens[q].kind == "RBRACE"), None)
        if close is None:
            return None
        inside = tokens[m + 1:close]
        m = close + 1
    else:
        return None
    if m < n and tokens[m].kind == "AMP":
        m += 1
    if m >= n or tokens[m].kind != "EQ":
        return None
    head = tokens[k]
    if not inside or any(t.kind not in ("NUM", "COMMA") for t in inside) \
            or any(t.kind == "NUM" and not t.text.isdigit() for t in inside):
        raise fail("entry indices must be digits, as in K_{11} or K_{1,12}", head)
    commas = [q for q, t in enumerate(inside) if t.kind == "COMMA"]
    if commas:
        if len(inside) != 3 or commas != [1]:
            raise fail("write two indices separated by one comma, as in K_{1,12}", head)
        i, j = _parse_index(inside[0].text, head), _parse_index(inside[2].text, head)
    else:
        digits = "".join(t.text for t in inside)
        if len(digits) != 2:
            raise fail(f"ambiguous indices '{digits}': write K_{{i,j}} with a comma when an "
                       "index has more than one digit", head)
        i, j = int(digits[0]), int(digits[1])
    return i, j, head, m + 1


def _parse_latex_entries(tokens, declared, builder, end) -> MatrixInput:
    budget = _Budget()
    starts = []
    k = 0
    while k < len(tokens):
        hit = _latex_lhs_at(tokens, k)
        if hit:
            starts.append((k, hit))
            k = hit[3]
        else:
            k += 1
    if not starts or starts[0][0] != 0:
        raise fail("expected a matrix environment \\begin{pmatrix}...\\end{pmatrix} or entries "
                   "like K_{11} = ...", tokens[0])
    raw = []
    name = tokens[0].text
    for q, (k, (i, j, head, rhs_start)) in enumerate(starts):
        if head.text != name:
            raise fail(f"matrix name '{head.text}' differs from '{name}' used before", head)
        stop = starts[q + 1][0] if q + 1 < len(starts) else len(tokens)
        rhs = tokens[rhs_start:stop]
        while rhs and rhs[-1].kind in ("ROWSEP", "COMMA", "SEMI", "AMP"):
            rhs.pop()
        if not rhs:
            raise fail("missing expression after '='", tokens[rhs_start - 1])
        raw.append((i, j, _latex_entry(rhs, builder, _end_of(rhs), budget), head))
    entries, base, rows, cols = _normalise_entries(raw, declared)
    return MatrixInput("entries", rows, cols, None, entries, base, "latex", name=name,
                       index_base_declared=declared is not None)


# --------------------------------------------------------------------------- public
def _dispatch(text: str, builder: Builder, force: str | None) -> MatrixInput:
    cleaned, declared = _preprocess(text)
    syntax = force or ("latex" if _LATEX_HINT_RE.search(cleaned) else "math")
    if syntax == "latex":
        return _parse_latex_matrix(cleaned, declared, builder)
    return _parse_math_matrix(cleaned, declared, builder, force_commas=(syntax == "csv"))


@guarded
def parse_matrix_text(text: str, *, extra_symbols: Iterable[str] = ()) -> MatrixInput:
    """Parse a matrix written as text; the syntax (LaTeX or plain math) is auto-detected."""
    return _dispatch(text, Builder(extra_symbols), None)


def _load_npy(path: Path, size: int) -> MatrixInput:
    if size > MAX_NPY_BYTES:
        raise InputError(f"{path}: .npy file larger than {MAX_NPY_BYTES} bytes")
    fmt = np.lib.format
    try:
        with open(path, "rb") as fh:
            version = fmt.read_magic(fh)
            if version == (1, 0):
                shape, _fortran, dtype = fmt.read_array_header_1_0(fh)
            elif version == (2, 0):
                shape, _fortran, dtype = fmt.read_array_header_2_0(fh)
            else:
                raise InputError(f"{path}: unsupported .npy format version {version}")
    except InputError:
        raise
    except (ValueError, OSError, EOFError, SyntaxError, TypeError) as exc:
        raise InputError(f"{path}: not a valid .npy file ({type(exc).__name__})") from None
    if dtype.hasobject:
        raise InputError(f"{path}: object arrays are not accepted (they need pickle); save a "
                         "numeric array")
    if dtype.kind not in "iuf":
        raise InputError(f"{path}: .npy array must be numeric (integer or float), got dtype {dtype}")
    if len(shape) != 2:
        raise InputError(f"{path}: .npy array must be 2-D, got shape {shape}")
    if not (0 < shape[0] <= MAX_MATRIX_DIM and 0 < shape[1] <= MAX_MATRIX_DIM):
        raise InputError(f"{path}: matrix shape {shape} outside 1..{MAX_MATRIX_DIM} per side")
    try:
        arr = np.load(path, allow_pickle=False)
    except (ValueError, OSError, EOFError) as exc:
        raise InputError(f"{path}: could not read the .npy data ({type(exc).__name__})") from None
    if not np.all(np.isfinite(arr)):
        raise InputError(f"{path}: the array contains NaN or infinity")
    if arr.dtype.kind == "f":
        data = [[sp.Float(float(v)) for v in row] for row in arr]
    else:
        data = [[sp.Integer(int(v)) for v in row] for row in arr]
    return MatrixInput("full", int(arr.shape[0]), int(arr.shape[1]), data, None, None, "numeric",
                       array=np.asarray(arr, dtype=float))


@guarded
def load_matrix_file(path, *, extra_symbols: Iterable[str] = ()) -> MatrixInput:
    """Load a matrix from ``.npy``, ``.csv``, ``.tex`` or a text file (syntax auto-detected)."""
    p = Path(os.fspath(path))
    size = regular_file_size(p, "matrix file", "a text, .csv, .tex or .npy file")
    if size == 0:
        raise InputError(f"matrix file is empty: {p}")
    try:
        with open(p, "rb") as fh:
            head = fh.read(8)
    except PermissionError:
        raise InputError(f"{p}: permission denied: the matrix file is not readable") from None
    except OSError as exc:
        raise InputError(f"{p}: cannot read the matrix file ({exc.strerror or type(exc).__name__})") from None
    if head.startswith(b"\x93NUMPY"):
        return _load_npy(p, size)
    suffix = p.suffix.lower()
    if suffix == ".npy":
        raise InputError(f"{p}: not a .npy file (missing the NUMPY header)")
    if size > MAX_FILE_BYTES:
        raise InputError(f"{p}: file larger than {MAX_FILE_BYTES} bytes")
    try:
        with open(p, "rb") as fh:
            raw = fh.read(MAX_FILE_BYTES + 1)
    except OSError as exc:
        raise InputError(f"{p}: cannot read the matrix file ({exc.strerror or type(exc).__name__})") from None
    if b"\x00" in raw:
        raise InputError(f"{p}: binary file; expected text, .csv or .npy")
    try:
        text = raw.decode("utf-8-sig")
    except UnicodeDecodeError:
        raise InputError(f"{p}: not UTF-8 text; expected text, .csv or .npy") from None
    if not text.strip():
        raise InputError(f"matrix file is empty: {p}")
    force = {".csv": "csv", ".tex": "latex"}.get(suffix)
    return _dispatch(text, Builder(extra_symbols), force)
