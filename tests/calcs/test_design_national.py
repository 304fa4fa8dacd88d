"""National choices: the named set, single values overridden, the job keys, the sheet.

Values checked against EN 1990:2002+A1:2005 Table A1.1 (ψ0, ψ1, ψ2, recommended
values) and EN 1993-1-1:2005 6.1(1) Note 2B (γM0 = 1.00, γM1 = 1.00, γM2 = 1.25),
both from memory.
"""

from __future__ import annotations

from pathlib import Path

import pytest

from calcsheet.calcs.design import DesignBasis, plan_combinations
from calcsheet.errors import InputError
from calcsheet.job import JobError, parse_job
from calcsheet.mechanics import point_load
from calcsheet.pipeline.model import member_model
from calcsheet.sections import catalog_section
from calcsheet.standards import combinations as combos
from calcsheet.standards.national import (
    EN_RECOMMENDED,
    RECOMMENDED,
    national_choices,
)
from calcsheet.units import Quantity

EN_BRACKET = Path(__file__).resolve().parents[2] / "examples" / "en-bracket.toml"


def test_the_recommended_set_carries_the_standards_values() -> None:
    # EN 1993-1-1 6.1(1) Note 2B (from memory).
    assert (EN_RECOMMENDED.gamma_M0, EN_RECOMMENDED.gamma_M1, EN_RECOMMENDED.gamma_M2) == (
        1.00,
        1.00,
        1.25,
    )
    # EN 1990 Table A1.1 (from memory): offices 0.7/0.5/0.3, storage 1.0/0.9/0.8,
    # roofs 0/0/0, snow H <= 1000 m 0.5/0.2/0, wind 0.6/0.2/0.
    psi = EN_RECOMMENDED.psi_imposed
    assert (psi["B"].psi0, psi["B"].psi1, psi["B"].psi2) == (0.7, 0.5, 0.3)
    assert (psi["E"].psi0, psi["E"].psi1, psi["E"].psi2) == (1.0, 0.9, 0.8)
    assert (psi["H"].psi0, psi["H"].psi1, psi["H"].psi2) == (0.0, 0.0, 0.0)
    snow = EN_RECOMMENDED.psi_snow["H <= 1000 m"]
    assert (snow.psi0, snow.psi1, snow.psi2) == (0.5, 0.2, 0.0)
    wind = EN_RECOMMENDED.psi_wind
    assert (wind.psi0, wind.psi1, wind.psi2) == (0.6, 0.2, 0.0)
    assert EN_RECOMMENDED.en1990_expression == "6.10"


def test_the_set_agrees_with_the_combinations_own_psi0() -> None:
    # The combinations module keeps its own ψ0 table; the set must not drift from it.
    for category, value in combos.PSI0_IMPOSED.items():
        assert EN_RECOMMENDED.psi_imposed[category].psi0 == value
    for site, value in combos.SNOW_SITES.items():
        assert EN_RECOMMENDED.psi_snow[site].psi0 == value
    assert EN_RECOMMENDED.psi_wind.psi0 == combos.PSI0_WIND


def test_overridden_values_are_named_and_the_others_said_recommended() -> None:
    choices = national_choices(RECOMMENDED, gamma_M1=1.1, psi0={"W": 0.5})
    assert (choices.gamma_M0, choices.gamma_M1, choices.gamma_M2) == (1.0, 1.1, 1.25)
    overridden = {item.label for item in choices.overridden}
    assert overridden == {"γM1", "ψ0, ψ1, ψ2 of wind (W)"}
    lines = choices.basis_lines()
    assert any(line.startswith("γM1 = 1.10: overridden for this job") for line in lines)
    assert any(line.startswith("γM0 = 1.00: EN recommended values") for line in lines)


def test_an_unknown_set_is_refused_naming_the_known_ones() -> None:
    with pytest.raises(
        InputError, match="national_annex.*no such set; did you mean .EN recommended values"
    ):
        DesignBasis("EN 1993-1-1", national_annex="EN recomended values")


@pytest.mark.parametrize("value", [0.5, 2.5])
def test_a_partial_factor_out_of_range_is_refused(value: float) -> None:
    with pytest.raises(InputError, match="check gamma_M0.*from 0.8 to 2"):
        DesignBasis("EN 1993-1-1", gamma_M0=value)


def test_the_set_chooses_the_expression_and_the_job_may_override_it() -> None:
    loads = [
        point_load("g", z="2 m", magnitude="5 kN", angle="90 deg"),
        point_load("q", z="2 m", magnitude="8 kN", angle="90 deg"),
    ]
    args = (catalog_section("IPE 200"), loads, ["G", "Q"], Quantity(2, "m"), Quantity(0, "m"))
    default = plan_combinations(*args, DesignBasis("EN 1993-1-1"), Quantity(355, "MPa"))
    ab = plan_combinations(
        *args, DesignBasis("EN 1993-1-1", en1990_expression="6.10a/b"), Quantity(355, "MPa")
    )
    assert all("(6.10)" in combo.name for combo in default.combos)
    assert any("(6.10a)" in combo.name for combo in ab.combos)
    assert any("(6.10b)" in combo.name for combo in ab.combos)


def _job(**check: str) -> str:
    text = EN_BRACKET.read_text(encoding="utf-8")
    for key, value in check.items():
        text = text.replace('national_annex = "EN recommended values"', f"{key} = {value}", 1)
    return text


def _problems(text: str) -> str:
    with pytest.raises(JobError) as raised:
        member_model(parse_job(text, source="job.toml"), source="job.toml")
    return str(raised.value)


def test_the_job_key_names_an_unknown_set_and_suggests_the_known_one() -> None:
    message = _problems(_job(national_annex='"EN recommended"'))
    assert "check.national_annex" in message and '"EN recommended values"' in message


def test_the_job_refuses_a_partial_factor_out_of_range_by_its_key() -> None:
    text = EN_BRACKET.read_text(encoding="utf-8").replace("gamma_M1 = 1.10", "gamma_M1 = 0.5")
    with pytest.raises(JobError) as raised:
        parse_job(text, source="job.toml")
    assert "check.gamma_M1" in str(raised.value) and "0.8" in str(raised.value)


def test_the_job_sets_the_national_choices_of_the_design_basis() -> None:
    text = EN_BRACKET.read_text(encoding="utf-8").replace(
        "gamma_M1 = 1.10", "gamma_M1 = 1.10\ngamma_M2 = 1.1"
    )
    basis = member_model(parse_job(text, source="job.toml"), source="job.toml").design
    assert basis.national.gamma_M1 == 1.1 and basis.national.gamma_M2 == 1.1
    assert basis.national.gamma_M0 == 1.0
