"""EN 1993-1-1 checks of a member, written on a sheet from the sheet's design forces.

:func:`write_en1993_checks` classifies the cross-section (Table 5.2), writes the
cross-section resistances of 6.2 and the flexural buckling resistances of 6.3.1,
and adds one check per verification. It covers doubly symmetric rolled or
welded I-sections, rectangular/square hollow sections and circular hollow
sections; any other family is refused with a message saying what is covered.

Axes: the standard's y-y is the major axis and z-z the minor axis. In calcsheet's
section coordinates (x right, y up, x-x the strong axis of a W shape) that is

* EN y-y = calcsheet x-x: M_y,Ed is calcsheet's M_x, V_z,Ed its V_y (along the web);
* EN z-z = calcsheet y-y: M_z,Ed is calcsheet's M_y, V_y,Ed its V_x.

N_Ed is positive in tension, as calcsheet's N. Moments and shears enter the
checks by magnitude, so their signs do not matter here.
"""

from __future__ import annotations

import math
from collections.abc import Mapping, Sequence
from dataclasses import dataclass

import pint
import sympy as sp

from calcsheet.engine import Check, Input, Sheet, as_written
from calcsheet.engine.functions import Abs, Piecewise
from calcsheet.errors import DefinitionError, InputError
from calcsheet.sections import Section
from calcsheet.standards.en1993 import buckling as buck
from calcsheet.standards.en1993 import classification as cls
from calcsheet.standards.en1993 import resistance as res
from calcsheet.standards.en1993.factors import (
    NOMINAL_THICKNESS_LIMIT_MM,
    PartialFactors,
    Steel,
    as_partial_factors,
    as_steel,
)
from calcsheet.units import Quantity, parse_quantity, ureg

I_FAMILIES = frozenset({"W", "M", "S", "HP", "I-shape"})
RHS_FAMILIES = frozenset({"HSS_RECT", "rectangular HSS"})
CHS_FAMILIES = frozenset({"HSS_ROUND", "PIPE", "round HSS"})
SUPPORTED_TEXT = (
    "a doubly symmetric I-section (W, M, S, HP, or I-shape with equal flanges), a "
    "rectangular or square hollow section (HSS_RECT, rectangular HSS) or a circular "
    "hollow section (HSS_ROUND, PIPE, round HSS)"
)

DEMAND_DIMENSIONS: dict[str, str] = {
    "N_Ed": "force",
    "M_y_Ed": "moment",
    "M_z_Ed": "moment",
    "V_z_Ed": "force",
    "V_y_Ed": "force",
}
DEMAND_ALIASES = {"V_Ed": "V_z_Ed"}

AXES_TEXT = (
    "EN 1993-1-1 axes: y-y is the major axis and z-z the minor axis, i.e. calcsheet's "
    "x-x and y-y. So M_y,Ed is calcsheet's M_x, M_z,Ed its M_y, V_z,Ed (parallel to the "
    "web or depth) its V_y and V_y,Ed its V_x. N_Ed is positive in tension. Moments and "
    "shears are checked by magnitude."
)
NOT_COVERED_TEXT = (
    "Not covered by these checks: lateral-torsional buckling (6.3.2), members in bending "
    "and axial compression (6.3.3), torsion (6.2.7), class 4 cross-sections (EN 1993-1-5), "
    "local load introduction and connections. They must be verified separately."
)
CURVE_FIXED = (
    "the buckling curve follows from the section, the steel grade and its forming; "
    "build the sheet again with them"
)


@dataclass(frozen=True)
class _Geometry:
    kind: str  # "I", "RHS" or "CHS"
    fabrication: str  # rolled / welded (I), hot-finished / cold-formed (hollow)
    dims: dict[str, pint.Quantity]
    reference: str


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
) -> list[Check]:
    """Write the EN 1993-1-1 checks of ``section`` under ``demands`` on ``sheet``.

    ``demands`` maps ``"N_Ed"``, ``"M_y_Ed"``, ``"M_z_Ed"``, ``"V_z_Ed"`` and
    ``"V_y_Ed"`` (``"V_Ed"`` is taken as ``V_z_Ed``, the shear along the web) to
    symbols of design forces already on the sheet, in the standard's axes (see
    the module docstring); a force left out is not checked. ``material`` is a
    :class:`Steel`, a grade ("S355") or keywords of :func:`steel`. ``k_eff`` is
    the effective-length factor, one value or (k_y, k_z); 2.0 is the theoretical
    value of a fixed-free cantilever (common practice, no source). ``gamma``
    overrides the recommended partial factors. ``fabrication`` is "rolled" or
    "welded" for I-sections (catalog shapes default to rolled, user-defined
    I-shapes to welded), "hot-finished" or "cold-formed" for hollow sections
    (default cold-formed, as ASTM A500 tubes are: curve c, the safe choice).
    ``net_area`` adds the net-section check (6.7) in tension. ``interaction`` is
    "plastic" (6.2.9.1 for class 1 and 2, elastic for class 3) or "linear"
    (Eq. 6.2 throughout; always used for CHS).

    Returns the checks written, in sheet order.
    """
    writer = _Writer(sheet, section, _demands(sheet, demands))
    writer.geometry = _geometry(section, fabrication)
    writer.steel = as_steel(material)
    writer.factors = as_partial_factors(gamma)
    if interaction not in ("plastic", "linear"):
        raise InputError("interaction", interaction, "'plastic' or 'linear'")
    writer.interaction = interaction
    _check_thickness(writer.steel, writer.geometry)
    return writer.write(length, _k_factors(k_eff), net_area)


# --- validation ------------------------------------------------------------------------------


def _demands(sheet: Sheet, demands: Mapping[str, sp.Symbol]) -> dict[str, sp.Symbol]:
    known = ", ".join([*DEMAND_DIMENSIONS, *DEMAND_ALIASES])
    result: dict[str, sp.Symbol] = {}
    for key, symbol in demands.items():
        name = DEMAND_ALIASES.get(key, key)
        if name not in DEMAND_DIMENSIONS:
            raise InputError("demands", key, f"keys among {known}")
        if name in result:
            raise InputError("demands", key, f"{name} once (V_Ed is taken as V_z_Ed)")
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
        result[name] = symbol
    if not result:
        raise InputError("demands", {}, f"at least one design force among {known}")
    return result


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
        if k_design is not None:
            # The AISC tables give k_des = t_f + fillet; the fillet radius is the difference.
            r = (k_design - dims["tf"]).to(unit)
            reference = "k_des − t_f of the AISC tables"
        else:
            r = Quantity(0.0, unit)
            reference = "no fillet in the outline (section drawn from plates)"
        geometry = {"h": dims["d"], "b": dims["bf"], "t_w": dims["tw"], "t_f": dims["tf"], "r": r}
        return _Geometry("I", chosen, geometry, reference)
    if family in RHS_FAMILIES or family in CHS_FAMILIES:
        chosen = fabrication or "cold-formed"
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


# --- writing ---------------------------------------------------------------------------------


class _Writer:
    """Writes the checks; holds the symbols written so far."""

    geometry: _Geometry
    steel: Steel
    factors: PartialFactors
    interaction: str

    def __init__(self, sheet: Sheet, section: Section, demands: dict[str, sp.Symbol]) -> None:
        self.sheet = sheet
        self.section = section
        self.demands = demands
        self.s: dict[str, sp.Symbol] = {}
        self.checks: list[Check] = []

    # helpers

    def input(self, name: str, value: object, description: str, **options: object) -> sp.Symbol:
        """An input, or the sheet's own symbol when it already holds the same value."""
        quantity = parse_quantity(value, field=f"input {name}", dimension=options.get("dimension"))
        try:
            existing = self.sheet[name]
        except KeyError:
            return self.sheet.input(name, quantity, description, **options)
        old = existing.value
        if (
            isinstance(existing, Input)
            and old.dimensionality == quantity.dimensionality
            and math.isclose(old.to(quantity.units).m, quantity.m, rel_tol=1e-9, abs_tol=1e-12)
        ):
            return existing.symbol
        raise DefinitionError(
            f"EN 1993-1-1 checks need {name} = {quantity:~P} ({description}), but the sheet "
            f"already defines {name} = {old:~P}; write the checks on a sheet of their own"
        )

    def check(self, description: str, demand: sp.Basic, capacity: sp.Basic, reference: str):
        made = self.sheet.check(description, demand, capacity, reference=reference)
        self.checks.append(made)
        return made

    def has(self, *names: str) -> bool:
        return all(name in self.demands for name in names)

    # the sheet

    def write(
        self, length: pint.Quantity | str, k: tuple[float, float], net_area: object
    ) -> list[Check]:
        sheet = self.sheet
        sheet.heading("Member checks to EN 1993-1-1")
        sheet.add_reference("EN 1993-1-1:2005 Eurocode 3: Design of steel structures, Part 1-1")
        sheet.text(AXES_TEXT)
        # as_written rather than ``with sheet``: the caller may already be inside its own
        # ``with sheet`` block, whose exit would otherwise be cut short by ours.
        with as_written():
            self._inputs(length, k)
            self._classify()
            if self.has("N_Ed"):
                self._axial(net_area)
            self._shear()
            self._bending()
            if self.has("N_Ed") and (self.has("M_y_Ed") or self.has("M_z_Ed")):
                self._combined()
            if self.has("N_Ed"):
                self._buckling(k)
        sheet.text(NOT_COVERED_TEXT)
        return list(self.checks)

    def _inputs(self, length: pint.Quantity | str, k: tuple[float, float]) -> None:
        s, steel, factors, geo = self.s, self.steel, self.factors, self.geometry
        self.sheet.heading("Material, partial factors and section", level=2)
        s["f_y"] = self.input(
            "f_y", steel.f_y, f"Yield strength, {steel.grade}", dimension="stress",
            unit="MPa", reference=steel.source,
        )  # fmt: skip
        s["E"] = self.input(
            "E", steel.E, "Modulus of elasticity", dimension="stress", unit="MPa",
            reference="EN 1993-1-1 3.2.6(1)",
        )  # fmt: skip
        s["f_235"] = self.input(
            "f_235", "235 MPa", "Reference strength of ε", dimension="stress", unit="MPa",
            reference="EN 1993-1-1 Table 5.2",
        )  # fmt: skip
        s["gamma_M0"] = self.input(
            "gamma_M0", factors.gamma_M0, "Partial factor, resistance of cross-sections",
            dimension="dimensionless", reference=factors.reference,
        )  # fmt: skip
        if self.has("N_Ed"):
            s["gamma_M1"] = self.input(
                "gamma_M1", factors.gamma_M1, "Partial factor, resistance of members to "
                "instability", dimension="dimensionless", reference=factors.reference,
            )  # fmt: skip
        section, props = self.section, self.section.properties
        sources = section.sources
        for name, key, description in (
            ("A", "A", "Area"),
            ("W_pl_y", "Zx", "Plastic modulus about y-y (calcsheet Z_x)"),
            ("W_el_y", "Sx", "Elastic modulus about y-y, smaller fibre (calcsheet S_x)"),
            ("W_pl_z", "Zy", "Plastic modulus about z-z (calcsheet Z_y)"),
            ("W_el_z", "Sy", "Elastic modulus about z-z, smaller fibre (calcsheet S_y)"),
            ("i_y", "rx", "Radius of gyration about y-y (calcsheet r_x)"),
            ("i_z", "ry", "Radius of gyration about z-z (calcsheet r_y)"),
        ):
            s[name] = self.input(name, props[key], description, reference=sources.get(key, ""))
        labels = {
            "h": "Depth",
            "b": "Width",
            "t_w": "Web thickness",
            "t_f": "Flange thickness",
            "r": "Root radius",
            "t": "Wall thickness (design)",
            "d": "Outside diameter",
        }
        for name, value in geo.dims.items():
            reference = geo.reference if name == "r" else "section dimensions"
            s[name] = self.input(name, value, labels[name], dimension="length", reference=reference)
        s["L"] = self.input("L", length, "Member length", dimension="length")
        for axis, factor in zip(("y", "z"), k, strict=True):
            s[f"k_cr_{axis}"] = self.input(
                f"k_cr_{axis}", factor, f"Effective-length factor, buckling about {axis}-{axis}",
                dimension="dimensionless",
                reference="fixed-free: 2.0 (common practice, no source)" if factor == 2.0 else "",
            )  # fmt: skip

    # classification (Table 5.2)

    def _classify(self) -> None:
        sheet, s, geo = self.sheet, self.s, self.geometry
        need_y, need_z, need_N = self.has("M_y_Ed"), self.has("M_z_Ed"), self.has("N_Ed")
        sheet.heading("Cross-section class (EN 1993-1-1 Table 5.2)", level=2)
        s["epsilon"] = cls.epsilon.write(sheet, "epsilon", s["f_235"], s["f_y"])
        if not (need_y or need_z or need_N):
            sheet.text("No axial force or bending among the demands: the class is not needed.")
            return
        if need_N:
            s["N_c"] = sheet.step("N_c", -self.demands["N_Ed"], "Axial force, compression positive")
        classes: dict[str, list[tuple[str, sp.Symbol]]] = {"y": [], "z": [], "N": []}
        if geo.kind == "I":
            sheet.text(
                "Flange outstands are classified in uniform compression for every case (exact "
                "for M_y, on the safe side for M_z); the web under N with M_y, from the plastic "
                "(α) and elastic (ψ) stress distributions. The web is not stressed by M_z."
            )
            s["c_f"] = sheet.step(
                "c_f", (s["b"] - s["t_w"] - 2 * s["r"]) / 2, "Flange outstand width",
                reference="EN 1993-1-1 Table 5.2 (sheet 2)",
            )  # fmt: skip
            s["c_w"] = sheet.step(
                "c_w", s["h"] - 2 * s["t_f"] - 2 * s["r"], "Web depth between fillets",
                reference="EN 1993-1-1 Table 5.2 (sheet 1)",
            )  # fmt: skip
            flange = self._outstand("f", s["c_f"], s["t_f"])
            classes["z"].append(("flange", flange))
            if need_y:
                classes["y"] += [("flange", flange), ("web", self._web("w", "M_y_Ed"))]
            if need_N:
                classes["N"] += [("flange", flange), ("web", self._compressed("w"))]
        elif geo.kind == "RHS":
            sheet.text(
                "c = h − 3t and b − 3t (Table 5.2: c may be taken so where the corner radius "
                "is not known; on the safe side). A wall that a moment compresses over its "
                "whole width is classified in compression; a wall that the moment bends in "
                "its plane is classified under N with that moment."
            )
            s["c_h"] = sheet.step("c_h", s["h"] - 3 * s["t"], "Flat width of the webs (depth)")
            s["c_b"] = sheet.step("c_b", s["b"] - 3 * s["t"], "Flat width of the flanges (width)")
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
            if len(candidates) == 1:
                # A copy step names the class where the checks use it.
                s[f"class_{key}"] = sheet.step(
                    f"class_{key}", candidates[0][1], f"Section class, {what[key]}"
                )
            else:
                s[f"class_{key}"] = sheet.governing(
                    f"class_{key}", candidates, f"Section class, {what[key]}",
                    reference="EN 1993-1-1 5.5.2(6)",
                )  # fmt: skip
            value = float(sheet.value(s[f"class_{key}"]).m)
            # Class 4 in compression matters only while the member is compressed.
            tension = key == "N" and float(sheet.value(self.demands["N_Ed"]).m) >= 0
            if value > 3 and tension:
                sheet.text(
                    "The section is class 4 in compression; a compressive N_Ed would need "
                    "effective properties (EN 1993-1-5), which are not covered."
                )
            elif value > 3:
                raise InputError(
                    "section",
                    self.section.name,
                    "a class 1, 2 or 3 cross-section",
                    f"class 4 in {what[key]}: effective properties (EN 1993-1-5) are not covered",
                )

    def _limits_to_class(self, tag: str, ratio: sp.Symbol, limits) -> sp.Symbol:
        sheet = self.sheet
        symbols = [
            clause.write(sheet, f"ct_{tag}_{n}", *args)
            for n, (clause, args) in enumerate(limits, start=1)
        ]
        return cls.class_from_limits.write(sheet, f"class_{tag}", ratio, *symbols)

    def _ratio(self, name: str, c: sp.Symbol, t: sp.Symbol, description: str) -> sp.Symbol:
        if name not in self.s:
            self.s[name] = self.sheet.step(name, c / t, description)
        return self.s[name]

    def _outstand(self, tag: str, c: sp.Symbol, t: sp.Symbol) -> sp.Symbol:
        eps = self.s["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the flange outstand")
        limits = [
            (cls.outstand_class_1_limit, (eps,)),
            (cls.outstand_class_2_limit, (eps,)),
            (cls.outstand_class_3_limit, (eps,)),
        ]
        return self._limits_to_class(tag, ratio, limits)

    def _part(self, tag: str) -> tuple[sp.Symbol, sp.Symbol, sp.Symbol]:
        s = self.s
        if self.geometry.kind == "I":
            return s["c_w"], s["t_w"], s["t_w"]
        c = s["c_h"] if tag.startswith("h") else s["c_b"]
        return c, s["t"], 2 * s["t"]

    def _compressed(self, tag: str) -> sp.Symbol:
        key = f"class_{tag}N"
        if key in self.s:
            return self.s[key]
        c, t, _ = self._part(tag)
        eps = self.s["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the internal part")
        limits = [
            (cls.internal_compression_class_1_limit, (eps,)),
            (cls.internal_compression_class_2_limit, (eps,)),
            (cls.internal_compression_class_3_limit, (eps,)),
        ]
        self.s[key] = self._limits_to_class(f"{tag}N", ratio, limits)
        return self.s[key]

    def _web(self, tag: str, moment: str) -> sp.Symbol:
        sheet, s = self.sheet, self.s
        c, t, t_total = self._part(tag)
        eps = s["epsilon"]
        ratio = self._ratio(f"ct_{tag}", c, t, "c/t of the internal part")
        axis = moment[2]
        if self.has("N_Ed"):
            alpha = cls.plastic_alpha.write(sheet, f"alpha_{tag}", s["N_c"], s["f_y"], c, t_total)
            W_el, depth = (s["W_el_y"], s["h"]) if axis == "y" else (s["W_el_z"], s["b"])
            psi = cls.elastic_psi.write(
                sheet, f"psi_{tag}", s["N_c"], s["A"], self.demands[moment], W_el, depth, c
            )
        else:
            alpha = sheet.step(f"alpha_{tag}", 0.5, "Pure bending: half the part in compression")
            psi = sheet.step(f"psi_{tag}", -1.0, "Pure bending: end stresses equal and opposite")
        limits = [
            (cls.internal_class_1_limit, (eps, alpha)),
            (cls.internal_class_2_limit, (eps, alpha)),
            (cls.internal_class_3_limit, (eps, psi)),
        ]
        return self._limits_to_class(tag, ratio, limits)

    def _tube(self) -> sp.Symbol:
        s, eps = self.s, self.s["epsilon"]
        ratio = self.sheet.step("dt", s["d"] / s["t"], "d/t of the tube")
        limits = [
            (cls.tube_class_1_limit, (eps,)),
            (cls.tube_class_2_limit, (eps,)),
            (cls.tube_class_3_limit, (eps,)),
        ]
        return self._limits_to_class("t", ratio, limits)

    # resistances

    def _axial(self, net_area: object) -> None:
        sheet, s = self.sheet, self.s
        sheet.heading("Axial force (EN 1993-1-1 6.2.3, 6.2.4)", level=2)
        s["N_pl_Rd"] = res.plastic_axial_resistance.write(
            sheet, "N_pl_Rd", s["A"], s["f_y"], s["gamma_M0"]
        )
        N_Ed = self.demands["N_Ed"]
        self.check(
            "Axial force on the gross section", Abs(N_Ed), s["N_pl_Rd"],
            "EN 1993-1-1 Eq. (6.5), (6.9)",
        )  # fmt: skip
        if net_area is None:
            sheet.text("No fastener holes given: the net section (Eq. 6.7) is not checked.")
            return
        s["A_net"] = self.input("A_net", net_area, "Net area at holes", dimension="area")
        s["f_u"] = self.input(
            "f_u", self.steel.f_u, "Ultimate strength", dimension="stress", unit="MPa",
            reference=self.steel.source,
        )  # fmt: skip
        s["gamma_M2"] = self.input(
            "gamma_M2", self.factors.gamma_M2, "Partial factor, net section in tension",
            dimension="dimensionless", reference=self.factors.reference,
        )  # fmt: skip
        s["N_u_Rd"] = res.net_section_resistance.write(
            sheet, "N_u_Rd", s["A_net"], s["f_u"], s["gamma_M2"]
        )
        s["N_t_Ed"] = sheet.step(
            "N_t_Ed", (Abs(N_Ed) + N_Ed) / 2, "Tension force (zero in compression)"
        )
        self.check("Tension, net section", s["N_t_Ed"], s["N_u_Rd"], "EN 1993-1-1 Eq. (6.5), (6.7)")

    def _shear(self) -> None:
        if not (self.has("V_z_Ed") or self.has("V_y_Ed")):
            return
        sheet, s, geo = self.sheet, self.s, self.geometry
        sheet.heading("Shear (EN 1993-1-1 6.2.6)", level=2)
        if geo.kind in ("I", "RHS"):
            s["eta"] = self.input(
                "eta", 1.0, "Factor η of the shear area (1.0 may be used conservatively)",
                dimension="dimensionless", reference="EN 1993-1-1 6.2.6(3) Note",
            )  # fmt: skip
        for axis, key in (("z", "V_z_Ed"), ("y", "V_y_Ed")):
            if not self.has(key):
                continue
            area = self._shear_area(axis)
            s[f"V_pl_{axis}_Rd"] = res.plastic_shear_resistance.write(
                sheet, f"V_pl_{axis}_Rd", area, s["f_y"], s["gamma_M0"]
            )
            parts = {"I": ("web", "flanges"), "RHS": ("webs", "flanges")}.get(geo.kind)
            along = f"along {axis}" + (f" ({parts[axis == 'y']})" if parts else "")
            self.check(
                f"Shear {along}", Abs(self.demands[key]), s[f"V_pl_{axis}_Rd"],
                "EN 1993-1-1 Eq. (6.17), (6.18)",
            )  # fmt: skip
            if geo.kind != "CHS":
                self._shear_buckling(axis)

    def _shear_area(self, axis: str) -> sp.Symbol:
        sheet, s, geo = self.sheet, self.s, self.geometry
        if geo.kind == "CHS":
            if "A_v" not in s:
                s["A_v"] = res.shear_area_chs.write(sheet, "A_v", s["A"])
            return s["A_v"]
        name = f"A_v_{axis}"
        if geo.kind == "RHS":
            h, b = (s["h"], s["b"]) if axis == "z" else (s["b"], s["h"])
            s[name] = res.shear_area_rhs.write(sheet, name, s["A"], h, b)
            return s[name]
        self._web_height()
        if axis == "y":
            s[name] = res.shear_area_i_flanges.write(sheet, name, s["A"], s["h_w"], s["t_w"])
        elif geo.fabrication == "rolled":
            s[name] = res.shear_area_rolled_i.write(
                sheet, name, s["A"], s["b"], s["t_f"], s["t_w"], s["r"], s["h_w"], s["eta"]
            )
        else:
            s[name] = res.shear_area_welded_i.write(sheet, name, s["h_w"], s["t_w"], s["eta"])
        return s[name]

    def _web_height(self) -> None:
        if "h_w" not in self.s:
            s = self.s
            s["h_w"] = self.sheet.step("h_w", s["h"] - 2 * s["t_f"], "Web depth between flanges")

    def _shear_buckling(self, axis: str) -> None:
        sheet, s, geo = self.sheet, self.s, self.geometry
        if geo.kind == "I":
            if axis == "y":
                return  # flanges in shear: no web panel to buckle
            depth, thickness, what = s["h_w"], s["t_w"], "web"
        else:
            name = "h_w" if axis == "z" else "b_w"
            if name not in s:
                side = s["h"] if axis == "z" else s["b"]
                s[name] = sheet.step(name, side - 2 * s["t"], "Wall depth between the other walls")
            depth, thickness, what = s[name], s["t"], "walls"
        if "hw_tw_max" not in s:
            s["hw_tw_max"] = res.shear_buckling_limit.write(
                sheet, "hw_tw_max", s["epsilon"], s["eta"]
            )
        ratio = sheet.step(
            f"hw_tw_{axis}", depth / thickness, f"Slenderness of the {what} in shear"
        )
        self.check(
            f"Shear buckling not governing ({what}, {axis})", ratio, s["hw_tw_max"],
            "EN 1993-1-1 6.2.6(6)",
        )  # fmt: skip

    def _bending(self) -> None:
        if not (self.has("M_y_Ed") or self.has("M_z_Ed")):
            return
        sheet, s = self.sheet, self.s
        sheet.heading("Bending (EN 1993-1-1 6.2.5, 6.2.8)", level=2)
        strength = s["f_y"]
        shears = [(key[2], key) for key in ("V_z_Ed", "V_y_Ed") if self.has(key)]
        if shears:
            for axis, key in shears:
                s[f"rho_{axis}"] = res.shear_reduction.write(
                    sheet, f"rho_{axis}", self.demands[key], s[f"V_pl_{axis}_Rd"]
                )
            if len(shears) == 1:
                s["rho"] = s[f"rho_{shears[0][0]}"]
            else:
                s["rho"] = sheet.governing(
                    "rho", [("V_z", s["rho_z"]), ("V_y", s["rho_y"])], "Larger reduction factor"
                )
            s["f_y_V"] = res.shear_reduced_strength.write(
                sheet, "f_y_V", s["rho"], s["f_y"], unit="MPa"
            )
            strength = s["f_y_V"]
        self.strength = strength
        for axis in ("y", "z"):
            key = f"M_{axis}_Ed"
            if not self.has(key):
                continue
            name = f"M_c_{axis}_Rd"
            s[name] = res.bending_resistance.write(
                sheet, name, s[f"W_pl_{axis}"], s[f"W_el_{axis}"], strength, s["gamma_M0"],
                s[f"class_{axis}"],
            )  # fmt: skip
            self.check(
                f"Bending about {axis}-{axis}", Abs(self.demands[key]), s[name],
                "EN 1993-1-1 Eq. (6.12)",
            )  # fmt: skip

    def _combined(self) -> None:
        sheet, s, geo = self.sheet, self.s, self.geometry
        sheet.heading("Bending and axial force (EN 1993-1-1 6.2.9)", level=2)
        N_Ed = self.demands["N_Ed"]
        axes = [axis for axis in ("y", "z") if self.has(f"M_{axis}_Ed")]
        if self.strength is s["f_y"]:
            N_Rd = s["N_pl_Rd"]
        else:
            N_Rd = s["N_pl_V_Rd"] = res.plastic_axial_resistance.write(
                sheet, "N_pl_V_Rd", s["A"], self.strength, s["gamma_M0"]
            )
            sheet.text("With shear: N_pl,Rd with the reduced yield strength as well (safe side).")
        if geo.kind == "CHS" or self.interaction == "linear":
            expr = Abs(N_Ed) / N_Rd
            for axis in axes:
                expr = expr + Abs(self.demands[f"M_{axis}_Ed"]) / s[f"M_c_{axis}_Rd"]
            s["u_NM"] = sheet.step(
                "u_NM", expr, "Linear interaction (valid for every class, conservative)",
                reference="EN 1993-1-1 Eq. (6.2)",
            )  # fmt: skip
            self.check("Bending and axial force", s["u_NM"], sp.Integer(1), "EN 1993-1-1 Eq. (6.2)")
            return
        n = s["n"] = res.axial_ratio.write(sheet, "n", N_Ed, N_Rd)
        if len(axes) == 2:
            governing = sheet.governing(
                "class_NM", [("y-y", s["class_y"]), ("z-z", s["class_z"])],
                "Class under biaxial bending with N (the worse of the two)",
            )  # fmt: skip
            classes = {"y": governing, "z": governing}
        else:
            classes = {axes[0]: s[f"class_{axes[0]}"]}
        if geo.kind == "I":
            s["a"] = res.web_ratio_i.write(sheet, "a", s["A"], s["b"], s["t_f"])
            ratios = {"y": s["a"], "z": s["a"]}
            plastic = {"y": res.reduced_moment_y_i, "z": res.reduced_moment_z_i}
        else:
            s["a_w"] = res.web_ratio_rhs.write(sheet, "a_w", s["A"], s["b"], s["t"])
            s["a_f"] = res.flange_ratio_rhs.write(sheet, "a_f", s["A"], s["h"], s["t"])
            ratios = {"y": s["a_w"], "z": s["a_f"]}
            plastic = {"y": res.reduced_moment_rhs, "z": res.reduced_moment_rhs}
        sheet.text(
            "Class 1 and 2: reduced plastic moments of 6.2.9.1. Class 3: the elastic criterion "
            "(6.42) written as M_Ed ≤ M_el,Rd·(1 − n) with exponents 1."
        )
        for axis in axes:
            M_c = s[f"M_c_{axis}_Rd"]
            expr = Piecewise(
                (plastic[axis](M_c, n, ratios[axis]), classes[axis] <= 2),
                (res.reduced_moment_elastic(M_c, n), True),
            )
            reference = f"{plastic[axis].reference}; EN 1993-1-1 6.2.9.2"
            s[f"M_N_{axis}_Rd"] = sheet.step(
                f"M_N_{axis}_Rd", expr, f"Moment resistance about {axis}-{axis} reduced for N",
                reference=reference,
            )  # fmt: skip
        if len(axes) == 2:
            if geo.kind == "I":
                alpha = res.biaxial_alpha_i.write(sheet, "alpha_NM", classes["y"])
                beta = res.biaxial_beta_i.write(sheet, "beta_NM", n, classes["y"])
            else:
                alpha = beta = res.biaxial_exponent_rhs.write(sheet, "alpha_NM", n, classes["y"])
            criterion = res.biaxial_criterion(
                Abs(self.demands["M_y_Ed"]), s["M_N_y_Rd"], Abs(self.demands["M_z_Ed"]),
                s["M_N_z_Rd"], alpha, beta,
            )  # fmt: skip
            reference = res.biaxial_criterion.reference
        else:
            axis = axes[0]
            criterion = Abs(self.demands[f"M_{axis}_Ed"]) / s[f"M_N_{axis}_Rd"]
            reference = "EN 1993-1-1 Eq. (6.31)"
        # At n ≥ 1 the axial force alone exhausts the section and no moment resistance is
        # left; the utilization shown is then n itself.
        s["u_NM"] = sheet.step(
            "u_NM", Piecewise((criterion, n < 1), (n, True)),
            "Utilization under N and M (n itself when n ≥ 1)", reference=reference,
        )  # fmt: skip
        self.check("Bending and axial force", s["u_NM"], sp.Integer(1), reference)

    def _buckling(self, k: tuple[float, float]) -> None:
        sheet, s, geo = self.sheet, self.s, self.geometry
        sheet.heading("Flexural buckling (EN 1993-1-1 6.3.1)", level=2)
        N_Ed = self.demands["N_Ed"]
        s["N_c_Ed"] = sheet.step(
            "N_c_Ed", (Abs(N_Ed) - N_Ed) / 2, "Compression force (zero in tension)"
        )
        s["lambda_1"] = buck.slenderness_limit.write(sheet, "lambda_1", s["E"], s["f_y"])
        for axis in ("y", "z"):
            if geo.kind == "I":
                kind = f"{geo.fabrication} I"
                choice = buck.buckling_curve(
                    kind, axis, grade=self.steel.grade, h=geo.dims["h"], b=geo.dims["b"],
                    t_f=geo.dims["t_f"],
                )  # fmt: skip
            else:
                choice = buck.buckling_curve(
                    "hollow", axis, grade=self.steel.grade, forming=geo.fabrication
                )
            sheet.text(f"Buckling about {axis}-{axis}: {choice.reason}.")
            L_cr = sheet.step(
                f"L_cr_{axis}", s[f"k_cr_{axis}"] * s["L"], f"Buckling length about {axis}-{axis}"
            )
            lam = buck.relative_slenderness_from_length.write(
                sheet, f"lambda_rel_{axis}", L_cr, s[f"i_{axis}"], s["lambda_1"]
            )
            alpha = self.input(
                f"alpha_{axis}", choice.alpha, f"Imperfection factor, curve {choice.curve}",
                dimension="dimensionless", reference="EN 1993-1-1 Table 6.1", fixed=CURVE_FIXED,
            )  # fmt: skip
            phi = buck.buckling_phi.write(sheet, f"Phi_{axis}", alpha, lam)
            chi = buck.reduction_factor.write(sheet, f"chi_{axis}", phi, lam)
            # Eq. (6.47) holds for class 1-3; a class 4 section is accepted only while the
            # member is in tension (then nothing buckles). Otherwise no branch applies and
            # the sheet stops with an error naming this step.
            applies = sp.Or(s["class_N"] <= 3, s["N_c_Ed"] / s["N_pl_Rd"] <= 0)
            s[f"N_b_{axis}_Rd"] = sheet.step(
                f"N_b_{axis}_Rd",
                Piecewise(
                    (buck.buckling_resistance(chi, s["A"], s["f_y"], s["gamma_M1"]), applies)
                ),
                buck.buckling_resistance.description,
                reference=buck.buckling_resistance.reference,
            )
            self.check(
                f"Flexural buckling about {axis}-{axis}", s["N_c_Ed"], s[f"N_b_{axis}_Rd"],
                "EN 1993-1-1 Eq. (6.46), (6.47)",
            )  # fmt: skip
