"""Packaging: every subpackage is listed in pyproject.toml and templates ship in the wheel."""

from __future__ import annotations

import tomllib
from pathlib import Path

ROOT = Path(__file__).resolve().parents[1]


def test_every_subpackage_is_listed_in_pyproject():
    listed = set(
        tomllib.loads((ROOT / "pyproject.toml").read_text())["tool"]["setuptools"]["packages"]
    )
    found = {
        ".".join(path.parent.relative_to(ROOT).parts)
        for path in (ROOT / "calcsheet").rglob("__init__.py")
    }
    assert found <= listed, f"add to pyproject.toml packages: {sorted(found - listed)}"
    assert "calcsheet.templates" in listed


def test_templates_are_found_through_the_package():
    from importlib.resources import files

    names = {entry.name for entry in files("calcsheet.templates").iterdir()}
    assert {"sheet.html.j2", "sheet.typ.j2"} <= names
