"""EN metric sections: I and H sections of EN 10365, hollow sections of EN 10210-2 and EN 10219-2.

The dimensions come from the files in ``calcsheet/sections/data`` (vendored from
the eurocodepy package, MIT licence; ``data/README.md`` says which version and
files); every property is computed here from them:

* IPE, HEA, HEB, HEM (EN 10365:2017): h, b, t_w, t_f and the root radius r. The
  outline carries the four quarter-circle root fillets, so A, I, W_el and W_pl
  include them, as the product tables do.
* SHS, RHS, CHS (EN 10210-2:2006, hot-finished): the source's corner radius is
  1.5 t on every row, the hot-finished rule of EN 10210-2 for calculating
  properties (outside corner radius r_o = 1.5 t, inside r_i = 1.0 t).
* SHS_CF, RHS_CF, CHS_CF (EN 10219-2:2006, cold-formed): the vendored data has
  no cold-formed list, so each hot-finished row has a cold-formed twin with the
  same sizes, " CF" after its designation ("SHS 100x100x5 CF"), the corner radii
  of EN 10219-2 (:func:`corner_radii` with ``forming="cold-formed"``: r_o = 2t,
  2.5t or 3t by the wall, r_i = r_o − t) and its mass from the area so computed
  at 7850 kg/m³. The EN 1993-1-1 checks read the family's standard: curve c of
  Table 6.2 for EN 10219, curve a for EN 10210.

Designations are spelled as the product standards write them ("IPE 300",
"HE 200 B", "SHS 100x100x5", "RHS 200x100x6.3", "CHS 168.3x8", "SHS 100x100x5 CF")
and looked up forgivingly by :mod:`calcsheet.sections.catalog`: case and spaces do
not matter, "SHS 100x100x5 CF", "SHS-CF 100x100x5" and "shs cf 100x100x5" are one
shape (without CF, the hot-finished one),
"HEB 200", "HEB200" and "HE200B" are the same shape, "x" or "×" separate the
sizes, and a decimal may be written with a point or a comma ("6,3").

A hollow section's :class:`Section` carries the family of a closed tube that the
analysis and the checks know (``HSS_RECT``, ``HSS_ROUND``, see
:data:`SECTION_FAMILY`); its catalog entry keeps SHS, RHS or CHS. An I or H
section's Section carries IPE, HEA, HEB or HEM.

Axes: EN y-y (the strong axis) is calcsheet's x-x, EN z-z is calcsheet's y-y, so
a section's ``Ix`` is the tables' I_y and ``Iy`` their I_z.
"""

from __future__ import annotations

import csv
import math
import re
from dataclasses import dataclass, replace
from functools import lru_cache
from importlib import resources
from types import MappingProxyType

import pint

from calcsheet.sections import shapes
from calcsheet.sections.section import COMPUTED, Section, build_section
from calcsheet.units import Quantity


@dataclass(frozen=True)
class MetricFamily:
    """A family of EN sections: its key, title, product standard and data file."""

    key: str
    title: str
    standard: str
    file: str
    forming: str = ""  # "hot-finished" or "cold-formed" for a hollow section; "" for I and H
    shape: str = "I"  # "I", "RHS" (square or rectangular hollow) or "CHS"


METRIC_FAMILIES: dict[str, MetricFamily] = {
    family.key: family
    for family in (
        MetricFamily("IPE", "IPE sections", "EN 10365:2017", "en10365_i_h_sections.csv"),
        MetricFamily("HEA", "HE A sections", "EN 10365:2017", "en10365_i_h_sections.csv"),
        MetricFamily("HEB", "HE B sections", "EN 10365:2017", "en10365_i_h_sections.csv"),
        MetricFamily("HEM", "HE M sections", "EN 10365:2017", "en10365_i_h_sections.csv"),
        MetricFamily(
            "SHS",
            "square hollow sections (hot-finished)",
            "EN 10210-2:2006",
            "en10210_rhs_shs.csv",
            "hot-finished",
            "RHS",
        ),
        MetricFamily(
            "RHS",
            "rectangular hollow sections (hot-finished)",
            "EN 10210-2:2006",
            "en10210_rhs_shs.csv",
            "hot-finished",
            "RHS",
        ),
        MetricFamily(
            "CHS",
            "circular hollow sections (hot-finished)",
            "EN 10210-2:2006",
            "en10210_chs.csv",
            "hot-finished",
            "CHS",
        ),
        MetricFamily(
            "SHS_CF",
            "square hollow sections (cold-formed)",
            "EN 10219-2:2006",
            "en10210_rhs_shs.csv",
            "cold-formed",
            "RHS",
        ),
        MetricFamily(
            "RHS_CF",
            "rectangular hollow sections (cold-formed)",
            "EN 10219-2:2006",
            "en10210_rhs_shs.csv",
            "cold-formed",
            "RHS",
        ),
        MetricFamily(
            "CHS_CF",
            "circular hollow sections (cold-formed)",
            "EN 10219-2:2006",
            "en10210_chs.csv",
            "cold-formed",
            "CHS",
        ),
    )
}
# The cold-formed family (EN 10219-2) of each hot-finished one (EN 10210-2). The vendored
# data has no cold-formed list: a cold-formed section is the hot-finished row's
# designation with " CF" after it, the same H, B (or d) and t, the corner radii of
# EN 10219-2 and its mass from the area computed with them (see data/README.md).
COLD_FORMED = {"SHS": "SHS_CF", "RHS": "RHS_CF", "CHS": "CHS_CF"}
COLD_FORMED_SUFFIX = " CF"
STEEL_DENSITY_KG_PER_M3 = 7850.0  # EN 10219-2:2006 and EN 10210-2:2006 mass tables (from memory)
DATA_SOURCE = "data: eurocodepy 2026.1.1, {file}"
# The Section.family of a hollow section: the family the analysis and the checks already
# know as a closed tube. With a family of its own, the torsion rule (mechanics/torsion.py)
# would take an SHS for an open section, τ = T·t/J, about ten times too small for a
# closed wall (Bredt); the catalog family (SHS, RHS, CHS) stays on the catalog entry.
SECTION_FAMILY = {
    key: {"RHS": "HSS_RECT", "CHS": "HSS_ROUND"}[family.shape]
    for key, family in METRIC_FAMILIES.items()
    if family.shape != "I"
}


@dataclass(frozen=True)
class MetricRow:
    """One row of a vendored file: its designation, family and values (mm, kg/m)."""

    designation: str
    family: MetricFamily
    values: dict[str, float]


@lru_cache(maxsize=1)
def metric_rows() -> tuple[MetricRow, ...]:
    """Every EN section of the vendored files, read once."""
    rows: list[MetricRow] = []
    folder = resources.files("calcsheet.sections") / "data"
    for file in dict.fromkeys(family.file for family in METRIC_FAMILIES.values()):
        with (folder / file).open(encoding="utf-8", newline="") as handle:
            for record in csv.DictReader(handle):
                designation = record.pop("designation")
                family = METRIC_FAMILIES[record.pop("family")]
                values = {name: float(text) for name, text in record.items()}
                rows.append(MetricRow(designation, family, values))
    rows += [cold_formed_row(row) for row in rows if row.family.key in COLD_FORMED]
    return tuple(rows)


def cold_formed_row(row: MetricRow) -> MetricRow:
    """The cold-formed (EN 10219-2) twin of a hot-finished row: same sizes, " CF" after
    the designation, the mass of the area with EN 10219-2 corners at 7850 kg/m³."""
    family = METRIC_FAMILIES[COLD_FORMED[row.family.key]]
    value = row.values
    if family.shape == "RHS":
        outer, inner = corner_radii(value["t_mm"], "cold-formed")
        area = rectangular_hollow_area(value["h_mm"], value["b_mm"], value["t_mm"], outer, inner)
    else:
        area = math.pi * value["t_mm"] * (value["d_mm"] - value["t_mm"])
    mass = round(area * 1e-6 * STEEL_DENSITY_KG_PER_M3, 2)
    values = {**value, "mass_kg_per_m": mass}
    return MetricRow(row.designation + COLD_FORMED_SUFFIX, family, values)


def lookup_keys(designation: str) -> set[str]:
    """Every key a row is found under: 'HE 200 B' -> {'HE200B', 'HEB200'}.

    Keys are upper case without spaces, with "X" between sizes and "_" for the
    decimal point, as :func:`calcsheet.sections.catalog.normalise_designation`
    writes a typed designation.
    """
    key = normalise_metric(designation)
    keys = {key}
    match = re.fullmatch(r"HE(\d+)([ABM])", key)
    if match:
        keys.add(f"HE{match.group(2)}{match.group(1)}")
    match = re.fullmatch(r"([A-Z]+)(\d.*)CF", key)
    if match:  # SHS 100x100x5 CF is also found as "SHS CF 100x100x5", "SHS-CF 100x100x5"
        keys.add(f"{match.group(1)}CF{match.group(2)}")
    return keys


def normalise_metric(text: str) -> str:
    """A typed EN designation in key form: 'rhs 200 x 100 x 6,3' -> 'RHS200X100X6_3'."""
    name = text.strip().upper().replace("×", "X").replace("*", "X")
    name = re.sub(r"(\d),(\d)", r"\1.\2", name)  # a decimal comma
    name = re.sub(r"[\s_-]+", "", name)  # "SHS-CF", "SHS_CF": the family key as typed
    name = re.sub(r"(\.\d*?)0+(?=X|CF$|$)", r"\1", name).replace(".X", "X")  # 5.0 -> 5
    name = re.sub(r"\.(?=CF$|$)", "", name)
    match = re.fullmatch(r"HE([ABM])(\d+)", name)
    if match:  # HEB200 -> HE200B, one key for both spellings
        name = f"HE{match.group(2)}{match.group(1)}"
    return name.replace(".", "_")


# --- rules of the product standards ------------------------------------------------------


def corner_radii(wall: float, forming: str = "hot-finished") -> tuple[float, float]:
    """Outside and inside corner radii (r_o, r_i) used to calculate hollow-section properties.

    Hot-finished, EN 10210-2:2006 Annex B: r_o = 1.5 t, r_i = 1.0 t. Cold-formed,
    EN 10219-2:2006 Annex B: r_o = 2.0 t (t <= 6 mm), 2.5 t (6 < t <= 10 mm),
    3.0 t (t > 10 mm), r_i = r_o − t. Both typed from memory; ``wall`` in mm for the
    cold-formed thresholds.
    """
    if forming == "hot-finished":
        return 1.5 * wall, 1.0 * wall
    if forming != "cold-formed":
        raise ValueError(f"forming {forming!r}: 'hot-finished' or 'cold-formed'")
    factor = 2.0 if wall <= 6.0 else 2.5 if wall <= 10.0 else 3.0
    return factor * wall, (factor - 1.0) * wall


def rectangular_hollow_area(
    height: float, width: float, wall: float, outer: float, inner: float
) -> float:
    """A of a rectangular hollow section with rounded corners, EN 10210-2:2006 and
    EN 10219-2:2006 Annex B (typed from memory): A = 2·t·(B + H − 2·t) − (4 − π)·(r_o² − r_i²).
    """
    return 2 * wall * (width + height - 2 * wall) - (4 - math.pi) * (outer**2 - inner**2)


def rectangular_hollow_torsion(
    height: float, width: float, wall: float, outer: float, inner: float
) -> float:
    """I_t of a rectangular hollow section, EN 10210-2:2006 Annex B (typed from memory).

    I_t = t³·h/3 + 2·K·A_h with R_c = (r_o + r_i)/2 the mid-line corner radius,
    h = 2·((B − t) + (H − t)) − 2·R_c·(4 − π) the mid-line perimeter,
    A_h = (B − t)·(H − t) − R_c²·(4 − π) the area it encloses and K = 2·A_h·t/h.
    """
    midline_radius = (outer + inner) / 2
    perimeter = 2 * ((width - wall) + (height - wall)) - 2 * midline_radius * (4 - math.pi)
    enclosed = (width - wall) * (height - wall) - midline_radius**2 * (4 - math.pi)
    k = 2 * enclosed * wall / perimeter
    return wall**3 * perimeter / 3 + 2 * k * enclosed


def corner_rule(wall: float, forming: str) -> str:
    """The corner radii of a hollow section in marked words (a source on the sheet):
    "{r_o} = 2{t}, {r_i} = {t}" (wall in mm)."""
    outer, inner = corner_radii(wall, forming)
    inside = "{t}" if inner == wall else f"{inner / wall:g}{{t}}"
    return f"{{r_o}} = {outer / wall:g}{{t}}, {{r_i}} = {inside}"


def rolled_i_torsion(depth: float, width: float, web: float, flange: float, root: float) -> float:
    """I_t of a rolled I or H section with root fillets (typed from memory).

    The flanges and the web as thin rectangles plus the two web-to-flange
    junctions, after El Darwish and Johnston, "Torsion of structural shapes",
    J. Struct. Div. ASCE 91 (ST1), 1965 (the attribution is from memory too):
    I_t = 2/3·(b − 0.63·t_f)·t_f³ + 1/3·(h − 2·t_f)·t_w³ + 2·α·D⁴, with
    α = (t_w/t_f)·(0.145 + 0.1·r/t_f) and D = ((r + t_w/2)² + (r + t_f)² − r²)/(2·r + t_f),
    the diameter of the circle inscribed in the junction. It gave the tabulated
    I_t of all 90 vendored I and H sections within −3 % / +5 % (a test); an
    alternative form with a fitted α gave up to −10 % on HE 100 M.
    """
    b, h, tw, tf, r = width, depth, web, flange, root
    alpha = tw / tf * (0.145 + 0.1 * r / tf)
    inscribed = ((r + tw / 2) ** 2 + (r + tf) ** 2 - r**2) / (2 * r + tf)
    return 2 / 3 * (b - 0.63 * tf) * tf**3 + 1 / 3 * (h - 2 * tf) * tw**3 + 2 * alpha * inscribed**4


def rolled_i_warping(depth: float, width: float, flange: float) -> float:
    """I_w of a doubly symmetric I: the flanges' own I_z times (h − t_f)²/4.

    I_w = t_f·b³/24·(h − t_f)²: thin-walled theory (Timoshenko and Gere, Theory
    of Elastic Stability, 2nd ed., 1961, ch. 5; from memory), the web and fillets
    neglected. It is 0.7 % to 5.3 % above the tabulated I_w of the vendored
    sections, and 1 % to 3 % above sectionproperties' finite-element value for
    IPE 300 and HE 200 B (tests): the tables, like the FE solution, count the web
    and the fillets, which the thin-walled formula leaves out.
    """
    return flange * width**3 / 24 * (depth - flange) ** 2


# --- sections ------------------------------------------------------------------------------


def metric_section(row: MetricRow) -> Section:
    """The section of one row, every property computed from its dimensions (mm)."""
    value, family = row.values, row.family
    source = DATA_SOURCE.format(file=family.file)
    if family.shape == "I":
        h, b, tw, tf, r = (value[name] for name in ("h_mm", "b_mm", "tw_mm", "tf_mm", "r_mm"))
        outline = shapes.i_shape(h, b, tw, tf, "mm", root_radius=r)
        outline = replace(
            outline,
            torsion_constant=rolled_i_torsion(h, b, tw, tf, r),
            torsion_note="computed: flanges, web and root-fillet junctions (El Darwish and "
            "Johnston, J. Struct. Div. ASCE 91(ST1), 1965)",
            warping_constant=rolled_i_warping(h, b, tf),
            warping_note="computed: {I_w} = {t_f}·{b}³·({h} − {t_f})²/24 (flanges only)",
        )
        dimensions = {"d": h, "bf": b, "tw": tw, "tf": tf, "r": r}
        computed = f"computed from {family.standard} dimensions, root fillets included"
    elif family.shape == "RHS":
        h, b, t = value["h_mm"], value["b_mm"], value["t_mm"]
        outer, inner = corner_radii(t, family.forming)
        outline = shapes.rectangular_tube(h, b, t, "mm", outer_radius=outer, inner_radius=inner)
        outline = replace(
            outline,
            torsion_constant=rectangular_hollow_torsion(h, b, t, outer, inner),
            torsion_note=(
                f"computed: {family.standard} Annex B, {{I_t}} = {{t}}³·{{h}}/3 + 2·{{K}}·{{A_h}}"
            ),
        )
        dimensions = {"H": h, "B": b, "t": t}
        computed = (
            f"computed from {family.standard} dimensions, "
            f"corners {corner_rule(t, family.forming)} (Annex B)"
        )
    else:
        d, t = value["d_mm"], value["t_mm"]
        outline = shapes.round_tube(d, t, "mm")
        dimensions = {"OD": d, "t": t}
        computed = f"computed from {family.standard} dimensions"
    tabulated = tabulated_values(row)
    section = build_section(
        name=row.designation,
        family=SECTION_FAMILY.get(family.key, family.key),
        dimensions={name: tabulated[name] for name in dimensions},
        length_unit="mm",
        shape=outline,
        tabulated=tabulated,
    )
    sources = {
        name: (f"{computed} ({source})" if text == COMPUTED else text)
        for name, text in section.sources.items()
    }
    return replace(section, sources=MappingProxyType(sources))


def tabulated_values(row: MetricRow) -> dict[str, pint.Quantity]:
    """The row as quantities under the section's dimension names (mm), and its mass per metre."""
    shape, value = row.family.shape, row.values
    if shape == "I":
        names = {"d": "h_mm", "bf": "b_mm", "tw": "tw_mm", "tf": "tf_mm", "r": "r_mm"}
    elif shape == "RHS":
        names = {"H": "h_mm", "B": "b_mm", "t": "t_mm"}
    else:
        names = {"OD": "d_mm", "t": "t_mm"}
    quantities = {name: Quantity(value[column], "mm") for name, column in names.items()}
    quantities["mass"] = Quantity(value["mass_kg_per_m"], "kg/m")
    return quantities
