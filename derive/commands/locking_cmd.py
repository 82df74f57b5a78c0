"""`derive locking ELEMENT`: closed-form bending locking ratio, spurious strains, limits."""
from __future__ import annotations

import math

import sympy as sp

from .. import catalog
from ..errors import InputError
from ..limits import echo, parse_whole
from ..locking import display_form, report
from ..symbols import nu, r
from ..output import CAUTION, check_digits, num, parse_number, working
from .common import add_digits_arg, add_output_args, print_json

NAME = "locking"
HELP = ("closed-form bending ratio theta_element/theta_continuum of a 2a x 2b rectangle in pure bending, "
        "in r = a/b and nu, with the spurious strains, tolerance limits and distortion sensitivity")
EXAMPLE = ("examples:\n"
           "  derive locking Q4\n"
           "  derive locking Q4 --variant full --aspect 2 --nu 0.3\n"
           "  derive locking Q4 --state plane-strain --tolerance 0.05 --nu 0:0.45\n"
           "  derive locking Q4 --variant eas4 --distortion taper=0.3 --aspect 2 --nu 0.3 --json\n"
           "  derive locking Q8 --distortion skew=30")


def add_arguments(p) -> None:
    p.add_argument("element", help="catalogue name (" + ", ".join(catalog.ELEMENTS) + ") or a spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default) or plane-strain")
    p.add_argument("--aspect", help="evaluate at this aspect ratio r = a/b (a along the bending axis)")
    p.add_argument("--nu", help="Poisson's ratio: one value (0.3), a list (0,0.2,0.3) or a range lo:hi[:steps] "
                                "of steps + 1 values, both ends included (0:0.45 gives 10 steps, 11 values: "
                                "0, 0.045, ..., 0.45); a list or range is used by --tolerance")
    p.add_argument("--tolerance", help="largest aspect ratio with |ratio - 1| <= TOLERANCE, e.g. 0.05")
    p.add_argument("--distortion", help="also the ratio of a distorted shape: skew=DEGREES, taper=FRACTION "
                                        "(depth varying along the element) or trapezoid=FRACTION (leaning ends); "
                                        "at --aspect and --nu (defaults 1 and 0.3)")
    add_output_args(p)
    add_digits_arg(p)


def parse_nus(text: str | None) -> list[float] | None:
    """One value, a comma list, or lo:hi[:steps] -> list of floats (None when not given)."""
    if text is None:
        return None
    text = text.strip()
    if ":" in text:
        parts = text.split(":")
        if len(parts) not in (2, 3):
            raise InputError(f"--nu {echo(text)}: a range is lo:hi or lo:hi:steps, e.g. 0:0.45")
        lo, hi = (float(parse_number(v, "--nu")) for v in parts[:2])
        steps = parse_whole(parts[2], "--nu steps", 1, 200) if len(parts) == 3 else 10
        if not lo < hi:
            raise InputError(f"--nu {echo(text)}: need lo < hi")
        vals = [lo + (hi - lo) * k / steps for k in range(steps + 1)]
    else:
        vals = [float(parse_number(v, "--nu")) for v in text.split(",") if v.strip()]
    if not vals:
        raise InputError("--nu is empty; give a value such as 0.3")
    for v in vals:
        if not -1 < v <= 0.5:
            raise InputError(f"--nu {echo(text)}: Poisson's ratio {v:g} is not allowed; -1 < nu <= 0.5")
    return vals


def run(args) -> int:
    fmt = "json" if args.json else args.format
    digits = check_digits(args.digits)
    nus = parse_nus(args.nu)
    aspect = None
    if args.aspect is not None:
        aspect = float(parse_number(args.aspect, "--aspect"))
        if aspect <= 0:
            raise InputError(f"--aspect must be a positive number, got {args.aspect}")
    tolerance = None
    if args.tolerance is not None:
        tolerance = float(parse_number(args.tolerance, "--tolerance"))
        if not 0 < tolerance < 1:
            raise InputError(f"--tolerance must be between 0 and 1, e.g. 0.05; got {args.tolerance}")
    single_nu = nus[0] if nus and len(nus) == 1 else None
    with working(f"locking of {args.element}", enabled=False if fmt == "json" else None):
        res = report(args.element, args.variant, args.state, aspect=aspect, nu_value=single_nu, tolerance=tolerance,
                     nus=nus, distortion_spec=args.distortion)
    if nus and len(nus) > 1 and aspect is not None and not res["zero_energy"]:
        from ..locking import evaluate
        res["ratios"] = [[v, evaluate(args.element, args.variant, args.state, aspect, v)] for v in nus]
    res["caution"] = CAUTION
    if fmt == "json":
        print_json(res)
        return 0
    if fmt == "latex":
        if res["formula"] is None:
            print(r"\text{zero-energy mode: no finite ratio}")
        else:
            expr = sp.sympify(res["formula"], locals={"r": r, "nu": nu})
            print(r"\frac{\theta_{e}}{\theta_{c}} = " + sp.latex(display_form(expr)))
        return 0
    for line in text_lines(res, digits):
        print(line)
    print(CAUTION)
    return 0


def text_lines(res: dict, digits: int = 6) -> list[str]:
    out = [f"{res['element']} {res['variant']}, {res['state']}: bending rotation ratio theta_element/theta_continuum",
           "  (one 2a x 2b rectangular element in pure bending; r = a/b, a along the bending axis)"]
    if res["zero_energy"]:
        out.append("  bending is a zero-energy mode of this element: it offers no stiffness (ratio unbounded)")
        return out
    out.append(f"  ratio = {res['formula_display']}")
    if res.get("ratio") is not None:
        out.append(f"  at r = {res['aspect']:g}, nu = {res['nu']:g}: {num(res['ratio'], digits)}")
    for v, val in res.get("ratios", []):
        out.append(f"  at r = {res['aspect']:g}, nu = {v:g}: {num(val, digits)}")
    st = res.get("spurious_strain")
    if st:
        out.append(f"  strains against the continuum: {st['summary']}")
        parts = max(len(d.get("element_parts", [])) for d in st["components"].values())
        if parts > 1:
            out.append("    (the rectangle is two triangles split along the diagonal from (-a, -b) to (a, b); "
                       "their strain fields differ and are shown apart)")
        for comp, d in st["components"].items():
            if len(d.get("element_parts", [])) > 1:
                out.append(f"    {comp:<8} continuum {d['continuum']}")
                for part in d["element_parts"]:
                    out.append(f"    {'':<8}   element, {part['part']}: {part['field']}")
            else:
                out.append(f"    {comp:<8} element {d['element']:<40} continuum {d['continuum']}")
        out.append(f"    ({st['units']})")
    tol = res.get("tolerance")
    if tol:
        out.append(f"  largest aspect ratio within {tol['tolerance']:g} of 1:")
        for lim in tol["limits"]:
            val = lim["aspect_limit"]
            txt = "unlimited" if val is not None and math.isinf(val) else (
                "none" if not val else f"r <= {num(val, digits)}")
            extra = f"; closed form r* = {lim['closed_form']}" if lim.get("closed_form") else f" ({lim['method']})"
            out.append(f"    nu = {lim['nu']:g}: {txt}{extra}")
    vol = res.get("volumetric")
    if vol:
        verdict = "locks (goes to zero)" if vol["locks"] else "stays finite"
        out.append(f"  volumetric index (plane strain): ratio as nu -> 1/2 = {vol['limit']} ({verdict}); "
                   f"at r = {vol['aspect']:g}: " + ", ".join(f"nu={v:g}: {num(x, digits)}" for v, x in vol["curve"]))
    dist = res.get("distortion")
    if dist:
        val = "zero-energy mode" if dist["ratio"] is None else num(dist["ratio"], digits)
        base = "zero-energy mode" if dist["undistorted_ratio"] is None else num(dist["undistorted_ratio"], digits)
        out.append(f"  distortion {dist['kind']}={dist['value']:g} ({dist['shape']}) at r = {dist['aspect']:g}, "
                   f"nu = {dist['nu']:g}: {val} (undistorted {base}; {dist['method']})")
        if dist.get("formula"):
            out.append(f"    in {dist['formula_symbol']}: {dist['formula']}")
        if dist.get("formula_r_nu_c"):
            out.append(f"    in r, nu and c: {dist['formula_r_nu_c']}")
    out.append(f"  method: {res['source']}")
    return out
