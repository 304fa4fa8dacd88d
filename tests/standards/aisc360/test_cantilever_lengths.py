"""Lb and Cb of the AISC 360-22 member checks: given or defaulted, cantilever effective
lengths by load height and tip restraint, warnings, and the errors a user sees."""

from __future__ import annotations

import pytest

from calcsheet.calcs.design import DesignBasis
from calcsheet.engine.marked_text import plain_text
from calcsheet.errors import InputError
from calcsheet.standards.aisc360 import (
    CHECK_TITLES,
    DemandArrays,
    aisc_checks_numeric,
    catalog_table,
)
from calcsheet.standards.aisc360.member_lengths import CANTILEVER_FACTORS
from calcsheet.units import Quantity

from .support import member_sheet, value

_KEY = {title: key for key, title in CHECK_TITLES.items()}


def _texts(sheet) -> str:
    """The sheet's words as plain text ({L_b} -> L_b)."""
    return "\n".join(plain_text(part.text) for part in sheet.parts if hasattr(part, "text"))


def _description(sheet, name: str) -> str:
    return sheet[name].description


def test_cantilever_factors_are_the_ssrc_guide_values() -> None:
    # SSRC Guide to Stability Design Criteria for Metal Structures, 6th ed. (2010),
    # Chapter 5, effective length factors for cantilevers after Nethercot, cantilever
    # built in at the support (from memory; the same values as BS 5950-1:2000 Table 14,
    # support (d), from memory): top flange loading / all other loading.
    assert CANTILEVER_FACTORS == {
        ("free", "top flange"): 1.4,
        ("free", "other"): 0.8,
        ("laterally braced", "top flange"): 1.4,
        ("laterally braced", "other"): 0.7,
        ("torsionally restrained", "top flange"): 0.6,
        ("torsionally restrained", "other"): 0.6,
    }


@pytest.mark.parametrize(
    ("height", "tip", "k"),
    [
        ("top flange", None, 1.4),  # tip defaulted to free
        ("shear centre", "free", 0.8),
        ("shear center", "laterally braced", 0.7),
        ("bottom flange", "free", 0.8),  # "all other loading" in the Guide
        (None, "torsionally restrained", 0.6),  # height defaulted to top flange
        ("top flange", "laterally braced", 1.4),
    ],
)
def test_defaulted_lb_is_the_cantilever_effective_length(height, tip, k) -> None:
    options = {"length": "10 ft", "load_height": height, "tip_restraint": tip}
    sheet = member_sheet("W12X26", "LRFD", Mx=20, **options)
    assert value(sheet, "L_b", "ft") == pytest.approx(k * 10, rel=1e-12)
    assert value(sheet, "k_LTB", "") == k
    assert "defaulted (from the effective length of a cantilever" in _description(sheet, "L_b")
    assert ("defaulted" in _description(sheet, "k_LTB")) == (height is None or tip is None)
    texts = _texts(sheet)
    assert "Caution: L_b is the effective length of a cantilever" in texts
    assert any("SSRC Guide to Stability Design Criteria" in ref for ref in sheet.references)
    # The numeric path reads the same length.
    demands = DemandArrays.from_quantities(
        *(Quantity(v, u) for v, u in ((0, "kip"), (20, "kip*ft"), (0, "kip*ft"), (0, "kip"),
                                       (0, "kip")))
    )  # fmt: skip
    numeric = aisc_checks_numeric(catalog_table(["W12X26"]), demands, method="LRFD", **options)
    written = {_KEY[check.description]: check.utilization for check in sheet.checks}
    assert numeric["flexure_x"][0, 0] == pytest.approx(written["flexure_x"], rel=1e-9)


def test_given_lb_and_cb_are_labelled_given() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft", Lb="8 ft", Cb=1.0)
    assert _description(sheet, "L_b").endswith(": given")
    assert _description(sheet, "C_b").endswith(": given")
    assert "WARNING" not in _texts(sheet)


def test_given_lb_wins_over_the_cantilever_table() -> None:
    sheet = member_sheet("W12X26", "LRFD", length="10 ft", Lb="9 ft", load_height="top flange")
    assert value(sheet, "L_b", "ft") == pytest.approx(9.0)
    with pytest.raises(KeyError):
        sheet["k_LTB"]


def test_defaulted_lb_without_load_height_is_l_with_a_caution() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft")
    assert value(sheet, "L_b", "ft") == pytest.approx(10.0)
    assert "defaulted (from the member length L)" in _description(sheet, "L_b")
    assert "L_b = L is unconservative for a load applied on the top flange" in _texts(sheet)
    # Not for a tube: no flanges, no load height.
    tube = member_sheet("HSS8X6X1/4", "LRFD", Mx=20, length="10 ft")
    assert "unconservative for a load applied on the top flange" not in _texts(tube)


def test_cb_defaulted_for_a_cantilever_cites_the_commentary() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft")
    description = _description(sheet, "C_b")
    assert "defaulted (1.0 for a cantilever with an unbraced free end" in description
    assert "AISC 360-22 Commentary to Section F1" in description
    assert value(sheet, "C_b", "") == 1.0
    # The old wording next to any value is gone.
    assert "(1.0 for a cantilever)" not in description


def test_warning_for_cb_above_one_on_a_cantilever() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft", Cb=2.5)
    texts = _texts(sheet)
    assert "WARNING: C_b = 2.5 > 1.0 on a cantilever" in texts
    assert _description(sheet, "C_b").endswith(": given")
    assert "(1.0 for a cantilever)" not in _description(sheet, "C_b")
    # Not a cantilever: no warning.
    beam = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft", Cb=2.5, cantilever=False)
    assert "WARNING" not in _texts(beam)


def test_warning_for_lb_longer_than_the_member() -> None:
    sheet = member_sheet("W12X26", "LRFD", Mx=20, length="10 ft", Lb="12 ft")
    assert "WARNING: the given L_b is longer than the member length L" in _texts(sheet)


@pytest.mark.parametrize("name", ["HSS8X6X1/4", "HSS6.000X0.250", "L4X4X1/2"])
@pytest.mark.parametrize("key", ["load_height", "tip_restraint"])
def test_load_height_on_a_section_without_flanges_is_refused(name, key) -> None:
    given = {"load_height": "top flange", "tip_restraint": "free"}[key]
    with pytest.raises(InputError, match=f"check.{key}") as raised:
        member_sheet(name, "LRFD", length="10 ft", **{key: given})
    assert "without flanges" in str(raised.value)
    assert given in str(raised.value)


def test_unknown_load_height_names_the_choices() -> None:
    with pytest.raises(InputError, match="check.load_height") as raised:
        DesignBasis("AISC 360-22", load_height="mid-web")
    message = str(raised.value)
    assert "mid-web" in message and "top flange, shear centre, bottom flange" in message
    with pytest.raises(InputError, match="check.tip_restraint"):
        DesignBasis("AISC 360-22", tip_restraint="fixed")
    # Spellings are normalised for the checks.
    basis = DesignBasis("AISC 360-22", load_height="Shear_Center", tip_restraint="FREE")
    assert (basis.load_height, basis.tip_restraint) == ("shear centre", "free")
    assert basis.Cb is None  # defaulted, labelled so on the sheet
