"""Loads: resolution of inclined forces and bad input naming the field."""

from __future__ import annotations

import math

import pytest

from calcsheet.errors import InputError
from calcsheet.mechanics import applied_moment, internal_forces, point_load


def test_angle_resolves_into_components() -> None:
    # cos 30° = 0.8660, sin 30° = 0.5: common practice, no source.
    load = point_load(
        "P", magnitude="10 kip", angle="30 deg", from_axis="+z", toward_axis="-y", z="5 ft"
    )
    assert load.Fz.to("kip").m == pytest.approx(10 * math.cos(math.radians(30)))
    assert load.Fy.to("kip").m == pytest.approx(-5.0)
    assert load.Fx.m == 0.0


def test_components_are_kept() -> None:
    load = point_load("Q", components=("1 kN", "-2 kN", "3 kN"), z="1 m", ex="10 mm")
    assert (load.Fx.m, load.Fy.m, load.Fz.m) == (1.0, -2.0, 3.0)
    assert load.magnitude.m == pytest.approx(math.sqrt(14.0))


@pytest.mark.parametrize(
    ("kwargs", "field"),
    [
        ({"components": ("0 kip", "0 kip", "0 kip")}, "load P components"),
        ({"magnitude": "0 kip", "angle": "10 deg"}, "load P magnitude"),
        ({"magnitude": "5 kip", "angle": 30}, "load P angle"),
        ({"magnitude": "5 kip", "angle": "30"}, "load P angle"),
        ({"magnitude": "5 kip", "angle": "30 deg", "toward_axis": "+z"}, "load P toward_axis"),
        ({"magnitude": "5 kip", "angle": "30 deg", "from_axis": "q"}, "load P from_axis"),
        ({"magnitude": "5 kip"}, "load P direction"),
        ({"magnitude": "5 ft", "angle": "30 deg"}, "load P magnitude"),
    ],
)
def test_bad_load_names_the_field(kwargs: dict, field: str) -> None:
    with pytest.raises(InputError) as caught:
        point_load("P", z="2 ft", **kwargs)
    assert caught.value.field == field


def test_load_outside_member_and_bad_length_and_station() -> None:
    load = point_load("P", magnitude="1 kip", angle="90 deg", z="9 ft")
    with pytest.raises(InputError) as caught:
        internal_forces("8 ft", [load])
    assert caught.value.field == "load P z"
    inside = point_load("P", magnitude="1 kip", angle="90 deg", z="2 ft")
    for length in ("0 ft", "-3 ft"):
        with pytest.raises(InputError) as caught:
            internal_forces(length, [inside])
        assert caught.value.field == "member length"
    for station in ("-1 in", "9 ft"):
        with pytest.raises(InputError) as caught:
            internal_forces("8 ft", [inside], station=station)
        assert caught.value.field == "station z"


def test_moment_needs_moment_units() -> None:
    with pytest.raises(InputError) as caught:
        applied_moment("C", z="1 ft", Mz="3 kip")
    assert caught.value.field == "moment C Mz"
