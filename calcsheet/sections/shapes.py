"""Outlines of each family from its dimensions, in plain floats of one length unit.

Every builder draws the section the way the AISC Manual pictures it, with the
lower-left corner of the bounding box at (0, 0):

* I-shapes (W, M, S, HP, plate girders): flanges horizontal, web vertical, so x-x
  is the strong axis.
* Channels (C, MC): web vertical on the left, flanges pointing to +x.
* Angles (L): heel at the lower left, the longer leg vertical (as the Manual
  tabulates x-x for the long leg vertical), legs along +x and +y.
* Tees (WT, MT, ST): flange on top, stem pointing down.
* Rectangular HSS: height H vertical, width B horizontal, outside corner radius
  2t and inside radius t, t the design wall thickness.

Rolled shapes are drawn without fillets (unless a root radius is given, as for the
EN I and H sections) or toe rounding, and with parallel flanges
except C channels (tf of S shapes and channels is the average flange thickness
the tables give; a C channel's flanges are drawn sloped, see :func:`channel`).

Each builder also gives labelled stress points (outline corners where the
extreme normal stresses of combined axial force and biaxial bending can occur),
the straight walls of an open section along which transverse shear flows
(angles, channels, tees: the stress model scans them for the shear peak), and
the torsion constant J and warping constant Cw by the usual thin-walled
formulas, with a note saying which.
"""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
from numpy.typing import NDArray

from calcsheet.errors import InputError
from calcsheet.sections.geometry import Outline

CHORDS_PER_QUARTER_CIRCLE = 32
POINTS_AROUND_ROUND = 24

ZERO_WARPING = "taken as zero (closed or solid section: warping is negligible)"
THIN_WALLED_J = "computed: thin-walled open section, {J} = Σ{b}·{t}³/3 (no fillets)"
THIN_WALLED_CW = "computed: thin-walled approximation (no fillets)"


@dataclass(frozen=True)
class StressPointSpec:
    """A labelled point of the outline, in the builder's coordinates."""

    label: str
    x: float
    y: float


@dataclass(frozen=True)
class Wall:
    """A straight wall: its mid-line from ``start`` to ``end`` and its thickness there.

    Walls run parallel to x or to y, so the cut across a wall is a horizontal cut
    (a vertical wall) or a vertical one (a horizontal wall). The mid-line stops
    where the wall meets another (the shared corner belongs to neither), so every
    cut across it crosses this wall alone. The thickness varies linearly from
    ``thickness`` at the start to ``end_thickness`` at the end (a sloped flange);
    ``end_thickness`` is None for a wall of uniform thickness.
    """

    label: str
    start: tuple[float, float]
    end: tuple[float, float]
    thickness: float
    end_thickness: float | None = None

    @property
    def vertical(self) -> bool:
        """True for a wall along y (cut across by horizontal lines)."""
        return self.start[0] == self.end[0]

    @property
    def thickest(self) -> float:
        """The larger of the thicknesses at the two ends."""
        return max(self.thickness, self.end_thickness or self.thickness)

    def at(self, fraction: float) -> tuple[float, float]:
        """The mid-line point at ``fraction`` (0 at ``start``, 1 at ``end``)."""
        return (
            self.start[0] + fraction * (self.end[0] - self.start[0]),
            self.start[1] + fraction * (self.end[1] - self.start[1]),
        )

    def moved(self, dx: float, dy: float, factor: float = 1.0) -> Wall:
        """The wall shifted by (dx, dy), then scaled by ``factor`` (another length unit)."""
        return Wall(
            self.label,
            ((self.start[0] + dx) * factor, (self.start[1] + dy) * factor),
            ((self.end[0] + dx) * factor, (self.end[1] + dy) * factor),
            self.thickness * factor,
            None if self.end_thickness is None else self.end_thickness * factor,
        )


@dataclass(frozen=True)
class ShapeOutline:
    """A section's outline, stress points, and torsion/warping constants, in one unit."""

    outline: Outline
    points: tuple[StressPointSpec, ...]
    torsion_constant: float | None
    torsion_note: str
    warping_constant: float | None
    warping_note: str
    walls: tuple[Wall, ...] = ()


# --- validation ------------------------------------------------------------------------


def require_positive(field: str, value: float, unit: str) -> None:
    """Raise :class:`InputError` naming ``field`` unless ``value`` is a positive length."""
    if not math.isfinite(value) or value <= 0:
        raise InputError(
            field,
            f"{value:g} {unit}",
            "a positive length, such as '12 in' or '300 mm'",
            "must be greater than zero",
        )


def require_less(field: str, value: float, limit: float, limit_text: str, unit: str) -> None:
    """Raise :class:`InputError` naming ``field`` unless ``value < limit``."""
    if not value < limit:
        raise InputError(
            field,
            f"{value:g} {unit}",
            f"less than {limit_text} ({limit:g} {unit})",
            "the section outline would not close",
        )


# --- polygons --------------------------------------------------------------------------


def _ring(points: list[tuple[float, float]]) -> NDArray[np.float64]:
    return np.array(points, dtype=float)


def _circle(center_x: float, center_y: float, radius: float, clockwise: bool = False):
    count = 4 * CHORDS_PER_QUARTER_CIRCLE * 3  # finer than corners: a whole face is curved
    angles = np.linspace(0.0, 2.0 * math.pi, count, endpoint=False)
    if clockwise:
        angles = angles[::-1]
    return np.column_stack((center_x + radius * np.cos(angles), center_y + radius * np.sin(angles)))


def _rounded_rectangle(width: float, height: float, inset: float, radius: float, clockwise=False):
    """Counter-clockwise ring of a rectangle inset by ``inset`` with corner ``radius``."""
    left, right = inset, width - inset
    bottom, top = inset, height - inset
    centers = [
        (right - radius, bottom + radius, -0.5 * math.pi),
        (right - radius, top - radius, 0.0),
        (left + radius, top - radius, 0.5 * math.pi),
        (left + radius, bottom + radius, math.pi),
    ]
    pieces = []
    for center_x, center_y, start in centers:
        if radius > 0:
            angles = start + np.linspace(0.0, 0.5 * math.pi, CHORDS_PER_QUARTER_CIRCLE + 1)
            pieces.append(
                np.column_stack(
                    (center_x + radius * np.cos(angles), center_y + radius * np.sin(angles))
                )
            )
        else:
            pieces.append(np.array([[center_x, center_y]]))
    ring = np.concatenate(pieces)
    return ring[::-1] if clockwise else ring


def _round_points(center: float, radius: float) -> tuple[StressPointSpec, ...]:
    points = []
    for index in range(POINTS_AROUND_ROUND):
        angle = 360.0 * index / POINTS_AROUND_ROUND
        radians = math.radians(angle)
        points.append(
            StressPointSpec(
                f"perimeter at {angle:g}° from +x",
                center + radius * math.cos(radians),
                center + radius * math.sin(radians),
            )
        )
    return tuple(points)


def rectangle_torsion_constant(long_side: float, short_side: float) -> float:
    """St Venant J of a solid rectangle: a·b³·(1/3 − 0.21·(b/a)·(1 − (b/a)⁴/12)).

    Source: Roark's Formulas for Stress and Strain, solid rectangle (from memory).
    """
    a, b = max(long_side, short_side), min(long_side, short_side)
    ratio = b / a
    return a * b**3 * (1.0 / 3.0 - 0.21 * ratio * (1.0 - ratio**4 / 12.0))


# --- builders --------------------------------------------------------------------------


def rectangle(width: float, depth: float, unit: str) -> ShapeOutline:
    """Solid rectangle (plate, flat bar): ``width`` horizontal, ``depth`` vertical."""
    require_positive("b", width, unit)
    require_positive("d", depth, unit)
    ring = _ring([(0, 0), (width, 0), (width, depth), (0, depth)])
    points = (
        StressPointSpec("top-left corner", 0, depth),
        StressPointSpec("top-right corner", width, depth),
        StressPointSpec("bottom-right corner", width, 0),
        StressPointSpec("bottom-left corner", 0, 0),
    )
    return ShapeOutline(
        Outline([ring]),
        points,
        rectangle_torsion_constant(width, depth),
        "computed: solid rectangle, Roark's series approximation",
        0.0,
        ZERO_WARPING,
    )


def round_bar(diameter: float, unit: str) -> ShapeOutline:
    """Solid round bar of the given diameter."""
    require_positive("D", diameter, unit)
    radius = diameter / 2
    return ShapeOutline(
        Outline([_circle(radius, radius, radius)]),
        _round_points(radius, radius),
        math.pi * diameter**4 / 32.0,
        "computed: solid circle, {J} = π·{D}⁴/32",
        0.0,
        ZERO_WARPING,
    )


def round_tube(outside_diameter: float, wall: float, unit: str) -> ShapeOutline:
    """Round HSS or pipe: outside diameter and design wall thickness."""
    require_positive("OD", outside_diameter, unit)
    require_positive("t", wall, unit)
    require_less("t", wall, outside_diameter / 2, "half the outside diameter OD/2", unit)
    radius = outside_diameter / 2
    inside = outside_diameter - 2 * wall
    rings = [_circle(radius, radius, radius), _circle(radius, radius, radius - wall, True)]
    return ShapeOutline(
        Outline(rings),
        _round_points(radius, radius),
        math.pi * (outside_diameter**4 - inside**4) / 32.0,
        "computed: circular tube, {J} = π·({OD}⁴ − {ID}⁴)/32",
        0.0,
        ZERO_WARPING,
    )


def rectangular_tube(
    height: float,
    width: float,
    wall: float,
    unit: str,
    outer_radius: float | None = None,
    inner_radius: float | None = None,
) -> ShapeOutline:
    """Rectangular or square HSS: outside corner radius 2t, inside radius t by default.

    ``outer_radius`` and ``inner_radius`` draw other corners (the EN hollow sections
    of :mod:`calcsheet.sections.metric` give their product standard's radii).
    Stress points are the corners of the bounding box, not the tangent points of
    the corner arcs: M·c/I with c to the bounding box is what the tables' S = I/c
    uses and is slightly conservative for biaxial bending.
    """
    require_positive("H", height, unit)
    require_positive("B", width, unit)
    require_positive("t", wall, unit)
    outside = 2 * wall if outer_radius is None else outer_radius
    inside = wall if inner_radius is None else inner_radius
    require_less("t", 2 * outside, min(height, width), "the smaller outside dimension", unit)
    outer = _rounded_rectangle(width, height, 0.0, outside)
    inner = _rounded_rectangle(width, height, wall, inside, clockwise=True)
    # Bredt's formula on the wall's mid-line.
    midline_radius = (outside + inside) / 2
    enclosed = (width - wall) * (height - wall) - (4 - math.pi) * midline_radius**2
    perimeter = 2 * (width - wall) + 2 * (height - wall) - (8 - 2 * math.pi) * midline_radius
    points = (
        StressPointSpec("top-left corner (bounding box)", 0, height),
        StressPointSpec("top-right corner (bounding box)", width, height),
        StressPointSpec("bottom-right corner (bounding box)", width, 0),
        StressPointSpec("bottom-left corner (bounding box)", 0, 0),
    )
    return ShapeOutline(
        Outline([outer, inner]),
        points,
        4 * enclosed**2 * wall / perimeter,
        "computed: Bredt, {J} = 4·{A_m}²·{t}/{p} on the wall mid-line "
        f"(corner radius {midline_radius / wall:g}t)",
        0.0,
        ZERO_WARPING,
    )


def i_shape(
    depth: float,
    flange_width: float,
    web: float,
    flange: float,
    unit: str,
    bottom_flange_width: float | None = None,
    bottom_flange: float | None = None,
    root_radius: float = 0.0,
) -> ShapeOutline:
    """I-shape; the bottom flange may differ from the top one (monosymmetric girder).

    ``root_radius`` draws the quarter-circle fillets of a rolled section where the
    web meets the flanges (each adds (1 − π/4)·r² of area); J and Cw stay the
    thin-walled values here, a caller with better formulas replaces them.
    """
    bottom_width = flange_width if bottom_flange_width is None else bottom_flange_width
    bottom_thickness = flange if bottom_flange is None else bottom_flange
    for field, value in (
        ("d", depth),
        ("bf", flange_width),
        ("tw", web),
        ("tf", flange),
        ("bf_bottom", bottom_width),
        ("tf_bottom", bottom_thickness),
    ):
        require_positive(field, value, unit)
    if bottom_flange is None:
        require_less("tf", flange, depth / 2, "half the depth d/2", unit)
    else:
        require_less("tf", flange + bottom_thickness, depth, "the depth d (both flanges)", unit)
    require_less("tw", web, min(flange_width, bottom_width), "the flange width bf", unit)
    width = max(flange_width, bottom_width)
    middle = width / 2
    web_left, web_right = middle - web / 2, middle + web / 2
    top_left, top_right = middle - flange_width / 2, middle + flange_width / 2
    bottom_left, bottom_right = middle - bottom_width / 2, middle + bottom_width / 2
    under_top = depth - flange
    over_bottom = bottom_thickness
    if root_radius < 0 or not math.isfinite(root_radius):
        require_positive("r", root_radius, unit)
    if root_radius > 0:
        require_less(
            "r", 2 * root_radius, min(under_top - over_bottom, width - web), "the clear web", unit
        )
    r = root_radius

    def fillet(center_x: float, center_y: float, start: float) -> list[tuple[float, float]]:
        """A concave quarter circle, turning clockwise from angle ``start``."""
        if r == 0:
            return [(center_x + r * math.cos(start), center_y + r * math.sin(start))]
        angles = start - np.linspace(0.0, 0.5 * math.pi, CHORDS_PER_QUARTER_CIRCLE + 1)
        return [(center_x + r * math.cos(a), center_y + r * math.sin(a)) for a in angles]

    half_pi = 0.5 * math.pi
    ring = _ring(
        [
            (bottom_left, 0),
            (bottom_right, 0),
            (bottom_right, over_bottom),
            *fillet(web_right + r, over_bottom + r, -half_pi),
            *fillet(web_right + r, under_top - r, math.pi),
            (top_right, under_top),
            (top_right, depth),
            (top_left, depth),
            (top_left, under_top),
            *fillet(web_left - r, under_top - r, half_pi),
            *fillet(web_left - r, over_bottom + r, 0.0),
            (bottom_left, over_bottom),
        ]
    )
    points = (
        StressPointSpec("top-left flange tip", top_left, depth),
        StressPointSpec("top-right flange tip", top_right, depth),
        StressPointSpec("bottom-right flange tip", bottom_right, 0),
        StressPointSpec("bottom-left flange tip", bottom_left, 0),
        StressPointSpec("top flange to web, left", web_left, under_top),
        StressPointSpec("top flange to web, right", web_right, under_top),
        StressPointSpec("bottom flange to web, right", web_right, over_bottom),
        StressPointSpec("bottom flange to web, left", web_left, over_bottom),
    )
    flange_distance = depth - (flange + bottom_thickness) / 2  # h0, between flange centroids
    torsion = (
        flange_width * flange**3 + bottom_width * bottom_thickness**3 + flange_distance * web**3
    ) / 3.0
    top_inertia = flange * flange_width**3 / 12.0
    bottom_inertia = bottom_thickness * bottom_width**3 / 12.0
    # Cw = h0²·I1·I2/(I1 + I2); for equal flanges this is tf·bf³·h0²/24 (AISC Design
    # Guide 9, from memory).
    warping = flange_distance**2 * top_inertia * bottom_inertia / (top_inertia + bottom_inertia)
    return ShapeOutline(
        Outline([ring]),
        points,
        torsion,
        THIN_WALLED_J,
        warping,
        THIN_WALLED_CW + ", {h_0}²·{I_1}·{I_2}/Σ{I}",
    )


def channel(
    depth: float,
    flange_width: float,
    web: float,
    flange: float,
    unit: str,
    flange_slope: float = 0.0,
):
    """Channel with the back of the web on the left and flanges pointing to +x.

    ``flange_slope`` (rise over run of the flanges' inner faces) draws the sloped
    flanges of a rolled channel; ``flange`` is then the thickness midway between the
    web face and the toe (the average thickness the shape tables give), so the
    flange's area is that of a parallel flange of that thickness.
    """
    for field, value in (("d", depth), ("bf", flange_width), ("tw", web), ("tf", flange)):
        require_positive(field, value, unit)
    require_less("tw", web, flange_width, "the flange width bf", unit)
    half_run = (flange_width - web) / 2
    at_web, at_toe = flange + flange_slope * half_run, flange - flange_slope * half_run
    require_less("tf", at_web, depth / 2, "half the depth d/2 (at the web face)", unit)
    if at_toe <= 0:
        raise InputError("tf", f"{flange:g} {unit}", "a flange that is still solid at its toe")
    ring = _ring(
        [
            (0, 0),
            (flange_width, 0),
            (flange_width, at_toe),
            (web, at_web),
            (web, depth - at_web),
            (flange_width, depth - at_toe),
            (flange_width, depth),
            (0, depth),
        ]
    )
    points = (
        StressPointSpec("back of web, top", 0, depth),
        StressPointSpec("top flange toe, outer face", flange_width, depth),
        StressPointSpec("top flange toe, inner face", flange_width, depth - at_toe),
        StressPointSpec("top flange to web, inside", web, depth - at_web),
        StressPointSpec("bottom flange to web, inside", web, at_web),
        StressPointSpec("bottom flange toe, inner face", flange_width, at_toe),
        StressPointSpec("bottom flange toe, outer face", flange_width, 0),
        StressPointSpec("back of web, bottom", 0, 0),
    )
    flange_distance = depth - flange
    flange_length = flange_width - web / 2
    torsion = (2 * flange_length * flange**3 + flange_distance * web**3) / 3.0
    # AISC Manual channel formula (from memory): Cw = tf·b'³·h0²/12 ·
    # (3·b'·tf + 2·h0·tw) / (6·b'·tf + h0·tw).
    warping = (
        flange
        * flange_length**3
        * flange_distance**2
        / 12.0
        * (3 * flange_length * flange + 2 * flange_distance * web)
        / (6 * flange_length * flange + flange_distance * web)
    )
    sloped = flange_slope != 0.0
    toe_thickness = at_toe if sloped else None
    walls = (
        Wall("web", (web / 2, at_web), (web / 2, depth - at_web), web),
        Wall(
            "top flange",
            (web, depth - at_web / 2),
            (flange_width, depth - at_toe / 2),
            at_web,
            toe_thickness,
        ),
        Wall("bottom flange", (web, at_web / 2), (flange_width, at_toe / 2), at_web, toe_thickness),
    )
    return ShapeOutline(
        Outline([ring]), points, torsion, THIN_WALLED_J, warping, THIN_WALLED_CW, walls
    )


def angle(vertical_leg: float, horizontal_leg: float, thickness: float, unit: str):
    """Angle with its heel at the lower left, legs along +y and +x."""
    require_positive("d", vertical_leg, unit)
    require_positive("b", horizontal_leg, unit)
    require_positive("t", thickness, unit)
    require_less("t", thickness, min(vertical_leg, horizontal_leg), "the shorter leg", unit)
    d, b, t = vertical_leg, horizontal_leg, thickness
    ring = _ring([(0, 0), (b, 0), (b, t), (t, t), (t, d), (0, d)])
    points = (
        StressPointSpec("heel", 0, 0),
        StressPointSpec("horizontal leg toe, outer face", b, 0),
        StressPointSpec("horizontal leg toe, inner face", b, t),
        StressPointSpec("inside corner", t, t),
        StressPointSpec("vertical leg toe, inner face", t, d),
        StressPointSpec("vertical leg toe, outer face", 0, d),
    )
    leg_d, leg_b = d - t / 2, b - t / 2
    torsion = (leg_d + leg_b) * t**3 / 3.0
    warping = t**3 * (leg_d**3 + leg_b**3) / 36.0  # AISC Manual angle formula (from memory)
    walls = (
        Wall("vertical leg", (t / 2, t), (t / 2, d), t),
        Wall("horizontal leg", (t, t / 2), (b, t / 2), t),
    )
    return ShapeOutline(
        Outline([ring]), points, torsion, THIN_WALLED_J, warping, THIN_WALLED_CW, walls
    )


def tee(depth: float, flange_width: float, stem: float, flange: float, unit: str):
    """Tee with the flange on top and the stem pointing down."""
    for field, value in (("d", depth), ("bf", flange_width), ("tw", stem), ("tf", flange)):
        require_positive(field, value, unit)
    require_less("tf", flange, depth, "the depth d", unit)
    require_less("tw", stem, flange_width, "the flange width bf", unit)
    middle = flange_width / 2
    stem_left, stem_right = middle - stem / 2, middle + stem / 2
    under = depth - flange
    ring = _ring(
        [
            (stem_left, 0),
            (stem_right, 0),
            (stem_right, under),
            (flange_width, under),
            (flange_width, depth),
            (0, depth),
            (0, under),
            (stem_left, under),
        ]
    )
    points = (
        StressPointSpec("top-left flange tip", 0, depth),
        StressPointSpec("top-right flange tip", flange_width, depth),
        StressPointSpec("right flange tip, underside", flange_width, under),
        StressPointSpec("flange to stem, right", stem_right, under),
        StressPointSpec("stem tip, right", stem_right, 0),
        StressPointSpec("stem tip, left", stem_left, 0),
        StressPointSpec("flange to stem, left", stem_left, under),
        StressPointSpec("left flange tip, underside", 0, under),
    )
    stem_length = depth - flange / 2
    torsion = (flange_width * flange**3 + stem_length * stem**3) / 3.0
    # AISC Manual tee formula (from memory): Cw = tf³·bf³/144 + tw³·d'³/36.
    warping = flange**3 * flange_width**3 / 144.0 + stem**3 * stem_length**3 / 36.0
    flange_middle = depth - flange / 2
    walls = (
        Wall("stem", (middle, 0.0), (middle, under), stem),
        Wall("left flange", (stem_left, flange_middle), (0.0, flange_middle), flange),
        Wall("right flange", (stem_right, flange_middle), (flange_width, flange_middle), flange),
    )
    return ShapeOutline(
        Outline([ring]), points, torsion, THIN_WALLED_J, warping, THIN_WALLED_CW, walls
    )


@dataclass(frozen=True)
class PlateSpec:
    """One rectangle of a built-up section: size and lower-left corner, in one unit."""

    width: float
    depth: float
    left: float
    bottom: float


def built_up(plates: list[PlateSpec], unit: str) -> ShapeOutline:
    """Rectangles welded together; they may touch but must not overlap.

    J is the sum of each plate's own J (open section, conservative when the plates
    form a closed cell); Cw is not computed.
    """
    if not plates:
        raise InputError("plates", "[]", "at least one rectangle", "nothing to build")
    for index, plate in enumerate(plates, start=1):
        require_positive(f"plate {index} width", plate.width, unit)
        require_positive(f"plate {index} depth", plate.depth, unit)
    for first in range(len(plates)):
        for second in range(first + 1, len(plates)):
            a, b = plates[first], plates[second]
            overlap_x = min(a.left + a.width, b.left + b.width) - max(a.left, b.left)
            overlap_y = min(a.bottom + a.depth, b.bottom + b.depth) - max(a.bottom, b.bottom)
            tolerance = 1e-9 * max(a.width, a.depth, b.width, b.depth)
            if overlap_x > tolerance and overlap_y > tolerance:
                raise InputError(
                    f"plate {second + 1}",
                    f"{b.width:g} x {b.depth:g} {unit} at ({b.left:g}, {b.bottom:g})",
                    "rectangles that touch at most along an edge",
                    f"overlaps plate {first + 1}",
                )
    left = min(plate.left for plate in plates)
    bottom = min(plate.bottom for plate in plates)
    rings, points = [], []
    for index, plate in enumerate(plates, start=1):
        x0, y0 = plate.left - left, plate.bottom - bottom
        x1, y1 = x0 + plate.width, y0 + plate.depth
        rings.append(_ring([(x0, y0), (x1, y0), (x1, y1), (x0, y1)]))
        points += [
            StressPointSpec(f"plate {index}, top-left corner", x0, y1),
            StressPointSpec(f"plate {index}, top-right corner", x1, y1),
            StressPointSpec(f"plate {index}, bottom-right corner", x1, y0),
            StressPointSpec(f"plate {index}, bottom-left corner", x0, y0),
        ]
    torsion = sum(rectangle_torsion_constant(p.width, p.depth) for p in plates)
    return ShapeOutline(
        Outline(rings),
        tuple(points),
        torsion,
        "computed: sum of the plates' own J (open section)",
        None,
        "not computed for built-up sections",
    )
