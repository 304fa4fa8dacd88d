"""Chapter G: G2.1 webs (Design Example G.1, G2.1(a) list), Cv2, G3, G4, G5, G6."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.sections import list_designations
from calcsheet.standards.aisc360 import catalog_table, shear
from calcsheet.standards.aisc360.numeric import _i_web_ratio

from .support import FY, INCH, KSI, E, member_sheet, value


def test_design_example_g1_w24x62() -> None:
    # AISC Design Examples G.1A/G.1B, W24X62 (from memory): φvVn = 306 kips,
    # Vn/Ωv = 204 kips (G2.1(a): φv = 1.00, Ωv = 1.50, Cv1 = 1.0).
    assert value(member_sheet("W24X62", "LRFD", length="1 ft"), "V_c_y", "kip") == (
        pytest.approx(306, rel=0.005)
    )
    assert value(member_sheet("W24X62", "ASD", length="1 ft"), "V_c_y", "kip") == (
        pytest.approx(204, rel=0.005)
    )


def test_w_shapes_outside_g2_1a_for_fy_50() -> None:
    # AISC Manual Table 3-2 footnote "shape does not meet the h/tw limit for shear in
    # AISC 360 Section G2.1(a) with Fy = 50 ksi" (from memory): these eight W shapes.
    table = catalog_table(list_designations("W"))
    ratios = _i_web_ratio(table.values).ravel()
    limit = shear.rolled_web_shear_limit.numeric(E, FY)
    outside = {name for name, ratio in zip(table.names, ratios, strict=True) if ratio > limit}
    assert outside == {
        "W44X230",
        "W40X149",
        "W36X135",
        "W33X118",
        "W30X90",
        "W24X55",
        "W16X26",
        "W12X14",
    }


def test_w12x14_takes_phi_0_90() -> None:
    # Hand calc from AISC 360-22 G2.1(b): h/tw > 2.24√(E/Fy), so φv = 0.90; h/tw <=
    # 1.10√(5.34·E/Fy) = 61.2, so Cv1 = 1.0 (G2-3); φvVn = 0.9·0.6·50·d·tw.
    sheet = member_sheet("W12X14", "LRFD", length="1 ft")
    d, t_w = value(sheet, "d", "in"), value(sheet, "t_w", "in")
    assert value(sheet, "phi_v_y", "") == 0.90
    assert value(sheet, "V_c_y", "kip") == pytest.approx(0.9 * 0.6 * 50 * d * t_w)


@pytest.mark.parametrize("k_v", [1.2, 5.0, 5.34])
def test_cv2_at_its_limits_from_both_sides(k_v: float) -> None:
    # AISC 360-22 Eq. G2-9/G2-10 meet at 1.10√(kvE/Fy) (both 1.0); G2-10/G2-11 meet at
    # 1.37√(kvE/Fy) to the rounding of 1.51 ≈ 1.10·1.37 (within 0.3 %).
    first, second = 1.10 * math.sqrt(k_v * 580), 1.37 * math.sqrt(k_v * 580)
    for limit, tolerance in ((first, 1e-8), (second, 0.003)):
        h_tw = np.array([limit * (1 - 1e-9), limit * (1 + 1e-9)])
        below, above = shear.shear_buckling_coefficient.numeric(h_tw, k_v, E, FY)
        assert below == pytest.approx(above, rel=tolerance)


def test_cv1_hand_calc() -> None:
    # Hand calc from AISC 360-22 Eq. G2-4: h/tw = 70, kv = 5.34: Cv1 = 1.10√(5.34·580)/70.
    got = shear.web_shear_coefficient.numeric(70.0, 5.34, E, FY)
    assert got == pytest.approx(1.10 * math.sqrt(5.34 * 580) / 70)


def test_rectangular_hss_g4_hand_calc() -> None:
    # Hand calc from AISC 360-22 Eq. G4-1: HSS20X4X1/4, h = 20 − 3·0.233 = 19.30 in,
    # h/t = 82.8 > 1.37√(5E/Fy) = 73.8: Cv2 = 1.51·5·29000/(82.8²·50) (G2-11);
    # Vn = 0.6·50·(2·19.30·0.233)·Cv2.
    sheet = member_sheet("HSS20X4X1/4", "LRFD", length="1 ft")
    h = 20 - 3 * 0.233
    lam = h / 0.233
    C_v2 = 1.51 * 5 * 29000 / (lam**2 * 50)
    assert value(sheet, "C_v2_y", "") == pytest.approx(C_v2)
    assert value(sheet, "V_n_y", "kip") == pytest.approx(0.6 * 50 * 2 * h * 0.233 * C_v2)


def test_round_hss_g5_hand_calc() -> None:
    # Hand calc from AISC 360-22 Eq. G5-2a/b: D = 6 in, D/t = 60, Lv = 60 in;
    # G5-2a = 1.60·29000/(√10·60^1.25) = 87.0 ksi, G5-2b = 0.78·29000/60^1.5 = 48.6 ksi,
    # the larger capped at 0.6·50 = 30 ksi. With D/t = 200: 1.60·29000/(√10·200^1.25) and
    # 0.78·29000/200^1.5 = 8.00 ksi.
    D, L_v = 6 * INCH, 60 * INCH
    got = shear.round_hss_shear_stress.numeric(E, FY, L_v, D, np.array([60.0, 200.0])) / KSI
    a = 1.60 * 29000 / (math.sqrt(10) * 200**1.25)
    b = 0.78 * 29000 / 200**1.5
    assert got == pytest.approx([30.0, max(a, b)])


def test_weak_axis_g6_hand_calc_w14x90() -> None:
    # Hand calc from AISC 360-22 Eq. G6-1: bf/(2tf) = 10.2 <= 1.10√(1.2·580) = 29.0, Cv2 = 1;
    # two flanges: Vn = 2·0.6·50·14.5·0.71 = 617.7 kips; φv = 0.90.
    sheet = member_sheet("W14X90", "LRFD", length="1 ft")
    assert value(sheet, "V_c_x", "kip") == pytest.approx(0.9 * 2 * 0.6 * 50 * 14.5 * 0.71)
