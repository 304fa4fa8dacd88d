"""Build a job: the member sheet at each station, then PDF, HTML and JSON on disk.

File names carry the member, the revision and (with several stations) the
station, so a new revision never overwrites the files of an earlier one. Files
already written for the revision are replaced only by the same inputs (the inputs
hash in their JSON or HTML): changed inputs need a new revision, or an explicit
``replace_issued``. Every output of a job is built in memory before the first is
written, and each file is written to a temporary name and renamed into place: a
failed build leaves the previous files as they were. Writing holds the output
folder's lock, so a second build into the folder waits for the first.
"""

from __future__ import annotations

import contextlib
import json
import re
from collections.abc import Callable, Iterator
from dataclasses import dataclass, field
from functools import cached_property
from pathlib import Path
from typing import Any

from calcsheet.calcs import member_sheet
from calcsheet.engine import Sheet, escape_marks
from calcsheet.engine.marked_text import plain_text
from calcsheet.errors import CalcsheetError, InputError
from calcsheet.job import Job, JobError
from calcsheet.pipeline.model import MemberModel, member_model
from calcsheet.pipeline.results import sheet_results
from calcsheet.pipeline.trace import hash_in_trace, inputs_hash, trace_text

_UNSAFE = re.compile(r"[^A-Za-z0-9._-]+")
MAX_STEM = 80


def safe_stem(text: str, *, fallback: str = "calc") -> str:
    """A file name part made of letters, digits, '.', '_' and '-' only; never a path."""
    stem = _UNSAFE.sub("-", str(text)).strip(".-")[:MAX_STEM].strip(".-")
    return stem or fallback


@dataclass
class BuiltSheet:
    """One sheet of a job (one station) and what it was written as."""

    sheet: Sheet
    stem: str
    paths: list[Path] = field(default_factory=list)
    station: str = ""  # "z = 30 in" when the job has several stations
    typst: str = ""  # the Typst markup its PDF was compiled from (kept for a calc package)

    @cached_property
    def results(self) -> dict:
        """The JSON results (every value in display and SI units): made when first asked."""
        return sheet_results(self.sheet)


@dataclass
class BuildResult:
    """The sheets of a job, the inputs hash, and a one-line summary for the terminal."""

    job: Job
    member: str
    hash: str
    sheets: list[BuiltSheet]
    source: str = "job"
    stem: str = ""  # the start of every output's file name: member (or output.stem), revision

    @property
    def all_pass(self) -> bool:
        return all(check.passes for built in self.sheets for check in built.sheet.checks)

    @property
    def governing_utilization(self) -> float:
        values = [
            check.worst_utilization
            for built in self.sheets
            for check in built.sheet.checks
            if check.utilization is not None
        ]
        return max(values, default=0.0)

    def _governing(self) -> tuple[BuiltSheet, Any] | None:
        governing = [
            (built, built.sheet.governing_check())
            for built in self.sheets
            if built.sheet.governing_check() is not None
        ]
        return max(governing, key=lambda pair: pair[1].worst_utilization, default=None)

    def governing_text(self) -> str:
        """The governing check, where and under which case it governs (and the station)."""
        found = self._governing()
        if found is None:
            return ""
        built, check = found
        at = plain_text(built.sheet.check_location(check))  # marked words, as plain text
        where = f", at {at}" if at else ""
        # The case names its own station when the check was scanned along the member.
        named = check.cases is not None and check.cases.station is not None
        if built.station and not named:
            where += f", station {built.station}"
        elif built.station and built.station.startswith("auto"):
            where += ", station auto"
        case = f", under {check.cases.case}" if check.cases is not None else ""
        return f"{check.description}{where}{case}"

    def summary(self) -> str:
        """``OA-1: OK, utilization 0.507 (…, at point 6 …) [inputs 3fa9…]``."""
        status = "OK" if self.all_pass else "NOT OK"
        found = self._governing()
        if found is None:
            return f"{self.member}: {status} (no checks) [inputs {self.hash}]"
        return (
            f"{self.member}: {status}, utilization {found[1].worst_utilization:.3f} "
            f"({self.governing_text()}) [inputs {self.hash}]"
        )


def output_folder(job: Job, job_folder: Path, override: Path | None = None) -> Path:
    """Where outputs go: ``override`` (the command line's), or output.folder in the job folder."""
    if override is not None:
        return Path(override)
    if any(ord(character) < 32 or character == "\x7f" for character in job.output.folder):
        raise JobError(
            "job", [("output.folder", "control characters are not allowed in a folder name")]
        )
    folder = Path(job.output.folder)
    if folder.is_absolute() or ".." in folder.parts:
        raise JobError(
            "job",
            [
                (
                    "output.folder",
                    f"{job.output.folder!r} must be a folder inside the job's folder "
                    "(no absolute path, no '..'); choose another place on the command line",
                )
            ],
        )
    return job_folder / folder


def build_sheets(job: Job, *, source: str = "job") -> BuildResult:
    """The job's sheets (one per station), each with its trace line, without writing anything."""
    model = member_model(job, source=source)
    trace = trace_text(job)
    base = safe_stem(job.output.stem or job.member.name)
    revision = safe_stem(model.title_block.revision, fallback="0")
    sheets = []
    for index, station in enumerate(model.stations):
        sheet = _member_sheet(job, model, station, index, source)
        sheet.trace = trace
        stem = f"{base}-rev{revision}"
        label = ""
        if model.auto_station:
            label = _found_station(sheet)
        elif len(model.stations) > 1:
            stem += "-z" + safe_stem(f"{station.magnitude:g}{station.units:~}")
            label = f"z = {station.magnitude:g} {station.units:~}"
        sheets.append(BuiltSheet(sheet, stem, station=label))
    return BuildResult(
        job, job.member.name, inputs_hash(job), sheets, source, stem=f"{base}-rev{revision}"
    )


def _member_sheet(job: Job, model: MemberModel, station, index: int, source: str) -> Sheet:
    try:
        sheet = member_sheet(
            model.section,
            model.loads,
            length=model.length,
            Fy=model.Fy,
            Fy_reference=model.Fy_source,
            title=job.sheet.title,
            title_block=model.title_block,
            units=job.sheet.units,
            design=model.design,
            load_types=model.load_types,
            detail=job.sheet.detail,
            **model.sheet_arguments(station),  # the station and the frame options
        )
    except (ArithmeticError, ValueError) as error:
        if isinstance(error, InputError):
            raise _placed(source, None if model.auto_station else index, error) from None
        # Numbers beyond what floating point holds (a section of 1e-320 in, a load of
        # 1e308 kip): said plainly, with the job's name, instead of a traceback.
        raise JobError(
            source,
            [("", f"the values give numbers out of range ({type(error).__name__}: {error})")],
        ) from None
    except CalcsheetError as error:
        # A step that cannot be evaluated for these values (a capacity of zero...).
        raise JobError(source, [("", str(error))]) from None
    for revision in model.revisions:
        sheet.add_revision(revision.mark, revision.date, revision.description, revision.by)
    if model.notes:  # unusual but possible inputs (a long bracket), for the checker
        # The notes quote load names as typed: shown literally, never as symbol marks.
        sheet.add_basis("Notes on the inputs", *(escape_marks(note) for note in model.notes))
    return sheet


def _found_station(sheet: Sheet) -> str:
    """``auto, z = 0 in``: the station the sheet found itself (its input ``z_s``)."""
    try:
        found = sheet.value("z_s")
    except KeyError:
        return "auto"
    return f"auto, z = {found.magnitude:g} {found.units:~}"


def _placed(source: str, index: int | None, error: InputError) -> JobError:
    """The job error for a calc input error, at the key path it most likely comes from.

    A station with nothing beyond it is the station's problem; anything else (a
    section the chosen standard does not cover, a sweep of an unknown load) is
    reported against the table it comes from. ``index`` is None for the station
    "auto" found.
    """
    if error.field.startswith("station"):
        path = "member.stations" if index is None else f"member.stations[{index}]"
    elif error.field.startswith("explore"):
        path = "explore"
    else:
        path = "check"
    return JobError(source, [(path, str(error))])


OUTPUT_SUFFIXES = (".pdf", ".html", ".json")
REPLACE_ISSUED_COMMAND = "calcsheet build --replace-issued"


def write_outputs(
    result: BuildResult,
    folder: Path,
    *,
    replace_issued: bool = False,
    waiting: Callable[[str], None] | None = None,
) -> list[Path]:
    """Render every output of the job, then write each atomically; returns the paths.

    Files already in ``folder`` under the same names (same member, revision and
    station) are replaced only if they were built from the same inputs, or with
    ``replace_issued``; otherwise :class:`JobError` asks for a new revision and
    nothing is written. ``waiting`` is told when another build holds the folder.
    With ``[output] package = true`` the job's calc package is written with its
    sheets, in the same atomic set and under the same rule.
    """
    # Imported here: rendering and the PDF engine are only needed when writing.
    from calcsheet.export.files import folder_lock, make_folder, write_all_atomically

    formats = result.job.output.formats
    rendered: list[tuple[Path, bytes]] = []
    for built in result.sheets:
        with _each_figure_drawn_once(built.sheet):
            rendered += _rendered(built, folder, formats, result.job.output.paper)
    package = None
    if result.job.output.package:
        from calcsheet.pipeline.package import job_package  # it sets the sheets' markup

        package = job_package(result, folder)
        rendered += package.files
    make_folder(folder)
    # The check and the writes under one lock: a build that waited sees what the other wrote.
    with folder_lock(folder, waiting=waiting):
        if not replace_issued:
            refuse_replacing_issued(result, folder)
            if package is not None:
                package.refuse_replacing(
                    folder, source=result.source, command=REPLACE_ISSUED_COMMAND
                )
        write_all_atomically(rendered)
    written = [path for path, _ in rendered]
    for built in result.sheets:
        built.paths = [path for path in written if path.stem == built.stem]
    return written


def _rendered(
    built: BuiltSheet, folder: Path, formats: list[str], paper: str
) -> list[tuple[Path, bytes]]:
    """The sheet's outputs in ``formats`` as (path, bytes), nothing written yet."""
    # Imported here: rendering and the PDF engine are only needed when writing.
    from concurrent.futures import ThreadPoolExecutor

    from calcsheet.export.files import compile_pdf
    from calcsheet.render.typst import render_typst

    rendered = []
    # The PDF engine works in a thread of its own (it lets go of the interpreter) while
    # the HTML and JSON are made: a cold build otherwise waited on each in turn.
    with ThreadPoolExecutor(max_workers=1) as engine:
        if "pdf" in formats:
            built.typst = render_typst(built.sheet, paper=paper)
            pdf = engine.submit(compile_pdf, built.typst)
        from calcsheet.render.html import render_html  # while the PDF compiles

        if "html" in formats:
            rendered.append((folder / f"{built.stem}.html", render_html(built.sheet).encode()))
        if "json" in formats:
            text = json.dumps(built.results, indent=2, ensure_ascii=False, sort_keys=False)
            rendered.append((folder / f"{built.stem}.json", (text + "\n").encode()))
        if "pdf" in formats:
            rendered.insert(0, (folder / f"{built.stem}.pdf", pdf.result()))
    return rendered


@contextlib.contextmanager
def _each_figure_drawn_once(sheet: Sheet) -> Iterator[None]:
    """While its outputs are rendered, a sheet's drawings are made once, not per output.

    A figure drawn from the sheet's values is drawn again by every view (the PDF's, the
    HTML's); the values cannot change while the outputs are rendered, so the PDF's
    drawing serves the HTML too (a tenth of a member's time in a batch went to drawing
    each figure twice).
    """
    drawn: dict[int, str] = {}
    draw = sheet.figure_svg

    def figure_svg(figure: Any) -> str:
        if id(figure) not in drawn:
            drawn[id(figure)] = draw(figure)
        return drawn[id(figure)]

    sheet.figure_svg = figure_svg  # type: ignore[method-assign]  # this sheet, this block only
    try:
        yield
    finally:
        del sheet.figure_svg


def issued_hash(folder: Path, stem: str) -> str | None:
    """The inputs hash of the files already written as ``stem`` in ``folder``.

    Read from the JSON's trace (``stamp`` in files of calcsheet 0.1.0), else from the
    HTML's footer (the PDF's text is compressed). ``""`` when files exist but none tells
    its hash; ``None`` when no file of that name exists.
    """
    existing = [folder / f"{stem}{suffix}" for suffix in OUTPUT_SUFFIXES]
    if not any(path.is_file() for path in existing):
        return None
    json_path, html_path = folder / f"{stem}.json", folder / f"{stem}.html"
    try:
        written = json.loads(json_path.read_text(encoding="utf-8"))
        trace = written.get("trace", written.get("stamp", ""))
        found = hash_in_trace(trace if isinstance(trace, str) else "")
        if found:
            return found
    except (OSError, ValueError, AttributeError):
        pass  # no JSON, or not one of ours: try the HTML
    try:
        page = html_path.read_text(encoding="utf-8")
    except (OSError, ValueError):
        return ""
    footer = re.search(r"<footer>(.*?)</footer>", page, re.DOTALL)
    return hash_in_trace(footer.group(1) if footer else "") or ""


def refuse_replacing_issued(result: BuildResult, folder: Path) -> None:
    """Raise :class:`JobError` if writing would replace files built from other inputs."""
    revision = result.sheets[0].sheet.title_block.revision if result.sheets else "0"
    refuse_replacing(
        folder,
        [built.stem for built in result.sheets],
        result.hash,
        revision=revision,
        source=result.source,
        command=REPLACE_ISSUED_COMMAND,
    )


def refuse_replacing(
    folder: Path, stems: list[str], inputs: str, *, revision: str, source: str, command: str
) -> None:
    """Raise :class:`JobError` if files ``stems``.* in ``folder`` came from inputs other
    than ``inputs`` (a hash) under the same revision: a sheet's files, or a calc package's."""
    problems = []
    for stem in stems:
        found = issued_hash(folder, stem)
        if found is None or found == inputs:
            continue
        if found:
            why = (
                f"{folder / stem}.* were built from other inputs "
                f"(inputs {found} then, {inputs} now) under the same revision {revision!r}"
            )
        else:
            why = (
                f"{folder / stem}.* exist and do not say which inputs built them "
                "(no JSON or HTML of theirs)"
            )
        problems.append(
            (
                "revisions",
                f"{why}: add a [[revisions]] entry with a new mark to issue the change, "
                f"or replace the issued files on purpose ({command})",
            )
        )
    if problems:
        raise JobError(source, problems)


@dataclass(frozen=True)
class PackageEntry:
    """What a calc package needs of one member: its sheets' markup and its title block.

    Made in the process that built the member (a batch worker, or the build of a job that
    asks for its package), so the package is set
    from the very markup the member's own PDF was compiled from, without building again.
    """

    markups: tuple[str, ...]  # one per sheet (station), in order
    title_block: tuple[tuple[str, str], ...]  # (field name, text), as TitleBlock declares
    issued: str  # the date the sheets are issued on (ISO), for the package's own date
    inputs: str  # the member's inputs hash
    paper: str


def package_entry(result: BuildResult) -> PackageEntry:
    """The package's part of a built job: its sheets' markup and its title block."""
    from dataclasses import asdict

    from calcsheet.render.typst import render_typst
    from calcsheet.render.view import issue_date  # rendering only where a package is made

    first = result.sheets[0].sheet
    paper = result.job.output.paper
    return PackageEntry(
        # The markup its PDF was compiled from; rendered here if the job writes no PDF.
        markups=tuple(
            built.typst or render_typst(built.sheet, paper=paper) for built in result.sheets
        ),
        title_block=tuple((key, str(value)) for key, value in asdict(first.title_block).items()),
        issued=issue_date(first).isoformat(),
        inputs=result.hash,
        paper=paper,
    )
