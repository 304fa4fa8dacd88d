"""Shared pieces of the hostile-input sweep: job data to vary, a hang guard, known bugs.

Tests start from the shipped starter job and the demo job, so keys the schema
gains later keep working here.
"""

from __future__ import annotations

import contextlib
import copy
import signal
import tomllib
import traceback
from collections.abc import Iterator
from pathlib import Path
from typing import Any

import tomli_w

from calcsheet.job.starter import STARTER

REPOSITORY = Path(__file__).resolve().parents[2]
OUTRIGGER = (REPOSITORY / "examples" / "outrigger.toml").read_text(encoding="utf-8")
STARTER_DATA: dict[str, Any] = tomllib.loads(STARTER)
OUTRIGGER_DATA: dict[str, Any] = tomllib.loads(OUTRIGGER)


def starter_data() -> dict[str, Any]:
    """A fresh, valid job as parsed TOML data (safe to change)."""
    return copy.deepcopy(STARTER_DATA)


def toml_text(data: dict[str, Any]) -> str:
    """Job data as TOML text, every string escaped by tomli_w."""
    return tomli_w.dumps(data)


def leaf_paths(data: Any, prefix: tuple = ()) -> list[tuple]:
    """Every path to a value that is not a table or an array: ("loads", 0, "magnitude")."""
    if isinstance(data, dict):
        return [path for key, item in data.items() for path in leaf_paths(item, (*prefix, key))]
    if isinstance(data, list):
        return [
            path for index, item in enumerate(data) for path in leaf_paths(item, (*prefix, index))
        ]
    return [prefix]


def set_path(data: Any, path: tuple, value: Any) -> None:
    """Set the value at ``path`` in nested data."""
    for part in path[:-1]:
        data = data[part]
    data[path[-1]] = value


class HangError(Exception):
    """A call ran far longer than any job could need: treated as a hang."""


@contextlib.contextmanager
def no_hang(seconds: float) -> Iterator[None]:
    """Raise :class:`HangError` in the main thread after ``seconds`` (a guard, not a speed test)."""

    def alarm(signum: int, frame: object) -> None:
        raise HangError(f"still running after {seconds} s")

    previous = signal.signal(signal.SIGALRM, alarm)
    signal.setitimer(signal.ITIMER_REAL, seconds)
    try:
        yield
    finally:
        signal.setitimer(signal.ITIMER_REAL, 0)
        signal.signal(signal.SIGALRM, previous)


# Bugs this sweep found that are not fixed yet. Each has a strict xfail test with its
# reproduction; the fuzz tolerates exactly these (by exception type and the calcsheet
# file it was raised in) so that it keeps hunting for new ones. When a bug is fixed,
# its xfail test passes and fails as strict: remove the test's marker and the entry.
KNOWN_BUGS: dict[str, tuple[tuple[type[BaseException], ...], str, str]] = {}


def known_bug(error: BaseException) -> str | None:
    """The KNOWN_BUGS entry that ``error`` is an instance of, or ``None``."""
    files = [frame.filename for frame in traceback.extract_tb(error.__traceback__)]
    for name, (kinds, where, message) in KNOWN_BUGS.items():
        found = isinstance(error, kinds) and message in str(error)
        if found and any(where in file for file in files):
            return name
    return None
