"""Parts of the AISC 360-22 member procedure shared by every kind of shape."""

from __future__ import annotations

from dataclasses import dataclass, field

from calcsheet.engine.procedure import Candidate, Flag, Value, Writer
from calcsheet.standards.aisc360 import compression, tension
from calcsheet.standards.aisc360.classification import (
    ElementLimits,
    classify,
    outcome_text,
)
from calcsheet.standards.aisc360.factors import COMPRESSION, TENSILE_YIELDING
from calcsheet.standards.aisc360.writing import write_available


@dataclass
class Strengths:
    """The available strengths a kind of shape gives, and what the checks cite."""

    P_c_t: Value
    P_c_c: Value
    M_c_x: Value
    M_c_y: Value
    V_c_x: Value
    V_c_y: Value
    I_x: Value
    I_y: Value
    references: dict[str, str] = field(default_factory=dict)
    # "H1" (doubly and singly symmetric members) or "H2" (stress interaction).
    interaction: str = "H1"
    # Round HSS: shear is checked on the resultant of V_rx and V_ry.
    resultant_shear: bool = False


@dataclass(frozen=True)
class Element:
    """An element's slenderness and its limits as written, with the decisions they give."""

    slenderness: Value
    lambda_p: Value | None
    lambda_r: Value

    def slender(self, w: Writer) -> Flag:
        """λ > λr (Section B4.1)."""
        return w.holds(self.slenderness, ">", self.lambda_r)

    def compact(self, w: Writer) -> Flag:
        """λ ≤ λp (Table B4.1b elements only)."""
        return w.holds(self.slenderness, "<=", self.lambda_p)


def classify_element(
    w: Writer, limits: ElementLimits, slenderness: Value, *, suffix: str
) -> Element:
    """Write λp (if any) and λr of ``limits`` and state the classification of ``slenderness``.

    The limit steps are named ``lambda_p<suffix>`` and ``lambda_r<suffix>``.
    """
    lam_p = (
        w.clause(limits.lambda_p, f"lambda_p{suffix}", w["E"], w["F_y"])
        if limits.lambda_p is not None
        else None
    )
    lam_r = w.clause(limits.lambda_r, f"lambda_r{suffix}", w["E"], w["F_y"])
    element = Element(slenderness, lam_p, lam_r)
    state_class(w, limits, element)
    return element


def state_class(
    w: Writer, limits: ElementLimits, element: Element, name: str | None = None
) -> None:
    """Say in words how an element classifies against limits already written."""
    if not w.prints:
        return
    value = float(w.value_of(element.slenderness).m)
    p_value = float(w.value_of(element.lambda_p).m) if element.lambda_p is not None else None
    r_value = float(w.value_of(element.lambda_r).m)
    outcome = classify(value, p_value, r_value)
    w.text(outcome_text(limits, value, p_value, r_value, outcome, element=name))


def write_tension(w: Writer) -> Value:
    """D2(a) tensile yielding; rupture (D2(b)) needs the connection and is stated as not checked."""
    force = w.unit("force")
    w.heading("Tension (AISC 360-22 Chapter D)", 2)
    w.text(
        "Tensile yielding in the gross section (D2(a)). Tensile rupture in the net section "
        "(D2(b)) depends on the end connection (An, U) and is not checked here."
    )
    P_n_t = w.clause(tension.tensile_yielding, "P_n_t", w["F_y"], w["A_g"], unit=force)
    return write_available(
        w, "P_c_t", P_n_t, TENSILE_YIELDING, "Available tensile strength", unit=force
    )


def write_flexural_buckling(w: Writer, r: Value, *, torsional: bool = False) -> Value:
    """Lc, Fe (E3-4, and E4-2 when ``torsional``) and Fcr (E3-2/E3-3); returns Fcr."""
    stress, length = w.unit("stress"), w.unit("length")
    L_c = w.clause(compression.effective_length, "L_c", w["K"], w["L"], unit=length)
    if not torsional:
        F_e = w.clause(compression.elastic_buckling_stress, "F_e", w["E"], L_c, r, unit=stress)
    else:
        F_e_flexural = w.clause(
            compression.elastic_buckling_stress, "F_e_y", w["E"], L_c, r, unit=stress
        )
        w.text(
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
        F_e = w.smallest(
            "F_e",
            [
                Candidate("flexural buckling (E3-4)", lambda: F_e_flexural),
                Candidate("torsional buckling (E4-2)", lambda: F_e_torsional),
            ],
            "Elastic buckling stress, the smaller",
            stress,
        )
    return w.clause(compression.critical_stress, "F_cr", w["F_y"], F_e, unit=stress)


def write_compression_available(w: Writer, P_n_c: Value) -> Value:
    """φc·Pn or Pn/Ωc."""
    return write_available(
        w, "P_c_c", P_n_c, COMPRESSION, "Available compressive strength", unit=w.unit("force")
    )


def write_nominal_compression(w: Writer, F_cr: Value, slender: Flag, effective_area) -> Value:
    """Pn = Fcr·Ag (E3-1) without slender elements, Fcr·Ae (E7-1) with them.

    ``effective_area()`` writes A_e (Section E7) and is called only where an element
    is slender.
    """
    force = w.unit("force")
    return w.choose(
        slender,
        lambda: w.clause(
            compression.nominal_compressive_strength_slender,
            "P_n_c",
            F_cr,
            effective_area(),
            unit=force,
        ),
        lambda: w.clause(
            compression.nominal_compressive_strength, "P_n_c", F_cr, w["A_g"], unit=force
        ),
    )
