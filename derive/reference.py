"""Reference domains and exact integrals of polynomials over them.

Two reference domains are used throughout derive:

``"square"``
    [-1, 1] x [-1, 1] in the reference coordinates (xi, eta); quadrilaterals.
``"triangle"``
    the triangle with vertices (0, 0), (1, 0), (0, 1) in (xi, eta); triangles.
    Its area coordinates are L1 = 1 - xi - eta, L2 = xi, L3 = eta.

Why a monomial table: element matrices on a reference domain are polynomials in
(xi, eta) (with symbolic coefficients such as ``E``, ``nu``, ``a``, ``b``).  Their exact
integral is a linear combination of the integrals of xi^p eta^q, which have closed forms.
Splitting the integrand into ``sympy.Poly`` terms and looking each monomial up in a cached
table is exact and far faster than ``sympy.integrate``, which this module never calls.
"""
from __future__ import annotations

import functools
import math
import operator
from collections.abc import Sequence

import sympy as sp
from sympy.polys.polyerrors import PolynomialError

from derive.errors import InputError
from derive.symbols import eta, xi

#: the supported reference domain names
DOMAINS: tuple[str, ...] = ("square", "triangle")

_AREA = {"square": sp.Integer(4), "triangle": sp.Rational(1, 2)}


def check_domain(domain: str) -> str:
    """Return ``domain`` if it is a known reference domain, else raise :class:`InputError`."""
    if not isinstance(domain, str) or domain not in DOMAINS:
        raise InputError(f"unknown reference domain {domain!r}; allowed: {', '.join(DOMAINS)}")
    return domain


def area(domain: str) -> sp.Rational:
    """Exact area of the reference domain: 4 for the square, 1/2 for the triangle."""
    return _AREA[check_domain(domain)]


def _check_power(name: str, value: int) -> int:
    try:
        if isinstance(value, bool):
            raise TypeError
        index = operator.index(value)
    except TypeError:
        index = -1
    if index < 0:
        raise InputError(f"monomial exponent {name} must be a non-negative integer, got {value!r}")
    return index


def monomial_integral(domain: str, p: int, q: int) -> sp.Rational:
    """Exact integral of xi**p * eta**q over the reference domain (cached).

    square:   product of the 1-D integrals over [-1, 1]: 2/(k+1) for even k, 0 for odd k.
    triangle: p! q! / (p + q + 2)!  (the area-coordinate formula with L2 = xi, L3 = eta).
    """
    return _monomial_integral(check_domain(domain), _check_power("p", p), _check_power("q", q))


@functools.lru_cache(maxsize=None)
def _monomial_integral(domain: str, p: int, q: int) -> sp.Rational:
    if domain == "square":
        if p % 2 or q % 2:
            return sp.Integer(0)
        return sp.Rational(4, (p + 1) * (q + 1))
    return sp.Rational(math.factorial(p) * math.factorial(q), math.factorial(p + q + 2))


def _short(expr: object, limit: int = 60) -> str:
    text = " ".join(str(expr).split())
    return text if len(text) <= limit else text[: limit - 3] + "..."


def _as_poly(expr: sp.Expr, gens: tuple[sp.Symbol, ...]) -> tuple[sp.Poly, sp.Expr]:
    """Polynomial part and a generator-free denominator of ``expr``.

    The fast path is ``sympy.Poly`` directly.  Only if that fails is the expression brought
    over a common denominator (``cancel``), which accepts e.g. ``(xi**2 - 1)/(xi - 1)`` or
    ``xi/(1 - nu)`` written in awkward forms; a denominator containing a generator is refused.
    """
    names = ", ".join(str(g) for g in gens)
    try:
        return sp.Poly(expr, *gens), sp.Integer(1)
    except (PolynomialError, sp.GeneratorsNeeded, TypeError, ValueError):
        pass
    try:
        num, den = sp.fraction(sp.cancel(sp.together(expr)))
        if not (den.free_symbols & set(gens)):
            return sp.Poly(num, *gens), den
    except (PolynomialError, sp.GeneratorsNeeded, TypeError, ValueError):
        pass
    raise InputError(f"integrate_polynomial: not a polynomial in ({names}): {_short(expr)}")


def integrate_polynomial(expr, domain: str, gens: Sequence[sp.Symbol] = (xi, eta)):
    """Exact integral over the reference domain of a polynomial in ``gens`` = (xi, eta).

    ``expr`` may have symbolic coefficients (``E``, ``nu``, ``a`` ...); they are carried
    through untouched.  A sympy Matrix is integrated entry by entry.  The integral is the sum
    of coefficient * :func:`monomial_integral` over the ``Poly`` terms; ``sympy.integrate``
    is never called.  Non-polynomial input raises :class:`InputError`.
    """
    check_domain(domain)
    gens = tuple(gens)
    if len(gens) != 2 or not all(isinstance(g, sp.Symbol) for g in gens):
        raise InputError(f"integrate_polynomial: gens must be two sympy Symbols, got {gens!r}")
    if isinstance(expr, sp.MatrixBase):
        return expr.applyfunc(lambda e: integrate_polynomial(e, domain, gens))
    try:
        expr = sp.sympify(expr)
    except (sp.SympifyError, TypeError) as exc:
        raise InputError(f"integrate_polynomial: cannot read expression {_short(expr)!s}") from exc
    if not isinstance(expr, sp.Expr):
        raise InputError(f"integrate_polynomial: not a scalar expression: {_short(expr)}")
    if not (expr.free_symbols & set(gens)):
        return expr * area(domain)
    poly, den = _as_poly(expr, gens)
    terms = []
    for (p, q), coeff in poly.terms():
        value = _monomial_integral(domain, p, q)
        if value != 0:
            terms.append(coeff * value)
    total = sp.Add(*terms)
    return total / den if den != 1 else total


def _nonnegative(value: sp.Expr) -> bool:
    """Exact sign test ``value >= 0`` for a sympy number (radicals, CRootOf, rationals)."""
    known = value.is_nonnegative
    if known is not None:
        return bool(known)
    # sympy could not decide: an exact zero written in a complicated form, or a number
    # very close to zero.  Decide exactly where possible, else with a high-precision value.
    if value.equals(0):
        return True
    approx = value.evalf(60)
    if approx.is_comparable:
        return bool(approx >= 0)
    raise InputError(f"contains: cannot decide the sign of {_short(value)}")


def contains(domain: str, point: Sequence, tol=0) -> bool:
    """True if ``point`` = (xi, eta) lies inside the reference domain or on its boundary.

    Comparisons are exact for sympy numbers (e.g. ``sqrt(3)/3``); ``tol`` >= 0 widens the
    domain by that amount in each inequality (useful for floating-point points).
    """
    check_domain(domain)
    try:
        if len(point) != 2:
            raise TypeError
        p, q = (sp.sympify(v) for v in point)
        tol = sp.sympify(tol)
    except (TypeError, sp.SympifyError) as exc:
        raise InputError(f"contains: point must be a pair (xi, eta) of numbers, got {point!r}") from exc
    for v in (p, q, tol):
        if not (isinstance(v, sp.Expr) and v.is_number and v.is_extended_real is not False):
            raise InputError(f"contains: point and tol must be real numbers, got {_short(v)}")
    if not _nonnegative(tol):
        raise InputError(f"contains: tol must be >= 0, got {tol}")
    if domain == "square":
        checks = (p + 1 + tol, 1 + tol - p, q + 1 + tol, 1 + tol - q)
    else:
        checks = (p + tol, q + tol, 1 + tol - p - q)
    return all(_nonnegative(c) for c in checks)


# expose the lru_cache interface on the public function (the cache sits behind validation)
monomial_integral.cache_info = _monomial_integral.cache_info  # type: ignore[attr-defined]
monomial_integral.cache_clear = _monomial_integral.cache_clear  # type: ignore[attr-defined]
