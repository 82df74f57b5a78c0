"""User-defined elements from a small TOML file of derive's own design.

Example (``derive/specs/q8-serendipity.toml``)::

    name = "Q8S"
    description = "8-node serendipity quadrilateral from its monomials"
    domain = "square"                      # "square" [-1,1]^2 or "triangle" (0,0),(1,0),(0,1)
    nodes = [[-1, -1], [1, -1], [1, 1], [-1, 1], [0, -1], [1, 0], [0, 1], [-1, 0]]
    basis = ["1", "xi", "eta", "xi^2", "xi*eta", "eta^2", "xi^2*eta", "xi*eta^2"]
    full_rule = "gauss-3x3"                # optional; default from the basis degree
    reduced_rule = "gauss-2x2"             # optional

Node coordinates are numbers or strings holding a fraction ("1/3").  Shape functions come
from the generalised Vandermonde matrix (:func:`derive.shapes.from_nodes`).
"""
from __future__ import annotations

import sys
from pathlib import Path

import sympy as sp

from .catalog import ElementInfo
from .errors import SpecError
from .shapes import ShapeSet, from_nodes, monomials

if sys.version_info >= (3, 11):
    import tomllib
else:  # pragma: no cover
    import tomli as tomllib

SPEC_DIR = Path(__file__).parent / "specs"
KEYS = ("name", "description", "domain", "nodes", "basis", "full_rule", "reduced_rule")


def shipped_specs() -> list[Path]:
    return sorted(SPEC_DIR.glob("*.toml"))


def load_spec(path) -> tuple[ElementInfo, ShapeSet]:
    """Read and validate a spec file; every problem is a one-line :class:`SpecError`."""
    path = Path(path)
    where = path.name
    try:
        data = tomllib.loads(path.read_text(encoding="utf-8"))
    except FileNotFoundError:
        raise SpecError(f"spec file {path} not found") from None
    except UnicodeDecodeError:
        raise SpecError(f"{where}: not a UTF-8 text file") from None
    except tomllib.TOMLDecodeError as exc:
        raise SpecError(f"{where}: not valid TOML ({exc})") from None
    unknown = sorted(set(data) - set(KEYS))
    if unknown:
        raise SpecError(f"{where}: unknown key(s) {', '.join(unknown)}; allowed: {', '.join(KEYS)}")
    for key in ("name", "domain", "nodes", "basis"):
        if key not in data:
            raise SpecError(f"{where}: missing key {key!r} (required: name, domain, nodes, basis)")
    name = str(data["name"])
    domain = str(data["domain"])
    if not isinstance(data["nodes"], list) or not data["nodes"]:
        raise SpecError(f"{where}: 'nodes' must be a list of [xi, eta] pairs")
    nodes = []
    for k, node in enumerate(data["nodes"], start=1):
        if not isinstance(node, list) or len(node) != 2:
            raise SpecError(f"{where}: node {k} must be a pair [xi, eta]")
        nodes.append(tuple(_coordinate(v, where, k) for v in node))
    basis_raw = data["basis"]
    if isinstance(basis_raw, list):
        basis_raw = ",".join(str(v) for v in basis_raw)
    try:
        basis = monomials(str(basis_raw))
        shapes = from_nodes(name, domain, nodes, basis)
    except SpecError as exc:
        raise SpecError(f"{where}: {exc}") from None
    default_full, default_red = default_rules(domain, basis)
    full_rule = str(data.get("full_rule", default_full))
    reduced_rule = str(data.get("reduced_rule", default_red))
    from . import quadrature
    for r in (full_rule, reduced_rule):
        try:
            rl = quadrature.rule(r)
        except Exception as exc:
            raise SpecError(f"{where}: {exc}") from None
        if rl.domain != domain:
            raise SpecError(f"{where}: rule {r} is for the {rl.domain}, the element is on the {domain}")
    info = ElementInfo(name=name, description=str(data.get("description", "user-defined element")), domain=domain,
                       nodes=tuple(nodes), basis=basis, full_rule=full_rule, reduced_rule=reduced_rule,
                       variants=("full", "reduced"), source=str(path.name))
    return info, shapes


def _coordinate(v, where: str, k: int) -> sp.Rational:
    if isinstance(v, bool):
        raise SpecError(f"{where}: node {k}: coordinate {v!r} is not a number")
    if isinstance(v, int):
        return sp.Integer(v)
    if isinstance(v, float):
        return sp.nsimplify(v, rational=True)
    if isinstance(v, str):
        s = v.strip()
        try:
            if "/" in s:
                p, q = s.split("/", 1)
                return sp.Rational(int(p), int(q))
            return sp.Rational(s)
        except (ValueError, TypeError, ZeroDivisionError):
            pass
    raise SpecError(f"{where}: node {k}: coordinate {v!r} is not a number or fraction such as \"1/3\"")


def default_rules(domain: str, basis) -> tuple[str, str]:
    """Full and reduced rules that integrate a rectangle's B^T D B exactly / one order lower.

    Square: with per-direction degree p, B has degree <= p per direction and B^T B <= 2p,
    which n = p + 1 Gauss points integrate exactly.  Triangle: total degree d gives
    products of degree 2d - 2.
    """
    from .symbols import eta, xi
    if domain == "square":
        p = max(max(sp.degree(m, xi), sp.degree(m, eta)) for m in basis)
        return f"gauss-{p + 1}x{p + 1}", f"gauss-{max(p, 1)}x{max(p, 1)}"
    d = max(sp.Poly(m, xi, eta).total_degree() for m in basis)
    return f"triangle-d{max(1, 2 * d - 2)}", f"triangle-d{max(1, 2 * d - 3)}"
