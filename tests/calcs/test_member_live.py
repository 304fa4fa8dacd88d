"""A member sheet follows every change of its inputs (issue: live sheets).

Each load input of a member sheet is changed in turn with ``set_input`` and the
sheet is compared with a fresh build from the changed loads: every step, every
check (the worst over the combinations included), the figures and the JSON
results must be equal. Before this, the tip deflection kept the loads it was built
with (its writer made its own copies), so its check went stale.

Scenario (our own): a 6 ft W8x31 outrigger, a dead-load hanger at the tip, a live
pull inclined 20° at mid-length with an offset, a wind push and a twisting couple.
"""

from __future__ import annotations

import dataclasses

import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis
from calcsheet.engine import Figure
from calcsheet.errors import InputError
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.pipeline.results import sheet_results
from calcsheet.sections import catalog_section
from calcsheet.units import Quantity

SECTION = catalog_section("W8x31")
TYPES = ["D", "L", "W", "D"]
BASIS = DesignBasis("AISC 360-22", method="LRFD", deflection_ratio=180)


def _loads(**changed):
    values = {
        "P_1": "2 kip",
        "theta_1": "90 deg",
        "z_1": "72 in",
        "e_y1": "-4 in",
        "P_2": "3 kip",
        "theta_2": "20 deg",
        "z_2": "40 in",
        "e_x2": "1.5 in",
        "F_x3": "0.8 kip",
        "C_z4": "1.5 kip*ft",
    } | changed
    return [
        point_load("hanger", magnitude=values["P_1"], angle=values["theta_1"], z=values["z_1"],
                   ey=values["e_y1"]),
        point_load("pull", magnitude=values["P_2"], angle=values["theta_2"], z=values["z_2"],
                   ex=values["e_x2"]),
        point_load("wind", components=(values["F_x3"], "0 kip", "0 kip"), z="72 in"),
        applied_moment("twist", z="72 in", Mz=values["C_z4"]),
    ]  # fmt: skip


def _build(**changed):
    return member_sheet(SECTION, _loads(**changed), length="72 in", design=BASIS, load_types=TYPES)


def _picture(sheet) -> dict:
    results = sheet_results(sheet)
    figures = [sheet.figure_svg(part) for part in sheet.parts if isinstance(part, Figure)]
    return {"results": results, "figures": figures}


CHANGES = {
    "P_1": "3.5 kip",
    "theta_1": "75 deg",
    "z_1": "60 in",
    "e_y1": "-6 in",
    "P_2": "6 kip",
    "theta_2": "35 deg",
    "z_2": "20 in",
    "e_x2": "-2 in",
    "F_x3": "-1.6 kip",
    "C_z4": "-0.5 kip*ft",
}


@pytest.mark.parametrize(("name", "value"), list(CHANGES.items()))
def test_each_load_input_changed_in_place_equals_a_fresh_build(name, value) -> None:
    sheet = _build()
    sheet.set_input(name, value)
    fresh = _build(**{name: value})
    assert _picture(sheet) == _picture(fresh)


def test_the_tip_deflection_follows_a_load_change() -> None:
    """The old failure: the deflection writer had its own copy of the loads."""
    sheet = _build()
    before = sheet.value("delta_tip").to("inch").m
    sheet.set_input("P_1", "4 kip")
    after = sheet.value("delta_tip").to("inch").m
    assert after != pytest.approx(before)
    assert after == pytest.approx(_build(P_1="4 kip").value("delta_tip").to("inch").m)


def test_inputs_the_member_does_not_own_are_refused_with_the_reason() -> None:
    sheet = _build()
    with pytest.raises(InputError, match="governing combination was chosen"):
        sheet.set_input("gamma_D", 1.6)
    with pytest.raises(InputError, match="input I_x"):
        sheet.set_input("I_x", "200 in^4")


@pytest.mark.parametrize(
    ("name", "value", "changed"),
    [
        ("L", "80 in", {"length": "80 in"}),
        ("F_y", "46 ksi", {"Fy": "46 ksi"}),
        ("K", 1.2, {"K": 1.2}),
        ("L_b", "36 in", {"Lb": Quantity(36, "inch")}),
        ("C_b", 1.3, {"Cb": 1.3}),
        ("n_lim", 240, {"deflection_ratio": 240}),
    ],
)
def test_member_and_design_inputs_changed_in_place_equal_a_fresh_build(name, value, changed):
    sheet = _build()
    sheet.set_input(name, value)
    basis_fields = {k: v for k, v in changed.items() if k in ("K", "Lb", "Cb", "deflection_ratio")}
    member_fields = {k: v for k, v in changed.items() if k not in basis_fields}
    fresh = member_sheet(
        SECTION,
        _loads(),
        **({"length": "72 in"} | member_fields),
        design=dataclasses.replace(BASIS, **basis_fields),
        load_types=TYPES,
    )
    assert _picture(sheet) == _picture(fresh)
