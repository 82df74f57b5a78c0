"""Safe user-input parser: typical textbook forms, matrices, files, error locations."""
from __future__ import annotations

import numpy as np
import pytest
import sympy as sp

from derive.errors import InputError, ParseError
from derive.symbols import E, a, b, c, eta, nu, t, x, xi
from derive.userinput import (MatrixInput, load_matrix_file, parse_expression,
                              parse_latex_expression, parse_matrix_text)

x1, y1, y12 = sp.symbols("x1 y1 y12")

# the rectangle's diagonal stiffness-type term, built directly with sympy
TEXTBOOK = E * t / (1 - nu**2) * (b / (3 * a) + (1 - nu) * a / (6 * b))


def same(expr, ref) -> bool:
    return sp.simplify(expr - ref) == 0


# --------------------------------------------------------------------------- expressions
def test_textbook_expression_plain_math():
    got = parse_expression("E*t/(1-nu^2)*(b/(3*a) + (1-nu)*a/(6*b))")
    assert got == TEXTBOOK  # reference library: sympy (built directly)


def test_textbook_expression_latex():
    got = parse_latex_expression(
        r"\frac{Et}{1-\nu^{2}}\left(\frac{b}{3a}+\frac{(1-\nu)a}{6b}\right)")
    assert same(got, TEXTBOOK)  # reference library: sympy (built directly)


@pytest.mark.parametrize("text, expected", [
    ("0.25", sp.Rational(1, 4)),
    ("1e-3", sp.Rational(1, 1000)),
    (".5", sp.Rational(1, 2)),
    ("2.", sp.Integer(2)),
    ("2.1E+11", sp.Integer(210_000_000_000)),
    ("2.5e2", sp.Integer(250)),
    ("0.1 + 0.2", sp.Rational(3, 10)),
])
def test_decimals_are_exact(text, expected):
    got = parse_expression(text)
    assert got == expected and isinstance(got, sp.Rational)  # reference library: sympy (built directly)


@pytest.mark.parametrize("text, expected", [
    ("2a", 2 * a),
    ("2 (1-nu)", 2 * (1 - nu)),
    ("(1-nu)(1+nu)", (1 - nu) * (1 + nu)),
    ("(1-nu)a", (1 - nu) * a),
    ("2a^2", 2 * a**2),
    ("2^3^2", sp.Integer(512)),
    ("2**3**2", sp.Integer(512)),
    ("-a^2", -a**2),
    ("2^-1", sp.Rational(1, 2)),
    ("a^(1/2)", sp.sqrt(a)),
    ("sqrt(8)", 2 * sp.sqrt(2)),
    ("[a + b]*{a - b}", (a + b) * (a - b)),
    ("x_1 + y12", x1 + y12),
    ("xi*eta", xi * eta),
    ("sin(pi/6) + abs(-3) + ln(1)", sp.Rational(7, 2)),
    ("E*t/4", E * t / 4),
    ("\u03bd \u00b7 2 \u2212 1", 2 * nu - 1),
    ("1/2*a", a / 2),
    ("a/b/2", a / (2 * b)),
])
def test_plain_math_forms(text, expected):
    assert same(parse_expression(text), expected)  # reference library: sympy (built directly)


@pytest.mark.parametrize("text, token", [
    ("a b", "b"),          # juxtaposed names
    ("a(1-nu)", "("),      # a symbol is not a function
    ("1/2a", "a"),         # ambiguous implicit product after '/'
    ("2 3", "3"),
    ("foo + 1", "foo"),
    ("sin x", "sin"),
    ("log(x, 2)", ","),
    ("2E-3", "2E-3"),
    ("a = 1", "="),
    ("(a + b", ""),
    ("a + b)", ")"),
    ("x0", "x0"),
    ("1/0", "/"),
    ("a^b", "^"),
])
def test_plain_math_rejections_carry_the_token(text, token):
    with pytest.raises(ParseError) as info:
        parse_expression(text)
    err = info.value
    assert err.line == 1 and err.column is not None and err.token == token  # common practice, no source
    assert "\n" not in str(err)


def test_error_position_uses_line_argument_and_columns():
    with pytest.raises(ParseError) as info:
        parse_expression("E*t + foo", line=7)
    err = info.value
    assert (err.line, err.column, err.token) == (7, 7, "foo")  # common practice, no source
    assert str(err).startswith("line 7, column 7: unknown name 'foo'")
    assert "allowed:" in str(err)


def test_extra_symbols():
    k = sp.Symbol("k")
    assert parse_expression("k*alpha2 + a", extra_symbols=["k", "alpha2"]) == \
        k * sp.Symbol("alpha2") + a  # reference library: sympy (built directly)
    with pytest.raises(InputError):
        parse_expression("1", extra_symbols=["__class__"])
    with pytest.raises(InputError):
        parse_expression("1", extra_symbols=["sin"])


@pytest.mark.parametrize("text, expected", [
    (r"\frac12", sp.Rational(1, 2)),
    (r"\frac ab", a / b),
    (r"\dfrac{a}{b}\tfrac{1}{2}", a / (2 * b)),
    (r"\sqrt[3]{8}", sp.Integer(2)),
    (r"\sqrt{2}", sp.sqrt(2)),
    (r"x_1^{2} + y_{12}", x1**2 + y12),
    (r"\sin^2 x + \cos^{2}(x)", sp.sin(x)**2 + sp.cos(x)**2),
    (r"\left|a - b\right| + |a|", sp.Abs(a - b) + sp.Abs(a)),
    (r"2\cdot 3 \times a", 6 * a),
    (r"2\times 10^{-3}", sp.Rational(1, 500)),
    (r"\frac{E\,t}{1-\nu^2}", E * t / (1 - nu**2)),
    (r"$\frac{a}{b}$", a / b),
    (r"\[ 2ab \]", 2 * a * b),
    (r"\left[ 1 + \xi \right]\left( 1 - \eta \right)/4", (1 + xi) * (1 - eta) / 4),
    (r"\sin x^2", sp.sin(x**2)),
    (r"nu + xi", nu + xi),          # a whole letter run spelling a Greek name is accepted
    (r"0.25a", a / 4),
    (r"\pi", sp.pi),
])
def test_latex_forms(text, expected):
    assert same(parse_latex_expression(text), expected)  # reference library: sympy (built directly)


@pytest.mark.parametrize("text, token", [
    (r"\int x", r"\int"),
    (r"\alpha", r"\alpha"),
    (r"\sin 2x", "x"),
    (r"a2", "2"),
    (r"x^23", "23"),
    (r"Enu", "n"),
    (r"sin x", "sin"),
    (r"x_0", "x_0"),
    (r"a^b^c", "^"),
    (r"a & b", "&"),
])
def test_latex_rejections(text, token):
    with pytest.raises(ParseError) as info:
        parse_latex_expression(text)
    assert info.value.token == token  # common practice, no source


def test_latex_unsupported_command_names_it_with_position():
    with pytest.raises(ParseError) as info:
        parse_latex_expression(r"a + \int x", line=2)
    err = info.value
    assert (err.line, err.column, err.token) == (2, 5, r"\int")  # common practice, no source
    assert r"unsupported LaTeX command '\int'" in str(err) and r"\frac" in str(err)


# --------------------------------------------------------------------------- matrices
D3 = sp.Matrix([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])


@pytest.mark.parametrize("text", [
    "1, nu, 0\nnu, 1, 0\n0, 0, (1-nu)/2\n",
    "1 nu 0\nnu 1 0\n0 0 (1 - nu)/2\n",
    "# a comment line\n\n1   nu 0   # trailing comment\nnu  1  0\n0   0  1/2 - nu/2\n",
    "D =\n1, nu, 0,\nnu, 1, 0,\n0, 0, (1-nu)/2,\n",
])
def test_full_matrix_math(text):
    m = parse_matrix_text(text)
    assert (m.kind, m.rows, m.cols, m.syntax, m.index_base) == ("full", 3, 3, "math", None)
    assert sp.simplify(m.to_matrix() - D3) == sp.zeros(3, 3)  # reference library: sympy (built directly)


@pytest.mark.parametrize("text", [
    r"\begin{pmatrix} 1 & \nu & 0 \\ \nu & 1 & 0 \\ 0 & 0 & \frac{1-\nu}{2} \end{pmatrix}",
    "$$D = \\begin{bmatrix}\n1 & \\nu & 0 \\\\\n\\nu & 1 & 0 \\\\\n0 & 0 & \\frac{1-\\nu}{2} \\\\\n"
    "\\end{bmatrix}$$",
    r"\[ \left[\begin{matrix}1 & \nu & 0\\\nu & 1 & 0\\0 & 0 & \frac{1}{2} - \frac{\nu}{2}"
    r"\end{matrix}\right] \]",
    r"\begin{array}{ccc} 1 & \nu & 0 \\ \nu & 1 & 0 \\ \hline 0 & 0 & (1-\nu)/2 \end{array}",
])
def test_full_matrix_latex(text):
    m = parse_matrix_text(text)
    assert (m.kind, m.rows, m.cols, m.syntax) == ("full", 3, 3, "latex")
    assert sp.simplify(m.to_matrix() - D3) == sp.zeros(3, 3)  # reference library: sympy (built directly)


def test_latex_prefactor_is_multiplied_in():
    m = parse_matrix_text(r"K = \frac{Et}{1-\nu^2}\begin{bmatrix} 1 & \nu \\ \nu & 1 \end{bmatrix}")
    ref = E * t / (1 - nu**2) * sp.Matrix([[1, nu], [nu, 1]])
    assert m.name == "K"
    assert sp.simplify(m.to_matrix() - ref) == sp.zeros(2, 2)  # reference library: sympy (built directly)


def test_whitespace_separation_rule():
    # common practice, no source: a binary operator with spaces on both sides joins,
    # a sign attached to the next token starts a new entry
    m = parse_matrix_text("1 - nu  2 -nu\na  b*c  b ^ 2\n")
    assert m.data == [[1 - nu, 2, -nu], [a, b * c, b**2]]
    m = parse_matrix_text("sin (xi)  2 (1-nu)\n")
    assert m.data == [[sp.sin(xi), 2, 1 - nu]]


def test_numeric_text_matrix():
    m = parse_matrix_text("1 0.5\n-2 1e-3\n")
    assert m.syntax == "numeric"
    assert m.data == [[1, sp.Rational(1, 2)], [-2, sp.Rational(1, 1000)]]  # common practice, no source
    np.testing.assert_array_equal(m.array, [[1.0, 0.5], [-2.0, 0.001]])


def test_ragged_rows_name_the_row():
    with pytest.raises(ParseError) as info:
        parse_matrix_text("1, 2, 3\n4, 5, 6\n7, 8\n")
    err = info.value
    assert err.line == 3 and "row 3 has 2 entries" in str(err)  # common practice, no source
    with pytest.raises(ParseError) as info:
        parse_matrix_text(r"\begin{pmatrix} 1 & 2 \\ 3 \end{pmatrix}")
    assert "row 2 has 1 entries" in str(info.value)


def test_matrix_entry_error_location():
    with pytest.raises(ParseError) as info:
        parse_matrix_text("1, 2\n3, E*t*foo\n")
    assert (info.value.line, info.value.column, info.value.token) == (2, 8, "foo")  # common practice, no source
    with pytest.raises(ParseError) as info:
        parse_matrix_text("\\begin{pmatrix}\n1 & 2 \\\\\n3 & \\int 4\n\\end{pmatrix}")
    assert (info.value.line, info.value.column, info.value.token) == (3, 5, r"\int")  # common practice, no source


def test_entries_one_based_detected():
    m = parse_matrix_text("K[1,1] = E*t\nK[1,2] = -nu\nK(2,2) = 1\n")
    assert (m.kind, m.index_base, m.index_base_declared, m.name) == ("entries", 1, False, "K")
    assert m.entries == {(0, 0): E * t, (0, 1): -nu, (1, 1): 1}  # common practice, no source
    assert (m.rows, m.cols) == (2, 2)
    assert m.to_matrix(symmetric=True) == sp.Matrix([[E * t, -nu], [-nu, 1]])


def test_entries_zero_based_detected():
    m = parse_matrix_text("B[0,0] = 1\nB[0,1] = 2\nB[1,1] = 3\n")
    assert m.index_base == 0 and not m.index_base_declared
    assert m.entries == {(0, 0): 1, (0, 1): 2, (1, 1): 3}  # common practice, no source
    with pytest.raises(InputError):
        m.to_matrix()                                     # (1,0) missing
    assert m.to_matrix(fill=sp.Integer(0)) == sp.Matrix([[1, 2], [0, 3]])


def test_entries_declared_base():
    m = parse_matrix_text("# index-base: 0\nk(1,1) = a\nk(2,2) = b\n")
    assert m.index_base == 0 and m.index_base_declared
    assert m.entries == {(1, 1): a, (2, 2): b}  # common practice, no source
    m = parse_matrix_text("# index-base: 1\nk[1,1] = a\n")
    assert m.index_base == 1 and m.entries == {(0, 0): a}  # common practice, no source
    with pytest.raises(ParseError) as info:
        parse_matrix_text("# index-base: 1\nk[0,1] = a\n")
    assert info.value.line == 2
    with pytest.raises(ParseError):
        parse_matrix_text("# index-base: 2\nk[0,1] = a\n")


def test_entries_errors():
    with pytest.raises(ParseError) as info:
        parse_matrix_text("K[1,1] = 1\nK[1,1] = 2\n")
    assert info.value.line == 2 and "twice" in str(info.value)  # common practice, no source
    with pytest.raises(ParseError):
        parse_matrix_text("K[1,1] = 1\nB[1,2] = 2\n")
    with pytest.raises(ParseError) as info:
        parse_matrix_text("K[1,1] = 1\n1 2\n")
    assert info.value.line == 2


def test_latex_entries():
    m = parse_matrix_text("\\[ K_{11} = \\frac{Et}{3}, \\quad K_{12} = -\\nu \\\\\n"
                          "K_{2,2} &= 4 \\]")
    assert (m.kind, m.syntax, m.index_base, m.name) == ("entries", "latex", 1, "K")
    assert m.entries == {(0, 0): E * t / 3, (0, 1): -nu, (1, 1): 4}  # reference library: sympy (built directly)
    with pytest.raises(ParseError):
        parse_matrix_text(r"K_{123} = 1")


def test_empty_text_is_an_input_error():
    with pytest.raises(InputError):
        parse_matrix_text("  \n# nothing\n")


# --------------------------------------------------------------------------- files
def test_load_npy(tmp_path):
    arr = np.array([[4.0, -1.0], [-1.0, 4.0]])
    path = tmp_path / "k.npy"
    np.save(path, arr)
    m = load_matrix_file(path)
    assert isinstance(m, MatrixInput)
    assert (m.kind, m.rows, m.cols, m.syntax) == ("full", 2, 2, "numeric")
    np.testing.assert_array_equal(m.array, arr)  # common practice, no source
    assert m.to_matrix().equals(sp.Matrix([[4, -1], [-1, 4]]))
    ints = tmp_path / "i.npy"
    np.save(ints, np.array([[1, 2], [3, 4]], dtype=np.int64))
    assert load_matrix_file(ints).data == [[1, 2], [3, 4]]  # common practice, no source


@pytest.mark.parametrize("bad", [np.zeros(3), np.zeros((2, 2, 2)), np.array([[1 + 2j]]),
                                 np.array([[np.nan]]), np.array([["a"]])])
def test_load_npy_rejects(tmp_path, bad):
    path = tmp_path / "bad.npy"
    np.save(path, bad)
    with pytest.raises(InputError):
        load_matrix_file(path)


def test_load_csv(tmp_path):
    path = tmp_path / "k.csv"
    path.write_text("1.5,-0.25,0\n-0.25,2,1e-3\n0,1e-3,3\n")
    m = load_matrix_file(path)
    assert (m.rows, m.cols, m.syntax) == (3, 3, "numeric")
    assert m.data[0][1] == sp.Rational(-1, 4) and m.data[1][2] == sp.Rational(1, 1000)  # common practice, no source
    np.testing.assert_allclose(m.array, np.loadtxt(path, delimiter=","))  # reference library: numpy.loadtxt
    sym = tmp_path / "s.csv"
    sym.write_text("E*t, -nu\n-nu, E*t\n")
    assert load_matrix_file(sym).syntax == "math"


def test_load_tex_and_text(tmp_path):
    tex = tmp_path / "k.tex"
    tex.write_text("% my derivation\n$K = \\begin{pmatrix} a & b \\\\ b & a \\end{pmatrix}$\n")
    m = load_matrix_file(tex)
    assert m.syntax == "latex" and m.to_matrix() == sp.Matrix([[a, b], [b, a]])  # common practice, no source
    txt = tmp_path / "k.txt"
    txt.write_text("# index-base: 1\nK[1,1] = a\nK[2,2] = b\n")
    m = load_matrix_file(txt)
    assert m.kind == "entries" and m.entries == {(0, 0): a, (1, 1): b}  # common practice, no source


def test_load_file_errors(tmp_path):
    with pytest.raises(InputError) as info:
        load_matrix_file(tmp_path / "missing.txt")
    assert "not found" in str(info.value) and "\n" not in str(info.value)
    empty = tmp_path / "empty.txt"
    empty.write_text("")
    with pytest.raises(InputError):
        load_matrix_file(empty)
    garbage = tmp_path / "garbage.bin"
    garbage.write_bytes(bytes(range(256)) * 4)
    with pytest.raises(InputError):
        load_matrix_file(garbage)
    latin = tmp_path / "latin.txt"
    latin.write_bytes("1 2\n\xe9 4\n".encode("latin-1"))
    with pytest.raises(InputError):
        load_matrix_file(latin)
    fake = tmp_path / "fake.npy"
    fake.write_text("1 2\n3 4\n")
    with pytest.raises(InputError):
        load_matrix_file(fake)
