"""The committed generated kernels (generated/) against an independent numeric quadrature.

Every kernel listed in generated/manifest.json, in every language (NumPy always; C and
Fortran compiled once per session with the loader's flags), on 1000 random valid distorted
elements: stiffness, strain/stress recovery and the validity kernel against
tests/test_kernels_ref.py (numpy only, written from the textbook definitions and the
published methods); symmetry and rigid-body null space of every output.  That the committed
files are what the generator produces now is tested in test_kernels_api.py (--check).
"""
from __future__ import annotations

import json
import types
import zlib
from concurrent.futures import ThreadPoolExecutor
from pathlib import Path

import numpy as np
import pytest
from numpy.testing import assert_allclose

import test_kernels_ref as ref
from compilers import need
from derive.codegen import loader
from derive.codegen.committed import repo_generated_dir

GEN = repo_generated_dir()
if GEN is None or not (GEN / "manifest.json").exists():
    pytest.skip("no generated/ folder next to the package (installed copy)", allow_module_level=True)
MANIFEST = json.loads((GEN / "manifest.json").read_text(encoding="utf-8"))
ENTRIES = MANIFEST["kernels"]
N_ELEMENTS = 1000


def _id(e) -> str:
    return f"{e['element']}-{e['variant']}-{e['state']}-{e['lang']}"


def _stem(e) -> str:
    return Path(next(iter(e["files"]))).stem


@pytest.fixture(scope="session")
def native():
    """Compile every committed C and Fortran kernel once (two at a time); cached per user."""
    jobs = {}
    for e in ENTRIES:
        if e["lang"] == "numpy":
            continue
        files = {Path(p).name: (GEN / p).read_text(encoding="utf-8") for p in e["files"]}
        jobs[_id(e)] = (files, e["lang"], _stem(e))

    def build(key):
        files, lang, stem = jobs[key]
        if loader.find_compiler(lang) is None:
            return key, None
        return key, loader.build_shared(files, lang, stem)

    with ThreadPoolExecutor(max_workers=2) as pool:
        return dict(pool.map(build, sorted(jobs)))


def _load(entry, native):
    if entry["lang"] == "numpy":
        path = GEN / next(iter(entry["files"]))
        mod = types.ModuleType("k_" + _stem(entry))
        exec(compile(path.read_text(encoding="utf-8"), str(path), "exec"), mod.__dict__)
        return None, mod
    lib = native.get(_id(entry))
    if lib is None:
        need(entry["lang"])           # skip with the reason; fail under CI
        raise AssertionError(f"{_id(entry)} did not build although its compiler is present")
    impl = loader._NativeImpl(lib, f"derive_{_stem(entry)}", "_f" if entry["lang"] == "fortran" else "")
    return impl, None


def _call(impl, mod, X, E, nu, t, U, name, state):
    n, k = X.shape[0], 2 * X.shape[1]
    if mod is not None:
        K = mod.stiffness(X, E, nu, t)
        d = mod.validity(X)
        strain, stress = mod.recovery(X, U, E, nu)
        return K, d, strain, stress
    K = np.empty((n, k, k))
    impl.stiffness(np.ascontiguousarray(X), E, nu, t, K)
    d = np.empty(n)
    impl.validity(np.ascontiguousarray(X), d)
    npts = ref.RULES[name]["full"]()[0].shape[0]
    nstr = 4 if state == "axisymmetric" else 3
    strain = np.empty((n, npts, nstr))
    stress = np.empty((n, npts, nstr))
    impl.recovery(np.ascontiguousarray(X), np.ascontiguousarray(U), E, nu, strain, stress)
    return K, d, strain, stress


def _rel(a, b, axes):
    """Per-element normwise relative difference max|a - b| / max|b|."""
    return np.max(np.abs(a - b), axis=axes) / np.max(np.abs(b), axis=axes)


@pytest.mark.parametrize("entry", ENTRIES, ids=[_id(e) for e in ENTRIES])
def test_committed_kernel_against_independent_quadrature(entry, native):
    name, variant, state = entry["element"], entry["variant"], entry["state"]
    impl, mod = _load(entry, native)
    rng = np.random.default_rng(zlib.crc32(_id(entry).encode()))
    X = ref.random_elements(name, N_ELEMENTS, rng, axisymmetric=state == "axisymmetric")
    E = float(np.exp(rng.uniform(np.log(0.01), np.log(1e3))))
    nu = float(rng.uniform(-0.2, 0.45))
    t = float(rng.uniform(0.1, 2.0))
    U = rng.normal(size=(N_ELEMENTS, 2 * X.shape[1]))
    K, dmin, strain, stress = _call(impl, mod, X, E, nu, t, U, name, state)
    assert K.shape == (N_ELEMENTS, entry["ndof"], entry["ndof"])

    Kref = ref.stiffness(name, variant, state, X, E, nu, t)
    err = _rel(K, Kref, (1, 2))
    # independent numeric quadrature (test_kernels_ref: textbook definitions, published methods,
    # Gauss points from numpy.polynomial.legendre.leggauss); tolerance from the issue: 1e-12
    assert err.max() <= 1e-12, f"worst element {err.argmax()}: rel. error {err.max():.2e}"

    # symmetry to round-off; common practice, no source
    sym = _rel(K, np.transpose(K, (0, 2, 1)), (1, 2))
    assert sym.max() <= 1e-14

    # rigid-body motions are in the null space (2 translations + rotation; axisymmetric: axial
    # translation); common practice, no source
    modes = ref.rigid_modes(X, state)
    KR = np.einsum("eij,emj->emi", K, modes)
    scale = np.max(np.abs(K), axis=(1, 2))[:, None] * np.max(np.abs(modes), axis=2) * K.shape[1]
    assert np.max(np.max(np.abs(KR), axis=2) / scale) <= 1e-12

    # validity kernel: min det J over the full rule's points, against the same quadrature points
    # (reference library: numpy.polynomial.legendre.leggauss; Dunavant (1985) for triangles)
    dref = ref.min_detJ(name, X)
    assert np.max(np.abs(dmin - dref) / np.abs(dref)) <= 1e-13
    assert np.all(dmin > 0)

    # strain/stress recovery at the full rule's points, from the published strain of the method
    sref, tref = ref.recovery(name, variant, state, X, U, E, nu)
    assert strain.shape == sref.shape
    assert _rel(strain, sref, (1, 2)).max() <= 1e-11      # common practice, no source
    assert _rel(stress, tref, (1, 2)).max() <= 1e-11      # common practice, no source


def test_inverted_element_reported_by_index(native):
    """The validity kernel of every committed language flags an inverted element by position."""
    rng = np.random.default_rng(7)
    for entry in [e for e in ENTRIES if e["element"] == "Q4" and e["variant"] == "full"
                  and e["state"] == "plane-stress"]:
        impl, mod = _load(entry, native)
        X = ref.random_elements("Q4", 50, rng)
        X[17] = X[17][::-1]                      # clockwise numbering: det J < 0 everywhere
        X[31, 2] = X[31, 0] + 0.1 * (X[31, 2] - X[31, 0])   # re-entrant corner: det J < 0 somewhere
        if mod is not None:
            d = mod.validity(X)
        else:
            d = np.empty(50)
            impl.validity(np.ascontiguousarray(X), d)
        # common practice, no source: det J <= 0 at a quadrature point marks an invalid element
        assert list(np.flatnonzero(d <= 0)) == [17, 31], entry["lang"]


def test_reference_shape_functions_sane():
    """Self-check of the hand-typed reference: partition of unity, Kronecker delta, derivatives."""
    nodes = {"T3": [(0, 0), (1, 0), (0, 1)], "T6": [(0, 0), (1, 0), (0, 1), (.5, 0), (.5, .5), (0, .5)],
             "Q4": list(map(tuple, ref.SQ_CORNERS)),
             "Q8": list(map(tuple, ref.SQ_CORNERS)) + [(0, -1), (1, 0), (0, 1), (-1, 0)],
             "Q9": list(map(tuple, ref.SQ_CORNERS)) + [(0, -1), (1, 0), (0, 1), (-1, 0), (0, 0)]}
    h = 1e-6
    for name, pts in nodes.items():
        for i, (s, r) in enumerate(pts):
            N, _, _ = ref.shape(name, s, r)
            assert_allclose(N, np.eye(len(pts))[i], rtol=0, atol=1e-14)   # Kronecker delta; definition
        s, r = 0.23, 0.31
        N, ds, dr = ref.shape(name, s, r)
        assert abs(N.sum() - 1) < 1e-14                             # partition of unity; definition
        # central differences (common practice, no source)
        # (truncation h^2 ~ 1e-12 and round-off eps / h ~ 1e-10 of these O(1) derivatives)
        assert_allclose(ds, (ref.shape(name, s + h, r)[0] - ref.shape(name, s - h, r)[0]) / (2 * h), rtol=0, atol=1e-8)
        assert_allclose(dr, (ref.shape(name, s, r + h)[0] - ref.shape(name, s, r - h)[0]) / (2 * h), rtol=0, atol=1e-8)
