"""The clauses' numeric functions written as code are in step with the clauses."""

from __future__ import annotations

import numpy as np
import sympy as sp

from calcsheet.standards import clause_code
from calcsheet.standards.write_clause_code import TARGET, load_all_clauses
from calcsheet.standards.write_clause_code import clause_code as written_text


def test_the_written_module_is_up_to_date() -> None:
    """After changing a clause: python -m calcsheet.standards.write_clause_code."""
    clauses = load_all_clauses()
    missing = [c.reference for c in clauses if c.written_key not in clause_code.FUNCTIONS]
    assert not missing, f"run python -m calcsheet.standards.write_clause_code ({missing[:3]})"
    assert TARGET.read_text(encoding="utf-8") == written_text(clauses)


def test_written_functions_equal_lambdify_of_the_expression() -> None:
    """The code is sympy's NumPy printing, as lambdify's: same numbers on random inputs."""
    rng = np.random.default_rng(5)
    for clause in load_all_clauses():
        symbols = [sp.Symbol(name, real=True) for name in clause.parameters]
        reference = sp.lambdify(symbols, clause.placeholder_expression, modules="numpy")
        arguments = [rng.uniform(0.5, 2.0, 7) for _ in symbols]
        with np.errstate(all="ignore"):
            expected = np.broadcast_to(reference(*arguments), (7,))
            got = clause.numeric(*arguments)
        np.testing.assert_allclose(
            got, expected, rtol=1e-12, equal_nan=True, err_msg=clause.reference
        )
