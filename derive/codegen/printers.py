"""Expression printers for the generated kernels (sympy's code printers, adapted).

Adaptations shared by all three languages:
* every number is printed as the float64 literal nearest to its exact value (shortest
  round-trip form, so output is byte-identical across runs and platforms);
* small integer powers become products (x*x), negative powers divisions, 1/2 powers sqrt;
* operation counting for the manifest (:func:`count_ops`).
"""
from __future__ import annotations

import sympy as sp
from sympy.printing.c import C99CodePrinter
from sympy.printing.fortran import FCodePrinter
from sympy.printing.pycode import PythonCodePrinter


def float_literal(value) -> str:
    """Shortest round-trip decimal of the float64 nearest to an exact sympy number."""
    v = float(sp.N(value, 30)) if not isinstance(value, float) else value
    text = repr(v)
    if text in ("inf", "-inf", "nan"):
        raise ValueError(f"non-finite constant {value} in a kernel")
    if "e" not in text and "." not in text:
        text += ".0"
    return text


def _int_power(printer, base, n: int) -> str:
    b = printer.parenthesize(base, sp.printing.precedence.PRECEDENCE["Mul"], strict=False)
    return "*".join([b] * n)


_LIT: dict = {}


def _literal(expr) -> str:
    hit = _LIT.get(expr)
    if hit is None:
        hit = _LIT[expr] = float_literal(expr)
    return hit


class _Common:
    """Mixin: numbers, powers and a fast path for sums and products.

    Sums and products print their arguments in sympy's canonical argument order (which
    is deterministic), a negative coefficient as subtraction, reciprocal factors as one
    division; everything else goes through the sympy printer.
    """

    one = "1.0"

    def _num(self, text: str) -> str:
        return text

    def _print_Symbol(self, expr):
        return expr.name

    def _factor(self, f) -> str:
        text = self._print(f)
        if f.is_Add or (f.is_Number and f < 0) or (f.is_Mul and not f.is_Atom):
            return f"({text})"
        return text

    def _print_Mul(self, expr):
        c, rest = expr.as_coeff_Mul()
        if c < 0:
            return "-" + self._print_Mul_pos(-c, rest)
        return self._print_Mul_pos(c, rest)

    def _print_Mul_pos(self, c, rest):
        num, den = [], []
        for f in sp.Mul.make_args(rest):
            if f.is_Pow and f.exp.is_Integer and f.exp < 0:
                den.append(f.base if f.exp == -1 else sp.Pow(f.base, -f.exp, evaluate=False))
            else:
                num.append(f)
        parts = [] if c == 1 else [self._print(c)]
        parts += [self._factor(f) for f in num]
        text = "*".join(parts) if parts else self._num(self.one)
        if den:
            dtext = "*".join(self._factor(f) for f in den)
            if len(den) > 1 or (den[0].is_Pow and "*" in dtext):
                dtext = f"({dtext})"
            text += "/" + dtext
        return text

    def _print_Add(self, expr):
        out = []
        for k, term in enumerate(expr.args):
            c, rest = term.as_coeff_Mul()
            neg = c < 0
            if neg:
                body = self._print(-c) if rest == 1 else self._print_Mul_pos(-c, rest)
            else:
                body = self._print(term)
            if k == 0:
                out.append(("-" if neg else "") + body)
            else:
                out.append((" - " if neg else " + ") + body)
        return "".join(out)

    def _print_Float(self, expr):
        return self._num(_literal(expr))

    def _print_Rational(self, expr):
        return self._num(_literal(expr))

    def _print_Integer(self, expr):
        return self._num(_literal(expr))

    def _print_NumberSymbol(self, expr):
        return self._num(_literal(expr))

    _print_Pi = _print_NumberSymbol
    _print_Exp1 = _print_NumberSymbol

    def _print_Pow(self, expr):
        base, ex = expr.base, expr.exp
        if ex.is_Integer:
            n = int(ex)
            if 1 <= n <= 4:
                return _int_power(self, base, n)
            if -4 <= n <= -1:
                den = _int_power(self, base, -n) if n != -1 else self.parenthesize(
                    base, sp.printing.precedence.PRECEDENCE["Pow"], strict=False)
                if n != -1:
                    den = f"({den})"
                return f"{self._num(self.one)}/{den}"
        if ex == sp.Rational(1, 2):
            return f"{self._sqrt}({self._print(base)})"
        if ex == -sp.Rational(1, 2):
            return f"{self._num(self.one)}/{self._sqrt}({self._print(base)})"
        return self._general_pow(expr)


class CPrinter(_Common, C99CodePrinter):
    _sqrt = "sqrt"

    def _general_pow(self, expr):
        return f"pow({self._print(expr.base)}, {self._print(expr.exp)})"

    def _print_Min(self, expr):
        args = [self._print(a) for a in expr.args]
        out = args[0]
        for a in args[1:]:
            out = f"fmin({out}, {a})"
        return out


class FortranPrinter(_Common, FCodePrinter):
    _sqrt = "sqrt"

    def __init__(self):
        super().__init__({"standard": 2008, "source_format": "free"})

    def _num(self, text: str) -> str:
        return text + "_dp"

    def _general_pow(self, expr):
        return f"{self.parenthesize(expr.base, 60)}**({self._print(expr.exp)})"

    def _print_Min(self, expr):
        return "min(" + ", ".join(self._print(a) for a in expr.args) + ")"



class NumpyPrinter(_Common, PythonCodePrinter):
    _sqrt = "np.sqrt"

    def _general_pow(self, expr):
        return f"{self.parenthesize(expr.base, 60)}**{self.parenthesize(expr.exp, 60)}"

    def _print_Min(self, expr):
        args = [self._print(a) for a in expr.args]
        out = args[0]
        for a in args[1:]:
            out = f"np.minimum({out}, {a})"
        return out


C = CPrinter()
F = FortranPrinter()
PY = NumpyPrinter()


def count_ops(expr) -> int:
    """Floating-point operations of an expression as printed (add, mul, div, sqrt = 1 each)."""
    if expr.is_Atom:
        return 0
    if expr.is_Add or expr.is_Mul:
        args = expr.args
        n = len(args) - 1
        if expr.is_Mul and args and args[0] == -1:
            n -= 0  # a negation folds into the neighbouring add/sub
        return n + sum(count_ops(a) for a in args)
    if expr.is_Pow:
        ex = expr.exp
        if ex.is_Integer:
            k = abs(int(ex))
            return (k - 1) + (1 if ex < 0 else 0) + count_ops(expr.base)
        return 1 + count_ops(expr.base)
    return 1 + sum(count_ops(a) for a in expr.args)


def _split_points(text: str):
    """Positions after which a long statement may be broken (after ' + ', ' - ', ', ')."""
    out = []
    depth = 0
    for k, ch in enumerate(text):
        if ch == "(":
            depth += 1
        elif ch == ")":
            depth -= 1
        elif ch == " " and k + 2 < len(text) and text[k + 1] in "+-" and text[k + 2] == " ":
            out.append(k)
    return out


def wrap_fortran(line: str, indent: str, width: int = 100) -> list[str]:
    """Split a long Fortran statement into free-form continuation lines (trailing ``&``)."""
    return _wrap(line, indent, width, " &")


def _wrap(line: str, indent: str, width: int, cont: str) -> list[str]:
    if len(line) <= width:
        return [line]
    cuts = _split_points(line)
    out, start = [], 0
    prefix = ""
    while len(prefix) + len(line) - start > width:
        limit = start + width - len(prefix) - len(cont)
        good = [c for c in cuts if start < c <= limit]
        if not good:
            later = [c for c in cuts if c > limit]
            if not later:
                break
            cut = later[0]
        else:
            cut = good[-1]
        out.append(prefix + line[start:cut] + cont)
        start = cut + 1
        prefix = indent + "    "
    out.append(prefix + line[start:])
    return out


def wrap_c(line: str, indent: str, width: int = 110) -> list[str]:
    """Split a long C (or parenthesised Python) statement before a '+' or '-' operator."""
    return _wrap(line, indent, width, "")


def c_expr(expr) -> str:
    return C._print(sp.sympify(expr))


def f_expr(expr) -> str:
    return F._print(sp.sympify(expr))


def py_expr(expr) -> str:
    return PY._print(sp.sympify(expr))
