"""Meshes of catalogue elements: generation, sparse assembly, loads, supports, solve, stresses.

What is here
  * :class:`Mesh`: nodal coordinates (N, 2), connectivity (n_elements, nodes per element) in
    the element's own node order (corners counter-clockwise, then mid-side, then interior),
    and, for structured meshes, each node's parametric position (s, t) in [0, 1]^2 so that
    the sides "left" (s = 0), "right" (s = 1), "bottom" (t = 0) and "top" (t = 1) can be
    named.  Built by :func:`structured` (a mapping of the unit square: bilinear patch,
    polar sector or any vectorised callable; mid-side nodes follow the mapping, so they lie
    on curved boundaries), :func:`from_corner_grid` (a grid of corner points with straight
    element edges and mid-side nodes at the edge midpoints), :func:`from_corners` (any
    corner mesh lifted to the element, e.g. a hand-drawn patch) or :func:`hand` (all nodes
    given).  Triangles split every cell of a structured grid along its rising diagonal, a
    straight edge (``curved_diagonals=True`` is the explicit option for a mapped one).
  * :func:`assemble`: global stiffness in ``scipy.sparse`` CSR from a batch of element
    matrices.  The element-matrix provider is a parameter, ``provider(xy, E, nu, t)`` with
    ``xy`` of shape (n, nodes, 2) returning (n, ndof, ndof); by default
    :func:`element_provider` picks the generated C kernel (``derive.kernel(..., lang="c")``)
    when it exists (meshes below :data:`C_MIN_ELEMENTS` elements try the generated NumPy
    kernel first, which needs no compilation) and falls back to the lambdified reference
    ``Element.numeric_stiffness`` otherwise.
  * consistent edge loads (:func:`edge_load`, :func:`uniform_edge_force`,
    :func:`pressure_load`): the traction integrated against the element's own shape
    functions along each loaded edge with a Gauss rule, per unit area times the thickness
    t (plane states) or 2 pi r (axisymmetric, full ring), consistent with the stiffness.
  * supports (:func:`fix`), :func:`solve` (elimination of prescribed DOFs, sparse LU),
    :func:`mechanism_check` (lowest eigenvalues of the supported stiffness: spurious modes
    that survive the supports, near-mechanisms; run by :func:`derive.analysis.analyse`, which
    also warns when the element variant has spurious zero-energy modes),
    stresses at the rule's points (:meth:`Solution.point_stresses`) and averaged at the
    nodes (:meth:`Solution.nodal_stresses`); mesh files (VTU out, a user's mesh in) are
    :mod:`derive.mesh_io`.

Stresses are D times the strain the formulation works with, at the element's full rule
points (or a rule you name): when the formulation declares a recovery operator
(``Formulation.strain(point) -> (S_u, S_a)``) the strain is S_u u + S_a alpha with the
condensed internal unknowns alpha = -K_aa^-1 K_ua^T u recovered element by element
(incompatible modes, enhanced strains, B-bar, hybrid stresses); otherwise it is B u.
"""
from __future__ import annotations

import math
import time
from dataclasses import dataclass, field
from functools import lru_cache
from typing import Callable, Sequence

import numpy as np
import scipy.sparse as sps
import scipy.sparse.linalg as spla
import sympy as sp

from . import catalog, quadrature
from .errors import GeometryError, InputError
from .material import D as D_matrix
from .material import check_material
from .problems import COOK
from .symbols import eta, xi

SIDES = ("left", "right", "bottom", "top")
Provider = Callable[[np.ndarray, float, float, float], np.ndarray]

# keys for de-duplicating nodes: cell-local coordinates are multiples of 1/_KEY (2520 = lcm(1..10))
_KEY = 2520


# ---------------------------------------------------------------------------------------------
# reference element data (numeric)

@dataclass(frozen=True)
class RefElement:
    """Numeric view of a catalogue element's reference shape functions and edges."""

    name: str
    domain: str
    nodes: np.ndarray            # (nn, 2) reference coordinates
    n_corners: int
    edges: tuple                 # per edge: (start (2,), end (2,), node indices ordered along the edge)
    full_rule: str
    _N: Callable = field(repr=False, compare=False)
    _dxi: Callable = field(repr=False, compare=False)
    _deta: Callable = field(repr=False, compare=False)

    @property
    def n_nodes(self) -> int:
        return self.nodes.shape[0]

    def N(self, pts: np.ndarray) -> np.ndarray:
        """Shape functions at reference points (np, 2) -> (np, nn)."""
        pts = np.atleast_2d(np.asarray(pts, dtype=float))
        return _evaluate(self._N, pts, self.n_nodes)

    def dN(self, pts: np.ndarray) -> np.ndarray:
        """Reference derivatives at points (np, 2) -> (np, 2, nn) ([d/dxi, d/deta])."""
        pts = np.atleast_2d(np.asarray(pts, dtype=float))
        return np.stack([_evaluate(self._dxi, pts, self.n_nodes), _evaluate(self._deta, pts, self.n_nodes)], axis=1)


def _evaluate(f, pts, nn):
    vals = f(pts[:, 0], pts[:, 1])
    return np.stack([np.broadcast_to(np.asarray(v, dtype=float), (pts.shape[0],)) for v in vals], axis=1)


@lru_cache(maxsize=None)
def ref_element(name: str) -> RefElement:
    info = catalog.element_info(name)
    sh = catalog.shape_set(info.name)
    nodes = np.array([[float(p), float(q)] for p, q in sh.nodes])
    if info.domain == "square":
        corners = [(-1, -1), (1, -1), (1, 1), (-1, 1)]
    else:
        corners = [(0, 0), (1, 0), (0, 1)]
    nc = len(corners)
    edges = []
    for k in range(nc):
        A, B = sp.Matrix(corners[k]), sp.Matrix(corners[(k + 1) % nc])
        on = []
        for i, (p, q) in enumerate(sh.nodes):
            P = sp.Matrix([p, q])
            d, e = B - A, P - A
            if d[0] * e[1] - d[1] * e[0] == 0:
                s = (e.dot(d)) / d.dot(d)
                if 0 <= s <= 1:
                    on.append((s, i))
        on.sort()
        edges.append((np.array(corners[k], float), np.array(corners[(k + 1) % nc], float),
                      tuple(i for _, i in on)))
    N = sp.lambdify((xi, eta), list(sh.functions), "numpy")
    dxi = sp.lambdify((xi, eta), list(sh.derivatives[0]), "numpy")
    deta = sp.lambdify((xi, eta), list(sh.derivatives[1]), "numpy")
    return RefElement(info.name, info.domain, nodes, nc, tuple(edges), info.full_rule, N, dxi, deta)


def rule_points(name: str) -> tuple[np.ndarray, np.ndarray]:
    """Float points and weights of a named quadrature rule."""
    return quadrature.rule(name).numeric()


# ---------------------------------------------------------------------------------------------
# mesh

@dataclass
class Mesh:
    """Nodes (N, 2), connectivity (n_elements, nodes per element) of one catalogue element.

    ``param`` holds each node's parametric position in the unit square for structured
    meshes (None for hand-specified ones); ``label`` is free text for reports.
    """

    element: str
    nodes: np.ndarray
    conn: np.ndarray
    param: np.ndarray | None = None
    label: str = ""

    def __post_init__(self):
        self.element = catalog.element_info(self.element).name
        self.nodes = np.ascontiguousarray(np.asarray(self.nodes, dtype=float))
        self.conn = np.ascontiguousarray(np.asarray(self.conn, dtype=np.int64))
        ref = ref_element(self.element)
        if self.nodes.ndim != 2 or self.nodes.shape[1] != 2:
            raise InputError(f"mesh nodes must be an (N, 2) array; got shape {self.nodes.shape}")
        if not np.all(np.isfinite(self.nodes)):
            raise InputError("mesh nodes must be finite numbers (found NaN or infinity)")
        if self.conn.ndim != 2 or self.conn.shape[1] != ref.n_nodes:
            raise InputError(f"{self.element} connectivity needs {ref.n_nodes} node numbers per element; "
                             f"got shape {self.conn.shape}")
        if self.conn.size and (self.conn.min() < 0 or self.conn.max() >= len(self.nodes)):
            raise InputError(f"connectivity refers to node {int(self.conn.max())} but the mesh has "
                             f"{len(self.nodes)} nodes (numbered from 0)")
        if self.conn.shape[0] == 0:
            raise InputError("mesh has no elements")

    @property
    def ref(self) -> RefElement:
        return ref_element(self.element)

    @property
    def n_nodes(self) -> int:
        return self.nodes.shape[0]

    @property
    def n_elements(self) -> int:
        return self.conn.shape[0]

    @property
    def ndof(self) -> int:
        return 2 * self.n_nodes

    def element_coords(self) -> np.ndarray:
        """(n_elements, nodes per element, 2) nodal coordinates."""
        return self.nodes[self.conn]

    def element_dofs(self) -> np.ndarray:
        """(n_elements, ndof per element) global DOF numbers, interleaved u, v per node."""
        c = self.conn
        return np.stack([2 * c, 2 * c + 1], axis=2).reshape(c.shape[0], -1)

    def side(self, name: str, tol: float = 1e-9) -> np.ndarray:
        """Boolean node mask of a named side of a structured mesh."""
        if self.param is None:
            raise InputError("named sides exist on structured meshes only; select nodes by coordinates instead")
        s, t = self.param[:, 0], self.param[:, 1]
        masks = {"left": np.abs(s) < tol, "right": np.abs(s - 1) < tol,
                 "bottom": np.abs(t) < tol, "top": np.abs(t - 1) < tol}
        if name not in masks:
            raise InputError(f"unknown side {name!r}; allowed: {', '.join(SIDES)}")
        return masks[name]

    def nodes_where(self, predicate: Callable[[np.ndarray, np.ndarray], np.ndarray]) -> np.ndarray:
        """Boolean node mask from a vectorised predicate of (x, y)."""
        return np.asarray(predicate(self.nodes[:, 0], self.nodes[:, 1]), dtype=bool)

    def nearest(self, x: float, y: float) -> int:
        """Index of the node nearest to (x, y)."""
        return int(np.argmin(np.hypot(self.nodes[:, 0] - x, self.nodes[:, 1] - y)))

    def node_at(self, x: float, y: float, tol: float = 1e-8) -> int:
        """Index of the node at (x, y); InputError if there is none."""
        k = self.nearest(x, y)
        scale = max(np.ptp(self.nodes[:, 0]), np.ptp(self.nodes[:, 1]), 1.0)
        if math.hypot(self.nodes[k, 0] - x, self.nodes[k, 1] - y) > tol * scale:
            raise InputError(f"no mesh node at ({x:g}, {y:g}); nearest is node {k} at "
                             f"({self.nodes[k, 0]:g}, {self.nodes[k, 1]:g})")
        return k

    def check(self, rule: str | None = None) -> dict:
        """det J at the rule points and at the nodes of every element; GeometryError if not positive."""
        ref = self.ref
        rule = rule or ref.full_rule
        pts, _ = rule_points(rule)
        xy = self.element_coords()
        for where, P in (("quadrature point", pts), ("node", ref.nodes)):
            dN = ref.dN(P)
            J = np.einsum("pan,enk->epak", dN, xy)
            det = J[..., 0, 0] * J[..., 1, 1] - J[..., 0, 1] * J[..., 1, 0]
            e, p = np.unravel_index(np.argmin(det), det.shape)
            if det[e, p] <= 0:
                raise GeometryError(f"mesh element {e} ({self.element}): det J = {det[e, p]:.6g} <= 0 at {where} "
                                    f"{p + 1}; check the node order (counter-clockwise) and the distortion")
        return {"elements": self.n_elements, "nodes": self.n_nodes}


#: cell-local corners (u, v) of the two triangles a square cell is split into (rising diagonal)
_TRIANGLE_CORNERS = (((0.0, 0.0), (1.0, 0.0), (1.0, 1.0)), ((0.0, 0.0), (1.0, 1.0), (0.0, 1.0)))


def _lift(element: str):
    """Cell-local (u, v) in [0, 1]^2 of every element node, for a square cell or its two triangles."""
    ref = ref_element(element)
    P = ref.nodes
    if ref.domain == "square":
        return [np.stack([(P[:, 0] + 1) / 2, (P[:, 1] + 1) / 2], axis=1)]
    p, q = P[:, 0], P[:, 1]
    return [np.stack([p + q, q], axis=1), np.stack([p, p + q], axis=1)]


def _affine_nodes(element: str) -> list[np.ndarray]:
    """Per cell piece (the square, or each of the two triangles), the boolean mask of the
    triangle nodes that lie off the cell's grid-line edges (on the diagonal or inside the
    triangle): these are placed by the affine map of the triangle's three corners so the
    diagonal edge is straight."""
    ref = ref_element(element)
    out = []
    for loc in _lift(element):
        if ref.domain == "square":
            out.append(np.zeros(ref.n_nodes, bool))
            continue
        u, v = loc.T
        out.append(~(np.isclose(u, 0) | np.isclose(u, 1) | np.isclose(v, 0) | np.isclose(v, 1)))
    return out


def _generate(element: str, nx: int, ny: int, position, label: str, curved_diagonals: bool = False) -> Mesh:
    """Shared structured generator: ``position(i, j, u, v) -> (x, y)`` for cell (i, j) and local (u, v).

    Nodes on the cell's grid-line edges are placed at ``position``.  Triangle nodes on the
    cell diagonal (and inside the triangle) are placed by the affine map of the triangle's
    corners, so every diagonal is a straight edge with its mid-side node at the midpoint;
    ``curved_diagonals=True`` places them at ``position`` too (the diagonal then follows the
    cell's map and is curved where the map is not affine).
    """
    nx, ny = _count(nx, "nx"), _count(ny, "ny")
    ref = ref_element(element)
    locals_ = _lift(element)
    affine_masks = _affine_nodes(element)
    I, J = np.meshgrid(np.arange(nx), np.arange(ny), indexing="ij")
    I, J = I.ravel(), J.ravel()  # cells, s-major
    all_keys, all_xy, all_param = [], [], []
    for k_tri, loc in enumerate(locals_):
        u = loc[None, :, 0]
        v = loc[None, :, 1]
        ks = I[:, None] * _KEY + np.rint(u * _KEY).astype(np.int64)
        kt = J[:, None] * _KEY + np.rint(v * _KEY).astype(np.int64)
        x, y = position(I[:, None], J[:, None], np.broadcast_to(u, ks.shape), np.broadcast_to(v, ks.shape))
        x = np.array(np.broadcast_to(x, ks.shape), dtype=float)
        y = np.array(np.broadcast_to(y, ks.shape), dtype=float)
        affine = affine_masks[k_tri]
        if affine.any() and not curved_diagonals:
            p, q = ref.nodes[affine, 0], ref.nodes[affine, 1]
            L = (1 - p - q, p, q)  # area coordinates of the nodes in their triangle
            cx = cy = 0.0
            for Lk, (cu, cv) in zip(L, _TRIANGLE_CORNERS[k_tri]):
                px, py = position(I[:, None], J[:, None], np.full((1, 1), cu), np.full((1, 1), cv))
                cx = cx + Lk[None, :] * px
                cy = cy + Lk[None, :] * py
            x[:, affine] = cx
            y[:, affine] = cy
        all_keys.append(kt * (nx * _KEY + 1) + ks)
        all_xy.append(np.stack([x, y], axis=2))
        all_param.append(np.stack([ks / (nx * _KEY), kt / (ny * _KEY)], axis=2))
    # interleave the two triangles of a cell so that element numbering follows the cells
    keys = np.stack(all_keys, axis=1).reshape(-1, ref.n_nodes)
    xy = np.stack(all_xy, axis=1).reshape(-1, ref.n_nodes, 2)
    par = np.stack(all_param, axis=1).reshape(-1, ref.n_nodes, 2)
    _, first, inverse = np.unique(keys.ravel(), return_index=True, return_inverse=True)
    nodes = xy.reshape(-1, 2)[first]
    param = par.reshape(-1, 2)[first]
    conn = inverse.reshape(keys.shape)
    return Mesh(element, nodes, conn, param, label)


def _count(n, what):
    try:
        if isinstance(n, bool):
            raise TypeError
        v = int(n)
        if v != n:
            raise TypeError
    except (TypeError, ValueError):
        raise InputError(f"{what} must be a whole number of elements, got {n!r}") from None
    if v < 1 or v > 4096:
        raise InputError(f"{what} must be between 1 and 4096 elements, got {v}")
    return v


def structured(element: str, nx: int, ny: int, mapping, label: str = "", curved_diagonals: bool = False) -> Mesh:
    """Structured nx x ny mesh of a mapping of the unit square.

    ``mapping(s, t) -> (x, y)`` is vectorised over arrays; every node on the grid lines
    (corner, mid-side of a grid-line edge) and every quadrilateral interior node is placed
    at the mapping of its parametric position, so nodes follow curved boundaries.
    ``mapping`` may also be four corner points (a bilinear quadrilateral, counter-clockwise
    from the corner at s = t = 0).  Triangles: the cell diagonal is a straight edge (its
    nodes at the affine map of the triangle's corners) unless ``curved_diagonals=True``.
    """
    if not callable(mapping):
        mapping = bilinear(mapping)

    def position(i, j, u, v):
        return mapping((i + u) / nx, (j + v) / ny)

    return _generate(element, nx, ny, position, label, curved_diagonals)


def from_corner_grid(element: str, X: np.ndarray, Y: np.ndarray, label: str = "",
                     curved_diagonals: bool = False) -> Mesh:
    """Mesh from a grid of element corners X[i, j], Y[i, j] (shape (nx+1, ny+1)).

    Element edges are straight: mid-side nodes at the edge midpoints (the triangles'
    diagonals included), quadrilateral interior nodes at the bilinear map of the cell's
    four corners.  ``curved_diagonals=True`` (an explicit choice, never the default)
    places the triangles' diagonal nodes by the cell's bilinear map instead, which curves
    the diagonal of a non-parallelogram cell.
    """
    X, Y = np.asarray(X, float), np.asarray(Y, float)
    if X.shape != Y.shape or X.ndim != 2 or min(X.shape) < 2:
        raise InputError(f"corner grids X, Y must have the same (nx+1, ny+1) shape with nx, ny >= 1; "
                         f"got {X.shape} and {Y.shape}")
    nx, ny = X.shape[0] - 1, X.shape[1] - 1

    def position(i, j, u, v):
        w00, w10, w11, w01 = (1 - u) * (1 - v), u * (1 - v), u * v, (1 - u) * v
        x = w00 * X[i, j] + w10 * X[i + 1, j] + w11 * X[i + 1, j + 1] + w01 * X[i, j + 1]
        y = w00 * Y[i, j] + w10 * Y[i + 1, j] + w11 * Y[i + 1, j + 1] + w01 * Y[i, j + 1]
        return x, y

    return _generate(element, nx, ny, position, label, curved_diagonals)


def from_corners(element: str, corner_nodes, corner_conn, label: str = "") -> Mesh:
    """Lift a corner mesh (Q4-like quadrilaterals or T3-like triangles) to ``element``.

    Each element's extra nodes are placed by the linear (triangle) or bilinear
    (quadrilateral) map of its corners: straight edges, mid-side nodes at the midpoints;
    coincident nodes of neighbouring elements are merged.
    """
    ref = ref_element(element)
    cn = np.asarray(corner_nodes, float)
    cc = np.asarray(corner_conn, np.int64)
    if cc.ndim != 2 or cc.shape[1] != ref.n_corners:
        raise InputError(f"{element} needs {ref.n_corners} corner numbers per element; got shape {cc.shape}")
    if cn.ndim != 2 or cn.shape[1] != 2:
        raise InputError(f"corner nodes must be an (N, 2) array; got shape {cn.shape}")
    if cc.min() < 0 or cc.max() >= len(cn):
        raise InputError(f"corner connectivity refers to node {int(cc.max())} but there are {len(cn)} nodes")
    C = cn[cc]  # (ne, nc, 2)
    P = ref.nodes
    if ref.domain == "square":
        p, q = P[:, 0], P[:, 1]
        W = np.stack([(1 - p) * (1 - q), (1 + p) * (1 - q), (1 + p) * (1 + q), (1 - p) * (1 + q)], axis=1) / 4
    else:
        p, q = P[:, 0], P[:, 1]
        W = np.stack([1 - p - q, p, q], axis=1)
    xy = np.einsum("nc,eck->enk", W, C)  # (ne, nn, 2)
    scale = max(np.ptp(cn[:, 0]), np.ptp(cn[:, 1]), 1e-300)
    keys = np.rint(xy.reshape(-1, 2) / scale * 1e9).astype(np.int64)
    # keep corner numbering first (as given), then the new nodes
    _, first, inverse = np.unique(keys, axis=0, return_index=True, return_inverse=True)
    inverse = inverse.ravel()
    order = np.argsort(first, kind="stable")
    rank = np.empty_like(order)
    rank[order] = np.arange(len(order))
    nodes = xy.reshape(-1, 2)[first[order]]
    conn = rank[inverse].reshape(xy.shape[0], ref.n_nodes)
    # renumber so the given corner nodes keep their numbers
    corner_of = {}
    for e in range(cc.shape[0]):
        for k in range(ref.n_corners):
            corner_of[int(conn[e, k])] = int(cc[e, k])
    n_c = len(cn)
    new = np.full(len(nodes), -1, np.int64)
    for m, c0 in corner_of.items():
        new[m] = c0
    rest = np.where(new < 0)[0]
    new[rest] = n_c + np.arange(len(rest))
    out_nodes = np.empty((n_c + len(rest), 2))
    out_nodes[:n_c] = cn
    out_nodes[new[rest]] = nodes[rest]
    return Mesh(element, out_nodes, new[conn], None, label)


def hand(element: str, nodes, conn, label: str = "") -> Mesh:
    """A hand-specified mesh (all nodes of every element given), checked for valid geometry."""
    m = Mesh(element, nodes, conn, None, label)
    m.check()
    return m


def bilinear(corners) -> Callable:
    """Mapping of the unit square onto a quadrilateral with corners c0 (s=t=0), c1 (s=1), c2, c3 (t=1)."""
    c = np.asarray(corners, float)
    if c.shape != (4, 2):
        raise InputError(f"a bilinear patch needs 4 corner points; got shape {c.shape}")

    def f(s, t):
        w = ((1 - s) * (1 - t), s * (1 - t), s * t, (1 - s) * t)
        return (sum(wk * c[k, 0] for k, wk in enumerate(w)), sum(wk * c[k, 1] for k, wk in enumerate(w)))

    return f


def polar(r_inner: float, r_outer: float, theta0: float = 0.0, theta1: float = math.pi / 2,
          grading: float = 1.0) -> Callable:
    """Mapping of the unit square onto an annular sector: s radial (inner -> outer), t angular.

    ``grading`` > 1 concentrates elements towards the inner radius (geometric spacing of s).
    """
    if not 0 < r_inner < r_outer:
        raise InputError(f"annulus radii must satisfy 0 < inner < outer; got {r_inner}, {r_outer}")

    def f(s, t):
        ss = s if grading == 1.0 else (grading ** s - 1) / (grading - 1)
        r = r_inner + (r_outer - r_inner) * ss
        th = theta0 + (theta1 - theta0) * t
        return r * np.cos(th), r * np.sin(th)

    return f


# ---------------------------------------------------------------------------------------------
# element matrices

#: generated-kernel languages tried, in order, by the default element-matrix provider
DEFAULT_LANGS: tuple[str, ...] = ("c", "numpy")
#: below this many elements :func:`assemble` tries the NumPy kernel first: a C kernel compiles
#: on first use (seconds for a quadratic element in a fresh cache), more than such a mesh costs
C_MIN_ELEMENTS = 2000


def element_provider(element: str, variant: str = "full", state: str = "plane-stress",
                     prefer: Sequence[str] | None = None) -> tuple[Provider, str]:
    """Element-matrix provider for a mesh, and a label saying which route it is.

    Tries the generated kernels ``derive.kernel(element, variant, state, lang)`` in the
    order of ``prefer`` (default :data:`DEFAULT_LANGS`: C, then NumPy); falls back to the
    lambdified reference ``numeric_stiffness``.
    """
    from .element import element as make_element
    el = make_element(element, variant, state)  # validates names
    kernel = _kernel_factory()
    if kernel is not None:
        for lang in (DEFAULT_LANGS if prefer is None else prefer):
            try:
                k = kernel(el.name, variant, state, lang=lang)
            except Exception:  # a kernel that is not generated / not compilable here: try the next route
                continue
            return k, f"kernel-{lang}"

    def reference(xy, E, nu, t):
        return el.numeric_stiffness(xy, E, nu, t)

    return reference, "reference"


def _kernel_factory():
    """``derive.kernel`` (the public contract), or the code generator's own entry point, or None."""
    import derive
    k = getattr(derive, "kernel", None)
    if k is not None:
        return k
    try:
        from .codegen import kernel as k
    except ImportError:
        return None
    return k


def gauss_provider(element: str, state: str = "plane-stress", rule: str | None = None) -> Provider:
    """Plain displacement stiffness int B^T D B thick dA by Gauss quadrature in numpy.

    Written only from the textbook definition (shape-function derivatives, Jacobian,
    B, D, weights); an independent route for plain displacement elements and the NumPy
    baseline of the mesh benchmark.
    """
    ref = ref_element(element)
    pts, wts = rule_points(rule or ref.full_rule)

    def k(xy, E, nu, t=1.0):
        xy = np.asarray(xy, float)
        single = xy.ndim == 2
        if single:
            xy = xy[None]
        B, detJ, r = b_matrices(element, state, xy, pts)
        Dm = _D(state, E, nu)
        thick = 2 * np.pi * r if state == "axisymmetric" else np.full_like(detJ, t)
        w = wts[None, :] * detJ * thick
        DB = np.matmul(Dm, B) * w[..., None, None]            # (ne, np, nstrain, ndof)
        K = np.matmul(np.swapaxes(B, 2, 3), DB).sum(axis=1)
        return K[0] if single else K

    return k


@lru_cache(maxsize=64)
def _D_cached(state: str, E: float, nu: float) -> np.ndarray:
    return np.array(D_matrix(state, sp.Float(E, 17), nu).evalf(17).tolist(), dtype=float)


def _D(state: str, E: float, nu: float) -> np.ndarray:
    check_material(state, E, nu)
    return _D_cached(state, float(E), float(nu))


def b_matrices(element: str, state: str, xy: np.ndarray, pts: np.ndarray):
    """B at reference points for a batch: returns B (ne, np, nstrain, ndof), det J (ne, np), radius (ne, np)."""
    ref = ref_element(element)
    N = ref.N(pts)                       # (np, nn)
    dN = ref.dN(pts)                     # (np, 2, nn)
    J = np.einsum("pan,enk->epak", dN, xy)   # J[a, k] = d x_k / d ref_a
    det = J[..., 0, 0] * J[..., 1, 1] - J[..., 0, 1] * J[..., 1, 0]
    inv = np.empty_like(J)
    inv[..., 0, 0] = J[..., 1, 1] / det
    inv[..., 0, 1] = -J[..., 0, 1] / det
    inv[..., 1, 0] = -J[..., 1, 0] / det
    inv[..., 1, 1] = J[..., 0, 0] / det
    dNx = np.einsum("epka,pan->epkn", inv, dN)  # (ne, np, 2, nn): [d/dx, d/dy]
    ne, npt, nn = xy.shape[0], pts.shape[0], ref.n_nodes
    r = np.einsum("pn,en->ep", N, xy[..., 0])
    if state == "axisymmetric":
        B = np.zeros((ne, npt, 4, 2 * nn))
        B[:, :, 0, 0::2] = dNx[:, :, 0]
        B[:, :, 1, 1::2] = dNx[:, :, 1]
        B[:, :, 2, 0::2] = N[None] / r[..., None]
        B[:, :, 3, 0::2] = dNx[:, :, 1]
        B[:, :, 3, 1::2] = dNx[:, :, 0]
    else:
        B = np.zeros((ne, npt, 3, 2 * nn))
        B[:, :, 0, 0::2] = dNx[:, :, 0]
        B[:, :, 1, 1::2] = dNx[:, :, 1]
        B[:, :, 2, 0::2] = dNx[:, :, 1]
        B[:, :, 2, 1::2] = dNx[:, :, 0]
    return B, det, r


# ---------------------------------------------------------------------------------------------
# assembly

@dataclass
class Assembly:
    K: sps.csr_matrix
    route: str
    element_seconds: float
    scatter_seconds: float


def assemble(mesh: Mesh, variant: str = "full", state: str = "plane-stress", E: float = 1.0, nu: float = 0.3,
             t: float = 1.0, provider: Provider | None = None, chunk: int = 32768) -> Assembly:
    """Global stiffness (CSR, ndof x ndof) of the mesh; element matrices from ``provider``."""
    check_material(state, E, nu)
    if not (isinstance(t, (int, float)) and math.isfinite(t) and t > 0):
        raise InputError(f"thickness t = {t} is not allowed; t must be a finite number > 0")
    route = "given"
    if provider is None:
        prefer = DEFAULT_LANGS if mesh.n_elements >= C_MIN_ELEMENTS else \
            tuple(dict.fromkeys(("numpy",) + tuple(DEFAULT_LANGS)))
        provider, route = element_provider(mesh.element, variant, state, prefer)
    xy = mesh.element_coords()
    ne = mesh.n_elements
    t0 = time.perf_counter()
    parts = [np.asarray(provider(xy[i:i + chunk], E, nu, t), dtype=float) for i in range(0, ne, chunk)]
    Ke = parts[0] if len(parts) == 1 else np.concatenate(parts)
    t1 = time.perf_counter()
    nd = Ke.shape[1]
    dofs = mesh.element_dofs()
    if Ke.shape != (ne, dofs.shape[1], dofs.shape[1]):
        raise InputError(f"element-matrix provider returned shape {Ke.shape}; expected {(ne, nd, nd)}")
    rows = np.repeat(dofs, nd, axis=1).ravel()
    cols = np.tile(dofs, (1, nd)).ravel()
    K = sps.csr_matrix((Ke.ravel(), (rows, cols)), shape=(mesh.ndof, mesh.ndof))
    K.sum_duplicates()
    t2 = time.perf_counter()
    return Assembly(K, route, t1 - t0, t2 - t1)


# ---------------------------------------------------------------------------------------------
# loads

def _gauss_1d(n: int):
    x, w = np.polynomial.legendre.leggauss(n)
    return x, w


def loaded_edges(mesh: Mesh, mask: np.ndarray) -> list[tuple[int, int]]:
    """(element, edge) pairs whose nodes all lie in the node mask."""
    ref = mesh.ref
    mask = np.asarray(mask, bool)
    out = []
    for k, (_, _, idx) in enumerate(ref.edges):
        on = np.all(mask[mesh.conn[:, list(idx)]], axis=1)
        out += [(int(e), k) for e in np.nonzero(on)[0]]
    return out


def _resolve_mask(mesh: Mesh, where) -> np.ndarray:
    if isinstance(where, str):
        return mesh.side(where)
    if callable(where):
        return mesh.nodes_where(where)
    m = np.asarray(where)
    if m.dtype == bool:
        if m.shape != (mesh.n_nodes,):
            raise InputError(f"node mask must have one entry per node ({mesh.n_nodes}); got {m.shape}")
        return m
    mask = np.zeros(mesh.n_nodes, bool)
    mask[m.astype(np.int64)] = True
    return mask


def edge_load(mesh: Mesh, where, traction, state: str = "plane-stress", t: float = 1.0,
              n_gauss: int | None = None) -> np.ndarray:
    """Consistent nodal forces of a traction (force per unit area) on the edges in ``where``.

    ``traction`` is a pair (tx, ty) or a vectorised callable ``(x, y, nx, ny) -> (tx, ty)``
    (n = outward unit normal of the edge); forces are int N_i traction thick ds, thick = t
    (plane states) or 2 pi r (axisymmetric).
    """
    ref = mesh.ref
    mask = _resolve_mask(mesh, where)
    edges = loaded_edges(mesh, mask)
    if not edges:
        raise InputError("no element edge lies entirely on the loaded boundary; check the side or node selection")
    ng = n_gauss or (max(len(ref.edges[0][2]), 2) + 1)
    gx, gw = _gauss_1d(ng)
    f = np.zeros(mesh.ndof)
    by_edge: dict[int, list[int]] = {}
    for e, k in edges:
        by_edge.setdefault(k, []).append(e)
    for k, elems in by_edge.items():
        A, Bp, _ = ref.edges[k]
        s01 = (gx + 1) / 2
        P = A[None] + s01[:, None] * (Bp - A)[None]              # reference points on the edge
        dref = (Bp - A) / 2                                      # d(ref)/d(gauss coordinate)
        N = ref.N(P)                                             # (ng, nn)
        dN = ref.dN(P)                                           # (ng, 2, nn)
        xy = mesh.nodes[mesh.conn[elems]]                        # (m, nn, 2)
        pos = np.einsum("gn,enk->egk", N, xy)
        J = np.einsum("gan,enk->egak", dN, xy)                   # d x_k / d ref_a
        tang = np.einsum("a,egak->egk", dref, J)                 # dx/dgauss
        ds = np.linalg.norm(tang, axis=2)
        normal = np.stack([tang[..., 1], -tang[..., 0]], axis=2) / ds[..., None]  # outward for CCW elements
        if callable(traction):
            tx, ty = traction(pos[..., 0], pos[..., 1], normal[..., 0], normal[..., 1])
        else:
            tx, ty = traction
        tr = np.stack([np.broadcast_to(tx, ds.shape), np.broadcast_to(ty, ds.shape)], axis=2)
        thick = 2 * np.pi * pos[..., 0] if state == "axisymmetric" else t
        w = gw[None] * ds * thick
        fe = np.einsum("eg,gn,egk->enk", w, N, tr)              # (m, nn, 2)
        dofs = mesh.element_dofs()[elems].reshape(len(elems), -1, 2)
        np.add.at(f, dofs.ravel(), fe.ravel())
    return f


def edge_length(mesh: Mesh, where) -> float:
    """Length of the boundary in ``where`` measured along the element edges."""
    f = edge_load(mesh, where, (1.0, 0.0), "plane-stress", 1.0)
    return float(f[0::2].sum())


def uniform_edge_force(mesh: Mesh, where, total: tuple[float, float], state: str = "plane-stress",
                       t: float = 1.0) -> np.ndarray:
    """A uniform traction on the edges in ``where`` whose resultant is ``total`` (Fx, Fy)."""
    if state == "axisymmetric":
        raise InputError("uniform_edge_force is for plane states; give a traction with edge_load instead")
    L = edge_length(mesh, where)
    return edge_load(mesh, where, (total[0] / (L * t), total[1] / (L * t)), state, t)


def pressure_load(mesh: Mesh, where, p: float, state: str = "plane-stress", t: float = 1.0) -> np.ndarray:
    """A pressure p (positive pushes into the body) on the edges in ``where``."""
    return edge_load(mesh, where, lambda x, y, nx, ny: (-p * nx, -p * ny), state, t)


# ---------------------------------------------------------------------------------------------
# supports and solve

class MechanismError(InputError):
    """The supported stiffness is singular: a zero-energy mode that spreads through the mesh, or
    supports that leave a rigid-body motion free."""


def fix(mesh: Mesh, where, components: str = "uv", value=0.0) -> dict[int, float]:
    """Prescribed DOFs for the nodes in ``where``: components "u", "v" or "uv"; value a number
    or a callable (x, y) -> (u, v)."""
    mask = _resolve_mask(mesh, where)
    if not mask.any():
        raise InputError("support selection contains no node")
    if not components or set(components) - set("uv"):
        raise InputError(f"support components must be 'u', 'v' or 'uv'; got {components!r}")
    idx = np.nonzero(mask)[0]
    out: dict[int, float] = {}
    if callable(value):
        uu, vv = value(mesh.nodes[idx, 0], mesh.nodes[idx, 1])
        uu, vv = np.broadcast_to(uu, idx.shape), np.broadcast_to(vv, idx.shape)
    else:
        uu = vv = np.full(idx.shape, float(value))
    for k, n in enumerate(idx):
        if "u" in components:
            out[2 * int(n)] = float(uu[k])
        if "v" in components:
            out[2 * int(n) + 1] = float(vv[k])
    return out


def solve(K: sps.spmatrix, f: np.ndarray, fixed: dict[int, float],
          diagnostics: dict | None = None) -> tuple[np.ndarray, np.ndarray, float]:
    """Solve K u = f with prescribed DOFs; returns (u, reactions, seconds).

    Sparse LU (SuperLU, minimum-degree ordering on A^T + A).  A pivot smaller than 1e-12
    of the largest means the supported stiffness is singular (a mechanism: a zero-energy
    mode or missing supports) and raises :class:`MechanismError`; between 1e-12 and 1e-8
    the system is nearly singular and a warning is put into ``diagnostics["warnings"]``.
    """
    n = K.shape[0]
    u = np.zeros(n)
    if fixed:
        cdofs = np.fromiter(fixed.keys(), np.int64)
        u[cdofs] = np.fromiter(fixed.values(), float)
    else:
        cdofs = np.zeros(0, np.int64)
    free = np.ones(n, bool)
    free[cdofs] = False
    fd = np.nonzero(free)[0]
    t0 = time.perf_counter()
    K = K.tocsr()
    rhs = f[fd] - (K[fd][:, cdofs] @ u[cdofs] if len(cdofs) else 0.0)
    Kff = K[fd][:, fd].tocsc()
    try:
        lu = spla.splu(Kff, permc_spec="MMD_AT_PLUS_A")
    except RuntimeError as exc:
        raise MechanismError(f"the stiffness matrix is singular with these supports ({exc}): a mechanism "
                             "(zero-energy mode) or too few supports") from None
    piv = np.abs(lu.U.diagonal())
    ratio = float(piv.min() / piv.max()) if piv.size else 1.0
    if ratio < 1e-12:
        raise MechanismError(f"the stiffness matrix is singular with these supports (smallest pivot {ratio:.1e} of "
                             "the largest): a mechanism (zero-energy mode) or too few supports")
    uf = lu.solve(rhs)
    if not np.all(np.isfinite(uf)):
        raise MechanismError("the solve produced non-finite displacements: a mechanism or too few supports")
    u[fd] = uf
    seconds = time.perf_counter() - t0
    reactions = K @ u - f
    reactions[fd] = 0.0
    if diagnostics is not None:
        diagnostics["min_pivot_ratio"] = ratio
        diagnostics.setdefault("warnings", [])
        if ratio < 1e-8:
            diagnostics["warnings"].append(f"nearly singular stiffness (smallest pivot {ratio:.1e} of the largest): "
                                           "a weakly restrained zero-energy mode may pollute the result")
        diagnostics["_lu"] = lu
    return u, reactions, seconds


# ---------------------------------------------------------------------------------------------
# solution and stresses

@dataclass
class Solution:
    mesh: Mesh
    variant: str
    state: str
    E: float
    nu: float
    t: float
    u: np.ndarray
    reactions: np.ndarray
    f: np.ndarray
    route: str = ""
    timings: dict = field(default_factory=dict)
    warnings: list = field(default_factory=list)
    reliable: bool = True          # False when mechanism_check found a (near-)mechanism
    checks: dict = field(default_factory=dict)

    def displacement(self, node: int) -> tuple[float, float]:
        return float(self.u[2 * node]), float(self.u[2 * node + 1])

    @property
    def U(self) -> np.ndarray:
        """(N, 2) nodal displacements."""
        return self.u.reshape(-1, 2)

    def displacement_at(self, x: float, y: float) -> tuple[float, float]:
        """Displacement at a point of the mesh, interpolated with the element's shape functions."""
        e, ref_pt = locate(self.mesh, x, y)
        N = self.mesh.ref.N(ref_pt[None])[0]
        ue = self.U[self.mesh.conn[e]]
        return float(N @ ue[:, 0]), float(N @ ue[:, 1])

    def point_stresses(self, rule: str | None = None) -> tuple[np.ndarray, np.ndarray]:
        """Stresses at the rule's points: returns (positions (ne, np, 2), stresses (ne, np, nstress)).

        D times the strain the formulation works with: its recovery operator
        S_u u + S_a alpha when it declares one (alpha: the condensed internal unknowns,
        recovered element by element), the compatible B u otherwise.
        """
        ref = self.mesh.ref
        rule = rule or ref.full_rule
        pts, _ = rule_points(rule)
        xy = self.mesh.element_coords()
        ue = self.u[self.mesh.element_dofs()]
        strain = formulation_strains(self.mesh.element, self.variant, self.state, xy, ue, self.E, self.nu, self.t,
                                     rule)
        if strain is None:
            B, _, _ = b_matrices(self.mesh.element, self.state, xy, pts)
            strain = np.einsum("epkd,ed->epk", B, ue)
        sig = np.einsum("kl,epl->epk", _D(self.state, self.E, self.nu), strain)
        pos = np.einsum("pn,enk->epk", ref.N(pts), xy)
        return pos, sig

    def nodal_stresses(self, rule: str | None = None) -> np.ndarray:
        """Stresses extrapolated from the rule points to each element's nodes, averaged over the
        elements meeting at a node: (N, nstress).

        The extrapolation fits the rule-point values with the element's shape functions when
        the rule has at least as many points as nodes, with the corner (linear / bilinear)
        functions when it has at least as many as corners, and with a constant otherwise.
        """
        ref = self.mesh.ref
        pts, _ = rule_points(rule or ref.full_rule)
        _, sig = self.point_stresses(rule)
        E = _extrapolation(ref, pts)                           # (nn, np)
        at_nodes = np.einsum("np,epk->enk", E, sig)
        ns = sig.shape[2]
        acc = np.zeros((self.mesh.n_nodes, ns))
        cnt = np.zeros(self.mesh.n_nodes)
        np.add.at(acc, self.mesh.conn.ravel(), at_nodes.reshape(-1, ns))
        np.add.at(cnt, self.mesh.conn.ravel(), 1.0)
        return acc / cnt[:, None]


@lru_cache(maxsize=None)
def _strain_plan(name: str, variant: str, state: str, rule: str):
    """Lambdified recovery operators (S_u, S_a) of a formulation at a rule's points, or None."""
    from .element import element as make_element
    from .formulations.base import Point
    from .symbols import E as E_s, nu as nu_s, t as t_s
    el = make_element(name, variant, state)
    hook = getattr(el.formulation, "strain", None)
    if hook is None:
        return None
    imap = el.map("general")
    args = list(imap.geometry.xs) + list(imap.geometry.ys) + [E_s, nu_s, t_s]
    funcs = []
    for (px, py) in quadrature.rule(rule).points:
        pt = Point(imap, state, sp.Float(px.evalf(30), 30), sp.Float(py.evalf(30), 30))
        Su, Sa = hook(pt)
        flat = list(Su) + (list(Sa) if Sa is not None else [])
        funcs.append((sp.lambdify(args, flat, "numpy", cse=True), Su.shape, None if Sa is None else Sa.shape))
    return funcs


def internal_unknowns(name: str, variant: str, state: str, xy: np.ndarray, ue: np.ndarray, E: float, nu: float,
                      t: float) -> np.ndarray | None:
    """Condensed internal unknowns alpha = -K_aa^-1 K_ua^T u of each element (None without any)."""
    from .stiffness import _numeric_plan
    ndof, n_int, plan = _numeric_plan((name, variant, state))
    if not n_int:
        return None
    n = xy.shape[0]
    args = [xy[:, i, 0] for i in range(xy.shape[1])] + [xy[:, i, 1] for i in range(xy.shape[1])] + [E, nu, t]
    blocks: dict[str, np.ndarray] = {}
    for block, funcs, weights in plan:
        if block == "uu":
            continue
        for (f, ls, ms, rs), w in zip(funcs, weights):
            vals = [np.broadcast_to(np.asarray(v, dtype=float), (n,)) for v in f(*args)]
            k1, k2, k3 = ls[0] * ls[1], ms[0] * ms[1], rs[0] * rs[1]
            L = np.stack(vals[:k1], axis=1).reshape(n, *ls)
            Mm = np.stack(vals[k1:k1 + k2], axis=1).reshape(n, *ms)
            Rm = np.stack(vals[k1 + k2:k1 + k2 + k3], axis=1).reshape(n, *rs)
            contrib = np.einsum("nki,nkl,nlj->nij", L, Mm, Rm) * (w * vals[-1])[:, None, None]
            blocks[block] = blocks[block] + contrib if block in blocks else contrib
    Kua, Kaa = blocks["ua"], blocks["aa"]
    rhs = np.einsum("nda,nd->na", Kua, ue)
    return -np.linalg.solve(Kaa, rhs[..., None])[..., 0]


def formulation_strains(name: str, variant: str, state: str, xy: np.ndarray, ue: np.ndarray, E: float, nu: float,
                        t: float, rule: str) -> np.ndarray | None:
    """Strains S_u u + S_a alpha at the rule's points (ne, np, nstrain) from the formulation's
    recovery operator, or None when the formulation declares none (then B u applies)."""
    plan = _strain_plan(name, variant, state, rule)
    if plan is None:
        return None
    alpha = internal_unknowns(name, variant, state, xy, ue, E, nu, t)
    n = xy.shape[0]
    args = [xy[:, i, 0] for i in range(xy.shape[1])] + [xy[:, i, 1] for i in range(xy.shape[1])] + [E, nu, t]
    out = []
    for f, su, sa in plan:
        vals = [np.broadcast_to(np.asarray(v, dtype=float), (n,)) for v in f(*args)]
        k1 = su[0] * su[1]
        Su = np.stack(vals[:k1], axis=1).reshape(n, *su)
        eps = np.einsum("nkd,nd->nk", Su, ue)
        if sa is not None and alpha is not None:
            Sa = np.stack(vals[k1:k1 + sa[0] * sa[1]], axis=1).reshape(n, *sa)
            eps = eps + np.einsum("nka,na->nk", Sa, alpha)
        out.append(eps)
    return np.stack(out, axis=1)


def locate(mesh: Mesh, x: float, y: float, tol: float = 1e-9) -> tuple[int, np.ndarray]:
    """Element containing (x, y) and the reference coordinates of the point in it (Newton on the map)."""
    xy = mesh.element_coords()
    lo, hi = xy.min(axis=1), xy.max(axis=1)
    span = max(np.ptp(mesh.nodes[:, 0]), np.ptp(mesh.nodes[:, 1]), 1e-300)
    pad = 1e-6 * span
    cand = np.nonzero((lo[:, 0] - pad <= x) & (x <= hi[:, 0] + pad) & (lo[:, 1] - pad <= y) & (y <= hi[:, 1] + pad))[0]
    ref = mesh.ref
    start = np.array([0.0, 0.0]) if ref.domain == "square" else np.array([1 / 3, 1 / 3])
    target = np.array([x, y])
    for e in cand:
        P = start.copy()
        for _ in range(30):
            N = ref.N(P[None])[0]
            dN = ref.dN(P[None])[0]
            pos = N @ xy[e]
            J = dN @ xy[e]                   # rows d/dxi, d/deta; columns x, y
            step = np.linalg.solve(J.T, target - pos)
            P = P + step
            if np.abs(step).max() < 1e-13:
                break
        inside = (np.all(np.abs(P) <= 1 + tol) if ref.domain == "square"
                  else (P.min() >= -tol and P.sum() <= 1 + tol))
        if inside and np.linalg.norm(ref.N(P[None])[0] @ xy[e] - target) <= 1e-9 * span:
            return int(e), P
    raise InputError(f"point ({x:g}, {y:g}) is not inside the mesh")


def _extrapolation(ref: RefElement, pts: np.ndarray) -> np.ndarray:
    npt = pts.shape[0]
    if npt >= ref.n_nodes:
        A = ref.N(pts)                                  # (np, nn)
        return np.linalg.lstsq(A, np.eye(npt), rcond=None)[0]   # (nn, np): least-squares fit
    if npt >= ref.n_corners:
        def corner_funcs(P):
            p, q = P[:, 0], P[:, 1]
            if ref.domain == "square":
                return np.stack([(1 - p) * (1 - q), (1 + p) * (1 - q), (1 + p) * (1 + q), (1 - p) * (1 + q)], 1) / 4
            return np.stack([1 - p - q, p, q], 1)
        coeff = np.linalg.lstsq(corner_funcs(pts), np.eye(npt), rcond=None)[0]   # (nc, np)
        return corner_funcs(ref.nodes) @ coeff                                    # (nn, np)
    return np.full((ref.n_nodes, npt), 1.0 / npt)


# ---------------------------------------------------------------------------------------------
# the mechanism / near-mechanism check of a supported stiffness

#: largest number of free DOFs for which :func:`mechanism_check` computes eigenvalues
#: (shift-invert on the solve's own LU factors; measured about 4x the factorization time,
#: ~1 s at 33 000 free DOFs on the 2-core machine)
EIG_CHECK_MAX_DOFS = 40000
#: a mode whose energy under the variant is below this fraction of its energy under the
#: full-integration variant of the same element is a spurious (zero-energy) mode
SPURIOUS_ENERGY_RATIO = 1e-5
#: an isolated lowest eigenvalue: lambda_1 / max diag below ISOLATED_ABS and lambda_1 / lambda_2
#: below ISOLATED_GAP (one mode far softer than every other: a near-mechanism)
ISOLATED_ABS = 1e-10
ISOLATED_GAP = 1e-6


def mechanism_check(mesh: Mesh, K: sps.spmatrix, fixed: dict[int, float], variant: str, state: str,
                    E: float, nu: float, t: float, lu=None, spurious: int | None = 0, k: int = 6) -> dict:
    """Smallest eigenvalues of the supported stiffness K_ff (ARPACK shift-invert about 0,
    reusing the solve's LU factors when given; fallback sigma = -1e-6 max diag).

    Flags a mechanism (``"mechanism": True`` and a warning) when
      * the element variant has spurious element modes and one of the k lowest modes of
        K_ff has less than :data:`SPURIOUS_ENERGY_RATIO` of its energy under the same mesh
        assembled with the ``full`` variant (a spurious mode that survived the supports), or
      * the lowest eigenvalue is isolated: lambda_1 < :data:`ISOLATED_ABS` max diag and
        lambda_1 < :data:`ISOLATED_GAP` lambda_2.
    Above :data:`EIG_CHECK_MAX_DOFS` free DOFs nothing is computed (``"checked": False``;
    a warning when the variant has spurious element modes).
    """
    n = K.shape[0]
    free = np.ones(n, bool)
    if fixed:
        free[np.fromiter(fixed.keys(), np.int64)] = False
    fd = np.nonzero(free)[0]
    nf = len(fd)
    out: dict = {"checked": False, "free_dofs": nf, "mechanism": False, "warnings": []}
    if nf > EIG_CHECK_MAX_DOFS:
        out["note"] = f"not checked: {nf} free DOFs > {EIG_CHECK_MAX_DOFS}"
        if spurious:
            out["warnings"].append(f"mechanism check not run ({nf} free DOFs > {EIG_CHECK_MAX_DOFS}): spurious "
                                   "modes surviving the supports are not excluded")
        return out
    Kff = K.tocsr()[fd][:, fd].tocsc()
    dmax = float(np.abs(Kff.diagonal()).max()) if nf else 1.0
    kk = min(k, nf - 1)
    if kk < 1:
        return out
    try:
        if nf <= 64:
            w, V = np.linalg.eigh(Kff.toarray())
            w, V = w[:kk], V[:, :kk]
        else:
            if lu is not None:
                op = spla.LinearOperator(Kff.shape, matvec=lu.solve, dtype=float)
                w, V = spla.eigsh(Kff, k=kk, sigma=0.0, OPinv=op, which="LM")
            else:
                w, V = spla.eigsh(Kff, k=kk, sigma=-1e-6 * dmax, which="LM")
    except Exception:
        try:
            w, V = spla.eigsh(Kff, k=kk, sigma=-1e-6 * dmax, which="LM")
        except Exception as exc:
            out["note"] = f"not checked: eigen-solver failed ({exc})"
            out["warnings"].append(f"mechanism check failed ({exc}); the result is not verified")
            return out
    order = np.argsort(w)
    w, V = w[order], V[:, order]
    out["checked"] = True
    out["lowest_eigenvalues_over_max_diag"] = [float(x / dmax) for x in w]
    lam1 = float(w[0])
    if len(w) > 1 and lam1 < ISOLATED_ABS * dmax and lam1 < ISOLATED_GAP * abs(float(w[1])):
        out["mechanism"] = True
        out["warnings"].append(f"near-mechanism: lowest eigenvalue of the supported stiffness {lam1 / dmax:.1e} of "
                               f"the largest diagonal and {lam1 / w[1]:.1e} of the next: an almost free mode; "
                               "the result is not reliable")
    if (spurious is None or spurious) and variant != "full":
        try:
            Kfull = assemble(mesh, "full", state, E, nu, t).K.tocsr()[fd][:, fd]
        except InputError as exc:
            out["warnings"].append(f"spurious-mode check not run (no full variant: {exc})")
            return out
        rq = np.einsum("ik,ik->k", V, Kfull @ V)
        ratio = w / np.where(rq > 0, rq, np.inf)
        out["energy_ratio_to_full"] = [float(x) for x in ratio]
        bad = np.nonzero(ratio < SPURIOUS_ENERGY_RATIO)[0]
        if bad.size:
            out["mechanism"] = True
            out["spurious_surviving"] = int(bad.size)
            out["warnings"].append(f"spurious mode survives the supports: {bad.size} of the {len(w)} lowest modes "
                                   f"carry {float(ratio[bad].max()):.1e} or less of their full-integration energy "
                                   f"(lowest eigenvalue {lam1 / dmax:.1e} of the largest diagonal); the result is "
                                   "not reliable")
    return out


def von_mises(sig: np.ndarray, state: str, nu: float) -> np.ndarray:
    """Von Mises stress of plane stress / plane strain (sigma_z = nu (sx + sy)) / axisymmetric stresses."""
    if state == "axisymmetric":
        sr, sz, st, trz = sig[..., 0], sig[..., 1], sig[..., 2], sig[..., 3]
        return np.sqrt(0.5 * ((sr - sz) ** 2 + (sz - st) ** 2 + (st - sr) ** 2) + 3 * trz ** 2)
    sx, sy, txy = sig[..., 0], sig[..., 1], sig[..., 2]
    sz = nu * (sx + sy) if state == "plane-strain" else 0.0 * sx
    return np.sqrt(0.5 * ((sx - sy) ** 2 + (sy - sz) ** 2 + (sz - sx) ** 2) + 3 * txy ** 2)


# ---------------------------------------------------------------------------------------------
# benchmark (derive perf --mesh)

def _membrane_problem(element: str, n: int):
    mesh = structured(element, n, n, COOK["corners"])
    f = uniform_edge_force(mesh, "right", (0.0, COOK["load"]), "plane-stress", COOK["t"])
    fixed = fix(mesh, "left", "uv")
    return mesh, f, fixed


def benchmark(quick: bool = False) -> dict:
    """Assembly and solve of an n x n Q4 mesh of the tapered membrane, per element-matrix route.

    Times are measured side by side in one run; the figures to quote are the ratios.
    """
    n = 32 if quick else 256
    element, variant, state, E, nu, t = "Q4", "full", "plane-stress", 1.0, 1.0 / 3.0, 1.0
    mesh, f, fixed = _membrane_problem(element, n)
    routes: list[tuple[str, Provider]] = []
    kernel = _kernel_factory()
    if kernel is not None:
        for lang in ("c", "numpy"):
            try:
                routes.append((f"generated {lang} kernel", kernel(element, variant, state, lang=lang)))
            except Exception:  # not generated or not compilable on this machine
                pass
    routes.append(("numpy Gauss quadrature (mesh.gauss_provider)", gauss_provider(element, state)))
    from .element import element as make_element
    el = make_element(element, variant, state)
    routes.append(("lambdified reference (numeric_stiffness)", lambda xy, E, nu, t: el.numeric_stiffness(xy, E, nu, t)))
    # warm-up (lambdify / compile / first-call costs are not assembly)
    small = mesh.element_coords()[:4]
    for _, p in routes:
        p(small, E, nu, t)
    results, lines = [], []
    reps = 3 if quick else 2
    lines.append(f"membrane {n} x {n} {element} ({mesh.n_elements} elements, {mesh.ndof} unknowns); best of {reps} "
                 f"interleaved runs per route; command: derive perf --mesh{' --quick' if quick else ''}")
    best: dict[str, Assembly] = {}
    for _ in range(reps):  # interleave the routes so machine drift affects them alike
        for label, p in routes:
            asm = assemble(mesh, variant, state, E, nu, t, provider=p)
            old = best.get(label)
            if old is None or asm.element_seconds + asm.scatter_seconds < old.element_seconds + old.scatter_seconds:
                best[label] = asm
    K_ref = best[routes[0][0]].K
    for label, _ in routes:
        b = best[label]
        diff = abs(b.K - K_ref).max() / abs(K_ref).max()
        results.append({"route": label, "element_seconds": b.element_seconds, "scatter_seconds": b.scatter_seconds,
                        "assembly_seconds": b.element_seconds + b.scatter_seconds,
                        "elements_per_second": mesh.n_elements / max(b.element_seconds + b.scatter_seconds, 1e-12),
                        "max_rel_difference": float(diff)})
    u, _, solve_s = solve(K_ref, f, fixed)
    v_corner = float(u[2 * mesh.node_at(48.0, 60.0) + 1])
    fastest = results[0]
    for r in results:
        lines.append(f"{r['route']}: assembly {r['assembly_seconds']:.3f} s (element matrices {r['element_seconds']:.3f} s "
                     f"+ scatter/CSR {r['scatter_seconds']:.3f} s), {r['elements_per_second']:.3g} elements/s; "
                     f"element matrices {r['element_seconds'] / fastest['element_seconds']:.2f}x the first route's "
                     f"time, assembly {r['assembly_seconds'] / fastest['assembly_seconds']:.2f}x; "
                     f"K differs by {r['max_rel_difference']:.1e}")
    lines.append(f"sparse LU solve (scipy SuperLU, MMD on A^T+A): {solve_s:.3f} s; corner deflection {v_corner:.4f}")
    return {"section": "mesh", "lines": lines, "n": n, "elements": mesh.n_elements, "unknowns": mesh.ndof,
            "routes": results, "solve_seconds": solve_s, "v_corner": v_corner}
