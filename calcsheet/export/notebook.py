"""nbconvert exporters: a notebook that built and displayed a sheet becomes its calc sheet files.

``jupyter nbconvert --to calcsheet calc.ipynb`` writes ``calc.pdf`` and ``calc.html`` next
to the notebook; ``--to calcsheet-html`` writes the HTML only. Only the sheet is written:
no code cell, prompt or other output appears in either file.

Which sheet: the LAST output in the notebook, in cell order and output order within a
cell, that carries :data:`~calcsheet.export.payload.SHEET_MIME_TYPE`. A sheet is
displayed (and so carries it) when a cell ends with it or calls ``display(sheet)``. If
several sheets are displayed, the last one wins: earlier ones are usually drafts of the
same calc. The outputs are those saved in the notebook, so save it after running it, or
add ``--execute`` to run it first.

Paper: ``--CalcsheetExporter.paper=a4`` (default ``letter``).

The PDF is compiled from the Typst markup the notebook carries, so converting a saved
notebook needs no kernel; only ``--execute`` starts one.
"""

from __future__ import annotations

import json
import os
import sys
from typing import Any

from nbconvert.exporters import Exporter
from nbconvert.utils.exceptions import ConversionException
from nbformat import NotebookNode
from traitlets import CaselessStrEnum, default

from calcsheet.errors import CalcsheetError
from calcsheet.export.files import ExportError, compile_pdf
from calcsheet.export.payload import PAYLOAD_VERSION, SHEET_MIME_TYPE
from calcsheet.render.typst import PAPER_SIZES

NO_SHEET_MESSAGE = (
    "no calc sheet in this notebook: display a Sheet in a cell, e.g. end a cell with "
    "`sheet`, then save/execute the notebook (or add --execute to run it first)"
)

# Only these outputs hold rich display data; streams and errors never carry a sheet.
_DISPLAY_OUTPUTS = ("display_data", "execute_result")


class SheetConversionError(CalcsheetError, ConversionException):
    """The notebook holds no readable sheet, or its PDF could not be made.

    A ``ConversionException``, so ``jupyter nbconvert`` reports it and exits with 1.
    """


def find_sheet_payload(nb: NotebookNode) -> dict[str, Any]:
    """The payload of the last sheet displayed in ``nb``; :class:`SheetConversionError` if none."""
    found: list[tuple[int, Any]] = []
    for number, cell in enumerate(nb.get("cells", []), start=1):
        if cell.get("cell_type") != "code":
            continue
        for output in cell.get("outputs", []):
            data = output.get("data", {}) if output.get("output_type") in _DISPLAY_OUTPUTS else {}
            if SHEET_MIME_TYPE in data:
                found.append((number, data[SHEET_MIME_TYPE]))
    if not found:
        raise SheetConversionError(NO_SHEET_MESSAGE)
    cell_number, payload = found[-1]
    return _checked_payload(payload, cell_number)


def _checked_payload(payload: Any, cell_number: int) -> dict[str, Any]:
    where = f"the calc sheet shown in cell {cell_number}"
    if isinstance(payload, str):
        # nbformat keeps JSON outputs as objects; a hand-edited file may hold text.
        try:
            payload = json.loads(payload)
        except ValueError:
            payload = None
    if not isinstance(payload, dict):
        raise SheetConversionError(f"{where} is not readable; run the notebook again")
    version = payload.get("version")
    if version != PAYLOAD_VERSION:
        raise SheetConversionError(
            f"{where} was saved by a calcsheet with sheet format {version!r}; this one reads "
            f"format {PAYLOAD_VERSION}: run the notebook again with this calcsheet"
        )
    missing = [key for key in ("html", "typst") if not isinstance(payload.get(key), str)]
    if missing:
        raise SheetConversionError(f"{where} lacks {', '.join(missing)}; run the notebook again")
    return payload


def _html_output_name(resources: dict[str, Any]) -> str:
    # nbconvert's app names the main file after unique_key (the notebook name, or
    # --output); the HTML takes the same name so the two files sit side by side. The
    # "./" matters: nbconvert's files writer makes the folder of every output and fails
    # on the empty folder name of a bare "calc.html".
    stem = resources.get("unique_key") or resources["metadata"].get("name") or "notebook"
    return os.path.join(".", f"{stem}.html")


def _running_app() -> Any | None:
    """The ``jupyter nbconvert`` application, when this process is that command."""
    app_module = sys.modules.get("nbconvert.nbconvertapp")
    if app_module is None or not app_module.NbConvertApp.initialized():
        return None
    return app_module.NbConvertApp.instance()


class _SheetExporter(Exporter):
    """Shared part: run the preprocessors (``--execute``), then find the last sheet."""

    def from_filename(
        self, filename: str, resources: dict[str, Any] | None = None, **kw: Any
    ) -> tuple[Any, dict[str, Any]]:
        """Convert a notebook file; on the command line a missing sheet is one error line."""
        try:
            return super().from_filename(filename, resources=resources, **kw)
        except SheetConversionError as error:
            app = _running_app()
            if app is None:
                raise
            # nbconvert logs a ConversionException with its whole traceback, then exits
            # with 1. Ours says what to do about the notebook; nbconvert's frames would
            # only bury it, so log the message alone and exit the same way.
            app.log.error("Error while converting '%s': %s", filename, error)
            app.exit(1)
            raise  # not reached: exit() raises SystemExit

    def _sheet(
        self, nb: NotebookNode, resources: dict[str, Any] | None, **kw: Any
    ) -> tuple[dict[str, Any], dict[str, Any]]:
        nb_copy, resources = super().from_notebook_node(nb, resources, **kw)
        payload = find_sheet_payload(nb_copy)
        self.log.info("Calc sheet %r", payload.get("title", ""))
        return payload, resources


class CalcsheetExporter(_SheetExporter):
    """``--to calcsheet``: the PDF of the last sheet shown, and its HTML next to it.

    The body is the PDF (``<name>.pdf``); the HTML goes into ``resources["outputs"]``
    as ``<name>.html``, which nbconvert's files writer puts in the same folder. Both are
    built before either is returned, so a failure writes neither.
    """

    output_mimetype = "application/pdf"
    export_from_notebook = "Calc sheet (PDF and HTML)"

    paper = CaselessStrEnum(
        sorted(PAPER_SIZES), default_value="letter", help="Paper of the PDF: letter or a4."
    ).tag(config=True)

    @default("file_extension")
    def _file_extension_default(self) -> str:
        return ".pdf"

    def from_notebook_node(
        self, nb: NotebookNode, resources: dict[str, Any] | None = None, **kw: Any
    ) -> tuple[bytes, dict[str, Any]]:
        """Return the PDF bytes; the HTML is in ``resources["outputs"]``."""
        payload, resources = self._sheet(nb, resources, **kw)
        try:
            pdf = compile_pdf(payload["typst"], paper=self.paper)
        except ExportError as error:
            raise SheetConversionError(str(error)) from None
        outputs = resources.get("outputs") or {}
        html_name = _html_output_name(resources)
        if not outputs:
            # Only used for the writer's "Support files will be in ..." line, which
            # should name the folder the HTML goes to rather than an unused one.
            resources["output_files_dir"] = os.path.dirname(html_name)
        outputs[html_name] = payload["html"].encode("utf-8")
        resources["outputs"] = outputs
        return pdf, resources


class CalcsheetHTMLExporter(_SheetExporter):
    """``--to calcsheet-html``: the standalone HTML of the last sheet shown, nothing else."""

    output_mimetype = "text/html"
    export_from_notebook = "Calc sheet (HTML)"

    @default("file_extension")
    def _file_extension_default(self) -> str:
        return ".html"

    def from_notebook_node(
        self, nb: NotebookNode, resources: dict[str, Any] | None = None, **kw: Any
    ) -> tuple[str, dict[str, Any]]:
        """Return the HTML document as text."""
        payload, resources = self._sheet(nb, resources, **kw)
        return payload["html"], resources
