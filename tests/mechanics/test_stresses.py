"""Stresses at points: closed-form plate cases, linearity, symmetry and the vectorised timing."""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.engine.procedure import ArrayWriter
from calcsheet.mechanics import formulas, internal_forces, point_load, stress_model
from calcsheet.sections import angle, catalog_section, i_shape, plate, round_bar

# Plate 4 in wide (x) by 6 in deep (y): Sx = b·d²/6 = 24 in³, Sy = d·b²/6 = 16 in³,
# A = 24 in² (hand calc). Cantilever 50 in, tip load 1 kip in the x-y plane at angle θ
# from +x toward +y, through the centroid.
PLATE = plate("4 in", "6 in")
LENGTH, P, SX, SY, AREA = 50.0, 1.0, 24.0, 16.0, 24.0


def _tip_load_stresses(theta_deg: float):
    load = point_load(
        "P",
        magnitude=f"{P} kip",
        angle=f"{theta_deg} deg",
        from_axis="+x",
        toward_axis="+y",
        z=f"{LENGTH} in",
    )
    forces = internal_forces(f"{LENGTH} in", [load])
    return stress_model(PLATE).stresses(forces.as_array("kip", "inch"))


def _corner(labels, name: str) -> int:
    return labels.index(f"{name} corner")


# Tension corner: the root fibre on the side the tip moves away from (common practice,
# no source): Fx > 0 stretches the −x side, Fy > 0 the −y side.
@pytest.mark.parametrize(
    ("theta", "tension", "compression"),
    [
        (30, "bottom-left", "top-right"),
        (120, "bottom-right", "top-left"),
        (210, "top-right", "bottom-left"),
        (300, "top-left", "bottom-right"),
    ],
)
def test_plate_tip_load_in_each_quadrant(theta: float, tension: str, compression: str) -> None:
    result = _tip_load_stresses(theta)
    c, s = abs(math.cos(math.radians(theta))), abs(math.sin(math.radians(theta)))
    expected = P * LENGTH * (c / SY + s / SX)  # σ = M_y/S_y + M_x/S_x (hand calc)
    assert result.governing_label("tension") == f"{tension} corner"
    assert result.governing_label("compression") == f"{compression} corner"
    assert result.sigma[_corner(result.labels, tension)] == pytest.approx(expected)
    assert result.sigma[_corner(result.labels, compression)] == pytest.approx(-expected)


@pytest.mark.parametrize(
    ("theta", "tension_side", "modulus"),
    [
        (0, ("top-left", "bottom-left"), SY),
        (90, ("bottom-left", "bottom-right"), SX),
        (180, ("top-right", "bottom-right"), SY),
        (270, ("top-left", "top-right"), SX),
    ],
)
def test_plate_tip_load_along_the_axes(theta, tension_side, modulus) -> None:
    result = _tip_load_stresses(theta)
    for name in tension_side:  # σ = P·L/S on the whole tension edge (hand calc)
        assert result.sigma[_corner(result.labels, name)] == pytest.approx(P * LENGTH / modulus)
    assert result.sigma.max() == pytest.approx(P * LENGTH / modulus)
    assert result.sigma.min() == pytest.approx(-P * LENGTH / modulus)
    # Shear at the centroid: τ = 1.5·V/A for a rectangle (common practice, no source).
    centroid = result.labels.index("centroid")
    assert result.tau[centroid] == pytest.approx(1.5 * P / AREA)


def test_load_through_centroid_gives_uniform_axial_stress() -> None:
    load = point_load(
        "P", magnitude="12 kip", angle="0 deg", from_axis="+z", toward_axis="+y", z="30 in"
    )
    forces = internal_forces("30 in", [load], station="10 in")
    result = stress_model(PLATE).stresses(forces.as_array())
    assert np.allclose(result.sigma, 12.0 / AREA)  # σ = N/A = 0.5 ksi everywhere
    assert np.allclose(result.tau, 0.0)


def test_unsymmetric_angle_bends_about_the_inclined_neutral_axis() -> None:
    # Under Mx alone the neutral axis of an angle is not the x axis: the general formula
    # must give zero resultant My = −∫σ·x dA (checked at the corners of a line fit).
    section = angle("6 in", "4 in", "0.5 in")
    model = stress_model(section)
    sigma = model.stresses(np.array([0, 0, 0, 0, 100.0, 0]))
    numbers = section.numeric("inch")
    D = numbers.Ix * numbers.Iy - numbers.Ixy**2
    expected = 100.0 * (numbers.Iy * model.y - numbers.Ixy * model.x) / D
    assert np.allclose(sigma.sigma, expected)
    heel = model.labels.index("heel")
    assert sigma.sigma[heel] != pytest.approx(100.0 * model.y[heel] / numbers.Ix, rel=1e-3)


def test_principal_and_von_mises_formulas() -> None:
    # σ = 6, τ = 4: σ1,2 = 3 ± 5 (Mohr's circle), von Mises = √(36 + 48) (hand calc).
    w = ArrayWriter()
    radius = formulas.mohr_radius(w, 6.0, 4.0)
    s1 = formulas.major_principal_stress(6.0, radius)
    s2 = formulas.minor_principal_stress(6.0, radius)
    assert (float(s1), float(s2)) == pytest.approx((8.0, -2.0))
    assert float(formulas.von_mises_stress(w, 6.0, 4.0)) == pytest.approx(math.sqrt(84.0))


@pytest.mark.parametrize("by_resultant", [True, False])
def test_round_bar_torsion_is_tr_over_j(by_resultant: bool) -> None:
    """τ = T·r/J at the perimeter, on the extreme fibres and on the sampled outline."""
    section = round_bar("2 in")
    model = stress_model(section, by_resultant=by_resultant)
    result = model.stresses(np.array([0, 0, 0, 10.0, 0, 0]))
    J = math.pi * 2.0**4 / 32  # solid circle (common practice, no source)
    if by_resultant:
        edge = [0, 1]
        assert "extreme fibre" in result.labels[0]
    else:
        edge = [i for i, label in enumerate(result.labels) if label.startswith("perimeter")]
    assert np.allclose(result.tau[edge], 10.0 * 1.0 / J, rtol=1e-3)


forces_strategy = st.lists(st.floats(-100, 100, allow_nan=False), min_size=6, max_size=6)


@settings(max_examples=40, deadline=None)
@given(forces=forces_strategy, scale=st.floats(-5, 5, allow_nan=False))
def test_stress_components_are_linear_in_load(forces, scale) -> None:
    model = stress_model(angle("6 in", "4 in", "0.5 in"))
    base = model.stresses(np.array(forces))
    scaled = model.stresses(scale * np.array(forces))
    assert np.allclose(scaled.sigma, scale * base.sigma, atol=1e-9)
    assert np.allclose(scaled.tau_zx, scale * base.tau_zx, atol=1e-9)
    assert np.allclose(scaled.tau_zy, scale * base.tau_zy, atol=1e-9)
    assert np.allclose(scaled.von_mises, abs(scale) * base.von_mises, atol=1e-9)


@settings(max_examples=40, deadline=None)
@given(forces=forces_strategy)
def test_mirror_symmetry_of_an_i_shape(forces) -> None:
    """Mirroring the load about y-z (x → −x) mirrors the normal stress of a symmetric I."""
    model = stress_model(i_shape("12 in", "8 in", "0.5 in", "0.75 in"))
    N, Vx, Vy, T, Mx, My = forces
    # Reflection x → −x: Vx and the moments with an x-lever change sign as pseudo-vectors.
    mirrored = np.array([N, -Vx, Vy, -T, Mx, -My])
    original = model.stresses(np.array(forces))
    reflected = model.stresses(mirrored)
    pair = {
        "top-left flange tip": "top-right flange tip",
        "bottom-left flange tip": "bottom-right flange tip",
        "top flange to web, left": "top flange to web, right",
        "bottom flange to web, left": "bottom flange to web, right",
    }
    for left, right in pair.items():
        i, j = model.labels.index(left), model.labels.index(right)
        assert reflected.sigma[j] == pytest.approx(original.sigma[i], abs=1e-9)
        assert reflected.von_mises[j] == pytest.approx(original.von_mises[i], abs=1e-9)


def test_thousand_load_cases_give_every_point_of_every_case() -> None:
    # Speed is measured by `make bench`, never asserted in a test.
    model = stress_model(catalog_section("W10x33"))
    cases = np.random.default_rng(7).normal(size=(1000, 6)) * 10
    result = model.stresses(cases)
    governing = result.governing_index("von Mises")
    assert result.von_mises.shape == (1000, len(model.labels))
    assert governing.shape == (1000,)
