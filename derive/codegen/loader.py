"""``derive.kernel(...)``: generate, compile on demand, cache per user, load, call.

* NumPy kernels are generated in memory and executed as a module.
* C kernels are compiled with the system C compiler (``$CC``, else ``cc``/``gcc``) into a
  per-user cache, ``$XDG_CACHE_HOME/derive/kernels`` (default ``~/.cache/derive/kernels``;
  ``$DERIVE_CACHE_DIR`` overrides), keyed by a hash of the source, the compiler's version
  line, the flags and the machine; loaded with ctypes.  Fortran likewise with ``$FC`` or
  ``gfortran``.  Without a compiler the NumPy kernel is used and a one-line warning says so.
* Every call checks its inputs before any native code runs: array shapes, finite
  coordinates, E > 0 and -1 < nu < 0.5, nu = 0.5 allowed in plane stress
  (:func:`derive.material.check_material`), t > 0.
"""
from __future__ import annotations

import ctypes
import hashlib
import os
import platform
import shutil
import subprocess
import tempfile
import threading
import types
import warnings
from functools import lru_cache
from pathlib import Path

import numpy as np

from .. import catalog
from ..errors import GeometryError, InputError
from ..material import STATES, check_material
from . import cache as kcache
from .cache import CacheUnusable, cache_dir  # noqa: F401  (cache_dir: public name)
from .emit import LANGS, generate

#: GNU compilers: -fno-tree-slp-vectorize avoids a pathological compile time in the RTL
#: combiner on long straight-line bodies (the lane loop is still loop-vectorised; measured
#: no loss); -mprefer-vector-width=512 lets the lane loops (C and Fortran batch routines)
#: use AVX-512 where present.
C_FLAGS = ("-O3", "-march=native", "-fno-tree-slp-vectorize", "-std=c99", "-fPIC", "-shared")
F_FLAGS = ("-O3", "-march=native", "-fno-tree-slp-vectorize", "-fPIC", "-shared")
if platform.machine().lower() in ("x86_64", "amd64"):
    C_FLAGS = C_FLAGS[:2] + ("-mprefer-vector-width=512",) + C_FLAGS[2:]
    F_FLAGS = F_FLAGS[:2] + ("-mprefer-vector-width=512",) + F_FLAGS[2:]
PORTABLE_FLAGS = ("-O3", "-fPIC", "-shared")


def compile_flags(lang: str, version: str) -> tuple[str, ...]:
    """Flags for the detected compiler (GNU flags only for GNU compilers)."""
    if not version.endswith("[GNU]"):
        return PORTABLE_FLAGS + (("-std=c99",) if lang == "c" else ())
    return C_FLAGS if lang == "c" else F_FLAGS
_LOCK = threading.Lock()


class KernelWarning(UserWarning):
    """A native kernel was requested but could not be built; NumPy is used instead."""


@lru_cache(maxsize=None)
def find_compiler(lang: str) -> tuple[str, str] | None:
    """(executable, version line) of the C or Fortran compiler, or None."""
    names = ([os.environ["CC"]] if os.environ.get("CC") else []) + ["cc", "gcc", "clang"] if lang == "c" else \
        ([os.environ["FC"]] if os.environ.get("FC") else []) + ["gfortran"]
    for name in names:
        exe = shutil.which(name)
        if not exe:
            continue
        try:
            out = subprocess.run([exe, "--version"], capture_output=True, text=True, timeout=30)
        except (OSError, subprocess.SubprocessError):
            continue
        if out.returncode == 0:
            text = out.stdout
            gnu = "clang" not in text.lower() and "free software foundation" in text.lower()
            return exe, (text.splitlines() or [""])[0].strip() + (" [GNU]" if gnu else "")
    return None


@lru_cache(maxsize=1)
def _machine_id() -> str:
    """CPU identity for -march=native builds (model name and flags)."""
    text = platform.machine()
    try:
        with open("/proc/cpuinfo", encoding="utf-8", errors="replace") as fh:
            for line in fh:
                if line.startswith(("model name", "flags")):
                    text += line.strip()
                if line.strip() == "":
                    break
    except OSError:
        pass
    return hashlib.sha256(text.encode()).hexdigest()[:16]


def build_shared(sources: dict, lang: str, stem: str) -> Path:
    """Compile sources {file name: text} into a shared library in the cache; return its path.

    The cache must be private (:mod:`.cache`); a cached library is verified against the
    checksum recorded when it was built and rebuilt (with a KernelWarning) when damaged.
    Raises :class:`CacheUnusable` when the cache cannot be used safely.
    """
    comp = find_compiler(lang)
    if comp is None:
        raise FileNotFoundError(f"no {'C' if lang == 'c' else 'Fortran'} compiler found")
    exe, version = comp
    flags = compile_flags(lang, version)
    h = hashlib.sha256()
    for name in sorted(sources):
        h.update(name.encode() + b"\0" + sources[name].encode() + b"\0")
    h.update(" ".join(flags).encode() + version.encode() + _machine_id().encode())
    key = h.hexdigest()[:20]
    folder = kcache.private_folder()
    lib = folder / f"{stem}-{lang}-{key}.so"
    with kcache.locked(folder):
        why = kcache.verify(lib)
        if why is None:
            return lib
        if why not in ("missing", "no checksum recorded"):      # the latter: built before checksums
            warnings.warn(f"derive.kernel: cached library {lib.name} is damaged ({why}); rebuilding it",
                          KernelWarning, stacklevel=4)
        try:
            kcache.discard(lib)
            with tempfile.TemporaryDirectory(prefix=f".build-{stem}-", dir=str(folder)) as tmp:
                main = None
                for name, text in sources.items():
                    (Path(tmp) / name).write_text(text, encoding="utf-8")
                    if name.endswith((".c", ".f90")):
                        main = name
                out = Path(tmp) / "k.so"
                cmd = [exe, *flags, main, "-o", str(out)]
                if lang == "fortran":
                    cmd.insert(1, "-J" + tmp)
                res = subprocess.run(cmd, cwd=tmp, capture_output=True, text=True)
                if res.returncode != 0:
                    raise RuntimeError(f"compiling {stem} ({lang}) failed: {res.stderr.strip()[:2000]}")
                kcache.install(out, lib)
        except OSError as exc:
            raise CacheUnusable(f"cannot build into the cache folder {folder} ({exc.strerror or exc})") from None
    return lib


def empty_aligned(shape, align: int = 64) -> np.ndarray:
    """Uninitialised float64 array whose data start on an ``align``-byte boundary.

    The C batch kernels stream K to memory with vector stores that need aligned addresses;
    NumPy's own allocations are typically only 16-byte aligned.
    """
    size = int(np.prod(shape))
    buf = np.empty(size + align // 8)
    off = (-buf.ctypes.data % align) // 8
    return buf[off:off + size].reshape(shape)


class Kernel:
    """A generated element kernel: ``k(xy, E, nu, t)`` -> stiffness (n, ndof, ndof).

    Also ``k.validity(xy)`` (min det J at the full rule's points), ``k.check(xy)``
    (GeometryError naming inverted elements by index) and ``k.recovery(xy, u, E, nu)``
    (strain, stress at the full rule's points).  ``lang`` is the language actually used
    (``requested`` the one asked for).
    """

    def __init__(self, kset, lang: str, requested: str, impl):
        self.element, self.variant, self.state = kset.element, kset.variant, kset.state
        self.meta = kset.meta
        self.nodes, self.ndof = kset.meta["nodes"], kset.meta["ndof"]
        self.npoints, self.nstrain = kset.meta["recovery_points"], kset.meta["nstrain"]
        self.lang, self.requested = lang, requested
        self.sources = {s.path: s.text for s in kset.sources}
        self._impl = impl

    def __repr__(self) -> str:
        return f"<derive kernel {self.element} {self.variant} {self.state} [{self.lang}]>"

    # ---------------------------------------------------------------- checks
    def _xy(self, xy) -> np.ndarray:
        arr = _real_array("xy", xy, f"(n, {self.nodes}, 2)")
        if arr.ndim == 2 and arr.shape == (self.nodes, 2):
            raise InputError(f"xy must have shape (n, {self.nodes}, 2) (a batch); for one element use xy[None]")
        if arr.ndim != 3 or arr.shape[1:] != (self.nodes, 2):
            raise InputError(f"xy must have shape (n, {self.nodes}, 2) for {self.element}; got {arr.shape}")
        if not np.all(np.isfinite(arr)):
            bad = int(np.flatnonzero(~np.all(np.isfinite(arr.reshape(arr.shape[0], -1)), axis=1))[0])
            raise InputError(f"xy contains NaN or infinity (first at element index {bad})")
        return np.ascontiguousarray(arr)

    def _material(self, E, nu, t=None):
        for name, v in (("E", E), ("nu", nu)) + ((("t", t),) if t is not None else ()):
            if not np.ndim(v) == 0:
                raise InputError(f"{name} must be a scalar (one material per call)")
            if not _is_real_scalar(v):
                raise InputError(f"{name} must be a real number (not a bool, complex number or string), got {v!r}")
        E, nu = float(E), float(nu)
        # exactly derive.material.check_material's rule: -1 < nu <= 0.5 in plane stress
        # (D = E / (1 - nu^2) [...] is finite at nu = 1/2), nu < 0.5 in the other states
        check_material(self.state, E, nu)
        if t is not None:
            t = float(t)
            if not np.isfinite(t) or t <= 0:
                raise InputError(f"thickness t = {t} is not allowed; t must be a finite number > 0")
        return E, nu, t

    def _out(self, out, n: int, xy: np.ndarray) -> np.ndarray:
        shape = (n, self.ndof, self.ndof)
        if out is None:
            return empty_aligned(shape)
        want = f"out must be a writeable, C-contiguous float64 array of shape {shape}"
        if not isinstance(out, np.ndarray):
            raise InputError(f"{want}; got {type(out).__name__}")
        if out.dtype != np.float64 or out.shape != shape:
            raise InputError(f"{want}; got {out.dtype} of shape {out.shape}")
        if not out.flags.writeable:
            raise InputError(f"{want}; this one is read-only")
        if not (out.flags.c_contiguous and out.flags.aligned):
            raise InputError(f"{want}; this one is not C-contiguous (or not aligned)")
        if np.may_share_memory(out, xy):
            raise InputError(f"{want}; this one overlaps xy")
        return out

    def _screen(self, d: np.ndarray) -> None:
        """GeometryError naming (by index) elements with det J <= 0 or not finite at a point."""
        bad = np.flatnonzero(~(np.isfinite(d) & (d > 0)))
        if not bad.size:
            return
        shown = ", ".join(str(int(i)) for i in bad[:10]) + (" ..." if bad.size > 10 else "")
        over = np.flatnonzero(~np.isfinite(d[bad]))
        why = ("inverted (clockwise), bow-tie, degenerate or all-zero" if not over.size else
               "det J not finite (coordinates too large for float64) or inverted, bow-tie, degenerate")
        raise GeometryError(f"{bad.size} {self.element} element(s) with det J <= 0 or not finite at a quadrature point "
                            f"({why}): index {shown}; first min det J = {d[bad[0]]:.6g}")

    # ---------------------------------------------------------------- calls
    def __call__(self, xy, E, nu, t=1.0, out=None, *, screen: bool = True):
        """Stiffness (n, ndof, ndof).  ``screen`` (default True) first runs the validity
        kernel and refuses inverted, bow-tie, degenerate and overflowing elements by index,
        and refuses elements whose K has a non-finite diagonal; ``screen=False`` skips both
        for speed."""
        arr = self._xy(xy)
        E, nu, t = self._material(E, nu, t)
        n = arr.shape[0]
        out = self._out(out, n, arr)
        if n and screen:
            self._screen(self._validity(arr))
        if n:
            self._impl.stiffness(arr, E, nu, t, out)
        if n and screen:
            # the diagonal only (a strided view, cheap next to the kernel): K is positive
            # semi-definite on a valid element, |K_ij| <= sqrt(K_ii K_jj), and an overflow or
            # NaN in the shared intermediates reaches the diagonal
            bad = np.flatnonzero(~np.isfinite(np.diagonal(out, axis1=1, axis2=2)).all(axis=1))
            if bad.size:
                shown = ", ".join(str(int(i)) for i in bad[:10]) + (" ..." if bad.size > 10 else "")
                raise GeometryError(f"stiffness not finite for {bad.size} {self.element} element(s) (coordinates too "
                                    f"large or too small for float64; rescale them): index {shown}")
        return out

    stiffness = __call__

    def _validity(self, arr: np.ndarray) -> np.ndarray:
        out = np.empty(arr.shape[0])
        if arr.shape[0]:
            self._impl.validity(arr, out)
        return out

    def validity(self, xy) -> np.ndarray:
        return self._validity(self._xy(xy))

    def check(self, xy) -> np.ndarray:
        """min det J per element; GeometryError naming the inverted/degenerate elements."""
        d = self.validity(xy)
        self._screen(d)
        return d

    def recovery(self, xy, u, E, nu):
        arr = self._xy(xy)
        E, nu, _ = self._material(E, nu)
        U = np.ascontiguousarray(_real_array("u", u, f"({arr.shape[0]}, {self.ndof})"))
        if U.shape != (arr.shape[0], self.ndof):
            raise InputError(f"u must have shape ({arr.shape[0]}, {self.ndof}); got {U.shape}")
        if not np.all(np.isfinite(U)):
            raise InputError("u contains NaN or infinity")
        n = arr.shape[0]
        strain = np.empty((n, self.npoints, self.nstrain))
        stress = np.empty((n, self.npoints, self.nstrain))
        if n:
            self._impl.recovery(arr, U, E, nu, strain, stress)
        return strain, stress


def _is_real_scalar(v) -> bool:
    """A real number: int or float (Python or NumPy), or another numbers.Real; never a bool,
    complex number, string or bytes (float() would accept "2" or True silently)."""
    import numbers
    if isinstance(v, (bool, np.bool_, str, bytes, complex, np.complexfloating)):
        return False
    if isinstance(v, np.ndarray):
        return v.dtype.kind in "iuf"
    return isinstance(v, (numbers.Real, np.integer, np.floating))


def _real_array(name: str, value, shape: str) -> np.ndarray:
    """``value`` as a float64 array, refusing bool, complex, string and other non-real entries."""
    try:
        raw = np.asarray(value)
    except (TypeError, ValueError):
        raise InputError(f"{name} must be an array of real numbers of shape {shape}") from None
    kind = raw.dtype.kind
    if kind == "O" and all(_is_real_scalar(v) for v in raw.flat):
        kind = "f"
    if kind not in "iuf":
        what = {"b": "booleans", "c": "complex numbers", "U": "strings", "S": "bytes"}.get(kind, "non-numbers")
        raise InputError(f"{name} must be an array of real numbers of shape {shape}; it holds {what}")
    try:
        return np.asarray(raw, dtype=np.float64)
    except (TypeError, ValueError, OverflowError):
        raise InputError(f"{name} must be an array of real numbers of shape {shape}") from None


class _NumpyImpl:
    def __init__(self, text: str, name: str):
        mod = types.ModuleType(f"derive_kernel_{name}")
        mod.__file__ = f"<derive generated {name}.py>"
        exec(compile(text, mod.__file__, "exec"), mod.__dict__)
        self.mod = mod

    # overflow on absurd coordinates gives inf/nan, which the checked call reports by index;
    # NumPy's RuntimeWarnings would only add noise on stderr
    def stiffness(self, xy, E, nu, t, out):
        with np.errstate(all="ignore"):
            self.mod.stiffness(xy, E, nu, t, out=out)

    def validity(self, xy, out):
        with np.errstate(all="ignore"):
            out[:] = self.mod.validity(xy)

    def recovery(self, xy, u, E, nu, strain, stress):
        with np.errstate(all="ignore"):
            s, t = self.mod.recovery(xy, u, E, nu)
        strain[:] = s
        stress[:] = t


def _ptr(a: np.ndarray):
    return ctypes.c_void_p(a.ctypes.data)


class _NativeImpl:
    def __init__(self, lib_path: Path, prefix: str, suffix: str):
        try:
            self.lib = ctypes.CDLL(str(lib_path))
        except OSError as exc:
            raise CacheUnusable(f"cached library {lib_path.name} cannot be loaded ({exc})") from None
        L, P, D = ctypes.c_long, ctypes.c_void_p, ctypes.c_double
        self.k = getattr(self.lib, f"{prefix}_stiffness_batch{suffix}")
        self.k.argtypes = [L, P, D, D, D, P]
        self.k.restype = None
        self.v = getattr(self.lib, f"{prefix}_validity{suffix}")
        self.v.argtypes = [L, P, P]
        self.v.restype = None
        self.r = getattr(self.lib, f"{prefix}_recovery{suffix}")
        self.r.argtypes = [L, P, P, D, D, P, P]
        self.r.restype = None

    def stiffness(self, xy, E, nu, t, out):
        self.k(xy.shape[0], _ptr(xy), E, nu, t, _ptr(out))

    def validity(self, xy, out):
        self.v(xy.shape[0], _ptr(xy), _ptr(out))

    def recovery(self, xy, u, E, nu, strain, stress):
        self.r(xy.shape[0], _ptr(xy), _ptr(u), E, nu, _ptr(strain), _ptr(stress))


def check_request(name, variant: str, state: str, lang: str):
    if lang not in LANGS:
        raise InputError(f"unknown kernel language {lang!r}; allowed: {', '.join(LANGS)}")
    info = catalog.element_info(name)
    v = catalog.check_variant(info, variant)
    catalog.check_state(state)
    if state not in getattr(v, "states", STATES):
        raise InputError(f"variant {variant!r} is offered in {', '.join(v.states)} only; got state {state!r}")
    return info


@lru_cache(maxsize=None)
def _kernel(name: str, variant: str, state: str, lang: str) -> Kernel:
    (kset,) = generate(name, variant, state, langs=(lang,))
    if lang == "numpy":
        return Kernel(kset, "numpy", lang, _NumpyImpl(kset.sources[0].text, kset.stem))
    sources = {Path(s.path).name: s.text for s in kset.sources}
    try:
        with _LOCK:
            lib = build_shared(sources, lang, kset.stem)
        prefix = f"derive_{kset.stem}"
        impl = _NativeImpl(lib, prefix, "_f" if lang == "fortran" else "")
        return Kernel(kset, lang, lang, impl)
    except (FileNotFoundError, CacheUnusable) as exc:
        warnings.warn(f"derive.kernel: {exc}; using the NumPy kernel for {kset.element} {kset.variant} "
                      f"{kset.state} instead of {lang}", KernelWarning, stacklevel=3)
        np_kernel = _kernel(name, variant, state, "numpy")
        return Kernel(kset, "numpy", lang, np_kernel._impl)


def kernel(name, variant: str = "full", state: str = "plane-stress", lang: str = "numpy") -> Kernel:
    """Generated stiffness kernel ``k(xy, E, nu, t)`` for a catalogue element.

    ``xy``: (n, nodes, 2) nodal coordinates; returns (n, ndof, ndof).  ``lang``: "numpy",
    "c" or "fortran" (compiled on first use into the per-user cache; NumPy with a warning
    when the compiler is missing).
    """
    if not isinstance(lang, str):
        raise InputError(f"unknown kernel language {lang!r}; allowed: {', '.join(LANGS)}")
    lang = lang.strip().lower()
    info = check_request(name, variant, state, lang)
    return _kernel(info.name, variant, state, lang)
