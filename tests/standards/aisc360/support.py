"""Helpers for the AISC 360-22 tests: sheets with demands, unit conversions."""

from __future__ import annotations

from functools import lru_cache

import numpy as np

from calcsheet.engine import Sheet
from calcsheet.sections import Section, catalog_section
from calcsheet.standards.aisc360 import Demands, PointStressDemands, write_aisc_checks
from calcsheet.units import Quantity

KSI = Quantity(1.0, "ksi").to("Pa").m
INCH = Quantity(1.0, "inch").to("m").m
KIP = Quantity(1.0, "kip").to("N").m
KIP_FT = Quantity(1.0, "kip*ft").to("N*m").m
E = 29000 * KSI
G = 11200 * KSI
FY = 50 * KSI


@lru_cache(maxsize=64)
def section(designation: str) -> Section:
    """Catalog sections are slow to build (outlines); build each once per test run."""
    return catalog_section(designation)


def member_sheet(
    designation: str | Section,
    method: str = "LRFD",
    *,
    P: float = 0.0,
    Mx: float = 0.0,
    My: float = 0.0,
    Vx: float = 0.0,
    Vy: float = 0.0,
    T: float | None = None,
    stresses: tuple[float, float, float] | None = None,
    **options: object,
) -> Sheet:
    """A sheet with demands (kip, kip·ft) as inputs and the AISC checks written on it.

    ``T`` a torque (kip·ft); ``stresses`` the largest and smallest normal stress and
    the largest shear stress over the points (ksi), for H3.3.
    """
    sheet = Sheet("AISC 360-22 test")
    with sheet:
        points = None
        if stresses is not None:
            points = PointStressDemands(
                *(
                    sheet.input(name, Quantity(value, "ksi"), name, dimension="stress")
                    for name, value in zip(
                        ("sigma_max", "sigma_min", "tau_gov"), stresses, strict=True
                    )
                )
            )
        demands = Demands(
            sheet.input("P_r", Quantity(P, "kip"), "Axial force", dimension="force"),
            sheet.input("M_rx", Quantity(Mx, "kip*ft"), "Moment about x", dimension="moment"),
            sheet.input("M_ry", Quantity(My, "kip*ft"), "Moment about y", dimension="moment"),
            sheet.input("V_rx", Quantity(Vx, "kip"), "Shear along x", dimension="force"),
            sheet.input("V_ry", Quantity(Vy, "kip"), "Shear along y", dimension="force"),
            None
            if T is None
            else sheet.input("T_r", Quantity(T, "kip*ft"), "Torque", dimension="moment"),
            points,
        )
        chosen = section(designation) if isinstance(designation, str) else designation
        write_aisc_checks(sheet, chosen, demands=demands, method=method, **options)
    return sheet


def value(sheet: Sheet, name: str, unit: str) -> float:
    return float(sheet.value(name).to(unit).m)


def array(*values: float) -> np.ndarray:
    return np.array(values, dtype=float)
