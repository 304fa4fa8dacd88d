"""Which St Venant torsion formula a section gets, with the values it needs.

Approximations (warping stresses of open sections are not included):

* round bar, round HSS, pipe: τ = T·r / J, r the point's distance from the centroid;
* rectangular HSS: thin closed wall (Bredt), τ = T / (2·A_m·t), A_m = (B − t)·(H − t)
  the area inside the wall mid-line with square corners;
* every other section (plate, I, channel, angle, tee): thin open walls,
  τ = T·t_max / J with t_max the thickest wall, applied at every point (conservative
  for the thinner walls).

The formulas themselves are :func:`calcsheet.mechanics.formulas.torsion_stress_round`,
``torsion_stress_closed`` and ``torsion_stress_open``, written by the point stress
procedure (:mod:`calcsheet.mechanics.point_stresses`).
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
from numpy.typing import NDArray

from calcsheet.sections import Section

ROUND_FAMILIES = frozenset({"round bar", "round HSS", "HSS_ROUND", "PIPE"})
CLOSED_RECTANGULAR_FAMILIES = frozenset({"rectangular HSS", "HSS_RECT"})
WARPING_NOTE = (
    "Torsion is taken as uniform (St Venant) torsion only; warping normal and shear "
    "stresses of open sections are not included."
)


@dataclass(frozen=True)
class TorsionRule:
    """The torsion formula for a section: ``kind`` is "round", "closed" or "open".

    ``thickness`` is t for "closed"/"open", ``enclosed_area`` is A_m for "closed".
    """

    kind: str
    description: str
    thickness: float = math.nan
    enclosed_area: float = math.nan


def _dimension(section: Section, names: tuple[str, ...], unit: str) -> list[float]:
    return [
        float(section.dimensions[name].to(unit).m) for name in names if name in section.dimensions
    ]


def torsion_rule(
    section: Section, x: NDArray[np.float64], y: NDArray[np.float64], unit: str
) -> TorsionRule:
    """Choose the torsion formula for ``section`` (stress points at (x, y), in ``unit``).

    A section without wall dimensions takes its farthest point as the thickness.
    """
    if section.family in ROUND_FAMILIES:
        return TorsionRule("round", "τ = T·r/J (round section)")
    if section.family in CLOSED_RECTANGULAR_FAMILIES:
        (height,) = _dimension(section, ("H", "Ht"), unit)
        (width,) = _dimension(section, ("B",), unit)
        (wall,) = _dimension(section, ("tdes", "t"), unit)[:1]
        enclosed = (width - wall) * (height - wall)
        return TorsionRule(
            "closed",
            "τ = T/(2·A_m·t) (thin closed wall, Bredt)",
            thickness=wall,
            enclosed_area=enclosed,
        )
    if section.family == "plate":
        walls = [min(_dimension(section, ("b", "d"), unit))]
    else:
        walls = _dimension(section, ("t", "tw", "tf", "tdes"), unit)
    if not walls:  # no wall dimensions known: the largest fibre distance, as for a solid
        walls = [float(np.max(np.hypot(x, y)))]
    wall = max(walls)
    return TorsionRule(
        "open",
        "τ = T·t_max/J (thin open walls, thickest wall)",
        thickness=wall,
    )
