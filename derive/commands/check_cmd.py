"""`derive check FILE`: compare a user's matrix with derive's and diagnose the mistake."""
from __future__ import annotations

import numpy as np
import sympy as sp

from ..bounded import Limits
from ..check import CODES, Target, check
from ..check_equality import MAX_DEGREE
from ..errors import InputError
from ..output import parse_set
from ..symbols import E, nu, t
from ..userinput import load_matrix_file
from .common import caution_line, print_json, resolve_element
from .stiffness_cmd import parse_nodes

NAME = "check"
HELP = "compare your hand derivation or your code's matrix with derive's and say what mistake it contains"
EXAMPLE = ("examples:\n"
           "  derive check my-q4.txt --element Q4                       # symbolic, 2a x 2b rectangle\n"
           "  derive check k.tex --element T3 --geometry general        # LaTeX bmatrix in x1, y1, ...\n"
           "  derive check solver-k.csv --element Q4 --nodes \"0,0 2,0 2.5,1 0,1.5\" --set E=210e9,nu=0.3,t=0.01\n"
           "  derive check b.txt --element Q4 --what B --json\n\n"
           "input: a matrix (rows on lines, entries separated by commas or spaces), K[i,j] = expr lines\n"
           "(0- or 1-based; declare with '# index-base: 1'), LaTeX pmatrix/bmatrix, or numbers (.csv, .npy).\n"
           "The text is parsed by derive's own whitelist parser, never evaluated as code.\n"
           "diagnosis codes: " + ", ".join(CODES) + "\n"
           "limits: comparing your entries may take --time-limit CPU seconds (default 5) and\n"
           f"--memory-limit MB (default 1024); entries of degree above {MAX_DEGREE} are refused.\n"
           "exit status: 0 match, 1 mismatch, 2 bad input (including a limit exceeded)")


def add_arguments(p) -> None:
    p.add_argument("file", help="the matrix to check (.txt/.tex/.csv/.npy or any text)")
    p.add_argument("--element", required=True, help="element name or spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full)")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default), plane-strain, axisymmetric")
    p.add_argument("--geometry", default="rectangle", choices=("rectangle", "parallelogram", "general"),
                   help="geometry of the expected matrix (default rectangle 2a x 2b)")
    p.add_argument("--nodes", help='numeric nodal coordinates "x1,y1 x2,y2 ..." (needed for numeric input '
                   "unless --set gives a, b, c)")
    p.add_argument("--set", dest="values", help="values, e.g. E=210e9,nu=0.3,t=0.01 (and a, b, c for the geometry)")
    p.add_argument("--what", default="stiffness", choices=("stiffness", "B", "shape"), help="what the file holds")
    p.add_argument("--tolerance", type=float, default=1e-8,
                   help="numeric input: tolerance relative to the expected matrix norm (default 1e-8)")
    p.add_argument("--time-limit", type=float, default=5.0, metavar="SECONDS",
                   help="CPU seconds allowed for comparing your entries and diagnosing (default 5; "
                   "derive's own matrices are not counted)")
    p.add_argument("--memory-limit", type=float, default=1024.0, metavar="MB",
                   help="extra memory allowed for the comparison (default 1024 MB)")
    p.add_argument("--json", action="store_true", help="machine-readable JSON output")


def _limits(args) -> Limits:
    if not (0 < args.tolerance < 1):
        raise InputError(f"--tolerance {args.tolerance:g} must be between 0 and 1 (relative to ||K||)")
    if not (0 < args.time_limit <= 3600):
        raise InputError(f"--time-limit {args.time_limit:g} must be between 0 and 3600 seconds")
    if not (16 <= args.memory_limit <= 1 << 20):
        raise InputError(f"--memory-limit {args.memory_limit:g} must be between 16 and {1 << 20} MB")
    return Limits(seconds=args.time_limit, memory=int(args.memory_limit * 2 ** 20),
                  what=f"comparing {args.file}",
                  hint="a hand derivation needs far less; raise --time-limit / --memory-limit if the input is as intended")


def run(args) -> int:
    limits = _limits(args)
    el = resolve_element(args.element, args.variant, args.state)
    values = parse_set(args.values)
    given = load_matrix_file(args.file)
    numeric = given.syntax == "numeric" or given.array is not None
    mat = {"E": values.get(E), "nu": values.get(nu), "t": values.get(t)}
    geo_values = {s: v for s, v in values.items() if s not in (E, nu, t)}
    if args.nodes is not None:
        geometry = parse_nodes(args.nodes)
    elif geo_values or numeric:
        imap = el.map(args.geometry)
        free = set().union(*(u.free_symbols | v.free_symbols for u, v in zip(imap.geometry.xs, imap.geometry.ys)))
        missing = sorted(s.name for s in free if s not in geo_values)
        if missing:
            raise InputError(f"numeric input needs numeric geometry: give --nodes or --set {', '.join(missing)}")
        geometry = [[u.subs(geo_values), v.subs(geo_values)] for u, v in zip(imap.geometry.xs, imap.geometry.ys)]
    else:
        geometry = args.geometry
    target = Target(el, geometry, mat, args.what)
    if numeric:
        arr = given.array if given.array is not None else np.array(given.to_matrix().evalf().tolist(), dtype=float)
        if arr.ndim != 2:
            raise InputError(f"{args.file}: a numeric matrix must be 2-D")
        result = check(target, given_numeric=arr, rtol=args.tolerance, limits=limits)
        given_m = sp.Matrix(arr.tolist())
    else:
        if given.kind == "full":
            given_m = given.to_matrix()
            result = check(target, given_m, limits=limits)
        else:
            full = _symmetric_full(given, el.ndof) if args.what == "stiffness" else None
            if full is not None:
                given_m = full
                result = check(target, full, limits=limits)
            else:
                given_m = given.entries
                result = check(target, dict(given.entries), limits=limits)
    if args.json:
        print_json({"element": el.name, "variant": el.variant, "state": el.state, "what": args.what,
                    "match": result.match, "compared": result.compared,
                    "mismatched": [list(ij) for ij in result.mismatched], "shape": result.shape,
                    "diagnosis": result.codes, "explanations": result.diagnosis,
                    "counterexample": result.counterexample, "entries": result.details, "method": result.method,
                    "index_base": given.index_base, "syntax": given.syntax, "caution": caution_line()})
    else:
        _print_text(el, args, result, given)
    return 0 if result.match else 1


def _symmetric_full(given, ndof: int) -> sp.Matrix | None:
    """An upper (or lower) triangle of K given as entries, completed by symmetry, if complete."""
    try:
        M = given.to_matrix(symmetric=True)
    except InputError:
        return None
    return M if M.shape == (ndof, ndof) else None


def _print_text(el, args, result, given) -> None:
    what = {"stiffness": "K", "B": "B", "shape": "N"}[args.what]
    print(f"derive check: {args.file} against {what} of {el.name} ({el.variant}, {el.state})")
    if given.index_base is not None:
        how = "declared" if given.index_base_declared else "detected"
        print(f"indices: {given.index_base}-based ({how})")
    if result.match:
        print(f"MATCH: all {result.compared} entries agree ({result.method}).")
        print(caution_line())
        return
    if result.shape is not None:
        g, e = result.shape["given"], result.shape["expected"]
        print(f"MISMATCH: your matrix is {g[0]} x {g[1]}; derive's {what} is {e[0]} x {e[1]}.")
    else:
        print(f"MISMATCH: {len(result.mismatched)} of {result.compared} entries differ ({result.method}).")
    if result.diagnosis:
        print("diagnosis:")
        for d in result.diagnosis:
            print(f"  {d['code']}: {d['explanation']}")
    else:
        print("diagnosis: none of the usual single mistakes (" + ", ".join(CODES) + ") explains the difference")
    if result.counterexample:
        ce = result.counterexample
        pt = ", ".join(f"{k}={v}" for k, v in ce["point"].items())
        print(f"counterexample: entry [{ce['entry'][0]},{ce['entry'][1]}] differs at {pt}")
    if result.details:
        print("mismatched entries (0-based): expected, given, difference (given - expected), relative difference:")
    for row in result.details[:20]:
        print("  " + _detail_line(row))
    if len(result.mismatched) > 20:
        print(f"  ... {len(result.mismatched) - 20} more (use --json for all)")
    print(caution_line())


def _detail_line(row: dict) -> str:
    i, j = row["entry"]
    rel = row["relative_difference"]
    rel_text = "n/a" if rel is None else f"{rel:.3g}"
    if isinstance(row["difference"], float):  # numeric input
        rel_text = "n/a (expected 0)" if rel is None else rel_text
        return (f"[{i},{j}]  expected {row['expected']}   given {row['given']}   "
                f"difference {row['difference']:.3g}   relative {rel_text}")
    text = f"[{i},{j}]  expected {row['expected']}   given {row['given']}"
    if row["difference"] is not None:
        text += f"   difference {row['difference']}"
    at = row.get("at_point")
    if at is not None:
        pt = ", ".join(f"{k}={v}" for k, v in at["point"].items())
        text += f"   at {pt or 'any point'}: expected {at['expected']}, given {at['given']}, relative {rel_text}"
    return text
