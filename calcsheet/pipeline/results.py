"""A sheet's results as plain data for the JSON file: every value, every check, what governs.

The file's form is the JSON Schema ``results.schema.json`` beside this module (shipped in
the package; :func:`results_schema` reads it). Each value is given twice: as the sheet
shows it (``value``, ``unit``) and in SI units named as people write them (``si_value``,
``si_unit``: Pa, N, N·m, m, m², m⁴, rad), so a program reading it needs no unit library.
"""

from __future__ import annotations

import json
import math
import re
from functools import lru_cache
from importlib import resources
from typing import Any

import pint

from calcsheet import __version__
from calcsheet.engine import Check, Heading, Sheet, Step
from calcsheet.engine.marked_text import plain_text
from calcsheet.units import linear_factor, ureg

# 1: files of calcsheet 0.1.0 (the trace line under "stamp"); 2: "trace", "points",
# and per check the combination, station, demand and capacity.
FORMAT_VERSION = 2

# The SI unit a program reads each kind of quantity in, as the trade writes it.
_SI_UNITS = (
    ("Pa", "pascal"),
    ("N", "newton"),
    ("N·m", "newton * meter"),
    ("N/m", "newton / meter"),
    ("m", "meter"),
    ("m²", "meter ** 2"),
    ("m³", "meter ** 3"),
    ("m⁴", "meter ** 4"),
    ("m⁶", "meter ** 6"),
    ("kg", "kilogram"),
    ("s", "second"),
)
_SUPERSCRIPTS = str.maketrans("0123456789-", "⁰¹²³⁴⁵⁶⁷⁸⁹⁻")


@lru_cache(maxsize=1)
def _si_by_dimension() -> dict[Any, tuple[str, pint.Unit]]:
    return {ureg.Unit(unit).dimensionality: (name, ureg.Unit(unit)) for name, unit in _SI_UNITS}


def _power(symbol: str, exponent: float) -> str:
    exponent = abs(exponent)
    if exponent == 1:
        return symbol
    text = f"{exponent:g}"
    return symbol + (text.translate(_SUPERSCRIPTS) if text.isdigit() else f"^{text}")


@lru_cache(maxsize=512)
def unit_name(unit: pint.Unit) -> str:
    """A unit as an engineer writes it: ``kip·ft``, ``in⁴``, ``kN/m``, ``ksi``.

    Forces come before lengths in a product (a moment is kip·ft, not ft·kip).
    """
    force = ureg.Unit("newton").dimensionality
    items = list(ureg.Quantity(1, unit).unit_items())
    items.sort(key=lambda item: ureg.Unit(item[0]).dimensionality != force)
    above = [_power(ureg.get_symbol(name), power) for name, power in items if power > 0]
    below = [_power(ureg.get_symbol(name), power) for name, power in items if power < 0]
    text = "·".join(above) or ("1" if below else "")
    if below:
        text += "/" + ("·".join(below) if len(below) == 1 else f"({'·'.join(below)})")
    return text


@lru_cache(maxsize=512)
def _si_unit(units: pint.Unit) -> tuple[pint.Unit, str]:
    """The SI unit a value in ``units`` is written in, and that unit's written name.

    Angles in rad, plain numbers with no unit (``""``); a kind of quantity not in the
    list falls back on SI base units, written the same way.
    """
    base = ureg.Quantity(1.0, units).to_base_units().units
    if base == ureg.radian:
        return base, "rad"
    if base.dimensionless:
        return base, ""
    named = _si_by_dimension().get(units.dimensionality)
    if named is None:
        return base, unit_name(base)
    name, unit = named
    return unit, name


def si_quantity(quantity: pint.Quantity) -> tuple[float, str]:
    """The value in the SI unit of its kind and that unit's written name."""
    unit, name = _si_unit(quantity.units)
    factor = linear_factor(quantity.units, unit)
    if factor is None:  # a unit with an offset: pint's own conversion
        return float(quantity.to(unit).magnitude), name
    return float(quantity.magnitude) * factor, name


def _number(value: float | None) -> float | None:
    """A finite float, or ``None`` (JSON has no infinity: a zero capacity says NOT OK)."""
    if value is None or not math.isfinite(value):
        return None
    return float(value)


def quantity_data(quantity: pint.Quantity) -> dict[str, Any]:
    """``value`` and ``unit`` as the sheet shows them; ``si_value`` and ``si_unit``."""
    si_value, si_unit = si_quantity(quantity)
    return {
        "value": _number(float(quantity.magnitude)),
        "unit": unit_name(quantity.units),
        "si_value": _number(si_value),
        "si_unit": si_unit,
    }


def check_data(sheet: Sheet, check: Check) -> dict[str, Any]:
    """One check: its worst utilization and where (combination, station), demand, capacity.

    ``demand`` and ``capacity`` are those written out on the sheet (the governing
    combination's); ``utilization`` is the worst over every combination evaluated.
    """
    cases = check.cases
    return {
        "description": check.description,
        "reference": plain_text(check.reference),
        "utilization": _number(check.worst_utilization),
        "written_utilization": _number(check.utilization),
        "status": check.status,
        "combination": (cases.combination or None) if cases is not None else None,
        "station": (
            quantity_data(cases.station)
            if cases is not None and cases.station is not None
            else None
        ),
        "governing_case": cases.case if cases is not None else None,
        "cases": cases.count if cases is not None else None,
        "demand": quantity_data(check.demand_value) if check.demand_value is not None else None,
        "capacity": (
            quantity_data(check.capacity_value) if check.capacity_value is not None else None
        ),
        "at": plain_text(sheet.check_location(check)),
    }


# The steps the point stress procedures (calcsheet.mechanics.point_stresses) write for
# each point n, named <term>_n; sigma_z_n is written for every point, shown or not.
_POINT_TERMS = (
    "sigma_Mx", "sigma_My", "sigma_z", "tau_zy", "tau_zx", "tau_T", "tau",
    "sigma_1", "sigma_2", "tau_max", "sigma_vm",
)  # fmt: skip
# Terms they write once for every point (no point number in the step name).
_SHARED_TERMS = ("sigma_N", "sigma_b", "tau_V", "tau_T", "tau")
_POINT_NUMBER = re.compile(r"^sigma_z_(\d+)$")
# How the point of a step is named where the sheet says it: the heading above a point
# written out ("Point 3: top flange tip") and the candidates of a governing step
# ("point 3 (top flange tip)"), which list every point, written out or not.
_POINT_HEADING = re.compile(r"^Point (\d+): (.+)$")
_POINT_CANDIDATE = re.compile(r"^point (\d+) \((.+)\)$")


def _is_stress(quantity: pint.Quantity) -> bool:
    return quantity.dimensionality == ureg.Unit("pascal").dimensionality


def _point_labels(sheet: Sheet) -> dict[str, str]:
    labels: dict[str, str] = {}
    for part in sheet.parts:
        if isinstance(part, Heading) and (found := _POINT_HEADING.match(part.text)):
            labels.setdefault(found.group(1), found.group(2))
        elif isinstance(part, Step):
            for text, _ in part.candidates:
                if found := _POINT_CANDIDATE.match(text):
                    labels.setdefault(found.group(1), found.group(2))
    return labels


def points_data(sheet: Sheet) -> list[dict[str, Any]]:
    """Each stress point: number, label, x and y (when fixed on the section) and every
    stress term at it by name (``sigma_Mx``, ``sigma_z``, ``tau``, ``sigma_vm``...).

    Points written out step by step and points only evaluated (a concise sheet) alike:
    the point stress procedures name each point's steps ``<term>_n``; terms written
    once for all points (``sigma_N``, a common ``tau_T``) are given at every point. A
    sheet without stress points gives an empty list.
    """
    steps = {part.name: part for part in sheet.steps}
    numbers = [found.group(1) for name in steps if (found := _POINT_NUMBER.match(name))]
    labels = _point_labels(sheet)
    shared = {
        term: steps[term]
        for term in _SHARED_TERMS
        if term in steps and _is_stress(steps[term].value)
    }
    result = []
    for number in numbers:
        terms = dict(shared)
        for term in _POINT_TERMS:
            step = steps.get(f"{term}_{number}")
            if step is not None and _is_stress(step.value):
                terms[term] = step
        coordinates = {}
        for axis in ("x", "y"):
            try:
                coordinates[axis] = quantity_data(sheet.value(f"{axis}_{number}"))
            except KeyError:
                coordinates[axis] = None
        result.append(
            {
                "number": number,
                "label": plain_text(labels.get(number, "")),
                **coordinates,
                "stresses": {
                    term: {"step": step.name, **quantity_data(step.value)}
                    for term, step in terms.items()
                },
            }
        )
    return result


def sheet_results(sheet: Sheet) -> dict[str, Any]:
    """Inputs, steps, stress points and checks with values as shown and in SI units."""
    governing = sheet.governing_check()
    return {
        "format_version": FORMAT_VERSION,
        "title": sheet.title,
        "trace": sheet.trace,
        "tool": f"calcsheet {__version__}",
        "inputs": [
            {
                "name": part.name,
                "description": plain_text(part.description),
                **quantity_data(part.value),
            }
            for part in sheet.inputs
        ],
        "steps": [
            {
                "name": part.name,
                "description": plain_text(part.description),
                "reference": plain_text(part.reference),
                **quantity_data(part.value),
                **(
                    {"governs_at": plain_text(sheet.governing_label(part))}
                    if part.candidates
                    else {}
                ),
            }
            for part in sheet.steps
        ],
        "points": points_data(sheet),
        "checks": [check_data(sheet, check) for check in sheet.checks],
        "governing": check_data(sheet, governing) if governing is not None else None,
        "all_pass": all(check.passes for check in sheet.checks),
    }


@lru_cache(maxsize=1)
def results_schema() -> dict[str, Any]:
    """The JSON Schema (draft 2020-12) of the results file, as shipped in the package."""
    text = resources.files("calcsheet.pipeline").joinpath("results.schema.json").read_text("utf-8")
    return json.loads(text)
