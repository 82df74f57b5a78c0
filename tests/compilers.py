"""One rule for tests that need gcc or gfortran.

On a user's machine a missing compiler skips the test with the reason (shown in the run's
summary through ``-rfEs`` in pyproject's addopts).  Under CI (the ``CI`` environment variable
set to anything but ``""``, ``0`` or ``false``, as .ci/run and the common CI services do) a
missing compiler fails the test: the generated native kernels would otherwise go unproven
while the run reports green.
"""
from __future__ import annotations

import os

import pytest

from derive.codegen import loader

NEED = {"c": "gcc (Debian package gcc)", "fortran": "gfortran (Debian package gfortran)"}
HAVE = {lang: loader.find_compiler(lang) is not None for lang in NEED}


def under_ci() -> bool:
    return os.environ.get("CI", "").strip().lower() not in ("", "0", "false", "no")


def need(lang: str) -> None:
    """Return when ``lang`` (numpy, c or fortran) can run here; otherwise skip, or fail under CI."""
    if lang == "numpy" or HAVE[lang]:
        return
    reason = f"no {lang} compiler on this machine; install {NEED[lang]}"
    if under_ci():
        pytest.fail(f"{reason} (CI is set: a missing compiler fails the run instead of skipping)", pytrace=False)
    pytest.skip(reason)
