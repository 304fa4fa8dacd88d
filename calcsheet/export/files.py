"""Write a sheet's HTML and PDF so that a failure never leaves a half-written file.

Each output is written to a temporary file in the same folder and renamed into
place only when complete; the previous file stays until then. Files get the mode
the process umask gives a new file (0644 under umask 022), as other tools' files
do, not the private 0600 of a temporary file. Ctrl-C while the files of a set are
being renamed into place takes effect once the set is complete, so a set is never
half old, half new. :func:`folder_lock` keeps two builds from writing into one
folder at once.
"""

from __future__ import annotations

import atexit
import contextlib
import errno
import glob
import os
import shutil
import signal
import stat
import sys
import tempfile
import threading
import time
from collections.abc import Callable, Iterator
from functools import lru_cache
from pathlib import Path
from typing import TYPE_CHECKING, Any

from calcsheet.errors import ExportError

if TYPE_CHECKING:  # the renderers load when a sheet is rendered: a batch's parent only writes
    from calcsheet.engine import Sheet


def pdf_bytes(sheet: Sheet, *, paper: str = "letter") -> bytes:
    """Compile the sheet's Typst markup to PDF in memory (fonts come with the typst wheel)."""
    from calcsheet.render.typst import render_typst

    return compile_pdf(render_typst(sheet, paper=paper))


_COMPILER_LOCK = threading.Lock()


def _compiler() -> Any:
    """The compiler of this process (a forked child makes its own: threads do not fork)."""
    return _compiler_of_process(os.getpid())


@lru_cache(maxsize=1)
def _compiler_of_process(pid: int) -> Any:
    """One Typst compiler per process, rooted in an empty private folder.

    Reusing the compiler keeps Typst's caches (fonts, layout) warm: the demo's PDF
    compiles in about a fifth of the time of a fresh compile. The empty root means
    the document can read no file at all, whatever it contains (defence in depth:
    user text is already escaped).
    """
    import typst  # imported here: the compiler is only needed for PDFs

    root = tempfile.mkdtemp(prefix="calcsheet-typst-root-")
    atexit.register(shutil.rmtree, root, ignore_errors=True)
    return typst.Compiler(root=root)


# PDF/A-2b (ISO 19005-2, level b): the archival form document systems ask of a
# submittal; fonts embedded, metadata in XMP. The markup must set a document date.
PDF_STANDARDS = ["a-2b"]


def compile_pdf(source: str, *, paper: str | None = None) -> bytes:
    """Compile Typst markup from ``render_typst`` to PDF/A-2b; ``paper`` overrides its paper."""
    from calcsheet.render.typst import paper_inputs

    # Validated before the compiler runs, so a wrong paper names the field, not Typst.
    inputs = paper_inputs(paper) if paper is not None else {}
    try:
        with _COMPILER_LOCK:
            return _compiler().compile(
                input=source.encode("utf-8"), sys_inputs=inputs, pdf_standards=PDF_STANDARDS
            )
    except Exception as error:  # typst raises its own error types per version
        raise ExportError(f"the PDF engine failed: {error}") from None


# A temporary file left by a process killed between writing and renaming is stale
# after this long; the next write into the folder removes it.
STALE_SECONDS = 600


def remove_stale_parts(path: Path) -> None:
    """Remove temporary files of ``path`` left behind by a killed build."""
    now = time.time()
    for stale in path.parent.glob(f".{glob.escape(path.name)}.*.part"):
        try:
            if now - stale.stat().st_mtime > STALE_SECONDS:
                stale.unlink()
        except OSError:
            pass  # another build is using it, or it is already gone


def write_atomically(path: Path, data: bytes, *, mode: int | None = None) -> None:
    """Write ``data`` to ``path`` through a temporary file renamed into place.

    A failure (disk full, read-only folder) raises :class:`ExportError` saying
    which file and why; the previous file at ``path`` is left as it was. ``mode``:
    the file's permission bits (default: what the umask gives a new file).
    """
    write_all_atomically([(Path(path), data)], mode=mode)


def write_all_atomically(files: list[tuple[Path, bytes]], *, mode: int | None = None) -> None:
    """Write several files as one: every one is written in full before any replaces its
    predecessor, so a failure (disk full mid-way) leaves all the previous files as they were.
    """
    staged: list[tuple[str, Path]] = []
    current = Path(".")
    try:
        for path, data in files:
            current = Path(path)
            staged.append((_staged_copy(current, data, mode), current))
        for _, path in staged:  # a rename that would fail is found before any is made
            current = path
            if path.is_dir():
                raise IsADirectoryError(errno.EISDIR, os.strerror(errno.EISDIR), str(path))
        with _interrupts_deferred():
            for temporary, path in staged:
                current = path
                os.replace(temporary, path)
    except OSError as error:
        raise ExportError(_cannot_write(current, error)) from None
    finally:
        for temporary, _ in staged:
            Path(temporary).unlink(missing_ok=True)  # already renamed, or abandoned


_UMASK_LOCK = threading.Lock()


def new_file_mode() -> int:
    """The permission bits a new file gets from the process umask (0o644 under umask 022)."""
    with _UMASK_LOCK:  # reading the umask means setting it: never two threads at once
        umask = os.umask(0o022)
        os.umask(umask)
    return 0o666 & ~umask


@contextlib.contextmanager
def _interrupts_deferred() -> Iterator[None]:
    """Hold Ctrl-C (SIGINT) until the block ends, so a set of renames is never cut in two.

    The handler is swapped for one that only notes the signal; when the block ends
    the signal is raised again with the previous handler in place (KeyboardInterrupt
    by default). Blocking the signal with a thread mask would not do: the PDF
    engine's threads would still take it. Outside the main thread, where no handler
    can be set, the block runs as is.
    """
    if threading.current_thread() is not threading.main_thread():
        yield
        return
    noted: list[int] = []
    previous = signal.signal(signal.SIGINT, lambda number, frame: noted.append(number))
    try:
        yield
    finally:
        signal.signal(signal.SIGINT, previous)
        if noted:
            signal.raise_signal(signal.SIGINT)


def _staged_copy(path: Path, data: bytes, mode: int | None = None) -> str:
    """``data`` written and flushed to a temporary file beside ``path``; its name."""
    remove_stale_parts(path)
    # mkstemp makes the file private (0600); the finished file gets ``mode``, or the
    # umask's (so an output issued 0600 by an earlier version is mended on rebuild).
    mode = new_file_mode() if mode is None else mode
    handle, temporary = tempfile.mkstemp(prefix=f".{path.name}.", suffix=".part", dir=path.parent)
    try:
        with os.fdopen(handle, "wb") as stream:
            stream.write(data)
            stream.flush()
            if hasattr(os, "fchmod"):
                os.fchmod(stream.fileno(), mode)
            os.fsync(stream.fileno())
    except BaseException:
        Path(temporary).unlink(missing_ok=True)
        raise
    if not hasattr(os, "fchmod"):  # Windows: chmod by name (only the read-only bit counts)
        os.chmod(temporary, mode)
    return temporary


def existing_mode(path: Path) -> int:
    """The permissions of the file at ``path``, else those the umask gives a new file:
    for writing over a user's own file (a job file) without changing who may read it."""
    try:
        return stat.S_IMODE(path.stat().st_mode)
    except OSError:
        return new_file_mode()


# How long a build waits for another one writing into the same folder before giving up.
LOCK_WAIT_SECONDS = 300.0
LOCK_NAME = ".calcsheet-writing.lock"


@contextlib.contextmanager
def folder_lock(
    folder: Path,
    *,
    wait_seconds: float | None = None,
    waiting: Callable[[str], None] | None = None,
) -> Iterator[None]:
    """Hold the output folder's lock while writing: a second build waits, then gives up.

    The lock is an advisory ``flock`` on a hidden file in the folder; the system
    releases it when the process ends, however it ends, so a killed build never
    leaves the folder locked. The file is removed when the lock is released.
    ``waiting`` is told once, with a message, when the build has to wait.
    """
    try:
        import fcntl
    except ImportError:  # not POSIX: no advisory locks; builds are not serialised
        yield
        return
    limit = LOCK_WAIT_SECONDS if wait_seconds is None else wait_seconds
    path = Path(folder) / LOCK_NAME
    deadline = time.monotonic() + limit
    told = False
    # A batch's workers take the lock for each member's few milliseconds of writing: a
    # short first wait, doubling to a tenth of a second, keeps them from idling behind it.
    pause = 0.005
    while True:
        try:
            descriptor = os.open(path, os.O_RDWR | os.O_CREAT, 0o666)
        except OSError:
            # A folder that takes no new file takes no output either: the write that
            # follows says so, naming the output rather than this lock file.
            yield
            return
        try:
            fcntl.flock(descriptor, fcntl.LOCK_EX | fcntl.LOCK_NB)
        except OSError:
            holder = _lock_holder(path)
            os.close(descriptor)
            if time.monotonic() >= deadline:
                raise ExportError(
                    f"another calcsheet build{holder} has been writing into {folder} for "
                    f"over {limit:g} s (lock file {path}); nothing was written: try again "
                    "when it has finished"
                ) from None
            if not told:
                told = True
                message = (
                    f"waiting for another calcsheet build{holder} writing into {folder} "
                    f"(lock file {path})"
                )
                (waiting or _say_waiting)(message)
            time.sleep(pause)
            pause = min(pause * 2, 0.1)
            continue
        # The holder before us may have removed the file after we opened it: then our
        # lock is on a file nobody else sees, so try again on the current one.
        try:
            same = os.fstat(descriptor).st_ino == os.stat(path).st_ino
        except OSError:
            same = False
        if not same:
            os.close(descriptor)
            continue
        break
    try:
        os.ftruncate(descriptor, 0)
        os.write(descriptor, f"{os.getpid()}\n".encode())
        yield
    finally:
        with contextlib.suppress(OSError):
            path.unlink()
        os.close(descriptor)  # releases the lock


def _lock_holder(path: Path) -> str:
    try:
        pid = path.read_text(encoding="ascii").strip()
    except (OSError, UnicodeDecodeError):
        return ""
    return f" (process {pid})" if pid.isdigit() else ""


def _say_waiting(message: str) -> None:
    print(message, file=sys.stderr, flush=True)


def make_folder(folder: Path) -> None:
    """Create the output folder (and its parents), or say clearly why not."""
    try:
        Path(folder).mkdir(parents=True, exist_ok=True)
    except (OSError, ValueError) as error:  # ValueError: a NUL byte in the name
        reason = getattr(error, "strerror", None) or str(error)
        raise ExportError(f"cannot create the output folder {folder}: {reason}") from None


def _cannot_write(path: Path, error: OSError) -> str:
    reason = error.strerror or type(error).__name__
    return f"cannot write {path}: {reason}; any earlier file of that name is unchanged"


def export_sheet(sheet: Sheet, folder: Path, stem: str, *, paper: str = "letter") -> list[Path]:
    """Write ``stem``.html and ``stem``.pdf into ``folder``, both built before either is written."""
    from calcsheet.render.html import render_html

    folder = Path(folder)
    make_folder(folder)
    html = render_html(sheet).encode("utf-8")
    pdf = pdf_bytes(sheet, paper=paper)
    files = [(folder / f"{stem}.html", html), (folder / f"{stem}.pdf", pdf)]
    write_all_atomically(files)
    return [path for path, _ in files]


def package_markup(context: dict[str, Any]) -> str:
    """A calc package (``templates/package.typ.j2``) as Typst markup: the cover, contents
    and summary, then every member's sheet markup, in one document (see ``render_package``
    in :mod:`calcsheet.pipeline.package` for what ``context`` holds)."""
    from calcsheet.render.templates import typst_environment

    return typst_environment().get_template("package.typ.j2").render(**context)
