"""Defaults of K, Lb, Cb and Cm from the supports, braces and moment diagram (AISC 360-22)."""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.errors import InputError
from calcsheet.standards.aisc360.design_parameters import (
    cb_of_segment,
    effective_length_default,
    lateral_torsional_modification_factor,
    moment_factor_cm,
    segment_effective_lengths,
    unbraced_segments,
)
from calcsheet.units import Quantity

# --- K: AISC 360-22 Commentary Table C-A-7.1 -------------------------------------------


@pytest.mark.parametrize(
    ("case", "K", "letter"),
    [
        # AISC 360-22 Commentary Table C-A-7.1, recommended design values (from memory):
        ("fixed-fixed", 0.65, "(a)"),
        ("fixed-pinned", 0.80, "(b)"),
        ("pinned-pinned", 1.0, "(d)"),
        ("fixed-free", 2.1, "(e)"),
    ],
)
def test_effective_length_defaults_are_the_recommended_design_values(case, K, letter):
    value, text = effective_length_default(case)
    assert value == pytest.approx(K)
    assert "AISC 360-22 Commentary Table C-A-7.1" in text
    assert f"case {letter}" in text


def test_two_span_and_overhang_say_how_the_segments_are_taken():
    # Each span pinned-pinned, K = 1.0 (AISC 360-22 Commentary Table C-A-7.1 case (d),
    # from memory); the overhang fixed-free, K = 2.1 (case (e), from memory).
    value, text = effective_length_default("two-span")
    assert value == 1.0 and "span by span" in text
    value, text = effective_length_default("Overhang")
    assert value == 1.0 and "K = 2.1 on the overhang length" in text


def test_unknown_support_case_names_the_field():
    with pytest.raises(InputError, match="support case"):
        effective_length_default("propped")


def test_segment_effective_lengths_of_an_overhang_and_a_two_span_member():
    # Pinned-pinned span K = 1.0, fixed-free overhang K = 2.1 (AISC 360-22 Commentary
    # Table C-A-7.1 cases (d) and (e), from memory); lengths are arithmetic.
    segments = segment_effective_lengths("overhang", "12 ft", ["0 ft", "9 ft"])
    assert [(s.z_start.m, s.z_end.m, s.K) for s in segments] == [(0, 9, 1.0), (9, 12, 2.1)]
    assert max(s.effective_length for s in segments).to("ft").m == pytest.approx(9.0)
    spans = segment_effective_lengths("two-span", "10 m", ["0 m", "5 m", "10 m"])
    assert [s.effective_length.to("m").m for s in spans] == pytest.approx([5.0, 5.0])
    (cantilever,) = segment_effective_lengths("fixed-free", "3 m", ["0 m"])
    assert cantilever.effective_length.to("m").m == pytest.approx(6.3)


# --- Lb: segments between braced points (AISC 360-22 Section F1) ------------------------


def test_unbraced_segments_between_supports_and_braces():
    segments = unbraced_segments("20 ft", ["0 ft", "20 ft"], ["10 ft", "5 ft"])
    assert [(s.z_start.m, s.z_end.m, s.free_end) for s in segments] == [
        (0, 5, False),
        (5, 10, False),
        (10, 20, False),
    ]


def test_a_cantilever_has_a_free_end_segment_unless_braced_at_the_tip():
    (free,) = unbraced_segments("3 m", ["0 m"])
    assert free.free_end and free.z_end.m == 3
    segments = unbraced_segments("3 m", ["0 m"], ["3000 mm"])
    assert [s.free_end for s in segments] == [False]


def test_a_brace_at_a_support_adds_nothing_and_overhangs_are_free():
    segments = unbraced_segments("12 ft", ["2 ft", "9 ft"], ["108 in"])
    assert [(s.z_start.m, s.z_end.m, s.free_end) for s in segments] == [
        (0, 2, True),
        (2, 9, False),
        (9, 12, True),
    ]


@pytest.mark.parametrize("braces", [["25 ft"], ["-1 ft"], ["4 ft", "48 in"]])
def test_bad_braces_name_the_field(braces):
    with pytest.raises(InputError, match="member braces"):
        unbraced_segments("20 ft", ["0 ft", "20 ft"], braces)


# --- Cb: AISC 360-22 Eq. F1-1 ----------------------------------------------------------


def _simple_span(moment_of):
    z = np.linspace(0.0, 1.0, 401)
    return z, moment_of(z)


@pytest.mark.parametrize(
    ("moment_of", "z_start", "z_end", "expected"),
    [
        # AISC Steel Construction Manual Table 3-1 (from memory): simple span, uniform
        # load, no intermediate brace: Cb = 1.14.
        (lambda z: 0.5 * z * (1 - z), 0.0, 1.0, 1.14),
        # Table 3-1 (from memory): midspan point load, no intermediate brace: Cb = 1.32.
        (lambda z: 0.5 * np.minimum(z, 1 - z), 0.0, 1.0, 1.32),
        # Table 3-1 (from memory): uniform load, braced at midspan: Cb = 1.30.
        (lambda z: 0.5 * z * (1 - z), 0.0, 0.5, 1.30),
        # Table 3-1 (from memory): midspan point load, braced at the load: Cb = 1.67.
        (lambda z: 0.5 * np.minimum(z, 1 - z), 0.5, 1.0, 1.67),
        # AISC 360-22 Commentary to Section F1 (from memory): uniform moment 1.0,
        # equal end moments in reverse curvature 2.27.
        (lambda z: np.ones_like(z), 0.0, 1.0, 1.00),
        (lambda z: 1 - 2 * z, 0.0, 1.0, 2.27),
    ],
)
def test_cb_of_a_segment_matches_the_published_values(moment_of, z_start, z_end, expected):
    z, m = _simple_span(moment_of)
    cb, text = cb_of_segment(z, -3.0 * m, z_start, z_end)  # sign and scale do not matter
    assert round(cb, 2) == pytest.approx(expected)
    assert "Eq. F1-1" in text


def test_equation_f1_1_itself():
    # AISC 360-22 Eq. F1-1 with the quarter-point moments of a uniform load on a
    # simple span, Mmax = wL²/8, MA = MC = 3wL²/32 (statics): 1.5625/1.375.
    assert lateral_torsional_modification_factor(0.125, 0.09375, 0.125, -0.09375) == (
        pytest.approx(1.5625 / 1.375)
    )
    assert lateral_torsional_modification_factor(
        Quantity(-80, "kip*ft"),
        Quantity(60, "kip*ft"),
        Quantity(40, "kip*ft"),
        Quantity(20, "kip*ft"),
    ) == pytest.approx(12.5 * 80 / (2.5 * 80 + 3 * 60 + 4 * 40 + 3 * 20))
    # Quantities in mixed units are compared in one unit (720 kip·in = 60 kip·ft).
    assert lateral_torsional_modification_factor(
        Quantity(80, "kip*ft"),
        Quantity(720, "kip*in"),
        Quantity(40, "kip*ft"),
        Quantity(0, "kip*ft"),
    ) == pytest.approx(12.5 * 80 / (2.5 * 80 + 3 * 60 + 4 * 40))
    assert lateral_torsional_modification_factor(0, 0, 0, 0) == 1.0


def test_a_cantilever_segment_with_an_unbraced_free_end_takes_cb_one():
    # AISC 360-22 Section F1 and its Commentary: Cb = 1.0 for a cantilever or overhang
    # whose free end is unbraced (from memory).
    z = np.linspace(0.0, 3.0, 31)
    cb, text = cb_of_segment(z, (3.0 - z) ** 2, 0.0, 3.0, free_end=True)
    assert cb == 1.0 and "free end is unbraced" in text


def test_cb_segment_outside_the_diagram_is_refused():
    z = np.linspace(0.0, 3.0, 31)
    with pytest.raises(InputError, match="unbraced segment"):
        cb_of_segment(z, z, 1.0, 4.0)


# --- Cm: AISC 360-22 Appendix 8 Eq. A-8-4 ----------------------------------------------


def test_cm_single_and_reverse_curvature():
    # AISC 360-22 Eq. A-8-4: Cm = 0.6 − 0.4·M1/M2, M1/M2 negative in single curvature.
    # Equal end moments bending in single curvature (same sign on one diagram): 1.0.
    cm, text = moment_factor_cm(50.0, 50.0, transverse_load=False)
    assert cm == pytest.approx(1.0) and "single curvature" in text
    # Reverse curvature, M1/M2 = +0.5: 0.6 − 0.2 = 0.4.
    cm, text = moment_factor_cm(-40.0, 80.0, transverse_load=False)
    assert cm == pytest.approx(0.4) and "reverse curvature" in text
    # One end moment zero: M1/M2 = 0, Cm = 0.6.
    cm, _ = moment_factor_cm(Quantity(30, "kN*m"), Quantity(0, "kN*m"), transverse_load=False)
    assert cm == pytest.approx(0.6)


def test_cm_with_transverse_loading_is_one():
    # AISC 360-22 Appendix 8: Cm by analysis or conservatively 1.0 with transverse loading.
    cm, text = moment_factor_cm(10.0, -10.0, transverse_load=True)
    assert cm == 1.0 and "conservatively" in text
