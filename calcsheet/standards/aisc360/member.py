"""AISC 360-22 member checks on a sheet: :func:`write_aisc_checks`.

For a rolled I-shape (W, M, S, HP), a rectangular or square HSS, a round HSS or
pipe, or an equal-leg single angle, the sheet gets the inputs the checks need
(material, lengths, section values with their sources), the classification of
the elements, the nominal and available strengths, the P-δ multipliers B1
(Appendix 8) and one check per action plus the interaction of Chapter H.

:class:`Demands` are symbols the sheet already has: required strengths already
factored (LRFD) or combined (ASD). Signs: P_r tension positive; M_rx about x,
M_ry about y; V_rx along x, V_ry along y (the member sheet's N, M_x, M_y, V_x,
V_y). For a W shape, V_ry is resisted by the web and V_rx by the flanges.

The procedure is written once, :func:`aisc_member_procedure`, against a writer:
:func:`write_aisc_checks` prints it on a sheet, and
:func:`~calcsheet.standards.aisc360.numeric.aisc_checks_numeric` evaluates it on
arrays of sections and load combinations for the searches.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass, fields

import numpy as np
import pint
import sympy as sp

from calcsheet.engine import Check, Sheet, as_written, escape_marks
from calcsheet.engine.procedure import SheetWriter, Writer
from calcsheet.errors import DefinitionError, InputError
from calcsheet.sections import Section
from calcsheet.standards.aisc360 import combined, shear
from calcsheet.standards.aisc360 import second_order as appendix8
from calcsheet.standards.aisc360.factors import design_method
from calcsheet.standards.aisc360.inputs import (
    A992,
    MODULI_REFERENCE,
    MemberInputs,
    Steel,
    parse_member_inputs,
)
from calcsheet.standards.aisc360.member_angle import write_single_angle
from calcsheet.standards.aisc360.member_common import Strengths
from calcsheet.standards.aisc360.member_hss import write_rectangular_hss, write_round_hss
from calcsheet.standards.aisc360.member_i import write_i_shape
from calcsheet.standards.aisc360.member_lengths import (
    LateralBracing,
    lateral_bracing,
    write_bracing_inputs,
)
from calcsheet.standards.aisc360.member_torsion import (
    HSS_KINDS,
    TORSION_TITLES,
    InteractionTerms,
    PointStressDemands,
    write_hss_torsion,
    write_open_section_stresses,
)
from calcsheet.standards.aisc360.numeric import scope_problem
from calcsheet.standards.aisc360.section_data import SUPPORTED, section_kind, section_values
from calcsheet.standards.aisc360.writing import (
    MATERIAL_FIXED,
    SPECIFICATION,
    write_section_values,
)

SPECIFICATION_TITLE = "ANSI/AISC 360-22, Specification for Structural Steel Buildings (AISC, 2022)"
_WRITERS: dict[str, Callable[[Writer], Strengths]] = {
    "I": write_i_shape,
    "HSS_RECT": write_rectangular_hss,
    "HSS_ROUND": write_round_hss,
    "L": write_single_angle,
}


@dataclass(frozen=True)
class Demands:
    """Required strengths at the section checked, as symbols (or expressions) of the sheet.

    Already factored (LRFD) or combined (ASD) for the design method of the checks.

    * ``P_r`` axial force, tension positive;
    * ``M_rx``, ``M_ry`` moments about x and y (either sign: magnitudes are checked);
    * ``V_rx``, ``V_ry`` shears along x and y (either sign);
    * ``T_r`` the torque (either sign), None: torsion not checked;
    * ``stresses`` the largest normal and shear stresses over the section's points
      (for the H3.3 checks of I-shapes and angles), None: not checked.
    """

    P_r: sp.Basic
    M_rx: sp.Basic
    M_ry: sp.Basic
    V_rx: sp.Basic
    V_ry: sp.Basic
    T_r: sp.Basic | None = None
    stresses: PointStressDemands | None = None


def write_aisc_checks(
    sheet: Sheet,
    section: Section,
    *,
    demands: Demands,
    method: str,
    material: Steel = A992,
    length: pint.Quantity | str,
    K: float | str = appendix8.K_FIXED_FREE,
    Lb: pint.Quantity | str | None = None,
    Cb: float | str | None = None,
    Cm: float | str = 1.0,
    second_order: bool = True,
    cantilever: bool = True,
    load_height: str | None = None,
    tip_restraint: str | None = None,
    bracing_sources: tuple[str, str] = ("", ""),
) -> list[Check]:
    """Write the AISC 360-22 strength checks of ``section`` on ``sheet``; return the checks.

    ``method`` is "LRFD" or "ASD". ``length`` is the member length L, ``K`` the
    effective length factor about both axes (default 2.1, fixed-free), ``Lb`` the
    laterally unbraced length, ``Cb`` the LTB modification factor (default 1.0),
    ``Cm`` the Appendix 8 factor for B1. With ``second_order=False`` the moments are
    taken as already second-order (no B1). ``cantilever``: the member is fixed at one
    end and free at the other; for a cantilever I-shape, ``load_height`` ("top
    flange", "shear centre", "bottom flange") and ``tip_restraint`` ("free",
    "laterally braced", "torsionally restrained") default Lb to the cantilever's
    effective length (see :mod:`.member_lengths`); otherwise Lb defaults to L.

    Bad input raises :class:`InputError` naming the field; a section family or a
    section outside what is covered raises it before anything is written.
    """
    chosen = design_method(method)
    kind = section_kind(section.family)
    values = section_values(section)
    inputs = parse_member_inputs(material, length, K, Lb, 1.0 if Cb is None else Cb, Cm)
    bracing = lateral_bracing(
        kind,
        Lb_given=Lb is not None,
        Cb_given=Cb is not None,
        cantilever=cantilever,
        load_height=load_height,
        tip_restraint=tip_restraint,
        sources=bracing_sources,
    )
    _check_scope(kind, values, inputs, section.name)
    for item in fields(Demands):
        given = getattr(demands, item.name)
        optional = item.name in ("T_r", "stresses") and given is None
        if not (optional or isinstance(given, sp.Basic | PointStressDemands)):
            raise DefinitionError(
                f"AISC 360-22 checks: demand {item.name} must be a symbol of the sheet"
            )
    w = SheetWriter(sheet, chosen)
    sheet.add_basis("Codes and editions", f"{SPECIFICATION_TITLE}, {chosen}.")
    sheet.add_basis(
        "Material",
        f"{escape_marks(inputs.grade)}: {{F_y}}, {{E}} (and {{G}}) as listed in the inputs.",
    )
    sheet.add_reference(SPECIFICATION_TITLE)
    with as_written():
        sheet.heading(f"Member strength to AISC 360-22 ({chosen})")
        sheet.text(
            "Required strengths: {P_r} axial (tension positive), {M_rx} and {M_ry} about x and "
            "y, {V_rx} and {V_ry} along x and y, already "
            f"{'factored' if chosen == 'LRFD' else 'combined'} for {chosen}. "
            f"{_torsion_scope(kind, demands)} Connections are not checked here."
        )
        aisc_member_procedure(
            w, kind, values, inputs, demands, second_order, name=section.name, bracing=bracing
        )
    return list(w.checks.values())


def aisc_member_procedure(
    w: Writer,
    kind: str,
    values: dict,
    inputs: MemberInputs,
    demands: Demands,
    second_order: bool,
    *,
    name: str = "",
    bracing: LateralBracing | None = None,
) -> None:
    """The AISC 360-22 member checks, written once for both writers.

    ``values``: the section values (:class:`SectionValue` for a sheet, arrays for an
    array writer); ``demands``: the required strengths (symbols or arrays). The
    checks end up in ``w.checks`` under the keys of :data:`CHECK_TITLES`.
    ``bracing``: whether Lb and Cb were given, and the cantilever's inputs (None:
    both given, not a cantilever).
    """
    _write_member_inputs(w, inputs, kind, second_order, bracing or LateralBracing())
    w.heading(f"Section {w.literal(name)}".strip(), 2)
    write_section_values(w, values)
    strengths = _WRITERS[kind](w)
    _write_demand_side(w, kind, strengths, demands, second_order)


# The checks of the procedure by key, as titled on the sheet.
CHECK_TITLES = {
    "buckling_x": "Axial compression below the elastic buckling load about x",
    "buckling_y": "Axial compression below the elastic buckling load about y",
    "axial": "Axial force",
    "flexure_x": "Flexure about x",
    "flexure_y": "Flexure about y",
    "shear": "Shear (resultant)",
    "shear_x": "Shear along x",
    "shear_y": "Shear along y",
    "combined": "Combined axial force and flexure",
    **TORSION_TITLES,
}


def _torsion_scope(kind: str, demands: Demands) -> str:
    """What the sheet says of torsion (AISC 360-22 Section H3) for this member."""
    if kind in HSS_KINDS:
        if demands.T_r is None:
            return "Torsion (H3) is not checked here."
        return "Torsion: H3.1 and H3.2 with the torque {T_r}."
    if demands.stresses is None or demands.T_r is None:
        return "Torsion (H3) is not checked here."
    return "Torsion: H3.3 with the point stresses of the section under the torque {T_r}."


def _check_scope(kind: str, values: dict, inputs: MemberInputs, name: str) -> None:
    arrays = {key: np.array([[float(v.quantity.to_base_units().m)]]) for key, v in values.items()}
    outside, reason = scope_problem(
        kind, arrays, float(inputs.E.to("Pa").m), float(inputs.F_y.to("Pa").m)
    )
    if bool(np.any(outside)):
        raise InputError("section", name, f"{SUPPORTED}, within the scope of the checks", reason)


def _write_member_inputs(
    w: Writer, inputs: MemberInputs, kind: str, second_order: bool, bracing: LateralBracing
) -> None:
    w.heading("Material and member", 2)
    w.input(
        "E",
        inputs.E,
        "Modulus of elasticity of steel",
        reference=MODULI_REFERENCE,
        dimension="stress",
        fixed=MATERIAL_FIXED,
    )
    if kind == "I":
        w.input(
            "G",
            inputs.G,
            "Shear modulus of elasticity of steel",
            reference=MODULI_REFERENCE,
            dimension="stress",
        )
    w.input(
        "F_y",
        inputs.F_y,
        f"Specified minimum yield stress ({w.literal(inputs.grade)})",
        dimension="stress",
        fixed=MATERIAL_FIXED,
    )
    w.input("L", inputs.length, "Member length", dimension="length")
    w.input(
        "K",
        inputs.K,
        "Effective length factor, both axes"
        + (" (2.1 recommended for fixed-free)" if bracing.cantilever else ""),
        reference="AISC 360-22 Commentary Table C-A-7.1",
        dimension="dimensionless",
    )
    write_bracing_inputs(w, inputs, bracing)
    if second_order:
        w.input(
            "C_m",
            inputs.C_m,
            "Equivalent uniform moment factor (1.0 with transverse loading: conservative)",
            reference="AISC 360-22 Appendix 8, Eq. A-8-4",
            dimension="dimensionless",
        )


def _write_demand_side(
    w: Writer, kind: str, strengths: Strengths, demands: Demands, second_order: bool
) -> None:
    force = w.unit("force")
    w.heading("Axial strength for the sign of the force", 2)
    P_r = demands.P_r
    P_c = w.branch(
        "P_c",
        [(strengths.P_c_t, P_r / strengths.P_c_t >= 0), (strengths.P_c_c, True)],
        "Available axial strength: tension when {P_r} ≥ 0, compression otherwise",
        unit=force,
        reference="AISC 360-22 Sections D2, E1",
    )
    M_rx, M_ry = demands.M_rx, demands.M_ry
    if second_order:
        M_rx, M_ry = _write_b1(w, strengths, demands)
    refs = strengths.references
    w.heading("Combined axial force and flexure (AISC 360-22 Chapter H)", 2)
    terms = (
        w.absolute(P_r),
        P_c,
        w.absolute(M_rx),
        strengths.M_c_x,
        w.absolute(M_ry),
        strengths.M_c_y,
    )
    if strengths.interaction == "H1":
        eta = w.clause(combined.h1_interaction, "eta_H1", *terms)
        combined_reference = "AISC 360-22 Eq. H1-1a, H1-1b"
    else:
        w.text(
            "H2-1 with every term at its largest and added by magnitude: the ratios of required "
            "to available strength stand for the stress ratios at the worst point (conservative)."
        )
        eta = w.clause(combined.h2_interaction, "eta_H2", *terms)
        combined_reference = "AISC 360-22 Eq. H2-1"

    w.heading("Checks", 2)
    w.check("axial", CHECK_TITLES["axial"], w.absolute(P_r), P_c, reference=refs["axial"])
    for axis, moment in (("x", M_rx), ("y", M_ry)):
        key = f"flexure_{axis}"
        w.check(
            key,
            CHECK_TITLES[key],
            w.absolute(moment),
            getattr(strengths, f"M_c_{axis}"),
            reference=refs[key],
        )
    if strengths.resultant_shear:
        V_r = w.clause(shear.resultant_shear, "V_r", demands.V_rx, demands.V_ry, unit=force)
        w.check("shear", CHECK_TITLES["shear"], V_r, strengths.V_c_x, reference=refs["shear"])
    else:
        for axis in ("x", "y"):
            key = f"shear_{axis}"
            w.check(
                key,
                CHECK_TITLES[key],
                w.absolute(getattr(demands, f"V_r{axis}")),
                getattr(strengths, f"V_c_{axis}"),
                reference=refs[key],
            )
    w.check("combined", CHECK_TITLES["combined"], eta, sp.Integer(1), reference=combined_reference)
    _write_torsion(w, kind, strengths, demands, P_c, (M_rx, M_ry), eta)


def _write_torsion(
    w: Writer, kind: str, strengths: Strengths, demands: Demands, P_c, moments: tuple, eta_H1
) -> None:
    """Section H3: H3.1/H3.2 for an HSS with a torque, H3.3 for other members with stresses."""
    if kind in HSS_KINDS and demands.T_r is not None:
        terms = InteractionTerms(
            demands.P_r, P_c, moments[0], moments[1], demands.V_rx, demands.V_ry, eta_H1
        )
        T_r, T_c = write_hss_torsion(w, kind, strengths, demands.T_r, terms)
        w.heading("Torsion checks", 2)
        w.check("torsion", CHECK_TITLES["torsion"], T_r, T_c, reference="AISC 360-22 Eq. H3-1")
        w.check(
            "torsion_interaction",
            CHECK_TITLES["torsion_interaction"],
            w["eta_H3"],
            sp.Integer(1),
            reference="AISC 360-22 Section H3.2, Eq. H3-6 (Chapter H1 when Tr <= 0.2Tc)",
        )
    elif kind not in HSS_KINDS and demands.stresses is not None and demands.T_r is not None:
        terms = InteractionTerms(
            demands.P_r, P_c, demands.M_rx, demands.M_ry, demands.V_rx, demands.V_ry, eta_H1
        )
        rows = write_open_section_stresses(w, strengths, demands.stresses, demands.T_r, terms)
        w.heading("Torsion checks", 2)
        for key, (demand, capacity, reference) in rows.items():
            w.check(key, CHECK_TITLES[key], demand, capacity, reference=reference)


def _write_b1(w: Writer, strengths: Strengths, demands: Demands) -> tuple:
    force, moment = w.unit("force"), w.unit("moment")
    w.heading("Second-order effects (AISC 360-22 Appendix 8)", 2)
    w.text(
        "{B_1} amplifies each first-order moment for P-δ (Eq. A-8-3), with {P_e1} from "
        "EI* = EI and {L_c1} = {K}·{L} (the effective length method, {K} as above). {B_1} = 1 "
        "in tension. {B_1} exists only while {alpha}·{P_r} stays below {P_e1}, checked below "
        "for each axis. Moments from a second-order analysis need no {B_1}: build the checks "
        "without the amplification."
    )
    alpha = w.input(
        "alpha",
        appendix8.amplification_alpha(w.method),
        f"α for {w.method}",
        reference="AISC 360-22 Appendix 8, Section 8.2.1",
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    P_r = demands.P_r
    compression = w.branch(
        "P_r_c",
        [(-P_r, P_r < 0 * P_r), (0 * P_r, True)],
        "Axial compression (zero in tension)",
        unit=force,
        reference="AISC 360-22 Appendix 8, Section 8.2.1",
    )
    amplified = []
    for axis, I, M_r in (("x", strengths.I_x, demands.M_rx), ("y", strengths.I_y, demands.M_ry)):
        P_e1 = w.clause(
            appendix8.euler_load, f"P_e1_{axis}", w["E"] * I, w["K"], w["L"], unit=force
        )
        key = f"buckling_{axis}"
        w.check(
            key, CHECK_TITLES[key], alpha * compression, P_e1, reference="AISC 360-22 Eq. A-8-3"
        )
        buckles = w.holds(alpha * compression, ">=", P_e1)

        def first_order(M_r=M_r, axis=axis):
            # B1 has no value: the member buckles under the load (the check above
            # fails); the moments stay first-order.
            w.text(
                f"{{alpha}}·{{P_r}} ≥ {{P_e1}} about {axis}: the member buckles under the axial "
                "load and {B_1} is undefined. NOT OK: choose a stiffer section or a shorter member."
            )
            return M_r

        def second_order(M_r=M_r, axis=axis, P_e1=P_e1):
            B_1 = w.clause(appendix8.b1_multiplier, f"B_1_{axis}", w["C_m"], alpha, P_r, P_e1)
            return w.step(
                f"M_r{axis}_2",
                B_1 * M_r,
                f"Required flexural strength about {axis} with P-δ",
                unit=moment,
                reference="AISC 360-22 Eq. A-8-1",
            )

        amplified.append(w.choose(buckles, first_order, second_order))
    return amplified[0], amplified[1]
