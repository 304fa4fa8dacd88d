"""Building jobs: job -> model -> member sheet -> PDF, HTML and JSON on disk."""

from calcsheet.build.model import MemberModel, member_model
from calcsheet.build.run import BuildResult, build_sheets, output_folder, safe_stem, write_outputs
from calcsheet.build.trace import inputs_hash, trace_text

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
