"""A line chart of utilization against load angle (the load-direction sweep).

Plain axes with a grid every 45°, the limit line at 1.0, the angle drawn on the
sheet marked and the worst angle named, all in the figures' own style.
"""

from __future__ import annotations

import itertools
from collections.abc import Sequence

from calcsheet.engine.marked_text import MarkedText
from calcsheet.figures.labels import Obstacles, place_label, text_box
from calcsheet.figures.style import AXIS, DIMENSION, INK, NOTE, SMALL_FONT_SIZE, TENSION
from calcsheet.figures.svg import Svg, text_width

WIDTH = 520.0
HEIGHT = 220.0


def sweep_chart(
    angles_deg: Sequence[float],
    utilizations: Sequence[float],
    *,
    drawn: tuple[float, float],
    title: str,
) -> str:
    """SVG of utilization against the load angle, with the drawn and the worst angle marked.

    ``drawn`` is the angle drawn on the sheet and its utilization, as the caller found it.
    """
    values = [float(value) for value in utilizations]
    angles = [float(angle) for angle in angles_deg]
    top = max(1.2, max(values) * 1.1)
    svg = Svg(title=title)

    def at(angle: float, value: float) -> tuple[float, float]:
        span = (angles[-1] - angles[0]) or 1.0
        return ((angle - angles[0]) / span * WIDTH, HEIGHT - value / top * HEIGHT)

    # The two marks' labels keep clear of the axes, the tick labels, the curve and
    # each other (a worst angle next to the drawn one put one label on the other).
    obstacles = Obstacles()

    def text(position: tuple[float, float], words: str, **options: object) -> None:
        svg.text(position, words, size=SMALL_FONT_SIZE, **options)  # type: ignore[arg-type]
        anchor = options.get("anchor", "middle")
        shift = {"start": 0.5, "middle": 0.0, "end": -0.5}[str(anchor)]
        width = text_width(words, SMALL_FONT_SIZE)
        obstacles.add_box(
            text_box((position[0] + shift * width, position[1]), words, SMALL_FONT_SIZE)
        )

    def line(start: tuple[float, float], end: tuple[float, float], **options: object) -> None:
        svg.line(start, end, **options)  # type: ignore[arg-type]
        obstacles.add_line(start, end)

    line((0, HEIGHT), (WIDTH, HEIGHT), stroke=INK, width=1.0)
    line((0, 0), (0, HEIGHT), stroke=INK, width=1.0)
    step = 45.0
    tick = angles[0]
    while tick <= angles[-1] + 1e-9:
        x, _ = at(tick, 0)
        svg.line((x, 0), (x, HEIGHT), stroke=AXIS, width=0.4, dash="2 3")
        text((x, HEIGHT + 12), f"{tick:g}°", fill=NOTE)
        tick += step
    for level in _levels(top):
        _, y = at(angles[0], level)
        svg.line((0, y), (WIDTH, y), stroke=AXIS, width=0.4, dash="2 3")
        text((-6, y), f"{level:g}", anchor="end", fill=NOTE)
    _, limit_y = at(angles[0], 1.0)
    line((0, limit_y), (WIDTH, limit_y), stroke=TENSION_HEX, width=1.2, dash="6 3")
    text((WIDTH - 2, limit_y - 8), "limit 1.0", anchor="end")
    curve = [at(a, v) for a, v in zip(angles, values, strict=True)]
    svg.polyline(curve, stroke=INK, width=1.6)
    for start, end in itertools.pairwise(curve):
        obstacles.add_line(start, end)
    worst = max(range(len(values)), key=values.__getitem__)
    drawn_deg, drawn_value = drawn
    marks = (
        (at(angles[worst], values[worst]), f"worst {angles[worst]:g}°: {values[worst]:.3f}", -1),
        (at(drawn_deg, drawn_value), f"drawn {drawn_deg:g}°: {drawn_value:.3f}", 1),
    )
    for point, _, _ in marks:
        svg.circle(point, 3.2, fill=INK)
        obstacles.add_box(text_box(point, "o", 7.0))
    for point, label, upward in marks:
        centre, _ = place_label(obstacles, point, (0.0, 12.0 * upward), label, size=SMALL_FONT_SIZE)
        svg.text(centre, label, size=SMALL_FONT_SIZE, fill=DIMENSION, bold=True)
    svg.text(
        (WIDTH / 2, HEIGHT + 28), MarkedText("load angle {theta}"), size=SMALL_FONT_SIZE, fill=NOTE
    )
    svg.text((-34, HEIGHT / 2), "utilization", size=SMALL_FONT_SIZE, fill=NOTE, vertical=True)
    return svg.render()


TENSION_HEX = "#{:02x}{:02x}{:02x}".format(*TENSION)


def _levels(top: float) -> list[float]:
    step = 0.25 if top <= 1.5 else 0.5 if top <= 3 else 1.0 if top <= 6 else round(top / 5)
    levels, value = [], step
    while value < top:
        levels.append(round(value, 6))
        value += step
    return levels
