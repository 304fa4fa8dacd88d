"""Plane-area integrals of a cross-section outline: area, moments, cuts, plastic moduli.

An :class:`Outline` is a set of closed polygonal rings in one length unit, plain
floats. Solid rings run counter-clockwise and holes clockwise, so a hole's
integrals come out negative and the rings simply add up; an HSS is its outer
ring plus its inner ring. Curved edges (HSS corners, tubes, bars) are given as
many short chords by the shape builders.

Every integral uses Green's theorem in a form whose integrand carries ``dy``
(for example ``A = ∮ x dy``). The straight closing segment that a horizontal cut
``y = c`` adds to a clipped region has ``dy = 0`` and contributes nothing, so the
part of the section above a cut is integrated by clipping each edge on its own,
vectorised over all edges, with no polygon clipping. Vertical cuts reuse the same
code on the outline turned a quarter turn (a rotation keeps ring orientation).
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

# Two-point Gauss-Legendre rule on [0, 1]: exact for the cubic integrands below.
_GAUSS_T = np.array([0.5 - 0.5 / math.sqrt(3.0), 0.5 + 0.5 / math.sqrt(3.0)])
_GAUSS_W = np.array([0.5, 0.5])
_BISECTION_STEPS = 64


@dataclass(frozen=True)
class ChordCut:
    """The stretch of material a straight cut crosses at a point, and the part it cuts off.

    ``width`` is the chord's length (zero where the cut passes through no material
    at the point: a free face or a toe); ``first_x`` = ∫x dA and ``first_y`` = ∫y dA
    of the part on the upper side of a horizontal chord, in the outline's axes.
    """

    width: float
    first_x: float
    first_y: float


NO_MATERIAL = ChordCut(0.0, 0.0, 0.0)


@dataclass(frozen=True)
class AreaIntegrals:
    """Integrals over a region about the outline's own origin."""

    area: float
    first_x: float  # ∫ x dA
    first_y: float  # ∫ y dA
    second_xx: float  # ∫ x² dA
    second_yy: float  # ∫ y² dA
    product_xy: float  # ∫ x y dA


class Outline:
    """Closed rings of (x, y) vertices; counter-clockwise solid, clockwise holes."""

    def __init__(self, rings: list[NDArray[np.float64]]) -> None:
        self.rings = [np.asarray(ring, dtype=float) for ring in rings]
        starts = np.concatenate(self.rings)
        ends = np.concatenate([np.roll(ring, -1, axis=0) for ring in self.rings])
        self._x0, self._y0 = starts[:, 0], starts[:, 1]
        self._x1, self._y1 = ends[:, 0], ends[:, 1]
        self.x_min, self.x_max = float(starts[:, 0].min()), float(starts[:, 0].max())
        self.y_min, self.y_max = float(starts[:, 1].min()), float(starts[:, 1].max())
        self._turned: Outline | None = None
        self._counter_clockwise: bool | None = None

    def shifted(self, dx: float, dy: float) -> Outline:
        """The same outline moved by (dx, dy)."""
        return Outline([ring + np.array([dx, dy]) for ring in self.rings])

    def scaled(self, factor: float) -> Outline:
        """The same outline in another length unit (lengths times ``factor``)."""
        return Outline([ring * factor for ring in self.rings])

    def quarter_turned(self) -> Outline:
        """The outline turned +90°: (x, y) -> (-y, x), so the old x becomes the new y."""
        if self._turned is None:
            self._turned = Outline(
                [np.column_stack((-ring[:, 1], ring[:, 0])) for ring in self.rings]
            )
        return self._turned

    # --- integrals ------------------------------------------------------------------

    def integrals(self, above: float = -math.inf) -> AreaIntegrals:
        """Area integrals of the part of the section with ``y >= above``."""
        xa, ya, xb, yb = self._clipped_edges(above)
        dy = yb - ya
        x = xa[:, None] + (xb - xa)[:, None] * _GAUSS_T
        y = ya[:, None] + (yb - ya)[:, None] * _GAUSS_T
        weight = dy[:, None] * _GAUSS_W

        def total(integrand: NDArray[np.float64]) -> float:
            return float(np.sum(integrand * weight))

        return AreaIntegrals(
            area=total(x),
            first_x=total(x * x / 2.0),
            first_y=total(x * y),
            second_xx=total(x**3 / 3.0),
            second_yy=total(x * y * y),
            product_xy=total(x * x * y / 2.0),
        )

    def _clipped_edges(self, above: float) -> tuple[NDArray[np.float64], ...]:
        x0, y0, x1, y1 = self._x0, self._y0, self._x1, self._y1
        if above == -math.inf:
            return x0, y0, x1, y1
        dy = y1 - y0
        with np.errstate(divide="ignore", invalid="ignore"):
            t_cut = np.clip((above - y0) / dy, 0.0, 1.0)
        rising = dy > 0
        t_start = np.where(rising, t_cut, 0.0)
        t_end = np.where(rising, 1.0, t_cut)
        flat = dy == 0  # horizontal edges carry no dy, hence nothing to integrate
        t_start = np.where(flat, 0.0, t_start)
        t_end = np.where(flat, 0.0, t_end)
        dx = x1 - x0
        return (
            x0 + t_start * dx,
            y0 + t_start * dy,
            x0 + t_end * dx,
            y0 + t_end * dy,
        )

    def first_moment_above(self, cut: ArrayLike) -> NDArray[np.float64]:
        """∫ y dA over the part above each horizontal cut ``y = cut`` (vectorised)."""
        cuts = np.atleast_1d(np.asarray(cut, dtype=float))
        return np.array([self.integrals(above=float(c)).first_y for c in cuts])

    def area_above(self, cut: float) -> float:
        """Area of the part above the horizontal cut ``y = cut``."""
        return self.integrals(above=cut).area

    # --- cuts -------------------------------------------------------------------------

    def cut_width(self, cut: ArrayLike) -> NDArray[np.float64]:
        """Length of material crossed by each horizontal line ``y = cut``.

        Where the line runs along a horizontal edge (the underside of a flange, say),
        the narrower of the two sides is returned: that is the width which governs
        the shear stress V·Q/(I·b) there.
        """
        cuts = np.atleast_1d(np.asarray(cut, dtype=float))
        nudge = 1e-9 * max(self.y_max - self.y_min, self.x_max - self.x_min)
        below = np.array([self._width_exactly_at(float(c) - nudge) for c in cuts])
        above = np.array([self._width_exactly_at(float(c) + nudge) for c in cuts])
        return np.minimum(below, above)

    def _width_exactly_at(self, level: float) -> float:
        x0, y0, x1, y1 = self._x0, self._y0, self._x1, self._y1
        upward = (y0 <= level) & (level < y1)
        downward = (y1 <= level) & (level < y0)
        crossing = upward | downward
        if not np.any(crossing):
            return 0.0
        t = (level - y0[crossing]) / (y1[crossing] - y0[crossing])
        x = x0[crossing] + t * (x1[crossing] - x0[crossing])
        direction = np.where(upward[crossing], 1, -1)
        order = np.argsort(x, kind="stable")
        x, winding = x[order], np.cumsum(direction[order])
        inside = winding[:-1] != 0
        return float(np.sum(np.diff(x)[inside]))

    def chord_cut(self, x: float, level: float) -> ChordCut | None:
        """The horizontal chord through (x, level) and the part of the section above it.

        A horizontal line may cross an open section in several separate stretches (both
        flanges of a channel, a flange and a stem of a tee); the shear stress at a point
        is carried by the stretch through that point, and the flow over it comes from
        the part of the section that this stretch alone cuts off (thin-walled open
        section shear flow: the cut must separate the section). That part is found by
        splitting the ring at the chord's two ends. Along a horizontal face the narrower
        side governs, as in :meth:`cut_width`; a line that meets no material at the
        point on one side (a free face, a toe) gives width zero.

        Only a single solid ring (every open rolled shape, plate and bar) can be split
        this way; for several rings (tubes, built-up plates) ``None`` is returned and
        the caller uses the whole-line cut.
        """
        if len(self.rings) != 1:
            return None
        if self._counter_clockwise is None:
            self._counter_clockwise = _polygon_first_moments(self.rings[0])[0] > 0
        edges = (self._x0, self._y0, self._x1, self._y1)
        size = max(self.y_max - self.y_min, self.x_max - self.x_min)
        nudge = 1e-9 * size
        below = _chord_of_ring(edges, self._counter_clockwise, x, level - nudge, 1e-7 * size)
        above = _chord_of_ring(edges, self._counter_clockwise, x, level + nudge, 1e-7 * size)
        if below.width == 0.0 or above.width == 0.0:
            return NO_MATERIAL
        return below if below.width < above.width else above

    # --- plastic modulus ------------------------------------------------------------

    def plastic_modulus_about_horizontal(self) -> float:
        """Plastic modulus for bending about a horizontal axis (Z = A/2 · lever arm).

        The plastic neutral axis is the horizontal line that halves the area; Z is the
        first moment of the two halves about it, ``Q_above - Q_below``.
        """
        whole = self.integrals()
        low, high = self.y_min, self.y_max
        for _ in range(_BISECTION_STEPS):
            middle = 0.5 * (low + high)
            if self.area_above(middle) > 0.5 * whole.area:
                low = middle
            else:
                high = middle
        first_above = self.integrals(above=0.5 * (low + high)).first_y
        return 2.0 * first_above - whole.first_y


def _polygon_first_moments(points: NDArray[np.float64]) -> tuple[float, float, float]:
    """Signed area, ∫x dA and ∫y dA of one closed polygon (shoelace formulas)."""
    x, y = points[:, 0], points[:, 1]
    x_next, y_next = np.append(x[1:], x[0]), np.append(y[1:], y[0])
    cross = x * y_next - x_next * y
    return (
        float(np.sum(cross) / 2.0),
        float(np.sum((x + x_next) * cross) / 6.0),
        float(np.sum((y + y_next) * cross) / 6.0),
    )


def _chord_of_ring(
    edges: tuple[NDArray[np.float64], ...],
    counter_clockwise: bool,
    x: float,
    level: float,
    tolerance: float,
) -> ChordCut:
    """Chord of the line y = ``level`` through ``x`` in one ring (its edges as start and
    end coordinates), and the part above it."""
    x0, y0, x1, y1 = edges
    crossing = ((y0 <= level) & (level < y1)) | ((y1 <= level) & (level < y0))
    crossed = np.flatnonzero(crossing)
    if crossed.size < 2:
        return NO_MATERIAL
    at = x0[crossed] + (level - y0[crossed]) * (x1[crossed] - x0[crossed]) / (
        y1[crossed] - y0[crossed]
    )
    order = np.argsort(at, kind="stable")
    at, crossed = at[order], crossed[order]
    # Crossings pair up left to right into stretches of material (one ring, no holes).
    for left in range(0, len(at) - 1, 2):
        if at[left] - tolerance <= x <= at[left + 1] + tolerance:
            break
    else:
        return NO_MATERIAL
    start = (float(at[left]), level)
    end = (float(at[left + 1]), level)
    first_edge, last_edge = int(crossed[left]), int(crossed[left + 1])
    count = len(x0)

    def walk(from_edge: int, to_edge: int) -> list[tuple[float, float]]:
        """Vertices from the end of ``from_edge`` to the start of ``to_edge``, forwards."""
        vertices = []
        index = (from_edge + 1) % count
        while True:
            vertices.append((float(x0[index]), float(y0[index])))
            if index == to_edge:
                return vertices
            index = (index + 1) % count

    # Walking a counter-clockwise ring forward from the right end of the chord to its
    # left end and closing along the chord (left to right) keeps the material on the
    # left of travel: that is the part above. A clockwise ring walks the other way.
    if counter_clockwise:
        piece = [end, *walk(last_edge, first_edge), start]
    else:
        piece = [start, *walk(first_edge, last_edge), end]
    area, first_x, first_y = _polygon_first_moments(np.array(piece))
    sign = 1.0 if area >= 0 else -1.0
    return ChordCut(end[0] - start[0], sign * first_x, sign * first_y)
