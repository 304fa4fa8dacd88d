"""The tip deflection printed on a sheet equals the same procedure run on arrays (issue 12).

:func:`~calcsheet.mechanics.deflection.tip_deflection_procedure` is written once;
:func:`write_tip_deflection` prints it (sympy expressions evaluated with units by the
engine) and :func:`tip_deflection_arrays` evaluates it on numpy arrays in SI units.
Over 240 random cantilevers (catalog W, C, WT, HSS and single angles, user-defined
unequal-leg angles in inches and millimetres; point loads with zero and non-zero
components, eccentric axial forces, couples) both must agree to 1e-9, and so must
one array run over all cantilevers at once (a batch that mixes symmetric and
unsymmetric sections, so it takes the general I_xy formulas for all of them).
The cantilevers are invented test data.
"""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.mechanics import applied_moment, point_load
from calcsheet.mechanics.deflection import (
    LoadTerms,
    tip_deflection,
    tip_deflection_arrays,
    write_tip_deflection,
)
from calcsheet.sections import angle, catalog_section
from calcsheet.units import parse_quantity

COUNT = 240
MAX_LOADS = 4
CATALOG = [
    "W10X33", "W8X31", "W14X22", "C10X15.3", "MC12X10.6", "WT6X20", "HSS6X4X1/4",
    "L4X3X3/8", "L6X6X1/2", "L3X2X1/4", "L8X4X1/2",
]  # fmt: skip


def _maybe(rng: np.random.Generator, low: float, high: float, zero: float = 0.3) -> float:
    """A random value, exactly zero with probability ``zero``."""
    return 0.0 if rng.random() < zero else float(rng.uniform(low, high))


def _cantilever(rng: np.random.Generator) -> dict:
    if rng.random() < 0.25:  # a user-defined angle, unequal legs: I_xy != 0
        if rng.random() < 0.5:
            d, b = rng.uniform(2, 8), rng.uniform(1.5, 6)
            section = angle(f"{d:.3f} in", f"{b:.3f} in", f"{rng.uniform(0.2, 0.6):.3f} in")
        else:
            d, b = rng.uniform(50, 200), rng.uniform(40, 150)
            section = angle(f"{d:.1f} mm", f"{b:.1f} mm", f"{rng.uniform(5, 15):.1f} mm")
    else:
        section = catalog_section(CATALOG[int(rng.integers(len(CATALOG)))])
    si = rng.random() < 0.4
    unit, force, moment = ("mm", "kN", "kN*m") if si else ("in", "kip", "kip*in")
    length = float(rng.uniform(1000, 6000) if si else rng.uniform(40, 240))
    loads = []
    for number in range(int(rng.integers(1, MAX_LOADS + 1))):
        z = float(rng.uniform(0.05, 1.0) * length)
        if rng.random() < 0.7:
            values = [_maybe(rng, -2, 2) for _ in range(3)]
            if not any(values):  # a load needs a direction
                values[int(rng.integers(3))] = float(rng.uniform(0.5, 2))
            components = tuple(f"{value} {force}" for value in values)
            offset = 80 if si else 3
            ex, ey = (f"{_maybe(rng, -offset, offset)} {unit}" for _ in range(2))
            loads.append(
                point_load(f"P{number}", components=components, z=f"{z} {unit}", ex=ex, ey=ey)
            )
        else:
            size = 1 if si else 10
            values = [_maybe(rng, -size, size) for _ in range(3)]
            if not any(values):
                values[int(rng.integers(3))] = float(rng.uniform(1, size))
            Mx, My, Mz = (f"{value} {moment}" for value in values)
            loads.append(applied_moment(f"C{number}", z=f"{z} {unit}", Mx=Mx, My=My, Mz=Mz))
    return {
        "section": section,
        "loads": loads,
        "length": f"{length} {unit}",
        "E": "200000 MPa" if si else "29000 ksi",
        "n": float(rng.uniform(120, 600)),
        "units": "SI" if si else "US",
    }


def _sheet_values(case: dict) -> dict[str, float] | None:
    """u, v, δ, limit and δ/limit from the printed sheet, SI (m); None without a check."""
    sheet = Sheet("parity", units=case["units"])
    check = write_tip_deflection(
        sheet, case["section"], case["loads"], length=case["length"], E=case["E"], n=case["n"]
    )
    if check is None:
        return None
    names = {part.name for part in sheet.steps}

    def metres(name: str) -> float:
        return sheet.value(name).to("m").m if name in names else 0.0

    return {
        "u": metres("u_tip"),
        "v": metres("v_tip"),
        "total": metres("delta_tip"),
        "limit": metres("delta_lim"),
        "utilization": check.utilization,
    }


def _si_terms(load) -> LoadTerms:
    def si(value) -> float:
        return float(value.to_base_units().m)

    if hasattr(load, "Mx"):
        return LoadTerms(load.name, si(load.z), C_x=si(load.Mx), C_y=si(load.My))
    return LoadTerms(
        load.name, si(load.z), F_x=si(load.Fx), F_y=si(load.Fy), F_z=si(load.Fz),
        e_x=si(load.ex), e_y=si(load.ey),
    )  # fmt: skip


def _section_si(section) -> tuple[float, float, float]:
    props = section.properties
    return tuple(float(props[key].to("m**4").m) for key in ("Ix", "Iy", "Ixy"))


def _close(got: float, expected: float, scale: float) -> bool:
    return abs(got - expected) <= 1e-9 * max(abs(expected), scale)


@pytest.fixture(scope="module")
def cases() -> list[dict]:
    rng = np.random.default_rng(2026)
    made = [_cantilever(rng) for _ in range(COUNT)]
    assert sum(_section_si(c["section"])[2] != 0.0 for c in made) >= 40  # angles are in
    return made


@pytest.fixture(scope="module")
def printed(cases) -> list[dict[str, float] | None]:
    return [_sheet_values(case) for case in cases]


def test_each_sheet_equals_the_array_run_of_its_cantilever(cases, printed) -> None:
    checked = 0
    for number, (case, sheet) in enumerate(zip(cases, printed, strict=True)):
        Ix, Iy, Ixy = _section_si(case["section"])
        length = float(parse_quantity(case["length"], field="length").to("m").m)
        E = float(parse_quantity(case["E"], field="E").to("Pa").m)
        arrays = tip_deflection_arrays(
            [_si_terms(load) for load in case["loads"]],
            length=length, E=E, Ix=Ix, Iy=Iy, Ixy=Ixy, n=case["n"],
        )  # fmt: skip
        if sheet is None:  # no load bends the member: no check, and the arrays say 0
            assert float(arrays.total) == 0.0, number
            continue
        scale = sheet["total"]
        for key in ("u", "v", "total", "limit"):
            assert _close(sheet[key], float(getattr(arrays, key)), scale), (number, key)
        assert _close(sheet["utilization"], float(arrays.utilization), 1e-300), number
        # tip_deflection (quantities from the loads) is the same array run.
        quantities = tip_deflection(case["section"], case["loads"], length=case["length"],
                                    E=case["E"])  # fmt: skip
        assert _close(quantities.total.to("m").m, sheet["total"], scale), number
        checked += 1
    assert checked >= 200


def test_one_array_run_over_all_cantilevers_equals_the_sheets(cases, printed) -> None:
    """All cantilevers at once: loads padded with zero loads to the same count."""
    n = len(cases)
    values = {
        key: np.zeros((MAX_LOADS, n))
        for key in ("a", "F_x", "F_y", "F_z", "e_x", "e_y", "C_x", "C_y")
    }
    for j, case in enumerate(cases):
        for k, load in enumerate(case["loads"]):
            terms = _si_terms(load)
            for key in values:
                value = getattr(terms, key)
                values[key][k, j] = 0.0 if value is None else value
    loads = [
        LoadTerms(f"slot {k}", **{key: values[key][k] for key in values}) for k in range(MAX_LOADS)
    ]
    sections = np.array([_section_si(case["section"]) for case in cases])
    length = np.array([parse_quantity(case["length"], field="length").to("m").m for case in cases])
    E = np.array([parse_quantity(case["E"], field="E").to("Pa").m for case in cases])
    batch = tip_deflection_arrays(
        loads,
        length=length,
        E=E,
        Ix=sections[:, 0],
        Iy=sections[:, 1],
        Ixy=sections[:, 2],
        n=np.array([case["n"] for case in cases]),
    )
    for j, sheet in enumerate(printed):
        if sheet is None:
            assert batch.total[j] == 0.0
            continue
        for key in ("u", "v", "total", "limit", "utilization"):
            scale = sheet["total"] if key != "utilization" else 1e-300
            assert _close(sheet[key], float(getattr(batch, key)[j]), scale), (j, key)
