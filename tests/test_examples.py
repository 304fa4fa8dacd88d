"""The user-written example calc works with the public API and gives the hand-checked result."""

from __future__ import annotations

import importlib.util
from pathlib import Path

import pytest

EXAMPLE = Path(__file__).resolve().parents[1] / "examples" / "bolt_group.py"
EN_BRACKET = Path(__file__).resolve().parents[1] / "examples" / "en-bracket.toml"


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


def test_the_en_demo_job_builds_to_pdf_html_and_json(tmp_path: Path) -> None:
    """examples/en-bracket.toml through the command line, as `make demo-en` runs it."""
    import json

    from calcsheet.cli import main

    assert main(["build", str(EN_BRACKET), "--out", str(tmp_path)]) == 0
    stem = tmp_path / "en-bracket-demo-revA"
    pdf = stem.with_suffix(".pdf").read_bytes()
    assert pdf.startswith(b"%PDF")
    html = stem.with_suffix(".html").read_text(encoding="utf-8")
    results = json.loads(stem.with_suffix(".json").read_text(encoding="utf-8"))
    assert "EN 1993-1-1" in json.dumps(results)
    # The national choices in the design basis: γM1 overridden, the others recommended.
    assert "γM1 = 1.10: overridden for this job" in html
    assert "γM0 = 1.00: EN recommended values" in html
    # The lightest HE B section, weights in kg/m; the job's own section is that one.
    assert "Design exploration: lightest of the HE B sections" in html
    assert "HE 140 B" in html and "kg/m" in html
    assert "lb/ft" not in html
