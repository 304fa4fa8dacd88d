"""Resource bounds: oversized lists and files are refused with a message naming the limit.

(Memory of a large batch is measured, not tested: bench/batch_memory.py.)
"""

from __future__ import annotations

import io
import pathlib
from pathlib import Path

import pypdf
import pytest

from calcsheet.cli import main
from calcsheet.job import JobError, job_from_data, read_job
from calcsheet.job.load import MAX_JOB_BYTES
from calcsheet.job.schema import MAX_TEXT
from calcsheet.pipeline import build_sheets, write_outputs
from calcsheet.pipeline.batch import MAX_MEMBERS, members_from_toml, run_batch

from .support import no_hang, starter_data, toml_text

MANY = 10_000


def refused(data: dict) -> dict[str, str]:
    with pytest.raises(JobError) as raised:
        job_from_data(data, source="big.toml")
    return dict(raised.value.problems)


def test_ten_thousand_loads_are_refused_naming_the_key_and_the_limit() -> None:
    data = starter_data()
    load = data["loads"][0]
    data["loads"] = [dict(load, name=f"P{index}") for index in range(MANY)]
    assert refused(data) == {"loads": "at most 200 entries allowed; this list has 10,000"}


def test_ten_thousand_stations_are_refused_naming_the_key_and_the_limit() -> None:
    data = starter_data()
    data["member"]["stations"] = [f"{index * 0.006:.3f} in" for index in range(MANY)]
    assert refused(data) == {"member.stations": "at most 20 entries allowed; this list has 10,000"}


@pytest.mark.parametrize("key", ["moments", "revisions"])
def test_other_long_lists_are_refused_too(key: str) -> None:
    data = starter_data()
    entry = {"name": "M", "z": "60 in"} if key == "moments" else {"mark": "A"}
    data[key] = [dict(entry, name=f"M{i}") if key == "moments" else entry for i in range(MANY)]
    assert refused(data)[key].startswith("at most 200 entries allowed")


def test_calcsheet_check_refuses_a_job_file_of_ten_thousand_loads(tmp_path, capsys) -> None:
    data = starter_data()
    load = {"z": "60 in", "components": ["1 kip", "0 kip", "0 kip"]}
    data["loads"] = [dict(load, name=f"P{index}") for index in range(MANY)]
    path = tmp_path / "many.toml"
    path.write_text(toml_text(data), encoding="utf-8")
    assert path.stat().st_size < MAX_JOB_BYTES  # the list limit is what refuses it
    assert main(["check", str(path)]) == 2
    message = capsys.readouterr().err
    assert str(path) in message and "loads: at most 200 entries allowed" in message


def test_a_50_mb_job_file_is_refused_without_being_read(tmp_path, monkeypatch, capsys) -> None:
    path = tmp_path / "huge.toml"
    with path.open("wb") as handle:  # sparse: 50 MB long, almost nothing on disk
        handle.write(b'version = 1\n[sheet]\ntitle = "')
        handle.truncate(50_000_000)

    def no_reading(self, *args, **kwargs):
        raise AssertionError(f"{self} was read")

    for method in ("read_text", "read_bytes", "open"):
        monkeypatch.setattr(pathlib.Path, method, no_reading)
    with pytest.raises(JobError) as raised:
        read_job(path)
    (message,) = dict(raised.value.problems).values()
    assert "50,000,000 bytes" in message and f"{MAX_JOB_BYTES:,}" in message
    assert main(["check", str(path)]) == 2
    assert "50,000,000 bytes" in capsys.readouterr().err


def test_a_batch_of_too_many_members_stops_before_any_is_built(tmp_path) -> None:
    members = "\n".join(
        f'[[members]]\nmember.name = "M{index}"' for index in range(MAX_MEMBERS + 1)
    )
    data = members_from_toml(members, source="batch.toml")
    with pytest.raises(JobError) as raised:
        run_batch(data, tmp_path / "out", source="batch.toml", workers=1)
    assert dict(raised.value.problems)["members"] == f"{MAX_MEMBERS + 1} members; at most 5000"
    assert not (tmp_path / "out").exists()


def test_a_50_mb_batch_table_is_refused_without_being_read(tmp_path, monkeypatch) -> None:
    path = tmp_path / "members.toml"
    with path.open("wb") as handle:
        handle.write(b"[[members]]\n")
        handle.truncate(50_000_000)

    def no_reading(self, *args, **kwargs):
        raise AssertionError(f"{self} was read")

    monkeypatch.setattr(pathlib.Path, "read_text", no_reading)
    assert main(["batch", str(path), "--out", str(tmp_path / "out")]) == 2


def test_free_text_at_its_limit_builds_and_writes_and_100k_characters_are_refused(
    tmp_path: Path,
) -> None:
    # Text printed in the title block and the revision log is limited to MAX_TEXT
    # characters (issue 16: a 10,000-character title made five pages of title).
    keys = ["sheet.title", "revisions[0].description", "revisions[0].by", "member.section.name"]
    keys += [f"title_block.{key}" for key in starter_data()["title_block"] if "date" not in key]
    for size in (MAX_TEXT, 100_000):
        long = ("Wrap me " * (size // 8 + 1))[:size].strip()
        data = starter_data()
        data["sheet"]["title"] = long
        for key in data["title_block"]:
            data["title_block"][key] = "2026-12-01" if key.endswith("_date") else long
        data["revisions"][0].update(description=long, by=long)
        data["member"]["section"] = {"kind": "round bar", "D": "2 in", "name": long}
        if size > MAX_TEXT:
            problems = refused(data)
            assert set(problems) == set(keys)
            assert all(f"at most {MAX_TEXT} characters" in text for text in problems.values())
            continue
        with no_hang(240):
            written = write_outputs(build_sheets(job_from_data(data)), tmp_path)
        pdf = next(path for path in written if path.suffix == ".pdf")
        pages = pypdf.PdfReader(io.BytesIO(pdf.read_bytes())).pages
        assert len(pages) >= 1
        html = next(path for path in written if path.suffix == ".html").read_text(encoding="utf-8")
        assert long in html
