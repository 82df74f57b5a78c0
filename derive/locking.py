"""Bending locking of an element, in closed form, by the energy route.

The test problem: a 2a x 2b rectangle (aspect ratio r = a/b) under pure bending, the linear
stress sigma_xx = sigma0 y / b, sigma_yy = tau_xy = 0 (equilibrated, traction-free on
y = +-b, a linear traction on the two ends).

* continuum: that stress field is the exact solution; its strain energy is
  U_c = 1/2 int sigma^T C sigma dV with C = D^-1 of the plane state (plane strain: the 3-D
  energy with eps_zz = 0, so C_xx = (1 - nu^2) / E).
* element: the consistent nodal load of the same stress, f = int B^T sigma dV (equal to the
  boundary integral of N^T t because div sigma = 0), applied to the element's condensed
  stiffness K (any variant: the :class:`~derive.formulations.base.Formulation` structure,
  each term integrated with its own rule), supported statically determinately (u, v at the
  corner (-a, -b), v at (a, -b)); U_e = 1/2 f^T u.
* ratio = U_e / U_c.  For one load pattern the work f^T u is the generalised end rotation,
  so the energy ratio is theta_element / theta_continuum: 1 for an element that represents
  pure bending, below 1 for a stiffer (locking) element, unbounded when the bending pattern
  is a zero-energy mode (then ``zero_energy`` is reported instead of a number).

The arithmetic is exact over the field Q(r, nu) (b = E = t = sigma0 = 1 without loss of
generality: the ratio is dimensionless), through the exact polynomial route of
:mod:`derive.stiffness`, so the result is a cancelled rational function of r and nu; no
``simplify`` anywhere.  Triangles are analysed as the rectangle split into two along the
diagonal from (-a, -b) to (a, b).

Distortion (the same energy route on the distorted shape; sigma = sigma0 y / b is the exact
solution of any shape loaded by its tractions sigma n, so the ratio stays defined):

* ``skew=THETA``: parallelogram, end edges at THETA degrees from the vertical,
  x = a X + c Y with c = b tan THETA; affine, so exact and symbolic in c (given r and nu);
* ``taper=TAU``: a tapered beam segment, depth 2b (1 - TAU) at the left end and
  2b (1 + TAU) at the right end (y = b Y (1 + TAU X)), ends vertical;
* ``trapezoid=S``: horizontal top and bottom edges of lengths 2a (1 - S) and 2a (1 + S),
  leaning ends (x = a X (1 - S Y)).

A tapered or trapezoidal quadrilateral is not affine: it is evaluated numerically with the
element's own rules through the numeric batch route (float64); a two-triangle patch stays
affine and exact.
"""
from __future__ import annotations

import math
import time
from dataclasses import dataclass, field
from functools import lru_cache

import numpy as np
import sympy as sp
from sympy.polys.domains import QQ
from sympy.polys.matrices import DomainMatrix
from sympy.polys.matrices.exceptions import DMNonInvertibleMatrixError

from . import catalog, material, quadrature
from .element import element
from .errors import InputError
from .formulations.base import B_op, Formulation, Point, Term
from .geometry import Geometry, IsoMap
from .limits import check_aspect, parse_literal
from .stiffness import exact_blocks, numeric_stiffness
from .symbols import eta, nu, r, x, xi, y

PLANE_STATES = ("plane-stress", "plane-strain")
#: symbols of the distortion parameters: c = b tan(skew angle), s = trapezoid, tau = taper
c_sym = sp.Symbol("c")
s_sym = sp.Symbol("s")
tau = sp.Symbol("tau")
#: distortion kinds: (units, symbol, description)
DISTORTIONS = {
    "skew": ("degrees", c_sym, "parallelogram, ends at the angle from the vertical (c = b tan angle)"),
    "taper": ("fraction", tau, "depth 2b(1 - tau) at the left end, 2b(1 + tau) at the right end, ends vertical"),
    "trapezoid": ("fraction", s_sym, "top edge 2a(1 - s), bottom edge 2a(1 + s), ends leaning"),
}
COMPONENTS = ("eps_xx", "eps_yy", "gamma_xy")
SOURCE = ("energy route (derive.locking): the element's strain energy under the consistent nodal load of "
          "sigma_xx = sigma0*y/b, divided by the continuum's strain energy under the same load (for one "
          "load the energy ratio equals the ratio of end rotations)")
#: names of the patch elements whose strain fields are reported apart (triangles: the 2a x 2b
#: rectangle split along the diagonal from (-a, -b) to (a, b))
PATCH_PARTS = {"triangle": ("lower-right triangle", "upper-left triangle")}
#: the published Q4 plane-stress result, for reference in reports and charts
COOK_Q4 = (1 - nu ** 2) / (1 + (1 - nu) * r ** 2 / 2)
COOK_SOURCE = "Cook, Malkus, Plesha & Witt, Concepts and Applications of FEA, 4th ed."


# ---------------------------------------------------------------------------------------------
# checks and small helpers

def check(name: str, variant: str, state: str):
    """The Element (validating names); refuses states without a bending ratio."""
    el = element(name, variant, state)
    if state not in PLANE_STATES:
        raise InputError(f"the bending locking ratio is defined for the plane states ({', '.join(PLANE_STATES)}); "
                         f"got {state!r}")
    return el


@lru_cache(maxsize=None)
def compliance(state: str, nu_value=nu) -> sp.Matrix:
    """C = D^-1 with E = 1 (entries cancelled)."""
    return material.D(state, sp.Integer(1), nu_value).inv().applyfunc(sp.cancel)


def _sigma_op(p: Point) -> sp.Matrix:
    return sp.Matrix([p.at(p.imap.y), 0, 0])


def _y_op(p: Point) -> sp.Matrix:
    return sp.Matrix([[p.at(p.imap.y)]])


def _identity3(p: Point) -> sp.Matrix:
    return sp.eye(3)


def _one(p: Point) -> sp.Matrix:
    return sp.Matrix([[1]])


#: the load f = int B^T sigma dV ("ua") and int y^2 dV ("aa") as a formulation, so they are
#: integrated by the same exact route as the stiffness
LOAD = Formulation(
    variant="bending-load",
    terms=(Term("ua", B_op, _identity3, _sigma_op, rule="exact", label="B^T sigma"),
           Term("aa", _y_op, _one, _y_op, rule="exact", label="y^2")),
    n_internal=1,
    description="consistent load of the linear bending stress and the second moment of area",
)


_TRIANGLES = (((-1, -1), (1, -1), (1, 1)), ((-1, -1), (1, 1), (-1, 1)))


def _ref_patch(name: str):
    """Element node lists in the rectangle's normalised coordinates (X, Y) in [-1, 1]^2.

    Returns (elements, nodes): per element the node positions (X, Y) of the undistorted patch
    (which also identify the shared nodes), and the list of distinct nodes.
    """
    info = catalog.element_info(name)
    shapes = catalog.shape_set(info.name)
    if info.domain == "square":
        elements = [tuple((sp.sympify(p), sp.sympify(q)) for p, q in shapes.nodes)]
    else:
        elements = []
        for (X1, Y1), (X2, Y2), (X3, Y3) in _TRIANGLES:
            elements.append(tuple((sp.Integer(X1) + (X2 - X1) * p + (X3 - X1) * q,
                                   sp.Integer(Y1) + (Y2 - Y1) * p + (Y3 - Y1) * q) for p, q in shapes.nodes))
    nodes: list = []
    for el in elements:
        for n in el:
            if n not in nodes:
                nodes.append(n)
    return elements, nodes


def _map_point(X, Y, r_v, dist):
    """The distortion map of the patch (b = 1): x = r X (1 - s Y) + c Y, y = Y (1 + tau X)."""
    c_v, s_v, tau_v = dist
    return sp.expand(r_v * X * (1 - s_v * Y) + c_v * Y), sp.expand(Y * (1 + tau_v * X))


def _element_coords(name: str, k: int, r_v, dist):
    """Nodal coordinates of patch element k.  Quadrilaterals: the (bilinear) distortion map of
    every node, which keeps edges straight and mid-side nodes at mid-edge; triangles: the
    corners mapped, the other nodes by the triangle's own affine map (straight sides)."""
    elements, _ = _ref_patch(name)
    info = catalog.element_info(name)
    if info.domain == "square":
        pts = [_map_point(X, Y, r_v, dist) for X, Y in elements[k]]
    else:
        corners = [_map_point(sp.Integer(X), sp.Integer(Y), r_v, dist) for X, Y in _TRIANGLES[k]]
        (x1, y1), (x2, y2), (x3, y3) = corners
        pts = [(sp.expand(x1 + (x2 - x1) * p + (x3 - x1) * q), sp.expand(y1 + (y2 - y1) * p + (y3 - y1) * q))
               for p, q in catalog.shape_set(info.name).nodes]
    xs, ys = zip(*pts)
    return tuple(xs), tuple(ys)


def _field(*values):
    syms = sorted({s for v in values for s in getattr(v, "free_symbols", set())}, key=lambda s: s.name)
    return QQ.frac_field(*syms) if syms else QQ


def _rational(v, what: str) -> sp.Expr:
    if isinstance(v, sp.Basic):
        return v
    try:
        f = float(v)
    except (TypeError, ValueError):
        raise InputError(f"{what}: {v!r} is not a number") from None
    if not math.isfinite(f):
        raise InputError(f"{what}: {v!r} is not a finite number")
    return sp.Rational(repr(f)) if isinstance(v, float) else sp.nsimplify(v, rational=True)


# ---------------------------------------------------------------------------------------------
# the exact route

@dataclass(frozen=True)
class Response:
    """The solved bending problem of one patch (exact field arithmetic)."""

    ratio: sp.Expr | None
    zero_energy: bool
    field: object
    element_data: tuple = field(default=(), compare=False)  # (imap, formulation, u_e, alpha) per element


_NO_DISTORTION = (sp.Integer(0), sp.Integer(0), sp.Integer(0))


@lru_cache(maxsize=None)
def _solve_exact(name: str, variant: str, state: str, r_v=r, nu_v=nu, dist=_NO_DISTORTION,
                 symmetry: bool = True) -> Response:
    """Solve the bending problem exactly; ``dist`` = (c, s, tau), numbers or symbols.

    ``symmetry=False`` skips the reduction to the bending-symmetric subspace (the direct solve,
    kept for the benchmark and as a cross-check)."""
    el = check(name, variant, state)
    form = el.formulation
    elements, nodes = _ref_patch(el.info.name)
    F = _field(r_v, nu_v, *dist)
    material_ = {"E": sp.Integer(1), "nu": nu_v, "t": sp.Integer(1)}
    n = 2 * len(nodes)
    Kg = [[F.zero] * n for _ in range(n)]
    fg = [F.zero] * n
    Iy = F.zero
    per_element = []
    for k, ref_nodes in enumerate(elements):
        xs, ys = _element_coords(el.info.name, k, r_v, dist)
        imap = IsoMap(el.shapes, Geometry("rectangle", xs, ys))
        blocks = exact_blocks(form, imap, state, material_, lambda term: el.info.rule_name(term.rule))
        blocks = {k: v.convert_to(F) for k, v in blocks.items()}
        load = exact_blocks(LOAD, imap, state, material_, lambda term: None)
        fe = load["ua"].convert_to(F)
        Iy += load["aa"].convert_to(F).to_list()[0][0]
        ndof = el.ndof
        K = blocks.get("uu", DomainMatrix.zeros((ndof, ndof), F))
        X = None
        if form.n_internal:
            X = blocks["aa"].lu_solve(blocks["ua"].transpose())
            K = K - blocks["ua"] * X
        dofs = [2 * nodes.index(nd) + k for nd in ref_nodes for k in (0, 1)]
        Kl, fl = K.to_list(), fe.to_list()
        for i, gi in enumerate(dofs):
            fg[gi] += fl[i][0]
            row = Kg[gi]
            for j, gj in enumerate(dofs):
                row[gj] += Kl[i][j]
        per_element.append((imap, form, dofs, X))
    group = _symmetry_group(elements, nodes, dist) if symmetry else [((1, 1), list(range(len(nodes))), 1)]
    if not _invariant(Kg, fg, group):  # a formulation that breaks the symmetry: solve in full
        group = [((1, 1), list(range(len(nodes))), 1)]
    basis = _basis(group, n)
    m = len(basis)
    Kr = [[sum((sa * sb * Kg[i][j] for i, sa in ba for j, sb in bb), F.zero) for bb in basis] for ba in basis]
    fr = [sum((sa * fg[i] for i, sa in ba), F.zero) for ba in basis]
    Kf = DomainMatrix(Kr, (m, m), F)
    ff = DomainMatrix([[v] for v in fr], (m, 1), F)
    y_full = _solve_reduced(Kf, ff, _rigid_pivots(basis, nodes), F)
    if y_full is None:
        return Response(None, True, F, ())
    u = DomainMatrix([[v] for v in y_full], (m, 1), F)
    work = (ff.transpose() * u).to_list()[0][0]
    C11 = F.from_sympy(compliance(state, nu_v)[0, 0])
    ratio = F.to_sympy(work / (C11 * Iy))
    yl = [row[0] for row in u.to_list()]
    ul = [F.zero] * n
    for ba, yv in zip(basis, yl):
        for i, sa in ba:
            ul[i] += sa * yv
    data = []
    for imap, form_, dofs, X in per_element:
        ue = [ul[d] for d in dofs]
        alpha = None
        if X is not None:
            alpha = [-sum((X.to_list()[k][j] * ue[j] for j in range(len(ue))), F.zero) for k in range(X.shape[0])]
        data.append((imap, form_, tuple(ue), None if alpha is None else tuple(alpha)))
    return Response(sp.cancel(ratio), False, F, tuple(data))


#: reflections of the patch: (sign of X, sign of Y) and the character of the bending pattern
#: (u odd in X and Y, v even: symmetric under X -> -X, antisymmetric under Y -> -Y)
_REFLECTIONS = {"x": ((-1, 1), 1), "y": ((1, -1), -1), "xy": ((-1, -1), -1)}


def _symmetry_group(elements, nodes, dist) -> list:
    """Signed node permutations that map the (distorted) patch onto itself.

    Each entry: ((sign_u, sign_v), node permutation, character).  The identity is always in;
    a reflection is kept when it maps every element's node set onto an element's node set and
    the distortion respects it (skew c keeps only the half-turn, the trapezoid s only
    X -> -X, the taper tau only Y -> -Y).
    """
    c_v, s_v, tau_v = dist
    group = [((1, 1), list(range(len(nodes))), 1)]
    allowed = {"x": c_v == 0 and tau_v == 0, "y": c_v == 0 and s_v == 0, "xy": s_v == 0 and tau_v == 0}
    sets = [frozenset(el) for el in elements]
    for key, ((sx, sy), chi) in _REFLECTIONS.items():
        if not allowed[key]:
            continue
        image = [(sx * X, sy * Y) for X, Y in nodes]
        if any(p not in nodes for p in image):
            continue
        if any(frozenset((sx * X, sy * Y) for X, Y in el) not in sets for el in elements):
            continue
        group.append(((sx, sy), [nodes.index(p) for p in image], chi))
    return group


def _rigid_pivots(basis, nodes) -> list[int]:
    """Coordinates of the reduced basis to hold at zero so that no rigid-body mode is left.

    The plane rigid modes (two translations, rotation about the centre) are projected on the
    (orthogonal, sparse) basis; those lying in the subspace form the rows of a small rational
    matrix whose pivot columns are a statically determinate choice of supports.
    """
    n = 2 * len(nodes)
    modes = [[1 if k % 2 == 0 else 0 for k in range(n)], [0 if k % 2 == 0 else 1 for k in range(n)],
             [(-nodes[k // 2][1] if k % 2 == 0 else nodes[k // 2][0]) for k in range(n)]]
    rows = []
    for mode in modes:
        coeff = [sp.Rational(sum(sa * mode[i] for i, sa in ba), sum(sa * sa for _, sa in ba)) for ba in basis]
        back = [0] * n
        for ba, cf in zip(basis, coeff):
            for i, sa in ba:
                back[i] += cf * sa
        if any(cf != 0 for cf in coeff) and all(sp.sympify(back[i] - mode[i]) == 0 for i in range(n)):
            rows.append(coeff)
    if not rows:
        return []
    _, pivots = sp.Matrix(rows).rref()
    return list(pivots)


def _solve_reduced(K: DomainMatrix, f: DomainMatrix, fixed: list[int], F):
    """Solve the reduced system with the coordinates ``fixed`` held at zero.

    Returns the full coordinate list, or None when the load excites a zero-energy mode
    (the system is inconsistent).  A further singularity (spurious modes) is handled with the
    row-reduced form: its free columns are held at zero too, after checking consistency.
    """
    m = K.shape[0]
    Kl, fl = K.to_list(), [row[0] for row in f.to_list()]

    def attempt(fix):
        free = [i for i in range(m) if i not in fix]
        A = DomainMatrix([[Kl[i][j] for j in free] for i in free], (len(free), len(free)), F)
        b = DomainMatrix([[fl[i]] for i in free], (len(free), 1), F)
        sol = [row[0] for row in A.lu_solve(b).to_list()]
        y = [F.zero] * m
        for i, v in zip(free, sol):
            y[i] = v
        return y

    try:
        return attempt(fixed)
    except DMNonInvertibleMatrixError:
        pass
    null = K.nullspace()
    if any(row[0] != F.zero for row in (null * f).to_list()):
        return None
    _, pivots = K.rref()
    return attempt([i for i in range(m) if i not in pivots])


def _invariant(Kg, fg, group) -> bool:
    """K and f commute with every signed permutation of the group (character chi for f)."""
    for (sx, sy), perm, chi in group[1:]:
        sign = [sx if k % 2 == 0 else sy for k in range(len(fg))]
        dof = [2 * perm[k // 2] + k % 2 for k in range(len(fg))]
        for i in range(len(fg)):
            if fg[dof[i]] != chi * sign[i] * fg[i]:
                return False
            row, grow = Kg[i], Kg[dof[i]]
            for j in range(len(fg)):
                if grow[dof[j]] != sign[i] * sign[j] * row[j]:
                    return False
    return True


def _basis(group, n: int) -> list:
    """Basis of the nodal vectors that transform like the bending pattern (sparse columns)."""
    out, seen = [], set()
    for j in range(n):
        vec: dict = {}
        for (sx, sy), perm, chi in group:
            s_ = sx if j % 2 == 0 else sy
            k = 2 * perm[j // 2] + j % 2
            vec[k] = vec.get(k, 0) + chi * s_
        vec = {k: v for k, v in vec.items() if v}
        if not vec:
            continue
        first = min(vec)
        sgn = 1 if vec[first] > 0 else -1
        key = tuple(sorted((k, sgn * v) for k, v in vec.items()))
        if key in seen:
            continue
        seen.add(key)
        g = math.gcd(*[abs(v) for v in vec.values()])
        out.append([(k, sgn * v // g) for k, v in sorted(vec.items())])
    return out


# ---------------------------------------------------------------------------------------------
# public: closed form and its analysis

def locking_ratio(name: str, variant: str = "full", state: str = "plane-stress") -> sp.Expr:
    """theta_element / theta_continuum of a 2a x 2b rectangle in pure bending, in r = a/b and nu.

    A cancelled rational function (exact); ``sympy.oo`` when the bending pattern is a
    zero-energy mode of the element (the element offers no stiffness against it).
    """
    res = _solve_exact(catalog.element_info(name).name, variant, state)
    return sp.oo if res.zero_energy else res.ratio


@dataclass(frozen=True)
class Analysis:
    element: str
    variant: str
    state: str
    ratio: sp.Expr | None
    zero_energy: bool
    strain: dict | None
    seconds: float

    @property
    def formula(self) -> str | None:
        return None if self.ratio is None else str(self.ratio)

    def display(self) -> str:
        return "zero-energy mode" if self.ratio is None else str(display_form(self.ratio))


def display_form(expr) -> sp.Expr:
    """Factored form for reading, in the natural sign (1 - nu^2, not (nu - 1)(nu + 1)); display
    only, the value is unchanged.  The one rule of derive.output.natural_form."""
    from .output import natural_form
    return natural_form(expr)


@lru_cache(maxsize=None)
def analyse(name: str, variant: str = "full", state: str = "plane-stress") -> Analysis:
    """Closed-form ratio plus the spurious-strain report (cached)."""
    t0 = time.perf_counter()
    name = catalog.element_info(name).name
    res = _solve_exact(name, variant, state)
    strain = None if res.zero_energy else strain_report(res, state, PATCH_PARTS.get(catalog.element_info(name).domain, ()))
    return Analysis(name, variant, state, res.ratio, res.zero_energy, strain, time.perf_counter() - t0)


def strain_report(res: Response, state: str, names: tuple = ()) -> dict:
    """Element strain field of the bending response against the continuum's, per component.

    Strains in units of the continuum's peak bending strain eps0 = C_xx sigma0 (at y = b),
    coordinates in units of b; ``names`` label the patch elements (their fields are shown
    apart when they differ).  A component is *spurious* where the element carries a term
    (a monomial in x, y) the continuum does not, *missing* where the continuum has a term the
    element lacks.
    """
    F = res.field
    C = compliance(state, nu)
    cont = [sp.cancel(C[k, 0] / C[0, 0]) * y for k in range(3)]
    per_element = []
    X_, Y_ = sp.symbols("X_ Y_")
    for imap, form, ue, alpha in res.element_data:
        pt = Point(imap, state, xi, eta, E=sp.Integer(1), nu=nu, t=sp.Integer(1))
        Su, Sa = form.strain(pt) if form.strain is not None else (pt.B, None)
        u = sp.Matrix([F.to_sympy(v) for v in ue])
        eps = Su * u
        if Sa is not None and alpha is not None:
            eps += Sa * sp.Matrix([F.to_sympy(v) for v in alpha])
        sol = sp.solve([X_ - imap.x, Y_ - imap.y], [xi, eta], dict=True)[0]
        back = {xi: sol[xi].subs({X_: x, Y_: y}), eta: sol[eta].subs({X_: x, Y_: y})}
        per_element.append([sp.cancel(sp.expand(e.subs(back)) / C[0, 0]) for e in eps])
    comps = {}
    spurious, missing = [], []
    for k, label in enumerate(COMPONENTS):
        e_parts, e_names = [], []  # distinct fields over the patch (two triangles may differ)
        for n_el, fields in enumerate(per_element):
            if not any(sp.cancel(fields[k] - q) == 0 for q in e_parts):
                e_parts.append(fields[k])
                e_names.append(names[n_el] if n_el < len(names) else f"element {n_el + 1}")
        e_support = set()
        for part in e_parts:
            e_support |= _support(part)
        c_support = _support(cont[k])
        extra = sorted(str(m) for m in e_support - c_support)
        lack = sorted(str(m) for m in c_support - e_support)
        shown = [str(display_form(p)) for p in e_parts]
        comps[label] = {"element": shown[0] if len(shown) == 1 else
                        "; ".join(f"{n}: {f}" for n, f in zip(e_names, shown)),
                        "element_parts": [{"part": n, "field": f} for n, f in zip(e_names, shown)],
                        "continuum": str(cont[k]), "spurious_terms": extra, "missing_terms": lack}
        if extra:
            spurious.append(label)
        if lack:
            missing.append(label)
    summary = []
    if spurious:
        summary.append("spurious " + ", ".join(f"{c} ({', '.join(comps[c]['spurious_terms'])})" for c in spurious))
    if missing:
        summary.append("missing " + ", ".join(f"{c} ({', '.join(comps[c]['missing_terms'])})" for c in missing))
    return {"units": "strain / eps0 (eps0 = C_xx*sigma0, the continuum's peak bending strain); x, y in units of b",
            "components": comps, "spurious": spurious, "missing": missing,
            "summary": "; ".join(summary) if summary else
            "none: the element carries exactly the continuum's strain terms"}


def _support(expr) -> set:
    expr = sp.expand(sp.cancel(expr))
    if expr == 0:
        return set()
    num, den = sp.fraction(sp.together(expr))
    poly = sp.Poly(sp.expand(num), x, y)
    return {x ** i * y ** j for (i, j), coeff in poly.terms() if coeff != 0}


# ---------------------------------------------------------------------------------------------
# evaluation, tolerance, volumetric index

@lru_cache(maxsize=None)
def ratio_function(name: str, variant: str = "full", state: str = "plane-stress"):
    """Vectorised float function (r, nu) -> ratio from the closed form (lambdify, cached).

    A zero-energy element gives a function returning +inf everywhere.
    """
    expr = locking_ratio(name, variant, state)
    if expr is sp.oo:
        return lambda rr, nn: np.full(np.broadcast(np.asarray(rr, float), np.asarray(nn, float)).shape, np.inf)
    f = sp.lambdify((r, nu), expr, "numpy")

    def g(rr, nn):
        rr, nn = np.asarray(rr, dtype=float), np.asarray(nn, dtype=float)
        return np.broadcast_to(np.asarray(f(rr, nn), dtype=float), np.broadcast(rr, nn).shape)
    return g


def check_point(aspect=None, nu_value=None, state: str = "plane-stress"):
    if aspect is not None:
        check_aspect(aspect)
    if nu_value is not None:
        material.check_material(state, None, float(nu_value))


def evaluate(name: str, variant: str, state: str, aspect: float, nu_value: float) -> float | None:
    check_point(aspect, nu_value, state)
    expr = locking_ratio(name, variant, state)
    if expr is sp.oo:
        return None
    return float(ratio_function(name, variant, state)(aspect, nu_value))


def aspect_limit(name: str, variant: str, state: str, nu_value, tolerance) -> dict:
    """Largest aspect ratio r* with |ratio(r) - 1| <= tolerance for every 0 < r <= r*.

    Exact: the band edges ratio = 1 -+ tol are polynomial equations in r (ratio rational), so
    r* is the smallest positive real root at which the ratio leaves the band; its closed form
    in nu is given where sympy solves the equation in radicals (with symbolic nu), else the
    root is bracketed and refined numerically (reported as such).
    """
    tol = _rational(tolerance, "--tolerance")
    if not 0 < tol < 1:
        raise InputError(f"--tolerance must be between 0 and 1 (e.g. 0.05), got {tolerance}")
    check_point(None, float(nu_value), state)
    nu_q = _rational(nu_value, "--nu")
    expr = locking_ratio(name, variant, state)
    out = {"nu": float(nu_value), "tolerance": float(tol)}
    if expr is sp.oo:
        return {**out, "aspect_limit": None, "method": "zero-energy mode: no finite ratio"}
    e = sp.cancel(expr.subs(nu, nu_q))
    g = sp.lambdify(r, e, "numpy")

    def inside(rv):
        return abs(float(g(rv)) - 1) <= float(tol) * (1 + 1e-12)

    at0 = _limit_r0(e)
    out["ratio_at_r0"] = float(at0)
    if not e.has(r):
        ok = abs(float(e) - 1) <= float(tol)
        return {**out, "aspect_limit": math.inf if ok else 0.0, "unlimited": ok,
                "method": f"ratio {float(e):.4g} independent of r: " + ("within" if ok else "outside")
                + " the tolerance at every aspect ratio"}
    if abs(float(at0) - 1) > float(tol):
        return {**out, "aspect_limit": 0.0, "unlimited": False,
                "method": f"ratio is {float(at0):.4g} already as r -> 0: outside the tolerance at every aspect ratio"}
    roots = []
    for edge in (1 - tol, 1 + tol):
        num = sp.fraction(sp.cancel(e - edge))[0]
        if num.has(r):
            for rt in sp.Poly(num, r).real_roots():
                v = float(rt)
                if v > 0:
                    roots.append((v, edge, rt))
    roots.sort(key=lambda t: t[0])
    for v, edge, rt in roots:
        if not inside(v * (1 + 1e-7) + 1e-12):
            closed = _closed_form_limit(expr, edge, nu_q, tol, v)
            res = {**out, "aspect_limit": v, "unlimited": False, "edge": float(edge),
                   "method": "closed form" if closed else "exact polynomial root"}
            if closed:
                res["closed_form"] = closed
                res["closed_form_symbols"] = "r* in nu and tol (the tolerance)"
            return res
    # no exit: check far out (the ratio may approach a limit inside the band)
    return {**out, "aspect_limit": math.inf, "unlimited": True, "method": "ratio stays within the tolerance for all r"}


def _limit_r0(e):
    num, den = sp.fraction(sp.cancel(e))
    d0 = den.subs(r, 0)
    if d0 != 0:
        return num.subs(r, 0) / d0
    return sp.limit(e, r, 0, "+")


TOL = sp.Symbol("tol")


@lru_cache(maxsize=None)
def _closed_form_solutions(expr, sign: int):
    """Solutions r(nu, tol) of ratio(r, nu) = 1 + sign * tol, where sympy finds radicals."""
    num = sp.fraction(sp.cancel(expr - (1 + sign * TOL)))[0]
    try:
        deg = sp.Poly(num, r).degree()
    except sp.PolynomialError:
        return ()
    if deg > 4:
        return ()
    try:
        return tuple(sp.solve(num, r))
    except NotImplementedError:
        return ()


def _closed_form_limit(expr, edge, nu_q, tol, value: float) -> str | None:
    """A closed form r*(nu, tol) for this band edge whose value at (nu_q, tol) matches."""
    sign = 1 if edge > 1 else -1
    for s_ in _closed_form_solutions(expr, sign):
        try:
            val = complex(s_.subs({nu: nu_q, TOL: tol}).evalf(30))
        except (TypeError, ValueError):
            continue
        if abs(val.imag) < 1e-12 and abs(val.real - value) <= 1e-9 * max(1.0, value):
            return str(s_)
    return None


def volumetric_index(name: str, variant: str, aspect: float = 1.0, nus=None) -> dict:
    """Plane strain: the ratio's limit as nu -> 1/2 (in r and at ``aspect``) and the curve in nu."""
    expr = locking_ratio(name, variant, "plane-strain")
    nus = list(nus) if nus is not None else [0.0, 0.2, 0.3, 0.4, 0.45, 0.49, 0.499, 0.4999]
    if expr is sp.oo:
        return {"limit": None, "zero_energy": True}
    num, den = sp.fraction(sp.cancel(expr))
    half = sp.Rational(1, 2)
    dh = den.subs(nu, half)
    lim = sp.cancel(num.subs(nu, half) / dh) if dh != 0 else sp.limit(expr, nu, half, "-")
    f = ratio_function(name, variant, "plane-strain")
    lim_val = float(lim.subs(r, _rational(aspect, "--aspect"))) if lim.is_finite is not False else math.inf
    return {"limit": str(lim), "aspect": float(aspect), "limit_at_aspect": lim_val,
            "locks": bool(lim == 0), "curve": [[float(v), float(f(aspect, v))] for v in nus]}


# ---------------------------------------------------------------------------------------------
# distortion

def _skew_c(angle_deg: float) -> float:
    if not math.isfinite(angle_deg) or abs(angle_deg) >= 89.0:
        raise InputError(f"skew angle must be between -89 and 89 degrees, got {angle_deg}")
    return math.tan(math.radians(angle_deg))


def _check_fraction(kind: str, value: float) -> None:
    if not math.isfinite(value) or abs(value) >= 0.95:
        raise InputError(f"{kind} must be between -0.95 and 0.95 (1 would collapse an edge), got {value}")


def _check_distortion(kind: str, value: float) -> None:
    if kind not in DISTORTIONS:
        raise InputError(f"unknown distortion {kind!r}; allowed: skew=DEGREES, taper=FRACTION, trapezoid=FRACTION")
    if kind == "skew":
        _skew_c(value)
    else:
        _check_fraction(kind, value)


def _dist_tuple(kind: str, param) -> tuple:
    zero = sp.Integer(0)
    return {"skew": (param, zero, zero), "trapezoid": (zero, param, zero), "taper": (zero, zero, param)}[kind]


def _param_value(kind: str, value: float) -> float:
    return _skew_c(value) if kind == "skew" else float(value)


@lru_cache(maxsize=None)
def distortion_expression(name: str, variant: str, state: str, kind: str, aspect, nu_value) -> sp.Expr | None:
    """Exact ratio symbolic in the distortion parameter (c = b tan angle, s or tau) for given r
    and nu, where the patch stays affine (every skew; taper and trapezoid for triangles).
    None for a zero-energy response."""
    res = _solve_exact(catalog.element_info(name).name, variant, state, _rational(aspect, "--aspect"),
                       _rational(nu_value, "--nu"), _dist_tuple(kind, DISTORTIONS[kind][1]))
    return None if res.zero_energy else res.ratio


def _exact_applies(name: str, kind: str) -> bool:
    return kind == "skew" or catalog.element_info(name).domain == "triangle"


@lru_cache(maxsize=None)
def _load_plan(name: str, state: str):
    """Lambdified integrands of f_x = int dN/dx y det J and of y^2 det J, general coordinates."""
    el = element(name, "full", state)
    imap = el.map("general")
    pt = Point(imap, state, xi, eta)
    yy = imap.y
    exprs = [sp.expand(pt.adjJ[0, 0] * u + pt.adjJ[0, 1] * v) * yy for u, v in zip(*pt.dN_ref)]
    exprs.append(yy ** 2 * pt.detJ)
    args = [xi, eta] + list(imap.geometry.xs) + list(imap.geometry.ys)
    return sp.lambdify(args, exprs, "numpy", cse=True)


def numeric_ratio(name: str, variant: str, state: str, xy, nu_value: float) -> np.ndarray:
    """Ratio for a batch of single quadrilaterals (n, nodes, 2) by the numeric route.

    An independent evaluation path: K from :meth:`Element.numeric_stiffness` (the element's
    own rules, float64), the load and the second moment by a 6 x 6 Gauss rule (exact for these
    polynomial integrands), the energy from the eigen-decomposition of the supported K.
    NaN marks a zero-energy bending response.
    """
    el = check(name, variant, state)
    if el.info.domain != "square":
        raise InputError("numeric distortion ratios are for quadrilaterals (triangles are evaluated exactly)")
    xy = np.asarray(xy, dtype=float)
    if xy.ndim == 2:
        xy = xy[None]
    nb, nn = xy.shape[0], xy.shape[1]
    K = numeric_stiffness(el.info.name, variant, state, xy, 1.0, float(nu_value), 1.0)
    pts, wts = quadrature.gauss_square(6).numeric()
    plan = _load_plan(el.info.name, state)
    args = [pts[:, 0][:, None], pts[:, 1][:, None]] + [xy[None, :, i, 0] for i in range(nn)] + \
        [xy[None, :, i, 1] for i in range(nn)]
    vals = [np.broadcast_to(np.asarray(v, dtype=float), (len(wts), nb)) for v in plan(*args)]
    f = np.zeros((nb, 2 * nn))
    for i in range(nn):
        f[:, 2 * i] = wts @ vals[i]
    Iy = wts @ vals[-1]
    free = [i for i in range(2 * nn) if i not in (0, 1, 3)]  # u1, v1, v2 held
    Kf = K[:, free][:, :, free]
    ff = f[:, free]
    out = np.empty(nb)
    C11 = 1.0 if state == "plane-stress" else 1.0 - float(nu_value) ** 2
    for k in range(nb):
        w, V = np.linalg.eigh(Kf[k])
        tiny = w < 1e-10 * w.max()
        proj = V.T @ ff[k]
        if np.any(np.abs(proj[tiny]) > 1e-8 * np.linalg.norm(ff[k])):
            out[k] = np.nan
            continue
        keep = ~tiny
        work = float(np.sum(proj[keep] ** 2 / w[keep]))
        out[k] = work / (C11 * Iy[k])
    return out


def distorted_nodes(name: str, kind: str, value: float, aspect: float) -> np.ndarray:
    """Nodal coordinates (b = 1) of the distorted quadrilateral (skew in degrees)."""
    _check_distortion(kind, value)
    info = catalog.element_info(name)
    if info.domain != "square":
        raise InputError("distorted_nodes is for quadrilaterals; triangles are analysed as a two-element patch")
    c_v, s_v, t_v = (float(v) for v in _dist_tuple(kind, _param_value(kind, value)))
    elements, _ = _ref_patch(info.name)
    return np.array([[aspect * float(X) * (1 - s_v * float(Y)) + c_v * float(Y), float(Y) * (1 + t_v * float(X))]
                     for X, Y in elements[0]])


def distortion_curve(name: str, variant: str, state: str, kind: str, values, aspect: float = 1.0,
                     nu_value: float = 0.3) -> tuple[np.ndarray, str]:
    """Ratio over a range of distortion values; returns (ratios, method).  NaN: zero energy."""
    el = check(name, variant, state)
    check_point(aspect, nu_value, state)
    values = np.atleast_1d(np.asarray(values, dtype=float))
    for v in values:
        _check_distortion(kind, float(v))
    if _exact_applies(el.info.name, kind):
        expr = distortion_expression(el.info.name, variant, state, kind, _rational(float(aspect), "--aspect"),
                                     _rational(float(nu_value), "--nu"))
        sym = DISTORTIONS[kind][1]
        label = f"exact, symbolic in {sym}" + (" = b tan(angle)" if kind == "skew" else "")
        if expr is None:
            return np.full(values.shape, np.nan), label + " (zero-energy mode)"
        f = sp.lambdify(sym, expr, "numpy")
        params = np.array([_param_value(kind, float(v)) for v in values])
        return np.broadcast_to(np.asarray(f(params), dtype=float), values.shape).copy(), label
    xy = np.stack([distorted_nodes(el.info.name, kind, float(v), aspect) for v in values])
    return numeric_ratio(el.info.name, variant, state, xy, nu_value), "numeric, element's own rules (float64)"


def distortion(name: str, variant: str, state: str, kind: str, value: float, aspect: float = 1.0,
               nu_value: float = 0.3) -> dict:
    """Ratio of one distorted shape, with the undistorted ratio beside it."""
    vals, method = distortion_curve(name, variant, state, kind, [value], aspect, nu_value)
    base = evaluate(name, variant, state, aspect, nu_value)
    out = {"kind": kind, "value": float(value), "units": DISTORTIONS[kind][0], "shape": DISTORTIONS[kind][2],
           "aspect": float(aspect), "nu": float(nu_value), "ratio": None if np.isnan(vals[0]) else float(vals[0]),
           "zero_energy": bool(np.isnan(vals[0])), "undistorted_ratio": base, "method": method}
    if _exact_applies(catalog.element_info(name).name, kind):
        expr = distortion_expression(catalog.element_info(name).name, variant, state, kind,
                                     _rational(float(aspect), "--aspect"), _rational(float(nu_value), "--nu"))
        if expr is not None and sp.count_ops(expr) < 400:
            out["formula"] = str(expr)
            out["formula_symbol"] = str(DISTORTIONS[kind][1])
    if kind == "skew" and catalog.element_info(name).n_nodes == 4:
        full = skew_formula(name, variant, state)
        if full is not None:
            out["formula_r_nu_c"] = str(full)
    return out


@lru_cache(maxsize=None)
def skew_formula(name: str, variant: str = "full", state: str = "plane-stress") -> sp.Expr | None:
    """The parallelogram ratio symbolic in r, nu and c = b tan(skew angle) (exact).

    Tractable for the 4-node element (well under a second); the quadratic elements take from
    about a second (Q8) to tens of seconds (Q9) and are offered symbolic in c only
    (:func:`distortion_expression`).  None for a zero-energy response.
    """
    res = _solve_exact(catalog.element_info(name).name, variant, state, r, nu, _dist_tuple("skew", c_sym))
    return None if res.zero_energy else res.ratio


def parse_distortion(text: str) -> tuple[str, float]:
    """``skew=30`` (degrees), ``taper=0.2`` or ``trapezoid=0.2`` -> (kind, value)."""
    kind, eq, value = (text or "").partition("=")
    kind = kind.strip().lower()
    if not eq or kind not in DISTORTIONS:
        raise InputError(f"--distortion {text!r}: write skew=DEGREES (e.g. skew=30), taper=FRACTION (e.g. "
                         "taper=0.2) or trapezoid=FRACTION")
    v = float(parse_literal(value, f"--distortion {kind}"))
    _check_distortion(kind, v)
    return kind, v


# ---------------------------------------------------------------------------------------------
# report, demo section, benchmark

def report(name: str, variant: str = "full", state: str = "plane-stress", aspect=None, nu_value=None,
           tolerance=None, nus=None, distortion_spec: str | None = None) -> dict:
    """Everything ``derive locking`` prints, as a JSON-ready dict."""
    check(name, variant, state)
    check_point(aspect, nu_value, state)
    an = analyse(name, variant, state)
    out = {"element": an.element, "variant": variant, "state": state,
           "aspect": None if aspect is None else float(aspect), "nu": None if nu_value is None else float(nu_value),
           "ratio": None, "zero_energy": an.zero_energy, "formula": an.formula,
           "formula_display": an.display(), "symbols": {"r": "a/b (2a along the bending axis x, 2b deep)",
                                                          "nu": "Poisson's ratio"},
           "source": SOURCE, "seconds": round(an.seconds, 3)}
    if aspect is not None and nu_value is not None:
        out["ratio"] = evaluate(name, variant, state, float(aspect), float(nu_value))
    out["spurious_strain"] = an.strain
    if tolerance is not None:
        nus_ = list(nus) if nus else ([float(nu_value)] if nu_value is not None else [0.0, 0.3])
        out["tolerance"] = {"tolerance": float(tolerance),
                            "limits": [aspect_limit(name, variant, state, v, tolerance) for v in nus_]}
    if state == "plane-strain" and not an.zero_energy:
        out["volumetric"] = volumetric_index(name, variant, 1.0 if aspect is None else float(aspect))
    if distortion_spec:
        kind, value = parse_distortion(distortion_spec)
        out["distortion"] = distortion(name, variant, state, kind, value, 1.0 if aspect is None else float(aspect),
                                       0.3 if nu_value is None else float(nu_value))
    return out


def _clear_caches() -> None:
    from . import stiffness
    for fn in (_solve_exact, analyse, ratio_function, distortion_expression, skew_formula, compliance, element,
               catalog.shape_set,
               stiffness.rule_moment):
        fn.cache_clear()


def benchmark(quick: bool = False) -> dict:
    """Closed-form ratio per element (caches cleared) and a 200 x 200 chart grid, lambdify vs subs."""
    cases = [("Q4", "full"), ("Q4", "incompatible-centred"), ("Q4", "eas4"), ("Q8", "full")]
    if not quick:
        cases += [("Q4", "hybrid5"), ("Q9", "full"), ("T6", "full")]
    rows, lines = [], []
    for name, variant in cases:
        _clear_caches()
        t0 = time.perf_counter()
        locking_ratio(name, variant, "plane-stress")
        dt = time.perf_counter() - t0
        rows.append({"element": name, "variant": variant, "seconds": dt, "target_s": 5.0})
        lines.append(f"closed-form ratio {name} {variant} (plane stress, caches cleared): {dt:.2f} s (target < 5 s)")
    sym_rows = []
    for name, variant in ([("Q4", "full")] if quick else [("Q4", "full"), ("Q4", "eas4"), ("T6", "full")]):
        _clear_caches()
        t0 = time.perf_counter()
        red = _solve_exact(name, variant, "plane-stress").ratio
        t_red = time.perf_counter() - t0
        _clear_caches()
        t0 = time.perf_counter()
        direct = _solve_exact(name, variant, "plane-stress", symmetry=False).ratio
        t_dir = time.perf_counter() - t0
        agree = sp.cancel(red - direct) == 0
        sym_rows.append({"element": name, "variant": variant, "symmetry_s": t_red, "direct_s": t_dir, "agree": agree})
        lines.append(f"{name} {variant}: symmetry-reduced solve {t_red:.2f} s vs direct supported solve {t_dir:.2f} s "
                     f"(ratio {t_dir / t_red:.1f}x), results agree: {agree}")
    n = 60 if quick else 200
    expr = locking_ratio("Q4", "full", "plane-strain")
    ratio_function.cache_clear()
    rr, nn = np.meshgrid(np.logspace(0, math.log10(20), n), np.linspace(0, 0.499, n))
    t0 = time.perf_counter()
    Z = ratio_function("Q4", "full", "plane-strain")(rr, nn)
    t_lam = time.perf_counter() - t0
    sample = 100 if not quick else 20
    t0 = time.perf_counter()
    for k in range(sample):
        i, j = divmod(k * 37 % (n * n), n)
        float(expr.subs({r: rr[i, j], nu: nn[i, j]}))
    t_sub = (time.perf_counter() - t0) / sample * n * n
    lines.append(f"{n} x {n} (aspect, nu) grid from the closed form: lambdify {t_lam * 1000:.1f} ms (incl. lambdify; "
                 f"target < 1 s) vs point-by-point subs ~{t_sub:.1f} s (extrapolated from {sample} points), "
                 f"ratio ~{t_sub / t_lam:.0f}x")
    assert np.all(np.isfinite(Z))
    return {"rows": rows, "symmetry": sym_rows, "grid": {"n": n, "lambdify_s": t_lam, "subs_estimate_s": t_sub},
            "lines": lines, "command": "derive perf --locking"}
