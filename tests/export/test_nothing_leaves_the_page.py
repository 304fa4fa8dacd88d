"""A corpus of generated sheets: every glyph lies on the page.

The corpus is random members and loads (seeded, so a failure repeats) with long
names and awkward numbers: open and closed sections, unsymmetric angles, the
generic check and AISC 360-22, both paper sizes. The PDF is read back with
pdfminer.six (character boxes as laid out); the figures' SVG text boxes are
estimated as the figure code estimates them (:func:`calcsheet.figures.svg.text_width`).
"""

from __future__ import annotations

import io
import random
from collections.abc import Iterator

import pytest
from pdfminer.high_level import extract_pages
from pdfminer.layout import LTChar

from calcsheet.calcs.design import DesignBasis
from calcsheet.calcs.member import member_sheet
from calcsheet.engine import Sheet, TitleBlock
from calcsheet.errors import InputError
from calcsheet.export.files import pdf_bytes
from calcsheet.mechanics import point_load
from calcsheet.sections import catalog_section

LONG_NAME = "bracket load from the sign support lug on the north face, grid line 14"
# (section, check kind, paper): the shapes whose sheets run widest (unsymmetric
# angles and channels print the longest shear formulas).
CORPUS = (
    ("L6X4X1/2", "allowable stress", "letter"),
    ("C10X15.3", "allowable stress", "a4"),
    ("WT8X25", "allowable stress", "letter"),
    ("L3X3X3/16", "AISC 360-22", "a4"),
    ("W14X48", "AISC 360-22", "letter"),
    ("HSS8X4X1/4", "AISC 360-22", "a4"),
)


def corpus_sheet(index: int) -> tuple[Sheet, str]:
    """Member ``index`` of the corpus, with its paper size."""
    designation, kind, paper = CORPUS[index]
    rng = random.Random(1000 + index)
    length = rng.uniform(40.0, 160.0)
    loads = [
        point_load(
            LONG_NAME,
            z=f"{rng.uniform(0.5, 1.0) * length:.3f} in",
            magnitude=f"{rng.uniform(0.5, 300.0):.4f} kip",
            angle=f"{rng.uniform(-180.0, 180.0):.3f} deg",
            from_axis="+z",
            toward_axis=rng.choice(("-y", "+x", "-x")),
            ex=f"{rng.uniform(-20.0, 20.0):.4f} in",
            ey=f"{rng.uniform(-20.0, 20.0):.4f} in",
        ),
        point_load(
            "wind",
            z=f"{length:.3f} in",
            components=(f"{rng.uniform(-9, 9):.3f} kip", "-1.23456 kip", "0.001 kip"),
        ),
    ]
    block = TitleBlock(
        project="Long project name for a mixed-use tower podium, level 3 transfer " * 2,
        subject=f"{LONG_NAME}, {designation}",
        calc_number="S-2026-000123-REV-B",
    )
    sheet = member_sheet(
        catalog_section(designation),
        loads,
        length=f"{length:.3f} in",
        station=f"{rng.uniform(0.0, 0.2) * length:.3f} in",
        title=f"Member {designation}: {LONG_NAME}",
        title_block=block,
        design=DesignBasis(kind=kind),
        load_types=["D", "W"],
    )
    return sheet, paper


def _characters(item: object) -> Iterator[LTChar]:
    if isinstance(item, LTChar):
        yield item
    elif hasattr(item, "__iter__"):
        for child in item:  # type: ignore[attr-defined]
            yield from _characters(child)


@pytest.mark.parametrize("index", range(len(CORPUS)), ids=[entry[0] for entry in CORPUS])
def test_every_glyph_lies_inside_the_page(index: int) -> None:
    try:
        sheet, paper = corpus_sheet(index)
    except InputError as error:  # a shape a check refuses is no page to look at
        pytest.skip(str(error))
    outside = []
    for page in extract_pages(io.BytesIO(pdf_bytes(sheet, paper=paper))):
        left, bottom, right, top = page.bbox
        # Inside the paper with a margin: a glyph in the last few points of the
        # sheet is cut by any printer.
        margin = 18.0
        for glyph in _characters(page):
            if (
                glyph.x0 < left + margin
                or glyph.x1 > right - margin
                or glyph.y0 < bottom + margin
                or glyph.y1 > top - margin
            ):
                outside.append((page.pageid, glyph.get_text(), round(glyph.x0), round(glyph.y0)))
    assert not outside, f"glyphs outside the page: {outside[:10]}"
