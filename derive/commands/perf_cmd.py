"""`derive perf`: benchmarks, reported as ratios measured in one run."""
from __future__ import annotations

import platform

from ..output import emit_json, working
from ..perf import SECTIONS, run_section
from .common import add_output_args, output_format, print_json

NAME = "perf"
HELP = "benchmarks (symbolic derivation, locking, kernels, mesh) measured side by side"
EXAMPLE = ("examples:\n  derive perf --symbolic\n  derive perf --kernels --quick\n  derive perf --all --json")


def add_arguments(p) -> None:
    for name in SECTIONS:
        p.add_argument(f"--{name}", action="store_true", help=f"run the {name} benchmark")
    p.add_argument("--all", action="store_true", help="run every benchmark")
    p.add_argument("--quick", action="store_true", help="smaller problem sizes (a smoke run, not the figures)")
    add_output_args(p, formats=False)


def run(args) -> int:
    chosen = [n for n in SECTIONS if args.all or getattr(args, n)]
    if not chosen:
        chosen = list(SECTIONS)
    results = []
    for name in chosen:
        with working(f"perf {name}", enabled=False if output_format(args) == "json" else None):
            res = run_section(name, quick=args.quick)
        results.append(res)
        if output_format(args) != "json":
            _print(res)
    if output_format(args) == "json":
        print_json({"machine": {"python": platform.python_version(), "processor": platform.machine()},
                    "results": results})
    return 0


def _print(res: dict) -> None:
    name = res.get("section")
    if not res.get("available", True):
        print(f"[{name}] not available in this build")
        return
    print(f"[{name}]")
    for line in res.get("lines", []):
        print("  " + line)
    if not res.get("lines"):
        print("  " + emit_json(res).replace("\n", "\n  "))
