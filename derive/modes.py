"""Zero-energy modes of an element stiffness: rigid-body and spurious, and whether they spread.

The element stiffness (float64, from the element's own formulation) is decomposed with a
symmetric eigen-solver; eigenvalues below ``tol`` times the largest are zero-energy modes.
The rigid-body modes (plane states: two translations and the rotation; axisymmetric: the
axial translation) are projected out of that null space; what is left are the spurious
modes, returned as an orthonormal basis.

A spurious mode is *communicable* when it survives assembly: a small free-free mesh of the
same element (3 x 3 cells by default) is assembled and the zero eigenvalues of the global
stiffness beyond the rigid-body count are counted.  Any left over can propagate through a
mesh (hourglassing); none means neighbouring elements suppress the element's modes.
"""
from __future__ import annotations

import numpy as np

from . import mesh as M
from .errors import InputError
from .output import fmt
from .kinematics import rigid_body_modes

GEOMETRIES = ("square", "rectangle", "parallelogram", "distorted")

# element corners for each named geometry (quadrilateral / triangle), counter-clockwise
_QUAD_CORNERS = {
    "square": ((-1.0, -1.0), (1.0, -1.0), (1.0, 1.0), (-1.0, 1.0)),
    "rectangle": ((-2.0, -1.0), (2.0, -1.0), (2.0, 1.0), (-2.0, 1.0)),          # aspect ratio a/b = 2
    "parallelogram": ((-1.5, -1.0), (0.5, -1.0), (1.5, 1.0), (-0.5, 1.0)),      # skew 0.5 (c = 0.5, a = b = 1)
    "distorted": ((0.0, 0.0), (2.0, 0.0), (2.4, 1.6), (0.4, 1.2)),              # general convex quadrilateral
}
_TRI_CORNERS = {
    "square": ((0.0, 0.0), (1.0, 0.0), (0.0, 1.0)),
    "rectangle": ((0.0, 0.0), (2.0, 0.0), (0.0, 1.0)),
    "parallelogram": ((0.0, 0.0), (1.0, 0.0), (0.5, 1.0)),
    "distorted": ((0.0, 0.0), (2.0, 0.3), (0.6, 1.5)),
}


def element_nodes(name: str, geometry: str = "square") -> np.ndarray:
    """Nodal coordinates of one element of a named shape (straight edges, mid-side nodes at midpoints)."""
    ref = M.ref_element(name)
    table = _QUAD_CORNERS if ref.domain == "square" else _TRI_CORNERS
    if geometry not in table:
        raise InputError(f"unknown geometry {geometry!r}; allowed: {', '.join(GEOMETRIES)} or --nodes")
    corners = np.array(table[geometry])
    if ref.domain == "square" and geometry == "square":
        return ref.nodes.copy()
    m = M.from_corners(name, corners, [list(range(ref.n_corners))])
    return m.nodes[m.conn[0]]


def _null_space(K: np.ndarray, tol: float):
    w, V = np.linalg.eigh(K)
    big = np.abs(w).max()
    zero = np.abs(w) <= tol * big
    return w, V, zero


def zero_energy_modes(name: str, variant: str = "full", state: str = "plane-stress", nodes=None,
                      geometry: str = "square", E: float = 1.0, nu: float = 0.3, tol: float = 1e-8,
                      mesh_cells: int = 3) -> dict:
    """Eigen-analysis of one element stiffness and the communicability check on a small mesh."""
    from .element import element as make_element
    from .limits import check_tolerance
    tol = check_tolerance(tol, "modes")
    el = make_element(name, variant, state)
    if nodes is None:
        nodes = element_nodes(el.name, geometry)
        if state == "axisymmetric":
            nodes = nodes + np.array([3.0 * np.ptp(nodes[:, 0]), 0.0])  # away from the axis
        geom_label = geometry
    else:
        nodes = np.asarray(nodes, float)
        geom_label = "nodes"
    el.validity(nodes)
    K = np.asarray(el.numeric_stiffness(nodes, E, nu, 1.0))
    K = 0.5 * (K + K.T)
    w, V, zero = _null_space(K, tol)
    Z = V[:, zero]
    R = np.array(rigid_body_modes(list(nodes[:, 0]), list(nodes[:, 1]), state), dtype=float).T
    Qr, _ = np.linalg.qr(R)
    big = np.abs(w).max()
    rigid_ok = [float(np.linalg.norm(K @ q)) <= 1e3 * tol * big for q in Qr.T]
    n_rigid = int(sum(rigid_ok))
    S = Z - Qr @ (Qr.T @ Z)
    if S.shape[1]:
        U, sv, _ = np.linalg.svd(S, full_matrices=False)
        spurious_modes = U[:, sv > 0.5]
    else:
        spurious_modes = np.zeros((K.shape[0], 0))
    n_zero = int(zero.sum())
    result = {"element": el.name, "variant": variant, "state": state, "geometry": geom_label,
              "nodes": nodes.tolist(), "E": E, "nu": nu, "tolerance": tol,
              "eigenvalues": w.tolist(), "zero_energy": n_zero, "rigid": n_rigid,
              "spurious": int(spurious_modes.shape[1]),
              "rigid_modes": Qr.T.tolist(), "spurious_modes": spurious_modes.T.tolist()}
    if state == "axisymmetric":
        result["rigid_expected"] = 1
    else:
        result["rigid_expected"] = 3
    if result["spurious"]:
        mc = mesh_check(el.name, variant, state, E, nu, tol, mesh_cells)
        result["mesh_check"] = mc
        result["communicable"] = mc["spurious"] > 0
    else:
        result["communicable"] = False
    return result


def _mesh_count(name, variant, state, E, nu, tol, nx, ny) -> dict:
    x0 = 4.0 if state == "axisymmetric" else 0.0
    mesh = M.structured(name, nx, ny, ((x0, 0.0), (x0 + 2.0 * nx, 0.0), (x0 + 2.0 * nx, 2.0 * ny), (x0, 2.0 * ny)))
    asm = M.assemble(mesh, variant, state, E, nu, 1.0)
    K = asm.K.toarray()
    K = 0.5 * (K + K.T)
    _, _, zero = _null_space(K, tol)
    rigid = 1 if state == "axisymmetric" else 3
    # the same mesh with its left edge clamped: do the modes survive a support?
    free = np.setdiff1d(np.arange(mesh.ndof), np.fromiter(M.fix(mesh, "left", "uv").keys(), np.int64))
    _, _, zc = _null_space(K[np.ix_(free, free)], tol)
    return {"mesh": f"{nx} x {ny}", "elements": mesh.n_elements, "zero_energy": int(zero.sum()), "rigid": rigid,
            "spurious": int(zero.sum()) - rigid, "spurious_with_clamped_edge": int(zc.sum())}


def mesh_check(name: str, variant: str, state: str = "plane-stress", E: float = 1.0, nu: float = 0.3,
               tol: float = 1e-8, cells: int = 3) -> dict:
    """Zero-energy counts of free-free meshes of square cells (triangles: split): a cells x cells
    block and the two one-element-thick strips (cells x 1, 1 x cells), where a mode that is
    suppressed inside a block may still run along a single row of elements.

    Returns the block's counts, the list of all meshes, and ``spurious`` = the largest
    spurious count found in any of them.
    """
    meshes = [_mesh_count(name, variant, state, E, nu, tol, nx, ny)
              for nx, ny in ((cells, cells), (cells, 1), (1, cells))]
    worst = max(meshes, key=lambda m: m["spurious"])
    return {**meshes[0], "spurious": worst["spurious"], "worst_mesh": worst["mesh"],
            "spurious_with_clamped_edge": max(m["spurious_with_clamped_edge"] for m in meshes), "meshes": meshes}


# ---------------------------------------------------------------------------------------------
# a whole mesh (derive modes ELEMENT --mesh-file FILE)

#: largest number of DOFs of an assembled mesh whose zero-energy modes are computed (dense
#: eigen-solver: 3000 DOFs take about 10 s and 70 MB on the 2-core machine)
MESH_MODES_MAX_DOFS = 3000


def mesh_zero_energy_modes(mesh: M.Mesh, variant: str = "full", state: str = "plane-stress", E: float = 1.0,
                           nu: float = 0.3, tol: float = 1e-8) -> dict:
    """Zero-energy modes of a whole free-free mesh (e.g. a user's mesh file): eigenvalues of the
    assembled stiffness below ``tol`` times the largest, beyond the rigid-body count, are
    spurious global modes (hourglassing that this mesh does not suppress)."""
    if not (0 < tol < 1):
        raise InputError(f"--tol {tol:g}: give a number between 0 and 1 (exclusive), e.g. 1e-8")
    if mesh.ndof > MESH_MODES_MAX_DOFS:
        raise InputError(f"mesh {mesh.label!r} has {mesh.ndof} DOFs; zero-energy modes of an assembled mesh are "
                         f"computed up to {MESH_MODES_MAX_DOFS} DOFs (dense eigen-solver); use a coarser mesh")
    K = M.assemble(mesh, variant, state, E, nu, 1.0).K.toarray()
    K = 0.5 * (K + K.T)
    w, _, zero = _null_space(K, tol)
    rigid = 1 if state == "axisymmetric" else 3
    n_zero = int(zero.sum())
    big = float(np.abs(w).max())
    return {"element": mesh.element, "variant": variant, "state": state, "mesh_file": mesh.label,
            "elements": mesh.n_elements, "nodes": mesh.n_nodes, "dofs": mesh.ndof, "nu": nu, "tolerance": tol,
            "zero_energy": n_zero, "rigid": rigid, "spurious": max(n_zero - rigid, 0),
            "lowest_eigenvalues_over_max": [float(v / big) for v in np.sort(np.abs(w))[:min(len(w), n_zero + 3)]]}


def mesh_summary_lines(result: dict) -> list[str]:
    lines = [f"{result['mesh_file']}: {result['elements']} {result['element']} {result['variant']} elements "
             f"({result['state']}), {result['dofs']} DOFs, free-free: {result['zero_energy']} zero-energy modes, "
             f"{result['rigid']} rigid-body, {result['spurious']} spurious"]
    lines.append("smallest eigenvalues / largest: " + ", ".join(f"{v:.2e}" for v in result["lowest_eigenvalues_over_max"]))
    if result["spurious"]:
        lines.append(f"WARNING: {result['spurious']} spurious mode(s) survive assembly of this mesh: they can be "
                     "excited by the loads (hourglassing); use another variant or suppress them with supports")
    return lines


# ---------------------------------------------------------------------------------------------
# plot

def _outline_lines(name: str, n: int = 24):
    """Reference-space polylines: the element boundary and a few interior iso-lines."""
    ref = M.ref_element(name)
    s = np.linspace(0.0, 1.0, n)
    lines = []
    for A, B, _ in ref.edges:
        lines.append(A[None] + s[:, None] * (B - A)[None])
    if ref.domain == "square":
        for c in (-0.5, 0.0, 0.5):
            g = np.linspace(-1, 1, n)
            lines.append(np.stack([np.full(n, c), g], 1))
            lines.append(np.stack([g, np.full(n, c)], 1))
    else:
        for c in (0.25, 0.5):
            g = np.linspace(0, 1 - c, n)
            lines.append(np.stack([np.full(n, c), g], 1))
            lines.append(np.stack([g, np.full(n, c)], 1))
    return lines


def plot_modes(result: dict, path, dpi: int | None = None) -> str:
    """Write :func:`modes_figure` into an image file (.png, .svg, .pdf)."""
    from . import plotting
    plotting.plot_format(path)
    return str(plotting.save(modes_figure(result), path, plotting.DEFAULT_DPI if dpi is None else dpi))


def modes_figure(result: dict):
    """Deformed shapes of the zero-energy modes (rigid first, then spurious)."""
    from . import plotting
    name = result["element"]
    ref = M.ref_element(name)
    nodes = np.array(result["nodes"])
    modes = [("rigid", np.array(v)) for v in result["rigid_modes"]] + \
            [("spurious", np.array(v)) for v in result["spurious_modes"]]
    n = len(modes)
    cols = min(n, 4)
    rows = (n + cols - 1) // cols
    fig = plotting.figure(3.2 * cols, 3.0 * rows + 0.6,
                          "grey dashed: undeformed element; blue: rigid-body mode; red: spurious mode "
                          "(amplitude scaled to 20 % of the element size)")
    axes = fig.subplots(rows, cols, squeeze=False)
    size = max(np.ptp(nodes[:, 0]), np.ptp(nodes[:, 1]))
    lines = _outline_lines(name)
    for k, (kind, vec) in enumerate(modes):
        ax = axes[k // cols][k % cols]
        U = vec.reshape(-1, 2)
        U = U * (0.2 * size / max(np.abs(U).max(), 1e-300))
        for P in lines:
            N = ref.N(P)
            ax.plot(N @ nodes[:, 0], N @ nodes[:, 1], color="0.75", lw=0.8, ls="--")
            ax.plot(N @ (nodes[:, 0] + U[:, 0]), N @ (nodes[:, 1] + U[:, 1]),
                    color="tab:red" if kind == "spurious" else "tab:blue", lw=1.2)
        ax.plot(nodes[:, 0] + U[:, 0], nodes[:, 1] + U[:, 1], "o", ms=3, color="k")
        ax.set_aspect("equal")
        ax.set_title(f"{kind} mode {k + 1}", fontsize=9)
        ax.axis("off")
    for k in range(n, rows * cols):
        axes[k // cols][k % cols].axis("off")
    comm = " (communicable)" if result.get("communicable") else ""
    fig.suptitle(f"{name} {result['variant']}: {result['zero_energy']} zero-energy modes, "
                 f"{result['rigid']} rigid, {result['spurious']} spurious{comm}", fontsize=10)
    return fig


def summary_lines(result: dict) -> list[str]:
    lines = [f"{result['element']} {result['variant']} ({result['state']}, geometry {result['geometry']}): "
             f"{result['zero_energy']} zero-energy modes: {result['rigid']} rigid-body, {result['spurious']} spurious"]
    nz = sorted(abs(v) for v in result["eigenvalues"])
    big = max(nz)
    lines.append("smallest eigenvalues / largest: " + ", ".join(fmt(v / big, ".2e") for v in nz[:min(len(nz), 8)]))
    if result["spurious"]:
        mc = result["mesh_check"]
        for m in mc["meshes"]:
            lines.append(f"free-free {m['mesh']} mesh: {m['zero_energy']} zero-energy modes, {m['rigid']} rigid, "
                         f"{m['spurious']} spurious ({m['spurious_with_clamped_edge']} with one edge clamped)")
        if result["communicable"]:
            lines.append(f"WARNING: spurious mode(s) are communicable: {mc['spurious']} survive assembly of the "
                         f"{mc['worst_mesh']} mesh and can propagate through a structure (hourglassing)")
        else:
            lines.append("the spurious mode(s) are not communicable: assembly suppresses them")
    return lines
