"""The numeric path's rows for a cantilever's loads as given, as the member sheet takes them.

A member sheet takes the torque about the shear centre and, for an open section with
a warping model, the twist of the member (AISC Design Guide 9's torsion equation), so
the rows the stress model gets carry T about the shear centre and the twist columns
G·φ′, E·φ″, E·φ‴ (:meth:`calcsheet.mechanics.stresses.StressModel.stresses`).
"""

from __future__ import annotations

import numpy as np

from calcsheet.calcs.member_analysis import member_twist, resolve_supports, statics_rows
from calcsheet.mechanics.loads import member_length
from calcsheet.mechanics.stresses import model_forces
from calcsheet.sections import Section
from calcsheet.units import Quantity, parse_quantity

NEWTONS_PER_KIP = float(Quantity(1.0, "kip").to("N").m)


def cantilever_rows(
    section: Section, loads, length, station, modulus: str = "29000 ksi"
) -> np.ndarray:
    """One row in kip and kip·L (L the section's unit), with the twist columns."""
    length_q = member_length(length)
    station_q = parse_quantity(station, field="station", dimension="length")
    types = ["D"] * len(loads)
    _, held = resolve_supports("fixed-free", None, length_q)
    twist = member_twist(section, length_q, held, loads, types, modulus)
    rows = statics_rows(section, loads, types, length_q, station_q, twist)
    return model_forces(rows.sum(axis=0), section.length_unit) / NEWTONS_PER_KIP
