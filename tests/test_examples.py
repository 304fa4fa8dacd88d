"""The user-written example calc works with the public API and gives the hand-checked result."""

from __future__ import annotations

import importlib.util
from pathlib import Path

import pytest

EXAMPLE = Path(__file__).resolve().parents[1] / "examples" / "bolt_group.py"


def _load_example():
    spec = importlib.util.spec_from_file_location("bolt_group_example", EXAMPLE)
    module = importlib.util.module_from_spec(spec)
    spec.loader.exec_module(module)
    return module


def test_bolt_group_corner_bolt_force_matches_a_hand_calculation():
    sheet = _load_example().bolt_group_sheet("9 kip", "5 in")
    # Elastic method by hand (common practice, no source): M = 45 kip*in,
    # Ip = 4 (1.5^2 + 1.5^2) = 18 in^2, Rv = 9/4 + 45*1.5/18 = 6.0 kip,
    # Rh = 45*1.5/18 = 3.75 kip, R = sqrt(6.0^2 + 3.75^2) = 7.0755 kip.
    assert sheet.value("R").to("kip").magnitude == pytest.approx(7.0755, abs=1e-4)
    assert sheet.checks[0].passes
    sheet.set_input("P", "12 kip")
    assert not sheet.checks[0].passes


def test_the_readme_shows_the_demo_job_as_it_is() -> None:
    """The complete job example in the README is the demo job file, character for character."""
    root = Path(__file__).resolve().parents[1]
    readme = (root / "README.md").read_text(encoding="utf-8")
    shown = readme.split("```toml\n", 1)[1].split("```", 1)[0]
    assert shown == (root / "examples" / "outrigger.toml").read_text(encoding="utf-8")
