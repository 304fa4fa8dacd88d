"""Distributed loads along a member: uniform or linearly varying, over a part of it, offset.

Axes as in :mod:`calcsheet.mechanics.loads`. A distributed load acts from station
``z_start`` to ``z_end`` with the force per length ``q_start`` = (qx, qy, qz) at
its start and ``q_end`` at its end, varying linearly between; it acts at offsets
``ex``, ``ey`` from the centroid (so a load along y applied at ``ex`` twists the
member, and a load along z at ``ey`` bends it). Self-weight is a uniform load
along the stated gravity axis over the whole member.
"""

from __future__ import annotations

from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.mechanics.loads import (
    AXES,
    QuantityInput,
    check_on_member,
    member_length,
    parse_signed_axis,
)
from calcsheet.units import Quantity, parse_quantity

ForcePerLength = tuple[QuantityInput, QuantityInput, QuantityInput]


@dataclass(frozen=True)
class DistributedLoad:
    """Force per length varying linearly from ``q_start`` at ``z_start`` to ``q_end`` at ``z_end``.

    ``q_start`` and ``q_end`` hold (qx, qy, qz) in one unit of force per length.
    """

    name: str
    z_start: pint.Quantity
    z_end: pint.Quantity
    q_start: tuple[pint.Quantity, pint.Quantity, pint.Quantity]
    q_end: tuple[pint.Quantity, pint.Quantity, pint.Quantity]
    ex: pint.Quantity
    ey: pint.Quantity


def distributed_load(
    name: str,
    *,
    z_start: QuantityInput,
    z_end: QuantityInput,
    q_start: ForcePerLength,
    q_end: ForcePerLength | None = None,
    ex: QuantityInput = "0 in",
    ey: QuantityInput = "0 in",
) -> DistributedLoad:
    """A distributed load by its (qx, qy, qz) at both ends (``q_end`` defaults to uniform).

    Its extent is checked against the member by the solver (which knows the
    length); here a start not before the end raises :class:`InputError` naming
    ``distributed load <name> z_end``.
    """
    prefix = f"distributed load {name}"
    start = parse_quantity(z_start, field=f"{prefix} z_start", dimension="length")
    end = parse_quantity(z_end, field=f"{prefix} z_end", dimension="length")
    if end.to(start.units).m <= start.m:
        raise InputError(
            f"{prefix} z_end",
            z_end,
            f"a station beyond z_start = {start:~P}",
            "a distributed load needs a length",
        )

    def read(values: ForcePerLength, which: str) -> tuple[pint.Quantity, ...]:
        if len(values) != 3:
            raise InputError(f"{prefix} {which}", values, "three forces per length (qx, qy, qz)")
        read_values = tuple(
            parse_quantity(value, field=f"{prefix} {which} q{axis}", dimension="force per length")
            for axis, value in zip(AXES, values, strict=True)
        )
        unit = read_values[0].units
        return tuple(value.to(unit) for value in read_values)

    q_at_start = read(q_start, "q_start")
    q_at_end = q_at_start if q_end is None else read(q_end, "q_end")
    unit = q_at_start[0].units
    q_at_end = tuple(value.to(unit) for value in q_at_end)
    ex_q = parse_quantity(ex, field=f"{prefix} ex", dimension="length")
    ey_q = parse_quantity(ey, field=f"{prefix} ey", dimension="length")
    return DistributedLoad(name, start, end, q_at_start, q_at_end, ex_q, ey_q)  # type: ignore[arg-type]


def self_weight(
    weight_per_length: QuantityInput,
    length: QuantityInput,
    *,
    gravity_axis: str = "-y",
    name: str = "self-weight",
) -> DistributedLoad:
    """The member's own weight: a uniform load of ``weight_per_length`` along ``gravity_axis``.

    ``gravity_axis`` is one of +x, -x, +y, -y, +z, -z (``-y`` for a horizontal beam
    with its web vertical, ``-z`` for a column standing on its base at z = 0).
    """
    weight = parse_quantity(
        weight_per_length, field=f"{name} weight per length", dimension="force per length"
    )
    if weight.m < 0:
        raise InputError(
            f"{name} weight per length",
            weight_per_length,
            "a weight of zero or more; gravity_axis gives its direction",
        )
    length_q = member_length(length)
    axis, sign = parse_signed_axis(gravity_axis, field=f"{name} gravity_axis")
    components = tuple(
        Quantity(sign * weight.m if each == axis else 0.0, weight.units) for each in AXES
    )
    zero = Quantity(0.0, length_q.units)
    return DistributedLoad(name, zero, length_q, components, components, zero, zero)  # type: ignore[arg-type]


def check_distributed_on_member(load: DistributedLoad, length: pint.Quantity) -> None:
    """Raise :class:`InputError` when a distributed load reaches outside the member."""
    prefix = f"distributed load {load.name}"
    check_on_member(load.z_start, length, field=f"{prefix} z_start", shown=f"{load.z_start:~P}")
    check_on_member(load.z_end, length, field=f"{prefix} z_end", shown=f"{load.z_end:~P}")
