"""The section: a shape from the catalog (family, then a designation that narrows as one
types) or a section by its dimensions, with the boxes its kind takes."""

from __future__ import annotations

from collections.abc import Callable
from typing import Any, get_args

import ipywidgets as widgets

from calcsheet.errors import InputError
from calcsheet.job.schema import SectionKind, SectionSpec
from calcsheet.pipeline.model import section_dimension_keys
from calcsheet.sections.catalog import FAMILIES, find_entry, list_designations
from calcsheet.widgets.fields import (
    ChoiceField,
    ComboField,
    Field,
    QuantityField,
    TextField,
    ToggleField,
)

CATALOG = "catalog"
CUSTOM = "custom dimensions"
KINDS: tuple[str, ...] = get_args(SectionKind)
# Every dimension key a section table may hold, in the order the boxes are shown.
DIMENSION_KEYS = tuple(key for key in SectionSpec.model_fields if key not in ("kind", "name"))
# Words beside the symbols, so nobody has to remember which of b, B, bf is which.
DIMENSION_HINTS = {
    "b": "width",
    "d": "depth",
    "D": "diameter",
    "OD": "outside diameter",
    "t": "wall or leg thickness",
    "H": "height",
    "B": "width",
    "bf": "flange width",
    "tf": "flange thickness",
    "tw": "web thickness",
    "bf_bottom": "bottom flange width (if unequal)",
    "tf_bottom": "bottom flange thickness (if unequal)",
}


def family_of(designation: str) -> str | None:
    """The catalog family of a designation ("HSS6X6X3/8" -> "HSS_RECT"), or None if unknown."""
    try:
        return find_entry(designation).family.key
    except InputError:
        return None


class SectionPicker:
    """Where the section comes from, and its entries; ``member.section`` in the job file."""

    def __init__(self, on_change: Callable[[Any], None]) -> None:
        self.source = ToggleField("section from", [CATALOG, CUSTOM], CATALOG)
        self.family = ChoiceField(
            "family", [(family.title, key) for key, family in FAMILIES.items()], "W"
        )
        self.designation = ComboField(
            "designation",
            list_designations("W"),
            placeholder="type to search, e.g. W8X31",
        )
        self.kind = ChoiceField("kind", [(kind, kind) for kind in KINDS], "rectangular HSS")
        self.name = TextField("section name", placeholder="shown on the sheet (optional)")
        self.dimensions = {
            key: QuantityField(
                key,
                "length",
                placeholder=DIMENSION_HINTS[key],
                optional=key.endswith("_bottom"),
            )
            for key in DIMENSION_KEYS
        }
        for key, field in self.dimensions.items():
            field.widget.tooltip = DIMENSION_HINTS[key]
        self._catalog_box = widgets.VBox([self.family.box, self.designation.box])
        self._dimensions_box = widgets.VBox()
        self._custom_box = widgets.VBox([self.kind.box, self.name.box, self._dimensions_box])
        self._shown = widgets.VBox()
        self.box = widgets.VBox([self.source.box, self._shown])
        self.source.observe(self._show)
        self.kind.observe(self._show)
        self.family.observe(self._family_changed)
        for field in self.every_field():
            field.observe(on_change)
        self._show()

    def every_field(self) -> list[Field]:
        return [
            self.source,
            self.family,
            self.designation,
            self.kind,
            self.name,
            *self.dimensions.values(),
        ]

    def _show(self, _change: Any = None) -> None:
        if self.source.value == CATALOG:
            self._shown.children = [self._catalog_box]
            return
        self._shown.children = [self._custom_box]
        self._dimensions_box.children = [
            self.dimensions[key].box for key in self._kind_keys(self.kind.value)
        ]

    @staticmethod
    def _kind_keys(kind: str) -> tuple[str, ...]:
        required, optional = section_dimension_keys(kind)
        return required + optional

    def _family_changed(self, _change: Any) -> None:
        options = list_designations(self.family.value)
        current = self.designation.widget.value
        self.designation.widget.options = options
        if current and family_of(current) != self.family.value:
            # A designation of another family would only show as an error: start afresh.
            self.designation.widget.value = ""

    def fill(self, section: str | SectionSpec) -> None:
        """Show the job file's section (a designation keeps the spelling it was written with)."""
        if isinstance(section, str):
            self.source.set(CATALOG)
            family = family_of(section)
            if family is not None:
                self.family.set(family)
            self.designation.set(section)
            return
        self.source.set(CUSTOM)
        self.kind.set(section.kind)
        self.name.set(section.name)
        for key, field in self.dimensions.items():
            field.set(getattr(section, key) or "")
        self._show()

    def fields(self) -> dict[str, Field]:
        """The shown entries by key path; ``member.section`` takes messages about the whole."""
        if self.source.value == CATALOG:
            return {
                "member.section.source": self.source,
                "member.section.family": self.family,
                "member.section": self.designation,
            }
        fields: dict[str, Field] = {
            "member.section.source": self.source,
            "member.section": self.kind,
            "member.section.kind": self.kind,
            "member.section.name": self.name,
        }
        for key in self._kind_keys(self.kind.value):
            fields[f"member.section.{key}"] = self.dimensions[key]
        return fields

    def quantity_fields(self) -> list[QuantityField]:
        return list(self.dimensions.values())

    def data(self) -> str | dict[str, Any]:
        """A designation, or a table of the kind's dimensions (empty optional ones left out)."""
        if self.source.value == CATALOG:
            return self.designation.value
        data: dict[str, Any] = {"kind": self.kind.value}
        if self.name.value:
            data["name"] = self.name.value
        for key in self._kind_keys(self.kind.value):
            field = self.dimensions[key]
            if field.value or not field.optional:
                data[key] = field.value
        return data
