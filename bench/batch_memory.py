"""Peak memory of ``calcsheet batch`` on 1,000 generated members (JSON only). Prints; not a test.

Runs the command line in this process, so ``RUSAGE_SELF`` is the batch's parent
process and ``RUSAGE_CHILDREN`` its largest worker (spawned, then waited for).

    .venv/bin/python bench/batch_memory.py [members] [workers]
"""

from __future__ import annotations

import resource
import sys
import tempfile
import time
import tomllib
from pathlib import Path

import tomli_w

from calcsheet.cli import main
from calcsheet.job.starter import STARTER

SECTIONS = ("W8X31", "W10X33", "HSS6X6X3/8", "W12X26")


def batch_table(members: int) -> str:
    """A TOML batch: the starter job as defaults, JSON output only, members varying a little."""
    defaults = tomllib.loads(STARTER)
    defaults["output"]["formats"] = ["json"]
    del defaults["member"]["name"]
    rows = [
        {
            "member": {"name": f"M-{index:04d}", "section": SECTIONS[index % len(SECTIONS)]},
            "loads": [dict(defaults["loads"][0], magnitude=f"{1 + index % 7} kip")],
        }
        for index in range(members)
    ]
    return tomli_w.dumps({"defaults": defaults, "members": rows})


def megabytes(kilobytes: int) -> float:
    """ru_maxrss is in kilobytes on Linux."""
    return kilobytes / 1024


def main_bench() -> None:
    members = int(sys.argv[1]) if len(sys.argv) > 1 else 1000
    workers = sys.argv[2] if len(sys.argv) > 2 else None
    with tempfile.TemporaryDirectory() as folder:
        table = Path(folder) / "members.toml"
        table.write_text(batch_table(members), encoding="utf-8")
        argv = ["batch", str(table), "--out", str(Path(folder) / "out")]
        if workers:
            argv += ["--workers", workers]
        start = time.perf_counter()
        status = main(argv)
        elapsed = time.perf_counter() - start
        written = len(list((Path(folder) / "out").glob("*.json")))
    parent = resource.getrusage(resource.RUSAGE_SELF).ru_maxrss
    largest_worker = resource.getrusage(resource.RUSAGE_CHILDREN).ru_maxrss
    print(
        f"calcsheet batch, {members} members, formats json: exit {status}, "
        f"{written} JSON files, {elapsed:.1f} s"
    )
    print(f"peak RSS, parent process:  {megabytes(parent):7.1f} MB")
    print(f"peak RSS, largest worker:  {megabytes(largest_worker):7.1f} MB")


if __name__ == "__main__":
    main_bench()
