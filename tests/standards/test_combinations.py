"""Load combinations: ASCE 7 2.3.1 / 2.4.1 and EN 1990 Eq. (6.10), and the numeric helpers."""

from __future__ import annotations

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st
from hypothesis.extra import numpy as hnp

from calcsheet.errors import InputError
from calcsheet.standards.combinations import (
    LOAD_TYPES,
    STANDARDS,
    Combination,
    combinations,
    combine_numeric,
    envelope,
    user_combinations,
)

ASCE_GRAVITY_WIND = ["D", "L", "Lr", "S", "R", "W"]


def factors(combos: list[Combination]) -> list[dict[str, float]]:
    return [dict(combo.factors) for combo in combos]


def test_load_types_are_listed() -> None:
    assert set(LOAD_TYPES) == {"D", "L", "Lr", "S", "R", "W", "E", "G", "Q"}


def test_asce_7_16_strength_combinations() -> None:
    # ASCE 7-16 2.3.1 (from memory): 1.4D; 1.2D + 1.6L + 0.5(Lr or S or R);
    # 1.2D + 1.6(Lr or S or R) + (L or 0.5W); 1.2D + 1.0W + L + 0.5(Lr or S or R); 0.9D + 1.0W.
    # "Effects of one or more loads not acting shall be investigated" (2.3.1): every
    # companion also absent. Expanded: 1 + 4 + 3·3 + 2·4 + 1 = 23 combinations.
    combos = combinations("ASCE 7-16 strength", ASCE_GRAVITY_WIND)
    roof = [{t: 0.5} for t in ("Lr", "S", "R")] + [{}]
    expected = [{"D": 1.4}]
    expected += [{"D": 1.2, "L": 1.6, **r} for r in roof]
    expected += [
        {"D": 1.2, t: 1.6, **o} for t in ("Lr", "S", "R") for o in ({"L": 1.0}, {"W": 0.5}, {})
    ]
    expected += [{"D": 1.2, "W": 1.0, **live, **r} for live in ({"L": 1.0}, {}) for r in roof]
    expected += [{"D": 0.9, "W": 1.0}]
    assert factors(combos) == expected
    assert combos[0].reference == "ASCE 7-16 2.3.1"


def test_asce_7_22_strength_snow_is_strength_level() -> None:
    # ASCE 7-22 2.3.1: snow maps are strength level, 1.0S where S is principal (STRUCTURE
    # magazine, "Ground Snow Loads for ASCE 7-22", Feb. 2022); 0.3S as a companion (from
    # memory). Otherwise as 7-16, with every companion also absent (23 combinations).
    combos = combinations("ASCE 7-22 LRFD", ASCE_GRAVITY_WIND)
    assert len(combos) == 23
    assert {"D": 1.2, "S": 1.0, "L": 1.0} in factors(combos)
    assert {"D": 1.2, "L": 1.6, "S": 0.3} in factors(combos)
    assert {"D": 1.2, "W": 1.0, "L": 1.0, "S": 0.3} in factors(combos)
    assert combos[1].name == "ASCE 7-22 2.3.1 (2): 1.2D + 1.6L + 0.5Lr"


def test_asce_7_22_allowable_stress_combinations() -> None:
    # ASCE 7-22 2.4.1 (from memory; 0.7S confirmed by STRUCTURE magazine, "ASCE 7-22 Flat
    # Roof Snow Load versus Minimum Snow Load": 3a D + (Lr or 0.7S or R), 4a, 6a):
    # D; D + L; D + (Lr or 0.7S or R); D + 0.75L + 0.75(Lr or 0.7S or R); D + 0.6W;
    # D + 0.75L + 0.75(0.6W) + 0.75(Lr or 0.7S or R); 0.6D + 0.6W. With loads not acting
    # (2.4.1): (4) gives 2·4 − 1 = 7 (L or the roof load acts), (6) gives 2·4 = 8.
    combos = factors(combinations("ASCE 7-22 ASD", ASCE_GRAVITY_WIND))
    assert len(combos) == 1 + 1 + 3 + 7 + 1 + 8 + 1
    assert combos[:3] == [{"D": 1.0}, {"D": 1.0, "L": 1.0}, {"D": 1.0, "Lr": 1.0}]
    assert {"D": 1.0, "S": 0.7} in combos
    assert {"D": 1.0, "L": 0.75, "S": pytest.approx(0.525)} in combos
    assert {"D": 1.0, "W": pytest.approx(0.45), "L": 0.75, "R": 0.75} in combos
    assert combos[-1] == {"D": 0.6, "W": 0.6}


def test_types_without_loads_are_skipped() -> None:
    # Only D and L: 1.4D and 1.2D + 1.6L (the Lr/S/R companions and the W cases drop out).
    assert factors(combinations("ASCE 7-22 strength", ["D", "L"])) == [
        {"D": 1.4},
        {"D": 1.2, "L": 1.6},
    ]
    # Only D and W: 1.4D, 1.2D + 0.5W is not listed (its principal Lr/S/R is absent).
    assert factors(combinations("ASCE 7-22 strength", ["D", "W"])) == [
        {"D": 1.4},
        {"D": 1.2, "W": 1.0},
        {"D": 0.9, "W": 1.0},
    ]


def test_seismic_combinations_need_s_ds() -> None:
    with pytest.raises(InputError, match="S_DS"):
        combinations("ASCE 7-22 strength", ["D", "E"])
    # ASCE 7 2.3.6 with E_v = 0.2·S_DS·D (12.4.2.2), S_DS = 1.0: (1.2 + 0.2)D + E, (0.9 − 0.2)D + E.
    combos = factors(combinations("ASCE 7-22 strength", ["D", "E"], S_DS=1.0))
    assert {"D": pytest.approx(1.4), "E": 1.0} in combos
    assert {"D": pytest.approx(0.7), "E": 1.0} in combos


def test_en_1990_eq_6_10() -> None:
    # EN 1990 Eq. (6.10), Table A1.2(B) (from memory): γG = 1.35 / 1.00, γQ = 1.5, and
    # 0 for a favourable variable action (so each accompanying one is also omitted);
    # ψ0 = 0.7 (category B), 0.6 (wind), Table A1.1 (from memory).
    combos = combinations("EN 1990", ["G", "Q", "W"], imposed_category="B")
    assert factors(combos) == [
        {"G": 1.35},
        {"G": 1.35, "Q": 1.5, "W": pytest.approx(0.9)},
        {"G": 1.35, "Q": 1.5},
        {"G": 1.0, "Q": 1.5, "W": pytest.approx(0.9)},
        {"G": 1.0, "Q": 1.5},
        {"G": 1.35, "W": 1.5, "Q": pytest.approx(1.05)},
        {"G": 1.35, "W": 1.5},
        {"G": 1.0, "W": 1.5, "Q": pytest.approx(1.05)},
        {"G": 1.0, "W": 1.5},
    ]
    assert combos[1].name.startswith("EN 1990 Eq. (6.10), Q leading")
    # Category E (storage) ψ0 = 1.0; roofs (H): ψ0 = 0 and not combined with snow or wind.
    storage = factors(combinations("EN 1990", ["G", "Q", "S"], imposed_category="E"))
    assert {"G": 1.35, "S": 1.5, "Q": 1.5} in storage
    roofs = factors(combinations("EN 1990", ["G", "Q", "S"], imposed_category="H"))
    assert {"G": 1.35, "Q": 1.5} in roofs and {"G": 1.35, "S": 1.5} in roofs
    high = factors(combinations("EN 1990", ["G", "Q", "S"], psi0={"S": 0.7}))
    assert {"G": 1.35, "Q": 1.5, "S": pytest.approx(1.05)} in high


def test_unsupported_standard_lists_the_supported_ones() -> None:
    with pytest.raises(InputError, match="standard") as info:
        combinations("NBCC 2020", ["D"])
    for name in STANDARDS:
        assert name in str(info.value)
    with pytest.raises(InputError, match="load type"):
        combinations("EN 1990", ["D"])


def test_user_combination_naming_a_missing_type() -> None:
    with pytest.raises(InputError) as info:
        user_combinations({"uplift": {"D": 0.6, "W": 0.6}}, ["D", "L"])
    message = str(info.value)
    assert "combination 'uplift'" in message and "'W'" in message and "D, L" in message
    made = user_combinations({"service": {"D": 1.0, "L": 1.0}}, ["D", "L"])
    assert made[0].text() == "D + L"


def test_combine_numeric_and_envelope() -> None:
    types = ["D", "L", "W"]
    # Forces by type (n_types, n_stations, 6): one station; D and L down, W uplift.
    forces = np.zeros((3, 1, 6))
    forces[:, 0, 4] = [10.0, 5.0, -30.0]  # M_x by type
    combos = combinations("ASCE 7-22 strength", types)
    combined = combine_numeric(forces, combos, types)
    assert combined.shape == (len(combos), 1, 6)
    # Hand calc: 1.4·10 = 14; 1.2·10 + 1.6·5 = 20; 1.2·10 − 30 + 5 = −13; 1.2·10 − 30 = −18
    # (L not acting, ASCE 7-22 2.3.1); 0.9·10 − 30 = −21.
    env = envelope(combined)
    assert combined[:, 0, 4] == pytest.approx([14.0, 20.0, -13.0, -18.0, -21.0])
    assert env.maximum[0, 4] == pytest.approx(20.0)
    assert env.minimum[0, 4] == pytest.approx(0.9 * 10 - 30)
    assert env.names(combos)[0, 4] == "ASCE 7-22 2.3.1 (5): 0.9D + W"
    assert env.extreme[0, 4] == pytest.approx(-21.0)
    with pytest.raises(InputError, match="forces_by_type"):
        combine_numeric(forces[:2], combos, types)


@settings(max_examples=50, deadline=None)
@given(
    first=hnp.arrays(float, (4, 3, 6), elements=st.floats(-1e3, 1e3)),
    second=hnp.arrays(float, (4, 3, 6), elements=st.floats(-1e3, 1e3)),
    a=st.floats(-5, 5),
    b=st.floats(-5, 5),
)
def test_combination_is_linear(first, second, a, b) -> None:
    types = ["D", "L", "S", "W"]
    combos = combinations("ASCE 7-22 strength", types)
    left = combine_numeric(a * first + b * second, combos, types)
    right = a * combine_numeric(first, combos, types) + b * combine_numeric(second, combos, types)
    assert np.allclose(left, right, atol=1e-6)
    # And each combination is the plain weighted sum.
    for index, combo in enumerate(combos):
        manual = sum(combo.factor(t) * first[k] for k, t in enumerate(types))
        assert np.allclose(combine_numeric(first, combos, types)[index], manual, atol=1e-9)
