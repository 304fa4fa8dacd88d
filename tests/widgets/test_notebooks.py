"""The two notebooks in notebooks/ run headless, and `jupyter nbconvert --to calcsheet` turns
each executed copy into the calc sheet's PDF.

The notebooks are executed once (a module fixture) with nbclient, in their own folder
(the form opens ../examples/outrigger.toml from there), by a kernelspec of our own that
points at this interpreter, as tests/export/test_notebook.py does; the executed copies
go to a temporary folder, so the notebooks in git keep their outputs cleared.

The form notebook shows a widget, which carries no sheet; its last cell displays
``form.sheet`` so that nbconvert finds the sheet the form shows.
"""

from __future__ import annotations

import io
import subprocess
import sys
from pathlib import Path

import nbformat
import pypdf
import pytest
from jupyter_client.kernelspec import KernelSpecManager
from jupyter_client.manager import KernelManager
from nbclient import NotebookClient

from calcsheet.export.payload import SHEET_MIME_TYPE
from tests.jupyter_env import KERNEL, isolated_jupyter

ROOT = Path(__file__).resolve().parents[2]
NOTEBOOKS = ROOT / "notebooks"
FORM = "member-form-demo.ipynb"
USER_CALC = "user-calc-example.ipynb"
JUPYTER = str(Path(sys.executable).parent / "jupyter")
WIDGET_VIEW = "application/vnd.jupyter.widget-view+json"


@pytest.fixture(scope="module")
def executed(tmp_path_factory: pytest.TempPathFactory) -> dict[str, Path]:
    """Both notebooks executed; the executed copies, saved in a temporary folder."""
    folder = tmp_path_factory.mktemp("executed")
    env = isolated_jupyter(folder, KERNEL)
    kernels = folder / "jupyter" / "kernels"
    copies = {}
    for name in (FORM, USER_CALC):
        nb = nbformat.read(NOTEBOOKS / name, as_version=4)
        manager = KernelManager(
            kernel_name=KERNEL, kernel_spec_manager=KernelSpecManager(kernel_dirs=[str(kernels)])
        )
        client = NotebookClient(
            nb,
            km=manager,
            timeout=300,
            resources={"metadata": {"path": str(NOTEBOOKS)}},
        )
        client.execute(env=env)  # raises CellExecutionError naming the cell on any error
        copies[name] = folder / name
        nbformat.write(nb, copies[name])
    return copies


def _outputs(path: Path) -> list[dict]:
    nb = nbformat.read(path, as_version=4)
    return [output for cell in nb.cells if cell.cell_type == "code" for output in cell.outputs]


def test_the_notebooks_in_git_have_no_outputs() -> None:
    for name in (FORM, USER_CALC):
        nb = nbformat.read(NOTEBOOKS / name, as_version=4)
        nbformat.validate(nb)
        for cell in nb.cells:
            if cell.cell_type == "code":
                assert cell.outputs == [] and cell.execution_count is None, name


def test_both_notebooks_run_without_error(executed: dict[str, Path]) -> None:
    for path in executed.values():
        assert not [output for output in _outputs(path) if output.output_type == "error"]
    form_outputs = _outputs(executed[FORM])
    assert any(WIDGET_VIEW in output.get("data", {}) for output in form_outputs)
    assert SHEET_MIME_TYPE in form_outputs[-1]["data"]  # form.sheet, for nbconvert
    printed = "".join(output.get("text", "") for output in _outputs(executed[USER_CALC]))
    assert "Bolt shear: utilization" in printed


@pytest.mark.parametrize(
    ("name", "title"),
    [
        (USER_CALC, "Bracket BR-3 to column flange: eccentric bolt group"),
        (FORM, "Sign outrigger arm OA-1: combined stresses at the support"),
    ],
)
def test_nbconvert_writes_the_pdf_of_the_executed_notebook(
    executed: dict[str, Path], name: str, title: str
) -> None:
    path = executed[name]
    result = subprocess.run(
        [JUPYTER, "nbconvert", "--to", "calcsheet", path.name],
        cwd=path.parent,
        env=isolated_jupyter(path.parent, KERNEL),
        capture_output=True,
        text=True,
        timeout=300,
    )
    assert result.returncode == 0, result.stderr
    pdf = path.with_suffix(".pdf")
    reader = pypdf.PdfReader(io.BytesIO(pdf.read_bytes()))
    text = " ".join(" ".join(page.extract_text() for page in reader.pages).split())
    assert title in text
    assert "Sheet 1 of" in text
    assert path.with_suffix(".html").exists()
