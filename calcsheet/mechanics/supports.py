"""Supports of a straight member: where it is held and which motions each support restrains.

The member runs along z from 0 to L (axes as in :mod:`calcsheet.mechanics.loads`).
A support sits on the member axis at station ``z`` and restrains a set of the six
motions of the section there: the translations ``ux``, ``uy``, ``uz`` and the
rotations ``rx``, ``ry``, ``rz`` (``rz`` is the twist about the member axis). The
named cases of the trade are built by :func:`support_case`.

The pin and the roller of the simply supported cases restrain the twist as well
(a fork support: the section cannot rotate about the member axis at a support),
which is how a beam end framed into a support is taken in practice (common
practice, no source); a support that leaves the twist free is written with
:func:`support` and its own set of motions.
"""

from __future__ import annotations

from collections.abc import Iterable, Sequence
from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.mechanics.loads import QuantityInput, check_on_member, member_length
from calcsheet.units import parse_quantity

MOTIONS: tuple[str, ...] = ("ux", "uy", "uz", "rx", "ry", "rz")
"""The six motions of a section, in the order of every numeric array of the frame solver."""

FIXED: frozenset[str] = frozenset(MOTIONS)
"""A fixed end: every translation and rotation restrained."""

PINNED: frozenset[str] = frozenset({"ux", "uy", "uz", "rz"})
"""A pin: the three translations and the twist restrained; bending rotations free."""

ROLLER: frozenset[str] = frozenset({"ux", "uy", "rz"})
"""A roller: the two transverse translations and the twist; free along the member axis."""

SUPPORT_CASES: tuple[str, ...] = (
    "fixed-free",
    "pinned-pinned",
    "fixed-pinned",
    "fixed-fixed",
    "overhang",
    "two-span",
)
"""The named support cases of :func:`support_case`."""


@dataclass(frozen=True)
class Support:
    """A support at station ``z`` on the member axis restraining the motions in ``restrains``."""

    name: str
    z: pint.Quantity
    restrains: frozenset[str]

    def restrained_indices(self) -> tuple[int, ...]:
        """Indices in :data:`MOTIONS` of the restrained motions, in that order."""
        return tuple(index for index, motion in enumerate(MOTIONS) if motion in self.restrains)


def support(name: str, *, z: QuantityInput, restrains: Iterable[str]) -> Support:
    """A support from its station and the names of the motions it restrains.

    Raises :class:`InputError` naming ``support <name> restrains`` for a motion
    name not in :data:`MOTIONS`, or for an empty set (a support that holds nothing).
    """
    field = f"support {name}"
    z_q = parse_quantity(z, field=f"{field} z", dimension="length")
    wanted = [str(motion).strip().lower() for motion in restrains]
    unknown = [motion for motion in wanted if motion not in MOTIONS]
    if unknown:
        raise InputError(
            f"{field} restrains", unknown, f"motions among {', '.join(MOTIONS)}", "unknown motion"
        )
    if not wanted:
        raise InputError(f"{field} restrains", wanted, "at least one motion", "it holds nothing")
    return Support(name, z_q, frozenset(wanted))


def support_case(
    case: str,
    length: QuantityInput,
    *,
    positions: Sequence[QuantityInput] | None = None,
) -> tuple[Support, ...]:
    """The supports of a named case of the trade (one of :data:`SUPPORT_CASES`).

    * ``fixed-free``: fixed at ``positions[0]`` (default z = 0), the rest free.
    * ``pinned-pinned``: a pin and a roller (default at 0 and L).
    * ``fixed-pinned``: fixed at the first position, a roller at the second (0, L).
    * ``fixed-fixed``: fixed at both (0, L).
    * ``overhang``: a pin and a roller at two given stations; one or both ends overhang.
    * ``two-span``: a pin at the first station and rollers at the other two (default
      0, L/2, L): two spans over an intermediate support.

    ``positions`` moves the supports (an overhang is a pinned-pinned case with a
    support inside the member). A wrong count of positions or a position outside
    the member raises :class:`InputError` naming the field.
    """
    length_q = member_length(length)
    key = str(case).strip().lower()
    layouts: dict[str, tuple[tuple[frozenset[str], ...], tuple[QuantityInput, ...] | None]] = {
        "fixed-free": ((FIXED,), (0 * length_q,)),
        "pinned-pinned": ((PINNED, ROLLER), (0 * length_q, length_q)),
        "fixed-pinned": ((FIXED, ROLLER), (0 * length_q, length_q)),
        "fixed-fixed": ((FIXED, FIXED), (0 * length_q, length_q)),
        "overhang": ((PINNED, ROLLER), None),
        "two-span": ((PINNED, ROLLER, ROLLER), (0 * length_q, length_q / 2, length_q)),
    }
    if key not in layouts:
        raise InputError("support case", case, f"one of {', '.join(SUPPORT_CASES)}")
    kinds, default_positions = layouts[key]
    chosen = default_positions if positions is None else tuple(positions)
    if chosen is None or len(chosen) != len(kinds):
        raise InputError(
            "support positions",
            positions,
            f"{len(kinds)} stations for the case {key}",
            "the case needs one station per support",
        )
    supports = []
    for number, (kind, where) in enumerate(zip(kinds, chosen, strict=True), start=1):
        field = f"support positions[{number - 1}]"
        z_q = parse_quantity(where, field=field, dimension="length")
        check_on_member(z_q, length_q, field=field, shown=where)
        supports.append(Support(f"S{number}", z_q, kind))
    return tuple(supports)
