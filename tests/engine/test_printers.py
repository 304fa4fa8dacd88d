"""Golden output of the three printers (LaTeX, MathML, Typst) and the plain one.

The golden files in tests/engine/golden/ were reviewed by eye; the Typst ones are
also compiled here, so a markup error fails the test.
"""

from __future__ import annotations

from pathlib import Path

import pytest
import typst

from calcsheet.engine import Sheet
from calcsheet.engine.functions import Abs, Max, Min, Piecewise, atan2, cos, sin, sqrt

TARGETS = ("latex", "mathml", "typst", "plain")


def _sample_sheet() -> Sheet:
    """Steps chosen to cover the printer: signs, fractions, roots, trig, branches, order."""
    sheet = Sheet("printer sample", units="US")
    with sheet:
        P = sheet.input("P", "6.5 kip", "Applied load", dimension="force")
        theta = sheet.input("theta", "30 deg", "Load angle from the member axis", dimension="angle")
        e = sheet.input("e", "2.5 in", "Eccentricity", dimension="length")
        c = sheet.input("c", "3 in", "Distance to the extreme fibre", dimension="length")
        I_x = sheet.input("I_x", "40.5 in^4", "Moment of inertia", dimension="moment of inertia")
        A = sheet.input("A", "7.58 in^2", "Area", dimension="area")
        M_neg = sheet.input("M_z", "-12 kip*ft", "A negative moment", dimension="moment")
        P_x = sheet.step("P_x", P * cos(theta), "Axial component", unit="kip")
        sheet.step("P_y", P * sin(theta), "Transverse component", unit="kip")
        sheet.step("sigma_e", P_x * e * c / I_x, "Bending stress from the offset", unit="ksi")
        sheet.step("sigma_min", P_x / A - P_x * e * c / I_x, "Stress at the far fibre", unit="ksi")
        sheet.step("f_b", M_neg * c / I_x, "Stress from a negative moment", unit="ksi")
        sheet.step("r_x", sqrt(I_x / A), "Radius of gyration", unit="in")
        sheet.step("alpha", atan2(P * sin(theta), P * cos(theta)), "Angle back", unit="deg")
        sheet.step(
            "F_b",
            Piecewise((0.66 * P / A, theta <= 45 * 3.14159 / 180), (0.6 * P / A, True)),
            "A branch",
            unit="ksi",
        )
        sheet.step("tau_xy", Abs(M_neg) / (2 * A * c), "Absolute value and a product below")
        sheet.step("M_max", Max(Abs(M_neg), P * e), "The larger", unit="kip*ft")
        sheet.step("k", Min(e / c, 1 / 2), "The smaller, with a fraction")
    return sheet


@pytest.mark.parametrize("target", TARGETS)
def test_printed_steps_match_golden(target, golden):
    sheet = _sample_sheet()
    text = "\n".join(sheet.equation(step, target).chain() for step in sheet.steps) + "\n"
    golden.check(f"sample_steps.{target}.txt", text)


def test_products_print_in_the_order_written():
    sheet = _sample_sheet()
    assert "P_{x} \\, e \\, c" in sheet.equation(sheet["sigma_e"], "latex").symbolic
    assert "P_x*e*c" in sheet.equation(sheet["sigma_e"], "plain").symbolic


def test_negative_values_are_parenthesised_in_every_target():
    sheet = _sample_sheet()
    substituted = {t: sheet.equation(sheet["f_b"], t).substituted for t in TARGETS}
    assert "\\left(-12\\ \\mathrm{kip}" in substituted["latex"]
    assert "<mo>(</mo><mo>&#x2212;</mo><mn>12</mn>" in substituted["mathml"]
    assert '(-12 thin "kip"' in substituted["typst"]
    assert "(-12 kip*ft)" in substituted["plain"]


def test_greek_and_subscripts_in_every_target():
    sheet = _sample_sheet()
    names = {t: sheet.equation(sheet["sigma_min"], t).symbol for t in TARGETS}
    assert names["latex"] == "\\sigma_{\\mathrm{min}}"
    assert names["mathml"] == '<msub><mi>σ</mi><mi mathvariant="normal">min</mi></msub>'
    assert names["typst"] == 'sigma_(upright("min"))'
    assert sheet.equation(sheet["tau_xy"], "latex").symbol == "\\tau_{\\mathit{xy}}"


def test_typst_output_compiles(tmp_path: Path):
    sheet = _sample_sheet()
    body = "\n\n".join(f"$ {sheet.equation(step, 'typst').chain()} $" for step in sheet.steps)
    source = tmp_path / "steps.typ"
    source.write_text(body, encoding="utf-8")
    assert typst.compile(str(source))[:4] == b"%PDF"


def test_only_the_branch_that_applies_is_substituted():
    sheet = _sample_sheet()
    assert "0.66" in sheet.equation(sheet["F_b"], "plain").substituted
    sheet.set_input("theta", "60 deg")
    assert "0.6*" in sheet.equation(sheet["F_b"], "plain").substituted
    assert "0.66" not in sheet.equation(sheet["F_b"], "plain").substituted


def test_the_sign_and_parenthesis_decision_is_made_once():
    # Issue 17: the structural printer decides; a target gives its number, unit and wraps.
    from calcsheet.engine.printers import PRINTERS, _ExpressionPrinter

    assert all("quantity" not in vars(printer) for printer in PRINTERS.values())
    assert "quantity" in vars(_ExpressionPrinter)
    sheet = _sample_sheet()
    results = {t: sheet.equation(sheet["f_b"], t).result for t in TARGETS}
    assert results["latex"].startswith("-") and "\\left(" not in results["latex"]
    assert results["mathml"].startswith("<mrow><mo>&#x2212;</mo>")
    assert results["typst"].startswith("-") and not results["typst"].startswith("(")
    assert results["plain"].startswith("-") and not results["plain"].startswith("(")


def test_a_stacked_step_may_set_its_result_beside_the_numbers():
    sheet = _sample_sheet()
    for target in TARGETS:
        equation = sheet.equation(sheet["sigma_min"], target)
        three = equation.stacked()
        two = equation.stacked(result_beside=True)
        assert equation.result in two
        assert equation.printer.chain([equation.substituted, equation.result]) in two
        assert two != three
    plain = sheet.equation(sheet["sigma_min"], "plain")
    assert plain.stacked(result_beside=True).count("\n") == plain.stacked().count("\n") - 1
