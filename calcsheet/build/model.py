"""From a validated job to the model a calc takes: section, material, loads, stations.

Every problem found while building the model (an unknown shape, a load beyond
the member, a flange thicker than half the depth) is reported with its job-file
key path, all at once, as a :class:`~calcsheet.job.JobError`.
"""

from __future__ import annotations

import inspect
from collections.abc import Callable
from dataclasses import dataclass
from functools import lru_cache

import pint

from calcsheet.calcs.design import DesignBasis
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
    title_block: TitleBlock
    revisions: tuple[Revision, ...]
    design: DesignBasis
    load_types: tuple[str, ...] = ()


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
        except ArithmeticError as error:  # dimensions of 1e-320 or 1e300: out of range
            reason = f"{type(error).__name__}: {error}"
            self.found.append((path, f"the values give numbers out of range ({reason})"))
            return None


def _section(spec: str | SectionSpec, problems: _Problems) -> Section | None:
    if isinstance(spec, str):
        return problems.attempt("member.section", lambda: _catalog_section(spec))
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
    return problems.attempt(
        "member.section", lambda: _built_section(spec.kind, tuple(given.items()), name)
    )


# A section depends only on its spec and is never changed once built (a frozen
# dataclass), so a rebuild after a change of a load or the length (the form rebuilds
# on every change) reuses it instead of integrating the outline again.
@lru_cache(maxsize=64)
def _catalog_section(designation: str) -> Section:
    return catalog_section(designation)


@lru_cache(maxsize=64)
def _built_section(kind: str, given: tuple[tuple[str, str], ...], name: str) -> Section:
    return _BUILDERS[kind](**dict(given), name=name)


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
        _check_positions(job, length, loads, problems)
    if len(loads) == len(job.loads) + len(job.moments) and not problems.found:
        for index, station in enumerate(stations):
            problems.attempt(
                f"member.stations[{index}]", lambda s=station: validate_loads(length, loads, s)
            )
    Fy, Fy_source = _yield_stress(job, problems)
    design = problems.attempt("check", lambda: design_basis(job))
    if problems.found:
        raise JobError(source, problems.found)
    assert section is not None and Fy is not None  # no problems means both were built
    block = job.title_block
    revisions = tuple(
        Revision(entry.mark, entry.date, entry.description, entry.by) for entry in job.revisions
    )
    # The job's title block has the engine's fields but the revision, which is the
    # latest entry of the revision log.
    fields = block.model_dump()
    fields["subject"] = fields["subject"] or f"{job.member.name}, {section.name}"
    title_block = TitleBlock(**fields, revision=revisions[-1].mark if revisions else "0")
    return MemberModel(
        section=section,
        loads=tuple(loads),
        length=length,
        stations=stations,
        Fy=Fy,
        Fy_source=Fy_source,
        title_block=title_block,
        revisions=revisions,
        design=design,
        load_types=tuple([spec.type for spec in job.loads] + [spec.type for spec in job.moments]),
    )


def _check_positions(
    job: Job, length: pint.Quantity, loads: list[PointLoad | AppliedMoment], problems: _Problems
) -> None:
    """The length, then each load's z, reported at their own key paths.

    Checked one by one (before the stations) so that a load beyond the member is
    named at ``loads[i].z`` rather than at the station being checked, and a form can
    mark the very field that is wrong.
    """
    if problems.attempt("member.length", lambda: validate_loads(length, [])) is None:
        return
    paths = [f"loads[{i}].z" for i in range(len(job.loads))]
    paths += [f"moments[{i}].z" for i in range(len(job.moments))]
    for path, load in zip(paths, loads, strict=True):
        problems.attempt(path, lambda load=load: validate_loads(length, [load]))


def section_dimension_keys(kind: str) -> tuple[tuple[str, ...], tuple[str, ...]]:
    """The dimension keys a section kind of the job file takes: (required, optional).

    ``section_dimension_keys("I")`` is ``(("d", "bf", "tw", "tf"), ("bf_bottom", "tf_bottom"))``;
    a form uses it to show the right boxes for "custom dimensions".
    """
    builder = _BUILDERS[kind]
    names = [name for name in inspect.signature(builder).parameters if name != "name"]
    required = tuple(name for name in names if _required(builder, name))
    return required, tuple(name for name in names if name not in required)


def _yield_stress(job: Job, problems: _Problems) -> tuple[pint.Quantity | None, str]:
    material = job.material
    if material.Fy is not None:
        return parse_quantity(material.Fy, field="material.Fy", dimension="stress"), "job file"
    grade = problems.attempt("material.grade", lambda: find_grade(material.grade or ""))
    if grade is None:
        return None, ""
    return grade.Fy, f"{grade.name}, minimum (calcsheet grade table)"


def design_basis(job: Job) -> DesignBasis:
    """The member sheet's design basis from the job's [check] and [explore] tables."""
    check, explore = job.check, job.explore
    grade = job.material.grade or ""
    step = parse_quantity(explore.sweep_step, field="explore.sweep_step", dimension="angle")
    return DesignBasis(
        kind=check.kind,
        method=check.method,
        combinations=check.combinations,
        factor_of_safety=check.factor_of_safety,
        K=check.K,
        Lb=parse_quantity(check.Lb, field="check.Lb", dimension="length") if check.Lb else None,
        Cb=check.Cb,
        gamma_M0=check.gamma_M0,
        gamma_M1=check.gamma_M1,
        S_DS=check.S_DS,
        reverse_lateral=check.reverse_lateral,
        en1990_expression=check.en1990_expression,
        imposed_category=check.imposed_category,
        snow_site=check.snow_site,
        psi0=check.psi0,
        grade=grade,
        deflection_ratio=check.deflection_limit,
        sweep_load=explore.sweep_load or None,
        sweep_step_deg=float(step.to("deg").m),
        lightest_in=explore.lightest_in or None,
    )
