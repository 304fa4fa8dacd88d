"""Symbols in words ({M_x}): one mark, typeset in HTML and PDF, plain in JSON and text."""

from __future__ import annotations

import io
import json

import pypdf

from calcsheet.demo import outrigger_sheet
from calcsheet.engine import Sheet
from calcsheet.engine.marked_text import marked_pieces, plain_text, rich_text
from calcsheet.export.files import pdf_bytes
from calcsheet.pipeline.results import sheet_results
from calcsheet.render.html import render_html
from calcsheet.render.typst import render_typst


def test_marks_split_words_and_symbols():
    assert marked_pieces("Term from {M_x} at {y_3}") == [
        (False, "Term from "),
        (True, "M_x"),
        (False, " at "),
        (True, "y_3"),
    ]


def test_braces_that_are_not_a_symbol_name_stay_text():
    for text in ("a {set} of {1, 2}", "{not a name}", "{}", "{x-y}"):
        assert plain_text(text) == text.replace("{set}", "set")
    assert marked_pieces("{1, 2}") == [(False, "{1, 2}")]


def test_plain_text_names_the_symbol_with_greek_letters():
    assert plain_text("σ from {M_x}; {sigma_vm} and {tau_max}") == ("σ from M_x; σ_vm and τ_max")


def test_html_escapes_words_and_sets_symbols_as_mathml():
    html = rich_text("<b>{M_x}</b> & co", "mathml")
    assert html.startswith("&lt;b&gt;<math><msub><mi>M</mi><mi>x</mi></msub></math>")
    assert "&amp; co" in html


def test_typst_words_are_literals_and_symbols_math():
    assert rich_text('#{M_x} "q"', "typst") == '#"#"$M_(x)$#" \\"q\\""'
    assert rich_text("", "typst") == '#""'


def _marked_sheet() -> Sheet:
    sheet = Sheet("Marks")
    with sheet:
        sheet.heading("Moments {M_x} and $M_y$ #x")
        sheet.text("Bending: {sigma} = {M_x}·{y}/{I_x}; *not bold* _nor_ @label <tag>")
        M_x = sheet.input("M_x", "10 kip*ft", "Moment about x, {M_x}")
        sheet.table(["Point", "{sigma} from {M_x}"], [["1", M_x]], caption="Terms of {M_x}")
    return sheet


def test_sheet_marks_render_in_html_pdf_and_stay_plain_in_json():
    sheet = _marked_sheet()
    html = render_html(sheet)
    assert "{M_x}" not in html
    assert "<msub><mi>M</mi><mi>x</mi></msub>" in html
    assert "M_x" not in html.split("<body>")[1].replace('"M_x"', "")
    markup = render_typst(sheet)
    assert "$M_(x)$" in markup
    text = "".join(
        page.extract_text() for page in pypdf.PdfReader(io.BytesIO(pdf_bytes(sheet))).pages
    )
    assert "{" not in text and "M_x" not in text
    assert "*not bold* _nor_ @label <tag>" in text  # markup characters of the words as typed
    results = json.dumps(sheet_results(sheet), ensure_ascii=False)
    assert "Moment about x, M_x" in results and "{M_x}" not in results


def test_demo_has_no_raw_underscore_symbols_in_headers_or_captions():
    markup = render_typst(outrigger_sheet())
    for raw in ("M_x and M_y", '"Q_x above"', '"σ from Mx"', '"Vx"'):
        assert raw not in markup
