"""Design charts: files of the requested format, plotted data equal to the closed form (read back
from the figure objects), the `derive chart` command and the demo section."""
from __future__ import annotations

import json
import math

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import fem_reference as fr

from derive import charts
from derive import locking as L
from derive.cli import main
from derive.symbols import nu, r

COOK = (1 - nu ** 2) / (1 + (1 - nu) * r ** 2 / 2)
SIGNATURES = {".png": b"\x89PNG\r\n\x1a\n", ".svg": b"<svg", ".pdf": b"%PDF-"}


def _q4_plane_strain(rv: float, nv: float) -> float:
    # Q4 full, plane strain, derived by hand from the bending mode u = c x y (the independent value
    # of tests/test_locking.py, Cook et al. 4th ed. method, from memory)
    return (1 - 2 * nv) / ((1 - nv) ** 2 + (1 - nv) * (1 - 2 * nv) * rv ** 2 / 2)


def test_locking_chart_data_equal_the_closed_form(tmp_path):
    fig = charts.locking_chart("Q4:full,Q4:incompatible-centred,Q8:full,Q4:reduced", "plane-stress",
                               [0.0, 0.3, 0.49], (1, 20), 0.05)
    lines = {d["gid"]: d for d in charts.series(fig)}
    assert {"ratio|Q4|full|0.3", "ratio|Q4|incompatible-centred|0.49", "ratio|Q8|full|0"} <= set(lines)
    assert not any("reduced" in g for g in lines)                     # zero-energy: no curve
    d = lines["ratio|Q4|full|0.3"]
    x, y = np.array(d["x"]), np.array(d["y"])
    assert math.isclose(x[0], 1) and math.isclose(x[-1], 20) and len(x) == 200
    for k in (0, 37, 120, 199):
        # Cook, Malkus, Plesha & Witt (4th ed.) formula, from memory, at the sampled points
        assert math.isclose(y[k], float(COOK.subs({r: x[k], nu: 0.3})), rel_tol=1e-12)
    ax = fig.axes[0]
    assert ax.get_xscale() == "log" and "aspect ratio" in ax.get_xlabel() and ax.get_title()
    assert "θ" in ax.get_ylabel()
    # tolerance band drawn: a patch spanning 0.95 .. 1.05 (common practice for a +-5 % band)
    band = next(p for p in ax.patches if (p.get_gid() or "").startswith("tolerance"))
    assert math.isclose(band.get_y(), 0.95) and math.isclose(band.get_y() + band.get_height(), 1.05)
    # one line style per element, one colour per nu (the chart's legend convention)
    data_lines = [ln for ln in ax.lines if (ln.get_gid() or "").startswith("ratio|")]
    style = {}
    colour = {}
    for ln in data_lines:
        _, name, variant, v = ln.get_gid().split("|")
        style.setdefault(name + variant, set()).add(str(ln.get_linestyle()))
        colour.setdefault(v, set()).add(ln.get_color())
    assert all(len(s_) == 1 for s_ in style.values()) and len({next(iter(s_)) for s_ in style.values()}) == 3
    assert all(len(c_) == 1 for c_ in colour.values()) and len({next(iter(c_)) for c_ in colour.values()}) == 3


def test_aspect_limit_marked_where_the_curve_leaves_the_band():
    fig = charts.locking_chart("Q4:full", "plane-stress", [0.0, 0.2], (0.05, 5), 0.05)
    lines = {d["gid"]: d for d in charts.series(fig)}
    for v in ("0", "0.2"):
        mark = lines[f"limit|Q4|full|{v}"]
        # r* from Cook's formula solved by hand: sqrt(2 (tol - nu^2) / ((1 - nu)(1 - tol)))
        nv = float(v)
        rstar = math.sqrt(2 * (0.05 - nv ** 2) / ((1 - nv) * 0.95))
        assert math.isclose(mark["x"][0], rstar, rel_tol=1e-10)
        assert math.isclose(mark["y"][1], 0.95, rel_tol=1e-9)


def test_contour_grid_equals_the_closed_form():
    fig = charts.contour_chart("Q4", "full", "plane-strain", (1, 20), (0, 0.499), n=200)
    ax = fig.axes[0]
    mesh = next(c for c in ax.collections if c.get_gid() == "grid|Q4|full")
    Z = np.asarray(mesh.get_array()).reshape(200, 200)
    coords = mesh.get_coordinates()        # cell corners around the 'nearest' centres
    rr = np.logspace(0, math.log10(20), 200)
    nn = np.linspace(0, 0.499, 200)
    assert coords.shape[:2] == (201, 201)
    for i, j in ((0, 0), (10, 150), (199, 3), (120, 77)):
        # plane-strain closed form derived by hand (tests/test_locking.py), not derive's own formula
        assert math.isclose(Z[i, j], _q4_plane_strain(rr[j], nn[i]), rel_tol=1e-11)


def test_distortion_chart_data(tmp_path):
    fig = charts.distortion_chart("Q4:full,Q4:eas4", "plane-stress", "skew", (0, 45), 2.0, 0.3, n=10)
    lines = {d["gid"]: d for d in charts.series(fig)}
    d = lines["distortion|Q4|full|skew"]
    xs = np.array(d["x"])
    # against an independent energy solve on the skewed element (textbook Q4 of tests/fem_reference.py,
    # nodes x = a X + c Y, y = Y with c = tan(angle), a = 2, b = 1), not derive's own expression
    ref = np.array(fr.REF_NODES["Q4"], dtype=float)
    for k in (0, 4, 9):
        c = math.tan(math.radians(xs[k]))
        xy = np.column_stack([2.0 * ref[:, 0] + c * ref[:, 1], ref[:, 1]])
        expected = fr.bending_energy_ratio("Q4", [xy], lambda e: fr.stiffness("Q4", e, 1.0, 0.3, 1.0))
        assert math.isclose(d["y"][k], expected, rel_tol=1e-10)
    assert d["y"][0] == pytest.approx(float(COOK.subs({r: 2, nu: sp.Rational(3, 10)})), rel=1e-12)
    # Simo & Rifai (1990): exact on parallelograms
    assert_allclose(lines["distortion|Q4|eas4|skew"]["y"], 1.0, rtol=1e-10, atol=0)


@pytest.mark.parametrize("ext", [".png", ".svg", ".pdf"])
def test_files_of_the_requested_format_written_atomically(tmp_path, ext):
    path = charts.save(charts.locking_chart("Q4:full", "plane-stress", [0.3], (1, 10), 0.05), tmp_path / f"c{ext}")
    data = path.read_bytes()
    assert len(data) > 1000 and SIGNATURES[ext] in data[:400]
    assert sorted(p.name for p in tmp_path.iterdir()) == [f"c{ext}"]   # no temporary file left


def test_bad_chart_inputs():
    from derive.errors import InputError
    with pytest.raises(InputError, match="extension"):
        charts.save(charts.locking_chart("Q4", "plane-stress", [0.3], (1, 2), None), "chart.jpg")
    with pytest.raises(InputError, match="lo < hi"):
        charts.locking_chart("Q4", "plane-stress", [0.3], (5, 2))
    with pytest.raises(InputError, match="zero-energy"):
        charts.contour_chart("Q4", "reduced", "plane-stress")
    with pytest.raises(InputError, match="unknown variant"):
        charts.parse_specs("Q4:bogus")


def test_chart_cli(tmp_path, capsys):
    out = tmp_path / "chart.svg"       # its folder must exist: derive creates no folder for a file
    code = main(["chart", "locking", "--elements", "Q4:full,Q4:incompatible-centred,Q8:full", "--state",
                 "plane-stress", "--nu", "0,0.3,0.49", "--aspect", "1:20", "-o", str(out), "--json"])
    data = json.loads(capsys.readouterr().out)
    assert code == 0 and out.exists() and data["format"] == "svg" and len(data["series"]) == 9
    code = main(["chart", "contour", "--elements", "Q4:full", "--state", "plane-strain", "-o", str(tmp_path / "c.png")])
    assert code == 0 and (tmp_path / "c.png").stat().st_size > 1000
    code = main(["chart", "distortion", "--elements", "Q4:full,Q4:hybrid5", "--distortion", "trapezoid=0:0.5",
                 "-o", str(tmp_path / "d.pdf")])
    assert code == 0 and (tmp_path / "d.pdf").read_bytes().startswith(b"%PDF")
    capsys.readouterr()
    code = main(["chart", "locking", "-o", str(tmp_path / "x.gif")])
    err = capsys.readouterr().err
    assert code == 2 and ".png" in err and err.count("\n") == 1


def test_demo_section_writes_its_files(tmp_path):
    res = charts.demo_section(tmp_path)
    assert res["title"] and any("Q4 full" in line for line in res["lines"])
    for name in res["files"]:
        assert (tmp_path / name).stat().st_size > 100
    table = json.loads((tmp_path / "locking-table.json").read_text())
    q4 = next(row for row in table if row["element"] == "Q4" and row["variant"] == "full")
    # the demo's a/b = 2, nu = 0.2 against Cook's formula (4th ed., from memory)
    assert math.isclose(q4["ratio"], float(COOK.subs({r: 2, nu: sp.Rational(1, 5)})), rel_tol=1e-12)
