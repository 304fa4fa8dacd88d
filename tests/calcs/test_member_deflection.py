"""The member sheet's tip deflection uses the member's own load symbols (issue 12, item 5).

Before, the deflection writer wrote its own copies of the loads (a_d1, F_y_d1, ...)
next to the member's inputs, so a load stood twice on the sheet and the copies
could disagree with the loads the statics used. Now the deflection sums the
member's F_x1, F_y1, F_z1 (or P_1, θ_1 resolved), e_x1, e_y1, z_1 and C_x1, C_y1.

Expected values come from :func:`tip_deflection` (the array run of the same
procedure), which tests/mechanics/test_deflection.py checks against the closed
forms of AISC Manual Table 3-23 and against integration of the curvature.
Scenarios are our own (invented test data).
"""

from __future__ import annotations

import re

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.mechanics.deflection import tip_deflection
from calcsheet.render.html import render_html
from calcsheet.sections import angle, catalog_section

AISC = DesignBasis("AISC 360-22", method="LRFD", deflection_ratio=240)
SECTION = catalog_section("W10X33")
LENGTH = "84 in"


def _loads(P_1: str = "3 kip", F_y2: str = "-1.5 kip", z_2: str = "20 in"):
    return [
        # inclined and offset at the tip: F_y and F_z from P_1, θ_1; F_z at e_y bends
        point_load("bracket", magnitude=P_1, angle="30 deg", from_axis="-y", toward_axis="+z",
                   z="84 in", ey="5 in", ex="-1 in"),
        # between the support and the station (z_s = 30 in): not in the cut, in the deflection
        point_load("hanger", components=("0.4 kip", F_y2, "0 kip"), z=z_2),
        applied_moment("twist", z="60 in", Mx="-8 kip*in", My="5 kip*in", Mz="3 kip*in"),
    ]  # fmt: skip


def _build(basis: DesignBasis = AISC, section=SECTION, **changed):
    return member_sheet(
        section,
        _loads(**changed),
        length=LENGTH,
        station="30 in",
        design=basis,
        load_types=["G", "Q", "G"] if basis.kind == "EN 1993-1-1" else ["D", "L", "D"],
    )


def _expected(section=SECTION, E: str = "29000 ksi", **changed) -> float:
    return tip_deflection(section, _loads(**changed), length=LENGTH, E=E).total.to("inch").m


def _deflection_check(sheet):
    return next(check for check in sheet.checks if check.description == "Tip deflection")


def test_no_load_is_written_twice() -> None:
    sheet = _build()
    copies = [p.name for p in sheet.inputs if re.fullmatch(r"(a|[FCe]_[xyz])_d\d+", p.name)]
    assert copies == []
    used = {str(s) for s in sheet["v_tip"].expr.free_symbols | sheet["u_tip"].expr.free_symbols}
    # The member's own symbols: the resolved components of P_1, its offsets and position,
    # the hanger between support and station, the couple.
    assert {"F_y1", "F_z1", "e_y1", "e_x1", "z_1", "F_y2", "F_x2", "z_2", "C_x3", "C_y3"} <= used
    assert sheet.value("delta_tip").to("inch").m == pytest.approx(_expected(), rel=1e-9)
    check = _deflection_check(sheet)
    assert check.utilization == pytest.approx(_expected() / (84 / 240), rel=1e-9)


@pytest.mark.parametrize(
    ("name", "value", "changed"),
    [
        ("P_1", "5 kip", {"P_1": "5 kip"}),
        ("F_y2", "-4 kip", {"F_y2": "-4 kip"}),
        ("z_2", "10 in", {"z_2": "10 in"}),
    ],
)
def test_set_input_changes_the_tip_deflection_as_a_fresh_build(name, value, changed) -> None:
    sheet = _build()
    before = sheet.value("delta_tip").to("inch").m
    sheet.set_input(name, value)
    fresh = _build(**changed)
    for step in ("u_tip", "v_tip", "delta_tip", "delta_lim"):
        assert sheet.value(step).to("inch").m == fresh.value(step).to("inch").m, step
    assert _deflection_check(sheet).utilization == _deflection_check(fresh).utilization
    after = sheet.value("delta_tip").to("inch").m
    assert after != pytest.approx(before)
    assert after == pytest.approx(_expected(**changed), rel=1e-9)


def test_a_load_component_that_becomes_non_zero_enters_after_set_input() -> None:
    """A zero component is left out of the sums at build; the rebuild brings it back."""
    sheet = _build(F_y2="0 kip")
    assert "F_y2" not in {str(s) for s in sheet["v_tip"].expr.free_symbols}
    sheet.set_input("F_y2", "-2 kip")
    assert "F_y2" in {str(s) for s in sheet["v_tip"].expr.free_symbols}
    assert sheet.value("delta_tip").to("inch").m == pytest.approx(
        _expected(F_y2="-2 kip"), rel=1e-9
    )


def test_unsymmetric_angle_on_a_generic_member_sheet() -> None:
    section = angle("5 in", "3 in", "0.5 in")
    generic = DesignBasis("allowable stress", deflection_ratio=250)
    sheet = _build(generic, section)
    assert sheet.value("D_I").m > 0  # the unsymmetric formulas, through the member's I_xy
    expected = _expected(section)
    assert sheet.value("delta_tip").to("inch").m == pytest.approx(expected, rel=1e-9)
    assert _deflection_check(sheet).utilization == pytest.approx(expected / (84 / 250), rel=1e-9)


def test_en_1993_member_shares_its_modulus() -> None:
    en = DesignBasis("EN 1993-1-1", deflection_ratio=250)
    sheet = _build(en)
    assert sheet.value("E").to("MPa").m == pytest.approx(210000)
    expected = _expected(E="210000 MPa")
    assert sheet.value("delta_tip").to("inch").m == pytest.approx(expected, rel=1e-9)


def test_member_sheets_equal_the_array_run_over_random_members() -> None:
    """Printed (member sheet) and numeric (tip_deflection) agree to 1e-9."""
    rng = np.random.default_rng(7)
    generic = DesignBasis("allowable stress", deflection_ratio=240)
    members = [  # the AISC checks cover W shapes and equal-leg angles
        (SECTION, AISC),
        (catalog_section("L6X6X1/2"), AISC),
        (catalog_section("L4X3X3/8"), generic),
        (catalog_section("C10X15.3"), generic),
    ]
    for _ in range(8):
        section, basis = members[int(rng.integers(len(members)))]
        changed = {
            "P_1": f"{rng.uniform(0.5, 6):.4f} kip",
            "F_y2": f"{rng.uniform(-4, 4):.4f} kip",
            "z_2": f"{rng.uniform(1, 84):.3f} in",
        }
        sheet = _build(basis, section, **changed)
        expected = _expected(section, **changed)
        assert sheet.value("delta_tip").to("inch").m == pytest.approx(expected, rel=1e-9)


def test_the_member_sheet_cites_published_sources_only() -> None:
    words = render_html(_build()).lower()
    assert "table 3-23" in words
    assert "from memory" not in words and "common practice" not in words
