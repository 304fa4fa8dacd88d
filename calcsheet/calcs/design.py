"""The design basis of a member sheet, and the numeric work behind its checks.

A :class:`DesignBasis` says which check the sheet makes: the generic allowable
stress check, AISC 360-22 (ASD or LRFD) or EN 1993-1-1, with the load
combinations that go with it. Before the sheet is written, every combination is
evaluated numerically (the same clauses as the printed steps, on arrays) to find
the governing one; the sheet then prints that combination in full and lists the
others in an envelope table. The load-direction sweep and the lightest-section
search use the same numeric path.
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass, field
from functools import lru_cache

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.mechanics import internal_forces, stress_model
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, point_load
from calcsheet.mechanics.statics import loads_beyond
from calcsheet.sections import Section
from calcsheet.standards.combinations import Combination, combinations, factor_matrix
from calcsheet.units import Quantity

KINDS = ("allowable stress", "AISC 360-22", "EN 1993-1-1")


@dataclass(frozen=True)
class DesignBasis:
    """Which check a member sheet makes, and its settings (defaults as stated)."""

    kind: str = "allowable stress"
    method: str = "LRFD"
    combinations: str | None = None  # None: ASCE 7-22 for AISC, EN 1990 for EN, none else
    factor_of_safety: float = 1.67
    K: float | None = None  # effective length factor; AISC 2.1, EN 2.0 when None
    Lb: pint.Quantity | None = None
    Cb: float = 1.0
    gamma_M0: float = 1.00
    gamma_M1: float = 1.00
    S_DS: float | None = None
    grade: str = ""
    deflection_ratio: float | None = None  # L/n; None: no deflection check
    sweep_load: str | None = None
    sweep_step_deg: float = 5.0
    lightest_in: str | None = None

    def __post_init__(self) -> None:
        if self.kind not in KINDS:
            raise InputError("check kind", self.kind, "one of: " + ", ".join(KINDS))
        if self.kind == "AISC 360-22" and self.method not in ("LRFD", "ASD"):
            raise InputError("check method", self.method, "LRFD or ASD")
        if self.K is not None and not (math.isfinite(self.K) and self.K > 0):
            raise InputError("check K", self.K, "a positive effective length factor")
        if self.lightest_in and self.kind != "AISC 360-22":
            raise InputError(
                "explore lightest_in",
                self.lightest_in,
                "a family to search only with the AISC 360-22 check (its numeric path)",
            )

    @property
    def combination_standard(self) -> str | None:
        """The load-combination standard, or None when loads are taken as given."""
        if self.combinations is not None:
            return None if self.combinations.lower() == "none" else self.combinations
        if self.kind == "AISC 360-22":
            return "ASCE 7-22 strength" if self.method == "LRFD" else "ASCE 7-22 ASD"
        if self.kind == "EN 1993-1-1":
            return "EN 1990"
        return None

    @property
    def effective_length_factor(self) -> float:
        if self.K is not None:
            return self.K
        # Fixed-free: AISC Commentary Table C-A-7.1 recommends 2.1 (from memory);
        # EN 1993-1-1 has no table; 2.0 is the theoretical value (common practice).
        return 2.1 if self.kind == "AISC 360-22" else 2.0


@dataclass
class CombinationPlan:
    """Every combination's internal forces at the station and its utilization."""

    standard: str
    types: list[str]
    combos: list[Combination]
    forces: np.ndarray  # (n_combos, 6): N, Vx, Vy, T, Mx, My in N and N·m
    utilization: np.ndarray  # (n_combos,)
    measure: str
    governing: int
    # AISC: the utilization of every check under every combination (check -> (n_combos,))
    per_check: dict[str, np.ndarray] = field(default_factory=dict)

    @property
    def governing_combination(self) -> Combination:
        return self.combos[self.governing]


def forces_by_type(
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    present: Sequence[str] | None = None,
) -> tuple[list[str], np.ndarray]:
    """Internal forces at the station of each load type's loads: (n_types, 6) in N, N·m.

    ``present`` lists the types to give rows for (by default those of ``loads``).
    """
    present = list(dict.fromkeys(types)) if present is None else list(present)
    rows = []
    for load_type in present:
        chosen = [load for load, kind in zip(loads, types, strict=True) if kind == load_type]
        if loads_beyond(chosen, station):
            rows.append(internal_forces(length, chosen, station).as_array("N", "m"))
        else:
            rows.append(np.zeros(6))
    return present, np.array(rows)


def _aisc_numeric(table, forces: np.ndarray, basis: DesignBasis, Fy, length) -> dict:
    """aisc_checks_numeric of ``table`` under the combinations' forces (n, 6) in N, N·m."""
    from calcsheet.standards.aisc360 import DemandArrays, Steel, aisc_checks_numeric

    demands = DemandArrays(
        P_r=forces[:, 0], M_rx=forces[:, 4], M_ry=forces[:, 5], V_rx=forces[:, 1], V_ry=forces[:, 2]
    )
    return aisc_checks_numeric(
        table,
        demands,
        method=basis.method,
        material=Steel(F_y=Fy, grade=basis.grade or "steel"),
        length=length,
        K=basis.effective_length_factor,
        Lb=basis.Lb,
        Cb=basis.Cb,
    )


# Sections are built once per design (and cached by the job builder), so their AISC
# tables are kept by identity; the section is held too, so an id is never reused.
_SECTION_TABLES: dict[int, tuple[Section, object]] = {}


def _section_table(section: Section) -> object:
    from calcsheet.standards.aisc360.section_data import section_table

    kept = _SECTION_TABLES.get(id(section))
    if kept is None or kept[0] is not section:
        if len(_SECTION_TABLES) >= 32:
            _SECTION_TABLES.clear()
        kept = _SECTION_TABLES[id(section)] = (section, section_table([section]))
    return kept[1]


def utilizations(
    section: Section,
    forces: np.ndarray,
    basis: DesignBasis,
    Fy: pint.Quantity,
    length: pint.Quantity,
) -> tuple[np.ndarray, dict[str, np.ndarray], str]:
    """Utilization of each row of ``forces`` (n, 6) in N, N·m, the utilization of each
    AISC check per row (empty for the other kinds), and what the utilization measures."""
    if basis.kind == "AISC 360-22":
        checks = _aisc_numeric(_section_table(section), forces, basis, Fy, length)
        per_check = {name: values[0] for name, values in checks.items()}
        worst = np.max(np.stack(list(per_check.values())), axis=0)
        return worst, per_check, "governing AISC 360-22 check"
    if basis.kind == "EN 1993-1-1":
        from calcsheet.standards.en1993 import en1993_checks_numeric, steel

        grade = basis.grade if basis.grade.upper().startswith("S") else "S355"
        per_check = en1993_checks_numeric(
            section,
            # EN y-y is our x-x: N, M_y,Ed = M_x, M_z,Ed = M_y, V_z,Ed = V_y, V_y,Ed = V_x.
            {"N_Ed": forces[:, 0], "M_y_Ed": forces[:, 4], "M_z_Ed": forces[:, 5],
             "V_z_Ed": forces[:, 2], "V_y_Ed": forces[:, 1]},
            material=steel(grade, f_y=Fy),
            length=length,
            k_eff=basis.effective_length_factor,
            gamma={"gamma_M0": basis.gamma_M0, "gamma_M1": basis.gamma_M1},
        )  # fmt: skip
        worst = np.max(np.stack(list(per_check.values())), axis=0)
        return worst, per_check, "governing EN 1993-1-1 check"
    # Elastic proxy (stated on the sheet): the largest von Mises stress at the points
    # over the allowable (F_y/Ω) or the design yield stress (f_y/γM0, EN 1993-1-1 6.2.1(5)).
    unit = section.length_unit
    metres = float(Quantity(1.0, unit).to("m").m)
    stresses = stress_model(section, unit).stresses(forces / [1, 1, 1, metres, metres, metres])
    vm = stresses.von_mises.max(axis=-1) * float(Quantity(1.0, f"N/{unit}**2").to("Pa").m)
    if basis.kind == "allowable stress":
        allowable = Fy.to("Pa").m / basis.factor_of_safety
        measure = "largest von Mises stress / (F_y/Ω)"
    else:
        allowable = Fy.to("Pa").m / basis.gamma_M0
        measure = "largest von Mises stress / (f_y/γM0), EN 1993-1-1 6.2.1(5)"
    return vm / allowable, {}, measure


def plan_combinations(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    basis: DesignBasis,
    Fy: pint.Quantity,
) -> CombinationPlan | None:
    """Evaluate every combination of the basis; None when loads are taken as given."""
    standard = basis.combination_standard
    if standard is None:
        return None
    present, by_type = forces_by_type(loads, types, length, station)
    combos = combinations(standard, present, S_DS=basis.S_DS)
    if not combos:
        raise InputError(
            "loads type",
            ", ".join(present),
            f"load types that {standard} combines (D, L, Lr, S, R, W, E; EN: G, Q, S, W)",
            "no combination applies",
        )
    from calcsheet.standards.combinations import combine_numeric

    forces = combine_numeric(by_type, combos, present)
    values, per_check, measure = utilizations(section, forces, basis, Fy, length)
    # Infinite utilization is an answer (outside the clauses' scope, or buckling);
    # infinite forces or NaN mean the inputs are beyond floating point.
    if not np.all(np.isfinite(forces)) or np.any(np.isnan(values)):
        raise InputError(
            "loads", ", ".join(present), "loads whose combined forces are finite numbers"
        )
    return CombinationPlan(
        per_check=per_check,
        standard=standard,
        types=present,
        combos=combos,
        forces=forces,
        utilization=values,
        measure=measure,
        governing=int(np.argmax(values)),
    )


@dataclass(frozen=True)
class Sweep:
    """Utilization against the angle of one load, drawn angle and worst angle."""

    load: str
    angles_deg: np.ndarray
    utilization: np.ndarray
    drawn_deg: float

    @property
    def drawn_utilization(self) -> float:
        """The utilization at the angle drawn on the sheet (between sweep points: linear)."""
        return float(np.interp(self.drawn_deg, self.angles_deg, self.utilization))

    @property
    def worst_deg(self) -> float:
        return float(self.angles_deg[int(np.argmax(self.utilization))])


def angle_sweep(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    basis: DesignBasis,
    Fy: pint.Quantity,
) -> Sweep:
    """Turn one load (given by magnitude and angle) through 0–360° in its plane."""
    names = [load.name for load in loads]
    if basis.sweep_load not in names:
        raise InputError(
            "explore sweep_load", basis.sweep_load, "the name of a load: " + ", ".join(names)
        )
    index = names.index(basis.sweep_load)
    swept = loads[index]
    if not isinstance(swept, PointLoad) or swept.direction is None:
        raise InputError(
            "explore sweep_load", basis.sweep_load, "a load given by magnitude and angle"
        )
    step = basis.sweep_step_deg
    if not (math.isfinite(step) and 0.5 <= step <= 90):
        raise InputError("explore sweep_step", step, "an angle step from 0.5 to 90 deg")
    angles = np.arange(0.0, 360.0 + step / 2, step)
    # Statics is linear in the load: the swept load at angle θ gives
    # cos θ·(its forces at 0°) + sin θ·(its forces at 90°); the other loads do not move.
    present = list(dict.fromkeys(types))
    _, base = forces_by_type(
        [load for i, load in enumerate(loads) if i != index],
        [kind for i, kind in enumerate(types) if i != index],
        length,
        station,
        present,
    )
    unit_forces = []
    for quarter in (0.0, 90.0):
        turned = point_load(
            swept.name,
            z=swept.z,
            magnitude=swept.magnitude,
            angle=Quantity(quarter, "deg"),
            from_axis=swept.direction.from_axis,
            toward_axis=swept.direction.toward_axis,
            ex=swept.ex,
            ey=swept.ey,
        )
        unit_forces.append(forces_by_type([turned], ["swept"], length, station)[1][0])
    radians = np.radians(angles)
    swept_forces = (
        np.cos(radians)[:, None] * unit_forces[0] + np.sin(radians)[:, None] * unit_forces[1]
    )
    by_angle = np.repeat(base[np.newaxis], len(angles), axis=0)  # (angles, types, 6)
    by_angle[:, present.index(types[index])] += swept_forces
    standard = basis.combination_standard
    if standard is not None:
        combos = combinations(standard, present, S_DS=basis.S_DS)
        factors = factor_matrix(combos, present)  # (combos, types)
        combined = np.einsum("ct,atk->ack", factors, by_angle)  # (angles, combos, 6)
    else:
        combined = by_angle.sum(axis=1)[:, np.newaxis, :]
    flat = combined.reshape(-1, 6)
    values = utilizations(section, flat, basis, Fy, length)[0].reshape(combined.shape[:2])
    values = values.max(axis=1)
    drawn = float(swept.direction.angle.to("deg").m) % 360.0
    return Sweep(swept.name, angles, values, drawn)


@dataclass(frozen=True)
class Candidate:
    """A catalog section tried by the lightest-section search."""

    name: str
    weight: pint.Quantity
    utilization: float
    governing_check: str

    @property
    def passes(self) -> bool:
        return self.utilization <= 1.0


@lru_cache(maxsize=8)
def _family_table(family: str) -> tuple[list[str], object]:
    """A family's designations (lightest first) and their table: fixed data, read once."""
    from calcsheet.sections import list_designations
    from calcsheet.standards.aisc360.section_data import catalog_table

    try:
        names = list_designations(family, lightest_first=True)
    except InputError:
        raise InputError(
            "explore lightest_in", family, "a catalog family such as W or HSS_RECT"
        ) from None
    return names, catalog_table(names)


def lightest_section(
    plan: CombinationPlan, basis: DesignBasis, Fy: pint.Quantity, length: pint.Quantity
) -> tuple[Candidate | None, list[Candidate]]:
    """The lightest section of ``basis.lightest_in`` passing every AISC check, and the
    (up to) two lighter sections before it, which fail."""
    from calcsheet.sections.catalog import find_entry

    names, family_table = _family_table(basis.lightest_in or "")
    checks = _aisc_numeric(family_table, plan.forces, basis, Fy, length)
    keys = list(checks)
    table = np.stack([checks[name] for name in keys])  # (checks, sections, combos)
    per_check = table.max(axis=2)  # (checks, sections)
    worst = per_check.max(axis=0)
    which = per_check.argmax(axis=0)

    def candidate(i: int) -> Candidate:
        weight = find_entry(names[i]).values.get("weight", math.nan)
        return Candidate(names[i], Quantity(weight, "lbf/ft"), float(worst[i]), keys[int(which[i])])

    passing = np.flatnonzero(worst <= 1.0)
    if passing.size == 0:
        return None, [candidate(i) for i in range(max(0, len(names) - 2), len(names))]
    first = int(passing[0])
    return candidate(first), [candidate(i) for i in range(max(0, first - 2), first)]


__all__ = [
    "KINDS",
    "Candidate",
    "CombinationPlan",
    "DesignBasis",
    "Sweep",
    "angle_sweep",
    "forces_by_type",
    "lightest_section",
    "plan_combinations",
    "utilizations",
]
