"""Internal forces of a cantilever from statics of the free part beyond a station.

Sign convention
---------------
The member is cut at station ``z_s``. The internal forces are the resultants of
the stresses on the cut face whose outward normal is +z (the face of the part
between the support and the station), taken about the centroid of that face.
By equilibrium of the free part (from the cut to the free end), they equal the
resultant of the loads on the free part, about the cut's centroid:

* ``N  = Σ Fz``   (positive = tension)
* ``Vx = Σ Fx``,  ``Vy = Σ Fy``
* ``T  = Σ (ex·Fy − ey·Fx) + Σ Mz``           (right-hand rule about +z)
* ``Mx = Σ (ey·Fz − a·Fy) + Σ Mx``            (right-hand rule about +x)
* ``My = Σ (a·Fx − ex·Fz) + Σ My``            (right-hand rule about +y)

where ``a = z − z_s`` is the load's distance beyond the cut. With this convention
positive Mx puts the +y fibres in tension and positive My the −x fibres
(σ = Mx·y/Ix − My·x/Iy for a section with Ixy = 0). Loads exactly at the cut
count as beyond it (at the support the member carries every load).
"""

from __future__ import annotations

from collections.abc import Sequence
from dataclasses import dataclass

import numpy as np
import pint
from numpy.typing import NDArray

from calcsheet.mechanics.loads import (
    AppliedMoment,
    PointLoad,
    QuantityInput,
    check_on_member,
    member_length,
)
from calcsheet.units import Quantity, parse_quantity

FORCE_NAMES: tuple[str, ...] = ("N", "Vx", "Vy", "T", "Mx", "My")
"""Order of the six internal forces in every numeric array of this package."""


@dataclass(frozen=True)
class InternalForces:
    """The six internal forces at ``station`` (see the module docstring for signs)."""

    station: pint.Quantity
    N: pint.Quantity
    Vx: pint.Quantity
    Vy: pint.Quantity
    T: pint.Quantity
    Mx: pint.Quantity
    My: pint.Quantity

    def as_array(self, force_unit: str = "kip", length_unit: str = "inch") -> NDArray[np.float64]:
        """(N, Vx, Vy, T, Mx, My) as floats in force_unit and force_unit·length_unit."""
        moment_unit = f"{force_unit}*{length_unit}"
        return np.array(
            [
                self.N.to(force_unit).m,
                self.Vx.to(force_unit).m,
                self.Vy.to(force_unit).m,
                self.T.to(moment_unit).m,
                self.Mx.to(moment_unit).m,
                self.My.to(moment_unit).m,
            ]
        )


def loads_beyond(
    loads: Sequence[PointLoad | AppliedMoment], station: pint.Quantity
) -> list[PointLoad | AppliedMoment]:
    """The loads on the free part: those at or beyond the station."""
    return [load for load in loads if load.z.to(station.units).m >= station.m]


def validate_loads(
    length: QuantityInput,
    loads: Sequence[PointLoad | AppliedMoment],
    station: QuantityInput = "0 in",
) -> tuple[pint.Quantity, pint.Quantity]:
    """Check the length, the station and every load position; return (length, station)."""
    length_q = member_length(length)
    station_q = parse_quantity(station, field="station z", dimension="length")
    check_on_member(station_q, length_q, field="station z", shown=station)
    for load in loads:
        kind = "load" if isinstance(load, PointLoad) else "moment"
        check_on_member(load.z, length_q, field=f"{kind} {load.name} z", shown=f"{load.z:~P}")
    return length_q, station_q


def internal_forces(
    length: QuantityInput,
    loads: Sequence[PointLoad | AppliedMoment],
    station: QuantityInput = "0 in",
    *,
    force_unit: str = "kip",
    length_unit: str = "inch",
) -> InternalForces:
    """Internal forces at ``station`` from statics of the free part (module docstring)."""
    _, station_q = validate_loads(length, loads, station)
    free = loads_beyond(loads, station_q)
    forces, positions, couples = numeric_loads(free, force_unit, length_unit)
    result = resultants_numeric(forces, positions, float(station_q.to(length_unit).m))
    result = result + couples_numeric(couples)
    moment_unit = f"{force_unit}*{length_unit}"
    units = (force_unit, force_unit, force_unit, moment_unit, moment_unit, moment_unit)
    values = {
        name: Quantity(float(value), unit)
        for name, value, unit in zip(FORCE_NAMES, result, units, strict=True)
    }
    return InternalForces(station=station_q, **values)


def numeric_loads(
    loads: Sequence[PointLoad | AppliedMoment], force_unit: str, length_unit: str
) -> tuple[NDArray[np.float64], NDArray[np.float64], NDArray[np.float64]]:
    """Forces (n, 3), their points (n, 3) as (ex, ey, z), and couples (m, 3) as floats."""
    moment_unit = f"{force_unit}*{length_unit}"
    point_loads = [load for load in loads if isinstance(load, PointLoad)]
    couples = [load for load in loads if isinstance(load, AppliedMoment)]
    forces = np.array(
        [
            [load.Fx.to(force_unit).m, load.Fy.to(force_unit).m, load.Fz.to(force_unit).m]
            for load in point_loads
        ]
    ).reshape(-1, 3)
    positions = np.array(
        [
            [load.ex.to(length_unit).m, load.ey.to(length_unit).m, load.z.to(length_unit).m]
            for load in point_loads
        ]
    ).reshape(-1, 3)
    moments = np.array(
        [[c.Mx.to(moment_unit).m, c.My.to(moment_unit).m, c.Mz.to(moment_unit).m] for c in couples]
    ).reshape(-1, 3)
    return forces, positions, moments


def resultants_numeric(
    forces: NDArray[np.float64], positions: NDArray[np.float64], station: float
) -> NDArray[np.float64]:
    """Internal forces (..., 6) from point forces beyond the cut (vectorised).

    ``forces`` has shape (..., n_loads, 3) with (Fx, Fy, Fz); ``positions`` has
    shape (n_loads, 3) with (ex, ey, z) of each load, all assumed at or beyond
    ``station``. The moment is r × F about the cut centroid, r = (ex, ey, z − z_s):
    Mx = ey·Fz − a·Fy, My = a·Fx − ex·Fz, T = ex·Fy − ey·Fx (module docstring).
    """
    forces = np.asarray(forces, dtype=float)
    lever = np.asarray(positions, dtype=float).copy()
    lever[:, 2] -= station
    moments = np.cross(lever, forces)  # (Mx, My, Mz) for each load, broadcast over cases
    total_force = forces.sum(axis=-2)
    total_moment = moments.sum(axis=-2)
    return np.stack(
        [
            total_force[..., 2],
            total_force[..., 0],
            total_force[..., 1],
            total_moment[..., 2],
            total_moment[..., 0],
            total_moment[..., 1],
        ],
        axis=-1,
    )


def couples_numeric(couples: NDArray[np.float64]) -> NDArray[np.float64]:
    """The contribution (N, Vx, Vy, T, Mx, My) of concentrated couples (m, 3) beyond the cut."""
    total = np.asarray(couples, dtype=float).reshape(-1, 3).sum(axis=0)
    return np.array([0.0, 0.0, 0.0, total[2], total[0], total[1]])
