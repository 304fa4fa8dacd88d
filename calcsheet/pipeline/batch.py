"""Many members from one table: a sheet each, in parallel processes, plus a summary.

A batch is a TOML file with ``[defaults]`` (any job keys) and ``[[members]]``
(each member's keys, merged over the defaults, both over an optional base job),
or a CSV file whose header names job keys by path (``member.name``,
``member.section``, ``loads[0].magnitude``) over a base job given separately.

Rules that keep every member's work apart and nothing silent:

- A header column that is no job key stops the batch once, before anything runs.
- A CSV cell left blank, a row with fewer or more cells than the header: that
  row's member is skipped with the row and column named. A cell holding exactly
  ``(base)`` takes the base job's value on purpose.
- Every other bad member is reported and skipped; the others still build.
- ``{member}`` in the title, subject, calc number or file stem of the base job
  (or ``[defaults]``) becomes each member's name. Two members that would print
  the same title, subject or calc number stop the batch: each sheet is its own.
- Two members whose files would have the same name (names that differ only in
  characters a file name cannot hold, ``B/1`` and ``B-1``, or only in case) stop
  the batch before anything runs, naming them.
"""

from __future__ import annotations

import copy
import csv
import dataclasses
import difflib
import io
import multiprocessing
import os
import re
import signal
import tomllib
import types
import typing
from collections.abc import Callable, Iterator, Sequence
from concurrent.futures import ProcessPoolExecutor
from dataclasses import dataclass
from pathlib import Path
from typing import TYPE_CHECKING, Any

from pydantic import BaseModel

from calcsheet.errors import CalcsheetError, ExportError, InputError
from calcsheet.job import JobError, job_from_data
from calcsheet.job.schema import Job

if TYPE_CHECKING:  # the build stage is heavy: workers import it, the parent need not
    from calcsheet.pipeline.run import PackageEntry

MAX_MEMBERS = 5000
MAX_INDEX = 200
_PATH_PART = re.compile(r"([A-Za-z_][A-Za-z0-9_]*)((?:\[\d+\])*)")
# A CSV cell holding exactly this takes the base job's value (a blank cell is an error).
BASE_VALUE = "(base)"
MEMBER_PLACEHOLDER = "{member}"
# The keys a batch makes each member's own: the placeholder is replaced in them.
PER_MEMBER_KEYS = (
    ("sheet", "title"),
    ("title_block", "subject"),
    ("title_block", "calc_number"),
    ("output", "stem"),
)
# Of those, the ones no two members' sheets may share.
DISTINCT_KEYS = PER_MEMBER_KEYS[:3]
SKIPPED_BAD_INPUT = "SKIPPED (bad input)"
SKIPPED_NOT_WRITTEN = "SKIPPED (not written)"


@dataclass(frozen=True)
class BatchMember:
    """One member's job data, where it comes from, and problems found in its row."""

    data: dict[str, Any]
    where: str = ""  # "row 4", "members[3]"
    problems: tuple[tuple[str, str], ...] = ()

    @property
    def name(self) -> str:
        member = self.data.get("member")
        return str(member.get("name", "")) if isinstance(member, dict) else ""


@dataclass(frozen=True)
class MemberOutcome:
    """What happened to one member: its summary line, or the reason it was skipped."""

    name: str
    section: str
    ok: bool
    utilization: float | None
    all_pass: bool
    message: str
    paths: tuple[str, ...] = ()
    governing: str = ""  # the governing check, where it governs
    reason: str = ""  # why the member was skipped, on one line
    not_written: bool = False  # skipped because its files could not be written
    package: PackageEntry | None = None  # its part of a calc package, when one is made

    @property
    def status(self) -> str:
        if self.ok:
            return "OK" if self.all_pass else "NOT OK"
        return SKIPPED_NOT_WRITTEN if self.not_written else SKIPPED_BAD_INPUT


def _merge(base: dict[str, Any], over: dict[str, Any]) -> dict[str, Any]:
    merged = copy.deepcopy(base)
    for key, value in over.items():
        if isinstance(value, dict) and isinstance(merged.get(key), dict):
            merged[key] = _merge(merged[key], value)
        else:
            merged[key] = copy.deepcopy(value)
    return merged


def _path_parts(path: str) -> list[tuple[str, list[int]]] | None:
    """``loads[0].magnitude`` as [("loads", [0]), ("magnitude", [])]; None if not a path."""
    parts = []
    for part in path.split("."):
        match = _PATH_PART.fullmatch(part)
        if match is None:
            return None
        parts.append((match.group(1), [int(index) for index in re.findall(r"\d+", match.group(2))]))
    return parts


def _set_path(data: dict[str, Any], path: str, value: str) -> None:
    """Set ``loads[0].magnitude`` in nested data, creating (or replacing) tables as needed.

    The path has been checked against the job's keys (:func:`column_problem`). A
    value the base job holds where the path goes deeper (``member.section.kind``
    over a catalog name) is replaced by a table: the row gives the whole key.
    """
    parts = _path_parts(path)
    assert parts is not None
    target: Any = data
    for position, (key, indices) in enumerate(parts):
        last = position == len(parts) - 1
        if not indices:
            if last:
                target[key] = value
            else:
                if not isinstance(target.get(key), dict):
                    target[key] = {}
                target = target[key]
            continue
        if not isinstance(target.get(key), list):
            target[key] = []
        items = target[key]
        for depth, index in enumerate(indices):
            deeper = depth < len(indices) - 1
            while len(items) <= index:
                items.append([] if deeper else {})
            if deeper:
                if not isinstance(items[index], list):
                    items[index] = []
                items = items[index]
            elif last:
                items[index] = value
            else:
                if not isinstance(items[index], dict):
                    items[index] = {}
                target = items[index]


def _list_item(annotation: Any) -> Any | None:
    """The item type of a list annotation (``list[LoadSpec] | None`` -> LoadSpec)."""
    if typing.get_origin(annotation) is typing.Annotated:  # a list with its bounds
        return _list_item(typing.get_args(annotation)[0])
    if typing.get_origin(annotation) is list:
        return typing.get_args(annotation)[0]
    if typing.get_origin(annotation) in (typing.Union, types.UnionType):
        for option in typing.get_args(annotation):
            item = _list_item(option)
            if item is not None:
                return item
    return None


def _tables_in(annotation: Any) -> list[type[BaseModel]]:
    """The job tables (pydantic models) a value of ``annotation`` may be."""
    if isinstance(annotation, type) and issubclass(annotation, BaseModel):
        return [annotation]
    found: list[type[BaseModel]] = []
    for argument in typing.get_args(annotation):
        found += [model for model in _tables_in(argument) if model not in found]
    return found


def column_problem(path: str) -> str | None:
    """What is wrong with a CSV header's key path for a job (None: it is one)."""
    parts = _path_parts(path)
    if parts is None:
        return "not a job key path (like loads[0].magnitude)"
    tables: list[type[BaseModel]] = [Job]
    for position, (key, indices) in enumerate(parts):
        fields = {name: info for table in tables for name, info in table.model_fields.items()}
        inside = ".".join(name for name, _ in parts[:position]) or "the job"
        if key not in fields:
            close = difflib.get_close_matches(key, sorted(fields), n=1, cutoff=0.6)
            hint = f'; did you mean "{close[0]}"?' if close else ""
            return f"{inside} has no key {key!r}{hint}"
        annotation = fields[key].annotation
        for index in indices:
            item = _list_item(annotation)
            if item is None:
                return f"{key} is not a list: write it without [{index}]"
            if index > MAX_INDEX:
                return f"index {index} too large (at most {MAX_INDEX})"
            annotation = item
        tables = _tables_in(annotation)
        if position < len(parts) - 1 and not tables:
            return f"{key} holds a value, not a table: nothing goes after it"
    return None


def members_from_toml(
    text: str, *, source: str, base: dict[str, Any] | None = None
) -> list[dict[str, Any]]:
    """Job data of each member of a TOML batch: base job, then [defaults], then the member."""
    try:
        data = tomllib.loads(text)
    except tomllib.TOMLDecodeError as error:
        raise JobError(source, [("", f"TOML syntax error: {error}")]) from None
    unknown = sorted(set(data) - {"defaults", "members"})
    if unknown:
        raise JobError(
            source,
            [(key, "unknown key; a batch has [defaults] and [[members]]") for key in unknown],
        )
    members = data.get("members")
    if not isinstance(members, list) or not members:
        raise JobError(source, [("members", "give at least one [[members]] entry")])
    defaults = data.get("defaults", {})
    problems = [] if isinstance(defaults, dict) else [("defaults", "must be a table")]
    problems += [
        (f"members[{index}]", "must be a table ([[members]])")
        for index, member in enumerate(members)
        if not isinstance(member, dict)
    ]
    if problems:
        raise JobError(source, problems)
    start = _merge(base or {}, defaults)
    return [_merge(start, member) for member in members]


def members_from_csv(text: str, base: dict[str, Any], *, source: str) -> list[BatchMember]:
    """Each CSV row as a member: the base job with the row's cells set by key path.

    Problems of the header stop the batch (they concern every row); problems of a
    row (a blank cell, too few or too many cells) are that row's and skip it.
    """
    rows = [row for row in csv.reader(io.StringIO(text))]
    numbered = [(number, row) for number, row in enumerate(rows, start=1) if "".join(row).strip()]
    if not numbered:
        raise JobError(source, [("", "the table is empty; its first row names job keys")])
    _, header = numbered[0]
    columns = [cell.strip() for cell in header]
    problems = []
    for position, column in enumerate(columns, start=1):
        if not column:
            problems.append((f"column {position}", "the header cell is blank; name a job key"))
        elif columns.index(column) != position - 1:
            problems.append((f"column {position}", f"{column!r} is named twice in the header"))
        else:
            problem = column_problem(column)
            if problem:
                problems.append((f"column {position} ({column})", problem))
    if problems:
        raise JobError(source, problems)
    if len(numbered) == 1:
        raise JobError(source, [("", "the table has no member rows under its header")])
    return [_csv_member(number, cells, columns, base) for number, cells in numbered[1:]]


def _csv_member(
    number: int, cells: list[str], columns: list[str], base: dict[str, Any]
) -> BatchMember:
    where = f"row {number}"
    problems = []
    if len(cells) > len(columns):
        extra = ", ".join(repr(cell) for cell in cells[len(columns) :])
        problems.append(
            (
                where,
                f"{len(cells)} cells but the header has {len(columns)} columns (extra: {extra})",
            )
        )
    data = copy.deepcopy(base)
    for position, column in enumerate(columns):
        place = f"{where}, column {position + 1} ({column})"
        if position >= len(cells):
            problems.append((place, "missing: the row has fewer cells than the header"))
            continue
        value = cells[position].strip()
        if not value:
            problems.append(
                (place, f"blank; give the value, or {BASE_VALUE} to keep the base job's")
            )
        elif value != BASE_VALUE:
            _set_path(data, column, value)
    return BatchMember(data, where, tuple(problems))


def _as_member(index: int, member: BatchMember | dict[str, Any]) -> BatchMember:
    if isinstance(member, BatchMember):
        return member
    return BatchMember(member, f"members[{index}]")


def _personalized(member: BatchMember) -> BatchMember:
    """The member with ``{member}`` in its title, subject, calc number and stem replaced."""
    name = member.name
    data = copy.deepcopy(member.data)
    for table, key in PER_MEMBER_KEYS:
        section = data.get(table)
        if isinstance(section, dict) and isinstance(section.get(key), str):
            section[key] = section[key].replace(MEMBER_PLACEHOLDER, name)
    return BatchMember(data, member.where, member.problems)


def _value(data: dict[str, Any], table: str, key: str) -> str:
    section = data.get(table)
    value = section.get(key, "") if isinstance(section, dict) else ""
    return value.strip() if isinstance(value, str) else ""


def _file_stem(member: BatchMember) -> str:
    """The file name part a member's outputs would start with (before the revision)."""
    from calcsheet.pipeline.run import safe_stem  # the one rule for file names

    return safe_stem(_value(member.data, "output", "stem") or member.name.strip())


def _listed(names: list[str]) -> str:
    shown = ", ".join(repr(name) for name in names[:6])
    return shown + (f" and {len(names) - 6} more" if len(names) > 6 else "")


def check_names(members: Sequence[BatchMember | dict[str, Any]], *, source: str) -> None:
    """Stop the batch before anything runs if members would overwrite each other's work.

    Missing or duplicate names, names that become the same file name, and a title,
    subject or calc number that several members' sheets would share.
    """
    if len(members) > MAX_MEMBERS:
        raise JobError(source, [("members", f"{len(members)} members; at most {MAX_MEMBERS}")])
    # Members whose row already has problems are skipped; they write nothing.
    usable = [
        _personalized(_as_member(index, member))
        for index, member in enumerate(members)
        if not _as_member(index, member).problems
    ]
    problems = [
        (f"{member.where}: member.name", "missing") for member in usable if not member.name.strip()
    ]
    names = [member.name for member in usable if member.name.strip()]
    twice = sorted({name for name in names if names.count(name) > 1})
    problems += [("member.name", f"{name!r} is used by more than one member") for name in twice]
    by_stem: dict[str, list[str]] = {}
    for member in usable:
        if member.name.strip() and member.name not in twice:
            by_stem.setdefault(_file_stem(member).casefold(), []).append(member.name)
    for clashing in by_stem.values():
        if len(clashing) > 1:
            problems.append(
                (
                    "member.name",
                    f"{_listed(clashing)} would all be written to the same files "
                    f"({_file_stem(_member_named(usable, clashing[0]))}-rev...): file names "
                    "keep letters, digits, '.', '_' and '-', turn any other characters into "
                    "'-' and may ignore case; make the names differ in letters or digits, "
                    "or give each member its own output.stem",
                )
            )
    for table, key in DISTINCT_KEYS:
        shared: dict[str, list[str]] = {}
        for member in usable:
            value = _value(member.data, table, key)
            if value:
                shared.setdefault(value, []).append(member.name)
        for value, owners in shared.items():
            if len(owners) > 1:
                shown = value if len(value) <= 60 else value[:57] + "..."
                problems.append(
                    (
                        f"{table}.{key}",
                        f"{shown!r} would be printed on the sheets of {len(owners)} members "
                        f"({_listed(owners)}); write {MEMBER_PLACEHOLDER} in it where the "
                        "member's name goes (in the base job or [defaults]), or give each "
                        f"member its own {table}.{key}",
                    )
                )
    if problems:
        raise JobError(source, problems)


def _member_named(members: list[BatchMember], name: str) -> BatchMember:
    return next(member for member in members if member.name == name)


def _one_line(error: CalcsheetError) -> str:
    if isinstance(error, JobError):
        return "; ".join(f"{path}: {text}" if path else text for path, text in error.problems)
    return str(error).replace("\n", "; ")


def _quietly(message: str) -> None:
    """Batch members wait for each other's writes without saying so."""


def build_member(
    member: BatchMember | dict[str, Any],
    folder: str,
    source: str,
    replace_issued: bool = False,
    package: bool = False,
) -> MemberOutcome:
    """Build and write one member (runs in a worker process); never raises for bad input.

    ``package``: also hand back the member's part of a calc package (its PDF markup).
    """
    from calcsheet.pipeline.run import build_sheets, package_entry, write_outputs  # workers only

    member = _personalized(_as_member(0, member))
    name = member.name or "?"
    table = member.data.get("member")
    section = table.get("section", "") if isinstance(table, dict) else ""
    if isinstance(section, dict):
        section = section.get("kind", "")
    section_text = section if isinstance(section, str) else ""
    where = f"{source} {member.where}".strip() if member.where.startswith("row") else source
    label = f"{where}: member {name}"
    try:
        if member.problems:
            raise JobError(label, list(member.problems))
        job = job_from_data(member.data, source=label)
        result = build_sheets(job, source=label)
        paths = write_outputs(result, Path(folder), replace_issued=replace_issued, waiting=_quietly)
    except CalcsheetError as error:
        return MemberOutcome(
            name,
            section_text,
            False,
            None,
            False,
            str(error),
            reason=_one_line(error),
            not_written=isinstance(error, ExportError),
        )
    return MemberOutcome(
        name,
        section_text,
        True,
        result.governing_utilization,
        result.all_pass,
        result.summary(),
        tuple(str(path) for path in paths),
        governing=result.governing_text(),
        package=package_entry(result) if package else None,
    )


def _ignore_interrupts() -> None:
    """Workers leave Ctrl-C to the parent, which stops handing out members."""
    signal.signal(signal.SIGINT, signal.SIG_IGN)


def run_batch(
    members: Sequence[BatchMember | dict[str, Any]],
    folder: Path,
    *,
    source: str,
    workers: int | None = None,
    progress: Callable[[int, int, MemberOutcome], None] | None = None,
    replace_issued: bool = False,
    package: bool = False,
) -> list[MemberOutcome]:
    """Build every member in parallel processes; outcomes in the table's order.

    ``package``: each outcome carries its member's part of a calc package
    (:func:`write_package` sets them into one PDF).
    """
    return run_batch_and_summary(
        members,
        folder,
        source=source,
        workers=workers,
        progress=progress,
        replace_issued=replace_issued,
        package=package,
        summarize=False,
    ).outcomes


@dataclass(frozen=True)
class BatchRun:
    """A batch's outcomes, and its summary files rendered but not yet written."""

    outcomes: list[MemberOutcome]
    summary: list[tuple[str, bytes]]  # (file name, contents), see :func:`summary_files`


def run_batch_and_summary(
    members: Sequence[BatchMember | dict[str, Any]],
    folder: Path,
    *,
    source: str,
    workers: int | None = None,
    progress: Callable[[int, int, MemberOutcome], None] | None = None,
    replace_issued: bool = False,
    package: bool = False,
    summarize: bool = True,
) -> BatchRun:
    """:func:`run_batch`, and the summary's files rendered by a worker already warm.

    A worker has the sheet engine imported and its PDF compiler's fonts loaded; the parent
    has neither (it only hands out members), and would spend a second or more on them
    after the last member, with every worker idle.
    """
    if workers is not None and (isinstance(workers, bool) or workers < 1):
        raise InputError("workers", workers, "a whole number of processes, at least 1")
    entries = [_as_member(index, member) for index, member in enumerate(members)]
    check_names(entries, source=source)
    workers = workers or os.cpu_count() or 1
    outcomes: list[MemberOutcome] = []
    count = len(entries)
    if workers == 1:
        results: Iterator[MemberOutcome] = (
            build_member(entry, str(folder), source, replace_issued, package) for entry in entries
        )
        for done, outcome in enumerate(results, start=1):
            outcomes.append(outcome)
            if progress:
                progress(done, count, outcome)
        return BatchRun(outcomes, summary_files(outcomes, source=source) if summarize else [])
    # "spawn": a forked worker would inherit the parent's PDF compiler and its threads.
    context = multiprocessing.get_context("spawn")
    with ProcessPoolExecutor(
        max_workers=workers, mp_context=context, initializer=_ignore_interrupts
    ) as pool:
        mapped = pool.map(
            build_member,
            entries,
            [str(folder)] * count,
            [source] * count,
            [replace_issued] * count,
            [package] * count,
        )
        for done, outcome in enumerate(mapped, start=1):
            outcomes.append(outcome)
            if progress:
                progress(done, count, outcome)
        if not summarize:
            return BatchRun(outcomes, [])
        # The package parts stay here: the summary needs none of their markup.
        light = [dataclasses.replace(outcome, package=None) for outcome in outcomes]
        summary = pool.submit(summary_files, light, source=source).result()
    return BatchRun(outcomes, summary)


SUMMARY_COLUMNS = [
    "member",
    "section",
    "governing utilization",
    "status",
    "governing check",
    "reason skipped",
]


def summary_csv(outcomes: list[MemberOutcome]) -> str:
    """One row per member: utilization, status, the governing check, or why it was skipped."""
    out = io.StringIO()
    writer = csv.writer(out, lineterminator="\n")
    writer.writerow(SUMMARY_COLUMNS)
    for outcome in outcomes:
        utilization = f"{outcome.utilization:.3f}" if outcome.ok else ""
        writer.writerow(
            [
                outcome.name,
                outcome.section,
                utilization,
                outcome.status,
                outcome.governing,
                outcome.reason,
            ]
        )
    return out.getvalue()


LOG_NAME = "batch.log"


def batch_log(outcomes: list[MemberOutcome], *, source: str) -> str:
    """The batch log: each member's summary line, or the full message of why it was skipped."""
    lines = [f"calcsheet batch {source}: {_counts(outcomes)}", ""]
    for outcome in outcomes:
        if outcome.ok:
            lines.append(outcome.message)
            lines += [f"  wrote {path}" for path in outcome.paths]
        else:
            lines.append(f"{outcome.name}: {outcome.status}")
            lines += [f"  {line}" for line in outcome.message.splitlines()]
    return "\n".join(lines) + "\n"


def _counts(outcomes: list[MemberOutcome]) -> str:
    failed = sum(1 for outcome in outcomes if outcome.ok and not outcome.all_pass)
    skipped = sum(1 for outcome in outcomes if not outcome.ok)
    passed = len(outcomes) - failed - skipped
    return f"{len(outcomes)} members: {passed} pass, {failed} fail, {skipped} skipped"


def summary_sheet(outcomes: list[MemberOutcome], *, title: str = "Batch summary") -> Any:
    """The summary as a sheet (a table of members) for PDF and HTML."""
    from calcsheet.engine import Sheet  # the engine only when a summary sheet is wanted

    sheet = Sheet(title)
    skipped = sum(1 for outcome in outcomes if not outcome.ok)
    why = f" (why: the last column, and {LOG_NAME} beside this file)" if skipped else ""
    sheet.text(f"{_counts(outcomes)}{why}.")
    rows = list(csv.reader(io.StringIO(summary_csv(outcomes))))
    sheet.table(rows[0], rows[1:], caption="Governing utilization of each member")
    return sheet


@dataclass(frozen=True)
class PackageFiles:
    """The files of a calc package and what it holds."""

    paths: tuple[Path, ...]
    members: int  # members whose sheets are in it
    left_out: int  # members skipped (their line in the contents says why)


def write_package(
    outcomes: list[MemberOutcome],
    folder: Path,
    *,
    source: str,
    calc_number: str = "",
    replace_issued: bool = False,
    waiting: Callable[[str], None] | None = None,
) -> PackageFiles:
    """Write the calc package of a batch: one PDF/A-2b with a cover, the contents, the
    summary and every member's sheets numbered through, and a JSON saying what is in it
    (:func:`calcsheet.pipeline.package.render_package`, a part per member).

    ``outcomes`` come from :func:`run_batch` with ``package=True``. The package's inputs
    hash covers every member's; an issued package of the same name and revision is
    replaced only by the same inputs, or with ``replace_issued`` (as a member's files).
    Raises :class:`JobError` when no member could be built.
    """
    from calcsheet.export.files import folder_lock, make_folder, write_all_atomically
    from calcsheet.pipeline.package import PackagePart, PackageSummary, render_package

    entries = [outcome.package for outcome in outcomes if outcome.ok and outcome.package]
    if not entries:
        raise JobError(
            source,
            [
                (
                    "package",
                    f"none of the {len(outcomes)} members was built (see why in {LOG_NAME}), "
                    "so there are no sheets to put in a calc package; nothing was written "
                    "for it",
                )
            ],
        )
    parts = [
        PackagePart(
            name=outcome.name,
            section=outcome.section,
            utilization=outcome.utilization,
            status=outcome.status,
            note=outcome.governing if outcome.ok else outcome.reason,
            inputs=outcome.package.inputs if outcome.package else None,
            markups=outcome.package.markups if outcome.ok and outcome.package else (),
        )
        for outcome in outcomes
    ]
    summary_rows = list(csv.reader(io.StringIO(summary_csv(outcomes))))
    summary = PackageSummary(
        heading="Batch summary",
        columns=summary_rows[0],
        rows=summary_rows[1:],
        counts=_counts(outcomes),
        part_heading="Member",
        holds=("Members", f"{len(entries)} of {len(outcomes)} ({source})"),
    )
    package = render_package(
        parts,
        entries,
        folder,
        source=source,
        calc_number=calc_number.strip() or f"{Path(source).stem} package",
        summary=summary,
        manifest_members=[
            {
                "name": outcome.name,
                "status": outcome.status,
                "governing_utilization": outcome.utilization,
                "inputs": outcome.package.inputs if outcome.package else None,
            }
            for outcome in outcomes
        ],
    )
    make_folder(folder)
    with folder_lock(folder, waiting=waiting):
        if not replace_issued:
            package.refuse_replacing(
                folder, source=source, command="calcsheet batch --package --replace-issued"
            )
        write_all_atomically(package.files)
    return PackageFiles(package.paths, len(entries), len(outcomes) - len(entries))


SUMMARY_NAME = "summary"


def summary_files(outcomes: list[MemberOutcome], *, source: str) -> list[tuple[str, bytes]]:
    """The batch's summary as files (name, contents): the summary sheet's HTML and PDF,
    ``summary.csv`` and the batch log, in the order they are reported."""
    from calcsheet.export.files import pdf_bytes
    from calcsheet.render.html import render_html

    sheet = summary_sheet(outcomes)
    return [
        (f"{SUMMARY_NAME}.html", render_html(sheet).encode("utf-8")),
        (f"{SUMMARY_NAME}.pdf", pdf_bytes(sheet)),
        (f"{SUMMARY_NAME}.csv", summary_csv(outcomes).encode()),
        (LOG_NAME, batch_log(outcomes, source=source).encode()),
    ]
