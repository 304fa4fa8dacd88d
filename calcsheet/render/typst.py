"""Typst markup of a sheet, for the PDF."""

from __future__ import annotations

from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.render.templates import typst_environment
from calcsheet.render.view import build_view

PAPER_SIZES = {"letter": "us-letter", "a4": "a4"}

# The page setup reads the paper from this Typst `sys.inputs` key when it is given, so
# markup rendered once (say, stored in a notebook) can still be printed on either paper.
PAPER_INPUT = "calcsheet-paper"


def typst_paper(paper: str) -> str:
    """Typst's name for ``paper`` (``letter`` or ``a4``); anything else is refused."""
    try:
        return PAPER_SIZES[paper.lower()]
    except (KeyError, AttributeError):
        raise InputError("paper", paper, "'letter' or 'a4'") from None


def paper_inputs(paper: str) -> dict[str, str]:
    """The Typst ``sys_inputs`` that print markup from :func:`render_typst` on ``paper``."""
    return {PAPER_INPUT: typst_paper(paper)}


def render_typst(sheet: Sheet, *, paper: str = "letter") -> str:
    """The whole sheet as Typst markup; ``paper`` is ``letter`` or ``a4``.

    ``paper`` is the default; compiling with :func:`paper_inputs` overrides it.
    """
    template = typst_environment().get_template("sheet.typ.j2")
    return template.render(
        view=build_view(sheet, "typst"), paper=typst_paper(paper), paper_input=PAPER_INPUT
    )
