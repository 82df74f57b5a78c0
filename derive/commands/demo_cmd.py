"""`derive demo`: the worked scenario end to end, outputs in a folder."""
from __future__ import annotations

from ..demo import run_demo
from ..output import CAUTION
from .common import add_force_arg, add_output_args, output_format, print_json

NAME = "demo"
HELP = "run the worked scenario (an invented transfer-beam check) and write its outputs into a folder"
EXAMPLE = "examples:\n  derive demo\n  derive demo -o my-demo-folder --json\n  derive demo -o my-demo-folder --force"


def add_arguments(p) -> None:
    p.add_argument("-o", "--output", default="derive-demo",
                   help="folder for the outputs (default: ./derive-demo); created if missing, its parent must "
                        "exist; a folder holding files derive did not write needs --force")
    add_force_arg(p, "write into a folder that holds other files (derive replaces only its own file names and "
                     "deletes nothing)")
    add_output_args(p, formats=False)


def _print_section(sec: dict) -> None:
    print(f"== {sec['title']}")
    for line in sec["lines"]:
        print("  " + line)
    print(flush=True)


def run(args) -> int:
    quiet = output_format(args) == "json"
    summary = run_demo(args.output, show_progress=False if quiet else None, force=args.force,
                       on_section=None if quiet else _print_section)
    if quiet:
        print_json({"output": args.output, "sections": summary["sections"], "caution": CAUTION})
        return 0
    print(f"Outputs written to {args.output}/ (report: {args.output}/demo-report.md)")
    print(CAUTION)
    return 0
