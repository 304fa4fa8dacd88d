"""When typing pauses: the sheet is rebuilt at the short pause, a half-typed entry is marked later.

The pauses themselves are the timers' business; these tests call what each timer runs
(``_pause_ended`` for the short pause, ``refresh`` for the longer one) with timers that
never fire on their own (30 s), so nothing here waits or depends on the clock.

The messages checked are the units parser's (``calcsheet.units``): "4.8 k" is not a
force (pint reads "k" as the Boltzmann constant), and the message says so and what is
expected.
"""

from __future__ import annotations

import asyncio
from pathlib import Path

import pytest

from calcsheet.widgets import MemberForm
from calcsheet.widgets.form import DEBOUNCE_SECONDS, PROBLEM_PAUSE_SECONDS

ROOT = Path(__file__).resolve().parents[2]
DEMO = ROOT / "examples" / "outrigger.toml"
MAGNITUDE = "loads[0].magnitude"
NEVER = 30.0  # seconds: longer than any test; the timers do not fire by themselves


@pytest.fixture
def form(tmp_path: Path) -> MemberForm:
    made = MemberForm.from_job_file(DEMO, debounce=NEVER, problem_pause=2 * NEVER, folder=tmp_path)
    made.set_value("check.kind", "allowable stress")  # quick rebuilds: the pauses are tested
    made.set_value("explore.sweep_load", "")
    made.set_value("explore.lightest_in", "")
    made.refresh()
    return made


def test_the_problem_pause_is_longer_than_the_rebuild_pause() -> None:
    assert 0 < DEBOUNCE_SECONDS < PROBLEM_PAUSE_SECONDS


def test_at_the_pause_a_readable_change_is_built_and_shown(form: MemberForm) -> None:
    before, shown = form.results, form.preview.sheet_view.value
    form.set_value(MAGNITUDE, "4.8 kip")
    assert form._timer.pending and form.results is before  # waiting for the pause
    form._pause_ended()
    assert form.results is not before and not form.errors
    assert form.results.job.loads[0].magnitude == "4.8 kip"
    assert form.preview.sheet_view.value != shown
    assert f"{form.results.governing_utilization:.3f}" in form.preview.key_results.value
    assert not form._problem_timer.pending


@pytest.mark.parametrize("half_typed", ["4", "4.8", "4.8 k", "4.8 ki"])
def test_a_half_typed_entry_is_not_marked_at_the_short_pause(
    form: MemberForm, half_typed: str
) -> None:
    before, shown = form.results, form.preview.sheet_view.value
    form.set_value(MAGNITUDE, half_typed)
    form._pause_ended()
    # Nothing flashes between two keys: no mark, no note, the preview as it was.
    assert form.errors == {}
    assert form.fields()[MAGNITUDE].problem is None
    assert form.preview.note.value == ""
    assert form.results is before and form.preview.sheet_view.value == shown
    assert form._problem_timer.pending  # marked after the longer pause, if still so


def test_after_the_longer_pause_the_entry_is_marked_naming_field_value_and_expected(
    form: MemberForm,
) -> None:
    good = form.results
    form.set_value(MAGNITUDE, "4.8 k")
    form._pause_ended()
    form._refresh_quietly()  # what the problem timer runs
    # Beside the box (which still holds the value as typed): what is wrong and expected;
    # in the preview's note: the field by its label and key path.
    message = form.errors[MAGNITUDE]
    assert "not a force; expected a force, such as '6.5 kip'" in message
    assert form.fields()[MAGNITUDE].problem == message
    assert form.fields()[MAGNITUDE].widget.value == "4.8 k"
    assert "<b>magnitude (loads[0].magnitude)</b>: " in form.preview.note.value
    assert "last good result" in form.preview.note.value
    assert form.results is good  # nothing lost: the last good result stays


def test_typing_on_cancels_the_mark_and_the_finished_value_is_built(form: MemberForm) -> None:
    form.set_value(MAGNITUDE, "4.8 k")
    form._pause_ended()
    assert form._problem_timer.pending
    form.set_value(MAGNITUDE, "4.8 kip")  # the next key: still being typed
    assert not form._problem_timer.pending and form._timer.pending
    form._pause_ended()
    assert not form.errors and form.results.job.loads[0].magnitude == "4.8 kip"


def test_a_fix_at_the_short_pause_clears_an_earlier_mark(form: MemberForm) -> None:
    form.set_value(MAGNITUDE, "6.5 in")
    form.refresh()
    assert MAGNITUDE in form.errors
    form.set_value(MAGNITUDE, "6.5 kip")
    form._pause_ended()
    assert form.errors == {} and form.fields()[MAGNITUDE].problem is None
    assert form.preview.note.value == ""


def test_refresh_runs_at_once_and_drops_both_waits(form: MemberForm) -> None:
    form.set_value(MAGNITUDE, "4.8 k")
    form._pause_ended()
    form.refresh()
    assert not form._timer.pending and not form._problem_timer.pending
    assert MAGNITUDE in form.errors


# -- the build done ahead after opening ----------------------------------------------------


def test_outside_a_kernel_nothing_is_built_ahead(tmp_path: Path) -> None:
    form = MemberForm.from_job_file(DEMO, folder=tmp_path)
    assert form._warm_up is None


def test_in_a_kernel_the_job_is_built_ahead_until_the_first_change(tmp_path: Path) -> None:
    async def open_and_change() -> tuple[bool, bool]:
        # Inside a running loop, as in a Jupyter kernel; the loop never reaches the call.
        form = MemberForm.from_job_file(DEMO, debounce=NEVER, folder=tmp_path)
        waiting = form._warm_up is not None
        form.set_value(MAGNITUDE, "4.8 kip")
        form._timer.cancel()
        return waiting, form._warm_up is None

    waiting, dropped = asyncio.run(open_and_change())
    assert waiting and dropped


def test_the_build_ahead_shows_nothing_and_keeps_the_result(form: MemberForm) -> None:
    result, sheet = form.results, form.preview.sheet_view.value
    form._build_ahead()
    assert form.results is result and form.preview.sheet_view.value == sheet
    form.set_value(MAGNITUDE, "6.5 in")
    form.refresh()
    form._build_ahead()  # entries with problems: nothing to build ahead
    assert form.results is result and MAGNITUDE in form.errors
