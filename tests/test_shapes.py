"""Shape functions: catalogue, construction from nodes + monomials, spec files, errors."""
import numpy as np
import pytest
import sympy as sp
from numpy.testing import assert_allclose

import fem_reference as ref
from derive import catalog
from derive.errors import SpecError
from derive.shapes import from_nodes, monomials
from derive.spec import SPEC_DIR, load_spec
from derive.symbols import eta, xi

# completeness degrees: textbook facts (e.g. Zienkiewicz & Taylor, The Finite Element Method, vol. 1), from memory
COMPLETENESS = {"T3": 1, "T6": 2, "Q4": 1, "Q8": 2, "Q9": 2}


@pytest.mark.parametrize("name", list(COMPLETENESS))
def test_catalogue_checks(name):
    checks = catalog.shape_set(name).checks()
    assert checks["partition_of_unity"] is True  # common practice, no source
    assert checks["kronecker_delta"] is True  # common practice, no source
    assert checks["completeness"] == COMPLETENESS[name]  # textbook fact, from memory


@pytest.mark.parametrize("name", list(COMPLETENESS))
def test_shape_functions_match_hand_typed_textbook_forms(name):
    sh = catalog.shape_set(name)
    f = sp.lambdify((xi, eta), list(sh.functions))
    rng = np.random.default_rng(1)
    for _ in range(5):
        if name[0] == "Q":
            s, t = rng.uniform(-1, 1, 2)
        else:
            s, t = rng.uniform(0, 0.5, 2)
        N_ref, _, _ = ref.shape(name, s, t)
        # textbook shape functions typed by hand in tests/fem_reference.py (Cook et al. 4th ed., from memory)
        assert_allclose(np.array(f(s, t), dtype=float), N_ref, rtol=0, atol=1e-14)


def test_q8_spec_reproduces_catalogue():
    info, sh = load_spec(SPEC_DIR / "q8-serendipity.toml")
    q8 = catalog.shape_set("Q8")
    for a, b in zip(sh.functions, q8.functions):
        assert sp.expand(a - b) == 0  # same nodes and basis give the same functions (common practice)


def test_q12_and_t10_specs():
    info, sh = load_spec(SPEC_DIR / "q12-cubic-serendipity.toml")
    assert sh.n == 12 and sh.checks()["completeness"] == 3  # cubic serendipity: complete cubic (from memory)
    # corner function of the cubic serendipity element: (1/32)(1-xi)(1-eta)(9(xi^2+eta^2) - 10), from memory
    N1 = sp.Rational(1, 32) * (1 - xi) * (1 - eta) * (9 * (xi ** 2 + eta ** 2) - 10)
    assert sp.expand(sh.functions[0] - N1) == 0
    info, sh = load_spec(SPEC_DIR / "t10-cubic-triangle.toml")
    assert sh.n == 10 and sh.checks()["completeness"] == 3  # complete cubic (common practice)
    L1 = 1 - xi - eta
    # T10 corner function L1 (3 L1 - 1)(3 L1 - 2) / 2 (Zienkiewicz & Taylor, from memory)
    assert sp.expand(sh.functions[0] - L1 * (3 * L1 - 1) * (3 * L1 - 2) / 2) == 0


def test_not_unisolvent():
    with pytest.raises(SpecError, match="not unisolvent"):
        from_nodes("X", "square", [(-1, -1), (1, -1), (1, 1), (-1, 1)], monomials("1, xi, eta, xi^2"))


def test_wrong_number_of_monomials():
    with pytest.raises(SpecError, match="3 monomials for 4 nodes"):
        from_nodes("X", "square", [(-1, -1), (1, -1), (1, 1), (-1, 1)], monomials("1, xi, eta"))


def test_node_off_domain():
    with pytest.raises(SpecError, match="node 3 .* outside the triangle"):
        from_nodes("X", "triangle", [(0, 0), (1, 0), (1, 1)], monomials("1, xi, eta"))


def test_bad_monomial_text():
    with pytest.raises(SpecError, match="not xi or eta"):
        monomials("1, xi, __import__")


def test_spec_file_errors(tmp_path):
    p = tmp_path / "bad.toml"
    p.write_text('name = "X"\ndomain = "square"\nnodes = [[-1,-1],[1,-1],[1,1],[-1,1]]\nbasis = ["1","xi","eta"]\n')
    with pytest.raises(SpecError, match="bad.toml: .*3 monomials for 4 nodes"):
        load_spec(p)
    p.write_text("name = [")
    with pytest.raises(SpecError, match="not valid TOML"):
        load_spec(p)
    p.write_text('name = "X"\ndomain = "square"\nnodes = [[0,0]]\nbasis = ["1"]\ncolour = "red"\n')
    with pytest.raises(SpecError, match="unknown key"):
        load_spec(p)


def test_spec_elements_reach_the_analyses(capsys):
    from derive.cli import main
    import json
    # a spec element is analysed like a catalogue one: the Q8 spec reproduces Q8's bending ratio 1
    # and its zero-energy count (3 rigid modes), and the cubic T10 passes the constant-strain patch
    # (quadratic fields contain pure bending; isoparametric completeness: common practice)
    assert main(["locking", "q8-serendipity.toml", "--aspect", "4", "--nu", "0.3", "--json"]) == 0
    assert json.loads(capsys.readouterr().out)["ratio"] == 1
    assert main(["modes", "q12-cubic-serendipity.toml", "--json"]) == 0
    data = json.loads(capsys.readouterr().out)
    assert data["rigid"] == 3 and data["spurious"] == 0
    assert main(["patch", "t10-cubic-triangle.toml", "--json"]) == 0
    assert json.loads(capsys.readouterr().out)["passed"] is True


def test_spec_may_not_reuse_a_catalogue_name(tmp_path):
    from derive import catalog
    from derive.errors import InputError
    p = tmp_path / "q4.toml"
    p.write_text('name = "Q4"\ndomain = "square"\nnodes = [[-1,-1],[1,-1],[1,1],[-1,1]]\n'
                 'basis = ["1","xi","eta","xi*eta"]\n')
    with pytest.raises(InputError, match="catalogue element"):
        catalog.element_info(str(p))
