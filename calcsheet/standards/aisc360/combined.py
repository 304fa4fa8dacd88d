"""AISC 360-22 Chapter H: combined axial force and flexure (H1, H2)."""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Abs
from calcsheet.standards.aisc360._functions import cases
from calcsheet.standards.clause import clause

# Pr/Pc at which H1-1a gives way to H1-1b.
AXIAL_RATIO_LIMIT = 0.2


@clause("AISC 360-22 Eq. H1-1a, H1-1b", "Interaction of axial force and flexure")
def h1_interaction(
    P_r: sp.Basic,
    P_c: sp.Basic,
    M_rx: sp.Basic,
    M_cx: sp.Basic,
    M_ry: sp.Basic,
    M_cy: sp.Basic,
) -> sp.Expr:
    """Pr/Pc + 8/9·(Mrx/Mcx + Mry/Mcy) when Pr/Pc >= 0.2 (H1-1a), else Pr/(2Pc) + (...) (H1-1b).

    Pass magnitudes (|Pr|, |Mrx|, |Mry|); the result must not exceed 1.0.
    """
    flexure = M_rx / M_cx + M_ry / M_cy
    return cases(
        (P_r / P_c + sp.Rational(8, 9) * flexure, P_r / P_c >= AXIAL_RATIO_LIMIT),
        (P_r / (2 * P_c) + flexure, True),
    )


@clause("AISC 360-22 Eq. H2-1", "Interaction of stresses at a point")
def h2_interaction(
    f_ra: sp.Basic,
    F_ca: sp.Basic,
    f_rbw: sp.Basic,
    F_cbw: sp.Basic,
    f_rbz: sp.Basic,
    F_cbz: sp.Basic,
) -> sp.Expr:
    """|fra/Fca + frbw/Fcbw + frbz/Fcbz| (AISC 360-22 Eq. H2-1), not to exceed 1.0.

    Each stress with its sign at the point considered, about the principal axes w, z.
    """
    return Abs(f_ra / F_ca + f_rbw / F_cbw + f_rbz / F_cbz)
