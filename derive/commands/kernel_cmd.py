"""`derive kernel`: generate NumPy / C / Fortran element kernels; regenerate or check the committed set."""
from __future__ import annotations

import os
import sys
import time
from pathlib import Path

from ..errors import InputError
from ..limits import whole_number
from ..output import OutputFolder, Progress
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
           "  derive kernel --list                             # what the committed set contains\n"
           "only files derive wrote into a folder (recorded in its manifest) are replaced or removed;\n"
           "--all refuses (exit 2) a file of the same name that derive did not write unless --force;\n"
           "a single kernel's -o refuses a folder holding files derive did not write unless --force")

LANG_CHOICES = ("numpy", "c", "fortran", "all")


def add_arguments(p) -> None:
    p.add_argument("element", nargs="?", help="catalogue name (T3, T6, Q4, Q8, Q9) or a spec .toml file")
    p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    p.add_argument("--state", default="plane-stress", help="plane-stress (default), plane-strain, axisymmetric")
    p.add_argument("--lang", default="numpy", help="numpy (default), c, fortran, or all")
    p.add_argument("-o", "--output", help="folder to write into (created when its parent exists; files written "
                                          "atomically; derive replaces and removes only files its manifest says it "
                                          "wrote); default: print the source, or generated/ for --all")
    p.add_argument("--force", action="store_true",
                   help="write even where files derive did not write exist, replacing those of the same name "
                        "(never removes any other file)")
    p.add_argument("--all", action="store_true", help="regenerate the whole committed set (default folder generated/)")
    p.add_argument("--check", action="store_true",
                   help="compare the committed set with what the generator produces now; exit 1 on any difference")
    p.add_argument("--list", action="store_true", help="list the committed set (element, variant, state, languages)")
    p.add_argument("--jobs", type=whole_number, default=None, help="worker processes for --all/--check (default: up to 2)")
    add_output_args(p, formats=False)


def _target(args) -> Path:
    from ..codegen.committed import repo_generated_dir
    if args.output:
        return Path(args.output)
    d = repo_generated_dir()
    if d is None:
        raise InputError("no source checkout found for generated/; give the folder with -o DIR")
    return d


def _cores() -> int:
    """Cores this process may run on (the affinity mask where the platform has one)."""
    try:
        return max(1, len(os.sched_getaffinity(0)))
    except (AttributeError, OSError):
        return max(1, os.cpu_count() or 1)


def run(args) -> int:
    from ..codegen import committed
    modes = [m for m in ("all", "check", "list") if getattr(args, m)]
    if len(modes) > 1:
        raise InputError("--all, --check and --list exclude each other; give one")
    if args.jobs is not None and args.jobs < 1:
        raise InputError(f"--jobs must be >= 1, got {args.jobs}")
    if args.jobs is not None and args.jobs > _cores():
        print(f"derive kernel: --jobs {args.jobs} capped at {_cores()}, the number of cores available",
              file=sys.stderr)
        args.jobs = _cores()
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
            done = committed.write_all(dest, files, force=args.force)
            if fmt == "json":
                print_json({"written": str(dest), "files": len(files), "seconds": round(elapsed, 2),
                            "removed": done["removed"], "replaced_not_derive": done["replaced_foreign"]})
            else:
                print(f"wrote {len(files)} files into {dest}/ in {elapsed:.1f} s")
                for rel in done["removed"]:
                    print(f"  removed {rel} (written by an earlier derive kernel --all, no longer generated)")
                for rel in done["replaced_foreign"]:
                    print(f"  replaced {rel} (not written by derive; --force)")
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
    if args.output:
        folder = OutputFolder(args.output, "-o", force=args.force)
        names = [Path(src.path).name for ks in sets for src in ks.sources]
        for name in names:
            folder.target(name)                    # every name checked before the first write
        written = [str(folder.write(Path(src.path).name, src.text)) for ks in sets for src in ks.sources]
    for ks in sets:
        entry = {"lang": ks.lang, "files": [], "flops": ks.meta["flops"], "rules": ks.meta["rules"],
                 "ndof": ks.meta["ndof"], "n_internal": ks.meta["n_internal"]}
        for src in ks.sources:
            fname = Path(src.path).name
            entry["files"].append(str(Path(args.output) / fname) if args.output else fname)
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
