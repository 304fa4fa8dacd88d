"""The member combined-stress sheet: agrees with the numeric path, says what it is, bad input.

Scenario (our own): a 5 ft W10x33 davit arm with a 6 kip hoist pull inclined 30° from
the arm axis toward −y, hung from a lug 5 in below and 1 in right of the centroid at
the tip, plus a 0.5 kip side push at mid-length and a 1 kip·ft twisting couple.
"""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.engine import Prose
from calcsheet.errors import InputError
from calcsheet.mechanics import applied_moment, internal_forces, point_load, stress_model
from calcsheet.sections import angle, catalog_section, plate

LOADS = [
    point_load(
        "hoist",
        magnitude="6 kip",
        angle="30 deg",
        from_axis="+z",
        toward_axis="-y",
        z="60 in",
        ex="1 in",
        ey="-5 in",
    ),
    point_load("side push", components=("0.5 kip", "0 kip", "0 kip"), z="30 in"),
    applied_moment("twist", z="60 in", Mz="1 kip*ft"),
]


@pytest.mark.parametrize("section", [catalog_section("W10x33"), angle("6 in", "4 in", "0.5 in")])
def test_sheet_matches_the_vectorised_path(section) -> None:
    sheet = member_sheet(section, LOADS, length="60 in", station="10 in")
    forces = internal_forces("60 in", LOADS, "10 in")
    model = stress_model(section, section.length_unit)
    numeric = model.stresses(forces.as_array("kip", section.length_unit))
    for index in range(len(model.labels)):
        n = index + 1
        assert sheet.value(f"sigma_z_{n}").to("ksi").m == pytest.approx(numeric.sigma[index])
        assert sheet.value(f"sigma_vm_{n}").to("ksi").m == pytest.approx(numeric.von_mises[index])
    governing = int(numeric.governing_index("von Mises"))
    check = sheet.checks[0]
    assert model.labels[governing] in check.description
    assert check.demand_value.to("ksi").m == pytest.approx(numeric.von_mises.max())
    assert check.capacity_value.to("ksi").m == pytest.approx(50 / 1.67)


def test_sheet_states_conventions_and_that_it_is_not_a_spec_check() -> None:
    sheet = member_sheet(plate("4 in", "6 in"), LOADS[:2], length="60 in")
    prose = " ".join(part.text for part in sheet.parts if isinstance(part, Prose))
    assert "NOT a specification check" in prose
    assert "outward normal is +z" in prose
    assert "warping" in prose
    assert "Governing points" in prose
    assert sheet["M_x"].reference == "statics of the free part"
    # Hand calc at the support (statics, common practice, no source):
    # Mx = ey·Fz − a·Fy = −5·5.196 + 60·3 = 154.02 kip·in.
    assert sheet.value("M_x").to("kip*inch").m == pytest.approx(-5 * 6 * np.cos(np.pi / 6) + 180)


def test_changing_an_input_re_evaluates() -> None:
    sheet = member_sheet(plate("4 in", "6 in"), LOADS[:1], length="60 in")
    before = sheet.value("sigma_vm_max").to("ksi").m
    sheet.set_input("P_1", "12 kip")
    assert sheet.value("sigma_vm_max").to("ksi").m == pytest.approx(2 * before)


@pytest.mark.parametrize(
    ("kwargs", "field"),
    [
        ({"length": "0 in"}, "member length"),
        ({"length": "60 in", "station": "70 in"}, "station z"),
        ({"length": "60 in", "Fy": "50"}, "Fy"),
        ({"length": "60 in", "Omega": -1.0}, "Omega"),
        ({"length": "40 in"}, "load hoist z"),
    ],
)
def test_bad_input_names_the_field(kwargs, field) -> None:
    with pytest.raises(InputError) as caught:
        member_sheet(plate("4 in", "6 in"), LOADS, **kwargs)
    assert caught.value.field == field
