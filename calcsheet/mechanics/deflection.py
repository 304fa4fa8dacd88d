"""Tip deflection of the cantilever under service loads: numbers and a sheet that shows them.

The member is fixed at z = 0 and free at z = L (axes as in
:mod:`calcsheet.mechanics.loads`). Elastic, small deflections, shear deformation
neglected; the loads are the unfactored (service) loads.

Standard cantilever cases (e.g. AISC Manual Table 3-23, cantilever cases; from
memory), with a the distance of the load from the support:

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
"""

from __future__ import annotations

import math
from collections.abc import Sequence
from dataclasses import dataclass
from typing import TYPE_CHECKING

import numpy as np
import pint
import sympy as sp
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import DefinitionError, InputError
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, QuantityInput
from calcsheet.mechanics.statics import validate_loads
from calcsheet.units import Quantity, parse_quantity

if TYPE_CHECKING:  # the sheet is passed in; mechanics does not import the engine
    from calcsheet.engine import Check, Sheet
    from calcsheet.sections import Section

# The sheet cites the published table; that its cantilever cases read as below was
# checked from memory (the tests derive the same formulas by integration).
CANTILEVER_SOURCE = "AISC Steel Construction Manual, 16th ed., Table 3-23, cantilever cases"
LIMIT_SOURCE = "deflection limit as specified for this member"
# Relative size below which I_xy is round-off of a zero (a symmetric section).
_ZERO_IXY = 1e-9


def point_load_factor(a: ArrayLike, length: float) -> NDArray[np.float64]:
    """a²·(3L − a)/6 = ∫₀ᵃ (L − z)(a − z) dz: tip deflection·E·I per unit point load at a."""
    a = np.asarray(a, dtype=float)
    return a**2 * (3.0 * length - a) / 6.0


def couple_factor(a: ArrayLike, length: float) -> NDArray[np.float64]:
    """a·(2L − a)/2 = ∫₀ᵃ (L − z) dz: tip deflection·E·I per unit couple at a."""
    a = np.asarray(a, dtype=float)
    return a * (2.0 * length - a) / 2.0


def tip_deflection_numeric(
    forces: ArrayLike,
    positions: ArrayLike,
    couples: ArrayLike,
    couple_stations: ArrayLike,
    *,
    length: float,
    E: float,
    Ix: float,
    Iy: float,
    Ixy: float = 0.0,
) -> NDArray[np.float64]:
    """Tip deflections (u along x, v along y) as an array (..., 2), vectorised over cases.

    ``forces`` (..., n, 3) holds (Fx, Fy, Fz) of n point loads, ``positions``
    (n, 3) their (ex, ey, z); ``couples`` (..., m, 3) holds (Mx, My, Mz) of m
    couples at ``couple_stations`` (m,). Units must be consistent (kip, inch, ksi).
    """
    forces = np.asarray(forces, dtype=float)
    positions = np.asarray(positions, dtype=float).reshape(-1, 3)
    couples = np.asarray(couples, dtype=float)
    stations = np.asarray(couple_stations, dtype=float).reshape(-1)
    g_point = point_load_factor(positions[:, 2], length)
    g_offset = couple_factor(positions[:, 2], length)
    g_couple = couple_factor(stations, length)
    fx, fy, fz = forces[..., 0], forces[..., 1], forces[..., 2]
    # Φ = ∫₀ᴸ (L − z)·M(z) dz of the internal moments (module docstring).
    phi_x = (-fy * g_point + fz * positions[:, 1] * g_offset).sum(axis=-1)
    phi_y = (fx * g_point - fz * positions[:, 0] * g_offset).sum(axis=-1)
    if stations.size:
        phi_x = phi_x + (couples[..., 0] * g_couple).sum(axis=-1)
        phi_y = phi_y + (couples[..., 1] * g_couple).sum(axis=-1)
    D = Ix * Iy - Ixy * Ixy
    v = -(phi_x * Iy + phi_y * Ixy) / (E * D)
    u = (phi_y * Ix + phi_x * Ixy) / (E * D)
    return np.stack(np.broadcast_arrays(u, v), axis=-1)


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
    forces, positions, couples, stations = _numeric_loads(loads, length_unit)
    props = section.numeric(length_unit)
    result = tip_deflection_numeric(
        forces,
        positions,
        couples,
        stations,
        length=float(length_q.to(length_unit).m),
        E=float(modulus.to(f"N/{length_unit}**2").m),
        Ix=props.Ix,
        Iy=props.Iy,
        Ixy=props.Ixy,
    )
    u, v = (Quantity(float(value), length_unit) for value in result)
    return TipDeflection(u, v, Quantity(math.hypot(u.m, v.m), length_unit))


def _numeric_loads(
    loads: Sequence[PointLoad | AppliedMoment], length_unit: str
) -> tuple[np.ndarray, np.ndarray, np.ndarray, np.ndarray]:
    points = [load for load in loads if isinstance(load, PointLoad)]
    moments = [load for load in loads if isinstance(load, AppliedMoment)]
    forces = np.array([[load.component(axis).to("N").m for axis in "xyz"] for load in points])
    positions = np.array(
        [[load.ex.to(length_unit).m, load.ey.to(length_unit).m, load.z.to(length_unit).m]
         for load in points]
    )  # fmt: skip
    moment_unit = f"N*{length_unit}"
    couples = np.array(
        [[c.Mx.to(moment_unit).m, c.My.to(moment_unit).m, c.Mz.to(moment_unit).m] for c in moments]
    )
    stations = np.array([c.z.to(length_unit).m for c in moments])
    return (
        forces.reshape(-1, 3),
        positions.reshape(-1, 3),
        couples.reshape(-1, 3),
        stations.reshape(-1),
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
    """
    length_q, _ = validate_loads(length, loads)
    ratio = float(n)
    if not (math.isfinite(ratio) and ratio > 0):
        raise InputError("n", n, "a positive limit ratio, e.g. 180 for L/180")
    props = section.properties
    unsymmetric = abs(props["Ixy"].m) > _ZERO_IXY * math.sqrt(props["Ix"].m * props["Iy"].m)
    sheet.heading("Tip deflection (service loads)")
    sheet.text(
        "Elastic, small deflections, shear deformation neglected; loads unfactored. Standard "
        "cantilever cases (AISC Manual Table 3-23), a from the support: "
        "a point load P gives P·a²·(3L − a)/(6EI) at the tip, a couple C gives "
        "C·a·(2L − a)/(2EI). An axial force F_z at offsets e_x, e_y acts as the couples "
        "e_y·F_z about x and −e_x·F_z about y at its station. v is the deflection along +y, "
        "u along +x; a couple C_x > 0 deflects the tip toward −y."
    )
    # sympy's evaluate(False) is what the engine's as_written does (keep products in the
    # order written); mechanics comes before the engine and does not import it.
    with sp.evaluate(False):
        L = _input(sheet, "L", length_q, "Member length", dimension="length")
        E_s = _input(sheet, "E", E, "Modulus of elasticity", dimension="stress")
        I_x = _input(
            sheet, "I_x", props["Ix"], "Second moment of area about x",
            reference=section.sources.get("Ix", ""),
        )  # fmt: skip
        I_y = _input(
            sheet, "I_y", props["Iy"], "Second moment of area about y",
            reference=section.sources.get("Iy", ""),
        )  # fmt: skip
        n_lim = _input(
            sheet, "n_lim", ratio, "Deflection limit ratio, δ ≤ L/n", dimension="dimensionless",
            reference=LIMIT_SOURCE,
        )  # fmt: skip
        terms_v, terms_u = _write_loads(sheet, loads, L, length_q)
        if not terms_v and not terms_u:
            sheet.text("No load bends the member: the tip does not deflect.")
            return None
        point = CANTILEVER_SOURCE
        if unsymmetric:
            I_xy = _input(
                sheet, "I_xy", props["Ixy"], "Product of area ∫x·y dA",
                reference=section.sources.get("Ixy", ""),
            )  # fmt: skip
            sheet.text(
                "I_xy ≠ 0: the load terms are summed per plane (Φ_v for forces along y and "
                "couples about x, Φ_u for the others) and combined by the unsymmetric formulas."
            )
            # A plane without load terms drops out of both formulas (its Φ is zero).
            phi_v = sheet.step("Phi_v", sp.Add(*terms_v), "Load terms, v") if terms_v else None
            phi_u = sheet.step("Phi_u", sp.Add(*terms_u), "Load terms, u") if terms_u else None
            D = sheet.step("D_I", I_x * I_y - I_xy**2, "I_x·I_y − I_xy²")
            v_parts = [phi_v * I_y] if phi_v is not None else []
            u_parts = [phi_u * I_x] if phi_u is not None else []
            if phi_u is not None:
                v_parts.append(-phi_u * I_xy)
            if phi_v is not None:
                u_parts.append(-phi_v * I_xy)
            v = sheet.step(
                "v_tip", sp.Add(*v_parts) / (E_s * D), "Tip deflection along y", reference=point
            )
            u = sheet.step(
                "u_tip", sp.Add(*u_parts) / (E_s * D), "Tip deflection along x", reference=point
            )
            delta = sheet.step("delta_tip", sp.sqrt(u**2 + v**2), "Resultant tip deflection")
        else:
            planes = []
            if terms_v:
                planes.append(sheet.step(
                    "v_tip", sp.Add(*terms_v) / (E_s * I_x), "Tip deflection along y",
                    reference=point,
                ))  # fmt: skip
            if terms_u:
                planes.append(sheet.step(
                    "u_tip", sp.Add(*terms_u) / (E_s * I_y), "Tip deflection along x",
                    reference=point,
                ))  # fmt: skip
            if len(planes) == 2:
                delta = sheet.step(
                    "delta_tip", sp.sqrt(planes[1] ** 2 + planes[0] ** 2),
                    "Resultant tip deflection",
                )  # fmt: skip
            else:
                delta = sheet.step("delta_tip", sp.Abs(planes[0]), "Tip deflection")
        limit = sheet.step("delta_lim", L / n_lim, "Deflection limit", reference=LIMIT_SOURCE)
        return sheet.check("Tip deflection", delta, limit, reference=LIMIT_SOURCE)


def _write_loads(
    sheet: Sheet,
    loads: Sequence[PointLoad | AppliedMoment],
    L: sp.Symbol,
    length_q: pint.Quantity,
) -> tuple[list[sp.Expr], list[sp.Expr]]:
    """Inputs of each load; returns the terms E·I·v and E·I·u of a symmetric section.

    v terms: F_y·a²(3L − a)/6, −F_z·e_y·a(2L − a)/2, −C_x·a(2L − a)/2;
    u terms: F_x·a²(3L − a)/6, −F_z·e_x·a(2L − a)/2, +C_y·a(2L − a)/2 (module docstring).
    """
    terms_v: list[sp.Expr] = []
    terms_u: list[sp.Expr] = []
    unit = length_q.units
    for number, load in enumerate(loads, start=1):
        tag = f"d{number}"
        a = sheet.input(
            f"a_{tag}", load.z.to(unit), f"Distance of {load.name} from the support",
            dimension="length",
        )  # fmt: skip
        point = a**2 * (3 * L - a) / 6
        couple = a * (2 * L - a) / 2
        if isinstance(load, AppliedMoment):
            for axis, value in (("x", load.Mx), ("y", load.My)):
                if value.m != 0:
                    C = sheet.input(f"C_{axis}_{tag}", value, f"Couple of {load.name} about {axis}")
                    if axis == "x":
                        terms_v.append(-C * couple)
                    else:
                        terms_u.append(C * couple)
            continue
        F = {
            axis: sheet.input(f"F_{axis}_{tag}", load.component(axis), f"{load.name} along {axis}")
            for axis in "xyz"
            if load.component(axis).m != 0
        }
        e = {}
        if "z" in F:
            for axis, value in (("x", load.ex), ("y", load.ey)):
                if value.m != 0:
                    e[axis] = sheet.input(
                        f"e_{axis}_{tag}", value.to(unit), f"Offset of {load.name} in {axis}",
                        dimension="length",
                    )  # fmt: skip
        if "y" in F:
            terms_v.append(F["y"] * point)
        if "x" in F:
            terms_u.append(F["x"] * point)
        # An eccentric axial force bends the member like the couples e_y·F_z and −e_x·F_z.
        if "y" in e:
            terms_v.append(-F["z"] * e["y"] * couple)
        if "x" in e:
            terms_u.append(-F["z"] * e["x"] * couple)
    return terms_v, terms_u


def _input(sheet: Sheet, name: str, value: object, description: str, **options: object):
    """An input, or the sheet's own input of that name when it holds the same value.

    The member sheet already states L, I_x and I_y; repeating them would be refused
    (a name is defined once) and would let the two copies drift apart.
    """
    quantity = parse_quantity(value, field=f"input {name}", dimension=options.get("dimension"))
    try:
        existing = sheet[name]
    except KeyError:
        return sheet.input(name, quantity, description, **options)
    old = existing.value
    same = old.dimensionality == quantity.dimensionality and math.isclose(
        float(old.to(quantity.units).m), float(quantity.m), rel_tol=1e-9, abs_tol=1e-12
    )
    # Only an input is shared: a step of equal value now may change with other inputs.
    if same and getattr(existing, "expr", None) is None:
        return existing.symbol
    raise DefinitionError(
        f"tip deflection needs {name} = {quantity:~P} ({description}), but the sheet already "
        f"defines {name} = {old:~P}"
    )
