"""Units for the whole package: the one pint registry, parsing, display presets, number format.

There is exactly one :class:`pint.UnitRegistry` in calcsheet (``ureg``); quantities
from two registries cannot be combined, so every module imports it from here.
Text typed by a user is parsed with a strict number-and-unit grammar and pint's
unit parser, never with Python's ``eval`` or sympy's ``sympify``.
"""

from __future__ import annotations

import math
import re
from dataclasses import dataclass, field
from decimal import ROUND_HALF_EVEN, Decimal
from functools import lru_cache

import pint

from calcsheet.errors import InputError


def _registry() -> pint.UnitRegistry:
    """The registry, its parsed definitions cached in the user's cache folder.

    Parsing pint's definitions file costs about half of a cold command; the cache
    (keyed by the file's content, so a new pint makes a new one) cuts that to a
    fraction. A folder that cannot be written falls back to parsing every time.
    """
    try:
        return pint.UnitRegistry(autoconvert_offset_to_baseunit=True, cache_folder=":auto:")
    except Exception:  # a read-only or missing cache folder: parse as before
        return pint.UnitRegistry(autoconvert_offset_to_baseunit=True)


ureg = _registry()
Quantity = ureg.Quantity
Unit = ureg.Unit

# Dimensions a field can ask for, by the name an engineer would use.
DIMENSIONS: dict[str, str] = {
    "dimensionless": "",
    "angle": "",
    "length": "[length]",
    "area": "[length] ** 2",
    "section modulus": "[length] ** 3",
    "moment of inertia": "[length] ** 4",
    "force": "[force]",
    "force per length": "[force] / [length]",
    "moment": "[force] * [length]",
    "stress": "[force] / [length] ** 2",
    "mass per length": "[mass] / [length]",
}

_EXAMPLES: dict[str, str] = {
    "dimensionless": "1.5",
    "angle": "30 deg",
    "length": "12 in or 300 mm",
    "area": "7.58 in^2",
    "section modulus": "30.8 in^3",
    "moment of inertia": "171 in^4",
    "force": "6.5 kip or 30 kN",
    "force per length": "0.5 kip/ft",
    "moment": "25 kip*ft or 35 kN*m",
    "stress": "50 ksi or 345 MPa",
    "mass per length": "33 lb/ft",
}

_NUMBER = r"[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d{1,3})?"
_QUANTITY_TEXT = re.compile(rf"^\s*(?P<number>{_NUMBER})\s*(?P<unit>[^\d\s.+-].*?)?\s*$")
_UNIT_TEXT = re.compile(r"^[A-Za-z_µμ°Ω·*/^()\d\s.-]{1,40}$")
_NOT_FINITE = re.compile(r"^\s*[+-]?(nan|inf|infinity)\b", re.IGNORECASE)
# The sheet prints negative numbers with the typographic minus (U+2212); a value
# copied from a sheet back into a job file is read as the ASCII hyphen-minus.
UNICODE_MINUS = "\u2212"
# "4200 lb" for a force: the pound is a mass; the force unit is lbf (the pound-force).
_POUND = re.compile(r"(?<![A-Za-z])lbs?(?![A-Za-z])")


def dimension_example(dimension: str) -> str:
    """An example entry for a field of the given dimension, for error messages."""
    return _EXAMPLES.get(dimension, "a number with a unit")


def parse_quantity(
    text: str | int | float | pint.Quantity,
    *,
    field: str,
    dimension: str | None = None,
) -> pint.Quantity:
    """Read a user's entry such as ``"6.5 kip"`` or ``"40 deg"`` into a quantity.

    ``dimension`` is one of :data:`DIMENSIONS`; an entry of another dimension, an
    angle without a unit, NaN or infinity, or an unknown unit raises
    :class:`InputError` naming ``field``.
    """
    expected = _expected_text(dimension)
    if isinstance(text, pint.Quantity):
        quantity = text
    elif isinstance(text, bool):
        raise InputError(field, text, expected, "a yes/no value is not a quantity")
    elif isinstance(text, (int, float)):
        try:
            quantity = Quantity(float(text))
        except OverflowError:  # an int beyond the largest float
            raise InputError(field, text, expected, "the number must be finite") from None
        if dimension == "angle":
            raise InputError(field, text, expected, "an angle needs its unit, deg or rad")
    elif isinstance(text, str):
        quantity = _parse_text(text, field=field, expected=expected, dimension=dimension)
    else:
        raise InputError(field, text, expected, f"a {type(text).__name__} is not a quantity")
    if quantity._REGISTRY is not ureg:
        quantity = Quantity(quantity.magnitude, str(quantity.units))
    magnitude = quantity.magnitude
    if not isinstance(magnitude, (int, float)) or not math.isfinite(magnitude):
        raise InputError(field, text, expected, "the number must be finite")
    if dimension is not None:
        _require_dimension(quantity, dimension, field=field, shown=text, expected=expected)
    return quantity


def _expected_text(dimension: str | None) -> str:
    if dimension is None:
        return "a number with a unit, such as '6.5 kip'"
    if dimension not in DIMENSIONS:
        raise ValueError(f"unknown dimension name {dimension!r}; known: {sorted(DIMENSIONS)}")
    if dimension == "dimensionless":
        return "a plain number, such as '1.5'"
    article = "an" if dimension[0] in "aeiou" else "a"
    examples = " or ".join(f"'{example}'" for example in dimension_example(dimension).split(" or "))
    return f"{article} {dimension}, such as {examples}"


def _parse_text(text: str, *, field: str, expected: str, dimension: str | None) -> pint.Quantity:
    if len(text) > 80:
        raise InputError(field, text, expected, "the entry is too long")
    typed, text = text, text.replace(UNICODE_MINUS, "-")
    if _NOT_FINITE.match(text):
        raise InputError(field, typed, expected, "the number must be finite")
    match = _QUANTITY_TEXT.match(text)
    if match is None:
        raise InputError(field, typed, expected, "not a number followed by a unit")
    number = float(match.group("number"))
    if not math.isfinite(number):
        raise InputError(field, typed, expected, "the number must be finite")
    unit_text = (match.group("unit") or "").strip()
    if not unit_text:
        if dimension == "angle":
            raise InputError(field, typed, expected, "an angle needs its unit, deg or rad")
        return Quantity(number)
    return Quantity(number, parse_unit(unit_text, field=field, shown=typed, expected=expected))


def parse_unit(text: str, *, field: str, shown: object = None, expected: str = "") -> pint.Unit:
    """Read a unit such as ``"kip*ft"`` or ``"in^2"``; unknown units raise :class:`InputError`."""
    shown = text if shown is None else shown
    expected = expected or "a unit such as kip, kN, in, mm, ksi, MPa, kip*ft, kN*m, deg"
    normalised = (
        text.replace("°", "deg")
        .replace("·", "*")
        .replace("μ", "µ")
        .replace(UNICODE_MINUS, "-")
        .strip()
    )
    if normalised == "%":
        raise InputError(field, shown, expected, "percent is not accepted; give a plain number")
    if not _UNIT_TEXT.match(normalised):
        raise InputError(field, shown, expected, f"{text!r} is not a unit")
    try:
        unit = ureg.parse_units(normalised)
    except (pint.errors.UndefinedUnitError, pint.errors.DefinitionSyntaxError) as error:
        raise InputError(field, shown, expected, f"unknown unit {text!r}") from error
    except Exception as error:  # pint's parser: KeyError, ZeroDivisionError, TokenError...
        raise InputError(field, shown, expected, f"{text!r} is not a unit") from error
    return unit


def _require_dimension(
    quantity: pint.Quantity, dimension: str, *, field: str, shown: object, expected: str
) -> None:
    wanted = DIMENSIONS[dimension]
    # Not ``quantity.dimensionless``: pint converts to root units for it, which
    # overflows for a unit such as km^999.
    dimensionless = not quantity.dimensionality
    if dimension == "angle":
        if not dimensionless or quantity.unitless:
            raise InputError(field, shown, expected, "an angle needs its unit, deg or rad")
        return
    if wanted == "":
        if not dimensionless:
            raise InputError(field, shown, expected, f"{quantity.units:~} is not dimensionless")
        return
    if not quantity.check(wanted):
        got = describe_dimension(quantity)
        problem = f"that is {_with_article(got)}, not a {dimension}"
        if (quantity * ureg.standard_gravity).check(wanted):
            problem = _mass_for_force_hint(shown, dimension)
        raise InputError(field, shown, expected, problem)


def _mass_for_force_hint(shown: object, dimension: str) -> str:
    """Why "4200 lb" is not a force: lb is the pound (a mass), lbf the pound-force."""
    if _POUND.search(str(shown)):
        written = _POUND.sub("lbf", str(shown))
        return f"lb is a mass (the pound), lbf a force (the pound-force): write {written!r}"
    return (
        f"that is a mass; give the {dimension} with a force unit (N, kN, lbf or kip); "
        "a mass of 1 kg weighs 9.81 N"
    )


def _with_article(noun: str) -> str:
    return f"{'an' if noun[0] in 'aeiou' else 'a'} {noun}"


def describe_dimension(quantity: pint.Quantity | pint.Unit) -> str:
    """The engineer's name of a quantity's dimension ("force", "stress"), or pint's form."""
    dimensionality = quantity.dimensionality
    for name, wanted in DIMENSIONS.items():
        if wanted and dimensionality == ureg.get_dimensionality(wanted):
            return name
    if not dimensionality:
        return "dimensionless number"
    if dimensionality == ureg.get_dimensionality("[mass]"):
        return "mass"
    return str(dimensionality)


# --- display presets --------------------------------------------------------------


@dataclass(frozen=True)
class UnitSystem:
    """Preferred display unit for each dimension, chosen per sheet (US customary or SI)."""

    name: str
    preferred: dict[str, str] = field(default_factory=dict)

    @property
    def description(self) -> str:
        """The preset in words for the design basis: its name and main display units."""
        title = {"US": "US customary", "SI": "SI"}.get(self.name, self.name)
        main = [
            f"{self.preferred[kind]} ({kind})".replace("**", "^").replace("*", "·")
            for kind in ("length", "force", "moment", "stress")
            if kind in self.preferred
        ]
        return f"{title}: " + ", ".join(main)

    def unit_for(self, quantity: pint.Quantity) -> pint.Unit | None:
        """The preset's unit for this quantity's dimension, or ``None`` when it has none."""
        return _preferred_unit(tuple(self.preferred.items()), quantity.dimensionality)


US_CUSTOMARY = UnitSystem(
    "US",
    {
        "length": "in",
        "area": "in**2",
        "section modulus": "in**3",
        "moment of inertia": "in**4",
        "force": "kip",
        "force per length": "kip/ft",
        "moment": "kip*ft",
        "stress": "ksi",
        "mass per length": "lb/ft",
        "[length] ** 6": "in**6",
    },
)

SI = UnitSystem(
    "SI",
    {
        "length": "mm",
        "area": "mm**2",
        "section modulus": "mm**3",
        "moment of inertia": "mm**4",
        "force": "kN",
        "force per length": "kN/m",
        "moment": "kN*m",
        "stress": "MPa",
        "mass per length": "kg/m",
        "[length] ** 6": "mm**6",
    },
)

UNIT_SYSTEMS: dict[str, UnitSystem] = {"US": US_CUSTOMARY, "SI": SI}


def unit_system(name: str | UnitSystem) -> UnitSystem:
    """Look up a preset by name ("US" or "SI"); the error lists what exists."""
    if isinstance(name, UnitSystem):
        return name
    try:
        return UNIT_SYSTEMS[str(name).strip().upper()]
    except KeyError:
        raise InputError("unit system", name, "'US' or 'SI'") from None


@lru_cache(maxsize=256)
def _preferred_unit(
    preferred: tuple[tuple[str, str], ...], dimensionality: object
) -> pint.Unit | None:
    for dimension, unit in preferred:
        wanted = DIMENSIONS.get(dimension, dimension)
        if wanted and ureg.get_dimensionality(wanted) == dimensionality:
            return ureg.parse_units(unit)
    return None


# --- unit typesetting ---------------------------------------------------------------

# Abbreviations engineers write; pint's own short symbols serve for the rest.
_UNIT_SYMBOLS = {
    "degree": "°",
    "kip_per_square_inch": "ksi",
    "pound_force_per_square_inch": "psi",
    "force_pound": "lbf",
    "pound": "lb",
}


@lru_cache(maxsize=512)
def unit_factors(unit: pint.Unit) -> tuple[tuple[str, float], ...]:
    """A unit as (symbol, exponent) pairs in a stable order, for the printers to typeset.

    Positive exponents come first, so ``kip/ft`` prints as kip·ft⁻¹ or kip/ft.
    """
    items = list(unit._units.items())
    ordered = [item for item in items if item[1] > 0] + [item for item in items if item[1] < 0]
    factors = []
    for name, exponent in ordered:
        symbol = _UNIT_SYMBOLS.get(name) or ureg.get_symbol(name)
        factors.append((symbol, float(exponent)))
    return tuple(factors)


@lru_cache(maxsize=2048)
def linear_factor(units: pint.Unit, target: pint.Unit) -> float | None:
    """The factor that takes a magnitude in ``units`` to ``target``; None when either has
    an offset (degrees Celsius), which only pint's own conversion handles.

    Found once per pair of units: a sheet shows and writes thousands of values in a few
    dozen units, and asking pint each time cost a tenth of a rebuilt sheet and a fifth of
    a batch member. Raises ``pint.DimensionalityError`` for units of different kinds.
    """
    one = ureg.Quantity(1.0, units).to(target)
    zero = ureg.Quantity(0.0, units).to(target)
    return float(one.magnitude) if float(zero.magnitude) == 0.0 else None


# --- significant figures -------------------------------------------------------------


@dataclass(frozen=True)
class NumberStyle:
    """How numbers print on a sheet.

    ``significant`` None means the trade's habit: four significant figures when the
    leading digit is 1, three otherwise (common practice, no source). Trailing
    zeros that carry precision are kept (2.50, not 2.5).
    """

    significant: int | None = None
    group_thousands: bool = False
    scientific_above: float = 1e7
    scientific_below: float = 1e-4


DEFAULT_STYLE = NumberStyle()


@dataclass(frozen=True)
class FormattedNumber:
    """A number ready to typeset: sign, digits and an optional power of ten."""

    negative: bool
    digits: str
    exponent: int | None = None

    def plain(self) -> str:
        """ASCII form, e.g. ``-1.23e+08``, for logs and JSON-adjacent text."""
        sign = "-" if self.negative else ""
        power = f"e{self.exponent:+03d}" if self.exponent is not None else ""
        return f"{sign}{self.digits}{power}"


def format_number(value: float, style: NumberStyle = DEFAULT_STYLE) -> FormattedNumber:
    """Round ``value`` to significant figures the way an engineer writes it."""
    if not math.isfinite(value):
        raise ValueError(f"cannot format a non-finite number: {value}")
    if value == 0:
        return FormattedNumber(False, "0")
    negative = value < 0
    magnitude = abs(value)
    # Ten figures first: a value that is 3.565 up to round-off (3.5649999999, from one
    # side of a symmetric section) then rounds like its mirror image 3.5650000001.
    decimal_value = Decimal(repr(magnitude))
    if (style.significant or 0) < _CARRIED:
        decimal_value = _round_significant(decimal_value, _CARRIED)
    if style.significant:
        rounded = _round_significant(decimal_value, style.significant)
    else:
        rounded = _round_significant(decimal_value, 3)
        if _leading_digit(rounded) == 1:  # 9.9996 rounds to 10.0, which then takes 4 figures
            rounded = _round_significant(decimal_value, 4)
    exponent10 = rounded.adjusted()
    if magnitude >= style.scientific_above or magnitude < style.scientific_below:
        mantissa = rounded.scaleb(-exponent10)
        return FormattedNumber(negative, f"{mantissa:f}", exponent10)
    digits = f"{rounded:f}"
    if style.group_thousands:
        whole, _, fraction = digits.partition(".")
        whole = f"{int(whole):,}"
        digits = f"{whole}.{fraction}" if fraction else whole
    return FormattedNumber(negative, digits)


# Figures a value keeps before it is rounded for print; the evaluator carries twelve.
_CARRIED = 10
# Figures a typed input may have and still print exactly as typed.
_TYPED = 6


def _round_significant(value: Decimal, significant: int) -> Decimal:
    # Halves to even (ISO 80000-1 Annex B, rule A); a magnitude is rounded, so a value
    # and its negative print alike.
    exponent10 = value.adjusted()
    rounded = value.quantize(Decimal(1).scaleb(exponent10 - significant + 1), ROUND_HALF_EVEN)
    if rounded.adjusted() != exponent10:  # 9.995 -> 10.0: one digit more, one decimal less
        rounded = rounded.quantize(Decimal(1).scaleb(rounded.adjusted() - significant + 1))
    return rounded


def format_as_typed(value: float, style: NumberStyle = DEFAULT_STYLE) -> FormattedNumber:
    """An input's number as it was typed: 15 not 15.0, 1.67 not 1.670, 0.375 as is.

    A value with at most six significant figures (after removing round-off from a
    unit conversion) prints with exactly its own figures; anything longer, or
    outside the plain-notation range, prints by :func:`format_number`.
    """
    if not math.isfinite(value) or value == 0:
        return format_number(value, style)
    magnitude = abs(value)
    if magnitude >= style.scientific_above or magnitude < style.scientific_below:
        return format_number(value, style)
    carried = _round_significant(Decimal(repr(magnitude)), _CARRIED).normalize()
    if len(carried.as_tuple().digits) > _TYPED:
        return format_number(value, style)
    digits = f"{carried:f}"
    if style.group_thousands:
        whole, _, fraction = digits.partition(".")
        digits = f"{int(whole):,}" + (f".{fraction}" if fraction else "")
    return FormattedNumber(value < 0, digits)


def format_count(value: float) -> FormattedNumber | None:
    """A whole number (a class, a count) as an integer; None when ``value`` is not whole."""
    if not math.isfinite(value) or abs(value) >= 1e6:
        return None
    nearest = round(value)
    if abs(value - nearest) > 1e-9 * max(1.0, abs(value)):
        return None
    return FormattedNumber(nearest < 0, str(abs(nearest)))


def _leading_digit(value: Decimal) -> int:
    return value.as_tuple().digits[0]
