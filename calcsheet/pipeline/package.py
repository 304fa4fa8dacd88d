"""A calc package: one PDF/A-2b of a cover, the contents, a summary and the sheets it holds,
numbered through ("Sheet 14 of 63"), each sheet with its own title block; and a JSON
beside it saying what is in it and which inputs built it.

One procedure sets every package: a batch's (a part per member, ``calcsheet batch
--package``) and a job's (a part per station, ``[output] package = true``). The callers
say what the parts are; this module renders the files and guards issued ones.
"""

# Why a package is ONE Typst document (the parts' markup set one after another) rather
# than the sheets' PDFs joined: one document has one PDF/A-2b metadata stream and one
# bookmark outline, and Typst's page counter numbers the sheets through the package by
# itself; PDFs joined afterwards would need a PDF library at run time and their PDF/A
# metadata and outlines rebuilt by hand.

from __future__ import annotations

import dataclasses
import datetime
import hashlib
import json
from collections.abc import Sequence
from dataclasses import dataclass
from pathlib import Path
from typing import Any

from calcsheet.pipeline.run import (
    BuildResult,
    BuiltSheet,
    PackageEntry,
    package_entry,
    refuse_replacing,
    safe_stem,
)

PACKAGE_LABEL = "calcsheet-member-{index}"
PACKAGE_SUFFIXES = (".pdf", ".json")


@dataclass(frozen=True)
class PackagePart:
    """One line of a package's contents (a member of a batch, a station of a job) and the
    sheets' markup it stands for; no markup: listed, with ``note`` saying why it is not in."""

    name: str
    section: str
    utilization: float | None
    status: str  # "OK", "NOT OK", "SKIPPED (bad input)"...
    note: str  # the governing check, or why the part is left out
    inputs: str | None  # the inputs hash its sheets were built from
    markups: tuple[str, ...] = ()  # one per sheet, in order


@dataclass(frozen=True)
class PackageSummary:
    """The summary table after the contents, and what the cover and contents call things."""

    heading: str  # "Batch summary"
    columns: list[str]
    rows: list[list[str]]
    counts: str  # "3 members: 1 pass, 1 fail, 1 skipped"
    part_heading: str  # the contents' first column: "Member", "Station"
    holds: tuple[str, str]  # the cover's line on what is inside: ("Members", "2 of 3 (x.csv)")


@dataclass(frozen=True)
class RenderedPackage:
    """A package's files rendered in memory, not yet written."""

    files: list[tuple[Path, bytes]]  # the PDF, then the JSON
    stem: str
    inputs: str  # the package's own inputs hash (calc number, revision, every part's)
    revision: str

    @property
    def paths(self) -> tuple[Path, ...]:
        return tuple(path for path, _ in self.files)

    def refuse_replacing(self, folder: Path, *, source: str, command: str) -> None:
        """Raise :class:`JobError` if an issued package of this name came from other inputs."""
        refuse_replacing(
            folder, [self.stem], self.inputs, revision=self.revision, source=source, command=command
        )


def shared_value(entries: Sequence[PackageEntry], key: str) -> str:
    """The title-block value every entry shares, else the distinct values joined."""
    values = [dict(entry.title_block).get(key, "") for entry in entries]
    distinct = list(dict.fromkeys(value for value in values if value))
    return ", ".join(distinct)


def render_package(
    parts: Sequence[PackagePart],
    entries: Sequence[PackageEntry],
    folder: Path,
    *,
    source: str,
    calc_number: str,
    summary: PackageSummary,
    manifest_members: list[dict[str, Any]],
    stem: str = "",
) -> RenderedPackage:
    """The calc package's PDF and JSON, in memory.

    ``entries``: the title blocks of the built sheets (at least one); the package prints the
    values they share. ``stem``: the files' name (default: the calc number and revision).
    The package's inputs hash covers the calc number, the revision and every part's name,
    status and inputs, so a changed part changes it.
    """
    from calcsheet import __version__
    from calcsheet.engine import CAUTIONS
    from calcsheet.export.files import compile_pdf, package_markup
    from calcsheet.render.typst import typst_paper

    revision = shared_value(entries, "revision") or "0"
    fingerprint = "\n".join(
        [calc_number, revision]
        + [f"{part.name}\t{part.status}\t{part.inputs or ''}" for part in parts]
    )
    inputs = hashlib.sha256(fingerprint.encode("utf-8")).hexdigest()[:12]
    trace = f"inputs {inputs} · rev. {revision}"
    built = [part for part in parts if part.markups]
    labels = {id(part): PACKAGE_LABEL.format(index=index) for index, part in enumerate(built)}
    contents = [
        {
            "name": part.name,
            "section": part.section,
            "utilization": f"{part.utilization:.3f}" if part.utilization is not None else "",
            "status": part.status,
            "note": part.note,
            "label": labels.get(id(part), ""),
        }
        for part in parts
    ]
    members = [
        {"name": part.name, "label": labels[id(part)], "markups": part.markups} for part in built
    ]
    project = shared_value(entries, "project")
    prepared_by = shared_value(entries, "prepared_by")
    title_items = [
        ("Project", project),
        ("Project no.", shared_value(entries, "project_number")),
        ("Calc no.", calc_number),
        ("Revision", revision),
        summary.holds,
        ("Prepared by", prepared_by),
        ("Checked by", shared_value(entries, "checked_by")),
        ("Checked on", shared_value(entries, "checked_date")),
    ]
    markup = package_markup(
        {
            "paper": typst_paper(entries[0].paper),
            "title": f"Calc package {calc_number}",
            "title_items": title_items,
            "project": project,
            "project_number": shared_value(entries, "project_number"),
            "calc_number": calc_number,
            "revision": revision,
            "tool_version": __version__,
            "trace": trace,
            "cautions": CAUTIONS,
            "part_heading": summary.part_heading,
            "contents": contents,
            "summary_heading": summary.heading,
            "counts": summary.counts + ".",
            "summary_columns": summary.columns,
            "summary_rows": summary.rows,
            "members": members,
            "authors": [prepared_by] if prepared_by else [],
            "description": f"{project}: calc package {calc_number}, {summary.counts}",
            "keywords": [calc_number, f"rev. {revision}", trace],
            "date": max(datetime.date.fromisoformat(entry.issued) for entry in entries),
        }
    )
    manifest = {
        "package": calc_number,
        "revision": revision,
        "trace": trace,
        "source": source,
        "members": manifest_members,
    }
    stem = stem or (
        f"{safe_stem(calc_number, fallback='package')}-rev{safe_stem(revision, fallback='0')}"
    )
    files = [
        (folder / f"{stem}.pdf", compile_pdf(markup)),
        (
            folder / f"{stem}.json",
            (json.dumps(manifest, indent=2, ensure_ascii=False) + "\n").encode(),
        ),
    ]
    return RenderedPackage(files, stem, inputs, revision)


def package_schema() -> dict[str, Any]:
    """The JSON Schema of a package's JSON, shipped as ``package.schema.json``."""
    from importlib import resources

    text = resources.files("calcsheet.pipeline").joinpath("package.schema.json").read_text("utf-8")
    return json.loads(text)


JOB_SUMMARY_COLUMNS = ["station", "section", "governing utilization", "status", "governing check"]
JOB_PACKAGE_SUFFIX = "-package"


def job_package(result: BuildResult, folder: Path) -> RenderedPackage:
    """The calc package of one job (``[output] package = true``): a part per station's sheet.

    Its calc number is the job's (``title_block.calc_number``; else the member's name and
    "package"); its files are the job's own name and revision with ``-package``
    (``DA-1-revA-package.pdf``), beside the sheets and never one of theirs. A job of one
    station gets a package too: the cover, contents and summary, then its sheet.
    """
    job = result.job
    entry = package_entry(result)
    section = job.member.section if isinstance(job.member.section, str) else job.member.section.kind
    parts = []
    rows = []
    stations = []
    for built, markup in zip(result.sheets, entry.markups, strict=True):
        # The sheet alone, its station unnamed: the contents' line names it already.
        one = dataclasses.replace(result, sheets=[dataclasses.replace(built, station="")])
        status = "OK" if one.all_pass else "NOT OK"
        station = built.station or _station_of(built)
        name = f"{result.member}, {station}" if station else result.member
        utilization = one.governing_utilization
        governing = one.governing_text()
        parts.append(
            PackagePart(name, section, utilization, status, governing, result.hash, (markup,))
        )
        rows.append([station or result.member, section, f"{utilization:.3f}", status, governing])
        stations.append(
            {
                "station": station,
                "status": status,
                "governing_utilization": utilization,
                "governing_check": governing,
            }
        )
    failing = sum(1 for part in parts if part.status != "OK")
    how_many = f"{len(parts)} station{'s' if len(parts) != 1 else ''}"
    counts = f"{how_many}: {len(parts) - failing} pass, {failing} fail"
    calc_number = dict(entry.title_block).get("calc_number", "").strip()
    summary = PackageSummary(
        heading="Summary",
        columns=JOB_SUMMARY_COLUMNS,
        rows=rows,
        counts=counts,
        part_heading="Station",
        holds=("Member", f"{result.member}, {how_many} ({source_name(result.source)})"),
    )
    manifest_members = [
        {
            "name": result.member,
            "status": "OK" if result.all_pass else "NOT OK",
            "governing_utilization": result.governing_utilization,
            "inputs": result.hash,
            "stations": stations,
        }
    ]
    return render_package(
        parts,
        [entry],
        folder,
        source=result.source,
        calc_number=calc_number or f"{result.member} package",
        summary=summary,
        manifest_members=manifest_members,
        stem=result.stem + JOB_PACKAGE_SUFFIX,
    )


def source_name(source: str) -> str:
    """The job file's name as the cover gives it (not the folders it was read from)."""
    return Path(source).name or source


def _station_of(built: BuiltSheet) -> str:
    """``z = 0 in``: a sheet's station when the job gives only one (its file name omits it)."""
    try:
        found = built.sheet.value("z_s")
    except KeyError:
        return ""
    return f"z = {found.magnitude:g} {found.units:~}"
