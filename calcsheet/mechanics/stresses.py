"""Stresses at the points of a section under internal forces, for many load cases at once.

Build a :class:`StressModel` once per section (it precomputes, for every stress
point, the stress per unit of each internal force); then
:meth:`StressModel.stresses` turns an array of internal forces of shape
(..., 6) in the order (N, Vx, Vy, T, Mx, My) into stresses at every point with
two matrix products. Units must be consistent: forces in F and moments in F·L
with the model's length unit L give stresses in F/L².

At each point (x, y) measured from the centroid:

* normal stress σ: axial plus unsymmetric bending (:func:`formulas.bending_stress`);
* τzy from the horizontal cut through the point and τzx from the vertical cut
  (average over the cut width, :func:`formulas.shear_flow_stress`). On a section
  of one ring (every open shape) the cut is the stretch of material through the
  point, with the part that stretch cuts off: a cut through the bottom flange of a
  channel takes the bottom flange tip, not both tips; a cut that meets no material
  at the point (a free face, a toe) gives no shear. Tubes and built-up plates use
  the whole line across the section;
* τ_T from St Venant torsion (:mod:`calcsheet.mechanics.torsion`);
* τ = √(τzx² + τzy²) + |τ_T|, except at a re-entrant corner of an open section,
  where the two cuts cross two different walls and τ = max(|τzx|, |τzy|) + |τ_T|
  (:func:`formulas.junction_shear`); then σ1, σ2, τ_max and von Mises.

The centroid is added as a point (label ``centroid``) when it lies in the
material, because the transverse shear of a symmetric section peaks there. On
the straight walls of an angle, channel or tee the transverse shear peaks where
the wall's mid-line crosses the neutral axis of the bending that goes with the
shear; with Ixy ≠ 0 that is well off the centroidal axes, and it moves with the
direction of the shear. :func:`wall_peak_points` adds those peaks as points
(see there how they are chosen). Sections without walls whose centroid is not in
the material (tubes) get the points where the centroidal axes leave the outline:
the walls at the neutral axis of each bending plane, where V·Q/(I·b) peaks.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.mechanics import formulas
from calcsheet.mechanics.torsion import TorsionRule, torsion_rule
from calcsheet.sections import Section, SectionNumbers
from calcsheet.sections.geometry import NO_MATERIAL, ChordCut, Outline
from calcsheet.sections.shapes import Wall

Array = NDArray[np.float64]
CENTROID_LABEL = "centroid"

# The wall points must give every direction of shear its peak to within 1 %; they
# are chosen to 0.8 % on a grid of directions 0.1° apart, which leaves 0.2 % for the
# directions between grid lines (the peaks change little over 0.1°; a test checks
# random directions against a dense scan of every wall). A finer tolerance only adds
# points to the sheet: 0.5 % gives an equal-leg angle 12 wall points, 0.8 % gives 11.
PEAK_TOLERANCE = 0.008
DIRECTION_STEPS = 1800
_MAX_WALL_POINTS = 40

MEASURES: dict[str, str] = {
    "tension": "largest normal stress (tension)",
    "compression": "most negative normal stress (compression)",
    "shear": "largest shear stress on the cross-section",
    "max shear": "largest in-plane maximum shear stress",
    "von Mises": "largest von Mises stress",
}


def point_in_material(rings: list[Array], x: float, y: float) -> bool:
    """Even-odd ray test: is (x, y) inside the outline (holes excluded)?"""
    inside = False
    for ring in rings:
        x0, y0 = ring[:, 0], ring[:, 1]
        x1, y1 = np.roll(x0, -1), np.roll(y0, -1)
        crosses = (y0 > y) != (y1 > y)
        with np.errstate(divide="ignore", invalid="ignore"):
            x_cross = x0 + (y - y0) * (x1 - x0) / (y1 - y0)
        inside ^= bool(np.count_nonzero(crosses & (x < x_cross)) % 2)
    return inside


def _axis_crossings(rings: list[Array], vertical: bool) -> tuple[float, float] | None:
    """Extreme points where a centroidal axis (y = 0, or x = 0 when vertical) meets the outline."""
    found: list[float] = []
    for ring in rings:
        along, across = (ring[:, 1], ring[:, 0]) if vertical else (ring[:, 0], ring[:, 1])
        a0, c0 = along, across
        a1, c1 = np.roll(a0, -1), np.roll(c0, -1)
        crosses = (c0 > 0.0) != (c1 > 0.0)
        with np.errstate(divide="ignore", invalid="ignore"):
            at = a0 + (0.0 - c0) * (a1 - a0) / (c1 - c0)
        found.extend(at[crosses].tolist())
    return (min(found), max(found)) if found else None


def neutral_axis_points(rings: list[Array]) -> list[tuple[str, float, float]]:
    """Outer points of the material on the centroidal axes (for sections hollow at the centroid)."""
    points = []
    horizontal = _axis_crossings(rings, vertical=False)
    if horizontal is not None:
        points += [("x axis, left face", horizontal[0], 0.0)]
        points += [("x axis, right face", horizontal[1], 0.0)]
    vertical = _axis_crossings(rings, vertical=True)
    if vertical is not None:
        points += [("y axis, bottom face", 0.0, vertical[0])]
        points += [("y axis, top face", 0.0, vertical[1])]
    return points


@dataclass(frozen=True, eq=False)
class CutData:
    """First moments and widths of the cuts through each point (one length unit).

    Horizontal cut at y, the part above it: ``Qx_above`` = ∫y dA, ``Qy_above`` = ∫x dA,
    width ``b``. Vertical cut at x, the part to the right: ``Qx_right`` = ∫y dA,
    ``Qy_right`` = ∫x dA, thickness ``t``.
    """

    Qx_above: Array
    Qy_above: Array
    b: Array
    Qx_right: Array
    Qy_right: Array
    t: Array


@dataclass(frozen=True, eq=False)
class PointStresses:
    """Stresses at every point for every case: arrays of shape (..., n_points)."""

    labels: tuple[str, ...]
    sigma: Array
    tau_zx: Array
    tau_zy: Array
    tau_torsion: Array
    tau: Array
    sigma_1: Array
    sigma_2: Array
    tau_max: Array
    von_mises: Array

    def governing_index(self, measure: str) -> Array:
        """Index of the governing point for ``measure`` (a key of :data:`MEASURES`), per case."""
        values = {
            "tension": self.sigma,
            "compression": -self.sigma,
            "shear": self.tau,
            "max shear": self.tau_max,
            "von Mises": self.von_mises,
        }
        if measure not in values:
            raise KeyError(f"unknown measure {measure!r}; known: {sorted(MEASURES)}")
        return np.argmax(values[measure], axis=-1)

    def governing_label(self, measure: str) -> str:
        """Label of the governing point of a single load case."""
        index = self.governing_index(measure)
        if np.ndim(index) != 0:
            raise ValueError("governing_label needs the stresses of one load case")
        return self.labels[int(index)]


@dataclass(frozen=True, eq=False)
class StressModel:
    """Per-point stress per unit internal force for one section (module docstring)."""

    length_unit: str
    labels: tuple[str, ...]
    x: Array
    y: Array
    A: float
    Ix: float
    Iy: float
    Ixy: float
    J: float
    cuts: CutData
    torsion: TorsionRule
    junction: Array  # (n,) bool: a re-entrant corner where two walls meet
    normal_matrix: Array  # (6, n): σ per unit (N, Vx, Vy, T, Mx, My)
    zx_matrix: Array  # (6, n): τzx per unit force
    zy_matrix: Array  # (6, n): τzy per unit force

    def stresses(self, forces: ArrayLike) -> PointStresses:
        """Stresses at every point for internal forces of shape (..., 6)."""
        forces = np.asarray(forces, dtype=float)
        sigma = forces @ self.normal_matrix
        tau_zx = forces @ self.zx_matrix
        tau_zy = forces @ self.zy_matrix
        tau_t = forces[..., 3:4] * self.torsion.factor
        tau = np.where(
            self.junction,
            formulas.junction_shear(tau_zx, tau_zy, tau_t),
            formulas.combined_shear(tau_zx, tau_zy, tau_t),
        )
        sigma_1, sigma_2 = formulas.principal_stresses(sigma, tau)
        return PointStresses(
            labels=self.labels,
            sigma=sigma,
            tau_zx=tau_zx,
            tau_zy=tau_zy,
            tau_torsion=tau_t,
            tau=tau,
            sigma_1=sigma_1,
            sigma_2=sigma_2,
            tau_max=formulas.max_shear_stress(sigma, tau),
            von_mises=formulas.von_mises_stress(sigma, tau),
        )


# A convex corner sharper than this (the boundary turning by more than 45°) has two
# free faces with independent normals; a polygon drawing a curve turns far less.
_SHARP_TURN = np.radians(45.0)


def _corner_points(outline: Outline, x: Array, y: Array, re_entrant: bool) -> Array:
    """Which points sit on a corner of a one-ring outline, re-entrant or sharp convex.

    On a counter-clockwise ring a re-entrant corner (where walls meet) turns
    clockwise; a sharp convex corner (a toe, a heel, a flange tip) turns counter-
    clockwise by more than 45°. Tubes and built-up plates (several rings) have none
    counted.
    """
    found = np.zeros(len(x), dtype=bool)
    if len(outline.rings) != 1:
        return found
    ring = outline.rings[0]
    incoming = ring - np.roll(ring, 1, axis=0)
    outgoing = np.roll(ring, -1, axis=0) - ring
    cross = incoming[:, 0] * outgoing[:, 1] - incoming[:, 1] * outgoing[:, 0]
    dot = np.sum(incoming * outgoing, axis=1)
    orientation = np.sign(
        np.sum(ring[:, 0] * np.roll(ring[:, 1], -1) - np.roll(ring[:, 0], -1) * ring[:, 1])
    )
    turn = np.arctan2(cross * orientation, dot)
    corners = ring[turn < 0] if re_entrant else ring[turn > _SHARP_TURN]
    size = max(outline.x_max - outline.x_min, outline.y_max - outline.y_min)
    for corner_x, corner_y in corners:
        found |= np.hypot(x - corner_x, y - corner_y) < 1e-9 * size
    return found


def re_entrant_corners(outline: Outline, x: Array, y: Array) -> Array:
    """Which points sit on a re-entrant corner of a one-ring outline (where walls meet)."""
    return _corner_points(outline, x, y, re_entrant=True)


def free_corners(outline: Outline, x: Array, y: Array) -> Array:
    """Which points sit on a sharp convex corner of a one-ring outline (a toe or a tip).

    Both faces there are free and their normals independent, so both components of
    the transverse shear vanish (traction-free faces, common practice, no source),
    whichever cut passes through the point: a horizontal cut at the toe of a sloped
    flange still crosses the flange, but the toe carries no shear.
    """
    return _corner_points(outline, x, y, re_entrant=False)


def _cut_through(outline: Outline, along: float, level: float) -> ChordCut:
    """The stretch of material a horizontal cut at ``level`` crosses at ``along``.

    On a section of several rings (a tube, plates side by side) a cut's stretches do
    not each cut off a part of their own, so the whole line across it is used.
    """
    local = outline.chord_cut(along, level)
    if local is not None:
        return local
    part = outline.integrals(above=level)
    return ChordCut(float(outline.cut_width(level)[0]), part.first_x, part.first_y)


def cut_data(section: Section, x: Array, y: Array, length_unit: str) -> CutData:
    """First moments and widths of the horizontal and vertical cuts through each point."""
    outline = section.numeric(length_unit).outline
    turned = outline.quarter_turned()  # (x, y) -> (−y, x): "above" is "to the right"
    free = free_corners(outline, x, y)
    above, right = [], []
    for px, py, at_free_corner in zip(x, y, free, strict=True):
        if at_free_corner:  # see free_corners: no shear, whichever way it is cut
            above.append(NO_MATERIAL)
            right.append(NO_MATERIAL)
            continue
        above.append(_cut_through(outline, float(px), float(py)))
        right.append(_cut_through(turned, float(-py), float(px)))
    return CutData(
        Qx_above=np.array([part.first_y for part in above]),
        Qy_above=np.array([part.first_x for part in above]),
        b=np.array([part.width for part in above]),
        Qx_right=np.array([-part.first_x for part in right]),
        Qy_right=np.array([part.first_y for part in right]),
        t=np.array([part.width for part in right]),
    )


@dataclass(frozen=True)
class WallShear:
    """Transverse shear across one wall per unit shear force in each direction.

    τ(u) = (Σ ``coefficients[k, i]``·u^i) / t(u) for the unit shear of ``directions[k]``
    (radians from +x), u from 0 at the wall's start to 1 at its end. As u grows the
    part cut off gains a strip of the wall whose area is linear in u (a uniform wall:
    constant) and whose centroid lies on the mid-line, so Q, hence the numerator, is
    a cubic in u (a quadratic for a uniform wall), and t(u) is linear.
    """

    wall: Wall
    coefficients: Array  # (directions, 4)
    thickness: tuple[float, float]  # t at u = 0 and u = 1

    def values(self, fractions: ArrayLike) -> Array:
        """τ at each fraction for every direction: shape (directions, fractions)."""
        u = np.atleast_1d(np.asarray(fractions, dtype=float))
        powers = np.vstack([np.ones_like(u), u, u * u, u**3])
        width = self.thickness[0] + (self.thickness[1] - self.thickness[0]) * u
        return (self.coefficients @ powers) / width

    def peak(self) -> tuple[Array, Array]:
        """Largest |τ| on the wall for every direction, and the fraction where it is.

        On a uniform wall dτ/du = 0 where the mid-line crosses the neutral axis of the
        bending that goes with the shear, otherwise the peak is at an end. It is found
        on a grid of 129 fractions and refined by the parabola through the best grid
        value and its neighbours (exact for a uniform wall, whose τ is a parabola).
        """
        grid = np.linspace(0.0, 1.0, _WALL_GRID)
        values = np.abs(self.values(grid))
        best = np.argmax(values, axis=1)
        inner = np.clip(best, 1, _WALL_GRID - 2)
        rows = np.arange(len(best))
        left, middle, right = (values[rows, inner + k] for k in (-1, 0, 1))
        curvature = left - 2.0 * middle + right
        with np.errstate(divide="ignore", invalid="ignore"):
            shift = np.where(curvature < 0, 0.5 * (left - right) / curvature, 0.0)
        refined = np.clip(grid[inner] + np.clip(shift, -1.0, 1.0) * grid[1], 0.0, 1.0)
        at_end = (best == 0) | (best == _WALL_GRID - 1)
        fraction = np.where(at_end, grid[best], refined)
        powers = np.vstack([np.ones_like(fraction), fraction, fraction**2, fraction**3])
        width = self.thickness[0] + (self.thickness[1] - self.thickness[0]) * fraction
        value = np.abs(np.sum(self.coefficients * powers.T, axis=1) / width)
        return value, fraction


_WALL_GRID = 129


def wall_shear(numbers: SectionNumbers, wall: Wall, directions: Array) -> WallShear:
    """Fit τ(u) across ``wall`` for a unit shear in each of ``directions``."""
    outline = numbers.outline
    samples = np.array([0.2, 0.4, 0.6, 0.8])  # inside the wall: its ends touch a corner or toe
    first_about_x, first_about_y, widths = [], [], []
    for fraction in samples:
        px, py = wall.at(float(fraction))
        if wall.vertical:  # a horizontal cut, the part above
            cut = _cut_through(outline, px, py)
            first_about_x.append(cut.first_y)
            first_about_y.append(cut.first_x)
        else:  # a vertical cut, the part to the right
            cut = _cut_through(outline.quarter_turned(), -py, px)
            first_about_x.append(-cut.first_x)
            first_about_y.append(cut.first_y)
        widths.append(cut.width)
    vandermonde = np.vander(samples, 4, increasing=True)
    qx_coefficients = np.linalg.solve(vandermonde, first_about_x)
    qy_coefficients = np.linalg.solve(vandermonde, first_about_y)
    width_slope = (widths[-1] - widths[0]) / (samples[-1] - samples[0])
    thickness = (widths[0] - width_slope * samples[0], widths[0] + width_slope * (1 - samples[0]))
    unit_x, unit_y = np.cos(directions)[:, None], np.sin(directions)[:, None]
    # The numerator of τ·t: shear_flow_stress with a unit width.
    coefficients = formulas.shear_flow_stress(
        unit_x,
        unit_y,
        qx_coefficients[None, :],
        qy_coefficients[None, :],
        1.0,
        numbers.Ix,
        numbers.Iy,
        numbers.Ixy,
    )
    return WallShear(wall, coefficients, thickness)


def _direction_label(direction: float) -> str:
    degrees = round(float(np.degrees(direction)), 1) % 180.0
    if degrees == 0.0:
        return "peak of V_x shear"
    if degrees == 90.0:
        return "peak of V_y shear"
    return f"peak shear for V along {degrees:g}° (or {degrees + 180:g}°) from +x"


def wall_peak_points(numbers: SectionNumbers) -> list[tuple[str, float, float]]:
    """Points on the walls' mid-lines where the transverse shear of some direction peaks.

    The peak on a wall sits where its mid-line crosses the neutral axis of the bending
    that goes with the shear, so it moves along the wall as the direction of (V_x,
    V_y) turns, and a sheet's loads may turn it after it is built. Rather than one
    point for one direction, the points are chosen for every direction at once: first
    the peaks of V_x alone and V_y alone, then, while some direction on a 0.1° grid
    gets less than 99.2 % of its peak (the largest over all walls, see
    :meth:`WallShear.peak`) from the points so far, that direction's own peak is
    added. The wall ends are counted as covered: they are outline corners (a toe, or
    the corner where the wall meets another), whose cuts are the same stretch of
    material.
    """
    if not numbers.walls:
        return []
    directions = np.linspace(0.0, np.pi, DIRECTION_STEPS, endpoint=False)
    shears = [wall_shear(numbers, wall, directions) for wall in numbers.walls]
    peaks = [shear.peak() for shear in shears]
    exact = np.max(np.stack([value for value, _ in peaks]), axis=0)
    if not np.any(exact > 0):
        return []
    chosen: list[list[float]] = [[0.0, 1.0] for _ in shears]
    names: list[tuple[int, float, str]] = []

    def add(wall_index: int, direction_index: int) -> bool:
        fraction = float(peaks[wall_index][1][direction_index])
        if min(abs(fraction - known) for known in chosen[wall_index]) < 1e-6:
            return False
        chosen[wall_index].append(fraction)
        names.append((wall_index, fraction, _direction_label(directions[direction_index])))
        return True

    for direction_index in (0, DIRECTION_STEPS // 2):  # V_x alone, V_y alone
        for wall_index in range(len(shears)):
            add(wall_index, direction_index)
    for _ in range(_MAX_WALL_POINTS):
        sampled = np.max(
            np.stack(
                [
                    np.abs(shear.values(chosen[index])).max(axis=1)
                    for index, shear in enumerate(shears)
                ]
            ),
            axis=0,
        )
        shortfall = sampled / np.where(exact > 0, exact, 1.0)
        worst = int(np.argmin(np.where(exact > 0, shortfall, 1.0)))
        if shortfall[worst] >= 1.0 - PEAK_TOLERANCE:
            break
        governing_wall = int(np.argmax([value[worst] for value, _ in peaks]))
        if not add(governing_wall, worst):
            break
    points = []
    for wall_index, fraction, name in sorted(names, key=lambda item: item[:2]):
        wall = shears[wall_index].wall
        px, py = wall.at(fraction)
        points.append((f"{wall.label}, {name}", px, py))
    return points


def stress_model(
    section: Section, length_unit: str = "inch", *, include_centroid: bool = True
) -> StressModel:
    """Precompute the per-point stress factors of ``section`` in ``length_unit``."""
    numbers = section.numeric(length_unit)
    labels = list(numbers.point_labels)
    x, y = list(numbers.point_x), list(numbers.point_y)
    if include_centroid:
        rings = numbers.outline.rings
        if point_in_material(rings, 0.0, 0.0):
            extra = [(CENTROID_LABEL, 0.0, 0.0)]
        elif numbers.walls:
            extra = []  # the wall peaks below take the place of the axis crossings
        else:
            extra = neutral_axis_points(rings)
        extra += wall_peak_points(numbers)
        scale = max(float(np.ptp(ring[:, 0]) + np.ptp(ring[:, 1])) for ring in rings)
        for label, px, py in extra:
            # a corner already on the axis (a round tube's perimeter) is not repeated
            if not any(
                abs(px - qx) + abs(py - qy) < 1e-6 * scale for qx, qy in zip(x, y, strict=True)
            ):
                labels.append(label)
                x.append(px)
                y.append(py)
    x_arr, y_arr = np.array(x), np.array(y)
    Ix, Iy, Ixy, A, J = numbers.Ix, numbers.Iy, numbers.Ixy, numbers.A, numbers.J
    cuts = cut_data(section, x_arr, y_arr, length_unit)
    n = len(labels)
    unit_force = np.ones(n)
    zeros = np.zeros(n)

    normal = np.zeros((6, n))
    normal[0] = formulas.axial_stress(unit_force, A)
    normal[4] = formulas.bending_stress(unit_force, zeros, x_arr, y_arr, Ix, Iy, Ixy)
    normal[5] = formulas.bending_stress(zeros, unit_force, x_arr, y_arr, Ix, Iy, Ixy)

    def shear_rows(Q_about_x: Array, Q_about_y: Array, width: Array) -> Array:
        rows = np.zeros((6, n))
        rows[1] = formulas.shear_flow_stress(
            unit_force, zeros, Q_about_x, Q_about_y, width, Ix, Iy, Ixy
        )
        rows[2] = formulas.shear_flow_stress(
            zeros, unit_force, Q_about_x, Q_about_y, width, Ix, Iy, Ixy
        )
        return rows

    return StressModel(
        length_unit=length_unit,
        labels=tuple(labels),
        x=x_arr,
        y=y_arr,
        A=A,
        Ix=Ix,
        Iy=Iy,
        Ixy=Ixy,
        J=J,
        cuts=cuts,
        torsion=torsion_rule(section, x_arr, y_arr, J, length_unit),
        junction=re_entrant_corners(numbers.outline, x_arr, y_arr),
        normal_matrix=normal,
        zx_matrix=shear_rows(cuts.Qx_right, cuts.Qy_right, cuts.t),
        zy_matrix=shear_rows(cuts.Qx_above, cuts.Qy_above, cuts.b),
    )
