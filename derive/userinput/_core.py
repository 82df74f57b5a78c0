"""Shared pieces of the safe parsers: limits, tokens and the whitelisted expression builder.

Nothing here ever turns text into code: tokens are produced by hand-written scanners and
every sympy object is constructed explicitly (``sympy.Integer``, ``sympy.Rational``,
``sympy.Add``, ``sympy.Mul``, ``sympy.Pow`` and a fixed table of functions).
"""
from __future__ import annotations

import keyword
import time
from dataclasses import dataclass
from typing import Iterable

import sympy as sp

from ..errors import InputError, ParseError
from ..symbols import by_name, lookup

# --------------------------------------------------------------------------- limits
#: largest matrix text (characters) or text file (bytes) accepted
MAX_TEXT_CHARS = 200_000
#: largest text file on disk, checked before reading it
MAX_FILE_BYTES = 200_000
#: largest ``.npy`` file on disk
MAX_NPY_BYTES = 2_000_000
#: longest single expression (one matrix entry, one call of parse_expression)
MAX_EXPRESSION_CHARS = 20_000
#: most tokens in one expression
MAX_TOKENS = 5_000
#: most tokens in one matrix text (all entries together)
MAX_TOTAL_TOKENS = 200_000
#: deepest nesting of brackets, function calls and exponents
MAX_DEPTH = 50
#: most digits in one number literal (integer and fraction digits together)
MAX_INTEGER_DIGITS = 50
#: largest |numerator| and denominator of an exponent (also |n| in 1e<n>)
MAX_EXPONENT = 64
#: most decimal digits of any integer produced while folding numbers (``2^64``, products)
MAX_RESULT_DIGITS = 200
#: most rows and most columns of a matrix
MAX_MATRIX_DIM = 200
#: deepest nesting of function calls (sympy evaluates functions of constants eagerly)
MAX_FUNCTION_DEPTH = 4
#: wall-clock budget of one public call (a parse of one expression or one matrix)
MAX_SECONDS = 5.0

_MAX_RESULT_BITS = int(MAX_RESULT_DIGITS * 3.3219280948873626) + 1

# --------------------------------------------------------------------------- whitelist
FUNCTIONS = {
    "sqrt": sp.sqrt, "sin": sp.sin, "cos": sp.cos, "tan": sp.tan, "exp": sp.exp,
    "log": sp.log, "ln": sp.log, "sinh": sp.sinh, "cosh": sp.cosh, "tanh": sp.tanh,
    "atan": sp.atan, "asin": sp.asin, "acos": sp.acos, "abs": sp.Abs,
}
CONSTANTS = {"pi": sp.pi}
ALLOWED_NAMES_TEXT = ("xi, eta, zeta, x, y, z, a, b, c, r, R, E, nu, t, nodal x1, y1, x2, ..., pi")
FUNCTIONS_TEXT = "sqrt, sin, cos, tan, exp, log (ln), sinh, cosh, tanh, atan, asin, acos, abs"


@dataclass(frozen=True, slots=True)
class Token:
    """One lexical token: ``kind`` (NUM, NAME, OP, ...), source ``text``, 1-based position."""
    kind: str
    text: str
    line: int
    col: int
    space_before: bool = False
    value: object = None

    @property
    def end_col(self) -> int:
        return self.col + len(self.text)


def fail(message: str, tok: Token | None = None, *, line: int | None = None,
         col: int | None = None, token: str | None = None) -> ParseError:
    """Build (not raise) a ParseError located at ``tok`` or at an explicit position."""
    if tok is not None:
        return ParseError(message, tok.line, tok.col, tok.text if token is None else token)
    return ParseError(message, line, col, token)


def show_char(ch: str) -> str:
    """Printable rendering of one offending character for messages."""
    if ch.isprintable() and not ch.isspace():
        return repr(ch)
    return f"U+{ord(ch):04X}"


def is_ascii_digit(ch: str) -> bool:
    return "0" <= ch <= "9"


def is_ascii_letter(ch: str) -> bool:
    return "a" <= ch <= "z" or "A" <= ch <= "Z"


#: Unicode characters users paste from typeset documents, mapped to plain tokens
UNICODE_OPERATORS = {"\u2212": "-", "\u00b7": "*", "\u22c5": "*", "\u00d7": "*"}
UNICODE_NAMES = {"\u03bd": "nu", "\u03be": "xi", "\u03b7": "eta", "\u03b6": "zeta", "\u03c0": "pi"}


def validate_extra_symbols(extra_symbols: Iterable[str]) -> dict[str, sp.Symbol]:
    """Check user-declared extra names (plain identifiers) and make their symbols."""
    if isinstance(extra_symbols, str):
        extra_symbols = extra_symbols.replace(",", " ").split()
    table: dict[str, sp.Symbol] = {}
    for name in extra_symbols:
        if not isinstance(name, str) or not name or len(name) > 32 \
                or not is_ascii_letter(name[0]) \
                or not all(is_ascii_letter(ch) or is_ascii_digit(ch) for ch in name):
            raise InputError(f"invalid extra symbol name {name!r}; use letters and digits, "
                             "starting with a letter (at most 32 characters)")
        if keyword.iskeyword(name) or name in FUNCTIONS or name in CONSTANTS:
            raise InputError(f"extra symbol name {name!r} is reserved (keyword, function or constant)")
        table[name] = lookup(name) or sp.Symbol(name)
    return table


def _bits(n: int) -> int:
    return abs(n).bit_length()


def _short(value: sp.Rational) -> str:
    return str(value) if max(_bits(value.p), _bits(value.q)) < 64 else "(huge)"


def scan_number(text: str, i: int, *, scientific: bool):
    """Scan a decimal literal starting at ``text[i]``; return (end, Rational) or raise.

    Errors are returned as ``(end, message)`` strings so callers can attach positions.
    Decimals are exact: ``0.25`` -> 1/4, ``1e-3`` -> 1/1000.
    """
    n = len(text)
    j = i
    while j < n and is_ascii_digit(text[j]):
        j += 1
    int_part = text[i:j]
    frac = ""
    has_point = False
    if j < n and text[j] == "." and (int_part or (j + 1 < n and is_ascii_digit(text[j + 1]))):
        has_point = True
        k = j + 1
        while k < n and is_ascii_digit(text[k]):
            k += 1
        frac = text[j + 1:k]
        j = k
    digits = int_part + frac
    if len(digits) > MAX_INTEGER_DIGITS:
        return j, f"number literal has more than {MAX_INTEGER_DIGITS} digits"
    exp10 = 0
    if scientific and j < n and text[j] in "eE":
        k = j + 1
        if k < n and text[k] in "+-":
            k += 1
        if k < n and is_ascii_digit(text[k]):
            if text[j] == "E" and not has_point:
                m = k
                while m < n and is_ascii_digit(text[m]):
                    m += 1
                return m, (f"ambiguous '{text[i:m]}': write {text[i:j]}e{text[j + 1:m]} for "
                           f"scientific notation or {text[i:j]}*E{text[j + 1:m]} for a product "
                           "with Young's modulus")
            m = k
            while m < n and is_ascii_digit(text[m]):
                m += 1
            exp_digits = text[k:m].lstrip("0") or "0"
            if len(exp_digits) > 3 or int(exp_digits) > MAX_EXPONENT:
                return m, (f"decimal exponent in '{text[i:m]}' is too large; "
                           f"at most {MAX_EXPONENT} in absolute value")
            exp10 = int(exp_digits) * (-1 if text[k - 1] == "-" else 1)
            j = m
    if j < n and text[j] == ".":
        return j + 1, "unexpected '.' after a number (attribute access and '1..2' are not allowed)"
    mantissa = int(digits) if digits else 0
    scale = len(frac) - exp10
    if scale >= 0:
        value = sp.Rational(mantissa, 10 ** scale)
    else:
        value = sp.Integer(mantissa * 10 ** (-scale))
    return j, value


class Builder:
    """Builds sympy objects from parsed pieces, enforcing the whitelist and size limits."""

    def __init__(self, extra_symbols: Iterable[str] = ()):
        self.extra = validate_extra_symbols(extra_symbols)
        self.fixed = by_name()
        self.function_depth = 0
        self.deadline = time.perf_counter() + MAX_SECONDS

    # ---- budgets
    def tick(self, tok: Token | None) -> None:
        if time.perf_counter() > self.deadline:
            raise fail(f"input too expensive: building it took more than {MAX_SECONDS:g} s", tok)

    def enter_function(self, tok: Token) -> None:
        self.function_depth += 1
        if self.function_depth > MAX_FUNCTION_DEPTH:
            raise fail(f"function calls nested deeper than {MAX_FUNCTION_DEPTH} levels", tok)

    def leave_function(self) -> None:
        self.function_depth -= 1

    # ---- names
    def allowed_text(self) -> str:
        text = ALLOWED_NAMES_TEXT
        if self.extra:
            text += ", " + ", ".join(sorted(self.extra))
        return text

    def resolve(self, name: str) -> sp.Expr | None:
        if name in CONSTANTS:
            return CONSTANTS[name]
        if name in self.extra:
            return self.extra[name]
        return lookup(name)

    # ---- numbers
    def check_size(self, expr: sp.Expr, tok: Token | None) -> sp.Expr:
        """Shallow check of a freshly built object: no huge numeric coefficient and no
        resulting power beyond the exponent limit (sympy combines (x^64)^64 into x^4096)."""
        items = (expr,) if not expr.args else (expr,) + expr.args
        for item in items:
            if item.is_Rational and (_bits(item.p) > _MAX_RESULT_BITS or _bits(item.q) > _MAX_RESULT_BITS):
                raise fail(f"number too large: results may have at most {MAX_RESULT_DIGITS} digits", tok)
            if item.is_Pow and item.exp.is_Rational and (abs(item.exp.p) > MAX_EXPONENT
                                                         or item.exp.q > MAX_EXPONENT):
                raise fail(f"resulting power {_short(item.exp)} exceeds the exponent limit: "
                           f"|numerator| and denominator at most {MAX_EXPONENT}", tok)
        return expr

    # ---- operations
    def power(self, base: sp.Expr, exponent: sp.Expr, tok: Token | None) -> sp.Expr:
        """``base ** exponent``; the exponent must be a small rational, checked before sympy sees it."""
        if not exponent.is_Rational:
            raise fail("exponent must be a rational number such as 2, -1 or 1/2 "
                       f"(numerator and denominator at most {MAX_EXPONENT})", tok)
        self.tick(tok)
        p, q = int(exponent.p), int(exponent.q)
        if abs(p) > MAX_EXPONENT or q > MAX_EXPONENT:
            raise fail(f"exponent {_short(exponent)} is too large: |numerator| and denominator may be at "
                       f"most {MAX_EXPONENT} (no power towers)", tok)
        self._check_power_growth(base, p, tok)
        if q != 1:
            self._check_constant_argument(base, f"a root ({exponent})", tok)
        if q != 1 and base.free_symbols and base.atoms(sp.Function):
            # sympy evaluates roots by asking the assumption system (is sin(...)^2
            # nonnegative?), at a cost that is unbounded for nested functions, and it does
            # so again whenever the power enters a product, so such roots are refused
            raise fail(f"a root ({exponent}) of an expression that contains a function (such "
                       "as sqrt(sin(x))) is not supported; roots of polynomials, rational "
                       "expressions and constants are", tok)
        value = self.check_size(sp.Pow(base, exponent), tok)
        if q != 1:
            self._check_real_constant(value, tok)
        return value

    @staticmethod
    def _check_constant_argument(arg: sp.Expr, what: str, tok: Token | None) -> None:
        """sympy evaluates functions and roots of constants eagerly; when the constant itself
        contains a function (sin(log(2)), sqrt(tanh(1) - 1)) that evaluation can take
        unbounded time, so such nested transcendental constants are refused."""
        if arg.free_symbols or arg.is_Rational:
            return
        if arg.atoms(sp.Function):
            raise fail(f"{what} of a constant that contains a function (such as sin(log(2))) is "
                       "not supported; nest functions only around expressions with symbols", tok)

    @staticmethod
    def _check_real_constant(value: sp.Expr, tok: Token | None) -> None:
        if value.free_symbols or value.is_Rational:
            return
        if value.has(sp.zoo, sp.nan, sp.oo, -sp.oo):
            raise fail("expression is undefined or infinite (tan(pi/2), log(0)?)", tok)
        number = value.evalf(15)
        if number.has(sp.I, sp.nan, sp.zoo, sp.oo, -sp.oo):
            raise fail("expression is not real (root, log, asin or acos of a number outside its "
                       "real domain?)", tok)

    def _check_power_growth(self, base: sp.Expr, p: int, tok: Token | None) -> None:
        if abs(p) <= 1:
            return
        atoms = (base,) if base.is_Rational else base.atoms(sp.Rational)
        bits = max((max(_bits(a.p), _bits(a.q)) for a in atoms), default=0)
        if bits * abs(p) > _MAX_RESULT_BITS:
            raise fail(f"power would produce a number with more than {MAX_RESULT_DIGITS} digits", tok)

    def product(self, factors: list[sp.Expr], tok: Token | None) -> sp.Expr:
        if len(factors) == 1:
            return factors[0]
        self.tick(tok)
        bits = sum(max(_bits(f.p), _bits(f.q)) for f in factors if f.is_Rational)
        if bits > 4 * _MAX_RESULT_BITS:
            raise fail(f"product would produce a number with more than {MAX_RESULT_DIGITS} digits", tok)
        return self.check_size(sp.Mul(*factors), tok)

    def reciprocal(self, expr: sp.Expr, tok: Token | None) -> sp.Expr:
        if expr.is_Number and expr.is_zero:
            raise fail("division by zero", tok)
        return sp.Pow(expr, -1)

    def total(self, terms: list[sp.Expr], tok: Token | None) -> sp.Expr:
        if len(terms) == 1:
            return terms[0]
        self.tick(tok)
        return self.check_size(sp.Add(*terms), tok)

    def negate(self, expr: sp.Expr, tok: Token | None) -> sp.Expr:
        return sp.Mul(sp.Integer(-1), expr)

    def call(self, fname: str, arg: sp.Expr, tok: Token | None) -> sp.Expr:
        func = FUNCTIONS[fname]
        self.tick(tok)
        if fname == "exp":
            # sympy rewrites exp(c*log(u)) as u**c: apply the power limits to c and u first
            for term in sp.Add.make_args(arg):
                coeff, rest = term.as_coeff_Mul()
                if rest.has(sp.log):
                    if not coeff.is_Rational or abs(coeff.p) > MAX_EXPONENT or coeff.q > MAX_EXPONENT:
                        raise fail("exp(c*log(u)) would become u^c with a too large exponent c; "
                                   f"|numerator| and denominator of c may be at most {MAX_EXPONENT}", tok)
                    self._check_power_growth(rest, int(coeff.p), tok)
        if fname == "sqrt":
            return self.power(arg, sp.Rational(1, 2), tok)
        self._check_constant_argument(arg, f"{fname}()", tok)
        if fname == "log" and arg.is_Number and arg.is_zero:
            raise fail("log(0) is undefined", tok)
        if arg.free_symbols:
            # sympy's automatic evaluation of functions of symbolic arguments asks the
            # assumption system questions (is tanh(...) real?) whose cost is unbounded for
            # nested arguments; build the function unevaluated (same object sympy returns
            # when there is nothing to simplify)
            return func(arg, evaluate=False)
        value = self.check_size(func(arg), tok)
        self._check_real_constant(value, tok)
        return value

    def finish(self, expr: sp.Expr, tok: Token | None) -> sp.Expr:
        """Final checks on a complete expression: finite and real-valued constants only."""
        if expr.has(sp.zoo, sp.nan, sp.oo, -sp.oo):
            raise fail("expression is undefined or infinite (division by zero, log(0), tan(pi/2)?)", tok)
        if expr.has(sp.I):
            raise fail("expression is not real (square root or log of a negative number?)", tok)
        return expr


def guarded(func):
    """Last line of defence for public entry points: anything unexpected while building
    sympy objects (RecursionError, MemoryError, sympy internals) becomes a ParseError."""
    import functools

    @functools.wraps(func)
    def wrapper(*args, **kwargs):
        try:
            return func(*args, **kwargs)
        except InputError:
            raise
        except RecursionError:
            raise ParseError("input is nested too deeply") from None
        except MemoryError:
            raise ParseError("input needs too much memory") from None
        except (ValueError, TypeError, ArithmeticError, AttributeError, KeyError,
                IndexError) as exc:
            raise ParseError(f"could not build the expression: {type(exc).__name__}") from exc
    return wrapper
