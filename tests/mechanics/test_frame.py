"""The frame solver against closed-form beam cases, the cantilever statics, and properties.

Closed-form values: AISC Steel Construction Manual (15th ed.), Table 3-23 "Shears,
Moments and Deflections", case numbers as given beside each check, and Roark's
Formulas for Stress and Strain (7th ed.), Table 8.1. All typed from memory, the
case numbers too; where a maximum's location needed a root, the derivation is
written beside it.
"""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.errors import InputError
from calcsheet.mechanics import (
    applied_moment,
    distributed_load,
    internal_forces,
    member_stiffness,
    point_load,
    self_weight,
    solve_frame,
    support,
    support_case,
)
from calcsheet.mechanics.deflection import tip_deflection
from calcsheet.sections import catalog_section
from calcsheet.units import Quantity

E_KSI = 29000.0
IX = 300.0
IY = 80.0
STIFFNESS = member_stiffness(
    E=f"{E_KSI} ksi", G="11200 ksi", A="12 in^2", Ix=f"{IX} in^4", Iy=f"{IY} in^4", J="3 in^4"
)
EI = E_KSI * IX
CLOSE = 1e-3  # the 0.1 % agreement the issue asks for


def uniform_down(w: float, start: float, end: float, name: str = "w") -> object:
    return distributed_load(
        name,
        z_start=Quantity(start, "inch"),
        z_end=Quantity(end, "inch"),
        q_start=(Quantity(0.0, "kip/inch"), Quantity(-w, "kip/inch"), Quantity(0.0, "kip/inch")),
    )


def down(P: float, z: float, name: str = "P") -> object:
    return point_load(
        name, components=("0 kip", Quantity(-P, "kip"), "0 kip"), z=Quantity(z, "inch")
    )


def fine(L: float, n: int = 4001) -> np.ndarray:
    return np.linspace(0.0, L, n)


# ----------------------------------------------------------------- closed-form cases


def test_simply_supported_uniform_load() -> None:
    # AISC Manual Table 3-23 case 1 (from memory): R = wL/2, M_max = wL²/8 at midspan,
    # Δ_max = 5wL⁴/(384EI) at midspan.
    L, w = 240.0, 0.1
    result = solve_frame(
        f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [uniform_down(w, 0, L)]
    )
    assert result.reactions[0, :, 1] == pytest.approx([w * L / 2, w * L / 2], rel=CLOSE)
    moment = result.internal_forces([L / 2])[0, 0, 4]
    assert -moment == pytest.approx(w * L**2 / 8, rel=CLOSE)  # sagging: −y fibres in tension
    deflection = result.deflections(fine(L))[0, :, 1]
    assert -deflection.min() == pytest.approx(5 * w * L**4 / (384 * EI), rel=CLOSE)
    assert fine(L)[deflection.argmin()] == pytest.approx(L / 2, rel=CLOSE)


def test_simply_supported_off_centre_point_load() -> None:
    # AISC Manual Table 3-23 case 8 / Roark Table 8.1 case 1e (from memory):
    # R1 = Pb/L, R2 = Pa/L, M_max = Pab/L under the load, Δ at the load = Pa²b²/(3EIL),
    # Δ_max = Pab(a + 2b)·√(3a(a + 2b))/(27EIL) at x = √(a(a + 2b)/3) from the far end
    # of the longer part (a > b, x from the support at the a side).
    L, P, a = 240.0, 10.0, 150.0
    b = L - a
    result = solve_frame(
        f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [down(P, a)]
    )
    assert result.reactions[0, :, 1] == pytest.approx([P * b / L, P * a / L], rel=CLOSE)
    assert -result.internal_forces([a])[0, 0, 4] == pytest.approx(P * a * b / L, rel=CLOSE)
    at_load = result.deflections([a])[0, 0, 1]
    assert -at_load == pytest.approx(P * a**2 * b**2 / (3 * EI * L), rel=CLOSE)
    deflection = result.deflections(fine(L))[0, :, 1]
    largest = P * a * b * (a + 2 * b) * math.sqrt(3 * a * (a + 2 * b)) / (27 * EI * L)
    assert -deflection.min() == pytest.approx(largest, rel=CLOSE)
    assert fine(L)[deflection.argmin()] == pytest.approx(math.sqrt(a * (a + 2 * b) / 3), rel=CLOSE)


def test_fixed_fixed_uniform_load() -> None:
    # AISC Manual Table 3-23 case 15 (from memory): R = wL/2, M at the ends wL²/12
    # (hogging), at midspan wL²/24 (sagging), Δ_max = wL⁴/(384EI) at midspan.
    L, w = 300.0, 0.2
    result = solve_frame(
        f"{L} in", support_case("fixed-fixed", f"{L} in"), STIFFNESS, [uniform_down(w, 0, L)]
    )
    assert result.reactions[0, :, 1] == pytest.approx([w * L / 2] * 2, rel=CLOSE)
    assert abs(result.reactions[0, 0, 3]) == pytest.approx(w * L**2 / 12, rel=CLOSE)
    moments = result.internal_forces([0.0, L / 2, L])[0, :, 4]
    assert moments == pytest.approx([w * L**2 / 12, -w * L**2 / 24, w * L**2 / 12], rel=CLOSE)
    deflection = result.deflections([L / 2])[0, 0, 1]
    assert -deflection == pytest.approx(w * L**4 / (384 * EI), rel=CLOSE)


def test_propped_cantilever_uniform_load() -> None:
    # AISC Manual Table 3-23 case 12 (from memory): R_fixed = 5wL/8, R_prop = 3wL/8,
    # M_fixed = wL²/8, M_max,positive = 9wL²/128 at 3L/8 from the prop.
    # Δ_max = wL⁴/(185EI) in the table (rounded); the exact coefficient is
    # (39 + 55√33)/65536 at x = L(1 + √33)/16 from the prop (derived from the elastic
    # curve EIy = w(3Lx³ − 2x⁴ − L³x)/48, its slope set to zero).
    L, w = 200.0, 0.15
    result = solve_frame(
        f"{L} in", support_case("fixed-pinned", f"{L} in"), STIFFNESS, [uniform_down(w, 0, L)]
    )
    assert result.reactions[0, :, 1] == pytest.approx([5 * w * L / 8, 3 * w * L / 8], rel=CLOSE)
    assert result.internal_forces([0.0])[0, 0, 4] == pytest.approx(w * L**2 / 8, rel=CLOSE)
    at_peak = result.internal_forces([L - 3 * L / 8])[0, 0, 4]
    assert -at_peak == pytest.approx(9 * w * L**2 / 128, rel=CLOSE)
    deflection = result.deflections(fine(L))[0, :, 1]
    coefficient = (39 + 55 * math.sqrt(33)) / 65536
    assert -deflection.min() == pytest.approx(coefficient * w * L**4 / EI, rel=CLOSE)
    assert -deflection.min() == pytest.approx(w * L**4 / (185 * EI), rel=3e-3)  # table's rounding
    assert L - fine(L)[deflection.argmin()] == pytest.approx(
        L * (1 + math.sqrt(33)) / 16, rel=CLOSE
    )


def test_propped_cantilever_point_load_at_centre() -> None:
    # AISC Manual Table 3-23 case 13 (from memory): R_fixed = 11P/16, R_prop = 5P/16,
    # M_fixed = 3PL/16, M under the load = 5PL/32, Δ under the load = 7PL³/(768EI),
    # Δ_max = PL³/(48√5·EI) at 0.447L from the prop.
    L, P = 180.0, 8.0
    result = solve_frame(
        f"{L} in", support_case("fixed-pinned", f"{L} in"), STIFFNESS, [down(P, L / 2)]
    )
    assert result.reactions[0, :, 1] == pytest.approx([11 * P / 16, 5 * P / 16], rel=CLOSE)
    moments = result.internal_forces([0.0, L / 2])[0, :, 4]
    assert moments == pytest.approx([3 * P * L / 16, -5 * P * L / 32], rel=CLOSE)
    assert -result.deflections([L / 2])[0, 0, 1] == pytest.approx(
        7 * P * L**3 / (768 * EI), rel=CLOSE
    )
    deflection = result.deflections(fine(L))[0, :, 1]
    assert -deflection.min() == pytest.approx(P * L**3 / (48 * math.sqrt(5) * EI), rel=CLOSE)
    assert L - fine(L)[deflection.argmin()] == pytest.approx(L / math.sqrt(5), rel=CLOSE)


def test_overhang_with_uniform_load_on_the_whole_beam() -> None:
    # AISC Manual Table 3-23 case 24 (from memory), beam overhanging one support,
    # uniform load over span l and overhang a: R1 = w(l² − a²)/(2l), R2 = w(l + a)²/(2l),
    # M1 = w(l + a)²(l − a)²/(8l²) at x = l(1 − a²/l²)/2, M2 = wa²/2 at R2,
    # Δ at the end of the overhang = wa(4a²l − l³ + 3a³)/(24EI) (upward when negative).
    l, a, w = 240.0, 60.0, 0.1
    L = l + a
    supports = support_case("overhang", f"{L} in", positions=("0 in", f"{l} in"))
    result = solve_frame(f"{L} in", supports, STIFFNESS, [uniform_down(w, 0, L)])
    expected = [w * (l**2 - a**2) / (2 * l), w * (l + a) ** 2 / (2 * l)]
    assert result.reactions[0, :, 1] == pytest.approx(expected, rel=CLOSE)
    x1 = l * (1 - a**2 / l**2) / 2
    sagging = -result.internal_forces([x1])[0, 0, 4]
    assert sagging == pytest.approx(w * (l + a) ** 2 * (l - a) ** 2 / (8 * l**2), rel=CLOSE)
    assert result.internal_forces([l])[0, 0, 4] == pytest.approx(w * a**2 / 2, rel=CLOSE)
    tip = result.deflections([L])[0, 0, 1]
    assert -tip == pytest.approx(w * a * (4 * a**2 * l - l**3 + 3 * a**3) / (24 * EI), rel=CLOSE)


def test_overhangs_at_both_ends_by_statics() -> None:
    # Two equal overhangs c under a uniform load: R = wL/2 each, M at a support wc²/2,
    # at midspan w(l²/8 − c²/2) sagging (statics; AISC Manual Table 3-23, beam overhanging
    # both supports, uniform load, gives the same for equal overhangs: from memory, case
    # number not checked).
    c, l, w = 40.0, 200.0, 0.12
    L = l + 2 * c
    supports = support_case("overhang", f"{L} in", positions=(f"{c} in", f"{c + l} in"))
    result = solve_frame(f"{L} in", supports, STIFFNESS, [uniform_down(w, 0, L)])
    assert result.reactions[0, :, 1] == pytest.approx([w * L / 2] * 2, rel=CLOSE)
    moments = result.internal_forces([c, L / 2])[0, :, 4]
    assert moments == pytest.approx([w * c**2 / 2, -w * (l**2 / 8 - c**2 / 2)], rel=CLOSE)


def test_two_equal_spans_uniform_load() -> None:
    # AISC Manual Table 3-23, continuous beam, two equal spans, uniform load (from memory,
    # case number not checked), spans l:
    # R_outer = 3wl/8, R_centre = 10wl/8, M_centre = wl²/8 (hogging),
    # M_max,positive = 9wl²/128 at 3l/8 from an outer support, Δ_max = wl⁴/(185EI)
    # (exact coefficient as in the propped cantilever, by symmetry the same curve).
    l, w = 150.0, 0.25
    L = 2 * l
    result = solve_frame(
        f"{L} in", support_case("two-span", f"{L} in"), STIFFNESS, [uniform_down(w, 0, L)]
    )
    assert result.reactions[0, :, 1] == pytest.approx(
        [3 * w * l / 8, 10 * w * l / 8, 3 * w * l / 8], rel=CLOSE
    )
    moments = result.internal_forces([3 * l / 8, l])[0, :, 4]
    assert moments == pytest.approx([-9 * w * l**2 / 128, w * l**2 / 8], rel=CLOSE)
    deflection = result.deflections(fine(L))[0, :, 1]
    coefficient = (39 + 55 * math.sqrt(33)) / 65536
    assert -deflection.min() == pytest.approx(coefficient * w * l**4 / EI, rel=CLOSE)
    _, found = result.critical_station("Mx")
    assert abs(found[0]) == pytest.approx(w * l**2 / 8, rel=CLOSE)


def test_linearly_varying_load_on_a_simple_span() -> None:
    # Roark Table 8.1 case 2a with w_a = 0 (from memory), a triangular load rising to w
    # at the right support: R_left = wL/6, R_right = wL/3, M_max = wL²/(9√3) at L/√3,
    # Δ_max = 0.00652·wL⁴/EI at x = 0.5193L.
    L, w = 240.0, 0.3
    load = distributed_load(
        "tri",
        z_start="0 in",
        z_end=f"{L} in",
        q_start=("0 kip/in", "0 kip/in", "0 kip/in"),
        q_end=("0 kip/in", f"{-w} kip/in", "0 kip/in"),
    )
    result = solve_frame(f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [load])
    assert result.reactions[0, :, 1] == pytest.approx([w * L / 6, w * L / 3], rel=CLOSE)
    moment = -result.internal_forces([L / math.sqrt(3)])[0, 0, 4]
    assert moment == pytest.approx(w * L**2 / (9 * math.sqrt(3)), rel=CLOSE)
    deflection = result.deflections(fine(L))[0, :, 1]
    assert -deflection.min() == pytest.approx(0.00652 * w * L**4 / EI, rel=CLOSE)
    assert fine(L)[deflection.argmin()] == pytest.approx(0.5193 * L, rel=CLOSE)


def test_self_weight_of_a_column_is_axial() -> None:
    # A column fixed at its base (z = 0), gravity along −z: N = −w(L − z) (compression),
    # the base reaction is +wL along z (statics, common practice, no source).
    L, w = 144.0, 0.05 / 12
    weight = self_weight(Quantity(w, "kip/inch"), f"{L} in", gravity_axis="-z")
    result = solve_frame(f"{L} in", support_case("fixed-free", f"{L} in"), STIFFNESS, [weight])
    assert result.reactions[0, 0, 2] == pytest.approx(w * L)
    axial = result.internal_forces([0.0, L / 2, L])[0, :, 0]
    assert axial == pytest.approx([-w * L, -w * L / 2, 0.0], abs=1e-12)
    shortening = result.deflections([L])[0, 0, 2]
    assert shortening == pytest.approx(-w * L**2 / (2 * E_KSI * 12.0), rel=1e-9)


def test_offset_distributed_load_twists_the_member() -> None:
    # A uniform load q along −y at ex on a span with fork supports: torque per length
    # ex·(−q); each support takes half; T varies linearly from −t·L/2 to +t·L/2
    # (statics, common practice, no source). Twist at midspan t·L²/(8GJ).
    L, q, ex = 200.0, 0.1, 3.0
    load = distributed_load(
        "q",
        z_start="0 in",
        z_end=f"{L} in",
        q_start=("0 kip/in", f"{-q} kip/in", "0 kip/in"),
        ex=f"{ex} in",
    )
    result = solve_frame(f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [load])
    torque_per_length = ex * -q
    torques = result.internal_forces([0.0, L / 2, L], side="right")[0, :, 3]
    assert torques[:2] == pytest.approx([torque_per_length * L / 2, 0.0], abs=1e-9)
    twist = result.deflections([L / 2])[0, 0, 3]
    assert twist == pytest.approx(torque_per_length * L**2 / (8 * 11200.0 * 3.0), rel=1e-9)


def test_sides_of_a_station_with_a_load_or_a_support() -> None:
    # Statics (common practice, no source): a simple span with P down at a. With
    # Vy = Σ Fy beyond the cut (+z face), the shear just before the load is
    # R2 − P = −Pb/L and just after it R2 = Pa/L.
    L, P, a = 200.0, 6.0, 50.0
    b = L - a
    result = solve_frame(
        f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [down(P, a)]
    )
    shear = {
        side: result.internal_forces([a], side=side)[0, 0, 2]
        for side in ("station", "left", "right")
    }
    assert shear["left"] == pytest.approx(-P * b / L)
    assert shear["station"] == pytest.approx(-P * b / L)  # a load at the cut is beyond it
    assert shear["right"] == pytest.approx(P * a / L)
    # At z = 0 the reaction there is behind the cut by default: the member's own shear.
    start = {
        side: result.internal_forces([0.0], side=side)[0, 0, 2]
        for side in ("station", "left", "right")
    }
    assert start["station"] == pytest.approx(-P * b / L)
    assert start["left"] == pytest.approx(0.0, abs=1e-12)  # everything beyond: balanced
    empty = solve_frame(f"{L} in", support_case("pinned-pinned", f"{L} in"), STIFFNESS, [])
    assert np.abs(empty.internal_forces([0.0, L])).max() == 0.0


# ------------------------------------------------------------- the cantilever's statics

coordinate = st.floats(-8, 8, allow_nan=False)
force = st.floats(-20, 20, allow_nan=False)


@settings(max_examples=40, deadline=None)
@given(
    loads=st.lists(
        st.tuples(force, force, force, coordinate, coordinate, st.floats(0, 1)),
        min_size=1,
        max_size=4,
    ),
    couples=st.lists(st.tuples(force, force, force, st.floats(0, 1)), max_size=2),
    stations=st.lists(st.floats(0, 1), min_size=1, max_size=5),
)
def test_cantilever_equals_statics_of_the_free_part(
    loads: list, couples: list, stations: list
) -> None:
    """For a member fixed at z = 0, the frame's forces equal ``internal_forces`` exactly."""
    L = 96.0
    members = [
        point_load(
            f"P{n}",
            components=tuple(Quantity(v, "kip") for v in (fx, fy, fz)),
            z=Quantity(round(t * L, 3), "inch"),
            ex=Quantity(ex, "inch"),
            ey=Quantity(ey, "inch"),
        )
        for n, (fx, fy, fz, ex, ey, t) in enumerate(loads)
        if (fx, fy, fz) != (0.0, 0.0, 0.0)
    ] + [
        applied_moment(
            f"C{n}",
            z=Quantity(round(t * L, 3), "inch"),
            Mx=Quantity(mx, "kip*inch"),
            My=Quantity(my, "kip*inch"),
            Mz=Quantity(mz, "kip*inch"),
        )
        for n, (mx, my, mz, t) in enumerate(couples)
    ]
    if not members:
        return
    result = solve_frame(f"{L} in", support_case("fixed-free", f"{L} in"), STIFFNESS, [members])
    at = [0.0] + [round(t * L, 3) for t in stations] + [float(m.z.m) for m in members]
    frame = result.internal_forces(at)[0]
    expected = np.array(
        [internal_forces(f"{L} in", members, Quantity(s, "inch")).as_array() for s in at]
    )
    scale = 1.0 + np.abs(expected).max()
    assert np.abs(frame - expected).max() <= 1e-12 * scale * L


def test_cantilever_tip_deflection_equals_the_deflection_module_for_an_angle() -> None:
    # Unsymmetric bending (I_xy ≠ 0): the coupled solution against the closed form
    # of calcsheet.mechanics.deflection (AISC Manual Table 3-23 cantilever cases).
    section = catalog_section("L4X3X1/2")
    props = section.properties
    stiffness = member_stiffness(
        E="29000 ksi",
        G="11200 ksi",
        A=props["A"],
        Ix=props["Ix"],
        Iy=props["Iy"],
        J=props["J"],
        Ixy=props["Ixy"],
    )
    loads = [
        point_load("P", components=("0.3 kip", "-0.5 kip", "2 kip"), z="40 in", ey="-1 in"),
        applied_moment("C", z="20 in", Mx="1 kip*in", My="-2 kip*in"),
    ]
    result = solve_frame("60 in", support_case("fixed-free", "60 in"), stiffness, [loads])
    closed = tip_deflection(section, loads, length="60 in")
    u, v = result.deflections([60.0])[0, 0, :2]
    assert u == pytest.approx(closed.u.to("inch").m, rel=1e-9)
    assert v == pytest.approx(closed.v.to("inch").m, rel=1e-9)


# ----------------------------------------------------------------------- properties

CASES = ("fixed-free", "pinned-pinned", "fixed-pinned", "fixed-fixed", "overhang", "two-span")


@st.composite
def members(draw: st.DrawFn) -> tuple[float, tuple, list]:
    """A member on a random case of supports with random point, couple and line loads."""
    L = draw(st.floats(60, 400))
    case = draw(st.sampled_from(CASES))
    positions = None
    if case == "overhang":
        first = draw(st.floats(0, 0.4)) * L
        second = draw(st.floats(0.6, 1.0)) * L
        positions = (Quantity(first, "inch"), Quantity(second, "inch"))
    if case == "two-span":
        positions = (
            Quantity(0.0, "inch"),
            Quantity(draw(st.floats(0.2, 0.8)) * L, "inch"),
            Quantity(L, "inch"),
        )
    supports = support_case(case, Quantity(L, "inch"), positions=positions)
    loads: list = []
    for n in range(draw(st.integers(1, 3))):
        components = draw(st.tuples(force, force, force).filter(lambda f: any(f)))
        loads.append(
            point_load(
                f"P{n}",
                components=tuple(Quantity(v, "kip") for v in components),
                z=Quantity(draw(st.floats(0, 1)) * L, "inch"),
                ex=Quantity(draw(coordinate), "inch"),
                ey=Quantity(draw(coordinate), "inch"),
            )
        )
    if draw(st.booleans()):
        loads.append(
            applied_moment(
                "C",
                z=Quantity(draw(st.floats(0, 1)) * L, "inch"),
                Mx=Quantity(draw(force), "kip*inch"),
                Mz=Quantity(draw(force), "kip*inch"),
            )
        )
    if draw(st.booleans()):
        start = draw(st.floats(0, 0.5)) * L
        end = start + draw(st.floats(0.1, 0.5)) * L
        per_length = st.floats(-0.2, 0.2)
        loads.append(
            distributed_load(
                "q",
                z_start=Quantity(start, "inch"),
                z_end=Quantity(end, "inch"),
                q_start=tuple(Quantity(draw(per_length), "kip/inch") for _ in range(3)),
                q_end=tuple(Quantity(draw(per_length), "kip/inch") for _ in range(3)),
                ex=Quantity(draw(coordinate), "inch"),
                ey=Quantity(draw(coordinate), "inch"),
            )
        )
    return L, supports, loads


def applied_totals(loads: list) -> tuple[np.ndarray, np.ndarray]:
    """Total force and moment about the origin of the applied loads (kip, kip·in)."""
    total_force, total_moment = np.zeros(3), np.zeros(3)
    for load in loads:
        if hasattr(load, "Fx"):
            vector = np.array([load.Fx.m, load.Fy.m, load.Fz.m])
            where = np.array([load.ex.m, load.ey.m, load.z.m])
            total_force += vector
            total_moment += np.cross(where, vector)
        elif hasattr(load, "Mx"):
            total_moment += np.array([load.Mx.m, load.My.m, load.Mz.m])
        else:  # a linear distributed load integrated in closed form
            a, b = load.z_start.m, load.z_end.m
            q0 = np.array([q.m for q in load.q_start])
            q1 = np.array([q.m for q in load.q_end])
            resultant = (q0 + q1) / 2 * (b - a)
            first_moment = (b - a) ** 2 * (q0 / 6 + q1 / 3) + a * resultant  # ∫ z·q dz
            total_force += resultant
            offsets = np.array([load.ex.m, load.ey.m, 0.0])
            total_moment += np.cross(offsets, resultant)
            # the z-arm part: ∫ (0, 0, z) × q dz = (−∫z·qy, ∫z·qx, 0)
            total_moment += np.array([-first_moment[1], first_moment[0], 0.0])
    return total_force, total_moment


@settings(max_examples=60, deadline=None)
@given(member=members())
def test_reactions_balance_the_loads(member: tuple) -> None:
    """Σ reactions + Σ loads = 0 for forces and for moments about the origin."""
    L, supports, loads = member
    result = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [loads])
    applied_force, applied_moment_total = applied_totals(loads)
    reactions = result.reactions[0]
    reaction_force = reactions[:, :3].sum(axis=0)
    where = np.array([[0.0, 0.0, s.z.m] for s in supports])
    reaction_moment = reactions[:, 3:].sum(axis=0) + np.cross(where, reactions[:, :3]).sum(axis=0)
    scale = 1 + np.abs(applied_force).sum() * L + np.abs(applied_moment_total).sum()
    assert np.abs(reaction_force + applied_force).max() <= 1e-9 * scale
    assert np.abs(reaction_moment + applied_moment_total).max() <= 1e-9 * scale
    # The cut just inside each end carries nothing beyond the member: statics closes.
    ends = result.internal_forces([L], side="right")[0, 0]
    assert np.abs(ends).max() <= 1e-9 * scale


@settings(max_examples=40, deadline=None)
@given(first=members(), second_factor=st.floats(-3, 3), first_factor=st.floats(-3, 3))
def test_response_is_linear_in_the_loads(
    first: tuple, first_factor: float, second_factor: float
) -> None:
    """Solving the scaled, summed loads equals combining the solved cases by factors."""
    L, supports, loads = first
    half = max(len(loads) // 2, 1)
    one, two = loads[:half], loads[half:]
    result = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [one, two])
    scaled = [_scaled(load, first_factor) for load in one] + [
        _scaled(load, second_factor) for load in two
    ]
    together = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [scaled])
    stations = np.linspace(0, L, 37)
    factors = [[first_factor, second_factor]]
    combined = result.internal_forces(stations, factors)
    direct = together.internal_forces(stations)
    scale = 1 + np.abs(direct).max()
    assert np.abs(combined - direct).max() <= 1e-9 * scale
    np.testing.assert_allclose(result.reactions_for(factors), together.reactions, atol=1e-9 * scale)
    bent = result.deflections(stations, factors)
    bent_direct = together.deflections(stations)
    assert np.abs(bent - bent_direct).max() <= 1e-9 * (1 + np.abs(bent_direct).max())


def _scaled(load: object, factor: float) -> object:
    from dataclasses import replace

    if hasattr(load, "Fx"):
        return replace(load, Fx=load.Fx * factor, Fy=load.Fy * factor, Fz=load.Fz * factor)
    if hasattr(load, "Mx"):
        return replace(load, Mx=load.Mx * factor, My=load.My * factor, Mz=load.Mz * factor)
    return replace(
        load,
        q_start=tuple(q * factor for q in load.q_start),
        q_end=tuple(q * factor for q in load.q_end),
    )


@settings(max_examples=40, deadline=None)
@given(
    case=st.sampled_from(("pinned-pinned", "fixed-fixed")),
    L=st.floats(80, 300),
    P=st.floats(0.5, 20),
    where=st.floats(0.05, 0.45),
    w=st.floats(0, 0.3),
)
def test_symmetric_member_gives_symmetric_diagrams(
    case: str, L: float, P: float, where: float, w: float
) -> None:
    """Loads mirrored about midspan on mirrored supports: M and v symmetric, V antisymmetric."""
    a = where * L
    loads = [down(P, a, "P1"), down(P, L - a, "P2"), uniform_down(w, 0, L)]
    supports = support_case(case, Quantity(L, "inch"))
    result = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [loads])
    stations = np.linspace(0, L, 41)[1:-1]
    left = result.internal_forces(stations, side="left")[0]
    mirrored = result.internal_forces(L - stations, side="right")[0]
    scale = 1 + np.abs(left).max()
    assert np.abs(left[:, 4] - mirrored[:, 4]).max() <= 1e-9 * scale
    assert np.abs(left[:, 2] + mirrored[:, 2]).max() <= 1e-9 * scale
    deflection = result.deflections(stations)[0, :, 1]
    assert np.abs(deflection - deflection[::-1]).max() <= 1e-9 * (1 + np.abs(deflection).max())
    assert result.reactions[0, 0, 1] == pytest.approx(result.reactions[0, 1, 1], rel=1e-9)


@settings(max_examples=30, deadline=None)
@given(member=members())
def test_deflection_inside_elements_meets_the_nodes(member: tuple) -> None:
    """Integrating the exact curvature from each element's left node reaches the next node."""
    L, supports, loads = member
    result = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [loads])
    at_nodes = result.deflections(result.nodes)[0]
    nodal = result.displacements[0][:, [0, 1, 2, 5]]
    assert np.abs(at_nodes - nodal).max() <= 1e-8 * (1 + np.abs(nodal).max())


@settings(max_examples=30, deadline=None)
@given(member=members())
def test_station_search_finds_the_largest_moment_of_a_fine_scan(member: tuple) -> None:
    """The candidates (nodes, grid, stationary points) reach the peak of 1,000 stations."""
    L, supports, loads = member
    result = solve_frame(Quantity(L, "inch"), supports, STIFFNESS, [loads])
    scan = result.internal_forces(np.linspace(0, L, 1000))[0]
    for name, index in (("Mx", 4), ("My", 5), ("Vy", 2), ("T", 3)):
        where, found = result.critical_station(name)
        peak = np.abs(scan[:, index]).max()
        assert abs(found[0]) >= peak - 1e-9 * (1 + peak)
        # The value reported is the member's own at that station (one side of it).
        sides = [
            result.internal_forces(where, side=side)[0, 0, index]
            for side in ("station", "left", "right")
        ]
        assert min(abs(found[0] - value) for value in sides) <= 1e-12 * (1 + peak)


# ------------------------------------------------------------------------ bad input


def test_a_mechanism_is_named() -> None:
    no_twist = [
        support("A", z="0 in", restrains=("ux", "uy", "uz")),
        support("B", z="100 in", restrains=("ux", "uy")),
    ]
    with pytest.raises(InputError, match="supports.*twist rz"):
        solve_frame("100 in", no_twist, STIFFNESS, [[down(1.0, 50.0)]])
    one_pin = [support("A", z="0 in", restrains=("ux", "uy", "uz", "rz"))]
    with pytest.raises(InputError, match="turns about x"):
        solve_frame("100 in", one_pin, STIFFNESS, [[down(1.0, 50.0)]])


def test_a_support_outside_the_member() -> None:
    beyond = [
        support("A", z="0 in", restrains=("ux", "uy", "uz", "rz", "rx", "ry")),
        support("B", z="120 in", restrains=("uy",)),
    ]
    with pytest.raises(InputError, match="support B z"):
        solve_frame("100 in", beyond, STIFFNESS, [[down(1.0, 50.0)]])
    with pytest.raises(InputError, match=r"support positions\[1\]"):
        support_case("overhang", "100 in", positions=("0 in", "101 in"))


def test_distributed_load_of_no_length_or_past_the_end() -> None:
    with pytest.raises(InputError, match="distributed load w z_end"):
        distributed_load(
            "w", z_start="10 in", z_end="10 in", q_start=("0 kip/in", "-1 kip/in", "0 kip/in")
        )
    past = uniform_down(0.1, 50.0, 130.0)
    with pytest.raises(InputError, match="distributed load w z_end.*outside the member"):
        solve_frame("100 in", support_case("pinned-pinned", "100 in"), STIFFNESS, [[past]])


def test_other_bad_entries_are_named() -> None:
    with pytest.raises(InputError, match="support case"):
        support_case("hinged", "100 in")
    with pytest.raises(InputError, match="support positions"):
        support_case("overhang", "100 in")
    with pytest.raises(InputError, match="support A restrains"):
        support("A", z="0 in", restrains=("ux", "twist"))
    twice = [
        support("A", z="0 in", restrains=("ux", "uy", "uz", "rz")),
        support("B", z="0 in", restrains=("ux", "uy")),
    ]
    with pytest.raises(InputError, match="support B z"):
        solve_frame("100 in", twice, STIFFNESS, [[down(1.0, 50.0)]])
    result = solve_frame(
        "100 in", support_case("pinned-pinned", "100 in"), STIFFNESS, [[down(1.0, 50.0)]]
    )
    with pytest.raises(InputError, match="stations"):
        result.internal_forces([101.0])
    with pytest.raises(InputError, match="combination factors"):
        result.internal_forces([10.0], factors=[[1.0, 2.0]])
    with pytest.raises(InputError, match="section Ixy"):
        member_stiffness(
            E="29000 ksi",
            G="11200 ksi",
            A="1 in^2",
            Ix="1 in^4",
            Iy="1 in^4",
            J="1 in^4",
            Ixy="1 in^4",
        )


def test_sorted_distinct_is_numpy_unique_for_stations() -> None:
    """sorted_distinct stands in for np.unique on station arrays (numpy's own result is the
    reference: its documented behaviour for a flat float array)."""
    from calcsheet.mechanics.frame import sorted_distinct

    rng = np.random.default_rng(11)
    for _ in range(500):
        values = rng.choice(np.round(rng.uniform(-5, 10, 15), 1), size=rng.integers(0, 40))
        values = np.append(values, [0.0, -0.0])
        np.testing.assert_array_equal(sorted_distinct(values), np.unique(values))
