"""Sections an engineer defines by dimensions, in any length unit ("300 mm", "12 in").

Each function takes quantities or text, converts every dimension to the unit of
the first one (so an SI section keeps mm and a US one inches), validates it
(InputError naming the field) and returns a :class:`~calcsheet.sections.section.Section`
whose properties are all computed from the outline. Orientation, origin and
labels are as described in :mod:`calcsheet.sections.shapes` and
:mod:`calcsheet.sections.section`.
"""

from __future__ import annotations

from collections.abc import Sequence

import pint

from calcsheet.errors import InputError
from calcsheet.sections import shapes
from calcsheet.sections.section import Section, build_section
from calcsheet.units import parse_quantity

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


def _floats(dimensions: dict[str, pint.Quantity]) -> dict[str, float]:
    return {field: float(quantity.magnitude) for field, quantity in dimensions.items()}


def _section(name: str, family: str, unit: str, dimensions, shape) -> Section:
    return build_section(
        name=name, family=family, dimensions=dimensions, length_unit=unit, shape=shape
    )


def plate(b: LengthInput, d: LengthInput, *, name: str = "plate") -> Section:
    """Solid rectangle: width ``b`` (horizontal) by depth ``d`` (vertical)."""
    unit, dims = _lengths(b=b, d=d)
    value = _floats(dims)
    return _section(name, "plate", unit, dims, shapes.rectangle(value["b"], value["d"], unit))


def round_bar(D: LengthInput, *, name: str = "round bar") -> Section:
    """Solid round bar of diameter ``D``."""
    unit, dims = _lengths(D=D)
    return _section(name, "round bar", unit, dims, shapes.round_bar(_floats(dims)["D"], unit))


def round_hss(OD: LengthInput, t: LengthInput, *, name: str = "round HSS") -> Section:
    """Round HSS or pipe; ``t`` is the design wall thickness."""
    unit, dims = _lengths(OD=OD, t=t)
    value = _floats(dims)
    return _section(name, "round HSS", unit, dims, shapes.round_tube(value["OD"], value["t"], unit))


def rectangular_hss(
    H: LengthInput, B: LengthInput, t: LengthInput, *, name: str = "rectangular HSS"
) -> Section:
    """Rectangular HSS, height ``H`` by width ``B``, design wall ``t``, corner radii 2t / t."""
    unit, dims = _lengths(H=H, B=B, t=t)
    value = _floats(dims)
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
    unit, dims = _lengths(d=d, bf=bf, tw=tw, tf=tf, bf_bottom=bf_bottom, tf_bottom=tf_bottom)
    value = _floats(dims)
    shape = shapes.i_shape(
        value["d"],
        value["bf"],
        value["tw"],
        value["tf"],
        unit,
        bottom_flange_width=value.get("bf_bottom"),
        bottom_flange=value.get("tf_bottom"),
    )
    return _section(name, "I-shape", unit, dims, shape)


def channel(
    d: LengthInput, bf: LengthInput, tw: LengthInput, tf: LengthInput, *, name: str = "channel"
) -> Section:
    """Channel, back of web on the left."""
    unit, dims = _lengths(d=d, bf=bf, tw=tw, tf=tf)
    value = _floats(dims)
    shape = shapes.channel(value["d"], value["bf"], value["tw"], value["tf"], unit)
    return _section(name, "channel", unit, dims, shape)


def angle(d: LengthInput, b: LengthInput, t: LengthInput, *, name: str = "angle") -> Section:
    """Angle with vertical leg ``d`` and horizontal leg ``b``, heel at the lower left."""
    unit, dims = _lengths(d=d, b=b, t=t)
    value = _floats(dims)
    return _section(
        name, "angle", unit, dims, shapes.angle(value["d"], value["b"], value["t"], unit)
    )


def tee(
    d: LengthInput, bf: LengthInput, tw: LengthInput, tf: LengthInput, *, name: str = "tee"
) -> Section:
    """Tee, flange on top, stem down."""
    unit, dims = _lengths(d=d, bf=bf, tw=tw, tf=tf)
    value = _floats(dims)
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
