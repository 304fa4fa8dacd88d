"""Batches: one sheet per member, a correct summary, bad members skipped, names unique."""

from __future__ import annotations

import csv
import io
import tomllib
from pathlib import Path

import pytest

from calcsheet.errors import InputError
from calcsheet.job import JobError
from calcsheet.job.starter import STARTER
from calcsheet.pipeline.batch import (
    BASE_VALUE,
    batch_log,
    column_problem,
    members_from_csv,
    members_from_toml,
    run_batch,
    summary_csv,
)

# Twelve W8 members with loads growing by 1 kip (invented demo numbers).
SECTIONS = ["W8X31", "W8X24", "W8X18", "W8X40"] * 3


def _base() -> dict:
    """The starter job with its title and calc number made per member."""
    base = tomllib.loads(STARTER)
    base["sheet"]["title"] = "Davit arm {member}: combined stresses at the support"
    base["title_block"]["calc_number"] = "C-{member}"
    # No self-weight: the tests compare members by the linearity of stress in the load.
    base["member"]["self_weight"] = False
    return base


def _table() -> str:
    rows = ["member.name,member.section,loads[0].magnitude"]
    rows += [f"M{n},{section},{n} kip" for n, section in enumerate(SECTIONS, start=1)]
    return "\n".join(rows) + "\n"


def test_twelve_members_give_twelve_sheets_and_a_correct_summary(tmp_path: Path) -> None:
    members = members_from_csv(_table(), _base(), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=2)
    assert len(list(tmp_path.glob("*.pdf"))) == 12
    assert len(list(tmp_path.glob("*.json"))) == 12
    rows = list(csv.DictReader(io.StringIO(summary_csv(outcomes))))
    assert [row["member"] for row in rows] == [f"M{n}" for n in range(1, 13)]
    assert [row["section"] for row in rows] == SECTIONS
    # Linear elasticity (common practice, no source): stress is linear in the load, so the
    # utilization of M5 (W8X31, 5 kip) is 5 × M1's (W8X31, 1 kip).
    assert float(rows[4]["governing utilization"]) == pytest.approx(
        5 * float(rows[0]["governing utilization"]), abs=0.002
    )
    for row, outcome in zip(rows, outcomes, strict=True):
        assert row["status"] == ("OK" if outcome.utilization <= 1 else "NOT OK")


def test_a_bad_member_is_reported_and_skipped(tmp_path: Path) -> None:
    table = _table().replace("M3,W8X18", "M3,W8X19")
    members = members_from_csv(table, _base(), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=1)
    bad = outcomes[2]
    assert not bad.ok and "member.section" in bad.message and "W8X19" in bad.message
    assert sum(outcome.ok for outcome in outcomes) == 11
    assert not list(tmp_path.glob("M3-*"))


def test_duplicate_member_names_stop_the_batch_before_anything_runs(tmp_path: Path) -> None:
    table = _table().replace("M4,", "M1,")
    members = members_from_csv(table, _base(), source="members.csv")
    with pytest.raises(JobError, match="'M1' is used by more than one member"):
        run_batch(members, tmp_path, source="members.csv", workers=1)
    assert not list(tmp_path.iterdir())


def test_a_toml_batch_merges_each_member_over_the_defaults() -> None:
    starter = tomllib.loads(STARTER)
    text = (
        '[defaults.material]\ngrade = "ASTM A36"\n\n'
        '[[members]]\n[members.member]\nname = "T1"\nsection = "W8X31"\nlength = "60 in"\n'
    )
    (member,) = members_from_toml(text, source="batch.toml")
    assert member["material"] == {"grade": "ASTM A36"}
    assert member["member"]["name"] == "T1"
    assert "loads" not in member and starter["loads"]


def test_a_bad_key_path_in_a_csv_header_is_named() -> None:
    with pytest.raises(JobError, match="not a job key path"):
        members_from_csv("member..name\nX\n", {}, source="m.csv")


def test_member_names_that_give_the_same_file_name_stop_the_batch(tmp_path: Path) -> None:
    """B/1, B-1 and B 1 are all written as B-1-rev...: before, one set of files, three OKs."""
    table = "member.name,member.section\nB/1,W8X31\nB-1,W8X24\nB 1,W8X18\nb-1,W8X40\nC1,W8X31\n"
    members = members_from_csv(table, _base(), source="members.csv")
    with pytest.raises(JobError) as raised:
        run_batch(members, tmp_path, source="members.csv", workers=1)
    (problem,) = [text for path, text in raised.value.problems if path == "member.name"]
    assert "'B/1', 'B-1', 'B 1', 'b-1' would all be written to the same files" in problem
    assert "C1" not in problem
    assert not list(tmp_path.iterdir())


def test_an_output_stem_shared_by_members_stops_the_batch(tmp_path: Path) -> None:
    base = _base()
    base["output"]["stem"] = "arm"
    members = members_from_csv("member.name\nA1\nA2\n", base, source="m.csv")
    with pytest.raises(JobError, match="'A1', 'A2' would all be written to the same files"):
        run_batch(members, tmp_path, source="m.csv", workers=1)
    base["output"]["stem"] = "arm-{member}"
    members = members_from_csv("member.name\nA1\nA2\n", base, source="m.csv")
    outcomes = run_batch(members, tmp_path, source="m.csv", workers=1)
    assert all(outcome.ok for outcome in outcomes)
    assert sorted(path.name for path in tmp_path.glob("*.json")) == [
        "arm-A1-revA.json",
        "arm-A2-revA.json",
    ]


def test_a_blank_cell_skips_its_row_naming_row_and_column(tmp_path: Path) -> None:
    """Before, a blank cell silently took the base job's value (3 kip)."""
    table = (
        "member.name,member.section,loads[0].magnitude\n"
        "M1,W8X31,5 kip\n"
        "M2,W8X31,\n"
        f"M3,W8X31,{BASE_VALUE}\n"
    )
    members = members_from_csv(table, _base(), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=1)
    assert [outcome.ok for outcome in outcomes] == [True, False, True]
    assert "row 3, column 3 (loads[0].magnitude): blank" in outcomes[1].message
    assert BASE_VALUE in outcomes[1].message
    assert not list(tmp_path.glob("M2-*"))
    # "(base)" keeps the base job's 3 kip on purpose: M3 is 3/5 of M1 (stress linear in
    # the load, common practice, no source).
    assert outcomes[2].utilization == pytest.approx(0.6 * outcomes[0].utilization, rel=1e-6)


def test_a_short_row_and_a_long_row_are_skipped_like_other_bad_rows(tmp_path: Path) -> None:
    """Before, one extra cell refused the whole batch and a missing one was silent."""
    table = "member.name,member.section\nM1,W8X31\nM2,W8X31,surplus\nM3\nM4,W8X19\n"
    members = members_from_csv(table, _base(), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=1)
    assert [outcome.ok for outcome in outcomes] == [True, False, False, False]
    assert "row 3: 3 cells but the header has 2 columns (extra: 'surplus')" in outcomes[1].message
    assert "row 4, column 2 (member.section): missing" in outcomes[2].message
    assert "W8X19" in outcomes[3].message
    assert sorted(path.name for path in tmp_path.glob("*.json")) == ["M1-revA.json"]


def test_a_header_typo_is_reported_once_before_anything_runs(tmp_path: Path) -> None:
    """Before, every row reported "member.sectoin: unknown key" (one message per row)."""
    table = "member.name,member.sectoin\n" + "".join(f"M{n},W8X31\n" for n in range(1, 6))
    with pytest.raises(JobError) as raised:
        members_from_csv(table, _base(), source="members.csv")
    assert raised.value.problems == [
        (
            "column 2 (member.sectoin)",
            "member has no key 'sectoin'; did you mean \"section\"?",
        )
    ]
    assert str(raised.value).count("sectoin") == 2  # the column, and the key: once


@pytest.mark.parametrize(
    ("column", "problem"),
    [
        ("loads[0].magnitude", None),
        ("member.section.kind", None),
        ("member.stations[1]", None),
        ("title_block.calc_number", None),
        ("loads[0].magnitud", 'did you mean "magnitude"'),
        ("member.name.first", "holds a value, not a table"),
        ("member[0].name", "not a list"),
        ("loads[201].magnitude", "too large"),
        ("loads..z", "not a job key path"),
    ],
)
def test_header_columns_are_checked_against_the_job_keys(column: str, problem) -> None:
    found = column_problem(column)
    assert found is None if problem is None else problem in found


def test_each_member_sheet_carries_its_own_title_subject_and_calc_number(tmp_path) -> None:
    """Before, every member's sheet carried the base job's title and calc number."""
    members = members_from_csv(
        "member.name,title_block.subject\nK1,Knee brace K1\nK2,Knee brace K2\n",
        _base(),
        source="k.csv",
    )
    run_batch(members, tmp_path, source="k.csv", workers=1)
    for name in ("K1", "K2"):
        page = (tmp_path / f"{name}-revA.html").read_text(encoding="utf-8")
        assert f"Davit arm {name}: combined stresses" in page
        assert f"C-{name}" in page and f"Knee brace {name}" in page
        assert "DA-1" not in page and "C-001" not in page


@pytest.mark.parametrize(
    ("key", "table"),
    [("title", "sheet"), ("calc_number", "title_block"), ("subject", "title_block")],
)
def test_a_title_subject_or_calc_number_shared_by_members_stops_the_batch(
    key: str, table: str, tmp_path: Path
) -> None:
    base = _base()
    base[table][key] = "Same on every sheet"
    members = members_from_csv("member.name\nK1\nK2\n", base, source="k.csv")
    with pytest.raises(JobError) as raised:
        run_batch(members, tmp_path, source="k.csv", workers=1)
    problems = dict(raised.value.problems)
    assert "would be printed on the sheets of 2 members ('K1', 'K2')" in problems[f"{table}.{key}"]
    assert "{member}" in problems[f"{table}.{key}"]
    assert not list(tmp_path.iterdir())


def test_the_summary_names_the_governing_check_and_why_a_member_was_skipped(tmp_path) -> None:
    table = "member.name,member.section\nM1,W8X31\nM2,W8X19\n"
    members = members_from_csv(table, _base(), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=1)
    rows = list(csv.DictReader(io.StringIO(summary_csv(outcomes))))
    assert list(rows[0]) == [
        "member",
        "section",
        "governing utilization",
        "status",
        "governing check",
        "reason skipped",
    ]
    assert "at point" in rows[0]["governing check"] and rows[0]["reason skipped"] == ""
    assert rows[1]["status"] == "SKIPPED (bad input)"
    assert "member.section" in rows[1]["reason skipped"] and "W8X19" in rows[1]["reason skipped"]
    log = batch_log(outcomes, source="members.csv")
    assert "2 members: 1 pass, 0 fail, 1 skipped" in log
    assert "M2: SKIPPED (bad input)" in log and "did you mean" in log


def test_a_toml_batch_goes_over_a_base_job(tmp_path: Path) -> None:
    """Before, --base was ignored for a TOML batch."""
    text = '[defaults.check]\nfactor_of_safety = 2.0\n\n[[members]]\nmember.name = "T1"\n'
    (member,) = members_from_toml(text, source="batch.toml", base=_base())
    assert member["member"]["section"] == "W8X31"  # from the base job
    assert member["check"] == {"kind": "allowable stress", "factor_of_safety": 2.0}
    assert member["member"]["name"] == "T1"


@pytest.mark.parametrize("workers", [0, -1])
def test_fewer_than_one_worker_is_refused(workers: int, tmp_path: Path) -> None:
    members = members_from_csv("member.name\nK1\n", _base(), source="k.csv")
    with pytest.raises(InputError, match="workers: got .*at least 1"):
        run_batch(members, tmp_path, source="k.csv", workers=workers)


def _readme_block(language: str, after: str) -> str:
    readme = (Path(__file__).resolve().parents[2] / "README.md").read_text(encoding="utf-8")
    start = readme.index(f"```{language}\n", readme.index(after)) + len(language) + 4
    return readme[start : readme.index("```", start)]


def test_the_readme_batch_examples_build(tmp_path: Path) -> None:
    csv_members = members_from_csv(
        _readme_block("csv", "A CSV table names"), _base(), source="readme.csv"
    )
    toml_members = members_from_toml(
        _readme_block("toml", "A TOML batch has"), source="readme.toml", base=_base()
    )
    for folder, members in (("csv", csv_members), ("toml", toml_members)):
        outcomes = run_batch(members, tmp_path / folder, source="readme", workers=1)
        assert [outcome.ok for outcome in outcomes] == [True, True], outcomes
    page = (tmp_path / "toml" / "OA-2-revA.html").read_text(encoding="utf-8")
    assert "Outrigger arm OA-2: combined stresses" in page and "S-OA-2" in page
    page = (tmp_path / "csv" / "OA-2-revA.html").read_text(encoding="utf-8")
    assert "Outrigger arm OA-2" in page and "Davit arm OA-2" in page
