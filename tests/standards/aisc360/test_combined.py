"""Chapter H (H1-1a/H1-1b, H2-1) and Appendix 8 (B1)."""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.standards.aisc360 import combined
from calcsheet.standards.aisc360 import second_order as appendix8
from calcsheet.standards.aisc360.second_order import K_FIXED_FREE, amplification_alpha

from .support import INCH, KIP, E, member_sheet, value


def test_design_example_h1_w14x99() -> None:
    # AISC Design Examples H.1A/H.1B, W14X99, Lc = Lb = 14 ft, moments from a second-order
    # analysis (from memory): LRFD Pu = 400 kips, Mux = 250, Muy = 80 kip·ft; φcPn = 1130,
    # φbMnx = 642, φbMny = 311; H1-1a = 400/1130 + 8/9(250/642 + 80/311) = 0.929.
    # ASD Pa = 267, Max = 167, May = 53.3; Pn/Ωc = 750, Mnx/Ωb = 428, Mny/Ωb = 207.
    # Tolerance 0.5 % (rounding of the example).
    cases = (
        ("LRFD", (-400, 250, 80), (1130, 642, 311)),
        ("ASD", (-267, 167, 53.3), (750, 428, 207)),
    )
    for method, (P, Mx, My), (P_c, M_cx, M_cy) in cases:
        sheet = member_sheet(
            "W14X99", method, P=P, Mx=Mx, My=My, length="14 ft", K=1.0, second_order=False
        )
        assert value(sheet, "P_c", "kip") == pytest.approx(P_c, rel=0.005)
        assert value(sheet, "M_c_x", "kip*ft") == pytest.approx(M_cx, rel=0.005)
        assert value(sheet, "M_c_y", "kip*ft") == pytest.approx(M_cy, rel=0.005)
        expected = -P / P_c + 8 / 9 * (Mx / M_cx + My / M_cy)
        assert value(sheet, "eta_H1", "") == pytest.approx(expected, rel=0.005)


@pytest.mark.parametrize("ratio", [0.2 - 1e-9, 0.2, 0.2 + 1e-9])
def test_h1_1a_and_h1_1b_meet_at_pr_pc_0_2(ratio: float) -> None:
    # At Pr/Pc = 0.2 the two interaction curves meet where Mr/Mc = 0.9: H1-1a gives
    # 0.2 + 8/9·0.9 = 1.0 and H1-1b 0.1 + 0.9 = 1.0 (AISC 360-22 Section H1.1).
    got = combined.h1_interaction.numeric(ratio, 1.0, 0.6, 1.0, 0.3, 1.0)
    assert got == pytest.approx(1.0, abs=1e-8)
    by_a = ratio + 8 / 9 * 0.9
    by_b = ratio / 2 + 0.9
    assert got == pytest.approx(by_a if ratio >= 0.2 else by_b)


def test_printed_h1_agrees_with_numeric() -> None:
    sheet = Sheet("H1")
    with sheet:
        P_c = sheet.input("P_c", "500 kip")
        M_cx = sheet.input("M_cx", "300 kip*ft")
        M_cy = sheet.input("M_cy", "100 kip*ft")
        for index, P in enumerate((30.0, 250.0)):
            P_r = sheet.input(f"P_r_{index}", f"{P} kip")
            M_rx = sheet.input(f"M_rx_{index}", "120 kip*ft")
            M_ry = sheet.input(f"M_ry_{index}", "20 kip*ft")
            combined.h1_interaction.write(sheet, f"eta_{index}", P_r, P_c, M_rx, M_cx, M_ry, M_cy)
            numeric = combined.h1_interaction.numeric(P, 500.0, 120.0, 300.0, 20.0, 100.0)
            assert sheet.value(f"eta_{index}").m == pytest.approx(numeric)


def test_h2_1_hand_calc() -> None:
    # Hand calc from AISC 360-22 Eq. H2-1: |10/20 − 6/30 + 4/40| = 0.4.
    assert combined.h2_interaction.numeric(10, 20, -6, 30, 4, 40) == pytest.approx(0.4)


def test_b1_hand_calc_and_alpha() -> None:
    # Hand calc from AISC 360-22 Eq. A-8-3, A-8-5: EI = 29000 ksi·100 in⁴, K·L = 2.1·120 in:
    # Pe1 = π²EI/(KL)² = 450.7 kips; Pr = −100 kips (compression), LRFD α = 1:
    # B1 = 1/(1 − 100/450.7) = 1.285; ASD α = 1.6: 1/(1 − 160/450.7) = 1.550.
    assert amplification_alpha("LRFD") == 1.0 and amplification_alpha("ASD") == 1.6
    assert K_FIXED_FREE == 2.1
    P_e1 = appendix8.euler_load.numeric(E * 100 * INCH**4, K_FIXED_FREE, 120 * INCH)
    assert P_e1 / KIP == pytest.approx(np.pi**2 * 29000 * 100 / (2.1 * 120) ** 2)
    for alpha in (1.0, 1.6):
        B_1 = appendix8.b1_multiplier.numeric(1.0, alpha, -100 * KIP, P_e1)
        expected = 1 / (1 - alpha * 100 * KIP / P_e1)
        assert pytest.approx(expected) == B_1
    # Tension: B1 = 1; Cm small: B1 not below 1; α|Pr| >= Pe1: no value (NaN).
    P_r = np.array([50.0, -10.0, -1000.0]) * KIP
    got = appendix8.b1_multiplier.numeric(0.4, 1.0, P_r, P_e1)
    assert got[0] == 1.0 and got[1] == 1.0 and np.isnan(got[2])


def test_a_member_that_buckles_under_the_load_fails_on_the_sheet() -> None:
    sheet = member_sheet("L2X2X1/4", "LRFD", P=-20, Mx=1, length="10 ft")
    stability = [check for check in sheet.checks if "buckling load" in check.description]
    assert stability and not stability[0].passes
    assert "B_1_x" not in {step.name for step in sheet.steps}
