"""The command line: exit statuses, messages without tracebacks, --help with an example."""

from __future__ import annotations

import subprocess
import sys
from pathlib import Path

import pytest

from calcsheet.cli import main
from calcsheet.job.starter import STARTER


def _write(folder: Path, name: str, text: str) -> Path:
    path = folder / name
    path.write_text(text, encoding="utf-8")
    return path


def test_check_mode_exit_statuses(tmp_path: Path, capsys) -> None:
    passing = _write(tmp_path, "pass.toml", STARTER)
    failing = _write(tmp_path, "fail.toml", STARTER.replace('"3 kip"', '"300 kip"'))
    bad = _write(tmp_path, "bad.toml", STARTER.replace('"3 kip"', '"3 in"'))
    assert main(["check", str(passing)]) == 0
    assert "DA-1: OK" in capsys.readouterr().out
    assert main(["check", str(failing)]) == 1
    assert "DA-1: NOT OK" in capsys.readouterr().out
    assert main(["check", str(bad)]) == 2
    error = capsys.readouterr().err
    assert "bad.toml: 1 problem" in error and "loads[0].magnitude" in error
    assert "Traceback" not in error
    assert not list(tmp_path.glob("out"))  # check mode writes nothing


def test_new_never_overwrites(tmp_path: Path, capsys) -> None:
    path = tmp_path / "job.toml"
    assert main(["new", str(path)]) == 0
    assert path.read_text() == STARTER
    path.write_text("mine")
    assert main(["new", str(path)]) == 2
    assert path.read_text() == "mine"
    assert "not overwritten" in capsys.readouterr().err


def test_build_and_compare_write_their_files(tmp_path: Path, capsys) -> None:
    old = _write(tmp_path, "a.toml", STARTER)
    new = _write(
        tmp_path,
        "b.toml",
        STARTER.replace('mark = "A"', 'mark = "B"').replace('"20 deg"', '"25 deg"'),
    )
    assert main(["build", str(old)]) == 0
    assert (tmp_path / "out" / "DA-1-revA.pdf").exists()
    assert main(["compare", str(old), str(new)]) == 0
    out = capsys.readouterr().out
    assert "loads[0].angle: 20 deg -> 25 deg" in out
    assert (tmp_path / "out" / "DA-1-delta-revA-to-revB.pdf").exists()


def test_a_toml_syntax_error_is_one_message_with_exit_2(tmp_path: Path, capsys) -> None:
    path = _write(tmp_path, "broken.toml", "[member\n")
    assert main(["build", str(path)]) == 2
    error = capsys.readouterr().err
    assert "broken.toml" in error and "line 1" in error and "Traceback" not in error


@pytest.mark.parametrize("command", ["build", "check", "new", "compare", "batch"])
def test_help_shows_an_example(command: str) -> None:
    result = subprocess.run(
        [sys.executable, "-m", "calcsheet.cli", command, "--help"],
        capture_output=True,
        text=True,
        check=True,
    )
    assert "example:" in result.stdout and f"calcsheet {command}" in result.stdout


def test_build_exits_1_when_a_check_fails_and_still_writes(tmp_path: Path, capsys) -> None:
    """Before, build exited 0 with a failing check."""
    failing = _write(tmp_path, "fail.toml", STARTER.replace('"3 kip"', '"300 kip"'))
    assert main(["build", str(failing)]) == 1
    assert "DA-1: NOT OK" in capsys.readouterr().out
    assert (tmp_path / "out" / "DA-1-revA.pdf").exists()


def test_a_changed_build_under_the_same_revision_is_refused_with_exit_2(tmp_path, capsys) -> None:
    job = _write(tmp_path, "job.toml", STARTER)
    assert main(["build", str(job)]) == 0
    before = (tmp_path / "out" / "DA-1-revA.json").read_bytes()
    job.write_text(STARTER.replace('"3 kip"', '"3.5 kip"'), encoding="utf-8")
    capsys.readouterr()
    assert main(["build", str(job)]) == 2
    error = capsys.readouterr().err
    assert "job.toml: 1 problem" in error and "revisions:" in error
    assert "--replace-issued" in error and "Traceback" not in error
    assert (tmp_path / "out" / "DA-1-revA.json").read_bytes() == before
    assert main(["build", str(job), "--replace-issued"]) == 0
    assert (tmp_path / "out" / "DA-1-revA.json").read_bytes() != before


def test_new_in_a_missing_folder_says_so_with_exit_2(tmp_path: Path, capsys) -> None:
    """Before: "internal error: FileNotFoundError ..." and exit 3."""
    target = tmp_path / "nodir" / "x.toml"
    assert main(["new", str(target)]) == 2
    error = capsys.readouterr().err
    assert f"the folder {tmp_path / 'nodir'} does not exist" in error
    assert "internal error" not in error
    assert main(["new", str(tmp_path)]) == 2
    assert "is a folder" in capsys.readouterr().err


@pytest.mark.parametrize("workers", ["-1", "0", "two"])
def test_batch_workers_below_one_is_a_usage_error(workers: str, tmp_path, capsys) -> None:
    """Before, --workers -1 ended in "internal error" with exit 3."""
    table = _write(tmp_path, "m.toml", '[[members]]\nmember.name = "A"\n')
    with pytest.raises(SystemExit) as raised:
        main(["batch", str(table), "--workers", workers])
    assert raised.value.code == 2
    error = capsys.readouterr().err
    assert "--workers" in error and "at least 1" in error and repr(workers) in error
    assert "internal error" not in error


def test_check_refuses_the_output_folder_build_refuses(tmp_path: Path, capsys) -> None:
    """Before, check passed a job whose output.folder build refuses."""
    job = _write(tmp_path, "job.toml", STARTER.replace('folder = "out"', 'folder = "../out"'))
    assert main(["build", str(job)]) == 2
    build_error = capsys.readouterr().err
    assert main(["check", str(job)]) == 2
    assert "output.folder" in build_error and "output.folder" in capsys.readouterr().err


def test_check_names_the_governing_station(tmp_path: Path, capsys) -> None:
    job = _write(
        tmp_path, "job.toml", STARTER.replace('stations = ["0 in"]', 'stations = ["0 in", "30 in"]')
    )
    assert main(["check", str(job)]) == 0
    assert "station z = 0 in" in capsys.readouterr().out


def test_compare_of_two_members_or_in_the_wrong_order_exits_2(tmp_path: Path, capsys) -> None:
    rev_a = _write(tmp_path, "a.toml", STARTER)
    rev_b = _write(
        tmp_path,
        "b.toml",
        STARTER.replace('mark = "A"', 'mark = "B"').replace(
            "\n[[revisions]]\n", '\n[[revisions]]\nmark = "A"\n\n[[revisions]]\n', 1
        ),
    )
    other = _write(tmp_path, "other.toml", STARTER.replace('name = "DA-1"', 'name = "DA-9"'))
    assert main(["compare", str(rev_b), str(rev_a)]) == 2
    assert "later than the new job's rev. A" in capsys.readouterr().err
    assert main(["compare", str(rev_a), str(other)]) == 2
    assert "--other-member" in capsys.readouterr().err
    assert not (tmp_path / "out").exists()
    assert main(["compare", str(rev_a), str(other), "--other-member"]) == 0
    assert main(["compare", str(rev_a), str(rev_b)]) == 0


def test_batch_writes_its_log_and_honours_base_for_a_toml_batch(tmp_path: Path, capsys) -> None:
    """Before, the summary pointed at a batch log that was never written, and --base was
    ignored for a TOML batch."""
    base = _write(
        tmp_path,
        "base.toml",
        STARTER.replace('title = "Davit arm DA-1', 'title = "Davit arm {member}').replace(
            'calc_number = "C-001"', 'calc_number = "C-{member}"'
        ),
    )
    table = _write(
        tmp_path,
        "m.toml",
        '[[members]]\nmember.name = "A1"\n\n[[members]]\nmember.name = "A2"\n'
        'member.section = "W8X19"\n',
    )
    out = tmp_path / "sheets"
    status = main(["batch", str(table), "--base", str(base), "--out", str(out), "--workers", "1"])
    assert status == 2  # A2 skipped for bad input
    assert (out / "A1-revA.pdf").exists()
    log = (out / "batch.log").read_text(encoding="utf-8")
    assert "2 members: 1 pass, 0 fail, 1 skipped" in log and "W8X19" in log
    summary = (out / "summary.html").read_text(encoding="utf-8")
    assert "batch.log" in summary
    assert "wrote " + str(out / "batch.log") in capsys.readouterr().out


def test_check_says_auto_and_the_station_it_found(tmp_path: Path, capsys) -> None:
    job = _write(tmp_path, "job.toml", STARTER.replace('stations = ["0 in"]', 'stations = "auto"'))
    assert main(["check", str(job)]) == 0
    out = capsys.readouterr().out
    assert "DA-1: OK" in out and "station auto" in out and "station z = " in out


def test_new_shows_the_frame_keys_with_their_comments(tmp_path: Path, capsys) -> None:
    path = tmp_path / "job.toml"
    assert main(["new", str(path)]) == 0
    text = path.read_text(encoding="utf-8")
    for line in (
        'supports = "fixed-free"      # fixed at z = 0, free at the end',
        "# support_positions = [",
        "self_weight = true           # the member's own weight, a load of type D",
        'gravity = "-y"               # the way gravity acts',
        '# braces = ["30 in"]',
        "# [[supports]]",
        'restrains = ["ux", "uy", "uz", "rx", "ry", "rz"]',
        "# [[distributed]]",
        'q_start = ["0.02 kip/ft", "0 kip/ft", "0 kip/ft"]',
        'or "auto" (the',
    ):
        assert line in text, line


def test_check_of_the_column_demo_names_what_it_needs(capsys) -> None:
    """Refused by key until the member sheet takes the frame options; then it is checked."""

    demo = Path(__file__).resolve().parents[1] / "examples" / "column-bracket.toml"
    status = main(["check", str(demo)])
    captured = capsys.readouterr()
    assert "Traceback" not in captured.err
    assert status in (0, 1) and "PC-3: " in captured.out


def test_build_writes_the_jobs_calc_package_when_asked(tmp_path: Path, capsys) -> None:
    job = _write(
        tmp_path,
        "job.toml",
        STARTER.replace('stations = ["0 in"]', 'stations = ["0 in", "24 in"]').replace(
            "package = false", "package = true"
        ),
    )
    assert main(["build", str(job)]) == 0
    out = capsys.readouterr().out
    for name in ("DA-1-revA-z24in.pdf", "DA-1-revA-package.pdf", "DA-1-revA-package.json"):
        assert f"wrote {tmp_path / 'out' / name}" in out
    bad = _write(tmp_path, "bad.toml", STARTER.replace("package = false", 'package = "yes"'))
    assert main(["build", str(bad), "--out", str(tmp_path / "bad")]) == 2
    error = capsys.readouterr().err
    assert "output.package: expected true or false" in error and "(got 'yes')" in error
    assert "Traceback" not in error and not (tmp_path / "bad").exists()
