"""The inputs of the AISC 360-22 member checks: material, lengths and factors, validated once.

The sheet writer and the numeric path read the same parsed values, so a bad entry
is refused the same way by both, with the field named.
"""

from __future__ import annotations

from dataclasses import dataclass

import pint

from calcsheet.errors import InputError
from calcsheet.standards.aisc360.second_order import K_FIXED_FREE
from calcsheet.units import parse_quantity

# AISC 360-22 Symbols: E = 29,000 ksi (200 000 MPa), G = 11,200 ksi (77 200 MPa).
E_STEEL = "29000 ksi"
G_STEEL = "11200 ksi"
K_EXPECTED = (
    "a positive number, e.g. 2.1 for a fixed-free cantilever (AISC Commentary Table C-A-7.1)"
)
MODULI_REFERENCE = "AISC 360-22 Symbols (modulus of elasticity and shear modulus of steel)"


@dataclass(frozen=True)
class Steel:
    """A structural steel: yield stress, moduli and a grade name for the design basis."""

    F_y: pint.Quantity | str = "50 ksi"
    E: pint.Quantity | str = E_STEEL
    G: pint.Quantity | str = G_STEEL
    grade: str = "ASTM A992"


A992 = Steel()


@dataclass(frozen=True)
class MemberInputs:
    """Parsed and checked inputs, as quantities (K, Cb, Cm plain numbers)."""

    F_y: pint.Quantity
    E: pint.Quantity
    G: pint.Quantity
    grade: str
    length: pint.Quantity
    K: float
    L_b: pint.Quantity
    C_b: float
    C_m: float


def parse_member_inputs(
    material: Steel,
    length: pint.Quantity | str,
    K: float | str = K_FIXED_FREE,
    Lb: pint.Quantity | str | None = None,
    Cb: float | str = 1.0,
    Cm: float | str = 1.0,
) -> MemberInputs:
    """Check every input; an unusable one raises InputError naming it and what is expected."""
    if not isinstance(material, Steel):
        raise InputError("material", material, "a Steel(F_y=..., E=..., G=...)")
    stresses = {}
    for name in ("F_y", "E", "G"):
        value = parse_quantity(
            getattr(material, name), field=f"material {name}", dimension="stress"
        )
        if value.m <= 0:
            raise InputError(f"material {name}", getattr(material, name), "a positive stress")
        stresses[name] = value
    if stresses["F_y"] >= stresses["E"]:
        raise InputError("material F_y", material.F_y, "a yield stress below E")
    member_length = _positive_length(length, "member length L")
    k = _number(K, "effective length factor K", K_EXPECTED)
    unbraced = member_length if Lb is None else _positive_length(Lb, "unbraced length L_b")
    c_b = _number(Cb, "C_b", "a number of at least 1.0 (Eq. F1-1 gives no less)")
    if c_b < 1.0:
        raise InputError("C_b", Cb, "a number of at least 1.0 (Eq. F1-1 gives no less)")
    c_m = _number(Cm, "C_m", "a number in (0, 1] (Appendix 8, Eq. A-8-4)")
    if c_m > 1.0:
        raise InputError("C_m", Cm, "a number in (0, 1] (Appendix 8, Eq. A-8-4)")
    return MemberInputs(
        stresses["F_y"],
        stresses["E"],
        stresses["G"],
        str(material.grade),
        member_length,
        k,
        unbraced,
        c_b,
        c_m,
    )


def _positive_length(value: pint.Quantity | str, field: str) -> pint.Quantity:
    quantity = parse_quantity(value, field=field, dimension="length")
    if quantity.m <= 0:
        raise InputError(field, value, "a positive length")
    return quantity


def _number(value: float | str, field: str, expected: str) -> float:
    quantity = parse_quantity(value, field=field, dimension="dimensionless")
    number = float(quantity.to("dimensionless").m)
    if number <= 0:
        raise InputError(field, value, expected)
    return number
