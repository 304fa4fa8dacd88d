"""The internal-force diagrams: valid SVG, one panel per force present, peaks, scale, labels.

Check values of the beam cases: AISC Steel Construction Manual (15th ed.) Table 3-23
case 1, simple beam under a uniform load (from memory): M_max = wL²/8 at midspan,
V = w(L/2 − z).
"""

from __future__ import annotations

import itertools
import re

import numpy as np
import pytest

from calcsheet.engine.marked_text import plain_text
from calcsheet.errors import InputError
from calcsheet.figures.annotate import value_text
from calcsheet.figures.diagrams import SIGN_CONVENTION, force_diagrams, support_marks
from calcsheet.mechanics import distributed_load, member_stiffness, solve_frame, support_case
from calcsheet.units import Quantity
from tests.figures.svgtools import SVG, by_class, parse, text_boxes, texts

L = 6.0  # m
W = 10e3  # N/m


def _simple_beam(n: int = 121) -> tuple[np.ndarray, np.ndarray]:
    """Stations and forces of a simple beam under W (Table 3-23 case 1, from memory)."""
    z = np.linspace(0.0, L, n)
    forces = np.zeros((n, 6))
    forces[:, 2] = W * (L / 2 - z)  # Vy
    forces[:, 4] = -W * z * (L - z) / 2  # Mx, sagging negative (the solver's convention)
    return z, forces


def _draw(z, forces, low=None, high=None, **options):
    given = {
        "supports_m": [(0.0, "pinned"), (L, "roller")],
        "length_unit": "m",
        "force_unit": "kN",
        "moment_unit": "kN*m",
    }
    low = forces * 0.5 if low is None else low
    high = forces if high is None else high
    low, high = np.minimum(low, high), np.maximum(low, high)
    return force_diagrams(z, forces, low, high, **{**given, **options})


def _peak_labels(root) -> list[tuple[float, str, float, str]]:
    """(value, unit, station, length unit) of every peak label."""
    found = []
    for element in by_class(root, "peak-label"):
        match = re.fullmatch(r"(\S+) (\S+) at z = (\S+) (\S+)", element.text)
        assert match, element.text
        value, unit, station, length_unit = match.groups()
        found.append((float(value.replace("−", "-")), unit, float(station), length_unit))
    return found


def test_valid_svg_with_one_panel_per_force_present():
    root = parse(_draw(*_simple_beam()))
    titles = ["".join(element.itertext()) for element in by_class(root, "panel-title")]
    assert titles == ["Vy (kN)", "Mx (kN·m)"]  # N, Vx, T, My are zero: no panel
    assert len(by_class(root, "governing")) == 2
    assert len(by_class(root, "governing-area")) == 2
    assert len(by_class(root, "envelope-band")) == 2
    dashed = [e for e in root.iter(f"{SVG}polyline") if e.get("stroke-dasharray")]
    assert len(dashed) == 4  # both edges of each band


def test_labelled_peaks_equal_the_arrays_extremes_to_the_shown_precision():
    z, forces = _simple_beam()
    root = parse(_draw(z, forces))
    labels = _peak_labels(root)
    # Mx: wL²/8 = 10 kN/m × 36 m² / 8 = 45.0 kN·m sagging at midspan (Table 3-23 case 1).
    assert (-45.0, "kN·m", 3.0, "m") in labels
    # Vy: ±wL/2 = ±30.0 kN at the supports (Table 3-23 case 1).
    assert (30.0, "kN", 0.0, "m") in labels and (-30.0, "kN", 6.0, "m") in labels
    shown = {element.text for element in by_class(root, "peak-label")}
    largest = forces[:, 4].min() / 1e3
    station = z[forces[:, 4].argmin()]
    assert f"{value_text(largest)} kN·m at z = {value_text(station)} m" in shown


def test_us_units_and_station_conversion():
    z, forces = _simple_beam()
    root = parse(_draw(z, forces, length_unit="ft", force_unit="kip", moment_unit="kip*ft"))
    labels = _peak_labels(root)
    moment = Quantity(-45.0, "kN*m").to("kip*ft").m  # 33.19 kip·ft
    midspan = Quantity(3.0, "m").to("ft").m  # 9.843 ft
    (mx,) = [label for label in labels if label[1] == "kip·ft"]
    assert mx[0] == pytest.approx(moment, rel=5e-3)
    assert mx[2] == pytest.approx(midspan, rel=5e-3)
    assert mx[3] == "ft"


def test_round_off_components_are_skipped_and_all_zero_says_so():
    z, forces = _simple_beam()
    forces[:, 1] = 1e-9  # Vx: round-off against 30 kN, not a force
    forces[:, 3] = 1e-10  # T: round-off against 45 kN·m
    root = parse(_draw(z, forces))
    titles = ["".join(element.itertext()) for element in by_class(root, "panel-title")]
    assert titles == ["Vy (kN)", "Mx (kN·m)"]
    empty = parse(_draw(z, np.zeros_like(forces)))
    assert not by_class(empty, "panel-title")
    assert any("every component is zero" in text for text in texts(empty))


def test_every_panel_has_the_same_horizontal_scale():
    z, forces = _simple_beam()
    forces[:, 0] = 5e3  # N, constant
    root = parse(_draw(z, forces))
    (member,) = by_class(root, "member")
    x0, x1 = float(member.get("x1")), float(member.get("x2"))
    for line in by_class(root, "governing"):
        xs = [float(pair.split(",")[0]) for pair in line.get("points").split()]
        assert (xs[0], xs[-1]) == pytest.approx((x0, x1), abs=0.01)
        # Every point lies along the member's drawn length (straight runs are thinned to
        # their ends; a curved one keeps its midspan station halfway along).
        assert all(x0 - 0.01 <= x <= x1 + 0.01 for x in xs)
        assert len(xs) == 2 or any(x == pytest.approx((x0 + x1) / 2, abs=0.01) for x in xs)


def test_supports_and_load_stations_are_drawn():
    z, forces = _simple_beam()
    supports = support_marks(support_case("two-span", "6 m"))
    assert supports == [(0.0, "pinned"), (3.0, "roller"), (6.0, "roller")]
    root = parse(_draw(z, forces, supports_m=supports, loads_m=[(2.0, "P1"), 4.5]))
    assert len(by_class(root, "support")) == 3
    assert len(by_class(root, "load-station")) == 2
    assert "P1" in [element.text for element in by_class(root, "load-name")]
    ticks = [element.text for element in by_class(root, "station-tick")]
    assert ticks == ["0", "2.00", "3.00", "4.50", "6.00"]


def test_sign_convention_is_written_under_the_figure():
    root = parse(_draw(*_simple_beam()))
    notes = " ".join("".join(element.itertext()) for element in by_class(root, "note"))
    assert notes == plain_text(SIGN_CONVENTION).replace("_", "")  # V_x drawn as V, subscript x


@pytest.mark.parametrize("supports", [[(0.0, "fixed")], [(0.0, "pinned"), (4.5, "roller")]])
def test_no_two_texts_overlap(supports):
    z, forces = _simple_beam(241)
    forces[:, 0] = -2e4
    forces[:, 5] = 3e3 * np.sin(np.pi * z / L)  # My
    high = forces * 1.3
    root = parse(_draw(z, forces, forces * 0.2, high, supports_m=supports, loads_m=[(3.0, "P")]))
    boxes = text_boxes(root)
    for (first, a), (second, b) in itertools.combinations(boxes, 2):
        assert not a.overlaps(b), (first, second)


def test_with_the_frame_solver_and_combinations():
    # Dead 4 kN/m and live 6 kN/m on a 6 m simple span; 1.2D + 1.6L governs 1.4D.
    # Table 3-23 case 1 (from memory): M = wL²/8 = (1.2·4 + 1.6·6)·36/8 = 64.8 kN·m.
    stiffness = member_stiffness(
        E="200 GPa", G="77 GPa", A="5000 mm^2", Ix="8e7 mm^4", Iy="1e7 mm^4", J="2e5 mm^4"
    )

    def uniform(name, w):
        return distributed_load(
            name, z_start="0 m", z_end="6 m", q_start=("0 kN/m", f"{-w} kN/m", "0 kN/m")
        )

    supports = support_case("pinned-pinned", "6 m")
    result = solve_frame(
        "6 m",
        supports,
        stiffness,
        [[uniform("D", 4)], [uniform("L", 6)]],
        force_unit="N",
        length_unit="m",
    )
    z = np.linspace(0.0, L, 61)
    combined = result.internal_forces(z, [[1.2, 1.6], [1.4, 0.0]])
    svg = force_diagrams(
        z,
        combined[0],
        combined.min(axis=0),
        combined.max(axis=0),
        supports_m=support_marks(supports),
        length_unit="m",
        force_unit="kN",
        moment_unit="kN*m",
        governing_name="1.2D + 1.6L",
    )
    root = parse(svg)
    assert (-64.8, "kN·m", 3.0, "m") in _peak_labels(root)
    assert any("1.2D + 1.6L" in (element.text or "") for element in by_class(root, "legend"))


def test_names_are_escaped_and_output_is_deterministic():
    z, forces = _simple_beam()
    name = "<script>alert(1)</script> & D"
    svg = _draw(z, forces, governing_name=name, loads_m=[(1.0, name)])
    assert "<script>" not in svg
    assert svg == _draw(z, forces, governing_name=name, loads_m=[(1.0, name)])


def test_bad_arguments_name_the_field():
    z, forces = _simple_beam()
    units = {"length_unit": "m", "force_unit": "kN", "moment_unit": "kN*m"}
    with pytest.raises(InputError, match="diagram stations"):
        force_diagrams(z[::-1], forces, forces, forces, supports_m=[0.0], **units)
    with pytest.raises(InputError, match="diagram envelope_low"):
        force_diagrams(z, forces, forces[:, :4], forces, supports_m=[0.0], **units)
    with pytest.raises(InputError, match="diagram unit"):
        force_diagrams(z, forces, forces, forces, supports_m=[0.0], **{**units, "force_unit": "m"})
    with pytest.raises(InputError, match="diagram supports"):
        force_diagrams(z, forces, forces, forces, supports_m=[(0.0, "clamped")], **units)


def test_no_text_overlaps_in_random_diagrams():
    # Invented diagrams (random cubics, supports and load stations, fixed seed): the
    # layout must keep every text clear of every other whatever the shapes.
    rng = np.random.default_rng(7)
    for _ in range(30):
        length = float(rng.uniform(0.5, 30.0))
        z = np.sort(np.concatenate([[0.0, length], rng.uniform(0.0, length, 60)]))
        scales = 10 ** rng.uniform(0, 6, size=6) * (rng.random(6) < 0.6)
        shapes = [np.polyval(rng.normal(size=4), z / length) for _ in range(6)]
        governing = np.stack(shapes, axis=1) * scales
        other = governing * rng.uniform(-1.5, 1.5, size=6)
        supports = [
            (float(at), str(rng.choice(["fixed", "pinned", "roller"])))
            for at in rng.uniform(0.0, length, int(rng.integers(1, 4)))
        ]
        loads = [(float(at), f"P{i}") for i, at in enumerate(rng.uniform(0.0, length, 3))]
        svg = force_diagrams(
            z,
            governing,
            np.minimum(governing, other),
            np.maximum(governing, other),
            supports_m=supports,
            length_unit="ft",
            force_unit="kip",
            moment_unit="kip*ft",
            loads_m=loads,
            governing_name="1.2D + 1.6L + 0.5S",
        )
        boxes = text_boxes(parse(svg))
        for (first, a), (second, b) in itertools.combinations(boxes, 2):
            assert not a.overlaps(b), (first, second)
