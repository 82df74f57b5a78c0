"""Tests of derive.quadrature: exact Gauss-Legendre, tensor and triangle rules."""
from __future__ import annotations

import itertools
import math

import mpmath
import numpy as np
import pytest
import sympy as sp
from sympy.polys.polyfuncs import symmetrize

from derive.errors import InputError
from derive.quadrature import (GAUSS_MAX, Rule, gauss_legendre, gauss_square, rule,
                               triangle_rule)
from derive.reference import contains

DPS = 40


def line_moment(k: int) -> sp.Rational:
    # standard result: int_{-1}^{1} x^k dx = (1 - (-1)^(k+1)) / (k+1), calculus
    return sp.Rational(1 - (-1) ** (k + 1), k + 1)


def triangle_moment(p: int, q: int) -> sp.Rational:
    # standard result: integral of area-coordinate powers L1^c L2^p L3^q is
    # c! p! q! 2A / (c+p+q+2)!, Eisenberg & Malvern (1973), from memory; here c = 0, A = 1/2
    A = sp.Rational(1, 2)
    return sp.Rational(math.factorial(p) * math.factorial(q), math.factorial(p + q + 2)) * 2 * A


def high_precision(values):
    with mpmath.workdps(DPS):
        return [mpmath.mpf(str(sp.N(v, DPS))) for v in values]


# --------------------------------------------------------------------------- Gauss-Legendre

@pytest.mark.parametrize("n", range(1, GAUSS_MAX + 1))
def test_gauss_legendre_vs_numpy(n):
    points, weights = gauss_legendre(n)
    ref_x, ref_w = np.polynomial.legendre.leggauss(n)
    # reference library: numpy.polynomial.legendre.leggauss
    np.testing.assert_allclose([float(p.evalf(30)) for p in points], ref_x, rtol=0, atol=1e-14)
    # reference library: numpy.polynomial.legendre.leggauss
    np.testing.assert_allclose([float(w.evalf(30)) for w in weights], ref_w, rtol=0, atol=1e-14)
    assert all(not v.has(sp.Float) for v in points + weights)
    assert list(points) == sorted(points, key=lambda v: float(v.evalf(30)))


def test_gauss_legendre_abramowitz_stegun_values():
    def num(v):
        return float(v.evalf(30))
    # Abramowitz & Stegun (1964), Table 25.4, from memory (15 decimals)
    p3, w3 = gauss_legendre(3)
    assert num(p3[2]) == pytest.approx(0.774596669241483, abs=1e-15)
    assert num(w3[2]) == pytest.approx(0.555555555555556, abs=1e-15)
    assert num(w3[1]) == pytest.approx(0.888888888888889, abs=1e-15)
    # Abramowitz & Stegun (1964), Table 25.4, from memory
    p4, w4 = gauss_legendre(4)
    assert [num(v) for v in p4[2:]] == pytest.approx([0.339981043584856, 0.861136311594053], abs=1e-15)
    assert [num(v) for v in w4[2:]] == pytest.approx([0.652145154862546, 0.347854845137454], abs=1e-15)
    # Abramowitz & Stegun (1964), Table 25.4, from memory
    p5, w5 = gauss_legendre(5)
    assert [num(v) for v in p5[2:]] == pytest.approx([0.0, 0.538469310105683, 0.906179845938664], abs=1e-15)
    assert [num(v) for v in w5[2:]] == pytest.approx(
        [0.568888888888889, 0.478628670499366, 0.236926885056189], abs=1e-15)


def test_gauss_legendre_closed_forms():
    # standard closed forms (e.g. Abramowitz & Stegun (1964), 25.4.29, from memory)
    assert gauss_legendre(1) == ((0,), (2,))
    assert gauss_legendre(2) == ((-1 / sp.sqrt(3), 1 / sp.sqrt(3)), (1, 1))
    assert gauss_legendre(3) == ((-sp.sqrt(sp.Rational(3, 5)), 0, sp.sqrt(sp.Rational(3, 5))),
                                 (sp.Rational(5, 9), sp.Rational(8, 9), sp.Rational(5, 9)))
    assert gauss_legendre(4) is gauss_legendre(4)  # cached


@pytest.mark.parametrize("n", range(1, 6))
def test_gauss_legendre_exact_to_degree_2n_minus_1(n):
    points, weights = gauss_legendre(n)
    for k in range(2 * n + 1):
        value = sp.expand(sp.Add(*[w * x**k for x, w in zip(points, weights)]))
        if k <= 2 * n - 1:
            assert value == line_moment(k), (n, k)  # exact equality in exact arithmetic
        else:
            assert value != line_moment(k)
            assert abs(float(value - line_moment(k))) > 1e-6


@pytest.mark.parametrize("n", range(6, GAUSS_MAX + 1))
def test_gauss_legendre_crootof_exact_to_1e25(n):
    points, weights = gauss_legendre(n)
    xs, ws = high_precision(points), high_precision(weights)
    with mpmath.workdps(DPS):
        for k in range(2 * n + 1):
            value = mpmath.fsum(w * x**k for x, w in zip(xs, ws))
            error = abs(value - mpmath.mpf(line_moment(k).p) / line_moment(k).q)
            if k <= 2 * n - 1:
                assert error < mpmath.mpf("1e-25"), (n, k)
            else:
                assert error > mpmath.mpf("1e-8"), (n, k)


@pytest.mark.parametrize("bad", [0, GAUSS_MAX + 1, 2.0, True, "3", None])
def test_gauss_legendre_bad_n(bad):
    with pytest.raises(InputError, match=f"1..{GAUSS_MAX}"):
        gauss_legendre(bad)


# --------------------------------------------------------------------------- tensor rules

def square_error(r: Rule, p: int, q: int, exact: bool):
    if exact:
        value = sp.expand(sp.Add(*[w * x**p * y**q for (x, y), w in zip(r.points, r.weights)]))
        return value - line_moment(p) * line_moment(q)
    pts, wts = r.numeric()
    return float(np.sum(wts * pts[:, 0] ** p * pts[:, 1] ** q)) - float(line_moment(p) * line_moment(q))


@pytest.mark.parametrize("nx,ny,exact", [(1, 1, True), (2, 2, True), (2, 3, True), (3, 1, True),
                                         (3, 3, True), (4, 4, False), (5, 2, False),
                                         (5, 5, False), (7, 7, False)])
def test_gauss_square_exactness(nx, ny, exact):
    r = gauss_square(nx, ny)
    assert r.domain == "square" and r.name == f"gauss-{nx}x{ny}"
    assert r.degree == min(2 * nx - 1, 2 * ny - 1)
    assert r.npoints == nx * ny
    tol = 1e-13  # float64 rounding of the evaluated rule, common practice, no source
    for d in range(r.degree + 1):
        for p in range(d + 1):
            err = square_error(r, p, d - p, exact)
            assert (err == 0) if exact else abs(err) < tol, (p, d - p)
    # degree + 1: the pure power in the direction with fewer points is not integrated
    d = r.degree + 1
    p, q = (d, 0) if nx <= ny else (0, d)
    err = square_error(r, p, q, exact)
    assert err != 0 and abs(float(err)) > 1e-6


def test_gauss_square_each_direction_exact_to_2n_minus_1():
    r = gauss_square(2, 4)
    assert square_error(r, 3, 7, exact=True) == 0  # xi^3 eta^7: degrees 3 <= 3 and 7 <= 7
    assert square_error(r, 4, 0, exact=True) != 0


def test_gauss_square_point_order_and_weights():
    r = gauss_square(2, 3)
    px, wx = gauss_legendre(2)
    py, wy = gauss_legendre(3)
    # row by row from the bottom, xi fastest
    assert r.points == tuple((px[i], py[j]) for j in range(3) for i in range(2))
    assert r.points[0] == (px[0], py[0]) and r.points[1] == (px[1], py[0])
    assert all(sp.expand(r.weights[2 * j + i] - wx[i] * wy[j]) == 0
               for j in range(3) for i in range(2))
    assert sp.expand(sp.Add(*r.weights)) == 4  # area of [-1,1]^2
    assert gauss_square(3) is gauss_square(3, 3) is rule("gauss-3") is rule("gauss-3x3")


def test_numeric_cached_readonly_float64():
    r = gauss_square(2, 3)
    pts, wts = r.numeric()
    assert pts.shape == (6, 2) and wts.shape == (6,)
    assert pts.dtype == np.float64 and wts.dtype == np.float64
    assert r.numeric()[0] is pts
    with pytest.raises(ValueError):
        pts[0, 0] = 0.0
    x3, w3 = np.polynomial.legendre.leggauss(3)
    # reference library: numpy.polynomial.legendre.leggauss (eta has 3 points, rows)
    np.testing.assert_allclose(pts[::2, 1], x3, rtol=0, atol=1e-15)
    np.testing.assert_allclose(wts.sum(), 4.0, rtol=0, atol=1e-14)  # area of [-1,1]^2


# --------------------------------------------------------------------------- triangle rules

def test_triangle_rule_reference_values():
    # Strang & Fix (1973), 6-point degree-3 rule, from memory
    d3 = triangle_rule(3)
    coords = sorted({float(c.evalf(30)) for p in d3.points for c in p})
    assert coords == pytest.approx([0.109039009072877, 0.231933368553031, 0.659027622374092], abs=1e-14)
    # Dunavant (1985), degree 4, 6 points, weights normalised to area 1, from memory
    pts, wts = triangle_rule(4).numeric()
    assert sorted(set(np.round(pts[:, 0], 14))) == pytest.approx(
        [0.091576213509771, 0.108103018168070, 0.445948490915965, 0.816847572980459], abs=1e-14)
    assert sorted(set(np.round(2 * wts, 14))) == pytest.approx(
        [0.109951743655322, 0.223381589678011], abs=1e-14)
    # Radon 7-point degree-5 rule (e.g. Zienkiewicz & Taylor tables), from memory
    pts, wts = triangle_rule(5).numeric()
    assert sorted(set(np.round(pts[:, 0], 14))) == pytest.approx(
        [0.059715871789770, 0.101286507323456, 0.333333333333333, 0.470142064105115,
         0.797426985353087], abs=1e-14)
    assert sorted(set(np.round(2 * wts, 14))) == pytest.approx(
        [0.125939180544827, 0.132394152788506, 0.225], abs=1e-14)


def test_triangle_degree4_weight_matches_published_radical():
    # Dunavant (1985) writes the degree-4 weights with sqrt(213125 - 53320 sqrt(10)), from memory
    s = sp.sqrt(38 - 44 * sp.sqrt(sp.Rational(2, 5)))
    diff = sp.sqrt(213125 - 53320 * sp.sqrt(10)) - (45 * sp.sqrt(10) / 2 - 5) * s
    assert sp.minimal_polynomial(diff, sp.Symbol("z")) == sp.Symbol("z")  # exactly zero


@pytest.mark.parametrize("degree", range(1, 6))
def test_triangle_rule_basic_properties(degree):
    r = triangle_rule(degree)
    assert r.name == f"triangle-d{degree}" and r.domain == "triangle" and r.degree == degree
    assert r is triangle_rule(degree) is rule(f"triangle-d{degree}")
    assert all(not v.has(sp.Float) for p in r.points for v in p)
    assert all(not w.has(sp.Float) for w in r.weights)
    assert all(w.evalf(30) > 0 for w in r.weights)
    # exact inside test (all points are interior; checked in float just below)
    assert all(contains("triangle", p) for p in r.points)
    pts, wts = r.numeric()
    assert (pts > 0).all() and (pts.sum(axis=1) < 1).all()
    assert abs(wts.sum() - 0.5) < 1e-15  # area of the reference triangle
    # symmetric: the point set is invariant under permutations of the area coordinates
    bary = np.column_stack([1 - pts.sum(axis=1), pts])
    key = lambda arr: sorted(map(tuple, np.round(np.column_stack([arr, wts]), 12)))  # noqa: E731
    for perm in itertools.permutations(range(3)):
        permuted = bary[:, perm]
        assert key(permuted[:, 1:]) == key(pts)


@pytest.mark.parametrize("degree", [1, 2, 4, 5])
def test_triangle_rule_exact_arithmetic(degree):
    r = triangle_rule(degree)

    def apply(p, q):
        return sp.expand(sp.Add(*[w * x**p * y**q for (x, y), w in zip(r.points, r.weights)]))

    assert apply(0, 0) == sp.Rational(1, 2)  # area of the reference triangle
    for d in range(degree + 1):
        for p in range(d + 1):
            assert apply(p, d - p) == triangle_moment(p, d - p), (p, d - p)
    # degree + 1: at least one monomial is not integrated exactly
    d = degree + 1
    errors = [abs(float(apply(p, d - p) - triangle_moment(p, d - p))) for p in range(d + 1)]
    assert max(errors) > 1e-8


def test_triangle_degree3_exact_via_vieta():
    r = triangle_rule(3)
    t = sp.Symbol("t")
    cubic = sp.Poly(60 * t**3 - 60 * t**2 + 15 * t - 1, t)
    roots = [sp.CRootOf(cubic, k) for k in range(3)]
    # the points are the 6 permutations of the roots as (L2, L3); weights 1/12 each
    assert sorted(r.points, key=str) == sorted(
        [(b, c) for _, b, c in itertools.permutations(roots)], key=str)
    assert set(r.weights) == {sp.Rational(1, 12)}
    # exact check: sum over permutations of L2^p L3^q is symmetric in the roots; rewrite it
    # in elementary symmetric functions and insert Vieta's values s1 = 1, s2 = 1/4, s3 = 1/60
    r1, r2, r3 = sp.symbols("r1 r2 r3")
    vieta = {}
    for d in range(5):
        for p in range(d + 1):
            q = d - p
            total = sum(y**p * z**q for _, y, z in itertools.permutations((r1, r2, r3)))
            expr, remainder, defs = symmetrize(sp.expand(total), r1, r2, r3, formal=True)
            assert remainder == 0
            elementary = dict(defs)  # s1, s2, s3 -> r1 + r2 + r3, ..., r1 r2 r3
            values = {s: {1: 1, 2: sp.Rational(1, 4), 3: sp.Rational(1, 60)}[
                sp.Poly(e, r1, r2, r3).total_degree()] for s, e in elementary.items()}
            value = sp.expand(expr.subs(values)) / 12
            vieta[(p, q)] = value
            if d <= 3:
                assert vieta[(p, q)] == triangle_moment(p, q), (p, q)
    assert any(vieta[(p, 4 - p)] != triangle_moment(p, 4 - p) for p in range(5))


@pytest.mark.parametrize("degree", range(1, 6))
def test_triangle_rule_high_precision(degree):
    r = triangle_rule(degree)
    pts = [high_precision(p) for p in r.points]
    wts = high_precision(r.weights)
    with mpmath.workdps(DPS):
        for d in range(degree + 2):
            errs = []
            for p in range(d + 1):
                q = d - p
                value = mpmath.fsum(w * x**p * y**q for (x, y), w in zip(pts, wts))
                m = triangle_moment(p, q)
                errs.append(abs(value - mpmath.mpf(m.p) / m.q))
            if d <= degree:
                assert max(errs) < mpmath.mpf("1e-25"), d
            else:
                assert max(errs) > mpmath.mpf("1e-8"), d


@pytest.mark.parametrize("bad", [0, 6, 2.5, "2"])
def test_triangle_rule_bad_degree(bad):
    with pytest.raises(InputError, match="1..5"):
        triangle_rule(bad)


# --------------------------------------------------------------------------- names and Rule

def test_rule_by_name():
    assert rule("gauss-2x2") is gauss_square(2, 2)
    assert rule("gauss-1x3").points == gauss_square(1, 3).points
    assert rule("triangle-d5") is triangle_rule(5)
    assert rule(" gauss-4 ").name == "gauss-4x4"


@pytest.mark.parametrize("name", ["gauss", "gauss-0", "gauss-11", "gauss-2x", "gauss-2x2x2x2",
                                  "triangle-d0", "triangle-d6", "triangle-2", "Gauss-2", "", 3])
def test_rule_bad_names(name):
    with pytest.raises(InputError, match="allowed forms: 'gauss-<n>', 'gauss-<nx>x<ny>'") as info:
        rule(name)
    assert "\n" not in str(info.value) and "triangle-d<degree>" in str(info.value)


def test_rule_validation():
    with pytest.raises(InputError, match="exact"):
        Rule("bad", "square", ((0.5, 0),), (4,), 1)
    with pytest.raises(InputError, match="as many"):
        Rule("bad", "square", ((0, 0),), (2, 2), 1)
    with pytest.raises(InputError, match="allowed"):
        Rule("bad", "disc", ((0, 0),), (4,), 1)
    r = Rule("centre", "square", ((0, 0),), (4,), 1)
    assert r.npoints == 1 and r.points == ((sp.Integer(0), sp.Integer(0)),)
    assert r == Rule("centre", "square", ((0, 0),), (4,), 1)


def test_tensor_numeric_matches_direct_evaluation():
    # the tensor rules seed numeric() from 1-D values; compare with evaluating each exact entry
    for r in (gauss_square(4, 3), gauss_square(6, 2)):
        pts, wts = r.numeric()
        direct_p = np.array([[float(c.evalf(30)) for c in p] for p in r.points])
        direct_w = np.array([float(w.evalf(30)) for w in r.weights])
        # common practice, no source: both routes round 30-digit values to float64
        np.testing.assert_allclose(pts, direct_p, rtol=0, atol=1e-16)
        np.testing.assert_allclose(wts, direct_w, rtol=2e-16, atol=0)
