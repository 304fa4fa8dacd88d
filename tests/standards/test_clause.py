"""A clause is written once: the printed step and the numeric path give the same value."""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.engine.functions import Piecewise
from calcsheet.standards import clause
from calcsheet.units import ureg


@clause("AISC 360-22 Eq. E3-2, E3-3", "Critical stress for flexural buckling")
def critical_stress(F_y, F_e):
    """E3-2 when F_y/F_e <= 2.25, else E3-3 (AISC 360-22 Section E3)."""
    return Piecewise((0.658 ** (F_y / F_e) * F_y, F_y / F_e <= 2.25), (0.877 * F_e, True))


@pytest.mark.parametrize("F_e", [40.0, 10.0])
def test_the_step_and_the_numeric_path_agree(F_e: float) -> None:
    sheet = Sheet("clause")
    with sheet:
        F_y = sheet.input("F_y", "50 ksi", dimension="stress")
        F_e_symbol = sheet.input("F_e", f"{F_e} ksi", dimension="stress")
        critical_stress.write(sheet, "F_cr", F_y, F_e_symbol, unit="ksi")
    step = sheet["F_cr"]
    assert step.reference == "AISC 360-22 Eq. E3-2, E3-3"
    pascal = ureg.Quantity(1, "ksi").to("Pa").m
    numeric = critical_stress.numeric(np.array([50.0 * pascal]), np.array([F_e * pascal]))
    assert sheet.value("F_cr").to("ksi").m == pytest.approx(numeric[0] / pascal)
    # Arithmetic of E3-2 / E3-3 (AISC 360-22 Section E3): 0.658^(50/40)·50 = 29.63 ksi;
    # 0.877·10 = 8.77 ksi.
    expected = 0.658 ** (50 / F_e) * 50 if 50 / F_e <= 2.25 else 0.877 * F_e
    assert numeric[0] / pascal == pytest.approx(expected)


def test_parameters_and_docstring_come_from_the_builder() -> None:
    assert critical_stress.parameters == ("F_y", "F_e")
    assert "E3-2" in critical_stress.__doc__
