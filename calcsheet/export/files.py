"""Write a sheet's HTML and PDF so that a failure never leaves a half-written file.

Each output is written to a temporary file in the same folder and renamed into
place only when complete; the previous file stays until then.
"""

from __future__ import annotations

import atexit
import errno
import glob
import os
import shutil
import stat
import tempfile
import threading
import time
from functools import lru_cache
from pathlib import Path
from typing import Any

from calcsheet.engine import Sheet
from calcsheet.errors import ExportError
from calcsheet.render.html import render_html
from calcsheet.render.typst import paper_inputs, render_typst


def pdf_bytes(sheet: Sheet, *, paper: str = "letter") -> bytes:
    """Compile the sheet's Typst markup to PDF in memory (fonts come with the typst wheel)."""
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


def compile_pdf(source: str, *, paper: str | None = None) -> bytes:
    """Compile Typst markup from ``render_typst`` to PDF; ``paper`` overrides its paper."""
    # Validated before the compiler runs, so a wrong paper names the field, not Typst.
    inputs = paper_inputs(paper) if paper is not None else {}
    try:
        with _COMPILER_LOCK:
            return _compiler().compile(input=source.encode("utf-8"), sys_inputs=inputs)
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


def write_atomically(path: Path, data: bytes) -> None:
    """Write ``data`` to ``path`` through a temporary file renamed into place.

    A failure (disk full, read-only folder) raises :class:`ExportError` saying
    which file and why; the previous file at ``path`` is left as it was.
    """
    write_all_atomically([(Path(path), data)])


def write_all_atomically(files: list[tuple[Path, bytes]]) -> None:
    """Write several files as one: every one is written in full before any replaces its
    predecessor, so a failure (disk full mid-way) leaves all the previous files as they were.
    """
    staged: list[tuple[str, Path]] = []
    current = Path(".")
    try:
        for path, data in files:
            current = Path(path)
            staged.append((_staged_copy(current, data), current))
        for _, path in staged:  # a rename that would fail is found before any is made
            current = path
            if path.is_dir():
                raise IsADirectoryError(errno.EISDIR, os.strerror(errno.EISDIR), str(path))
        for temporary, path in staged:
            current = path
            os.replace(temporary, path)
    except OSError as error:
        raise ExportError(_cannot_write(current, error)) from None
    finally:
        for temporary, _ in staged:
            Path(temporary).unlink(missing_ok=True)  # already renamed, or abandoned


def _staged_copy(path: Path, data: bytes) -> str:
    """``data`` written and flushed to a temporary file beside ``path``; its name."""
    remove_stale_parts(path)
    handle, temporary = tempfile.mkstemp(prefix=f".{path.name}.", suffix=".part", dir=path.parent)
    try:
        # mkstemp makes the file private (600); the finished file gets the mode a plain
        # write would give it: the previous file's, or the umask's for a new one.
        os.fchmod(handle, _mode_for(path))
        with os.fdopen(handle, "wb") as stream:
            stream.write(data)
            stream.flush()
            os.fsync(stream.fileno())
    except BaseException:
        Path(temporary).unlink(missing_ok=True)
        raise
    return temporary


def _mode_for(path: Path) -> int:
    """The permissions for ``path``: those of the file it replaces, else 666 less the umask."""
    try:
        return stat.S_IMODE(path.stat().st_mode)
    except OSError:
        return 0o666 & ~_umask()


def _umask() -> int:
    """The process umask (read from /proc where possible: setting it is not thread-safe)."""
    try:
        for line in Path("/proc/self/status").read_text().splitlines():
            if line.startswith("Umask:"):
                return int(line.split()[1], 8)
    except (OSError, ValueError, IndexError):
        pass
    mask = os.umask(0o022)
    os.umask(mask)
    return mask


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
    folder = Path(folder)
    make_folder(folder)
    html = render_html(sheet).encode("utf-8")
    pdf = pdf_bytes(sheet, paper=paper)
    files = [(folder / f"{stem}.html", html), (folder / f"{stem}.pdf", pdf)]
    write_all_atomically(files)
    return [path for path, _ in files]
