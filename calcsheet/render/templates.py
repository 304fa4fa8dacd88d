"""The jinja2 environments for the HTML and Typst templates shipped in calcsheet.templates."""

from __future__ import annotations

from functools import lru_cache

import jinja2
import markupsafe

from calcsheet.engine.marked_text import rich_text
from calcsheet.engine.typst_literal import typst_string


def typst_data(value: object) -> str:
    """Data (an SVG drawing) as a Typst string literal, every character kept as it is."""
    return typst_string(value)


def typst_text(value: object) -> str:
    """User text as a Typst string literal, shown literally with ``#"..."`` in markup;
    long runs without a space may break (see :func:`typst_string`)."""
    return typst_string(value, breakable=True)


def html_rich(value: object) -> markupsafe.Markup:
    """Words with ``{symbol}`` marks as HTML: words escaped, symbols as inline MathML."""
    return markupsafe.Markup(rich_text(str(value), "mathml"))


def typst_rich(value: object) -> str:
    """Words with ``{symbol}`` marks as Typst markup: words as string literals (``#"..."``),
    symbols as inline math. For markup; in code, put it in brackets (``[...]``)."""
    return rich_text(str(value), "typst", breakable=True)


@lru_cache(maxsize=1)
def _compiled_template_cache() -> jinja2.BytecodeCache | None:
    """Templates compiled once per machine, not in every process (a tenth of a cold build).

    jinja2's file cache in the user's private temporary folder (created 0700 and
    refused if another user owns it, as the compiled code is loaded and run); an entry
    is used only while its template's text is unchanged. None, and templates compiled
    each time, where no such folder can be made.
    """
    try:
        return jinja2.FileSystemBytecodeCache()
    except (OSError, RuntimeError):
        return None


@lru_cache(maxsize=1)
def html_environment() -> jinja2.Environment:
    """HTML templates with autoescaping: user text can never become markup."""
    environment = jinja2.Environment(
        loader=jinja2.PackageLoader("calcsheet.templates", "."),
        autoescape=True,
        undefined=jinja2.StrictUndefined,
        trim_blocks=True,
        lstrip_blocks=True,
        bytecode_cache=_compiled_template_cache(),
    )
    environment.filters["rich"] = html_rich
    return environment


@lru_cache(maxsize=1)
def typst_environment() -> jinja2.Environment:
    """Typst templates: every user value passes the ``text`` filter (a string literal)."""
    environment = jinja2.Environment(
        loader=jinja2.PackageLoader("calcsheet.templates", "."),
        autoescape=False,
        undefined=jinja2.StrictUndefined,
        trim_blocks=True,
        lstrip_blocks=True,
        bytecode_cache=_compiled_template_cache(),
    )
    environment.filters["text"] = typst_text
    environment.filters["data"] = typst_data
    environment.filters["rich"] = typst_rich
    return environment
