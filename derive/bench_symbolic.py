"""Symbolic-derivation benchmark: closed-form rectangle / brick stiffness vs a naive route.

The naive route is what one writes in a throw-away session: B^T D B t det J with sympy
Matrix products, ``sympy.integrate`` over the reference domain, then ``simplify`` entry by
entry.  Both routes are timed in one run; the ratio is what is reported.  For the 3-D
elements the naive route takes minutes to hours for the whole matrix, so it is timed on a few
upper-triangle entries and extrapolated to all of them (stated in the line).
"""
from __future__ import annotations

import time

import sympy as sp

from .element import Element, element
from .formulations.base import Point
from .symbols import eta, xi, zeta

#: 3-D closed forms timed (targets from the issue, seconds on 2 cores)
SOLID_TARGETS = {"H8": 1.0, "T10": 10.0, "H20": 30.0, "H27": 30.0}


def _limits(domain: str) -> tuple:
    """Iterated integration limits of the reference domain, innermost first."""
    return {"square": ((xi, -1, 1), (eta, -1, 1)),
            "triangle": ((eta, 0, 1 - xi), (xi, 0, 1)),
            "cube": ((xi, -1, 1), (eta, -1, 1), (zeta, -1, 1)),
            "tetrahedron": ((zeta, 0, 1 - xi - eta), (eta, 0, 1 - xi), (xi, 0, 1))}[domain]


def naive_stiffness(name: str, entries: list[tuple[int, int]] | None = None) -> sp.Matrix | dict:
    """K on the default geometry (rectangle / brick) by sympy.integrate + simplify (the slow route,
    for comparison); only the listed (i, j) entries when ``entries`` is given (returned as a dict)."""
    el = element(name)
    imap = el.map()
    pt = Point(imap, el.state, *imap.coords)
    B, D = pt.B, pt.D
    integrand = (B.T * D * B) * pt.detJ * pt.thick
    limits = _limits(el.shapes.domain)

    def one(e):
        return sp.simplify(sp.integrate(e, *limits))
    if entries is not None:
        return {(i, j): one(integrand[i, j]) for i, j in entries}
    return integrand.applyfunc(lambda e: sp.integrate(e, *limits)).applyfunc(sp.simplify)


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
    solid = ("H8",) if quick else tuple(SOLID_TARGETS)
    for name in solid:
        t0, c0 = time.perf_counter(), time.process_time()
        K = _fresh(name).stiffness(None, rule="exact")
        fast, cpu = time.perf_counter() - t0, time.process_time() - c0
        n = K.rows
        sample = [(0, 0)] if quick else [(0, 0), (0, 1), (0, 4), (1, 7), (2, 5), (3, 9)]
        t0 = time.perf_counter()
        Kn = naive_stiffness(name, sample)
        per_entry = (time.perf_counter() - t0) / len(sample)
        naive = per_entry * n * (n + 1) / 2
        same = all(sp.cancel(K[i, j] - v) == 0 for (i, j), v in Kn.items())
        target = SOLID_TARGETS[name]
        rows.append({"element": name, "derive_s": fast, "derive_cpu_s": cpu, "naive_s_extrapolated": naive, "speedup": naive / fast,
                     "agree": same, "target_s": target, "sampled_entries": len(sample)})
        lines.append(f"{name} (solid, brick geometry): derive {fast:.2f} s wall, {cpu:.2f} s CPU (target < {target:g} s), naive integrate+simplify "
                     f"~{naive:.0f} s (extrapolated from {len(sample)} of {n * (n + 1) // 2} entries), ratio "
                     f"~{naive / fast:.0f}x, sampled entries agree: {same}")
    return {"rows": rows, "lines": lines, "command": "derive perf --symbolic"}
