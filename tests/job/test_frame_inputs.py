"""The job's frame inputs become the member sheet's keyword arguments (model values).

Supports (a named case with positions, or supports of the job's own), distributed
loads with their types, self-weight (on by default) with its gravity axis, brace
points and the automatic station, read by :func:`calcsheet.pipeline.model.member_model`.
"""

from __future__ import annotations

import inspect
import tomllib
from pathlib import Path

import pytest

from calcsheet.calcs.member import member_sheet
from calcsheet.job import JobError, job_from_data, parse_job, read_job
from calcsheet.job.starter import STARTER
from calcsheet.mechanics.distributed import DistributedLoad
from calcsheet.mechanics.supports import FIXED, PINNED, Support
from calcsheet.pipeline.model import member_model
from calcsheet.units import Quantity

BASE = """
version = 1

[member]
name = "C-1"
section = "W10X33"
length = "20 ft"
{member}

[material]
grade = "ASTM A992"

[check]
kind = "AISC 360-22"

[[loads]]
name = "bracket"
type = "D"
z = "12 ft"
components = ["0 kip", "0 kip", "-5 kip"]
ey = "6 in"
{tables}
"""

WIND = """
[[distributed]]
name = "wind"
type = "W"
z_start = "0 ft"
z_end = "20 ft"
q_start = ["0.1 kip/ft", "0 kip/ft", "0 kip/ft"]
q_end = ["0.2 kip/ft", "0 kip/ft", "0 kip/ft"]
ey = "2 in"
"""


def job_text(member: str = "", tables: str = "") -> str:
    return BASE.format(member=member, tables=tables)


@pytest.fixture
def frame_on() -> None:
    """(The model always gives the member sheet its frame options.)"""


def test_the_member_sheet_takes_every_frame_option() -> None:
    parameters = inspect.signature(member_sheet).parameters
    for name in ("supports", "support_positions", "distributed", "self_weight", "braces"):
        assert name in parameters


def test_the_defaults_are_auto_station_self_weight_on_and_gravity_minus_y() -> None:
    job = parse_job(job_text())
    assert job.member.stations == "auto" and job.member.auto_station
    assert job.member.supports == "fixed-free" and job.supports == []
    assert job.member.self_weight is True and job.member.gravity == "-y"
    assert job.member.braces == [] and job.distributed == []


def test_a_plain_job_asks_only_for_self_weight(frame_on) -> None:
    model = member_model(parse_job(job_text()))
    assert model.self_weight is True and model.stations == ("auto",) and model.auto_station
    assert model.frame_options == {"self_weight": True, "gravity": "-y"}
    assert model.sheet_arguments("auto") == {"station": "auto", **model.frame_options}


def test_self_weight_off_and_stations_given_are_the_old_cantilever(frame_on) -> None:
    text = job_text('self_weight = false\nstations = ["0 ft", "6 ft"]')
    model = member_model(parse_job(text))
    assert model.self_weight is False and model.frame_options == {}
    assert model.stations == (Quantity(0, "ft"), Quantity(6, "ft"))
    assert model.sheet_arguments(model.stations[1]) == {"station": Quantity(6, "ft")}


def test_a_named_case_with_positions_and_braces(frame_on) -> None:
    member = (
        'supports = "overhang"\nsupport_positions = ["2 ft", "16 ft"]\n'
        'braces = ["8 ft"]\ngravity = "-z"'
    )
    model = member_model(parse_job(job_text(member)))
    options = model.frame_options
    assert options["supports"] == "overhang"
    assert options["support_positions"] == [Quantity(2, "ft"), Quantity(16, "ft")]
    assert options["braces"] == [Quantity(8, "ft")]
    assert options["gravity"] == "-z" and options["self_weight"] is True


def test_a_case_name_is_read_in_any_case_and_spacing(frame_on) -> None:
    model = member_model(parse_job(job_text('supports = " Pinned-Pinned "')))
    assert model.frame_options["supports"] == "pinned-pinned"
    assert "support_positions" not in model.frame_options


def test_supports_of_the_jobs_own_become_support_objects(frame_on) -> None:
    tables = """
[[supports]]
name = "base"
z = "0 ft"
restrains = ["ux", "uy", "uz", "rx", "ry", "rz"]

[[supports]]
name = "tie"
z = "20 ft"
restrains = ["ux", "uy", "uz", "rz"]
"""
    model = member_model(parse_job(job_text(tables=tables)))
    base, tie = model.frame_options["supports"]
    assert base == Support("base", Quantity(0, "ft"), FIXED)
    assert tie == Support("tie", Quantity(20, "ft"), PINNED)


def test_a_distributed_load_becomes_a_load_object_with_its_type(frame_on) -> None:
    model = member_model(parse_job(job_text(tables=WIND)))
    (wind,) = model.frame_options["distributed"]
    assert isinstance(wind, DistributedLoad)
    assert (wind.name, wind.z_start, wind.z_end) == ("wind", Quantity(0, "ft"), Quantity(20, "ft"))
    assert wind.q_start[0] == Quantity(0.1, "kip/ft") and wind.q_end[0] == Quantity(0.2, "kip/ft")
    assert wind.ey == Quantity(2, "in")
    assert model.frame_options["distributed_types"] == ["W"]


def test_a_uniform_distributed_load_repeats_its_start(frame_on) -> None:
    text = job_text(tables=WIND.replace('q_end = ["0.2 kip/ft", "0 kip/ft", "0 kip/ft"]\n', ""))
    (wind,) = member_model(parse_job(text)).distributed
    assert wind.q_end == wind.q_start


def test_a_job_of_distributed_loads_only_is_a_job() -> None:
    text = job_text(tables=WIND).replace(
        '[[loads]]\nname = "bracket"\ntype = "D"\nz = "12 ft"\n'
        'components = ["0 kip", "0 kip", "-5 kip"]\ney = "6 in"\n',
        "",
    )
    assert len(parse_job(text).distributed) == 1


def test_load_names_differ_across_point_and_distributed_loads() -> None:
    with pytest.raises(JobError) as raised:
        parse_job(job_text(tables=WIND.replace('name = "wind"', 'name = "bracket"')))
    assert "load names must differ; used twice: bracket" in str(raised.value)


def test_positions_of_a_named_case_do_not_go_with_supports_of_your_own() -> None:
    tables = '[[supports]]\nname = "base"\nz = "0 ft"\nrestrains = ["ux"]\n'
    with pytest.raises(JobError) as raised:
        parse_job(job_text('support_positions = ["0 ft"]', tables))
    assert "member.support_positions moves the supports of a named case" in str(raised.value)


EXAMPLES = Path(__file__).resolve().parents[2] / "examples"


def test_the_column_bracket_demo_reads_and_asks_for_its_frame(frame_on) -> None:
    job = read_job(EXAMPLES / "column-bracket.toml")
    model = member_model(job)
    options = model.frame_options
    assert options["supports"] == "pinned-pinned" and options["gravity"] == "-z"
    assert options["self_weight"] is True and options["braces"] == [Quantity(9, "ft")]
    assert [load.name for load in options["distributed"]] == ["wind on column"]
    assert model.auto_station and model.load_types == ("D", "L")


def _commented_table(text: str, header: str) -> dict:
    """The starter's commented-out ``header`` table, uncommented and read as TOML."""
    lines = text.split(f"# {header}\n", 1)[1].split("\n\n", 1)[0].splitlines()
    body = "\n".join(line.removeprefix("# ").split("  #")[0] for line in lines)
    return tomllib.loads(body)


@pytest.mark.parametrize(
    ("header", "key"), [("[[supports]]", "supports"), ("[[distributed]]", "distributed")]
)
def test_the_starters_commented_tables_are_valid_when_uncommented(header: str, key: str) -> None:
    data = tomllib.loads(STARTER)
    data[key] = [_commented_table(STARTER, header)]
    if key == "supports":
        del data["member"]["supports"]
    job = job_from_data(data)
    assert len(getattr(job, key)) == 1


def test_a_batch_table_sets_the_support_case_self_weight_and_stations() -> None:
    """The batch CSV columns are job key paths: the frame keys are columns like any other."""
    from calcsheet.pipeline.batch import column_problem, members_from_csv

    base = tomllib.loads(job_text())
    table = (
        "member.name,member.supports,member.self_weight,member.stations,member.braces[0]\n"
        "C-1,pinned-pinned,false,auto,10 ft\n"
        "C-2,fixed-free,true,auto,5 ft\n"
    )
    for column in table.splitlines()[0].split(","):
        assert column_problem(column) is None, column
    first, second = (
        job_from_data(member.data) for member in members_from_csv(table, base, source="b.csv")
    )
    assert first.member.supports == "pinned-pinned" and first.member.self_weight is False
    assert first.member.auto_station and first.member.braces == ["10 ft"]
    assert second.member.self_weight is True and second.member.supports == "fixed-free"


def test_a_batch_cell_that_is_not_yes_or_no_names_the_key() -> None:
    from calcsheet.pipeline.batch import members_from_csv

    base = tomllib.loads(job_text())
    (member,) = members_from_csv("member.self_weight\nmaybe\n", base, source="b.csv")
    with pytest.raises(JobError) as raised:
        job_from_data(member.data)
    ((path, message),) = raised.value.problems
    assert path == "member.self_weight" and "valid boolean" in message and "'maybe'" in message


def test_the_inputs_hash_reads_the_frame_quantities_in_any_unit() -> None:
    """Quantities hash in SI base units: 20 ft and 240 in are one input (1 ft = 12 in)."""
    from calcsheet.pipeline import inputs_hash

    feet = parse_job(job_text('braces = ["10 ft"]', WIND))
    inches = parse_job(
        job_text('braces = ["120 in"]', WIND.replace('z_end = "20 ft"', 'z_end = "240 in"'))
    )
    assert inputs_hash(feet) == inputs_hash(inches)
    assert inputs_hash(feet) != inputs_hash(parse_job(job_text('braces = ["11 ft"]', WIND)))
