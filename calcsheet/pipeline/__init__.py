"""Building jobs: job -> model -> member sheet -> PDF, HTML and JSON on disk.

The names below load on first use (PEP 562): a batch's parent process imports
``calcsheet.pipeline.batch`` only to read the table and hand members to workers, and
should not pay for the calcs it never runs (over a second, before any worker starts).
"""

from __future__ import annotations

import importlib
from typing import TYPE_CHECKING, Any

if TYPE_CHECKING:
    from calcsheet.pipeline.model import MemberModel, member_model
    from calcsheet.pipeline.run import (
        BuildResult,
        build_sheets,
        output_folder,
        safe_stem,
        write_outputs,
    )
    from calcsheet.pipeline.trace import inputs_hash, trace_text

_HOMES = {
    "MemberModel": "calcsheet.pipeline.model",
    "member_model": "calcsheet.pipeline.model",
    "BuildResult": "calcsheet.pipeline.run",
    "build_sheets": "calcsheet.pipeline.run",
    "output_folder": "calcsheet.pipeline.run",
    "safe_stem": "calcsheet.pipeline.run",
    "write_outputs": "calcsheet.pipeline.run",
    "inputs_hash": "calcsheet.pipeline.trace",
    "trace_text": "calcsheet.pipeline.trace",
}

__all__ = [
    "BuildResult",
    "MemberModel",
    "build_sheets",
    "inputs_hash",
    "member_model",
    "output_folder",
    "safe_stem",
    "trace_text",
    "write_outputs",
]


def __getattr__(name: str) -> Any:
    home = _HOMES.get(name)
    if home is None:
        raise AttributeError(f"module {__name__!r} has no attribute {name!r}")
    value = getattr(importlib.import_module(home), name)
    globals()[name] = value  # once loaded, an ordinary attribute
    return value
