"""Resistance factors φ (LRFD) and safety factors Ω (ASD) of AISC 360-22, per limit state.

The available strength is φ·Rn (LRFD, Section B3.1) or Rn/Ω (ASD, Section B3.2).
:func:`available_strength` builds that expression around a nominal strength and
names the factor symbol, so the sheet can list φ or Ω as an input citing its
section and the numeric path can multiply by the same number.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

import sympy as sp

from calcsheet.engine import as_written
from calcsheet.errors import InputError

METHODS = ("LRFD", "ASD")


@dataclass(frozen=True)
class LimitStateFactors:
    """φ and Ω of one limit state, with the section that sets them.

    ``suffix`` names the factor symbols (``phi_c``, ``Omega_c``), as the
    Specification writes them (φt, φc, φb, φv).
    """

    limit_state: str
    phi: float
    omega: float
    reference: str
    suffix: str

    def value(self, method: str) -> float:
        """φ for LRFD, Ω for ASD."""
        return self.phi if design_method(method) == "LRFD" else self.omega

    def multiplier(self, method: str) -> float:
        """What multiplies Rn to give the available strength: φ, or 1/Ω."""
        return self.phi if design_method(method) == "LRFD" else 1.0 / self.omega

    def symbol_name(self, method: str) -> str:
        """``phi_<suffix>`` for LRFD, ``Omega_<suffix>`` for ASD."""
        base = "phi" if design_method(method) == "LRFD" else "Omega"
        return f"{base}_{self.suffix}"

    def description(self, method: str) -> str:
        """What the factor is, as an input's description."""
        kind = "Resistance factor" if design_method(method) == "LRFD" else "Safety factor"
        return f"{kind}, {self.limit_state}"


TENSILE_YIELDING = LimitStateFactors(
    "tensile yielding in the gross section", 0.90, 1.67, "AISC 360-22 Section D2(a)", "t"
)
TENSILE_RUPTURE = LimitStateFactors(
    "tensile rupture in the net section", 0.75, 2.00, "AISC 360-22 Section D2(b)", "t"
)
COMPRESSION = LimitStateFactors("compression", 0.90, 1.67, "AISC 360-22 Section E1", "c")
FLEXURE = LimitStateFactors("flexure", 0.90, 1.67, "AISC 360-22 Section F1", "b")
# G2.1(a): webs of rolled I-shapes with h/tw <= 2.24 sqrt(E/Fy); every other case
# of Chapter G (G1) takes 0.90 / 1.67.
SHEAR_ROLLED_I_WEB = LimitStateFactors(
    "shear, web of a rolled I-shape with {h}/{t_w} ≤ 2.24·√({E}/{F_y})",
    1.00,
    1.50,
    "AISC 360-22 Section G2.1(a)",
    "v",
)
SHEAR = LimitStateFactors("shear", 0.90, 1.67, "AISC 360-22 Section G1", "v")


def design_method(method: object) -> str:
    """``"LRFD"`` or ``"ASD"`` from a user's entry; anything else is an InputError."""
    text = str(method).strip().upper() if isinstance(method, str) else None
    if text not in METHODS:
        raise InputError(
            "design method", method, "ASD or LRFD", "AISC 360-22 Section B3 gives only these two"
        )
    return text


@dataclass(frozen=True)
class AvailableStrength:
    """φ·Rn or Rn/Ω as an expression, and the factor it uses.

    Define ``factor`` on the sheet (``sheet.input(factor.name, value, ...,
    reference=reference)``) before writing ``expression`` as a step.
    """

    expression: sp.Expr
    factor: sp.Symbol
    value: float
    description: str
    reference: str


def available_strength(
    nominal: sp.Expr, method: str, factors: LimitStateFactors
) -> AvailableStrength:
    """φ·Rn (LRFD, AISC 360-22 Eq. B3-1) or Rn/Ω (ASD, Eq. B3-2) around ``nominal``."""
    chosen = design_method(method)
    factor = sp.Symbol(factors.symbol_name(chosen))
    with as_written():
        expression = apply_factor(chosen, factor, nominal)
    return AvailableStrength(
        expression, factor, factors.value(chosen), factors.description(chosen), factors.reference
    )


def apply_factor(method: str, factor: Any, nominal: Any) -> Any:
    """φ·Rn (LRFD, AISC 360-22 Eq. B3-1) or Rn/Ω (ASD, Eq. B3-2): symbols or arrays."""
    return factor * nominal if design_method(method) == "LRFD" else nominal / factor
