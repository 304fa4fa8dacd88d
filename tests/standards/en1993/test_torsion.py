"""EN 1993-1-1:2005 6.2.7 (torsion) and 6.2.7(9) (shear force with torsion) in the procedure.

Hand calcs write the arithmetic and cite the clause or equation of EN 1993-1-1:2005; the
formulas are typed from memory of the standard (6.2.7(1) Eq. 6.23, 6.2.1(5) Eq. 6.1,
6.2.7(9) Eq. 6.25, 6.26, 6.28, 6.2.8(4)) and of thin-walled torsion (Bredt's formula
τ = T/(2·A_m·t) for a closed wall, τ = T·t/I_t for an open section), and say so. Member
dimensions are our own invention unless a catalog section is named.
"""

from __future__ import annotations

import math
import re

import numpy as np
import pytest
import sympy as sp

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis
from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.mechanics import point_load
from calcsheet.render.html import render_html
from calcsheet.sections import Section, catalog_section, rectangular_hss, round_hss
from calcsheet.standards.en1993 import (
    EN_CHECK_TITLES,
    en1993_checks_numeric,
    steel,
    write_en1993_checks,
)
from calcsheet.standards.en1993.factors import as_partial_factors
from calcsheet.standards.en1993.numeric import en1993_checks_prepared
from calcsheet.standards.en1993.section_table import family_inputs, family_table
from calcsheet.units import Quantity
from tests.standards.en1993.test_procedure import _random_member

KEYS = {title: key for key, title in EN_CHECK_TITLES.items()}
DEMANDS = ("N_Ed", "M_y_Ed", "M_z_Ed", "V_z_Ed", "V_y_Ed", "T_Ed")
# f_y/√3 for S355 and γM0 = 1.0 (EN 1993-1-1 6.1(1) recommended value): the shear
# strength of the yield criterion, Eq. (6.1) with σ = 0.
TAU_RD_S355 = 355.0 / math.sqrt(3)  # = 204.96 N/mm²


def demand_sheet(values: dict[str, float]) -> tuple[Sheet, dict[str, sp.Symbol]]:
    """A sheet with the demands (N, N·m) as inputs; T_Ed and M are moments."""
    sheet = Sheet("EN 1993-1-1 torsion", units="SI")
    with sheet:
        symbols = {}
        for name, value in values.items():
            moment = name.startswith(("M", "T"))
            symbols[name] = sheet.input(
                name,
                Quantity(value, "N*m" if moment else "N"),
                dimension="moment" if moment else "force",
            )
    return sheet, symbols


def sheet_checks(section: Section, demands: dict[str, float], **options) -> tuple[Sheet, dict]:
    sheet, symbols = demand_sheet(demands)
    checks = write_en1993_checks(sheet, section, demands=symbols, **options)
    return sheet, {KEYS[check.description]: check.utilization for check in checks}


def mm(sheet: Sheet, name: str, power: int = 1) -> float:
    return float(sheet.value(name).to(f"mm**{power}").m)


def test_ipe_300_open_section_by_hand() -> None:
    """IPE 300, S355, T_Ed = 2 kN·m, V_z,Ed = 80 kN, V_y,Ed = 10 kN.

    I_t = 20.12 cm⁴ (EN 10365 table of IPE 300, from memory; the catalog section computes
    its own). St Venant torsion of an open section (6.2.7(4)): τ_t = T·t/I_t.
    * Thickest element t_f = 10.7 mm: τ_t,Ed = 2·10⁶·10.7/201200 = 106.4 N/mm².
    * τ_Rd = 355/√3 = 204.96 N/mm² (6.2.7(5) with 6.2.1(5) Eq. 6.1, σ = 0).
    * T_Rd = I_t·τ_Rd/t_f = 201200·204.96/10.7 = 3.854 kN·m; T_Ed/T_Rd = 0.519 (Eq. 6.23).
    * Web (carries V_z): τ_t,w = 2·10⁶·7.1/201200 = 70.58 N/mm²; A_v,z = A − 2·b·t_f +
      (t_w + 2r)·t_f = 5381 − 3210 + 397.0 = 2568 mm² (6.2.6(3)a); V_pl,z,Rd = 2568·204.96 =
      526.3 kN (Eq. 6.18); Eq. (6.26): V_pl,T,Rd = √(1 − 70.58/(1.25·204.96))·526.3 =
      0.8511·526.3 = 448.0 kN; 80/448.0 = 0.1786 (Eq. 6.25).
    * Flanges (carry V_y): τ_t,f = 106.4 N/mm²; A_v,y = A − h_w·t_w (6.2.6(3)e as the
      procedure uses it) = 5381 − 278.6·7.1 = 3403 mm²; V_pl,y,Rd = 697.5 kN;
      V_pl,T,Rd = √(1 − 106.4/256.2)·697.5 = 0.7648·697.5 = 533.5 kN; 10/533.5 = 0.0187.
    """
    section = catalog_section("IPE 300")
    I_t = section.properties["J"].to("mm**4").m
    assert I_t == pytest.approx(20.12e4, rel=0.01)  # EN 10365, from memory
    A = section.properties["A"].to("mm**2").m
    T, V_z, V_y = 2e3, 80e3, 10e3
    sheet, u = sheet_checks(
        section, {"T_Ed": T, "V_z_Ed": V_z, "V_y_Ed": V_y}, material="S355", length="3 m"
    )
    T_Nmm = T * 1e3
    tau_f = T_Nmm * 10.7 / I_t
    assert float(sheet.value("tau_t_Ed").to("MPa").m) == pytest.approx(tau_f, rel=1e-9)
    assert tau_f == pytest.approx(106.4, abs=0.05)
    T_Rd = I_t * TAU_RD_S355 / 10.7  # N·mm
    assert T_Rd / 1e6 == pytest.approx(3.854, abs=5e-4)
    assert u["torsion"] == pytest.approx(T_Nmm / T_Rd, rel=1e-9)
    assert u["torsion"] == pytest.approx(0.519, abs=5e-4)
    # Eq. (6.26) with the web's stress for V_z, the flanges' for V_y.
    A_vz = A - 2 * 150 * 10.7 + (7.1 + 2 * 15) * 10.7
    assert mm(sheet, "A_v_z", 2) == pytest.approx(A_vz, rel=1e-9)
    tau_w = T_Nmm * 7.1 / I_t
    V_pl_T_z = math.sqrt(1 - tau_w / (1.25 * TAU_RD_S355)) * A_vz * TAU_RD_S355
    assert u["shear_torsion_z"] == pytest.approx(V_z / V_pl_T_z, rel=1e-9)
    assert u["shear_torsion_z"] == pytest.approx(0.1786, abs=5e-4)
    A_vy = A - (300 - 2 * 10.7) * 7.1
    V_pl_T_y = math.sqrt(1 - tau_f / (1.25 * TAU_RD_S355)) * A_vy * TAU_RD_S355
    assert u["shear_torsion_y"] == pytest.approx(V_y / V_pl_T_y, rel=1e-9)
    assert u["shear_torsion_y"] == pytest.approx(0.0187, abs=5e-4)
    # The shear checks without torsion are unchanged (Eq. 6.17, 6.18).
    assert u["shear_z"] == pytest.approx(V_z / (A_vz * TAU_RD_S355), rel=1e-9)
    # The sheet says that warping is not in this check.
    texts = " ".join(getattr(part, "text", "") for part in sheet.parts)
    assert "Warping torsion" in texts and "6.2.7(2), (4), (7)" in texts


@pytest.mark.parametrize(
    ("fabrication", "R_m", "A_m"),
    [
        # EN 10219-2:2006 Annex B (from memory): 6 < t ≤ 10 mm, r_o = 2.5t = 20 mm, r_i = r_o − t
        # = 12 mm, R_m = 16 mm; A_m = 92·192 − (4 − π)·16² = 17664 − 219.75 = 17444.25 mm².
        ("cold-formed", 16.0, 17444.25),
        # EN 10210-2:2006 Annex B (from memory): r_o = 1.5t = 12, r_i = t = 8, R_m = 10 mm;
        # A_m = 17664 − (4 − π)·100 = 17578.16 mm².
        ("hot-finished", 10.0, 17578.16),
    ],
)
def test_rhs_by_bredt_and_eq_6_28(fabrication: str, R_m: float, A_m: float) -> None:
    """RHS 200 × 100 × 8, S355, T_Ed = 10 kN·m, V_z,Ed = 100 kN.

    Bredt (closed thin wall, 6.2.7(4), (7)): τ_t,Ed = T/(2·A_m·t); cold-formed:
    10·10⁶/(2·17444.25·8) = 35.83 N/mm². T_Rd = 2·A_m·t·τ_Rd = 2·17444.25·8·204.96 =
    57.21 kN·m; T_Ed/T_Rd = 0.1748 (Eq. 6.23). Eq. (6.28): V_pl,T,Rd = (1 − 35.83/204.96)·
    V_pl,z,Rd = 0.8252·V_pl,z,Rd, A_v = A·h/(b + h) (6.2.6(3)f).
    """
    section = rectangular_hss("200 mm", "100 mm", "8 mm")
    A = section.properties["A"].to("mm**2").m
    T, V_z = 10e3, 100e3
    sheet, u = sheet_checks(
        section, {"T_Ed": T, "V_z_Ed": V_z}, material="S355", length="2 m",
        fabrication=fabrication,
    )  # fmt: skip
    assert mm(sheet, "R_m") == pytest.approx(R_m, rel=1e-9)
    exact = 92 * 192 - (4 - math.pi) * R_m**2
    assert exact == pytest.approx(A_m, abs=0.01)
    assert mm(sheet, "A_m_T", 2) == pytest.approx(exact, rel=1e-9)
    A_m = exact
    tau = 10e6 / (2 * A_m * 8)
    assert float(sheet.value("tau_t_Ed").to("MPa").m) == pytest.approx(tau, rel=1e-9)
    T_Rd = 2 * A_m * 8 * TAU_RD_S355
    assert u["torsion"] == pytest.approx(10e6 / T_Rd, rel=1e-9)
    if fabrication == "cold-formed":
        assert tau == pytest.approx(35.83, abs=0.005)
        assert T_Rd / 1e6 == pytest.approx(57.21, abs=0.005)
        assert u["torsion"] == pytest.approx(0.1748, abs=5e-5)
    V_pl = A * 200 / 300 * TAU_RD_S355
    assert u["shear_torsion_z"] == pytest.approx(V_z / ((1 - tau / TAU_RD_S355) * V_pl), rel=1e-9)
    assert "shear_torsion_y" not in u  # no V_y,Ed given: not checked


def test_chs_by_bredt() -> None:
    """CHS 168.3 × 6, S355, T_Ed = 2 kN·m, V_y,Ed = 50 kN: A_m = π·162.3²/4 = 20688.4 mm²;
    τ_t,Ed = 2·10⁶/(2·20688.4·6) = 8.056 N/mm² (Bredt); T_Rd = 2·20688.4·6·204.96 =
    50.88 kN·m, T_Ed/T_Rd = 0.0393 (Eq. 6.23). A_v = 2A/π (6.2.6(3)g); Eq. (6.28):
    V_pl,T,Rd = (1 − 8.056/204.96)·V_pl,Rd."""
    section = round_hss("168.3 mm", "6 mm")
    _, u = sheet_checks(section, {"T_Ed": 2e3, "V_y_Ed": 50e3}, material="S355", length="2 m")
    A_m = math.pi * 162.3**2 / 4
    assert A_m == pytest.approx(20688.4, abs=0.05)
    tau = 2e6 / (2 * A_m * 6)
    assert tau == pytest.approx(8.056, abs=5e-4)
    assert u["torsion"] == pytest.approx(tau / TAU_RD_S355, rel=1e-9)
    assert u["torsion"] == pytest.approx(0.0393, abs=5e-5)
    A = section.properties["A"].to("mm**2").m
    V_pl = 2 * A / math.pi * TAU_RD_S355
    assert u["shear_torsion_y"] == pytest.approx(50e3 / ((1 - tau / TAU_RD_S355) * V_pl), rel=1e-9)
    # The same stress as the thin-tube formula T·r_m/J with J = 2π·r_m³·t (common
    # practice, no source): 2·10⁶·81.15/(2π·81.15³·6) = 8.056 N/mm².
    r_m = 81.15
    assert tau == pytest.approx(2e6 * r_m / (2 * math.pi * r_m**3 * 6), rel=1e-12)


def test_no_torque_and_round_off_torque_give_zero_demand() -> None:
    """T = 0, and T = 10⁻¹²·M_y (round-off of statics, below 10⁻⁹·|M|: the AISC side's
    threshold), give zero torsion demand; the shear checks with torsion equal the plain ones
    (V_pl,T,Rd = V_pl,Rd by Eq. 6.26 with τ_t,Ed = 0). Without T_Ed among the demands the
    torsion checks are not written at all."""
    section = catalog_section("IPE 300")
    base = {"M_y_Ed": 50e3, "V_z_Ed": 60e3, "V_y_Ed": 5e3}
    for torque in (0.0, 1e-12 * 50e3, -1e-12 * 50e3):
        _, u = sheet_checks(section, {**base, "T_Ed": torque}, material="S355", length="3 m")
        assert u["torsion"] == 0.0
        assert u["shear_torsion_z"] == pytest.approx(u["shear_z"], rel=1e-12)
        assert u["shear_torsion_y"] == pytest.approx(u["shear_y"], rel=1e-12)
        numeric = en1993_checks_numeric(
            section, {k: np.array([v]) for k, v in {**base, "T_Ed": torque}.items()},
            material="S355", length="3 m",
        )  # fmt: skip
        assert numeric["torsion"][0] == 0.0
    # Just above the round-off the torque counts.
    _, u = sheet_checks(section, {**base, "T_Ed": 1e-6 * 50e3}, material="S355", length="3 m")
    assert u["torsion"] > 0
    _, u = sheet_checks(section, base, material="S355", length="3 m")
    assert not {"torsion", "shear_torsion_z", "shear_torsion_y"} & set(u)


def test_torsion_exhausting_the_shear_resistance() -> None:
    """Eq. (6.26) has no shear resistance left where τ_t,Ed ≥ 1.25·τ_Rd: with a shear
    force the check is NOT OK (τ_t,Ed/(1.25·τ_Rd) shown), without one it is 0 and the
    torsion check carries the failure. IPE 300, T_Ed = 6 kN·m: τ_t,f = 6·10⁶·10.7/I_t ≈ 319
    N/mm² > 1.25·204.96 = 256.2 N/mm²; the web's τ_t,w ≈ 212 N/mm² is below it."""
    section = catalog_section("IPE 300")
    I_t = section.properties["J"].to("mm**4").m
    tau_f = 6e6 * 10.7 / I_t
    for V_y, expected in ((1e3, tau_f / (1.25 * TAU_RD_S355)), (0.0, 0.0)):
        demands = {"T_Ed": 6e3, "V_z_Ed": 20e3, "V_y_Ed": V_y}
        _, u = sheet_checks(section, demands, material="S355", length="1 m")
        assert u["shear_torsion_y"] == pytest.approx(expected, rel=1e-9)
        assert u["torsion"] > 1
        numeric = en1993_checks_numeric(
            section, {k: np.array([v]) for k, v in demands.items()}, material="S355",
            length="1 m",
        )  # fmt: skip
        assert float(numeric["shear_torsion_y"][0]) == pytest.approx(expected, rel=1e-9)


def test_slender_rhs_walls_under_torsion_are_refused() -> None:
    """6.2.7(8): the walls of a closed section in shear from torsion need EN 1993-1-5 beyond
    h_w/t = 72ε/η (6.2.6(6)). RHS 400 × 200 × 5, S355: (400 − 10)/5 = 78 > 72·0.8136 = 58.6.
    Refused on the sheet and infinite on the numeric path with a torque; accepted without."""
    section = rectangular_hss("400 mm", "200 mm", "5 mm")
    sheet, symbols = demand_sheet({"T_Ed": 1e3})
    with pytest.raises(InputError, match=r"6\.2\.7\(8\)"):
        write_en1993_checks(sheet, section, demands=symbols, material="S355", length="2 m")
    numeric = en1993_checks_numeric(
        section, {"T_Ed": np.array([1e3, 0.0])}, material="S355", length="2 m"
    )
    assert np.isinf(numeric["torsion"][0]) and numeric["torsion"][1] == 0.0
    _, u = sheet_checks(section, {"T_Ed": 0.0}, material="S355", length="2 m")
    assert u == {"torsion": 0.0}


def test_printed_and_numeric_agree_with_torque_on_random_members() -> None:
    """Random members (those of the parity test of the procedure) with a torque column:
    the sheet's utilizations equal the numeric path's, row 0 among four (every decision of
    6.2.7 taken per row: zero, round-off and real torques)."""
    rng = np.random.default_rng(20261214)
    compared = refused = torsion_nonzero = 0
    for index in range(80):
        section, options = _random_member(rng, index)
        props = {key: section.properties[key].to_base_units().m for key in ("A", "Zx", "Zy")}
        f_y = 355e6
        scale = np.array(
            [props["A"] * f_y, props["Zx"] * f_y, props["Zy"] * f_y, props["A"] * f_y / 3,
             props["A"] * f_y / 6, props["Zx"] * f_y * 0.03]
        )  # fmt: skip
        rows = rng.uniform(-1.0, 1.0, (4, 6)) * scale * rng.uniform(0.05, 0.9, (4, 1))
        rows[rng.random((4, 6)) < 0.2] = 0.0
        if index % 7 == 0:
            rows[0, 5] = 1e-12 * abs(rows[0, 1])  # round-off
        numeric = en1993_checks_numeric(
            section, {key: rows[:, i] for i, key in enumerate(DEMANDS)}, **options
        )
        try:
            _, printed = sheet_checks(section, dict(zip(DEMANDS, rows[0], strict=True)), **options)
        except InputError:
            assert all(np.isinf(values[0]) for values in numeric.values())
            refused += 1
            continue
        assert set(printed) == set(numeric)
        for key, utilization in printed.items():
            assert utilization == pytest.approx(float(numeric[key][0]), rel=1e-9, abs=1e-12), (
                index,
                key,
            )
        torsion_nonzero += printed["torsion"] > 0
        compared += 1
    print(f"torsion parity: {compared} compared, {refused} refused, {torsion_nonzero} torqued")
    assert compared >= 55 and torsion_nonzero >= 40


@pytest.mark.parametrize("family", ["IPE", "SHS", "RHS", "CHS"])
def test_family_search_with_torque_equals_the_built_sections(family: str) -> None:
    """The lightest-section search's arrays (section values from the family table) give the
    torsion checks of each built catalog section (their values differ from the table's in
    the fifth significant figure, see section_table)."""
    table = family_table(family)
    chosen = list(range(0, len(table.names), max(1, len(table.names) // 5)))[:5]
    forces = np.array([[10e3, 2e3, 5e3, 800.0], [5e3, 0.0, -1e3, 0.0]])
    demands = {"N_Ed": forces[:, 0], "V_z_Ed": forces[:, 1], "V_y_Ed": forces[:, 2],
               "T_Ed": forces[:, 3]}  # fmt: skip
    options = {"material": "S355", "length": "2 m", "k_eff": 2.0}
    member, given, refused = family_inputs(
        table, material=steel("S355"), length=Quantity(2, "m"), k_eff=2.0,
        gamma=as_partial_factors(None),
    )  # fmt: skip
    together = en1993_checks_prepared(member, demands, given, refused)
    for i in chosen:
        built = catalog_section(table.names[i])
        alone = en1993_checks_numeric(built, demands, **options)
        for key in ("torsion", "shear_torsion_z", "shear_torsion_y"):
            np.testing.assert_allclose(together[key][i], alone[key], rtol=2e-3, err_msg=key)
        assert together["torsion"][i][0] > 0 and together["torsion"][i][1] == 0


def test_a_member_failing_only_in_torsion_is_not_ok() -> None:
    """A short IPE 300 bracket (our own invention): 20 kN down at 0.3 m to the side of the
    web, 0.5 m from the support. T_Ed = 20·0.3 = 6 kN·m > T_Rd = 3.854 kN·m (hand calc
    above), while bending (10 kN·m) and shear (20 kN) are small: the only failing check is
    6.2.7, and the summary says NOT OK."""
    loads = [point_load("bracket", components=("0 kN", "-20 kN", "0 kN"), z="0.5 m", ex="0.3 m")]
    basis = DesignBasis("EN 1993-1-1", grade="S355", combinations="none")
    sheet = member_sheet(
        catalog_section("IPE 300"), loads, length="0.5 m", Fy="355 MPa", design=basis,
        units="SI",
    )  # fmt: skip
    by_key = {KEYS[c.description]: c.utilization for c in sheet.checks if c.description in KEYS}
    assert by_key["torsion"] == pytest.approx(6e6 / (20.118e4 * TAU_RD_S355 / 10.7), rel=2e-3)
    assert max(value for key, value in by_key.items() if key != "torsion") < 1 < by_key["torsion"]
    assert sheet.governing_check().description == EN_CHECK_TITLES["torsion"]
    html = render_html(sheet)
    start = html.index('<section class="summary">')
    summary = html[start : html.index("</section>", start)]
    assert re.search(r"Torsion \(St Venant\).*?NOT OK", summary, re.S)


def test_rho_of_6_2_8_4_takes_v_pl_t_rd() -> None:
    """EN 1993-1-1 6.2.8(4) (from memory): with torsion, ρ = (2·V_Ed/V_pl,T,Rd − 1)², 0 for
    V_Ed ≤ 0.5·V_pl,T,Rd. IPE 300, S355, V_z,Ed = 250 kN: without torsion 250 ≤ 0.5·526.3 =
    263.2 kN, ρ = 0; with T_Ed = 2 kN·m, V_pl,T,Rd = 448.0 kN (hand calc above), 250 > 224.0,
    ρ = (500/448.0 − 1)² = 0.013 (0.0134 with V_pl,T,Rd unrounded: ρ is sensitive to it)."""
    section = catalog_section("IPE 300")
    base = {"M_y_Ed": 100e3, "V_z_Ed": 250e3}
    sheet, _ = sheet_checks(section, base, material="S355", length="3 m")
    assert float(sheet.value("rho_z").m) == 0.0
    sheet, _ = sheet_checks(section, {**base, "T_Ed": 2e3}, material="S355", length="3 m")
    V_pl_T = float(sheet.value("V_pl_T_z_Rd").to("N").m)
    assert V_pl_T / 1e3 == pytest.approx(448.0, abs=0.1)
    assert float(sheet.value("rho_z").m) == pytest.approx((2 * 250e3 / V_pl_T - 1) ** 2, rel=1e-9)
    assert float(sheet.value("rho_z").m) == pytest.approx(0.0134, abs=1e-4)
