"""Many members from one table: a sheet each, in parallel processes, plus a summary.

A batch is a TOML file with ``[defaults]`` (any job keys) and ``[[members]]``
(each member's keys, merged over the defaults), or a CSV file whose header names
job keys by path (``member.name``, ``member.section``, ``loads[0].magnitude``)
over a base job given separately. A bad member is reported and skipped; the
others still build. Duplicate member names stop the batch before anything runs.
"""

from __future__ import annotations

import copy
import csv
import io
import multiprocessing
import os
import re
import tomllib
from collections.abc import Callable, Iterator
from concurrent.futures import ProcessPoolExecutor
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from calcsheet.errors import CalcsheetError
from calcsheet.job import JobError, job_from_data

MAX_MEMBERS = 5000
_PATH_PART = re.compile(r"([A-Za-z_][A-Za-z0-9_]*)((?:\[\d+\])*)")


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


def _merge(base: dict[str, Any], over: dict[str, Any]) -> dict[str, Any]:
    merged = copy.deepcopy(base)
    for key, value in over.items():
        if isinstance(value, dict) and isinstance(merged.get(key), dict):
            merged[key] = _merge(merged[key], value)
        else:
            merged[key] = copy.deepcopy(value)
    return merged


def _set_path(data: dict[str, Any], path: str, value: str, *, where: str) -> None:
    """Set ``loads[0].magnitude`` in nested data, creating tables as needed."""
    target: Any = data
    parts = path.split(".")
    for position, part in enumerate(parts):
        match = _PATH_PART.fullmatch(part)
        if match is None:
            raise JobError(where, [(path, "not a job key path (like loads[0].magnitude)")])
        key, indices = match.group(1), [int(i) for i in re.findall(r"\d+", match.group(2))]
        last = position == len(parts) - 1
        if not indices:
            if last:
                target[key] = value
            else:
                target = target.setdefault(key, {})
            continue
        items = target.setdefault(key, [])
        for depth, index in enumerate(indices):
            if index > 200:
                raise JobError(where, [(path, "index too large (at most 200)")])
            while len(items) <= index:
                items.append({})
            if depth < len(indices) - 1:
                items = items[index]
            elif last:
                items[index] = value
            else:
                target = items[index]


def members_from_toml(text: str, *, source: str) -> list[dict[str, Any]]:
    """Job data of each member of a TOML batch (defaults merged)."""
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
    return [_merge(defaults, member) for member in members]


def members_from_csv(text: str, base: dict[str, Any], *, source: str) -> list[dict[str, Any]]:
    """Job data of each CSV row: the base job with the row's cells set by key path."""
    rows = list(csv.DictReader(io.StringIO(text)))
    if not rows:
        raise JobError(source, [("", "the table has no member rows under its header")])
    members = []
    for number, row in enumerate(rows, start=2):
        data = copy.deepcopy(base)
        for path, value in row.items():
            if path is None:
                raise JobError(source, [(f"row {number}", "more cells than header columns")])
            if value is not None and value.strip():
                _set_path(data, path.strip(), value.strip(), where=f"{source} row {number}")
        members.append(data)
    return members


def check_names(members: list[dict[str, Any]], *, source: str) -> None:
    """Duplicate or missing member names stop the batch (their files would collide)."""
    if len(members) > MAX_MEMBERS:
        raise JobError(source, [("members", f"{len(members)} members; at most {MAX_MEMBERS}")])
    names = [str(member.get("member", {}).get("name", "")) for member in members]
    problems = [
        (f"members[{index}].member.name", "missing") for index, name in enumerate(names) if not name
    ]
    twice = sorted({name for name in names if name and names.count(name) > 1})
    problems += [("member.name", f"{name!r} is used by more than one member") for name in twice]
    if problems:
        raise JobError(source, problems)


def build_member(data: dict[str, Any], folder: str, source: str) -> MemberOutcome:
    """Build and write one member (runs in a worker process); never raises for bad input."""
    from calcsheet.build.run import build_sheets, write_outputs  # heavy: only in workers

    name = str(data.get("member", {}).get("name", "?"))
    section = data.get("member", {}).get("section", "")
    section_text = section if isinstance(section, str) else str(section.get("kind", ""))
    try:
        job = job_from_data(data, source=f"{source}: member {name}")
        result = build_sheets(job, source=f"{source}: member {name}")
        paths = write_outputs(result, Path(folder))
    except CalcsheetError as error:
        return MemberOutcome(name, section_text, False, None, False, str(error))
    return MemberOutcome(
        name,
        section_text,
        True,
        result.governing_utilization,
        result.all_pass,
        result.summary(),
        tuple(str(path) for path in paths),
    )


def run_batch(
    members: list[dict[str, Any]],
    folder: Path,
    *,
    source: str,
    workers: int | None = None,
    progress: Callable[[int, int, MemberOutcome], None] | None = None,
) -> list[MemberOutcome]:
    """Build every member in parallel processes; outcomes in the table's order."""
    check_names(members, source=source)
    workers = workers or os.cpu_count() or 1
    outcomes: list[MemberOutcome] = []
    if workers == 1:
        results: Iterator[MemberOutcome] = (
            build_member(data, str(folder), source) for data in members
        )
        for done, outcome in enumerate(results, start=1):
            outcomes.append(outcome)
            if progress:
                progress(done, len(members), outcome)
        return outcomes
    # "spawn": a forked worker would inherit the parent's PDF compiler and its threads.
    context = multiprocessing.get_context("spawn")
    with ProcessPoolExecutor(max_workers=workers, mp_context=context) as pool:
        mapped = pool.map(
            build_member, members, [str(folder)] * len(members), [source] * len(members)
        )
        for done, outcome in enumerate(mapped, start=1):
            outcomes.append(outcome)
            if progress:
                progress(done, len(members), outcome)
    return outcomes


def summary_csv(outcomes: list[MemberOutcome]) -> str:
    """member, section, governing utilization, status: one row per member."""
    out = io.StringIO()
    writer = csv.writer(out, lineterminator="\n")
    writer.writerow(["member", "section", "governing utilization", "status"])
    for outcome in outcomes:
        if outcome.ok:
            status = "OK" if outcome.all_pass else "NOT OK"
            writer.writerow([outcome.name, outcome.section, f"{outcome.utilization:.3f}", status])
        else:
            writer.writerow([outcome.name, outcome.section, "", "SKIPPED (bad input)"])
    return out.getvalue()


def summary_sheet(outcomes: list[MemberOutcome], *, title: str = "Batch summary") -> Any:
    """The summary as a sheet (a table of members) for PDF and HTML."""
    from calcsheet.engine import Sheet  # the engine only when a summary sheet is wanted

    sheet = Sheet(title)
    failed = sum(1 for outcome in outcomes if outcome.ok and not outcome.all_pass)
    skipped = sum(1 for outcome in outcomes if not outcome.ok)
    sheet.text(
        f"{len(outcomes)} members: {len(outcomes) - failed - skipped} pass, {failed} fail, "
        f"{skipped} skipped for bad input (see the batch log)."
    )
    rows = list(csv.reader(io.StringIO(summary_csv(outcomes))))
    sheet.table(rows[0], rows[1:], caption="Governing utilization of each member")
    return sheet
