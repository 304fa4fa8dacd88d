"""The live preview: the result at a glance, a note when the entries have problems, the sheet.

Each part is one HTML widget whose value is replaced in place (and only when it
changed), so the page does not jump or flash while the user types; the 100-odd
kilobytes of the sheet travel to the browser only when the sheet changed.

The key results go first: they are sent to the browser as soon as the build is done,
and the sheet is printed and sent after them, so a person sees the new utilization
while the sheet is still on its way. The sheet is sent whole: a change of a load
changes about two thirds of it (every step downstream), and in chromium replacing
only the blocks that changed took as long to lay out as replacing all of them.
"""

from __future__ import annotations

import html

import ipywidgets as widgets

from calcsheet.engine import Sheet
from calcsheet.engine.marked_text import rich_text
from calcsheet.pipeline import BuildResult
from calcsheet.render.html import render_fragment

OK_COLOUR = "#1f6f3f"
NOT_OK_COLOUR = "#a11d1d"
STALE_COLOUR = "#6b7280"
STALE_STATUS = "entries have problems"
NOTE_STYLE = "border-left:4px solid #c98a00;background:#fff7e0;padding:0.4em 0.7em;margin:0.3em 0;"
MAX_LISTED_PROBLEMS = 6
CELL_STYLE = "padding:0.1em 0.9em 0.1em 0;text-align:left;vertical-align:top"
KEY_RESULTS_CLASS = "calcsheet-key-results"
SHEET_VIEW_CLASS = "calcsheet-sheet-view"


def governing_sheet(result: BuildResult) -> Sheet:
    """The sheet (station) with the highest utilization: the one the preview shows."""

    def utilization(built) -> float:
        check = built.sheet.governing_check()
        return check.utilization if check is not None else 0.0

    return max(result.sheets, key=utilization).sheet


def _cells(tag: str, *texts: str) -> str:
    return "".join(f"<{tag} style='{CELL_STYLE}'>{text}</{tag}>" for text in texts)


def key_results_html(result: BuildResult, *, stale: bool = False) -> str:
    """Status, governing utilization and where it governs, station by station, and the trace line.

    ``stale``: the entries have problems and ``result`` is the last good build, not
    theirs. The badge then says so, in grey, and the figures are marked as the last
    good result: an "OK" must never stand above entries that have problems.
    """
    if stale:
        status, colour = STALE_STATUS, STALE_COLOUR
    else:
        status = "OK" if result.all_pass else "NOT OK"
        colour = OK_COLOUR if result.all_pass else NOT_OK_COLOUR
    stations = result.job.member.stations
    rows = []
    for index, built in enumerate(result.sheets):
        # Read from the sheet itself: the JSON results (every value in SI) are not
        # needed for the preview and cost a pint conversion per value.
        governing = built.sheet.governing_check()
        if result.job.member.auto_station:  # "auto, z = 12 ft": the station the sheet found
            where = html.escape(built.station)
        else:
            where = "z = " + html.escape(stations[index]) if index < len(stations) else ""
        if governing is None:
            rows.append("<tr>" + _cells("td", where, "", "no checks", "") + "</tr>")
            continue
        location = built.sheet.check_location(governing)
        at = f" at {rich_text(location, 'mathml')}" if location else ""  # marks typeset
        cells = _cells(
            "td",
            where,
            f"<b>{governing.utilization:.3f}</b>",
            html.escape(governing.status),
            html.escape(governing.description) + at,
        )
        rows.append(f"<tr>{cells}</tr>")
    trace = html.escape(result.sheets[0].sheet.trace) if result.sheets else ""
    badge = (
        f"background:{colour};color:white;font-weight:bold;padding:0.15em 0.6em;border-radius:3px"
    )
    faded = ";opacity:0.55" if stale else ""
    before = "last good result: " if stale else ""
    return (
        f'<div style="font-size:0.95em{faded}">'
        f'<span style="{badge}">{status}</span> '
        f"{before}governing utilization <b>{result.governing_utilization:.3f}</b>"
        f" · {html.escape(result.member)}"
        '<table style="border-collapse:collapse;margin-top:0.3em;text-align:left">'
        "<tr>"
        + _cells("th", "station", "utilization", "status", "governs")
        + "</tr>"
        + "".join(rows)
        + "</table>"
        f'<div style="color:#555;font-size:0.85em">{trace}</div>'
        "</div>"
    )


def problems_note_html(problems: list[tuple[str, str]], *, have_result: bool) -> str:
    """The note shown while the entries have problems: what is wrong, and what is shown."""
    if not problems:
        return ""
    count = len(problems)
    shown = "".join(
        f"<li><b>{html.escape(label)}</b>: {html.escape(message)}</li>"
        for label, message in problems[:MAX_LISTED_PROBLEMS]
    )
    more = (
        f"<li>… and {count - MAX_LISTED_PROBLEMS} more</li>" if count > MAX_LISTED_PROBLEMS else ""
    )
    kept = (
        "The preview below is the last good result, not these entries."
        if have_result
        else "There is no sheet yet."
    )
    noun = "entry has a problem" if count == 1 else f"{count} entries have problems"
    return f'<div style="{NOTE_STYLE}">The current {noun}. {kept}<ul>{shown}{more}</ul></div>'


class Preview:
    """Key results, the problems note and the sheet, each updated in place."""

    def __init__(self) -> None:
        self.key_results = widgets.HTML()
        self.key_results.add_class(KEY_RESULTS_CLASS)
        self.note = widgets.HTML()
        self.sheet_view = widgets.HTML(
            layout=widgets.Layout(border="1px solid #d0d4da", padding="0.5em")
        )
        self.sheet_view.add_class(SHEET_VIEW_CLASS)
        self.box = widgets.VBox([self.key_results, self.note, self.sheet_view])
        self._shown_result: BuildResult | None = None
        self._shown_key_results: tuple[BuildResult, bool] | None = None

    def show(self, result: BuildResult | None, problems: list[tuple[str, str]]) -> None:
        """Show ``result`` (the last good one) and the note about ``problems``.

        With problems the key results say "entries have problems" instead of OK or
        NOT OK, since they are not these entries' results.
        """
        _replace(self.note, problems_note_html(problems, have_result=result is not None))
        if result is None:
            _replace(self.key_results, "")
            self._shown_key_results = None
            return
        stale = bool(problems)
        shown = self._shown_key_results
        if shown is None or shown[0] is not result or shown[1] != stale:
            self._shown_key_results = (result, stale)
            _replace(self.key_results, key_results_html(result, stale=stale))
        if result is self._shown_result:
            return  # the sheet of this result is already shown
        self._shown_result = result
        # Printed only now, after the key results went out: they do not wait for it.
        _replace(self.sheet_view, SHEET_FRAME.format(render_fragment(governing_sheet(result))))


# The widget sizes its content to the sheet's narrowest possible layout (a wide table or
# equation), which ran past the preview's column and cut the sheet's right edge off. A
# frame of no intrinsic width (CSS size containment) fills the column instead; what is
# wider than the column scrolls inside the sheet.
SHEET_FRAME = '<div style="contain: inline-size; overflow-x: auto">{}</div>'


def _replace(widget: widgets.HTML, value: str) -> None:
    if widget.value != value:
        widget.value = value
