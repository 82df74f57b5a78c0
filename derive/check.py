"""Compare a user's matrix (hand derivation or their code's numbers) with derive's, and
diagnose the usual mistakes.

Equality is decided, entry by entry, by exact cancellation of the difference; where
cancellation is inconclusive (radicals, elementary functions) by evaluation at many exact
rational points, and a point where the two differ is reported as the counterexample.
Numeric input is compared with a tolerance relative to the expected matrix's norm.

When the matrices differ, each diagnosis below is tried by applying that one mistake to
derive's matrix and asking whether the result equals the user's exactly (numeric input:
within the tolerance).  Only mistakes that explain the whole difference are reported; the
more specific one wins where two coincide (``sign`` over ``scale -1``, ``thickness`` over
``scale t``).

  node-order        the user's nodes are a permutation of derive's (different start node,
                    opposite orientation, or any renumbering): reports the permutation
  transposed        the user's matrix is derive's transposed
  thickness         t missing (K / t) or applied twice (K t)
  shear-convention  the shear term scaled: tensor instead of engineering shear strain
                    (shear part x 1/4), (1 - nu) for (1 - nu)/2 (x 2), or both (x 1/2)
  plane-state       plane stress and plane strain swapped
  sign              the whole matrix negated
  scale             a constant factor, which it states
  quadrature        matches the element integrated with another rule, which it names
  dof-order         DOFs blocked u1..un, v1..vn instead of interleaved u1, v1, ...
"""
from __future__ import annotations

import dataclasses
import itertools
import random
from dataclasses import dataclass, field

import numpy as np
import sympy as sp

from . import quadrature
from .element import Element, element
from .errors import InputError
from .formulations.base import D_op, Formulation

CODES = ("node-order", "transposed", "thickness", "shear-convention", "plane-state", "sign", "scale",
         "quadrature", "dof-order")
N_RANDOM_POINTS = 12


@dataclass
class CheckResult:
    match: bool
    mismatched: list[tuple[int, int]]
    diagnosis: list[dict] = field(default_factory=list)
    counterexample: dict | None = None
    compared: int = 0
    method: str = "exact"
    details: list[dict] = field(default_factory=list)

    @property
    def codes(self) -> list[str]:
        return [d["code"] for d in self.diagnosis]


# ---------------------------------------------------------------------------------------------
# equality

def _sample_value(sym: sp.Symbol, rnd: random.Random) -> sp.Rational:
    name = sym.name
    if name == "nu":
        return sp.Rational(rnd.randint(1, 45), 97)
    if name in ("E", "t", "a", "b", "R"):
        return sp.Rational(rnd.randint(50, 400), rnd.randint(20, 60))
    return sp.Rational(rnd.randint(-300, 300), rnd.randint(50, 120))


def _points(symbols, n: int, seed: int = 20261201):
    rnd = random.Random(seed)
    syms = sorted(symbols, key=lambda s: s.name)
    return [{s: _sample_value(s, rnd) for s in syms} for _ in range(n)]


def equal_exact(expected: sp.Expr, given: sp.Expr) -> tuple[bool | None, dict | None]:
    """(True, None) equal; (False, point) different with a counterexample; None if undecided."""
    diff = sp.expand(expected - given) if not (expected.free_symbols or given.free_symbols) else expected - given
    try:
        d = sp.cancel(sp.together(diff))
    except Exception:  # cancel refuses some function-heavy input; fall back to evaluation
        d = diff
    if d == 0:
        return True, None
    rational = d.is_rational_function(*d.free_symbols) if d.free_symbols else d.is_Rational
    for pt in _points(d.free_symbols, N_RANDOM_POINTS):
        try:
            v = d.subs(pt)
            v = sp.nsimplify(v) if not v.is_Rational else v
        except Exception:
            continue
        if v.is_number and v.is_finite and v != 0 and abs(complex(v.evalf(30))) > 1e-25:
            return False, {k.name: str(val) for k, val in pt.items()}
    if rational:
        return False, None
    return True, None  # all random exact points agree: equal with high probability


def _entries_of(M) -> dict:
    if isinstance(M, dict):
        return M
    return {(i, j): M[i, j] for i in range(M.rows) for j in range(M.cols)}


def compare_symbolic(expected: sp.Matrix, given) -> CheckResult:
    """Entry-wise exact comparison; ``given`` is a Matrix or a dict {(i, j): expr}."""
    entries = _entries_of(given)
    if not isinstance(given, dict) and given.shape != expected.shape:
        if given.shape == expected.T.shape:  # a transposed matrix: every entry differs; diagnosis follows
            return CheckResult(match=False, mismatched=[], compared=len(entries), method="shape differs")
        raise InputError(f"the given matrix is {given.rows} x {given.cols}; expected {expected.rows} x {expected.cols}")
    mismatched, counter = [], None
    for (i, j), g in sorted(entries.items()):
        if not (0 <= i < expected.rows and 0 <= j < expected.cols):
            raise InputError(f"entry [{i},{j}] is outside the {expected.rows} x {expected.cols} matrix (0-based)")
        ok, pt = equal_exact(sp.sympify(expected[i, j]), g)
        if not ok:
            mismatched.append((i, j))
            if counter is None and pt is not None:
                counter = {"entry": [i, j], "point": pt}
    return CheckResult(match=not mismatched, mismatched=mismatched, counterexample=counter, compared=len(entries))


def compare_numeric(expected: np.ndarray, given: np.ndarray, rtol: float) -> CheckResult:
    expected = np.asarray(expected, dtype=float)
    given = np.asarray(given, dtype=float)
    if given.shape != expected.shape:
        if given.shape == expected.T.shape:
            return CheckResult(match=False, mismatched=[], compared=given.size, method="shape differs")
        raise InputError(f"the given matrix is {given.shape[0]} x {given.shape[1]}; expected "
                         f"{expected.shape[0]} x {expected.shape[1]}")
    scale = max(np.linalg.norm(expected), 1e-300)
    bad = np.argwhere(np.abs(given - expected) > rtol * scale)
    return CheckResult(match=len(bad) == 0, mismatched=[(int(i), int(j)) for i, j in bad], compared=given.size,
                       method=f"numeric, tolerance {rtol:g} x ||expected||")


# ---------------------------------------------------------------------------------------------
# recomputation with one mistake

def _with_middle(form: Formulation, transform) -> Formulation:
    """The formulation with every D-middle term's material matrix transformed."""
    terms = []
    for term in form.terms:
        if term.middle is D_op:
            terms.append(dataclasses.replace(term, middle=lambda p, _f=transform: _f(p.D)))
        else:
            terms.append(term)
    return dataclasses.replace(form, terms=tuple(terms))


def _with_rule(form: Formulation, rule: str) -> Formulation:
    return dataclasses.replace(form, terms=tuple(dataclasses.replace(t, rule=rule) for t in form.terms))


def _stiffness(el: Element, form: Formulation, geometry, material: dict) -> sp.Matrix:
    return el.stiffness(geometry, E=material["E"], nu=material["nu"], t=material["t"], formulation=form)


def _shear_scaled(D: sp.Matrix, s) -> sp.Matrix:
    D2 = D.copy()
    k = D.rows - 1  # the shear row is last in every Voigt order used here
    D2[k, k] = D[k, k] * s
    return D2


@dataclass
class Target:
    """What the user's matrix should be: element, variant, state, geometry, material, what."""

    el: Element
    geometry: object
    material: dict
    what: str = "stiffness"

    def expected(self) -> sp.Matrix:
        if self.what == "shape":
            return sp.Matrix([list(self.el.shape_functions)])
        if self.what == "B":
            return self.el.B(self.geometry)
        return self.el.stiffness(self.geometry, E=self.material["E"], nu=self.material["nu"], t=self.material["t"])

    def _mat(self) -> dict:
        m = self.material
        return self.el.material(m["E"], m["nu"], m["t"])

    def candidates(self, K: sp.Matrix):
        """(code, detail, matrix) for each single mistake applied to the expected K."""
        out = []
        n = K.rows
        t_val = self._mat()["t"]
        if self.what == "stiffness":
            out.append(("thickness", "t missing (K / t)", K / t_val))
            out.append(("thickness", "t applied twice (K t)", K * t_val))
            form = self.el.formulation
            for s, why in ((sp.Rational(1, 4), "tensor shear strain eps_xy used instead of engineering gamma_xy"),
                           (2, "(1 - nu) written for (1 - nu)/2 in the shear term of D"),
                           (sp.Rational(1, 2), "tensor shear strain and (1 - nu) for (1 - nu)/2 together")):
                f2 = _with_middle(form, lambda D, _s=s: _shear_scaled(D, _s))
                out.append(("shear-convention", why, lambda f2=f2: _stiffness(self.el, f2, self.geometry, self._mat())))
            if self.el.state in ("plane-stress", "plane-strain"):
                other = "plane-strain" if self.el.state == "plane-stress" else "plane-stress"
                el2 = Element(self.el.info, self.el.variant, other, self.el.shapes)
                out.append(("plane-state", f"{other} used instead of {self.el.state}",
                            lambda el2=el2: el2.stiffness(self.geometry, E=self.material["E"], nu=self.material["nu"],
                                                          t=self.material["t"])))
            own = {self.el.info.rule_name(t.rule) for t in form.terms}
            for rname in _alternative_rules(self.el.info.domain):
                if rname in own:
                    continue
                f3 = _with_rule(form, rname)
                out.append(("quadrature", f"integrated with {rname} instead of {', '.join(sorted(own))}",
                            lambda f3=f3: _stiffness(self.el, f3, self.geometry, self._mat())))
        out.append(("sign", "the whole matrix has the opposite sign", -K))
        if n % 2 == 0 and self.what != "shape":
            perm = [2 * i for i in range(n // 2)] + [2 * i + 1 for i in range(n // 2)]
            if K.cols == n:
                out.append(("dof-order", "DOFs blocked u1..un, v1..vn instead of interleaved u1, v1, ...",
                            K.extract(perm, perm)))
            else:
                out.append(("dof-order", "columns blocked u1..un, v1..vn instead of interleaved",
                            K.extract(list(range(K.rows)), [2 * i for i in range(K.cols // 2)] +
                                      [2 * i + 1 for i in range(K.cols // 2)])))
        return out


def _alternative_rules(domain: str) -> list[str]:
    if domain == "square":
        return [f"gauss-{n}x{n}" for n in (1, 2, 3, 4)]
    return [f"triangle-d{d}" for d in quadrature.TRIANGLE_DEGREES] if hasattr(quadrature, "TRIANGLE_DEGREES") \
        else [f"triangle-d{d}" for d in (1, 2, 3, 4, 5)]


# ---------------------------------------------------------------------------------------------
# the checker

def _as_numeric(M: sp.Matrix) -> np.ndarray | None:
    if M.free_symbols:
        return None
    return np.array(M.evalf(20).tolist(), dtype=float)


def _matches(candidate, given, numeric_given: np.ndarray | None, rtol: float, entries_only: dict | None) -> bool:
    if callable(candidate):
        try:
            candidate = candidate()
        except InputError:
            return False
    if numeric_given is not None:
        A = _as_numeric(candidate)
        if A is None or A.shape != numeric_given.shape:
            return False
        return np.abs(A - numeric_given).max() <= rtol * max(np.linalg.norm(A), 1e-300)
    if entries_only is not None:
        return all(0 <= i < candidate.rows and 0 <= j < candidate.cols and equal_exact(candidate[i, j], g)[0]
                   for (i, j), g in entries_only.items())
    if candidate.shape != given.shape:
        return False
    return all(equal_exact(candidate[i, j], given[i, j])[0] for i in range(given.rows) for j in range(given.cols))


def _scale_factor(K: sp.Matrix, given, numeric_given, entries) -> sp.Expr | None:
    """The constant c with given = c K, if one exists (c free of the coordinates xi, eta)."""

    if numeric_given is not None:
        A = _as_numeric(K)
        if A is None or A.shape != numeric_given.shape:
            return None
        mask = np.abs(A) > 1e-12 * np.abs(A).max()
        if not mask.any():
            return None
        ratios = numeric_given[mask] / A[mask]
        c = float(np.median(ratios))
        if np.allclose(numeric_given, c * A, rtol=0, atol=1e-9 * np.abs(numeric_given).max()) and abs(c - 1) > 1e-9:
            return sp.nsimplify(c, rational=False, tolerance=1e-10)
        return None
    items = entries.items() if entries is not None else ((ij, given[ij]) for ij in itertools.product(range(K.rows), range(K.cols)))
    c = None
    for (i, j), g in items:
        if K[i, j] == 0:
            if sp.cancel(g) != 0:
                return None
            continue
        ratio = sp.cancel(g / K[i, j])
        if c is None:
            c = ratio
        elif sp.cancel(ratio - c) != 0:
            return None
    if c is None or c == 1 or (c.free_symbols & {sp.Symbol("xi"), sp.Symbol("eta")}):
        return None
    return c


def node_permutation(K: np.ndarray, G: np.ndarray, rtol: float) -> list[int] | None:
    """Node permutation p with G[block i, block j] = K[block p[i], block p[j]], by backtracking.

    2 DOFs per node.  Returns None if no permutation (other than the identity) matches.
    """
    n = K.shape[0] // 2
    tol = rtol * max(np.abs(K).max(), 1e-300)

    def block(M, i, j):
        return M[2 * i:2 * i + 2, 2 * j:2 * j + 2]

    perm: list[int] = []
    used = [False] * n

    def extend(i: int) -> bool:
        if i == n:
            return True
        for cand in range(n):
            if used[cand]:
                continue
            if np.abs(block(G, i, i) - block(K, cand, cand)).max() > tol:
                continue
            if any(np.abs(block(G, i, k) - block(K, cand, perm[k])).max() > tol for k in range(i)):
                continue
            used[cand] = True
            perm.append(cand)
            if extend(i + 1):
                return True
            perm.pop()
            used[cand] = False
        return False

    if extend(0) and perm != list(range(n)):
        return perm
    return None


def column_group_permutation(K: np.ndarray | None, G: np.ndarray | None, size: int) -> list[int] | None:
    """Permutation p with G's column group i equal to K's column group p[i] (groups of
    ``size`` columns: 1 per node for shape functions, 2 per node for B); None if none or identity."""
    if K is None or G is None or K.shape != G.shape or K.shape[1] % size:
        return None
    n = K.shape[1] // size
    tol = 1e-9 * max(np.abs(K).max(), 1e-300)
    perm, used = [], set()
    for i in range(n):
        gi = G[:, size * i:size * i + size]
        hit = next((j for j in range(n) if j not in used
                    and np.abs(gi - K[:, size * j:size * j + size]).max() <= tol), None)
        if hit is None:
            return None
        used.add(hit)
        perm.append(hit)
    return None if perm == list(range(n)) else perm


def _probe_numeric(M: sp.Matrix, seed: int = 7) -> np.ndarray:
    pt = _points(M.free_symbols, 1, seed)[0]
    return np.array(M.subs(pt).evalf(20).tolist(), dtype=float)


def check(target: Target, given=None, given_numeric: np.ndarray | None = None, rtol: float = 1e-8) -> CheckResult:
    """Compare and, on mismatch, diagnose.  ``given``: Matrix or {(i, j): expr}; or numeric array."""
    K = target.expected()
    entries = given if isinstance(given, dict) else None
    if given_numeric is not None:
        A = _as_numeric(K)
        if A is None:
            names = ", ".join(sorted(s.name for s in K.free_symbols))
            raise InputError(f"a numeric matrix needs numeric geometry and material: {names} still symbolic "
                             "(give --nodes and --set E=...,nu=...,t=...)")
        result = compare_numeric(A, given_numeric, rtol)
    else:
        result = compare_symbolic(K, given)
    if result.match:
        return result
    found = []
    # node order (full matrices only)
    if entries is None and K.rows == K.cols and K.rows % 2 == 0 and target.what == "stiffness":
        Kp = _as_numeric(K) if given_numeric is not None else _probe_numeric(K)
        Gp = given_numeric if given_numeric is not None else _probe_numeric_given(given, K)
        if Gp is not None:
            perm = node_permutation(Kp, Gp, max(rtol, 1e-9))
            if perm is not None:
                idx = [2 * p + k for p in perm for k in (0, 1)]
                if _matches(K.extract(idx, idx), given, given_numeric, rtol, entries):
                    found.append({"code": "node-order", "explanation":
                                  "your node i is derive's node perm[i] (1-based: " +
                                  ", ".join(f"{i + 1}->{p + 1}" for i, p in enumerate(perm)) + ")",
                                  "permutation": [p + 1 for p in perm]})
    elif entries is None and given_numeric is None and target.what in ("shape", "B") and given.shape == K.shape:
        size = 1 if target.what == "shape" else 2
        perm = column_group_permutation(_probe_numeric(K), _probe_numeric_given(given, K), size)
        if perm is not None:
            cols = [size * p + k for p in perm for k in range(size)]
            if _matches(K.extract(list(range(K.rows)), cols), given, None, rtol, None):
                found.append({"code": "node-order", "explanation":
                              "your node i is derive's node perm[i] (1-based: " +
                              ", ".join(f"{i + 1}->{p + 1}" for i, p in enumerate(perm)) + ")",
                              "permutation": [p + 1 for p in perm]})
    if K.rows != K.cols or target.what != "stiffness":
        KT = K.T
        if given_numeric is not None:
            ok = KT.shape == given_numeric.shape and _matches(KT, None, given_numeric, rtol, None)
        elif entries is None:
            ok = KT.shape == given.shape and _matches(KT, given, None, rtol, None)
        else:
            ok = False
        if ok:
            found.append({"code": "transposed", "explanation": "your matrix is derive's transposed"})
    elif given_numeric is None and entries is None and given.shape == K.shape and K != K.T:
        if _matches(K.T, given, None, rtol, None):
            found.append({"code": "transposed", "explanation": "your matrix is derive's transposed"})
    for code, why, cand in target.candidates(K):
        if any(f["code"] == code for f in found):
            continue
        if _matches(cand, given, given_numeric, rtol, entries):
            found.append({"code": code, "explanation": why})
    if not any(f["code"] in ("sign", "thickness") for f in found):
        c = _scale_factor(K, given, given_numeric, entries)
        t_val = target._mat()["t"]
        if c is not None and c != -1 and sp.cancel(c - t_val) != 0 and sp.cancel(c - 1 / t_val) != 0:
            found.append({"code": "scale", "explanation": f"your matrix is {c} times derive's", "factor": str(c)})
    result.diagnosis = found
    return result


def _probe_numeric_given(given, K) -> np.ndarray | None:
    if not isinstance(given, sp.MatrixBase) or given.shape != K.shape:
        return None
    pt = _points(K.free_symbols | given.free_symbols, 1, 7)[0]
    try:
        return np.array(given.subs(pt).evalf(20).tolist(), dtype=float)
    except (TypeError, ValueError):
        return None


def demo_section(outdir) -> dict:
    """Demo: the in-house solver's Q4 matrix for one beam element, checked and diagnosed.

    The (invented) solver routine under audit builds D with (1 - nu) where (1 - nu)/2
    belongs; derive finds the mismatch and names the mistake.  Written to the demo folder
    as the solver's CSV and derive's report.
    """
    from pathlib import Path

    from .output import CAUTION, emit_json, write_atomic
    outdir = Path(outdir)
    nodes = [[0, 0], [sp.Rational(3, 5), 0], [sp.Rational(3, 5), sp.Rational(3, 10)], [0, sp.Rational(3, 10)]]
    mat = {"E": sp.Integer(32 * 10 ** 9), "nu": sp.Rational(1, 5), "t": sp.Rational(2, 5)}
    el = element("Q4")
    good = Target(el, nodes, mat)
    K = np.array(good.expected().evalf().tolist(), dtype=float)
    wrong = _stiffness(el, _with_middle(el.formulation, lambda D: _shear_scaled(D, 2)), nodes, good._mat())
    Kw = np.array(wrong.evalf().tolist(), dtype=float)
    buf_ok = "\n".join(",".join(f"{v:.17g}" for v in row) for row in K) + "\n"
    buf_bad = "\n".join(",".join(f"{v:.17g}" for v in row) for row in Kw) + "\n"
    write_atomic(outdir / "solver-q4-fixed.csv", buf_ok)
    write_atomic(outdir / "solver-q4-as-found.csv", buf_bad)
    res_bad = check(good, given_numeric=Kw)
    res_ok = check(good, given_numeric=K)
    report = {"as_found": {"match": res_bad.match, "mismatched": len(res_bad.mismatched),
                           "diagnosis": res_bad.diagnosis},
              "fixed": {"match": res_ok.match}, "caution": CAUTION}
    write_atomic(outdir / "solver-check.json", emit_json(report) + "\n")
    lines = [f"in-house solver Q4 (0.6 m x 0.3 m element), as found: match {res_bad.match}, "
             f"{len(res_bad.mismatched)} of 64 entries differ; diagnosis: "
             + "; ".join(f"{d['code']} ({d['explanation']})" for d in res_bad.diagnosis),
             f"after the fix: match {res_ok.match}",
             "reproduce: derive check solver-q4-as-found.csv --element Q4 --nodes \"0,0 0.6,0 0.6,0.3 0,0.3\" "
             "--set E=32e9,nu=0.2,t=0.4"]
    return {"title": "Auditing the solver's element matrix", "lines": lines,
            "files": ["solver-q4-as-found.csv", "solver-q4-fixed.csv", "solver-check.json"]}
