"""Hostile input against the code generator, the kernel writer, the kernel cache and the kernel
API: each test reproduces an attack (a sentinel file that must never appear, a folder whose
contents must survive, a bounded time) and checks that it is refused or harmless."""
from __future__ import annotations

import ctypes
import dataclasses
import json
import os
import stat
import subprocess
import sys
import time
import warnings

import compilers
import numpy as np
import pytest

from derive import catalog
from derive.cli import main
from derive.codegen import committed, emit, loader
from derive.codegen.ir import build
from derive.errors import GeometryError, InputError, SpecError
from derive.spec import load_spec

#: generous hang guard for work that must be refused quickly (not a timing assertion)
HANG = 60


def _need(lang):
    compilers.need(lang)        # skip with the reason, or fail under CI


Q4_NODES = "[[-1, -1], [1, -1], [1, 1], [-1, 1]]"
Q4_BASIS = '["1", "xi", "eta", "xi*eta"]'


def _spec(tmp_path, name_toml: str, nodes: str = Q4_NODES, basis: str = Q4_BASIS, file="s.toml", extra=""):
    p = tmp_path / file
    p.write_text(f"name = {name_toml}\ndomain = \"square\"\nnodes = {nodes}\nbasis = {basis}\n{extra}",
                 encoding="utf-8")
    return p


# ---------------------------------------------------------------------------------------------
# 1. spec names: validated at load time

HOSTILE_NAMES = [
    '"Q\\"; __import__(\\"os\\").system(\\"touch pwned\\"); x = \\""',      # closes a Python string
    '"Q*/ __attribute__((constructor)) static void p(void) {} /*"',         # closes a C comment
    '"Q\\n  call execute_command_line(\\"touch pwned\\")"',                  # newline into Fortran
    '"Q\\u0000"', '"Q\\u001b[2J"', '"Q\\t"', '"Qé"', '""', '"1Q"',
    '"' + "Q" * 100000 + '"', '"Q' + "x" * 16 + '"', "42",
]


@pytest.mark.parametrize("name", HOSTILE_NAMES, ids=range(len(HOSTILE_NAMES)))
def test_hostile_spec_names_are_refused_at_load(tmp_path, name):
    p = _spec(tmp_path, name)
    t0 = time.perf_counter()
    with pytest.raises(SpecError) as exc:
        load_spec(p)
    assert time.perf_counter() - t0 < HANG
    msg = str(exc.value)
    assert "s.toml" in msg and "\n" not in msg and "\x00" not in msg and "\x1b" not in msg and len(msg) < 300


@pytest.mark.parametrize("name", ['"Q4 "', '" q4"', '"q8"', '"T3\\t"', '"Ｑ4"'])
def test_spec_names_must_not_collide_with_the_catalogue(tmp_path, name):
    p = _spec(tmp_path, name)
    with pytest.raises(SpecError, match="s.toml"):
        load_spec(p)


def test_cli_refuses_a_hostile_spec_name_with_exit_2(tmp_path, capsys, monkeypatch):
    monkeypatch.chdir(tmp_path)
    p = _spec(tmp_path, HOSTILE_NAMES[0])
    for cmd in (["kernel", str(p)], ["patch", str(p)], ["shapes", str(p)]):
        assert main(cmd) == 2
        err = capsys.readouterr().err
        assert "s.toml" in err and len(err.strip().splitlines()) == 1
    assert not (tmp_path / "pwned").exists()


def test_a_valid_spec_name_still_works(tmp_path):
    info, _ = load_spec(_spec(tmp_path, '"My-Q4_b"'))
    assert info.name == "My-Q4_b"


# defence in depth: a name that slipped past validation still cannot close a string or comment

PAYLOADS = {
    "numpy": 'Q"+open("pwned","w").name+"""+open("pwned","w").name+"""\nopen("pwned","w")\n#',
    "c": 'Q*/ int system(const char *); __attribute__((constructor)) static void p(void) '
         '{ system("touch pwned"); } /*\\\n??/',
    "fortran": 'Q\n  call execute_command_line("touch pwned")\n!',
}


def _hostile_kernel(lang, monkeypatch):
    info = dataclasses.replace(catalog.ELEMENTS["Q4"], name=PAYLOADS[lang])
    ir = build(info, catalog.shape_set("Q4"), "full", "plane-stress")
    monkeypatch.setattr(emit, "stem", lambda *a: "hostile_q4_full")   # the identifier stays valid
    (ks,) = emit.generate(info.name, "full", "plane-stress", langs=(lang,), ir=ir)
    return ks


@pytest.mark.parametrize("lang", ["numpy", "c", "fortran"])
def test_hostile_name_cannot_reach_generated_code(lang, tmp_path, monkeypatch):
    _need(lang)
    monkeypatch.chdir(tmp_path)
    monkeypatch.setenv("DERIVE_CACHE_DIR", str(tmp_path / "cache"))
    ks = _hostile_kernel(lang, monkeypatch)
    X = np.array([[[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]])
    K = np.empty((1, 8, 8))
    if lang == "numpy":
        impl = loader._NumpyImpl(ks.sources[0].text, "hostile")        # imports the module
        assert impl.mod.ELEMENT == PAYLOADS["numpy"]                   # the literal holds the text exactly
    else:
        lib = loader.build_shared({os.path.basename(s.path): s.text for s in ks.sources}, lang, "hostile_q4_full")
        impl = loader._NativeImpl(lib, "derive_hostile_q4_full", "_f" if lang == "fortran" else "")
    impl.stiffness(X, 1.0, 0.25, 1.0, K)
    # a 2 x 1 rectangle: K[0, 0] = E t / (1 - nu^2) (b/(3a) + (1 - nu) a/(6b)) with a = 1, b = 1/2
    # (closed form of the bilinear rectangle, e.g. Cook et al., Concepts and Applications of FEA, 4th ed.)
    nu = 0.25
    np.testing.assert_allclose(K[0, 0, 0], (0.5 / 3 + (1 - nu) * 1 / 3) / (1 - nu ** 2), rtol=1e-12, atol=0)
    assert not (tmp_path / "pwned").exists()


def test_escape_filters_keep_text_inside_literals_and_comments():
    evil = 'a*/b/*c??/d\\\n"""e\x00\u00e9'
    c = emit.c_comment(evil)
    assert "*/" not in c and "/*" not in c and "??" not in c and "\\" not in c and "\n" not in c
    assert all(" " <= ch <= "~" for ch in c)
    assert "\n" not in emit.f_comment(evil) and all(" " <= ch <= "~" for ch in emit.f_comment(evil))
    assert eval(emit.py_str(evil)) == evil                       # common practice: repr round trip
    doc = emit.py_doc(evil)
    assert eval('"""' + doc + '"""') == evil                   # the docstring holds the text exactly
    assert '"""' not in doc and "\n" not in doc


# ---------------------------------------------------------------------------------------------
# 2. kernel --all -o DIR / kernel E -o DIR: only derive's own files

def _fake_set(names=("c/x.c", "numpy/x.py")):
    files = {rel: f"/* {rel} */\n" for rel in names}
    files["README.md"] = "# Generated kernels (do not edit)\n"
    manifest = {"generator": "derive.codegen", "kernels": [],
                "files": {rel: "0" for rel in files}}
    files["manifest.json"] = json.dumps(manifest) + "\n"
    return files


def _user_folder(d):
    (d / "src").mkdir(parents=True)
    (d / "src" / "main.c").write_text("int main(void) { return 0; }\n")
    (d / "notes.txt").write_text("mine\n")
    os.chmod(d, 0o755)
    return {"src/main.c": "int main(void) { return 0; }\n", "notes.txt": "mine\n"}


def _survives(d, mine):
    for rel, text in mine.items():
        assert (d / rel).read_text() == text
    assert stat.S_IMODE(os.stat(d).st_mode) == 0o755


def test_kernel_all_keeps_the_users_files_and_folder_mode(tmp_path, monkeypatch, capsys):
    files = _fake_set()
    monkeypatch.setattr(committed, "render_all", lambda jobs=None, progress=None: dict(files))
    d = tmp_path / "out"
    mine = _user_folder(d)
    assert main(["kernel", "--all", "-o", str(d)]) == 0
    _survives(d, mine)
    assert (d / "c" / "x.c").read_text() == files["c/x.c"]
    # a second run replaces derive's own files and removes those it no longer generates
    files2 = _fake_set(("c/x.c",))
    monkeypatch.setattr(committed, "render_all", lambda jobs=None, progress=None: dict(files2))
    assert main(["kernel", "--all", "-o", str(d)]) == 0
    assert not (d / "numpy" / "x.py").exists()
    _survives(d, mine)
    capsys.readouterr()


def test_kernel_all_refuses_a_file_it_did_not_write_unless_force(tmp_path, monkeypatch, capsys):
    files = _fake_set()
    monkeypatch.setattr(committed, "render_all", lambda jobs=None, progress=None: dict(files))
    d = tmp_path / "out"
    mine = _user_folder(d)
    (d / "README.md").write_text("my project\n")
    mine["README.md"] = "my project\n"
    capsys.readouterr()
    assert main(["kernel", "--all", "-o", str(d)]) == 2
    err = capsys.readouterr().err
    assert "README.md" in err and "--force" in err and len(err.strip().splitlines()) == 1
    _survives(d, mine)
    assert not (d / "c").exists()                                      # nothing written
    assert main(["kernel", "--all", "-o", str(d), "--force"]) == 0
    assert (d / "README.md").read_text() == files["README.md"]
    del mine["README.md"]
    _survives(d, mine)


def test_kernel_all_into_the_current_folder(tmp_path, monkeypatch):
    files = _fake_set()
    monkeypatch.setattr(committed, "render_all", lambda jobs=None, progress=None: dict(files))
    mine = _user_folder(tmp_path / "here")
    monkeypatch.chdir(tmp_path / "here")
    assert main(["kernel", "--all", "-o", "."]) == 0
    _survives(tmp_path / "here", mine)
    assert (tmp_path / "here" / "manifest.json").exists()


def test_single_kernel_write_refuses_a_users_file_of_the_same_name(tmp_path, capsys):
    # the common folder rule (derive.output.OutputFolder): a folder holding files derive did
    # not write needs --force; derive never removes them
    d = tmp_path / "k"
    mine = _user_folder(d)
    (d / "q4_full_plane_stress.c").write_text("my own code\n")
    assert main(["kernel", "Q4", "--lang", "c", "-o", str(d)]) == 2
    assert "q4_full_plane_stress.c" in capsys.readouterr().err
    assert (d / "q4_full_plane_stress.c").read_text() == "my own code\n"
    assert not (d / "q4_full_plane_stress.h").exists()
    assert main(["kernel", "Q4", "--lang", "c", "-o", str(d), "--force"]) == 0
    assert "derive generated kernel" in (d / "q4_full_plane_stress.c").read_text()
    assert main(["kernel", "Q4", "--lang", "all", "-o", str(d), "--force"]) == 0
    assert (d / "q4_full_plane_stress.f90").exists()
    _survives(d, mine)
    capsys.readouterr()


def test_jobs_is_capped_at_the_core_count(monkeypatch, capsys):
    seen = {}

    def fake(jobs=None, progress=None):
        seen["jobs"] = jobs
        return {}
    monkeypatch.setattr(committed, "render_all", fake)
    monkeypatch.setattr(committed, "differences", lambda dest, files: [])
    assert main(["kernel", "--check", "--jobs", "500"]) == 0
    cores = len(os.sched_getaffinity(0)) if hasattr(os, "sched_getaffinity") else os.cpu_count()
    assert seen["jobs"] == cores
    assert f"capped at {cores}" in capsys.readouterr().err


# ---------------------------------------------------------------------------------------------
# 3. spec size limits

def _lagrange(n):
    from fractions import Fraction as F
    pts = [F(-1) + F(2 * i, n - 1) for i in range(n)]
    nodes = json.dumps([[str(a), str(b)] for b in pts for a in pts])
    basis = json.dumps([f"xi^{i}*eta^{j}" for j in range(n) for i in range(n)])
    return nodes, basis


@pytest.mark.parametrize("case", ["repeated-exponent", "49-nodes", "169-nodes", "5000-digits", "superscript",
                                  "one-over-zero", "huge-exponent-text", "big-file"])
def test_oversized_or_malformed_specs_are_refused_quickly(tmp_path, case, capsys):
    nodes, basis, extra = Q4_NODES, Q4_BASIS, ""
    if case == "repeated-exponent":
        basis = json.dumps(["1", "xi", "eta", "*".join(["xi^12"] * 100)])
    elif case == "49-nodes":
        nodes, basis = _lagrange(7)
    elif case == "169-nodes":
        nodes, basis = _lagrange(13)
    elif case == "5000-digits":
        nodes = "[[" + "1" * 5000 + ", -1], [1, -1], [1, 1], [-1, 1]]"
    elif case == "superscript":
        basis = '["1", "xi", "eta", "xi^²"]'
    elif case == "one-over-zero":
        nodes = '[["1/0", -1], [1, -1], [1, 1], [-1, 1]]'
    elif case == "huge-exponent-text":
        nodes = '[["1e-9999999", -1], [1, -1], [1, 1], [-1, 1]]'
    elif case == "big-file":
        extra = "# " + "x" * 70000 + "\n"
    p = _spec(tmp_path, '"QX"', nodes, basis, extra=extra)
    t0 = time.perf_counter()
    assert main(["shapes", str(p)]) == 2
    assert time.perf_counter() - t0 < HANG
    err = capsys.readouterr().err.strip()
    assert "s.toml" in err and len(err.splitlines()) == 1 and "internal error" not in err
    if case in ("49-nodes", "169-nodes"):
        assert "at most 27" in err
    if case == "repeated-exponent":
        assert "limits are" in err


def test_the_shipped_specs_are_within_the_limits():
    from derive.spec import shipped_specs
    for p in shipped_specs():
        load_spec(p)


# ---------------------------------------------------------------------------------------------
# 4. a damaged cached library is detected by its checksum and rebuilt (never SIGBUS)

RUN_Q4_C = """
import warnings, numpy as np, derive
warnings.simplefilter("always")
k = derive.kernel("Q4", lang="c")
X = np.array([[[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]])
print(k.lang, repr(float(k(X, 1.0, 0.25, 1.0)[0, 0, 0])))
"""
#: K[0, 0] of the 2 x 1 rectangle, E = 1, nu = 1/4, t = 1: E t / (1 - nu^2) (b/(3a) + (1 - nu) a/(6b))
#: with a = 1, b = 1/2 (closed form of the bilinear rectangle, e.g. Cook et al., Concepts and
#: Applications of FEA, 4th ed.)
K00 = (1 / 6 + 0.75 / 3) / (1 - 0.25 ** 2)


def _run(script, cache, umask=None):
    env = dict(os.environ, DERIVE_CACHE_DIR=str(cache))
    pre = f"import os; os.umask({umask:#o})\n" if umask is not None else ""
    return subprocess.run([sys.executable, "-c", pre + script], capture_output=True, text=True, env=env,
                          timeout=600, cwd=os.path.dirname(os.path.dirname(os.path.abspath(__file__))))


def _libs(cache):
    return sorted((cache / "kernels").glob("q4_full_plane_stress-c-*.so"))


@pytest.mark.parametrize("damage", ["truncated", "random-bytes", "checksum-missing"])
def test_damaged_cached_library_is_rebuilt(tmp_path, damage):
    _need("c")
    cache = tmp_path / "cache"
    first = _run(RUN_Q4_C, cache)
    assert first.returncode == 0, first.stderr
    (lib,) = _libs(cache)
    data = lib.read_bytes()
    if damage == "truncated":
        lib.write_bytes(data[: len(data) // 3])
    elif damage == "random-bytes":
        lib.write_bytes(np.random.default_rng(7).bytes(len(data)))
    else:
        (lib.parent / (lib.name + ".sha256")).unlink()
    res = _run(RUN_Q4_C, cache)
    assert res.returncode == 0, (res.returncode, res.stderr[-2000:])      # SIGBUS would be -7
    if damage == "checksum-missing":      # a library built before checksums were recorded: rebuilt quietly
        assert "damaged" not in res.stderr
    else:
        assert "damaged" in res.stderr and "rebuilding" in res.stderr
    lang, value = res.stdout.split()
    assert lang == "c"
    np.testing.assert_allclose(float(value), K00, rtol=1e-12, atol=0)
    assert lib.read_bytes() != b"" and (lib.parent / (lib.name + ".sha256")).exists()


# ---------------------------------------------------------------------------------------------
# 5. cache permissions

def test_cache_is_private_whatever_the_umask(tmp_path):
    _need("c")
    cache = tmp_path / "cache"
    res = _run(RUN_Q4_C, cache, umask=0)
    assert res.returncode == 0 and res.stdout.startswith("c "), res.stderr
    for d in (cache, cache / "kernels"):
        assert stat.S_IMODE(os.stat(d).st_mode) == 0o700
    (lib,) = _libs(cache)
    for f in (lib, lib.parent / (lib.name + ".sha256")):
        assert stat.S_IMODE(os.stat(f).st_mode) == 0o600


def _fresh_kernel(monkeypatch, cache):
    monkeypatch.setenv("DERIVE_CACHE_DIR", str(cache))
    loader._kernel.cache_clear()
    try:
        with pytest.warns(loader.KernelWarning) as rec:
            k = loader.kernel("Q4", lang="c")
    finally:
        loader._kernel.cache_clear()
    return k, " ".join(str(w.message) for w in rec)


@pytest.mark.parametrize("case", ["folder-world-writable", "folder-other-owner", "library-group-writable",
                                  "library-other-owner", "folder-cannot-be-created", "folder-read-only"])
def test_unsafe_or_unusable_cache_falls_back_to_numpy(tmp_path, monkeypatch, case):
    _need("c")
    cache = tmp_path / "cache"
    kdir = cache / "kernels"
    if case.startswith("library"):
        assert _run(RUN_Q4_C, cache).returncode == 0
        (lib,) = _libs(cache)
        if case == "library-group-writable":
            os.chmod(lib, 0o660)
        else:
            if os.getuid() != 0:
                pytest.skip("changing a file's owner needs root")
            os.chown(lib, 65534, 65534)
    elif case == "folder-world-writable":
        kdir.mkdir(parents=True)
        os.chmod(kdir, 0o777)
    elif case == "folder-other-owner":
        if os.getuid() != 0:
            pytest.skip("changing a folder's owner needs root")
        kdir.mkdir(parents=True)
        os.chmod(kdir, 0o700)
        os.chown(kdir, 65534, 65534)
    elif case == "folder-cannot-be-created":
        (tmp_path / "file").write_text("")
        cache = tmp_path / "file" / "cache"
    else:   # read-only: every write into the cache fails (root ignores mode bits, so simulated)
        kdir.mkdir(parents=True, mode=0o700)

        def refuse(*a, **kw):
            raise PermissionError(13, "Permission denied")
        monkeypatch.setattr(loader.tempfile, "TemporaryDirectory", refuse)
    k, msg = _fresh_kernel(monkeypatch, cache)
    assert k.lang == "numpy" and k.requested == "c"
    expect = {"folder-world-writable": "writable by group or others", "library-group-writable":
              "writable by group or others", "folder-other-owner": "another user", "library-other-owner":
              "another user", "folder-cannot-be-created": "cannot be created", "folder-read-only": "cannot build"}
    assert expect[case] in msg and "NumPy" in msg
    X = np.array([[[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]])
    np.testing.assert_allclose(k(X, 1.0, 0.25, 1.0)[0, 0, 0], K00, rtol=1e-12, atol=0)


# ---------------------------------------------------------------------------------------------
# 6. out=: writeable, C-contiguous float64 of the exact shape, or InputError (before native code)

def _outs(tmp_path):
    ro = np.zeros((3, 8, 8))
    ro.flags.writeable = False
    path = tmp_path / "k.bin"
    np.zeros((3, 8, 8)).tofile(path)
    mm = np.memmap(path, dtype=np.float64, mode="r", shape=(3, 8, 8))
    return {"read-only ndarray": ro, "read-only memmap": mm, "float32": np.zeros((3, 8, 8), np.float32),
            "fortran order": np.zeros((3, 8, 8), order="F"), "wrong shape": np.zeros((3, 8, 7)),
            "strided view": np.zeros((6, 8, 8))[::2], "list": [[0.0] * 8] * 8,
            "big-endian": np.zeros((3, 8, 8), dtype=">f8")}


@pytest.mark.parametrize("lang", ["numpy", "c", "fortran"])
def test_out_must_be_writeable_contiguous_float64(lang, tmp_path):
    _need(lang)
    k = loader.kernel("Q4", lang=lang)
    X = np.tile(np.array([[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]), (3, 1, 1))
    for what, out in _outs(tmp_path).items():
        with pytest.raises(InputError, match="out must be a writeable, C-contiguous float64"):
            k(X, 1.0, 0.25, 1.0, out=out)
        if isinstance(out, np.ndarray):
            assert not np.any(out), what                      # nothing written into it
    buf = np.zeros(3 * 8 * 8 + 3 * 4 * 2)
    with pytest.raises(InputError, match="overlaps xy"):
        k(buf[:24].reshape(3, 4, 2), 1.0, 0.25, 1.0, out=buf[:192].reshape(3, 8, 8))
    good = np.zeros((3, 8, 8))
    assert k(X, 1.0, 0.25, 1.0, out=good) is good
    np.testing.assert_allclose(good[:, 0, 0], K00, rtol=1e-12, atol=0)


def test_standalone_numpy_kernel_refuses_a_read_only_out():
    import types
    mod = types.ModuleType("q4")
    exec(compile((committed.repo_generated_dir() / "numpy" / "q4_full_plane_stress.py").read_text(), "q4", "exec"),
         mod.__dict__)
    ro = np.zeros((1, 8, 8))
    ro.flags.writeable = False
    X = np.array([[[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]])
    with pytest.raises(ValueError, match="writeable"):
        mod.stiffness(X, 1.0, 0.25, 1.0, out=ro)
    assert not np.any(ro)


# ---------------------------------------------------------------------------------------------
# 7. the checked call: invalid elements by index, non-real arguments refused

GOOD = [[0.0, 0.0], [2.0, 0.0], [2.0, 1.0], [0.0, 1.0]]
BAD = {"clockwise": [[0.0, 0.0], [0.0, 1.0], [2.0, 1.0], [2.0, 0.0]],
       "bow-tie": [[0.0, 0.0], [2.0, 1.0], [2.0, 0.0], [0.0, 1.0]],
       "all-zero": [[0.0, 0.0]] * 4,
       "1e200": [[0.0, 0.0], [2e200, 0.0], [2e200, 1e200], [0.0, 1e200]]}


@pytest.mark.parametrize("lang", ["numpy", "c", "fortran"])
@pytest.mark.parametrize("what", list(BAD))
def test_checked_call_names_invalid_elements_by_index(lang, what):
    _need(lang)
    k = loader.kernel("Q4", lang=lang)
    X = np.array([GOOD, GOOD, BAD[what], GOOD, BAD[what]])
    with pytest.raises(GeometryError, match=r"2 Q4 element\(s\).*index 2, 4"):
        k(X, 1.0, 0.25, 1.0)
    with warnings.catch_warnings():
        warnings.simplefilter("ignore")                       # overflow in the 1e200 element
        K = k(X, 1.0, 0.25, 1.0, screen=False)                # the caller opted out for speed
    np.testing.assert_allclose(K[0, 0, 0], K00, rtol=1e-12, atol=0)
    np.testing.assert_allclose(k(X[[0, 1, 3]], 1.0, 0.25, 1.0)[:, 0, 0], K00, rtol=1e-12, atol=0)


@pytest.mark.parametrize("arg,value", [("E", True), ("E", "200"), ("E", 1 + 0j), ("E", np.complex128(1.0)),
                                       ("nu", np.bool_(False)), ("t", "1"), ("t", b"1"),
                                       ("xy", "bool"), ("xy", "complex"), ("xy", "str"), ("xy", "object-str")])
def test_non_real_arguments_are_refused(arg, value):
    k = loader.kernel("Q4", lang="numpy")
    X = np.array([GOOD])
    kw = {"xy": X, "E": 1.0, "nu": 0.25, "t": 1.0}
    if arg == "xy":
        kw["xy"] = {"bool": X > 0, "complex": X + 0j, "str": X.astype(str),
                    "object-str": np.array(X.tolist(), dtype=object).astype(str).astype(object)}[value]
    else:
        kw[arg] = value
    with pytest.raises(InputError, match=arg):
        k(kw["xy"], kw["E"], kw["nu"], kw["t"])
