"""AISC 360-22 checks on EN metric sections (issue 15, bad input: "an AISC check on a
metric shape works").

Scenario (our own, invented numbers): a 2 m cantilever with a 10 kN tip load down,
S355 steel (F_y = 355 MPa), checked to AISC 360-22 LRFD.
"""

from __future__ import annotations

import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis
from calcsheet.mechanics import point_load
from calcsheet.sections import catalog_section
from calcsheet.standards.aisc360.section_data import section_values

LOADS = [point_load("tip", z="2 m", components=("0 kN", "-10 kN", "0 kN"))]


def _sheet(designation: str):
    return member_sheet(
        catalog_section(designation), LOADS, length="2 m", Fy="355 MPa",
        design=DesignBasis("AISC 360-22"), load_types=["D"],
    )  # fmt: skip


def test_k_des_of_an_en_i_section_is_flange_thickness_plus_root_radius() -> None:
    """IPE 300: t_f = 10.7 mm, r = 15 mm (EN 10365:2017 table, the vendored file), so
    k_des = t_f + r = 25.7 mm; the sheet says how it was obtained."""
    values = section_values(catalog_section("IPE 300"))
    assert values["k_des"].quantity.to("mm").m == pytest.approx(10.7 + 15.0)
    assert "t_f + r" in values["k_des"].source
    assert "AISC shape tables give k_des for their own shapes only" in values["k_des"].source
    assert values["d"].source == "dimension of the EN 10365:2017 section"


def test_an_en_hollow_section_keeps_its_wall_thickness() -> None:
    """AISC 360-22 Section B4.2: the 0.93·t design thickness is for ERW HSS made to ASTM
    A500; an EN 10210 SHS 100x100x5 keeps t = 5 mm, and the sheet says so."""
    values = section_values(catalog_section("SHS 100x100x5"))
    assert values["t"].quantity.to("mm").m == pytest.approx(5.0)
    assert "0.93 t" in values["t"].source and "ASTM A500" in values["t"].source
    chs = section_values(catalog_section("CHS 168.3x8"))
    assert chs["t"].quantity.to("mm").m == pytest.approx(8.0)


def test_an_ipe_300_checked_to_aisc_builds_a_sheet_with_mp_by_hand() -> None:
    """M_p = F_y·Z_x (AISC 360-22 Eq. F2-1) with Z_x of the IPE 300 as computed from its
    dimensions; checked by hand against the EN 10365 tabulated W_pl,y = 628.4 cm³
    (ArcelorMittal sales programme, from memory): 355 MPa × 628.4 cm³ = 223.1 kN·m."""
    sheet = _sheet("IPE 300")
    z_x = sheet.value("Z_x").to("mm**3").m
    assert z_x == pytest.approx(628.4e3, rel=0.005)
    assert sheet.value("M_p").to("kN*m").m == pytest.approx(355 * z_x / 1e6, rel=1e-9)
    assert sheet.value("M_p").to("kN*m").m == pytest.approx(223.1, rel=0.005)
    # h = d − 2·k_des = 300 − 2·25.7 = 248.6 mm (AISC 360-22 Table B4.1b, k_des as above)
    assert sheet.value("h").to("mm").m == pytest.approx(248.6)
    assert sheet["k_des"].reference.startswith("k_des = t_f + r")
    assert all(check.reference.startswith("AISC 360-22") for check in sheet.checks)


def test_an_shs_100x100x5_checked_to_aisc_builds_a_sheet_with_mp_by_hand() -> None:
    """Rectangular HSS flexure, AISC 360-22 F7: M_p = F_y·Z_x (Eq. F7-1). Z of an SHS
    100x100x5 with EN 10210-2 corners (r_o = 1.5t, r_i = t): 66.4 cm³ (EN 10210-2
    tables, from memory), so M_p = 355 MPa × 66.4 cm³ = 23.6 kN·m."""
    sheet = _sheet("SHS 100x100x5")
    z_x = sheet.value("Z_x").to("mm**3").m
    assert z_x == pytest.approx(66.4e3, rel=0.005)
    assert sheet.value("M_p_x").to("kN*m").m == pytest.approx(355 * z_x / 1e6, rel=1e-9)
    assert sheet.value("t").to("mm").m == pytest.approx(5.0)


@pytest.mark.parametrize("designation", ["HE 200 B", "CHS 168.3x8", "RHS 200x100x6.3 CF"])
def test_other_en_families_build_an_aisc_sheet(designation: str) -> None:
    sheet = _sheet(designation)
    assert sheet.checks and all(check.worst_utilization >= 0 for check in sheet.checks)


def test_an_en_check_on_an_aisc_shape_says_where_the_root_radius_came_from() -> None:
    """The EN check reads the fillet of a W shape as k_des − t_f of the AISC tables."""
    from calcsheet.standards.en1993.member import member_data

    member = member_data(catalog_section("W10X33"), length="2 m")
    assert "AISC tables" in member.values["r"][2]


def test_the_aisc_lightest_search_runs_on_an_en_family() -> None:
    """The search's table of an EN family holds the values its sheets print."""
    from calcsheet.standards.aisc360.section_data import catalog_table

    table = catalog_table(["IPE 200", "IPE 300"])
    assert table.kind == "I"
    z_x = section_values(catalog_section("IPE 300"))["Z_x"].quantity.to("m**3").m
    assert table.values["Z_x"][1, 0] == pytest.approx(z_x, rel=1e-12)
    assert table.values["k_des"][1, 0] == pytest.approx((10.7 + 15.0) / 1000)


def test_the_sheet_prints_how_k_des_was_obtained() -> None:
    from calcsheet.render.html import render_html

    html = render_html(_sheet("IPE 300"))
    assert "t_f + r" in html and "for their own shapes only" in html


def test_the_aisc_lightest_search_picks_an_ipe_that_passes_on_its_own_sheet() -> None:
    from calcsheet.calcs.design import lightest_section, plan_combinations
    from calcsheet.units import Quantity

    basis = DesignBasis("AISC 360-22", lightest_in="IPE")
    length, fy = Quantity(2, "m"), Quantity(355, "MPa")
    plan = plan_combinations(
        catalog_section("IPE 300"), LOADS, ["D"], length, Quantity(0, "m"), basis, fy
    )
    chosen, lighter = lightest_section(plan, basis, fy, length, LOADS)
    assert chosen is not None and chosen.name.startswith("IPE")
    assert all(not candidate.passes for candidate in lighter)
    assert all(check.worst_utilization <= 1.0 for check in _sheet(chosen.name).checks)
