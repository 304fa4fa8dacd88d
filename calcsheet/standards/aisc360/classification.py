"""Width-to-thickness limits of AISC 360-22 Tables B4.1a and B4.1b, and classification.

Each limit is a clause of E and F_y (λp, λr); the width-to-thickness ratio λ of an
element is written by the caller, because how b, h or D/t are measured depends on
the shape (Section B4.1). Classifying is a numeric decision taken when the sheet
is built: it chooses which equations of Chapters E and F apply, so the sheet
states λ, λp, λr as steps and the outcome in words.

Table case numbers are quoted from memory of the 2016/2022 tables (unchanged
between the two editions as far as recalled); the limits themselves are the
familiar coefficients.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass
from enum import StrEnum

import numpy as np
import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.engine.functions import sqrt
from calcsheet.standards.clause import Clause, clause

TABLE_A = "AISC 360-22 Table B4.1a"
TABLE_B = "AISC 360-22 Table B4.1b"


class Classification(StrEnum):
    """Table B4.1a gives nonslender/slender; Table B4.1b compact/noncompact/slender."""

    NONSLENDER = "nonslender"
    COMPACT = "compact"
    NONCOMPACT = "noncompact"
    SLENDER = "slender"


def clause_b41(section: str, description: str) -> Callable[[Callable[..., sp.Expr]], Clause]:
    """``@clause`` citing a part of AISC 360-22 Section B4.1."""
    return clause(f"AISC 360-22 {section}", description)


def _root_limit(coefficient: float, reference: str, description: str) -> Clause:
    """A limit of the form coefficient·√(E/F_y)."""

    def build(E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
        return sp.Float(coefficient) * sqrt(E / F_y)

    return Clause(reference, description, build)


def _ratio_limit(coefficient: float, reference: str, description: str) -> Clause:
    """A limit of the form coefficient·E/F_y (round HSS)."""

    def build(E: sp.Basic, F_y: sp.Basic) -> sp.Expr:
        return sp.Float(coefficient) * E / F_y

    return Clause(reference, description, build)


@dataclass(frozen=True)
class ElementLimits:
    """One row of Table B4.1a (``lambda_p`` is None) or Table B4.1b."""

    key: str
    element: str
    loading: str
    lambda_p: Clause | None
    lambda_r: Clause

    @property
    def reference(self) -> str:
        """The table and case, as cited on the sheet."""
        return self.lambda_r.reference


def _compression(key: str, case: int, element: str, limit: Clause | float) -> ElementLimits:
    reference = f"{TABLE_A} Case {case}"
    lam_r = (
        limit
        if isinstance(limit, Clause)
        else _root_limit(limit, reference, f"Limit λr, {element}, axial compression")
    )
    return ElementLimits(key, element, "axial compression", None, lam_r)


def _flexure(key: str, case: int, element: str, p: float, r: float) -> ElementLimits:
    reference = f"{TABLE_B} Case {case}"
    return ElementLimits(
        key,
        element,
        "flexure",
        _root_limit(p, reference, f"Limit λp, {element}, flexure"),
        _root_limit(r, reference, f"Limit λr, {element}, flexure"),
    )


# --- Table B4.1a: members subject to axial compression ------------------------------
I_FLANGE_COMPRESSION = _compression("I_flange_c", 1, "flange of a rolled I-shape", 0.56)
ANGLE_LEG_COMPRESSION = _compression("L_leg_c", 3, "leg of a single angle", 0.45)
I_WEB_COMPRESSION = _compression("I_web_c", 5, "web of a doubly symmetric I-shape", 1.49)
HSS_WALL_COMPRESSION = _compression("HSS_wall_c", 6, "wall of a rectangular HSS", 1.40)
ROUND_HSS_COMPRESSION = _compression(
    "round_c",
    9,
    "round HSS",
    _ratio_limit(0.11, f"{TABLE_A} Case 9", "Limit λr, round HSS, axial compression"),
)

# --- Table B4.1b: members subject to flexure ------------------------------------------
I_FLANGE_FLEXURE = _flexure("I_flange_f", 10, "flange of a rolled I-shape", 0.38, 1.0)
ANGLE_LEG_FLEXURE = _flexure("L_leg_f", 12, "leg of a single angle", 0.54, 0.91)
I_FLANGE_MINOR_AXIS = _flexure(
    "I_flange_minor", 13, "flange of an I-shape in minor-axis bending", 0.38, 1.0
)
I_WEB_FLEXURE = _flexure("I_web_f", 15, "web of a doubly symmetric I-shape", 3.76, 5.70)
HSS_FLANGE_FLEXURE = _flexure("HSS_flange_f", 17, "flange of a rectangular HSS", 1.12, 1.40)
HSS_WEB_FLEXURE = _flexure("HSS_web_f", 19, "web of a rectangular HSS", 2.42, 5.70)
ROUND_HSS_FLEXURE = ElementLimits(
    "round_f",
    "round HSS",
    "flexure",
    _ratio_limit(0.07, f"{TABLE_B} Case 20", "Limit λp, round HSS, flexure"),
    _ratio_limit(0.31, f"{TABLE_B} Case 20", "Limit λr, round HSS, flexure"),
)


def classify(slenderness: float, lambda_p: float | None, lambda_r: float) -> Classification:
    """Compact λ ≤ λp, noncompact λp < λ ≤ λr, slender λ > λr (Section B4.1).

    Without λp (Table B4.1a) the outcome is nonslender or slender.
    """
    if slenderness > lambda_r:
        return Classification.SLENDER
    if lambda_p is None:
        return Classification.NONSLENDER
    return Classification.COMPACT if slenderness <= lambda_p else Classification.NONCOMPACT


# Codes of classify_numeric, in order of increasing slenderness.
COMPACT_CODE, NONCOMPACT_CODE, SLENDER_CODE = 0, 1, 2


def classify_numeric(
    slenderness: np.ndarray, lambda_p: np.ndarray | None, lambda_r: np.ndarray
) -> np.ndarray:
    """Vectorised :func:`classify`: 0 compact (or nonslender), 1 noncompact, 2 slender."""
    codes = np.where(slenderness > lambda_r, SLENDER_CODE, NONCOMPACT_CODE)
    if lambda_p is None:
        return np.where(codes == SLENDER_CODE, SLENDER_CODE, COMPACT_CODE)
    return np.where(slenderness <= lambda_p, COMPACT_CODE, codes)


@dataclass(frozen=True)
class WrittenElement:
    """What :func:`write_classification` put on the sheet, and the outcome."""

    slenderness: sp.Symbol
    lambda_p: sp.Symbol | None
    lambda_r: sp.Symbol
    classification: Classification


def write_classification(
    sheet: Sheet,
    limits: ElementLimits,
    slenderness: sp.Symbol,
    E: sp.Symbol,
    F_y: sp.Symbol,
    *,
    suffix: str,
) -> WrittenElement:
    """Write λp (if any) and λr as steps, classify from the current values and say so.

    The limit steps are named ``lambda_p<suffix>`` and ``lambda_r<suffix>``
    (``lambda_pf``, ``lambda_rw``...). The outcome is decided now, from the values
    at build time; the caller fixes the inputs it depends on.
    """
    lam_p = (
        limits.lambda_p.write(sheet, f"lambda_p{suffix}", E, F_y)
        if limits.lambda_p is not None
        else None
    )
    lam_r = limits.lambda_r.write(sheet, f"lambda_r{suffix}", E, F_y)
    value = float(sheet.value(slenderness).m)
    p_value = float(sheet.value(lam_p).m) if lam_p is not None else None
    r_value = float(sheet.value(lam_r).m)
    outcome = classify(value, p_value, r_value)
    sheet.text(outcome_text(limits, value, p_value, r_value, outcome))
    return WrittenElement(slenderness, lam_p, lam_r, outcome)


def outcome_text(
    limits: ElementLimits,
    value: float,
    p_value: float | None,
    r_value: float,
    outcome: Classification,
    *,
    element: str | None = None,
) -> str:
    """The classification in words, with the numbers that decided it."""
    shown = f"λ = {value:.3g}"
    if outcome is Classification.SLENDER:
        relation = f"> λr = {r_value:.3g}"
    elif outcome is Classification.NONCOMPACT:
        relation = f"> λp = {p_value:.3g} and ≤ λr = {r_value:.3g}"
    elif outcome is Classification.COMPACT:
        relation = f"≤ λp = {p_value:.3g}"
    else:
        relation = f"≤ λr = {r_value:.3g}"
    named = element or limits.element
    return (
        f"{named[:1].upper()}{named[1:]} ({limits.loading}): {shown} {relation}, "
        f"so the element "
        f"is {outcome.value} ({limits.reference})."
    )


# --- widths and ratios of Section B4.1 ------------------------------------------------


@clause_b41("Section B4.1a", "Flange half-width, b = bf/2 (rolled I-shape)")
def half_flange_width(b_f: sp.Basic) -> sp.Expr:
    """b = bf/2 for flanges of I-shaped members (AISC 360-22 Section B4.1a)."""
    return b_f / 2


@clause_b41("Section B4.1b", "Web height, {h} = {d} − 2·{k_des} (rolled shape, fillets excluded)")
def rolled_web_height(d: sp.Basic, k_des: sp.Basic) -> sp.Expr:
    """h = d − 2·k_des: the clear distance between flanges less the fillets (Section B4.1b)."""
    return d - 2 * k_des


@clause_b41("Section B4.1b", "Flat width of an HSS wall, outside dimension less 3t")
def hss_flat_width(outside: sp.Basic, t: sp.Basic) -> sp.Expr:
    """b or h = outside dimension − 3t when the corner radius is not known (Section B4.1b)."""
    return outside - 3 * t


@clause_b41("Section B4.1", "Width-to-thickness ratio")
def width_thickness_ratio(b: sp.Basic, t: sp.Basic) -> sp.Expr:
    """λ = b/t, h/tw or D/t (AISC 360-22 Section B4.1)."""
    return b / t
