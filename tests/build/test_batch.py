"""Batches: one sheet per member, a correct summary, bad members skipped, names unique."""

from __future__ import annotations

import csv
import io
import tomllib
from pathlib import Path

import pytest

from calcsheet.build.batch import (
    members_from_csv,
    members_from_toml,
    run_batch,
    summary_csv,
)
from calcsheet.job import JobError
from calcsheet.job.starter import STARTER

# Twelve W8 members with loads growing by 1 kip (invented demo numbers).
SECTIONS = ["W8X31", "W8X24", "W8X18", "W8X40"] * 3


def _table() -> str:
    rows = ["member.name,member.section,loads[0].magnitude"]
    rows += [f"M{n},{section},{n} kip" for n, section in enumerate(SECTIONS, start=1)]
    return "\n".join(rows) + "\n"


def test_twelve_members_give_twelve_sheets_and_a_correct_summary(tmp_path: Path) -> None:
    members = members_from_csv(_table(), tomllib.loads(STARTER), source="members.csv")
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
    members = members_from_csv(table, tomllib.loads(STARTER), source="members.csv")
    outcomes = run_batch(members, tmp_path, source="members.csv", workers=1)
    bad = outcomes[2]
    assert not bad.ok and "member.section" in bad.message and "W8X19" in bad.message
    assert sum(outcome.ok for outcome in outcomes) == 11
    assert not list(tmp_path.glob("M3-*"))


def test_duplicate_member_names_stop_the_batch_before_anything_runs(tmp_path: Path) -> None:
    table = _table().replace("M4,", "M1,")
    members = members_from_csv(table, tomllib.loads(STARTER), source="members.csv")
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
