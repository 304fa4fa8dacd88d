"""Non-uniform torsion of a member: the twist φ(z) and its derivatives, and the stresses they give.

The member runs along z from 0 to L. Its twist obeys (AISC Design Guide 9, Torsional
Analysis of Structural Steel Members, Appendix C.1, from memory)

    G·J·φ' − E·Cw·φ''' = T(z),      i.e.      E·Cw·φ'''' − G·J·φ'' = m(z),

T(z) the internal torque and m(z) the applied torque per unit length, φ positive
counter-clockwise about +z. Between load points the solution is closed form,

    φ = A + B·u + C·e^(−u/a) + D·e^(−(ℓ−u)/a) − m·u²/(2·G·J),   a = √(E·Cw/(G·J)),

u measured from the start of a stretch of length ℓ (the decaying exponentials are
the cosh/sinh of Design Guide 9's Appendix C written so that a long member
neither overflows nor loses digits). The four constants of each stretch follow
from the end conditions and, at a concentrated torque T₀, continuity of φ, φ', φ''
with φ''' jumping by T₀/(E·Cw); they are solved exactly (a small linear system),
which gives the solutions Design Guide 9 publishes in Appendix C.4 for its
Appendix B cases with these end conditions and loads (the tests write out the
cantilever and simply supported ones; case numbers are not quoted, they are not
recalled reliably) and any mix of them.

End conditions, each end independently (Design Guide 9, Appendix C.2, from memory):

* twist: restrained (φ = 0) or free (no torque: G·J·φ' − E·Cw·φ''' = 0);
* warping: restrained (φ' = 0, e.g. a welded base plate) or free (φ'' = 0).

"Torsionally fixed" is both restrained, "torsionally pinned" twist restrained and
warping free, a cantilever's tip both free.

A section that does not warp (Cw = 0: tubes, bars) has pure St Venant torsion,
φ'' = T'/(G·J), φ''' = 0, with only the twist conditions.

Stresses at a point (Design Guide 9, Sections 4.1.1 to 4.1.3, from memory):
St Venant shear τ_t = G·t·φ' (at the wall's faces), warping shear
τ_w = −E·Sw·φ'''/t and warping normal stress σ_w = E·Wn·φ'' (Wn, Sw and t from
:mod:`calcsheet.sections.warping`).
"""

from __future__ import annotations

import itertools
import math
from collections.abc import Callable, Sequence
from dataclasses import dataclass

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import InputError
from calcsheet.sections.warping import WarpingPoints

Array = NDArray[np.float64]
_BISECTION_STEPS = 80


@dataclass(frozen=True)
class EndRestraint:
    """How one end of the member is held against twist and against warping."""

    twist: bool
    warping: bool

    @property
    def words(self) -> str:
        """The restraint in words, for a sheet."""
        if self.twist:
            return "torsionally fixed" if self.warping else "torsionally pinned"
        return "free, warping restrained" if self.warping else "free"


FIXED = EndRestraint(twist=True, warping=True)
PINNED = EndRestraint(twist=True, warping=False)
FREE = EndRestraint(twist=False, warping=False)


@dataclass(frozen=True)
class ConcentratedTorque:
    """A torque T₀ (about +z) at station z."""

    torque: float
    z: float


@dataclass(frozen=True)
class DistributedTorque:
    """A torque m per unit length (about +z) from ``start`` to ``end`` (None: the whole member)."""

    per_length: float
    start: float = 0.0
    end: float | None = None


Load = ConcentratedTorque | DistributedTorque


@dataclass(frozen=True, eq=False)
class TwistSolution:
    """φ(z) on each stretch between load points, for a batch of load cases.

    ``constants[..., i, :]`` are (A, B·a, C, D) of stretch i (all with the units of φ),
    ``per_length[..., i]`` the distributed torque on it; the leading axes run over the
    load cases (one per load for :func:`unit_twists`, one per combination after
    :meth:`combined`). With ``Cw = 0`` (``a = 0``) C and D are zero and B is φ'.
    """

    length: float
    GJ: float
    a: float
    boundaries: Array  # (n + 1,) stations of the stretch ends, 0 and L included
    constants: Array  # (..., n, 4)
    per_length: Array  # (..., n)

    def combined(self, factors: ArrayLike) -> TwistSolution:
        """The solution of Σ factor·case, ``factors`` of shape (..., cases) (the leading axis)."""
        weights = np.asarray(factors, dtype=float)
        return TwistSolution(
            self.length,
            self.GJ,
            self.a,
            self.boundaries,
            np.tensordot(weights, self.constants, axes=(-1, 0)),
            np.tensordot(weights, self.per_length, axes=(-1, 0)),
        )

    def derivatives(self, z: ArrayLike, side: str = "after") -> Array:
        """φ, φ', φ'', φ''' at the stations ``z``: shape (..., 4, stations).

        φ''' jumps at a concentrated torque (φ, φ', φ'' are continuous everywhere): at a
        load point ``side`` "after" takes the stretch beyond it, "before" the one ending
        there. A check at a load point takes both.
        """
        if side not in ("after", "before"):
            raise ValueError(f"side must be 'after' or 'before', not {side!r}")
        stations = np.atleast_1d(np.asarray(z, dtype=float))
        count = len(self.boundaries) - 1
        found = np.searchsorted(
            self.boundaries, stations, side="right" if side == "after" else "left"
        )
        index = np.clip(found - 1, 0, count - 1)
        u = stations - self.boundaries[index]
        stretch = np.diff(self.boundaries)[index]
        k = self.constants[..., index, :]  # (..., stations, 4)
        m = self.per_length[..., index] / self.GJ
        A, B, C, D = (k[..., j] for j in range(4))
        if self.a == 0.0:  # St Venant alone
            zero = np.zeros_like(A + m)
            return np.stack([A + B * u - m * u * u / 2, B - m * u, -m + zero, zero], axis=-2)
        a = self.a
        e1, e2 = np.exp(-u / a), np.exp(-(stretch - u) / a)
        return np.stack(
            [
                A + B * u / a + C * e1 + D * e2 - m * u * u / 2,
                (B - C * e1 + D * e2) / a - m * u,
                (C * e1 + D * e2) / a**2 - m,
                (-C * e1 + D * e2) / a**3 + 0.0 * m,
            ],
            axis=-2,
        )

    def peak_stations(self) -> Array:
        """Stations where φ, φ', φ'' or φ''' can peak: the stretch ends and every interior extremum.

        φ''' jumps at a concentrated torque, so take each station on both sides
        (:meth:`derivatives` with ``side="before"`` and ``"after"``).

        On a stretch φ''' peaks where φ'''' = 0 and φ'' where φ''' = 0, both where
        C·e^(−u/a) = ∓D·e^(−(ℓ−u)/a), so u = (ℓ − a·ln(∓D/C))/2; φ' peaks where
        φ'' = 0, which is monotonic on each side of the φ''' root and is bracketed
        there and bisected; φ peaks where φ' = 0, which is monotonic between the zeros
        of φ'', bracketed and bisected the same way. The union over every load case is
        returned, sorted.
        """
        found = [self.boundaries]
        if self.a == 0.0:  # φ' = B − m·u/GJ: φ peaks where it crosses zero
            for index, stretch in enumerate(np.diff(self.boundaries)):
                slope = self.constants[..., index, 1].ravel()
                m = self.per_length[..., index].ravel() / self.GJ
                with np.errstate(divide="ignore", invalid="ignore"):
                    u = np.where(m != 0, slope / m, -1.0)
                inside = u[(u > 0) & (u < stretch)]
                found.append(self.boundaries[index] + inside)
            return _distinct(np.concatenate(found), self.length)
        a = self.a
        lengths = np.diff(self.boundaries)
        constants = self.constants.reshape(-1, len(lengths), 4)
        per_length = self.per_length.reshape(-1, len(lengths))
        for case in range(constants.shape[0]):
            for index, stretch in enumerate(lengths):
                _, _, C, D = constants[case, index]
                k = per_length[case, index] * a * a / self.GJ
                crest = _balance(stretch, a, D / C) if C else None  # where φ''' = 0
                bend = _balance(stretch, a, -D / C) if C else None  # where φ'''' = 0
                inside = [u for u in (crest, bend) if u is not None]
                found.append(self.boundaries[index] + np.array(inside))
                # a²·φ'' is monotonic on each side of `crest`: bracket its zeros there
                pieces = [0.0, *([crest] if crest is not None else []), stretch]
                flat = []  # zeros of φ''
                for low, high in itertools.pairwise(pieces):
                    root = _bisect(_curvature(C, D, k, stretch, a), low, high)
                    if root is not None:
                        flat.append(root)
                found.append(self.boundaries[index] + np.array(flat))
                # a·φ' is monotonic between the zeros of φ'': bracket the zeros of φ' there
                B = constants[case, index, 1]
                for low, high in itertools.pairwise([0.0, *flat, stretch]):
                    root = _bisect(_slope(B, C, D, k / a, stretch, a), low, high)
                    if root is not None:
                        found.append(np.array([self.boundaries[index] + root]))
        return _distinct(np.concatenate(found), self.length)


def _distinct(stations: Array, length: float) -> Array:
    """Sorted stations, those closer than 1e-9·L to the one before dropped (a root at an end)."""
    ordered = np.clip(np.sort(stations), 0.0, length)
    keep = np.concatenate([[True], np.diff(ordered) > 1e-9 * length])
    return ordered[keep]


def _balance(stretch: float, a: float, ratio: float) -> float | None:
    """The u inside (0, ℓ) where e^(−u/a) = ratio·e^(−(ℓ−u)/a), if there is one."""
    if not ratio > 0:
        return None
    u = (stretch - a * math.log(ratio)) / 2
    return u if 0.0 < u < stretch else None


def _slope(B: float, C: float, D: float, k: float, stretch: float, a: float):
    """a·φ' on a stretch, as a function of u (k = m·a/GJ)."""

    def value(u: float) -> float:
        return B - C * math.exp(-u / a) + D * math.exp(-(stretch - u) / a) - k * u

    return value


def _curvature(C: float, D: float, k: float, stretch: float, a: float) -> Callable[[float], float]:
    """a²·φ'' on a stretch, as a function of u."""

    def value(u: float) -> float:
        return C * math.exp(-u / a) + D * math.exp(-(stretch - u) / a) - k

    return value


def _bisect(function, low: float, high: float) -> float | None:
    f_low, f_high = function(low), function(high)
    if f_low == 0.0 or f_high == 0.0 or (f_low > 0) == (f_high > 0):
        return None
    for _ in range(_BISECTION_STEPS):
        middle = 0.5 * (low + high)
        f_middle = function(middle)
        if (f_middle > 0) == (f_low > 0):
            low, f_low = middle, f_middle
        else:
            high = middle
    return 0.5 * (low + high)


def _check(length: float, GJ: float, ECw: float, start: EndRestraint, end: EndRestraint) -> None:
    if not (math.isfinite(length) and length > 0):
        raise InputError("member.length", length, "a positive length")
    if not (math.isfinite(GJ) and GJ > 0):
        raise InputError("G·J", GJ, "a positive torsional stiffness (J > 0)")
    if not (math.isfinite(ECw) and ECw >= 0):
        raise InputError("E·Cw", ECw, "a warping stiffness of zero or more")
    if not (start.twist or end.twist):
        raise InputError(
            "supports",
            f"{start.words} at z = 0, {end.words} at z = L",
            "at least one end restrained against twist",
            "the member could spin freely about its axis",
        )


def _boundaries(length: float, loads: Sequence[Load]) -> Array:
    points = [0.0, length]
    for index, load in enumerate(loads):
        if isinstance(load, ConcentratedTorque):
            if not 0.0 <= load.z <= length:
                raise InputError(f"torques[{index}].z", load.z, f"a station from 0 to {length:g}")
            points.append(load.z)
        else:
            end = length if load.end is None else load.end
            if not 0.0 <= load.start < end <= length:
                raise InputError(
                    f"torques[{index}]",
                    f"{load.start:g} to {end:g}",
                    f"a stretch inside 0 to {length:g}, start before end",
                )
            points += [load.start, end]
    ordered = np.unique(points)
    keep = np.concatenate([[True], np.diff(ordered) > 1e-12 * length])
    return ordered[keep]


def unit_twists(
    length: float,
    GJ: float,
    ECw: float,
    start: EndRestraint,
    end: EndRestraint,
    loads: Sequence[Load],
) -> TwistSolution:
    """The twist under each load on its own: a solution whose leading axis runs over ``loads``.

    Consistent units: torques in F·L (per length: F), G·J in F·L², E·Cw in F·L⁴.
    Combine them with :meth:`TwistSolution.combined`.
    """
    _check(length, GJ, ECw, start, end)
    boundaries = _boundaries(length, loads)
    stretches = np.diff(boundaries)
    count = len(stretches)
    per_length = np.zeros((len(loads), count))
    middles = (boundaries[:-1] + boundaries[1:]) / 2
    for index, load in enumerate(loads):
        if isinstance(load, DistributedTorque):
            stop = length if load.end is None else load.end
            inside = (middles > load.start) & (middles < stop)
            per_length[index, inside] = load.per_length
    if ECw == 0.0:
        constants = _st_venant(length, GJ, start, end, loads, boundaries, per_length)
        return TwistSolution(length, GJ, 0.0, boundaries, constants, per_length)
    a = math.sqrt(ECw / GJ)
    size = 4 * count
    matrix = np.zeros((size, size))
    rhs = np.zeros((size, len(loads)))
    m = per_length / GJ  # (loads, n): the particular solution is −m·u²/2

    def rows(index: int, u: float) -> Array:
        """a^k·φ^(k) of stretch ``index`` at u, k = 0..3, on (A, B·a, C, D)."""
        e1, e2 = math.exp(-u / a), math.exp(-(stretches[index] - u) / a)
        return np.array(
            [[1.0, u / a, e1, e2], [0.0, 1.0, -e1, e2], [0.0, 0.0, e1, e2], [0.0, 0.0, -e1, e2]]
        )

    def particular(index: int, u: float) -> Array:
        """a^k·φ_p^(k), k = 0..3, per load: shape (4, loads)."""
        mi = m[:, index]
        return np.array([-mi * u * u / 2, -mi * a * u, -mi * a * a, 0.0 * mi])

    row = 0
    for restraint, index, u, side in ((start, 0, 0.0, -1.0), (end, count - 1, stretches[-1], 1.0)):
        values, extra = rows(index, u), particular(index, u)
        # twist: φ = 0, or no torque: a·φ' − a³·φ''' = applied end torque·a/(G·J) (sign by end)
        end_torque = np.array(
            [
                load.torque
                if isinstance(load, ConcentratedTorque)
                and abs(load.z - (0.0 if side < 0 else length)) <= 1e-12 * length
                else 0.0
                for load in loads
            ]
        )
        if restraint.twist:
            matrix[row, 4 * index : 4 * index + 4] = values[0]
            rhs[row] = -extra[0]
        else:
            matrix[row, 4 * index : 4 * index + 4] = values[1] - values[3]
            rhs[row] = side * end_torque * a / GJ - (extra[1] - extra[3])
        row += 1
        which = 1 if restraint.warping else 2
        matrix[row, 4 * index : 4 * index + 4] = values[which]
        rhs[row] = -extra[which]
        row += 1
    for node in range(1, count):
        before, after = node - 1, node
        left, right = rows(before, stretches[before]), rows(after, 0.0)
        left_p, right_p = particular(before, stretches[before]), particular(after, 0.0)
        torque_here = np.array(
            [
                load.torque
                if isinstance(load, ConcentratedTorque)
                and abs(load.z - boundaries[node]) <= 1e-12 * length
                else 0.0
                for load in loads
            ]
        )
        for k in range(4):
            matrix[row, 4 * after : 4 * after + 4] = right[k]
            matrix[row, 4 * before : 4 * before + 4] = -left[k]
            rhs[row] = left_p[k] - right_p[k]
            if k == 3:  # a³·Δφ''' = T₀·a³/(E·Cw) = T₀·a/(G·J)
                rhs[row] += torque_here * a / GJ
            row += 1
    solution = np.linalg.solve(matrix, rhs)  # (4n, loads)
    constants = solution.T.reshape(len(loads), count, 4)
    return TwistSolution(length, GJ, a, boundaries, constants, per_length)


def _st_venant(
    length: float,
    GJ: float,
    start: EndRestraint,
    end: EndRestraint,
    loads: Sequence[Load],
    boundaries: Array,
    per_length: Array,
) -> Array:
    """(A, B) of φ = A + B·u − m·u²/(2GJ) per stretch for pure St Venant torsion (Cw = 0)."""
    stretches = np.diff(boundaries)
    count = len(stretches)
    m = per_length / GJ
    size = 2 * count
    matrix = np.zeros((size, size))
    rhs = np.zeros((size, len(loads)))

    def torque_at(station: float) -> Array:
        return np.array(
            [
                load.torque
                if isinstance(load, ConcentratedTorque) and abs(load.z - station) <= 1e-12 * length
                else 0.0
                for load in loads
            ]
        )

    row = 0
    for restraint, index, u, side in ((start, 0, 0.0, -1.0), (end, count - 1, stretches[-1], 1.0)):
        if restraint.twist:
            matrix[row, 2 * index : 2 * index + 2] = [1.0, u]
            rhs[row] = m[:, index] * u * u / 2
        else:  # G·J·φ' = applied end torque (sign by end)
            matrix[row, 2 * index : 2 * index + 2] = [0.0, 1.0]
            rhs[row] = side * torque_at(0.0 if side < 0 else length) / GJ + m[:, index] * u
        row += 1
    for node in range(1, count):
        before, after = node - 1, node
        ell = stretches[before]
        matrix[row, 2 * after] = 1.0
        matrix[row, 2 * before : 2 * before + 2] = [-1.0, -ell]
        rhs[row] = -m[:, before] * ell * ell / 2
        row += 1
        matrix[row, 2 * after + 1] = 1.0  # G·J·Δφ' = −T₀
        matrix[row, 2 * before + 1] = -1.0
        rhs[row] = -m[:, before] * ell - torque_at(boundaries[node]) / GJ
        row += 1
    solution = np.linalg.lstsq(matrix, rhs, rcond=None)[0] if size else np.zeros((0, len(loads)))
    constants = np.zeros((len(loads), count, 4))
    constants[..., :2] = solution.T.reshape(len(loads), count, 2)
    return constants


@dataclass(frozen=True, eq=False)
class TorsionStresses:
    """Torsion stresses at every station and point: arrays of shape (..., stations, points)."""

    st_venant_shear: Array  # G·t·φ'
    warping_shear: Array  # −E·Sw·φ'''/t, along the wall toward the hub
    warping_normal: Array  # E·Wn·φ''


def torsion_stresses(
    derivatives: ArrayLike, points: WarpingPoints, E: float, G: float
) -> TorsionStresses:
    """Stresses from φ', φ'', φ''' (``derivatives`` of shape (..., 4, stations)) at ``points``.

    For open sections: a section that does not warp (tubes, bars: thickness 0 at its
    points) gets zero here; its St Venant shear is that of
    :mod:`calcsheet.mechanics.torsion` (Bredt, or T·r/J).

    AISC Design Guide 9, Eqs. 4.1 (τ_t = G·t·θ'), 4.2a (τ_ws = −E·Sw·θ'''/t) and 4.3a
    (σ_ws = E·Wn·θ''), equation numbers from memory.
    """
    values = np.asarray(derivatives, dtype=float)
    first = values[..., 1, :, None]
    second = values[..., 2, :, None]
    third = values[..., 3, :, None]
    thickness = points.thickness
    safe = np.where(thickness > 0, thickness, 1.0)
    return TorsionStresses(
        st_venant_shear=G * thickness * first,
        warping_shear=-E * (points.Sw / safe) * third,
        warping_normal=E * points.Wn * second,
    )
