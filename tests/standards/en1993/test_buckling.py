"""Flexural buckling, EN 1993-1-1 6.3.1: χ against published values, Table 6.2 choices."""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.standards.en1993 import IMPERFECTION_FACTORS, buckling_curve
from calcsheet.standards.en1993.buckling import (
    buckling_phi,
    critical_force,
    reduction_factor,
    relative_slenderness,
    relative_slenderness_from_length,
    slenderness_limit,
)


def chi(curve: str, lam: float | np.ndarray) -> np.ndarray:
    alpha = np.full(np.shape(lam), IMPERFECTION_FACTORS[curve])
    phi = buckling_phi.numeric(alpha, np.asarray(lam, dtype=float))
    return reduction_factor.numeric(phi, np.asarray(lam, dtype=float))


def test_imperfection_factors_of_table_6_1() -> None:
    # EN 1993-1-1 Table 6.1 (from memory): a0 0.13, a 0.21, b 0.34, c 0.49, d 0.76.
    assert IMPERFECTION_FACTORS == {"a0": 0.13, "a": 0.21, "b": 0.34, "c": 0.49, "d": 0.76}


@pytest.mark.parametrize(
    ("curve", "lam", "expected"),
    [
        # Widely published χ tables / EN 1993-1-1 Figure 6.4 (from memory), each also
        # re-derived by hand from Eq. (6.49): e.g. curve b, λ̄ = 1: Φ = 0.5(1 + 0.34·0.8 + 1)
        # = 1.136, χ = 1/(1.136 + √(1.136² − 1)) = 0.5970.
        ("a", 1.0, 0.6656),
        ("b", 1.0, 0.5970),
        ("c", 1.0, 0.5399),
        ("d", 1.0, 0.4671),
        ("b", 0.5, 0.8842),  # from memory; hand calc Φ = 0.676, χ = 1/(0.676 + 0.4550)
        ("a0", 1.0, 0.7253),  # hand calc from Eq. (6.49): Φ = 1.052, χ = 1/(1.052 + 0.3267)
    ],
)
def test_chi_matches_published_values(curve: str, lam: float, expected: float) -> None:
    assert float(chi(curve, np.array([lam]))[0]) == pytest.approx(expected, abs=5e-5)


@pytest.mark.parametrize("curve", list(IMPERFECTION_FACTORS))
def test_chi_is_one_up_to_the_plateau(curve: str) -> None:
    # At λ̄ = 0.2, Φ = 0.5(1 + 0.04) = 0.52 and χ = 1/(0.52 + 0.48) = 1 exactly (Eq. 6.49).
    values = chi(curve, np.array([0.0, 0.1, 0.2]))
    assert values == pytest.approx([1.0, 1.0, 1.0], abs=1e-12)
    # Continuous and below 1 just past the plateau.
    after = float(chi(curve, np.array([0.2 + 1e-6]))[0])
    assert 1.0 - 1e-5 < after < 1.0


@settings(max_examples=80, deadline=None)
@given(lam=st.floats(0.0, 4.0), step=st.floats(1e-4, 0.5))
def test_chi_decreases_with_slenderness_and_with_the_curve(lam: float, step: float) -> None:
    for curve in IMPERFECTION_FACTORS:
        first, second = chi(curve, np.array([lam, lam + step]))
        assert 0.0 < second <= first <= 1.0
    by_curve = [float(chi(curve, np.array([lam]))[0]) for curve in ("a0", "a", "b", "c", "d")]
    assert by_curve == sorted(by_curve, reverse=True)


def test_chi_tends_to_the_euler_curve_for_slender_members() -> None:
    # For large λ̄, χ → 1/λ̄² (χ·A·f_y → N_cr): common practice, no source.
    lam = 8.0
    assert float(chi("b", np.array([lam]))[0]) * lam**2 == pytest.approx(1.0, rel=0.06)


def test_both_forms_of_eq_6_50_agree() -> None:
    # Hand calc from EN 1993-1-1 Eq. (6.50): λ̄ = √(A·f_y/N_cr) = L_cr/(i·λ₁), i = √(I/A).
    E, f_y, A, I, L_cr = 210e9, 355e6, 5.381e-3, 8.356e-5, 6.0
    N_cr = critical_force.numeric(E, I, L_cr)
    first = relative_slenderness.numeric(A, f_y, N_cr)
    lambda_1 = slenderness_limit.numeric(E, f_y)
    second = relative_slenderness_from_length.numeric(L_cr, math.sqrt(I / A), lambda_1)
    assert float(first) == pytest.approx(float(second), rel=1e-12)
    # λ₁ = 93.9ε (EN 1993-1-1 6.3.1.3(1)); ε = √(235/355) = 0.8136.
    assert float(lambda_1) == pytest.approx(93.9 * math.sqrt(235 / 355), rel=1e-3)


def test_the_sheet_and_the_numeric_path_agree() -> None:
    sheet = Sheet("chi", units="SI")
    with sheet:
        alpha = sheet.input("alpha", 0.34)
        lam = sheet.input("lambda_rel", 1.0)
        phi = buckling_phi.write(sheet, "Phi", alpha, lam)
        reduction_factor.write(sheet, "chi", phi, lam)
    assert sheet["chi"].reference == "EN 1993-1-1 Eq. (6.49)"
    assert sheet.value("chi").m == pytest.approx(0.5970, abs=5e-5)
    sheet.set_input("lambda_rel", 0.1)
    assert sheet.value("chi").m == pytest.approx(1.0)


# --- Table 6.2 (from memory) ---------------------------------------------------------------


@pytest.mark.parametrize(
    ("h", "b", "t_f", "grade", "axis", "curve"),
    [
        ("300 mm", "150 mm", "10.7 mm", "S355", "y", "a"),  # h/b = 2 > 1.2, t_f ≤ 40
        ("300 mm", "150 mm", "10.7 mm", "S355", "z", "b"),
        ("300 mm", "150 mm", "10.7 mm", "S460", "y", "a0"),
        ("300 mm", "150 mm", "10.7 mm", "S460", "z", "a0"),
        ("600 mm", "300 mm", "50 mm", "S275", "y", "b"),  # 40 < t_f ≤ 100
        ("600 mm", "300 mm", "50 mm", "S275", "z", "c"),
        ("600 mm", "300 mm", "50 mm", "S460", "z", "a"),
        ("300 mm", "300 mm", "19 mm", "S235", "y", "b"),  # h/b ≤ 1.2 (an HEB 300)
        ("300 mm", "300 mm", "19 mm", "S235", "z", "c"),
        ("300 mm", "300 mm", "19 mm", "S460", "z", "a"),
        ("500 mm", "450 mm", "110 mm", "S355", "y", "d"),  # h/b ≤ 1.2, t_f > 100
        ("500 mm", "450 mm", "110 mm", "S460", "z", "c"),
    ],
)
def test_rolled_i_sections(h, b, t_f, grade, axis, curve) -> None:
    choice = buckling_curve("rolled I", axis, grade=grade, h=h, b=b, t_f=t_f)
    assert choice.curve == curve
    assert choice.alpha == IMPERFECTION_FACTORS[curve]
    assert "Table 6.2" in choice.reason


def test_welded_and_hollow_sections() -> None:
    welded = {
        (axis, t_f): buckling_curve("welded I", axis, grade="S355", h="800 mm", b="300 mm", t_f=t_f)
        for axis in "yz"
        for t_f in ("20 mm", "50 mm")
    }
    curves = {key: choice.curve for key, choice in welded.items()}
    assert curves == {
        ("y", "20 mm"): "b",
        ("z", "20 mm"): "c",
        ("y", "50 mm"): "c",
        ("z", "50 mm"): "d",
    }
    assert buckling_curve("hollow", "y", grade="S355", forming="hot-finished").curve == "a"
    assert buckling_curve("hollow", "z", grade="S460", forming="hot-finished").curve == "a0"
    assert buckling_curve("hollow", "y", grade="S460", forming="cold-formed").curve == "c"


def test_bad_entries_name_the_field() -> None:
    with pytest.raises(InputError, match="hollow section forming"):
        buckling_curve("hollow", "y", grade="S355", forming="welded")
    with pytest.raises(InputError, match="buckling axis"):
        buckling_curve("rolled I", "x", grade="S355", h="1 m", b="1 m", t_f="10 mm")
    with pytest.raises(InputError, match="t_f"):
        buckling_curve("rolled I", "y", grade="S355", h="900 mm", b="300 mm", t_f="120 mm")
