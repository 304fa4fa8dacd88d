"""Placing labels where they neither cover material nor each other.

A label is tried at a short distance from its point in the preferred direction
(outward from the centroid, say), then in directions turned a little either
way, then further out; the first spot whose box is free of the obstacles wins.
Obstacles are boxes (other labels, dimension texts), segments (outline edges,
dimension lines) and filled regions (the material). If nothing is free, the
first candidate is used: a label that overlaps is better than a missing one.
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass, field

import numpy as np

from calcsheet.figures.style import FONT_SIZE
from calcsheet.figures.svg import Point, text_width
from calcsheet.mechanics.stresses import point_in_edges, ring_edges

_TURNS_DEGREES = (0, 25, -25, 50, -50, 75, -75, 105, -105, 135, -135, 180)
_DISTANCES = (3.0, 8.0, 15.0, 24.0, 36.0, 52.0, 72.0, 96.0)
_CENTRED = math.sin(math.radians(22.5))  # closer than this to an axis: centre the label on it


@dataclass(frozen=True)
class Box:
    """An axis-aligned rectangle in paper coordinates (y down)."""

    x0: float
    y0: float
    x1: float
    y1: float

    def padded(self, pad: float) -> Box:
        """The box grown by ``pad`` on every side."""
        return Box(self.x0 - pad, self.y0 - pad, self.x1 + pad, self.y1 + pad)

    def overlaps(self, other: Box) -> bool:
        """True when the two boxes share some area."""
        return (
            self.x0 < other.x1 and other.x0 < self.x1 and self.y0 < other.y1 and other.y0 < self.y1
        )

    @property
    def center(self) -> Point:
        """The middle of the box."""
        return (0.5 * (self.x0 + self.x1), 0.5 * (self.y0 + self.y1))


def text_box(center: Point, text: str, size: float = FONT_SIZE) -> Box:
    """The estimated box of ``text`` centred at ``center``."""
    half_width, half_height = text_width(text, size) / 2, size / 2
    return Box(
        center[0] - half_width,
        center[1] - half_height,
        center[0] + half_width,
        center[1] + half_height,
    )


def _segments_cross_box(box: Box, segments: np.ndarray, bounds: np.ndarray) -> bool:
    """Whether any of the segments (rows x0, y0, x1, y1) crosses ``box``.

    ``bounds`` (rows min x, min y, max x, max y of each segment) first drops the segments
    whose own box misses ``box``: most do, and a figure tries hundreds of label spots. The
    few left are clipped one by one (numpy's cost per call is more than their arithmetic).
    """
    if segments.size == 0:
        return False
    near = (
        (bounds[:, 0] <= box.x1)
        & (bounds[:, 2] >= box.x0)
        & (bounds[:, 1] <= box.y1)
        & (bounds[:, 3] >= box.y0)
    )
    return any(_segment_crosses_box(box, *row) for row in segments[near].tolist())


def _segment_crosses_box(box: Box, x0: float, y0: float, x1: float, y1: float) -> bool:
    """Liang-Barsky clipping of one segment against ``box``."""
    dx, dy = x1 - x0, y1 - y0
    t_enter, t_leave = 0.0, 1.0
    for p, q in ((-dx, x0 - box.x0), (dx, box.x1 - x0), (-dy, y0 - box.y0), (dy, box.y1 - y0)):
        if p == 0:
            if q < 0:
                return False
        elif p < 0:
            t_enter = max(t_enter, q / p)
        else:
            t_leave = min(t_leave, q / p)
    return t_enter <= t_leave


@dataclass
class Obstacles:
    """What a new label must keep clear of."""

    boxes: list[Box] = field(default_factory=list)
    segments: list[tuple[float, float, float, float]] = field(default_factory=list)
    regions: list[list[np.ndarray]] = field(default_factory=list)
    _segment_array: np.ndarray | None = None
    _segment_bounds: np.ndarray | None = None
    _region_edges: list[list[tuple[np.ndarray, ...]]] = field(default_factory=list)

    def add_box(self, box: Box) -> None:
        """Keep labels off this box (a placed label, a dimension text)."""
        self.boxes.append(box)

    def add_line(self, start: Point, end: Point) -> None:
        """Keep labels off this segment (a dimension line, an arrow)."""
        self.segments.append((start[0], start[1], end[0], end[1]))
        self._segment_array = None

    def add_region(self, rings: Sequence[np.ndarray]) -> None:
        """Keep labels off this filled region and its edges (the material)."""
        rings = [np.asarray(ring, dtype=float) for ring in rings]
        self.regions.append(rings)
        self._region_edges.append([ring_edges(ring) for ring in rings])
        for ring in rings:
            ends = np.roll(ring, -1, axis=0)
            self.segments.extend(
                (float(a[0]), float(a[1]), float(b[0]), float(b[1]))
                for a, b in zip(ring, ends, strict=True)
            )
        self._segment_array = None

    def blocks(self, box: Box) -> bool:
        """True when ``box`` touches any obstacle."""
        if any(box.overlaps(other) for other in self.boxes):
            return True
        if self._segment_array is None:
            ends = np.array(self.segments, dtype=float).reshape(-1, 4)
            self._segment_array = ends
            self._segment_bounds = np.column_stack(
                (
                    np.minimum(ends[:, 0], ends[:, 2]),
                    np.minimum(ends[:, 1], ends[:, 3]),
                    np.maximum(ends[:, 0], ends[:, 2]),
                    np.maximum(ends[:, 1], ends[:, 3]),
                )
            )
        if _segments_cross_box(box, self._segment_array, self._segment_bounds):
            return True
        x, y = box.center
        return any(point_in_edges(edges, x, y) for edges in self._region_edges)


def place_label(
    obstacles: Obstacles,
    anchor: Point,
    direction: Point,
    text: str,
    *,
    size: float = FONT_SIZE,
    gap: float = 2.0,
    turns: Sequence[float] = _TURNS_DEGREES,
    distances: Sequence[float] = _DISTANCES,
) -> tuple[Point, bool]:
    """The centre for ``text`` near ``anchor``, and whether it sits far enough to need a leader.

    The box is registered as an obstacle, so later labels keep clear of it.
    """
    length = math.hypot(*direction)
    base = math.atan2(direction[1], direction[0]) if length > 0 else -math.pi / 2
    width, height = text_width(text, size), size
    first: tuple[Point, Box] | None = None
    for distance in distances:
        for turn in turns:
            angle = base + math.radians(turn)
            ux, uy = math.cos(angle), math.sin(angle)
            # The box's nearest corner or edge goes to the candidate spot, as a drafter
            # sets a label beside, above or diagonally off a point.
            side_x = 0.0 if abs(ux) < _CENTRED else math.copysign(1.0, ux)
            side_y = 0.0 if abs(uy) < _CENTRED else math.copysign(1.0, uy)
            reach = distance + gap
            center = (
                anchor[0] + ux * reach + side_x * width / 2,
                anchor[1] + uy * reach + side_y * height / 2,
            )
            box = text_box(center, text, size)
            if first is None:
                first = (center, box)
            if not obstacles.blocks(box.padded(1.0)):
                obstacles.add_box(box)
                return center, distance > _DISTANCES[1]
    assert first is not None
    obstacles.add_box(first[1])
    return first[0], False
