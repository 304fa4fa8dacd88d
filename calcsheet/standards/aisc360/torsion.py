"""AISC 360-22 Section H3: torsion, and torsion combined with shear, flexure and axial force.

* H3.1: the torsional strength of round HSS (a) and rectangular HSS (b),
  Tn = Fcr·C (Eq. H3-1) with Fcr by Eq. H3-2a/H3-2b (round) or H3-3/H3-4/H3-5
  (rectangular) and C, the HSS torsional constant, as the User Note of H3.1 gives it;
* H3.2: the interaction of torsion with shear, flexure and axial force (Eq. H3-6),
  which applies when Tr > 0.2·Tc;
* H3.3: non-HSS members (open sections), where the required normal and shear
  stresses of an elastic analysis are compared with Fy (Eq. H3-7), 0.6·Fy (Eq. H3-8)
  and the buckling stress Fcr (Eq. H3-9), which the Specification leaves to analysis:
  here Chapter E's for the axial part of the compressive stress and Chapter F's for the
  rest, their ratios added as in Eq. H2-1 (:func:`buckling_stress_ratio`).

φT = 0.90 (LRFD) and ΩT = 1.67 (ASD) for all of them (Sections H3.1 and H3.3).
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import sqrt
from calcsheet.standards.aisc360._functions import cases, largest, smallest
from calcsheet.standards.aisc360.factors import LimitStateFactors
from calcsheet.standards.clause import clause

TORSION_HSS = LimitStateFactors("torsion of HSS", 0.90, 1.67, "AISC 360-22 Section H3.1", "T")
TORSION_OPEN = LimitStateFactors(
    "torsion and combined stress of non-HSS members", 0.90, 1.67, "AISC 360-22 Section H3.3", "T"
)
# Tr/Tc up to which torsion may be neglected in the interaction (Section H3.2).
TORSION_RATIO_LIMIT = 0.2
# The largest h/t Eq. H3-5 covers (Section H3.1(b)(3)).
RECTANGULAR_HSS_MAX_RATIO = 260


@clause("AISC 360-22 Section H3.1, User Note", "Torsional constant of a round HSS")
def round_hss_torsional_constant(D: sp.Basic, t: sp.Basic) -> sp.Expr:
    """C = π·(D − t)²·t/2 (AISC 360-22 Section H3.1, User Note)."""
    return sp.pi * (D - t) ** 2 * t / 2


@clause("AISC 360-22 Section H3.1, User Note", "Torsional constant of a rectangular HSS")
def rectangular_hss_torsional_constant(B: sp.Basic, H: sp.Basic, t: sp.Basic) -> sp.Expr:
    """C = 2·(B − t)·(H − t)·t − 4.5·(4 − π)·t³ (AISC 360-22 Section H3.1, User Note)."""
    return 2 * (B - t) * (H - t) * t - 4.5 * (4 - sp.pi) * t**3


@clause("AISC 360-22 Eq. H3-2a", "Torsional buckling stress of a round HSS, length-dependent")
def round_hss_torsion_stress_long(E: sp.Basic, L: sp.Basic, D: sp.Basic, D_t: sp.Basic) -> sp.Expr:
    """Fcr = 1.23·E / (√(L/D)·(D/t)^(5/4)) (AISC 360-22 Eq. H3-2a)."""
    return 1.23 * E / (sqrt(L / D) * D_t ** sp.Rational(5, 4))


@clause("AISC 360-22 Eq. H3-2b", "Torsional buckling stress of a round HSS")
def round_hss_torsion_stress_short(E: sp.Basic, D_t: sp.Basic) -> sp.Expr:
    """Fcr = 0.60·E / (D/t)^(3/2) (AISC 360-22 Eq. H3-2b)."""
    return 0.60 * E / D_t ** sp.Rational(3, 2)


@clause("AISC 360-22 Section H3.1(a)", "Critical stress of a round HSS in torsion")
def round_hss_torsion_critical(F_cr_a: sp.Basic, F_cr_b: sp.Basic, F_y: sp.Basic) -> sp.Expr:
    """The larger of Eq. H3-2a and H3-2b, not more than 0.6·Fy (AISC 360-22 Section H3.1(a))."""
    return smallest(largest(F_cr_a, F_cr_b), 0.6 * F_y)


@clause("AISC 360-22 Eq. H3-3, H3-4, H3-5", "Critical stress of a rectangular HSS in torsion")
def rectangular_hss_torsion_critical(h_t: sp.Basic, E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
    """Fcr = 0.6·Fy for h/t <= 2.45√(E/Fy) (H3-3); 0.6·Fy·2.45√(E/Fy)/(h/t) up to
    3.07√(E/Fy) (H3-4); 0.458·π²·E/(h/t)² beyond, up to h/t = 260 (H3-5).

    h is the flat width of the longer side, t the design wall thickness.
    """
    return cases(
        (0.6 * F_y, h_t <= 2.45 * sqrt(E / F_y)),
        (0.6 * F_y * 2.45 * sqrt(E / F_y) / h_t, h_t <= 3.07 * sqrt(E / F_y)),
        (0.458 * sp.pi**2 * E / h_t**2, True),
    )


@clause("AISC 360-22 Eq. H3-1", "Nominal torsional strength of an HSS")
def hss_torsional_strength(F_cr: sp.Basic, C: sp.Basic) -> sp.Expr:
    """Tn = Fcr·C (AISC 360-22 Eq. H3-1)."""
    return F_cr * C


@clause("AISC 360-22 Eq. H3-6", "Interaction of torsion, shear, flexure and axial force")
def torsion_interaction(
    P_r: sp.Basic,
    P_c: sp.Basic,
    M_rx: sp.Basic,
    M_cx: sp.Basic,
    M_ry: sp.Basic,
    M_cy: sp.Basic,
    v_ratio: sp.Basic,
    T_r: sp.Basic,
    T_c: sp.Basic,
    eta_H1: sp.Basic,
) -> sp.Expr:
    """(Pr/Pc + Mr/Mc) + (Vr/Vc + Tr/Tc)² when Tr > 0.2·Tc (AISC 360-22 Eq. H3-6);
    otherwise torsion is neglected (Section H3.2) and the Chapter H1 ratio ``eta_H1`` stands.

    Pass magnitudes. Mr/Mc is the sum over both axes and ``v_ratio`` = Vr/Vc the shear
    ratio (the sum of both directions' ratios for a rectangular HSS): conservative for
    a member bent about two axes, which Eq. H3-6 does not address.
    """
    return cases(
        (
            P_r / P_c + M_rx / M_cx + M_ry / M_cy + (v_ratio + T_r / T_c) ** 2,
            T_r > TORSION_RATIO_LIMIT * T_c,
        ),
        (eta_H1, True),
    )


@clause("AISC 360-22 Eq. H3-7", "Nominal stress, yielding under normal stress")
def normal_yielding_stress(F_y: sp.Basic) -> sp.Expr:
    """Fn = Fy (AISC 360-22 Eq. H3-7)."""
    return F_y


@clause("AISC 360-22 Eq. H3-8", "Nominal stress, shear yielding")
def shear_yielding_stress(F_y: sp.Basic) -> sp.Expr:
    """Fn = 0.6·Fy (AISC 360-22 Eq. H3-8)."""
    return 0.6 * F_y


@clause("AISC 360-22 Section H3.3(c), Eq. H3-9", "Buckling under the compressive normal stress")
def buckling_stress_ratio(f_a: sp.Basic, F_ca: sp.Basic, f_b: sp.Basic, F_cb: sp.Basic) -> sp.Expr:
    """fa/Fca + fb/Fcb: Fn = Fcr (AISC 360-22 Eq. H3-9) with the buckling stress of the
    section split by action, as the stress ratios of Eq. H2-1 add them.

    ``f_a`` the compressive stress of the axial force, ``F_ca`` its available buckling
    stress (Chapter E); ``f_b`` the rest of the compressive normal stress at the worst
    point, ``F_cb`` its available stress in flexure (Chapter F, lateral-torsional and
    local buckling). Must not exceed 1.0.
    """
    return f_a / F_ca + f_b / F_cb
