"""Chapter E: E3-1..E3-4, E4-2, E7 against published values and hand calcs."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.standards.aisc360 import compression

from .support import FY, INCH, KSI, E, G, member_sheet, value


def test_design_example_e1a_w14x132() -> None:
    # AISC Design Examples (v15/v16) E.1A, W14X132, Lc = 30 ft, Fy = 50 ksi (from memory):
    # φcPn = 893 kips, Pn/Ωc = 594 kips. Tolerance 0.5 % (rounding of the example).
    lrfd = member_sheet("W14X132", "LRFD", length="30 ft", K=1.0)
    asd = member_sheet("W14X132", "ASD", length="30 ft", K=1.0)
    assert value(lrfd, "P_c_c", "kip") == pytest.approx(893, rel=0.005)
    assert value(asd, "P_c_c", "kip") == pytest.approx(594, rel=0.005)


def test_table_4_1a_w14x90_squash_load() -> None:
    # AISC Manual Table 4-1a, W14X90, Lc = 0: φcPn = 1190 kips (from memory; 0.9·50·26.5).
    sheet = member_sheet("W14X90", "LRFD", length="0.01 in", K=1.0)
    assert value(sheet, "P_c_c", "kip") == pytest.approx(1190, rel=0.005)


def test_hand_calc_w14x90_lc_20_ft() -> None:
    # Hand calc from AISC 360-22 Eq. E3-4, E3-2, E3-1: ry = 3.70 in, Lc = 240 in,
    # Fe = π²·29000/(240/3.70)² = 68.03 ksi; Fcr = 0.658^(50/68.03)·50 = 36.76 ksi;
    # φcPn = 0.9·36.76·26.5 = 876.7 kips. E4-2 gives a higher Fe (torsional) here.
    sheet = member_sheet("W14X90", "LRFD", length="20 ft", K=1.0)
    F_e = math.pi**2 * 29000 / (240 / 3.70) ** 2
    F_cr = 0.658 ** (50 / F_e) * 50
    assert value(sheet, "F_e", "ksi") == pytest.approx(F_e, rel=1e-6)
    assert value(sheet, "P_c_c", "kip") == pytest.approx(0.9 * F_cr * 26.5, rel=1e-6)
    assert sheet.governing_label(sheet["F_e"]) == "flexural buckling (E3-4)"


def test_hand_calc_torsional_buckling_e4_2() -> None:
    # Hand calc from AISC 360-22 Eq. E4-2, W14X90 (Cw = 16000 in⁶, J = 4.06 in⁴,
    # Ix + Iy = 1361 in⁴), Lcz = 240 in: Fe = (π²·29000·16000/240² + 11200·4.06)/1361.
    expected = (math.pi**2 * 29000 * 16000 / 240**2 + 11200 * 4.06) / 1361
    got = compression.torsional_buckling_stress.numeric(
        E, 16000 * INCH**6, 240 * INCH, G, 4.06 * INCH**4, 999 * INCH**4, 362 * INCH**4
    )
    assert got / KSI == pytest.approx(expected)


@pytest.mark.parametrize("side", [-1e-9, 0.0, 1e-9])
def test_e3_2_and_e3_3_meet_at_fy_over_fe_2_25(side: float) -> None:
    # E3-2 at Fy/Fe = 2.25 gives 0.658^2.25·Fy = 0.3903·Fy, E3-3 gives 0.877/2.25·Fy =
    # 0.3898·Fy: the two equations meet within 0.15 % (AISC 360-22 Section E3).
    F_e = FY / (2.25 + side)
    F_cr = compression.critical_stress.numeric(FY, F_e)
    assert F_cr / FY == pytest.approx(0.3903, rel=0.002)
    inelastic = 0.658 ** (FY / F_e) * FY
    elastic = 0.877 * F_e
    assert F_cr == pytest.approx(inelastic if side <= 0 else elastic)


def test_printed_critical_stress_agrees_with_numeric() -> None:
    sheet = Sheet("E3")
    with sheet:
        F_y = sheet.input("F_y", "50 ksi", dimension="stress")
        for index, F_e in enumerate((10.0, 22.222, 40.0, 200.0)):
            F_e_symbol = sheet.input(f"F_e_{index}", f"{F_e} ksi", dimension="stress")
            compression.critical_stress.write(sheet, f"F_cr_{index}", F_y, F_e_symbol, unit="ksi")
            numeric = compression.critical_stress.numeric(FY, F_e * KSI)
            assert value(sheet, f"F_cr_{index}", "ksi") == pytest.approx(numeric / KSI)


def test_slender_w14x43_uses_e7() -> None:
    # W14X43 has a slender web in compression for Fy = 50 ksi (AISC Manual Table 4-1a
    # footnote "c", from memory). Hand calc of E7 at Lc = 2 ft with the catalog values:
    # Fe = π²E/(24/ry)², Fcr (E3-2); web case (a): Fel = (1.31·35.88/λ)²·Fy,
    # he = h(1 − 0.18√(Fel/Fcr))√(Fel/Fcr) when λ > λr√(Fy/Fcr); Ae = Ag − (h − he)·tw.
    sheet = member_sheet("W14X43", "LRFD", length="2 ft", K=1.0)
    d, tw, k = (value(sheet, name, "in") for name in ("d", "t_w", "k_des"))
    A, ry = value(sheet, "A_g", "in**2"), value(sheet, "r_y", "in")
    h = d - 2 * k
    lam, lam_r = h / tw, 1.49 * math.sqrt(29000 / 50)
    F_e = math.pi**2 * 29000 / (24 / ry) ** 2
    F_cr = 0.658 ** (50 / F_e) * 50
    assert lam > lam_r * math.sqrt(50 / F_cr)
    F_el = (1.31 * lam_r / lam) ** 2 * 50
    h_e = h * (1 - 0.18 * math.sqrt(F_el / F_cr)) * math.sqrt(F_el / F_cr)
    A_e = A - (h - h_e) * tw
    assert value(sheet, "A_e", "in**2") == pytest.approx(A_e, rel=1e-3)
    assert value(sheet, "P_n_c", "kip") == pytest.approx(F_cr * A_e, rel=1e-3)
    assert value(sheet, "b_e", "in") == pytest.approx(value(sheet, "b", "in"))  # flange full


@pytest.mark.parametrize("case", ["a", "b", "c"])
def test_e7_effective_width_is_continuous_at_its_limit(case: str) -> None:
    # At λ = λr·√(Fy/Fcr), E7-3 gives b·c2·(1 − c1·c2) = b (c2 from E7-4), to the rounding
    # of c2 in Table E7.1.
    lam_r, F_cr = 30.0, 0.6 * FY
    limit = lam_r * math.sqrt(FY / F_cr)
    widths = []
    for lam in (limit * (1 - 1e-9), limit * (1 + 1e-9)):
        F_el = compression.LOCAL_BUCKLING_STRESS[case].numeric(lam_r, lam, FY)
        widths.append(compression.EFFECTIVE_WIDTH[case].numeric(1.0, lam, lam_r, FY, F_cr, F_el))
    assert widths[0] == 1.0
    assert widths[1] == pytest.approx(1.0, abs=0.005)


def test_hand_calc_round_hss_effective_area_e7_6() -> None:
    # Hand calc from AISC 360-22 Eq. E7-6: D/t = 80 > 0.11E/Fy = 63.8, Ae/Ag =
    # 0.038·29000/(50·80) + 2/3 = 0.9422.
    got = compression.effective_area_round.numeric(E, FY, np.array([50.0, 80.0]), 1.0)
    assert got[0] == 1.0
    assert got[1] == pytest.approx(0.038 * 29000 / (50 * 80) + 2 / 3)
