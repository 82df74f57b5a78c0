"""Isoparametric map, Jacobian and validity checks, for 1, 2 and 3 dimensions.

The map x_i(xi) = sum_k N_k(xi) X_ik (i over the physical axes x, y[, z]; xi the reference
coordinates of the element's domain) uses the element's own shape functions.  The Jacobian
follows the textbook layout, one row per reference coordinate:

    J[a, i] = d x_i / d xi_a      (2-D: [[dx/dxi, dy/dxi], [dx/deta, dy/deta]]),
    [dN/dx, dN/dy, dN/dz]^T = J^-1 [dN/dxi, dN/deta, dN/dzeta]^T.

det J and J^-1 = adj(J) / det J come from :func:`determinant` and :func:`adjugate`, the same
code for every dimension.

Geometry kinds (``Geometry.kind``), by the element's dimension:
  * 1-D ``segment``: length 2a along x, centred at the origin;
  * 2-D ``rectangle``: 2a x 2b, centred at the origin (triangles: the lower-left half,
    vertices (-a,-b), (a,-b), (-a,b)); ``parallelogram``: the rectangle sheared by the skew
    parameter c, x = a X + c Y, y = b Y (X, Y the rectangle's normalised coordinates), skew
    angle atan(c/b);
  * 3-D ``brick``: 2a x 2b x 2c centred at the origin (tetrahedra: the corner with vertices
    (-a,-b,-c), (a,-b,-c), (-a,b,-c), (-a,-b,c); wedges: the triangular prism over the lower-left
    half of the 2a x 2b rectangle); ``parallelepiped``: the brick sheared in plan by the skew s,
    x = a X + s Y, y = b Y, z = c Z;
  * any dimension ``general``: symbolic nodal coordinates x1, y1[, z1], ..., xn, yn[, zn];
  * ``nodes``: numeric nodal coordinates (an (n, dim) array).
For the axisymmetric model the rectangle and parallelogram are centred at radius R instead of
the origin, so r = x > 0.
"""
from __future__ import annotations

from functools import cached_property
from typing import Sequence

import numpy as np
import sympy as sp

from . import limits, reference
from .errors import GeometryError, InputError
from .shapes import ShapeSet
from .symbols import R, a, b, c, nodal_axes, s

#: symbolic geometry kinds by dimension (the first is the default)
KINDS_BY_DIM = {1: ("segment", "general"), 2: ("rectangle", "parallelogram", "general"),
                3: ("brick", "parallelepiped", "general")}
KINDS = ("rectangle", "parallelogram", "general")
_AXES = ("x", "y", "z")


def default_kind(dim: int) -> str:
    """The default symbolic geometry of a dimension: segment, rectangle or brick."""
    return KINDS_BY_DIM[dim][0]


class Geometry:
    """Nodal coordinates of one element (exact sympy expressions) and what they mean.

    ``Geometry(kind, xs, ys[, zs])``: one tuple of nodal values per physical axis.
    """

    __slots__ = ("kind", "axes")

    def __init__(self, kind: str, *axes: Sequence[sp.Expr]):
        if not 1 <= len(axes) <= 3:
            raise InputError(f"a geometry has 1, 2 or 3 coordinate axes, got {len(axes)}")
        object.__setattr__(self, "kind", kind)
        object.__setattr__(self, "axes", tuple(tuple(v) for v in axes))

    def __setattr__(self, name, value):
        raise AttributeError("Geometry is immutable")

    def __eq__(self, other) -> bool:
        return isinstance(other, Geometry) and (self.kind, self.axes) == (other.kind, other.axes)

    def __hash__(self) -> int:
        return hash((self.kind, self.axes))

    def __repr__(self) -> str:
        return f"Geometry({self.kind!r}, {', '.join(map(repr, self.axes))})"

    @property
    def dim(self) -> int:
        """Number of physical coordinates per node."""
        return len(self.axes)

    @property
    def xs(self) -> tuple[sp.Expr, ...]:
        return self.axes[0]

    @property
    def ys(self) -> tuple[sp.Expr, ...]:
        return self.axes[1]

    @property
    def zs(self) -> tuple[sp.Expr, ...]:
        return self.axes[2]

    @property
    def numeric(self) -> bool:
        return self.kind == "nodes"

    def as_array(self) -> np.ndarray:
        """(n, dim) float array of the coordinates (numeric geometries only)."""
        return np.array([[float(v) for v in row] for row in zip(*self.axes)])


def _normalised(shapes: ShapeSet, node) -> tuple:
    """Node position in the [-1, 1]^dim box the symbolic kinds scale: simplex coordinates
    (triangle, tetrahedron, the wedge's triangle) stretched from [0, 1] to [-1, 1]."""
    if shapes.domain in ("line", "square", "cube"):
        return tuple(node)
    if shapes.domain == "wedge":
        return (2 * node[0] - 1, 2 * node[1] - 1, node[2])
    return tuple(2 * v - 1 for v in node)


def make_geometry(shapes: ShapeSet, geometry, axisymmetric: bool = False) -> Geometry:
    """Build nodal coordinates for a geometry kind name or a numeric (n, dim) array-like."""
    if isinstance(geometry, Geometry):
        return geometry
    dim = shapes.dim
    if geometry is None:
        geometry = default_kind(dim)
    if isinstance(geometry, str):
        kind = geometry.strip().lower()
        kinds = KINDS_BY_DIM[dim]
        if kind == "general":
            return Geometry("general", *nodal_axes(shapes.n, dim))
        if kind in kinds:
            skewed = kind in ("parallelogram", "parallelepiped")
            x0 = R if axisymmetric else 0
            axes: list[list] = [[] for _ in range(dim)]
            for node in shapes.nodes:
                X = _normalised(shapes, node)
                if dim == 1:
                    axes[0].append(sp.expand(a * X[0]))
                elif dim == 2:
                    axes[0].append(sp.expand(x0 + a * X[0] + (c if skewed else 0) * X[1]))
                    axes[1].append(sp.expand(b * X[1]))
                else:
                    axes[0].append(sp.expand(a * X[0] + (s if skewed else 0) * X[1]))
                    axes[1].append(sp.expand(b * X[1]))
                    axes[2].append(sp.expand(c * X[2]))
            return Geometry(kind, *axes)
        other = [k for d, ks in KINDS_BY_DIM.items() if d != dim for k in ks if k != "general"]
        if kind in other:
            raise InputError(f"geometry {geometry!r} does not fit the {dim}-D element {shapes.name}; "
                             f"allowed: {', '.join(kinds)} or numeric nodal coordinates")
        raise InputError(f"unknown geometry {geometry!r}; allowed: {', '.join(kinds)} or numeric nodal coordinates")
    try:
        arr = np.asarray(geometry, dtype=float)
    except (TypeError, ValueError, OverflowError):
        raise InputError(f"nodal coordinates must be numbers in an (n, {dim}) array") from None
    if arr.ndim == 2 and arr.shape[0] == shapes.n and arr.shape[1] != dim and arr.shape[1] in (1, 2, 3):
        names = ", ".join(_AXES[:dim])
        raise InputError(f"element {shapes.name} is {dim}-D: each of its {shapes.n} nodes needs {dim} coordinates "
                         f"({names}), got {arr.shape[1]} per node; as an ({shapes.n}, {dim}) array")
    if arr.shape != (shapes.n, dim):
        raise InputError(f"element {shapes.name} needs {shapes.n} nodes as an ({shapes.n}, {dim}) array; "
                         f"got shape {arr.shape}")
    check_coordinates(arr, axisymmetric, dim)
    exact = [[v if isinstance(v, sp.Rational) else sp.Rational(float(v)) for v in row] for row in _rows(geometry, arr)]
    return Geometry("nodes", *(tuple(row[k] for row in exact) for k in range(dim)))


def check_coordinates(xy, axisymmetric: bool = False, dim: int = 2) -> np.ndarray:
    """Numeric nodal coordinates as a float array: finite, within the documented magnitude
    (:data:`derive.limits.MAGNITUDE`), and for the axisymmetric state at radius r = x >= 0."""
    if isinstance(xy, (str, bytes)):
        raise InputError(f"nodal coordinates must be numbers in an (n, {dim}) array, got a string")
    try:
        arr = np.asarray(xy, dtype=float)
    except (TypeError, ValueError, OverflowError):
        raise InputError(f"nodal coordinates must be real numbers in an (n, {dim}) array") from None
    if arr.ndim not in (2, 3) or arr.shape[-1] != dim:
        raise InputError(f"nodal coordinates must be an (nodes, {dim}) or (n, nodes, {dim}) array; got shape {arr.shape}")
    if not np.all(np.isfinite(arr)):
        raise InputError("nodal coordinates must be finite numbers (found NaN or infinity)")
    big = float(np.abs(arr).max()) if arr.size else 0.0
    if big > limits.MAGNITUDE[1]:
        raise InputError(f"nodal coordinate {big:.6g} is out of range; coordinates must be {limits.magnitude_text()}")
    if axisymmetric and arr.size and arr[..., 0].min() < 0:
        flat = arr.reshape(-1, arr.shape[-2], dim)
        e, k = np.unravel_index(int(np.argmin(flat[..., 0])), flat.shape[:2])
        where = f"node {k + 1}" + (f" of element {e}" if flat.shape[0] > 1 else "")
        raise GeometryError(f"axisymmetric element: {where} is at radius r = x = {flat[e, k, 0]:.6g} < 0; "
                            "the axis is x = 0 and every node needs r >= 0")
    return arr


def check_geometry_values(values: dict, axisymmetric: bool = False) -> None:
    """Numeric values of the geometry parameters (a, b, c, R) given with ``--set``.

    a and b are half-sides and must be > 0; in the axisymmetric state the element spans
    r = R - a - |c| .. R + a + |c|, so R >= a + |c| (r >= 0: the element may touch the axis
    x = 0 but not cross it).  Values left symbolic are not checked.
    """
    for sym in (a, b, R):
        if sym in values:
            limits.check_positive(values[sym], sym.name, "--set")
    if axisymmetric and R in values and a in values:
        reach = values[a] + abs(values.get(c, 0))
        if values[R] < reach:
            raise GeometryError(f"axisymmetric element at radius R = {values[R]} with a = {values[a]}"
                                + (f", c = {values[c]}" if c in values else "")
                                + f": it would cross the axis (r = R - a{' - |c|' if c in values else ''} "
                                f"= {float(values[R] - reach):.6g} < 0); need R >= a{' + |c|' if c in values else ''}")


def _rows(geometry, arr):
    """Keep exact sympy rationals given by the caller; floats otherwise."""
    if isinstance(geometry, np.ndarray):
        return arr.tolist()
    try:
        return [list(row) for row in geometry]
    except TypeError:
        return arr.tolist()


# --------------------------------------------------------------------------- dimension-free algebra

def _minor(M: sp.Matrix, i: int, j: int) -> sp.Matrix:
    return M[[r for r in range(M.rows) if r != i], [k for k in range(M.cols) if k != j]]


def determinant(M: sp.Matrix) -> sp.Expr:
    """det of a 1x1, 2x2 or 3x3 matrix by cofactor expansion along the first row, unexpanded
    (2x2: M00 M11 - M01 M10)."""
    n = M.rows
    if n == 0:
        return sp.Integer(1)
    if n == 1:
        return M[0, 0]
    total = None
    for j in range(n):
        term = M[0, j] * determinant(_minor(M, 0, j))
        total = term if total is None else (total + term if j % 2 == 0 else total - term)
    return total


def adjugate(M: sp.Matrix) -> sp.Matrix:
    """adj(M), so that M^-1 = adj(M) / det M (2x2: [[M11, -M01], [-M10, M00]])."""
    n = M.rows
    if n == 1:
        return sp.Matrix([[1]])

    def cof(i, j):
        d = determinant(_minor(M, i, j))
        return d if (i + j) % 2 == 0 else -d
    return sp.Matrix(n, n, lambda i, j: cof(j, i))


class IsoMap:
    """The isoparametric map of one element with given nodal coordinates."""

    def __init__(self, shapes: ShapeSet, geometry: Geometry):
        if geometry.dim != shapes.dim:
            raise InputError(f"element {shapes.name} is {shapes.dim}-D but the geometry has {geometry.dim} "
                             "coordinates per node")
        self.shapes = shapes
        self.geometry = geometry

    def __eq__(self, other) -> bool:
        return isinstance(other, IsoMap) and (self.shapes, self.geometry) == (other.shapes, other.geometry)

    def __hash__(self) -> int:
        return hash((self.shapes, self.geometry))

    @property
    def dim(self) -> int:
        return self.shapes.dim

    @property
    def coords(self) -> tuple[sp.Symbol, ...]:
        return self.shapes.coords

    @cached_property
    def position(self) -> tuple[sp.Expr, ...]:
        """(x, y[, z]) as expanded polynomials in the reference coordinates."""
        return tuple(sp.expand(sum(N * u for N, u in zip(self.shapes.functions, axis))) for axis in self.geometry.axes)

    @property
    def x(self) -> sp.Expr:
        return self.position[0]

    @property
    def y(self) -> sp.Expr:
        return self.position[1]

    @property
    def z(self) -> sp.Expr:
        return self.position[2]

    def jacobian_at(self, *point: sp.Expr) -> sp.Matrix:
        """J at a point (symbolic or exact numbers; default the symbolic point), textbook layout."""
        point = tuple(point) if point else self.coords
        sub = dict(zip(self.coords, point))
        rows = []
        for d in self.shapes.derivatives:
            vals = [f.subs(sub) if f.free_symbols else f for f in d]
            rows.append([sum(v * u for v, u in zip(vals, axis)) for axis in self.geometry.axes])
        return sp.Matrix(rows).applyfunc(sp.expand)

    @cached_property
    def jacobian(self) -> sp.Matrix:
        return self.jacobian_at(*self.coords)

    @cached_property
    def det(self) -> sp.Expr:
        return sp.expand(determinant(self.jacobian))

    @cached_property
    def inverse(self) -> sp.Matrix:
        """J^-1 as adj(J) / det J (entries not simplified)."""
        return adjugate(self.jacobian) / self.det

    @cached_property
    def is_affine(self) -> bool:
        """True when J is constant over the element (straight-sided parallelogram / triangle / brick / tetrahedron)."""
        return not (self.jacobian.free_symbols & set(self.coords))


# --------------------------------------------------------------------------- validity

def _grid(domain: str, n_grid: int) -> list[np.ndarray]:
    """A regular grid of reference points covering the domain (one array per coordinate)."""
    dim = reference.dimension(domain)
    box = domain in ("line", "square", "cube")
    g = np.linspace(-1.0, 1.0, n_grid) if box else np.linspace(0.0, 1.0, n_grid)
    axes = [g] * dim
    if domain == "wedge":
        axes = [g, g, np.linspace(-1.0, 1.0, n_grid)]
    mesh = [m.ravel() for m in np.meshgrid(*axes)]
    if box:
        return mesh
    ns = 2 if domain == "wedge" else dim
    keep = sum(mesh[:ns]) <= 1.0 + 1e-12
    return [m[keep] for m in mesh]


def det_samples(imap: IsoMap, points: Sequence[tuple], n_grid: int | None = None) -> dict:
    """det J at the rule's points and on a fine grid over the element (numeric geometry)."""
    coords = imap.coords
    if n_grid is None:
        n_grid = 21 if imap.dim <= 2 else 11
    f = sp.lambdify(coords, imap.det, "numpy")
    P = _grid(imap.shapes.domain, n_grid)
    grid = np.broadcast_to(np.asarray(f(*P), dtype=float), np.shape(P[0])).ravel()
    at_points = [float(imap.det.subs(dict(zip(coords, p)))) for p in points]
    return {"grid_min": float(grid.min()), "grid_max": float(grid.max()),
            "points_min": min(at_points), "points_max": max(at_points), "points": at_points}


#: rules that integrate det J of every catalogue element exactly (the measure in the report)
_MEASURE_RULE = {"line": "gauss-line-4", "cube": "gauss-4x4x4", "tetrahedron": "tetrahedron-d5",
                 "wedge": "wedge-d5x4"}


def element_measure(imap: IsoMap) -> float:
    """Length / area / volume of a numeric element: the corner polygon's area (shoelace) in 2-D,
    the integral of det J by a rule exact for it in 1-D and 3-D."""
    domain = imap.shapes.domain
    if imap.dim == 2:
        xs = [float(v) for v in imap.geometry.xs]
        ys = [float(v) for v in imap.geometry.ys]
        ncorner = 3 if domain == "triangle" else 4
        return 0.5 * sum(xs[i] * ys[(i + 1) % ncorner] - xs[(i + 1) % ncorner] * ys[i] for i in range(ncorner))
    from .quadrature import rule
    pts, wts = rule(_MEASURE_RULE[domain]).numeric()
    f = sp.lambdify(imap.coords, imap.det, "numpy")
    vals = np.broadcast_to(np.asarray(f(*pts.T), dtype=float), (len(wts),))
    return float(np.dot(wts, vals))


_MEASURE_NAME = {1: "length", 2: "area", 3: "volume"}


def validity_report(imap: IsoMap, points: Sequence[tuple]) -> dict:
    """Validity report of a numeric element; raises GeometryError for an invalid one.

    Checks, in order: zero measure (area, volume; coplanar tetrahedra), inverted numbering
    (negative det J everywhere: clockwise in 2-D, mirrored in 3-D), and a det J that changes
    sign (non-convex, self-intersecting or badly distorted element), naming the node or point
    and the value.  The report gives the measure under ``"area"`` (2-D), ``"volume"`` (3-D) or
    ``"length"`` (1-D).
    """
    if not imap.geometry.numeric:
        raise InputError("a validity report needs numeric nodal coordinates")
    name, dim = imap.shapes.name, imap.dim
    samples = det_samples(imap, points)
    size = element_measure(imap)
    arr = imap.geometry.as_array()
    scale = max(float((arr.max(axis=0) - arr.min(axis=0)).max()), 1e-300) ** dim
    what = _MEASURE_NAME[dim]
    report = {what: size, "det_min": samples["grid_min"], "det_max": samples["grid_max"],
              "det_at_points_min": samples["points_min"], "det_at_points_max": samples["points_max"]}
    if dim == 2:
        xs = [float(v) for v in imap.geometry.xs]
        ys = [float(v) for v in imap.geometry.ys]
        crossing = _crossing_edges(xs, ys, 3 if imap.shapes.domain == "triangle" else 4)
        if crossing:
            worst = _worst_corner(imap)
            (i, j), (k, m) = crossing
            raise GeometryError(f"element {name}: self-intersecting (bow-tie): edge {i}-{j} crosses edge "
                                f"{k}-{m}; det J changes sign over the element (min {samples['grid_min']:.6g}, "
                                f"max {samples['grid_max']:.6g}; most negative at node {worst[0]}, det J = {worst[1]:.6g}); "
                                "number the corners in order around the element")
    if abs(size) <= 1e-12 * scale:
        if dim == 2:
            raise GeometryError(f"element {name}: zero area (corner polygon area {size:.6g}); "
                                "check for repeated or collinear corner nodes")
        hint = "coplanar vertices" if imap.shapes.domain == "tetrahedron" else "repeated or coplanar corner nodes"
        raise GeometryError(f"element {name}: zero {what} ({what} {size:.6g}); the element is flat: check for {hint}")
    if samples["grid_max"] < 0:
        if dim == 2:
            raise GeometryError(f"element {name}: nodes are numbered clockwise (det J = "
                                f"{samples['grid_max']:.6g} < 0 everywhere); number corners counter-clockwise")
        raise GeometryError(f"element {name}: the element is inverted (det J = {samples['grid_max']:.6g} < 0 "
                            "everywhere: mirrored node numbering); number the nodes as in the README conventions")
    if samples["grid_min"] <= 0:
        worst = _worst_corner(imap)
        raise GeometryError(f"element {name}: det J changes sign over the element (min {samples['grid_min']:.6g}, "
                            f"max {samples['grid_max']:.6g}; most negative at node {worst[0]}, det J = {worst[1]:.6g}); "
                            "the element is non-convex, self-intersecting or too distorted")
    for k, v in enumerate(samples["points"], start=1):
        if v <= 0:
            raise GeometryError(f"element {name}: det J = {v:.6g} <= 0 at quadrature point {k}")
    return report


def _crossing_edges(xs, ys, ncorner: int):
    """The first pair of non-adjacent corner-polygon edges that cross properly (1-based node
    numbers), or None.  Only a quadrilateral has non-adjacent edges."""
    if ncorner != 4:
        return None

    def orient(p, q, r):
        v = (xs[q] - xs[p]) * (ys[r] - ys[p]) - (ys[q] - ys[p]) * (xs[r] - xs[p])
        return (v > 0) - (v < 0)

    for (i, j), (k, m) in (((0, 1), (2, 3)), ((1, 2), (3, 0))):
        o1, o2, o3, o4 = orient(i, j, k), orient(i, j, m), orient(k, m, i), orient(k, m, j)
        if o1 * o2 < 0 and o3 * o4 < 0:
            return (i + 1, j + 1), (k + 1, m + 1)
    return None


def _worst_corner(imap: IsoMap) -> tuple[int, float]:
    vals = [(k, float(imap.det.subs(dict(zip(imap.coords, node))))) for k, node in enumerate(imap.shapes.nodes, start=1)]
    return min(vals, key=lambda kv: kv[1])
