"""The section values the AISC 360-22 checks need, per kind of shape, for the sheet and for arrays.

One list per kind says which properties and dimensions the checks read and the
symbol each gets on the sheet, so the sheet writer and the numeric path (many
sections as arrays in SI base units) read the same values under the same names.
"""

from __future__ import annotations

import math
from collections.abc import Mapping, Sequence
from dataclasses import dataclass

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.sections import Section, catalog_section, find_entry
from calcsheet.units import Quantity

# Kind of shape -> section families (catalog keys and user-defined names) it covers.
KINDS: dict[str, tuple[str, ...]] = {
    "I": ("W", "M", "S", "HP", "IPE", "HEA", "HEB", "HEM"),
    "HSS_RECT": ("HSS_RECT", "rectangular HSS"),
    "HSS_ROUND": ("HSS_ROUND", "PIPE", "round HSS"),
    "L": ("L", "angle"),
}
SUPPORTED = (
    "a rolled I-shape (W, M, S, HP; IPE, HEA, HEB, HEM of EN 10365), a rectangular or "
    "square HSS (or EN SHS, RHS), a round HSS, pipe (or EN CHS), or an equal-leg single "
    "angle (L)"
)


def section_kind(family: str) -> str:
    """The kind of shape ("I", "HSS_RECT", "HSS_ROUND", "L") of a section family."""
    for kind, families in KINDS.items():
        if family in families:
            return kind
    raise InputError(
        "section family",
        family,
        SUPPORTED,
        "the AISC 360-22 checks here do not cover this family",
    )


@dataclass(frozen=True)
class Field:
    """One value the checks read: its sheet symbol, what it is, its unit power of length."""

    name: str
    description: str
    power: int


def _fields(*rows: tuple[str, str, int]) -> tuple[Field, ...]:
    return tuple(Field(*row) for row in rows)


_COMMON = (
    ("A_g", "Gross area", 2),
    ("I_x", "Second moment of area about x", 4),
    ("I_y", "Second moment of area about y", 4),
)
FIELDS: dict[str, tuple[Field, ...]] = {
    "I": _fields(
        *_COMMON,
        ("S_x", "Elastic section modulus about x", 3),
        ("S_y", "Elastic section modulus about y", 3),
        ("Z_x", "Plastic section modulus about x", 3),
        ("Z_y", "Plastic section modulus about y", 3),
        ("r_y", "Radius of gyration about y (the smaller)", 1),
        ("J", "Torsional constant", 4),
        ("C_w", "Warping constant", 6),
        ("d", "Depth", 1),
        ("b_f", "Flange width", 1),
        ("t_f", "Flange thickness", 1),
        ("t_w", "Web thickness", 1),
        ("k_des", "Distance from the outer face of the flange to the web toe of the fillet", 1),
    ),
    "HSS_RECT": _fields(
        *_COMMON,
        ("S_x", "Elastic section modulus about x", 3),
        ("S_y", "Elastic section modulus about y", 3),
        ("Z_x", "Plastic section modulus about x", 3),
        ("Z_y", "Plastic section modulus about y", 3),
        ("r_x", "Radius of gyration about x", 1),
        ("r_y", "Radius of gyration about y", 1),
        ("J", "Torsional constant", 4),
        ("H", "Overall height (along y)", 1),
        ("B", "Overall width (along x)", 1),
        ("t", "Design wall thickness", 1),
    ),
    "HSS_ROUND": _fields(
        ("A_g", "Gross area", 2),
        ("I", "Second moment of area (any axis)", 4),
        ("S", "Elastic section modulus", 3),
        ("Z", "Plastic section modulus", 3),
        ("r", "Radius of gyration", 1),
        ("D", "Outside diameter", 1),
        ("t", "Design wall thickness", 1),
    ),
    "L": _fields(
        *_COMMON,
        ("S_x", "Elastic section modulus about x, to the toe (the smaller)", 3),
        ("S_y", "Elastic section modulus about y, to the toe (the smaller)", 3),
        ("r_z", "Radius of gyration about the minor principal axis z", 1),
        ("b", "Leg width", 1),
        ("t", "Leg thickness", 1),
    ),
}

# A user-defined section: the Section property, or the dimension names tried in order.
_PROPERTY = {"A_g": "A", "I_x": "Ix", "I_y": "Iy", "S_x": "Sx", "S_y": "Sy", "Z_x": "Zx"}
_PROPERTY |= {"Z_y": "Zy", "r_x": "rx", "r_y": "ry", "J": "J", "C_w": "Cw"}
_PROPERTY |= {"I": "Ix", "S": "Sx", "Z": "Zx", "r": "rx"}
_DIMENSION = {
    "d": ("d",),
    "b_f": ("bf",),
    "t_f": ("tf",),
    "t_w": ("tw",),
    "H": ("Ht", "H"),
    "B": ("B",),
    "D": ("OD", "D"),
    "b": ("d", "b"),
}
# Catalog column of each field, for the fast path that skips building Section outlines.
_COLUMN = {"A_g": "area", "I_x": "Ix", "I_y": "Iy", "S_x": "Sx", "S_y": "Sy", "Z_x": "Zx"}
_COLUMN |= {"Z_y": "Zy", "r_x": "rx", "r_y": "ry", "J": "J", "C_w": "Cw", "I": "Ix", "S": "Sx"}
_COLUMN |= {"Z": "Zx", "r": "rx", "d": "d", "b_f": "bf", "t_f": "tf", "t_w": "tw", "k_des": "k"}
_COLUMN |= {"H": "Ht", "B": "B", "D": "OD", "r_z": "rz"}
_COLUMN_BY_KIND = {"HSS_RECT": {"t": "tdes"}, "HSS_ROUND": {"t": "tdes"}, "L": {"t": "t", "b": "d"}}


@dataclass(frozen=True)
class SectionValue:
    """A value for the sheet: the quantity, what it is, and where it comes from."""

    field: Field
    quantity: pint.Quantity
    source: str


def section_values(section: Section) -> dict[str, SectionValue]:
    """Every value the checks read for ``section``, by sheet symbol name."""
    kind = section_kind(section.family)
    values = {field.name: _value(section, kind, field) for field in FIELDS[kind]}
    if kind == "L":
        legs = [section.dimensions.get(name) for name in ("d", "b")]
        if (
            legs[0] is None
            or legs[1] is None
            or not math.isclose(legs[0].m, legs[1].to(legs[0].u).m)
        ):
            raise InputError(
                "section",
                section.name,
                "an equal-leg single angle",
                "unequal-leg angles need principal-axis flexure (F10.2) not covered here",
            )
    return values


def _value(section: Section, kind: str, field: Field) -> SectionValue:
    unit = f"{section.length_unit}**{field.power}"
    column = {**_COLUMN, **_COLUMN_BY_KIND.get(kind, {})}[field.name]
    standard = _metric_standard(section)
    if standard:  # an EN section: its dimensions as given, properties computed from them
        if field.name == "k_des":
            return _metric_k_des(section, field, unit, standard)
        if field.name == "t":
            return SectionValue(
                field, section.dimensions["t"].to(unit), _metric_wall_note(standard)
            )
        if column in section.tabulated and field.name not in _PROPERTY:
            quantity = section.tabulated[column].to(unit)
            return SectionValue(field, quantity, f"dimension of the {standard} section")
    # A catalog shape: every value from the shape table, as catalog_table reads it.
    elif column in section.tabulated:
        source = _tabulated(section)
        if column == "tdes":
            source += "; design wall thickness (AISC 360-22 Section B4.2)"
        return SectionValue(field, section.tabulated[column].to(unit), source)
    # A user-defined section: computed properties and the given dimensions.
    if field.name in _PROPERTY:
        key = _PROPERTY[field.name]
        quantity = section.properties.get(key)
        if quantity is not None and not math.isnan(quantity.m):
            return SectionValue(field, quantity.to(unit), section.sources.get(key, ""))
    if field.name == "r_z" and "r_min" in section.properties:
        quantity = section.properties["r_min"]
        return SectionValue(field, quantity.to(unit), section.sources.get("r_min", ""))
    if field.name == "t" and "t" in section.dimensions:
        return SectionValue(field, section.dimensions["t"].to(unit), "section dimension")
    for name in _DIMENSION.get(field.name, ()):
        if name in section.dimensions:
            source = f"dimension of the {standard} section" if standard else "section dimension"
            return SectionValue(field, section.dimensions[name].to(unit), source)
    raise InputError(
        f"section {section.name} {field.name}",
        "missing",
        f"{field.description.lower()} for the AISC 360-22 checks",
    )


def _metric_standard(section: Section) -> str:
    """The EN product standard of a catalog section ("EN 10365:2017"); "" for any other."""
    if section.tabulated.get("mass") is None:  # only the EN catalog sections carry a mass
        return ""
    try:
        return find_entry(section.name).family.standard
    except InputError:
        return ""


def _metric_k_des(section: Section, field: Field, unit: str, standard: str) -> SectionValue:
    """k_des of an EN rolled I or H section: flange thickness plus root radius, k_des = t_f + r.

    The AISC tables give k_des for their own shapes only; for an EN 10365 section
    the distance from the outer face of the flange to the web toe of the fillet is
    t_f + r with the root radius r of the product standard, so h = d − 2·k_des
    (AISC 360-22 Table B4.1b) is the web's straight part between the root fillets,
    as EN 1993-1-1 Table 5.2 takes c = h − 2·t_f − 2·r.
    """
    quantity = (section.dimensions["tf"] + section.dimensions["r"]).to(unit)
    source = (
        f"k_des = t_f + r, flange thickness plus root radius of the {standard} section "
        "(the AISC shape tables give k_des for their own shapes only)"
    )
    return SectionValue(field, quantity, source)


def _metric_wall_note(standard: str) -> str:
    """The design wall thickness of an EN hollow section, and why it is not 0.93·t."""
    return (
        f"wall thickness t of the {standard} section, taken as the design wall thickness: "
        "the reduction to 0.93 t of AISC 360-22 Section B4.2 applies to electric-resistance-"
        "welded HSS made to ASTM A500 and like specifications, not to EN hollow sections"
    )


def _tabulated(section: Section) -> str:
    sources = [source for source in section.sources.values() if "tabulated" in source]
    return sources[0] if sources else "shape tables"


# --- arrays for the numeric path ------------------------------------------------------


@dataclass(frozen=True)
class SectionTable:
    """Many sections of one kind as arrays in SI base units (m, m², m³, m⁴, m⁶).

    ``values[name]`` has shape ``(n, 1)`` so that it broadcasts against ``m``
    load combinations; ``names`` are the designations in order.
    """

    kind: str
    names: tuple[str, ...]
    values: Mapping[str, np.ndarray]

    def __len__(self) -> int:
        return len(self.names)


def section_table(sections: Sequence[Section]) -> SectionTable:
    """A :class:`SectionTable` from Section objects (all of one kind)."""
    if not sections:
        raise InputError("sections", sections, "at least one section")
    kinds = {section_kind(section.family) for section in sections}
    if len(kinds) > 1:
        raise InputError("sections", sorted(kinds), "sections of one kind (I, HSS, round, angle)")
    (kind,) = kinds
    rows = [section_values(section) for section in sections]
    values = {
        field.name: np.array(
            [float(row[field.name].quantity.to_base_units().m) for row in rows]
        ).reshape(-1, 1)
        for field in FIELDS[kind]
    }
    return SectionTable(kind, tuple(section.name for section in sections), values)


def catalog_table(designations: Sequence[str]) -> SectionTable:
    """A :class:`SectionTable` straight from the shape tables (fast: no outlines are built).

    Same values as ``section_table([catalog_section(d) for d in designations])``:
    the catalog sections take these properties from the tables too. EN sections
    (dimensions only) are built and read that way.
    """
    entries = [find_entry(designation) for designation in designations]
    if not entries:
        raise InputError("designations", designations, "at least one designation")
    if any(entry.family.metric for entry in entries):
        # EN sections carry dimensions only: their values come from the built sections,
        # as section_values gives them to a sheet.
        return section_table([catalog_section(entry.designation) for entry in entries])
    kinds = {section_kind(entry.family.key) for entry in entries}
    if len(kinds) > 1:
        raise InputError("designations", sorted(kinds), "shapes of one kind")
    (kind,) = kinds
    columns = {**_COLUMN, **_COLUMN_BY_KIND.get(kind, {})}
    inch = Quantity(1.0, "inch").to("meter").m
    values = {}
    for field in FIELDS[kind]:
        column = columns[field.name]
        missing = [entry.designation for entry in entries if column not in entry.values]
        if missing:
            raise InputError(
                f"shape table column {column}", missing[:3], "a value for every designation"
            )
        values[field.name] = (
            np.array([entry.values[column] for entry in entries]) * inch**field.power
        ).reshape(-1, 1)
    if kind == "L":
        unequal = [e.designation for e in entries if not math.isclose(e.values["d"], e.values["b"])]
        if unequal:
            raise InputError(
                "designations", unequal[:3], "equal-leg angles", "unequal legs are not covered"
            )
    return SectionTable(kind, tuple(entry.designation for entry in entries), values)
