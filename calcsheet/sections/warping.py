"""Shear centre, warping constant, and the warping function and statical moment at points.

Idealisation (the thin-walled open-section model of Vlasov, as AISC Design Guide 9,
Torsional Analysis of Structural Steel Members, uses it):

* the section is its **mid-line**: straight walls of uniform thickness meeting at
  nodes, fillets, toe rounding and the overlap of walls at a junction ignored.
  I-shapes: two flanges at their mid-thickness joined by the web between them
  (h0 = d − (tf + tf_bottom)/2 apart); channels: flanges of the *average*
  thickness tf the tables give, drawn parallel (the AISC table's Cw and eo follow
  this model, not the sloped flanges of a C shape), at d − tf apart, joined by the
  web mid-line; tees: the flange mid-line and the stem up to it; angles: the two
  legs from the corner of their mid-lines (b − t/2 and d − t/2 long);
* the sectorial coordinate ω = ∫ r dS along the mid-line, its pole moved to the
  shear centre S (the pole for which ∫ω·x dA = ∫ω·y dA = 0, about the model's own
  centroid) and normalised (∫ω dA = 0);
* ``Cw = ∫Wn² dA + Σ t³/12 ∫ r_t² ds``: the second term is the warping through
  each wall's thickness (r_t the distance along the wall from S's foot); it is all
  of Cw for a tee or an angle, whose walls all meet at S, and a few per mille of it
  for an I-shape or a channel;
* closed and solid sections (tubes, bars, plates) are taken as not warping
  (Cw = 0) with the shear centre at the centroid: they are doubly symmetric.

Signs. ``Wn`` is the warping function in the sense of the warping normal stress
σ_w = E·Wn·φ'' (twist φ positive counter-clockwise about +z): on a W shape Wn > 0
at the top-right flange tip. At a point off the mid-line it includes the
through-thickness term (−n·r_t, n the offset from the mid-line), so it is the
thick-wall warping function a finite-element solution gives. ``Sw`` is
∫Wn·t ds over the part of the mid-line cut off beyond the point (away from the
model's hub: the web of an I or channel, the corner of an angle, the flange–stem
junction of a tee), so the warping shear τ_w = −E·Sw·φ'''/t acts along the wall
toward the hub (AISC Design Guide 9, Sections 4.1.2 and 4.1.3, from memory).
Only the mid-line part of the warping carries Sw; the through-thickness part's
shear is neglected (common practice, no source).
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import InputError
from calcsheet.sections.section import Section

Array = NDArray[np.float64]

# IPE and HE: the EN 10365 I-section families of the metric catalog (dimensions d, bf, tw, tf).
I_FAMILIES = frozenset({"W", "M", "S", "HP", "I-shape", "IPE", "HEA", "HEB", "HEM"})
CHANNEL_FAMILIES = frozenset({"C", "MC", "channel"})
TEE_FAMILIES = frozenset({"WT", "MT", "ST", "tee"})
ANGLE_FAMILIES = frozenset({"L", "angle"})
NON_WARPING_FAMILIES = frozenset(
    {"rectangular HSS", "HSS_RECT", "round HSS", "HSS_ROUND", "PIPE", "round bar", "plate"}
)

MIDLINE_NOTE = (
    "thin-walled mid-line model: straight walls of uniform thickness, fillets and the "
    "overlap of walls at junctions ignored"
)
CHANNEL_NOTE = "channel flanges parallel, of the average thickness tf the tables give"
NOT_WARPING_NOTE = (
    "closed or solid section: warping neglected (Cw = 0), shear centre at the centroid"
)


@dataclass(frozen=True)
class MidlineWall:
    """One straight wall of the mid-line model: from node ``start`` (hub side) to ``end``."""

    label: str
    start: int
    end: int
    thickness: float


@dataclass(frozen=True)
class MidlineModel:
    """Nodes (builder coordinates, one length unit) and walls forming a tree; node 0 is the hub.

    Walls are listed so that each wall's ``start`` is nearer the hub than its ``end``.
    """

    nodes: Array  # (n, 2)
    walls: tuple[MidlineWall, ...]
    note: str


@dataclass(frozen=True, eq=False)
class WarpingProperties:
    """A section's warping properties in one length unit, about its centroid.

    ``x_s``, ``y_s`` locate the shear centre from the section's centroid (the outline's,
    as every other property); ``Cw`` is in unit⁶. ``nodes`` are the mid-line nodes from
    the centroid and ``node_wn`` the mid-line Wn at them (Wn is linear along a wall).
    ``Cw`` is ``Cw_midline`` plus the through-thickness part (see the module docstring).
    """

    length_unit: str
    x_s: float
    y_s: float
    Cw: float
    Cw_midline: float  # ∫ Wn² dA alone (the thin-walled formulas of the tables)
    note: str
    nodes: Array
    walls: tuple[MidlineWall, ...]
    node_wn: Array

    @property
    def warps(self) -> bool:
        """Whether the section has a mid-line model (False for tubes, bars and plates)."""
        return bool(self.walls)

    def at_points(self, x: ArrayLike, y: ArrayLike) -> WarpingPoints:
        """Wn, Sw, the wall thickness and the τ_w direction at points (x, y) from the centroid."""
        return _at_points(self, np.asarray(x, dtype=float), np.asarray(y, dtype=float))


@dataclass(frozen=True, eq=False)
class WarpingPoints:
    """Warping values at points: arrays of shape (n,).

    ``wall`` names the mid-line wall each point was taken on (empty for a section
    that does not warp); ``thickness`` is that wall's t (for G·t·φ' and Sw/t);
    ``Wn_midline`` is Wn without the through-thickness term (the value the thin-walled
    formulas and the tables give, e.g. Wno = h0·bf/4 at a W shape's flange tips: at an
    outer-face flange tip Wn is smaller than it by tf/h0, at an inner-face tip larger);
    ``shear_x``, ``shear_y`` the unit vector along which a positive τ_w = −E·Sw·φ'''/t
    acts (toward the hub).
    """

    wall: tuple[str, ...]
    Wn: Array
    Wn_midline: Array  # Wn at the point's foot on the mid-line (Design Guide 9's values)
    Sw: Array
    thickness: Array
    shear_x: Array
    shear_y: Array


# --- the mid-line models of each family -------------------------------------------------------


def _size(section: Section, name: str, unit: str) -> float:
    return float(section.dimensions[name].to(unit).magnitude)


def midline_model(section: Section, unit: str) -> MidlineModel | None:
    """The mid-line model of ``section`` in builder coordinates (lower-left corner at 0, 0).

    None for a tube, bar or plate (not warping). A built-up section raises
    :class:`InputError`: its walls are not known.
    """
    family = section.family
    if family in NON_WARPING_FAMILIES:
        return None
    if family in I_FAMILIES:
        return _i_model(section, unit)
    if family in CHANNEL_FAMILIES:
        return _channel_model(section, unit)
    if family in TEE_FAMILIES:
        return _tee_model(section, unit)
    if family in ANGLE_FAMILIES:
        return _angle_model(section, unit)
    raise InputError(
        "section",
        section.name,
        "an I-shape, channel, tee, angle, tube, bar or plate",
        f"warping properties are not computed for a {family} section",
    )


def _i_model(section: Section, unit: str) -> MidlineModel:
    d, bf = _size(section, "d", unit), _size(section, "bf", unit)
    tw, tf = _size(section, "tw", unit), _size(section, "tf", unit)
    bf_b = _size(section, "bf_bottom", unit) if "bf_bottom" in section.dimensions else bf
    tf_b = _size(section, "tf_bottom", unit) if "tf_bottom" in section.dimensions else tf
    middle = max(bf, bf_b) / 2
    top, bottom = d - tf / 2, tf_b / 2
    nodes = np.array(
        [
            (middle, top),
            (middle, bottom),
            (middle - bf / 2, top),
            (middle + bf / 2, top),
            (middle - bf_b / 2, bottom),
            (middle + bf_b / 2, bottom),
        ]
    )
    walls = (
        MidlineWall("web", 0, 1, tw),
        MidlineWall("top flange, left", 0, 2, tf),
        MidlineWall("top flange, right", 0, 3, tf),
        MidlineWall("bottom flange, left", 1, 4, tf_b),
        MidlineWall("bottom flange, right", 1, 5, tf_b),
    )
    return MidlineModel(nodes, walls, MIDLINE_NOTE)


def _channel_model(section: Section, unit: str) -> MidlineModel:
    d, bf = _size(section, "d", unit), _size(section, "bf", unit)
    tw, tf = _size(section, "tw", unit), _size(section, "tf", unit)
    web = tw / 2
    nodes = np.array(
        [(web, d / 2), (web, d - tf / 2), (web, tf / 2), (bf, d - tf / 2), (bf, tf / 2)]
    )
    walls = (
        MidlineWall("web, upper half", 0, 1, tw),
        MidlineWall("web, lower half", 0, 2, tw),
        MidlineWall("top flange", 1, 3, tf),
        MidlineWall("bottom flange", 2, 4, tf),
    )
    return MidlineModel(nodes, walls, f"{MIDLINE_NOTE}; {CHANNEL_NOTE}")


def _tee_model(section: Section, unit: str) -> MidlineModel:
    d, bf = _size(section, "d", unit), _size(section, "bf", unit)
    tw, tf = _size(section, "tw", unit), _size(section, "tf", unit)
    middle, flange = bf / 2, d - tf / 2
    nodes = np.array([(middle, flange), (middle, 0.0), (0.0, flange), (bf, flange)])
    walls = (
        MidlineWall("stem", 0, 1, tw),
        MidlineWall("flange, left", 0, 2, tf),
        MidlineWall("flange, right", 0, 3, tf),
    )
    return MidlineModel(nodes, walls, MIDLINE_NOTE)


def _angle_model(section: Section, unit: str) -> MidlineModel:
    d, b, t = _size(section, "d", unit), _size(section, "b", unit), _size(section, "t", unit)
    if section.family == "L":  # the catalog draws the longer leg vertical
        d, b = max(d, b), min(d, b)
    nodes = np.array([(t / 2, t / 2), (t / 2, d), (b, t / 2)])
    walls = (MidlineWall("vertical leg", 0, 1, t), MidlineWall("horizontal leg", 0, 2, t))
    return MidlineModel(nodes, walls, MIDLINE_NOTE)


# --- integrals over the mid-line ----------------------------------------------------------------


def _linear_product(length_times_t: Array, f0, f1, g0, g1):
    """∫ f·g dA over walls where f and g vary linearly from (f0, g0) to (f1, g1)."""
    return length_times_t * (f0 * g0 / 3 + (f0 * g1 + f1 * g0) / 6 + f1 * g1 / 3)


def _sectorial(nodes: Array, walls: Sequence[MidlineWall], pole: Array) -> Array:
    """ω at every node, 0 at the hub: ω grows by (start − pole) × (end − start) along a wall."""
    omega = np.zeros(len(nodes))
    for wall in walls:  # listed hub-first, so a wall's start already has its ω
        start, end = nodes[wall.start], nodes[wall.end]
        arm = start - pole
        step = end - start
        omega[wall.end] = omega[wall.start] + arm[0] * step[1] - arm[1] * step[0]
    return omega


def warping_properties(section: Section, length_unit: str = "inch") -> WarpingProperties:
    """Shear centre, Cw and the mid-line warping function of ``section`` in ``length_unit``.

    Raises :class:`InputError` for a built-up section (no mid-line model).
    """
    model = midline_model(section, length_unit)
    x_bar = float(section.properties["x_bar"].to(length_unit).magnitude)
    y_bar = float(section.properties["y_bar"].to(length_unit).magnitude)
    if model is None:
        return WarpingProperties(
            length_unit, 0.0, 0.0, 0.0, 0.0, NOT_WARPING_NOTE, np.zeros((0, 2)), (), np.zeros(0)
        )
    starts = np.array([wall.start for wall in model.walls])
    ends = np.array([wall.end for wall in model.walls])
    thickness = np.array([wall.thickness for wall in model.walls])
    lengths = np.hypot(*(model.nodes[ends] - model.nodes[starts]).T)
    lt = lengths * thickness
    # The model's own centroid and second moments (thin-walled: line integrals times t).
    area = float(lt.sum())
    mids = (model.nodes[starts] + model.nodes[ends]) / 2
    centroid = (lt[:, None] * mids).sum(axis=0) / area
    nodes = model.nodes - centroid
    x0, x1 = nodes[starts, 0], nodes[ends, 0]
    y0, y1 = nodes[starts, 1], nodes[ends, 1]
    ix = float(_linear_product(lt, y0, y1, y0, y1).sum())
    iy = float(_linear_product(lt, x0, x1, x0, x1).sum())
    ixy = float(_linear_product(lt, x0, x1, y0, y1).sum())
    omega = _sectorial(nodes, model.walls, np.zeros(2))
    w0, w1 = omega[starts], omega[ends]
    i_wx = float(_linear_product(lt, w0, w1, x0, x1).sum())
    i_wy = float(_linear_product(lt, w0, w1, y0, y1).sum())
    # ω_S = ω_C − x_s·(y − y_hub) + y_s·(x − x_hub): orthogonal to x and y at the shear centre.
    matrix = np.array([[-ixy, iy], [-ix, ixy]])
    shear_centre = np.linalg.solve(matrix, [-i_wx, -i_wy])
    omega_s = _sectorial(nodes, model.walls, shear_centre)
    mean = float(_linear_product(lt, omega_s[starts], omega_s[ends], 1.0, 1.0).sum()) / area
    wn = -(omega_s - mean)  # the sense of σ_w = E·Wn·φ'' (see the module docstring)
    primary = float(_linear_product(lt, wn[starts], wn[ends], wn[starts], wn[ends]).sum())
    # Through the thickness: t³/12 ∫ r_t² ds, r_t linear along the wall.
    tangent = (nodes[ends] - nodes[starts]) / lengths[:, None]
    r0 = np.sum((nodes[starts] - shear_centre) * tangent, axis=1)
    r1 = np.sum((nodes[ends] - shear_centre) * tangent, axis=1)
    secondary = float(np.sum(thickness**3 / 12 * lengths * (r0 * r0 + r0 * r1 + r1 * r1) / 3))
    shift = centroid - np.array([x_bar, y_bar])  # the model's centroid from the section's
    size = float(np.ptp(model.nodes, axis=0).max())
    # A shear centre on a symmetry axis comes out as round-off of zero there: make it zero,
    # so a doubly symmetric section's torque about it is exactly the centroid's.
    located = np.where(np.abs(shear_centre + shift) < 1e-9 * size, -shift, shear_centre)
    return WarpingProperties(
        length_unit=length_unit,
        x_s=float(located[0] + shift[0]),
        y_s=float(located[1] + shift[1]),
        Cw=primary + secondary,
        Cw_midline=primary,
        note=model.note,
        nodes=nodes + shift,
        walls=model.walls,
        node_wn=wn,
    )


# --- values at points ---------------------------------------------------------------------------


def _subtree_sw(props: WarpingProperties) -> Array:
    """∫Wn·t ds over each wall's end node's subtree (the walls beyond it), per wall."""
    nodes, walls = props.nodes, props.walls
    own = np.array(
        [
            wall.thickness
            * float(np.hypot(*(nodes[wall.end] - nodes[wall.start])))
            * (props.node_wn[wall.start] + props.node_wn[wall.end])
            / 2
            for wall in walls
        ]
    )
    beyond = np.zeros(len(walls))
    for index in reversed(range(len(walls))):  # children are listed after their parents
        wall = walls[index]
        beyond[index] = sum(
            own[child] + beyond[child]
            for child in range(len(walls))
            if walls[child].start == wall.end
        )
    return beyond


def _at_points(props: WarpingProperties, x: Array, y: Array) -> WarpingPoints:
    count = len(x)
    if not props.warps:
        zero = np.zeros(count)
        return WarpingPoints(("",) * count, *(zero.copy() for _ in range(6)))
    nodes, walls = props.nodes, props.walls
    beyond = _subtree_sw(props)
    shear_centre = np.array([props.x_s, props.y_s])
    labels, wn_out, mid_out, sw_out, t_out, sx_out, sy_out = [], [], [], [], [], [], []
    size = float(np.ptp(nodes, axis=0).max())
    for px, py in zip(x, y, strict=True):
        candidates = []
        for index, wall in enumerate(walls):
            start, end = nodes[wall.start], nodes[wall.end]
            length = float(np.hypot(*(end - start)))
            tangent = (end - start) / length
            along = float(np.clip(np.dot((px, py) - start, tangent), 0.0, length))
            foot = start + along * tangent
            offset = np.array((px, py)) - foot
            # how far outside the wall's own material the point lies (≤ 0 inside)
            outside = float(np.hypot(*offset)) - wall.thickness / 2
            u = along / length
            wn_mid = (1 - u) * props.node_wn[wall.start] + u * props.node_wn[wall.end]
            normal = np.array((-tangent[1], tangent[0]))
            through = -float(np.dot(offset, normal)) * float(np.dot(foot - shear_centre, tangent))
            wn_end = props.node_wn[wall.end]
            part = wall.thickness * (length - along) * (wn_mid + wn_end) / 2
            sw = part + beyond[index]
            candidates.append((outside, index, wn_mid + through, sw, -tangent, wn_mid))
        nearest = min(item[0] for item in candidates)
        inside = [item for item in candidates if item[0] <= nearest + 1e-9 * size]
        # A point where walls meet is in each: take the wall with the larger warping shear.
        chosen = max(inside, key=lambda item: abs(item[3]) / walls[item[1]].thickness)
        _, index, wn, sw, direction, wn_mid = chosen
        labels.append(walls[index].label)
        wn_out.append(wn)
        mid_out.append(wn_mid)
        sw_out.append(sw)
        t_out.append(walls[index].thickness)
        sx_out.append(direction[0])
        sy_out.append(direction[1])
    return WarpingPoints(
        tuple(labels),
        np.array(wn_out),
        np.array(mid_out),
        np.array(sw_out),
        np.array(t_out),
        np.array(sx_out),
        np.array(sy_out),
    )


def torque_about_shear_centre(
    props: WarpingProperties, force_x: ArrayLike, force_y: ArrayLike, x: ArrayLike, y: ArrayLike
) -> Array:
    """Torque about the shear-centre axis of a force (F_x, F_y) acting at (x, y) from the centroid.

    T = (x − x_s)·F_y − (y − y_s)·F_x, positive counter-clockwise about +z (statics).
    """
    fx, fy = np.asarray(force_x, dtype=float), np.asarray(force_y, dtype=float)
    arm_x = np.asarray(x, dtype=float) - props.x_s
    arm_y = np.asarray(y, dtype=float) - props.y_s
    return arm_x * fy - arm_y * fx


def torsion_parameter(E: float, Cw: float, G: float, J: float) -> float:
    """a = √(E·Cw / (G·J)), the length over which warping restraint dies out.

    AISC Design Guide 9, Section 3.3 (from memory). Infinite for J = 0, zero for Cw = 0.
    """
    if J <= 0:
        return math.inf
    return math.sqrt(E * Cw / (G * J))
