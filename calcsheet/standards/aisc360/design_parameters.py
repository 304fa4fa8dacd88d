"""Design parameters of AISC 360-22 that follow from the supports, the braces and the moments.

The member sheet takes K (effective length), Lb (unbraced length), Cb (lateral-torsional
buckling modification) and Cm (the P-δ moment factor of B1) as inputs a user may type.
These functions give each one's default from the member's supports, braces and moment
diagram, with a sentence naming the table or equation and the case it came from, so a
sheet can say, for instance, "K defaulted from AISC 360-22 Commentary Table C-A-7.1,
case (d) ...". Each returns a :class:`DesignParameter` (value, basis), which unpacks as
``K, text = effective_length_default("pinned-pinned")``.

Stations run along the member axis z from 0 to L, as in :mod:`calcsheet.mechanics.supports`.
Moments passed in follow the one sign convention of the moment diagram (the frame
solver's internal Mx or My along the member), so two end moments of the same sign bend
the member in single curvature.
"""

from __future__ import annotations

import itertools
from collections.abc import Sequence
from typing import NamedTuple

import numpy as np
import pint
from numpy.typing import ArrayLike

from calcsheet.errors import InputError
from calcsheet.mechanics.loads import QuantityInput, member_length
from calcsheet.mechanics.supports import SUPPORT_CASES
from calcsheet.units import parse_quantity

TABLE_C_A_7_1 = "AISC 360-22 Commentary Table C-A-7.1"

# Stations closer than this fraction of the member length are one station: a brace typed
# as 120 in and a support at 10 ft are the same point once converted.
_SAME_STATION = 1e-9


class DesignParameter(NamedTuple):
    """A design parameter's default ``value`` and the ``basis`` a sheet prints beside it."""

    value: float
    basis: str


class UnbracedSegment(NamedTuple):
    """A length of the member between two points braced against lateral-torsional buckling.

    ``free_end`` is True when one end of the segment is the unbraced free end of a
    cantilever or an overhang (Cb is then 1.0, :func:`cb_of_segment`).
    """

    z_start: pint.Quantity
    z_end: pint.Quantity
    free_end: bool = False


# --- effective length: Commentary Table C-A-7.1 --------------------------------------

# Recommended design values of Table C-A-7.1 (the theoretical values raised where the
# ideal end condition is seldom reached in practice), with the table's case letter.
# Typed from memory of the Commentary (as K_FIXED_FREE in .second_order); the tests say so.
_TABLE_CASES: dict[str, tuple[str, str, float, str]] = {
    "fixed-fixed": ("a", "both ends fixed", 0.65, "0.65"),
    "fixed-pinned": ("b", "one end fixed, the other pinned", 0.80, "0.80"),
    "pinned-pinned": ("d", "both ends pinned", 1.0, "1.0"),
    "fixed-free": ("e", "one end fixed, the other free", 2.1, "2.1"),
}


def _case_text(case: str) -> str:
    letter, words, _, shown = _TABLE_CASES[case]
    return f"{TABLE_C_A_7_1}, case ({letter}) {words}: recommended design value K = {shown}"


def effective_length_default(support_case: str) -> DesignParameter:
    """The effective length factor K of a named support case (AISC 360-22 Commentary Table C-A-7.1).

    The recommended design values of the table: fixed-fixed 0.65 (case a),
    fixed-pinned 0.80 (case b), pinned-pinned 1.0 (case d), fixed-free 2.1 (case e).
    The table knows single columns only, so a member on more than two supports is
    taken segment by segment between supports:

    * ``two-span``: each span between two supports is pinned-pinned, K = 1.0 on the
      span's length (the continuity over the middle support, which would lower K,
      is neglected);
    * ``overhang``: the span between the supports is pinned-pinned, K = 1.0 on its
      length; an overhang beyond a support is taken as fixed-free, K = 2.1 on the
      overhang's length (:func:`segment_effective_lengths` gives both).

    The value returned for ``two-span`` and ``overhang`` is the spans' K (1.0); the
    text says how the segments are taken. An unknown case raises :class:`InputError`
    naming ``support case``.
    """
    case = _known_case(support_case)
    if case in _TABLE_CASES:
        return DesignParameter(_TABLE_CASES[case][2], f"{_case_text(case)}.")
    if case == "two-span":
        text = (
            f"{TABLE_C_A_7_1} taken span by span: each span between supports as "
            f"case (d) both ends pinned, K = 1.0 on the span length."
        )
        return DesignParameter(_TABLE_CASES["pinned-pinned"][2], text)
    text = (
        f"{TABLE_C_A_7_1} taken segment by segment: the span between the supports as "
        f"case (d) both ends pinned, K = 1.0 on the span length; the overhang as case (e) "
        f"one end fixed, the other free, K = 2.1 on the overhang length."
    )
    return DesignParameter(_TABLE_CASES["pinned-pinned"][2], text)


class EffectiveLength(NamedTuple):
    """One segment between supports (or a support and a free end) with its K and K·l."""

    z_start: pint.Quantity
    z_end: pint.Quantity
    K: float
    effective_length: pint.Quantity
    basis: str


def segment_effective_lengths(
    support_case: str, length: QuantityInput, supports_z: Sequence[QuantityInput]
) -> list[EffectiveLength]:
    """K and the effective length K·l of every segment of the member (Table C-A-7.1).

    Segments run between consecutive supports, and from an end support to a free
    end of the member; the largest K·l governs flexural buckling in the plane the
    supports hold. Single-span cases give one segment over the supports' span
    (a fixed-free member: from the fixed support to the free end). Stations are
    quantities; the result is in the unit of ``length``.
    """
    case = _known_case(support_case)
    length_q = member_length(length)
    unit = length_q.units
    stations = _sorted_stations(supports_z, length_q, field="support positions")
    if not stations:
        raise InputError("support positions", list(supports_z), "at least one support station")
    total = float(length_q.m)
    segments: list[EffectiveLength] = []

    def add(start: float, end: float, table_case: str) -> None:
        K = _TABLE_CASES[table_case][2]
        segments.append(
            EffectiveLength(
                start * unit, end * unit, K, K * (end - start) * unit, _case_text(table_case)
            )
        )

    tolerance = _SAME_STATION * total
    if case == "fixed-free":
        fixed = stations[0]
        if fixed > tolerance:
            add(0.0, fixed, "fixed-free")
        if fixed < total - tolerance:
            add(fixed, total, "fixed-free")
        return segments
    if len(stations) < 2:
        raise InputError(
            "support positions", list(supports_z), f"two or more stations for the case {case}"
        )
    if stations[0] > tolerance:  # an overhang before the first support
        add(0.0, stations[0], "fixed-free")
    between = case if case in _TABLE_CASES else "pinned-pinned"
    for start, end in itertools.pairwise(stations):
        add(start, end, between)
    if stations[-1] < total - tolerance:  # an overhang beyond the last support
        add(stations[-1], total, "fixed-free")
    return segments


def _known_case(support_case: str) -> str:
    case = str(support_case).strip().lower()
    if case not in SUPPORT_CASES:
        raise InputError("support case", support_case, f"one of {', '.join(SUPPORT_CASES)}")
    return case


# --- unbraced lengths: Section F1 ------------------------------------------------------


def _sorted_stations(
    stations: Sequence[QuantityInput], length: pint.Quantity, *, field: str
) -> list[float]:
    """Stations as floats in the length's unit, sorted; InputError for one off the member."""
    values = []
    for number, station in enumerate(stations):
        z = parse_quantity(station, field=f"{field}[{number}]", dimension="length")
        z_value = float(z.to(length.units).m)
        tolerance = _SAME_STATION * float(length.m)
        if z_value < -tolerance or z_value > float(length.m) + tolerance:
            raise InputError(
                field,
                station,
                f"stations from 0 to the member length {length:~P}",
                "outside the member",
            )
        values.append(min(max(z_value, 0.0), float(length.m)))
    return sorted(values)


def unbraced_segments(
    length: QuantityInput,
    supports_z: Sequence[QuantityInput],
    braces_z: Sequence[QuantityInput] = (),
) -> list[UnbracedSegment]:
    """The laterally unbraced segments of the member (AISC 360-22 Section F1, Lb).

    Lb is the length between points braced against lateral displacement of the
    compression flange or twist of the section. Every station in ``supports_z`` is
    taken as such a point (the named cases of :mod:`calcsheet.mechanics.supports`
    restrain the twist; leave out a support that does not), and so is every brace
    station. A part of the member beyond the last braced
    point (a cantilever, an overhang) is a segment with ``free_end=True``.

    A brace outside the member, or two braces at one station, raises
    :class:`InputError` naming ``member braces``; a brace at a support is
    accepted and adds nothing. The result is in the unit of ``length``.
    """
    length_q = member_length(length)
    unit = length_q.units
    total = float(length_q.m)
    tolerance = _SAME_STATION * total
    supports = _sorted_stations(supports_z, length_q, field="support positions")
    braces = _sorted_stations(braces_z, length_q, field="member braces")
    for before, after in itertools.pairwise(braces):
        if after - before <= tolerance:
            raise InputError(
                "member braces",
                [str(brace) for brace in braces_z],
                "distinct brace stations",
                f"two braces at {before:g} {unit:~P}",
            )
    points: list[float] = []
    for z in sorted([*supports, *braces]):
        if not points or z - points[-1] > tolerance:
            points.append(z)
    if not points:  # nothing holds the member: one segment, both ends free
        return [UnbracedSegment(0.0 * unit, total * unit, True)]
    segments = []
    if points[0] > tolerance:
        segments.append(UnbracedSegment(0.0 * unit, points[0] * unit, True))
    segments.extend(
        UnbracedSegment(start * unit, end * unit, False)
        for start, end in itertools.pairwise(points)
    )
    if points[-1] < total - tolerance:
        segments.append(UnbracedSegment(points[-1] * unit, total * unit, True))
    return segments


def _magnitudes(*moments: float | pint.Quantity) -> list[float]:
    """Moments as floats: quantities in the unit of the first quantity given, floats as they are."""
    unit = next((m.units for m in moments if isinstance(m, pint.Quantity)), None)
    return [float(m.to(unit).m) if isinstance(m, pint.Quantity) else float(m) for m in moments]


# --- Cb: Eq. F1-1 ----------------------------------------------------------------------


def lateral_torsional_modification_factor(
    M_max: float, M_A: float, M_B: float, M_C: float
) -> float:
    """Cb = 12.5·|Mmax| / (2.5·|Mmax| + 3·|MA| + 4·|MB| + 3·|MC|) (AISC 360-22 Eq. F1-1).

    Mmax is the largest moment in the unbraced segment, MA, MB and MC the moments
    at its quarter point, centreline and three-quarter point, all as absolute
    values. Floats or quantities of one unit; a segment without moment gives 1.0.
    """
    values = [abs(value) for value in _magnitudes(M_max, M_A, M_B, M_C)]
    m_max, m_a, m_b, m_c = values
    m_max = max(values)  # Mmax is at least every quarter-point moment
    if m_max == 0.0:
        return 1.0
    return 12.5 * m_max / (2.5 * m_max + 3.0 * m_a + 4.0 * m_b + 3.0 * m_c)


def cb_of_segment(
    stations: ArrayLike,
    moments: ArrayLike,
    z_start: float,
    z_end: float,
    *,
    free_end: bool = False,
) -> DesignParameter:
    """Cb of one unbraced segment from a moment diagram (AISC 360-22 Eq. F1-1).

    ``stations`` (increasing, one length unit) and ``moments`` (one value per
    station) are the moment diagram about the axis of bending; ``z_start`` and
    ``z_end`` bound the segment in the stations' unit. |M| at the quarter points
    is interpolated linearly between stations, and Mmax is the largest |M| at the
    stations inside the segment, its ends and its quarter points.

    A cantilever or overhang whose free end is unbraced (``free_end=True``, see
    :func:`unbraced_segments`) takes Cb = 1.0: Eq. F1-1 is written for segments
    braced at both ends, and AISC 360-22 Section F1 with its Commentary sets
    Cb = 1.0 for a cantilever or overhang whose free end is unbraced.
    """
    z = np.asarray(stations, dtype=float)
    m = np.asarray(moments, dtype=float)
    if z.ndim != 1 or m.shape != z.shape or z.size < 2:
        raise InputError(
            "moment diagram", (z.shape, m.shape), "one moment per station, two stations or more"
        )
    if np.any(np.diff(z) < 0):
        raise InputError("moment diagram stations", "not increasing", "increasing stations")
    if not z[0] <= z_start < z_end <= z[-1]:
        raise InputError(
            "unbraced segment",
            (z_start, z_end),
            f"z_start < z_end within the stations {z[0]:g} to {z[-1]:g}",
        )
    if free_end:
        return DesignParameter(
            1.0,
            "AISC 360-22 Section F1 and Commentary: Cb = 1.0 for a cantilever or overhang "
            "whose free end is unbraced.",
        )
    quarters = z_start + (z_end - z_start) * np.array([0.0, 0.25, 0.5, 0.75, 1.0])
    at_quarters = np.abs(np.interp(quarters, z, m))
    inside = np.abs(m[(z >= z_start) & (z <= z_end)])
    m_max = float(max(at_quarters.max(), inside.max(initial=0.0)))
    _, m_a, m_b, m_c, _ = (float(value) for value in at_quarters)
    if m_max == 0.0:
        return DesignParameter(1.0, "AISC 360-22 Eq. F1-1: no moment in the segment, Cb = 1.0.")
    cb = lateral_torsional_modification_factor(m_max, m_a, m_b, m_c)
    return DesignParameter(
        cb,
        "AISC 360-22 Eq. F1-1 from the moment diagram: |M| at the quarter points "
        "and the largest |M| of the segment.",
    )


# --- Cm of B1: Appendix 8 Eq. A-8-4 ----------------------------------------------------


def moment_factor_cm(M_start: float, M_end: float, transverse_load: bool) -> DesignParameter:
    """Cm of the P-δ multiplier B1 (AISC 360-22 Appendix 8, Eq. A-8-4).

    Without transverse loading between the supports, Cm = 0.6 − 0.4·(M1/M2), where
    M1 and M2 are the smaller and the larger end moment (in absolute value) and
    M1/M2 is positive in reverse curvature, negative in single curvature. With
    transverse loading between the supports Appendix 8 lets Cm be found by analysis
    or taken conservatively as 1.0; 1.0 is returned.

    ``M_start`` and ``M_end`` are the moments at the two ends of the member (or
    of the segment between its supports), both read off one moment diagram, so
    equal signs mean single curvature; which end is which does not matter.
    Floats or quantities of one unit.
    """
    if transverse_load:
        return DesignParameter(
            1.0,
            "AISC 360-22 Appendix 8: transverse loading between the supports, "
            "Cm conservatively taken as 1.0.",
        )
    first, second = _magnitudes(M_start, M_end)
    small, large = sorted((first, second), key=abs)
    # Same signs on one diagram: single curvature, M1/M2 negative (Appendix 8); with no
    # end moment at all there is nothing to amplify and the ratio is taken as 0.
    ratio = 0.0 if large == 0.0 else -small / large
    if ratio > 0:
        shape = " (reverse curvature)"
    elif ratio < 0:
        shape = " (single curvature)"
    else:
        shape = ""
    cm = 0.6 - 0.4 * ratio
    return DesignParameter(
        cm,
        f"AISC 360-22 Eq. A-8-4: no transverse loading between the supports, "
        f"M1/M2 = {ratio:.3g}{shape}.",
    )
