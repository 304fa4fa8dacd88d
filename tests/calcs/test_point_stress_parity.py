"""Parity: the printed stresses at points and the numeric ones are the same procedure.

The point stress procedure (:mod:`calcsheet.mechanics.point_stresses`) runs on a sheet
(steps with the sheet's symbols, point by point) and on arrays
(:meth:`StressModel.stresses`, every point and case at once). Both must give the same
numbers to 1e-9 (of the largest stress of the member) at every point, for random
members: random catalog and user-defined sections of every kind, random point loads
with offsets, random couples, random stations.

Most members are run on a sheet of the procedure alone (the sheet is written once per
section with the internal forces as inputs, then each member's forces are set on it,
which re-evaluates every step); a few are full member sheets. No value here is checked
against an outside source: the outside checks of the same stresses are in
tests/mechanics (sectionproperties, hand calcs).
"""

from __future__ import annotations

import zlib
from dataclasses import fields, replace

import numpy as np
import pytest

from calcsheet.calcs import member_sheet
from calcsheet.calcs.points import section_terms, write_point_inputs
from calcsheet.calcs.round_section import write_round_inputs
from calcsheet.engine import Sheet
from calcsheet.engine.procedure import SheetWriter
from calcsheet.mechanics import applied_moment, internal_forces, point_load, stress_model
from calcsheet.mechanics.formulas import product_determinant
from calcsheet.mechanics.point_stresses import (
    FORCE_NAMES,
    ForceTerms,
    point_stress_procedure,
    round_stress_procedure,
)
from calcsheet.mechanics.stresses import StressModel
from calcsheet.sections import (
    Section,
    angle,
    built_up,
    catalog_section,
    channel,
    i_shape,
    list_designations,
    plate,
    rectangular_hss,
    round_bar,
    round_hss,
    tee,
)
from calcsheet.units import Quantity
from tests.calcs.twist_rows import cantilever_rows

FAMILIES = ("W", "M", "S", "HP", "C", "MC", "L", "WT", "MT", "ST", "HSS_RECT", "HSS_ROUND", "PIPE")
CATALOG_PER_FAMILY = 3
USER_PER_KIND = 3
MEMBERS_PER_SECTION = 5
TOLERANCE = 1e-9
# The terms compared at every point: sheet step name (n the point's number) -> numeric field.
TERMS = {
    "sigma_z_{n}": "sigma",
    "tau_{n}": "tau",
    "sigma_1_{n}": "sigma_1",
    "sigma_2_{n}": "sigma_2",
    "tau_max_{n}": "tau_max",
    "sigma_vm_{n}": "von_mises",
}


def _user_sections(rng: np.random.Generator) -> list[Section]:
    """Sections of every user-defined kind with random proportions (inches)."""

    def between(low: float, high: float) -> float:
        return float(rng.uniform(low, high))

    found = []
    for index in range(USER_PER_KIND):
        d, bf = between(6, 20), between(4, 12)
        tw, tf = between(0.2, 0.6), between(0.3, 1.0)
        unequal = {"bf_bottom": f"{between(4, 14)} in", "tf_bottom": f"{between(0.3, 1.2)} in"}
        found += [
            i_shape(f"{d} in", f"{bf} in", f"{tw} in", f"{tf} in", **(unequal if index else {})),
            channel(f"{d} in", f"{bf / 2} in", f"{tw} in", f"{tf} in"),
            tee(f"{d / 2} in", f"{bf} in", f"{tw} in", f"{tf} in"),
            angle(f"{between(2, 8)} in", f"{between(2, 8)} in", f"{between(0.25, 0.75)} in"),
            rectangular_hss(
                f"{between(4, 12)} in", f"{between(3, 10)} in", f"{between(0.2, 0.5)} in"
            ),
            round_hss(f"{between(3, 12)} in", f"{between(0.15, 0.5)} in"),
            plate(f"{between(0.5, 12)} in", f"{between(0.5, 12)} in"),
            round_bar(f"{between(0.5, 4)} in"),
            _random_built_up(rng),
        ]
    return found


def _random_built_up(rng: np.random.Generator) -> Section:
    """A web plate with a flange plate on top, at a random spot, and one below (a box of
    two plates side by side when the coin says so)."""
    web_b, web_d = rng.uniform(0.3, 1.0), rng.uniform(6, 16)
    top_b, top_t = rng.uniform(4, 12), rng.uniform(0.4, 1.2)
    bottom_b, bottom_t = rng.uniform(3, 10), rng.uniform(0.4, 1.2)
    top_left = -rng.uniform(0.0, top_b - web_b)
    plates = [
        (f"{bottom_b} in", f"{bottom_t} in", f"{-rng.uniform(0, bottom_b - web_b)} in", 0),
        (f"{web_b} in", f"{web_d} in", 0, f"{bottom_t} in"),
        (f"{top_b} in", f"{top_t} in", f"{top_left} in", f"{bottom_t + web_d} in"),
    ]
    if rng.uniform() < 0.5:  # two webs apart: plates side by side between the flanges
        gap = rng.uniform(1.0, 3.0)
        plates.append((f"{web_b} in", f"{web_d} in", f"{web_b + gap} in", f"{bottom_t} in"))
        plates[0] = (f"{2 * web_b + gap} in", f"{bottom_t} in", 0, 0)
        plates[2] = (f"{2 * web_b + gap} in", f"{top_t} in", 0, f"{bottom_t + web_d} in")
    return built_up(plates)


def _sections() -> list[Section]:
    rng = np.random.default_rng(20261202)
    found = []
    for family in FAMILIES:
        names = list_designations(family)
        for index in rng.choice(len(names), CATALOG_PER_FAMILY, replace=False):
            found.append(catalog_section(names[int(index)]))
    return found + _user_sections(rng)


_PLANES = (("+z", "-y"), ("-x", "+y"), ("+z", "+x"))


def _random_member(rng: np.random.Generator, unit: str):
    """Random loads (forces with offsets, inclined forces, couples) on a random cantilever,
    and a random station with at least one load beyond it."""
    length = float(rng.uniform(20, 200))
    loads = []
    for number in range(int(rng.integers(1, 4))):
        z = f"{rng.uniform(0.3, 1.0) * length} {unit}"
        offsets = {"ex": f"{rng.normal(0, 3)} {unit}", "ey": f"{rng.normal(0, 3)} {unit}"}
        if rng.uniform() < 0.5:
            components = tuple(f"{value} kip" for value in rng.normal(0, 5, size=3))
            loads.append(point_load(f"P{number}", z=z, components=components, **offsets))
        else:
            from_axis, toward_axis = _PLANES[int(rng.integers(len(_PLANES)))]
            loads.append(
                point_load(
                    f"P{number}",
                    z=z,
                    magnitude=f"{rng.uniform(1, 10)} kip",
                    angle=f"{rng.uniform(0, 360)} deg",
                    from_axis=from_axis,
                    toward_axis=toward_axis,
                    **offsets,
                )
            )
    if rng.uniform() < 0.6:
        Mx, My, Mz = (f"{value} kip*{unit}" for value in rng.normal(0, 30, size=3))
        loads.append(
            applied_moment("C", z=f"{rng.uniform(0.3, 1.0) * length} {unit}", Mx=Mx, My=My, Mz=Mz)
        )
    nearest = min(float(load.z.to(unit).m) for load in loads)
    station = f"{rng.uniform(0.0, 0.95) * nearest} {unit}"
    return loads, f"{length} {unit}", station


def _procedure_sheet(section: Section, model: StressModel) -> Sheet:
    """The point stress procedure alone on a sheet, the internal forces as inputs."""
    unit = model.length_unit
    sheet = Sheet("Stresses at the points")
    with sheet:
        units = ("kip",) * 3 + (f"kip*{unit}",) * 3
        forces = {
            name: sheet.input(name, Quantity(1.0, force_unit), f"internal {name}")
            for name, force_unit in zip(FORCE_NAMES, units, strict=True)
        }
        props = {
            name: sheet.input(name, section.properties[key], name)
            for name, key in (("A", "A"), ("I_x", "Ix"), ("I_y", "Iy"), ("J", "J"))
        }
        if not model.symmetric:
            props["I_xy"] = sheet.input("I_xy", section.properties["Ixy"], "product of area")
            props["D"] = sheet.step(
                "D", product_determinant(props["I_x"], props["I_y"], props["I_xy"]), "D"
            )
        rule = model.torsion
        if rule.kind == "closed":
            props["t"] = sheet.input("t", Quantity(rule.thickness, unit), "wall")
            props["A_m"] = sheet.input("A_m", Quantity(rule.enclosed_area, f"{unit}**2"), "A_m")
        elif rule.kind == "open":
            props["t_max"] = sheet.input("t_max", Quantity(rule.thickness, unit), "thickest wall")
        terms = section_terms(props, rule.kind, unit)
        w = SheetWriter(sheet)
        if model.resultant is not None:
            round_stress_procedure(
                w, ForceTerms.of(forces), terms, write_round_inputs(sheet, model)
            )
        else:
            point_stress_procedure(
                w, write_point_inputs(sheet, model), ForceTerms.of(forces), terms
            )
    return sheet


def _sheet_terms(sheet: Sheet, model: StressModel, stress: str) -> dict[str, np.ndarray]:
    """The sheet's values of every compared term at every point, as numeric fields."""

    def value(name: str, default: float = 0.0) -> float:
        try:
            return float(sheet.value(name).to(stress).m)
        except KeyError:
            return default

    values = {
        field: np.array([value(step.format(n=i + 1)) for i in range(len(model.labels))])
        for step, field in TERMS.items()
    }
    points = range(1, len(model.labels) + 1)
    if model.resultant is None:
        values["tau_zy"] = np.array([value(f"tau_zy_{n}") for n in points])
        values["tau_zx"] = np.array([value(f"tau_zx_{n}") for n in points])
        common = value("tau_T", np.nan)
        values["tau_torsion"] = np.array([value(f"tau_T_{n}", common) for n in points])
    else:  # one shear for both fibres
        values["tau"] = np.full(len(model.labels), value("tau", np.nan))
        values["tau_zy"] = np.full(len(model.labels), value("tau_V"))
        values["tau_torsion"] = np.full(len(model.labels), value("tau_T"))
    return values


def _assert_same(sheet_values: dict[str, np.ndarray], numeric, where: str) -> int:
    """Every term at every point equal to 1e-9 of the largest stress; returns the points."""
    scale = max(float(np.abs(numeric.von_mises).max()), float(np.abs(numeric.sigma).max()), 1e-30)
    for field, printed in sheet_values.items():
        computed = np.asarray(getattr(numeric, field))
        assert printed.shape == computed.shape, (where, field)
        worst = float(np.abs(printed - computed).max()) / scale
        assert worst <= TOLERANCE, f"{where}: {field} differs by {worst:.2e} of the largest"
    return len(numeric.labels)


SECTIONS = _sections()


@pytest.mark.parametrize("section", SECTIONS, ids=lambda section: section.name)
def test_printed_and_numeric_point_stresses_agree(section: Section) -> None:
    model = stress_model(section, section.length_unit)
    sheet = _procedure_sheet(section, model)
    unit = model.length_unit
    stress = f"kip/{unit}**2"
    rng = np.random.default_rng(zlib.crc32(section.name.encode()))
    cases = []
    for _ in range(MEMBERS_PER_SECTION):
        loads, length, station = _random_member(rng, unit)
        cases.append(internal_forces(length, loads, station).as_array("kip", unit))
    numeric = model.stresses(np.array(cases))  # every member at once, as the searches run
    units = ("kip",) * 3 + (f"kip*{unit}",) * 3
    for index, forces in enumerate(cases):
        sheet.set_inputs(
            {
                name: Quantity(float(value), force_unit)
                for name, value, force_unit in zip(FORCE_NAMES, forces, units, strict=True)
            }
        )
        one = _row(numeric, index)
        _assert_same(_sheet_terms(sheet, model, stress), one, f"{section.name} member {index}")


def _row(numeric, index: int):
    """The stresses of one case of a many-case result."""
    return replace(
        numeric,
        **{
            item.name: getattr(numeric, item.name)[index]
            for item in fields(numeric)
            if item.name != "labels"
        },
    )


def test_the_parity_covers_at_least_200_members_of_every_kind() -> None:
    families = {section.family for section in SECTIONS}
    assert {"angle", "channel", "tee", "plate", "round bar", "built-up"} <= families
    assert {"round HSS", "rectangular HSS", "I-shape"} <= families
    assert len(SECTIONS) * MEMBERS_PER_SECTION >= 200


def test_round_sections_sampled_on_the_outline_agree_too() -> None:
    """The general procedure with the round torsion rule (τ = T·r/J at each point)."""
    rng = np.random.default_rng(11)
    for section in (round_bar("3 in"), round_hss("8 in", "0.3 in"), catalog_section("PIPE4STD")):
        model = stress_model(section, section.length_unit, by_resultant=False)
        assert model.torsion.kind == "round"
        sheet = _procedure_sheet(section, model)
        loads, length, station = _random_member(rng, model.length_unit)
        forces = internal_forces(length, loads, station).as_array("kip", model.length_unit)
        units = ("kip",) * 3 + (f"kip*{model.length_unit}",) * 3
        sheet.set_inputs(
            {n: Quantity(float(v), u) for n, v, u in zip(FORCE_NAMES, forces, units, strict=True)}
        )
        stress = f"kip/{model.length_unit}**2"
        _assert_same(_sheet_terms(sheet, model, stress), model.stresses(forces), section.name)


FULL_SHEETS = [
    catalog_section("W14x90"),
    catalog_section("L5X3X1/2"),
    catalog_section("C12x25"),
    catalog_section("WT6x20"),
    catalog_section("HSS10X6X3/8"),
    catalog_section("HSS8.625X0.322"),
    angle("5 in", "5 in", "0.375 in"),
    tee("7 in", "6 in", "0.4 in", "0.6 in"),
    plate("3 in", "10 in"),
    round_bar("2.5 in"),
    built_up([("10 in", "0.75 in", 0, 0), ("0.5 in", "12 in", "2 in", "0.75 in")]),
]


@pytest.mark.parametrize("section", FULL_SHEETS, ids=lambda section: section.name)
def test_member_sheet_prints_the_numeric_stresses(section: Section) -> None:
    """A full member sheet, random loads: its steps are the numeric path's values."""
    rng = np.random.default_rng(zlib.crc32(section.name.encode()))
    unit = section.length_unit
    loads, length, station = _random_member(rng, unit)
    sheet = member_sheet(section, loads, length=length, station=station)
    model = stress_model(section, unit)
    # T about the shear centre and the twist of an open section, as the sheet takes them.
    forces = cantilever_rows(section, loads, length, station)
    _assert_same(_sheet_terms(sheet, model, f"kip/{unit}**2"), model.stresses(forces), section.name)
    # The governing von Mises point and value are the numeric path's.
    numeric = model.stresses(forces)
    governing = sheet.value("sigma_vm_max").to(f"kip/{unit}**2").m
    assert governing == pytest.approx(float(numeric.von_mises.max()), rel=TOLERANCE)
