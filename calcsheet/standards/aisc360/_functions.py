"""``Piecewise``, ``Min`` and ``Max`` built without sympy's evaluation.

The sheet builds clauses inside ``as_written()`` (no evaluation) already; the
numeric path builds them once more to lambdify them, and sympy's simplification
of conditions there costs tens of milliseconds per clause for nothing: the
branches are written to be read as they stand.
"""

from __future__ import annotations

import sympy as sp

from calcsheet.engine.functions import Max, Min, Piecewise


def cases(*branches: tuple[sp.Basic, sp.Basic | bool]) -> sp.Expr:
    """``Piecewise`` of (value, condition) pairs, the first true condition applies."""
    return Piecewise(*branches, evaluate=False)


def smallest(*args: sp.Basic) -> sp.Expr:
    """``Min`` of the arguments, as written."""
    return Min(*args, evaluate=False)


def largest(*args: sp.Basic) -> sp.Expr:
    """``Max`` of the arguments, as written."""
    return Max(*args, evaluate=False)
