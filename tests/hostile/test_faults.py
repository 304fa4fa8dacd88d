"""Faults while writing: what the command line says, its exit status, and the files left.

A write failure (read-only folder, disk full, PDF engine) exits 3 naming the file
and the reason; bad input exits 2. The previous outputs are never half-written:
not when a write fails, not when the process is killed mid-build, not when two
builds of one job run at once.
"""

from __future__ import annotations

import errno
import io
import json
import os
import select
import signal
import subprocess
import sys
import time
from pathlib import Path

import pypdf
import pytest

from calcsheet.cli import main
from calcsheet.export import files
from calcsheet.job.starter import STARTER

from .support import starter_data, toml_text

OUTPUTS = ("DA-1-revA.pdf", "DA-1-revA.html", "DA-1-revA.json")
SECOND_VERSION = STARTER.replace('magnitude = "3 kip"', 'magnitude = "4 kip"')
# The second version keeps revision A, so writing it replaces issued files on purpose.
REPLACE = "--replace-issued"


def write_job(folder: Path, text: str = STARTER, name: str = "job.toml") -> Path:
    folder.mkdir(parents=True, exist_ok=True)
    path = folder / name
    path.write_text(text, encoding="utf-8")
    return path


def outputs(folder: Path) -> dict[str, bytes]:
    """Every file in ``folder`` by name (temporary files included)."""
    return {path.name: path.read_bytes() for path in folder.iterdir() if path.is_file()}


def run(argv: list[str], capsys: pytest.CaptureFixture[str]) -> tuple[int, str]:
    status = main(argv)
    return status, capsys.readouterr().err


@pytest.fixture
def built(tmp_path: Path, capsys: pytest.CaptureFixture[str]) -> tuple[Path, dict[str, bytes]]:
    """A job built once (its outputs in job/out), then changed so the next build differs."""
    job = write_job(tmp_path / "job")
    assert main(["build", str(job)]) == 0
    capsys.readouterr()
    job.write_text(SECOND_VERSION, encoding="utf-8")
    before = outputs(tmp_path / "job" / "out")
    assert sorted(before) == sorted(OUTPUTS)
    return job, before


def assert_complete(folder: Path) -> None:
    """Each output parses to the end, and no temporary file is left."""
    pdf = pypdf.PdfReader(io.BytesIO((folder / "DA-1-revA.pdf").read_bytes()))
    assert len(pdf.pages) >= 1 and "DA-1" in pdf.pages[0].extract_text()
    assert json.loads((folder / "DA-1-revA.json").read_text(encoding="utf-8"))["all_pass"]
    assert (folder / "DA-1-revA.html").read_text(encoding="utf-8").rstrip().endswith("</html>")
    assert not list(folder.glob(".*.part"))


# --- the output folder cannot be written ---------------------------------------------


def test_a_read_only_output_folder_exits_3_naming_the_file(built, capsys) -> None:
    job, before = built
    folder = job.parent / "out"
    folder.chmod(0o555)
    try:
        if os.access(folder, os.W_OK):
            pytest.skip("chmod does not stop this user (root) from writing")
        status, message = run(["build", str(job), REPLACE], capsys)
    finally:
        folder.chmod(0o755)
    assert status == 3
    assert "DA-1-revA.pdf" in message and "Permission denied" in message
    assert outputs(folder) == before


def test_an_output_folder_under_a_file_exits_3_naming_the_folder(tmp_path, capsys) -> None:
    job = write_job(tmp_path / "job")
    (tmp_path / "blocker").write_text("a file where a folder should be")
    target = tmp_path / "blocker" / "sheets"
    status, message = run(["build", str(job), "--out", str(target)], capsys)
    assert status == 3
    assert f"cannot create the output folder {target}" in message
    assert "Not a directory" in message or "File exists" in message


def test_a_folder_where_an_output_goes_exits_3_naming_it(built, capsys) -> None:
    job, _ = built
    folder = job.parent / "out"
    (folder / "DA-1-revA.html").unlink()
    (folder / "DA-1-revA.html").mkdir()
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 3
    assert "DA-1-revA.html" in message and "directory" in message.lower()
    assert not list(folder.glob(".*.part"))


def test_a_failed_write_leaves_every_previous_output_as_it_was(built, capsys) -> None:
    job, before = built
    folder = job.parent / "out"
    (folder / "DA-1-revA.html").unlink()
    (folder / "DA-1-revA.html").mkdir()
    assert main(["build", str(job), REPLACE]) == 3
    assert (folder / "DA-1-revA.pdf").read_bytes() == before["DA-1-revA.pdf"]


@pytest.mark.parametrize(
    ("code", "words"),
    [(errno.EROFS, "Read-only file system"), (errno.EACCES, "Permission denied")],
)
def test_a_folder_refusing_new_files_exits_3_and_keeps_the_old_ones(
    built, capsys, monkeypatch, code: int, words: str
) -> None:
    """As root a chmod does not stop writes, so the refusal is simulated where it happens."""
    job, before = built

    def refuse(*args, **kwargs):
        raise OSError(code, os.strerror(code))

    monkeypatch.setattr(files.tempfile, "mkstemp", refuse)
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 3
    assert "DA-1-revA.pdf" in message and words in message
    assert "unchanged" in message
    assert outputs(job.parent / "out") == before


# --- disk full and the PDF engine ----------------------------------------------------


class _FullDisk:
    """A file opened by ``os.fdopen`` whose writes fail as on a full disk."""

    def __init__(self, descriptor: int, *args, **kwargs) -> None:
        self.descriptor = descriptor

    def __enter__(self) -> _FullDisk:
        return self

    def __exit__(self, *exc_info) -> None:
        os.close(self.descriptor)

    def write(self, data: bytes) -> int:
        raise OSError(errno.ENOSPC, os.strerror(errno.ENOSPC))


def test_a_full_disk_exits_3_naming_the_file_and_keeps_the_old_ones(
    built, capsys, monkeypatch
) -> None:
    job, before = built
    monkeypatch.setattr(files.os, "fdopen", _FullDisk)
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 3
    assert "cannot write" in message and "DA-1-revA.pdf" in message
    assert "No space left on device" in message
    assert outputs(job.parent / "out") == before  # no temporary file left either


def test_a_full_disk_at_fsync_keeps_the_old_ones(built, capsys, monkeypatch) -> None:
    job, before = built

    def full(descriptor: int) -> None:
        raise OSError(errno.ENOSPC, os.strerror(errno.ENOSPC))

    monkeypatch.setattr(files.os, "fsync", full)
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 3 and "No space left on device" in message
    assert outputs(job.parent / "out") == before


def test_a_failing_pdf_engine_exits_3_and_writes_nothing(built, capsys, monkeypatch) -> None:
    job, before = built

    class BrokenCompiler:
        def compile(self, **options):
            raise RuntimeError("font cache is corrupt")

    monkeypatch.setattr(files, "_compiler", BrokenCompiler)
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 3
    assert "PDF engine failed" in message and "font cache is corrupt" in message
    assert outputs(job.parent / "out") == before  # the HTML and JSON wait for the PDF


def test_bad_input_exits_2_naming_the_file(tmp_path, capsys) -> None:
    (tmp_path / "binary.toml").write_bytes(b"\xff\xfe\x00garbage")
    (tmp_path / "folder.toml").mkdir()
    bad_key = write_job(
        tmp_path, STARTER.replace('length = "60 in"', 'length = "60 kip"'), "k.toml"
    )
    cases = {
        tmp_path / "missing.toml": "no such file",
        tmp_path / "binary.toml": "not UTF-8",
        tmp_path / "folder.toml": "folder",
        bad_key: "member.length",
    }
    for path, words in cases.items():
        status, message = run(["build", str(path)], capsys)
        assert status == 2, message
        assert str(path) in message and words in message
        assert "Traceback" not in message


# --- killed mid-build, and two builds at once ----------------------------------------

# Runs the command line with os.replace slowed: the temporary file of the first output is
# complete, the parent is told, and the process waits to be killed before renaming it.
SLOW_REPLACE = """
import os, sys, time
real_replace = os.replace
def slow_replace(source, target):
    print("RENAMING", target, flush=True)
    time.sleep(120)
    real_replace(source, target)
os.replace = slow_replace
from calcsheet.cli import main
sys.exit(main(sys.argv[1:]))
"""


def wait_for_line(process: subprocess.Popen, marker: str, limit: float = 120) -> str:
    """The first line of the child's output holding ``marker`` (a guard against a hang)."""
    end = time.monotonic() + limit
    while time.monotonic() < end:
        ready, _, _ = select.select([process.stdout], [], [], 1.0)
        if ready:
            line = process.stdout.readline()
            if marker in line:
                return line
            if not line and process.poll() is not None:
                break
    process.kill()
    pytest.fail(f"the build never reached {marker!r}: {process.stderr.read()}")


def test_a_build_killed_while_writing_leaves_the_previous_outputs(built, capsys) -> None:
    job, before = built
    folder = job.parent / "out"
    process = subprocess.Popen(
        [sys.executable, "-c", SLOW_REPLACE, "build", str(job), REPLACE],
        stdout=subprocess.PIPE,
        stderr=subprocess.PIPE,
        text=True,
    )
    try:
        line = wait_for_line(process, "RENAMING")
        assert "DA-1-revA.pdf" in line
        process.send_signal(signal.SIGKILL)
        process.wait(timeout=60)
    finally:
        process.kill()
        process.stdout.close()
        process.stderr.close()

    after = outputs(folder)
    parts = [name for name in after if name.startswith(".") and name.endswith(".part")]
    # Every output is staged in full before the first rename: the kill leaves the staged
    # copies (hidden temporary names) and the previous outputs untouched.
    assert any(name.startswith(".DA-1-revA.pdf.") for name in parts)
    assert {name: after[name] for name in OUTPUTS} == before  # byte-identical

    # A temporary file of a build still running (recent) is left alone by the next build;
    # one older than STALE_SECONDS is a leftover of a killed build and is removed.
    stale = [folder / name for name in parts]
    recent = folder / ".DA-1-revA.html.recent.part"
    recent.write_bytes(b"another build is writing this")
    past = time.time() - files.STALE_SECONDS - 60
    for path in stale:
        os.utime(path, (past, past))
    status, message = run(["build", str(job), REPLACE], capsys)
    assert status == 0, message
    assert not any(path.exists() for path in stale)
    assert recent.exists()
    recent.unlink()
    assert_complete(folder)
    assert outputs(folder)["DA-1-revA.json"] != before["DA-1-revA.json"]  # the new version


def test_two_builds_of_one_job_at_once_leave_complete_files(tmp_path) -> None:
    job = write_job(tmp_path / "job")
    for _ in range(2):  # two rounds: the second overwrites the first round's files
        processes = [
            subprocess.Popen(
                [sys.executable, "-m", "calcsheet.cli", "build", str(job)],
                stdout=subprocess.PIPE,
                stderr=subprocess.PIPE,
                text=True,
            )
            for _ in range(2)
        ]
        for process in processes:
            _, err = process.communicate(timeout=300)
            assert process.returncode == 0, err
            assert "Traceback" not in err
        assert_complete(tmp_path / "job" / "out")


def test_a_job_whose_output_formats_skip_the_pdf_never_starts_the_engine(
    tmp_path, capsys, monkeypatch
) -> None:
    """With formats = ["json"], a broken PDF engine does not matter."""
    data = starter_data()
    data["output"]["formats"] = ["json"]
    job = write_job(tmp_path / "job", toml_text(data))

    def broken(*args, **kwargs):
        raise AssertionError("the PDF engine was started")

    monkeypatch.setattr(files, "compile_pdf", broken)
    status, message = run(["build", str(job)], capsys)
    assert status == 0, message
    assert outputs(tmp_path / "job" / "out").keys() == {"DA-1-revA.json"}
