"""The one Typst escaper: markup characters stay text in markup, math and code.

The expected text is the input itself (what was typed is what is printed); the
Typst syntax facts (markup characters, string escapes) are from the Typst
reference, "Syntax" and "str" pages (typst.app/docs), from memory.
"""

from __future__ import annotations

import io

import pypdf
import pytest

from calcsheet.engine.typst_literal import typst_string
from calcsheet.export.files import compile_pdf

SPECIAL = ["#", "$", "*", "_", "@", "<", ">", "`", "\\", "[", "]", "/", '"', "=", "-", "+", "~"]


def _text_of(markup: str) -> str:
    data = compile_pdf("#set document(date: datetime(year: 2026, month: 1, day: 1))\n" + markup)
    reader = pypdf.PdfReader(io.BytesIO(data))
    return "".join(page.extract_text() for page in reader.pages)


@pytest.mark.parametrize("character", SPECIAL)
def test_each_special_character_is_escaped_or_left_as_is(character):
    literal = typst_string(f"a{character}b")
    assert literal.startswith('"') and literal.endswith('"')
    inner = literal[1:-1]
    if character in '\\"':
        assert inner == f"a\\{character}b"  # the only two escapes a string literal needs
    else:
        assert inner == f"a{character}b"


def test_special_characters_print_as_typed_in_markup_math_and_code():
    typed = 'a#b $c$ *d* _e_ @f <g> `h` \\i [j] /k/ "l" = - + ~'
    literal = typst_string(typed)
    markup = f"#{literal}\n\n$ {literal} $\n\n#text({literal})\n"
    shown = _text_of(markup)
    flat = "".join(shown.split())
    assert flat.count("".join(typed.split())) == 3, shown


def test_control_characters_dropped_newline_and_tab_kept_as_escapes():
    assert typst_string("a\x00b\x07c\rd") == '"abcd"'
    assert typst_string("a\nb\tc") == '"a\\nb\\tc"'


def test_breakable_text_gets_break_opportunities_in_long_runs_only():
    long_word = "x" * 45
    assert "\u200b" in typst_string(long_word, breakable=True)
    assert "\u200b" not in typst_string(long_word)
    assert "\u200b" not in typst_string("short words only", breakable=True)


def test_code_cannot_run_from_text():
    # A would-be injection closes nothing: it prints as typed.
    typed = '"); #panic("boom"); #("'
    shown = _text_of(f"#{typst_string(typed)}")
    assert "panic" in shown
