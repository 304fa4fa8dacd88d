"""The form's frame entries: supports, brace points, self-weight, distributed loads, auto station.

The form -> job -> model path gives the member sheet the same keyword arguments as
the job file does, and Save writes the new keys. Unit conversions use exact
definitions: 1 ft = 0.3048 m and 1 lbf = 4.448 221 615 260 5 N (the international
yard and pound, 1959), so 0.1 kip/ft = 1.4594 kN/m, shown to four significant
figures (the first is 1) as sheets print numbers (DEVELOPERS.md, "Conventions").
"""

from __future__ import annotations

import tomllib
from pathlib import Path

import pytest

from calcsheet.job import read_job
from calcsheet.pipeline.model import member_model
from calcsheet.widgets import MemberForm
from calcsheet.widgets.form import OWN_SUPPORTS
from calcsheet.widgets.rows import LINEAR

ROOT = Path(__file__).resolve().parents[2]
COLUMN = ROOT / "examples" / "column-bracket.toml"
DEMO = ROOT / "examples" / "outrigger.toml"


@pytest.fixture
def frame_on() -> None:
    """(The model always gives the member sheet its frame options.)"""


@pytest.fixture
def column(tmp_path: Path) -> MemberForm:
    """The column demo in a form that builds only when told (it needs the frame analysis)."""
    return MemberForm.from_job_file(COLUMN, debounce=None, folder=tmp_path)


def test_the_column_demo_fills_the_frame_entries_and_reads_back(column: MemberForm) -> None:
    assert column.to_job() == read_job(COLUMN)
    assert column.value("member.supports") == "pinned-pinned"
    assert column.value("member.auto_station") is True
    assert column.fields()["member.stations"].box.layout.display == "none"
    assert column.value("member.braces") == ["9 ft"]
    assert column.value("member.self_weight") is True
    assert column.value("member.gravity") == "-z"
    assert column.value("distributed[0].q_end[0]") == "0.11 kip/ft"
    assert column.value("distributed[0].varies") == LINEAR


def test_form_and_file_give_the_sheet_the_same_arguments(column: MemberForm, frame_on) -> None:
    from_form = member_model(column.to_job()).frame_options
    from_file = member_model(read_job(COLUMN)).frame_options
    assert from_form == from_file
    assert from_form["supports"] == "pinned-pinned" and from_form["gravity"] == "-z"


def test_frame_entries_typed_become_job_keys(column: MemberForm, frame_on) -> None:
    column.set_value("member.supports", "overhang")
    column.set_value("member.support_positions", "2 ft, 15 ft")
    column.set_value("member.braces", "")
    column.set_value("member.self_weight", False)
    column.set_value("distributed[0].varies", "uniform")
    member = column.job_data()["member"]
    assert member["supports"] == "overhang"
    assert member["support_positions"] == ["2 ft", "15 ft"]
    assert "braces" not in member and member["self_weight"] is False
    assert "q_end" not in column.job_data()["distributed"][0]
    options = member_model(column.to_job()).frame_options
    assert options["supports"] == "overhang" and "self_weight" not in options
    assert "braces" not in options


def test_a_distributed_load_past_the_end_is_marked_beside_its_box(column, frame_on) -> None:
    column.set_value("distributed[0].z_end", "20 ft")
    column.refresh()
    assert "outside the member" in column.errors["distributed[0].z_end"]
    assert "outside the member" in column.fields()["distributed[0].z_end"].message.value


def test_an_unknown_support_case_from_a_file_is_kept_and_marked(tmp_path, frame_on) -> None:
    text = COLUMN.read_text(encoding="utf-8").replace('"pinned-pinned"', '"pined-pinned"')
    path = tmp_path / "job.toml"
    path.write_text(text, encoding="utf-8")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    assert form.value("member.supports") == "pined-pinned"
    assert 'did you mean "pinned-pinned"' in form.errors["member.supports"]


def test_a_new_distributed_row_is_a_load_over_the_whole_member(column: MemberForm) -> None:
    row = column.distributed.add()
    data = row.data()
    assert data["name"] == "line load 2" and data["z_start"] == "0 in"
    assert data["z_end"] == "18 ft" and data["q_start"] == ["0 kip/ft", "-0.1 kip/ft", "0 kip/ft"]
    assert len(column.to_job().distributed) == 2


def test_line_loads_follow_a_switch_of_units(column: MemberForm) -> None:
    column.distributed.add()
    column.set_value("sheet.units", "SI")
    assert column.shown("distributed[1].q_start[1]") == "-1.459 kN/m"
    assert column.value("distributed[1].q_start[1]") == "-0.1 kip/ft"  # as typed


def test_unticking_auto_asks_for_stations(column: MemberForm) -> None:
    column.set_value("member.auto_station", False)
    assert column.fields()["member.stations"].box.layout.display is None
    assert column.fields()["member.stations"].check() == "give at least one length, such as '0 in'"
    column.set_value("member.stations", "0 ft, 11 ft")
    assert column.to_job().member.stations == ["0 ft", "11 ft"]


def test_the_preview_names_the_station_auto_found(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    form.set_value("check.kind", "allowable stress")
    form.set_value("explore.sweep_load", "")
    form.set_value("explore.lightest_in", "")
    form.set_value("member.auto_station", True)
    form.refresh()
    assert form.errors == {}
    assert "auto, z = " in form.preview.key_results.value


def test_save_writes_the_frame_keys(column: MemberForm, tmp_path: Path) -> None:
    column.set_value("member.self_weight", False)
    column.set_value("member.braces", "6 ft, 12 ft")
    written = column.save(tmp_path / "saved.toml")
    data = tomllib.loads(written.read_text(encoding="utf-8"))
    assert data["member"]["self_weight"] is False
    assert data["member"]["braces"] == ["6 ft", "12 ft"]
    assert data["member"]["stations"] == "auto" and data["member"]["gravity"] == "-z"
    assert data["distributed"][0]["q_end"] == ["0.11 kip/ft", "0 kip/ft", "0 kip/ft"]
    assert read_job(written) == column.to_job()


def test_save_over_the_file_changes_only_the_changed_key(tmp_path: Path) -> None:
    path = tmp_path / "column.toml"
    original = COLUMN.read_text(encoding="utf-8")
    path.write_text(original, encoding="utf-8")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    form.set_value("member.self_weight", False)
    form.save(replace=True)
    changed = path.read_text(encoding="utf-8")
    # tomlkit keeps the comment after the value (and the spaces before it).
    assert changed == original.replace("self_weight = true ", "self_weight = false ")


def test_supports_of_the_jobs_own_are_kept_through_the_form(tmp_path: Path) -> None:
    text = COLUMN.read_text(encoding="utf-8").replace(
        'supports = "pinned-pinned"   # pinned base plate; the tie beam holds the top\n', ""
    )
    text += '\n[[supports]]\nname = "base"\nz = "0 ft"\nrestrains = ["ux", "uy", "uz", "rz"]\n'
    path = tmp_path / "own.toml"
    path.write_text(text, encoding="utf-8")
    form = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    assert form.value("member.supports") == OWN_SUPPORTS
    job = form.to_job()
    assert job == read_job(path) and job.supports[0].restrains == ["ux", "uy", "uz", "rz"]
    form.set_value("member.supports", "fixed-free")
    assert form.to_job().supports == [] and form.to_job().member.supports == "fixed-free"
