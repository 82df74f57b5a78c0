"""What a program can check on every chart and plot derive draws: the PNG resolution, every legend
entry visible (coinciding curves included), labelled reference lines, tick labels that do not
overlap, plain numbers on mesh-size axes, and the caution in the footer and the file."""
from __future__ import annotations

import itertools
import re
import struct
from pathlib import Path

import numpy as np
import pytest

from derive import benchmarks as B
from derive import charts, modes, plotting
from derive.cli import main
from derive.output import CAUTION

# ---------------------------------------------------------------------------------------------
# helpers


def _png_dpi(data: bytes) -> tuple[float, float]:
    """Resolution from the PNG pHYs chunk: pixels per metre, unit byte 1 = metre (PNG
    specification, W3C 2003, section 11.3.5.3, from memory)."""
    assert data[:8] == b"\x89PNG\r\n\x1a\n"
    pos = 8
    while pos < len(data):
        length, kind = struct.unpack(">I4s", data[pos:pos + 8])
        if kind == b"pHYs":
            ppx, ppy, unit = struct.unpack(">IIB", data[pos + 8:pos + 17])
            assert unit == 1
            return ppx * 0.0254, ppy * 0.0254
        pos += 12 + length
    raise AssertionError("no pHYs chunk")


def _renderer(fig):
    from matplotlib.backends.backend_agg import FigureCanvasAgg
    FigureCanvasAgg(fig)
    fig.canvas.draw()
    return fig.canvas.get_renderer()


def _shown_tick_labels(axis):
    """Tick labels matplotlib draws: visible, non-empty, at a location inside the view interval."""
    lo, hi = sorted(axis.get_view_interval())
    out = []
    for tick in itertools.chain(axis.get_major_ticks(), axis.get_minor_ticks()):
        loc = tick.get_loc()
        if loc is None or not (lo - 1e-12 * abs(hi) <= loc <= hi + 1e-12 * abs(hi)):
            continue
        for lab in (tick.label1, tick.label2):
            if lab.get_visible() and lab.get_text().strip():
                out.append(lab)
    return out


def overlapping_tick_labels(fig) -> list[tuple[str, str]]:
    """Pairs of tick labels of one axis whose drawn bounding boxes overlap (by more than 1 px)."""
    r = _renderer(fig)
    bad = []
    for ax in fig.axes:
        for axis in (ax.xaxis, ax.yaxis):
            boxes = [(lab.get_text(), lab.get_window_extent(r)) for lab in _shown_tick_labels(axis)]
            for (ta, a), (tb, b) in itertools.combinations(boxes, 2):
                w = min(a.x1, b.x1) - max(a.x0, b.x0)
                h = min(a.y1, b.y1) - max(a.y0, b.y0)
                if w > 1 and h > 1:
                    bad.append((ta, tb))
    return bad


def _legend_labels(fig) -> list[str]:
    out = []
    for ax in fig.axes:
        leg = ax.get_legend()
        if leg is not None:
            out += [t.get_text() for t in leg.get_texts()]
    for leg in fig.legends:
        out += [t.get_text() for t in leg.get_texts()]
    return out


def _marker_positions(line) -> set[int]:
    n = len(line.get_xdata())
    every = line.get_markevery()
    if every is None:
        return set(range(n))
    start, step = every if isinstance(every, tuple) else (0, every)
    return set(range(start, n, step))


# ---------------------------------------------------------------------------------------------
# the figures (small studies: the checks are about drawing, not about the numbers)


@pytest.fixture(scope="module")
def figures():
    figs = {
        "locking": charts.locking_chart([("Q4", "full"), ("Q4", "incompatible-centred"), ("Q8", "full")],
                                        "plane-stress", [0.0, 0.2, 0.49], (1.0, 20.0), 0.05),
        "contour": charts.contour_chart("Q4", "full", "plane-strain", (1.0, 20.0), (0.0, 0.499), n=60),
        "distortion": charts.distortion_chart([("Q4", "full"), ("Q4", "incompatible"), ("Q4", "incompatible-centred"),
                                               ("Q4", "eas4"), ("Q4", "hybrid5"), ("Q8", "full")],
                                              "plane-stress", "taper", (0.0, 0.6), 2.0, 0.2),
        "membrane": B.study_figure(B.membrane_study("Q4", "full", levels=(2, 4, 8, 16))),
        "cylinder": B.study_figure(B.cylinder_study("Q4", "bbar", levels=(2, 4, 8), nus=(0.3, 0.4999))),
        "cantilever": B.study_figure(B.cantilever_study("Q4", "full")),
        "locking-mesh": B.study_figure(B.locking_mesh_study("Q4", "eas4", depths=(1, 2), aspects=(1, 2, 5, 10))),
        "comparison": B.comparison_figure([B.locking_mesh_study("Q4", v, depths=(1,), aspects=(1, 3, 10))
                                           for v in ("full", "eas4")]),
        "tb3": B.tb3_figure([(el, "full", nx, nx // 6, 1e-3 * (1 + k) * (1 - 1 / nx))
                             for k, el in enumerate(("Q4", "Q8")) for nx in (6, 12, 24, 48)],
                            [("Q4", "full"), ("Q8", "full")], 2.2e-3, ((6, 1), (12, 2), (24, 4), (48, 8))),
        "modes": modes.modes_figure(modes.zero_energy_modes("Q4", "reduced")),
    }
    return figs


def test_every_figure_carries_the_caution_in_its_footer(figures):
    for name, fig in figures.items():
        # the project's rule: the caution in every chart (common practice, no source)
        assert CAUTION in plotting.footer_text(fig).replace("\n", " "), name


def test_no_tick_labels_overlap(figures):
    for name, fig in figures.items():
        assert overlapping_tick_labels(fig) == [], name      # legibility, common practice, no source


def test_the_overlap_check_can_fail():
    # a crowded axis: 40 long labels in 2 inches must be reported
    fig = plotting.figure(2.0, 2.0)
    ax = fig.add_subplot()
    ax.set_xticks(range(40))
    ax.set_xticklabels([f"label {k}" for k in range(40)])
    assert len(overlapping_tick_labels(fig)) > 10


def test_mesh_size_axes_show_plain_numbers(figures):
    _renderer(figures["tb3"])
    labels = [t.get_text() for t in _shown_tick_labels(figures["tb3"].axes[0].xaxis)]
    assert labels == ["6", "12", "24", "48"]                  # the demo's meshes (common practice, no source)
    left, right = figures["membrane"].axes[:2]
    _renderer(figures["membrane"])
    assert [t.get_text() for t in _shown_tick_labels(left.xaxis)] == ["2", "4", "8", "16"]
    assert sorted(t.get_text() for t in _shown_tick_labels(right.xaxis)) == ["1/16", "1/2", "1/4", "1/8"]
    _renderer(figures["locking"])
    shown = [t.get_text() for t in _shown_tick_labels(figures["locking"].axes[0].xaxis)]
    assert shown == ["1", "2", "5", "10", "20"] and not any("10^" in s or "$" in s for s in shown)


def test_every_data_line_and_reference_line_is_in_the_legend(figures):
    for name, fig in figures.items():
        if name in ("contour", "modes"):
            continue
        legend = _legend_labels(fig)
        for ax in fig.axes:
            for line in ax.lines:
                gid, label = line.get_gid() or "", line.get_label()
                dotted = str(line.get_linestyle()) in (":", "--") and len(line.get_xdata()) == 2
                if gid.startswith(("ratio|", "distortion|")) or (dotted and not gid.startswith("limit|")):
                    assert not label.startswith("_") and label in legend, (name, gid, label)


def test_coinciding_curves_keep_every_marker_visible(figures):
    fig = figures["locking"]
    ax = fig.axes[0]
    at_one = [ln for ln in ax.lines if (ln.get_gid() or "").startswith("ratio|")
              and np.allclose(ln.get_ydata(), 1.0, rtol=0, atol=1e-9)]
    # Q4 incompatible-centred and Q8 are exact in pure bending at every nu: six curves at 1
    # (Taylor, Beresford & Wilson 1976; Cook et al., from memory)
    assert len(at_one) == 6
    positions = [_marker_positions(ln) for ln in at_one]
    for a, b in itertools.combinations(positions, 2):
        assert not a & b                                      # markers never drawn on top of each other
    assert "curves on top of each other" in plotting.footer_text(fig)
    # the taper chart: incompatible, incompatible-centred and eas4 coincide; hybrid5 is drawn
    dist = figures["distortion"]
    labels = _legend_labels(dist)
    assert "Q4 hybrid5" in labels and "r = a/b = 2" in dist.axes[0].get_title()
    lines = {ln.get_label(): ln for ln in dist.axes[0].lines}
    same = [_marker_positions(lines[k]) for k in ("Q4 incompatible", "Q4 incompatible-centred", "Q4 eas4")]
    for a, b in itertools.combinations(same, 2):
        assert not a & b


def test_png_resolution_default_and_option(tmp_path, capsys):
    path = charts.save(charts.locking_chart("Q4:full", "plane-stress", [0.3], (1, 10), 0.05), tmp_path / "a.png")
    dpi = _png_dpi(path.read_bytes())
    np.testing.assert_allclose(dpi, (300, 300), rtol=0, atol=0.05)   # print resolution, common practice
    code = main(["chart", "locking", "--dpi", "150", "-o", str(tmp_path / "b.png"), "--json"])
    assert code == 0
    np.testing.assert_allclose(_png_dpi((tmp_path / "b.png").read_bytes()), (150, 150), rtol=0, atol=0.05)
    capsys.readouterr()
    for bad in ("5", "abc", "1e9", "150.5"):
        assert main(["chart", "locking", "--dpi", bad, "-o", str(tmp_path / "c.png")]) == 2
        err = capsys.readouterr().err
        assert err.count("\n") == 1 and "--dpi" in err
    assert not (tmp_path / "c.png").exists()


def test_bench_and_modes_plots_take_dpi(tmp_path, capsys):
    assert main(["bench", "cantilever", "--element", "Q4", "--load", "shear", "--mesh", "rectangular",
                 "--plot", str(tmp_path / "c.png"), "--dpi", "100", "--json"]) == 0
    np.testing.assert_allclose(_png_dpi((tmp_path / "c.png").read_bytes()), (100, 100), rtol=0, atol=0.05)
    assert main(["modes", "Q4", "--variant", "reduced", "--plot", str(tmp_path / "m.png"), "--json"]) == 0
    np.testing.assert_allclose(_png_dpi((tmp_path / "m.png").read_bytes()), (300, 300), rtol=0, atol=0.05)


@pytest.mark.parametrize("ext", [".png", ".svg", ".pdf"])
def test_the_caution_travels_in_the_file(tmp_path, ext):
    path = charts.save(charts.locking_chart("Q4:full", "plane-stress", [0.3], (1, 10), 0.05), tmp_path / f"a{ext}")
    assert CAUTION.encode() in path.read_bytes()


def test_save_refuses_a_figure_without_the_footer(tmp_path):
    from matplotlib.figure import Figure
    with pytest.raises(ValueError, match="caution"):
        plotting.save(Figure(), tmp_path / "x.png")
    assert not (tmp_path / "x.png").exists()


def test_every_image_is_written_through_plotting_save():
    # savefig appears only in derive/plotting.py, so no chart escapes the footer and dpi rules
    root = Path(charts.__file__).parent
    users = [p.relative_to(root).as_posix() for p in root.rglob("*.py")
             if re.search(r"\.savefig\(", p.read_text()) and p.name != "plotting.py"]
    assert users == []


def test_demo_taper_chart_matches_the_text(tmp_path, monkeypatch):
    saved = {}
    real = charts.save

    def record(fig, path, close=True, dpi=plotting.DEFAULT_DPI):
        saved[Path(path).name] = (fig.axes[0].get_title(), _legend_labels(fig))
        return real(fig, path, close, dpi)

    monkeypatch.setattr(charts, "save", record)
    res = charts.demo_section(tmp_path)
    title, legend = saved["locking-distortion-taper.png"]
    named = re.findall(r"Q4 (\S+) on a tapered element .*a/b = (\S+)\)", "\n".join(res["lines"]))
    assert named, res["lines"]
    for variant, aspect in named:
        assert f"Q4 {variant}" in legend                     # every variant the text reports is drawn
        assert f"r = a/b = {aspect.rstrip(':')}" in title     # at the text's aspect ratio
