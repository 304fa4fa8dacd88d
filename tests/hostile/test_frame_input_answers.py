"""Careless frame inputs (supports, distributed loads, brace points, stations) get clear answers.

Each case edits the shipped demo job (examples/outrigger.toml) and runs
``calcsheet check`` on it: exit 2 and a message naming the key path, what was
typed and what to write instead; never a traceback.
"""

from __future__ import annotations

from pathlib import Path

import pytest

from .support import OUTRIGGER
from .test_input_answers import answer, refused_at


def with_member(*lines: str) -> tuple[str, str]:
    """An edit setting ``lines`` (``key = value``) in the demo job's [member] table."""
    block = OUTRIGGER[OUTRIGGER.index('length = "48 in"') : OUTRIGGER.index("\n\n[material]")]
    kept = block.splitlines()
    for line in lines:
        key = line.split("=")[0].strip()
        kept = [old for old in kept if old.split("=")[0].strip() != key] + [line]
    return (block, "\n".join(kept))


# The demo job names its support case; supports of the job's own replace it.
NO_NAMED_CASE = ('supports = "fixed-free"', "# no named case")


def with_tables(text: str) -> tuple[str, str]:
    """An edit adding array-of-tables entries before the demo job's [output] table."""
    return ("[output]", text.strip() + "\n\n[output]")


WIND = """
[[distributed]]
name = "wind along the arm"
type = "W"
z_start = "0 in"
z_end = "48 in"
q_start = ["0.02 kip/ft", "0 kip/ft", "0 kip/ft"]
"""


def test_an_unknown_support_case_suggests_the_close_name(tmp_path: Path, capsys) -> None:
    line = refused_at(
        *answer(tmp_path, capsys, with_member('supports = "pinned-pined"')), "member.supports"
    )
    assert "got 'pinned-pined'" in line
    assert "expected one of fixed-free, pinned-pinned" in line
    assert 'did you mean "pinned-pinned"' in line


def test_a_support_position_outside_the_member_is_named(tmp_path: Path, capsys) -> None:
    edit = with_member('supports = "pinned-pinned"', 'support_positions = ["0 in", "60 in"]')
    line = refused_at(*answer(tmp_path, capsys, edit), "member.support_positions[1]")
    assert "got '60 in' (outside the member)" in line
    assert "expected a station from 0 to the member length 48" in line


def test_a_wrong_count_of_support_positions_says_how_many(tmp_path: Path, capsys) -> None:
    edit = with_member('supports = "two-span"', 'support_positions = ["0 in", "48 in"]')
    line = refused_at(*answer(tmp_path, capsys, edit), "member.support_positions")
    assert "expected 3 stations for the case two-span" in line


def test_an_overhang_without_its_positions_asks_for_them(tmp_path: Path, capsys) -> None:
    line = refused_at(
        *answer(tmp_path, capsys, with_member('supports = "overhang"')), "member.support_positions"
    )
    assert "2 stations for the case overhang" in line


def test_a_support_of_your_own_outside_the_member_is_named(tmp_path: Path, capsys) -> None:
    tables = '[[supports]]\nname = "base"\nz = "-6 in"\nrestrains = ["ux", "uy", "uz", "rz"]\n'
    line = refused_at(
        *answer(tmp_path, capsys, NO_NAMED_CASE, with_tables(tables)), "supports[0].z"
    )
    assert "got '-6 in' (outside the member)" in line


def test_a_support_that_restrains_nothing_is_refused(tmp_path: Path, capsys) -> None:
    tables = '[[supports]]\nname = "base"\nz = "0 in"\nrestrains = []\n'
    line = refused_at(
        *answer(tmp_path, capsys, NO_NAMED_CASE, with_tables(tables)), "supports[0].restrains"
    )
    assert "a support restrains at least one motion" in line
    assert '["ux", "uy", "uz", "rz"]' in line


def test_an_unknown_motion_lists_the_six(tmp_path: Path, capsys) -> None:
    tables = '[[supports]]\nname = "base"\nz = "0 in"\nrestrains = ["ux", "uw"]\n'
    line = refused_at(
        *answer(tmp_path, capsys, NO_NAMED_CASE, with_tables(tables)), "supports[0].restrains[1]"
    )
    assert "'ux', 'uy', 'uz', 'rx', 'ry' or 'rz'" in line and "'uw'" in line


def test_a_named_case_and_supports_of_your_own_are_refused_together(tmp_path, capsys) -> None:
    edits = (
        with_member('supports = "fixed-free"'),
        with_tables('[[supports]]\nname = "base"\nz = "0 in"\nrestrains = ["ux"]\n'),
    )
    status, message = answer(tmp_path, capsys, *edits)
    assert status == 2
    assert "the supports are given twice: member.supports = 'fixed-free' and [[supports]]" in (
        message
    )


def test_a_brace_point_outside_the_member_is_named(tmp_path: Path, capsys) -> None:
    edit = with_member('braces = ["24 in", "50 in"]')
    line = refused_at(*answer(tmp_path, capsys, edit), "member.braces[1]")
    assert "got '50 in' (outside the member)" in line


def test_a_distributed_load_of_zero_length_is_refused(tmp_path: Path, capsys) -> None:
    wind = WIND.replace('z_start = "0 in"', 'z_start = "48 in"')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].z_end")
    assert "got '48 in' (a distributed load needs a length)" in line
    assert "expected a station beyond z_start = 48" in line


def test_a_distributed_load_past_the_free_end_is_refused(tmp_path: Path, capsys) -> None:
    wind = WIND.replace('z_end = "48 in"', 'z_end = "5 ft"')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].z_end")
    assert "(outside the member)" in line and "from 0 to the member length 48" in line


def test_a_line_load_in_the_wrong_unit_names_the_component(tmp_path: Path, capsys) -> None:
    wind = WIND.replace('"0.02 kip/ft", "0 kip/ft"', '"0.02 kip/ft", "0.1 kip"')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].q_start[1]")
    assert "a force per length" in line and "'0.1 kip'" in line


def test_a_line_load_as_a_bare_number_asks_for_its_unit(tmp_path: Path, capsys) -> None:
    wind = WIND.replace('"0.02 kip/ft"', "0.02")
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].q_start[0]")
    assert 'write "0.02 kip/ft" or "0.02 kN/m"' in line


def test_a_line_load_needs_three_components(tmp_path: Path, capsys) -> None:
    wind = WIND.replace('"0.02 kip/ft", "0 kip/ft", "0 kip/ft"', '"0.02 kip/ft"')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].q_start")
    assert "at least 3 entries allowed; this list has 1" in line


def test_a_distributed_load_type_the_combinations_lack_names_the_load(tmp_path, capsys) -> None:
    wind = WIND.replace('type = "W"', 'type = "Q"')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].type")
    assert "distributed load 'wind along the arm' has type 'Q'" in line


@pytest.mark.parametrize("typed", ['"top"', "5", "true"])
def test_stations_neither_auto_nor_a_list_say_what_to_write(tmp_path, capsys, typed) -> None:
    edit = ('stations = ["0 in"]', f"stations = {typed}")
    line = refused_at(*answer(tmp_path, capsys, edit), "member.stations")
    assert 'write "auto" (the critical station is found along the member)' in line


def test_a_gravity_axis_not_among_the_six_is_refused(tmp_path: Path, capsys) -> None:
    line = refused_at(*answer(tmp_path, capsys, with_member('gravity = "down"')), "member.gravity")
    assert "'+x', '-x', '+y', '-y', '+z' or '-z'" in line


def test_a_distributed_load_far_off_the_member_is_refused_as_a_point_load_is(
    tmp_path: Path, capsys
) -> None:
    wind = WIND.replace('q_start = ["0.02', 'ey = "1e6 in"\nq_start = ["0.02')
    line = refused_at(*answer(tmp_path, capsys, with_tables(wind)), "distributed[0].ey")
    assert "got '1e6 in'; expected an offset of at most 60 in" in line
