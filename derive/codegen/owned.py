"""Writing the committed kernel set into a folder without touching anything derive did not write.

The set's ``manifest.json`` records every file derive wrote into the folder (its ``files``
and each kernel's ``files``).  It decides what ``derive kernel --all -o DIR`` may replace or
clean up (single kernels, ``derive kernel E -o DIR``, follow the common folder rule of
:class:`derive.output.OutputFolder`):

* a file derive wants to write is replaced when the record lists it, when its content is
  already exactly what derive would write, or with ``force``; otherwise the whole write is
  refused (exit 2) before any file is touched;
* clean-ups remove only files the previous record lists and the new set no longer has;
* nothing else in the folder is read, removed or changed, and the folder's own mode stays.
"""
from __future__ import annotations

import hashlib
import json
from pathlib import Path

from ..errors import InputError
from ..output import write_atomic

GENERATOR = "derive.codegen"


def digest(text: str) -> str:
    return hashlib.sha256(text.encode("utf-8")).hexdigest()


def read_record(dest: Path, name: str) -> tuple[set[str], bool]:
    """(files the record in ``dest`` lists, whether a record file exists but is not derive's)."""
    p = Path(dest) / name
    if not p.is_file():
        return set(), p.exists()
    try:
        data = json.loads(p.read_text(encoding="utf-8"))
    except (OSError, UnicodeDecodeError, ValueError):
        return set(), True
    if not isinstance(data, dict) or data.get("generator") != GENERATOR:
        return set(), True
    owned = set()
    files = data.get("files")
    if isinstance(files, dict):
        owned |= {str(k) for k in files}
    for entry in data.get("kernels", []) if isinstance(data.get("kernels"), list) else []:
        if isinstance(entry, dict) and isinstance(entry.get("files"), dict):
            owned |= {str(k) for k in entry["files"]}
    return owned, False


def _same(path: Path, text: str) -> bool:
    try:
        return path.read_bytes() == text.encode("utf-8")
    except OSError:
        return False


def foreign(dest: Path, files: dict[str, str], owned: set[str]) -> list[str]:
    """Relative paths among ``files`` that exist in ``dest``, are not in ``owned`` and differ."""
    out = []
    for rel, text in files.items():
        p = Path(dest) / rel
        if rel in owned or not (p.exists() or p.is_symlink()):
            continue
        if p.is_file() and not p.is_symlink() and _same(p, text):
            continue
        out.append(rel)
    return out


def refuse_foreign(dest: Path, names: list[str]) -> None:
    if names:
        shown = ", ".join(names[:5]) + (f" and {len(names) - 5} more" if len(names) > 5 else "")
        raise InputError(f"{dest}: {len(names)} file(s) of the same name exist that derive did not write ({shown}); "
                         "nothing was written; give --force to replace them, or choose another folder")


def write_files(dest: Path, files: dict[str, str], order: list[str] | None = None) -> list[Path]:
    """Write ``files`` (relative path -> text) atomically one by one; OSError as InputError."""
    written = []
    for rel in order or list(files):
        target = Path(dest) / rel
        try:
            if target.is_symlink():        # replace the link itself, never write through it
                target.unlink()
            written.append(write_atomic(target, files[rel], make_folder=True))
        except IsADirectoryError:
            raise InputError(f"{target}: is a folder; derive needs to write a file there") from None
        except OSError as exc:
            raise InputError(f"{target}: cannot write ({exc.strerror or exc})") from None
    return written


def remove_stale(dest: Path, stale: set[str]) -> list[str]:
    """Remove files derive wrote earlier (listed in its old record) that the new set lacks."""
    removed = []
    for rel in sorted(stale):
        p = Path(dest) / rel
        if p.is_file() or p.is_symlink():
            try:
                p.unlink()
                removed.append(rel)
            except OSError:
                pass
    return removed
