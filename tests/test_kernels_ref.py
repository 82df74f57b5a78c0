"""Independent reference for the generated-kernel tests (numpy only; no tests in here).

Everything is written from the textbook definitions, not from derive's symbolic routes:
hand-typed shape functions and derivatives, Gauss points and weights from
``numpy.polynomial.legendre.leggauss`` (reference library), the triangle rules typed in
from Dunavant (1985) (degree 1: centroid, weight 1/2; degree 2: (1/6, 1/6), (2/3, 1/6),
(1/6, 2/3), weights 1/6; from memory), textbook D matrices, and each variant from its
published method:

* selective: Doherty, Wilson & Taylor (1969); Hughes (1987) Sec. 4.4 (from memory):
  D = D_dev + kappa m m^T, D_dev with the full rule, kappa m m^T with the reduced rule;
* incompatible: Wilson, Taylor, Doherty & Ghaboussi (1973) (from memory): bubble
  displacements (1 - xi^2), (1 - eta^2) in u and v, derivatives through the point's own
  Jacobian, condensed;
* incompatible-centred: Taylor, Beresford & Wilson (1976) (from memory): the bubble
  derivatives through the centre Jacobian, scaled by det J0 / det J;
* bbar: Hughes (1980) (from memory): the dilatation projected onto a pressure space pi,
  K = int B^T D_dev B dV + kappa g^T M_p^-1 g, g = int pi^T m^T B dV, M_p = int pi^T pi dV;
  constant pi for Q4 (mean dilatation, Nagtegaal, Parks & Rice 1974), {1, xi, eta} for the
  quadratic elements;
* eas4: Simo & Rifai (1990) (from memory): eps_enh = (det J0 / det J) T0^-T E(xi, eta)
  alpha with T0 the covariant-to-physical strain map at the centre (built here by
  transforming unit strain tensors, eps~ = J0 eps J0^T);
* hybrid5: Pian & Sumihara (1984) (from memory): constant stresses plus contravariant
  reference stresses tau^11 = eta beta_4, tau^22 = xi beta_5 mapped with the centre
  Jacobian, sigma = J0^T tau J0; K = G^T H^-1 G.

The split is the three-dimensional deviatoric/volumetric one, kappa = lambda + 2 mu / 3 (the
bulk modulus; in plane strain m^T eps is the volume change since eps_zz = 0), with the
textbook plane-stress reduction lambda* = 2 lambda mu / (lambda + 2 mu) in plane stress;
Hughes (1987) Sec. 4.4, from memory.
"""
from __future__ import annotations

import numpy as np

SQ_CORNERS = np.array([[-1.0, -1.0], [1.0, -1.0], [1.0, 1.0], [-1.0, 1.0]])


# ---------------------------------------------------------------------------------------------
# quadrature

def gauss_square(n: int):
    # reference library: numpy.polynomial.legendre.leggauss
    x, w = np.polynomial.legendre.leggauss(n)
    pts = np.array([[x[i], x[j]] for j in range(n) for i in range(n)])
    wts = np.array([w[i] * w[j] for j in range(n) for i in range(n)])
    return pts, wts


def triangle_rule(degree: int):
    # Dunavant (1985), degree 1 and 2 rules on the triangle (0,0), (1,0), (0,1); from memory
    if degree == 1:
        return np.array([[1 / 3, 1 / 3]]), np.array([0.5])
    if degree == 2:
        return np.array([[1 / 6, 1 / 6], [2 / 3, 1 / 6], [1 / 6, 2 / 3]]), np.full(3, 1 / 6)
    raise ValueError(degree)


# textbook practice: Q4 2x2 / 1x1, Q8 and Q9 3x3 / 2x2, T3 one point, T6 three / one point
RULES = {
    "T3": {"full": lambda: triangle_rule(1), "reduced": lambda: triangle_rule(1)},
    "T6": {"full": lambda: triangle_rule(2), "reduced": lambda: triangle_rule(1)},
    "Q4": {"full": lambda: gauss_square(2), "reduced": lambda: gauss_square(1)},
    "Q8": {"full": lambda: gauss_square(3), "reduced": lambda: gauss_square(2)},
    "Q9": {"full": lambda: gauss_square(3), "reduced": lambda: gauss_square(2)},
}
CENTRE = {"T3": (1 / 3, 1 / 3), "T6": (1 / 3, 1 / 3), "Q4": (0.0, 0.0), "Q8": (0.0, 0.0), "Q9": (0.0, 0.0)}
NODES = {"T3": 3, "T6": 6, "Q4": 4, "Q8": 8, "Q9": 9}


# ---------------------------------------------------------------------------------------------
# shape functions (textbook forms, typed in)

def shape(name: str, s: float, r: float):
    """(N, dN/dxi, dN/deta) at reference point (s, r) = (xi, eta)."""
    if name == "T3":
        return np.array([1 - s - r, s, r]), np.array([-1.0, 1.0, 0.0]), np.array([-1.0, 0.0, 1.0])
    if name == "T6":
        L1, L2, L3 = 1 - s - r, s, r
        N = np.array([L1 * (2 * L1 - 1), L2 * (2 * L2 - 1), L3 * (2 * L3 - 1), 4 * L1 * L2, 4 * L2 * L3, 4 * L3 * L1])
        ds = np.array([-(4 * L1 - 1), 4 * L2 - 1, 0.0, 4 * (L1 - L2), 4 * L3, -4 * L3])
        dr = np.array([-(4 * L1 - 1), 0.0, 4 * L3 - 1, -4 * L2, 4 * L2, 4 * (L1 - L3)])
        return N, ds, dr
    si, ri = SQ_CORNERS[:, 0], SQ_CORNERS[:, 1]
    if name == "Q4":
        return (1 + si * s) * (1 + ri * r) / 4, si * (1 + ri * r) / 4, ri * (1 + si * s) / 4
    if name == "Q8":
        N = np.zeros(8)
        ds = np.zeros(8)
        dr = np.zeros(8)
        N[:4] = (1 + si * s) * (1 + ri * r) * (si * s + ri * r - 1) / 4
        ds[:4] = si * (1 + ri * r) * (2 * si * s + ri * r) / 4
        dr[:4] = ri * (1 + si * s) * (si * s + 2 * ri * r) / 4
        # mid-side nodes (0,-1), (1,0), (0,1), (-1,0)
        N[4], ds[4], dr[4] = (1 - s * s) * (1 - r) / 2, -s * (1 - r), -(1 - s * s) / 2
        N[5], ds[5], dr[5] = (1 + s) * (1 - r * r) / 2, (1 - r * r) / 2, -r * (1 + s)
        N[6], ds[6], dr[6] = (1 - s * s) * (1 + r) / 2, -s * (1 + r), (1 - s * s) / 2
        N[7], ds[7], dr[7] = (1 - s) * (1 - r * r) / 2, -(1 - r * r) / 2, -r * (1 - s)
        return N, ds, dr
    if name == "Q9":
        def lag(x):  # quadratic Lagrange polynomials at -1, 0, 1 and their derivatives
            return (np.array([x * (x - 1) / 2, 1 - x * x, x * (x + 1) / 2]), np.array([x - 0.5, -2 * x, x + 0.5]))
        ls, dls = lag(s)
        lr, dlr = lag(r)
        idx = [(0, 0), (2, 0), (2, 2), (0, 2), (1, 0), (2, 1), (1, 2), (0, 1), (1, 1)]
        return (np.array([ls[i] * lr[j] for i, j in idx]), np.array([dls[i] * lr[j] for i, j in idx]),
                np.array([ls[i] * dlr[j] for i, j in idx]))
    raise ValueError(name)


# ---------------------------------------------------------------------------------------------
# material

def D_matrix(state: str, E: float, nu: float) -> np.ndarray:
    # textbook isotropic elasticity, Voigt [xx, yy, xy] / [rr, zz, tt, rz], engineering shear
    if state == "plane-stress":
        return E / (1 - nu ** 2) * np.array([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])
    f = E / ((1 + nu) * (1 - 2 * nu))
    if state == "plane-strain":
        return f * np.array([[1 - nu, nu, 0], [nu, 1 - nu, 0], [0, 0, (1 - 2 * nu) / 2]])
    return f * np.array([[1 - nu, nu, nu, 0], [nu, 1 - nu, nu, 0], [nu, nu, 1 - nu, 0], [0, 0, 0, (1 - 2 * nu) / 2]])


def bulk(state: str, E: float, nu: float) -> float:
    lam, mu = E * nu / ((1 + nu) * (1 - 2 * nu)), E / (2 * (1 + nu))
    if state == "plane-stress":
        lam = 2 * lam * mu / (lam + 2 * mu)      # plane-stress lambda*, textbook
    return lam + 2 * mu / 3


def m_vector(state: str) -> np.ndarray:
    return np.array([1.0, 1.0, 1.0, 0.0]) if state == "axisymmetric" else np.array([1.0, 1.0, 0.0])


# ---------------------------------------------------------------------------------------------
# per-point kinematics for a batch of elements

class PointData:
    """J, det J, physical derivatives, B and the volume factor at one point for all elements."""

    def __init__(self, name, state, X, s, r, t):
        N, ds, dr = shape(name, s, r)
        dref = np.array([ds, dr])                       # (2, nodes)
        self.N, self.dref = N, dref
        self.J = np.einsum("an,enb->eab", dref, X)       # J[a, b] = d x_b / d xi_a
        J = self.J
        self.det = J[:, 0, 0] * J[:, 1, 1] - J[:, 0, 1] * J[:, 1, 0]
        self.dxy = np.linalg.solve(J, np.broadcast_to(dref, (X.shape[0],) + dref.shape))
        self.r = X[:, :, 0] @ N
        self.dV = self.det * (2 * np.pi * self.r if state == "axisymmetric" else t)
        self.B = strain_matrix(state, N, self.dxy, self.r)
        self.s, self.rr = s, r


def strain_matrix(state, N, dxy, radius) -> np.ndarray:
    """B for a displacement field with shape values N (k,) and derivatives dxy (e, 2, k)."""
    e, _, k = dxy.shape
    rows = 4 if state == "axisymmetric" else 3
    B = np.zeros((e, rows, 2 * k))
    B[:, 0, 0::2] = dxy[:, 0]
    B[:, 1, 1::2] = dxy[:, 1]
    if state == "axisymmetric":
        B[:, 2, 0::2] = np.asarray(N)[None, :] / radius[:, None]
        B[:, 3, 0::2] = dxy[:, 1]
        B[:, 3, 1::2] = dxy[:, 0]
    else:
        B[:, 2, 0::2] = dxy[:, 1]
        B[:, 2, 1::2] = dxy[:, 0]
    return B


def points(name, state, X, which, t):
    pts, wts = RULES[name][which]()
    return [(PointData(name, state, X, s, r, t), w) for (s, r), w in zip(pts, wts)]


def centre_jacobian(name, X):
    s, r = CENTRE[name]
    N, ds, dr = shape(name, s, r)
    return np.einsum("an,enb->eab", np.array([ds, dr]), X)


# ---------------------------------------------------------------------------------------------
# blocks per variant: returns (Kuu, Kua, Kaa) with Kua/Kaa None for plain elements

def pressure(name, s, r) -> np.ndarray:
    """Pressure space of B-bar: constant for Q4 (mean dilatation, Nagtegaal, Parks & Rice 1974),
    linear {1, xi, eta} for the quadratic elements (the three-parameter pressure of the mixed
    quadratic elements; the choice documented for derive's B-bar)."""
    return np.array([1.0]) if name == "Q4" else np.array([1.0, s, r])


def _bubbles(s, r):
    return np.array([1 - s * s, 1 - r * r]), np.array([-2 * s, 0.0]), np.array([0.0, -2 * r])


def blocks(name, variant, state, X, E, nu, t):
    D = D_matrix(state, E, nu)
    n = X.shape[0]
    nd = 2 * NODES[name]
    if variant in ("full", "reduced"):
        K = sum(np.einsum("eki,kl,elj->eij", p.B, D, p.B) * (w * p.dV)[:, None, None]
                for p, w in points(name, state, X, variant, t))
        return K, None, None
    m = m_vector(state)
    kappa = bulk(state, E, nu)
    Dvol = kappa * np.outer(m, m)
    Ddev = D - Dvol
    if variant == "selective":
        K = sum(np.einsum("eki,kl,elj->eij", p.B, Ddev, p.B) * (w * p.dV)[:, None, None]
                for p, w in points(name, state, X, "full", t))
        K = K + sum(np.einsum("eki,kl,elj->eij", p.B, Dvol, p.B) * (w * p.dV)[:, None, None]
                    for p, w in points(name, state, X, "reduced", t))
        return K, None, None
    pts = points(name, state, X, "full", t)
    if variant == "bbar":
        # B-bar: the dilatation m^T B u projected onto the pressure space pi (L2 projection),
        # K = K_dev + kappa g^T M_p^-1 g, g = int pi^T m^T B dV, M_p = int pi^T pi dV, written as
        # a condensation with K_ua = g^T, K_aa = -M_p / kappa
        Kuu = sum(np.einsum("eki,kl,elj->eij", p.B, Ddev, p.B) * (w * p.dV)[:, None, None] for p, w in pts)
        g = sum(np.einsum("a,eki,k->eai", pressure(name, p.s, p.rr), p.B, m) * (w * p.dV)[:, None, None]
                for p, w in pts)
        Mp = sum(np.outer(pressure(name, p.s, p.rr), pressure(name, p.s, p.rr))[None] * (w * p.dV)[:, None, None]
                 for p, w in pts)
        return Kuu, np.transpose(g, (0, 2, 1)), -Mp / kappa
    J0 = centre_jacobian(name, X)
    det0 = J0[:, 0, 0] * J0[:, 1, 1] - J0[:, 0, 1] * J0[:, 1, 0]
    if variant in ("incompatible", "incompatible-centred"):
        Kuu = np.zeros((n, nd, nd))
        Kua = np.zeros((n, nd, 4))
        Kaa = np.zeros((n, 4, 4))
        for p, w in pts:
            P, dPs, dPr = _bubbles(p.s, p.rr)
            dref = np.array([dPs, dPr])
            if variant == "incompatible":
                dP = np.linalg.solve(p.J, np.broadcast_to(dref, (n, 2, 2)))
            else:
                dP = np.linalg.solve(J0, np.broadcast_to(dref, (n, 2, 2))) * (det0 / p.det)[:, None, None]
            G = strain_matrix(state, P, dP, p.r)
            c = (w * p.dV)[:, None, None]
            Kuu += np.einsum("eki,kl,elj->eij", p.B, D, p.B) * c
            Kua += np.einsum("eki,kl,elj->eij", p.B, D, G) * c
            Kaa += np.einsum("eki,kl,elj->eij", G, D, G) * c
        return Kuu, Kua, Kaa
    if variant == "eas4":
        # covariant-to-physical Voigt strain map at the centre: eps~ = J0 eps J0^T
        A = np.zeros((n, 3, 3))
        for k in range(3):
            v = np.zeros(3)
            v[k] = 1.0
            eps = np.array([[v[0], v[2] / 2], [v[2] / 2, v[1]]])
            et = np.einsum("eab,bc,edc->ead", J0, eps, J0)
            A[:, 0, k], A[:, 1, k], A[:, 2, k] = et[:, 0, 0], et[:, 1, 1], 2 * et[:, 0, 1]
        Kuu = np.zeros((n, nd, nd))
        Kua = np.zeros((n, nd, 4))
        Kaa = np.zeros((n, 4, 4))
        for p, w in pts:
            Em = np.array([[p.s, 0, 0, 0], [0, p.rr, 0, 0], [0, 0, p.s, p.rr]])
            M = np.linalg.solve(A, np.broadcast_to(Em, (n, 3, 4))) * (det0 / p.det)[:, None, None]
            c = (w * p.dV)[:, None, None]
            Kuu += np.einsum("eki,kl,elj->eij", p.B, D, p.B) * c
            Kua += np.einsum("eki,kl,elj->eij", p.B, D, M) * c
            Kaa += np.einsum("eki,kl,elj->eij", M, D, M) * c
        return Kuu, Kua, Kaa
    if variant == "hybrid5":
        C = np.linalg.inv(D)
        H = np.zeros((n, 5, 5))
        G = np.zeros((n, 5, nd))
        for p, w in pts:
            P = hybrid_P(J0, p.s, p.rr)
            c = (w * p.dV)[:, None, None]
            H += np.einsum("eki,kl,elj->eij", P, C, P) * c
            G += np.einsum("eki,ekj->eij", P, p.B) * c
        # K = G^T H^-1 G, i.e. K_uu = 0, K_ua = G^T, K_aa = -H
        return np.zeros((n, nd, nd)), np.transpose(G, (0, 2, 1)), -H
    raise KeyError(f"no independent reference for variant {variant!r}")


def hybrid_P(J0, s, r) -> np.ndarray:
    """(e, 3, 5) stress modes: constants + J0^T diag(eta beta4, xi beta5) J0 in Voigt form."""
    n = J0.shape[0]
    P = np.zeros((n, 3, 5))
    P[:, 0, 0] = P[:, 1, 1] = P[:, 2, 2] = 1.0
    for col, (a, amp) in ((3, (0, r)), (4, (1, s))):
        tau = np.zeros((2, 2))
        tau[a, a] = amp
        sig = np.einsum("eai,ab,ebj->eij", J0, tau, J0)   # sigma_ij = J_ai tau^ab J_bj
        P[:, 0, col], P[:, 1, col], P[:, 2, col] = sig[:, 0, 0], sig[:, 1, 1], sig[:, 0, 1]
    return P


def stiffness(name, variant, state, X, E, nu, t):
    Kuu, Kua, Kaa = blocks(name, variant, state, X, E, nu, t)
    if Kua is None:
        return Kuu
    return Kuu - Kua @ np.linalg.solve(Kaa, np.transpose(Kua, (0, 2, 1)))


def recovery(name, variant, state, X, U, E, nu):
    """(strain, stress) at the full rule's points, each (e, points, nstrain), from the method."""
    D = D_matrix(state, E, nu)
    t = 1.0
    Kuu, Kua, Kaa = blocks(name, variant, state, X, E, nu, t)
    alpha = None
    if Kua is not None:
        alpha = -np.linalg.solve(Kaa, np.einsum("eia,ei->ea", Kua, U)[:, :, None])[:, :, 0]
    pts = points(name, state, X, "full", t)
    n = X.shape[0]
    strains = []
    for p, w in pts:
        eps = np.einsum("eki,ei->ek", p.B, U)
        if variant == "bbar":
            m = m_vector(state)
            nm = m @ m
            # the projected dilatation theta_bar = pi M_p^-1 g u replaces m^T B u; with the
            # condensed pressure parameters alpha = kappa M_p^-1 g u it is pi alpha / kappa
            theta = np.einsum("a,ea->e", pressure(name, p.s, p.rr), alpha) / bulk(state, E, nu)
            eps = eps - np.outer(eps @ m, m) / nm + np.outer(theta, m) / nm
        elif variant in ("incompatible", "incompatible-centred"):
            J0 = centre_jacobian(name, X)
            det0 = J0[:, 0, 0] * J0[:, 1, 1] - J0[:, 0, 1] * J0[:, 1, 0]
            P, dPs, dPr = _bubbles(p.s, p.rr)
            dref = np.array([dPs, dPr])
            if variant == "incompatible":
                dP = np.linalg.solve(p.J, np.broadcast_to(dref, (n, 2, 2)))
            else:
                dP = np.linalg.solve(J0, np.broadcast_to(dref, (n, 2, 2))) * (det0 / p.det)[:, None, None]
            eps = eps + np.einsum("eka,ea->ek", strain_matrix(state, P, dP, p.r), alpha)
        elif variant == "eas4":
            J0 = centre_jacobian(name, X)
            det0 = J0[:, 0, 0] * J0[:, 1, 1] - J0[:, 0, 1] * J0[:, 1, 0]
            A = np.zeros((n, 3, 3))
            for k in range(3):
                v = np.zeros(3)
                v[k] = 1.0
                e2 = np.array([[v[0], v[2] / 2], [v[2] / 2, v[1]]])
                et = np.einsum("eab,bc,edc->ead", J0, e2, J0)
                A[:, 0, k], A[:, 1, k], A[:, 2, k] = et[:, 0, 0], et[:, 1, 1], 2 * et[:, 0, 1]
            Em = np.array([[p.s, 0, 0, 0], [0, p.rr, 0, 0], [0, 0, p.s, p.rr]])
            M = np.linalg.solve(A, np.broadcast_to(Em, (n, 3, 4))) * (det0 / p.det)[:, None, None]
            eps = eps + np.einsum("eka,ea->ek", M, alpha)
        elif variant == "hybrid5":
            J0 = centre_jacobian(name, X)
            sig = np.einsum("eka,ea->ek", hybrid_P(J0, p.s, p.rr), alpha)
            eps = sig @ np.linalg.inv(D).T              # the strain of the assumed stress
        strains.append(eps)
    strain = np.stack(strains, axis=1)
    return strain, strain @ D.T


def min_detJ(name, X):
    return np.min(np.stack([p.det for p, _ in points(name, "plane-stress", X, "full", 1.0)]), axis=0)


# ---------------------------------------------------------------------------------------------
# random valid distorted elements

def random_elements(name: str, n: int, rng, axisymmetric: bool = False) -> np.ndarray:
    """n random valid distorted elements: perturbed corners, curved edges, random similarity map.

    Valid: det J > 0.15 x its mean on a 5 x 5 Gauss grid (or the triangle's points) and at
    the rule points, so that every element is well inside the admissible set.
    """
    out = []
    while len(out) < n:
        m = 2 * (n - len(out)) + 8
        X = _candidates(name, m, rng)
        # random rotation, log-uniform scale, translation
        th = rng.uniform(0, 2 * np.pi, m)
        sc = np.exp(rng.uniform(np.log(0.3), np.log(3.0), m))
        R = np.stack([np.stack([np.cos(th), -np.sin(th)], -1), np.stack([np.sin(th), np.cos(th)], -1)], 1)
        X = np.einsum("eij,enj->eni", R, X) * sc[:, None, None]
        if axisymmetric:
            X[:, :, 0] += -X[:, :, 0].min(axis=1)[:, None] + rng.uniform(0.2, 3.0, m)[:, None]
            X[:, :, 1] += rng.uniform(-5, 5, m)[:, None]
        else:
            X += rng.uniform(-5, 5, (m, 1, 2))
        ok = _valid(name, X)
        out.extend(X[ok])
    return np.array(out[:n])


def _candidates(name, m, rng):
    if name in ("T3", "T6"):
        c = np.array([[0.0, 0.0], [1.0, 0.0], [0.0, 1.0]])[None] + rng.uniform(-0.15, 0.15, (m, 3, 2))
        if name == "T3":
            return c
        mids = np.stack([(c[:, 0] + c[:, 1]) / 2, (c[:, 1] + c[:, 2]) / 2, (c[:, 2] + c[:, 0]) / 2], 1)
        return np.concatenate([c, mids + rng.uniform(-0.05, 0.05, (m, 3, 2))], axis=1)
    c = SQ_CORNERS[None] + rng.uniform(-0.3, 0.3, (m, 4, 2))
    if name == "Q4":
        return c
    mids = np.stack([(c[:, k] + c[:, (k + 1) % 4]) / 2 for k in range(4)], 1) + rng.uniform(-0.12, 0.12, (m, 4, 2))
    X = np.concatenate([c, mids], axis=1)
    if name == "Q9":
        X = np.concatenate([X, (c.mean(axis=1) + rng.uniform(-0.12, 0.12, (m, 2)))[:, None]], axis=1)
    return X


def _valid(name, X):
    if name in ("T3", "T6"):
        probe = np.array([[1 / 6, 1 / 6], [2 / 3, 1 / 6], [1 / 6, 2 / 3], [1 / 3, 1 / 3], [0.02, 0.02], [0.96, 0.02],
                          [0.02, 0.96], [0.5, 0.02], [0.49, 0.49], [0.02, 0.5]])
    else:
        g, _ = gauss_square(5)
        probe = np.concatenate([g, 0.98 * SQ_CORNERS])
    dets = []
    for s, r in probe:
        N, ds, dr = shape(name, s, r)
        J = np.einsum("an,enb->eab", np.array([ds, dr]), X)
        dets.append(J[:, 0, 0] * J[:, 1, 1] - J[:, 0, 1] * J[:, 1, 0])
    dets = np.array(dets)
    return np.all(dets > 0.15 * dets.mean(axis=0), axis=0) & (dets.mean(axis=0) > 0)


def rigid_modes(X, state):
    """Nodal displacement vectors (e, modes, ndof) of the rigid-body motions."""
    n, k, _ = X.shape
    tx = np.zeros((n, 2 * k))
    tx[:, 0::2] = 1.0
    ty = np.zeros((n, 2 * k))
    ty[:, 1::2] = 1.0
    if state == "axisymmetric":
        return ty[:, None]
    rot = np.zeros((n, 2 * k))
    rot[:, 0::2] = -X[:, :, 1]
    rot[:, 1::2] = X[:, :, 0]
    return np.stack([tx, ty, rot], axis=1)
