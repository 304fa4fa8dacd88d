"""Tip deflection of the cantilever under service loads, written once for sheet and arrays.

The member is fixed at z = 0 and free at z = L (axes as in
:mod:`calcsheet.mechanics.loads`). Elastic, small deflections, shear deformation
neglected; the loads are the unfactored (service) loads.

Standard cantilever cases (AISC Manual Table 3-23, cantilever cases; that the table
reads so was checked from memory), with a the distance of the load from the support:

* a point load P at a gives a tip deflection P·a²·(3L − a)/(6·E·I);
* a couple C at a gives C·a·(2L − a)/(2·E·I).

Both follow from the tip deflection of a cantilever, ∫₀ᴸ (L − z)·κ(z) dz: for P
the curvature is P·(a − z)/(E·I) up to a, and ∫₀ᵃ (L − z)(a − z) dz = a²(3L − a)/6;
for C it is C/(E·I) up to a, and ∫₀ᵃ (L − z) dz = a(2L − a)/2.

Signs follow :mod:`calcsheet.mechanics.statics`. With M_x and M_y the internal
moments, the curvatures are v'' = −(M_x·I_y + M_y·I_xy)/(E·D) and
u'' = (M_y·I_x + M_x·I_xy)/(E·D), D = I_x·I_y − I_xy², v the deflection along +y
and u along +x (from σ = E·ε with ε = −y·v'' − x·u''). So a force F_y > 0 lifts
the tip (v > 0); a couple C_x > 0 at a gives v = −C_x·a(2L − a)/(2EI_x), and a
couple C_y > 0 gives u = +C_y·a(2L − a)/(2EI_y). An axial force F_z at offsets
(e_x, e_y) bends the member from its station to the support like the couples
C_x = e_y·F_z and C_y = −e_x·F_z.

With the load terms Φ_v = Σ F_y·a²(3L − a)/6 − Σ (F_z·e_y + C_x)·a(2L − a)/2 and
Φ_u = Σ F_x·a²(3L − a)/6 − Σ (F_z·e_x − C_y)·a(2L − a)/2, the tip deflections are
v = (Φ_v·I_y − Φ_u·I_xy)/(E·D) and u = (Φ_u·I_x − Φ_v·I_xy)/(E·D); with I_xy = 0
they are v = Φ_v/(E·I_x) and u = Φ_u/(E·I_y).

The procedure, :func:`tip_deflection_procedure`, is written once against a writer
(:mod:`calcsheet.engine.procedure`): :func:`write_tip_deflection` and
:func:`write_tip_deflection_of` print it on a sheet, :func:`tip_deflection_numeric`
and :func:`tip_deflection` evaluate it on numpy arrays. The writers live in the
engine; this module imports them inside the functions that run the procedure, so
importing :mod:`calcsheet.mechanics` stays light (no sympy printers).
"""

from __future__ import annotations

import functools
import math
import operator
from collections.abc import Callable, Sequence
from dataclasses import dataclass, fields
from typing import TYPE_CHECKING, Any

import numpy as np
import pint
import sympy as sp
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import DefinitionError, InputError
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, QuantityInput, member_length
from calcsheet.mechanics.statics import validate_loads
from calcsheet.units import Quantity, parse_quantity

if TYPE_CHECKING:  # the sheet is passed in; mechanics does not import the engine
    from calcsheet.engine import Check, Sheet
    from calcsheet.engine.procedure import SheetWriter, Writer
    from calcsheet.sections import Section

# A value in the procedure: a sheet symbol (or expression) or a float / numpy array.
Value = Any

# The sheet cites the published table; that its cantilever cases read as in the module
# docstring was checked from memory (the tests derive the same formulas by integration).
CANTILEVER_SOURCE = "AISC Steel Construction Manual, 16th ed., Table 3-23, cantilever cases"
LIMIT_SOURCE = "deflection limit as specified for this member"
CHECK_KEY = "deflection"
CHECK_TITLE = "Tip deflection"
# Relative size below which I_xy is round-off of a zero (a symmetric section).
_ZERO_IXY = 1e-9
_INTRO = (
    "Elastic, small deflections, shear deformation neglected; loads unfactored. Standard "
    "cantilever cases (AISC Manual Table 3-23), {a} from the support: "
    "a point load {P} gives {P}·{a}²·(3{L} − {a})/(6{E}{I}) at the tip, a couple {C} gives "
    "{C}·{a}·(2{L} − {a})/(2{E}{I}). An axial force {F_z} at offsets {e_x}, {e_y} acts as the "
    "couples {e_y}·{F_z} about x and −{e_x}·{F_z} about y at its station. {v} is the "
    "deflection along +y, {u} along +x; a couple {C_x} > 0 deflects the tip toward −y. "
    "Components that are zero "
    "are left out of the sums."
)


@dataclass(frozen=True)
class LoadTerms:
    """One load's values for the tip deflection, as writer values (symbols or arrays).

    ``a`` is the load's distance from the support (its position z). ``None`` means the
    load has no such component: its terms are left out. A point load gives ``F_x``,
    ``F_y``, ``F_z`` and the offsets ``e_x``, ``e_y`` of its point of application; a
    couple gives ``C_x``, ``C_y`` (a torque C_z does not bend the member). Signs and
    units as in :mod:`calcsheet.mechanics.loads`; arrays in coherent units (SI).
    """

    name: str
    a: Value
    F_x: Value | None = None
    F_y: Value | None = None
    F_z: Value | None = None
    e_x: Value | None = None
    e_y: Value | None = None
    C_x: Value | None = None
    C_y: Value | None = None


def point_load_factor(a: Value, length: Value) -> Value:
    """a²·(3L − a)/6 = ∫₀ᵃ (L − z)(a − z) dz: tip deflection·E·I per unit point load at a.

    AISC Manual Table 3-23, cantilever with a concentrated load at any point.
    """
    return a**2 * (3 * length - a) / 6


def couple_factor(a: Value, length: Value) -> Value:
    """a·(2L − a)/2 = ∫₀ᵃ (L − z) dz: tip deflection·E·I per unit couple at a.

    The cantilever with a concentrated couple at a (curvature C/(E·I) up to a).
    """
    return a * (2 * length - a) / 2


def load_terms(loads: Sequence[LoadTerms], L: Value) -> tuple[list[Value], list[Value]]:
    """The terms E·I·v (Φ_v) and E·I·u (Φ_u) of each load (module docstring).

    v terms: F_y·a²(3L − a)/6, −F_z·e_y·a(2L − a)/2, −C_x·a(2L − a)/2;
    u terms: F_x·a²(3L − a)/6, −F_z·e_x·a(2L − a)/2, +C_y·a(2L − a)/2.
    """
    terms_v: list[Value] = []
    terms_u: list[Value] = []
    for load in loads:
        a = load.a
        if load.F_y is not None:
            terms_v.append(load.F_y * point_load_factor(a, L))
        if load.F_x is not None:
            terms_u.append(load.F_x * point_load_factor(a, L))
        # An eccentric axial force bends the member like the couples e_y·F_z and −e_x·F_z.
        if load.F_z is not None and load.e_y is not None:
            terms_v.append(-load.F_z * load.e_y * couple_factor(a, L))
        if load.F_z is not None and load.e_x is not None:
            terms_u.append(-load.F_z * load.e_x * couple_factor(a, L))
        if load.C_x is not None:
            terms_v.append(-load.C_x * couple_factor(a, L))
        if load.C_y is not None:
            terms_u.append(load.C_y * couple_factor(a, L))
    return terms_v, terms_u


def tip_deflection_procedure(
    w: Writer,
    loads: Sequence[LoadTerms],
    *,
    L: Value,
    E: Value,
    I_x: Value,
    I_y: Value,
    I_xy: Value | None,
    n_lim: Value | None,
) -> Value | None:
    """The tip deflection and the check δ ≤ L/n, written once for both writers.

    ``I_xy`` is ``None`` for a section with a symmetry axis (the symmetric forms
    Φ/(E·I) are written), else the product of area (the unsymmetric forms); the
    general forms with I_xy = 0 give the same numbers. ``n_lim`` ``None`` leaves the
    limit and the check out. Returns the check (``w.check``), or ``None`` when no
    load bends the member or there is no limit. The steps are ``Phi_v``, ``Phi_u``,
    ``D_I`` (unsymmetric), ``v_tip``, ``u_tip``, ``delta_tip``, ``delta_lim``.
    """
    terms_v, terms_u = load_terms(loads, L)
    if not terms_v and not terms_u:
        w.text("No load bends the member: the tip does not deflect.")
        return None
    point = CANTILEVER_SOURCE
    if I_xy is None:
        planes = []
        if terms_v:
            planes.append(w.step(
                "v_tip", _total(terms_v) / (E * I_x), "Tip deflection along y", reference=point
            ))  # fmt: skip
        if terms_u:
            planes.append(w.step(
                "u_tip", _total(terms_u) / (E * I_y), "Tip deflection along x", reference=point
            ))  # fmt: skip
        if len(planes) == 2:
            delta = w.step(
                "delta_tip", w.root(planes[1] ** 2 + planes[0] ** 2), "Resultant tip deflection"
            )
        else:
            delta = w.step("delta_tip", w.absolute(planes[0]), "Tip deflection")
    else:
        w.text(
            "{I_xy} ≠ 0: the load terms are summed per plane ({Phi_v} for forces along y and "
            "couples about x, {Phi_u} for the others) and combined by the unsymmetric formulas."
        )
        # A plane without load terms drops out of both formulas (its Φ is zero).
        phi_v = w.step("Phi_v", _total(terms_v), "Load terms, v") if terms_v else None
        phi_u = w.step("Phi_u", _total(terms_u), "Load terms, u") if terms_u else None
        D = w.step("D_I", I_x * I_y - I_xy**2, "{I_x}·{I_y} − {I_xy}²")
        v_parts = [phi_v * I_y] if phi_v is not None else []
        u_parts = [phi_u * I_x] if phi_u is not None else []
        if phi_u is not None:
            v_parts.append(-phi_u * I_xy)
        if phi_v is not None:
            u_parts.append(-phi_v * I_xy)
        v = w.step("v_tip", _total(v_parts) / (E * D), "Tip deflection along y", reference=point)
        u = w.step("u_tip", _total(u_parts) / (E * D), "Tip deflection along x", reference=point)
        delta = w.step("delta_tip", w.root(u**2 + v**2), "Resultant tip deflection")
    if n_lim is None:
        return None
    limit = w.step("delta_lim", L / n_lim, "Deflection limit", reference=LIMIT_SOURCE)
    return w.check(CHECK_KEY, CHECK_TITLE, delta, limit, reference=LIMIT_SOURCE)


def _total(terms: Sequence[Value]) -> Value:
    """The sum of the terms in the order written (a sheet prints them so)."""
    return functools.reduce(operator.add, terms)


def is_symmetric(Ix: ArrayLike, Iy: ArrayLike, Ixy: ArrayLike) -> bool:
    """Whether I_xy is zero (round-off aside) for every section given."""
    Ixy = np.abs(np.asarray(Ixy, dtype=float))
    scale = np.sqrt(np.abs(np.asarray(Ix, dtype=float) * np.asarray(Iy, dtype=float)))
    return bool(np.all(Ixy <= _ZERO_IXY * scale))


# --- numbers: the procedure on arrays ------------------------------------------------------


@dataclass(frozen=True)
class DeflectionArrays:
    """Tip deflections u (along x), v (along y), their resultant, the limit and δ/limit.

    Arrays broadcast over the load cases and sections given; ``limit`` and
    ``utilization`` are ``None`` without a limit ratio.
    """

    u: NDArray[np.float64]
    v: NDArray[np.float64]
    total: NDArray[np.float64]
    limit: NDArray[np.float64] | None = None
    utilization: NDArray[np.float64] | None = None


def tip_deflection_arrays(
    loads: Sequence[LoadTerms],
    *,
    length: ArrayLike,
    E: ArrayLike,
    Ix: ArrayLike,
    Iy: ArrayLike,
    Ixy: ArrayLike = 0.0,
    n: ArrayLike | None = None,
) -> DeflectionArrays:
    """:func:`tip_deflection_procedure` on arrays: every value in consistent units.

    Load values of ``m`` cases with shape ``(m,)`` and section values of ``k``
    sections with shape ``(k, 1)`` give ``(k, m)`` arrays. Sections whose I_xy is
    zero everywhere use the symmetric forms; otherwise the general forms (equal for
    I_xy = 0).
    """
    from calcsheet.engine.procedure import ArrayWriter  # imported when run: see module doc

    w = ArrayWriter()
    product = None if is_symmetric(Ix, Iy, Ixy) else np.asarray(Ixy, dtype=float)
    with np.errstate(divide="ignore", invalid="ignore"):
        check = tip_deflection_procedure(
            w,
            loads,
            L=np.asarray(length, dtype=float),
            E=np.asarray(E, dtype=float),
            I_x=np.asarray(Ix, dtype=float),
            I_y=np.asarray(Iy, dtype=float),
            I_xy=product,
            n_lim=None if n is None else np.asarray(n, dtype=float),
        )
    u = np.asarray(w.symbols.get("u_tip", 0.0), dtype=float)
    v = np.asarray(w.symbols.get("v_tip", 0.0), dtype=float)
    u, v = np.broadcast_arrays(u, v)
    total = np.broadcast_to(np.asarray(w.symbols.get("delta_tip", 0.0), dtype=float), u.shape)
    if n is None:
        return DeflectionArrays(u, v, total)
    limit = np.asarray(np.asarray(length, dtype=float) / np.asarray(n, dtype=float))
    utilization = total / limit if check is None else np.asarray(check, dtype=float)
    return DeflectionArrays(u, v, total, limit, utilization)


def tip_deflection_numeric(
    forces: ArrayLike,
    positions: ArrayLike,
    couples: ArrayLike,
    couple_stations: ArrayLike,
    *,
    length: float,
    E: ArrayLike,
    Ix: ArrayLike,
    Iy: ArrayLike,
    Ixy: ArrayLike = 0.0,
) -> NDArray[np.float64]:
    """Tip deflections (u along x, v along y) as an array (..., 2), vectorised over cases.

    ``forces`` (..., n, 3) holds (Fx, Fy, Fz) of n point loads, ``positions``
    (n, 3) (or (..., n, 3)) their (ex, ey, z); ``couples`` (..., m, 3) holds
    (Mx, My, Mz) of m couples at ``couple_stations`` (m,). Units must be
    consistent (kip, inch, ksi). Section values may be arrays that broadcast
    with the leading axes of the loads (many sections at once).
    """
    forces = np.asarray(forces, dtype=float)
    positions = np.asarray(positions, dtype=float)
    positions = positions.reshape(1, 3) if positions.ndim == 1 else positions
    couples = np.asarray(couples, dtype=float)
    stations = np.asarray(couple_stations, dtype=float)
    stations = stations.reshape(-1) if stations.ndim == 0 else stations
    loads = [
        LoadTerms(
            f"load {i + 1}",
            positions[..., i, 2],
            F_x=forces[..., i, 0],
            F_y=forces[..., i, 1],
            F_z=forces[..., i, 2],
            e_x=positions[..., i, 0],
            e_y=positions[..., i, 1],
        )
        for i in range(forces.shape[-2] if forces.ndim >= 2 else 0)
    ]
    loads += [
        LoadTerms(f"couple {j + 1}", stations[..., j], C_x=couples[..., j, 0],
                  C_y=couples[..., j, 1])
        for j in range(stations.shape[-1])
    ]  # fmt: skip
    result = tip_deflection_arrays(loads, length=length, E=E, Ix=Ix, Iy=Iy, Ixy=Ixy)
    return np.stack(np.broadcast_arrays(result.u, result.v), axis=-1)


@dataclass(frozen=True)
class TipDeflection:
    """Tip deflections along x (u) and y (v), and their resultant."""

    u: pint.Quantity
    v: pint.Quantity
    total: pint.Quantity


def tip_deflection(
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    *,
    length: QuantityInput,
    E: QuantityInput = "29000 ksi",
    length_unit: str = "inch",
) -> TipDeflection:
    """Tip deflection of the cantilever under ``loads`` (service loads), as quantities."""
    length_q, _ = validate_loads(length, loads)
    modulus = parse_quantity(E, field="E", dimension="stress")
    props = section.properties
    result = tip_deflection_arrays(
        [si_load_terms(load) for load in loads],
        length=_si(length_q),
        E=_si(modulus),
        Ix=_si(props["Ix"]),
        Iy=_si(props["Iy"]),
        Ixy=_si(props["Ixy"]),
    )
    u, v, total = (Quantity(float(value), "m").to(length_unit) for value in
                   (result.u, result.v, result.total))  # fmt: skip
    return TipDeflection(u, v, total)


def _si(value: pint.Quantity) -> float:
    return float(value.to_base_units().m)


def si_load_terms(load: PointLoad | AppliedMoment) -> LoadTerms:
    """A load's values in SI base units, every component given (zeros add nothing): the
    input of :func:`tip_deflection_arrays` for loads given as objects."""
    if isinstance(load, AppliedMoment):
        return LoadTerms(load.name, _si(load.z), C_x=_si(load.Mx), C_y=_si(load.My))
    return LoadTerms(
        load.name,
        _si(load.z),
        F_x=_si(load.component("x")),
        F_y=_si(load.component("y")),
        F_z=_si(load.component("z")),
        e_x=_si(load.ex),
        e_y=_si(load.ey),
    )


# --- the sheet ---------------------------------------------------------------------------------


def write_tip_deflection(
    sheet: Sheet,
    section: Section,
    loads: Sequence[PointLoad | AppliedMoment],
    *,
    length: QuantityInput,
    E: QuantityInput = "29000 ksi",
    n: float = 180.0,
) -> Check | None:
    """Write the tip deflection of the cantilever and the check δ ≤ L/n on ``sheet``.

    ``loads`` are the service (unfactored) loads. Each load's inputs carry the
    subscript d and its number (F_y,d1, a_d1, ...): force components and offsets
    that are zero are left out of the sheet, so build it again to add one. ``n``
    is the limit ratio (180 by default: common practice, no source). Inputs that
    the sheet already holds with the same value (L, E, I_x, I_y, I_xy) are reused.
    Returns the check, or ``None`` when no load bends the member.

    A sheet that already states the loads (the member sheet) passes its own
    symbols to :func:`write_tip_deflection_of` instead, so no load is written twice.
    """
    length_q, _ = validate_loads(length, loads)
    return _write_on_sheet(
        sheet, section, length_q, E, n, lambda w: _write_load_inputs(w, loads, length_q.units)
    )


def write_tip_deflection_of(
    sheet: Sheet,
    section: Section,
    loads: Sequence[LoadTerms],
    *,
    length: QuantityInput,
    E: QuantityInput = "29000 ksi",
    n: float = 180.0,
) -> Check | None:
    """As :func:`write_tip_deflection`, from load values the sheet already has.

    ``loads`` hold the sheet's own symbols (steps or inputs) of every load, ``a``
    its position from the support; a changed input then changes the deflection
    too. Every component given enters the sums; give ``None`` for one to leave out.
    """
    length_q = member_length(length)
    for load in loads:
        for item in fields(LoadTerms):
            value = getattr(load, item.name)
            if item.name != "name" and value is not None and not isinstance(value, sp.Basic):
                raise DefinitionError(
                    f"tip deflection: {item.name} of {load.name} must be a symbol of the sheet"
                )
    note = "Each load enters at its position from the support: a = z of the load."
    return _write_on_sheet(sheet, section, length_q, E, n, lambda w: list(loads), note)


def _write_on_sheet(
    sheet: Sheet,
    section: Section,
    length_q: pint.Quantity,
    E: QuantityInput,
    n: float,
    write_loads: Callable[[SheetWriter], list[LoadTerms]],
    note: str = "",
) -> Check | None:
    from calcsheet.engine.procedure import SheetWriter  # imported when run: see module doc

    ratio = float(n)
    if not (math.isfinite(ratio) and ratio > 0):
        raise InputError("n", n, "a positive limit ratio, e.g. 180 for L/180")
    modulus = parse_quantity(E, field="E", dimension="stress")
    props = section.properties
    unit = props["Ix"].units
    symmetric = is_symmetric(*(props[key].to(unit).m for key in ("Ix", "Iy", "Ixy")))
    w = SheetWriter(sheet)
    # sympy's evaluate(False) is what the engine's as_written does (keep products in the
    # order written); mechanics comes before the engine and does not import it.
    with sp.evaluate(False):
        w.heading("Tip deflection (service loads)")
        w.text(f"{_INTRO} {note}".strip())
        L = w.input("L", length_q, "Member length", dimension="length")
        E_s = w.input("E", modulus, "Modulus of elasticity", dimension="stress")
        I_x = w.input(
            "I_x", props["Ix"], "Second moment of area about x",
            reference=section.sources.get("Ix", ""),
        )  # fmt: skip
        I_y = w.input(
            "I_y", props["Iy"], "Second moment of area about y",
            reference=section.sources.get("Iy", ""),
        )  # fmt: skip
        n_lim = w.input(
            "n_lim", ratio, "Deflection limit ratio, δ ≤ L/n", dimension="dimensionless",
            reference=LIMIT_SOURCE,
        )  # fmt: skip
        terms = write_loads(w)
        I_xy = None
        if not symmetric and any(load_terms(terms, L)):
            I_xy = w.input(
                "I_xy", props["Ixy"], "Product of area ∫x·y dA",
                reference=section.sources.get("Ixy", ""),
            )  # fmt: skip
        return tip_deflection_procedure(
            w, terms, L=L, E=E_s, I_x=I_x, I_y=I_y, I_xy=I_xy, n_lim=n_lim
        )


def _write_load_inputs(
    w: SheetWriter, loads: Sequence[PointLoad | AppliedMoment], unit: pint.Unit
) -> list[LoadTerms]:
    """Inputs of each load (subscript d and its number); zero components are left out."""
    written: list[LoadTerms] = []
    for number, load in enumerate(loads, start=1):
        tag = f"d{number}"
        a = w.input(
            f"a_{tag}", load.z.to(unit), f"Distance of {w.literal(load.name)} from the support",
            dimension="length",
        )  # fmt: skip
        if isinstance(load, AppliedMoment):
            C = {
                axis: w.input(
                    f"C_{axis}_{tag}", value, f"Couple of {w.literal(load.name)} about {axis}"
                )
                for axis, value in (("x", load.Mx), ("y", load.My))
                if value.m != 0
            }
            written.append(LoadTerms(load.name, a, C_x=C.get("x"), C_y=C.get("y")))
            continue
        F = {
            axis: w.input(
                f"F_{axis}_{tag}", load.component(axis), f"{w.literal(load.name)} along {axis}"
            )
            for axis in "xyz"
            if load.component(axis).m != 0
        }
        e = {}
        if "z" in F:  # an offset matters only to an axial force
            for axis, value in (("x", load.ex), ("y", load.ey)):
                if value.m != 0:
                    e[axis] = w.input(
                        f"e_{axis}_{tag}", value.to(unit),
                        f"Offset of {w.literal(load.name)} in {axis}", dimension="length",
                    )  # fmt: skip
        written.append(
            LoadTerms(
                load.name,
                a,
                F_x=F.get("x"),
                F_y=F.get("y"),
                F_z=F.get("z"),
                e_x=e.get("x"),
                e_y=e.get("y"),
            )
        )
    return written
