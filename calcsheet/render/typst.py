"""Typst markup of a sheet, for the PDF."""

from __future__ import annotations

from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.render.templates import typst_environment
from calcsheet.render.view import build_view

PAPER_SIZES = {"letter": "us-letter", "a4": "a4"}


def render_typst(sheet: Sheet, *, paper: str = "letter") -> str:
    """The whole sheet as Typst markup; ``paper`` is ``letter`` or ``a4``."""
    try:
        typst_paper = PAPER_SIZES[paper.lower()]
    except (KeyError, AttributeError):
        raise InputError("paper", paper, "'letter' or 'a4'") from None
    template = typst_environment().get_template("sheet.typ.j2")
    return template.render(view=build_view(sheet, "typst"), paper=typst_paper)
