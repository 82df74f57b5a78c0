"""`derive kernel`: generate NumPy / C / Fortran element kernels; regenerate or check the committed set."""
from __future__ import annotations

import sys
import time
from pathlib import Path

from ..errors import InputError
from ..output import Progress, write_atomic
from .common import add_output_args, output_format, print_json, resolve_element

NAME = "kernel"
HELP = "generate element kernels (NumPy, C, Fortran): stiffness, validity, recovery; --all / --check the committed set"
EXAMPLE = ("examples:\n"
           "  derive kernel Q4 --lang c -o kernels/            # q4_full_plane_stress.c and .h into kernels/\n"
           "  derive kernel Q8 --variant reduced --state plane-strain --lang fortran -o kernels/\n"
           "  derive kernel Q4 --variant eas4 --lang numpy     # print the NumPy module\n"
           "  derive kernel T6 --lang all -o kernels/ --json   # all three languages, machine-readable summary\n"
           "  derive kernel --all                              # regenerate generated/ (the committed set)\n"
           "  derive kernel --check                            # exit 1 if generated/ is stale\n"
           "  derive kernel --list                             # what the committed set contains")

LANG_CHOICES = ("numpy", "c", "fortran", "all")


def add_arguments(p) -> None:
    p.add_argument("element", nargs="?", help="catalogue name (T3, T6, Q4, Q8, Q9) or a spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default), plane-strain, axisymmetric")
    p.add_argument("--lang", default="numpy", help="numpy (default), c, fortran, or all")
    p.add_argument("-o", "--output", help="folder to write into (created; files written atomically); "
                                          "default: print the source, or generated/ for --all")
    p.add_argument("--all", action="store_true", help="regenerate the whole committed set (default folder generated/)")
    p.add_argument("--check", action="store_true",
                   help="compare the committed set with what the generator produces now; exit 1 on any difference")
    p.add_argument("--list", action="store_true", help="list the committed set (element, variant, state, languages)")
    p.add_argument("--jobs", type=int, default=None, help="worker processes for --all/--check (default: up to 2)")
    add_output_args(p, formats=False)


def _target(args) -> Path:
    from ..codegen.committed import repo_generated_dir
    if args.output:
        return Path(args.output)
    d = repo_generated_dir()
    if d is None:
        raise InputError("no source checkout found for generated/; give the folder with -o DIR")
    return d


def run(args) -> int:
    from ..codegen import committed
    modes = [m for m in ("all", "check", "list") if getattr(args, m)]
    if len(modes) > 1:
        raise InputError("--all, --check and --list exclude each other; give one")
    if args.jobs is not None and args.jobs < 1:
        raise InputError(f"--jobs must be >= 1, got {args.jobs}")
    fmt = output_format(args)
    if modes:
        if args.element:
            raise InputError(f"--{modes[0]} works on the whole committed set; drop the element argument")
        if modes[0] == "list":
            rows = [{"element": e, "variant": v, "state": s, "languages": list(langs)}
                    for e, v, s, langs in committed.committed_set()]
            if fmt == "json":
                print_json({"committed": rows, "policy": committed.__doc__.split("\n\n")[1].strip()})
            else:
                for r in rows:
                    print(f"{r['element']:4s} {r['variant']:22s} {r['state']:14s} {', '.join(r['languages'])}")
            return 0
        dest = _target(args)
        show = fmt != "json"
        progress = Progress(len(committed.committed_set()), "kernels", enabled=None if show else False)
        t0 = time.perf_counter()
        files = committed.render_all(jobs=args.jobs, progress=lambda k, n: progress.step())
        progress.close()
        elapsed = time.perf_counter() - t0
        if modes[0] == "all":
            committed.write_all(dest, files)
            if fmt == "json":
                print_json({"written": str(dest), "files": len(files), "seconds": round(elapsed, 2)})
            else:
                print(f"wrote {len(files)} files into {dest}/ in {elapsed:.1f} s")
            return 0
        diffs = committed.differences(dest, files)
        if fmt == "json":
            print_json({"folder": str(dest), "up_to_date": not diffs, "differences": diffs,
                        "seconds": round(elapsed, 2)})
        elif diffs:
            print(f"{dest}/ is stale ({len(diffs)} difference(s)); run `derive kernel --all`:")
            for d in diffs[:40]:
                print("  " + d)
            if len(diffs) > 40:
                print(f"  ... {len(diffs) - 40} more")
        else:
            print(f"{dest}/ is up to date ({len(files)} files, checked in {elapsed:.1f} s)")
        return 1 if diffs else 0
    if not args.element:
        raise InputError("give an ELEMENT (e.g. Q4), or --all / --check / --list")
    lang = args.lang.strip().lower()
    if lang not in LANG_CHOICES:
        raise InputError(f"unknown --lang {args.lang!r}; allowed: {', '.join(LANG_CHOICES)}")
    langs = ("numpy", "c", "fortran") if lang == "all" else (lang,)
    el = resolve_element(args.element, args.variant, args.state)
    from ..codegen.emit import generate
    from ..codegen.ir import build
    t0 = time.perf_counter()
    ir = build(el.info, el.shapes, el.variant, el.state)
    sets = generate(el.name, el.variant, el.state, langs=langs, ir=ir)
    elapsed = time.perf_counter() - t0
    summary = {"element": el.name, "variant": el.variant, "state": el.state, "seconds": round(elapsed, 3),
               "kernels": []}
    written = []
    for ks in sets:
        entry = {"lang": ks.lang, "files": [], "flops": ks.meta["flops"], "rules": ks.meta["rules"],
                 "ndof": ks.meta["ndof"], "n_internal": ks.meta["n_internal"]}
        for src in ks.sources:
            fname = Path(src.path).name
            if args.output:
                path = write_atomic(Path(args.output) / fname, src.text, make_folder=True)
                written.append(str(path))
                entry["files"].append(str(path))
            else:
                entry["files"].append(fname)
        summary["kernels"].append(entry)
    if fmt == "json":
        if not args.output:
            for entry, ks in zip(summary["kernels"], sets):
                entry["sources"] = {Path(s.path).name: s.text for s in ks.sources}
        print_json(summary)
        return 0
    if args.output:
        for w in written:
            print(f"wrote {w}")
        print(f"({el.name} {el.variant} {el.state}: derived and emitted in {elapsed:.2f} s)")
        return 0
    if len(sets) > 1:
        raise InputError("--lang all writes several files; give -o DIR")
    src = sets[0].sources[0]
    sys.stdout.write(src.text)
    if len(sets[0].sources) > 1:
        others = ", ".join(Path(s.path).name for s in sets[0].sources[1:])
        print(f"/* also generated: {others}; use -o DIR to write all files */")
    return 0
