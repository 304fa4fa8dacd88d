"""The command line: ``calcsheet build | check | new | compare | batch``.

Exit status: 0 done (and, for check, every check passes), 1 a check fails,
2 bad input (the message names the file, the key and the problem), 3 an output
could not be written (disk full, read-only folder, PDF engine), or an internal
error. Heavy modules are imported only by the command that needs them.
"""

from __future__ import annotations

import argparse
import os
import sys
from pathlib import Path

EXAMPLES = """\
examples:
  calcsheet new davit.toml                 write a commented starter job
  calcsheet build davit.toml               PDF, HTML and JSON into the job's output folder
  calcsheet build davit.toml --out sheets  ... into ./sheets instead
  calcsheet check davit.toml               exit 0 if every check passes, 1 if not, 2 bad input
  calcsheet compare rev-A.toml rev-B.toml  the revision delta as PDF and HTML
  calcsheet batch members.toml             one sheet per member plus a summary
  calcsheet batch members.csv --base davit.toml
"""

OK, CHECK_FAILS, BAD_INPUT, NOT_WRITTEN = 0, 1, 2, 3
# A batch of 5,000 members (the batch limit) is well under this; larger is not a table.
MAX_TABLE_BYTES = 20_000_000
INTERNAL = NOT_WRITTEN


def _parser() -> argparse.ArgumentParser:
    parser = argparse.ArgumentParser(
        prog="calcsheet",
        description="Member combined-stress checks as calculation sheets (PDF, HTML, JSON).",
        epilog=EXAMPLES,
        formatter_class=argparse.RawDescriptionHelpFormatter,
    )
    commands = parser.add_subparsers(dest="command", required=True, metavar="command")

    def command(name: str, summary: str, example: str) -> argparse.ArgumentParser:
        return commands.add_parser(
            name,
            help=summary,
            description=summary,
            epilog=f"example:\n  {example}",
            formatter_class=argparse.RawDescriptionHelpFormatter,
        )

    build = command("build", "build a job file into PDF, HTML and JSON", "calcsheet build job.toml")
    build.add_argument("job", type=Path, help="the job file (TOML)")
    build.add_argument("--out", type=Path, help="output folder (default: the job's output.folder)")
    check = command(
        "check",
        "check a job without writing files; exit 1 if a check fails",
        "calcsheet check job.toml && echo all pass",
    )
    check.add_argument("jobs", type=Path, nargs="+", help="job files")
    new = command("new", "write a commented starter job file", "calcsheet new davit.toml")
    new.add_argument("job", type=Path, help="the file to create (never overwritten)")
    compare = command(
        "compare",
        "compare two revisions of a job: changed inputs and moved results",
        "calcsheet compare rev-A.toml rev-B.toml --out delta",
    )
    compare.add_argument("old", type=Path)
    compare.add_argument("new", type=Path)
    compare.add_argument("--out", type=Path, help="output folder (default: the new job's)")
    batch = command(
        "batch",
        "build many members from one table, in parallel",
        "calcsheet batch members.csv --base davit.toml --out sheets",
    )
    batch.add_argument("table", type=Path, help="a TOML batch ([defaults], [[members]]) or CSV")
    batch.add_argument("--base", type=Path, help="base job for a CSV table")
    batch.add_argument("--out", type=Path, help="output folder (default: ./batch-out)")
    batch.add_argument("--workers", type=int, default=None, help="processes (default: CPUs)")
    return parser


def _build(arguments: argparse.Namespace) -> int:
    from calcsheet.build import build_sheets, output_folder, write_outputs
    from calcsheet.job import read_job

    job = read_job(arguments.job)
    result = build_sheets(job, source=str(arguments.job))
    folder = output_folder(job, arguments.job.parent, arguments.out)
    for path in write_outputs(result, folder):
        print(f"wrote {path}")
    print(result.summary())
    return OK


def _check(arguments: argparse.Namespace) -> int:
    from calcsheet.build import build_sheets
    from calcsheet.errors import CalcsheetError
    from calcsheet.job import JobError, read_job

    status = OK
    for path in arguments.jobs:
        try:
            result = build_sheets(read_job(path), source=str(path))
        except JobError as error:
            print(str(error), file=sys.stderr)
            status = BAD_INPUT
            continue
        except CalcsheetError as error:  # every job is checked, each error names its file
            print(f"{path}: {error}", file=sys.stderr)
            status = BAD_INPUT
            continue
        print(result.summary())
        if not result.all_pass and status == OK:
            status = CHECK_FAILS
    return status


def _new(arguments: argparse.Namespace) -> int:
    from calcsheet.job.starter import STARTER

    try:
        with open(arguments.job, "x", encoding="utf-8") as handle:
            handle.write(STARTER)
    except FileExistsError:
        print(f"{arguments.job}: already exists; not overwritten", file=sys.stderr)
        return BAD_INPUT
    print(f"wrote {arguments.job}: edit it, then run: calcsheet build {arguments.job}")
    return OK


def _compare(arguments: argparse.Namespace) -> int:
    from calcsheet.build import build_sheets, output_folder, safe_stem
    from calcsheet.build.compare import changed_inputs, delta_sheet
    from calcsheet.export.files import export_sheet
    from calcsheet.job import read_job

    old_job, new_job = read_job(arguments.old), read_job(arguments.new)
    old = build_sheets(old_job, source=str(arguments.old))
    new = build_sheets(new_job, source=str(arguments.new))
    for change in changed_inputs(old, new):
        print(f"{change.path}: {change.old} -> {change.new}")
    sheet = delta_sheet(old, new)
    folder = output_folder(new_job, arguments.new.parent, arguments.out)
    marks = [safe_stem(result.sheets[0].sheet.title_block.revision) for result in (old, new)]
    stem = f"{safe_stem(new.member)}-delta-rev{marks[0]}-to-rev{marks[1]}"
    for path in export_sheet(sheet, folder, stem, paper=new_job.output.paper):
        print(f"wrote {path}")
    return OK


def _batch(arguments: argparse.Namespace) -> int:
    from calcsheet.build.batch import (
        members_from_csv,
        members_from_toml,
        run_batch,
        summary_csv,
        summary_sheet,
    )
    from calcsheet.export.files import export_sheet, make_folder, write_atomically
    from calcsheet.job import JobError

    table: Path = arguments.table
    try:
        size = table.stat().st_size
        if size > MAX_TABLE_BYTES:
            raise JobError(
                str(table), [("", f"{size:,} bytes; a batch table is at most {MAX_TABLE_BYTES:,}")]
            )
        text = table.read_text(encoding="utf-8")
    except (OSError, UnicodeDecodeError) as error:
        raise JobError(str(table), [("", f"cannot read it: {error}")]) from None
    if table.suffix.lower() == ".csv":
        if arguments.base is None:
            raise JobError(str(table), [("", "a CSV batch needs --base job.toml")])
        import tomllib

        try:
            base = tomllib.loads(arguments.base.read_text(encoding="utf-8"))
        except (OSError, UnicodeDecodeError, tomllib.TOMLDecodeError) as error:
            raise JobError(str(arguments.base), [("", f"cannot read it: {error}")]) from None
        members = members_from_csv(text, base, source=str(table))
    else:
        members = members_from_toml(text, source=str(table))
    folder = arguments.out or Path("batch-out")
    outcomes = run_batch(
        members, folder, source=str(table), workers=arguments.workers, progress=_progress
    )
    for outcome in outcomes:
        if not outcome.ok:
            print(f"skipped {outcome.name}:\n{outcome.message}", file=sys.stderr)
    make_folder(folder)
    write_atomically(folder / "summary.csv", summary_csv(outcomes).encode())
    for path in export_sheet(summary_sheet(outcomes), folder, "summary"):
        print(f"wrote {path}")
    print(f"wrote {folder / 'summary.csv'}")
    if any(not outcome.ok for outcome in outcomes):
        return BAD_INPUT
    return OK if all(outcome.all_pass for outcome in outcomes) else CHECK_FAILS


def _progress(done: int, total: int, outcome) -> None:
    width = 30
    filled = int(width * done / total)
    bar = "#" * filled + "-" * (width - filled)
    line = f"[{bar}] {done}/{total} {outcome.name}"
    if sys.stderr.isatty():
        end = "\n" if done == total else ""
        print(f"\r{line[:100]:<100}", end=end, file=sys.stderr, flush=True)
    elif done == total or done % max(1, total // 10) == 0:
        print(line, file=sys.stderr)


COMMANDS = {"build": _build, "check": _check, "new": _new, "compare": _compare, "batch": _batch}


def main(argv: list[str] | None = None) -> int:
    """Run one command; returns the exit status (never raises for bad input)."""
    arguments = _parser().parse_args(argv)
    from calcsheet.errors import CalcsheetError, ExportError

    try:
        return COMMANDS[arguments.command](arguments)
    except ExportError as error:
        print(str(error), file=sys.stderr)
        return NOT_WRITTEN
    except CalcsheetError as error:
        print(str(error), file=sys.stderr)
        return BAD_INPUT
    except KeyboardInterrupt:
        print("stopped; files written so far are complete, none is half-written", file=sys.stderr)
        return INTERNAL
    except Exception as error:  # the last line of defence: a message, not a traceback
        if os.environ.get("CALCSHEET_DEBUG"):
            raise
        print(
            f"internal error: {type(error).__name__}: {error}\n"
            "(set CALCSHEET_DEBUG=1 to see the traceback, and please report it)",
            file=sys.stderr,
        )
        return INTERNAL


if __name__ == "__main__":
    sys.exit(main())
