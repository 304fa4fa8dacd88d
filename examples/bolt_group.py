"""A user-written calc on the public API: a four-bolt group under an eccentric load.

Elastic method for a 2 x 2 bolt group: each bolt takes an equal share of the
direct load, and the moment of the eccentric load is shared in proportion to
each bolt's distance from the group centroid (common practice, no source). The
scenario and numbers are our own, for demonstration.

Run: ``python examples/bolt_group.py OUT`` to write OUT/bolt-group.html and .pdf.
"""

from __future__ import annotations

import sys
from pathlib import Path

from calcsheet.engine import Sheet, TitleBlock
from calcsheet.engine.functions import sqrt


def bolt_group_sheet(load: str = "9 kip", eccentricity: str = "5 in") -> Sheet:
    """The bolt-group check; ``load`` and ``eccentricity`` are entries such as "9 kip"."""
    sheet = Sheet(
        "Shelf angle bolt group: eccentric shear",
        units="US",
        title_block=TitleBlock(project="Example", subject="Bolt group BG-1", revision="0"),
    )
    with sheet:
        sheet.heading("Inputs")
        P = sheet.input("P", load, "Vertical load on the group", dimension="force")
        e = sheet.input(
            "e", eccentricity, "Load offset from the group centroid", dimension="length"
        )
        s_x = sheet.input("s_x", "3 in", "Horizontal bolt spacing", dimension="length")
        s_y = sheet.input("s_y", "3 in", "Vertical bolt spacing", dimension="length")
        n = sheet.input("n", 4, "Number of bolts", dimension="dimensionless")
        R_allow = sheet.input(
            "R_a", "7.5 kip", "Allowable shear per bolt (from the bolt supplier)", dimension="force"
        )

        sheet.heading("Group geometry")
        x_c = sheet.step("x_c", s_x / 2, "Horizontal distance, centroid to corner bolt", unit="in")
        y_c = sheet.step("y_c", s_y / 2, "Vertical distance, centroid to corner bolt", unit="in")
        I_p = sheet.step(
            "I_p", n * (x_c**2 + y_c**2), "Polar moment of the bolt group", unit="in^2"
        )

        sheet.heading("Forces on the corner bolt")
        M = sheet.step("M", P * e, "Moment of the eccentric load", unit="kip*in")
        R_v = sheet.step(
            "R_v", P / n + M * x_c / I_p, "Vertical force on the corner bolt", unit="kip"
        )
        R_h = sheet.step("R_h", M * y_c / I_p, "Horizontal force on the corner bolt", unit="kip")
        R = sheet.step("R", sqrt(R_v**2 + R_h**2), "Resultant on the corner bolt", unit="kip")

        sheet.check("Shear on the most loaded bolt", R, R_allow, reference="elastic method")
    return sheet


if __name__ == "__main__":
    from calcsheet.export.files import export_sheet

    folder = Path(sys.argv[1] if len(sys.argv) > 1 else "out")
    for path in export_sheet(bolt_group_sheet(), folder, "bolt-group"):
        print(f"wrote {path}")
