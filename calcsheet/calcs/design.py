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

import dataclasses
import math
from collections.abc import Mapping, Sequence
from dataclasses import dataclass, field

import numpy as np
import pint

from calcsheet.calcs.design_standards import (
    DesignStandard,
    design_standard,
    registered,
)
from calcsheet.errors import InputError
from calcsheet.mechanics import internal_forces
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, point_load
from calcsheet.mechanics.statics import loads_beyond
from calcsheet.sections import Section
from calcsheet.standards.combinations import (
    PSI0_IMPOSED,
    PSI0_WIND,
    SNOW_SITES,
    Combination,
    combinations,
    factor_matrix,
)
from calcsheet.standards.national import RECOMMENDED, NationalChoices, national_choices
from calcsheet.units import Quantity

KINDS = registered()


@dataclass(frozen=True)
class DesignBasis:
    """Which check a member sheet makes, and its settings (defaults as stated)."""

    kind: str = "allowable stress"
    method: str = "LRFD"
    combinations: str | None = None  # None: ASCE 7-22 for AISC, EN 1990 for EN, none else
    factor_of_safety: float = 1.67
    K: float | None = None  # effective length factor; AISC 2.1, EN 2.0 when None
    Lb: pint.Quantity | None = None
    Cb: float | None = None  # None: 1.0, labelled defaulted on the sheet
    # Lateral-torsional buckling: where the load acts on the section ("top flange",
    # "shear centre", "bottom flange"; with EN 1993-1-1 also a length above the shear
    # centre, positive destabilizing) and, for an AISC cantilever, the tip's restraint
    # ("free", "laterally braced", "torsionally restrained"). None: not given (AISC:
    # Lb = L; EN: at the shear centre).
    load_height: str | pint.Quantity | None = None
    tip_restraint: str | None = None
    # Set by the member sheet: a cantilever fixed at z = 0 or not, and how a
    # defaulted Lb and Cb were found on a member on supports ("" when not).
    cantilever: bool = True
    Lb_source: str = ""
    Cb_source: str = ""
    S_DS: float | None = None
    reverse_lateral: bool = False  # wind and earthquake also reversed
    imposed_category: str = "A"  # EN 1990 Table A1.1
    snow_site: str = "H <= 1000 m"  # ψ0 of snow, EN 1990 Table A1.1
    # National choices (EN 1990, EN 1993-1-1): a named set, and single values of it
    # overridden for the job (None: the set's value); see calcsheet.standards.national.
    national_annex: str = RECOMMENDED
    gamma_M0: float | None = None
    gamma_M1: float | None = None
    gamma_M2: float | None = None
    en1990_expression: str | None = None  # "6.10" or "6.10a/b"
    psi0: Mapping[str, float] | None = None  # ψ0 of Q, S or W given directly (EN 1990)
    grade: str = ""
    deflection_ratio: float | None = None  # L/n; None: no deflection check
    sweep_load: str | None = None
    sweep_step_deg: float = 5.0
    lightest_in: str | None = None
    # EN 1993-1-1 6.3.2 and 6.3.3: "6.3.2.2" (general case) or "6.3.2.3" (rolled or
    # equivalent welded); None: 6.3.2.3 for rolled, 6.3.2.2 for welded I-sections.
    ltb_method: str | None = None
    interaction_method: str = "B"  # EN 1993-1-1 6.3.3 factors: Annex "B" or Annex "A"

    def __post_init__(self) -> None:
        standard = design_standard(self.kind)
        if standard.methods and self.method not in standard.methods:
            raise InputError("check method", self.method, " or ".join(standard.methods))
        self.national  # noqa: B018 (refuses an unknown set or a partial factor out of range)
        if self.K is not None and not (math.isfinite(self.K) and self.K > 0):
            raise InputError("check K", self.K, "a positive effective length factor")
        from calcsheet.standards.aisc360.member_lengths import (
            load_height_choice,
            tip_restraint_choice,
        )

        # The spellings the checks read ("shear center" becomes "shear centre").
        height = self.load_height
        if isinstance(height, str):
            try:
                height = load_height_choice(height)
            except InputError:
                if self.kind != "EN 1993-1-1":
                    raise
                # EN 1993-1-1 also takes a length ("50 mm"), read with the section's depth.
        object.__setattr__(self, "load_height", height)
        object.__setattr__(self, "tip_restraint", tip_restraint_choice(self.tip_restraint))
        if self.lightest_in and standard.search is None:
            searchable = [name for name in KINDS if design_standard(name).search is not None]
            raise InputError(
                "explore lightest_in",
                self.lightest_in,
                f"a family to search only with the {', '.join(searchable)} check",
            )

    @property
    def standard(self) -> DesignStandard:
        """The registered standard the checks follow."""
        return design_standard(self.kind)

    @property
    def combination_standard(self) -> str | None:
        """The load-combination standard, or None when loads are taken as given."""
        if self.combinations is not None:
            return None if self.combinations.lower() == "none" else self.combinations
        return self.standard.combination_standard(self.method)

    @property
    def national(self) -> NationalChoices:
        """The national choices in use: the named set with this job's overrides."""
        return national_choices(
            self.national_annex,
            gamma_M0=self.gamma_M0,
            gamma_M1=self.gamma_M1,
            gamma_M2=self.gamma_M2,
            en1990_expression=self.en1990_expression,
            psi0=self.psi0,
            imposed_category=self.imposed_category,
            snow_site=self.snow_site,
        )

    def combination_options(self, load_names: Mapping[str, Sequence[str]] | None = None) -> dict:
        """The keyword options of :func:`combinations` this basis sets."""
        national = self.national
        return {
            "S_DS": self.S_DS,
            "reverse_lateral": self.reverse_lateral,
            "en1990_expression": national.en1990_expression,
            "imposed_category": self.imposed_category,
            "snow_site": self.snow_site,
            "psi0": self._psi0_for_combinations(national),
            "load_names": load_names,
        }

    def _psi0_for_combinations(self, national: NationalChoices) -> dict[str, float] | None:
        """ψ0 the combinations take beyond their own EN 1990 Table A1.1 values: the job's
        overrides, and any value of the national set that differs from the table."""
        parameters = national.parameters
        category = str(self.imposed_category).strip().upper()
        in_set = {
            "Q": parameters.psi_imposed.get(category),
            "S": parameters.psi_snow.get(self.snow_site),
            "W": parameters.psi_wind,
        }
        table = {
            "Q": PSI0_IMPOSED.get(category),
            "S": SNOW_SITES.get(self.snow_site),
            "W": PSI0_WIND,
        }
        given = {
            load_type: psi.psi0
            for load_type, psi in in_set.items()
            if psi is not None and psi.psi0 != table[load_type]
        }
        given.update(self.psi0 or {})
        return given or None

    @property
    def effective_length_factor(self) -> float:
        if self.K is not None:
            return self.K
        return self.standard.effective_length_factor


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
    basis: DesignBasis
    # The utilization of every check under every combination (check key -> (n_combos,)),
    # from the procedure the sheet writes out for the governing combination.
    per_check: dict[str, np.ndarray] = field(default_factory=dict)
    # The forces of every combination at every candidate station (n, 6) when the member
    # was scanned along its length: the lightest-section search covers them all.
    scanned_forces: np.ndarray | None = None

    @property
    def governing_combination(self) -> Combination:
        return self.combos[self.governing]

    @property
    def search_forces(self) -> np.ndarray:
        """The rows of forces a catalog search must pass: every station scanned, or the
        station's combinations."""
        if self.scanned_forces is None:
            return self.forces
        # A station's two sides repeat each other where nothing acts there: once is enough.
        return np.unique(self.scanned_forces, axis=0)


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


def utilizations(
    section: Section,
    forces: np.ndarray,
    basis: DesignBasis,
    Fy: pint.Quantity,
    length: pint.Quantity,
) -> tuple[np.ndarray, dict[str, np.ndarray], str]:
    """Utilization of each row of ``forces`` (n, 6) in N, N·m: the governing one, each
    check's (by key, see :func:`check_titles`), and what the governing one measures.

    The standard's own procedure evaluated on arrays (see :mod:`.design_standards`).
    """
    per_check, measure = basis.standard.evaluate(section, forces, basis, Fy, length)
    if per_check:
        worst = np.max(np.stack(list(per_check.values())), axis=0)
        return worst, per_check, measure
    raise InputError("check kind", basis.kind, "a standard whose checks can be evaluated")


def check_titles(basis: DesignBasis) -> dict[str, str]:
    """The sheet's title of each check key of :func:`utilizations`."""
    return dict(basis.standard.check_titles())


def plan_combinations(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    basis: DesignBasis,
    Fy: pint.Quantity,
    by_type: np.ndarray | None = None,
) -> CombinationPlan | None:
    """Evaluate every combination of the basis; None when loads are taken as given.

    ``by_type`` (types present, 6) gives the internal forces at the station of each
    load type (a member on supports, solved by the frame); by default they are the
    statics of the cantilever's free part.
    """
    standard = basis.combination_standard
    if standard is None:
        return None
    if by_type is None:
        present, by_type = forces_by_type(loads, types, length, station)
    else:
        present = list(dict.fromkeys(types))
    names = {kind: [load.name for load, t in zip(loads, types, strict=True) if t == kind]
             for kind in present}  # fmt: skip
    combos = combinations(standard, present, **basis.combination_options(names))
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
        basis=basis,
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


@dataclass(frozen=True)
class FixedShare:
    """What loads the sweep does not model (distributed loads, self-weight) add.

    ``forces`` (types, 6) at the station in N, N·m by load type ``types``; ``tip``
    the (u, v) tip deflection under them as given, in m. The sweep adds both to
    every angle (the response is linear in the loads).
    """

    types: list[str]
    forces: np.ndarray
    tip: tuple[float, float] = (0.0, 0.0)


def angle_sweep(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    types: Sequence[str],
    length: pint.Quantity,
    station: pint.Quantity,
    basis: DesignBasis,
    Fy: pint.Quantity,
    fixed: FixedShare | None = None,
) -> Sweep:
    """Turn one load (given by magnitude and angle) through 0–360° in its plane.

    ``fixed``: the share of the loads that are not point loads or couples (on a
    cantilever: distributed loads and self-weight), added at every angle.
    """
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
    present = list(dict.fromkeys([*types, *(fixed.types if fixed else ())]))
    _, base = forces_by_type(
        [load for i, load in enumerate(loads) if i != index],
        [kind for i, kind in enumerate(types) if i != index],
        length,
        station,
        present,
    )
    if fixed is not None:
        for row, kind in enumerate(fixed.types):
            base[present.index(kind)] += fixed.forces[row]
    unit_forces = []
    quarters = []
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
        quarters.append(turned)
        unit_forces.append(forces_by_type([turned], ["swept"], length, station)[1][0])
    radians = np.radians(angles)
    swept_forces = (
        np.cos(radians)[:, None] * unit_forces[0] + np.sin(radians)[:, None] * unit_forces[1]
    )
    by_angle = np.repeat(base[np.newaxis], len(angles), axis=0)  # (angles, types, 6)
    by_angle[:, present.index(types[index])] += swept_forces
    standard = basis.combination_standard
    if standard is not None:
        combos = combinations(standard, present, **basis.combination_options())
        factors = factor_matrix(combos, present)  # (combos, types)
        combined = np.einsum("ct,atk->ack", factors, by_angle)  # (angles, combos, 6)
    else:
        combined = by_angle.sum(axis=1)[:, np.newaxis, :]
    flat = combined.reshape(-1, 6)
    values = utilizations(section, flat, basis, Fy, length)[0].reshape(combined.shape[:2])
    values = values.max(axis=1)
    if basis.deflection_ratio:
        turning = (index, quarters, radians)
        tip = fixed.tip if fixed is not None else (0.0, 0.0)
        values = np.maximum(
            values,
            _deflection_utilization(_stiffness_of(section), loads, turning, basis, length, tip),
        )
    drawn = float(swept.direction.angle.to("deg").m) % 360.0
    return Sweep(swept.name, angles, values, drawn)


def _bending_stiffness(designation: str) -> tuple[float, float, float]:
    """I_x, I_y, I_xy (m⁴) of a catalog shape for its deflection: tabulated for a doubly
    symmetric shape (I_xy = 0), from the built section for any other (an angle)."""
    from calcsheet.sections import catalog_section
    from calcsheet.sections.catalog import find_entry, tabulated_properties

    family = find_entry(designation).family
    if family.metric:  # EN sections: the family's table (every one doubly symmetric)
        from calcsheet.standards.en1993.section_table import family_table

        table = family_table(family.key)
        at = table.index(find_entry(designation).designation)
        return (float(table.I_x[at]), float(table.I_y[at]), 0.0)
    if family.key in ("L", "WT", "MT", "ST", "C", "MC"):
        return _stiffness_of(catalog_section(designation))
    table = tabulated_properties(designation)
    return (float(table["Ix"].to("m**4").m), float(table["Iy"].to("m**4").m), 0.0)


def _stiffness_of(section: Section) -> tuple[float, float, float]:
    numbers = section.numeric("m")
    return numbers.Ix, numbers.Iy, numbers.Ixy


def _deflection_utilization(
    stiffness: tuple[float, float, float],
    loads: Sequence[PointLoad | AppliedMoment],
    turning: tuple[int, list[PointLoad], np.ndarray] | None,
    basis: DesignBasis,
    length: pint.Quantity,
    fixed_tip: tuple[float, float] = (0.0, 0.0),
) -> np.ndarray:
    """The tip deflection check (service loads as given) of a section of ``stiffness``
    (I_x, I_y, I_xy in m⁴), optionally with one load turned through angles: the sheet's
    deflection procedure on arrays, one value per angle. ``fixed_tip`` (u, v) in m is
    added to the point loads' tip deflection (the share of distributed loads)."""
    from calcsheet.mechanics.deflection import si_load_terms, tip_deflection_arrays

    terms = [si_load_terms(load) for load in loads]
    radians = np.zeros(1)
    if turning is not None:
        index, quarters, radians = turning
        at_0, at_90 = (si_load_terms(load) for load in quarters)
        # Statics is linear in the load: at angle θ, cos θ·(its terms at 0°) + sin θ·(at 90°).
        terms[index] = dataclasses.replace(
            at_0,
            **{
                name: np.cos(radians) * getattr(at_0, name) + np.sin(radians) * getattr(at_90, name)
                for name in ("F_x", "F_y", "F_z")
            },
        )
    Ix, Iy, Ixy = stiffness
    result = tip_deflection_arrays(
        terms,
        length=float(length.to("m").m),
        E=float(Quantity(basis.standard.modulus).to("Pa").m),
        Ix=Ix,
        Iy=Iy,
        Ixy=Ixy,
        n=basis.deflection_ratio,
    )
    if fixed_tip != (0.0, 0.0):
        total = np.hypot(result.u + fixed_tip[0], result.v + fixed_tip[1])
        limit = float(length.to("m").m) / float(basis.deflection_ratio)
        return np.broadcast_to(np.asarray(total / limit, dtype=float), radians.shape)
    return np.broadcast_to(np.asarray(result.utilization, dtype=float), radians.shape)


# The governing check of a candidate the procedure cannot check (its utilization is
# infinite: class 4, a web that needs a shear buckling verification, an uncovered shape).
OUTSIDE_THE_CHECKS = "outside the checks' scope (e.g. class 4)"


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

    @property
    def weight_text(self) -> str:
        """The weight as its table gives it: lb/ft (AISC) or kg/m (EN sections)."""
        if self.weight.check("[mass] / [length]"):
            return f"{self.weight.to('kg/m').m:g} kg/m"
        return f"{self.weight.to('lbf/ft').m:g} lb/ft"


def lightest_section(
    plan: CombinationPlan,
    basis: DesignBasis,
    Fy: pint.Quantity,
    length: pint.Quantity,
    loads: Sequence[PointLoad | AppliedMoment] = (),
) -> tuple[Candidate | None, list[Candidate]]:
    """The lightest section of ``basis.lightest_in`` passing every check of the standard
    under every combination, and the (up to) two lighter sections before it, which fail.

    With a deflection limit in the basis and the service ``loads``, the tip deflection
    is a check too (the sheet's procedure on each candidate's own section).
    """
    from calcsheet.sections.catalog import find_entry

    search = basis.standard.search
    if search is None:
        raise InputError("explore lightest_in", basis.lightest_in, "a standard with a search")
    names, checks = search(basis.lightest_in or "", plan.search_forces, basis, Fy, length)
    keys = list(checks)
    table = np.stack([checks[name] for name in keys])  # (checks, sections, combos)
    per_check = table.max(axis=2)  # (checks, sections)
    worst = per_check.max(axis=0)
    which = per_check.argmax(axis=0)

    kept: dict[int, float] = {}

    def deflection(i: int) -> float:
        if not (basis.deflection_ratio and loads):
            return 0.0
        if i not in kept:
            kept[i] = float(
                _deflection_utilization(_bending_stiffness(names[i]), loads, None, basis, length)[0]
            )
        return kept[i]

    def candidate(i: int) -> Candidate:
        entry = find_entry(names[i])
        if entry.family.metric:  # EN sections: mass per metre, as the product standards give
            weight = Quantity(entry.values["mass_kg_per_m"], "kg/m")
        else:
            weight = Quantity(entry.values.get("weight", math.nan), "lbf/ft")
        if not np.isfinite(worst[i]):
            return Candidate(names[i], weight, math.inf, OUTSIDE_THE_CHECKS)
        bending = deflection(i)
        if bending > worst[i]:
            return Candidate(names[i], weight, bending, "deflection")
        return Candidate(names[i], weight, float(worst[i]), keys[int(which[i])])

    # Strength first (every section at once), then the deflection of each passing section
    # in order of weight until one passes both: the same checks as the sheet's.
    for first in np.flatnonzero(worst <= 1.0):
        chosen = candidate(int(first))
        if chosen.passes:
            first = int(first)
            return chosen, [candidate(i) for i in range(max(0, first - 2), first)]
    return None, [candidate(i) for i in range(max(0, len(names) - 2), len(names))]


__all__ = [
    "KINDS",
    "Candidate",
    "CombinationPlan",
    "DesignBasis",
    "Sweep",
    "angle_sweep",
    "check_titles",
    "forces_by_type",
    "lightest_section",
    "plan_combinations",
    "utilizations",
]
