"""The member form driven as a user would, at the Python level: entries, preview, files.

Values from outside the project: 1 in = 25.4 mm and 1 lbf = 4.448 221 615 260 5 N
exactly (the international yard and pound, 1959), hence 1 kip = 4.448 222 kN and
1 ksi = 6.894 757 MPa. Converted entries are rounded as sheets print numbers (three
significant figures, four when the first is 1: DEVELOPERS.md, "Conventions").
"""

from __future__ import annotations

import json
from datetime import date
from pathlib import Path

import pytest

from calcsheet.job import read_job
from calcsheet.job.schema import SectionSpec
from calcsheet.pipeline import build_sheets, inputs_hash
from calcsheet.pipeline.model import section_dimension_keys
from calcsheet.widgets import FormError, MemberForm
from calcsheet.widgets import form as form_module
from calcsheet.widgets.fields import BAD_BACKGROUND
from calcsheet.widgets.jobfile import next_revision_mark

ROOT = Path(__file__).resolve().parents[2]
DEMO = ROOT / "examples" / "outrigger.toml"
WIDGET_VIEW = "application/vnd.jupyter.widget-view+json"


@pytest.fixture
def form(tmp_path: Path) -> MemberForm:
    """The demo job in a form that rebuilds only when told (no timer in these tests).

    Switched to the generic allowable-stress check without exploration, so that each
    test rebuilds quickly and any section family builds; the AISC and EN panels have
    tests of their own.
    """
    made = MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)
    made.set_value("check.kind", "allowable stress")
    made.set_value("explore.sweep_load", "")
    made.set_value("explore.lightest_in", "")
    made.refresh()
    return made


@pytest.fixture
def demo_form(tmp_path: Path) -> MemberForm:
    """The demo job as it is: AISC 360-22 LRFD with the sweep and the lightest section."""
    return MemberForm.from_job_file(DEMO, debounce=None, folder=tmp_path)


def _message(form: MemberForm, path: str) -> str:
    return form.fields()[path].message.value


# -- opening and building ----------------------------------------------------------------


def test_the_demo_job_opens_builds_and_reads_back_unchanged(demo_form: MemberForm) -> None:
    form = demo_form
    assert form.to_job() == read_job(DEMO)
    assert form.errors == {}
    assert form.results is not None and form.results.all_pass
    assert form.results.hash == build_sheets(read_job(DEMO)).hash
    assert "OK" in form.preview.key_results.value
    assert "Sign outrigger arm OA-1" in form.preview.sheet_view.value
    assert form.preview.note.value == ""
    assert WIDGET_VIEW in form._repr_mimebundle_()


def test_a_change_updates_the_results_and_the_preview(form: MemberForm) -> None:
    before, shown = form.results, form.preview.sheet_view.value
    form.set_value("loads[0].magnitude", "4.8 kip")
    form.refresh()
    assert form.results is not before
    assert form.results.governing_utilization > before.governing_utilization
    assert form.to_job().loads[0].magnitude == "4.8 kip"
    assert form.preview.sheet_view.value != shown
    assert "4.80" in form.preview.sheet_view.value  # the new input, as the sheet prints it
    assert f"{form.results.governing_utilization:.3f}" in form.preview.key_results.value


def test_changes_wait_for_the_pause_and_refresh_runs_at_once(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=30, folder=tmp_path)  # never fires here
    before = form.results
    form.set_value("member.length", "50 in")
    assert form._timer.pending and form.results is before
    form.refresh()
    assert not form._timer.pending and form.results is not before
    assert form.results.job.member.length == "50 in"


def test_without_a_pause_every_change_rebuilds(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, debounce=0, folder=tmp_path)
    before = form.results
    form.set_value("loads[1].components[0]", "0.5 kip")
    assert form.results is not before
    assert form.results.job.loads[1].components[0] == "0.5 kip"


# -- wrong entries -------------------------------------------------------------------------


@pytest.mark.parametrize(
    ("entry", "why"),
    [
        ("6.5 in", "that is a length, not a force"),
        ("abc", "not a number followed by a unit"),
        ("", "not a number followed by a unit"),
        ("6.5 kips!", "not a unit"),
    ],
)
def test_a_wrong_entry_is_marked_and_the_last_good_result_kept(
    form: MemberForm, entry: str, why: str
) -> None:
    good, shown = form.results, form.preview.sheet_view.value
    form.set_value("loads[0].magnitude", entry)
    assert form.refresh() is good
    assert why in form.errors["loads[0].magnitude"]
    assert why in _message(form, "loads[0].magnitude")
    assert "expected a force" in _message(form, "loads[0].magnitude")
    assert form.fields()["loads[0].magnitude"].widget.style.background == BAD_BACKGROUND
    assert "last good result" in form.preview.note.value
    assert form.preview.sheet_view.value == shown
    assert "Traceback" not in json.dumps(form.errors)


def test_the_rest_of_the_form_keeps_working_and_a_fix_clears_the_mark(form: MemberForm) -> None:
    form.set_value("loads[0].magnitude", "6.5 in")
    form.set_value("member.length", "2 kip")
    form.refresh()
    assert set(form.errors) == {"loads[0].magnitude", "member.length"}
    form.set_value("member.length", "50 in")
    form.refresh()
    assert set(form.errors) == {"loads[0].magnitude"}
    assert _message(form, "member.length") == ""
    form.set_value("loads[0].magnitude", "2.4 kip")
    form.refresh()
    assert form.errors == {}
    assert form.preview.note.value == ""
    assert form.fields()["loads[0].magnitude"].widget.style.background is None
    assert form.results.job.member.length == "50 in"


def test_problems_of_the_model_are_shown_beside_the_entry_they_name(form: MemberForm) -> None:
    form.set_value("member.section", "HSS6X6X3/9")
    form.set_value("loads[0].z", "60 in")
    form.refresh()
    assert "did you mean HSS6X6X3/8" in form.errors["member.section"]
    assert "did you mean HSS6X6X3/8" in _message(form, "member.section")
    assert "outside the member" in _message(form, "loads[0].z")
    assert form.results.job.member.section == "HSS6X6X3/8"  # the last good one


def test_a_problem_of_the_whole_job_goes_to_the_forms_message(form: MemberForm) -> None:
    form.set_value("loads[1].name", "sign bracket")
    form.refresh()
    # Two loads of one name is a problem of the job as a whole: the form's own message.
    assert "used twice: sign bracket" in form.errors[""]
    assert "used twice" in form.general.message.value


def test_an_unexpected_failure_is_one_line_and_keeps_the_last_result(
    form: MemberForm, monkeypatch: pytest.MonkeyPatch
) -> None:
    good = form.results

    def broken(*_args: object, **_kwargs: object) -> None:
        raise RuntimeError("disk on fire\n  at line 2")

    monkeypatch.setattr(form_module, "build_sheets", broken)
    form.set_value("loads[0].magnitude", "3 kip")
    assert form.refresh() is good
    assert form.errors == {"": "unexpected problem (RuntimeError): disk on fire at line 2"}
    assert "disk on fire" in form.general.message.value


def test_an_unknown_entry_is_refused_with_the_list_of_entries(form: MemberForm) -> None:
    with pytest.raises(KeyError, match="loads\\[0\\].magnitude"):
        form.set_value("loads[0].size", "3 kip")
    with pytest.raises(KeyError):
        form.set_value("loads[0]", "3 kip")  # a row's message, not an entry


# -- units -----------------------------------------------------------------------------------


def test_switching_units_converts_every_quantity(form: MemberForm) -> None:
    form.set_value("sheet.units", "SI")
    assert form.shown("member.length") == "1219 mm"  # 48 in x 25.4 = 1219.2 mm
    assert form.shown("member.stations") == "0 mm"
    assert form.shown("loads[0].magnitude") == "10.68 kN"  # 2.4 kip x 4.448 = 10.676 kN
    assert form.shown("loads[0].ey") == "-101.6 mm"  # -4 in x 25.4
    assert form.shown("loads[0].angle") == "35 deg"  # angles have no system
    assert form.shown("loads[1].components[0]") == "1.557 kN"  # 0.35 kip x 4.448 = 1.5569
    assert form.shown("material.Fy") == "345 MPa"  # 50 ksi x 6.895 = 344.7 MPa
    # The calc takes the entries as typed, not the rounded figures shown.
    assert form.value("member.length") == "48 in"
    assert form.value("loads[0].magnitude") == "2.4 kip"
    form.refresh()
    assert form.errors == {}
    assert form.results.job.sheet.units == "SI"
    assert "1219" in form.preview.sheet_view.value


def test_switching_back_restores_the_entries_unless_edited(form: MemberForm) -> None:
    form.set_value("sheet.units", "SI")
    form.set_value("member.length", "1500 mm")
    form.set_value("sheet.units", "US")
    assert form.shown("member.length") == "59.1 in"  # 1500 / 25.4 = 59.06 in
    assert form.value("member.length") == "1500 mm"  # the calc takes it as typed
    assert form.shown("loads[0].magnitude") == "2.4 kip"  # untouched: as typed
    assert form.shown("loads[0].ey") == "-4 in"
    form.refresh()
    assert form.errors == {}


def test_a_wrong_entry_is_left_as_typed_when_units_switch(form: MemberForm) -> None:
    form.set_value("loads[0].z", "forty")
    form.set_value("sheet.units", "SI")
    assert form.value("loads[0].z") == "forty"
    form.refresh()
    assert "loads[0].z" in form.errors


# -- section, material, loads, check -----------------------------------------------------------


def test_a_section_by_dimensions(form: MemberForm) -> None:
    assert section_dimension_keys("rectangular HSS") == (("H", "B", "t"), ())
    form.set_value("member.section.source", "custom dimensions")
    form.set_value("member.section.kind", "rectangular HSS")
    form.set_value("member.section.H", "6 in")
    form.set_value("member.section.B", "6 in")
    form.set_value("member.section.t", "")
    form.refresh()
    assert "member.section.t" in form.errors
    form.set_value("member.section.t", "0.349 in")
    form.refresh()
    assert form.errors == {}
    section = form.results.job.member.section
    assert section == SectionSpec(kind="rectangular HSS", H="6 in", B="6 in", t="0.349 in")
    assert "member.section.bf" not in form.fields()  # only the kind's own boxes


def test_the_catalog_picker_lists_the_family_and_keeps_the_spelling(form: MemberForm) -> None:
    assert form.value("member.section.family") == "HSS_RECT"
    picker = form.section.designation.widget
    assert "HSS6X6X3/8" in picker.options
    form.set_value("member.section.family", "W")
    assert "W8X31" in picker.options and form.value("member.section") == ""
    form.set_value("member.section", "w8x31")
    form.refresh()
    assert form.errors == {} and form.results.job.member.section == "w8x31"


def test_a_grade_fills_its_strengths_and_a_typed_one_wins(form: MemberForm) -> None:
    form.set_value("material.grade", "ASTM A36")
    # 36 and 58 ksi: the minimums of ASTM A36 as calcsheet.materials lists them.
    assert (form.value("material.Fy"), form.value("material.Fu")) == ("36.0 ksi", "58.0 ksi")
    assert form.job_data()["material"] == {"grade": "ASTM A36"}
    form.set_value("material.Fy", "40 ksi")
    assert form.job_data()["material"] == {"grade": "ASTM A36", "Fy": "40 ksi"}
    form.set_value("material.grade", "ASTM A992")
    assert form.value("material.Fy") == "50.0 ksi"


def test_loads_are_added_and_removed_and_their_keys_follow(form: MemberForm) -> None:
    form.loads.add()
    assert form.value("loads[2].name") == "load 3"
    assert form.value("loads[2].z") == "48 in"  # a new load starts at the free end
    form.loads.remove(form.loads.rows[0])
    form.refresh()
    assert [load.name for load in form.results.job.loads] == ["wind on sign", "load 3"]
    assert "loads[2].name" not in form.fields()


def test_a_load_given_by_components(form: MemberForm) -> None:
    form.set_value("loads[0].direction", "components")
    form.set_value("loads[0].components[1]", "-2 kip")
    assert "loads[0].magnitude" not in form.fields()
    form.refresh()
    load = form.results.job.loads[0]
    assert load.components == ["0 kip", "-2 kip", "0 kip"] and load.magnitude is None


def test_the_demo_opens_with_its_aisc_check_and_the_method_can_change(
    demo_form: MemberForm,
) -> None:
    assert demo_form.value("check.kind") == "AISC 360-22"
    descriptions = [check.description for check in demo_form.sheet.checks]
    assert "Combined axial force and flexure" in descriptions
    demo_form.set_value("check.method", "ASD")
    demo_form.refresh()
    assert demo_form.results.job.check.method == "ASD"
    assert "ASD" in demo_form.sheet.basis["Codes and editions"][0]


def test_the_eurocode_panel_builds_with_en_load_types(demo_form: MemberForm) -> None:
    demo_form.set_value("check.kind", "EN 1993-1-1")
    demo_form.set_value("explore.lightest_in", "")
    demo_form.set_value("loads[0].type", "G")
    demo_form.refresh()
    assert demo_form.errors == {}
    assert any("buckling" in check.description for check in demo_form.sheet.checks)


def test_the_check_panel_shows_its_entries(form: MemberForm) -> None:
    assert form.value("check.kind") == "allowable stress"
    form.set_value("check.factor_of_safety", "0")
    form.refresh()
    assert "above 0" in form.errors["check.factor_of_safety"]
    form.set_value("check.factor_of_safety", "2")
    form.refresh()
    assert form.results.job.check.factor_of_safety == 2.0


# -- files and revisions -------------------------------------------------------------------


def test_saved_job_file_loads_back_to_the_same_job_and_the_same_hash(
    form: MemberForm, tmp_path: Path
) -> None:
    form.set_value("loads[0].magnitude", "3 kip")
    form.set_value("sheet.units", "SI")
    form.set_value("material.Fy", "360 MPa")
    form.loads.add()
    form.refresh()
    assert form.errors == {}
    path = form.save("saved/job")
    assert path == tmp_path / "saved" / "job.toml"
    saved = read_job(path)
    assert saved == form.to_job()
    assert inputs_hash(saved) == form.results.hash == build_sheets(saved).hash

    again = MemberForm.from_job_file(path, debounce=None, folder=tmp_path)
    assert again.to_job() == saved
    assert again.results.hash == form.results.hash


def test_a_job_asking_for_its_calc_package_keeps_asking_after_a_save(
    form: MemberForm, tmp_path: Path
) -> None:
    """[output] package = true is an entry of the form: loaded, saved and loaded back."""
    form.set_value("output.package", True)
    form.refresh()
    assert form.errors == {}
    saved = read_job(form.save("packaged.toml"))
    assert saved.output.package is True
    again = MemberForm.from_job_file(tmp_path / "packaged.toml", debounce=None, folder=tmp_path)
    assert again.value("output.package") is True
    assert again.to_job().output.package is True


def test_load_replaces_the_entries(demo_form: MemberForm, tmp_path: Path) -> None:
    form = demo_form
    path = form.save("demo-copy.toml")
    form.set_value("member.name", "OA-2")
    form.set_value("loads[0].magnitude", "zzz")
    assert form.load(path) == read_job(DEMO)
    assert form.to_job() == read_job(DEMO) and form.errors == {}


def test_buttons_report_problems_in_one_line(form: MemberForm) -> None:
    form.job_path.set("missing.toml")
    form.buttons["load"].click()
    assert "missing.toml: no such file" in form.status.value
    form.set_value("loads[0].magnitude", "6.5 in")
    form.buttons["export"].click()
    assert "Export PDF + HTML + JSON not done: the entries have problems" in form.status.value
    with pytest.raises(FormError):
        form.export()


def test_export_writes_the_files_and_links_them(form: MemberForm, tmp_path: Path) -> None:
    written = form.export()
    names = sorted(path.name for path in written)
    assert names == [
        "outrigger-demo-revB.html",
        "outrigger-demo-revB.json",
        "outrigger-demo-revB.pdf",
    ]
    assert all(path.parent == tmp_path / "out" and path.stat().st_size for path in written)
    assert 'href="out/outrigger-demo-revB.pdf"' in form.links.value
    form.set_value("output.folder", "../elsewhere")
    form.buttons["export"].click()
    assert "must be a folder inside" in form.status.value


def test_a_new_revision_takes_the_next_mark_and_todays_date(form: MemberForm) -> None:
    form.buttons["revision"].click()
    form.refresh()
    last = form.results.job.revisions[-1]
    assert (last.mark, last.date, last.description) == ("C", date.today().isoformat(), "")
    assert "rev. C" in form.results.sheets[0].sheet.trace


@pytest.mark.parametrize(
    ("marks", "following"),
    [
        ([], "A"),
        (["A"], "B"),
        (["A", "Z"], "AA"),
        (["AZ"], "BA"),
        (["0"], "1"),
        (["9"], "10"),
        (["09"], "10"),
        (["P1"], "P2"),
        (["b"], "c"),
        (["-"], "-1"),
    ],
)
def test_next_revision_mark(marks: list[str], following: str) -> None:
    assert next_revision_mark(marks) == following


def test_a_form_without_a_job_starts_from_the_starter(tmp_path: Path) -> None:
    form = MemberForm(debounce=None, folder=tmp_path)
    assert form.errors == {}
    assert form.results.job.member.section == "W8X31"


def test_a_preview_that_cannot_be_drawn_is_one_line_too(
    form: MemberForm, monkeypatch: pytest.MonkeyPatch
) -> None:
    from calcsheet.widgets import preview

    def broken(_sheet: object) -> str:
        raise ValueError("template missing")

    monkeypatch.setattr(preview, "render_fragment", broken)
    form.set_value("loads[0].magnitude", "3 kip")
    form.refresh()  # does not raise
    assert form.errors[""] == "unexpected problem (ValueError): template missing"
    assert "template missing" in form.general.message.value


def test_a_section_by_dimensions_couples_and_revisions_survive_the_job_file(
    form: MemberForm,
) -> None:
    form.set_value("member.section.source", "custom dimensions")
    form.set_value("member.section.kind", "I")
    for key, value in {"d": "8 in", "bf": "6 in", "tw": "0.3 in", "tf": "0.4 in"}.items():
        form.set_value(f"member.section.{key}", value)
    form.set_value("member.section.name", "built-up I")
    form.moments.add()
    form.set_value("moments[0].Mz", "0.5 kip*ft")
    form.new_revision()
    form.set_value("revisions[2].description", "Section changed to a built-up I")
    form.refresh()
    assert form.errors == {}
    saved = read_job(form.save("custom.toml"))
    assert saved == form.to_job()
    assert saved.member.section.bf_bottom is None  # left empty: not written
    assert saved.moments[0].Mz == "0.5 kip*ft"
    assert saved.revisions[-1].mark == "C"
    assert build_sheets(saved).hash == form.results.hash
