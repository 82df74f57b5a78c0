"""Plain displacement formulations: ``full`` and uniform ``reduced`` integration.

K = int B^T D B t dA, integrated with the element's full rule or its reduced rule
(the rules of each element are in the catalogue).
"""
from __future__ import annotations

from .base import B_op, D_op, Formulation, Term


def full(info, state: str) -> Formulation:
    return Formulation(
        variant="full",
        terms=(Term("uu", B_op, D_op, B_op, rule="full", symmetric=True, label="B^T D B"),),
        description="displacement element, full integration",
        source="standard displacement formulation",
    )


def reduced(info, state: str) -> Formulation:
    return Formulation(
        variant="reduced",
        terms=(Term("uu", B_op, D_op, B_op, rule="reduced", symmetric=True, label="B^T D B"),),
        description="displacement element, uniformly reduced integration",
        source="standard displacement formulation",
    )
