"""Notebooks to calc sheets: the payload a displayed sheet carries, and the nbconvert exporters.

The fast tests hand the exporters notebooks built in memory. The slow ones run
`jupyter nbconvert` as a user would, executing the notebook twice in all (a shared
module fixture), with a kernelspec of their own that points at this interpreter so
that no kernel installed on the machine is picked up instead.
"""

from __future__ import annotations

import io
import json
import os
import subprocess
import sys
from pathlib import Path

import nbformat
import pypdf
import pytest
from nbconvert.exporters import get_exporter
from nbconvert.utils.exceptions import ConversionException
from traitlets import TraitError
from traitlets.config import Config

from calcsheet.demo import outrigger_sheet
from calcsheet.engine import Sheet
from calcsheet.export.notebook import (
    NO_SHEET_MESSAGE,
    CalcsheetExporter,
    CalcsheetHTMLExporter,
    SheetConversionError,
)
from calcsheet.export.payload import PAYLOAD_VERSION, SHEET_MIME_TYPE, sheet_payload
from tests.jupyter_env import KERNEL, isolated_jupyter

TITLE = "Sign outrigger arm OA-1: combined stresses at the support"
CODE = ["from calcsheet.demo import outrigger_sheet", "sheet = outrigger_sheet()", "sheet"]
LETTER = (612, 792)  # 8.5 x 11 in at 72 pt/in
A4 = (595, 842)  # 210 x 297 mm in pt


def _pdf(data: bytes) -> pypdf.PdfReader:
    return pypdf.PdfReader(io.BytesIO(data))


def _page_size(reader: pypdf.PdfReader) -> tuple[int, int]:
    box = reader.pages[0].mediabox
    return round(float(box.width)), round(float(box.height))


def _text(reader: pypdf.PdfReader) -> str:
    return "\n".join(page.extract_text() for page in reader.pages)


def _notebook(*payloads: dict) -> nbformat.NotebookNode:
    """A notebook whose cells each displayed one payload, as a kernel would have saved it."""
    nb = nbformat.v4.new_notebook()
    nb.cells.append(nbformat.v4.new_markdown_cell("# A calc"))
    for number, payload in enumerate(payloads, start=1):
        cell = nbformat.v4.new_code_cell("sheet", execution_count=number)
        cell.outputs = [
            nbformat.v4.new_output("stream", name="stdout", text="building\n"),
            nbformat.v4.new_output(
                "execute_result",
                data={
                    "text/plain": "<Sheet>",
                    "text/html": "<div>view</div>",
                    SHEET_MIME_TYPE: payload,
                },
                execution_count=number,
            ),
        ]
        nb.cells.append(cell)
    nbformat.validate(nb)
    return nb


def _resources(stem: str) -> dict:
    return {"unique_key": stem, "metadata": {"name": stem, "path": ""}}


@pytest.fixture(scope="module")
def demo_payload() -> dict:
    return sheet_payload(outrigger_sheet())


# -- the payload ---------------------------------------------------------------------------


def test_payload_is_json_deterministic_and_complete(demo_payload):
    assert json.loads(json.dumps(demo_payload)) == demo_payload
    assert sheet_payload(outrigger_sheet()) == demo_payload
    assert demo_payload["version"] == PAYLOAD_VERSION
    assert demo_payload["title"] == TITLE
    assert demo_payload["title_block"]["calc_number"] == "S-201"
    assert demo_payload["html"].startswith("<!DOCTYPE html") or "<html" in demo_payload["html"]
    assert "<math" in demo_payload["html"]
    assert "#set page(" in demo_payload["typst"]
    # The notebook carries the document twice (HTML view and this); keep it modest.
    assert len(json.dumps(demo_payload)) < 500_000  # HTML and Typst with figures


def test_a_displayed_sheet_offers_the_payload_beside_its_html_view():
    sheet = outrigger_sheet()
    bundle = sheet._repr_mimebundle_()
    assert bundle == {SHEET_MIME_TYPE: sheet_payload(sheet)}
    assert "<math" in sheet._repr_html_()  # what notebook front ends show


# -- the exporters, in process ---------------------------------------------------------------


def test_exporters_are_registered_with_nbconvert():
    assert get_exporter("calcsheet") is CalcsheetExporter
    assert get_exporter("calcsheet-html") is CalcsheetHTMLExporter


def test_pdf_exporter_gives_the_pdf_and_puts_the_html_beside_it(demo_payload):
    pdf, resources = CalcsheetExporter().from_notebook_node(
        _notebook(demo_payload), resources=_resources("my-calc")
    )
    reader = _pdf(pdf)
    text = _text(reader)
    assert TITLE in " ".join(text.split())
    assert "Sheet 1 of" in text
    assert _page_size(reader) == LETTER
    assert resources["output_extension"] == ".pdf"
    assert resources["outputs"] == {
        os.path.join(".", "my-calc.html"): demo_payload["html"].encode("utf-8")
    }


def test_paper_is_chosen_by_configuration(demo_payload):
    config = Config({"CalcsheetExporter": {"paper": "A4"}})
    pdf, _ = CalcsheetExporter(config=config).from_notebook_node(
        _notebook(demo_payload), resources=_resources("calc")
    )
    assert _page_size(_pdf(pdf)) == A4
    with pytest.raises(TraitError):
        CalcsheetExporter(paper="legal")


def test_the_last_sheet_shown_wins():
    first, last = Sheet("First draft"), Sheet("Issued calc")
    html, resources = CalcsheetHTMLExporter().from_notebook_node(
        _notebook(sheet_payload(first), sheet_payload(last)), resources=_resources("calc")
    )
    assert html == sheet_payload(last)["html"]
    assert "Issued calc" in html and "First draft" not in html
    assert resources["output_extension"] == ".html"
    assert not resources.get("outputs")


def test_a_notebook_without_a_sheet_is_refused_clearly():
    nb = _notebook()
    nb.cells.append(nbformat.v4.new_code_cell("x = 1"))
    with pytest.raises(SheetConversionError, match="no calc sheet in this notebook") as caught:
        CalcsheetExporter().from_notebook_node(nb)
    assert str(caught.value) == NO_SHEET_MESSAGE
    assert isinstance(caught.value, ConversionException)  # nbconvert exits with 1 on it


@pytest.mark.parametrize(
    ("payload", "message"),
    [
        ({"version": PAYLOAD_VERSION + 1, "html": "", "typst": ""}, "sheet format"),
        ({"version": PAYLOAD_VERSION, "html": "<p>"}, "lacks typst"),
        ("not json", "not readable"),
    ],
)
def test_an_unreadable_sheet_output_names_the_cell(payload, message):
    with pytest.raises(SheetConversionError, match=message) as caught:
        CalcsheetHTMLExporter().from_notebook_node(_notebook(payload))
    assert "cell 2" in str(caught.value)


# -- jupyter nbconvert, as a user runs it ----------------------------------------------------

JUPYTER = str(Path(sys.executable).parent / "jupyter")


class Folder:
    """A folder holding notebooks, and `jupyter nbconvert` run inside it."""

    def __init__(self, path: Path) -> None:
        self.path = path
        self.env = isolated_jupyter(path, KERNEL)

    def write(self, name: str, cells: list[str]) -> None:
        nb = nbformat.v4.new_notebook()
        nb.metadata["kernelspec"] = {"name": "python3", "display_name": "Python 3"}
        nb.cells = [nbformat.v4.new_code_cell(source) for source in cells]
        nbformat.write(nb, self.path / name)

    def nbconvert(self, *arguments: str) -> subprocess.CompletedProcess:
        return subprocess.run(
            [JUPYTER, "nbconvert", f"--ExecutePreprocessor.kernel_name={KERNEL}", *arguments],
            cwd=self.path,
            env=self.env,
            capture_output=True,
            text=True,
            timeout=300,
        )


@pytest.fixture(scope="module")
def converted(tmp_path_factory: pytest.TempPathFactory) -> Folder:
    """The demo notebook converted with --execute, and a saved executed copy of it."""
    folder = Folder(tmp_path_factory.mktemp("notebooks"))
    folder.write("my-calc.ipynb", CODE)
    for arguments in (
        ["--to", "calcsheet", "--execute", "my-calc.ipynb"],
        ["--to", "notebook", "--execute", "--output", "executed", "my-calc.ipynb"],
    ):
        result = folder.nbconvert(*arguments)
        assert result.returncode == 0, result.stderr
    return folder


def test_nbconvert_execute_writes_the_pdf_and_the_html_side_by_side(converted):
    reader = pypdf.PdfReader(converted.path / "my-calc.pdf")
    text = _text(reader)
    assert TITLE in " ".join(text.split())
    assert "Sheet 1 of" in text
    assert _page_size(reader) == LETTER
    html = (converted.path / "my-calc.html").read_text(encoding="utf-8")
    assert "<math" in html and TITLE in html
    # Only the sheet: no code cell reaches the output (the bare `sheet` is in class names).
    for code in ("outrigger_sheet()", "from calcsheet.demo import"):
        assert code not in html


def test_a_saved_notebook_carries_the_sheet_and_converts_without_a_kernel(converted):
    nb = nbformat.read(converted.path / "executed.ipynb", as_version=4)
    nbformat.validate(nb)
    data = nb.cells[-1].outputs[-1]["data"]
    assert "text/html" in data  # what notebook front ends show
    assert data[SHEET_MIME_TYPE]["title"] == TITLE
    result = converted.nbconvert(
        "--to", "calcsheet", "--CalcsheetExporter.paper=a4", "--output", "a4", "executed.ipynb"
    )
    assert result.returncode == 0, result.stderr
    assert _page_size(pypdf.PdfReader(converted.path / "a4.pdf")) == A4
    assert (converted.path / "a4.html").read_bytes() == (
        converted.path / "my-calc.html"
    ).read_bytes()


def test_nbconvert_on_a_notebook_without_a_sheet_fails_in_one_line(converted):
    converted.write("no-sheet.ipynb", ["x = 1"])
    previous = converted.path / "no-sheet.pdf"
    previous.write_bytes(b"an earlier issue")
    result = converted.nbconvert("--to", "calcsheet", "no-sheet.ipynb")
    assert result.returncode != 0
    assert "no calc sheet in this notebook" in result.stderr
    assert "Traceback" not in result.stderr
    assert previous.read_bytes() == b"an earlier issue"
    assert not (converted.path / "no-sheet.html").exists()
