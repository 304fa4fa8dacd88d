"""What is printed is what was computed: the substituted form, evaluated back, is the result.

The plain target's substituted text is read back with pint's expression parser
(test code on our own output, never on user text) and compared with the value the
engine computed, for random positive inputs.
"""

from __future__ import annotations

import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.engine import Sheet
from calcsheet.units import NumberStyle, ureg

positive = st.floats(min_value=0.01, max_value=1e4, allow_nan=False, allow_infinity=False)


def _sheet(P: float, e: float, c: float, I: float, A: float, k: float) -> Sheet:
    # Enough significant figures that reading back is limited by float precision only.
    sheet = Sheet("roundtrip", number_style=NumberStyle(significant=15))
    with sheet:
        P_ = sheet.input("P", f"{P!r} kip", "Load", dimension="force")
        e_ = sheet.input("e", f"{e!r} in", "Offset", dimension="length")
        c_ = sheet.input("c", f"{c!r} mm", "Fibre distance", dimension="length")
        I_ = sheet.input("I", f"{I!r} in^4", "Inertia", dimension="moment of inertia")
        A_ = sheet.input("A", f"{A!r} cm^2", "Area", dimension="area")
        k_ = sheet.input("k", k, "Factor", dimension="dimensionless")
        sheet.step("sigma_1", P_ / A_ + P_ * e_ * c_ / I_, "Sum of fractions", unit="ksi")
        sheet.step("sigma_2", P_ / A_ - k_ * P_ * e_ * c_ / I_, "A difference", unit="MPa")
        sheet.step("M", -P_ * (e_ + 2 * c_), "A negative product", unit="kip*ft")
        sheet.step("r", (I_ / A_) ** 0.5 * k_**2, "Powers", unit="mm")
        sheet.step("q", P_ / (k_ * A_) / (1 + k_), "Nested denominators", unit="psi")
    return sheet


@settings(max_examples=60, deadline=None)
@given(P=positive, e=positive, c=positive, I=positive, A=positive, k=positive)
def test_substituted_form_evaluates_back_to_the_result(P, e, c, I, A, k):
    sheet = _sheet(P, e, c, I, A, k)
    for step in sheet.steps:
        equation = sheet.equation(step, "plain")
        read_back = ureg.parse_expression(equation.substituted)
        result = ureg.parse_expression(equation.result)
        assert read_back.to(step.value.units).magnitude == pytest.approx(
            result.to(step.value.units).magnitude, rel=1e-9, abs=1e-300
        ), equation.chain()
        assert result.to(step.value.units).magnitude == pytest.approx(
            step.value.magnitude, rel=1e-12
        )
