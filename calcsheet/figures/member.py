"""The member in elevation (y-z plane) with its loads and supports, and an end view (x-y plane).

A cantilever fixed at z = 0 is drawn with a hatched wall at its support; any other
member with a symbol of our own at each support: a fixed end as a hatched wall
(a hatched block inside the member's length), a pin as a triangle on a hatched
base, a roller as a triangle on two wheels, any other set of restraints as a
plain square. Distributed loads are drawn as a row of arrows between their ends
over an outline of their intensity, named with their values.

The elevation is to scale along z. When the member depth and the load offsets
would be too thin to read at that scale, the vertical scale alone is enlarged by
a round factor and the figure says so ("vertical scale ×N"); forces are always
drawn at their true angle in the y-z plane. The end view, seen from the free end
(x right, y up, as the section is drawn everywhere), is to one scale in x and y
and shows where each load acts relative to the centroid.

In the elevation z runs to the right and y up, so +x points into the page: a
force with no y or z component is drawn as ⊗ (+x) or ⊙ (−x).
"""

from __future__ import annotations

import math
from collections.abc import Sequence

import numpy as np
import pint

from calcsheet.engine.marked_text import MarkedText, escape_marks
from calcsheet.figures.annotate import (
    Frame,
    arrow,
    arrowhead,
    axis_label,
    centre_line,
    centroid_mark,
    linear_dimension,
    quantity_text,
    unit_vector,
)
from calcsheet.figures.labels import Box, Obstacles, place_label, text_box
from calcsheet.figures.style import (
    FONT_SIZE,
    INK,
    MATERIAL,
    NOTE,
    OUTLINE_WIDTH,
    PAPER,
    SMALL_FONT_SIZE,
    THIN,
)
from calcsheet.figures.svg import Point, Svg, text_width
from calcsheet.mechanics.distributed import DistributedLoad
from calcsheet.mechanics.loads import AppliedMoment, PointLoad
from calcsheet.mechanics.supports import FIXED, PINNED, ROLLER, Support
from calcsheet.sections import Section
from calcsheet.units import Quantity, parse_quantity

ELEVATION_LENGTH = 320.0  # px for the member length (the whole figure fits a page at 1:1)
MAX_HALF_HEIGHT = 90.0  # px above or below the member axis, at most
MIN_DEPTH = 22.0  # px: a thinner member gets an enlarged vertical scale
END_VIEW_HALF = 60.0  # px from the centroid to the furthest thing in the end view
FORCE_ARROW = 56.0  # px, elevation force arrows (their length is not to any scale)
END_VIEW_ARROW = 34.0
ROW_SPACING = 20.0  # px between rows of z dimensions
LUG_HALF_WIDTH = 4.0
EXAGGERATIONS = (2, 5, 10, 20, 50, 100, 200, 500, 1000)

QuantityInput = pint.Quantity | str


def member_figure(
    length: QuantityInput,
    station: QuantityInput,
    loads: Sequence[PointLoad],
    *,
    depth: QuantityInput | None = None,
    section: Section | None = None,
    moments: Sequence[AppliedMoment] = (),
    unit: str = "in",
    supports: Sequence[Support] = (),
    distributed: Sequence[DistributedLoad] = (),
    braces: Sequence[pint.Quantity] = (),
) -> str:
    """SVG of the cantilever: support at z = 0, free end at z = L, the cut at ``station``.

    Give the member ``depth`` or its ``section`` (the depth is then the
    section's, and the end view shows its outline). Every point load is an arrow
    at its true angle at its z and e_y (on a lug when it acts outside the depth),
    with e_y dimensioned; ``moments`` are curved arrows (Mx) with their
    components written beside them. Lengths are written in ``unit``. ``supports``
    (none: a cantilever fixed at z = 0) are drawn with their symbols and
    ``distributed`` loads as rows of arrows, ``braces`` (brace points) as crosses
    below the member.
    """
    member_length = parse_quantity(length, field="member length", dimension="length").to(unit)
    cut = parse_quantity(station, field="station", dimension="length").to(unit)
    if depth is not None:
        member_depth = parse_quantity(depth, field="depth", dimension="length").to(unit)
    elif section is not None:
        extent = section.outline.y_max - section.outline.y_min
        member_depth = Quantity(extent, section.length_unit).to(unit)
    else:
        raise TypeError("member_figure needs the member depth or its section")
    L, d = float(member_length.m), float(member_depth.m)
    placed = [_PlacedLoad.of(load, unit) for load in loads]

    frame, factor = _elevation_frame(L, d, placed)
    svg = Svg(title="Member elevation and end view")
    obstacles = Obstacles()
    cantilever = not supports or (
        len(supports) == 1 and supports[0].restrains == FIXED and supports[0].z.m == 0
    )
    _draw_member(svg, obstacles, frame, L, d, wall=cantilever)
    if not cantilever:
        for item in supports:
            _draw_support(svg, obstacles, frame, item, L, d, unit)
    for point in braces:
        _draw_brace(svg, obstacles, frame, float(point.to(unit).m), d)
    # Every row of arrows first, then their names, so no name lands on a later row.
    named = [
        _draw_distributed(svg, obstacles, frame, load, d, number, unit)
        for number, load in enumerate(distributed)
    ]
    for at, text in named:
        center, _ = place_label(obstacles, at, (1.0, 0.0), text, size=SMALL_FONT_SIZE, gap=4)
        svg.text(center, text, size=SMALL_FONT_SIZE, css_class="distributed-label")
    dimensioned: set[tuple[float, float]] = set()
    for number, load in enumerate(placed):
        # Loads sharing a point (a bracket and the wind on it) share one e_y dimension.
        first_at_point = (load.z, load.ey) not in dimensioned
        dimensioned.add((load.z, load.ey))
        _draw_load(svg, obstacles, frame, (L, d), load, number, unit, first_at_point)
    for moment in moments:
        _draw_moment(svg, obstacles, frame, moment, unit)
    _draw_station(svg, obstacles, frame, float(cut.m), d, unit)
    extra_rows = [
        (
            float(item.z.to(unit).m),
            MarkedText(
                f"{escape_marks(drawn_name(item.name))}: {{z}} = {quantity_text(item.z.to(unit))}"
            ),
        )
        for item in ([] if cantilever else supports)
    ]
    _draw_z_dimensions(svg, obstacles, frame, L, d, float(cut.m), placed, unit, extra_rows)
    elevation_left, elevation_right = svg.x_min, svg.x_max
    _draw_triad(svg, obstacles, (elevation_left + 8, svg.y_max + 34))

    notes = ["Elevation (y-z plane); forces at their true angle, arrow lengths not to scale"]
    if factor > 1:
        notes.append(f"vertical scale ×{factor}: depth and offsets enlarged, z to scale")
    if braces:
        notes.append("× brace point (lateral restraint)")
    if any(load.in_page == 0 for load in placed):
        notes.append("⊗ force along +x (into the page), ⊙ along −x")
    bottom = svg.y_max + 8
    for number, note in enumerate(notes):
        at = (elevation_left, bottom + (number + 0.5) * (SMALL_FONT_SIZE + 4))
        svg.text(at, note, size=SMALL_FONT_SIZE, anchor="start", fill=NOTE, css_class="note")

    _draw_end_view(svg, elevation_right + 50, d, placed, section, unit)
    return svg.render()


# A load's name in the drawing is cut to this many characters (the sheet's load
# headings give it whole): a long name would reach across the other view.
LABEL_CHARACTERS = 28


def drawn_name(name: str) -> str:
    """A load's name as the drawing labels it: whole, or cut with an ellipsis."""
    name = " ".join(name.split())
    if len(name) <= LABEL_CHARACTERS:
        return name
    return name[: LABEL_CHARACTERS - 1].rstrip(" ,;:") + "…"


class _PlacedLoad:
    """A point load's numbers in the figure's length unit, and its in-plane directions."""

    def __init__(self, load: PointLoad, unit: str) -> None:
        self.name = drawn_name(load.name)
        self.z = float(load.z.to(unit).m)
        self.ex = float(load.ex.to(unit).m)
        self.ey = float(load.ey.to(unit).m)
        force_unit = load.magnitude.units
        fx, fy, fz = (float(load.component(axis).to(force_unit).m) for axis in "xyz")
        size = float(load.magnitude.m)
        self.label = f"{self.name} = {quantity_text(load.magnitude)}"
        in_plane = math.hypot(fy, fz)
        # Paper directions (y down): elevation (z, y) and end view (x, y).
        self.elevation = (fz / in_plane, -fy / in_plane) if in_plane > 1e-9 * size else None
        across = math.hypot(fx, fy)
        self.end_view = (fx / across, -fy / across) if across > 1e-9 * size else None
        self.in_page = 0 if self.elevation is None else 1
        self.sign_x = 1.0 if fx > 0 else -1.0

    @classmethod
    def of(cls, load: PointLoad, unit: str) -> _PlacedLoad:
        """The load placed in ``unit``."""
        return cls(load, unit)


def _elevation_frame(L: float, d: float, loads: Sequence[_PlacedLoad]) -> tuple[Frame, int]:
    """The scale along z, and the round factor by which y is enlarged (1 when it is not)."""
    scale = ELEVATION_LENGTH / L
    reach = max([d / 2, *(abs(load.ey) for load in loads)])
    if reach * scale > MAX_HALF_HEIGHT:  # a deep, short member: shrink both scales
        scale = MAX_HALF_HEIGHT / reach
    factor = 1
    if d * scale < MIN_DEPTH:
        needed = MIN_DEPTH / (d * scale)
        allowed = MAX_HALF_HEIGHT / (reach * scale)
        factor = next((f for f in EXAGGERATIONS if f >= needed), EXAGGERATIONS[-1])
        while factor > 1 and factor > allowed:  # keep far lugs on the paper
            smaller = [f for f in EXAGGERATIONS if f < factor]
            factor = smaller[-1] if smaller else 1
    return Frame(scale, y_scale=scale * factor), factor


def _draw_member(
    svg: Svg, obstacles: Obstacles, frame: Frame, L: float, d: float, *, wall: bool = True
) -> None:
    """The member as a band of its depth, the fixed support hatched (a cantilever), the axis."""
    band = np.array([(0.0, -d / 2), (L, -d / 2), (L, d / 2), (0.0, d / 2)])
    paper = frame.ring(band)
    svg.rings([paper.tolist()], fill=MATERIAL, width=OUTLINE_WIDTH, css_class="member")
    obstacles.add_region([paper])
    if not wall:
        end_x = frame.point(L, 0)[0]
        centre_line(svg, None, (-6, 0), (end_x + 18, 0))
        return
    top, bottom = frame.point(0, d / 2)[1], frame.point(0, -d / 2)[1]
    wall_top, wall_bottom = top - 14, bottom + 14
    svg.line((0, wall_top), (0, wall_bottom), width=2.2, css_class="support")
    obstacles.add_box(Box(-9, wall_top, 0, wall_bottom))
    y = wall_top
    while y < wall_bottom:  # hatching on the support side
        end = min(y + 7, wall_bottom)
        svg.line((0, y), (-(end - y), end), width=THIN)
        y += 5
    end_x = frame.point(L, 0)[0]
    centre_line(svg, None, (-6, 0), (end_x + 18, 0))


def _shaft_in_member(start: Point, end: Point, frame: Frame, d: float, L: float) -> int:
    """How many of 21 points along a shaft fall inside the member band (to choose a side)."""
    left, top = frame.point(0, d / 2)
    right, bottom = frame.point(L, -d / 2)
    inside = 0
    for t in np.linspace(0.0, 1.0, 21):
        x, y = start[0] + t * (end[0] - start[0]), start[1] + t * (end[1] - start[1])
        inside += int(left + 0.5 < x < right - 0.5 and top + 0.5 < y < bottom - 0.5)
    return inside


def _draw_load(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    size: tuple[float, float],
    load: _PlacedLoad,
    number: int,
    unit: str,
    dimension_ey: bool = True,
) -> None:
    """Lug (when outside the depth), force arrow at its true angle, name, e_y dimension.

    The arrow starts at the point (a pull) or ends there (a push), whichever
    keeps more of it off the member, so it never hides the member or the lug.
    """
    L, d = size
    at = frame.point(load.z, load.ey)
    if abs(load.ey) > d / 2:
        face = frame.point(load.z, math.copysign(d / 2, load.ey))
        beyond = at[1] + math.copysign(6.0, at[1] - face[1])
        lug = [
            (at[0] - LUG_HALF_WIDTH, face[1]),
            (at[0] + LUG_HALF_WIDTH, face[1]),
            (at[0] + LUG_HALF_WIDTH, beyond),
            (at[0] - LUG_HALF_WIDTH, beyond),
        ]
        svg.rings([lug], fill=MATERIAL, width=1.0, css_class="lug")
        obstacles.add_region([np.array(lug)])
        svg.circle(at, 1.8, fill=PAPER, stroke=INK, width=0.8)
    else:
        svg.circle(at, 2.2, fill=INK)
    if load.elevation is None:
        # Along x only: the tail or the tip of the arrow, seen end on.
        svg.circle(at, 6.5, fill=PAPER, stroke=INK, width=1.4, css_class="load-along-x")
        if load.sign_x > 0:
            for sx, sy in ((1, 1), (1, -1)):
                svg.line((at[0] - 4.6 * sx, at[1] - 4.6 * sy), (at[0] + 4.6 * sx, at[1] + 4.6 * sy))
        else:
            svg.circle(at, 1.8, fill=INK)
        obstacles.add_box(Box(at[0] - 7, at[1] - 7, at[0] + 7, at[1] + 7))
        free_end, direction = at, (0.7, -0.7)
    else:
        ux, uy = load.elevation
        pull = (at[0] + ux * FORCE_ARROW, at[1] + uy * FORCE_ARROW)  # tail at the point
        push = (at[0] - ux * FORCE_ARROW, at[1] - uy * FORCE_ARROW)  # tip at the point
        if _shaft_in_member(at, pull, frame, d, L) < _shaft_in_member(push, at, frame, d, L):
            arrow(svg, at, pull, width=1.8, css_class="load-arrow")
            free_end, direction = pull, (ux, uy)
            obstacles.add_line(at, pull)
        else:
            arrow(svg, push, at, width=1.8, css_class="load-arrow")
            free_end, direction = push, (-ux, -uy)
            obstacles.add_line(push, at)
    center, _ = place_label(obstacles, free_end, direction, load.label, size=SMALL_FONT_SIZE)
    svg.text(center, load.label, size=SMALL_FONT_SIZE, bold=True, css_class="load-label")
    if load.ey != 0 and dimension_ey:
        axis_point = frame.point(load.z, 0.0)
        line_x = at[0] - 12 - 10 * number
        linear_dimension(
            svg,
            obstacles,
            (axis_point, at),
            ((line_x, axis_point[1]), (line_x, at[1])),
            MarkedText(f"{{e_y}} = {quantity_text(Quantity(load.ey, unit))}"),
            text_toward=(-1.0, 0.0),
        )


def _draw_moment(
    svg: Svg, obstacles: Obstacles, frame: Frame, moment: AppliedMoment, unit: str
) -> None:
    """A curved arrow for Mx (clockwise when positive: +x points into the page), and its text."""
    z = float(moment.z.to(unit).m)
    center = frame.point(z, 0.0)
    radius = 14.0
    mx = float(moment.Mx.m)
    if mx != 0:
        clockwise = mx > 0
        start_angle, sweep = math.radians(200), math.radians(280)
        direction = 1 if clockwise else -1
        points = [
            (
                center[0] + radius * math.cos(start_angle + direction * t),
                center[1] + radius * math.sin(start_angle + direction * t),
            )
            for t in np.linspace(0.0, sweep, 29)
        ]
        svg.polyline(points, width=1.5)
        end_angle = start_angle + direction * sweep
        tangent = (-math.sin(end_angle) * direction, math.cos(end_angle) * direction)
        arrowhead(svg, points[-1], tangent, length=8, half_width=3.2)
        obstacles.add_box(
            Box(center[0] - radius, center[1] - radius, center[0] + radius, center[1] + radius)
        )
    parts = [
        f"{{{name}}} = {quantity_text(value)}"
        for name, value in (("M_x", moment.Mx), ("M_y", moment.My), ("M_z", moment.Mz))
        if value.m != 0
    ]
    text = MarkedText(f"{escape_marks(drawn_name(moment.name))}: {', '.join(parts) or '0'}")
    at, _ = place_label(obstacles, center, (0.0, -1.0), text, size=SMALL_FONT_SIZE, gap=radius)
    svg.text(at, text, size=SMALL_FONT_SIZE, css_class="moment-label")


def _draw_station(
    svg: Svg, obstacles: Obstacles, frame: Frame, z: float, d: float, unit: str
) -> None:
    """The cut as a dashed line across the member and beyond, named at its top."""
    x = frame.point(z, 0)[0]
    top = min(svg.y_min, frame.point(0, d / 2)[1]) - 6
    bottom = frame.point(0, -d / 2)[1] + 18
    svg.line((x, top), (x, bottom), width=1.2, dash="6 3", css_class="station")
    obstacles.add_line((x, top), (x, bottom))
    # A cut at the support has no dimension row to say where it is, so its label does.
    name = MarkedText(
        "cut" if z > 0 else f"cut at the support, {{z_s}} = {quantity_text(Quantity(0.0, unit))}"
    )
    upward = (0.0, -1.0) if z > 0 else (0.6, -0.8)  # at the support: off to the right
    center, _ = place_label(obstacles, (x, top), upward, name, size=SMALL_FONT_SIZE)
    svg.text(center, name, size=SMALL_FONT_SIZE, bold=True)


def _draw_z_dimensions(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    L: float,
    d: float,
    station: float,
    loads: Sequence[_PlacedLoad],
    unit: str,
    extra: Sequence[tuple[float, str]] = (),
) -> None:
    """Baseline dimensions from z = 0: the cut, each load and support position, the length."""
    rows: list[tuple[float, str]] = [(z, text) for z, text in extra if 0 < z < L]
    if station > 0:
        rows.append((station, MarkedText(f"{{z_s}} = {quantity_text(Quantity(station, unit))}")))
    positions: dict[float, list[str]] = {}
    for load in loads:
        if 0 < load.z < L and not math.isclose(load.z, station):
            positions.setdefault(load.z, []).append(escape_marks(drawn_name(load.name)))
    for z in sorted(positions):
        names = ", ".join(positions[z])
        rows.append((z, MarkedText(f"{names}: {{z}} = {quantity_text(Quantity(z, unit))}")))
    rows.append((L, MarkedText(f"{{L}} = {quantity_text(Quantity(L, unit))}")))
    rows.sort(key=lambda row: row[0])
    base = frame.point(0, -d / 2)
    first_row = svg.y_max + 18
    for number, (z, text) in enumerate(rows):
        y = first_row + number * ROW_SPACING
        end = frame.point(z, -d / 2)
        linear_dimension(svg, obstacles, (base, end), ((base[0], y), (end[0], y)), text)


def _draw_triad(svg: Svg, obstacles: Obstacles, origin: Point) -> None:
    """Small axes: z to the right, y up (x into the page)."""
    for tip, name in (((origin[0] + 26, origin[1]), "z"), ((origin[0], origin[1] - 26), "y")):
        arrow(svg, origin, tip, width=1.0, head=0.7)
        axis_label(svg, obstacles, tip, unit_vector(origin, tip), name)
    svg.circle(origin, 4.0, fill=PAPER, stroke=INK, width=1.0)
    for sx, sy in ((1, 1), (1, -1)):  # ⊗: x into the page
        svg.line(
            (origin[0] - 2.8 * sx, origin[1] - 2.8 * sy),
            (origin[0] + 2.8 * sx, origin[1] + 2.8 * sy),
            width=0.8,
        )
    axis_label(svg, obstacles, (origin[0] - 4, origin[1] + 4), (-0.7, 0.7), "x")


def _draw_end_view(
    svg: Svg,
    left: float,
    d: float,
    loads: Sequence[_PlacedLoad],
    section: Section | None,
    unit: str,
) -> None:
    """The section seen from the free end, with each load's point of action and e_x, e_y."""
    obstacles = Obstacles()
    # Labels of the end view must not reach back over the elevation on its left.
    obstacles.add_box(Box(-1e6, -1e6, left - 4, 1e6))
    rings = []
    if section is not None:
        factor = float(Quantity(1.0, section.length_unit).to(unit).m)
        rings = [ring * factor for ring in section.outline.rings]
    extent = [d / 2]
    for ring in rings:
        extent.append(float(np.abs(ring).max()))
    for load in loads:
        extent += [abs(load.ex), abs(load.ey)]
    scale = END_VIEW_HALF / max(extent)
    frame = Frame(scale, origin=(left + END_VIEW_HALF + 10, 0.0))
    if rings:
        paper = [frame.ring(ring) for ring in rings]
        svg.rings([ring.tolist() for ring in paper], fill=MATERIAL, width=OUTLINE_WIDTH)
        obstacles.add_region(paper)
    else:  # the depth alone: top and bottom faces
        for y in (d / 2, -d / 2):
            a, b = frame.point(-d / 2, y), frame.point(d / 2, y)
            svg.line(a, b, width=OUTLINE_WIDTH, dash="5 3")
            obstacles.add_line(a, b)
    origin = frame.point(0, 0)
    reach = END_VIEW_HALF + 12
    x_end, y_end = (origin[0] + reach, origin[1]), (origin[0], origin[1] - reach)
    centre_line(svg, obstacles, (origin[0] - reach, origin[1]), x_end)
    centre_line(svg, obstacles, (origin[0], origin[1] + reach), y_end)
    axis_label(svg, obstacles, x_end, (1.0, 0.0), "x")
    axis_label(svg, obstacles, y_end, (0.0, -1.0), "y")
    centroid_mark(svg, origin)
    for load in loads:
        at = frame.point(load.ex, load.ey)
        svg.circle(at, 2.6, fill=INK, css_class="end-view-load")
        obstacles.add_box(Box(at[0] - 3, at[1] - 3, at[0] + 3, at[1] + 3))
        if load.end_view is not None:
            tip = (
                at[0] + load.end_view[0] * END_VIEW_ARROW,
                at[1] + load.end_view[1] * END_VIEW_ARROW,
            )
            arrow(svg, at, tip, width=1.3, head=0.8)
            obstacles.add_line(at, tip)
    # One set of dimensions and one label per point of application, however many loads act there.
    names_at: dict[tuple[float, float], list[str]] = {}
    for load in loads:
        names_at.setdefault((load.ex, load.ey), []).append(drawn_name(load.name))
    for ex, ey in names_at:
        at = frame.point(ex, ey)
        if ex != 0:
            foot = frame.point(0.0, ey)
            text = MarkedText(f"{{e_x}} = {quantity_text(Quantity(ex, unit))}")
            linear_dimension(svg, obstacles, (foot, at), (foot, at), text, text_toward=(0.0, -1.0))
        if ey != 0:
            foot = frame.point(ex, 0.0)
            text = MarkedText(f"{{e_y}} = {quantity_text(Quantity(ey, unit))}")
            linear_dimension(svg, obstacles, (foot, at), (foot, at), text, text_toward=(1.0, 0.0))
    title_y = origin[1] - reach - 16 - FONT_SIZE
    title = "End view from the free end"
    svg.text((origin[0], title_y), title, size=SMALL_FONT_SIZE, fill=NOTE)
    obstacles.add_box(text_box((origin[0], title_y), title, SMALL_FONT_SIZE))
    centroid = frame.point(0, 0)
    for (ex, ey), names in names_at.items():
        at = frame.point(ex, ey)
        away = unit_vector(centroid, at)
        label = ", ".join(names)
        center, _ = place_label(obstacles, at, away if away != (0.0, 0.0) else (-0.7, 0.7), label)
        svg.text(center, label, size=FONT_SIZE, bold=True)


SUPPORT_SIZE = 11.0  # px, the height of a support symbol below the member


def _draw_support(
    svg: Svg, obstacles: Obstacles, frame: Frame, item: Support, L: float, d: float, unit: str
) -> None:
    """A support's symbol at its station, below the member (a wall at a fixed end)."""
    z = float(item.z.to(unit).m)
    x, bottom = frame.point(z, -d / 2)
    top = frame.point(z, d / 2)[1]
    size = SUPPORT_SIZE
    if item.restrains == FIXED:
        if math.isclose(z, 0.0, abs_tol=1e-9 * L) or math.isclose(z, L, rel_tol=1e-9):
            side = -1.0 if z < L / 2 else 1.0  # the wall on the outside of the end
            svg.line((x, top - 14), (x, bottom + 14), width=2.2, css_class="support")
            y = top - 14
            while y < bottom + 14:
                end = min(y + 7, bottom + 14)
                svg.line((x, y), (x + side * (end - y), end), width=THIN)
                y += 5
            obstacles.add_box(
                Box(min(x, x + side * 9), top - 14, max(x, x + side * 9), bottom + 14)
            )
        else:
            block = [(x - 6, top - 8), (x + 6, top - 8), (x + 6, bottom + 8), (x - 6, bottom + 8)]
            svg.rings([block], fill=PAPER, width=1.6, css_class="support")
            for offset in (-6.0, 0.0, 6.0):
                svg.line((x - 6, bottom + 2 + offset), (x + 6, bottom - 10 + offset), width=THIN)
            obstacles.add_box(Box(x - 6, top - 8, x + 6, bottom + 8))
    else:
        apex = (x, bottom)
        base_y = bottom + size
        triangle = [apex, (x - size * 0.7, base_y), (x + size * 0.7, base_y)]
        if item.restrains in (PINNED, ROLLER):
            svg.polygon(triangle, fill=PAPER, stroke=INK, width=1.4)
        else:
            square = [(x - 5, bottom), (x + 5, bottom), (x + 5, bottom + 10), (x - 5, bottom + 10)]
            svg.polygon(square, fill=PAPER, stroke=INK, width=1.4)
            base_y = bottom + 10
        ground = base_y
        if item.restrains == ROLLER:
            for dx in (-4.0, 4.0):
                svg.circle((x + dx, base_y + 3), 2.6, fill=PAPER, stroke=INK, width=1.0)
            ground = base_y + 6
        svg.line((x - size, ground), (x + size, ground), width=1.4, css_class="support")
        for hatch in np.linspace(x - size, x + size - 4, 5):
            svg.line((hatch + 4, ground), (hatch, ground + 4), width=THIN)
        obstacles.add_box(Box(x - size, bottom, x + size, ground + 4))
    label_at = (x, bottom + size + 14)
    svg.text(label_at, item.name, size=SMALL_FONT_SIZE, bold=True, css_class="support-label")
    half = text_width(item.name, SMALL_FONT_SIZE) / 2 + 1
    obstacles.add_box(
        Box(x - half, label_at[1] - SMALL_FONT_SIZE, x + half, label_at[1] + SMALL_FONT_SIZE / 2)
    )


def _draw_distributed(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    load: DistributedLoad,
    d: float,
    number: int,
    unit: str,
) -> tuple[Point, str]:
    """A row of arrows from the load's outline down to the member's top, one row above
    the other; returns where its name goes (beside the row's end) and the name."""
    a = float(load.z_start.to(unit).m)
    b = float(load.z_end.to(unit).m)
    unit_q = load.q_start[0].units
    start = [float(value.to(unit_q).m) for value in load.q_start]
    end = [float(value.to(unit_q).m) for value in load.q_end]
    biggest = max(max(abs(value) for value in start), max(abs(value) for value in end), 1e-300)
    top = frame.point(0, d / 2)[1] - 4 - number * 34
    height = 22.0

    def size_at(t: float) -> float:
        values = [first + t * (last - first) for first, last in zip(start, end, strict=True)]
        return math.sqrt(sum(value * value for value in values)) / biggest

    left, right = frame.point(a, 0)[0], frame.point(b, 0)[0]
    count = max(2, int((right - left) / 18) + 1)
    # The arrows' direction in the elevation (z right, y up on paper): a load along the
    # member axis (a column's self-weight) is a row of arrows along z; one along x only
    # a row of ⊗ (+x) or ⊙ (−x).
    reference = start if any(start) else end
    across = math.hypot(reference[2], reference[1])
    direction = (reference[2] / across, -reference[1] / across) if across > 0 else None
    outline = []
    for t in np.linspace(0.0, 1.0, count):
        x = left + t * (right - left)
        reach = 6 + height * size_at(float(t))
        tail = top - reach
        outline.append((x, tail))
        if reach < 9:
            continue
        if direction is None:
            centre = (x, top - 8)
            svg.circle(centre, 3.5, fill=PAPER, stroke=INK, width=1.0)
            if reference[0] < 0:
                svg.circle(centre, 1.0, fill=INK)
            else:
                svg.line((x - 2.4, top - 10.4), (x + 2.4, top - 5.6), width=0.8)
                svg.line((x - 2.4, top - 5.6), (x + 2.4, top - 10.4), width=0.8)
            continue
        ux, uy = direction
        if uy >= 0.3:  # toward the member: the tip on its top face
            arrow(svg, (x - ux * reach, top - uy * reach), (x, top), width=1.0,
                  css_class="distributed-arrow")  # fmt: skip
        elif uy <= -0.3:  # away from the member: the tail on its top face
            arrow(svg, (x, top), (x + ux * reach, top + uy * reach), width=1.0,
                  css_class="distributed-arrow")  # fmt: skip
        else:  # along the member: short arrows above it
            half = 6.0 * ux
            arrow(svg, (x - half, top - 8), (x + half, top - 8 + 6.0 * uy), width=1.0,
                  css_class="distributed-arrow")  # fmt: skip
    if direction is not None and abs(direction[1]) >= 0.3:  # the intensity across the member
        svg.polyline(outline, width=1.2)
    else:
        outline = [(left, top - 14), (right, top - 14)]
    obstacles.add_box(Box(left, min(y for _, y in outline), right, top))
    parts = []
    for axis, first, last in zip("xyz", load.q_start, load.q_end, strict=True):
        if first.m == 0 and last.to(unit_q).m == 0:
            continue
        if math.isclose(float(first.to(unit_q).m), float(last.to(unit_q).m)):
            parts.append(f"{{q_{axis}}} = {quantity_text(first)}")
        else:
            shown = f"{quantity_text(first)} to {quantity_text(last.to(unit_q))}"
            parts.append(f"{{q_{axis}}} = {shown}")
    return (
        right,
        (top + min(y for _, y in outline)) / 2,
    ), MarkedText(f"{escape_marks(drawn_name(load.name))}: {', '.join(parts)}")


def _draw_brace(svg: Svg, obstacles: Obstacles, frame: Frame, z: float, d: float) -> None:
    """A brace point: a cross on a short stem below the member's bottom face."""
    x, bottom = frame.point(z, -d / 2)
    stem_end = bottom + 9
    svg.line((x, bottom), (x, stem_end), width=1.0, css_class="brace")
    for dx in (-3.5, 3.5):
        svg.line((x - dx, stem_end - 3.5), (x + dx, stem_end + 3.5), width=1.4, css_class="brace")
    obstacles.add_box(Box(x - 4, bottom, x + 4, stem_end + 4))
