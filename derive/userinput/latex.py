"""LaTeX subset: tokenizer and parser (see the package docstring for the supported commands)."""
from __future__ import annotations

from typing import Iterable

import sympy as sp

from ._core import (MAX_DEPTH, MAX_EXPONENT, MAX_EXPRESSION_CHARS, MAX_TOKENS, UNICODE_NAMES,
                    UNICODE_OPERATORS, Builder, Token, fail, is_ascii_digit, is_ascii_letter,
                    scan_number, show_char)

FRAC_COMMANDS = ("frac", "dfrac", "tfrac", "cfrac")
LATEX_FUNCTIONS = {
    "sin": "sin", "cos": "cos", "tan": "tan", "exp": "exp", "log": "log", "ln": "ln",
    "sinh": "sinh", "cosh": "cosh", "tanh": "tanh", "arctan": "atan", "arcsin": "asin",
    "arccos": "acos",
}
GREEK = ("nu", "xi", "eta", "zeta", "pi")
SPACING_COMMANDS = ("quad", "qquad", "displaystyle", "textstyle")
OPERATOR_COMMANDS = {"cdot": "*", "times": "*", "div": "/"}
SUPPORTED_TEXT = ("supported: \\frac \\dfrac \\tfrac \\cfrac \\sqrt \\sqrt[n] \\left( \\right) "
                  "\\left[ \\right] \\left| \\right| \\lvert \\rvert \\cdot \\times \\div "
                  "\\sin \\cos \\tan \\exp \\log \\ln \\sinh \\cosh \\tanh \\arcsin \\arccos "
                  "\\arctan \\nu \\xi \\eta \\zeta \\pi \\, \\; \\! \\: \\quad \\qquad "
                  "\\begin{pmatrix|bmatrix|matrix|array}")
#: letter runs that spell a multi-letter name: accepted as that name in LaTeX mode
MULTI_LETTER_NAMES = ("nu", "xi", "eta", "zeta", "pi")
_FUNCTION_WORDS = set(LATEX_FUNCTIONS) | {"sqrt", "frac", "atan", "asin", "acos", "abs"}
_SPACE = " \t\r\f\v\u00a0~"
_MATRIX_ENVS = ("pmatrix", "bmatrix", "Bmatrix", "matrix", "smallmatrix", "array")
_WRAPPER_ENVS = ("equation", "equation*", "displaymath", "math", "align", "align*")  # align: entry lists
_OPEN_KINDS = ("LPAR", "LBRACE", "LABS")
_CLOSE_KINDS = ("RPAR", "RBRACE", "RABS")
_PAIR = {"(": ")", "[": "]", "{": "}"}


def unsupported(cmd: str, line: int, col: int):
    return fail(f"unsupported LaTeX command '\\{cmd}'; {SUPPORTED_TEXT}", line=line, col=col,
                token="\\" + cmd)


def tokenize(text: str, line: int = 1, col: int = 1, *, extra_names: Iterable[str] = (),
             max_chars: int = MAX_EXPRESSION_CHARS, max_tokens: int = MAX_TOKENS
             ) -> tuple[list[Token], tuple[int, int]]:
    """Split LaTeX math into tokens; letters are single tokens except known multi-letter names."""
    if len(text) > max_chars:
        raise fail(f"LaTeX input longer than {max_chars} characters", line=line, col=col)
    multi = set(MULTI_LETTER_NAMES) | {n for n in extra_names if len(n) > 1 and n.isalpha()}
    tokens: list[Token] = []
    depth = 0
    i, n = 0, len(text)
    space = False

    def add(kind, tok_text, value=None, width=None):
        nonlocal depth, space
        if len(tokens) >= max_tokens:
            raise fail(f"input has more than {max_tokens} tokens", line=line, col=col)
        if kind in _OPEN_KINDS:
            depth += 1
            if depth > MAX_DEPTH:
                raise fail(f"nesting deeper than {MAX_DEPTH} levels", line=line, col=col,
                           token=tok_text)
        elif kind in _CLOSE_KINDS:
            depth = max(depth - 1, 0)
        tokens.append(Token(kind, tok_text, line, col, space, value))
        space = False

    def read_letters(j):
        k = j
        while k < n and is_ascii_letter(text[k]):
            k += 1
        return k

    def skip_space(j):
        while j < n and text[j] in _SPACE:
            j += 1
        return j

    while i < n:
        ch = text[i]
        if ch in _SPACE:
            i += 1
            col += 1
            space = True
            continue
        if ch == "\n":
            i, line, col, space = i + 1, line + 1, 1, True
            continue
        if ch == "%":                       # LaTeX comment to the end of the line
            while i < n and text[i] != "\n":
                i += 1
            space = True
            continue
        start = i
        if ch == "\\":
            if i + 1 >= n:
                raise fail("lone backslash at the end of the input", line=line, col=col, token="\\")
            nxt = text[i + 1]
            if nxt == "\\":
                add("ROWSEP", "\\\\")
                j = i + 2
            elif is_ascii_letter(nxt):
                j = read_letters(i + 1)
                cmd = text[i + 1:j]
                if cmd in ("begin", "end"):
                    k = skip_space(j)
                    if k >= n or text[k] != "{":
                        raise fail(f"expected '{{name}}' after \\{cmd}", line=line, col=col,
                                   token="\\" + cmd)
                    m = k + 1
                    while m < n and (is_ascii_letter(text[m]) or text[m] == "*"):
                        m += 1
                    if m >= n or text[m] != "}":
                        raise fail(f"malformed \\{cmd}{{...}}", line=line, col=col, token="\\" + cmd)
                    env = text[k + 1:m]
                    if env not in _MATRIX_ENVS and env not in _WRAPPER_ENVS:
                        raise fail(f"unsupported LaTeX environment '{env}'; supported: "
                                   + ", ".join(_MATRIX_ENVS + _WRAPPER_ENVS), line=line, col=col,
                                   token=text[i:m + 1])
                    j = m + 1
                    if cmd == "begin" and env == "array":    # skip the column specification
                        k = skip_space(j)
                        if k < n and text[k] == "{":
                            m = k + 1
                            while m < n and text[m] in "lcr|":
                                m += 1
                            if m >= n or text[m] != "}":
                                raise fail("malformed array column specification; use e.g. {ccc}",
                                           line=line, col=col, token=text[i:m])
                            j = m + 1
                    add("BEGIN" if cmd == "begin" else "END", text[i:j], env)
                elif cmd in ("left", "right"):
                    k = skip_space(j)
                    delim = text[k:k + 1]
                    if delim == "\\":
                        m = read_letters(k + 1)
                        if m == k + 1:
                            m = k + 2
                        delim = text[k:m]
                    else:
                        m = k + 1
                    table = {"(": ("LPAR", "("), "[": ("LPAR", "["), "\\{": ("LPAR", "{"),
                             "|": ("LABS", "|"), "\\lvert": ("LABS", "|"), "\\vert": ("LABS", "|")}
                    if cmd == "right":
                        table = {")": ("RPAR", ")"), "]": ("RPAR", "]"), "\\}": ("RPAR", "}"),
                                 "|": ("RABS", "|"), "\\rvert": ("RABS", "|"),
                                 "\\vert": ("RABS", "|")}
                    if delim not in table:
                        raise fail(f"unsupported delimiter after \\{cmd}: {delim or 'nothing'!r}; "
                                   f"use \\{cmd}( \\{cmd}[ \\{cmd}| or \\{cmd}\\{{", line=line,
                                   col=col, token=text[i:m])
                    kind, value = table[delim]
                    add(kind, text[i:m], value)
                    j = m
                elif cmd == "lvert":
                    add("LABS", "\\lvert", "|")
                elif cmd == "rvert":
                    add("RABS", "\\rvert", "|")
                elif cmd in OPERATOR_COMMANDS:
                    add("OP", "\\" + cmd, OPERATOR_COMMANDS[cmd])
                elif cmd in SPACING_COMMANDS:
                    space = True
                else:
                    add("CMD", "\\" + cmd, cmd)
            elif nxt in ",;!: ":
                j = i + 2
                space = True
            elif nxt in "{}":
                add("LPAR" if nxt == "{" else "RPAR", text[i:i + 2], "{" if nxt == "{" else "}")
                j = i + 2
            elif nxt in "[]()":
                add("MATHDELIM", text[i:i + 2])
                j = i + 2
            else:
                raise fail(f"unsupported LaTeX control symbol {text[i:i + 2]!r}; {SUPPORTED_TEXT}",
                           line=line, col=col, token=text[i:i + 2])
        elif is_ascii_digit(ch) or (ch == "." and i + 1 < n and is_ascii_digit(text[i + 1])):
            j, value = scan_number(text, i, scientific=False)
            if isinstance(value, str):
                raise fail(value, line=line, col=col, token=text[i:j])
            add("NUM", text[i:j], value)
        elif is_ascii_letter(ch):
            j = read_letters(i)
            run = text[i:j]
            if run in multi:
                add("NAME", run, run)
            elif run in _FUNCTION_WORDS:
                raise fail(f"'{run}' without a backslash: write \\{run}", line=line, col=col,
                           token=run)
            else:
                for k, letter in enumerate(run):
                    tokens_before = len(tokens)
                    add("LETTER", letter, run)
                    if k:                      # fix the column of each letter of a run
                        t = tokens[tokens_before]
                        tokens[tokens_before] = Token(t.kind, t.text, t.line, t.col + k, False, run)
        elif ch in UNICODE_NAMES:
            j = i + 1
            add("NAME", ch, UNICODE_NAMES[ch])
        elif ch in "+-*/^_" or ch in UNICODE_OPERATORS:
            j = i + 1
            add("OP", ch, UNICODE_OPERATORS.get(ch, ch))
        elif ch == "{":
            j = i + 1
            add("LBRACE", ch)
        elif ch == "}":
            j = i + 1
            add("RBRACE", ch)
        elif ch in "([":
            j = i + 1
            add("LPAR", ch, ch)
        elif ch in ")]":
            j = i + 1
            add("RPAR", ch, ch)
        elif ch == "|":
            j = i + 1
            add("PIPE", ch)
        elif ch == "$":
            j = i + 2 if text[i:i + 2] == "$$" else i + 1
            add("DOLLAR", text[i:j])
        elif ch in "=&,;":
            j = i + 1
            add({"=": "EQ", "&": "AMP", ",": "COMMA", ";": "SEMI"}[ch], ch)
        else:
            reasons = {"'": "primes and quotes are not allowed", '"': "quotes are not allowed",
                       "`": "backticks are not allowed", "#": "'#' is not allowed here",
                       ".": "'.' is only allowed inside numbers"}
            reason = reasons.get(ch, f"unexpected character {show_char(ch)}")
            raise fail(f"{reason}; allowed in LaTeX mode: numbers, letters, + - * / ^ _ ( ) [ ] "
                       "{ } | and LaTeX commands", line=line, col=col, token=ch)
        col += j - start
        i = j
    return tokens, (line, col)


def strip_delimiters(tokens: list[Token]) -> list[Token]:
    """Drop one pair of surrounding math delimiters: $..$, $$..$$, \\[..\\], \\(..\\)."""
    if len(tokens) >= 2:
        first, last = tokens[0], tokens[-1]
        pairs = {"$": "$", "$$": "$$", "\\[": "\\]", "\\(": "\\)"}
        if first.kind in ("DOLLAR", "MATHDELIM") and pairs.get(first.text) == last.text:
            return tokens[1:-1]
    return tokens


class LatexParser:
    """Recursive-descent parser of the LaTeX subset; builds sympy objects through a Builder."""

    def __init__(self, tokens: list[Token], builder: Builder, end: tuple[int, int]):
        self.toks = list(tokens)
        self.pos = 0
        self.b = builder
        self.end = end
        self.depth = 0
        self.open_argument: Token | None = None

    def peek(self, offset: int = 0) -> Token | None:
        k = self.pos + offset
        return self.toks[k] if k < len(self.toks) else None

    def advance(self) -> Token:
        tok = self.toks[self.pos]
        self.pos += 1
        return tok

    def _ended(self, what: str):
        prev = self.toks[self.pos - 1].text if self.pos else ""
        after = f" after '{prev}'" if prev else ""
        return fail(f"input ended{after}; expected {what}", line=self.end[0], col=self.end[1],
                    token="")

    def _enter(self, tok: Token) -> None:
        self.depth += 1
        if self.depth > MAX_DEPTH:
            raise fail(f"nesting deeper than {MAX_DEPTH} levels", tok)

    def _leave(self) -> None:
        self.depth -= 1

    def _is_op(self, tok: Token | None, *ops: str) -> bool:
        return tok is not None and tok.kind == "OP" and tok.value in ops

    # ---- grammar
    def parse(self) -> sp.Expr:
        if not self.toks:
            raise fail("empty expression", line=self.end[0], col=self.end[1], token="")
        expr = self.expr()
        tok = self.peek()
        if tok is not None:
            self._structural(tok)
            if tok.kind in _CLOSE_KINDS or tok.kind == "PIPE":
                raise fail(f"unmatched '{tok.text}'", tok)
            raise fail(f"unexpected '{tok.text}' after a complete expression", tok)
        return self.b.finish(expr, self.toks[0])

    def expr(self) -> sp.Expr:
        terms = [self.term()]
        while self._is_op(self.peek(), "+", "-"):
            tok = self.advance()
            term = self.term()
            terms.append(self.b.negate(term, tok) if tok.value == "-" else term)
        return self.b.total(terms, self.toks[0])

    def _starts_factor(self, tok: Token) -> bool:
        return tok.kind in ("LETTER", "NAME", "CMD", "LPAR", "LBRACE", "LABS", "NUM")

    def term(self) -> sp.Expr:
        first = self.peek()
        factors = [self.unary()]
        after_division = False
        while True:
            tok = self.peek()
            if tok is None:
                break
            if self._is_op(tok, "*", "/"):
                self.advance()
                factor = self.unary()
                after_division = tok.value == "/"
                factors.append(self.b.reciprocal(factor, tok) if after_division else factor)
            elif self._starts_factor(tok):
                if tok.kind == "NUM":
                    raise fail(f"missing operator before the number '{tok.text}' "
                               "(write \\cdot or * between numbers)", tok)
                if self.open_argument is not None:
                    fn = self.open_argument
                    raise fail(f"ambiguous argument of {fn.text}: use parentheses, e.g. "
                               f"{fn.text}(2x)", tok)
                if after_division:
                    raise fail("ambiguous implicit product after '/': use \\frac{..}{..} "
                               "or parentheses", tok)
                factors.append(self.power())
            else:
                break
        return self.b.product(factors, first)

    def unary(self) -> sp.Expr:
        first = self.peek()
        negative = False
        while self._is_op(self.peek(), "+", "-"):
            negative ^= self.advance().value == "-"
        value = self.power()
        return self.b.negate(value, first) if negative else value

    def power(self) -> sp.Expr:
        self.open_argument = None
        base = self.atom()
        tok = self.peek()
        if self._is_op(tok, "^"):
            self.advance()
            exponent = self.script(tok, split_digits=False)
            nxt = self.peek()
            if self._is_op(nxt, "^"):
                raise fail("double superscript: use braces, e.g. a^{b^{c}}", nxt)
            if self._is_op(nxt, "_"):
                raise fail("write the subscript before the superscript, e.g. x_{1}^{2}", nxt)
            return self.b.power(base, exponent, tok)
        if self._is_op(tok, "_"):
            raise fail("subscripts are only supported on single letters for nodal names "
                       "such as x_1 or y_{12}", tok)
        return base

    def script(self, owner: Token, *, split_digits: bool) -> sp.Expr:
        """A TeX argument: {group} or one token (digit, letter, Greek command)."""
        tok = self.peek()
        what = f"after '{owner.text}'"
        if tok is None:
            raise self._ended(f"an argument {{...}} {what}")
        if tok.kind == "LBRACE":
            return self.braced()
        if tok.kind == "NUM":
            if len(tok.text) > 1:
                if not split_digits or not tok.text.isdigit():
                    raise fail(f"use braces for a multi-character argument {what}, "
                               f"e.g. {{{tok.text}}}", tok)
                rest = tok.text[1:]
                self.toks[self.pos] = Token("NUM", rest, tok.line, tok.col + 1, False,
                                            sp.Integer(int(rest)))
                return sp.Integer(int(tok.text[0]))
            self.advance()
            return tok.value
        if tok.kind in ("LETTER", "NAME"):
            self.advance()
            return self._symbol(tok)
        if tok.kind == "CMD" and tok.value in GREEK:
            self.advance()
            return self._symbol(tok)
        self._structural(tok)
        raise fail(f"expected an argument {{...}} {what}", tok)

    def braced(self) -> sp.Expr:
        open_tok = self.advance()
        self._enter(open_tok)
        if self.peek() is not None and self.peek().kind == "RBRACE":
            raise fail("empty braces {}", self.peek())
        inner = self.expr()
        close = self.peek()
        if close is None:
            raise self._ended(f"'}}' to close '{{' opened at line {open_tok.line}, "
                              f"column {open_tok.col}")
        if close.kind != "RBRACE":
            self._structural(close)
            raise fail(f"expected '}}' to close '{{' opened at line {open_tok.line}, "
                       f"column {open_tok.col}", close)
        self.advance()
        self._leave()
        self.open_argument = None
        return inner

    def _symbol(self, tok: Token) -> sp.Expr:
        name = tok.value if tok.kind in ("NAME", "CMD") else tok.text
        value = self.b.resolve(name)
        if value is None:
            hint = ""
            if tok.kind == "LETTER" and len(tok.value) > 1:
                hint = (f" in '{tok.value}' (adjacent letters multiply in LaTeX; write Greek "
                        "letters as \\nu, \\xi, \\eta, \\zeta, \\pi)")
            elif name == "e":
                hint = " (write \\exp{...} for the exponential function)"
            raise fail(f"unknown name '{name}'{hint}; allowed: {self.b.allowed_text()} "
                       "(nodal names written x_1, y_{12})", tok)
        return value

    def _structural(self, tok: Token) -> None:
        if tok.kind == "EQ":
            raise fail("'=' is not allowed inside an expression", tok)
        if tok.kind in ("AMP", "ROWSEP"):
            raise fail(f"'{tok.text}' is only allowed inside a matrix environment", tok)
        if tok.kind in ("BEGIN", "END"):
            raise fail("matrix environments are only allowed in matrix input", tok)
        if tok.kind in ("DOLLAR", "MATHDELIM"):
            raise fail(f"math delimiter '{tok.text}' is only allowed around the whole input", tok)
        if tok.kind in ("COMMA", "SEMI"):
            raise fail(f"'{tok.text}' is not allowed inside an expression", tok)

    def atom(self) -> sp.Expr:
        tok = self.peek()
        if tok is None:
            raise self._ended("a number, a letter, a command or '('")
        kind = tok.kind
        if kind == "NUM":
            self.advance()
            return tok.value
        if kind == "LETTER":
            self.advance()
            if self._is_op(self.peek(), "_"):
                return self._subscripted(tok)
            return self._symbol(tok)
        if kind == "NAME":
            self.advance()
            return self._symbol(tok)
        if kind == "CMD":
            return self._command()
        if kind == "LBRACE":
            return self.braced()
        if kind in ("LPAR", "LABS", "PIPE"):
            return self._group()
        self._structural(tok)
        raise fail(f"unexpected '{tok.text}'; expected a number, a letter, a command or '('", tok)

    def _subscripted(self, letter: Token) -> sp.Expr:
        under = self.advance()
        tok = self.peek()
        digits = None
        if tok is not None and tok.kind == "NUM" and tok.text.isdigit():
            if len(tok.text) > 1:
                raise fail(f"write {letter.text}_{{{tok.text}}} for a multi-digit subscript", tok)
            self.advance()
            digits = tok.text
        elif tok is not None and tok.kind == "LBRACE":
            inner, close = self.peek(1), self.peek(2)
            if inner is not None and inner.kind == "NUM" and inner.text.isdigit() \
                    and close is not None and close.kind == "RBRACE":
                self.pos += 3
                digits = inner.text
        if digits is None:
            raise fail("subscripts must be digits, as in the nodal names x_1 or y_{12}",
                       tok or under)
        value = self.b.resolve(letter.text + digits)
        if value is None:
            raise fail(f"unknown subscripted name '{letter.text}_{digits}'; allowed: nodal "
                       "coordinates x_1, y_1, x_2, ... (numbered from 1)", letter,
                       token=f"{letter.text}_{digits}")
        return value

    def _group(self) -> sp.Expr:
        open_tok = self.advance()
        self._enter(open_tok)
        is_abs = open_tok.kind != "LPAR"
        if is_abs:
            self.b.enter_function(open_tok)
        inner = self.expr()
        close = self.peek()
        if open_tok.kind == "LPAR":
            want, shown = ("RPAR",), _PAIR[open_tok.value]
        elif open_tok.kind == "LABS":
            want, shown = ("RABS",), "\\right| or \\rvert"
        else:
            want, shown = ("PIPE",), "|"
        opened = f"'{open_tok.text}' opened at line {open_tok.line}, column {open_tok.col}"
        if close is None:
            raise self._ended(f"{shown} to close {opened}")
        if close.kind not in want or (close.kind == "RPAR" and close.value != _PAIR[open_tok.value]):
            self._structural(close)
            raise fail(f"expected {shown} to close {opened}", close)
        self.advance()
        self._leave()
        self.open_argument = None
        if not is_abs:
            return inner
        self.b.leave_function()
        return self.b.call("abs", inner, open_tok)

    def _command(self) -> sp.Expr:
        tok = self.advance()
        cmd = tok.value
        if cmd in GREEK:
            if self._is_op(self.peek(), "_"):
                raise fail(f"subscripts on {tok.text} are not supported", self.peek())
            return self._symbol(tok)
        if cmd in FRAC_COMMANDS:
            self._enter(tok)
            num = self.script(tok, split_digits=True)
            den = self.script(tok, split_digits=True)
            self._leave()
            return self.b.product([num, self.b.reciprocal(den, tok)], tok)
        if cmd == "sqrt":
            index = None
            nxt = self.peek()
            if nxt is not None and nxt.kind == "LPAR" and nxt.text == "[":
                self.advance()
                self._enter(nxt)
                index = self.expr()
                close = self.peek()
                if close is None or close.kind != "RPAR" or close.value != "]":
                    raise fail("expected ']' to close the root index of \\sqrt[n]{...}",
                               close or nxt)
                self.advance()
                self._leave()
                if not index.is_Integer or not 1 <= index <= MAX_EXPONENT:
                    raise fail(f"root index of \\sqrt[n] must be an integer from 1 to "
                               f"{MAX_EXPONENT}", nxt)
            self._enter(tok)
            self.b.enter_function(tok)
            arg = self.script(tok, split_digits=True)
            self.b.leave_function()
            self._leave()
            if index is None:
                return self.b.call("sqrt", arg, tok)
            return self.b.power(arg, sp.Rational(1, int(index)), tok)
        if cmd in LATEX_FUNCTIONS:
            return self._function(tok, LATEX_FUNCTIONS[cmd])
        raise unsupported(cmd, tok.line, tok.col)

    def _function(self, tok: Token, fname: str) -> sp.Expr:
        exponent = None
        nxt = self.peek()
        if self._is_op(nxt, "^"):
            self.advance()
            exponent = self.script(nxt, split_digits=False)
            if not exponent.is_Integer or not 1 <= exponent <= MAX_EXPONENT:
                raise fail(f"a power written on {tok.text} must be a positive integer "
                           f"(for inverse functions use \\arcsin, \\arccos, \\arctan)", nxt)
        elif self._is_op(nxt, "_"):
            raise fail(f"subscripts on {tok.text} (e.g. a logarithm base) are not supported", nxt)
        nxt = self.peek()
        if nxt is None:
            raise self._ended(f"an argument after {tok.text}")
        self._enter(tok)
        self.b.enter_function(tok)
        if nxt.kind in ("LPAR", "LBRACE", "LABS"):
            arg = self.atom()
            open_arg = None
        else:
            arg = self.power()
            open_arg = tok
        self.b.leave_function()
        self._leave()
        value = self.b.call(fname, arg, tok)
        if exponent is not None:
            value = self.b.power(value, exponent, tok)
        self.open_argument = open_arg
        return value


def parse_tokens(tokens: list[Token], builder: Builder, end: tuple[int, int]) -> sp.Expr:
    return LatexParser(tokens, builder, end).parse()


def parse_latex_expression(text: str, *, line: int = 1,
                           extra_symbols: Iterable[str] = ()) -> sp.Expr:
    """Parse one scalar expression written in the documented LaTeX subset."""
    if not isinstance(text, str):
        raise fail("expression must be text", line=line, col=1)
    builder = Builder(extra_symbols)
    tokens, end = tokenize(text, line, 1, extra_names=builder.extra)
    return parse_tokens(strip_delimiters(tokens), builder, end)
