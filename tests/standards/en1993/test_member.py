"""EN 1993-1-1 member checks on a sheet, each value re-derived by hand in the test."""

from __future__ import annotations

import math

import pytest
import sympy as sp

from calcsheet.calcs.member import member_sheet
from calcsheet.engine import Sheet
from calcsheet.errors import DefinitionError, InputError
from calcsheet.mechanics import point_load
from calcsheet.sections import angle, catalog_section, i_shape, rectangular_hss, round_hss
from calcsheet.standards.en1993 import steel, write_en1993_checks


def si_sheet(**forces: str) -> tuple[Sheet, dict[str, sp.Symbol]]:
    sheet = Sheet("EN 1993-1-1", units="SI")
    dims = {"N": "force", "V": "force", "M": "moment"}
    with sheet:
        symbols = {
            name: sheet.input(name, value, dimension=dims[name[0]])
            for name, value in forces.items()
        }
    return sheet, symbols


def chi(alpha: float, lam: float) -> float:
    """Eq. (6.49), written out again for the test."""
    phi = 0.5 * (1 + alpha * (lam - 0.2) + lam**2)
    return min(1.0, 1.0 / (phi + math.sqrt(phi**2 - lam**2)))


def by_description(checks, text: str):
    return next(check for check in checks if check.description.startswith(text))


def test_rolled_i_section_by_hand() -> None:
    """Hand calc from EN 1993-1-1 Eq. (6.6), (6.13), (6.18), (6.36)-(6.41), (6.47)-(6.50)."""
    section = i_shape("300 mm", "150 mm", "7.1 mm", "10.7 mm")  # IPE 300 plates, no fillet
    sheet, d = si_sheet(N_Ed="-100 kN", M_y_Ed="50 kN*m", M_z_Ed="3 kN*m", V_Ed="60 kN")
    checks = write_en1993_checks(
        sheet, section, demands=d, material="S235", length="3 m", fabrication="rolled"
    )
    props = {key: section.properties[key].to_base_units().m for key in section.properties}
    A, fy = props["A"], 235e6
    # Classes (Table 5.2), ε = 1: flange c/t = 71.45/10.7 = 6.68 ≤ 9 -> 1; web under N + M:
    # α = ½(1 + 100 kN/(235·278.6·7.1)) = 0.6076, 396/(13α − 1) = 57.4 ≥ 39.2 -> 1.
    assert sheet.value("alpha_w").m == pytest.approx(0.5 * (1 + 100e3 / (fy * 0.2786 * 0.0071)))
    assert sheet.value("class_y").m == 1
    assert sheet.value("class_z").m == 1
    # Pure compression: web 39.2 > 38ε, ≤ 42ε -> class 3.
    assert sheet.value("class_N").m == 3
    N_pl = A * fy
    assert by_description(checks, "Axial").utilization == pytest.approx(100e3 / N_pl)
    # 6.2.6(3)a: A − 2bt_f + t_w·t_f (r = 0) = 2054.0 mm² > η·h_w·t_w = 1978.1 mm².
    A_v = A - 2 * 0.150 * 0.0107 + 0.0071 * 0.0107
    assert A_v * 1e6 == pytest.approx(2054.03, abs=0.01)
    V_pl = A_v * fy / math.sqrt(3)
    assert by_description(checks, "Shear along z").utilization == pytest.approx(60e3 / V_pl)
    M_pl_y, M_pl_z = props["Zx"] * fy, props["Zy"] * fy
    assert by_description(checks, "Bending about y-y").utilization == pytest.approx(50e3 / M_pl_y)
    assert by_description(checks, "Bending about z-z").utilization == pytest.approx(3e3 / M_pl_z)
    # 6.2.9.1: n = 0.082, a = 0.381: M_N,y = M_pl,y (cap), M_N,z = M_pl,z (n ≤ a); α = 2, β = 1.
    n = 100e3 / N_pl
    a = min((A - 2 * 0.150 * 0.0107) / A, 0.5)
    assert n < a
    assert min(M_pl_y * (1 - n) / (1 - a / 2), M_pl_y) == M_pl_y
    combined = (50e3 / M_pl_y) ** 2 + (3e3 / M_pl_z) ** max(5 * n, 1)
    assert by_description(checks, "Bending and axial").utilization == pytest.approx(combined)
    # 6.3.1: λ₁ = π√(E/f_y) = 93.9; L_cr = 2·3 m; rolled, h/b = 2, t_f ≤ 40: a (y), b (z).
    lambda_1 = math.pi * math.sqrt(210e9 / fy)
    for axis, radius, alpha in (("y", props["rx"], 0.21), ("z", props["ry"], 0.34)):
        lam = 6.0 / (radius * lambda_1)
        assert sheet.value(f"lambda_rel_{axis}").m == pytest.approx(lam)
        N_b = chi(alpha, lam) * A * fy
        check = by_description(checks, f"Flexural buckling about {axis}")
        assert check.utilization == pytest.approx(100e3 / N_b)
    assert all(check.passes for check in checks)


def test_inputs_change_and_the_sheet_follows() -> None:
    section = i_shape("300 mm", "150 mm", "7.1 mm", "10.7 mm")
    sheet, d = si_sheet(N_Ed="-100 kN", M_y_Ed="50 kN*m")
    checks = write_en1993_checks(sheet, section, demands=d, material="S235", length="3 m")
    sheet.set_input("N_Ed", "40 kN")  # tension: nothing left to buckle
    assert by_description(checks, "Flexural buckling about z").utilization == 0.0
    sheet.set_input("gamma_M0", 1.1)  # a National Annex value
    A = section.properties["A"].to("m**2").m
    assert by_description(checks, "Axial").utilization == pytest.approx(40e3 * 1.1 / (A * 235e6))
    # f_y settled the scope (class 4, the web limit of 6.2.6(6)) when the sheet was built.
    with pytest.raises(InputError, match="build the sheet again"):
        sheet.set_input("f_y", "355 MPa")


def test_welded_default_for_user_i_shapes_and_shear_area() -> None:
    section = i_shape("300 mm", "150 mm", "7.1 mm", "10.7 mm")
    sheet, d = si_sheet(N_Ed="-10 kN", V_z_Ed="10 kN")
    write_en1993_checks(sheet, section, demands=d, material="S235", length="2 m")
    # 6.2.6(3)d: η·h_w·t_w = 1.0 · 278.6 · 7.1 = 1978.06 mm²; welded t_f ≤ 40: b (y), c (z).
    assert sheet.value("A_v_z").to("mm**2").m == pytest.approx(1978.06)
    assert sheet.value("alpha_y").m == 0.34 and sheet.value("alpha_z").m == 0.49


def test_catalog_w_shape_on_the_member_sheet() -> None:
    """The EN checks go on the member sheet, reusing its A and L, with the axis mapping."""
    section = catalog_section("W10X33")
    load = point_load("P1", components=("0.3 kip", "-6 kip", "-2 kip"), z="60 in", ey="-5 in")
    sheet = member_sheet(section, [load], length="60 in")
    demands = {
        "N_Ed": sp.Symbol("N"),
        "M_y_Ed": sp.Symbol("M_x"),
        "M_z_Ed": sp.Symbol("M_y"),
        "V_z_Ed": sp.Symbol("V_y"),
        "V_y_Ed": sp.Symbol("V_x"),
    }
    checks = write_en1993_checks(
        sheet, section, demands=demands, material=steel("S355", f_y="345 MPa"), length="60 in"
    )
    # Axial, shear z and y, bending y and z, N + M, buckling y and z, lateral-torsional
    # buckling and Eq. (6.61), (6.62); the web limit of 6.2.6(6) is a statement, not a
    # check (issue 12: utilization is demand/capacity).
    assert len(checks) == 11
    # M_y,Ed = calcsheet M_x = e_y·F_z − a·F_y = (−5)(−2) − 60(−6) = 370 kip·in; class 1 or
    # 2 in bending, so M_c,y,Rd = Z_x·f_y = 38.8 in³ · 345 MPa (Eq. 6.13, hand calc).
    M_c = 38.8 * 0.0254**3 * 345e6
    M_Ed = 370 * 4448.222 * 0.0254
    assert by_description(checks, "Bending about y-y").utilization == pytest.approx(
        M_Ed / M_c, rel=1e-3
    )
    # Rolled W, h/b = 9.73/7.96 = 1.22 > 1.2, t_f = 11 mm: a about y, b about z (Table 6.2).
    assert sheet.value("alpha_y").m == 0.21 and sheet.value("alpha_z").m == 0.34
    # Fillet from the AISC tables: r = k_des − t_f = 0.935 − 0.435 = 0.5 in.
    assert sheet.value("r").to("inch").m == pytest.approx(0.5)


def test_rhs_cold_formed_by_default() -> None:
    section = rectangular_hss("200 mm", "100 mm", "8 mm")
    sheet, d = si_sheet(N_Ed="-300 kN", M_y_Ed="40 kN*m", M_z_Ed="10 kN*m")
    checks = write_en1993_checks(sheet, section, demands=d, length="4 m")
    assert sheet.value("alpha_y").m == 0.49 and sheet.value("alpha_z").m == 0.49  # curve c
    # Table 5.2 with c = b − 3t: flanges (100 − 24)/8 = 9.5 ≤ 33ε = 26.8 -> class 1 (S355).
    assert sheet.value("ct_b").m == pytest.approx(9.5)
    assert sheet.value("class_y").m == 1
    # RHS exponent 1.66/(1 − 1.13n²) (6.2.9.1(6)), n from Eq. (6.6).
    A = section.properties["A"].to("m**2").m
    n = 300e3 / (A * 355e6)
    assert sheet.value("alpha_NM").m == pytest.approx(min(1.66 / (1 - 1.13 * n**2), 6))
    assert len(checks) == 9  # with LTB (RHS, h ≠ b) and Eq. (6.61), (6.62)


def test_chs_uses_the_linear_interaction() -> None:
    section = round_hss("168.3 mm", "5 mm")
    sheet, d = si_sheet(N_Ed="-200 kN", M_y_Ed="10 kN*m", M_z_Ed="5 kN*m")
    checks = write_en1993_checks(sheet, section, demands=d, material="S355", length="3 m")
    # d/t = 33.66 > 50ε² = 33.10, ≤ 70ε² -> class 2 (Table 5.2 sheet 3, hand calc).
    assert sheet.value("class_t").m == 2
    props = {key: section.properties[key].to_base_units().m for key in ("A", "Zx", "Zy")}
    expected = 200e3 / (props["A"] * 355e6) + 10e3 / (props["Zx"] * 355e6)
    expected += 5e3 / (props["Zy"] * 355e6)
    assert by_description(checks, "Bending and axial").utilization == pytest.approx(expected)


def test_what_is_not_supported_is_said() -> None:
    sheet, d = si_sheet(N_Ed="-10 kN")
    with pytest.raises(InputError, match="I-section.*hollow section") as info:
        write_en1993_checks(sheet, angle("100 mm", "100 mm", "10 mm"), demands=d, length="1 m")
    assert "angle" in str(info.value)
    unequal = i_shape("300 mm", "150 mm", "7 mm", "10 mm", bf_bottom="200 mm")
    with pytest.raises(InputError, match="unequal flanges"):
        write_en1993_checks(sheet, unequal, demands=d, length="1 m")


def test_class_4_is_refused() -> None:
    slender = i_shape("900 mm", "300 mm", "4 mm", "20 mm")  # web c/t = 215 > 124ε
    sheet, d = si_sheet(M_y_Ed="100 kN*m")
    with pytest.raises(InputError, match="class 4"):
        write_en1993_checks(sheet, slender, demands=d, length="1 m")


def test_bad_demands_and_thick_sections() -> None:
    sheet, d = si_sheet(N_Ed="-10 kN", M_y_Ed="5 kN*m")
    section = i_shape("300 mm", "150 mm", "7.1 mm", "10.7 mm")
    with pytest.raises(InputError, match="a moment"):
        write_en1993_checks(sheet, section, demands={"M_y_Ed": d["N_Ed"]}, length="1 m")
    with pytest.raises(InputError, match="keys among"):
        write_en1993_checks(sheet, section, demands={"M_x_Ed": d["M_y_Ed"]}, length="1 m")
    thick = catalog_section("W14X730")  # t_f = 4.91 in = 125 mm
    with pytest.raises(InputError, match="f_y"):
        write_en1993_checks(sheet, thick, demands=d, length="1 m")


def test_a_clash_with_a_different_value_is_refused() -> None:
    sheet, d = si_sheet(N_Ed="-10 kN")
    with sheet:
        sheet.input("A", "1 m**2", dimension="area")
    section = i_shape("300 mm", "150 mm", "7.1 mm", "10.7 mm")
    with pytest.raises(DefinitionError, match="already defines 'A'"):
        # S235: web c/t = 39.2 ≤ 42ε, class 3 in compression (S355 would be class 4).
        write_en1993_checks(sheet, section, demands=d, material="S235", length="1 m")


def test_thick_rolled_sections_and_table_6_2() -> None:
    sheet, d = si_sheet(N_Ed="-1000 kN")
    # W14X730: h/b = 22.4/17.9 = 1.25 > 1.2 with t_f = 125 mm: no row of Table 6.2.
    with pytest.raises(InputError, match="outside Table 6.2"):
        write_en1993_checks(
            sheet, catalog_section("W14X730"), demands=d, material=steel("S355", f_y="295 MPa"),
            length="4 m",
        )  # fmt: skip
    # h/b = 500/450 ≤ 1.2 and t_f = 110 mm > 100 mm: curve d about both axes.
    stocky = i_shape("500 mm", "450 mm", "60 mm", "110 mm")
    sheet, d = si_sheet(N_Ed="-1000 kN")
    write_en1993_checks(
        sheet, stocky, demands=d, material=steel("S355", f_y="295 MPa"), length="4 m",
        fabrication="rolled",
    )  # fmt: skip
    assert sheet.value("alpha_y").m == 0.76 and sheet.value("alpha_z").m == 0.76
