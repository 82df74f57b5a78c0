"""`derive list`: elements, variants, states, rules and shipped spec files."""
from __future__ import annotations

from .. import catalog
from ..material import STATES
from ..spec import shipped_specs
from .common import add_output_args, output_format, print_json

NAME = "list"
HELP = "list elements, variants, states and example spec files"
EXAMPLE = "example:\n  derive list\n  derive list --json"


def add_arguments(p) -> None:
    add_output_args(p, formats=False)


def run(args) -> int:
    elements = [{"name": e.name, "description": e.description, "nodes": e.n_nodes, "domain": e.domain,
                 "full_rule": e.full_rule, "reduced_rule": e.reduced_rule, "variants": list(e.variants)}
                for e in catalog.ELEMENTS.values()]
    variants = [{"name": v.name, "description": v.description, "source": v.source,
                 "states": list(getattr(v, "states", STATES))} for v in catalog.VARIANTS.values()]
    specs = [p.name for p in shipped_specs()]
    if output_format(args) == "json":
        print_json({"elements": elements, "variants": variants, "states": list(STATES), "specs": specs})
        return 0
    print("Elements:")
    for e in elements:
        print(f"  {e['name']:<4} {e['description']} ({e['domain']}; rules: full {e['full_rule']}, "
              f"reduced {e['reduced_rule']})")
        print(f"       variants: {', '.join(e['variants'])}")
    print("Variants:")
    for v in variants:
        src = f" [{v['source']}]" if v["source"] else ""
        print(f"  {v['name']:<22} {v['description']}{src}")
    print("States:\n  " + ", ".join(STATES))
    print("Example spec files (use the file name as ELEMENT):\n  " + "\n  ".join(specs))
    return 0
