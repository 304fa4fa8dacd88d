"""AISC 360-22 Chapter D: tension members, Section D2."""

from __future__ import annotations

import sympy as sp

from calcsheet.standards.clause import clause


@clause("AISC 360-22 Eq. D2-1", "Nominal tensile strength, yielding in the gross section")
def tensile_yielding(F_y: sp.Basic, A_g: sp.Basic) -> sp.Expr:
    """Pn = Fy·Ag (AISC 360-22 Eq. D2-1)."""
    return F_y * A_g


@clause("AISC 360-22 Eq. D2-2", "Nominal tensile strength, rupture in the net section")
def tensile_rupture(F_u: sp.Basic, A_e: sp.Basic) -> sp.Expr:
    """Pn = Fu·Ae (AISC 360-22 Eq. D2-2); Ae = An·U depends on the connection (D3)."""
    return F_u * A_e
