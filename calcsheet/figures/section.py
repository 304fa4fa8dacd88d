"""The cross-section drawn to scale: outline, centroidal axes, dimensions, stress points.

One scale for x and y, so the drawing's proportions are the section's. The
overall depth is dimensioned on the left and the width (or the diameter) below;
wall, flange and web thicknesses are dimensioned where the section's family
says where they are. Stress points are dots with short labels placed outside
the material, pushed outward from the centroid and clear of each other.
"""

from __future__ import annotations

import math
from collections.abc import Sequence

import numpy as np

from calcsheet.engine.marked_text import MarkedText
from calcsheet.figures.annotate import (
    Frame,
    axis_label,
    centre_line,
    centroid_mark,
    extension_line,
    linear_dimension,
    quantity_text,
    thickness_dimension,
    unit_vector,
)
from calcsheet.figures.labels import Box, Obstacles, place_label
from calcsheet.figures.style import (
    FONT_SIZE,
    INK,
    MATERIAL,
    OUTLINE_WIDTH,
)
from calcsheet.figures.svg import Point, Svg
from calcsheet.sections import Section
from calcsheet.units import Quantity

DRAWING_SIZE = 230.0  # px taken by the larger of the section's width and depth
AXIS_OVERRUN = 16.0  # px the centroidal axes run past the outline
DIMENSION_OFFSET = 30.0  # px from the outline to an overall dimension line

I_SHAPES = {"W", "M", "S", "HP", "IPE", "HEA", "HEB", "HEM", "I-shape"}
CHANNELS = {"C", "MC", "channel"}
TEES = {"WT", "MT", "ST", "tee"}
ANGLES = {"L", "angle"}
RECTANGULAR_TUBES = {"HSS_RECT", "rectangular HSS"}
ROUND_TUBES = {"HSS_ROUND", "PIPE", "round HSS"}
ROUND = ROUND_TUBES | {"round bar"}

# Names a dimension goes by on the figure, in order of preference; the tables' design
# wall "tdes" and rectangular HSS height "Ht" print as the usual t and H.
_DEPTH_NAMES = ("d", "Ht", "H", "OD", "D")
_WIDTH_NAMES = ("bf", "bf_bottom", "B", "b", "OD", "D")
# Each dimension as the figure writes it: a symbol as the sheet's inputs set it (b_f,
# t_w), OD as the tables write it.
_SHOWN_AS = {
    "Ht": "{H}", "tdes": "{t}", "bf": "{b_f}", "bf_bottom": "{b_f_bottom}", "tf": "{t_f}",
    "tf_bottom": "{t_f_bottom}", "tw": "{t_w}", "d": "{d}", "H": "{H}", "B": "{B}", "b": "{b}",
    "D": "{D}", "t": "{t}",
}  # fmt: skip


def section_figure(
    section: Section,
    points: Sequence[tuple[str, float, float]] | None = None,
    *,
    unit: str | None = None,
) -> str:
    """SVG of ``section`` to scale with its centroidal axes, dimensions and stress points.

    ``points`` are (label, x, y) measured from the centroid in ``unit``; by
    default the section's own stress points, numbered 1, 2, ... in their order.
    ``unit`` (default: the section's length unit) is also the unit in which the
    dimensions are written.
    """
    unit = unit or section.length_unit
    to_section = float(Quantity(1.0, unit).to(section.length_unit).magnitude)
    outline = section.outline
    frame = Frame(DRAWING_SIZE / max(outline.x_max - outline.x_min, outline.y_max - outline.y_min))
    svg = Svg(title=f"Section {section.name}")
    obstacles = Obstacles()

    rings = [frame.ring(ring) for ring in outline.rings]
    svg.rings(
        [ring.tolist() for ring in rings], fill=MATERIAL, width=OUTLINE_WIDTH, css_class="outline"
    )
    obstacles.add_region(rings)
    _draw_axes(svg, obstacles, frame, section)
    _draw_overall_dimensions(svg, obstacles, frame, section, unit)
    _draw_thicknesses(svg, obstacles, frame, section, unit)

    if points is None:
        chosen = [
            (
                str(number),
                float(p.x.to(section.length_unit).m),
                float(p.y.to(section.length_unit).m),
            )
            for number, p in enumerate(section.points, start=1)
        ]
    else:
        chosen = [(str(label), x * to_section, y * to_section) for label, x, y in points]
    draw_points(svg, obstacles, frame, chosen, outline.rings)

    top = svg.y_min
    svg.text(((svg.x_min + svg.x_max) / 2, top - 6 - FONT_SIZE / 2), section.name, bold=True)
    return svg.render()


def draw_points(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    points: Sequence[tuple[str, float, float]],
    rings: Sequence[np.ndarray] = (),
) -> None:
    """Dots at the points, then their labels on the open side of the outline there.

    Dots go down first so every label keeps off every dot, not only the earlier
    ones. A label looks first along the outline's outward direction at its point
    (the bisector of a corner, re-entrant corners included), else outward from
    the centroid.
    """
    centroid = frame.point(0.0, 0.0)
    placed = [(label, (x, y), frame.point(x, y)) for label, x, y in points]
    for _, _, at in placed:
        svg.circle(at, 2.6, fill=INK, css_class="stress-point")
        obstacles.add_box(_dot_box(at))
    for label, model, at in placed:
        outward = outward_direction(rings, *model)
        direction = (outward[0], -outward[1]) if outward else unit_vector(centroid, at)
        center, far = place_label(obstacles, at, direction, label)
        if far:  # a label pushed away from its dot gets a leader, so it is not misread
            svg.line(at, _toward(center, at, FONT_SIZE * 0.6), stroke=INK, width=0.5)
        svg.text(center, label)


def outward_direction(rings: Sequence[np.ndarray], x: float, y: float) -> Point | None:
    """Unit vector out of the material at (x, y) when the point is on the outline, else None.

    Rings keep the material on their left (solid counter-clockwise, holes
    clockwise), so the right-hand normal of every edge points out of the material;
    at a vertex the two edges' normals are averaged.
    """
    if not rings:
        return None
    size = max(float(np.ptp(np.concatenate(rings), axis=0).max()), 1e-300)
    tolerance = 1e-6 * size
    best: tuple[float, Point] | None = None
    for ring in rings:
        starts, ends = ring, np.roll(ring, -1, axis=0)
        edge = ends - starts
        lengths = np.hypot(edge[:, 0], edge[:, 1])
        safe = np.where(lengths > 0, lengths, 1.0)
        normals = np.column_stack((edge[:, 1], -edge[:, 0])) / safe[:, None]
        t = np.clip(
            ((x - starts[:, 0]) * edge[:, 0] + (y - starts[:, 1]) * edge[:, 1]) / safe**2, 0, 1
        )
        distance = np.hypot(starts[:, 0] + t * edge[:, 0] - x, starts[:, 1] + t * edge[:, 1] - y)
        touching = np.flatnonzero((distance <= tolerance) & (lengths > 0))
        if touching.size == 0:
            continue
        total = normals[touching].sum(axis=0)
        length = float(np.hypot(*total))
        if length > 1e-9 and (best is None or float(distance[touching].min()) < best[0]):
            best = (float(distance[touching].min()), (total[0] / length, total[1] / length))
    return None if best is None else best[1]


def _dot_box(at: Point) -> Box:
    return Box(at[0] - 2.6, at[1] - 2.6, at[0] + 2.6, at[1] + 2.6)


def _toward(start: Point, end: Point, distance: float) -> Point:
    """The point ``distance`` from ``start`` toward ``end``."""
    ux, uy = unit_vector(start, end)
    return (start[0] + ux * distance, start[1] + uy * distance)


def _draw_axes(svg: Svg, obstacles: Obstacles, frame: Frame, section: Section) -> None:
    outline = section.outline
    left, top = frame.point(outline.x_min, outline.y_max)
    right, bottom = frame.point(outline.x_max, outline.y_min)
    origin = frame.point(0.0, 0.0)
    x_end = (right + AXIS_OVERRUN, origin[1])
    y_end = (origin[0], top - AXIS_OVERRUN)
    centre_line(svg, obstacles, (left - AXIS_OVERRUN, origin[1]), x_end, css_class="axis-x")
    centre_line(svg, obstacles, (origin[0], bottom + AXIS_OVERRUN), y_end, css_class="axis-y")
    axis_label(svg, obstacles, x_end, (1.0, 0.0), "x")
    axis_label(svg, obstacles, y_end, (0.0, -1.0), "y")
    centroid_mark(svg, origin)


def _named(section: Section, extent: float, names: Sequence[str], unit: str) -> str:
    """ "d = 9.73 in" when a named dimension equals ``extent``, else just the length.

    Angles say "leg": the tables' d and b do not follow which leg is drawn upright.
    """
    length = Quantity(extent, section.length_unit)
    if section.family in ANGLES:
        return f"leg = {quantity_text(length, unit)}"
    for name in names:
        value = section.dimensions.get(name)
        if value is not None and math.isclose(
            float(value.to(section.length_unit).m), extent, rel_tol=1e-6
        ):
            return MarkedText(f"{_SHOWN_AS.get(name, name)} = {quantity_text(length, unit)}")
    return quantity_text(length, unit)


def _extreme_vertex(section: Section, *, side: str) -> tuple[Point, Point]:
    """The two vertices that fix an overall dimension, in model coordinates.

    ``side`` "left": the top-most and bottom-most vertices nearest the left (the
    depth is dimensioned there); "bottom": the left-most and right-most vertices
    nearest the bottom (the width).
    """
    vertices = np.concatenate(section.outline.rings)
    x, y = vertices[:, 0], vertices[:, 1]
    tolerance = 1e-9 * (np.ptp(x) + np.ptp(y))
    if side == "left":
        top = vertices[y >= y.max() - tolerance]
        bottom = vertices[y <= y.min() + tolerance]
        first, second = top[np.argmin(top[:, 0])], bottom[np.argmin(bottom[:, 0])]
    else:
        lefts = vertices[x <= x.min() + tolerance]
        rights = vertices[x >= x.max() - tolerance]
        first, second = lefts[np.argmin(lefts[:, 1])], rights[np.argmin(rights[:, 1])]
    return (float(first[0]), float(first[1])), (float(second[0]), float(second[1]))


def _draw_overall_dimensions(
    svg: Svg, obstacles: Obstacles, frame: Frame, section: Section, unit: str
) -> None:
    outline = section.outline
    left = frame.point(outline.x_min, 0.0)[0]
    bottom = frame.point(0.0, outline.y_min)[1]
    width = outline.x_max - outline.x_min
    depth = outline.y_max - outline.y_min
    if section.family not in ROUND:
        top_vertex, bottom_vertex = _extreme_vertex(section, side="left")
        features = (frame.point(*top_vertex), frame.point(*bottom_vertex))
        line_x = left - DIMENSION_OFFSET
        line = ((line_x, features[0][1]), (line_x, features[1][1]))
        linear_dimension(svg, obstacles, features, line, _named(section, depth, _DEPTH_NAMES, unit))
    left_vertex, right_vertex = _extreme_vertex(section, side="bottom")
    features = (frame.point(*left_vertex), frame.point(*right_vertex))
    line_y = bottom + DIMENSION_OFFSET
    line = ((features[0][0], line_y), (features[1][0], line_y))
    linear_dimension(svg, obstacles, features, line, _named(section, width, _WIDTH_NAMES, unit))


def _length(section: Section, *names: str) -> tuple[str, float] | None:
    """The first of ``names`` the section has, with its value in the section's unit."""
    for name in names:
        value = section.dimensions.get(name)
        if value is not None:
            return _SHOWN_AS.get(name, name), float(value.to(section.length_unit).m)
    return None


def _draw_thicknesses(
    svg: Svg, obstacles: Obstacles, frame: Frame, section: Section, unit: str
) -> None:
    """Dimension the flange, web or wall thickness where the family tells us where it is."""
    outline, family = section.outline, section.family
    x_min, x_max, y_min, y_max = outline.x_min, outline.x_max, outline.y_min, outline.y_max
    middle = 0.5 * (x_min + x_max)

    def text(name: str, value: float) -> str:
        return MarkedText(f"{name} = {quantity_text(Quantity(value, section.length_unit), unit)}")

    def flange_at_tip(tip_x: float, thickness: tuple[str, float]) -> None:
        # Extension lines carry both faces of the flange out to the right of its tip.
        name, value = thickness
        tip_top, tip_under = frame.point(tip_x, y_max), frame.point(tip_x, y_max - value)
        line_x = tip_top[0] + 14
        for face in (tip_top, tip_under):
            extension_line(svg, obstacles, (face[0] + 3, face[1]), (line_x + 4, face[1]))
        thickness_dimension(
            svg, obstacles, (line_x, tip_top[1]), (line_x, tip_under[1]), text(name, value), (1, 0)
        )

    def across(left_face: float, right_face: float, y: float, thickness: tuple[str, float]):
        name, value = thickness
        near, far = frame.point(left_face, y), frame.point(right_face, y)
        thickness_dimension(svg, obstacles, near, far, text(name, value), (1, 0))

    flange = _length(section, "tf")
    web = _length(section, "tw")
    wall = _length(section, "tdes", "t")
    if family in I_SHAPES and flange and web:
        top_width = _length(section, "bf")
        tip = middle + top_width[1] / 2 if top_width else x_max
        flange_at_tip(tip, flange)
        bottom_flange = _length(section, "tf_bottom") or flange
        level = 0.5 * (y_min + bottom_flange[1])  # halfway down the lower web
        across(middle - web[1] / 2, middle + web[1] / 2, level, web)
    elif family in CHANNELS and flange and web:
        flange_at_tip(x_max, flange)
        across(x_min, x_min + web[1], 0.5 * (y_min + flange[1]), web)
    elif family in TEES and flange and web:
        flange_at_tip(x_max, flange)
        stem_level = 0.5 * (y_min + y_max - flange[1])
        across(middle - web[1] / 2, middle + web[1] / 2, stem_level, web)
    elif family in ANGLES and wall:
        level = y_max - 0.25 * (y_max - y_min)  # on the vertical leg, clear of the heel
        across(x_min, x_min + wall[1], level, wall)
    elif family in RECTANGULAR_TUBES and wall:
        level = 0.5 * y_max  # above the x axis, clear of the corner radii
        across(x_max - wall[1], x_max, level, wall)
    elif family in ROUND_TUBES and wall:
        # Across the wall at 45° up and to the right, clear of both axes.
        radius = 0.5 * (x_max - x_min)
        c = math.cos(math.pi / 4)
        center_x, center_y = middle, 0.5 * (y_min + y_max)
        inner = frame.point(center_x + (radius - wall[1]) * c, center_y + (radius - wall[1]) * c)
        outer = frame.point(center_x + radius * c, center_y + radius * c)
        name, value = wall
        thickness_dimension(svg, obstacles, inner, outer, text(name, value), (c, -c))
