"""Mesh files through meshio: results out as VTK ``.vtu``, a user's own mesh in (VTU, XDMF, ...).

* :func:`write_vtu`: the *undeformed* mesh with the displacement as point data (a viewer warps
  it by the vector, e.g. ParaView's "Warp By Vector"; writing deformed points would deform the
  picture twice), averaged nodal stresses and von Mises as point data, element-mean stresses as
  cell data.  Cell types: T3 triangle (VTK 5), Q4 quad (9), T6 triangle6 (22), Q8 quad8 (23),
  Q9 quad9 (28); other elements are written as their corner polygon.  The node order of these
  VTK cells is derive's own (corners counter-clockwise, then mid-sides, then the centre).
* :func:`read_mesh`: a plane mesh of one element type from any format meshio reads (VTU and
  XDMF are the open formats documented; Gmsh ``.msh`` works too).  Boundary cells (vertices,
  lines) are ignored, points no element uses are dropped, and the file is refused with a
  one-line message when it holds no cells or cells of another type than the element's, 3-D
  cells, points off the x-y plane, or elements with a non-positive Jacobian (clockwise).
"""
from __future__ import annotations

import contextlib
import io
import os
import tempfile
from pathlib import Path

import numpy as np

from . import catalog
from .errors import InputError
from .mesh import Mesh, Solution, von_mises
from .output import write_atomic

#: derive element -> meshio cell type (the VTK cell of the same nodes in the same order)
CELL_TYPES = {"T3": "triangle", "Q4": "quad", "T6": "triangle6", "Q8": "quad8", "Q9": "quad9"}
#: meshio cell types of plane elements derive knows, for the messages
_PLANE_TYPES = {v: k for k, v in CELL_TYPES.items()}
_IGNORED = {"vertex", "line", "line3", "line4"}
#: largest mesh file read (bytes): a plain guard against reading a huge file into memory
MAX_FILE_BYTES = 2_000_000_000


def _meshio():
    try:
        import meshio
    except ImportError:  # pragma: no cover - meshio is a dependency
        raise InputError("mesh files need the meshio package (pip install meshio)") from None
    return meshio


def _cells(mesh: Mesh):
    ctype = CELL_TYPES.get(mesh.element)
    conn = mesh.conn
    if ctype is None:  # other elements: their corner polygon
        nc = mesh.ref.n_corners
        ctype = "triangle" if nc == 3 else "quad"
        conn = conn[:, :nc]
    return ctype, conn


def solution_mesh(sol: Solution):
    """The meshio Mesh of a solution: undeformed points, displacement and stresses as data."""
    meshio = _meshio()
    mesh = sol.mesh
    ctype, conn = _cells(mesh)
    n = mesh.n_nodes
    points = np.column_stack([mesh.nodes, np.zeros(n)])
    nod = sol.nodal_stresses()
    _, sp_ = sol.point_stresses()
    cell = sp_.mean(axis=1)
    names = ["sigma_rr", "sigma_zz", "sigma_tt", "tau_rz"] if sol.state == "axisymmetric" else \
        ["sigma_xx", "sigma_yy", "tau_xy"]
    point_data = {"displacement": np.column_stack([sol.U, np.zeros(n)])}
    for k, nm in enumerate(names):
        point_data[nm] = np.ascontiguousarray(nod[:, k])
    point_data["von_mises"] = von_mises(nod, sol.state, sol.nu)
    cell_data = {f"{nm}_mean": [np.ascontiguousarray(cell[:, k])] for k, nm in enumerate(names)}
    return meshio.Mesh(points, [(ctype, np.ascontiguousarray(conn))], point_data=point_data, cell_data=cell_data)


def write_vtu(path, sol: Solution) -> Path:
    """Write the solution as a ``.vtu`` file (undeformed points + displacement), atomically.
    A viewer shows the deformed shape by warping the points by ``displacement``."""
    path = Path(path)
    if path.suffix.lower() != ".vtu":
        raise InputError(f"--vtu {str(path)!r}: the file name must end in .vtu")
    m = solution_mesh(sol)
    with tempfile.TemporaryDirectory(prefix="derive-vtu-") as tmp:
        part = Path(tmp) / "out.vtu"
        m.write(part, file_format="vtu")
        data = part.read_bytes()
    return write_atomic(path, data)


def _one_line(exc: BaseException) -> str:
    text = " ".join(str(exc).split())
    return (text[:200] + " ...") if len(text) > 200 else (text or type(exc).__name__)


def read_mesh(path, element: str, label: str | None = None, option: str = "--mesh-file") -> Mesh:
    """A user's plane mesh of ``element`` from a file meshio reads; InputError (one line) if unusable."""
    info = catalog.element_info(element)
    want = CELL_TYPES.get(info.name)
    p = Path(path)
    shown = f"{option} {str(path)!r}"
    if want is None:
        raise InputError(f"{shown}: element {info.name} has no VTK cell type; mesh files work with "
                         f"{', '.join(CELL_TYPES)}")
    if not p.exists():
        raise InputError(f"{shown}: no such file")
    if not p.is_file():
        raise InputError(f"{shown}: not a regular file")
    if not os.access(p, os.R_OK):
        raise InputError(f"{shown}: not readable (permission denied)")
    if p.stat().st_size > MAX_FILE_BYTES:
        raise InputError(f"{shown}: {p.stat().st_size / 1e9:.1f} GB is more than the {MAX_FILE_BYTES / 1e9:g} GB "
                         "derive reads")
    meshio = _meshio()
    said = io.StringIO()
    try:
        # meshio prints its reasons and calls sys.exit when no reader succeeds: keep both inside
        with contextlib.redirect_stdout(said), contextlib.redirect_stderr(said):
            m = meshio.read(p)
    except (Exception, SystemExit) as exc:  # ReadError, KeyError, ValueError, XML errors, SystemExit
        why = _one_line(exc) if not isinstance(exc, SystemExit) else (_one_line(said.getvalue()) or "unknown format")
        raise InputError(f"{shown}: cannot read it as a mesh ({why}); use a .vtu or .xdmf file") from None
    found: dict[str, int] = {}
    blocks = []
    for block in m.cells:
        ct = block.type
        if ct in _IGNORED:
            continue
        found[ct] = found.get(ct, 0) + len(block.data)
        if ct == want:
            blocks.append(np.asarray(block.data, dtype=np.int64))
    listing = ", ".join(f"{k} ({v})" for k, v in found.items()) or "none"
    other = [k for k in found if k != want]
    if other or not blocks:
        hint = ""
        if len(found) == 1 and other and other[0] in _PLANE_TYPES:
            hint = f" (that is a {_PLANE_TYPES[other[0]]} mesh: use --element {_PLANE_TYPES[other[0]]})"
        raise InputError(f"{shown}: {info.name} needs {want} cells only; the file has {listing}{hint}")
    conn = np.concatenate(blocks)
    pts = np.asarray(m.points, dtype=float)
    if pts.ndim != 2 or pts.shape[1] not in (2, 3) or not np.all(np.isfinite(pts)):
        raise InputError(f"{shown}: points must be finite x, y (, z) coordinates")
    if conn.size and (conn.min() < 0 or conn.max() >= len(pts)):
        raise InputError(f"{shown}: a cell refers to point {int(conn.max())} but the file has {len(pts)} points")
    used = np.unique(conn)
    pts = pts[used]
    if pts.shape[1] == 3:
        size = max(float(np.ptp(pts[:, 0])), float(np.ptp(pts[:, 1])), 1e-300)
        if float(np.ptp(pts[:, 2])) > 1e-9 * size:
            raise InputError(f"{shown}: the points are not in one x-y plane (z varies by {np.ptp(pts[:, 2]):.3g}); "
                             "derive meshes are plane")
    renumber = np.full(len(pts), -1, np.int64)
    renumber[used] = np.arange(len(used))
    mesh = Mesh(info.name, pts[:, :2], renumber[conn], None, label or p.name)
    mesh.check()
    return mesh
