"""Isoparametric map, Jacobian, validity checks and material checks."""
import numpy as np
import pytest
import sympy as sp

from derive.element import element
from derive.errors import GeometryError, InputError, MaterialError
from derive.material import D, split, volumetric_vector
from derive.symbols import E, a, b, c, nu, xi, eta


def test_rectangle_and_parallelogram_jacobians():
    q4 = element("Q4")
    J = q4.map("rectangle").jacobian
    assert J == sp.Matrix([[a, 0], [0, b]])  # x = a xi, y = b eta (common practice)
    m = q4.map("parallelogram")
    assert m.jacobian == sp.Matrix([[a, 0], [c, b]])  # x = a xi + c eta, y = b eta (common practice)
    assert m.det == a * b
    assert sp.simplify(m.inverse * m.jacobian - sp.eye(2)) == sp.zeros(2, 2)


def test_general_q4_det_is_bilinear():
    m = element("Q4").map("general")
    # det J of a bilinear quadrilateral is linear in xi and eta (no xi*eta term): textbook fact, from memory
    p = sp.Poly(m.det, xi, eta)
    assert p.total_degree() == 1


def test_validity_report_ok():
    rep = element("Q4").validity([[0, 0], [2, 0], [2, 1], [0, 1]])
    # det J = A/4 (common practice)
    assert rep["det_min"] == pytest.approx(0.5, rel=1e-12, abs=0)
    assert rep["det_max"] == pytest.approx(0.5, rel=1e-12, abs=0)
    assert rep["area"] == pytest.approx(2.0, rel=1e-12, abs=0)


def test_clockwise_nodes_refused():
    with pytest.raises(GeometryError, match="clockwise"):
        element("Q4").validity([[0, 0], [0, 1], [2, 1], [2, 0]])


def test_zero_area_refused():
    with pytest.raises(GeometryError, match="zero area"):
        element("T3").validity([[0, 0], [1, 1], [2, 2]])


def test_nonconvex_refused_names_node():
    with pytest.raises(GeometryError, match=r"changes sign.*node 3"):
        element("Q4").validity([[0, 0], [2, 0], [0.4, 0.4], [0, 2]])


def test_bad_node_arrays():
    with pytest.raises(InputError, match=r"\(4, 2\) array"):
        element("Q4").stiffness([[0, 0], [1, 0], [1, 1]], E=1, nu=0.3, t=1)
    with pytest.raises(InputError, match="finite"):
        element("Q4").stiffness([[0, 0], [1, 0], [1, float("nan")], [0, 1]], E=1, nu=0.3, t=1)


@pytest.mark.parametrize("state,nuv,ok", [("plane-stress", 0.5, True), ("plane-strain", 0.5, False),
                                          ("axisymmetric", 0.5, False), ("plane-stress", -1.0, False),
                                          ("plane-stress", 0.6, False), ("plane-strain", 0.4999, True)])
def test_poisson_checks(state, nuv, ok):
    if ok:
        D(state, 1.0, nuv)
    else:
        with pytest.raises(MaterialError):
            D(state, 1.0, nuv)


def test_e_must_be_positive():
    with pytest.raises(MaterialError, match="E must be"):
        D("plane-stress", 0, 0.3)


@pytest.mark.parametrize("state", ["plane-stress", "plane-strain", "axisymmetric"])
def test_split_is_deviatoric_plus_volumetric(state):
    Ddev, Dvol, kappa = split(state)
    m = volumetric_vector(state)
    assert (D(state) - Ddev - Dvol).applyfunc(sp.cancel) == sp.zeros(*Ddev.shape)
    assert (Dvol - kappa * m * m.T).applyfunc(sp.cancel) == sp.zeros(*Ddev.shape)
    lam, mu = E * nu / ((1 + nu) * (1 - 2 * nu)), E / (2 * (1 + nu))
    if state == "plane-stress":
        lam = E * nu / (1 - nu ** 2)  # plane-stress lambda* (Hughes, The Finite Element Method, 1987, from memory)
    # kappa = lambda + 2 mu / 3, the 3-D bulk modulus (Timoshenko & Goodier, from memory)
    assert sp.cancel(kappa - (lam + 2 * mu / 3)) == 0
    w = np.linalg.eigvalsh(np.array(Ddev.subs({E: 1, nu: sp.Rational(3, 10)}).evalf().tolist(), dtype=float))
    if state == "axisymmetric":
        assert abs(w).min() < 1e-12 < w.max()  # 2 mu (I - m m^T / 3): m itself is its null vector (common practice)
    else:
        assert w.min() > 0  # positive definite deviatoric part in the plane states (common practice)


def test_plane_strain_d_entries():
    Dm = D("plane-strain")
    # D11 = E (1 - nu) / ((1 + nu)(1 - 2 nu)) (Timoshenko & Goodier, from memory)
    assert sp.cancel(Dm[0, 0] - E * (1 - nu) / ((1 + nu) * (1 - 2 * nu))) == 0
