"""The EN 1993-1-1 member checks on arrays: many load combinations (and sections) at once.

The procedure is the sheet's own,
:func:`~calcsheet.standards.en1993.member.en1993_member_procedure`, run by an
:class:`~calcsheet.engine.procedure.ArrayWriter`: every clause is evaluated
with :meth:`Clause.numeric` in SI base units (m, N, Pa) and every decision that
depends on the values (classes, the interaction of 6.2.9, the shear reduction of
6.2.8, tension or compression) is taken per element. Demands have shape ``(m,)``;
one section gives ``(m,)`` utilizations per check, a sequence of ``n`` sections of
one kind gives ``(n, m)``.

Where the procedure leaves its scope (class 4, a web that needs a shear buckling
verification, a section Table 3.1 or 6.2 does not cover) the utilization is
infinite, so a search never picks it.
"""

from __future__ import annotations

import dataclasses
from collections.abc import Mapping, Sequence
from typing import Any

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.sections import Section
from calcsheet.standards.en1993.factors import PartialFactors, Steel
from calcsheet.standards.en1993.member import (
    DEMAND_DIMENSIONS,
    MemberData,
    demand_name,
    member_data,
    run_on_arrays,
    scope_problems,
    si_inputs,
)

_SI_UNITS = {"force": "N", "moment": "N*m"}


def en1993_checks_numeric(
    section: Section | Sequence[Section],
    demands: Mapping[str, Any],
    *,
    material: Steel | str | Mapping[str, object] = "S355",
    length: pint.Quantity | str,
    k_eff: float | tuple[float, float] = 2.0,
    gamma: PartialFactors | Mapping[str, float] | None = None,
    fabrication: str | None = None,
    net_area: pint.Quantity | str | None = None,
    interaction: str = "plastic",
    ltb_method: str | None = None,
    load_height: str | pint.Quantity = "shear centre",
    support_case: str = "cantilever",
    moment_diagram: str = "uniform",
    end_moment_ratio: float = 1.0,
    interaction_method: str = "B",
) -> dict[str, np.ndarray]:
    """The utilization of each check of :func:`write_en1993_checks`, as arrays.

    ``demands`` maps the sheet's demand names (``N_Ed``, ``M_y_Ed``, ``M_z_Ed``,
    ``V_z_Ed``, ``V_y_Ed``, ``T_Ed``; ``V_Ed`` for ``V_z_Ed``) to arrays of shape ``(m,)`` in
    N and N·m (or pint quantities); a name left out is not checked, as on the
    sheet. The options after ``interaction`` are those of lateral-torsional buckling
    and 6.3.3 (see :func:`write_en1993_checks`). Keys of the result are those of
    :data:`~calcsheet.standards.en1993.member.EN_CHECK_TITLES`. For one section
    each array has shape ``(m,)``; for a sequence of ``n`` sections of one kind and
    fabrication, ``(n, m)``. A combination that takes the section outside the checks
    (class 4, a web beyond 6.2.6(6): the sheet refuses these) gives ``inf`` in every
    check. A section the checks do not cover at all (its family, Table 3.1 or 6.2)
    raises :class:`InputError` as on the sheet, or gives ``inf`` within a sequence.
    """
    arrays = _demand_arrays(demands)
    options = {
        "material": material,
        "length": length,
        "k_eff": k_eff,
        "gamma": gamma,
        "fabrication": fabrication,
        "net_area": net_area,
        "interaction": interaction,
        "ltb_method": ltb_method,
        "load_height": load_height,
        "support_case": support_case,
        "moment_diagram": moment_diagram,
        "end_moment_ratio": end_moment_ratio,
        "interaction_method": interaction_method,
    }
    member, given, refused = _prepared(section, options)
    return en1993_checks_prepared(member, arrays, given, refused)


def en1993_checks_prepared(
    member: MemberData,
    demands: Mapping[str, np.ndarray],
    given: Mapping[str, Any],
    refused: np.ndarray,
) -> dict[str, np.ndarray]:
    """:func:`en1993_checks_numeric` on inputs already prepared: ``member`` shapes the
    procedure, ``given`` holds its inputs by name in SI base units (section values as
    ``(n, 1)`` arrays for ``n`` sections), ``refused`` marks the sections out of scope.
    ``demands`` are arrays ``(m,)`` in N and N·m under the procedure's names.
    """
    arrays = dict(demands)
    w = run_on_arrays(member, arrays, **given)
    outside = refused
    for mask, _ in scope_problems(w, member.kind):
        outside = outside | mask
    shape = np.broadcast_shapes(np.shape(refused), *(np.shape(v) for v in w.checks.values()))
    shape = np.broadcast_shapes(shape, np.shape(next(iter(arrays.values()))))
    result = {}
    for key, ratio in w.checks.items():
        ratio = np.broadcast_to(ratio, shape)
        result[key] = np.where(np.broadcast_to(outside, shape) | ~np.isfinite(ratio), np.inf, ratio)
    return result


def _demand_arrays(demands: Mapping[str, Any]) -> dict[str, np.ndarray]:
    if not demands:
        raise InputError(
            "demands", {}, "at least one design force among " + ", ".join(DEMAND_DIMENSIONS)
        )
    converted: dict[str, np.ndarray] = {}
    for key, value in demands.items():
        name = demand_name(key)
        if name in converted:
            raise InputError("demands", key, f"{name} once (V_Ed is taken as V_z_Ed)")
        unit = _SI_UNITS[DEMAND_DIMENSIONS[name]]
        try:
            number = value.to(unit).m if isinstance(value, pint.Quantity) else value
            array = np.atleast_1d(np.asarray(number, dtype=float))
        except (TypeError, ValueError, pint.DimensionalityError):
            raise InputError(
                f"demands {key}", value, f"numbers in {unit} or a {DEMAND_DIMENSIONS[name]}"
            ) from None
        if array.ndim != 1:
            raise InputError(
                f"demands {key}", f"shape {array.shape}", "one value per combination, shape (m,)"
            )
        converted[name] = array
    try:
        shaped = np.broadcast_arrays(*converted.values())
    except ValueError:
        raise InputError(
            "demands", {k: v.shape for k, v in converted.items()}, "arrays of one length"
        ) from None
    return dict(zip(converted, shaped, strict=True))


# Prepared sections by identity and options (reading a section's values and choosing its
# buckling curves costs more than the checks); the sections are held, so no id is reused.
_PREPARED: dict[tuple, tuple[object, tuple[MemberData, dict[str, Any], np.ndarray]]] = {}


def _prepared(
    section: Section | Sequence[Section], options: dict[str, Any]
) -> tuple[MemberData, dict[str, Any], np.ndarray]:
    """Member data, the inputs as SI arrays (or floats) and the sections refused."""
    single = isinstance(section, Section)
    held = section if single else tuple(section)
    key = (id(section) if single else tuple(id(item) for item in held), _hashable(options))
    kept = _PREPARED.get(key)
    if kept is not None and _same_objects(kept[0], held):
        return kept[1]
    if single:
        member = member_data(section, **options)
        prepared = (member, si_inputs(member), np.zeros((), dtype=bool))
    else:
        prepared = _many(list(held), options)
    if len(_PREPARED) >= 64:
        _PREPARED.clear()
    _PREPARED[key] = (held, prepared)
    return prepared


def _same_objects(kept: object, held: object) -> bool:
    if isinstance(kept, tuple) and isinstance(held, tuple):
        return len(kept) == len(held) and all(a is b for a, b in zip(kept, held, strict=True))
    return kept is held


def _hashable(value: Any) -> Any:
    """A key for the options: quantities by magnitude and unit, mappings sorted."""
    if isinstance(value, pint.Quantity):
        return (float(value.m), str(value.units))
    if isinstance(value, Mapping):
        return tuple(sorted((str(k), _hashable(v)) for k, v in value.items()))
    if dataclasses.is_dataclass(value) and not isinstance(value, type):
        fields = dataclasses.fields(value)
        return (type(value).__name__, *(_hashable(getattr(value, f.name)) for f in fields))
    if isinstance(value, (list, tuple)):
        return tuple(_hashable(item) for item in value)
    return value


def _many(
    sections: list[Section], options: dict[str, Any]
) -> tuple[MemberData, dict[str, np.ndarray], np.ndarray]:
    """The first usable section's member data and every section's values as ``(n, 1)`` arrays."""
    if not sections:
        raise InputError("section", [], "at least one section")
    members: list[MemberData | None] = []
    for item in sections:
        try:
            members.append(member_data(item, **options))
        except InputError:
            members.append(None)
    usable = [m for m in members if m is not None]
    if not usable:
        member_data(sections[0], **options)  # raises, naming the problem
    first = usable[0]
    for item, member in zip(sections, members, strict=True):
        if member is not None and (member.kind, member.fabrication) != (
            first.kind,
            first.fabrication,
        ):
            raise InputError(
                "section",
                item.name,
                f"sections of one kind and fabrication ({first.kind}, {first.fabrication})",
            )
    filled = [m if m is not None else first for m in members]
    inputs = [si_inputs(m) for m in filled]
    given = {name: np.array([[item[name]] for item in inputs]) for name in inputs[0]}
    refused = np.array([[m is None] for m in members], dtype=bool)
    return first, given, refused
