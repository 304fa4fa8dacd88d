"""The revision delta: what changed between two jobs, and how each result moved.

Written as a sheet of its own (tables, no steps) that an engineer attaches to a
resubmittal: the changed inputs by key path with old and new text, then every
check of every station with its old and new utilization and status.

Only revisions of one member compare, the earlier first (:func:`check_comparable`):
two different members, or a later revision given as the old one, are refused
unless the caller asks for different members on purpose.
"""

from __future__ import annotations

import dataclasses
import math
import re
from dataclasses import dataclass
from typing import Any

from calcsheet.engine import Sheet
from calcsheet.job import JobError
from calcsheet.pipeline.run import BuildResult
from calcsheet.pipeline.trace import normalized

ABSENT = "(none)"


def _flatten(value: Any, path: str = "") -> dict[str, Any]:
    if isinstance(value, dict):
        flat: dict[str, Any] = {}
        for key, item in value.items():
            flat.update(_flatten(item, f"{path}.{key}" if path else str(key)))
        return flat
    if isinstance(value, list) and value and isinstance(value[0], dict):
        flat = {}
        for index, item in enumerate(value):
            flat.update(_flatten(item, f"{path}[{index}]"))
        return flat
    return {path: value}


def _shown(value: Any) -> str:
    if value is None:
        return ABSENT
    if isinstance(value, list):
        return ", ".join(str(item) for item in value)
    return str(value)


@dataclass(frozen=True)
class InputChange:
    path: str
    old: str
    new: str


def changed_inputs(old: BuildResult, new: BuildResult) -> list[InputChange]:
    """Inputs whose value differs (units normalized: "6.5 kip" equals "6500 lbf")."""
    before = _flatten(old.job.model_dump(mode="json", exclude={"output"}))
    after = _flatten(new.job.model_dump(mode="json", exclude={"output"}))
    changes = []
    for path in [*before, *(key for key in after if key not in before)]:
        a, b = before.get(path), after.get(path)
        key = re.sub(r"\[\d+\]$", "", path.rsplit(".", 1)[-1])
        if normalized(a, key) != normalized(b, key):
            changes.append(InputChange(path, _shown(a), _shown(b)))
    return changes


def _current_mark(result: BuildResult) -> str:
    return result.job.revisions[-1].mark if result.job.revisions else "0"


def _mark_order(mark: str) -> tuple[int, int | str] | None:
    """A mark's place in the usual sequences (0, 1, 2... or A, B, C...); None if neither."""
    if mark.isdigit():
        return (0, int(mark))
    if len(mark) == 1 and mark.isalpha():
        return (1, mark.upper())
    return None


def _is_later(old: BuildResult, new: BuildResult) -> bool:
    """Whether the old job's revision comes after the new job's."""
    old_mark, new_mark = _current_mark(old), _current_mark(new)
    if old_mark == new_mark:
        return False  # two versions of one revision: a what-if, in either order
    old_log = [revision.mark for revision in old.job.revisions]
    new_log = [revision.mark for revision in new.job.revisions]
    if new_mark in old_log[:-1]:
        return True  # the old job's log lists the new one's mark as an earlier issue
    if old_mark in new_log[:-1]:
        return False
    old_place, new_place = _mark_order(old_mark), _mark_order(new_mark)
    if old_place and new_place and old_place[0] == new_place[0]:
        return old_place > new_place
    return False  # nothing tells the order: compare as given


def check_comparable(old: BuildResult, new: BuildResult, *, other_member: bool = False) -> None:
    """Raise :class:`JobError` unless ``new`` is a later (or the same) revision of ``old``'s member.

    ``other_member`` allows two different members (a delta between two similar arms).
    """
    problems = []
    if not other_member and old.job.member.name != new.job.member.name:
        problems.append(
            (
                "member.name",
                f"the old job is member {old.job.member.name!r} and the new one "
                f"{new.job.member.name!r}: a revision delta compares two revisions of one "
                "member; pass --other-member to compare two members on purpose",
            )
        )
    if _is_later(old, new):
        old_mark, new_mark = _current_mark(old), _current_mark(new)
        problems.append(
            (
                "revisions",
                f"the old job ({old.source}) is rev. {old_mark}, later than the new job's "
                f"rev. {new_mark}: give the earlier revision first "
                f"(calcsheet compare {new.source} {old.source})",
            )
        )
    if problems:
        raise JobError(f"compare {old.source} with {new.source}", problems)


def _checks(result: BuildResult) -> dict[tuple[str, str], dict]:
    found = {}
    for built in result.sheets:
        station = built.stem.rsplit("-z", 1)[1] if "-z" in built.stem else ""
        for check in built.results["checks"]:
            # The JSON gives a utilization that is not finite (zero capacity) as null.
            worst = check["utilization"]
            found[(station, check["description"])] = {
                **check,
                "utilization": math.inf if worst is None else worst,
            }
    return found


def delta_sheet(old: BuildResult, new: BuildResult) -> Sheet:
    """A sheet listing the changed inputs and the moved results of two builds."""
    old_block = old.sheets[0].sheet.title_block
    new_block = new.sheets[0].sheet.title_block
    sheet = Sheet(
        f"Revision delta: {new.member}, rev. {old_block.revision} to rev. {new_block.revision}",
        # The new build's title block, but the subject; not checked yet.
        title_block=dataclasses.replace(
            new_block,
            subject=f"Changes from rev. {old_block.revision} to rev. {new_block.revision}",
            checked_by="",
            checked_date="",
        ),
        units=new.job.sheet.units,
    )
    sheet.trace = f"inputs {old.hash} to {new.hash}"
    sheet.heading("Inputs changed")
    changes = changed_inputs(old, new)
    if changes:
        sheet.table(
            ["Input (job file key)", f"Rev. {old_block.revision}", f"Rev. {new_block.revision}"],
            [[change.path, change.old, change.new] for change in changes],
            caption=f"{len(changes)} input(s) changed; every other input is the same",
        )
    else:
        sheet.text("No input changed: the two jobs give the same sheet.")
    sheet.heading("Results")
    before, after = _checks(old), _checks(new)
    rows = []
    for key in [*before, *(key for key in after if key not in before)]:
        a, b = before.get(key), after.get(key)
        station, description = key
        label = f"{description} (station {station})" if station else description
        rows.append(
            [
                label,
                f"{a['utilization']:.3f} {a['status']}" if a else ABSENT,
                f"{b['utilization']:.3f} {b['status']}" if b else ABSENT,
                f"{b['utilization'] - a['utilization']:+.3f}" if a and b else "",
                (b or {}).get("at", ""),
            ]
        )
    sheet.table(
        [
            "Check",
            f"Rev. {old_block.revision}",
            f"Rev. {new_block.revision}",
            "Change",
            "Governs at (new)",
        ],
        rows,
        caption="Utilization of every check, before and after",
    )
    return sheet
