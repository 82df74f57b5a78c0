"""derive.modes: zero-energy counts, rigid vs spurious, communicability, plots, CLI."""
from __future__ import annotations

import json

import numpy as np
import pytest
from numpy.testing import assert_allclose

from derive import modes
from derive.cli import main
from derive.kinematics import rigid_body_modes


@pytest.mark.parametrize("name,variant,zero,spurious,communicable", [
    # textbook zero-energy counts (Cook, Malkus & Plesha (1989), from memory):
    ("Q4", "full", 3, 0, False),       # bilinear quadrilateral, 2x2 Gauss: rigid-body modes only
    ("Q4", "reduced", 5, 2, True),     # one-point rule: two hourglass modes, communicable
    ("Q8", "reduced", 4, 1, False),    # 8-node, 2x2: one spurious mode, not communicable
    ("Q9", "reduced", 6, 3, None),     # 9-node, 2x2: three spurious modes
    ("T3", "full", 3, 0, False),
    ("T6", "full", 3, 0, False),
    ("Q9", "full", 3, 0, False),
])
def test_zero_energy_counts(name, variant, zero, spurious, communicable):
    for geometry in ("square", "distorted"):
        r = modes.zero_energy_modes(name, variant, geometry=geometry)
        assert (r["zero_energy"], r["rigid"], r["spurious"]) == (zero, 3, spurious), geometry
        if communicable is not None:
            assert r["communicable"] is communicable


def test_spurious_modes_are_orthogonal_to_rigid_and_zero_energy():
    r = modes.zero_energy_modes("Q4", "reduced", geometry="distorted")
    nodes = np.array(r["nodes"])
    R = np.array(rigid_body_modes(list(nodes[:, 0]), list(nodes[:, 1])), float)
    S = np.array(r["spurious_modes"])
    # orthogonal up to the eigen-solver's round-off (common practice, no source)
    assert_allclose(S @ R.T, 0, rtol=0, atol=1e-10 * np.abs(R).max())
    from derive import element
    K = element("Q4", "reduced").numeric_stiffness(nodes, 1.0, 0.3, 1.0)
    assert np.abs(S @ K @ S.T).max() < 1e-10 * np.abs(K).max()


def test_mesh_check_counts():
    # Q8 2x2 mode is suppressed by its neighbours (Cook, Malkus & Plesha (1989), from memory)
    assert modes.mesh_check("Q8", "reduced")["spurious"] == 0
    # Q4 one-point hourglass modes survive assembly (Flanagan & Belytschko (1981), from memory)
    assert modes.mesh_check("Q4", "reduced")["spurious"] >= 2


def test_axisymmetric_rigid_count():
    # axisymmetric solids: only the axial translation is a rigid-body motion (common practice, no source)
    r = modes.zero_energy_modes("Q4", "full", "axisymmetric")
    assert (r["zero_energy"], r["rigid"], r["spurious"]) == (1, 1, 0)


def test_incompatible_variants_have_no_spurious_modes():
    # incompatible modes and enhanced strains keep full rank (Taylor, Beresford & Wilson (1976);
    # Simo & Rifai (1990), from memory)
    for v in ("incompatible", "incompatible-centred", "eas4", "hybrid5"):
        r = modes.zero_energy_modes("Q4", v, geometry="distorted")
        assert (r["zero_energy"], r["spurious"]) == (3, 0), v


def test_plot_and_cli(tmp_path, capsys):
    png = tmp_path / "modes.png"
    code = main(["modes", "Q8", "--variant", "reduced", "--plot", str(png), "--json"])
    data = json.loads(capsys.readouterr().out)
    assert code == 0
    assert {"element", "variant", "zero_energy", "rigid", "spurious"} <= set(data)
    assert (data["element"], data["variant"], data["zero_energy"], data["rigid"], data["spurious"]) == \
        ("Q8", "reduced", 4, 3, 1)
    assert data["communicable"] is False
    assert png.read_bytes()[:8] == b"\x89PNG\r\n\x1a\n"
    code = main(["modes", "Q4", "--variant", "reduced"])
    out = capsys.readouterr().out
    assert code == 0 and "WARNING" in out and "communicable" in out


def test_cli_bad_input(capsys):
    assert main(["modes", "Q7"]) == 2
    assert main(["modes", "Q4", "--nodes", "0,0 1,0 1,1"]) == 2
    assert main(["modes", "Q4", "--nodes", "0,0 0,1 1,1 1,0"]) == 2     # clockwise
    err = capsys.readouterr().err
    assert all(line.startswith("derive modes: error:") for line in err.strip().splitlines())
