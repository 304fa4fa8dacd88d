"""The one way text reaches Typst: as a string literal, which Typst shows and never runs.

Every printer and template that puts text into Typst markup (the step printer's words
and units, the templates' user text, an SVG drawing handed to ``image``) goes through
:func:`typst_string`. Inside a Typst string literal only the backslash and the double
quote are special, so markup characters (``#``, ``$``, ``*``, ``_``, ``@``, ``<``,
backticks, brackets, ``/``) stay text and no code can run: in markup the literal is
shown with ``#"..."``, in math as ``"..."``, in code as it is.
"""

from __future__ import annotations

import re

# Control characters other than tab, newline and carriage return: no PDF text or SVG
# holds them, and a Typst string literal has no escape for them.
_CONTROL = re.compile(r"[\x00-\x08\x0b\x0c\x0e-\x1f\x7f]")
# Typst breaks lines only between words; a longer run gets invisible break points.
_LONG_RUN = re.compile(r"\S{20}(?=\S)")
_BREAK_OPPORTUNITY = "\u200b"
# In this order: the backslash first, so the escapes added after it stay single. (A chain
# of replace() is several times faster than str.translate on a drawing's 50 kB.)
_ESCAPES = (("\\", "\\\\"), ('"', '\\"'), ("\n", "\\n"), ("\r", ""), ("\t", "\\t"))


def typst_string(value: object, *, breakable: bool = False) -> str:
    """``value`` as a Typst string literal, quotes included, every character shown as it is.

    Control characters that no text holds, and carriage returns, are dropped; newline
    and tab are kept as escapes. With ``breakable`` (text set in running markup), a run of
    more than 20 characters without a space gets zero-width break opportunities, so a
    2,000-character word wraps instead of running off the page.
    """
    text = _CONTROL.sub("", str(value))
    if breakable:
        text = _LONG_RUN.sub(lambda run: run[0] + _BREAK_OPPORTUNITY, text)
    for character, escaped in _ESCAPES:
        text = text.replace(character, escaped)
    return f'"{text}"'
