"""Errors that reach the user: each says which field or step, what was given, what was expected.

Every stage raises one of these instead of letting a sympy, pint or parser error
escape, so that the form, the command line and the notebook can show one clear
line to the engineer.
"""

from __future__ import annotations


class CalcsheetError(Exception):
    """Base of every error calcsheet reports to a user."""

    def _render_traceback_(self) -> list[str]:
        # IPython calls this instead of printing a traceback: a notebook user sees
        # one clear line, as on the command line.
        return [f"{type(self).__name__}: {self}"]


class InputError(CalcsheetError, ValueError):
    """A value typed by a user (form field, job-file key, input of a calc) is not usable."""

    def __init__(self, field: str, value: object, expected: str, problem: str = "") -> None:
        self.field = field
        self.value = value
        self.expected = expected
        self.problem = problem
        shown = repr(value) if isinstance(value, str) else str(value)
        if len(shown) > 80:
            shown = shown[:77] + "..."
        detail = f" ({problem})" if problem else ""
        super().__init__(f"{field}: got {shown}{detail}; expected {expected}")


class DefinitionError(CalcsheetError):
    """A calc is written wrongly: a symbol used before it is defined, defined twice, a bad name."""


class DimensionError(CalcsheetError):
    """A step combines quantities whose dimensions do not agree."""


class EvaluationError(CalcsheetError):
    """A step cannot be evaluated for these values (root of a negative, no branch applies)."""


class ExportError(CalcsheetError):
    """An output could not be made or written: the PDF engine failed, a disk is full."""
