"""The EN 1993-1-1 keys (national set, γM0/γM1/γM2, 6.3.2 method, 6.3.3 annex, load
height) and the AISC cantilever keys (load height, tip restraint) in the form and in
the starter (issue 15): the form fills them from a file, Save writes them, and the
form's job gives the same design basis as the file's.

Values from outside the project: the recommended partial factors of EN 1993-1-1:2005
6.1(1) Note 2B, γM0 = 1.00, γM1 = 1.00, γM2 = 1.25.
"""

from __future__ import annotations

import tomllib
from pathlib import Path

import pytest

from calcsheet.job import read_job
from calcsheet.job.schema import CheckSpec
from calcsheet.job.starter import STARTER
from calcsheet.pipeline.model import design_basis
from calcsheet.widgets import MemberForm

EN_CHECK = """[check]
kind = "EN 1993-1-1"
national_annex = "EN recommended values"
gamma_M1 = 1.1
ltb_method = "6.3.2.2"
interaction_method = "A"
load_height = "top flange"
"""
AISC_CHECK = """[check]
kind = "AISC 360-22"
load_height = "bottom flange"
tip_restraint = "laterally braced"
"""


def _job_file(tmp_path: Path, check: str, name: str) -> Path:
    """The starter job with its [check] table replaced (an IPE for the EN check)."""
    start = STARTER.index("[check]")
    end = STARTER.index("# Point loads")
    text = STARTER[:start] + check + "\n" + STARTER[end:]
    if "EN 1993" in check:
        text = text.replace('section = "W8X31"', 'section = "IPE 200"')
        text = text.replace('grade = "ASTM A992"', 'grade = "S355"')
        text = text.replace('type = "L"', 'type = "Q"')
    path = tmp_path / name
    path.write_text(text, encoding="utf-8")
    return path


def test_the_starters_commented_check_keys_are_valid_when_uncommented() -> None:
    block = STARTER[STARTER.index("[check]") : STARTER.index("# Point loads")]
    lines = [
        line[2:].split("#")[0]
        for line in block.splitlines()
        if line.startswith("# ") and " = " in line
    ]
    keys = dict(tomllib.loads("\n".join(lines[1:])))  # the kind line repeats one above
    for key in ("national_annex", "gamma_M0", "gamma_M1", "gamma_M2", "ltb_method",
                "interaction_method", "load_height", "tip_restraint"):  # fmt: skip
        assert key in keys, key
    spec = CheckSpec(kind="EN 1993-1-1", **keys)
    # The starter shows the recommended values, EN 1993-1-1:2005 6.1(1) Note 2B.
    assert (spec.gamma_M0, spec.gamma_M1, spec.gamma_M2) == (1.0, 1.0, 1.25)


def test_the_en_panel_fills_from_a_file_and_gives_the_files_design_basis(tmp_path) -> None:
    path = _job_file(tmp_path, EN_CHECK, "en.toml")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    assert form.value("check.gamma_M1") == pytest.approx(1.1)
    assert form.value("check.gamma_M0") is None  # blank: the national set's value
    assert form.value("check.ltb_method") == "6.3.2.2"
    assert form.value("check.interaction_method") == "A"
    assert form.value("check.load_height") == "top flange"
    assert form.value("check.national_annex") == "EN recommended values"
    assert form.to_job() == read_job(path)
    assert design_basis(form.to_job()) == design_basis(read_job(path))


def test_save_writes_the_en_keys_typed_and_leaves_blanks_out(tmp_path) -> None:
    path = _job_file(tmp_path, 'kind = "allowable stress"\n'.join(["[check]\n", ""]), "a.toml")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    form.set_value("member.section", "IPE 200")
    form.set_value("material.grade", "S355")
    form.set_value("loads[0].type", "Q")
    form.set_value("check.kind", "EN 1993-1-1")
    form.set_value("check.gamma_M0", "1.05")
    form.set_value("check.gamma_M2", "")
    form.set_value("check.ltb_method", "6.3.2.3")
    form.set_value("check.interaction_method", "B")
    form.set_value("check.load_height", "bottom flange")
    form.refresh()
    assert form.errors == {}
    saved_path = form.save("saved.toml")
    saved = tomllib.loads(saved_path.read_text(encoding="utf-8"))["check"]
    assert saved["gamma_M0"] == 1.05 and "gamma_M2" not in saved and "gamma_M1" not in saved
    assert saved["ltb_method"] == "6.3.2.3" and saved.get("interaction_method", "B") == "B"
    assert saved["load_height"] == "bottom flange"
    job = read_job(saved_path)
    assert job == form.to_job()
    basis = design_basis(job)
    assert basis == design_basis(form.to_job())
    assert basis.gamma_M0 == 1.05 and basis.ltb_method == "6.3.2.3"


def test_a_partial_factor_out_of_range_is_marked_beside_its_box(tmp_path) -> None:
    path = _job_file(tmp_path, EN_CHECK, "en.toml")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    form.set_value("check.gamma_M1", "3")
    form.refresh()
    assert "check.gamma_M1" in form.errors


def test_the_aisc_panel_keeps_load_height_and_tip_restraint(tmp_path) -> None:
    path = _job_file(tmp_path, AISC_CHECK, "aisc.toml")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    assert form.value("check.load_height") == "bottom flange"
    assert form.value("check.tip_restraint") == "laterally braced"
    assert form.to_job() == read_job(path)
    assert design_basis(form.to_job()) == design_basis(read_job(path))
    form.set_value("check.tip_restraint", "torsionally restrained")
    form.set_value("check.load_height", None)
    saved = tomllib.loads(form.save("again.toml").read_text(encoding="utf-8"))["check"]
    assert saved["tip_restraint"] == "torsionally restrained" and "load_height" not in saved


def test_a_job_with_annex_a_builds(tmp_path) -> None:
    from calcsheet.pipeline import build_sheets

    path = _job_file(tmp_path, EN_CHECK, "en.toml")
    build_sheets(read_job(path))
