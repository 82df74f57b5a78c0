"""Element and variant registry: the single source of element, variant and state names.

Elements are described by data only (reference domain, nodes, monomial basis, rules);
their shape functions come from :func:`derive.shapes.from_nodes` like a user-defined
element's.  Variants name a builder in ``derive.formulations``.
"""
from __future__ import annotations

import importlib
from dataclasses import dataclass
from functools import lru_cache

import sympy as sp

from . import models, reference
from . import shapes as shapes_mod
from .errors import InputError
from .material import STATES
from .symbols import eta, xi, zeta

R_ = sp.Rational


@dataclass(frozen=True)
class ElementInfo:
    """Catalogue entry: what the element is made of and how it is integrated."""

    name: str
    description: str
    domain: str
    nodes: tuple
    basis: tuple
    full_rule: str
    reduced_rule: str
    variants: tuple[str, ...]
    source: str = ""

    @property
    def n_nodes(self) -> int:
        return len(self.nodes)

    @property
    def dim(self) -> int:
        """Reference (and physical) dimension of the element: 1, 2 or 3."""
        return reference.dimension(self.domain)

    @property
    def default_state(self) -> str:
        """The model used when none is named: plane-stress in 2-D, solid in 3-D."""
        return {2: "plane-stress", 3: "solid"}.get(self.dim, models.names(self.dim)[0] if models.names(self.dim) else "")

    def states(self) -> tuple[str, ...]:
        """The kinematic models of the element's dimension."""
        return models.names(self.dim)

    def ndof_for(self, state: str) -> int:
        """DOFs of the element in a model: nodes x the model's fields."""
        return models.get(state).ndof(self.n_nodes)

    @property
    def ndof(self) -> int:
        """DOFs in the element's default model (nodes x fields)."""
        return self.ndof_for(self.default_state)

    def rule_name(self, which: str) -> str:
        """Resolve "full" / "reduced" to this element's rule name; other names pass through."""
        if which == "full":
            return self.full_rule
        if which == "reduced":
            return self.reduced_rule
        return which


@dataclass(frozen=True)
class VariantInfo:
    name: str
    description: str
    builder: str  # "module:function" inside derive.formulations
    source: str = ""
    #: states the variant is offered in (all by default)
    states: tuple[str, ...] = STATES


_SQ = ((-1, -1), (1, -1), (1, 1), (-1, 1))
_SQ_MID = ((0, -1), (1, 0), (0, 1), (-1, 0))
_TRI = ((0, 0), (1, 0), (0, 1))
_TRI_MID = ((R_(1, 2), 0), (R_(1, 2), R_(1, 2)), (0, R_(1, 2)))

ELEMENTS: dict[str, ElementInfo] = {}
VARIANTS: dict[str, VariantInfo] = {}


def register_element(info: ElementInfo) -> None:
    ELEMENTS[info.name] = info


def register_variant(info: VariantInfo) -> None:
    VARIANTS[info.name] = info


for _v in (
    VariantInfo("full", "displacement element, full integration", "displacement:full"),
    VariantInfo("reduced", "uniformly reduced integration", "displacement:reduced"),
    VariantInfo("selective", "reduced rule for the volumetric part of D only (all states; T6 plane states; T10 keeps 3 conformal zero modes)", "selective:selective",
                "Doherty, Wilson & Taylor (1969); Hughes (1987)"),
    VariantInfo("incompatible", "bubble modes 1-xi^2, 1-eta^2 (H8: and 1-zeta^2, nine modes), own Jacobian; fails the patch test off "
                "parallelograms (all states)", "incompatible:incompatible", "Wilson, Taylor, Doherty & Ghaboussi (1973)"),
    VariantInfo("incompatible-centred", "bubble modes through the centre Jacobian, scaled det J0/det J; passes "
                "the patch test (plane states, solid)", "incompatible:incompatible_centred", "Taylor, Beresford & Wilson (1976)",
                ("plane-stress", "plane-strain", "solid")),
    VariantInfo("bbar", "B-bar: dilatation projected on a constant (Q4, H8) or linear (Q8, Q9, T6, H20, H27, T10) pressure, condensed (plane states, solid; axisymmetric Q4)", "bbar:bbar",
                "Hughes (1980)"),
    VariantInfo("eas4", "enhanced assumed strain, 4 modes (plane states)", "eas:eas4", "Simo & Rifai (1990)",
                ("plane-stress", "plane-strain")),
    VariantInfo("hybrid5", "assumed-stress hybrid, 5 stress parameters (plane states)", "hybrid:hybrid5",
                "Pian & Sumihara (1984)", ("plane-stress", "plane-strain")),
    VariantInfo("eas9", "enhanced assumed strain, 9 modes (H8, solid)", "eas:eas9",
                "Simo & Rifai (1990)", ("solid",)),
    VariantInfo("eas21", "enhanced assumed strain, 21 modes (H8, solid)", "eas:eas21",
                "Andelfinger & Ramm (1993)", ("solid",)),
    VariantInfo("hybrid18", "assumed-stress hybrid, 18 stress parameters (H8, solid)", "hybrid:hybrid18",
                "Pian & Tong (1986)", ("solid",)),
):
    register_variant(_v)

register_element(ElementInfo(
    "T3", "3-node linear triangle (constant strain)", "triangle", _TRI,
    (sp.Integer(1), xi, eta), "triangle-d1", "triangle-d1", ("full",)))
register_element(ElementInfo(
    "T6", "6-node quadratic triangle (linear strain)", "triangle", _TRI + _TRI_MID,
    (sp.Integer(1), xi, eta, xi ** 2, xi * eta, eta ** 2), "triangle-d2", "triangle-d1", ("full", "reduced", "selective", "bbar")))
register_element(ElementInfo(
    "Q4", "4-node bilinear quadrilateral", "square", _SQ,
    (sp.Integer(1), xi, eta, xi * eta), "gauss-2x2", "gauss-1x1",
    ("full", "reduced", "selective", "incompatible", "incompatible-centred", "bbar", "eas4", "hybrid5")))
register_element(ElementInfo(
    "Q8", "8-node serendipity quadrilateral", "square", _SQ + _SQ_MID,
    (sp.Integer(1), xi, eta, xi ** 2, xi * eta, eta ** 2, xi ** 2 * eta, xi * eta ** 2),
    "gauss-3x3", "gauss-2x2", ("full", "reduced", "selective", "bbar")))
register_element(ElementInfo(
    "Q9", "9-node Lagrange quadrilateral", "square", _SQ + _SQ_MID + ((0, 0),),
    (sp.Integer(1), xi, eta, xi ** 2, xi * eta, eta ** 2, xi ** 2 * eta, xi * eta ** 2, xi ** 2 * eta ** 2),
    "gauss-3x3", "gauss-2x2", ("full", "reduced", "selective", "bbar")))


_CUBE = reference.vertices("cube")
_CUBE_EDGES = ((0, 1), (1, 2), (2, 3), (3, 0), (4, 5), (5, 6), (6, 7), (7, 4), (0, 4), (1, 5), (2, 6), (3, 7))
_CUBE_MID = tuple(tuple((u + v) / 2 for u, v in zip(_CUBE[i], _CUBE[j])) for i, j in _CUBE_EDGES)
_CUBE_FACES = ((0, 0, -1), (0, -1, 0), (1, 0, 0), (0, 1, 0), (-1, 0, 0), (0, 0, 1))
_TET = reference.vertices("tetrahedron")
_TET_EDGES = ((0, 1), (1, 2), (2, 0), (0, 3), (1, 3), (2, 3))
_TET_MID = tuple(tuple(R_(u + v, 2) for u, v in zip(_TET[i], _TET[j])) for i, j in _TET_EDGES)
_LIN3 = (sp.Integer(1), xi, eta, zeta)
_QUAD3 = _LIN3 + (xi ** 2, eta ** 2, zeta ** 2, xi * eta, eta * zeta, zeta * xi)
_SOLID_BASIC = ("full", "reduced", "selective", "bbar")

register_element(ElementInfo(
    "H8", "8-node trilinear hexahedron", "cube", _CUBE,
    _LIN3 + (xi * eta, eta * zeta, zeta * xi, xi * eta * zeta), "gauss-2x2x2", "gauss-1x1x1",
    _SOLID_BASIC + ("incompatible", "incompatible-centred", "eas9", "eas21", "hybrid18")))
register_element(ElementInfo(
    "H20", "20-node serendipity hexahedron", "cube", _CUBE + _CUBE_MID,
    _QUAD3 + (xi ** 2 * eta, xi ** 2 * zeta, eta ** 2 * xi, eta ** 2 * zeta, zeta ** 2 * xi, zeta ** 2 * eta,
              xi * eta * zeta, xi ** 2 * eta * zeta, xi * eta ** 2 * zeta, xi * eta * zeta ** 2),
    "gauss-3x3x3", "gauss-2x2x2", _SOLID_BASIC))
register_element(ElementInfo(
    "H27", "27-node triquadratic Lagrange hexahedron", "cube", _CUBE + _CUBE_MID + _CUBE_FACES + ((0, 0, 0),),
    tuple(xi ** i * eta ** j * zeta ** k for k in range(3) for j in range(3) for i in range(3)),
    "gauss-3x3x3", "gauss-2x2x2", _SOLID_BASIC))
register_element(ElementInfo(
    "T4", "4-node linear tetrahedron (constant strain)", "tetrahedron", _TET, _LIN3,
    "tetrahedron-d1", "tetrahedron-d1", ("full",)))
register_element(ElementInfo(
    "T10", "10-node quadratic tetrahedron", "tetrahedron", _TET + _TET_MID, _QUAD3,
    "tetrahedron-d2", "tetrahedron-d1", _SOLID_BASIC))
register_element(ElementInfo(
    "W6", "6-node linear wedge (triangular prism)", "wedge", reference.vertices("wedge"),
    _LIN3 + (xi * zeta, eta * zeta), "wedge-d2x2", "wedge-d1x1", ("full", "reduced")))


#: user-defined elements loaded from spec files in this process, by upper-case name; kept apart
#: from ELEMENTS so the catalogue (and the committed kernel set) never changes by loading a file
SPEC_ELEMENTS: dict[str, ElementInfo] = {}


def element_info(name: str) -> ElementInfo:
    """Catalogue entry by name, or the entry of a spec file when ``name`` is a ``.toml`` path
    (a shipped example may be named by its file name alone)."""
    if isinstance(name, str) and name.strip().lower().endswith(".toml"):
        return _spec_info(name.strip())
    key = name.strip().upper() if isinstance(name, str) else name
    if key in ELEMENTS:
        return ELEMENTS[key]
    if key in SPEC_ELEMENTS:
        return SPEC_ELEMENTS[key]
    raise InputError(f"unknown element {name!r}; allowed: {', '.join(ELEMENTS)} or a spec .toml file")


def _spec_info(path_text: str) -> ElementInfo:
    from pathlib import Path

    from .spec import SPEC_DIR, load_spec
    path = Path(path_text)
    if not path.exists() and (SPEC_DIR / path.name).exists():
        path = SPEC_DIR / path.name
    info, _ = load_spec(path)
    key = info.name.upper()
    if key in ELEMENTS:
        raise InputError(f"spec {path.name}: its name {info.name!r} is a catalogue element; give the spec another name")
    SPEC_ELEMENTS[key] = info
    return info


def check_variant(info: ElementInfo, variant: str) -> VariantInfo:
    if variant not in VARIANTS:
        raise InputError(f"unknown variant {variant!r}; allowed: {', '.join(VARIANTS)}")
    if variant not in info.variants:
        raise InputError(f"variant {variant!r} does not apply to {info.name}; {info.name} has: {', '.join(info.variants)}")
    return VARIANTS[variant]


def check_state(state: str) -> str:
    if state not in STATES:
        raise InputError(f"unknown state {state!r}; allowed: {', '.join(STATES)}")
    return state


def check_element_state(info: ElementInfo, state: str) -> None:
    """Refuse a model of another dimension (a 2-D element with the solid model and vice versa)."""
    model = models.get(check_state(state))
    if model.dim != info.dim:
        allowed = ", ".join(info.states()) or "none"
        raise InputError(f"element {info.name} is {info.dim}-D but state {state!r} is a {model.dim}-D model; "
                         f"allowed for {info.name}: {allowed}")


@lru_cache(maxsize=None)
def shape_set(name: str) -> shapes_mod.ShapeSet:
    info = element_info(name)
    return shapes_mod.from_nodes(info.name, info.domain, info.nodes, info.basis)


def check_variant_state(v: VariantInfo, state: str) -> None:
    if state not in v.states:
        raise InputError(f"variant {v.name!r} is offered in {', '.join(v.states)} only; got state {state!r}")


def formulation(info: ElementInfo, variant: str, state: str):
    """Build the variant's :class:`~derive.formulations.base.Formulation` for this element."""
    v = check_variant(info, variant)
    check_element_state(info, state)
    check_variant_state(v, state)
    module, func = v.builder.split(":")
    mod = importlib.import_module(f"derive.formulations.{module}")
    return getattr(mod, func)(info, state)
