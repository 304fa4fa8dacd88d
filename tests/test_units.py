"""Units: parsing, conversions against published factors, display presets, number format."""

from __future__ import annotations

import math

import pytest

from calcsheet.errors import InputError
from calcsheet.units import (
    SI,
    US_CUSTOMARY,
    NumberStyle,
    Quantity,
    format_as_typed,
    format_count,
    format_number,
    parse_quantity,
    unit_factors,
    unit_system,
    ureg,
)

# NIST SP 811 (2008), Appendix B.8/B.9 conversion factors.
NIST_FACTORS = [
    ("1 in", "mm", 25.4, 0.0),  # NIST SP 811 B.8: inch to meter 2.54e-2 exactly
    ("1 ft", "m", 0.3048, 0.0),  # NIST SP 811 B.8: foot to meter 3.048e-1 exactly
    ("1 lbf", "N", 4.448222, 1e-6),  # NIST SP 811 B.8: pound-force to newton 4.448 222
    ("1 kip", "kN", 4.448222, 1e-6),  # NIST SP 811 B.8: kip (1000 lbf) to newton 4.448 222e3
    ("1 ksi", "MPa", 6.894757, 1e-6),  # NIST SP 811 B.8: kip per square inch to pascal 6.894 757e6
    ("1 psi", "kPa", 6.894757, 1e-6),  # NIST SP 811 B.8: psi to pascal 6.894 757e3
    ("1 kip*ft", "kN*m", 1.355818, 1e-6),  # NIST SP 811 B.8: pound-force foot to N*m 1.355 818
    ("1 in^4", "mm^4", 416231.4, 1e-6),  # NIST SP 811 B.8: in^4 to m^4 4.162 314e-7
    ("180 deg", "rad", math.pi, 0.0),  # NIST SP 811 B.8: degree to radian 1.745 329e-2 (pi/180)
]


@pytest.mark.parametrize(("text", "unit", "expected", "rel"), NIST_FACTORS)
def test_conversion_factors_match_nist_sp811(text, unit, expected, rel):
    converted = parse_quantity(text, field="test").to(unit).magnitude
    assert converted == pytest.approx(expected, rel=rel or 1e-12)


@pytest.mark.parametrize(
    ("text", "magnitude", "unit"),
    [
        ("6.5 kip", 6.5, "kip"),
        ("40 deg", 40.0, "degree"),
        ("40°", 40.0, "degree"),
        ("250 kN*m", 250.0, "kilonewton * meter"),
        ("50 ksi", 50.0, "kip_per_square_inch"),
        ("-2.5e3 lbf", -2500.0, "force_pound"),
        ("7.58 in^2", 7.58, "inch ** 2"),
        (".5 in", 0.5, "inch"),
        ("  12   mm ", 12.0, "millimeter"),
    ],
)
def test_parse_quantity_reads_number_and_unit(text, magnitude, unit):
    quantity = parse_quantity(text, field="load")
    assert quantity.magnitude == magnitude
    assert str(quantity.units) == unit


def test_parsed_quantities_share_the_one_registry():
    assert parse_quantity("1 kip", field="x")._REGISTRY is ureg
    assert (parse_quantity("1 kip", field="x") + Quantity(1, "kN")).check("[force]")


@pytest.mark.parametrize(
    ("text", "dimension", "fragment"),
    [
        ("nan kip", None, "finite"),
        ("NaN", None, "finite"),
        ("inf kip", None, "finite"),
        ("-Infinity", None, "finite"),
        ("1e999 kip", None, "finite"),
        ("6.5 furlongz", None, "unknown unit"),
        ("six kip", None, "not a number"),
        ("", None, "not a number"),
        ("30", "angle", "needs its unit"),
        ("6.5 in", "force", "a length, not a force"),
        ("50 kip", "stress", "a force, not a stress"),
        ("__import__('os').system('ls') kip", None, "not a number"),
        ("1 kip; import os", None, "not a unit"),
        ("1 " + "k" * 100, None, "too long"),
    ],
)
def test_bad_entries_name_the_field_and_what_is_expected(text, dimension, fragment):
    with pytest.raises(InputError) as raised:
        parse_quantity(text, field="load P", dimension=dimension)
    message = str(raised.value)
    assert message.startswith("load P: got ")
    assert fragment in message
    assert "expected" in message


def test_a_number_for_an_angle_is_refused_but_a_number_for_a_ratio_is_accepted():
    with pytest.raises(InputError, match="angle"):
        parse_quantity(30, field="theta", dimension="angle")
    assert parse_quantity(1.5, field="ratio", dimension="dimensionless").magnitude == 1.5


def test_unit_presets_choose_by_dimension():
    assert US_CUSTOMARY.unit_for(Quantity(1, "N/mm**2")) == ureg.ksi
    assert SI.unit_for(Quantity(1, "kip*ft")) == ureg.parse_units("kN*m")
    assert SI.unit_for(Quantity(1, "in**4")) == ureg.parse_units("mm**4")
    assert unit_system("si") is SI
    with pytest.raises(InputError, match="'US' or 'SI'"):
        unit_system("imperial")


@pytest.mark.parametrize(
    ("value", "shown"),
    [
        # Engineers' habit: 3 significant figures, 4 when the leading digit is 1
        # (common practice, no source); precision-carrying zeros kept.
        (4.5999999, "4.60"),
        (2.5, "2.50"),
        (12345.6, "12350"),
        (1234.5, "1234"),
        (0.25, "0.250"),
        (-0.05678, "-0.0568"),
        (9.9996, "10.00"),
        (19.99, "20.0"),
        (0.0, "0"),
        (123456789.0, "1.235e+08"),
        (0.0000123, "1.230e-05"),
    ],
)
def test_significant_figures(value, shown):
    assert format_number(value).plain() == shown


def test_thousands_separator_and_fixed_significant_figures_are_options():
    assert format_number(12345.6, NumberStyle(group_thousands=True)).plain() == "12,350"
    assert format_number(2.0, NumberStyle(significant=2)).plain() == "2.0"


def test_unit_factors_for_typesetting():
    assert unit_factors(ureg.parse_units("kip*ft")) == (("kip", 1.0), ("ft", 1.0))
    assert unit_factors(ureg.ksi) == (("ksi", 1.0),)
    assert unit_factors(ureg.parse_units("kN/m")) == (("kN", 1.0), ("m", -1.0))
    assert unit_factors(ureg.degree) == (("°", 1.0),)


# --- careless entries (issue 16) ---------------------------------------------------------


@pytest.mark.parametrize(
    ("text", "dimension", "expected"),
    [
        ("\u22124 in", "length", -4.0),  # U+2212 MINUS SIGN, as the sheet prints negatives
        ("\u22122.5e\u22123 kip", "force", -2.5e-3),
        ("2 in^\u22121", None, 2.0),
    ],
)
def test_the_unicode_minus_is_read_as_a_minus(text, dimension, expected):
    # U+2212 MINUS SIGN (The Unicode Standard, Mathematical Operators block).
    assert parse_quantity(text, field="e", dimension=dimension).m == expected


def test_the_unicode_minus_in_an_exponent_gives_the_unit():
    assert parse_quantity("2 in^\u22121", field="k").units == ureg.parse_units("1/in")


@pytest.mark.parametrize(
    ("text", "dimension", "written"),
    [
        ("4200 lb", "force", "'4200 lbf'"),
        ("4200 lbs", "force", "'4200 lbf'"),
        ("5 lb*ft", "moment", "'5 lbf*ft'"),
        ("50 lb/in^2", "stress", "'50 lbf/in^2'"),
    ],
)
def test_pounds_of_mass_for_a_force_say_to_write_lbf(text, dimension, written):
    # NIST SP 811 (2008) B.8: pound (avoirdupois) is a unit of mass; pound-force of force.
    with pytest.raises(InputError) as raised:
        parse_quantity(text, field="P", dimension=dimension)
    assert "lb is a mass" in str(raised.value) and written in str(raised.value)
    assert raised.value.value == text  # quoted as typed


def test_kilograms_for_a_force_say_to_give_a_force_unit():
    # 1 kgf = 9.80665 N (NIST SP 811 (2008) B.8: kilogram-force to newton 9.806 65).
    with pytest.raises(InputError) as raised:
        parse_quantity("300 kg", field="P", dimension="force")
    assert "that is a mass" in str(raised.value) and "kN" in str(raised.value)


def test_a_length_for_a_force_keeps_its_plain_message():
    with pytest.raises(InputError, match="that is a length, not a force"):
        parse_quantity("6.5 in", field="P", dimension="force")


@pytest.mark.parametrize(
    ("value", "shown"),
    [
        (15.0, "15"),  # "15°, not 15.00°" (issue 17)
        (1.67, "1.67"),  # Ω of AISC 360-22 B3.2, as the code gives it
        (18.0, "18"),
        (0.375, "0.375"),
        (48.00000000000001, "48"),  # 4 ft in inches, round-off of the conversion
        (1200.0000000000002, "1200"),  # 1.2 m in mm
        (2.4, "2.4"),
    ],
)
def test_inputs_print_as_typed(value, shown):
    # The typed figures are the input's own precision (common practice, no source).
    assert format_as_typed(value).digits == shown


def test_an_input_with_many_figures_prints_to_the_sheets_figures():
    assert format_as_typed(3.14159265).digits == "3.14"


def test_whole_numbers_print_as_integers():
    assert format_count(4.0).digits == "4"
    assert format_count(3.9999999999999).digits == "4"
    assert format_count(3.5) is None


def test_a_value_and_its_mirror_print_alike():
    # One side of a symmetric section at 3.565 up to round-off, the other at -3.565
    # (arithmetic, no source): both print 3.56 (ISO 80000-1 Annex B rule A, halves to even).
    assert format_number(3.5649999999999).digits == format_number(-3.5650000000001).digits
