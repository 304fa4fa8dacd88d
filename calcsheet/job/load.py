"""Read a job file: TOML syntax, then the schema, reporting every problem at once."""

from __future__ import annotations

import difflib
import tomllib
from pathlib import Path
from typing import Any

from pydantic import ValidationError

from calcsheet.errors import CalcsheetError
from calcsheet.job.schema import Job, known_keys

# A job file is a page of text; anything far larger is not one (and is not read whole).
MAX_JOB_BYTES = 1_000_000


class JobError(CalcsheetError):
    """A job file cannot be used; ``problems`` lists every (key path, message) found."""

    def __init__(self, source: str, problems: list[tuple[str, str]]) -> None:
        self.source = source
        self.problems = problems
        count = len(problems)
        heading = f"{source}: {count} problem{'s' if count != 1 else ''}"
        lines = [f"  {path}: {message}" if path else f"  {message}" for path, message in problems]
        super().__init__("\n".join([heading, *lines]))


def key_path(location: tuple[str | int, ...]) -> str:
    """``("loads", 0, "magnitude")`` as ``loads[0].magnitude``."""
    text = ""
    for part in location:
        if isinstance(part, int):
            text += f"[{part}]"
        else:
            text += f".{part}" if text else str(part)
    return text


def _message(error: dict[str, Any]) -> str:
    kind, location = error["type"], error["loc"]
    given = error.get("input")
    if kind == "extra_forbidden":
        key = str(location[-1])
        close = difflib.get_close_matches(key, sorted(known_keys()), n=1, cutoff=0.6)
        hint = f'; did you mean "{close[0]}"?' if close else ""
        return f"unknown key{hint}"
    if kind == "missing":
        return "required key is missing"
    if kind in ("too_long", "too_short") and error.get("ctx", {}).get("field_type") == "List":
        # pydantic says "List should have at most 200 items after validation, not 10000".
        context = error["ctx"]
        bound = context["max_length"] if kind == "too_long" else context["min_length"]
        entries = f"{bound:,} entr{'y' if bound == 1 else 'ies'}"
        limit = f"at most {entries}" if kind == "too_long" else f"at least {entries}"
        return f"{limit} allowed; this list has {context['actual_length']:,}"
    if kind == "string_too_long" and isinstance(given, str):
        # pydantic says "String should have at most 200 characters".
        bound = error["ctx"]["max_length"]
        return (
            f"at most {bound:,} characters allowed; this text has {len(given):,} "
            f"(it begins {given[:40]!r}): shorten it"
        )
    message = str(error["msg"]).removeprefix("Value error, ")
    if isinstance(given, (str, int, float)) and not isinstance(given, bool):
        shown = repr(given) if len(repr(given)) <= 60 else repr(given)[:57] + "...'"
        return f"{message} (got {shown})"
    return message


def _is_branch(location: tuple[str | int, ...], kind: str) -> bool:
    """Whether a union's branch of ``kind`` (pydantic names it ``literal['auto']``) reported."""
    return any(isinstance(part, str) and part.startswith(kind) for part in location)


def _problems(error: ValidationError) -> list[tuple[str, str]]:
    seen: dict[tuple[str, str], None] = {}
    for item in error.errors():
        # A union (catalog name or a table of dimensions) reports each branch; keep the
        # branch that matches what was written.
        branches = set(item["loc"])
        if branches & {"str", "constrained-str"} and isinstance(item.get("input"), dict):
            continue
        section_branch = "SectionSpec" in branches and item["type"] == "model_type"
        if section_branch and isinstance(item.get("input"), str):
            continue
        # "auto" or a list (member.stations): a list reports only its own branch.
        if _is_branch(item["loc"], "literal[") and not isinstance(item.get("input"), str):
            continue
        location = tuple(
            part
            for part in item["loc"]
            if part not in ("str", "constrained-str", "SectionSpec", "function-after")
            and not (isinstance(part, str) and part.startswith("list["))
        )
        seen.setdefault((key_path(location), _message(item)), None)
    return list(seen)


def parse_job(text: str, *, source: str = "job") -> Job:
    """A job from TOML text; :class:`JobError` lists every problem with its key path.

    A byte-order mark at the start (some Windows editors save UTF-8 with one) is
    not part of the job and is skipped.
    """
    try:
        data = tomllib.loads(text.removeprefix("\ufeff"))
    except tomllib.TOMLDecodeError as error:
        raise JobError(source, [("", f"TOML syntax error: {error}")]) from None
    except RecursionError:  # tomllib recurses once per level of nested arrays or tables
        raise JobError(source, [("", "arrays or tables are nested too deeply")]) from None
    return job_from_data(data, source=source)


def job_from_data(data: dict[str, Any], *, source: str = "job") -> Job:
    """A job from already-parsed TOML data (a batch row, a form's values)."""
    try:
        return Job.model_validate(data)
    except ValidationError as error:
        raise JobError(source, _problems(error)) from None


def read_job(path: str | Path) -> Job:
    """Read and validate the job file at ``path``."""
    path = Path(path)
    try:
        size = path.stat().st_size
        if size > MAX_JOB_BYTES:
            raise JobError(
                str(path),
                [("", f"the file is {size:,} bytes; a job file is under {MAX_JOB_BYTES:,}")],
            )
        text = path.read_text(encoding="utf-8")
    except FileNotFoundError:
        raise JobError(str(path), [("", "no such file")]) from None
    except IsADirectoryError:
        raise JobError(str(path), [("", "this is a folder, not a job file")]) from None
    except UnicodeDecodeError:
        raise JobError(str(path), [("", "not UTF-8 text")]) from None
    except OSError as error:
        raise JobError(str(path), [("", f"cannot read it: {error.strerror}")]) from None
    return parse_job(text, source=str(path))
