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
        raise InputError(f"{what} {str(path)!r}: the name must end in {', '.join(FORMATS)}")
    return fmt


def check_dpi(dpi) -> int:
    """A resolution in dots per inch within :data:`DPI_RANGE`; InputError otherwise."""
    lo, hi = DPI_RANGE
    try:
        value = float(dpi)
    except (TypeError, ValueError):
        raise InputError(f"--dpi {dpi!r}: give a whole number of dots per inch between {lo} and {hi}") from None
    if not (math.isfinite(value) and value == int(value) and lo <= value <= hi):
        raise InputError(f"--dpi {dpi!r}: give a whole number of dots per inch between {lo} and {hi}")
    return int(value)


def _footer_text(note: str | None) -> str:
    parts = [p for p in (note, CAUTION) if p]
    return "\n".join(textwrap.fill(p, 160) for p in parts)


def figure(width: float = 7.5, height: float = 5.0, note: str | None = None):
    """A Figure with the footer (``note``, then the caution) written below the axes."""
    from matplotlib.figure import Figure
    text = _footer_text(note)
    n_lines = text.count("\n") + 1
    fig = Figure(figsize=(width, height), layout="constrained")
    bottom = min(0.4, (n_lines * _FOOTER_LINE_INCH + 0.08) / height)
    fig.get_layout_engine().set(rect=(0, bottom, 1, 1 - bottom))
    footer = fig.text(0.01, 0.005, text, fontsize=FOOTER_FONTSIZE, color="0.3", ha="left", va="bottom")
    footer.set_gid("footer")
    return fig


def set_note(fig, note: str | None) -> None:
    """Replace the figure's footer text (the caution stays)."""
    for t in fig.texts:
        if t.get_gid() == "footer":
            t.set_text(_footer_text(note))


def footer_text(fig) -> str:
    """The footer of a figure made by :func:`figure` ('' when there is none)."""
    return next((t.get_text() for t in fig.texts if t.get_gid() == "footer"), "")


def style(k: int, n_curves: int = 1, n_points: int = 200, colour: int | None = None, line: int | None = None,
          marker: int | None = None) -> dict:
    """Plot keywords of curve ``k`` of ``n_curves``: its colour, line style and marker, and a
    marker spacing staggered by ``k`` so coinciding curves show every marker type."""
    every = max(n_points // 8, 1)
    start = (k * every) // max(n_curves, 1) if n_curves > 1 else 0
    return {"color": COLOURS[(k if colour is None else colour) % len(COLOURS)],
            "ls": STYLES[(k if line is None else line) % len(STYLES)],
            "marker": MARKERS[(k if marker is None else marker) % len(MARKERS)],
            "markevery": (start, every) if n_points > 1 else None, "ms": 4.5, "lw": 1.5,
            "markerfacecolor": "none" if (k // len(MARKERS)) % 2 else None}


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
    buf = io.BytesIO()
    fig.savefig(buf, format=fmt, dpi=dpi, metadata=_metadata(fmt))
    return write_atomic(path, buf.getvalue())


def _metadata(fmt: str) -> dict:
    # fixed metadata so repeated runs write identical files (no creation dates)
    if fmt == "png":
        return {"Software": "derive"}
    if fmt == "svg":
        return {"Date": None, "Creator": "derive"}
    return {"CreationDate": None, "Creator": "derive", "Producer": "derive"}
