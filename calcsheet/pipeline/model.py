"""From a validated job to the model a calc takes: section, material, loads, stations.

The supports, distributed loads, self-weight, brace points and the automatic
station become the member sheet's frame options (:attr:`MemberModel.frame_options`).

Every problem found while building the model (an unknown shape, a load beyond
the member, a flange thicker than half the depth) is reported with its job-file
key path, all at once, as a :class:`~calcsheet.job.JobError`.
"""

from __future__ import annotations

import difflib
import inspect
from collections.abc import Callable
from dataclasses import dataclass
from functools import lru_cache

import pint

from calcsheet.calcs.design import DesignBasis
from calcsheet.engine import Revision, TitleBlock
from calcsheet.errors import InputError
from calcsheet.job import Job, JobError
from calcsheet.job.schema import AUTO_STATION, SectionSpec
from calcsheet.materials import find_grade
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.mechanics.distributed import (
    DistributedLoad,
    check_distributed_on_member,
    distributed_load,
)
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, check_on_member
from calcsheet.mechanics.statics import validate_loads
from calcsheet.mechanics.supports import SUPPORT_CASES, Support, support, support_case
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
from calcsheet.standards.combinations import ASCE_TYPES, EN_TYPES
from calcsheet.units import Quantity, parse_quantity

# The yield stress a job may give: the range of structural steels, from about
# 24 ksi (ASTM A283 Gr. A; S185 is 185 MPa) to about 140 ksi (S960 is 960 MPa) (from
# memory), with a margin. A value outside is a slip of unit or digit; 5000 ksi was
# otherwise blamed on the section's web (slender for that F_y).
FY_RANGE = (Quantity(20, "ksi"), Quantity(150, "ksi"))

# Offsets of a load from the centroid (a bracket, a lug). A bracket several section
# depths long is common practice, so a large offset is noted on the sheet for the
# checker: beyond NOTED_OFFSET times the section's size in that direction. Beyond
# both the member length and REFUSED_OFFSET times the section's larger outside
# dimension, the bracket is a member of its own (or the number a slip: 1e6 in), and
# the job is refused (common practice, no source).
NOTED_OFFSET = 5.0
REFUSED_OFFSET = 10.0

# A cantilever fixed at z = 0 with point loads only: the sheet's behaviour without
# frame options.
DEFAULT_SUPPORTS = "fixed-free"

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
    notes: tuple[str, ...] = ()
    supports: str | tuple[Support, ...] = DEFAULT_SUPPORTS
    support_positions: tuple[pint.Quantity, ...] | None = None
    distributed: tuple[DistributedLoad, ...] = ()
    distributed_types: tuple[str, ...] = ()
    self_weight: bool = False
    gravity: str = "-y"
    braces: tuple[pint.Quantity, ...] = ()

    @property
    def auto_station(self) -> bool:
        """Whether the sheet finds the critical station (``stations = "auto"``)."""
        return self.stations == (AUTO_STATION,)

    @property
    def frame_options(self) -> dict[str, object]:
        """The member sheet's keyword arguments that differ from a cantilever under point loads.

        Supports other than fixed-free at z = 0 (``supports``, ``support_positions``),
        distributed loads with their types, self-weight with its gravity axis and
        brace points; empty for a job of point loads on a cantilever without self-weight.
        """
        options: dict[str, object] = {}
        if self.supports != DEFAULT_SUPPORTS or self.support_positions is not None:
            options["supports"] = self.supports
            if self.support_positions is not None:
                options["support_positions"] = list(self.support_positions)
        if self.distributed:
            options["distributed"] = list(self.distributed)
            options["distributed_types"] = list(self.distributed_types)
        if self.self_weight:
            options["self_weight"] = True
            options["gravity"] = self.gravity
        if self.braces:
            options["braces"] = list(self.braces)
        return options

    def sheet_arguments(self, station: pint.Quantity | str) -> dict[str, object]:
        """The member sheet's station and frame options, for one of :attr:`stations`."""
        return {"station": station, **self.frame_options}


class _Problems:
    """Collects (key path, message) pairs so that one run reports them all."""

    def __init__(self) -> None:
        self.found: list[tuple[str, str]] = []

    def attempt(
        self, path: str, make: Callable[[], object], keys: dict[str, str] | None = None
    ) -> object | None:
        """``make()``, or ``None`` with its problem recorded at ``path``.

        ``keys`` maps the field names an :class:`InputError` may carry (``"load P
        angle"``) to the job-file key under ``path`` (``"angle"``), so the problem is
        reported at ``loads[0].angle`` with what was typed, not at ``loads[0]``.
        """
        try:
            return make()
        except InputError as error:
            key = (keys or {}).get(error.field)
            if key is None:
                self.found.append((path, str(error)))
            else:
                where = f"{path}.{key}" if key else path
                self.found.append((where, str(error).removeprefix(f"{error.field}: ")))
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
            f"loads[{index}]",
            lambda spec=spec, options=options: point_load(spec.name, **options),
            _load_keys("load", spec.name),
        )
        if load is not None:
            loads.append(load)
    for index, spec in enumerate(job.moments):
        couple = problems.attempt(
            f"moments[{index}]",
            lambda spec=spec: applied_moment(
                spec.name, z=spec.z, Mx=spec.Mx, My=spec.My, Mz=spec.Mz
            ),
            _load_keys("moment", spec.name),
        )
        if couple is not None:
            loads.append(couple)
    length = parse_quantity(job.member.length, field="member.length", dimension="length")
    stations: tuple[pint.Quantity | str, ...] = (AUTO_STATION,)
    if not job.member.auto_station:
        stations = tuple(
            parse_quantity(text, field="member.stations", dimension="length")
            for text in job.member.stations
        )
    if len(loads) == len(job.loads) + len(job.moments):
        _check_positions(job, length, loads, problems)
    if len(loads) == len(job.loads) + len(job.moments) and not problems.found:
        for index, station in enumerate(stations):
            if isinstance(station, str):  # "auto": found by the sheet
                continue
            problems.attempt(
                f"member.stations[{index}]", lambda s=station: validate_loads(length, loads, s)
            )
    frame = _frame_inputs(job, length, problems)
    notes: list[str] = []
    all_built = len(frame.distributed) == len(job.distributed)
    if section is not None and len(loads) == len(job.loads) + len(job.moments) and all_built:
        notes = _check_offsets(job, section, length, loads, problems, frame.distributed)
    Fy, Fy_source = _yield_stress(job, problems)
    design = problems.attempt("check", lambda: design_basis(job), _BASIS_KEYS)
    if isinstance(design, DesignBasis):
        _check_load_types(job, design, problems)
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
        notes=tuple(notes),
        supports=frame.supports,
        support_positions=frame.support_positions,
        distributed=frame.distributed,
        distributed_types=tuple(spec.type for spec in job.distributed),
        self_weight=job.member.self_weight,
        gravity=job.member.gravity,
        braces=frame.braces,
    )


@dataclass(frozen=True)
class _FrameInputs:
    """The supports, distributed loads and brace points read from a job."""

    supports: str | tuple[Support, ...] = DEFAULT_SUPPORTS
    support_positions: tuple[pint.Quantity, ...] | None = None
    distributed: tuple[DistributedLoad, ...] = ()
    braces: tuple[pint.Quantity, ...] = ()


def _frame_inputs(job: Job, length: pint.Quantity, problems: _Problems) -> _FrameInputs:
    """Supports, distributed loads and brace points, each problem at its key path.

    Positions are checked against the member only once its length is good (a bad
    length is reported at ``member.length`` on its own).
    """
    length_good = length.m > 0 and not any(path == "member.length" for path, _ in problems.found)
    supports, positions = _supports(job, length if length_good else None, problems)
    distributed = _distributed(job, length if length_good else None, problems)
    braces = []
    for index, text in enumerate(job.member.braces):
        where = parse_quantity(text, field="member.braces", dimension="length")
        if length_good:
            problems.attempt(
                f"member.braces[{index}]",
                lambda where=where, text=text: check_on_member(
                    where, length, field="brace", shown=text
                ),
                {"brace": ""},
            )
        braces.append(where)
    return _FrameInputs(supports, positions, distributed, tuple(braces))


def _supports(
    job: Job, length: pint.Quantity | None, problems: _Problems
) -> tuple[str | tuple[Support, ...], tuple[pint.Quantity, ...] | None]:
    """The job's own [[supports]] tables, or the named case of member.supports."""
    if job.supports:
        built: list[Support] = []
        for index, spec in enumerate(job.supports):
            prefix = f"support {spec.name}"
            made = problems.attempt(
                f"supports[{index}]",
                lambda spec=spec: support(spec.name, z=spec.z, restrains=spec.restrains),
                {f"{prefix} z": "z", f"{prefix} restrains": "restrains"},
            )
            if isinstance(made, Support) and length is not None:
                problems.attempt(
                    f"supports[{index}].z",
                    lambda made=made, spec=spec: check_on_member(
                        made.z, length, field="z", shown=spec.z
                    ),
                    {"z": ""},
                )
            if isinstance(made, Support):
                built.append(made)
        return tuple(built), None
    typed = job.member.supports
    case = typed.strip().lower()
    if case not in SUPPORT_CASES:
        close = difflib.get_close_matches(case, SUPPORT_CASES, n=2, cutoff=0.5)
        hint = " or ".join(f'"{name}"' for name in close)
        problems.found.append(
            (
                "member.supports",
                f"got {typed!r}; expected one of {', '.join(SUPPORT_CASES)}"
                + (f": did you mean {hint}?" if hint else "")
                + " (or your own [[supports]] tables, each with name, z and restrains)",
            )
        )
        return DEFAULT_SUPPORTS, None
    texts = job.member.support_positions
    positions = (
        None
        if texts is None
        else tuple(
            parse_quantity(text, field="member.support_positions", dimension="length")
            for text in texts
        )
    )
    if length is not None:
        try:
            support_case(case, length, positions=texts)
        except InputError as error:
            where = error.field.replace("support positions", "member.support_positions")
            problems.found.append((where, str(error).removeprefix(f"{error.field}: ")))
    return case, positions


def _distributed(
    job: Job, length: pint.Quantity | None, problems: _Problems
) -> tuple[DistributedLoad, ...]:
    """The [[distributed]] loads, each checked to lie on the member with a length of its own."""
    made_loads = []
    for index, spec in enumerate(job.distributed):
        prefix = f"distributed load {spec.name}"
        keys = {
            f"{prefix} {key}": key for key in ("z_start", "z_end", "ex", "ey", "q_start", "q_end")
        }
        for which in ("q_start", "q_end"):
            keys |= {f"{prefix} {which} q{axis}": f"{which}[{i}]" for i, axis in enumerate("xyz")}
        made = problems.attempt(
            f"distributed[{index}]",
            lambda spec=spec: distributed_load(
                spec.name,
                z_start=spec.z_start,
                z_end=spec.z_end,
                q_start=tuple(spec.q_start),
                q_end=tuple(spec.q_end) if spec.q_end is not None else None,
                ex=spec.ex,
                ey=spec.ey,
            ),
            keys,
        )
        if not isinstance(made, DistributedLoad):
            continue
        if length is not None:
            problems.attempt(
                f"distributed[{index}]",
                lambda made=made: check_distributed_on_member(made, length),
                keys,
            )
        made_loads.append(made)
    return tuple(made_loads)


def _load_keys(kind: str, name: str) -> dict[str, str]:
    """The fields :func:`point_load` / :func:`applied_moment` name, as job-file keys."""
    prefix = f"{kind} {name}"
    keys = ["z", "ex", "ey", "magnitude", "angle", "from_axis", "toward_axis", "components"]
    if kind == "moment":
        keys = ["z", "Mx", "My", "Mz"]
    mapping = {f"{prefix} {key}": key for key in keys}
    mapping |= {f"{prefix} F{axis}": f"components[{i}]" for i, axis in enumerate("xyz")}
    mapping[f"{prefix} direction"] = ""
    return mapping


def _check_offsets(
    job: Job,
    section: Section,
    length: pint.Quantity,
    loads: list[PointLoad | AppliedMoment],
    problems: _Problems,
    distributed: tuple[DistributedLoad, ...] = (),
) -> list[str]:
    """Refuse an offset no bracket has; return notes for the sheet on long brackets.

    The rule (NOTED_OFFSET, REFUSED_OFFSET above): an offset beyond both the member
    length and 10 times the section's larger outside dimension is an error; one
    beyond 5 times the section's size in its own direction (the depth for ey, the
    width for ex) is printed in the design basis for the checker.
    """
    unit = section.length_unit
    numbers = section.numeric(unit)
    sizes = {
        "ex": ("width", numbers.c_left + numbers.c_right),
        "ey": ("depth", numbers.c_top + numbers.c_bottom),
    }
    largest = max(size for _, size in sizes.values())
    limit = max(float(length.to(unit).m), REFUSED_OFFSET * largest)
    notes = []
    placed = [
        ("loads", "Load", index, spec, load)
        for index, (spec, load) in enumerate(zip(job.loads, loads, strict=False))
        if isinstance(load, PointLoad)
    ]
    placed += [
        ("distributed", "Distributed load", index, spec, load)
        for index, (spec, load) in enumerate(zip(job.distributed, distributed, strict=False))
    ]
    for table, kind, index, spec, load in placed:
        for key, (what, size) in sizes.items():
            offset = float(getattr(load, key).to(unit).m)
            typed = getattr(spec, key)
            if abs(offset) > limit:
                problems.found.append(
                    (
                        f"{table}[{index}].{key}",
                        f"got {typed!r}; expected an offset of at most {_shown(limit, unit)} "
                        f"(the larger of the member length and {REFUSED_OFFSET:g} times the "
                        f"section's larger outside dimension, {_shown(largest, unit)}). Check the "
                        "number and its unit; a bracket that long is a member of its own: "
                        "check it on its own sheet, and here give the force at the centroid "
                        "with the bracket's moment as a [[moments]] entry",
                    )
                )
            elif abs(offset) > NOTED_OFFSET * size:
                notes.append(
                    f"{kind} {spec.name!r} is applied {_shown(abs(offset), unit)} from the "
                    f"centroid ({key} = {typed}), {abs(offset) / size:.3g} times the "
                    f"section {what} ({_shown(size, unit)}): the bracket or lug that carries "
                    "it, and its connection to the member, are not checked on this sheet."
                )
    return notes


def _shown(value: float, unit: str) -> str:
    """``60 in``: a length for a message, to 4 significant figures."""
    return f"{Quantity(value, unit):.4g~P}"


def _check_load_types(job: Job, design: DesignBasis, problems: _Problems) -> None:
    """Each load's type must be one the combination standard uses; name the load."""
    standard = design.combination_standard
    if standard is None:
        return
    allowed = EN_TYPES if standard.startswith("EN") else ASCE_TYPES
    meaning = (
        "with ASCE 7, D is the dead load and L the live load"
        if allowed is ASCE_TYPES
        else "with EN 1990, G is the permanent load and Q the variable load"
    )
    tables = (("loads", job.loads), ("moments", job.moments), ("distributed", job.distributed))
    for table, specs in tables:
        what = "distributed load" if table == "distributed" else table[:-1]
        for index, spec in enumerate(specs):
            if spec.type not in allowed:
                problems.found.append(
                    (
                        f"{table}[{index}].type",
                        f"{what} {spec.name!r} has type {spec.type!r}, which the "
                        f"{standard} combinations do not use; expected one of "
                        f"{', '.join(allowed)} ({meaning})",
                    )
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
        Fy = parse_quantity(material.Fy, field="material.Fy", dimension="stress")
        low, high = FY_RANGE
        if not low <= Fy <= high:
            low_si, high_si = (bound.to("MPa").m for bound in FY_RANGE)
            problems.found.append(
                (
                    "material.Fy",
                    f"got {material.Fy!r}; expected a yield stress from {low.m:g} to "
                    f"{high.m:g} ksi ({low_si:.0f} to {high_si:.0f} MPa), the range of "
                    "structural steels: check the number and its unit",
                )
            )
            return None, ""
        return Fy, "job file"
    grade = problems.attempt("material.grade", lambda: find_grade(material.grade or ""))
    if grade is None:
        return None, ""
    return grade.Fy, f"{grade.name}, minimum (calcsheet grade table)"


# The design basis's fields an InputError names -> the key under [check] it reports.
_BASIS_KEYS = {
    f"check {key}": key
    for key in ("national_annex", "gamma_M0", "gamma_M1", "gamma_M2", "en1990_expression")
}


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
        load_height=check.load_height,
        tip_restraint=check.tip_restraint,
        ltb_method=check.ltb_method,
        interaction_method=check.interaction_method,
        national_annex=check.national_annex,
        gamma_M0=check.gamma_M0,
        gamma_M1=check.gamma_M1,
        gamma_M2=check.gamma_M2,
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
