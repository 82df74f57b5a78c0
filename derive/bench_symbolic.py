"""Symbolic-derivation benchmark: closed-form rectangular stiffness vs a naive route.

The naive route is what one writes in a throw-away session: B^T D B t det J with sympy
Matrix products, ``sympy.integrate`` over the square, then ``simplify`` entry by entry.
Both routes are timed in one run; the ratio is what is reported.
"""
from __future__ import annotations

import time

import sympy as sp

from .element import Element, element
from .formulations.base import Point
from .symbols import eta, t, xi


def naive_stiffness(name: str) -> sp.Matrix:
    """K for the rectangle by sympy.integrate + simplify (the slow route, for comparison)."""
    el = element(name)
    imap = el.map("rectangle")
    pt = Point(imap, "plane-stress", xi, eta)
    B, D = pt.B, pt.D
    integrand = (B.T * D * B) * pt.detJ * t
    K = integrand.applyfunc(lambda e: sp.integrate(e, (xi, -1, 1), (eta, -1, 1)))
    return K.applyfunc(sp.simplify)


def _fresh(name: str) -> Element:
    """A new Element with every derivation cache cleared, so the timing includes the
    shape functions (Vandermonde inverse) and the moment tables."""
    from . import catalog, reference, stiffness
    from sympy.core.cache import clear_cache
    clear_cache()
    catalog.shape_set.cache_clear()
    stiffness.rule_moment.cache_clear()
    reference.monomial_integral.cache_clear()
    e = element(name)
    return Element(e.info, e.variant, e.state, catalog.shape_set(name))


def benchmark(quick: bool = False) -> dict:
    names = ("Q4",) if quick else ("Q4", "Q8", "Q9")
    rows, lines = [], []
    for name in names:
        t0 = time.perf_counter()
        K = _fresh(name).stiffness("rectangle", rule="exact")
        fast = time.perf_counter() - t0
        t0 = time.perf_counter()
        Kn = naive_stiffness(name)
        naive = time.perf_counter() - t0
        same = all(sp.cancel(K[i, j] - Kn[i, j]) == 0 for i in range(K.rows) for j in range(i, K.cols))
        rows.append({"element": name, "derive_s": fast, "naive_s": naive, "speedup": naive / fast, "agree": same})
        lines.append(f"{name}: derive {fast:.3f} s, naive integrate+simplify {naive:.2f} s, "
                     f"ratio {naive / fast:.0f}x, results agree: {same}")
    return {"rows": rows, "lines": lines, "command": "derive perf --symbolic"}
