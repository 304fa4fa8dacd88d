"""Torsion in the AISC 360-22 member procedure (Section H3), for both writers.

* Round and rectangular HSS: the available torsional strength Tc (H3.1) against the
  required torque Tr, and the interaction of H3.2 (Eq. H3-6) when Tr > 0.2·Tc.
* I-shapes and single angles (non-HSS members, H3.3): the required normal and shear
  stresses of the member's elastic stress analysis (the largest over the section's
  stress points) against φT·Fy, φT·0.6·Fy and φT·Fcr.
"""

from __future__ import annotations

from dataclasses import dataclass
from typing import Any

from calcsheet.engine.procedure import Value, Writer
from calcsheet.standards.aisc360 import torsion
from calcsheet.standards.aisc360.member_common import Strengths
from calcsheet.standards.aisc360.writing import write_available

HSS_KINDS = ("HSS_RECT", "HSS_ROUND")

# Check key -> title, as the sheet titles them (merged into the procedure's CHECK_TITLES).
TORSION_TITLES = {
    "torsion": "Torsion (HSS)",
    "torsion_interaction": "Combined torsion, shear, flexure and axial force (HSS)",
    "torsion_normal_yielding": "Torsion: normal stress, yielding",
    "torsion_shear_yielding": "Torsion: shear stress, shear yielding",
    "torsion_buckling": "Torsion: compressive normal stress, buckling",
}
WARPING_NOTE = (
    "The point stresses include St Venant torsion (T·t/J on an open section); warping "
    "normal and shear stresses are included only where the member's torsion model says so "
    "in its stress steps above."
)


@dataclass(frozen=True)
class PointStressDemands:
    """The required stresses at the worst points of the section (symbols or arrays).

    ``sigma_max`` the largest normal stress (tension positive), ``sigma_min`` the
    smallest (most compressive), ``tau_max`` the largest shear stress magnitude; from
    the member's elastic stress analysis at the station checked.
    """

    sigma_max: Any
    sigma_min: Any
    tau_max: Any


@dataclass(frozen=True)
class InteractionTerms:
    """What the H3.2 interaction reads from the rest of the procedure (magnitudes)."""

    P_r: Value
    P_c: Value
    M_rx: Value
    M_ry: Value
    V_rx: Value
    V_ry: Value
    eta_H1: Value


def write_hss_torsion(
    w: Writer, kind: str, strengths: Strengths, T_r: Value, terms: InteractionTerms
) -> tuple[Value, Value]:
    """Tc of a round or rectangular HSS (H3.1) and the H3.2 interaction.

    Returns the demand |Tr| and Tc for the torsion check, and writes the interaction
    step ``eta_H3``; the checks themselves are added by :func:`write_torsion_checks`.
    """
    E, F_y, t = w["E"], w["F_y"], w["t"]
    stress, moment = w.unit("stress"), w.unit("moment")
    w.heading("Torsion (AISC 360-22 Section H3.1)", 2)
    if kind == "HSS_ROUND":
        w.text(
            "Round HSS (H3.1(a)): Fcr the larger of Eq. H3-2a and H3-2b, not more than 0.6·Fy, "
            "with L the member length; C as the User Note of H3.1 gives it."
        )
        D_t = w["lambda_D"]
        F_cr_a = w.clause(
            torsion.round_hss_torsion_stress_long, "F_cr_Ta", E, w["L"], w["D"], D_t, unit=stress
        )
        F_cr_b = w.clause(torsion.round_hss_torsion_stress_short, "F_cr_Tb", E, D_t, unit=stress)
        F_cr = w.clause(
            torsion.round_hss_torsion_critical, "F_cr_T", F_cr_a, F_cr_b, F_y, unit=stress
        )
        C = w.clause(torsion.round_hss_torsional_constant, "C_T", w["D"], t)
    else:
        w.text(
            "Rectangular HSS (H3.1(b)): h/t of the longer side (flat width h = outside "
            "dimension − 3t as above); Eq. H3-5 covers h/t up to 260. C as the User Note of "
            "H3.1 gives it."
        )
        h_t = w.step(
            "lambda_T",
            w.larger(w["lambda_h"], w["lambda_b"]),
            "Width-to-thickness ratio of the longer side",
            reference="AISC 360-22 Section H3.1(b)",
        )
        F_cr = w.clause(
            torsion.rectangular_hss_torsion_critical, "F_cr_T", h_t, E, F_y, unit=stress
        )
        C = w.clause(torsion.rectangular_hss_torsional_constant, "C_T", w["B"], w["H"], t)
    T_n = w.clause(torsion.hss_torsional_strength, "T_n", F_cr, C, unit=moment)
    T_c = write_available(
        w, "T_c", T_n, torsion.TORSION_HSS, "Available torsional strength", unit=moment
    )

    w.heading("Torsion with shear, flexure and axial force (AISC 360-22 Section H3.2)", 2)
    T_abs = w.absolute(T_r)
    if kind == "HSS_ROUND":
        v_ratio = w.step(
            "v_ratio",
            w.root(terms.V_rx**2 + terms.V_ry**2) / strengths.V_c_x,
            "Shear ratio Vr/Vc, on the resultant shear",
            reference="AISC 360-22 Section H3.2",
        )
    else:
        v_ratio = w.step(
            "v_ratio",
            w.absolute(terms.V_rx) / strengths.V_c_x + w.absolute(terms.V_ry) / strengths.V_c_y,
            "Shear ratio Vr/Vc, both directions added (conservative)",
            reference="AISC 360-22 Section H3.2",
        )
    if w.prints:
        above = w.holds(T_abs, ">", torsion.TORSION_RATIO_LIMIT * T_c)
        w.text(
            "Eq. H3-6 applies when Tr > 0.2·Tc; below it torsion is neglected and the "
            "interaction is that of Chapter H1 written above (η_H1). Mr/Mc is the sum over "
            "both axes (conservative for biaxial bending). Here Tr "
            + ("> 0.2·Tc: Eq. H3-6 applies." if above else "≤ 0.2·Tc: torsion is neglected.")
        )
    w.clause(
        torsion.torsion_interaction,
        "eta_H3",
        w.absolute(terms.P_r),
        terms.P_c,
        w.absolute(terms.M_rx),
        strengths.M_c_x,
        w.absolute(terms.M_ry),
        strengths.M_c_y,
        v_ratio,
        T_abs,
        T_c,
        terms.eta_H1,
    )
    return T_abs, T_c


def write_open_section_stresses(w: Writer, stresses: PointStressDemands) -> dict[str, tuple]:
    """H3.3 for a non-HSS member: (demand, available stress) of each check by key."""
    stress = w.unit("stress")
    F_y = w["F_y"]
    w.heading("Torsion and combined stress (AISC 360-22 Section H3.3)", 2)
    w.text(
        "A non-HSS member: the required normal stress fn and shear stress fv are the largest "
        "over the stress points of the section from the elastic analysis above (N, M_x, M_y, "
        "shear V·Q/(I·b) and torsion). " + WARPING_NOTE + " Buckling (Eq. H3-9): the "
        "compressive normal stress against Fcr taken as the member's critical stress of "
        "Chapter E written above (flexural or torsional buckling, AISC 360-22 Sections E3 "
        "and E4); shear buckling of the elements is the subject of Chapter G, checked above."
    )
    F_n_y = w.clause(torsion.normal_yielding_stress, "F_n_Ty", F_y, unit=stress)
    F_c_y = write_available(
        w, "F_c_Ty", F_n_y, torsion.TORSION_OPEN, "Available normal stress, yielding", unit=stress
    )
    F_n_v = w.clause(torsion.shear_yielding_stress, "F_n_Tv", F_y, unit=stress)
    F_c_v = write_available(
        w, "F_c_Tv", F_n_v, torsion.TORSION_OPEN, "Available shear stress, yielding", unit=stress
    )
    F_n_cr = w.clause(torsion.buckling_stress, "F_n_Tcr", w["F_cr"], unit=stress)
    F_c_cr = write_available(
        w, "F_c_Tcr", F_n_cr, torsion.TORSION_OPEN, "Available stress, buckling", unit=stress
    )
    sigma_max, sigma_min = stresses.sigma_max, stresses.sigma_min
    f_n = w.step(
        "f_n",
        w.larger(w.absolute(sigma_max), w.absolute(sigma_min)),
        "Required normal stress, the largest magnitude over the points",
        unit=stress,
        reference="AISC 360-22 Section H3.3",
    )
    f_c = w.step(
        "f_nc",
        w.larger(-sigma_min, 0 * sigma_min),
        "Required compressive normal stress (zero when no point is in compression)",
        unit=stress,
        reference="AISC 360-22 Section H3.3",
    )
    f_v = w.step(
        "f_v",
        stresses.tau_max,
        "Required shear stress, the largest over the points",
        unit=stress,
        reference="AISC 360-22 Section H3.3",
    )
    return {
        "torsion_normal_yielding": (f_n, F_c_y, "AISC 360-22 Section H3.3(a), Eq. H3-7"),
        "torsion_shear_yielding": (f_v, F_c_v, "AISC 360-22 Section H3.3(b), Eq. H3-8"),
        "torsion_buckling": (f_c, F_c_cr, "AISC 360-22 Section H3.3(c), Eq. H3-9"),
    }
