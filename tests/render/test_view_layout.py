"""How the view lays a sheet out for its target (issue 17: the demo within 10 pages).

Layout rules only: the values shown are the sheet's own, so no outside source applies.
"""

from __future__ import annotations

import pytest

from calcsheet.engine import Sheet
from calcsheet.render.html import render_html
from calcsheet.render.view import (
    PartView,
    _joined_descriptions,
    _one_row_per_value,
    _side_by_side,
    _ViewBuilder,
    build_view,
)


def _input(symbol: str, text: str, value: str, source: str) -> PartView:
    return PartView("input", symbol=symbol, text=text, value=value, reference=source)


def test_inputs_of_one_value_from_one_source_share_a_row():
    rows = _one_row_per_value(
        [
            _input("A", "Area", "7.58", "note a"),
            _input("e_x", "Offset in x", "0", ""),
            _input("e_y", "Offset in y", "0", ""),  # typed by the engineer: a row each
            _input("A_g", "Gross area", "7.58", "note a"),
            _input("phi_c", "Resistance factor, compression", "0.9", "E1"),
            _input("phi_b", "Resistance factor, flexure", "0.9", "F1"),  # another source
        ],
        "typst",
    )
    assert [row.symbol for row in rows] == ["A, A_g", "e_x", "e_y", "phi_c", "phi_b"]
    assert rows[0].text == "Area; gross area"


def test_a_shared_row_writes_the_common_words_once():
    assert (
        _joined_descriptions(["Elastic section modulus about x", "Elastic section modulus about y"])
        == "Elastic section modulus about x / y"
    )
    assert (
        _joined_descriptions(["Load factor on Q in EN 1990", "Load factor on W in EN 1990"])
        == "Load factor on Q / W in EN 1990"
    )
    assert _joined_descriptions(["Depth", "Width"]) == "Depth; width"
    assert _joined_descriptions(["Area", "Area"]) == "Area"


def _figure(width: float, floats: bool = True) -> PartView:
    return PartView("figure", text=f"{width} wide", width=width, floats=floats)


def test_two_narrow_floating_figures_near_each_other_go_side_by_side():
    prose = PartView("prose", text="words")
    parts = [_figure(175), prose, prose, _figure(172), prose, _figure(420), _figure(170)]
    laid = _side_by_side(parts)
    assert [view.kind for view in laid] == [
        "figure_row",
        "prose",
        "prose",
        "prose",
        "figure",
        "figure",
    ]
    assert [entry.width for entry in laid[0].entries] == [175, 172]


@pytest.mark.parametrize(
    "parts",
    [
        [_figure(175), _figure(300)],  # the second too wide
        [_figure(175), _figure(172, floats=False)],  # the last figure stays in the flow
        [_figure(175), *[PartView("prose")] * 31, _figure(172)],  # too far apart
    ],
)
def test_figures_stay_apart_otherwise(parts):
    assert "figure_row" not in [view.kind for view in _side_by_side(parts)]


def _svg(width: int) -> str:
    return f'<svg xmlns="http://www.w3.org/2000/svg" width="{width}" height="200"></svg>'


def test_side_by_side_in_the_pdf_only():
    sheet = Sheet("Figures")
    for caption in ("One", "Two", "Last"):
        sheet.figure(_svg(300), caption)
    assert [view.kind for view in build_view(sheet, "typst").parts] == ["figure_row", "figure"]
    assert [view.kind for view in build_view(sheet, "mathml").parts] == ["figure"] * 3
    assert render_html(sheet).count("<figure>") == 3


def test_every_part_type_has_a_visit_method_and_an_unknown_one_is_refused():
    import calcsheet.engine.parts as parts

    for kind in ("Heading", "Prose", "Table", "Figure", "Input", "Step", "Check", "CheckList"):
        assert hasattr(_ViewBuilder, f"visit_{kind}"), kind
        assert hasattr(parts, kind)
    builder = _ViewBuilder(Sheet("Empty"), "typst")
    with pytest.raises(TypeError, match="Revision"):
        builder.visit(parts.Revision("A", "", "", ""))
