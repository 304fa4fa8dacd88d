"""Shared writing for the AISC 360-22 member procedure: section values, φ·Rn or Rn/Ω.

The procedure runs on either writer of :mod:`calcsheet.engine.procedure`: a
:class:`~calcsheet.engine.procedure.SheetWriter` (cited steps on a sheet) or an
:class:`~calcsheet.engine.procedure.ArrayWriter` (numpy arrays for searches).
"""

from __future__ import annotations

import dataclasses
from collections.abc import Mapping
from typing import Any

from calcsheet.engine.procedure import ArrayWriter, SheetWriter, Value, Writer
from calcsheet.standards.aisc360.factors import LimitStateFactors, apply_factor
from calcsheet.standards.aisc360.section_data import SectionValue

SPECIFICATION = "set by AISC 360-22"
SECTION_FIXED = "a property of the section that decided its classification; build the sheet again"
MATERIAL_FIXED = (
    "decides the section classification (Table B4.1) and so which equations apply; "
    "build the sheet again"
)

__all__ = [
    "MATERIAL_FIXED",
    "SECTION_FIXED",
    "SPECIFICATION",
    "ArrayWriter",
    "SheetWriter",
    "Writer",
    "write_available",
    "write_section_values",
]


def write_section_values(w: Writer, values: Mapping[str, SectionValue | Any]) -> None:
    """Section properties and dimensions as inputs citing their sources.

    For an array writer, ``values`` may be the arrays of a
    :class:`~calcsheet.standards.aisc360.section_data.SectionTable` instead.
    """
    for name, value in values.items():
        if isinstance(value, SectionValue):
            w.input(
                value.field.name,
                value.quantity,
                value.field.description,
                reference=value.source,
                fixed=SECTION_FIXED,
            )
        else:
            w.given(name, value)


def write_available(
    w: Writer,
    name: str,
    nominal: Value,
    factors: LimitStateFactors,
    description: str,
    *,
    unit: str | None,
    suffix: str | None = None,
) -> Value:
    """φ·Rn (LRFD, Eq. B3-1) or Rn/Ω (ASD, Eq. B3-2), φ or Ω listed as an input citing
    its section."""
    if suffix is not None:
        factors = dataclasses.replace(factors, suffix=suffix)
    factor = w.input(
        factors.symbol_name(w.method),
        factors.value(w.method),
        factors.description(w.method),
        reference=factors.reference,
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    expression = apply_factor(w.method, factor, nominal)
    section = "B3.1" if w.method == "LRFD" else "B3.2"
    return w.step(
        name,
        expression,
        f"{description} ({w.method})",
        unit=unit,
        reference=f"AISC 360-22 Section {section}",
    )
