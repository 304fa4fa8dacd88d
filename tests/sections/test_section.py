"""Section conventions: centroidal origin, stress points, shear cuts, the numeric view."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.errors import InputError
from calcsheet.sections import angle, catalog_section, i_shape, plate, rectangular_hss


def test_points_are_measured_from_the_centroid() -> None:
    section = plate("4 in", "12 in")
    corners = {point.label: (point.x.m, point.y.m) for point in section.points}
    assert corners["top-right corner"] == pytest.approx((2.0, 6.0))
    assert corners["bottom-left corner"] == pytest.approx((-2.0, -6.0))


def test_i_shape_flange_tips_are_the_extreme_points() -> None:
    section = i_shape("12 in", "8 in", "0.5 in", "0.75 in")
    tips = {p.label: (p.x.m, p.y.m) for p in section.points if "tip" in p.label}
    assert tips == {
        "top-left flange tip": pytest.approx((-4.0, 6.0)),
        "top-right flange tip": pytest.approx((4.0, 6.0)),
        "bottom-right flange tip": pytest.approx((4.0, -6.0)),
        "bottom-left flange tip": pytest.approx((-4.0, -6.0)),
    }


def test_angle_has_every_corner_and_negative_product_of_inertia() -> None:
    section = angle("6 in", "4 in", "0.5 in")
    labels = [p.label for p in section.points]
    assert len(labels) == 6 and "heel" in labels and "inside corner" in labels
    heel = next(p for p in section.points if p.label == "heel")
    assert (heel.x.m, heel.y.m) == pytest.approx((-section.x_bar.m, -section.y_bar.m))
    assert section.Ixy.m < 0
    # long leg vertical: the major axis is turned less than 45° from x, counter-clockwise
    assert 0 < section.alpha.to("degree").m < 45
    assert section.I1 >= section.Ix >= section.I2


def test_hss_stress_points_are_bounding_box_corners() -> None:
    section = rectangular_hss("8 in", "4 in", "0.349 in")
    xs = sorted({round(p.x.m, 9) for p in section.points})
    ys = sorted({round(p.y.m, 9) for p in section.points})
    assert xs == [-2.0, 2.0] and ys == [-4.0, 4.0]
    assert section.c_top.m == pytest.approx(4.0)


def test_shear_cuts_of_a_w_shape() -> None:
    section = catalog_section("W10X33")
    d, bf, tw, tf = (section.dimensions[k].m for k in ("d", "bf", "tw", "tf"))
    assert section.b("0 in").m == pytest.approx(tw)
    # Q at mid-depth of the fillet-free outline, by hand (common practice, no source)
    flange = bf * tf * (d / 2 - tf / 2)
    web = tw * (d / 2 - tf) ** 2 / 2
    assert section.Q_x("0 in").m == pytest.approx(flange + web)
    assert section.Q_x(f"{d / 2} in").m == pytest.approx(0.0, abs=1e-12)
    assert section.b(f"{d / 2 - tf} in").m == pytest.approx(tw)  # narrower side governs
    assert section.t("0 in").m == pytest.approx(d - 2 * tf + 2 * tf)  # web + both flanges
    assert section.t(f"{bf / 2 - 0.01} in").m == pytest.approx(2 * tf)
    # Q about y of the half right of the web: two half-flanges plus half the web
    half = 2 * tf * (bf / 2) ** 2 / 2 + (d - 2 * tf) * (tw / 2) ** 2 / 2
    assert section.Q_y("0 in").m == pytest.approx(half)
    assert section.Q_x("10 mm").dimensionality == section.Sx.dimensionality


def test_cut_position_must_be_a_length() -> None:
    with pytest.raises(InputError) as raised:
        plate("4 in", "12 in").Q_x("3 kip")
    assert raised.value.field == "y"


def test_numeric_view_matches_quantities_and_converts_units() -> None:
    section = angle("150 mm", "100 mm", "10 mm")
    in_mm = section.numeric()
    assert in_mm.length_unit == "millimeter"
    assert in_mm.Ix == pytest.approx(section.Ix.to("mm**4").m)
    assert in_mm.alpha == pytest.approx(section.alpha.to("radian").m)
    in_m = section.numeric("meter")
    assert in_m.Ix == pytest.approx(in_mm.Ix * 1e-12)
    area_in_m2, area_in_mm2 = in_m.A, in_mm.A
    assert area_in_m2 == pytest.approx(area_in_mm2 * 1e-6)
    assert in_m.point_x == pytest.approx(in_mm.point_x * 1e-3)
    assert in_m.Q_x([0.0])[0] == pytest.approx(in_mm.Q_x([0.0])[0] * 1e-9)
    assert in_m.b([0.0])[0] == pytest.approx(0.010)
    assert math.isfinite(in_mm.Cw)


def test_numeric_view_vectorises_stresses_at_points() -> None:
    numbers = plate("4 in", "12 in").numeric()
    moments = np.linspace(-100.0, 100.0, 1000)  # kip·in about x
    stresses = moments[:, None] * numbers.point_y[None, :] / numbers.Ix
    assert stresses.shape == (1000, 4)
    assert np.max(np.abs(stresses)) == pytest.approx(100.0 / numbers.Sx)
    cuts = np.linspace(-6, 6, 25)
    assert numbers.Q_x(cuts).shape == (25,)
    assert numbers.Q_x(cuts).max() == pytest.approx(4 * 12**2 / 8)  # b·d²/8


def test_unknown_property_is_an_attribute_error() -> None:
    with pytest.raises(AttributeError):
        _ = plate("4 in", "12 in").Sw1
