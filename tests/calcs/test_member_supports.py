"""The member sheet of a member on supports: reactions, statics beyond the cut, the
critical station, the deflection along the member, and bad input.

Closed forms from the AISC Steel Construction Manual, 16th ed., Table 3-23 (its case
numbers from memory). Scenarios (our own): a 20 ft W14x90 floor beam simply supported
with a uniform load and with an off-centre point load; a 12 ft W12x26 hanger beam on
pins carrying an inclined pull on a lug below its bottom flange; a 14 ft W10x49 column
fixed at its base with its self-weight along −z and an eccentric bracket load near the
top.
"""

from __future__ import annotations

import dataclasses
import re

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.design import DesignBasis
from calcsheet.calcs.member_analysis import (
    SIDES,
    force_diagrams,
    section_weight,
    solve_member,
)
from calcsheet.engine import Heading
from calcsheet.errors import InputError
from calcsheet.mechanics import distributed_load, point_load, support
from calcsheet.mechanics.distributed import DistributedLoad
from calcsheet.mechanics.supports import support_case
from calcsheet.sections import catalog_section, plate
from calcsheet.units import Quantity

W14 = catalog_section("W14X90")
UNIFORM = distributed_load(
    "floor", z_start="0 ft", z_end="20 ft", q_start=("0 kip/ft", "-2 kip/ft", "0 kip/ft")
)


def _value(sheet, name: str, unit: str) -> float:
    return float(sheet.value(name).to(unit).m)


def test_simply_supported_uniform_load_matches_the_closed_form() -> None:
    sheet = member_sheet(W14, [], length="20 ft", supports="pinned-pinned", distributed=[UNIFORM])
    # AISC Manual (16th ed.) Table 3-23 Case 1, simple beam, uniformly distributed load:
    # R = wL/2 = 20 kip, M_max = wL²/8 = 100 kip·ft at the centre.
    assert _value(sheet, "R_yS1", "kip") == pytest.approx(20.0, rel=1e-3)
    assert _value(sheet, "R_yS2", "kip") == pytest.approx(20.0, rel=1e-3)
    assert _value(sheet, "z_s", "ft") == pytest.approx(10.0, rel=1e-3)
    # Sagging: the bottom fibres in tension, M_x negative by the sheet's convention.
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(-100.0, rel=1e-3)
    assert abs(_value(sheet, "V_y", "kip")) < 1e-6
    # Equilibrium of the whole member closes (statics).
    assert abs(_value(sheet, "Sigma_Fy", "kip")) < 1e-9
    assert abs(_value(sheet, "Sigma_Mx", "kip*ft")) < 1e-9


def test_simply_supported_off_centre_point_load_matches_the_closed_form() -> None:
    load = point_load("P", components=("0 kip", "-10 kip", "0 kip"), z="5 ft")
    sheet = member_sheet(W14, [load], length="20 ft", supports="pinned-pinned")
    # AISC Manual (16th ed.) Table 3-23 Case 8, simple beam, concentrated load at any
    # point: R1 = Pb/L = 7.5 kip, R2 = Pa/L = 2.5 kip, M_max = Pab/L = 37.5 kip·ft at the load.
    assert _value(sheet, "R_yS1", "kip") == pytest.approx(7.5, rel=1e-3)
    assert _value(sheet, "R_yS2", "kip") == pytest.approx(2.5, rel=1e-3)
    assert _value(sheet, "z_s", "ft") == pytest.approx(5.0, rel=1e-3)
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(-37.5, rel=1e-3)


def test_a_user_station_is_kept_and_the_cut_carries_the_reaction_beyond_it() -> None:
    load = point_load("P", components=("0 kip", "-10 kip", "0 kip"), z="5 ft")
    sheet = member_sheet(W14, [load], length="20 ft", supports="pinned-pinned", station="15 ft")
    # Statics (AISC Manual Table 3-23 Case 8): beyond the load M = R2·(L − z) = 2.5·5.
    assert _value(sheet, "z_s", "ft") == pytest.approx(15.0)
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(-12.5, rel=1e-6)
    assert _value(sheet, "V_y", "kip") == pytest.approx(2.5, rel=1e-6)


def test_hanger_beam_with_an_inclined_pull_on_a_lug_builds() -> None:
    section = catalog_section("W12X26")
    depth = float(section.tabulated["d"].to("in").m)
    pull = point_load(
        "hoist", magnitude="8 kip", angle="25 deg", from_axis="-y", toward_axis="+x",
        z="4 ft", ey=f"{-(depth / 2 + 3.0)} in",
    )  # fmt: skip
    sheet = member_sheet(
        section, [pull], length="12 ft", supports="pinned-pinned",
        design=DesignBasis(kind="AISC 360-22", deflection_ratio=360), load_types=["L"],
    )  # fmt: skip
    # Statics: the reactions balance the factored pull (1.6L in ASCE 7-22 2.3.1 (2)).
    total_y = _value(sheet, "R_yS1", "kip") + _value(sheet, "R_yS2", "kip")
    assert total_y == pytest.approx(1.6 * 8 * np.cos(np.radians(25)), rel=1e-9)
    for name in ("Sigma_Fx", "Sigma_Fy", "Sigma_Mx", "Sigma_My", "Sigma_Mz"):
        assert abs(float(sheet.value(name).m)) < 1e-9
    assert sheet.governing_check() is not None
    assert any(check.description == "Deflection along the member" for check in sheet.checks)


@pytest.mark.parametrize("case", ["fixed-free", "pinned-pinned"])
def test_column_with_self_weight_and_an_eccentric_bracket_builds(case) -> None:
    section = catalog_section("W10X49")
    bracket = point_load("bracket", components=("0 kip", "0 kip", "-30 kip"), z="13 ft", ey="8 in")
    sheet = member_sheet(
        section, [bracket], length="14 ft", supports=case, self_weight=True, gravity="-z",
        station="0 ft",
    )  # fmt: skip
    # AISC Manual Table 1-1: W10x49 weighs 49 lb/ft (nominal), so the base carries
    # N = −(30 + 0.049·14) kip (statics).
    assert _value(sheet, "w_sw", "lbf/ft") == pytest.approx(49.0)
    assert _value(sheet, "N", "kip") == pytest.approx(-(30 + 0.049 * 14), rel=1e-9)
    if case == "fixed-free":
        # Statics of the free part: M_x = e_y·F_z = 8 in · (−30 kip).
        assert _value(sheet, "M_x", "kip*in") == pytest.approx(-240.0, rel=1e-9)
    else:
        # A pin-ended column with a couple P·e at the bracket: end shears P·e/L (statics).
        assert abs(_value(sheet, "R_yS1", "kip")) == pytest.approx(240.0 / 168.0, rel=1e-6)
        assert _value(sheet, "R_yS1", "kip") == pytest.approx(-_value(sheet, "R_yS2", "kip"))


OVERHANG_LOADS = [
    point_load("P", magnitude="6 kip", angle="20 deg", from_axis="-y", toward_axis="+x",
               z="22 ft", ey="-9 in"),
    point_load("Q", components=("0 kip", "-4 kip", "0 kip"), z="7 ft"),
]  # fmt: skip
OVERHANG_SPREAD = [
    distributed_load("w", z_start="2 ft", z_end="18 ft",
                     q_start=("0 kip/ft", "-0.5 kip/ft", "0 kip/ft"),
                     q_end=("0 kip/ft", "-1.5 kip/ft", "0 kip/ft")),
]  # fmt: skip


@pytest.mark.parametrize("kind", ["allowable stress", "AISC 360-22"])
def test_the_governing_station_matches_a_scan_of_a_thousand_stations(kind) -> None:
    basis = DesignBasis(kind=kind)
    types = ["L", "D"]
    spread_types = ["L"]
    sheet = member_sheet(
        W14, OVERHANG_LOADS, length="24 ft", supports="overhang",
        support_positions=["0 ft", "18 ft"], distributed=OVERHANG_SPREAD,
        distributed_types=spread_types, load_types=types, design=basis, self_weight=True,
        station="auto",
    )  # fmt: skip
    sheet_worst = max(check.worst_utilization for check in sheet.checks)
    # The brute force: the same solution at 1,000 stations (both sides of each) under every
    # combination, each check by the standard's numeric evaluator.
    from calcsheet.calcs.member_analysis import member_self_weight

    length = Quantity(24, "ft")
    held = support_case("overhang", length, positions=["0 ft", "18 ft"])
    own, _ = member_self_weight(W14, length, "-y")
    analysis = solve_member(
        W14, length, held, "overhang", [*OVERHANG_LOADS, *OVERHANG_SPREAD, own],
        [*types, *spread_types, "D"], basis,
    )  # fmt: skip
    if kind == "AISC 360-22":
        # The sheet's own Lb and Cb (from the supports and the moment diagrams).
        from calcsheet.calcs.member_analysis import bracing_defaults

        found = bracing_defaults(analysis, length, [])
        basis = dataclasses.replace(basis, Lb=found.Lb, Cb=found.Cb, cantilever=False)
    brute = _scanned_worst(W14, analysis, basis, length)
    assert sheet_worst == pytest.approx(brute, rel=5e-3)
    assert sheet_worst >= brute * (1 - 1e-9)


def test_every_check_names_its_own_station() -> None:
    sheet = member_sheet(
        W14, OVERHANG_LOADS, length="24 ft", supports="overhang",
        support_positions=["0 ft", "18 ft"], distributed=OVERHANG_SPREAD,
        design=DesignBasis(kind="AISC 360-22"), load_types=["L", "D"],
    )  # fmt: skip
    stations = {check.description: check.cases.station for check in sheet.checks if check.cases}
    # Every check carries the station of its worst case; shear peaks at a support (the
    # right side of S1 or either side of S2) and flexure about x inside the span
    # or over S2 (statics of an overhanging beam under downward loads, from memory).
    assert all(station is not None for station in stations.values())
    supports_ft = {0.0, 18.0}
    assert round(float(stations["Shear along y"].to("ft").m), 6) in supports_ft
    headings = [part.text for part in sheet.parts if isinstance(part, Heading)]
    assert "Critical station of every check" in headings


def test_deflection_along_a_simple_span_matches_the_closed_form() -> None:
    sheet = member_sheet(
        W14, [], length="20 ft", supports="pinned-pinned", distributed=[UNIFORM],
        design=DesignBasis(deflection_ratio=360),
    )  # fmt: skip
    # AISC Manual (16th ed.) Table 3-23 Case 1: Δmax = 5wL⁴/(384EI) at the centre,
    # E = 29,000 ksi, I_x = 999 in⁴ (AISC Manual Table 1-1, W14x90).
    w, L, E, I = 2.0 / 12, 240.0, 29000.0, 999.0
    assert _value(sheet, "delta_max", "in") == pytest.approx(5 * w * L**4 / (384 * E * I), rel=1e-3)
    assert _value(sheet, "L_d", "in") == pytest.approx(240.0)


def test_the_cantilever_with_point_loads_keeps_its_closed_form_tip_deflection() -> None:
    load = point_load("P", components=("0 kip", "-2 kip", "0 kip"), z="60 in")
    sheet = member_sheet(W14, [load], length="60 in", design=DesignBasis(deflection_ratio=180))
    assert any(check.description == "Tip deflection" for check in sheet.checks)
    assert "R_yS1" not in {part.name for part in sheet.inputs}


def test_self_weight_of_a_built_section_is_area_times_unit_weight() -> None:
    section = plate("4 in", "6 in")
    # EN 1991-1-1 Annex A Table A.4: steel 78.5 kN/m³ (upper value); A = 24 in².
    expected = Quantity(24, "in**2") * Quantity(78.5, "kN/m**3")
    assert section_weight(section).weight.to("N/m").m == pytest.approx(expected.to("N/m").m)
    sheet = member_sheet(section, [], length="10 ft", supports="pinned-pinned", self_weight=True)
    assert _value(sheet, "w_sw", "N/m") == pytest.approx(expected.to("N/m").m)


def test_changing_a_support_position_or_a_distributed_load_rebuilds() -> None:
    sheet = member_sheet(W14, [], length="20 ft", supports="pinned-pinned", distributed=[UNIFORM])
    sheet.set_input("q_ya1", "-4 kip/ft")
    # AISC Manual Table 3-23 Case 1: R = wL/2.
    assert _value(sheet, "R_yS1", "kip") == pytest.approx(40.0, rel=1e-6)
    sheet.set_input("z_S2", "16 ft")
    assert _value(sheet, "z_S2", "ft") == pytest.approx(16.0)
    with pytest.raises(InputError, match="R_yS1"):
        sheet.set_input("R_yS1", "3 kip")


def test_force_diagrams_give_stations_and_envelopes() -> None:
    length = Quantity(20, "ft")
    analysis = solve_member(
        W14, length, support_case("pinned-pinned", length), "pinned-pinned", [UNIFORM], ["D"],
        DesignBasis(kind="AISC 360-22"),
    )  # fmt: skip
    diagrams = force_diagrams(analysis)
    assert diagrams.stations.shape[0] == diagrams.governing.shape[0]
    # AISC Manual Table 3-23 Case 1, 1.4D (ASCE 7-22 2.3.1 (1)): M = 1.4·wL²/8.
    peak = np.max(np.abs(diagrams.high[:, 4])) if np.any(diagrams.high[:, 4]) else 0
    deepest = max(peak, np.max(np.abs(diagrams.low[:, 4])))
    expected = Quantity(1.4 * 100, "kip*ft").to("N*m").m
    assert deepest == pytest.approx(expected, rel=1e-3)
    assert set(SIDES) == {"station", "right"}


def _zero_length_load() -> DistributedLoad:
    q = tuple(Quantity(value, "kip/ft") for value in (0.0, -1.0, 0.0))
    at = Quantity(5.0, "ft")
    zero = Quantity(0.0, "in")
    return DistributedLoad("flat", at, at, q, q, zero, zero)  # type: ignore[arg-type]


@pytest.mark.parametrize(
    ("kwargs", "field"),
    [
        ({"supports": [support("S1", z="0 ft", restrains=["uy", "uz", "rz"])]}, "supports"),
        ({"supports": "pinned-pinned", "support_positions": ["0 ft", "25 ft"]},
         "support positions[1]"),
        ({"supports": [support("A", z="0 ft", restrains=["ux", "uy", "uz", "rz"]),
                       support("B", z="30 ft", restrains=["ux", "uy", "rz"])]}, "support B z"),
        ({"supports": "pinned-both-ends"}, "supports"),
        ({"supports": "pinned-pinned", "distributed": [_zero_length_load()]},
         "distributed load flat z_end"),
        ({"supports": "pinned-pinned", "distributed": [distributed_load(
            "long", z_start="10 ft", z_end="25 ft",
            q_start=("0 kip/ft", "-1 kip/ft", "0 kip/ft"))]}, "distributed load long z_end"),
        ({"supports": "pinned-pinned", "braces": ["5 ft", "21 ft"]}, "braces[1]"),
        ({"supports": "pinned-pinned", "gravity": "down"}, "gravity"),
        ({"supports": 123}, "supports"),
        ({"supports": "pinned-pinned", "braces": "5 ft"}, "braces"),
        ({"supports": "pinned-pinned", "distributed": None}, "distributed"),
        ({"supports": "pinned-pinned", "distributed": [UNIFORM], "distributed_types": []},
         "distributed types"),
    ],
)  # fmt: skip
def test_bad_input_names_the_field(kwargs, field) -> None:
    load = point_load("P", components=("0 kip", "-10 kip", "0 kip"), z="5 ft")
    with pytest.raises(InputError) as caught:
        member_sheet(W14, [load], length="20 ft", **kwargs)
    assert caught.value.field == field


def test_fixed_fixed_uniform_load_matches_the_closed_form() -> None:
    sheet = member_sheet(W14, [], length="20 ft", supports="fixed-fixed", distributed=[UNIFORM])
    # AISC Manual (16th ed.) Table 3-23 Case 15, beam fixed at both ends, uniformly
    # distributed load: M at the supports wL²/12 = 66.7 kip·ft, at the centre wL²/24.
    # Hogging at the ends: the internal M_x there is positive (top in tension), so the
    # couple the support applies to the member at z = 0 is its negative (statics).
    assert _value(sheet, "M_xS1", "kip*ft") == pytest.approx(-2 * 400 / 12, rel=1e-3)
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(2 * 400 / 12, rel=1e-3)
    assert _value(sheet, "z_s", "ft") in (pytest.approx(0.0, abs=1e-9), pytest.approx(20.0))
    sheet = member_sheet(
        W14, [], length="20 ft", supports="fixed-fixed", distributed=[UNIFORM], station="10 ft"
    )
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(-2 * 400 / 24, rel=1e-3)


def test_a_cantilever_fixed_at_its_far_end_carries_the_reaction_beyond_the_cut() -> None:
    load = point_load("P", components=("0 kip", "-3 kip", "0 kip"), z="0 ft")
    sheet = member_sheet(
        W14, [load], length="8 ft", supports="fixed-free", support_positions=["8 ft"],
        station="4 ft",
    )  # fmt: skip
    # Statics of the part beyond the cut (the fixed end's reactions): M = −P·a = 3·4 kip·ft
    # at mid-length of a cantilever loaded at its tip (AISC Manual Table 3-23 Case 22).
    assert _value(sheet, "R_yS1", "kip") == pytest.approx(3.0)
    assert _value(sheet, "M_x", "kip*ft") == pytest.approx(12.0, rel=1e-9)


def test_auto_station_on_a_cantilever_with_point_loads_finds_the_support() -> None:
    load = point_load("P", components=("0 kip", "-3 kip", "0 kip"), z="60 in")
    sheet = member_sheet(W14, [load], length="60 in", station="auto")
    # Statics of a tip-loaded cantilever (AISC Manual Table 3-23 Case 22): M_max = P·L at
    # the support.
    assert _value(sheet, "z_s", "in") == pytest.approx(0.0, abs=1e-9)
    assert _value(sheet, "M_x", "kip*in") == pytest.approx(180.0)


def test_cantilever_under_its_self_weight_deflects_as_the_closed_form() -> None:
    sheet = member_sheet(
        W14, [], length="10 ft", self_weight=True, design=DesignBasis(deflection_ratio=180)
    )
    # AISC Manual (16th ed.) Table 3-23, cantilever with a uniformly distributed load
    # (case number from memory): Δmax = wL⁴/(8EI) at the free end, M = wL²/2 at the support;
    # w = 90 lb/ft (AISC Manual Table 1-1, W14x90), I_x = 999 in⁴, E = 29,000 ksi.
    w, L, E, I = 0.090 / 12, 120.0, 29000.0, 999.0
    assert _value(sheet, "delta_max", "in") == pytest.approx(w * L**4 / (8 * E * I), rel=1e-3)
    assert _value(sheet, "M_x", "kip*in") == pytest.approx(w * L**2 / 2, rel=1e-9)
    assert "R_yS1" not in {part.name for part in sheet.inputs}


def test_a_named_support_case_takes_its_own_effective_length_factor() -> None:
    load = point_load("P", components=("0 kip", "0 kip", "-50 kip"), z="14 ft")
    for case, K in (("pinned-pinned", 1.0), ("fixed-fixed", 0.65), ("fixed-free", 2.1)):
        sheet = member_sheet(
            catalog_section("W10X49"), [load], length="14 ft", supports=case, station="0 ft",
            design=DesignBasis(kind="AISC 360-22"),
        )  # fmt: skip
        # AISC 360-22 Commentary Table C-A-7.1, recommended design values (from memory).
        assert float(sheet.value("K").m) == pytest.approx(K)


def test_en_1990_takes_the_self_weight_and_distributed_loads_as_permanent_g() -> None:
    load = point_load("P", components=("0 kN", "-20 kN", "0 kN"), z="2 m")
    floor = distributed_load(
        "floor", z_start="0 m", z_end="6 m", q_start=("0 kN/m", "-4 kN/m", "0 kN/m")
    )
    sheet = member_sheet(
        catalog_section("IPE 300"), [load], length="6 m", supports="two-span",
        load_types=["Q"], distributed=[floor], self_weight=True, units="SI", Fy="355 MPa",
        design=DesignBasis(kind="EN 1993-1-1"),
    )  # fmt: skip
    # EN 1990 names permanent actions G (Eq. 6.10): both loads enter with γ_G.
    assert "gamma_G" in {part.name for part in sheet.inputs}
    # EN 10365:2017 nominal mass of an IPE 300: 42.2 kg/m (the catalog's), times g_n.
    assert _value(sheet, "w_sw", "N/m") == pytest.approx(42.2 * 9.80665, rel=1e-9)


def test_the_member_drawing_shows_supports_distributed_loads_and_braces() -> None:
    from calcsheet.figures import member_figure

    held = support_case("overhang", "24 ft", positions=["0 ft", "18 ft"])
    svg = member_figure(
        "24 ft", "6 ft", OVERHANG_LOADS, section=W14, unit="ft", supports=held,
        distributed=OVERHANG_SPREAD, braces=[Quantity(9, "ft")],
    )  # fmt: skip
    # Our own symbols (common practice, no source): a label per support, the load's name
    # with its values at both ends, a cross per brace point with the note that says so.
    assert svg.count('class="support-label"') == 2
    words = re.sub(r"<[^>]+>", "", svg)  # q with subscript y is drawn in <tspan>s
    assert "w: qy = −0.500 kip/ft to −1.500 kip/ft" in words
    assert svg.count('class="brace"') == 3
    assert "brace point (lateral restraint)" in svg


def test_a_couple_inside_the_span_is_checked_just_beyond_it() -> None:
    from calcsheet.mechanics import applied_moment

    couple = applied_moment("C", z="5 ft", Mx="40 kip*ft")
    sheet = member_sheet(W14, [couple], length="20 ft", supports="pinned-pinned")
    # Statics of a simple beam with a couple C at a = 5 ft: the reactions are ±C/L, the
    # moment jumps by C at the couple, from C·a/L = 10 to C·(L − a)/L = 30 kip·ft (from
    # memory, statics). The larger value is just beyond the couple: the cut there leaves
    # the couple on the part behind it.
    assert _value(sheet, "z_s", "ft") == pytest.approx(5.0)
    assert abs(_value(sheet, "M_x", "kip*ft")) == pytest.approx(30.0, rel=1e-9)
    assert "excluded" in sheet["z_1"].description  # the couple: behind the cut


def test_the_sheets_forces_are_the_frame_solutions_at_the_station() -> None:
    basis = DesignBasis(kind="AISC 360-22")
    sheet = member_sheet(
        W14, OVERHANG_LOADS, length="24 ft", supports="overhang",
        support_positions=["0 ft", "18 ft"], distributed=OVERHANG_SPREAD,
        load_types=["L", "D"], design=basis, self_weight=True,
    )  # fmt: skip
    from calcsheet.calcs.member_analysis import member_self_weight

    length = Quantity(24, "ft")
    held = support_case("overhang", length, positions=["0 ft", "18 ft"])
    own, _ = member_self_weight(W14, length, "-y")
    analysis = solve_member(
        W14, length, held, "overhang", [*OVERHANG_LOADS, *OVERHANG_SPREAD, own],
        ["L", "D", "D", "D"], basis,
    )  # fmt: skip
    station = float(sheet.value("z_s").to("m").m)
    units = ("N", "N", "N", "N*m", "N*m", "N*m")
    written = np.array(
        [
            float(sheet.value(name).to(unit).m)
            for name, unit in zip(("N", "V_x", "V_y", "T", "M_x", "M_y"), units, strict=True)
        ]
    )
    # The statics written on the sheet against the solver's own (the same member), for
    # some combination and side: they agree to round-off.
    rows = np.concatenate(
        [analysis.result.internal_forces([station], analysis.factors, side=side)[:, 0, :]
         for side in ("station", "right")]
    )  # fmt: skip
    scale = np.max(np.abs(rows), axis=0) + 1.0
    assert np.min(np.max(np.abs(rows - written) / scale, axis=1)) < 1e-9


@pytest.mark.parametrize("seed", [3, 11, 29])
def test_random_members_on_supports_never_report_less_than_a_station_scan(seed) -> None:
    """Brute force: random supports, point loads at any angle and offset, a partial
    trapezoidal load and self-weight (invented numbers); the sheet's worst utilization
    is never below the same checks at 1,000 stations on both sides of every load."""
    import random

    from calcsheet.calcs.member_analysis import (
        bracing_defaults,
        member_self_weight,
        recommended_K,
    )

    rng = random.Random(seed)
    section = catalog_section(rng.choice(["W10X33", "HSS8X4X1/4", "W8X31"]))
    case = rng.choice(["pinned-pinned", "fixed-pinned", "fixed-fixed", "two-span"])
    kind = rng.choice(["allowable stress", "AISC 360-22"])
    loads = [
        point_load(
            f"P{i}", magnitude=f"{rng.uniform(1, 15):.2f} kip",
            angle=f"{rng.uniform(-180, 180):.1f} deg", from_axis="+z",
            toward_axis=rng.choice(["-y", "+x"]), z=f"{rng.uniform(0.5, 19.5):.2f} ft",
            ey=f"{rng.uniform(-6, 6):.2f} in", ex=f"{rng.uniform(-3, 3):.2f} in",
        )
        for i in range(2)
    ]  # fmt: skip
    types = [rng.choice(["D", "L", "W"]) for _ in loads]
    start = rng.uniform(0, 10)
    spread = [
        distributed_load(
            "w", z_start=f"{start:.2f} ft", z_end=f"{rng.uniform(start + 1, 20):.2f} ft",
            q_start=("0 kip/ft", f"{-rng.uniform(0, 1):.3f} kip/ft", "0 kip/ft"),
            q_end=(f"{rng.uniform(-0.3, 0.3):.3f} kip/ft", f"{-rng.uniform(0, 1):.3f} kip/ft",
                   "0 kip/ft"),
        )
    ]  # fmt: skip
    basis = DesignBasis(kind=kind)
    sheet = member_sheet(
        section, loads, length="20 ft", supports=case, distributed=spread,
        distributed_types=["L"], load_types=types, design=basis, self_weight=True,
    )  # fmt: skip
    strength = [c for c in sheet.checks if c.description != "Deflection along the member"]
    sheet_worst = max(check.worst_utilization for check in strength)
    length = Quantity(20, "ft")
    held = support_case(case, length)
    own, _ = member_self_weight(section, length, "-y")
    analysis = solve_member(
        section, length, held, case, [*loads, *spread, own], [*types, "L", "D"], basis
    )
    if kind == "AISC 360-22":  # the sheet's own K, Lb and Cb
        found = bracing_defaults(analysis, length, [])
        basis = dataclasses.replace(
            basis, K=recommended_K(case, kind), Lb=found.Lb, Cb=found.Cb, cantilever=False
        )
    brute = _scanned_worst(section, analysis, basis, length)
    assert sheet_worst >= brute * (1 - 1e-6)


def _scanned_worst(section, analysis, basis, length) -> float:
    """The brute force: the worst utilization of every check at 1,000 stations, both
    sides of each, under every combination (F_y = 50 ksi, the sheets' default)."""
    from calcsheet.calcs.design import utilizations

    stations = np.linspace(0.0, float(length.to("m").m), 1000)
    worst = 0.0
    for side in ("left", "right"):
        forces = analysis.result.internal_forces(stations, analysis.factors, side=side)
        values, _, _ = utilizations(
            section, forces.reshape(-1, 6), basis, Quantity(50, "ksi"), length
        )
        worst = max(worst, float(np.max(values)))
    return worst
