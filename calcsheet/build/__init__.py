"""Building jobs: job -> model -> member sheet -> PDF, HTML and JSON on disk."""

from calcsheet.build.model import MemberModel, member_model
from calcsheet.build.run import BuildResult, build_sheets, output_folder, safe_stem, write_outputs
from calcsheet.build.stamp import inputs_hash, stamp_text

__all__ = [
    "BuildResult",
    "MemberModel",
    "build_sheets",
    "inputs_hash",
    "member_model",
    "output_folder",
    "safe_stem",
    "stamp_text",
    "write_outputs",
]
