"""`derive demo`: the worked scenario end to end, outputs in a folder."""
from __future__ import annotations

from ..demo import run_demo
from ..output import CAUTION
from .common import add_output_args, output_format, print_json

NAME = "demo"
HELP = "run the worked scenario (an invented transfer-beam check) and write its outputs into a folder"
EXAMPLE = "examples:\n  derive demo\n  derive demo -o my-demo-folder --json"


def add_arguments(p) -> None:
    p.add_argument("-o", "--output", default="derive-demo", help="folder for the outputs (default: ./derive-demo)")
    add_output_args(p, formats=False)


def run(args) -> int:
    quiet = output_format(args) == "json"
    summary = run_demo(args.output, show_progress=False if quiet else None)
    if quiet:
        print_json({"output": args.output, "sections": summary["sections"]})
        return 0
    for sec in summary["sections"]:
        print(f"== {sec['title']}")
        for line in sec["lines"]:
            print("  " + line)
    print(f"\nOutputs written to {args.output}/ (report: {args.output}/demo-report.md)")
    print(CAUTION)
    return 0
