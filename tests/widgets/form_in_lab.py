"""The member form in a real JupyterLab, driven by chromium: for the browser test and the bench.

:func:`lab_server` runs JupyterLab on loopback with a token, in a folder holding a copy
of the demo notebook and job, with a kernelspec that runs this interpreter.
:func:`launch_chromium` starts Debian's chromium through playwright (``executable_path``:
playwright's own browser download is never used) with background networking off.
:func:`open_demo_form` runs the notebook and waits for the form's preview.

:func:`type_and_watch` types into an entry as a person does, a key at a time, and
watches the preview from inside the page: the times are the page's own clock
(``performance.now()``), from the last keystroke's ``input`` event to the first frame
in which the key results, and then the sheet, show exactly the result a build of the
new entries gives (their text compared with the expected HTML parsed in the page).
The browser test asserts only that they follow; ``bench/form_browser.py`` reports the
times. Nothing here needs pytest.
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
from contextlib import contextmanager
from dataclasses import dataclass
from pathlib import Path
from typing import Any
from urllib.error import URLError
from urllib.request import urlopen

from calcsheet.widgets.preview import KEY_RESULTS_CLASS, SHEET_VIEW_CLASS
from tests.jupyter_env import isolated_jupyter

ROOT = Path(__file__).resolve().parents[2]
CHROMIUM = shutil.which("chromium") or shutil.which("chromium-browser")
STARTUP_SECONDS = 120
# Chromium talks to nothing but the loopback server: no updates, sync, or field trials.
CHROMIUM_FLAGS = [
    "--no-sandbox",  # CI containers run as root
    "--disable-gpu",
    "--disable-background-networking",
    "--disable-component-update",
    "--disable-sync",
    "--disable-default-apps",
    "--disable-extensions",
    "--disable-field-trial-config",
    "--no-first-run",
    "--no-default-browser-check",
    "--metrics-recording-only",
]
KEY_RESULTS_SELECTOR = f".{KEY_RESULTS_CLASS}"
SHEET_SELECTOR = f".{SHEET_VIEW_CLASS}"
# A quick typist: about 8 keys a second, a key every 120 ms (from memory). The form's
# pause (calcsheet.widgets.form.DEBOUNCE_SECONDS) is longer, so typing does not rebuild.
TYPING_DELAY_MS = 120


def missing_tools() -> list[str]:
    """What the browser runs need and this machine lacks (empty: all there)."""
    wanted = (
        ("chromium", CHROMIUM is not None),
        ("jupyterlab", importlib.util.find_spec("jupyterlab") is not None),
        ("playwright", importlib.util.find_spec("playwright") is not None),
    )
    return [name for name, present in wanted if not present]


def _free_port() -> int:
    with socket.socket() as probe:
        probe.bind(("127.0.0.1", 0))
        return probe.getsockname()[1]


@contextmanager
def lab_server(folder: Path) -> Iterator[str]:
    """JupyterLab on loopback serving ``folder``; yields the demo notebook's URL (with the token).

    The demo notebook and its job are copied into ``folder``: nothing is written into
    the repository. Raises RuntimeError with the server's log if it does not start.
    """
    (folder / "notebooks").mkdir(exist_ok=True)
    (folder / "examples").mkdir(exist_ok=True)
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
    log_path = folder / "server.log"
    log = log_path.open("w")
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
                    raise RuntimeError(
                        "JupyterLab did not start:\n" + log_path.read_text()
                    ) from None
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


def launch_chromium(playwright: Any) -> Any:
    """Debian's chromium, headless, through playwright (never playwright's own download)."""
    if CHROMIUM is None:
        raise RuntimeError("chromium is not installed")
    return playwright.chromium.launch(executable_path=CHROMIUM, headless=True, args=CHROMIUM_FLAGS)


def open_demo_form(browser: Any, url: str) -> Any:
    """A page showing the demo notebook with its cells run: the form and its preview."""
    page = browser.new_page(viewport={"width": 1600, "height": 1100})
    page.set_default_timeout(90_000)
    page.goto(url)
    page.wait_for_selector(".jp-Notebook")
    # Run All does nothing until the kernel is up: wait for the status bar to say so.
    page.wait_for_selector("text=/Python 3 \\| Idle/")
    page.get_by_role("menuitem", name="Run", exact=True).click()
    page.get_by_role("menuitem", name=re.compile(r"^Run All Cells")).click()
    page.wait_for_selector(f"{KEY_RESULTS_SELECTOR} >> text=governing utilization")
    page.wait_for_selector(f"{SHEET_SELECTOR} .calcsheet")
    return page


def entry_box(page: Any, label: str) -> Any:
    """The first text box labelled ``label`` (e.g. the first load's "magnitude")."""
    return page.locator(f".widget-text:has(label:text-is('{label}')) input").first


@dataclass(frozen=True)
class ChangeTiming:
    """Milliseconds from the last keystroke to the first frame showing the new result."""

    key_results_ms: float
    sheet_ms: float


# Runs in the page. Watches the preview from before the first key; a view counts as
# showing the new result when its text is that of the expected HTML (the HTML a build
# of the new entries gives), and the time is taken at the next frame (after the
# browser has laid the change out), measured from the last keystroke.
_WATCH = """
([keyResults, sheet, timeoutMs, keySelector, sheetSelector]) => {
  const textOf = (html) => {
    const holder = document.createElement("div");
    holder.innerHTML = html;
    return holder.textContent;
  };
  const views = {
    keyResults: [document.querySelector(keySelector), textOf(keyResults)],
    sheet: [document.querySelector(sheetSelector), textOf(sheet)],
  };
  const watch = {lastKey: null, shown: {}, painted: {}, problem: null};
  for (const [name, [view, expected]] of Object.entries(views)) {
    if (view === null) watch.problem = `no ${name} view in the page`;
    else if (view.textContent === expected) watch.problem = `${name} already shows the result`;
  }
  // Each view is looked at only when something in it changed: the page does no other work.
  const observers = Object.entries(views).map(([name, [view, expected]]) => {
    const observer = new MutationObserver(() => {
      const now = performance.now();
      if (watch.lastKey === null || name in watch.shown || view.textContent !== expected) return;
      watch.shown[name] = now;
      // After the frame that lays the change out: a task queued from the frame callback.
      requestAnimationFrame(() => setTimeout(() => { watch.painted[name] = performance.now(); }));
    });
    if (view !== null) {
      observer.observe(view, {childList: true, subtree: true, characterData: true});
    }
    return observer;
  });
  watch.done = new Promise((resolve) => {
    const started = performance.now();
    const poll = () => {
      const finished = Object.keys(watch.painted).length === 2;
      if (finished || watch.problem || performance.now() - started > timeoutMs) {
        observers.forEach((observer) => observer.disconnect());
        resolve();
      } else {
        setTimeout(poll, 100);
      }
    };
    poll();
  });
  window.__calcsheetWatch = watch;
  return watch.problem;
}
"""

# Every key typed into the box notes the time in the current watch (one listener a box).
_MARK_KEYS = """
(box) => {
  if (box.dataset.calcsheetTimed) return;
  box.dataset.calcsheetTimed = "yes";
  box.addEventListener("input", () => { window.__calcsheetWatch.lastKey = performance.now(); });
}
"""

_RESULT = """
async () => {
  const watch = window.__calcsheetWatch;
  await watch.done;
  return {lastKey: watch.lastKey, painted: watch.painted, problem: watch.problem};
}
"""


def type_and_watch(
    page: Any,
    box: Any,
    text: str,
    key_results_html: str,
    sheet_html: str,
    *,
    typing_delay_ms: float = TYPING_DELAY_MS,
    timeout_ms: float = 60_000,
) -> ChangeTiming:
    """Replace the entry in ``box`` by typing ``text``; wait until the preview shows the result.

    ``key_results_html`` and ``sheet_html`` are what the preview's two views must show
    for the new entries (from a build of them outside the page). Raises RuntimeError
    if they do not within ``timeout_ms``, or if they already showed it before typing.
    """
    problem = page.evaluate(
        _WATCH, [key_results_html, sheet_html, timeout_ms, KEY_RESULTS_SELECTOR, SHEET_SELECTOR]
    )
    if problem:
        raise RuntimeError(problem)
    box.evaluate(_MARK_KEYS)
    box.click()
    box.press("Control+a")
    box.press_sequentially(text, delay=typing_delay_ms)
    found = page.evaluate(_RESULT)
    if found["problem"]:
        raise RuntimeError(found["problem"])
    late = [name for name in ("keyResults", "sheet") if name not in found["painted"]]
    if late:
        raise RuntimeError(f"the preview's {' and '.join(late)} did not show the new result")
    painted = found["painted"]
    return ChangeTiming(
        key_results_ms=painted["keyResults"] - found["lastKey"],
        sheet_ms=painted["sheet"] - found["lastKey"],
    )
