"""The design standards a member sheet checks against, each registered once.

A :class:`DesignStandard` says everything the member calc needs of a standard:
its name (the job's ``check.kind``), its design methods, the load-combination
standard it goes with, its default effective length factor and modulus, the
titles of its checks, how it writes them on a sheet and how it evaluates the same
procedure on arrays (every load combination, or every section of a catalog
family). The member calc, the job builder and the form look a standard up here by
name instead of switching on strings. Definitions are immutable and know nothing
of the registry; :func:`register` adds one, :func:`design_standard` finds it.

The form's panel for a standard lives with the form (a later stage);
``calcsheet.widgets.checks`` keys its panels by these names, and a test keeps the
two lists equal.
"""

from __future__ import annotations

from collections.abc import Callable, Mapping
from dataclasses import dataclass
from functools import lru_cache
from typing import TYPE_CHECKING, Any

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.mechanics import stress_model
from calcsheet.sections import Section
from calcsheet.units import Quantity

if TYPE_CHECKING:
    from calcsheet.calcs.design import DesignBasis
    from calcsheet.engine import Check, Sheet

GENERIC_CHECK_TITLE = "Von Mises stress, largest over the points"
NOT_A_SPEC_CHECK = (
    "The check below is a generic allowable-stress check of the von Mises stress "
    "against {F_y}/{Omega}. It is NOT a specification check: member stability (buckling, "
    "lateral-torsional buckling), local buckling, connections and fatigue are not covered."
)

# (per-check utilizations by key, each (n_rows,), and what the governing one measures)
Evaluation = tuple[dict[str, np.ndarray], str]


@dataclass(frozen=True)
class CheckContext:
    """What the member sheet has written when its checks are written.

    ``forces``: the internal forces at the station as symbols (N, V_x, V_y, T, M_x,
    M_y); ``points``: the governing point stresses (sigma_vm_max...); ``symbols``:
    the member's inputs (F_y, Omega...); ``material``: F_y and the member length.
    """

    sheet: Sheet
    section: Section
    basis: DesignBasis
    forces: Mapping[str, Any]
    points: Mapping[str, Any]
    symbols: Mapping[str, Any]
    material: tuple[pint.Quantity, pint.Quantity]
    stress_unit: str


@dataclass(frozen=True)
class DesignStandard:
    """One standard as the member calc uses it."""

    name: str
    # The checks are a specification's (False: a generic stress check, said so on the sheet).
    specification: bool
    methods: tuple[str, ...]
    # The load-combination standard by design method ("" when the standard has none).
    combinations: Mapping[str, str | None]
    # K of a fixed-free member when the job gives none, and the modulus the deflection uses.
    effective_length_factor: float
    modulus: str
    check_titles: Callable[[], Mapping[str, str]]
    # Every check under each row of forces (n, 6) in N and N·m: per-check utilizations.
    evaluate: Callable[[Section, np.ndarray, DesignBasis, pint.Quantity, pint.Quantity], Evaluation]
    write: Callable[[CheckContext], list[Check]]
    # Every section of a catalog family under every row of forces: names (lightest first)
    # and per-check utilizations, each (n_sections, n_rows); None: no catalog search.
    search: (
        Callable[
            [str, np.ndarray, DesignBasis, pint.Quantity, pint.Quantity],
            tuple[list[str], dict[str, np.ndarray]],
        ]
        | None
    ) = None

    def combination_standard(self, method: str) -> str | None:
        """The combination standard that goes with this standard and ``method``."""
        return self.combinations.get(method if self.methods else "")


_REGISTRY: dict[str, DesignStandard] = {}


def register(standard: DesignStandard) -> DesignStandard:
    """Add a standard under its name (once)."""
    if standard.name in _REGISTRY:
        raise ValueError(f"design standard {standard.name!r} is registered already")
    _REGISTRY[standard.name] = standard
    return standard


def registered() -> tuple[str, ...]:
    """The names of the registered standards, in the order registered."""
    return tuple(_REGISTRY)


def design_standard(name: str) -> DesignStandard:
    """The standard registered as ``name``; an :class:`InputError` names the choices."""
    try:
        return _REGISTRY[name]
    except KeyError:
        raise InputError("check kind", name, "one of: " + ", ".join(_REGISTRY)) from None


# --- the generic allowable stress check ---------------------------------------------------


def von_mises_ratio(section: Section, forces: np.ndarray, allowable: pint.Quantity) -> np.ndarray:
    """The largest von Mises stress over the points, over an allowable stress, per row."""
    unit = section.length_unit
    metres = float(Quantity(1.0, unit).to("m").m)
    stresses = stress_model(section, unit).stresses(forces / [1, 1, 1, metres, metres, metres])
    vm = stresses.von_mises.max(axis=-1) * float(Quantity(1.0, f"N/{unit}**2").to("Pa").m)
    return vm / float(allowable.to("Pa").m)


def _generic_evaluate(section, forces, basis, Fy, length) -> Evaluation:
    ratio = von_mises_ratio(section, forces, Fy / basis.factor_of_safety)
    return {"von_mises": ratio}, "largest von Mises stress / (F_y/Ω)"


def _generic_write(context: CheckContext) -> list[Check]:
    sheet, symbols = context.sheet, context.symbols
    sheet.heading("Allowable-stress check")
    F_allow = sheet.step(
        "F_allow", symbols["F_y"] / symbols["Omega"], "Generic allowable stress",
        unit=context.stress_unit,
    )  # fmt: skip
    sheet.text(NOT_A_SPEC_CHECK)
    return [
        sheet.check(
            GENERIC_CHECK_TITLE,
            context.points["sigma_vm_max"],
            F_allow,
            reference="generic F_y/Ω; not a specification check",
        )
    ]


# --- AISC 360-22 ------------------------------------------------------------------------------


def _aisc_arguments(basis: DesignBasis, Fy: pint.Quantity, length: pint.Quantity) -> dict:
    from calcsheet.standards.aisc360 import Steel

    return {
        "method": basis.method,
        "material": Steel(F_y=Fy, grade=basis.grade or "steel"),
        "length": length,
        "K": basis.effective_length_factor,
        "Lb": basis.Lb,
        "Cb": basis.Cb,
    }


def _aisc_demands(forces: np.ndarray):
    from calcsheet.standards.aisc360 import DemandArrays

    return DemandArrays(
        P_r=forces[:, 0], M_rx=forces[:, 4], M_ry=forces[:, 5], V_rx=forces[:, 1], V_ry=forces[:, 2]
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


def _aisc_evaluate(section, forces, basis, Fy, length) -> Evaluation:
    from calcsheet.standards.aisc360 import aisc_checks_numeric

    checks = aisc_checks_numeric(
        _section_table(section), _aisc_demands(forces), **_aisc_arguments(basis, Fy, length)
    )
    return {key: values[0] for key, values in checks.items()}, "governing AISC 360-22 check"


@lru_cache(maxsize=8)
def _family_table(family: str) -> tuple[list[str], object]:
    """A family's designations (lightest first) and their table: fixed data, read once."""
    from calcsheet.sections import list_designations
    from calcsheet.standards.aisc360.section_data import catalog_table

    try:
        names = list_designations(family, lightest_first=True)
        return names, catalog_table(names)
    except InputError:
        raise InputError(
            "explore lightest_in", family, "a catalog family of AISC shapes such as W or HSS_RECT"
        ) from None


def _aisc_search(family, forces, basis, Fy, length) -> tuple[list[str], dict[str, np.ndarray]]:
    from calcsheet.standards.aisc360 import aisc_checks_numeric

    names, table = _family_table(family)
    checks = aisc_checks_numeric(table, _aisc_demands(forces), **_aisc_arguments(basis, Fy, length))
    return names, checks


def _aisc_titles() -> Mapping[str, str]:
    from calcsheet.standards.aisc360 import CHECK_TITLES

    return CHECK_TITLES


def _aisc_write(context: CheckContext) -> list[Check]:
    from calcsheet.standards.aisc360 import Demands, Steel, write_aisc_checks

    forces, basis = context.forces, context.basis
    Fy, length = context.material
    return write_aisc_checks(
        context.sheet,
        context.section,
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


# --- EN 1993-1-1 ------------------------------------------------------------------------------


def _en_grade(basis: DesignBasis) -> str:
    """The EN 10025 grade that chooses the buckling curves (S355 when none is given)."""
    return basis.grade if basis.grade.upper().startswith("S") else "S355"


def _en_gamma(basis: DesignBasis) -> dict[str, float]:
    return {"gamma_M0": basis.gamma_M0, "gamma_M1": basis.gamma_M1}


def _en_evaluate(section, forces, basis, Fy, length) -> Evaluation:
    from calcsheet.standards.en1993 import en1993_checks_numeric, steel

    per_check = en1993_checks_numeric(
        section,
        # EN y-y is our x-x: N, M_y,Ed = M_x, M_z,Ed = M_y, V_z,Ed = V_y, V_y,Ed = V_x.
        {"N_Ed": forces[:, 0], "M_y_Ed": forces[:, 4], "M_z_Ed": forces[:, 5],
         "V_z_Ed": forces[:, 2], "V_y_Ed": forces[:, 1]},
        material=steel(_en_grade(basis), f_y=Fy),
        length=length,
        k_eff=basis.effective_length_factor,
        gamma=_en_gamma(basis),
    )  # fmt: skip
    return per_check, "governing EN 1993-1-1 check"


def _en_titles() -> Mapping[str, str]:
    from calcsheet.standards.en1993 import EN_CHECK_TITLES

    return EN_CHECK_TITLES


def _en_write(context: CheckContext) -> list[Check]:
    from calcsheet.standards.en1993 import steel, write_en1993_checks

    sheet, basis, forces = context.sheet, context.basis, context.forces
    Fy, length = context.material
    grade = _en_grade(basis)
    if grade != basis.grade:
        sheet.text(
            f"No EN 10025 grade given: buckling curves are chosen as for {grade} "
            "(Table 6.2), with {f_y} as given."
        )
    # EN 1993-1-1 names the strong axis y-y: our M_x is its M_y,Ed, our V_y its V_z,Ed.
    return write_en1993_checks(
        sheet,
        context.section,
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
        gamma=_en_gamma(basis),
    )


ALLOWABLE_STRESS = register(
    DesignStandard(
        name="allowable stress",
        specification=False,
        methods=(),
        combinations={"": None},
        effective_length_factor=2.0,
        modulus="29000 ksi",
        check_titles=lambda: {"von_mises": GENERIC_CHECK_TITLE},
        evaluate=_generic_evaluate,
        write=_generic_write,
    )
)
AISC_360_22 = register(
    DesignStandard(
        name="AISC 360-22",
        specification=True,
        methods=("LRFD", "ASD"),
        combinations={"LRFD": "ASCE 7-22 strength", "ASD": "ASCE 7-22 ASD"},
        # Fixed-free: AISC Commentary Table C-A-7.1 recommends 2.1 (from memory).
        effective_length_factor=2.1,
        # AISC 360-22 Symbols: E = 29,000 ksi.
        modulus="29000 ksi",
        check_titles=_aisc_titles,
        evaluate=_aisc_evaluate,
        write=_aisc_write,
        search=_aisc_search,
    )
)
EN_1993_1_1 = register(
    DesignStandard(
        name="EN 1993-1-1",
        specification=True,
        methods=(),
        combinations={"": "EN 1990"},
        # EN 1993-1-1 has no table of K; 2.0 is the theoretical fixed-free value
        # (common practice, no source).
        effective_length_factor=2.0,
        # EN 1993-1-1 3.2.6(1): E = 210,000 N/mm².
        modulus="210000 MPa",
        check_titles=_en_titles,
        evaluate=_en_evaluate,
        write=_en_write,
    )
)
