"""Loads on a cantilever member: point forces given by magnitude and direction, and couples.

Axis system (the same as :mod:`calcsheet.sections.section`): the member runs along
local z from its fixed support at z = 0 to its free end at z = L; x and y lie in
the cross-section (x right, y up, origin at the centroid), and x, y, z are
right-handed. A point load acts at the station ``z`` along the member and at
offsets ``ex``, ``ey`` from the centroid of the section there (a lug below the
flange has ``ey < 0``).

A force's direction is given either by its three components, or by an angle in a
plane of the member: the force points ``cos(angle)`` along ``from_axis`` and
``sin(angle)`` along ``toward_axis`` (two different axes, each one of ``+x``,
``-x``, ``+y``, ``-y``, ``+z``, ``-z``). Text is parsed with
:func:`calcsheet.units.parse_quantity`; a bad entry raises :class:`InputError`
naming the field.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.units import Quantity, parse_quantity

QuantityInput = pint.Quantity | str | float | int

AXES: tuple[str, ...] = ("x", "y", "z")

# An angle beyond one turn either way is a slip ("400 deg" for "40 deg"), never a
# direction an engineer means: it would be read as the angle less a turn.
MAX_TURN_DEG = 360.0
_SIGNED_AXES = {
    f"{sign}{axis}": (axis, 1.0 if sign == "+" else -1.0) for axis in AXES for sign in "+-"
}


@dataclass(frozen=True)
class Direction:
    """How a force's direction was given: an angle between two signed axes.

    The unit vector is ``cos(angle)·from_axis + sin(angle)·toward_axis``.
    """

    angle: pint.Quantity
    from_axis: str
    toward_axis: str


@dataclass(frozen=True)
class PointLoad:
    """A force at station ``z`` and offsets (``ex``, ``ey``) from the section centroid.

    ``Fx``, ``Fy``, ``Fz`` are the components along the member axes. ``magnitude``
    and ``direction`` record how it was given (``direction`` is ``None`` when the
    components were given directly), so a sheet can print the resolution.
    """

    name: str
    Fx: pint.Quantity
    Fy: pint.Quantity
    Fz: pint.Quantity
    z: pint.Quantity
    ex: pint.Quantity
    ey: pint.Quantity
    magnitude: pint.Quantity
    direction: Direction | None = None

    def component(self, axis: str) -> pint.Quantity:
        """The component along ``x``, ``y`` or ``z``."""
        return {"x": self.Fx, "y": self.Fy, "z": self.Fz}[axis]


@dataclass(frozen=True)
class AppliedMoment:
    """A concentrated couple at station ``z`` with components along x, y and z.

    Components follow the right-hand rule about the member axes (``Mz`` twists
    the member about its axis).
    """

    name: str
    Mx: pint.Quantity
    My: pint.Quantity
    Mz: pint.Quantity
    z: pint.Quantity


def parse_signed_axis(text: str, *, field: str) -> tuple[str, float]:
    """Read ``"+y"``, ``"-z"`` or ``"x"`` into (axis letter, sign)."""
    key = str(text).strip().lower()
    if key in AXES:
        key = "+" + key
    if key not in _SIGNED_AXES:
        raise InputError(field, text, "one of +x, -x, +y, -y, +z, -z")
    return _SIGNED_AXES[key]


def point_load(
    name: str,
    *,
    z: QuantityInput,
    magnitude: QuantityInput | None = None,
    angle: QuantityInput | None = None,
    from_axis: str = "+z",
    toward_axis: str = "-y",
    components: tuple[QuantityInput, QuantityInput, QuantityInput] | None = None,
    ex: QuantityInput = "0 in",
    ey: QuantityInput = "0 in",
) -> PointLoad:
    """A point load given by magnitude + angle in a plane, or by (Fx, Fy, Fz).

    Give either ``magnitude`` and ``angle`` (the force points
    ``cos(angle)·from_axis + sin(angle)·toward_axis``), or ``components``.
    A zero or negative magnitude (the angle gives the direction), an angle without
    its unit or beyond a full turn either way (|angle| > 360 deg), or parallel axes
    raise :class:`InputError` naming the field (``load <name> angle`` ...).
    """
    prefix = f"load {name}"
    z_q = parse_quantity(z, field=f"{prefix} z", dimension="length")
    ex_q = parse_quantity(ex, field=f"{prefix} ex", dimension="length")
    ey_q = parse_quantity(ey, field=f"{prefix} ey", dimension="length")
    if components is not None:
        if magnitude is not None or angle is not None:
            raise InputError(
                f"{prefix} direction", components, "either components or magnitude and angle"
            )
        if len(components) != 3:
            raise InputError(f"{prefix} components", components, "three forces (Fx, Fy, Fz)")
        fx, fy, fz = (
            parse_quantity(value, field=f"{prefix} F{axis}", dimension="force")
            for axis, value in zip(AXES, components, strict=True)
        )
        unit = fx.units
        fy, fz = fy.to(unit), fz.to(unit)
        size = math.hypot(fx.m, fy.m, fz.m)  # no overflow for components near 1e308
        if size == 0.0:
            raise InputError(
                f"{prefix} components", components, "a force with a direction", "all three are zero"
            )
        return PointLoad(name, fx, fy, fz, z_q, ex_q, ey_q, Quantity(size, unit), None)

    if magnitude is None or angle is None:
        raise InputError(
            f"{prefix} direction",
            None,
            "magnitude and angle (with from_axis/toward_axis), or components (Fx, Fy, Fz)",
        )
    size = parse_quantity(magnitude, field=f"{prefix} magnitude", dimension="force")
    if size.m == 0.0:
        raise InputError(
            f"{prefix} magnitude", magnitude, "a non-zero force", "zero has no direction"
        )
    theta = parse_quantity(angle, field=f"{prefix} angle", dimension="angle")
    degrees = float(theta.to("deg").m)
    if abs(degrees) > MAX_TURN_DEG:
        within = math.fmod(degrees, MAX_TURN_DEG)
        raise InputError(
            f"{prefix} angle",
            angle,
            f"an angle from -{MAX_TURN_DEG:g} to {MAX_TURN_DEG:g} deg",
            f"more than a full turn; it would be taken as {within:.6g} deg: write that if meant",
        )
    if size.m < 0.0:
        # A negative magnitude silently reverses the force; the direction is the angle's.
        reversed_angle = degrees + 180.0 if degrees + 180.0 <= MAX_TURN_DEG else degrees - 180.0
        raise InputError(
            f"{prefix} magnitude",
            magnitude,
            "a positive force; the angle gives its direction",
            f"a negative magnitude reverses the force: to reverse it, write the magnitude "
            f"without its sign and the angle {reversed_angle:.6g} deg (the angle ± 180 deg)",
        )
    first, first_sign = parse_signed_axis(from_axis, field=f"{prefix} from_axis")
    second, second_sign = parse_signed_axis(toward_axis, field=f"{prefix} toward_axis")
    if first == second:
        raise InputError(
            f"{prefix} toward_axis",
            toward_axis,
            f"an axis other than {first}",
            "the axes are parallel",
        )
    radians = float(theta.to("radian").m)
    values = dict.fromkeys(AXES, 0.0)
    values[first] += first_sign * math.cos(radians)
    values[second] += second_sign * math.sin(radians)
    unit = size.units
    fx, fy, fz = (Quantity(size.m * values[axis], unit) for axis in AXES)
    direction = Direction(
        theta,
        f"{'+' if first_sign > 0 else '-'}{first}",
        f"{'+' if second_sign > 0 else '-'}{second}",
    )
    return PointLoad(name, fx, fy, fz, z_q, ex_q, ey_q, size, direction)


def applied_moment(
    name: str,
    *,
    z: QuantityInput,
    Mx: QuantityInput = "0 kip*ft",
    My: QuantityInput = "0 kip*ft",
    Mz: QuantityInput = "0 kip*ft",
) -> AppliedMoment:
    """A concentrated couple at station ``z`` (right-hand rule about x, y, z)."""
    prefix = f"moment {name}"
    z_q = parse_quantity(z, field=f"{prefix} z", dimension="length")
    mx, my, mz = (
        parse_quantity(value, field=f"{prefix} M{axis}", dimension="moment")
        for axis, value in zip(AXES, (Mx, My, Mz), strict=True)
    )
    return AppliedMoment(name, mx, my.to(mx.units), mz.to(mx.units), z_q)


def member_length(length: QuantityInput, *, field: str = "member length") -> pint.Quantity:
    """Parse and validate the member length (positive)."""
    value = parse_quantity(length, field=field, dimension="length")
    if value.m <= 0:
        raise InputError(field, length, "a positive length", "the member must have a length")
    return value


def check_on_member(
    value: pint.Quantity, length: pint.Quantity, *, field: str, shown: object
) -> None:
    """Raise :class:`InputError` unless 0 <= value <= length."""
    if value.m < 0 or value.to(length.units).m > length.m:
        raise InputError(
            field, shown, f"a station from 0 to the member length {length:~P}", "outside the member"
        )
