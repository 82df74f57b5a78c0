"""Rendering of kernel IR into NumPy, C (source + header) and Fortran with jinja2 templates.

Output is deterministic: no dates, paths or hash-ordered iteration; numbers print as the
shortest round-trip float64 literal.  One source file per (element, variant, state, lang)
holds three kernels: stiffness, validity (min det J over the full rule's points) and
recovery (strain and stress at the full rule's points).
"""
from __future__ import annotations

import re
import textwrap
from dataclasses import dataclass
from functools import lru_cache

import jinja2

from .. import catalog, quadrature
from .version import GENERATOR_VERSION
from .ir import KernelIR, build
from .lower import Lowered, lower
from .printers import c_expr, f_expr, float_literal, py_expr, wrap_c, wrap_fortran

LANGS = ("numpy", "c", "fortran")
#: C batch kernels process this many elements at a time, transposed so that the element
#: index is the innermost (unit-stride, vectorisable) dimension.
C_LANES = 8
#: Fortran batch kernels likewise (lane index first in the scratch arrays)
F_LANES = 8
NUMPY_CHUNK = 2048
#: C/Fortran lowering: points unrolled with constants folded for small rules, a loop over
#: point tables for larger ones (see lower.UNROLL_MAX)
NATIVE_MODE = "mixed"


@lru_cache(maxsize=1)
def _env() -> jinja2.Environment:
    env = jinja2.Environment(loader=jinja2.PackageLoader("derive.codegen", "templates"),
                             undefined=jinja2.StrictUndefined, keep_trailing_newline=True,
                             trim_blocks=True, lstrip_blocks=True, autoescape=False)
    env.filters.update(py_str=py_str, py_doc=py_doc, c_comment=c_comment, f_comment=f_comment)
    return env


# ---------------------------------------------------------------------------------------------
# escaping of text literals per target language.  Names reaching the generator are validated
# (derive.spec.check_name), but every piece of text a template places in a string or a comment
# goes through one of these filters as well, so no text can close a string or a comment.

def _ascii_line(text: str) -> str:
    """One line of printable ASCII: non-ASCII as backslash escapes, control characters as '?'."""
    text = str(text).encode("ascii", "backslashreplace").decode("ascii")
    return "".join(c if " " <= c <= "~" else "?" for c in text)


def py_str(text: str) -> str:
    """A Python string literal (double-quoted, ASCII) holding exactly ``text``."""
    import json
    return json.dumps(str(text), ensure_ascii=True)   # JSON string escapes are Python string escapes


def py_doc(text: str) -> str:
    """``text`` safe inside a triple-double-quoted (non-raw) docstring, on one line."""
    out = []
    for c in str(text):
        if c in '\\"':
            out.append("\\" + c)
        elif " " <= c <= "~":
            out.append(c)
        else:                                   # \n, \x00, \xe9, \u2028 ...: escapes Python reads back
            out.append(c.encode("unicode_escape").decode("ascii"))
    return "".join(out)


def c_comment(text: str) -> str:
    """``text`` safe inside a C block comment: no comment delimiters, no backslash (line
    splicing), no trigraphs, one line of ASCII."""
    line = _ascii_line(text).replace("\\", "/")
    while "*/" in line or "/*" in line or "??" in line:
        line = line.replace("*/", "* /").replace("/*", "/ *").replace("??", "? ?")
    return line


def f_comment(text: str) -> str:
    """``text`` safe in a Fortran ``!`` comment: one line of printable ASCII."""
    return _ascii_line(text)


def check_identifier(name: str) -> str:
    """A kernel's file stem, which becomes C and Fortran identifiers: refuse anything else."""
    if not re.fullmatch(r"[a-z][a-z0-9_]*", name) or len(name) > 46:
        from ..errors import InputError
        raise InputError(f"kernel name {_ascii_line(name)[:60]!r} is not usable in C and Fortran identifiers "
                         "(a letter, then letters, digits or '_'; at most 46 characters)")
    return name


def stem(element: str, variant: str, state: str) -> str:
    raw = f"{element}_{variant}_{state}".lower()
    return re.sub(r"[^a-z0-9]+", "_", raw).strip("_")


@dataclass
class Source:
    """One generated file."""

    path: str      # relative path, e.g. "c/q4_full_plane_stress.c"
    text: str


@dataclass
class KernelSet:
    """All sources and the manifest entry of one (element, variant, state, lang)."""

    element: str
    variant: str
    state: str
    lang: str
    stem: str
    sources: list
    meta: dict


# ---------------------------------------------------------------------------------------------
# meta data shared by all languages

def _rule_text(name: str) -> str:
    rl = quadrature.rule(name)
    return f"{name} ({rl.npoints} point{'s' if rl.npoints != 1 else ''})"


def describe(ir: KernelIR, lows: dict) -> dict:
    nodes, ndof = ir.n_nodes, ir.ndof
    st = ir.state
    strains = ("eps_rr, eps_zz, eps_tt, gamma_rz" if st == "axisymmetric" else "eps_xx, eps_yy, gamma_xy")
    stresses = ("sigma_rr, sigma_zz, sigma_tt, tau_rz" if st == "axisymmetric" else "sigma_xx, sigma_yy, tau_xy")
    npr = quadrature.rule(ir.full_rule).npoints
    thick = ("thickness t (the out-of-plane thickness)" if st != "axisymmetric"
             else "ignored: axisymmetric kernels integrate over the full ring, thick = 2 pi r")
    return {
        "element": ir.element, "variant": ir.variant, "state": st,
        "description": ir.description, "source": ir.source,
        "nodes": nodes, "ndof": ndof, "n_internal": ir.n_internal, "nstrain": ir.nstrain,
        "rules": dict(ir.rules), "full_rule": ir.full_rule, "recovery_points": npr,
        "flops": {name: low.flops() for name, low in lows.items()},
        "inputs": {
            "xy": f"nodal coordinates, shape (n, {nodes}, 2), C order: xy[e, i, 0] = x and xy[e, i, 1] = y of "
                  f"node i+1 (counter-clockwise corners first, then mid-side, then interior)"
                  + ("; x is the radius r > 0" if st == "axisymmetric" else ""),
            "E": "Young's modulus (> 0), scalar",
            "nu": ("Poisson's ratio (-1 < nu <= 0.5), scalar" if st == "plane-stress"
                   else "Poisson's ratio (-1 < nu < 0.5), scalar"),
            "t": thick,
            "u": f"nodal displacements for recovery, shape (n, {ndof}), interleaved u1, v1, u2, v2, ...",
        },
        "outputs": {
            "K": f"stiffness, shape (n, {ndof}, {ndof}), DOFs interleaved u1, v1, u2, v2, ...; symmetric"
                 + (f"; the {ir.n_internal} internal unknowns are condensed" if ir.n_internal else ""),
            "detJ_min": "validity: min det J over the points of " + ir.full_rule + ", shape (n,); <= 0 means an "
                        "inverted or degenerate element",
            "strain": f"recovery: strain at the {npr} points of {ir.full_rule}, shape (n, {npr}, {ir.nstrain}), "
                      f"Voigt [{strains}] (engineering shear)",
            "stress": f"recovery: stress D strain at the same points, shape (n, {npr}, {ir.nstrain}), [{stresses}]",
        },
        "units": "any consistent set; K has units of E * length (plane) or E * length (ring, per radian x 2 pi)",
    }


def _wrap_header(lines: list[str], width: int = 96) -> list[str]:
    out = []
    for line in lines:
        if len(line) <= width:
            out.append(line)
            continue
        lead = len(line) - len(line.lstrip())
        key = line[lead:].split(" ", 1)[0]
        pos = line.find(key) + len(key)
        while pos < len(line) and line[pos] == " ":
            pos += 1
        out += textwrap.wrap(line, width=width, subsequent_indent=" " * pos, break_on_hyphens=False)
    return out


def header_lines(ir: KernelIR, meta: dict, lang: str) -> list[str]:
    st = ir.state
    rules = "; ".join(f"{label}: {_rule_text(r)}" for label, r in ir.rules.items())
    from ..output import CAUTION
    out = [
        f"derive generated kernel: {ir.element} {ir.variant} {st}",
        "",
        *textwrap.wrap(CAUTION, width=92),
        "",
        f"element      {ir.element}, {ir.n_nodes} nodes, {ir.ndof} DOFs interleaved u1, v1, u2, v2, ...",
        f"formulation  {ir.description}" + (f" [{ir.source}]" if ir.source else ""),
        f"integration  {rules}",
    ]
    if ir.n_internal:
        out.append(f"internal     {ir.n_internal} internal unknowns condensed inside the kernel: "
                   "K = K_uu - K_ua K_aa^-1 K_ua^T (unrolled factorisation of K_aa, no pivoting)")
    out += [
        f"flops        stiffness {meta['flops']['stiffness']}, validity {meta['flops']['validity']}, "
        f"recovery {meta['flops']['recovery']} per element (add, mul, div, sqrt)",
        "",
        "arguments (units-agnostic; any consistent set of units):",
        f"  xy      {meta['inputs']['xy']}",
        f"  E       {meta['inputs']['E']}",
        f"  nu      {meta['inputs']['nu']}",
        f"  t       {meta['inputs']['t']}",
        f"  u       {meta['inputs']['u']}",
        f"  K       {meta['outputs']['K']}",
        f"  detJ_min {meta['outputs']['detJ_min']}",
        f"  strain  {meta['outputs']['strain']}",
        f"  stress  {meta['outputs']['stress']}",
        "",
        "The kernels do not check their inputs; derive.kernel() checks shapes, finite",
        "coordinates and E, nu before calling them.  Screen meshes with the validity kernel.",
        f"generator    derive.codegen {GENERATOR_VERSION}; regenerate with",
        f"             derive kernel {ir.element} --variant {ir.variant} --state {st} --lang {lang}",
    ]
    return _wrap_header(out)


# ---------------------------------------------------------------------------------------------
# C

def _c_stmt_lines(low_block, indent: str, out_fmt, rolled: bool = False) -> list[str]:
    lines = []
    for s, e in low_block.stmts:
        lines += wrap_c(f"{indent}const double {s} = {c_expr(e)};", indent)
    for s, e, op, first in low_block.accs:
        if op == "add":
            text = f"{s} = {c_expr(e)};" if first else f"{s} += {c_expr(e)};"
        else:
            text = f"{s} = {c_expr(e)};" if first else f"{s} = fmin({s}, {c_expr(e)});"
        lines += wrap_c(indent + text, indent)
    for name, idx, e in low_block.outs:
        lines += wrap_c(f"{indent}{out_fmt(name, ('p',) + tuple(idx) if rolled else idx)} = {c_expr(e)};", indent)
    return lines


def _decl(names, indent: str, ctype: str = "double", width: int = 100) -> list[str]:
    lines, cur = [], ""
    for n in names:
        piece = (", " if cur else "") + n
        if len(indent) + len(ctype) + 1 + len(cur) + len(piece) > width:
            lines.append(f"{indent}{ctype} {cur};")
            cur = n
        else:
            cur += piece
    if cur:
        lines.append(f"{indent}{ctype} {cur};")
    return lines


def _flat(shape, idx) -> int:
    k = 0
    for s, i in zip(shape, idx):
        k = k * s + i
    return k


def _c_body(low: Lowered, ir: KernelIR, inputs: dict, outputs: dict, tag: str, indent="    "):
    """Statements of one kernel body and the file-scope point tables it needs.

    inputs: name -> C accessor format; outputs likewise ("__point__" for per-point outputs).
    """
    lines, consts = [], []
    used = low.used_inputs
    for i in range(ir.n_nodes):
        for k, c in enumerate(("x", "y")):
            nm = f"{c}{i + 1}"
            if nm in used:
                lines.append(f"{indent}const double {nm} = {inputs['xy'](2 * i + k)};")
    if "u" in inputs:
        for j in range(ir.ndof):
            if f"u{j + 1}" in used:
                lines.append(f"{indent}const double u{j + 1} = {inputs['u'](j)};")
    for k, nm in enumerate(("E", "nu", "t")):
        if nm in used:
            lines.append(f"{indent}const double {nm} = mat[{k}];")
    for k, (s, _) in enumerate(low.mat):
        if s.name in used:
            lines.append(f"{indent}const double {s} = mat[{3 + k}];")
    if low.elem:
        lines.append(f"{indent}/* element quantities: map coefficients, centre Jacobian */")
    for s, e in low.elem:
        lines += wrap_c(f"{indent}const double {s} = {c_expr(e)};", indent)
    init = getattr(low, "init", set())
    plain = [str(s) for s, _ in low.accumulators if s not in init]
    if plain:
        lines += _decl(plain, indent)
    zero = [f"{s} = {'HUGE_VAL' if op == 'min' else '0.0'}" for s, op in low.accumulators if s in init]
    if zero:
        lines += _decl(zero, indent)
    for bi, blk in enumerate(low.pre + [None] + low.post):
        if blk is None:
            if low.tail:
                lines.append(f"{indent}/* static condensation of the internal unknowns */")
            for s, e in low.tail:
                lines += wrap_c(f"{indent}const double {s} = {c_expr(e)};", indent)
            continue
        if not blk.rolled:
            lines.append(f"{indent}{{   /* {blk.title} */")
            lines += _c_stmt_lines(blk, indent + "    ", outputs.get("__point__"))
            lines.append(f"{indent}}}")
            continue
        lines.append(f"{indent}for (int p = 0; p < {blk.npoints}; ++p) {{   /* {blk.title} */")
        inner = indent + "    "
        for sym, vals in blk.pc.items():
            tname = f"{tag}{bi}_{sym}"
            consts += _c_table(tname, vals, _pc_comment(blk, sym))
            lines.append(f"{inner}const double {sym} = {tname}[p];")
        lines += _c_stmt_lines(blk, inner, outputs.get("__point__"), rolled=True)
        lines.append(f"{indent}}}")
    for name, items in low.outputs.items():
        shape = low.shapes[name]
        for idx, e in items:
            if isinstance(e, tuple):
                e = _mirror_expr(items, e[1], shape)
            lines += wrap_c(f"{indent}{outputs[name](_flat(shape, idx))} = {c_expr(e)};", indent)
    return lines, consts


def _pc_comment(blk, sym) -> str:
    d = getattr(blk, "pc_defs", {}).get(sym, sym)
    what = {"w": "the point weight", "xi": "xi", "eta": "eta"}.get(str(d), str(d).replace("**", "^"))
    return f"{sym} = {what} at the points of {blk.title.split(':')[0]}"


def _c_table(name: str, vals, comment: str = "") -> list[str]:
    items = [float_literal(v) for v in vals]
    out = ([f"/* {comment} */"] if comment else []) + [f"static const double {name}[{len(items)}] = {{"]
    cur = "   "
    for it in items:
        piece = f" {it},"
        if len(cur) + len(piece) > 100:
            out.append(cur)
            cur = "   "
        cur += piece
    out.append(cur.rstrip(","))
    out.append("};")
    return out


def _mirror_expr(items, idx, shape):
    for i2, e in items:
        if i2 == idx:
            return e
    raise KeyError(idx)


def _mat_lines(mats: list, indent="    ") -> list[str]:
    lines = [f"{indent}mat[0] = E;", f"{indent}mat[1] = nu;", f"{indent}mat[2] = t;"]
    for k, (s, e) in enumerate(mats):
        lines += wrap_c(f"{indent}mat[{3 + k}] = {c_expr(e)};   /* {s} */", indent)
    return lines


def render_c(ir: KernelIR, lows: dict, meta: dict, name: str) -> list[Source]:
    prefix = f"derive_{name}"
    K, V, R = lows["stiffness"], lows["validity"], lows["recovery"]
    # the three bodies share one material table (union of their material constants)
    mats = _merge_mats(lows)
    for low in lows.values():
        _remap_mats(low, mats)
    nin = 2 * ir.n_nodes
    nk = ir.ndof * ir.ndof
    stiff_body, c1 = _c_body(K, ir, {"xy": lambda k: f"xy[{k} * sx]"}, {"K": lambda k: f"K[{k} * sk]"}, "KS")
    valid_body, c2 = _c_body(V, ir, {"xy": lambda k: f"xy[{k}]"}, {"detJ_min": lambda k: "*detJ_min"}, "KV")
    nstr = ir.nstrain

    def point_out(nm, idx):
        if idx[0] == "p":
            return f"{nm}[p * {nstr} + {idx[1]}]"
        return f"{nm}[{idx[0] * nstr + idx[1]}]"

    rec_body, c3 = _c_body(R, ir, {"xy": lambda k: f"xy[{k}]", "u": lambda k: f"u[{k}]"},
                           {"__point__": point_out}, "KR")
    ctx = {
        "header": header_lines(ir, meta, "c"), "prefix": prefix, "name": name, "guard": prefix.upper() + "_H",
        "nin": nin, "nk": nk, "ndof": ir.ndof, "nodes": ir.n_nodes, "nmat": 3 + len(mats), "lanes": C_LANES,
        "mat_lines": _mat_lines(mats), "stiff_body": stiff_body, "valid_body": valid_body,
        "rec_body": rec_body, "nrec": meta["recovery_points"] * nstr, "nstrain": nstr,
        "npoints": meta["recovery_points"], "version": GENERATOR_VERSION, "tables": c1 + c2 + c3,
    }
    env = _env()
    return [Source(f"c/{name}.c", env.get_template("kernel.c.j2").render(**ctx)),
            Source(f"c/{name}.h", env.get_template("kernel.h.j2").render(**ctx))]


def _merge_mats(lows: dict) -> list:
    seen, out = set(), []
    for low in lows.values():
        for s, e in low.mat:
            if s not in seen:
                seen.add(s)
                out.append((s, e))
    out.sort(key=lambda se: int(se[0].name[1:]))
    return out


def _remap_mats(low: Lowered, mats: list):
    """Give every kernel of a file the same material table (indices into mat[])."""
    low.mat = list(mats)


# ---------------------------------------------------------------------------------------------
# Fortran

def _f_names(low: Lowered) -> tuple[list, list]:
    top = [str(s) for s, _ in low.elem] + [str(s) for s, _ in low.accumulators] + [str(s) for s, _ in low.tail]
    blocks = [[str(s) for s, _ in blk.stmts] for blk in low.pre + low.post]
    return top, blocks


def _f_decl(names, indent: str) -> list[str]:
    lines, cur = [], []
    for n in names:
        cur.append(n)
        if len(", ".join(cur)) > 80:
            lines.append(f"{indent}real(dp) :: " + ", ".join(cur))
            cur = []
    if cur:
        lines.append(f"{indent}real(dp) :: " + ", ".join(cur))
    return lines


def _f_stmt(indent, lhs, rhs) -> list[str]:
    return wrap_fortran(f"{indent}{lhs} = {f_expr(rhs)}", indent)


def _f_body(low: Lowered, ir: KernelIR, out_fmt, point_fmt=None, tag: str = "T", indent="    ",
            in_fmt=None, mat=None):
    """Declarations and statements of one Fortran kernel body.

    in_fmt(k, i): accessor of coordinate k of node i (0-based; default xy(k, i)).  mat: a list
    that receives (declaration names, statements) of the material constants instead of the
    body (the lane-blocked batch routine computes them once per call).
    """
    decl, lines, tables = [], [], []
    used = low.used_inputs
    names = []
    in_fmt = in_fmt or (lambda k, i: f"xy({k + 1}, {i + 1})")
    for i in range(ir.n_nodes):
        for k, c in enumerate(("x", "y")):
            nm = f"{c}{i + 1}"
            if nm in used:
                names.append(nm)
                lines.append(f"{indent}{nm} = {in_fmt(k, i)}")
    for j in range(ir.ndof):
        if f"u{j + 1}" in used:
            names.append(f"u{j + 1}")
            lines.append(f"{indent}u{j + 1} = u({j + 1})")
    for s, e in low.mat:
        if s.name in used:
            if mat is not None:
                mat.append((s.name, e))
                continue
            names.append(s.name)
            lines += _f_stmt(indent, s, e)
    for s, e in low.elem:
        lines += _f_stmt(indent, s, e)
    top, _ = _f_names(low)
    names += top
    init = getattr(low, "init", set())
    for s, op in low.accumulators:
        if s in init:
            lines.append(f"{indent}{s} = {'huge(1.0_dp)' if op == 'min' else '0.0_dp'}")
    rolled_any = False
    local_names = []
    for bi, blk in enumerate(low.pre + [None] + low.post):
        if blk is None:
            if low.tail:
                lines.append(f"{indent}! static condensation of the internal unknowns")
            for s, e in low.tail:
                lines += _f_stmt(indent, s, e)
            continue
        ind = indent
        if blk.rolled:
            rolled_any = True
            lines.append(f"{indent}do p = 1, {blk.npoints}   ! {blk.title}")
            ind = indent + "  "
            lines.append(f"{ind}block")
        else:
            lines.append(f"{indent}block   ! {blk.title}")
        inner = ind + "  "
        bn = ([str(s) for s in blk.pc] if blk.rolled else []) + [str(s) for s, _ in blk.stmts]
        local_names += bn
        if bn:
            lines += _f_decl(bn, inner)
        if blk.rolled:
            for sym, vals in blk.pc.items():
                tname = f"{tag}{bi}_{sym}"
                tables += [f"{indent}! {_pc_comment(blk, sym)}"] + _f_table(tname, vals, indent)
                lines.append(f"{inner}{sym} = {tname}(p)")
        for s, e in blk.stmts:
            lines += _f_stmt(inner, s, e)
        for s, e, op, first in blk.accs:
            if op == "add":
                lines += (_f_stmt(inner, s, e) if first else
                          wrap_fortran(f"{inner}{s} = {s} + ({f_expr(e)})", inner))
            else:
                lines += (_f_stmt(inner, s, e) if first else
                          wrap_fortran(f"{inner}{s} = min({s}, {f_expr(e)})", inner))
        for nm, idx, e in blk.outs:
            where = point_fmt(nm, ("p",) + tuple(idx) if blk.rolled else idx)
            lines += wrap_fortran(f"{inner}{where} = {f_expr(e)}", inner)
        lines.append(f"{ind}end block")
        if blk.rolled:
            lines.append(f"{indent}end do")
    for name, items in low.outputs.items():
        shape = low.shapes[name]
        for idx, e in items:
            if isinstance(e, tuple):
                e = _mirror_expr(items, e[1], shape)
            lines += wrap_fortran(f"{indent}{out_fmt(name, idx)} = {f_expr(e)}", indent)
    decl = tables + _f_decl(names, indent)
    if rolled_any:
        decl.append(f"{indent}integer :: p")
    _check_case(names + local_names + [t.split("::")[1].split("(")[0].strip() for t in tables if "::" in t] +
                ["xy", "u", "E", "nu", "t", "K", "detJ_min", "strain", "stress", "mat", "n", "iel", "p",
                 "lanes", "lane", "mlan", "ib", "xl", "kl"])
    return decl, lines


def _f_table(name: str, vals, indent: str) -> list[str]:
    items = [float_literal(v) + "_dp" for v in vals]
    head = f"{indent}real(dp), parameter :: {name}({len(items)}) = ["
    out, cur = [], head
    for k, it in enumerate(items):
        piece = it + (", " if k + 1 < len(items) else "]")
        if len(cur) + len(piece) > 98:
            out.append(cur.rstrip() + " &")
            cur = indent + "    "
        cur += piece
    out.append(cur)
    return out


def _check_case(names):
    seen = {}
    for n in names:
        k = n.lower()
        if k in seen and seen[k] != n:
            raise ValueError(f"Fortran name clash (case-insensitive): {seen[k]} and {n}")
        seen[k] = n


def render_fortran(ir: KernelIR, lows: dict, meta: dict, name: str) -> list[Source]:
    K, V, R = lows["stiffness"], lows["validity"], lows["recovery"]
    sd, sl = _f_body(K, ir, lambda nm, idx: f"K({idx[0] + 1}, {idx[1] + 1})", tag="KS")
    # batch: the same body inside a loop over F_LANES lanes (one element each, lane index
    # first in the scratch arrays), so that gfortran vectorises across elements
    bmat = []
    bd, bl = _f_body(K, ir, lambda nm, idx: f"kl(lane, {idx[0] + 1}, {idx[1] + 1})", tag="KS",
                     indent="          ", in_fmt=lambda k, i: f"xl(lane, {k + 1}, {i + 1})", mat=bmat)
    bmat_decl = _f_decl([nm for nm, _ in bmat], "    ")
    bmat_lines = [line for nm, e in bmat for line in _f_stmt("    ", nm, e)]
    vd, vl = _f_body(V, ir, lambda nm, idx: "detJ_min", tag="KV")

    def point_out(nm, idx):
        if idx[0] == "p":
            return f"{nm}({idx[1] + 1}, p)"
        return f"{nm}({idx[1] + 1}, {idx[0] + 1})"

    rd, rl = _f_body(R, ir, None, point_out, tag="KR")
    ctx = {"header": header_lines(ir, meta, "fortran"), "module": f"derive_{name}", "name": name,
           "nodes": ir.n_nodes, "ndof": ir.ndof, "nstrain": ir.nstrain, "npoints": meta["recovery_points"],
           "stiff_decl": sd, "stiff_lines": sl, "lanes": F_LANES, "batch_decl": bd, "batch_lines": bl,
           "batch_mat_decl": bmat_decl, "batch_mat_lines": bmat_lines, "valid_decl": vd, "valid_lines": vl,
           "rec_decl": rd, "rec_lines": rl, "version": GENERATOR_VERSION}
    text = _env().get_template("kernel.f90.j2").render(**ctx)
    return [Source(f"fortran/{name}.f90", text)]


# ---------------------------------------------------------------------------------------------
# NumPy

def _py_lines(low: Lowered, ir: KernelIR, tag: str, out_fmt, indent="    ") -> tuple[list, list]:
    consts, lines = [], []
    used = low.used_inputs
    for i in range(ir.n_nodes):
        for k, c in enumerate(("x", "y")):
            nm = f"{c}{i + 1}"
            if nm in used:
                lines.append(f"{indent}{nm} = X[{2 * i + k}]")
    for j in range(ir.ndof):
        if f"u{j + 1}" in used:
            lines.append(f"{indent}u{j + 1} = U[{j}]")
    for k, nm in enumerate(("E", "nu", "t")):
        if nm in used:
            lines.append(f"{indent}{nm} = mat[{k}]")
    for k, (s, _) in enumerate(low.mat):
        if s.name in used:
            lines.append(f"{indent}{s} = mat[{3 + k}]")
    for s, e in low.elem:
        lines += _py_assign(indent, s, e)
    for bi, blk in enumerate(low.pre + [None] + low.post):
        if blk is None:
            if low.tail:
                lines.append(f"{indent}# static condensation of the internal unknowns")
            for s, e in low.tail:
                lines += _py_assign(indent, s, e)
            continue
        lines.append(f"{indent}# {blk.title}")
        npts = blk.npoints
        for s, vals in blk.pc.items():
            cname = f"_{tag}{bi}_{s}"
            consts.append(f"# {_pc_comment(blk, s)}")
            consts.append(f"{cname} = np.array([{', '.join(float_literal(v) for v in vals)}]).reshape({npts}, 1)")
            lines.append(f"{indent}{s} = {cname}")
        for s, e in blk.stmts:
            lines += _py_assign(indent, s, e)
        for s, e, op, first in blk.accs:
            red = f"_psum({py_expr(e)}, {npts})" if op == "add" else f"_pmin({py_expr(e)})"
            text = f"{s} = {red}" if first else (f"{s} = {s} + {red}" if op == "add" else f"{s} = np.minimum({s}, {red})")
            lines.append(indent + text)
        for nm, idx, e in blk.outs:
            lines.append(f"{indent}{nm}[{idx[0]}] = {py_expr(e)}")
    for name, items in low.outputs.items():
        shape = low.shapes[name]
        for idx, e in items:
            if isinstance(e, tuple):
                src = _flat(shape, e[1])
                lines.append(f"{indent}{out_fmt(name, _flat(shape, idx))} = {out_fmt(name, src)}")
            else:
                lines.append(f"{indent}{out_fmt(name, _flat(shape, idx))} = {py_expr(e)}")
    return consts, lines


def _py_assign(indent, s, e) -> list[str]:
    text = f"{indent}{s} = {py_expr(e)}"
    if len(text) <= 110:
        return [text]
    parts = wrap_c(f"{indent}{s} = ({py_expr(e)})", indent)
    return parts


def render_numpy(ir: KernelIR, lows: dict, meta: dict, name: str) -> list[Source]:
    mats = _merge_mats(lows)
    for low in lows.values():
        _remap_mats(low, mats)
    sc, sl = _py_lines(lows["stiffness"], ir, "S", lambda nm, k: f"buf[{k}]")
    vc, vl = _py_lines(lows["validity"], ir, "V", lambda nm, k: "detJ_min")
    rc, rl = _py_lines(lows["recovery"], ir, "R", None)
    mat_lines = []
    for s, e in mats:
        mat_lines += _py_assign("    ", s, e)
    ctx = {"header": header_lines(ir, meta, "numpy"), "name": name, "nodes": ir.n_nodes, "ndof": ir.ndof,
           "nstrain": ir.nstrain, "npoints": meta["recovery_points"], "chunk": NUMPY_CHUNK,
           "consts": sc + vc + rc, "stiff_lines": sl, "valid_lines": vl, "rec_lines": rl,
           "mat_lines": mat_lines, "mat_names": ["E", "nu", "t"] + [str(s) for s, _ in mats],
           "element": ir.element, "variant": ir.variant, "state": ir.state, "version": GENERATOR_VERSION,
           }
    text = _env().get_template("kernel.py.j2").render(**ctx)
    return [Source(f"numpy/{name}.py", text)]


# ---------------------------------------------------------------------------------------------
# entry points

@lru_cache(maxsize=None)
def _ir_for(key):
    element, variant, state = key
    info = catalog.element_info(element)
    return build(info, catalog.shape_set(info.name), variant, state)


def lowered(ir: KernelIR, mode: str) -> dict:
    return {name: lower(ir, fn, mode) for name, fn in ir.functions.items()}


def generate(element: str, variant: str = "full", state: str = "plane-stress", langs=LANGS, ir=None) -> list:
    """KernelSet per language for one catalogue element (or a given IR)."""
    if ir is None:
        ir = _ir_for((catalog.element_info(element).name, variant, state))
    name = check_identifier(stem(ir.element, ir.variant, ir.state))
    out = []
    unrolled = vector = None
    for lang in langs:
        if lang in ("c", "fortran"):
            if unrolled is None:
                unrolled = lowered(ir, NATIVE_MODE)
            lows = unrolled
        elif lang == "numpy":
            if vector is None:
                vector = lowered(ir, "vector")
            lows = vector
        else:
            raise ValueError(f"unknown language {lang!r}")
        if unrolled is None:
            unrolled = lowered(ir, NATIVE_MODE)
        meta = describe(ir, unrolled)
        render = {"c": render_c, "fortran": render_fortran, "numpy": render_numpy}[lang]
        sources = render(ir, lows, meta, name)
        out.append(KernelSet(ir.element, ir.variant, ir.state, lang, name, sources, meta))
    return out
