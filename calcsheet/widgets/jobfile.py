"""Saving the form as a job file, and the mark of the next revision."""

from __future__ import annotations

import re
from datetime import date
from pathlib import Path
from typing import Any

import tomli_w

from calcsheet.export.files import write_atomically
from calcsheet.job import job_from_data

HEADER = (
    "# calcsheet job file, saved from the member form on {day}.\n"
    "# Build it with:  calcsheet build {name}\n"
)
_TRAILING_NUMBER = re.compile(r"^(.*?)(\d+)$")
_TRAILING_LETTERS = re.compile(r"^(.*?)([A-Za-z]+)$")


def without_none(value: Any) -> Any:
    """TOML has no null: keys whose value is None are left out (the job file's defaults)."""
    if isinstance(value, dict):
        return {key: without_none(item) for key, item in value.items() if item is not None}
    if isinstance(value, list):
        return [without_none(item) for item in value]
    return value


def job_toml(data: dict[str, Any], *, name: str = "job.toml") -> str:
    """The job file text for the form's data (validated first: a bad job is not written)."""
    job_from_data(data, source="form")  # raises JobError naming every problem
    header = HEADER.format(day=date.today().isoformat(), name=name)
    return header + "\n" + tomli_w.dumps(without_none(data))


def write_job_file(path: Path, data: dict[str, Any]) -> Path:
    """Write the job file atomically (an interrupted save leaves the previous file whole)."""
    path = Path(path)
    if path.suffix.lower() != ".toml":
        path = path.with_name(path.name + ".toml")
    text = job_toml(data, name=path.name)
    path.parent.mkdir(parents=True, exist_ok=True)
    write_atomically(path, text.encode("utf-8"))
    return path


def next_revision_mark(marks: list[str]) -> str:
    """The mark after the last one: A -> B, Z -> AA, 0 -> 1, 9 -> 10, P1 -> P2; none -> A."""
    if not marks or not marks[-1].strip():
        return "A"
    last = marks[-1].strip()
    number = _TRAILING_NUMBER.match(last)
    if number:
        prefix, digits = number.groups()
        return f"{prefix}{int(digits) + 1:0{len(digits)}d}"
    letters = _TRAILING_LETTERS.match(last)
    if letters:
        prefix, tail = letters.groups()
        return prefix + _next_letters(tail)
    return last + "1"


def _next_letters(text: str) -> str:
    """Count in letters, keeping the case: B -> C, Z -> AA, AZ -> BA, b -> c."""
    upper = text.isupper() or not text.islower()
    first = "A" if upper else "a"
    last = "Z" if upper else "z"
    chars = list(text)
    for index in range(len(chars) - 1, -1, -1):
        if chars[index] in (last, last.lower(), last.upper()):
            chars[index] = first
            continue
        chars[index] = chr(ord(chars[index]) + 1)
        return "".join(chars)
    return first + "".join(chars)
