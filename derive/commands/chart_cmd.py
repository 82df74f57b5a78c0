"""`derive chart KIND`: design charts of the closed-form locking ratio (PNG, SVG or PDF)."""
from __future__ import annotations

from pathlib import Path

from .. import charts, plotting
from ..errors import InputError
from ..limits import check_aspect
from ..output import CAUTION, check_output_file, parse_number, working
from .common import add_force_arg, add_output_args, output_format, print_json
from .locking_cmd import parse_nus

NAME = "chart"
HELP = ("design charts of the bending locking ratio: against aspect ratio (locking), over aspect ratio and "
        "Poisson's ratio (contour), against a distortion (distortion); format from the file extension")
EXAMPLE = ("examples:\n"
           "  derive chart locking --elements Q4:full,Q4:incompatible-centred,Q8:full --state plane-stress \\\n"
           "      --nu 0,0.3,0.49 --aspect 1:20 -o chart.png\n"
           "  derive chart contour --elements Q4:full --state plane-strain --aspect 1:20 --nu 0:0.499 -o q4.svg\n"
           "  derive chart distortion --elements Q4:full,Q4:eas4,Q8:full --distortion taper=0:0.6 "
           "--aspect 1 --nu 0.3 -o taper.pdf")
KINDS = ("locking", "contour", "distortion")


def add_arguments(p) -> None:
    p.add_argument("kind", choices=KINDS,
                   help="locking (ratio vs aspect), contour (one element over aspect and nu), "
                        "distortion (ratio vs skew/taper/trapezoid)")
    p.add_argument("--elements", default="Q4:full",
                   help="ELEMENT[:VARIANT] list, e.g. Q4:full,Q4:eas4,Q8 (contour: exactly one)")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default) or plane-strain")
    p.add_argument("--nu", help="locking: list of nu (default 0,0.3,0.49); contour: range lo:hi (default 0:0.499); "
                                "distortion: one value (default 0.3)")
    p.add_argument("--aspect", help="locking/contour: range lo:hi of r = a/b (default 1:20); distortion: one value "
                                    "(default 1)")
    p.add_argument("--tolerance", default="0.05", help="tolerance band / contour (default 0.05; 'none' to omit)")
    p.add_argument("--distortion", default="taper=0:0.6",
                   help="distortion chart: KIND=lo:hi with KIND skew (degrees), taper or trapezoid (default taper=0:0.6)")
    p.add_argument("-o", "--output", required=True,
                   help="chart file to write: .png, .svg or .pdf (its folder must exist)")
    p.add_argument("--dpi", default=str(plotting.DEFAULT_DPI),
                   help=f"resolution of a .png chart in dots per inch (default {plotting.DEFAULT_DPI}, print quality; "
                        f"{plotting.DPI_RANGE[0]}-{plotting.DPI_RANGE[1]})")
    add_force_arg(p, "replace an existing chart file")
    add_output_args(p, formats=False)


def _pair(text: str, what: str) -> tuple[float, float]:
    parts = text.split(":")
    if len(parts) != 2:
        raise InputError(f"{what} {text!r}: give a range lo:hi, e.g. 1:20")
    lo, hi = float(parse_number(parts[0], what)), float(parse_number(parts[1], what))
    if what == "--aspect":
        check_aspect(lo, "--aspect")
        check_aspect(hi, "--aspect")
    if not lo < hi:
        raise InputError(f"{what} {text!r}: need lo < hi")
    return lo, hi


def run(args) -> int:
    out = Path(args.output)
    if out.suffix.lower() not in charts.FORMATS:
        raise InputError(f"-o {args.output!r}: the chart file must end in {', '.join(charts.FORMATS)}")
    check_output_file(out, "-o", args.force)
    dpi = plotting.check_dpi(args.dpi)
    tol = None if args.tolerance.strip().lower() == "none" else float(parse_number(args.tolerance, "--tolerance"))
    specs = charts.parse_specs(args.elements)
    with working(f"{args.kind} chart", enabled=False if output_format(args) == "json" else None):
        fig, meta = _figure(args, specs, tol)
        data = charts.series(fig)
        path = charts.save(fig, out, dpi=dpi)
    summary = {"chart": args.kind, "output": str(path), "format": charts.FORMATS[out.suffix.lower()],
               "elements": [f"{n}:{v}" for n, v in specs], "state": args.state, **meta,
               "series": [d["gid"] for d in data], "dpi": dpi, "bytes": path.stat().st_size, "caution": CAUTION}
    if output_format(args) == "json":
        print_json(summary)
        return 0
    print(f"{args.kind} chart written to {path} ({summary['bytes']} bytes, {len(data)} data lines)")
    print(CAUTION)
    return 0


def _figure(args, specs, tol):
    """The chart's figure and the parameters it was drawn for."""
    if args.kind == "locking":
        nus = parse_nus(args.nu) if args.nu is not None else [0.0, 0.3, 0.49]
        aspect = _pair(args.aspect, "--aspect") if args.aspect is not None else (1.0, 20.0)
        fig = charts.locking_chart(specs, args.state, nus, aspect, tol)
        meta = {"nu": nus, "aspect": list(aspect)}
    elif args.kind == "contour":
        if len(specs) != 1:
            raise InputError("a contour chart is for one element: give --elements with exactly one entry")
        name, variant = specs[0]
        nu_range = _pair(args.nu, "--nu") if args.nu is not None else (0.0, 0.499)
        aspect = _pair(args.aspect, "--aspect") if args.aspect is not None else (1.0, 20.0)
        fig = charts.contour_chart(name, variant, args.state, aspect, nu_range, tolerance=tol)
        meta = {"nu": list(nu_range), "aspect": list(aspect)}
    else:
        kind, eq, rng = args.distortion.partition("=")
        kind = kind.strip().lower()
        if not eq:
            raise InputError(f"--distortion {args.distortion!r}: write KIND=lo:hi, e.g. taper=0:0.6 or skew=0:45")
        values = _pair(rng, "--distortion")
        nu = float(parse_number(args.nu, "--nu")) if args.nu is not None else 0.3
        aspect = check_aspect(parse_number(args.aspect, "--aspect"), "--aspect") if args.aspect is not None else 1.0
        fig = charts.distortion_chart(specs, args.state, kind, values, aspect, nu)
        meta = {"nu": nu, "aspect": aspect, "distortion": kind, "range": list(values)}
    return fig, meta
