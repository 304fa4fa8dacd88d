"""The figures of a corpus of generated sheets: no two labels on top of each other.

The corpus is that of tests/export/test_nothing_leaves_the_page.py (random members
and loads, long names). Text boxes are estimated as the figure code estimates them
(:func:`calcsheet.figures.svg.text_width`), from the SVG as written.
"""

from __future__ import annotations

from collections.abc import Iterator

import pytest

from calcsheet.engine import Sheet
from calcsheet.engine.parts import Figure
from calcsheet.errors import InputError
from tests.export.test_nothing_leaves_the_page import CORPUS, corpus_sheet
from tests.figures.svgtools import parse, text_boxes


def _figures(sheet: Sheet) -> Iterator[tuple[str, str]]:
    for part in sheet.parts:
        if isinstance(part, Figure):
            yield part.caption, part.svg(sheet) if callable(part.svg) else part.svg


@pytest.mark.parametrize("index", range(len(CORPUS)), ids=[entry[0] for entry in CORPUS])
def test_no_two_figure_labels_overlap(index: int) -> None:
    try:
        sheet, _ = corpus_sheet(index)
    except InputError as error:  # a shape a check refuses has no figures to look at
        pytest.skip(str(error))
    overlaps = []
    for caption, svg in _figures(sheet):
        boxes = text_boxes(parse(svg))
        for first, (words, box) in enumerate(boxes):
            for other_words, other in boxes[first + 1 :]:
                # Half a point of shared edge is the estimate's own slack.
                if box.padded(-0.5).overlaps(other.padded(-0.5)):
                    overlaps.append((caption[:40], words, other_words))
    assert not overlaps, f"labels on top of each other: {overlaps[:10]}"
