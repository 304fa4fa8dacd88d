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

import sympy as sp

from calcsheet.engine.procedure import Candidate, Value, Writer
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
    "The point stresses include St Venant torsion ({T}·{t}/{J} on an open section); warping "
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
            "Shear ratio {V_r}/{V_c}, on the resultant shear",
            reference="AISC 360-22 Section H3.2",
        )
    else:
        v_ratio = w.step(
            "v_ratio",
            w.absolute(terms.V_rx) / strengths.V_c_x + w.absolute(terms.V_ry) / strengths.V_c_y,
            "Shear ratio {V_r}/{V_c}, both directions added (conservative)",
            reference="AISC 360-22 Section H3.2",
        )
    if w.prints:
        above = w.holds(T_abs, ">", torsion.TORSION_RATIO_LIMIT * T_c)
        w.text(
            "Eq. H3-6 applies when {T_r} > 0.2·{T_c}; below it torsion is neglected and the "
            "interaction is that of Chapter H1 written above ({eta_H1}). {M_r}/{M_c} is the sum "
            "over both axes (conservative for biaxial bending). Here {T_r} "
            + ("> 0.2·{T_c}: Eq. H3-6 applies." if above else "≤ 0.2·{T_c}: torsion is neglected.")
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


def write_open_section_stresses(
    w: Writer,
    strengths: Strengths,
    stresses: PointStressDemands,
    T_r: Value,
    terms: InteractionTerms,
) -> dict[str, tuple]:
    """H3.3 for a non-HSS member: (demand, capacity, reference) of each check by key.

    The section applies to members subjected to torsion: with no torque (|Tr| at most
    1e-9 of |Mrx| + |Mry|, the round-off of statics) every demand is zero.
    """
    stress = w.unit("stress")
    F_y = w["F_y"]
    w.heading("Torsion and combined stress (AISC 360-22 Section H3.3)", 2)
    w.text(
        "A non-HSS member under torsion: the required normal stress {f_n} and shear stress "
        "{f_v} are the largest over the stress points of the section from the elastic "
        "analysis above ({N}, {M_x}, {M_y}, shear {V}·{Q}/({I}·{b}) and torsion). "
        + WARPING_NOTE
        + " The section applies to members subjected to torsion: without a torque "
        "(|{T_r}| ≤ 10⁻⁹·(|{M_rx}| + |{M_ry}|), the round-off of statics) the demands below "
        "are zero and Chapters E to H1 "
        "above govern alone."
    )
    if w.prints:
        w.text(
            "Buckling (H3.3(c), {F_n} = {F_cr}, Eq. H3-9) leaves {F_cr} to analysis. Here the "
            "compressive normal stress at the worst point is split into the stress of the "
            "axial force {f_na}, taken to the available compressive stress of Chapter E "
            "({F_c_Ta} = {P_c}/{A_g}, flexural or torsional buckling as written above), and "
            "the rest {f_nb} (flexure and torsion), taken to the available flexural stress of "
            "Chapter F ({F_c_Tb} = {M_c}/{S}, the smaller of the two axes: lateral-torsional "
            "and local buckling); "
            "their ratios are added as in Eq. H2-1. The lightest-section search, where asked "
            "for, does not repeat these stress checks for each catalog section."
        )
    T_abs = w.absolute(T_r)
    round_off = 1e-9 * (w.absolute(terms.M_rx) + w.absolute(terms.M_ry))
    present, absent = T_abs > round_off, T_abs <= round_off
    zero = 0 * stresses.sigma_max
    F_n_y = w.clause(torsion.normal_yielding_stress, "F_n_Ty", F_y, unit=stress)
    F_c_y = write_available(
        w, "F_c_Ty", F_n_y, torsion.TORSION_OPEN, "Available normal stress, yielding", unit=stress
    )
    F_n_v = w.clause(torsion.shear_yielding_stress, "F_n_Tv", F_y, unit=stress)
    F_c_v = write_available(
        w, "F_c_Tv", F_n_v, torsion.TORSION_OPEN, "Available shear stress, yielding", unit=stress
    )
    sigma_max, sigma_min = stresses.sigma_max, stresses.sigma_min
    reference = "AISC 360-22 Section H3.3"
    f_n = w.branch(
        "f_n",
        [(w.larger(w.absolute(sigma_max), w.absolute(sigma_min)), present), (zero, True)],
        "Required normal stress, the largest magnitude over the points (zero without torque)",
        unit=stress,
        reference=reference,
    )
    f_v = w.branch(
        "f_v",
        [(stresses.tau_max, present), (zero, True)],
        "Required shear stress, the largest over the points (zero without torque)",
        unit=stress,
        reference=reference,
    )
    f_c = w.branch(
        "f_nc",
        [(w.larger(-sigma_min, zero), present), (zero, True)],
        "Required compressive normal stress, the largest over the points (zero without "
        "torque or compression)",
        unit=stress,
        reference=reference,
    )
    P_r = terms.P_r
    f_a = w.branch(
        "f_na",
        [(zero, absent), (-P_r / w["A_g"], P_r < 0 * P_r), (zero, True)],
        "Compressive stress of the axial force (zero in tension or without torque)",
        unit=stress,
        reference=reference,
    )
    f_b = w.step(
        "f_nb",
        w.larger(f_c - f_a, zero),
        "The rest of the compressive normal stress (flexure and torsion)",
        unit=stress,
        reference=reference,
    )
    F_ca = w.step(
        "F_c_Ta",
        strengths.P_c_c / w["A_g"],
        "Available compressive stress, buckling (Chapter E)",
        unit=stress,
        reference="AISC 360-22 Sections E1, H3.3(c)",
    )
    F_cb = w.smallest(
        "F_c_Tb",
        [
            Candidate(
                f"about {axis}",
                lambda axis=axis: w.step(
                    f"F_c_Tb_{axis}",
                    getattr(strengths, f"M_c_{axis}") / w[f"S_{axis}"],
                    f"Available flexural stress about {axis}, {{M_c}}/{{S}} (Chapter F)",
                    unit=stress,
                    reference="AISC 360-22 Sections F1, H3.3(c)",
                ),
            )
            for axis in ("x", "y")
        ],
        "Available flexural stress, the smaller of the two axes",
        stress,
    )
    eta = w.clause(torsion.buckling_stress_ratio, "eta_T", f_a, F_ca, f_b, F_cb)
    return {
        "torsion_normal_yielding": (f_n, F_c_y, "AISC 360-22 Section H3.3(a), Eq. H3-7"),
        "torsion_shear_yielding": (f_v, F_c_v, "AISC 360-22 Section H3.3(b), Eq. H3-8"),
        "torsion_buckling": (eta, sp.Integer(1), "AISC 360-22 Section H3.3(c), Eq. H3-9"),
    }
