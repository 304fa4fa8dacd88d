"""The EN lightest-section search against a brute-force loop over built sections.

Scenario (our own, invented numbers): a 2.4 m cantilever bracket carrying a hoist
block (Q) and its own gear (G) at the tip, 120 mm below the centroid, with a wind
push (W) across it; every EN 1990 Eq. (6.10) combination, every EN 1993-1-1 check
and the tip deflection under L/200.

The search reads each section's values from the family's closed-form table
(:mod:`calcsheet.standards.en1993.section_table`); the brute force builds every
section of the family (its outline integrated) and evaluates the member sheet's own
numeric path on it, one section at a time. Both must pick the same section, and agree
on every check of every section.
"""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.calcs.design import (
    DesignBasis,
    _deflection_utilization,
    _stiffness_of,
    lightest_section,
    plan_combinations,
    utilizations,
)
from calcsheet.mechanics import point_load
from calcsheet.sections import catalog_section
from calcsheet.standards.en1993.section_table import (
    circular_hollow_values,
    family_table,
    i_section_values,
)
from calcsheet.units import Quantity

LOADS = [
    point_load("gear", z="2.4 m", magnitude="4 kN", angle="90 deg", ey="-120 mm"),
    point_load("hoist", z="2.4 m", magnitude="12 kN", angle="75 deg", ey="-120 mm"),
    point_load("wind", z="2.4 m", components=("1.5 kN", "0 kN", "0 kN")),
]
TYPES = ["G", "Q", "W"]
LENGTH, STATION, FY = Quantity(2.4, "m"), Quantity(0, "m"), Quantity(355, "MPa")


def _brute_force(basis: DesignBasis, plan) -> tuple[str | None, dict[str, np.ndarray]]:
    """Every section of the family built, checked one by one (strength, then deflection)."""
    table = family_table(basis.lightest_in)
    chosen = None
    worst = {}
    for name in table.names:
        section = catalog_section(name)
        values, per_check, _ = utilizations(section, plan.forces, basis, FY, LENGTH)
        worst[name] = {key: float(np.max(value)) for key, value in per_check.items()}
        bending = 0.0
        if basis.deflection_ratio:
            stiffness = _stiffness_of(section)
            bending = _deflection_utilization(stiffness, LOADS, None, basis, LENGTH)[0]
        if chosen is None and max(values.max(), bending) <= 1.0:
            chosen = name
    return chosen, worst


@pytest.mark.parametrize(
    ("family", "limit"), [("IPE", 200), ("HEB", 200), ("RHS", 200), ("IPE", None), ("SHS", None)]
)
def test_the_search_picks_the_section_a_loop_over_built_sections_picks(family, limit) -> None:
    # Without the deflection limit the strength checks govern the choice.
    basis = DesignBasis("EN 1993-1-1", grade="S355", deflection_ratio=limit, lightest_in=family)
    plan = plan_combinations(catalog_section("IPE 300"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    chosen, lighter = lightest_section(plan, basis, FY, LENGTH, LOADS)
    expected, worst = _brute_force(basis, plan)
    assert chosen is not None and chosen.name == expected
    # Every check of every section agrees (the tables' closed forms and the built
    # outlines differ in the fifth significant figure).
    names, checks = basis.standard.search(family, plan.forces, basis, FY, LENGTH)
    for index, name in enumerate(names):
        for key, value in worst[name].items():
            searched = float(np.max(checks[key][index]))
            if math.isinf(value):
                assert math.isinf(searched), (name, key)
            else:
                assert searched == pytest.approx(value, rel=1e-3), (name, key)
    assert all(not candidate.passes for candidate in lighter)
    assert chosen.weight.units == Quantity(1, "kg/m").units


@pytest.mark.parametrize("height", ["top flange", "bottom flange"])
def test_the_search_reads_each_sections_own_ltb_curve_and_load_height(height) -> None:
    # IPE sections run from h/b ≤ 2 to h/b > 2 (EN 1993-1-1 Table 6.5: curve b, then c),
    # and z_g = ±h/2 follows each depth: the search must not take the first section's.
    basis = DesignBasis("EN 1993-1-1", grade="S355", lightest_in="IPE", load_height=height)
    plan = plan_combinations(catalog_section("IPE 300"), LOADS, TYPES, LENGTH, STATION, basis, FY)
    _, worst = _brute_force(basis, plan)
    names, checks = basis.standard.search("IPE", plan.forces, basis, FY, LENGTH)
    for index, name in enumerate(names):
        value, searched = worst[name]["ltb"], float(np.max(checks["ltb"][index]))
        if math.isinf(value):
            assert math.isinf(searched), name
        else:
            assert searched == pytest.approx(value, rel=1e-3), name


def test_an_en_job_sheet_lists_the_lightest_section_in_kg_per_metre() -> None:
    from calcsheet.calcs import member_sheet

    basis = DesignBasis("EN 1993-1-1", grade="S355", deflection_ratio=200, lightest_in="HEB")
    sheet = member_sheet(
        catalog_section("HEB 160"), LOADS, length=LENGTH, Fy=FY, design=basis, load_types=TYPES,
        units="SI",
    )  # fmt: skip
    tables = [part for part in sheet.parts if type(part).__name__ == "Table"]
    rows = [row for table in tables for row in table.rows if str(row[0]).startswith("HE ")]
    assert rows and all(str(row[1]).endswith(" kg/m") for row in rows)


def test_closed_form_i_section_values_match_the_product_table() -> None:
    # IPE 300, EN 10365:2017 dimensions h 300, b 150, t_w 7.1, t_f 10.7, r 15 mm; the
    # ArcelorMittal sections catalogue (2018) tabulates A = 53.81 cm², I_y = 8356 cm⁴,
    # W_pl,y = 628.4 cm³, I_z = 603.8 cm⁴, W_pl,z = 125.2 cm³ (from memory).
    values = i_section_values(300.0, 150.0, 7.1, 10.7, 15.0)
    assert values["A"] / 100 == pytest.approx(53.81, rel=1e-3)
    assert values["I_y"] / 1e4 == pytest.approx(8356, rel=1e-3)
    assert values["W_pl_y"] / 1e3 == pytest.approx(628.4, rel=1e-3)
    assert values["I_z"] / 1e4 == pytest.approx(603.8, rel=1e-3)
    assert values["W_pl_z"] / 1e3 == pytest.approx(125.2, rel=1e-3)


def test_closed_form_hollow_values_match_the_built_sections() -> None:
    # CHS: A = π/4·(d² − (d − 2t)²), exact; the built section integrates its outline.
    values = circular_hollow_values(168.3, 8.0)
    assert values["A"] == pytest.approx(math.pi / 4 * (168.3**2 - 152.3**2), rel=1e-12)
    for family in ("SHS", "RHS", "CHS", "HEM"):
        table = family_table(family)
        for index in (0, len(table.names) // 2, len(table.names) - 1):
            built = catalog_section(table.names[index]).properties
            assert table.values["A"][index] == pytest.approx(built["A"].to("m**2").m, rel=2e-4)
            assert table.values["W_pl_y"][index] == pytest.approx(
                built["Zx"].to("m**3").m, rel=2e-4
            )
            assert table.I_y[index] == pytest.approx(built["Iy"].to("m**4").m, rel=2e-4)
