"""The 3-D solid catalogue: H8, H20, H27, T4, T10, W6 and the H8 variants.

Independent references are written here from the textbook definitions with numpy only.
"""
from __future__ import annotations

import itertools

import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import derive
from derive import catalog
from derive.errors import InputError
from derive.symbols import E, a, b, c, nu

H8_CORNERS = np.array([[-1, -1, -1], [1, -1, -1], [1, 1, -1], [-1, 1, -1],
                       [-1, -1, 1], [1, -1, 1], [1, 1, 1], [-1, 1, 1]], dtype=float)


def iso_D(Ev: float, nv: float) -> np.ndarray:
    """Isotropic 3-D D, Voigt [xx, yy, zz, yz, zx, xy], engineering shear (Timoshenko & Goodier, from memory)."""
    lam, mu = Ev * nv / ((1 + nv) * (1 - 2 * nv)), Ev / (2 * (1 + nv))
    D = np.zeros((6, 6))
    D[:3, :3] = lam
    D[:3, :3] += 2 * mu * np.eye(3)
    D[3:, 3:] = mu * np.eye(3)
    return D


def strain_B(dNdx: np.ndarray) -> np.ndarray:
    """6 x 3n B from physical derivatives dNdx (3, n): textbook definition of small strain."""
    n = dNdx.shape[1]
    B = np.zeros((6, 3 * n))
    for i in range(n):
        dx, dy, dz = dNdx[:, i]
        B[0, 3 * i], B[1, 3 * i + 1], B[2, 3 * i + 2] = dx, dy, dz
        B[3, 3 * i + 1], B[3, 3 * i + 2] = dz, dy
        B[4, 3 * i + 2], B[4, 3 * i] = dx, dz
        B[5, 3 * i], B[5, 3 * i + 1] = dy, dx
    return B


def h8_reference_K(xyz: np.ndarray, Ev: float, nv: float, n_gauss: int = 2) -> np.ndarray:
    """H8 stiffness by Gauss quadrature written from the textbook (Zienkiewicz & Taylor; Hughes 1987):
    N_i = (1 + xi xi_i)(1 + eta eta_i)(1 + zeta zeta_i)/8, J = dN/dxi^T X, K = sum w B^T D B det J."""
    g, w = np.polynomial.legendre.leggauss(n_gauss)  # reference library: numpy Gauss-Legendre
    D = iso_D(Ev, nv)
    K = np.zeros((24, 24))
    for (p, wp), (q, wq), (r, wr) in itertools.product(zip(g, w), repeat=3):
        s = H8_CORNERS
        dN = np.array([s[:, 0] * (1 + q * s[:, 1]) * (1 + r * s[:, 2]),
                       s[:, 1] * (1 + p * s[:, 0]) * (1 + r * s[:, 2]),
                       s[:, 2] * (1 + p * s[:, 0]) * (1 + q * s[:, 1])]) / 8
        J = dN @ xyz
        B = strain_B(np.linalg.solve(J, dN))
        K += wp * wq * wr * np.linalg.det(J) * B.T @ D @ B
    return K


def t4_reference_K(xyz: np.ndarray, Ev: float, nv: float) -> np.ndarray:
    """Constant-strain tetrahedron in closed form: N = C^-1 [1, x, y, z], K = V B^T D B
    (Zienkiewicz & Taylor, The Finite Element Method, vol. 1, from memory)."""
    C = np.hstack([np.ones((4, 1)), xyz])
    coeffs = np.linalg.inv(C)          # column i: coefficients of N_i in (1, x, y, z)
    V = abs(np.linalg.det(C)) / 6
    B = strain_B(coeffs[1:, :])
    return V * B.T @ iso_D(Ev, nv) @ B


# --------------------------------------------------------------------------- stiffness against references

def test_h8_brick_closed_form_against_numpy_gauss():
    el = derive.element("H8", "full", "solid")
    K = el.stiffness("brick")
    assert K.shape == (24, 24)
    vals = {a: sp.Rational(3, 2), b: sp.Rational(1, 2), c: 1, E: 200, nu: sp.Rational(3, 10)}
    Kn = np.array(K.subs(vals).tolist(), dtype=float)
    xyz = H8_CORNERS * [1.5, 0.5, 1.0]
    assert_allclose(Kn, h8_reference_K(xyz, 200.0, 0.3), rtol=1e-12, atol=1e-10)


def test_h8_distorted_numeric_against_numpy_gauss():
    el = derive.element("H8", "full", "solid")
    rng = np.random.default_rng(11)
    xyz = H8_CORNERS * [2.0, 1.0, 0.7] + 0.15 * rng.standard_normal((8, 3))
    assert_allclose(el.numeric_stiffness(xyz, 3.0, 0.25), h8_reference_K(xyz, 3.0, 0.25), rtol=1e-12, atol=1e-12)
    # the symbolic route on numeric nodes (30-digit rule points) gives the same matrix
    Ks = np.array(el.stiffness(xyz.tolist(), E=3, nu=sp.Rational(1, 4)).tolist(), dtype=float)
    assert_allclose(Ks, h8_reference_K(xyz, 3.0, 0.25), rtol=1e-11, atol=1e-12)


def test_t4_against_closed_form_constant_strain_tetrahedron():
    el = derive.element("T4", "full", "solid")
    xyz = np.array([[0.0, 0.0, 0.0], [2.0, 0.1, 0.0], [0.3, 1.5, 0.2], [0.1, 0.4, 1.2]])
    ref = t4_reference_K(xyz, 5.0, 0.2)
    assert_allclose(el.numeric_stiffness(xyz, 5.0, 0.2), ref, rtol=1e-12, atol=1e-12)
    Ks = np.array(el.stiffness(xyz.tolist(), E=5, nu=sp.Rational(1, 5)).tolist(), dtype=float)
    assert_allclose(Ks, ref, rtol=1e-12, atol=1e-12)


# --------------------------------------------------------------------------- zero-energy modes

def _zero_modes(K: np.ndarray) -> int:
    ev = np.linalg.eigvalsh(0.5 * (K + K.T))
    return int(np.sum(np.abs(ev) < 1e-9 * np.abs(ev).max()))


VARIANT_ZEROS = [("H8", "full", 6), ("H8", "reduced", 18), ("H8", "selective", 6), ("H8", "bbar", 6),
                 ("H8", "incompatible", 6), ("H8", "incompatible-centred", 6), ("H8", "eas9", 6),
                 ("H8", "eas21", 6), ("H8", "hybrid18", 6), ("T4", "full", 6), ("W6", "full", 6),
                 ("T10", "full", 6), ("T10", "selective", 9), ("T10", "bbar", 6), ("H20", "full", 6),
                 ("H20", "bbar", 6), ("H27", "full", 6)]


@pytest.mark.parametrize("name,variant,zeros", VARIANT_ZEROS)
def test_zero_energy_modes(name, variant, zeros):
    # 6 rigid-body modes for a properly integrated solid; one-point H8 adds 12 hourglass modes
    # (Flanagan & Belytschko 1981, from memory).  T10 selective (one-point volumetric rule) keeps the
    # three special conformal fields u = 2 (g.x) x - |x|^2 g (zero deviatoric strain, dilatation linear
    # and zero at the centroid): 6 + 3 (Liouville's theorem on conformal maps; common practice, no source)
    el = derive.element(name, variant, "solid")
    rng = np.random.default_rng(7)
    nodes = np.array(el.shapes.nodes, dtype=float)
    if el.shapes.domain != "cube":
        nodes = 2 * nodes - 1 if el.shapes.domain == "tetrahedron" else nodes
    xyz = nodes * [1.3, 0.9, 1.1] + 0.05 * rng.standard_normal(nodes.shape)
    K = el.numeric_stiffness(xyz, 1.0, 0.3)
    assert _zero_modes(K) == zeros


# --------------------------------------------------------------------------- constant-strain (single element) patch

def _constant_stress_forces(xyz: np.ndarray, sigma: np.ndarray) -> np.ndarray:
    """int B^T sigma dV of the standard H8 by 2x2x2 Gauss (textbook; exact for trilinear det J)."""
    g, w = np.polynomial.legendre.leggauss(2)
    f = np.zeros(24)
    for (p, wp), (q, wq), (r, wr) in itertools.product(zip(g, w), repeat=3):
        s = H8_CORNERS
        dN = np.array([s[:, 0] * (1 + q * s[:, 1]) * (1 + r * s[:, 2]),
                       s[:, 1] * (1 + p * s[:, 0]) * (1 + r * s[:, 2]),
                       s[:, 2] * (1 + p * s[:, 0]) * (1 + q * s[:, 1])]) / 8
        J = dN @ xyz
        f += wp * wq * wr * np.linalg.det(J) * strain_B(np.linalg.solve(J, dN)).T @ sigma
    return f


@pytest.mark.parametrize("variant,passes", [("full", True), ("incompatible-centred", True), ("eas9", True),
                                            ("eas21", True), ("hybrid18", True), ("bbar", True),
                                            ("incompatible", False)])
def test_single_element_constant_strain(variant, passes):
    # a linear displacement field must produce the nodal forces of its constant stress, K u = int B^T sigma
    # (the patch test on one element; Taylor, Beresford & Wilson 1976 for the incompatible-mode failure)
    rng = np.random.default_rng(2)
    xyz = H8_CORNERS * [1.0, 0.8, 0.6] + 0.2 * rng.standard_normal((8, 3))
    G = np.array([[1e-3, 2e-4, -3e-4], [5e-4, -2e-3, 1e-4], [-4e-4, 3e-4, 1.5e-3]])
    u = (xyz @ G.T).ravel()
    eps = np.array([G[0, 0], G[1, 1], G[2, 2], G[1, 2] + G[2, 1], G[2, 0] + G[0, 2], G[0, 1] + G[1, 0]])
    f = _constant_stress_forces(xyz, iso_D(1.0, 0.3) @ eps)
    K = derive.element("H8", variant, "solid").numeric_stiffness(xyz, 1.0, 0.3)
    err = np.abs(K @ u - f).max() / np.abs(f).max()
    if passes:
        assert err < 1e-10
    else:
        assert err > 1e-4


def test_incompatible_h8_is_exact_in_pure_bending_on_a_brick():
    # pure bending about y (nu = 0): u = k x z, v = 0, w = -k x^2 / 2, strain eps_xx = k z only, energy
    # U = E I k^2 (2L) / 2 (beam theory; Timoshenko & Goodier, from memory).  The nodal values of u are
    # trilinear (w is rigid at the nodes); the element's energy u^T K u / 2 is exact for the incompatible
    # and enhanced elements and too large for the plain H8 (parasitic shear: locking).
    La, hb, hc, kappa = 5.0, 0.5, 0.5, 1e-3
    xyz = H8_CORNERS * [La, hb, hc]
    u = np.zeros(24)
    u[0::3] = kappa * xyz[:, 0] * xyz[:, 2]
    exact = 0.5 * 1.0 * (2 * hb) * (2 * hc) ** 3 / 12 * kappa ** 2 * (2 * La)
    ratio = {}
    for variant in ("full", "incompatible", "incompatible-centred", "eas9", "eas21"):
        K = derive.element("H8", variant, "solid").numeric_stiffness(xyz, 1.0, 0.0)
        ratio[variant] = exact / (0.5 * u @ K @ u)
    for variant in ("incompatible", "incompatible-centred", "eas9", "eas21"):
        assert ratio[variant] == pytest.approx(1.0, rel=1e-10)
    # plain H8: shear energy k^2 a^2 mu ... makes it far too stiff at L/c = 10
    assert ratio["full"] < 0.1


# --------------------------------------------------------------------------- symbolic routes and names

@pytest.mark.parametrize("name", ["T4", "T10", "W6"])
def test_closed_form_on_the_brick_family_matches_numeric(name):
    el = derive.element(name, "full", "solid")
    K = el.stiffness("brick")
    vals = {a: 1, b: sp.Rational(1, 2), c: sp.Rational(3, 4), E: 1, nu: sp.Rational(1, 4)}
    Kn = np.array(K.subs(vals).tolist(), dtype=float)
    xyz = np.array([[float(v.subs(vals)) for v in row] for row in zip(*el.map("brick").geometry.axes)])
    # the numeric route evaluates the same formulation independently of the exact polynomial route
    assert_allclose(Kn, el.numeric_stiffness(xyz, 1.0, 0.25), rtol=1e-12, atol=1e-12)


def test_parallelepiped_closed_form():
    el = derive.element("H8", "full", "solid")
    K = el.stiffness("parallelepiped")
    s = sp.Symbol("s")
    vals = {a: 1, b: sp.Rational(1, 2), c: sp.Rational(3, 4), s: sp.Rational(1, 3), E: 1, nu: sp.Rational(1, 4)}
    Kn = np.array(K.subs(vals).tolist(), dtype=float)
    xyz = np.column_stack([H8_CORNERS[:, 0] + H8_CORNERS[:, 1] / 3, H8_CORNERS[:, 1] / 2, 0.75 * H8_CORNERS[:, 2]])
    assert_allclose(Kn, h8_reference_K(xyz, 1.0, 0.25), rtol=1e-12, atol=1e-12)


def test_variants_offered_and_refused():
    assert set(catalog.element_info("H8").variants) == {"full", "reduced", "selective", "bbar", "incompatible",
                                                       "incompatible-centred", "eas9", "eas21", "hybrid18"}
    assert catalog.element_info("T4").variants == ("full",)
    assert catalog.element_info("W6").variants == ("full", "reduced")
    with pytest.raises(InputError, match="does not apply"):
        derive.element("H20", "eas9", "solid")
    with pytest.raises(InputError, match="does not apply to Q4"):
        derive.element("Q4", "eas9", "plane-stress")
    for v in ("eas9", "eas21", "hybrid18"):
        assert catalog.VARIANTS[v].source  # each cites its published source


def test_user_spec_on_the_hexahedron(tmp_path):
    from derive.spec import load_spec
    path = tmp_path / "h8s.toml"
    path.write_text('name = "H8S"\ndomain = "hexahedron"\n'
                    'nodes = [[-1,-1,-1],[1,-1,-1],[1,1,-1],[-1,1,-1],[-1,-1,1],[1,-1,1],[1,1,1],[-1,1,1]]\n'
                    'basis = ["1","xi","eta","zeta","xi*eta","eta*zeta","xi*zeta","xi*eta*zeta"]\n')
    info, shapes = load_spec(path)
    assert info.domain == "cube" and info.full_rule == "gauss-2x2x2" and info.reduced_rule == "gauss-1x1x1"
    el = derive.element(str(path), "full", "solid")
    xyz = H8_CORNERS * [1.0, 0.7, 0.4]
    assert_allclose(el.numeric_stiffness(xyz, 1.0, 0.3), h8_reference_K(xyz, 1.0, 0.3), rtol=1e-12, atol=1e-12)
    bad = tmp_path / "bad.toml"
    bad.write_text('name = "B"\ndomain = "wedge"\nnodes = [[0, 0], [1, 0]]\nbasis = ["1", "xi"]\n')
    with pytest.raises(derive.errors.SpecError, match="node 1 must be a triple"):
        load_spec(bad)
