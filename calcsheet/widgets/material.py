"""The material: a grade from the list fills F_y and F_u, which stay editable.

A value the user typed (or a job file gave) over the grade's is written to the
job file and wins, as the job file's rules say; a value still as the grade
filled it is left out, so the sheet cites the grade as the source of F_y.
"""

from __future__ import annotations

from collections.abc import Callable
from typing import Any

import ipywidgets as widgets

from calcsheet.job.schema import MaterialSpec
from calcsheet.materials import GRADES
from calcsheet.widgets.fields import ChoiceField, Field, QuantityField, quantity_text

NO_GRADE = ""
NO_GRADE_LABEL = "(none: give F_y below)"


class MaterialPanel:
    """``material.grade``, ``material.Fy`` and ``material.Fu``."""

    def __init__(self, on_change: Callable[[Any], None], units: Callable[[], str]) -> None:
        self._units = units
        options = [(NO_GRADE_LABEL, NO_GRADE)] + [(name, name) for name in GRADES]
        self.grade = ChoiceField("grade", options, NO_GRADE)
        self.Fy = QuantityField("F_y (yield)", "stress", placeholder="e.g. 50 ksi or 345 MPa")
        self.Fu = QuantityField(
            "F_u (tensile)", "stress", optional=True, placeholder="e.g. 65 ksi or 450 MPa"
        )
        self.source = widgets.HTML()
        # The texts the grade filled in: an entry still equal to one is the grade's value.
        self._filled: dict[str, str] = {"Fy": "", "Fu": ""}
        # A job file that gave F_y (or F_u) beside the grade keeps giving it when saved.
        self._given: dict[str, bool] = {"Fy": False, "Fu": False}
        self.box = widgets.VBox([self.grade.box, self.Fy.box, self.Fu.box, self.source])
        self.grade.observe(self._grade_chosen)
        for field in self.every_field():
            field.observe(on_change)

    def every_field(self) -> list[Field]:
        return [self.grade, self.Fy, self.Fu]

    def _grade_chosen(self, _change: Any) -> None:
        self._given = {"Fy": False, "Fu": False}
        self._prefill(self._units())

    def _prefill(self, system: str, refill: dict[str, bool] | None = None) -> None:
        """Fill the grade's values in ``system``'s unit (only the ``refill`` entries, if given)."""
        grade = GRADES.get(self.grade.value)
        for key, field in (("Fy", self.Fy), ("Fu", self.Fu)):
            if grade is None:
                self._filled[key] = ""
                continue
            text = quantity_text(getattr(grade, key), "stress", system)
            self._filled[key] = text
            if not self._given[key] and (refill is None or refill[key]):
                field.set(text)
        self.source.value = (
            f'<span style="color:#555;font-size:0.9em">{grade.source}; minimum values '
            "recalled from memory, check them against the governing standard</span>"
            if grade is not None
            else ""
        )

    def fill(self, spec: MaterialSpec, system: str) -> None:
        """Show the job file's material."""
        # The grade first: choosing it resets what was given, which is then set here.
        self.grade.set(spec.grade if spec.grade is not None else NO_GRADE)
        self._given = {"Fy": spec.Fy is not None, "Fu": spec.Fu is not None}
        self.Fy.set(spec.Fy or "")
        self.Fu.set(spec.Fu or "")
        self._prefill(system)

    def convert(self, old: str, new: str) -> None:
        """Follow a change of units: the grade's values are filled afresh, typed ones converted."""
        refill: dict[str, bool] = {}
        for key, field in (("Fy", self.Fy), ("Fu", self.Fu)):
            # The grade's value is filled afresh below, not rounded twice; a typed one
            # is converted for the eye and kept as typed for the calc.
            refill[key] = not self._given[key] and field.shown == self._filled[key]
            if not refill[key]:
                field.convert(old, new)
        self._prefill(new, refill)

    def fields(self) -> dict[str, Field]:
        return {"material.grade": self.grade, "material.Fy": self.Fy, "material.Fu": self.Fu}

    def data(self) -> dict[str, Any]:
        data: dict[str, Any] = {}
        if self.grade.value != NO_GRADE:
            data["grade"] = self.grade.value
        for key, field in (("Fy", self.Fy), ("Fu", self.Fu)):
            text = field.value
            own = self._given[key] or text != self._filled[key] or self.grade.value == NO_GRADE
            if text and own:
                data[key] = text
            elif key == "Fy" and self.grade.value == NO_GRADE:
                data[key] = text  # empty: the job check asks for it beside the box
        return data
