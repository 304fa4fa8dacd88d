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


def check_results_schema(data: dict) -> None:
    """Fail unless ``data`` (JSON results, as read back from text) fits the shipped schema."""
    import jsonschema

    from calcsheet.pipeline.results import results_schema

    validator = jsonschema.Draft202012Validator(results_schema())
    problems = sorted(validator.iter_errors(data), key=lambda error: list(error.absolute_path))
    assert not problems, "results JSON does not fit results.schema.json:\n" + "\n".join(
        f"  {'/'.join(map(str, error.absolute_path)) or '(top)'}: {error.message}"
        for error in problems[:10]
    )


@pytest.fixture(autouse=True)
def _every_results_json_fits_the_schema(monkeypatch: pytest.MonkeyPatch) -> None:
    """Every JSON results file a test writes (in this process) is checked against the
    schema shipped in the package, through the function that makes the results."""
    import json
    import sys

    run = sys.modules.get("calcsheet.pipeline.run")  # imported by the tests that build jobs
    if run is None:
        return
    original = run.sheet_results

    def checked(sheet: object) -> dict:
        data = original(sheet)
        check_results_schema(json.loads(json.dumps(data, ensure_ascii=False)))
        return data

    monkeypatch.setattr(run, "sheet_results", checked)
