"""Job files: a member check as TOML text, validated with every problem named by key path."""

from calcsheet.job.load import JobError, job_from_data, parse_job, read_job
from calcsheet.job.schema import FORMAT_VERSION, Job

__all__ = ["FORMAT_VERSION", "Job", "JobError", "job_from_data", "parse_job", "read_job"]
