"""`derive bench PROBLEM`: benchmark problems with published or closed-form answers."""
from __future__ import annotations

from .. import benchmarks as B
from .. import catalog, plotting
from ..errors import InputError
from ..limits import parse_whole
from ..mesh_io import write_vtu
from ..output import CAUTION, Progress, check_digits, check_output_file, digits_override, parse_number, write_atomic
from .common import add_digits_arg, add_force_arg, add_output_args, output_format, print_json

NAME = "bench"
HELP = "benchmark meshes: cantilever, membrane (tapered panel), thick cylinder, locking-mesh chart"
EXAMPLE = ("examples:\n"
           "  derive bench cantilever --element Q4 --variant full\n"
           "  derive bench cantilever --element Q4 --variant incompatible-centred --mesh trapezoidal --refine 2\n"
           "  derive bench membrane --element Q9 --refine 5 --plot membrane.png --table membrane.md\n"
           "  derive bench membrane --element Q4 --mesh 16 --vtu membrane-16.vtu\n"
           "  derive bench cylinder --element Q4 --variant bbar --nu 0.49,0.4999 --json\n"
           "  derive bench locking-mesh --element Q4 --plot locking-mesh.png --accuracy 0.9\n"
           "  derive bench locking-mesh --element Q4 --variant full,incompatible-centred,eas4 --plot cmp.png\n"
           "  derive bench membrane --element Q8 --mesh-file my-panel.vtu --vtu result.vtu")


def add_arguments(p) -> None:
    p.add_argument("problem", choices=B.PROBLEMS, help="benchmark problem")
    p.add_argument("--element", default="Q4", help="catalogue name (" + ", ".join(catalog.ELEMENTS) + ") or a spec .toml file "
                                                    "(default Q4)")
    p.add_argument("--variant", default="full",
                   help="formulation variant (default: full); see `derive list`; locking-mesh accepts a "
                        "comma-separated list to compare variants on one chart")
    p.add_argument("--mesh-file", metavar="FILE",
                   help="run the problem on your own mesh of its domain instead of derive's meshes: a file "
                        "meshio reads (.vtu, .xdmf), one cell type matching --element (triangle, triangle6, quad, "
                        "quad8, quad9 for T3, T6, Q4, Q8, Q9); supports, loads and output points are found by "
                        "coordinates (domains in notes/verification.md)")
    p.add_argument("--mesh", help="cantilever: rectangular, trapezoidal, parallelogram or all (default all); "
                                  "membrane / cylinder: N for a single N x N mesh instead of a refinement study")
    p.add_argument("--refine", help="cantilever: subdivide each of the 6 cells N x N (default 1); membrane / cylinder: "
                                    "number of refinement levels 2, 4, ... (default 5 / 4)")
    p.add_argument("--load", default="both", choices=("shear", "extension", "both"),
                   help="cantilever tip load (default both)")
    p.add_argument("--nu", help="cylinder: Poisson's ratios, comma-separated (default 0.3,0.49,0.499,0.4999)")
    p.add_argument("--depths", default="1,2,4", help="locking-mesh: elements through the depth (default 1,2,4)")
    p.add_argument("--accuracy", default="0.95",
                   help="locking-mesh: target fraction of beam theory for the mesh advice (default 0.95)")
    p.add_argument("--plot", metavar="FILE", help="write a chart (.png, .svg, .pdf)")
    p.add_argument("--memory-limit", metavar="GB",
                   help=f"refuse runs whose memory estimate exceeds GB (default {B.MEMORY_LIMIT_GB:g}; the estimate "
                        f"is {B.BYTES_PER_ENTRY:g} bytes per element-matrix entry, measured)")
    p.add_argument("--dpi", default=str(plotting.DEFAULT_DPI),
                   help=f"resolution of a .png --plot in dots per inch (default {plotting.DEFAULT_DPI})")
    p.add_argument("--table", metavar="FILE", help="write the result table (Markdown)")
    p.add_argument("--vtu", metavar="FILE",
                   help="write the (finest) run as VTK .vtu: undeformed mesh, displacement and stresses as data")
    p.add_argument("--scale", default="1",
                   help="warp factor to use in the viewer for --vtu (printed with the file name; default 1); the "
                        "file holds the undeformed mesh and the displacement")
    add_force_arg(p, "replace existing --plot / --table / --vtu files (their folders must exist)")
    add_output_args(p, formats=False)
    add_digits_arg(p, default=None)


def _int(text, what, low=1, high=4096):
    return parse_whole(text, what, low, high)


def _floats(text, what):
    out = []
    for item in str(text).split(","):
        if item.strip():
            out.append(float(parse_number(item, what)))
    if not out:
        raise InputError(f"{what} is empty")
    return out


def run(args) -> int:
    with digits_override(check_digits(args.digits) if args.digits is not None else None):   # the report lines honour --digits
        return _run(args)


def _run(args) -> int:
    quiet = output_format(args) == "json"
    show = False if quiet else None
    prob = args.problem
    if args.plot:
        B.plot_format(args.plot)          # refuse a bad file name before the runs
    dpi = plotting.check_dpi(args.dpi)
    for option in ("plot", "table", "vtu"):
        if getattr(args, option):
            check_output_file(getattr(args, option), f"--{option}", args.force)
    scale = float(parse_number(args.scale, "--scale"))
    limit = B.check_memory_limit(None if args.memory_limit is None else parse_number(args.memory_limit,
                                                                                      "--memory-limit"))
    if args.mesh_file:
        if args.mesh or args.refine:
            raise InputError("--mesh-file replaces --mesh and --refine; give one or the other")
        from ..mesh_io import read_mesh
        user_mesh = read_mesh(args.mesh_file, args.element)
        loads = ("shear", "extension") if args.load == "both" else (args.load,)
        nus = _floats(args.nu, "--nu") if args.nu else None
        if "," in args.variant:
            raise InputError("--mesh-file runs one variant; give --variant without a list")
        res = B.mesh_file_study(prob, user_mesh, args.variant, loads, nus, show_progress=show, memory_limit=limit)
    elif prob == "cantilever":
        meshes = B.CANTILEVER_MESHES if args.mesh in (None, "all") else (args.mesh,)
        for m in meshes:
            if m not in B.CANTILEVER_MESHES:
                raise InputError(f"--mesh {m!r} for the cantilever; allowed: {', '.join(B.CANTILEVER_MESHES)}, all")
        loads = ("shear", "extension") if args.load == "both" else (args.load,)
        refine = _int(1 if args.refine is None else args.refine, "--refine", 1, 64)
        res = B.cantilever_study(args.element, args.variant, meshes, loads, refine, show_progress=show,
                                 memory_limit=limit)
    elif prob == "membrane":
        if args.mesh is not None:
            levels = (_int(args.mesh, "--mesh"),)
        else:
            k = _int(5 if args.refine is None else args.refine, "--refine", 1, 10)
            levels = tuple(2 ** i for i in range(1, k + 1))
        res = B.membrane_study(args.element, args.variant, levels, show_progress=show, memory_limit=limit)
    elif prob == "cylinder":
        if args.mesh is not None:
            levels = (_int(args.mesh, "--mesh", 1, 1024),)
        else:
            k = _int(4 if args.refine is None else args.refine, "--refine", 1, 9)
            levels = tuple(2 ** i for i in range(1, k + 1))
        nus = _floats(args.nu, "--nu") if args.nu is not None else B.CYLINDER["nus"]
        res = B.cylinder_study(args.element, args.variant, levels, nus, show_progress=show, memory_limit=limit)
    else:
        depths = [_int(d, "--depths", 1, 64) for d in str(args.depths).split(",") if d.strip()]
        if not depths:
            raise InputError("--depths is empty; give elements through the depth, e.g. 1,2,4")
        acc = float(parse_number(args.accuracy, "--accuracy"))
        variants = [v.strip() for v in args.variant.split(",") if v.strip()]
        if not variants:
            raise InputError("--variant is empty")
        studies = [B.locking_mesh_study(args.element, v, depths, accuracy=acc, show_progress=show, memory_limit=limit)
                   for v in variants]
        if len(studies) == 1:
            res = studies[0]
        else:
            res = {"problem": "locking-mesh", "element": studies[0]["element"], "variant": ",".join(variants),
                   "studies": [{k: v for k, v in st.items() if not k.startswith("_") and k != "lines"}
                               for st in studies],
                   "results": [r for st in studies for r in st["results"]],
                   "lines": [line for st in studies for line in st["lines"]], "_solution": studies[-1]["_solution"],
                   "warnings": list(dict.fromkeys(w for st in studies for w in st.get("warnings", []))),
                   "_studies": studies, **{k: studies[-1][k] for k in ("mesh", "value", "reference", "normalized")}}
    files = {}
    writing = Progress(1, "bench", enabled=show)
    if args.plot:
        writing.step(f"writing the plot {args.plot}")
        if res.get("_studies"):
            files["plot"] = str(B.plot_locking_comparison(res["_studies"], args.plot, dpi))
        else:
            files["plot"] = str(B.plot_study(res, args.plot, dpi))
    if args.table:
        files["table"] = str(write_atomic(args.table, B.table_text(res)))
    if args.vtu:
        sol = res.get("_solution")
        if sol is None:
            raise InputError("--vtu: no run produced a solution (every mesh was a mechanism)")
        files["vtu"] = str(write_vtu(args.vtu, sol))
    writing.close()
    out = {k: v for k, v in res.items() if not k.startswith("_") and k != "lines"}
    out.setdefault("warnings", [])
    # results flagged by the mesh solve's mechanism check are marked, never plain numbers
    out["reliable"] = all(r.get("reliable") is not False for r in out.get("results", []))
    out["files"] = files
    if quiet:
        print_json({**out, "caution": CAUTION})
        return 0
    for line in res["lines"]:
        print(line)
    for kind, path in files.items():
        how = (f" (undeformed mesh with the point data 'displacement': warp by it, factor {scale:g}, to see the "
               "deformed shape)") if kind == "vtu" else ""
        print(f"{kind} written to {path}{how}")
    print(CAUTION)
    return 0
