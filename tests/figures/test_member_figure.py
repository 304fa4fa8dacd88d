"""The member figure: to scale along z, loads at their true angle, notes, escaping."""

from __future__ import annotations

import math

import pytest

from calcsheet.figures import member_figure
from calcsheet.mechanics.loads import applied_moment, point_load
from calcsheet.sections import catalog_section
from tests.figures.svgtools import by_class, line_ends, parse, path_points, texts


def _lug_load(**overrides):
    given = {
        "z": "48 in",
        "magnitude": "2.4 kip",
        "angle": "35 deg",
        "from_axis": "+z",
        "toward_axis": "-y",
        "ey": "-4 in",
    }
    return point_load("P", **{**given, **overrides})


def test_member_band_is_to_scale_along_z():
    root = parse(member_figure("48 in", "12 in", [_lug_load()], depth="6 in"))
    (member,) = by_class(root, "member")
    xs, ys = zip(*path_points(member), strict=True)
    ratio = (max(ys) - min(ys)) / (max(xs) - min(xs))
    assert ratio == pytest.approx(6 / 48, rel=1e-3)  # no enlargement: 6 in is thick enough
    assert not [text for text in texts(root) if "vertical scale" in text]
    (station,) = by_class(root, "station")
    (x1, _), (x2, _) = line_ends(station)
    assert x1 == x2 == pytest.approx(min(xs) + (max(xs) - min(xs)) * 12 / 48, abs=0.02)


def test_force_arrow_is_at_its_true_angle():
    root = parse(member_figure("48 in", "0 in", [_lug_load()], depth="6 in"))
    (shaft,) = by_class(root, "load-arrow")
    (x1, y1), (x2, y2) = line_ends(shaft)
    # +z is right and −y is down on paper (y grows downward): 35° below the axis.
    angle = math.degrees(math.atan2(y2 - y1, x2 - x1))
    assert angle % 180 == pytest.approx(35, abs=0.2)
    assert "P = 2.40 kip" in texts(root)
    assert "ey = −4.00 in" in texts(root)  # e with subscript y


def test_thin_member_gets_an_enlarged_vertical_scale_and_says_so():
    root = parse(member_figure("20 ft", "5 ft", [_lug_load(z="20 ft", ey="0 in")], depth="4 in"))
    notes = [text for text in texts(root) if "vertical scale" in text]
    assert len(notes) == 1
    factor = int(notes[0].split("×")[1].split(":")[0])
    (member,) = by_class(root, "member")
    xs, ys = zip(*path_points(member), strict=True)
    ratio = (max(ys) - min(ys)) / (max(xs) - min(xs))
    assert ratio == pytest.approx(4 / 240 * factor, rel=1e-3)


def test_section_gives_the_depth_and_the_end_view_outline():
    section = catalog_section("HSS6X6X3/8")
    loads = [
        _lug_load(ex="2 in"),
        point_load("R", z="30 in", components=("1 kip", "0 kip", "0 kip")),
    ]
    moment = applied_moment("M1", z="20 in", Mx="5 kip*ft")
    root = parse(member_figure("48 in", "24 in", loads, section=section, moments=[moment]))
    shown = texts(root)
    for text in ("ex = 2.00 in", "L = 48.0 in", "zs = 24.0 in", "M1: Mx = 5.00 kip·ft"):
        assert text in shown
    assert len(by_class(root, "end-view-load")) == 2
    assert len(by_class(root, "load-along-x")) == 1  # R has no y or z component
    assert any("into the page" in text for text in shown)


def test_millimetres():
    load = point_load("F", z="3000 mm", magnitude="10 kN", angle="60 deg", ey="-150 mm")
    shown = texts(parse(member_figure("3 m", "500 mm", [load], depth="200 mm", unit="mm")))
    assert "L = 3000 mm" in shown and "F = 10.00 kN" in shown


def test_load_names_are_escaped_and_output_is_deterministic():
    load = point_load("<script>x</script> & P", z="40 in", magnitude="1 kip", angle="90 deg")
    svg = member_figure("48 in", "0 in", [load], depth="6 in")
    assert "<script>" not in svg
    assert "<script>x</script> & P = 1.000 kip" in texts(parse(svg))
    assert svg == member_figure("48 in", "0 in", [load], depth="6 in")


def test_a_long_load_name_is_cut_in_the_drawing_only():
    name = "bracket load from the sign support lug on the north face"
    load = point_load(name, z="40 in", magnitude="1 kip", angle="90 deg")
    labels = texts(parse(member_figure("48 in", "0 in", [load], depth="6 in")))
    assert "bracket load from the sign… = 1.000 kip" in labels


def test_depth_or_section_is_required():
    with pytest.raises(TypeError):
        member_figure("48 in", "0 in", [])
