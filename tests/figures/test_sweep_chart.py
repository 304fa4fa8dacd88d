"""The load-direction sweep chart: its two marks' labels stay apart and off the axes."""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.figures.chart import sweep_chart
from tests.figures.svgtools import parse, text_boxes


@pytest.mark.parametrize("drawn_deg", [145.0, 150.0, 155.0, 0.0, 360.0])
def test_worst_and_drawn_labels_do_not_overlap_anything(drawn_deg):
    # A utilization curve peaking at 150° (invented shape, for layout only).
    angles = np.arange(0.0, 361.0, 5.0)
    values = 0.5 + 0.4 * np.sin(np.radians(angles - 60.0))
    drawn_value = float(0.5 + 0.4 * np.sin(np.radians(drawn_deg - 60.0)))
    boxes = text_boxes(
        parse(sweep_chart(angles, values, drawn=(drawn_deg, drawn_value), title="sweep"))
    )
    for index, (words, box) in enumerate(boxes):
        for other_words, other in boxes[index + 1 :]:
            assert not box.padded(-0.5).overlaps(other.padded(-0.5)), (words, other_words)
