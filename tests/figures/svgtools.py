"""Reading the figures back: parse the SVG, find elements by class, pull out coordinates."""

from __future__ import annotations

import re
import xml.etree.ElementTree as ET

from calcsheet.figures.labels import Box
from calcsheet.figures.svg import text_width

SVG = "{http://www.w3.org/2000/svg}"
NUMBER = re.compile(r"-?\d+(?:\.\d+)?")


def parse(svg: str) -> ET.Element:
    """The root element; fails the test when the SVG is not well-formed XML."""
    root = ET.fromstring(svg)
    assert root.tag == f"{SVG}svg"
    return root


def by_class(root: ET.Element, name: str) -> list[ET.Element]:
    """Every element whose class is ``name``."""
    return [element for element in root.iter() if element.get("class") == name]


def path_points(element: ET.Element) -> list[tuple[float, float]]:
    """The (x, y) pairs of a path made of M, L and Z commands."""
    values = [float(text) for text in NUMBER.findall(element.get("d", ""))]
    return list(zip(values[0::2], values[1::2], strict=True))


def line_ends(element: ET.Element) -> tuple[tuple[float, float], tuple[float, float]]:
    """The two ends of a <line>."""
    return (
        (float(element.get("x1")), float(element.get("y1"))),
        (float(element.get("x2")), float(element.get("y2"))),
    )


def texts(root: ET.Element) -> list[str]:
    """The words of every <text> (a symbol's <tspan> pieces joined: "ey = 2 in"), in order."""
    return ["".join(element.itertext()) for element in root.iter(f"{SVG}text")]


def drawn_width(element: ET.Element) -> float:
    """The width of a <text> as the figure code estimates it: each piece (a <tspan>, a
    symbol's smaller subscript) at its own font size."""
    size = float(element.get("font-size", "0"))
    width = text_width(element.text or "", size)
    for piece in element.iter(f"{SVG}tspan"):
        width += text_width(piece.text or "", float(piece.get("font-size", size)))
        width += text_width(piece.tail or "", size)
    return width


def text_boxes(root: ET.Element) -> list[tuple[str, Box]]:
    """Each horizontal text's words and its box as the figure code estimates it
    (:func:`calcsheet.figures.svg.text_width`); turned texts (a vertical dimension or
    axis title) are left out."""
    boxes = []
    for element in root.iter(f"{SVG}text"):
        if element.get("transform"):
            continue
        words = "".join(element.itertext())
        size = float(element.get("font-size", "0"))
        width = drawn_width(element)
        x, middle = float(element.get("x", "0")), float(element.get("y", "0")) - 0.35 * size
        start = {"start": 0.0, "middle": -width / 2, "end": -width}[
            element.get("text-anchor", "start")
        ]
        boxes.append(
            (words, Box(x + start, middle - size / 2, x + start + width, middle + size / 2))
        )
    return boxes
