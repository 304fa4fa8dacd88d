"""A read-only view of a sheet for one print target: what the templates iterate over."""

from __future__ import annotations

import dataclasses
import datetime
from dataclasses import dataclass
from typing import Any

import sympy as sp

from calcsheet import __version__
from calcsheet.engine import (
    CAUTIONS,
    Check,
    Figure,
    Heading,
    Input,
    Prose,
    Revision,
    Sheet,
    Step,
    Table,
)

# Characters of the plain-text chain above which a step is printed one piece per line,
# so that it fits the width of a letter or A4 page (measured on the demo's PDF).
LONG_EQUATION = 90


@dataclass(frozen=True)
class PartView:
    """One part as the template needs it; ``kind`` picks the template block."""

    kind: str
    text: str = ""
    level: int = 1
    symbol: str = ""
    math: str = ""
    symbolic: str = ""
    numeric: str = ""
    value: str = ""
    utilization: str = ""
    status: str = ""
    reference: str = ""
    svg: str = ""
    location: str = ""  # where a governing step or a check governs, from current values
    # A check standing for cases not written out (every load combination): the worst
    # utilization over them, its status, the case that gives it, and how many there are.
    worst: str = ""
    worst_status: str = ""
    case: str = ""
    cases: int = 0
    columns: tuple[str, ...] = ()
    text_columns: tuple[bool, ...] = ()  # per column: all text (left-aligned) or has values
    cells: tuple[tuple[tuple[bool, str], ...], ...] = ()  # (is math, content) per cell
    # A table of checks given one line each (``kind`` "check_table"): their views.
    entries: tuple[PartView, ...] = ()


@dataclass(frozen=True)
class SheetView:
    """Everything a template shows, already printed for its target."""

    title: str
    title_block: Any
    units: str
    parts: list[PartView]
    inputs: list[PartView]
    checks: list[PartView]
    governing: PartView | None
    cautions: tuple[str, ...]
    tool_version: str
    revisions: tuple[Revision, ...] = ()
    basis: tuple[tuple[str, tuple[str, ...]], ...] = ()
    references: tuple[str, ...] = ()
    trace: str = ""
    # The PDF's document information (PDF/A asks for a date: the date of issue).
    document_date: datetime.date | None = None
    author: str = ""
    description: str = ""
    keywords: tuple[str, ...] = ()


def build_view(sheet: Sheet, target: str) -> SheetView:
    """Print every part of ``sheet`` for ``target`` (``mathml`` or ``typst``)."""
    parts: list[PartView] = []
    inputs: list[PartView] = []
    checks: list[PartView] = []
    check_views: dict[int, PartView] = {}
    for part in sheet.parts:
        if isinstance(part, Heading):
            parts.append(PartView("heading", text=part.text, level=part.level))
        elif isinstance(part, Prose):
            parts.append(PartView("prose", text=part.text))
        elif isinstance(part, Table):
            caption = part.caption
            if part.unit is not None:
                caption += f" (values in {part.unit:~P})"
            cells = tuple(
                tuple(
                    (True, sheet.cell_text(part, cell, target))
                    if isinstance(cell, sp.Symbol)
                    else (False, cell)
                    for cell in row
                )
                for row in part.rows
            )
            text_columns = tuple(
                all(not row[index][0] for row in cells) for index in range(len(part.columns))
            )
            parts.append(
                PartView(
                    "table",
                    text=caption,
                    columns=part.columns,
                    cells=cells,
                    text_columns=text_columns,
                )
            )
        elif isinstance(part, Figure):
            parts.append(PartView("figure", text=part.caption, svg=sheet.figure_svg(part)))
        elif isinstance(part, Input):
            equation = sheet.equation(part, target)
            view = PartView(
                "input",
                text=part.description,
                symbol=equation.symbol,
                value=equation.result,
                reference=part.reference,
            )
            if part.listed:
                inputs.append(view)
            parts.append(view)
        elif isinstance(part, Step):
            if not part.shown:
                continue
            equation = sheet.equation(part, target)
            long = len(sheet.equation(part, "plain").chain()) > LONG_EQUATION
            parts.append(
                PartView(
                    "step",
                    text=part.description,
                    symbol=equation.symbol,
                    math=equation.stacked() if long else equation.chain(),
                    value=equation.result,
                    reference=part.reference,
                    location=sheet.governing_label(part),
                )
            )
        elif isinstance(part, Check):
            text = sheet.check_text(part, target)
            written_passes = part.utilization is not None and part.utilization <= 1.0
            view = PartView(
                "check",
                text=part.description,
                symbolic=text.symbolic,
                numeric=text.numeric,
                utilization=text.utilization,
                status="OK" if written_passes else "NOT OK",
                reference=part.reference,
                location=sheet.check_location(part),
                worst=text.worst,
                worst_status=part.status,
                case=part.worst_case,
                cases=part.cases.count if part.cases is not None else 0,
            )
            check_views[id(part)] = view
            checks.append(view)
            if part.shown:
                parts.append(view)
            elif parts and parts[-1].kind == "check_table":
                parts[-1] = dataclasses.replace(parts[-1], entries=(*parts[-1].entries, view))
            else:
                parts.append(PartView("check_table", entries=(view,)))
    governing_check = sheet.governing_check()
    governing = check_views.get(id(governing_check)) if governing_check is not None else None
    return SheetView(
        title=sheet.title,
        title_block=sheet.title_block,
        units=sheet.units.name,
        parts=parts,
        inputs=inputs,
        checks=checks,
        governing=governing,
        cautions=CAUTIONS,
        tool_version=__version__,
        revisions=tuple(sheet.revisions),
        basis=_basis(sheet),
        references=tuple(sheet.references),
        trace=sheet.trace,
        document_date=issue_date(sheet),
        author=sheet.title_block.prepared_by,
        description=_description(sheet),
        keywords=_keywords(sheet),
    )


def issue_date(sheet: Sheet, today: datetime.date | None = None) -> datetime.date:
    """The date the sheet is issued on: the latest dated revision's, else the date it was
    prepared, else today (the job file's dates are ISO, YYYY-MM-DD)."""
    written = [revision.date for revision in reversed(sheet.revisions)]
    for text in [*written, sheet.title_block.prepared_date]:
        try:
            return datetime.date.fromisoformat(str(text).strip())
        except ValueError:
            continue
    return today or datetime.date.today()


def _description(sheet: Sheet) -> str:
    block = sheet.title_block
    return "; ".join(
        text
        for text in (
            block.subject,
            block.project,
            f"rev. {block.revision}" if block.revision else "",
        )
        if text
    )


def _keywords(sheet: Sheet) -> tuple[str, ...]:
    """Calc number first (what a document system files a calc under), then the project's."""
    block = sheet.title_block
    found = (
        f"calc {block.calc_number}" if block.calc_number else "",
        f"project {block.project_number}" if block.project_number else "",
        f"rev. {block.revision}" if block.revision else "",
        "calculation sheet",
    )
    return tuple(text for text in found if text)


def _basis(sheet: Sheet) -> tuple[tuple[str, tuple[str, ...]], ...]:
    """The design basis by category; the units line comes from the sheet's unit preset."""
    basis = {category: tuple(items) for category, items in sheet.basis.items()}
    basis.setdefault("Units", (sheet.units.description,))
    return tuple(basis.items())
