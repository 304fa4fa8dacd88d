"""Symbols in words: ``{M_x}`` in a heading, a paragraph, a caption, a table header or a
description is the symbol M with subscript x, typeset as the sheet's equations set it.

A calc author writes ``"Term from {M_x}"``; the HTML shows MathML, the PDF Typst math
and every plain output (JSON, the command line, plain text) ``"Term from M_x"``. Only a
valid symbol name (see :mod:`calcsheet.engine.names`) between braces is a mark: other
braces are text. The words between marks are escaped for the target, so a mark can
never smuggle in markup.

Text a user typed (a load's name, a combination's) is put into marked text through
:func:`escape_marks`, so it always shows as typed: ``\\{``, ``\\}`` and ``\\\\`` stand for
a literal brace and backslash, and every output turns them back.
"""

from __future__ import annotations

import html
import re
from functools import lru_cache

from calcsheet.engine.names import GREEK_LETTERS, parse_symbol_name
from calcsheet.engine.printers import PRINTERS
from calcsheet.engine.typst_literal import typst_string

# An escaped brace or backslash (group 1), or a mark (group 2).
_TOKEN = re.compile(r"\\([\\{}])|\{([A-Za-z][A-Za-z0-9]*(?:_[A-Za-z0-9]+)*)\}")

__all__ = ["MarkedText", "escape_marks", "marked_pieces", "plain_text", "rich_text"]


class MarkedText(str):
    """Words that carry ``{symbol}`` marks, for a place that otherwise shows its text as
    typed: a table's text cell (``MarkedText("1: peak of {V_x} shear")``). Other cells
    may hold a user's text (a support's, a combination's name) and print literally."""

    __slots__ = ()

    def __str__(self) -> str:  # ``str(cell)`` keeps the mark that the text is marked
        return self


def escape_marks(text: object) -> str:
    """``text`` (typed by a user) for a place that reads marks: it shows literally,
    ``"beam {M_x}"`` as those characters and never as a symbol."""
    return str(text).replace("\\", "\\\\").replace("{", "\\{").replace("}", "\\}")


def marked_pieces(text: str) -> list[tuple[bool, str]]:
    """``text`` as (is a symbol, content) pieces in order; empty words are left out."""
    if "{" not in text and "\\" not in text:  # most words: no mark, nothing escaped
        return [(False, text)] if text else []
    pieces: list[tuple[bool, str]] = []
    words: list[str] = []  # the text since the last mark, escapes resolved
    position = 0
    for found in _TOKEN.finditer(text):
        if found[2] is not None and len(found[2]) > 32:  # longer than any symbol name: text
            continue
        words.append(text[position : found.start()])
        position = found.end()
        if found[1] is not None:
            words.append(found[1])
            continue
        if "".join(words):
            pieces.append((False, "".join(words)))
        words = []
        pieces.append((True, found[2]))
    words.append(text[position:])
    if "".join(words):
        pieces.append((False, "".join(words)))
    return pieces


def plain_text(text: str) -> str:
    """``text`` with each mark replaced by the symbol's name, a Greek letter's name by the
    letter (``{M_x}`` -> ``M_x``, ``{sigma_vm}`` -> ``σ_vm``)."""
    return "".join(
        _plain_symbol(content) if is_symbol else content
        for is_symbol, content in marked_pieces(str(text))
    )


def _plain_symbol(name: str) -> str:
    return "_".join(GREEK_LETTERS.get(part, part) for part in name.split("_"))


@lru_cache(maxsize=1024)
def _symbol(name: str, target: str) -> str:
    return PRINTERS[target]().symbol_name(parse_symbol_name(name))


def rich_text(text: str, target: str, *, breakable: bool = False) -> str:
    """``text`` for ``target``: ``mathml`` gives HTML (words escaped, symbols as inline
    MathML), ``typst`` gives Typst markup (words as ``#"..."`` literals, symbols as
    inline math), ``plain`` gives :func:`plain_text`. ``breakable``: long words may
    wrap in Typst (see :func:`~calcsheet.engine.typst_literal.typst_string`)."""
    if target == "plain":
        return plain_text(text)
    out = []
    for is_symbol, content in marked_pieces(str(text)):
        if target == "mathml":
            out.append(
                f"<math>{_symbol(content, target)}</math>" if is_symbol else html.escape(content)
            )
        elif target == "typst":
            out.append(
                f"${_symbol(content, target)}$"
                if is_symbol
                else "#" + typst_string(content, breakable=breakable)
            )
        else:
            raise ValueError(f"no rich text for target {target!r}")
    # An empty text still gives valid markup (an empty string literal in Typst).
    return "".join(out) if out else ("" if target == "mathml" else '#""')
