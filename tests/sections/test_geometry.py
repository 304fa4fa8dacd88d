"""Outline integrals, cuts and plastic moduli on hand-checkable shapes."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.sections.geometry import Outline


def _rectangle(width: float, depth: float, left: float = 0.0, bottom: float = 0.0):
    return np.array(
        [
            (left, bottom),
            (left + width, bottom),
            (left + width, bottom + depth),
            (left, bottom + depth),
        ]
    )


def test_rectangle_integrals_about_its_centroid() -> None:
    b, d = 4.0, 12.0
    outline = Outline([_rectangle(b, d, -b / 2, -d / 2)])
    whole = outline.integrals()
    assert whole.area == pytest.approx(b * d)
    assert whole.second_yy == pytest.approx(b * d**3 / 12)  # b·d³/12, common practice, no source
    assert whole.second_xx == pytest.approx(d * b**3 / 12)
    assert whole.product_xy == pytest.approx(0.0, abs=1e-12)


def test_rectangle_first_moment_and_width_at_neutral_axis() -> None:
    b, d = 4.0, 12.0
    outline = Outline([_rectangle(b, d, -b / 2, -d / 2)])
    # Q at the neutral axis of a rectangle = b·d²/8 (common practice, no source)
    assert outline.first_moment_above(0.0)[0] == pytest.approx(b * d**2 / 8)
    assert outline.cut_width(0.0)[0] == pytest.approx(b)
    # Q above y = d/4: area b·d/4 at lever 3d/8
    assert outline.first_moment_above(d / 4)[0] == pytest.approx(b * d / 4 * 3 * d / 8)
    assert outline.cut_width([d, -d])[0] == 0.0


def test_plastic_modulus_of_rectangle_is_b_d_squared_over_four() -> None:
    outline = Outline([_rectangle(4.0, 12.0)])
    # Z = b·d²/4 (common practice, no source)
    assert outline.plastic_modulus_about_horizontal() == pytest.approx(4.0 * 12.0**2 / 4)
    assert outline.quarter_turned().plastic_modulus_about_horizontal() == pytest.approx(
        12.0 * 4.0**2 / 4
    )


def test_holes_subtract_and_cut_width_skips_the_hole() -> None:
    outer = _rectangle(6.0, 10.0, -3.0, -5.0)
    hole = _rectangle(4.0, 8.0, -2.0, -4.0)[::-1]  # clockwise
    outline = Outline([outer, hole])
    whole = outline.integrals()
    assert whole.area == pytest.approx(60.0 - 32.0)
    assert whole.second_yy == pytest.approx((6 * 10**3 - 4 * 8**3) / 12)
    assert outline.cut_width(0.0)[0] == pytest.approx(2.0)  # two 1.0 walls
    assert outline.cut_width(4.5)[0] == pytest.approx(6.0)  # through the top plate
    # at y = 4, the underside of the top plate, the narrower side (the walls) governs
    assert outline.cut_width(4.0)[0] == pytest.approx(2.0)


def test_flat_edge_exactly_on_a_cut_does_not_disturb_the_integral() -> None:
    outline = Outline([_rectangle(2.0, 2.0, -1.0, -1.0)])
    assert outline.integrals(above=-1.0).area == pytest.approx(4.0)
    assert outline.integrals(above=1.0).area == pytest.approx(0.0)
    assert outline.integrals(above=0.0).area == pytest.approx(2.0)


def test_regular_polygon_circle_close_to_exact() -> None:
    angles = np.linspace(0.0, 2 * math.pi, 384, endpoint=False)
    outline = Outline([np.column_stack((np.cos(angles), np.sin(angles)))])
    # π·r⁴/4 for a circle (common practice, no source); 384 chords lose < 1e-4
    assert outline.integrals().second_yy == pytest.approx(math.pi / 4, rel=2e-4)
    # Z of a circle = d³/6 (common practice, no source)
    assert outline.plastic_modulus_about_horizontal() == pytest.approx(8 / 6, rel=2e-4)
