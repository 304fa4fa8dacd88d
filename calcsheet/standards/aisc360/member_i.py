"""AISC 360-22 strengths of a rolled, doubly symmetric I-shape (W, M, S, HP).

Compression E3 (and E4-2 torsional buckling, E7 when an element is slender),
flexure F2/F3 about x and F6 about y, shear G2.1 in the web and G6 in the flanges.
Written once against a writer (:mod:`calcsheet.engine.procedure`): printed on a
sheet or evaluated on arrays.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.procedure import Candidate, Writer
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360 import compression, flexure, shear
from calcsheet.standards.aisc360.factors import FLEXURE, SHEAR, SHEAR_ROLLED_I_WEB
from calcsheet.standards.aisc360.member_common import (
    Strengths,
    classify_element,
    write_compression_available,
    write_flexural_buckling,
    write_nominal_compression,
    write_tension,
)
from calcsheet.standards.aisc360.writing import SPECIFICATION, write_available


def write_i_shape(w: Writer) -> Strengths:
    """The strengths of an I-shape whose section values are already inputs."""
    E, F_y = w["E"], w["F_y"]
    stress, force, moment, length = (w.unit(k) for k in ("stress", "force", "moment", "length"))

    w.heading("Width-to-thickness ratios (AISC 360-22 Table B4.1)", 2)
    b = w.clause(b4.half_flange_width, "b", w["b_f"], unit=length)
    lam_f = w.clause(b4.width_thickness_ratio, "lambda_f", b, w["t_f"])
    h = w.clause(b4.rolled_web_height, "h", w["d"], w["k_des"], unit=length)
    lam_w = w.clause(b4.width_thickness_ratio, "lambda_w", h, w["t_w"])
    flange_c = classify_element(w, b4.I_FLANGE_COMPRESSION, lam_f, suffix="f_c")
    web_c = classify_element(w, b4.I_WEB_COMPRESSION, lam_w, suffix="w_c")
    flange_f = classify_element(w, b4.I_FLANGE_FLEXURE, lam_f, suffix="f")
    classify_element(w, b4.I_WEB_FLEXURE, lam_w, suffix="w")
    w.text(
        "Minor-axis bending: the flange limits of Table B4.1b Case 13 equal those of Case 10, "
        "so the flange classification above holds for F6 too."
    )

    P_c_t = write_tension(w)

    w.heading("Compression (AISC 360-22 Chapter E)", 2)
    w.text("Flexural buckling about y governs over x ({r_y} < {r_x}, the same {L_c} about both).")
    F_cr = write_flexural_buckling(w, w["r_y"], torsional=True)
    slender = w.either(flange_c.slender(w), web_c.slender(w))

    def effective_area():
        w.text("A slender element: effective area per E7 (Table E7.1 case (c) flanges, (a) web).")
        F_el_f = w.clause(
            compression.LOCAL_BUCKLING_STRESS["c"],
            "F_el_f",
            flange_c.lambda_r,
            lam_f,
            F_y,
            unit=stress,
        )
        b_e = w.clause(
            compression.EFFECTIVE_WIDTH["c"],
            "b_e",
            b,
            lam_f,
            flange_c.lambda_r,
            F_y,
            F_cr,
            F_el_f,
            unit=length,
        )
        F_el_w = w.clause(
            compression.LOCAL_BUCKLING_STRESS["a"],
            "F_el_w",
            web_c.lambda_r,
            lam_w,
            F_y,
            unit=stress,
        )
        h_e = w.clause(
            compression.EFFECTIVE_WIDTH["a"],
            "h_e",
            h,
            lam_w,
            web_c.lambda_r,
            F_y,
            F_cr,
            F_el_w,
            unit=length,
        )
        return w.clause(
            compression.effective_area_i_shape, "A_e", w["A_g"], h, h_e, w["t_w"], b, b_e, w["t_f"]
        )

    P_n_c = write_nominal_compression(w, F_cr, slender, effective_area)
    P_c_c = write_compression_available(w, P_n_c)

    w.heading("Flexure about x (AISC 360-22 Sections F2, F3)", 2)
    compact = flange_f.compact(w)
    M_p = w.clause(flexure.plastic_moment, "M_p", F_y, w["Z_x"], unit=moment)
    r_ts = w.clause(flexure.effective_radius, "r_ts", w["I_y"], w["C_w"], w["S_x"], unit=length)
    h_o = w.clause(flexure.flange_centroid_distance, "h_o", w["d"], w["t_f"], unit=length)
    c = w.step(
        "c",
        sp.Integer(1),
        "c = 1 for a doubly symmetric I-shape",
        reference="AISC 360-22 Eq. F2-8a",
    )
    L_p = w.clause(flexure.limiting_length_yielding, "L_p", w["r_y"], E, F_y, unit=length)
    L_r = w.clause(
        flexure.limiting_length_inelastic,
        "L_r",
        r_ts,
        E,
        F_y,
        w["J"],
        c,
        w["S_x"],
        h_o,
        unit=length,
    )
    F_cr_b = w.clause(
        flexure.ltb_critical_stress,
        "F_cr_b",
        w["C_b"],
        E,
        w["L_b"],
        r_ts,
        w["J"],
        c,
        w["S_x"],
        h_o,
        unit=stress,
    )
    M_ltb = w.clause(
        flexure.ltb_moment,
        w.label(compact, "M_n_x", "M_n_LTB"),
        M_p,
        w["C_b"],
        F_y,
        w["S_x"],
        w["L_b"],
        L_p,
        L_r,
        F_cr_b,
        unit=moment,
    )

    def flange_local_buckling():
        k_c = w.clause(flexure.flange_buckling_coefficient, "k_c", lam_w)
        return w.clause(
            flexure.flange_local_buckling,
            "M_n_FLB",
            M_p,
            F_y,
            w["S_x"],
            lam_f,
            flange_f.lambda_p,
            flange_f.lambda_r,
            E,
            k_c,
            unit=moment,
        )

    M_n_x = w.smallest(
        "M_n_x",
        [
            Candidate("yielding or lateral-torsional buckling (F2)", lambda: M_ltb),
            Candidate(
                "compression flange local buckling (F3.2)",
                flange_local_buckling,
                w.negate(compact),
            ),
        ],
        "Nominal flexural strength about x",
        moment,
    )
    M_c_x = write_available(
        w, "M_c_x", M_n_x, FLEXURE, "Available flexural strength about x", unit=moment
    )

    w.heading("Flexure about y (AISC 360-22 Section F6)", 2)
    M_p_y = w.clause(
        flexure.minor_axis_plastic_moment,
        w.label(compact, "M_n_y", "M_p_y"),
        F_y,
        w["Z_y"],
        w["S_y"],
        unit=moment,
    )
    M_n_y = w.smallest(
        "M_n_y",
        [
            Candidate("yielding (F6.1)", lambda: M_p_y),
            Candidate(
                "flange local buckling (F6.2)",
                lambda: w.clause(
                    flexure.minor_axis_flange_local_buckling,
                    "M_n_FLB_y",
                    M_p_y,
                    F_y,
                    w["S_y"],
                    lam_f,
                    flange_f.lambda_p,
                    flange_f.lambda_r,
                    E,
                    unit=moment,
                ),
                w.negate(compact),
            ),
        ],
        "Nominal flexural strength about y",
        moment,
    )
    M_c_y = write_available(
        w, "M_c_y", M_n_y, FLEXURE, "Available flexural strength about y", unit=moment
    )

    w.heading("Shear (AISC 360-22 Sections G2.1, G6)", 2)
    lam_v = w.clause(shear.rolled_web_shear_limit, "lambda_v", E, F_y)
    rolled_web = w.holds(lam_w, "<=", lam_v)
    if w.prints:
        shown_w, shown_v = (float(w.value_of(v).m) for v in (lam_w, lam_v))
        w.text(
            f"h/tw = {shown_w:.3g} "
            + (
                f"≤ {shown_v:.3g}: G2.1(a) applies (φv = 1.00, Ωv = 1.50, Cv1 = 1.0)."
                if rolled_web
                else f"> {shown_v:.3g}: G2.1(b) applies (φv = 0.90, Ωv = 1.67)."
            )
        )
    k_v = w.input(
        "k_v",
        shear.KV_UNSTIFFENED_WEB,
        "Web plate shear buckling coefficient, no stiffeners",
        reference="AISC 360-22 Section G2.1(b)(2)",
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    C_v1 = w.clause(shear.web_shear_coefficient, "C_v1", lam_w, k_v, E, F_y)
    A_w = w.clause(shear.web_area, "A_w", w["d"], w["t_w"])
    V_n_y = w.clause(shear.web_shear_strength, "V_n_y", F_y, A_w, C_v1, unit=force)

    def web_shear(factors):
        return lambda: write_available(
            w,
            "V_c_y",
            V_n_y,
            factors,
            "Available shear strength along y (web)",
            unit=force,
            suffix="v_y",
        )

    V_c_y = w.choose(rolled_web, web_shear(SHEAR_ROLLED_I_WEB), web_shear(SHEAR))
    k_v_f = w.input(
        "k_v_f",
        shear.KV_FLANGE_OR_LEG,
        "Shear buckling coefficient of a flange",
        reference="AISC 360-22 Section G6",
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    C_v2_f = w.clause(shear.shear_buckling_coefficient, "C_v2_f", lam_f, k_v_f, E, F_y)
    V_n_x = w.clause(
        shear.weak_axis_shear_strength, "V_n_x", F_y, w["b_f"], w["t_f"], C_v2_f, unit=force
    )
    V_c_x = write_available(
        w,
        "V_c_x",
        V_n_x,
        SHEAR,
        "Available shear strength along x (flanges)",
        unit=force,
        suffix="v_x",
    )
    slender_any = bool(slender) if w.prints else False
    compact_all = bool(compact) if w.prints else True
    return Strengths(
        P_c_t,
        P_c_c,
        M_c_x,
        M_c_y,
        V_c_x,
        V_c_y,
        w["I_x"],
        w["I_y"],
        references={
            "axial": "AISC 360-22 Sections D2, E3, E4" + (", E7" if slender_any else ""),
            "flexure_x": "AISC 360-22 Section F2" + ("" if compact_all else ", F3"),
            "flexure_y": "AISC 360-22 Section F6",
            "shear_x": "AISC 360-22 Section G6",
            "shear_y": "AISC 360-22 Section G2.1",
        },
    )
