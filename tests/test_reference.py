"""Tests of derive.reference: reference domains and exact monomial integrals."""
from __future__ import annotations

import math

import pytest
import sympy as sp
from scipy import integrate as sci

from derive.errors import InputError
from derive.reference import (DOMAINS, area, contains, integrate_polynomial,
                              monomial_integral)
from derive.symbols import E, a, b, eta, nu, xi


def square_closed(p: int, q: int) -> sp.Rational:
    """Integral of xi^p eta^q over [-1,1]^2 from the 1-D antiderivative x^(k+1)/(k+1)."""
    # standard result: int_{-1}^{1} x^k dx = (1 - (-1)^(k+1)) / (k+1), calculus
    one = lambda k: sp.Rational(1 - (-1) ** (k + 1), k + 1)  # noqa: E731
    return one(p) * one(q)


def triangle_closed(p: int, q: int) -> sp.Rational:
    """Integral of L2^p L3^q over the unit triangle (area A = 1/2), L1 power zero."""
    # standard result: integral of area-coordinate powers a! b! c! 2A / (a+b+c+2)!,
    # Eisenberg & Malvern (1973), from memory
    A = sp.Rational(1, 2)
    return sp.Integer(math.factorial(0) * math.factorial(p) * math.factorial(q)) * 2 * A \
        / math.factorial(p + q + 0 + 2)


def test_domains_and_area():
    assert DOMAINS[:3] == ("line", "square", "triangle")
    assert area("square") == 4  # standard result: [-1,1]^2 has area 2 * 2
    assert area("triangle") == sp.Rational(1, 2)  # standard result: right triangle, legs 1
    with pytest.raises(InputError, match="square, triangle"):
        area("disc")


@pytest.mark.parametrize("p", range(7))
@pytest.mark.parametrize("q", range(7))
def test_monomial_integral_closed_forms(p, q):
    assert monomial_integral("square", p, q) == square_closed(p, q)
    assert monomial_integral("triangle", p, q) == triangle_closed(p, q)
    assert isinstance(monomial_integral("triangle", p, q), sp.Rational)


@pytest.mark.parametrize("p,q", [(0, 0), (2, 0), (1, 1), (2, 4), (3, 2), (5, 1)])
def test_monomial_integral_vs_dblquad(p, q):
    f = lambda y, x: x**p * y**q  # noqa: E731  (dblquad integrates f(y, x))
    square, _ = sci.dblquad(f, -1.0, 1.0, -1.0, 1.0, epsabs=1e-13, epsrel=1e-13)
    triangle, _ = sci.dblquad(f, 0.0, 1.0, 0.0, lambda x: 1.0 - x, epsabs=1e-13, epsrel=1e-13)
    # reference library: scipy.integrate.dblquad
    assert float(monomial_integral("square", p, q)) == pytest.approx(square, abs=1e-12)
    # reference library: scipy.integrate.dblquad
    assert float(monomial_integral("triangle", p, q)) == pytest.approx(triangle, abs=1e-12)


def test_monomial_integral_is_cached_and_checks_input():
    monomial_integral("square", 30, 2)
    before = monomial_integral.cache_info().hits
    monomial_integral("square", 30, 2)
    assert monomial_integral.cache_info().hits == before + 1
    for bad in (-1, 1.5, True, "2"):
        with pytest.raises(InputError, match="non-negative integer"):
            monomial_integral("square", bad, 0)
    with pytest.raises(InputError, match="allowed: line, square, triangle"):
        monomial_integral("disc", 0, 0)


def test_integrate_polynomial_symbolic_coefficients():
    f = a + b * xi**2 + E / (1 - nu**2) * xi * eta + 3 * eta**4 * xi**2
    # standard results: int over [-1,1]^2 of 1, xi^2, xi*eta, xi^2 eta^4 = 4, 4/3, 0, 4/15
    expected_sq = 4 * a + sp.Rational(4, 3) * b + sp.Rational(4, 5)
    # Eisenberg & Malvern (1973) area-coordinate formula, from memory: 1/2, 1/12, 1/24, 2!4!/8!
    expected_tr = a / 2 + b / 12 + E / (1 - nu**2) / 24 + 3 * sp.Rational(2 * 24, 40320)
    assert sp.simplify(integrate_polynomial(f, "square") - expected_sq) == 0
    assert sp.simplify(integrate_polynomial(f, "triangle") - expected_tr) == 0


@pytest.mark.parametrize("domain", ("square", "triangle"))  # the 2-D domains; 3-D in test_solid_core.py
def test_integrate_polynomial_vs_sympy_integrate(domain):
    # independent route: sympy.integrate on the textbook iterated-integral limits
    f = (1 + a * xi - b * eta) ** 3 * (xi - 2 * eta**2)
    if domain == "square":
        ref = sp.integrate(sp.integrate(f, (xi, -1, 1)), (eta, -1, 1))
    else:
        ref = sp.integrate(sp.integrate(f, (eta, 0, 1 - xi)), (xi, 0, 1))
    assert sp.expand(integrate_polynomial(f, domain) - ref) == 0


def test_integrate_polynomial_other_inputs():
    assert integrate_polynomial(7, "square") == 28
    assert integrate_polynomial(a, "triangle") == a / 2
    # an exact polynomial written as a quotient is accepted: (xi^2 - 1)/(xi - 1) = xi + 1
    assert integrate_polynomial((xi**2 - 1) / (xi - 1), "square") == 4
    M = sp.Matrix([[1, xi], [eta**2, xi * eta]])
    # standard results over [-1,1]^2: 4, 0, 4/3, 0
    assert integrate_polynomial(M, "square") == sp.Matrix([[4, 0], [sp.Rational(4, 3), 0]])
    s, r = sp.symbols("s r")
    assert integrate_polynomial(s**2 * r, "square", gens=(s, r)) == 0
    # standard result: int over [-1,1]^2 of s^2 = (2/3) * 2
    assert integrate_polynomial(s**2 * xi, "square", gens=(s, r)) == sp.Rational(4, 3) * xi


@pytest.mark.parametrize("expr", [sp.sin(xi), 1 / xi, sp.sqrt(eta), xi**a,
                                  sp.exp(xi) * eta, xi / (1 + eta)])
def test_integrate_polynomial_rejects_non_polynomials(expr):
    with pytest.raises(InputError, match="not a polynomial") as info:
        integrate_polynomial(expr, "square")
    assert "\n" not in str(info.value)


def test_integrate_polynomial_bad_domain_and_gens():
    with pytest.raises(InputError, match="unknown reference domain 'quad'.*square, triangle"):
        integrate_polynomial(xi, "quad")
    with pytest.raises(InputError, match="gens"):
        integrate_polynomial(xi, "square", gens=(xi,))


def test_contains_exact():
    s3 = sp.sqrt(3)
    assert contains("square", (1, s3 / 3))  # on the edge xi = 1
    assert contains("square", (-1, -1))
    assert not contains("square", (1 + sp.Rational(1, 10**30), 0))
    assert contains("square", (1 + sp.Rational(1, 10**30), 0), tol=sp.Rational(1, 10**20))
    assert not contains("square", (s3 / 3, sp.sqrt(5) - 1))  # sqrt(5) - 1 > 1
    assert contains("triangle", (sp.Rational(1, 2), sp.Rational(1, 2)))  # on the hypotenuse
    assert contains("triangle", (0, 0))
    assert not contains("triangle", (sp.sqrt(2) / 2, sp.sqrt(2) / 2))  # xi + eta = sqrt(2) > 1
    assert not contains("triangle", (sp.Rational(-1, 10**40), sp.Rational(1, 2)))
    # an exact zero in a form sympy cannot sign directly: (sqrt(2)-1)^2 - (3 - 2 sqrt(2)) = 0
    zero = (sp.sqrt(2) - 1) ** 2 - (3 - 2 * sp.sqrt(2))
    assert contains("triangle", (zero, 1))
    assert contains("triangle", (0.25, 0.75))  # floats are accepted
    assert not contains("triangle", (0.25 + 1e-12, 0.75))
    assert contains("triangle", (0.25 + 1e-12, 0.75), tol=1e-9)


def test_contains_errors():
    with pytest.raises(InputError, match="pair"):
        contains("square", (0, 0, 0))
    with pytest.raises(InputError, match="real numbers"):
        contains("square", (xi, 0))
    with pytest.raises(InputError, match="tol"):
        contains("square", (0, 0), tol=-1)
    with pytest.raises(InputError, match="allowed"):
        contains("hexagon", (0, 0))
