"""`derive samples`: copy the shipped sample inputs (for `derive check`) into a folder."""
from __future__ import annotations

from importlib import resources
from pathlib import Path

from ..errors import OutputError
from ..output import CAUTION, check_output_file, write_atomic
from .common import add_force_arg, add_output_args, output_format, print_json

NAME = "samples"
HELP = "copy small sample inputs (a hand derivation, a solver's exported matrix) to try `derive check` on"
EXAMPLE = ("examples:\n  derive samples                 # my-k.txt and solver-k.csv into the current folder\n"
           "  derive samples -o inputs --force\n"
           "  derive check my-k.txt --element Q4")

#: the command that exercises each sample (printed after copying; the README tour runs them)
TRY = {
    "my-k.txt": "derive check my-k.txt --element Q4",
    "solver-k.csv": 'derive check solver-k.csv --element Q4 --nodes "0,0 2,0 2.5,1 0,1.5" --set E=210e9,nu=0.3,t=0.01',
}


def sample_files() -> dict[str, bytes]:
    """Name -> contents of every shipped sample (derive/samples/, package data)."""
    folder = resources.files("derive") / "samples"
    return {f.name: f.read_bytes() for f in sorted(folder.iterdir(), key=lambda f: f.name)
            if f.is_file() and not f.name.startswith((".", "_"))}


def add_arguments(p) -> None:
    p.add_argument("-o", "--output", default=".", help="existing folder to copy the samples into (default: .)")
    add_force_arg(p, "replace sample files of the same name that already exist there")
    add_output_args(p, formats=False)


def run(args) -> int:
    folder = Path(args.output)
    if not folder.is_dir():
        raise OutputError(f"-o {args.output}: " + ("is a file; give a folder" if folder.exists() else
                                                  "folder does not exist; create it first"))
    files = sample_files()
    targets = {name: check_output_file(folder / name, "-o", args.force) for name in files}  # all checked first
    written = [str(write_atomic(targets[name], data)) for name, data in files.items()]
    if output_format(args) == "json":
        print_json({"files": written, "try": [TRY[n] for n in files if n in TRY], "caution": CAUTION})
        return 0
    for path in written:
        print(f"wrote {path}")
    print("try:" + "".join(f"\n  {TRY[n]}" for n in files if n in TRY))
    return 0
