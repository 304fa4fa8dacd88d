"""SVG figures drawn to scale, for the HTML and the PDF of a sheet.

* :func:`section_figure`: the cross-section with its axes, dimensions and stress points;
* :func:`member_figure`: the cantilever in elevation with its loads, and an end view;
* :func:`normal_stress_figure`: the normal stress over the section, with the neutral axis.

Each returns one self-contained SVG string (no scripts, ids or external
references), the same string for the same input, ready for ``Sheet.figure``.
"""

from calcsheet.figures.member import member_figure
from calcsheet.figures.section import section_figure
from calcsheet.figures.stress import normal_stress_figure

__all__ = ["member_figure", "normal_stress_figure", "section_figure"]
