"""The Element object of the public contract: ``derive.element(name, variant, state)``."""
from __future__ import annotations

from dataclasses import dataclass, field
from functools import cached_property, lru_cache

import numpy as np
import sympy as sp

from . import catalog, models, quadrature
from .catalog import ElementInfo
from .errors import InputError
from .formulations.base import Formulation, Point
from .geometry import IsoMap, make_geometry, validity_report
from .material import check_material
from .shapes import ShapeSet
from .limits import check_symbolic_points
from .stiffness import (NotPolynomial, condense_exact, condense_symbolic, exact_blocks, numeric_stiffness,
                        point_blocks, rule_label)
from .symbols import E as E_sym
from .symbols import nu as nu_sym, t as t_sym

RULE_CHOICES = ("element", "exact")


@dataclass(frozen=True)
class Element:
    """One element, one variant, one state: shape functions, map, B and stiffness."""

    info: ElementInfo
    variant: str
    state: str
    shapes: ShapeSet = field(compare=False)

    @property
    def name(self) -> str:
        return self.info.name

    @property
    def shape_functions(self) -> tuple[sp.Expr, ...]:
        return self.shapes.functions

    @cached_property
    def formulation(self) -> Formulation:
        return catalog.formulation(self.info, self.variant, self.state)

    @property
    def model(self) -> models.Model:
        """The kinematic model (fields, strains, measure) of ``state``."""
        return models.get(self.state)

    @property
    def dim(self) -> int:
        return self.info.dim

    @property
    def ndof(self) -> int:
        """Element DOFs: nodes x the model's fields (interleaved per node)."""
        return self.model.ndof(self.info.n_nodes)

    def map(self, geometry=None) -> IsoMap:
        """Isoparametric map for a geometry kind name (default: rectangle in 2-D, brick in 3-D)
        or numeric (n, dim) nodes."""
        geom = make_geometry(self.shapes, geometry, axisymmetric=self.model.radial_offset)
        return IsoMap(self.shapes, geom)

    def B(self, geometry=None) -> sp.Matrix:
        """Standard displacement B at the symbolic reference point for the geometry (entries
        cancelled on affine shapes)."""
        imap = self.map(geometry)
        B = Point(imap, self.state, *imap.coords).B
        return B.applyfunc(sp.cancel) if imap.is_affine else B

    def validity(self, nodes) -> dict:
        """Validity report (det J over the element and at the full rule's points)."""
        imap = self.map(nodes)
        return validity_report(imap, quadrature.rule(self.info.full_rule).points)

    def material(self, E=None, nu=None, t=None, D=None) -> dict:
        """Checked material values as exact sympy numbers; the symbols E, nu, t where not given.

        ``D``: a constitutive matrix replacing the isotropic D(E, nu) (e.g.
        :func:`derive.material.orthotropic`), of the model's strain size."""
        check_material(self.state, E, nu, t)
        out = {"E": E_sym if E is None else sp.nsimplify(E, rational=True),
               "nu": nu_sym if nu is None else sp.nsimplify(nu, rational=True),
               "t": t_sym if t is None else sp.nsimplify(t, rational=True)}
        if D is not None:
            n = len(self.model.strains)
            if not isinstance(D, sp.MatrixBase) or D.shape != (n, n):
                raise InputError(f"D must be a {n} x {n} sympy Matrix for state {self.state!r} "
                                 f"(Voigt [{', '.join(self.model.strains)}])")
            if self.variant in ("selective", "bbar"):
                raise InputError(f"variant {self.variant!r} splits the isotropic D(E, nu); an anisotropic D is "
                                 "offered with the other variants only")
            out["D"] = D
        return out

    def _rule_for(self, rule: str):
        if rule == "exact":
            return lambda term: None
        if rule == "element":
            return lambda term: self.info.rule_name(term.rule)
        quadrature.rule(rule)  # validates the name
        return lambda term: rule

    def stiffness(self, geometry=None, rule: str = "element", E=None, nu=None, t=None,
                  formulation: Formulation | None = None, D=None) -> sp.Matrix:
        """Element stiffness as a sympy Matrix.

        ``rule``: "element" (each term with the formulation's own rule, the default),
        "exact" (every integral exact over the reference domain: affine geometry only), or
        a rule name such as "gauss-3x3" that replaces every term's rule.  Material values
        default to the symbols E, nu, t (t is not used in 3-D).  ``geometry``: a kind name
        (default rectangle in 2-D, brick in 3-D) or numeric (n, dim) nodes.  ``D`` replaces the
        isotropic material matrix (anisotropic solids).  Numeric nodes on non-affine shapes are evaluated
        at 30-digit Float rule points.  ``formulation`` replaces the variant's own (the
        checker uses it to recompute the element with one deliberate mistake).
        """
        material = self.material(E, nu, t, D)
        imap = self.map(geometry)
        if imap.geometry.numeric:
            validity_report(imap, quadrature.rule(self.info.full_rule).points)
        rule_for = self._rule_for(rule)
        form = self.formulation if formulation is None else formulation
        if imap.is_affine and not self.model.needs_radius:
            try:
                blocks = exact_blocks(form, imap, self.state, material, rule_for)
            except NotPolynomial:
                pass
            else:
                return condense_exact(blocks, self.ndof, form.n_internal, form, rule_label(self, rule))
        if rule == "exact":
            raise InputError("exact integration needs a polynomial integrand (rectangle, parallelogram, "
                             "straight-sided triangle, brick, parallelepiped or straight-edged tetrahedron; not "
                             "axisymmetric); use --rule element or a Gauss rule")
        if imap.geometry.kind == "general" and form.n_internal:
            raise InputError(f"{self.name} {self.variant} on general symbolic geometry needs a symbolic condensation "
                             "that is too large to be useful; give numeric nodes or use the generated kernel")
        used = ("E", "nu") if self.state == "axisymmetric" else ("E", "nu", "t")  # axisymmetric: 2 pi r, no t
        symbolic_material = any(isinstance(material[k], sp.Basic) and material[k].free_symbols for k in used)
        if not imap.geometry.numeric or symbolic_material:
            own = quadrature.rule(self.info.full_rule).npoints
            for term in form.terms:
                name = rule_for(term)
                check_symbolic_points(quadrature.rule(name).npoints, name, f"{self.name} {self.variant} ({self.state})",
                                      own=own, geometry_symbolic=not imap.geometry.numeric)
        blocks = point_blocks(form, imap, self.state, material, lambda term: rule_for(term))
        return condense_symbolic(blocks, self.ndof, form.n_internal, form, rule_label(self, rule))

    def numeric_stiffness(self, xy, E: float, nu: float, t: float = 1.0) -> np.ndarray:
        """Float64 stiffness for one element (nodes, dim) or a batch (n, nodes, dim)."""
        key = self.info.name.upper()
        if catalog.ELEMENTS.get(key, self.info) != self.info:
            raise InputError(f"element {self.info.name!r} is not the catalogue element of that name")
        if key not in catalog.ELEMENTS:
            catalog.SPEC_ELEMENTS.setdefault(key, self.info)  # a spec element: make it resolvable by name
        return numeric_stiffness(self.info.name, self.variant, self.state, xy, E, nu, t)


def element(name: str, variant: str = "full", state: str | None = None) -> Element:
    """Catalogue element by name (T3, T6, Q4, Q8, Q9; H8, H20, H27, T4, T10, W6), variant and
    state (the kinematic model; default plane-stress for 2-D elements, solid for 3-D ones)."""
    if state is None:
        state = catalog.element_info(name).default_state
    return _element(name, variant, state)


@lru_cache(maxsize=None)
def _element(name: str, variant: str, state: str) -> Element:
    info = catalog.element_info(name)
    v = catalog.check_variant(info, variant)
    catalog.check_state(state)
    catalog.check_element_state(info, state)
    catalog.check_variant_state(v, state)
    return Element(info, variant, state, catalog.shape_set(info.name))


# the lru_cache interface of the public function (the cache sits behind the default-state resolution)
element.cache_clear = _element.cache_clear  # type: ignore[attr-defined]
element.cache_info = _element.cache_info  # type: ignore[attr-defined]
