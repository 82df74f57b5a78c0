"""derive.kernel(...): the public contract, input checks, fallback, on-demand native builds,
the committed set being current (derive kernel --check), the CLI, and a new variant
flowing through the generator unchanged."""
from __future__ import annotations

import dataclasses
import json
import os
import re
import subprocess
import sys
import types
import warnings
import zlib
from pathlib import Path

import numpy as np
import pytest

import derive
import test_kernels_ref as ref
from derive import catalog
from derive.cli import main
from derive.codegen import committed, emit, loader
from derive.errors import GeometryError, InputError, MaterialError

from compilers import need as _need      # skip with the reason; fail under CI


def _check_against_reference(k, name, variant, state, n=1000):
    rng = np.random.default_rng(zlib.crc32(f"{name}{variant}{state}{k.lang}".encode()))
    X = ref.random_elements(name, n, rng, axisymmetric=state == "axisymmetric")
    E, nu, t = 7.5, 0.31, 0.4
    K = k(X, E, nu, t)
    Kref = ref.stiffness(name, variant, state, X, E, nu, t)
    err = np.max(np.abs(K - Kref), axis=(1, 2)) / np.max(np.abs(Kref), axis=(1, 2))
    # independent numeric quadrature of tests/test_kernels_ref.py (textbook definitions,
    # numpy.polynomial.legendre.leggauss); tolerance from the issue
    assert err.max() <= 1e-12
    return X


# ---------------------------------------------------------------------------------------------
# the contract, including combinations outside the committed native set (built on demand)

@pytest.mark.parametrize("name,variant,state,lang", [
    ("Q4", "full", "plane-stress", "numpy"),
    ("Q4", "eas4", "plane-strain", "c"),
    ("Q8", "full", "axisymmetric", "c"),
    ("T6", "bbar", "plane-strain", "fortran"),
    ("Q4", "incompatible", "axisymmetric", "fortran"),
])
def test_contract_on_demand(name, variant, state, lang):
    _need(lang)
    k = derive.kernel(name, variant, state, lang)
    assert k.lang == lang and k.ndof == 2 * ref.NODES[name]
    X = _check_against_reference(k, name, variant, state)
    K = k(X[:5], 7.5, 0.31, 0.4)
    assert K.shape == (5, k.ndof, k.ndof)
    strain, stress = k.recovery(X[:5], np.ones((5, k.ndof)), 7.5, 0.31)
    assert strain.shape == (5, k.npoints, 4 if state == "axisymmetric" else 3) and stress.shape == strain.shape


@pytest.mark.parametrize("lang", ["c", "fortran"])
def test_same_result_all_languages(lang):
    _need(lang)
    rng = np.random.default_rng(3)
    X = ref.random_elements("Q8", 200, rng)
    k = derive.kernel("Q8", "reduced", "plane-stress", lang)
    assert k.lang == lang                       # the native route ran, not a fallback
    base = derive.kernel("Q8", "reduced", "plane-stress", "numpy")(X, 2.0, 0.2, 1.0)
    K = k(X, 2.0, 0.2, 1.0)
    # the languages evaluate the same statements; round-off only (common practice)
    assert np.max(np.abs(K - base)) <= 1e-13 * np.max(np.abs(base)), lang
    # and both are the textbook matrix (independent numpy quadrature, tests/test_kernels_ref.py)
    Kref = ref.stiffness("Q8", "reduced", "plane-stress", X, 2.0, 0.2, 1.0)
    assert np.max(np.abs(K - Kref)) <= 1e-12 * np.max(np.abs(Kref))


# ---------------------------------------------------------------------------------------------
# input checks happen before any native code runs

class _Boom:
    def __getattr__(self, name):
        raise AssertionError("native code was called")


@pytest.mark.parametrize("lang", ["numpy", "c"])
def test_input_checks_before_native(lang):
    _need(lang)
    k = derive.kernel("Q4", lang=lang)
    good = ref.random_elements("Q4", 3, np.random.default_rng(1))
    k2 = loader.Kernel.__new__(loader.Kernel)
    k2.__dict__.update(k.__dict__)
    k2._impl = _Boom()
    with pytest.raises(InputError, match=r"shape \(n, 4, 2\)"):
        k2(good[:, :3], 1.0, 0.3, 1.0)
    with pytest.raises(InputError, match="batch"):
        k2(good[0], 1.0, 0.3, 1.0)
    bad = good.copy()
    bad[2, 1, 0] = np.nan
    with pytest.raises(InputError, match="element index 2"):
        k2(bad, 1.0, 0.3, 1.0)
    bad[2, 1, 0] = np.inf
    with pytest.raises(InputError, match="NaN or infinity"):
        k2.validity(bad)
    for E, nu in ((0.0, 0.3), (-1.0, 0.3), (np.nan, 0.3), (1.0, -1.0), (1.0, 0.7), (1.0, np.nan)):
        with pytest.raises(MaterialError):
            k2(good, E, nu, 1.0)
    with pytest.raises(InputError, match="thickness"):
        k2(good, 1.0, 0.3, 0.0)
    with pytest.raises(InputError, match="scalar"):
        k2(good, np.array([1.0, 2.0]), 0.3, 1.0)
    with pytest.raises(InputError, match="u must have shape"):
        k2.recovery(good, np.zeros((3, 7)), 1.0, 0.3)
    with pytest.raises(InputError, match="out must be"):
        k2(good, 1.0, 0.3, 1.0, out=np.zeros((3, 8, 7)))



@pytest.mark.parametrize("lang", ["numpy", "c", "fortran"])
def test_nu_half_follows_check_material(lang):
    # the kernels use exactly derive.material.check_material's rule: -1 < nu <= 0.5 in plane
    # stress (D = E / (1 - nu^2) [[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]] is finite at
    # nu = 1/2; plane-stress D as in Timoshenko & Goodier, from memory), nu < 0.5 in plane
    # strain and axisymmetry, where E / ((1 + nu)(1 - 2 nu)) is infinite
    _need(lang)
    from derive.material import check_material
    check_material("plane-stress", 1.0, 0.5)          # the rule the kernels must match
    k = derive.kernel("Q4", lang=lang)
    X = ref.random_elements("Q4", 50, np.random.default_rng(5))
    K = k(X, 2.0, 0.5, 0.3)
    Kref = ref.stiffness("Q4", "full", "plane-stress", X, 2.0, 0.5, 0.3)
    assert np.isfinite(K).all()
    err = np.max(np.abs(K - Kref), axis=(1, 2)) / np.max(np.abs(Kref), axis=(1, 2))
    assert err.max() <= 1e-12    # independent numeric quadrature, as above
    U = np.random.default_rng(6).standard_normal((50, 8))
    strain, stress = k.recovery(X, U, 2.0, 0.5)
    assert np.isfinite(strain).all() and np.isfinite(stress).all()
    for nu in (0.5000001, 0.7, -1.0):
        with pytest.raises(MaterialError):
            k(X, 2.0, nu, 0.3)
    for state in ("plane-strain", "axisymmetric"):
        with pytest.raises(MaterialError):
            check_material(state, 1.0, 0.5)
        ks = loader.Kernel.__new__(loader.Kernel)
        ks.__dict__.update(derive.kernel("Q4", state=state, lang="numpy").__dict__)
        ks._impl = _Boom()
        Xs = ref.random_elements("Q4", 3, np.random.default_rng(7), axisymmetric=state == "axisymmetric")
        with pytest.raises(MaterialError, match="singular"):
            ks(Xs, 1.0, 0.5, 1.0)
        with pytest.raises(MaterialError, match="singular"):
            ks.recovery(Xs, np.zeros((3, 8)), 1.0, 0.5)

def test_bad_requests():
    with pytest.raises(InputError, match="unknown element"):
        derive.kernel("Q5")
    with pytest.raises(InputError, match="language"):
        derive.kernel("Q4", lang="rust")
    with pytest.raises(InputError, match="does not apply"):
        derive.kernel("T3", "eas4")
    with pytest.raises(InputError, match="offered in"):
        derive.kernel("Q4", "eas4", "axisymmetric")


def test_fallback_to_numpy_without_compiler(monkeypatch):
    monkeypatch.setattr(loader, "find_compiler", lambda lang: None)
    loader._kernel.cache_clear()
    try:
        with warnings.catch_warnings(record=True) as rec:
            warnings.simplefilter("always")
            k = derive.kernel("T3", "full", "plane-strain", "c")
        msgs = [str(w.message) for w in rec if issubclass(w.category, loader.KernelWarning)]
        assert len(msgs) == 1 and "\n" not in msgs[0] and "NumPy" in msgs[0]
        assert k.lang == "numpy" and k.requested == "c"
        _check_against_reference(k, "T3", "full", "plane-strain", n=200)
    finally:
        loader._kernel.cache_clear()


@pytest.mark.parametrize("lang", ["numpy", "c", "fortran"])
def test_check_names_inverted_elements(lang):
    _need(lang)
    k = derive.kernel("Q8", lang=lang)
    X = ref.random_elements("Q8", 40, np.random.default_rng(5))
    X[5] = X[5][[0, 3, 2, 1, 7, 6, 5, 4]]          # clockwise numbering
    X[29, 0] = X[29, 2] + 0.05 * (X[29, 0] - X[29, 2])  # corner pulled through the element
    d = k.validity(X)
    assert list(np.flatnonzero(d <= 0)) == [5, 29]    # common practice: det J <= 0 is invalid
    with pytest.raises(GeometryError, match=r"index 5, 29"):
        k.check(X)
    assert np.all(k.check(np.delete(X, [5, 29], axis=0)) > 0)


# ---------------------------------------------------------------------------------------------
# the committed set is current and the generator is deterministic

def test_committed_set_is_current_in_a_fresh_process():
    gen = committed.repo_generated_dir()
    if gen is None or not gen.exists():
        pytest.skip("no generated/ folder (installed copy)")
    env = dict(os.environ, PYTHONHASHSEED="4242")     # another hash seed: no set-order dependence
    res = subprocess.run([sys.executable, "-m", "derive", "kernel", "--check", "--json"], capture_output=True,
                         text=True, env=env, timeout=600)
    out = json.loads(res.stdout)
    assert res.returncode == 0, out["differences"][:10]
    assert out["up_to_date"] is True


def test_differences_and_atomic_write(tmp_path):
    files = {"a.txt": "one\n", "sub/b.c": "int x;\n"}
    # the manifest records what derive wrote (it guides replacements and clean-ups)
    files["manifest.json"] = json.dumps({"generator": "derive.codegen", "files": {"a.txt": "", "sub/b.c": ""}})
    committed.write_all(tmp_path / "g", files)
    assert committed.differences(tmp_path / "g", files) == []
    (tmp_path / "g" / "a.txt").write_text("changed\n")
    (tmp_path / "g" / "extra.h").write_text("\n")
    (tmp_path / "g" / "sub" / "b.c").unlink()
    assert committed.differences(tmp_path / "g", files) == ["differs: a.txt", "not generated (stale): extra.h",
                                                            "missing: sub/b.c"]
    committed.write_all(tmp_path / "g", files)             # rewrites derive's files, keeps the others
    assert committed.differences(tmp_path / "g", files) == ["not generated (stale): extra.h"]
    assert (tmp_path / "g" / "extra.h").read_text() == "\n"  # not derive's: never removed
    assert sorted(p.name for p in tmp_path.iterdir()) == ["g"]   # no temporary folders left
    assert sorted(p.name for p in (tmp_path / "g").iterdir()) == ["a.txt", "extra.h", "manifest.json", "sub"]


def test_generation_is_deterministic_in_process():
    a = emit.generate("Q4", "hybrid5", "plane-stress", langs=("c", "fortran", "numpy"))
    emit._ir_for.cache_clear()
    b = emit.generate("Q4", "hybrid5", "plane-stress", langs=("c", "fortran", "numpy"))
    assert [s.text for k in a for s in k.sources] == [s.text for k in b for s in k.sources]
    text = a[0].sources[0].text
    # reproducible text: no checkout path and no date or time stamp (byte-for-byte --check)
    checkout = str(Path(__file__).resolve().parents[1])
    assert "generator    derive.codegen" in text and checkout not in text
    assert not re.search(r"(19|20)\d\d-[01]\d-[0-3]\d|\d\d:\d\d:\d\d", text)


def test_every_catalogue_combination_generates():
    combos = committed.catalogue_combos()
    # every 2-D element x variant (the generator is 2-D so far; 3-D kernels are not in the committed set)
    assert {(e, v) for e, v, _ in combos} == {(e, v) for e, info in catalog.ELEMENTS.items() if info.dim == 2
                                              for v in info.variants}
    manifest = json.loads((committed.repo_generated_dir() / "manifest.json").read_text())
    have = {(k["element"], k["variant"], k["state"], k["lang"]) for k in manifest["kernels"]}
    for e, v, s, langs in committed.committed_set():
        for lang in langs:
            assert (e, v, s, lang) in have


# ---------------------------------------------------------------------------------------------
# a new variant needs no generator change

def _toy_module():
    import sympy as sp
    from derive.formulations.base import B_op, D_op, Formulation, Term

    def Nmat(p):
        M = sp.zeros(2, 2 * len(p.N))
        for i, v in enumerate(p.N):
            M[0, 2 * i] = v
            M[1, 2 * i + 1] = v
        return M

    def spring(p):
        return sp.eye(2) * p.E / 10

    def toy(info, state):
        # K = int B^T D B (full rule) + int N^T (E/10) N (reduced rule): an elastic foundation
        return Formulation("toy", (Term("uu", B_op, D_op, B_op, rule="full", symmetric=True),
                                   Term("uu", Nmat, spring, Nmat, rule="reduced", symmetric=True)))

    mod = types.ModuleType("derive.formulations._toy")
    mod.toy = toy
    return mod


@pytest.mark.parametrize("lang", ["numpy", "c"])
def test_new_variant_flows_through_the_generator(monkeypatch, lang):
    _need(lang)                              # skip with the reason; fail under CI
    monkeypatch.setitem(sys.modules, "derive.formulations._toy", _toy_module())
    monkeypatch.setitem(catalog.VARIANTS, "toy", catalog.VariantInfo("toy", "test variant", "_toy:toy"))
    info = catalog.ELEMENTS["Q4"]
    monkeypatch.setitem(catalog.ELEMENTS, "Q4", dataclasses.replace(info, variants=info.variants + ("toy",)))
    X = ref.random_elements("Q4", 1000, np.random.default_rng(11))
    E, nu, t = 3.0, 0.25, 0.5
    Kref = ref.stiffness("Q4", "full", "plane-stress", X, E, nu, t)
    for p, w in ref.points("Q4", "plane-stress", X, "reduced", t):
        Nm = np.zeros((2, 8))
        Nm[0, 0::2] = p.N
        Nm[1, 1::2] = p.N
        Kref = Kref + (w * p.dV)[:, None, None] * (E / 10) * (Nm.T @ Nm)[None]
    k = derive.kernel("Q4", "toy", "plane-stress", lang)
    assert k.lang == lang                    # the route that actually ran
    K = k(X, E, nu, t)
    err = np.max(np.abs(K - Kref), axis=(1, 2)) / np.max(np.abs(Kref), axis=(1, 2))
    assert err.max() <= 1e-12     # independent numeric quadrature (leggauss), as above


# ---------------------------------------------------------------------------------------------
# the CLI

def test_cli_writes_kernel_files(tmp_path, capsys):
    assert main(["kernel", "Q4", "--variant", "incompatible-centred", "--lang", "all", "-o", str(tmp_path),
                 "--json"]) == 0
    out = json.loads(capsys.readouterr().out)
    names = sorted(p.name for p in tmp_path.iterdir())
    stem = "q4_incompatible_centred_plane_stress"
    # the kernel files and the record of what derive wrote there (guides later overwrites)
    assert names == [".derive-manifest.json", f"{stem}.c", f"{stem}.f90", f"{stem}.h", f"{stem}.py"]
    assert out["kernels"][0]["flops"]["stiffness"] > 0
    text = (tmp_path / f"{stem}.h").read_text()
    assert f"void derive_{stem}_stiffness_batch(long n" in text


def test_cli_prints_source(capsys):
    assert main(["kernel", "T3", "--lang", "c"]) == 0
    text = capsys.readouterr().out
    assert "derive_t3_full_plane_stress_stiffness_batch" in text and "also generated: t3_full_plane_stress.h" in text


@pytest.mark.parametrize("argv,needle", [
    (["kernel", "Q5"], "unknown element"),
    (["kernel", "Q4", "--lang", "rust"], "unknown --lang"),
    (["kernel", "Q4", "--variant", "eas4", "--state", "axisymmetric"], "offered in"),
    (["kernel", "Q4", "--all"], "drop the element"),
    (["kernel"], "give an ELEMENT"),
    (["kernel", "--all", "--check"], "exclude each other"),
    (["kernel", "Q4", "--lang", "all"], "give -o DIR"),
])
def test_cli_bad_input_one_line_exit_2(argv, needle, capsys):
    assert main(argv) == 2
    err = capsys.readouterr().err.strip()
    assert needle in err and "\n" not in err


def test_cli_list(capsys):
    assert main(["kernel", "--list", "--json"]) == 0
    rows = json.loads(capsys.readouterr().out)["committed"]
    assert {"element": "Q4", "variant": "full", "state": "plane-stress", "languages": ["numpy", "c", "fortran"]} in rows


def test_cli_spec_element(capsys):
    assert main(["kernel", "q8-serendipity.toml", "--lang", "numpy", "--json"]) == 0
    out = json.loads(capsys.readouterr().out)
    assert out["kernels"][0]["ndof"] == 16


def test_cli_all_and_check_exit_status(tmp_path, monkeypatch, capsys):
    fake = {"manifest.json": "{}\n", "c/x.c": "int x;\n"}
    monkeypatch.setattr(committed, "render_all", lambda jobs=None, progress=None: dict(fake))
    dest = tmp_path / "gen"
    assert main(["kernel", "--all", "-o", str(dest)]) == 0
    assert main(["kernel", "--check", "-o", str(dest)]) == 0
    (dest / "c" / "x.c").write_text("int y;\n")
    capsys.readouterr()
    assert main(["kernel", "--check", "-o", str(dest), "--json"]) == 1      # a check ran and failed
    out = json.loads(capsys.readouterr().out)
    assert out["up_to_date"] is False and out["differences"] == ["differs: c/x.c"]


@pytest.mark.parametrize("lang", ["c", "fortran"])
def test_batch_blocks_with_a_short_last_block(lang):
    # the native batch routines work on blocks of 8 elements (lanes); batches that are not a
    # multiple of 8, and a single element, must match the independent quadrature element by element
    _need(lang)
    for name, variant in (("Q4", "full"), ("Q8", "full"), ("Q4", "eas4")):
        k = derive.kernel(name, variant, lang=lang)
        X = ref.random_elements(name, 21, np.random.default_rng(11))
        Kref = ref.stiffness(name, variant, "plane-stress", X, 7.5, 0.31, 0.4)
        for n in (1, 5, 8, 13, 21):
            K = k(X[:n], 7.5, 0.31, 0.4)
            err = np.max(np.abs(K - Kref[:n]), axis=(1, 2)) / np.max(np.abs(Kref[:n]), axis=(1, 2))
            assert err.max() <= 1e-12     # independent numeric quadrature (leggauss), as above
        assert k(X[:0], 7.5, 0.31, 0.4).shape == (0, k.ndof, k.ndof)
