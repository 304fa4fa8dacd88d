"""The jinja2 environments for the HTML and Typst templates shipped in calcsheet.templates."""

from __future__ import annotations

import re
from functools import lru_cache

import jinja2

_CONTROL = re.compile(r"[\x00-\x08\x0b\x0c\x0e-\x1f\x7f]")
# Typst breaks lines only between words; a longer run gets invisible break points.
_LONG_RUN = re.compile(r"\S{20}(?=\S)")
_BREAK_OPPORTUNITY = "\u200b"


def typst_data(value: object) -> str:
    """Data (an SVG drawing) as a Typst string literal, every character kept as it is."""
    text = str(value).replace("\\", "\\\\").replace('"', '\\"')
    text = text.replace("\r", "").replace("\n", "\\n")
    return f'"{text}"'


def typst_string(value: object) -> str:
    """User text as a Typst string literal, shown literally with ``#"..."`` in markup.

    Inside a string literal only the backslash and the quote are special, so
    markup characters (``#``, ``$``, ``*``, ``_``, ``@``, ``<``) stay text and no
    code can run. Control characters are dropped; newlines are kept as ``\\n``. A run
    of more than 20 characters without a space gets zero-width break opportunities,
    so a 2,000-character word wraps instead of running off the page.
    """
    text = _CONTROL.sub("", str(value))
    text = _LONG_RUN.sub(lambda run: run[0] + _BREAK_OPPORTUNITY, text)
    text = text.replace("\\", "\\\\").replace('"', '\\"').replace("\r", "").replace("\n", "\\n")
    return f'"{text}"'


@lru_cache(maxsize=1)
def html_environment() -> jinja2.Environment:
    """HTML templates with autoescaping: user text can never become markup."""
    return jinja2.Environment(
        loader=jinja2.PackageLoader("calcsheet.templates", "."),
        autoescape=True,
        undefined=jinja2.StrictUndefined,
        trim_blocks=True,
        lstrip_blocks=True,
    )


@lru_cache(maxsize=1)
def typst_environment() -> jinja2.Environment:
    """Typst templates: every user value passes the ``text`` filter (a string literal)."""
    environment = jinja2.Environment(
        loader=jinja2.PackageLoader("calcsheet.templates", "."),
        autoescape=False,
        undefined=jinja2.StrictUndefined,
        trim_blocks=True,
        lstrip_blocks=True,
    )
    environment.filters["text"] = typst_string
    environment.filters["data"] = typst_data
    return environment
