"""Kinematic models: what is interpolated at the nodes and which strains it produces.

A model (the public ``state`` argument) owns, for the elements of its dimension:

* its nodal **fields** (``("u", "v")`` in the plane, ``("u", "v", "w")`` in 3-D; structural
  models add rotations), so an element has ``ndof = nodes x len(fields)`` DOFs, interleaved per
  node (u1, v1, w1, u2, ...);
* its generalised **strains** (Voigt labels) and how each is built from the fields: a table of
  entries ``(row, field, operator, coefficient)`` with operator ``d/d<axis>``, ``N`` (the value)
  or ``N/r`` (the value over the radius); :meth:`Model.B` assembles B from N and dN/dx with it,
  the same code for every model and dimension;
* its **constitutive** matrix D, the deviatoric/volumetric split and the volumetric vector
  (delegated to :mod:`derive.material` by name);
* its **measure**: the factor multiplying det J in every integral (t in the plane, 2 pi r
  axisymmetric, 1 for the 3-D solid);
* its **rigid-body modes**.

Adding a model is one :func:`register` call with a new entry table (see DEVELOPERS.md).
"""
from __future__ import annotations

from dataclasses import dataclass
from typing import Callable, Sequence

import sympy as sp

from . import material
from .errors import InputError

#: operator names of the strain table: derivative along physical axis k ("d0", "d1", "d2"),
#: the shape function value ("N") and the value over the radius ("N/r", axisymmetric hoop strain)
OPERATORS = ("d0", "d1", "d2", "N", "N/r")


@dataclass(frozen=True)
class Entry:
    """One contribution to B: strain ``row`` += coefficient * operator(N_i) * field value."""

    row: int
    field: int
    op: str
    coeff: int = 1


@dataclass(frozen=True)
class Model:
    """A kinematic model (see the module docstring)."""

    name: str
    dim: int
    fields: tuple[str, ...]
    strains: tuple[str, ...]
    entries: tuple[Entry, ...]
    description: str
    #: factor of det J in every integral: "t" (plane thickness), "2 pi r" or "1"
    measure: str
    #: symbolic geometries centred at radius R instead of the origin (axisymmetric)
    radial_offset: bool = False
    rigid: Callable[[Sequence[Sequence]], list[list]] | None = None

    @property
    def nfields(self) -> int:
        return len(self.fields)

    def ndof(self, n_nodes: int) -> int:
        """Element DOFs: nodes x fields."""
        return n_nodes * self.nfields

    def dof_names(self, n_nodes: int) -> list[str]:
        """u1, v1, w1, u2, ... (interleaved per node)."""
        return [f"{f}{i}" for i in range(1, n_nodes + 1) for f in self.fields]

    @property
    def needs_radius(self) -> bool:
        return any(e.op == "N/r" for e in self.entries)

    def B(self, N: Sequence, dN: Sequence[Sequence], radius=None) -> sp.Matrix:
        """B (strains x ndof) from the shape functions N and their physical derivatives dN
        (dN[k][i] = dN_i / dx_k), by the model's entry table."""
        n = len(N) if N is not None else len(dN[0])
        nf = self.nfields
        B = sp.zeros(len(self.strains), nf * n)
        if self.needs_radius and radius is None:
            raise ValueError(f"{self.name} B needs the radius")
        for i in range(n):
            for e in self.entries:
                if e.op == "N":
                    value = N[i]
                elif e.op == "N/r":
                    value = N[i] / radius
                else:
                    value = dN[int(e.op[1])][i]
                B[e.row, nf * i + e.field] = value if e.coeff == 1 else e.coeff * value
        return B

    def thickness(self, t, radius) -> sp.Expr:
        """The factor of det J: t, 2 pi r or 1."""
        if self.measure == "t":
            return t
        if self.measure == "2 pi r":
            return 2 * sp.pi * radius
        return sp.Integer(1)

    def D(self, E, nu) -> sp.Matrix:
        return material.D(self.name, E, nu)

    def split(self, E, nu):
        return material.split(self.name, E, nu)

    def volumetric_vector(self) -> sp.Matrix:
        return material.volumetric_vector(self.name)

    def rigid_body_modes(self, coords: Sequence[Sequence]) -> list[list]:
        """Nodal vectors of the rigid-body modes; ``coords`` one sequence per axis (xs, ys[, zs])."""
        return self.rigid(coords)


MODELS: dict[str, Model] = {}


def register(model: Model) -> Model:
    if model.name not in material.STATES:
        raise ValueError(f"model {model.name!r}: add its name to derive.material.STATES and its D there")
    MODELS[model.name] = model
    return model


def get(name: str) -> Model:
    """The model of a ``state`` name, or a one-line :class:`InputError`."""
    model = MODELS.get(name) if isinstance(name, str) else None
    if model is None:
        raise InputError(f"unknown state {name!r}; allowed: {', '.join(MODELS)}")
    return model


def names(dim: int | None = None) -> tuple[str, ...]:
    """Model names, optionally only those of one dimension."""
    return tuple(m.name for m in MODELS.values() if dim is None or m.dim == dim)


# --------------------------------------------------------------------------- rigid-body modes

def _translations(n: int, nf: int, which: Sequence[int]) -> list[list]:
    return [[1 if f == k else 0 for _ in range(n) for f in range(nf)] for k in which]


def _plane_rigid(coords):
    xs, ys = coords[0], coords[1]
    n = len(xs)
    return _translations(n, 2, (0, 1)) + [[v for i in range(n) for v in (-ys[i], xs[i])]]


def _axisymmetric_rigid(coords):
    return _translations(len(coords[0]), 2, (1,))


def _solid_rigid(coords):
    xs, ys, zs = coords
    n = len(xs)
    rot_x = [v for i in range(n) for v in (0, -zs[i], ys[i])]
    rot_y = [v for i in range(n) for v in (zs[i], 0, -xs[i])]
    rot_z = [v for i in range(n) for v in (-ys[i], xs[i], 0)]
    return _translations(n, 3, (0, 1, 2)) + [rot_x, rot_y, rot_z]


# --------------------------------------------------------------------------- the catalogue of models

_U, _V, _W = 0, 1, 2
_PLANE = (Entry(0, _U, "d0"), Entry(1, _V, "d1"), Entry(2, _U, "d1"), Entry(2, _V, "d0"))

register(Model("plane-stress", 2, ("u", "v"), ("xx", "yy", "xy"), _PLANE,
               "plane stress (sigma_zz = 0), thickness t", "t", rigid=_plane_rigid))
register(Model("plane-strain", 2, ("u", "v"), ("xx", "yy", "xy"), _PLANE,
               "plane strain (eps_zz = 0), thickness t", "t", rigid=_plane_rigid))
register(Model("axisymmetric", 2, ("u", "v"), ("rr", "zz", "tt", "rz"),
               (Entry(0, _U, "d0"), Entry(1, _V, "d1"), Entry(2, _U, "N/r"), Entry(3, _U, "d1"), Entry(3, _V, "d0")),
               "axisymmetric solid: x = r, y = z, u radial, v axial, full ring 2 pi r", "2 pi r",
               radial_offset=True, rigid=_axisymmetric_rigid))
register(Model("solid", 3, ("u", "v", "w"), ("xx", "yy", "zz", "yz", "zx", "xy"),
               (Entry(0, _U, "d0"), Entry(1, _V, "d1"), Entry(2, _W, "d2"),
                Entry(3, _V, "d2"), Entry(3, _W, "d1"),
                Entry(4, _W, "d0"), Entry(4, _U, "d2"),
                Entry(5, _U, "d1"), Entry(5, _V, "d0")),
               "3-D solid, Voigt [xx, yy, zz, yz, zx, xy], engineering shear", "1", rigid=_solid_rigid))
