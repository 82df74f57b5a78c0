"""derive: derive, audit and generate finite element routines.

Public contract (see README and notes/architecture.md):
  derive.element(name, variant="full", state="plane-stress") -> Element
  derive.locking_ratio(name, variant, state) -> sympy expression in r, nu
  derive.kernel(name, variant="full", state="plane-stress", lang="numpy") -> callable
"""
from __future__ import annotations

from .codegen import kernel
from .element import Element, element
from .locking import locking_ratio

__all__ = ["Element", "element", "kernel", "locking_ratio"]

__version__ = "0.1.0"
