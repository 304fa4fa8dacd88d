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


# --- careless input (issue 16) -------------------------------------------------------------


def test_a_byte_order_mark_is_skipped(tmp_path: Path) -> None:
    path = tmp_path / "job.toml"
    path.write_text(STARTER, encoding="utf-8-sig")  # as some Windows editors save UTF-8
    assert read_job(path) == parse_job(STARTER)
    assert parse_job("\ufeff" + STARTER) == parse_job(STARTER)


def test_a_bare_number_is_asked_for_in_quotes_with_its_unit() -> None:
    problems = _problems(STARTER.replace('angle = "20 deg"', "angle = 20"))
    assert (
        problems["loads[0].angle"] == 'a number needs its unit, in quotes: write "20 deg" (got 20)'
    )
    problems = _problems(STARTER.replace('stations = ["0 in"]', "stations = [0, 12.5]"))
    assert 'write "0 in" or "0 mm"' in problems["member.stations[0]"]
    assert 'write "12.5 in" or "12.5 mm"' in problems["member.stations[1]"]


def test_a_quantity_message_says_what_is_wrong_and_what_is_expected() -> None:
    problems = _problems(STARTER.replace('"3 kip"', '"4200 lb"'))
    assert problems["loads[0].magnitude"] == (
        "lb is a mass (the pound), lbf a force (the pound-force): write '4200 lbf'; "
        "expected a force, such as '6.5 kip' or '30 kN' (got '4200 lb')"
    )


@pytest.mark.parametrize(
    ("typed", "accepted"),
    [
        ("100000 kip", True),  # the stated bound, MAX_FORCE
        ("-100000 kip", True),  # a component's sign is its direction
        ("444822 kN", True),  # 100,000 kip = 444,822 kN (NIST SP 811 B.8: 4.448 222 kN/kip)
        ("100001 kip", False),
        ("444823.2 kN", False),
        ("1e9 kip", False),
    ],
)
def test_forces_are_bounded_at_100000_kip(typed: str, accepted: bool) -> None:
    text = STARTER.replace('magnitude = "3 kip"', f'components = ["{typed}", "0 kip", "0 kip"]')
    text = text.replace('angle = "20 deg"', "")
    if accepted:
        assert parse_job(text).loads[0].components[0] == typed
        return
    message = _problems(text)["loads[0].components[0]"]
    assert "at most 100,000 kip (444,822 kN)" in message and repr(typed) in message


@pytest.mark.parametrize("date", ["", "2026-12-01", "2028-02-29"])  # 2028 is a leap year
def test_iso_dates_and_empty_dates_are_accepted(date: str) -> None:
    text = STARTER.replace('prepared_date = ""', f'prepared_date = "{date}"')
    assert parse_job(text).title_block.prepared_date == date


@pytest.mark.parametrize(
    "date", ["yesterday-ish", "2026-13-01", "2027-02-29", "2026-1-5", "26-12-01"]
)
def test_other_dates_are_refused(date: str) -> None:
    text = STARTER.replace('date = ""', f'date = "{date}"')
    message = _problems(text)["revisions[0].date"]
    assert message.startswith("a date as YYYY-MM-DD") and repr(date) in message


def test_a_toml_date_is_read_as_its_iso_text() -> None:
    text = STARTER.replace('prepared_date = ""', "prepared_date = 2026-12-01")
    assert parse_job(text).title_block.prepared_date == "2026-12-01"


def test_title_text_is_limited_to_200_characters() -> None:
    at_limit = STARTER.replace('project = "Pump house upgrade"', f'project = "{"p" * 200}"')
    assert len(parse_job(at_limit).title_block.project) == 200
    over = STARTER.replace('project = "Pump house upgrade"', f'project = "{"p" * 10_000}"')
    message = _problems(over)["title_block.project"]
    assert message.startswith("at most 200 characters allowed; this text has 10,000")
    assert len(message) < 200


@pytest.mark.parametrize(
    ("stations", "named"),
    [
        ('["0 in", "0 in"]', "stations[1] = '0 in' repeats stations[0] = '0 in'"),
        ('["30 in", "0 in", "762 mm"]', "stations[2] = '762 mm' repeats stations[0] = '30 in'"),
    ],
)
def test_a_repeated_station_is_refused_naming_both(stations: str, named: str) -> None:
    # 30 in = 762 mm exactly (NIST SP 811 (2008) B.8: inch = 2.54e-2 m exactly).
    text = STARTER.replace('stations = ["0 in"]', f"stations = {stations}")
    assert named in _problems(text)["member.stations"]


def test_a_table_section_reports_only_the_table_branch() -> None:
    text = STARTER.replace(
        'section = "W8X31"', 'section = { kind = "round bar", D = "2 in", bogus = "1 in" }'
    )
    assert _problems(text) == {"member.section.bogus": "unknown key"}
