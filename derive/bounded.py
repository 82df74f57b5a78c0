"""Run one piece of work under a CPU-time, wall-clock and memory limit.

Estimates made before heavy symbolic work (``derive.check_equality``) keep ordinary and
hostile input cheap; this is the hard safety net behind them.  On POSIX the work runs in a
forked child whose CPU time (``ITIMER_PROF``, backed by ``RLIMIT_CPU``) and address space
(``RLIMIT_AS``) are limited, and which the parent kills at the wall-clock limit; the result
comes back pickled through a pipe.  The limit being exceeded is an InputError (one line,
exit status 2 in the CLI).  Without ``fork`` (Windows) or when other Python threads run
(fork would copy their locks), the work runs in-process: MemoryError and RecursionError
still become InputErrors, but time is not limited.
"""
from __future__ import annotations

import math
import os
import pickle
import select
import signal
import sys
import threading
import time
from dataclasses import dataclass
from typing import Callable, TypeVar

from .errors import InputError

T = TypeVar("T")


@dataclass(frozen=True)
class Limits:
    """CPU seconds and extra address space (bytes) allowed; ``what`` and ``hint`` go into the message."""

    seconds: float = 5.0
    memory: int = 1 << 30
    what: str = "the work"
    hint: str = ""

    @property
    def wall_seconds(self) -> float:
        """Wall-clock limit: generous over the CPU limit, for a loaded machine."""
        return 3 * self.seconds + 5


class _OverTime(BaseException):
    """Raised in the child by the CPU timer; a BaseException so no ``except Exception`` eats it."""


def _time_message(lim: Limits, seconds: float) -> str:
    return f"{lim.what} took more than {seconds:g} s" + (f"; {lim.hint}" if lim.hint else "")


def _memory_message(lim: Limits) -> str:
    return f"{lim.what} needed more than {lim.memory / 2 ** 20:.0f} MB" + (f"; {lim.hint}" if lim.hint else "")


def _can_fork() -> bool:
    return hasattr(os, "fork") and sys.platform != "win32" and threading.active_count() == 1


def _address_space() -> int | None:
    try:
        with open("/proc/self/status") as fh:
            for line in fh:
                if line.startswith("VmSize:"):
                    return int(line.split()[1]) * 1024
    except OSError:
        return None
    return None


def run_bounded(func: Callable[[], T], lim: Limits) -> tuple[T, float]:
    """``(func(), cpu_seconds_used)`` within ``lim``; InputError when a limit is exceeded."""
    if not _can_fork():
        start = time.process_time()
        try:
            return func(), time.process_time() - start
        except MemoryError:
            raise InputError(_memory_message(lim)) from None
        except RecursionError:
            raise InputError(f"{lim.what}: an expression is nested too deeply") from None
    read_fd, write_fd = os.pipe()
    pid = os.fork()
    if pid == 0:  # child
        os.close(read_fd)
        _child(func, lim, write_fd)
    os.close(write_fd)
    return _parent(pid, read_fd, lim)


def _lower(which: int, soft: int) -> None:
    """Lower a soft resource limit (never above the hard limit an outer shell may have set)."""
    import resource
    cur_soft, hard = resource.getrlimit(which)
    if hard != resource.RLIM_INFINITY:
        soft = min(soft, hard)
    if cur_soft != resource.RLIM_INFINITY:
        soft = min(soft, cur_soft)
    resource.setrlimit(which, (soft, hard))


def _child(func, lim: Limits, write_fd: int) -> None:
    code = 1
    try:
        import resource
        _lower(resource.RLIMIT_CPU, max(1, math.ceil(lim.seconds)) + 2)
        used = _address_space()
        if used is not None:
            _lower(resource.RLIMIT_AS, used + lim.memory)

        def over(signum, frame):
            raise _OverTime()
        signal.signal(signal.SIGPROF, over)
        signal.setitimer(signal.ITIMER_PROF, lim.seconds)
        try:
            value = func()
            signal.setitimer(signal.ITIMER_PROF, 0)
            ru = resource.getrusage(resource.RUSAGE_SELF)
            payload = ("ok", value, ru.ru_utime + ru.ru_stime)
        except _OverTime:
            payload = ("time",)
        except MemoryError:
            payload = ("memory",)
        except RecursionError:
            payload = ("input", f"{lim.what}: an expression is nested too deeply")
        except InputError as exc:
            payload = ("input", str(exc))
        except Exception as exc:  # reported by the parent as an internal error
            payload = ("error", f"{type(exc).__name__}: {exc}")
        signal.setitimer(signal.ITIMER_PROF, 0)
        try:
            data = pickle.dumps(payload)
        except Exception as exc:
            data = pickle.dumps(("error", f"result not transferable: {type(exc).__name__}"))
        view = memoryview(data)
        while view:
            n = os.write(write_fd, view)
            view = view[n:]
        code = 0
    except BaseException:
        code = 1
    finally:
        os._exit(code)


def _parent(pid: int, read_fd: int, lim: Limits):
    chunks = []
    deadline = time.monotonic() + lim.wall_seconds
    done = False
    try:
        while True:
            remaining = deadline - time.monotonic()
            if remaining <= 0:
                raise InputError(_time_message(lim, lim.wall_seconds) + " (wall clock)")
            ready, _, _ = select.select([read_fd], [], [], remaining)
            if ready:
                chunk = os.read(read_fd, 1 << 16)
                if not chunk:
                    break
                chunks.append(chunk)
        _, status = os.waitpid(pid, 0)
        done = True
    finally:
        os.close(read_fd)
        if not done:
            try:
                os.kill(pid, signal.SIGKILL)
                os.waitpid(pid, 0)
            except (ProcessLookupError, ChildProcessError):
                pass
    if os.WIFSIGNALED(status):
        sig = os.WTERMSIG(status)
        if sig in (signal.SIGXCPU, signal.SIGKILL):
            raise InputError(_time_message(lim, lim.seconds))
        raise RuntimeError(f"{lim.what} stopped by signal {sig}")
    if not chunks:  # died before reporting (e.g. out of memory while sending the result)
        raise InputError(f"{lim.what} stopped without a result (exit status {os.WEXITSTATUS(status)}); "
                         "it may have run out of memory" + (f"; {lim.hint}" if lim.hint else ""))
    payload = pickle.loads(b"".join(chunks))
    kind = payload[0]
    if kind == "ok":
        return payload[1], payload[2]
    if kind == "time":
        raise InputError(_time_message(lim, lim.seconds))
    if kind == "memory":
        raise InputError(_memory_message(lim))
    if kind == "input":
        raise InputError(payload[1])
    raise RuntimeError(payload[1])
