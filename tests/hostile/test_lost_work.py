"""Lost or replaced work, and careless use of the command line, as a new user would try it.

Every case runs the real command line (in this process, or in a child where a
signal or a second process is part of the case) and asserts the exit status, the
message and the files left. The count of cases and how they ended is printed when
the module finishes.
"""

from __future__ import annotations

import contextlib
import csv
import io
import json
import os
import re
import signal
import stat
import subprocess
import sys
from collections import Counter
from pathlib import Path

import pytest

from calcsheet.cli import main
from calcsheet.job.starter import STARTER

from .support import starter_data, toml_text
from .test_faults import wait_for_line

OUTCOMES: Counter[str] = Counter()
HASH = re.compile(r"inputs ([0-9a-f]{12})")


@pytest.fixture(scope="module", autouse=True)
def report_cases(request: pytest.FixtureRequest):
    yield
    total = sum(OUTCOMES.values())
    lines = [f"hostile lost work: {total} cases ran"]
    lines += [f"  {key}: {count}" for key, count in sorted(OUTCOMES.items())]
    capture = request.config.pluginmanager.get_plugin("capturemanager")
    with capture.global_and_fixture_disabled() if capture else contextlib.nullcontext():
        print("\n" + "\n".join(lines))


def record(status: int) -> None:
    names = {0: "ok", 1: "check fails", 2: "refused", 3: "not written", 130: "interrupted"}
    OUTCOMES[f"exit {status} ({names.get(status, 'other')})"] += 1


def cli(argv: list[str], capsys: pytest.CaptureFixture[str]) -> tuple[int, str, str]:
    try:
        status = main(argv)
    except SystemExit as exit_:  # argparse refuses a usage error this way
        status = int(exit_.code or 0)
    out, err = capsys.readouterr()
    record(status)
    assert "Traceback" not in err and "internal error" not in err, err
    return status, out, err


def per_member_base() -> dict:
    data = starter_data()
    data["sheet"]["title"] = "Davit arm {member}"
    data["title_block"]["calc_number"] = "C-{member}"
    return data


def write(folder: Path, name: str, text: str) -> Path:
    folder.mkdir(parents=True, exist_ok=True)
    path = folder / name
    path.write_text(text, encoding="utf-8")
    return path


def traced_hashes(folder: Path, stem: str) -> set[str]:
    """The inputs hash as the JSON and the HTML of one set print it."""
    found = set(HASH.findall(json.loads((folder / f"{stem}.json").read_text())["trace"]))
    footer = re.search(r"<footer>(.*?)</footer>", (folder / f"{stem}.html").read_text(), re.DOTALL)
    assert footer is not None
    return found | set(HASH.findall(footer.group(1)))


# --- batch: members that would overwrite each other -----------------------------------

CLASHING = [("B/1", "B 1", "B-1"), ("x:1", "x*1", "x?1"), ("Arm", "ARM", "arm"), ("a.b", ".a.b.")]


@pytest.mark.parametrize("names", CLASHING, ids=lambda names: "|".join(names))
def test_member_names_that_make_one_file_name_stop_the_batch(names, tmp_path, capsys) -> None:
    rows = "".join(f'"{name}",W8X31\n' for name in names)
    table = write(tmp_path, "m.csv", "member.name,member.section\n" + rows + "Other,W8X31\n")
    base = write(tmp_path, "base.toml", toml_text(per_member_base()))
    out = tmp_path / "out"
    argv = ["batch", str(table), "--base", str(base), "--out", str(out), "--workers", "1"]
    status, _, err = cli(argv, capsys)
    assert status == 2
    assert "would all be written to the same files" in err
    assert all(repr(name) in err for name in names)
    assert not out.exists()  # nothing ran


def test_blank_short_and_long_rows_are_skipped_each_with_its_reason(tmp_path, capsys) -> None:
    table = write(
        tmp_path,
        "m.csv",
        "member.name,member.section,loads[0].magnitude\n"
        "R1,W8X31,2 kip\n"
        "R2,,2 kip\n"
        "R3,W8X31\n"
        "R4,W8X31,2 kip,surplus\n"
        "R5,W8X31,(base)\n",
    )
    base = write(tmp_path, "base.toml", toml_text(per_member_base()))
    out = tmp_path / "out"
    argv = ["batch", str(table), "--base", str(base), "--out", str(out), "--workers", "1"]
    status, _, _ = cli(argv, capsys)
    assert status == 2
    rows = {
        row["member"]: row for row in csv.DictReader(io.StringIO((out / "summary.csv").read_text()))
    }
    assert [row["status"] for row in rows.values()] == [
        "OK",
        "SKIPPED (bad input)",
        "SKIPPED (bad input)",
        "SKIPPED (bad input)",
        "OK",
    ]
    assert "row 3, column 2 (member.section): blank" in rows["R2"]["reason skipped"]
    assert "row 4, column 3 (loads[0].magnitude): missing" in rows["R3"]["reason skipped"]
    assert "(extra: 'surplus')" in rows["R4"]["reason skipped"]
    assert all("at point" in rows[name]["governing check"] for name in ("R1", "R5"))
    log = (out / "batch.log").read_text(encoding="utf-8")
    assert all(f"R{n}: SKIPPED" in log for n in (2, 3, 4))
    assert sorted(path.name for path in out.glob("R*.json")) == ["R1-revA.json", "R5-revA.json"]


def test_a_header_typo_is_one_message_not_one_per_row(tmp_path, capsys) -> None:
    rows = "".join(f"M{n},W8X31\n" for n in range(1, 21))
    table = write(tmp_path, "m.csv", "member.name,member.sectoin\n" + rows)
    base = write(tmp_path, "base.toml", toml_text(per_member_base()))
    status, _, err = cli(["batch", str(table), "--base", str(base)], capsys)
    assert status == 2
    assert err.count("sectoin") == 2 and 'did you mean "section"' in err


def test_a_shared_calc_number_stops_the_batch(tmp_path, capsys) -> None:
    data = per_member_base()
    data["title_block"]["calc_number"] = "C-001"
    table = write(tmp_path, "m.csv", "member.name\nK1\nK2\n")
    base = write(tmp_path, "base.toml", toml_text(data))
    status, _, err = cli(["batch", str(table), "--base", str(base)], capsys)
    assert status == 2 and "title_block.calc_number: 'C-001' would be printed" in err


# --- an issued set: replaced only on purpose, one build at a time ----------------------


def test_a_changed_job_under_the_same_revision_keeps_the_issued_set(tmp_path, capsys) -> None:
    job = write(tmp_path / "job", "job.toml", STARTER)
    assert cli(["build", str(job)], capsys)[0] == 0
    folder = tmp_path / "job" / "out"
    issued = {path.name: path.read_bytes() for path in folder.iterdir()}
    edits = [('"3 kip"', '"13 kip"'), ('"20 deg"', '"21 deg"'), ('"-4 in"', '"-5 in"')]
    edits += [('"60 in"', '"61 in"'), ('"ASTM A992"', '"ASTM A36"')]
    for edit in edits:
        changed = STARTER.replace(*edit)
        job.write_text(changed, encoding="utf-8")
        status, _, err = cli(["build", str(job)], capsys)
        assert status == 2 and "add a [[revisions]] entry" in err, edit
        assert {path.name: path.read_bytes() for path in folder.iterdir()} == issued
    job.write_text(STARTER.replace('"3 kip"', '"3000 lbf"'), encoding="utf-8")
    assert cli(["build", str(job)], capsys)[0] == 0  # the same inputs: rebuilt in place


def test_a_batch_member_does_not_replace_an_issued_set(tmp_path, capsys) -> None:
    base = write(tmp_path, "base.toml", toml_text(per_member_base()))
    out = tmp_path / "out"
    argv = ["batch", "", "--base", str(base), "--out", str(out), "--workers", "1"]
    first = write(tmp_path, "one.csv", "member.name,loads[0].magnitude\nM1,2 kip\n")
    second = write(tmp_path, "two.csv", "member.name,loads[0].magnitude\nM1,2.5 kip\n")
    assert cli([argv[0], str(first), *argv[2:]], capsys)[0] == 0
    before = (out / "M1-revA.json").read_bytes()
    status, _, err = cli([argv[0], str(second), *argv[2:]], capsys)
    assert status == 2 and "--replace-issued" in err
    assert (out / "M1-revA.json").read_bytes() == before
    assert cli([argv[0], str(second), *argv[2:], "--replace-issued"], capsys)[0] == 0


def test_two_builds_of_different_inputs_into_one_folder_one_is_refused(tmp_path) -> None:
    """Before, both exited 0 and the last one won."""
    jobs = [
        write(tmp_path / "jobs", "a.toml", STARTER),
        write(tmp_path / "jobs", "b.toml", STARTER.replace('"3 kip"', '"3.5 kip"')),
    ]
    out = tmp_path / "out"
    processes = [
        subprocess.Popen(
            [sys.executable, "-m", "calcsheet.cli", "build", str(job), "--out", str(out)],
            stdout=subprocess.PIPE,
            stderr=subprocess.PIPE,
            text=True,
        )
        for job in jobs
    ]
    results = [(process.wait(timeout=300), process.communicate()) for process in processes]
    statuses = sorted(status for status, _ in results)
    for status in statuses:
        record(status)
    assert statuses == [0, 2], results
    (winner,) = [out_err for status, out_err in results if status == 0]
    (loser,) = [out_err for status, out_err in results if status == 2]
    assert "built from other inputs" in loser[1] and "Traceback" not in loser[1]
    winner_hash = HASH.search(winner[0]).group(1)
    assert traced_hashes(out, "DA-1-revA") == {winner_hash}
    assert not list(out.glob(".*"))  # no lock file, no temporary file


# --- Ctrl-C ----------------------------------------------------------------------------

# The build is told to pause at a given moment (printing PAUSED) so that the test can
# press Ctrl-C there.
PAUSE_AT = """
import os, sys, time
from calcsheet.export import files
moment = sys.argv.pop(1)
real_replace, real_fsync = os.replace, os.fsync
def pause(name):
    print("PAUSED", name, flush=True)
    time.sleep(3)
if moment == "staging":
    def fsync(descriptor):
        pause("staging")
        real_fsync(descriptor)
    files.os.fsync = fsync
else:
    def replace(source, target):
        if not str(target).endswith(".pdf"):
            pause("renaming")
        real_replace(source, target)
    files.os.replace = replace
from calcsheet.cli import main
sys.exit(main(sys.argv[1:]))
"""


@pytest.mark.parametrize("moment", ["staging", "renaming"])
def test_ctrl_c_exits_130_and_leaves_whole_consistent_files(moment, tmp_path, capsys) -> None:
    """Before, Ctrl-C exited 3. Pressed while the files are staged, the old set stays; pressed
    while they are renamed into place, the renames finish first, so the set is all new."""
    job = write(tmp_path / "job", "job.toml", STARTER)
    assert cli(["build", str(job)], capsys)[0] == 0
    folder = tmp_path / "job" / "out"
    old_hash = traced_hashes(folder, "DA-1-revA")
    job.write_text(STARTER.replace('"3 kip"', '"3.5 kip"'), encoding="utf-8")
    process = subprocess.Popen(
        [sys.executable, "-c", PAUSE_AT, moment, "build", str(job), "--replace-issued"],
        stdout=subprocess.PIPE,
        stderr=subprocess.PIPE,
        text=True,
    )
    try:
        wait_for_line(process, "PAUSED")
        process.send_signal(signal.SIGINT)
        status = process.wait(timeout=120)
        err = process.stderr.read()
    finally:
        process.kill()
        process.stdout.close()
        process.stderr.close()
    record(status)
    assert status == 130, err
    assert "stopped (Ctrl-C)" in err and "Traceback" not in err
    hashes = traced_hashes(folder, "DA-1-revA")
    assert len(hashes) == 1  # JSON and HTML from one build
    assert (hashes == old_hash) == (moment == "staging")
    assert not list(folder.glob(".*"))


# --- modes, usage errors ----------------------------------------------------------------


def test_outputs_follow_the_umask(tmp_path) -> None:
    """Before, outputs were 0600: colleagues on a shared folder could not open them."""
    job = write(tmp_path / "job", "job.toml", STARTER)
    code = "import os, sys; os.umask(0o022); from calcsheet.cli import main; sys.exit(main())"
    result = subprocess.run(
        [sys.executable, "-c", code, "build", str(job)], capture_output=True, text=True
    )
    record(result.returncode)
    assert result.returncode == 0, result.stderr
    modes = {
        path.name: stat.S_IMODE(path.stat().st_mode)
        for path in (tmp_path / "job" / "out").iterdir()
    }
    assert set(modes.values()) == {0o644}, modes


USAGE = {
    "workers -1": (["batch", "m.toml", "--workers", "-1"], "at least 1"),
    "workers 0": (["batch", "m.toml", "--workers", "0"], "at least 1"),
    "workers 1.5": (["batch", "m.toml", "--workers", "1.5"], "at least 1"),
    "new in no folder": (["new", "nodir/x.toml"], "does not exist"),
    "new on a folder": (["new", "."], "is a folder"),
    "csv without base": (["batch", "m.csv"], "needs --base"),
    "table is a folder": (["batch", "sub"], "is a folder"),
    "compare reversed": (["compare", "b.toml", "a.toml"], "give the earlier revision first"),
    "compare two members": (["compare", "a.toml", "other.toml"], "--other-member"),
    "check outside folder": (["check", "outside.toml"], "output.folder"),
    "build outside folder": (["build", "outside.toml"], "output.folder"),
}


@pytest.mark.parametrize("case", sorted(USAGE))
def test_careless_usage_exits_2_with_a_clear_message(case, tmp_path, capsys, monkeypatch) -> None:
    monkeypatch.chdir(tmp_path)
    write(tmp_path, "m.toml", '[[members]]\nmember.name = "A"\n')
    write(tmp_path, "m.csv", "member.name\nA\n")
    (tmp_path / "sub").mkdir()
    write(tmp_path, "a.toml", STARTER)
    revised = STARTER.replace('mark = "A"', 'mark = "B"').replace(
        "\n[[revisions]]\n", '\n[[revisions]]\nmark = "A"\n\n[[revisions]]\n', 1
    )
    write(tmp_path, "b.toml", revised)
    write(tmp_path, "other.toml", STARTER.replace('name = "DA-1"', 'name = "DA-2"'))
    write(tmp_path, "outside.toml", STARTER.replace('folder = "out"', 'folder = "../x"'))
    argv, words = USAGE[case]
    status, _, err = cli(argv, capsys)
    assert status == 2, err
    assert words in err
    assert not (tmp_path / "out").exists() and not (tmp_path / "batch-out").exists()
    assert os.listdir(tmp_path).count("x.toml") == 0
