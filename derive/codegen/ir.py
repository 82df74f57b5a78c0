"""Kernel intermediate representation: a formulation turned into staged straight-line code.

The generator consumes the :class:`~derive.formulations.base.Formulation` structure only:
every term ``factor * int L^T M R detJ thick`` is evaluated at a *symbolic* point of the
reference domain, with a :class:`KernelPoint` whose Jacobian, det J, physical shape
function derivatives, radius and centre Jacobian are plain symbols.  The operators of any
variant (B, D, bubble modes, enhanced strains, stress modes, ...) then come out as small
expressions in those symbols, and each subexpression is filed under the stage where it
can be computed once:

==========  ====================================================================
stage       depends on
==========  ====================================================================
material    E, nu, t only (once per call)
element     nodal coordinates (and material): map coefficients, centre Jacobian
point       the quadrature point: J, det J, dN/dx, radius, per-term products
constant    the reference point only (xi, eta, the weight): numbers per point
==========  ====================================================================

Per point the work is structured as S = (w det J thick factor) M (a few products),
T = S R (sparse: only non-zero entries of R), then L^T T accumulated into the block
(upper triangle only for symmetric terms).  Blocks are the formulation's uu, ua, aa; a
formulation with internal unknowns is condensed after the point loop with an unrolled
LDL^T (or LU) of the small aa block.  The printers (:mod:`.printers`) and templates turn
the IR into NumPy, C and Fortran: C/Fortran unroll the points with the constants folded,
NumPy evaluates all points of a rule at once on (points, elements) arrays.
"""
from __future__ import annotations

from dataclasses import dataclass, field
from functools import cached_property

import sympy as sp

from .. import catalog, kinematics, quadrature
from ..errors import InputError
from ..formulations.base import Point
from ..geometry import IsoMap, make_geometry
from ..symbols import E as E_sym
from ..symbols import eta, nu as nu_sym, t as t_sym, xi

MAT, ELEM, PC, PT = "mat", "elem", "pc", "pt"

#: the weight of the current quadrature point (a point constant)
W = sp.Symbol("w")


@dataclass
class Group:
    """Statements evaluated at every point of one rule (templates in point constants)."""

    rule: str
    points: tuple          # exact (xi, eta) pairs
    weights: tuple         # exact weights
    stmts: list = field(default_factory=list)   # (symbol, expr) point-stage definitions
    accs: list = field(default_factory=list)    # (accumulator symbol, expr, op) op: "add" | "min"
    outs: list = field(default_factory=list)    # (output name, index tuple, expr): per-point outputs

    @property
    def npoints(self) -> int:
        return len(self.points)


@dataclass
class Function:
    """One kernel function: material / element stages, point groups, tail, outputs."""

    name: str
    mat: list            # (symbol, expr) in E, nu, t
    elem: list           # (symbol, expr) in nodal coordinates (+ material symbols)
    groups: list         # Group
    accumulators: list   # (symbol, op) in declaration order
    tail: list           # (symbol, expr) after the point loop (condensation, solves)
    outputs: dict        # output name -> list of (index tuple, expr)
    shapes: dict         # output name -> shape tuple
    inputs: tuple        # "xy", "u", "E", "nu", "t"
    post: list = field(default_factory=list)   # groups evaluated after the tail (per-point outputs)


class Hoister:
    """Files maximal subexpressions under the stage that can compute them once."""

    def __init__(self, categories: dict):
        self.cat = dict(categories)          # symbol -> category
        self.defs = {MAT: [], ELEM: [], PC: []}
        self._memo = {}
        self._counts = {MAT: 0, ELEM: 0, PC: 0}
        self._prefix = {MAT: "m", ELEM: "e", PC: "c"}
        self._cats_memo = {}

    def cats(self, expr) -> frozenset:
        key = expr
        hit = self._cats_memo.get(key)
        if hit is not None:
            return hit
        out = set()
        for s in expr.free_symbols:
            c = self.cat.get(s)
            if c is None:
                raise InputError(f"kernel generator: symbol {s} in a formulation operator is not a known input, "
                                 "material or point quantity")
            out.add(c)
        res = frozenset(out)
        self._cats_memo[key] = res
        return res

    @staticmethod
    def level(c: frozenset):
        if not c:
            return None
        if c <= {MAT}:
            return MAT
        if c <= {PC}:
            return PC
        if c <= {MAT, ELEM}:
            return ELEM
        return None

    def define(self, level: str, expr) -> sp.Symbol:
        key = (level, expr)
        hit = self._memo.get(key)
        if hit is not None:
            return hit
        if level == ELEM:
            expr = self._hoist(expr, inner=True)
        sym = sp.Symbol(f"{self._prefix[level]}{self._counts[level]}")
        self._counts[level] += 1
        self.cat[sym] = level
        self.defs[level].append((sym, expr))
        self._memo[key] = sym
        return sym

    def hoist(self, expr):
        return self._hoist(sp.sympify(expr), inner=False)

    def _hoist(self, expr, inner: bool):
        if expr.is_Atom:
            return expr
        c = self.cats(expr)
        lev = self.level(c)
        if lev is not None and not (inner and lev == ELEM):
            if inner and lev == PC:
                return expr
            return self.define(lev, expr)
        if expr.is_Add or expr.is_Mul:
            buckets = {PC: [], MAT: [], ELEM: []}
            nums, rest = [], []
            for a in expr.args:
                ca = self.cats(a) if not a.is_Number else frozenset()
                la = self.level(ca) if ca else None
                if not ca:
                    nums.append(a)
                elif la is not None and not (inner and la == ELEM):
                    buckets[la].append(a)
                else:
                    rest.append(self._hoist(a, inner))
            new = []
            if buckets[PC] and not inner:
                new.append(self._group(expr.func, nums + buckets[PC], PC))
            else:
                new += nums + buckets[PC]
            if buckets[MAT] and buckets[ELEM]:
                buckets[ELEM] += buckets[MAT]
                buckets[MAT] = []
            for lev2 in (MAT, ELEM):
                if buckets[lev2]:
                    new.append(self._group(expr.func, buckets[lev2], lev2))
            return expr.func(*(new + rest))
        return expr.func(*[self._hoist(a, inner) for a in expr.args])

    def _group(self, func, args, lev):
        if len(args) == 1 and args[0].is_Symbol:
            return args[0]
        return self.define(lev, func(*args))


class KernelPoint(Point):
    """A symbolic point whose geometric quantities are plain symbols (see module doc)."""

    def __init__(self, imap: IsoMap, state: str, ctx: "Builder"):
        super().__init__(imap, state, xi, eta, E_sym, nu_sym, t_sym)
        self.ctx = ctx

    @cached_property
    def J(self) -> sp.Matrix:
        return self.ctx.J

    @cached_property
    def detJ(self):
        return self.ctx.detJ

    @cached_property
    def dN(self):
        return self.ctx.dN

    def physical(self, dxi_vals, deta_vals):
        return self.ctx.physical(dxi_vals, deta_vals)

    @cached_property
    def radius(self):
        return self.ctx.r

    @cached_property
    def J0(self) -> sp.Matrix:
        return self.ctx.J0

    @cached_property
    def detJ0(self):
        return self.ctx.detJ0


class Builder:
    """Builds the IR of one (element, variant, state)."""

    def __init__(self, info, shapes, variant: str, state: str):
        self.info, self.shapes, self.variant, self.state = info, shapes, variant, state
        if shapes.dim != 2:
            raise InputError(f"kernels are generated for 2-D elements only so far; {info.name} is {shapes.dim}-D "
                             "(use Element.numeric_stiffness for a float64 reference)")
        self.form = catalog.formulation(info, variant, state)
        self.n = shapes.n
        self.ndof = 2 * shapes.n
        self.nint = int(self.form.n_internal)
        geom = make_geometry(shapes, "general")
        self.imap = IsoMap(shapes, geom)
        self.xs, self.ys = geom.xs, geom.ys
        cats = {s: ELEM for s in self.xs + self.ys}
        cats.update({E_sym: MAT, nu_sym: MAT, t_sym: MAT, xi: PC, eta: PC, W: PC})
        # point-stage symbols
        self.J = sp.Matrix(2, 2, [sp.Symbol(n) for n in ("J00", "J01", "J10", "J11")])
        self.detJ = sp.Symbol("detJ")
        self.idet = sp.Symbol("idet")
        self.r = sp.Symbol("r")
        self.J0 = sp.Matrix(2, 2, [sp.Symbol(n) for n in ("J0_00", "J0_01", "J0_10", "J0_11")])
        self.detJ0 = sp.Symbol("detJ0")
        self.Ji = sp.Matrix(2, 2, [sp.Symbol(n) for n in ("Ji00", "Ji01", "Ji10", "Ji11")])
        self.dN = (tuple(sp.Symbol(f"dNdx{i + 1}") for i in range(self.n)),
                   tuple(sp.Symbol(f"dNdy{i + 1}") for i in range(self.n)))
        for s in list(self.J) + list(self.Ji) + [self.detJ, self.idet, self.r] + list(self.dN[0] + self.dN[1]):
            cats[s] = PT
        for s in list(self.J0) + [self.detJ0]:
            cats[s] = ELEM
        self.H = Hoister(cats)
        self._tmp = 0
        self._pmemo = {}
        self._point_defs: list = []      # shared point definitions (J, detJ, idet, dN, r)
        self._elem_defs: list = []       # map coefficients, centre Jacobian
        self._map_and_point()
        self.pt = KernelPoint(self.imap, state, self)

    # ------------------------------------------------------------------ geometry
    def _map_and_point(self):
        """x(xi,eta) = sum_m X_m mono_m: X_m (element stage), J, det J, dN/dx (point stage)."""
        H = self.H
        coeff_syms = {}
        maps = []
        for coord, name in ((self.imap.x, "gx"), (self.imap.y, "gy")):
            poly = sp.Poly(coord, xi, eta)
            terms = []
            for k, (monom, coeff) in enumerate(sorted(poly.terms())):
                sym = sp.Symbol(f"{name}_{monom[0]}_{monom[1]}")
                H.cat[sym] = ELEM
                self._elem_defs.append((sym, coeff))
                terms.append((monom, sym))
                coeff_syms[sym] = coeff
            maps.append(terms)

        def deriv(terms, which):
            out = sp.Integer(0)
            for (p, q), sym in terms:
                if which == 0 and p:
                    out += H.hoist(p * xi ** (p - 1) * eta ** q) * sym
                elif which == 1 and q:
                    out += H.hoist(q * xi ** p * eta ** (q - 1)) * sym
            return out

        def deriv_at(terms, which, cx, cy):
            out = sp.Integer(0)
            for (p, q), sym in terms:
                if which == 0 and p:
                    out += p * cx ** (p - 1) * cy ** q * sym
                elif which == 1 and q:
                    out += q * cx ** p * cy ** (q - 1) * sym
            return out

        Xt, Yt = maps
        J = self.J
        # J = [[dx/dxi, dy/dxi], [dx/deta, dy/deta]]
        self._point_defs += [(J[0, 0], deriv(Xt, 0)), (J[0, 1], deriv(Yt, 0)),
                             (J[1, 0], deriv(Xt, 1)), (J[1, 1], deriv(Yt, 1))]
        self._point_defs.append((self.detJ, J[0, 0] * J[1, 1] - J[0, 1] * J[1, 0]))
        self._point_defs.append((self.idet, 1 / self.detJ))
        Ji = self.Ji  # J^-1 = adj(J) / det J
        self._point_defs += [(Ji[0, 0], self.idet * J[1, 1]), (Ji[0, 1], -self.idet * J[0, 1]),
                             (Ji[1, 0], -self.idet * J[1, 0]), (Ji[1, 1], self.idet * J[0, 0])]
        dxi, deta = self.shapes.derivatives
        dx, dy = self.physical(dxi, deta)
        for i in range(self.n):
            self._point_defs.append((self.dN[0][i], dx[i]))
            self._point_defs.append((self.dN[1][i], dy[i]))
        self._point_defs.append((self.r, sum((H.hoist(xi ** p * eta ** q) * s for (p, q), s in Xt), sp.Integer(0))))
        cx, cy = (sp.Integer(0), sp.Integer(0)) if self.shapes.domain == "square" else (sp.Rational(1, 3),) * 2
        J0 = self.J0
        self._elem_defs += [(J0[0, 0], deriv_at(Xt, 0, cx, cy)), (J0[0, 1], deriv_at(Yt, 0, cx, cy)),
                            (J0[1, 0], deriv_at(Xt, 1, cx, cy)), (J0[1, 1], deriv_at(Yt, 1, cx, cy))]
        self._elem_defs.append((self.detJ0, J0[0, 0] * J0[1, 1] - J0[0, 1] * J0[1, 0]))

    def physical(self, dxi_vals, deta_vals):
        """[d/dx, d/dy] = adj(J) [d/dxi, d/deta] / det J with the point's symbols."""
        H, Ji = self.H, self.Ji
        dx, dy = [], []
        for u, v in zip(dxi_vals, deta_vals):
            u, v = H.hoist(sp.sympify(u)), H.hoist(sp.sympify(v))
            dx.append(Ji[0, 0] * u + Ji[0, 1] * v)
            dy.append(Ji[1, 0] * u + Ji[1, 1] * v)
        return tuple(dx), tuple(dy)

    def stmt(self, stmts: list, prefix: str, expr) -> sp.Symbol:
        """Append a point statement (reusing an identical earlier one of the same list)."""
        memo = self._pmemo.setdefault(id(stmts), {})
        hit = memo.get(expr)
        if hit is not None:
            return hit
        s = self.tmp(prefix)
        stmts.append((s, expr))
        memo[expr] = s
        return s

    def tmp(self, prefix: str) -> sp.Symbol:
        s = sp.Symbol(f"{prefix}{self._tmp}")
        self._tmp += 1
        self.H.cat[s] = PT
        return s

    # ------------------------------------------------------------------ terms
    def block_shape(self, block):
        return {"uu": (self.ndof, self.ndof), "ua": (self.ndof, self.nint), "aa": (self.nint, self.nint)}[block]

    def symmetric_block(self, block) -> bool:
        if block == "ua":
            return False
        terms = [t for t in self.form.terms if t.block == block]
        return all(t.symmetric for t in terms)

    def term_products(self, term, stmts: list):
        """Statements for one term at the symbolic point; returns {(block, i, j): expr}."""
        H, pt = self.H, self.pt
        same = term.symmetric and term.right is term.left
        L = term.left(pt)
        M = term.middle(pt)
        R = L if same else term.right(pt)
        if L.rows != M.rows or M.cols != R.rows:
            raise InputError(f"term {term.label or term.block}: operator shapes {L.shape}, {M.shape}, {R.shape} "
                             "do not chain as L^T M R")
        L = L.applyfunc(H.hoist)
        R = L if same else R.applyfunc(H.hoist)
        M = M.applyfunc(H.hoist)
        scale = H.hoist(W * pt.detJ * pt.thick * term.factor)
        if not scale.is_Symbol:
            scale = self.stmt(stmts, "sc", scale)
        # S = scale * M
        S = {}
        for k in range(M.rows):
            for l in range(M.cols):
                m = M[k, l]
                if m == 0:
                    continue
                if m == 1:
                    S[k, l] = scale
                    continue
                S[k, l] = self.stmt(stmts, "s", scale * m)
        # T = S R, sparse
        Rnz = {}
        for l in range(R.rows):
            for j in range(R.cols):
                if R[l, j] != 0:
                    Rnz.setdefault(j, []).append(l)
        T = {}
        for j in range(R.cols):
            for k in range(M.rows):
                parts = [S[k, l] * R[l, j] for l in Rnz.get(j, ()) if (k, l) in S]
                if not parts:
                    continue
                expr = sp.Add(*parts)
                if len(parts) == 1 and parts[0].is_Symbol:
                    T[k, j] = expr
                    continue
                T[k, j] = self.stmt(stmts, "T", expr)
        sym_block = self.symmetric_block(term.block)
        out = {}
        Lnz = {}
        for k in range(L.rows):
            for i in range(L.cols):
                if L[k, i] != 0:
                    Lnz.setdefault(i, []).append(k)
        for i in range(L.cols):
            for j in range(R.cols):
                if term.symmetric and j < i:
                    continue
                parts = [L[k, i] * T[k, j] for k in Lnz.get(i, ()) if (k, j) in T]
                if not parts:
                    continue
                expr = sp.Add(*parts)
                keys = [(term.block, i, j)]
                if term.symmetric and not sym_block and j > i:
                    keys.append((term.block, j, i))  # a symmetric term inside a full block
                for key in keys:
                    out[key] = out.get(key, 0) + expr
        return out


# ---------------------------------------------------------------------------------------------
# condensation (unrolled, symbolic)

def _acc_symbol(block, i, j):
    return sp.Symbol({"uu": "K", "ua": "A", "aa": "H"}[block] + f"_{i}_{j}")


def factor_aa(H, m: int, symmetric: bool):
    """Unrolled LDL^T (symmetric) or Doolittle LU (general) of the m x m block, no pivoting.

    ``H(i, j)`` gives the entry (upper triangle suffices when symmetric).  Returns
    (statements, solver) where ``solver(rhs_columns)`` returns (statements, solutions) for a
    list of right-hand-side vectors.  No pivoting: the aa block of every catalogue variant is
    definite (positive for incompatible/enhanced modes, negative for B-bar/hybrid) on a
    valid element.
    """
    stmts = []
    if symmetric:
        Lf = {}
        d, idd = [], []
        for j in range(m):
            acc = H(j, j) - sp.Add(*[Lf[j, k] * Lf[j, k] * d[k] for k in range(j)])
            dj = sp.Symbol(f"cd{j}")
            stmts.append((dj, acc))
            ij = sp.Symbol(f"cid{j}")
            stmts.append((ij, 1 / dj))
            d.append(dj)
            idd.append(ij)
            for i in range(j + 1, m):
                f = H(j, i) - sp.Add(*[Lf[i, k] * Lf[j, k] * d[k] for k in range(j)])
                s = sp.Symbol(f"cL{i}_{j}")
                stmts.append((s, f * ij))
                Lf[i, j] = s

        def solve(cols, tag="y"):
            out_stmts, sols = [], []
            for c, b in enumerate(cols):
                y = []
                for k in range(m):
                    e = b[k] - sp.Add(*[Lf[k, j] * y[j] for j in range(k)])
                    s = sp.Symbol(f"c{tag}{k}_{c}")
                    out_stmts.append((s, e))
                    y.append(s)
                sols.append(y)
            return out_stmts, sols

        return stmts, solve, (Lf, d, idd)
    # general: Doolittle LU, L unit lower, U upper
    Lf, U = {}, {}
    for i in range(m):
        for j in range(i, m):
            e = H(i, j) - sp.Add(*[Lf[i, k] * U[k, j] for k in range(i)])
            s = sp.Symbol(f"cU{i}_{j}")
            stmts.append((s, e))
            U[i, j] = s
        iu = sp.Symbol(f"ciu{i}")
        stmts.append((iu, 1 / U[i, i]))
        U["inv", i] = iu
        for j in range(i + 1, m):
            e = (H(j, i) - sp.Add(*[Lf[j, k] * U[k, i] for k in range(i)])) * iu
            s = sp.Symbol(f"cL{j}_{i}")
            stmts.append((s, e))
            Lf[j, i] = s
    return stmts, None, (Lf, U)


def condensation(ir_blocks: dict, ndof: int, m: int, sym_uu: bool, sym_aa: bool):
    """Statements and the upper-triangle (or full) condensed K entries."""
    def H(i, j):
        if sym_aa and j < i:
            i, j = j, i
        return ir_blocks.get(("aa", i, j), sp.Integer(0))

    def A(i, k):
        return ir_blocks.get(("ua", i, k), sp.Integer(0))

    def Kuu(i, j):
        if sym_uu and j < i:
            i, j = j, i
        return ir_blocks.get(("uu", i, j), sp.Integer(0))

    out = {}
    if not m:
        for i in range(ndof):
            for j in range(ndof):
                if sym_uu and j < i:
                    continue
                out[i, j] = Kuu(i, j)
        return [], out, True
    stmts, solve, fac = factor_aa(H, m, sym_aa)
    if sym_aa:
        Lf, d, idd = fac
        s2, Y = solve([[A(i, k) for k in range(m)] for i in range(ndof)])
        stmts += s2
        Z = []
        for i in range(ndof):
            zi = []
            for k in range(m):
                s = sp.Symbol(f"cz{k}_{i}")
                stmts.append((s, Y[i][k] * idd[k]))
                zi.append(s)
            Z.append(zi)
        for i in range(ndof):
            for j in range(i, ndof):
                out[i, j] = Kuu(i, j) - sp.Add(*[Z[i][k] * Y[j][k] for k in range(m)])
        return stmts, out, True
    # general LU: X = H^-1 A^T (columns), K = Kuu - A X
    Lf, U = fac
    X = []
    for i in range(ndof):
        y = []
        for k in range(m):
            e = A(i, k) - sp.Add(*[Lf[k, j] * y[j] for j in range(k)])
            s = sp.Symbol(f"cy{k}_{i}")
            stmts.append((s, e))
            y.append(s)
        x = [None] * m
        for k in reversed(range(m)):
            e = (y[k] - sp.Add(*[U[k, j] * x[j] for j in range(k + 1, m)])) * U["inv", k]
            s = sp.Symbol(f"cx{k}_{i}")
            stmts.append((s, e))
            x[k] = s
        X.append(x)
    for i in range(ndof):
        for j in range(ndof):
            if sym_uu and j < i:
                continue
            out[i, j] = Kuu(i, j) - sp.Add(*[A(i, k) * X[j][k] for k in range(m)])
    return stmts, out, sym_uu


def solve_internal(ir_blocks: dict, ndof: int, m: int, sym_aa: bool, u_syms):
    """alpha = -K_aa^-1 K_ua^T u, unrolled: (statements, alpha symbols)."""
    def H(i, j):
        if sym_aa and j < i:
            i, j = j, i
        return ir_blocks.get(("aa", i, j), sp.Integer(0))

    stmts, solve, fac = factor_aa(H, m, sym_aa)
    b = []
    for k in range(m):
        s = sp.Symbol(f"cb{k}")
        stmts.append((s, -sp.Add(*[ir_blocks.get(("ua", i, k), 0) * u_syms[i] for i in range(ndof)])))
        b.append(s)
    alpha = [None] * m
    if sym_aa:
        Lf, d, idd = fac
        s2, (y,) = solve([b], tag="y")
        stmts += s2
        for k in reversed(range(m)):
            e = y[k] * idd[k] - sp.Add(*[Lf[j, k] * alpha[j] for j in range(k + 1, m)])
            s = sp.Symbol(f"alpha{k + 1}")
            stmts.append((s, e))
            alpha[k] = s
        return stmts, alpha
    Lf, U = fac
    y = []
    for k in range(m):
        e = b[k] - sp.Add(*[Lf[k, j] * y[j] for j in range(k)])
        s = sp.Symbol(f"cy{k}")
        stmts.append((s, e))
        y.append(s)
    for k in reversed(range(m)):
        e = (y[k] - sp.Add(*[U[k, j] * alpha[j] for j in range(k + 1, m)])) * U["inv", k]
        s = sp.Symbol(f"alpha{k + 1}")
        stmts.append((s, e))
        alpha[k] = s
    return stmts, alpha


# ---------------------------------------------------------------------------------------------
# the three kernel functions

@dataclass
class KernelIR:
    element: str
    variant: str
    state: str
    domain: str
    n_nodes: int
    ndof: int
    n_internal: int
    nstrain: int
    rules: dict              # term label/rule -> rule name
    full_rule: str
    functions: dict          # name -> Function
    description: str
    source: str
    xs: tuple
    ys: tuple


def _rule_group(rule_name: str) -> Group:
    rl = quadrature.rule(rule_name)
    return Group(rule=rule_name, points=rl.points, weights=rl.weights)


def build(info, shapes, variant: str, state: str) -> KernelIR:
    """IR of the stiffness, validity and recovery kernels of one element/variant/state."""
    b = Builder(info, shapes, variant, state)
    form = b.form
    # ---------------- stiffness
    groups: dict[str, Group] = {}
    contributions: dict[str, dict] = {}
    rules = {}
    for k, term in enumerate(form.terms):
        rname = info.rule_name(term.rule)
        rules[term.label or f"term {k + 1} ({term.block})"] = rname
        g = groups.setdefault(rname, _rule_group(rname))
        contrib = b.term_products(term, g.stmts)
        acc = contributions.setdefault(rname, {})
        for key, e in contrib.items():
            acc[key] = acc.get(key, 0) + e
    sym_uu, sym_aa = b.symmetric_block("uu"), b.symmetric_block("aa")
    accumulators = []
    seen = set()
    blocks = {}
    for rname, g in groups.items():
        for key in sorted(contributions[rname], key=_block_order):
            s = _acc_symbol(*key)
            if s not in seen:
                seen.add(s)
                accumulators.append((s, "add"))
            g.accs.append((s, contributions[rname][key], "add"))
            blocks[key] = s
    tail, Kout, sym_out = condensation(blocks, b.ndof, b.nint, sym_uu, sym_aa)
    Kentries = []
    for i in range(b.ndof):
        for j in range(b.ndof):
            if sym_out and j < i:
                Kentries.append(((i, j), ("mirror", (j, i))))
            else:
                Kentries.append(((i, j), Kout.get((i, j), sp.Integer(0))))
    shared_groups = list(groups.values())
    for g in shared_groups:
        g.stmts[:0] = list(b._point_defs)
    stiff = Function("stiffness", [], list(b._elem_defs), shared_groups, accumulators, tail,
                     {"K": Kentries}, {"K": (b.ndof, b.ndof)}, ("xy", "E", "nu", "t"))
    # ---------------- validity: min det J over the full rule's points
    vg = _rule_group(info.full_rule)
    vg.stmts = list(b._point_defs)
    dmin = sp.Symbol("dmin")
    vg.accs.append((dmin, b.detJ, "min"))
    valid = Function("validity", [], list(b._elem_defs), [vg], [(dmin, "min")], [],
                     {"detJ_min": [((), dmin)]}, {"detJ_min": ()}, ("xy",))
    # ---------------- recovery: strain and stress at the full rule's points
    nstr = kinematics.strain_rows(state)
    u_syms = tuple(sp.Symbol(f"u{i + 1}") for i in range(b.ndof))
    for s in u_syms:
        b.H.cat[s] = ELEM
    rec_tail, alpha = [], []
    rec_groups = []
    if b.nint:
        # the internal unknowns need the ua and aa blocks (the uu accumulations are pruned later)
        for g in shared_groups:
            g2 = Group(g.rule, g.points, g.weights, list(g.stmts),
                       [a for a in g.accs if not str(a[0]).startswith("K_")], [])
            rec_groups.append(g2)
        rec_tail, alpha = solve_internal(blocks, b.ndof, b.nint, sym_aa, u_syms)
        for s in alpha:
            b.H.cat[s] = ELEM
    rg = _rule_group(info.full_rule)
    rg.stmts = list(b._point_defs)
    pt = b.pt
    if form.strain is not None:
        Su, Sa = form.strain(pt)
    else:
        Su, Sa = pt.B, None
    Dm = pt.D
    eps = []
    for kk in range(nstr):
        e = sp.Add(*[b.H.hoist(Su[kk, j]) * u_syms[j] for j in range(b.ndof) if Su[kk, j] != 0])
        if Sa is not None and b.nint:
            e += sp.Add(*[b.H.hoist(Sa[kk, a]) * alpha[a] for a in range(b.nint) if Sa[kk, a] != 0])
        s = b.tmp("eps")
        rg.stmts.append((s, e))
        eps.append(s)
    for kk in range(nstr):
        rg.outs.append(("strain", (kk,), eps[kk]))
    for kk in range(nstr):
        e = sp.Add(*[b.H.hoist(Dm[kk, l]) * eps[l] for l in range(nstr) if Dm[kk, l] != 0])
        rg.outs.append(("stress", (kk,), e))
    npr = rg.npoints
    recov = Function("recovery", [], list(b._elem_defs), rec_groups,
                     [a for a in accumulators if not str(a[0]).startswith("K_")], rec_tail,
                     {"strain": [], "stress": []}, {"strain": (npr, nstr), "stress": (npr, nstr)},
                     ("xy", "u", "E", "nu"), post=[rg])
    # material and element hoisted definitions are shared by all three functions
    mat = list(b.H.defs[MAT])
    elem_h = list(b.H.defs[ELEM])
    for f in (stiff, valid, recov):
        f.mat = mat
        f.elem = f.elem + elem_h
    ir = KernelIR(element=info.name, variant=variant, state=state, domain=shapes.domain, n_nodes=b.n,
                  ndof=b.ndof, n_internal=b.nint, nstrain=nstr, rules=rules, full_rule=info.full_rule,
                  functions={"stiffness": stiff, "validity": valid, "recovery": recov},
                  description=form.description, source=form.source, xs=b.xs, ys=b.ys)
    ir.pc_defs = list(b.H.defs[PC])
    ir.u_syms = u_syms
    return ir


def _block_order(key):
    return ({"uu": 0, "ua": 1, "aa": 2}[key[0]], key[1], key[2])
