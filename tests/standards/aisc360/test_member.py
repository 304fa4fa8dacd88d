"""write_aisc_checks on a sheet, its numeric twin, and the errors a user sees."""

from __future__ import annotations

import numpy as np
import pytest

from calcsheet.engine import Sheet
from calcsheet.errors import DefinitionError, InputError
from calcsheet.sections import angle, list_designations, rectangular_hss, round_hss
from calcsheet.standards.aisc360 import (
    CHECK_TITLES,
    DemandArrays,
    Demands,
    Steel,
    aisc_checks_numeric,
    aisc_utilization_numeric,
    catalog_table,
    section_table,
    write_aisc_checks,
)
from calcsheet.standards.aisc360.member_torsion import TORSION_TITLES
from calcsheet.units import Quantity

from .support import member_sheet, section

_CHECK_KEYS = {title: key for key, title in CHECK_TITLES.items()}

# (section, method, P, Mx, My, Vx, Vy in kip and kip·ft, options): every family, both
# methods, tension and compression, each F2 zone, slender and noncompact elements.
PARITY_CASES = [
    ("W14X90", "LRFD", -300, 200, 40, 10, 30, {"length": "12 ft"}),
    ("W18X50", "ASD", 40, 150, 5, 2, 40, {"length": "20 ft", "K": 1.0, "Lb": "10 ft", "Cb": 1.3}),
    ("W30X90", "LRFD", -50, 400, 10, 5, 80, {"length": "30 ft", "K": 1.0}),
    ("W14X43", "LRFD", -150, 60, 10, 5, 20, {"length": "3 ft", "K": 1.0}),
    ("HSS12X12X1/4", "LRFD", -60, 40, 30, 10, 10, {"length": "10 ft"}),
    ("HSS20X4X1/4", "ASD", -5, 60, 2, 1, 20, {"length": "6 ft", "Lb": "40 ft"}),
    ("HSS6.625X0.280", "LRFD", -10, 8, 6, 3, 4, {"length": "5 ft"}),
    ("Pipe4STD", "ASD", 15, 3, 1, 1, 1, {"length": "8 ft"}),
    ("L4X4X1/2", "LRFD", 10, 2, 1, 1, 2, {"length": "6 ft", "Cb": 1.2}),
    ("L6X6X3/8", "ASD", -2, 4, 0, 0, 3, {"length": "4 ft", "K": 1.0}),
]


def _demand_arrays(P, Mx, My, Vx, Vy) -> DemandArrays:
    return DemandArrays.from_quantities(
        Quantity(np.array([P]), "kip"),
        Quantity(np.array([Mx]), "kip*ft"),
        Quantity(np.array([My]), "kip*ft"),
        Quantity(np.array([Vx]), "kip"),
        Quantity(np.array([Vy]), "kip"),
    )


@pytest.mark.parametrize(("name", "method", "P", "Mx", "My", "Vx", "Vy", "options"), PARITY_CASES)
def test_the_sheet_and_the_numeric_path_agree(name, method, P, Mx, My, Vx, Vy, options) -> None:
    sheet = member_sheet(name, method, P=P, Mx=Mx, My=My, Vx=Vx, Vy=Vy, **options)
    numeric = aisc_checks_numeric(
        catalog_table([name]), _demand_arrays(P, Mx, My, Vx, Vy), method=method, **options
    )
    for check in sheet.checks:
        key = _CHECK_KEYS[check.description]
        assert check.utilization == pytest.approx(float(numeric[key][0, 0]), rel=1e-9), key
        assert check.reference.startswith("AISC 360-22")
    governing = aisc_utilization_numeric(
        catalog_table([name]), _demand_arrays(P, Mx, My, Vx, Vy), method=method, **options
    )
    assert governing[0] == pytest.approx(sheet.governing_check().utilization, rel=1e-9)


def test_changing_the_length_re_evaluates_like_the_numeric_path() -> None:
    sheet = member_sheet("W14X90", "LRFD", P=-300, Mx=200, My=40, length="12 ft", K=1.0)
    sheet.set_inputs({"L": "25 ft", "L_b": "25 ft"})
    numeric = aisc_utilization_numeric(
        catalog_table(["W14X90"]),
        _demand_arrays(-300, 200, 40, 0, 0),
        method="LRFD",
        length="25 ft",
        K=1.0,
    )
    assert sheet.governing_check().utilization == pytest.approx(numeric[0], rel=1e-9)


def test_inputs_that_chose_the_equations_are_fixed() -> None:
    sheet = member_sheet("W14X90", "LRFD", length="12 ft")
    with pytest.raises(InputError, match="build the sheet again"):
        sheet.set_input("F_y", "65 ksi")
    with pytest.raises(InputError, match="build the sheet again"):
        sheet.set_input("b_f", "10 in")


def test_an_input_the_sheet_already_has_is_reused_or_refused() -> None:
    sheet = Sheet("member")
    with sheet:
        F_y = sheet.input("F_y", "50 ksi", dimension="stress")
        L = sheet.input("L", "144 in", dimension="length")
        zero = sheet.input("F_0", "0 kip")
        moment = sheet.input("M_0", "0 kip*ft")
        demands = Demands(zero, moment, moment, zero, zero)
        write_aisc_checks(sheet, section("W10X33"), demands=demands, method="LRFD", length="12 ft")
    assert [part.name for part in sheet.inputs].count("F_y") == 1
    assert sheet["F_y"].symbol == F_y and sheet["L"].symbol == L
    other = Sheet("member")
    with other:
        other.input("F_y", "36 ksi", dimension="stress")
        zero = other.input("F_0", "0 kip")
        moment = other.input("M_0", "0 kip*ft")
        with pytest.raises(DefinitionError, match="F_y"):
            write_aisc_checks(
                other,
                section("W10X33"),
                demands=Demands(zero, moment, moment, zero, zero),
                method="LRFD",
                length="12 ft",
            )


def test_every_supported_family_writes_its_checks() -> None:
    for chosen in (
        rectangular_hss("8 in", "4 in", "0.25 in"),
        round_hss("6 in", "0.25 in"),
        angle("4 in", "4 in", "0.375 in"),
    ):
        sheet = member_sheet(chosen, "LRFD", P=-5, Mx=5, My=1, length="6 ft")
        assert len(sheet.checks) >= 5
        assert sheet.checks[-1].reference.startswith("AISC 360-22 Eq. H")


@pytest.mark.parametrize(
    ("options", "field"),
    [
        ({"method": "LSD"}, "design method"),
        ({"K": 0}, "effective length factor K"),
        ({"K": -1.0}, "effective length factor K"),
        ({"length": "0 ft"}, "member length L"),
        ({"length": "12 kip"}, "member length L"),
        ({"Lb": "-1 ft"}, "unbraced length L_b"),
        ({"Cb": 0.8}, "C_b"),
        ({"Cm": 1.5}, "C_m"),
        ({"material": Steel(F_y="0 ksi")}, "material F_y"),
    ],
)
def test_bad_input_is_refused_before_anything_is_written(options, field) -> None:
    sheet = Sheet("bad")
    with sheet:
        zero = sheet.input("F_0", "0 kip")
        moment = sheet.input("M_0", "0 kip*ft")
        arguments = {"method": "LRFD", "length": "12 ft", **options}
        with pytest.raises(InputError, match=field):
            write_aisc_checks(
                sheet,
                section("W10X33"),
                demands=Demands(zero, moment, moment, zero, zero),
                **arguments,
            )
    assert len(sheet.parts) == 2


@pytest.mark.parametrize(
    ("chosen", "message"),
    [
        ("C10X15.3", "section family.*rolled I-shape"),
        ("WT6X20", "section family.*rolled I-shape"),
        ("L6X4X1/2", "equal-leg single angle"),
    ],
)
def test_a_family_the_checks_do_not_cover_is_named(chosen: str, message: str) -> None:
    with pytest.raises(InputError, match=message):
        member_sheet(chosen, "LRFD", length="10 ft")


def test_a_round_tube_beyond_f8_is_refused() -> None:
    thin = round_hss("20 in", "0.05 in")  # D/t = 400 > 0.45E/Fy = 261
    with pytest.raises(InputError, match="0.45E/Fy"):
        member_sheet(thin, "LRFD", length="10 ft")
    table = section_table([thin, round_hss("6 in", "0.25 in")])
    got = aisc_utilization_numeric(
        table, _demand_arrays(-1, 1, 0, 0, 0), method="LRFD", length="10 ft"
    )
    assert np.isinf(got[0]) and np.isfinite(got[1])


def test_catalog_table_matches_section_table() -> None:
    names = ["W14X90", "W8X31", "W44X230"]
    fast, slow = catalog_table(names), section_table([section(name) for name in names])
    assert fast.names == slow.names and fast.kind == slow.kind == "I"
    for key, values in fast.values.items():
        np.testing.assert_allclose(values, slow.values[key], rtol=1e-12)


def test_lightest_w_shape_search_shape_and_order() -> None:
    names = list_designations("W")
    table = catalog_table(names)
    demands = DemandArrays.from_quantities(
        Quantity(np.linspace(-200, 50, 8), "kip"),
        Quantity(np.linspace(-150, 150, 8), "kip*ft"),
        Quantity(np.full(8, 10.0), "kip*ft"),
        Quantity(np.full(8, 2.0), "kip"),
        Quantity(np.full(8, 20.0), "kip"),
    )
    checks = aisc_checks_numeric(table, demands, method="LRFD", length="15 ft")
    # No torque and no point stresses given: no torsion checks (Section H3).
    assert set(checks) == set(CHECK_TITLES) - {"shear"} - set(TORSION_TITLES)
    assert all(array.shape == (len(names), 8) for array in checks.values())
    governing = aisc_utilization_numeric(table, demands, method="LRFD", length="15 ft")
    assert governing.shape == (len(names),)
    weight = {name: float(name.split("X")[1]) for name in names}
    passing = [name for name, u in zip(names, governing, strict=True) if u <= 1.0]
    lightest = min(passing, key=weight.__getitem__)
    sheet = member_sheet(lightest, "LRFD", P=-200, Mx=-150, My=10, Vx=2, Vy=20, length="15 ft")
    assert sheet.governing_check().utilization <= 1.0


def test_demand_arrays_refuse_a_wrong_dimension() -> None:
    with pytest.raises(InputError, match="demand M_rx"):
        DemandArrays.from_quantities(
            Quantity(1.0, "kip"),
            Quantity(1.0, "kip"),
            Quantity(1.0, "kip*ft"),
            Quantity(1.0, "kip"),
            Quantity(1.0, "kip"),
        )
