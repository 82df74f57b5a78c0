"""Benchmarks behind `derive perf`: ratios measured side by side in one run.

Each section is a function ``benchmark(quick: bool) -> dict`` in the module that owns the
capability; this table maps the section names to them, so adding a benchmark does not
touch the command.  Timing lives here, never in pass/fail tests.
"""
from __future__ import annotations

import importlib

SECTIONS = {
    "symbolic": "derive.bench_symbolic:benchmark",
    "locking": "derive.locking:benchmark",
    "kernels": "derive.codegen.bench:benchmark",
    "mesh": "derive.mesh:benchmark",
}


def run_section(name: str, quick: bool = False) -> dict:
    """Run one section; a section whose module does not exist yet reports that instead."""
    module, func = SECTIONS[name].split(":")
    try:
        mod = importlib.import_module(module)
    except ModuleNotFoundError as exc:
        if exc.name == module:
            return {"section": name, "available": False}
        raise
    fn = getattr(mod, func, None)
    if fn is None:
        return {"section": name, "available": False}
    result = fn(quick=quick)
    result.setdefault("section", name)
    result.setdefault("available", True)
    return result
