"""Stresses at the points of a section under internal forces, for many load cases at once.

Build a :class:`StressModel` once per section (its stress points and the cuts
through them); then :meth:`StressModel.stresses` turns an array of internal forces
of shape (..., 6) in the order (N, Vx, Vy, T, Mx, My) into stresses at every point,
for every case at once, by running the point stress procedure of
:mod:`calcsheet.mechanics.point_stresses` on arrays (the member sheet runs the same
procedure on its symbols). Units must be consistent: forces in F and moments in F·L
with the model's length unit L give stresses in F/L².

At each point (x, y) measured from the centroid:

* normal stress σ: axial plus unsymmetric bending (:func:`formulas.bending_stress_x`
  and ``bending_stress_y``);
* τzy from the horizontal cut through the point and τzx from the vertical cut
  (average over the cut width, :func:`formulas.transverse_shear`). On a section
  of one ring (every open shape) the cut is the stretch of material through the
  point, with the part that stretch cuts off: a cut through the bottom flange of a
  channel takes the bottom flange tip, not both tips; a cut that meets no material
  at the point (a free face, a toe) gives no shear. Tubes and built-up plates use
  the whole line across the section;
* τ_T from St Venant torsion (:mod:`calcsheet.mechanics.torsion`) of the torque
  about the shear-centre axis (:meth:`StressModel.shear_centre_forces` turns the
  centroid's T into it); or, when the twist
  derivatives φ′, φ″, φ‴ are given (open sections with a warping model), the warping
  normal stress E·Wn·φ″ into σ and the shear G·t·φ′ + |E·Sw·φ‴/t| (AISC Design Guide 9);
* τ = √(τzx² + τzy²) + |τ_T|, except at a re-entrant corner of an open section,
  where the two cuts cross two different walls and τ = max(|τzx|, |τzy|) + |τ_T|
  (:func:`formulas.shear_at_point`); then σ1, σ2, τ_max and von Mises.

A round section (bar, round HSS, pipe) is taken by its resultant moment and shear
instead: its points are the two extreme fibres of the diameter normal to the
resultant moment (:func:`~calcsheet.mechanics.point_stresses.round_stress_procedure`).

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

import dataclasses
import functools
from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import InputError
from calcsheet.mechanics import formulas
from calcsheet.mechanics.point_stresses import (
    HORIZONTAL_CUT,
    ROUND_FIBRES,
    VERTICAL_CUT,
    Cut,
    ForceTerms,
    PointRecord,
    PointTerms,
    PointWarping,
    RoundTerms,
    SectionTerms,
    TwistTerms,
    point_stress_procedure,
    round_stress_procedure,
)
from calcsheet.mechanics.torsion import (
    ROUND_FAMILIES,
    TorsionRule,
    shear_centre_torque,
    torsion_rule,
)
from calcsheet.sections import Section, SectionNumbers
from calcsheet.sections.geometry import NO_MATERIAL, ChordCut, Outline
from calcsheet.sections.shapes import Wall
from calcsheet.sections.warping import WarpingPoints, WarpingProperties, warping_properties
from calcsheet.units import Quantity

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
# Relative difference below which two points' stresses are a tie (round-off).
_TIE = 1e-9
# Relative size (of A^1.5) below which a first moment is round-off of an exact zero.
_ZERO_Q = 1e-9

MEASURES: dict[str, str] = {
    "tension": "largest normal stress (tension)",
    "compression": "most negative normal stress (compression)",
    "shear": "largest shear stress on the cross-section",
    "max shear": "largest in-plane maximum shear stress",
    "von Mises": "largest von Mises stress",
}


def point_in_material(rings: list[Array], x: float, y: float) -> bool:
    """Even-odd ray test: is (x, y) inside the outline (holes excluded)?"""
    return point_in_edges([ring_edges(ring) for ring in rings], x, y)


def ring_edges(ring: Array) -> tuple[Array, Array, Array, Array]:
    """A closed ring's edges as arrays x0, y0, x1, y1 (for many tests of one outline)."""
    x0, y0 = ring[:, 0], ring[:, 1]
    return x0, y0, np.roll(x0, -1), np.roll(y0, -1)


def point_in_edges(rings: list[tuple[Array, Array, Array, Array]], x: float, y: float) -> bool:
    """:func:`point_in_material` over rings already given as :func:`ring_edges`."""
    inside = False
    for x0, y0, x1, y1 in rings:
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
    """Stresses at every point for every case: arrays of shape (..., n_points).

    The two extreme fibres of a round section taken by its resultant moment have no
    cuts: ``tau_zy`` holds the transverse shear τ_V of the resultant shear (taken at
    both fibres) and ``tau_zx`` is zero.
    """

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
        chosen = values[measure]
        # Points equal but for round-off (the two sides of a symmetric section) are a tie,
        # and a tie goes to the first point, as the sheet's governing steps take it.
        largest = np.max(chosen, axis=-1, keepdims=True)
        scale = np.max(np.abs(chosen), axis=-1, keepdims=True)
        return np.argmax(chosen >= largest - _TIE * scale, axis=-1)

    def governing_label(self, measure: str) -> str:
        """Label of the governing point of a single load case.

        Point labels are words with ``{symbol}`` marks (``"web, peak of {V_x} shear"``),
        as the sheet typesets them; ``calcsheet.engine.marked_text.plain_text`` gives
        the plain words (``"web, peak of V_x shear"``)."""
        index = self.governing_index(measure)
        if np.ndim(index) != 0:
            raise ValueError("governing_label needs the stresses of one load case")
        return self.labels[int(index)]


def round_values(section: Section, length_unit: str) -> RoundTerms:
    """R_o, Q_0 and b_0 of a round section from its outline, as floats in ``length_unit``."""
    numbers = section.numeric(length_unit)
    return RoundTerms(
        R_o=max(float(np.abs(ring).max()) for ring in numbers.outline.rings),
        Q_0=float(numbers.Q_x([0.0])[0]),
        b_0=float(numbers.b([0.0])[0]),
    )


@dataclass(frozen=True, eq=False)
class StressModel:
    """A section's stress points with their cuts, and its values, in one length unit.

    :meth:`stresses` runs the point stress procedure
    (:func:`calcsheet.mechanics.point_stresses.point_stress_procedure`) on arrays; a
    member sheet runs the same procedure on its own symbols. A round section taken by
    its resultant moment (``resultant`` given) has the two extreme fibres of
    :func:`~calcsheet.mechanics.point_stresses.round_stress_procedure` as its points;
    they turn with the moment, so their ``x`` and ``y`` are NaN and they have no cuts.
    """

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
    resultant: RoundTerms | None = None
    # The section itself, for its warping model (computed when first asked for).
    section: Section | None = None

    @functools.cached_property
    def warping(self) -> WarpingProperties | None:
        """The section's warping model (shear centre, Cw), or None.

        None for a section without one: a round section, a closed or solid one (they do
        not warp and their shear centre is the centroid) and a built-up shape whose walls
        are not known (:func:`calcsheet.sections.warping.warping_properties` refuses it).
        """
        if self.section is None or self.resultant is not None:
            return None
        try:
            props = warping_properties(self.section, self.length_unit)
        except InputError:
            return None
        return props if props.warps else None

    def shear_centre_forces(self, forces: ArrayLike) -> Array:
        """Internal forces (..., 6) with T about the centroid turned into T about the shear centre.

        The same forces for a section whose shear centre is the centroid (doubly
        symmetric, closed, solid) or is not known (a built-up shape).
        """
        values = np.array(forces, dtype=float)
        props = self.warping
        if props is not None and (props.x_s or props.y_s):
            values[..., 3] = shear_centre_torque(
                values[..., 3], values[..., 1], values[..., 2], props.x_s, props.y_s
            )
        return values

    @functools.cached_property
    def warping_points(self) -> WarpingPoints | None:
        """Wn (mid-line), Sw and the wall thickness at every point, or None (no model)."""
        props = self.warping
        return None if props is None else props.at_points(self.x, self.y)

    @property
    def symmetric(self) -> bool:
        """Whether I_xy is zero: the symmetric forms of bending and shear are written."""
        return self.Ixy == 0.0

    def point_cuts(self) -> list[dict[str, Cut]]:
        """The cuts of each point that carry shear, by name ("zy" horizontal, "zx" vertical).

        A cut through no material (zero width: a free face, a toe) or one that cuts off
        nothing (both first moments round-off of zero) is left out; so is the other
        first moment of a section with a symmetry axis where it is round-off of zero.
        The sheet writes the values of these cuts as its inputs and the arrays use them.
        """
        q_scale = self.A**1.5
        cuts = self.cuts
        found = []
        for index in range(len(self.labels)):
            point: dict[str, Cut] = {}
            for name, (q_own, q_other, width) in (
                (HORIZONTAL_CUT, (cuts.Qx_above[index], cuts.Qy_above[index], cuts.b[index])),
                (VERTICAL_CUT, (cuts.Qy_right[index], cuts.Qx_right[index], cuts.t[index])),
            ):
                has_own = abs(q_own) > _ZERO_Q * q_scale
                has_other = abs(q_other) > _ZERO_Q * q_scale
                if width <= 0 or not (has_own or has_other):
                    continue
                keep_other = has_other or not self.symmetric
                point[name] = Cut(
                    float(q_own), float(q_other) if keep_other else None, float(width)
                )
            found.append(point)
        return found

    def section_terms(self) -> SectionTerms:
        """The section's values for the procedures, as floats in the model's length unit."""
        rule = self.torsion
        return SectionTerms(
            A=self.A,
            I_x=self.Ix,
            I_y=self.Iy,
            J=self.J,
            torsion=rule.kind,
            I_xy=None if self.symmetric else self.Ixy,
            D=None if self.symmetric else formulas.product_determinant(self.Ix, self.Iy, self.Ixy),
            t=rule.thickness if rule.kind == "closed" else None,
            A_m=rule.enclosed_area if rule.kind == "closed" else None,
            t_max=rule.thickness if rule.kind == "open" else None,
        )

    @functools.cached_property
    def _arrays(self) -> tuple[SectionTerms, PointTerms]:
        """All points as one :class:`PointTerms` of arrays (a missing cut: Q = 0 on b = 1)."""
        selected = self.point_cuts()
        arrays = {}
        for name in (HORIZONTAL_CUT, VERTICAL_CUT):
            present = [name in point for point in selected]
            cuts = [point.get(name) for point in selected]
            arrays[name] = Cut(
                Q_own=np.array([c.Q_own if c else 0.0 for c in cuts]),
                Q_other=np.array([c.Q_other if c and c.Q_other is not None else 0.0 for c in cuts]),
                width=np.where(present, [c.width if c else 1.0 for c in cuts], 1.0),
            )
        point = PointTerms("all", "all points", self.x, self.y, arrays, self.junction)
        return self.section_terms(), point

    def stresses(self, forces: ArrayLike) -> PointStresses:
        """Stresses at every point for internal forces of shape (..., 6) or (..., 9).

        The forces (N, Vx, Vy, T, Mx, My) in F and F·L with the model's length unit L
        give stresses in F/L², of shape (..., n_points). T is the torque the section
        twists under, about its shear-centre axis (:meth:`shear_centre_forces` turns a
        centroid's T into it).

        Three more columns give the twist of an open section with warping:
        G·φ′ (F/L³), E·φ″ (F/L⁴), E·φ‴ (F/L⁵); the warping stresses are then added
        (module docstring). A section without a warping model ignores them (St Venant).
        """
        from calcsheet.engine.procedure import ArrayWriter  # imported when run: module doc

        forces = np.asarray(forces, dtype=float)
        terms = ForceTerms(*(forces[..., i : i + 1] for i in range(6)))
        section, point = self._arrays
        twist_terms = None
        warped = self.warping_points if forces.shape[-1] == 9 else None
        if warped is not None:
            # The moduli ride in the columns: E = G = 1 in the procedure.
            twist_terms = TwistTerms(*(forces[..., i : i + 1] for i in range(6, 9)), E=1.0, G=1.0)
            point = dataclasses.replace(
                point, warping=PointWarping(warped.Wn_midline, warped.Sw, warped.thickness)
            )
        w = ArrayWriter()
        with np.errstate(divide="ignore", invalid="ignore"):
            if self.resultant is not None:
                fibres = round_stress_procedure(
                    w, terms, section, RoundTerms(**vars(self.resultant))
                )
                records = _joined(fibres)
            else:
                (record,) = point_stress_procedure(w, [point], terms, section, twist_terms)
                records = record.terms
        shape = (*forces.shape[:-1], len(self.labels))
        values = {key: _full(value, shape) for key, value in records.items()}
        return PointStresses(
            labels=self.labels,
            sigma=values["sigma"],
            tau_zx=values["tau_zx"],
            tau_zy=values["tau_zy"],
            tau_torsion=values["tau_T"],
            tau=values["tau"],
            sigma_1=values["sigma_1"],
            sigma_2=values["sigma_2"],
            tau_max=values["tau_max"],
            von_mises=values["sigma_vm"],
        )


def model_forces(forces: ArrayLike, length_unit: str) -> Array:
    """Rows of forces in N and N·m (and twist columns in Pa/m, Pa/m², Pa/m³) turned into
    N and N·L with L = ``length_unit``, as :meth:`StressModel.stresses` takes them."""
    values = np.asarray(forces, dtype=float)
    metres = float(Quantity(1.0, length_unit).to("m").m)
    scale = [1, 1, 1, 1 / metres, 1 / metres, 1 / metres, metres**3, metres**4, metres**5]
    return values * scale[: values.shape[-1]]


def _full(value: Array, shape: tuple[int, ...]) -> Array:
    """A term spread over every case and point (terms like N/A are the same at every point)."""
    value = np.asarray(value, dtype=float)
    return value if value.shape == shape else np.broadcast_to(value, shape).copy()


def _joined(fibres: list[PointRecord]) -> dict[str, Array]:
    """The records of the round fibres as arrays over the fibres (the last axis).

    The round procedure has no cuts: its transverse shear τ_V, taken at both fibres,
    is given as τzy, and τzx is zero.
    """
    keys = ("sigma", "tau_V", "tau_T", "tau", "sigma_1", "sigma_2", "tau_max", "sigma_vm")
    joined = {
        key: np.concatenate(np.broadcast_arrays(*(np.asarray(f.terms[key]) for f in fibres)), -1)
        for key in keys
    }
    joined["tau_zy"] = joined.pop("tau_V")
    joined["tau_zx"] = np.zeros_like(joined["tau"])
    return joined


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
    # The numerator of τ·t: the horizontal cut's transverse shear on a unit width (its
    # general form holds for either cut, and for I_xy = 0).
    Ix, Iy, Ixy = numbers.Ix, numbers.Iy, numbers.Ixy
    coefficients = formulas.transverse_shear(
        unit_y,
        unit_x,
        qx_coefficients[None, :],
        qy_coefficients[None, :],
        1.0,
        Ix,
        Iy,
        Ixy,
        formulas.product_determinant(Ix, Iy, Ixy),
    )
    return WallShear(wall, coefficients, thickness)


def _direction_label(direction: float) -> str:
    degrees = round(float(np.degrees(direction)), 1) % 180.0
    if degrees == 0.0:
        return "peak of {V_x} shear"
    if degrees == 90.0:
        return "peak of {V_y} shear"
    return f"peak shear for {{V}} along {degrees:g}° (or {degrees + 180:g}°) from +x"


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
    section: Section,
    length_unit: str = "inch",
    *,
    include_centroid: bool = True,
    by_resultant: bool = True,
) -> StressModel:
    """The stress points of ``section`` with their cuts, in ``length_unit``.

    A round section (bar, round HSS, pipe) is taken by its resultant moment and shear
    (its two extreme fibres, as the member sheet writes it); ``by_resultant=False``
    samples the points of its outline like any other section.
    """
    numbers = section.numeric(length_unit)
    Ix, Iy, Ixy, A, J = numbers.Ix, numbers.Iy, numbers.Ixy, numbers.A, numbers.J
    if by_resultant and section.family in ROUND_FAMILIES:
        fibres = len(_ROUND_LABELS)
        nowhere, no_cut = np.full(fibres, np.nan), np.zeros(fibres)
        return StressModel(
            length_unit=length_unit,
            labels=_ROUND_LABELS,
            x=nowhere,
            y=nowhere.copy(),
            A=A,
            Ix=Ix,
            Iy=Iy,
            Ixy=Ixy,
            J=J,
            cuts=CutData(no_cut, no_cut, no_cut, no_cut, no_cut, no_cut),
            torsion=torsion_rule(section, nowhere, nowhere, length_unit),
            junction=np.zeros(fibres, dtype=bool),
            resultant=round_values(section, length_unit),
        )
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
        cuts=cut_data(section, x_arr, y_arr, length_unit),
        torsion=torsion_rule(section, x_arr, y_arr, length_unit),
        junction=re_entrant_corners(numbers.outline, x_arr, y_arr),
        section=section,
    )


_ROUND_LABELS = tuple(label for label, _ in ROUND_FIBRES)
