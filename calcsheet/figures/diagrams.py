"""Internal-force diagrams along the member: one panel per force that is not zero.

The member runs left to right at one horizontal scale for every panel, so a station
lines up from panel to panel and with the member drawn on top (its supports and the
stations where loads act). Each panel shows one of N, Vx, Vy, T, Mx, My:

* the governing combination as a line over a filled area;
* the envelope of all combinations (the lowest and the highest value at each station)
  as a pale band with dashed edges;
* the governing combination's largest and smallest values marked and written with their
  station; the envelope's extremes written beside the panel;
* the supports as small symbols on the panel's axis.

Each panel's vertical scale is its own (the values span a fixed height); positive values
are drawn above the axis. The sign convention is that of the frame solver
(:mod:`calcsheet.mechanics.frame`) and is written under the figure (:data:`SIGN_CONVENTION`).
"""

from __future__ import annotations

import itertools
import math
from collections.abc import Sequence

import numpy as np
import pint
from numpy.typing import ArrayLike, NDArray

from calcsheet.engine.marked_text import MarkedText, plain_text
from calcsheet.errors import InputError
from calcsheet.figures.annotate import unit_text, value_text
from calcsheet.figures.labels import Box, Obstacles, place_label, text_box
from calcsheet.figures.style import (
    AXIS,
    COMPRESSION,
    DIMENSION,
    INK,
    NOTE,
    PAPER,
    SMALL_FONT_SIZE,
    THIN,
    mix,
)
from calcsheet.figures.svg import Point, Svg, number, text_width
from calcsheet.mechanics.statics import FORCE_NAMES
from calcsheet.mechanics.supports import Support
from calcsheet.units import Quantity

DIAGRAM_LENGTH = 440.0  # px for the member length, in every panel
PANEL_HEIGHT = 44.0  # px from the smallest to the largest value of a panel
LABEL_ROOM = SMALL_FONT_SIZE + 12  # px above and below a panel for its peak labels
PANEL_GAP = 10.0  # px between one panel's label room and the next one's
STRIP_HEIGHT = 44.0  # px for the member strip on top (supports, load stations)
SUPPORT_SIZE = 9.0  # px, height of a support symbol on the member strip
AXIS_SUPPORT_SIZE = 6.0  # px, height of a support symbol on a panel's axis
CAPTION_CHARACTERS = 96  # characters per line of the caption under the figure

GOVERNING_FILL = mix(COMPRESSION, 0.38)
ENVELOPE_FILL = "#ebebe8"
ENVELOPE_DASH = "4 3"

# A component whose largest value is below this share of the largest value of its kind
# (forces or moments) is round-off of the solver, not a force: its panel is left out.
ZERO_SHARE = 1e-9

SUPPORT_KINDS = ("fixed", "pinned", "roller", "support")

SIGN_CONVENTION = (
    "Internal forces on the cut face whose outward normal is +z (the resultant of everything "
    "beyond the cut): {N} positive in tension; {V_x}, {V_y} positive along +x, +y; {T}, {M_x}, "
    "{M_y} by the right-hand rule about +z, +x, +y (positive {M_x} puts the +y fibres in "
    "tension). Positive "
    "values are drawn above each panel's axis; each panel has its own vertical scale."
)
"""The sign convention of the diagrams, as written under the figure (marked text, usable as a
caption)."""
# Each force's symbol in the panel titles, in the order of FORCE_NAMES.
_FORCE_SYMBOLS = ("N", "V_x", "V_y", "T", "M_x", "M_y")

_IS_MOMENT = (False, False, False, True, True, True)

SupportMark = float | tuple[float, str]
LoadMark = float | tuple[float, str]


def support_marks(supports: Sequence[Support]) -> list[tuple[float, str]]:
    """Supports as (station in m, kind) for :func:`force_diagrams`.

    A support holding both bending rotations is drawn fixed, one holding the
    axial translation a pin, any other a roller.
    """
    marks = []
    for held in supports:
        if {"rx", "ry"} <= held.restrains:
            kind = "fixed"
        elif "uz" in held.restrains:
            kind = "pinned"
        else:
            kind = "roller"
        marks.append((float(held.z.to("m").m), kind))
    return marks


def force_diagrams(
    stations_m: ArrayLike,
    governing: ArrayLike,
    envelope_low: ArrayLike,
    envelope_high: ArrayLike,
    *,
    supports_m: Sequence[SupportMark],
    length_unit: str,
    force_unit: str,
    moment_unit: str,
    loads_m: Sequence[LoadMark] = (),
    governing_name: str = "",
) -> str:
    """SVG of the internal-force diagrams along the member.

    ``stations_m`` (n,) are stations in m, increasing (a station may repeat, to draw
    the jump under a point load); ``governing``, ``envelope_low`` and
    ``envelope_high`` (n, 6) are N, Vx, Vy, T, Mx, My in N and N·m: the governing
    combination, and the lowest and highest values of all combinations. Values are
    written in ``length_unit``, ``force_unit`` and ``moment_unit``.

    ``supports_m`` are stations in m, or (station, kind) pairs with kind one of
    fixed, pinned, roller (:func:`support_marks` makes them from
    :class:`~calcsheet.mechanics.supports.Support`); ``loads_m`` are the stations
    of the loads, or (station, name) pairs, marked on the member strip.
    ``governing_name`` names the governing combination in the legend.
    """
    stations = _stations(stations_m)
    arrays = [
        _forces(values, name, len(stations))
        for values, name in (
            (governing, "governing"),
            (envelope_low, "envelope_low"),
            (envelope_high, "envelope_high"),
        )
    ]
    units = [moment_unit if moment else force_unit for moment in _IS_MOMENT]
    factors = np.array(
        [
            _factor("N*m" if moment else "N", unit)
            for moment, unit in zip(_IS_MOMENT, units, strict=True)
        ]
    )
    governing_v, low_v, high_v = (values * factors for values in arrays)
    length_factor = _factor("m", length_unit)
    z = stations * length_factor
    start, span = float(z[0]), float(z[-1] - z[0])
    scale = DIAGRAM_LENGTH / span

    def x_of(z_value: float) -> float:
        return (z_value - start) * scale

    svg = Svg(title="Internal-force diagrams along the member")
    obstacles = Obstacles()
    supports = [_support_mark(mark, length_factor) for mark in supports_m]
    loads = [_load_mark(mark, length_factor) for mark in loads_m]
    _draw_member_strip(svg, obstacles, (x_of(start), x_of(float(z[-1]))), supports, loads, x_of)

    shown = _components_shown(np.stack(arrays))
    top = STRIP_HEIGHT + 20.0
    top = _draw_legend(svg, obstacles, top, governing_name) + PANEL_GAP
    peaks: list[tuple[Point, float, float, str, bool]] = []
    for index in shown:
        panel = _Panel(_FORCE_SYMBOLS[index], unit_text(units[index]), top + LABEL_ROOM)
        panel.scale_values(governing_v[:, index], low_v[:, index], high_v[:, index])
        panel.draw(svg, obstacles, z, x_of, supports)
        peaks.extend(panel.peaks(z, x_of))
        top = panel.bottom + LABEL_ROOM + PANEL_GAP
    if not shown:
        svg.text(
            (DIAGRAM_LENGTH / 2, top + LABEL_ROOM),
            "No internal forces: every component is zero along the member.",
            size=SMALL_FONT_SIZE,
            fill=NOTE,
            css_class="note",
        )
        top += 2 * LABEL_ROOM
    length_text = unit_text(length_unit)
    top = _draw_station_scale(svg, obstacles, top, z, supports, loads, x_of, length_text)
    _draw_caption(svg, obstacles, top + 8)
    # Labels last: every line, symbol and text above is in place for them to keep clear of.
    for point, value, station, unit, above in peaks:
        _label_peak(svg, obstacles, point, value, station, unit, length_text, above)
    return svg.render()


# --- inputs ----------------------------------------------------------------------------


def _stations(stations_m: ArrayLike) -> NDArray[np.float64]:
    stations = np.asarray(stations_m, dtype=float)
    if stations.ndim != 1 or stations.size < 2 or not np.all(np.isfinite(stations)):
        raise InputError("diagram stations", stations.shape, "two or more finite stations (n,)")
    if np.any(np.diff(stations) < 0) or stations[-1] <= stations[0]:
        raise InputError("diagram stations", "not increasing", "stations increasing along z")
    return stations


def _forces(values: ArrayLike, name: str, count: int) -> NDArray[np.float64]:
    array = np.asarray(values, dtype=float)
    if array.shape != (count, len(FORCE_NAMES)) or not np.all(np.isfinite(array)):
        raise InputError(
            f"diagram {name}",
            array.shape,
            f"finite forces of shape ({count}, 6): N, Vx, Vy, T, Mx, My per station",
        )
    return array


def _factor(si_unit: str, unit: str) -> float:
    try:
        return float(Quantity(1.0, si_unit).to(unit).m)
    except (pint.errors.PintError, ValueError) as error:
        raise InputError("diagram unit", unit, f"a unit of the same kind as {si_unit}") from error


def _support_mark(mark: SupportMark, length_factor: float) -> tuple[float, str]:
    z, kind = (mark, "support") if isinstance(mark, int | float) else mark
    if kind not in SUPPORT_KINDS:
        raise InputError("diagram supports", kind, f"one of {', '.join(SUPPORT_KINDS)}")
    return float(z) * length_factor, kind


def _load_mark(mark: LoadMark, length_factor: float) -> tuple[float, str]:
    z, name = (mark, "") if isinstance(mark, int | float) else mark
    return float(z) * length_factor, str(name)


def _components_shown(arrays: NDArray[np.float64]) -> list[int]:
    """Indices of the components with a value that is not zero (round-off aside)."""
    largest = np.abs(arrays).max(axis=(0, 1))  # per component
    shown = []
    for index, moment in enumerate(_IS_MOMENT):
        of_kind = max(largest[i] for i, m in enumerate(_IS_MOMENT) if m == moment)
        if largest[index] > ZERO_SHARE * of_kind:
            shown.append(index)
    return shown


# --- one panel -------------------------------------------------------------------------


class _Panel:
    """One component's diagram: its vertical scale, geometry and peaks."""

    def __init__(self, name: str, unit: str, top: float) -> None:
        self.name = name
        self.unit = unit
        self.top = top

    def scale_values(self, governing: NDArray, low: NDArray, high: NDArray) -> None:
        """Fit the values into the panel height, zero included."""
        self.governing, self.low, self.high = governing, low, high
        largest = max(0.0, float(governing.max()), float(high.max()), float(low.max()))
        smallest = min(0.0, float(governing.min()), float(high.min()), float(low.min()))
        self.y_scale = PANEL_HEIGHT / (largest - smallest)
        self.axis_y = self.top + largest * self.y_scale
        self.bottom = self.top + PANEL_HEIGHT

    def y_of(self, value: float) -> float:
        """Paper y of a value (positive up)."""
        return self.axis_y - value * self.y_scale

    def draw(self, svg: Svg, obstacles: Obstacles, z: NDArray, x_of, supports) -> None:
        """Band, area, lines, axis, supports and the panel's name and envelope range."""
        xs = [x_of(float(value)) for value in z]
        high = _thinned([(x, self.y_of(v)) for x, v in zip(xs, self.high, strict=True)])
        low = _thinned([(x, self.y_of(v)) for x, v in zip(xs, self.low, strict=True)])
        curve = _thinned([(x, self.y_of(v)) for x, v in zip(xs, self.governing, strict=True)])
        left, right = xs[0], xs[-1]
        band = [*high, *reversed(low)]
        svg.rings([band], fill=ENVELOPE_FILL, stroke=None, css_class="envelope-band")
        area = [(left, self.axis_y), *curve, (right, self.axis_y)]
        svg.rings([area], fill=GOVERNING_FILL, stroke=None, css_class="governing-area")
        obstacles.add_region([np.array(band)])
        obstacles.add_region([np.array(area)])
        for edge in (high, low):
            _polyline(svg, obstacles, edge, stroke=DIMENSION, width=0.9, dash=ENVELOPE_DASH)
        svg.line((left, self.axis_y), (right, self.axis_y), stroke=INK, width=0.8)
        obstacles.add_line((left, self.axis_y), (right, self.axis_y))
        _polyline(svg, obstacles, curve, stroke=INK, width=1.5, css_class="governing")
        for z_support, kind in supports:
            _support_symbol(svg, obstacles, (x_of(z_support), self.axis_y), kind, AXIS_SUPPORT_SIZE)
        title = MarkedText(f"{{{self.name}}} ({self.unit})")
        at = (left - 12, self.axis_y)
        svg.text(at, title, size=SMALL_FONT_SIZE, anchor="end", bold=True, css_class="panel-title")
        obstacles.add_box(_box(at, title, "end"))
        # Round-off of an exact zero (1e-13 beside 3.85) is written as 0.
        noise = 1e-9 * max(float(np.abs(self.high).max()), float(np.abs(self.low).max()))
        high, low = float(self.high.max()), float(self.low.min())
        lines = (
            f"envelope max {value_text(high if abs(high) > noise else 0.0)}",
            f"envelope min {value_text(low if abs(low) > noise else 0.0)}",
        )
        for number_of_line, line in enumerate(lines):
            at = (right + 14, self.top + PANEL_HEIGHT / 2 + (number_of_line - 0.5) * 14)
            svg.text(
                at,
                line,
                size=SMALL_FONT_SIZE,
                anchor="start",
                fill=NOTE,
                css_class="envelope-range",
            )
            obstacles.add_box(_box(at, line, "start"))

    def peaks(self, z: NDArray, x_of) -> list[tuple[Point, float, float, str, bool]]:
        """The governing combination's largest (above) and smallest (below) value to label."""
        found = []
        span = PANEL_HEIGHT / self.y_scale  # the values' range in the panel's unit
        largest, smallest = int(np.argmax(self.governing)), int(np.argmin(self.governing))
        for index, above in ((largest, True), (smallest, False)):
            value = float(self.governing[index])
            if (value > 0) == above and abs(value) > ZERO_SHARE * span:
                point = (x_of(float(z[index])), self.y_of(value))
                found.append((point, value, float(z[index]), self.unit, above))
        return found


# A point closer than this (px) to the line through its neighbours adds nothing drawn.
THINNING_TOLERANCE = 0.05


def _thinned(points: Sequence[Point]) -> list[Point]:
    """The points without repeats and without points on a straight run between their
    neighbours (both sides of a station where nothing jumps, a linear shear diagram):
    the drawing is the same, the file a fraction of the size."""
    kept: list[Point] = []
    for point in points:
        if kept and math.isclose(point[0], kept[-1][0]) and math.isclose(point[1], kept[-1][1]):
            continue
        if len(kept) >= 2:
            (x0, y0), (x1, y1) = kept[-2], kept[-1]
            run = math.hypot(point[0] - x0, point[1] - y0)
            off = abs((point[0] - x0) * (y1 - y0) - (point[1] - y0) * (x1 - x0)) / run if run else 0
            between = min(x0, point[0]) <= x1 <= max(x0, point[0]) and min(
                y0, point[1]
            ) <= y1 <= max(y0, point[1])
            if off <= THINNING_TOLERANCE and between:
                kept[-1] = point
                continue
        kept.append(point)
    return kept


def _polyline(
    svg: Svg,
    obstacles: Obstacles,
    points: Sequence[Point],
    *,
    stroke: str,
    width: float,
    dash: str | None = None,
    css_class: str | None = None,
) -> None:
    """A polyline with a class (the builder's has none), kept clear of labels."""
    for x, y in points:
        svg.extend(x, y)
    svg.element(
        "polyline",
        {
            "class": css_class,
            "points": " ".join(f"{number(x)},{number(y)}" for x, y in points),
            "fill": "none",
            "stroke": stroke,
            "stroke-width": width,
            "stroke-dasharray": dash,
            "stroke-linejoin": "round",
        },
    )
    for start, end in itertools.pairwise(points):
        obstacles.add_line(start, end)


def _box(at: Point, text: str, anchor: str) -> Box:
    """The box of text drawn at ``at`` with ``anchor``."""
    shift = {"start": 0.5, "middle": 0.0, "end": -0.5}[anchor] * text_width(text, SMALL_FONT_SIZE)
    return text_box((at[0] + shift, at[1]), text, SMALL_FONT_SIZE)


def _label_peak(
    svg: Svg,
    obstacles: Obstacles,
    point: Point,
    value: float,
    station: float,
    unit: str,
    length_unit: str,
    above: bool,
) -> None:
    """A dot on the peak and its value and station beside it (a leader when set off)."""
    svg.circle(point, 2.4, fill=INK, css_class="peak")
    text = f"{value_text(value)} {unit} at z = {value_text(station)} {length_unit}"
    direction = (0.0, -1.0) if above else (0.0, 1.0)
    center, far = place_label(obstacles, point, direction, text, size=SMALL_FONT_SIZE)
    if far:
        edge_y = center[1] + (SMALL_FONT_SIZE / 2 if center[1] < point[1] else -SMALL_FONT_SIZE / 2)
        svg.line(point, (center[0], edge_y), stroke=DIMENSION, width=THIN)
    svg.text(center, text, size=SMALL_FONT_SIZE, bold=True, css_class="peak-label")


# --- member strip, symbols, legend, scale, caption ---------------------------------------


def _support_symbol(
    svg: Svg, obstacles: Obstacles, at: Point, kind: str, size: float, css_class: str = ""
) -> None:
    """A fixed end (a wall with hatching), a pin (triangle) or a roller (triangle on wheels)."""
    x, y = at
    half = size * 0.7
    if kind == "fixed":
        svg.line((x, y - size), (x, y + size), width=1.8, css_class=css_class or None)
        for step in range(4):
            y0 = y - size + step * size / 2
            svg.line((x, y0), (x - size / 2, y0 + size / 2), width=THIN)
        obstacles.add_box(Box(x - size / 2, y - size, x + 1, y + size))
        return
    svg.polygon([(x, y), (x - half, y + size), (x + half, y + size)], fill=PAPER, stroke=INK)
    bottom = y + size
    if kind == "roller":
        radius = size / 6
        for dx in (-half / 2, half / 2):
            svg.circle((x + dx, bottom + radius), radius, fill=PAPER, stroke=INK, width=0.8)
        bottom += 2 * radius
    svg.line((x - half - 2, bottom), (x + half + 2, bottom), width=1.0, css_class=css_class or None)
    obstacles.add_box(Box(x - half - 2, y, x + half + 2, bottom + 1))


def _draw_member_strip(
    svg: Svg,
    obstacles: Obstacles,
    ends: tuple[float, float],
    supports: Sequence[tuple[float, str]],
    loads: Sequence[tuple[float, str]],
    x_of,
) -> None:
    """The member as a line with its supports and the stations where loads act."""
    y = STRIP_HEIGHT / 2
    svg.line((ends[0], y), (ends[1], y), width=2.4, css_class="member")
    obstacles.add_line((ends[0], y), (ends[1], y))
    for z_support, kind in supports:
        _support_symbol(svg, obstacles, (x_of(z_support), y), kind, SUPPORT_SIZE, "support")
    for z_load, name in loads:
        x = x_of(z_load)
        svg.line((x, y - 14), (x, y), stroke=INK, width=1.0, css_class="load-station")
        svg.circle((x, y), 2.2, fill=INK)
        obstacles.add_line((x, y - 14), (x, y))
        if name:
            center, _ = place_label(obstacles, (x, y - 14), (0.0, -1.0), name, size=SMALL_FONT_SIZE)
            svg.text(center, name, size=SMALL_FONT_SIZE, css_class="load-name")


def _draw_legend(svg: Svg, obstacles: Obstacles, top: float, governing_name: str) -> float:
    """Swatches for the governing combination and the envelope; returns the y below them."""
    entries = (
        ("governing", f"governing combination{': ' + governing_name if governing_name else ''}"),
        ("envelope", "envelope of all combinations"),
    )
    x = 0.0
    y = top + SMALL_FONT_SIZE / 2
    for kind, text in entries:
        if kind == "governing":
            svg.rings(
                [[(x, y - 5), (x + 22, y - 5), (x + 22, y + 5), (x, y + 5)]],
                fill=GOVERNING_FILL,
                stroke=None,
            )
            svg.line((x, y - 5), (x + 22, y - 5), width=1.5)
        else:
            svg.rings(
                [[(x, y - 5), (x + 22, y - 5), (x + 22, y + 5), (x, y + 5)]],
                fill=ENVELOPE_FILL,
                stroke=None,
            )
            for edge in (y - 5, y + 5):
                svg.line((x, edge), (x + 22, edge), stroke=DIMENSION, width=0.9, dash="4 3")
        at = (x + 28, y)
        svg.text(at, text, size=SMALL_FONT_SIZE, anchor="start", css_class="legend")
        obstacles.add_box(Box(x, y - 6, at[0] + text_width(text, SMALL_FONT_SIZE), y + 6))
        x = at[0] + text_width(text, SMALL_FONT_SIZE) + 24
    return top + SMALL_FONT_SIZE


def _draw_station_scale(
    svg: Svg,
    obstacles: Obstacles,
    top: float,
    z: NDArray,
    supports: Sequence[tuple[float, str]],
    loads: Sequence[tuple[float, str]],
    x_of,
    length_unit: str,
) -> float:
    """A scale of stations under the panels (ends, supports, loads); returns the y below it."""
    left, right = x_of(float(z[0])), x_of(float(z[-1]))
    y = top + 4
    svg.line((left, y), (right, y), stroke=AXIS, width=THIN)
    obstacles.add_box(Box(left, y - 3, right, y + 3))
    marks = sorted({float(z[0]), float(z[-1]), *(s for s, _ in supports), *(s for s, _ in loads)})
    rows: list[list[Box]] = []
    for station in marks:
        x = x_of(station)
        svg.line((x, y - 3), (x, y + 3), stroke=AXIS, width=THIN)
        text = value_text(station)
        for row_number in range(6):  # the first row where it is free
            if row_number == len(rows):
                rows.append([])
            at = (x, y + 11 + row_number * (SMALL_FONT_SIZE + 2))
            box = text_box(at, text, SMALL_FONT_SIZE).padded(1.5)
            if not any(box.overlaps(other) for other in rows[row_number]):
                rows[row_number].append(box)
                obstacles.add_box(box)
                svg.text(at, text, size=SMALL_FONT_SIZE, fill=NOTE, css_class="station-tick")
                break
    below = y + 11 + len(rows) * (SMALL_FONT_SIZE + 2)
    name = f"z ({length_unit}), to scale"
    at = (right, below + 2)
    svg.text(at, name, size=SMALL_FONT_SIZE, anchor="end", fill=NOTE, css_class="scale-name")
    obstacles.add_box(_box(at, name, "end"))
    return below + 2 + SMALL_FONT_SIZE


def _draw_caption(svg: Svg, obstacles: Obstacles, top: float) -> None:
    """The sign convention under the figure, in lines of a readable length."""
    lines: list[str] = []
    for word in SIGN_CONVENTION.split():  # a line's length as read, marks left out
        if lines and len(plain_text(lines[-1])) + 1 + len(plain_text(word)) <= CAPTION_CHARACTERS:
            lines[-1] += " " + word
        else:
            lines.append(word)
    for number_of_line, line in enumerate(MarkedText(line) for line in lines):
        at = (0.0, top + number_of_line * (SMALL_FONT_SIZE + 3))
        svg.text(at, line, size=SMALL_FONT_SIZE, anchor="start", fill=NOTE, css_class="note")
        obstacles.add_box(_box(at, line, "start"))
