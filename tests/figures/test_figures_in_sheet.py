"""Figures in a sheet: inline in the HTML, embedded with readable text in the PDF."""

from __future__ import annotations

import io

import pypdf

from calcsheet.engine import Sheet
from calcsheet.export.files import pdf_bytes
from calcsheet.figures import member_figure, normal_stress_figure, section_figure
from calcsheet.mechanics.loads import point_load
from calcsheet.render.html import render_html
from calcsheet.sections import catalog_section, plate


def _sheet() -> Sheet:
    section = catalog_section("W10X33")
    sheet = Sheet("Figures")
    sheet.figure(section_figure(section), "W10X33 to scale")
    sheet.figure(normal_stress_figure(section, "20 kip", "30 kip*ft", "5 kip*ft"), "σ at the cut")
    load = point_load("P <&>", z="48 in", magnitude="2.4 kip", angle="35 deg", ey="-4 in")
    sheet.figure(member_figure("48 in", "0 in", [load], section=section), "")
    sheet.figure(
        lambda _: section_figure(plate("300 mm", "20 mm", name='PL "A" \\ #1')), "drawn late"
    )
    return sheet


def test_figures_compile_into_the_pdf_with_their_text():
    data = pdf_bytes(_sheet())
    assert data.startswith(b"%PDF")
    text = " ".join(page.extract_text() for page in pypdf.PdfReader(io.BytesIO(data)).pages)
    flat = " ".join(text.split())
    for expected in (
        "tf = 0.435 in",
        "N.A.",
        "P <&> = 2.40 kip",
        'PL "A" \\ #1',
        "W10X33 to scale",
    ):
        assert expected in flat


def test_figures_are_inline_svg_in_the_html():
    html = render_html(_sheet())
    assert html.count("<svg") == 4
    assert "P &lt;&amp;&gt; = 2.40 kip" in html
    assert "<script" not in html
