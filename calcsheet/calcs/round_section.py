"""Stresses of a round section (bar, round HSS, pipe) from the resultant moment and shear.

Every diameter of a round section is a principal axis, so the bending stress peaks
at the two ends of the diameter normal to the resultant moment,
σ = N/A ± M_r·R_o/I with M_r = √(M_x² + M_y²); sampling the perimeter would miss
that peak by up to 1 − cos(half the spacing). Transverse shear peaks on the
neutral axis of the resultant shear V_r = √(V_x² + V_y²): τ_V = V_r·Q_0/(I·b_0),
Q_0 and b_0 of the half section cut through the centroid. Torsion: τ_T = T·R_o/J.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.calcs.member_figures import section_drawing
from calcsheet.calcs.points import PointSymbols, write_combined
from calcsheet.engine import Sheet
from calcsheet.engine.functions import Abs, sqrt
from calcsheet.sections import Section
from calcsheet.units import Quantity

ROUND_TEXT = (
    "Round section: every diameter is a principal axis, so bending is taken with the "
    "resultant moment M_r = √(M_x² + M_y²), largest at the two ends of the diameter "
    "normal to it: σ = N/A ± M_r·R_o/I. The transverse shear is largest on the neutral "
    "axis of the resultant shear V_r = √(V_x² + V_y²): τ_V = V_r·Q_0/(I·b_0). Both fibres "
    "are checked with τ = τ_V + |τ_T| (the largest shear, wherever it acts: conservative)."
)
_FIBRES = (
    ("extreme fibre on the tension side of M_r", 1),
    ("extreme fibre on the compression side of M_r", -1),
)


def write_round_point_stresses(
    sheet: Sheet,
    section: Section,
    forces: dict[str, sp.Symbol],
    props: dict[str, sp.Symbol | None],
    stress: str,
) -> list[PointSymbols]:
    """Steps for the two extreme fibres of a round section; returns their symbols."""
    N, V_x, V_y, T, M_x, M_y = (forces[k] for k in ("N", "V_x", "V_y", "T", "M_x", "M_y"))
    A, I, J = props["A"], props["I_x"], props["J"]
    numbers = section.numeric()
    unit = section.length_unit
    outer_radius = max(float(abs(ring).max()) for ring in numbers.outline.rings)
    sheet.heading("Stresses at the extreme fibres of the round section")
    sheet.text(ROUND_TEXT)
    sheet.figure(
        section_drawing(section, [], unit),
        f"Section {section.name} to scale (its extreme fibres lie on the diameter normal "
        "to the resultant moment).",
    )
    R_o = sheet.input(
        "R_o", Quantity(outer_radius, unit), "Outside radius", reference="section outline"
    )
    Q_0 = sheet.input(
        "Q_0",
        Quantity(float(numbers.Q_x([0.0])[0]), f"{unit}**3"),
        "First moment of the half section about the centroid",
        reference="section outline",
    )
    b_0 = sheet.input(
        "b_0",
        Quantity(float(numbers.b([0.0])[0]), unit),
        "Width of material on a cut through the centroid",
        reference="section outline",
    )
    M_r = sheet.step("M_r", sqrt(M_x**2 + M_y**2), "Resultant bending moment")
    V_r = sheet.step("V_r", sqrt(V_x**2 + V_y**2), "Resultant transverse shear")
    sigma_N = sheet.step("sigma_N", N / A, "Axial term, N/A", unit=stress)
    sigma_b = sheet.step("sigma_b", M_r * R_o / I, "Bending term at the extreme fibre", unit=stress)
    tau_V = sheet.step("tau_V", V_r * Q_0 / (I * b_0), "Transverse shear, largest", unit=stress)
    tau_T = sheet.step("tau_T", T * R_o / J, "Torsion at the outside radius, T·R_o/J", unit=stress)
    tau = sheet.step("tau", tau_V + Abs(tau_T), "Shear stress taken at both fibres", unit=stress)
    points = []
    for index, (label, sign) in enumerate(_FIBRES, start=1):
        n = str(index)
        sheet.heading(f"Point {n}: {label}", level=2)
        expr = sigma_N + sigma_b if sign > 0 else sigma_N - sigma_b
        sigma = sheet.step(f"sigma_z_{n}", expr, "Normal stress (sum)", unit=stress)
        record = PointSymbols(index, label)
        record.terms.update(sigma_N=sigma_N, sigma_b=sigma_b, sigma=sigma, tau=tau)
        write_combined(sheet, record, n, stress)
        points.append(record)
    return points
