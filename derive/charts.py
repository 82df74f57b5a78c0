"""Design charts from the closed-form locking ratios (matplotlib, object-oriented API, Agg).

* :func:`locking_chart`: ratio against aspect ratio (log axis), one line style and marker
  per element/variant, one colour per Poisson's ratio, the tolerance band and each curve's
  aspect-ratio limit marked;
* :func:`contour_chart`: the ratio over (aspect ratio, nu) for one element, with the
  tolerance contour;
* :func:`distortion_chart`: the ratio against a distortion parameter (skew, taper,
  trapezoid) at one aspect ratio and nu.

Every curve is evaluated from the closed form through ``lambdify`` (one vectorised call per
curve or grid, never point-by-point substitution).  Figures are ``matplotlib.figure.Figure``
objects (no pyplot state); :func:`save` writes PNG, SVG or PDF according to the file's
extension, atomically.  Data lines carry a ``gid`` ("ratio|Q4|full|0.3", "limit|...",
"distortion|...") so their data can be read back from the figure.  Colours were chosen for
distinct luminance and are paired with line styles and markers, so the charts stay legible
when printed in grey.
"""
from __future__ import annotations

import math
from pathlib import Path

import numpy as np
import sympy as sp

from . import locking, plotting
from .errors import InputError
from .plotting import COLOURS, DEFAULT_DPI, MARKERS, STYLES  # noqa: F401  (re-exported names)

FORMATS = plotting.FORMATS
SOURCE_NOTE = ("closed forms: derive energy route (exact element response to the consistent load of a linear "
               "bending stress); Q4 full matches Cook, Malkus, Plesha & Witt (4th ed.)")
#: curves whose values agree to this relative difference everywhere are reported as coinciding
COINCIDE_RTOL = 1e-9


def _figure(note: str | None = None, width: float = 7.5, height: float = 5.0):
    return plotting.figure(width, height, note)


def _stagger_coinciding(drawn: list[tuple[str, object, np.ndarray]], n_points: int) -> str:
    """Stagger the markers of coinciding curves; the footer sentence that names them."""
    groups = plotting.coinciding([y for _, _, y in drawn], COINCIDE_RTOL)
    for g in groups:
        plotting.stagger([drawn[i][1] for i in g], n_points)
    return _coincide_note([[drawn[i][0] for i in g] for g in groups])


def _coincide_note(groups: list[list[str]]) -> str:
    if not groups:
        return ""
    return ("curves on top of each other (markers staggered so each shows): "
            + "; ".join(" = ".join(g) for g in groups))


def _legend(ax, fontsize: float = 7) -> None:
    """Legend beside the axes (never over the curves)."""
    ax.legend(fontsize=fontsize, loc="upper left", bbox_to_anchor=(1.01, 1.0), borderaxespad=0.0,
              handlelength=3.0)


def _label(name: str, variant: str) -> str:
    return f"{name} {variant}"


def parse_specs(text) -> list[tuple[str, str]]:
    """``Q4:full,Q8`` -> [("Q4", "full"), ("Q8", "full")] (validated against the catalogue)."""
    from . import catalog
    items = text.split(",") if isinstance(text, str) else list(text)
    out = []
    for item in items:
        if isinstance(item, tuple):
            name, variant = item
        else:
            item = item.strip()
            if not item:
                continue
            name, _, variant = item.partition(":")
            variant = variant.strip() or "full"
        info = catalog.element_info(name.strip())
        catalog.check_variant(info, variant)
        out.append((info.name, variant))
    if not out:
        raise InputError("give at least one element, e.g. --elements Q4:full,Q8:full")
    return out


def locking_chart(specs, state: str = "plane-stress", nus=(0.0, 0.3, 0.49), aspect=(1.0, 20.0),
                  tolerance: float | None = 0.05, n: int = 200):
    """Ratio against aspect ratio for each (element, variant) and nu.

    One colour per nu, one line style and marker per element; markers of all curves are
    staggered along the axis so that curves lying on top of each other (e.g. every element
    that is exact in bending, at ratio 1 for all nu) still show each legend entry."""
    specs = parse_specs(specs)
    lo, hi = _range(aspect, "aspect ratio", positive=True)
    nus = [float(v) for v in nus]
    for v in nus:
        locking.check_point(None, v, state)
    if len(nus) > len(COLOURS):
        raise InputError(f"at most {len(COLOURS)} values of nu per chart")
    if len(specs) > len(STYLES):
        raise InputError(f"at most {len(STYLES)} elements per chart")
    rr = np.logspace(math.log10(lo), math.log10(hi), n)
    fig = _figure(width=9.0)
    ax = fig.add_subplot()
    if tolerance is not None:
        tol = float(tolerance)
        if not 0 < tol < 1:
            raise InputError(f"tolerance must be between 0 and 1, got {tolerance}")
        band = ax.axhspan(1 - tol, 1 + tol, color="0.88", zorder=0, label=f"tolerance band 1 ± {tol:g}")
        band.set_gid(f"tolerance|{tol:g}")
    ax.axhline(1.0, color="0.5", lw=0.8, zorder=1, label="continuum (ratio 1)")
    notes, curves, limits = [], [], False
    for k, (name, variant) in enumerate(specs):
        locking.check(name, variant, state)
        f = locking.ratio_function(name, variant, state)
        if locking.locking_ratio(name, variant, state) is sp.oo:
            notes.append(f"{_label(name, variant)}: bending is a zero-energy mode (no curve)")
            continue
        for j, v in enumerate(nus):
            y = np.broadcast_to(np.asarray(f(rr, v), dtype=float), rr.shape)
            label = f"{_label(name, variant)}, ν = {v:g}"
            line, = ax.plot(rr, y, label=label, **plotting.style(k, n, colour=j, line=k, marker=k))
            line.set_gid(f"ratio|{name}|{variant}|{v:g}")
            curves.append((label, line, y))
            if tolerance is not None:
                lim = locking.aspect_limit(name, variant, state, v, tol)["aspect_limit"]
                if lim is not None and lo <= lim <= hi:
                    yl = float(f(lim, v))
                    mk, = ax.plot([lim, lim], [0, yl], color=COLOURS[j], ls=":", lw=0.9,
                                  label="largest r within the tolerance" if not limits else None)
                    mk.set_gid(f"limit|{name}|{variant}|{v:g}")
                    ax.plot([lim], [yl], marker="|", ms=12, color=COLOURS[j], mew=2)
                    limits = True
    ax.set_xscale("log")
    ax.set_xlim(lo, hi)
    ax.set_ylim(bottom=0)
    ax.set_xlabel("element aspect ratio r = a/b (–), log scale; element 2a long (bending axis) × 2b deep")
    ax.set_ylabel("bending rotation ratio θ_element / θ_continuum (–)")
    ax.set_title(f"Bending locking of one element in pure bending, {state}")
    ax.grid(True, which="both", color="0.9", lw=0.5)
    _legend(ax)
    ax.set_xlim(lo, hi)
    plotting.plain_log_ticks(ax, lo, hi)
    same = _stagger_coinciding(curves, n)
    plotting.set_note(fig, "; ".join(p for p in [SOURCE_NOTE, *notes, same] if p))
    return fig


def contour_chart(name: str, variant: str = "full", state: str = "plane-strain", aspect=(1.0, 20.0),
                  nu_range=(0.0, 0.499), n: int = 200, tolerance: float | None = 0.05):
    """Ratio over (aspect ratio, nu): a colour map of the values with contour lines."""
    (name, variant), = parse_specs([f"{name}:{variant}"])
    locking.check(name, variant, state)
    if locking.locking_ratio(name, variant, state) is sp.oo:
        raise InputError(f"{name} {variant}: bending is a zero-energy mode; there is no ratio to chart")
    lo, hi = _range(aspect, "aspect ratio", positive=True)
    n0, n1 = _range(nu_range, "nu range")
    locking.check_point(None, n0, state)
    locking.check_point(None, n1, state)
    rr = np.logspace(math.log10(lo), math.log10(hi), n)
    nn = np.linspace(n0, n1, n)
    R, NU = np.meshgrid(rr, nn)
    Z = locking.ratio_function(name, variant, state)(R, NU)
    fig = _figure(SOURCE_NOTE)
    ax = fig.add_subplot()
    mesh = ax.pcolormesh(R, NU, Z, shading="nearest", cmap="cividis", vmin=0, vmax=max(1.0, float(np.nanmax(Z))),
                         rasterized=True)
    mesh.set_gid(f"grid|{name}|{variant}")
    levels = [v for v in (0.1, 0.25, 0.5, 0.75, 0.9, 1.0) if np.nanmin(Z) < v < np.nanmax(Z)]
    if levels:
        cs = ax.contour(R, NU, Z, levels=levels, colors="white", linewidths=0.8)
        ax.clabel(cs, fmt="%.2f", fontsize=7)
    if tolerance is not None:
        tol = float(tolerance)
        if np.nanmin(Z) < 1 - tol < np.nanmax(Z):
            ct = ax.contour(R, NU, Z, levels=[1 - tol], colors="black", linewidths=1.6, linestyles="--")
            ax.clabel(ct, fmt={1 - tol: f"1 − {tol:g}"}, fontsize=7)
    fig.colorbar(mesh, ax=ax, label="θ_element / θ_continuum (–)")
    ax.set_xscale("log")
    plotting.plain_log_ticks(ax, lo, hi)
    ax.set_xlabel("element aspect ratio r = a/b (–), log scale")
    ax.set_ylabel("Poisson's ratio ν (–)")
    ax.set_title(f"{name} {variant}, {state}: bending rotation ratio")
    return fig


def distortion_chart(specs, state: str = "plane-stress", kind: str = "taper", values=(0.0, 0.6),
                     aspect: float = 1.0, nu: float = 0.3, n: int = 31):
    """Ratio against a distortion parameter (skew angle in degrees, taper or trapezoid fraction).

    The aspect ratio r = a/b and nu of the chart are stated in the title; curves that lie on
    top of each other are named in the footer and their markers staggered."""
    specs = parse_specs(specs)
    lo, hi = _range(values, f"{kind} range")
    locking.check_point(aspect, nu, state)
    if kind not in locking.DISTORTIONS:
        raise InputError(f"unknown distortion {kind!r}; allowed: {', '.join(locking.DISTORTIONS)}")
    xs = np.linspace(lo, hi, n)
    fig = _figure(width=9.0)
    ax = fig.add_subplot()
    ax.axhline(1.0, color="0.5", lw=0.8, label="continuum (ratio 1)")
    methods, curves, missing = set(), [], []
    for k, (name, variant) in enumerate(specs):
        ys, method = locking.distortion_curve(name, variant, state, kind, xs, aspect, nu)
        methods.add(f"{name}: {method}")
        if np.all(np.isnan(ys)):
            missing.append(f"{_label(name, variant)}: zero-energy bending mode (no curve)")
            continue
        line, = ax.plot(xs, ys, label=_label(name, variant), **plotting.style(k, n))
        line.set_gid(f"distortion|{name}|{variant}|{kind}")
        curves.append((_label(name, variant), line, ys))
    units = {"skew": "skew angle of the ends from the vertical (degrees)",
             "taper": "taper τ (–): depth 2b(1 − τ) at the left end, 2b(1 + τ) at the right",
             "trapezoid": "trapezoid s (–): top edge 2a(1 − s), bottom edge 2a(1 + s)"}[kind]
    ax.set_xlabel(units)
    ax.set_ylabel("bending rotation ratio θ_element / θ_continuum (–)")
    ax.set_title(f"Distortion sensitivity in pure bending, {state}, r = a/b = {aspect:g}, ν = {nu:g}")
    ax.set_ylim(bottom=0)
    ax.grid(True, color="0.9", lw=0.5)
    _legend(ax, 8)
    same = _stagger_coinciding(curves, n)
    plotting.set_note(fig, "; ".join(p for p in ["energy route on the distorted shape (derive.locking)",
                                                 *sorted(methods), *missing, same] if p))
    return fig


def _range(value, what: str, positive: bool = False) -> tuple[float, float]:
    try:
        lo, hi = (float(v) for v in value)
    except (TypeError, ValueError):
        raise InputError(f"{what}: give two numbers lo:hi") from None
    if not (math.isfinite(lo) and math.isfinite(hi)) or lo >= hi or (positive and lo <= 0):
        raise InputError(f"{what}: need {'0 < ' if positive else ''}lo < hi, got {lo:g}:{hi:g}")
    return lo, hi


def save(fig, path, close: bool = True, dpi: int = DEFAULT_DPI) -> Path:
    """Write the figure as PNG, SVG or PDF (by the extension), atomically; returns the path.
    PNG at ``dpi`` dots per inch (default :data:`derive.plotting.DEFAULT_DPI`)."""
    path = plotting.save(fig, path, dpi, what="chart file")
    if close:
        fig.clear()
    return Path(path)


def series(fig) -> list[dict]:
    """The data lines of a chart (gid, x, y), read back from the figure's artists."""
    out = []
    for ax in fig.axes:
        for line in ax.lines:
            gid = line.get_gid()
            if gid:
                out.append({"gid": gid, "x": np.asarray(line.get_xdata(), float).tolist(),
                            "y": np.asarray(line.get_ydata(), float).tolist()})
    return out


# ---------------------------------------------------------------------------------------------
# demo section

def demo_section(outdir) -> dict:
    """Locking of the candidate elements at the transfer beam's aspect ratio, with charts."""
    from .demo import SCENARIO
    from .locking import aspect_limit, distortion, evaluate
    from .output import emit_json, write_atomic
    outdir = Path(outdir)
    nu_b = SCENARIO["nu"]
    aspect = 2.0  # 0.6 m x 0.3 m elements of the 12 x 4 candidate mesh: a/b = 2
    lines, table = [], []
    for name, variant in (("Q4", "full"), ("Q4", "incompatible-centred"), ("Q4", "eas4"), ("Q4", "hybrid5"),
                          ("Q4", "reduced"), ("Q8", "full"), ("Q9", "full")):
        an = locking.analyse(name, variant, "plane-stress")
        val = evaluate(name, variant, "plane-stress", aspect, nu_b)
        lim = aspect_limit(name, variant, "plane-stress", nu_b, 0.05)
        table.append({"element": name, "variant": variant, "formula": an.formula, "ratio": val, "limit_5pct": lim})
        if val is None:
            lines.append(f"{name} {variant}: bending is a zero-energy (hourglass) mode: unusable alone")
        else:
            lim_txt = "any aspect ratio" if lim.get("unlimited") else (
                "none" if lim["aspect_limit"] == 0 else f"a/b <= {lim['aspect_limit']:.3g}")
            lines.append(f"{name} {variant}: theta/theta_exact = {an.display()}; at a/b = {aspect:g}, nu = {nu_b}: "
                         f"{val:.4f}; within 5 %: {lim_txt}")
    for variant in ("incompatible-centred", "eas4", "hybrid5"):
        d = distortion("Q4", variant, "plane-stress", "taper", 0.3, aspect, nu_b)
        lines.append(f"Q4 {variant} on a tapered element (depth varying by +-30 % along it, a/b = {aspect:g}): "
                     f"{d['ratio']:.3f} (a patch-test-passing 4-node element locks when tapered: MacNeal, 1987)")
    q4 = locking.analyse("Q4", "full", "plane-stress")
    if q4.strain:
        lines.append(f"Q4 full spurious strain in bending: {q4.strain['summary']}")
    files = [write_atomic(outdir / "locking-table.json", emit_json(table) + "\n")]
    files.append(save(locking_chart([("Q4", "full"), ("Q4", "incompatible-centred"), ("Q8", "full")],
                                    "plane-stress", [0.0, nu_b, 0.49], (1.0, 20.0), 0.05),
                      outdir / "locking-ratio.png"))
    files.append(save(contour_chart("Q4", "full", "plane-strain", (1.0, 20.0), (0.0, 0.499)),
                      outdir / "locking-contour-q4-plane-strain.png"))
    # the taper chart at the mesh's own a/b (the text's value), with every variant the text reports
    files.append(save(distortion_chart([("Q4", "full"), ("Q4", "incompatible"), ("Q4", "incompatible-centred"),
                                        ("Q4", "eas4"), ("Q4", "hybrid5"), ("Q8", "full")],
                                       "plane-stress", "taper", (0.0, 0.6), aspect, nu_b),
                      outdir / "locking-distortion-taper.png"))
    lines.append("charts: ratio vs aspect (Q4 full / incompatible-centred / Q8), contour of Q4 full in plane strain, "
                 f"taper sensitivity of the Q4 variants and Q8 at a/b = {aspect:g}, nu = {nu_b}")
    return {"title": "Bending locking and the choice of element", "lines": lines,
            "files": [str(Path(f).name) for f in files]}
