"""Triangle meshes of derive.mesh have straight edges: the diagonal's mid-side node is at the
diagonal's midpoint (not at the cell centre), and the T6 cantilever agrees with an independent
solve written here from the textbook definitions (tests/fem_reference.py element matrices)."""
from __future__ import annotations

import numpy as np
import pytest

from derive import benchmarks as B
from derive import mesh as M

import fem_reference as fr

# T6 node order: corners 0, 1, 2 then mid-sides of the edges 0-1, 1-2, 2-0 (textbook convention)
T6_EDGES = ((0, 1, 3), (1, 2, 4), (2, 0, 5))


def _trapezoid_corners(refine: int):
    """Corner grid of the trapezoidal cantilever (MacNeal & Harder 1985, from memory): length 6,
    depth 0.2, six coarse cells whose interior lines lean alternately +-45 degrees; each coarse
    cell subdivided refine x refine by its bilinear map.  Written here from the definition."""
    L, h, nx = 6.0, 0.2, 6
    xb = np.arange(nx + 1, dtype=float)
    xt = xb.copy()
    for i in range(1, nx):
        sgn = 1.0 if i % 2 else -1.0
        xb[i] -= sgn * h / 2
        xt[i] += sgn * h / 2
    fx, fy = nx * refine, refine
    X = np.zeros((fx + 1, fy + 1))
    Y = np.zeros((fx + 1, fy + 1))
    for I in range(fx + 1):
        i, r = min(I // refine, nx - 1), I - min(I // refine, nx - 1) * refine
        u = r / refine
        for j in range(fy + 1):
            v = j / fy
            X[I, j] = (1 - v) * ((1 - u) * xb[i] + u * xb[i + 1]) + v * ((1 - u) * xt[i] + u * xt[i + 1])
            Y[I, j] = v * h
    return X, Y


def _independent_t6_cantilever(refine: int) -> float:
    """Mean tip deflection under a unit tip shear, straight-sided T6, solved densely here."""
    X, Y = _trapezoid_corners(refine)
    E, nu, t = 1.0e7, 0.3, 0.1
    nodes: dict[tuple, int] = {}

    def node(p):
        key = (round(p[0], 12), round(p[1], 12))
        return nodes.setdefault(key, len(nodes))

    elems = []
    for i in range(X.shape[0] - 1):
        for j in range(X.shape[1] - 1):
            c00 = np.array([X[i, j], Y[i, j]]); c10 = np.array([X[i + 1, j], Y[i + 1, j]])
            c11 = np.array([X[i + 1, j + 1], Y[i + 1, j + 1]]); c01 = np.array([X[i, j + 1], Y[i, j + 1]])
            for a, b, c in ((c00, c10, c11), (c00, c11, c01)):   # split along the rising diagonal
                pts = [a, b, c, (a + b) / 2, (b + c) / 2, (c + a) / 2]  # straight edges: midpoints
                elems.append([node(p) for p in pts])
    xy = np.array(list(nodes), dtype=float)
    n = len(xy)
    K = np.zeros((2 * n, 2 * n))
    for e in elems:
        ke = fr.stiffness("T6", xy[e], E, nu, t)
        dofs = np.ravel([[2 * k, 2 * k + 1] for k in e])
        K[np.ix_(dofs, dofs)] += ke
    f = np.zeros(2 * n)
    L = 6.0
    tip = [k for k in range(n) if abs(xy[k, 0] - L) < 1e-12]
    # uniform traction on each 3-node straight tip edge: consistent loads 1/6, 2/3, 1/6 of the edge
    # resultant (textbook quadratic-edge lumping, e.g. Zienkiewicz & Taylor, from memory)
    for e in elems:
        for a, b, m in T6_EDGES:
            ids = (e[a], e[b], e[m])
            if all(k in tip for k in ids):
                length = abs(xy[e[b], 1] - xy[e[a], 1])
                share = length / 0.2                     # unit total shear over the depth 0.2
                for k, w in zip(ids, (1 / 6, 1 / 6, 2 / 3)):
                    f[2 * k + 1] += w * share
    fixed = [d for k in range(n) if abs(xy[k, 0]) < 1e-12 for d in (2 * k, 2 * k + 1)]
    free = np.setdiff1d(np.arange(2 * n), fixed)
    u = np.zeros(2 * n)
    u[free] = np.linalg.solve(K[np.ix_(free, free)], f[free])
    return float(np.mean([u[2 * k + 1] for k in tip]))


@pytest.mark.parametrize("refine", [1, 2])
def test_t6_cantilever_mid_side_nodes_at_edge_midpoints(refine):
    mesh = B.cantilever_mesh("T6", "trapezoidal", refine)
    xy = mesh.element_coords()
    for a, b, m in T6_EDGES:
        # straight edges: every mid-side node is the midpoint of its edge (common practice, no source)
        np.testing.assert_allclose(xy[:, m], (xy[:, a] + xy[:, b]) / 2, rtol=0, atol=1e-12)


def test_structured_diagonals_straight_by_default_curved_on_request():
    corners = ((0.0, 0.0), (48.0, 44.0), (48.0, 60.0), (0.0, 44.0))    # a non-parallelogram patch
    straight = M.structured("T6", 3, 3, corners)
    xy = straight.element_coords()
    # lower triangle of a cell: corners (0,0), (1,0), (1,1) of the cell, diagonal = edge 2-0 (node 5);
    # upper: corners (0,0), (1,1), (0,1), diagonal = edge 0-1 (node 3)
    low, up = xy[0::2], xy[1::2]
    np.testing.assert_allclose(low[:, 5], (low[:, 2] + low[:, 0]) / 2, rtol=0, atol=1e-12)  # midpoint, no source
    np.testing.assert_allclose(up[:, 3], (up[:, 0] + up[:, 1]) / 2, rtol=0, atol=1e-12)
    curved = M.structured("T6", 3, 3, corners, curved_diagonals=True).element_coords()
    # on request the diagonal node follows the bilinear map: the cell centre, the mean of the four
    # cell corners (bilinear map at (1/2, 1/2), common practice, no source)
    cl, cu = curved[0::2], curved[1::2]
    centre = (cl[:, 0] + cl[:, 1] + cl[:, 2] + cu[:, 2]) / 4
    np.testing.assert_allclose(cl[:, 5], centre, rtol=0, atol=1e-12)
    assert np.abs(cl[:, 5] - low[:, 5]).max() > 0.1          # and differs from the midpoint here


def test_grid_line_nodes_still_follow_a_curved_mapping():
    # the cylinder's arcs: corner and grid-line mid-side nodes on the circles r = 3 and r = 9
    mesh = M.structured("T6", 2, 4, M.polar(3.0, 9.0))
    r = np.hypot(mesh.nodes[:, 0], mesh.nodes[:, 1])
    for side, radius in (("left", 3.0), ("right", 9.0)):
        np.testing.assert_allclose(r[mesh.side(side)], radius, rtol=1e-12, atol=0)  # geometry, no source


@pytest.mark.parametrize("refine, floor", [(1, 0.95), (2, 0.99)])
def test_t6_trapezoidal_cantilever_matches_independent_solve(refine, floor):
    got = B.run_cantilever("T6", "full", "trapezoidal", "shear", refine)
    ref = _independent_t6_cantilever(refine)
    # independent dense solve with the textbook T6 (tests/fem_reference.py), same mesh definition
    np.testing.assert_allclose(got["value"], ref, rtol=1e-8, atol=0)
    # MacNeal & Harder (1985), from memory: reference tip deflection 0.1081; a straight-sided T6
    # trapezoidal mesh reaches about 0.96 (refine 1) and 0.993 (refine 2) of it
    assert got["normalized"] > floor
