"""The jinja2 environments for the HTML and Typst templates shipped in calcsheet.templates."""

from __future__ import annotations

from functools import lru_cache

import jinja2

from calcsheet.engine.typst_literal import typst_string


def typst_data(value: object) -> str:
    """Data (an SVG drawing) as a Typst string literal, every character kept as it is."""
    return typst_string(value)


def typst_text(value: object) -> str:
    """User text as a Typst string literal, shown literally with ``#"..."`` in markup;
    long runs without a space may break (see :func:`typst_string`)."""
    return typst_string(value, breakable=True)


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
    environment.filters["text"] = typst_text
    environment.filters["data"] = typst_data
    return environment
