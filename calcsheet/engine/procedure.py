"""A procedure of a standard, written once and run by one of two writers.

A procedure (the member checks of a chapter, say) is a Python function of a
writer ``w``. It defines inputs, writes clauses and steps, settles the
Specification's decisions (which equation applies) and adds checks, only through
the writer:

* :class:`SheetWriter` prints it: every step lands on a :class:`~calcsheet.engine.Sheet`
  with its reference, decisions are settled from the values the sheet has now and
  said in words, and checks are sheet checks.
* :class:`ArrayWriter` evaluates it: symbols are numpy arrays in coherent SI base
  units, clauses run through :meth:`Clause.numeric`, a decision is taken element by
  element (``numpy.where``; every alternative is evaluated) and a check gives the
  array of its utilizations.

Because both run the same function, the sheet and the searches over load
combinations, stations and catalog sections cannot drift apart. The rules for
procedure authors:

* arithmetic on symbols (``+ - * / **``, comparisons in branch conditions) works in
  both writers; functions go through the writer (``absolute``, ``larger``, ``root``,
  ``branch``; ``any_of`` joins branch conditions);
* a decision the sheet settles when it is built is ``w.holds(a, op, b)`` combined
  with ``w.either``/``w.both``, then ``w.choose`` or a conditional candidate of
  ``w.smallest``; ``w.largest`` and ``w.smallest`` write governing steps;
* text that quotes values is written only when ``w.prints``.

The writers live with the engine because procedures of every stage use them (the
deflection of the analysis, the clauses of the standards); they know a clause only
by its ``write`` and ``numeric`` methods.
"""

from __future__ import annotations

import dataclasses
import functools
import math
import operator
from collections.abc import Callable, Mapping, Sequence
from dataclasses import dataclass, field
from typing import TYPE_CHECKING, Any

import numpy as np
import pint
import sympy as sp

from calcsheet.engine.functions import Abs, Max, Piecewise, sqrt
from calcsheet.engine.marked_text import escape_marks
from calcsheet.engine.parts import Check, Input
from calcsheet.engine.sheet import Sheet
from calcsheet.errors import DefinitionError
from calcsheet.units import Quantity, parse_quantity

if TYPE_CHECKING:
    # A clause of a standard: ``write`` prints it on a sheet, ``numeric`` evaluates it.
    from calcsheet.standards.clause import Clause

# A value in a procedure: a sheet symbol (or expression) or a numpy array in SI units.
Value = Any
# A decision: a bool (sheet) or a boolean array (arrays).
Flag = Any
_COMPARE = {"<": operator.lt, "<=": operator.le, ">": operator.gt, ">=": operator.ge}


@dataclass(frozen=True)
class Candidate:
    """A strength that may govern: its label, how to write it, and when it applies."""

    label: str
    write: Callable[[], Value]
    applies: Flag = True


@dataclass
class SheetWriter:
    """Writes a procedure on a sheet: cited steps, decisions in words, sheet checks."""

    sheet: Sheet
    method: str = ""
    prints = True
    symbols: dict[str, sp.Symbol] = field(default_factory=dict)
    checks: dict[str, Check] = field(default_factory=dict)
    # Steps evaluated but not printed, and no words: see :meth:`quietly`.
    quiet: bool = False

    def quietly(self) -> SheetWriter:
        """The same writer (sheet, symbols, checks) evaluating steps without printing them.

        For parts a sheet states in a table instead of step by step (the points of a
        section other than the governing ones, say): the values stay live.
        """
        return dataclasses.replace(self, quiet=True)

    # --- values ------------------------------------------------------------------------
    def unit(self, kind: str) -> str:
        """The sheet's display unit for ``kind`` (stress, force, moment, length)."""
        return self.sheet.units.preferred[kind]

    def __getitem__(self, name: str) -> sp.Symbol:
        return self.symbols[name]

    def input(
        self,
        name: str,
        value: pint.Quantity | float | str,
        description: str,
        *,
        reference: str = "",
        dimension: str | None = None,
        fixed: str = "",
        unit: str | None = None,
        computed: bool = False,
    ) -> sp.Symbol:
        """Define an input, or reuse the sheet's input of that name when it has this value
        (``computed``: see :meth:`Sheet.input`)."""
        try:
            existing = self.sheet[name]
        except KeyError:
            existing = None
        if existing is None:
            symbol = self.sheet.input(
                name,
                value,
                description,
                reference=reference,
                dimension=dimension,
                fixed=fixed,
                unit=unit,
                computed=computed,
            )
        elif isinstance(existing, Input) and _same(existing.value, value):
            if fixed and not existing.fixed:
                # The procedure settled decisions from this value: changing it
                # through set_input would leave them stale.
                existing.fixed = fixed
            symbol = existing.symbol
        else:
            raise DefinitionError(
                f"the sheet already defines {name!r} ({existing.value:~P}) but the "
                f"procedure needs {value} under that name"
            )
        self.symbols[name] = symbol
        return symbol

    def given(self, name: str, symbol: sp.Basic) -> sp.Basic:
        """A value the sheet already has (a demand written earlier), known by ``name``."""
        self.symbols[name] = symbol
        return symbol

    def step(self, name: str, expr: sp.Basic, description: str, **options: Any) -> sp.Symbol:
        """A step, remembered by name."""
        if self.quiet:
            options["shown"] = False
        symbol = self.sheet.step(name, expr, description, **options)
        self.symbols[name] = symbol
        return symbol

    def clause(
        self, clause: Clause, name: str, *args: sp.Basic, unit: str | None = None
    ) -> sp.Symbol:
        """A step written by a :class:`Clause`, remembered by name."""
        options = {"shown": False} if self.quiet else {}
        symbol = clause.write(self.sheet, name, *args, unit=unit, **options)
        self.symbols[name] = symbol
        return symbol

    def branch(
        self,
        name: str,
        cases: Sequence[tuple[Value, Any]],
        description: str,
        **options: Any,
    ) -> sp.Symbol:
        """A step whose expression depends on conditions: ``[(value, condition), ...]``."""
        return self.step(name, Piecewise(*cases), description, **options)

    def absolute(self, value: Value) -> sp.Basic:
        return Abs(value)

    def larger(self, a: Value, b: Value) -> sp.Basic:
        return Max(a, b)

    def root(self, value: Value) -> sp.Basic:
        return sqrt(value)

    @staticmethod
    def any_of(*conditions: Any) -> Any:
        """Branch conditions joined by "or", kept in the step (live, not settled now)."""
        return sp.Or(*conditions)

    # --- decisions -----------------------------------------------------------------------
    def value_of(self, value: Value) -> pint.Quantity | float:
        """The current value of a symbol (a plain number stays as it is)."""
        if isinstance(value, sp.Symbol):
            return self.sheet.value(value)
        if isinstance(value, sp.Number):
            return float(value)
        if isinstance(value, sp.Basic):
            return self.sheet.evaluate(value)
        return value

    def holds(self, a: Value, op: str, b: Value) -> bool:
        """Whether ``a op b`` holds for the current values (a decision settled now)."""
        self.sheet.note_decision(a, b)
        return bool(_COMPARE[op](self.value_of(a), self.value_of(b)))

    @staticmethod
    def either(*flags: Flag) -> bool:
        return any(bool(flag) for flag in flags)

    @staticmethod
    def both(*flags: Flag) -> bool:
        return all(bool(flag) for flag in flags)

    @staticmethod
    def negate(flag: Flag) -> bool:
        return not flag

    def choose(
        self, flag: Flag, then: Callable[[], Value], otherwise: Callable[[], Value]
    ) -> Value:
        """Write only the alternative that applies."""
        return then() if flag else otherwise()

    @staticmethod
    def label(flag: Flag, when_true: str, when_false: str) -> str:
        """A name or text that depends on a decision (arrays: ``when_false``)."""
        return when_true if flag else when_false

    @staticmethod
    def literal(text: object) -> str:
        """Text a user typed (a load's name) for a description or heading: shown as typed,
        its braces never read as symbol marks (:func:`~calcsheet.engine.escape_marks`)."""
        return escape_marks(text)

    def smallest(
        self, name: str, candidates: Sequence[Candidate], description: str, unit: str | None
    ) -> Value:
        """The smallest of the candidates that apply (one: that strength itself)."""
        written = [(c.label, c.write()) for c in candidates if c.applies]
        if len(written) == 1:
            return written[0][1]
        symbol = self.sheet.governing(name, written, description, largest=False, unit=unit)
        self.symbols[name] = symbol
        return symbol

    def largest(
        self,
        name: str,
        candidates: Sequence[tuple[str, Value]],
        description: str,
        *,
        unit: str | None = None,
        reference: str = "",
    ) -> Value:
        """The largest of labelled values, as a governing step (one: a step of it)."""
        if len(candidates) == 1:
            return self.step(name, candidates[0][1], description, unit=unit, reference=reference)
        symbol = self.sheet.governing(
            name, list(candidates), description, unit=unit, reference=reference
        )
        self.symbols[name] = symbol
        return symbol

    # --- words and checks ------------------------------------------------------------------
    def heading(self, text: str, level: int = 1) -> None:
        if not self.quiet:
            self.sheet.heading(text, level)

    def text(self, text: str) -> None:
        if not self.quiet:
            self.sheet.text(text)

    def check(
        self, key: str, title: str, demand: Value, capacity: Value, *, reference: str = ""
    ) -> Check:
        """A check of demand against capacity; its utilization is demand / capacity."""
        made = self.sheet.check(title, demand, capacity, reference=reference)
        self.checks[key] = made
        return made


@dataclass
class ArrayWriter:
    """Evaluates a procedure on numpy arrays in SI base units: no sheet, no words.

    ``given`` holds the arrays the caller supplies by name (section values of many
    sections with shape ``(n, 1)``, demands of many load cases with shape ``(m,)``);
    an :meth:`input` of that name takes the given array instead of its value.
    """

    given_values: Mapping[str, Any] = field(default_factory=dict)
    method: str = ""
    prints = False
    symbols: dict[str, Any] = field(default_factory=dict)
    checks: dict[str, np.ndarray] = field(default_factory=dict)

    def unit(self, kind: str) -> None:
        return None

    def __getitem__(self, name: str) -> Any:
        return self.symbols[name]

    def input(
        self,
        name: str,
        value: pint.Quantity | float | str,
        description: str = "",
        *,
        reference: str = "",
        dimension: str | None = None,
        fixed: str = "",
        unit: str | None = None,
        computed: bool = False,
    ) -> Any:
        """The given array of that name, or the value in SI base units."""
        result = self.given_values[name] if name in self.given_values else _si(value, dimension)
        self.symbols[name] = result
        return result

    def given(self, name: str, value: Any) -> Any:
        self.symbols[name] = value
        return value

    def step(self, name: str, expr: Any, description: str = "", **options: Any) -> Any:
        result = _number(expr)
        self.symbols[name] = result
        return result

    def clause(self, clause: Clause, name: str, *args: Any, unit: str | None = None) -> Any:
        result = clause.numeric(*(_number(arg) for arg in args))
        self.symbols[name] = result
        return result

    def branch(
        self, name: str, cases: Sequence[tuple[Any, Any]], description: str = "", **options: Any
    ) -> Any:
        conditions = [np.asarray(True if c is True else c, dtype=bool) for _, c in cases]
        values = [np.asarray(_number(v), dtype=float) for v, _ in cases]
        arrays = np.broadcast_arrays(*conditions, *values)
        result = np.select(arrays[: len(cases)], arrays[len(cases) :], default=np.nan)
        self.symbols[name] = result
        return result

    @staticmethod
    def absolute(value: Any) -> Any:
        return np.abs(value)

    @staticmethod
    def larger(a: Any, b: Any) -> Any:
        return np.maximum(a, b)

    @staticmethod
    def root(value: Any) -> Any:
        return np.sqrt(value)

    @staticmethod
    def any_of(*conditions: Any) -> Any:
        return functools.reduce(np.logical_or, (np.asarray(c, dtype=bool) for c in conditions))

    @staticmethod
    def value_of(value: Any) -> Any:
        return value

    @staticmethod
    def holds(a: Any, op: str, b: Any) -> np.ndarray:
        with np.errstate(invalid="ignore"):
            return np.asarray(_COMPARE[op](_number(a), _number(b)), dtype=bool)

    @staticmethod
    def either(*flags: Flag) -> np.ndarray:
        # reduce pairwise: flags of sections (n, 1) and of load cases (m,) broadcast
        return functools.reduce(np.logical_or, (np.asarray(flag, dtype=bool) for flag in flags))

    @staticmethod
    def both(*flags: Flag) -> np.ndarray:
        return functools.reduce(np.logical_and, (np.asarray(flag, dtype=bool) for flag in flags))

    @staticmethod
    def negate(flag: Flag) -> np.ndarray:
        return np.logical_not(flag)

    def choose(self, flag: Flag, then: Callable[[], Any], otherwise: Callable[[], Any]) -> Any:
        """Both alternatives where the flag differs between elements, else the one that applies."""
        flag = np.asarray(flag, dtype=bool)
        if flag.all():
            return then()
        if not flag.any():
            return otherwise()
        return np.where(flag, then(), otherwise())

    @staticmethod
    def label(flag: Flag, when_true: str, when_false: str) -> str:
        return when_false

    @staticmethod
    def literal(text: object) -> str:
        return str(text)

    def quietly(self) -> ArrayWriter:
        return self

    def smallest(
        self, name: str, candidates: Sequence[Candidate], description: str = "", unit: Any = None
    ) -> Any:
        values = []
        for candidate in candidates:
            applies = np.asarray(candidate.applies, dtype=bool)
            if not applies.any():
                continue
            values.append(np.where(applies, candidate.write(), np.inf))
        result = np.minimum.reduce(np.broadcast_arrays(*values)) if values else np.inf
        self.symbols[name] = result
        return result

    def largest(
        self,
        name: str,
        candidates: Sequence[tuple[str, Any]],
        description: str = "",
        *,
        unit: Any = None,
        reference: str = "",
    ) -> Any:
        values = [np.asarray(_number(value), dtype=float) for _, value in candidates]
        result = np.maximum.reduce(np.broadcast_arrays(*values))
        self.symbols[name] = result
        return result

    def heading(self, text: str, level: int = 1) -> None:
        return None

    def text(self, text: str) -> None:
        return None

    def check(
        self, key: str, title: str, demand: Any, capacity: Any, *, reference: str = ""
    ) -> np.ndarray:
        with np.errstate(divide="ignore", invalid="ignore"):
            ratio = np.asarray(_number(demand), dtype=float) / np.asarray(
                _number(capacity), dtype=float
            )
        self.checks[key] = ratio
        return ratio


Writer = SheetWriter | ArrayWriter


def _number(value: Any) -> Any:
    """Sympy numbers (constants written in a procedure) as floats; arrays as they are."""
    if isinstance(value, sp.Basic):
        if value is sp.true:
            return True
        if value is sp.false:
            return False
        return float(value)
    return value


def _si(value: pint.Quantity | float | str, dimension: str | None) -> float:
    if isinstance(value, str):
        value = parse_quantity(value, field="input", dimension=dimension)
    if isinstance(value, pint.Quantity):
        return float(value.to_base_units().m)
    if isinstance(value, sp.Basic):
        return float(value)
    return float(value)


def _same(existing: pint.Quantity, value: pint.Quantity | float | str) -> bool:
    if isinstance(value, str):
        return False
    try:
        other = value if isinstance(value, pint.Quantity) else Quantity(value)
        return math.isclose(float(existing.to(other.units).m), float(other.m), rel_tol=1e-9)
    except pint.DimensionalityError:
        return False
