"""Drawing vocabulary shared by the figures: arrows, dimensions, axes and value text."""

from __future__ import annotations

import math
from dataclasses import dataclass

import numpy as np
import pint

from calcsheet.figures.labels import Box, Obstacles, place_label, text_box
from calcsheet.figures.style import (
    ARROW_HALF_WIDTH,
    ARROW_LENGTH,
    AXIS,
    DIMENSION,
    FONT_SIZE,
    INK,
    PAPER,
    SMALL_FONT_SIZE,
    THIN,
)
from calcsheet.figures.svg import Point, Svg
from calcsheet.units import format_number, unit_factors, ureg

AXIS_DASH = "9 3 2 3"  # long dash, dot: the drafting pattern for centre lines
_SUPERSCRIPTS = str.maketrans("0123456789-", "⁰¹²³⁴⁵⁶⁷⁸⁹⁻")


# --- model to paper -----------------------------------------------------------------


@dataclass(frozen=True)
class Frame:
    """Model coordinates (y up) to paper (px, y down): a scale, and an origin on paper.

    ``y_scale`` differs from ``scale`` only where a figure says so (an exaggerated
    vertical scale, noted on the figure).
    """

    scale: float
    origin: Point = (0.0, 0.0)
    y_scale: float | None = None

    def point(self, x: float, y: float) -> Point:
        """The paper position of model point (x, y)."""
        y_scale = self.scale if self.y_scale is None else self.y_scale
        return (self.origin[0] + self.scale * x, self.origin[1] - y_scale * y)

    def ring(self, ring: np.ndarray) -> np.ndarray:
        """A ring of model points as paper points."""
        y_scale = self.scale if self.y_scale is None else self.y_scale
        return np.column_stack(
            (self.origin[0] + self.scale * ring[:, 0], self.origin[1] - y_scale * ring[:, 1])
        )


# --- text of values -----------------------------------------------------------------


def value_text(value: float, *, signed: bool = False) -> str:
    """A number as a sheet prints it (3 significant figures, 4 for a leading 1), true minus."""
    formatted = format_number(float(value))
    text = formatted.digits
    if formatted.exponent is not None:
        text += "×10" + str(formatted.exponent).translate(_SUPERSCRIPTS)
    if formatted.negative:
        return "−" + text
    return ("+" + text) if signed and value != 0 else text


def unit_text(unit: pint.Unit | str) -> str:
    """A unit as an engineer writes it: in, mm, kip·ft, kN·m, ksi, kip/in²."""
    factors = unit_factors(ureg.Unit(unit) if isinstance(unit, str) else unit)

    def power(symbol: str, exponent: float) -> str:
        size = abs(exponent)
        shown = "" if size == 1 else format(size, "g").translate(_SUPERSCRIPTS)
        return symbol + shown

    upper = "·".join(power(symbol, exponent) for symbol, exponent in factors if exponent > 0)
    lower = "·".join(power(symbol, exponent) for symbol, exponent in factors if exponent < 0)
    if not lower:
        return upper
    return f"{upper or '1'}/{lower}"


def quantity_text(quantity: pint.Quantity, unit: str | None = None, *, signed: bool = False):
    """``quantity`` in ``unit`` (default its own) as "12.5 kip·ft"."""
    quantity = quantity.to(unit) if unit else quantity
    return f"{value_text(float(quantity.magnitude), signed=signed)} {unit_text(quantity.units)}"


# --- arrows -------------------------------------------------------------------------


def unit_vector(start: Point, end: Point) -> Point:
    """The unit vector from ``start`` to ``end`` ((0, 0) when they coincide)."""
    dx, dy = end[0] - start[0], end[1] - start[1]
    length = math.hypot(dx, dy)
    return (0.0, 0.0) if length == 0 else (dx / length, dy / length)


def arrowhead(
    svg: Svg,
    tip: Point,
    direction: Point,
    *,
    colour: str = INK,
    length: float = ARROW_LENGTH,
    half_width: float = ARROW_HALF_WIDTH,
) -> None:
    """A filled arrowhead with its tip at ``tip``, pointing along ``direction``."""
    ux, uy = direction
    bx, by = tip[0] - ux * length, tip[1] - uy * length
    svg.polygon(
        [
            tip,
            (bx - uy * half_width, by + ux * half_width),
            (bx + uy * half_width, by - ux * half_width),
        ],
        fill=colour,
    )


def arrow(
    svg: Svg,
    tail: Point,
    tip: Point,
    *,
    colour: str = INK,
    width: float = 1.6,
    head: float = 1.0,
    css_class: str | None = None,
) -> None:
    """A line from ``tail`` to ``tip`` with a head at ``tip`` (``head`` scales the head)."""
    direction = unit_vector(tail, tip)
    length = ARROW_LENGTH * 1.4 * head
    # Stop the shaft inside the head so its square end does not poke through the point.
    neck = (tip[0] - direction[0] * length * 0.8, tip[1] - direction[1] * length * 0.8)
    svg.line(tail, neck, stroke=colour, width=width, css_class=css_class)
    arrowhead(
        svg, tip, direction, colour=colour, length=length, half_width=ARROW_HALF_WIDTH * 1.4 * head
    )


# --- dimensions ---------------------------------------------------------------------


def extension_line(svg: Svg, obstacles: Obstacles, start: Point, end: Point) -> None:
    """A thin grey line from a feature out to its dimension line."""
    svg.line(start, end, stroke=DIMENSION, width=THIN)
    obstacles.add_line(start, end)


def linear_dimension(
    svg: Svg,
    obstacles: Obstacles,
    features: tuple[Point, Point],
    line: tuple[Point, Point],
    text: str,
    *,
    size: float = SMALL_FONT_SIZE,
    text_toward: Point | None = None,
) -> None:
    """Dimension between two ``features``, drawn on the dimension ``line`` (its two ends).

    Extension lines run from a small gap off each feature to just past the
    dimension line; arrowheads sit inside it when there is room, else outside
    pointing in. The text reads along the line, on the side away from the
    features; with ``text_toward`` it is set level instead, placed from the middle
    of the line toward that direction wherever it is free (short dimensions).
    """
    a, b = line
    out = unit_vector(features[0], a)
    if out == (0.0, 0.0):
        out = unit_vector(features[1], b)
    for feature, on_line in zip(features, line, strict=True):
        if math.dist(feature, on_line) > 4:
            extension_line(
                svg,
                obstacles,
                (feature[0] + out[0] * 3, feature[1] + out[1] * 3),
                (on_line[0] + out[0] * 4, on_line[1] + out[1] * 4),
            )
    along = unit_vector(a, b)
    if math.dist(a, b) >= 2 * ARROW_LENGTH + 4:
        svg.line(a, b, stroke=DIMENSION, width=THIN)
        arrowhead(svg, a, (-along[0], -along[1]), colour=DIMENSION)
        arrowhead(svg, b, along, colour=DIMENSION)
    else:  # too short for arrows inside: bring them in from outside
        tail = ARROW_LENGTH + 8
        svg.line(
            (a[0] - along[0] * tail, a[1] - along[1] * tail),
            (b[0] + along[0] * tail, b[1] + along[1] * tail),
            stroke=DIMENSION,
            width=THIN,
        )
        arrowhead(svg, a, along, colour=DIMENSION)
        arrowhead(svg, b, (-along[0], -along[1]), colour=DIMENSION)
    obstacles.add_line(a, b)
    middle = (0.5 * (a[0] + b[0]), 0.5 * (a[1] + b[1]))
    if text_toward is not None:
        center, _ = place_label(obstacles, middle, text_toward, text, size=size, gap=2.0)
        svg.text(center, text, size=size)
        return
    vertical = abs(along[1]) > abs(along[0])
    center = (middle[0] + out[0] * (size / 2 + 3), middle[1] + out[1] * (size / 2 + 3))
    svg.text(center, text, size=size, fill=INK, vertical=vertical)
    box = text_box(center, text, size)
    if vertical:  # the box of turned text is the unturned box turned about its centre
        half_w, half_h = (box.x1 - box.x0) / 2, (box.y1 - box.y0) / 2
        box = Box(center[0] - half_h, center[1] - half_w, center[0] + half_h, center[1] + half_w)
    obstacles.add_box(box)


def thickness_dimension(
    svg: Svg,
    obstacles: Obstacles,
    near: Point,
    far: Point,
    text: str,
    text_direction: Point,
    *,
    size: float = SMALL_FONT_SIZE,
) -> None:
    """A thin part's thickness: arrows from outside pointing at both faces, text beside.

    ``near`` and ``far`` are points on the two faces; the text is placed from the
    middle towards ``text_direction`` where it is free.
    """
    along = unit_vector(near, far)
    tail = ARROW_LENGTH + 9
    before = (near[0] - along[0] * tail, near[1] - along[1] * tail)
    after = (far[0] + along[0] * tail, far[1] + along[1] * tail)
    svg.line(before, after, stroke=DIMENSION, width=THIN)
    arrowhead(svg, near, along, colour=DIMENSION)
    arrowhead(svg, far, (-along[0], -along[1]), colour=DIMENSION)
    obstacles.add_line(before, after)
    # Text along the line goes past its tail, so it keeps clear of the line itself;
    # text across the line sits beside its middle.
    along_text = along[0] * text_direction[0] + along[1] * text_direction[1]
    if along_text > 0.7:
        anchor = after
    elif along_text < -0.7:
        anchor = before
    else:
        anchor = (0.5 * (near[0] + far[0]), 0.5 * (near[1] + far[1]))
    center, _ = place_label(obstacles, anchor, text_direction, text, size=size, gap=3.0)
    svg.text(center, text, size=size)


# --- axes ---------------------------------------------------------------------------


def centre_line(svg: Svg, obstacles: Obstacles | None, start: Point, end: Point, **kw) -> None:
    """A dash-dot centre line (centroidal axes, the member axis)."""
    svg.line(start, end, stroke=AXIS, width=0.8, dash=AXIS_DASH, **kw)
    if obstacles is not None:
        obstacles.add_line(start, end)


def axis_label(svg: Svg, obstacles: Obstacles, at: Point, direction: Point, name: str) -> None:
    """An axis name (x, y, z) just beyond the end of its line, in italics."""
    center, _ = place_label(obstacles, at, direction, name, size=FONT_SIZE, gap=1.0)
    svg.text(center, name, italic=True, fill=INK)


def centroid_mark(svg: Svg, at: Point) -> None:
    """A small open circle at the centroid."""
    svg.circle(at, 3.2, fill=PAPER, stroke=INK, width=1.0, css_class="centroid")
