"""The normal stress over a section: banded fill, neutral axis, extreme values, legend.

σ = N/A + [(Mx·Iy + My·Ixy)·y − (My·Ix + Mx·Ixy)·x] / (Ix·Iy − Ixy²), tension
positive (the convention of :mod:`calcsheet.mechanics.formulas`; with Ixy = 0 it
is N/A + Mx·y/Ix − My·x/Iy). The field is linear in x and y, so the bands of
equal colour are strips between parallel lines: each is the outline clipped by
two half-planes, computed here so the SVG needs no clip paths or ids.
"""

from __future__ import annotations

import itertools
import math
from collections.abc import Sequence

import numpy as np
import pint

from calcsheet.engine.marked_text import MarkedText
from calcsheet.figures.annotate import (
    Frame,
    axis_label,
    centre_line,
    centroid_mark,
    quantity_text,
    unit_text,
    unit_vector,
    value_text,
)
from calcsheet.figures.labels import Box, Obstacles, place_label
from calcsheet.figures.section import DRAWING_SIZE, outward_direction
from calcsheet.figures.style import (
    COMPRESSION,
    FONT_SIZE,
    INK,
    NEUTRAL_AXIS,
    NOTE,
    OUTLINE_WIDTH,
    PAPER,
    SMALL_FONT_SIZE,
    TENSION,
    THIN,
    mix,
)
from calcsheet.figures.svg import Point, Svg
from calcsheet.mechanics import formulas
from calcsheet.sections import Section
from calcsheet.units import Quantity, parse_quantity

TARGET_BANDS = 8
SWATCH = 15.0  # px, side of a legend swatch
AXIS_OVERRUN = 16.0

QuantityInput = pint.Quantity | str


def normal_stress_figure(
    section: Section,
    N: QuantityInput,
    Mx: QuantityInput,
    My: QuantityInput,
    *,
    stress_unit: str = "ksi",
) -> str:
    """SVG of the normal stress over ``section`` for internal forces N, Mx, My.

    Bands coloured warm for tension and cool for compression, deeper with the
    magnitude, with a legend of the band limits in ``stress_unit``; the neutral
    axis drawn and labelled where it crosses the section (or a note that there is
    none in it); the extreme tension and compression labelled at their points.
    """
    axial = parse_quantity(N, field="N", dimension="force")
    moment_x = parse_quantity(Mx, field="Mx", dimension="moment")
    moment_y = parse_quantity(My, field="My", dimension="moment")
    field = LinearStress.of(section, axial, moment_x, moment_y, stress_unit)
    outline = section.outline
    frame = Frame(DRAWING_SIZE / max(outline.x_max - outline.x_min, outline.y_max - outline.y_min))
    svg = Svg(title=f"Normal stress, {section.name}")
    obstacles = Obstacles()
    vertices = np.concatenate(outline.rings)
    values = field.at(vertices[:, 0], vertices[:, 1])
    low, high = float(values.min()), float(values.max())
    scale = max(abs(low), abs(high))

    levels = band_levels(low, high)
    _paint_bands(svg, frame, section, field, levels, scale)
    rings = [frame.ring(ring) for ring in outline.rings]
    svg.rings([ring.tolist() for ring in rings], width=OUTLINE_WIDTH, css_class="outline")
    obstacles.add_region(rings)
    _draw_axes(svg, obstacles, frame, section)

    notes = _draw_neutral_axis(svg, obstacles, frame, section, field, low, high)
    _label_extremes(svg, obstacles, frame, section, vertices, values, stress_unit)
    _draw_legend(svg, levels, scale, stress_unit)

    forces = MarkedText(
        ", ".join(
            (
                f"{{N}} = {quantity_text(axial, signed=True)}",
                f"{{M_x}} = {quantity_text(moment_x, signed=True)}",
                f"{{M_y}} = {quantity_text(moment_y, signed=True)}",
            )
        )
    )
    top, middle_x = svg.y_min, 0.5 * (svg.x_min + svg.x_max)
    svg.text((middle_x, top - 4 - SMALL_FONT_SIZE / 2), forces, size=SMALL_FONT_SIZE, fill=NOTE)
    svg.text((middle_x, top - 10 - 1.5 * SMALL_FONT_SIZE - FONT_SIZE / 2), section.name, bold=True)
    bottom = svg.y_max
    for number, note in enumerate([*notes, MarkedText("{sigma} positive in tension")]):
        at = (middle_x, bottom + 6 + (number + 0.5) * (SMALL_FONT_SIZE + 4))
        svg.text(at, note, size=SMALL_FONT_SIZE, fill=NOTE, css_class="note")
    return svg.render()


class LinearStress:
    """σ(x, y) = a + b·x + c·y in one stress unit, x and y in the section's length unit."""

    def __init__(self, a: float, b: float, c: float) -> None:
        self.a, self.b, self.c = a, b, c

    @classmethod
    def of(
        cls,
        section: Section,
        N: pint.Quantity,
        Mx: pint.Quantity,
        My: pint.Quantity,
        stress_unit: str,
    ) -> LinearStress:
        """The field of N, Mx, My over ``section`` (pint checks every unit on the way)."""
        length = section.length_unit
        numbers = section.numeric()
        A = Quantity(numbers.A, f"{length}**2")
        Ix, Iy, Ixy = (
            Quantity(value, f"{length}**4") for value in (numbers.Ix, numbers.Iy, numbers.Ixy)
        )
        D = formulas.product_determinant(Ix, Iy, Ixy)

        def bending(x: pint.Quantity, y: pint.Quantity) -> pint.Quantity:
            # the analysis's own formulas, so the figure and the steps cannot differ
            return formulas.bending_stress_x(Mx, x, y, Ix, Iy, Ixy, D) + formulas.bending_stress_y(
                My, x, y, Ix, Iy, Ixy, D
            )

        one, zero = Quantity(1.0, length), Quantity(0.0, length)
        gradient = f"{stress_unit}/{length}"
        a = float(formulas.axial_stress(N, A).to(stress_unit).magnitude)
        b = float((bending(one, zero) / one).to(gradient).magnitude)
        c = float((bending(zero, one) / one).to(gradient).magnitude)
        return cls(a, b, c)

    def at(self, x: np.ndarray, y: np.ndarray) -> np.ndarray:
        """σ at the points (x, y)."""
        return self.a + self.b * np.asarray(x) + self.c * np.asarray(y)

    def clip_above(self, ring: np.ndarray, lower: float) -> np.ndarray:
        """The part of ``ring`` where σ ≥ lower (Sutherland-Hodgman against one half-plane).

        A concave ring may come back with zero-width slivers along the cut; the
        bands clip a convex rectangle, which has none.
        """
        return _clip_half_plane(ring, self.at(ring[:, 0], ring[:, 1]) - lower)


def _clip_half_plane(ring: np.ndarray, side: np.ndarray) -> np.ndarray:
    """Vertices of ``ring`` clipped to ``side >= 0`` (side is linear along each edge)."""
    if np.all(side >= 0):
        return ring
    if np.all(side < 0):
        return np.empty((0, 2))
    result: list[np.ndarray] = []
    count = len(ring)
    for index in range(count):
        current, following = ring[index], ring[(index + 1) % count]
        s_current, s_following = side[index], side[(index + 1) % count]
        if s_current >= 0:
            result.append(current)
        if (s_current >= 0) != (s_following >= 0):
            t = s_current / (s_current - s_following)
            result.append(current + t * (following - current))
    return np.array(result)


def band_levels(low: float, high: float, target: int = TARGET_BANDS) -> list[float]:
    """Round band limits covering [low, high], about ``target`` bands, zero a limit if crossed."""
    if high - low <= 1e-12 * max(abs(low), abs(high), 1e-300):
        return [low, high]  # uniform stress: one band
    raw = (high - low) / target
    power = 10.0 ** math.floor(math.log10(raw))
    step = next(f * power for f in (1.0, 2.0, 2.5, 5.0, 10.0) if f * power >= raw * (1 - 1e-9))
    first, last = math.floor(low / step + 1e-9), math.ceil(high / step - 1e-9)
    return [k * step + 0.0 for k in range(first, last + 1)]


def _paint_bands(
    svg: Svg,
    frame: Frame,
    section: Section,
    field: LinearStress,
    levels: Sequence[float],
    scale: float,
) -> None:
    """Fill the section with the bands, then cover what lies outside the material.

    Each band is the part of a rectangle round the section where σ is above the
    band's lower limit, painted lowest band first, so a higher band covers the
    rest and no seam shows between two bands. The rectangle is convex, so its
    pieces are clean polygons; a paper-coloured mask (the rectangle with the
    outline cut out, holes left in) then trims them to the section without the
    clip paths and ids an SVG clip would need.
    """
    outline = section.outline
    pad = 2.0 / frame.scale
    box = np.array(
        [
            (outline.x_min - pad, outline.y_min - pad),
            (outline.x_max + pad, outline.y_min - pad),
            (outline.x_max + pad, outline.y_max + pad),
            (outline.x_min - pad, outline.y_max + pad),
        ]
    )
    for lower, upper in itertools.pairwise(levels):
        piece = field.clip_above(box, lower)
        if len(piece) >= 3:
            colour = _band_colour(0.5 * (lower + upper), scale)
            svg.rings([frame.ring(piece).tolist()], fill=colour, stroke=None, css_class="band")
    # The mask reaches past the bands, so no hairline of colour shows along its edge.
    wider = box + np.array([[-pad, -pad], [pad, -pad], [pad, pad], [-pad, pad]])
    mask = [frame.ring(wider).tolist()] + [frame.ring(ring).tolist() for ring in outline.rings]
    svg.rings(mask, fill=PAPER, stroke=None, extend=False)


def _band_colour(value: float, scale: float) -> str:
    if scale == 0:
        return mix(TENSION, 0.0)
    share = 0.12 + 0.88 * min(abs(value) / scale, 1.0)
    return mix(TENSION if value > 0 else COMPRESSION, share)


def _draw_axes(svg: Svg, obstacles: Obstacles, frame: Frame, section: Section) -> None:
    outline = section.outline
    left, top = frame.point(outline.x_min, outline.y_max)
    right, bottom = frame.point(outline.x_max, outline.y_min)
    origin = frame.point(0.0, 0.0)
    x_end, y_end = (right + AXIS_OVERRUN, origin[1]), (origin[0], top - AXIS_OVERRUN)
    centre_line(svg, obstacles, (left - AXIS_OVERRUN, origin[1]), x_end)
    centre_line(svg, obstacles, (origin[0], bottom + AXIS_OVERRUN), y_end)
    axis_label(svg, obstacles, x_end, (1.0, 0.0), "x")
    axis_label(svg, obstacles, y_end, (0.0, -1.0), "y")
    centroid_mark(svg, origin)


def _draw_neutral_axis(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    section: Section,
    field: LinearStress,
    low: float,
    high: float,
) -> list[str]:
    """Draw σ = 0 across the section when it crosses it; else return the note saying why not."""
    if high <= 0 and low >= 0:
        return [MarkedText("no normal stress: {N}, {M_x} and {M_y} are all zero")]
    if low >= 0:
        return ["no neutral axis in the section: all tension"]
    if high <= 0:
        return ["no neutral axis in the section: all compression"]
    outline = section.outline
    gradient = math.hypot(field.b, field.c)
    normal = (field.b / gradient, field.c / gradient)
    foot = (-field.a / gradient * normal[0], -field.a / gradient * normal[1])
    along = (-normal[1], normal[0])
    margin = AXIS_OVERRUN * 1.6 / frame.scale
    box = (
        outline.x_min - margin,
        outline.x_max + margin,
        outline.y_min - margin,
        outline.y_max + margin,
    )
    ends = _line_in_box(foot, along, box)
    if ends is None:
        return []
    start, end = (frame.point(*ends[0]), frame.point(*ends[1]))
    svg.line(start, end, stroke=NEUTRAL_AXIS, width=1.6, dash="7 3", css_class="neutral-axis")
    obstacles.add_line(start, end)
    # Label the left end of a flat axis and the lower end of a steep one: the axis
    # names x and y sit at the right and the top.
    flat = abs(end[0] - start[0]) >= abs(end[1] - start[1])
    key = 0 if flat else 1
    first_is_label = start[0] < end[0] if flat else start[key] > end[key]
    label_end, other = (start, end) if first_is_label else (end, start)
    center, _ = place_label(obstacles, label_end, unit_vector(other, label_end), "N.A.", gap=2.0)
    svg.text(center, "N.A.", bold=True, fill=NEUTRAL_AXIS)
    return []


def _line_in_box(
    point: Point, direction: Point, box: tuple[float, float, float, float]
) -> tuple[Point, Point] | None:
    """The chord of the line point + t·direction inside the box (x0, x1, y0, y1)."""
    t_low, t_high = -math.inf, math.inf
    for coordinate, step, lower, upper in (
        (point[0], direction[0], box[0], box[1]),
        (point[1], direction[1], box[2], box[3]),
    ):
        if abs(step) < 1e-15:
            if not lower <= coordinate <= upper:
                return None
            continue
        first, second = (lower - coordinate) / step, (upper - coordinate) / step
        t_low, t_high = max(t_low, min(first, second)), min(t_high, max(first, second))
    if t_low >= t_high:
        return None
    return (
        (point[0] + t_low * direction[0], point[1] + t_low * direction[1]),
        (point[0] + t_high * direction[0], point[1] + t_high * direction[1]),
    )


def _label_extremes(
    svg: Svg,
    obstacles: Obstacles,
    frame: Frame,
    section: Section,
    vertices: np.ndarray,
    values: np.ndarray,
    stress_unit: str,
) -> None:
    """Dots and values at the extreme tension and compression (one label if uniform)."""
    unit = unit_text(stress_unit)
    high_index, low_index = int(np.argmax(values)), int(np.argmin(values))
    high, low = float(values[high_index]), float(values[low_index])
    spread = high - low
    if spread <= 1e-9 * max(abs(high), abs(low), 1e-300):
        marks = [(high_index, f"{{sigma}} = {value_text(high, signed=True)} {unit} (uniform)")]
    else:
        marks = []
        if high > 0:
            marks.append((high_index, f"{{sigma_max}} = {value_text(high, signed=True)} {unit}"))
        if low < 0:
            marks.append((low_index, f"{{sigma_min}} = {value_text(low, signed=True)} {unit}"))
        if not marks:  # neither tension nor compression anywhere: label the larger end
            marks.append((high_index, f"{{sigma}} = {value_text(high, signed=True)} {unit}"))
    centroid = frame.point(0.0, 0.0)
    dots = []
    for index, _ in marks:
        at = frame.point(float(vertices[index, 0]), float(vertices[index, 1]))
        svg.circle(at, 3.0, fill=INK, css_class="extreme")
        obstacles.add_box(Box(at[0] - 3, at[1] - 3, at[0] + 3, at[1] + 3))
        dots.append(at)
    for (index, words), at in zip(marks, dots, strict=True):
        text = MarkedText(words)
        outward = outward_direction(section.outline.rings, *vertices[index])
        direction = (outward[0], -outward[1]) if outward else unit_vector(centroid, at)
        center, far = place_label(obstacles, at, direction, text, size=SMALL_FONT_SIZE)
        if far:
            svg.line(at, center, stroke=INK, width=0.5)
        svg.text(center, text, size=SMALL_FONT_SIZE, bold=True, css_class="extreme-value")


def _level_text(level: float, step: float) -> str:
    """A band limit with as many decimals as the step needs, so the column reads evenly."""
    decimals = next((d for d in range(7) if abs(round(step, d) - step) <= 1e-9 * abs(step)), 6)
    text = f"{abs(level):.{decimals}f}"
    if float(text) == 0:
        return "0"
    return ("−" if level < 0 else "+") + text


def _draw_legend(svg: Svg, levels: Sequence[float], scale: float, stress_unit: str) -> None:
    """Swatches from the most tension (top) to the most compression, limits beside them."""
    left = svg.x_max + 24
    bands = len(levels) - 1
    middle_y = 0.5 * (svg.y_min + svg.y_max)
    top = middle_y - 0.5 * bands * SWATCH
    svg.text(
        (left, top - 12),
        MarkedText(f"{{sigma}}, {unit_text(stress_unit)}"),
        anchor="start",
        bold=True,
    )
    for row in range(bands):
        upper, lower = levels[-1 - row], levels[-2 - row]
        y = top + row * SWATCH
        colour = _band_colour(0.5 * (upper + lower), scale)
        svg.polygon(
            [(left, y), (left + SWATCH, y), (left + SWATCH, y + SWATCH), (left, y + SWATCH)],
            fill=colour,
            stroke=INK,
            width=THIN,
        )
    if levels[0] == levels[-1]:  # uniform: one swatch, one value
        at = (left + SWATCH + 7, top + 0.5 * SWATCH)
        svg.text(at, value_text(levels[0], signed=True), size=SMALL_FONT_SIZE, anchor="start")
        return
    step = levels[1] - levels[0]
    for row, level in enumerate(reversed(levels)):
        y = top + row * SWATCH
        svg.line((left + SWATCH, y), (left + SWATCH + 4, y), stroke=INK, width=THIN)
        svg.text(
            (left + SWATCH + 7, y),
            _level_text(level, step),
            size=SMALL_FONT_SIZE,
            anchor="start",
        )
