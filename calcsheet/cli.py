"""The command line: ``calcsheet build | check | new | compare | batch``.

Exit status: 0 done and every check passes, 1 a check fails (build, check and
batch alike; the files are still written), 2 bad input or usage (the message names
the file, the key and the problem), 3 an output could not be written (disk full,
read-only folder, PDF engine, another build holding the folder too long), 4 an
internal error (a bug: please report it), 130 stopped by Ctrl-C (every file is
whole: the old one or the new one). Heavy modules are imported only by the
command that needs them.
"""

from __future__ import annotations

import argparse
import atexit
import contextlib
import gc
import os
import sys
from pathlib import Path
from typing import NoReturn

EXAMPLES = """\
examples:
  calcsheet new davit.toml                 write a commented starter job
  calcsheet build davit.toml               PDF, HTML and JSON into the job's output folder
  calcsheet build davit.toml --out sheets  ... into ./sheets instead
  calcsheet build davit.toml --replace-issued   replace this revision's files with new inputs
  calcsheet check davit.toml               exit 0 if every check passes, 1 if not, 2 bad input
  calcsheet compare rev-A.toml rev-B.toml  the revision delta as PDF and HTML
  calcsheet batch members.toml             one sheet per member plus a summary
  calcsheet batch members.csv --base davit.toml
  calcsheet batch members.toml --package C-100   ... and one calc package PDF, calc no. C-100
"""

OK, CHECK_FAILS, BAD_INPUT, NOT_WRITTEN, INTERNAL = 0, 1, 2, 3, 4
INTERRUPTED = 130  # 128 + SIGINT, as shells report a command stopped by Ctrl-C
# A batch of 5,000 members (the batch limit) is well under this; larger is not a table.
MAX_TABLE_BYTES = 20_000_000
REPLACE_ISSUED_HELP = (
    "replace files already written for this revision even though the inputs changed "
    "(without it such a build is refused: add a revision instead)"
)


def _processes(text: str) -> int:
    """``--workers``: a whole number of at least 1."""
    try:
        value = int(text)
    except ValueError:
        value = 0
    if value < 1:
        raise argparse.ArgumentTypeError(
            f"expected a whole number of processes, at least 1 (got {text!r})"
        )
    return value


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
    build.add_argument("--replace-issued", action="store_true", help=REPLACE_ISSUED_HELP)
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
    compare.add_argument(
        "--other-member",
        action="store_true",
        help="allow the two jobs to be different members (refused otherwise)",
    )
    batch = command(
        "batch",
        "build many members from one table, in parallel",
        "calcsheet batch members.csv --base davit.toml --out sheets",
    )
    batch.add_argument("table", type=Path, help="a TOML batch ([defaults], [[members]]) or CSV")
    batch.add_argument(
        "--base",
        type=Path,
        help="base job: needed for a CSV table; under a TOML batch's [defaults] if given",
    )
    batch.add_argument("--out", type=Path, help="output folder (default: ./batch-out)")
    batch.add_argument(
        "--workers", type=_processes, default=None, help="processes, at least 1 (default: CPUs)"
    )
    batch.add_argument("--replace-issued", action="store_true", help=REPLACE_ISSUED_HELP)
    batch.add_argument(
        "--package",
        nargs="?",
        const="",
        default=None,
        metavar="CALC_NO",
        help="also write one calc package PDF: a cover, contents, the summary and every "
        "member's sheets numbered through; CALC_NO is its calc number (default: "
        "'<table> package')",
    )
    return parser


def _each_sheet_built_once() -> contextlib.AbstractContextManager[None]:
    """A command that builds each sheet once: no compiled re-evaluation plans (they pay
    only when a sheet is evaluated again; counting and compiling them cost a hundredth
    of a cold build)."""
    from calcsheet.engine.evaluate import compiled_plans

    return compiled_plans(False)


def _build(arguments: argparse.Namespace) -> int:
    with _each_sheet_built_once():
        return _build_once(arguments)


def _build_once(arguments: argparse.Namespace) -> int:
    from calcsheet.job import read_job
    from calcsheet.pipeline import build_sheets, output_folder, write_outputs

    job = read_job(arguments.job)
    result = build_sheets(job, source=str(arguments.job))
    folder = output_folder(job, arguments.job.parent, arguments.out)
    for path in write_outputs(result, folder, replace_issued=arguments.replace_issued):
        print(f"wrote {path}")
    print(result.summary())
    return OK if result.all_pass else CHECK_FAILS


def _check(arguments: argparse.Namespace) -> int:
    with _each_sheet_built_once():
        return _check_once(arguments)


def _check_once(arguments: argparse.Namespace) -> int:
    from calcsheet.errors import CalcsheetError
    from calcsheet.job import JobError, read_job
    from calcsheet.pipeline import build_sheets, output_folder

    status = OK
    for path in arguments.jobs:
        try:
            job = read_job(path)
            result = build_sheets(job, source=str(path))
            # What build would refuse, check refuses too (a folder outside the job's).
            output_folder(job, path.parent)
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

    path: Path = arguments.job
    try:
        with open(path, "x", encoding="utf-8") as handle:
            handle.write(STARTER)
    except FileExistsError:
        if path.is_dir():
            print(
                f"{path}: is a folder; give a file name such as {path / 'job.toml'}",
                file=sys.stderr,
            )
        else:
            print(f"{path}: already exists; not overwritten", file=sys.stderr)
        return BAD_INPUT
    except FileNotFoundError:
        print(
            f"{path}: the folder {path.parent} does not exist; create it first "
            "(mkdir) or give a path in an existing folder",
            file=sys.stderr,
        )
        return BAD_INPUT
    except (OSError, ValueError) as error:  # ValueError: a NUL byte in the name
        reason = getattr(error, "strerror", None) or str(error)
        print(f"cannot write {path}: {reason}", file=sys.stderr)
        return NOT_WRITTEN
    print(f"wrote {path}: edit it, then run: calcsheet build {path}")
    return OK


def _compare(arguments: argparse.Namespace) -> int:
    from calcsheet.export.files import export_sheet
    from calcsheet.job import read_job
    from calcsheet.pipeline import build_sheets, output_folder, safe_stem
    from calcsheet.pipeline.compare import changed_inputs, check_comparable, delta_sheet

    old_job, new_job = read_job(arguments.old), read_job(arguments.new)
    old = build_sheets(old_job, source=str(arguments.old))
    new = build_sheets(new_job, source=str(arguments.new))
    check_comparable(old, new, other_member=arguments.other_member)
    for change in changed_inputs(old, new):
        print(f"{change.path}: {change.old} -> {change.new}")
    sheet = delta_sheet(old, new)
    folder = output_folder(new_job, arguments.new.parent, arguments.out)
    marks = [safe_stem(result.sheets[0].sheet.title_block.revision) for result in (old, new)]
    stem = f"{safe_stem(new.member)}-delta-rev{marks[0]}-to-rev{marks[1]}"
    for path in export_sheet(sheet, folder, stem, paper=new_job.output.paper):
        print(f"wrote {path}")
    return OK


def _read_text(path: Path, *, limit: int, kind: str) -> str:
    """A batch table or base job as text (a byte-order mark is dropped); JobError if not."""
    from calcsheet.job import JobError

    try:
        size = path.stat().st_size
        if size > limit:
            raise JobError(str(path), [("", f"{size:,} bytes; a {kind} is at most {limit:,}")])
        return path.read_text(encoding="utf-8-sig")
    except FileNotFoundError:
        raise JobError(str(path), [("", "no such file")]) from None
    except IsADirectoryError:
        raise JobError(str(path), [("", f"this is a folder, not a {kind}")]) from None
    except (OSError, UnicodeDecodeError) as error:
        reason = getattr(error, "strerror", None) or str(error)
        raise JobError(str(path), [("", f"cannot read it: {reason}")]) from None


def _batch(arguments: argparse.Namespace) -> int:
    from calcsheet.export.files import make_folder, write_all_atomically
    from calcsheet.job import JobError
    from calcsheet.job.load import MAX_JOB_BYTES
    from calcsheet.pipeline.batch import (
        members_from_csv,
        members_from_toml,
        run_batch_and_summary,
        write_package,
    )

    table: Path = arguments.table
    text = _read_text(table, limit=MAX_TABLE_BYTES, kind="batch table")
    base = None
    if arguments.base is not None:
        import tomllib

        try:
            base = tomllib.loads(_read_text(arguments.base, limit=MAX_JOB_BYTES, kind="job file"))
        except tomllib.TOMLDecodeError as error:
            raise JobError(str(arguments.base), [("", f"TOML syntax error: {error}")]) from None
    if table.suffix.lower() == ".csv":
        if base is None:
            raise JobError(str(table), [("", "a CSV batch needs --base job.toml")])
        members = members_from_csv(text, base, source=str(table))
    else:
        members = members_from_toml(text, source=str(table), base=base)
    folder = arguments.out or Path("batch-out")
    run = run_batch_and_summary(
        members,
        folder,
        source=str(table),
        workers=arguments.workers,
        progress=_progress,
        replace_issued=arguments.replace_issued,
        package=arguments.package is not None,
    )
    outcomes = run.outcomes
    for outcome in outcomes:
        if not outcome.ok:
            print(f"skipped {outcome.name}:\n{outcome.message}", file=sys.stderr)
    make_folder(folder)
    summary = [(folder / name, data) for name, data in run.summary]
    write_all_atomically(summary)
    for path, _ in summary:
        print(f"wrote {path}")
    if arguments.package is not None:  # after the summary: a package refused loses nothing
        package = write_package(
            outcomes,
            folder,
            source=str(table),
            calc_number=arguments.package,
            replace_issued=arguments.replace_issued,
        )
        for path in package.paths:
            print(f"wrote {path}")
    if any(outcome.not_written for outcome in outcomes):
        return NOT_WRITTEN
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
        print(
            "stopped (Ctrl-C); every file is whole: the one from before, or the new one",
            file=sys.stderr,
        )
        return INTERRUPTED
    except Exception as error:  # the last line of defence: a message, not a traceback
        if os.environ.get("CALCSHEET_DEBUG"):
            raise
        print(
            f"internal error: {type(error).__name__}: {error}\n"
            "(set CALCSHEET_DEBUG=1 to see the traceback, and please report it)",
            file=sys.stderr,
        )
        return INTERNAL


def run() -> NoReturn:
    """The ``calcsheet`` command: :func:`main`, then leave without tearing down the
    interpreter.

    Freeing every object of a finished build (sympy's caches, the unit registry, the
    PDF engine's caches) took about 0.15 s, a seventh of a cold build, for nothing:
    the files are whole on disk by then. Output is flushed and the exit handlers run
    first, as a normal exit does.
    """
    # A build allocates many long-lived objects (sympy's, pint's): collecting young objects
    # every 700 allocations cost a twentieth of a cold build; every 20,000 is ample for
    # one command's life.
    gc.set_threshold(20_000, 20, 20)
    status = main()
    for stream in (sys.stdout, sys.stderr):
        # A closed pipe (``calcsheet check job.toml | head``): nothing more to say.
        with contextlib.suppress(OSError, ValueError):
            stream.flush()
    atexit._run_exitfuncs()  # clean-ups registered by us and by libraries
    os._exit(status)


if __name__ == "__main__":
    run()
