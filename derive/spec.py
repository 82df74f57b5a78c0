"""User-defined elements from a small TOML file of derive's own design.

Example (``derive/specs/q8-serendipity.toml``)::

    name = "Q8S"
    description = "8-node serendipity quadrilateral from its monomials"
    domain = "square"                      # "square" [-1,1]^2 or "triangle" (0,0),(1,0),(0,1);
                                           # 3-D: "hexahedron" [-1,1]^3, "tetrahedron", "wedge"
    nodes = [[-1, -1], [1, -1], [1, 1], [-1, 1], [0, -1], [1, 0], [0, 1], [-1, 0]]
    basis = ["1", "xi", "eta", "xi^2", "xi*eta", "eta^2", "xi^2*eta", "xi*eta^2"]
    full_rule = "gauss-3x3"                # optional; default from the basis degree
    reduced_rule = "gauss-2x2"             # optional

Node coordinates are numbers or strings holding a fraction ("1/3").  Shape functions come
from the generalised Vandermonde matrix (:func:`derive.shapes.from_nodes`).

A spec's text reaches generated kernel source (the name, the description, the file name), so
it is validated here before anything else sees it: the name is a short identifier
(:data:`NAME_PATTERN`) that does not collide with a catalogue name after normalisation
(strip, case-fold), the description is printable ASCII, and the size is bounded
(:data:`MAX_NODES`, :data:`MAX_DEGREE`, :data:`MAX_TOTAL_DEGREE`, :data:`MAX_FILE_BYTES`)
so that a crafted file cannot make the derivation run for minutes.  The code generator
escapes every literal per target language as well (defence in depth).
"""
from __future__ import annotations

import math
import re
import sys
from pathlib import Path

import sympy as sp

from .catalog import ElementInfo
from .errors import SpecError
from .files import regular_file_size
from .shapes import ShapeSet, from_nodes, monomials

if sys.version_info >= (3, 11):
    import tomllib
else:  # pragma: no cover
    import tomli as tomllib

SPEC_DIR = Path(__file__).parent / "specs"
#: domain names a spec may use -> reference domain ("hexahedron" is the reference cube)
DOMAIN_NAMES = {"square": "square", "triangle": "triangle", "hexahedron": "cube", "cube": "cube",
                "tetrahedron": "tetrahedron", "wedge": "wedge"}
KEYS = ("name", "description", "domain", "nodes", "basis", "full_rule", "reduced_rule")

#: a spec name: a letter, then letters, digits, "_" or "-"; at most 16 characters (it becomes
#: part of C and Fortran identifiers, whose length Fortran limits to 63)
NAME_PATTERN = re.compile(r"[A-Za-z][A-Za-z0-9_-]{0,15}")
DESCRIPTION_MAX = 200
#: size limits: 27 nodes admits every element up to the 27-node Lagrange hexahedron; the
#: per-coordinate and total degree limits admit everything up to a quartic Lagrange square
#: (Q25) and a quintic triangle (T21).  Beyond them the exact derivation runs for minutes.
MAX_NODES = 27
MAX_DEGREE = 6
MAX_TOTAL_DEGREE = 8
MAX_FILE_BYTES = 65536
#: a node coordinate written as text (a fraction such as "1/3") is at most this long
MAX_COORD_CHARS = 40


def shipped_specs() -> list[Path]:
    return sorted(SPEC_DIR.glob("*.toml"))


def load_spec(path) -> tuple[ElementInfo, ShapeSet]:
    """Read and validate a spec file; every problem is a one-line :class:`SpecError`."""
    path = Path(path)
    where = _printable(path.name)
    data = _read(path, where)
    unknown = sorted(set(data) - set(KEYS))
    if unknown:
        raise SpecError(f"{where}: unknown key(s) {', '.join(unknown)}; allowed: {', '.join(KEYS)}")
    for key in ("name", "domain", "nodes", "basis"):
        if key not in data:
            raise SpecError(f"{where}: missing key {key!r} (required: name, domain, nodes, basis)")
    name = check_name(data["name"], where)
    description = _check_description(data.get("description", "user-defined element"), where)
    domain = DOMAIN_NAMES.get(str(data["domain"]).strip().lower(), str(data["domain"]))
    if domain not in DOMAIN_NAMES.values():
        raise SpecError(f"{where}: unknown domain {data['domain']!r}; allowed: {', '.join(DOMAIN_NAMES)}")
    from .reference import coordinates
    coords = coordinates(domain)
    shape = "[" + ", ".join(c.name for c in coords) + "]"
    what = "a pair" if len(coords) == 2 else "a triple"
    if not isinstance(data["nodes"], list) or not data["nodes"]:
        raise SpecError(f"{where}: 'nodes' must be a list of {shape} coordinates")
    if len(data["nodes"]) > MAX_NODES:
        raise SpecError(f"{where}: {len(data['nodes'])} nodes; a spec has at most {MAX_NODES} nodes "
                        "(the limit of the exact derivation's running time)")
    nodes = []
    for k, node in enumerate(data["nodes"], start=1):
        if not isinstance(node, list) or len(node) != len(coords):
            raise SpecError(f"{where}: node {k} must be {what} {shape} on the {data['domain']}")
        nodes.append(tuple(_coordinate(v, where, k) for v in node))
    basis_raw = data["basis"]
    if isinstance(basis_raw, list):
        basis_raw = ",".join(str(v) for v in basis_raw)
    basis_text = str(basis_raw)
    bad = re.search(r"[^A-Za-z0-9_*^ ,]", basis_text)
    if bad:
        raise SpecError(f"{where}: basis: character {bad.group()!r} is not allowed (allowed: ASCII monomials such "
                        "as xi^2*eta, separated by commas)")
    try:
        basis = monomials(basis_text, domain)
        _check_degree(basis, where)
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
    info = ElementInfo(name=name, description=description, domain=domain,
                       nodes=tuple(nodes), basis=basis, full_rule=full_rule, reduced_rule=reduced_rule,
                       variants=("full", "reduced"), source=where)
    return info, shapes


def _read(path: Path, where: str) -> dict:
    """The parsed TOML of a spec file of bounded size; every failure a one-line SpecError."""
    regular_file_size(path, "spec file", "an element spec .toml file", SpecError)
    try:
        with open(path, "rb") as fh:
            raw = fh.read(MAX_FILE_BYTES + 1)
    except FileNotFoundError:
        raise SpecError(f"spec file {_printable(str(path))} not found") from None
    except IsADirectoryError:
        raise SpecError(f"spec file {_printable(str(path))} is a folder, not a file") from None
    except OSError as exc:
        raise SpecError(f"spec file {_printable(str(path))}: cannot be read ({exc.strerror or exc})") from None
    if len(raw) > MAX_FILE_BYTES:
        raise SpecError(f"{where}: larger than {MAX_FILE_BYTES // 1024} kB; a spec file is at most "
                        f"{MAX_FILE_BYTES // 1024} kB")
    try:
        return tomllib.loads(raw.decode("utf-8"))
    except UnicodeDecodeError:
        raise SpecError(f"{where}: not a UTF-8 text file") from None
    except tomllib.TOMLDecodeError as exc:
        raise SpecError(f"{where}: not valid TOML ({_printable(str(exc))})") from None
    except ValueError as exc:  # e.g. an integer of more than 4300 digits
        what = "an integer of more than 4300 digits" if "digits" in str(exc) else _printable(str(exc))
        raise SpecError(f"{where}: not valid TOML ({what})") from None


def _printable(text: str, limit: int = 80) -> str:
    """``text`` safe to print on one terminal line: control and non-ASCII characters escaped, shortened."""
    out = text.encode("ascii", "backslashreplace").decode("ascii")
    out = "".join(c if c.isprintable() else repr(c)[1:-1] for c in out)
    return out if len(out) <= limit else out[:limit] + "..."


def check_name(value, where: str) -> str:
    """A spec's name, validated: an identifier-like short ASCII name, not a catalogue name.

    The name becomes part of generated source (identifiers, string literals, comments), of
    file names and of terminal output, so nothing else is allowed through.
    """
    from .catalog import ELEMENTS
    if not isinstance(value, str):
        raise SpecError(f"{where}: 'name' must be a string such as \"Q12\", got {type(value).__name__}")
    norm = value.strip().casefold()
    for cat in ELEMENTS:
        if norm == cat.casefold():
            raise SpecError(f"{where}: name {_printable(value)!r} collides with the catalogue element {cat} "
                            "(names are compared stripped and case-folded); give the spec another name")
    if not NAME_PATTERN.fullmatch(value):
        raise SpecError(f"{where}: name {_printable(value, 40)!r} is not allowed; a name is a letter followed by "
                        "letters, digits, '_' or '-', at most 16 characters (e.g. \"Q12\")")
    return value


def _check_description(value, where: str) -> str:
    if not isinstance(value, str):
        raise SpecError(f"{where}: 'description' must be a string")
    if len(value) > DESCRIPTION_MAX or not all(" " <= c <= "~" for c in value):
        raise SpecError(f"{where}: description {_printable(value, 40)!r} is not allowed; it must be printable ASCII "
                        f"on one line, at most {DESCRIPTION_MAX} characters")
    return value


def _check_degree(basis, where: str) -> None:
    """Refuse bases whose degree makes the exact derivation unbounded (domain-agnostic)."""
    for k, m in enumerate(basis, start=1):
        if m.is_number:
            continue
        syms = sorted(m.free_symbols, key=str)
        poly = sp.Poly(m, *syms)
        per = max(poly.degree(s) for s in syms)
        total = poly.total_degree()
        if per > MAX_DEGREE or total > MAX_TOTAL_DEGREE:
            raise SpecError(f"basis entry {k} ({_printable(str(m).replace('**', '^'), 40)}) has degree {per} in one "
                            f"coordinate and {total} in total; the limits are {MAX_DEGREE} and {MAX_TOTAL_DEGREE}")


def _coordinate(v, where: str, k: int) -> sp.Rational:
    if isinstance(v, bool):
        raise SpecError(f"{where}: node {k}: coordinate {v!r} is not a number")
    if isinstance(v, int):
        return sp.Integer(v)
    if isinstance(v, float):
        if not math.isfinite(v):
            raise SpecError(f"{where}: node {k}: coordinate {v!r} is not a finite number")
        return sp.nsimplify(v, rational=True)
    if isinstance(v, str):
        s = v.strip()
        if len(s) > MAX_COORD_CHARS or not re.fullmatch(r"[0-9+\-./ ]+([eE][+-]?[0-9]{1,2})?", s):
            raise SpecError(f"{where}: node {k}: coordinate {_printable(v, 40)!r} is not a number or fraction such as "
                            f"\"1/3\" (at most {MAX_COORD_CHARS} characters)")
        try:
            if "/" in s:
                p, q = s.split("/", 1)
                p, q = int(p), int(q)
            else:
                p, q = sp.Rational(s), 1
        except (ValueError, TypeError, ZeroDivisionError):
            p = None
        if p is not None:
            if q == 0:
                raise SpecError(f"{where}: node {k}: coordinate {v!r} divides by zero")
            return sp.Rational(p, q)
    raise SpecError(f"{where}: node {k}: coordinate {_printable(repr(v), 40)} is not a number or fraction such as "
                    "\"1/3\"")


def default_rules(domain: str, basis) -> tuple[str, str]:
    """Full and reduced rules that integrate a rectangle's B^T D B exactly / one order lower.

    Square: with per-direction degree p, B has degree <= p per direction and B^T B <= 2p,
    which n = p + 1 Gauss points integrate exactly.  Triangle: total degree d gives
    products of degree 2d - 2.
    """
    from .symbols import eta, xi, zeta
    if domain == "square":
        p = max(max(sp.degree(m, xi), sp.degree(m, eta)) for m in basis)
        return f"gauss-{p + 1}x{p + 1}", f"gauss-{max(p, 1)}x{max(p, 1)}"
    if domain == "cube":
        p = max(max(sp.degree(m, s) for s in (xi, eta, zeta)) for m in basis)
        return f"gauss-{p + 1}x{p + 1}x{p + 1}", f"gauss-{max(p, 1)}x{max(p, 1)}x{max(p, 1)}"
    if domain == "triangle":
        d = max(sp.Poly(m, xi, eta).total_degree() for m in basis)
        return f"triangle-d{max(1, 2 * d - 2)}", f"triangle-d{max(1, 2 * d - 3)}"
    if domain == "tetrahedron":
        d = max(sp.Poly(m, xi, eta, zeta).total_degree() for m in basis)
        return f"tetrahedron-d{min(5, max(1, 2 * d - 2))}", f"tetrahedron-d{min(5, max(1, 2 * d - 3))}"
    # wedge: triangle degree in (xi, eta), Gauss points in zeta
    d = max(sp.Poly(m, xi, eta).total_degree() for m in basis)
    p = max(sp.degree(m, zeta) for m in basis)
    return f"wedge-d{min(5, max(1, 2 * d))}x{p + 1}", f"wedge-d{max(1, 2 * d - 2)}x{max(p, 1)}"
