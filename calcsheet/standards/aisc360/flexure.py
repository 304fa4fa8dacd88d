"""AISC 360-22 Chapter F: flexure of I-shapes (F2, F3, F6), HSS (F7, F8) and single angles (F10).

Each clause is one equation, or one equation chosen among its branches with
``Piecewise`` where the Specification switches on a length or a slenderness (the
sheet prints only the branch that applies). Which limit states apply at all
(flange local buckling only for noncompact or slender flanges, ...) is decided
from the classification when the sheet is built.

Coefficients of F7.2(c), F7.4 and F10 are quoted from memory of the 2016/2022
Specification (the continuity of F10-1/F10-6/F10-8 and F10-2/F10-3 at their
limits was checked as a consistency test).
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import pi, sqrt
from calcsheet.standards.aisc360._functions import cases, largest, smallest
from calcsheet.standards.clause import clause

# --- F2: doubly symmetric compact I-shapes bent about the major axis -----------------


@clause("AISC 360-22 Eq. F2-1", "Plastic moment")
def plastic_moment(F_y: sp.Basic, Z: sp.Basic) -> sp.Expr:
    """Mp = Fy·Zx (AISC 360-22 Eq. F2-1)."""
    return F_y * Z


@clause("AISC 360-22 Section F2.2", "Distance between flange centroids, ho = d − tf")
def flange_centroid_distance(d: sp.Basic, t_f: sp.Basic) -> sp.Expr:
    """ho = d − tf (AISC 360-22 Section F2.2, definition of ho)."""
    return d - t_f


@clause("AISC 360-22 Eq. F2-7", "Effective radius of gyration")
def effective_radius(I_y: sp.Basic, C_w: sp.Basic, S_x: sp.Basic) -> sp.Expr:
    """rts = √(√(Iy·Cw)/Sx) (AISC 360-22 Eq. F2-7 gives rts²)."""
    return sqrt(sqrt(I_y * C_w) / S_x)


@clause("AISC 360-22 Eq. F2-5", "Limiting laterally unbraced length for yielding")
def limiting_length_yielding(r_y: sp.Basic, E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
    """Lp = 1.76·ry·√(E/Fy) (AISC 360-22 Eq. F2-5)."""
    return 1.76 * r_y * sqrt(E / F_y)


@clause("AISC 360-22 Eq. F2-6", "Limiting unbraced length for inelastic LTB")
def limiting_length_inelastic(
    r_ts: sp.Basic,
    E: sp.Basic,
    F_y: sp.Basic,
    J: sp.Basic,
    c: sp.Basic,
    S_x: sp.Basic,
    h_o: sp.Basic,
) -> sp.Expr:
    """Lr = 1.95·rts·E/(0.7Fy)·√(Jc/(Sx·ho) + √((Jc/(Sx·ho))² + 6.76(0.7Fy/E)²)) (Eq. F2-6)."""
    ratio = J * c / (S_x * h_o)
    return (
        1.95 * r_ts * E / (0.7 * F_y) * sqrt(ratio + sqrt(ratio**2 + 6.76 * (0.7 * F_y / E) ** 2))
    )


@clause("AISC 360-22 Eq. F2-4", "Critical stress for lateral-torsional buckling")
def ltb_critical_stress(
    C_b: sp.Basic,
    E: sp.Basic,
    L_b: sp.Basic,
    r_ts: sp.Basic,
    J: sp.Basic,
    c: sp.Basic,
    S_x: sp.Basic,
    h_o: sp.Basic,
) -> sp.Expr:
    """Fcr = Cb·π²E/(Lb/rts)²·√(1 + 0.078·Jc/(Sx·ho)·(Lb/rts)²) (AISC 360-22 Eq. F2-4)."""
    return (
        C_b
        * pi**2
        * E
        / (L_b / r_ts) ** 2
        * sqrt(1 + 0.078 * J * c / (S_x * h_o) * (L_b / r_ts) ** 2)
    )


@clause("AISC 360-22 Eq. F2-1, F2-2, F2-3", "Nominal flexural strength, yielding and LTB")
def ltb_moment(
    M_p: sp.Basic,
    C_b: sp.Basic,
    F_y: sp.Basic,
    S_x: sp.Basic,
    L_b: sp.Basic,
    L_p: sp.Basic,
    L_r: sp.Basic,
    F_cr: sp.Basic,
) -> sp.Expr:
    """Mp when Lb <= Lp (F2-1); F2-2 when Lp < Lb <= Lr; Fcr·Sx when Lb > Lr (F2-3); <= Mp."""
    return cases(
        (M_p, L_b <= L_p),
        (
            smallest(C_b * (M_p - (M_p - 0.7 * F_y * S_x) * ((L_b - L_p) / (L_r - L_p))), M_p),
            L_b <= L_r,
        ),
        (smallest(F_cr * S_x, M_p), True),
    )


# --- F3: compact web, noncompact or slender flanges -------------------------------------


@clause("AISC 360-22 Table B4.1b note [a]", "Flange local buckling coefficient")
def flange_buckling_coefficient(h_tw: sp.Basic) -> sp.Expr:
    """kc = 4/√(h/tw), not less than 0.35 nor more than 0.76 (Table B4.1b, note [a])."""
    return smallest(largest(4 / sqrt(h_tw), 0.35), 0.76)


@clause("AISC 360-22 Eq. F3-1, F3-2", "Nominal flexural strength, flange local buckling")
def flange_local_buckling(
    M_p: sp.Basic,
    F_y: sp.Basic,
    S_x: sp.Basic,
    lam: sp.Basic,
    lam_pf: sp.Basic,
    lam_rf: sp.Basic,
    E: sp.Basic,
    k_c: sp.Basic,
) -> sp.Expr:
    """Noncompact flanges F3-1; slender flanges Mn = 0.9·E·kc·Sx/λ² (F3-2)."""
    return cases(
        (M_p - (M_p - 0.7 * F_y * S_x) * ((lam - lam_pf) / (lam_rf - lam_pf)), lam <= lam_rf),
        (0.9 * E * k_c * S_x / lam**2, True),
    )


# --- F6: I-shapes bent about the minor axis -------------------------------------------


@clause("AISC 360-22 Eq. F6-1", "Nominal flexural strength, yielding (minor axis)")
def minor_axis_plastic_moment(F_y: sp.Basic, Z_y: sp.Basic, S_y: sp.Basic) -> sp.Expr:
    """Mn = Mp = Fy·Zy <= 1.6·Fy·Sy (AISC 360-22 Eq. F6-1)."""
    return smallest(F_y * Z_y, 1.6 * F_y * S_y)


@clause("AISC 360-22 Eq. F6-2, F6-3, F6-4", "Nominal flexural strength, flange local buckling")
def minor_axis_flange_local_buckling(
    M_p: sp.Basic,
    F_y: sp.Basic,
    S_y: sp.Basic,
    lam: sp.Basic,
    lam_pf: sp.Basic,
    lam_rf: sp.Basic,
    E: sp.Basic,
) -> sp.Expr:
    """Noncompact flanges F6-2; slender flanges Mn = Fcr·Sy with Fcr = 0.69E/λ² (F6-3, F6-4)."""
    return cases(
        (M_p - (M_p - 0.7 * F_y * S_y) * ((lam - lam_pf) / (lam_rf - lam_pf)), lam <= lam_rf),
        (0.69 * E / lam**2 * S_y, True),
    )


# --- F7: square and rectangular HSS -----------------------------------------------------


@clause("AISC 360-22 Eq. F7-1", "Plastic moment")
def hss_plastic_moment(F_y: sp.Basic, Z: sp.Basic) -> sp.Expr:
    """Mn = Mp = Fy·Z (AISC 360-22 Eq. F7-1)."""
    return F_y * Z


@clause("AISC 360-22 Eq. F7-2, F7-3", "Nominal flexural strength, flange local buckling")
def hss_flange_local_buckling(
    M_p: sp.Basic,
    F_y: sp.Basic,
    S: sp.Basic,
    lam: sp.Basic,
    lam_rf: sp.Basic,
    E: sp.Basic,
    S_e: sp.Basic,
) -> sp.Expr:
    """Noncompact: Mp − (Mp − Fy·S)(3.57·(b/t)·√(Fy/E) − 4.0) <= Mp (F7-2); slender Fy·Se (F7-3)."""
    return cases(
        (smallest(M_p - (M_p - F_y * S) * (3.57 * lam * sqrt(F_y / E) - 4.0), M_p), lam <= lam_rf),
        (F_y * S_e, True),
    )


@clause("AISC 360-22 Eq. F7-4", "Effective width of the compression flange")
def hss_effective_flange_width(
    t: sp.Basic, E: sp.Basic, F_y: sp.Basic, lam: sp.Basic, b: sp.Basic
) -> sp.Expr:
    """be = 1.92·t·√(E/Fy)·(1 − 0.38/(b/t)·√(E/Fy)) <= b (AISC 360-22 Eq. F7-4)."""
    return smallest(1.92 * t * sqrt(E / F_y) * (1 - 0.38 / lam * sqrt(E / F_y)), b)


@clause(
    "AISC 360-22 Section F7.2(c)",
    "Effective section modulus: elastic, without b − be of the compression flange",
)
def hss_effective_section_modulus(
    I: sp.Basic, A: sp.Basic, H: sp.Basic, t: sp.Basic, b: sp.Basic, b_e: sp.Basic
) -> sp.Expr:
    """Se of the tube with the strip (b − be)·t removed from the compression flange.

    Removing a = (b − be)·t at y0 = (H − t)/2 moves the neutral axis a·y0/(A − a)
    away from it: Ie = I − a·y0²·A/(A − a), Se = Ie/(H/2 + a·y0/(A − a)).
    """
    a = (b - b_e) * t
    y_0 = (H - t) / 2
    return (I - a * y_0**2 * A / (A - a)) / (H / 2 + a * y_0 / (A - a))


@clause("AISC 360-22 Eq. F7-6", "Nominal flexural strength, web local buckling")
def hss_web_local_buckling(
    M_p: sp.Basic, F_y: sp.Basic, S: sp.Basic, lam_w: sp.Basic, E: sp.Basic
) -> sp.Expr:
    """Noncompact webs: Mp − (Mp − Fy·S)(0.305·(h/tw)·√(Fy/E) − 0.738) <= Mp (Eq. F7-6)."""
    return smallest(M_p - (M_p - F_y * S) * (0.305 * lam_w * sqrt(F_y / E) - 0.738), M_p)


@clause("AISC 360-22 Eq. F7-12", "Limiting laterally unbraced length for yielding")
def hss_limiting_length_yielding(
    E: sp.Basic, r_y: sp.Basic, J: sp.Basic, A_g: sp.Basic, M_p: sp.Basic
) -> sp.Expr:
    """Lp = 0.13·E·ry·√(J·Ag)/Mp (AISC 360-22 Eq. F7-12)."""
    return 0.13 * E * r_y * sqrt(J * A_g) / M_p


@clause("AISC 360-22 Eq. F7-13", "Limiting laterally unbraced length for inelastic LTB")
def hss_limiting_length_inelastic(
    E: sp.Basic, r_y: sp.Basic, J: sp.Basic, A_g: sp.Basic, F_y: sp.Basic, S_x: sp.Basic
) -> sp.Expr:
    """Lr = 2·E·ry·√(J·Ag)/(0.7·Fy·Sx) (AISC 360-22 Eq. F7-13)."""
    return 2 * E * r_y * sqrt(J * A_g) / (0.7 * F_y * S_x)


@clause("AISC 360-22 Eq. F7-10, F7-11", "Nominal flexural strength, lateral-torsional buckling")
def hss_ltb_moment(
    M_p: sp.Basic,
    C_b: sp.Basic,
    F_y: sp.Basic,
    S_x: sp.Basic,
    L_b: sp.Basic,
    L_p: sp.Basic,
    L_r: sp.Basic,
    E: sp.Basic,
    J: sp.Basic,
    A_g: sp.Basic,
    r_y: sp.Basic,
) -> sp.Expr:
    """Mp when Lb <= Lp; F7-10 when Lp < Lb <= Lr; 2·E·Cb·√(J·Ag)/(Lb/ry) (F7-11); <= Mp."""
    return cases(
        (M_p, L_b <= L_p),
        (
            smallest(C_b * (M_p - (M_p - 0.7 * F_y * S_x) * ((L_b - L_p) / (L_r - L_p))), M_p),
            L_b <= L_r,
        ),
        (smallest(2 * E * C_b * sqrt(J * A_g) / (L_b / r_y), M_p), True),
    )


# --- F8: round HSS -------------------------------------------------------------------


@clause("AISC 360-22 Eq. F8-1, F8-2, F8-3, F8-4", "Nominal flexural strength, round HSS")
def round_hss_flexure(
    E: sp.Basic, F_y: sp.Basic, D_t: sp.Basic, Z: sp.Basic, S: sp.Basic
) -> sp.Expr:
    """Compact Fy·Z (F8-1); noncompact (0.021E/(D/t) + Fy)·S (F8-2); slender 0.33E/(D/t)·S.

    F8 holds for D/t < 0.45E/Fy; the caller refuses thinner tubes.
    """
    return cases(
        (F_y * Z, D_t <= 0.07 * E / F_y),
        ((0.021 * E / D_t + F_y) * S, D_t <= 0.31 * E / F_y),
        (0.33 * E / D_t * S, True),
    )


# --- F10: single angles ------------------------------------------------------------------


@clause("AISC 360-22 Section F10.1", "Yield moment about the axis of bending")
def angle_yield_moment(F_y: sp.Basic, S: sp.Basic) -> sp.Expr:
    """My = Fy·S with the geometric section modulus S (AISC 360-22 Section F10.1)."""
    return F_y * S


@clause("AISC 360-22 Eq. F10-1", "Nominal flexural strength, yielding")
def angle_yielding(M_y: sp.Basic) -> sp.Expr:
    """Mn = 1.5·My (AISC 360-22 Eq. F10-1)."""
    return 1.5 * M_y


@clause("AISC 360-22 Section F10.2(b)(2)(i)", "Yield moment for LTB, 0.80 of the geometric")
def angle_yield_moment_ltb(M_y: sp.Basic) -> sp.Expr:
    """Equal-leg angle in geometric-axis bending without LTB restraint: 0.80·My."""
    return 0.80 * M_y


@clause("AISC 360-22 Eq. F10-5a", "Elastic LTB moment, equal-leg angle, toe in compression")
def angle_elastic_ltb_moment(
    E: sp.Basic, b: sp.Basic, t: sp.Basic, C_b: sp.Basic, L_b: sp.Basic
) -> sp.Expr:
    """Mcr = 0.58·E·b⁴·t·Cb/Lb²·(√(1 + 0.88·(Lb·t/b²)²) − 1) (Eq. F10-5a).

    The toe-in-compression case is the smaller Mcr, so it is used whatever the sign.
    """
    return 0.58 * E * b**4 * t * C_b / L_b**2 * (sqrt(1 + 0.88 * (L_b * t / b**2) ** 2) - 1)


@clause("AISC 360-22 Eq. F10-2, F10-3", "Nominal flexural strength, lateral-torsional buckling")
def angle_ltb(M_y: sp.Basic, M_cr: sp.Basic) -> sp.Expr:
    """(1.92 − 1.17√(My/Mcr))·My <= 1.5My when My/Mcr <= 1 (F10-2), else (0.92 − 0.17Mcr/My)Mcr."""
    return cases(
        (smallest((1.92 - 1.17 * sqrt(M_y / M_cr)) * M_y, 1.5 * M_y), M_y / M_cr <= 1),
        ((0.92 - 0.17 * M_cr / M_y) * M_cr, True),
    )


@clause("AISC 360-22 Eq. F10-6, F10-7, F10-8", "Nominal flexural strength, leg local buckling")
def angle_leg_local_buckling(
    F_y: sp.Basic, S_c: sp.Basic, lam: sp.Basic, lam_r: sp.Basic, E: sp.Basic
) -> sp.Expr:
    """Noncompact Fy·Sc·(2.43 − 1.72·(b/t)·√(Fy/E)) (F10-6); slender Fcr·Sc, Fcr = 0.71E/(b/t)²."""
    return cases(
        (F_y * S_c * (2.43 - 1.72 * lam * sqrt(F_y / E)), lam <= lam_r),
        (0.71 * E / lam**2 * S_c, True),
    )
