"""The Sheet: an ordered calc of inputs, steps and checks, evaluated with units.

Typical use, the same for built-in calcs and for a calc of one's own::

    sheet = Sheet("Bracket check", units="US")
    with sheet:                         # keep products in the order written
        P = sheet.input("P", "6.5 kip", "Applied load", dimension="force")
        A = sheet.input("A", "7.58 in^2", "Area", dimension="area")
        f_a = sheet.step("f_a", P / A, "Axial stress", unit="ksi")

Every step is evaluated when it is added, so a wrong unit fails at once with a
message naming the step. Changing an input (:meth:`Sheet.set_input`)
re-evaluates every step and re-fills the printed values, without re-printing the
symbolic forms.
"""

from __future__ import annotations

import math
from collections.abc import Callable, Iterable, Iterator, Sequence
from contextlib import ExitStack
from dataclasses import dataclass
from functools import lru_cache

import pint
import sympy as sp

from calcsheet.engine.evaluate import chosen_branch, evaluate, sum_closes_to_zero
from calcsheet.engine.functions import Max, Min
from calcsheet.engine.names import parse_symbol_name
from calcsheet.engine.parts import (
    Check,
    CheckCases,
    Figure,
    Heading,
    Input,
    Part,
    Prose,
    Revision,
    Step,
    Table,
    TitleBlock,
)
from calcsheet.engine.printers import PRINTERS, Quantityish, _ExpressionPrinter, as_written
from calcsheet.errors import DefinitionError, DimensionError, EvaluationError, InputError
from calcsheet.units import (
    DEFAULT_STYLE,
    NumberStyle,
    UnitSystem,
    describe_dimension,
    format_as_typed,
    format_count,
    format_number,
    linear_factor,
    parse_quantity,
    parse_unit,
    unit_factors,
    unit_system,
    ureg,
)

_ANGLE_UNITS = {"radian", "degree"}
_NO_UNIT = ureg.dimensionless


@dataclass(frozen=True)
class Equation:
    """A step printed for one target: the symbol, the symbolic form, the numbers, the result.

    ``substituted`` is ``None`` when it would only repeat the result (a step that
    copies a symbol or a number).
    """

    target: str
    symbol: str
    symbolic: str | None
    substituted: str | None
    result: str
    printer: _ExpressionPrinter

    def chain(self) -> str:
        """``symbol = symbolic = substituted = result`` in the target's markup."""
        pieces = [self.symbol]
        pieces += [piece for piece in (self.symbolic, self.substituted) if piece is not None]
        pieces.append(self.result)
        return self.printer.chain(pieces)

    def stacked(self, result_beside: bool = False) -> str:
        """The same chain one piece per line, equals signs aligned (for long equations);
        ``result_beside`` sets the result on the line of the numbers (``= 1.2 · 3 kip =
        3.6 kip``), a line shorter, when that line fits."""
        pieces = [self.symbol]
        pieces += [piece for piece in (self.symbolic, self.substituted) if piece is not None]
        pieces.append(self.result)
        if result_beside and self.substituted is not None:
            pieces[-2:] = [self.printer.chain(pieces[-2:])]
        if len(pieces) < 3:
            return self.chain()
        return self.printer.stacked(pieces)


@dataclass(frozen=True)
class CheckText:
    """A check printed for one target: demand vs capacity in symbols and in numbers."""

    symbolic: str
    numeric: str
    utilization: str
    worst: str = ""  # the worst utilization over the check's cases (see Check.cases)


class Sheet:
    """An ordered calc of headings, prose, inputs, steps, checks and figures."""

    def __init__(
        self,
        title: str = "",
        *,
        units: str | UnitSystem = "US",
        number_style: NumberStyle = DEFAULT_STYLE,
        title_block: TitleBlock | None = None,
    ) -> None:
        self.title = title
        self.title_block = title_block or TitleBlock(subject=title)
        self.units = unit_system(units)
        self.number_style = number_style
        self.parts: list[Part] = []
        self._defined: dict[str, Input | Step] = {}
        self._values: dict[sp.Symbol, pint.Quantity] = {}
        self._shown: dict[sp.Symbol, Quantityish] = {}
        self._templates: dict[tuple[int, str], tuple] = {}
        self._printers: dict[str, tuple[_ExpressionPrinter, _ExpressionPrinter]] = {}
        self._written_order = ExitStack()
        self.revisions: list[Revision] = []
        self.basis: dict[str, list[str]] = {}
        self.references: list[str] = []
        # The trace line: what produced this sheet (inputs hash, revision), printed on every
        # page beside the tool version. Not "stamp": that is the engineer's seal.
        self.trace: str = ""
        # Symbols whose values settled a decision when the calc was written (which
        # equation applies): a concise sheet keeps the steps that give them.
        self.decided: set[sp.Symbol] = set()

    # -- writing the calc ------------------------------------------------------------

    def __enter__(self) -> Sheet:
        self._written_order.enter_context(as_written())
        return self

    def __exit__(self, *exc_info: object) -> None:
        self._written_order.close()

    def add_revision(self, mark: str, date: str = "", description: str = "", by: str = "") -> None:
        """Log an issue of the calc; the latest mark becomes the title block's revision."""
        revision = Revision(str(mark), str(date), str(description), str(by))
        self.revisions.append(revision)
        self.title_block.revision = revision.mark

    def add_basis(self, category: str, *items: str) -> None:
        """State part of the design basis: codes and editions, materials, assumptions..."""
        self.basis.setdefault(str(category), []).extend(str(item) for item in items)

    def add_reference(self, *citations: str) -> None:
        """List a document the calc relies on (standards, handbooks, tables), once each."""
        for citation in citations:
            if str(citation) not in self.references:
                self.references.append(str(citation))

    def heading(self, text: str, level: int = 1) -> Heading:
        """Start a part (level 1) or a subsection (level 2) of the calc."""
        part = Heading(str(text), level)
        self.parts.append(part)
        return part

    def text(self, text: str) -> Prose:
        """A paragraph: an assumption, the sign convention, a note to the checker."""
        part = Prose(str(text))
        self.parts.append(part)
        return part

    def figure(self, svg: str | Callable[[Sheet], str], caption: str = "") -> Figure:
        """An SVG drawing made by calcsheet's figure code (never user-supplied markup).

        Pass a function of the sheet to draw from current values at render time.
        """
        part = Figure(svg, str(caption))
        self.parts.append(part)
        return part

    def figure_svg(self, figure: Figure) -> str:
        """The figure's SVG as drawn now (a drawing function sees the current values)."""
        return figure.svg(self) if callable(figure.svg) else figure.svg

    def table(
        self,
        columns: list[str] | tuple[str, ...],
        rows: list[list[str | sp.Symbol] | tuple[str | sp.Symbol, ...]],
        *,
        caption: str = "",
        unit: str | None = None,
    ) -> Table:
        """A table whose cells are text or symbols defined earlier (shown with current values)."""
        columns = tuple(str(column) for column in columns)
        checked_rows = []
        for number, row in enumerate(rows, start=1):
            row = tuple(row)
            if len(row) != len(columns):
                raise DefinitionError(
                    f"table {caption!r}: row {number} has {len(row)} cells "
                    f"for {len(columns)} columns"
                )
            for cell in row:
                if isinstance(cell, sp.Symbol):
                    self._require_defined(cell, f"table {caption!r}")
            checked_rows.append(tuple(c if isinstance(c, sp.Symbol) else str(c) for c in row))
        shown_in = parse_unit(unit, field=f"table {caption!r} unit") if unit is not None else None
        part = Table(columns, checked_rows, str(caption), shown_in)
        self.parts.append(part)
        return part

    def input(
        self,
        name: str,
        value: str | float | pint.Quantity,
        description: str = "",
        *,
        dimension: str | None = None,
        unit: str | None = None,
        reference: str = "",
        listed: bool = True,
        fixed: str = "",
        computed: bool = False,
    ) -> sp.Symbol:
        """Add an input; returns its symbol for use in later steps.

        ``value`` is a quantity or text such as ``"6.5 kip"`` (read by pint's unit
        parser, never evaluated). ``dimension`` (force, length, stress, angle...)
        is checked now and whenever the input changes. ``listed=False`` leaves it
        out of the inputs table because a table of the sheet shows it. ``fixed``
        is the reason the input cannot be changed with :meth:`set_input` (it
        decided the layout of the sheet); build the sheet again instead.

        An input prints as it was typed (15°, Ω = 1.67, 0.9 kip); ``computed=True``
        marks a value the calc computed elsewhere (an analysis's reaction, a value from
        a solution), which prints to the sheet's significant figures as results do
        (0.900 kip): its figures are the number's precision, not the engineer's words.
        """
        symbol = self._new_symbol(name, "input")
        quantity = parse_quantity(value, field=f"input {name}", dimension=dimension)
        display = self._display_unit(quantity, unit, where=f"input {name!r}")
        part = Input(
            symbol,
            str(description),
            str(reference),
            display,
            sheet=self,
            dimension=dimension,
            listed=bool(listed),
            fixed=str(fixed),
            computed=bool(computed),
        )
        self._store(part, quantity)
        return symbol

    def step(
        self,
        name: str,
        expr: sp.Basic | float,
        description: str = "",
        *,
        unit: str | None = None,
        reference: str = "",
        shown: bool = True,
    ) -> sp.Symbol:
        """Add a step ``name = expr``; returns its symbol for use in later steps.

        ``expr`` is a sympy expression over symbols this sheet defined earlier.
        ``unit`` is the unit the result is shown in; without it the sheet's unit
        preset chooses by dimension. ``reference`` cites the clause or equation.
        ``shown=False`` evaluates the step without printing its line: use it for
        values a table of the sheet shows, with the formula stated in the text.
        """
        return self._add_step(name, expr, description, unit, reference, shown=shown)

    def governing(
        self,
        name: str,
        candidates: Sequence[tuple[str, sp.Symbol]],
        description: str = "",
        *,
        largest: bool = True,
        unit: str | None = None,
        reference: str = "",
    ) -> sp.Symbol:
        """Add a step that takes the largest (or smallest) of labelled candidates.

        The sheet names the candidate that governs from the current values
        (:meth:`governing_label`), so the name follows every input change; a
        check whose demand is this step states where it governs.
        """
        pairs = tuple((str(label), symbol) for label, symbol in candidates)
        if not pairs or not all(isinstance(symbol, sp.Symbol) for _, symbol in pairs):
            raise DefinitionError(
                f"governing step {name!r}: give (label, symbol) pairs of earlier steps"
            )
        symbols = [symbol for _, symbol in pairs]
        expr = (Max if largest else Min)(*symbols) if len(symbols) > 1 else symbols[0]
        return self._add_step(
            name, expr, description, unit, reference, candidates=pairs, largest=largest
        )

    def _add_step(
        self,
        name: str,
        expr: sp.Basic | float,
        description: str,
        unit: str | None,
        reference: str,
        **options: object,
    ) -> sp.Symbol:
        symbol = self._new_symbol(name, "step")
        if isinstance(expr, (int, float)) and not isinstance(expr, bool):
            expr = sp.Integer(expr) if isinstance(expr, int) else sp.Float(expr)
        if not isinstance(expr, sp.Basic):
            raise DefinitionError(
                f"step {name!r}: the expression must be built from this sheet's symbols, "
                f"not a {type(expr).__name__}"
            )
        self._require_defined(expr, f"step {name!r}")
        quantity = evaluate(expr, self._values, step=name)
        display = self._display_unit(quantity, unit, where=f"step {name!r}")
        part = Step(
            symbol, str(description), str(reference), display, sheet=self, expr=expr, **options
        )
        self._store(part, quantity)
        return symbol

    def check(
        self,
        description: str,
        demand: sp.Basic,
        capacity: sp.Basic,
        *,
        reference: str = "",
    ) -> Check:
        """Add a check ``demand <= capacity``; its utilization is demand / capacity."""
        for role, expr in (("demand", demand), ("capacity", capacity)):
            if not isinstance(expr, sp.Basic):
                raise DefinitionError(
                    f"check {description!r}: the {role} must be a sympy expression"
                )
            self._require_defined(expr, f"check {description!r}")
        part = Check(str(description), demand, capacity, str(reference), sheet=self)
        self._evaluate_check(part, self._values)
        self.parts.append(part)
        return part

    # -- changing inputs --------------------------------------------------------------

    def set_input(self, name: str, value: str | float | pint.Quantity) -> None:
        """Change an input and re-evaluate the calc.

        When a step fails with the new value, the sheet keeps every previous value
        and the error says which step failed.
        """
        self.set_inputs({name: value})

    def set_inputs(self, changes: dict[str, str | float | pint.Quantity]) -> None:
        """Change several inputs at once, then re-evaluate (or rebuild) the calc once."""
        values = dict(self._values)
        rebuild = getattr(self, "_rebuild", None)
        for name, value in changes.items():
            part = self._defined.get(name)
            if not isinstance(part, Input):
                known = ", ".join(n for n, p in self._defined.items() if isinstance(p, Input))
                raise InputError("input name", name, f"one of: {known}")
            field = f"input {name}"
            if part.fixed and rebuild is None:
                raise InputError(
                    field, value, "no change here: build the sheet again", problem=part.fixed
                )
            quantity = parse_quantity(value, field=field, dimension=part.dimension)
            old = values[part.symbol]
            if quantity.dimensionality != old.dimensionality:
                raise InputError(
                    field, value, f"{_article(describe_dimension(old))}, like {old:~P}"
                )
            values[part.symbol] = _to_display(quantity, part.unit, field)
        if rebuild is not None:
            current = {
                name: values[part.symbol]
                for name, part in self._defined.items()
                if isinstance(part, Input)
            }
            self._adopt(rebuild(current))
            return
        checks: list[tuple[Check, tuple]] = []
        for part in self.parts:
            if isinstance(part, Step):
                values[part.symbol] = _to_display(
                    evaluate(part.expr, values, step=part.name), part.unit, f"step {part.name!r}"
                )
            elif isinstance(part, Check):
                checks.append((part, self._check_values(part, values)))
        self._values = values
        for name in changes:  # now a value the engineer typed, printed as typed
            self._defined[name].computed = False
        for check, (demand, capacity, utilization) in checks:
            check.demand_value, check.capacity_value, check.utilization = (
                demand,
                capacity,
                utilization,
            )
        for part in self._defined.values():
            part.value = values[part.symbol]
        self._shown.clear()

    def _adopt(self, built: Sheet) -> None:
        """Take the contents of a sheet built anew; what was added afterwards stays."""
        kept = {
            "revisions": self.revisions,
            "trace": self.trace,
            "title_block": self.title_block,
            "title": self.title,
        }
        vars(self).clear()
        vars(self).update(vars(built))
        for part in self.parts:
            if hasattr(part, "sheet"):
                part.sheet = self
        vars(self).update(kept)

    # -- reading results -------------------------------------------------------------------

    def __getitem__(self, name: str) -> Input | Step:
        try:
            return self._defined[name]
        except KeyError:
            raise KeyError(f"no input or step named {name!r}") from None

    def value(self, name: str | sp.Symbol) -> pint.Quantity:
        """The current value of an input or step, in its display unit."""
        key = name.name if isinstance(name, sp.Symbol) else name
        return self[key].value

    def evaluate(self, expr: sp.Basic, *, where: str = "a decision") -> pint.Quantity:
        """The current value of an expression over this sheet's symbols (nothing is added).

        For a calc that settles a decision from the values it has now (which equation
        of a standard applies); errors name ``where``.
        """
        self._require_defined(expr, where)
        return evaluate(expr, self._values, step=where)

    @property
    def checks(self) -> list[Check]:
        """The checks in sheet order."""
        return [part for part in self.parts if isinstance(part, Check)]

    @property
    def steps(self) -> list[Step]:
        """The steps in sheet order."""
        return [part for part in self.parts if isinstance(part, Step)]

    @property
    def inputs(self) -> list[Input]:
        """The inputs in sheet order."""
        return [part for part in self.parts if isinstance(part, Input)]

    def governing_check(self) -> Check | None:
        """The check with the highest utilization (the worst of its cases, where it has them)."""
        checks = [check for check in self.checks if check.utilization is not None]
        return max(checks, key=lambda check: check.worst_utilization, default=None)

    def set_cases(
        self,
        check: Check,
        worst: float,
        case: str,
        count: int,
        *,
        combination: str = "",
        station: pint.Quantity | None = None,
    ) -> None:
        """Say that ``check`` was also evaluated for ``count`` cases not written out.

        The calc computes them with the procedure that wrote the check; ``worst`` is
        the largest utilization among them and ``case`` names where it occurs (as
        printed); ``combination`` and ``station``, when given, say the same apart for
        a program reading the results. The summary, the status and
        :meth:`governing_check` then take the worst case.
        """
        if check not in self.checks:
            raise DefinitionError(f"check {check.description!r} is not on this sheet")
        if math.isnan(worst) or worst < 0:
            raise EvaluationError(
                f"check {check.description!r}: the worst utilization of its cases is {worst}"
            )
        check.cases = CheckCases(
            float(worst), str(case), int(count), combination=str(combination), station=station
        )

    def rebuild_with(self, build: Callable[[dict[str, pint.Quantity]], Sheet]) -> None:
        """Let :meth:`set_inputs` rebuild this calc instead of re-evaluating it.

        For a calc whose layout, or whose parts computed when it was built (a search
        over load combinations), depend on its inputs: ``build`` takes every input's
        current value by name (with the changes) and returns the calc built anew,
        which then replaces this sheet's contents. Inputs that ``build`` cannot take
        are refused by it with an :class:`InputError`.
        """
        self._rebuild = build

    def governing_label(self, part: Step | sp.Symbol) -> str:
        """The label of the candidate that governs a governing step, from current values."""
        step = self[part.name] if isinstance(part, sp.Symbol) else part
        if not isinstance(step, Step) or not step.candidates:
            return ""
        common = self._values[step.candidates[0][1]].units
        values = [float(self._values[symbol].to(common).magnitude) for _, symbol in step.candidates]
        pick = max if step.largest else min
        index = pick(range(len(values)), key=values.__getitem__)
        return step.candidates[index][0]

    def check_location(self, check: Check) -> str:
        """Where a check governs, when its demand is a governing step; else empty."""
        if isinstance(check.demand, sp.Symbol) and check.demand.name in self._defined:
            return self.governing_label(check.demand)
        return ""

    def note_decision(self, *values: object) -> None:
        """Remember the symbols of ``values`` as having settled a decision of the calc."""
        for value in values:
            if isinstance(value, sp.Basic):
                self.decided.update(_ordered_symbols(value))

    def rests_on(self, expressions: Iterable[sp.Basic]) -> set[sp.Symbol]:
        """Every symbol the current values of ``expressions`` rest on: the symbols they use
        and, recursively, those of the steps that give them, following only the branch of a
        piecewise step that applies now (with the conditions tried to reach it)."""
        found: set[sp.Symbol] = set()
        pending = [symbol for expr in expressions for symbol in _ordered_symbols(expr)]
        while pending:
            symbol = pending.pop()
            if symbol in found:
                continue
            found.add(symbol)
            part = self._defined.get(symbol.name)
            if not isinstance(part, Step):
                continue
            expr = part.expr
            used: list[sp.Basic] = [expr]
            if isinstance(expr, sp.Piecewise):
                try:
                    branch = chosen_branch(expr, self._values, step=part.name)
                except (DimensionError, EvaluationError):
                    branch = None  # no branch applies now: every branch counts
                if branch is not None:
                    used = [expr.args[branch][0]]
                    used += [condition for _, condition in expr.args[: branch + 1]]
            pending += [symbol for piece in used for symbol in _ordered_symbols(piece)]
        return found

    def iter_parts(self) -> Iterator[Part]:
        """The parts in order, for renderers."""
        return iter(self.parts)

    # -- printing ------------------------------------------------------------------------

    def equation(self, part: Input | Step, target: str) -> Equation:
        """A step or input printed for ``target`` (latex, mathml, typst or plain)."""
        symbolic_printer, slot_printer = self._printer_pair(target)
        key = (id(part), target)
        if key not in self._templates:
            self._templates[key] = _printed_template(part, target, symbolic_printer, slot_printer)
        name, symbolic, template, order = self._templates[key]
        substituted = None
        if template is not None:
            branch = 0
            if isinstance(part.expr, sp.Piecewise):
                branch = chosen_branch(part.expr, self._values, step=part.name)
            shown = [self._shown_value(symbol) for symbol in order]
            substituted = slot_printer.fill(template[branch], shown)
        result = slot_printer.quantity(self._shown_value(part.symbol), False, standalone=True)
        return Equation(target, name, symbolic, substituted, result, slot_printer)

    def check_text(self, check: Check, target: str) -> CheckText:
        """A check printed for ``target``: symbols, numbers and the utilization."""
        printer, slot_printer = self._printer_pair(target)
        sign = "≤"
        symbolic = printer.relation(
            printer.print_expression(check.demand), sign, printer.print_expression(check.capacity)
        )
        numeric = printer.relation(
            slot_printer.quantity(self._format(check.demand_value), False, standalone=True),
            "≤" if check.utilization is not None and check.utilization <= 1.0 else ">",
            slot_printer.quantity(self._format(check.capacity_value), False, standalone=True),
        )
        utilization, worst = (
            slot_printer.quantity(self._format(ureg.Quantity(value)), False, standalone=True)
            for value in (check.utilization, check.worst_utilization)
        )
        return CheckText(symbolic, numeric, utilization, worst)

    def cell_text(self, table: Table, cell: sp.Symbol, target: str) -> str:
        """A symbol cell of ``table`` printed for ``target`` from the current value."""
        _, slot_printer = self._printer_pair(target)
        quantity = self._values[cell]
        if table.unit is None:
            return slot_printer.quantity(self._shown_value(cell), False, standalone=True)
        try:
            magnitude = float(quantity.to(table.unit).magnitude)
        except pint.DimensionalityError:
            raise DimensionError(
                f"table {table.caption!r}: {cell.name} ({quantity:~P}) cannot be shown in "
                f"{table.unit:~P}"
            ) from None
        number = format_number(magnitude, self.number_style)
        return slot_printer.quantity(Quantityish(number), False, standalone=True)

    def format_value(self, quantity: pint.Quantity, target: str) -> str:
        """A quantity typeset for ``target`` with the sheet's number style."""
        _, slot_printer = self._printer_pair(target)
        return slot_printer.quantity(self._format(quantity), False, standalone=True)

    def _printer_pair(self, target: str) -> tuple[_ExpressionPrinter, _ExpressionPrinter]:
        if target not in self._printers:
            try:
                printer_class = PRINTERS[target]
            except KeyError:
                raise ValueError(
                    f"unknown print target {target!r}; known: {sorted(PRINTERS)}"
                ) from None
            self._printers[target] = (printer_class(), printer_class({}))
        return self._printers[target]

    def _shown_value(self, symbol: sp.Symbol) -> Quantityish:
        shown = self._shown.get(symbol)
        if shown is None:
            part = self._defined.get(symbol.name)
            typed = isinstance(part, Input) and not part.computed
            quantity = self._values[symbol]
            if isinstance(part, Step) and sum_closes_to_zero(part.expr, quantity, self._values):
                quantity = quantity * 0  # ΣF = 5.9e-12 kip of 10 kip terms prints as 0 kip
            shown = self._shown[symbol] = self._format(quantity, typed=typed)
        return shown

    def _format(self, quantity: pint.Quantity, *, typed: bool = False) -> Quantityish:
        """The number as an engineer writes it: an input as typed (15°, Ω = 1.67), a
        whole dimensionless result as an integer (class 4), the rest to the sheet's
        significant figures."""
        value = float(quantity.magnitude)
        number = None
        if typed:
            number = format_as_typed(value, self.number_style)
        elif quantity.units == _NO_UNIT:
            number = format_count(value)
        if number is None:
            number = format_number(value, self.number_style)
        # A plain number has no unit factors (pint's ``unitless`` costs a root-unit
        # conversion per value, which shows when a whole sheet is printed).
        return Quantityish(number, unit_factors(quantity.units))

    # -- internals -------------------------------------------------------------------------

    def _new_symbol(self, name: str, kind: str) -> sp.Symbol:
        parse_symbol_name(name)
        if name in self._defined:
            earlier = "an input" if isinstance(self._defined[name], Input) else "a step"
            raise DefinitionError(f"{kind} {name!r}: the symbol is already defined by {earlier}")
        return sp.Symbol(name)

    def _require_defined(self, expr: sp.Basic, where: str) -> None:
        for symbol in _ordered_symbols(expr):
            known = self._defined.get(symbol.name)
            if known is None or known.symbol != symbol:
                raise DefinitionError(f"{where} uses {symbol.name!r} before it is defined")

    def _display_unit(
        self, quantity: pint.Quantity, unit: str | None, *, where: str
    ) -> pint.Unit | None:
        if unit is not None:
            # The same few display units come back on every step: parsed once.
            display = _known_unit(str(unit)) or parse_unit(unit, field=f"{where} display unit")
            if display.dimensionality != quantity.dimensionality:
                raise DimensionError(
                    f"{where}: the result is {_article(describe_dimension(quantity))} "
                    f"({quantity.units:~P}) but the display unit {unit!r} is "
                    f"{_article(describe_dimension(display))}"
                )
            return display
        if str(quantity.units) in _ANGLE_UNITS:
            return ureg.degree
        if not quantity.dimensionality:  # (pint's ``dimensionless`` converts to root units)
            return None
        return self.units.unit_for(quantity) or quantity.to_reduced_units().units

    def _store(self, part: Input | Step, quantity: pint.Quantity) -> None:
        value = _to_display(quantity, part.unit, part.name)
        part.value = value
        self._values[part.symbol] = value
        self._defined[part.name] = part
        self.parts.append(part)

    def _check_values(
        self, check: Check, values: dict[sp.Symbol, pint.Quantity]
    ) -> tuple[pint.Quantity, pint.Quantity, float]:
        where = f"check {check.description!r}"
        demand = evaluate(check.demand, values, step=where)
        capacity = evaluate(check.capacity, values, step=where)
        if demand.dimensionality != capacity.dimensionality:
            raise DimensionError(
                f"{where}: demand is {_article(describe_dimension(demand))} but capacity is "
                f"{_article(describe_dimension(capacity))}"
            )
        capacity_in_demand_units = capacity.to(demand.units)
        if capacity_in_demand_units.magnitude <= 0:
            raise EvaluationError(f"{where}: the capacity {capacity:~P} must be positive")
        # Python floats: an overflow gives inf (reported below), not a numpy warning.
        utilization = abs(float(demand.magnitude)) / float(capacity_in_demand_units.magnitude)
        if not math.isfinite(utilization):
            raise EvaluationError(
                f"{where}: the utilization is not a finite number (demand {demand:~P}, "
                f"capacity {capacity:~P}); check the values for extreme sizes"
            )
        return demand, capacity_in_demand_units, utilization

    def _evaluate_check(self, check: Check, values: dict[sp.Symbol, pint.Quantity]) -> None:
        check.demand_value, check.capacity_value, check.utilization = self._check_values(
            check, values
        )

    # -- notebook display ------------------------------------------------------------------

    def _repr_html_(self) -> str:
        # The engine knows no renderer; the notebook view is the one place that
        # reaches forward, lazily, so that importing the engine stays light.
        from calcsheet.render.html import render_fragment

        return render_fragment(self)

    def _repr_mimebundle_(self, include: object = None, exclude: object = None) -> dict:
        # The whole document travels with the notebook output, so nbconvert can
        # write the sheet later without the kernel (see calcsheet.export.payload).
        from calcsheet.export.payload import SHEET_MIME_TYPE, sheet_payload

        return {SHEET_MIME_TYPE: sheet_payload(self)}

    def _repr_latex_(self) -> str:
        lines = []
        for part in self.parts:
            if isinstance(part, (Input, Step)):
                lines.append(self.equation(part, "latex").chain())
        return (
            "$$\\begin{aligned}"
            + " \\\\ ".join(line.replace(" = ", " &= ", 1) for line in lines)
            + "\\end{aligned}$$"
        )


@lru_cache(maxsize=512)
def _known_unit(text: str) -> pint.Unit | None:
    """A display unit written by a calc author, parsed; None when it is not one."""
    try:
        return parse_unit(text, field="display unit")
    except InputError:
        return None


def _to_display(quantity: pint.Quantity, unit: pint.Unit | None, where: str) -> pint.Quantity:
    shown = unit if unit is not None else ureg.dimensionless
    try:
        factor = linear_factor(quantity.units, shown)
        if factor is None:
            converted = quantity.to(shown)
        else:
            converted = ureg.Quantity(quantity.magnitude * factor, shown)
    except pint.DimensionalityError:
        raise DimensionError(
            f"{where}: cannot show {quantity:~P} in {unit if unit is not None else 'plain numbers'}"
        ) from None
    if not math.isfinite(float(converted.magnitude)):
        raise EvaluationError(f"{where}: the value is not finite")
    return converted


def _ordered_symbols(expr: sp.Basic) -> list[sp.Symbol]:
    """Free symbols in the order they first appear as written (stable slot numbering)."""
    seen: dict[sp.Symbol, None] = {}
    for node in sp.preorder_traversal(expr):
        if isinstance(node, sp.Symbol):
            seen.setdefault(node, None)
    return list(seen)


def _article(noun: str) -> str:
    return f"{'an' if noun[:1] in 'aeiou' else 'a'} {noun}"


# A sheet rebuilt after a design change (the form rebuilds on every entry) has the same
# expressions as before; sympy compares them by structure, so their printed templates
# are kept across sheets here instead of being printed again.
@lru_cache(maxsize=20_000)
def _cached_template(
    part_kind: str, name: str, expr: sp.Basic, candidates: int, target: str
) -> tuple:
    symbolic_printer, slot_printer = PRINTERS[target](), PRINTERS[target]({})
    return _template_of(part_kind, name, expr, candidates, symbolic_printer, slot_printer)


def _printed_template(
    part: Input | Step,
    target: str,
    symbolic_printer: _ExpressionPrinter,
    slot_printer: _ExpressionPrinter,
) -> tuple:
    """(name, symbolic, substituted templates, slot order) of a step or input."""
    kind = "step" if isinstance(part, Step) else "input"
    expr = part.expr if isinstance(part, Step) else sp.S.Zero
    candidates = len(part.candidates) if isinstance(part, Step) else 0
    try:
        return _cached_template(kind, part.name, expr, candidates, target)
    except TypeError:  # an expression that cannot be hashed: print it here
        return _template_of(kind, part.name, expr, candidates, symbolic_printer, slot_printer)


def _template_of(
    part_kind: str,
    part_name: str,
    expr: sp.Basic,
    candidates: int,
    symbolic_printer: _ExpressionPrinter,
    slot_printer: _ExpressionPrinter,
) -> tuple:
    """Print a step once: its name, symbolic form and substitution templates with slots."""
    name = symbolic_printer.symbol_name(parse_symbol_name(part_name))
    summarized = part_kind == "step" and candidates > 3
    if part_kind == "step" and not summarized and not (expr.is_Symbol or expr.is_Number):
        slots = {symbol: index for index, symbol in enumerate(_ordered_symbols(expr))}
        symbolic = symbolic_printer.print_expression(expr)
        # For an "if" step only the branch that applies is worth substituting.
        branches = [value for value, _ in expr.args] if isinstance(expr, sp.Piecewise) else [expr]
        substituted = tuple(
            type(slot_printer)(slots).print_expression(branch) for branch in branches
        )
        order = tuple(slots)
    elif summarized:
        # max(...) of many values is read from the table it comes from;
        # the line shows the rule and the result, and where it governs.
        symbolic, substituted, order = (
            symbolic_printer.print_extreme_of_many(expr),
            None,
            (),
        )
    elif part_kind == "step" and expr.is_Symbol:
        symbolic, substituted, order = (
            symbolic_printer.print_expression(expr),
            None,
            (),
        )
    else:
        symbolic, substituted, order = None, None, ()
    return (name, symbolic, substituted, order)
