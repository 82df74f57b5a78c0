"""The dimension-generic core: reference domains, quadrature, shapes, map, models, solid D.

Every number is checked against an outside source named beside the check.
"""
from __future__ import annotations

import itertools
import math

import mpmath
import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose
from scipy import integrate as sci

import derive
from derive import catalog, models, quadrature, reference
from derive.errors import GeometryError, InputError, MaterialError
from derive.material import D, orthotropic, split, transversely_isotropic
from derive.symbols import E, a, b, c, eta, nu, xi, zeta

R_ = sp.Rational


# --------------------------------------------------------------------------- reference domains

def test_dimensions_measures_centres():
    # standard results: lengths/areas/volumes of [-1,1], [-1,1]^2, unit triangle, [-1,1]^3,
    # unit tetrahedron 1/6, triangle x [-1,1] = 1 (common practice, no source)
    assert [reference.dimension(d) for d in reference.DOMAINS] == [1, 2, 2, 3, 3, 3]
    assert [reference.measure(d) for d in reference.DOMAINS] == [2, 4, R_(1, 2), 8, R_(1, 6), 1]
    assert reference.centre("tetrahedron") == (R_(1, 4),) * 3  # centroid = mean of the vertices
    assert reference.coordinates("wedge") == (xi, eta, zeta)


@pytest.mark.parametrize("powers", [(0, 0, 0), (2, 0, 0), (1, 1, 1), (2, 2, 0), (3, 1, 2), (0, 4, 1)])
def test_3d_monomial_integrals_against_scipy(powers):
    p, q, r = powers
    f = lambda z, y, x: x**p * y**q * z**r  # noqa: E731  (tplquad integrates f(z, y, x))
    # reference library: scipy.integrate.tplquad on the textbook limits of each domain
    cube = sci.tplquad(f, -1, 1, -1, 1, -1, 1, epsabs=1e-13, epsrel=1e-13)[0]
    tet = sci.tplquad(f, 0, 1, 0, lambda x: 1 - x, 0, lambda x, y: 1 - x - y, epsabs=1e-13, epsrel=1e-13)[0]
    wedge = sci.tplquad(f, 0, 1, 0, lambda x: 1 - x, -1, 1, epsabs=1e-13, epsrel=1e-13)[0]
    assert_allclose(float(reference.monomial_integral("cube", p, q, r)), cube, rtol=1e-11, atol=1e-13)
    assert_allclose(float(reference.monomial_integral("tetrahedron", p, q, r)), tet, rtol=1e-11, atol=1e-13)
    assert_allclose(float(reference.monomial_integral("wedge", p, q, r)), wedge, rtol=1e-11, atol=1e-13)


def test_tetrahedron_dirichlet_formula_and_line():
    # Eisenberg & Malvern (1973) volume-coordinate formula p! q! r! 6V / (p+q+r+3)!, V = 1/6 (from memory)
    for p, q, r in itertools.product(range(4), repeat=3):
        expected = R_(math.factorial(p) * math.factorial(q) * math.factorial(r), math.factorial(p + q + r + 3))
        assert reference.monomial_integral("tetrahedron", p, q, r) == expected
    # calculus: int_{-1}^{1} x^k dx = 2/(k+1) for even k, 0 for odd k
    assert [reference.monomial_integral("line", k) for k in range(5)] == [2, 0, R_(2, 3), 0, R_(2, 5)]
    with pytest.raises(InputError, match="needs 3 exponents"):
        reference.monomial_integral("cube", 1, 1)


def test_integrate_polynomial_and_contains_in_3d():
    f = (1 + a * xi) * (eta - 2 * zeta) ** 2
    # independent route: sympy.integrate on the iterated limits
    ref = sp.integrate(f, (zeta, 0, 1 - xi - eta), (eta, 0, 1 - xi), (xi, 0, 1))
    assert sp.expand(reference.integrate_polynomial(f, "tetrahedron") - ref) == 0
    ref = sp.integrate(f, (zeta, -1, 1), (eta, 0, 1 - xi), (xi, 0, 1))
    assert sp.expand(reference.integrate_polynomial(f, "wedge") - ref) == 0
    assert reference.contains("tetrahedron", (R_(1, 4),) * 3)
    assert not reference.contains("tetrahedron", (R_(1, 2), R_(1, 2), R_(1, 100)))  # L1 < 0
    assert reference.contains("wedge", (0, 1, -1)) and not reference.contains("wedge", (0, 0, R_(11, 10)))
    with pytest.raises(InputError, match="triple"):
        reference.contains("cube", (0, 0))


# --------------------------------------------------------------------------- quadrature

RULES_3D = ["gauss-line-1", "gauss-line-3", "gauss-1x1x1", "gauss-2x2x2", "gauss-3x3x3", "gauss-2x3x4",
            "tetrahedron-d1", "tetrahedron-d2", "tetrahedron-d3", "tetrahedron-d4", "tetrahedron-d5",
            "wedge-d1x1", "wedge-d2x2", "wedge-d3x2", "wedge-d5x3"]


@pytest.mark.parametrize("name", RULES_3D)
def test_rules_integrate_monomials_exactly_to_their_degree(name):
    rl = quadrature.rule(name)
    mpmath.mp.dps = 40
    pts = [[mpmath.mpf(str(sp.N(v, 45))) for v in pt] for pt in rl.points]
    wts = [mpmath.mpf(str(sp.N(w, 45))) for w in rl.weights]
    assert all(w > 0 for w in wts)  # positive weights (common practice: stability of the rule)
    assert all(reference.contains(rl.domain, pt) for pt in rl.points)
    worst_above = 0
    for powers in itertools.product(range(rl.degree + 2), repeat=rl.dim):
        d = sum(powers)
        if d > rl.degree + 1:
            continue
        value = mpmath.fsum(w * mpmath.fprod(x ** k for x, k in zip(pt, powers)) for pt, w in zip(pts, wts))
        exact = reference.monomial_integral(rl.domain, *powers)  # closed forms checked above against scipy
        err = abs(value - mpmath.mpf(exact.p) / exact.q)
        if d <= rl.degree:
            assert err < mpmath.mpf("1e-30"), (powers, err)
        else:
            worst_above = max(worst_above, err)
    # one degree more is not integrated exactly: the stated degree is the rule's true degree
    assert worst_above > mpmath.mpf("1e-12")


def test_rule_names_and_products():
    assert quadrature.rule("gauss-2x2x2") is quadrature.gauss_cube(2)
    assert quadrature.rule("gauss-2x2x2").npoints == 8
    assert quadrature.rule("wedge-d2x2").npoints == 6 and quadrature.rule("wedge-d2x2").degree == 2
    assert quadrature.rule("tetrahedron-d5").npoints == 15  # Stroud T3:5-1 has 15 points (from memory)
    # square rule unchanged by the generic tensor construction: 2x2 Gauss points +-1/sqrt(3), weights 1
    assert quadrature.rule("gauss-2x2").points[0] == (-1 / sp.sqrt(3), -1 / sp.sqrt(3))
    with pytest.raises(InputError, match="tetrahedron-d<degree>"):
        quadrature.rule("tetrahedron-d6")
    with pytest.raises(InputError, match="3 coordinates"):
        quadrature.Rule("bad", "cube", ((0, 0),), (8,), 1)


# --------------------------------------------------------------------------- shapes

SOLIDS = ("H8", "H20", "H27", "T4", "T10", "W6")


@pytest.mark.parametrize("name,degree", [("H8", 1), ("H20", 2), ("H27", 2), ("T4", 1), ("T10", 2), ("W6", 1)])
def test_partition_kronecker_completeness(name, degree):
    # textbook properties of Lagrange/serendipity interpolation (Zienkiewicz & Taylor, from memory):
    # sum N_i = 1, N_i(x_j) = delta_ij, complete to the degree of the element
    checks = catalog.shape_set(name).checks()
    assert checks == {"partition_of_unity": True, "kronecker_delta": True, "completeness": degree}


def test_node_orders_as_documented():
    sh = catalog.shape_set("H8")
    # issue 11 / README conventions: face z = -1 counter-clockwise seen from +z, then z = +1
    assert sh.nodes[:4] == ((-1, -1, -1), (1, -1, -1), (1, 1, -1), (-1, 1, -1))
    assert sh.nodes[4:] == ((-1, -1, 1), (1, -1, 1), (1, 1, 1), (-1, 1, 1))
    h20 = catalog.shape_set("H20").nodes
    assert h20[8] == (0, -1, -1) and h20[11] == (-1, 0, -1) and h20[12] == (0, -1, 1) and h20[16] == (-1, -1, 0)
    h27 = catalog.shape_set("H27").nodes
    assert h27[20:] == ((0, 0, -1), (0, -1, 0), (1, 0, 0), (0, 1, 0), (-1, 0, 0), (0, 0, 1), (0, 0, 0))
    t10 = catalog.shape_set("T10").nodes
    half = R_(1, 2)
    assert t10[4:] == ((half, 0, 0), (half, half, 0), (0, half, 0), (0, 0, half), (half, 0, half), (0, half, half))
    assert catalog.shape_set("W6").nodes[3] == (0, 0, 1)


def test_h8_shape_functions_are_the_textbook_trilinear_products():
    # N_i = (1 + xi xi_i)(1 + eta eta_i)(1 + zeta zeta_i) / 8 (Zienkiewicz & Taylor, from memory)
    sh = catalog.shape_set("H8")
    for f, (p, q, r) in zip(sh.functions, sh.nodes):
        assert sp.expand(f - (1 + p * xi) * (1 + q * eta) * (1 + r * zeta) / 8) == 0


def test_t10_corner_and_edge_functions():
    # quadratic tetrahedron: corner L (2L - 1), edge 4 L_i L_j (Zienkiewicz & Taylor, from memory)
    sh = catalog.shape_set("T10")
    L1 = 1 - xi - eta - zeta
    assert sp.expand(sh.functions[0] - L1 * (2 * L1 - 1)) == 0
    assert sp.expand(sh.functions[4] - 4 * L1 * xi) == 0
    assert sp.expand(sh.functions[9] - 4 * eta * zeta) == 0


# --------------------------------------------------------------------------- map, Jacobian, validity

def test_brick_and_parallelepiped_jacobians():
    el = derive.element("H8", "full", "solid")
    J = el.map("brick").jacobian
    assert J == sp.diag(a, b, c)  # x = a xi, y = b eta, z = c zeta (common practice)
    s = sp.Symbol("s")
    m = el.map("parallelepiped")
    assert m.jacobian == sp.Matrix([[a, 0, 0], [s, b, 0], [0, 0, c]])  # x = a X + s Y (the shear)
    assert m.det == a * b * c
    assert sp.simplify(m.inverse * m.jacobian - sp.eye(3)) == sp.zeros(3, 3)


def test_general_det_against_numpy():
    el = derive.element("H20", "full", "solid")
    rng = np.random.default_rng(3)
    nodes = np.array(el.shapes.nodes, dtype=float) * [2.0, 1.0, 0.5] + 0.05 * rng.standard_normal((20, 3))
    imap = el.map(nodes)
    pt = (R_(1, 3), R_(-1, 5), R_(1, 7))
    J = np.array(imap.jacobian_at(*pt).tolist(), dtype=float)
    # reference library: numpy.linalg.det / inv of the same Jacobian
    det = float(imap.det.subs(dict(zip((xi, eta, zeta), pt))))
    assert_allclose(det, np.linalg.det(J), rtol=1e-12, atol=0)
    Jinv = np.array(imap.inverse.subs(dict(zip((xi, eta, zeta), pt))).tolist(), dtype=float)
    assert_allclose(Jinv, np.linalg.inv(J), rtol=1e-11, atol=1e-12)


def test_validity_reports_and_bad_3d_elements():
    h8 = derive.element("H8", "full", "solid")
    box = [[0, 0, 0], [2, 0, 0], [2, 1, 0], [0, 1, 0], [0, 0, 3], [2, 0, 3], [2, 1, 3], [0, 1, 3]]
    rep = h8.validity(box)
    assert rep["volume"] == pytest.approx(6.0, rel=1e-12)  # 2 x 1 x 3 box (common practice)
    assert rep["det_min"] == pytest.approx(6.0 / 8, rel=1e-12)  # det J = V / 8 (common practice)
    mirrored = box[4:] + box[:4]
    with pytest.raises(GeometryError, match="inverted"):
        h8.validity(mirrored)
    flat = [[x, y, 0] for x, y, _ in box]
    with pytest.raises(GeometryError, match="zero volume"):
        h8.validity(flat)
    twisted = [row[:] for row in box]
    twisted[6] = [-1.0, -0.5, -1.0]  # corner 7 pulled through the element
    with pytest.raises(GeometryError, match=r"changes sign.*node \d+, det J = -"):
        h8.validity(twisted)
    t4 = derive.element("T4", "full", "solid")
    with pytest.raises(GeometryError, match="coplanar"):
        t4.validity([[0, 0, 0], [1, 0, 0], [0, 1, 0], [1, 1, 0]])
    with pytest.raises(InputError, match="needs 3 coordinates"):
        t4.stiffness([[0, 0], [1, 0], [0, 1], [1, 1]], E=1, nu=0.3)
    with pytest.raises(InputError, match="does not fit the 3-D element"):
        h8.map("rectangle")


def test_dimension_mismatch_between_element_and_model():
    with pytest.raises(InputError, match="Q4 is 2-D but state 'solid' is a 3-D model"):
        derive.element("Q4", "full", "solid")
    with pytest.raises(InputError, match="H8 is 3-D but state 'plane-stress'"):
        derive.element("H8", "full", "plane-stress")
    assert derive.element("H8").state == "solid" and derive.element("Q4").state == "plane-stress"


# --------------------------------------------------------------------------- models

def test_model_registry_fields_and_ndof():
    assert models.get("solid").fields == ("u", "v", "w")
    assert models.get("plane-strain").fields == ("u", "v")
    assert derive.element("H20").ndof == 60 and derive.element("T10").ndof == 30  # nodes x 3 fields
    assert derive.element("Q8", "full", "axisymmetric").ndof == 16
    assert models.get("solid").dof_names(2) == ["u1", "v1", "w1", "u2", "v2", "w2"]
    with pytest.raises(InputError, match="unknown state"):
        models.get("shell")


def test_solid_B_reproduces_a_linear_field():
    # a linear displacement u = G x gives the strain eps = sym(G) in Voigt [xx, yy, zz, yz, zx, xy]
    # with engineering shear (textbook definition; common practice, no source)
    el = derive.element("T4", "full", "solid")
    nodes = np.array([[0.1, 0.0, 0.2], [1.3, 0.1, 0.0], [0.2, 1.1, 0.3], [0.0, 0.2, 0.9]])
    G = np.array([[0.3, -0.2, 0.5], [0.7, 0.1, -0.4], [0.2, 0.6, -0.3]])
    u = (nodes @ G.T).ravel()
    B = np.array(el.B([[sp.Rational(str(v)) for v in row] for row in nodes]).tolist(), dtype=float)
    eps = B @ u
    expected = [G[0, 0], G[1, 1], G[2, 2], G[1, 2] + G[2, 1], G[2, 0] + G[0, 2], G[0, 1] + G[1, 0]]
    assert_allclose(eps, expected, rtol=1e-12, atol=1e-12)


def test_solid_rigid_body_modes_are_strain_free():
    el = derive.element("H8", "full", "solid")
    rng = np.random.default_rng(5)
    nodes = np.array(el.shapes.nodes, dtype=float) + 0.1 * rng.standard_normal((8, 3))
    K = el.numeric_stiffness(nodes, 1.0, 0.3)
    modes = np.array(models.get("solid").rigid_body_modes(nodes.T.tolist()), dtype=float).T
    # rigid motions store no energy: K r = 0 (common practice, no source)
    assert_allclose(K @ modes, 0, rtol=0, atol=1e-12)
    assert np.linalg.matrix_rank(modes) == 6


# --------------------------------------------------------------------------- material

def test_isotropic_solid_D_is_the_lame_form():
    # D = lambda m m^T + mu diag(2, 2, 2, 1, 1, 1), engineering shear (Timoshenko & Goodier, from memory)
    Ev, nv = 210.0, 0.3
    lam, mu = Ev * nv / ((1 + nv) * (1 - 2 * nv)), Ev / (2 * (1 + nv))
    m = np.array([1, 1, 1, 0, 0, 0], float)
    expected = lam * np.outer(m, m) + mu * np.diag([2, 2, 2, 1, 1, 1])
    assert_allclose(np.array(D("solid", Ev, nv).tolist(), dtype=float), expected, rtol=1e-13, atol=1e-12)
    Ddev, Dvol, kappa = split("solid")
    assert sp.simplify(kappa - E / (3 * (1 - 2 * nu))) == 0  # bulk modulus E / (3 (1 - 2 nu)), from memory
    assert (Ddev * sp.Matrix([1, 1, 1, 0, 0, 0])).applyfunc(sp.simplify) == sp.zeros(6, 1)  # deviatoric


def test_orthotropic_D_is_the_inverse_compliance():
    consts = dict(E1=140.0, E2=10.0, E3=12.0, nu12=0.3, nu13=0.28, nu23=0.45, G12=5.0, G13=5.5, G23=3.8)
    Dm = np.array(orthotropic(**consts).tolist(), dtype=float)
    E1, E2, E3 = consts["E1"], consts["E2"], consts["E3"]
    n12, n13, n23 = consts["nu12"], consts["nu13"], consts["nu23"]
    # compliance from its textbook definition (Jones, Mechanics of Composite Materials, from memory)
    S = np.zeros((6, 6))
    S[:3, :3] = [[1 / E1, -n12 / E1, -n13 / E1], [-n12 / E1, 1 / E2, -n23 / E2], [-n13 / E1, -n23 / E2, 1 / E3]]
    S[3, 3], S[4, 4], S[5, 5] = 1 / consts["G23"], 1 / consts["G13"], 1 / consts["G12"]
    # reference library: numpy.linalg.inv
    assert_allclose(Dm, np.linalg.inv(S), rtol=1e-12, atol=1e-12)
    assert np.all(np.linalg.eigvalsh(Dm) > 0)
    with pytest.raises(MaterialError, match="not positive definite"):
        orthotropic(1.0, 1.0, 1.0, 0.9, 0.9, 0.9, 1.0, 1.0, 1.0)
    with pytest.raises(MaterialError, match="G23"):
        orthotropic(1.0, 1.0, 1.0, 0.3, 0.3, 0.3, 1.0, 1.0, 0.0)


def test_transversely_isotropic_reduces_to_isotropic():
    Ev, nv = 7.0, 0.25
    Dt = transversely_isotropic(Ev, Ev, nv, nv, Ev / (2 * (1 + nv)))
    # equal constants in every direction give the isotropic D (definition; common practice, no source)
    assert_allclose(np.array(Dt.tolist(), dtype=float), np.array(D("solid", Ev, nv).tolist(), dtype=float),
                    rtol=1e-13, atol=1e-13)
    Dt = np.array(transversely_isotropic(20.0, 5.0, 0.3, 0.2, 2.0).tolist(), dtype=float)
    assert_allclose(Dt[:2, :2], Dt[:2, :2].T, rtol=0, atol=1e-13)
    assert Dt[0, 0] == pytest.approx(Dt[1, 1], rel=1e-13)  # x-y plane of isotropy


def test_anisotropic_D_in_the_stiffness():
    el = derive.element("H8", "full", "solid")
    Dm = transversely_isotropic(20, 5, R_(3, 10), R_(1, 5), 2)
    box = [[0, 0, 0], [1, 0, 0], [1, 1, 0], [0, 1, 0], [0, 0, 1], [1, 0, 1], [1, 1, 1], [0, 1, 1]]
    K = np.array(el.stiffness(box, D=Dm).tolist(), dtype=float)
    assert_allclose(K, K.T, rtol=0, atol=1e-12)
    assert np.sum(np.abs(np.linalg.eigvalsh(K)) < 1e-9 * np.abs(K).max()) == 6  # 6 rigid modes
    with pytest.raises(InputError, match="6 x 6"):
        el.stiffness(box, D=sp.eye(3))
