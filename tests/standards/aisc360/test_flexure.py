"""Chapter F: F2/F3 (Manual Table 3-2, Design Examples F.1), F6, F7, F8, F10, boundaries."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.standards.aisc360 import flexure

from .support import FY, INCH, KIP_FT, KSI, E, member_sheet, value

# AISC Manual (15th ed.) Table 3-2, Fy = 50 ksi, Cb = 1 (from memory): Lp and Lr in ft,
# φbMpx in kip·ft, φvVnx in kips. Tolerance 1 % (the table rounds to 3 significant figures;
# W8X31 is noncompact, so its φbMpx is the F3 flange local buckling strength).
TABLE_3_2 = [
    ("W18X50", 5.83, 16.9, 379, 192),
    ("W21X44", 4.45, 13.0, 358, 217),
    ("W24X55", 4.73, 13.9, 503, 252),
    ("W16X26", 3.96, 11.2, 166, 106),
    ("W14X22", 3.67, 10.4, 125, 94.5),
    ("W12X26", 5.33, 14.9, 140, 84.2),
    ("W10X33", 6.85, 21.8, 146, 84.7),
    ("W8X31", 7.18, 24.8, 114, 68.4),
]


@pytest.mark.parametrize(("name", "L_p", "L_r", "phi_M_p", "phi_V_n"), TABLE_3_2)
def test_manual_table_3_2(name: str, L_p: float, L_r: float, phi_M_p: float, phi_V_n: float):
    sheet = member_sheet(name, "LRFD", length="1 ft", K=1.0, Lb="1 in")
    assert value(sheet, "L_p", "ft") == pytest.approx(L_p, rel=0.01)
    assert value(sheet, "L_r", "ft") == pytest.approx(L_r, rel=0.01)
    assert value(sheet, "M_c_x", "kip*ft") == pytest.approx(phi_M_p, rel=0.01)
    assert value(sheet, "V_c_y", "kip") == pytest.approx(phi_V_n, rel=0.01)


def test_design_example_f1_w18x50() -> None:
    # AISC Design Examples F.1-1A/B (continuously braced) and F.1-2A/B (Lb = 11.67 ft,
    # Cb = 1.01), W18X50 (from memory): φbMn = 379 and 306 kip·ft, Mn/Ωb = 252 and 204.
    for method, braced, third_points in (("LRFD", 379, 306), ("ASD", 252, 204)):
        sheet = member_sheet("W18X50", method, length="35 ft", K=1.0, Lb="1 in")
        assert value(sheet, "M_c_x", "kip*ft") == pytest.approx(braced, rel=0.005)
        sheet = member_sheet("W18X50", method, length="35 ft", K=1.0, Lb="11.67 ft", Cb=1.01)
        assert value(sheet, "M_c_x", "kip*ft") == pytest.approx(third_points, rel=0.005)


def test_noncompact_flange_w14x90_f3() -> None:
    # Hand calc from AISC 360-22 Eq. F3-1: λ = 14.5/(2·0.71) = 10.21, λpf = 9.152,
    # λrf = 24.08; Mn = 7850 − (7850 − 0.7·50·143)(10.21 − 9.152)/(24.08 − 9.152) kip·in;
    # AISC Manual Table 3-2 gives φbMpx = 574 kip·ft for W14X90 (from memory).
    lam, lam_p, lam_r = 14.5 / 1.42, 0.38 * math.sqrt(580), math.sqrt(580)
    expected = (7850 - (7850 - 0.7 * 50 * 143) * (lam - lam_p) / (lam_r - lam_p)) / 12
    sheet = member_sheet("W14X90", "LRFD", length="1 ft", K=1.0, Lb="1 in")
    assert value(sheet, "M_n_FLB", "kip*ft") == pytest.approx(expected, rel=1e-6)
    assert value(sheet, "M_c_x", "kip*ft") == pytest.approx(574, rel=0.005)
    assert sheet.governing_label(sheet["M_n_x"]) == "compression flange local buckling (F3.2)"


def _ltb(L_b: float, C_b: float = 1.0) -> float:
    """M_n of W18X50 by F2 at L_b (in), from SI arrays: Mp, Lp, Lr from the catalog values."""
    Z, S, ry, Iy, Cw, J, d, tf = 101, 88.9, 1.65, 40.1, 3040, 1.24, 18.0, 0.57
    r_ts = flexure.effective_radius.numeric(Iy * INCH**4, Cw * INCH**6, S * INCH**3)
    h_o = (d - tf) * INCH
    L_p = flexure.limiting_length_yielding.numeric(ry * INCH, E, FY)
    L_r = flexure.limiting_length_inelastic.numeric(r_ts, E, FY, J * INCH**4, 1.0, S * INCH**3, h_o)
    F_cr = flexure.ltb_critical_stress.numeric(
        C_b, E, L_b * INCH, r_ts, J * INCH**4, 1.0, S * INCH**3, h_o
    )
    M_p = flexure.plastic_moment.numeric(FY, Z * INCH**3)
    return (
        float(flexure.ltb_moment.numeric(M_p, C_b, FY, S * INCH**3, L_b * INCH, L_p, L_r, F_cr)),
        float(L_p / INCH),
        float(L_r / INCH),
    )


@pytest.mark.parametrize("C_b", [1.0, 1.3])
def test_f2_is_continuous_at_lp_and_lr(C_b: float) -> None:
    # F2-1/F2-2 meet at Lb = Lp exactly (both Mp; with Cb > 1 F2-2 is capped at Mp).
    # F2-2/F2-3 meet at Lb = Lr (Fcr·Sx = Cb·0.7Fy·Sx by the definition of Lr) to the
    # rounding of the coefficients 1.95 and 6.76 of Eq. F2-6: within 0.2 %.
    _, L_p, L_r = _ltb(100.0)
    for limit, tolerance in ((L_p, 1e-9), (L_r, 0.002)):
        below, _, _ = _ltb(limit * (1 - 1e-9), C_b)
        above, _, _ = _ltb(limit * (1 + 1e-9), C_b)
        assert below == pytest.approx(above, rel=tolerance)
    at_lr, _, _ = _ltb(L_r, 1.0)
    assert at_lr / KIP_FT == pytest.approx(0.7 * 50 * 88.9 / 12, rel=1e-9)


def test_printed_ltb_moment_agrees_with_numeric() -> None:
    for L_b in (40.0, 150.0, 300.0):  # in: the three zones of F2 for W18X50
        sheet = member_sheet("W18X50", "LRFD", length="30 ft", K=1.0, Lb=f"{L_b} in")
        numeric, _, _ = _ltb(L_b)
        assert value(sheet, "M_n_x", "N*m") == pytest.approx(numeric, rel=1e-3)


def test_minor_axis_f6_hand_calc_w14x99() -> None:
    # Hand calc from AISC 360-22 Eq. F6-1, F6-2: W14X99, Zy = 83.6, Sy = 55.2 in³;
    # Mp = min(50·83.6, 1.6·50·55.2) = 4180 kip·in; λ = 14.6/(2·0.78) = 9.36 > λpf:
    # Mn = 4180 − (4180 − 0.7·50·55.2)(λ − λpf)/(λrf − λpf).
    sheet = member_sheet("W14X99", "LRFD", length="1 ft", K=1.0)
    lam = value(sheet, "lambda_f", "")
    lam_p, lam_r = 0.38 * math.sqrt(580), math.sqrt(580)
    expected = 4180 - (4180 - 0.7 * 50 * 55.2) * (lam - lam_p) / (lam_r - lam_p)
    assert value(sheet, "M_n_y", "kip*in") == pytest.approx(expected, rel=1e-6)


def test_rectangular_hss_noncompact_flange_f7_2() -> None:
    # Hand calc from AISC 360-22 Eq. F7-2 for HSS8X8X1/4 (catalog tdes = 0.233 in; Z and S
    # read from the sheet, i.e. the catalog): b/t = (8 − 3·0.233)/0.233 = 31.3, between
    # λp = 1.12√(E/Fy) = 27.0 and λr = 1.40√(E/Fy) = 33.7;
    # Mn = Mp − (Mp − Fy·S)(3.57·b/t·√(Fy/E) − 4).
    sheet = member_sheet("HSS8X8X1/4", "LRFD", length="1 ft", K=1.0)
    Z, S = value(sheet, "Z_x", "in**3"), value(sheet, "S_x", "in**3")
    lam = (8 - 3 * 0.233) / 0.233
    M_p = 50 * Z
    expected = M_p - (M_p - 50 * S) * (3.57 * lam * math.sqrt(50 / 29000) - 4.0)
    assert value(sheet, "M_n_x", "kip*in") == pytest.approx(expected, rel=1e-4)


def test_rectangular_hss_slender_flange_effective_width_f7_4() -> None:
    # Hand calc from AISC 360-22 Eq. F7-4: HSS12X12X1/4, b/t = 48.5 > λr;
    # be = 1.92·t·√(E/Fy)·(1 − 0.38/(b/t)·√(E/Fy)).
    sheet = member_sheet("HSS12X12X1/4", "LRFD", length="1 ft", K=1.0)
    t, root = 0.233, math.sqrt(580)
    lam = (12 - 3 * t) / t
    assert value(sheet, "b_e_x", "in") == pytest.approx(1.92 * t * root * (1 - 0.38 / lam * root))
    # Se < Sx and Mn = Fy·Se (F7-3).
    assert value(sheet, "S_e_x", "in**3") < value(sheet, "S_x", "in**3")
    assert value(sheet, "M_n_x", "kip*in") == pytest.approx(50 * value(sheet, "S_e_x", "in**3"))


def test_effective_section_modulus_without_reduction_is_the_elastic_one() -> None:
    # With be = b nothing is removed: Se = I/(H/2) (hand calc).
    got = flexure.hss_effective_section_modulus.numeric(100.0, 10.0, 8.0, 0.25, 7.0, 7.0)
    assert got == pytest.approx(100.0 / 4.0)


def test_f7_2_meets_mp_at_lambda_p() -> None:
    # 3.57·1.12 − 4.0 = −0.0016: F7-2 reaches Mp at λp to the rounding of the coefficients.
    lam_p = 1.12 * math.sqrt(29000 / 50)
    M_p = 1.2 * FY  # Z/S = 1.2
    got = flexure.hss_flange_local_buckling.numeric(M_p, FY, 1.0, lam_p, 1.4 * lam_p, E, 1.0)
    assert got == pytest.approx(M_p, rel=1e-3)


def test_round_hss_f8_hand_calc() -> None:
    # Hand calc from AISC 360-22 Eq. F8-1..F8-4, Z = 1.3, S = 1.0 (arbitrary units):
    # D/t = 30 compact: Fy·Z; D/t = 100 noncompact: (0.021E/100 + Fy)·S; D/t = 200 slender:
    # 0.33E/200·S.
    D_t = np.array([30.0, 100.0, 200.0])
    got = flexure.round_hss_flexure.numeric(E, FY, D_t, 1.3, 1.0) / KSI
    assert got == pytest.approx([50 * 1.3, 0.021 * 29000 / 100 + 50, 0.33 * 29000 / 200])


def test_single_angle_f10_hand_calc() -> None:
    # Hand calc from AISC 360-22 F10, L4X4X1/2 (Sx = 1.96 in³, b/t = 8 compact), Lb = 10 ft:
    # My = 50·1.96; Mcr = 0.58·E·b⁴·t/Lb²·(√(1 + 0.88(Lb·t/b²)²) − 1) (F10-5a);
    # 0.8My/Mcr <= 1: Mn = (1.92 − 1.17√(0.8My/Mcr))·0.8My <= 1.2My (F10-2).
    sheet = member_sheet("L4X4X1/2", "LRFD", length="10 ft", K=1.0)
    M_y = 50 * 1.96
    L_b, b, t = 120.0, 4.0, 0.5
    M_cr = 0.58 * 29000 * b**4 * t / L_b**2 * (math.sqrt(1 + 0.88 * (L_b * t / b**2) ** 2) - 1)
    ratio = 0.8 * M_y / M_cr
    assert ratio <= 1
    expected = min((1.92 - 1.17 * math.sqrt(ratio)) * 0.8 * M_y, 1.5 * 0.8 * M_y)
    assert value(sheet, "M_cr_x", "kip*in") == pytest.approx(M_cr)
    assert value(sheet, "M_n_x", "kip*in") == pytest.approx(min(expected, 1.5 * M_y))


def test_f10_equations_meet_at_their_limits() -> None:
    # Consistency of the remembered coefficients: F10-2 and F10-3 both give 0.75My at
    # My/Mcr = 1; F10-6 gives 1.50·Fy·Sc at λp = 0.54√(E/Fy) (F10-1) and F10-6/F10-8
    # agree within 1 % at λr = 0.91√(E/Fy).
    below = flexure.angle_ltb.numeric(1.0, 1.0 + 1e-12)
    above = flexure.angle_ltb.numeric(1.0, 1.0 - 1e-12)
    assert below == pytest.approx(0.75) and above == pytest.approx(0.75)
    root = math.sqrt(29000 / 50)
    at_p = flexure.angle_leg_local_buckling.numeric(FY, 1.0, 0.54 * root, 0.91 * root, E)
    assert at_p / FY == pytest.approx(1.5, rel=0.001)
    lam_r = 0.91 * root
    noncompact = flexure.angle_leg_local_buckling.numeric(FY, 1.0, lam_r, lam_r, E)
    slender = flexure.angle_leg_local_buckling.numeric(FY, 1.0, lam_r * (1 + 1e-9), lam_r, E)
    assert noncompact == pytest.approx(slender, rel=0.01)


def test_printed_f8_agrees_with_numeric() -> None:
    sheet = Sheet("F8")
    with sheet:
        E_s = sheet.input("E", "29000 ksi")
        F_y = sheet.input("F_y", "50 ksi")
        Z = sheet.input("Z", "13 in^3")
        S = sheet.input("S", "10 in^3")
        for index, ratio in enumerate((30.0, 100.0, 200.0)):
            D_t = sheet.input(f"lambda_{index}", ratio)
            flexure.round_hss_flexure.write(sheet, f"M_n_{index}", E_s, F_y, D_t, Z, S)
            numeric = flexure.round_hss_flexure.numeric(E, FY, ratio, 13 * INCH**3, 10 * INCH**3)
            assert value(sheet, f"M_n_{index}", "N*m") == pytest.approx(numeric)
