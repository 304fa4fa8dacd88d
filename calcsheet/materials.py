"""Steel grades with their minimum specified yield and tensile stresses.

Values are the familiar minimums, recalled from memory (not copied from the
standards): ASTM A992, A36, A572, A500, A53, A1085 as listed in the AISC Manual's
Table 2-4, and EN 10025-2 grades for t <= 40 mm as in EN 1993-1-1 Table 3.1.
Check them against the edition that governs the job; F_y given in a job wins.
"""

from __future__ import annotations

from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.units import Quantity


@dataclass(frozen=True)
class Grade:
    """A steel grade: minimum F_y and F_u, and where they come from."""

    name: str
    Fy: pint.Quantity
    Fu: pint.Quantity
    source: str


def _us(name: str, fy: float, fu: float, source: str) -> Grade:
    return Grade(name, Quantity(fy, "ksi"), Quantity(fu, "ksi"), source)


def _si(name: str, fy: float, fu: float) -> Grade:
    return Grade(
        name, Quantity(fy, "MPa"), Quantity(fu, "MPa"), "EN 1993-1-1 Table 3.1, t <= 40 mm"
    )


GRADES: dict[str, Grade] = {
    grade.name: grade
    for grade in (
        _us("ASTM A992", 50, 65, "ASTM A992 (W shapes)"),
        _us("ASTM A36", 36, 58, "ASTM A36"),
        _us("ASTM A572 Gr. 50", 50, 65, "ASTM A572"),
        _us("ASTM A500 Gr. B (rectangular)", 46, 58, "ASTM A500 (rectangular HSS)"),
        _us("ASTM A500 Gr. B (round)", 42, 58, "ASTM A500 (round HSS)"),
        _us("ASTM A500 Gr. C (rectangular)", 50, 62, "ASTM A500 (rectangular HSS)"),
        _us("ASTM A500 Gr. C (round)", 46, 62, "ASTM A500 (round HSS)"),
        _us("ASTM A1085 Gr. A", 50, 65, "ASTM A1085 (HSS)"),
        _us("ASTM A53 Gr. B", 35, 60, "ASTM A53 (pipe)"),
        _si("S235", 235, 360),
        _si("S275", 275, 430),
        _si("S355", 355, 490),
    )
}


def find_grade(name: str, *, field: str = "material grade") -> Grade:
    """The grade called ``name`` (case and spaces ignored), or an error listing the grades."""
    wanted = "".join(str(name).split()).lower()
    for grade in GRADES.values():
        if "".join(grade.name.split()).lower() == wanted:
            return grade
    raise InputError(field, name, "one of: " + ", ".join(GRADES))
