"""Isoparametric map, Jacobian and validity checks.

The map x(xi, eta) = sum N_i x_i, y(xi, eta) = sum N_i y_i uses the element's own shape
functions.  The Jacobian follows the textbook layout

    J = [[dx/dxi,  dy/dxi ],
         [dx/deta, dy/deta]],      [dN/dx, dN/dy]^T = J^-1 [dN/dxi, dN/deta]^T.

Geometry kinds (``Geometry.kind``):
  * ``rectangle``: 2a x 2b, centred at the origin (triangles: the lower-left half,
    vertices (-a,-b), (a,-b), (-a,b));
  * ``parallelogram``: the rectangle sheared by the skew parameter c, x = a X + c Y,
    y = b Y (X, Y the rectangle's normalised coordinates), skew angle atan(c/b);
  * ``general``: symbolic nodal coordinates x1, y1, ..., xn, yn;
  * ``nodes``: numeric nodal coordinates (an (n, 2) array).
For the axisymmetric state the rectangle and parallelogram are centred at radius R
instead of the origin, so r = x > 0.
"""
from __future__ import annotations

from dataclasses import dataclass
from functools import cached_property
from typing import Sequence

import numpy as np
import sympy as sp

from . import limits
from .errors import GeometryError, InputError
from .shapes import ShapeSet
from .symbols import R, a, b, c, eta, nodal, xi

KINDS = ("rectangle", "parallelogram", "general")


@dataclass(frozen=True)
class Geometry:
    """Nodal coordinates of one element (exact sympy expressions) and what they mean."""

    kind: str
    xs: tuple[sp.Expr, ...]
    ys: tuple[sp.Expr, ...]

    @property
    def numeric(self) -> bool:
        return self.kind == "nodes"

    def as_array(self) -> np.ndarray:
        """(n, 2) float array of the coordinates (numeric geometries only)."""
        return np.array([[float(u), float(v)] for u, v in zip(self.xs, self.ys)])


def make_geometry(shapes: ShapeSet, geometry, axisymmetric: bool = False) -> Geometry:
    """Build nodal coordinates for a geometry kind name or a numeric (n, 2) array-like."""
    if isinstance(geometry, Geometry):
        return geometry
    if isinstance(geometry, str):
        kind = geometry.strip().lower()
        if kind == "general":
            xs, ys = nodal(shapes.n)
            return Geometry("general", xs, ys)
        if kind in ("rectangle", "parallelogram"):
            skew = c if kind == "parallelogram" else 0
            x0 = R if axisymmetric else 0
            xs, ys = [], []
            for (p, q) in shapes.nodes:
                if shapes.domain == "square":
                    X, Y = p, q
                else:  # reference triangle -> lower-left half of the rectangle
                    X, Y = 2 * p - 1, 2 * q - 1
                xs.append(sp.expand(x0 + a * X + skew * Y))
                ys.append(sp.expand(b * Y))
            return Geometry(kind, tuple(xs), tuple(ys))
        raise InputError(f"unknown geometry {geometry!r}; allowed: {', '.join(KINDS)} or numeric nodal coordinates")
    try:
        arr = np.asarray(geometry, dtype=float)
    except (TypeError, ValueError, OverflowError):
        raise InputError("nodal coordinates must be numbers in an (n, 2) array") from None
    if arr.shape != (shapes.n, 2):
        raise InputError(f"element {shapes.name} needs {shapes.n} nodes as an ({shapes.n}, 2) array; got shape {arr.shape}")
    check_coordinates(arr, axisymmetric)
    exact = [[v if isinstance(v, sp.Rational) else sp.Rational(float(v)) for v in row] for row in _rows(geometry, arr)]
    xs = tuple(row[0] for row in exact)
    ys = tuple(row[1] for row in exact)
    return Geometry("nodes", xs, ys)


def check_coordinates(xy, axisymmetric: bool = False) -> np.ndarray:
    """Numeric nodal coordinates as a float array: finite, within the documented magnitude
    (:data:`derive.limits.MAGNITUDE`), and for the axisymmetric state at radius r = x >= 0."""
    if isinstance(xy, (str, bytes)):
        raise InputError("nodal coordinates must be numbers in an (n, 2) array, got a string")
    try:
        arr = np.asarray(xy, dtype=float)
    except (TypeError, ValueError, OverflowError):
        raise InputError("nodal coordinates must be real numbers in an (n, 2) array") from None
    if arr.ndim not in (2, 3) or arr.shape[-1] != 2:
        raise InputError(f"nodal coordinates must be an (nodes, 2) or (n, nodes, 2) array; got shape {arr.shape}")
    if not np.all(np.isfinite(arr)):
        raise InputError("nodal coordinates must be finite numbers (found NaN or infinity)")
    big = float(np.abs(arr).max()) if arr.size else 0.0
    if big > limits.MAGNITUDE[1]:
        raise InputError(f"nodal coordinate {big:.6g} is out of range; coordinates must be {limits.magnitude_text()}")
    if axisymmetric and arr.size and arr[..., 0].min() < 0:
        flat = arr.reshape(-1, arr.shape[-2], 2)
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


@dataclass(frozen=True)
class IsoMap:
    """The isoparametric map of one element with given nodal coordinates."""

    shapes: ShapeSet
    geometry: Geometry

    @cached_property
    def x(self) -> sp.Expr:
        return sp.expand(sum(N * u for N, u in zip(self.shapes.functions, self.geometry.xs)))

    @cached_property
    def y(self) -> sp.Expr:
        return sp.expand(sum(N * v for N, v in zip(self.shapes.functions, self.geometry.ys)))

    def jacobian_at(self, p: sp.Expr = xi, q: sp.Expr = eta) -> sp.Matrix:
        """J at (p, q) (symbolic or exact numbers), textbook layout (see module doc)."""
        dxi, deta = self.shapes.derivatives
        xs, ys = self.geometry.xs, self.geometry.ys
        sub = {xi: p, eta: q}
        rows = []
        for d in (dxi, deta):
            vals = [f.subs(sub) if f.free_symbols else f for f in d]
            rows.append([sum(v * u for v, u in zip(vals, xs)), sum(v * w for v, w in zip(vals, ys))])
        return sp.Matrix(rows).applyfunc(sp.expand)

    @cached_property
    def jacobian(self) -> sp.Matrix:
        return self.jacobian_at(xi, eta)

    @cached_property
    def det(self) -> sp.Expr:
        J = self.jacobian
        return sp.expand(J[0, 0] * J[1, 1] - J[0, 1] * J[1, 0])

    @cached_property
    def inverse(self) -> sp.Matrix:
        """J^-1 as adj(J) / det J (entries not simplified)."""
        J = self.jacobian
        adj = sp.Matrix([[J[1, 1], -J[0, 1]], [-J[1, 0], J[0, 0]]])
        return adj / self.det

    @cached_property
    def is_affine(self) -> bool:
        """True when J is constant over the element (straight-sided parallelogram / triangle)."""
        return not (self.jacobian.free_symbols & {xi, eta})


def det_samples(imap: IsoMap, points: Sequence[tuple], n_grid: int = 21) -> dict:
    """det J at the rule's points and on a fine grid over the element (numeric geometry)."""
    f = sp.lambdify((xi, eta), imap.det, "numpy")
    if imap.shapes.domain == "square":
        g = np.linspace(-1.0, 1.0, n_grid)
        P, Q = np.meshgrid(g, g)
    else:
        g = np.linspace(0.0, 1.0, n_grid)
        P, Q = np.meshgrid(g, g)
        keep = P + Q <= 1.0 + 1e-12
        P, Q = P[keep], Q[keep]
    grid = np.broadcast_to(np.asarray(f(P, Q), dtype=float), np.shape(P)).ravel()
    at_points = [float(imap.det.subs({xi: p, eta: q})) for (p, q) in points]
    return {"grid_min": float(grid.min()), "grid_max": float(grid.max()),
            "points_min": min(at_points), "points_max": max(at_points), "points": at_points}


def validity_report(imap: IsoMap, points: Sequence[tuple]) -> dict:
    """Validity report of a numeric element; raises GeometryError for an invalid one.

    Checks, in order: zero area, clockwise numbering (negative det J everywhere), and a
    det J that changes sign (non-convex or badly distorted quadrilateral), naming the
    node or point and the value.
    """
    if not imap.geometry.numeric:
        raise InputError("a validity report needs numeric nodal coordinates")
    samples = det_samples(imap, points)
    xs = [float(v) for v in imap.geometry.xs]
    ys = [float(v) for v in imap.geometry.ys]
    ncorner = 3 if imap.shapes.domain == "triangle" else 4
    area = 0.5 * sum(xs[i] * ys[(i + 1) % ncorner] - xs[(i + 1) % ncorner] * ys[i] for i in range(ncorner))
    scale = max(max(xs) - min(xs), max(ys) - min(ys), 1e-300) ** 2
    report = {"area": area, "det_min": samples["grid_min"], "det_max": samples["grid_max"],
              "det_at_points_min": samples["points_min"], "det_at_points_max": samples["points_max"]}
    crossing = _crossing_edges(xs, ys, ncorner)
    if crossing:
        worst = _worst_corner(imap)
        (i, j), (k, m) = crossing
        raise GeometryError(f"element {imap.shapes.name}: self-intersecting (bow-tie): edge {i}-{j} crosses edge "
                            f"{k}-{m}; det J changes sign over the element (min {samples['grid_min']:.6g}, "
                            f"max {samples['grid_max']:.6g}; most negative at node {worst[0]}, det J = {worst[1]:.6g}); "
                            "number the corners in order around the element")
    if abs(area) <= 1e-12 * scale:
        raise GeometryError(f"element {imap.shapes.name}: zero area (corner polygon area {area:.6g}); "
                            "check for repeated or collinear corner nodes")
    if samples["grid_max"] < 0:
        raise GeometryError(f"element {imap.shapes.name}: nodes are numbered clockwise (det J = "
                            f"{samples['grid_max']:.6g} < 0 everywhere); number corners counter-clockwise")
    if samples["grid_min"] <= 0:
        worst = _worst_corner(imap)
        raise GeometryError(f"element {imap.shapes.name}: det J changes sign over the element (min {samples['grid_min']:.6g}, "
                            f"max {samples['grid_max']:.6g}; most negative at node {worst[0]}, det J = {worst[1]:.6g}); "
                            "the element is non-convex or too distorted")
    for k, v in enumerate(samples["points"], start=1):
        if v <= 0:
            raise GeometryError(f"element {imap.shapes.name}: det J = {v:.6g} <= 0 at quadrature point {k}")
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
    vals = [(k, float(imap.det.subs({xi: p, eta: q}))) for k, (p, q) in enumerate(imap.shapes.nodes, start=1)]
    return min(vals, key=lambda kv: kv[1])
