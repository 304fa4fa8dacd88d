"""The job file's schema: what a member check needs, as plain text that diffs well.

Quantities are strings with their unit ("6.5 kip", "1.2 m"), read by pint's unit
parser (never evaluated) and checked for dimension here, so a force written as
"6.5 in" is reported with its key path before anything is built. Unknown keys are
errors (a typo must not silently fall back to a default).
"""

from __future__ import annotations

import datetime
import math
import re
from typing import Annotated, Any, Literal

from pydantic import (
    AfterValidator,
    BaseModel,
    BeforeValidator,
    ConfigDict,
    Field,
    field_validator,
    model_validator,
)

from calcsheet.errors import InputError
from calcsheet.units import Quantity, parse_quantity

FORMAT_VERSION = 1

# Text printed in the title block, the sheet's title and the revision log: a line or
# two on the page. Longer text is a paste gone wrong (it would run over pages).
MAX_TEXT = 200

# The largest force and moment a job takes. A single member checked by this tool
# does not see more (100,000 kip is 445 MN; 1,000,000 kip*ft is 1.36 GN*m), so a
# larger value is a unit or a typing slip (common practice, no source). Without the
# bound, 1e9 kip printed a utilization of 68 million and 1e300 kip overflowed.
MAX_FORCE = Quantity(100_000, "kip")
MAX_MOMENT = Quantity(1_000_000, "kip*ft")
# The longest member: a cantilever of 1,000 ft (305 m) is beyond any this tool checks;
# 1e30 in overflowed in the statics with a message naming no key.
MAX_MEMBER_LENGTH = Quantity(1_000, "ft")
# The largest distributed load: 10,000 kip/ft (146 MN/m) is far beyond what a member
# checked here carries along its length, so a larger value is a slip of unit or digit
# (common practice, no source).
MAX_LINE_LOAD = Quantity(10_000, "kip/ft")

# The unit a bare number most likely lacks, for the message that asks for it.
_UNIT_EXAMPLES = {
    "length": ("in", "mm"),
    "force": ("kip", "kN"),
    "moment": ("kip*ft", "kN*m"),
    "stress": ("ksi", "MPa"),
    "angle": ("deg",),
    "force per length": ("kip/ft", "kN/m"),
}


def _quoted(dimension: str) -> BeforeValidator:
    """A bare number (``angle = 15``) is refused with the entry to write instead."""

    def check(value: Any) -> Any:
        if isinstance(value, (int, float)) and not isinstance(value, bool):
            # The number as typed when it is an ordinary one (not nan, not 400 digits).
            number = str(value) if isinstance(value, int) else f"{value:g}"
            not_finite = isinstance(value, float) and not math.isfinite(value)
            if not_finite or len(number) > 20:
                number = "15"
            written = " or ".join(f'"{number} {unit}"' for unit in _UNIT_EXAMPLES[dimension])
            raise ValueError(f"a number needs its unit, in quotes: write {written}")
        return value

    return BeforeValidator(check)


def _quantity(dimension: str, largest: Quantity | None = None) -> AfterValidator:
    def check(text: str) -> str:
        try:
            value = parse_quantity(text, field="value", dimension=dimension)
        except InputError as error:
            problem = f"{error.problem}; " if error.problem else ""
            raise ValueError(f"{problem}expected {error.expected}") from None
        if largest is not None and abs(value) > largest:
            raise ValueError(_too_large(dimension, largest))
        return text

    return AfterValidator(check)


def _too_large(dimension: str, largest: Quantity) -> str:
    us, si = {
        "force": ("kip", "kN"),
        "moment": ("kip*ft", "kN*m"),
        "length": ("ft", "m"),
        "force per length": ("kip/ft", "kN/m"),
    }[dimension]
    return (
        f"a {dimension} of at most {largest.to(us).m:,.0f} {us} "
        f"({largest.to(si).m:,.0f} {si}) in size; check the number and its unit"
    )


Length = Annotated[str, _quoted("length"), _quantity("length")]
Force = Annotated[str, _quoted("force"), _quantity("force")]
Moment = Annotated[str, _quoted("moment"), _quantity("moment")]
Stress = Annotated[str, _quoted("stress"), _quantity("stress")]
Angle = Annotated[str, _quoted("angle"), _quantity("angle")]
LoadForce = Annotated[str, _quoted("force"), _quantity("force", MAX_FORCE)]
LoadMoment = Annotated[str, _quoted("moment"), _quantity("moment", MAX_MOMENT)]
MemberLength = Annotated[str, _quoted("length"), _quantity("length", MAX_MEMBER_LENGTH)]
LineLoad = Annotated[str, _quoted("force per length"), _quantity("force per length", MAX_LINE_LOAD)]

_ISO_DATE = re.compile(r"\d{4}-\d{2}-\d{2}")


def _date_text(value: Any) -> Any:
    """A TOML date (``date = 2026-12-01``) as its ISO text; text is checked after."""
    if isinstance(value, datetime.date) and not isinstance(value, datetime.datetime):
        return value.isoformat()
    return value


def _iso_date(text: str) -> str:
    if not text:
        return text
    try:
        if _ISO_DATE.fullmatch(text) is None:
            raise ValueError
        datetime.date.fromisoformat(text)
    except ValueError:
        raise ValueError(
            "a date as YYYY-MM-DD (year, month, day), such as 2026-12-01, or empty"
        ) from None
    return text


Date = Annotated[str, BeforeValidator(_date_text), AfterValidator(_iso_date)]
Text = Annotated[str, Field(max_length=MAX_TEXT)]


# ASCE 7 types (D, L, Lr, S, R, W, E) and EN 1990 types (G, Q, S, W).
LoadType = Literal["D", "L", "Lr", "S", "R", "W", "E", "G", "Q"]


class _Table(BaseModel):
    """A TOML table: unknown keys are errors; text is stripped."""

    model_config = ConfigDict(extra="forbid", str_strip_whitespace=True, frozen=True)


class SheetSpec(_Table):
    """The sheet's title, the unit system every value is shown in, and how much of the
    point-by-point derivation is written out ("concise": the governing points, every
    other point in the table; "full": every point step by step)."""

    title: Text = "Member combined stresses"
    units: Literal["US", "SI"] = "US"
    detail: Literal["concise", "full"] = "concise"


class TitleBlockSpec(_Table):
    """The title block on every page: text of at most MAX_TEXT characters, ISO dates."""

    project: Text = ""
    project_number: Text = ""
    subject: Text = ""
    calc_number: Text = ""
    prepared_by: Text = ""
    prepared_date: Date = ""
    checked_by: Text = ""
    checked_date: Date = ""


class RevisionSpec(_Table):
    mark: str = Field(min_length=1, max_length=20)
    date: Date = ""
    description: Text = ""
    by: Text = ""


SectionKind = Literal[
    "plate", "round bar", "round HSS", "rectangular HSS", "I", "channel", "angle", "tee"
]


class SectionSpec(_Table):
    """A section by dimensions; which keys a kind needs is checked when it is built."""

    kind: SectionKind
    name: Text = ""
    b: Length | None = None
    d: Length | None = None
    D: Length | None = None
    OD: Length | None = None
    t: Length | None = None
    H: Length | None = None
    B: Length | None = None
    bf: Length | None = None
    tf: Length | None = None
    tw: Length | None = None
    bf_bottom: Length | None = None
    tf_bottom: Length | None = None


# The station the member sheet finds by itself: the one of the largest utilization along
# the member (``stations = "auto"``, the default).
AUTO_STATION = "auto"

# The motions a support restrains: translations along and rotations about x, y, z.
Motion = Literal["ux", "uy", "uz", "rx", "ry", "rz"]
# The direction gravity acts in, for the self-weight: -y for a beam with its web
# vertical, -z for a column standing on its base at z = 0.
GravityAxis = Literal["+x", "-x", "+y", "-y", "+z", "-z"]


def _stations(value: Any) -> Any:
    """``"auto"`` (any case) or a list of stations; other text says what to write."""
    if isinstance(value, str) and value.strip().lower() == AUTO_STATION:
        return AUTO_STATION
    if not isinstance(value, list):
        raise ValueError(
            f'write "{AUTO_STATION}" (the critical station is found along the member) or a '
            'list of stations from the support, such as ["0 in", "24 in"]'
        )
    return value


class MemberSpec(_Table):
    """The member: name, section (a catalog designation or dimensions), length, stations.

    ``stations``: "auto" (the default: the sheet finds the critical station) or a list.
    ``supports``: a named case (fixed-free, pinned-pinned, fixed-pinned, fixed-fixed,
    overhang, two-span; checked when the model is built), with ``support_positions``
    to move its supports; or the job's ``[[supports]]`` tables, not both.
    ``self_weight`` (on by default, load type D of the member's own weight) acts along
    ``gravity``; ``braces`` are the stations where the member is braced.
    """

    name: str = Field(min_length=1, max_length=80)
    section: str | SectionSpec
    length: MemberLength
    stations: Annotated[list[Length], Field(min_length=1, max_length=20)] | Literal["auto"] = Field(
        default=AUTO_STATION, union_mode="left_to_right"
    )
    supports: str = Field(default="fixed-free", min_length=1, max_length=40)
    support_positions: list[Length] | None = Field(default=None, min_length=1, max_length=10)
    self_weight: bool = True
    gravity: GravityAxis = "-y"
    braces: list[Length] = Field(default_factory=list, max_length=50)

    @field_validator("stations", mode="before")
    @classmethod
    def _auto_or_list(cls, value: Any) -> Any:
        return _stations(value)

    @field_validator("stations")
    @classmethod
    def _each_station_once(cls, stations: list[str] | str) -> list[str] | str:
        if isinstance(stations, str):
            return stations
        return _each_once(stations, "stations", "station")

    @field_validator("braces")
    @classmethod
    def _each_brace_once(cls, braces: list[str]) -> list[str]:
        return _each_once(braces, "braces", "brace point")

    @property
    def auto_station(self) -> bool:
        """Whether the sheet finds the critical station itself."""
        return self.stations == AUTO_STATION


def _each_once(texts: list[str], key: str, what: str) -> list[str]:
    """Refuse a station given twice, compared in one unit to 9 significant figures.

    So "12 in" repeats "1 ft".
    """
    seen: dict[str, int] = {}
    for index, text in enumerate(texts):
        inches = parse_quantity(text, field=what, dimension="length").to("in").m
        found = f"{inches:.9g}"
        if found in seen:
            first = seen[found]
            raise ValueError(
                f"{key}[{index}] = {text!r} repeats {key}[{first}] = {texts[first]!r}; "
                f"each {what} is given once: remove the repeat"
            )
        seen[found] = index
    return texts


class SupportSpec(_Table):
    """A support of the member's own making: where it is and which motions it restrains."""

    name: str = Field(min_length=1, max_length=80)
    z: Length
    restrains: list[Motion] = Field(min_length=1, max_length=6)

    @field_validator("restrains", mode="before")
    @classmethod
    def _holds_something(cls, value: Any) -> Any:
        if isinstance(value, list) and not value:
            raise ValueError(
                'a support restrains at least one motion: list them, such as ["ux", "uy", '
                '"uz", "rz"] for a pin (ux, uy, uz translations; rx, ry, rz rotations)'
            )
        return value

    @field_validator("restrains")
    @classmethod
    def _each_motion_once(cls, motions: list[str]) -> list[str]:
        twice = sorted({motion for motion in motions if motions.count(motion) > 1})
        if twice:
            raise ValueError(f"each motion is listed once; listed twice: {', '.join(twice)}")
        return motions


class MaterialSpec(_Table):
    """A grade from the list (F_y and F_u prefilled) or F_y given directly; F_y given wins."""

    grade: str | None = None
    Fy: Stress | None = None
    Fu: Stress | None = None

    @model_validator(mode="after")
    def _needs_a_yield_stress(self) -> MaterialSpec:
        if self.grade is None and self.Fy is None:
            raise ValueError("give a grade or Fy")
        return self


class CheckSpec(_Table):
    """Which check the sheet makes, and its settings (unused settings are ignored).

    ``kind``: "allowable stress" (generic von Mises against F_y/Ω), "AISC 360-22"
    (``method`` LRFD or ASD) or "EN 1993-1-1". ``combinations``: the load
    combination standard; by default ASCE 7-22 (strength for LRFD, ASD for ASD)
    with AISC, EN 1990 with EN 1993, none with the allowable-stress check.
    ``reverse_lateral``: wind and earthquake loads act also reversed. EN 1990 only:
    ``en1990_expression`` ("6.10", or "6.10a/b" for Eq. 6.10a and 6.10b),
    ``imposed_category`` (A-H, Table A1.1: ψ0 of Q), ``snow_site`` (ψ0 of S) and
    ``psi0`` (ψ0 of Q, S or W given directly, e.g. ``{ S = 0.7 }``). EN 1993-1-1:
    ``national_annex`` names the set of national choices (γM0, γM1, γM2, ψ, the
    expression), "EN recommended values" by default; ``gamma_M0``, ``gamma_M1``,
    ``gamma_M2`` and ``en1990_expression`` override single values of it.
    """

    kind: Literal["allowable stress", "AISC 360-22", "EN 1993-1-1"] = "allowable stress"
    method: Literal["LRFD", "ASD"] = "LRFD"
    factor_of_safety: float = Field(default=1.67, gt=0, le=100)
    combinations: (
        Literal[
            "ASCE 7-22 strength",
            "ASCE 7-22 ASD",
            "ASCE 7-16 strength",
            "ASCE 7-16 ASD",
            "EN 1990",
            "none",
        ]
        | None
    ) = None
    K: float | None = Field(default=None, gt=0, le=10)
    Lb: Length | None = None
    Cb: float | None = Field(default=None, ge=1.0, le=3.0)  # None: defaulted, and said so
    # Cantilever lateral-torsional buckling of I-shapes (AISC): spellings checked with
    # the design basis ("top flange", "shear centre", "bottom flange"; "free",
    # "laterally braced", "torsionally restrained").
    load_height: str | None = Field(default=None, min_length=1, max_length=40)
    tip_restraint: str | None = Field(default=None, min_length=1, max_length=40)
    # EN 1993-1-1: 6.3.2.2 (general case) or 6.3.2.3 (rolled); 6.3.3 by Annex B or A.
    ltb_method: Literal["6.3.2.2", "6.3.2.3"] | None = None
    interaction_method: Literal["A", "B"] = "B"
    # National choices (EN): a named set (the set's names are checked with the design
    # basis) and single values overridden; None takes the set's value.
    national_annex: str = Field(default="EN recommended values", min_length=1, max_length=80)
    gamma_M0: float | None = Field(default=None, ge=0.8, le=2.0)
    gamma_M1: float | None = Field(default=None, ge=0.8, le=2.0)
    gamma_M2: float | None = Field(default=None, ge=0.8, le=2.0)
    S_DS: float | None = Field(default=None, ge=0, le=5)
    reverse_lateral: bool = False
    en1990_expression: Literal["6.10", "6.10a/b"] | None = None
    imposed_category: Literal["A", "B", "C", "D", "E", "F", "G", "H"] = "A"
    snow_site: Literal["H <= 1000 m", "H > 1000 m", "Nordic"] = "H <= 1000 m"
    psi0: dict[Literal["Q", "S", "W"], Annotated[float, Field(ge=0, le=1)]] | None = None
    deflection_limit: float | None = Field(default=None, gt=0, le=10000)


class ExploreSpec(_Table):
    """Design exploration drawn on the sheet: the load-direction sweep, the lightest section."""

    sweep_load: str = ""
    sweep_step: Angle = "5 deg"
    lightest_in: str = ""


class LoadSpec(_Table):
    """A point load: magnitude with an angle between two axes, or three components."""

    name: str = Field(min_length=1, max_length=80)
    type: LoadType = "D"
    z: Length
    magnitude: LoadForce | None = None
    angle: Angle | None = None
    from_axis: str = "+z"
    toward_axis: str = "-y"
    components: list[LoadForce] | None = Field(default=None, min_length=3, max_length=3)
    ex: Length = "0 in"
    ey: Length = "0 in"

    @model_validator(mode="after")
    def _one_way_of_giving_the_direction(self) -> LoadSpec:
        polar = self.magnitude is not None or self.angle is not None
        if polar and self.components is not None:
            raise ValueError("give either magnitude and angle, or components, not both")
        if self.components is None and (self.magnitude is None or self.angle is None):
            raise ValueError("give magnitude and angle, or components = [Fx, Fy, Fz]")
        return self


class MomentSpec(_Table):
    """A concentrated couple at z, by its components about x, y, z (right-hand rule)."""

    name: str = Field(min_length=1, max_length=80)
    type: LoadType = "D"
    z: Length
    Mx: LoadMoment = "0 kip*ft"
    My: LoadMoment = "0 kip*ft"
    Mz: LoadMoment = "0 kip*ft"


class DistributedSpec(_Table):
    """A distributed load from z_start to z_end: force per length (qx, qy, qz) at each end.

    ``q_end`` defaults to ``q_start`` (a uniform load); ``ex``, ``ey`` offset its line
    of action from the centroid, as for a point load.
    """

    name: str = Field(min_length=1, max_length=80)
    type: LoadType = "D"
    z_start: Length
    z_end: Length
    q_start: list[LineLoad] = Field(min_length=3, max_length=3)
    q_end: list[LineLoad] | None = Field(default=None, min_length=3, max_length=3)
    ex: Length = "0 in"
    ey: Length = "0 in"


def _true_or_false(value: Any) -> Any:
    """A TOML boolean; the words ``true`` and ``false`` also as text (a batch's CSV cell).

    pydantic would also take "yes", "on", "1" and the like: a switch that decides what is
    written is given plainly or refused.
    """
    if isinstance(value, bool):
        return value
    if value in ("true", "false"):
        return value == "true"
    raise ValueError("expected true or false (a TOML boolean, without quotes)")


class OutputSpec(_Table):
    """Where the sheet goes and what is written; not part of the inputs hash.

    ``folder`` (inside the job's folder), ``stem`` (file names; empty: the member's name),
    ``paper`` ("letter" or "a4"), ``formats`` (any of pdf, html, json). ``package = true``
    also writes the job's calc package beside the sheets: one PDF with a cover, the
    contents, a summary and every station's sheet numbered through, and its JSON
    (``<stem>-rev<R>-package.pdf``/``.json``; calc number from the title block).
    """

    folder: str = "out"
    stem: str = ""
    paper: Literal["letter", "a4"] = "letter"
    formats: list[Literal["pdf", "html", "json"]] = Field(
        default_factory=lambda: ["pdf", "html", "json"], min_length=1
    )
    package: Annotated[bool, BeforeValidator(_true_or_false)] = False


class Job(_Table):
    """A whole job file."""

    version: Literal[1] = FORMAT_VERSION
    sheet: SheetSpec = SheetSpec()
    title_block: TitleBlockSpec = TitleBlockSpec()
    revisions: list[RevisionSpec] = Field(default_factory=list, max_length=200)
    member: MemberSpec
    material: MaterialSpec
    check: CheckSpec = CheckSpec()
    explore: ExploreSpec = ExploreSpec()
    loads: list[LoadSpec] = Field(default_factory=list, max_length=200)
    moments: list[MomentSpec] = Field(default_factory=list, max_length=200)
    distributed: list[DistributedSpec] = Field(default_factory=list, max_length=200)
    supports: list[SupportSpec] = Field(default_factory=list, max_length=20)
    output: OutputSpec = OutputSpec()

    @model_validator(mode="after")
    def _needs_a_load(self) -> Job:
        if not self.loads and not self.moments and not self.distributed:
            raise ValueError("give at least one [[loads]], [[moments]] or [[distributed]] entry")
        names = [entry.name for entry in (*self.loads, *self.moments, *self.distributed)]
        twice = sorted({name for name in names if names.count(name) > 1})
        if twice:
            raise ValueError(f"load names must differ; used twice: {', '.join(twice)}")
        return self

    @model_validator(mode="after")
    def _supports_one_way(self) -> Job:
        named = "supports" in self.member.model_fields_set
        if self.supports and named:
            raise ValueError(
                f"the supports are given twice: member.supports = {self.member.supports!r} "
                "and [[supports]] tables; give a named case in member.supports or your own "
                "[[supports]] tables, not both"
            )
        if self.supports and self.member.support_positions is not None:
            raise ValueError(
                "member.support_positions moves the supports of a named case "
                "(member.supports); [[supports]] tables give each support's own z"
            )
        names = [entry.name for entry in self.supports]
        twice = sorted({name for name in names if names.count(name) > 1})
        if twice:
            raise ValueError(f"support names must differ; used twice: {', '.join(twice)}")
        return self


def known_keys() -> set[str]:
    """Every key of every table, for "did you mean" suggestions."""
    keys: set[str] = set()
    for model in (
        Job,
        SheetSpec,
        TitleBlockSpec,
        RevisionSpec,
        SectionSpec,
        MemberSpec,
        MaterialSpec,
        CheckSpec,
        ExploreSpec,
        LoadSpec,
        MomentSpec,
        DistributedSpec,
        SupportSpec,
        OutputSpec,
    ):
        keys.update(model.model_fields)
    return keys
