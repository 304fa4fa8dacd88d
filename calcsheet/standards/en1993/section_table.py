"""A metric catalog family's section values as arrays, for searching a family fast.

Building a :class:`~calcsheet.sections.Section` of an EN section draws its
outline and integrates it (20-40 ms each); a search over a family needs only the
values the EN 1993-1-1 checks read (A, W_pl, W_el, i, the dimensions and the
buckling curves) and the second moments for the tip deflection. They are
computed here in closed form from the dimensions, for every section of a family
at once:

* I and H sections (EN 10365): two flanges, the web and four root fillets, each
  fillet the square r × r less a quarter circle of radius r. These are the
  formulas behind the product tables (the fillet's area (1 − π/4)·r², its centroid
  r·(10 − 3π)/(3·(4 − π)) from the faces it joins); for W_pl they give
  t_w·h²/4 + (b − t_w)·(h − t_f)·t_f + (4 − π)/2·r²·(h − 2t_f) + (3π − 10)/3·r³.
* Square and rectangular hollow sections: the outer rectangle with corners rounded
  to r_o less the inner one rounded to r_i; hot-finished (EN 10210-2:2006 Annex B)
  r_o = 1.5t, r_i = t, cold-formed (EN 10219-2:2006 Annex B) r_o = 2t, 2.5t or 3t
  by the wall and r_i = r_o − t (the rule the catalog's sections use).
* Circular hollow sections: the annulus.

The built section integrates a polygon that follows the arcs, so its values differ
from these in the fifth significant figure (a test compares them); a test also
keeps a search over this table equal to a loop over the built sections.
"""

from __future__ import annotations

import math
from collections.abc import Mapping
from dataclasses import dataclass
from functools import lru_cache
from typing import Any

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.sections import Section, catalog_section, list_designations
from calcsheet.sections.metric import (
    METRIC_FAMILIES,
    corner_radii,
    metric_rows,
    rectangular_hollow_torsion,
    rolled_i_torsion,
    rolled_i_warping,
)
from calcsheet.standards.en1993 import buckling as buck
from calcsheet.standards.en1993 import lateral as lat
from calcsheet.standards.en1993.factors import NOMINAL_THICKNESS_LIMIT_MM, PartialFactors, Steel
from calcsheet.standards.en1993.member import MemberData, member_data, si_inputs
from calcsheet.units import Quantity

I_FAMILIES = ("IPE", "HEA", "HEB", "HEM")
EN_FAMILIES = tuple(METRIC_FAMILIES)  # IPE, HEA, HEB, HEM, SHS, RHS, CHS, SHS_CF, RHS_CF, CHS_CF
MM = 1e-3  # metres per millimetre

# The fillet shape (square r × r less a quarter circle of radius r) per unit r:
# its area, first moment and second moment about a face through its sharp corner.
_FILLET_AREA = 1.0 - math.pi / 4.0
_FILLET_FIRST = (10.0 - 3.0 * math.pi) / 12.0
_FILLET_SECOND = 1.0 - 5.0 * math.pi / 16.0


@dataclass(frozen=True)
class FamilyTable:
    """Every section of one metric family, lightest first, its values in SI base units.

    ``values`` maps the names the EN procedure reads (``A``, ``W_pl_y``, ``i_z``,
    ``h``, ``t_f``...) to arrays ``(n,)``; ``I_x`` and ``I_y`` (calcsheet's axes,
    m⁴) serve the tip deflection; ``mass`` is in kg/m; ``thickest`` in mm.
    """

    family: str
    names: tuple[str, ...]
    values: Mapping[str, np.ndarray]
    I_x: np.ndarray
    I_y: np.ndarray
    mass: np.ndarray
    thickest: np.ndarray

    def index(self, designation: str) -> int:
        return self.names.index(designation)


def _fillet_about(distance: np.ndarray, r: np.ndarray, toward: float) -> np.ndarray:
    """Second moment of one fillet shape about an axis ``distance`` from its face.

    ``toward`` is −1 when the shape lies between the face and the axis (a web-flange
    fillet about y-y, a tube's corner), +1 when it lies beyond the face (about z-z).
    """
    area = _FILLET_AREA * r**2
    return distance**2 * area + toward * 2 * distance * _FILLET_FIRST * r**3 + _FILLET_SECOND * r**4


def i_section_values(h, b, tw, tf, r) -> dict[str, np.ndarray]:
    """A, I, W_el, W_pl and i of rolled I or H sections with root fillets (arrays, one unit)."""
    fillet = _FILLET_AREA * r**2
    area = 2 * b * tf + (h - 2 * tf) * tw + 4 * fillet
    web = h - 2 * tf
    I_y = (b * h**3 - (b - tw) * web**3) / 12 + 4 * _fillet_about(h / 2 - tf, r, -1.0)
    I_z = (2 * tf * b**3 + web * tw**3) / 12 + 4 * _fillet_about(tw / 2, r, +1.0)
    W_pl_y = (
        tw * h**2 / 4
        + (b - tw) * (h - tf) * tf
        + 4 * (fillet * (h / 2 - tf) - _FILLET_FIRST * r**3)
    )
    W_pl_z = tf * b**2 / 2 + web * tw**2 / 4 + 4 * (fillet * tw / 2 + _FILLET_FIRST * r**3)
    return _with_derived(area, I_y, I_z, W_pl_y, W_pl_z, h / 2, b / 2)


def _rounded_rectangle(H, B, R) -> tuple[np.ndarray, ...]:
    """Area, I about the axis parallel to B and to H, and W_pl about each, of a B × H
    rectangle whose four corners are rounded to radius R."""
    area = B * H - 4 * _FILLET_AREA * R**2
    I_1 = B * H**3 / 12 - 4 * _fillet_about(H / 2, R, -1.0)
    I_2 = H * B**3 / 12 - 4 * _fillet_about(B / 2, R, -1.0)
    W_1 = B * H**2 / 4 - 4 * (_FILLET_AREA * R**2 * H / 2 - _FILLET_FIRST * R**3)
    W_2 = H * B**2 / 4 - 4 * (_FILLET_AREA * R**2 * B / 2 - _FILLET_FIRST * R**3)
    return area, I_1, I_2, W_1, W_2


def hollow_corner_radii(t, forming: str = "hot-finished") -> tuple[np.ndarray, np.ndarray]:
    """Outside and inside corner radii of hollow sections of walls ``t`` (mm), by
    :func:`~calcsheet.sections.metric.corner_radii` (EN 10210-2 or EN 10219-2 Annex B)."""
    pairs = [corner_radii(float(wall), forming) for wall in np.atleast_1d(t)]
    outer, inner = (np.array(column).reshape(np.shape(t)) for column in zip(*pairs, strict=True))
    return outer, inner


def hollow_rectangle_values(h, b, t, forming: str = "hot-finished") -> dict[str, np.ndarray]:
    """A, I, W_el, W_pl and i of SHS or RHS, the corners of EN 10210-2 Annex B
    (hot-finished) or EN 10219-2 Annex B (cold-formed); dimensions in mm."""
    outer_r, inner_r = hollow_corner_radii(t, forming)
    outer = _rounded_rectangle(h, b, outer_r)
    inner = _rounded_rectangle(h - 2 * t, b - 2 * t, inner_r)
    area, I_y, I_z, W_pl_y, W_pl_z = (o - i for o, i in zip(outer, inner, strict=True))
    return _with_derived(area, I_y, I_z, W_pl_y, W_pl_z, h / 2, b / 2)


def circular_hollow_values(d, t) -> dict[str, np.ndarray]:
    """A, I, W_el, W_pl and i of circular hollow sections."""
    inside = d - 2 * t
    area = math.pi / 4 * (d**2 - inside**2)
    I = math.pi / 64 * (d**4 - inside**4)
    W_pl = (d**3 - inside**3) / 6
    return _with_derived(area, I, I, W_pl, W_pl, d / 2, d / 2)


def _with_derived(area, I_y, I_z, W_pl_y, W_pl_z, c_y, c_z) -> dict[str, np.ndarray]:
    return {
        "A": area,
        "I_y": I_y,
        "I_z": I_z,
        "W_pl_y": W_pl_y,
        "W_el_y": I_y / c_y,
        "W_pl_z": W_pl_z,
        "W_el_z": I_z / c_z,
        "i_y": np.sqrt(I_y / area),
        "i_z": np.sqrt(I_z / area),
    }


@lru_cache(maxsize=16)
def family_table(family: str) -> FamilyTable:
    """The table of a metric family (IPE, HEA, HEB, HEM, SHS, RHS, CHS, SHS_CF, RHS_CF,
    CHS_CF), read once."""
    key = str(family).strip().upper()
    if key not in METRIC_FAMILIES:
        raise InputError("family", family, f"an EN family: {', '.join(METRIC_FAMILIES)}")
    names = list_designations(key, lightest_first=True)
    rows = {row.designation: row.values for row in metric_rows() if row.family.key == key}
    column = {name: np.array([rows[n][name] for n in names]) for name in rows[names[0]]}
    shape, forming = METRIC_FAMILIES[key].shape, METRIC_FAMILIES[key].forming
    if shape == "I":
        h, b, tw, tf, r = (column[name] for name in ("h_mm", "b_mm", "tw_mm", "tf_mm", "r_mm"))
        values = i_section_values(h, b, tw, tf, r)
        # The torsion and warping constants as the catalog's sections compute them.
        values["I_t"] = rolled_i_torsion(h, b, tw, tf, r)
        values["I_w"] = rolled_i_warping(h, b, tf)
        dims = {"h": h, "b": b, "t_w": tw, "t_f": tf, "r": r}
        thickest = np.maximum(tw, tf)
    elif shape == "RHS":
        h, b, t = column["h_mm"], column["b_mm"], column["t_mm"]
        values = hollow_rectangle_values(h, b, t, forming)
        outer_r, inner_r = hollow_corner_radii(t, forming)
        values["I_t"] = rectangular_hollow_torsion(h, b, t, outer_r, inner_r)
        values["I_w"] = np.zeros_like(t)
        dims = {"h": h, "b": b, "t": t}
        thickest = t
    else:
        d, t = column["d_mm"], column["t_mm"]
        values = circular_hollow_values(d, t)
        values["I_t"] = 2 * values["I_y"]  # the polar moment of the annulus
        values["I_w"] = np.zeros_like(t)
        dims = {"d": d, "t": t}
        thickest = t
    power = {
        "A": 2, "I_y": 4, "I_z": 4, "I_t": 4, "I_w": 6,
        "W_pl_y": 3, "W_el_y": 3, "W_pl_z": 3, "W_el_z": 3,
    }  # fmt: skip
    si = {name: value * MM ** power.get(name, 1) for name, value in values.items()}
    si.update({name: value * MM for name, value in dims.items()})
    si["I_yy"] = si["I_y"]  # the EN strong axis under the name the Annex A steps use
    return FamilyTable(
        family=key,
        names=tuple(names),
        values=si,
        I_x=si["I_y"],
        I_y=si["I_z"],
        mass=column["mass_kg_per_m"],
        thickest=thickest,
    )


@lru_cache(maxsize=16)
def _first_section(family: str) -> Section:
    """The family's lightest section, built once: its member data shape the procedure."""
    return catalog_section(family_table(family).names[0])


def family_inputs(
    table: FamilyTable,
    *,
    material: Steel,
    length: pint.Quantity,
    k_eff: float,
    gamma: PartialFactors,
    stability: Mapping[str, Any] | None = None,
) -> tuple[MemberData, dict[str, Any], np.ndarray]:
    """What the EN procedure needs to run on every section of ``table`` at once.

    The member data of the family's first section (its kind, fabrication and options
    shape the procedure), the inputs by name with the section values as ``(n, 1)``
    arrays, and the sections refused as member data would refuse them (a nominal
    f_y of Table 3.1 on an element thicker than 40 mm).
    """
    member = member_data(
        _first_section(table.family),
        material=material,
        length=length,
        k_eff=k_eff,
        gamma=gamma,
        **(stability or {}),
    )
    given: dict[str, Any] = dict(si_inputs(member))
    for name in member.values:
        given[name] = table.values[name][:, np.newaxis]
    if member.ltb is not None and "h" in table.values:
        # What 6.3.2 reads of each section's own shape: the curve of Table 6.4/6.5 by
        # h/b and the load's height z_g by the depth (the first section's would do for
        # none of the others).
        height = (stability or {}).get("load_height", "shear centre")
        rows = zip(table.values["h"], table.values["b"], strict=True)
        curves, heights = [], []
        for h, b in rows:
            depth = Quantity(h, "m")
            if member.kind == "I":
                chosen = lat.ltb_curve(
                    member.ltb.method, member.fabrication, depth, Quantity(b, "m")
                )
                curves.append(chosen.alpha)
            else:
                curves.append(member.ltb.curve.alpha)
            heights.append(float(lat.load_height(height, depth)[0].to("m").m))
        given["alpha_LT"] = np.array(curves)[:, np.newaxis]
        given["z_g"] = np.array(heights)[:, np.newaxis]
    if member.kind == "I":
        for axis in ("y", "z"):
            given[f"alpha_{axis}"] = np.array(
                [
                    [
                        buck.buckling_curve(
                            f"{member.fabrication} I", axis, grade=material.grade,
                            h=f"{h / MM:.6g} mm", b=f"{b / MM:.6g} mm", t_f=f"{t_f / MM:.6g} mm",
                        ).alpha
                    ]
                    for h, b, t_f in zip(
                        table.values["h"], table.values["b"], table.values["t_f"], strict=True
                    )
                ]
            )  # fmt: skip
    if member.kind == "RHS":
        # Torsion (6.2.7) reads each section's mid-line corner radius over t: for cold-formed
        # sections it steps with the wall thickness (EN 10219-2 Annex B).
        ratios = []
        for wall in table.values["t"]:
            outer, inner = corner_radii(float(wall / MM), member.fabrication)
            ratios.append((outer + inner) / (2 * float(wall / MM)))
        given["k_R"] = np.array(ratios)[:, np.newaxis]
    refused = np.zeros((len(table.names), 1), dtype=bool)
    if material.source != "given":
        refused = (table.thickest > NOMINAL_THICKNESS_LIMIT_MM)[:, np.newaxis]
    return member, given, refused


__all__ = [
    "EN_FAMILIES",
    "FamilyTable",
    "circular_hollow_values",
    "family_inputs",
    "family_table",
    "hollow_rectangle_values",
    "i_section_values",
]
