"""The form in a real JupyterLab: run the demo notebook, change an entry, see the preview follow.

JupyterLab runs on loopback with a token, in a temporary folder holding a copy of the
demo notebook and job (nothing is written into the repository but the screenshots),
with a kernelspec that runs this interpreter. Debian's chromium is driven by the
``playwright`` package with ``executable_path`` set: playwright's own browser
download is not used. Skipped, saying why, when chromium, jupyterlab or playwright is
missing (they are not among the dev dependencies: ``pip install jupyterlab playwright``).

The screenshots go to tests/artifacts/ (member-form.png after a good change,
member-form-bad-entry.png with an entry marked).
"""

from __future__ import annotations

import importlib.util
import re
import secrets
import shutil
import socket
import subprocess
import sys
import time
from collections.abc import Iterator
from pathlib import Path
from urllib.error import URLError
from urllib.request import urlopen

import pytest

from tests.jupyter_env import isolated_jupyter

ROOT = Path(__file__).resolve().parents[2]
ARTIFACTS = ROOT / "tests" / "artifacts"
CHROMIUM = shutil.which("chromium") or shutil.which("chromium-browser")
MISSING = [
    name
    for name, present in (
        ("chromium", CHROMIUM is not None),
        ("jupyterlab", importlib.util.find_spec("jupyterlab") is not None),
        ("playwright", importlib.util.find_spec("playwright") is not None),
    )
    if not present
]
pytestmark = pytest.mark.skipif(
    bool(MISSING), reason=f"needs {', '.join(MISSING)} for the browser test of the form"
)

STARTUP_SECONDS = 120
KEY_RESULTS = "text=governing utilization"


def _free_port() -> int:
    with socket.socket() as probe:
        probe.bind(("127.0.0.1", 0))
        return probe.getsockname()[1]


@pytest.fixture(scope="module")
def lab(tmp_path_factory: pytest.TempPathFactory) -> Iterator[str]:
    """A JupyterLab server on loopback; yields the demo notebook's URL (with the token)."""
    folder = tmp_path_factory.mktemp("lab")
    (folder / "notebooks").mkdir()
    (folder / "examples").mkdir()
    shutil.copy(ROOT / "notebooks" / "member-form-demo.ipynb", folder / "notebooks")
    shutil.copy(ROOT / "examples" / "outrigger.toml", folder / "examples")
    # The notebook asks for "python3": ours runs this interpreter, whatever else is installed.
    env = isolated_jupyter(folder, "python3", "Python 3")
    port, token = _free_port(), secrets.token_hex(16)
    command = [
        sys.executable,
        "-m",
        "jupyterlab",
        "--no-browser",
        "--ip=127.0.0.1",
        f"--port={port}",
        f"--IdentityProvider.token={token}",
        f"--ServerApp.root_dir={folder}",
        "--ServerApp.allow_root=True",  # CI containers run as root
        "--LabApp.extension_manager=readonly",  # no extension index looked up
        "--LabApp.news_url=",
    ]
    log = (folder / "server.log").open("w")
    server = subprocess.Popen(command, cwd=folder, env=env, stdout=log, stderr=subprocess.STDOUT)
    try:
        deadline = time.monotonic() + STARTUP_SECONDS
        while True:
            try:
                urlopen(f"http://127.0.0.1:{port}/api/status?token={token}", timeout=2)
                break
            except (URLError, OSError):
                if server.poll() is not None or time.monotonic() > deadline:
                    log.flush()
                    pytest.fail("JupyterLab did not start:\n" + (folder / "server.log").read_text())
                time.sleep(0.5)
        yield f"http://127.0.0.1:{port}/lab/tree/notebooks/member-form-demo.ipynb?token={token}"
    finally:
        server.terminate()
        try:
            server.wait(timeout=30)
        except subprocess.TimeoutExpired:
            server.kill()
            server.wait(timeout=30)
        log.close()


def _key_results_text(page) -> str:
    return page.locator(KEY_RESULTS).first.inner_text()


def _changed_key_results(page, before: str, seconds: float = 60) -> str:
    # The preview follows after the form's pause (0.3 s) and a rebuild: poll, do not sleep.
    deadline = time.monotonic() + seconds
    while time.monotonic() < deadline:
        text = _key_results_text(page)
        if text != before:
            return text
        page.wait_for_timeout(200)
    pytest.fail(f"the preview did not change within {seconds} s: {before!r}")


def test_the_form_runs_in_jupyterlab_and_the_preview_follows_an_entry(lab: str) -> None:
    from playwright.sync_api import sync_playwright

    ARTIFACTS.mkdir(exist_ok=True)
    with sync_playwright() as playwright:
        browser = playwright.chromium.launch(
            executable_path=CHROMIUM, headless=True, args=["--no-sandbox", "--disable-gpu"]
        )
        try:
            page = browser.new_page(viewport={"width": 1600, "height": 1100})
            page.set_default_timeout(90_000)
            page.goto(lab)
            page.wait_for_selector(".jp-Notebook")
            # Run All does nothing until the kernel is up: wait for the status bar to say so.
            page.wait_for_selector("text=/Python 3 \\| Idle/")
            page.get_by_role("menuitem", name="Run", exact=True).click()
            page.get_by_role("menuitem", name=re.compile(r"^Run All Cells")).click()
            page.wait_for_selector(KEY_RESULTS)
            before = _key_results_text(page)
            assert "OK" in before

            # The first load's magnitude (the second load is given by components).
            magnitude = page.locator(".widget-text:has(label:text-is('magnitude')) input").first
            magnitude.fill("4.8 kip")
            after = _changed_key_results(page, before)
            assert "governing utilization" in after
            page.screenshot(path=str(ARTIFACTS / "member-form.png"))

            magnitude.fill("6.5 in")
            page.wait_for_selector("text=that is a length, not a force")
            page.wait_for_selector("text=The preview below is the last good result")
            # The last good figures stay, under a badge that no longer says OK (issue 16).
            stale = _key_results_text(page)
            assert stale.startswith("entries have problems last good result: ")
            figures = re.sub(r"^(NOT )?OK ", "", after)
            assert stale.removeprefix("entries have problems last good result: ") == figures
            magnitude.evaluate("box => box.scrollIntoView({block: 'center'})")
            page.screenshot(path=str(ARTIFACTS / "member-form-bad-entry.png"))
        finally:
            browser.close()
