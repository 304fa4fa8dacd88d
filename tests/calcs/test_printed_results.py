"""Results as an engineer writes them on the built demo sheets (issue 17).

- equilibrium sums that close print 0, not the round-off of twelve carried figures;
- the twist rate φ′ at a warping-fixed end prints 0 (AISC Design Guide 9, Appendix B,
  cantilever: φ′(0) = 0, typed from memory as in test_member_warping.py);
- reactions of the analysis print to the sheet's figures (0.900 kip), typed loads as
  typed (2.5 kip);
- words outside the equations carry no raw symbol spelling (M_x, σ^2, "alpha"): symbols
  in words are {marks} typeset as the equations are. That holds for prose, captions,
  table headers and cells, references, the inputs' sources and the labels drawn in the
  figures (subscripts drawn as subscripts).

The printing rules are calcsheet's (DEVELOPERS.md, Conventions); the demos' numbers are
invented.
"""

from __future__ import annotations

import html
import re
from functools import cache
from pathlib import Path

import pytest

from calcsheet.calcs import member_sheet
from calcsheet.engine import Sheet
from calcsheet.engine.names import GREEK_LETTERS
from calcsheet.job.load import read_job
from calcsheet.mechanics import point_load
from calcsheet.pipeline.results import sheet_results
from calcsheet.pipeline.run import build_sheets
from calcsheet.render.html import render_html
from calcsheet.sections import catalog_section

EXAMPLES = Path(__file__).resolve().parents[2] / "examples"
DEMOS = ("outrigger", "column-bracket", "en-bracket")


@cache
def _sheet(name: str) -> Sheet:
    return build_sheets(read_job(EXAMPLES / f"{name}.toml")).sheets[0].sheet


@cache
def _html(name: str) -> str:
    return render_html(_sheet(name))


def _words(markup: str) -> str:
    """The sheet's words: everything outside MathML, SVG and style, entities resolved;
    references, the inputs' sources, their notes and table cells included."""
    body = markup.split("<body", 1)[-1]
    outside = re.sub(r"<(math|svg|style)\b.*?</\1>", "\n", body, flags=re.S)
    words = html.unescape(re.sub(r"<[^>]+>", "\n", outside))
    # A data file a source names is spelled as it is on disk (en10365_i_h_sections.csv).
    return re.sub(r"[\w.-]+\.(?:csv|toml|json)\b", "", words)


def _figure_words(markup: str) -> list[str]:
    """The text of each label drawn in the sheet's figures (SVG ``<text>``, its
    ``<tspan>`` pieces joined), entities resolved."""
    texts = re.findall(r"<text\b[^>]*>(.*?)</text>", markup, flags=re.S)
    return [html.unescape(re.sub(r"<[^>]+>", "", text)) for text in texts]


# A subscript or superscript written out (M_x, σ_vm, λ̄_0, b^2), or a Greek letter's name.
_RAW_SYMBOL = re.compile(
    r"[A-Za-z\u0370-\u03ff][\u0300-\u036f]?_[A-Za-z0-9]|\^|\b(?:" + "|".join(GREEK_LETTERS) + r")\b"
)


@pytest.mark.parametrize("name", DEMOS)
def test_no_raw_symbols_in_the_words_of_a_demo_sheet(name: str) -> None:
    raw = sorted(
        {line.strip() for line in _words(_html(name)).splitlines() if _RAW_SYMBOL.search(line)}
    )
    assert raw == []


@pytest.mark.parametrize("name", DEMOS)
def test_no_raw_symbols_in_the_figures_of_a_demo_sheet(name: str) -> None:
    labels = _figure_words(_html(name))
    assert labels  # the demos draw figures with labels
    assert sorted({label for label in labels if _RAW_SYMBOL.search(label)}) == []


def test_equilibrium_sums_that_close_print_zero() -> None:
    sheet = _sheet("column-bracket")
    sums = [step for step in sheet.steps if re.fullmatch(r"Sigma_[FM][xyz]", step.name)]
    assert len(sums) == 6
    for step in sums:
        shown = sheet.equation(step, "plain").chain()
        assert re.search(r"= 0 kip(\*ft)?$", shown), shown
    assert "<msup><mn>10</mn>" not in _html("column-bracket")  # no 5.87 × 10⁻¹² kip


def test_reactions_print_as_results_and_typed_loads_as_typed() -> None:
    words = html.unescape(re.sub(r"<[^>]+>", "", _html("column-bracket")))
    assert "−0.900kip" in words and "−0.9kip" not in words
    assert "(−2.5kip)" in words  # the wind load as typed in the job


def test_the_twist_rate_at_a_fixed_end_prints_zero() -> None:
    load = point_load("P", z="96 in", components=("0 kip", "-10 kip", "0 kip"), ex="3 in")
    sheet = member_sheet(catalog_section("W10x49"), [load], length="96 in")
    assert sheet.equation(sheet["phi_1"], "plain").chain() == "phi_1 = 0 1/in"
    assert sheet.value("phi_2").m != 0  # the other derivatives keep their values


@pytest.mark.parametrize(
    ("section", "label"),
    [
        ("L6X4X1/2", "vertical leg, peak of V_y shear"),
        ("HSS6.000X0.500", "extreme fibre on the tension side of M_r"),
    ],
)
def test_stress_point_labels_are_typeset_on_the_sheet_and_plain_in_json(
    section: str, label: str
) -> None:
    """A point named after a symbol (the peak of V_y shear on an angle's leg, the tension
    side of M_r on a round tube) prints the symbol as math in the tables, the point
    headings and "Governs at", and as plain text in the JSON file (calcsheet's own
    names, common practice, no source)."""
    load = point_load("P", z="48 in", components=("0.5 kip", "-2 kip", "0 kip"), ex="1 in")
    sheet = member_sheet(catalog_section(section), [load], length="48 in")
    markup = render_html(sheet)
    raw = sorted({line.strip() for line in _words(markup).splitlines() if _RAW_SYMBOL.search(line)})
    assert raw == []
    assert label in [point["label"] for point in sheet_results(sheet)["points"]]


@pytest.mark.parametrize("name", DEMOS)
def test_references_and_locations_are_plain_text_in_json(name: str) -> None:
    """The JSON file gives references and where a step or check governs as plain text
    (k = k_w, not marks), as a program reads them."""
    results = sheet_results(_sheet(name))
    texts = [step["reference"] for step in results["steps"]]
    texts += [step.get("governs_at", "") for step in results["steps"]]
    texts += [check["reference"] for check in results["checks"]]
    texts += [check["at"] for check in results["checks"]]
    texts += [point["label"] for point in results["points"]]
    assert any(texts)
    assert [text for text in texts if "{" in text or "}" in text] == []
