"""derive.patch: the five-element patch test, its higher-order companion, and the CLI exit codes."""
from __future__ import annotations

import json

import numpy as np
import pytest
from numpy.testing import assert_allclose

from derive import patch
from derive.cli import main

# MacNeal & Harder (1985), from memory: sigma_x = sigma_y = 1333, tau_xy = 400 for the prescribed field
PUBLISHED = np.array([1333.333333, 1333.333333, 400.0])


def test_patch_geometry_is_the_published_one():
    # MacNeal & Harder (1985), from memory: 0.24 x 0.12 with interior nodes at these points
    m = patch.patch_mesh("Q4")
    assert m.n_elements == 5 and m.n_nodes == 8
    for p in [(0.04, 0.02), (0.18, 0.03), (0.16, 0.08), (0.08, 0.08)]:
        m.node_at(*p)
    m8 = patch.patch_mesh("Q8")
    assert m8.n_nodes == 8 + 12          # mid-side nodes at the 12 edge midpoints
    # midpoint of (0.04,0.02)-(0.18,0.03), arithmetic by hand
    assert_allclose(m8.nodes[m8.node_at(0.11, 0.025)], [0.11, 0.025], rtol=0, atol=1e-15)


@pytest.mark.parametrize("name", ["Q4", "Q8", "Q9", "T3", "T6"])
def test_full_elements_pass(name):
    res = patch.patch_test(name, "full")
    assert res["passed"], patch.summary_lines(res)
    for t in res["tests"]:
        # the fields lie in the element spaces, so only float64 round-off of a small well-conditioned
        # solve remains (measured 1e-16 .. 5e-14): 1e-10 relative, far below the verdict's 1e-6
        assert t["max_error"] < 1e-10
        if t["order"] == "constant":
            # MacNeal & Harder (1985), from memory: 1333.333333 / 1333.333333 / 400 (10 digits)
            assert_allclose(t["stress_mean"], PUBLISHED, rtol=1e-9, atol=0)
            assert_allclose(t["stress_expected"], PUBLISHED, rtol=1e-9, atol=0)


def test_incompatible_fails_and_centred_passes():
    # Wilson et al. (1973) modes fail off parallelograms; the centre-Jacobian correction of
    # Taylor, Beresford & Wilson (1976) passes (from memory)
    bad = patch.patch_test("Q4", "incompatible")
    good = patch.patch_test("Q4", "incompatible-centred")
    assert not bad["passed"] and bad["max_error"] > 1e-3
    assert good["passed"] and good["max_error"] < 1e-10      # round-off only, as above
    # both pass on a regular (rectangular) patch (same sources)
    assert patch.patch_test("Q4", "incompatible", patches=("regular",), orders=("constant",))["passed"]


@pytest.mark.parametrize("variant", ["selective", "bbar", "eas4", "hybrid5"])
def test_q4_variants_pass(variant):
    # Hughes (1980) B-bar, Simo & Rifai (1990) EAS, Pian & Sumihara (1984) hybrid: all pass (from memory)
    res = patch.patch_test("Q4", variant)
    assert res["passed"], patch.summary_lines(res)
    for t in res["tests"]:
        assert t["max_error"] < 1e-10                           # round-off only, as above
        assert_allclose(t["stress_mean"], PUBLISHED, rtol=1e-9, atol=0)


def test_higher_order_patch():
    # 9-node Lagrange and straight-sided 6-node triangles keep quadratic completeness under the
    # bilinear / affine map; the 8-node serendipity element loses it off parallelograms
    # (Lee & Bathe (1993), from memory)
    assert patch.patch_test("Q9", "full", orders=("higher",), patches=("distorted",))["passed"]
    assert patch.patch_test("T6", "full", orders=("higher",), patches=("distorted",))["passed"]
    q8 = patch.patch_test("Q8", "full", orders=("higher",), patches=("distorted", "regular"))
    by_patch = {t["patch"]: t["passed"] for t in q8["tests"]}
    assert by_patch == {"distorted": False, "regular": True}


def test_reduced_q4_force_driven_is_a_mechanism():
    # one-point Q4 with three supports: hourglass mechanism (common practice, no source)
    res = patch.patch_test("Q4", "reduced")
    forms = {t["form"]: t for t in res["tests"]}
    assert forms["displacement"]["passed"]
    assert not forms["force"]["passed"] and forms["force"]["mechanism"]
    assert not res["passed"] and res["mechanism"]


def test_plane_strain_matches_D():
    # plane strain: sigma = D eps with eps = (1e-3, 1e-3, 1e-3) (Hooke's law, elementary)
    res = patch.patch_test("Q4", "full", "plane-strain")
    E, nu = 1e6, 0.25
    f = E / ((1 + nu) * (1 - 2 * nu))
    expected = [f * (1 - nu + nu) * 1e-3, f * (1 - nu + nu) * 1e-3, f * (1 - 2 * nu) / 2 * 1e-3]
    assert res["passed"] and res["max_error"] < 1e-10            # round-off only, as above
    assert_allclose(res["tests"][0]["stress_mean"], expected, rtol=1e-10, atol=0)


def test_cli_exit_codes(capsys):
    assert main(["patch", "Q4"]) == 0
    assert main(["patch", "Q4", "--variant", "incompatible", "--json"]) == 1
    out = capsys.readouterr().out
    data = json.loads(out[out.index("{"):])
    assert {"element", "variant", "passed", "max_error"} <= set(data)
    assert data["passed"] is False and data["variant"] == "incompatible"
    assert main(["patch", "Q4", "--variant", "reduced", "--json"]) == 1
    json.loads(capsys.readouterr().out)                 # strict JSON even with a mechanism
    assert main(["patch", "T3", "--order", "higher"]) == 2
    assert main(["patch", "Q4", "--variant", "nonsense"]) == 2
    assert main(["patch", "Q4", "--tol", "abc"]) == 2
    err = capsys.readouterr().err.strip().splitlines()
    assert len(err) == 3 and all(e.startswith("derive patch: error:") for e in err)
