"""AISC 360-22 Chapter G: shear of I-shape webs (G2), single angles (G3), rectangular HSS
(G4), round HSS (G5) and I-shapes in weak-axis shear (G6).

Members without transverse stiffeners and without tension field action. kv is
5.34 for unstiffened I-shape webs (G2.1(b)), 5 for HSS walls (G4) and 1.2 for
flanges and angle legs (G3, G6); the caller passes it as an input so the sheet
shows it.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import sqrt
from calcsheet.standards.aisc360._functions import cases, largest, smallest
from calcsheet.standards.clause import clause

KV_UNSTIFFENED_WEB = 5.34
KV_HSS = 5.0
KV_FLANGE_OR_LEG = 1.2


@clause("AISC 360-22 Section G2.1(a)", "Web slenderness limit for φv = 1.00 (rolled I-shapes)")
def rolled_web_shear_limit(E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
    """2.24·√(E/Fy): rolled I-shape webs within it take φv = 1.00, Ωv = 1.50, Cv1 = 1.0."""
    return 2.24 * sqrt(E / F_y)


@clause("AISC 360-22 Eq. G2-1", "Nominal shear strength")
def web_shear_strength(F_y: sp.Basic, A_w: sp.Basic, C_v1: sp.Basic) -> sp.Expr:
    """Vn = 0.6·Fy·Aw·Cv1 (AISC 360-22 Eq. G2-1), Aw = d·tw."""
    return 0.6 * F_y * A_w * C_v1


@clause("AISC 360-22 Eq. G2-2, G2-3, G2-4", "Web shear strength coefficient")
def web_shear_coefficient(h_tw: sp.Basic, k_v: sp.Basic, E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
    """Cv1 = 1.0 when h/tw <= 1.10·√(kv·E/Fy) (G2-2, G2-3), else 1.10·√(kv·E/Fy)/(h/tw)."""
    return cases(
        (1, h_tw <= 1.10 * sqrt(k_v * E / F_y)),
        (1.10 * sqrt(k_v * E / F_y) / h_tw, True),
    )


@clause("AISC 360-22 Eq. G2-9, G2-10, G2-11", "Web shear buckling coefficient")
def shear_buckling_coefficient(
    h_tw: sp.Basic, k_v: sp.Basic, E: sp.Basic, F_y: sp.Basic
) -> sp.Expr:
    """Cv2 = 1.0 (G2-9); 1.10√(kvE/Fy)/(h/tw) up to 1.37√(kvE/Fy) (G2-10); else G2-11."""
    return cases(
        (1, h_tw <= 1.10 * sqrt(k_v * E / F_y)),
        (1.10 * sqrt(k_v * E / F_y) / h_tw, h_tw <= 1.37 * sqrt(k_v * E / F_y)),
        (1.51 * k_v * E / (h_tw**2 * F_y), True),
    )


@clause("AISC 360-22 Eq. G3-1", "Nominal shear strength of a single-angle leg")
def angle_shear_strength(F_y: sp.Basic, b: sp.Basic, t: sp.Basic, C_v2: sp.Basic) -> sp.Expr:
    """Vn = 0.6·Fy·b·t·Cv2 (AISC 360-22 Eq. G3-1), kv = 1.2, h/tw = b/t."""
    return 0.6 * F_y * b * t * C_v2


@clause("AISC 360-22 Eq. G4-1", "Nominal shear strength of a rectangular HSS")
def hss_shear_strength(F_y: sp.Basic, A_w: sp.Basic, C_v2: sp.Basic) -> sp.Expr:
    """Vn = 0.6·Fy·Aw·Cv2 (AISC 360-22 Eq. G4-1), Aw = 2·h·t, kv = 5."""
    return 0.6 * F_y * A_w * C_v2


@clause("AISC 360-22 Eq. G5-2a, G5-2b", "Shear critical stress of a round HSS")
def round_hss_shear_stress(
    E: sp.Basic, F_y: sp.Basic, L_v: sp.Basic, D: sp.Basic, D_t: sp.Basic
) -> sp.Expr:
    """The larger of 1.60E/(√(Lv/D)·(D/t)^(5/4)) (G5-2a) and 0.78E/(D/t)^(3/2) (G5-2b), <= 0.6Fy."""
    return smallest(
        largest(
            1.60 * E / (sqrt(L_v / D) * D_t ** sp.Rational(5, 4)),
            0.78 * E / D_t ** sp.Rational(3, 2),
        ),
        0.6 * F_y,
    )


@clause("AISC 360-22 Eq. G5-1", "Nominal shear strength of a round HSS")
def round_hss_shear_strength(F_cr: sp.Basic, A_g: sp.Basic) -> sp.Expr:
    """Vn = Fcr·Ag/2 (AISC 360-22 Eq. G5-1)."""
    return F_cr * A_g / 2


@clause("AISC 360-22 Eq. G6-1", "Nominal weak-axis shear strength, both flanges")
def weak_axis_shear_strength(
    F_y: sp.Basic, b_f: sp.Basic, t_f: sp.Basic, C_v2: sp.Basic
) -> sp.Expr:
    """Vn = 0.6·Fy·bf·tf·Cv2 per flange (AISC 360-22 Eq. G6-1), two flanges."""
    return 2 * (0.6 * F_y * b_f * t_f * C_v2)


@clause("AISC 360-22 Section G2.1", "Web area, Aw = d·tw")
def web_area(d: sp.Basic, t_w: sp.Basic) -> sp.Expr:
    """Aw = d·tw, the overall depth times the web thickness (AISC 360-22 Section G2.1)."""
    return d * t_w


@clause("AISC 360-22 Section G4", "Shear area of a rectangular HSS, Aw = 2·h·t")
def hss_web_area(h: sp.Basic, t: sp.Basic) -> sp.Expr:
    """Aw = 2·h·t, the two walls parallel to the shear (AISC 360-22 Section G4)."""
    return 2 * h * t


@clause("", "Resultant shear (a round HSS resists shear alike in every direction)")
def resultant_shear(V_rx: sp.Basic, V_ry: sp.Basic) -> sp.Expr:
    """Vr = √(Vrx² + Vry²): the vector sum of the two shear components."""
    return sqrt(V_rx**2 + V_ry**2)
