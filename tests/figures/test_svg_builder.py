"""The SVG builder: escaping, fixed number format, an extent that holds everything drawn."""

from __future__ import annotations

from calcsheet.figures.svg import Svg, number
from tests.figures.svgtools import SVG, parse, texts


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
