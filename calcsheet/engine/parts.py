"""The parts a sheet is made of: headings, prose, inputs, steps, checks and figures.

Parts are plain data. The sheet fills in their values; renderers only read them.
"""

from __future__ import annotations

from collections.abc import Callable
from dataclasses import dataclass, field, fields
from typing import TYPE_CHECKING, Any

import pint
import sympy as sp

if TYPE_CHECKING:
    from calcsheet.engine.sheet import Sheet


CAUTIONS: tuple[str, ...] = (
    "Prepared for review by a qualified engineer; not valid until checked and sealed.",
    "Verify every clause against the governing code edition and local amendments.",
    "This tool does not replace engineering judgement: confirm loads, geometry, "
    "connections and stability beyond what this sheet covers.",
)


def _labelled(label: str, default: str = "") -> Any:
    return field(default=default, metadata={"label": label})


@dataclass
class TitleBlock:
    """What a reviewer looks for at the top of every page of a calc package.

    The one declaration of the title block's fields, in the order a sheet shows them,
    each with the label it is shown under: the sheets' title blocks
    (:func:`title_block_items`), the notebook payload and the job file's
    ``[title_block]`` (whose keys a test keeps equal to these, less the revision, which
    the job's revision log gives) follow it.
    """

    project: str = _labelled("Project")
    project_number: str = _labelled("Project no.")
    subject: str = _labelled("Subject")
    calc_number: str = _labelled("Calc no.")
    prepared_by: str = _labelled("Prepared by")
    prepared_date: str = _labelled("Prepared on")
    checked_by: str = _labelled("Checked by")
    checked_date: str = _labelled("Checked on")
    revision: str = _labelled("Revision", "0")


def title_block_items(block: TitleBlock) -> list[tuple[str, str]]:
    """The title block's fields as (label, text) in the order they are declared."""
    return [(item.metadata["label"], str(getattr(block, item.name))) for item in fields(block)]


@dataclass(frozen=True)
class Revision:
    """One line of the revision log: what changed in this issue of the calc."""

    mark: str
    date: str = ""
    description: str = ""
    by: str = ""


@dataclass(eq=False)
class Heading:
    """A part title; level 1 starts a part of the calc, level 2 a subsection."""

    text: str
    level: int = 1


@dataclass(eq=False)
class Prose:
    """A paragraph of explanation: assumptions, sign convention, notes to the checker."""

    text: str


@dataclass(eq=False)
class Table:
    """Rows of cells: a cell is text, or a symbol shown with its current value.

    A symbol cell is never a copy of a number: it is printed from the sheet's
    values whenever the table is rendered, so it follows every input change.
    ``unit`` shows every symbol cell in that unit, without repeating the unit.
    """

    columns: tuple[str, ...]
    rows: list[tuple[str | sp.Symbol, ...]]
    caption: str = ""
    unit: pint.Unit | None = None


@dataclass(eq=False)
class Figure:
    """An SVG drawing with a caption, made by calcsheet's own figure code.

    ``svg`` is the drawing, or a function of the sheet that draws it from the
    current values (a stress plot that must follow every input change).
    """

    svg: str | Callable[[Sheet], str]
    caption: str = ""


@dataclass(eq=False)
class _Defined:
    """Something that gives a symbol a value: an input or a step."""

    symbol: sp.Symbol
    description: str
    reference: str
    unit: pint.Unit | None
    value: pint.Quantity | None = None
    sheet: Sheet | None = field(default=None, repr=False)

    @property
    def name(self) -> str:
        """The symbol's name as the calc author wrote it (``sigma_max``)."""
        return self.symbol.name

    def _repr_latex_(self) -> str:
        if self.sheet is None:
            return f"${self.name}$"
        return "$$" + self.sheet.equation(self, "latex").chain() + "$$"

    def _repr_html_(self) -> str:
        if self.sheet is None:
            return self.name
        math = self.sheet.equation(self, "mathml").chain()
        return f'<math display="block">{math}</math>'


@dataclass(eq=False)
class Input(_Defined):
    """A value the engineer supplies, with the dimension it must have.

    ``listed`` False keeps it out of the inputs table (a table of the sheet
    shows it instead). A non-empty ``fixed`` says why the value cannot change
    without building the sheet again (it decided which steps the sheet has).
    ``computed``: the value is a result the calc brings in (a reaction of the
    analysis), printed to the sheet's figures for results; otherwise it is what the
    engineer typed and prints as typed.
    """

    dimension: str | None = None
    listed: bool = True
    fixed: str = ""
    computed: bool = False


@dataclass(eq=False)
class Step(_Defined):
    """One line of the calc: symbol = expression, evaluated with units, with its reference.

    ``shown`` False evaluates the step for tables and checks without printing its
    line. ``candidates`` (label, symbol) pairs make it a governing step: the
    largest (or smallest) of the candidates, and the sheet names the one that
    governs from the current values.
    """

    expr: sp.Basic = sp.S.Zero
    shown: bool = True
    candidates: tuple[tuple[str, sp.Symbol], ...] = ()
    largest: bool = True


@dataclass(frozen=True)
class CheckCases:
    """The same check evaluated for cases the sheet does not write out step by step.

    ``worst`` is the largest utilization over ``count`` cases (the written case
    among them), ``case`` names the case that gives it (a load combination, a
    station). A calc computes these with the same procedure as its written steps.
    ``combination`` and ``station``, when the calc gives them, are the parts of
    ``case`` a program reads on its own (the JSON results).
    """

    worst: float
    case: str
    count: int
    combination: str = ""
    station: pint.Quantity | None = None


@dataclass(eq=False)
class Check:
    """Demand against capacity: utilization = demand / capacity, pass when it is at most 1.

    With :attr:`cases` the check also stands for cases not written out: it passes
    only when the worst of them passes too. ``shown`` False gives it one line in a
    table of such checks instead of a block of its own (it still counts everywhere).
    """

    description: str
    demand: sp.Basic
    capacity: sp.Basic
    reference: str = ""
    demand_value: pint.Quantity | None = None
    capacity_value: pint.Quantity | None = None
    utilization: float | None = None
    sheet: Sheet | None = field(default=None, repr=False)
    cases: CheckCases | None = None
    shown: bool = True

    @property
    def worst_utilization(self) -> float | None:
        """The larger of the written utilization and the worst of the other cases."""
        if self.utilization is None:
            return None
        if self.cases is None:
            return self.utilization
        return max(self.utilization, self.cases.worst)

    @property
    def worst_case(self) -> str:
        """The case of :attr:`worst_utilization` when another case than the written one
        governs; empty when the written case governs or there are no other cases."""
        if self.cases is None or self.utilization is None:
            return ""
        # The written case is among the cases; its two evaluations differ in round-off.
        return self.cases.case if self.cases.worst > self.utilization * (1 + 1e-9) else ""

    @property
    def passes(self) -> bool:
        """True when the utilization, and the worst of its cases, is at most 1."""
        worst = self.worst_utilization
        return worst is not None and worst <= 1.0

    @property
    def status(self) -> str:
        """OK or NOT OK, as written on a calc sheet."""
        return "OK" if self.passes else "NOT OK"

    def summary(self) -> dict[str, Any]:
        """The check's result as plain data (for JSON and tables)."""
        result = {
            "description": self.description,
            "reference": self.reference,
            "utilization": self.worst_utilization,
            "written_utilization": self.utilization,
            "status": self.status,
        }
        if self.cases is not None:
            result["governing_case"] = self.cases.case
            result["cases"] = self.cases.count
        return result


@dataclass(eq=False)
class CheckList:
    """Checks given one line each in a table instead of a block of their own (their
    ``shown`` is False; they stay where they were written, for the summary's order)."""

    checks: list[Check]
    caption: str = ""


Part = Heading | Prose | Figure | Table | Input | Step | Check | CheckList
