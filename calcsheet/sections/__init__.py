"""Cross-sections: the AISC shape catalog, user-defined sections, and their properties.

Coordinates (see :mod:`calcsheet.sections.section` for the full statement): the
section lies in the (x, y) plane, x horizontal to the right, y vertical up, origin
at the centroid; x-x is the AISC strong axis of a W shape; the member axis is z.

Quick use::

    from calcsheet.sections import catalog_section, rectangular_hss, plate

    w = catalog_section("W10X33")            # tabulated A, I, S, Z, r, J, Cw
    tube = rectangular_hss("8 in", "4 in", "0.349 in")
    bar = plate("300 mm", "20 mm")
    numbers = w.numeric("inch")              # floats for vectorised stress checks
"""

from calcsheet.sections.catalog import (
    FAMILIES,
    catalog_section,
    family_title,
    find_entry,
    list_designations,
    normalise_designation,
    tabulated_properties,
)
from calcsheet.sections.section import Section, SectionNumbers, StressPoint
from calcsheet.sections.user_defined import (
    angle,
    built_up,
    channel,
    i_shape,
    plate,
    rectangular_hss,
    round_bar,
    round_hss,
    tee,
)
from calcsheet.sections.warping import (
    WarpingPoints,
    WarpingProperties,
    torque_about_shear_centre,
    torsion_parameter,
    warping_properties,
)

__all__ = [
    "FAMILIES",
    "Section",
    "SectionNumbers",
    "StressPoint",
    "WarpingPoints",
    "WarpingProperties",
    "angle",
    "built_up",
    "catalog_section",
    "channel",
    "family_title",
    "find_entry",
    "i_shape",
    "list_designations",
    "normalise_designation",
    "plate",
    "rectangular_hss",
    "round_bar",
    "round_hss",
    "tabulated_properties",
    "tee",
    "torque_about_shear_centre",
    "torsion_parameter",
    "warping_properties",
]
