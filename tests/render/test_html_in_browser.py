"""The HTML sheet in a real browser: math laid out as MathML, nothing raw, a screenshot kept.

Uses Debian's chromium (installed by .ci/run). A copy of the sheet gets a small
measuring script appended (the sheet itself has none); chromium's --dump-dom
prints the page after the script ran.
"""

from __future__ import annotations

import json
import re
import shutil
import subprocess
import tempfile
from pathlib import Path

import pytest

from calcsheet.demo import outrigger_sheet
from calcsheet.render.html import render_html

ARTIFACTS = Path(__file__).resolve().parents[1] / "artifacts"
CHROMIUM = shutil.which("chromium") or shutil.which("chromium-browser")
FLAGS = [
    "--headless",
    "--no-sandbox",
    "--disable-gpu",
    "--disable-quic",
    "--no-first-run",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
]

MEASURE = """
<script>
const boxes = [...document.querySelectorAll('math')].map(m => m.getBoundingClientRect());
// A fraction laid out as math has its numerator above its denominator (in any size:
// fractions in exponents and in the conditions of a case split are set smaller).
const fractions = [...document.querySelectorAll('mfrac')];
const stacked = fractions.filter(m => m.children.length === 2 &&
  m.children[0].getBoundingClientRect().bottom <= m.children[1].getBoundingClientRect().top + 1);
const result = {
  math: boxes.length,
  empty: boxes.filter(b => b.width < 1 || b.height < 1).length,
  fractions: fractions.length,
  stackedFractions: stacked.length,
  text: document.body.innerText,
};
const out = document.createElement('pre');
out.id = 'measured';
out.textContent = JSON.stringify(result);
document.body.appendChild(out);
</script>
"""

pytestmark = pytest.mark.skipif(CHROMIUM is None, reason="chromium is not installed")


def _run_chromium(*arguments: str) -> subprocess.CompletedProcess:
    with tempfile.TemporaryDirectory() as profile:
        return subprocess.run(
            [CHROMIUM, *FLAGS, f"--user-data-dir={profile}", *arguments],
            capture_output=True,
            text=True,
            timeout=120,
            check=False,
        )


def test_math_is_laid_out_as_mathml_and_no_raw_source_shows(tmp_path: Path):
    html = render_html(outrigger_sheet())
    page = tmp_path / "sheet.html"
    page.write_text(html.replace("</body>", MEASURE + "</body>"), encoding="utf-8")
    dump = _run_chromium("--dump-dom", page.as_uri())
    match = re.search(r'<pre id="measured">(.*?)</pre>', dump.stdout, re.S)
    assert match, dump.stderr[-2000:]
    measured = json.loads(match.group(1).replace("&quot;", '"').replace("&amp;", "&"))
    assert measured["math"] > 20
    assert measured["empty"] == 0
    assert measured["fractions"] > 5
    # A fraction laid out as math stacks its numerator over its denominator.
    assert measured["stackedFractions"] == measured["fractions"]
    for raw in ("\\frac", "frac(", "$", "\\mathrm", "<m"):
        assert raw not in measured["text"]


def test_screenshot_is_kept_as_an_artifact(tmp_path: Path):
    page = tmp_path / "sheet.html"
    page.write_text(render_html(outrigger_sheet()), encoding="utf-8")
    ARTIFACTS.mkdir(exist_ok=True)
    shot = ARTIFACTS / "outrigger-demo.png"
    _run_chromium("--window-size=1000,2000", f"--screenshot={shot}", page.as_uri())
    assert shot.exists() and shot.stat().st_size > 10_000
