"""Shared test helpers: golden files for rendered output.

Set CALCSHEET_UPDATE_GOLDEN=1 to rewrite golden files; review the diff by eye
before committing it.
"""

from __future__ import annotations

import os
from pathlib import Path

import pytest


class Golden:
    def __init__(self, folder: Path) -> None:
        self.folder = folder

    def check(self, name: str, actual: str) -> None:
        path = self.folder / name
        if os.environ.get("CALCSHEET_UPDATE_GOLDEN") == "1" or not path.exists():
            path.parent.mkdir(parents=True, exist_ok=True)
            path.write_text(actual, encoding="utf-8")
            if os.environ.get("CALCSHEET_UPDATE_GOLDEN") != "1":
                pytest.fail(f"golden file {path} was missing and has been written; review it")
            return
        expected = path.read_text(encoding="utf-8")
        assert actual == expected, f"output differs from golden file {path}"


@pytest.fixture
def golden(request: pytest.FixtureRequest) -> Golden:
    return Golden(Path(request.fspath).parent / "golden")
