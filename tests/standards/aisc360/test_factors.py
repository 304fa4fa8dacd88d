"""φ and Ω per limit state, and φ·Rn / Rn/Ω (AISC 360-22 Sections B3, D2, E1, F1, G1, G2.1)."""

from __future__ import annotations

import pytest
import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.standards.aisc360 import available_strength, design_method
from calcsheet.standards.aisc360.factors import (
    COMPRESSION,
    FLEXURE,
    SHEAR,
    SHEAR_ROLLED_I_WEB,
    TENSILE_RUPTURE,
    TENSILE_YIELDING,
)

# AISC 360-22 D2, E1, F1, G1, G2.1(a) (from memory; unchanged since the 2005 edition).
PUBLISHED = [
    (TENSILE_YIELDING, 0.90, 1.67),
    (TENSILE_RUPTURE, 0.75, 2.00),
    (COMPRESSION, 0.90, 1.67),
    (FLEXURE, 0.90, 1.67),
    (SHEAR_ROLLED_I_WEB, 1.00, 1.50),
    (SHEAR, 0.90, 1.67),
]


@pytest.mark.parametrize(("factors", "phi", "omega"), PUBLISHED)
def test_factors_per_limit_state(factors, phi, omega) -> None:
    assert factors.value("LRFD") == phi
    assert factors.value("ASD") == omega
    assert factors.multiplier("ASD") == pytest.approx(1 / omega)


@pytest.mark.parametrize(("method", "expected"), [("LRFD", 0.9 * 1325), ("asd", 1325 / 1.67)])
def test_available_strength_on_a_sheet(method: str, expected: float) -> None:
    sheet = Sheet("factors")
    with sheet:
        P_n = sheet.input("P_n", "1325 kip", dimension="force")
        strength = available_strength(P_n, method, COMPRESSION)
        sheet.input(strength.factor.name, strength.value, reference=strength.reference)
        sheet.step("P_c", strength.expression, unit="kip")
    assert sheet.value("P_c").to("kip").m == pytest.approx(expected)
    name = "phi_c" if method == "LRFD" else "Omega_c"
    assert strength.factor == sp.Symbol(name)
    assert strength.reference == "AISC 360-22 Section E1"


@pytest.mark.parametrize("method", ["LSD", "", None, 3, "EN 1993"])
def test_an_unknown_method_names_the_field_and_the_choices(method) -> None:
    with pytest.raises(InputError, match="design method.*ASD or LRFD"):
        design_method(method)
