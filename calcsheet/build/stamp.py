"""The traceability stamp: tool version, a short hash of the normalized inputs, revision.

The hash covers every input of the job (not where the outputs go). Quantities are
normalized to SI base units first, so "6.5 kip" and "6500 lbf" hash alike and a
reformatted file keeps its hash; any change of value changes it.
"""

from __future__ import annotations

import hashlib
import json
from typing import Any

from calcsheet.job import Job
from calcsheet.units import parse_quantity

HASH_LENGTH = 12


def normalized(value: Any) -> Any:
    """Quantities in SI base units (so a change of unit alone is no change); the rest as is."""
    if isinstance(value, dict):
        return {key: normalized(item) for key, item in sorted(value.items())}
    if isinstance(value, list):
        return [normalized(item) for item in value]
    if isinstance(value, str):
        try:
            quantity = parse_quantity(value, field="stamp")
        except ValueError:
            return value
        if quantity.dimensionless and not str(quantity.units):
            return value  # plain numbers written as text stay text
        base = quantity.to_base_units()
        return f"{base.magnitude:.12g} {base.units:~}"
    return value


def inputs_hash(job: Job) -> str:
    """A short hex digest of the job's inputs (outputs excluded), stable across runs."""
    inputs = job.model_dump(mode="json", exclude={"output"})
    canonical = json.dumps(normalized(inputs), sort_keys=True, separators=(",", ":"))
    return hashlib.sha256(canonical.encode("utf-8")).hexdigest()[:HASH_LENGTH]


def stamp_text(job: Job) -> str:
    """What the sheet prints on every page beside the tool version: inputs hash and revision."""
    revision = job.revisions[-1].mark if job.revisions else "0"
    return f"inputs {inputs_hash(job)} · rev. {revision}"
