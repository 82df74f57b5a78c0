"""Entry-by-entry equality for ``derive check``, with its cost bounded before any algebra.

A user's entry may pass every parser limit and still be expensive: ``(a+b+...+r)^64``
expands to about 10^11 terms, a product of 40 rational factors to a numerator of 2^40
terms, and sympy's ``cancel`` on either runs for minutes and gigabytes.  So each
comparison first *estimates* (from the expression tree, without expanding anything) the
number of terms and the total degree of the numerator and denominator that ``together``
and ``expand`` would produce, and then

1. evaluates both entries exactly (rational arithmetic) at the same few random rational
   points (entries with roots or functions: at 50 significant digits); a point where
   they differ decides "different" and is the counterexample;
2. if they agree everywhere and the estimated size of ``n_e d_g - n_g d_e`` is at most
   ``MAX_PROOF_TERMS``, proves equality by expanding it (``exact``); larger entries are
   reported "equal at the random points" (``points``): for rational functions a false
   match needs every point to be a root of the nonzero difference, which has probability
   below (degree / 10^6) per point (Schwartz-Zippel lemma).

An entry whose estimated degree exceeds ``MAX_DEGREE`` is refused (InputError): no
element matrix has such degree, and exact evaluation would cost memory in proportion.
"""
from __future__ import annotations

import functools
import math
import random
from dataclasses import dataclass
from fractions import Fraction

import sympy as sp

from .errors import InputError

#: estimated terms of the expanded cross difference up to which equality is proven
MAX_PROOF_TERMS = 6000
#: estimated total degree beyond which an entry is refused
MAX_DEGREE = 1000
#: random exact points per comparison
N_POINTS = 6
#: significant digits for entries that are not rational functions (roots, functions)
FLOAT_DIGITS = 50
#: relative difference below which two float evaluations agree
FLOAT_RTOL = 1e-30

_CAP = 10 ** 15  # estimates saturate here: anything this large is "too large"


@dataclass(frozen=True)
class Size:
    """Upper bounds on the expanded numerator/denominator of an expression (over a common
    denominator): term counts, total degrees, and whether it is a rational function of its
    symbols (no roots, functions or constants such as pi)."""

    num: int
    den: int
    deg_num: int
    deg_den: int
    rational: bool

    @property
    def degree(self) -> int:
        return max(self.deg_num, self.deg_den)


_ONE = Size(1, 1, 0, 0, True)
_SYMBOL = Size(1, 1, 1, 0, True)
_OPAQUE = Size(1, 1, 1, 0, False)  # a root or a function, treated as one more generator


def _cap(n: int) -> int:
    return n if n < _CAP else _CAP


def _power_terms(terms: int, k: int) -> int:
    """Upper bound on the terms of (t_1 + ... + t_n)^k: the multisets of k from n."""
    if terms <= 1 or k <= 1:
        return terms if k >= 1 else 1
    if k * math.log10(terms) > 15 and terms > k:
        return _CAP
    return _cap(math.comb(terms + k - 1, k))


def estimate(expr: sp.Expr) -> Size:
    """Size bounds of ``expr`` (memoised over shared subtrees, linear in the tree)."""
    memo: dict = {}
    return _estimate(sp.sympify(expr), memo)


def _estimate(e, memo) -> Size:
    hit = memo.get(e)
    if hit is not None:
        return hit
    if e.is_Rational:
        s = _ONE
    elif e.is_Symbol:
        s = _SYMBOL
    elif e.is_Number or e.is_NumberSymbol:
        s = Size(1, 1, 0, 0, False)
    elif e.is_Add or e.is_Mul:
        parts = [_estimate(a, memo) for a in e.args]
        rational = all(p.rational for p in parts)
        den = 1
        deg_den = 0
        for p in parts:
            den = _cap(den * p.den)
            deg_den += p.deg_den
        if e.is_Mul:
            num = 1
            for p in parts:
                num = _cap(num * p.num)
            s = Size(num, den, sum(p.deg_num for p in parts), deg_den, rational)
        else:  # over the product of the denominators, as together() does
            num = 0
            deg_num = 0
            for p in parts:
                num = _cap(num + p.num * (den // max(p.den, 1)))
                deg_num = max(deg_num, p.deg_num + deg_den - p.deg_den)
            s = Size(num, den, deg_num, deg_den, rational)
    elif e.is_Pow and e.exp.is_Integer:
        b = _estimate(e.base, memo)
        k = int(e.exp)
        n, d = _power_terms(b.num, abs(k)), _power_terms(b.den, abs(k))
        dn, dd = b.deg_num * abs(k), b.deg_den * abs(k)
        s = Size(n, d, dn, dd, b.rational) if k >= 0 else Size(d, n, dd, dn, b.rational)
    else:  # root, function: its argument's degree still matters for evaluation
        inner = max((_estimate(a, memo).degree for a in e.args), default=0)
        s = Size(1, 1, max(1, inner), 0, False)
    memo[e] = s
    return s


# ---------------------------------------------------------------------------------------------
# random points and evaluation

def sample_value(name: str, rnd: random.Random) -> Fraction:
    """A random rational in the physical range of the symbol (nu in (0, 0.49), lengths and
    moduli positive), from about 10^6 distinct values."""
    if name == "nu":
        return Fraction(rnd.randint(1, 490), 1000) + Fraction(rnd.randint(0, 999), 10 ** 6)
    if name in ("E", "t", "a", "b", "R", "r"):
        return Fraction(rnd.randint(100, 99999), rnd.randint(20, 9973))
    return Fraction(rnd.randint(-99999, 99999), rnd.randint(20, 9973))


def make_points(symbols, n: int = N_POINTS, seed: int = 20261201) -> list[dict]:
    """``n`` points {symbol: Fraction}, the same for the same symbols on every run."""
    rnd = random.Random(seed)
    syms = sorted(set(symbols), key=lambda s: s.name)
    return [{s: sample_value(s.name, rnd) for s in syms} for _ in range(n)]


class _NotRational(Exception):
    pass


def _exact(e, pt: dict, memo: dict) -> Fraction:
    """Exact value of a rational function of the symbols at ``pt`` (ZeroDivisionError at a pole)."""
    hit = memo.get(e)
    if hit is not None:
        return hit
    if e.is_Rational:
        v = Fraction(int(e.p), int(e.q))
    elif e.is_Symbol:
        if e not in pt:
            raise _NotRational(e)
        v = pt[e]
    elif e.is_Add:
        v = sum((_exact(a, pt, memo) for a in e.args), Fraction(0))
    elif e.is_Mul:
        v = Fraction(1)
        for a in e.args:
            v *= _exact(a, pt, memo)
    elif e.is_Pow and e.exp.is_Integer:
        v = _exact(e.base, pt, memo) ** int(e.exp)
    else:
        raise _NotRational(e)
    memo[e] = v
    return v


def value_at(expr, pt: dict):
    """Exact Fraction, or an mpmath-backed sympy Float for entries with roots/functions,
    or None where the expression is undefined (a pole)."""
    try:
        return _exact(expr, pt, {})
    except ZeroDivisionError:
        return None
    except _NotRational:
        pass
    subs = {s: sp.Rational(v.numerator, v.denominator) for s, v in pt.items()}
    try:
        v = sp.sympify(expr).evalf(FLOAT_DIGITS, subs=subs)
    except (ZeroDivisionError, ValueError, TypeError, ArithmeticError):
        return None
    if not v.is_number or v.has(sp.zoo, sp.nan, sp.oo, -sp.oo) or v.has(sp.I):
        return None
    return v


def _as_float(u):
    return sp.Float(sp.Rational(u.numerator, u.denominator), FLOAT_DIGITS) if isinstance(u, Fraction) else u


def values_differ(u, v) -> bool:
    """Exact values: unequal.  Float values (50 digits): relative difference above FLOAT_RTOL."""
    if isinstance(u, Fraction) and isinstance(v, Fraction):
        return u != v
    u, v = _as_float(u), _as_float(v)
    return bool(abs(u - v) > FLOAT_RTOL * max(abs(u), abs(v)) + sp.Float(10) ** (5 - FLOAT_DIGITS))


# ---------------------------------------------------------------------------------------------
# the comparison

def check_degree(expr, where: str) -> Size:
    size = estimate(expr)
    if size.degree > MAX_DEGREE:
        raise InputError(f"{where}: the entry has degree about {size.degree} in its symbols (limit "
                         f"{MAX_DEGREE}); no element matrix has such degree: is it the intended matrix?")
    return size


@functools.lru_cache(maxsize=64)
def _ring(gens: tuple):
    return sp.ring(gens, sp.QQ)[0]


def _cross_difference_vanishes(expected, given, rational: bool) -> bool:
    """n_e d_g == n_g d_e, in sympy's sparse polynomial ring for rational functions (several
    times faster than expanding expressions), else by expansion (roots, functions)."""
    ne, de = sp.together(expected).as_numer_denom()
    ng, dg = sp.together(given).as_numer_denom()
    if rational:
        gens = tuple(sorted(expected.free_symbols | given.free_symbols, key=lambda s: s.name))
        if not gens:
            return sp.Rational(ne * dg - ng * de) == 0
        R = _ring(gens)
        try:
            return R(ne) * R(dg) == R(ng) * R(de)
        except (ValueError, TypeError, sp.polys.polyerrors.PolynomialError):
            pass  # not a polynomial after all: expand below
    return sp.expand(ne * dg - ng * de) == 0


class Comparer:
    """Compares pairs of entries on one fixed set of points; caches values and verdicts so a
    user's entry is evaluated once however many candidate matrices it is compared with."""

    def __init__(self, symbols, n_points: int = N_POINTS):
        self.points = make_points(symbols, n_points)
        self._values: dict = {}
        self._sizes: dict = {}
        self._verdicts: dict = {}
        self.proven = 0
        self.sampled = 0

    def size(self, expr) -> Size:
        s = self._sizes.get(expr)
        if s is None:
            s = self._sizes[expr] = estimate(expr)
        return s

    def values(self, expr) -> list:
        vals = self._values.get(expr)
        if vals is None:
            missing = sp.sympify(expr).free_symbols - set(self.points[0]) if self.points else set()
            if missing:
                self.extend(missing)
            vals = self._values[expr] = [value_at(expr, p) for p in self.points]
        return vals

    def extend(self, symbols) -> None:
        """Add symbols to the points (clears the caches: every value must use the same points)."""
        have = set(self.points[0]) if self.points else set()
        self.points = make_points(have | set(symbols), len(self.points))
        self._values.clear()
        self._verdicts.clear()

    def equal(self, expected, given) -> tuple[bool, dict | None]:
        """(True, None) equal; (False, point or None) different, with a counterexample point."""
        expected, given = sp.sympify(expected), sp.sympify(given)
        key = (expected, given)
        hit = self._verdicts.get(key)
        if hit is not None:
            return hit
        verdict = self._equal(expected, given)
        self._verdicts[key] = verdict
        return verdict

    def _equal(self, expected, given):
        if expected == given:
            return True, None
        ve, vg = self.values(expected), self.values(given)
        agreed = 0
        for pt, u, v in zip(self.points, ve, vg):
            if u is None or v is None:
                continue
            if values_differ(u, v):
                return False, {k.name: str(val) for k, val in pt.items()
                               if k in expected.free_symbols | given.free_symbols}
            agreed += 1
        se, sg = self.size(expected), self.size(given)
        cross = se.num * sg.den + sg.num * se.den
        if cross <= MAX_PROOF_TERMS:
            rational = se.rational and sg.rational
            if _cross_difference_vanishes(expected, given, rational):
                self.proven += 1
                return True, None
            if rational:
                return False, None  # a nonzero polynomial that vanished at every point: rare
        if agreed == 0:
            return False, None  # undefined at every point: cannot be the same entry
        self.sampled += 1
        return True, None

    def method(self) -> str:
        if not self.sampled:
            return "exact"
        return (f"exact for {self.proven} entr{'y' if self.proven == 1 else 'ies'}, equal at "
                f"{len(self.points)} random rational points for {self.sampled} (too large to expand)")
