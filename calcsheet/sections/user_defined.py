"""Sections an engineer defines by dimensions, in any length unit ("300 mm", "12 in").

Each function takes quantities or text, converts every dimension to the unit of
the first one (so an SI section keeps mm and a US one inches), validates it
(InputError naming the field) and returns a :class:`~calcsheet.sections.section.Section`
whose properties are all computed from the outline. Orientation, origin and
labels are as described in :mod:`calcsheet.sections.shapes` and
:mod:`calcsheet.sections.section`.
"""

from __future__ import annotations

from collections.abc import Iterator, Sequence
from contextlib import contextmanager

import pint

from calcsheet.errors import InputError
from calcsheet.sections import shapes
from calcsheet.sections.section import Section, build_section
from calcsheet.units import Quantity, parse_quantity

LengthInput = pint.Quantity | str | float | int


def _lengths(**given: LengthInput | None) -> tuple[str, dict[str, pint.Quantity]]:
    """Parse every given length; the unit of the first one becomes the section's unit."""
    parsed = {
        field: parse_quantity(value, field=field, dimension="length")
        for field, value in given.items()
        if value is not None
    }
    unit = str(next(iter(parsed.values())).units)
    return unit, {field: quantity.to(unit) for field, quantity in parsed.items()}


@contextmanager
def _as_typed(
    given: dict[str, LengthInput | None], dims: dict[str, pint.Quantity]
) -> Iterator[None]:
    """Quote a dimension in a message as it was typed ("2.1 in"), not as converted."""
    try:
        yield
    except InputError as error:
        value = dims.get(error.field)
        typed = given.get(error.field)
        if value is None or typed is None or error.value != f"{value.m:g} {value.units}":
            raise
        raise InputError(error.field, typed, error.expected, error.problem) from None


def _short(value: float, unit: str) -> str:
    return f"{Quantity(value, unit):g~P}"


def _floats(dimensions: dict[str, pint.Quantity]) -> dict[str, float]:
    return {field: float(quantity.magnitude) for field, quantity in dimensions.items()}


def _section(name: str, family: str, unit: str, dimensions, shape) -> Section:
    return build_section(
        name=name, family=family, dimensions=dimensions, length_unit=unit, shape=shape
    )


def plate(b: LengthInput, d: LengthInput, *, name: str = "plate") -> Section:
    """Solid rectangle: width ``b`` (horizontal) by depth ``d`` (vertical)."""
    given = {"b": b, "d": d}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    with _as_typed(given, dims):
        shape = shapes.rectangle(value["b"], value["d"], unit)
    return _section(name, "plate", unit, dims, shape)


def round_bar(D: LengthInput, *, name: str = "round bar") -> Section:
    """Solid round bar of diameter ``D``."""
    given = {"D": D}
    unit, dims = _lengths(**given)
    with _as_typed(given, dims):
        shape = shapes.round_bar(_floats(dims)["D"], unit)
    return _section(name, "round bar", unit, dims, shape)


def round_hss(OD: LengthInput, t: LengthInput, *, name: str = "round HSS") -> Section:
    """Round HSS or pipe; ``t`` is the design wall thickness."""
    given = {"OD": OD, "t": t}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    with _as_typed(given, dims):
        shape = shapes.round_tube(value["OD"], value["t"], unit)
    return _section(name, "round HSS", unit, dims, shape)


def rectangular_hss(
    H: LengthInput, B: LengthInput, t: LengthInput, *, name: str = "rectangular HSS"
) -> Section:
    """Rectangular HSS, height ``H`` by width ``B``, design wall ``t``, corner radii 2t / t."""
    given = {"H": H, "B": B, "t": t}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    smaller = min(value["H"], value["B"])
    if min(value.values()) > 0 and not 4 * value["t"] < smaller:
        # The outside corners have radius 2t: two of them across the smaller side.
        raise InputError(
            "t",
            t,
            f"a wall thinner than a quarter of the smaller outside dimension "
            f"({_short(smaller, unit)} / 4 = {_short(smaller / 4, unit)})",
            "with outside corner radii of 2t the section outline would not close",
        )
    with _as_typed(given, dims):
        shape = shapes.rectangular_tube(value["H"], value["B"], value["t"], unit)
    return _section(name, "rectangular HSS", unit, dims, shape)


def i_shape(
    d: LengthInput,
    bf: LengthInput,
    tw: LengthInput,
    tf: LengthInput,
    *,
    bf_bottom: LengthInput | None = None,
    tf_bottom: LengthInput | None = None,
    name: str = "I-shape",
) -> Section:
    """I-shape; give ``bf_bottom``/``tf_bottom`` for a bottom flange unlike the top one."""
    given = {"d": d, "bf": bf, "tw": tw, "tf": tf, "bf_bottom": bf_bottom, "tf_bottom": tf_bottom}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    bottom = value.get("tf_bottom")
    if bottom is not None and min(value.values()) > 0 and not value["tf"] + bottom < value["d"]:
        raise InputError(
            "tf",
            tf,
            f"less than d - tf_bottom = {_short(value['d'] - bottom, unit)} "
            f"(with tf_bottom = {tf_bottom}, both flanges together thinner than the depth d)",
            "the section outline would not close",
        )
    with _as_typed(given, dims):
        shape = shapes.i_shape(
            value["d"],
            value["bf"],
            value["tw"],
            value["tf"],
            unit,
            bottom_flange_width=value.get("bf_bottom"),
            bottom_flange=bottom,
        )
    return _section(name, "I-shape", unit, dims, shape)


def channel(
    d: LengthInput, bf: LengthInput, tw: LengthInput, tf: LengthInput, *, name: str = "channel"
) -> Section:
    """Channel, back of web on the left."""
    given = {"d": d, "bf": bf, "tw": tw, "tf": tf}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    with _as_typed(given, dims):
        shape = shapes.channel(value["d"], value["bf"], value["tw"], value["tf"], unit)
    return _section(name, "channel", unit, dims, shape)


def angle(d: LengthInput, b: LengthInput, t: LengthInput, *, name: str = "angle") -> Section:
    """Angle with vertical leg ``d`` and horizontal leg ``b``, heel at the lower left."""
    given = {"d": d, "b": b, "t": t}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    with _as_typed(given, dims):
        shape = shapes.angle(value["d"], value["b"], value["t"], unit)
    return _section(name, "angle", unit, dims, shape)


def tee(
    d: LengthInput, bf: LengthInput, tw: LengthInput, tf: LengthInput, *, name: str = "tee"
) -> Section:
    """Tee, flange on top, stem down."""
    given = {"d": d, "bf": bf, "tw": tw, "tf": tf}
    unit, dims = _lengths(**given)
    value = _floats(dims)
    with _as_typed(given, dims):
        shape = shapes.tee(value["d"], value["bf"], value["tw"], value["tf"], unit)
    return _section(name, "tee", unit, dims, shape)


def built_up(
    plates: Sequence[tuple[LengthInput, LengthInput, LengthInput, LengthInput]],
    *,
    name: str = "built-up section",
) -> Section:
    """Rectangles given as (width, depth, left edge x, bottom edge y); touching, not overlapping.

    Positions may be zero or negative; they only place the plates relative to
    each other.
    """
    unit = None
    specs, dims = [], {}
    for index, plate_entry in enumerate(plates, start=1):
        if len(plate_entry) != 4:
            raise InputError(
                f"plate {index}",
                plate_entry,
                "(width, depth, left x, bottom y), e.g. ('12 in', '1 in', 0, '10 in')",
            )
        width, depth = (
            parse_quantity(value, field=f"plate {index} {role}", dimension="length")
            for value, role in zip(plate_entry[:2], ("width", "depth"), strict=True)
        )
        unit = unit or str(width.units)
        left, bottom = (
            _position(value, f"plate {index} {role}", unit)
            for value, role in zip(plate_entry[2:], ("left", "bottom"), strict=True)
        )
        dims[f"plate {index}"] = (width.to(unit), depth.to(unit))
        specs.append(
            shapes.PlateSpec(
                float(width.to(unit).magnitude),
                float(depth.to(unit).magnitude),
                float(left.to(unit).magnitude),
                float(bottom.to(unit).magnitude),
            )
        )
    shape = shapes.built_up(specs, unit or "in")
    flat_dims = {
        f"{plate} {role}": quantity
        for plate, pair in dims.items()
        for role, quantity in zip(("b", "d"), pair, strict=True)
    }
    return _section(name, "built-up", unit or "inch", flat_dims, shape)


def _position(value: LengthInput, field: str, unit: str) -> pint.Quantity:
    """A plate position; a bare 0 is accepted as zero length."""
    if isinstance(value, (int, float)) and not isinstance(value, bool) and value == 0:
        return parse_quantity(f"0 {unit}", field=field, dimension="length")
    return parse_quantity(value, field=field, dimension="length")
