"""`derive perf --kernels`: generated kernels against a vectorised NumPy quadrature baseline.

For Q4, Q8 and T6 in plane stress, n = 200 000 random distorted elements (``quick``:
20 000), measured side by side in one run (best of several repeats each): the generated C,
NumPy and Fortran kernels and a well-written NumPy baseline (batched matmul over the Gauss
points, explicit 2x2 inverse, no Python loop over elements).  Reported: time, elements
per second, ratio to the baseline, flops per element (the generated C code's operation
count), the achieved flop rate and its fraction of the core's peak (estimated from the
CPU flags and the measured clock: FMA x SIMD width x 2 units), plus the write-bandwidth
bound of storing K.  Single thread: the kernels are serial and BLAS threads are not used
by the timed code.
"""
from __future__ import annotations

import platform
import time

import numpy as np

from .. import catalog, quadrature

ELEMENTS = ("Q4", "Q8", "T6")
COMMAND = "derive perf --kernels"


def random_elements(name: str, n: int, seed: int = 0, amplitude: float = 0.12) -> np.ndarray:
    """n distorted copies of the reference element (each node moved up to ``amplitude``)."""
    info = catalog.ELEMENTS[name]
    ref = np.array([[float(a), float(b)] for a, b in info.nodes])
    if info.domain == "triangle":
        ref = 2.0 * ref
    rng = np.random.default_rng(seed)
    return ref[None] + amplitude * rng.uniform(-1.0, 1.0, (n, len(ref), 2))


class Baseline:
    """Vectorised textbook quadrature K = sum_g w_g B^T D B det J t (plane stress)."""

    def __init__(self, name: str):
        info = catalog.ELEMENTS[name]
        shapes = catalog.shape_set(name)
        rl = quadrature.rule(info.full_rule)
        pts, self.w = rl.numeric()
        import sympy as sp
        from ..symbols import eta, xi
        dxi, deta = shapes.derivatives
        f = sp.lambdify((xi, eta), [list(dxi), list(deta)], "numpy")
        self.dN = [np.array(np.broadcast_arrays(*[np.asarray(v, float) for v in sum(f(p, q), [])])).reshape(2, -1)
                   for p, q in pts]
        self.nodes = shapes.n

    def __call__(self, xy, E, nu, t):
        n, m = xy.shape[0], self.nodes
        D = E / (1 - nu ** 2) * np.array([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])
        K = np.zeros((n, 2 * m, 2 * m))
        B = np.zeros((n, 3, 2 * m))
        for dN, w in zip(self.dN, self.w):
            J = dN @ xy                                        # (n, 2, 2)
            det = J[:, 0, 0] * J[:, 1, 1] - J[:, 0, 1] * J[:, 1, 0]
            Ji = np.empty_like(J)
            Ji[:, 0, 0], Ji[:, 0, 1] = J[:, 1, 1] / det, -J[:, 0, 1] / det
            Ji[:, 1, 0], Ji[:, 1, 1] = -J[:, 1, 0] / det, J[:, 0, 0] / det
            dxy = Ji @ dN                                      # (n, 2, nodes)
            B[:, 0, 0::2] = dxy[:, 0]
            B[:, 1, 1::2] = dxy[:, 1]
            B[:, 2, 0::2] = dxy[:, 1]
            B[:, 2, 1::2] = dxy[:, 0]
            K += (w * t * det)[:, None, None] * (np.transpose(B, (0, 2, 1)) @ (D @ B))
        return K


def _best(fn, repeats: int) -> float:
    best = float("inf")
    for _ in range(repeats):
        t0 = time.perf_counter()
        fn()
        best = min(best, time.perf_counter() - t0)
    return best


def _cpu() -> dict:
    """Model name, measured-clock estimate and peak double-precision flops per cycle."""
    model, flags, mhz = platform.processor() or platform.machine(), set(), None
    try:
        with open("/proc/cpuinfo", encoding="utf-8", errors="replace") as fh:
            for line in fh:
                if line.startswith("model name") and model in ("", platform.machine(), platform.processor()):
                    model = line.split(":", 1)[1].strip()
                elif line.startswith("flags"):
                    flags = set(line.split(":", 1)[1].split())
                elif line.startswith("cpu MHz") and mhz is None:
                    mhz = float(line.split(":", 1)[1])
                if line.strip() == "" and flags:
                    break
    except OSError:
        pass
    width = 8 if "avx512f" in flags else (4 if "avx2" in flags or "avx" in flags else 2)
    fma = 2 if "fma" in flags or "avx512f" in flags else 1
    per_cycle = width * fma * 2          # two FMA/vector units per core assumed
    return {"model": model, "mhz": mhz, "flops_per_cycle": per_cycle,
            "peak_gflops": per_cycle * mhz / 1e3 if mhz else None,
            "simd": "avx512" if width == 8 else ("avx2" if width == 4 else "sse2")}


def _write_bandwidth(nbytes: int) -> float:
    a = np.empty(nbytes // 8)
    a.fill(0.0)
    t = _best(lambda: a.fill(1.0), 3)
    return nbytes / t


def generation_timings(full_set: bool = True) -> dict:
    """Wall times of deriving + emitting: Q4 general geometry (all three languages, fresh
    process, the CLI command) and, unless quick, the whole committed set (``--all`` into a
    temporary folder)."""
    import subprocess
    import sys
    import tempfile
    out = {}
    code = ("import time; t0 = time.perf_counter(); from derive.codegen.emit import generate; "
            "generate('Q4', 'full', 'plane-stress', langs=('numpy', 'c', 'fortran')); "
            "print(time.perf_counter() - t0)")
    t0 = time.perf_counter()
    res = subprocess.run([sys.executable, "-c", code], capture_output=True, text=True, check=True)
    out["q4_process_s"] = time.perf_counter() - t0
    out["q4_in_process_s"] = float(res.stdout.strip().splitlines()[-1])
    if full_set:
        with tempfile.TemporaryDirectory() as tmp:
            t0 = time.perf_counter()
            subprocess.run([sys.executable, "-m", "derive", "kernel", "--all", "-o", tmp + "/g", "--json"],
                           capture_output=True, text=True, check=True)
            out["all_s"] = time.perf_counter() - t0
    return out


def benchmark(quick: bool = False) -> dict:
    from .loader import empty_aligned, find_compiler, kernel
    n = 20_000 if quick else 200_000
    repeats = 3 if quick else 5
    E, nu, t = 1.0, 0.3, 1.0
    cpu = _cpu()
    rows, lines = [], []
    bw = _write_bandwidth(n * 128 * 8)
    lines.append(f"n = {n} random distorted elements per element type, plane stress, best of {repeats}; "
                 f"single thread; CPU {cpu['model']} ({cpu['simd']}, "
                 f"{'%.0f MHz' % cpu['mhz'] if cpu['mhz'] else 'clock unknown'}, est. peak "
                 f"{'%.0f' % cpu['peak_gflops'] if cpu['peak_gflops'] else '?'} GFlop/s double); "
                 f"measured fill bandwidth (plain stores, numpy fill) {bw / 1e9:.1f} GB/s")
    langs = ["c", "numpy", "fortran"]
    for name in ELEMENTS:
        xy = random_elements(name, n)
        base = Baseline(name)
        ndof = 2 * xy.shape[1]
        out = empty_aligned((n, ndof, ndof))
        ref = base(xy[:200], E, nu, t)
        tb = _best(lambda: base(xy, E, nu, t), 3)
        row = {"element": name, "n": n, "baseline_s": tb, "kernels": {}}
        lines.append(f"{name}: baseline NumPy quadrature {tb * 1e3:.1f} ms ({n / tb / 1e6:.2f} M el/s)")
        for lang in langs:
            if lang != "numpy" and find_compiler(lang) is None:
                lines.append(f"  {lang}: no compiler, skipped")
                continue
            k = kernel(name, "full", "plane-stress", lang)
            K0 = k(xy[:200], E, nu, t)
            err = float(np.abs(K0 - ref).max() / np.abs(ref).max())
            tk = _best(lambda: k(xy, E, nu, t, out=out), repeats)
            flops = k.meta["flops"]["stiffness"]
            rate = flops * n / tk
            frac = rate / (cpu["peak_gflops"] * 1e9) if cpu["peak_gflops"] else None
            store = n * ndof * ndof * 8 / tk
            # the same kernel on a batch whose K stays in cache (compute-bound rate, no memory wall)
            nc = 4096 if ndof <= 12 else 1024
            xc, oc = np.ascontiguousarray(xy[:nc]), empty_aligned((nc, ndof, ndof))
            reps = max(1, int(2e5 // nc))
            tc = _best(lambda: [k._impl.stiffness(xc, E, nu, t, oc) for _ in range(reps)], 3) / (reps * nc)
            row_cache = flops / tc
            row["kernels"][lang] = {"in_cache_el_per_s": 1 / tc, "in_cache_gflops": row_cache / 1e9,
                                    "in_cache_fraction_of_peak": (row_cache / (cpu["peak_gflops"] * 1e9)
                                                                  if cpu["peak_gflops"] else None),
                                    "s": tk, "el_per_s": n / tk, "speedup": tb / tk, "flops_per_element": flops,
                                    "gflops": rate / 1e9, "fraction_of_peak": frac, "store_GBps": store / 1e9,
                                    "max_rel_diff_vs_baseline": err}
            lines.append(f"  {lang:8s} {tk * 1e3:8.1f} ms  {n / tk / 1e6:6.2f} M el/s  {tb / tk:6.1f}x baseline  "
                         f"{flops} flop/el  {rate / 1e9:5.1f} GFlop/s"
                         + (f" ({100 * frac:.0f}% of peak)" if frac is not None else "")
                         + f"  K store {store / 1e9:.1f} GB/s ({100 * store / bw:.0f}% of fill bw)  "
                         f"rel. diff {err:.1e}")
            lines.append(f"  {'':8s} in cache ({nc} elements repeated): {1 / tc / 1e6:6.2f} M el/s, "
                         f"{row_cache / 1e9:5.1f} GFlop/s"
                         + (f" ({100 * row_cache / (cpu['peak_gflops'] * 1e9):.0f}% of peak)"
                            if cpu["peak_gflops"] else ""))
        rows.append(row)
    gen = generation_timings(full_set=not quick)
    lines.append(f"derive + emit Q4 general geometry (NumPy, C, Fortran): {gen['q4_in_process_s']:.2f} s in process "
                 f"(imports included), {gen['q4_process_s']:.2f} s for the whole fresh interpreter")
    if "all_s" in gen:
        lines.append(f"derive kernel --all (the committed set, up to 2 worker processes): {gen['all_s']:.1f} s")
    return {"rows": rows, "lines": lines, "command": COMMAND + (" --quick" if quick else ""), "cpu": cpu,
            "write_bandwidth_GBps": bw / 1e9, "generation": gen}
