"""An isolated Jupyter set-up for tests that run notebooks or JupyterLab.

A kernelspec of our own, first on JUPYTER_PATH, runs this interpreter; every other
Jupyter and IPython folder points inside the test folder, so nothing of the user's
set-up (kernels, start-up files) takes part and nothing is left in $HOME.
"""

from __future__ import annotations

import json
import os
import sys
from pathlib import Path

KERNEL = "calcsheet-test-python"


def isolated_jupyter(
    folder: Path, kernel: str = KERNEL, display_name: str = "calcsheet tests"
) -> dict[str, str]:
    """Write the kernelspec ``kernel`` under ``folder``; return the environment to run in."""
    spec = folder / "jupyter" / "kernels" / kernel
    spec.mkdir(parents=True, exist_ok=True)
    argv = [sys.executable, "-m", "ipykernel_launcher", "-f", "{connection_file}"]
    description = {"argv": argv, "display_name": display_name, "language": "python"}
    (spec / "kernel.json").write_text(json.dumps(description))
    return {
        **os.environ,
        "JUPYTER_PATH": str(folder / "jupyter"),
        "JUPYTER_DATA_DIR": str(folder / "jupyter-data"),
        "JUPYTER_RUNTIME_DIR": str(folder / "jupyter-runtime"),
        "JUPYTER_CONFIG_DIR": str(folder / "jupyter-config"),
        "IPYTHONDIR": str(folder / "ipython"),
        "PYDEVD_DISABLE_FILE_VALIDATION": "1",
    }
