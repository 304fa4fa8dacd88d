"""The sheet's values of a section and of its stress points, as the point stress
procedures (:mod:`calcsheet.mechanics.point_stresses`) take them."""

from __future__ import annotations

from collections.abc import Mapping

import sympy as sp

from calcsheet.engine import Sheet
from calcsheet.mechanics.point_stresses import (
    HORIZONTAL_CUT,
    VERTICAL_CUT,
    Cut,
    PointTerms,
    SectionTerms,
)
from calcsheet.mechanics.stresses import StressModel
from calcsheet.units import Quantity

# Input names of a cut's values: (Q_own, Q_other, width), then the point's number.
CUT_NAMES = {HORIZONTAL_CUT: ("Q_xa", "Q_ya", "b"), VERTICAL_CUT: ("Q_yr", "Q_xr", "t")}


def section_terms(
    props: Mapping[str, sp.Symbol | None], torsion: str, length_unit: str
) -> SectionTerms:
    """The sheet's section symbols (A, I_x, I_y, J; I_xy and D or ``None``; the torsion
    rule's t and A_m, or t_max) for :mod:`calcsheet.mechanics.point_stresses`."""
    return SectionTerms(
        A=props["A"],
        I_x=props["I_x"],
        I_y=props["I_y"],
        J=props["J"],
        torsion=torsion,
        I_xy=props.get("I_xy"),
        D=props.get("D"),
        t=props.get("t"),
        A_m=props.get("A_m"),
        t_max=props.get("t_max"),
        length_unit=length_unit,
    )


def write_point_inputs(sheet: Sheet, model: StressModel) -> list[PointTerms]:
    """x_n, y_n and the values of the cuts through every point n, as unlisted inputs.

    The cuts are those of :meth:`StressModel.point_cuts` (the ones the numeric path
    uses): Q_xa_n, Q_ya_n, b_n of the horizontal cut and Q_yr_n, Q_xr_n, t_n of the
    vertical one; the tables of the member sheet show them.
    """
    unit = model.length_unit
    volume = f"{unit}**3"
    points: list[PointTerms] = []
    for index, (label, cuts) in enumerate(zip(model.labels, model.point_cuts(), strict=True)):
        n = str(index + 1)
        written: dict[str, Cut] = {}
        for name, cut in cuts.items():
            own_name, other_name, width_name = CUT_NAMES[name]
            Q_other = None
            if cut.Q_other is not None:
                Q_other = sheet.input(
                    f"{other_name}_{n}", Quantity(cut.Q_other, volume), listed=False
                )
            written[name] = Cut(
                sheet.input(f"{own_name}_{n}", Quantity(cut.Q_own, volume), listed=False),
                Q_other,
                sheet.input(f"{width_name}_{n}", Quantity(cut.width, unit), listed=False),
            )
        points.append(
            PointTerms(
                n,
                label,
                sheet.input(f"x_{n}", Quantity(model.x[index], unit), listed=False),
                sheet.input(f"y_{n}", Quantity(model.y[index], unit), listed=False),
                written,
                junction=bool(model.junction[index]),
            )
        )
    return points
