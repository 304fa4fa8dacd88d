"""The functions a step may use, re-exported from sympy so calc authors import one place.

Each works with units in :mod:`calcsheet.engine.evaluate`: trigonometric functions
take angles in deg or rad; ``sqrt`` of a quantity takes the root of its unit too;
``Min``/``Max`` compare quantities of one dimension; ``Piecewise`` chooses a branch
by conditions written with ``<``, ``<=``, ``>``, ``>=`` (``True`` for "otherwise").
"""

from sympy import (
    Abs,
    Max,
    Min,
    Piecewise,
    acos,
    asin,
    atan,
    atan2,
    cos,
    exp,
    log,
    pi,
    sin,
    sqrt,
    tan,
)

__all__ = [
    "Abs",
    "Max",
    "Min",
    "Piecewise",
    "acos",
    "asin",
    "atan",
    "atan2",
    "cos",
    "exp",
    "log",
    "pi",
    "sin",
    "sqrt",
    "tan",
]
