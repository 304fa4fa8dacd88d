"""AISC 360-22 strengths of rectangular HSS (E3/E7, F7, G4) and round HSS (E3/E7, F8, G5)."""

from __future__ import annotations

from calcsheet.engine.procedure import Candidate, Writer
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360 import compression, flexure, shear
from calcsheet.standards.aisc360.factors import FLEXURE, SHEAR
from calcsheet.standards.aisc360.member_common import (
    Element,
    Strengths,
    classify_element,
    state_class,
    write_compression_available,
    write_flexural_buckling,
    write_nominal_compression,
    write_tension,
)
from calcsheet.standards.aisc360.writing import SPECIFICATION, write_available


def write_rectangular_hss(w: Writer) -> Strengths:
    """The strengths of a rectangular or square HSS (H along y, B along x)."""
    E, F_y, t = w["E"], w["F_y"], w["t"]
    stress, force, _moment, length = (w.unit(k) for k in ("stress", "force", "moment", "length"))

    w.heading("Width-to-thickness ratios (AISC 360-22 Table B4.1)", 2)
    b = w.clause(b4.hss_flat_width, "b", w["B"], t, unit=length)
    h = w.clause(b4.hss_flat_width, "h", w["H"], t, unit=length)
    lam_b = w.clause(b4.width_thickness_ratio, "lambda_b", b, t)
    lam_h = w.clause(b4.width_thickness_ratio, "lambda_h", h, t)
    walls = classify_element(w, b4.HSS_WALL_COMPRESSION, lam_b, suffix="_c")
    walls_h = Element(lam_h, None, walls.lambda_r)
    state_class(w, b4.HSS_WALL_COMPRESSION, walls_h, "wall of height h")
    flange_x = classify_element(w, b4.HSS_FLANGE_FLEXURE, lam_b, suffix="f")
    flange_y = Element(lam_h, flange_x.lambda_p, flange_x.lambda_r)
    state_class(w, b4.HSS_FLANGE_FLEXURE, flange_y, "flange h (bending about y)")
    web_x = classify_element(w, b4.HSS_WEB_FLEXURE, lam_h, suffix="w")
    web_y = Element(lam_b, web_x.lambda_p, web_x.lambda_r)
    state_class(w, b4.HSS_WEB_FLEXURE, web_y, "web b (bending about y)")

    P_c_t = write_tension(w)

    w.heading("Compression (AISC 360-22 Chapter E)", 2)
    about_y = w.holds(w["r_y"], "<=", w["r_x"])
    w.text(
        "Flexural buckling about the axis of the smaller radius of gyration, "
        f"{w.label(about_y, 'r_y', 'r_x')}."
    )
    F_cr = write_flexural_buckling(w, w.choose(about_y, lambda: w["r_y"], lambda: w["r_x"]))
    slender = w.either(walls.slender(w), walls_h.slender(w))

    def effective_area():
        w.text("A slender wall: effective area per E7 (Table E7.1 case (b)).")
        case = "b"
        F_el_b = w.clause(
            compression.LOCAL_BUCKLING_STRESS[case],
            "F_el_b",
            walls.lambda_r,
            lam_b,
            F_y,
            unit=stress,
        )
        b_e = w.clause(
            compression.EFFECTIVE_WIDTH[case],
            "b_e",
            b,
            lam_b,
            walls.lambda_r,
            F_y,
            F_cr,
            F_el_b,
            unit=length,
        )
        F_el_h = w.clause(
            compression.LOCAL_BUCKLING_STRESS[case],
            "F_el_h",
            walls.lambda_r,
            lam_h,
            F_y,
            unit=stress,
        )
        h_e = w.clause(
            compression.EFFECTIVE_WIDTH[case],
            "h_e",
            h,
            lam_h,
            walls.lambda_r,
            F_y,
            F_cr,
            F_el_h,
            unit=length,
        )
        return w.clause(compression.effective_area_box, "A_e", w["A_g"], h, h_e, b, b_e, t)

    P_n_c = write_nominal_compression(w, F_cr, slender, effective_area)
    P_c_c = write_compression_available(w, P_n_c)

    M_c = {}
    for axis, other, flange, web, depth, width, lam_fl, lam_web, flat in (
        ("x", "y", flange_x, web_x, "H", "B", lam_b, lam_h, b),
        ("y", "x", flange_y, web_y, "B", "H", lam_h, lam_b, h),
    ):
        M_c[axis] = _rectangular_hss_flexure(
            w, axis, other, flange, web, (depth, width), (lam_fl, lam_web, flat)
        )

    w.heading("Shear (AISC 360-22 Section G4)", 2)
    k_v = w.input(
        "k_v",
        shear.KV_HSS,
        "Shear buckling coefficient of an HSS wall",
        reference="AISC 360-22 Section G4",
        dimension="dimensionless",
        fixed=SPECIFICATION,
    )
    V_c = {}
    for axis, flat, lam in (("y", h, lam_h), ("x", b, lam_b)):
        A_w = w.clause(shear.hss_web_area, f"A_w_{axis}", flat, t)
        C_v2 = w.clause(shear.shear_buckling_coefficient, f"C_v2_{axis}", lam, k_v, E, F_y)
        V_n = w.clause(shear.hss_shear_strength, f"V_n_{axis}", F_y, A_w, C_v2, unit=force)
        V_c[axis] = write_available(
            w, f"V_c_{axis}", V_n, SHEAR, f"Available shear strength along {axis}", unit=force
        )
    return Strengths(
        P_c_t,
        P_c_c,
        M_c["x"],
        M_c["y"],
        V_c["x"],
        V_c["y"],
        w["I_x"],
        w["I_y"],
        references={
            "axial": "AISC 360-22 Sections D2, E3" + (", E7" if w.prints and slender else ""),
            "flexure_x": "AISC 360-22 Section F7",
            "flexure_y": "AISC 360-22 Section F7",
            "shear_x": "AISC 360-22 Section G4",
            "shear_y": "AISC 360-22 Section G4",
        },
    )


def write_round_hss(w: Writer) -> Strengths:
    """The strengths of a round HSS or pipe."""
    E, F_y, t = w["E"], w["F_y"], w["t"]
    stress, force, moment = (w.unit(k) for k in ("stress", "force", "moment"))

    w.heading("Width-to-thickness ratio (AISC 360-22 Table B4.1)", 2)
    lam = w.clause(b4.width_thickness_ratio, "lambda_D", w["D"], t)
    wall_c = classify_element(w, b4.ROUND_HSS_COMPRESSION, lam, suffix="_c")
    classify_element(w, b4.ROUND_HSS_FLEXURE, lam, suffix="f")

    P_c_t = write_tension(w)

    w.heading("Compression (AISC 360-22 Chapter E)", 2)
    F_cr = write_flexural_buckling(w, w["r"])
    slender = wall_c.slender(w)
    P_n_c = write_nominal_compression(
        w,
        F_cr,
        slender,
        lambda: w.clause(compression.effective_area_round, "A_e", E, F_y, lam, w["A_g"]),
    )
    P_c_c = write_compression_available(w, P_n_c)

    w.heading("Flexure (AISC 360-22 Section F8)", 2)
    w.text("A round section: the same strength about every axis.")
    M_n = w.clause(flexure.round_hss_flexure, "M_n", E, F_y, lam, w["Z"], w["S"], unit=moment)
    M_c = write_available(w, "M_c", M_n, FLEXURE, "Available flexural strength", unit=moment)

    w.heading("Shear (AISC 360-22 Section G5)", 2)
    L_v = w.step(
        "L_v",
        w["L"],
        "Distance from maximum to zero shear: the member length of a cantilever "
        "(conservative for other cases)",
        unit=w.unit("length"),
        reference="AISC 360-22 Section G5",
    )
    F_cr_v = w.clause(shear.round_hss_shear_stress, "F_cr_v", E, F_y, L_v, w["D"], lam, unit=stress)
    V_n = w.clause(shear.round_hss_shear_strength, "V_n", F_cr_v, w["A_g"], unit=force)
    V_c = write_available(w, "V_c", V_n, SHEAR, "Available shear strength", unit=force)
    return Strengths(
        P_c_t,
        P_c_c,
        M_c,
        M_c,
        V_c,
        V_c,
        w["I"],
        w["I"],
        references={
            "axial": "AISC 360-22 Sections D2, E3" + (", E7" if w.prints and slender else ""),
            "flexure_x": "AISC 360-22 Section F8",
            "flexure_y": "AISC 360-22 Section F8",
            "shear": "AISC 360-22 Section G5",
        },
        resultant_shear=True,
    )


def _rectangular_hss_flexure(
    w: Writer,
    axis: str,
    other: str,
    flange: Element,
    web: Element,
    sides: tuple[str, str],
    ratios: tuple,
):
    """F7: yielding, flange and web local buckling and (major axis only) F7.4 LTB."""
    E, F_y, t = w["E"], w["F_y"], w["t"]
    moment, length = w.unit("moment"), w.unit("length")
    depth, width = sides
    lam_fl, lam_web, flat = ratios
    w.heading(f"Flexure about {axis} (AISC 360-22 Section F7)", 2)
    S, Z, I = w[f"S_{axis}"], w[f"Z_{axis}"], w[f"I_{axis}"]
    M_p = w.clause(flexure.hss_plastic_moment, f"M_p_{axis}", F_y, Z, unit=moment)

    def flange_local_buckling():
        b_e = w.clause(
            flexure.hss_effective_flange_width,
            f"b_e_{axis}",
            t,
            E,
            F_y,
            lam_fl,
            flat,
            unit=length,
        )
        S_e = w.clause(
            flexure.hss_effective_section_modulus,
            f"S_e_{axis}",
            I,
            w["A_g"],
            w[depth],
            t,
            flat,
            b_e,
        )
        return w.clause(
            flexure.hss_flange_local_buckling,
            f"M_n_FLB_{axis}",
            M_p,
            F_y,
            S,
            lam_fl,
            flange.lambda_r,
            E,
            S_e,
            unit=moment,
        )

    def web_local_buckling():
        return w.clause(
            flexure.hss_web_local_buckling,
            f"M_n_WLB_{axis}",
            M_p,
            F_y,
            S,
            lam_web,
            E,
            unit=moment,
        )

    def lateral_torsional_buckling():
        # F7.4: only the major axis of a rectangular tube; r about the other axis.
        r_other = w[f"r_{other}"]
        L_p = w.clause(
            flexure.hss_limiting_length_yielding,
            f"L_p_{axis}",
            E,
            r_other,
            w["J"],
            w["A_g"],
            M_p,
            unit=length,
        )
        L_r = w.clause(
            flexure.hss_limiting_length_inelastic,
            f"L_r_{axis}",
            E,
            r_other,
            w["J"],
            w["A_g"],
            F_y,
            S,
            unit=length,
        )
        return w.clause(
            flexure.hss_ltb_moment,
            f"M_n_LTB_{axis}",
            M_p,
            w["C_b"],
            F_y,
            S,
            w["L_b"],
            L_p,
            L_r,
            E,
            w["J"],
            w["A_g"],
            r_other,
            unit=moment,
        )

    major = w.holds(w[depth], ">", w[width])
    if w.prints and not major:
        w.text(
            f"Bending about {axis}, the minor axis or a square tube: lateral-torsional "
            "buckling does not apply (F7.4)."
        )
    M_n = w.smallest(
        f"M_n_{axis}",
        [
            Candidate("yielding (F7.1)", lambda: M_p),
            Candidate(
                "flange local buckling (F7.2)", flange_local_buckling, w.negate(flange.compact(w))
            ),
            Candidate("web local buckling (F7.3)", web_local_buckling, w.negate(web.compact(w))),
            Candidate("lateral-torsional buckling (F7.4)", lateral_torsional_buckling, major),
        ],
        f"Nominal flexural strength about {axis}",
        moment,
    )
    return write_available(
        w, f"M_c_{axis}", M_n, FLEXURE, f"Available flexural strength about {axis}", unit=moment
    )
