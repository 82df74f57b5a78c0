"""Integration of a formulation's terms and static condensation.

Three routes, one formulation structure (:mod:`derive.formulations.base`):

* ``exact`` polynomial route: on affine geometry (rectangle, parallelogram, straight
  triangles) every integrand is a polynomial in xi, eta.  Operator entries are turned into
  sparse polynomials over the field Q(parameters) and integrated term by term from a
  moment table: the exact monomial integrals of the reference domain (closed form), or
  the rule's own moments sum_g w_g xi_g^p eta_g^q ("as the element's rule computes it",
  which is how reduced and selective rules are evaluated exactly).  No sympy.integrate,
  no simplify: the field arithmetic keeps every entry a cancelled rational function.
* ``points`` route: any geometry, symbolic or numeric; sum over the rule's points of
  w L^T M R detJ thick, unsimplified (general symbolic geometry, axisymmetric).
* ``numeric`` route (:func:`numeric_stiffness`): the per-point operator matrices for
  general symbolic coordinates are lambdified once per (element, variant, state) and
  evaluated in float64 for a batch of elements, then condensed with numpy.
"""
from __future__ import annotations

import re
from functools import cached_property, lru_cache

import numpy as np
import sympy as sp
from sympy.matrices.exceptions import NonInvertibleMatrixError
from sympy.polys.domains import QQ
from sympy.polys.matrices import DomainMatrix
from sympy.polys.matrices.exceptions import DMNonInvertibleMatrixError
from sympy.polys.rings import ring

from . import quadrature, reference
from .errors import GeometryError, InputError
from .formulations.base import Formulation, Point
from .geometry import IsoMap
from .output import Progress


# ---------------------------------------------------------------------------------------------
# moment tables

@lru_cache(maxsize=None)
def rule_moment(rule_name: str, *powers: int) -> sp.Expr:
    """sum_g w_g xi_g^p eta_g^q [zeta_g^r] for a named rule, exact (radicals cancelled).

    Tensor Gauss rules (line, square, cube) factor into 1-D moments (:func:`gauss_moment_1d`),
    which are rational and need no radicals; other rules sum over their exact points.
    """
    m = _GAUSS_NAME.fullmatch(rule_name.strip())
    if m:
        counts = [int(g) for g in m.groups() if g]
        if len(counts) == 1 and not rule_name.strip().startswith("gauss-line-"):
            counts = counts * 2  # "gauss-3" is the 3 x 3 square rule
        rl = quadrature.rule(rule_name)  # validates the point counts
        if len(counts) == len(powers) == rl.dim:
            return sp.Mul(*[gauss_moment_1d(n, k) for n, k in zip(counts, powers)])
    rl = quadrature.rule(rule_name)
    s = sum(w * sp.Mul(*[c ** k for c, k in zip(pt, powers)]) for pt, w in zip(rl.points, rl.weights))
    s = sp.nsimplify(sp.radsimp(sp.expand(s)))
    return s


_GAUSS_NAME = re.compile(r"gauss-(?:line-)?(\d+)(?:x(\d+))?(?:x(\d+))?")


@lru_cache(maxsize=None)
def gauss_moment_1d(n: int, p: int) -> sp.Rational:
    """sum_i w_i x_i^p of the n-point Gauss-Legendre rule, exactly, without its radical points.

    The points are the roots of the Legendre polynomial P_n.  Write x^p = s(x) P_n(x) + r(x)
    with deg r < n; the rule is exact to degree 2n - 1, so it integrates r exactly, and
    P_n(x_i) = 0 gives sum_i w_i x_i^p = sum_i w_i r(x_i) = int_{-1}^{1} r(x) dx (a rational).
    For p <= 2n - 1 this is just int x^p.  (The direct sum over CRootOf points took most of a
    minute for the 10-point rule.)
    """
    from .symbols import x as X
    if p <= 2 * n - 1:
        return sp.Rational(2, p + 1) if p % 2 == 0 else sp.Integer(0)
    rem = sp.rem(sp.Poly(X ** p, X, domain=QQ), sp.Poly(sp.legendre(n, X), X, domain=QQ))
    return sum((sp.Rational(2, k + 1) * c for (k,), c in rem.terms() if k % 2 == 0), sp.Integer(0))


def _moments(domain: str, rule_name: str | None):
    if rule_name is None:
        return lambda *powers: reference.monomial_integral(domain, *powers)
    return lambda *powers: rule_moment(rule_name, *powers)


# ---------------------------------------------------------------------------------------------
# exact polynomial route

class NotPolynomial(Exception):
    """An integrand is not a polynomial in the reference coordinates: the exact route does not apply."""


def _field(exprs, coords) -> object:
    syms = set()
    for e in exprs:
        syms |= getattr(e, "free_symbols", set())
    syms -= set(coords)
    syms = sorted(syms, key=lambda s: s.name)
    return QQ.frac_field(*syms) if syms else QQ


def _evaluate_terms(form: Formulation, imap: IsoMap, state: str, material: dict):
    """Evaluate L, M, R and the weight factor of every term at the symbolic point."""
    pt = Point(imap, state, *imap.coords, **material)
    out = []
    for term in form.terms:
        L = term.left(pt)
        M = term.middle(pt)
        Rm = L if term.symmetric and term.right is term.left else term.right(pt)
        g = pt.detJ * pt.thick * term.factor
        out.append((term, L, M, Rm, g))
    return out


def exact_blocks(form: Formulation, imap: IsoMap, state: str, material: dict, rule_for) -> dict:
    """Blocks as DomainMatrix over one field, by the exact polynomial route.

    ``rule_for(term)`` returns a rule name, or None for exact integration over the domain.
    Raises :class:`NotPolynomial` when an integrand is not polynomial.
    """
    coords = imap.coords
    evaluated = _evaluate_terms(form, imap, state, material)
    everything = []
    for term, L, M, Rm, g in evaluated:
        if M.free_symbols & set(coords):
            raise NotPolynomial("material matrix varies over the element")
        everything += list(L) + list(M) + list(Rm) + [g]
    F = _field(everything, coords)
    Rg = ring(list(coords), F)[0]

    def conv(e):
        try:
            return Rg.from_expr(sp.expand(e)) if e != 0 else Rg.zero
        except Exception as exc:  # sympy raises several types for non-polynomials
            raise NotPolynomial(str(e)) from exc

    blocks: dict[str, DomainMatrix] = {}
    for term, L, M, Rm, g in evaluated:
        moments = _moments(imap.shapes.domain, rule_for(term))
        mom_cache: dict = {}

        def integral(poly):
            total = F.zero
            for key, coeff in poly.terms():
                if key not in mom_cache:
                    mom_cache[key] = F.convert(moments(*key))
                mk = mom_cache[key]
                if mk:
                    total += coeff * mk
            return total

        gp = conv(g)
        Lp = {(k, i): conv(L[k, i]) for k in range(L.rows) for i in range(L.cols) if L[k, i] != 0}
        Rp = {(l, j): conv(Rm[l, j]) * gp for l in range(Rm.rows) for j in range(Rm.cols) if Rm[l, j] != 0}
        Mf = {(k, l): F.from_sympy(M[k, l]) for k in range(M.rows) for l in range(M.cols) if M[k, l] != 0}
        rows, cols = L.cols, Rm.cols
        out = None
        if hasattr(F, "field"):  # symbolic parameters: the lifted route (plain QQ entries need none)
            try:
                out = _lifted_products(F, coords, Lp, Rp, Mf, rows, cols, term.symmetric, moments)
            except _IrrationalMoment:
                out = None
        if out is not None:
            dm = DomainMatrix(out, (rows, cols), F)
            blocks[term.block] = blocks[term.block] + dm if term.block in blocks else dm
            continue
        out = [[F.zero] * cols for _ in range(rows)]
        for (k, i), lp in Lp.items():
            for (l, j), rp in Rp.items():
                if term.symmetric and j < i:
                    continue
                mkl = Mf.get((k, l))
                if mkl is None:
                    continue
                out[i][j] += mkl * integral(lp * rp)
        if term.symmetric:
            for i in range(rows):
                for j in range(i):
                    out[i][j] = out[j][i]
        dm = DomainMatrix(out, (rows, cols), F)
        blocks[term.block] = blocks[term.block] + dm if term.block in blocks else dm
    return blocks


class _IrrationalMoment(Exception):
    """A rule moment is not rational: the lifted route does not apply (the field route does)."""


def _lifted_products(F, coords, Lp: dict, Rp: dict, Mf: dict, rows: int, cols: int, symmetric: bool, moments):
    """sum_kl M_kl int L_ki R_lj for every (i, j), with the products formed over QQ.

    Each operator entry (a polynomial in the reference coordinates with coefficients in the field
    Q(parameters)) is lifted to numerator / denominator with a numerator in QQ[coordinates,
    parameters]; products and the moment integration are then plain polynomial arithmetic, the
    contributions are grouped by (M entry, denominators) and each matrix entry is formed as one
    fraction and cancelled once.  Mathematically the same field element as summing field
    products pair by pair, far fewer gcds (the 3-D closed forms need this)."""
    Q = F.field.ring                        # QQ[parameters]
    nc = len(coords)
    P = ring(list(coords) + list(Q.symbols), sp.QQ)[0] if Q.symbols else ring(list(coords), sp.QQ)[0]
    dens: list = []
    den_index: dict = {}
    lcm_cache: dict = {}

    def key_of(p):
        return tuple(sorted(p.items()))

    def lcm(p, q):
        if p == q or q == Q.one:
            return p
        if p == Q.one:
            return q
        k = (key_of(p), key_of(q))
        hit = lcm_cache.get(k)
        if hit is None:
            hit = lcm_cache[k] = p.lcm(q)
        return hit

    def lift(poly):
        terms = list(poly.terms())
        den = Q.one
        for _, coeff in terms:
            den = lcm(den, coeff.denom)
        data = {}
        for cexp, coeff in terms:
            scaled = coeff.numer * den.exquo(coeff.denom) if coeff.denom != den else coeff.numer
            for pexp, c in scaled.terms():
                data[tuple(cexp) + tuple(pexp)] = data.get(tuple(cexp) + tuple(pexp), 0) + c
        key = tuple(sorted(den.items()))
        if key not in den_index:
            den_index[key] = len(dens)
            dens.append(den)
        return P.from_dict(data) if data else P.zero, den_index[key]

    mom_cache: dict = {}

    def integrate(prod) -> dict:
        acc: dict = {}
        for exp, c in prod.terms():
            cexp, pexp = exp[:nc], exp[nc:]
            m = mom_cache.get(cexp)
            if m is None:
                value = sp.sympify(moments(*cexp))
                if not value.is_Rational:
                    raise _IrrationalMoment(str(value))
                m = mom_cache[cexp] = sp.QQ.convert(value)
            if m:
                acc[pexp] = acc.get(pexp, 0) + c * m
        return acc

    Ll = {key: lift(p) for key, p in Lp.items()}
    Rl = {key: lift(p) for key, p in Rp.items()}
    groups: dict = {}
    for (k, i), (lnum, ldi) in Ll.items():
        for (l, j), (rnum, rdi) in Rl.items():
            if symmetric and j < i:
                continue
            mkl = Mf.get((k, l))
            if mkl is None:
                continue
            acc = integrate(lnum * rnum)
            if not acc:
                continue
            g = groups.setdefault((i, j), {}).setdefault((k, l, ldi, rdi), {})
            for pexp, c in acc.items():
                g[pexp] = g.get(pexp, 0) + c
    out = [[F.zero] * cols for _ in range(rows)]
    for (i, j), parts in groups.items():
        terms = []
        for (k, l, ldi, rdi), data in parts.items():
            mkl = Mf[(k, l)]
            poly = Q.from_dict({p: c for p, c in data.items() if c}) if Q.symbols else Q(sum(data.values()))
            if poly:
                terms.append((mkl.numer * poly, mkl.denom * dens[ldi] * dens[rdi]))
        if not terms:
            continue
        by_den: dict = {}
        for n_, d in terms:
            k = key_of(d)
            if k in by_den:
                by_den[k][1] += n_
            else:
                by_den[k] = [d, n_]
        lcd = Q.one
        for d, _ in by_den.values():
            lcd = lcm(lcd, d)
        num = Q.zero
        for d, n_ in by_den.values():
            num += n_ if d == lcd else n_ * lcd.exquo(d)
        out[i][j] = F.field.new(num, lcd)
    if symmetric:
        for i in range(rows):
            for j in range(i):
                out[i][j] = out[j][i]
    return out


def condense_exact(blocks: dict, ndof: int, n_internal: int, form: Formulation | None = None,
                   rule: str = "") -> sp.Matrix:
    """K = K_uu - K_ua K_aa^-1 K_ua^T in exact field arithmetic, returned as a sympy Matrix.

    A singular K_aa (a rule too weak for the internal modes) raises :class:`SingularInternalBlock`.
    """
    F = next(iter(blocks.values())).domain
    Kuu = blocks.get("uu", DomainMatrix.zeros((ndof, ndof), F))
    if n_internal:
        Kua, Kaa = blocks["ua"], blocks["aa"]
        try:
            X = Kaa.lu_solve(Kua.transpose())
        except DMNonInvertibleMatrixError:
            raise singular_block_error(form, rule, Kaa.rank(), n_internal) from None
        Kuu = Kuu - Kua * X
    return Kuu.to_Matrix()


class SingularInternalBlock(InputError):
    """The condensed internal block K_aa is singular: the rule chosen cannot integrate the
    variant's internal modes (e.g. eas4 or incompatible modes with a 1-point rule)."""


def rule_label(el, rule: str) -> str:
    """The rule as the user chose it, for messages ("element" shows the element's own rules)."""
    if rule == "element":
        return "the element's own rules (" + ", ".join(el.info.rule_name(r) for r in el.formulation.rules()) + ")"
    return rule


def singular_block_error(form: Formulation | None, rule: str, rank: int, n: int,
                         where: str = "") -> SingularInternalBlock:
    """The one-line message for a singular K_aa: which block, its rank, and why."""
    variant = form.variant if form is not None else "this variant"
    label = next((t.label for t in form.terms if t.block == "aa" and t.label), "") if form is not None else ""
    block = f"K_aa ({n} x {n}{', ' + label if label else ''})"
    return SingularInternalBlock(
        f"variant {variant}{' with rule ' + rule if rule else ''}{where}: the internal block {block} is singular "
        f"(rank {rank} of {n}): the rule is too weak to integrate the variant's internal modes; "
        "use the element's own rule (--rule element) or a stronger Gauss rule")


# ---------------------------------------------------------------------------------------------
# point route

def point_blocks(form: Formulation, imap: IsoMap, state: str, material: dict, rule_for_name) -> dict:
    """Blocks as sympy matrices by summing over each term's rule points (any geometry)."""
    blocks: dict[str, sp.Matrix] = {}
    points_cache: dict = {}
    rules = [quadrature.rule(rule_for_name(term)) for term in form.terms]
    total = sum(rl.npoints for rl in rules)
    progress = Progress(total, "integrating") if total > PROGRESS_POINTS else None
    for term, rl in zip(form.terms, rules):
        acc = None
        for key, w in _rule_points(rl, imap.geometry.numeric):
            if progress:
                progress.step(term.label)
            if key not in points_cache:
                points_cache[key] = Point(imap, state, *key, **material)
            pt = points_cache[key]
            L = term.left(pt)
            M = term.middle(pt)
            Rm = L if term.symmetric and term.right is term.left else term.right(pt)
            contrib = (L.T * M * Rm) * (w * pt.detJ * pt.thick * term.factor)
            acc = contrib if acc is None else acc + contrib
        blocks[term.block] = acc if term.block not in blocks else blocks[term.block] + acc
    if progress:
        progress.close()
    return blocks


#: the point route shows progress on a terminal beyond this many points in all terms
PROGRESS_POINTS = 24


def _rule_points(rl, numeric: bool):
    """The rule's points and weights; 30-digit Floats for numeric geometry, where exact radicals
    would only slow the arithmetic down without making the float result any better."""
    if not numeric:
        return list(zip(rl.points, rl.weights))
    return [(tuple(sp.Float(c.evalf(30), 30) for c in pt), sp.Float(w.evalf(30), 30))
            for pt, w in zip(rl.points, rl.weights)]


def condense_symbolic(blocks: dict, ndof: int, n_internal: int, form: Formulation | None = None,
                      rule: str = "") -> sp.Matrix:
    """K = K_uu - K_ua K_aa^-1 K_ua^T with sympy matrices (point route)."""
    Kuu = blocks.get("uu", sp.zeros(ndof, ndof))
    if n_internal:
        Kua, Kaa = blocks["ua"], blocks["aa"]
        rank = _numeric_rank(Kaa)
        if rank is not None and rank < n_internal:
            raise singular_block_error(form, rule, rank, n_internal)
        try:
            Kuu = Kuu - Kua * Kaa.LUsolve(Kua.T)
        except (NonInvertibleMatrixError, ZeroDivisionError):
            raise singular_block_error(form, rule, Kaa.rank(), n_internal) from None
    return Kuu


def _numeric_rank(A: sp.Matrix, rtol: float = 1e-10) -> int | None:
    """Rank of a numeric sympy matrix from its singular values (None when A is symbolic)."""
    if A.free_symbols:
        return None
    return _rank_float(np.array(A.evalf(30).tolist(), dtype=float), rtol)


def _rank_float(A: np.ndarray, rtol: float = 1e-10) -> int:
    s = np.linalg.svd(A, compute_uv=False)
    return int(np.sum(s > rtol * s.max())) if s.size and s.max() > 0 else 0


# ---------------------------------------------------------------------------------------------
# numeric route

class SlotPoint(Point):
    """A point whose geometric quantities (J, det J, dN/dx, J0, det J0, radius) are plain symbols
    ("slots"), filled in numerically per element: the operators of any variant then stay small
    expressions in a few symbols however many nodes the element has (3-D numeric route)."""

    def __init__(self, imap, state, point, slots: dict):
        super().__init__(imap, state, *point)
        self.slots = slots

    @cached_property
    def J(self):
        return self.slots["J"]

    @cached_property
    def detJ(self):
        return self.slots["detJ"]

    @cached_property
    def dN(self):
        return self.slots["dN"]

    @cached_property
    def radius(self):
        return self.slots["r"]

    @cached_property
    def J0(self):
        return self.slots["J0"]

    @cached_property
    def detJ0(self):
        return self.slots["detJ0"]


def _slots(dim: int, n: int) -> dict:
    J = sp.Matrix(dim, dim, lambda i, j: sp.Symbol(f"J_{i}{j}"))
    J0 = sp.Matrix(dim, dim, lambda i, j: sp.Symbol(f"J0_{i}{j}"))
    dN = tuple(tuple(sp.Symbol(f"dN_{k}_{i}") for i in range(n)) for k in range(dim))
    return {"J": J, "detJ": sp.Symbol("detJ"), "dN": dN, "r": sp.Symbol("r_"), "J0": J0, "detJ0": sp.Symbol("detJ0")}


def _slot_args(slots: dict) -> list:
    from .symbols import E, nu, t
    return (list(slots["J"]) + [slots["detJ"]] + [v for row in slots["dN"] for v in row] + list(slots["J0"])
            + [slots["detJ0"], slots["r"], E, nu, t])


def _slot_values(shapes, point, X: np.ndarray, centre_J: np.ndarray, centre_det: np.ndarray, E, nu, t) -> list:
    """Numeric slot values at one reference point for a batch X (n, nodes, dim)."""
    sub = dict(zip(shapes.coords, point))
    dref = np.array([[float(f.subs(sub)) if f.free_symbols else float(f) for f in d] for d in shapes.derivatives])
    Nv = np.array([float(f.subs(sub)) if f.free_symbols else float(f) for f in shapes.functions])
    J = np.einsum("an,enj->eaj", dref, X)                 # J[a, j] = dx_j / dxi_a
    det = np.linalg.det(J)
    dN = np.linalg.solve(J, np.broadcast_to(dref, (X.shape[0],) + dref.shape))  # J^-1 dN/dxi
    r = X[:, :, 0] @ Nv
    dim, n = dref.shape
    vals = [J[:, i, j] for i in range(dim) for j in range(dim)] + [det]
    vals += [dN[:, k, i] for k in range(dim) for i in range(n)]
    vals += [centre_J[:, i, j] for i in range(dim) for j in range(dim)] + [centre_det, r, E, nu, t]
    return vals


@lru_cache(maxsize=None)
def _numeric_plan(element_key: tuple):
    """Lambdified per-point operator matrices (cached per element, variant, state).

    2-D: for general symbolic coordinates (the route the committed 2-D results come from);
    other dimensions: on :class:`SlotPoint` symbols, filled numerically per element."""
    from .element import element as make_element  # local import: element.py imports this module
    name, variant, state = element_key
    el = make_element(name, variant, state)
    imap = el.map("general")
    from .symbols import E, nu, t
    slotted = el.dim != 2
    slots = _slots(el.dim, el.info.n_nodes) if slotted else None
    args = _slot_args(slots) if slotted else [v for axis in imap.geometry.axes for v in axis] + [E, nu, t]
    plan = []
    for term in el.formulation.terms:
        rl = quadrature.rule(el.info.rule_name(term.rule))
        pts_np, w_np = rl.numeric()
        funcs = []
        for point in rl.points:
            if slotted:
                pt = SlotPoint(imap, state, point, slots)
            else:
                pt = Point(imap, state, *(sp.Float(c.evalf(30), 30) for c in point))
            L = term.left(pt)
            M = term.middle(pt)
            Rm = L if term.symmetric and term.right is term.left else term.right(pt)
            scale = pt.detJ * pt.thick * term.factor
            flat = list(L) + list(M) + list(Rm) + [scale]
            f = sp.lambdify(args, flat, "numpy", cse=True)
            if slotted:
                f = _from_coordinates(f, el.shapes, point)
            funcs.append((f, L.shape, M.shape, Rm.shape))
        plan.append((term.block, funcs, w_np))
    return el.ndof, el.formulation.n_internal, plan


def _from_coordinates(inner, shapes, point):
    """Wrap a slot-lambdified function so that it takes nodal coordinates by axis, then E, nu, t
    (the argument list of the 2-D route): the slots are computed here with numpy."""
    from . import reference
    c0 = reference.centre(shapes.domain)
    dref0 = np.array([[float(f.subs(dict(zip(shapes.coords, c0)))) for f in d] for d in shapes.derivatives])
    nn, dim = shapes.n, shapes.dim

    def f(*args):
        X = np.stack([np.stack([np.broadcast_to(np.asarray(args[k * nn + i], dtype=float), np.shape(args[0]))
                                for i in range(nn)], axis=-1) for k in range(dim)], axis=-1)
        X = X.reshape(-1, nn, dim)
        J0 = np.einsum("an,enj->eaj", dref0, X)
        E, nu, t = args[dim * nn:]
        return inner(*_slot_values(shapes, point, X, J0, np.linalg.det(J0), E, nu, t))
    return f


def catalog_shape_set(name: str):
    from .catalog import shape_set
    return shape_set(name)


def numeric_stiffness(name: str, variant: str, state: str, xy, E: float, nu: float, t: float = 1.0) -> np.ndarray:
    """Float64 stiffness of one element (xy: (nodes, dim)) or a batch (xy: (n, nodes, dim)).

    Evaluates the same formulation terms as the symbolic routes, point by point, then
    condenses internal unknowns with numpy.  A reference implementation, not a fast kernel.
    """
    from .geometry import check_coordinates
    from .material import check_material
    check_material(state, E, nu, t)
    shapes = catalog_shape_set(name)
    nn, dim = shapes.n, shapes.dim
    xy = check_coordinates(xy, axisymmetric=state == "axisymmetric", dim=dim)
    single = xy.ndim == 2
    if single:
        xy = xy[None]
    ndof, n_int, plan = _numeric_plan((name, variant, state))
    if xy.shape[1] != nn:
        raise InputError(f"element {name} needs {nn} nodes per element, as an ({nn}, {dim}) or "
                         f"(n, {nn}, {dim}) array; got shape {xy.shape[1:] if single else xy.shape}")
    n = xy.shape[0]
    args = [xy[:, i, k] for k in range(xy.shape[2]) for i in range(xy.shape[1])] + [E, nu, t]
    blocks: dict[str, np.ndarray] = {}
    # a degenerate element divides by det J = 0: no RuntimeWarning, it is refused below by index
    with np.errstate(all="ignore"):
        for block, funcs, weights in plan:
            for (f, ls, ms, rs), w in zip(funcs, weights):
                vals = [np.broadcast_to(np.asarray(v, dtype=float), (n,)) for v in f(*args)]
                k1, k2, k3 = ls[0] * ls[1], ms[0] * ms[1], rs[0] * rs[1]
                L = np.stack(vals[:k1], axis=1).reshape(n, *ls)
                M = np.stack(vals[k1:k1 + k2], axis=1).reshape(n, *ms)
                Rm = np.stack(vals[k1 + k2:k1 + k2 + k3], axis=1).reshape(n, *rs)
                scale = vals[-1]
                contrib = np.einsum("nki,nkl,nlj->nij", L, M, Rm) * (w * scale)[:, None, None]
                blocks[block] = blocks[block] + contrib if block in blocks else contrib
    finite = np.all([np.all(np.isfinite(B.reshape(n, -1)), axis=1) for B in blocks.values()], axis=0)
    if not np.all(finite):
        k = int(np.flatnonzero(~finite)[0])
        where = f"element {k} of the batch" if n > 1 else "the element"
        raise GeometryError(f"{name} {variant}: {where} gives a stiffness that is not finite (det J = 0 at a rule "
                            "point: collapsed or degenerate nodes); screen the nodes with Element.validity")
    K = blocks.get("uu", np.zeros((n, ndof, ndof)))
    if n_int:
        Kua, Kaa = blocks["ua"], blocks["aa"]
        _check_internal_blocks(Kaa, name, variant, state)
        K = K - Kua @ np.linalg.solve(Kaa, np.transpose(Kua, (0, 2, 1)))
    return K[0] if single else K


def _check_internal_blocks(Kaa: np.ndarray, name: str, variant: str, state: str) -> None:
    """Refuse a batch in which some element's K_aa is singular (numerically), naming the element."""
    s = np.linalg.svd(Kaa, compute_uv=False)
    top = s.max(axis=1)
    rank = np.sum(s > 1e-10 * top[:, None], axis=1)
    bad = np.nonzero((rank < Kaa.shape[1]) | ~np.isfinite(top) | (top == 0))[0]
    if bad.size:
        from .element import element as make_element
        el = make_element(name, variant, state)
        where = f" (element {int(bad[0])} of the batch)" if Kaa.shape[0] > 1 else ""
        rules = rule_label(el, "element")
        raise singular_block_error(el.formulation, rules, int(rank[bad[0]]), Kaa.shape[1], where)

