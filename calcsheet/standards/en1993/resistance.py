"""Cross-section resistances, EN 1993-1-1:2005 Section 6.2.

Axes are the standard's: y-y the major axis, z-z the minor axis (calcsheet's x-x
and y-y). Every builder returns one expression; dimensional constants are
arguments. Shear areas (6.2.6(3)) are stated in each docstring; they are quoted
from memory and should be read against the standard on review.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Max, Min, Piecewise, pi, sqrt
from calcsheet.standards.clause import clause

# --- elastic verification at a point ------------------------------------------------------


@clause("EN 1993-1-1 Eq. (6.1)", "Yield criterion at a critical point")
def yield_criterion(sigma_x, sigma_z, tau, f_y, gamma_M0):
    """(σx/(fy/γM0))² + (σz/(fy/γM0))² − (σx/(fy/γM0))(σz/(fy/γM0)) + 3(τ/(fy/γM0))² ≤ 1."""
    f = f_y / gamma_M0
    return (
        (sigma_x / f) ** 2 + (sigma_z / f) ** 2 - (sigma_x / f) * (sigma_z / f) + 3 * (tau / f) ** 2
    )


@clause("EN 1993-1-1 Eq. (6.1)", "Yield criterion at a point of a member (σz = 0)")
def yield_criterion_member(sigma_x, tau, f_y, gamma_M0):
    """Eq. (6.1) with no transverse normal stress: (σx/(fy/γM0))² + 3(τ/(fy/γM0))² ≤ 1."""
    return (sigma_x / (f_y / gamma_M0)) ** 2 + 3 * (tau / (f_y / gamma_M0)) ** 2


# --- axial force --------------------------------------------------------------------------


@clause("EN 1993-1-1 Eq. (6.6), (6.10)", "Plastic resistance of the gross section")
def plastic_axial_resistance(A, f_y, gamma_M0):
    """N_pl,Rd = A·f_y/γM0: tension (6.6), and compression of class 1–3 sections (6.10)."""
    return A * f_y / gamma_M0


@clause("EN 1993-1-1 Eq. (6.7)", "Ultimate resistance of the net section")
def net_section_resistance(A_net, f_u, gamma_M2):
    """N_u,Rd = 0.9·A_net·f_u/γM2 at fastener holes (6.2.3(2)b)."""
    return 0.9 * A_net * f_u / gamma_M2


# --- bending ------------------------------------------------------------------------------


@clause("EN 1993-1-1 Eq. (6.13), (6.14)", "Bending resistance for the section class")
def bending_resistance(W_pl, W_el, f_y, gamma_M0, section_class):
    """M_c,Rd = W_pl·f_y/γM0 for class 1 or 2 (6.13), W_el,min·f_y/γM0 for class 3 (6.14).

    No branch applies to class 4 (effective section, EN 1993-1-5): not covered.
    """
    return Piecewise(
        (W_pl * f_y / gamma_M0, section_class <= 2),
        (W_el * f_y / gamma_M0, section_class <= 3),
    )


# --- shear --------------------------------------------------------------------------------


@clause("EN 1993-1-1 Eq. (6.18)", "Plastic shear resistance")
def plastic_shear_resistance(A_v, f_y, gamma_M0):
    """V_pl,Rd = A_v·(f_y/√3)/γM0."""
    return A_v * (f_y / sqrt(3)) / gamma_M0


@clause("EN 1993-1-1 6.2.6(3)a", "Shear area of a rolled I-section, load parallel to the web")
def shear_area_rolled_i(A, b, t_f, t_w, r, h_w, eta):
    """A_v = A − 2·b·t_f + (t_w + 2r)·t_f, but not less than η·h_w·t_w (6.2.6(3)a)."""
    return Max(A - 2 * b * t_f + (t_w + 2 * r) * t_f, eta * h_w * t_w)


@clause("EN 1993-1-1 6.2.6(3)d", "Shear area of a welded I-section, load parallel to the web")
def shear_area_welded_i(h_w, t_w, eta):
    """A_v = η·Σ(h_w·t_w) (6.2.6(3)d)."""
    return eta * h_w * t_w


@clause("EN 1993-1-1 6.2.6(3)e", "Shear area of an I-section, load parallel to the flanges")
def shear_area_i_flanges(A, h_w, t_w):
    """A_v = A − Σ(h_w·t_w) (6.2.6(3)e, stated for welded sections; used for rolled ones)."""
    return A - h_w * t_w


@clause("EN 1993-1-1 6.2.6(3)f", "Shear area of an RHS of uniform thickness")
def shear_area_rhs(A, h_load, h_other):
    """A_v = A·h/(b + h), h the depth parallel to the load (6.2.6(3)f)."""
    return A * h_load / (h_other + h_load)


@clause("EN 1993-1-1 6.2.6(3)g", "Shear area of a CHS of uniform thickness")
def shear_area_chs(A):
    """A_v = 2A/π (6.2.6(3)g)."""
    return 2 * A / pi


@clause("EN 1993-1-1 6.2.6(6)", "Web slenderness limit without shear buckling check")
def shear_buckling_limit(eps, eta):
    """h_w/t_w ≤ 72ε/η: beyond it, shear buckling to EN 1993-1-5 Section 5."""
    return 72 * eps / eta


# --- bending and shear --------------------------------------------------------------------


@clause("EN 1993-1-1 6.2.8(3)", "Reduction factor for shear, ρ")
def shear_reduction(V_Ed, V_pl_Rd):
    """ρ = (2·V_Ed/V_pl,Rd − 1)² when 0.5·V_pl,Rd < V_Ed < V_pl,Rd, else 0 (6.2.8(2), (3)).

    From V_pl,Rd on the shear check (6.2.6(1)) fails and 6.2.8 has no ρ (it would take
    all of f_y and more); the moment resistance is then left unreduced, so the bending
    check keeps a positive capacity while the shear check says NOT OK.
    """
    return Piecewise(
        (0, sp.Abs(V_Ed) <= V_pl_Rd / 2),
        ((2 * sp.Abs(V_Ed) / V_pl_Rd - 1) ** 2, sp.Abs(V_Ed) < V_pl_Rd),
        (0, True),
    )


@clause("EN 1993-1-1 6.2.8(3)", "Yield strength reduced for shear")
def shear_reduced_strength(rho, f_y):
    """(1 − ρ)·f_y; applied here to the whole section, which is on the safe side of
    6.2.8(3) (that clause reduces f_y on the shear area only)."""
    return (1 - rho) * f_y


# --- bending and axial force --------------------------------------------------------------


@clause("EN 1993-1-1 Eq. (6.2)", "Linear interaction of axial force and bending")
def linear_interaction(N_Ed, N_Rd, M_y_Ed, M_y_Rd, M_z_Ed, M_z_Rd):
    """N_Ed/N_Rd + M_y,Ed/M_y,Rd + M_z,Ed/M_z,Rd ≤ 1 (6.2.1(7), any class; magnitudes)."""
    return sp.Abs(N_Ed) / N_Rd + sp.Abs(M_y_Ed) / M_y_Rd + sp.Abs(M_z_Ed) / M_z_Rd


@clause("EN 1993-1-1 6.2.9.1(5)", "Ratio of axial force to plastic resistance, n")
def axial_ratio(N_Ed, N_pl_Rd):
    """n = N_Ed/N_pl,Rd (magnitude)."""
    return sp.Abs(N_Ed) / N_pl_Rd


@clause("EN 1993-1-1 6.2.9.1(5)", "Web area ratio a of an I-section")
def web_ratio_i(A, b, t_f):
    """a = (A − 2·b·t_f)/A, but a ≤ 0.5."""
    return Min((A - 2 * b * t_f) / A, 0.5)


@clause("EN 1993-1-1 Eq. (6.36)", "Reduced major-axis plastic moment of an I-section")
def reduced_moment_y_i(M_pl_y_Rd, n, a):
    """M_N,y,Rd = M_pl,y,Rd·(1 − n)/(1 − 0.5a), but M_N,y,Rd ≤ M_pl,y,Rd."""
    return Min(M_pl_y_Rd * (1 - n) / (1 - a / 2), M_pl_y_Rd)


@clause("EN 1993-1-1 Eq. (6.37), (6.38)", "Reduced minor-axis plastic moment of an I-section")
def reduced_moment_z_i(M_pl_z_Rd, n, a):
    """M_N,z,Rd = M_pl,z,Rd for n ≤ a (6.37); M_pl,z,Rd·[1 − ((n − a)/(1 − a))²] for n > a."""
    return Piecewise((M_pl_z_Rd, n <= a), (M_pl_z_Rd * (1 - ((n - a) / (1 - a)) ** 2), True))


@clause("EN 1993-1-1 6.2.9.1(5)", "Web area ratio {a_w} of an RHS")
def web_ratio_rhs(A, b, t):
    """a_w = (A − 2·b·t)/A, but a_w ≤ 0.5 (b the width, across the y-y axis)."""
    return Min((A - 2 * b * t) / A, 0.5)


@clause("EN 1993-1-1 6.2.9.1(5)", "Flange area ratio {a_f} of an RHS")
def flange_ratio_rhs(A, h, t):
    """a_f = (A − 2·h·t)/A, but a_f ≤ 0.5 (h the depth)."""
    return Min((A - 2 * h * t) / A, 0.5)


@clause("EN 1993-1-1 Eq. (6.39), (6.40)", "Reduced plastic moment of an RHS")
def reduced_moment_rhs(M_pl_Rd, n, a):
    """M_N,Rd = M_pl,Rd·(1 − n)/(1 − 0.5a) ≤ M_pl,Rd; a = a_w about y-y (6.39), a_f about z-z
    (6.40)."""
    return Min(M_pl_Rd * (1 - n) / (1 - a / 2), M_pl_Rd)


@clause("EN 1993-1-1 6.2.9.2(1), Eq. (6.42)", "Largest longitudinal stress, elastic")
def elastic_longitudinal_stress(N_Ed, A, M_y_Ed, W_el_y, M_z_Ed, W_el_z):
    """σx,Ed = |N_Ed|/A + |M_y,Ed|/W_el,y + |M_z,Ed|/W_el,z (class 3, no holes).

    Checked against f_y/γM0 (Eq. 6.42), this is the stress ratio n + m_y + m_z: every
    term at the corner where all three stresses add, which a doubly symmetric section has.
    """
    return sp.Abs(N_Ed) / A + sp.Abs(M_y_Ed) / W_el_y + sp.Abs(M_z_Ed) / W_el_z


@clause("EN 1993-1-1 6.2.9.2(1), Eq. (6.42)", "Largest longitudinal stress, elastic")
def elastic_longitudinal_stress_uniaxial(N_Ed, A, M_Ed, W_el):
    """σx,Ed = |N_Ed|/A + |M_Ed|/W_el under N with bending about one axis (class 3)."""
    return sp.Abs(N_Ed) / A + sp.Abs(M_Ed) / W_el


@clause("EN 1993-1-1 6.2.9.1(6)", "Exponent α of the biaxial criterion, I-section")
def biaxial_alpha_i(section_class):
    """α = 2 for I and H sections (class 1, 2); 1 (linear) otherwise (class 3 sections are
    checked by their stress, Eq. 6.42, instead)."""
    return Piecewise((2, section_class <= 2), (1, True))


@clause("EN 1993-1-1 6.2.9.1(6)", "Exponent β of the biaxial criterion, I-section")
def biaxial_beta_i(n, section_class):
    """β = 5n but β ≥ 1 for I and H sections (class 1, 2); 1 (linear) for class 3."""
    return Piecewise((Max(5 * n, 1), section_class <= 2), (1, True))


@clause("EN 1993-1-1 6.2.9.1(6)", "Exponents α = β of the biaxial criterion, RHS")
def biaxial_exponent_rhs(n, section_class):
    """α = β = 1.66/(1 − 1.13n²) but ≤ 6 for RHS (class 1, 2); 1 (linear) for class 3.

    1.66/(1 − 1.13n²) reaches 6 at n = 0.80, so beyond it the cap applies (and the
    formula's pole at n = 0.94 is never reached).
    """
    return Piecewise(
        (1, section_class > 2),
        (Min(1.66 / (1 - 1.13 * n**2), 6), n <= 0.8),
        (6, True),
    )


@clause("EN 1993-1-1 Eq. (6.41)", "Bi-axial bending with axial force")
def biaxial_criterion(M_y_Ed, M_N_y_Rd, M_z_Ed, M_N_z_Rd, alpha, beta):
    """[M_y,Ed/M_N,y,Rd]^α + [M_z,Ed/M_N,z,Rd]^β ≤ 1 (magnitudes)."""
    return (sp.Abs(M_y_Ed) / M_N_y_Rd) ** alpha + (sp.Abs(M_z_Ed) / M_N_z_Rd) ** beta
