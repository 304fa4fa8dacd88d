"""Table B4.1a/B4.1b limits and the classification at λp and λr, from both sides."""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.sections import list_designations
from calcsheet.standards.aisc360 import catalog_table
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360.classification import Classification, classify, classify_numeric

from .support import FY, E

ROOT = math.sqrt(29000 / 50)  # √(E/Fy) for Fy = 50 ksi

# Hand calc from AISC 360-22 Tables B4.1a and B4.1b: coefficient · √(E/Fy) or · E/Fy.
LIMITS = [
    (b4.I_FLANGE_COMPRESSION.lambda_r, 0.56 * ROOT),
    (b4.I_WEB_COMPRESSION.lambda_r, 1.49 * ROOT),
    (b4.HSS_WALL_COMPRESSION.lambda_r, 1.40 * ROOT),
    (b4.ANGLE_LEG_COMPRESSION.lambda_r, 0.45 * ROOT),
    (b4.ROUND_HSS_COMPRESSION.lambda_r, 0.11 * 29000 / 50),
    (b4.I_FLANGE_FLEXURE.lambda_p, 0.38 * ROOT),
    (b4.I_FLANGE_FLEXURE.lambda_r, 1.0 * ROOT),
    (b4.I_WEB_FLEXURE.lambda_p, 3.76 * ROOT),
    (b4.I_WEB_FLEXURE.lambda_r, 5.70 * ROOT),
    (b4.HSS_FLANGE_FLEXURE.lambda_p, 1.12 * ROOT),
    (b4.HSS_WEB_FLEXURE.lambda_p, 2.42 * ROOT),
    (b4.ROUND_HSS_FLEXURE.lambda_r, 0.31 * 29000 / 50),
    (b4.ANGLE_LEG_FLEXURE.lambda_p, 0.54 * ROOT),
]


@pytest.mark.parametrize(("limit", "expected"), LIMITS)
def test_limits_for_fy_50(limit, expected) -> None:
    assert limit.numeric(E, FY) == pytest.approx(expected)


def test_the_printed_limit_is_the_numeric_one() -> None:
    sheet = Sheet("limits")
    with sheet:
        E_symbol = sheet.input("E", "29000 ksi", dimension="stress")
        F_y = sheet.input("F_y", "50 ksi", dimension="stress")
        lam = sheet.input("lambda_f", 10.21, dimension="dimensionless")
        written = b4.write_classification(
            sheet, b4.I_FLANGE_FLEXURE, lam, E_symbol, F_y, suffix="f"
        )
    assert written.classification is Classification.NONCOMPACT
    assert sheet.value("lambda_pf").m == pytest.approx(b4.I_FLANGE_FLEXURE.lambda_p.numeric(E, FY))
    assert sheet["lambda_rf"].reference == "AISC 360-22 Table B4.1b Case 10"
    assert "noncompact" in sheet.parts[-1].text


@pytest.mark.parametrize(
    ("slenderness", "expected"),
    [
        (9.0, Classification.COMPACT),
        (9.5, Classification.COMPACT),  # at λp: compact
        (9.5 + 1e-9, Classification.NONCOMPACT),
        (24.0, Classification.NONCOMPACT),  # at λr: noncompact
        (24.0 + 1e-9, Classification.SLENDER),
    ],
)
def test_classification_at_both_limits_from_both_sides(slenderness, expected) -> None:
    assert classify(slenderness, 9.5, 24.0) is expected
    code = classify_numeric(np.array([slenderness]), np.array([9.5]), np.array([24.0]))[0]
    assert code == [
        Classification.COMPACT,
        Classification.NONCOMPACT,
        Classification.SLENDER,
    ].index(expected)


def test_table_b41a_has_only_nonslender_and_slender() -> None:
    assert classify(13.0, None, 13.0) is Classification.NONSLENDER
    assert classify(13.0 + 1e-9, None, 13.0) is Classification.SLENDER


def test_w_shapes_with_noncompact_flanges_for_fy_50() -> None:
    # AISC Manual (15th/16th ed.) Table 1-1 / 3-2 footnote "shape exceeds compact limit for
    # flexure with Fy = 50 ksi" (from memory): these ten W shapes, and no other.
    table = catalog_table(list_designations("W"))
    b = b4.half_flange_width.numeric(table.values["b_f"])
    lam = b4.width_thickness_ratio.numeric(b, table.values["t_f"]).ravel()
    limit = b4.I_FLANGE_FLEXURE.lambda_p.numeric(E, FY)
    noncompact = {name for name, ratio in zip(table.names, lam, strict=True) if ratio > limit}
    assert noncompact == {
        "W21X48",
        "W14X99",
        "W14X90",
        "W12X65",
        "W10X12",
        "W8X31",
        "W8X10",
        "W6X15",
        "W6X9",
        "W6X8.5",
    }
