"""The member sheet's figures, drawn from the sheet's current values at render time.

A figure is a function of the sheet (see :meth:`Sheet.figure`), so after
``set_input`` the load arrows, their angles and the stress distribution follow
the new values, exactly like the steps.
"""

from __future__ import annotations

import weakref
from collections.abc import Callable, Sequence

import pint

from calcsheet.engine import Sheet
from calcsheet.figures import member_figure, normal_stress_figure, section_figure
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.mechanics.distributed import DistributedLoad
from calcsheet.mechanics.loads import AppliedMoment, PointLoad
from calcsheet.mechanics.supports import Support
from calcsheet.sections import Section


def _current_loads(
    sheet: Sheet, loads: Sequence[PointLoad | AppliedMoment]
) -> tuple[list[PointLoad], list[AppliedMoment]]:
    """The loads rebuilt with the sheet's current magnitudes, angles and offsets."""
    forces, couples = [], []
    for number, load in enumerate(loads, start=1):
        value = sheet.value
        z = value(f"z_{number}")
        if isinstance(load, AppliedMoment):
            couples.append(
                applied_moment(
                    load.name,
                    z=z,
                    Mx=value(f"C_x{number}"),
                    My=value(f"C_y{number}"),
                    Mz=value(f"C_z{number}"),
                )
            )
            continue
        offsets = {"ex": value(f"e_x{number}"), "ey": value(f"e_y{number}")}
        if load.direction is not None:
            forces.append(
                point_load(
                    load.name,
                    z=z,
                    magnitude=value(f"P_{number}"),
                    angle=value(f"theta_{number}"),
                    from_axis=load.direction.from_axis,
                    toward_axis=load.direction.toward_axis,
                    **offsets,
                )
            )
        else:
            components = tuple(value(f"F_{axis}{number}") for axis in "xyz")
            forces.append(point_load(load.name, z=z, components=components, **offsets))
    return forces, couples


def member_drawing(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    unit: str,
    *,
    supports: Sequence[Support] = (),
    distributed: Sequence[DistributedLoad] = (),
    braces: Sequence[pint.Quantity] = (),
) -> Callable[[Sheet], str]:
    """The elevation and end view of the member with its loads and supports, as they are now.

    ``supports`` and ``distributed`` are drawn as built (a change of them rebuilds the
    sheet); the point loads follow the sheet's current values.
    """

    def draw(sheet: Sheet) -> str:
        forces, couples = _current_loads(sheet, loads)
        return member_figure(
            sheet.value("L"),
            sheet.value("z_s"),
            forces,
            section=section,
            moments=couples,
            unit=unit,
            supports=supports,
            distributed=distributed,
            braces=braces,
        )

    return draw


# A sheet rebuilt after a change of load draws the same section again: drawn once per
# section object (forgotten with it), a few ms of every rebuild of the form's preview.
_SECTION_DRAWINGS: weakref.WeakKeyDictionary[Section, dict[tuple, str]] = (
    weakref.WeakKeyDictionary()
)


def section_drawing(section: Section, points: Sequence[tuple[str, float, float]], unit: str) -> str:
    """The section with its dimensions and the numbered stress points (fixed geometry)."""
    drawn = _SECTION_DRAWINGS.setdefault(section, {})
    key = (tuple(points), unit)
    if key not in drawn:
        drawn[key] = section_figure(section, points, unit=unit)
    return drawn[key]


def stress_drawing(section: Section, stress_unit: str) -> Callable[[Sheet], str]:
    """The normal-stress distribution over the section at the station, as it is now."""

    def draw(sheet: Sheet) -> str:
        return normal_stress_figure(
            section,
            sheet.value("N"),
            sheet.value("M_x"),
            sheet.value("M_y"),
            stress_unit=stress_unit,
        )

    return draw
