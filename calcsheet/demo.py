"""The demo calc: a rooftop sign outrigger checked for combined stresses (a scenario of our own).

The job is examples/outrigger.toml in the repository (a copy ships here as
:data:`DEMO_JOB`, tested to be identical). ``make demo`` builds it with the
command line; :func:`outrigger_sheet` gives the same sheet in Python.
"""

from __future__ import annotations

from importlib import resources

from calcsheet.engine import Sheet


def demo_job_text() -> str:
    """The demo job file's text, as shipped inside the package."""
    return resources.files("calcsheet").joinpath("demo_job.toml").read_text(encoding="utf-8")


def outrigger_sheet() -> Sheet:
    """The demo sheet, built from the demo job with the same code as the command line."""
    from calcsheet.job import parse_job
    from calcsheet.pipeline import build_sheets

    job = parse_job(demo_job_text(), source="demo job")
    return build_sheets(job, source="demo job").sheets[0].sheet
