"""A tiny deterministic SVG builder: elements as strings, every value escaped.

Drawings are built in paper units (px, y down) and the builder keeps the
bounding box of everything drawn, text included (estimated from the character
count), so the ``viewBox`` always fits the drawing and no label is clipped.
Numbers are written with a fixed number of decimals, and nothing random or
time-dependent goes in, so the same figure is the same string on every run.
There are no scripts, ids or external references: a figure is inlined into HTML
and embedded in the PDF as it is, and two figures on one page cannot clash.
"""

from __future__ import annotations

import html
import math
import re
from collections.abc import Iterable, Sequence
from typing import NamedTuple

from calcsheet.engine.marked_text import MarkedText, marked_pieces
from calcsheet.engine.names import NamePart, parse_symbol_name
from calcsheet.figures.style import FONT_FAMILY, FONT_SIZE, INK

SVG_NAMESPACE = "http://www.w3.org/2000/svg"
DECIMALS = 2
# Average advance width of DejaVu Sans (and of the usual sans-serif fallbacks) in em;
# slightly generous so an estimated box holds the real text.
CHARACTER_WIDTH = 0.62
# XML 1.0 forbids these characters even when escaped; user text loses them.
_NOT_XML = re.compile(r"[\x00-\x08\x0b\x0c\x0e-\x1f\ufffe\uffff]")

Point = tuple[float, float]


_FIXED = f".{DECIMALS}f"
_ZEROS = frozenset((format(0.0, _FIXED), format(-0.0, _FIXED)))


def number(value: float) -> str:
    """A coordinate with fixed decimals; never "-0.00" (so output does not depend on signs of 0)."""
    text = format(value, _FIXED)
    return "0" if text in _ZEROS else text.rstrip("0").rstrip(".")


def clean_text(text: object) -> str:
    """User text made safe to escape into XML: characters XML cannot hold are dropped."""
    return _NOT_XML.sub("", str(text))


# A symbol's subscript as the sheet's math sets it: smaller, below the baseline.
SUBSCRIPT_SCALE = 0.72
SUBSCRIPT_DROP = 0.3  # em of the label's size


def text_width(text: str, size: float = FONT_SIZE) -> float:
    """Estimated width of ``text`` at ``size`` px as drawn (a :class:`MarkedText`'s
    subscripts smaller), for layout and the bounding box."""
    return sum(
        CHARACTER_WIDTH * size * (SUBSCRIPT_SCALE if run.subscript else 1.0) * len(run.text)
        for run in text_runs(text)
    )


class Run(NamedTuple):
    """A stretch of a label drawn in one style."""

    text: str
    italic: bool = False
    subscript: bool = False


def text_runs(text: str) -> list[Run]:
    """A label as runs: plain text is one run, shown as it is; a :class:`MarkedText`
    draws each ``{symbol}`` as the sheet's equations set it (a letter italic, a word
    upright, the subscripts smaller and lowered: ``{e_y}`` is e with subscript y)."""
    if not isinstance(text, MarkedText):
        return [Run(clean_text(text))] if text else []
    runs: list[Run] = []
    for is_symbol, content in marked_pieces(text):
        if not is_symbol:
            runs.append(Run(content))
            continue
        name = parse_symbol_name(content)
        runs.append(_symbol_run(name.base))
        for index, part in enumerate(name.subscripts):
            if index:
                runs.append(Run(",", subscript=True))
            runs.append(_symbol_run(part, subscript=True))
    return runs


def _symbol_run(part: NamePart, *, subscript: bool = False) -> Run:
    if part.greek is not None:
        return Run(part.greek, italic=True, subscript=subscript)
    italic = not part.upright and not part.text.isdigit()
    return Run(part.text, italic=italic, subscript=subscript)


def _text_content(runs: list[Run], size: float) -> str:
    """The runs as the character data of one ``<text>``: plain runs as they are, others
    in ``<tspan>``s; a subscript moves down by ``dy`` and the run after it back up (``dy``
    rather than ``baseline-shift``, which not every SVG renderer honours)."""
    drop = SUBSCRIPT_DROP * size
    out = []
    lowered = False
    for run in runs:
        attributes = {}
        if run.subscript != lowered:
            attributes["dy"] = number(drop if run.subscript else -drop)
            lowered = run.subscript
        if run.subscript:
            attributes["font-size"] = number(SUBSCRIPT_SCALE * size)
        if run.italic:
            attributes["font-style"] = "italic"
        content = escape(clean_text(run.text))
        if not attributes:
            out.append(content)
            continue
        attrs = "".join(f' {name}="{value}"' for name, value in attributes.items())
        out.append(f"<tspan{attrs}>{content}</tspan>")
    return "".join(out)


def escape(text: str) -> str:
    """Text as XML character data: ``&``, ``<`` and ``>`` escaped.

    The standard library's own (``html.escape``) rather than ``xml.sax.saxutils``,
    whose import pulls in the HTTP client: a tenth of a cold start's imports.
    """
    return html.escape(text, quote=False)


def quoteattr(text: str) -> str:
    """Text as a double-quoted XML attribute value (quotes escaped too)."""
    return f'"{html.escape(text, quote=True)}"'


def _attribute(value: object) -> str:
    if isinstance(value, float | int) and not isinstance(value, bool):
        return f'"{number(float(value))}"'  # digits, sign and point: nothing to escape
    return quoteattr(clean_text(value))


class Svg:
    """Collects elements and their extent; :meth:`render` writes the document."""

    def __init__(self, title: str = "") -> None:
        self.title = title
        self._elements: list[str] = []
        self.x_min = self.y_min = math.inf
        self.x_max = self.y_max = -math.inf

    # --- extent -------------------------------------------------------------------

    def extend(self, x: float, y: float) -> None:
        """Grow the drawing's extent to include (x, y)."""
        self.x_min, self.x_max = min(self.x_min, x), max(self.x_max, x)
        self.y_min, self.y_max = min(self.y_min, y), max(self.y_max, y)

    def _extend_all(self, points: Iterable[Point]) -> None:
        for x, y in points:
            self.extend(x, y)

    # --- elements -----------------------------------------------------------------

    def element(self, tag: str, attributes: dict[str, object], content: str | None = None) -> None:
        """Append ``<tag .../>``; attribute values are escaped, ``content`` must be escaped."""
        attrs = "".join(
            f" {name}={_attribute(value)}"
            for name, value in attributes.items()
            if value is not None
        )
        if content is None:
            self._elements.append(f"<{tag}{attrs}/>")
        else:
            self._elements.append(f"<{tag}{attrs}>{content}</{tag}>")

    def line(
        self,
        start: Point,
        end: Point,
        *,
        stroke: str = INK,
        width: float = 1.0,
        dash: str | None = None,
        css_class: str | None = None,
    ) -> None:
        """A straight line from ``start`` to ``end``."""
        self._extend_all((start, end))
        self.element(
            "line",
            {
                "class": css_class,
                "x1": start[0],
                "y1": start[1],
                "x2": end[0],
                "y2": end[1],
                "stroke": stroke,
                "stroke-width": width,
                "stroke-dasharray": dash,
                "stroke-linecap": "butt",
            },
        )

    def polyline(
        self,
        points: Sequence[Point],
        *,
        stroke: str = INK,
        width: float = 1.0,
        dash: str | None = None,
    ) -> None:
        """An open chain of straight segments."""
        self._extend_all(points)
        self.element(
            "polyline",
            {
                "points": " ".join(f"{number(x)},{number(y)}" for x, y in points),
                "fill": "none",
                "stroke": stroke,
                "stroke-width": width,
                "stroke-dasharray": dash,
                "stroke-linejoin": "round",
            },
        )

    def polygon(
        self,
        points: Sequence[Point],
        *,
        fill: str = INK,
        stroke: str | None = None,
        width: float = 1.0,
    ) -> None:
        """A closed, filled polygon (arrowheads, swatches)."""
        self._extend_all(points)
        self.element(
            "polygon",
            {
                "points": " ".join(f"{number(x)},{number(y)}" for x, y in points),
                "fill": fill,
                "stroke": stroke or "none",
                "stroke-width": width if stroke else None,
                "stroke-linejoin": "miter" if stroke else None,
            },
        )

    def rings(
        self,
        rings: Sequence[Sequence[Point]],
        *,
        fill: str = "none",
        stroke: str | None = INK,
        width: float = 1.0,
        css_class: str | None = None,
        extend: bool = True,
    ) -> None:
        """Closed rings as one path (holes cut out by the even-odd rule)."""
        pieces = []
        for ring in rings:
            if len(ring) < 3:
                continue
            if extend:
                self._extend_all(ring)
            head, *rest = ring
            steps = " ".join(f"L{number(x)} {number(y)}" for x, y in rest)
            pieces.append(f"M{number(head[0])} {number(head[1])} {steps} Z")
        if not pieces:
            return
        self.element(
            "path",
            {
                "class": css_class,
                "d": " ".join(pieces),
                "fill": fill,
                "fill-rule": "evenodd",
                "stroke": stroke or "none",
                "stroke-width": width if stroke else None,
                "stroke-linejoin": "miter" if stroke else None,
            },
        )

    def path(self, d: str, points: Iterable[Point], *, stroke: str = INK, width: float = 1.0):
        """A stroked path given as path data; ``points`` bound it for the extent."""
        self._extend_all(points)
        self.element("path", {"d": d, "fill": "none", "stroke": stroke, "stroke-width": width})

    def circle(
        self,
        center: Point,
        radius: float,
        *,
        fill: str = INK,
        stroke: str | None = None,
        width: float = 1.0,
        css_class: str | None = None,
    ) -> None:
        """A circle (stress points, the centroid mark, pin holes)."""
        x, y = center
        self._extend_all(((x - radius, y - radius), (x + radius, y + radius)))
        self.element(
            "circle",
            {
                "class": css_class,
                "cx": x,
                "cy": y,
                "r": radius,
                "fill": fill,
                "stroke": stroke or "none",
                "stroke-width": width if stroke else None,
            },
        )

    def text(
        self,
        position: Point,
        content: str,
        *,
        size: float = FONT_SIZE,
        anchor: str = "middle",
        fill: str = INK,
        italic: bool = False,
        bold: bool = False,
        vertical: bool = False,
        css_class: str | None = None,
    ) -> None:
        """Text whose vertical centre is at ``position`` (``vertical`` reads bottom to top);
        ``content`` shows as it is, a :class:`MarkedText` with its symbols typeset.

        The baseline is placed from the font size rather than with
        ``dominant-baseline``, which not every SVG renderer honours.
        """
        x, y = position
        runs = text_runs(content)
        width = text_width(content, size)
        start = {"start": 0.0, "middle": -width / 2, "end": -width}[anchor]
        if vertical:  # turned -90° about (x, y): the text runs upward, centred on x
            self._extend_all(((x - size / 2, y - start - width), (x + size / 2, y - start)))
            transform = f"rotate(-90 {number(x)} {number(y)})"
        else:
            self._extend_all(((x + start, y - size / 2), (x + start + width, y + size / 2)))
            transform = None
        self.element(
            "text",
            {
                "class": css_class,
                "x": x,
                "y": y + 0.35 * size,
                "font-size": size,
                "text-anchor": anchor,
                "font-style": "italic" if italic else None,
                "font-weight": "bold" if bold else None,
                "fill": fill,
                "transform": transform,
            },
            _text_content(runs, size),
        )

    # --- document -----------------------------------------------------------------

    def render(self, margin: float = 6.0) -> str:
        """The SVG document, sized to what was drawn plus ``margin`` px all round."""
        if not self._elements:
            self.extend(0.0, 0.0)
        left, top = self.x_min - margin, self.y_min - margin
        width = self.x_max - self.x_min + 2 * margin
        height = self.y_max - self.y_min + 2 * margin
        root = {
            "xmlns": SVG_NAMESPACE,
            "viewBox": f"{number(left)} {number(top)} {number(width)} {number(height)}",
            "width": number(width),
            "height": number(height),
            "role": "img",
            "font-family": FONT_FAMILY,
            "style": "max-width: 100%; height: auto",
        }
        attrs = "".join(f" {name}={quoteattr(value)}" for name, value in root.items())
        title = f"<title>{escape(clean_text(self.title))}</title>" if self.title else ""
        body = "\n".join(self._elements)
        return f"<svg{attrs}>{title}\n{body}\n</svg>"
