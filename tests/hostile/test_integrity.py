"""The inputs hash on the sheet: recomputable from the job file, blind to layout, not to values.

The hash printed in the HTML footer, the PDF and the JSON trace must equal
``inputs_hash(read_job(path))``; changing any digit of any value changes it;
reformatting the file (spaces, key order, quoting, inline tables, units) does not.
"""

from __future__ import annotations

import io
import json
import re
from pathlib import Path

import pypdf
import pytest

from calcsheet.cli import main
from calcsheet.job import JobError, parse_job, read_job
from calcsheet.job.starter import STARTER
from calcsheet.pipeline import inputs_hash

from .support import OUTRIGGER, starter_data, toml_text

HASH = re.compile(r"inputs ([0-9a-f]{12})")


def printed_hashes(folder: Path, stem: str) -> dict[str, str]:
    """The hash as each output prints it."""
    page = (folder / f"{stem}.html").read_text(encoding="utf-8")
    footer = re.search(r"<footer>(.*?)</footer>", page, re.DOTALL)
    assert footer is not None
    trace = json.loads((folder / f"{stem}.json").read_text(encoding="utf-8"))["trace"]
    pdf = pypdf.PdfReader(io.BytesIO((folder / f"{stem}.pdf").read_bytes()))
    found = {"html footer": HASH.search(footer.group(1)), "json trace": HASH.search(trace)}
    found.update(
        {f"pdf page {n}": HASH.search(page.extract_text()) for n, page in enumerate(pdf.pages, 1)}
    )
    missing = [where for where, match in found.items() if match is None]
    assert not missing, f"no inputs hash in {missing}"
    return {where: match.group(1) for where, match in found.items()}


@pytest.mark.parametrize(
    ("text", "stem"), [(STARTER, "DA-1-revA"), (OUTRIGGER, "outrigger-demo-revB")]
)
def test_the_printed_hash_is_recomputed_from_the_job_file(
    text: str, stem: str, tmp_path: Path, capsys: pytest.CaptureFixture[str]
) -> None:
    path = tmp_path / "job.toml"
    path.write_text(text, encoding="utf-8")
    assert main(["build", str(path), "--out", str(tmp_path / "out")]) == 0
    summary = capsys.readouterr().out
    expected = inputs_hash(read_job(path))
    assert set(printed_hashes(tmp_path / "out", stem).values()) == {expected}
    assert f"[inputs {expected}]" in summary


def value_digits(text: str) -> list[int]:
    """Positions of the digits inside the values of a job file (not keys, comments, output)."""
    positions = []
    offset = 0
    section = ""
    for line in text.splitlines(keepends=True):
        header = re.match(r"\s*\[+([^\]]+)\]", line)
        if header:
            section = header.group(1).strip()
        elif "=" in line and not line.lstrip().startswith("#") and section != "output":
            start = line.index("=") + 1
            value = re.match(r'\s*("[^"]*"|[^#\n]*)', line[start:])
            first = offset + start + value.start(1)
            positions += [first + i for i, char in enumerate(value.group(1)) if char.isdigit()]
        offset += len(line)
    return positions


@pytest.mark.parametrize("text", [STARTER, OUTRIGGER], ids=["starter", "outrigger"])
def test_changing_any_digit_of_any_value_changes_the_hash(text: str) -> None:
    base = inputs_hash(parse_job(text))
    positions = value_digits(text)
    assert len(positions) > 20
    changed = 0
    for position in positions:
        digit = text[position]
        edited = text[:position] + str((int(digit) + 1) % 10) + text[position + 1 :]
        try:
            job = parse_job(edited)
        except JobError:
            continue  # version = 2, or a check kind that does not exist: refused
        assert inputs_hash(job) != base, edited.splitlines()[text[:position].count("\n")]
        changed += 1
    assert changed >= len(positions) // 2  # most edits still make a valid job


def test_a_change_in_the_thirteenth_figure_changes_the_hash() -> None:
    base = STARTER.replace('length = "60 in"', 'length = "60.00000000000 in"')
    edited = STARTER.replace('length = "60 in"', 'length = "60.00000000001 in"')
    assert inputs_hash(parse_job(base)) != inputs_hash(parse_job(edited))


def reorder(value):
    """The same data with every table's keys in reverse order."""
    if isinstance(value, dict):
        return {key: reorder(value[key]) for key in reversed(list(value))}
    if isinstance(value, list):
        return [reorder(item) for item in value]
    return value


REFORMATS = {
    "spaces and blank lines": lambda text: re.sub(r" = ", "   =\t", text).replace("\n", "\n\n"),
    "no comments": lambda text: re.sub(r"\s*#[^\n\"]*$", "", text, flags=re.MULTILINE),
    "indented": lambda text: "\n".join("    " + line for line in text.splitlines()),
    "key order": lambda text: toml_text(reorder(parse_job(text).model_dump(exclude_none=True))),
    "literal strings": lambda text: re.sub(r'"([^"\\\']*)"', r"'\1'", text),
    "3 kip as 3000 lbf": lambda text: text.replace('"3 kip"', '"3000 lbf"'),
    "60 in as 5 ft": lambda text: text.replace('"60 in"', '"5 ft"'),
    "20 deg in rad": lambda text: text.replace('"20 deg"', '"0.3490658503988659 rad"'),
    "units glued": lambda text: text.replace('"3 kip"', '"3kip"').replace('"-4 in"', '"-4  in"'),
    "0 in as 0 mm": lambda text: text.replace('"0 in"', '"0 mm"'),
    "outer spaces": lambda text: text.replace('"DA-1"', '"  DA-1  "'),
    "inline tables": lambda text: text.replace('[material]\ngrade = "ASTM A992"', "").replace(
        "version = 1", 'version = 1\nmaterial = { grade = "ASTM A992" }'
    ),
    "CRLF line ends": lambda text: text.replace("\n", "\r\n"),
}


@pytest.mark.parametrize("name", sorted(REFORMATS))
def test_reformatting_the_file_keeps_the_hash(name: str) -> None:
    reformatted = REFORMATS[name](STARTER)
    assert reformatted != STARTER
    assert inputs_hash(parse_job(reformatted)) == inputs_hash(parse_job(STARTER))


def test_where_the_outputs_go_is_not_part_of_the_hash() -> None:
    data = starter_data()
    data["output"] = {"folder": "elsewhere", "stem": "x", "paper": "a4", "formats": ["json"]}
    assert inputs_hash(parse_job(toml_text(data))) == inputs_hash(parse_job(STARTER))
