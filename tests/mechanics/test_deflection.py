"""Tip deflection of the cantilever: closed forms, integration of the curvature, superposition."""

from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.calcs.member import member_sheet
from calcsheet.engine import Sheet
from calcsheet.errors import DefinitionError
from calcsheet.mechanics import applied_moment, internal_forces, point_load
from calcsheet.mechanics.deflection import (
    LoadTerms,
    tip_deflection,
    tip_deflection_arrays,
    tip_deflection_numeric,
    write_tip_deflection,
    write_tip_deflection_of,
)
from calcsheet.render.html import render_html
from calcsheet.sections import angle, catalog_section

E = 29000.0  # ksi
W = catalog_section("W10X33")
IX, IY = W.properties["Ix"].to("in**4").m, W.properties["Iy"].to("in**4").m


def integrate_curvature(section, loads, length: float, n: int = 40001) -> tuple[float, float]:
    """Tip (u, v) by integrating the curvature twice with numpy (independent of the module).

    Internal moments from the free body beyond each station, written out here:
    M_x = Σ(e_y·F_z − (z_i − z)·F_y) + ΣC_x, M_y = Σ((z_i − z)·F_x − e_x·F_z) + ΣC_y; curvatures
    v'' = −(M_x·I_y + M_y·I_xy)/(E·D), u'' = (M_y·I_x + M_x·I_xy)/(E·D).
    """
    props = section.numeric("inch")
    stations = [load.z.to("inch").m for load in loads]
    z = np.union1d(np.linspace(0.0, length, n), stations)
    Mx, My = np.zeros_like(z), np.zeros_like(z)
    for load in loads:
        zi = load.z.to("inch").m
        beyond = z <= zi  # the load is on the free part of every cut before it
        if hasattr(load, "Fx"):
            fx, fy, fz = (load.component(a).to("kip").m for a in "xyz")
            ex, ey = load.ex.to("inch").m, load.ey.to("inch").m
            Mx += np.where(beyond, ey * fz - (zi - z) * fy, 0.0)
            My += np.where(beyond, (zi - z) * fx - ex * fz, 0.0)
        else:
            Mx += np.where(beyond, load.Mx.to("kip*inch").m, 0.0)
            My += np.where(beyond, load.My.to("kip*inch").m, 0.0)
    D = props.Ix * props.Iy - props.Ixy**2
    kv = -(Mx * props.Iy + My * props.Ixy) / (E * D)
    ku = (My * props.Ix + Mx * props.Ixy) / (E * D)

    def twice(kappa: np.ndarray) -> float:
        slope = np.concatenate([[0.0], np.cumsum((kappa[1:] + kappa[:-1]) / 2 * np.diff(z))])
        return float(np.sum((slope[1:] + slope[:-1]) / 2 * np.diff(z)))

    return twice(ku), twice(kv)


def test_tip_load_gives_pl3_over_3ei_in_both_planes() -> None:
    # δ = P·L³/(3EI): AISC Steel Construction Manual, 16th ed., Table 3-23, cantilevered
    # beam, concentrated load at free end (from memory).
    L = 96.0
    down = point_load("P", components=("0 kip", "-2 kip", "0 kip"), z=f"{L} in")
    side = point_load("H", components=("1.5 kip", "0 kip", "0 kip"), z=f"{L} in")
    result = tip_deflection(W, [down, side], length=f"{L} in")
    assert result.v.to("inch").m == pytest.approx(-2.0 * L**3 / (3 * E * IX))
    assert result.u.to("inch").m == pytest.approx(1.5 * L**3 / (3 * E * IY))
    assert result.total.m == pytest.approx(np.hypot(result.u.m, result.v.m))


def test_point_load_and_couple_anywhere() -> None:
    # P at a from the support: Δ_max = P·b²(3l − b)/(6EI) with b = a, AISC Steel Construction
    # Manual, 16th ed., Table 3-23, cantilevered beam, concentrated load at any point (from
    # memory). C at a: C·a(2L − a)/(2EI), Roark's Formulas for Stress and Strain, Table 8.1,
    # cantilever with a concentrated intermediate moment (from memory); the end couple
    # (a = L) gives the familiar C·L²/(2EI). C_x > 0 turns the tip toward −y, C_y > 0 toward +x.
    L, a, P, C = 120.0, 45.0, 3.0, 50.0
    load = point_load("P", components=("0 kip", f"{P} kip", "0 kip"), z=f"{a} in")
    result = tip_deflection(W, [load], length=f"{L} in")
    assert result.v.m == pytest.approx(P * a**2 * (3 * L - a) / (6 * E * IX))
    couple = applied_moment("C", z=f"{a} in", Mx=f"{C} kip*in", My=f"{C} kip*in")
    result = tip_deflection(W, [couple], length=f"{L} in")
    assert result.v.m == pytest.approx(-C * a * (2 * L - a) / (2 * E * IX))
    assert result.u.m == pytest.approx(C * a * (2 * L - a) / (2 * E * IY))


def test_eccentric_axial_force_acts_as_a_couple() -> None:
    # F_z at e_y bends like C_x = e_y·F_z from its station to the support.
    L, a = 100.0, 60.0
    pull = point_load("T", components=("0 kip", "0 kip", "4 kip"), z=f"{a} in", ey="-3 in")
    couple = applied_moment("C", z=f"{a} in", Mx="-12 kip*in")
    assert tip_deflection(W, [pull], length=f"{L} in").v.m == pytest.approx(
        tip_deflection(W, [couple], length=f"{L} in").v.m
    )


@pytest.mark.parametrize("section", [W, angle("4 in", "3 in", "0.375 in")], ids=["W", "angle"])
def test_against_integration_of_the_curvature(section) -> None:
    L = 80.0
    loads = [
        point_load(
            "P1", components=("0.4 kip", "-1.2 kip", "2 kip"), z="80 in", ex="1 in", ey="-2 in"
        ),
        point_load("P2", components=("-0.3 kip", "0.5 kip", "0 kip"), z="35 in"),
        applied_moment("C1", z="50 in", Mx="6 kip*in", My="-4 kip*in"),
    ]
    u, v = integrate_curvature(section, loads, L)
    result = tip_deflection(section, loads, length=f"{L} in")
    # Trapezoid rule: the couple's jump in curvature leaves an O(h) error of a few 1e-6.
    assert result.u.m == pytest.approx(u, rel=2e-5)
    assert result.v.m == pytest.approx(v, rel=2e-5)


def test_moments_agree_with_the_statics_module() -> None:
    # The curvature sign rule uses calcsheet's internal-force signs; check the moments the
    # test integrates against internal_forces at a station.
    loads = [
        point_load(
            "P1", components=("0.4 kip", "-1.2 kip", "2 kip"), z="80 in", ex="1 in", ey="-2 in"
        ),
        applied_moment("C1", z="50 in", Mx="6 kip*in", My="-4 kip*in"),
    ]
    forces = internal_forces("80 in", loads, station="20 in")
    assert forces.Mx.to("kip*inch").m == pytest.approx(-2 * 2 - 60 * -1.2 + 6)
    assert forces.My.to("kip*inch").m == pytest.approx(60 * 0.4 - 1 * 2 - 4)


finite = st.floats(-10, 10, allow_nan=False)


@settings(max_examples=60, deadline=None)
@given(
    forces=st.lists(st.tuples(finite, finite, finite), min_size=2, max_size=5),
    stations=st.lists(st.floats(0, 100), min_size=5, max_size=5),
    scale=st.floats(-3, 3),
)
def test_superposition_and_linearity(forces, stations, scale) -> None:
    props = angle("4 in", "3 in", "0.375 in").numeric("inch")
    n = len(forces)
    F = np.array(forces)
    positions = np.column_stack([np.linspace(-1, 1, n), np.linspace(2, -2, n), stations[:n]])
    no_couples = (np.zeros((0, 3)), np.zeros(0))
    kwargs = dict(length=100.0, E=E, Ix=props.Ix, Iy=props.Iy, Ixy=props.Ixy)
    together = tip_deflection_numeric(F, positions, *no_couples, **kwargs)
    one_by_one = sum(
        tip_deflection_numeric(F[i : i + 1], positions[i : i + 1], *no_couples, **kwargs)
        for i in range(n)
    )
    assert np.allclose(together, one_by_one, atol=1e-9)
    scaled = tip_deflection_numeric(scale * F, positions, *no_couples, **kwargs)
    assert np.allclose(scaled, scale * together, atol=1e-9)
    # Vectorised over cases: a stack of two load sets gives both answers at once.
    stack = tip_deflection_numeric(np.stack([F, 2 * F]), positions, *no_couples, **kwargs)
    assert np.allclose(stack, [together, 2 * together], atol=1e-9)


def test_the_sheet_prints_the_same_values_and_checks_l_over_n() -> None:
    L = "96 in"
    loads = [
        point_load("P", components=("0.5 kip", "-2 kip", "1 kip"), z="96 in", ey="-4 in"),
        applied_moment("C", z="40 in", My="10 kip*in"),
    ]
    sheet = Sheet("deflection")
    check = write_tip_deflection(sheet, W, loads, length=L)
    expected = tip_deflection(W, loads, length=L)
    assert sheet.value("v_tip").to("inch").m == pytest.approx(expected.v.m)
    assert sheet.value("u_tip").to("inch").m == pytest.approx(expected.u.m)
    assert sheet.value("delta_lim").to("inch").m == pytest.approx(96 / 180)  # L/180 default
    assert check.utilization == pytest.approx(expected.total.m / (96 / 180))
    assert sheet["delta_lim"].reference == "deflection limit as specified for this member"
    sheet.set_input("n_lim", 360)
    assert check.utilization == pytest.approx(expected.total.m / (96 / 360))
    sheet.set_input("F_y_d1", "-4 kip")  # the printed formula follows the input
    doubled = tip_deflection(
        W,
        [
            point_load("P", components=("0.5 kip", "-4 kip", "1 kip"), z="96 in", ey="-4 in"),
            loads[1],
        ],
        length=L,
    )
    assert sheet.value("v_tip").to("inch").m == pytest.approx(doubled.v.m)


def test_unsymmetric_section_on_the_sheet() -> None:
    section = angle("4 in", "3 in", "0.375 in")
    loads = [point_load("P", components=("0 kip", "-0.5 kip", "0 kip"), z="48 in")]
    sheet = Sheet("angle")
    write_tip_deflection(sheet, section, loads, length="48 in", n=240)
    expected = tip_deflection(section, loads, length="48 in")
    assert sheet.value("u_tip").to("inch").m == pytest.approx(expected.u.m)
    assert sheet.value("v_tip").to("inch").m == pytest.approx(expected.v.m)
    assert expected.u.m != 0.0  # a vertical load on an angle moves the tip sideways too


def test_on_the_member_sheet_the_section_inputs_are_reused() -> None:
    loads = [point_load("P1", components=("0 kip", "-3 kip", "0 kip"), z="60 in")]
    sheet = member_sheet(W, loads, length="60 in")
    check = write_tip_deflection(sheet, W, loads, length="60 in")
    assert check.utilization == pytest.approx(3 * 60**3 / (3 * E * IX) / (60 / 180))


def test_no_bending_no_check() -> None:
    loads = [point_load("N", components=("0 kip", "0 kip", "5 kip"), z="60 in")]
    assert write_tip_deflection(Sheet("axial"), W, loads, length="60 in") is None


def test_end_couple_gives_cl2_over_2ei() -> None:
    # C at the free end: δ = C·L²/(2EI), Roark's Formulas for Stress and Strain, Table 8.1,
    # cantilever with an end moment (from memory).
    L, C = 90.0, 24.0
    couple = applied_moment("C", z=f"{L} in", My=f"{C} kip*in")
    assert tip_deflection(W, [couple], length=f"{L} in").u.m == pytest.approx(
        C * L**2 / (2 * E * IY)
    )


def test_general_form_with_zero_product_of_area_equals_the_symmetric_form() -> None:
    """The array writer uses the unsymmetric formulas as soon as one section of a batch has
    I_xy != 0; for the symmetric sections they must give the symmetric numbers."""
    rng = np.random.default_rng(12)
    m = 50
    loads = [
        LoadTerms("P", rng.uniform(0, 100, m), F_x=rng.normal(size=m), F_y=rng.normal(size=m),
                  F_z=rng.normal(size=m), e_x=rng.normal(size=m), e_y=rng.normal(size=m)),
        LoadTerms("C", rng.uniform(0, 100, m), C_x=rng.normal(size=m), C_y=rng.normal(size=m)),
    ]  # fmt: skip
    angle_props = angle("4 in", "3 in", "0.375 in").numeric("inch")
    Ix = np.array([[IX], [angle_props.Ix]])
    Iy = np.array([[IY], [angle_props.Iy]])
    Ixy = np.array([[0.0], [angle_props.Ixy]])
    both = tip_deflection_arrays(loads, length=100.0, E=E, Ix=Ix, Iy=Iy, Ixy=Ixy, n=180)
    alone = tip_deflection_arrays(loads, length=100.0, E=E, Ix=IX, Iy=IY, Ixy=0.0, n=180)
    assert both.u.shape == (2, m)
    for name in ("u", "v", "total", "utilization"):
        np.testing.assert_allclose(getattr(both, name)[0], getattr(alone, name), rtol=1e-12)
    # Symmetric forms, written out (module docstring): v = Φ_v/(E·I_x), u = Φ_u/(E·I_y).
    P, C = loads
    phi_v = P.F_y * P.a**2 * (3 * 100 - P.a) / 6 - P.F_z * P.e_y * P.a * (200 - P.a) / 2
    phi_v -= C.C_x * C.a * (200 - C.a) / 2
    np.testing.assert_allclose(alone.v, phi_v / (E * IX), rtol=1e-12)


def test_sections_by_cases_broadcast() -> None:
    """k sections (shape (k, 1)) by m load cases (shape (m,)) give (k, m) arrays, each
    element the single evaluation."""
    sections = [W, catalog_section("W8X31"), angle("4 in", "3 in", "0.375 in"),
                angle("6 in", "6 in", "0.5 in")]  # fmt: skip
    props = [s.numeric("inch") for s in sections]
    Ix, Iy, Ixy = (np.array([[getattr(p, k)] for p in props]) for k in ("Ix", "Iy", "Ixy"))
    forces = np.array([[[0.5, -2.0, 1.0]], [[0.0, 3.0, -4.0]], [[1.0, 0.0, 0.0]]])  # (3, 1, 3)
    positions = np.array([[1.0, -2.0, 70.0]])
    couples = np.array([[[2.0, -1.0, 0.0]], [[0.0, 0.0, 5.0]], [[-3.0, 4.0, 0.0]]])
    stations = np.array([40.0])
    kwargs = dict(length=96.0, E=E)
    together = tip_deflection_numeric(
        forces, positions, couples, stations, Ix=Ix, Iy=Iy, Ixy=Ixy, **kwargs
    )
    assert together.shape == (4, 3, 2)
    for i, p in enumerate(props):
        for j in range(3):
            one = tip_deflection_numeric(
                forces[j], positions, couples[j], stations, Ix=p.Ix, Iy=p.Iy, Ixy=p.Ixy, **kwargs
            )
            np.testing.assert_allclose(together[i, j], one, rtol=1e-12, atol=1e-15)


def test_a_sheet_passes_its_own_load_symbols_and_they_stay_live() -> None:
    """write_tip_deflection_of: no copies of the loads, so set_input moves the tip."""
    sheet = Sheet("own loads")
    with sheet:
        F = sheet.input("F_1", "-2 kip", "Load along y")
        z = sheet.input("z_1", "70 in", "Position", dimension="length")
        C = sheet.input("C_2", "12 kip*in", "Couple about y")
        z2 = sheet.input("z_2", "40 in", "Position", dimension="length")
        check = write_tip_deflection_of(
            sheet, W, [LoadTerms("P", z, F_y=F), LoadTerms("C", z2, C_y=C)], length="96 in"
        )
    names = {part.name for part in sheet.inputs}
    assert not any(name.endswith(("_d1", "_d2")) for name in names)

    def expected(force: str) -> float:
        loads = [
            point_load("P", components=("0 kip", force, "0 kip"), z="70 in"),
            applied_moment("C", z="40 in", My="12 kip*in"),
        ]
        return tip_deflection(W, loads, length="96 in").total.m / (96 / 180)

    assert check.utilization == pytest.approx(expected("-2 kip"), rel=1e-12)
    sheet.set_input("F_1", "-5 kip")
    assert check.utilization == pytest.approx(expected("-5 kip"), rel=1e-12)


def test_sheet_symbols_are_required_by_write_tip_deflection_of() -> None:
    with pytest.raises(DefinitionError, match="a of P must be a symbol of the sheet"):
        write_tip_deflection_of(Sheet("x"), W, [LoadTerms("P", 10.0, F_y=1.0)], length="96 in")


@pytest.mark.parametrize("section", [W, angle("4 in", "3 in", "0.375 in")], ids=["W", "angle"])
def test_the_sheet_cites_published_sources_only(section) -> None:
    """A sheet never says "from memory" or "common practice" (project rule)."""
    loads = [
        point_load("P", components=("0.5 kip", "-2 kip", "1 kip"), z="96 in", ey="-4 in"),
        applied_moment("C", z="40 in", My="10 kip*in"),
    ]
    sheet = Sheet("deflection")
    write_tip_deflection(sheet, section, loads, length="96 in")
    words = render_html(sheet).lower()
    assert "table 3-23" in words
    assert "memory" not in words and "common practice" not in words
