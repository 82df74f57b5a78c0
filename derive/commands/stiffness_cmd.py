"""`derive stiffness ELEMENT`: closed-form or rule-evaluated stiffness, B and D matrices."""
from __future__ import annotations

import sympy as sp

from ..errors import InputError
from ..geometry import check_geometry_values
from ..material import D as D_matrix
from ..output import (check_digits, check_unknown, describe_geometry, matrix_notes, matrix_latex, matrix_text, numeric_text, parse_number, parse_set,
                      to_float_matrix, working)
from ..symbols import E, nu, t
from .common import (add_digits_arg, add_element_args, add_output_args, caution_line, output_format, print_json,
                     resolve_element)

NAME = "stiffness"
HELP = "element stiffness K (or B, D), closed form or as the element's rule computes it"
EXAMPLE = ("examples:\n"
           "  derive stiffness Q4 --geometry rectangle\n"
           "  derive stiffness Q4 --geometry rectangle --set a=2,b=0.5,E=210e9,nu=0.3,t=0.01\n"
           "  derive stiffness T3 --nodes \"0,0 2,0 0,1\" --set E=1,nu=1/4,t=1 --json\n"
           "  derive stiffness Q8 --geometry parallelogram --state plane-strain --format latex\n"
           "  derive stiffness Q4 --what B --geometry rectangle\n"
           "  derive stiffness H8 --state solid --geometry brick --set a=1,b=1,c=1,E=1,nu=0.3")


def add_arguments(p) -> None:
    add_element_args(p)
    p.add_argument("--geometry", default=None, choices=GEOMETRIES,
                   help="2-D: rectangle 2a x 2b (default; for triangles the right triangle with legs 2a, 2b, its "
                        "lower-left half), parallelogram (a, b, skew c; triangles: its lower-left half); 3-D: "
                        "brick 2a x 2b x 2c (default), parallelepiped (a, b, c, skew s); general (x1, y1[, z1], ...)")
    p.add_argument("--nodes", help='numeric nodal coordinates "x1,y1 x2,y2 ..." or "x1,y1,z1 ..." '
                   "(overrides --geometry)")
    p.add_argument("--rule", default="element",
                   help="element (each term with its own rule, default), exact, or a rule such as gauss-3x3")
    p.add_argument("--what", default="K", choices=("K", "B", "D"), help="matrix to print (default K)")
    p.add_argument("--set", dest="values", help="numeric values, e.g. a=2,b=0.5,E=210e9,nu=0.3,t=0.01")
    add_output_args(p)
    add_digits_arg(p)


GEOMETRIES = ("rectangle", "parallelogram", "brick", "parallelepiped", "segment", "general")


def parse_nodes(text: str) -> list[list[sp.Rational]]:
    """Nodes "x,y x,y ..." (2-D) or "x,y,z ..." (3-D): every node with the same number of coordinates."""
    rows = []
    for k, item in enumerate(text.split(), start=1):
        parts = item.split(",")
        count = len(rows[0]) if rows else None
        if len(parts) not in (2, 3) or (count is not None and len(parts) != count):
            want = {2: "x,y", 3: "x,y,z"}.get(count, "x,y (2-D) or x,y,z (3-D)")
            raise InputError(f"--nodes: node {k} ({item!r}) must be {want} with no spaces inside, e.g. \"0,0 2,0 0,1\"")
        rows.append([parse_number(v, f"--nodes node {k} {axis}") for v, axis in zip(parts, "xyz")])
    if not rows:
        raise InputError("--nodes is empty; give \"x1,y1 x2,y2 ...\"")
    return rows


def run(args) -> int:
    el = resolve_element(args.element, args.variant, args.state)
    values = parse_set(args.values)
    check_geometry_values(values, el.state == "axisymmetric")
    geometry = parse_nodes(args.nodes) if args.nodes is not None else args.geometry
    if args.what != "K" and args.rule != "element":
        raise InputError(f"--rule applies to K only; --what {args.what} has no integration rule (drop --rule)")
    mat = {k: values.get(s) for k, s in (("E", E), ("nu", nu), ("t", t))}
    with working(f"deriving {args.what} of {el.name}", enabled=False if output_format(args) == "json" else None):
        if args.what == "D":
            M = D_matrix(el.state, mat["E"] if mat["E"] is not None else E, mat["nu"] if mat["nu"] is not None else nu)
            label = "D"
        elif args.what == "B":
            M = el.B(geometry)
            label = "B"
        else:
            M = el.stiffness(geometry, rule=args.rule, E=mat["E"], nu=mat["nu"], t=mat["t"])
            label = "K"
    rest = {s: v for s, v in values.items() if s not in (E, nu, t)}
    check_unknown(values, M.free_symbols | {E, nu, t}, f"{label} of {el.name}")
    if rest:
        M = M.subs(rest)
    numeric = not (M.free_symbols - {sp.Symbol("xi"), sp.Symbol("eta"), sp.Symbol("zeta")}) and args.what != "B"
    fmt = output_format(args)
    digits = check_digits(args.digits)
    kind = "nodes" if args.nodes is not None else (args.geometry or el.map().geometry.kind)
    geometry_text = describe_geometry(kind, el.shapes.domain, el.state == "axisymmetric")
    notes = matrix_notes(label, el.state, M.rows, M.cols)
    header = {"element": el.name, "variant": el.variant, "state": el.state,
              "geometry": kind, "geometry_description": geometry_text, "rule": args.rule, "matrix": label,
              "shape": [M.rows, M.cols], "layout": notes}
    if label != "D":
        header["dof_order"] = "interleaved " + ", ".join(el.model.dof_names(2)) + ", ..."
    title = f"{label} of {el.name} ({el.variant}, {el.state})" + (
        "" if label == "D" else f", geometry: {geometry_text}" + (f", rule {args.rule}" if label == "K" else ""))
    if numeric:
        A = to_float_matrix(M)
        if fmt == "json":
            print_json({**header, "numeric": True, "values": A.tolist(), "caution": caution_line()})
        else:
            print(f"# {title}, numeric ({digits} significant digits)")
            print(f"# {notes[0]}; full matrix shown")
            print(numeric_text(A, digits))
            if fmt == "text":
                print("# " + caution_line())
        return 0
    if fmt == "json":
        print_json({**header, "numeric": False, "entries": [[str(v) for v in row] for row in M.tolist()],
                    "symbols": sorted(s.name for s in M.free_symbols), "caution": caution_line()})
    elif fmt == "latex":
        print(matrix_latex(M, label, title=title, notes=notes[:1], symmetric=label != "B"))
        print(f"% {caution_line()}")
    else:
        print(f"# {title}")
        for line in notes:
            print("# " + line)
        print("# index-base: 0")
        print(matrix_text(M, label, symmetric=(label != "B")))
        print("# " + caution_line())
    return 0
