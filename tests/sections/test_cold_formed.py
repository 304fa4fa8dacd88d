"""Cold-formed hollow sections of EN 10219-2 (issue 15): corner radii, properties from
the dimensions, look-up, the EN buckling curve and the EN lightest-section search."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.errors import InputError
from calcsheet.sections import catalog_section, find_entry, list_designations
from calcsheet.sections.metric import corner_radii, rectangular_hollow_area
from calcsheet.standards.en1993.section_table import family_table, hollow_corner_radii


@pytest.mark.parametrize(
    ("wall", "outer", "inner"),
    # EN 10219-2:2006 Annex B (from memory): r_o = 2t (t ≤ 6 mm), 2.5t (6 < t ≤ 10 mm),
    # 3t (t > 10 mm); r_i = r_o − t.
    [(5.0, 10.0, 5.0), (6.0, 12.0, 6.0), (8.0, 20.0, 12.0), (10.0, 25.0, 15.0), (12.5, 37.5, 25.0)],
)
def test_corner_radii_follow_en_10219_2(wall, outer, inner) -> None:
    assert corner_radii(wall, "cold-formed") == pytest.approx((outer, inner))
    table_outer, table_inner = hollow_corner_radii(np.array([wall]), "cold-formed")
    assert (table_outer[0], table_inner[0]) == pytest.approx((outer, inner))


def test_shs_100x100x5_cf_against_the_product_tables() -> None:
    """EN 10219-2 SHS 100x100x5 (r_o = 10 mm, r_i = 5 mm): A = 18.4 cm², I = 271 cm⁴,
    W_el = 54.2 cm³, W_pl = 64.6 cm³, I_t = 441 cm⁴, 14.4 kg/m (EN 10219-2 section
    tables as printed in manufacturers' catalogues, from memory)."""
    section = catalog_section("SHS 100x100x5 CF")
    p = section.properties
    assert section.family == "HSS_RECT"
    assert p["A"].to("cm**2").m == pytest.approx(18.4, rel=0.005)
    assert p["Ix"].to("cm**4").m == pytest.approx(271, rel=0.005)
    assert p["Iy"].to("cm**4").m == pytest.approx(271, rel=0.005)
    assert p["Sx"].to("cm**3").m == pytest.approx(54.2, rel=0.005)
    assert p["Zx"].to("cm**3").m == pytest.approx(64.6, rel=0.005)
    assert p["J"].to("cm**4").m == pytest.approx(441, rel=0.01)
    assert find_entry("SHS 100x100x5 CF").values["mass_kg_per_m"] == pytest.approx(14.4, abs=0.05)
    assert "EN 10219-2" in section.sources["A"] and "{r_o} = 2{t}" in section.sources["A"]


@pytest.mark.parametrize(
    "designation",
    ["SHS 100x100x5 CF", "SHS 100x100x8 CF", "RHS 200x100x6.3 CF", "RHS 300x200x12.5 CF"],
)
def test_area_against_the_closed_form_of_annex_b(designation) -> None:
    """A = 2t(B + H − 2t) − (4 − π)(r_o² − r_i²) (EN 10219-2:2006 Annex B, from memory);
    the section integrates its outline (arcs as chords), so within 0.1 %."""
    entry = find_entry(designation)
    h, b, t = (entry.values[name] for name in ("h_mm", "b_mm", "t_mm"))
    outer, inner = corner_radii(t, "cold-formed")
    closed = 2 * t * (b + h - 2 * t) - (4 - math.pi) * (outer**2 - inner**2)
    assert rectangular_hollow_area(h, b, t, outer, inner) == pytest.approx(closed, rel=1e-12)
    built = catalog_section(designation).properties["A"].to("mm**2").m
    assert built == pytest.approx(closed, rel=1e-3)
    # Mass at 7850 kg/m³ (EN 10219-2 density, from memory), rounded to 0.01 kg/m.
    assert entry.values["mass_kg_per_m"] == pytest.approx(closed * 1e-6 * 7850, abs=0.006)


def test_a_cold_formed_chs_is_the_annulus() -> None:
    """A = π·t·(d − t): CHS 168.3x8 CF, 40.3 cm² (closed form)."""
    area = catalog_section("CHS 168.3x8 CF").properties["A"].to("mm**2").m
    assert area == pytest.approx(math.pi * 8 * (168.3 - 8), rel=1e-3)


@pytest.mark.parametrize(
    "typed",
    ["SHS 100x100x5 CF", "shs 100x100x5 cf", "SHS-CF 100x100x5", "SHS CF 100 x 100 x 5",
     "shs_cf 100x100x5.0", "SHS100X100X5CF"],
)  # fmt: skip
def test_look_up_is_forgiving_and_keeps_hot_finished_apart(typed) -> None:
    assert find_entry(typed).designation == "SHS 100x100x5 CF"
    assert find_entry("SHS 100x100x5").designation == "SHS 100x100x5"
    assert find_entry("SHS 100x100x5").family.standard.startswith("EN 10210-2")
    assert find_entry(typed).family.standard.startswith("EN 10219-2")


def test_an_unknown_cold_formed_size_suggests_close_names() -> None:
    with pytest.raises(InputError) as error:
        find_entry("SHS 100x100x7 CF")
    message = str(error.value)
    assert "designation" in message and "SHS 100x100x7 CF" in message
    assert "SHS 100x100x8 CF" in message and "cold-formed" in message


def test_cold_formed_families_are_listed() -> None:
    for family in ("SHS_CF", "RHS_CF", "CHS_CF"):
        names = list_designations(family, lightest_first=True)
        assert names and all(name.endswith(" CF") for name in names)


def test_the_en_check_takes_buckling_curve_c_for_cold_formed() -> None:
    """EN 1993-1-1:2005 Table 6.2: cold-formed hollow sections, curve c (any grade);
    hot-finished, curve a (S235 to S420)."""
    from calcsheet.standards.en1993.member import member_data

    cold = member_data(catalog_section("SHS 100x100x5 CF"), length="3 m")
    assert cold.fabrication == "cold-formed"
    assert {choice.curve for choice in cold.curves.values()} == {"c"}
    hot = member_data(catalog_section("SHS 100x100x5"), length="3 m")
    assert {choice.curve for choice in hot.curves.values()} == {"a"}


@pytest.mark.parametrize("family", ["SHS_CF", "RHS_CF", "CHS_CF"])
def test_the_search_table_matches_the_built_sections(family) -> None:
    table = family_table(family)
    for index in (0, len(table.names) // 2, len(table.names) - 1):
        built = catalog_section(table.names[index]).properties
        assert table.values["A"][index] == pytest.approx(built["A"].to("m**2").m, rel=2e-4)
        assert table.values["W_pl_y"][index] == pytest.approx(built["Zx"].to("m**3").m, rel=2e-4)
        assert table.I_y[index] == pytest.approx(built["Iy"].to("m**4").m, rel=2e-4)
        assert table.values["I_t"][index] == pytest.approx(built["J"].to("m**4").m, rel=1e-9)


def test_the_en_lightest_search_runs_on_a_cold_formed_family() -> None:
    """The cold-formed SHS chosen is no lighter than the hot-finished one chosen for the
    same demands: curve c is below curve a and the corners take some area off."""
    from calcsheet.calcs.design import DesignBasis, lightest_section, plan_combinations
    from calcsheet.mechanics import point_load
    from calcsheet.units import Quantity

    loads = [point_load("hoist", z="2 m", magnitude="8 kN", angle="90 deg")]
    length, fy = Quantity(2, "m"), Quantity(355, "MPa")
    chosen = {}
    for family in ("SHS", "SHS_CF"):
        basis = DesignBasis("EN 1993-1-1", grade="S355", lightest_in=family)
        section = catalog_section("SHS 100x100x5")
        plan = plan_combinations(section, loads, ["G"], length, Quantity(0, "m"), basis, fy)
        chosen[family], _ = lightest_section(plan, basis, fy, length, loads)
    assert chosen["SHS_CF"].name.endswith(" CF")
    assert chosen["SHS_CF"].weight >= chosen["SHS"].weight * 0.97
