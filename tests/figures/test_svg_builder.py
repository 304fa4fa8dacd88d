"""The SVG builder: escaping, fixed number format, an extent that holds everything drawn."""

from __future__ import annotations

import pytest

from calcsheet.engine.marked_text import MarkedText, escape_marks
from calcsheet.figures.svg import SUBSCRIPT_SCALE, Svg, number, text_width
from tests.figures.svgtools import SVG, drawn_width, parse, texts


def test_numbers_have_fixed_decimals_and_no_negative_zero():
    assert number(1.0 / 3.0) == "0.33"
    assert number(-0.0001) == "0"
    assert number(12.5) == "12.5"
    assert number(-7.0) == "-7"


def test_text_and_attributes_are_escaped():
    svg = Svg(title='<script>alert(1)</script> & "quoted"')
    svg.text((0, 0), "<b>bold</b> & more\x00")
    svg.element("rect", {"class": '" onload="x', "width": 3.0})
    out = svg.render()
    root = parse(out)
    assert "<script" not in out
    assert not [element for element in root.iter() if element.tag.endswith("script")]
    assert texts(root) == ["<b>bold</b> & more"]  # the NUL XML cannot hold is dropped
    assert root.find(f"{SVG}title").text == '<script>alert(1)</script> & "quoted"'
    rect = root.find(f"{SVG}rect")
    assert rect.get("class") == '" onload="x'
    assert rect.get("onload") is None


def test_view_box_holds_the_text_drawn():
    svg = Svg()
    svg.line((0, 0), (10, 0))
    svg.text((5, 40), "a long label for the extent", anchor="start")
    root = parse(svg.render(margin=0))
    left, top, width, height = (float(v) for v in root.get("viewBox").split())
    assert left <= 0 and top <= 0
    assert left + width >= 5 + 100  # 27 characters at 12 px are wider than 100 px
    assert top + height >= 46
    assert root.get("xmlns") is None  # ElementTree turns the namespace into the tag
    assert root.tag == f"{SVG}svg"


def test_a_marked_label_draws_its_subscripts_as_subscripts():
    """``{e_y}`` in a label is e with a smaller, lowered subscript y, the letters italic as
    the sheet's math sets them (calcsheet's own style, common practice, no source); the
    words after it return to the baseline."""
    svg = Svg()
    svg.text((0, 0), MarkedText("{e_y} = 2 in, {sigma_max}"), size=10)
    root = parse(svg.render())
    (text,) = root.iter(f"{SVG}text")
    pieces = list(text.iter(f"{SVG}tspan"))
    assert [piece.text for piece in pieces] == ["e", "y", " = 2 in, ", "σ", "max"]
    assert pieces[0].get("font-style") == "italic" and pieces[0].get("font-size") is None
    assert pieces[1].get("font-size") == number(10 * SUBSCRIPT_SCALE)
    assert pieces[1].get("font-style") == "italic"
    assert float(pieces[1].get("dy")) > 0 and float(pieces[2].get("dy")) < 0
    assert pieces[4].get("font-style") is None  # a word in a subscript is upright
    assert texts(root) == ["ey = 2 in, σmax"]


def test_plain_and_escaped_text_in_a_label_shows_as_typed():
    """A user's name is never typeset: plain text keeps its braces, and in a marked label
    it goes through escape_marks; markup in it is escaped like any text."""
    svg = Svg()
    svg.text((0, 0), "load {M_x} <b>")
    svg.text((0, 20), MarkedText(f"{escape_marks('{e_y} & <i>')}: {{z}} = 1 in"))
    root = parse(svg.render())
    assert texts(root) == ["load {M_x} <b>", "{e_y} & <i>: z = 1 in"]
    first = next(root.iter(f"{SVG}text"))
    assert not list(first.iter(f"{SVG}tspan"))


def test_a_marked_label_is_estimated_as_drawn():
    """The layout's width of a label (text_width) is the sum of its pieces at their own
    sizes, the same the overlap test reads back from the SVG."""
    label = MarkedText("{z_s} = 132.0 in")
    plain = text_width("z = 132.0 in", 12) + text_width("s", 12 * SUBSCRIPT_SCALE)
    assert text_width(label, 12) == pytest.approx(plain)
    svg = Svg()
    svg.text((0, 0), label, size=12)
    (text,) = parse(svg.render()).iter(f"{SVG}text")
    assert drawn_width(text) == pytest.approx(plain)
