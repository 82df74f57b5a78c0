"""The per-user cache of compiled kernels: where it is, who may own it, and whether a cached
library is intact.

A shared library is native code that runs on load, so the cache is only used when nobody
else can write into it:

* folders derive creates are 0700 and files 0600, whatever the umask;
* a cache folder or library not owned by the current user, or writable by group or others,
  is refused (:class:`CacheUnusable`; the loader falls back to the NumPy kernel and says so);
* every library has a sha256 recorded beside it at build time (``<lib>.sha256``) and is
  verified before it is loaded: a truncated or overwritten library is rebuilt (and the
  loader says so) instead of crashing the interpreter with SIGBUS or a raw OSError;
* builds hold an exclusive lock on the folder (``.lock``), so concurrent processes neither
  build twice nor see a half-written library.
"""
from __future__ import annotations

import contextlib
import hashlib
import os
import stat
import tempfile
from pathlib import Path

try:  # POSIX only; elsewhere builds rely on the atomic rename alone
    import fcntl
except ImportError:  # pragma: no cover
    fcntl = None

#: permission bits that let someone other than the owner change a folder or file
UNSAFE_BITS = stat.S_IWGRP | stat.S_IWOTH


class CacheUnusable(Exception):
    """The cache folder or a cached library cannot be used safely (message: one line, why)."""


def cache_dir() -> Path:
    """Per-user cache folder for compiled kernels (never inside the repository)."""
    env = os.environ.get("DERIVE_CACHE_DIR")
    if env:
        base = Path(env)
    else:
        xdg = os.environ.get("XDG_CACHE_HOME")
        base = (Path(xdg) if xdg else Path.home() / ".cache") / "derive"
    return base / "kernels"


def _uid() -> int | None:
    return os.getuid() if hasattr(os, "getuid") else None


def check_private(path: Path, what: str) -> os.stat_result:
    """Refuse ``path`` unless it is owned by the current user and not writable by group/others."""
    try:
        st = os.stat(path)
    except OSError as exc:
        raise CacheUnusable(f"{what} {path} cannot be read ({exc.strerror or exc})") from None
    uid = _uid()
    if uid is not None and st.st_uid != uid:
        raise CacheUnusable(f"{what} {path} belongs to another user (uid {st.st_uid}); derive loads native code "
                            "only from a cache folder of your own (set DERIVE_CACHE_DIR)")
    if uid is not None and st.st_mode & UNSAFE_BITS:
        raise CacheUnusable(f"{what} {path} is writable by group or others (mode {stat.S_IMODE(st.st_mode):04o}); "
                            "derive loads native code only from a private cache (chmod 700, or set DERIVE_CACHE_DIR)")
    return st


def private_folder(folder: Path | None = None) -> Path:
    """The cache folder, created 0700 level by level where missing, and checked."""
    folder = Path(folder) if folder is not None else cache_dir()
    missing = []
    p = folder
    while not p.exists() and p != p.parent:
        missing.append(p)
        p = p.parent
    for d in reversed(missing):
        try:
            d.mkdir(mode=0o700)
            os.chmod(d, 0o700)       # mkdir's mode is filtered by the umask
        except FileExistsError:
            pass
        except OSError as exc:
            raise CacheUnusable(f"cache folder {d} cannot be created ({exc.strerror or exc})") from None
    if not folder.is_dir():
        raise CacheUnusable(f"cache folder {folder} is not a folder")
    check_private(folder, "cache folder")
    return folder


def digest_file(path: Path) -> str:
    h = hashlib.sha256()
    with open(path, "rb") as fh:
        for block in iter(lambda: fh.read(1 << 20), b""):
            h.update(block)
    return h.hexdigest()


def checksum_path(lib: Path) -> Path:
    return lib.with_name(lib.name + ".sha256")


def verify(lib: Path) -> str | None:
    """None when ``lib`` is intact and private; otherwise why it must be rebuilt.

    Raises :class:`CacheUnusable` for a library another user could have written.
    """
    if not lib.exists() and not lib.is_symlink():
        return "missing"
    if lib.is_symlink() or not lib.is_file():
        raise CacheUnusable(f"cached library {lib} is not a regular file")
    check_private(lib, "cached library")
    try:
        want = checksum_path(lib).read_text(encoding="ascii").strip()
    except (OSError, UnicodeDecodeError):
        return "no checksum recorded"
    try:
        have = digest_file(lib)
    except OSError as exc:
        return f"unreadable ({exc.strerror or exc})"
    return None if have == want else "checksum mismatch"


def install(built: Path, lib: Path) -> None:
    """Move a freshly built library into place (0600) with its checksum recorded beside it."""
    os.chmod(built, 0o600)
    fd, tmp = tempfile.mkstemp(prefix=".sum-", dir=str(lib.parent))   # mkstemp: 0600
    with os.fdopen(fd, "w", encoding="ascii") as fh:
        fh.write(digest_file(built) + "\n")
    os.replace(tmp, checksum_path(lib))
    os.replace(built, lib)


def discard(lib: Path) -> None:
    for p in (lib, checksum_path(lib)):
        with contextlib.suppress(OSError):
            p.unlink()


@contextlib.contextmanager
def locked(folder: Path):
    """Exclusive lock on the cache folder while a library is checked or built."""
    if fcntl is None:  # pragma: no cover
        yield
        return
    lock = folder / ".lock"
    try:
        fd = os.open(lock, os.O_RDWR | os.O_CREAT, 0o600)
    except OSError:
        yield                        # a read-only cache: nothing can be built, reading needs no lock
        return
    try:
        fcntl.flock(fd, fcntl.LOCK_EX)
        yield
    finally:
        os.close(fd)
