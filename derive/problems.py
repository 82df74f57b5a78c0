"""Data of the benchmark problems (geometry, material, loads, reference values); no code.

Kept apart from :mod:`derive.benchmarks` (which builds meshes and runs the studies) so that
lower layers (the mesh benchmark behind ``derive perf --mesh``) can use the same tapered
panel without importing the studies.  notes/verification.md states the meshes and where each
reference value comes from.
"""
from __future__ import annotations

#: straight cantilever, MacNeal & Harder (1985), from memory
CANTILEVER = {"length": 6.0, "depth": 0.2, "t": 0.1, "E": 1.0e7, "nu": 0.30, "nx": 6,
              # MacNeal & Harder (1985), from memory
              "reference": {"shear": 0.1081, "extension": 3.0e-5}}

#: tapered panel, Cook (1974): corners counter-clockwise from the clamped bottom corner
COOK = {"corners": ((0.0, 0.0), (48.0, 44.0), (48.0, 60.0), (0.0, 44.0)), "E": 1.0, "nu": 1.0 / 3.0, "t": 1.0,
        "load": 1.0, "corner": (48.0, 60.0), "mid": (48.0, 52.0),
        # the panel and its mid-edge output point: Cook (1974), from memory; the value 23.96 is the
        # figure usually quoted for it (recalled, not taken from a table)
        "quoted_mid": 23.96}

#: converged values established in this project: Q9 and Q8 refinement studies to 256 x 256 with
#: Richardson extrapolation of the last three levels agree to 1e-4 (Q9: 25.18928 / 23.96774,
#: Q8: 25.18922 / 23.96774); see notes/verification.md
COOK_CONVERGED = {"corner": 25.189, "mid": 23.968}
#: how COOK_CONVERGED was obtained (printed with the membrane study)
COOK_CONVERGED_METHOD = ("derive's own converged computation: Q9 and Q8 full on structured N x N meshes of the "
                         "panel up to 256 x 256, Richardson extrapolation of N = 64, 128, 256; Q9 and Q8 agree to "
                         "1e-4 (notes/verification.md)")
#: the published source of the problem and of its output points
COOK_SOURCE = ("Cook, R. D. (1974), Improved two-dimensional finite element, J. Struct. Div. ASCE 100 (ST9), "
               "from memory")

#: thick-walled cylinder under internal pressure, plane strain (dimensions as in MacNeal & Harder 1985)
CYLINDER = {"inner": 3.0, "outer": 9.0, "E": 1000.0, "p": 1.0, "t": 1.0,
            "nus": (0.3, 0.49, 0.499, 0.4999)}
