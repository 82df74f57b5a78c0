"""`derive patch ELEMENT`: constant-strain and higher-order patch tests; exit 1 on failure."""
from __future__ import annotations

from .. import catalog
from ..limits import check_tolerance, tolerance_help
from ..output import CAUTION, check_digits, digits_override
from ..patch import FORMS, ORDERS, PATCHES, patch_test, summary_lines
from .common import add_digits_arg, add_output_args, output_format, print_json

NAME = "patch"
HELP = "patch tests on the published five-element patch (displacement- and force-driven); exit 1 on failure"
EXAMPLE = ("examples:\n"
           "  derive patch Q4\n"
           "  derive patch Q4 --variant incompatible          # fails on the distorted patch\n"
           "  derive patch Q8 --order higher --patch regular\n"
           "  derive patch T6 --state plane-strain --json")


def add_arguments(p) -> None:
    p.add_argument("element", help="catalogue name (" + ", ".join(catalog.ELEMENTS) + ") or a spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    p.add_argument("--state", default="plane-stress", choices=("plane-stress", "plane-strain"),
                   help="plane-stress (default; the published stresses 1333/1333/400) or plane-strain")
    p.add_argument("--form", default="both", choices=FORMS + ("both",),
                   help="displacement-driven, force-driven or both (default)")
    p.add_argument("--order", choices=ORDERS + ("both",),
                   help="constant strain, higher (pure bending, quadratic elements only) or both")
    p.add_argument("--patch", choices=PATCHES + ("both",),
                   help="the distorted five-element patch, a regular 2 x 2 patch, or both.  Without --order and "
                        "--patch: constant strain on the distorted patch, plus (quadratic elements) the higher-order "
                        "test on the regular patch")
    p.add_argument("--tol", default="1e-6", help="relative tolerance for passing (default 1e-6; " + tolerance_help("patch") + ")")
    add_output_args(p, formats=False)
    add_digits_arg(p, default=None)


def run(args) -> int:
    tol = check_tolerance(args.tol, "patch")
    forms = FORMS if args.form == "both" else (args.form,)
    orders = None if args.order is None else (ORDERS if args.order == "both" else (args.order,))
    patches = None if args.patch is None else (PATCHES if args.patch == "both" else (args.patch,))
    res = patch_test(args.element, args.variant, args.state, forms, orders, patches, tol)
    if output_format(args) == "json":
        print_json({**res, "caution": CAUTION})
    else:
        with digits_override(check_digits(args.digits) if args.digits is not None else None):
            lines = summary_lines(res)
        for line in lines:
            print(line)
        print(CAUTION)
    return 0 if res["passed"] else 1
