"""Partial factors, steel grades and imperfection factors of EN 1993-1-1:2005.

Values are the recommended ones of the standard; a National Annex may change the
partial factors, so a sheet shows them as inputs the engineer can edit. Numbers
marked "from memory" were written without the standard at hand and should be
compared with it when the project is reviewed.
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.units import parse_quantity

PARTIAL_FACTORS_REFERENCE = "EN 1993-1-1 6.1(1) Note 2B (recommended values)"

# Table 6.1: imperfection factor of each buckling curve.
IMPERFECTION_FACTORS: dict[str, float] = {"a0": 0.13, "a": 0.21, "b": 0.34, "c": 0.49, "d": 0.76}

# Table 3.1, hot-rolled structural steel (EN 10025-2/-3/-4), nominal thickness t <= 40 mm:
# (f_y, f_u) in N/mm². From memory; the values for 40 mm < t <= 80 mm are lower, so a
# thicker element must be given f_y explicitly.
NOMINAL_STRENGTHS_MPA: dict[str, tuple[float, float]] = {
    "S235": (235.0, 360.0),
    "S275": (275.0, 430.0),
    "S355": (355.0, 510.0),
    "S420": (420.0, 520.0),
    "S460": (460.0, 540.0),
}
NOMINAL_THICKNESS_LIMIT_MM = 40.0


@dataclass(frozen=True)
class PartialFactors:
    """γM0 (cross-sections), γM1 (member buckling), γM2 (net section in tension)."""

    gamma_M0: float = 1.00
    gamma_M1: float = 1.00
    gamma_M2: float = 1.25
    reference: str = PARTIAL_FACTORS_REFERENCE


@dataclass(frozen=True)
class Steel:
    """A structural steel: its grade (for Table 6.2), f_y, f_u and E.

    ``f_y`` and ``f_u`` default to the nominal values of Table 3.1 for t <= 40 mm.
    """

    grade: str
    f_y: pint.Quantity
    f_u: pint.Quantity
    E: pint.Quantity
    source: str


def steel(
    grade: str = "S355",
    *,
    f_y: pint.Quantity | str | None = None,
    f_u: pint.Quantity | str | None = None,
    E: pint.Quantity | str = "210000 MPa",
) -> Steel:
    """A :class:`Steel` of one of the grades S235, S275, S355, S420, S460.

    E = 210 000 N/mm² is the value of EN 1993-1-1 3.2.6(1).
    """
    key = str(grade).strip().upper()
    if key not in NOMINAL_STRENGTHS_MPA:
        raise InputError("steel grade", grade, f"one of {', '.join(NOMINAL_STRENGTHS_MPA)}")
    nominal_fy, nominal_fu = NOMINAL_STRENGTHS_MPA[key]
    given = f_y is not None
    fy = parse_quantity(f_y if given else f"{nominal_fy} MPa", field="f_y", dimension="stress")
    fu = parse_quantity(
        f_u if f_u is not None else f"{nominal_fu} MPa", field="f_u", dimension="stress"
    )
    modulus = parse_quantity(E, field="E", dimension="stress")
    for field, value in (("f_y", fy), ("f_u", fu), ("E", modulus)):
        if value.m <= 0:
            raise InputError(field, f"{value:~P}", "a positive stress")
    source = "given" if given else "EN 1993-1-1 Table 3.1 (t ≤ 40 mm)"
    return Steel(key, fy.to("MPa"), fu.to("MPa"), modulus.to("MPa"), source)


def as_steel(material: Steel | str | Mapping[str, object]) -> Steel:
    """Accept a :class:`Steel`, a grade name, or a mapping of :func:`steel` keywords."""
    if isinstance(material, Steel):
        return material
    if isinstance(material, str):
        return steel(material)
    if isinstance(material, Mapping):
        unknown = set(material) - {"grade", "f_y", "f_u", "E"}
        if unknown:
            raise InputError("material", sorted(unknown), "keys among grade, f_y, f_u, E")
        return steel(**material)  # type: ignore[arg-type]
    raise InputError("material", material, "a grade such as 'S355' or steel('S355', f_y=...)")


def as_partial_factors(gamma: PartialFactors | Mapping[str, float] | None) -> PartialFactors:
    """Accept :class:`PartialFactors`, a mapping of overrides, or ``None`` (recommended)."""
    if gamma is None:
        return PartialFactors()
    if isinstance(gamma, PartialFactors):
        return gamma
    if isinstance(gamma, Mapping):
        known = {"gamma_M0", "gamma_M1", "gamma_M2"}
        unknown = set(gamma) - known
        if unknown:
            raise InputError("gamma", sorted(unknown), "keys among gamma_M0, gamma_M1, gamma_M2")
        values = {}
        for key, value in gamma.items():
            number = float(value)
            if not number > 0:
                raise InputError(f"gamma {key}", value, "a positive partial factor")
            values[key] = number
        return PartialFactors(**values, reference="given (National Annex or project)")
    raise InputError("gamma", gamma, "PartialFactors or a mapping such as {'gamma_M0': 1.0}")
