"""Shared sheet writing for the AISC 360-22 member checks: inputs, factors, available strengths.

An input the sheet already has under the same name and with the same value (the
member sheet's ``F_y``, ``L``, ``I_x``...) is reused rather than defined twice.
"""

from __future__ import annotations

import dataclasses
import math
from dataclasses import dataclass, field

import pint
import sympy as sp

from calcsheet.engine import Check, Input, Sheet
from calcsheet.errors import DefinitionError
from calcsheet.standards.aisc360.factors import LimitStateFactors, available_strength
from calcsheet.standards.aisc360.section_data import SectionValue
from calcsheet.standards.clause import Clause

SPECIFICATION = "set by AISC 360-22"
SECTION_FIXED = "a property of the section that decided its classification; build the sheet again"
MATERIAL_FIXED = (
    "decides the section classification (Table B4.1) and so which equations apply; "
    "build the sheet again"
)


@dataclass
class Writer:
    """The sheet being written, the design method and the units it shows."""

    sheet: Sheet
    method: str
    symbols: dict[str, sp.Symbol] = field(default_factory=dict)
    checks: list[Check] = field(default_factory=list)

    def unit(self, kind: str) -> str:
        """The sheet's display unit for ``kind`` (stress, force, moment, length)."""
        return self.sheet.units.preferred[kind]

    def __getitem__(self, name: str) -> sp.Symbol:
        return self.symbols[name]

    def input(
        self,
        name: str,
        value: pint.Quantity | float | str,
        description: str,
        *,
        reference: str = "",
        dimension: str | None = None,
        fixed: str = "",
    ) -> sp.Symbol:
        """Define an input, or reuse the sheet's input of that name when it has this value."""
        try:
            existing = self.sheet[name]
        except KeyError:
            existing = None
        if existing is None:
            symbol = self.sheet.input(
                name, value, description, reference=reference, dimension=dimension, fixed=fixed
            )
        elif isinstance(existing, Input) and _same(existing.value, value):
            if fixed and not existing.fixed:
                # The checks decided their equations from this value: changing it
                # through set_input would leave them stale.
                existing.fixed = fixed
            symbol = existing.symbol
        else:
            raise DefinitionError(
                f"AISC 360-22 checks: the sheet already defines {name!r} "
                f"({existing.value:~P}) but the checks need {value} under that name"
            )
        self.symbols[name] = symbol
        return symbol

    def section_value(self, value: SectionValue) -> sp.Symbol:
        """A section property or dimension as an input citing its source."""
        return self.input(
            value.field.name,
            value.quantity,
            value.field.description,
            reference=value.source,
            fixed=SECTION_FIXED,
        )

    def step(self, name: str, expr: sp.Basic, description: str, **options: object) -> sp.Symbol:
        """A step, remembered by name."""
        symbol = self.sheet.step(name, expr, description, **options)
        self.symbols[name] = symbol
        return symbol

    def clause(
        self, clause: Clause, name: str, *args: sp.Basic, unit: str | None = None
    ) -> sp.Symbol:
        """A step written by a :class:`Clause`, remembered by name."""
        symbol = clause.write(self.sheet, name, *args, unit=unit)
        self.symbols[name] = symbol
        return symbol

    def governing_min(
        self, name: str, candidates: list[tuple[str, sp.Symbol]], description: str, unit: str
    ) -> sp.Symbol:
        """The smallest of labelled strengths (one candidate: that strength itself)."""
        if len(candidates) == 1:
            return candidates[0][1]
        symbol = self.sheet.governing(name, candidates, description, largest=False, unit=unit)
        self.symbols[name] = symbol
        return symbol

    def available(
        self,
        name: str,
        nominal: sp.Symbol,
        factors: LimitStateFactors,
        description: str,
        *,
        unit: str,
        suffix: str | None = None,
    ) -> sp.Symbol:
        """φ·Rn or Rn/Ω as a step, with φ or Ω listed as an input citing its section."""
        if suffix is not None:
            factors = dataclasses.replace(factors, suffix=suffix)
        strength = available_strength(nominal, self.method, factors)
        self.input(
            strength.factor.name,
            strength.value,
            strength.description,
            reference=strength.reference,
            dimension="dimensionless",
            fixed=SPECIFICATION,
        )
        section = "B3.1" if self.method == "LRFD" else "B3.2"
        return self.step(
            name,
            strength.expression,
            f"{description} ({self.method})",
            unit=unit,
            reference=f"AISC 360-22 Section {section}",
        )

    def value(self, name: str) -> float:
        """The current magnitude of a symbol, in its display unit."""
        return float(self.sheet.value(self.symbols[name]).m)


def _same(existing: pint.Quantity, value: pint.Quantity | float | str) -> bool:
    if isinstance(value, str):
        return False
    try:
        other = value if isinstance(value, pint.Quantity) else existing.__class__(value)
        return math.isclose(float(existing.to(other.units).m), float(other.m), rel_tol=1e-9)
    except pint.DimensionalityError:
        return False
