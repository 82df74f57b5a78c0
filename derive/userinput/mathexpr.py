"""Plain math syntax: tokenizer and precedence parser (see the package docstring for the grammar)."""
from __future__ import annotations

import keyword
from typing import Iterable

import sympy as sp

from ._core import (FUNCTIONS, FUNCTIONS_TEXT, MAX_DEPTH, MAX_EXPRESSION_CHARS, MAX_TOKENS,
                    UNICODE_NAMES, UNICODE_OPERATORS, Builder, Token, fail, is_ascii_digit,
                    is_ascii_letter, scan_number, show_char)

ALLOWED_TOKENS_TEXT = "allowed: numbers, names, + - * / ^ ** ( ) [ ] { } and function calls f(x)"
_OPENERS = {"(": ")", "[": "]", "{": "}"}
_CLOSERS = {")", "]", "}"}
_SPACE = " \t\r\f\v\u00a0"
_REJECTED = {
    "'": "strings (quotes) are not allowed",
    '"': "strings (quotes) are not allowed",
    "`": "backticks are not allowed",
    ";": "';' is not allowed: one expression only",
    "=": "'=' is not allowed inside an expression",
    ":": "':' is not allowed (no lambdas, slices or annotations)",
    "\\": "backslash found: LaTeX is not accepted in plain math syntax (use the LaTeX parser)",
    "#": "'#' is not allowed inside an expression",
    "@": "'@' is not allowed",
    "!": "'!' is not allowed (no factorials)",
    "%": "'%' is not allowed",
}


def tokenize(text: str, line: int = 1, col: int = 1, *, max_chars: int = MAX_EXPRESSION_CHARS,
             max_tokens: int = MAX_TOKENS) -> tuple[list[Token], tuple[int, int]]:
    """Split plain math text into tokens; returns the tokens and the end position."""
    if len(text) > max_chars:
        raise fail(f"expression longer than {max_chars} characters", line=line, col=col)
    tokens: list[Token] = []
    depth = 0
    i, n = 0, len(text)
    space = False
    while i < n:
        ch = text[i]
        if ch in _SPACE:
            i += 1
            col += 1
            space = True
            continue
        if ch == "\n":
            i += 1
            line += 1
            col = 1
            space = True
            continue
        if len(tokens) >= max_tokens:
            raise fail(f"input has more than {max_tokens} tokens", line=line, col=col)
        if is_ascii_digit(ch) or (ch == "." and i + 1 < n and is_ascii_digit(text[i + 1])):
            j, value = scan_number(text, i, scientific=True)
            if isinstance(value, str):
                raise fail(value, line=line, col=col, token=text[i:j])
            tok = Token("NUM", text[i:j], line, col, space, value)
        elif is_ascii_letter(ch) or ch == "_":
            j = i + 1
            while j < n and (is_ascii_letter(text[j]) or is_ascii_digit(text[j]) or text[j] == "_"):
                j += 1
            name = text[i:j]
            if name.startswith("_") or "__" in name:
                raise fail("names starting with '_' or containing '__' are not allowed", line=line,
                           col=col, token=name)
            if keyword.iskeyword(name) or keyword.issoftkeyword(name):
                raise fail(f"'{name}' is a Python keyword; only math is accepted", line=line,
                           col=col, token=name)
            if j < n and text[j] == ".":
                raise fail("attribute access ('.') is not allowed", line=line, col=col + (j - i),
                           token=".")
            tok = Token("NAME", name, line, col, space)
        elif ch in UNICODE_NAMES:
            j = i + 1
            tok = Token("NAME", ch, line, col, space, UNICODE_NAMES[ch])
        elif ch == "*" and i + 1 < n and text[i + 1] == "*":
            j = i + 2
            tok = Token("OP", "**", line, col, space, "^")
        elif ch in "+-*/^" or ch in UNICODE_OPERATORS:
            j = i + 1
            tok = Token("OP", ch, line, col, space, UNICODE_OPERATORS.get(ch, ch))
        elif ch in _OPENERS:
            depth += 1
            if depth > MAX_DEPTH:
                raise fail(f"nesting deeper than {MAX_DEPTH} levels", line=line, col=col, token=ch)
            j = i + 1
            tok = Token("LPAR", ch, line, col, space)
        elif ch in _CLOSERS:
            depth = max(depth - 1, 0)
            j = i + 1
            tok = Token("RPAR", ch, line, col, space)
        elif ch == ",":
            j = i + 1
            tok = Token("COMMA", ch, line, col, space)
        else:
            reason = _REJECTED.get(ch)
            if reason is None:
                reason = "'.' is only allowed inside numbers (no attribute access)" if ch == "." else \
                    f"unexpected character {show_char(ch)}"
            raise fail(f"{reason}; {ALLOWED_TOKENS_TEXT}", line=line, col=col, token=ch)
        tokens.append(tok)
        col += j - i
        i = j
        space = False
    return tokens, (line, col)


class MathParser:
    """Precedence-climbing parser over math tokens; builds sympy objects through a Builder."""

    def __init__(self, tokens: list[Token], builder: Builder, end: tuple[int, int]):
        self.toks = tokens
        self.pos = 0
        self.b = builder
        self.end = end
        self.depth = 0

    # ---- helpers
    def peek(self) -> Token | None:
        return self.toks[self.pos] if self.pos < len(self.toks) else None

    def advance(self) -> Token:
        tok = self.toks[self.pos]
        self.pos += 1
        return tok

    def _ended(self, what: str):
        prev = self.toks[self.pos - 1].text if self.pos else ""
        after = f" after '{prev}'" if prev else ""
        return fail(f"expression ended{after}; expected {what}", line=self.end[0], col=self.end[1],
                    token="")

    def _enter(self, tok: Token) -> None:
        self.depth += 1
        if self.depth > MAX_DEPTH:
            raise fail(f"nesting deeper than {MAX_DEPTH} levels", tok)

    # ---- grammar
    def parse(self) -> sp.Expr:
        if not self.toks:
            raise fail("empty expression; expected a number, a name or '('", line=self.end[0],
                       col=self.end[1], token="")
        expr = self.expr()
        tok = self.peek()
        if tok is not None:
            if tok.kind == "RPAR":
                raise fail(f"unmatched '{tok.text}'", tok)
            if tok.kind == "COMMA":
                raise fail("',' is not allowed here (functions take one argument; "
                           "commas separate matrix entries only)", tok)
            raise fail(f"unexpected '{tok.text}' after a complete expression", tok)
        return self.b.finish(expr, self.toks[0])

    def expr(self) -> sp.Expr:
        terms = [self.term()]
        while True:
            tok = self.peek()
            if tok is None or tok.kind != "OP" or tok.value not in "+-":
                break
            self.advance()
            term = self.term()
            terms.append(self.b.negate(term, tok) if tok.value == "-" else term)
        return self.b.total(terms, self.toks[0])

    def term(self) -> sp.Expr:
        first_tok = self.peek()
        factors = [self.unary()]
        after_division = False
        while True:
            tok = self.peek()
            if tok is None:
                break
            if tok.kind == "OP" and tok.value in "*/":
                self.advance()
                factor = self.unary()
                if tok.value == "/":
                    factors.append(self.b.reciprocal(factor, tok))
                    after_division = True
                else:
                    factors.append(factor)
                    after_division = False
            elif tok.kind in ("NAME", "NUM", "LPAR"):
                prev = self.toks[self.pos - 1]
                self._check_juxtaposition(prev, tok)
                if after_division:
                    raise fail("ambiguous implicit product after '/': add parentheses, e.g. "
                               "1/(2*a), or an explicit '*'", tok)
                factors.append(self.power())
            else:
                break
        return self.b.product(factors, first_tok)

    @staticmethod
    def _check_juxtaposition(prev: Token, tok: Token) -> None:
        if tok.kind == "NUM":
            raise fail(f"missing operator before the number '{tok.text}'", tok)
        if prev.kind in ("NUM", "RPAR"):
            return
        raise fail(f"missing operator between '{prev.text}' and '{tok.text}'; write "
                   f"{prev.text}*{tok.text} (only a number or ')' may be followed directly by a "
                   "name or '(')", tok)

    def unary(self) -> sp.Expr:
        negative = False
        first = self.peek()
        while True:
            tok = self.peek()
            if tok is not None and tok.kind == "OP" and tok.value in "+-":
                self.advance()
                negative ^= tok.value == "-"
            else:
                break
        value = self.power()
        return self.b.negate(value, first) if negative else value

    def power(self) -> sp.Expr:
        base = self.atom()
        tok = self.peek()
        if tok is not None and tok.kind == "OP" and tok.value == "^":
            self.advance()
            self._enter(tok)
            exponent = self.unary()      # right-associative: a^b^c = a^(b^c)
            self.depth -= 1
            return self.b.power(base, exponent, tok)
        return base

    def atom(self) -> sp.Expr:
        tok = self.peek()
        if tok is None:
            raise self._ended("a number, a name or '('")
        if tok.kind == "NUM":
            self.advance()
            return tok.value
        if tok.kind == "NAME":
            self.advance()
            name = tok.value or tok.text
            nxt = self.peek()
            if name in FUNCTIONS:
                if nxt is None or nxt.kind != "LPAR":
                    raise fail(f"function '{name}' needs parentheses: {name}(...)", tok)
                self.b.enter_function(tok)
                arg = self.group()
                self.b.leave_function()
                return self.b.call(name, arg, tok)
            value = self.b.resolve(self._normalise(name))
            if value is None:
                raise fail(f"unknown name '{tok.text}'; allowed: {self.b.allowed_text()}; "
                           f"functions: {FUNCTIONS_TEXT}", tok)
            if nxt is not None and nxt.kind == "LPAR":
                raise fail(f"'{tok.text}' is not a function; write {tok.text}*(...) for a product", nxt)
            return value
        if tok.kind == "LPAR":
            return self.group()
        if tok.kind == "RPAR":
            raise fail(f"unexpected '{tok.text}'; expected a number, a name or '('", tok)
        if tok.kind == "COMMA":
            raise fail("unexpected ','; expected a number, a name or '('", tok)
        raise fail(f"unexpected '{tok.text}'; expected a number, a name or '('", tok)

    @staticmethod
    def _normalise(name: str) -> str:
        """``x_1`` -> ``x1`` (subscripted nodal names written with an underscore)."""
        head, sep, tail = name.partition("_")
        if sep and head and tail.isdigit() and tail.isascii():
            return head + tail
        return name

    def group(self) -> sp.Expr:
        open_tok = self.advance()
        self._enter(open_tok)
        inner = self.expr()
        close = self.peek()
        if close is None:
            raise self._ended(f"'{_OPENERS[open_tok.text]}' to close '{open_tok.text}' opened at "
                              f"line {open_tok.line}, column {open_tok.col}")
        if close.kind == "COMMA":
            raise fail("',' is not allowed here: functions take exactly one argument", close)
        if close.kind != "RPAR" or close.text != _OPENERS[open_tok.text]:
            raise fail(f"expected '{_OPENERS[open_tok.text]}' to close '{open_tok.text}' opened at "
                       f"line {open_tok.line}, column {open_tok.col}", close)
        self.advance()
        self.depth -= 1
        return inner


def parse_tokens(tokens: list[Token], builder: Builder, end: tuple[int, int]) -> sp.Expr:
    return MathParser(tokens, builder, end).parse()


def parse_expression(text: str, *, line: int = 1,
                     extra_symbols: Iterable[str] = ()) -> sp.Expr:
    """Parse one expression in plain math syntax into a sympy expression (never evaluates code)."""
    if not isinstance(text, str):
        raise fail("expression must be text", line=line, col=1)
    builder = Builder(extra_symbols)
    tokens, end = tokenize(text, line, 1)
    return parse_tokens(tokens, builder, end)
