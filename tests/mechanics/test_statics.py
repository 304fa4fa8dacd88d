"""Statics of the free part: hand-checkable cases and hypothesis equilibrium."""

from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.mechanics import applied_moment, internal_forces, point_load, resultants_numeric


def test_downward_tip_load_hogs_the_support() -> None:
    # M = P·L with the top in tension at a cantilever root: common practice, no source.
    load = point_load("P", components=("0 kip", "-2 kip", "0 kip"), z="10 ft")
    forces = internal_forces("10 ft", [load])
    assert forces.Vy.to("kip").m == pytest.approx(-2.0)
    assert forces.Mx.to("kip*ft").m == pytest.approx(20.0)  # 2 kip × 10 ft, +y in tension
    assert forces.My.m == 0.0 and forces.T.m == 0.0 and forces.N.m == 0.0


def test_offset_axial_load_and_torque() -> None:
    # Lug 4 in below the centroid pulling along +z: Mx = ey·Fz = −4 in × 3 kip (hand calc).
    load = point_load("P", components=("1 kip", "0 kip", "3 kip"), z="5 ft", ey="-4 in")
    forces = internal_forces("5 ft", [load], station="2 ft")
    assert forces.N.to("kip").m == pytest.approx(3.0)
    assert forces.Mx.to("kip*inch").m == pytest.approx(-12.0)
    assert forces.My.to("kip*inch").m == pytest.approx(36.0)  # a·Fx = 36 in × 1 kip
    assert forces.T.to("kip*inch").m == pytest.approx(4.0)  # −ey·Fx = 4 in × 1 kip


def test_load_line_through_support_centroid_gives_no_moment_there() -> None:
    # A force whose line of action passes through (0, 0, 0): r ∥ F so r × F = 0.
    # Applied at z = 48 in, ey = 6 in, pointing back along (0, −6, −48): common practice.
    load = point_load("P", components=("0 kip", "-0.6 kip", "-4.8 kip"), z="48 in", ey="6 in")
    forces = internal_forces("60 in", [load])
    assert forces.Mx.to("kip*inch").m == pytest.approx(0.0, abs=1e-12)
    assert forces.My.m == pytest.approx(0.0, abs=1e-12)
    assert forces.T.m == pytest.approx(0.0, abs=1e-12)


def test_loads_before_the_station_are_not_carried() -> None:
    near = point_load("near", components=("0 kip", "-5 kip", "0 kip"), z="1 ft")
    far = point_load("far", components=("0 kip", "-1 kip", "0 kip"), z="6 ft")
    couple = applied_moment("C", z="4 ft", Mx="2 kip*ft")
    forces = internal_forces("6 ft", [near, far, couple], station="3 ft")
    assert forces.Vy.to("kip").m == pytest.approx(-1.0)
    assert forces.Mx.to("kip*ft").m == pytest.approx(3.0 + 2.0)  # 1 kip × 3 ft + couple


finite = st.floats(-50, 50, allow_nan=False)


@settings(max_examples=60, deadline=None)
@given(
    forces=st.lists(st.tuples(finite, finite, finite), min_size=1, max_size=4),
    data=st.data(),
)
def test_equilibrium_of_the_free_part(forces: list, data: st.DataObject) -> None:
    """Cut forces + loads on the free part have zero resultant force and moment."""
    positions = np.array(
        [[data.draw(finite), data.draw(finite), data.draw(st.floats(20, 100))] for _ in forces]
    )
    station = data.draw(st.floats(0, 20))
    load_array = np.array(forces, dtype=float)
    cut = resultants_numeric(load_array, positions, station)
    # The free part's cut face (normal −z) carries −(N, V, M); loads must balance it.
    total_force = load_array.sum(axis=0) - np.array([cut[1], cut[2], cut[0]])
    lever = positions - np.array([0.0, 0.0, station])
    total_moment = np.cross(lever, load_array).sum(axis=0) - np.array([cut[4], cut[5], cut[3]])
    scale = 1.0 + np.abs(load_array).sum() * 200
    assert np.allclose(total_force, 0.0, atol=1e-9 * scale)
    assert np.allclose(total_moment, 0.0, atol=1e-9 * scale)
    # Moments about the support follow from those at the station: M0 = Ms + (−zs·ez) × F.
    root = resultants_numeric(load_array, positions, 0.0)
    assert root[4] == pytest.approx(cut[4] - station * cut[2], abs=1e-9 * scale)
    assert root[5] == pytest.approx(cut[5] + station * cut[1], abs=1e-9 * scale)
