"""Interaction factors of EN 1993-1-1:2005 Annex A (Method 1) for 6.3.3.

Clauses for the auxiliary terms and the factors of Table A.1 and the equivalent
uniform moment factors of Table A.2, for doubly symmetric class 1, 2 and 3
cross-sections. The ratios r = N_Ed/N_cr are written as steps of their own so
each expression stays short. The expressions are quoted from memory and should be
read against the standard on review.
"""

from __future__ import annotations

from calcsheet.engine.functions import Max, Min, Piecewise, pi, sqrt
from calcsheet.standards.clause import clause

TABLE_A1 = "EN 1993-1-1 Annex A, Table A.1"
TABLE_A2 = "EN 1993-1-1 Annex A, Table A.2"


@clause(TABLE_A1, "Elastic torsional buckling force")
def torsional_critical_force(G, I_t, E, I_w, L_T, i_y, i_z):
    """N_cr,T = (G·I_t + π²·E·I_w/L_T²)/i_0², i_0² = i_y² + i_z² (shear centre at the
    centroid of a doubly symmetric section)."""
    return (G * I_t + pi**2 * E * I_w / L_T**2) / (i_y**2 + i_z**2)


@clause(TABLE_A1, "Critical force ratio r = {N_Ed}/{N_cr}")
def critical_ratio(N_Ed, N_cr):
    """r = N_Ed/N_cr (compression)."""
    return N_Ed / N_cr


@clause(TABLE_A1, "Auxiliary term μ")
def mu(r, chi):
    """μ_y = (1 − N_Ed/N_cr,y)/(1 − χ_y·N_Ed/N_cr,y), μ_z likewise."""
    return (1 - r) / (1 - chi * r)


@clause(TABLE_A1, "Auxiliary term w = {W_pl}/{W_el} ≤ 1.5")
def plastic_ratio(W_pl, W_el):
    """w_y = W_pl,y/W_el,y ≤ 1.5, w_z = W_pl,z/W_el,z ≤ 1.5."""
    return Min(W_pl / W_el, 1.5)


@clause(TABLE_A1, "Auxiliary term {n_pl}")
def axial_plastic_ratio(N_Ed, A, f_y, gamma_M1):
    """n_pl = N_Ed/(N_Rk/γM1), N_Rk = A·f_y."""
    return N_Ed / (A * f_y / gamma_M1)


@clause(TABLE_A1, "Auxiliary term {a_LT}")
def torsion_ratio(I_t, I_y):
    """a_LT = 1 − I_T/I_y ≥ 0."""
    return Max(1 - I_t / I_y, 0)


@clause(TABLE_A2, "Elastic critical moment under uniform moment (for {lambda_0})")
def critical_moment_uniform(E, I_z, I_w, G, I_t, L_LT):
    """M_cr,0 = π²·E·I_z/L²·√(I_w/I_z + L²·G·I_t/(π²·E·I_z)): ψ_y = 1, load at the shear
    centre (the three-factor formula of SN003a-EN-EU with C1 = 1)."""
    return pi**2 * E * I_z / L_LT**2 * sqrt(I_w / I_z + L_LT**2 * G * I_t / (pi**2 * E * I_z))


@clause(TABLE_A2, "Factor C1 = {k_c}⁻²")
def c1_from_kc(k_c):
    """C1 = k_c⁻², k_c of Table 6.6."""
    return 1 / k_c**2


@clause(TABLE_A2, "Slenderness limit of {lambda_0} below which torsion is not considered")
def lambda_0_limit(C_1, r_z, r_T):
    """0.2·√C1·⁴√[(1 − N_Ed/N_cr,z)(1 − N_Ed/N_cr,TF)] (N_cr,TF = N_cr,T for a doubly
    symmetric section); taken as 0 when N_Ed exceeds either critical force."""
    return 0.2 * sqrt(C_1) * Max((1 - r_z) * (1 - r_T), 0) ** 0.25


@clause(TABLE_A2, "{C_mi_0} for end moments (ψ) or a uniform moment (ψ = 1)")
def moment_factor_0_linear(psi, r):
    """C_mi,0 = 0.79 + 0.21·ψ_i + 0.36·(ψ_i − 0.33)·N_Ed/N_cr,i."""
    return 0.79 + 0.21 * psi + 0.36 * (psi - 0.33) * r


@clause(TABLE_A2, "{C_mi_0} for a uniform load")
def moment_factor_0_uniform_load(r):
    """C_mi,0 = 1 − 0.18·N_Ed/N_cr,i."""
    return 1 - 0.18 * r


@clause(TABLE_A2, "{C_mi_0} for a central point load")
def moment_factor_0_point_load(r):
    """C_mi,0 = 1 + 0.03·N_Ed/N_cr,i."""
    return 1 + 0.03 * r


@clause(TABLE_A2, "Equivalent uniform moment factor {C_my}")
def moment_factor_y(C_my_0, lambda_0, lambda_0_lim, M_y_Ed, N_Ed, A, W_el_y, a_LT, r_y):
    """C_my = C_my,0 when λ̄_0 ≤ the limit; else C_my,0 + (1 − C_my,0)·√ε_y·a_LT/(1 + √ε_y·a_LT)
    with ε_y = M_y,Ed/N_Ed·A/W_el,y (class 1–3); as N_Ed → 0, ε_y → ∞ and C_my → 1."""
    root = sqrt(abs(M_y_Ed) * A / (N_Ed * W_el_y)) * a_LT
    return Piecewise(
        (C_my_0, lambda_0 <= lambda_0_lim),
        (1, r_y <= 0),
        (C_my_0 + (1 - C_my_0) * root / (1 + root), True),
    )


@clause(TABLE_A2, "Equivalent uniform moment factor {C_mLT}")
def moment_factor_lt(C_my, a_LT, lambda_0, lambda_0_lim, r_z, r_T):
    """C_mLT = 1.0 when λ̄_0 ≤ the limit; else C_my²·a_LT/√((1 − N_Ed/N_cr,z)(1 −
    N_Ed/N_cr,T)) ≥ 1 (beyond a critical force the member has buckled: 1, not used)."""
    return Piecewise(
        (1, lambda_0 <= lambda_0_lim),
        (Max(C_my**2 * a_LT / sqrt((1 - r_z) * (1 - r_T)), 1), (1 - r_z) * (1 - r_T) > 0),
        (1, True),
    )


@clause(TABLE_A1, "Auxiliary term {b_LT}")
def b_lt(a_LT, lambda_0, M_y_Ed, chi_LT, M_pl_y_Rd, M_z_Ed, M_pl_z_Rd):
    """b_LT = 0.5·a_LT·λ̄_0²·M_y,Ed/(χ_LT·M_pl,y,Rd)·M_z,Ed/M_pl,z,Rd."""
    return a_LT * lambda_0**2 / 2 * abs(M_y_Ed) / (chi_LT * M_pl_y_Rd) * abs(M_z_Ed) / M_pl_z_Rd


@clause(TABLE_A1, "Auxiliary term {c_LT}")
def c_lt(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    """c_LT = 10·a_LT·λ̄_0²/(5 + λ̄_z⁴)·M_y,Ed/(C_my·χ_LT·M_pl,y,Rd)."""
    return 10 * a_LT * lambda_0**2 / (5 + lambda_z**4) * abs(M_y_Ed) / (C_my * chi_LT * M_pl_y_Rd)


@clause(TABLE_A1, "Auxiliary term {d_LT}")
def d_lt(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd, M_z_Ed, C_mz, M_pl_z_Rd):
    """d_LT = 2·a_LT·λ̄_0/(0.1 + λ̄_z⁴)·M_y,Ed/(C_my·χ_LT·M_pl,y,Rd)·M_z,Ed/(C_mz·M_pl,z,Rd)."""
    return (
        2 * a_LT * lambda_0 / (0.1 + lambda_z**4) * abs(M_y_Ed) / (C_my * chi_LT * M_pl_y_Rd)
        * abs(M_z_Ed) / (C_mz * M_pl_z_Rd)
    )  # fmt: skip


@clause(TABLE_A1, "Auxiliary term {e_LT}")
def e_lt(a_LT, lambda_0, lambda_z, M_y_Ed, C_my, chi_LT, M_pl_y_Rd):
    """e_LT = 1.7·a_LT·λ̄_0/(0.1 + λ̄_z⁴)·M_y,Ed/(C_my·χ_LT·M_pl,y,Rd)."""
    return 1.7 * a_LT * lambda_0 / (0.1 + lambda_z**4) * abs(M_y_Ed) / (C_my * chi_LT * M_pl_y_Rd)


@clause(TABLE_A1, "Auxiliary term {C_yy}")
def c_yy(w_y, C_my, lambda_max, n_pl, b_LT, W_el_y, W_pl_y):
    """C_yy = 1 + (w_y − 1)·[(2 − 1.6/w_y·C_my²·λ̄_max − 1.6/w_y·C_my²·λ̄_max²)·n_pl − b_LT]
    ≥ W_el,y/W_pl,y."""
    bracket = (2 - 1.6 / w_y * C_my**2 * lambda_max - 1.6 / w_y * C_my**2 * lambda_max**2) * n_pl
    return Max(1 + (w_y - 1) * (bracket - b_LT), W_el_y / W_pl_y)


@clause(TABLE_A1, "Auxiliary term {C_yz}")
def c_yz(w_z, w_y, C_mz, lambda_max, n_pl, c_LT, W_el_z, W_pl_z):
    """C_yz = 1 + (w_z − 1)·[(2 − 14·C_mz²·λ̄_max²/w_z⁵)·n_pl − c_LT]
    ≥ 0.6·√(w_z/w_y)·W_el,z/W_pl,z."""
    bracket = (2 - 14 * C_mz**2 * lambda_max**2 / w_z**5) * n_pl - c_LT
    return Max(1 + (w_z - 1) * bracket, 0.6 * sqrt(w_z / w_y) * W_el_z / W_pl_z)


@clause(TABLE_A1, "Auxiliary term {C_zy}")
def c_zy(w_y, w_z, C_my, lambda_max, n_pl, d_LT, W_el_y, W_pl_y):
    """C_zy = 1 + (w_y − 1)·[(2 − 14·C_my²·λ̄_max²/w_y⁵)·n_pl − d_LT]
    ≥ 0.6·√(w_y/w_z)·W_el,y/W_pl,y."""
    bracket = (2 - 14 * C_my**2 * lambda_max**2 / w_y**5) * n_pl - d_LT
    return Max(1 + (w_y - 1) * bracket, 0.6 * sqrt(w_y / w_z) * W_el_y / W_pl_y)


@clause(TABLE_A1, "Auxiliary term {C_zz}")
def c_zz(w_z, C_mz, lambda_max, n_pl, e_LT, W_el_z, W_pl_z):
    """C_zz = 1 + (w_z − 1)·[(2 − 1.6/w_z·C_mz²·λ̄_max − 1.6/w_z·C_mz²·λ̄_max²)·n_pl − e_LT]
    ≥ W_el,z/W_pl,z."""
    bracket = (2 - 1.6 / w_z * C_mz**2 * lambda_max - 1.6 / w_z * C_mz**2 * lambda_max**2) * n_pl
    return Max(1 + (w_z - 1) * (bracket - e_LT), W_el_z / W_pl_z)


@clause(TABLE_A1, "Interaction factor {k_yy} (Method 1)")
def k_yy(C_my, C_mLT, mu_y, r_y, C_yy, section_class):
    """k_yy = C_my·C_mLT·μ_y/(1 − N_Ed/N_cr,y)·1/C_yy (class 1, 2); without 1/C_yy (class 3)."""
    elastic = C_my * C_mLT * mu_y / (1 - r_y)
    return Piecewise((elastic / C_yy, section_class <= 2), (elastic, True))


@clause(TABLE_A1, "Interaction factor {k_yz} (Method 1)")
def k_yz(C_mz, mu_y, r_z, C_yz, w_z, w_y, section_class):
    """k_yz = C_mz·μ_y/(1 − N_Ed/N_cr,z)·1/C_yz·0.6·√(w_z/w_y) (class 1, 2);
    C_mz·μ_y/(1 − N_Ed/N_cr,z) (class 3)."""
    elastic = C_mz * mu_y / (1 - r_z)
    return Piecewise((elastic / C_yz * 0.6 * sqrt(w_z / w_y), section_class <= 2), (elastic, True))


@clause(TABLE_A1, "Interaction factor {k_zy} (Method 1)")
def k_zy(C_my, C_mLT, mu_z, r_y, C_zy, w_y, w_z, section_class):
    """k_zy = C_my·C_mLT·μ_z/(1 − N_Ed/N_cr,y)·1/C_zy·0.6·√(w_y/w_z) (class 1, 2);
    C_my·C_mLT·μ_z/(1 − N_Ed/N_cr,y) (class 3)."""
    elastic = C_my * C_mLT * mu_z / (1 - r_y)
    return Piecewise((elastic / C_zy * 0.6 * sqrt(w_y / w_z), section_class <= 2), (elastic, True))


@clause(TABLE_A1, "Interaction factor {k_zz} (Method 1)")
def k_zz(C_mz, mu_z, r_z, C_zz, section_class):
    """k_zz = C_mz·μ_z/(1 − N_Ed/N_cr,z)·1/C_zz (class 1, 2); without 1/C_zz (class 3)."""
    elastic = C_mz * mu_z / (1 - r_z)
    return Piecewise((elastic / C_zz, section_class <= 2), (elastic, True))
