"""Each check's reported utilization is its worst over every combination, found by brute force.

Issue 12 failure 4: the summary and the JSON showed each check at the combination
that governs overall, not at its own worst. Here every combination is also written
as a sheet of its own (the loads multiplied by the combination's factors and taken
as given, so only the printed procedure is involved) and each check's reported
worst must equal the largest utilization of that check over those sheets. The live
load is turned through several angles so that different checks peak under
different combinations.

Scenario (our own, invented numbers): a 7 ft W8x31 outrigger with a dead-load
hanger at the tip below the centroid, a live-load pull through a bracket and a
wind push along x.
"""

from __future__ import annotations

import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis, plan_combinations
from calcsheet.mechanics import point_load
from calcsheet.mechanics.loads import PointLoad
from calcsheet.pipeline.results import sheet_results
from calcsheet.sections import catalog_section
from calcsheet.units import Quantity

SECTION = catalog_section("W8x31")
LENGTH = Quantity(84, "in")
TYPES = ["D", "L", "W"]


def _loads(angle_deg: float) -> list[PointLoad]:
    return [
        point_load("hanger", magnitude="3 kip", angle="90 deg", z="84 in", ey="-4 in"),
        point_load(
            "pull", magnitude="4 kip", angle=f"{angle_deg} deg", z="60 in", ex="2 in", ey="3 in"
        ),
        point_load("wind", components=("0.9 kip", "0 kip", "0 kip"), z="84 in"),
    ]


def _scaled(loads: list[PointLoad], factors: list[float]) -> list[PointLoad]:
    return [
        point_load(
            load.name,
            components=(factor * load.Fx, factor * load.Fy, factor * load.Fz),
            z=load.z,
            ex=load.ex,
            ey=load.ey,
        )
        for load, factor in zip(loads, factors, strict=True)
        if factor != 0.0
    ]


@pytest.mark.parametrize("method", ["LRFD", "ASD"])
@pytest.mark.parametrize("angle_deg", [0.0, 135.0, 250.0])
def test_each_check_reports_its_worst_combination(method: str, angle_deg: float) -> None:
    basis = DesignBasis("AISC 360-22", method=method)
    loads = _loads(angle_deg)
    sheet = member_sheet(SECTION, loads, length=LENGTH, design=basis, load_types=TYPES)
    plan = plan_combinations(
        SECTION, loads, TYPES, LENGTH, Quantity(0, "in"), basis, sheet.value("F_y")
    )
    given = DesignBasis("AISC 360-22", method=method, combinations="none")
    brute: dict[str, float] = {}
    for combo in plan.combos:
        factors = [combo.factor(kind) for kind in TYPES]
        acting = [kind for kind, factor in zip(TYPES, factors, strict=True) if factor != 0.0]
        one = member_sheet(
            SECTION, _scaled(loads, factors), length=LENGTH, design=given, load_types=acting
        )
        for check in one.checks:
            brute[check.description] = max(brute.get(check.description, 0.0), check.utilization)
    reported = {check.description: check for check in sheet.checks}
    for description, worst in brute.items():
        if description == "Tip deflection":
            continue  # a service check under the loads as given, not under combinations
        assert reported[description].worst_utilization == pytest.approx(worst, rel=1e-9, abs=1e-12)
    results = {c["description"]: c for c in sheet_results(sheet)["checks"]}
    for description, worst in brute.items():
        if description != "Tip deflection":
            assert results[description]["utilization"] == pytest.approx(worst, rel=1e-9, abs=1e-12)
    assert sheet_results(sheet)["all_pass"] == all(v <= 1.0 for v in brute.values())


def test_a_check_can_peak_under_another_combination_than_the_governing_one() -> None:
    """The case issue 12 reported: the scenario has a check whose worst combination is
    not the one written out, so the old summary understated it."""
    basis = DesignBasis("AISC 360-22", method="LRFD")
    sheet = member_sheet(SECTION, _loads(135.0), length=LENGTH, design=basis, load_types=TYPES)
    moved = [check for check in sheet.checks if check.worst_case]
    assert moved, "no check peaks under another combination: the scenario lost its point"
    for check in moved:
        assert check.worst_utilization > check.utilization


def _en_loads(angle_deg: float) -> list[PointLoad]:
    return [
        point_load("sign", magnitude="6 kN", angle="90 deg", z="2.1 m", ey="-0.12 m"),
        point_load("hoist", magnitude="15 kN", angle=f"{angle_deg} deg", z="1.5 m", ex="0.05 m"),
        point_load("wind", components=("3 kN", "0 kN", "0 kN"), z="2.1 m"),
    ]


@pytest.mark.parametrize("angle_deg", [10.0, 160.0, 300.0])
def test_each_en_check_reports_its_worst_combination(angle_deg: float) -> None:
    """The same brute force for EN 1993-1-1 under EN 1990 Eq. (6.10), favourable variable
    actions omitted (Table A1.2(B)): a 2.1 m SHS 120x120x6 outrigger (our own, invented)."""
    from calcsheet.sections import rectangular_hss

    section = rectangular_hss("120 mm", "120 mm", "6 mm")
    types = ["G", "Q", "W"]
    length = Quantity(2.1, "m")
    basis = DesignBasis("EN 1993-1-1", grade="S355")
    loads = _en_loads(angle_deg)
    sheet = member_sheet(
        section, loads, length=length, Fy="355 MPa", design=basis, load_types=types, units="SI"
    )
    plan = plan_combinations(
        section, loads, types, length, Quantity(0, "m"), basis, Quantity(355, "MPa")
    )
    given = DesignBasis("EN 1993-1-1", grade="S355", combinations="none")
    brute: dict[str, float] = {}
    for combo in plan.combos:
        factors = [combo.factor(kind) for kind in types]
        acting = [kind for kind, factor in zip(types, factors, strict=True) if factor != 0.0]
        one = member_sheet(
            section, _scaled(loads, factors), length=length, Fy="355 MPa", design=given,
            load_types=acting, units="SI",
        )  # fmt: skip
        for check in one.checks:
            brute[check.description] = max(brute.get(check.description, 0.0), check.utilization)
    reported = {check.description: check for check in sheet.checks}
    assert set(brute) <= set(reported)
    for description, worst in brute.items():
        assert reported[description].worst_utilization == pytest.approx(worst, rel=1e-9, abs=1e-12)


def test_issue_12_failure_2_a_live_load_that_helps_is_also_left_out() -> None:
    """ASCE 7-22 2.3.1: "the effects of one or more loads not acting shall be investigated".

    A 12 ft W8x31 column (our own, invented): roof dead load 20 kip on its axis, a crane
    bracket live load 8 kip 12 in off the axis on the windward face, wind 2.95 kip the
    other way at the top. The bracket's moment opposes the wind's, so 1.2D + 1.0W without
    L is worse than with it. Before, every combination kept L when the job had one and the
    sheet said OK (0.985 under 1.2D + W + L); 1.2D + W gives 1.012.
    """
    loads = [
        point_load("roof", magnitude="20 kip", angle="180 deg", from_axis="+z",
                   toward_axis="+x", z="144 in"),
        point_load("crane bracket", magnitude="8 kip", angle="180 deg", from_axis="+z",
                   toward_axis="+x", z="144 in", ex="12 in"),
        point_load("wind", components=("-2.95 kip", "0 kip", "0 kip"), z="144 in"),
    ]  # fmt: skip
    types = ["D", "L", "W"]
    basis = DesignBasis("AISC 360-22")
    sheet = member_sheet(SECTION, loads, length="144 in", design=basis, load_types=types)
    plan = plan_combinations(
        SECTION, loads, types, Quantity(144, "in"), Quantity(0, "in"), basis, sheet.value("F_y")
    )
    by_text = {
        combo.text(): float(u) for combo, u in zip(plan.combos, plan.utilization, strict=True)
    }
    assert by_text["1.2D + W + L"] < 1.0 < by_text["1.2D + W"]
    governing = sheet.governing_check()
    assert not governing.passes and governing.worst_utilization > 1.0
    assert plan.governing_combination.text() == "1.2D + W"


def test_issue_12_failure_3_a_favourable_imposed_load_is_omitted() -> None:
    """EN 1990 Table A1.2(B): a favourable variable action takes 0, and γG,inf = 1.0.

    A 2 m SHS 100x100x5 canopy arm (our own, invented): its own weight 1 kN and an
    imposed maintenance load 1.5 kN down at the tip, wind uplift 4 kN. G + 1.5W without Q
    is the worst; before, Q always accompanied the leading wind (1.5·ψ0·Q).
    """
    from calcsheet.sections import rectangular_hss

    section = rectangular_hss("100 mm", "100 mm", "5 mm")
    loads = [
        point_load("canopy", magnitude="1 kN", angle="90 deg", z="2 m"),
        point_load("maintenance", magnitude="1.5 kN", angle="90 deg", z="2 m"),
        point_load("uplift", magnitude="4 kN", angle="-90 deg", z="2 m"),
    ]
    types = ["G", "Q", "W"]
    basis = DesignBasis("EN 1993-1-1", grade="S355")
    sheet = member_sheet(
        section, loads, length="2 m", Fy="355 MPa", design=basis, load_types=types, units="SI"
    )
    plan = plan_combinations(
        section, loads, types, Quantity(2, "m"), Quantity(0, "m"), basis, Quantity(355, "MPa")
    )
    governing = plan.governing_combination
    assert governing.factor("Q") == 0.0 and governing.factor("W") == 1.5
    assert governing.factor("G") == 1.0
    old = [c for c in plan.combos if c.factor("W") == 1.5 and c.factor("Q") > 0]
    worst_old = max(float(plan.utilization[plan.combos.index(c)]) for c in old)
    assert sheet.governing_check().worst_utilization > worst_old
