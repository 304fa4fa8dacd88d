"""A straight member on supports: reactions, internal forces and deflections along it.

Method
------
The member runs along z from 0 to L (axes as in :mod:`calcsheet.mechanics.loads`)
and is cut into 3-D frame elements by the direct stiffness method: nodes at every
support, at the ends, at the point loads and couples, at both ends of every
distributed load and at a few equal subdivisions, except that a node closer than
L/100 to one already taken is left out (a very short element costs the solve its
digits) and its load enters the element through the shape functions. Each element has 12 degrees of
freedom, (ux, uy, uz, rx, ry, rz) at both ends: an axial bar (E·A), St Venant
torsion (G·J, no warping) and Euler-Bernoulli bending in both planes (shear
deformation neglected). Bending uses the centroidal axes x, y of the section
(those of :mod:`calcsheet.mechanics.stresses`); with I_xy ≠ 0 the two planes are
solved coupled (the bending energy ½·E·[u'' v'']·[[I_y, I_xy], [I_xy, I_x]]·[u'' v'']ᵀ),
so no rotation to principal axes is needed. Twist is about the centroid (the
shear centre is not modelled, as in :mod:`calcsheet.mechanics.statics`).

Loads enter as consistent (work-equivalent) nodal loads, distributed ones integrated
by Gauss quadrature exactly for linearly varying loads; for a prismatic
Euler-Bernoulli member the nodal displacements, and hence the reactions
(K·d − F at the supports), are then exact (the Hermite cubics are the member's
homogeneous solutions). Internal forces at a station are not interpolated from
the elements: they are the statics of the part beyond the cut (loads and
reactions), integrated in closed form over the distributed loads; this is the
element's fixed-end correction written out, and exact for polynomial loads.
Deflections inside an element are the left node's displacement and slope plus
the double integral of the exact curvature, split at every load, support and
load end (three-point Gauss on each piece, exact for the cubic moments of linear
loads).

Sign convention
---------------
As :mod:`calcsheet.mechanics.statics`: the internal forces (N, Vx, Vy, T, Mx, My)
act on the cut face with outward normal +z and equal the resultant, about the
cut's centroid, of every load and reaction beyond the cut. At a station where a
load or reaction sits, ``side="left"`` counts it beyond the cut (the limit from
below), ``side="right"`` behind it (the limit from above); the default
``side="station"`` is ``"left"`` except at z = 0, where the reactions there count
behind it, so that a cantilever fixed at z = 0 gives exactly
:func:`calcsheet.mechanics.statics.internal_forces`. Reactions are the forces and
couples (Fx, Fy, Fz, Mx, My, Mz) the supports apply to the member, at the
support point on the axis. Deflections (u, v, w, twist) follow the axes.

Load cases combine by linearity: :func:`solve_frame` takes several load cases and
each result method takes ``factors`` (combinations × cases) to return combined
values, without solving again.
"""

from __future__ import annotations

import itertools
from collections.abc import Sequence
from dataclasses import dataclass
from typing import Literal

import numpy as np
import pint
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import InputError
from calcsheet.mechanics.distributed import DistributedLoad, check_distributed_on_member
from calcsheet.mechanics.loads import (
    AppliedMoment,
    PointLoad,
    QuantityInput,
    check_on_member,
    member_length,
)
from calcsheet.mechanics.statics import FORCE_NAMES
from calcsheet.mechanics.supports import MOTIONS, Support
from calcsheet.units import parse_quantity


def sorted_distinct(values: ArrayLike) -> NDArray[np.float64]:
    """The values of a flat float array sorted, each once: ``np.unique`` for stations.

    ``np.unique`` imports numpy.ma on its first call (it asks whether the array is
    masked), a hundredth of a cold build; stations are never masked and never NaN.
    """
    ordered = np.sort(np.asarray(values, dtype=float).ravel())
    if ordered.size == 0:
        return ordered
    keep = np.empty(ordered.size, dtype=bool)
    keep[0] = True
    np.not_equal(ordered[1:], ordered[:-1], out=keep[1:])
    return ordered[keep]


FrameLoad = PointLoad | AppliedMoment | DistributedLoad
Side = Literal["station", "left", "right"]

REACTION_NAMES: tuple[str, ...] = ("Fx", "Fy", "Fz", "Mx", "My", "Mz")
"""Order of the six reaction components in every numeric array of this module."""

DEFLECTION_NAMES: tuple[str, ...] = ("u", "v", "w", "twist")
"""Order of the displacements along the member: along x, y, z and the twist (radians)."""

DOF_PER_NODE = 6
DEFAULT_SUBDIVISIONS = 4
# Stations closer than this fraction of the length are one node: a user's 120 in and
# 10 ft must meet, and round-off in unit conversion must not make a 1e-13 in element.
_SAME_STATION = 1e-9
# Nodes closer than this fraction of the length would make elements so short that
# their stiffness (∝ 1/l³) swamps the rest of the matrix and costs the solution its
# digits (an element L/1000 long loses about nine). Loads need no node of their own
# (shape functions keep the nodal solution exact), so a load nearer than this to a
# node adds none; two supports must be further apart than _SUPPORT_SPACING.
_NODE_SPACING = 1e-2
_SUPPORT_SPACING = 1e-3
_GAUSS_4 = np.polynomial.legendre.leggauss(4)
_GAUSS_3 = np.polynomial.legendre.leggauss(3)
# Interior sample points of an element for fitting a force's cubic (stationary points).
_SAMPLES = np.array([0.1, 0.37, 0.63, 0.9])


@dataclass(frozen=True)
class MemberStiffness:
    """Material and section values of a prismatic member (centroidal axes x, y).

    ``Ixy`` is the product of inertia about the centroidal x, y axes (zero for a
    doubly or singly symmetric section with a symmetry axis along x or y).
    """

    E: pint.Quantity
    G: pint.Quantity
    A: pint.Quantity
    Ix: pint.Quantity
    Iy: pint.Quantity
    J: pint.Quantity
    Ixy: pint.Quantity


def member_stiffness(
    *,
    E: QuantityInput,
    G: QuantityInput,
    A: QuantityInput,
    Ix: QuantityInput,
    Iy: QuantityInput,
    J: QuantityInput,
    Ixy: QuantityInput = "0 in^4",
) -> MemberStiffness:
    """Parse the stiffness values; E, G, A, Ix, Iy, J must be positive and Ixy² < Ix·Iy."""
    dimensions = {
        "E": "stress",
        "G": "stress",
        "A": "area",
        "Ix": "moment of inertia",
        "Iy": "moment of inertia",
        "J": "moment of inertia",
        "Ixy": "moment of inertia",
    }
    given = {"E": E, "G": G, "A": A, "Ix": Ix, "Iy": Iy, "J": J, "Ixy": Ixy}
    values = {
        name: parse_quantity(value, field=f"section {name}", dimension=dimensions[name])
        for name, value in given.items()
    }
    for name in ("E", "G", "A", "Ix", "Iy", "J"):
        if values[name].m <= 0:
            raise InputError(f"section {name}", given[name], "a positive value")
    ix = values["Ix"].to("in^4").m
    iy = values["Iy"].to("in^4").m
    ixy = values["Ixy"].to("in^4").m
    if ixy * ixy >= ix * iy:
        raise InputError(
            "section Ixy", Ixy, f"|Ixy| below sqrt(Ix·Iy) = {np.sqrt(ix * iy):.6g} in^4"
        )
    return MemberStiffness(**values)


# --------------------------------------------------------------------------- elements


def _hermite(xi: NDArray[np.float64], length: float) -> tuple[NDArray, NDArray]:
    """Hermite cubics (w_i, w'_i, w_j, w'_j) and their z-derivatives at ξ, shape (n, 4)."""
    xi2, xi3 = xi * xi, xi * xi * xi
    values = np.stack(
        [
            1 - 3 * xi2 + 2 * xi3,
            length * (xi - 2 * xi2 + xi3),
            3 * xi2 - 2 * xi3,
            length * (xi3 - xi2),
        ],
        axis=-1,
    )
    slopes = np.stack(
        [
            (6 * xi2 - 6 * xi) / length,
            1 - 4 * xi + 3 * xi2,
            (6 * xi - 6 * xi2) / length,
            3 * xi2 - 2 * xi,
        ],
        axis=-1,
    )
    return values, slopes


# Bending coordinates: (u_i, u'_i, u_j, u'_j) = (ux_i, ry_i, ux_j, ry_j) since ry = u';
# (v_i, v'_i, v_j, v'_j) = (uy_i, -rx_i, uy_j, -rx_j) since a rotation about +x tips
# the +z axis toward -y, rx = -v'.
_U_DOFS = (0, 4, 6, 10)
_V_DOFS = (1, 3, 7, 9)
_V_SIGNS = np.array([1.0, -1.0, 1.0, -1.0])


def element_stiffness(length: float, values: dict[str, float]) -> NDArray[np.float64]:
    """The 12 × 12 stiffness of a prismatic element (DOFs ux, uy, uz, rx, ry, rz at i, then j)."""
    L = length
    bending = (
        np.array(
            [
                [12, 6 * L, -12, 6 * L],
                [6 * L, 4 * L * L, -6 * L, 2 * L * L],
                [-12, -6 * L, 12, -6 * L],
                [6 * L, 2 * L * L, -6 * L, 4 * L * L],
            ]
        )
        / L**3
    )
    to_bending = np.zeros((8, 12))
    to_bending[np.arange(4), _U_DOFS] = 1.0
    to_bending[4 + np.arange(4), _V_DOFS] = _V_SIGNS
    E = values["E"]
    plane = np.array([[values["Iy"], values["Ixy"]], [values["Ixy"], values["Ix"]]])
    stiffness = to_bending.T @ (E * np.kron(plane, bending)) @ to_bending
    axial = E * values["A"] / L
    torsion = values["G"] * values["J"] / L
    for first, second, k in ((2, 8, axial), (5, 11, torsion)):
        stiffness[first, first] += k
        stiffness[second, second] += k
        stiffness[first, second] -= k
        stiffness[second, first] -= k
    return stiffness


def element_shape(xi: NDArray[np.float64], length: float) -> NDArray[np.float64]:
    """(n, 6, 12): (u, v, w, θx, θy, φ) at ξ from the 12 element DOFs, for consistent loads."""
    values, slopes = _hermite(np.asarray(xi, dtype=float), length)
    shape = np.zeros((len(xi), 6, 12))
    shape[:, 0, _U_DOFS] = values
    shape[:, 4, _U_DOFS] = slopes
    shape[:, 1, _V_DOFS] = values * _V_SIGNS
    shape[:, 3, _V_DOFS] = -slopes * _V_SIGNS
    shape[:, 2, 2] = 1 - xi
    shape[:, 2, 8] = xi
    shape[:, 5, 5] = 1 - xi
    shape[:, 5, 11] = xi
    return shape


# ------------------------------------------------------------------------ numeric loads


@dataclass(frozen=True)
class _NumericDistributed:
    """A distributed load in floats: force density q(t) = q0 + q1·t, t = z − a, on [a, b]."""

    case: int
    a: float
    b: float
    q0: NDArray[np.float64]
    q1: NDArray[np.float64]
    ex: float
    ey: float

    def densities(self, z: NDArray[np.float64]) -> NDArray[np.float64]:
        """(n, 6): distributed forces and couples (qx, qy, qz, mx, my, mz) at z."""
        q = self.q0[None, :] + (z - self.a)[:, None] * self.q1[None, :]
        return np.concatenate([q, _offset_couples(q, self.ex, self.ey)], axis=1)


def _offset_couples(force: NDArray[np.float64], ex: float, ey: float) -> NDArray[np.float64]:
    """Couples (…, 3) about the centroid of forces (…, 3) acting at (ex, ey): r × F."""
    fx, fy, fz = force[..., 0], force[..., 1], force[..., 2]
    return np.stack([ey * fz, -ex * fz, ex * fy - ey * fx], axis=-1)


def _as_cases(cases: Sequence[FrameLoad] | Sequence[Sequence[FrameLoad]]) -> list[list[FrameLoad]]:
    """One load case (a list of loads) or several (a list of lists) as a list of lists."""
    items = list(cases)
    if not items:
        return [[]]  # one case without loads: every result is zero
    if isinstance(items[0], (PointLoad, AppliedMoment, DistributedLoad)):
        return [items]  # type: ignore[list-item]
    return [list(case) for case in items]  # type: ignore[arg-type]


# --------------------------------------------------------------------------- the result


@dataclass(frozen=True)
class FrameResult:
    """The solved member for every load case, in ``force_unit`` and ``length_unit`` floats.

    ``reactions`` has shape (cases, supports, 6) in :data:`REACTION_NAMES` order;
    ``nodes`` are the stations of the element ends; ``displacements`` (cases,
    nodes, 6) the nodal motions (ux, uy, uz, rx, ry, rz).
    """

    length: float
    supports: tuple[Support, ...]
    nodes: NDArray[np.float64]
    displacements: NDArray[np.float64]
    reactions: NDArray[np.float64]
    stiffness: dict[str, float]
    force_unit: str
    length_unit: str
    # Statics of the part beyond the cut, as coefficients of station functions.
    _point_z: NDArray[np.float64]
    _point_is_reaction: NDArray[np.bool_]
    _point_constant: NDArray[np.float64]  # (points, cases, 6)
    _point_slope: NDArray[np.float64]  # (points, cases, 6)
    _dist_ranges: NDArray[np.float64]  # (distributed, 2): a, b
    _dist_coefficients: NDArray[np.float64]  # (distributed, 5, cases, 6)
    # Nodes, loads, supports and load ends: the forces are smooth between them.
    _breakpoints: NDArray[np.float64]

    @property
    def case_count(self) -> int:
        """The number of load cases solved."""
        return self.displacements.shape[0]

    def combined(self, values: NDArray[np.float64], factors: ArrayLike | None) -> NDArray:
        """Values (cases, …) combined by ``factors`` (combinations, cases); as is when None."""
        if factors is None:
            return values
        matrix = self._factors(factors)
        return np.tensordot(matrix, values, axes=(1, 0))

    def _factors(self, factors: ArrayLike) -> NDArray[np.float64]:
        matrix = np.atleast_2d(np.asarray(factors, dtype=float))
        if matrix.shape[1] != self.case_count:
            raise InputError(
                "combination factors",
                matrix.shape,
                f"one factor per load case ({self.case_count}) in each combination",
            )
        return matrix

    def reactions_for(self, factors: ArrayLike | None = None) -> NDArray[np.float64]:
        """Reactions (cases or combinations, supports, 6)."""
        return self.combined(self.reactions, factors)

    def _station_basis(self, stations: NDArray[np.float64], side: Side) -> NDArray[np.float64]:
        """(stations, basis): the functions of the station the forces are linear in."""
        s = stations[:, None]
        tolerance = _SAME_STATION * self.length
        z = self._point_z[None, :]
        at = np.abs(s - z) <= tolerance
        if side == "left":
            counts_at = np.ones_like(at)
        elif side == "right":
            counts_at = np.zeros_like(at)
        else:
            at_start = np.abs(s) <= tolerance
            counts_at = ~(self._point_is_reaction[None, :] & at_start)
        beyond = ((s < z) & ~at) | (at & counts_at)
        point_columns = [beyond.astype(float), beyond * s]
        a = self._dist_ranges[None, :, 0]
        b = self._dist_ranges[None, :, 1]
        t_end = b - a
        t_low = np.clip(s, a, b) - a
        s_local = s - a
        i0 = t_end - t_low
        i1 = (t_end**2 - t_low**2) / 2
        i2 = (t_end**3 - t_low**3) / 3
        dist_columns = np.stack([i0, i1, i2, s_local * i0, s_local * i1], axis=-1)
        return np.concatenate(
            [point_columns[0], point_columns[1], dist_columns.reshape(len(stations), -1)], axis=1
        )

    def _coefficients(self) -> NDArray[np.float64]:
        """(basis, cases, 6) matching :meth:`_station_basis`."""
        dist = self._dist_coefficients.reshape(-1, self.case_count, 6)
        return np.concatenate([self._point_constant, self._point_slope, dist], axis=0)

    def internal_forces(
        self,
        stations: ArrayLike,
        factors: ArrayLike | None = None,
        *,
        side: Side = "station",
    ) -> NDArray[np.float64]:
        """(N, Vx, Vy, T, Mx, My) at the stations: (cases or combinations, stations, 6).

        ``stations`` are floats in ``length_unit`` (0 to L); ``factors`` (combinations,
        cases) combine the load cases; ``side`` as in the module docstring.
        """
        s = self._stations(stations)
        coefficients = self._coefficients()
        if factors is not None:
            coefficients = np.einsum("bkf,ck->bcf", coefficients, self._factors(factors))
        basis = self._station_basis(s, side)
        flat = basis @ coefficients.reshape(coefficients.shape[0], -1)
        return flat.reshape(len(s), -1, 6).transpose(1, 0, 2)

    def _stations(self, stations: ArrayLike) -> NDArray[np.float64]:
        s = np.atleast_1d(np.asarray(stations, dtype=float))
        if s.ndim != 1 or np.any(~np.isfinite(s)):
            raise InputError("stations", stations, "finite stations along the member")
        tolerance = _SAME_STATION * self.length
        if np.any(s < -tolerance) or np.any(s > self.length + tolerance):
            raise InputError(
                "stations",
                stations,
                f"stations from 0 to the member length {self.length:g} {self.length_unit}",
                "outside the member",
            )
        return np.clip(s, 0.0, self.length)

    def deflections(
        self, stations: ArrayLike, factors: ArrayLike | None = None
    ) -> NDArray[np.float64]:
        """(u, v, w, twist) at the stations: (cases or combinations, stations, 4).

        u, v, w in ``length_unit``, the twist in radians. From the nodal solution
        and the exact curvature inside the element (module docstring).
        """
        s = self._stations(stations)
        element = np.clip(np.searchsorted(self.nodes, s, side="right") - 1, 0, len(self.nodes) - 2)
        reference = self.nodes[element]
        run = s - reference
        # ∫ from the node to s, split where a load or support makes the curvature kink.
        low, high = np.minimum(reference, s)[:, None], np.maximum(reference, s)[:, None]
        cuts = np.sort(
            np.concatenate([low, high, np.clip(self._breakpoints[None, :], low, high)], axis=1),
            axis=1,
        )
        starts, ends = cuts[:, :-1], cuts[:, 1:]
        points, weights = _GAUSS_3
        inner = starts[..., None] + (ends - starts)[..., None] * (points + 1) / 2
        sign = np.where(run >= 0, 1.0, -1.0)[:, None, None]
        w_gauss = sign * weights * (ends - starts)[..., None] / 2  # (stations, pieces, 3)
        forces = self.internal_forces(inner.ravel(), side="left").reshape(
            (self.case_count, *inner.shape, 6)
        )
        values = self.stiffness
        E, D = values["E"], values["Ix"] * values["Iy"] - values["Ixy"] ** 2
        Mx, My = forces[..., 4], forces[..., 5]
        curvature_u = (My * values["Ix"] + Mx * values["Ixy"]) / (E * D)
        curvature_v = -(Mx * values["Iy"] + My * values["Ixy"]) / (E * D)
        strain = forces[..., 0] / (E * values["A"])
        twist_rate = forces[..., 3] / (values["G"] * values["J"])
        arm = (s[:, None, None] - inner)[None]
        w_gauss = w_gauss[None]

        def integral(rate: NDArray[np.float64]) -> NDArray[np.float64]:
            return np.sum(rate, axis=(-2, -1))

        node = self.displacements[:, element, :]  # (cases, stations, 6)
        u = node[..., 0] + node[..., 4] * run + integral(w_gauss * arm * curvature_u)
        v = node[..., 1] - node[..., 3] * run + integral(w_gauss * arm * curvature_v)
        w = node[..., 2] + integral(w_gauss * strain)
        twist = node[..., 5] + integral(w_gauss * twist_rate)
        return self.combined(np.stack([u, v, w, twist], axis=-1), factors)

    def candidate_stations(
        self, factors: ArrayLike | None = None, *, grid: int = 40
    ) -> NDArray[np.float64]:
        """Stations where a force can peak: nodes, a grid and stationary points of each force.

        The stations of supports, load points and ends of distributed loads are
        taken; between them every internal force is a cubic at most (linear
        loads), and its stationary points (zero shear for the moments) are found
        from the cubic through four interior samples, for every case or combination.
        """
        starts = self._breakpoints[:-1]
        spans = np.diff(self._breakpoints)
        samples = starts[:, None] + spans[:, None] * _SAMPLES[None, :]
        forces = self.internal_forces(samples.ravel(), factors, side="left")
        forces = forces.reshape(forces.shape[0], len(spans), len(_SAMPLES), 6)
        vandermonde = np.vander(_SAMPLES, 4, increasing=True)
        coefficients = np.einsum("ji,ceif->cejf", np.linalg.inv(vandermonde), forces)
        c1, c2, c3 = coefficients[:, :, 1], 2 * coefficients[:, :, 2], 3 * coefficients[:, :, 3]
        roots = _quadratic_roots(c3, c2, c1)  # (…, 2) in ξ, NaN where none
        inside = (roots > 0) & (roots < 1)
        xi = np.where(inside, roots, np.nan)
        stations = starts[None, :, None, None] + spans[None, :, None, None] * xi
        found = stations[np.isfinite(stations)]
        every = np.concatenate([self._breakpoints, np.linspace(0.0, self.length, grid + 1), found])
        return sorted_distinct(np.round(every / self.length, 12)) * self.length

    def critical_station(
        self, force: str, factors: ArrayLike | None = None, *, grid: int = 40
    ) -> tuple[NDArray[np.float64], NDArray[np.float64]]:
        """For each case or combination, the station of the largest |force| and its value.

        ``force`` is one of :data:`FORCE_NAMES`. Both sides of every candidate
        station are looked at (a couple makes the moment jump), and the station's
        own value (at z = 0 the loads there count and the reactions do not).
        """
        if force not in FORCE_NAMES:
            raise InputError("force", force, f"one of {', '.join(FORCE_NAMES)}")
        index = FORCE_NAMES.index(force)
        stations = self.candidate_stations(factors, grid=grid)
        sides: tuple[Side, ...] = ("station", "left", "right")
        every = np.concatenate(
            [self.internal_forces(stations, factors, side=side)[..., index] for side in sides],
            axis=1,
        )
        best = np.argmax(np.abs(every), axis=1)
        picked = every[np.arange(every.shape[0]), best]
        return np.tile(stations, len(sides))[best], picked


def _quadratic_roots(a: NDArray, b: NDArray, c: NDArray) -> NDArray[np.float64]:
    """Real roots (…, 2) of a·x² + b·x + c; NaN for none; the linear root when a is ~0."""
    scale = np.maximum(np.maximum(np.abs(a), np.abs(b)), np.abs(c))
    scale = np.where(scale == 0, 1.0, scale)
    a, b, c = a / scale, b / scale, c / scale
    with np.errstate(invalid="ignore", divide="ignore"):
        disc = b * b - 4 * a * c
        root = np.sqrt(np.where(disc >= 0, disc, np.nan))
        quadratic = np.abs(a) > 1e-12
        first = np.where(
            quadratic, (-b - root) / (2 * a), np.where(np.abs(b) > 1e-12, -c / b, np.nan)
        )
        second = np.where(quadratic, (-b + root) / (2 * a), np.nan)
    return np.stack([first, second], axis=-1)


# ----------------------------------------------------------------------------- solving


def solve_frame(
    length: QuantityInput,
    supports: Sequence[Support],
    stiffness: MemberStiffness,
    cases: Sequence[FrameLoad] | Sequence[Sequence[FrameLoad]],
    *,
    force_unit: str = "kip",
    length_unit: str = "inch",
    subdivisions: int = DEFAULT_SUBDIVISIONS,
) -> FrameResult:
    """Solve the member for one load case (a list of loads) or several (a list of lists).

    Raises :class:`InputError` naming the field for a support or load outside the
    member, two supports at one station, or supports that leave a rigid-body
    motion free (a mechanism).
    """
    length_q = member_length(length)
    L = float(length_q.to(length_unit).m)
    moment_unit = f"{force_unit}*{length_unit}"
    load_cases = _as_cases(cases)
    if not supports:
        raise InputError("supports", [], "at least one support", "the member is not held")

    support_z = []
    for item in supports:
        check_on_member(item.z, length_q, field=f"support {item.name} z", shown=f"{item.z:~P}")
        support_z.append(float(item.z.to(length_unit).m))

    forces: list[tuple[int, NDArray, NDArray, float]] = []  # case, F, (ex, ey), z
    couples: list[tuple[int, NDArray, float]] = []
    distributed: list[_NumericDistributed] = []
    for case, loads in enumerate(load_cases):
        for load in loads:
            if isinstance(load, PointLoad):
                field = f"load {load.name} z"
                check_on_member(load.z, length_q, field=field, shown=f"{load.z:~P}")
                vector = np.array(
                    [load.Fx.to(force_unit).m, load.Fy.to(force_unit).m, load.Fz.to(force_unit).m]
                )
                offsets = np.array([load.ex.to(length_unit).m, load.ey.to(length_unit).m])
                forces.append((case, vector, offsets, float(load.z.to(length_unit).m)))
            elif isinstance(load, AppliedMoment):
                field = f"moment {load.name} z"
                check_on_member(load.z, length_q, field=field, shown=f"{load.z:~P}")
                vector = np.array(
                    [
                        load.Mx.to(moment_unit).m,
                        load.My.to(moment_unit).m,
                        load.Mz.to(moment_unit).m,
                    ]
                )
                couples.append((case, vector, float(load.z.to(length_unit).m)))
            elif isinstance(load, DistributedLoad):
                check_distributed_on_member(load, length_q)
                density = f"{force_unit}/{length_unit}"
                a = float(load.z_start.to(length_unit).m)
                b = float(load.z_end.to(length_unit).m)
                if b - a <= _SAME_STATION * L:
                    raise InputError(
                        f"distributed load {load.name} z_end",
                        f"{load.z_end:~P}",
                        "a station beyond z_start",
                        "a distributed load needs a length",
                    )
                q_a = np.array([value.to(density).m for value in load.q_start])
                q_b = np.array([value.to(density).m for value in load.q_end])
                distributed.append(
                    _NumericDistributed(
                        case, a, b, q_a, (q_b - q_a) / (b - a),
                        float(load.ex.to(length_unit).m), float(load.ey.to(length_unit).m),
                    )
                )  # fmt: skip
            else:
                raise InputError("loads", load, "point loads, couples and distributed loads")

    _check_distinct_supports(supports, support_z, L)
    nodes = _node_stations(
        L,
        support_z,
        [z for *_, z in forces]
        + [z for *_, z in couples]
        + [d.a for d in distributed]
        + [d.b for d in distributed],
        subdivisions,
    )
    support_nodes = [_node_of(nodes, z) for z in support_z]
    _check_no_mechanism(supports, support_z, L, length_unit)

    values = {
        "E": float(stiffness.E.to(f"{force_unit}/{length_unit}**2").m),
        "G": float(stiffness.G.to(f"{force_unit}/{length_unit}**2").m),
        "A": float(stiffness.A.to(f"{length_unit}**2").m),
        "Ix": float(stiffness.Ix.to(f"{length_unit}**4").m),
        "Iy": float(stiffness.Iy.to(f"{length_unit}**4").m),
        "J": float(stiffness.J.to(f"{length_unit}**4").m),
        "Ixy": float(stiffness.Ixy.to(f"{length_unit}**4").m),
    }
    node_count = len(nodes)
    dof_count = DOF_PER_NODE * node_count
    case_count = len(load_cases)
    global_stiffness = np.zeros((dof_count, dof_count))
    for element in range(node_count - 1):
        dofs = slice(DOF_PER_NODE * element, DOF_PER_NODE * (element + 2))
        global_stiffness[dofs, dofs] += element_stiffness(
            nodes[element + 1] - nodes[element], values
        )
    nodal_loads = np.zeros((dof_count, case_count))
    for case, vector, offsets, z in forces:
        generalized = np.concatenate([vector, _offset_couples(vector, *offsets)])
        _add_concentrated(nodal_loads[:, case], nodes, z, generalized[None, :], np.ones(1))
    for case, vector, z in couples:
        generalized = np.concatenate([np.zeros(3), vector])
        _add_concentrated(nodal_loads[:, case], nodes, z, generalized[None, :], np.ones(1))
    points, weights = _GAUSS_4
    for load in distributed:
        # Each piece of the load between consecutive nodes (or beyond the end nodes) is
        # integrated by Gauss quadrature: exact for a linear load times the cubics.
        cuts = sorted_distinct(np.clip(np.concatenate([[load.a, load.b], nodes]), load.a, load.b))
        for low, high in itertools.pairwise(cuts):
            z = low + (high - low) * (points + 1) / 2
            _add_concentrated(
                nodal_loads[:, load.case], nodes, z, load.densities(z), weights * (high - low) / 2
            )

    restrained = np.zeros(dof_count, dtype=bool)
    for item, node in zip(supports, support_nodes, strict=True):
        restrained[DOF_PER_NODE * node + np.array(item.restrained_indices(), dtype=int)] = True
    free = ~restrained
    displacement = np.zeros((dof_count, case_count))
    displacement[free] = np.linalg.solve(global_stiffness[np.ix_(free, free)], nodal_loads[free])
    unbalanced = global_stiffness @ displacement - nodal_loads
    reactions = np.zeros((case_count, len(supports), 6))
    for number, (item, node) in enumerate(zip(supports, support_nodes, strict=True)):
        held = np.array(item.restrained_indices(), dtype=int)
        reactions[:, number, held] = unbalanced[DOF_PER_NODE * node + held].T

    return _result(
        L, tuple(supports), nodes, displacement, reactions, values,
        forces, couples, distributed, support_z, case_count, force_unit, length_unit,
    )  # fmt: skip


def _result(
    L: float,
    supports: tuple[Support, ...],
    nodes: NDArray[np.float64],
    displacement: NDArray[np.float64],
    reactions: NDArray[np.float64],
    values: dict[str, float],
    forces: list[tuple[int, NDArray, NDArray, float]],
    couples: list[tuple[int, NDArray, float]],
    distributed: list[_NumericDistributed],
    support_z: list[float],
    case_count: int,
    force_unit: str,
    length_unit: str,
) -> FrameResult:
    """Collect the statics of every load and reaction as station-function coefficients."""
    point_z: list[float] = []
    is_reaction: list[bool] = []
    constant: list[NDArray] = []
    slope: list[NDArray] = []

    def add(z: float, reaction: bool, per_case: NDArray, offsets: NDArray, couple: NDArray) -> None:
        # per_case (cases, 3) forces at (ex, ey, z), couple (cases, 3): see statics'
        # docstring; the moments of a force about the cut are linear in the station s.
        fx, fy, fz = per_case[:, 0], per_case[:, 1], per_case[:, 2]
        ex, ey = offsets
        point_z.append(z)
        is_reaction.append(reaction)
        constant.append(
            np.stack(
                [
                    fz,
                    fx,
                    fy,
                    ex * fy - ey * fx + couple[:, 2],
                    ey * fz - z * fy + couple[:, 0],
                    z * fx - ex * fz + couple[:, 1],
                ],
                axis=-1,
            )
        )
        zero = np.zeros_like(fx)
        slope.append(np.stack([zero, zero, zero, zero, fy, -fx], axis=-1))

    no_offset = np.zeros(2)
    for case, vector, offsets, z in forces:
        per_case = np.zeros((case_count, 3))
        per_case[case] = vector
        add(z, False, per_case, offsets, np.zeros((case_count, 3)))
    for case, vector, z in couples:
        couple = np.zeros((case_count, 3))
        couple[case] = vector
        add(z, False, np.zeros((case_count, 3)), no_offset, couple)
    for number, z in enumerate(support_z):
        add(z, True, reactions[:, number, :3], no_offset, reactions[:, number, 3:])

    dist_coefficients = np.zeros((len(distributed), 5, case_count, 6))
    for number, load in enumerate(distributed):
        # Basis (I0, I1, I2, s·I0, s·I1) with I_k = ∫ t^k dt over the loaded part beyond
        # the cut, t = z − a and s measured from a; densities c(t) = c0 + c1·t.
        c0 = np.concatenate([load.q0, _offset_couples(load.q0, load.ex, load.ey)])
        c1 = np.concatenate([load.q1, _offset_couples(load.q1, load.ex, load.ey)])
        qx, qy, qz, mx, my, mz = range(6)
        table = np.zeros((5, 6))
        for force, component in ((0, qz), (1, qx), (2, qy), (3, mz)):
            table[0, force] += c0[component]
            table[1, force] += c1[component]
        # Mx = ∫mx − ∫(t − s)·qy ;  My = ∫my + ∫(t − s)·qx
        table[0, 4] += c0[mx]
        table[1, 4] += c1[mx] - c0[qy]
        table[2, 4] += -c1[qy]
        table[3, 4] += c0[qy]
        table[4, 4] += c1[qy]
        table[0, 5] += c0[my]
        table[1, 5] += c1[my] + c0[qx]
        table[2, 5] += c1[qx]
        table[3, 5] += -c0[qx]
        table[4, 5] += -c1[qx]
        dist_coefficients[number, :, load.case, :] = table

    return FrameResult(
        length=L,
        supports=supports,
        nodes=nodes,
        displacements=displacement.T.reshape(case_count, len(nodes), DOF_PER_NODE),
        reactions=reactions,
        stiffness=values,
        force_unit=force_unit,
        length_unit=length_unit,
        _point_z=np.array(point_z, dtype=float),
        _point_is_reaction=np.array(is_reaction, dtype=bool),
        _point_constant=np.array(constant).reshape(-1, case_count, 6),
        _point_slope=np.array(slope).reshape(-1, case_count, 6),
        _dist_ranges=np.array([[d.a, d.b] for d in distributed], dtype=float).reshape(-1, 2),
        _dist_coefficients=dist_coefficients,
        _breakpoints=_breakpoints(
            L, [nodes, point_z, [d.a for d in distributed], [d.b for d in distributed]]
        ),
    )


def _breakpoints(length: float, groups: list) -> NDArray[np.float64]:
    """Sorted distinct stations from groups of them (closer than round-off are one)."""
    every = np.sort(np.concatenate([np.asarray(group, dtype=float) for group in groups]))
    keep = np.concatenate([[True], np.diff(every) > _SAME_STATION * length])
    return every[keep]


def _node_stations(
    length: float, support_z: list[float], stations: list[float], subdivisions: int
) -> NDArray[np.float64]:
    """Sorted element-end stations: every support, then the ends, loads and a grid.

    A station closer than :data:`_NODE_SPACING` × L to a node already taken adds no
    node (a very short element would spoil the solution's precision); a load there
    enters the element through its shape functions, or rigidly if beyond the end
    node, so the nodal solution stays exact.
    """
    grid = np.linspace(0.0, length, max(int(subdivisions), 1) + 1)
    nodes = list(dict.fromkeys(support_z))
    for station in [0.0, length, *stations, *grid]:
        if min(abs(station - node) for node in nodes) > _NODE_SPACING * length:
            nodes.append(station)
    return np.array(sorted(nodes), dtype=float)


def _node_of(nodes: NDArray[np.float64], z: float) -> int:
    return int(np.argmin(np.abs(nodes - z)))


def _add_concentrated(
    target: NDArray[np.float64],
    nodes: NDArray[np.float64],
    stations: NDArray[np.float64] | float,
    generalized: NDArray[np.float64],
    weights: NDArray[np.float64],
) -> None:
    """Add work-equivalent nodal loads of weighted generalized loads (n, 6) at stations.

    Inside an element the load enters through its shape functions; beyond the first
    or last node (an end within the node spacing of a support) it moves rigidly to
    that node, with the couple of its lever arm along z.
    """
    stations = np.atleast_1d(np.asarray(stations, dtype=float))
    for z, load, weight in zip(stations, generalized, weights, strict=True):
        if z < nodes[0] or z > nodes[-1]:
            node = 0 if z < nodes[0] else len(nodes) - 1
            arm = z - nodes[node]
            moved = load.copy()
            moved[3:] += np.cross([0.0, 0.0, arm], load[:3])
            target[DOF_PER_NODE * node : DOF_PER_NODE * (node + 1)] += weight * moved
            continue
        element = int(np.clip(np.searchsorted(nodes, z, side="right") - 1, 0, len(nodes) - 2))
        span = nodes[element + 1] - nodes[element]
        xi = np.array([(z - nodes[element]) / span])
        shape = element_shape(xi, span)[0]  # (6, 12)
        dofs = slice(DOF_PER_NODE * element, DOF_PER_NODE * (element + 2))
        target[dofs] += weight * (shape.T @ load)


def _check_distinct_supports(
    supports: Sequence[Support], stations: list[float], length: float
) -> None:
    for number, (item, z) in enumerate(zip(supports, stations, strict=True)):
        for other, other_z in zip(supports[:number], stations[:number], strict=True):
            if abs(z - other_z) <= _SUPPORT_SPACING * length:
                raise InputError(
                    f"support {item.name} z",
                    f"{item.z:~P}",
                    f"a station more than L/{1 / _SUPPORT_SPACING:g} from support {other.name}",
                    "two supports at one station: give one support with both restraints",
                )


def _check_no_mechanism(
    supports: Sequence[Support], stations: list[float], length: float, unit: str
) -> None:
    """Raise :class:`InputError` when the supports leave a rigid-body motion free.

    A straight member without hinges moves as a rigid body only; its six motions
    fall in four groups that the supports restrain separately: along z (uz), the
    twist (rz), the x-z plane (ux at a station, ry) and the y-z plane (uy, rx). A
    bending plane needs two independent restraints: translations at two stations,
    or a translation and a rotation.
    """

    def held(motion: str) -> list[float]:
        return [z for item, z in zip(supports, stations, strict=True) if motion in item.restrains]

    problems = []
    if not held("uz"):
        problems.append("nothing restrains uz, so the member slides along its axis")
    if not held("rz"):
        problems.append("nothing restrains the twist rz, so the member spins about its axis")
    tolerance = _SAME_STATION * length
    for along, rotation, about in (("ux", "ry", "y"), ("uy", "rx", "x")):
        translations = held(along)
        rotations = held(rotation)
        distinct = len(translations) > 0 and (max(translations) - min(translations)) > tolerance
        if distinct or (translations and rotations):
            continue
        if translations:
            problems.append(
                f"only {along} at z = {translations[0]:g} {unit} holds the {along[1]}-z plane, "
                f"so the member turns about {about} there (restrain {along} at a second "
                f"station or {rotation})"
            )
        elif rotations:
            problems.append(f"nothing restrains {along}, so the member moves along {along[1]}")
        else:
            problems.append(
                f"nothing restrains {along} or {rotation}, so the member moves along {along[1]}"
            )
    if problems:
        shown = {item.name: sorted(item.restrains, key=MOTIONS.index) for item in supports}
        raise InputError(
            "supports", shown, "supports that hold the member in place", "; ".join(problems)
        )
