"""The compiled float path of evaluate(): same values as the pint walk, same errors."""

from __future__ import annotations

import pytest
import sympy as sp

from calcsheet.engine.evaluate import _PLANS, _carried, _evaluate_with_units, evaluate
from calcsheet.engine.functions import Piecewise, cos, sqrt
from calcsheet.errors import EvaluationError
from calcsheet.units import Quantity

P, theta, A, B, e, I = sp.symbols("P theta A B e I")
# A branch chosen by a plain-number condition, trigonometry of an angle, roots of units.
EXPR = Piecewise(
    (P * cos(theta) / A + P * e * sqrt(A) / I, e / sqrt(A) > 1),
    (P / A, True),
)


def _values(load: str, unit_area: str = "in**2") -> dict:
    return {
        P: Quantity(float(load.split()[0]), load.split()[1]),
        theta: Quantity(30, "deg"),
        A: Quantity(7.58, unit_area),
        e: Quantity(4, "in"),
        I: Quantity(39.5, "in**4"),
    }


def test_repeated_evaluations_take_the_compiled_path_and_agree_with_pint() -> None:
    for load in ("2.4 kip", "2.5 kip", "2.6 kip", "-3 kip"):
        fast = evaluate(EXPR, _values(load), step="f")
        slow = _evaluate_with_units(EXPR, _values(load), step="f")
        # Both paths carry 12 significant figures: the same number, in the same units.
        assert fast.units == slow.units
        assert fast.m == _carried(slow.m, slow.units).m
    compiled = [plan for plan in _PLANS.values() if plan]
    assert compiled  # the third evaluation onward ran compiled


def test_other_units_start_a_new_plan_and_still_agree() -> None:
    values = _values("10.7 kN", "mm**2")
    values[A] = Quantity(4890, "mm**2")
    for _ in range(3):
        result = evaluate(EXPR, values, step="f")
    assert result.to("MPa").m == pytest.approx(
        _evaluate_with_units(EXPR, values, step="f").to("MPa").m, rel=1e-12
    )


def test_a_value_the_float_path_cannot_take_gives_the_pint_message() -> None:
    root = sqrt(A - B)
    for _ in range(3):
        evaluate(root, {A: Quantity(12, "in**2"), B: Quantity(10, "in**2")}, step="r")
    with pytest.raises(EvaluationError, match="step 'r'"):
        evaluate(root, {A: Quantity(8, "in**2"), B: Quantity(10, "in**2")}, step="r")


def test_without_compiled_plans_the_values_are_the_same_and_the_setting_comes_back() -> None:
    """A one-shot command (calcsheet build) evaluates without plans: same numbers."""
    from calcsheet.engine import evaluate as evaluation

    with_plans = [evaluate(EXPR, _values(load), step="f") for load in ("1.1 kip",) * 3]
    with evaluation.compiled_plans(False):
        assert not evaluation._plans_wanted
        without = [evaluate(EXPR, _values(load), step="f") for load in ("1.1 kip",) * 3]
    assert evaluation._plans_wanted
    assert [q.m for q in without] == [q.m for q in with_plans]
    assert {q.units for q in without} == {q.units for q in with_plans}
