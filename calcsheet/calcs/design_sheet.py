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
    FixedShare,
    angle_sweep,
    check_titles,
    lightest_section,
    plan_combinations,
)
from calcsheet.engine import Check, CheckList, Heading, Input, Prose, Sheet, Step
from calcsheet.figures.chart import sweep_chart
from calcsheet.mechanics.deflection import CHECK_KEY as DEFLECTION_KEY
from calcsheet.mechanics.deflection import CHECK_TITLE as DEFLECTION_TITLE
from calcsheet.mechanics.loads import AppliedMoment, PointLoad
from calcsheet.sections import Section, family_title
from calcsheet.standards.combinations import combination_rules_text
from calcsheet.units import Quantity, format_number, ureg

CHOSEN_AT_BUILD = (
    "the governing combination was chosen when the sheet was built; build the sheet again "
    "after changing the loads"
)
# Table headers as the sheet's equations set the symbols ({M_x}: see engine.marked_text).
_FORCE_COLUMNS = (("{N}", "force"), ("{V_x}", "force"), ("{V_y}", "force"), ("{T}", "moment"),
                  ("{M_x}", "moment"), ("{M_y}", "moment"))  # fmt: skip


# Concise detail writes a limit state out in full when it governs, or when its utilization
# is at least FULL_ABOVE; when the governing one is itself at least FULL_ABOVE, also
# those within FULL_WITHIN of it (a close second matters only near the limit).
FULL_ABOVE = 0.5
FULL_WITHIN = 0.8

__all__ = [
    "condense_checks",
    "write_check_cases",
    "write_combinations",
    "write_exploration",
]


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
    preset: dict[str, str],
) -> dict[str, sp.Symbol]:
    """The envelope table and the governing combination's load factors (by load type)."""
    sheet.heading(f"Load combinations ({plan.standard})")
    sheet.text(
        combination_rules_text(plan.standard, plan.types, **plan.basis.combination_options())
    )
    force_unit, moment_unit = preset["force"], preset["moment"]
    rows = []
    # Rounding noise of the statics (cos 90° is 6e-17, not 0) prints as 0.
    noise = 1e-12 * float(np.abs(plan.forces).max(initial=0.0))
    shown_forces = np.where(np.abs(plan.forces) <= noise, 0.0, plan.forces)
    for index, combo in enumerate(plan.combos):
        forces = shown_forces[index]
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
        _write_check_matrix(sheet, plan)
    chosen = plan.governing_combination
    sheet.text(
        "Governing combination: "
        f"{_named(chosen)} ({plan.measure} {plan.utilization[plan.governing]:.3f}). Its load "
        "factors multiply each load in the statics below; every other combination gives a "
        "lower governing utilization. Where another combination governs a single check, the "
        "summary names it with its utilization."
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
    return factor_symbols


def _shown_utilization(value: float) -> str:
    return f"{value:.3f}" if np.isfinite(value) else "∞"


def _write_check_matrix(sheet: Sheet, plan: CombinationPlan) -> None:
    """Every check under every combination, numbered columns with a key below."""
    titles = check_titles(plan.basis)
    keys = list(plan.per_check)
    rows = []
    for index, combo in enumerate(plan.combos):
        cells = [_shown_utilization(float(plan.per_check[key][index])) for key in keys]
        mark = " (governs)" if index == plan.governing else ""
        rows.append([_named(combo) + mark, *cells])
    worst = ["Worst", *(_shown_utilization(float(np.max(plan.per_check[key]))) for key in keys)]
    sheet.table(
        ["Combination", *(f"({number})" for number in range(1, len(keys) + 1))],
        [*rows, worst],
        caption=(
            "Utilization of each check under each combination (the procedure written out "
            "below, computed when the sheet was built): "
            + "; ".join(
                f"({number}) {titles.get(key, key)}" for number, key in enumerate(keys, start=1)
            )
        ),
    )


def write_check_cases(
    sheet: Sheet, plan: CombinationPlan, checks: Sequence[Check], station: pint.Quantity
) -> None:
    """Give each written check the worst of its utilizations over every combination."""
    titles = check_titles(plan.basis)
    by_title = {check.description: check for check in checks}
    where = f"z = {format_number(float(station.m)).plain()} {_unit(str(station.units))}"
    for key, values in plan.per_check.items():
        check = by_title.get(titles.get(key, ""))
        if check is None:
            continue
        worst = int(np.argmax(values))
        combination = _named(plan.combos[worst])
        sheet.set_cases(
            check,
            float(values[worst]),
            f"{combination}, station {where}",
            len(plan.combos),
            combination=combination,
            station=station,
        )


def condense_checks(sheet: Sheet, first: int, checks: Sequence[Check]) -> None:
    """Concise detail for a specification chapter (``sheet.parts[first:]``, its ``checks``).

    The limit states that govern (see :data:`FULL_ABOVE`, :data:`FULL_WITHIN`) stay
    written out step by step, with every step their values rest on and every step that
    settled a decision (a classification, which equation applies). Every other check
    gets one line in a table (demand, capacity, utilization, worst combination, clause),
    its own steps evaluated by the same procedure without being printed; a subsection
    left with nothing shown loses its heading and words.
    """
    rated = [(check.worst_utilization or 0.0, check) for check in checks]
    if not rated:
        return
    top = max(utilization for utilization, _ in rated)
    governing = next(check for utilization, check in rated if utilization == top)
    full = [
        check
        for utilization, check in rated
        if check is governing
        or utilization >= FULL_ABOVE
        or (top >= FULL_ABOVE and utilization >= FULL_WITHIN * top)
    ]
    rest = [check for check in checks if all(check is not chosen for chosen in full)]
    if not rest:
        return
    chapter = sheet.parts[first:]
    needed = sheet.rests_on(
        [*(c.demand for c in full), *(c.capacity for c in full), *sheet.decided]
    )
    for part in chapter:
        if isinstance(part, Step) and part.shown and part.symbol not in needed:
            part.shown = False
    for check in rest:
        check.shown = False
    kept = _without_empty_subsections(chapter)
    names = ", ".join(f"{c.description} ({c.worst_utilization or 0.0:.3f})" for c in full)
    note = Prose(
        f"Written out in full above: {names}: the limit state with the largest utilization, "
        f"any at {FULL_ABOVE:g} or more and, when the largest is {FULL_ABOVE:g} or more, any "
        f"within {100 * (1 - FULL_WITHIN):g} % of it. "
        "Each other limit state is evaluated by the same procedure (the steps only it needs "
        'are not printed; detail "full" prints them) and given one line below.'
    )
    last_shown = max(
        index for index, part in enumerate(kept) if isinstance(part, Check) and part.shown
    )
    table = CheckList(
        rest, "Limit states not written out step by step, each evaluated by the same procedure"
    )
    kept[last_shown + 1 : last_shown + 1] = [note, table]
    sheet.parts[first:] = kept


def _without_empty_subsections(parts: list) -> list:
    """The parts less the heading and words of each subsection whose steps and checks are
    all hidden, and the heading of a subsection of inputs only (the inputs table lists them)."""
    kept: list = []
    section: list = []

    def close() -> None:
        computed = [p for p in section if isinstance(p, (Step, Check))]
        if computed and not any(p.shown for p in computed):
            section[:] = [p for p in section if not isinstance(p, (Heading, Prose))]
        elif all(isinstance(p, (Heading, Input)) for p in section):
            section[:] = [p for p in section if isinstance(p, Input)]
        kept.extend(section)
        section.clear()

    for part in parts:
        if isinstance(part, Heading):
            close()
        section.append(part)
    close()
    return kept


def write_exploration(
    sheet: Sheet,
    section: Section,
    loading: tuple[Sequence[PointLoad | AppliedMoment], Sequence[str]],
    geometry: tuple[pint.Quantity, pint.Quantity],
    basis: DesignBasis,
    Fy: pint.Quantity,
    plan: CombinationPlan | None,
    fixed: FixedShare | None = None,
) -> None:
    """The load-direction sweep and the lightest-section search, when the basis asks.

    ``fixed``: on a cantilever, the share of the distributed loads and self-weight,
    which the sweep adds at every angle.
    """
    loads, types = loading
    length, station = geometry
    if basis.sweep_load:
        sweep = angle_sweep(section, loads, types, length, station, basis, Fy, fixed)
        sheet.heading(f"Design exploration: direction of {sweep.load}")
        drawn = sweep.drawn_utilization
        sheet.text(
            f"The load {sweep.load} is turned through 0–360° in its plane in steps of "
            f"{basis.sweep_step_deg:g}°, magnitude and point of application unchanged, and the "
            f"governing utilization of every check (every combination"
            f"{', the tip deflection under the loads as given' if basis.deflection_ratio else ''}"
            f") is found for each angle (computed when the sheet was built). Worst angle "
            f"{sweep.worst_deg:g}°: {sweep.utilization.max():.3f}; "
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
        chosen, lighter = lightest_section(plan, basis, Fy, length, loads)
        sheet.heading(f"Design exploration: lightest of the {family_title(basis.lightest_in)}")
        titles = {**check_titles(basis), DEFLECTION_KEY: DEFLECTION_TITLE}
        rows = [
            [
                candidate.name,
                candidate.weight_text,
                f"{candidate.utilization:.3f}" if np.isfinite(candidate.utilization) else "—",
                titles.get(candidate.governing_check, candidate.governing_check),
                "passes" if candidate.passes else "fails",
            ]
            for candidate in [*lighter, *([chosen] if chosen else [])]
        ]
        sheet.table(
            ["Section", "Weight", "Utilization", "Governing check", "Result"],
            rows,
            caption=(
                f"The lightest section of the family passing every {basis.kind} check "
                + ("and the tip deflection " if basis.deflection_ratio else "")
                + "under every combination, and the next lighter ones with why they fail "
                "(computed when the sheet was built; only this sheet's section is written out)"
            ),
        )
        if chosen is None:
            sheet.text(f"None of the {family_title(basis.lightest_in)} passes every check.")
        if np.any(np.abs(plan.forces[:, 3]) > 0):
            # The other sections' twist is not solved: the search's torsion is St Venant's.
            sheet.text(
                "The member carries a torque: the search takes the other sections' torsion "
                "as St Venant torsion only (their warping stresses are not computed). "
                "Build the chosen section's own sheet before adopting it."
            )
