"""The sheet as a notebook output: everything needed to write its files later, without a kernel.

A displayed ``Sheet`` adds one JSON output of type :data:`SHEET_MIME_TYPE` next to its
HTML view (``Sheet._repr_mimebundle_``). The notebook then carries the finished
documents, so ``jupyter nbconvert --to calcsheet`` (``calcsheet.export.notebook``)
writes the PDF and HTML from the saved file alone. Notebook front ends do not know the
type and show the HTML view instead.

This module is imported by the engine on every display, so it must stay light: the
renderers are imported when a payload is built, and nbconvert never.
"""

from __future__ import annotations

from dataclasses import asdict
from typing import TYPE_CHECKING, Any

if TYPE_CHECKING:
    from calcsheet.engine import Sheet

SHEET_MIME_TYPE = "application/vnd.calcsheet.sheet+json"

# Raised whenever a key changes meaning, so an exporter can refuse a payload it cannot read.
PAYLOAD_VERSION = 1


def sheet_payload(sheet: Sheet) -> dict[str, Any]:
    """The sheet as a JSON-serializable dict: the same sheet gives the same dict.

    Keys: ``version``, ``title``, ``title_block`` (field name to text), ``html`` (the
    standalone document) and ``typst`` (markup for the PDF, letter paper by default;
    ``calcsheet.render.typst.paper_inputs`` picks the paper when it is compiled).
    """
    from calcsheet.render.html import render_html
    from calcsheet.render.typst import render_typst

    return {
        "version": PAYLOAD_VERSION,
        "title": sheet.title,
        "title_block": {name: str(value) for name, value in asdict(sheet.title_block).items()},
        "html": render_html(sheet),
        "typst": render_typst(sheet),
    }
