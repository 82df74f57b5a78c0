"""Quadrature rules with exact symbolic points and weights.

What: Gauss-Legendre rules on [-1, 1] (the line), their tensor products on the reference
square and cube, symmetric rules on the reference triangle (vertices (0,0), (1,0), (0,1) in
(xi, eta)) and tetrahedron (vertices (0,0,0), (1,0,0), (0,1,0), (0,0,1)), and triangle x line
products on the wedge (see :mod:`derive.reference`).  Every rule is an immutable :class:`Rule` whose points and weights
are exact sympy numbers (rationals, radicals or ``CRootOf`` algebraic numbers; never floats)
and whose ``degree`` is the total polynomial degree it integrates exactly.

Why exact: derive audits element formulations (reduced and selective integration, patch
tests, locking ratios) symbolically, so a rule must give the same closed form a hand
derivation gives.  Numerical kernels use :meth:`Rule.numeric`, which evaluates the exact
values once at high precision and rounds to float64.

Everything is cached: a rule is built once per process (a few milliseconds, up to ~0.1 s the
first time for the ``CRootOf`` Gauss rules with 6..10 points) and returned as the same
object afterwards.  Construction uses no ``simplify``; only ``expand`` on closed-form
tensor weights.
"""
from __future__ import annotations

import functools
import itertools
import operator
import re
from dataclasses import dataclass

import numpy as np
import sympy as sp

from derive.errors import InputError
from derive.reference import check_domain, dimension
from derive.symbols import x as _x

#: number of points for which :func:`gauss_legendre` has closed forms with radicals
GAUSS_CLOSED_FORM_MAX = 5
#: largest number of Gauss points supported (6..10 use exact ``CRootOf`` roots)
GAUSS_MAX = 10
#: degrees for which :func:`triangle_rule` exists
TRIANGLE_DEGREES = (1, 2, 3, 4, 5)
#: degrees for which :func:`tetrahedron_rule` exists
TETRAHEDRON_DEGREES = (1, 2, 3, 4, 5)

#: digits used when rounding exact points/weights to float64 in :meth:`Rule.numeric`
_EVALF_DIGITS = 30


@dataclass(frozen=True)
class Rule:
    """A quadrature rule on a reference domain: sum_i weights[i] * f(points[i]).

    ``points`` are tuples of reference coordinates (as many as the domain has: (xi,),
    (xi, eta) or (xi, eta, zeta)) and ``weights`` their weights, all exact sympy numbers; the
    weights sum to the measure of ``domain`` (:func:`derive.reference.measure`).  ``degree`` is
    the largest total degree d such that every monomial of total degree <= d is integrated
    exactly.
    """

    name: str
    domain: str
    points: tuple[tuple[sp.Expr, sp.Expr], ...]
    weights: tuple[sp.Expr, ...]
    degree: int

    def __post_init__(self) -> None:
        check_domain(self.domain)
        if not isinstance(self.name, str) or not self.name:
            raise InputError(f"Rule: name must be a non-empty string, got {self.name!r}")
        if isinstance(self.degree, bool) or not isinstance(self.degree, int) or self.degree < 0:
            raise InputError(f"Rule {self.name}: degree must be a non-negative int, got {self.degree!r}")
        points = tuple(tuple(_exact(c, self.name) for c in p) for p in self.points)
        weights = tuple(_exact(w, self.name) for w in self.weights)
        dim = dimension(self.domain)
        if not points or len(points) != len(weights) or any(len(p) != dim for p in points):
            raise InputError(f"Rule {self.name}: need as many points of {dim} coordinates as weights, at least one")
        object.__setattr__(self, "points", points)
        object.__setattr__(self, "weights", weights)

    @property
    def dim(self) -> int:
        """Number of reference coordinates of each point."""
        return dimension(self.domain)

    @property
    def npoints(self) -> int:
        """Number of quadrature points."""
        return len(self.weights)

    def numeric(self) -> tuple[np.ndarray, np.ndarray]:
        """Points (npoints, dim) and weights (npoints,) as float64 arrays (read-only, cached).

        Each exact value is evaluated with ``evalf`` at 30 significant digits and then
        rounded to float64, so the arrays are correctly rounded up to the last bit or so.
        """
        cached = self.__dict__.get("_numeric")
        if cached is None:
            pts = np.array([[_to_float(c) for c in p] for p in self.points], dtype=np.float64)
            wts = np.array([_to_float(w) for w in self.weights], dtype=np.float64)
            pts.setflags(write=False)
            wts.setflags(write=False)
            cached = (pts, wts)
            object.__setattr__(self, "_numeric", cached)
        return cached


def _exact(value, name: str) -> sp.Expr:
    try:
        value = sp.sympify(value)
    except (sp.SympifyError, TypeError) as exc:
        raise InputError(f"Rule {name}: cannot read point/weight {value!r}") from exc
    if not isinstance(value, sp.Expr) or not value.is_number:
        raise InputError(f"Rule {name}: points and weights must be numbers, got {value}")
    if value.has(sp.Float):
        raise InputError(f"Rule {name}: points and weights must be exact (no floats), got {value}")
    return value


def _to_float(value: sp.Expr) -> float:
    return float(value.evalf(_EVALF_DIGITS))


def _count(value, what: str, low: int, high: int) -> int:
    try:
        if isinstance(value, bool):
            raise TypeError
        n = operator.index(value)
    except TypeError:
        n = None
    if n is None or not low <= n <= high:
        raise InputError(f"{what} must be an integer in {low}..{high}, got {value!r}")
    return n


# --------------------------------------------------------------------------- Gauss-Legendre

def gauss_legendre(n: int) -> tuple[tuple[sp.Expr, ...], tuple[sp.Expr, ...]]:
    """Exact n-point Gauss-Legendre points (ascending) and weights on [-1, 1].

    n = 1..5: closed forms with radicals, e.g. n = 2: -+1/sqrt(3), weights 1;
    n = 3: 0, -+sqrt(3/5), weights 8/9, 5/9;
    n = 4: -+sqrt(3/7 -+ 2/7 sqrt(6/5)), weights (18 +- sqrt(30))/36;
    n = 5: 0, -+sqrt(5 -+ 2 sqrt(10/7))/3, weights 128/225, (322 +- 13 sqrt(70))/900.
    n = 6..10: the points are ``CRootOf`` roots of the Legendre polynomial P_n (exact
    algebraic numbers; the negative half written as -(positive root) so the rule is exactly
    symmetric) and the weights 2 / ((1 - x^2) P_n'(x)^2), reduced modulo P_n to a polynomial
    in the point with rational coefficients.  The rule integrates degree 2n - 1 exactly.
    """
    return _gauss_legendre(_count(n, "number of Gauss points n", 1, GAUSS_MAX))


@functools.lru_cache(maxsize=None)
def _gauss_legendre(n: int) -> tuple[tuple[sp.Expr, ...], tuple[sp.Expr, ...]]:
    R, sqrt = sp.Rational, sp.sqrt
    if n == 1:
        pos, wpos, centre = [], [], sp.Integer(2)
    elif n == 2:
        pos, wpos, centre = [1 / sqrt(3)], [sp.Integer(1)], None
    elif n == 3:
        pos, wpos, centre = [sqrt(R(3, 5))], [R(5, 9)], R(8, 9)
    elif n == 4:
        pos = [sqrt(R(3, 7) - R(2, 7) * sqrt(R(6, 5))), sqrt(R(3, 7) + R(2, 7) * sqrt(R(6, 5)))]
        wpos = [R(1, 2) + sqrt(30) / 36, R(1, 2) - sqrt(30) / 36]
        centre = None
    elif n == 5:
        pos = [sqrt(5 - 2 * sqrt(R(10, 7))) / 3, sqrt(5 + 2 * sqrt(R(10, 7))) / 3]
        wpos = [R(161, 450) + 13 * sqrt(70) / 900, R(161, 450) - 13 * sqrt(70) / 900]
        centre = R(128, 225)
    else:
        pos, wpos, centre = _gauss_crootof(n)
    points = tuple([-p for p in reversed(pos)] + ([sp.Integer(0)] if centre is not None else []) + pos)
    weights = tuple(list(reversed(wpos)) + ([centre] if centre is not None else []) + wpos)
    return points, weights


def _gauss_crootof(n: int):
    legendre = sp.Poly(sp.legendre_poly(n, _x), _x)
    # weight w(x) = 2 / ((1 - x^2) P_n'(x)^2), as the inverse of the denominator modulo P_n
    denominator = sp.Poly((1 - _x**2), _x) * legendre.diff(_x) ** 2 * sp.Rational(1, 2)
    weight_poly = sp.Poly(sp.invert(denominator.as_expr(), legendre.as_expr(), _x), _x)
    pos = [sp.CRootOf(legendre, k) for k in range(n - n // 2, n)]
    coeffs = weight_poly.all_coeffs()[::-1]  # constant term first

    def weight(r):
        return sp.Add(*[c * r**k for k, c in enumerate(coeffs) if c != 0])

    centre = weight_poly.eval(0) if n % 2 else None
    return pos, [weight(r) for r in pos], centre


def gauss_square(nx: int, ny: int | None = None) -> Rule:
    """Tensor Gauss-Legendre rule with nx points along xi and ny (default nx) along eta.

    Name ``f"gauss-{nx}x{ny}"``.  Point order: lexicographic in (eta index, xi index), i.e.
    row by row from the bottom (eta ascending) and, within a row, left to right (xi varies
    fastest).  Weight of point (i, j) is w_i * w_j.  ``degree`` = min(2 nx - 1, 2 ny - 1),
    the total degree integrated exactly (each direction separately is exact to 2n - 1).
    """
    nx = _count(nx, "number of Gauss points nx", 1, GAUSS_MAX)
    ny = nx if ny is None else _count(ny, "number of Gauss points ny", 1, GAUSS_MAX)
    return _gauss_square(nx, ny)


def gauss_line(n: int) -> Rule:
    """n-point Gauss-Legendre rule on the reference line [-1, 1], name ``f"gauss-line-{n}"``."""
    return _gauss_tensor((_count(n, "number of Gauss points n", 1, GAUSS_MAX),))


def gauss_cube(nx: int, ny: int | None = None, nz: int | None = None) -> Rule:
    """Tensor Gauss-Legendre rule on the reference cube, name ``f"gauss-{nx}x{ny}x{nz}"``.

    Point order: zeta index slowest, then eta, xi fastest (the square's order, layer by layer
    from zeta = -1 up).  Weight w_i w_j w_k; degree min(2 n - 1) over the three directions.
    """
    nx = _count(nx, "number of Gauss points nx", 1, GAUSS_MAX)
    ny = nx if ny is None else _count(ny, "number of Gauss points ny", 1, GAUSS_MAX)
    nz = nx if nz is None else _count(nz, "number of Gauss points nz", 1, GAUSS_MAX)
    return _gauss_tensor((nx, ny, nz))


def _gauss_square(nx: int, ny: int) -> Rule:
    return _gauss_tensor((nx, ny))


_TENSOR_DOMAIN = {1: "line", 2: "square", 3: "cube"}


@functools.lru_cache(maxsize=None)
def _gauss_tensor(counts: tuple[int, ...]) -> Rule:
    """Gauss-Legendre product rule with counts[a] points along reference axis a (xi fastest)."""
    rules = [_gauss_legendre(n) for n in counts]
    closed = max(counts) <= GAUSS_CLOSED_FORM_MAX
    order = list(itertools.product(*[range(n) for n in reversed(counts)]))
    points, weights = [], []
    for idx in order:
        ks = idx[::-1]  # ks[a]: index along axis a
        points.append(tuple(rules[a][0][k] for a, k in enumerate(ks)))
        w = functools.reduce(operator.mul, [rules[a][1][k] for a, k in enumerate(ks)])
        weights.append(sp.expand(w) if closed else w)
    name = f"gauss-line-{counts[0]}" if len(counts) == 1 else "gauss-" + "x".join(map(str, counts))
    result = Rule(name=name, domain=_TENSOR_DOMAIN[len(counts)], points=tuple(points),
                  weights=tuple(weights), degree=min(2 * n - 1 for n in counts))
    # Seed the float cache from the 1-D values (evalf'd once each, products taken at the same
    # precision) instead of evaluating the product expressions: 10x10 CRootOf rules would
    # otherwise take a noticeable fraction of a second in numeric().
    vals = [[sp.N(v, _EVALF_DIGITS) for v in r[0]] for r in rules]
    wvals = [[sp.N(v, _EVALF_DIGITS) for v in r[1]] for r in rules]
    pts = np.array([[float(vals[a][k]) for a, k in enumerate(idx[::-1])] for idx in order], dtype=np.float64)
    wts = np.array([float(functools.reduce(operator.mul, [wvals[a][k] for a, k in enumerate(idx[::-1])]))
                    for idx in order], dtype=np.float64)
    pts.setflags(write=False)
    wts.setflags(write=False)
    object.__setattr__(result, "_numeric", (pts, wts))
    return result


# --------------------------------------------------------------------------- triangle

def _orbit1() -> list[tuple[sp.Expr, sp.Expr]]:
    third = sp.Rational(1, 3)
    return [(third, third)]


def _orbit3(a: sp.Expr) -> list[tuple[sp.Expr, sp.Expr]]:
    """Points with area coordinates a permutation of (1-2a, a, a); (xi, eta) = (L2, L3)."""
    b = 1 - 2 * a
    return [(a, a), (b, a), (a, b)]


def _orbit6(a: sp.Expr, b: sp.Expr, c: sp.Expr) -> list[tuple[sp.Expr, sp.Expr]]:
    """The six points whose area coordinates (L1, L2, L3) permute (a, b, c)."""
    return [(l2, l3) for _, l2, l3 in itertools.permutations((a, b, c))]


def triangle_rule(degree: int) -> Rule:
    """Symmetric rule on the reference triangle integrating total degree ``degree`` exactly.

    All weights are positive and all points interior; weights sum to 1/2 (the area).

    ====== ======== ===========================================================================
    degree points   rule
    ====== ======== ===========================================================================
    1      1        centroid, weight 1/2
    2      3        (1/6, 1/6), (2/3, 1/6), (1/6, 2/3), weights 1/6
    3      6        Strang & Fix (1973) 6-point rule, equal weights 1/12: the area coordinates
                    are the permutations of the three roots of 60 t^3 - 60 t^2 + 15 t - 1
                    (exact ``CRootOf``; the cubic has three real roots, so real radicals do
                    not exist).  Used instead of the classic 4-point rule, whose centroid
                    weight is negative.
    4      6        Dunavant (1985) 6-point rule in closed form: with
                    s = sqrt(38 - 44 sqrt(2/5)), a = (8 - sqrt(10) -+ s)/18 on orbits
                    (a, a, 1-2a), weights (620 -+ (45 sqrt(10)/2 - 5) s)/7440
                    (= (620 -+ sqrt(213125 - 53320 sqrt(10)))/7440)
    5      7        Radon-type 7-point rule: centroid 9/80 and a = (6 -+ sqrt(15))/21,
                    weights (155 -+ sqrt(15))/2400
    ====== ======== ===========================================================================

    Name ``f"triangle-d{degree}"``; any other degree raises :class:`InputError`.
    """
    return _triangle_rule(_count(degree, "triangle rule degree", TRIANGLE_DEGREES[0],
                                 TRIANGLE_DEGREES[-1]))


@functools.lru_cache(maxsize=None)
def _triangle_rule(degree: int) -> Rule:
    R, sqrt = sp.Rational, sp.sqrt
    if degree == 1:
        points, weights = _orbit1(), [R(1, 2)]
    elif degree == 2:
        points, weights = _orbit3(R(1, 6)), [R(1, 6)] * 3
    elif degree == 3:
        cubic = 60 * _x**3 - 60 * _x**2 + 15 * _x - 1
        roots = [sp.CRootOf(cubic, k) for k in range(3)]
        points, weights = _orbit6(*roots), [R(1, 12)] * 6
    elif degree == 4:
        inner = sqrt(38 - 44 * sqrt(R(2, 5)))
        # (45 sqrt(10)/2 - 5) * inner == sqrt(213125 - 53320 sqrt(10)), Dunavant's form;
        # written over the single nested radical so that plain expand() proves exactness
        wroot = (45 * sqrt(10) / 2 - 5) * inner
        a_small = (8 - sqrt(10) - inner) / 18
        a_large = (8 - sqrt(10) + inner) / 18
        points = _orbit3(a_small) + _orbit3(a_large)
        weights = [(620 - wroot) / 7440] * 3 + [(620 + wroot) / 7440] * 3
    else:  # degree == 5
        s15 = sqrt(15)
        points = _orbit1() + _orbit3((6 - s15) / 21) + _orbit3((6 + s15) / 21)
        weights = [R(9, 80)] + [(155 - s15) / 2400] * 3 + [(155 + s15) / 2400] * 3
    return Rule(name=f"triangle-d{degree}", domain="triangle", points=tuple(points),
                weights=tuple(weights), degree=degree)


# --------------------------------------------------------------------------- tetrahedron

def _tet_orbit4(a: sp.Expr) -> list[tuple[sp.Expr, sp.Expr, sp.Expr]]:
    """Points whose volume coordinates permute (1-3a, a, a, a); (xi, eta, zeta) = (L2, L3, L4)."""
    b = 1 - 3 * a
    return [(a, a, a), (b, a, a), (a, b, a), (a, a, b)]


def _tet_orbit6(a: sp.Expr) -> list[tuple[sp.Expr, sp.Expr, sp.Expr]]:
    """Points whose volume coordinates permute (a, a, 1/2-a, 1/2-a) (the edge-midpoint orbit)."""
    b = sp.Rational(1, 2) - a
    return [(a, b, b), (b, a, b), (b, b, a), (b, a, a), (a, b, a), (a, a, b)]


def tetrahedron_rule(degree: int) -> Rule:
    """Symmetric rule on the reference tetrahedron integrating total degree ``degree`` exactly.

    All weights are positive and the points inside or on the element; weights sum to 1/6.

    ====== ======== ===========================================================================
    degree points   rule
    ====== ======== ===========================================================================
    1      1        centroid, weight 1/6
    2      4        a = (5 - sqrt(5))/20 on the orbit (a, a, a, 1-3a), weights 1/24
                    (Hammer, Marlowe & Stroud 1956; Keast 1986 rule 2)
    3      8        orbits a1 = 1/10 and a2 = 5/24 + sqrt(205)/120 of (a, a, a, 1-3a), weights
                    175/1944 - 5 sqrt(205)/972 and 5 sqrt(205)/972 - 47/972 (both > 0): the
                    two-orbit solution of the moment equations of the symmetric invariants
                    (Keast's 1986 construction; the classic 5-point rule has a negative weight)
    4, 5   15       Stroud (1971) T3:5-1 (Keast 1986 rule 6): centroid 16/135, orbits
                    (7 -+ sqrt(15))/34 of (a, a, a, 1-3a) with (2665 +- 14 sqrt(15))/37800 and
                    the edge orbit (5 - sqrt(15))/20 with 10/189 (unit-volume weights, times 1/6
                    here); degree 4 uses it too (Keast's 11-point degree-4 rule has a negative weight)
    ====== ======== ===========================================================================

    Name ``f"tetrahedron-d{degree}"``; the rule's ``degree`` attribute is the degree it reaches
    (5 for the degree-4 request).  Any other degree raises :class:`InputError`.
    """
    return _tetrahedron_rule(_count(degree, "tetrahedron rule degree", TETRAHEDRON_DEGREES[0],
                                    TETRAHEDRON_DEGREES[-1]))


@functools.lru_cache(maxsize=None)
def _tetrahedron_rule(degree: int) -> Rule:
    R, sqrt = sp.Rational, sp.sqrt
    quarter = R(1, 4)
    if degree == 1:
        points, weights, reached = [(quarter,) * 3], [R(1, 6)], 1
    elif degree == 2:
        points, weights, reached = _tet_orbit4((5 - sqrt(5)) / 20), [R(1, 24)] * 4, 2
    elif degree == 3:
        s205 = sqrt(205)
        points = _tet_orbit4(R(1, 10)) + _tet_orbit4(R(5, 24) + s205 / 120)
        weights = [R(175, 1944) - 5 * s205 / 972] * 4 + [5 * s205 / 972 - R(47, 972)] * 4
        reached = 3
    else:
        s15 = sqrt(15)
        points = ([(quarter,) * 3] + _tet_orbit4((7 - s15) / 34) + _tet_orbit4((7 + s15) / 34)
                  + _tet_orbit6((5 - s15) / 20))
        sixth = R(1, 6)
        weights = ([R(16, 135) * sixth] + [(R(2665, 37800) + 14 * s15 / 37800) * sixth] * 4
                   + [(R(2665, 37800) - 14 * s15 / 37800) * sixth] * 4 + [R(10, 189) * sixth] * 6)
        reached = 5
    return Rule(name=f"tetrahedron-d{degree}", domain="tetrahedron", points=tuple(points),
                weights=tuple(weights), degree=reached)


# --------------------------------------------------------------------------- wedge

def wedge_rule(degree: int, n: int) -> Rule:
    """Product of :func:`triangle_rule` (``degree``) in (xi, eta) and ``n`` Gauss points in zeta.

    Name ``f"wedge-d{degree}x{n}"``; point order: zeta slowest, the triangle's points fastest;
    weight w_tri * w_line (sum 1, the wedge's volume); degree min(degree, 2 n - 1).
    """
    degree = _count(degree, "wedge rule triangle degree", TRIANGLE_DEGREES[0], TRIANGLE_DEGREES[-1])
    return _wedge_rule(degree, _count(n, "number of Gauss points n", 1, GAUSS_MAX))


@functools.lru_cache(maxsize=None)
def _wedge_rule(degree: int, n: int) -> Rule:
    tri = _triangle_rule(degree)
    zs, wz = _gauss_legendre(n)
    points = [(p, q, z) for z in zs for (p, q) in tri.points]
    weights = [sp.expand(w * u) for u in wz for w in tri.weights]
    return Rule(name=f"wedge-d{degree}x{n}", domain="wedge", points=tuple(points), weights=tuple(weights),
                degree=min(tri.degree, 2 * n - 1))


# --------------------------------------------------------------------------- by name

_GAUSS_NAME = re.compile(r"gauss-(\d+)(?:x(\d+))?")
_CUBE_NAME = re.compile(r"gauss-(\d+)x(\d+)x(\d+)")
_LINE_NAME = re.compile(r"gauss-line-(\d+)")
_TRIANGLE_NAME = re.compile(r"triangle-d(\d+)")
_TETRAHEDRON_NAME = re.compile(r"tetrahedron-d(\d+)")
_WEDGE_NAME = re.compile(r"wedge-d(\d+)x(\d+)")


def rule(name: str) -> Rule:
    """Rule by name: ``"gauss-2x2"`` (nx x ny), ``"gauss-3"`` (= 3x3), ``"gauss-2x2x2"`` (cube),
    ``"gauss-line-3"``, ``"triangle-d2"``, ``"tetrahedron-d2"``, ``"wedge-d2x2"``."""
    forms = (f"allowed forms: 'gauss-<n>', 'gauss-<nx>x<ny>', 'gauss-<nx>x<ny>x<nz>', 'gauss-line-<n>' "
             f"(n = 1..{GAUSS_MAX}), 'triangle-d<degree>', 'tetrahedron-d<degree>' (degree = "
             f"{TRIANGLE_DEGREES[0]}..{TRIANGLE_DEGREES[-1]}), 'wedge-d<degree>x<n>'")
    if not isinstance(name, str):
        raise InputError(f"unknown quadrature rule {name!r}; {forms}")
    text = name.strip()

    def gauss_ok(*counts):
        return all(1 <= int(c) <= GAUSS_MAX for c in counts)

    match = _GAUSS_NAME.fullmatch(text)
    if match:
        nx = int(match.group(1))
        ny = int(match.group(2)) if match.group(2) else nx
        if gauss_ok(nx, ny):
            return _gauss_square(nx, ny)
    match = _CUBE_NAME.fullmatch(text) or _LINE_NAME.fullmatch(text)
    if match and gauss_ok(*match.groups()):
        return _gauss_tensor(tuple(int(g) for g in match.groups()))
    match = _TRIANGLE_NAME.fullmatch(text)
    if match and int(match.group(1)) in TRIANGLE_DEGREES:
        return _triangle_rule(int(match.group(1)))
    match = _TETRAHEDRON_NAME.fullmatch(text)
    if match and int(match.group(1)) in TETRAHEDRON_DEGREES:
        return _tetrahedron_rule(int(match.group(1)))
    match = _WEDGE_NAME.fullmatch(text)
    if match and int(match.group(1)) in TRIANGLE_DEGREES and gauss_ok(match.group(2)):
        return _wedge_rule(int(match.group(1)), int(match.group(2)))
    raise InputError(f"unknown quadrature rule {name!r}; {forms}")
