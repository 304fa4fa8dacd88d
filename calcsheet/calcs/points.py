"""The member sheet's section values as the point stress procedures take them."""

from __future__ import annotations

from collections.abc import Mapping

import sympy as sp

from calcsheet.mechanics.point_stresses import SectionTerms


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
