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
