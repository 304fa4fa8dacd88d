"""HTML: one self-contained file (MathML, inline SVG and styles, no scripts, no network)."""

from __future__ import annotations

from calcsheet.engine import Sheet
from calcsheet.render.templates import html_environment
from calcsheet.render.view import build_view


def render_html(sheet: Sheet) -> str:
    """The whole sheet as a standalone HTML document."""
    template = html_environment().get_template("sheet.html.j2")
    return template.render(view=build_view(sheet, "mathml"), fragment=False)


def render_fragment(sheet: Sheet) -> str:
    """The sheet as an HTML fragment, for display inside a notebook."""
    template = html_environment().get_template("sheet.html.j2")
    return template.render(view=build_view(sheet, "mathml"), fragment=True)
