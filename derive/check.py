"""Compare a user's matrix (hand derivation or their code's numbers) with derive's, and
diagnose the usual mistakes.

Equality is decided entry by entry (derive.check_equality): both entries are evaluated
exactly at the same random rational points (a point where they differ is the
counterexample), and where they agree everywhere, equality is proven by expanding the
cross difference when its estimated size allows; larger entries are reported equal at the
points (the method says how many).  Sizes are estimated from the expression tree before
any algebra, so a short input that would expand to millions of terms costs no more than
its evaluation; the work driven by the user's entries runs under a CPU-time and memory
limit (derive.bounded).  Numeric input is compared with a tolerance relative to the
expected matrix's norm.

When the matrices differ, each diagnosis below is tried by applying that one mistake to
derive's matrix and asking whether the result equals the user's (numeric input: within
the tolerance).  Only mistakes that explain the whole difference are reported; the more
specific one wins where two coincide (``sign`` over ``scale -1``, ``thickness`` over
``scale t``).

  node-order        the user's nodes are a permutation of derive's (different start node,
                    opposite orientation, or any renumbering): reports the permutation
  clockwise         nodes numbered clockwise and det J kept signed (negative), so the
                    matrix is -P K P^T: reports the permutation
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
from dataclasses import dataclass, field
from fractions import Fraction

import numpy as np
import sympy as sp

from . import quadrature
from .bounded import Limits, run_bounded
from .check_equality import MAX_PROOF_TERMS, Comparer, check_degree, estimate, values_differ
from .element import Element, element
from .errors import InputError
from .formulations.base import D_op, Formulation
from .output import display

CODES = ("node-order", "clockwise", "transposed", "thickness", "shear-convention", "plane-state", "sign", "scale",
         "quadrature", "dof-order")


@dataclass
class CheckResult:
    match: bool
    mismatched: list[tuple[int, int]]
    diagnosis: list[dict] = field(default_factory=list)
    counterexample: dict | None = None
    compared: int = 0
    method: str = "exact"
    details: list[dict] = field(default_factory=list)
    shape: dict | None = None  # {"given": [r, c], "expected": [r, c]} when the shapes differ

    @property
    def codes(self) -> list[str]:
        return [d["code"] for d in self.diagnosis]


# ---------------------------------------------------------------------------------------------
# equality

def _entries_of(M) -> dict:
    if isinstance(M, dict):
        return M
    return {(i, j): M[i, j] for i in range(M.rows) for j in range(M.cols)}


def _symbols_of(*mats) -> set:
    out: set = set()
    for M in mats:
        for v in (M.values() if isinstance(M, dict) else M):
            out |= sp.sympify(v).free_symbols
    return out


def _shape_differs(expected_shape, given_shape, compared: int) -> CheckResult:
    return CheckResult(match=False, mismatched=[], compared=compared, method="shape differs",
                       shape={"given": list(given_shape), "expected": list(expected_shape)})


def compare_symbolic(expected: sp.Matrix, given, comparer: Comparer | None = None) -> CheckResult:
    """Entry-wise comparison; ``given`` is a Matrix or a dict {(i, j): expr}.  Cost bounded
    before any algebra (derive.check_equality); each entry's degree is checked first."""
    entries = _entries_of(given)
    if not isinstance(given, dict) and given.shape != expected.shape:
        if given.shape == expected.T.shape:  # transposed: the diagnosis follows, no entry list
            return _shape_differs(expected.shape, given.shape, len(entries))
        raise InputError(f"the given matrix is {given.rows} x {given.cols}; expected {expected.rows} x {expected.cols}")
    for (i, j), g in sorted(entries.items()):
        if not (0 <= i < expected.rows and 0 <= j < expected.cols):
            raise InputError(f"entry [{i},{j}] is outside the {expected.rows} x {expected.cols} matrix (0-based)")
        check_degree(g, f"entry [{i},{j}] (0-based)")
    comparer = comparer or Comparer(_symbols_of(expected, entries))
    mismatched, counter = [], None
    for (i, j), g in sorted(entries.items()):
        ok, pt = comparer.equal(expected[i, j], g)
        if not ok:
            mismatched.append((i, j))
            if counter is None and pt is not None:
                counter = {"entry": [i, j], "point": pt}
    result = CheckResult(match=not mismatched, mismatched=mismatched, counterexample=counter,
                         compared=len(entries), method=comparer.method())
    result.details = _details_symbolic(expected, entries, mismatched, comparer)
    return result


def compare_numeric(expected: np.ndarray, given: np.ndarray, rtol: float) -> CheckResult:
    expected = np.asarray(expected, dtype=float)
    given = np.asarray(given, dtype=float)
    if given.shape != expected.shape:
        if given.shape == expected.T.shape:
            return _shape_differs(expected.shape, given.shape, given.size)
        raise InputError(f"the given matrix is {given.shape[0]} x {given.shape[1]}; expected "
                         f"{expected.shape[0]} x {expected.shape[1]}")
    scale = max(np.linalg.norm(expected), 1e-300)
    bad = np.argwhere(np.abs(given - expected) > rtol * scale)
    mismatched = [(int(i), int(j)) for i, j in bad]
    result = CheckResult(match=len(bad) == 0, mismatched=mismatched, compared=given.size,
                         method=f"numeric, tolerance {rtol:g} x ||expected||")
    result.details = [_detail_numeric(i, j, expected[i, j], given[i, j], scale) for i, j in mismatched[:DETAIL_LIMIT]]
    return result


# ---------------------------------------------------------------------------------------------
# mismatch details: expected and given in the same form, their difference and relative difference

DETAIL_LIMIT = 200
NUMBER_DIGITS = 12  # significant digits of expected, given and difference in the details
_SHOW_TERMS = 64    # user entries up to this estimated size are shown factored, like derive's


def number_text(v: float) -> str:
    return f"{float(v):.{NUMBER_DIGITS}g}"


def _finite_float(v) -> float | None:
    """float(v), or None where it does not fit a float (an exact value beyond 1e308)."""
    try:
        f = float(v)
    except (OverflowError, ValueError, TypeError):
        return None
    return f if np.isfinite(f) else None


def _value_text(v) -> str:
    """An exact or 50-digit value in the form of number_text, also beyond the float range."""
    f = _finite_float(v)
    if f is not None:
        return number_text(f)
    if isinstance(v, Fraction):
        v = sp.Rational(v.numerator, v.denominator)
    return str(sp.Float(v, NUMBER_DIGITS))


def _detail_numeric(i: int, j: int, e: float, g: float, norm: float) -> dict:
    d = float(g) - float(e)
    return {"entry": [i, j], "expected": number_text(e), "given": number_text(g), "difference": d,
            "relative_difference": d / abs(e) if e != 0 else None, "relative_to_norm": abs(d) / norm}


def _show(expr) -> str:
    expr = sp.sympify(expr)
    size = estimate(expr)
    if size.num <= _SHOW_TERMS and size.den <= _SHOW_TERMS:
        return str(display(expr))
    return str(expr)


def _details_symbolic(K: sp.Matrix, entries: dict, mismatched, comparer: Comparer) -> list[dict]:
    out = []
    for (i, j) in mismatched[:DETAIL_LIMIT]:
        e, g = sp.sympify(K[i, j]), sp.sympify(entries[(i, j)])
        row = {"entry": [i, j], "expected": _show(e), "given": _show(g), "difference": None,
               "relative_difference": None, "at_point": None}
        diff_size = estimate(g - e)
        if diff_size.num <= _SHOW_TERMS and diff_size.den <= _SHOW_TERMS:
            row["difference"] = str(display(sp.cancel(sp.together(g - e))))
        for pt, ve, vg in zip(comparer.points, comparer.values(e), comparer.values(g)):
            if ve is None or vg is None or not values_differ(ve, vg):
                continue
            row["at_point"] = {"point": {k.name: str(v) for k, v in pt.items()
                                         if k in e.free_symbols | g.free_symbols},
                               "expected": _value_text(ve), "given": _value_text(vg)}
            row["relative_difference"] = _finite_float((vg - ve) / abs(ve)) if ve != 0 else None
            break
        out.append(row)
    return out


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


def _matches(candidate: sp.Matrix, given, numeric_given: np.ndarray | None, rtol: float,
             entries_only: dict | None, comparer: Comparer | None) -> bool:
    if numeric_given is not None:
        A = _as_numeric(candidate)
        if A is None or A.shape != numeric_given.shape:
            return False
        return np.abs(A - numeric_given).max() <= rtol * max(np.linalg.norm(A), 1e-300)
    if entries_only is not None:
        return all(0 <= i < candidate.rows and 0 <= j < candidate.cols and comparer.equal(candidate[i, j], g)[0]
                   for (i, j), g in entries_only.items())
    if candidate.shape != given.shape:
        return False
    return all(comparer.equal(candidate[i, j], given[i, j])[0] for i in range(given.rows) for j in range(given.cols))


def _scale_numeric(A: np.ndarray | None, G: np.ndarray) -> sp.Expr | None:
    if A is None or A.shape != G.shape:
        return None
    mask = np.abs(A) > 1e-12 * np.abs(A).max()
    if not mask.any():
        return None
    c = float(np.median(G[mask] / A[mask]))
    if np.abs(G - c * A).max() <= 1e-9 * np.abs(G).max() and abs(c - 1) > 1e-9:
        return sp.nsimplify(c, rational=False, tolerance=1e-10)
    return None


def _is_monomial(c: sp.Expr) -> bool:
    """A number times powers of symbols (2, 3/2, E, 2 t, 1/a): what a forgotten or doubled
    constant makes; a ratio of polynomials is no scale mistake."""
    return all(f.is_Number or f.is_Symbol or (f.is_Pow and f.base.is_Symbol and f.exp.is_Rational)
               for f in sp.Mul.make_args(c))


def _scale_symbolic(K: sp.Matrix, items: list, comparer: Comparer) -> sp.Expr | None:
    """The c with given = c K on every given entry.  The ratio must first be the same for
    every entry at every point (exact values, cheap); only then is c formed symbolically,
    from the smallest entry, and checked on all entries."""
    ratio_at: list = [None] * len(comparer.points)
    for ij, g in items:
        for k, (vg, vk) in enumerate(zip(comparer.values(g), comparer.values(K[ij]))):
            if vg is None or vk is None:
                continue
            if vk == 0:
                if values_differ(vg, 0 * vk):
                    return None
                continue
            r = vg / vk
            if ratio_at[k] is None:
                ratio_at[k] = r
            elif values_differ(r, ratio_at[k]):
                return None
    known = [r for r in ratio_at if r is not None]
    if not known:
        return None
    if all(isinstance(r, Fraction) for r in known) and len(set(known)) == 1:
        c = sp.Rational(known[0].numerator, known[0].denominator)
    else:
        nonzero = [(ij, g) for ij, g in items if K[ij] != 0]
        (i, j), g = min(nonzero, key=lambda it: comparer.size(it[1]).num * comparer.size(it[1]).den)
        c = g / K[i, j]
        if estimate(c).num <= _SHOW_TERMS:
            c = sp.factor(sp.cancel(sp.together(c)))
    if not all(comparer.equal(c * K[ij], gg)[0] for ij, gg in items):
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


def _probe(M: sp.Matrix, comparer: Comparer) -> np.ndarray | None:
    """M's entries at the comparer's first point where all are defined, as floats (the same
    point for derive's matrix and the user's, so their probes are comparable)."""
    for k in range(len(comparer.points)):
        vals = [comparer.values(M[i, j])[k] for i in range(M.rows) for j in range(M.cols)]
        if all(v is not None for v in vals):
            floats = [_finite_float(v) for v in vals]
            if any(f is None for f in floats):
                return None  # beyond the float range: no numeric probe
            return np.array(floats, dtype=float).reshape(M.rows, M.cols)
    return None


def _permutation_text(perm: list[int]) -> str:
    return "your node i is derive's node perm[i] (1-based: " + \
        ", ".join(f"{i + 1}->{p + 1}" for i, p in enumerate(perm)) + ")"


def _limits(lim: Limits | None) -> Limits:
    return lim or Limits(what="comparing the matrix", hint="a hand derivation needs far less; "
                         "raise --time-limit / --memory-limit if the input is as intended")


def check(target: Target, given=None, given_numeric: np.ndarray | None = None, rtol: float = 1e-8,
          limits: Limits | None = None) -> CheckResult:
    """Compare and, on mismatch, diagnose.  ``given``: Matrix or {(i, j): expr}; or numeric array.

    Work driven by the user's entries runs under ``limits`` (CPU time shared by the
    comparison and the diagnosis, memory; derive.bounded); derive's own matrices (the
    expected one and each single-mistake candidate) are computed outside it.
    """
    K = target.expected()
    lim = _limits(limits)
    if given_numeric is not None:
        A = _as_numeric(K)
        if A is None:
            names = ", ".join(sorted(s.name for s in K.free_symbols))
            raise InputError(f"a numeric matrix needs numeric geometry and material: {names} still symbolic "
                             "(give --nodes and --set E=...,nu=...,t=...)")
        result = compare_numeric(A, given_numeric, rtol)
        if not result.match:
            result.diagnosis = _diagnose(target, K, None, given_numeric, rtol, _candidates(target, K), None)
        return result
    result, used = run_bounded(lambda: compare_symbolic(K, given), lim)
    if result.match:
        return result
    cands = _candidates(target, K)
    rest = dataclasses.replace(lim, seconds=max(lim.seconds - used, 0.5))
    result.diagnosis, _ = run_bounded(lambda: _diagnose(target, K, given, None, rtol, cands,
                                                        Comparer(_symbols_of(K, _entries_of(given)))), rest)
    return result


def _candidates(target: Target, K: sp.Matrix) -> list:
    """(code, detail, matrix) of every single mistake, computed by derive (not limited)."""
    out = []
    for code, why, cand in target.candidates(K):
        if callable(cand):
            try:
                cand = cand()
            except (InputError, ValueError, ArithmeticError):
                continue  # the mistake cannot be made here (e.g. a rule too weak for the enhanced modes)
        out.append((code, why, cand))
    return out


def _diagnose(target: Target, K: sp.Matrix, given, given_numeric, rtol: float, cands: list,
              comparer: Comparer | None) -> list[dict]:
    entries = given if isinstance(given, dict) else None
    found = []
    square_k = K.rows == K.cols and K.rows % 2 == 0 and target.what == "stiffness"
    if entries is None and square_k:
        Kp = _as_numeric(K) if given_numeric is not None else _probe(K, comparer)
        Gp = given_numeric if given_numeric is not None else (
            _probe(given, comparer) if given.shape == K.shape else None)
        if Kp is not None and Gp is not None and Kp.shape == Gp.shape:
            tol = max(rtol, 1e-9)
            perm = node_permutation(Kp, Gp, tol)
            if perm is not None:
                idx = [2 * p + k for p in perm for k in (0, 1)]
                if _matches(K.extract(idx, idx), given, given_numeric, rtol, None, comparer):
                    found.append({"code": "node-order", "explanation": _permutation_text(perm),
                                  "permutation": [p + 1 for p in perm]})
            flipped = node_permutation(Kp, -Gp, tol)
            if flipped is not None:
                idx = [2 * p + k for p in flipped for k in (0, 1)]
                if _matches(-K.extract(idx, idx), given, given_numeric, rtol, None, comparer):
                    found.append({"code": "clockwise", "explanation":
                                  "node order reversed (clockwise) with a signed, negative det J: your matrix is "
                                  "-P K P^T; " + _permutation_text(flipped) +
                                  "; number the nodes counter-clockwise or integrate with |det J|",
                                  "permutation": [p + 1 for p in flipped]})
    elif entries is None and given_numeric is None and target.what in ("shape", "B") and given.shape == K.shape:
        size = 1 if target.what == "shape" else 2
        perm = column_group_permutation(_probe(K, comparer), _probe(given, comparer), size)
        if perm is not None:
            cols = [size * p + k for p in perm for k in range(size)]
            if _matches(K.extract(list(range(K.rows)), cols), given, None, rtol, None, comparer):
                found.append({"code": "node-order", "explanation": _permutation_text(perm),
                              "permutation": [p + 1 for p in perm]})
    transposed = {"code": "transposed", "explanation": "your matrix is derive's transposed"}
    if K.rows != K.cols or target.what != "stiffness":
        KT = K.T
        if given_numeric is not None:
            ok = KT.shape == given_numeric.shape and _matches(KT, None, given_numeric, rtol, None, None)
        elif entries is None:
            ok = KT.shape == given.shape and _matches(KT, given, None, rtol, None, comparer)
        else:
            ok = False
        if ok:
            found.append(transposed)
    elif given_numeric is None and entries is None and given.shape == K.shape and K != K.T:
        if _matches(K.T, given, None, rtol, None, comparer):
            found.append(transposed)
    for code, why, cand in cands:
        if any(f["code"] == code for f in found):
            continue
        if _matches(cand, given, given_numeric, rtol, entries, comparer):
            found.append({"code": code, "explanation": why})
    if not any(f["code"] in ("sign", "thickness", "clockwise") for f in found):
        if given_numeric is not None:
            c = _scale_numeric(_as_numeric(K), given_numeric)
        elif entries is not None or given.shape == K.shape:
            c = _scale_symbolic(K, sorted(_entries_of(given).items()), comparer)
        else:
            c = None
        t_val = target._mat()["t"]
        if c is not None and c != 1 and c != -1 and _is_monomial(c) \
                and not (c.free_symbols & {sp.Symbol("xi"), sp.Symbol("eta")}) \
                and sp.cancel(c - t_val) != 0 and sp.cancel(c - 1 / t_val) != 0:
            found.append({"code": "scale", "explanation": f"your matrix is {c} times derive's", "factor": str(c)})
    return found


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
