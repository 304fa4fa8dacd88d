"""The Sheet: evaluation with units, clear errors, re-evaluation after an input changes."""

from __future__ import annotations

import pytest
import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.engine.functions import Piecewise, cos, sin, sqrt
from calcsheet.errors import DefinitionError, DimensionError, EvaluationError, InputError


def _bracket() -> tuple[Sheet, dict[str, sp.Symbol]]:
    sheet = Sheet("bracket", units="US")
    with sheet:
        s = {
            "P": sheet.input("P", "6.5 kip", "Load", dimension="force"),
            "A": sheet.input("A", "7.58 in^2", "Area", dimension="area"),
            "L": sheet.input("L", "18 in", "Arm", dimension="length"),
        }
        s["f_a"] = sheet.step("f_a", s["P"] / s["A"], "Axial stress", unit="ksi")
    return sheet, s


def test_a_step_is_evaluated_with_units():
    sheet, _ = _bracket()
    # 6.5 kip / 7.58 in^2 = 0.8575 ksi (arithmetic, common practice, no source)
    assert sheet.value("f_a").to("ksi").magnitude == pytest.approx(6.5 / 7.58)


def test_adding_a_force_to_a_length_names_the_step_and_the_units():
    sheet, s = _bracket()
    with pytest.raises(DimensionError) as raised, sheet:
        sheet.step("bad_sum", s["P"] + s["L"], "A force plus a length")
    message = str(raised.value)
    assert "step 'bad_sum'" in message
    assert "kip" in message and "in" in message
    assert "[length]" in message


def test_the_sine_of_a_length_is_a_dimension_error():
    sheet, s = _bracket()
    with pytest.raises(DimensionError, match="step 'bad_angle'.*must be an angle"):
        sheet.step("bad_angle", sin(s["L"]), "Sine of a length")


def test_a_display_unit_of_the_wrong_dimension_is_refused():
    sheet, s = _bracket()
    with pytest.raises(DimensionError, match="step 'f_b'.*a stress.*'kip' is a force"):
        sheet.step("f_b", s["P"] / s["A"], "Stress shown in kip", unit="kip")


def test_a_symbol_used_before_it_is_defined_is_named():
    sheet, s = _bracket()
    stranger = sp.Symbol("M_z")
    with pytest.raises(DefinitionError, match="step 'f_b' uses 'M_z' before it is defined"):
        sheet.step("f_b", stranger / s["A"], "Uses an undefined moment")


def test_a_symbol_cannot_be_defined_twice():
    sheet, s = _bracket()
    with pytest.raises(DefinitionError, match="step 'P'.*already defined by an input"):
        sheet.step("P", 2 * s["P"], "Redefines P")


@pytest.mark.parametrize("name", ["", "2x", "sigma max", "a-b", "x__y", "_x", "a" * 40])
def test_bad_symbol_names_are_refused(name):
    sheet, _ = _bracket()
    with pytest.raises(DefinitionError, match="not usable"):
        sheet.input(name, "1 in", "bad name")


@pytest.mark.parametrize("value", ["nan kip", "inf kip", "-inf kip", float("nan"), float("inf")])
def test_nan_and_infinity_are_refused_with_the_input_named(value):
    sheet, _ = _bracket()
    with pytest.raises(InputError, match="input P: .*finite"):
        sheet.set_input("P", value)


def test_unknown_units_and_wrong_dimensions_name_the_input():
    sheet, _ = _bracket()
    with pytest.raises(InputError, match="input P: .*unknown unit 'kipz'"):
        sheet.set_input("P", "6.5 kipz")
    with pytest.raises(InputError, match="input P: .*a length, not a force"):
        sheet.set_input("P", "6.5 in")
    with pytest.raises(InputError, match="input name: got 'Q'"):
        sheet.set_input("Q", "1 kip")


def test_changing_an_input_re_evaluates_every_step():
    sheet, _ = _bracket()
    sheet.set_input("P", "13 kip")
    # 13 kip / 7.58 in^2 (arithmetic, common practice, no source)
    assert sheet.value("f_a").magnitude == pytest.approx(13 / 7.58)
    assert "(13 kip)" in sheet.equation(sheet["f_a"], "plain").substituted


def test_a_failed_change_keeps_every_previous_value():
    sheet = Sheet("roots")
    with sheet:
        a = sheet.input("a", "4 in^2", "Area", dimension="area")
        b = sheet.input("b", "1 in^2", "Area removed", dimension="area")
        sheet.step("w", sqrt(a - b), "Width", unit="in")
    before = sheet.value("w")
    with pytest.raises(EvaluationError, match="w"):
        sheet.set_input("b", "9 in^2")
    assert sheet.value("w") == before
    assert sheet.value("b").magnitude == 1


def test_a_piecewise_with_no_branch_that_applies_is_an_evaluation_error():
    sheet, s = _bracket()
    with pytest.raises(EvaluationError, match="no branch"):
        sheet.step("k", Piecewise((1, s["L"] > 100 * s["L"])), "No branch")


def test_angles_work_in_degrees_and_radians():
    sheet = Sheet("angles")
    with sheet:
        P = sheet.input("P", "10 kip", "Load", dimension="force")
        theta = sheet.input("theta", "60 deg", "Angle", dimension="angle")
        phi = sheet.input("phi", f"{3.141592653589793 / 3} rad", "Angle", dimension="angle")
        sheet.step("P_x", P * cos(theta), "Component", unit="kip")
        sheet.step("P_y", P * cos(phi), "Component", unit="kip")
    # 10 kip x cos 60° = 5 kip, in degrees or radians (common practice, no source)
    assert sheet.value("P_x").magnitude == pytest.approx(5.0)
    assert sheet.value("P_y").magnitude == pytest.approx(5.0)


def test_a_check_reports_utilization_and_status():
    sheet, s = _bracket()
    with sheet:
        F_a = sheet.input("F_a", "1.0 ksi", "Allowable", dimension="stress")
    check = sheet.check("Axial stress", s["f_a"], F_a, reference="common practice")
    # utilization = (6.5 / 7.58 ksi) / 1.0 ksi (arithmetic, common practice, no source)
    assert check.utilization == pytest.approx(6.5 / 7.58)
    assert check.passes and check.status == "OK"
    sheet.set_input("P", "10 kip")
    assert check.utilization == pytest.approx(10 / 7.58)
    assert check.status == "NOT OK"
    assert sheet.governing_check() is check


def test_a_check_of_different_dimensions_is_refused():
    sheet, s = _bracket()
    with pytest.raises(DimensionError, match="demand is a stress but capacity is a force"):
        sheet.check("Mixed", s["f_a"], s["P"])


def test_steps_show_in_a_notebook():
    sheet, _ = _bracket()
    assert sheet["f_a"]._repr_latex_().startswith("$$f_{a} = \\frac{P}{A}")
    assert "<math" in sheet["f_a"]._repr_html_()
    assert sheet._repr_latex_().startswith("$$\\begin{aligned}")


def test_a_table_shows_current_values_after_an_input_changes():
    sheet, s = _bracket()
    table = sheet.table(["Term", "Value"], [["axial", s["f_a"]]], caption="t", unit="ksi")
    # 6.5 / 7.58 = 0.858 ksi, then 13 / 7.58 = 1.715 ksi (arithmetic, common practice, no source)
    assert sheet.cell_text(table, s["f_a"], "plain") == "0.858"
    sheet.set_input("P", "13 kip")
    assert sheet.cell_text(table, s["f_a"], "plain") == "1.715"


def test_a_table_refuses_ragged_rows_and_undefined_symbols():
    sheet, s = _bracket()
    with pytest.raises(DefinitionError, match="row 1 has 1 cells for 2 columns"):
        sheet.table(["a", "b"], [[s["P"]]])
    with pytest.raises(DefinitionError, match="uses 'q' before it is defined"):
        sheet.table(["a"], [[sp.Symbol("q")]])


def _three_bolts() -> Sheet:
    """Three bolt forces (invented demo numbers): the largest governs."""
    sheet = Sheet("bolts")
    with sheet:
        forces = [
            (f"bolt {n}", sheet.input(f"R_{n}", f"{value} kip", dimension="force"))
            for n, value in ((1, 3.0), (2, 5.0), (3, 4.0))
        ]
        R_max = sheet.governing("R_max", forces, "Largest bolt force", unit="kip")
        capacity = sheet.input("R_n", "10 kip", dimension="force")
        sheet.check("Bolt force", R_max, capacity)
    return sheet


def test_a_governing_step_names_the_candidate_that_governs_now():
    sheet = _three_bolts()
    assert sheet.value("R_max").to("kip").m == pytest.approx(5.0)
    assert sheet.governing_label(sheet["R_max"]) == "bolt 2"
    assert sheet.check_location(sheet.checks[0]) == "bolt 2"
    sheet.set_input("R_3", "7 kip")
    assert sheet.governing_label(sheet["R_max"]) == "bolt 3"
    assert sheet.check_location(sheet.checks[0]) == "bolt 3"


def test_the_smallest_can_govern_and_a_governing_step_needs_candidates():
    sheet = Sheet("min")
    with sheet:
        a = sheet.input("a", "-2 ksi", dimension="stress")
        b = sheet.input("b", "1 ksi", dimension="stress")
        sheet.governing("s_min", [("A", a), ("B", b)], largest=False)
        with pytest.raises(DefinitionError, match="s_none"):
            sheet.governing("s_none", [])
    assert sheet.governing_label(sheet["s_min"]) == "A"


def test_a_fixed_input_refuses_a_change_and_says_why():
    sheet = Sheet("fixed")
    with sheet:
        sheet.input("z", "10 in", dimension="length", fixed="it decides which loads are cut")
    with pytest.raises(InputError) as raised:
        sheet.set_input("z", "12 in")
    assert "input z" in str(raised.value) and "decides which loads" in str(raised.value)
    assert sheet.value("z").to("in").m == 10


def test_hidden_steps_and_unlisted_inputs_still_evaluate():
    sheet = Sheet("hidden")
    with sheet:
        x = sheet.input("x", "2 in", dimension="length", listed=False)
        y = sheet.step("y", 3 * x, shown=False)
    assert not sheet["x"].listed and not sheet["y"].shown
    assert sheet.value(y).to("in").m == 6


def test_revisions_basis_and_references_are_kept_in_order():
    sheet = Sheet("log")
    sheet.add_revision("A", "2026-11-02", "Issued for review", "A.E.")
    sheet.add_revision("B", "2026-11-20", "Lug moved 1 in down", "A.E.")
    sheet.add_basis("Assumptions", "Static loads")
    sheet.add_basis("Assumptions", "Elastic")
    sheet.add_reference("AISC 360-22")
    sheet.add_reference("AISC 360-22")
    assert [revision.mark for revision in sheet.revisions] == ["A", "B"]
    assert sheet.title_block.revision == "B"
    assert sheet.basis == {"Assumptions": ["Static loads", "Elastic"]}
    assert sheet.references == ["AISC 360-22"]
