"""AISC 360-22 Chapter E: flexural buckling (E3) and members with slender elements (E7).

E3 covers members without slender elements (Table B4.1a). E7 reduces the area to
an effective area where elements are slender; for a member without slender
elements every effective width equals the full width, so E7-1 gives the same
strength as E3-1. The sheet writes E7 only for slender sections; the numeric path
uses the E7 clauses for all sections, which is the same arithmetic.

Not covered: torsional and flexural-torsional buckling (E4), single-angle
members per E5, built-up members (E6).
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import pi, sqrt
from calcsheet.standards.aisc360._functions import cases
from calcsheet.standards.clause import Clause, clause

# Fy/Fe at which the inelastic curve E3-2 gives way to the elastic E3-3.
INELASTIC_LIMIT = 2.25


@clause("AISC 360-22 Section E2", "Effective length, Lc = K·L")
def effective_length(K: sp.Basic, L: sp.Basic) -> sp.Expr:
    """Lc = K·L (AISC 360-22 Section E2, definition of Lc)."""
    return K * L


@clause("AISC 360-22 Section E2", "Slenderness ratio")
def slenderness_ratio(L_c: sp.Basic, r: sp.Basic) -> sp.Expr:
    """Lc/r (AISC 360-22 Section E2; the User Note recommends Lc/r <= 200)."""
    return L_c / r


@clause("AISC 360-22 Eq. E3-4", "Elastic buckling stress")
def elastic_buckling_stress(E: sp.Basic, L_c: sp.Basic, r: sp.Basic) -> sp.Expr:
    """Fe = π²E/(Lc/r)² (AISC 360-22 Eq. E3-4)."""
    return pi**2 * E / (L_c / r) ** 2


@clause("AISC 360-22 Eq. E3-2, E3-3", "Critical stress for flexural buckling")
def critical_stress(F_y: sp.Basic, F_e: sp.Basic) -> sp.Expr:
    """Fcr = 0.658^(Fy/Fe)·Fy when Fy/Fe <= 2.25 (E3-2), else 0.877·Fe (E3-3)."""
    return cases(
        (0.658 ** (F_y / F_e) * F_y, F_y / F_e <= INELASTIC_LIMIT),
        (0.877 * F_e, True),
    )


@clause("AISC 360-22 Eq. E3-1", "Nominal compressive strength, flexural buckling")
def nominal_compressive_strength(F_cr: sp.Basic, A_g: sp.Basic) -> sp.Expr:
    """Pn = Fcr·Ag (AISC 360-22 Eq. E3-1)."""
    return F_cr * A_g


# --- E7: members with slender elements -----------------------------------------------

# Table E7.1: effective width imperfection adjustment factors c1, c2 (c2 from Eq. E7-4).
E7_CASES: dict[str, tuple[float, float, str]] = {
    "a": (0.18, 1.31, "stiffened elements except walls of square and rectangular HSS"),
    "b": (0.20, 1.38, "walls of square and rectangular HSS"),
    "c": (0.22, 1.49, "all other elements"),
}


def _local_buckling_stress(case: str) -> Clause:
    _, c_2, elements = E7_CASES[case]

    def build(lam_r: sp.Basic, lam: sp.Basic, F_y: sp.Basic) -> sp.Expr:
        return (sp.Float(c_2) * lam_r / lam) ** 2 * F_y

    return Clause(
        f"AISC 360-22 Eq. E7-5, Table E7.1 case ({case})",
        f"Elastic local buckling stress, {elements} (c2 = {c_2})",
        build,
    )


def _effective_width(case: str) -> Clause:
    c_1, _, elements = E7_CASES[case]

    def build(
        b: sp.Basic, lam: sp.Basic, lam_r: sp.Basic, F_y: sp.Basic, F_cr: sp.Basic, F_el: sp.Basic
    ) -> sp.Expr:
        return cases(
            (b, lam <= lam_r * sqrt(F_y / F_cr)),
            (b * (1 - sp.Float(c_1) * sqrt(F_el / F_cr)) * sqrt(F_el / F_cr), True),
        )

    return Clause(
        f"AISC 360-22 Eq. E7-2, E7-3, Table E7.1 case ({case})",
        f"Effective width, {elements} (c1 = {c_1})",
        build,
    )


LOCAL_BUCKLING_STRESS = {case: _local_buckling_stress(case) for case in E7_CASES}
EFFECTIVE_WIDTH = {case: _effective_width(case) for case in E7_CASES}


@clause("AISC 360-22 Section E7.1", "Effective area: Ag less the ineffective widths")
def effective_area_i_shape(
    A_g: sp.Basic,
    h: sp.Basic,
    h_e: sp.Basic,
    t_w: sp.Basic,
    b: sp.Basic,
    b_e: sp.Basic,
    t_f: sp.Basic,
) -> sp.Expr:
    """Ae = Ag − (h − he)·tw − 4·(b − be)·tf for an I-shape (four half-flanges)."""
    return A_g - (h - h_e) * t_w - 4 * (b - b_e) * t_f


@clause("AISC 360-22 Section E7.1", "Effective area: Ag less the ineffective widths")
def effective_area_box(
    A_g: sp.Basic, h: sp.Basic, h_e: sp.Basic, b: sp.Basic, b_e: sp.Basic, t: sp.Basic
) -> sp.Expr:
    """Ae = Ag − 2·(h − he)·t − 2·(b − be)·t for a rectangular HSS."""
    return A_g - 2 * (h - h_e) * t - 2 * (b - b_e) * t


@clause("AISC 360-22 Section E7.1", "Effective area: Ag less the ineffective widths")
def effective_area_angle(
    A_g: sp.Basic, b_1: sp.Basic, b_e1: sp.Basic, b_2: sp.Basic, b_e2: sp.Basic, t: sp.Basic
) -> sp.Expr:
    """Ae = Ag − (b1 − be1)·t − (b2 − be2)·t for a single angle."""
    return A_g - (b_1 - b_e1) * t - (b_2 - b_e2) * t


@clause("AISC 360-22 Eq. E7-6", "Effective area of a round HSS")
def effective_area_round(E: sp.Basic, F_y: sp.Basic, D_t: sp.Basic, A_g: sp.Basic) -> sp.Expr:
    """Ae = Ag when D/t <= 0.11E/Fy, else [0.038E/(Fy·D/t) + 2/3]·Ag (Eq. E7-6).

    E7.2 holds for D/t < 0.45E/Fy; the caller refuses thinner tubes.
    """
    return cases(
        (A_g, D_t <= 0.11 * E / F_y),
        ((0.038 * E / (F_y * D_t) + sp.Rational(2, 3)) * A_g, True),
    )


@clause("AISC 360-22 Eq. E7-1", "Nominal compressive strength, slender elements")
def nominal_compressive_strength_slender(F_cr: sp.Basic, A_e: sp.Basic) -> sp.Expr:
    """Pn = Fcr·Ae (AISC 360-22 Eq. E7-1)."""
    return F_cr * A_e


@clause("AISC 360-22 Eq. E4-2", "Elastic torsional buckling stress, doubly symmetric member")
def torsional_buckling_stress(
    E: sp.Basic,
    C_w: sp.Basic,
    L_cz: sp.Basic,
    G: sp.Basic,
    J: sp.Basic,
    I_x: sp.Basic,
    I_y: sp.Basic,
) -> sp.Expr:
    """Fe = (π²·E·Cw/Lcz² + G·J)/(Ix + Iy) (AISC 360-22 Eq. E4-2)."""
    return (pi**2 * E * C_w / L_cz**2 + G * J) / (I_x + I_y)
