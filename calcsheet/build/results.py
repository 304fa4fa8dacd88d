"""A sheet's results as plain data for the JSON file: every value, every check, what governs."""

from __future__ import annotations

from typing import Any

import pint

from calcsheet import __version__
from calcsheet.engine import Sheet


def _value(quantity: pint.Quantity) -> dict[str, Any]:
    base = quantity.to_base_units()
    return {
        "value": float(quantity.magnitude),
        "unit": f"{quantity.units:~}",
        "si_value": float(base.magnitude),
        "si_unit": f"{base.units:~}",
    }


def sheet_results(sheet: Sheet) -> dict[str, Any]:
    """Inputs, steps and checks with values in display and SI base units."""
    governing = sheet.governing_check()
    return {
        "title": sheet.title,
        "trace": sheet.trace,
        "tool": f"calcsheet {__version__}",
        "inputs": [
            {"name": part.name, "description": part.description, **_value(part.value)}
            for part in sheet.inputs
        ],
        "steps": [
            {
                "name": part.name,
                "description": part.description,
                "reference": part.reference,
                **_value(part.value),
                **({"governs_at": sheet.governing_label(part)} if part.candidates else {}),
            }
            for part in sheet.steps
        ],
        "checks": [
            {**check.summary(), "at": sheet.check_location(check)} for check in sheet.checks
        ],
        "governing": (
            {**governing.summary(), "at": sheet.check_location(governing)}
            if governing is not None
            else None
        ),
        "all_pass": all(check.passes for check in sheet.checks),
    }
