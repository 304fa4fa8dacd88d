"""A read-only view of a sheet for one print target: what the templates iterate over."""

from __future__ import annotations

import dataclasses
import datetime
import re
from dataclasses import dataclass
from typing import Any

import sympy as sp

from calcsheet import __version__
from calcsheet.engine import (
    CAUTIONS,
    Check,
    CheckList,
    Equation,
    Figure,
    Heading,
    Input,
    Prose,
    Revision,
    Sheet,
    Step,
    Table,
    title_block_items,
)
from calcsheet.engine.marked_text import MarkedText, escape_marks
from calcsheet.engine.names import GREEK_LETTERS

# Characters of the plain-text chain above which a step is printed one piece per line,
# so that it fits the width of a letter or A4 page (measured on the demo's PDF).
LONG_EQUATION = 90
# Characters of the plain-text chain up to which a PDF sets the equation beside its words
# (words in the left column, equation in the right), saving a line per step.
BESIDE_EQUATION = 70
# Characters of a stacked equation's last line (numbers = result) up to which the result is
# set on that line: the plain text parenthesises every value, so 105 of its characters take
# about four fifths of a letter page's text width (measured on the demo's PDF).
RESULT_BESIDE = 105


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
    beside: bool = False  # a short step: the PDF sets its equation beside its words
    floats: bool = False  # a figure the PDF may move to the top or bottom of a page
    width: float = 0.0  # a figure's printed width in pt (0: as wide as the text)
    # A table of checks given one line each (``kind`` "check_table"): their views.
    entries: tuple[PartView, ...] = ()


@dataclass(frozen=True)
class SheetView:
    """Everything a template shows, already printed for its target."""

    title: str
    title_block: Any
    # The title block as the sheet shows it, (label, text) in order, the units last.
    title_items: tuple[tuple[str, str], ...]
    units: str
    parts: list[PartView]
    inputs: list[PartView]
    checks: list[PartView]
    governing: PartView | None
    cautions: tuple[str, ...]
    tool_version: str
    revisions: tuple[Revision, ...] = ()
    # Sources that several inputs share, printed once under the inputs table: (mark, text).
    input_notes: tuple[tuple[str, str], ...] = ()
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
    builder = _ViewBuilder(sheet, target)
    for part in sheet.parts:
        builder.visit(part)
    parts = builder.parts
    checks = [builder.check_view(check) for check in sheet.checks]
    inputs, input_notes = _shared_sources(_one_row_per_value(builder.inputs, target))
    figures = [index for index, view in enumerate(parts) if view.kind == "figure"]
    for index in figures[:-1]:  # the last stays in the flow: nothing floats past the end
        parts[index] = dataclasses.replace(parts[index], floats=True)
    if target == "typst":  # pages: a pair of narrow floating figures takes one's height
        parts = _side_by_side(parts)
    governing_check = sheet.governing_check()
    governing = builder.check_view(governing_check) if governing_check is not None else None
    return SheetView(
        title=sheet.title,
        title_block=sheet.title_block,
        title_items=(*title_block_items(sheet.title_block), ("Units", sheet.units.name)),
        units=sheet.units.name,
        parts=parts,
        inputs=inputs,
        input_notes=input_notes,
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


class _ViewBuilder:
    """Walks a sheet's parts, one ``visit_<PartType>`` method per part type (as jinja2's
    ``NodeVisitor`` walks a template's nodes): a new part type is one new method here and
    one template block. The parts' views go to ``parts`` in order; listed inputs also to
    ``inputs``."""

    def __init__(self, sheet: Sheet, target: str) -> None:
        self.sheet = sheet
        self.target = target
        self.parts: list[PartView] = []
        self.inputs: list[PartView] = []
        self._check_views: dict[int, PartView] = {}

    def visit(self, part: object) -> None:
        """Add the view of ``part``: the visit method of its type, or of the nearest base
        class that has one."""
        for kind in type(part).__mro__:
            method = getattr(self, f"visit_{kind.__name__}", None)
            if method is not None:
                method(part)
                return
        raise TypeError(f"no view for a sheet part of type {type(part).__name__}")

    def visit_Heading(self, part: Heading) -> None:
        self.parts.append(PartView("heading", text=part.text, level=part.level))

    def visit_Prose(self, part: Prose) -> None:
        self.parts.append(PartView("prose", text=part.text))

    def visit_Table(self, part: Table) -> None:
        caption = part.caption
        if part.unit is not None:
            caption += f" (values in {part.unit:~P})"
        cells = tuple(
            tuple(
                (True, self.sheet.cell_text(part, cell, self.target))
                if isinstance(cell, sp.Symbol)
                else (False, _cell_words(cell))
                for cell in row
            )
            for row in part.rows
        )
        text_columns = tuple(
            all(not row[index][0] and not _is_number(row[index][1]) for row in cells)
            for index in range(len(part.columns))
        )
        self.parts.append(
            PartView(
                "table", text=caption, columns=part.columns, cells=cells, text_columns=text_columns
            )
        )

    def visit_Figure(self, part: Figure) -> None:
        svg = self.sheet.figure_svg(part)
        self.parts.append(PartView("figure", text=part.caption, svg=svg, width=_print_width(svg)))

    def visit_Input(self, part: Input) -> None:
        equation = self.sheet.equation(part, self.target)
        view = PartView(
            "input",
            text=part.description,
            symbol=equation.symbol,
            value=equation.result,
            reference=part.reference,
        )
        if part.listed:
            self.inputs.append(view)
        self.parts.append(view)

    def visit_Step(self, part: Step) -> None:
        if not part.shown:
            return
        equation = self.sheet.equation(part, self.target)
        plain_equation = self.sheet.equation(part, "plain")
        plain = plain_equation.chain()
        long = _set_width(plain) > LONG_EQUATION
        self.parts.append(
            PartView(
                "step",
                beside=_set_width(plain) <= BESIDE_EQUATION,
                text=part.description,
                symbol=equation.symbol,
                math=equation.stacked(_result_fits_beside(plain_equation))
                if long
                else equation.chain(),
                value=equation.result,
                reference=part.reference,
                location=self.sheet.governing_label(part),
            )
        )

    def visit_Check(self, part: Check) -> None:
        view = self.check_view(part)
        if part.shown:
            self.parts.append(view)

    def visit_CheckList(self, part: CheckList) -> None:
        entries = tuple(self.check_view(check) for check in part.checks)
        self.parts.append(PartView("check_table", text=part.caption, entries=entries))

    def check_view(self, part: Check) -> PartView:
        """A check printed for the target, once: the summary reuses the part's view."""
        if id(part) not in self._check_views:
            self._check_views[id(part)] = _check_view(self.sheet, part, self.target)
        return self._check_views[id(part)]


def _cell_words(cell: str) -> str:
    """A table's text cell as marked text (the templates print it ``rich``): a cell made
    :class:`MarkedText` keeps its marks, any other shows as typed."""
    return cell if isinstance(cell, MarkedText) else escape_marks(cell)


def _result_fits_beside(plain: Equation) -> bool:
    """Whether a stacked equation's last line, the numbers and the result, fits the page:
    then the result needs no line of its own."""
    if plain.substituted is None:
        return False
    return _set_width(f"{plain.symbol} = {plain.substituted} = {plain.result}") <= RESULT_BESIDE


_GREEK_NAME = re.compile("|".join(sorted(GREEK_LETTERS, key=len, reverse=True)))


def _set_width(plain: str) -> int:
    """About how many characters wide a plain-text equation is when typeset: a Greek
    letter's name is one letter, underscores and powers' stars take no room. A stacked
    equation (several lines) counts as too wide to set beside words."""
    if "\n" in plain:
        return 10**6
    shown = _GREEK_NAME.sub("g", plain).replace("**", "").replace("_", "").replace("sqrt", "√")
    return len(_fractions_stacked(shown))


def _fractions_stacked(text: str) -> str:
    """``text`` with each ``(numerator)/(denominator)`` of the plain printer replaced by
    as many characters as the wider of the two: a fraction is set one above the other."""
    while (middle := text.find(")/(")) >= 0:
        start = _matching(text, middle, -1)
        end = _matching(text, middle + 2, +1)
        if start < 0 or end < 0:
            break
        numerator, denominator = text[start + 1 : middle], text[middle + 3 : end]
        text = text[:start] + "x" * max(len(numerator), len(denominator)) + text[end + 1 :]
    return text


def _matching(text: str, index: int, direction: int) -> int:
    """The index of the parenthesis matching the one at ``index`` (-1 when none)."""
    depth = 0
    while 0 <= index < len(text):
        depth += {"(": 1, ")": -1}.get(text[index], 0) * direction
        if depth == 0:
            return index
        index += direction
    return -1


_NUMBER = re.compile(r"^[−+-]?(\d[\d,]*\.?\d*|\.\d+|∞|—)$")


def _is_number(cell: str) -> bool:
    """A text cell holding a number already printed (or a dash for none): set as a value."""
    return bool(_NUMBER.match(cell.strip()))


# Figures print at this fraction of their drawn size (SVG px at 96 per inch), which keeps
# their lettering at about 6.5 pt, and no taller than FIGURE_HEIGHT pt: a page holds a
# figure and the steps it illustrates.
FIGURE_SCALE = 0.66
FIGURE_HEIGHT = 150.0
# A tall drawing (the internal-force diagrams) is set no smaller than this, so that its
# lettering stays readable (about 5 pt); it then takes more than FIGURE_HEIGHT.
MIN_FIGURE_SCALE = 0.5
_SVG_SIZE = re.compile(r'<svg\b[^>]*?\swidth="([0-9.]+)"[^>]*?\sheight="([0-9.]+)"')


def _print_width(svg: str) -> float:
    """The printed width of an SVG drawing in pt (0 when it gives no size)."""
    found = _SVG_SIZE.search(svg)
    if not found:
        return 0.0
    width, height = (float(found[index]) * 0.75 for index in (1, 2))  # px to pt
    scale = FIGURE_SCALE
    if height > 0:
        scale = min(FIGURE_SCALE, max(FIGURE_HEIGHT / height, MIN_FIGURE_SCALE))
    return round(width * scale, 1)


# How the symbols of one inputs-table row are separated, per target.
_SYMBOL_SEPARATORS = {"mathml": '<mo separator="true">,</mo>', "typst": ", "}


def _one_row_per_value(inputs: list[PartView], target: str) -> list[PartView]:
    """The inputs with those that have the same value from the same source in one row
    (``A, A_g``: the area and the gross area; ``I_x, I_y`` of a square tube), at the
    place of the first, so the table lists each value once. Inputs without a source
    (what the engineer typed) keep a row each."""
    rows: list[list[PartView]] = []
    by_value: dict[tuple[str, str], list[PartView]] = {}
    for item in inputs:
        key = (item.value, item.reference)
        if item.reference and key in by_value:
            by_value[key].append(item)
            continue
        row = [item]
        rows.append(row)
        if item.reference:
            by_value[key] = row
    separator = _SYMBOL_SEPARATORS.get(target, ", ")
    return [
        row[0]
        if len(row) == 1
        else dataclasses.replace(
            row[0],
            symbol=separator.join(item.symbol for item in row),
            text=_joined_descriptions([item.text for item in row]),
        )
        for row in rows
    ]


def _joined_descriptions(texts: list[str]) -> str:
    """Descriptions of one row joined, the words they share at the start and at the end
    written once: "Elastic section modulus about x / y"; "Load factor on Q / W in EN 1990
    Eq. (6.10)"; "Area; gross area" when they share none."""
    if len(set(texts)) == 1:
        return texts[0]
    split = [text.split(" ") for text in texts]
    shortest = min(len(words) for words in split)

    def shared(index: int) -> bool:  # the word at ``index`` (from the end when < 0)
        return len({words[index] for words in split}) == 1

    start = 0
    while start < shortest - 1 and shared(start):
        start += 1
    end = 0
    while start + end < shortest - 1 and shared(-1 - end):
        end += 1
    if not start and not end:
        return "; ".join([texts[0], *(text[:1].lower() + text[1:] for text in texts[1:])])
    middles = " / ".join(" ".join(words[start : len(words) - end]) for words in split)
    return " ".join([*split[0][:start], middles, *split[0][len(split[0]) - end :]])


# A floating figure printed at most this wide (pt) is set beside the next one as narrow,
# each under its own caption: two fit across an A4 or letter page's text (504 pt, 521 pt).
BESIDE_FIGURE_WIDTH = 240.0
# ...when at most this many parts lie between them: about a page of text, so neither moves
# far from the words it illustrates (a float moves to a page's top or bottom anyway).
BESIDE_FIGURE_DISTANCE = 30


def _side_by_side(parts: list[PartView]) -> list[PartView]:
    """The parts with each pair of narrow floating figures near each other joined into one
    ``figure_row`` at the place of the first: the pair takes one figure's height."""

    def narrow(view: PartView) -> bool:
        return view.kind == "figure" and view.floats and 0 < view.width <= BESIDE_FIGURE_WIDTH

    joined: list[PartView] = []
    moved: set[int] = set()
    for index, view in enumerate(parts):
        if index in moved:
            continue
        following = next(
            (later for later in range(index + 1, len(parts)) if parts[later].kind == "figure"),
            None,
        )
        if (
            narrow(view)
            and following is not None
            and following - index - 1 <= BESIDE_FIGURE_DISTANCE
            and narrow(parts[following])
        ):
            joined.append(PartView("figure_row", floats=True, entries=(view, parts[following])))
            moved.add(following)
            continue
        joined.append(view)
    return joined


# A source this long, given for more than one input, is printed once as a note.
_NOTE_LENGTH = 30


def _shared_sources(
    inputs: list[PartView],
) -> tuple[list[PartView], tuple[tuple[str, str], ...]]:
    """The inputs with each long source that several of them share replaced by a note mark
    ("note a"), and the notes in order of first use."""
    counts: dict[str, int] = {}
    for item in inputs:
        counts[item.reference] = counts.get(item.reference, 0) + 1
    marks: dict[str, str] = {}
    for item in inputs:
        source = item.reference
        if counts[source] > 1 and len(source) > _NOTE_LENGTH and source not in marks:
            marks[source] = chr(ord("a") + len(marks)) if len(marks) < 26 else str(len(marks))
    if not marks:
        return inputs, ()
    noted = [
        dataclasses.replace(item, reference=f"note {marks[item.reference]}")
        if item.reference in marks
        else item
        for item in inputs
    ]
    return noted, tuple((mark, source) for source, mark in marks.items())


def _check_view(sheet: Sheet, part: Check, target: str) -> PartView:
    """A check printed for ``target``."""
    text = sheet.check_text(part, target)
    written_passes = part.utilization is not None and part.utilization <= 1.0
    plain = sheet.check_text(part, "plain")
    return PartView(
        "check",
        beside=_set_width(f"{plain.symbolic}    {plain.numeric}") <= BESIDE_EQUATION,
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
