"""User text in every field that reaches a template, a file name or a figure label.

One job per payload, with the payload in all such fields at once (title, the title
block, the revision, member name, section name, load and moment names, output stem),
built from TOML text and written into a temporary folder. The text must come out as
text: no element or attribute in the HTML or the SVG, no Typst code run, no jinja
expression evaluated, no file read, no file name outside the folder.
"""

from __future__ import annotations

import html
import io
import json
import os
import re
import unicodedata
import xml.etree.ElementTree as ET
from html.parser import HTMLParser
from pathlib import Path

import pypdf
import pytest

from calcsheet.cli import main
from calcsheet.job import parse_job
from calcsheet.pipeline import build_sheets, output_folder, write_outputs

from .support import starter_data, toml_text

PAYLOADS = [
    "<script>alert(1)</script>",
    '#read("/etc/passwd")',
    '#include "/etc/passwd"',
    "../../etc/passwd",
    '" onload="alert(1)',
    "$x$",
    "*b*",
    "@ref",
    "\\",
    "\x00\x07\x1b[31m",
    "]]></svg><script>",
    "{{ 7*7 }}",
    "{% raw %}",
]
SAFE_NAME = re.compile(r"^[A-Za-z0-9_-][A-Za-z0-9._-]*$")
SVG = re.compile(r"<svg\b.*?</svg>", re.DOTALL)
MARK_LENGTH = 20  # the schema's limit for a revision mark
ISO_DATE = "2026-12-01"


def hostile_job_text(payload: str) -> str:
    """The starter with ``payload`` in every free-text field (names kept distinct)."""
    data = starter_data()
    data["sheet"]["title"] = payload
    for key in data["title_block"]:
        # Dates must be YYYY-MM-DD (a payload there is refused: test_input_answers.py).
        data["title_block"][key] = ISO_DATE if key.endswith("_date") else payload
    data["revisions"] = [
        {"mark": payload[:MARK_LENGTH], "date": ISO_DATE, "description": payload, "by": payload}
    ]
    data["member"]["name"] = payload
    data["member"]["section"] = {
        "kind": "rectangular HSS",
        "name": payload,
        "H": "8 in",
        "B": "4 in",
        "t": "0.349 in",
    }
    data["loads"][0]["name"] = payload
    data["loads"].append(
        {"name": f"{payload} 2", "z": "30 in", "components": ["0.3 kip", "0 kip", "0 kip"]}
    )
    data["moments"] = [{"name": f"{payload} 3", "z": "60 in", "Mz": "0.5 kip*ft"}]
    data["output"]["stem"] = payload
    return toml_text(data)


class _Structure(HTMLParser):
    """Every element and attribute name of an HTML document."""

    def __init__(self) -> None:
        super().__init__(convert_charrefs=True)
        self.tags: list[str] = []
        self.attributes: list[str] = []
        self.text: list[str] = []

    def handle_starttag(self, tag: str, attrs: list[tuple[str, str | None]]) -> None:
        self.tags.append(tag)
        self.attributes += [name for name, _ in attrs]

    def handle_data(self, data: str) -> None:
        self.text.append(data)


def tree(folder: Path, skip: Path) -> set[str]:
    """Every path under ``folder`` except those under ``skip``."""
    found = set()
    for root, folders, files in os.walk(folder):
        if Path(root) == skip:
            folders.clear()
            continue
        found.update(os.path.join(root, name) for name in folders + files)
    return found


def shown(payload: str) -> str:
    """The payload as a sheet can show it: stripped, without control characters."""
    text = "".join(c for c in payload if unicodedata.category(c) != "Cc")
    return text.strip()


def squeeze(text: str) -> str:
    """Text without spaces or zero-width break opportunities, for finding words in a PDF."""
    return re.sub(r"[\s\u200b]+", "", text)


@pytest.mark.parametrize("payload", PAYLOADS, ids=[repr(p) for p in PAYLOADS])
def test_user_text_stays_text_in_every_output(payload: str, tmp_path: Path) -> None:
    job_folder = tmp_path / "job"
    job_folder.mkdir()
    outside_before = tree(tmp_path.parent, skip=tmp_path)
    etc_before = sorted(os.listdir("/etc"))

    job = parse_job(hostile_job_text(payload), source="hostile.toml")
    result = build_sheets(job, source="hostile.toml")
    folder = output_folder(job, job_folder)
    written = write_outputs(result, folder)

    # Files: only inside the output folder, with plain names.
    assert tree(tmp_path.parent, skip=tmp_path) == outside_before
    assert sorted(os.listdir("/etc")) == etc_before
    inside = {path for path in tmp_path.rglob("*") if path.is_file()}
    assert inside == set(written)
    for path in written:
        assert path.parent == job_folder / "out"
        assert SAFE_NAME.match(path.name), path.name
    by_suffix = {path.suffix: path for path in written}
    assert set(by_suffix) == {".pdf", ".html", ".json"}

    # HTML: no script element, no event attribute; the text survives as text.
    page = by_suffix[".html"].read_text(encoding="utf-8")
    structure = _Structure()
    structure.feed(page)
    assert "script" not in structure.tags
    assert not [name for name in structure.attributes if name.lower().startswith("on")]
    assert page.rstrip().endswith("</html>")
    text = html.unescape("".join(structure.text))
    assert shown(payload) in text
    if payload == "{{ 7*7 }}":
        assert "{{ 7*7 }}" in text  # not evaluated to 49

    # Inline SVG figures: well-formed XML, no script, no event attribute.
    figures = SVG.findall(page)
    assert figures, "the sheet has figures"
    labels = []
    for figure in figures:
        root = ET.fromstring(figure)
        for element in root.iter():
            assert not element.tag.lower().endswith("script")
            assert not [name for name in element.attrib if name.lower().startswith("on")]
            labels.append(element.text or "")
    assert any(shown(payload) in label for label in labels), "a label shows the load name"

    # JSON: parses, the title is the text as given.
    data = json.loads(by_suffix[".json"].read_text(encoding="utf-8"))
    assert data["title"] == payload.strip()

    # PDF: no file content read into it, and the text printed literally.
    pdf = pypdf.PdfReader(io.BytesIO(by_suffix[".pdf"].read_bytes()))
    pdf_text = "\n".join(page.extract_text() for page in pdf.pages)
    assert "root:" not in pdf_text
    assert squeeze(shown(payload)) in squeeze(pdf_text)


@pytest.mark.parametrize(
    "payload",
    PAYLOADS,
    ids=[repr(p) for p in PAYLOADS],
)
def test_an_output_folder_from_the_job_stays_inside_the_jobs_folder(
    payload: str, tmp_path: Path, capsys: pytest.CaptureFixture[str]
) -> None:
    data = starter_data()
    data["output"].update(folder=payload, formats=["json"])
    job_folder = tmp_path / "job"
    job_folder.mkdir()
    job_file = job_folder / "job.toml"
    job_file.write_text(toml_text(data), encoding="utf-8")
    outside_before = tree(tmp_path.parent, skip=tmp_path)

    status = main(["build", str(job_file)])

    message = capsys.readouterr().err
    assert tree(tmp_path.parent, skip=tmp_path) == outside_before
    written = [path for path in tmp_path.rglob("*") if path.is_file() and path != job_file]
    if status == 2:
        assert "output.folder" in message and not written
        return
    assert status == 0, message
    assert [path.name for path in written] == ["DA-1-revA.json"]
    assert job_folder in written[0].resolve().parents
