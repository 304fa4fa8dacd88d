"""AISC 360-22 (ASD and LRFD) as clauses: one :class:`~calcsheet.standards.Clause` per equation.

Modules: :mod:`.factors` (φ, Ω), :mod:`.classification` (Table B4.1), :mod:`.tension`
(D2), :mod:`.compression` (E3, E4-2, E7), :mod:`.flexure` (F2, F3, F6, F7, F8, F10),
:mod:`.shear` (G2, G3, G4, G5, G6), :mod:`.combined` (H1, H2), :mod:`.torsion` (H3),
:mod:`.second_order`
(Appendix 8, B1). :func:`write_aisc_checks` writes a member's checks on a sheet;
:func:`aisc_checks_numeric` runs the same procedure on arrays of sections and loads.
"""

from calcsheet.standards.aisc360.factors import (
    AvailableStrength,
    LimitStateFactors,
    available_strength,
    design_method,
)
from calcsheet.standards.aisc360.inputs import Steel
from calcsheet.standards.aisc360.member import (
    CHECK_TITLES,
    Demands,
    aisc_member_procedure,
    write_aisc_checks,
)
from calcsheet.standards.aisc360.member_torsion import PointStressDemands
from calcsheet.standards.aisc360.numeric import (
    DemandArrays,
    aisc_checks_numeric,
    aisc_utilization_numeric,
)
from calcsheet.standards.aisc360.section_data import (
    SectionTable,
    catalog_table,
    section_kind,
    section_table,
)

__all__ = [
    "CHECK_TITLES",
    "AvailableStrength",
    "DemandArrays",
    "Demands",
    "LimitStateFactors",
    "PointStressDemands",
    "SectionTable",
    "Steel",
    "aisc_checks_numeric",
    "aisc_member_procedure",
    "aisc_utilization_numeric",
    "available_strength",
    "catalog_table",
    "design_method",
    "section_kind",
    "section_table",
    "write_aisc_checks",
]
