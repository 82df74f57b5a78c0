"""`derive shapes ELEMENT`: shape functions, their checks, and the isoparametric map."""
from __future__ import annotations

import sympy as sp

from ..output import CAUTION, check_digits, display, matrix_latex, num
from .common import (add_digits_arg, add_element_args, add_output_args, output_format, print_json,
                     resolve_element)
from .stiffness_cmd import describe_geometry, parse_nodes

NAME = "shapes"
HELP = "shape functions with partition-of-unity, Kronecker-delta and completeness checks"
EXAMPLE = ("examples:\n  derive shapes Q8\n  derive shapes T6 --format latex\n"
           "  derive shapes q12-cubic-serendipity.toml --json\n"
           "  derive shapes Q4 --geometry parallelogram   # adds the map, J, det J\n"
           "  derive shapes Q4 --nodes \"0,0 2,0 2.2,1 0,1\"  # validity report of a numeric element\n"
           "  derive shapes H8 --nodes \"0,0,0 2,0,0 2,1,0 0,1,0 0,0,1 2,0,1 2,1,1 0,1,1\"")


def add_arguments(p) -> None:
    add_element_args(p, variant=False, state=False)
    p.add_argument("--geometry", choices=("rectangle", "parallelogram", "brick", "parallelepiped", "general"),
                   help="also print the isoparametric map, Jacobian and det J for this geometry (rectangle "
                        "2a x 2b; for triangles the right triangle with legs 2a, 2b, the rectangle's lower-left half)")
    p.add_argument("--nodes", help='numeric nodal coordinates "x1,y1 x2,y2 ..." (3-D: "x1,y1,z1 ..."): map, J and a '
                   "validity report (det J over the element and at the rule's points)")
    add_output_args(p)
    add_digits_arg(p)


def run(args) -> int:
    el = resolve_element(args.element)
    digits = check_digits(args.digits)
    sh = el.shapes
    checks = sh.checks()
    fmt = output_format(args)
    axes = ("x", "y", "z")[:sh.dim]
    data = {"element": el.name, "domain": sh.domain, "nodes": [[str(u) for u in node] for node in sh.nodes],
            "basis": [str(m) for m in sh.basis], "shape_functions": [str(f) for f in sh.functions],
            "checks": checks}
    imap = None
    if args.nodes is not None:
        nodes = parse_nodes(args.nodes)
        data["validity"] = el.validity(nodes)
        imap = el.map(nodes)
        data["map"] = {"geometry": "nodes", **{k: str(v) for k, v in zip(axes, imap.position)},
                       "jacobian": [[str(display(v)) for v in row] for row in imap.jacobian.tolist()],
                       "det_jacobian": str(display(imap.det))}
    elif args.geometry:
        imap = el.map(args.geometry)
        data["map"] = {"geometry": args.geometry,
                       "geometry_description": describe_geometry(args.geometry, sh.domain),
                       **{k: str(v) for k, v in zip(axes, imap.position)},
                       "jacobian": [[str(display(v)) for v in row] for row in imap.jacobian.tolist()],
                       "det_jacobian": str(display(imap.det))}
    if fmt == "json":
        print_json({**data, "caution": CAUTION})
        return 0
    if fmt == "latex":
        for i, f in enumerate(sh.functions, start=1):
            print(f"N_{{{i}}} = {sp.latex(f)} \\\\")
        if imap is not None:
            print(matrix_latex(imap.jacobian.applyfunc(display), "J"))
            print(f"\\det J = {sp.latex(display(imap.det))}")
        print(f"% {CAUTION}")
        return 0
    print(f"{el.name}: {el.info.description} on the {sh.domain} reference domain")
    print("basis: {" + ", ".join(map(str, sh.basis)) + "}")
    for i, (f, node) in enumerate(zip(sh.functions, sh.nodes), start=1):
        at = ", ".join(f"{s}={u}" for s, u in zip(sh.coords, node))
        print(f"N{i} (node at {at}) = {f}")
    print("checks:")
    print(f"  partition of unity (sum N_i = 1): {'yes' if checks['partition_of_unity'] else 'NO'}")
    print(f"  Kronecker delta at the nodes:     {'yes' if checks['kronecker_delta'] else 'NO'}")
    print(f"  completeness degree:              {checks['completeness']}")
    if imap is not None:
        shape = describe_geometry(args.geometry, sh.domain) if args.geometry else "the given nodal coordinates"
        print(f"map ({shape}): " + ", ".join(f"{k} = {v}" for k, v in zip(axes, imap.position)))
        print(f"J = {imap.jacobian.applyfunc(display).tolist()}")
        print(f"det J = {display(imap.det)}")
    if "validity" in data:
        print(f"nodes ({', '.join(axes)}): " + "  ".join("(" + ", ".join(num(float(c), digits) for c in row) + ")"
                                                    for row in zip(*imap.geometry.axes)))
        v = data["validity"]
        what = next(k for k in ("area", "volume", "length") if k in v)
        print(f"validity: valid; {what} {num(v[what], digits)}; det J over the element {num(v['det_min'], digits)} .. "
              f"{num(v['det_max'], digits)}; at the full rule's points {num(v['det_at_points_min'], digits)} .. "
              f"{num(v['det_at_points_max'], digits)}")
    print(CAUTION)
    return 0
