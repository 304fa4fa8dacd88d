"""The revision delta: what changed between two jobs, and how each result moved.

Written as a sheet of its own (tables, no steps) that an engineer attaches to a
resubmittal: the changed inputs by key path with old and new text, then every
check of every station with its old and new utilization and status.
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from typing import Any

from calcsheet.build.run import BuildResult
from calcsheet.build.stamp import normalized
from calcsheet.engine import Sheet, TitleBlock

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


def _checks(result: BuildResult) -> dict[tuple[str, str], dict]:
    found = {}
    for built in result.sheets:
        station = built.stem.rsplit("-z", 1)[1] if "-z" in built.stem else ""
        for check in built.results["checks"]:
            found[(station, check["description"])] = check
    return found


def delta_sheet(old: BuildResult, new: BuildResult) -> Sheet:
    """A sheet listing the changed inputs and the moved results of two builds."""
    old_block = old.sheets[0].sheet.title_block
    new_block = new.sheets[0].sheet.title_block
    sheet = Sheet(
        f"Revision delta: {new.member}, rev. {old_block.revision} to rev. {new_block.revision}",
        title_block=TitleBlock(
            project=new_block.project,
            project_number=new_block.project_number,
            subject=f"Changes from rev. {old_block.revision} to rev. {new_block.revision}",
            calc_number=new_block.calc_number,
            prepared_by=new_block.prepared_by,
            prepared_date=new_block.prepared_date,
            revision=new_block.revision,
        ),
        units=new.job.sheet.units,
    )
    sheet.stamp = f"inputs {old.hash} to {new.hash}"
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
