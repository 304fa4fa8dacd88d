"""Cross-section resistances (6.2) and classification limits (Table 5.2), by hand calc."""

from __future__ import annotations

import math

import numpy as np
import pytest
from hypothesis import given, settings
from hypothesis import strategies as st

from calcsheet.errors import InputError
from calcsheet.standards.en1993 import classification as cls
from calcsheet.standards.en1993 import resistance as res
from calcsheet.standards.en1993.factors import PartialFactors, steel

MPA = 1e6


def test_recommended_partial_factors() -> None:
    # EN 1993-1-1 6.1(1) Note 2B (from memory): γM0 = 1.00, γM1 = 1.00, γM2 = 1.25.
    factors = PartialFactors()
    assert (factors.gamma_M0, factors.gamma_M1, factors.gamma_M2) == (1.0, 1.0, 1.25)


def test_nominal_strengths_and_bad_grade() -> None:
    # EN 1993-1-1 Table 3.1, t ≤ 40 mm (from memory): S355 f_y 355, f_u 510 N/mm².
    s355 = steel("s355")
    assert (s355.f_y.to("MPa").m, s355.f_u.to("MPa").m, s355.E.to("MPa").m) == (355, 510, 210000)
    with pytest.raises(InputError, match="steel grade"):
        steel("S690")


def test_yield_criterion_eq_6_1() -> None:
    # Hand calc from EN 1993-1-1 Eq. (6.1): σx = 200, τ = 100, fy = 355 N/mm², γM0 = 1:
    # (200/355)² + 3(100/355)² = 0.31740 + 0.23805 = 0.55545.
    value = res.yield_criterion_member.numeric(200 * MPA, 100 * MPA, 355 * MPA, 1.0)
    assert float(value) == pytest.approx(0.55545, abs=1e-5)
    full = res.yield_criterion.numeric(200 * MPA, 0.0, 100 * MPA, 355 * MPA, 1.0)
    assert float(full) == pytest.approx(float(value))
    # With σz: (1/355²)(200² + 50² − 200·50 + 3·100²) = 62500/126025 = 0.49593.
    both = res.yield_criterion.numeric(200 * MPA, 50 * MPA, 100 * MPA, 355 * MPA, 1.0)
    assert float(both) == pytest.approx(0.49593, abs=1e-5)


def test_shear_area_of_a_rolled_ipe_300() -> None:
    # IPE 300: A = 53.81 cm², b = 150, t_f = 10.7, t_w = 7.1, r = 15 mm; section tables give
    # A_v,z = 25.68 cm² (from memory). 6.2.6(3)a: 5381 − 2·150·10.7 + (7.1 + 30)·10.7 = 2568.
    mm2 = 1e-6
    area = res.shear_area_rolled_i.numeric(
        5381 * mm2, 0.150, 0.0107, 0.0071, 0.015, 0.300 - 2 * 0.0107, 1.0
    )
    assert float(area) / mm2 == pytest.approx(2568.0, abs=1.0)
    # V_pl,Rd = 2568 mm² · 235/√3 N/mm² = 348.4 kN for S235 (hand calc from Eq. 6.18).
    shear = res.plastic_shear_resistance.numeric(float(area), 235 * MPA, 1.0)
    assert float(shear) / 1e3 == pytest.approx(2568 * 235 / math.sqrt(3) / 1e3, rel=1e-3)


def test_shear_areas_of_hollow_sections() -> None:
    # 6.2.6(3)f, g: RHS A·h/(b + h); CHS 2A/π (hand calc).
    assert float(res.shear_area_rhs.numeric(1.0, 0.2, 0.1)) == pytest.approx(2 / 3)
    assert float(res.shear_area_chs.numeric(math.pi)) == pytest.approx(2.0)


def test_bending_resistance_follows_the_class() -> None:
    # Eq. (6.13), (6.14): W_pl for class 1, 2; W_el for class 3; nothing for class 4.
    values = res.bending_resistance.numeric(2.0, 1.5, 1.0, 1.0, np.array([1.0, 2.0, 3.0, 4.0]))
    assert values[:3] == pytest.approx([2.0, 2.0, 1.5])
    assert math.isnan(values[3])


def test_shear_reduction_rho() -> None:
    # 6.2.8(3): ρ = (2V/V_pl − 1)² above half the resistance; 0.75 V_pl gives 0.25.
    values = res.shear_reduction.numeric(np.array([0.3, 0.5, 0.75, -0.75, 0.99]), 1.0)
    assert values == pytest.approx([0.0, 0.0, 0.25, 0.25, 0.98**2])
    # From V_pl,Rd on the shear check fails and no ρ exists: the moment is left unreduced.
    assert res.shear_reduction.numeric(np.array([1.0, 1.5]), 1.0) == pytest.approx([0.0, 0.0])


def test_reduced_moments_of_an_i_section() -> None:
    # Hand calc from Eq. (6.36)-(6.38): n = 0.3, a = 0.4:
    # M_N,y = (1 − 0.3)/(1 − 0.2) = 0.875·M_pl; M_N,z = [1 − ((0.3 − 0.4)/0.6)²] → n ≤ a: M_pl.
    assert float(res.reduced_moment_y_i.numeric(1.0, 0.3, 0.4)) == pytest.approx(0.875)
    assert float(res.reduced_moment_y_i.numeric(1.0, 0.05, 0.4)) == pytest.approx(1.0)  # capped
    assert float(res.reduced_moment_z_i.numeric(1.0, 0.3, 0.4)) == pytest.approx(1.0)
    # n = 0.7 > a = 0.4: 1 − (0.3/0.6)² = 0.75.
    assert float(res.reduced_moment_z_i.numeric(1.0, 0.7, 0.4)) == pytest.approx(0.75)
    # a = (A − 2bt_f)/A ≤ 0.5: A = 1, 2bt_f = 0.3 -> 0.7 capped at 0.5.
    assert float(res.web_ratio_i.numeric(1.0, 0.15, 1.0)) == pytest.approx(0.5)


def test_biaxial_exponents() -> None:
    # 6.2.9.1(6): I-section α = 2, β = 5n ≥ 1; RHS α = β = 1.66/(1 − 1.13n²) ≤ 6; class 3: 1.
    assert float(res.biaxial_beta_i.numeric(0.1, 1.0)) == 1.0
    assert float(res.biaxial_beta_i.numeric(0.4, 2.0)) == pytest.approx(2.0)
    assert float(res.biaxial_beta_i.numeric(0.4, 3.0)) == 1.0
    assert float(res.biaxial_exponent_rhs.numeric(0.5, 1.0)) == pytest.approx(1.66 / (1 - 0.2825))
    assert float(res.biaxial_exponent_rhs.numeric(0.9, 1.0)) == 6.0
    assert float(res.biaxial_exponent_rhs.numeric(0.5, 3.0)) == 1.0


@settings(max_examples=60, deadline=None)
@given(n=st.floats(0.0, 0.99))
def test_rhs_exponent_is_continuous_and_capped(n: float) -> None:
    value = float(res.biaxial_exponent_rhs.numeric(n, 1.0))
    assert 1.66 <= value <= 6.0


# --- Table 5.2 -----------------------------------------------------------------------------


def test_epsilon_values_of_table_5_2() -> None:
    # Table 5.2 prints ε = 1.00, 0.92, 0.81, 0.75, 0.71 for f_y = 235 ... 460 (from memory).
    f_y = np.array([235.0, 275.0, 355.0, 420.0, 460.0]) * MPA
    values = cls.epsilon.numeric(235 * MPA, f_y)
    assert np.round(values, 2) == pytest.approx([1.00, 0.92, 0.81, 0.75, 0.71])


def test_internal_part_limits_reduce_to_the_printed_cases() -> None:
    # Table 5.2 sheet 1 prints 72ε/83ε/124ε in bending and 33ε/38ε/42ε in compression;
    # the general formulas give them at α = 0.5, ψ = −1 and α = 1, ψ = 1 (hand calc).
    eps = 0.81
    assert float(cls.internal_class_1_limit.numeric(eps, 0.5)) == pytest.approx(72 * eps)
    assert float(cls.internal_class_2_limit.numeric(eps, 0.5)) == pytest.approx(83 * eps)
    assert float(cls.internal_class_3_limit.numeric(eps, -1.0)) == pytest.approx(124 * eps)
    assert float(cls.internal_class_1_limit.numeric(eps, 1.0)) == pytest.approx(33 * eps)
    assert float(cls.internal_class_2_limit.numeric(eps, 1.0)) == pytest.approx(38 * eps)
    assert float(cls.internal_class_3_limit.numeric(eps, 1.0)) == pytest.approx(42 * eps)
    # The two branches meet at α = 0.5 (396/5.5 = 72) and at ψ = −1 (42/0.34 ≈ 123.5 vs 124).
    below = float(cls.internal_class_1_limit.numeric(eps, 0.5 - 1e-9))
    assert below == pytest.approx(72 * eps, rel=1e-6)
    assert float(cls.internal_class_3_limit.numeric(eps, -1 + 1e-9)) == pytest.approx(
        123.5 * eps, rel=1e-3
    )


def test_class_from_limits() -> None:
    ratios = np.array([5.0, 9.5, 13.0, 20.0])
    classes = cls.class_from_limits.numeric(ratios, 9.0, 10.0, 14.0)
    assert classes == pytest.approx([1, 2, 3, 4])


def test_plastic_alpha_and_elastic_psi() -> None:
    # α = ½(1 + N/(f_y·c·t)): N = f_y·c·t/2 gives 0.75; pure bending 0.5; capped at 1.
    assert float(cls.plastic_alpha.numeric(0.5, 1.0, 1.0, 1.0)) == pytest.approx(0.75)
    assert float(cls.plastic_alpha.numeric(0.0, 1.0, 1.0, 1.0)) == pytest.approx(0.5)
    assert float(cls.plastic_alpha.numeric(5.0, 1.0, 1.0, 1.0)) == 1.0
    assert float(cls.plastic_alpha.numeric(-5.0, 1.0, 1.0, 1.0)) == cls.ALPHA_FLOOR
    # ψ: σ_N = 1, σ_M = 3 -> (1 − 3)/(1 + 3) = −0.5 (N_c = 1, A = 1, M = 3, W = 1, c = h).
    assert float(cls.elastic_psi.numeric(1.0, 1.0, 3.0, 1.0, 1.0, 1.0)) == pytest.approx(-0.5)
    # No compression at either end (tension, no moment): taken as pure bending.
    assert float(cls.elastic_psi.numeric(-1.0, 1.0, 0.0, 1.0, 1.0, 1.0)) == -1.0


def test_tube_limits() -> None:
    # Table 5.2 sheet 3: d/t ≤ 50ε², 70ε², 90ε²; S355: ε² = 235/355 = 0.662 -> 33.1, 46.3, 59.6.
    eps = math.sqrt(235 / 355)
    limits = [
        float(c.numeric(eps))
        for c in (cls.tube_class_1_limit, cls.tube_class_2_limit, cls.tube_class_3_limit)
    ]
    assert limits == pytest.approx([33.10, 46.34, 59.58], abs=0.01)
