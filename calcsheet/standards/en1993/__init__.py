"""EN 1993-1-1:2005 (Eurocode 3, steel buildings) as clauses, and member checks on a sheet.

Modules: :mod:`~calcsheet.standards.en1993.factors` (partial factors, grades,
imperfection factors), :mod:`~calcsheet.standards.en1993.classification`
(Table 5.2), :mod:`~calcsheet.standards.en1993.resistance` (6.2),
:mod:`~calcsheet.standards.en1993.torsion` (6.2.7, torsion and shear with torsion),
:mod:`~calcsheet.standards.en1993.buckling` (6.3.1, Tables 6.1 and 6.2),
:mod:`~calcsheet.standards.en1993.lateral` (6.3.2, lateral-torsional buckling and M_cr),
:mod:`~calcsheet.standards.en1993.interaction` (6.3.3, Annex B),
:mod:`~calcsheet.standards.en1993.annex_a` (6.3.3, Annex A) and
:mod:`~calcsheet.standards.en1993.member` (the procedure, :func:`write_en1993_checks`)
and :mod:`~calcsheet.standards.en1993.numeric` (:func:`en1993_checks_numeric`).

The standard's axes: y-y major, z-z minor (calcsheet's x-x and y-y).
"""

from calcsheet.standards.en1993.buckling import CurveChoice, buckling_curve
from calcsheet.standards.en1993.factors import (
    IMPERFECTION_FACTORS,
    PartialFactors,
    Steel,
    steel,
)
from calcsheet.standards.en1993.member import (
    EN_CHECK_TITLES,
    en1993_member_procedure,
    write_en1993_checks,
)
from calcsheet.standards.en1993.numeric import en1993_checks_numeric

__all__ = [
    "EN_CHECK_TITLES",
    "IMPERFECTION_FACTORS",
    "CurveChoice",
    "PartialFactors",
    "Steel",
    "buckling_curve",
    "en1993_checks_numeric",
    "en1993_member_procedure",
    "steel",
    "write_en1993_checks",
]
