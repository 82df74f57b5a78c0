"""`derive modes ELEMENT`: zero-energy modes (rigid-body and spurious) and whether they spread."""
from __future__ import annotations

from .. import catalog, plotting
from ..errors import InputError
from ..limits import check_tolerance, tolerance_help
from ..modes import GEOMETRIES, plot_modes, summary_lines, zero_energy_modes
from ..output import CAUTION, check_digits, check_output_file, digits_override, parse_number, working
from .common import add_digits_arg, add_force_arg, add_output_args, output_format, print_json
from .stiffness_cmd import parse_nodes

NAME = "modes"
HELP = "zero-energy modes of the element stiffness: rigid-body vs spurious, communicable or not"
EXAMPLE = ("examples:\n"
           "  derive modes Q4 --variant reduced\n"
           "  derive modes Q9 --variant reduced --plot q9-modes.png\n"
           "  derive modes Q8 --variant reduced --geometry distorted --json\n"
           "  derive modes Q4 --variant reduced --mesh-file my-mesh.vtu\n"
           "  derive modes Q4 --nodes \"0,0 2,0 2.4,1.6 0.4,1.2\" --nu 0.49")


def add_arguments(p) -> None:
    p.add_argument("element", help="catalogue name (" + ", ".join(catalog.ELEMENTS) + ") or a spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default), plane-strain, axisymmetric")
    p.add_argument("--geometry", default="square", choices=GEOMETRIES,
                   help="element shape: square (the reference element, default), rectangle (aspect 2), "
                        "parallelogram (skew 0.5), distorted (a general convex quadrilateral)")
    p.add_argument("--mesh-file", metavar="FILE",
                   help="zero-energy modes of your whole free-free mesh instead of one element: a file meshio "
                        "reads (.vtu, .xdmf) with one cell type matching ELEMENT (triangle, triangle6, quad, quad8, "
                        "quad9 for T3, T6, Q4, Q8, Q9); up to 3000 DOFs")
    p.add_argument("--nodes", help='numeric nodal coordinates "x1,y1 x2,y2 ..." (overrides --geometry)')
    p.add_argument("--nu", default="0.3", help="Poisson's ratio used for the eigenvalues (default 0.3; E = 1, t = 1)")
    p.add_argument("--tol", default="1e-8", help="zero threshold relative to the largest eigenvalue (default 1e-8; " + tolerance_help("modes") + ")")
    p.add_argument("--plot", metavar="FILE", help="write the deformed shapes of the zero-energy modes (.png, .svg, .pdf)")
    p.add_argument("--dpi", default=str(plotting.DEFAULT_DPI),
                   help=f"resolution of a .png --plot in dots per inch (default {plotting.DEFAULT_DPI})")
    add_force_arg(p, "replace an existing --plot file (its folder must exist)")
    add_output_args(p, formats=False)
    add_digits_arg(p, default=None)


def run(args) -> int:
    if args.mesh_file:
        return _run_mesh_file(args)
    if args.plot:
        plotting.plot_format(args.plot)   # refuse a bad file name before the analysis
        check_output_file(args.plot, "--plot", args.force)
    dpi = plotting.check_dpi(args.dpi)
    nu = float(parse_number(args.nu, "--nu"))
    tol = check_tolerance(args.tol, "modes")
    nodes = [[float(u), float(v)] for u, v in parse_nodes(args.nodes)] if args.nodes is not None else None
    show = False if output_format(args) == "json" else None
    with working(f"modes of {args.element}", enabled=show):
        res = zero_energy_modes(args.element, args.variant, args.state, nodes=nodes, geometry=args.geometry, nu=nu,
                                tol=tol)
    if args.plot:
        with working(f"plotting {res.get('zero_energy', '')} mode shapes", enabled=show):
            res["plot"] = plot_modes(res, args.plot, dpi)
    if output_format(args) == "json":
        print_json({**res, "caution": CAUTION})
        return 0
    with digits_override(check_digits(args.digits) if args.digits is not None else None):
        lines = summary_lines(res)
    for line in lines:
        print(line)
    if args.plot:
        print(f"mode shapes written to {res['plot']}")
    print(CAUTION)
    return 0


def _run_mesh_file(args) -> int:
    from ..mesh_io import read_mesh
    from ..modes import mesh_summary_lines, mesh_zero_energy_modes
    if args.nodes or args.plot or args.geometry != "square":
        raise InputError("--mesh-file analyses the whole mesh: --nodes, --geometry and --plot are for one element")
    nu = float(parse_number(args.nu, "--nu"))
    tol = check_tolerance(args.tol, "modes")
    mesh = read_mesh(args.mesh_file, args.element)
    show = False if output_format(args) == "json" else None
    with working(f"modes of {mesh.label}", enabled=show):
        res = mesh_zero_energy_modes(mesh, args.variant, args.state, nu=nu, tol=tol)
    if output_format(args) == "json":
        print_json({**res, "caution": CAUTION})
        return 0
    for line in mesh_summary_lines(res):
        print(line)
    print(CAUTION)
    return 0
