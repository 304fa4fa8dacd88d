"""Mechanics of a cantilever member: loads, statics at a station, stresses at section points.

Axis system: member along z from the fixed support (z = 0); section in (x, y),
x right, y up, origin at the centroid; right-handed. Internal forces act on the
cut face whose outward normal is +z (see :mod:`calcsheet.mechanics.statics`).

Quick use::

    from calcsheet.mechanics import point_load, internal_forces, stress_model

    load = point_load("P1", magnitude="6 kip", angle="30 deg", from_axis="+z",
                      toward_axis="-y", z="60 in", ey="-5 in")
    forces = internal_forces("60 in", [load], station="0 in")
    model = stress_model(section)             # once per section
    result = model.stresses(forces.as_array("kip", "inch"))   # ksi at every point
"""

from calcsheet.mechanics.distributed import DistributedLoad, distributed_load, self_weight
from calcsheet.mechanics.frame import (
    DEFLECTION_NAMES,
    REACTION_NAMES,
    FrameResult,
    MemberStiffness,
    member_stiffness,
    solve_frame,
)
from calcsheet.mechanics.loads import (
    AppliedMoment,
    Direction,
    PointLoad,
    applied_moment,
    member_length,
    point_load,
)
from calcsheet.mechanics.statics import (
    FORCE_NAMES,
    InternalForces,
    internal_forces,
    loads_beyond,
    resultants_numeric,
    validate_loads,
)
from calcsheet.mechanics.stresses import (
    CENTROID_LABEL,
    MEASURES,
    PointStresses,
    StressModel,
    stress_model,
)
from calcsheet.mechanics.supports import (
    MOTIONS,
    SUPPORT_CASES,
    Support,
    support,
    support_case,
)
from calcsheet.mechanics.torsion import WARPING_NOTE, TorsionRule, torsion_rule
from calcsheet.mechanics.warping_torsion import (
    FIXED,
    FREE,
    PINNED,
    ConcentratedTorque,
    DistributedTorque,
    EndRestraint,
    TorsionStresses,
    TwistSolution,
    torsion_stresses,
    unit_twists,
)

__all__ = [
    "CENTROID_LABEL",
    "DEFLECTION_NAMES",
    "FIXED",
    "FORCE_NAMES",
    "FREE",
    "MEASURES",
    "MOTIONS",
    "PINNED",
    "REACTION_NAMES",
    "SUPPORT_CASES",
    "WARPING_NOTE",
    "AppliedMoment",
    "ConcentratedTorque",
    "Direction",
    "DistributedLoad",
    "DistributedTorque",
    "EndRestraint",
    "FrameResult",
    "InternalForces",
    "MemberStiffness",
    "PointLoad",
    "PointStresses",
    "StressModel",
    "Support",
    "TorsionRule",
    "TorsionStresses",
    "TwistSolution",
    "applied_moment",
    "distributed_load",
    "internal_forces",
    "loads_beyond",
    "member_length",
    "member_stiffness",
    "point_load",
    "resultants_numeric",
    "self_weight",
    "solve_frame",
    "stress_model",
    "support",
    "support_case",
    "torsion_rule",
    "torsion_stresses",
    "unit_twists",
    "validate_loads",
]
