"""Independent check of point stresses against the FE library sectionproperties (3.x).

Its actions map one-to-one to ours (checked with a plate: ``mxx`` puts +y in
tension, ``myy`` puts −x in tension, i.e. both right-hand-rule like ours):
n = N, vx = Vx, vy = Vy, mxx = Mx, myy = My. ``get_stress_at_points`` takes points
in the geometry's own coordinates, so the FE centroid is added to ours, and returns
(σzz, τzx, τzy). Points on the boundary are moved 0.1 % toward the centroid so
each lies inside an element. Normal stress within 2 %; transverse shear at the
centroid within 10 % (our τ = V·Q/(I·b) is the average over the cut width, the FE
value is local).
"""

from __future__ import annotations

import numpy as np
import pytest
from sectionproperties.analysis import Section as FeSection
from sectionproperties.pre.library import (
    angle_section,
    i_section,
    rectangular_hollow_section,
    rectangular_section,
)

from calcsheet.mechanics import stress_model
from calcsheet.sections import angle, i_shape, plate, rectangular_hss

# N, Vx, Vy, T, Mx, My in kip and kip·in: axial force with biaxial bending and shear.
ACTIONS = np.array([12.0, 1.5, -4.0, 0.0, 180.0, -45.0])


def _fe(geometry, mesh_size: float) -> FeSection:
    geometry.create_mesh(mesh_sizes=[mesh_size])
    fe = FeSection(geometry)
    fe.calculate_geometric_properties()
    fe.calculate_warping_properties()
    return fe


def _fe_sigma_plane(fe: FeSection, actions: np.ndarray) -> np.ndarray:
    """FE nodal σzz fitted by a plane a + b·x + c·y, for points off the FE mesh.

    The HSS stress points are bounding-box corners outside its rounded corners;
    σ is linear over the section, so the FE plane extended there is exact.
    """
    N, Vx, Vy, _, Mx, My = actions
    stresses = fe.calculate_stress(n=N, mxx=Mx, myy=My, vx=Vx, vy=Vy).get_stress()[0]
    nodes = fe.mesh["vertices"]
    design = np.column_stack([np.ones(len(nodes)), nodes[:, 0], nodes[:, 1]])
    coefficients, *_ = np.linalg.lstsq(design, stresses["sig_zz"], rcond=None)
    return coefficients


def _compare(ours, fe: FeSection, *, shear_at_centroid: bool) -> None:
    model = stress_model(ours, "inch")
    result = model.stresses(ACTIONS)
    cx, cy = fe.get_c()
    N, Vx, Vy, _, Mx, My = ACTIONS
    points = [(cx + x, cy + y) for x, y in zip(model.x, model.y, strict=True)]
    fe_values = fe.get_stress_at_points(points, n=N, mxx=Mx, myy=My, vx=Vx, vy=Vy)
    plane = _fe_sigma_plane(fe, ACTIONS)
    scale = np.abs(result.sigma).max()
    for label, ours_sigma, fe_value, (px, py) in zip(
        model.labels, result.sigma, fe_values, points, strict=True
    ):
        fe_sigma = plane @ [1.0, px, py] if fe_value is None else fe_value[0]
        # 2 % of the largest normal stress on the section.
        assert fe_sigma == pytest.approx(ours_sigma, abs=0.02 * scale), label
    if shear_at_centroid:
        centroid = model.labels.index("centroid")
        (_, tau_zx, tau_zy) = fe.get_stress_at_points([(cx, cy)], vy=Vy)[0]
        only_vy = model.stresses(np.array([0, 0, Vy, 0, 0, 0]))
        assert tau_zy == pytest.approx(only_vy.tau_zy[centroid], rel=0.10)
        assert abs(tau_zx) < 0.05 * abs(tau_zy)


def test_i_shape_against_fe() -> None:
    ours = i_shape("12 in", "8 in", "0.5 in", "0.75 in")
    _compare(
        ours, _fe(i_section(d=12, b=8, t_f=0.75, t_w=0.5, r=0, n_r=1), 0.5), shear_at_centroid=True
    )


def test_rectangular_hss_against_fe() -> None:
    ours = rectangular_hss("8 in", "4 in", "0.349 in")
    geometry = rectangular_hollow_section(d=8, b=4, t=0.349, r_out=0.698, n_r=8, r_in=0.349)
    # The centroid of a tube is in the hole: no centroid point, shear not compared here.
    _compare(ours, _fe(geometry, 0.1), shear_at_centroid=False)


def test_plate_against_fe() -> None:
    ours = plate("4 in", "12 in")
    _compare(ours, _fe(rectangular_section(d=12, b=4), 1.0), shear_at_centroid=True)


def test_unsymmetric_angle_against_fe() -> None:
    ours = angle("6 in", "4 in", "0.5 in")
    _compare(
        ours, _fe(angle_section(d=6, b=4, t=0.5, r_r=0, r_t=0, n_r=1), 0.2), shear_at_centroid=False
    )


def test_web_shear_of_i_shape_at_flange_junction_against_fe() -> None:
    """τ = V·Q/(I·t_w) in the web just below the flange, within 10 % of the FE value."""
    ours = i_shape("12 in", "8 in", "0.5 in", "0.75 in")
    fe = _fe(i_section(d=12, b=8, t_f=0.75, t_w=0.5, r=0, n_r=1), 0.2)
    model = stress_model(ours)
    junction = model.labels.index("top flange to web, right")
    cx, cy = fe.get_c()
    Vy = -4.0
    ours_tau = model.stresses(np.array([0, 0, Vy, 0, 0, 0])).tau_zy[junction]
    # 0.05 in below the flange, on the web centre line.
    (_, _, fe_tau) = fe.get_stress_at_points([(cx, cy + model.y[junction] - 0.05)], vy=Vy)[0]
    assert fe_tau == pytest.approx(ours_tau, rel=0.10)


def test_tube_shear_at_the_neutral_axis_against_fe() -> None:
    """The tube's centroid is in the hole: the walls on the x axis carry the peak V_y shear.

    τ = V·Q/(I·2t) (average over the two walls) within 10 % of the FE value at the
    mid-thickness of the wall on the x axis (sectionproperties 3.x).
    """
    ours = rectangular_hss("8 in", "4 in", "0.349 in")
    geometry = rectangular_hollow_section(d=8, b=4, t=0.349, r_out=0.698, n_r=8, r_in=0.349)
    fe = _fe(geometry, 0.05)
    model = stress_model(ours)
    right = model.labels.index("x axis, right face")
    assert model.x[right] == pytest.approx(2.0) and model.y[right] == 0.0
    Vy = -4.0
    only_vy = model.stresses(np.array([0, 0, Vy, 0, 0, 0]))
    assert np.argmax(np.abs(only_vy.tau_zy)) in {right, model.labels.index("x axis, left face")}
    cx, cy = fe.get_c()
    (_, _, fe_tau) = fe.get_stress_at_points([(cx + 2.0 - 0.349 / 2, cy)], vy=Vy)[0]
    assert fe_tau == pytest.approx(only_vy.tau_zy[right], rel=0.10)


def test_angle_shear_at_the_long_leg_peak_against_fe() -> None:
    """The angle's centroid is off the legs: its V_y shear peaks on the long leg where the
    leg's mid-line crosses the neutral axis of M_x alone (above the x axis, Ixy ≠ 0)."""
    ours = angle("6 in", "4 in", "0.5 in")
    fe = _fe(angle_section(d=6, b=4, t=0.5, r_r=0, r_t=0, n_r=1), 0.05)
    model = stress_model(ours)
    peak = model.labels.index("vertical leg, peak of {V_y} shear")
    Vy = -4.0
    only_vy = model.stresses(np.array([0, 0, Vy, 0, 0, 0]))
    cx, cy = fe.get_c()
    (_, _, fe_tau) = fe.get_stress_at_points([(cx + model.x[peak], cy + model.y[peak])], vy=Vy)[0]
    # The long leg's shear is nearly uniform across its 0.5 in thickness (thin wall).
    assert fe_tau == pytest.approx(only_vy.tau_zy[peak], rel=0.10)
