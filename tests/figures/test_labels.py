"""Label placement's clipping: one segment at a time, checked against an array form.

Both are Liang-Barsky clipping (Liang and Barsky, ACM Transactions on Graphics 3(1),
1984, from memory). The first test checks label placement's form against the array
form kept here as the reference; the second, three cases whose answer is plain
geometry (common practice, no source).
"""

from __future__ import annotations

import numpy as np

import calcsheet.figures.labels as labels
from calcsheet.figures.labels import Box


def _clipped_as_arrays(box: Box, segments: np.ndarray) -> bool:
    """The reference: Liang-Barsky over all segments at once, in numpy (the form label
    placement used before it clipped the few near segments one by one)."""
    x0, y0, x1, y1 = segments.T
    dx, dy = x1 - x0, y1 - y0
    t_enter, t_leave = np.zeros_like(x0), np.ones_like(x0)
    possible = np.ones_like(x0, dtype=bool)
    for p, q in ((-dx, x0 - box.x0), (dx, box.x1 - x0), (-dy, y0 - box.y0), (dy, box.y1 - y0)):
        parallel = p == 0
        possible &= ~(parallel & (q < 0))
        with np.errstate(divide="ignore", invalid="ignore"):
            ratio = np.where(parallel, 0.0, q / np.where(parallel, 1.0, p))
        t_enter = np.where(~parallel & (p < 0), np.maximum(t_enter, ratio), t_enter)
        t_leave = np.where(~parallel & (p > 0), np.minimum(t_leave, ratio), t_leave)
    return bool(np.any(possible & (t_enter <= t_leave)))


def test_one_by_one_and_array_clipping_agree() -> None:
    rng = np.random.default_rng(3)
    for _ in range(5000):
        x0, x1 = sorted(rng.uniform(0, 10, 2))
        y0, y1 = sorted(rng.uniform(0, 10, 2))
        box = Box(x0, y0, x1, y1)
        # Whole numbers too: segments on a box edge, parallel to it, or of zero length.
        decimals = 0 if rng.random() < 0.3 else 3
        segments = np.round(rng.uniform(-2, 12, (int(rng.integers(1, 6)), 4)), decimals)
        bounds = np.column_stack(
            (
                np.minimum(segments[:, 0], segments[:, 2]),
                np.minimum(segments[:, 1], segments[:, 3]),
                np.maximum(segments[:, 0], segments[:, 2]),
                np.maximum(segments[:, 1], segments[:, 3]),
            )
        )
        by_arrays = _clipped_as_arrays(box, segments)
        one_by_one = labels._segments_cross_box(box, segments, bounds)
        assert by_arrays == one_by_one, (box, segments)


def test_a_segment_through_a_box_crosses_it_and_one_beside_does_not() -> None:
    box = Box(0.0, 0.0, 1.0, 1.0)
    assert labels._segment_crosses_box(box, -1.0, 0.5, 2.0, 0.5)  # through the middle
    assert not labels._segment_crosses_box(box, -1.0, 1.5, 2.0, 1.5)  # above it
    assert labels._segment_crosses_box(box, 0.2, 0.2, 0.3, 0.3)  # wholly inside
