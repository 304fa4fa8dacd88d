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
from calcsheet.mechanics.stresses import model_forces
from calcsheet.sections import Section
from calcsheet.units import Quantity

if TYPE_CHECKING:
    from calcsheet.calcs.design import DesignBasis
    from calcsheet.engine import Check, Sheet
    from calcsheet.standards.en1993 import PartialFactors

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
    stresses = stress_model(section, unit).stresses(model_forces(forces, unit))
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
            reference="generic {F_y}/{Omega}; not a specification check",
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
        # The member sheet's model: a cantilever fixed at z = 0, or a member on supports.
        "cantilever": basis.cantilever,
        "load_height": basis.load_height,
        "tip_restraint": basis.tip_restraint,
        "bracing_sources": (basis.Lb_source, basis.Cb_source),
    }


def _aisc_demands(forces: np.ndarray, section: Section | None = None):
    """The demands of each row of forces; with ``section``, the point stresses for H3.3
    (the member sheet's own stress model) unless it is an HSS (H3.1 reads the torque)."""
    from calcsheet.standards.aisc360 import DemandArrays, PointStressDemands
    from calcsheet.standards.aisc360.member_torsion import HSS_KINDS
    from calcsheet.standards.aisc360.section_data import section_kind

    stresses = None
    if section is not None and section_kind(section.family) not in HSS_KINDS:
        unit = section.length_unit
        to_pa = float(Quantity(1.0, f"N/{unit}**2").to("Pa").m)
        points = stress_model(section, unit).stresses(model_forces(forces, unit))
        stresses = PointStressDemands(
            points.sigma.max(axis=-1) * to_pa,
            points.sigma.min(axis=-1) * to_pa,
            points.tau.max(axis=-1) * to_pa,
        )
    return DemandArrays(
        P_r=forces[:, 0], M_rx=forces[:, 4], M_ry=forces[:, 5], V_rx=forces[:, 1],
        V_ry=forces[:, 2], T_r=forces[:, 3], stresses=stresses,
    )  # fmt: skip


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
        _section_table(section),
        _aisc_demands(forces, section),
        **_aisc_arguments(basis, Fy, length),
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
    from calcsheet.standards.aisc360 import Demands, PointStressDemands, Steel, write_aisc_checks

    forces, basis, points = context.forces, context.basis, context.points
    Fy, length = context.material
    arguments = _aisc_arguments(basis, Fy, length)
    arguments["material"] = Steel(F_y=Fy, grade=basis.grade or "steel (F_y as given)")
    return write_aisc_checks(
        context.sheet,
        context.section,
        demands=Demands(
            P_r=forces["N"],
            M_rx=forces["M_x"],
            M_ry=forces["M_y"],
            V_rx=forces["V_x"],
            V_ry=forces["V_y"],
            T_r=forces["T"],
            stresses=PointStressDemands(
                points["sigma_max"], points["sigma_min"], points["tau_gov"]
            ),
        ),
        **arguments,
    )


# --- EN 1993-1-1 ------------------------------------------------------------------------------


def _en_grade(basis: DesignBasis) -> str:
    """The EN 10025 grade that chooses the buckling curves (S355 when none is given)."""
    return basis.grade if basis.grade.upper().startswith("S") else "S355"


def _en_gamma(basis: DesignBasis) -> PartialFactors:
    """γM0, γM1, γM2 of the basis's national set, with the job's overrides."""
    from calcsheet.standards.en1993 import PartialFactors

    national = basis.national
    parameters = national.parameters
    reference = f"{parameters.gamma_reference} ({parameters.name})"
    changed = [item.label for item in national.overridden if item.label.startswith("γM")]
    if changed:
        reference += f"; {', '.join(changed)} overridden for this job (see the design basis)"
    return PartialFactors(
        gamma_M0=national.gamma_M0,
        gamma_M1=national.gamma_M1,
        gamma_M2=national.gamma_M2,
        reference=reference,
    )


def _write_national_basis(sheet: Sheet, basis: DesignBasis) -> None:
    """The codes and the national choices in use, each value recommended or overridden."""
    national = basis.national
    parameters = national.parameters
    sheet.add_basis(
        "Codes and editions",
        "EN 1993-1-1:2005 Eurocode 3: Design of steel structures, Part 1-1 (member checks); "
        "EN 1990:2002+A1:2005 Eurocode: Basis of structural design (load combinations).",
        f'National choices: the set "{parameters.name}", {parameters.source}'
        + (
            "; the values marked overridden are given for this job."
            if national.overridden
            else "; no value overridden."
        ),
    )
    with_psi = basis.combination_standard == "EN 1990"
    if with_psi:
        sheet.add_reference("EN 1990:2002+A1:2005 Eurocode: Basis of structural design")
    sheet.add_basis("Partial factors and national choices", *national.basis_lines(with_psi))


def _en_stability(basis: DesignBasis) -> dict[str, Any]:
    """The basis' options of lateral-torsional buckling (6.3.2) and 6.3.3.

    A cantilever fixed at z = 0 is the procedure's "cantilever"; a member on supports
    is taken as "simply supported" over its length with C1 of a uniform moment (1.0,
    the least of the SN003 table) for a load at the shear centre, or of a uniform load
    (so that C2·z_g counts) for a load off it.
    """
    height = "shear centre" if basis.load_height is None else basis.load_height
    options: dict[str, Any] = {
        "ltb_method": basis.ltb_method,
        "load_height": height,
        "interaction_method": basis.interaction_method,
    }
    if not basis.cantilever:
        options["support_case"] = "simply supported"
        options["moment_diagram"] = "uniform" if height == "shear centre" else "uniform load"
    return options


def _en_evaluate(section, forces, basis, Fy, length) -> Evaluation:
    from calcsheet.standards.en1993 import en1993_checks_numeric, steel

    per_check = en1993_checks_numeric(
        section,
        _en_demands(forces),
        material=steel(_en_grade(basis), f_y=Fy),
        length=length,
        k_eff=basis.effective_length_factor,
        gamma=_en_gamma(basis),
        **_en_stability(basis),
    )  # fmt: skip
    return per_check, "governing EN 1993-1-1 check"


def _en_demands(forces: np.ndarray) -> dict[str, np.ndarray]:
    # EN y-y is our x-x: N, M_y,Ed = M_x, M_z,Ed = M_y, V_z,Ed = V_y, V_y,Ed = V_x; the
    # torque about the member axis is T_Ed.
    return {"N_Ed": forces[:, 0], "M_y_Ed": forces[:, 4], "M_z_Ed": forces[:, 5],
            "V_z_Ed": forces[:, 2], "V_y_Ed": forces[:, 1], "T_Ed": forces[:, 3]}  # fmt: skip


def _en_search(family, forces, basis, Fy, length) -> tuple[list[str], dict[str, np.ndarray]]:
    """Every section of a metric family under every row of forces: the sheet's EN procedure
    on arrays, the sections' values from the family's table (no section is built)."""
    from calcsheet.standards.en1993 import steel
    from calcsheet.standards.en1993.numeric import en1993_checks_prepared
    from calcsheet.standards.en1993.section_table import EN_FAMILIES, family_inputs, family_table

    if str(family).strip().upper() not in EN_FAMILIES:
        raise InputError(
            "explore lightest_in",
            family,
            f"an EN family to search with the EN 1993-1-1 check: {', '.join(EN_FAMILIES)}",
        )
    table = family_table(family)
    member, given, refused = family_inputs(
        table,
        material=steel(_en_grade(basis), f_y=Fy),
        length=length,
        k_eff=basis.effective_length_factor,
        gamma=_en_gamma(basis),
        stability=_en_stability(basis),
    )
    checks = en1993_checks_prepared(member, _en_demands(forces), given, refused)
    return list(table.names), checks


def _en_titles() -> Mapping[str, str]:
    from calcsheet.standards.en1993 import EN_CHECK_TITLES

    return EN_CHECK_TITLES


def _en_write(context: CheckContext) -> list[Check]:
    from calcsheet.standards.en1993 import steel, write_en1993_checks

    sheet, basis, forces = context.sheet, context.basis, context.forces
    Fy, length = context.material
    _write_national_basis(sheet, basis)
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
            "T_Ed": forces["T"],
        },
        material=steel(grade, f_y=Fy),
        length=length,
        k_eff=basis.effective_length_factor,
        gamma=_en_gamma(basis),
        **_en_stability(basis),
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
        search=_en_search,
    )
)
