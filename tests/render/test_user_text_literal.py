"""Text a user typed shows as typed: braces in a load's name are never a symbol mark.

A load called ``arm {M_x} \\{N}`` must read so on the HTML, in the PDF and in the JSON,
not as the symbol M with subscript x (calcsheet's own rule for marked text, see
``calcsheet.engine.marked_text``; no outside source applies).
"""

from __future__ import annotations

import html
import io
import json
import re

import pypdf

from calcsheet.calcs import member_sheet
from calcsheet.engine.marked_text import escape_marks, marked_pieces, plain_text, rich_text
from calcsheet.export.files import pdf_bytes
from calcsheet.mechanics import point_load
from calcsheet.pipeline.results import sheet_results
from calcsheet.render.html import render_html
from calcsheet.render.typst import render_typst
from calcsheet.sections import catalog_section

HOSTILE = "arm {M_x} \\{N} }{ \\\\"


def test_escaped_text_is_one_literal_piece_in_every_target():
    marked = f"Magnitude of {escape_marks(HOSTILE)}, {{P_1}}"
    assert marked_pieces(marked) == [(False, f"Magnitude of {HOSTILE}, "), (True, "P_1")]
    assert plain_text(marked) == f"Magnitude of {HOSTILE}, P_1"
    assert "<math>" not in rich_text(escape_marks(HOSTILE), "mathml")
    assert "$" not in rich_text(escape_marks(HOSTILE), "typst")


def _hostile_sheet():
    load = point_load(HOSTILE, z="96 in", components=("0 kip", "-10 kip", "0 kip"))
    return member_sheet(catalog_section("W10x49"), [load], length="96 in")


def _words(markup: str) -> str:
    """The HTML's text outside MathML, entities resolved."""
    outside = re.sub(r"<math.*?</math>|<svg.*?</svg>|<style.*?</style>", " ", markup, flags=re.S)
    return html.unescape(re.sub(r"<[^>]+>", " ", outside))


def test_a_load_name_with_braces_shows_literally_in_html_typst_pdf_and_json():
    sheet = _hostile_sheet()
    words = _words(render_html(sheet))
    assert f"Load 1: {HOSTILE} (type D)" in words
    assert words.count(HOSTILE) >= 2
    markup = render_typst(sheet)
    assert '#"Load 1: arm {M_x} \\\\{N} }{ \\\\\\\\ (type D)"' in markup  # a literal, no math
    assert 'arm #""$M_(x)$' not in markup and '$M_(x)$#" \\\\{N}' not in markup
    pdf_text = "".join(
        page.extract_text() for page in pypdf.PdfReader(io.BytesIO(pdf_bytes(sheet))).pages
    )
    assert "arm{M_x}\\{N}}{\\\\" in re.sub(r"\s+", "", pdf_text)
    results = json.dumps(sheet_results(sheet), ensure_ascii=False)
    assert json.dumps(f"Component of {HOSTILE} along y", ensure_ascii=False) in results


def test_a_note_quoting_a_load_name_shows_it_literally(tmp_path):
    """A load far from the centroid gets a note on the design basis quoting its name."""
    import tomllib

    from calcsheet.job import job_from_data
    from calcsheet.job.starter import STARTER
    from calcsheet.pipeline import build_sheets

    data = tomllib.loads(STARTER)
    data["loads"][0]["name"] = HOSTILE
    data["loads"][0]["ey"] = "-50 in"  # over 5 times the W8X31 depth: noted, not refused
    sheet = build_sheets(job_from_data(data, source="test")).sheets[0].sheet
    words = _words(render_html(sheet))
    assert "Notes on the inputs" in words
    assert f"Load {HOSTILE!r} is applied" in words  # the note quotes the name as repr()
