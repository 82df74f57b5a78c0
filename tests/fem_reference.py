"""Independent textbook finite element routines for the tests (numpy only).

Written from the textbook definitions, not from derive: hand-typed shape functions,
Gauss points from numpy.polynomial.legendre.leggauss (reference library), the 3-point
triangle rule with points (1/6, 1/6), (2/3, 1/6), (1/6, 2/3) and weights 1/6 (Strang &
Fix (1973), from memory), and K = sum_g w_g B^T D B det J t; the bending energy ratio of
a patch from its definition (work of the consistent load of sigma_xx = y over the
continuum's energy).
"""
from __future__ import annotations

import numpy as np


def D_matrix(state: str, E: float, nu: float) -> np.ndarray:
    if state == "plane-stress":
        return E / (1 - nu ** 2) * np.array([[1, nu, 0], [nu, 1, 0], [0, 0, (1 - nu) / 2]])
    if state == "plane-strain":
        f = E / ((1 + nu) * (1 - 2 * nu))
        return f * np.array([[1 - nu, nu, 0], [nu, 1 - nu, 0], [0, 0, (1 - 2 * nu) / 2]])
    f = E / ((1 + nu) * (1 - 2 * nu))
    return f * np.array([[1 - nu, nu, nu, 0], [nu, 1 - nu, nu, 0], [nu, nu, 1 - nu, 0], [0, 0, 0, (1 - 2 * nu) / 2]])


def shape(name: str, s: float, t: float):
    """(N, dN/ds, dN/dt) of the textbook element at reference point (s, t)."""
    if name == "Q4":
        sn = np.array([-1, 1, 1, -1.0]); tn = np.array([-1, -1, 1, 1.0])
        N = (1 + sn * s) * (1 + tn * t) / 4
        return N, sn * (1 + tn * t) / 4, tn * (1 + sn * s) / 4
    if name == "Q8":
        sn = np.array([-1, 1, 1, -1.0]); tn = np.array([-1, -1, 1, 1.0])
        N = np.zeros(8); ds = np.zeros(8); dt = np.zeros(8)
        N[:4] = (1 + sn * s) * (1 + tn * t) * (sn * s + tn * t - 1) / 4
        ds[:4] = sn * (1 + tn * t) * (2 * sn * s + tn * t) / 4
        dt[:4] = tn * (1 + sn * s) * (sn * s + 2 * tn * t) / 4
        # mid-side nodes 5 (0,-1), 6 (1,0), 7 (0,1), 8 (-1,0)
        N[4] = (1 - s * s) * (1 - t) / 2; ds[4] = -s * (1 - t); dt[4] = -(1 - s * s) / 2
        N[5] = (1 + s) * (1 - t * t) / 2; ds[5] = (1 - t * t) / 2; dt[5] = -t * (1 + s)
        N[6] = (1 - s * s) * (1 + t) / 2; ds[6] = -s * (1 + t); dt[6] = (1 - s * s) / 2
        N[7] = (1 - s) * (1 - t * t) / 2; ds[7] = -(1 - t * t) / 2; dt[7] = -t * (1 - s)
        return N, ds, dt
    if name == "Q9":
        def l(x):  # 1-D quadratic Lagrange at -1, 0, 1 and derivatives
            return np.array([x * (x - 1) / 2, 1 - x * x, x * (x + 1) / 2]), np.array([x - 0.5, -2 * x, x + 0.5])
        ls, dls = l(s); lt, dlt = l(t)
        idx = [(0, 0), (2, 0), (2, 2), (0, 2), (1, 0), (2, 1), (1, 2), (0, 1), (1, 1)]
        N = np.array([ls[i] * lt[j] for i, j in idx])
        return N, np.array([dls[i] * lt[j] for i, j in idx]), np.array([ls[i] * dlt[j] for i, j in idx])
    if name == "T3":
        return np.array([1 - s - t, s, t]), np.array([-1.0, 1, 0]), np.array([-1.0, 0, 1])
    if name == "T6":
        L1, L2, L3 = 1 - s - t, s, t
        N = np.array([L1 * (2 * L1 - 1), L2 * (2 * L2 - 1), L3 * (2 * L3 - 1), 4 * L1 * L2, 4 * L2 * L3, 4 * L3 * L1])
        ds = np.array([-(4 * L1 - 1), 4 * L2 - 1, 0, 4 * (L1 - L2), 4 * L3, -4 * L3])
        dt = np.array([-(4 * L1 - 1), 0, 4 * L3 - 1, -4 * L2, 4 * L2, 4 * (L1 - L3)])
        return N, ds, dt
    if name == "Q12":
        return _q12(s, t)
    if name == "T10":
        return _t10(s, t)
    raise KeyError(name)


#: Q12 nodes: corners, then two per edge at the thirds, counter-clockwise from the bottom edge
Q12_NODES = [(-1, -1), (1, -1), (1, 1), (-1, 1), (-1 / 3, -1), (1 / 3, -1), (1, -1 / 3), (1, 1 / 3),
             (1 / 3, 1), (-1 / 3, 1), (-1, 1 / 3), (-1, -1 / 3)]
#: T10 nodes: corners, two per edge at the thirds (edges 1-2, 2-3, 3-1), the centroid
T10_NODES = [(0, 0), (1, 0), (0, 1), (1 / 3, 0), (2 / 3, 0), (2 / 3, 1 / 3), (1 / 3, 2 / 3), (0, 2 / 3), (0, 1 / 3),
             (1 / 3, 1 / 3)]


def _q12(s: float, t: float):
    """12-node cubic serendipity (Zienkiewicz & Taylor, The Finite Element Method, vol. 1, from
    memory): corners (1/32)(1 + s si)(1 + t ti)(9 (s^2 + t^2) - 10); side nodes at si = +-1,
    ti = +-1/3: (9/32)(1 + s si)(1 - t^2)(1 + 9 t ti), and the same with s and t exchanged."""
    N = np.zeros(12); ds = np.zeros(12); dt = np.zeros(12)
    for k, (a, b) in enumerate(Q12_NODES):
        if abs(a) == 1 and abs(b) == 1:
            g = 9 * (s * s + t * t) - 10
            N[k] = (1 + s * a) * (1 + t * b) * g / 32
            ds[k] = (1 + t * b) * (a * g + (1 + s * a) * 18 * s) / 32
            dt[k] = (1 + s * a) * (b * g + (1 + t * b) * 18 * t) / 32
        elif abs(a) == 1:
            N[k] = 9 / 32 * (1 + s * a) * (1 - t * t) * (1 + 9 * t * b)
            ds[k] = 9 / 32 * a * (1 - t * t) * (1 + 9 * t * b)
            dt[k] = 9 / 32 * (1 + s * a) * (-2 * t * (1 + 9 * t * b) + 9 * b * (1 - t * t))
        else:
            N[k] = 9 / 32 * (1 + t * b) * (1 - s * s) * (1 + 9 * s * a)
            ds[k] = 9 / 32 * (1 + t * b) * (-2 * s * (1 + 9 * s * a) + 9 * a * (1 - s * s))
            dt[k] = 9 / 32 * b * (1 - s * s) * (1 + 9 * s * a)
    return N, ds, dt


def _t10(s: float, t: float):
    """10-node cubic triangle in area coordinates L1 = 1 - s - t, L2 = s, L3 = t (Zienkiewicz &
    Taylor, from memory): corners L (3L - 1)(3L - 2) / 2, the side node a third of the way from
    node i towards j (9/2) Li Lj (3 Li - 1), the centroid 27 L1 L2 L3."""
    L = np.array([1 - s - t, s, t])
    dLs = np.array([-1.0, 1.0, 0.0]); dLt = np.array([-1.0, 0.0, 1.0])
    N = np.zeros(10); gL = np.zeros((10, 3))
    for i in range(3):
        N[i] = L[i] * (3 * L[i] - 1) * (3 * L[i] - 2) / 2
        gL[i, i] = (27 * L[i] ** 2 - 18 * L[i] + 2) / 2
    # (node, i nearer, j): 1/3 along 1-2, 2/3 along 1-2, then 2-3 and 3-1 likewise
    for k, (i, j) in enumerate([(0, 1), (1, 0), (1, 2), (2, 1), (2, 0), (0, 2)], start=3):
        N[k] = 4.5 * L[i] * L[j] * (3 * L[i] - 1)
        gL[k, i] = 4.5 * L[j] * (6 * L[i] - 1)
        gL[k, j] = 4.5 * L[i] * (3 * L[i] - 1)
    N[9] = 27 * L[0] * L[1] * L[2]
    gL[9] = 27 * np.array([L[1] * L[2], L[0] * L[2], L[0] * L[1]])
    return N, gL @ dLs, gL @ dLt


def _duffy(n: int):
    """n x n Gauss (numpy leggauss) collapsed onto the reference triangle (Duffy map): exact for
    polynomials of total degree 2n - 2."""
    g, w = np.polynomial.legendre.leggauss(n)
    pts, wts = [], []
    for u, wu in zip(g, w):
        for v, wv in zip(g, w):
            s = (1 + u) / 2
            pts.append((s, (1 - s) * (1 + v) / 2))
            wts.append(wu * wv * (1 - s) / 4)
    return pts, wts


def rule(name: str, full: bool = True):
    """(points, weights) of the element's textbook rule."""
    if name in ("Q4", "Q8", "Q9", "Q12"):
        n = {"Q4": 2, "Q8": 3, "Q9": 3, "Q12": 4}[name] - (0 if full else 1)
        g, w = np.polynomial.legendre.leggauss(n)
        pts = [(x, y) for y in g for x in g]
        wts = [wx * wy for wy in w for wx in w]
        return pts, wts
    if name == "T10":          # degree 4 (full) / 3 (reduced), exact on straight-sided triangles
        return _duffy(4 if full else 3)
    if name == "T3" or (name == "T6" and not full):
        return [(1 / 3, 1 / 3)], [0.5]
    return [(1 / 6, 1 / 6), (2 / 3, 1 / 6), (1 / 6, 2 / 3)], [1 / 6] * 3


def stiffness(name: str, xy: np.ndarray, E: float, nu: float, t: float, state: str = "plane-stress",
              full: bool = True) -> np.ndarray:
    """Textbook K = sum_g w B^T D B det J t (axisymmetric: t replaced by 2 pi r)."""
    D = D_matrix(state, E, nu)
    n = xy.shape[0]
    K = np.zeros((2 * n, 2 * n))
    for (s, q), w in zip(*rule(name, full)):
        N, ds, dt = shape(name, s, q)
        J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
        detJ = np.linalg.det(J)
        dxy = np.linalg.solve(J, np.vstack([ds, dt]))
        if state == "axisymmetric":
            r = N @ xy[:, 0]
            B = np.zeros((4, 2 * n))
            B[0, 0::2] = dxy[0]; B[1, 1::2] = dxy[1]; B[2, 0::2] = N / r
            B[3, 0::2] = dxy[1]; B[3, 1::2] = dxy[0]
            thick = 2 * np.pi * r
        else:
            B = np.zeros((3, 2 * n))
            B[0, 0::2] = dxy[0]; B[1, 1::2] = dxy[1]; B[2, 0::2] = dxy[1]; B[2, 1::2] = dxy[0]
            thick = t
        K += w * detJ * thick * B.T @ D @ B
    return K


REF_NODES = {
    "Q4": [(-1, -1), (1, -1), (1, 1), (-1, 1)],
    "Q8": [(-1, -1), (1, -1), (1, 1), (-1, 1), (0, -1), (1, 0), (0, 1), (-1, 0)],
    "Q9": [(-1, -1), (1, -1), (1, 1), (-1, 1), (0, -1), (1, 0), (0, 1), (-1, 0), (0, 0)],
    "T3": [(0, 0), (1, 0), (0, 1)],
    "T6": [(0, 0), (1, 0), (0, 1), (0.5, 0), (0.5, 0.5), (0, 0.5)],
    "Q12": Q12_NODES,
    "T10": T10_NODES,
}


def random_element(name: str, rng: np.random.Generator, distortion: float = 0.2) -> np.ndarray:
    """A valid distorted element: corners perturbed, mid-side nodes near the edge midpoints.

    The reference nodes are scaled to a 2 x 1.5 element, rotated and shifted; each node
    moves by up to ``distortion`` times the element size.  Validity (det J > 0 at a grid)
    is enforced by rejection.
    """
    ref = np.array(REF_NODES[name], dtype=float)
    while True:
        xy = ref * np.array([1.0, 0.75]) + rng.uniform(-distortion, distortion, ref.shape) * 0.5
        ang = rng.uniform(0, 2 * np.pi)
        Rm = np.array([[np.cos(ang), -np.sin(ang)], [np.sin(ang), np.cos(ang)]])
        xy = xy @ Rm.T * rng.uniform(0.5, 3.0) + rng.uniform(-5, 5, 2)
        if _valid(name, xy):
            return xy


def _valid(name: str, xy: np.ndarray) -> bool:
    grid = np.linspace(-1, 1, 9) if name[0] == "Q" else np.linspace(0, 1, 9)
    for s in grid:
        for q in grid:
            if name[0] == "T" and s + q > 1:
                continue
            N, ds, dt = shape(name, s, q)
            J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
            if np.linalg.det(J) <= 0:
                return False
    return True


def _load_points(name: str):
    """Reference points and weights exact for the degree-2 load integrands: a 6 x 6 Gauss rule
    (numpy leggauss) on the square, the same collapsed onto the triangle (Duffy map)."""
    g, w = np.polynomial.legendre.leggauss(6)
    if name[0] == "Q":
        return [(s, q, ws * wq) for s, ws in zip(g, w) for q, wq in zip(g, w)]
    out = []
    for u, wu in zip(g, w):
        for v, wv in zip(g, w):
            s = (1 + u) / 2
            out.append((s, (1 - s) * (1 + v) / 2, wu * wv * (1 - s) / 4))
    return out


def bending_energy_ratio(name: str, elements: list, stiffness, compliance: float = 1.0) -> float:
    """Bending locking ratio of a patch of elements (each an (n, 2) node array), ``stiffness(xy)``
    giving each element matrix (E = 1, t = 1); ``compliance``: 1 in plane stress, 1 - nu^2 in
    plane strain (the continuum's energy density is compliance * sigma_xx^2 / 2).

    Energy ratio of the patch's response to the consistent load of sigma_xx = y (E = 1,
    plane stress) over the continuum's energy int y^2 dA, written from the definition:
    f = int B^T sigma dA, the patch supported on u, v at its first node and v at its second
    (statically determinate; the load is self-equilibrated), work f . K^-1 f."""
    keys: dict = {}
    conn = [[keys.setdefault((round(x, 12), round(y, 12)), len(keys)) for x, y in xy] for xy in elements]
    nd = 2 * len(keys)
    K = np.zeros((nd, nd)); f = np.zeros(nd); second = 0.0
    for xy, nodes in zip(elements, conn):
        dofs = np.ravel([[2 * n, 2 * n + 1] for n in nodes])
        K[np.ix_(dofs, dofs)] += stiffness(xy)
        for s, q, wt in _load_points(name):
            N, ds, dt = shape(name, s, q)
            J = np.array([[ds @ xy[:, 0], ds @ xy[:, 1]], [dt @ xy[:, 0], dt @ xy[:, 1]]])
            dxy = np.linalg.solve(J, np.vstack([ds, dt]))
            dA = wt * np.linalg.det(J)
            yy = N @ xy[:, 1]
            f[dofs[0::2]] += dxy[0] * yy * dA
            second += yy * yy * dA
    free = [k for k in range(nd) if k not in (0, 1, 3)]
    u = np.linalg.solve(K[np.ix_(free, free)], f[free])
    return float(f[free] @ u / (compliance * second))
