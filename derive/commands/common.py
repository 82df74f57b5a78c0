"""Helpers shared by the command modules: element resolution, output options, printing."""
from __future__ import annotations

import argparse
import sys
from pathlib import Path

from .. import catalog
from ..element import Element, element
from ..errors import InputError
from ..material import STATES
from ..output import CAUTION, DEFAULT_DIGITS, FORMATS, emit_json


class HelpFormatter(argparse.RawDescriptionHelpFormatter):
    pass


def add_element_args(p: argparse.ArgumentParser, variant: bool = True, state: bool = True) -> None:
    p.add_argument("element", help="catalogue name (" + ", ".join(catalog.ELEMENTS) + ") or a spec .toml file")
    if variant:
        p.add_argument("--variant", default="full", help="formulation variant (default: full); see `derive list`")
    if state:
        p.add_argument("--state", default=None, help="kinematic model: plane-stress (default for 2-D elements), "
                       "plane-strain, axisymmetric; solid (default and only model for 3-D elements)")


def add_output_args(p: argparse.ArgumentParser, formats: bool = True) -> None:
    if formats:
        p.add_argument("--format", choices=FORMATS, default="text", help="output format (default: text)")
    p.add_argument("--json", action="store_true",
                   help="machine-readable JSON output" + (" (same as --format json)" if formats else ""))


def output_format(args) -> str:
    if getattr(args, "json", False):
        return "json"
    return getattr(args, "format", "text")


def resolve_element(name: str, variant: str = "full", state: str | None = None) -> Element:
    """Catalogue name, or a path to a spec file (``.toml``); ``state`` None: the element's default model."""
    if state is not None and state not in STATES:
        raise InputError(f"unknown state {state!r}; allowed: {', '.join(STATES)}")
    path = Path(name)
    if not name.lower().endswith(".toml") and path.exists() and path.is_file():
        raise InputError(f"{name}: an element spec file must end in .toml")
    return element(name, variant, state)  # catalogue names and spec .toml files alike


def default_state(args) -> None:
    """Fill ``--state`` when it was not given: the element's default model (plane-stress for a
    2-D element, solid for a 3-D one)."""
    if getattr(args, "state", "") is None and isinstance(getattr(args, "element", None), str):
        args.state = catalog.element_info(args.element).default_state


def print_json(obj) -> None:
    sys.stdout.write(emit_json(obj) + "\n")


def caution_line() -> str:
    return CAUTION


def add_force_arg(p: argparse.ArgumentParser, what: str = "replace an existing output file") -> None:
    """``--force``: the one switch that lets a command replace or write into what exists
    (see the output-path rules in derive/output.py)."""
    p.add_argument("--force", action="store_true", help=what)


def add_digits_arg(p: argparse.ArgumentParser, default: int | None = DEFAULT_DIGITS) -> None:
    """``--digits N``: significant digits of the numbers in text output.  ``default=None``: each
    number keeps the report's own format unless the option is given."""
    p.add_argument("--digits", default=None if default is None else str(default),
                   help="significant digits of numbers in text output (1 to 17; default "
                        + (f"{default})" if default is not None else "each report's own format)"))
