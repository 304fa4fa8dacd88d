"""Stresses of a round section (bar, round HSS, pipe) from the resultant moment and shear.

Every diameter of a round section is a principal axis, so the bending stress peaks
at the two ends of the diameter normal to the resultant moment,
σ = N/A ± M_r·R_o/I with M_r = √(M_x² + M_y²); sampling the perimeter would miss
that peak by up to 1 − cos(half the spacing). Transverse shear peaks on the
neutral axis of the resultant shear V_res = √(V_x² + V_y²): τ_V = V_res·Q_0/(I·b_0),
Q_0 and b_0 of the half section cut through the centroid. Torsion: τ_T = T·R_o/J.
The steps are :func:`calcsheet.mechanics.point_stresses.round_stress_procedure`,
which the numeric path (:class:`calcsheet.mechanics.stresses.StressModel`) runs too.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.calcs.member_figures import section_drawing
from calcsheet.calcs.points import section_terms
from calcsheet.engine import Sheet
from calcsheet.engine.procedure import SheetWriter
from calcsheet.mechanics.point_stresses import (
    ForceTerms,
    PointRecord,
    RoundTerms,
    round_stress_procedure,
)
from calcsheet.mechanics.stresses import StressModel
from calcsheet.sections import Section
from calcsheet.units import Quantity

ROUND_TEXT = (
    "Round section: every diameter is a principal axis, so bending is taken with the "
    "resultant moment {M_r} = √({M_x}² + {M_y}²), largest at the two ends of the diameter "
    "normal to it: {sigma} = {N}/{A} ± {M_r}·{R_o}/{I}. The transverse shear is largest on "
    "the neutral axis of the resultant shear {V_res} = √({V_x}² + {V_y}²): "
    "{tau_V} = {V_res}·{Q_0}/({I}·{b_0}). Both fibres are checked with "
    "{tau} = {tau_V} + |{tau_T}| (the largest shear, wherever it acts: conservative)."
)


def write_round_point_stresses(
    sheet: Sheet,
    section: Section,
    model: StressModel,
    forces: dict[str, sp.Symbol],
    props: dict[str, sp.Symbol | None],
) -> list[PointRecord]:
    """Steps for the two extreme fibres of a round section; returns their values."""
    unit = model.length_unit
    sheet.heading("Stresses at the extreme fibres of the round section")
    sheet.text(ROUND_TEXT)
    sheet.figure(
        section_drawing(section, [], unit),
        f"Section {section.name} to scale (its extreme fibres lie on the diameter normal "
        "to the resultant moment).",
    )
    return round_stress_procedure(
        SheetWriter(sheet),
        ForceTerms.of(forces),
        section_terms(props, model.torsion.kind, unit),
        write_round_inputs(sheet, model),
    )


def write_round_inputs(sheet: Sheet, model: StressModel) -> RoundTerms:
    """R_o, Q_0 and b_0 of a round section as inputs (from its outline)."""
    values = model.resultant
    if values is None:
        raise ValueError("the section is not taken by its resultant moment")
    unit = model.length_unit
    R_o = sheet.input(
        "R_o", Quantity(values.R_o, unit), "Outside radius", reference="section outline"
    )
    Q_0 = sheet.input(
        "Q_0",
        Quantity(values.Q_0, f"{unit}**3"),
        "First moment of the half section about the centroid",
        reference="section outline",
    )
    b_0 = sheet.input(
        "b_0",
        Quantity(values.b_0, unit),
        "Width of material on a cut through the centroid",
        reference="section outline",
    )
    return RoundTerms(R_o, Q_0, b_0)
