"""The committed kernel set under ``generated/``: what is in it, regenerate, check.

Policy (``derive kernel --all``):

* NumPy: every catalogue element x each of its variants x every state the variant is
  offered in;
* C (source + header) and Fortran: the same elements and variants in plane stress.

Other states in C/Fortran are one command away (``derive kernel Q4 --state plane-strain
--lang c -o DIR``) and are what ``derive.kernel(..., lang="c")`` compiles on demand; the
committed native set is kept to what the test suite compiles and checks in every run.
New elements and variants enter the set automatically: the lists below are computed from
the catalogue, never typed in.
"""
from __future__ import annotations

import hashlib
import json
import os
from concurrent.futures import ProcessPoolExecutor
from pathlib import Path

from .. import catalog
from ..errors import InputError
from ..material import STATES
from .version import GENERATOR_VERSION
from . import owned as owned_mod
from .emit import generate

NATIVE_STATES = ("plane-stress",)
MANIFEST = "manifest.json"


def catalogue_combos() -> list[tuple[str, str, str]]:
    """Every (element, variant, state) of the catalogue that has a formulation."""
    out = []
    for name, info in catalog.ELEMENTS.items():
        if info.dim != 2:  # the generator is 2-D so far (derive.codegen.ir.Builder)
            continue
        for variant in info.variants:
            vinfo = catalog.VARIANTS.get(variant)
            if vinfo is None:
                continue
            for state in getattr(vinfo, "states", STATES):
                try:
                    catalog.formulation(info, variant, state)
                except InputError:
                    continue
                out.append((name, variant, state))
    return out


def committed_set() -> list[tuple[str, str, str, tuple[str, ...]]]:
    """(element, variant, state, languages) of the committed set, in a fixed order."""
    out = []
    for name, variant, state in catalogue_combos():
        langs = ("numpy",) + (("c", "fortran") if state in NATIVE_STATES else ())
        out.append((name, variant, state, langs))
    return out


def _one(job):
    name, variant, state, langs = job
    sets = generate(name, variant, state, langs=langs)
    return [(k.lang, k.stem, [(s.path, s.text) for s in k.sources], k.meta) for k in sets]


def repo_generated_dir() -> Path | None:
    """``generated/`` of the source checkout derive runs from (None when installed elsewhere)."""
    root = Path(__file__).resolve().parents[2]
    if (root / "pyproject.toml").exists() and (root / "derive").is_dir():
        return root / "generated"
    return None


def render_all(jobs: int | None = None, progress=None) -> dict[str, str]:
    """{relative path: text} of the whole committed set including the manifest."""
    work = committed_set()
    cores = os.cpu_count() or 1
    jobs = min(jobs or 2, cores)            # never more worker processes than cores
    results = []
    if jobs > 1 and len(work) > 1:
        # largest first so the two workers finish together
        order = sorted(range(len(work)), key=lambda i: -_weight(work[i]))
        with ProcessPoolExecutor(max_workers=jobs) as pool:
            futures = {i: pool.submit(_one, work[i]) for i in order}
            for k, i in enumerate(order):
                results.append((i, futures[i].result()))
                if progress:
                    progress(k + 1, len(work))
    else:
        for i, job in enumerate(work):
            results.append((i, _one(job)))
            if progress:
                progress(i + 1, len(work))
    results.sort()
    files: dict[str, str] = {}
    entries = []
    for _, sets in results:
        for lang, stem, sources, meta in sets:
            digests = {}
            h = hashlib.sha256()
            for path, text in sources:
                files[path] = text
                digests[path] = hashlib.sha256(text.encode()).hexdigest()
                h.update(path.encode() + b"\0" + text.encode() + b"\0")
            entries.append({
                "element": meta["element"], "variant": meta["variant"], "state": meta["state"], "lang": lang,
                "files": digests, "content_hash": h.hexdigest(),
                "functions": _functions(lang, stem),
                "rules": meta["rules"], "full_rule": meta["full_rule"], "nodes": meta["nodes"],
                "ndof": meta["ndof"], "n_internal": meta["n_internal"], "nstrain": meta["nstrain"],
                "recovery_points": meta["recovery_points"], "operation_count": meta["flops"],
                "inputs": meta["inputs"], "outputs": meta["outputs"],
                "description": meta["description"], "source": meta["source"],
            })
    entries.sort(key=lambda e: (e["element"], e["variant"], e["state"], e["lang"]))
    manifest = {
        "generator": owned_mod.GENERATOR, "generator_version": GENERATOR_VERSION,
        "policy": "numpy: every catalogue element, variant and state; c and fortran: every element and "
                  "variant in " + ", ".join(NATIVE_STATES),
        "regenerate": "derive kernel --all", "check": "derive kernel --check",
        "layout": {"xy": "(n, nodes, 2) float64, C order", "K": "(n, ndof, ndof) float64, C order, DOFs "
                   "interleaved u1, v1, u2, v2, ...", "fortran": "column-major xy(2, nodes, n), K(ndof, ndof, n) "
                   "(the same memory as the C layout)"},
        "kernels": entries,
    }
    files["README.md"] = _readme(entries)
    # every file derive writes here (the record that guides later replacements and clean-ups)
    manifest["files"] = {rel: owned_mod.digest(text) for rel, text in sorted(files.items())}
    files[MANIFEST] = json.dumps(manifest, indent=2, sort_keys=True) + "\n"
    return dict(sorted(files.items()))


def _weight(job) -> int:
    name, variant, state, langs = job
    info = catalog.ELEMENTS[name]
    return info.n_nodes * len(langs) * (2 if state == "axisymmetric" else 1)


def _functions(lang: str, stem: str) -> dict:
    if lang == "numpy":
        return {"stiffness": "stiffness(xy, E, nu, t, out=None)", "validity": "validity(xy)",
                "recovery": "recovery(xy, u, E, nu)"}
    suffix = "_f" if lang == "fortran" else ""
    p = f"derive_{stem}"
    return {"stiffness": f"{p}_stiffness{suffix}", "stiffness_batch": f"{p}_stiffness_batch{suffix}",
            "validity": f"{p}_validity{suffix}", "recovery": f"{p}_recovery{suffix}"}


def _readme(entries) -> str:
    lines = ["# Generated kernels (do not edit)", "",
             "Written by `derive kernel --all`; `derive kernel --check` fails when this folder differs from",
             "what the generator produces now.  `manifest.json` lists every kernel with its rule, operation",
             "count, inputs/outputs and layout, and a content hash.  One file per element, variant and",
             "state holds three kernels: stiffness, validity (min det J at the full rule's points) and",
             "recovery (strain and stress at the full rule's points).", "",
             "Policy: NumPy for every catalogue element, variant and state; C (source + header) and",
             "Fortran for every element and variant in " + ", ".join(NATIVE_STATES) + ".  Any other",
             "combination: `derive kernel ELEMENT --variant V --state S --lang c -o DIR`.", "",
             "| element | variant | state | languages | stiffness flops |", "|---|---|---|---|---|"]
    rows = {}
    for e in entries:
        key = (e["element"], e["variant"], e["state"])
        rows.setdefault(key, {"langs": [], "flops": e["operation_count"]["stiffness"]})["langs"].append(e["lang"])
    for (el, var, st), r in rows.items():
        lines.append(f"| {el} | {var} | {st} | {', '.join(r['langs'])} | {r['flops']} |")
    return "\n".join(lines) + "\n"


def write_all(dest: Path, files: dict[str, str], force: bool = False) -> dict:
    """Write the committed set into ``dest``, touching only derive's own files.

    The previous ``manifest.json`` (when it is derive's) says which files derive wrote: those
    are replaced, and those the new set no longer has are removed.  A file of the same name
    that derive did not write is refused (InputError, nothing written) unless ``force``.
    Nothing else in the folder changes, nor the folder's mode.  Returns what was done.
    """
    dest = Path(dest)
    if dest.exists() and not dest.is_dir():
        raise InputError(f"{dest}: is a file; -o takes a folder")
    owned, manifest_foreign = owned_mod.read_record(dest, MANIFEST)
    if (dest / MANIFEST).is_file() and not manifest_foreign:
        owned |= {MANIFEST, "README.md"}    # a derive manifest: the folder's README is derive's too
    clash = owned_mod.foreign(dest, files, owned)
    if clash and not force:
        owned_mod.refuse_foreign(dest, clash)
    stale = {rel for rel in owned if rel not in files}
    removed = owned_mod.remove_stale(dest, stale)
    # the manifest first: an interrupted write leaves only files some derive manifest lists
    order = [MANIFEST] + [rel for rel in files if rel != MANIFEST] if MANIFEST in files else list(files)
    written = owned_mod.write_files(dest, files, order)
    return {"written": len(written), "removed": removed, "replaced_foreign": clash if force else []}


def differences(dest: Path, files: dict[str, str]) -> list[str]:
    """Human-readable differences between ``dest`` and the expected files (empty: identical)."""
    dest = Path(dest)
    out = []
    present = set()
    if dest.exists():
        for p in sorted(dest.rglob("*")):
            if p.is_file():
                present.add(p.relative_to(dest).as_posix())
    for rel in sorted(set(files) | present):
        if rel not in present:
            out.append(f"missing: {rel}")
        elif rel not in files:
            out.append(f"not generated (stale): {rel}")
        else:
            data = (dest / rel).read_bytes()
            if data != files[rel].encode("utf-8"):
                out.append(f"differs: {rel}")
    return out
