"""Cross-section classification, EN 1993-1-1:2005 Table 5.2.

Each limit is a clause of its own so a sheet shows c/t beside the three limits
and the class that follows. ``eps`` is ε = √(235/f_y) with f_y in N/mm²; the
235 N/mm² is an argument (``f_235``) so the expression carries no hidden unit.

Stress ratios follow the table: ``alpha`` is the compressed fraction of an
internal part at full plasticity (classes 1 and 2), ``psi`` the ratio of the end
stresses of the part in the elastic state (class 3), compression positive.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Max, Min, Piecewise, sqrt
from calcsheet.standards.clause import clause

# A wall with almost none of its depth in compression is class 1 for any real c/t;
# the floor keeps 36ε/α finite (the limit is then 720ε) and errs on the safe side.
ALPHA_FLOOR = 0.05


@clause("EN 1993-1-1 Table 5.2", "ε = √(235/{f_y})")
def epsilon(f_235, f_y):
    """Material factor ε of Table 5.2 (sheet 3): ε = √(235/f_y), f_y in N/mm²."""
    return sqrt(f_235 / f_y)


@clause("EN 1993-1-1 Table 5.2", "Class of a part from its c/t ratio and the three limits")
def class_from_limits(c_t, limit_1, limit_2, limit_3):
    """Class 1, 2 or 3 when c/t is within that class's limit, else 4 (Table 5.2)."""
    return Piecewise(
        (1, c_t <= limit_1),
        (2, c_t <= limit_2),
        (3, c_t <= limit_3),
        (4, True),
    )


# --- internal compression parts (webs, walls of hollow sections), Table 5.2 sheet 1 --------


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 1 limit of an internal part")
def internal_class_1_limit(eps, alpha):
    """c/t ≤ 396ε/(13α − 1) when α > 0.5, else c/t ≤ 36ε/α (Table 5.2 sheet 1)."""
    return Piecewise((396 * eps / (13 * alpha - 1), alpha > 0.5), (36 * eps / alpha, True))


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 2 limit of an internal part")
def internal_class_2_limit(eps, alpha):
    """c/t ≤ 456ε/(13α − 1) when α > 0.5, else c/t ≤ 41.5ε/α (Table 5.2 sheet 1)."""
    return Piecewise((456 * eps / (13 * alpha - 1), alpha > 0.5), (41.5 * eps / alpha, True))


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 3 limit of an internal part")
def internal_class_3_limit(eps, psi):
    """c/t ≤ 42ε/(0.67 + 0.33ψ) when ψ > −1, else c/t ≤ 62ε(1 − ψ)√(−ψ) (Table 5.2)."""
    return Piecewise(
        (42 * eps / (0.67 + 0.33 * psi), psi > -1),
        (62 * eps * (1 - psi) * sqrt(-psi), True),
    )


@clause(
    "EN 1993-1-1 Table 5.2 (sheet 1)",
    "Compressed fraction α of an internal part at full plasticity",
)
def plastic_alpha(N_c, f_y, c, t_total):
    """α = ½(1 + N_c/(f_y·c·Σt)), between a floor of 0.05 and 1.

    The plastic neutral axis of a doubly symmetric section under N and M lies in
    the web(s) while the axial force fits in them: the web depth c carries N_c
    (compression positive) on a central strip of height N_c/(f_y·Σt), Σt the
    total thickness of the parallel webs (t_w for an I-section, 2t for a hollow
    section). Common practice for Table 5.2; no formula of the standard.
    """
    return Min(1, Max(ALPHA_FLOOR, (1 + N_c / (f_y * c * t_total)) / 2))


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "End stress ratio ψ of an internal part")
def elastic_psi(N_c, A, M, W_el, h, c):
    """ψ = σ₂/σ₁ with σ = N_c/A ± |M|·c/(W_el·h) at the ends of the part (compression +).

    The part spans ±c/2 about the centroid of a doubly symmetric section of depth
    h (across the bending axis), so the bending stress there is |M|/W_el·(c/h).
    When no end is in compression the part is taken as in pure bending (ψ = −1),
    which gives a lower class-3 limit than the true (tension) state: safe side.
    """
    sigma_N = N_c / A
    sigma_M = sp.Abs(M) * c / (W_el * h)
    # "σ₁ > 0" written as σ_N > −σ_M so both sides carry a stress unit.
    return Piecewise(((sigma_N - sigma_M) / (sigma_N + sigma_M), sigma_N > -sigma_M), (-1, True))


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 1 limit of an internal part in compression")
def internal_compression_class_1_limit(eps):
    """c/t ≤ 33ε for an internal part in compression (Table 5.2 sheet 1)."""
    return 33 * eps


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 2 limit of an internal part in compression")
def internal_compression_class_2_limit(eps):
    """c/t ≤ 38ε for an internal part in compression (Table 5.2 sheet 1)."""
    return 38 * eps


@clause("EN 1993-1-1 Table 5.2 (sheet 1)", "Class 3 limit of an internal part in compression")
def internal_compression_class_3_limit(eps):
    """c/t ≤ 42ε for an internal part in compression (Table 5.2 sheet 1)."""
    return 42 * eps


# --- outstand flanges, Table 5.2 sheet 2 ---------------------------------------------------


@clause("EN 1993-1-1 Table 5.2 (sheet 2)", "Class 1 limit of an outstand in compression")
def outstand_class_1_limit(eps):
    """c/t ≤ 9ε for an outstand flange in compression (Table 5.2 sheet 2)."""
    return 9 * eps


@clause("EN 1993-1-1 Table 5.2 (sheet 2)", "Class 2 limit of an outstand in compression")
def outstand_class_2_limit(eps):
    """c/t ≤ 10ε for an outstand flange in compression (Table 5.2 sheet 2)."""
    return 10 * eps


@clause("EN 1993-1-1 Table 5.2 (sheet 2)", "Class 3 limit of an outstand in compression")
def outstand_class_3_limit(eps):
    """c/t ≤ 14ε for an outstand flange in compression (Table 5.2 sheet 2)."""
    return 14 * eps


# --- tubular sections, Table 5.2 sheet 3 ---------------------------------------------------


@clause("EN 1993-1-1 Table 5.2 (sheet 3)", "Class 1 limit of a tube, d/t ≤ 50ε²")
def tube_class_1_limit(eps):
    """d/t ≤ 50ε² for a circular hollow section in bending and/or compression."""
    return 50 * eps**2


@clause("EN 1993-1-1 Table 5.2 (sheet 3)", "Class 2 limit of a tube, d/t ≤ 70ε²")
def tube_class_2_limit(eps):
    """d/t ≤ 70ε² for a circular hollow section in bending and/or compression."""
    return 70 * eps**2


@clause("EN 1993-1-1 Table 5.2 (sheet 3)", "Class 3 limit of a tube, d/t ≤ 90ε²")
def tube_class_3_limit(eps):
    """d/t ≤ 90ε² for a circular hollow section (beyond: class 4, EN 1993-1-6)."""
    return 90 * eps**2
