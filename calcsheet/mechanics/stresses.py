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
  (average over the cut width, :func:`formulas.shear_flow_stress`);
* τ_T from St Venant torsion (:mod:`calcsheet.mechanics.torsion`);
* τ = √(τzx² + τzy²) + |τ_T|, then σ1, σ2, τ_max and von Mises.

The centroid is added as a point (label ``centroid``) when it lies in the
material, because the transverse shear of a symmetric section peaks there. When
it does not (tubes, angles, most channels), the points where the centroidal axes
leave the outline are added instead: the walls at the neutral axis of each
bending plane, where V·Q/(I·b) peaks.
"""

from __future__ import annotations

from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.mechanics import formulas
from calcsheet.mechanics.torsion import TorsionRule, torsion_rule
from calcsheet.sections import Section

Array = NDArray[np.float64]
CENTROID_LABEL = "centroid"

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
        tau = formulas.combined_shear(tau_zx, tau_zy, tau_t)
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


def cut_data(section: Section, x: Array, y: Array, length_unit: str) -> CutData:
    """First moments and widths of the horizontal and vertical cuts through each point."""
    outline = section.numeric(length_unit).outline
    turned = outline.quarter_turned()  # (x, y) -> (−y, x): "above" is "to the right"
    above = [outline.integrals(above=float(level)) for level in y]
    right = [turned.integrals(above=float(level)) for level in x]
    return CutData(
        Qx_above=np.array([part.first_y for part in above]),
        Qy_above=np.array([part.first_x for part in above]),
        b=np.asarray(outline.cut_width(y), dtype=float),
        Qx_right=np.array([-part.first_x for part in right]),
        Qy_right=np.array([part.first_y for part in right]),
        t=np.asarray(turned.cut_width(x), dtype=float),
    )


def stress_model(
    section: Section, length_unit: str = "inch", *, include_centroid: bool = True
) -> StressModel:
    """Precompute the per-point stress factors of ``section`` in ``length_unit``."""
    numbers = section.numeric(length_unit)
    labels = list(numbers.point_labels)
    x, y = list(numbers.point_x), list(numbers.point_y)
    if include_centroid:
        rings = numbers.outline.rings
        extra = (
            [(CENTROID_LABEL, 0.0, 0.0)]
            if point_in_material(rings, 0.0, 0.0)
            else neutral_axis_points(rings)
        )
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
        normal_matrix=normal,
        zx_matrix=shear_rows(cuts.Qx_right, cuts.Qy_right, cuts.t),
        zy_matrix=shear_rows(cuts.Qx_above, cuts.Qy_above, cuts.b),
    )
