"""From a validated job to the model a calc takes: section, material, loads, stations.

Every problem found while building the model (an unknown shape, a load beyond
the member, a flange thicker than half the depth) is reported with its job-file
key path, all at once, as a :class:`~calcsheet.job.JobError`.
"""

from __future__ import annotations

import inspect
from collections.abc import Callable
from dataclasses import dataclass

import pint

from calcsheet.engine import Revision, TitleBlock
from calcsheet.errors import InputError
from calcsheet.job import Job, JobError
from calcsheet.job.schema import SectionSpec
from calcsheet.materials import find_grade
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.mechanics.loads import AppliedMoment, PointLoad
from calcsheet.mechanics.statics import validate_loads
from calcsheet.sections import (
    Section,
    angle,
    catalog_section,
    channel,
    i_shape,
    plate,
    rectangular_hss,
    round_bar,
    round_hss,
    tee,
)
from calcsheet.units import parse_quantity

_BUILDERS: dict[str, Callable[..., Section]] = {
    "plate": plate,
    "round bar": round_bar,
    "round HSS": round_hss,
    "rectangular HSS": rectangular_hss,
    "I": i_shape,
    "channel": channel,
    "angle": angle,
    "tee": tee,
}


@dataclass(frozen=True)
class MemberModel:
    """Everything the member calc takes, built from one job."""

    section: Section
    loads: tuple[PointLoad | AppliedMoment, ...]
    length: pint.Quantity
    stations: tuple[pint.Quantity, ...]
    Fy: pint.Quantity
    Fy_source: str
    factor_of_safety: float
    title_block: TitleBlock
    revisions: tuple[Revision, ...]


class _Problems:
    """Collects (key path, message) pairs so that one run reports them all."""

    def __init__(self) -> None:
        self.found: list[tuple[str, str]] = []

    def attempt(self, path: str, make: Callable[[], object]) -> object | None:
        try:
            return make()
        except InputError as error:
            self.found.append((path, str(error)))
            return None


def _section(spec: str | SectionSpec, problems: _Problems) -> Section | None:
    if isinstance(spec, str):
        return problems.attempt("member.section", lambda: catalog_section(spec))
    builder = _BUILDERS[spec.kind]
    wanted = [name for name in inspect.signature(builder).parameters if name != "name"]
    given = {key: getattr(spec, key) for key in wanted if getattr(spec, key) is not None}
    missing = [key for key in wanted if key not in given and _required(builder, key)]
    if missing:
        problems.found.append(
            ("member.section", f"a {spec.kind} needs {', '.join(missing)} (lengths with units)")
        )
        return None
    extra = [
        key
        for key in SectionSpec.model_fields
        if key not in ("kind", "name", *wanted) and getattr(spec, key) is not None
    ]
    if extra:
        problems.found.append(
            ("member.section", f"a {spec.kind} takes {', '.join(wanted)}; not {', '.join(extra)}")
        )
        return None
    name = spec.name or spec.kind
    return problems.attempt("member.section", lambda: builder(**given, name=name))


def _required(builder: Callable[..., Section], key: str) -> bool:
    return inspect.signature(builder).parameters[key].default is inspect.Parameter.empty


def member_model(job: Job, *, source: str = "job") -> MemberModel:
    """Build the member model of ``job``; :class:`JobError` lists every problem."""
    problems = _Problems()
    section = _section(job.member.section, problems)
    loads: list[PointLoad | AppliedMoment] = []
    for index, spec in enumerate(job.loads):
        options = {"z": spec.z, "ex": spec.ex, "ey": spec.ey}
        if spec.components is not None:
            options["components"] = tuple(spec.components)
        else:
            options.update(
                magnitude=spec.magnitude,
                angle=spec.angle,
                from_axis=spec.from_axis,
                toward_axis=spec.toward_axis,
            )
        load = problems.attempt(
            f"loads[{index}]", lambda spec=spec, options=options: point_load(spec.name, **options)
        )
        if load is not None:
            loads.append(load)
    for index, spec in enumerate(job.moments):
        couple = problems.attempt(
            f"moments[{index}]",
            lambda spec=spec: applied_moment(
                spec.name, z=spec.z, Mx=spec.Mx, My=spec.My, Mz=spec.Mz
            ),
        )
        if couple is not None:
            loads.append(couple)
    length = parse_quantity(job.member.length, field="member.length", dimension="length")
    stations = tuple(
        parse_quantity(text, field="member.stations", dimension="length")
        for text in job.member.stations
    )
    if len(loads) == len(job.loads) + len(job.moments):
        for index, station in enumerate(stations):
            problems.attempt(
                f"member.stations[{index}]", lambda s=station: validate_loads(length, loads, s)
            )
    Fy, Fy_source = _yield_stress(job, problems)
    if problems.found:
        raise JobError(source, problems.found)
    assert section is not None and Fy is not None  # no problems means both were built
    block = job.title_block
    revisions = tuple(
        Revision(entry.mark, entry.date, entry.description, entry.by) for entry in job.revisions
    )
    title_block = TitleBlock(
        project=block.project,
        project_number=block.project_number,
        subject=block.subject or f"{job.member.name}, {section.name}",
        calc_number=block.calc_number,
        prepared_by=block.prepared_by,
        prepared_date=block.prepared_date,
        checked_by=block.checked_by,
        checked_date=block.checked_date,
        revision=revisions[-1].mark if revisions else "0",
    )
    return MemberModel(
        section=section,
        loads=tuple(loads),
        length=length,
        stations=stations,
        Fy=Fy,
        Fy_source=Fy_source,
        factor_of_safety=job.check.factor_of_safety,
        title_block=title_block,
        revisions=revisions,
    )


def _yield_stress(job: Job, problems: _Problems) -> tuple[pint.Quantity | None, str]:
    material = job.material
    if material.Fy is not None:
        return parse_quantity(material.Fy, field="material.Fy", dimension="stress"), "job file"
    grade = problems.attempt("material.grade", lambda: find_grade(material.grade or ""))
    if grade is None:
        return None, ""
    return grade.Fy, f"{grade.name}, minimum (calcsheet grade table)"
