"""Uniform members in bending and axial compression, EN 1993-1-1:2005 6.3.3 and Annex B.

Clauses for the interaction factors of Annex B (Table B.1 for members not
susceptible to torsional deformations, Table B.2 for k_zy of members that are),
and the two
criteria Eq. (6.61) and (6.62) for class 1, 2 and 3 cross-sections (ΔM = 0,
Table 6.7). The expressions of Annex B are quoted from memory and should be read
against the standard on review.
"""

from __future__ import annotations

from calcsheet.engine.functions import Max, Min, Piecewise
from calcsheet.standards.clause import clause


@clause("EN 1993-1-1 Table 6.7", "Characteristic moment resistance")
def characteristic_moment(W_pl, W_el, f_y, section_class):
    """M_Rk = W_pl·f_y for class 1 or 2, W_el·f_y for class 3 (Table 6.7)."""
    return Piecewise((W_pl * f_y, section_class <= 2), (W_el * f_y, section_class <= 3))


@clause("EN 1993-1-1 Eq. (6.61), (6.62)", "Axial force ratio for buckling, n = {N_Ed}/{N_b_Rd}")
def buckling_axial_ratio(N_Ed, chi, A, f_y, gamma_M1):
    """n_y = N_Ed/(χ_y·N_Rk/γM1), n_z = N_Ed/(χ_z·N_Rk/γM1), N_Rk = A·f_y (class 1–3): the
    first term of Eq. (6.61) and (6.62), and n_y, n_z of Annex B."""
    return N_Ed / (chi * A * f_y / gamma_M1)


@clause("EN 1993-1-1 Annex B, Table B.1", "Interaction factor {k_yy}")
def k_yy(C_my, lambda_y, n_y, section_class):
    """Class 1, 2: C_my·(1 + (λ̄_y − 0.2)·n_y) ≤ C_my·(1 + 0.8·n_y);
    class 3: C_my·(1 + 0.6·λ̄_y·n_y) ≤ C_my·(1 + 0.6·n_y) (I-sections and RHS)."""
    return Piecewise(
        (C_my * Min(1 + (lambda_y - 0.2) * n_y, 1 + 0.8 * n_y), section_class <= 2),
        (C_my * Min(1 + 0.6 * lambda_y * n_y, 1 + 0.6 * n_y), True),
    )


@clause("EN 1993-1-1 Annex B, Table B.1", "Interaction factor {k_zz}, I-section")
def k_zz_i(C_mz, lambda_z, n_z, section_class):
    """Class 1, 2: C_mz·(1 + (2λ̄_z − 0.6)·n_z) ≤ C_mz·(1 + 1.4·n_z);
    class 3: C_mz·(1 + 0.6·λ̄_z·n_z) ≤ C_mz·(1 + 0.6·n_z)."""
    return Piecewise(
        (C_mz * Min(1 + (2 * lambda_z - 0.6) * n_z, 1 + 1.4 * n_z), section_class <= 2),
        (C_mz * Min(1 + 0.6 * lambda_z * n_z, 1 + 0.6 * n_z), True),
    )


@clause("EN 1993-1-1 Annex B, Table B.1", "Interaction factor {k_zz}, hollow section")
def k_zz_hollow(C_mz, lambda_z, n_z, section_class):
    """Class 1, 2 (RHS): C_mz·(1 + (λ̄_z − 0.2)·n_z) ≤ C_mz·(1 + 0.8·n_z);
    class 3: C_mz·(1 + 0.6·λ̄_z·n_z) ≤ C_mz·(1 + 0.6·n_z)."""
    return Piecewise(
        (C_mz * Min(1 + (lambda_z - 0.2) * n_z, 1 + 0.8 * n_z), section_class <= 2),
        (C_mz * Min(1 + 0.6 * lambda_z * n_z, 1 + 0.6 * n_z), True),
    )


@clause("EN 1993-1-1 Annex B, Table B.1", "Interaction factor {k_yz}")
def k_yz(k_zz, section_class):
    """k_yz = 0.6·k_zz for class 1, 2; k_zz for class 3."""
    return Piecewise((0.6 * k_zz, section_class <= 2), (k_zz, True))


@clause("EN 1993-1-1 Annex B, Table B.1", "Interaction factor {k_zy}, no torsional deformation")
def k_zy_rigid(k_yy, section_class):
    """k_zy = 0.6·k_yy for class 1, 2; 0.8·k_yy for class 3."""
    return Piecewise((0.6 * k_yy, section_class <= 2), (0.8 * k_yy, True))


@clause("EN 1993-1-1 Annex B, Table B.2", "Interaction factor {k_zy}, torsional deformation")
def k_zy_torsional(C_mLT, lambda_z, n_z, section_class):
    """Class 1, 2: [1 − 0.1·λ̄_z·n_z/(C_mLT − 0.25)] ≥ [1 − 0.1·n_z/(C_mLT − 0.25)], and
    for λ̄_z < 0.4: k_zy = 0.6 + λ̄_z ≤ 1 − 0.1·λ̄_z·n_z/(C_mLT − 0.25);
    class 3: [1 − 0.05·λ̄_z·n_z/(C_mLT − 0.25)] ≥ [1 − 0.05·n_z/(C_mLT − 0.25)]."""
    plastic = 1 - 0.1 * lambda_z * n_z / (C_mLT - 0.25)
    elastic = Max(1 - 0.05 * lambda_z * n_z / (C_mLT - 0.25), 1 - 0.05 * n_z / (C_mLT - 0.25))
    return Piecewise(
        (elastic, section_class > 2),
        (Min(0.6 + lambda_z, plastic), lambda_z < 0.4),
        (Max(plastic, 1 - 0.1 * n_z / (C_mLT - 0.25)), True),
    )


@clause("EN 1993-1-1 Eq. (6.61)", "Bending and axial compression, buckling about y-y")
def interaction_661(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    """N_Ed/(χ_y·N_Rk/γM1) + k_yy·M_y,Ed/(χ_LT·M_y,Rk/γM1) + k_yz·M_z,Ed/(M_z,Rk/γM1) ≤ 1,
    the first term written as n_y; moments by magnitude, ΔM = 0 (class 1–3)."""
    return (
        n_y
        + k_yy * abs(M_y_Ed) / (chi_LT * M_y_Rk / gamma_M1)
        + k_yz * abs(M_z_Ed) / (M_z_Rk / gamma_M1)
    )


@clause("EN 1993-1-1 Eq. (6.62)", "Bending and axial compression, buckling about z-z")
def interaction_662(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    """N_Ed/(χ_z·N_Rk/γM1) + k_zy·M_y,Ed/(χ_LT·M_y,Rk/γM1) + k_zz·M_z,Ed/(M_z,Rk/γM1) ≤ 1,
    the first term written as n_z; moments by magnitude, ΔM = 0 (class 1–3)."""
    return (
        n_z
        + k_zy * abs(M_y_Ed) / (chi_LT * M_y_Rk / gamma_M1)
        + k_zz * abs(M_z_Ed) / (M_z_Rk / gamma_M1)
    )


@clause("EN 1993-1-1 Eq. (6.61)", "Bending about y-y and axial compression, buckling about y-y")
def interaction_661_uniaxial(n_y, k_yy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    """N_Ed/(χ_y·N_Rk/γM1) + k_yy·M_y,Ed/(χ_LT·M_y,Rk/γM1) ≤ 1 (no M_z)."""
    return n_y + k_yy * abs(M_y_Ed) / (chi_LT * M_y_Rk / gamma_M1)


@clause("EN 1993-1-1 Eq. (6.62)", "Bending about y-y and axial compression, buckling about z-z")
def interaction_662_uniaxial(n_z, k_zy, M_y_Ed, chi_LT, M_y_Rk, gamma_M1):
    """N_Ed/(χ_z·N_Rk/γM1) + k_zy·M_y,Ed/(χ_LT·M_y,Rk/γM1) ≤ 1 (no M_z)."""
    return n_z + k_zy * abs(M_y_Ed) / (chi_LT * M_y_Rk / gamma_M1)


@clause("EN 1993-1-1 Eq. (6.61)", "Bending about z-z and axial compression, buckling about y-y")
def interaction_661_minor(n_y, k_yz, M_z_Ed, M_z_Rk, gamma_M1):
    """N_Ed/(χ_y·N_Rk/γM1) + k_yz·M_z,Ed/(M_z,Rk/γM1) ≤ 1 (no M_y)."""
    return n_y + k_yz * abs(M_z_Ed) / (M_z_Rk / gamma_M1)


@clause("EN 1993-1-1 Eq. (6.62)", "Bending about z-z and axial compression, buckling about z-z")
def interaction_662_minor(n_z, k_zz, M_z_Ed, M_z_Rk, gamma_M1):
    """N_Ed/(χ_z·N_Rk/γM1) + k_zz·M_z,Ed/(M_z,Rk/γM1) ≤ 1 (no M_y)."""
    return n_z + k_zz * abs(M_z_Ed) / (M_z_Rk / gamma_M1)
