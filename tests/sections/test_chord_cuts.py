"""Cuts through a point of an open section: the stretch of material there and the part it cuts off.

Hand calculations (thin-walled open section shear flow: the cut that gives the shear
at a point is the one across the wall through that point, and Q is of the part that
cut separates; common practice, no source) on shapes built in this file.
"""

from __future__ import annotations

import pytest

from calcsheet.sections import angle, channel, rectangular_hss, tee


def test_vertical_cut_through_a_channel_flange_takes_that_flange_alone() -> None:
    # Channel 10 x 3 in, web 0.3 in, flanges 0.5 in; back of the web at x = 0.
    numbers = channel("10 in", "3 in", "0.3 in", "0.5 in").numeric()
    x_cut = 1.5 - numbers.x_bar  # 1.5 in from the back of the web
    turned = numbers.outline.quarter_turned()  # a vertical cut at x is a horizontal one there
    top = turned.chord_cut(-(9.75 - numbers.y_bar), x_cut)  # top flange, mid-thickness
    assert top is not None
    # Part to the right: 1.5 in x 0.5 in of top flange, centroid 2.25 in from the back
    # of the web and 4.75 in above mid-depth (hand calc).
    area = 1.5 * 0.5
    assert top.width == pytest.approx(0.5)
    assert top.first_y == pytest.approx(area * (2.25 - numbers.x_bar))  # ∫x dA
    assert -top.first_x == pytest.approx(area * 4.75)  # ∫y dA, mid-depth is the centroid


def test_cut_meeting_no_material_at_the_point_has_zero_width() -> None:
    numbers = angle("6 in", "6 in", "0.5 in").numeric()
    outline, xb, yb = numbers.outline, numbers.x_bar, numbers.y_bar
    # Inner face of the vertical leg, at its toe: the vertical line x = t meets the
    # horizontal leg far below, not at the toe.
    toe_x, toe_y = 0.5 - xb, 6.0 - yb
    assert outline.quarter_turned().chord_cut(-toe_y, toe_x).width == 0.0
    # Top face of the horizontal leg at its toe: a free face.
    assert outline.chord_cut(6.0 - xb, 0.5 - yb).width == 0.0
    # The inside corner: the horizontal cut crosses the vertical leg (0.5 in), not both legs.
    corner = outline.chord_cut(0.5 - xb, 0.5 - yb)
    assert corner.width == pytest.approx(0.5)
    # Part above: the vertical leg above the horizontal leg, 5.5 x 0.5 in at 3.25 in up.
    assert corner.first_y == pytest.approx(5.5 * 0.5 * (3.25 - yb))


def test_tee_flange_underside_at_the_tip_is_a_free_face() -> None:
    numbers = tee("8 in", "8 in", "0.4 in", "0.6 in").numeric()
    assert numbers.outline.chord_cut(8.0 - numbers.x_bar, 7.4 - numbers.y_bar).width == 0.0


def test_sections_of_several_rings_leave_the_cut_to_the_whole_line() -> None:
    assert rectangular_hss("8 in", "4 in", "0.349 in").outline.chord_cut(0.0, 0.0) is None


def test_walls_of_open_sections_are_measured_from_the_centroid() -> None:
    section = angle("6 in", "4 in", "0.5 in")
    xb, yb = section.x_bar.m, section.y_bar.m
    long_leg = next(wall for wall in section.walls if wall.label == "vertical leg")
    assert long_leg.vertical and long_leg.thickness == pytest.approx(0.5)
    assert long_leg.start == pytest.approx((0.25 - xb, 0.5 - yb))
    assert long_leg.end == pytest.approx((0.25 - xb, 6.0 - yb))
    assert [wall.label for wall in channel("10 in", "3 in", "0.3 in", "0.5 in").walls] == [
        "web",
        "top flange",
        "bottom flange",
    ]
    assert rectangular_hss("8 in", "4 in", "0.349 in").walls == ()
    in_mm = section.numeric("mm").walls[0]
    assert in_mm.thickness == pytest.approx(12.7)
