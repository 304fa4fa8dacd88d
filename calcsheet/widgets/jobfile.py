"""Saving the form as a job file, and the mark of the next revision.

A job file is the user's own text: saving over one changes only the keys whose
values changed and keeps every comment, blank line, key order and quoting
elsewhere (the file is updated through tomlkit, a round-trip TOML library), and
it keeps the file's permissions. A new file gets the permissions the process
umask gives (as any editor's would), and a header saying it came from the form.
Whether to write over a file at all is the form's decision (it asks first when
the file was not written by the form): see :meth:`MemberForm.save`.
"""

from __future__ import annotations

import re
import tomllib
from datetime import date
from pathlib import Path
from typing import Any

import tomli_w
import tomlkit
from tomlkit.container import Container
from tomlkit.items import AoT, Item

from calcsheet.export.files import existing_mode, write_atomically
from calcsheet.job import job_from_data

FORM_MARK = "# calcsheet job file, saved from the member form"
HEADER = FORM_MARK + " on {day}.\n# Build it with:  calcsheet build {name}\n"
_FORM_HEADER_LINE = re.compile(re.escape(FORM_MARK) + r" on [^\n]*")
_BYTE_ORDER_MARK = "\ufeff"
_TRAILING_NUMBER = re.compile(r"^(.*?)(\d+)$")
_TRAILING_LETTERS = re.compile(r"^(.*?)([A-Za-z]+)$")


def without_none(value: Any) -> Any:
    """TOML has no null: keys whose value is None are left out (the job file's defaults)."""
    if isinstance(value, dict):
        return {key: without_none(item) for key, item in value.items() if item is not None}
    if isinstance(value, list):
        return [without_none(item) for item in value]
    return value


def job_file_path(path: str | Path) -> Path:
    """The path a job file is saved at: ``.toml`` is added when the name lacks it."""
    path = Path(path)
    return path if path.suffix.lower() == ".toml" else path.with_name(path.name + ".toml")


def written_by_form(path: Path) -> bool:
    """Whether the file at ``path`` was created by the form (it starts with the form's header)."""
    try:
        with Path(path).open("rb") as stream:
            start = stream.read(len(FORM_MARK.encode("utf-8")) + 3)
    except OSError:
        return False
    return start.decode("utf-8", "replace").lstrip(_BYTE_ORDER_MARK).startswith(FORM_MARK)


def job_toml(data: dict[str, Any], *, name: str = "job.toml", previous: str | None = None) -> str:
    """The job file text for the form's data (validated first: a bad job is not written).

    With ``previous`` (the text of the file being written over) the result is that
    text with only the changed keys changed; comments and layout stay. Should the
    updated text not read back as the same job (text that is not TOML, say), a fresh
    file is written instead: the job's values come first.
    """
    job = job_from_data(data, source="form")  # raises JobError naming every problem
    plain = without_none(data)
    if previous is not None:
        updated = _updated_text(previous, plain, job)
        if updated is not None:
            return updated
    header = HEADER.format(day=date.today().isoformat(), name=name)
    return header + "\n" + tomli_w.dumps(plain)


def write_job_file(path: Path, data: dict[str, Any]) -> Path:
    """Write the job file atomically (an interrupted save leaves the previous file whole).

    An existing file keeps its comments, layout and permissions where keys did not
    change; a new one gets the permissions of the process umask.
    """
    path = job_file_path(path)
    previous = _readable_text(path)
    text = job_toml(data, name=path.name, previous=previous)
    path.parent.mkdir(parents=True, exist_ok=True)
    write_atomically(path, text.encode("utf-8"), mode=existing_mode(path))
    return path


def _readable_text(path: Path) -> str | None:
    """The text of an existing file to update, or None (no file, or not UTF-8 text)."""
    try:
        return path.read_bytes().decode("utf-8")
    except (OSError, UnicodeDecodeError):
        return None


def _updated_text(previous: str, data: dict[str, Any], job: object) -> str | None:
    """``previous`` with ``data``'s values put in; None if that cannot be done faithfully."""
    mark = _BYTE_ORDER_MARK if previous.startswith(_BYTE_ORDER_MARK) else ""
    body = previous.removeprefix(_BYTE_ORDER_MARK)
    try:
        document = tomlkit.parse(body)
        added: list[tuple[Any, str]] = []
        _merge_table(document, data, added)
        _drop_needless_additions(document, added, job)
        text = tomlkit.dumps(document)
    except Exception:  # not TOML (tomlkit raises its own errors), or a shape it cannot update
        return None
    if text != body:  # a table added last brings its blank line: end as the file did
        text = text.rstrip("\n") + "\n" if body.endswith("\n") else text
    text = _FORM_HEADER_LINE.sub(f"{FORM_MARK} on {date.today().isoformat()}.", text, count=1)
    try:
        if job_from_data(tomllib.loads(text), source="form") != job:
            return None
    except Exception:  # the updated text does not read back: write afresh
        return None
    return mark + text


def _merge_table(table: Any, data: dict[str, Any], added: list[tuple[Any, str]]) -> None:
    """Make ``table`` (a tomlkit table or document) hold ``data``, touching only what differs."""
    for key in [key for key in table if key not in data]:
        del table[key]
    for key, value in data.items():
        if key not in table:
            table[key] = _new_item(value)
            added.append((table, key))
            continue
        current = table[key]
        if _plain(current) == value:
            continue  # unchanged: its text, comment and place stay as they are
        if isinstance(value, dict) and isinstance(current, dict):
            _merge_table(current, value, added)
        elif _is_table_list(value) and isinstance(current, AoT):
            _merge_table_list(current, value, added)
        elif isinstance(value, dict) or _is_table_list(value):
            table[key] = _new_item(value)  # e.g. a designation became a table of dimensions
        else:
            table[key] = value  # tomlkit keeps the comment after the value


def _merge_table_list(tables: AoT, data: list[dict[str, Any]], added: list) -> None:
    """Update an array of tables (loads, couples, revisions), keeping each entry's text.

    Entries are matched by their ``name`` where every one has a distinct name (a load
    removed from the middle takes its comments with it), otherwise by position.
    """
    old_names = [_plain(table.get("name")) for table in tables]
    new_names = [value.get("name") for value in data]
    by_name = all(isinstance(name, str) for name in old_names + new_names) and (
        len(set(old_names)) == len(old_names) and len(set(new_names)) == len(new_names)
    )
    if by_name:
        old_by_name = dict(zip(old_names, tables, strict=True))
        matched = [old_by_name.get(name) for name in new_names]
    else:
        matched = [tables[index] if index < len(tables) else None for index in range(len(data))]
    entries = []
    for table, value in zip(matched, data, strict=True):
        if table is None:
            entries.append(_new_item(value))
        else:
            _merge_table(table, value, added)
            entries.append(table)
    if len(entries) == len(tables) and all(a is b for a, b in zip(entries, tables, strict=True)):
        return  # the same entries in the same order: each was updated in place
    while len(tables):
        del tables[0]
    for entry in entries:
        tables.append(entry)


def _new_item(value: Any) -> Any:
    """A value for a key the file does not have; tables end with a blank line, as written."""
    if isinstance(value, dict):
        table = tomlkit.table()
        for key, item in value.items():
            table[key] = _new_item(item)
        table.add(tomlkit.nl())
        return table
    if _is_table_list(value):
        tables = tomlkit.aot()
        for item in value:
            tables.append(_new_item(item))
        return tables
    return value


def _is_table_list(value: Any) -> bool:
    return isinstance(value, list) and bool(value) and all(isinstance(v, dict) for v in value)


def _plain(value: Any) -> Any:
    """A tomlkit value as plain Python (dicts, lists, str, numbers), for comparing."""
    if isinstance(value, (Item, Container)):
        return value.unwrap()
    return value


def _drop_needless_additions(document: Any, added: list[tuple[Any, str]], job: object) -> None:
    """Leave out added keys the job does not need (defaults the file did not write)."""
    for table, key in reversed(added):
        value = table[key]
        del table[key]
        try:
            same = job_from_data(document.unwrap(), source="form") == job
        except Exception:
            same = False
        if not same:
            table[key] = value


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
