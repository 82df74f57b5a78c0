"""A mesh analysis with its checks: assemble, solve, and say when the result is not to be trusted.

:func:`analyse` is the solve every benchmark and patch test runs: the mesh machinery of
:mod:`derive.mesh` (assembly, supports, sparse solve, :func:`derive.mesh.mechanism_check`)
plus the element-level knowledge of :mod:`derive.modes` (does the variant have spurious
zero-energy modes, and do they spread through a mesh?).  It lives above both, so that
:mod:`derive.mesh` never imports the mode analysis that itself builds small meshes.
"""
from __future__ import annotations

import time
from functools import lru_cache

import numpy as np

from . import catalog
from .mesh import Mesh, Provider, Solution, assemble, mechanism_check, solve
from .modes import zero_energy_modes

__all__ = ["analyse", "element_spurious_modes", "spurious_mode_warning"]


def analyse(mesh: Mesh, f: np.ndarray, fixed: dict[int, float], variant: str = "full",
            state: str = "plane-stress", E: float = 1.0, nu: float = 0.3, t: float = 1.0,
            provider: Provider | None = None, check: bool = True, stage=None) -> Solution:
    """Assemble, solve and return a :class:`Solution`.

    ``stage`` (optional) is called with "assembly", "solve" and "check" as each begins (the
    progress display of long runs).

    With ``check`` (default) the solution carries the element-mode warning of the variant
    (:func:`spurious_mode_warning`) and the result of :func:`derive.mesh.mechanism_check`; a detected
    near-mechanism sets ``Solution.reliable = False`` and adds a warning.
    """
    note = stage or (lambda _: None)
    note("assembly")
    asm = assemble(mesh, variant, state, E, nu, t, provider)
    diag: dict = {}
    note("solve")
    u, reactions, secs = solve(asm.K, f, fixed, diag)
    warnings = list(diag.get("warnings", []))
    reliable, checks = True, {}
    secs_check = 0.0
    if check:
        note("check")
        t0 = time.perf_counter()
        elem = spurious_mode_warning(mesh.element, variant, state)
        if elem:
            warnings.insert(0, elem)
        checks = mechanism_check(mesh, asm.K, fixed, variant, state, E, nu, t, lu=diag.get("_lu"),
                                 spurious=element_spurious_modes(mesh.element, variant, state)["spurious"])
        if checks.get("mechanism"):
            reliable = False
        warnings += checks.get("warnings", [])
        secs_check = time.perf_counter() - t0
    return Solution(mesh, variant, state, E, nu, t, u, reactions, f, asm.route,
                    {"element_matrices": asm.element_seconds, "scatter": asm.scatter_seconds, "solve": secs,
                     "mechanism_check": secs_check},
                    warnings, reliable, checks)




@lru_cache(maxsize=None)
def element_spurious_modes(element: str, variant: str, state: str) -> dict:
    """Spurious zero-energy modes of one element of the variant (``derive.modes``, square
    geometry), cached per element / variant / state: {"spurious": n, "communicable": bool}."""
    try:
        r = zero_energy_modes(element, variant, state)
    except Exception as exc:  # a variant the eigen-analysis cannot handle: say so, do not guess
        return {"spurious": None, "communicable": None, "error": str(exc)}
    return {"spurious": int(r["spurious"]), "communicable": bool(r["communicable"])}


def spurious_mode_warning(element: str, variant: str, state: str) -> str | None:
    """One-line warning when the element variant has spurious zero-energy modes (None otherwise)."""
    info = element_spurious_modes(catalog.element_info(element).name, variant, state)
    n = info["spurious"]
    if n is None:
        return f"{element} {variant} ({state}): spurious zero-energy modes not determined ({info.get('error')})"
    if not n:
        return None
    spread = "communicable: they can spread through a mesh" if info["communicable"] else \
        "not communicable in free-free test meshes"
    return (f"{element} {variant} ({state}) has {n} spurious zero-energy element mode{'s' if n > 1 else ''} "
            f"({spread}; see `derive modes {element} --variant {variant}`)")
