"""Label placement's clipping test: the one-segment and the array form agree.

Both are Liang-Barsky clipping (Liang and Barsky, ACM Transactions on Graphics 3(1),
1984, from memory); the first test checks the two forms against each other, the second
three cases whose answer is plain geometry (common practice, no source).
"""

from __future__ import annotations

import numpy as np
import pytest

import calcsheet.figures.labels as labels
from calcsheet.figures.labels import Box


def test_one_by_one_and_array_clipping_agree(monkeypatch: pytest.MonkeyPatch) -> None:
    rng = np.random.default_rng(3)
    for _ in range(5000):
        x0, x1 = sorted(rng.uniform(0, 10, 2))
        y0, y1 = sorted(rng.uniform(0, 10, 2))
        box = Box(x0, y0, x1, y1)
        # Whole numbers too: segments on a box edge, parallel to it, or of zero length.
        decimals = 0 if rng.random() < 0.3 else 3
        segments = np.round(rng.uniform(-2, 12, (int(rng.integers(1, 6)), 4)), decimals)
        monkeypatch.setattr(labels, "_FEW_SEGMENTS", 0)
        by_arrays = labels._segments_cross_box(box, segments)
        monkeypatch.setattr(labels, "_FEW_SEGMENTS", 16)
        one_by_one = labels._segments_cross_box(box, segments)
        assert by_arrays == one_by_one, (box, segments)


def test_a_segment_through_a_box_crosses_it_and_one_beside_does_not() -> None:
    box = Box(0.0, 0.0, 1.0, 1.0)
    assert labels._segment_crosses_box(box, -1.0, 0.5, 2.0, 0.5)  # through the middle
    assert not labels._segment_crosses_box(box, -1.0, 1.5, 2.0, 1.5)  # above it
    assert labels._segment_crosses_box(box, 0.2, 0.2, 0.3, 0.3)  # wholly inside
