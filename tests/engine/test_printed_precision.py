"""How a value prints: typed inputs as typed, computed inputs and results to the sheet's
figures, and the round-off of a sum that closes printed as 0.

The rules are calcsheet's own (DEVELOPERS.md, Conventions: 3 significant figures, 4 when
the leading digit is 1); the arithmetic is common practice, no source.
"""

from __future__ import annotations

import pytest
import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.engine.evaluate import ROUND_OFF_OF_ZERO, sum_closes_to_zero
from calcsheet.errors import InputError
from calcsheet.units import Quantity


def _shown(sheet: Sheet, name: str) -> str:
    return sheet.equation(sheet[name], "plain").chain()


def test_a_typed_input_prints_as_typed_and_a_computed_one_as_a_result() -> None:
    sheet = Sheet("reactions", units="US")
    with sheet:
        sheet.input("P", "0.9 kip", "Load as typed", dimension="force")
        sheet.input("R", Quantity(-0.9, "kip"), "Reaction from the analysis", computed=True)
        sheet.input("Q", Quantity(-0.81, "kip"), "Another reaction", computed=True)
    assert _shown(sheet, "P") == "P = 0.9 kip"
    assert _shown(sheet, "R") == "R = -0.900 kip"
    assert _shown(sheet, "Q") == "Q = -0.810 kip"
    sheet.set_input("R", "-1.5 kip")  # typed now: printed as typed
    assert _shown(sheet, "R") == "R = -1.5 kip"


def test_a_sum_that_closes_to_round_off_prints_zero_and_keeps_its_value() -> None:
    sheet = Sheet("equilibrium", units="US")
    with sheet:
        a = sheet.input("a", Quantity(1.553 * 1.2, "kip"), "Load", computed=True)
        b = sheet.input("b", Quantity(-1.8636 + 5.9e-12, "kip"), "Reaction", computed=True)
        sheet.step("S", a + b, "Sum of the forces (zero: equilibrium)", unit="kip")
        sheet.step("D", a + b + sheet.input("c", "0.01 kip", "A lost load"), "Sum", unit="kip")
    assert sheet.value("S").m != 0  # the stored value is the arithmetic's
    assert _shown(sheet, "S").endswith("= 0 kip")
    assert _shown(sheet, "D").endswith("= 0.01000 kip")  # a real residual still shows


@pytest.mark.parametrize(
    ("total", "closes"),
    [(5.9e-12, True), (ROUND_OFF_OF_ZERO * 10 * 0.99, True), (ROUND_OFF_OF_ZERO * 10 * 1.01, False),
     (0.0, False), (1e-3, False)],
)  # fmt: skip
def test_the_rule_is_relative_to_the_largest_term(total: float, closes: bool) -> None:
    x, y = sp.symbols("x y")
    values = {x: Quantity(10.0, "kip"), y: Quantity(-10.0 + total, "kip")}
    assert sum_closes_to_zero(x + y, Quantity(total, "kip"), values) is closes


def test_a_product_is_never_taken_for_a_sum() -> None:
    x = sp.Symbol("x")
    assert not sum_closes_to_zero(2 * x, Quantity(1e-20, "kip"), {x: Quantity(5e-21, "kip")})


def test_computed_is_a_plain_flag_and_bad_values_still_name_the_input() -> None:
    sheet = Sheet("flag")
    with pytest.raises(InputError, match="input R"):
        sheet.input("R", "lots", "Reaction", dimension="force", computed=True)
