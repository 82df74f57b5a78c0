"""Benchmark problems with published or closed-form answers, on meshes of any catalogue element.

Problems (the data are in the constants below; notes/verification.md states the meshes):
  * ``cantilever``: the straight cantilever of MacNeal & Harder (1985): length 6, depth 0.2,
    thickness 0.1, E = 1e7, nu = 0.3, 6 elements along the length (``refine`` subdivides
    each), root clamped, unit tip shear (reference 0.1081) or unit tip extension
    (reference 3.0e-5), spread over the tip edge as a uniform traction lumped consistently.
    Meshes ``rectangular``, ``trapezoidal`` and ``parallelogram`` (45-degree distortions).
  * ``membrane``: the tapered panel of Cook (1974), clamped at x = 0, total shear load 1
    spread uniformly over the edge x = 48; vertical displacement at the top corner (48, 60)
    and at the mid-point of the loaded edge (48, 52); refinement study with Richardson
    extrapolation.
  * ``cylinder``: thick-walled cylinder under internal pressure, plane strain, quarter model
    with symmetry supports; radial displacement at the bore against the Lame solution.
  * ``locking-mesh``: cantilever tip deflection over Timoshenko beam theory (shear factor
    5/6) against element aspect ratio for 1, 2 and 4 elements through the depth.
"""
from __future__ import annotations

import math
from pathlib import Path

import numpy as np

from . import catalog, mesh_io, plotting
from . import mesh as M
from .analysis import analyse
from .errors import InputError
from .output import CAUTION, Progress, write_atomic
from .output import fmt as number
from .problems import CANTILEVER, COOK, COOK_CONVERGED, COOK_CONVERGED_METHOD, COOK_SOURCE, CYLINDER

PROBLEMS = ("cantilever", "membrane", "cylinder", "locking-mesh")
CANTILEVER_MESHES = ("rectangular", "trapezoidal", "parallelogram")

# ---------------------------------------------------------------------------------------------
# closed forms

def beam_tip_deflection(P: float = 1.0, L: float = 6.0, h: float = 0.2, t: float = 0.1, E: float = 1e7,
                        nu: float = 0.3, kappa: float = 5.0 / 6.0) -> float:
    """Cantilever tip deflection P L^3 / (3 E I) + P L / (kappa G A) (Timoshenko beam theory)."""
    I = t * h ** 3 / 12.0
    G = E / (2.0 * (1.0 + nu))
    return P * L ** 3 / (3.0 * E * I) + P * L / (kappa * G * t * h)


def bar_extension(P: float = 1.0, L: float = 6.0, h: float = 0.2, t: float = 0.1, E: float = 1e7) -> float:
    return P * L / (E * h * t)


def lame_bore(p: float, a: float, b: float, E: float, nu: float) -> float:
    """Radial displacement at r = a of a thick cylinder under internal pressure p, plane strain (Lame)."""
    return (1.0 + nu) * p * a ** 2 / (E * (b ** 2 - a ** 2)) * ((1.0 - 2.0 * nu) * a + b ** 2 / a)


def richardson(values, ratio: float = 2.0) -> dict:
    """Richardson extrapolation from the last three values of a sequence refined by ``ratio``.

    Observed order p = log((v2 - v1) / (v3 - v2)) / log(ratio); extrapolated
    v3 + (v3 - v2) / (ratio^p - 1).  Returns also the two-level estimate with p fixed
    by the caller when the observed order is not usable.
    """
    v = [float(x) for x in values]
    if len(v) < 3:
        raise InputError("Richardson extrapolation needs at least three refinement levels")
    v1, v2, v3 = v[-3:]
    d1, d2 = v2 - v1, v3 - v2
    if d1 == 0 or d2 == 0 or d1 * d2 < 0:
        return {"order": None, "value": v3, "note": "not monotone; no extrapolation"}
    p = math.log(d1 / d2) / math.log(ratio)
    return {"order": p, "value": v3 + d2 / (ratio ** p - 1.0), "note": ""}


def slope(h, err) -> float | None:
    """Least-squares slope of log(err) against log(h) (the convergence rate)."""
    h, err = np.asarray(h, float), np.abs(np.asarray(err, float))
    keep = err > 0
    if keep.sum() < 2:
        return None
    return float(np.polyfit(np.log(h[keep]), np.log(err[keep]), 1)[0])


# ---------------------------------------------------------------------------------------------
# meshes

def cantilever_mesh(element: str, kind: str = "rectangular", refine: int = 1, nx: int | None = None,
                    ny: int | None = None, length: float | None = None, depth: float | None = None) -> M.Mesh:
    """Cantilever mesh: ``nx`` x ``ny`` cells (default 6 x 1) times ``refine`` in each direction.

    Corner x positions of the coarse cells (x along the length, depth 0.2, cells of length 1):
      rectangular:   bottom = top = i;
      trapezoidal:   interior lines i = 1..5 alternately inclined +/-45 degrees:
                     odd i bottom i - d/2, top i + d/2; even i bottom i + d/2, top i - d/2;
                     the root (i = 0) and tip (i = 6) vertical;
      parallelogram: every line across the depth, ends included, inclined at 45 degrees:
                     bottom i - d/2, top i + d/2 (so the centre line runs from 0 to 6).
    """
    if kind not in CANTILEVER_MESHES:
        raise InputError(f"unknown cantilever mesh {kind!r}; allowed: {', '.join(CANTILEVER_MESHES)}")
    L = CANTILEVER["length"] if length is None else length
    h = CANTILEVER["depth"] if depth is None else depth
    nx = CANTILEVER["nx"] if nx is None else nx
    ny = 1 if ny is None else ny
    refine = M._count(refine, "refine")
    dx = L / nx
    xb = np.arange(nx + 1) * dx
    xt = xb.copy()
    if kind != "rectangular" and (nx != 6 or ny != 1):
        raise InputError("the distorted cantilever meshes are defined on the 6 x 1 coarse mesh; use --refine")
    off = h / 2.0
    if kind == "trapezoidal":
        for i in range(1, nx):
            sgn = 1.0 if i % 2 == 1 else -1.0
            xb[i] -= sgn * off
            xt[i] += sgn * off
    elif kind == "parallelogram":
        xb -= off
        xt += off
    # coarse corner grid (nx+1, ny+1) then refine bilinearly inside each coarse cell
    fx, fy = nx * refine, ny * refine
    X = np.empty((fx + 1, fy + 1))
    Y = np.empty((fx + 1, fy + 1))
    for I in range(fx + 1):
        i, r = divmod(I, refine)
        if i == nx:
            i, r = nx - 1, refine
        u = r / refine
        for Jj in range(fy + 1):
            v = Jj / fy
            x0 = (1 - u) * xb[i] + u * xb[i + 1]
            x1 = (1 - u) * xt[i] + u * xt[i + 1]
            X[I, Jj] = (1 - v) * x0 + v * x1
            Y[I, Jj] = v * h
    return M.from_corner_grid(element, X, Y, label=f"{kind} {fx} x {fy}")


def membrane_mesh(element: str, n: int) -> M.Mesh:
    return M.structured(element, n, n, COOK["corners"], label=f"{n} x {n}")


def cylinder_mesh(element: str, n_r: int, n_theta: int | None = None) -> M.Mesh:
    """Quarter of the annulus (s radial, t hoop); nodes on the arcs."""
    n_theta = n_r if n_theta is None else n_theta
    return M.structured(element, n_r, n_theta, M.polar(CYLINDER["inner"], CYLINDER["outer"]),
                        label=f"{n_r} x {n_theta}")


# ---------------------------------------------------------------------------------------------
# size limits

#: default memory limit of one benchmark run in GB (override: ``memory_limit=`` / ``--memory-limit``)
MEMORY_LIMIT_GB = 8.0
#: peak resident memory per element-matrix entry (n_elements x (2 x nodes)^2) of a run: element
#: matrices, COO/CSR assembly, sparse LU with fill, solution and checks.  Measured (2-core machine,
#: `/usr/bin/time -f %M derive bench membrane --mesh N --json`): Q4 128: 110 B, Q4 256: 181 B,
#: Q4 512: 245 B, Q9 128: 152 B, Q9 256: 195 B per entry over a 150 MB interpreter; the
#: estimate uses 250 B so that it errs on the safe side up to 512 x 512.
BYTES_PER_ENTRY = 250.0
BASE_BYTES = 150e6


def _cells_to_elements(element: str, cells: int) -> int:
    info = catalog.element_info(element)
    return cells * (2 if info.domain == "triangle" else 1)


def estimate(element: str, n_elements: int) -> dict:
    """Memory estimate of one mesh run: elements, element-matrix entries, bytes (see BYTES_PER_ENTRY)."""
    nde = 2 * catalog.element_info(element).n_nodes
    entries = int(n_elements) * nde * nde
    return {"elements": int(n_elements), "entries": entries, "bytes": BASE_BYTES + BYTES_PER_ENTRY * entries}


def _machine_bytes() -> float | None:
    try:
        import os
        return float(os.sysconf("SC_PHYS_PAGES") * os.sysconf("SC_PAGE_SIZE"))
    except (ValueError, OSError, AttributeError):
        return None


def check_memory_limit(limit_gb) -> float:
    """A memory limit in GB: a finite number > 0 (None: the default :data:`MEMORY_LIMIT_GB`)."""
    if limit_gb is None:
        return MEMORY_LIMIT_GB
    try:
        v = float(limit_gb)
    except (TypeError, ValueError):
        raise InputError(f"--memory-limit {limit_gb!r}: give a number of GB > 0, e.g. 16") from None
    if not (math.isfinite(v) and v > 0):
        raise InputError(f"--memory-limit {limit_gb!r}: give a number of GB > 0, e.g. 16")
    return v


def check_size(what: str, element: str, n_elements: int, limit_gb=None) -> dict:
    """Refuse a run whose memory estimate exceeds the limit (InputError naming the estimate, the
    limit and the override); returns the estimate."""
    limit = check_memory_limit(limit_gb)
    est = estimate(element, n_elements)
    gb = est["bytes"] / 1e9
    if gb > limit:
        machine = _machine_bytes()
        where = f"; this machine has {machine / 1e9:.0f} GB" if machine else ""
        raise InputError(f"{what} with {element}: about {gb:.1f} GB of memory estimated ({est['elements']} elements, "
                         f"{BYTES_PER_ENTRY:g} bytes per element-matrix entry), more than the limit of {limit:g} GB; "
                         f"give --memory-limit {math.ceil(gb)} to run it anyway{where}")
    return est


# ---------------------------------------------------------------------------------------------
# single runs

def _element(element: str, variant: str, state: str):
    from .element import element as make_element
    return make_element(element, variant, state)


def _warn(sol) -> dict:
    """Row fields from a solution's checks: ``reliable`` (False when the mesh solve found a
    (near-)mechanism, see ``mesh.mechanism_check``) and its warnings."""
    out = {"reliable": bool(sol.reliable)}
    if sol.warnings:
        out["warnings"] = list(sol.warnings)
    return out


def _row_label(r) -> str:
    extra = f", {r['load']}" if "load" in r else ""
    extra += f", nu {r['nu']}" if "nu" in r else ""
    return f"{r['mesh']}{extra}"


def _warning_lines(rows) -> list[str]:
    """One line per distinct warning; a warning shared by every row that solved is printed once
    without labels."""
    seen: dict[str, list[str]] = {}
    for r in rows:
        for w in r.get("warnings", []):
            seen.setdefault(w, []).append(_row_label(r))
    solved = sum(1 for r in rows if r.get("value") is not None)
    out = []
    for w, labels in seen.items():
        out.append(f"warning: {w}" if len(labels) == solved and solved > 1 else
                   f"warning ({'; '.join(labels)}): {w}")
    return out


def study_warnings(rows) -> list[str]:
    """Distinct warnings of a study's rows, in order (the JSON field ``warnings``)."""
    return list(dict.fromkeys(w for r in rows for w in r.get("warnings", [])))


UNRELIABLE = "UNRELIABLE (mechanism)"


def _marked(r: dict, key: str, fmt: str) -> str:
    """A row's number for text output; flagged rows say so instead of a plain number."""
    v = r.get(key)
    if v is None:
        return MECHANISM
    if r.get("reliable") is False:
        return f"{number(v, fmt)} {UNRELIABLE}"
    return number(v, fmt)


def run_cantilever(element: str, variant: str = "full", kind: str = "rectangular", load: str = "shear",
                   refine: int = 1, provider=None, nx=None, ny=None, memory_limit=None, stage=None) -> dict:
    _element(element, variant, "plane-stress")
    if load not in ("shear", "extension"):
        raise InputError(f"unknown cantilever load {load!r}; allowed: shear, extension")
    c = CANTILEVER
    cells = (c["nx"] if nx is None else nx) * (1 if ny is None else ny) * M._count(refine, "refine") ** 2
    check_size(f"cantilever {kind} refine {refine}", element, _cells_to_elements(element, cells), memory_limit)
    mesh = cantilever_mesh(element, kind, refine, nx, ny)
    total = (0.0, 1.0) if load == "shear" else (1.0, 0.0)
    f = M.uniform_edge_force(mesh, "right", total, "plane-stress", c["t"])
    fixed = M.fix(mesh, "left", "uv")
    sol = analyse(mesh, f, fixed, variant, "plane-stress", c["E"], c["nu"], c["t"], provider, stage=stage)
    tip = np.nonzero(mesh.side("right"))[0]
    comp = 1 if load == "shear" else 0
    value = float(sol.U[tip, comp].mean())
    ref = c["reference"][load]
    return {"problem": "cantilever", "element": mesh.element, "variant": variant, "mesh": kind, "load": load,
            "refine": refine, "cells": mesh.label, "value": value, "reference": ref, "normalized": value / ref,
            **_warn(sol), "_solution": sol}


def run_membrane(element: str, variant: str = "full", n: int = 16, provider=None, memory_limit=None,
                 stage=None) -> dict:
    _element(element, variant, "plane-stress")
    c = COOK
    n = M._count(n, "membrane mesh")
    check_size(f"membrane {n} x {n}", element, _cells_to_elements(element, n * n), memory_limit)
    mesh = membrane_mesh(element, n)
    f = M.uniform_edge_force(mesh, "right", (0.0, c["load"]), "plane-stress", c["t"])
    fixed = M.fix(mesh, "left", "uv")
    sol = analyse(mesh, f, fixed, variant, "plane-stress", c["E"], c["nu"], c["t"], provider, stage=stage)
    corner = sol.displacement_at(*c["corner"])[1]
    mid = sol.displacement_at(*c["mid"])[1]
    ref = COOK_CONVERGED["mid"]
    return {"problem": "membrane", "element": mesh.element, "variant": variant, "mesh": f"{n} x {n}", "n": n,
            "value": mid, "corner": corner, "mid": mid, "reference": ref, "normalized": mid / ref,
            "reference_corner": COOK_CONVERGED["corner"], **_warn(sol), "_solution": sol}


def run_cylinder(element: str, variant: str = "full", n: int = 8, nu: float = 0.4999, provider=None,
                 n_theta: int | None = None, memory_limit=None, stage=None) -> dict:
    _element(element, variant, "plane-strain")
    c = CYLINDER
    n = M._count(n, "cylinder mesh")
    nt = n if n_theta is None else M._count(n_theta, "cylinder hoop elements")
    check_size(f"cylinder {n} x {nt}", element, _cells_to_elements(element, n * nt), memory_limit)
    mesh = cylinder_mesh(element, n, n_theta)
    f = M.pressure_load(mesh, "left", c["p"], "plane-strain", c["t"])
    fixed = {**M.fix(mesh, "bottom", "v"), **M.fix(mesh, "top", "u")}
    sol = analyse(mesh, f, fixed, variant, "plane-strain", c["E"], nu, c["t"], provider, stage=stage)
    bore = np.nonzero(mesh.side("left"))[0]
    P = mesh.nodes[bore]
    ur = (sol.U[bore, 0] * P[:, 0] + sol.U[bore, 1] * P[:, 1]) / np.hypot(P[:, 0], P[:, 1])
    value = float(ur.mean())
    ref = lame_bore(c["p"], c["inner"], c["outer"], c["E"], nu)
    return {"problem": "cylinder", "element": mesh.element, "variant": variant, "mesh": mesh.label, "n": n, "nu": nu,
            "value": value, "reference": ref, "normalized": value / ref, "error": value / ref - 1.0,
            **_warn(sol), "_solution": sol}


# ---------------------------------------------------------------------------------------------
# studies

class _Stages:
    """Progress of a study on a terminal: one step per stage (assembly, solve, check) of each run."""

    STAGES = 3

    def __init__(self, runs: int, label: str, show):
        self.pr = Progress(runs * self.STAGES, label, enabled=show)
        self.run = ""

    def step(self, what: str) -> None:
        """A new run begins (shown with its first stage)."""
        self.run = what

    def __call__(self, stage: str) -> None:
        self.pr.step(f"{self.run}: {stage}")

    def close(self) -> None:
        self.pr.close()


def _progress(total, label, show):
    return _Stages(total, label, show)


MECHANISM = "mechanism (singular stiffness)"


def _attempt(fn, *args, **kw):
    """Run one problem; a mechanism (singular supported stiffness) becomes a row with value None."""
    try:
        r = fn(*args, **kw)
    except M.MechanismError:
        return None, None
    sol = r.pop("_solution")
    return r, sol


def _num(v, fmt: str) -> str:
    return format(v, fmt) if v is not None else MECHANISM


def cantilever_study(element: str, variant: str = "full", meshes=CANTILEVER_MESHES, loads=("shear", "extension"),
                     refine: int = 1, show_progress=False, memory_limit=None) -> dict:
    rows, last = [], None
    check_size(f"cantilever refine {refine}", element,
               _cells_to_elements(element, CANTILEVER["nx"] * M._count(refine, "refine") ** 2), memory_limit)
    pr = _progress(len(meshes) * len(loads), "cantilever", show_progress)
    for kind in meshes:
        for load in loads:
            pr.step(f"{kind} {load}")
            r, sol = _attempt(run_cantilever, element, variant, kind, load, refine, memory_limit=memory_limit,
                              stage=pr)
            if r is None:
                r = {"problem": "cantilever", "element": element, "variant": variant, "mesh": kind, "load": load,
                     "refine": refine, "value": None, "reference": CANTILEVER["reference"][load], "normalized": None,
                     "reliable": False, "note": MECHANISM}
            last = sol or last
            rows.append(r)
    pr.close()
    lines = [f"cantilever (MacNeal & Harder 1985): {element} {variant}, 6 x 1 cells x refine {refine}; "
             "value = mean tip displacement along the load"]
    for r in rows:
        lines.append(f"{r['mesh']:<13} {r['load']:<9} value {_marked(r, 'value', '.6g')}  reference "
                     f"{number(r['reference'], '.6g')}  normalized {_marked(r, 'normalized', '.4f')}")
    lines += _warning_lines(rows)
    return {"problem": "cantilever", "element": element, "variant": variant, "results": rows, "lines": lines,
            "warnings": study_warnings(rows), **_headline(rows[0]), "_solution": last}


def _headline(row: dict) -> dict:
    out = {k: row[k] for k in ("mesh", "value", "reference", "normalized")}
    out["reliable"] = row.get("reliable", row.get("value") is not None)
    return out


def membrane_study(element: str, variant: str = "full", levels=(2, 4, 8, 16, 32), show_progress=False,
                   memory_limit=None) -> dict:
    levels = [M._count(n, "membrane mesh") for n in levels]
    big = max(levels)
    check_size(f"membrane {big} x {big}", element, _cells_to_elements(element, big * big), memory_limit)
    rows, last = [], None
    pr = _progress(len(levels), "membrane", show_progress)
    for n in levels:
        pr.step(f"{n} x {n}")
        r, sol = _attempt(run_membrane, element, variant, n, memory_limit=memory_limit, stage=pr)
        if r is None:
            r = {"problem": "membrane", "element": element, "variant": variant, "mesh": f"{n} x {n}", "n": n,
                 "value": None, "corner": None, "mid": None, "reference": COOK_CONVERGED["mid"],
                 "normalized": None, "reliable": False, "note": MECHANISM}
        last = sol or last
        rows.append(r)
    pr.close()
    out = {"problem": "membrane", "element": element, "variant": variant, "results": rows}
    ok = [r for r in rows if r["mid"] is not None and r.get("reliable") is not False]
    geometric = all(b == 2 * a for a, b in zip(levels, levels[1:]))
    extrap = {}
    if len(ok) == len(rows) and len(rows) >= 3 and geometric:
        for key in ("corner", "mid"):
            extrap[key] = richardson([r[key] for r in rows])
    out["extrapolated"] = extrap
    refs = {k: (COOK_CONVERGED[k] if COOK_CONVERGED[k] is not None else (extrap.get(k) or {}).get("value"))
            for k in ("corner", "mid")}
    out["converged_reference"] = refs
    rates = {}
    for key in ("corner", "mid"):
        if refs[key] is not None and ok:
            for r in ok:
                r[f"error_{key}"] = r[key] - refs[key]
            rates[key] = slope([1.0 / r["n"] for r in ok], [r[f"error_{key}"] for r in ok])
    out["rates"] = rates
    lines = [f"membrane (Cook 1974): {element} {variant}; v at the top corner (48, 60) and at the loaded edge's "
             "mid-point (48, 52)", f"{'mesh':>9} {'v corner':>11} {'v mid-edge':>11}"]
    for r in rows:
        if r["mid"] is None:
            lines.append(f"{r['mesh']:>9} {MECHANISM}")
        else:
            lines.append(f"{r['mesh']:>9} {number(r['corner'], '11.5f'):>11} {number(r['mid'], '11.5f'):>11}"
                         + (f"  {UNRELIABLE}" if r.get("reliable") is False else ""))
    for key, e in extrap.items():
        if e["order"] is not None:
            lines.append(f"Richardson ({key}, last three levels): {number(e['value'], '.4f')}, observed order "
                         f"{number(e['order'], '.2f')}")
        else:
            lines.append(f"Richardson ({key}): {e['note']}")
    for key, sl in rates.items():
        if sl is not None:
            lines.append(f"convergence rate ({key}): error ~ h^{number(sl, '.2f')} against {number(refs[key], '.4f')}")
    lines.append(f"reference values: corner {COOK_CONVERGED['corner']}, mid-edge {COOK_CONVERGED['mid']} = "
                 f"{COOK_CONVERGED_METHOD}")
    lines.append(f"problem, load and the mid-edge output point (48, 52): {COOK_SOURCE}; the mid-edge value usually "
                 f"quoted for it, {COOK['quoted_mid']} (recalled, not from a table), agrees with ours to 0.01")
    lines += _warning_lines(rows)
    out["lines"] = lines
    out["warnings"] = study_warnings(rows)
    out.update(_headline(rows[-1]))
    out["_solution"] = last
    return out


def cylinder_study(element: str, variant: str = "full", levels=(2, 4, 8, 16), nus=CYLINDER["nus"],
                   show_progress=False, memory_limit=None) -> dict:
    levels = [M._count(n, "cylinder mesh") for n in levels]
    big = max(levels)
    check_size(f"cylinder {big} x {big}", element, _cells_to_elements(element, big * big), memory_limit)
    rows, last = [], None
    pr = _progress(len(levels) * len(nus), "cylinder", show_progress)
    for nu in nus:
        for n in levels:
            pr.step(f"nu {nu} {n} x {n}")
            r, sol = _attempt(run_cylinder, element, variant, n, nu, memory_limit=memory_limit, stage=pr)
            if r is None:
                r = {"problem": "cylinder", "element": element, "variant": variant, "mesh": f"{n} x {n}", "n": n,
                     "nu": nu, "value": None,
                     "reference": lame_bore(CYLINDER["p"], CYLINDER["inner"], CYLINDER["outer"], CYLINDER["E"], nu),
                     "normalized": None, "error": None, "reliable": False, "note": MECHANISM}
            last = sol or last
            rows.append(r)
    pr.close()
    rates = {}
    for nu in nus:
        sub = [r for r in rows if r["nu"] == nu and r["error"] is not None and r.get("reliable") is not False]
        rates[str(nu)] = slope([1.0 / r["n"] for r in sub], [r["error"] for r in sub])
    lines = [f"cylinder (Lame, plane strain, inner {CYLINDER['inner']:g}, outer {CYLINDER['outer']:g}, "
             f"E {CYLINDER['E']:g}, p {CYLINDER['p']:g}): {element} {variant}; radial displacement at the bore / Lame",
             f"{'nu':>7} " + " ".join(f"{str(n) + ' x ' + str(n):>10}" for n in levels) + "   rate"]
    for nu in nus:
        sub = [r for r in rows if r["nu"] == nu]
        rate = rates[str(nu)]
        lines.append(f"{nu:>7} " + " ".join(_cyl_cell(r) for r in sub) +
                     (f"   h^{rate:.2f}" if rate is not None else ""))
    flagged = [r for r in rows if r.get("reliable") is False and r["normalized"] is not None]
    if flagged:
        vals = ", ".join(f"{r['mesh']} nu {r['nu']}: {number(r['normalized'], '.4g')}" for r in flagged)
        lines.append(f"unreliable: the mesh solve found a spurious mode or near-mechanism; the values ({vals}) "
                     "are not results")
    lines += _warning_lines(rows)
    return {"problem": "cylinder", "element": element, "variant": variant, "results": rows, "rates": rates,
            "lines": lines, "warnings": study_warnings(rows), **_headline(rows[-1]), "_solution": last}


def _cyl_cell(r: dict) -> str:
    if r["normalized"] is None:
        return f"{'mechanism':>10}"
    if r.get("reliable") is False:
        return f"{'unreliable':>10}"
    return f"{number(r['normalized'], '10.4f'):>10}"


LOCKING_ASPECTS = (1, 2, 3, 5, 10, 15, 30)


def locking_mesh_study(element: str, variant: str = "full", depths=(1, 2, 4), aspects=LOCKING_ASPECTS,
                       accuracy: float = 0.95, show_progress=False, memory_limit=None) -> dict:
    """Tip deflection / Timoshenko beam theory against element aspect ratio (length / depth of an element)."""
    c = CANTILEVER
    slender = c["length"] / c["depth"]
    ref = beam_tip_deflection(1.0, c["length"], c["depth"], c["t"], c["E"], c["nu"])
    if not 0 < accuracy <= 2:
        raise InputError(f"accuracy must be a fraction of beam theory such as 0.95; got {accuracy}")
    rows, last = [], None
    depths = [M._count(ny, "elements through the depth") for ny in depths]
    for ar in aspects:
        if not (isinstance(ar, (int, float)) and ar > 0):
            raise InputError(f"aspect ratios must be positive numbers; got {ar!r}")
    most = max(slender * ny / ar * ny for ny in depths for ar in aspects)
    check_size("locking-mesh", element, _cells_to_elements(element, int(math.ceil(most))), memory_limit)
    pr = _progress(len(depths) * len(aspects), "locking-mesh", show_progress)
    for ny in depths:
        for ar in aspects:
            nx = slender * ny / ar
            if abs(nx - round(nx)) > 1e-9 or round(nx) < 1:
                raise InputError(f"aspect ratio {ar} with {ny} elements through the depth does not give a whole "
                                 f"number of elements along the length (L/h = {slender:g})")
            nx = int(round(nx))
            pr.step(f"{ny} deep, aspect {ar}")
            r, sol = _attempt(run_cantilever, element, variant, "rectangular", "shear", 1, nx=nx, ny=ny,
                              memory_limit=memory_limit, stage=pr)
            last = sol or last
            value = r["value"] if r else None
            row = {"problem": "locking-mesh", "element": element, "variant": variant,
                   "mesh": f"{nx} x {ny}", "depth_elements": ny, "aspect": ar, "value": value,
                   "reference": ref, "normalized": value / ref if value is not None else None,
                   "reliable": bool(r and r.get("reliable", True))}
            if r and r.get("warnings"):
                row["warnings"] = r["warnings"]
            rows.append(row)
    pr.close()
    needed = {}
    for ny in depths:
        ok = [r["aspect"] for r in rows if r["depth_elements"] == ny and r["normalized"] is not None
              and r["reliable"] and r["normalized"] >= accuracy]
        needed[str(ny)] = max(ok) if ok else None
    lines = [f"locking-mesh: cantilever L {c['length']:g}, depth {c['depth']:g}, {element} {variant}; "
             f"tip deflection / Timoshenko beam theory ({ref:.6g})",
             f"{'aspect':>7} " + " ".join(f"{str(ny) + ' deep':>9}" for ny in depths)]
    for ar in aspects:
        cells = [next(r for r in rows if r["depth_elements"] == ny and r["aspect"] == ar) for ny in depths]
        lines.append(f"{ar:>7} " + " ".join(f"{'mechanism':>9}" if c["normalized"] is None else
                                            f"{'unreliable':>9}" if not c["reliable"] else
                                            f"{c['normalized']:9.4f}" for c in cells))
    for ny in depths:
        a_ = needed[str(ny)]
        lines.append(f"{ny} through the depth: largest aspect ratio reaching {accuracy:g} of beam theory: "
                     + (f"{a_}" if a_ is not None else "none of those tried"))
    lines += _warning_lines(rows)
    return {"problem": "locking-mesh", "element": element, "variant": variant, "results": rows, "accuracy": accuracy,
            "largest_aspect_for_accuracy": needed, "lines": lines, "warnings": study_warnings(rows),
            **_headline(rows[-1]), "_solution": last}


# ---------------------------------------------------------------------------------------------
# a user's own mesh (derive bench PROBLEM --mesh-file FILE)

#: the problems' domains: bounding box (x0, x1, y0, y1) and area (the cylinder's quarter annulus
#: with straight-sided elements is smaller than pi/4 (b^2 - a^2): the area check allows 2 %)
DOMAINS = {
    "cantilever": {"box": (0.0, CANTILEVER["length"], 0.0, CANTILEVER["depth"]),
                   "area": CANTILEVER["length"] * CANTILEVER["depth"], "rtol": 1e-6},
    "membrane": {"box": (0.0, 48.0, 0.0, 60.0), "area": 1440.0, "rtol": 1e-6},
    "cylinder": {"box": (0.0, CYLINDER["outer"], 0.0, CYLINDER["outer"]),
                 "area": math.pi / 4 * (CYLINDER["outer"] ** 2 - CYLINDER["inner"] ** 2), "rtol": 0.02},
}
DOMAINS["locking-mesh"] = DOMAINS["cantilever"]


def mesh_area(mesh: M.Mesh) -> float:
    """Area of a mesh: sum of w det J over the element's full rule."""
    pts, wts = M.rule_points(mesh.ref.full_rule)
    _, det, _ = M.b_matrices(mesh.element, "plane-stress", mesh.element_coords(), pts)
    return float((det * wts[None, :]).sum())


def check_domain(mesh: M.Mesh, problem: str) -> float:
    """Refuse (InputError, one line) a user's mesh that is not the problem's domain; returns the
    length scale used for the boundary tolerances."""
    d = DOMAINS[problem]
    x0, x1, y0, y1 = d["box"]
    size = max(x1 - x0, y1 - y0)
    lo, hi = mesh.nodes.min(axis=0), mesh.nodes.max(axis=0)
    got = (lo[0], hi[0], lo[1], hi[1])
    if any(abs(g - w) > 1e-6 * size for g, w in zip(got, d["box"])):
        raise InputError(f"mesh {mesh.label!r} spans x {lo[0]:g}..{hi[0]:g}, y {lo[1]:g}..{hi[1]:g}; the {problem} "
                         f"domain is x {x0:g}..{x1:g}, y {y0:g}..{y1:g} (see notes/verification.md)")
    area = mesh_area(mesh)
    if abs(area - d["area"]) > d["rtol"] * d["area"]:
        raise InputError(f"mesh {mesh.label!r} covers an area of {area:.6g}; the {problem} domain has "
                         f"{d['area']:.6g} (holes, overlaps or another shape)")
    return size


def _mask(mesh: M.Mesh, values, target: float, tol: float, what: str) -> np.ndarray:
    m = np.abs(values - target) <= tol
    if not m.any():
        raise InputError(f"mesh {mesh.label!r}: no node on the {what}")
    return m


def run_on_mesh(problem: str, mesh: M.Mesh, variant: str = "full", load: str = "shear", nu: float | None = None,
                memory_limit=None, stage=None) -> dict:
    """One run of a benchmark problem on a user's mesh of its domain (supports, loads and output
    points found by coordinates, as on derive's own meshes)."""
    if problem not in DOMAINS:
        raise InputError(f"unknown problem {problem!r}; allowed: {', '.join(DOMAINS)}")
    check_size(f"{problem} on {mesh.label}", mesh.element, mesh.n_elements, memory_limit)
    size = check_domain(mesh, problem)
    tol = 1e-6 * size
    x, y = mesh.nodes[:, 0], mesh.nodes[:, 1]
    base = {"problem": problem, "element": mesh.element, "variant": variant, "mesh": mesh.label,
            "elements": mesh.n_elements, "nodes": mesh.n_nodes}
    if problem in ("cantilever", "locking-mesh"):
        c = CANTILEVER
        _element(mesh.element, variant, "plane-stress")
        load = "shear" if problem == "locking-mesh" else load
        if load not in ("shear", "extension"):
            raise InputError(f"unknown cantilever load {load!r}; allowed: shear, extension")
        root = _mask(mesh, x, 0.0, tol, "root x = 0")
        tip = _mask(mesh, x, c["length"], tol, f"tip x = {c['length']:g}")
        total = (0.0, 1.0) if load == "shear" else (1.0, 0.0)
        f = M.uniform_edge_force(mesh, tip, total, "plane-stress", c["t"])
        sol = analyse(mesh, f, M.fix(mesh, root, "uv"), variant, "plane-stress", c["E"], c["nu"], c["t"],
                      stage=stage)
        value = float(sol.U[tip, 1 if load == "shear" else 0].mean())
        if problem == "locking-mesh":
            ref = beam_tip_deflection(1.0, c["length"], c["depth"], c["t"], c["E"], c["nu"])
            xy = mesh.element_coords()
            ext = np.ptp(xy, axis=1)
            aspect = float(np.mean(ext[:, 0] / ext[:, 1]))
            row = {**base, "load": load, "aspect": aspect, "value": value, "reference": ref}
        else:
            ref = c["reference"][load]
            row = {**base, "load": load, "value": value, "reference": ref}
        row["normalized"] = value / ref
    elif problem == "membrane":
        c = COOK
        _element(mesh.element, variant, "plane-stress")
        clamp = _mask(mesh, x, 0.0, tol, "clamped edge x = 0")
        edge = _mask(mesh, x, 48.0, tol, "loaded edge x = 48")
        f = M.uniform_edge_force(mesh, edge, (0.0, c["load"]), "plane-stress", c["t"])
        sol = analyse(mesh, f, M.fix(mesh, clamp, "uv"), variant, "plane-stress", c["E"], c["nu"], c["t"],
                      stage=stage)
        corner = sol.displacement_at(*c["corner"])[1]
        mid = sol.displacement_at(*c["mid"])[1]
        ref = COOK_CONVERGED["mid"]
        row = {**base, "value": mid, "corner": corner, "mid": mid, "reference": ref, "normalized": mid / ref,
               "reference_corner": COOK_CONVERGED["corner"]}
    else:
        c = CYLINDER
        nu = 0.3 if nu is None else float(nu)
        _element(mesh.element, variant, "plane-strain")
        r = np.hypot(x, y)
        bore = _mask(mesh, r, c["inner"], tol, f"bore r = {c['inner']:g}")
        f = M.pressure_load(mesh, bore, c["p"], "plane-strain", c["t"])
        fixed = {**M.fix(mesh, _mask(mesh, y, 0.0, tol, "symmetry edge y = 0"), "v"),
                 **M.fix(mesh, _mask(mesh, x, 0.0, tol, "symmetry edge x = 0"), "u")}
        sol = analyse(mesh, f, fixed, variant, "plane-strain", c["E"], nu, c["t"], stage=stage)
        P = mesh.nodes[bore]
        ur = (sol.U[bore, 0] * P[:, 0] + sol.U[bore, 1] * P[:, 1]) / np.hypot(P[:, 0], P[:, 1])
        value = float(ur.mean())
        ref = lame_bore(c["p"], c["inner"], c["outer"], c["E"], nu)
        row = {**base, "nu": nu, "value": value, "reference": ref, "normalized": value / ref,
               "error": value / ref - 1.0}
    return {**row, **_warn(sol), "_solution": sol}


def mesh_file_study(problem: str, mesh: M.Mesh, variant: str = "full", loads=("shear", "extension"), nus=None,
                    show_progress=False, memory_limit=None) -> dict:
    """The rows of a problem on one user mesh (cantilever: each load; cylinder: each nu)."""
    if problem == "cantilever":
        cases = [{"load": load} for load in loads]
    elif problem == "cylinder":
        cases = [{"nu": nu} for nu in (nus or CYLINDER["nus"])]
    else:
        cases = [{}]
    pr = _progress(len(cases), problem, show_progress)
    rows, last = [], None
    for case in cases:
        pr.step(f"{mesh.label} {' '.join(f'{k} {v}' for k, v in case.items())}")
        r, sol = _attempt(run_on_mesh, problem, mesh, variant, memory_limit=memory_limit, stage=pr, **case)
        if r is None:
            r = {"problem": problem, "element": mesh.element, "variant": variant, "mesh": mesh.label, **case,
                 "value": None, "reference": None, "normalized": None, "reliable": False, "note": MECHANISM}
        last = sol or last
        rows.append(r)
    pr.close()
    lines = [f"{problem} on the mesh file {mesh.label}: {mesh.element} {variant}, {mesh.n_elements} elements, "
             f"{mesh.n_nodes} nodes (domain, supports and loads as on derive's own meshes, notes/verification.md)"]
    for r in rows:
        case = " ".join(f"{k} {r[k]}" for k in ("load", "nu") if k in r)
        extra = ""
        if problem == "membrane" and r.get("corner") is not None:
            extra = f"  corner {r['corner']:.5f}"
        if problem == "locking-mesh" and r.get("aspect") is not None:
            extra = f"  mean element aspect ratio {r['aspect']:.3g}"
        ref = f"{r['reference']:.6g}" if r.get("reference") is not None else "-"
        lines.append(f"{case or problem:<16} value {_marked(r, 'value', '.6g')}  reference {ref}  normalized "
                     f"{_marked(r, 'normalized', '.4f')}{extra}")
    if problem == "membrane":
        lines.append(f"reference: {COOK_CONVERGED_METHOD}; problem: {COOK_SOURCE}")
    lines += _warning_lines(rows)
    return {"problem": problem, "element": mesh.element, "variant": variant, "mesh_file": mesh.label,
            "results": rows, "lines": lines, "warnings": study_warnings(rows), **_headline(rows[0]),
            "_solution": last}


# ---------------------------------------------------------------------------------------------
# plots and tables

def plot_format(path) -> str:
    """Image format from the file suffix; InputError for anything but .png, .svg, .pdf."""
    return plotting.plot_format(path)


def _v(x) -> float:
    return float("nan") if x is None else float(x)


def _h_ticks(ax, ns) -> None:
    """Mesh-size axis in h = 1 / N: ticks at the meshes, labelled 1/2, 1/4, ... (no minor labels)."""
    from matplotlib.ticker import FixedFormatter, FixedLocator, NullFormatter, NullLocator
    ns = sorted(set(ns))
    ax.xaxis.set_major_locator(FixedLocator([1.0 / n for n in ns]))
    ax.xaxis.set_major_formatter(FixedFormatter([f"1/{n}" for n in ns]))
    ax.xaxis.set_minor_locator(NullLocator())
    ax.xaxis.set_minor_formatter(NullFormatter())


def _log_error_axis(ax) -> None:
    """Decades only on a log error axis (minor labels off: they overlap on short ranges)."""
    from matplotlib.ticker import LogLocator, NullFormatter
    ax.yaxis.set_major_locator(LogLocator(base=10, numticks=8))
    ax.yaxis.set_minor_formatter(NullFormatter())


def _legend(ax, fontsize: float = 7) -> None:
    ax.legend(fontsize=fontsize, loc="best", handlelength=3.0)


def _curves(ax, xs, ys_list, labels, plot="plot"):
    """Plot curves with distinct colour, line style and marker; coinciding curves get staggered
    markers (every legend entry visible).  Returns the labels of the coinciding groups."""
    lines = []
    for k, (ys, lab) in enumerate(zip(ys_list, labels)):
        x = xs[k] if isinstance(xs[0], (list, tuple, np.ndarray)) else xs
        st = plotting.style(k, len(x))
        st["markevery"] = None
        line, = getattr(ax, plot)(x, ys, label=lab, **st)
        lines.append(line)
    groups = plotting.coinciding(ys_list) if len({len(y) for y in ys_list}) == 1 else []
    for g in groups:
        # few points: offset the coinciding markers sideways by size instead of by position
        for i, k in enumerate(g):
            lines[k].set_markersize(4.5 + 2.5 * (len(g) - 1 - i))
            lines[k].set_markerfacecolor("none" if i < len(g) - 1 else lines[k].get_color())
    return [[labels[k] for k in g] for g in groups]


def _same_note(groups) -> str:
    return ("curves on top of each other (markers drawn in decreasing sizes): " +
            "; ".join(" = ".join(g) for g in groups)) if groups else ""


def plot_study(study: dict, path, dpi: int = plotting.DEFAULT_DPI) -> Path:
    """Write the chart of a study (:func:`study_figure`) as PNG, SVG or PDF."""
    return plotting.save(study_figure(study), path, dpi)


def study_figure(study: dict):
    """Chart of a study: membrane/cylinder convergence (value and log-log error), cantilever bars,
    locking-mesh normalized deflection against aspect ratio."""
    prob = "bars" if study.get("mesh_file") else study["problem"]
    title = f"{study['problem']}: {study['element']} {study['variant']}" + \
        (f" on {study['mesh_file']}" if study.get("mesh_file") else "")
    notes = []
    if prob == "membrane":
        fig = plotting.figure(11, 4.6)
        a1, a2 = fig.subplots(1, 2)
        rows = study["results"]
        ns = [r["n"] for r in rows]
        labels = {"corner": "top corner (48, 60)", "mid": "mid-edge (48, 52)"}
        notes.append(_same_note(_curves(a1, ns, [[_v(r[k]) for r in rows] for k in labels], list(labels.values()))))
        refs = study["converged_reference"]
        for j, (key, lab) in enumerate(labels.items()):
            ref = refs.get(key)
            if ref is not None:
                a1.axhline(ref, ls=":", lw=0.9, color=plotting.COLOURS[j],
                           label=f"converged {key} {ref:.3f} (derive: Q9/Q8 to 256 x 256, Richardson)")
        errs, elabs = [], []
        for key, lab in labels.items():
            ref = refs.get(key)
            if ref is not None:
                errs.append([max(abs(_v(r[key]) - ref), 1e-16) for r in rows])
                elabs.append(f"{lab}, slope {study['rates'].get(key) or float('nan'):.2f}")
        if errs:
            _curves(a2, [1.0 / n for n in ns], errs, elabs, plot="loglog")
        a1.set_xscale("log", base=2)
        plotting.integer_ticks(a1, ns)
        a1.set_xlabel("elements per side N")
        a1.set_ylabel("vertical displacement")
        _legend(a1)
        _h_ticks(a2, ns)
        _log_error_axis(a2)
        a2.set_xlabel("h = 1 / N")
        a2.set_ylabel("|v - converged|")
        _legend(a2)
        fig.suptitle(title)
    elif prob == "cylinder":
        fig = plotting.figure(11, 4.6)
        a1, a2 = fig.subplots(1, 2)
        nus = sorted({r["nu"] for r in study["results"]})
        subs = [[r for r in study["results"] if r["nu"] == nu] for nu in nus]
        groups = _curves(a1, [[r["n"] for r in sub] for sub in subs], [[_v(r["normalized"]) for r in sub] for sub in subs],
                         [f"nu = {nu}" for nu in nus])
        notes.append(_same_note(groups))
        _curves(a2, [[1.0 / r["n"] for r in sub] for sub in subs],
                [[max(abs(_v(r["error"])), 1e-16) for r in sub] for sub in subs],
                [f"nu = {nu}, slope {study['rates'].get(str(nu)) or float('nan'):.2f}" for nu in nus], plot="loglog")
        a1.axhline(1.0, ls=":", color="grey", label="Lamé solution (ratio 1)")
        a1.set_xscale("log", base=2)
        levels = sorted({r["n"] for r in study["results"]})
        plotting.integer_ticks(a1, levels)
        a1.set_xlabel("elements per side N (radial = hoop)")
        a1.set_ylabel("bore displacement / Lamé")
        _legend(a1)
        _h_ticks(a2, levels)
        _log_error_axis(a2)
        a2.set_xlabel("h = 1 / N")
        a2.set_ylabel("|relative error|")
        _legend(a2)
        fig.suptitle(title)
    elif prob == "locking-mesh":
        fig = plotting.figure(7.5, 4.6)
        ax = fig.add_subplot()
        notes.append(_locking_mesh_axes(ax, study))
        ax.set_title(title)
    else:
        fig = plotting.figure(7.5, 4.6)
        ax = fig.add_subplot()
        labels = [f"{r['mesh']}\n{r['load'] if 'load' in r else ('nu ' + str(r['nu']) if 'nu' in r else '')}"
                  for r in study["results"]]
        ax.bar(range(len(labels)), [_v(r["normalized"]) for r in study["results"]], color="0.55",
               label="value / reference")
        ax.axhline(1.0, ls=":", color="grey", label=_REFERENCE_LABELS.get(study["problem"], "reference"))
        ax.set_xticks(range(len(labels)))
        ax.set_xticklabels(labels, fontsize=8)
        ax.set_ylabel("value / reference")
        ax.set_title(title)
        _legend(ax)
    plotting.set_note(fig, "; ".join(n for n in notes if n) or None)
    return fig


_REFERENCE_LABELS = {"cantilever": "reference (MacNeal & Harder 1985)",
                     "membrane": "derive's converged mid-edge value", "cylinder": "Lamé solution",
                     "locking-mesh": "Timoshenko beam theory"}


def _locking_mesh_axes(ax, study: dict) -> str:
    """Normalized deflection against aspect ratio, one curve per depth; the reference lines labelled."""
    depths = sorted({r["depth_elements"] for r in study["results"]})
    subs = [[r for r in study["results"] if r["depth_elements"] == ny] for ny in depths]
    groups = _curves(ax, [[r["aspect"] for r in sub] for sub in subs], [[_v(r["normalized"]) for r in sub] for sub in subs],
                     [f"{ny} through depth" for ny in depths], plot="semilogx")
    ax.axhline(1.0, ls=":", color="grey", label="Timoshenko beam theory")
    ax.axhline(study["accuracy"], ls="--", lw=0.8, color="grey", label=f"accuracy target {study['accuracy']:g}")
    plotting.integer_ticks(ax, sorted({r["aspect"] for r in study["results"]}))
    ax.set_xlabel("element aspect ratio (length / depth)")
    ax.set_ylabel("tip deflection / Timoshenko theory")
    _legend(ax)
    return _same_note(groups)


def plot_locking_comparison(studies: list[dict], path, dpi: int = plotting.DEFAULT_DPI) -> Path:
    """Write :func:`comparison_figure` as PNG, SVG or PDF."""
    return plotting.save(comparison_figure(studies), path, dpi)


def comparison_figure(studies: list[dict]):
    """Locking-mesh charts of several variants side by side (shared axes)."""
    n = len(studies)
    fig = plotting.figure(4.6 * n, 4.4)
    axes = fig.subplots(1, n, sharey=True, squeeze=False)
    notes = []
    for ax, study in zip(axes[0], studies):
        note = _locking_mesh_axes(ax, study)
        if note:
            notes.append(f"{study['variant']}: {note}")
        ax.set_title(f"{study['element']} {study['variant']}", fontsize=10)
    for ax in axes[0][1:]:
        ax.set_ylabel("")
    plotting.set_note(fig, "; ".join(notes) or None)
    return fig


def table_text(study: dict) -> str:
    """Markdown table of a study's rows."""
    rows = study["results"]
    skip = {"problem", "element"} | ({"variant"} if len({r["variant"] for r in rows}) == 1 else set())
    keys = [k for k in rows[0] if not k.startswith("_") and k not in skip]
    out = ["| " + " | ".join(keys) + " |", "|" + "---|" * len(keys)]
    for r in rows:
        out.append("| " + " | ".join(_fmt(r.get(k)) for k in keys) + " |")
    return "\n".join(out) + "\n\n> " + CAUTION + "\n"


def _fmt(v) -> str:
    if isinstance(v, float):
        return f"{v:.6g}"
    return "" if v is None else str(v)


# ---------------------------------------------------------------------------------------------
# demo section: the transfer beam

def tb3_figure(rows, cands, beam: float, meshes):
    """The demo's mesh study: midspan deflection against the number of elements along the span."""
    fig = plotting.figure(7.5, 4.6)
    ax = fig.add_subplot()
    subs = [[r for r in rows if (r[0], r[1]) == (el, var)] for el, var in cands]
    groups = _curves(ax, [[r[2] for r in sub] for sub in subs], [[r[4] * 1e3 for r in sub] for sub in subs],
                     [f"{el} {var}" for el, var in cands], plot="semilogx")
    ax.axhline(beam * 1e3, ls=":", color="grey", label="beam theory (with shear)")
    plotting.integer_ticks(ax, [nx for nx, _ in meshes])
    ax.set_xlabel("elements along the span (meshes 6 x 1, 12 x 2, 24 x 4, 48 x 8)")
    ax.set_ylabel("midspan deflection (mm)")
    ax.set_title("TB-3 mesh study")
    _legend(ax, 8)
    plotting.set_note(fig, _same_note(groups) or None)
    return fig


def demo_section(outdir: Path) -> dict:
    """Transfer beam TB-3 (invented): mesh study of the midspan deflection and patch tests."""
    from .demo import SCENARIO
    from .patch import patch_test
    outdir = Path(outdir)
    L, h, t, E, nu = (SCENARIO["span_m"], SCENARIO["depth_m"], SCENARIO["thickness_m"], SCENARIO["E_Pa"],
                      SCENARIO["nu"])
    q = 400e3  # N/m on the top face (invented design load)
    I = t * h ** 3 / 12
    G = E / (2 * (1 + nu))
    beam = 5 * q * L ** 4 / (384 * E * I) + q * L ** 2 / (8 * (5 / 6) * G * t * h)
    lines, files, rows = [], [], []
    cands = [("Q4", "full")]
    if "incompatible-centred" in catalog.ELEMENTS["Q4"].variants:
        cands.append(("Q4", "incompatible-centred"))
    cands.append(("Q8", "full"))
    meshes = ((6, 1), (12, 2), (24, 4), (48, 8))
    last = None
    for el, var in cands:
        for nx, ny in meshes:
            m = M.structured(el, nx, ny, ((0, 0), (L, 0), (L, h), (0, h)))
            f = M.edge_load(m, "top", (0.0, -q / t), "plane-stress", t)
            # end faces held vertically (shear-carrying supports, as in beam theory), one horizontal restraint
            fixed = {**M.fix(m, "left", "v"), **M.fix(m, "right", "v"), 2 * m.node_at(0.0, 0.0): 0.0}
            sol = analyse(m, f, fixed, var, "plane-stress", E, nu, t)
            v = -sol.displacement_at(L / 2, h / 2)[1]
            rows.append((el, var, nx, ny, v))
            last = sol
    lines.append(f"simply supported span {L} m (end faces held vertically), uniform load {q / 1e3:g} kN/m on the top "
                 f"face; midspan deflection at mid-depth; beam theory with shear (factor 5/6): {beam * 1e3:.4f} mm")
    for el, var, nx, ny, v in rows:
        lines.append(f"{el} {var:<21} {nx:>3} x {ny}: {v * 1e3:.4f} mm ({v / beam:.3f} of beam theory)")
    fine = [r[4] for r in rows if (r[0], r[1]) == cands[-1]]
    ext = richardson(fine)
    if ext["order"] is not None:
        lines.append(f"{cands[-1][0]} {cands[-1][1]} Richardson estimate of the converged deflection: "
                     f"{ext['value'] * 1e3:.4f} mm (observed order {ext['order']:.2f}); a 12 x 2 Q4 full mesh is "
                     f"{[r[4] for r in rows if r[:4] == ('Q4', 'full', 12, 2)][0] / ext['value']:.3f} of it")
    fig = tb3_figure(rows, cands, beam, meshes)
    files.append(plotting.save(fig, outdir / "tb3-mesh-study.png").name)
    if last is not None:
        files.append(mesh_io.write_vtu(outdir / "tb3-q8-48x8.vtu", last).name)
    for el, var in cands:
        res = patch_test(el, var)
        lines.append(f"patch test {el} {var}: {'passed' if res['passed'] else 'FAILED'} "
                     f"(max relative error {res['max_error']:.1e})")
    return {"title": "Mesh study and patch tests", "lines": lines, "files": files}
