"""EN 1993-1-1 checks of a member, written once for a sheet and for arrays.

:func:`en1993_member_procedure` classifies the cross-section (Table 5.2), writes
the cross-section resistances of 6.2 (with a torque T_Ed, St Venant torsion of 6.2.7
and shear with torsion of 6.2.7(9): :mod:`~calcsheet.standards.en1993.torsion`) and the
flexural buckling resistances of 6.3.1, and adds one check per verification under the keys of
:data:`EN_CHECK_TITLES`: with bending about y-y, lateral-torsional buckling (6.3.2);
with N and bending, the member interaction of 6.3.3 (Eq. 6.61 and 6.62 with the
factors of Annex B or Annex A, taken as 0 while N is tension). It is written against a writer
(:mod:`calcsheet.engine.procedure`): :func:`write_en1993_checks` prints it on
a sheet, :func:`~calcsheet.standards.en1993.numeric.en1993_checks_numeric`
evaluates it on arrays of load combinations (and sections). Every decision that
depends on the demands (the class of a web under N and M, the interaction of
6.2.9 that applies, the shear reduction of 6.2.8, whether the member is
compressed) is a branch of the expressions, so it is taken per combination.

It covers doubly symmetric rolled or welded I-sections, rectangular/square
hollow sections and circular hollow sections; any other family is refused with
a message saying what is covered. Class 4 cross-sections and webs that need a
shear buckling verification (6.2.6(6)) are outside the scope: the sheet refuses
them before writing anything, the numeric path gives an infinite utilization.

Axes: the standard's y-y is the major axis and z-z the minor axis. In calcsheet's
section coordinates (x right, y up, x-x the strong axis of a W shape) that is

* EN y-y = calcsheet x-x: M_y,Ed is calcsheet's M_x, V_z,Ed its V_y (along the web);
* EN z-z = calcsheet y-y: M_z,Ed is calcsheet's M_y, V_y,Ed its V_x.

N_Ed is positive in tension, as calcsheet's N. Moments and shears enter the
checks by magnitude, so their signs do not matter here.
"""

from __future__ import annotations

import functools
import math
import operator
from collections.abc import Mapping, Sequence
from dataclasses import dataclass
from typing import Any

import numpy as np
import pint
import sympy as sp

from calcsheet.engine import Check, Sheet, as_written
from calcsheet.engine.procedure import ArrayWriter, SheetWriter, Value, Writer
from calcsheet.errors import InputError
from calcsheet.sections import Section
from calcsheet.sections.metric import corner_radii
from calcsheet.standards.clause import Clause
from calcsheet.standards.en1993 import annex_a
from calcsheet.standards.en1993 import buckling as buck
from calcsheet.standards.en1993 import classification as cls
from calcsheet.standards.en1993 import interaction as inter
from calcsheet.standards.en1993 import lateral as lat
from calcsheet.standards.en1993 import resistance as res
from calcsheet.standards.en1993 import torsion as tor
from calcsheet.standards.en1993.buckling import CurveChoice
from calcsheet.standards.en1993.factors import (
    NOMINAL_THICKNESS_LIMIT_MM,
    PartialFactors,
    Steel,
    as_partial_factors,
    as_steel,
)
from calcsheet.units import Quantity, parse_quantity, ureg

# AISC rolled I-shapes, EN 10365 I and H sections, and I-sections drawn from plates.
I_FAMILIES = frozenset({"W", "M", "S", "HP", "IPE", "HEA", "HEB", "HEM", "I-shape"})
RHS_FAMILIES = frozenset({"HSS_RECT", "rectangular HSS"})
CHS_FAMILIES = frozenset({"HSS_ROUND", "PIPE", "round HSS"})
SUPPORTED_TEXT = (
    "a doubly symmetric I-section (IPE, HEA, HEB, HEM, W, M, S, HP, or I-shape with equal "
    "flanges), a rectangular or square hollow section (SHS, RHS, HSS_RECT, rectangular HSS) "
    "or a circular hollow section (CHS, HSS_ROUND, PIPE, round HSS)"
)
SCOPE_TEXT = (
    "a class 1, 2 or 3 cross-section whose webs need no shear buckling verification "
    "(EN 1993-1-1 5.5, 6.2.6(6))"
)

DEMAND_DIMENSIONS: dict[str, str] = {
    "N_Ed": "force",
    "M_y_Ed": "moment",
    "M_z_Ed": "moment",
    "V_z_Ed": "force",
    "V_y_Ed": "force",
    "T_Ed": "moment",
}
DEMAND_ALIASES = {"V_Ed": "V_z_Ed"}
F_235 = Quantity(235.0, "MPa")  # the reference strength of ε (Table 5.2)
POISSON_RATIO = 0.3  # EN 1993-1-1 3.2.6(1)
# EN 1993-1-1 6.3.2.3(1): λ̄_LT,0 ≤ 0.4 and β ≥ 0.75 recommended (a National Annex may
# give others; the sheet shows them as inputs).
LAMBDA_LT_0 = 0.4
BETA_LT = 0.75

# The checks of the procedure by key, as titled on the sheet (in sheet order).
EN_CHECK_TITLES: dict[str, str] = {
    "axial": "Axial force on the gross section",
    "net_section": "Tension, net section",
    "shear_z": "Shear along z",
    "shear_y": "Shear along y",
    "torsion": "Torsion (St Venant)",
    "shear_torsion_z": "Shear along z with torsion",
    "shear_torsion_y": "Shear along y with torsion",
    "bending_y": "Bending about y-y",
    "bending_z": "Bending about z-z",
    "combined": "Bending and axial force",
    "buckling_y": "Flexural buckling about y-y",
    "buckling_z": "Flexural buckling about z-z",
    "ltb": "Lateral-torsional buckling",
    "interaction_y": "Bending and compression, Eq. (6.61)",
    "interaction_z": "Bending and compression, Eq. (6.62)",
}

AXES_TEXT = (
    "EN 1993-1-1 axes: y-y is the major axis and z-z the minor axis, i.e. calcsheet's "
    "x-x and y-y. So {M_y_Ed} is calcsheet's {M_x}, {M_z_Ed} its {M_y}, {V_z_Ed} (parallel to the "
    "web or depth) its {V_y} and {V_y_Ed} its {V_x}. {N_Ed} is positive in tension. Moments and "
    "shears are checked by magnitude."
)
NOT_COVERED_TEXT = (
    "Not covered by these checks: torsion (6.2.7), class 4 cross-sections (EN 1993-1-5), "
    "intermediate lateral restraints, local load introduction and connections. They must be "
    "verified separately."
)
NOT_COVERED_WITH_TORQUE_TEXT = (
    "Not covered by these checks: warping torsion of open sections (the warping torque "
    "{T_w_Ed} and the bimoment {B_Ed} of EN 1993-1-1 6.2.7(2), (4), and their direct stresses "
    "combined with bending), class 4 cross-sections (EN 1993-1-5), intermediate lateral "
    "restraints, local load introduction and connections. They must be verified separately."
)
WARPING_TEXT = (
    "An open section: {T_Ed} is taken as St Venant torsion throughout ({T_t_Ed} = {T_Ed}, "
    "6.2.7(2)), with {tau_t_Ed} = {T_t_Ed}·t/{I_t} largest in the thickest element. Warping "
    "torsion ({T_w_Ed} and the bimoment {B_Ed}, 6.2.7(2), (4), (7)) is not included in this "
    "check; where "
    "the member's stress steps include warping, its stresses appear there, not here."
)
CLOSED_TEXT = (
    "A closed hollow section: warping is neglected (EN 1993-1-1 6.2.7(7)) and {T_Ed} is "
    "carried as St Venant torsion, the shear stress of the thin wall by Bredt's formula "
    "{tau_t_Ed} = {T_Ed}/(2·{A_m}·t), {A_m} the area enclosed by the mid-line of the wall."
)
NO_TORQUE_TEXT = (
    "The checks of 6.2.7 apply to a member under torsion: a torque of at most 10⁻⁹·(|{M_y_Ed}| "
    "+ |{M_z_Ed}|), the round-off of statics, is taken as zero."
)
LTB_FIXED = (
    "follows from the section, the support case, the moment diagram and the load height "
    "chosen; build the sheet again with them"
)
CURVE_FIXED = (
    "the buckling curve follows from the section, the steel grade and its forming; "
    "build the sheet again with them"
)
MATERIAL_FIXED = (
    "decides through ε whether the section is within the checks (class 4 and the web limit "
    "of EN 1993-1-1 6.2.6(6) were settled when the sheet was built); build the sheet again"
)
LIMIT_FIXED = (
    "decides whether the web needs a shear buckling verification (EN 1993-1-1 6.2.6(6)), "
    "stated when the sheet was built; build the sheet again"
)


@dataclass(frozen=True)
class _Geometry:
    kind: str  # "I", "RHS" or "CHS"
    fabrication: str  # rolled / welded (I), hot-finished / cold-formed (hollow)
    dims: dict[str, pint.Quantity]
    reference: str


@dataclass(frozen=True)
class MemberData:
    """What the procedure needs besides the demands: the section, material and member.

    ``values`` maps an input name to (value, description, reference); ``curves``
    gives the buckling curve of Table 6.2 about "y" and "z". The kind of section,
    its fabrication, the options and which demands are given shape the sheet;
    everything else is a value, so an array writer may be given arrays for it.
    """

    name: str
    kind: str
    fabrication: str
    values: dict[str, tuple[pint.Quantity, str, str]]
    curves: dict[str, CurveChoice]
    steel: Steel
    factors: PartialFactors
    length: pint.Quantity
    k: tuple[float, float]
    net_area: pint.Quantity | None
    interaction: str
    ltb: LateralData | None = None  # None: not susceptible (CHS, SHS): no LTB check
    factors_m: lat.DiagramFactors | None = None
    support_case: str = "cantilever"
    interaction_method: str = "B"
    diagram_text: str = "uniform"
    moment_diagram: str = "uniform"
    end_moment_ratio: float = 1.0
    # RHS: the mid-line corner radius over the wall thickness, (r_o + r_i)/(2t), and its source.
    corner_ratio: float = 0.0
    corner_source: str = ""


@dataclass(frozen=True)
class LateralData:
    """How lateral-torsional buckling is verified (6.3.2), settled when the member is read."""

    method: str  # "6.3.2.2" or "6.3.2.3"
    curve: CurveChoice
    z_g: pint.Quantity
    z_g_source: str
    k_LT: float
    k_LT_source: str


def write_en1993_checks(
    sheet: Sheet,
    section: Section,
    *,
    demands: Mapping[str, sp.Symbol],
    material: Steel | str | Mapping[str, object] = "S355",
    length: pint.Quantity | str,
    k_eff: float | tuple[float, float] = 2.0,
    gamma: PartialFactors | Mapping[str, float] | None = None,
    fabrication: str | None = None,
    net_area: pint.Quantity | str | None = None,
    interaction: str = "plastic",
    ltb_method: str | None = None,
    load_height: str | pint.Quantity = "shear centre",
    support_case: str = "cantilever",
    moment_diagram: str = "uniform",
    end_moment_ratio: float = 1.0,
    interaction_method: str = "B",
) -> list[Check]:
    """Write the EN 1993-1-1 checks of ``section`` under ``demands`` on ``sheet``.

    ``demands`` maps ``"N_Ed"``, ``"M_y_Ed"``, ``"M_z_Ed"``, ``"V_z_Ed"`` and
    ``"V_y_Ed"`` (``"V_Ed"`` is taken as ``V_z_Ed``, the shear along the web) and
    ``"T_Ed"`` (the torque about the member axis) to symbols of design forces already on
    the sheet, in the standard's axes (see
    the module docstring); a force left out is not checked. ``material`` is a
    :class:`Steel`, a grade ("S355") or keywords of :func:`steel`. ``k_eff`` is
    the effective-length factor, one value or (k_y, k_z); 2.0 is the theoretical
    value of a fixed-free cantilever (common practice, no source). ``gamma``
    overrides the recommended partial factors. ``fabrication`` is "rolled" or
    "welded" for I-sections (catalog shapes default to rolled, user-defined
    I-shapes to welded), "hot-finished" or "cold-formed" for hollow sections
    (default cold-formed, as ASTM A500 tubes are: curve c, the safe choice).
    ``net_area`` adds the net-section check (6.7) in tension. ``interaction`` is
    "plastic" (6.2.9.1 for class 1 and 2, the stress criterion of 6.2.9.2 for
    class 3) or "linear" (Eq. 6.2 throughout; always used for CHS).

    Lateral-torsional buckling (6.3.2) of I-sections and RHS: ``ltb_method`` is
    "6.3.2.3" (rolled or equivalent welded; the default for rolled sections) or
    "6.3.2.2" (general case; the default for welded ones); ``load_height`` is
    "shear centre" (default), "top flange", "bottom flange" or a length above the
    shear centre; ``support_case`` "cantilever" (fixed-free, default) or "simply
    supported"; ``moment_diagram`` the shape of M_y between the supports ("uniform",
    "end moments" with ``end_moment_ratio`` ψ, "uniform load", "central point load").
    Members in bending and compression (6.3.3) take their interaction factors from
    ``interaction_method`` "B" (Annex B, the default) or "A" (Annex A, Method 1).

    A class 4 section, or a web that needs a shear buckling verification, is
    refused before anything is written. Returns the checks written, in sheet order.
    """
    symbols = _demands(sheet, demands)
    member = member_data(
        section,
        material=material,
        length=length,
        k_eff=k_eff,
        gamma=gamma,
        fabrication=fabrication,
        net_area=net_area,
        interaction=interaction,
        ltb_method=ltb_method,
        load_height=load_height,
        support_case=support_case,
        moment_diagram=moment_diagram,
        end_moment_ratio=end_moment_ratio,
        interaction_method=interaction_method,
    )
    # The scope depends on the demands (the class of a web under N and M): settle it
    # with the same procedure on the current values, before anything is written.
    current = {key: float(sheet.value(symbol).to_base_units().m) for key, symbol in symbols.items()}
    problems = scope_problems(run_on_arrays(member, current), member.kind)
    for outside, reason in problems:
        if bool(np.any(outside)):
            raise InputError("section", section.name, SCOPE_TEXT, reason)
    w = SheetWriter(sheet)
    sheet.heading("Member checks to EN 1993-1-1")
    sheet.add_reference("EN 1993-1-1:2005 Eurocode 3: Design of steel structures, Part 1-1")
    sheet.text(AXES_TEXT)
    # as_written rather than ``with sheet``: the caller may already be inside its own
    # ``with sheet`` block, whose exit would otherwise be cut short by ours.
    with as_written():
        en1993_member_procedure(w, member, symbols)
    sheet.text(NOT_COVERED_WITH_TORQUE_TEXT if "T_Ed" in symbols else NOT_COVERED_TEXT)
    return list(w.checks.values())


def run_on_arrays(member: MemberData, demands: Mapping[str, Any], **given: Any) -> ArrayWriter:
    """The procedure on arrays (demands in N, N·m); ``given`` replaces inputs by name."""
    w = ArrayWriter(given_values=given)
    with np.errstate(divide="ignore", invalid="ignore", over="ignore"):
        en1993_member_procedure(w, member, demands)
    return w


# The parts each class is the worst of (see _Procedure._classify), by section kind: the
# part's name, its class symbol and its c/t symbol.
_CLASS_PARTS: dict[str, dict[str, tuple[tuple[str, str, str], ...]]] = {
    "I": {
        "y": (("flange outstand", "class_f", "ct_f"), ("web", "class_w", "ct_w")),
        "z": (("flange outstand", "class_f", "ct_f"),),
        "N": (("flange outstand", "class_f", "ct_f"), ("web", "class_wN", "ct_w")),
    },
    "RHS": {
        "y": (("flanges", "class_bN", "ct_b"), ("webs", "class_h", "ct_h")),
        "z": (("webs", "class_hN", "ct_h"), ("flanges", "class_b", "ct_b")),
        "N": (("flanges", "class_bN", "ct_b"), ("webs", "class_hN", "ct_h")),
    },
    "CHS": {key: (("wall", "class_t", "dt"),) for key in ("y", "z", "N")},
}


def scope_problems(w: ArrayWriter, kind: str = "") -> list[tuple[np.ndarray, str]]:
    """Where the procedure run on arrays left its scope: (mask, reason in words) pairs.

    With the section ``kind`` ("I", "RHS", "CHS") a class 4 reason names the part, its
    c/t and the class 3 limit it exceeds.
    """
    s = w.symbols
    problems = []
    compressed = np.asarray(s["N_Ed"]) < 0 if "N_Ed" in s else np.zeros((), dtype=bool)
    for key, what in (
        ("y", "bending about y-y with N"),
        ("z", "bending about z-z with N"),
        ("N", "compression"),
    ):
        if f"class_{key}" not in s:
            continue
        outside = np.asarray(s[f"class_{key}"]) > 3
        if key == "N":
            outside = outside & compressed
        problems.append((outside, f"class 4 in {what}{_class_4_parts(s, kind, key, outside)}: "
                         "effective properties (EN 1993-1-5 4.4) are not covered"))  # fmt: skip
    for axis in ("z", "y"):
        if f"hw_tw_{axis}" in s:
            ratio, limit = np.asarray(s[f"hw_tw_{axis}"]), np.asarray(s["hw_tw_max"])
            problems.append(
                (
                    ratio > limit,
                    f"web slenderness h_w/t_w = {np.max(ratio):.4g} > 72ε/η = "
                    f"{np.min(limit):.4g} (shear along {axis}): shear buckling to EN 1993-1-5 "
                    "Section 5 is not covered (EN 1993-1-1 6.2.6(6))",
                )
            )
    if "hw_tw_T" in s:
        ratio, limit = np.asarray(s["hw_tw_T"]), np.asarray(s["hw_tw_max"])
        torqued = np.asarray(s["T_t_Ed"]) > 0
        problems.append(
            (
                (ratio > limit) & torqued,
                f"wall slenderness h_w/t = {np.max(ratio):.4g} > 72ε/η = {np.min(limit):.4g} "
                "under torsion: the design shear strength of the walls to EN 1993-1-5 is not "
                "covered (EN 1993-1-1 6.2.7(8))",
            )
        )
    return problems


def _class_4_parts(symbols: Mapping[str, Any], kind: str, key: str, outside: np.ndarray) -> str:
    """ ": the web has c/t = 61.2 > 34.2, the class 3 limit of ..." for the parts of class 4
    where ``outside`` holds (the largest c/t among those elements)."""
    if not np.any(outside):
        return ""
    named = []
    for part, class_name, ratio_name in _CLASS_PARTS.get(kind, {}).get(key, ()):
        if class_name not in symbols or ratio_name not in symbols:
            continue
        part_class = np.asarray(symbols[class_name])
        where = np.broadcast_to(
            part_class > 3, np.broadcast_shapes(part_class.shape, outside.shape)
        )
        where = where & outside
        if not np.any(where):
            continue
        shape = where.shape
        ratio = np.broadcast_to(np.asarray(symbols[ratio_name], dtype=float), shape)[where]
        limit_name = f"{class_name.replace('class_', 'ct_')}_3"
        limit = np.broadcast_to(np.asarray(symbols[limit_name], dtype=float), shape)[where]
        worst = int(np.argmax(ratio))
        label = "d/t" if ratio_name == "dt" else "c/t"
        named.append(
            f"the {part} has {label} = {ratio[worst]:.3g} > {limit[worst]:.3g}, the class 3 "
            "limit of EN 1993-1-1 Table 5.2 (class 4)"
        )
    return ": " + "; ".join(named) if named else ""


def si_inputs(member: MemberData) -> dict[str, float]:
    """The procedure's inputs from ``member`` in SI base units, converted once.

    Given to an :class:`ArrayWriter`, they spare the unit conversions of each run
    (the values are the ones the procedure's inputs would convert, by name).
    """
    steel, factors = member.steel, member.factors
    quantities: dict[str, Any] = {
        "f_y": steel.f_y,
        "E": steel.E,
        "f_235": F_235,
        "f_u": steel.f_u,
        "L": member.length,
        **{name: value for name, (value, _, _) in member.values.items()},
    }
    if member.net_area is not None:
        quantities["A_net"] = member.net_area
    if member.ltb is not None:
        quantities["z_g"] = member.ltb.z_g
    result = {name: float(value.to_base_units().m) for name, value in quantities.items()}
    if member.ltb is not None:
        result.update(
            nu=POISSON_RATIO,
            k_LT=member.ltb.k_LT,
            alpha_LT=member.ltb.curve.alpha,
            lambda_LT_0=LAMBDA_LT_0,
            beta_LT=BETA_LT,
        )
    diagram = member.factors_m
    if diagram is not None:
        result.update(
            C_1=diagram.C_1, C_2=diagram.C_2, k_c=diagram.k_c, C_my=diagram.C_my,
            C_mz=diagram.C_mz, C_mLT=diagram.C_mLT,
        )  # fmt: skip
    result.update(
        gamma_M0=factors.gamma_M0,
        gamma_M1=factors.gamma_M1,
        gamma_M2=factors.gamma_M2,
        k_cr_y=member.k[0],
        k_cr_z=member.k[1],
        alpha_y=member.curves["y"].alpha,
        alpha_z=member.curves["z"].alpha,
    )
    if member.kind == "RHS":
        result["k_R"] = member.corner_ratio
    return result


def _hollow_forming(section: Section) -> str:
    """Hot-finished for an EN 10210 catalog section; otherwise cold-formed (buckling curve
    c, the conservative choice, EN 1993-1-1 Table 6.2) unless the job says otherwise."""
    from calcsheet.sections.catalog import find_entry

    try:
        standard = find_entry(section.name).family.standard
    except InputError:  # a section drawn from dimensions
        return "cold-formed"
    return "hot-finished" if standard.startswith("EN 10210") else "cold-formed"


# --- validation ------------------------------------------------------------------------------


def member_data(
    section: Section,
    *,
    material: Steel | str | Mapping[str, object] = "S355",
    length: pint.Quantity | str,
    k_eff: float | tuple[float, float] = 2.0,
    gamma: PartialFactors | Mapping[str, float] | None = None,
    fabrication: str | None = None,
    net_area: pint.Quantity | str | None = None,
    interaction: str = "plastic",
    ltb_method: str | None = None,
    load_height: str | pint.Quantity = "shear centre",
    support_case: str = "cantilever",
    moment_diagram: str = "uniform",
    end_moment_ratio: float = 1.0,
    interaction_method: str = "B",
) -> MemberData:
    """Read and check everything but the demands (arguments as :func:`write_en1993_checks`)."""
    geometry = _geometry(section, fabrication)
    chosen_steel = as_steel(material)
    factors = as_partial_factors(gamma)
    if interaction not in ("plastic", "linear"):
        raise InputError("interaction", interaction, "'plastic' or 'linear'")
    _check_thickness(chosen_steel, geometry)
    k = _k_factors(k_eff)
    member_length = parse_quantity(length, field="length", dimension="length")
    if not member_length.m > 0:
        raise InputError("length", f"{member_length:~P}", "a positive member length")
    area = None
    if net_area is not None:
        area = parse_quantity(net_area, field="net_area", dimension="area")
        if not area.m > 0:
            raise InputError("net_area", f"{area:~P}", "a positive net area")
    props, sources = section.properties, section.sources
    values: dict[str, tuple[pint.Quantity, str, str]] = {}
    for name, key, description in (
        ("A", "A", "Area"),
        ("W_pl_y", "Zx", "Plastic modulus about y-y (calcsheet {Z_x})"),
        ("W_el_y", "Sx", "Elastic modulus about y-y, smaller fibre (calcsheet {S_x})"),
        ("W_pl_z", "Zy", "Plastic modulus about z-z (calcsheet {Z_y})"),
        ("W_el_z", "Sy", "Elastic modulus about z-z, smaller fibre (calcsheet {S_y})"),
        ("i_y", "rx", "Radius of gyration about y-y (calcsheet {r_x})"),
        ("i_z", "ry", "Radius of gyration about z-z (calcsheet {r_y})"),
    ):
        values[name] = (props[key], description, sources.get(key, ""))
    labels = {
        "h": "Depth",
        "b": "Width",
        "t_w": "Web thickness",
        "t_f": "Flange thickness",
        "r": "Root radius",
        "t": "Wall thickness (design)",
        "d": "Outside diameter",
    }
    for name, value in geometry.dims.items():
        reference = geometry.reference if name == "r" else "section dimensions"
        values[name] = (value, labels[name], reference)
    curves = {axis: _curve(geometry, chosen_steel, axis) for axis in ("y", "z")}
    if interaction_method not in ("A", "B"):
        raise InputError(
            "interaction_method", interaction_method,
            "'B' (EN 1993-1-1 Annex B, the default) or 'A' (Annex A, Method 1)",
        )  # fmt: skip
    diagram = lat.moment_diagram_factors(support_case, moment_diagram, float(end_moment_ratio))
    lateral = _lateral(geometry, ltb_method, load_height, support_case)
    if (
        lateral is not None
        and support_case == "simply supported"
        and moment_diagram in ("uniform", "end moments")
        and lateral.z_g.m != 0
    ):
        # C2·z_g is the effect of transverse loads; end moments have none, so a load height
        # would silently drop out (and a uniform moment is not the safe side of a load on
        # the top flange: a uniform load there gives a lower M_cr).
        raise InputError(
            "load_height", load_height,
            "'shear centre' with end moments only, or the moment diagram of the transverse "
            "load ('uniform load' or 'central point load')",
            f"moment_diagram is {moment_diagram!r}, which has no transverse load",
        )  # fmt: skip
    if lateral is not None or interaction_method == "A":
        torsion = (
            ("I_z", "Iy", "Second moment of area about z-z (calcsheet {I_y})"),
            ("I_t", "J", "Torsion constant"),
            ("I_w", "Cw", "Warping constant"),
        )
        if interaction_method == "A":
            # Named I_yy: a member sheet's own I_y is calcsheet's minor axis.
            torsion = (
                ("I_yy", "Ix", "Second moment of area about y-y (calcsheet {I_x})"),
                *torsion,
            )
        for name, key, description in torsion:
            if key not in props or not math.isfinite(float(props[key].m)):
                raise InputError(
                    "section", section.name, f"a section with its {description.lower()}",
                    "needed for the elastic critical moment (EN 1993-1-1 6.3.2.2)",
                )  # fmt: skip
            values[name] = (props[key], description, sources.get(key, ""))
    return MemberData(
        section.name,
        geometry.kind,
        geometry.fabrication,
        values,
        curves,
        chosen_steel,
        factors,
        member_length,
        k,
        area,
        interaction,
        lateral,
        diagram,
        support_case,
        interaction_method,
        _diagram_text(support_case, moment_diagram, float(end_moment_ratio)),
        moment_diagram,
        float(end_moment_ratio),
        *_corner_ratio(geometry),
    )


def _corner_ratio(geometry: _Geometry) -> tuple[float, str]:
    """(r_o + r_i)/(2t) of a rectangular hollow section's corners and its source; (0, "")
    for other sections. Hot-finished: EN 10210-2 Annex B; cold-formed: EN 10219-2 Annex B
    (r_o by the wall thickness)."""
    if geometry.kind != "RHS":
        return 0.0, ""
    wall = float(geometry.dims["t"].to("mm").m)
    outer, inner = corner_radii(wall, geometry.fabrication)
    if geometry.fabrication == "hot-finished":
        source = "EN 10210-2:2006 Annex B: {r_o} = 1.5{t}, {r_i} = {t}"
    else:
        source = (
            f"EN 10219-2:2006 Annex B: {{r_o}} = {outer / wall:.3g}{{t}}, {{r_i}} = {{r_o}} − {{t}}"
        )
    return (outer + inner) / (2 * wall), source


def _diagram_text(support_case: str, diagram: str, psi: float) -> str:
    if support_case == "cantilever":
        return "not used (effective length of the cantilever)"
    return f"end moments, ψ = {psi:.3g}" if diagram == "end moments" else diagram


def _lateral(
    geometry: _Geometry,
    method: str | None,
    load_height: str | pint.Quantity,
    support_case: str,
) -> LateralData | None:
    """How 6.3.2 applies to the member; None for a section not susceptible to it."""
    dims = geometry.dims
    if geometry.kind == "CHS" or (
        geometry.kind == "RHS" and math.isclose(dims["h"].to("mm").m, dims["b"].to("mm").m)
    ):
        return None
    depth = dims["h"]
    z_g, source = lat.load_height(load_height, depth)
    if geometry.kind == "I":
        chosen = method or ("6.3.2.3" if geometry.fabrication == "rolled" else "6.3.2.2")
        curve = lat.ltb_curve(chosen, geometry.fabrication, depth, dims["b"])
    else:
        if method not in (None, "6.3.2.2"):
            raise InputError(
                "ltb_method", method, "'6.3.2.2' for a hollow section (6.3.2.3 is for I-sections)"
            )
        chosen = "6.3.2.2"
        alpha = lat.LTB_IMPERFECTION_FACTORS["d"]
        curve = CurveChoice("d", alpha, "other cross-section: curve d (EN 1993-1-1 Table 6.4)")
    if support_case == "cantilever":
        destabilizing = float(z_g.to("mm").m) > 0
        k_LT = lat.cantilever_length_factor(destabilizing)
        loading = "destabilizing" if destabilizing else "normal"
        k_source = f"{lat.CANTILEVER_SOURCE}: {loading} loading"
    else:
        k_LT, k_source = 1.0, f"{lat.SN003}: fork supports, {{k}} = {{k_w}} = 1"
    return LateralData(chosen, curve, z_g, source, k_LT, k_source)


def _curve(geometry: _Geometry, steel: Steel, axis: str) -> CurveChoice:
    if geometry.kind == "I":
        dims = geometry.dims
        return buck.buckling_curve(
            f"{geometry.fabrication} I", axis, grade=steel.grade, h=dims["h"], b=dims["b"],
            t_f=dims["t_f"],
        )  # fmt: skip
    return buck.buckling_curve("hollow", axis, grade=steel.grade, forming=geometry.fabrication)


def _demands(sheet: Sheet, demands: Mapping[str, sp.Symbol]) -> dict[str, sp.Symbol]:
    known = ", ".join([*DEMAND_DIMENSIONS, *DEMAND_ALIASES])
    result: dict[str, sp.Symbol] = {}
    for key, symbol in demands.items():
        name = demand_name(key)
        if not isinstance(symbol, sp.Symbol):
            raise InputError(f"demands {key}", symbol, "a symbol defined on the sheet")
        try:
            value = sheet.value(symbol)
        except KeyError:
            raise InputError(
                f"demands {key}", symbol.name, "a symbol defined on this sheet"
            ) from None
        dimension = DEMAND_DIMENSIONS[name]
        reference = {"force": ureg.newton, "moment": ureg.newton * ureg.meter}[dimension]
        if value.dimensionality != (1 * reference).dimensionality:
            raise InputError(f"demands {key}", f"{value:~P}", f"a {dimension}")
        if name in result:
            raise InputError("demands", key, f"{name} once (V_Ed is taken as V_z_Ed)")
        result[name] = symbol
    if not result:
        raise InputError("demands", {}, f"at least one design force among {known}")
    return result


def demand_name(key: str) -> str:
    """The demand's name in the procedure (``V_Ed`` is ``V_z_Ed``); unknown keys refused."""
    name = DEMAND_ALIASES.get(key, key)
    if name not in DEMAND_DIMENSIONS:
        known = ", ".join([*DEMAND_DIMENSIONS, *DEMAND_ALIASES])
        raise InputError("demands", key, f"keys among {known}")
    return name


def _k_factors(k_eff: float | tuple[float, float]) -> tuple[float, float]:
    values = tuple(k_eff) if isinstance(k_eff, Sequence) else (k_eff, k_eff)
    if len(values) != 2:
        raise InputError("k_eff", k_eff, "one factor or two (k_y, k_z)")
    checked = []
    for value in values:
        number = float(value)
        if not (math.isfinite(number) and number > 0):
            raise InputError("k_eff", k_eff, "positive effective-length factors")
        checked.append(number)
    return checked[0], checked[1]


def _geometry(section: Section, fabrication: str | None) -> _Geometry:
    family, dims = section.family, dict(section.dimensions)
    unit = section.length_unit
    if family in I_FAMILIES:
        for bottom, top in (("bf_bottom", "bf"), ("tf_bottom", "tf")):
            if bottom in dims and not math.isclose(
                dims[bottom].to(unit).m, dims[top].to(unit).m, rel_tol=1e-9
            ):
                raise InputError(
                    "section", f"{section.name} ({family})", SUPPORTED_TEXT, "unequal flanges"
                )
        chosen = fabrication or ("welded" if family == "I-shape" else "rolled")
        if chosen not in ("rolled", "welded"):
            raise InputError("fabrication", fabrication, "'rolled' or 'welded' for an I-section")
        k_design = section.tabulated.get("k")
        if "r" in dims:  # an EN 10365 section gives its root radius
            r = dims["r"].to(unit)
            reference = "root radius r of the EN 10365 section"
        elif k_design is not None:
            # The AISC tables give k_des = t_f + fillet; the fillet radius is the difference.
            r = (k_design - dims["tf"]).to(unit)
            reference = "{k_des} − {t_f} of the AISC tables"
        else:
            r = Quantity(0.0, unit)
            reference = "no fillet in the outline (section drawn from plates)"
        geometry = {"h": dims["d"], "b": dims["bf"], "t_w": dims["tw"], "t_f": dims["tf"], "r": r}
        return _Geometry("I", chosen, geometry, reference)
    if family in RHS_FAMILIES or family in CHS_FAMILIES:
        chosen = fabrication or _hollow_forming(section)
        if chosen not in buck.HOLLOW_FORMING:
            raise InputError(
                "fabrication", fabrication, "'hot-finished' or 'cold-formed' for a hollow section"
            )
        t = dims.get("tdes", dims.get("t"))
        if family in RHS_FAMILIES:
            geometry = {"h": dims.get("Ht", dims.get("H")), "b": dims["B"], "t": t}
            return _Geometry("RHS", chosen, geometry, "")
        return _Geometry("CHS", chosen, {"d": dims["OD"], "t": t}, "")
    raise InputError(
        "section",
        f"{section.name} ({family})",
        SUPPORTED_TEXT,
        "EN 1993-1-1 member checks are written for these families only",
    )


def _check_thickness(steel: Steel, geometry: _Geometry) -> None:
    if steel.source == "given":
        return
    thickest = max(
        geometry.dims[name].to("mm").m for name in ("t", "t_f", "t_w") if name in geometry.dims
    )
    if thickest > NOMINAL_THICKNESS_LIMIT_MM:
        raise InputError(
            "f_y",
            f"nominal {steel.grade}",
            "f_y given for the thickness (Table 3.1 lowers it beyond 40 mm)",
            f"the section is {thickest:.3g} mm thick",
        )


# --- the procedure ---------------------------------------------------------------------------


def en1993_member_procedure(w: Writer, member: MemberData, demands: Mapping[str, Value]) -> None:
    """The EN 1993-1-1 member checks, written once for both writers.

    ``demands`` maps the names of :data:`DEMAND_DIMENSIONS` to symbols of the sheet
    (sheet writer) or arrays in N and N·m (array writer); a name left out is not
    checked. The checks end up in ``w.checks`` under the keys of
    :data:`EN_CHECK_TITLES`.
    """
    _Procedure(w, member, {name: w.given(name, value) for name, value in demands.items()}).run()


def _formula(w: Writer, clause: Clause, *args: Value) -> Value:
    """A clause's right-hand side inside a larger expression (no step of its own)."""
    return clause(*args) if w.prints else clause.numeric(*args)


class _Procedure:
    """The procedure's state while it is written: the writer, the member, the demands."""

    def __init__(self, w: Writer, member: MemberData, demands: dict[str, Value]) -> None:
        self.w = w
        self.member = member
        self.demands = demands
        self.strength: Value = None

    def has(self, *names: str) -> bool:
        return all(name in self.demands for name in names)

    def run(self) -> None:
        self._inputs()
        self._classify()
        if self.has("N_Ed"):
            self._axial()
        self._shear()
        if self.has("T_Ed"):
            self._torsion()
        self._bending()
        if self.has("N_Ed") and (self.has("M_y_Ed") or self.has("M_z_Ed")):
            self._combined()
        if self.has("N_Ed"):
            self._buckling()
        if self.has("M_y_Ed"):
            self._lateral()
        if self.has("N_Ed") and (self.has("M_y_Ed") or self.has("M_z_Ed")):
            self._member_interaction()

    def _inputs(self) -> None:
        w, steel, factors, member = self.w, self.member.steel, self.member.factors, self.member
        w.heading("Material, partial factors and section", 2)
        w.input(
            "f_y", steel.f_y, f"Yield strength, {w.literal(steel.grade)}", dimension="stress",
            unit="MPa", reference=steel.source, fixed=MATERIAL_FIXED,
        )  # fmt: skip
        w.input(
            "E", steel.E, "Modulus of elasticity", dimension="stress", unit="MPa",
            reference="EN 1993-1-1 3.2.6(1)",
        )  # fmt: skip
        w.input(
            "f_235", F_235, "Reference strength of ε", dimension="stress",
            unit="MPa", reference="EN 1993-1-1 Table 5.2",
        )  # fmt: skip
        w.input(
            "gamma_M0", factors.gamma_M0, "Partial factor, resistance of cross-sections",
            dimension="dimensionless", reference=factors.reference,
        )  # fmt: skip
        if self.has("N_Ed") or (self.has("M_y_Ed") and self.member.ltb is not None):
            w.input(
                "gamma_M1", factors.gamma_M1, "Partial factor, resistance of members to "
                "instability", dimension="dimensionless", reference=factors.reference,
            )  # fmt: skip
        for name, (value, description, reference) in member.values.items():
            dimension = "length" if name in ("h", "b", "t_w", "t_f", "r", "t", "d") else None
            w.input(name, value, description, reference=reference, dimension=dimension)
        w.input("L", member.length, "Member length", dimension="length")
        for axis, factor in zip(("y", "z"), member.k, strict=True):
            fixed_free = " (2.0: fixed-free)" if factor == 2.0 else ""
            w.input(
                f"k_cr_{axis}", factor,
                f"Effective-length factor, buckling about {axis}-{axis}{fixed_free}",
                dimension="dimensionless",
            )  # fmt: skip

    # classification (Table 5.2)

    def _classify(self) -> None:
        w, kind = self.w, self.member.kind
        need_y, need_z, need_N = self.has("M_y_Ed"), self.has("M_z_Ed"), self.has("N_Ed")
        w.heading("Cross-section class (EN 1993-1-1 Table 5.2)", 2)
        w.clause(cls.epsilon, "epsilon", w["f_235"], w["f_y"])
        if not (need_y or need_z or need_N):
            w.text("No axial force or bending among the demands: the class is not needed.")
            return
        if need_N:
            w.step("N_c", -self.demands["N_Ed"], "Axial force, compression positive")
        classes: dict[str, list[tuple[str, Value]]] = {"y": [], "z": [], "N": []}
        if kind == "I":
            w.text(
                "Flange outstands are classified in uniform compression for every case (exact "
                "for {M_y}, on the safe side for {M_z}); the web under {N} with {M_y}, from the "
                "plastic (α) and elastic (ψ) stress distributions. The web is not stressed by "
                "{M_z}."
            )
            w.step(
                "c_f", (w["b"] - w["t_w"] - 2 * w["r"]) / 2, "Flange outstand width",
                reference="EN 1993-1-1 Table 5.2 (sheet 2)",
            )  # fmt: skip
            w.step(
                "c_w", w["h"] - 2 * w["t_f"] - 2 * w["r"], "Web depth between fillets",
                reference="EN 1993-1-1 Table 5.2 (sheet 1)",
            )  # fmt: skip
            flange = self._outstand("f", w["c_f"], w["t_f"])
            classes["z"].append(("flange", flange))
            if need_y:
                classes["y"] += [("flange", flange), ("web", self._web("w", "M_y_Ed"))]
            if need_N:
                classes["N"] += [("flange", flange), ("web", self._compressed("w"))]
        elif kind == "RHS":
            w.text(
                "c = h − 3t and b − 3t (Table 5.2: c may be taken so where the corner radius "
                "is not known; on the safe side). A wall that a moment compresses over its "
                "whole width is classified in compression; a wall that the moment bends in "
                "its plane is classified under N with that moment."
            )
            w.step("c_h", w["h"] - 3 * w["t"], "Flat width of the webs (depth)")
            w.step("c_b", w["b"] - 3 * w["t"], "Flat width of the flanges (width)")
            if need_y:
                classes["y"] += [
                    ("flanges", self._compressed("b")),
                    ("webs", self._web("h", "M_y_Ed")),
                ]
            if need_z:
                classes["z"] += [
                    ("webs", self._compressed("h")),
                    ("flanges", self._web("b", "M_z_Ed")),
                ]
            if need_N:
                classes["N"] += [
                    ("flanges", self._compressed("b")),
                    ("webs", self._compressed("h")),
                ]
        else:
            tube = self._tube()
            for key in classes:
                classes[key].append(("wall", tube))
        needed = {"y": need_y, "z": need_z, "N": need_N}
        what = {
            "y": "bending about y-y with N",
            "z": "bending about z-z with N",
            "N": "compression",
        }
        for key, candidates in classes.items():
            if not needed[key]:
                continue
            # One candidate: a copy step names the class where the checks use it.
            w.largest(
                f"class_{key}", candidates, f"Section class, {what[key]}",
                reference="EN 1993-1-1 5.5.2(6)" if len(candidates) > 1 else "",
            )  # fmt: skip
        if need_N and w.prints and float(w.value_of(w["class_N"]).m) > 3:
            # The scope test refused class 4 under compression: the member is in tension.
            w.text(
                "The section is class 4 in compression; a compressive {N_Ed} would need "
                "effective properties (EN 1993-1-5), which are not covered."
            )

    def _limits_to_class(self, tag: str, ratio: Value, limits) -> Value:
        w = self.w
        written = [
            w.clause(clause, f"ct_{tag}_{n}", *args)
            for n, (clause, args) in enumerate(limits, start=1)
        ]
        return w.clause(cls.class_from_limits, f"class_{tag}", ratio, *written)

    def _ratio(self, name: str, c: Value, t: Value, description: str) -> Value:
        if name not in self.w.symbols:
            self.w.step(name, c / t, description)
        return self.w[name]

    def _outstand(self, tag: str, c: Value, t: Value) -> Value:
        eps = self.w["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the flange outstand")
        limits = [
            (cls.outstand_class_1_limit, (eps,)),
            (cls.outstand_class_2_limit, (eps,)),
            (cls.outstand_class_3_limit, (eps,)),
        ]
        return self._limits_to_class(tag, ratio, limits)

    def _part(self, tag: str) -> tuple[Value, Value, Value]:
        w = self.w
        if self.member.kind == "I":
            return w["c_w"], w["t_w"], w["t_w"]
        c = w["c_h"] if tag.startswith("h") else w["c_b"]
        return c, w["t"], 2 * w["t"]

    def _compressed(self, tag: str) -> Value:
        key = f"class_{tag}N"
        if key in self.w.symbols:
            return self.w[key]
        c, t, _ = self._part(tag)
        eps = self.w["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the internal part")
        limits = [
            (cls.internal_compression_class_1_limit, (eps,)),
            (cls.internal_compression_class_2_limit, (eps,)),
            (cls.internal_compression_class_3_limit, (eps,)),
        ]
        return self._limits_to_class(f"{tag}N", ratio, limits)

    def _web(self, tag: str, moment: str) -> Value:
        w = self.w
        c, t, t_total = self._part(tag)
        eps = w["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the internal part")
        axis = moment[2]
        if self.has("N_Ed"):
            alpha = w.clause(cls.plastic_alpha, f"alpha_{tag}", w["N_c"], w["f_y"], c, t_total)
            W_el, depth = (w["W_el_y"], w["h"]) if axis == "y" else (w["W_el_z"], w["b"])
            psi = w.clause(
                cls.elastic_psi, f"psi_{tag}", w["N_c"], w["A"], self.demands[moment], W_el,
                depth, c,
            )  # fmt: skip
        else:
            alpha = w.step(f"alpha_{tag}", 0.5, "Pure bending: half the part in compression")
            psi = w.step(f"psi_{tag}", -1.0, "Pure bending: end stresses equal and opposite")
        limits = [
            (cls.internal_class_1_limit, (eps, alpha)),
            (cls.internal_class_2_limit, (eps, alpha)),
            (cls.internal_class_3_limit, (eps, psi)),
        ]
        return self._limits_to_class(tag, ratio, limits)

    def _tube(self) -> Value:
        w = self.w
        eps = w["epsilon"]
        ratio = w.step("dt", w["d"] / w["t"], "d/t of the tube")
        limits = [
            (cls.tube_class_1_limit, (eps,)),
            (cls.tube_class_2_limit, (eps,)),
            (cls.tube_class_3_limit, (eps,)),
        ]
        return self._limits_to_class("t", ratio, limits)

    # resistances

    def _axial(self) -> None:
        w, member = self.w, self.member
        w.heading("Axial force (EN 1993-1-1 6.2.3, 6.2.4)", 2)
        N_pl = w.clause(res.plastic_axial_resistance, "N_pl_Rd", w["A"], w["f_y"], w["gamma_M0"])
        N_Ed = self.demands["N_Ed"]
        w.check(
            "axial", EN_CHECK_TITLES["axial"], w.absolute(N_Ed), N_pl,
            reference="EN 1993-1-1 Eq. (6.5), (6.9)",
        )  # fmt: skip
        if member.net_area is None:
            w.text("No fastener holes given: the net section (Eq. 6.7) is not checked.")
            return
        w.input("A_net", member.net_area, "Net area at holes", dimension="area")
        w.input(
            "f_u", member.steel.f_u, "Ultimate strength", dimension="stress", unit="MPa",
            reference=member.steel.source,
        )  # fmt: skip
        w.input(
            "gamma_M2", member.factors.gamma_M2, "Partial factor, net section in tension",
            dimension="dimensionless", reference=member.factors.reference,
        )  # fmt: skip
        N_u = w.clause(res.net_section_resistance, "N_u_Rd", w["A_net"], w["f_u"], w["gamma_M2"])
        N_t = w.step("N_t_Ed", (w.absolute(N_Ed) + N_Ed) / 2, "Tension force (zero in compression)")
        w.check(
            "net_section", EN_CHECK_TITLES["net_section"], N_t, N_u,
            reference="EN 1993-1-1 Eq. (6.5), (6.7)",
        )  # fmt: skip

    def _shear(self) -> None:
        if not (self.has("V_z_Ed") or self.has("V_y_Ed")):
            return
        w, kind = self.w, self.member.kind
        w.heading("Shear (EN 1993-1-1 6.2.6)", 2)
        if kind in ("I", "RHS"):
            w.input(
                "eta", 1.0, "Factor η of the shear area (1.0 may be used conservatively)",
                dimension="dimensionless", reference="EN 1993-1-1 6.2.6(3) Note",
                fixed=LIMIT_FIXED,
            )  # fmt: skip
        for axis, key in (("z", "V_z_Ed"), ("y", "V_y_Ed")):
            if not self.has(key):
                continue
            area = self._shear_area(axis)
            if kind != "CHS":
                self._shear_buckling(axis)
            V_pl = w.clause(
                res.plastic_shear_resistance, f"V_pl_{axis}_Rd", area, w["f_y"], w["gamma_M0"]
            )
            parts = {"I": ("web", "flanges"), "RHS": ("webs", "flanges")}.get(kind)
            if parts and w.prints:
                w.text(f"Shear along {axis} is carried by the {parts[axis == 'y']}.")
            key_name = f"shear_{axis}"
            w.check(
                key_name, EN_CHECK_TITLES[key_name], w.absolute(self.demands[key]), V_pl,
                reference="EN 1993-1-1 Eq. (6.17), (6.18)",
            )  # fmt: skip

    # torsion (6.2.7) and shear with torsion (6.2.7(9))

    def _torsion(self) -> None:
        """T_Ed/T_Rd (Eq. 6.23) with St Venant torsion, and V_Ed/V_pl,T,Rd (Eq. 6.25)."""
        w, kind = self.w, self.member.kind
        w.heading("Torsion (EN 1993-1-1 6.2.7)", 2)
        T_Ed = self.demands["T_Ed"]
        w.text(CLOSED_TEXT if kind in ("RHS", "CHS") else WARPING_TEXT)
        tau_Rd = w.clause(tor.shear_yield_strength, "tau_Rd", w["f_y"], w["gamma_M0"], unit="MPa")
        if kind == "I":
            t_T = w.step("t_T", w.larger(w["t_f"], w["t_w"]), "Thickest element (flange or web)")
            T_Rd = w.clause(tor.open_section_torsion_resistance, "T_Rd", w["I_t"], t_T, tau_Rd)
        else:
            if kind == "RHS":
                self._torsion_walls()
                w.input(
                    "k_R", self.member.corner_ratio,
                    "Mid-line corner radius over the wall thickness, ({r_o} + {r_i})/(2t)",
                    dimension="dimensionless", reference=self.member.corner_source,
                )  # fmt: skip
                R_m = w.step("R_m", w["k_R"] * w["t"], "Mid-line corner radius")
                A_m = w.clause(tor.enclosed_area_rhs, "A_m_T", w["b"], w["h"], w["t"], R_m)
            else:
                A_m = w.clause(tor.enclosed_area_chs, "A_m_T", w["d"], w["t"])
                if w.prints:
                    w.text(
                        "Shear buckling of the tube wall under torsion (EN 1993-1-1 6.2.7(8)) "
                        "is not covered by these checks."
                    )
            T_Rd = w.clause(tor.closed_section_torsion_resistance, "T_Rd", A_m, w["t"], tau_Rd)
        w.text(NO_TORQUE_TEXT)
        moments = [w.absolute(self.demands[key]) for key in ("M_y_Ed", "M_z_Ed") if self.has(key)]
        T_abs = w.absolute(T_Ed)
        if moments:
            round_off = tor.TORQUE_ROUND_OFF * functools.reduce(operator.add, moments)
            present = T_abs > round_off
        else:
            # Over T_Rd, so that the condition has no unit (a bare 0 has none).
            present = T_abs / T_Rd > 0
        T_t = w.branch(
            "T_t_Ed",
            [(T_abs, present), (0 * T_abs, True)],
            "St Venant torque, the magnitude of {T_Ed} (zero within round-off)",
            reference="EN 1993-1-1 6.2.7(2)",
        )
        # The St Venant shear stress in the part that carries each shear force, by axis.
        part_stress: dict[str, Value] = {}
        if kind == "I":
            w.clause(tor.open_section_torsion_stress, "tau_t_Ed", T_t, t_T, w["I_t"], unit="MPa")
            for axis, thickness, part in (("z", "t_w", "web"), ("y", "t_f", "flanges")):
                if self.has(f"V_{axis}_Ed"):
                    if w.prints:
                        carry = "carries" if part == "web" else "carry"
                        w.text(f"{{tau_t_Ed}} in the {part}, which {carry} {{V_{axis}_Ed}}:")
                    part_stress[axis] = w.clause(
                        tor.open_section_torsion_stress, f"tau_t_{axis}_Ed", T_t, w[thickness],
                        w["I_t"], unit="MPa",
                    )  # fmt: skip
        else:
            tau = w.clause(
                tor.closed_section_torsion_stress, "tau_t_Ed", T_t, A_m, w["t"], unit="MPa"
            )
            part_stress = {axis: tau for axis in ("z", "y") if self.has(f"V_{axis}_Ed")}
        w.check(
            "torsion", EN_CHECK_TITLES["torsion"], T_t, T_Rd,
            reference="EN 1993-1-1 Eq. (6.23); 6.2.7(5), Eq. (6.1)",
        )  # fmt: skip
        if not part_stress:
            return
        w.heading("Shear force and torsion (EN 1993-1-1 6.2.7(9))", 2)
        reduced = tor.torsion_reduced_shear_i if kind == "I" else tor.torsion_reduced_shear_hollow
        limit = tor.I_SECTION_TORSION_FACTOR if kind == "I" else 1
        if w.prints:
            w.text(
                "Where {tau_t_Ed} reaches "
                + ("1.25·τ_Rd" if kind == "I" else "τ_Rd")
                + " no shear resistance is left: under a shear force the utilization shown is "
                "then {tau_t_Ed} over that stress (1 or more; without one it is 0, and the torsion "
                "check above has failed already). {V_pl_T_Rd} also takes the place of {V_pl_Rd} "
                "in the reduction for shear of 6.2.8 (6.2.8(4))."
            )
        for axis, tau_part in part_stress.items():
            V_pl_T = w.clause(reduced, f"V_pl_T_{axis}_Rd", tau_part, tau_Rd, w[f"V_pl_{axis}_Rd"])
            V_abs = w.absolute(self.demands[f"V_{axis}_Ed"])
            u = w.branch(
                f"u_VT_{axis}",
                [
                    (V_abs / V_pl_T, tau_part < limit * tau_Rd),
                    (tau_part / (limit * tau_Rd), V_abs / w[f"V_pl_{axis}_Rd"] > 0),
                    (sp.Integer(0), True),
                ],
                f"Utilization in shear along {axis} with torsion ({{tau_t_Ed}} over its limit "
                "where {V_pl_T_Rd} = 0 under a shear force)",
                reference=f"{reduced.reference.split(', ')[0]}, Eq. (6.25)",
            )
            key = f"shear_torsion_{axis}"
            w.check(
                key, EN_CHECK_TITLES[key], u, sp.Integer(1),
                reference=f"EN 1993-1-1 Eq. (6.25), {reduced.reference.split('Eq. ')[-1]}",
            )  # fmt: skip

    def _torsion_walls(self) -> None:
        """6.2.7(8) as a statement: the walls of an RHS under torsion are stocky enough
        for the shear yield strength (else refused, as 6.2.6(6) refuses them in shear)."""
        w = self.w
        if "eta" not in w.symbols:
            w.input(
                "eta", 1.0, "Factor η of the shear area (1.0 may be used conservatively)",
                dimension="dimensionless", reference="EN 1993-1-1 6.2.6(3) Note",
                fixed=LIMIT_FIXED,
            )  # fmt: skip
        if "hw_tw_max" not in w.symbols:
            w.clause(res.shear_buckling_limit, "hw_tw_max", w["epsilon"], w["eta"])
        ratio = w.step(
            "hw_tw_T", (w.larger(w["h"], w["b"]) - 2 * w["t"]) / w["t"],
            "Slenderness of the wider walls in shear from torsion",
        )  # fmt: skip
        if w.prints:
            shown = float(w.value_of(ratio).m)
            limit = float(w.value_of(w["hw_tw_max"]).m)
            w.text(
                f"{{h_w}}/t = {shown:.3g} ≤ 72ε/η = {limit:.3g}: the walls need no shear buckling "
                "verification (EN 1993-1-1 6.2.6(6), 6.2.7(8)); {tau_Rd} applies."
            )

    def _shear_area(self, axis: str) -> Value:
        w, member = self.w, self.member
        if member.kind == "CHS":
            if "A_v" not in w.symbols:
                w.clause(res.shear_area_chs, "A_v", w["A"])
            return w["A_v"]
        name = f"A_v_{axis}"
        if member.kind == "RHS":
            h, b = (w["h"], w["b"]) if axis == "z" else (w["b"], w["h"])
            return w.clause(res.shear_area_rhs, name, w["A"], h, b)
        self._web_height()
        if axis == "y":
            return w.clause(res.shear_area_i_flanges, name, w["A"], w["h_w"], w["t_w"])
        if member.fabrication == "rolled":
            return w.clause(
                res.shear_area_rolled_i, name, w["A"], w["b"], w["t_f"], w["t_w"], w["r"],
                w["h_w"], w["eta"],
            )  # fmt: skip
        return w.clause(res.shear_area_welded_i, name, w["h_w"], w["t_w"], w["eta"])

    def _web_height(self) -> None:
        w = self.w
        if "h_w" not in w.symbols:
            w.step("h_w", w["h"] - 2 * w["t_f"], "Web depth between flanges")

    def _shear_buckling(self, axis: str) -> None:
        """6.2.6(6) as a statement: the webs are stocky enough for V_pl,Rd (else refused)."""
        w, kind = self.w, self.member.kind
        if kind == "I":
            if axis == "y":
                return  # flanges in shear: no web panel to buckle
            self._web_height()
            depth, thickness, what = w["h_w"], w["t_w"], "web"
        else:
            name = "h_w" if axis == "z" else "b_w"
            if name not in w.symbols:
                side = w["h"] if axis == "z" else w["b"]
                w.step(name, side - 2 * w["t"], "Wall depth between the other walls")
            depth, thickness, what = w[name], w["t"], "walls"
        if "hw_tw_max" not in w.symbols:
            w.clause(res.shear_buckling_limit, "hw_tw_max", w["epsilon"], w["eta"])
        ratio = w.step(f"hw_tw_{axis}", depth / thickness, f"Slenderness of the {what} in shear")
        if w.prints:
            shown = float(w.value_of(ratio).m)
            limit = float(w.value_of(w["hw_tw_max"]).m)
            w.text(
                f"{{h_w}}/{{t_w}} = {shown:.3g} ≤ 72ε/η = {limit:.3g}: the {what} "
                f"{'needs' if what == 'web' else 'need'} no shear buckling verification, "
                "{V_pl_Rd} applies (EN 1993-1-1 6.2.6(6))."
            )

    def _bending(self) -> None:
        if not (self.has("M_y_Ed") or self.has("M_z_Ed")):
            return
        w = self.w
        w.heading("Bending (EN 1993-1-1 6.2.5, 6.2.8)", 2)
        strength = w["f_y"]
        shears = [(key[2], key) for key in ("V_z_Ed", "V_y_Ed") if self.has(key)]
        if shears:
            for axis, key in shears:
                # 6.2.8(4): with torsion, ρ from V_pl,T,Rd (6.2.7(9)).
                resistance = (
                    f"V_pl_T_{axis}_Rd" if f"V_pl_T_{axis}_Rd" in w.symbols else (f"V_pl_{axis}_Rd")
                )
                w.clause(res.shear_reduction, f"rho_{axis}", self.demands[key], w[resistance])
            w.largest(
                "rho", [(f"V_{axis}", w[f"rho_{axis}"]) for axis, _ in shears],
                "Larger reduction factor",
            )  # fmt: skip
            strength = w.clause(res.shear_reduced_strength, "f_y_V", w["rho"], w["f_y"], unit="MPa")
        self.strength = strength
        for axis in ("y", "z"):
            key = f"M_{axis}_Ed"
            if not self.has(key):
                continue
            M_c = w.clause(
                res.bending_resistance, f"M_c_{axis}_Rd", w[f"W_pl_{axis}"], w[f"W_el_{axis}"],
                strength, w["gamma_M0"], w[f"class_{axis}"],
            )  # fmt: skip
            check = f"bending_{axis}"
            w.check(
                check, EN_CHECK_TITLES[check], w.absolute(self.demands[key]), M_c,
                reference="EN 1993-1-1 Eq. (6.12)",
            )  # fmt: skip

    def _combined(self) -> None:
        w, member = self.w, self.member
        w.heading("Bending and axial force (EN 1993-1-1 6.2.9)", 2)
        N_Ed = self.demands["N_Ed"]
        axes = [axis for axis in ("y", "z") if self.has(f"M_{axis}_Ed")]
        # The clauses of 6.2.9 take magnitudes themselves; the sum of Eq. (6.2) here does not.
        moments = {axis: self.demands[f"M_{axis}_Ed"] for axis in axes}
        if not self.has("V_z_Ed") and not self.has("V_y_Ed"):
            N_Rd = w["N_pl_Rd"]
        else:
            N_Rd = w.clause(
                res.plastic_axial_resistance, "N_pl_V_Rd", w["A"], self.strength, w["gamma_M0"]
            )
            w.text("With shear: {N_pl_Rd} with the reduced yield strength as well (safe side).")
        if member.kind == "CHS" or member.interaction == "linear":
            expr = w.absolute(N_Ed) / N_Rd
            for axis in axes:
                expr = expr + w.absolute(moments[axis]) / w[f"M_c_{axis}_Rd"]
            u = w.step(
                "u_NM", expr, "Linear interaction (valid for every class, conservative)",
                reference="EN 1993-1-1 Eq. (6.2)",
            )  # fmt: skip
            w.check(
                "combined", EN_CHECK_TITLES["combined"], u, sp.Integer(1),
                reference="EN 1993-1-1 Eq. (6.2)",
            )  # fmt: skip
            return
        n = w.clause(res.axial_ratio, "n", N_Ed, N_Rd)
        if len(axes) == 2:
            governing = w.largest(
                "class_NM", [("y-y", w["class_y"]), ("z-z", w["class_z"])],
                "Class under biaxial bending with N (the worse of the two)",
            )  # fmt: skip
        else:
            governing = w[f"class_{axes[0]}"]
        w.text(
            "Class 1 and 2: reduced plastic moments of 6.2.9.1. Class 3: the largest "
            "longitudinal stress {sigma_x_Ed} = {N}/{A} + {M_y}/{W_el_y} + {M_z}/{W_el_z} against "
            "{f_y}/{gamma_M0} "
            "(6.2.9.2, Eq. 6.42); with shear, {f_y} reduced as above."
        )
        if len(axes) == 2:
            sigma = w.clause(
                res.elastic_longitudinal_stress, "sigma_x_Ed", N_Ed, w["A"], moments["y"],
                w["W_el_y"], moments["z"], w["W_el_z"], unit="MPa",
            )  # fmt: skip
        else:
            sigma = w.clause(
                res.elastic_longitudinal_stress_uniaxial, "sigma_x_Ed", N_Ed, w["A"],
                moments[axes[0]], w[f"W_el_{axes[0]}"], unit="MPa",
            )  # fmt: skip
        stress_ratio = sigma / (self.strength / w["gamma_M0"])
        if member.kind == "I":
            a = w.clause(res.web_ratio_i, "a", w["A"], w["b"], w["t_f"])
            ratios = {"y": a, "z": a}
            plastic = {"y": res.reduced_moment_y_i, "z": res.reduced_moment_z_i}
        else:
            a_w = w.clause(res.web_ratio_rhs, "a_w", w["A"], w["b"], w["t"])
            a_f = w.clause(res.flange_ratio_rhs, "a_f", w["A"], w["h"], w["t"])
            ratios = {"y": a_w, "z": a_f}
            plastic = {"y": res.reduced_moment_rhs, "z": res.reduced_moment_rhs}
        reduced = {
            axis: w.clause(plastic[axis], f"M_N_{axis}_Rd", w[f"M_c_{axis}_Rd"], n, ratios[axis])
            for axis in axes
        }
        if len(axes) == 2:
            if member.kind == "I":
                alpha = w.clause(res.biaxial_alpha_i, "alpha_NM", governing)
                beta = w.clause(res.biaxial_beta_i, "beta_NM", n, governing)
            else:
                alpha = beta = w.clause(res.biaxial_exponent_rhs, "alpha_NM", n, governing)
            criterion = _formula(
                w, res.biaxial_criterion, moments["y"], reduced["y"], moments["z"], reduced["z"],
                alpha, beta,
            )  # fmt: skip
            reference = res.biaxial_criterion.reference
        else:
            axis = axes[0]
            criterion = w.absolute(moments[axis]) / reduced[axis]
            reference = "EN 1993-1-1 Eq. (6.31)"
        # At n ≥ 1 the axial force alone exhausts the section and no plastic moment
        # resistance is left; the utilization shown is then n itself.
        u = w.branch(
            "u_NM",
            [(stress_ratio, governing > 2), (criterion, n < 1), (n, True)],
            "Utilization under {N} and {M}: {sigma_x_Ed}/({f_y}/{gamma_M0}) for class 3; the "
            "plastic criterion for class 1 and 2 ({n} itself when {n} ≥ 1)",
            reference=f"{reference}, (6.42)",
        )
        w.check(
            "combined", EN_CHECK_TITLES["combined"], u, sp.Integer(1),
            reference=f"{reference}, (6.42)",
        )  # fmt: skip

    def _buckling(self) -> None:
        w, member = self.w, self.member
        w.heading("Flexural buckling (EN 1993-1-1 6.3.1)", 2)
        N_Ed = self.demands["N_Ed"]
        N_c = w.step("N_c_Ed", (w.absolute(N_Ed) - N_Ed) / 2, "Compression force (zero in tension)")
        w.clause(buck.slenderness_limit, "lambda_1", w["E"], w["f_y"])
        for axis in ("y", "z"):
            choice = member.curves[axis]
            if w.prints:
                w.text(f"Buckling about {axis}-{axis}: {choice.reason}.")
            L_cr = w.step(
                f"L_cr_{axis}", w[f"k_cr_{axis}"] * w["L"], f"Buckling length about {axis}-{axis}"
            )
            lam = w.clause(
                buck.relative_slenderness_from_length, f"lambda_rel_{axis}", L_cr, w[f"i_{axis}"],
                w["lambda_1"],
            )  # fmt: skip
            alpha = w.input(
                f"alpha_{axis}", choice.alpha, f"Imperfection factor, curve {choice.curve}",
                dimension="dimensionless", reference="EN 1993-1-1 Table 6.1", fixed=CURVE_FIXED,
            )  # fmt: skip
            phi = w.clause(buck.buckling_phi, f"Phi_{axis}", alpha, lam)
            chi = w.clause(buck.reduction_factor, f"chi_{axis}", phi, lam)
            # Eq. (6.47) holds for class 1-3; a class 4 section is accepted only while the
            # member is in tension (then nothing buckles). Otherwise no branch applies: the
            # sheet stops with an error naming this step, the arrays give NaN (out of scope).
            applies = w.any_of(w["class_N"] <= 3, N_c / w["N_pl_Rd"] <= 0)
            resistance = _formula(w, buck.buckling_resistance, chi, w["A"], w["f_y"], w["gamma_M1"])
            N_b = w.branch(
                f"N_b_{axis}_Rd",
                [(resistance, applies)],
                buck.buckling_resistance.description,
                reference=buck.buckling_resistance.reference,
            )
            key = f"buckling_{axis}"
            w.check(key, EN_CHECK_TITLES[key], N_c, N_b, reference="EN 1993-1-1 Eq. (6.46), (6.47)")

    # lateral-torsional buckling (6.3.2)

    def _lateral(self) -> None:
        w, member = self.w, self.member
        w.heading("Lateral-torsional buckling (EN 1993-1-1 6.3.2)", 2)
        lateral, diagram = member.ltb, member.factors_m
        if lateral is None or diagram is None:
            shape = "circular" if member.kind == "CHS" else "square"
            w.text(
                f"A {shape} hollow section is not susceptible to lateral-torsional buckling "
                "(EN 1993-1-1 6.3.2.1(2)): no verification; {chi_LT} = 1.0 in 6.3.3."
            )
            return
        support = member.support_case
        if w.prints:
            w.text(
                f"Member {support}"
                + (" (fixed-free)" if support == "cantilever" else " (fork supports)")
                + f", moment diagram: {member.diagram_text}. {{M_y_Ed}} of the section checked is "
                "taken as the largest moment between the supports (check the section where {M_y} "
                "is largest). Curve: "
                f"{lateral.curve.reason}."
            )
        w.input(
            "nu", POISSON_RATIO, "Poisson's ratio in the elastic range",
            dimension="dimensionless", reference="EN 1993-1-1 3.2.6(1)",
        )  # fmt: skip
        G = w.clause(lat.shear_modulus, "G", w["E"], w["nu"], unit="MPa")
        w.input(
            "C_1", diagram.C_1, "Factor C1 of the moment diagram", dimension="dimensionless",
            reference=diagram.C_source, fixed=LTB_FIXED,
        )  # fmt: skip
        w.input(
            "C_2", diagram.C_2, "Factor C2 of the load height", dimension="dimensionless",
            reference=diagram.C_source, fixed=LTB_FIXED,
        )  # fmt: skip
        height = {
            "given": "Height of the load above the shear centre",
            "shear centre": "Load at the shear centre",
            "top flange": "Load on the top flange: h/2 above the shear centre",
            "bottom flange": "Load on the bottom flange: h/2 below the shear centre",
        }[lateral.z_g_source]
        w.input("z_g", lateral.z_g, height, dimension="length", fixed=LTB_FIXED)
        w.input(
            "k_LT", lateral.k_LT, "Effective length factor for lateral-torsional buckling",
            dimension="dimensionless", reference=lateral.k_LT_source, fixed=LTB_FIXED,
        )  # fmt: skip
        if support == "cantilever" and w.prints:
            w.text(
                "Cantilever: {M_cr} by the uniform-moment formula (C1 = 1, C2 = 0) over the "
                f"effective length of {lat.CANTILEVER_SOURCE}; the load height chose the "
                "length (destabilizing above the shear centre)."
            )
        L_LT = w.step("L_LT", w["k_LT"] * w["L"], "Length for lateral-torsional buckling")
        M_cr = w.clause(
            lat.critical_moment, "M_cr", w["C_1"], w["C_2"], w["z_g"], w["E"], w["I_z"],
            w["I_w"], G, w["I_t"], L_LT,
        )  # fmt: skip
        W_y = w.clause(lat.ltb_modulus, "W_y", w["W_pl_y"], w["W_el_y"], w["class_y"])
        lam = w.clause(lat.ltb_slenderness, "lambda_LT", W_y, w["f_y"], M_cr)
        alpha = w.input(
            "alpha_LT", lateral.curve.alpha, f"Imperfection factor, curve {lateral.curve.curve}",
            dimension="dimensionless", reference="EN 1993-1-1 Table 6.3", fixed=LTB_FIXED,
        )  # fmt: skip
        if lateral.method == "6.3.2.2":
            phi = w.clause(lat.ltb_phi_general, "Phi_LT", alpha, lam)
            chi = w.clause(lat.ltb_reduction_general, "chi_LT", phi, lam)
        else:
            w.input(
                "lambda_LT_0", LAMBDA_LT_0, "Plateau length {lambda_LT_0}",
                dimension="dimensionless",
                reference="EN 1993-1-1 6.3.2.3(1) (recommended value)",
            )  # fmt: skip
            w.input(
                "beta_LT", BETA_LT, "Factor β", dimension="dimensionless",
                reference="EN 1993-1-1 6.3.2.3(1) (recommended value)",
            )  # fmt: skip
            phi = w.clause(lat.ltb_phi_rolled, "Phi_LT", alpha, lam, w["lambda_LT_0"], w["beta_LT"])
            plain = w.clause(lat.ltb_reduction_rolled, "chi_LT_0", phi, lam, w["beta_LT"])
            w.input(
                "k_c", diagram.k_c, "Correction factor for the moment distribution",
                dimension="dimensionless", reference=diagram.k_c_source, fixed=LTB_FIXED,
            )  # fmt: skip
            f = w.clause(lat.ltb_modification_factor, "f_LT", w["k_c"], lam)
            chi = w.clause(lat.ltb_reduction_modified, "chi_LT", plain, f, lam)
        M_b = w.clause(lat.ltb_resistance, "M_b_Rd", chi, W_y, w["f_y"], w["gamma_M1"])
        w.check(
            "ltb", EN_CHECK_TITLES["ltb"], w.absolute(self.demands["M_y_Ed"]), M_b,
            reference="EN 1993-1-1 Eq. (6.54), (6.55)",
        )  # fmt: skip

    # members in bending and axial compression (6.3.3, Annex B)

    def _member_interaction(self) -> None:
        w, member = self.w, self.member
        annex = "Annex A" if member.interaction_method == "A" else "Annex B"
        w.heading(f"Bending and axial compression (EN 1993-1-1 6.3.3, {annex})", 2)
        diagram = member.factors_m
        assert diagram is not None
        N_Ed = self.demands["N_Ed"]
        axes = [axis for axis in ("y", "z") if self.has(f"M_{axis}_Ed")]
        if w.prints and float(w.value_of(N_Ed).to_base_units().m) > 0:
            w.text(
                "{N_Ed} is tension: 6.3.3 (members in bending and axial compression) does not "
                "apply and Eq. (6.61), (6.62) are taken as 0; the cross-section under N and M "
                "is verified by 6.2.9 (6.2.1(7)) above."
            )
        if len(axes) == 2:
            section_class = w.largest(
                "class_MN", [("y-y", w["class_y"]), ("z-z", w["class_z"])],
                "Class under N with bending about both axes (the worse of the two)",
            )  # fmt: skip
        else:
            section_class = w[f"class_{axes[0]}"]
        n = {}
        for axis in ("y", "z"):
            n[axis] = w.clause(
                inter.buckling_axial_ratio, f"n_{axis}", w["N_c_Ed"], w[f"chi_{axis}"], w["A"],
                w["f_y"], w["gamma_M1"],
            )  # fmt: skip
        rk = {}
        for axis in axes:
            rk[axis] = w.clause(
                inter.characteristic_moment, f"M_{axis}_Rk", w[f"W_pl_{axis}"],
                w[f"W_el_{axis}"], w["f_y"], section_class,
            )  # fmt: skip
        annex_a_used = member.interaction_method == "A"
        if annex_a_used:
            k = self._annex_a_factors(axes, section_class)
        else:
            k = self._interaction_factors(axes, n, section_class)
        moments = {axis: self.demands[f"M_{axis}_Ed"] for axis in axes}
        gamma = w["gamma_M1"]
        # Eq. (6.61) with k_yy, k_yz and n_y; Eq. (6.62) with k_zy, k_zz and n_z.
        for axis, key, major, minor in (
            ("y", "interaction_y", "yy", "yz"),
            ("z", "interaction_z", "zy", "zz"),
        ):
            if axes == ["y", "z"]:
                clause = inter.interaction_661 if axis == "y" else inter.interaction_662
                args = (
                    n[axis], k[major], moments["y"], w["chi_LT"], rk["y"], k[minor],
                    moments["z"], rk["z"], gamma,
                )  # fmt: skip
            elif axes == ["y"]:
                clause = inter.interaction_661_uniaxial
                if axis == "z":
                    clause = inter.interaction_662_uniaxial
                args = (n[axis], k[major], moments["y"], w["chi_LT"], rk["y"], gamma)
            else:
                clause = inter.interaction_661_minor if axis == "y" else inter.interaction_662_minor
                args = (n[axis], k[minor], moments["z"], rk["z"], gamma)
            # Compression (or no axial force) only: 6.3.3 does not apply in tension.
            cases = [(0, N_Ed / w["N_pl_Rd"] > 0)]
            if annex_a_used:
                # Beyond a critical force the factors of Annex A lose their meaning (the
                # member has buckled): the utilization is then the largest N_Ed/N_cr, ≥ 1.
                ratios = [w["r_y"], w["r_z"], w["r_T"]]
                beyond = w.any_of(*(ratio >= 1 for ratio in ratios))
                largest = functools.reduce(w.larger, [n[axis], *ratios])
                cases.append((largest, beyond))
            cases.append((_formula(w, clause, *args), True))
            u = w.branch(
                f"u_{key}",
                cases,
                f"{clause.description} (0 in tension)",
                reference=clause.reference,
            )
            w.check(key, EN_CHECK_TITLES[key], u, sp.Integer(1), reference=clause.reference)

    def _interaction_factors(
        self, axes: list[str], n: dict[str, Value], section_class: Value
    ) -> dict[str, Value]:
        """k_yy, k_zy (with M_y) and k_zz, k_yz (with M_z) of Annex B."""
        w, member = self.w, self.member
        diagram = member.factors_m
        assert diagram is not None
        torsional = member.kind == "I"
        k: dict[str, Value] = {}
        if "y" in axes:
            w.input(
                "C_my", diagram.C_my, "Equivalent uniform moment factor, {M_y}",
                dimension="dimensionless", reference=diagram.C_m_source, fixed=LTB_FIXED,
            )  # fmt: skip
            k["yy"] = w.clause(
                inter.k_yy, "k_yy", w["C_my"], w["lambda_rel_y"], n["y"], section_class
            )
            if torsional:
                w.input(
                    "C_mLT", diagram.C_mLT, "Equivalent uniform moment factor, LTB",
                    dimension="dimensionless", reference=diagram.C_m_source, fixed=LTB_FIXED,
                )  # fmt: skip
                k["zy"] = w.clause(
                    inter.k_zy_torsional, "k_zy", w["C_mLT"], w["lambda_rel_z"], n["z"],
                    section_class,
                )  # fmt: skip
            else:
                k["zy"] = w.clause(inter.k_zy_rigid, "k_zy", k["yy"], section_class)
            if member.ltb is None:
                w.input(
                    "chi_LT", 1.0, "Not susceptible to lateral-torsional buckling",
                    dimension="dimensionless", reference="EN 1993-1-1 6.3.2.1(2)",
                )  # fmt: skip
        if "z" in axes:
            w.input(
                "C_mz", diagram.C_mz, "Equivalent uniform moment factor, {M_z}",
                dimension="dimensionless", reference=diagram.C_m_source, fixed=LTB_FIXED,
            )  # fmt: skip
            k_zz = inter.k_zz_i if member.kind == "I" else inter.k_zz_hollow
            k["zz"] = w.clause(k_zz, "k_zz", w["C_mz"], w["lambda_rel_z"], n["z"], section_class)
            k["yz"] = w.clause(inter.k_yz, "k_yz", k["zz"], section_class)
        if w.prints:
            table = "B.2 (an open section: torsional deformation)" if torsional else "B.1"
            w.text(f"Interaction factors of EN 1993-1-1 Annex B, Table {table}.")
        return k

    def _annex_a_factors(self, axes: list[str], section_class: Value) -> dict[str, Value]:
        """k_yy, k_zy (with M_y) and k_zz, k_yz (with M_z) of Annex A (Method 1)."""
        w, member = self.w, self.member
        diagram = member.factors_m
        assert diagram is not None
        zero = sp.Integer(0)
        has_y, has_z = "y" in axes, "z" in axes
        M_y = self.demands["M_y_Ed"] if has_y else zero
        M_z = self.demands["M_z_Ed"] if has_z else zero
        N_c = w["N_c_Ed"]
        if "G" not in w.symbols:
            w.input(
                "nu", POISSON_RATIO, "Poisson's ratio in the elastic range",
                dimension="dimensionless", reference="EN 1993-1-1 3.2.6(1)",
            )  # fmt: skip
            w.clause(lat.shear_modulus, "G", w["E"], w["nu"], unit="MPa")
        E, G = w["E"], w["G"]
        w.clause(buck.critical_force, "N_cr_y", E, w["I_yy"], w["L_cr_y"])
        w.clause(buck.critical_force, "N_cr_z", E, w["I_z"], w["L_cr_z"])
        # The torsional buckling length is taken as the minor-axis one (common practice,
        # no source): the end conditions for twist follow those for lateral bending.
        w.text("Torsional buckling length taken as the buckling length about z-z, {L_cr_z}.")
        w.clause(
            annex_a.torsional_critical_force, "N_cr_T", G, w["I_t"], E, w["I_w"], w["L_cr_z"],
            w["i_y"], w["i_z"],
        )  # fmt: skip
        r = {
            key: w.clause(annex_a.critical_ratio, f"r_{key}", N_c, w[f"N_cr_{key}"])
            for key in ("y", "z", "T")
        }
        mu = {axis: w.clause(annex_a.mu, f"mu_{axis}", r[axis], w[f"chi_{axis}"]) for axis in "yz"}
        ratio = {
            axis: w.clause(annex_a.plastic_ratio, f"w_{axis}", w[f"W_pl_{axis}"], w[f"W_el_{axis}"])
            for axis in "yz"
        }
        n_pl = w.clause(annex_a.axial_plastic_ratio, "n_pl", N_c, w["A"], w["f_y"], w["gamma_M1"])
        a_LT = w.clause(annex_a.torsion_ratio, "a_LT", w["I_t"], w["I_yy"])
        lam_max = w.largest(
            "lambda_max", [("y-y", w["lambda_rel_y"]), ("z-z", w["lambda_rel_z"])],
            "Larger flexural slenderness {lambda_max}",
        )  # fmt: skip
        # C_mz,0: the diagram of M_z is not given, so ψ = 1 (uniform moment).
        if w.prints:
            w.text(
                "{C_mi_0} of Table A.2: {M_z} with ψ = 1 (its diagram is not given); {M_y} "
                + (
                    "with ψ = 1 (a cantilever: its diagram between restraints is not given)."
                    if member.support_case == "cantilever"
                    else f"from its diagram ({member.diagram_text})."
                )
            )
        k: dict[str, Value] = {}
        factors: dict[str, Value] = {}
        if has_z:
            w.input("psi_z", 1.0, "End moment ratio of {M_z} (not given: uniform)",
                    dimension="dimensionless", fixed=LTB_FIXED)  # fmt: skip
            factors["C_mz"] = w.clause(annex_a.moment_factor_0_linear, "C_mz", w["psi_z"], r["z"])
        if has_y:
            if member.ltb is None:
                w.input(
                    "chi_LT", 1.0, "Not susceptible to lateral-torsional buckling",
                    dimension="dimensionless", reference="EN 1993-1-1 6.3.2.1(2)",
                )  # fmt: skip
            lam_0 = self._annex_a_lambda_0(a_LT)
            if "k_c" not in w.symbols:
                w.input(
                    "k_c", diagram.k_c, "Correction factor for the moment distribution",
                    dimension="dimensionless", reference=diagram.k_c_source, fixed=LTB_FIXED,
                )  # fmt: skip
            C_1 = w.clause(annex_a.c1_from_kc, "C_1_A", w["k_c"])
            limit = w.clause(annex_a.lambda_0_limit, "lambda_0_lim", C_1, r["z"], r["T"])
            C_my_0 = self._annex_a_c_my_0(r["y"])
            C_my = w.clause(
                annex_a.moment_factor_y, "C_my", C_my_0, lam_0, limit, M_y, N_c, w["A"],
                w["W_el_y"], a_LT, r["y"],
            )  # fmt: skip
            C_mLT = w.clause(
                annex_a.moment_factor_lt, "C_mLT", C_my, a_LT, lam_0, limit, r["z"], r["T"]
            )
            M_pl = {}
            for axis in axes:
                M_pl[axis] = w.step(
                    f"M_pl_{axis}_Rd", w[f"W_pl_{axis}"] * w["f_y"] / w["gamma_M0"],
                    f"Plastic moment resistance about {axis}-{axis}",
                    reference="EN 1993-1-1 Eq. (6.13)",
                )  # fmt: skip
            chi_LT = w["chi_LT"]
            lam_z = w["lambda_rel_z"]
            if has_z:
                b = w.clause(
                    annex_a.b_lt, "b_LT", a_LT, lam_0, M_y, chi_LT, M_pl["y"], M_z, M_pl["z"]
                )
                c = w.clause(annex_a.c_lt, "c_LT", a_LT, lam_0, lam_z, M_y, C_my, chi_LT, M_pl["y"])
                d = w.clause(
                    annex_a.d_lt, "d_LT", a_LT, lam_0, lam_z, M_y, C_my, chi_LT, M_pl["y"], M_z,
                    factors["C_mz"], M_pl["z"],
                )  # fmt: skip
                e = w.clause(annex_a.e_lt, "e_LT", a_LT, lam_0, lam_z, M_y, C_my, chi_LT, M_pl["y"])
            else:
                b = d = zero
            C_yy = w.clause(
                annex_a.c_yy, "C_yy", ratio["y"], C_my, lam_max, n_pl, b, w["W_el_y"], w["W_pl_y"]
            )
            C_zy = w.clause(
                annex_a.c_zy, "C_zy", ratio["y"], ratio["z"], C_my, lam_max, n_pl, d, w["W_el_y"],
                w["W_pl_y"],
            )  # fmt: skip
            k["yy"] = w.clause(
                annex_a.k_yy, "k_yy", C_my, C_mLT, mu["y"], r["y"], C_yy, section_class
            )
            k["zy"] = w.clause(
                annex_a.k_zy, "k_zy", C_my, C_mLT, mu["z"], r["y"], C_zy, ratio["y"], ratio["z"],
                section_class,
            )  # fmt: skip
        if has_z:
            if not has_y:
                c = e = zero
            C_yz = w.clause(
                annex_a.c_yz, "C_yz", ratio["z"], ratio["y"], factors["C_mz"], lam_max, n_pl, c,
                w["W_el_z"], w["W_pl_z"],
            )  # fmt: skip
            C_zz = w.clause(
                annex_a.c_zz, "C_zz", ratio["z"], factors["C_mz"], lam_max, n_pl, e, w["W_el_z"],
                w["W_pl_z"],
            )  # fmt: skip
            k["yz"] = w.clause(
                annex_a.k_yz, "k_yz", factors["C_mz"], mu["y"], r["z"], C_yz, ratio["z"],
                ratio["y"], section_class,
            )  # fmt: skip
            k["zz"] = w.clause(
                annex_a.k_zz, "k_zz", factors["C_mz"], mu["z"], r["z"], C_zz, section_class
            )
        return k

    def _annex_a_lambda_0(self, a_LT: Value) -> Value:
        """λ̄_0, the slenderness for lateral-torsional buckling under a uniform moment."""
        w, member = self.w, self.member
        if member.ltb is None:
            return w.input(
                "lambda_0", 0.0, "Not susceptible to lateral-torsional buckling: {lambda_0} = 0",
                dimension="dimensionless", reference="EN 1993-1-1 6.3.2.1(2)",
            )  # fmt: skip
        M_cr_0 = w.clause(
            annex_a.critical_moment_uniform, "M_cr_0", w["E"], w["I_z"], w["I_w"], w["G"],
            w["I_t"], w["L_LT"],
        )  # fmt: skip
        return w.clause(lat.ltb_slenderness, "lambda_0", w["W_y"], w["f_y"], M_cr_0)

    def _annex_a_c_my_0(self, r_y: Value) -> Value:
        """C_my,0 of Table A.2 from the moment diagram of M_y."""
        w, member = self.w, self.member
        diagram = "uniform" if member.support_case == "cantilever" else member.moment_diagram
        if diagram == "uniform load":
            return w.clause(annex_a.moment_factor_0_uniform_load, "C_my_0", r_y)
        if diagram == "central point load":
            return w.clause(annex_a.moment_factor_0_point_load, "C_my_0", r_y)
        psi = member.end_moment_ratio if diagram == "end moments" else 1.0
        w.input(
            "psi_y", psi, "End moment ratio of {M_y}", dimension="dimensionless", fixed=LTB_FIXED
        )
        return w.clause(annex_a.moment_factor_0_linear, "C_my_0", w["psi_y"], r_y)
