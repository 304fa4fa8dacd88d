"""The form never loses or silently replaces the user's work, and never shows an OK it has not got.

Issue 16, the form's part: Save over a job file keeps its comments, layout and mode
and asks before writing over a file the form did not write; files the form writes
follow the process umask; the "OK" badge never stands above entries with problems;
switching US/SI rounds only what is shown, never what the calc uses.

Sources: a new file's permission bits are the mode asked for less the process umask
(POSIX.1-2017, open(), "the file permission bits ... shall be set to the value of
the argument following the oflag argument ... modified as follows: a bitwise AND is
performed on the file-mode bits and the corresponding bits in the complement of the
process' file mode creation mask"); tools create ordinary files asking for 0666
(common practice, no source). 1 in = 25.4 mm and 1 lbf = 4.448 221 615 260 5 N
exactly (the international yard and pound, 1959).
"""

from __future__ import annotations

import os
import shutil
import stat
from collections.abc import Iterator
from pathlib import Path
from typing import Any

import pytest

from calcsheet.job import read_job
from calcsheet.units import parse_quantity
from calcsheet.widgets import FormError, MemberForm
from calcsheet.widgets.jobfile import FORM_MARK, write_job_file

ROOT = Path(__file__).resolve().parents[2]
DEMO = ROOT / "examples" / "outrigger.toml"


@pytest.fixture
def own_copy(tmp_path: Path) -> Path:
    """The demo job (comments and all) as the user's own file, readable by the group."""
    path = tmp_path / "outrigger.toml"
    shutil.copyfile(DEMO, path)
    path.chmod(0o664)
    return path


@pytest.fixture
def umask_002() -> Iterator[None]:
    """A group-writable umask, as on a shared project folder (restored afterwards)."""
    before = os.umask(0o002)
    try:
        yield
    finally:
        os.umask(before)


def _mode(path: Path) -> int:
    return stat.S_IMODE(path.stat().st_mode)


def _changed_lines(before: str, after: str) -> list[tuple[str, str]]:
    old, new = before.splitlines(), after.splitlines()
    assert len(old) == len(new), "lines were added or removed"
    return [(a, b) for a, b in zip(old, new, strict=True) if a != b]


# -- Save over a file the form did not write ----------------------------------------------


def test_save_over_the_file_it_was_opened_from_asks_first(own_copy: Path) -> None:
    before = own_copy.read_text(encoding="utf-8")
    form = MemberForm.from_job_file(own_copy, debounce=None, folder=own_copy.parent)
    form.set_value("loads[0].magnitude", "3 kip")
    with pytest.raises(FormError, match="was not written by this form"):
        form.save()
    assert own_copy.read_text(encoding="utf-8") == before  # nothing written

    form.buttons["save"].click()  # the button asks instead of writing
    assert own_copy.read_text(encoding="utf-8") == before
    replace = form.buttons["replace"]
    assert replace.layout.display != "none"
    assert replace.description == "Replace outrigger.toml"
    assert "already exists and was not written by this form" in form.status.value

    replace.click()  # the user's word: update it
    after = own_copy.read_text(encoding="utf-8")
    assert _changed_lines(before, after) == [('magnitude = "2.4 kip"', 'magnitude = "3 kip"')]
    assert replace.layout.display == "none"
    assert "Saved the job file outrigger.toml" in form.status.value
    assert read_job(own_copy) == form.to_job()

    # Having said yes once, later saves in this session write without asking again.
    form.set_value("loads[0].magnitude", "3.5 kip")
    form.save()
    assert read_job(own_copy).loads[0].magnitude == "3.5 kip"


def test_the_replace_button_goes_away_when_the_file_name_changes(own_copy: Path) -> None:
    form = MemberForm.from_job_file(own_copy, debounce=None, folder=own_copy.parent)
    form.buttons["save"].click()
    assert form.buttons["replace"].layout.display != "none"
    form.job_path.set("outrigger-rev-c.toml")
    assert form.buttons["replace"].layout.display == "none"
    form.buttons["save"].click()  # a new file: written at once
    assert read_job(own_copy.parent / "outrigger-rev-c.toml") == read_job(own_copy)


def test_saving_unchanged_entries_leaves_the_file_byte_for_byte(own_copy: Path) -> None:
    before = own_copy.read_bytes()
    form = MemberForm.from_job_file(own_copy, debounce=None, folder=own_copy.parent)
    form.save(replace=True)
    assert own_copy.read_bytes() == before


def test_comments_and_layout_stay_where_keys_did_not_change(own_copy: Path) -> None:
    before = own_copy.read_text(encoding="utf-8")
    form = MemberForm.from_job_file(own_copy, debounce=None, folder=own_copy.parent)
    form.set_value("check.K", "2.0")
    form.loads.add()
    form.loads.remove(form.loads.rows[1])  # the wind load goes, a new one comes
    form.new_revision()
    form.set_value("revisions[2].description", "Wind load replaced")
    form.refresh()
    assert form.errors == {}
    form.save(replace=True)
    after = own_copy.read_text(encoding="utf-8")
    assert read_job(own_copy) == form.to_job()
    # Every comment of the file is still there, and so is the untouched text around it.
    comments = [line for line in before.splitlines() if line.lstrip().startswith("#")]
    assert comments and all(line in after.splitlines() for line in comments)
    assert "K = 2.0                      # fixed-free arm" in after  # its comment kept
    assert after.startswith(before.split("[sheet]")[0])  # the header block untouched
    assert 'name = "load 3"' in after and "wind on sign" not in after


def test_a_file_the_form_wrote_is_saved_over_without_asking(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path, save_path="mine.toml")
    written = form.save()
    assert written.read_text(encoding="utf-8").startswith(FORM_MARK)
    # A new session on the file the form created: no question asked.
    again = MemberForm.from_job_file(written, debounce=None, folder=tmp_path)
    again.set_value("member.length", "50 in")
    again.buttons["save"].click()
    assert again.buttons["replace"].layout.display == "none"
    assert read_job(written).member.length == "50 in"


def test_a_byte_order_mark_stays(tmp_path: Path) -> None:
    path = tmp_path / "with-bom.toml"
    path.write_bytes(b"\xef\xbb\xbf" + DEMO.read_bytes())
    data = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path).job_data()
    data["member"]["length"] = "50 in"
    write_job_file(path, data)
    text = path.read_bytes()
    assert text.startswith(b"\xef\xbb\xbf# Demo job")
    assert text.removeprefix(b"\xef\xbb\xbf") == DEMO.read_bytes().replace(
        b'length = "48 in"', b'length = "50 in"'
    )


# -- permissions ------------------------------------------------------------------------------


def test_save_keeps_the_files_mode(own_copy: Path) -> None:
    own_copy.chmod(0o640)
    form = MemberForm.from_job_file(own_copy, debounce=None, folder=own_copy.parent)
    form.set_value("member.length", "50 in")
    form.save(replace=True)
    assert _mode(own_copy) == 0o640


@pytest.mark.usefixtures("umask_002")
def test_new_files_the_form_writes_follow_the_umask(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    form.set_value("check.kind", "allowable stress")
    form.set_value("explore.sweep_load", "")
    form.set_value("explore.lightest_in", "")
    saved = form.save("new-job.toml")
    assert _mode(saved) == 0o664  # 0666 less the umask 002 (POSIX open())
    written = form.export()
    assert written and all(_mode(path) == 0o664 for path in written)


# -- the badge -----------------------------------------------------------------------------------


def _badge(form: MemberForm) -> str:
    """The text of the status badge (the first span of the key results)."""
    value = form.preview.key_results.value
    start = value.index("<span")
    return value[value.index(">", start) + 1 : value.index("</span>", start)]


def test_the_badge_does_not_say_ok_while_entries_have_problems(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    assert _badge(form) == "OK"
    form.set_value("loads[0].magnitude", "6.5 in")
    form.refresh()
    assert "entry has a problem" in form.preview.note.value
    assert _badge(form) == "entries have problems"
    assert "last good result: governing utilization" in form.preview.key_results.value
    form.set_value("loads[0].magnitude", "2.4 kip")
    form.refresh()
    assert _badge(form) == "OK"


# -- US/SI switching -------------------------------------------------------------------------------


def _quantities(value: Any, path: str = "") -> dict[str, float]:
    """Every quantity of the job data, by key path, in SI base units (magnitudes)."""
    found: dict[str, float] = {}
    if isinstance(value, dict):
        for key, item in value.items():
            found |= _quantities(item, f"{path}.{key}" if path else key)
    elif isinstance(value, list):
        for index, item in enumerate(value):
            found |= _quantities(item, f"{path}[{index}]")
    elif isinstance(value, str):
        try:
            quantity = parse_quantity(value, field=path)
        except Exception:
            return found  # names, dates, choices
        if not quantity.dimensionless or "deg" in value:
            found[path] = float(quantity.to_base_units().magnitude)
    return found


def test_switching_units_back_and_forth_changes_no_value_the_calc_uses(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    form.set_value("material.Fy", "52 ksi")  # typed over the grade's value
    before = _quantities(form.job_data())
    assert {"member.length", "loads[0].magnitude", "loads[1].components[0]"} <= set(before)
    assert before["material.Fy"] == pytest.approx(52 * 6894757.293168, rel=1e-12)
    for system in ["SI", "US", "SI", "US", "SI", "US", "SI"]:
        form.set_value("sheet.units", system)
        now = _quantities(form.job_data())
        assert now.keys() == before.keys()
        for key, value in before.items():
            assert now[key] == pytest.approx(value, rel=1e-12, abs=1e-300), key
    assert form.shown("material.Fy") == "359 MPa"  # 52 ksi x 6.894757 = 358.5 MPa
    form.refresh()
    assert form.errors == {}
    assert form.results.job.member.length == "48 in"  # the calc's input, as typed


def test_a_value_typed_in_si_survives_a_round_trip(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    form.set_value("sheet.units", "SI")
    form.set_value("member.length", "1234.5 mm")
    form.set_value("loads[0].magnitude", "11.37 kN")
    form.set_value("sheet.units", "US")
    assert form.shown("member.length") == "48.6 in"  # 1234.5 / 25.4 = 48.602 in
    assert form.value("member.length") == "1234.5 mm"
    form.refresh()
    assert form.results.job.loads[0].magnitude == "11.37 kN"
    form.set_value("sheet.units", "SI")
    assert form.shown("member.length") == "1234.5 mm"
    assert form.shown("loads[0].magnitude") == "11.37 kN"


def test_an_entry_edited_after_a_switch_is_taken_as_typed(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    form.set_value("sheet.units", "SI")
    form.set_value("loads[0].ey", "-100 mm")
    assert form.value("loads[0].ey") == "-100 mm"
    form.set_value("sheet.units", "US")
    assert form.shown("loads[0].ey") == "-3.94 in"  # -100 / 25.4 = -3.937 in
    assert form.value("loads[0].ey") == "-100 mm"
