"""Patch tests: the constant-strain test on the published five-element patch, and a higher-order one.

The patch (MacNeal & Harder, 1985): a 0.24 x 0.12 rectangle with four interior nodes at
(0.04, 0.02), (0.18, 0.03), (0.16, 0.08), (0.08, 0.08) forming five quadrilaterals;
E = 1.0e6, nu = 0.25, t = 0.001.  Triangles split every quadrilateral along its diagonal
from its first corner; quadratic elements put mid-side nodes at the straight-edge
midpoints (Q9: the interior node at the bilinear centre).

Fields
  * constant strain: u = 1e-3 (x + y/2), v = 1e-3 (y + x/2), so eps_x = eps_y = gamma_xy = 1e-3
    and, in plane stress, sigma_x = sigma_y = 1333.33, tau_xy = 400;
  * higher order (quadratic elements): pure bending about the patch's mid-depth y0 = 0.06,
    sigma_x = c (y - y0), sigma_y = tau_xy = 0, c = 1e4: an equilibrium field with quadratic
    displacements u = A x Y, v = -A x^2 / 2 + B Y^2 / 2 (Y = y - y0; plane stress A = c / E,
    B = -nu c / E; plane strain A = c (1 - nu^2) / E, B = -nu (1 + nu) c / E).

Forms
  * displacement-driven: every boundary node takes the exact displacement; the interior
    nodes are solved for;
  * force-driven: the boundary carries the consistent loads of the exact tractions
    sigma . n; only three DOFs are prescribed (u, v at the origin and v at (0.24, 0), to
    their exact values) to remove the rigid-body motion.
A test passes when every nodal displacement matches the field and the stresses D B u at
the rule points match the exact ones, both to ``tol`` (1e-6) relative to the field's largest value.
"""
from __future__ import annotations

import numpy as np

from . import catalog
from . import mesh as M
from .analysis import analyse
from .errors import InputError
from .limits import check_tolerance
from .output import fmt

PATCH_CORNERS = ((0.0, 0.0), (0.24, 0.0), (0.24, 0.12), (0.0, 0.12))
PATCH_INTERIOR = ((0.04, 0.02), (0.18, 0.03), (0.16, 0.08), (0.08, 0.08))
PATCH_QUADS = ((0, 1, 5, 4), (1, 2, 6, 5), (2, 3, 7, 6), (3, 0, 4, 7), (4, 5, 6, 7))
PATCH_MATERIAL = {"E": 1.0e6, "nu": 0.25, "t": 0.001}
EXPECTED_STRESS = (4000.0 / 3.0, 4000.0 / 3.0, 400.0)   # plane stress, the published values (1333, 1333, 400)
PATCHES = ("distorted", "regular")
FORMS = ("displacement", "force")
ORDERS = ("constant", "higher")
W, H = 0.24, 0.12


def patch_mesh(element: str, patch: str = "distorted") -> M.Mesh:
    """The five-element patch (``distorted``) or a regular 2 x 2 mesh of the same rectangle, for ``element``."""
    ref = M.ref_element(element)
    if patch == "distorted":
        nodes = np.array(PATCH_CORNERS + PATCH_INTERIOR)
        quads = np.array(PATCH_QUADS)
    elif patch == "regular":
        xs, ys = np.array([0.0, W / 2, W]), np.array([0.0, H / 2, H])
        nodes = np.array([[x, y] for y in ys for x in xs])
        quads = np.array([[j * 3 + i, j * 3 + i + 1, (j + 1) * 3 + i + 1, (j + 1) * 3 + i] for j in range(2)
                          for i in range(2)])
    else:
        raise InputError(f"unknown patch {patch!r}; allowed: {', '.join(PATCHES)}")
    if ref.domain == "triangle":
        cells = np.concatenate([quads[:, [0, 1, 2]], quads[:, [0, 2, 3]]])
    else:
        cells = quads
    m = M.from_corners(element, nodes, cells, label=f"{patch} patch")
    m.check()
    return m


def constant_field(x, y):
    return 1e-3 * (x + y / 2), 1e-3 * (y + x / 2)


def _bending(state: str, E: float, nu: float, c: float = 1e4, y0: float = H / 2):
    if state == "plane-stress":
        A, Bc = c / E, -nu * c / E
    else:
        A, Bc = c * (1 - nu ** 2) / E, -nu * (1 + nu) * c / E

    def field(x, y):
        Y = y - y0
        return A * x * Y, -A * x ** 2 / 2 + Bc * Y ** 2 / 2

    def stress(x, y):
        Y = y - y0
        z = np.zeros_like(Y)
        return np.stack([c * Y, z, z], axis=-1)

    return field, stress


def _constant_stress(state: str, E: float, nu: float):
    D = M._D(state, E, nu)
    sig = D @ np.array([1e-3, 1e-3, 1e-3])

    def stress(x, y):
        return np.broadcast_to(sig, np.shape(x) + (3,)).copy()

    return sig, stress


def run_one(element: str, variant: str = "full", state: str = "plane-stress", form: str = "displacement",
            order: str = "constant", patch: str = "distorted", tol: float = 1e-6, provider=None) -> dict:
    """One patch test; returns a dict with ``passed`` and the relative errors."""
    if state not in ("plane-stress", "plane-strain"):
        raise InputError(f"the patch tests here are for plane states; got {state!r}")
    if form not in FORMS:
        raise InputError(f"unknown patch-test form {form!r}; allowed: {', '.join(FORMS)}")
    if order not in ORDERS:
        raise InputError(f"unknown patch-test order {order!r}; allowed: {', '.join(ORDERS)}")
    from .element import element as make_element
    el = make_element(element, variant, state)
    mat = PATCH_MATERIAL
    E, nu, t = mat["E"], mat["nu"], mat["t"]
    mesh = patch_mesh(el.name, patch)
    if order == "constant":
        field = constant_field
        _, stress = _constant_stress(state, E, nu)
    else:
        if M.ref_element(el.name).n_nodes <= M.ref_element(el.name).n_corners:
            raise InputError(f"the higher-order patch test is for quadratic elements; {el.name} is linear")
        field, stress = _bending(state, E, nu)
    X, Y = mesh.nodes[:, 0], mesh.nodes[:, 1]
    ue, ve = field(X, Y)
    exact = np.empty(mesh.ndof)
    exact[0::2], exact[1::2] = ue, ve
    on_boundary = (np.abs(X) < 1e-12) | (np.abs(X - W) < 1e-12) | (np.abs(Y) < 1e-12) | (np.abs(Y - H) < 1e-12)
    if form == "displacement":
        fixed = {}
        for n in np.nonzero(on_boundary)[0]:
            fixed[2 * int(n)] = float(exact[2 * n])
            fixed[2 * int(n) + 1] = float(exact[2 * n + 1])
        f = np.zeros(mesh.ndof)
    else:
        f = np.zeros(mesh.ndof)
        sides = {"left": (lambda x, y: np.abs(x) < 1e-12, (-1.0, 0.0)),
                 "right": (lambda x, y: np.abs(x - W) < 1e-12, (1.0, 0.0)),
                 "bottom": (lambda x, y: np.abs(y) < 1e-12, (0.0, -1.0)),
                 "top": (lambda x, y: np.abs(y - H) < 1e-12, (0.0, 1.0))}
        for _, (pred, (nx_, ny_)) in sides.items():
            def traction(x, y, _nx, _ny, nx_=nx_, ny_=ny_):
                s = stress(x, y)
                return s[..., 0] * nx_ + s[..., 2] * ny_, s[..., 2] * nx_ + s[..., 1] * ny_
            f += M.edge_load(mesh, pred, traction, state, t)
        n0, n1 = mesh.node_at(0.0, 0.0), mesh.node_at(W, 0.0)
        fixed = {2 * n0: float(exact[2 * n0]), 2 * n0 + 1: float(exact[2 * n0 + 1]), 2 * n1 + 1: float(exact[2 * n1 + 1])}
    base = {"element": el.name, "variant": variant, "state": state, "form": form, "order": order, "patch": patch,
            "tolerance": tol, "elements": mesh.n_elements, "nodes": mesh.n_nodes}
    try:
        sol = analyse(mesh, f, fixed, variant, state, E, nu, t, provider)
    except M.MechanismError as exc:
        return {**base, "passed": False, "max_error": None, "displacement_error": None, "stress_error": None,
                "mechanism": True, "note": f"mechanism: {exc}"}
    u_scale = np.abs(exact).max()
    disp_err = float(np.abs(sol.u - exact).max() / u_scale)
    pos, sig = sol.point_stresses()
    sig_exact = stress(pos[..., 0], pos[..., 1])
    s_scale = np.abs(sig_exact).max()
    stress_err = float(np.abs(sig - sig_exact).max() / s_scale)
    max_err = max(disp_err, stress_err)
    out = {**base, "passed": bool(max_err <= tol), "max_error": max_err, "displacement_error": disp_err,
           "stress_error": stress_err}
    if order == "constant":
        mean = sig.reshape(-1, sig.shape[-1]).mean(axis=0)
        out["stress_mean"] = mean.tolist()
        out["stress_expected"] = sig_exact.reshape(-1, 3)[0].tolist()
    return out


def patch_test(element: str, variant: str = "full", state: str = "plane-stress", forms=FORMS, orders=None,
               patches=None, tol: float = 1e-6) -> dict:
    """The patch tests for one element variant.

    Default plan: the constant-strain test on the distorted five-element patch and, for
    quadratic elements, the higher-order (pure bending) test on the regular patch.  Giving
    ``orders`` and/or ``patches`` runs every combination of them instead (``patches``
    default: the distorted patch; ``orders`` default: constant, plus higher for quadratic).
    The higher-order test on the distorted patch is informative: an element whose space
    loses quadratic completeness under a bilinear map (the 8-node serendipity element)
    fails it.
    """
    tol = check_tolerance(tol, "patch")
    ref = M.ref_element(catalog.element_info(element).name)
    quadratic = ref.n_nodes > ref.n_corners
    if orders is None and patches is None:
        plan = [("distorted", "constant")] + ([("regular", "higher")] if quadratic else [])
    else:
        orders = orders or (("constant", "higher") if quadratic else ("constant",))
        patches = patches or ("distorted",)
        plan = [(p, o) for p in patches for o in orders]
    tests = [run_one(element, variant, state, form, order, patch, tol) for patch, order in plan for form in forms]
    finite = [t["max_error"] for t in tests if t["max_error"] is not None]
    return {"element": tests[0]["element"], "variant": variant, "state": state,
            "passed": all(t["passed"] for t in tests), "max_error": max(finite) if finite else None,
            "mechanism": any(t.get("mechanism") for t in tests), "tests": tests}


def summary_lines(res: dict) -> list[str]:
    err = "n/a" if res["max_error"] is None else fmt(res["max_error"], ".2e")
    lines = [f"{res['element']} {res['variant']} ({res['state']}): patch tests {'PASSED' if res['passed'] else 'FAILED'}"
             f", largest relative error {err}" + (" (a supported patch is a mechanism)" if res.get("mechanism") else "")]
    for t in res["tests"]:
        if "note" in t:
            lines.append(f"  {t['patch']:<9} {t['order']:<8} {t['form'] + '-driven':<19} FAIL  {t['note']}")
            continue
        s = (f"  {t['patch']:<9} {t['order']:<8} {t['form'] + '-driven':<19} {'pass' if t['passed'] else 'FAIL'}  "
             f"displacements {fmt(t['displacement_error'], '.1e')}  stresses {fmt(t['stress_error'], '.1e')}")
        if "stress_mean" in t:
            sx, sy, txy = t["stress_mean"]
            s += f"  (mean sigma_x {fmt(sx, '.2f')}, sigma_y {fmt(sy, '.2f')}, tau_xy {fmt(txy, '.2f')})"
        lines.append(s)
    return lines
