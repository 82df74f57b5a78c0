"""Generated numeric kernels: NumPy, C and Fortran from the formulation structure.

* :mod:`.ir`       formulation -> staged straight-line code (material, element, point)
* :mod:`.lower`    unrolled (C, Fortran) or vectorised (NumPy) statement lists, DCE, CSE
* :mod:`.printers` sympy code printers adapted (float64 literals, powers, op counts)
* :mod:`.emit`     jinja2 templates -> sources; :mod:`.committed` the committed set
* :mod:`.loader`   ``derive.kernel(...)``: compile on demand into a per-user cache, load
* :mod:`.bench`    ``derive perf --kernels``
"""
from __future__ import annotations

from .version import GENERATOR_VERSION  # noqa: F401  (public name)


def kernel(name, variant="full", state="plane-stress", lang="numpy"):
    """Callable ``k(xy, E, nu, t)`` -> (n, ndof, ndof) stiffness; see :func:`derive.codegen.loader.kernel`."""
    from .loader import kernel as _kernel
    return _kernel(name, variant, state, lang)
