"""AISC 360-22 strengths of an equal-leg single angle: D2, E3/E7, F10 (geometric axes), G3.

Flexure uses the rules of F10.2 for bending about a geometric axis of an
equal-leg angle without lateral-torsional restraint: My taken as 0.80 of the
geometric yield moment, Mcr by F10-5a (toe in compression, the smaller value,
whatever the sign of the moment), and leg local buckling with the toe in
compression. Those rules are for members without axial compression; the sheet
says so. E4 flexural-torsional buckling and E5 are not covered.
"""

from __future__ import annotations

from calcsheet.engine.procedure import Candidate, Writer
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360 import compression, flexure, shear
from calcsheet.standards.aisc360.factors import FLEXURE, SHEAR
from calcsheet.standards.aisc360.member_common import (
    Strengths,
    classify_element,
    write_compression_available,
    write_flexural_buckling,
    write_nominal_compression,
    write_tension,
)
from calcsheet.standards.aisc360.writing import SPECIFICATION, write_available

LIMITATIONS = (
    "Limitations for single angles: flexural buckling is checked about the minor principal "
    "axis z (E3) only; flexural-torsional buckling (E4) and the single-angle compression rules "
    "of E5 are not checked. Flexure follows F10.2 for bending about the geometric axes of an "
    "equal-leg angle with no lateral-torsional restraint; those rules assume no axial "
    "compression. With axial compression, resolve the moments into principal-axis components "
    "(F10.2, H2) by another calculation. The combined check is H2-1 with each term at its "
    "largest, added by magnitude (conservative)."
)


def write_single_angle(w: Writer) -> Strengths:
    """The strengths of an equal-leg single angle."""
    E, F_y, t, b = w["E"], w["F_y"], w["t"], w["b"]
    stress, force, moment, length = (w.unit(k) for k in ("stress", "force", "moment", "length"))
    w.text(LIMITATIONS)

    w.heading("Width-to-thickness ratio (AISC 360-22 Table B4.1)", 2)
    lam = w.clause(b4.width_thickness_ratio, "lambda_L", b, t)
    leg_c = classify_element(w, b4.ANGLE_LEG_COMPRESSION, lam, suffix="_c")
    leg_f = classify_element(w, b4.ANGLE_LEG_FLEXURE, lam, suffix="L")

    P_c_t = write_tension(w)

    w.heading("Compression (AISC 360-22 Chapter E)", 2)
    F_cr = write_flexural_buckling(w, w["r_z"])
    slender = leg_c.slender(w)

    def effective_area():
        w.text("Slender legs: effective area per E7 (Table E7.1 case (c)), both legs alike.")
        F_el = w.clause(
            compression.LOCAL_BUCKLING_STRESS["c"], "F_el", leg_c.lambda_r, lam, F_y, unit=stress
        )
        b_e = w.clause(
            compression.EFFECTIVE_WIDTH["c"],
            "b_e",
            b,
            lam,
            leg_c.lambda_r,
            F_y,
            F_cr,
            F_el,
            unit=length,
        )
        return w.clause(compression.effective_area_angle, "A_e", w["A_g"], b, b_e, b, b_e, t)

    P_n_c = write_nominal_compression(w, F_cr, slender, effective_area)
    P_c_c = write_compression_available(w, P_n_c)

    M_c = {}
    for axis in ("x", "y"):
        w.heading(f"Flexure about {axis} (AISC 360-22 Section F10)", 2)
        S = w[f"S_{axis}"]
        M_y = w.clause(flexure.angle_yield_moment, f"M_y_{axis}", F_y, S, unit=moment)
        M_yield = w.clause(flexure.angle_yielding, f"M_n_Y_{axis}", M_y, unit=moment)
        M_y_b = w.clause(flexure.angle_yield_moment_ltb, f"M_yb_{axis}", M_y, unit=moment)
        M_cr = w.clause(
            flexure.angle_elastic_ltb_moment,
            f"M_cr_{axis}",
            E,
            b,
            t,
            w["C_b"],
            w["L_b"],
            unit=moment,
        )
        M_ltb = w.clause(flexure.angle_ltb, f"M_n_LTB_{axis}", M_y_b, M_cr, unit=moment)
        M_n = w.smallest(
            f"M_n_{axis}",
            [
                Candidate("yielding (F10.1)", lambda M=M_yield: M),
                Candidate("lateral-torsional buckling (F10.2)", lambda M=M_ltb: M),
                Candidate(
                    "leg local buckling (F10.3)",
                    lambda S=S, axis=axis: w.clause(
                        flexure.angle_leg_local_buckling,
                        f"M_n_LLB_{axis}",
                        F_y,
                        S,
                        lam,
                        leg_f.lambda_r,
                        E,
                        unit=moment,
                    ),
                    w.negate(leg_f.compact(w)),
                ),
            ],
            f"Nominal flexural strength about {axis}",
            moment,
        )
        M_c[axis] = write_available(
            w, f"M_c_{axis}", M_n, FLEXURE, f"Available flexural strength about {axis}", unit=moment
        )

    w.heading("Shear (AISC 360-22 Section G3)", 2)
    k_v = w.input(
        "k_v",
        shear.KV_FLANGE_OR_LEG,
        "Shear buckling coefficient of an angle leg",
        reference="AISC 360-22 Section G3",
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    C_v2 = w.clause(shear.shear_buckling_coefficient, "C_v2", lam, k_v, E, F_y)
    V_n = w.clause(shear.angle_shear_strength, "V_n", F_y, b, t, C_v2, unit=force)
    V_c = write_available(w, "V_c", V_n, SHEAR, "Available shear strength of one leg", unit=force)
    return Strengths(
        P_c_t,
        P_c_c,
        M_c["x"],
        M_c["y"],
        V_c,
        V_c,
        w["I_x"],
        w["I_y"],
        references={
            "axial": "AISC 360-22 Sections D2, E3" + (", E7" if w.prints and slender else ""),
            "flexure_x": "AISC 360-22 Section F10",
            "flexure_y": "AISC 360-22 Section F10",
            "shear_x": "AISC 360-22 Section G3",
            "shear_y": "AISC 360-22 Section G3",
        },
        interaction="H2",
    )
