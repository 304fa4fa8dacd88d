"""Changing an input of a member sheet builds the sheet anew.

A member sheet decides parts of itself from its inputs when it is built: which
loads the cut carries, the governing load combination (and every other
combination's utilization, named in the summary), the classification of the
section. So :meth:`Sheet.set_input` on a member sheet maps the input back onto
the arguments of :func:`~calcsheet.calcs.member.member_sheet` and builds again;
the result is the sheet a fresh build with that value gives, every step, check,
figure and summary line included. Inputs that are not the member's own (a section
property, a resistance factor, a load factor the combination search chose) are
refused with the reason.
"""

from __future__ import annotations

import dataclasses
import math
import re
from collections.abc import Callable
from typing import Any

import pint

from calcsheet.engine import Sheet
from calcsheet.errors import InputError
from calcsheet.mechanics.loads import AppliedMoment, PointLoad, applied_moment, point_load

_LOAD_INPUT = re.compile(r"^(P|theta|z|e_x|e_y|F_x|F_y|F_z|C_x|C_y|C_z)_?(\d+)$")
_SUPPORT_INPUT = re.compile(r"^z_(S\d+)$")
# Inputs of distributed load w<n>: q along an axis at its start (a) or end (b), its ends
# z_wa, z_wb and its offsets e_xw, e_yw.
_DISTRIBUTED_INPUT = re.compile(r"^(q_[xyz][ab]|z_w[ab]|e_[xy]w)(\d+)$")
# Inputs of the design basis the member calc passes to the checks, by input name.
_BASIS_FIELDS = {
    "K": "K",
    "L_b": "Lb",
    "C_b": "Cb",
    "gamma_M0": "gamma_M0",
    "gamma_M1": "gamma_M1",
    "n_lim": "deflection_ratio",
}
NOT_THE_MEMBERS = (
    "set by the member calc from the section, the specification or the combination "
    "search; change the member's own inputs (loads, length, station, F_y, design settings) "
    "or build the sheet with another section"
)


def rebuild_on_change(sheet: Sheet, build: Callable[..., Sheet], arguments: dict[str, Any]) -> None:
    """Make ``set_input`` on ``sheet`` call ``build(**arguments)`` with the change applied."""
    built = {part.name: part.value for part in sheet.inputs}
    reasons = {part.name: part.fixed for part in sheet.inputs}

    def rebuild(values: dict[str, pint.Quantity]) -> Sheet:
        changed = {name: value for name, value in values.items() if not _same(value, built[name])}
        kwargs = dict(arguments)
        loads = list(kwargs["loads"])
        for name, value in changed.items():
            if _apply_support(name, value, kwargs, values) or _apply_distributed(
                name, value, kwargs, built
            ):
                continue
            if not _apply(name, value, kwargs, loads):
                raise InputError(
                    f"input {name}",
                    f"{value:~P}",
                    "no change here: build the sheet again",
                    problem=reasons.get(name) or NOT_THE_MEMBERS,
                )
        kwargs["loads"] = loads
        return build(**kwargs)

    sheet.rebuild_with(rebuild)


def _same(a: pint.Quantity, b: pint.Quantity) -> bool:
    try:
        return math.isclose(float(a.to(b.units).m), float(b.m), rel_tol=1e-12, abs_tol=0.0)
    except pint.DimensionalityError:
        return False


def _apply(
    name: str,
    value: pint.Quantity,
    kwargs: dict[str, Any],
    loads: list[PointLoad | AppliedMoment],
) -> bool:
    """Put an input's new value into the member calc's arguments; False if it is not one."""
    design = kwargs.get("design")
    if name == "L":
        kwargs["length"] = value
    elif name == "z_s":
        kwargs["station"] = value
    elif name in ("F_y", "f_y"):
        kwargs["Fy"] = value
    elif name == "Omega":
        kwargs["Omega"] = float(value.m_as(""))
        if design is not None:
            kwargs["design"] = dataclasses.replace(design, factor_of_safety=kwargs["Omega"])
    elif name in _BASIS_FIELDS and design is not None:
        field = _BASIS_FIELDS[name]
        kwargs["design"] = dataclasses.replace(
            design, **{field: value if field == "Lb" else float(value.m_as(""))}
        )
    else:
        match = _LOAD_INPUT.match(name)
        if match is None or not 1 <= int(match.group(2)) <= len(loads):
            return False
        index = int(match.group(2)) - 1
        changed = _changed_load(loads[index], match.group(1), value)
        if changed is None:
            return False
        loads[index] = changed
    return True


def _apply_support(
    name: str, value: pint.Quantity, kwargs: dict[str, Any], values: dict[str, pint.Quantity]
) -> bool:
    """A support's position: the case's positions, or the support given one by one."""
    match = _SUPPORT_INPUT.match(name)
    supports = kwargs.get("supports")
    if match is None or supports is None:
        return False
    if isinstance(supports, str):
        count = sum(1 for key in values if _SUPPORT_INPUT.match(key))
        kwargs["support_positions"] = [values[f"z_S{number}"] for number in range(1, count + 1)]
        return True
    changed = [
        dataclasses.replace(item, z=value) if item.name == match.group(1) else item
        for item in supports
    ]
    if changed == list(supports):
        return False
    kwargs["supports"] = changed
    return True


def _apply_distributed(
    name: str, value: pint.Quantity, kwargs: dict[str, Any], built: dict[str, pint.Quantity]
) -> bool:
    """An input of a distributed load (the self-weight's are the section's: refused)."""
    match = _DISTRIBUTED_INPUT.match(name)
    spread = list(kwargs.get("distributed") or ())
    if match is None or not 1 <= int(match.group(2)) <= len(spread):
        return False
    key, index = match.group(1), int(match.group(2)) - 1
    load = spread[index]
    if key.startswith("q_"):
        axis = "xyz".index(key[2])
        at_start, at_end = list(load.q_start), list(load.q_end)
        uniform = f"q_{key[2]}b{index + 1}" not in built
        if key[3] == "a" or uniform:
            at_start[axis] = value
        if key[3] == "b" or uniform:
            at_end[axis] = value
        changed = dataclasses.replace(load, q_start=tuple(at_start), q_end=tuple(at_end))
    elif key.startswith("z_w"):
        changed = dataclasses.replace(load, **{"z_start" if key[3] == "a" else "z_end": value})
    else:
        changed = dataclasses.replace(load, **{"ex" if key[2] == "x" else "ey": value})
    spread[index] = changed
    kwargs["distributed"] = spread
    return True


def _changed_load(
    load: PointLoad | AppliedMoment, key: str, value: pint.Quantity
) -> PointLoad | AppliedMoment | None:
    if isinstance(load, AppliedMoment):
        fields = {"Mx": load.Mx, "My": load.My, "Mz": load.Mz, "z": load.z}
        target = {"C_x": "Mx", "C_y": "My", "C_z": "Mz", "z": "z"}.get(key)
        if target is None:
            return None
        fields[target] = value
        return applied_moment(load.name, **fields)
    common = {"z": load.z, "ex": load.ex, "ey": load.ey}
    target = {"z": "z", "e_x": "ex", "e_y": "ey"}.get(key)
    if target is not None:
        common[target] = value
    if load.direction is not None:
        polar = {"magnitude": load.magnitude, "angle": load.direction.angle}
        if key in ("P", "theta"):
            polar["magnitude" if key == "P" else "angle"] = value
        elif target is None:
            return None
        return point_load(
            load.name,
            **common,
            **polar,
            from_axis=load.direction.from_axis,
            toward_axis=load.direction.toward_axis,
        )
    components = {"x": load.Fx, "y": load.Fy, "z": load.Fz}
    if key.startswith("F_"):
        components[key[-1]] = value
    elif target is None:
        return None
    return point_load(
        load.name, **common, components=(components["x"], components["y"], components["z"])
    )
