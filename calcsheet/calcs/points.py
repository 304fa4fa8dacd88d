"""What a calc defines at one stress point, and the combined stresses written the same way
for every kind of section."""

from __future__ import annotations

from dataclasses import dataclass, field

import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.engine.functions import Abs, Max, sqrt


@dataclass
class PointSymbols:
    """The symbols a sheet defined for one stress point (for its tables and governing steps)."""

    index: int
    label: str
    terms: dict[str, sp.Symbol] = field(default_factory=dict)


def shear_at_point(transverse: list[sp.Symbol], tau_T: sp.Symbol, junction: bool) -> sp.Expr:
    """The shear at a point from its transverse terms (one per cut through material) and τ_T.

    Two cuts through the point: τ = √(τzx² + τzy²) + |τ_T|; at a re-entrant corner the
    two cuts cross two different walls, so the larger wall shear is taken,
    τ = max(|τzx|, |τzy|) + |τ_T| (the same rules as
    :func:`calcsheet.mechanics.formulas.combined_shear` and ``junction_shear``).
    """
    if len(transverse) == 2 and junction:
        return Max(Abs(transverse[0]), Abs(transverse[1])) + Abs(tau_T)
    if len(transverse) == 2:
        return sqrt(transverse[0] ** 2 + transverse[1] ** 2) + Abs(tau_T)
    if transverse:
        return Abs(transverse[0]) + Abs(tau_T)
    return Abs(tau_T)


def write_combined(sheet: Sheet, record: PointSymbols, n: str, stress: str) -> None:
    """Principal stresses and maximum shear (table only), and the von Mises stress.

    Plane stress at a point of a member (σ along the axis, τ on the cross-section):
    σ1,2 = σ/2 ± √((σ/2)² + τ²), τ_max = √((σ/2)² + τ²), σ_vm = √(σ² + 3·τ²)
    (Mohr's circle and the von Mises criterion, common practice, no source).
    """
    sigma, tau = record.terms["sigma"], record.terms["tau"]
    radius = sqrt((sigma / 2) ** 2 + tau**2)
    record.terms["sigma_1"] = sheet.step(
        f"sigma_1_{n}", sigma / 2 + radius, "Major principal stress", unit=stress, shown=False
    )
    record.terms["sigma_2"] = sheet.step(
        f"sigma_2_{n}", sigma / 2 - radius, "Minor principal stress", unit=stress, shown=False
    )
    record.terms["tau_max"] = sheet.step(
        f"tau_max_{n}", radius, "Maximum in-plane shear stress", unit=stress, shown=False
    )
    record.terms["sigma_vm"] = sheet.step(
        f"sigma_vm_{n}", sqrt(sigma**2 + 3 * tau**2), "Von Mises stress", unit=stress
    )
