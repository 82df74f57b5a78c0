"""derive.mesh: generation, assembly against a hand-assembled model, loads, supports, solve, stresses (VTU: test_mesh_io.py)."""
from __future__ import annotations

import math

import numpy as np
import pytest
from numpy.testing import assert_allclose

import derive
from derive import analysis as A
from derive import mesh as M
from derive.errors import GeometryError, InputError

import fem_reference as fr
from compilers import need


def cst_stiffness(xy, E, nu, t):
    """Constant-strain triangle K = t A B^T D B with b_i = y_j - y_k, c_i = x_k - x_j
    (the textbook closed form of the 3-node triangle, e.g. Zienkiewicz & Taylor, from memory)."""
    (x1, y1), (x2, y2), (x3, y3) = xy
    A = 0.5 * ((x2 - x1) * (y3 - y1) - (x3 - x1) * (y2 - y1))
    b = [y2 - y3, y3 - y1, y1 - y2]
    c = [x3 - x2, x1 - x3, x2 - x1]
    B = np.zeros((3, 6))
    for i in range(3):
        B[0, 2 * i] = b[i]
        B[1, 2 * i + 1] = c[i]
        B[2, 2 * i] = c[i]
        B[2, 2 * i + 1] = b[i]
    B /= 2 * A
    D = E / (1 - nu ** 2) * np.array([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])
    return t * A * B.T @ D @ B


def test_two_triangles_hand_assembled():
    # textbook CST closed form per element, global matrix assembled by hand below
    nodes = np.array([[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]])
    conn = np.array([[0, 1, 2], [0, 2, 3]])
    mesh = M.hand("T3", nodes, conn)
    E, nu, t = 200.0, 0.3, 0.5
    k1 = cst_stiffness(nodes[[0, 1, 2]], E, nu, t)
    k2 = cst_stiffness(nodes[[0, 2, 3]], E, nu, t)
    K = np.zeros((8, 8))
    d1 = [0, 1, 2, 3, 4, 5]          # nodes 0, 1, 2
    d2 = [0, 1, 4, 5, 6, 7]          # nodes 0, 2, 3
    for a in range(6):
        for b in range(6):
            K[d1[a], d1[b]] += k1[a, b]
            K[d2[a], d2[b]] += k2[a, b]
    got = M.assemble(mesh, "full", "plane-stress", E, nu, t).K.toarray()
    assert_allclose(got, K, rtol=0, atol=1e-12 * np.abs(K).max())   # hand-assembled two-element model


def test_two_quads_hand_assembled_and_tension_bar():
    # two Q4 side by side; element matrices from the independent textbook routine (tests/fem_reference.py)
    nodes = np.array([[0, 0], [1, 0], [2, 0], [2, 1], [1, 1], [0, 1]], float)
    conn = np.array([[0, 1, 4, 5], [1, 2, 3, 4]])
    mesh = M.hand("Q4", nodes, conn)
    E, nu, t = 1000.0, 0.25, 0.1
    K = np.zeros((12, 12))
    for e in conn:
        ke = fr.stiffness("Q4", nodes[e], E, nu, t)
        dofs = np.ravel([[2 * n, 2 * n + 1] for n in e])
        K[np.ix_(dofs, dofs)] += ke
    got = M.assemble(mesh, "full", "plane-stress", E, nu, t).K.toarray()
    assert_allclose(got, K, rtol=0, atol=1e-12 * np.abs(K).max())     # hand-assembled two-element model
    # uniform tension sigma on x = 2: u = sigma x / E, v = -nu sigma y / E (Hooke's law, elementary)
    sigma = 3.0
    f = M.edge_load(mesh, lambda x, y: np.isclose(x, 2.0), (sigma, 0.0), "plane-stress", t)
    fixed = {**M.fix(mesh, lambda x, y: np.isclose(x, 0.0), "u"), 1: 0.0}
    sol = A.analyse(mesh, f, fixed, "full", "plane-stress", E, nu, t)
    # the field is in the element space, so float64 round-off only: 1e-12 relative
    # (displacements are of order 6e-3, stresses of order 3)
    assert_allclose(sol.U[:, 0], sigma * nodes[:, 0] / E, rtol=0, atol=1e-12 * sigma * 2 / E)
    assert_allclose(sol.U[:, 1], -nu * sigma * nodes[:, 1] / E, rtol=0, atol=1e-12 * sigma * 2 / E)
    _, sig = sol.point_stresses()
    assert_allclose(sig[..., 0], sigma, rtol=1e-12, atol=0)
    assert_allclose(sig[..., 1:], 0, rtol=0, atol=1e-12 * sigma)
    assert_allclose(sol.nodal_stresses()[:, 0], sigma, rtol=1e-12, atol=0)
    # reactions balance the load (statics)
    assert math.isclose(sol.reactions[0::2].sum(), -sigma * 1.0 * t, rel_tol=1e-12)


@pytest.mark.parametrize("name", ["Q4", "Q8", "T6"])
def test_gauss_provider_matches_textbook(name):
    # independent textbook routine (tests/fem_reference.py) against mesh.gauss_provider and the default provider
    rng = np.random.default_rng(7)
    xy = np.array([fr.random_element(name, rng) for _ in range(3)])
    ref = np.array([fr.stiffness(name, x, 5.0, 0.3, 0.2) for x in xy])
    # same rule, float64 on both sides: 1e-12 of the largest entry (common practice)
    assert_allclose(M.gauss_provider(name)(xy, 5.0, 0.3, 0.2), ref, rtol=0, atol=1e-12 * np.abs(ref).max())
    prov, _ = M.element_provider(name, "full", "plane-stress")
    assert_allclose(prov(xy, 5.0, 0.3, 0.2), ref, rtol=0, atol=1e-12 * np.abs(ref).max())


def test_structured_counts_and_sides():
    # node counts of structured grids (combinatorics, common practice, no source)
    n = 3
    corners = ((0, 0), (3, 0), (3, 2), (0, 2))
    assert M.structured("Q4", n, n, corners).n_nodes == (n + 1) ** 2
    assert M.structured("Q8", n, n, corners).n_nodes == (2 * n + 1) ** 2 - n * n
    assert M.structured("Q9", n, n, corners).n_nodes == (2 * n + 1) ** 2
    t6 = M.structured("T6", n, n, corners)
    assert t6.n_nodes == (2 * n + 1) ** 2 and t6.n_elements == 2 * n * n
    m = M.structured("Q8", 2, 3, corners)
    m.check()
    assert m.side("left").sum() == 2 * 3 + 1 and m.side("top").sum() == 2 * 2 + 1
    assert_allclose(m.nodes[m.side("right"), 0], 3.0, rtol=1e-15, atol=0)


def test_consistent_edge_loads():
    # consistent nodal loads of a uniform traction: linear edge 1/2, 1/2; quadratic edge 1/6, 2/3, 1/6
    # (textbook result, e.g. Cook et al. (2002), from memory)
    for name, share in (("Q4", [0.5, 0.5]), ("Q8", [1 / 6, 2 / 3, 1 / 6]), ("T6", [1 / 6, 2 / 3, 1 / 6])):
        m = M.structured(name, 1, 1, ((0, 0), (2, 0), (2, 1), (0, 1)))
        f = M.edge_load(m, "right", (0.0, 4.0), "plane-stress", 0.5)     # 4 * 0.5 * edge length 1 = 2
        on = np.nonzero(m.side("right"))[0]
        order = on[np.argsort(m.nodes[on, 1])]
        assert_allclose(f[2 * order + 1], 2.0 * np.array(share), rtol=1e-13, atol=0)
        assert_allclose(f[0::2], 0.0, rtol=0, atol=1e-15)


def test_pressure_on_arc_resultant():
    # pressure p on a quarter arc of radius a: resultant (p a, p a) towards +x, +y (statics)
    p, a = 2.0, 3.0
    for name in ("Q4", "Q9"):
        m = M.structured(name, 4, 8, M.polar(a, 9.0))
        f = M.pressure_load(m, "left", p, "plane-strain", 1.0)
        # statics makes the resultant exact whatever the edge shape (Q4 chords, Q9 parabolic arcs):
        # a uniform pressure on any curve sums to p times its end-to-end vector rotated by 90
        # degrees, here (p a, p a) (measured 0.0 and 4e-16 relative); round-off only
        assert math.isclose(f[0::2].sum(), p * a, rel_tol=1e-12) and math.isclose(f[1::2].sum(), p * a, rel_tol=1e-12)


def test_mechanism_is_reported():
    # one-point Q4 hourglass modes make a clamped 6 x 1 strip singular (common practice, no source)
    m = M.structured("Q4", 6, 1, ((0, 0), (6, 0), (6, 1), (0, 1)))
    f = M.uniform_edge_force(m, "right", (0.0, 1.0))
    with pytest.raises(M.MechanismError):
        A.analyse(m, f, M.fix(m, "left"), "reduced", "plane-stress", 1.0, 0.3)
    with pytest.raises(M.MechanismError):
        A.analyse(m, f, {}, "full", "plane-stress", 1.0, 0.3)


def test_bad_input():
    with pytest.raises(GeometryError):
        M.hand("Q4", [[0, 0], [0, 1], [1, 1], [1, 0]], [[0, 1, 2, 3]])     # clockwise
    with pytest.raises(InputError):
        M.structured("Q4", 0, 2, ((0, 0), (1, 0), (1, 1), (0, 1)))
    with pytest.raises(InputError):
        M.Mesh("Q4", [[0, 0], [1, 0], [1, 1]], [[0, 1, 2, 3]])
    m = M.structured("Q4", 2, 2, ((0, 0), (1, 0), (1, 1), (0, 1)))
    with pytest.raises(InputError):
        m.side("north")
    with pytest.raises(InputError):
        M.fix(m, "left", "w")
    with pytest.raises(InputError):
        m.node_at(0.3, 0.3)


def test_point_evaluation_and_corner_lifting():
    # a linear field is reproduced exactly at any point (completeness, common practice, no source)
    m = M.from_corners("Q9", [[0, 0], [2, 0], [2.5, 1.5], [0.2, 1.0]], [[0, 1, 2, 3]])
    assert m.n_nodes == 9
    # mid-edge and bilinear centre of the given corners (arithmetic by hand)
    assert_allclose(m.nodes[4], [1.0, 0.0], rtol=0, atol=1e-15)
    assert_allclose(m.nodes[8], [1.175, 0.625], rtol=0, atol=1e-15)
    sol = M.Solution(m, "full", "plane-stress", 1.0, 0.3, 1.0,
                     np.column_stack([1 + 2 * m.nodes[:, 0] - m.nodes[:, 1], 3 * m.nodes[:, 1]]).ravel(),
                     np.zeros(18), np.zeros(18))
    u, v = sol.displacement_at(1.3, 0.7)
    assert math.isclose(u, 1 + 2.6 - 0.7, rel_tol=1e-12) and math.isclose(v, 2.1, rel_tol=1e-12)
    with pytest.raises(InputError):
        sol.displacement_at(5.0, 5.0)


def test_provider_prefers_kernel(monkeypatch):
    calls = []

    def fake_kernel(name, variant="full", state="plane-stress", lang="numpy"):
        calls.append(lang)
        el = derive.element(name, variant, state)
        return lambda xy, E, nu, t: el.numeric_stiffness(xy, E, nu, t)

    monkeypatch.setattr(derive, "kernel", fake_kernel, raising=False)
    _, route = M.element_provider("Q4", "full", "plane-stress")
    assert route == "kernel-c" and calls == ["c"]

    def broken(name, variant="full", state="plane-stress", lang="numpy"):
        raise RuntimeError("no compiler")

    monkeypatch.setattr(derive, "kernel", broken, raising=False)
    _, route = M.element_provider("Q4", "full", "plane-stress")
    assert route == "reference"


def test_perf_benchmark_quick():
    res = M.benchmark(quick=True)
    assert res["lines"] and res["unknowns"] == 2 * 33 * 33
    assert all(r["max_rel_difference"] < 1e-10 for r in res["routes"])


def test_nodal_stresses_reproduce_a_linear_field():
    # a quadratic displacement field (pure bending, sigma_x = c y, elementary beam theory) gives
    # linear stresses that the rule-point fit reproduces at every node (common practice, no source)
    E, nu, c = 100.0, 0.3, 5.0
    for name in ("Q9", "Q8", "T6"):
        m = M.structured(name, 3, 2, ((0, 0), (3, 0), (3, 2), (0, 2)))
        x, y = m.nodes[:, 0], m.nodes[:, 1]
        u = np.column_stack([c / E * x * y, -c / E * x ** 2 / 2 - nu * c / E * y ** 2 / 2]).ravel()
        sol = M.Solution(m, "full", "plane-stress", E, nu, 1.0, u, np.zeros_like(u), np.zeros_like(u))
        pos, sig = sol.point_stresses()
        # round-off of the float64 evaluation only, relative to the largest stress c * 2 = 10
        assert_allclose(sig[..., 0], c * pos[..., 1], rtol=0, atol=1e-12 * 10)
        assert_allclose(sig[..., 1:], 0, rtol=0, atol=1e-12 * 10)
        nod = sol.nodal_stresses()
        assert_allclose(nod[:, 0], c * y, rtol=0, atol=1e-11 * 10)
        assert_allclose(nod[:, 1:], 0, rtol=0, atol=1e-11 * 10)


def test_c_kernel_assembly_matches_reference():
    # the generated C kernel (compiled on first use) against the independent textbook routine
    # (tests/fem_reference.py: numpy leggauss quadrature), assembled by hand here
    need("c")                                   # skip with the reason; fail under CI
    prov, route = M.element_provider("Q4", "full", "plane-stress", prefer=("c",))
    assert route == "kernel-c" and getattr(prov, "lang", None) == "c"   # the route that actually ran
    m = M.structured("Q4", 4, 3, ((0, 0), (48, 44), (48, 60), (0, 44)))
    Kc = M.assemble(m, "full", "plane-stress", 1.0, 1 / 3, 1.0, provider=prov).K.toarray()
    Kr = np.zeros_like(Kc)
    for e in m.conn:
        dofs = np.ravel([[2 * n, 2 * n + 1] for n in e])
        Kr[np.ix_(dofs, dofs)] += fr.stiffness("Q4", m.nodes[e], 1.0, 1 / 3, 1.0)
    assert_allclose(Kc, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


def _q9_cylinder(variant, n, nu=0.3):
    # quarter of the thick cylinder (inner 3, outer 9), symmetry rollers, bore pressure
    m = M.structured("Q9", n, n, M.polar(3.0, 9.0))
    f = M.pressure_load(m, "left", 1.0, "plane-strain")
    fixed = {**M.fix(m, "bottom", "v"), **M.fix(m, "top", "u")}
    return A.analyse(m, f, fixed, variant, "plane-strain", 1000.0, nu, 1.0)


def test_mechanism_check_flags_q9_reduced_cylinder():
    # Q9 with the 2x2 rule has 3 spurious element modes (Cook, Malkus & Plesha (1989), textbook
    # fact, from memory); on the coarse quarter cylinder one of them survives the two roller edges
    # and the LU pivots (>= 3e-9 here) do not see it; measured energy ratio to full integration
    # 9e-7 (2 x 2) and 5e-9 (4 x 4) against >= 0.5 for the physical lowest modes
    for n in (2, 4):
        sol = _q9_cylinder("reduced", n)
        assert not sol.reliable
        assert sol.checks["checked"] and sol.checks["spurious_surviving"] >= 1
        assert any("spurious zero-energy element modes" in w for w in sol.warnings)
        assert any("survives the supports" in w for w in sol.warnings)
    for n in (2, 4):
        sol = _q9_cylinder("full", n)
        assert sol.reliable and sol.warnings == [] and sol.checks["checked"]
        assert min(sol.checks["lowest_eigenvalues_over_max_diag"]) > 1e-6


def test_mechanism_check_keeps_good_meshes_clean():
    # full-integration elements have no spurious modes (common practice, no source): the clamped
    # strip and the cylinder must come out unflagged
    for el in ("Q4", "Q8", "Q9"):
        m = M.structured(el, 6, 1, ((0, 0), (6, 0), (6, 0.2), (0, 0.2)))
        f = M.uniform_edge_force(m, "right", (0.0, 1.0), "plane-stress", 0.1)
        sol = A.analyse(m, f, M.fix(m, "left"), "full", "plane-stress", 1e7, 0.3, 0.1)
        assert sol.reliable and sol.warnings == [], el
    assert A.spurious_mode_warning("Q9", "full", "plane-strain") is None
    assert "2 spurious" in A.spurious_mode_warning("Q4", "reduced", "plane-stress")


def test_mechanism_check_isolated_mode_and_size_limit(monkeypatch):
    # a strip on rollers (v = 0) along its bottom edge, held horizontally only by a spring of
    # 1e-13 of the stiffest diagonal: the horizontal translation is one eigenvalue far below
    # all others, a near-mechanism (common practice, no source)
    m = M.structured("Q4", 4, 1, ((0, 0), (4, 0), (4, 1), (0, 1)))
    K = M.assemble(m, "full", "plane-stress", 1.0, 0.3).K.tolil()
    K[0, 0] += 1e-13 * K.diagonal().max()
    K = K.tocsr()
    fixed = M.fix(m, "bottom", "v")
    out = M.mechanism_check(m, K, fixed, "full", "plane-stress", 1.0, 0.3, 1.0, spurious=0)
    assert out["checked"] and out["mechanism"] and "near-mechanism" in out["warnings"][0]
    fixed = M.fix(m, "left", "uv")
    out = M.mechanism_check(m, K, fixed, "full", "plane-stress", 1.0, 0.3, 1.0, spurious=0)
    assert out["checked"] and not out["mechanism"] and out["warnings"] == []
    monkeypatch.setattr(M, "EIG_CHECK_MAX_DOFS", 4)
    out = M.mechanism_check(m, K, fixed, "reduced", "plane-stress", 1.0, 0.3, 1.0, spurious=2)
    assert not out["checked"] and "not run" in out["warnings"][0]
