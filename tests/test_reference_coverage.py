"""Library paths that had no independent check: Element.B(), the Q12 and T10 spec elements
(stiffness and generated kernels), the axisymmetric closed-form stiffness of T3, T6, Q8, Q9.

Every comparison is against tests/fem_reference.py (numpy only, textbook definitions).
"""
from __future__ import annotations

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import derive
import fem_reference as fr
from compilers import need
from derive.element import element
from derive.spec import SPEC_DIR
from derive.symbols import E, R, a, b, eta, nu, t, xi

SPECS = {"Q12": SPEC_DIR / "q12-cubic-serendipity.toml", "T10": SPEC_DIR / "t10-cubic-triangle.toml"}


def _B_ref(name: str, xy: np.ndarray, s: float, q: float, axisymmetric: bool = False) -> np.ndarray:
    """Textbook B: rows eps_x, eps_y, gamma_xy (axisymmetric: eps_r, eps_z, eps_theta = u/r,
    gamma_rz), columns u1, v1, u2, ... (Cook et al. 4th ed., from memory)."""
    N, ds, dt = fr.shape(name, s, q)
    J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
    dx, dy = np.linalg.solve(J, np.vstack([ds, dt]))
    n = len(N)
    if axisymmetric:
        B = np.zeros((4, 2 * n))
        B[0, 0::2] = dx; B[1, 1::2] = dy; B[2, 0::2] = N / (N @ xy[:, 0]); B[3, 0::2] = dy; B[3, 1::2] = dx
        return B
    B = np.zeros((3, 2 * n))
    B[0, 0::2] = dx; B[1, 1::2] = dy; B[2, 0::2] = dy; B[2, 1::2] = dx
    return B


def _evaluate(K: sp.Matrix, vals: dict) -> np.ndarray:
    """The closed form evaluated in float64 at ``vals`` (lambdify with common subexpressions:
    an order of magnitude faster than subs/evalf on the large axisymmetric entries)."""
    syms = sorted(K.free_symbols, key=lambda s_: s_.name)
    f = sp.lambdify(syms, K, "numpy", cse=True)
    return np.array(f(*[float(vals[s_]) for s_ in syms]), dtype=float)


def _points(name: str):
    return [(0.21, 0.33), (0.6, 0.1)] if name[0] == "T" else [(0.21, -0.33), (-0.7, 0.55)]


# ------------------------------------------------------------------------------------------------
# reference self-check for the two new hand-typed elements

@pytest.mark.parametrize("name", ["Q12", "T10"])
def test_reference_q12_t10_shape_functions_are_sane(name):
    nodes = fr.REF_NODES[name]
    for i, (s, q) in enumerate(nodes):
        assert_allclose(fr.shape(name, s, q)[0], np.eye(len(nodes))[i], rtol=0, atol=1e-14)  # Kronecker delta
    s, q, h = 0.21, 0.33, 1e-6
    N, ds, dt = fr.shape(name, s, q)
    assert abs(N.sum() - 1) < 1e-14                                       # partition of unity
    # central differences (common practice, no source): truncation h^2, round-off eps / h
    assert_allclose(ds, (fr.shape(name, s + h, q)[0] - fr.shape(name, s - h, q)[0]) / (2 * h), rtol=0, atol=1e-8)
    assert_allclose(dt, (fr.shape(name, s, q + h)[0] - fr.shape(name, s, q - h)[0]) / (2 * h), rtol=0, atol=1e-8)


# ------------------------------------------------------------------------------------------------
# Element.B

@pytest.mark.parametrize("name", ["T3", "T6", "Q4", "Q8", "Q9"])
@pytest.mark.parametrize("state", ["plane-stress", "axisymmetric"])
def test_element_B_equals_the_textbook_B(name, state):
    rng = np.random.default_rng(17)
    xy = fr.random_element(name, rng)
    if state == "axisymmetric":
        xy[:, 0] += 10.0 - xy[:, 0].min()          # r > 0 everywhere
    Bs = element(name, "full", state).B(xy)
    f = sp.lambdify((xi, eta), Bs, "numpy")
    for s, q in _points(name):
        got = np.array(f(s, q), dtype=float)
        ref = _B_ref(name, xy, s, q, state == "axisymmetric")
        assert_allclose(got, ref, rtol=0, atol=1e-12 * np.abs(ref).max())   # textbook B, float64 round-off


def test_element_B_on_the_rectangle_symbolic():
    # Q4 on the 2a x 2b rectangle: dN/dx = (dN/dxi) / a, dN/dy = (dN/deta) / b (Cook et al., from memory)
    B = element("Q4").B("rectangle")
    sn, tn = [-1, 1, 1, -1], [-1, -1, 1, 1]
    for i in range(4):
        assert sp.cancel(B[0, 2 * i] - sn[i] * (1 + tn[i] * eta) / (4 * a)) == 0
        assert sp.cancel(B[1, 2 * i + 1] - tn[i] * (1 + sn[i] * xi) / (4 * b)) == 0
        assert B[0, 2 * i + 1] == 0 and B[1, 2 * i] == 0
        assert sp.cancel(B[2, 2 * i] - B[1, 2 * i + 1]) == 0 and sp.cancel(B[2, 2 * i + 1] - B[0, 2 * i]) == 0


# ------------------------------------------------------------------------------------------------
# the Q12 and T10 spec elements

def _spec_element(name: str, rng) -> np.ndarray:
    """Q12: a distorted quadrilateral with the side nodes at the thirds of its straight sides
    (the element's own map is then not affine, so the comparison needs the same 4 x 4 rule);
    T10: a straight-sided triangle (affine: any rule exact to degree 4 gives the same K)."""
    if name == "Q12":
        corners = np.array([[0.0, 0.0], [2.2, 0.3], [2.5, 1.9], [-0.1, 1.4]])
        P = [corners[i] + (corners[(i + 1) % 4] - corners[i]) * f for i in range(4) for f in (1 / 3, 2 / 3)]
        return np.vstack([corners] + P)
    c = np.array([[0.0, 0.0], [2.0, 0.4], [0.5, 1.7]]) + rng.uniform(-0.1, 0.1, (3, 2))
    sides = [c[i] + (c[(i + 1) % 3] - c[i]) * f for i in range(3) for f in (1 / 3, 2 / 3)]
    return np.vstack([c] + sides + [c.mean(axis=0)])


@pytest.mark.parametrize("name", ["Q12", "T10"])
def test_spec_element_stiffness_against_the_textbook_routine(name):
    xy = _spec_element(name, np.random.default_rng(3))
    el = element(str(SPECS[name]), "full", "plane-strain")
    K = el.numeric_stiffness(xy, 70.0, 0.33, 0.5)
    # textbook quadrature: 4 x 4 numpy leggauss (Q12); Duffy-collapsed 4 x 4 Gauss (T10)
    Kr = fr.stiffness(name, xy, 70.0, 0.33, 0.5, "plane-strain")
    assert_allclose(K, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


@pytest.mark.parametrize("name", ["Q12", "T10"])
def test_spec_element_closed_form_on_the_rectangle(name):
    el = element(str(SPECS[name]))
    K = el.stiffness("rectangle")
    vals = {a: sp.Rational(3, 4), b: sp.Rational(1, 2), E: 100, nu: sp.Rational(3, 10), t: 1}
    Kn = np.array(K.subs(vals).evalf(30).tolist(), dtype=float)
    X = np.array(fr.REF_NODES[name], dtype=float)
    if name[0] == "T":
        X = 2 * X - 1                    # the lower-left half of the rectangle (derive/geometry.py docstring)
    Kr = fr.stiffness(name, np.column_stack([0.75 * X[:, 0], 0.5 * X[:, 1]]), 100.0, 0.3, 1.0)
    assert_allclose(Kn, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())   # exact rationals vs float64 quadrature


@pytest.mark.parametrize("name", ["Q12", "T10"])
@pytest.mark.parametrize("lang", ["numpy", "c"])
def test_spec_element_kernel_against_the_textbook_routine(name, lang):
    need(lang)                               # skip with the reason; fail under CI
    k = derive.kernel(str(SPECS[name]), "full", "plane-stress", lang)
    assert k.lang == lang and k.ndof == 2 * len(fr.REF_NODES[name])
    rng = np.random.default_rng(5)
    X = np.stack([_spec_element(name, rng) * rng.uniform(0.5, 2.0) for _ in range(4)])
    K = k(X, 3.0, 0.25, 0.2)
    for e in range(len(X)):
        Kr = fr.stiffness(name, X[e], 3.0, 0.25, 0.2)     # textbook quadrature, as above
        assert_allclose(K[e], Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())


# ------------------------------------------------------------------------------------------------
# axisymmetric closed forms

@pytest.mark.parametrize("name", ["T3", "T6", "Q4", "Q8", "Q9"])
def test_axisymmetric_symbolic_stiffness_against_the_textbook_routine(name):
    # the rectangle centred at radius R (derive/geometry.py docstring); the textbook ring element
    # K = sum w B^T D B det J 2 pi r with the element's rule (tests/fem_reference.py)
    K = element(name, "full", "axisymmetric").stiffness("rectangle")
    assert K.free_symbols <= {a, b, R, E, nu}
    vals = {a: sp.Rational(3, 4), b: sp.Rational(1, 2), R: 2, E: 100, nu: sp.Rational(3, 10)}
    Kn = _evaluate(K, vals)
    X = np.array(fr.REF_NODES[name], dtype=float)
    if name[0] == "T":
        X = 2 * X - 1
    Kr = fr.stiffness(name, np.column_stack([2 + 0.75 * X[:, 0], 0.5 * X[:, 1]]), 100.0, 0.3, 1.0, "axisymmetric")
    assert_allclose(Kn, Kr, rtol=0, atol=1e-12 * np.abs(Kr).max())
