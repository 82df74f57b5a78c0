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

import io
import math
from pathlib import Path

import numpy as np
import sympy as sp

from . import locking
from .errors import InputError
from .output import write_atomic

#: colours of decreasing darkness (luminance roughly 0.0, 0.25, 0.45, 0.65, 0.8)
COLOURS = ("#000000", "#1b4f8a", "#b5520f", "#5d9c3a", "#c9a227", "#8c6bb1")
STYLES = ("-", "--", "-.", ":", (0, (5, 1, 1, 1, 1, 1)), (0, (1, 1)))
MARKERS = ("o", "s", "^", "D", "v", "P")
FORMATS = {".png": "png", ".svg": "svg", ".pdf": "pdf"}
SOURCE_NOTE = ("closed forms: derive energy route (exact element response to the consistent load of a linear "
               "bending stress); Q4 full matches Cook, Malkus, Plesha & Witt (4th ed.)")


def _figure(width=7.5, height=5.0):
    from matplotlib.figure import Figure
    fig = Figure(figsize=(width, height), dpi=110, layout="constrained")
    fig.get_layout_engine().set(rect=(0, 0.07, 1, 0.93))  # room for the source note below
    return fig


def _note(fig, text: str) -> None:
    import textwrap
    fig.text(0.01, 0.005, "\n".join(textwrap.wrap(text, 150)), fontsize=6, color="0.3", ha="left", va="bottom")


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
    """Ratio against aspect ratio for each (element, variant) and nu."""
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
    fig = _figure()
    ax = fig.add_subplot()
    if tolerance is not None:
        tol = float(tolerance)
        if not 0 < tol < 1:
            raise InputError(f"tolerance must be between 0 and 1, got {tolerance}")
        band = ax.axhspan(1 - tol, 1 + tol, color="0.88", zorder=0, label=f"tolerance band 1 ± {tol:g}")
        band.set_gid(f"tolerance|{tol:g}")
    ax.axhline(1.0, color="0.5", lw=0.8, zorder=1)
    notes = []
    for k, (name, variant) in enumerate(specs):
        locking.check(name, variant, state)
        f = locking.ratio_function(name, variant, state)
        if locking.locking_ratio(name, variant, state) is sp.oo:
            notes.append(f"{_label(name, variant)}: bending is a zero-energy mode (no curve)")
            continue
        for j, v in enumerate(nus):
            y = f(rr, v)
            line, = ax.plot(rr, y, color=COLOURS[j], ls=STYLES[k], marker=MARKERS[k], markevery=max(n // 8, 1),
                            ms=4, lw=1.6, label=f"{_label(name, variant)}, ν = {v:g}")
            line.set_gid(f"ratio|{name}|{variant}|{v:g}")
            if tolerance is not None:
                lim = locking.aspect_limit(name, variant, state, v, tol)["aspect_limit"]
                if lim is not None and lo <= lim <= hi:
                    yl = float(f(lim, v))
                    mk, = ax.plot([lim, lim], [0, yl], color=COLOURS[j], ls=":", lw=0.9)
                    mk.set_gid(f"limit|{name}|{variant}|{v:g}")
                    ax.plot([lim], [yl], marker="|", ms=12, color=COLOURS[j], mew=2)
    ax.set_xscale("log")
    ax.set_xlim(lo, hi)
    ax.set_ylim(bottom=0)
    ax.set_xlabel("element aspect ratio r = a/b (–), log scale; element 2a long (bending axis) × 2b deep")
    ax.set_ylabel("bending rotation ratio θ_element / θ_continuum (–)")
    ax.set_title(f"Bending locking of one element in pure bending, {state}")
    ax.grid(True, which="both", color="0.9", lw=0.5)
    ax.legend(fontsize=7, loc="best")
    _note(fig, SOURCE_NOTE + ("; " + "; ".join(notes) if notes else "") +
          ("; dotted verticals: largest r within the tolerance" if tolerance is not None else ""))
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
    fig = _figure()
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
    ax.set_xlabel("element aspect ratio r = a/b (–), log scale")
    ax.set_ylabel("Poisson's ratio ν (–)")
    ax.set_title(f"{name} {variant}, {state}: bending rotation ratio")
    _note(fig, SOURCE_NOTE)
    return fig


def distortion_chart(specs, state: str = "plane-stress", kind: str = "taper", values=(0.0, 0.6),
                     aspect: float = 1.0, nu: float = 0.3, n: int = 31):
    """Ratio against a distortion parameter (skew angle in degrees, taper or trapezoid fraction)."""
    specs = parse_specs(specs)
    lo, hi = _range(values, f"{kind} range")
    locking.check_point(aspect, nu, state)
    if kind not in locking.DISTORTIONS:
        raise InputError(f"unknown distortion {kind!r}; allowed: {', '.join(locking.DISTORTIONS)}")
    xs = np.linspace(lo, hi, n)
    fig = _figure()
    ax = fig.add_subplot()
    ax.axhline(1.0, color="0.5", lw=0.8)
    methods = set()
    for k, (name, variant) in enumerate(specs):
        ys, method = locking.distortion_curve(name, variant, state, kind, xs, aspect, nu)
        methods.add(f"{name}: {method}")
        if np.all(np.isnan(ys)):
            continue
        line, = ax.plot(xs, ys, color=COLOURS[k % len(COLOURS)], ls=STYLES[k % len(STYLES)],
                        marker=MARKERS[k % len(MARKERS)], markevery=max(n // 8, 1), ms=4, lw=1.6,
                        label=_label(name, variant))
        line.set_gid(f"distortion|{name}|{variant}|{kind}")
    units = {"skew": "skew angle of the ends from the vertical (degrees)",
             "taper": "taper τ (–): depth 2b(1 − τ) at the left end, 2b(1 + τ) at the right",
             "trapezoid": "trapezoid s (–): top edge 2a(1 − s), bottom edge 2a(1 + s)"}[kind]
    ax.set_xlabel(units)
    ax.set_ylabel("bending rotation ratio θ_element / θ_continuum (–)")
    ax.set_title(f"Distortion sensitivity in pure bending, {state}, r = a/b = {aspect:g}, ν = {nu:g}")
    ax.set_ylim(bottom=0)
    ax.grid(True, color="0.9", lw=0.5)
    ax.legend(fontsize=8, loc="best")
    _note(fig, "energy route on the distorted shape (derive.locking); " + "; ".join(sorted(methods)))
    return fig


def _range(value, what: str, positive: bool = False) -> tuple[float, float]:
    try:
        lo, hi = (float(v) for v in value)
    except (TypeError, ValueError):
        raise InputError(f"{what}: give two numbers lo:hi") from None
    if not (math.isfinite(lo) and math.isfinite(hi)) or lo >= hi or (positive and lo <= 0):
        raise InputError(f"{what}: need {'0 < ' if positive else ''}lo < hi, got {lo:g}:{hi:g}")
    return lo, hi


def save(fig, path, close: bool = True) -> Path:
    """Write the figure as PNG, SVG or PDF (by the extension), atomically; returns the path."""
    path = Path(path)
    fmt = FORMATS.get(path.suffix.lower())
    if fmt is None:
        raise InputError(f"chart file {str(path)!r}: the extension must be one of {', '.join(FORMATS)}")
    buf = io.BytesIO()
    fig.savefig(buf, format=fmt, metadata=_metadata(fmt))
    write_atomic(path, buf.getvalue())
    if close:
        fig.clear()
    return path


def _metadata(fmt: str) -> dict:
    # fixed metadata so repeated runs write identical files (no creation dates)
    if fmt == "png":
        return {"Software": "derive"}
    if fmt == "svg":
        return {"Date": None, "Creator": "derive"}
    return {"CreationDate": None, "Creator": "derive", "Producer": "derive"}


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
