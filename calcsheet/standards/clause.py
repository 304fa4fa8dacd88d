"""A clause or equation of a standard, written once as a sympy expression.

A :class:`Clause` wraps a function that builds the equation's right-hand side
from symbols. The same expression

* prints on a sheet as a step with the clause as its reference
  (:meth:`Clause.write`), evaluated with units by the engine; and
* evaluates fast on numpy arrays for searches over many sections or load cases
  (:meth:`Clause.numeric`), through :func:`sympy.lambdify` of that very
  expression, with every argument in coherent SI base units.

Rule for clause authors: every dimensional constant (E, G, a limit stress) is an
argument, never a number inside the expression, so the numeric path needs no
unit handling and the printed step shows where each value comes from.
"""

from __future__ import annotations

import hashlib
import inspect
from collections.abc import Callable
from dataclasses import dataclass, field
from functools import cached_property
from typing import Any

import numpy as np
import sympy as sp

from calcsheet.engine import Sheet, as_written

# Every clause made, so that their numeric functions can be written out as code once
# (:mod:`calcsheet.standards.write_clause_code`) instead of lambdified in each process.
ALL_CLAUSES: list[Clause] = []


@dataclass(frozen=True)
class Clause:
    """One clause or equation: its reference, what it gives, and how to build it."""

    reference: str
    description: str
    build: Callable[..., sp.Expr] = field(repr=False)

    def __post_init__(self) -> None:
        ALL_CLAUSES.append(self)

    def __call__(self, *args: sp.Basic) -> sp.Expr:
        """The right-hand side built from the caller's symbols (as written)."""
        with as_written():
            return self.build(*args)

    def write(
        self, sheet: Sheet, name: str, *args: sp.Symbol, unit: str | None = None, **options: Any
    ) -> sp.Symbol:
        """Add ``name = <clause>(args)`` to ``sheet`` as a step citing the clause."""
        return sheet.step(
            name, self(*args), self.description, reference=self.reference, unit=unit, **options
        )

    @cached_property
    def parameters(self) -> tuple[str, ...]:
        """The argument names of the builder, in order."""
        return tuple(inspect.signature(self.build).parameters)

    @cached_property
    def placeholder_expression(self) -> sp.Expr:
        """The expression over real symbols named as the builder's arguments.

        Built with sympy's usual evaluation, whatever the caller's ``as_written`` state,
        so that its key and its numeric code never depend on where it is first asked.
        """
        with sp.evaluate(True):
            return self.build(*(sp.Symbol(name, real=True) for name in self.parameters))

    @cached_property
    def code_key(self) -> str:
        """Names this clause's expression and arguments: a changed formula gets a new key."""
        text = f"{self.parameters}|{sp.srepr(self.placeholder_expression)}"
        return hashlib.sha256(text.encode()).hexdigest()[:20]

    @cached_property
    def written_key(self) -> str:
        """Names this clause's builder as written: its name, source text and closure values.

        Found without building the expression (sympy work that cost a tenth of a
        second a process), so a cold build looks its numeric code up cheaply. A builder
        edited since the code was written gets a new key and falls back to lambdify; a
        change in a helper it calls changes :attr:`code_key` instead, which the test of
        the written module catches.
        """
        build = self.build
        closure = tuple(repr(cell.cell_contents) for cell in build.__closure__ or ())
        text = f"{build.__module__}.{build.__qualname__}|{inspect.getsource(build)}|{closure}"
        return hashlib.sha256(text.encode()).hexdigest()[:20]

    @cached_property
    def _numeric_function(self) -> Callable[..., Any]:
        # The expression written out as numpy code (reviewed, in the package) is the same
        # printer's output as lambdify's; a clause changed since it was written falls back.
        from calcsheet.standards.clause_code import FUNCTIONS

        written = FUNCTIONS.get(self.written_key)
        if written is not None:
            return written
        placeholders = [sp.Symbol(name, real=True) for name in self.parameters]
        return sp.lambdify(placeholders, self.placeholder_expression, modules="numpy")

    def numeric(self, *args: Any) -> np.ndarray:
        """Evaluate on floats or numpy arrays given in coherent SI base units."""
        # As numpy values, so a division by zero in a branch that does not apply gives
        # inf or nan (then not selected) rather than Python's ZeroDivisionError.
        values = [np.asarray(arg, dtype=float) for arg in args]
        with np.errstate(divide="ignore", invalid="ignore"):
            result = self._numeric_function(*values)
        return np.broadcast_to(result, np.broadcast_shapes(*(np.shape(a) for a in values)))


def clause(reference: str, description: str) -> Callable[[Callable[..., sp.Expr]], Clause]:
    """Decorator: ``@clause("AISC 360-22 Eq. D2-1", "Tensile yielding")`` over a builder."""

    def wrap(build: Callable[..., sp.Expr]) -> Clause:
        made = Clause(reference, description, build)
        object.__setattr__(made, "__doc__", build.__doc__)
        return made

    return wrap
