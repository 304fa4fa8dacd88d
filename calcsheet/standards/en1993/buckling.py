"""Flexural buckling of uniform members in compression, EN 1993-1-1:2005 6.3.1.

Clauses for N_cr, the non-dimensional slenderness λ̄ (Eq. 6.50), Φ and χ
(Eq. 6.49) and N_b,Rd (Eq. 6.47); :func:`buckling_curve` picks the curve of
Table 6.2 with the reason in words, and :data:`IMPERFECTION_FACTORS` gives α of
Table 6.1. Table 6.2 is quoted from memory.
"""

from __future__ import annotations

from dataclasses import dataclass

import pint

from calcsheet.engine.functions import Min, pi, sqrt
from calcsheet.errors import InputError
from calcsheet.standards.clause import clause
from calcsheet.standards.en1993.factors import IMPERFECTION_FACTORS
from calcsheet.units import parse_quantity

TABLE_6_2 = "EN 1993-1-1 Table 6.2"


@clause("EN 1993-1-1 6.3.1.2(1)", "Elastic critical force for flexural buckling")
def critical_force(E, I, L_cr):
    """N_cr = π²·E·I/L_cr² (Euler force of the gross section)."""
    return pi**2 * E * I / L_cr**2


@clause("EN 1993-1-1 Eq. (6.50)", "Non-dimensional slenderness")
def relative_slenderness(A, f_y, N_cr):
    """λ̄ = √(A·f_y/N_cr) for class 1, 2 and 3 cross-sections."""
    return sqrt(A * f_y / N_cr)


@clause("EN 1993-1-1 6.3.1.3(1)", "Slenderness at which the Euler stress equals {f_y}")
def slenderness_limit(E, f_y):
    """λ₁ = π·√(E/f_y) = 93.9ε."""
    return pi * sqrt(E / f_y)


@clause("EN 1993-1-1 Eq. (6.50)", "Non-dimensional slenderness")
def relative_slenderness_from_length(L_cr, i, lambda_1):
    """λ̄ = L_cr/(i·λ₁) for class 1, 2 and 3 cross-sections (the second form of 6.50)."""
    return L_cr / (i * lambda_1)


@clause("EN 1993-1-1 6.3.1.2(1)", "Value to determine the reduction factor χ")
def buckling_phi(alpha, lambda_rel):
    """Φ = 0.5·[1 + α·(λ̄ − 0.2) + λ̄²]."""
    return (1 + alpha * (lambda_rel - 0.2) + lambda_rel**2) / 2


@clause("EN 1993-1-1 Eq. (6.49)", "Reduction factor for flexural buckling")
def reduction_factor(Phi, lambda_rel):
    """χ = 1/(Φ + √(Φ² − λ̄²)) but χ ≤ 1.0."""
    return Min(1 / (Phi + sqrt(Phi**2 - lambda_rel**2)), 1)


@clause("EN 1993-1-1 Eq. (6.47)", "Buckling resistance of a compression member")
def buckling_resistance(chi, A, f_y, gamma_M1):
    """N_b,Rd = χ·A·f_y/γM1 for class 1, 2 and 3 cross-sections."""
    return chi * A * f_y / gamma_M1


# --- Table 6.2 -----------------------------------------------------------------------------

SECTION_KINDS = ("rolled I", "welded I", "hollow")
HOLLOW_FORMING = ("hot-finished", "cold-formed")


@dataclass(frozen=True)
class CurveChoice:
    """A buckling curve of Table 6.2 with its imperfection factor and the reason."""

    curve: str
    alpha: float
    reason: str


def buckling_curve(
    kind: str,
    axis: str,
    *,
    grade: str,
    h: pint.Quantity | str | None = None,
    b: pint.Quantity | str | None = None,
    t_f: pint.Quantity | str | None = None,
    forming: str | None = None,
) -> CurveChoice:
    """The curve of Table 6.2 for buckling about ``axis`` ("y" major, "z" minor).

    ``kind`` is "rolled I" or "welded I" (give ``h``, ``b``, ``t_f``; h/b only matters
    for rolled sections) or "hollow" (give ``forming``: "hot-finished" or
    "cold-formed"). ``grade`` selects the S460 column of the table.
    """
    if kind not in SECTION_KINDS:
        raise InputError("section kind", kind, f"one of {', '.join(SECTION_KINDS)}")
    if axis not in ("y", "z"):
        raise InputError("buckling axis", axis, "'y' (major) or 'z' (minor)")
    s460 = str(grade).strip().upper() == "S460"
    column = "S460" if s460 else "S235 to S420"
    if kind == "hollow":
        if forming not in HOLLOW_FORMING:
            raise InputError("hollow section forming", forming, "'hot-finished' or 'cold-formed'")
        # Cold-formed: curve c for every grade; hot-finished: a (a0 for S460).
        curve = "c" if forming == "cold-formed" else ("a0" if s460 else "a")
        return _choice(curve, f"{forming} hollow section, {column}: curve {curve}")

    flange = _millimetres(t_f, "t_f")
    if kind == "welded I":
        thin = flange <= 40.0
        curve = ("b" if thin else "c") if axis == "y" else ("c" if thin else "d")
        limit = "{t_f} ≤ 40 mm" if thin else "{t_f} > 40 mm"
        return _choice(curve, f"welded I-section, {limit}, buckling about {axis}-{axis}: {curve}")

    ratio = _millimetres(h, "h") / _millimetres(b, "b")
    if ratio > 1.2:
        if flange <= 40.0:
            row, curves = "h/b > 1.2, {t_f} ≤ 40 mm", {"y": ("a", "a0"), "z": ("b", "a0")}
        elif flange <= 100.0:
            row, curves = "h/b > 1.2, 40 mm < {t_f} ≤ 100 mm", {"y": ("b", "a"), "z": ("c", "a")}
        else:
            raise InputError(
                "t_f", f"{flange:.4g} mm", "at most 100 mm for h/b > 1.2", "outside Table 6.2"
            )
    elif flange <= 100.0:
        row, curves = "h/b ≤ 1.2, {t_f} ≤ 100 mm", {"y": ("b", "a"), "z": ("c", "a")}
    else:
        row, curves = "h/b ≤ 1.2, {t_f} > 100 mm", {"y": ("d", "c"), "z": ("d", "c")}
    curve = curves[axis][1 if s460 else 0]
    reason = (
        f"rolled I-section, h/b = {ratio:.3g}: {row}, {column}, "
        f"buckling about {axis}-{axis}: curve {curve}"
    )
    return _choice(curve, reason)


def _choice(curve: str, reason: str) -> CurveChoice:
    return CurveChoice(curve, IMPERFECTION_FACTORS[curve], f"{reason} ({TABLE_6_2})")


def _millimetres(value: pint.Quantity | str | None, field: str) -> float:
    if value is None:
        raise InputError(field, None, "a length, needed to choose the curve of Table 6.2")
    return float(parse_quantity(value, field=field, dimension="length").to("mm").magnitude)
