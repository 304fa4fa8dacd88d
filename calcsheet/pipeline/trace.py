"""The trace line: a short hash of the normalized inputs and the revision, printed beside
the tool version on every page and in the JSON (key ``trace``; files written by
calcsheet 0.1.0 called it ``stamp``, a word the trade keeps for the engineer's seal).

The hash covers every input of the job (not where the outputs go). Quantities are
normalized to SI base units first, so "6.5 kip" and "6500 lbf" hash alike and a
reformatted file keeps its hash; any change of value changes it.
"""

from __future__ import annotations

import hashlib
import json
import re
from typing import Any

from calcsheet.job import Job
from calcsheet.units import parse_quantity

HASH_LENGTH = 12


# The job keys whose values are quantities (see calcsheet.job.schema); only these are
# normalized, so free text such as a title of "3 kip" stays text.
QUANTITY_KEYS = frozenset(
    {
        "length", "stations", "z", "magnitude", "angle", "components", "ex", "ey",
        "Mx", "My", "Mz", "Fy", "Fu", "Lb", "sweep_step",
        "support_positions", "braces", "z_start", "z_end", "q_start", "q_end",
        "b", "d", "D", "OD", "t", "H", "B", "bf", "tf", "tw", "bf_bottom", "tf_bottom",
    }
)  # fmt: skip


def _quantity_text(text: str) -> str:
    try:
        base = parse_quantity(text, field="trace").to_base_units()
        # 15 significant digits: all a double holds reliably, so 3 kip and 3000 lbf
        # agree while a change in the 13th digit still shows.
        return f"{base.magnitude:.15g} {base.units:~}"
    except (ValueError, ArithmeticError):
        return text


def normalized(value: Any, key: str = "") -> Any:
    """Quantities in SI base units (so a change of unit alone is no change); the rest as is."""
    if isinstance(value, dict):
        return {name: normalized(item, name) for name, item in sorted(value.items())}
    if isinstance(value, list):
        return [normalized(item, key) for item in value]
    if isinstance(value, str) and key in QUANTITY_KEYS:
        return _quantity_text(value)
    return value


def inputs_hash(job: Job) -> str:
    """A short hex digest of the job's inputs (outputs excluded), stable across runs."""
    inputs = job.model_dump(mode="json", exclude={"output"})
    canonical = json.dumps(normalized(inputs), sort_keys=True, separators=(",", ":"))
    return hashlib.sha256(canonical.encode("utf-8")).hexdigest()[:HASH_LENGTH]


def trace_text(job: Job) -> str:
    """What the sheet prints on every page beside the tool version: inputs hash and revision."""
    revision = job.revisions[-1].mark if job.revisions else "0"
    return f"inputs {inputs_hash(job)} · rev. {revision}"


_TRACED_HASH = re.compile(rf"inputs ([0-9a-f]{{{HASH_LENGTH}}})\b")


def hash_in_trace(text: str) -> str | None:
    """The inputs hash printed in a trace line (``inputs 3fa9c2e17b04 · rev. A``), or ``None``."""
    found = _TRACED_HASH.search(text)
    return found.group(1) if found else None
