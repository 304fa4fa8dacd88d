"""The JSON results: the stress points, each check's worst case, SI units as written, the schema."""

from __future__ import annotations

import json
from importlib import resources

import pytest

from calcsheet.job import parse_job
from calcsheet.job.starter import STARTER
from calcsheet.pipeline import build_sheets
from calcsheet.pipeline.results import results_schema, unit_name
from calcsheet.units import ureg

from ..conftest import check_results_schema
from ..hostile.support import OUTRIGGER

# NIST SP 811 (2008) Appendix B.8, factors for units listed alphabetically.
PA_PER_KSI = 6.894757e6  # kip per square inch (ksi) to pascal
NM_PER_KIP_FT = 1.355818e3  # foot pound-force to newton meter, times 1000
M_PER_IN = 0.0254  # inch to meter (exact)


@pytest.fixture(scope="module")
def demo() -> dict:
    results = build_sheets(parse_job(OUTRIGGER, source="outrigger.toml")).sheets[0].results
    return json.loads(json.dumps(results, ensure_ascii=False))


def test_the_demo_results_fit_the_shipped_schema(demo: dict) -> None:
    check_results_schema(demo)
    shipped = resources.files("calcsheet.pipeline").joinpath("results.schema.json")
    assert json.loads(shipped.read_text("utf-8")) == results_schema()


def test_the_schema_refuses_base_unit_spellings_and_missing_fields(demo: dict) -> None:
    broken = json.loads(json.dumps(demo))
    broken["steps"][0]["si_unit"] = "kg / m / s ** 2"
    del broken["checks"][0]["combination"]
    with pytest.raises(AssertionError) as raised:
        check_results_schema(broken)
    message = str(raised.value)
    assert "steps/0/si_unit" in message and "'combination' is a required property" in message


def test_every_point_has_its_label_coordinates_and_every_stress_term(demo: dict) -> None:
    points = demo["points"]
    steps = {step["name"]: step for step in demo["steps"]}
    assert [point["number"] for point in points] == [str(n) for n in range(1, len(points) + 1)]
    for point in points:
        n = point["number"]
        assert point["label"]
        assert point["x"]["unit"] == "in"
        assert point["x"]["si_value"] == pytest.approx(point["x"]["value"] * M_PER_IN)
        terms = point["stresses"]
        for term in ("sigma_Mx", "sigma_My", "sigma_z", "tau", "sigma_1", "sigma_2", "tau_max"):
            assert terms[term]["step"] == f"{term}_{n}"
            assert terms[term]["value"] == steps[f"{term}_{n}"]["value"]
        assert terms["sigma_vm"]["step"] == f"sigma_vm_{n}"
        assert terms["sigma_N"]["step"] == "sigma_N"  # the same at every point
        # The sum of the terms is the normal stress (common practice, no source).
        total = sum(terms[term]["value"] for term in ("sigma_N", "sigma_Mx", "sigma_My"))
        assert terms["sigma_z"]["value"] == pytest.approx(total, rel=1e-9)
        for term in terms.values():
            assert (term["unit"], term["si_unit"]) == ("ksi", "Pa")
            assert term["si_value"] == pytest.approx(term["value"] * PA_PER_KSI, rel=1e-6)


def test_a_round_section_gives_its_two_fibres_without_fixed_coordinates() -> None:
    text = STARTER.replace(
        'section = "W8X31"', 'section = { kind = "round HSS", OD = "6 in", t = "0.25 in" }'
    )
    results = build_sheets(parse_job(text, source="job.toml")).sheets[0].results
    points = results["points"]
    assert [point["number"] for point in points] == ["1", "2"]
    assert all(point["x"] is None and point["y"] is None for point in points)
    assert {"sigma_N", "sigma_b", "sigma_z", "tau", "sigma_vm"} <= set(points[0]["stresses"])


def test_each_check_gives_its_worst_combination_station_demand_and_capacity(demo: dict) -> None:
    flexure = next(check for check in demo["checks"] if check["description"] == "Flexure about x")
    assert flexure["utilization"] >= flexure["written_utilization"]
    assert flexure["combination"] and flexure["combination"] in flexure["governing_case"]
    assert flexure["governing_case"] == (
        f"{flexure['combination']}, station z = {flexure['station']['value']:g} in"
    )
    assert flexure["station"]["si_unit"] == "m"
    assert flexure["cases"] >= 2
    demand, capacity = flexure["demand"], flexure["capacity"]
    assert (demand["unit"], demand["si_unit"]) == ("kip·ft", "N·m")
    assert capacity["si_value"] == pytest.approx(capacity["value"] * NM_PER_KIP_FT, rel=1e-6)
    assert flexure["written_utilization"] == pytest.approx(demand["value"] / capacity["value"])
    # The deflection check is not evaluated per combination (the demo's arm carries its
    # own weight, so its deflection is found along the member).
    deflection = next(
        check
        for check in demo["checks"]
        if check["description"] in ("Tip deflection", "Deflection along the member")
    )
    assert deflection["combination"] is None and deflection["station"] is None


def test_si_units_are_named_as_written_and_display_units_agree_within_the_sheet(
    demo: dict,
) -> None:
    values = demo["inputs"] + demo["steps"]
    si_units = {value["si_unit"] for value in values}
    assert si_units <= {"", "Pa", "N", "N·m", "N/m", "m", "m²", "m³", "m⁴", "m⁶", "rad"}
    shown: dict[str, set[str]] = {}
    for value in values:
        shown.setdefault(value["si_unit"], set()).add(value["unit"])
    # One display unit per kind of quantity: moments all in kip·ft, stresses in ksi...
    assert {kind: units for kind, units in shown.items() if len(units) > 1} == {}


@pytest.mark.parametrize(
    ("unit", "written"),
    [
        ("kip * ft", "kip·ft"),
        ("kN * m", "kN·m"),
        ("inch ** 4", "in⁴"),
        ("kip / ft", "kip/ft"),
        ("ksi", "ksi"),
        ("kilogram / meter / second ** 2", "kg/(m·s²)"),
    ],
)
def test_units_are_written_force_first_with_superscripts(unit: str, written: str) -> None:
    assert unit_name(ureg.Unit(unit)) == written


def test_a_plain_sheet_with_an_unbounded_worst_case_gives_null_and_fits_the_schema() -> None:
    """JSON has no infinity (RFC 8259 section 6): a worst case against no capacity is null."""
    from calcsheet.engine import Sheet
    from calcsheet.pipeline.results import sheet_results

    sheet = Sheet("Bracket")
    with sheet:
        M = sheet.input("M", "12 kip*ft", "Moment", dimension="moment")
        M_n = sheet.input("M_n", "40 kip*ft", "Moment capacity", dimension="moment")
        check = sheet.check("Flexure", M, M_n, reference="AISC 360-22 Section F2")
    sheet.set_cases(check, float("inf"), "case 7", 8, combination="case 7")
    data = json.loads(json.dumps(sheet_results(sheet), ensure_ascii=False, allow_nan=False))
    check_results_schema(data)
    (flexure,) = data["checks"]
    assert flexure["utilization"] is None and flexure["status"] == "NOT OK"
    assert flexure["written_utilization"] == pytest.approx(0.3)  # 12 / 40
    assert (flexure["combination"], flexure["station"], flexure["cases"]) == ("case 7", None, 8)
    assert data["points"] == [] and data["trace"] == ""


def test_a_concise_sheet_lists_every_point_as_the_full_one_does(demo: dict) -> None:
    """Points only evaluated (not written out) on a concise sheet are in the JSON too."""
    text = OUTRIGGER.replace("[sheet]", '[sheet]\ndetail = "full"', 1)
    assert text != OUTRIGGER
    full = build_sheets(parse_job(text, source="outrigger.toml")).sheets[0].results
    assert json.loads(json.dumps(full["points"], ensure_ascii=False)) == demo["points"]
