"""Safe parsers for user-supplied math (expressions, matrices) used by ``derive check``.

User text is never evaluated as code: there is no ``eval``/``exec`` and no sympy string
parsing anywhere in this package.  A hand-written tokenizer and a recursive-descent parser
accept a whitelist and build sympy objects directly.  Everything else raises
:class:`derive.errors.ParseError` (1-based ``line``, ``column`` and the offending ``token``;
a one-line message saying what is allowed).  File-level problems raise
:class:`derive.errors.InputError`.

Public interface
----------------
``parse_expression(text, *, line=1, extra_symbols=())``          plain math syntax
``parse_latex_expression(text, *, line=1, extra_symbols=())``    LaTeX subset
``parse_matrix_text(text, *, extra_symbols=())`` -> ``MatrixInput``   syntax auto-detected
``load_matrix_file(path, *, extra_symbols=())``  -> ``MatrixInput``   .npy / .csv / .tex / text

Names
-----
The canonical symbols of :mod:`derive.symbols`: ``xi eta zeta x y z a b c r R E nu t`` and
the nodal coordinates ``x1, y1, x2, ...`` (numbered from 1), the constant ``pi`` and any
``extra_symbols`` (plain identifiers).  Unknown names are errors; names with a leading
underscore or ``__``, Python keywords (``lambda``, ``import``), attribute access (``a.b``),
quotes, ``;``, ``=``, ``:``, backticks, ``#``, ``!``, ``%``, ``@`` are rejected.
Functions (exactly one argument): ``sqrt sin cos tan exp log ln sinh cosh tanh atan asin
acos abs``.

Plain math grammar
------------------
::

    expr    := term (("+" | "-") term)*
    term    := unary (("*" | "/") unary | implicit)*
    implicit:= power            -- only after a number or a closing bracket
    unary   := ("+" | "-")* power
    power   := atom [("^" | "**") unary]       -- right-associative: 2^3^2 = 2^9
    atom    := NUMBER | NAME | FUNC "(" expr ")" | "(" expr ")" | "[" expr "]" | "{" expr "}"
    NUMBER  := digits ["." digits] [e [+-] digits] | "." digits

* ``^`` and ``**`` are the same operator.  ``-a^2`` is ``-(a^2)``; ``2^-1`` is allowed.
* Decimals are exact rationals: ``0.25`` -> 1/4, ``1e-3`` -> 1/1000, ``2.1E+11`` exact.
  Scientific notation uses ``e``; an uppercase ``E`` is an exponent marker only after a
  decimal point (``2.1E5``).  ``2E-3`` is rejected as ambiguous (``2e-3`` or ``2*E-3``?)
  and ``2E`` is ``2*E`` (Young's modulus).
* Implicit multiplication: a number or a closing bracket directly followed by a name or an
  opening bracket multiplies: ``2a``, ``2 (1-nu)``, ``(1-nu)(1+nu)``, ``(1-nu)a``,
  ``2sqrt(2)``.  It has the precedence of ``*`` (``2a^2`` = ``2*(a^2)``).  Rejected: two
  names side by side (``a b``: write ``a*b``), a name followed by ``(`` (``a(1-nu)``: only
  functions take parentheses), a number after a number or ``)``, and an implicit product
  right after ``/`` (``1/2a`` is ambiguous: write ``1/(2*a)`` or ``a/2``).
* ``x_1`` is accepted as the nodal name ``x1``.
* Functions of constants are evaluated (``sin(pi/6)`` -> 1/2, ``atan(1)`` -> pi/4);
  functions of expressions with symbols are built unevaluated (``sin(-x)`` stays as
  written), because sympy's automatic simplification asks its assumption system
  questions whose cost is unbounded for nested arguments.  For the same reason roots of
  expressions that contain a function (``sqrt(sin(x))``) and functions of constants that
  contain a function (``sin(log(2))``) are rejected, and calls nest at most
  ``MAX_FUNCTION_DEPTH`` deep.
* Unicode minus, ``·`` ``×`` and the letters ν ξ η ζ π are accepted as ``-``, ``*`` and names.

LaTeX subset
------------
* ``\\frac{..}{..}``, ``\\dfrac``, ``\\tfrac``, ``\\cfrac``; TeX single-token arguments
  (``\\frac12``, ``\\frac ab``).  ``\\sqrt{..}``, ``\\sqrt[n]{..}`` (n = 1..64).
* ``^{..}`` and ``^x`` (one digit, letter or Greek command; ``x^23`` must be ``x^{23}``).
* ``_`` only for nodal names: ``x_1`` -> ``x1``, ``y_{12}`` -> ``y12``.
* Greek: ``\\nu \\xi \\eta \\zeta \\pi``.  Functions: ``\\sin \\cos \\tan \\exp \\log \\ln
  \\sinh \\cosh \\tanh \\arcsin \\arccos \\arctan``; argument in ``( )``, ``{ }`` or a single
  factor (``\\sin x``, ``\\sin x^2`` = sin(x^2)); an unbracketed argument followed by
  another factor (``\\sin 2x``) is rejected as ambiguous.  ``\\sin^2 x`` = sin(x)^2.
* Grouping: ``( )``, ``[ ]``, ``{ }``, ``\\left( \\right)``, ``\\left[ \\right]``,
  ``\\left\\{ \\right\\}``; absolute value ``|..|``, ``\\left| \\right|``, ``\\lvert \\rvert``.
* Operators ``+ - * /``, ``\\cdot``, ``\\times``, ``\\div``.  Spacing ``\\, \\; \\! \\:
  \\quad \\qquad ~``, ``\\displaystyle`` and ``%`` comments are ignored.
* Letters: in LaTeX every letter is its own symbol and adjacent factors multiply:
  ``Et`` = E*t, ``2ab`` = 2*a*b, ``\\frac{..}{..}\\left(..\\right)`` is a product.  Greek
  letters are commands (``\\nu``); as a convenience a letter run that is exactly ``nu``,
  ``xi``, ``eta``, ``zeta``, ``pi`` (or a multi-letter extra symbol) is that name, since
  its letters alone would be unknown anyway; inside a longer run (``Enu``) it is an error.
  Function names without a backslash (``sin``) are errors.  A number after a letter or
  another factor (``a2``, ``x^2 3``) needs an explicit operator.  No scientific notation
  (``2E`` is ``2*E``); write ``2\\times 10^{-3}``.
* Any other command is an error naming it, e.g. "unsupported LaTeX command '\\int'".

Matrix text (``parse_matrix_text``)
-----------------------------------
Syntax is LaTeX if the text contains ``\\``, ``&``, ``$`` or ``_{``, else plain math.
Blank lines, ``#`` comments and (LaTeX) ``%`` comments are ignored.  A header line
``# index-base: 0`` or ``# index-base: 1`` declares the index base of indexed entries.

1. Full matrix, one row per line.  If any line contains a comma, entries are separated by
   commas (one trailing comma per row is allowed).  Otherwise entries are separated by
   whitespace, except that whitespace does not separate when the token before it is an
   operator, when the token after it is ``*``, ``/``, ``^``, ``**``, or when it is a ``+`` or
   ``-`` with whitespace on both sides (a binary operator), or inside brackets, or between a
   function name and ``(``.  So ``1 - nu  2`` has the two entries ``1 - nu`` and ``2``;
   ``1 -nu`` has two entries ``1`` and ``-nu``; ``2 (1-nu)`` has two entries (write
   ``2(1-nu)``).  An optional first line ``K =`` names the matrix.  All rows must have the
   same length.
2. Indexed entries, one per line: ``K[i,j] = expr`` or ``K(i,j) = expr`` (any name of
   letters and digits, the same on every line).  Without a header, the base is detected:
   0-based if any index is 0, else 1-based; ``MatrixInput.index_base`` reports it and
   ``entries`` keys are 0-based.
3. LaTeX ``\\begin{pmatrix}``/``bmatrix``/``Bmatrix``/``matrix``/``smallmatrix``/``array``
   with ``&`` and ``\\\\``, optionally ``K = `` before it, wrapped in ``$..$``, ``$$..$$``,
   ``\\[..\\]``, ``\\(..\\)`` or an ``equation`` environment, optionally inside
   ``\\left[ .. \\right]`` and with a scalar prefactor (``\\frac{Et}{1-\\nu^2}\\begin{bmatrix}``)
   that is multiplied into every entry.  LaTeX entries ``K_{11} = ..`` / ``K_{1,12} = ..``
   (base rule as in 2).

Files (``load_matrix_file``): ``.npy`` (``allow_pickle=False``; 2-D integer/float, finite;
entries are sympy Integer/Float and ``array`` keeps the values), ``.csv`` (comma-separated
form 1; numbers are exact rationals), ``.tex`` (LaTeX), anything else auto-detected.  Text
with numbers only has ``syntax == "numeric"`` and a float64 ``array``.  Missing, empty,
binary or non-UTF-8 files raise InputError, and so do a path that is a folder, FIFO,
device or socket (said as such; never opened) and an unreadable file.

Limits (constants in :mod:`derive.userinput._core`, checked before heavy work)
-----------------------------------------------------------------------------
======================  ========  ==================================================
MAX_TEXT_CHARS          200 000   characters of matrix text
MAX_FILE_BYTES          200 000   bytes of a text/.csv/.tex file (checked before reading)
MAX_NPY_BYTES         2 000 000   bytes of a .npy file (header checked before loading)
MAX_EXPRESSION_CHARS     20 000   characters of one expression / matrix entry
MAX_TOKENS                5 000   tokens of one expression / matrix entry
MAX_TOTAL_TOKENS        200 000   tokens of one matrix text
MAX_DEPTH                    50   nesting of brackets, calls, exponents, fractions
MAX_INTEGER_DIGITS           50   digits of a number literal
MAX_EXPONENT                 64   |numerator| and denominator of any exponent (and of
                                  ``1e<n>``); exponents must be rational numbers, checked
                                  before sympy builds the power, so ``9^9^9^9`` and
                                  ``2**2**2**2**2**2`` fail at once (9^387420489)
MAX_RESULT_DIGITS           200   digits of any number produced by folding (powers,
                                  products); power growth is estimated before computing
MAX_MATRIX_DIM              200   rows and columns
MAX_FUNCTION_DEPTH            4   nesting of function calls (sqrt, abs and \\sqrt count)
MAX_SECONDS                 5.0   wall-clock budget of one public call, checked between
                                  building steps (a safety net; the limits above keep
                                  ordinary and hostile inputs far below it)
======================  ========  ==================================================

The comparison in ``derive check`` adds its own bounds (derive.check_equality,
derive.bounded): an entry's estimated degree at most ``MAX_DEGREE`` (1000), symbolic proof
only below ``MAX_PROOF_TERMS`` estimated terms (else equality at random exact points), and
the comparison under a CPU-time and memory limit (``--time-limit``, ``--memory-limit``).

Results that are infinite, undefined (``1/0``, ``log(0)``) or complex (``sqrt(-1)``,
``acos(3)``) are rejected.  Resulting powers obey the exponent limit too: ``(x^64)^64``
would be ``x^4096`` and is rejected, as is ``x*x*...*x`` beyond 64 factors.
"""
from __future__ import annotations

from ._core import (MAX_DEPTH, MAX_EXPONENT, MAX_EXPRESSION_CHARS, MAX_FILE_BYTES,
                    MAX_FUNCTION_DEPTH, MAX_INTEGER_DIGITS, MAX_MATRIX_DIM, MAX_NPY_BYTES,
                    MAX_RESULT_DIGITS, MAX_SECONDS, MAX_TEXT_CHARS, MAX_TOKENS, MAX_TOTAL_TOKENS,
                    guarded)
from .latex import parse_latex_expression as _parse_latex_expression
from .mathexpr import parse_expression as _parse_expression
from .matrix import MatrixInput, load_matrix_file, parse_matrix_text

parse_expression = guarded(_parse_expression)
parse_latex_expression = guarded(_parse_latex_expression)

__all__ = [
    "parse_expression", "parse_latex_expression", "parse_matrix_text", "load_matrix_file",
    "MatrixInput", "MAX_TEXT_CHARS", "MAX_FILE_BYTES", "MAX_NPY_BYTES", "MAX_EXPRESSION_CHARS",
    "MAX_TOKENS", "MAX_TOTAL_TOKENS", "MAX_DEPTH", "MAX_INTEGER_DIGITS", "MAX_EXPONENT",
    "MAX_RESULT_DIGITS", "MAX_MATRIX_DIM", "MAX_FUNCTION_DEPTH", "MAX_SECONDS",
]
