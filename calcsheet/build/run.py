"""Build a job: the member sheet at each station, then PDF, HTML and JSON on disk.

File names carry the member, the revision and (with several stations) the
station, so a new revision never overwrites the files of an earlier one. Every
output of a job is built in memory before the first is written, and each file is
written to a temporary name and renamed into place: a failed build leaves the
previous files as they were.
"""

from __future__ import annotations

import json
import re
from dataclasses import dataclass, field
from functools import cached_property
from pathlib import Path

from calcsheet.build.model import MemberModel, member_model
from calcsheet.build.results import sheet_results
from calcsheet.build.stamp import inputs_hash, stamp_text
from calcsheet.calcs import member_sheet
from calcsheet.engine import Sheet
from calcsheet.errors import CalcsheetError, InputError
from calcsheet.job import Job, JobError

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

    def summary(self) -> str:
        """``OA-1: OK, utilization 0.507 (…, at point 6 …) [inputs 3fa9…]``."""
        governing = [
            (built.sheet, built.sheet.governing_check())
            for built in self.sheets
            if built.sheet.governing_check() is not None
        ]
        status = "OK" if self.all_pass else "NOT OK"
        if not governing:
            return f"{self.member}: {status} (no checks) [inputs {self.hash}]"
        sheet, check = max(governing, key=lambda pair: pair[1].worst_utilization)
        at = sheet.check_location(check)
        where = f", at {at}" if at else ""
        case = f", under {check.cases.case}" if check.cases is not None else ""
        return (
            f"{self.member}: {status}, utilization {check.worst_utilization:.3f} "
            f"({check.description}{where}{case}) [inputs {self.hash}]"
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
    """The job's sheets (one per station), stamped, without writing anything."""
    model = member_model(job, source=source)
    stamp = stamp_text(job)
    base = safe_stem(job.output.stem or job.member.name)
    revision = safe_stem(model.title_block.revision, fallback="0")
    sheets = []
    for index, station in enumerate(model.stations):
        sheet = _member_sheet(job, model, station, index, source)
        sheet.stamp = stamp
        stem = f"{base}-rev{revision}"
        if len(model.stations) > 1:
            stem += "-z" + safe_stem(f"{station.magnitude:g}{station.units:~}")
        sheets.append(BuiltSheet(sheet, stem))
    return BuildResult(job, job.member.name, inputs_hash(job), sheets)


def _member_sheet(job: Job, model: MemberModel, station, index: int, source: str) -> Sheet:
    try:
        sheet = member_sheet(
            model.section,
            model.loads,
            length=model.length,
            station=station,
            Fy=model.Fy,
            Fy_reference=model.Fy_source,
            title=job.sheet.title,
            title_block=model.title_block,
            units=job.sheet.units,
            design=model.design,
            load_types=model.load_types,
        )
    except (ArithmeticError, ValueError) as error:
        if isinstance(error, InputError):
            raise _placed(source, index, error) from None
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
        sheet.add_basis("Notes on the inputs", *model.notes)
    return sheet


def _placed(source: str, index: int, error: InputError) -> JobError:
    """The job error for a calc input error, at the key path it most likely comes from.

    A station with nothing beyond it is the station's problem; anything else (a
    section the chosen standard does not cover, a sweep of an unknown load) is
    reported against the table it comes from.
    """
    if error.field.startswith("station"):
        path = f"member.stations[{index}]"
    elif error.field.startswith("explore"):
        path = "explore"
    else:
        path = "check"
    return JobError(source, [(path, str(error))])


def write_outputs(result: BuildResult, folder: Path) -> list[Path]:
    """Render every output of the job, then write each atomically; returns the paths."""
    # Imported here: rendering and the PDF engine are only needed when writing.
    from calcsheet.export.files import make_folder, pdf_bytes, write_all_atomically
    from calcsheet.render.html import render_html

    formats = result.job.output.formats
    rendered: list[tuple[Path, bytes]] = []
    for built in result.sheets:
        if "pdf" in formats:
            data = pdf_bytes(built.sheet, paper=result.job.output.paper)
            rendered.append((folder / f"{built.stem}.pdf", data))
        if "html" in formats:
            rendered.append((folder / f"{built.stem}.html", render_html(built.sheet).encode()))
        if "json" in formats:
            text = json.dumps(built.results, indent=2, ensure_ascii=False, sort_keys=False)
            rendered.append((folder / f"{built.stem}.json", (text + "\n").encode()))
    make_folder(folder)
    write_all_atomically(rendered)
    written = [path for path, _ in rendered]
    for built in result.sheets:
        built.paths = [path for path in written if path.stem == built.stem]
    return written
