"""Figures for every chart and plot derive writes: one place for the format, the resolution,
the footer (source note and the caution) and the atomic write.

Figures are ``matplotlib.figure.Figure`` objects with the Agg canvas (no pyplot state, no
display needed), laid out by the constrained layout engine with a band at the bottom kept
free for the footer.  :func:`save` picks PNG, SVG or PDF from the file's extension, writes
fixed metadata (no creation dates, so repeated runs give identical files) and raster output
at :data:`DEFAULT_DPI` unless told otherwise.

Line styling for many curves on one axis: :func:`style` gives each curve its own colour,
line style and marker, and staggers the marker positions of curves that would otherwise
coincide, so that every legend entry stays visible when curves lie on top of each other.
"""
from __future__ import annotations

import io
import math
import textwrap
from pathlib import Path

import numpy as np

from .errors import InputError
from .output import CAUTION, write_atomic

#: file extension -> matplotlib format
FORMATS = {".png": "png", ".svg": "svg", ".pdf": "pdf"}
#: resolution of raster output (PNG) in dots per inch: print quality
DEFAULT_DPI = 300
#: accepted range of --dpi (below: unreadable; above: files of hundreds of MB)
DPI_RANGE = (50, 1200)

#: colours of decreasing darkness (luminance roughly 0.0, 0.25, 0.45, 0.65, 0.8), paired with
#: line styles and markers so the charts stay legible when printed in grey
COLOURS = ("#000000", "#1b4f8a", "#b5520f", "#5d9c3a", "#c9a227", "#8c6bb1")
STYLES = ("-", "--", "-.", ":", (0, (5, 1, 1, 1, 1, 1)), (0, (1, 1)))
MARKERS = ("o", "s", "^", "D", "v", "P", "X", "*", "<", ">")
#: the footer's font size (points) and the height reserved per footer line (fraction of 1 inch)
FOOTER_FONTSIZE = 6
_FOOTER_LINE_INCH = 0.12


def plot_format(path, what: str = "plot file") -> str:
    """Image format from the file suffix; InputError for anything but .png, .svg, .pdf."""
    fmt = FORMATS.get(Path(path).suffix.lower())
    if fmt is None:
        raise InputError(f"{what} {str(path)!r}: the extension must be one of {', '.join(FORMATS)}")
    return fmt


def check_dpi(dpi) -> int:
    """A resolution in dots per inch within :data:`DPI_RANGE`; InputError otherwise."""
    lo, hi = DPI_RANGE
    if isinstance(dpi, str):
        from .limits import parse_whole
        return parse_whole(dpi, "--dpi", lo, hi)
    try:
        value = float(dpi)
    except (TypeError, ValueError):
        raise InputError(f"--dpi {dpi!r}: give a whole number of dots per inch between {lo} and {hi}") from None
    if not (math.isfinite(value) and value == int(value) and lo <= value <= hi):
        raise InputError(f"--dpi {dpi!r}: give a whole number of dots per inch between {lo} and {hi}")
    return int(value)


def _footer_text(note: str | None, width_inch: float) -> str:
    """The note and the caution, wrapped to the figure's width (about 22 characters of the
    6-point footer font per inch)."""
    chars = max(40, int(width_inch * 22))
    parts = [p for p in (note, CAUTION) if p]
    return "\n".join(textwrap.fill(p, chars) for p in parts)


def _reserve(fig, text: str) -> None:
    """Keep a band at the bottom of the figure free for the footer's lines."""
    n_lines = text.count("\n") + 1
    height = fig.get_figheight()
    bottom = min(0.4, (n_lines * _FOOTER_LINE_INCH + 0.06) / height)
    fig.get_layout_engine().set(rect=(0, bottom, 1, 1 - bottom))


def figure(width: float = 7.5, height: float = 5.0, note: str | None = None):
    """A Figure with the footer (``note``, then the caution) written below the axes."""
    from matplotlib.figure import Figure
    text = _footer_text(note, width)
    fig = Figure(figsize=(width, height), layout="constrained")
    _reserve(fig, text)
    footer = fig.text(0.01, 0.005, text, fontsize=FOOTER_FONTSIZE, color="0.3", ha="left", va="bottom")
    footer.set_gid("footer")
    return fig


def set_note(fig, note: str | None) -> None:
    """Replace the figure's footer text (the caution stays)."""
    text = _footer_text(note, fig.get_figwidth())
    for t in fig.texts:
        if t.get_gid() == "footer":
            t.set_text(text)
    _reserve(fig, text)


def footer_text(fig) -> str:
    """The footer of a figure made by :func:`figure` ('' when there is none)."""
    return next((t.get_text() for t in fig.texts if t.get_gid() == "footer"), "")


def style(k: int, n_points: int = 200, colour: int | None = None, line: int | None = None,
          marker: int | None = None) -> dict:
    """Plot keywords of curve ``k``: its colour, line style and marker (by default all three
    indexed by ``k``), markers every ``n_points // 8`` points."""
    every = max(n_points // 8, 1)
    return {"color": COLOURS[(k if colour is None else colour) % len(COLOURS)],
            "ls": STYLES[(k if line is None else line) % len(STYLES)],
            "marker": MARKERS[(k if marker is None else marker) % len(MARKERS)],
            "markevery": (0, every), "ms": 4.5, "lw": 1.5}


def stagger(lines, n_points: int) -> None:
    """Shift the markers of curves that lie on top of each other so each curve's markers sit at
    their own points (every legend entry stays visible)."""
    m = len(lines)
    every = max(n_points // 8, m, 1)
    for i, line in enumerate(lines):
        line.set_markevery((i * every // m, every))


def coinciding(curves, rtol: float = 1e-9) -> list[list[int]]:
    """Index groups (two or more) of the curves ``[y0, y1, ...]`` whose values agree to ``rtol``
    at every point (NaN equal to NaN)."""
    groups: list[list[int]] = []
    arrays = [np.asarray(y, dtype=float) for y in curves]
    for i, y in enumerate(arrays):
        for g in groups:
            y0 = arrays[g[0]]
            if y0.shape == y.shape and np.allclose(y, y0, rtol=rtol, atol=0, equal_nan=True):
                g.append(i)
                break
        else:
            groups.append([i])
    return [g for g in groups if len(g) > 1]


def plain_log_ticks(ax, lo: float, hi: float, axis: str = "x") -> None:
    """Ticks of a log axis at 1, 2, 5 x 10^k within [lo, hi], labelled as plain numbers
    (1, 2, 5, 10, 20, not 10^0, 10^1)."""
    vals = [m * 10.0 ** e for e in range(math.floor(math.log10(lo)) - 1, math.ceil(math.log10(hi)) + 1)
            for m in (1, 2, 5) if lo * (1 - 1e-12) <= m * 10.0 ** e <= hi * (1 + 1e-12)]
    integer_ticks(ax, vals or [lo, hi], axis)


def integer_ticks(ax, values, axis: str = "x") -> None:
    """Plain integer tick labels at the given values (on a log axis too: 6, 12, 24, 48, not
    6x10^0 ... 4x10^1) and no minor tick labels."""
    from matplotlib.ticker import FixedLocator, NullFormatter, NullLocator
    vals = sorted({float(v) for v in values})
    target = ax.xaxis if axis == "x" else ax.yaxis
    target.set_major_locator(FixedLocator(vals))
    target.set_minor_locator(NullLocator())
    target.set_minor_formatter(NullFormatter())
    (ax.set_xticklabels if axis == "x" else ax.set_yticklabels)([f"{v:g}" for v in vals])


def save(fig, path, dpi: int = DEFAULT_DPI, what: str = "plot file") -> Path:
    """Write the figure as PNG, SVG or PDF (by the extension), atomically; returns the path."""
    fmt = plot_format(path, what)
    dpi = check_dpi(dpi)
    if CAUTION not in footer_text(fig).replace("\n", " "):
        raise ValueError("derive figures carry the caution in their footer: make them with plotting.figure")
    buf = io.BytesIO()
    fig.savefig(buf, format=fmt, dpi=dpi, metadata=_metadata(fmt))
    return write_atomic(path, buf.getvalue())


def _metadata(fmt: str) -> dict:
    """Fixed metadata (no creation dates: repeated runs write identical files), the caution
    included, so it travels with the file even when the footer is cropped away."""
    if fmt == "png":
        return {"Software": "derive", "Disclaimer": CAUTION}
    if fmt == "svg":
        return {"Date": None, "Creator": "derive", "Description": CAUTION}
    return {"CreationDate": None, "Creator": "derive", "Producer": "derive", "Subject": CAUTION}
