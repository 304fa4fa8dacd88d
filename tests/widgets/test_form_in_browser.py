"""The form in a real JupyterLab: run the demo notebook, change an entry, see the preview follow.

JupyterLab runs on loopback with a token, in a temporary folder holding a copy of the
demo notebook and job (nothing is written into the repository but the screenshots),
with a kernelspec that runs this interpreter. Debian's chromium is driven by the
``playwright`` package with ``executable_path`` set: playwright's own browser
download is not used (``tests/widgets/form_in_lab.py``, shared with
``bench/form_browser.py``, which times what this test only checks). Skipped, saying
why, when chromium, jupyterlab or playwright is missing.

The screenshots go to tests/artifacts/ (member-form.png after a good change,
member-form-bad-entry.png with an entry marked).
"""

from __future__ import annotations

import re
from collections.abc import Iterator
from pathlib import Path

import pytest

from tests.widgets.form_in_lab import (
    KEY_RESULTS_SELECTOR,
    ROOT,
    SHEET_SELECTOR,
    entry_box,
    lab_server,
    launch_chromium,
    missing_tools,
    open_demo_form,
    type_and_watch,
)

ARTIFACTS = ROOT / "tests" / "artifacts"
MISSING = missing_tools()
pytestmark = pytest.mark.skipif(
    bool(MISSING), reason=f"needs {', '.join(MISSING)} for the browser test of the form"
)


@pytest.fixture(scope="module")
def lab(tmp_path_factory: pytest.TempPathFactory) -> Iterator[str]:
    """A JupyterLab server on loopback; yields the demo notebook's URL (with the token)."""
    with lab_server(Path(tmp_path_factory.mktemp("lab"))) as url:
        yield url


def _expected_preview(magnitude: str) -> tuple[str, str]:
    """The key results and sheet HTML of the demo job with the first load's magnitude changed,
    built here, outside the page, as the form's kernel builds them."""
    from calcsheet.render.html import render_fragment
    from calcsheet.widgets import MemberForm
    from calcsheet.widgets.preview import governing_sheet, key_results_html

    form = MemberForm.from_job_file(ROOT / "examples" / "outrigger.toml", debounce=None)
    form.set_value("loads[0].magnitude", magnitude)
    result = form.refresh()
    assert result is not None and not form.errors, form.errors
    return key_results_html(result), render_fragment(governing_sheet(result))


def test_the_form_runs_in_jupyterlab_and_the_preview_follows_an_entry(lab: str) -> None:
    from playwright.sync_api import sync_playwright

    ARTIFACTS.mkdir(exist_ok=True)
    with sync_playwright() as playwright:
        browser = launch_chromium(playwright)
        try:
            page = open_demo_form(browser, lab)
            key_results = page.locator(KEY_RESULTS_SELECTOR)
            assert "OK" in key_results.inner_text()
            # The sheet fits its column: only a table or equation wider than the column
            # scrolls, inside the sheet (its right edge was once cut off).
            widths = page.evaluate(
                """(view) => {
                  const box = document.querySelector(view);
                  const sheet = box.querySelector('.calcsheet');
                  return [box.getBoundingClientRect().right, sheet.getBoundingClientRect().right];
                }""",
                SHEET_SELECTOR,
            )
            assert widths[1] <= widths[0] + 1, widths

            # The first load's magnitude (the second load is given by components), typed a
            # key at a time: the key results and then the whole sheet show exactly what a
            # build of the new entries gives (type_and_watch fails otherwise).
            magnitude = entry_box(page, "magnitude")
            type_and_watch(page, magnitude, "4.8 kip", *_expected_preview("4.8 kip"))
            after = key_results.inner_text()
            assert "governing utilization" in after
            page.screenshot(path=str(ARTIFACTS / "member-form.png"))

            magnitude.fill("6.5 in")
            page.wait_for_selector("text=that is a length, not a force")
            page.wait_for_selector("text=The preview below is the last good result")
            # The last good figures stay, under a badge that no longer says OK (issue 16).
            stale = key_results.inner_text()
            assert stale.startswith("entries have problems last good result: ")
            figures = re.sub(r"^(NOT )?OK ", "", after)
            assert stale.removeprefix("entries have problems last good result: ") == figures
            magnitude.evaluate("box => box.scrollIntoView({block: 'center'})")
            page.screenshot(path=str(ARTIFACTS / "member-form-bad-entry.png"))

            # Corrected, the entry's mark goes and the preview follows again.
            type_and_watch(page, magnitude, "5.3 kip", *_expected_preview("5.3 kip"))
            assert page.locator("text=that is a length, not a force").count() == 0
            assert key_results.inner_text().startswith(("OK ", "NOT OK "))
        finally:
            browser.close()
