"""Parts of the AISC 360-22 member checks shared by every kind of shape."""

from __future__ import annotations

from dataclasses import dataclass, field

import sympy as sp

from calcsheet.standards.aisc360 import compression, tension
from calcsheet.standards.aisc360.classification import (
    Classification,
    ElementLimits,
    WrittenElement,
    classify,
    outcome_text,
    write_classification,
)
from calcsheet.standards.aisc360.factors import COMPRESSION, TENSILE_YIELDING
from calcsheet.standards.aisc360.writing import Writer


@dataclass
class Strengths:
    """The available strengths a kind of shape gives, and what the checks cite."""

    P_c_t: sp.Symbol
    P_c_c: sp.Symbol
    M_c_x: sp.Symbol
    M_c_y: sp.Symbol
    V_c_x: sp.Symbol
    V_c_y: sp.Symbol
    I_x: sp.Symbol
    I_y: sp.Symbol
    references: dict[str, str] = field(default_factory=dict)
    # "H1" (doubly and singly symmetric members) or "H2" (stress interaction).
    interaction: str = "H1"
    # Round HSS: shear is checked on the resultant of V_rx and V_ry.
    resultant_shear: bool = False


def classify_element(
    w: Writer, limits: ElementLimits, slenderness: sp.Symbol, *, suffix: str
) -> WrittenElement:
    """Write λp, λr of ``limits`` and state the classification of ``slenderness``."""
    return write_classification(w.sheet, limits, slenderness, w["E"], w["F_y"], suffix=suffix)


def restate(
    w: Writer,
    limits: ElementLimits,
    slenderness: sp.Symbol,
    written: WrittenElement,
    element: str,
) -> Classification:
    """Classify another element against limits already written (same λp, λr)."""
    value = float(w.sheet.value(slenderness).m)
    p_value = float(w.sheet.value(written.lambda_p).m) if written.lambda_p is not None else None
    r_value = float(w.sheet.value(written.lambda_r).m)
    outcome = classify(value, p_value, r_value)
    w.sheet.text(outcome_text(limits, value, p_value, r_value, outcome, element=element))
    return outcome


def write_tension(w: Writer) -> sp.Symbol:
    """D2(a) tensile yielding; rupture (D2(b)) needs the connection and is stated as not checked."""
    force = w.unit("force")
    w.sheet.heading("Tension (AISC 360-22 Chapter D)", 2)
    w.sheet.text(
        "Tensile yielding in the gross section (D2(a)). Tensile rupture in the net section "
        "(D2(b)) depends on the end connection (An, U) and is not checked here."
    )
    P_n_t = w.clause(tension.tensile_yielding, "P_n_t", w["F_y"], w["A_g"], unit=force)
    return w.available("P_c_t", P_n_t, TENSILE_YIELDING, "Available tensile strength", unit=force)


def write_flexural_buckling(w: Writer, r: sp.Symbol, *, torsional: bool = False) -> sp.Symbol:
    """Lc, Fe (E3-4, and E4-2 when ``torsional``) and Fcr (E3-2/E3-3); returns Fcr."""
    stress, length = w.unit("stress"), w.unit("length")
    L_c = w.clause(compression.effective_length, "L_c", w["K"], w["L"], unit=length)
    if not torsional:
        F_e = w.clause(compression.elastic_buckling_stress, "F_e", w["E"], L_c, r, unit=stress)
    else:
        F_e_flexural = w.clause(
            compression.elastic_buckling_stress, "F_e_y", w["E"], L_c, r, unit=stress
        )
        w.sheet.text(
            "Torsional buckling (E4) with Lcz = Lc: the same effective length factor about the "
            "member axis (an assumption; a doubly symmetric section has no flexural-torsional "
            "coupling)."
        )
        F_e_torsional = w.clause(
            compression.torsional_buckling_stress,
            "F_e_z",
            w["E"],
            w["C_w"],
            L_c,
            w["G"],
            w["J"],
            w["I_x"],
            w["I_y"],
            unit=stress,
        )
        F_e = w.governing_min(
            "F_e",
            [
                ("flexural buckling (E3-4)", F_e_flexural),
                ("torsional buckling (E4-2)", F_e_torsional),
            ],
            "Elastic buckling stress, the smaller",
            stress,
        )
    return w.clause(compression.critical_stress, "F_cr", w["F_y"], F_e, unit=stress)


def write_compression_available(w: Writer, P_n_c: sp.Symbol) -> sp.Symbol:
    """φc·Pn or Pn/Ωc."""
    return w.available(
        "P_c_c", P_n_c, COMPRESSION, "Available compressive strength", unit=w.unit("force")
    )
