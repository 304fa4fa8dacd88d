"""The calc package of a batch: one PDF/A-2b of a cover, the contents, the summary and every
member's sheets numbered through the package ("Sheet 14 of 63"), each with its own title
block; a bookmark per member; issued packages protected as a member's files are."""

from __future__ import annotations

import dataclasses
import json
import re
import tomllib
from pathlib import Path

import jsonschema
import pypdf
import pytest

from calcsheet.job import JobError
from calcsheet.job.starter import STARTER
from calcsheet.pipeline.batch import members_from_csv, run_batch, write_package
from calcsheet.pipeline.package import package_schema

# Invented demo members: one passes, one fails its checks (200 kip on a W8X18), one names
# a section no table has (W8X19) and is skipped.
TABLE = """member.name,member.section,loads[0].magnitude
P1,W8X31,1 kip
P2,W8X18,200 kip
P3,W8X19,1 kip
"""
SHEET_NUMBER = re.compile(r"Sheet (\d+) of (\d+)")


def _base() -> dict:
    base = tomllib.loads(STARTER)
    base["sheet"]["title"] = "Davit arm {member}"
    base["title_block"]["calc_number"] = "C-{member}"
    return base


@pytest.fixture(scope="module")
def batch(tmp_path_factory: pytest.TempPathFactory) -> tuple[Path, list]:
    folder = tmp_path_factory.mktemp("package")
    members = members_from_csv(TABLE, _base(), source="members.csv")
    outcomes = run_batch(members, folder, source="members.csv", workers=1, package=True)
    return folder, outcomes


@pytest.fixture(scope="module")
def package(batch: tuple[Path, list]) -> tuple[Path, pypdf.PdfReader]:
    folder, outcomes = batch
    files = write_package(outcomes, folder, source="members.csv", calc_number="PK-1")
    assert (files.members, files.left_out) == (2, 1)
    pdf = next(path for path in files.paths if path.suffix == ".pdf")
    return pdf, pypdf.PdfReader(pdf)


def _pages(path: Path) -> int:
    return len(pypdf.PdfReader(path).pages)


def test_the_package_holds_a_cover_the_contents_and_every_members_sheets_numbered_through(
    batch: tuple[Path, list], package: tuple[Path, pypdf.PdfReader]
) -> None:
    folder, outcomes = batch
    path, reader = package
    assert path.name == "PK-1-revA.pdf"
    texts = [page.extract_text() for page in reader.pages]
    total = len(texts)
    # Every page's header (and footer) reads "Sheet n of N", n counting 1..N through the package.
    assert [SHEET_NUMBER.search(text).groups() for text in texts] == [
        (str(number), str(total)) for number in range(1, total + 1)
    ]
    assert "Calc package PK-1" in texts[0] and "seal and signature" in texts[0]
    assert "Cautions" in texts[0] and "Contents" in " ".join(texts[:2])
    own = {name: _pages(folder / f"{name}-revA.pdf") for name in ("P1", "P2")}
    front = total - sum(own.values())
    assert front >= 1
    # Each member's sheets in order, with its own title block (its calc number) on each.
    first = {"P1": front + 1, "P2": front + 1 + own["P1"]}
    for name, start in first.items():
        for page in range(start, start + own[name]):
            assert f"Calc: C-{name}" in texts[page - 1]
        assert f"Davit arm {name}" in texts[start - 1]
    # The contents give each member's first sheet; the skipped member is marked, not numbered.
    contents = re.sub(r"\s+", " ", " ".join(texts[:front]))
    assert re.search(rf"P1 W8X31 \S+ OK .*? {first['P1']} ", contents)
    assert re.search(rf"P2 W8X18 \S+ NOT OK .*? {first['P2']} ", contents)
    assert re.search(r"P3 W8X19 SKIPPED \(bad input\) .*?W8X19.*? not in this package", contents)
    assert [outcome.status for outcome in outcomes] == ["OK", "NOT OK", "SKIPPED (bad input)"]


def test_the_package_is_pdf_a_2b_with_a_bookmark_per_member(
    package: tuple[Path, pypdf.PdfReader],
) -> None:
    _, reader = package
    # ISO 19005-2 §6.6.4: the PDF/A identification (part 2, conformance B) in the XMP metadata.
    xmp = reader.trailer["/Root"]["/Metadata"].get_object().get_data().decode()
    assert re.search(r"pdfaid:part(>|=\")2", xmp) and re.search(r"pdfaid:conformance(>|=\")B", xmp)
    assert reader.metadata.title == "Calc package PK-1"
    top = [item.title for item in reader.outline if not isinstance(item, list)]
    assert top == ["Contents", "Batch summary", "P1", "P2"]
    pages = {item.title: reader.get_destination_page_number(item) for item in reader.outline
             if not isinstance(item, list)}  # fmt: skip
    assert "Davit arm P1" in reader.pages[pages["P1"]].extract_text()
    assert "Davit arm P2" in reader.pages[pages["P2"]].extract_text()


def test_the_packages_json_fits_the_shipped_schema(package: tuple[Path, pypdf.PdfReader]) -> None:
    path, _ = package
    manifest = json.loads(path.with_suffix(".json").read_text(encoding="utf-8"))
    jsonschema.Draft202012Validator(package_schema()).validate(manifest)
    assert [member["status"] for member in manifest["members"]] == [
        "OK",
        "NOT OK",
        "SKIPPED (bad input)",
    ]
    assert manifest["members"][2]["inputs"] is None


def test_an_issued_package_is_replaced_only_by_the_same_inputs(
    batch: tuple[Path, list], package: tuple[Path, pypdf.PdfReader]
) -> None:
    folder, outcomes = batch
    path, _ = package
    before = path.read_bytes()
    write_package(outcomes, folder, source="members.csv", calc_number="PK-1")  # same inputs
    assert path.read_bytes() == before
    first = outcomes[0]
    changed = [
        dataclasses.replace(first, package=dataclasses.replace(first.package, inputs="0" * 12)),
        *outcomes[1:],
    ]
    with pytest.raises(JobError, match="PK-1-revA.* were built from other inputs"):
        write_package(changed, folder, source="members.csv", calc_number="PK-1")
    assert path.read_bytes() == before
    write_package(changed, folder, source="members.csv", calc_number="PK-1", replace_issued=True)
    assert path.read_bytes() != before


def test_a_package_with_no_member_built_says_so(batch: tuple[Path, list], tmp_path: Path) -> None:
    _, outcomes = batch
    skipped = [outcomes[2]]
    with pytest.raises(JobError, match=r"package: none of the 1 members was built") as raised:
        write_package(skipped, tmp_path, source="members.csv")
    assert "nothing was written" in str(raised.value)
    assert not list(tmp_path.iterdir())


def test_a_member_written_without_a_pdf_still_goes_into_the_package(tmp_path: Path) -> None:
    base = _base()
    base["output"]["formats"] = ["json"]
    members = members_from_csv(TABLE.splitlines()[0] + "\nP1,W8X31,1 kip\n", base, source="one.csv")
    outcomes = run_batch(members, tmp_path, source="one.csv", workers=1, package=True)
    assert not list(tmp_path.glob("P1-*.pdf"))
    files = write_package(outcomes, tmp_path, source="one.csv", calc_number="PK-2")
    reader = pypdf.PdfReader(files.paths[0])
    top = [item for item in reader.outline if not isinstance(item, list)]
    assert [item.title for item in top][-1] == "P1"
    assert (
        "Davit arm P1" in reader.pages[reader.get_destination_page_number(top[-1])].extract_text()
    )
