"""Torsion, EN 1993-1-1:2005 6.2.7, and shear combined with torsion, 6.2.7(9).

* 6.2.7(1): T_Ed/T_Rd ≤ 1.0 (Eq. 6.23). T_Rd here is the torque at which the St Venant
  shear stress τ_t,Ed of 6.2.7(4) reaches the shear yield criterion of 6.2.1(5)
  (Eq. 6.1 with σ = 0: τ ≤ f_y/(√3·γM0)), the elastic verification 6.2.7(5) permits.
* τ_t,Ed of a closed thin-walled section (rectangular or circular hollow section):
  T/(2·A_m·t), A_m the area enclosed by the mid-line of the wall (Bredt's formula);
  of an open section (I or H): T·t/I_t, largest in the thickest element.
* 6.2.7(9): the plastic shear resistance reduced for torsion, V_pl,T,Rd, by Eq. (6.26)
  for I or H sections and Eq. (6.28) for structural hollow sections (channels,
  Eq. 6.27, are outside the member checks), with V_Ed/V_pl,T,Rd ≤ 1.0 (Eq. 6.25).

Every formula of this module is typed from memory of EN 1993-1-1:2005 and of the
thin-walled torsion formulas; read them against the standard on review.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Max, pi, sqrt
from calcsheet.standards.clause import clause

# |T_Ed| at most this fraction of |M_y,Ed| + |M_z,Ed| is the round-off of statics, not a
# torque (as the AISC procedure's H3.3 takes it).
TORQUE_ROUND_OFF = 1e-9
# Eq. (6.26): the St Venant shear stress of an I or H section is compared with 1.25 times
# the shear strength.
I_SECTION_TORSION_FACTOR = 1.25


@clause("EN 1993-1-1 6.2.7(5), 6.2.1(5) Eq. (6.1)", "Design shear strength, yield criterion")
def shear_yield_strength(f_y: sp.Basic, gamma_M0: sp.Basic) -> sp.Expr:
    """τ_Rd = f_y/(√3·γM0): Eq. (6.1) with σ_x = σ_z = 0 gives 3·(τ/(f_y/γM0))² ≤ 1."""
    return f_y / (sqrt(3) * gamma_M0)


@clause(
    "EN 10210-2:2006 and EN 10219-2:2006 Annex B (A_h)",
    "Area enclosed by the mid-line of the wall, rectangular hollow section",
)
def enclosed_area_rhs(b: sp.Basic, h: sp.Basic, t: sp.Basic, R_m: sp.Basic) -> sp.Expr:
    """A_m = (b − t)·(h − t) − (4 − π)·R_m², R_m the mid-line corner radius."""
    return (b - t) * (h - t) - (4 - pi) * R_m**2


@clause("EN 1993-1-1 6.2.7(4)", "Area enclosed by the mid-line of the wall, circular section")
def enclosed_area_chs(d: sp.Basic, t: sp.Basic) -> sp.Expr:
    """A_m = π·(d − t)²/4."""
    return pi * (d - t) ** 2 / 4


@clause("EN 1993-1-1 6.2.7(4), (7)", "St Venant shear stress, closed thin-walled section")
def closed_section_torsion_stress(T_t: sp.Basic, A_m: sp.Basic, t: sp.Basic) -> sp.Expr:
    """τ_t,Ed = T_t,Ed/(2·A_m·t) (Bredt's formula for a closed thin wall of thickness t)."""
    return T_t / (2 * A_m * t)


@clause("EN 1993-1-1 6.2.7(4)", "St Venant shear stress, open section")
def open_section_torsion_stress(T_t: sp.Basic, t: sp.Basic, I_t: sp.Basic) -> sp.Expr:
    """τ_t,Ed = T_t,Ed·t/I_t in an element of thickness t of an open section."""
    return T_t * t / I_t


@clause("EN 1993-1-1 6.2.7(1), (5), Eq. (6.23)", "Torsional resistance, closed section")
def closed_section_torsion_resistance(A_m: sp.Basic, t: sp.Basic, tau_Rd: sp.Basic) -> sp.Expr:
    """T_Rd = 2·A_m·t·τ_Rd: the torque at which τ_t,Ed reaches τ_Rd."""
    return 2 * A_m * t * tau_Rd


@clause("EN 1993-1-1 6.2.7(1), (5), Eq. (6.23)", "Torsional resistance, open section")
def open_section_torsion_resistance(I_t: sp.Basic, t: sp.Basic, tau_Rd: sp.Basic) -> sp.Expr:
    """T_Rd = I_t·τ_Rd/t_max: the torque at which τ_t,Ed in the thickest element reaches τ_Rd."""
    return I_t * tau_Rd / t


@clause("EN 1993-1-1 6.2.7(9), Eq. (6.26)", "Plastic shear resistance with torsion, I or H")
def torsion_reduced_shear_i(tau_t: sp.Basic, tau_Rd: sp.Basic, V_pl_Rd: sp.Basic) -> sp.Expr:
    """V_pl,T,Rd = √(1 − τ_t,Ed/(1.25·(f_y/√3)/γM0))·V_pl,Rd, with τ_Rd = (f_y/√3)/γM0.

    Where τ_t,Ed reaches 1.25·τ_Rd no shear resistance is left: V_pl,T,Rd = 0 (the root
    of a negative number has no meaning here).
    """
    return sqrt(Max(1 - tau_t / (I_SECTION_TORSION_FACTOR * tau_Rd), 0)) * V_pl_Rd


@clause("EN 1993-1-1 6.2.7(9), Eq. (6.28)", "Plastic shear resistance with torsion, hollow")
def torsion_reduced_shear_hollow(tau_t: sp.Basic, tau_Rd: sp.Basic, V_pl_Rd: sp.Basic) -> sp.Expr:
    """V_pl,T,Rd = [1 − τ_t,Ed/((f_y/√3)/γM0)]·V_pl,Rd, not less than 0."""
    return Max(1 - tau_t / tau_Rd, 0) * V_pl_Rd
