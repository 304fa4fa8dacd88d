"""The member on supports: its supports, distributed loads, self-weight, the frame solution,
the scan for the critical station and the deflection along the member.

The member sheet (:mod:`calcsheet.calcs.member`) writes a member held by any supports
of :mod:`calcsheet.mechanics.supports`. This module does the numeric work before the
sheet is written:

* the supports from a case name or :class:`Support` objects, checked on the member;
* the self-weight from the section's weight per length (the catalog's nominal weight,
  or the area times the unit weight of steel);
* the frame solution by the direct stiffness method, one load case per load type, so
  the plan's load factors combine them without solving again;
* every candidate station (load points, supports, zero shear, a grid) under every
  combination, by the standard's numeric evaluator of the checks, to find each
  check's worst combination and station;
* the deflection along every span and overhang under the service loads.

All numbers are SI (N, m) floats; quantities at the edges.
"""

from __future__ import annotations

import itertools
import math
from collections.abc import Sequence
from dataclasses import dataclass

import numpy as np
import pint
from numpy.typing import ArrayLike, NDArray

from calcsheet.calcs.design import DesignBasis, forces_by_type
from calcsheet.errors import InputError
from calcsheet.mechanics.distributed import DistributedLoad, check_distributed_on_member
from calcsheet.mechanics.distributed import self_weight as self_weight_load
from calcsheet.mechanics.frame import FrameResult, member_stiffness, solve_frame, sorted_distinct
from calcsheet.mechanics.loads import (
    AppliedMoment,
    PointLoad,
    QuantityInput,
    check_on_member,
    parse_signed_axis,
)
from calcsheet.mechanics.supports import FIXED, MOTIONS, SUPPORT_CASES, Support, support_case
from calcsheet.mechanics.torsion import (
    WarpingRestraints,
    shear_centre_torque,
    warping_restraints,
)
from calcsheet.mechanics.warping_torsion import (
    ConcentratedTorque,
    DistributedTorque,
    TwistSolution,
    unit_twists,
)
from calcsheet.sections import Section
from calcsheet.sections.warping import WarpingProperties, warping_properties
from calcsheet.standards.combinations import Combination, combinations, factor_matrix
from calcsheet.units import Quantity, parse_quantity

SOLVER_REFERENCE = "direct stiffness analysis (3-D frame elements)"
DEFLECTION_METHOD = (
    "direct stiffness analysis (3-D frame elements); exact for a prismatic Euler-Bernoulli member"
)
# EN 1991-1-1:2002 Annex A, Table A.4 gives steel 77.0 to 78.5 kN/m³; the upper value.
STEEL_UNIT_WEIGHT = Quantity(78.5, "kN/m**3")
STEEL_UNIT_WEIGHT_SOURCE = "EN 1991-1-1:2002 Annex A, Table A.4 (steel 77.0–78.5 kN/m³)"
# Standard acceleration of gravity (3rd CGPM, 1901), for a catalog mass per length.
STANDARD_GRAVITY = Quantity(9.80665, "m/s**2")
# The shear modulus with the modulus each standard states (G enters the twist only).
_SHEAR_MODULI = {
    "29000 ksi": ("11200 ksi", "AISC 360-22 Symbols: G = 11,200 ksi"),
    "210000 MPa": ("81000 MPa", "EN 1993-1-1 3.2.6(1): G ≈ 81,000 N/mm²"),
}
SIDES = ("station", "right")
"""Both sides of a candidate station: loads there beyond the cut, then behind it."""
# Stations closer than this fraction of the length are one (as the frame solver's).
_SAME_STATION = 1e-9
SELF_WEIGHT_NAME = "self-weight"


def describe_motions(item: Support) -> str:
    """The motions a support restrains, in words."""
    held = sorted(item.restrains, key=MOTIONS.index)
    if item.restrains == FIXED:
        return "every translation and rotation (fixed)"
    return ", ".join(held)


def support_kind(item: Support) -> str:
    """fixed, pin, roller or a plain 'support' for any other set of restraints."""
    from calcsheet.mechanics.supports import PINNED, ROLLER

    if item.restrains == FIXED:
        return "fixed"
    if item.restrains == PINNED:
        return "pin"
    if item.restrains == ROLLER:
        return "roller"
    return "support"


def resolve_supports(
    supports: str | Sequence[Support],
    positions: Sequence[QuantityInput] | None,
    length: pint.Quantity,
) -> tuple[str, tuple[Support, ...]]:
    """The case name ('' for supports given one by one) and the supports, on the member."""
    if isinstance(supports, str):
        key = supports.strip().lower()
        if key not in SUPPORT_CASES:
            raise InputError("supports", supports, f"one of {', '.join(SUPPORT_CASES)}")
        return key, support_case(key, length, positions=positions)
    items = tuple(supports)
    if not items:
        raise InputError("supports", [], "at least one support", "the member is not held")
    if positions is not None:
        raise InputError(
            "support positions",
            positions,
            "no positions when the supports are given one by one (each has its z)",
        )
    for number, item in enumerate(items):
        if not isinstance(item, Support):
            raise InputError(f"supports[{number}]", item, "a support made by support(...)")
        check_on_member(item.z, length, field=f"support {item.name} z", shown=f"{item.z:~P}")
    return "", items


# AISC 360-22 Commentary Table C-A-7.1, recommended design values of K for the ideal end
# conditions (from memory of the Commentary): fixed-fixed 0.65, fixed-pinned 0.80,
# pinned-pinned 1.0, fixed-free 2.1 (the standard's own default).
def recommended_K(case: str, kind: str) -> float | None:
    """K for a named support case where the standard's table gives it; None otherwise
    (the standard's default, K of a fixed-free member, then applies)."""
    from calcsheet.standards.aisc360.design_parameters import effective_length_default

    if kind == "AISC 360-22" and case in SUPPORT_CASES and case != "fixed-free":
        return effective_length_default(case).value
    return None


@dataclass(frozen=True)
class BracingDefaults:
    """Lb and Cb of a member on supports, found from its brace points and moments.

    ``Lb`` is the longest laterally unbraced segment and ``Cb`` the smallest Eq. F1-1
    value over every segment and every combination: together never less severe than
    the worst segment. The texts say so on the sheet.
    """

    Lb: pint.Quantity
    Cb: float
    Lb_source: str
    Cb_source: str


def bracing_defaults(
    analysis: MemberAnalysis, length: pint.Quantity, braces: Sequence[pint.Quantity]
) -> BracingDefaults:
    """Lb and Cb from the supports, the brace points and every combination's M_x diagram."""
    from calcsheet.standards.aisc360.design_parameters import cb_of_segment, unbraced_segments

    unit = length.units
    supports = [held.z.to(unit) for held in analysis.supports if "rz" in held.restrains]
    segments = unbraced_segments(length, supports, list(braces))
    result = analysis.result
    stations = sorted_distinct(
        np.concatenate(
            [np.linspace(0.0, result.length, 401), result.candidate_stations(analysis.factors)]
        )
    )
    moments = result.internal_forces(stations, analysis.factors)[..., 4]  # (combos, stations)
    metres = float(Quantity(1.0, unit).to("m").m)
    longest = max(segments, key=lambda seg: float((seg.z_end - seg.z_start).m))
    smallest = (math.inf, "")
    for segment in segments:
        start, end = float(segment.z_start.m) * metres, float(segment.z_end.m) * metres
        for row in moments:
            found = cb_of_segment(stations, row, start, end, free_end=segment.free_end)
            if found.value < smallest[0]:
                smallest = (found.value, found.basis)
    Lb = (longest.z_end - longest.z_start).to(unit)
    where = f"z = {longest.z_start:~P} to {longest.z_end:~P}"
    return BracingDefaults(
        Lb,
        float(smallest[0]),
        f"the longest laterally unbraced segment between supports and brace points, {where}",
        "the smallest Eq. F1-1 value over the unbraced segments and every combination's "
        "{M_x} diagram, AISC 360-22 Section F1",
    )


def permanent_type(basis: DesignBasis) -> str:
    """The load type of permanent (dead) load in the basis's combinations: G in EN 1990,
    D in ASCE 7 and when loads are taken as given. The self-weight has this type."""
    standard = basis.combination_standard or ""
    return "G" if standard.startswith("EN") else "D"


def is_cantilever(supports: Sequence[Support]) -> bool:
    """One fixed support at z = 0: the member sheet's cantilever."""
    return len(supports) == 1 and supports[0].restrains == FIXED and supports[0].z.m == 0


def validate_distributed(
    distributed: Sequence[DistributedLoad], length: pint.Quantity
) -> list[DistributedLoad]:
    """Each distributed load on the member, with a length."""
    checked = []
    for number, load in enumerate(distributed):
        if not isinstance(load, DistributedLoad):
            raise InputError(
                f"distributed[{number}]", load, "a distributed load made by distributed_load(...)"
            )
        check_distributed_on_member(load, length)
        if load.z_end.to(length.units).m - load.z_start.to(length.units).m <= (
            _SAME_STATION * length.m
        ):
            raise InputError(
                f"distributed load {load.name} z_end",
                f"{load.z_end:~P}",
                f"a station beyond z_start = {load.z_start:~P}",
                "a distributed load needs a length",
            )
        checked.append(load)
    return checked


def validate_braces(braces: Sequence[QuantityInput], length: pint.Quantity) -> list[pint.Quantity]:
    """Brace points (lateral restraints) along the member, each from 0 to L."""
    points = []
    for number, value in enumerate(braces):
        field = f"braces[{number}]"
        point = parse_quantity(value, field=field, dimension="length")
        check_on_member(point, length, field=field, shown=value)
        points.append(point)
    return sorted(points, key=lambda point: float(point.to(length.units).m))


@dataclass(frozen=True)
class SectionWeight:
    """The weight per length of the member and how it is found.

    ``kind``: "catalog" (the nominal weight), "mass" (the catalog's mass per length
    times g) or "area" (area times the unit weight of steel).
    """

    weight: pint.Quantity
    kind: str
    source: str


def section_weight(section: Section) -> SectionWeight:
    """The section's weight per length: catalog nominal weight, else A × unit weight."""
    table = section.tabulated
    source = section.sources.get("A", "")
    if "weight" in table:
        return SectionWeight(table["weight"].to("lbf/ft"), "catalog", source)
    if "mass" in table:
        mass = Quantity(table["mass"]).to("kg/m")
        return SectionWeight((mass * STANDARD_GRAVITY).to("N/m"), "mass", source)
    area = section.properties["A"]
    return SectionWeight((area * STEEL_UNIT_WEIGHT).to("N/m"), "area", STEEL_UNIT_WEIGHT_SOURCE)


def member_self_weight(
    section: Section, length: pint.Quantity, gravity: str
) -> tuple[DistributedLoad, SectionWeight]:
    """The self-weight as a uniform distributed load along ``gravity`` over the member."""
    parse_signed_axis(gravity, field="gravity")
    weight = section_weight(section)
    load = self_weight_load(weight.weight, length, gravity_axis=gravity, name=SELF_WEIGHT_NAME)
    return load, weight


def shear_modulus(modulus: str) -> tuple[str, str]:
    """G and its source for the modulus a standard states (E/2.6, ν = 0.3, otherwise)."""
    if modulus in _SHEAR_MODULI:
        return _SHEAR_MODULI[modulus]
    value = parse_quantity(modulus, field="E", dimension="stress") / 2.6
    return f"{value.to('MPa').m:.6g} MPa", "G = E/(2(1 + ν)), ν = 0.3"


MemberLoad = PointLoad | AppliedMoment | DistributedLoad


@dataclass
class MemberAnalysis:
    """The member solved for every load type, with the combinations' factors.

    ``types`` name the load cases of ``result`` in order; ``factors`` (combinations,
    types) combine them (one row of ones when the loads are taken as given).
    """

    supports: tuple[Support, ...]
    case: str
    result: FrameResult
    types: list[str]
    combos: list[Combination] | None
    factors: NDArray[np.float64]
    # The twist of an open section with warping, per load type (None: no warping model).
    twist: MemberTwist | None = None

    @property
    def service_factors(self) -> NDArray[np.float64]:
        """Every load type at factor 1: the service loads as given."""
        return np.ones((1, len(self.types)))


def combination_factors(
    basis: DesignBasis, loads: Sequence[MemberLoad], types: Sequence[str]
) -> tuple[list[str], list[Combination] | None, NDArray[np.float64]]:
    """The load types present, the basis's combinations and their factor matrix."""
    present = list(dict.fromkeys(types))
    standard = basis.combination_standard
    if standard is None:
        return present, None, np.ones((1, len(present)))
    names = {kind: [load.name for load, t in zip(loads, types, strict=True) if t == kind]
             for kind in present}  # fmt: skip
    combos = combinations(standard, present, **basis.combination_options(names))
    return present, combos, factor_matrix(combos, present)


def solve_member(
    section: Section,
    length: pint.Quantity,
    supports: tuple[Support, ...],
    case: str,
    loads: Sequence[MemberLoad],
    types: Sequence[str],
    basis: DesignBasis,
) -> MemberAnalysis:
    """Solve the member by the direct stiffness method, one load case per load type."""
    present, combos, factors = combination_factors(basis, loads, types)
    cases = [[load for load, t in zip(loads, types, strict=True) if t == kind] for kind in present]
    modulus = basis.standard.modulus
    props = section.properties
    stiffness = member_stiffness(
        E=modulus,
        G=shear_modulus(modulus)[0],
        A=props["A"],
        Ix=props["Ix"],
        Iy=props["Iy"],
        J=props["J"],
        Ixy=props["Ixy"],
    )
    result = solve_frame(length, supports, stiffness, cases, force_unit="N", length_unit="m")
    twist = member_twist(section, length, supports, loads, types, modulus)
    return MemberAnalysis(supports, case, result, present, combos, factors, twist)


@dataclass
class StationScan:
    """Every check under every combination at every candidate station, both sides.

    ``per_check`` maps a check key to utilizations (sides, combinations, stations);
    ``stations`` in m; ``forces`` (sides, combinations, stations, 6) in N, N·m, T about
    the shear centre, with the twist columns G·φ′, E·φ″, E·φ‴ after them (9) when the
    warping of an open section is modelled (:meth:`MemberTwist.columns`).
    """

    stations: NDArray[np.float64]
    forces: NDArray[np.float64]
    per_check: dict[str, NDArray[np.float64]]
    measure: str

    def worst(self, key: str) -> tuple[float, int, int, int]:
        """A check's worst utilization and its (side, combination, station) indices."""
        values = self.per_check[key]
        flat = int(np.argmax(np.where(np.isnan(values), -np.inf, values)))
        side, combo, station = np.unravel_index(flat, values.shape)
        return float(values.flat[flat]), int(side), int(combo), int(station)

    def governing_check(self) -> str:
        """The key of the check with the largest worst utilization."""
        return max(self.per_check, key=lambda key: self.worst(key)[0])


def scan_stations(
    analysis: MemberAnalysis,
    section: Section,
    basis: DesignBasis,
    Fy: pint.Quantity,
    length: pint.Quantity,
    stations: NDArray[np.float64] | None = None,
) -> StationScan:
    """Every check at every station (default: the candidates) × combination × side.

    The candidates hold each force's own peaks; a check that adds forces (an
    interaction sum of two moments) can peak between them, so around each check's
    worst candidate the stations are refined once (a grid between its neighbours).
    """
    candidates = stations is None
    if stations is None:
        stations = analysis.result.candidate_stations(analysis.factors)
        twist = analysis.twist
        if twist is not None and twist.solution is not None:
            # φ′, φ″, φ‴ can peak inside a span (a fixed-ended member under uniform torque):
            # every combination's peaks join the candidates.
            combined = twist.solution.combined(analysis.factors @ twist.weights)
            stations = np.union1d(stations, combined.peak_stations())
    scan = _scan(analysis, section, basis, Fy, length, np.asarray(stations, dtype=float))
    if not candidates or len(scan.stations) < 3:
        return scan
    finer = [scan.stations]
    for key in scan.per_check:
        at = scan.worst(key)[3]
        low = scan.stations[max(at - 1, 0)]
        high = scan.stations[min(at + 1, len(scan.stations) - 1)]
        finer.append(np.linspace(low, high, _REFINE))
    return _scan(analysis, section, basis, Fy, length, sorted_distinct(np.concatenate(finer)))


# Stations between a check's worst candidate and its neighbours, when refining.
_REFINE = 41


def _scan(
    analysis: MemberAnalysis,
    section: Section,
    basis: DesignBasis,
    Fy: pint.Quantity,
    length: pint.Quantity,
    stations: NDArray[np.float64],
) -> StationScan:
    result = analysis.result
    forces = np.stack(
        [result.internal_forces(stations, analysis.factors, side=side) for side in SIDES]
    )  # (sides, combos, stations, 6)
    forces = shear_centre_forces(section, forces)  # T about the shear centre, as the sheet's
    twist = analysis.twist
    if twist is not None and twist.modelled:
        columns = np.stack(
            [np.tensordot(analysis.factors, twist.columns(stations, side), 1) for side in SIDES]
        )
        forces = np.concatenate([forces, columns], axis=-1)
    per_check_flat, measure = basis.standard.evaluate(
        section, forces.reshape(-1, forces.shape[-1]), basis, Fy, length
    )
    if not per_check_flat:
        raise InputError("check kind", basis.kind, "a standard whose checks can be evaluated")
    shape = forces.shape[:3]
    per_check = {key: np.asarray(values).reshape(shape) for key, values in per_check_flat.items()}
    return StationScan(stations, forces, per_check, measure)


def station_rows(
    analysis: MemberAnalysis, section: Section, station: float, side: str
) -> NDArray[np.float64]:
    """The rows by load type at a station: forces with T about the shear centre, and the
    twist columns when warping is modelled ((types, 6) or (types, 9), SI)."""
    rows = shear_centre_forces(section, forces_at(analysis, station, side))
    twist = analysis.twist
    if twist is None or not twist.modelled:
        return rows
    return np.concatenate([rows, twist.columns([station], side)[:, 0, :]], axis=-1)


def forces_at(analysis: MemberAnalysis, station: float, side: str) -> NDArray[np.float64]:
    """Internal forces (types, 6) at one station (m) and side, by load type, in N, N·m."""
    return analysis.result.internal_forces([station], side=side)[:, 0, :]  # type: ignore[arg-type]


def counts_beyond(z: float, station: float, side: str, length: float, reaction: bool) -> bool:
    """Whether a load or reaction at ``z`` is carried by the cut at ``station`` (m).

    As the frame solver's sides: "station" counts a load at the station beyond the
    cut, except the reactions at z = 0 when the cut is there; "right" counts it behind.
    """
    tolerance = _SAME_STATION * length
    if abs(z - station) <= tolerance:
        if side == "right":
            return False
        return not (reaction and abs(station) <= tolerance)
    return z > station


@dataclass(frozen=True)
class DeflectionSegment:
    """The largest transverse deflection in a span, an overhang or a cantilever."""

    kind: str  # "span", "overhang" or "cantilever"
    start: float  # m
    end: float
    between: str  # "S1–S2", "S1 to the end"...
    deflection: float  # m, the largest √(u² + v²)
    at: float  # m

    @property
    def length(self) -> float:
        return self.end - self.start

    def utilization(self, n: float) -> float:
        return self.deflection / (self.length / n)


def deflection_segments(analysis: MemberAnalysis, points: int = 401) -> list[DeflectionSegment]:
    """Each span between supports and each overhang, its largest deflection under the
    service loads (every load type at factor 1), from the frame solution."""
    result = analysis.result
    L = result.length
    order = sorted(range(len(analysis.supports)), key=lambda i: float(result_z(analysis, i)))
    zs = [result_z(analysis, i) for i in order]
    names = [analysis.supports[i].name for i in order]
    tolerance = 1e-6 * L
    pieces: list[tuple[str, float, float, str]] = []
    if zs[0] > tolerance:
        kind = "cantilever" if len(zs) == 1 and zs[0] >= L - tolerance else "overhang"
        pieces.append((kind, 0.0, zs[0], f"z = 0 to {names[0]}"))
    for first, second, a, b in zip(names, names[1:], zs, zs[1:], strict=False):
        if b - a > tolerance:
            pieces.append(("span", a, b, f"{first}–{second}"))
    if zs[-1] < L - tolerance:
        kind = "cantilever" if len(zs) == 1 and zs[0] <= tolerance else "overhang"
        pieces.append((kind, zs[-1], L, f"{names[-1]} to z = L"))
    candidates = result.candidate_stations(analysis.service_factors)
    segments = []
    for kind, a, b, between in pieces:
        stations = sorted_distinct(
            np.concatenate(
                [np.linspace(a, b, points), candidates[(candidates >= a) & (candidates <= b)]]
            )
        )
        moved = result.deflections(stations, analysis.service_factors)[0]
        transverse = np.hypot(moved[:, 0], moved[:, 1])
        worst = int(np.argmax(transverse))
        segments.append(
            DeflectionSegment(kind, a, b, between, float(transverse[worst]), float(stations[worst]))
        )
    return segments


def result_z(analysis: MemberAnalysis, index: int) -> float:
    """A support's station in m."""
    return float(analysis.supports[index].z.to("m").m)


@dataclass(frozen=True)
class ForceDiagrams:
    """Internal forces along the member, for the diagrams of N, V, T, M.

    ``stations`` in m; ``governing`` (stations, 6) under the governing combination;
    ``low`` and ``high`` (stations, 6) the envelope over every combination; forces in
    N and N·m in the order N, Vx, Vy, T, Mx, My. Each station appears twice where a
    force jumps (the limit from below, then from above).
    """

    stations: NDArray[np.float64]
    governing: NDArray[np.float64]
    low: NDArray[np.float64]
    high: NDArray[np.float64]


def force_diagrams(
    analysis: MemberAnalysis, governing: int = 0, *, grid: int = 200
) -> ForceDiagrams:
    """The stations and the governing and envelope force arrays (SI) along the member."""
    result = analysis.result
    stations = sorted_distinct(
        np.concatenate(
            [np.linspace(0.0, result.length, grid + 1), result.candidate_stations(analysis.factors)]
        )
    )
    left = result.internal_forces(stations, analysis.factors, side="left")
    right = result.internal_forces(stations, analysis.factors, side="right")
    # Interleave both sides so a jump at a load or support is drawn as a vertical step.
    both = np.stack([left, right], axis=2).reshape(left.shape[0], -1, 6)
    at = np.repeat(stations, 2)
    return ForceDiagrams(at, both[governing], both.min(axis=0), both.max(axis=0))


# --- torsion of open sections with warping (AISC Design Guide 9) ------------------------------

# A linearly varying distributed load's torque is taken as this many uniform pieces.
_TORQUE_PIECES = 16
# A twist derivative below this fraction of its largest magnitude along the member is
# the round-off of a zero (MemberTwist.without_round_off); the closed form leaves ~1e-16.
ROUND_OFF_OF_ZERO = 1e-8
# Stations along the member at which that largest magnitude is taken.
_SCALE_STATIONS = 97


@dataclass(frozen=True, eq=False)
class MemberTwist:
    """The member's twist for the torsion of an open section with warping, in SI (N, m).

    ``restraints`` the end restraints and why (:func:`warping_restraints`); ``solution``
    the unit twists of the loads' torques (None when warping is not modelled: supports
    not at the ends, or no torque about the shear centre; ``reason`` says why);
    ``weights`` (rows, torques) combine them: one row per load type (factor 1), so a
    combination's twist is its factors times the rows, as its forces are. ``x_s``,
    ``y_s`` the shear centre from the centroid (m); E, G (Pa), G·J (N·m²), E·Cw (N·m⁴).
    """

    restraints: WarpingRestraints
    solution: TwistSolution | None
    weights: NDArray[np.float64]
    x_s: float
    y_s: float
    E: float
    G: float
    GJ: float
    ECw: float
    reason: str = ""

    @property
    def modelled(self) -> bool:
        """Whether the warping stresses are computed."""
        return self.solution is not None

    @property
    def torsion_parameter(self) -> float:
        """λ = √(G·J/(E·Cw)) in 1/m (AISC Design Guide 9's 1/a)."""
        return math.sqrt(self.GJ / self.ECw) if self.ECw > 0 else math.inf

    def derivatives(self, stations: ArrayLike, side: str) -> NDArray[np.float64]:
        """φ′, φ″, φ‴ (1/m, 1/m², 1/m³) at ``stations`` (m) per row: (rows, stations, 3).

        ``side`` as :data:`SIDES`: "station" takes the stretch before a torque at the
        station (it acts beyond the cut), "right" the one after it."""
        assert self.solution is not None
        combined = self.solution.combined(self.weights)
        values = combined.derivatives(stations, "before" if side == "station" else "after")
        return np.moveaxis(values[..., 1:, :], -2, -1)

    def without_round_off(self, values: ArrayLike) -> NDArray[np.float64]:
        """``values`` (φ′, φ″, φ‴ in the last axis, 1/m, 1/m², 1/m³) with each that is the
        round-off of a zero set to 0.

        A derivative a boundary condition makes zero (φ′ at a fixed end, φ″ at a fork)
        comes out of the closed form as ~1e-16 of its size elsewhere. The rule: below
        :data:`ROUND_OFF_OF_ZERO` of the largest magnitude the same derivative takes
        along the member under any load type, a value is zero; a value a checker should
        see is a sizeable fraction of that.
        """
        assert self.solution is not None
        grid = np.linspace(0.0, self.solution.length, _SCALE_STATIONS)
        along = [self.derivatives(grid, side) for side in ("station", "right")]
        scale = np.max(np.abs(np.concatenate(along, axis=1)), axis=(0, 1))  # (3,)
        found = np.array(values, dtype=float)
        found[np.abs(found) < ROUND_OFF_OF_ZERO * scale] = 0.0
        return found

    def columns(self, stations: ArrayLike, side: str) -> NDArray[np.float64]:
        """The twist columns of a row of forces: G·φ′, E·φ″, E·φ‴ (Pa/m, Pa/m², Pa/m³),
        (rows, stations, 3) (:meth:`calcsheet.mechanics.stresses.StressModel.stresses`)."""
        return self.derivatives(stations, side) * [self.G, self.E, self.E]


def torsion_loads(
    loads: Sequence[MemberLoad], x_s: float, y_s: float, length: float
) -> list[ConcentratedTorque | DistributedTorque]:
    """Each load's torque about the shear-centre axis at (x_s, y_s) (m), SI.

    A force (F_x, F_y) at (e_x, e_y): (e_x − x_s)·F_y − (e_y − y_s)·F_x; a couple its
    M_z; a distributed load the same per unit length, a linearly varying one as
    :data:`_TORQUE_PIECES` uniform pieces at their mid-point values (the twist at a
    station differs from the exact linear torque by far less than 1 %).
    """
    found: list[ConcentratedTorque | DistributedTorque] = []

    def si(value: pint.Quantity, unit: str) -> float:
        return float(value.to(unit).m)

    for load in loads:
        if isinstance(load, PointLoad):
            arm_x, arm_y = si(load.ex, "m") - x_s, si(load.ey, "m") - y_s
            torque = arm_x * si(load.Fy, "N") - arm_y * si(load.Fx, "N")
            found.append(ConcentratedTorque(torque, min(si(load.z, "m"), length)))
        elif isinstance(load, AppliedMoment):
            found.append(ConcentratedTorque(si(load.Mz, "N*m"), min(si(load.z, "m"), length)))
        else:
            arm_x, arm_y = si(load.ex, "m") - x_s, si(load.ey, "m") - y_s
            start, end = si(load.z_start, "m"), min(si(load.z_end, "m"), length)
            m0 = arm_x * si(load.q_start[1], "N/m") - arm_y * si(load.q_start[0], "N/m")
            m1 = arm_x * si(load.q_end[1], "N/m") - arm_y * si(load.q_end[0], "N/m")
            pieces = 1 if m0 == m1 else _TORQUE_PIECES
            edges = np.linspace(start, end, pieces + 1)
            for low, high in itertools.pairwise(edges):
                middle = ((low + high) / 2 - start) / (end - start)
                found.append(DistributedTorque(m0 + (m1 - m0) * middle, low, high))
    return found


def member_twist(
    section: Section,
    length: pint.Quantity,
    supports: Sequence[Support],
    loads: Sequence[MemberLoad],
    types: Sequence[str],
    modulus: str,
) -> MemberTwist | None:
    """The twist of an open section with a warping model under each load type; None for
    a section without one (closed, solid, round, built-up).

    The end restraints follow the supports (:func:`warping_restraints`); supports away
    from the ends, or no torque about the shear centre, leave it unsolved
    (``solution`` None, with the reason). AISC Design Guide 9, Torsional Analysis of
    Structural Steel Members: the torsion differential equation
    G·J·φ′ − E·Cw·φ‴ = T solved in closed form
    (:func:`~calcsheet.mechanics.warping_torsion.unit_twists`).
    """
    try:
        warping = warping_properties(section, "m")
    except InputError:
        return None
    if not warping.warps:
        return None
    length_m = float(length.to("m").m)
    E = float(parse_quantity(modulus, field="E").to("Pa").m)
    G = float(parse_quantity(shear_modulus(modulus)[0], field="G").to("Pa").m)
    GJ = G * float(section.properties["J"].to("m**4").m)
    ECw = E * float(warping_constant(section, warping).to("m**6").m)
    restraints = warping_restraints(list(supports), length_m)
    present = list(dict.fromkeys(types))
    torques: list[ConcentratedTorque | DistributedTorque] = []
    rows: list[int] = []  # each torque takes its load's type
    for load, kind in zip(loads, types, strict=True):
        pieces = torsion_loads([load], warping.x_s, warping.y_s, length_m)
        torques += pieces
        rows += [present.index(kind)] * len(pieces)
    weights = np.zeros((len(present), len(torques)))
    weights[rows, np.arange(len(torques))] = 1.0
    solution, reason = None, restraints.reason
    twisted = any(
        (torque.torque if isinstance(torque, ConcentratedTorque) else torque.per_length) != 0
        for torque in torques
    )
    if not twisted:
        reason = "no load twists the member about its shear centre"
    elif restraints.ends is not None:
        solution = unit_twists(length_m, GJ, ECw, *restraints.ends, torques)
    return MemberTwist(
        restraints, solution, weights, warping.x_s, warping.y_s, E, G, GJ, ECw, reason
    )


def shear_centre_forces(section: Section, forces: NDArray[np.float64]) -> NDArray[np.float64]:
    """Internal forces (..., 6) in N, N·m with T about the shear-centre axis.

    The frame and the statics give T about the centroid; the section twists about its
    shear centre, so T_s = T − x_s·V_y + y_s·V_x
    (:func:`calcsheet.mechanics.torsion.shear_centre_torque`). The same forces for a
    section whose shear centre is the centroid or is not known (a built-up shape).
    """
    centre = _shear_centre_m(section)
    values = np.array(forces, dtype=float)
    if centre is not None and (centre[0] or centre[1]):
        values[..., 3] = shear_centre_torque(
            values[..., 3], values[..., 1], values[..., 2], centre[0], centre[1]
        )
    return values


def _shear_centre_m(section: Section) -> tuple[float, float] | None:
    """The shear centre (m) from the centroid of an open section with a warping model."""
    try:
        props = warping_properties(section, "m")
    except InputError:
        return None
    return (props.x_s, props.y_s) if props.warps else None


def warping_constant(section: Section, warping: WarpingProperties) -> pint.Quantity:
    """Cw for the twist: the section's own (the AISC table's for a catalog shape, the
    thin-walled formula for a user-defined one), else the warping model's.

    The table's Cw is the value a checker looks up, and the one the standard's checks
    write under the same name; the warping model's differs from it by the fillets and
    the through-thickness term (well under 1 % for a W shape).
    """
    own = section.properties.get("Cw")
    if own is not None and float(own.m) > 0:
        return own
    return Quantity(warping.Cw, f"{warping.length_unit}**6")


def statics_rows(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    twist: MemberTwist | None,
    side: str = "station",
) -> NDArray[np.float64]:
    """The rows by load type of a cantilever by statics of its free part: the forces with
    T about the shear centre, and the twist columns when warping is modelled (SI).

    ``twist`` is :func:`member_twist` of the cantilever's loads (None: no warping model).
    """
    rows = shear_centre_forces(section, forces_by_type(loads, types, length, station)[1])
    if twist is None or not twist.modelled:
        return rows
    at = float(station.to("m").m)
    return np.concatenate([rows, twist.columns([at], side)[:, 0, :]], axis=-1)
