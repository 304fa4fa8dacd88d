"""The :class:`Section` object: a cross-section's outline, properties and stress points.

Coordinates and signs
---------------------
* The section lies in the (x, y) plane; x is horizontal (positive to the right),
  y vertical (positive up); the member axis is z, out of the page, so x, y, z form
  a right-handed set. This matches the AISC Manual: x-x is the strong axis of a W
  shape (flanges horizontal), y-y the weak axis.
* The origin is the centroid. Stress points, cut positions and outline vertices
  are measured from it.
* ``x_bar`` and ``y_bar`` locate the centroid from the left and the bottom of the
  bounding box (for an angle: from the back of the vertical leg and the back of the
  horizontal leg, as the Manual's x and y; for a channel x_bar is the Manual's x).
* ``Ixy = ∫ x·y dA`` (negative for an angle drawn with its heel at the lower left).
* ``alpha`` is the angle from +x to the major principal axis (axis 1), counter-
  clockwise positive, in (−90°, 90°]; I1 ≥ I2.
* Elastic moduli are given at each extreme fibre: ``Sx_top = Ix / c_top``, etc.;
  ``Sx`` and ``Sy`` are the smaller of the two, as the tables give for tees and
  channels.
* ``Q_x(y)`` is the first moment about the x axis of the area above a horizontal
  cut at height y, and ``b(y)`` the total width of material the cut crosses;
  ``Q_y(x)`` and ``t(x)`` are the same for a vertical cut and the area to its
  right. Both Q are ≥ 0, so τ = V·Q/(I·b) takes the sign of V. These are cuts across
  the whole section; the stress model cuts an open section through a point only
  across the stretch of material there (:meth:`Outline.chord_cut`).
* ``walls`` are the straight walls of an angle, channel or tee (mid-line and
  thickness, from the centroid), along which the stress model looks for the peak
  of the transverse shear.
"""

from __future__ import annotations

import math
import weakref
from collections.abc import Mapping
from dataclasses import dataclass, field
from types import MappingProxyType

import numpy as np
import pint
from numpy.typing import ArrayLike, NDArray

from calcsheet.sections.geometry import Outline
from calcsheet.sections.shapes import ShapeOutline, Wall
from calcsheet.units import Quantity, parse_quantity, ureg

COMPUTED = "computed from the outline (no fillets or corner rounding beyond the HSS radii)"

# Property name -> power of length, for unit conversion of the numeric view.
LENGTH_POWERS: dict[str, int] = {
    "A": 2,
    "x_bar": 1,
    "y_bar": 1,
    "c_top": 1,
    "c_bottom": 1,
    "c_left": 1,
    "c_right": 1,
    "Ix": 4,
    "Iy": 4,
    "Ixy": 4,
    "I1": 4,
    "I2": 4,
    "Sx_top": 3,
    "Sx_bottom": 3,
    "Sy_left": 3,
    "Sy_right": 3,
    "Sx": 3,
    "Sy": 3,
    "Zx": 3,
    "Zy": 3,
    "rx": 1,
    "ry": 1,
    "r_min": 1,
    "J": 4,
    "Cw": 6,
}


@dataclass(frozen=True)
class StressPoint:
    """A labelled point of the outline, measured from the centroid."""

    label: str
    x: pint.Quantity
    y: pint.Quantity


@dataclass(frozen=True, eq=False)
class SectionNumbers:
    """Plain floats in one length unit, for vectorised stress calculations.

    Every property has the unit ``length_unit`` raised to its power (A in unit²,
    Ix in unit⁴, Cw in unit⁶, ...); ``alpha`` is in radians. ``Cw`` is NaN where
    it is not available. ``point_x`` and ``point_y`` are measured from the
    centroid, in the order of ``point_labels``.
    """

    length_unit: str
    A: float
    x_bar: float
    y_bar: float
    c_top: float
    c_bottom: float
    c_left: float
    c_right: float
    Ix: float
    Iy: float
    Ixy: float
    I1: float
    I2: float
    alpha: float
    Sx_top: float
    Sx_bottom: float
    Sy_left: float
    Sy_right: float
    Sx: float
    Sy: float
    Zx: float
    Zy: float
    rx: float
    ry: float
    r_min: float
    J: float
    Cw: float
    point_labels: tuple[str, ...]
    point_x: NDArray[np.float64]
    point_y: NDArray[np.float64]
    outline: Outline = field(repr=False)
    walls: tuple[Wall, ...] = ()

    def Q_x(self, y: ArrayLike) -> NDArray[np.float64]:
        """First moment about x of the area above each horizontal cut at ``y``."""
        return self.outline.first_moment_above(y)

    def b(self, y: ArrayLike) -> NDArray[np.float64]:
        """Width of material crossed by each horizontal cut at ``y``."""
        return self.outline.cut_width(y)

    def Q_y(self, x: ArrayLike) -> NDArray[np.float64]:
        """First moment about y of the area right of each vertical cut at ``x``."""
        return self.outline.quarter_turned().first_moment_above(x)

    def t(self, x: ArrayLike) -> NDArray[np.float64]:
        """Thickness of material crossed by each vertical cut at ``x``."""
        return self.outline.quarter_turned().cut_width(x)


@dataclass(frozen=True, eq=False)
class Section:
    """A cross-section with its properties as quantities (see the module docstring).

    ``sources`` says for each property whether it was computed from the outline,
    taken from the shape tables, or approximated (J and Cw); ``tabulated`` holds
    every value the shape table gives for a catalog shape, empty otherwise.
    """

    name: str
    family: str
    dimensions: Mapping[str, pint.Quantity]
    length_unit: str
    properties: Mapping[str, pint.Quantity]
    alpha: pint.Quantity
    points: tuple[StressPoint, ...]
    sources: Mapping[str, str]
    tabulated: Mapping[str, pint.Quantity]
    outline: Outline = field(repr=False)
    walls: tuple[Wall, ...] = ()  # straight walls of an open section, from the centroid

    def __getattr__(self, name: str) -> pint.Quantity:
        # Properties read as attributes (section.Ix); dataclass fields are found first.
        properties = self.__dict__.get("properties")
        if properties is not None and name in properties:
            return properties[name]
        raise AttributeError(f"{type(self).__name__!s} has no property {name!r}")

    def __dir__(self) -> list[str]:
        return sorted(set(super().__dir__()) | set(self.properties))

    # --- shear cuts -----------------------------------------------------------------

    def _length(self, value: pint.Quantity | str, field_name: str) -> float:
        quantity = parse_quantity(value, field=field_name, dimension="length")
        return float(quantity.to(self.length_unit).magnitude)

    def Q_x(self, y: pint.Quantity | str) -> pint.Quantity:
        """First moment about x of the area above the horizontal cut at height ``y``."""
        value = self.outline.first_moment_above(self._length(y, "y"))[0]
        return Quantity(value, ureg(self.length_unit).units ** 3)

    def b(self, y: pint.Quantity | str) -> pint.Quantity:
        """Width of material crossed by the horizontal cut at height ``y``."""
        value = self.outline.cut_width(self._length(y, "y"))[0]
        return Quantity(value, self.length_unit)

    def Q_y(self, x: pint.Quantity | str) -> pint.Quantity:
        """First moment about y of the area to the right of the vertical cut at ``x``."""
        value = self.outline.quarter_turned().first_moment_above(self._length(x, "x"))[0]
        return Quantity(value, ureg(self.length_unit).units ** 3)

    def t(self, x: pint.Quantity | str) -> pint.Quantity:
        """Thickness of material crossed by the vertical cut at ``x``."""
        value = self.outline.quarter_turned().cut_width(self._length(x, "x"))[0]
        return Quantity(value, self.length_unit)

    # --- numeric view -----------------------------------------------------------------

    def numeric(self, length_unit: str | None = None) -> SectionNumbers:
        """All properties as floats in ``length_unit`` (default: the section's own unit).

        Made once per section and unit (a rebuilt sheet asked for it some eighty times,
        each a few dozen unit conversions); its arrays are read-only, as it is shared.
        """
        unit = length_unit or self.length_unit
        made = _NUMBERS.setdefault(self, {})
        if unit not in made:
            made[unit] = self._numbers_in(unit)
        return made[unit]

    def _numbers_in(self, unit: str) -> SectionNumbers:
        scale = float(Quantity(1.0, self.length_unit).to(unit).magnitude)
        values = {}
        for name, power in LENGTH_POWERS.items():
            quantity = self.properties.get(name)
            values[name] = (
                math.nan if quantity is None else float(quantity.to(f"{unit}**{power}").m)
            )
        return SectionNumbers(
            length_unit=unit,
            alpha=float(self.alpha.to("radian").magnitude),
            point_labels=tuple(point.label for point in self.points),
            point_x=_read_only(np.array([point.x.to(unit).magnitude for point in self.points])),
            point_y=_read_only(np.array([point.y.to(unit).magnitude for point in self.points])),
            outline=self.outline if scale == 1.0 else self.outline.scaled(scale),
            walls=tuple(wall.moved(0.0, 0.0, scale) for wall in self.walls),
            **values,
        )


# Each section's numeric views by length unit, held as long as the section is.
_NUMBERS: weakref.WeakKeyDictionary[Section, dict[str, SectionNumbers]] = (
    weakref.WeakKeyDictionary()
)


def _read_only(array: np.ndarray) -> np.ndarray:
    array.setflags(write=False)
    return array


def build_section(
    *,
    name: str,
    family: str,
    dimensions: Mapping[str, pint.Quantity],
    length_unit: str,
    shape: ShapeOutline,
    tabulated: Mapping[str, pint.Quantity] | None = None,
    use_tabulated: tuple[str, ...] = (),
    tabulated_source: str = "",
) -> Section:
    """Compute every property of ``shape`` and wrap it as a :class:`Section`.

    Names in ``use_tabulated`` (for example ``"Ix"``) take the table's value in
    place of the computed one; extreme-fibre moduli then use the tabulated I with
    the computed fibre distances.
    """
    whole = shape.outline.integrals()
    x_bar, y_bar = whole.first_x / whole.area, whole.first_y / whole.area
    outline = shape.outline.shifted(-x_bar, -y_bar)
    centroidal = outline.integrals()
    unit = ureg(length_unit).units
    sources: dict[str, str] = {}
    tabulated = dict(tabulated or {})
    chosen = [key for key in use_tabulated if key in tabulated]

    def plastic_modulus(key: str, turned: bool) -> float:
        # Found by bisection of the outline (a tenth of a cold build for an HSS), so not
        # when the table's value replaces it below.
        if key in chosen:
            return math.nan
        return (outline.quarter_turned() if turned else outline).plastic_modulus_about_horizontal()

    values: dict[str, float] = {
        "A": centroidal.area,
        "x_bar": x_bar,
        "y_bar": y_bar,
        "c_top": outline.y_max,
        "c_bottom": -outline.y_min,
        "c_left": -outline.x_min,
        "c_right": outline.x_max,
        "Ix": centroidal.second_yy,
        "Iy": centroidal.second_xx,
        "Ixy": centroidal.product_xy,
        "Zx": plastic_modulus("Zx", turned=False),
        "Zy": plastic_modulus("Zy", turned=True),
    }
    sources.update(dict.fromkeys(values, COMPUTED))
    if shape.torsion_constant is not None:
        values["J"] = shape.torsion_constant
    sources["J"] = shape.torsion_note
    if shape.warping_constant is not None:
        values["Cw"] = shape.warping_constant
    sources["Cw"] = shape.warping_note

    def take_tabulated() -> None:
        for key in chosen:
            power = LENGTH_POWERS[key]
            values[key] = float(tabulated[key].to(unit**power).magnitude)
            sources[key] = tabulated_source

    take_tabulated()  # tabulated A and I feed the derived values ...
    _add_derived(values, sources)
    take_tabulated()  # ... and tabulated S and r replace the derived ones
    alpha = values.pop("alpha")
    properties = {key: Quantity(value, unit ** LENGTH_POWERS[key]) for key, value in values.items()}
    points = tuple(
        StressPoint(
            point.label,
            Quantity(point.x - x_bar, length_unit),
            Quantity(point.y - y_bar, length_unit),
        )
        for point in shape.points
    )
    return Section(
        name=name,
        family=family,
        dimensions=MappingProxyType(dict(dimensions)),
        length_unit=length_unit,
        properties=MappingProxyType(properties),
        alpha=Quantity(math.degrees(alpha), "degree"),
        points=points,
        sources=MappingProxyType(sources),
        tabulated=MappingProxyType(tabulated),
        outline=outline,
        walls=tuple(wall.moved(-x_bar, -y_bar) for wall in shape.walls),
    )


def _add_derived(values: dict[str, float], sources: dict[str, str]) -> None:
    """Principal axes, elastic moduli and radii of gyration from A, Ix, Iy, Ixy."""
    ix, iy, ixy, area = values["Ix"], values["Iy"], values["Ixy"], values["A"]
    scale = max(ix, iy)
    if abs(ixy) <= 1e-12 * scale:
        ixy = values["Ixy"] = 0.0  # symmetric: keep alpha exactly 0 or 90°
    mean, radius = (ix + iy) / 2, math.hypot((ix - iy) / 2, ixy)
    values["I1"], values["I2"] = mean + radius, mean - radius
    values["alpha"] = 0.5 * math.atan2(-2.0 * ixy, ix - iy) + 0.0  # no "-0°" on a sheet
    values["Sx_top"] = ix / values["c_top"]
    values["Sx_bottom"] = ix / values["c_bottom"]
    values["Sy_left"] = iy / values["c_left"]
    values["Sy_right"] = iy / values["c_right"]
    values["Sx"] = min(values["Sx_top"], values["Sx_bottom"])
    values["Sy"] = min(values["Sy_left"], values["Sy_right"])
    values["rx"] = math.sqrt(ix / area)
    values["ry"] = math.sqrt(iy / area)
    values["r_min"] = math.sqrt(values["I2"] / area)
    derived = "derived from the section's A and I (computed or tabulated as noted)"
    for key in ("I1", "I2", "alpha", "Sx_top", "Sx_bottom", "Sy_left", "Sy_right"):
        sources.setdefault(key, derived)
    for key in ("Sx", "Sy", "rx", "ry", "r_min"):
        sources.setdefault(key, derived)
