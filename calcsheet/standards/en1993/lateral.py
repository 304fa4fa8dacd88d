"""Lateral-torsional buckling of members in bending, EN 1993-1-1:2005 6.3.2.

Clauses for the elastic critical moment M_cr (the three-factor formula of the
NCCI document SN003a-EN-EU, "Elastic critical moment for lateral torsional
buckling", Access Steel, with k = k_w), the slenderness λ̄_LT (Eq. 6.56), the
reduction factor χ_LT by 6.3.2.2 (general case, Eq. 6.56) or 6.3.2.3 (rolled or
equivalent welded sections, Eq. 6.57, with the modification f of Eq. 6.58) and
M_b,Rd (Eq. 6.55). :func:`ltb_curve` picks the curve of Table 6.4 or 6.5 with the
reason in words; :func:`moment_diagram_factors` gives C1, C2 (SN003), k_c (Table
6.6) and the C_m factors of Annex B (Table B.3) for a moment diagram.

Tables 6.3 to 6.6, B.3 and the SN003 coefficients are quoted from memory and
should be read against the documents on review.
"""

from __future__ import annotations

import itertools
import math
from dataclasses import dataclass

import pint

from calcsheet.engine.functions import Min, Piecewise, pi, sqrt
from calcsheet.errors import InputError
from calcsheet.standards.clause import clause
from calcsheet.standards.en1993.buckling import CurveChoice
from calcsheet.units import parse_quantity

SN003 = "NCCI SN003a-EN-EU (Access Steel), Elastic critical moment for lateral torsional buckling"
# BS 5950-1:2000 Table 14, effective lengths L_E of cantilevers without intermediate
# restraints, built-in at the support and free at the tip: 0.8L under normal loading,
# 1.4L under destabilizing loading (from memory). With the uniform-moment M_cr (C1 = 1)
# over 0.8L, a tip load at the shear centre of a section without warping stiffness gives
# M_cr = 3.93·√(E·I_z·G·I_t)/L, close to the exact 4.01 of the elastic theory of a
# cantilever under an end load (Timoshenko and Gere, Theory of Elastic Stability, 1961,
# from memory): the table is on the safe side there.
CANTILEVER_SOURCE = "BS 5950-1:2000 Table 14 (cantilever built-in at the support, free at the tip)"
CANTILEVER_FACTORS = {"normal": 0.8, "destabilizing": 1.4}

LTB_METHODS = ("6.3.2.2", "6.3.2.3")
SUPPORT_CASES = ("cantilever", "simply supported")
MOMENT_DIAGRAMS = ("uniform", "end moments", "uniform load", "central point load")
LOAD_HEIGHTS = ("shear centre", "top flange", "bottom flange")

# Table 6.3: imperfection factors of the lateral-torsional buckling curves.
LTB_IMPERFECTION_FACTORS: dict[str, float] = {"a": 0.21, "b": 0.34, "c": 0.49, "d": 0.76}

# SN003's table of C1 for end moments M and ψM, k = k_w = 1, by ψ (from memory).
_C1_END_MOMENTS = (
    (1.00, 1.00),
    (0.75, 1.14),
    (0.50, 1.31),
    (0.25, 1.52),
    (0.00, 1.77),
    (-0.25, 2.05),
    (-0.50, 2.33),
    (-0.75, 2.57),
    (-1.00, 2.55),
)


# --- clauses ---------------------------------------------------------------------------------


@clause("EN 1993-1-1 3.2.6(1)", "Shear modulus")
def shear_modulus(E, nu):
    """G = E/(2(1 + ν)), with ν = 0.3 in the elastic range (3.2.6(1))."""
    return E / (2 * (1 + nu))


@clause(
    f"{SN003}: three-factor formula, {{k}} = {{k_w}}",
    "Elastic critical moment for lateral-torsional buckling",
)
def critical_moment(C_1, C_2, z_g, E, I_z, I_w, G, I_t, L_LT):
    """M_cr = C1·π²·E·I_z/L²·[√(I_w/I_z + L²·G·I_t/(π²·E·I_z) + (C2·z_g)²) − C2·z_g].

    L is the length between lateral restraints times k (k = k_w: the same end
    conditions for lateral bending and warping); z_g is the height of the load's
    point of application above the shear centre (positive: destabilizing).
    """
    return (
        C_1
        * pi**2
        * E
        * I_z
        / L_LT**2
        * (sqrt(I_w / I_z + L_LT**2 * G * I_t / (pi**2 * E * I_z) + (C_2 * z_g) ** 2) - C_2 * z_g)
    )


@clause("EN 1993-1-1 6.3.2.2(1)", "Section modulus for lateral-torsional buckling")
def ltb_modulus(W_pl_y, W_el_y, section_class):
    """W_y = W_pl,y for class 1 or 2, W_el,y for class 3 (class 4: W_eff,y, not covered)."""
    return Piecewise((W_pl_y, section_class <= 2), (W_el_y, section_class <= 3))


@clause("EN 1993-1-1 6.3.2.2(1)", "Non-dimensional slenderness for lateral-torsional buckling")
def ltb_slenderness(W_y, f_y, M_cr):
    """λ̄_LT = √(W_y·f_y/M_cr)."""
    return sqrt(W_y * f_y / M_cr)


@clause("EN 1993-1-1 6.3.2.2(1)", "Value to determine {chi_LT}, general case")
def ltb_phi_general(alpha_LT, lambda_LT):
    """Φ_LT = 0.5·[1 + α_LT·(λ̄_LT − 0.2) + λ̄_LT²]."""
    return (1 + alpha_LT * (lambda_LT - 0.2) + lambda_LT**2) / 2


@clause("EN 1993-1-1 Eq. (6.56)", "Reduction factor for lateral-torsional buckling, general")
def ltb_reduction_general(Phi_LT, lambda_LT):
    """χ_LT = 1/(Φ_LT + √(Φ_LT² − λ̄_LT²)) but χ_LT ≤ 1.0."""
    return Min(1 / (Phi_LT + sqrt(Phi_LT**2 - lambda_LT**2)), 1)


@clause("EN 1993-1-1 6.3.2.3(1)", "Value to determine {chi_LT}, rolled or equivalent welded")
def ltb_phi_rolled(alpha_LT, lambda_LT, lambda_LT_0, beta):
    """Φ_LT = 0.5·[1 + α_LT·(λ̄_LT − λ̄_LT,0) + β·λ̄_LT²]."""
    return (1 + alpha_LT * (lambda_LT - lambda_LT_0) + beta * lambda_LT**2) / 2


@clause("EN 1993-1-1 Eq. (6.57)", "Reduction factor for lateral-torsional buckling, rolled")
def ltb_reduction_rolled(Phi_LT, lambda_LT, beta):
    """χ_LT = 1/(Φ_LT + √(Φ_LT² − β·λ̄_LT²)) but χ_LT ≤ 1.0 and χ_LT ≤ 1/λ̄_LT²."""
    return Min(1 / (Phi_LT + sqrt(Phi_LT**2 - beta * lambda_LT**2)), 1, 1 / lambda_LT**2)


@clause("EN 1993-1-1 6.3.2.3(2)", "Modification factor f for the moment distribution")
def ltb_modification_factor(k_c, lambda_LT):
    """f = 1 − 0.5·(1 − k_c)·[1 − 2.0·(λ̄_LT − 0.8)²] but f ≤ 1.0."""
    return Min(1 - (1 - k_c) * (1 - 2 * (lambda_LT - 0.8) ** 2) / 2, 1)


@clause("EN 1993-1-1 Eq. (6.58)", "Modified reduction factor for lateral-torsional buckling")
def ltb_reduction_modified(chi_LT, f, lambda_LT):
    """χ_LT,mod = χ_LT/f but χ_LT,mod ≤ 1.0 and χ_LT,mod ≤ 1/λ̄_LT²."""
    return Min(chi_LT / f, 1, 1 / lambda_LT**2)


@clause("EN 1993-1-1 Eq. (6.55)", "Design buckling resistance moment")
def ltb_resistance(chi_LT, W_y, f_y, gamma_M1):
    """M_b,Rd = χ_LT·W_y·f_y/γM1."""
    return chi_LT * W_y * f_y / gamma_M1


# --- choices settled when the member is read -------------------------------------------------


def ltb_curve(method: str, fabrication: str, h: pint.Quantity, b: pint.Quantity) -> CurveChoice:
    """The lateral-torsional buckling curve of an I-section: Table 6.4 (6.3.2.2) or 6.5."""
    if method not in LTB_METHODS:
        raise InputError("ltb_method", method, "'6.3.2.2' (general case) or '6.3.2.3' (rolled)")
    ratio = float((h / b).to("").m)
    slim = ratio > 2.0
    limit = "h/b > 2" if slim else "h/b ≤ 2"
    if method == "6.3.2.2":
        table = "EN 1993-1-1 Table 6.4"
        curves = {"rolled": ("b" if slim else "a"), "welded": ("d" if slim else "c")}
    else:
        table = "EN 1993-1-1 Table 6.5"
        curves = {"rolled": ("c" if slim else "b"), "welded": ("d" if slim else "c")}
    curve = curves[fabrication]
    reason = f"{fabrication} I-section, h/b = {ratio:.3g}: {limit}, curve {curve} ({table})"
    return CurveChoice(curve, LTB_IMPERFECTION_FACTORS[curve], reason)


@dataclass(frozen=True)
class DiagramFactors:
    """The factors a moment diagram gives, each with where it comes from."""

    C_1: float
    C_2: float
    k_c: float
    C_my: float
    C_mz: float
    C_mLT: float
    C_source: str
    k_c_source: str
    C_m_source: str


def moment_diagram_factors(support: str, diagram: str, psi: float = 1.0) -> DiagramFactors:
    """C1, C2 (SN003), k_c (Table 6.6) and C_my, C_mz, C_mLT (Table B.3) of a member.

    ``support`` is "cantilever" (fixed-free) or "simply supported" (fork supports);
    ``diagram`` the shape of M_y along the member between lateral restraints (see
    :data:`MOMENT_DIAGRAMS`), ``psi`` the ratio of the end moments for "end moments".
    """
    if support not in SUPPORT_CASES:
        raise InputError("support_case", support, " or ".join(repr(s) for s in SUPPORT_CASES))
    if diagram not in MOMENT_DIAGRAMS:
        raise InputError("moment_diagram", diagram, ", ".join(repr(d) for d in MOMENT_DIAGRAMS))
    if not (math.isfinite(psi) and -1.0 <= psi <= 1.0):
        raise InputError("end_moment_ratio", psi, "ψ from −1 to 1")
    if support == "cantilever":
        # M_cr of a cantilever by its effective length (C1 = 1, C2 = 0); Table 6.6 has no
        # cantilever row, so k_c = 1 (f = 1, no modification: the safe side). A cantilever
        # buckles in a sway mode: C_my = C_mz = 0.9 (Table B.3, note); its moment diagram
        # between restraints is not known here: C_mLT = 1.0, the uniform-moment value.
        return DiagramFactors(
            1.0, 0.0, 1.0, 0.9, 0.9, 1.0,
            f"uniform-moment formula over the effective length of {CANTILEVER_SOURCE}",
            "EN 1993-1-1 Table 6.6 has no cantilever row: {k_c} = 1.0 ({f} = 1)",
            "EN 1993-1-1 Table B.3, note: sway buckling mode ({C_my}, {C_mz}); {C_mLT} = 1.0, "
            "the uniform-moment value, as the diagram between restraints is not given",
        )  # fmt: skip
    # Simply supported (fork supports, k = k_w = 1). C_mz = 1.0: the diagram of M_z is
    # not given, and the uniform-moment value is the largest of Table B.3.
    m_note = "EN 1993-1-1 Table B.3 ({C_mz} = 1.0: the {M_z} diagram is not given, uniform value)"
    if diagram == "uniform":
        return DiagramFactors(
            1.0, 0.0, 1.0, 1.0, 1.0, 1.0, f"{SN003}: uniform moment (ψ = 1)",
            "EN 1993-1-1 Table 6.6 (ψ = 1)", m_note,
        )  # fmt: skip
    if diagram == "end moments":
        c_m = max(0.6 + 0.4 * psi, 0.4)
        return DiagramFactors(
            _c1_end_moments(psi), 0.0, 1 / (1.33 - 0.33 * psi), c_m, 1.0, c_m,
            f"{SN003}: end moments, ψ = {psi:.3g} (linear between the tabulated ψ)",
            f"EN 1993-1-1 Table 6.6 (ψ = {psi:.3g}): {{k_c}} = 1/(1.33 − 0.33ψ)",
            m_note,
        )  # fmt: skip
    # SN003's table for transverse loads (from memory): uniform load C1 = 1.127, C2 = 0.454;
    # central point load C1 = 1.348, C2 = 0.630 (k = 1). Table 6.6: k_c 0.94 and 0.90.
    # Table B.3, no end moments (α_h = 0): C_m = 0.95 and 0.90.
    if diagram == "uniform load":
        return DiagramFactors(
            1.127, 0.454, 0.94, 0.95, 1.0, 0.95, f"{SN003}: uniform load",
            "EN 1993-1-1 Table 6.6 (uniform load)", m_note,
        )  # fmt: skip
    return DiagramFactors(
        1.348, 0.630, 0.90, 0.90, 1.0, 0.90, f"{SN003}: central point load",
        "EN 1993-1-1 Table 6.6 (central point load)", m_note,
    )  # fmt: skip


def _c1_end_moments(psi: float) -> float:
    """C1 of SN003 Table 3.1 at ψ, linear between the tabulated values."""
    points = sorted(_C1_END_MOMENTS)
    for (psi_a, c_a), (psi_b, c_b) in itertools.pairwise(points):
        if psi_a <= psi <= psi_b:
            return c_a + (c_b - c_a) * (psi - psi_a) / (psi_b - psi_a)
    raise InputError("end_moment_ratio", psi, "ψ from −1 to 1")


def cantilever_length_factor(destabilizing: bool) -> float:
    """L_LT/L of a cantilever built-in at the support and free at the tip."""
    return CANTILEVER_FACTORS["destabilizing" if destabilizing else "normal"]


def load_height(value: str | pint.Quantity, depth: pint.Quantity) -> tuple[pint.Quantity, str]:
    """z_g (positive above the shear centre: destabilizing) and how it was found.

    ``value`` is "shear centre", "top flange" (z_g = h/2), "bottom flange" (−h/2) or a
    length such as "50 mm".
    """
    if isinstance(value, str) and value.strip() in LOAD_HEIGHTS:
        where = value.strip()
        factor = {"shear centre": 0.0, "top flange": 0.5, "bottom flange": -0.5}[where]
        return (depth * factor).to(depth.units), where
    try:
        height = parse_quantity(value, field="load_height", dimension="length")
    except InputError:
        raise InputError(
            "load_height", value, "'shear centre', 'top flange', 'bottom flange' or a length"
        ) from None
    if not math.isfinite(height.m):
        raise InputError("load_height", value, "a finite length")
    return height, "given"
