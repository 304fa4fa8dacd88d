"""The design parts of the member sheet: combinations, specification checks, exploration.

Written with the engine's public API like the rest of the member sheet. The
combination table and the exploration are computed when the sheet is built (they
say so); the governing combination's factors are inputs fixed with that reason,
so a change that could move the governing combination rebuilds the sheet.
"""

from __future__ import annotations

from collections.abc import Sequence

import numpy as np
import pint
import sympy as sp

from calcsheet.calcs.design import (
    CombinationPlan,
    DesignBasis,
    angle_sweep,
    lightest_section,
    plan_combinations,
)
from calcsheet.engine import Check, Sheet
from calcsheet.figures.chart import sweep_chart
from calcsheet.mechanics.loads import AppliedMoment, PointLoad
from calcsheet.sections import Section
from calcsheet.units import Quantity, format_number, ureg

CHOSEN_AT_BUILD = (
    "the governing combination was chosen when the sheet was built; build the sheet again "
    "after changing the loads"
)
_FORCE_COLUMNS = (("N", "force"), ("V_x", "force"), ("V_y", "force"), ("T", "moment"),
                  ("M_x", "moment"), ("M_y", "moment"))  # fmt: skip


CHECK_TITLES = {
    "axial": "Axial force",
    "flexure_x": "Flexure about x",
    "flexure_y": "Flexure about y",
    "shear_x": "Shear along x",
    "shear_y": "Shear along y",
    "combined": "Combined axial force and flexure",
}


def _named(combo) -> str:
    """The combination's name, with its factors unless the name already shows them."""
    text = combo.text()
    return combo.name if combo.name.endswith(text) else f"{combo.name}: {text}"


def _unit(unit: str) -> str:
    return f"{ureg.Unit(unit):~P}"


def _shown(value: float, unit: str, si_unit: str) -> str:
    number = format_number(float(Quantity(value, si_unit).to(unit).m))
    return number.plain().replace("-", "−")


def write_combinations(
    sheet: Sheet,
    plan: CombinationPlan,
    types: Sequence[str],
    free_suffixes: Sequence[str],
    preset: dict[str, str],
) -> dict[str, sp.Symbol]:
    """The envelope table and the governing combination's load factors (by load suffix)."""
    sheet.heading(f"Load combinations ({plan.standard})")
    force_unit, moment_unit = preset["force"], preset["moment"]
    rows = []
    for index, combo in enumerate(plan.combos):
        forces = plan.forces[index]
        cells = [
            _shown(forces[k], force_unit if kind == "force" else moment_unit,
                   "N" if kind == "force" else "N*m")
            for k, (_, kind) in enumerate(_FORCE_COLUMNS)
        ]  # fmt: skip
        mark = " (governs)" if index == plan.governing else ""
        rows.append([_named(combo) + mark, *cells, f"{plan.utilization[index]:.3f}"])
    sheet.table(
        ["Combination", *(name for name, _ in _FORCE_COLUMNS), "Utilization"],
        rows,
        caption=(
            f"Internal forces at the station for every combination ({_unit(force_unit)}, "
            f"{_unit(moment_unit)}) and the {plan.measure}, computed when the sheet was built"
        ),
    )
    if plan.per_check:
        from calcsheet.standards.en1993 import EN_CHECK_TITLES

        titles = EN_CHECK_TITLES if "EN 1993-1-1" in plan.measure else CHECK_TITLES
        rows = []
        for check, values in plan.per_check.items():
            worst = int(np.argmax(values))
            shown = f"{values[worst]:.3f}" if np.isfinite(values[worst]) else "∞"
            rows.append([titles.get(check, check), plan.combos[worst].name, shown])
        sheet.table(
            ["Check", "Governing combination", "Utilization"],
            rows,
            caption=(
                "The combination that governs each check (the same clauses evaluated for "
                "every combination when the sheet was built); the sheet writes out the "
                "combination that governs overall"
            ),
        )
    chosen = plan.governing_combination
    sheet.text(
        f"Governing combination: {_named(chosen)} ({plan.measure} "
        f"{plan.utilization[plan.governing]:.3f}). Its load factors multiply each load in "
        "the statics below; every other combination gives a lower utilization."
    )
    factor_symbols: dict[str, sp.Symbol] = {}
    for load_type in dict.fromkeys(types):
        factor_symbols[load_type] = sheet.input(
            f"gamma_{load_type}",
            chosen.factor(load_type),
            f"Load factor on {load_type} in {chosen.name}",
            dimension="dimensionless",
            reference=chosen.reference,
            fixed=CHOSEN_AT_BUILD,
        )
    return {suffix: factor_symbols[types[int(suffix) - 1]] for suffix in free_suffixes}


def write_standard_checks(
    sheet: Sheet,
    section: Section,
    basis: DesignBasis,
    forces: dict[str, sp.Symbol],
    material: tuple[pint.Quantity, pint.Quantity],
) -> list[Check]:
    """The specification checks of ``basis.kind`` under the internal forces written above."""
    Fy, length = material
    if basis.kind == "AISC 360-22":
        from calcsheet.standards.aisc360 import Demands, Steel, write_aisc_checks

        return write_aisc_checks(
            sheet,
            section,
            demands=Demands(
                P_r=forces["N"],
                M_rx=forces["M_x"],
                M_ry=forces["M_y"],
                V_rx=forces["V_x"],
                V_ry=forces["V_y"],
            ),
            method=basis.method,
            material=Steel(F_y=Fy, grade=basis.grade or "steel (F_y as given)"),
            length=length,
            K=basis.effective_length_factor,
            Lb=basis.Lb,
            Cb=basis.Cb,
        )
    from calcsheet.standards.en1993 import steel, write_en1993_checks

    grade = basis.grade if basis.grade.upper().startswith("S") else "S355"
    if grade != basis.grade:
        sheet.text(
            f"No EN 10025 grade given: buckling curves are chosen as for {grade} "
            "(Table 6.2), with f_y as given."
        )
    # EN 1993-1-1 names the strong axis y-y: our M_x is its M_y,Ed, our V_y its V_z,Ed.
    return write_en1993_checks(
        sheet,
        section,
        demands={
            "N_Ed": forces["N"],
            "M_y_Ed": forces["M_x"],
            "M_z_Ed": forces["M_y"],
            "V_z_Ed": forces["V_y"],
            "V_y_Ed": forces["V_x"],
        },
        material=steel(grade, f_y=Fy),
        length=length,
        k_eff=basis.effective_length_factor,
        gamma={"gamma_M0": basis.gamma_M0, "gamma_M1": basis.gamma_M1},
    )


def write_exploration(
    sheet: Sheet,
    section: Section,
    loading: tuple[Sequence[PointLoad | AppliedMoment], Sequence[str]],
    geometry: tuple[pint.Quantity, pint.Quantity],
    basis: DesignBasis,
    Fy: pint.Quantity,
    plan: CombinationPlan | None,
) -> None:
    """The load-direction sweep and the lightest-section search, when the basis asks."""
    loads, types = loading
    length, station = geometry
    if basis.sweep_load:
        sweep = angle_sweep(section, loads, types, length, station, basis, Fy)
        sheet.heading(f"Design exploration: direction of {sweep.load}")
        drawn = sweep.drawn_utilization
        sheet.text(
            f"The load {sweep.load} is turned through 0–360° in its plane in steps of "
            f"{basis.sweep_step_deg:g}°, magnitude and point of application unchanged, and the "
            f"governing utilization is found for each angle (computed when the sheet was "
            f"built). Worst angle {sweep.worst_deg:g}°: {sweep.utilization.max():.3f}; "
            f"drawn angle {sweep.drawn_deg:g}°: {drawn:.3f}."
        )
        sheet.figure(
            sweep_chart(
                sweep.angles_deg,
                sweep.utilization,
                drawn=(sweep.drawn_deg, drawn),
                title=f"Utilization against the angle of {sweep.load}",
            ),
            f"Governing utilization against the angle of {sweep.load}.",
        )
    if basis.lightest_in:
        if plan is None:
            plan = plan_combinations(section, loads, types, length, station, basis, Fy)
        chosen, lighter = lightest_section(plan, basis, Fy, length)
        sheet.heading(f"Design exploration: lightest {basis.lightest_in} section")
        rows = [
            [
                candidate.name,
                f"{candidate.weight.to('lbf/ft').m:g} lb/ft",
                f"{candidate.utilization:.3f}" if np.isfinite(candidate.utilization) else "—",
                candidate.governing_check.replace("_", " "),
                "passes" if candidate.passes else "fails",
            ]
            for candidate in [*lighter, *([chosen] if chosen else [])]
        ]
        sheet.table(
            ["Section", "Weight", "Utilization", "Governing check", "Result"],
            rows,
            caption=(
                "The lightest section of the family passing every AISC 360-22 check under "
                "every combination, and the next lighter ones with why they fail "
                "(computed when the sheet was built; only this sheet's section is written "
                "out step by step)"
            ),
        )
        if chosen is None:
            sheet.text(f"No {basis.lightest_in} section passes every check.")
