"""Job files: every problem named by file and key path, all at once; no traceback."""

from __future__ import annotations

from pathlib import Path

import pytest

from calcsheet.demo import demo_job_text
from calcsheet.job import JobError, parse_job, read_job
from calcsheet.job.starter import STARTER

REPOSITORY = Path(__file__).resolve().parents[2]


def test_the_demo_job_in_examples_is_the_one_shipped() -> None:
    shipped = demo_job_text()
    assert (REPOSITORY / "examples" / "outrigger.toml").read_text(encoding="utf-8") == shipped
    job = parse_job(shipped)
    assert job.member.section == "HSS6X6X3/8" and len(job.loads) == 2


def test_the_starter_job_is_valid() -> None:
    assert parse_job(STARTER).member.name == "DA-1"


def _problems(text: str) -> dict[str, str]:
    with pytest.raises(JobError) as raised:
        parse_job(text, source="bad.toml")
    assert str(raised.value).startswith("bad.toml: ")
    return dict(raised.value.problems)


def test_toml_syntax_error_gives_line_and_column() -> None:
    problems = _problems('[member]\nname = "A\n')
    (message,) = problems.values()
    assert "TOML syntax error" in message and "line 2" in message and "column" in message


BAD = """
[member]
name = "X-1"
section = "W10X33"
lenght = "60 in"

[material]
Fy = "50 ksi"

[[loads]]
name = "P"
z = "60 in"
magnitude = "6.5 in"
angle = "30"
"""


def test_every_problem_is_reported_at_once_with_its_key_path() -> None:
    problems = _problems(BAD)
    assert problems["member.length"] == "required key is missing"
    assert problems["member.lenght"] == 'unknown key; did you mean "length"?'
    assert "expected a force" in problems["loads[0].magnitude"]
    assert "'6.5 in'" in problems["loads[0].magnitude"]
    assert "expected an angle" in problems["loads[0].angle"]


def test_a_load_needs_one_way_of_giving_its_direction() -> None:
    text = STARTER.replace('magnitude = "3 kip"', 'components = ["1 kip", "0 kip", "0 kip"]')
    problems = _problems(text)
    assert "not both" in problems["loads[0]"]


def test_duplicate_load_names_are_refused() -> None:
    text = STARTER + '\n[[moments]]\nname = "hoist"\nz = "60 in"\nMz = "1 kip*ft"\n'
    assert "used twice: hoist" in " ".join(_problems(text).values())


@pytest.mark.parametrize(
    ("content", "expected"),
    [(None, "no such file"), (b"\xff\xfe bad", "not UTF-8"), ("folder", "folder")],
)
def test_unreadable_files_give_one_clear_line(tmp_path: Path, content, expected: str) -> None:
    path = tmp_path / "job.toml"
    if content == "folder":
        path.mkdir()
    elif content is not None:
        path.write_bytes(content)
    with pytest.raises(JobError) as raised:
        read_job(path)
    assert expected in str(raised.value)
