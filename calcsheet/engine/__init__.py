"""The calc engine: write a formula once; it computes with units and prints three ways.

Public API for calc authors (built-in calcs use nothing else)::

    from calcsheet.engine import Sheet, as_written
    from calcsheet.engine.functions import sqrt, sin, cos, tan, Min, Max, Abs, Piecewise
"""

from calcsheet.engine.marked_text import escape_marks
from calcsheet.engine.parts import (
    CAUTIONS,
    Check,
    CheckCases,
    CheckList,
    Figure,
    Heading,
    Input,
    Prose,
    Revision,
    Step,
    Table,
    TitleBlock,
    title_block_items,
)
from calcsheet.engine.printers import TARGETS, as_written
from calcsheet.engine.sheet import CheckText, Equation, Sheet

__all__ = [
    "CAUTIONS",
    "TARGETS",
    "Check",
    "CheckCases",
    "CheckList",
    "CheckText",
    "Equation",
    "Figure",
    "Heading",
    "Input",
    "Prose",
    "Revision",
    "Sheet",
    "Step",
    "Table",
    "TitleBlock",
    "as_written",
    "escape_marks",
    "title_block_items",
]
