"""HTML and PDF files: content a reviewer looks for, determinism, nothing half-written."""

from __future__ import annotations

import io
import os
import stat
import subprocess
import sys
from pathlib import Path

import pypdf
import pytest

from calcsheet.demo import outrigger_sheet
from calcsheet.engine import CAUTIONS, Sheet, TitleBlock
from calcsheet.export import files
from calcsheet.export.files import ExportError, export_sheet, pdf_bytes
from calcsheet.render.html import render_html


def _pdf_pages(data: bytes) -> list[str]:
    return [page.extract_text() for page in pypdf.PdfReader(io.BytesIO(data)).pages]


def test_pdf_has_title_block_numbering_utilizations_and_cautions():
    sheet = outrigger_sheet()
    pages = _pdf_pages(pdf_bytes(sheet))
    text = "\n".join(pages)
    for field in ("Harbour Street retail", "DEMO-0142", "S-201", "A. Engineer", "OA-1"):
        assert field in text
    for number, page in enumerate(pages, start=1):
        assert f"Sheet {number} of {len(pages)}" in page
    for check in sheet.checks:
        shown = f"{check.utilization:.4f}"[:5]
        assert shown in text.replace(" ", ""), check.description
    flat = " ".join(text.split())
    for caution in CAUTIONS:
        assert " ".join(caution.split())[:40] in flat


def test_building_twice_gives_identical_bytes():
    assert pdf_bytes(outrigger_sheet()) == pdf_bytes(outrigger_sheet())
    assert render_html(outrigger_sheet()) == render_html(outrigger_sheet())


def test_a_sheet_rebuilt_many_times_prints_the_same_bytes():
    """Rebuilt sheets take the compiled evaluation path; they must print exactly the same."""
    first = render_html(outrigger_sheet())
    for _ in range(3):
        assert render_html(outrigger_sheet()) == first


def test_a4_and_letter_are_selectable():
    letter = pypdf.PdfReader(io.BytesIO(pdf_bytes(outrigger_sheet(), paper="letter")))
    a4 = pypdf.PdfReader(io.BytesIO(pdf_bytes(outrigger_sheet(), paper="a4")))
    assert round(float(letter.pages[0].mediabox.width)) == 612  # 8.5 in x 72 pt
    assert round(float(a4.pages[0].mediabox.width)) == 595  # 210 mm in pt


PAYLOADS = [
    '#read("/etc/passwd")',
    "<script>alert(1)</script>",
    "$x$",
    "*bold*",
    "\\",
    "@ref",
    '" onload="x',
    "W" * 2000,
]


@pytest.mark.parametrize("payload", PAYLOADS)
def test_user_text_comes_out_literally(payload):
    sheet = Sheet(payload, title_block=TitleBlock(project=payload, subject=payload))
    with sheet:
        sheet.text(payload)
        P = sheet.input("P", "1 kip", payload, dimension="force")
        sheet.step("Q", 2 * P, payload, unit="kip", reference=payload)
    html = render_html(sheet)
    assert "<script>alert" not in html
    assert "&lt;script&gt;" in html or "<script" not in payload
    text = " ".join(_pdf_pages(pdf_bytes(sheet)))
    squeezed = text.replace("\n", "").replace(" ", "")
    if len(payload) < 100:
        assert payload.replace(" ", "") in squeezed
    assert "root:" not in text


def test_a_failed_pdf_keeps_the_previous_files(tmp_path: Path, monkeypatch):
    written = export_sheet(outrigger_sheet(), tmp_path, "sheet")
    before = {path.name: path.read_bytes() for path in written}

    def broken(*_args, **_kwargs):
        raise ExportError("the PDF engine failed: simulated")

    monkeypatch.setattr(files, "pdf_bytes", broken)
    sheet = outrigger_sheet()
    sheet.set_input("P_1", "3 kip")
    with pytest.raises(ExportError):
        export_sheet(sheet, tmp_path, "sheet")
    after = {path.name: path.read_bytes() for path in tmp_path.iterdir()}
    assert after == before


def test_a_table_reaches_both_outputs_with_current_values():
    sheet = Sheet("table")
    with sheet:
        P = sheet.input("P", "2 kip", "Load", dimension="force")
        A = sheet.input("A", "4 in^2", "Area", dimension="area")
        f = sheet.step("f", P / A, "Stress", unit="ksi")
    sheet.table(["Point", "Stress"], [["top <b>", f]], caption="Per point", unit="ksi")
    sheet.set_input("P", "3 kip")
    # 3 kip / 4 in^2 = 0.750 ksi (arithmetic, common practice, no source)
    html = render_html(sheet)
    assert '<table class="values">' in html and "top &lt;b&gt;" in html
    assert "<mn>0.750</mn>" in html
    text = " ".join(_pdf_pages(pdf_bytes(sheet)))
    assert "top <b>" in text and "0.750" in text and "(values in ksi)" in text


def test_revision_log_design_basis_references_and_governing_point_reach_both_outputs():
    sheet = Sheet("Lifting beam", title_block=TitleBlock(project="Log test"))
    sheet.add_revision("A", "2026-11-02", "Issued for review", "A.E.")
    sheet.add_revision("B", "2026-11-20", "Lug lowered 25 mm", "A.E.")
    sheet.add_basis("Assumptions", "Static hook load")
    sheet.add_reference("Made-up handbook for this test")
    with sheet:
        left = sheet.input("f_left", "12 ksi", dimension="stress")
        right = sheet.input("f_right", "18 ksi", dimension="stress")
        f_max = sheet.governing("f_max", [("right lug", right), ("left lug", left)])
        sheet.check("Lug stress", f_max, sheet.input("F_a", "30 ksi", dimension="stress"))
    html = render_html(sheet)
    flat = " ".join(" ".join(_pdf_pages(pdf_bytes(sheet))).split())
    for expected in (
        "Revision log",
        "Lug lowered 25 mm",
        "Design basis",
        "Static hook load",
        "References",
        "Made-up handbook for this test",
        "Governs at right lug",
        "Lug stress, at right lug",
    ):
        assert expected in html, expected
        assert expected in flat, expected
    assert "Rev. B" in flat


def test_a_2000_character_word_wraps_inside_the_page():
    """Every piece of text of the PDF starts inside the page, and the word is all there."""
    word = "W" * 2000
    sheet = Sheet(word, title_block=TitleBlock(project=word, calc_number="C-1"))
    with sheet:
        sheet.heading(word)
        sheet.text(f"Before {word} after.")
        a = sheet.input("a", "2 in", word, dimension="length", reference=word)
        sheet.step("b", 2 * a, word, reference=word)
        sheet.check(word, a, a)
    reader = pypdf.PdfReader(io.BytesIO(pdf_bytes(sheet)))
    found = 0
    for page in reader.pages:
        width = float(page.mediabox.width)
        pieces: list[tuple[float, str]] = []

        def visit(text, cm, tm, font, size, pieces=pieces):
            if text.strip():
                pieces.append((cm[4] + tm[4] * cm[0], text))

        text = page.extract_text(visitor_text=visit)
        found += text.replace("\u200b", "").replace("\n", "").count("W" * 40)
        for x, piece in pieces:
            assert 0 <= x < width, (x, piece[:30])
    assert found >= 4 * (2000 // 40)  # title, title block, heading, prose, description...


def test_the_pdf_engine_can_read_no_file(tmp_path: Path, monkeypatch):
    """Defence in depth: even markup that asks to read a file next to it cannot."""
    (tmp_path / "secret.txt").write_text("root:x:0:0")
    monkeypatch.chdir(tmp_path)
    for path in ("secret.txt", "/etc/passwd"):
        with pytest.raises(ExportError, match="file not found"):
            files.compile_pdf(f'#read("{path}")')


@pytest.mark.parametrize(("umask", "mode"), [(0o022, 0o644), (0o027, 0o640), (0o077, 0o600)])
def test_files_take_the_mode_the_umask_gives(tmp_path: Path, umask: int, mode: int):
    """Before, every output was 0600 (mkstemp's), whatever the umask. 0666 & ~umask is what
    open(2) gives a new file (POSIX.1-2017, open(): "the file permission bits ... modified
    by the process' file mode creation mask")."""
    previous = os.umask(umask)
    try:
        files.write_atomically(tmp_path / "new.txt", b"new")
        (tmp_path / "old.txt").write_bytes(b"old")
        os.chmod(tmp_path / "old.txt", 0o600)
        files.write_all_atomically([(tmp_path / "old.txt", b"replaced")])
    finally:
        os.umask(previous)
    assert stat.S_IMODE((tmp_path / "new.txt").stat().st_mode) == mode
    assert stat.S_IMODE((tmp_path / "old.txt").stat().st_mode) == mode
    files.write_atomically(tmp_path / "kept.txt", b"x", mode=0o600)
    assert stat.S_IMODE((tmp_path / "kept.txt").stat().st_mode) == 0o600


def test_a_second_writer_waits_for_the_folder_lock_then_gives_up(tmp_path: Path):
    said: list[str] = []
    with files.folder_lock(tmp_path):
        assert (tmp_path / files.LOCK_NAME).read_text().strip() == str(os.getpid())
        other = subprocess.run(
            [
                sys.executable,
                "-c",
                "import sys; from calcsheet.export import files\n"
                "try:\n"
                f"    with files.folder_lock({str(tmp_path)!r}, wait_seconds=0.5): pass\n"
                "except files.ExportError as error:\n"
                "    print(error); sys.exit(3)\n",
            ],
            capture_output=True,
            text=True,
            timeout=120,
        )
    assert other.returncode == 3, other.stderr
    assert "waiting for another calcsheet build" in other.stderr
    assert f"(process {os.getpid()})" in other.stderr
    assert "has been writing into" in other.stdout and "nothing was written" in other.stdout
    with files.folder_lock(tmp_path, waiting=said.append):  # released: no wait
        pass
    assert said == [] and not (tmp_path / files.LOCK_NAME).exists()


# --- ready to attach to a submittal -------------------------------------------------------


@pytest.fixture(scope="module")
def demo_pdf() -> pypdf.PdfReader:
    return pypdf.PdfReader(io.BytesIO(pdf_bytes(outrigger_sheet())))


def test_the_pdf_declares_pdf_a_2b_in_its_xmp_metadata(demo_pdf: pypdf.PdfReader) -> None:
    """ISO 19005-2:2011 clause 6.6.4: the file names its part (2) and conformance (B) in
    the pdfaid schema of its XMP metadata."""
    xmp = demo_pdf.xmp_metadata
    assert xmp is not None
    description = xmp.rdf_root.getElementsByTagNameNS("*", "Description")
    found: dict[str, str] = {}
    for node in description:
        for name in ("part", "conformance"):
            value = node.getAttributeNS("http://www.aiim.org/pdfa/ns/id/", name)
            if value:
                found[name] = value
            for child in node.getElementsByTagNameNS("http://www.aiim.org/pdfa/ns/id/", name):
                found[name] = child.firstChild.nodeValue
    assert found == {"part": "2", "conformance": "B"}


def test_the_pdf_carries_title_author_subject_keywords_and_an_issue_date(
    demo_pdf: pypdf.PdfReader,
) -> None:
    sheet = outrigger_sheet()
    info = demo_pdf.metadata
    assert info is not None
    assert info.title == sheet.title
    assert info.author == sheet.title_block.prepared_by
    assert sheet.title_block.subject in info.subject
    assert f"calc {sheet.title_block.calc_number}" in info["/Keywords"]
    latest = sheet.revisions[-1].date if sheet.revisions else sheet.title_block.prepared_date
    if latest:
        assert info["/CreationDate"].startswith("D:" + latest.replace("-", ""))


def test_the_pdf_has_a_bookmark_outline_of_the_sections(demo_pdf: pypdf.PdfReader) -> None:
    titles = [item.title for item in demo_pdf.outline if not isinstance(item, list)]
    for section in ("Summary", "Design basis", "Inputs", "Calculation"):
        assert section in titles
    nested = [item for item in demo_pdf.outline if isinstance(item, list)]
    assert nested and nested[0], "the calculation's own headings are bookmarked under it"


def test_the_first_sheet_has_boxes_for_the_seal_and_the_checker(
    demo_pdf: pypdf.PdfReader,
) -> None:
    first = " ".join(demo_pdf.pages[0].extract_text().split())
    assert "Engineer of record: seal and signature" in first
    assert "Checker" in first and "Initials" in first and "Date" in first
    later = " ".join(page.extract_text() for page in demo_pdf.pages[1:])
    assert "seal and signature" not in later
    html = render_html(outrigger_sheet())
    assert "Engineer of record: seal and signature" in html and "Initials" in html


def test_a_sheet_without_dates_is_dated_the_day_it_is_built() -> None:
    """PDF/A needs a document date; a sheet with none given takes the build's date."""
    import datetime

    from calcsheet.render.view import issue_date

    sheet = Sheet("Undated", title_block=TitleBlock(prepared_date="2026-03-04"))
    assert issue_date(sheet) == datetime.date(2026, 3, 4)
    sheet.add_revision("A", "2026-05-06")
    sheet.add_revision("B", "")  # not yet dated: the last dated issue counts
    assert issue_date(sheet) == datetime.date(2026, 5, 6)
    today = datetime.date(2026, 12, 2)
    assert issue_date(Sheet("Undated"), today=today) == today
    reader = pypdf.PdfReader(io.BytesIO(pdf_bytes(Sheet("Undated"))))
    assert reader.metadata["/CreationDate"].startswith("D:")
