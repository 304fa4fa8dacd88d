"""Building jobs: model errors by key path, the trace line, files on disk, nothing half-written."""

from __future__ import annotations

import json
from pathlib import Path

import pytest

from calcsheet.export import files
from calcsheet.export.files import ExportError
from calcsheet.job import JobError, parse_job
from calcsheet.job.starter import STARTER
from calcsheet.pipeline import build_sheets, inputs_hash, output_folder, safe_stem, write_outputs
from calcsheet.pipeline.compare import changed_inputs, check_comparable, delta_sheet


def _job(text: str = STARTER):
    return parse_job(text, source="job.toml")


def test_model_problems_name_the_key_path_all_at_once() -> None:
    text = STARTER.replace('section = "W8X31"', 'section = "W8X32"').replace(
        'grade = "ASTM A992"', 'grade = "A9999"'
    )
    with pytest.raises(JobError) as raised:
        build_sheets(_job(text), source="job.toml")
    problems = dict(raised.value.problems)
    assert "did you mean" in problems["member.section"]
    assert "one of: ASTM A992" in problems["material.grade"]


def test_a_section_by_dimensions_needs_its_keys() -> None:
    text = STARTER.replace(
        'section = "W8X31"', 'section = { kind = "rectangular HSS", H = "8 in", t = "0.3 in" }'
    )
    with pytest.raises(JobError) as raised:
        build_sheets(_job(text))
    assert "needs B" in dict(raised.value.problems)["member.section"]


def test_a_flange_thicker_than_half_the_depth_is_named() -> None:
    text = STARTER.replace(
        'section = "W8X31"',
        'section = { kind = "I", d = "8 in", bf = "6 in", tw = "0.3 in", tf = "5 in" }',
    )
    with pytest.raises(JobError) as raised:
        build_sheets(_job(text))
    assert "member.section" in dict(raised.value.problems)


def test_a_load_beyond_the_member_is_named() -> None:
    with pytest.raises(JobError) as raised:
        build_sheets(_job(STARTER.replace('length = "60 in"', 'length = "50 in"')))
    assert any("hoist" in message for _, message in raised.value.problems)


def test_the_hash_is_stable_ignores_units_and_outputs_and_sees_any_change() -> None:
    base = inputs_hash(_job())
    assert base == inputs_hash(_job())
    # 1 kip = 1000 lbf (NIST SP 811, Appendix B): the same load written another way.
    assert base == inputs_hash(_job(STARTER.replace('"3 kip"', '"3000 lbf"')))
    assert base == inputs_hash(_job(STARTER.replace('folder = "out"', 'folder = "other"')))
    assert base != inputs_hash(_job(STARTER.replace('"3 kip"', '"3.01 kip"')))
    assert base != inputs_hash(_job(STARTER.replace('ey = "-4 in"', 'ey = "-4.5 in"')))


def test_build_writes_traced_pdf_html_and_json_named_by_revision(tmp_path: Path) -> None:
    result = build_sheets(_job())
    paths = write_outputs(result, tmp_path)
    assert sorted(path.name for path in paths) == [
        "DA-1-revA.html",
        "DA-1-revA.json",
        "DA-1-revA.pdf",
    ]
    data = json.loads((tmp_path / "DA-1-revA.json").read_text())
    assert data["trace"].startswith(f"inputs {result.hash}")
    assert data["all_pass"] is True
    assert data["governing"]["at"].startswith("point ")
    moment = next(step for step in data["steps"] if step["name"] == "M_x")
    assert moment["si_unit"] == "N·m"  # the SI unit of moment as written (NIST SP 811 Table 3)
    assert result.hash in (tmp_path / "DA-1-revA.html").read_text()


def test_a_new_revision_does_not_overwrite_the_previous_files(tmp_path: Path) -> None:
    write_outputs(build_sheets(_job()), tmp_path)
    before = (tmp_path / "DA-1-revA.pdf").read_bytes()
    revised = STARTER.replace('mark = "A"', 'mark = "B"').replace('"3 kip"', '"4 kip"')
    write_outputs(build_sheets(_job(revised)), tmp_path)
    assert (tmp_path / "DA-1-revA.pdf").read_bytes() == before
    assert (tmp_path / "DA-1-revB.pdf").exists()


def test_a_failed_pdf_leaves_the_previous_outputs_intact(tmp_path: Path, monkeypatch) -> None:
    write_outputs(build_sheets(_job()), tmp_path)
    before = {path.name: path.read_bytes() for path in tmp_path.iterdir()}

    def broken(*args, **kwargs):
        raise ExportError("the PDF engine failed: simulated")

    monkeypatch.setattr(files, "compile_pdf", broken)
    changed = _job(STARTER.replace('"3 kip"', '"4 kip"'))
    with pytest.raises(ExportError):
        write_outputs(build_sheets(changed), tmp_path)
    after = {path.name: path.read_bytes() for path in tmp_path.iterdir()}
    assert after == before  # same files, same bytes, no temporary file left


def test_several_stations_give_one_sheet_each() -> None:
    result = build_sheets(
        _job(STARTER.replace('stations = ["0 in"]', 'stations = ["0 in", "30 in"]'))
    )
    assert [built.stem for built in result.sheets] == ["DA-1-revA-z0in", "DA-1-revA-z30in"]


def test_output_folder_must_stay_inside_the_job_folder(tmp_path: Path) -> None:
    for folder in ("../elsewhere", "/tmp/x"):
        job = _job(STARTER.replace('folder = "out"', f'folder = "{folder}"'))
        with pytest.raises(JobError, match="output.folder"):
            output_folder(job, tmp_path)
    assert output_folder(_job(), tmp_path) == tmp_path / "out"


@pytest.mark.parametrize(
    ("text", "expected"),
    [
        ("../../etc/passwd", "etc-passwd"),
        ("A B/C", "A-B-C"),
        ("...", "calc"),
        ("x" * 200, "x" * 80),
    ],
)
def test_file_names_are_sanitized(text: str, expected: str) -> None:
    assert safe_stem(text) == expected


def test_compare_lists_exactly_the_changed_inputs() -> None:
    old = build_sheets(_job())
    revised = STARTER.replace('mark = "A"', 'mark = "B"').replace('"3 kip"', '"4.5 kip"')
    new = build_sheets(_job(revised))
    changes = {change.path: (change.old, change.new) for change in changed_inputs(old, new)}
    assert changes == {"revisions[0].mark": ("A", "B"), "loads[0].magnitude": ("3 kip", "4.5 kip")}
    same_in_other_units = build_sheets(_job(STARTER.replace('"3 kip"', '"3000 lbf"')))
    assert changed_inputs(old, same_in_other_units) == []
    sheet = delta_sheet(old, new)
    assert "rev. A to rev. B" in sheet.title


# --- an issued set is never replaced silently ----------------------------------------

CHANGED_SAME_REVISION = STARTER.replace('"3 kip"', '"3.5 kip"')


def test_changed_inputs_under_the_same_revision_are_refused(tmp_path: Path) -> None:
    """Before, the issued PDF, HTML and JSON were replaced without a word."""
    first = build_sheets(_job())
    write_outputs(first, tmp_path)
    before = {path.name: path.read_bytes() for path in tmp_path.iterdir()}
    changed = build_sheets(_job(CHANGED_SAME_REVISION), source="job.toml")
    with pytest.raises(JobError) as raised:
        write_outputs(changed, tmp_path)
    (path, message), *_ = raised.value.problems
    assert path == "revisions"
    assert f"inputs {first.hash} then, {changed.hash} now" in message
    assert "add a [[revisions]] entry" in message and "--replace-issued" in message
    assert str(raised.value).startswith("job.toml: 1 problem")
    assert {path.name: path.read_bytes() for path in tmp_path.iterdir()} == before


def test_the_same_inputs_rebuild_in_place_and_replacing_on_purpose_works(tmp_path) -> None:
    write_outputs(build_sheets(_job()), tmp_path)
    # The same inputs written another way (1 kip = 1000 lbf, NIST SP 811 Appendix B).
    write_outputs(build_sheets(_job(STARTER.replace('"3 kip"', '"3000 lbf"'))), tmp_path)
    changed = build_sheets(_job(CHANGED_SAME_REVISION))
    write_outputs(changed, tmp_path, replace_issued=True)
    data = json.loads((tmp_path / "DA-1-revA.json").read_text())
    assert data["trace"].startswith(f"inputs {changed.hash}")
    assert not list(tmp_path.glob(".*"))  # no lock file or temporary file left


def test_the_issued_hash_is_read_from_the_html_when_there_is_no_json(tmp_path) -> None:
    write_outputs(build_sheets(_job()), tmp_path)
    (tmp_path / "DA-1-revA.json").unlink()
    with pytest.raises(JobError, match="built from other inputs"):
        write_outputs(build_sheets(_job(CHANGED_SAME_REVISION)), tmp_path)
    write_outputs(build_sheets(_job()), tmp_path)  # the same inputs: fine


def test_a_json_of_version_0_1_0_with_its_stamp_key_still_protects_the_issued_set(
    tmp_path,
) -> None:
    """calcsheet 0.1.0 wrote the trace line under the key "stamp"; its files stay protected."""
    write_outputs(build_sheets(_job()), tmp_path)
    path = tmp_path / "DA-1-revA.json"
    data = json.loads(path.read_text())
    old = {("stamp" if key == "trace" else key): value for key, value in data.items()}
    path.write_text(json.dumps(old))
    (tmp_path / "DA-1-revA.html").unlink()  # only the old JSON can tell the hash
    with pytest.raises(JobError, match="built from other inputs"):
        write_outputs(build_sheets(_job(CHANGED_SAME_REVISION)), tmp_path)
    write_outputs(build_sheets(_job()), tmp_path)  # the same inputs: fine


def test_a_pdf_alone_whose_inputs_cannot_be_told_is_not_replaced(tmp_path) -> None:
    (tmp_path / "DA-1-revA.pdf").write_bytes(b"%PDF-1.7 issued by hand")
    with pytest.raises(JobError, match="do not say which inputs built them"):
        write_outputs(build_sheets(_job()), tmp_path)
    assert (tmp_path / "DA-1-revA.pdf").read_bytes() == b"%PDF-1.7 issued by hand"


def test_each_station_of_an_issued_set_is_protected(tmp_path: Path) -> None:
    two = STARTER.replace('stations = ["0 in"]', 'stations = ["0 in", "30 in"]')
    write_outputs(build_sheets(_job(two)), tmp_path)
    changed = two.replace('"3 kip"', '"3.5 kip"')
    with pytest.raises(JobError) as raised:
        write_outputs(build_sheets(_job(changed)), tmp_path)
    assert len(raised.value.problems) == 2  # one per station's set


def test_several_stations_name_the_governing_station() -> None:
    """Before, the summary named the point but not which station it is at."""
    result = build_sheets(
        _job(STARTER.replace('stations = ["0 in"]', 'stations = ["0 in", "30 in"]'))
    )
    # The support carries the larger moment (statics of a cantilever, common practice, no
    # source), so the station at z = 0 governs.
    assert ", station z = 0 in)" in result.summary()
    assert result.governing_text().endswith("station z = 0 in")
    assert "station" not in build_sheets(_job()).summary()


# --- compare: one member, the earlier revision first ----------------------------------

REVISION_B = STARTER.replace(
    '[[revisions]]\nmark = "A"\ndate = ""\ndescription = "Issued for review"\nby = ""\n',
    '[[revisions]]\nmark = "A"\ndescription = "Issued for review"\n\n'
    '[[revisions]]\nmark = "B"\ndescription = "Load raised"\n',
).replace('"3 kip"', '"4 kip"')


def test_compare_refuses_two_different_members_unless_asked() -> None:
    old = build_sheets(_job())
    other = build_sheets(_job(REVISION_B.replace('name = "DA-1"', 'name = "DA-2"')))
    with pytest.raises(JobError) as raised:
        check_comparable(old, other)
    assert "member 'DA-1' and the new one 'DA-2'" in dict(raised.value.problems)["member.name"]
    check_comparable(old, other, other_member=True)


def test_compare_refuses_a_later_revision_given_as_the_old_one() -> None:
    assert 'mark = "B"' in REVISION_B
    rev_a, rev_b = (
        build_sheets(_job(), source="a.toml"),
        build_sheets(_job(REVISION_B), source="b.toml"),
    )
    check_comparable(rev_a, rev_b)
    with pytest.raises(JobError) as raised:
        check_comparable(rev_b, rev_a)
    message = dict(raised.value.problems)["revisions"]
    assert "rev. B, later than the new job's rev. A" in message
    assert "calcsheet compare a.toml b.toml" in message
    check_comparable(rev_a, build_sheets(_job(CHANGED_SAME_REVISION)))  # a what-if: allowed
