"""The figures' look in one place: line weights, greys, the stress palette, text sizes.

Clean black linework for the member and section, grey for dimensions and
construction lines, and two restrained hues for tension (warm) and compression
(cool). Text uses DejaVu Sans first: the PDF engine finds it on the system or
falls back to its own fonts, and browsers fall back to any sans-serif.
"""

from __future__ import annotations

FONT_FAMILY = "DejaVu Sans, Arial, Helvetica, sans-serif"
FONT_SIZE = 12.0
SMALL_FONT_SIZE = 10.5

INK = "#111111"
DIMENSION = "#6b6b6b"
AXIS = "#8a8a8a"
MATERIAL = "#e4e4e1"
PAPER = "#ffffff"
NOTE = "#444444"

OUTLINE_WIDTH = 1.3
THIN = 0.7
ARROW_LENGTH = 7.0
ARROW_HALF_WIDTH = 2.6

TENSION = (176, 74, 46)  # brick
COMPRESSION = (39, 95, 140)  # slate blue
NEUTRAL = (246, 244, 238)  # the pale end of both ramps
NEUTRAL_AXIS = "#1a1a1a"


def mix(colour: tuple[int, int, int], share: float) -> str:
    """``share`` of ``colour`` over the pale neutral, as #rrggbb (0 = neutral, 1 = colour)."""
    share = min(max(share, 0.0), 1.0)
    channels = (round(n + (c - n) * share) for c, n in zip(colour, NEUTRAL, strict=True))
    return "#" + "".join(f"{channel:02x}" for channel in channels)
