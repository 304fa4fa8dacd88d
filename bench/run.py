"""Speed figures and ratios against the targets (``make bench``). Not a test: it prints.

Targets (from the issues):
- re-evaluate and re-print a 40-step sheet after one input change: under 20 ms.
- the Jupyter form: one widget change to a refreshed preview: under 100 ms.
- stresses at all points of a section for 1,000 load cases: under 50 ms.
- the demo sheet's PDF, warm: under 150 ms; the cold command: under 2.5 s, and at most
  4 times a bare Typst compile of the same markup in a fresh process (issue 17).
- the lightest W shape under 8 combinations (numeric path): under 0.5 s.
- EN 1993-1-1: all checks x all EN 1990 combinations of one member (numeric path): 5 ms.
- the lightest passing IPE and HEB under all EN 1990 combinations, first call: 0.3 s.
- a batch of 200 members to PDF: under 20 s (issue 17).
- a member on supports: internal forces at 200 stations x 20 combinations: 10 ms.
- torsion stresses at all points x 200 stations x 20 combinations: under 20 ms.
"""

from __future__ import annotations

import os
import statistics
import subprocess
import sys
import tempfile
import time
from collections.abc import Callable
from pathlib import Path

from calcsheet.engine import Sheet
from calcsheet.engine.functions import cos, sin, sqrt

TARGETS = ("latex", "mathml", "typst")


def forty_step_sheet() -> Sheet:
    """A 40-step chain with fractions, powers, roots and trigonometry."""
    sheet = Sheet("bench")
    with sheet:
        P = sheet.input("P", "6.5 kip", "Load", dimension="force")
        theta = sheet.input("theta", "30 deg", "Angle", dimension="angle")
        A = sheet.input("A", "7.58 in^2", "Area", dimension="area")
        I = sheet.input("I_x", "39.5 in^4", "Inertia", dimension="moment of inertia")
        c = sheet.input("c", "3 in", "Fibre", dimension="length")
        e = sheet.input("e", "2 in", "Offset", dimension="length")
        force = P * cos(theta)
        for index in range(0, 40, 4):
            stress = sheet.step(
                f"s_{index}", force * e * c / I + P * sin(theta) / A, "Stress", unit="ksi"
            )
            root = sheet.step(f"s_{index + 1}", sqrt(stress**2 + (P / A) ** 2), "Root", unit="ksi")
            total = sheet.step(f"s_{index + 2}", stress / 2 + root - P / A, "Sum", unit="ksi")
            force = sheet.step(
                f"s_{index + 3}", total * A - P * cos(theta) / 2, "Force", unit="kip"
            )
    return sheet


def timed(action: Callable[[], object], repeat: int) -> float:
    """Median wall time of ``action`` in milliseconds."""
    samples = []
    for _ in range(repeat):
        start = time.perf_counter()
        action()
        samples.append((time.perf_counter() - start) * 1000)
    return statistics.median(samples)


def print_all(sheet: Sheet) -> None:
    for target in TARGETS:
        for step in sheet.steps:
            sheet.equation(step, target).chain()


def report(name: str, measured_ms: float, target_ms: float | None = None) -> None:
    if target_ms is None:
        print(f"{name:<58} {measured_ms:9.2f} ms")
    else:
        ratio = measured_ms / target_ms
        verdict = "meets" if ratio <= 1 else "MISSES"
        print(
            f"{name:<58} {measured_ms:9.2f} ms  target {target_ms:7.1f} ms  "
            f"ratio {ratio:5.2f}  {verdict}"
        )


def main() -> None:
    print("calcsheet benchmark (median wall time)")
    bench_lightest_section()  # first: its first call includes compiling the clauses
    bench_en1993_member()
    bench_en_lightest()
    report("engine: build a 40-step sheet", timed(forty_step_sheet, 5))
    sheet = forty_step_sheet()
    first_print = timed(lambda: print_all(forty_step_sheet()), 3)
    report("engine: build + first print of 40 steps to 3 targets", first_print)
    print_all(sheet)
    loads = iter(f"{6.5 + 0.01 * i} kip" for i in range(10_000))

    def change_and_reprint() -> None:
        sheet.set_input("P", next(loads))
        print_all(sheet)

    report(
        "engine: one input change, re-evaluate + re-print 3 targets",
        timed(change_and_reprint, 30),
        20,
    )
    report(
        "engine: one input change, re-evaluate only",
        timed(lambda: sheet.set_input("P", next(loads)), 30),
    )

    import numpy as np

    from calcsheet.mechanics import stress_model
    from calcsheet.sections import catalog_section

    model = stress_model(catalog_section("W10x33"))
    cases = np.random.default_rng(7).normal(size=(1000, 6)) * 10
    model.stresses(cases)
    report(
        "mechanics: stresses at all points, 1,000 load cases (W10x33)",
        timed(lambda: model.stresses(cases).governing_index("von Mises"), 20),
        50,
    )

    from calcsheet.demo import outrigger_sheet
    from calcsheet.export.files import pdf_bytes
    from calcsheet.render.html import render_html

    demo = outrigger_sheet()
    render_html(demo)
    pdf_bytes(demo)
    report("document: demo sheet to HTML, warm", timed(lambda: render_html(demo), 10))
    magnitudes = iter(f"{2.0 + 0.01 * n:.2f} kip" for n in range(1000))

    def changed_pdf() -> bytes:
        # A new value each time: Typst's caches must not see the same document twice.
        demo.set_input("P_1", next(magnitudes))
        return pdf_bytes(demo)

    report("document: demo sheet to PDF, warm (an input changed)", timed(changed_pdf, 5), 150)
    bench_cold_ratio()
    cold_column = cold_build("examples/column-bracket.toml")
    report("document: cold command, column on supports (frame, scan, diagrams)", cold_column, 2500)
    bench_frame_forces()
    bench_torsion_stresses()
    bench_form()
    bench_batch()
    from form_browser import bench_form_browser  # bench/ is this script's folder

    bench_form_browser()  # a real JupyterLab and chromium; skipped, saying why, without them


def _installed_environment() -> dict[str, str]:
    """The environment of a user's shell: Python writes and reads its bytecode caches.

    Some machines (this one's CI, for one) set PYTHONDONTWRITEBYTECODE, which makes every
    run compile calcsheet's modules from source; an installed package never does that.
    """
    return {name: value for name, value in os.environ.items() if name != "PYTHONDONTWRITEBYTECODE"}


def cold_build(job: str, repeat: int = 5, *, first_run: bool = True) -> float:
    """Median ms of ``calcsheet build`` of ``job`` in a fresh process, into a fresh folder
    (files issued by an earlier version are never replaced silently).

    One unmeasured run first (unless ``first_run`` is False: made already), as after an
    install: Python's bytecode and the compiled templates are written once per machine.
    """
    out = Path(tempfile.mkdtemp(prefix="calcsheet-bench-"))
    command = [sys.executable, "-m", "calcsheet.cli", "build", job, "--out", str(out)]
    env = _installed_environment()
    if first_run:
        subprocess.run(command, check=True, capture_output=True, env=env)
    return timed(lambda: subprocess.run(command, check=True, capture_output=True, env=env), repeat)


def bench_cold_ratio() -> float:
    """The cold command against a bare Typst compile of the same markup, each in a fresh
    process, measured side by side: one of each in turn, 7 times (issue 17: at most 4
    times). Returns the cold command's median (ms)."""
    from calcsheet.job import read_job
    from calcsheet.pipeline.run import build_sheets
    from calcsheet.render.typst import render_typst

    job = read_job("examples/outrigger.toml")
    markup = render_typst(build_sheets(job).sheets[0].sheet, paper="letter")
    folder = Path(tempfile.mkdtemp(prefix="calcsheet-bench-typst-"))
    (folder / "demo.typ").write_text(markup, encoding="utf-8")
    script = "import typst; typst.compile('demo.typ', output='demo.pdf', pdf_standards=['a-2b'])"
    env = _installed_environment()
    colds, bares = [], []
    cold_build("examples/outrigger.toml", repeat=1)
    for _ in range(7):
        colds.append(cold_build("examples/outrigger.toml", repeat=1, first_run=False))
        bares.append(
            timed(
                lambda: subprocess.run(
                    [sys.executable, "-c", script],
                    cwd=folder,
                    check=True,
                    capture_output=True,
                    env=env,
                ),
                1,
            )
        )
    cold, bare = statistics.median(colds), statistics.median(bares)
    report("document: cold command, start to PDF and HTML on disk", cold, 2500)
    report("document: bare Typst compile of the demo's markup, fresh process", bare)
    ratio = cold / bare
    verdict = "meets" if ratio <= 4 else "MISSES"
    print(
        f"{'document: cold command / bare Typst compile':<58} {ratio:9.2f} x   "
        f"target 4 x  {verdict}"
    )
    return cold


def bench_torsion_stresses() -> None:
    """St Venant shear, warping shear and warping normal stress at every stress point of a
    W10X49 cantilever (warping fixed at the base), 200 stations, 20 combinations of a tip
    torque and a uniform torque: combine the unit twists, evaluate them, multiply out.
    Target: 20 ms."""
    import numpy as np

    from calcsheet.mechanics import (
        FIXED,
        FREE,
        ConcentratedTorque,
        DistributedTorque,
        stress_model,
        torsion_stresses,
        unit_twists,
    )  # fmt: skip
    from calcsheet.sections import catalog_section, warping_properties

    section = catalog_section("W10X49")
    model = stress_model(section)
    points = warping_properties(section).at_points(model.x, model.y)
    E, G = 29_000.0, 11_200.0
    loads = [ConcentratedTorque(10.0, 120.0), DistributedTorque(0.05)]
    units = unit_twists(120.0, G * section.J.m, E * section.Cw.m, FIXED, FREE, loads)
    factors = np.random.default_rng(5).uniform(0.9, 1.6, size=(20, 2))
    stations = np.linspace(0.0, 120.0, 200)

    def evaluate() -> object:
        return torsion_stresses(units.combined(factors).derivatives(stations), points, E, G)

    evaluate()
    report(
        f"mechanics: torsion stresses, {len(points.Wn)} points x 200 stations x 20 combinations",
        timed(evaluate, 20),
        20,
    )


def bench_form() -> None:
    """The Jupyter form: one entry changed -> job checked, built, key results and sheet HTML.

    In-process and without the debounce pause (``refresh()`` runs what the timer would);
    the time to send the HTML to a browser is not included. Target: 100 ms.
    """
    from calcsheet.widgets import MemberForm

    form = MemberForm.from_job_file("examples/outrigger.toml", debounce=None)
    magnitudes = iter(f"{2.0 + 0.01 * n:.2f} kip" for n in range(1000))

    def change_and_refresh() -> None:
        form.set_value("loads[0].magnitude", next(magnitudes))
        form.refresh()
        assert not form.errors, form.errors  # a failed build would time the wrong thing

    change_and_refresh()
    report("form: one widget change -> refreshed preview", timed(change_and_refresh, 20), 100)


def _all_combination_demands():
    """Forces at the support of a cantilever under every ASCE 7-22 strength combination of
    five load types (D, L, Lr, S, W, each variable load acting or not): invented loads."""
    import numpy as np

    from calcsheet.calcs.design import forces_by_type
    from calcsheet.mechanics import point_load
    from calcsheet.standards.aisc360 import DemandArrays
    from calcsheet.standards.combinations import combinations, combine_numeric
    from calcsheet.units import Quantity

    loads = [
        point_load("dead", magnitude="4 kip", angle="90 deg", z="120 in", ey="-5 in"),
        point_load("live", magnitude="6 kip", angle="60 deg", z="100 in", ex="2 in"),
        point_load("roof", magnitude="2 kip", angle="90 deg", z="120 in"),
        point_load("snow", magnitude="3 kip", angle="90 deg", z="110 in"),
        point_load("wind", components=("1.5 kip", "0 kip", "0 kip"), z="120 in"),
    ]
    types = ["D", "L", "Lr", "S", "W"]
    present, by_type = forces_by_type(loads, types, Quantity(120, "in"), Quantity(0, "in"))
    combos = combinations("ASCE 7-22 strength", present)
    forces = combine_numeric(by_type, combos, present)
    demands = DemandArrays(
        P_r=forces[:, 0], M_rx=forces[:, 4], M_ry=forces[:, 5], V_rx=forces[:, 1],
        V_ry=forces[:, 2],
    )  # fmt: skip
    return demands, len(combos), np


def bench_one_member_all_combinations() -> None:
    """All AISC 360-22 checks x all combinations of one member, numeric path (the sheet's own
    procedure through the array writer). Target: 5 ms."""
    from calcsheet.standards.aisc360 import aisc_checks_numeric
    from calcsheet.standards.aisc360.section_data import catalog_table

    demands, count, _ = _all_combination_demands()
    table = catalog_table(["W10X33"])

    def evaluate() -> object:
        return aisc_checks_numeric(table, demands, method="LRFD", length="10 ft", K=2.1)

    evaluate()
    report(
        f"design: all AISC checks x {count} combinations, one member (warm)",
        timed(evaluate, 20),
        5,
    )


def bench_lightest_section() -> None:
    """Every W shape of the catalog under every combination of five load types, AISC 360-22
    LRFD, numeric path.

    The first call in a process includes turning the clauses into numpy functions.
    Target: 300 ms.
    """
    import numpy as np

    from calcsheet.sections import list_designations
    from calcsheet.standards.aisc360 import aisc_utilization_numeric
    from calcsheet.standards.aisc360.section_data import catalog_table

    names = list_designations("W", lightest_first=True)
    demands, combos, _ = _all_combination_demands()

    def search() -> str:
        table = catalog_table(names)
        worst = aisc_utilization_numeric(
            table, demands, method="LRFD", length="15 ft", K=1.0, Lb="15 ft"
        )
        passing = np.flatnonzero(worst <= 1.0)
        return names[int(passing[0])] if passing.size else ""

    first = timed(search, 1)
    report(
        f"design: lightest of {len(names)} W shapes x {combos} combinations, first call",
        first,
        300,
    )
    report("design: the same search, warm", timed(search, 5), 300)
    bench_one_member_all_combinations()


def bench_en1993_member() -> None:
    """A W10X33 post under G, Q and W: every EN 1990 combination, every EN 1993-1-1 check.

    The numeric path of the member sheet (the forces of each load type at the station
    are known): factor them into the combinations, run the checks on the arrays.
    Target: 5 ms.
    """
    import numpy as np

    from calcsheet.sections import catalog_section
    from calcsheet.standards.combinations import combinations, combine_numeric
    from calcsheet.standards.en1993 import en1993_checks_numeric, steel

    section = catalog_section("W10X33")
    types = ["G", "Q", "W"]
    # Internal forces (N, Vx, Vy, T, Mx, My) of each load type at the base, N and N·m.
    by_type = np.array(
        [
            [-40e3, 0.0, 2e3, 0.0, 8e3, 0.0],
            [-120e3, 0.0, 5e3, 0.0, 20e3, 1e3],
            [0.0, 6e3, 0.0, 0.0, 0.0, 18e3],
        ]
    )
    combos = combinations("EN 1990", types)
    material = steel("S355", f_y="345 MPa")

    def all_checks() -> dict:
        forces = combine_numeric(by_type, combos, types)
        demands = {
            "N_Ed": forces[:, 0], "M_y_Ed": forces[:, 4], "M_z_Ed": forces[:, 5],
            "V_z_Ed": forces[:, 2], "V_y_Ed": forces[:, 1],
        }  # fmt: skip
        return en1993_checks_numeric(section, demands, material=material, length="3 m")

    all_checks()  # compiles the clauses and reads the section once
    checks = all_checks()
    report(
        f"EN 1993-1-1: {len(checks)} checks x {len(combos)} combinations of one member, numeric",
        timed(all_checks, 50),
        5,
    )


def bench_en_lightest() -> None:
    """The lightest passing IPE and the lightest passing HEB of a 2 m cantilever bracket
    under G, Q and W (every EN 1990 Eq. 6.10 combination), every EN 1993-1-1 check and
    the tip deflection: the member sheet's search (:func:`lightest_section`), its
    sections' values from the family tables. Invented loads. Target: 300 ms, first call
    (the families' tables are made then)."""
    import dataclasses

    from calcsheet.calcs.design import DesignBasis, lightest_section, plan_combinations
    from calcsheet.mechanics import point_load
    from calcsheet.sections import catalog_section
    from calcsheet.units import Quantity

    loads = [
        point_load("self", magnitude="6 kN", angle="90 deg", z="2 m", ey="-100 mm"),
        point_load("hoist", magnitude="15 kN", angle="80 deg", z="1.8 m"),
        point_load("wind", components=("2 kN", "0 kN", "0 kN"), z="2 m"),
    ]
    types = ["G", "Q", "W"]
    length, station, Fy = Quantity(2, "m"), Quantity(0, "m"), Quantity(355, "MPa")
    basis = DesignBasis(kind="EN 1993-1-1", grade="S355", deflection_ratio=200)
    plan = plan_combinations(catalog_section("IPE 300"), loads, types, length, station, basis, Fy)
    assert plan is not None

    def search() -> str:
        found = []
        for family in ("IPE", "HEB"):
            chosen, _ = lightest_section(
                plan, dataclasses.replace(basis, lightest_in=family), Fy, length, loads
            )
            found.append(chosen.name if chosen else "none")
        return ", ".join(found)

    start = time.perf_counter()
    found = search()
    first = (time.perf_counter() - start) * 1000
    report(f"design: lightest passing IPE and HEB, {len(plan.combos)} EN combos, first", first, 300)
    report(f"design: the same EN search, warm ({found})", timed(search, 5), 300)


def bench_frame_forces() -> None:
    """Internal forces of a two-span member at 200 stations under 20 combinations.

    Six load cases (self-weight, a line load, a partial linearly varying load and
    three offset point loads) solved once; the timing is the combination by factors
    and the statics at the stations, as a search along the member repeats it.
    Target: 10 ms.
    """
    import numpy as np

    from calcsheet.mechanics import (
        distributed_load,
        member_stiffness,
        point_load,
        self_weight,
        solve_frame,
        support_case,
    )

    length = "360 in"
    stiffness = member_stiffness(
        E="29000 ksi", G="11200 ksi", A="9.71 in^2", Ix="170 in^4", Iy="36.6 in^4", J="0.583 in^4"
    )
    cases = [
        [self_weight("0.0275 kip/ft", length)],
        [distributed_load("L", z_start="0 in", z_end=length,
                          q_start=("0 kip/in", "-0.05 kip/in", "0 kip/in"), ey="5 in")],
        [distributed_load("W", z_start="60 in", z_end="300 in",
                          q_start=("0.01 kip/in", "0 kip/in", "0 kip/in"),
                          q_end=("0.03 kip/in", "0 kip/in", "0 kip/in"))],
        [point_load("P1", magnitude="6 kip", angle="30 deg", z="90 in", ey="-5 in")],
        [point_load("P2", magnitude="4 kip", angle="60 deg", from_axis="+x", z="250 in",
                    ex="2 in")],
        [point_load("P3", components=("0 kip", "-3 kip", "1 kip"), z="330 in", ey="-5 in")],
    ]  # fmt: skip
    result = solve_frame(length, support_case("two-span", length), stiffness, cases)
    factors = np.random.default_rng(3).uniform(0.0, 1.6, size=(20, len(cases)))
    stations = np.linspace(0.0, 360.0, 200)
    result.internal_forces(stations, factors)
    report(
        "mechanics: member on supports, forces at 200 stations x 20 combinations",
        timed(lambda: result.internal_forces(stations, factors), 50),
        10,
    )
    supports = support_case("two-span", length)
    report(
        "mechanics: member on supports, solve 6 load cases",
        timed(lambda: solve_frame(length, supports, stiffness, cases), 20),
    )
    report(
        "mechanics: member on supports, largest |Mx| of 20 combinations",
        timed(lambda: result.critical_station("Mx", factors), 20),
    )


def bench_batch() -> None:
    """200 members (the starter job, sections and loads varied) to PDF, HTML and JSON.

    Runs ``calcsheet batch`` as a user would, in worker processes. Target: 20 s (issue 17).
    """
    import tempfile
    import tomllib

    from calcsheet.job.starter import STARTER

    sections = ["W8X31", "W8X24", "W10X33", "W12X26", "HSS6X6X3/8", "HSS8X4X1/2"]
    with tempfile.TemporaryDirectory() as folder:
        base = Path(folder) / "base.toml"
        base.write_text(STARTER, encoding="utf-8")
        tomllib.loads(STARTER)  # the base must be valid before timing
        # Each member's sheet carries its own title and calc number (batch refuses copies).
        rows = ["member.name,member.section,loads[0].magnitude,sheet.title,title_block.calc_number"]
        rows += [
            f"M{n},{sections[n % len(sections)]},{1 + n % 7} kip,Arm M{n},C-{n:03d}"
            for n in range(200)
        ]
        table = Path(folder) / "members.csv"
        table.write_text("\n".join(rows) + "\n", encoding="utf-8")
        command = [
            sys.executable, "-m", "calcsheet.cli", "batch", str(table),
            "--base", str(base), "--out", str(Path(folder) / "out"),
        ]  # fmt: skip
        start = time.perf_counter()
        subprocess.run(command, check=True, capture_output=True, env=_installed_environment())
        elapsed = (time.perf_counter() - start) * 1000
    report("batch: 200 members to PDF, HTML and JSON (2 processes)", elapsed, 20_000)


if __name__ == "__main__":
    main()
