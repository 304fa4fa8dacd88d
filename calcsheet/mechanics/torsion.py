"""Which St Venant torsion formula a section gets, with the values it needs.

St Venant approximations (an open section with a warping model and supports at both
ends of the twist's stretch takes the warping stresses instead, see
:func:`warping_restraints` and :mod:`calcsheet.mechanics.warping_torsion`):

* round bar, round HSS, pipe: τ = T·r / J, r the point's distance from the centroid;
* rectangular HSS: thin closed wall (Bredt), τ = T / (2·A_m·t), A_m = (B − t)·(H − t)
  the area inside the wall mid-line with square corners;
* every other section (plate, I, channel, angle, tee): thin open walls,
  τ = T·t_max / J with t_max the thickest wall, applied at every point (conservative
  for the thinner walls).

The formulas themselves are :func:`calcsheet.mechanics.formulas.torsion_stress_round`,
``torsion_stress_closed`` and ``torsion_stress_open``, written by the point stress
procedure (:mod:`calcsheet.mechanics.point_stresses`).

The torque is taken about the shear-centre axis (:func:`shear_centre_torque`), the
axis the section twists about; for a doubly symmetric section, a tube or a bar the
shear centre is the centroid and it is the centroid's T.
"""

from __future__ import annotations

import math
from dataclasses import dataclass
from typing import Any

import numpy as np
from numpy.typing import NDArray

from calcsheet.mechanics.supports import FIXED, Support
from calcsheet.mechanics.warping_torsion import FIXED as WARPING_FIXED
from calcsheet.mechanics.warping_torsion import FREE, EndRestraint
from calcsheet.mechanics.warping_torsion import PINNED as WARPING_PINNED
from calcsheet.sections import Section

ROUND_FAMILIES = frozenset({"round bar", "round HSS", "HSS_ROUND", "PIPE"})
CLOSED_RECTANGULAR_FAMILIES = frozenset({"rectangular HSS", "HSS_RECT"})
WARPING_NOTE = (
    "Torsion is taken as uniform (St Venant) torsion only; warping normal and shear "
    "stresses of open sections are not included."
)
CLOSED_NOTE = (
    "Torsion is taken as uniform (St Venant) torsion: a closed or solid section barely "
    "warps, so its warping stresses are negligible and none are added."
)
UNKNOWN_WARPING_NOTE = (
    "Warping is not computed for this section: its walls are not known (a user-defined "
    "or built-up shape), so its shear centre and warping constant are not available. "
    "St Venant torsion only was used, with the torque about the centroid; warping "
    "normal and shear stresses are not included."
)
WARPING_SUPPORT_RULE = (
    "a support that holds every motion (fixed) is taken as restraining warping, any "
    "other support as leaving warping free"
)


def shear_centre_torque(T: Any, V_x: Any, V_y: Any, x_s: Any, y_s: Any) -> Any:
    """The torque about the shear-centre axis from the centroid's T and the shears.

    Each force (F_x, F_y) beyond the cut at (e_x, e_y) has the moment
    (e_x − x_s)·F_y − (e_y − y_s)·F_x about the shear-centre axis at (x_s, y_s), so
    T_s = T − x_s·V_y + y_s·V_x with V_x = ΣF_x, V_y = ΣF_y (statics, common practice,
    no source). Works on sheet symbols and on arrays.
    """
    return T - x_s * V_y + y_s * V_x


@dataclass(frozen=True)
class WarpingRestraints:
    """The member's twist and warping restraint at each end, or why there is none.

    ``ends`` (start, end) as :class:`~calcsheet.mechanics.warping_torsion.EndRestraint`
    or None when the supports are not at the ends only (warping is then not modelled);
    ``reason`` says so in words.
    """

    ends: tuple[EndRestraint, EndRestraint] | None
    reason: str


def _end_restraint(held: Support | None) -> EndRestraint:
    if held is None:
        return FREE
    if held.restrains == FIXED:
        return WARPING_FIXED
    if "rz" in held.restrains:
        return WARPING_PINNED
    return FREE


def warping_restraints(supports: list[Support], length_m: float) -> WarpingRestraints:
    """The end restraints the torsion solution takes from the supports (SI stations).

    A support holding every motion (fixed) restrains twist and warping; any other
    support restraining the twist (rz) restrains twist only (warping free); an end
    without a support is free. Supports away from the ends are not modelled by the
    closed-form solutions: None, with the reason.
    """
    tolerance = 1e-9 * length_m
    at_start = [item for item in supports if abs(float(item.z.to("m").m)) <= tolerance]
    at_end = [item for item in supports if abs(float(item.z.to("m").m) - length_m) <= tolerance]
    if len(at_start) + len(at_end) != len(supports):
        return WarpingRestraints(
            None,
            "a support lies between the ends; the closed-form solutions of the torsion "
            "equation cover supports at the member's ends only",
        )
    start = _end_restraint(at_start[0] if at_start else None)
    end = _end_restraint(at_end[0] if at_end else None)
    if not (start.twist or end.twist):
        return WarpingRestraints(None, "no support restrains the twist (rz)")
    return WarpingRestraints(
        (start, end), f"{start.words} at z = 0 and {end.words} at z = L ({WARPING_SUPPORT_RULE})"
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
        return TorsionRule("round", "{tau} = {T}·{r}/{J} (round section)")
    if section.family in CLOSED_RECTANGULAR_FAMILIES:
        (height,) = _dimension(section, ("H", "Ht"), unit)
        (width,) = _dimension(section, ("B",), unit)
        (wall,) = _dimension(section, ("tdes", "t"), unit)[:1]
        enclosed = (width - wall) * (height - wall)
        return TorsionRule(
            "closed",
            "{tau} = {T}/(2·{A_m}·{t}) (thin closed wall, Bredt)",
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
        "{tau} = {T}·{t_max}/{J} (thin open walls, thickest wall)",
        thickness=wall,
    )
