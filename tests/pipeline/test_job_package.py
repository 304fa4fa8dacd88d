"""The calc package of one job ([output] package = true): a cover, the contents, the summary
and every station's sheet numbered through the package, written with the sheets; issued
packages protected as the sheets are; the package's JSON fits the shipped schema."""

from __future__ import annotations

import json
import re
from pathlib import Path

import jsonschema
import pypdf
import pytest

from calcsheet.job import JobError, parse_job
from calcsheet.job.starter import STARTER
from calcsheet.pipeline import build_sheets, write_outputs
from calcsheet.pipeline.package import package_schema

SHEET_NUMBER = re.compile(r"Sheet (\d+) of (\d+)")
STATIONS = ("z0in", "z24in", "z48in")
# The starter's demo member (DA-1, calc no. C-001, rev. A) checked at three stations.
THREE_STATIONS = STARTER.replace(
    'stations = ["0 in"]', 'stations = ["0 in", "24 in", "48 in"]'
).replace("package = false", "package = true")


def _build(text: str, folder: Path, **options: bool) -> list[Path]:
    result = build_sheets(parse_job(text, source="job.toml"), source="job.toml")
    return write_outputs(result, folder, **options)


def _pages(path: Path) -> int:
    return len(pypdf.PdfReader(path).pages)


def _bookmarks(reader: pypdf.PdfReader) -> dict[str, int]:
    return {
        item.title: reader.get_destination_page_number(item)
        for item in reader.outline
        if not isinstance(item, list)
    }


@pytest.fixture(scope="module")
def built(tmp_path_factory: pytest.TempPathFactory) -> tuple[Path, list[Path]]:
    folder = tmp_path_factory.mktemp("job-package")
    return folder, _build(THREE_STATIONS, folder)


def test_the_package_is_written_beside_the_stations_sheets(
    built: tuple[Path, list[Path]],
) -> None:
    _, paths = built
    names = [path.name for path in paths]
    assert names[-2:] == ["DA-1-revA-package.pdf", "DA-1-revA-package.json"]
    for station in STATIONS:
        assert f"DA-1-revA-{station}.pdf" in names


def test_the_sheets_of_every_station_are_numbered_through_the_package(
    built: tuple[Path, list[Path]],
) -> None:
    folder, _ = built
    reader = pypdf.PdfReader(folder / "DA-1-revA-package.pdf")
    texts = [page.extract_text() for page in reader.pages]
    own = [_pages(folder / f"DA-1-revA-{station}.pdf") for station in STATIONS]
    front = len(texts) - sum(own)
    assert front >= 1
    # Every page's header and footer read "Sheet n of N", n counting 1..N through the package.
    numbers = [SHEET_NUMBER.findall(text) for text in texts]
    assert numbers == [[(str(page), str(len(texts)))] * 2 for page in range(1, len(texts) + 1)]
    # The cover: the package's calc number (the job's), the seal box, the contents.
    assert "Calc package C-001" in texts[0] and "seal and signature" in texts[0]
    assert "Contents" in texts[0] and "DA-1, 3 stations (job.toml)" in texts[0]
    # A bookmark per station on its first sheet; each sheet keeps the job's title block.
    first = [front + 1 + sum(own[:index]) for index in range(len(own))]
    marks = _bookmarks(reader)
    assert list(marks) == [
        "Contents",
        "Summary",
        "DA-1, z = 0 in",
        "DA-1, z = 24 in",
        "DA-1, z = 48 in",
    ]
    assert [marks[f"DA-1, z = {z} in"] + 1 for z in (0, 24, 48)] == first
    for page in range(front, len(texts)):
        assert "Calc: C-001" in texts[page]
    for start in first:
        assert "Davit arm DA-1" in texts[start - 1]
    # The contents give each station's first sheet.
    contents = re.sub(r"\s+", " ", " ".join(texts[:front]))
    for z, start in zip((0, 24, 48), first, strict=True):
        assert re.search(rf"DA-1, z = {z} in W8X31 \S+ OK .*? {start} ", contents)


def test_the_package_is_pdf_a_2b_with_its_own_title(built: tuple[Path, list[Path]]) -> None:
    folder, _ = built
    reader = pypdf.PdfReader(folder / "DA-1-revA-package.pdf")
    # ISO 19005-2 §6.6.4: the PDF/A identification (part 2, conformance B) in the XMP metadata.
    xmp = reader.trailer["/Root"]["/Metadata"].get_object().get_data().decode()
    assert re.search(r"pdfaid:part(>|=\")2", xmp) and re.search(r"pdfaid:conformance(>|=\")B", xmp)
    assert reader.metadata.title == "Calc package C-001"


def test_the_packages_json_fits_the_shipped_schema_and_names_each_station(
    built: tuple[Path, list[Path]],
) -> None:
    folder, _ = built
    manifest = json.loads((folder / "DA-1-revA-package.json").read_text(encoding="utf-8"))
    jsonschema.Draft202012Validator(package_schema()).validate(manifest)
    (member,) = manifest["members"]
    assert manifest["package"] == "C-001" and manifest["revision"] == "A"
    assert [station["station"] for station in member["stations"]] == [
        "z = 0 in",
        "z = 24 in",
        "z = 48 in",
    ]
    sheets = [
        json.loads((folder / f"DA-1-revA-{station}.json").read_text(encoding="utf-8"))
        for station in STATIONS
    ]
    # The same governing utilization as each station's own JSON results.
    assert [station["governing_utilization"] for station in member["stations"]] == [
        pytest.approx(max(check["utilization"] for check in sheet["checks"])) for sheet in sheets
    ]
    assert member["inputs"] in sheets[0]["trace"]


def test_a_job_of_one_station_gets_a_package_too(tmp_path: Path) -> None:
    _build(STARTER.replace("package = false", "package = true"), tmp_path)
    reader = pypdf.PdfReader(tmp_path / "DA-1-revA-package.pdf")
    own = _pages(tmp_path / "DA-1-revA.pdf")
    assert len(reader.pages) > own  # the cover, contents and summary, then the sheet
    marks = _bookmarks(reader)
    assert list(marks) == ["Contents", "Summary", "DA-1, z = 0 in"]
    assert marks["DA-1, z = 0 in"] == len(reader.pages) - own


def test_without_the_key_no_package_is_written(tmp_path: Path) -> None:
    paths = _build(STARTER, tmp_path)
    assert not [path for path in paths if "package" in path.name]


def test_an_issued_package_is_replaced_only_by_the_same_inputs(tmp_path: Path) -> None:
    _build(THREE_STATIONS, tmp_path)
    package = tmp_path / "DA-1-revA-package.json"
    _build(THREE_STATIONS, tmp_path)  # same inputs: allowed
    # A package issued from other inputs under the same revision (its trace says which).
    issued = json.loads(package.read_text(encoding="utf-8"))
    issued["trace"] = "inputs 000000000000 · rev. A"
    package.write_text(json.dumps(issued), encoding="utf-8")
    before = {path.name: path.stat().st_mtime_ns for path in tmp_path.iterdir()}
    with pytest.raises(JobError, match="DA-1-revA-package.* were built from other inputs"):
        _build(THREE_STATIONS, tmp_path)
    # Nothing was written: not the package, and not the sheets of the same set either.
    assert {path.name: path.stat().st_mtime_ns for path in tmp_path.iterdir()} == before
    _build(THREE_STATIONS, tmp_path, replace_issued=True)
    assert "000000000000" not in package.read_text(encoding="utf-8")


@pytest.mark.parametrize(
    ("typed", "got"), [('"yes"', "(got 'yes')"), ("1", "(got 1)"), ('"True"', "(got 'True')")]
)
def test_a_package_key_that_is_no_boolean_is_named_with_what_is_expected(
    typed: str, got: str
) -> None:
    text = STARTER.replace("package = false", f"package = {typed}")
    with pytest.raises(JobError) as raised:
        parse_job(text, source="job.toml")
    assert raised.value.problems == [
        ("output.package", f"expected true or false (a TOML boolean, without quotes) {got}")
    ]


def test_a_batch_tables_cell_may_say_true() -> None:
    """A CSV cell is text: the words true and false are taken as the booleans."""
    text = STARTER.replace("package = false", 'package = "true"')
    assert parse_job(text).output.package is True
