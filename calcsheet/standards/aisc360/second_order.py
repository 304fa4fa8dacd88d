"""AISC 360-22 Appendix 8: approximate second-order analysis, the P-δ multiplier B1.

B1 amplifies a member's first-order moment for the curvature between its ends.
α = 1.0 (LRFD) or 1.6 (ASD) (Appendix 8, Section 8.2.1); EI* = EI for the
effective length method, 0.8·τb·EI with the direct analysis method.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Abs, pi
from calcsheet.standards.aisc360._functions import cases, largest
from calcsheet.standards.aisc360.factors import design_method
from calcsheet.standards.clause import clause

ALPHA = {"LRFD": 1.0, "ASD": 1.6}

# Effective length factor K of a fixed-free column (flagpole): 2.1, the recommended
# design value of the AISC Commentary Table C-A-7.1, case (e) (theoretical 2.0).
# From memory of the Commentary; an editable input on the sheet.
K_FIXED_FREE = 2.1


def amplification_alpha(method: str) -> float:
    """α of Appendix 8: 1.0 for LRFD, 1.6 for ASD."""
    return ALPHA[design_method(method)]


@clause("AISC 360-22 Eq. A-8-5", "Elastic critical buckling strength in the plane of bending")
def euler_load(E_I: sp.Basic, K: sp.Basic, L: sp.Basic) -> sp.Expr:
    """Pe1 = π²·EI*/(K·L)² (AISC 360-22 Appendix 8 Eq. A-8-5, Lc1 = K·L)."""
    return pi**2 * E_I / (K * L) ** 2


@clause("AISC 360-22 Eq. A-8-3", "Multiplier for P-δ effects")
def b1_multiplier(C_m: sp.Basic, alpha: sp.Basic, P_r: sp.Basic, P_e1: sp.Basic) -> sp.Expr:
    """B1 = Cm/(1 − α·Pr/Pe1) >= 1 (Eq. A-8-3), Pr the axial compression.

    ``P_r`` is signed, tension positive: a member in tension takes B1 = 1. No
    branch applies when α·|Pr| >= Pe1 (the member buckles under the load): the
    sheet then reports the step, the numeric path gives NaN.
    """
    return cases(
        (1, P_r / P_e1 >= 0),
        (largest(C_m / (1 - alpha * Abs(P_r) / P_e1), 1), alpha * Abs(P_r) < P_e1),
    )
