"""The worked demo scenario, end to end, written into a folder the user names.

Scenario (invented): Ines Okafor, an engineer at the fictional Fenwick Rowe Partnership,
is checking the in-house solver used for transfer beam TB-3 of the fictional Larkspur
Wharf building: a deep floor-slab transfer beam, 7.2 m span, 1.2 m deep, 0.4 m thick,
concrete E = 32 GPa, nu = 0.2, modelled in plane stress.  She must pick an element and a
mesh, know how far the element locks at the aspect ratios she can afford, ship a kernel,
and prove her solver's element matrix right.

Each capability adds a section: a function ``section(outdir) -> dict`` returning
``{"title", "lines", "files"}``.  Sections run in the order of ``SECTIONS``.
"""
from __future__ import annotations

import importlib
import time
from pathlib import Path
from typing import Callable

import numpy as np
import sympy as sp

from .element import element
from .output import (CAUTION, OutputFolder, display, emit_json, matrix_header, matrix_latex, matrix_text, working,
                     write_atomic)
from .symbols import E, a, b, nu, t

SCENARIO = {
    "beam": "transfer beam TB-3, Larkspur Wharf (fictional)",
    "span_m": 7.2, "depth_m": 1.2, "thickness_m": 0.4, "E_Pa": 32e9, "nu": 0.2, "state": "plane-stress",
}

#: "module:function" of each section; later capabilities append theirs here.
SECTIONS = [
    "derive.demo:core_section",
    "derive.charts:demo_section",
    "derive.benchmarks:demo_section",
    "derive.check:demo_section",
    "derive.codegen.demo:demo_section",
]


def core_section(outdir: Path) -> dict:
    """Shape functions and the closed-form Q4 / Q8 stiffness for the candidate mesh."""
    files, lines = [], []
    q4 = element("Q4")
    K4 = q4.stiffness("rectangle")
    head = matrix_header(K4, "K", q4, "rectangle", "element")
    files.append(write_atomic(outdir / "q4-rectangle-stiffness.txt",
                              head + "\n# index-base: 0\n" + matrix_text(K4, "K", symmetric=True) + "\n"))
    files.append(write_atomic(outdir / "q4-rectangle-stiffness.tex",
                              matrix_header(K4, "K", q4, "rectangle", "element", comment="%", full=True) + "\n"
                              + matrix_latex(K4) + "\n"))
    # candidate mesh: 12 x 4 Q4 elements over the 7.2 m x 1.2 m beam -> 0.6 m x 0.3 m elements
    half_w, half_h = 0.6 / 2, 0.3 / 2
    vals = {a: sp.Rational(3, 10), b: sp.Rational(3, 20), E: sp.Integer(32 * 10 ** 9), nu: sp.Rational(1, 5),
            t: sp.Rational(2, 5)}
    Kn = np.array(K4.subs(vals).evalf().tolist(), dtype=float)
    eig = np.linalg.eigvalsh(Kn)
    zero = int(np.sum(np.abs(eig) < 1e-9 * np.abs(eig).max()))
    lines.append(f"Q4 closed form: K[0,0] = {display(K4[0, 0])}")
    lines.append(f"candidate mesh 12 x 4 Q4 over 7.2 m x 1.2 m: elements {2 * half_w:.2f} m x {2 * half_h:.2f} m, "
                 f"aspect ratio a/b = {half_w / half_h:.1f}")
    lines.append(f"Q4 stiffness of one such element: {zero} zero eigenvalues (3 expected: rigid-body modes), "
                 f"largest {eig.max():.4g} N/m")
    for name in ("Q4", "Q8", "Q9", "T3", "T6"):
        checks = element(name).shapes.checks()
        lines.append(f"{name} shape functions: partition of unity {checks['partition_of_unity']}, "
                     f"Kronecker delta {checks['kronecker_delta']}, completeness degree {checks['completeness']}")
    q8 = element("Q8")
    K8 = q8.stiffness("rectangle")
    files.append(write_atomic(outdir / "q8-rectangle-stiffness.txt", matrix_header(K8, "K", q8, "rectangle", "element")
                              + "\n# index-base: 0\n" + matrix_text(K8, "K", symmetric=True) + "\n"))
    return {"title": "Element matrices", "lines": lines, "files": [str(f.name) for f in files]}


def run_demo(outdir: str | Path, show_progress: bool | None = None, force: bool = False,
             on_section: Callable[[dict], None] | None = None) -> dict:
    """Run every section; write demo-report.md and demo-summary.json into ``outdir``.

    ``outdir`` follows the folder rule of :class:`derive.output.OutputFolder` (its parent must
    exist; a folder holding files derive did not write needs ``force``).  ``on_section`` is
    called with each section's result as soon as it finishes (the CLI prints it).
    """
    folder = OutputFolder(outdir, "-o", force=force)
    outdir = folder.path
    started = time.time()
    results = []
    try:
        for k, spec in enumerate(SECTIONS, start=1):
            module, func = spec.split(":")
            fn = getattr(importlib.import_module(module), func)
            with working(f"demo section {k}/{len(SECTIONS)} ({module.rsplit('.', 1)[-1]})", enabled=show_progress,
                         after=0.5):
                res = fn(outdir)
            results.append(res)
            if on_section is not None:
                on_section(res)
    finally:
        folder.adopt(started)
    report = [f"# derive demo: {SCENARIO['beam']}", "", f"> {CAUTION}", "",
              "Scenario (invented): checking the in-house solver used for a deep floor-slab transfer beam, "
              f"{SCENARIO['span_m']} m span, {SCENARIO['depth_m']} m deep, {SCENARIO['thickness_m']} m thick, "
              f"E = {SCENARIO['E_Pa'] / 1e9:g} GPa, nu = {SCENARIO['nu']}, plane stress.", ""]
    for res in results:
        report.append(f"## {res['title']}")
        report.append("")
        report += [f"- {line}" for line in res["lines"]]
        if res.get("files"):
            report.append("")
            report.append("Files: " + ", ".join(f"`{f}`" for f in res["files"]))
        report.append("")
    folder.write("demo-report.md", "\n".join(report) + "\n")
    summary = {"scenario": SCENARIO, "sections": results, "caution": CAUTION}
    folder.write("demo-summary.json", emit_json(summary) + "\n")
    return summary
