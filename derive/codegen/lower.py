"""Lowering of a kernel IR function to concrete statement lists (unrolled or vectorised).

* ``unrolled`` (C, Fortran): one block of statements per quadrature point with the point
  constants (shape-function derivatives, monomials, weights) folded in as numbers; copy
  propagation and constant folding after the substitution, optional CSE per point.
* ``vector`` (NumPy): one block per rule, evaluated on (points, elements) arrays with the
  point constants as (points, 1) arrays; sums over the points are reductions.

Both end with dead-code elimination, so a quantity no output needs is never computed
(the radius in a plane state, the centre Jacobian of a plain element, the uu block in
the recovery kernel).
"""
from __future__ import annotations

from dataclasses import dataclass, field

import sympy as sp
from sympy.simplify.cse_main import tree_cse

from ..symbols import eta, xi
from .ir import W, Function, KernelIR
from .printers import count_ops

_DIGITS = 30


@dataclass
class Block:
    title: str
    stmts: list                      # (symbol, expr)
    accs: list                       # (symbol, expr, op, first)
    outs: list                       # (name, index tuple, expr)
    pc: dict = field(default_factory=dict)   # vector mode: symbol -> list of point values
    npoints: int = 1
    rolled: bool = False                     # one template for all points (vector / loop)


@dataclass
class Lowered:
    name: str
    mode: str
    inputs: tuple
    mat: list
    elem: list
    accumulators: list               # (symbol, op)
    pre: list                        # blocks before the tail
    tail: list
    post: list                       # blocks after the tail
    outputs: dict                    # name -> list of (index, expr)
    shapes: dict
    used_inputs: set

    def flops(self) -> int:
        """Floating-point operations per element (a loop over points counts every point)."""
        n = sum(count_ops(e) for _, e in self.mat + self.elem + self.tail)
        for blk in self.pre + self.post:
            k = sum(count_ops(e) for _, e in blk.stmts)
            for _, e, op, first in blk.accs:
                k += count_ops(e) + (0 if first else 1)
            k += sum(count_ops(e) for _, _, e in blk.outs)
            n += k * (blk.npoints if blk.rolled else 1)
        for items in self.outputs.values():
            n += sum(count_ops(e) for _, e in items if not _is_mirror(e))
        return n


def _is_mirror(e) -> bool:
    return isinstance(e, tuple)


class PointValues:
    """Exact values of the point constants at the points of a rule, as 30-digit numbers."""

    def __init__(self, pc_defs: list):
        self.defs = dict(pc_defs)
        self._memo = {}

    def value(self, sym, p, q, w):
        key = (sym, p, q, w)
        hit = self._memo.get(key)
        if hit is not None:
            return hit
        if sym == xi:
            v = p
        elif sym == eta:
            v = q
        elif sym == W:
            v = w
        else:
            v = self.defs[sym].xreplace({xi: p, eta: q, W: w})
        v = _number(v)
        self._memo[key] = v
        return v


def _number(v):
    v = sp.sympify(v)
    if v.is_Rational:
        return v
    if not v.is_number:
        raise ValueError(f"point constant {v} is not a number")
    v = sp.expand(v) if v.has(sp.Pow) and not v.has(sp.CRootOf) else v
    if v.is_Rational:
        return v
    return sp.Float(sp.N(v, _DIGITS), _DIGITS)


def _free(e):
    return e.free_symbols if isinstance(e, sp.Basic) else set()


def _propagate(stmts, env):
    """Substitute env, fold constants, drop statements that became atoms (copy propagation)."""
    out = []
    for s, e in stmts:
        e2 = e.xreplace(env) if env else e
        if e2.is_Atom:
            env[s] = e2
            continue
        out.append((s, e2))
    return out


def _subst_block(blk: Block, env: dict):
    """Copy-propagate env through a block's statements, accumulations and outputs."""
    env = dict(env)
    blk.stmts = _propagate(blk.stmts, env)
    blk.accs = [(s, e.xreplace(env), op, f) for s, e, op, f in blk.accs]
    blk.accs = [a for a in blk.accs if a[1] != 0]
    blk.outs = [(n, i, e.xreplace(env)) for n, i, e in blk.outs]


def lower(ir: KernelIR, fn: Function, mode: str, cse: bool = True) -> Lowered:
    pv = PointValues(ir.pc_defs)
    pre = [b for g in fn.groups for b in _lower_group(g, pv, mode, cse)]
    zero_env = {}
    live_acc = {s for blk in pre for s, *_ in blk.accs}
    for s, op in fn.accumulators:
        if s not in live_acc:
            zero_env[s] = sp.Integer(0) if op == "add" else sp.oo
    tail = _propagate(fn.tail, zero_env)
    post = [b for g in fn.post for b in _lower_group(g, pv, mode, cse)]
    if zero_env:
        for blk in post:
            _subst_block(blk, zero_env)
    outputs = {}
    for name, items in fn.outputs.items():
        outputs[name] = [(idx, e if _is_mirror(e) else sp.sympify(e).xreplace(zero_env)) for idx, e in items]
    mat, elem = _propagate(fn.mat, {}), None
    env_elem = {}
    elem = _propagate(fn.elem, env_elem)
    if env_elem:  # element quantities that folded to atoms (e.g. a zero map coefficient)
        for blk in pre + post:
            _subst_block(blk, env_elem)
        tail = _propagate(tail, dict(env_elem))
    low = Lowered(fn.name, mode, fn.inputs, mat, elem, [a for a in fn.accumulators if a[0] not in zero_env],
                  pre, tail, post, outputs, fn.shapes, set())
    _dce(low)
    _mark_first(low)
    return low


#: C/Fortran ("mixed" mode): a rule is unrolled (constants folded per point) when
#: points x (accumulators + outputs) stays below this, else it becomes a loop over point
#: tables (same speed for larger elements, a fraction of the code and compile time)
UNROLL_MAX = 160


def _lower_group(g, pv: PointValues, mode: str, cse: bool) -> list:
    work = g.npoints * (len(g.accs) + len(g.outs))
    if mode == "vector" or (mode == "mixed" and work > UNROLL_MAX):
        title = (f"{g.rule}: all {g.npoints} points at once" if mode == "vector"
                 else f"{g.rule}: loop over the {g.npoints} points")
        blk = Block(title, list(g.stmts), [(s, e, op, False) for s, e, op in g.accs], list(g.outs),
                    npoints=g.npoints, rolled=True)
        if cse:
            _cse_block(blk)
        blk._points = (g.points, g.weights)
        blk._pv = pv
        return [blk]
    out = []
    for ip, ((p, q), w) in enumerate(zip(g.points, g.weights)):
        env = {}
        needed = set()
        for _, e in g.stmts:
            needed |= _free(e)
        for _, e, _ in g.accs:
            needed |= _free(e)
        for _, _, e in g.outs:
            needed |= _free(e)
        for s in needed:
            if s in pv.defs or s in (xi, eta, W):
                env[s] = pv.value(s, p, q, w)
        stmts = _propagate(g.stmts, env)
        accs = []
        for s, e, op in g.accs:
            e2 = e.xreplace(env)
            if e2 != 0:
                accs.append((s, e2, op, False))
        outs = [(n, (ip,) + idx, e.xreplace(env)) for n, idx, e in g.outs]
        title = (f"{g.rule} point {ip + 1} of {g.npoints}: xi = {_show(p)}, eta = {_show(q)}, "
                 f"weight = {_show(w)}")
        blk = Block(title, stmts, accs, outs)
        _local_dce(blk)
        if cse:
            _cse_block(blk)
        out.append(blk)
    return out


def _show(v) -> str:
    v = sp.sympify(v)
    if v.is_Rational:
        return str(v)
    return repr(float(sp.N(v, _DIGITS)))


def _local_dce(blk: Block):
    live = set()
    for _, e, *_ in blk.accs:
        live |= _free(e)
    for _, _, e in blk.outs:
        live |= _free(e)
    keep = []
    for s, e in reversed(blk.stmts):
        if s in live:
            keep.append((s, e))
            live |= _free(e)
    blk.stmts = keep[::-1]


def _cse_block(blk: Block):
    exprs = [e for _, e in blk.stmts] + [e for _, e, *_ in blk.accs] + [e for _, _, e in blk.outs]
    if not exprs:
        return
    taken = set()
    for s, _ in blk.stmts:
        taken.add(s.name)
    for e in exprs:
        taken |= {s.name for s in e.free_symbols}

    def names():
        k = 0
        while True:
            nm = f"q{k}"
            k += 1
            if nm not in taken:
                yield sp.Symbol(nm)

    # identical-subtree elimination only (sympy's tree_cse without the costly opt_cse
    # pre-pass): the staged IR leaves little else to find
    repl, red = tree_cse(exprs, names(), {}, "none", ())
    if not repl:
        return
    # place each CSE temporary right before its first use
    ns = len(blk.stmts)
    stmts_new = []
    placed = set()
    repl_deps = {s: e for s, e in repl}
    order = [s for s, _ in repl]

    def place(sym_set):
        for t in order:
            if t in sym_set and t not in placed:
                place(_free(repl_deps[t]))
                placed.add(t)
                stmts_new.append((t, repl_deps[t]))

    for k, (s, _) in enumerate(blk.stmts):
        e = red[k]
        place(_free(e))
        stmts_new.append((s, e))
    rest = red[ns:]
    for e in rest:
        place(_free(e))
    na = len(blk.accs)
    blk.accs = [(s, rest[k], op, f) for k, (s, _, op, f) in enumerate(blk.accs)]
    blk.outs = [(n, i, rest[na + k]) for k, (n, i, _) in enumerate(blk.outs)]
    blk.stmts = stmts_new
    _subst_block(blk, {})


def _dce(low: Lowered):
    live = set()
    for items in low.outputs.values():
        for _, e in items:
            if not _is_mirror(e):
                live |= _free(e)
    for blk in low.post:
        for _, _, e in blk.outs:
            live |= _free(e)
    # post blocks: their statements are local
    for blk in reversed(low.post):
        _local_dce(blk)
        for s, e in blk.stmts:
            live |= _free(e)
    keep = []
    for s, e in reversed(low.tail):
        if s in live:
            keep.append((s, e))
            live |= _free(e)
    low.tail = keep[::-1]
    for blk in reversed(low.pre):
        blk.accs = [a for a in blk.accs if a[0] in live]
        blk.outs = list(blk.outs)
        _local_dce(blk)
        local_defs = {s for s, _ in blk.stmts}
        for s, e in blk.stmts:
            live |= _free(e)
        for _, e, *_ in blk.accs:
            live |= _free(e)
        live -= local_defs
    low.pre = [b for b in low.pre if b.accs or b.outs]
    for blk in low.post:
        local_defs = {s for s, _ in blk.stmts}
        for s, e in blk.stmts:
            live |= _free(e)
    in_blocks = {s for b in low.pre for s, *_ in b.accs}
    low.accumulators = [a for a in low.accumulators if a[0] in in_blocks]
    keep = []
    for s, e in reversed(low.elem):
        if s in live:
            keep.append((s, e))
            live |= _free(e)
    low.elem = keep[::-1]
    low.used_inputs = {s.name for s in live}
    keep = []
    for s, e in reversed(low.mat):
        if s in live:
            keep.append((s, e))
            live |= _free(e)
    low.mat = keep[::-1]
    # vector mode: the point constants each block needs
    for blk in low.pre + low.post:
        if not blk.rolled:
            continue
        pcs = set()
        for _, e in blk.stmts:
            pcs |= _free(e)
        for _, e, *_ in blk.accs:
            pcs |= _free(e)
        for _, _, e in blk.outs:
            pcs |= _free(e)
        pv = blk._pv
        pts, wts = blk._points
        table, defs = {}, {}
        for s in sorted(pcs, key=_natural):
            if s in pv.defs or s in (xi, eta, W):
                table[s] = [pv.value(s, p, q, w) for (p, q), w in zip(pts, wts)]
                defs[s] = pv.defs.get(s, s)
        blk.pc = table
        blk.pc_defs = defs


def _natural(sym):
    import re
    m = re.fullmatch(r"([A-Za-z_]+)(\d+)", sym.name)
    return (m.group(1), int(m.group(2))) if m else (sym.name, -1)


def _mark_first(low: Lowered):
    """First contribution assigns; a loop over points needs its accumulators initialised."""
    seen = set()
    low.init = set()
    for blk in low.pre:
        new = []
        for s, e, op, _ in blk.accs:
            first = s not in seen
            if blk.rolled and low.mode != "vector":
                if first:
                    low.init.add(s)
                first = False
            new.append((s, e, op, first))
            seen.add(s)
        blk.accs = new
