"""Design checks on the member sheet: combinations, specification checks, exploration.

Scenario (our own, invented numbers): a 5 ft W10x33 davit arm with a 5 kip hoist pull
(dead load, D) 30° from −y toward +z on a lug 5 in below the centroid, and a 0.5 kip
wind push (W) along +x at the tip. The sheet's printed checks are compared with the
numeric path of the same clauses, which the combination search and the exploration use.
"""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import (
    DesignBasis,
    check_titles,
    lightest_section,
    plan_combinations,
)
from calcsheet.calcs.member_analysis import member_twist, resolve_supports, statics_rows
from calcsheet.errors import InputError
from calcsheet.mechanics import point_load
from calcsheet.sections import catalog_section
from calcsheet.units import Quantity

LOADS = [
    point_load(
        "hoist", z="60 in", magnitude="5 kip", angle="30 deg", from_axis="-y",
        toward_axis="+z", ey="-5 in",
    ),
    point_load("wind", z="60 in", components=("0.5 kip", "0 kip", "0 kip")),
]  # fmt: skip
TYPES = ["D", "W"]
LENGTH, STATION, FY = Quantity(60, "in"), Quantity(0, "in"), Quantity(50, "ksi")


def _sheet(basis: DesignBasis, section: str = "W10X33", types=TYPES):
    return member_sheet(
        catalog_section(section), LOADS, length=LENGTH, Fy=FY, design=basis, load_types=types
    )


@pytest.mark.parametrize("method", ["LRFD", "ASD"])
def test_the_printed_aisc_checks_agree_with_the_numeric_path(method: str) -> None:
    basis = DesignBasis("AISC 360-22", method=method, grade="ASTM A992")
    sheet = _sheet(basis)
    plan = plan_combinations(catalog_section("W10X33"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    # ASCE 7-22 2.3.1 strength: 1.4D, 1.2D + W, 0.9D + W; 2.4.1 ASD: D, D + 0.6W,
    # D + 0.45W (with L, here absent), 0.6D + 0.6W (from memory).
    assert plan is not None and len(plan.combos) == {"LRFD": 3, "ASD": 4}[method]
    governing = max(check.utilization for check in sheet.checks)
    assert governing == pytest.approx(plan.utilization.max(), rel=1e-9)
    # The load factors of the governing combination multiply the loads in the statics.
    combo = plan.governing_combination
    assert sheet.value("gamma_D").m == combo.factor("D")
    assert sheet.value("N").to("N").m == pytest.approx(plan.forces[plan.governing][0])
    assert sheet.value("M_x").to("N*m").m == pytest.approx(plan.forces[plan.governing][4])


def test_a_changed_load_factor_needs_a_rebuild() -> None:
    sheet = _sheet(DesignBasis("AISC 360-22"))
    with pytest.raises(InputError, match="governing combination was chosen"):
        sheet.set_input("gamma_D", 1.6)


def test_en_1993_with_en_1990_combinations() -> None:
    basis = DesignBasis("EN 1993-1-1", grade="S355")
    sheet = _sheet(basis, types=["G", "W"])
    names = [check.description for check in sheet.checks]
    assert any("Flexural buckling" in name for name in names)
    assert all(check.utilization is not None for check in sheet.checks)
    with pytest.raises(InputError, match="standard|type|G, Q"):
        _sheet(basis, types=["D", "W"])  # D is an ASCE 7 type, not EN 1990's


def test_a_family_the_standard_does_not_cover_is_refused_clearly() -> None:
    with pytest.raises(InputError) as raised:
        _sheet(DesignBasis("AISC 360-22"), section="C10X15.3")
    assert "section" in str(raised.value).lower()


def test_the_sweep_passes_through_the_drawn_angle_and_names_the_worst() -> None:
    basis = DesignBasis("AISC 360-22", sweep_load="hoist", sweep_step_deg=5.0)
    sheet = _sheet(basis)
    from calcsheet.calcs.design import angle_sweep

    sweep = angle_sweep(catalog_section("W10X33"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    drawn = sweep.utilization[list(sweep.angles_deg).index(30.0)]
    assert drawn == pytest.approx(max(check.utilization for check in sheet.checks), rel=1e-9)
    assert sweep.utilization.max() >= drawn
    assert sweep.worst_deg == sweep.angles_deg[int(np.argmax(sweep.utilization))]
    assert any("Design exploration" in getattr(part, "text", "") for part in sheet.parts)


def test_the_lightest_section_passes_in_its_own_sheet_and_the_lighter_ones_fail() -> None:
    basis = DesignBasis("AISC 360-22", lightest_in="W")
    plan = plan_combinations(catalog_section("W10X33"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    chosen, lighter = lightest_section(plan, basis, FY, LENGTH)
    assert chosen is not None and chosen.passes
    assert lighter and all(not candidate.passes for candidate in lighter)
    assert all(candidate.weight <= chosen.weight for candidate in lighter)
    # Independent of the numeric path: the chosen section's printed sheet passes every check.
    sheet = _sheet(DesignBasis("AISC 360-22"), section=chosen.name)
    assert all(check.passes for check in sheet.checks)
    assert max(check.utilization for check in sheet.checks) == pytest.approx(
        chosen.utilization, rel=1e-6
    )


def test_the_lightest_search_is_only_offered_with_a_specification() -> None:
    with pytest.raises(InputError, match="lightest_in"):
        DesignBasis("allowable stress", lightest_in="W")


def test_the_en_search_refuses_an_aisc_family_naming_the_en_ones() -> None:
    basis = DesignBasis("EN 1993-1-1", grade="S355", lightest_in="W")
    plan = plan_combinations(
        catalog_section("W10X33"), LOADS, ["G", "W"], LENGTH, STATION, basis, FY
    )
    with pytest.raises(InputError, match="explore lightest_in.*IPE, HEA, HEB, HEM, SHS, RHS, CHS"):
        lightest_section(plan, basis, FY, LENGTH)


def test_each_check_names_its_governing_combination() -> None:
    basis = DesignBasis("AISC 360-22")
    plan = plan_combinations(catalog_section("W10X33"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    # Arithmetic of the ASCE 7-22 2.3.1 factors (from memory): 1.4D has the most axial
    # force (all of it from D); the combinations with 1.0W the most flexure about y.
    axial = plan.combos[int(np.argmax(plan.per_check["axial"]))]
    flexure_y = plan.combos[int(np.argmax(plan.per_check["flexure_y"]))]
    assert axial.factor("D") == 1.4 and flexure_y.factor("W") == 1.0
    sheet = _sheet(basis)
    tables = [
        part for part in sheet.parts if getattr(part, "columns", ())[:2] == ("Combination", "(1)")
    ]
    # Every combination x every check, and a last row with each check's worst.
    assert tables and len(tables[0].rows) == len(plan.combos) + 1
    assert len(tables[0].columns) == len(plan.per_check) + 1
    # Each check on the sheet stands for its worst combination.
    titles = check_titles(basis)
    for check in sheet.checks:
        key = next((k for k, title in titles.items() if title == check.description), None)
        if key is None:
            continue  # the deflection check: service loads as given
        assert check.worst_utilization == pytest.approx(float(np.max(plan.per_check[key])))
        assert check.cases is not None and check.cases.count == len(plan.combos)


def test_the_sweep_includes_the_deflection_check() -> None:
    """Issue 17: a member whose deflection governs showed a sweep maximum below it.

    A 10 ft HSS4x4x1/4 arm (our own, invented) with 1.2 kip at the tip: the tip
    deflection against L/360 governs; at the drawn angle the sweep must equal the
    sheet's governing check, and its maximum can only be larger.
    """
    loads = [point_load("arm", magnitude="1.2 kip", angle="90 deg", z="120 in", ey="-2 in")]
    basis = DesignBasis("AISC 360-22", deflection_ratio=360, sweep_load="arm")
    sheet = member_sheet(
        catalog_section("HSS4X4X1/4"), loads, length="120 in", design=basis, load_types=["D"]
    )
    governing = sheet.governing_check()
    assert governing.description == "Tip deflection"
    from calcsheet.calcs.design import angle_sweep

    sweep = angle_sweep(
        catalog_section("HSS4X4X1/4"), loads, ["D"], Quantity(120, "in"), Quantity(0, "in"),
        basis, Quantity(50, "ksi"),
    )  # fmt: skip
    assert sweep.drawn_utilization == pytest.approx(governing.worst_utilization, rel=1e-9)
    assert sweep.utilization.max() >= governing.worst_utilization * (1 - 1e-9)


def test_the_lightest_section_also_passes_the_deflection_check() -> None:
    """Issue 17: the lightest-section table used the strength checks only.

    A 10 ft cantilever (our own, invented) with 1.2 kip at the tip against L/360: the
    lightest W passing strength fails the deflection, so the table's choice must be a
    heavier one whose own sheet passes every check.
    """
    loads = [point_load("arm", magnitude="1.2 kip", angle="90 deg", z="120 in")]
    strength_only = DesignBasis("AISC 360-22", lightest_in="W")
    with_deflection = DesignBasis("AISC 360-22", lightest_in="W", deflection_ratio=360)
    plan = plan_combinations(
        catalog_section("W8X31"), loads, ["D"], Quantity(120, "in"), Quantity(0, "in"),
        with_deflection, FY,
    )  # fmt: skip
    by_strength, _ = lightest_section(plan, strength_only, FY, Quantity(120, "in"), loads)
    chosen, lighter = lightest_section(plan, with_deflection, FY, Quantity(120, "in"), loads)
    assert chosen.name != by_strength.name and chosen.weight > by_strength.weight
    assert any(c.governing_check == "deflection" and not c.passes for c in lighter)
    sheet = member_sheet(
        catalog_section(chosen.name), loads, length="120 in", Fy=FY,
        design=DesignBasis("AISC 360-22", deflection_ratio=360), load_types=["D"],
    )  # fmt: skip
    assert all(check.passes for check in sheet.checks)


@pytest.mark.parametrize(
    ("kind", "section"),
    [
        ("AISC 360-22", "W10X33"),
        ("AISC 360-22", "HSS6X6X3/8"),
        ("AISC 360-22", "HSS6.625X0.280"),
        ("AISC 360-22", "Pipe4STD"),
        ("AISC 360-22", "L4X4X1/2"),
        ("EN 1993-1-1", "W10X33"),
        ("EN 1993-1-1", "HSS6X6X3/8"),
        ("EN 1993-1-1", "HSS6.625X0.280"),
        ("EN 1993-1-1", "IPE 300"),
        ("EN 1993-1-1", "HE 200 B"),
        ("EN 1993-1-1", "SHS 100x100x5"),
        ("EN 1993-1-1", "CHS 168.3x8"),
    ],
)
def test_a_member_sheet_builds_for_every_family_the_checks_cover(kind, section) -> None:
    """A round HSS once stopped the AISC sheet: the stress steps and the checks both
    named a step V_r. Every covered family builds, each check at its own worst."""
    basis = DesignBasis(kind, deflection_ratio=180, grade="S355" if kind != "AISC 360-22" else "")
    types = ["D", "W"] if kind == "AISC 360-22" else ["G", "W"]
    sheet = member_sheet(
        catalog_section(section), LOADS, length=LENGTH, Fy=FY, design=basis, load_types=types
    )
    # The sheet's torsion is about the shear centre (an angle's heel: a load through the
    # centroid twists it); the plan takes the same torque.
    # ... and the twist of an open section with warping (the cantilever fixed at z = 0).
    shape = catalog_section(section)
    _, held = resolve_supports("fixed-free", None, LENGTH)
    twist = member_twist(shape, LENGTH, held, LOADS, types, basis.standard.modulus)
    by_type = statics_rows(shape, LOADS, types, LENGTH, STATION, twist)
    plan = plan_combinations(
        catalog_section(section), LOADS, types, LENGTH, STATION, basis, FY, by_type=by_type
    )
    titles = check_titles(basis)
    for check in sheet.checks:
        key = next((k for k, title in titles.items() if title == check.description), None)
        if key is not None:
            assert check.worst_utilization == pytest.approx(
                float(np.max(plan.per_check[key])), rel=1e-9, abs=1e-12
            )


def test_en_checks_read_a_metric_section_as_its_product_standard_gives_it() -> None:
    """EN 10365 gives the root radius r of an IPE (15 mm for IPE 300, from the vendored
    EN 10365 table); an EN 10210 hollow section is hot-finished (buckling curve a,
    EN 1993-1-1 Table 6.2), a section drawn from dimensions cold-formed (curve c)."""
    from calcsheet.standards.en1993.member import member_data

    ipe = member_data(catalog_section("IPE 300"), length="3 m")
    assert ipe.values["r"][0].to("mm").m == pytest.approx(15.0)
    shs = member_data(catalog_section("SHS 100x100x5"), length="3 m")
    assert shs.fabrication == "hot-finished"
    assert {choice.curve for choice in shs.curves.values()} == {"a"}
