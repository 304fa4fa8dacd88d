"""Which check the sheet makes, and the entries each kind of check takes.

The job file knows three kinds: a generic allowable stress (F_y over a factor of
safety), AISC 360-22 (LRFD or ASD) and EN 1993-1-1, the last two with their load
combinations. Each kind is a small panel registered in :data:`CHECK_PANELS` under
the ``check.kind`` it writes; the form offers every registered kind and shows the
chosen one's entries, so a new kind is one class and one line here (plus its
place in the job schema and the calc). The design exploration (``[explore]``)
has its own panel below the check.
"""

from __future__ import annotations

from collections.abc import Callable
from typing import Any, ClassVar

import ipywidgets as widgets

from calcsheet.job.schema import CheckSpec, ExploreSpec
from calcsheet.sections import FAMILIES
from calcsheet.widgets.fields import ChoiceField, Field, NumberField, QuantityField, TextField

NOTE_STYLE = "color:#555;font-size:0.9em"


class CheckPanel:
    """The entries of one kind of check. Subclasses set ``kind`` and ``title``."""

    kind: ClassVar[str] = ""
    title: ClassVar[str] = ""

    def __init__(self) -> None:
        self.box: widgets.Widget = widgets.VBox()

    def every_field(self) -> list[Field]:
        return list(self.fields().values())

    def fields(self) -> dict[str, Field]:
        """Entries by key path (``check.<key>``)."""
        return {}

    def fill(self, spec: CheckSpec) -> None:
        """Show the job file's values."""

    def data(self) -> dict[str, Any]:
        """The ``[check]`` table, without ``kind``."""
        return {}


class AllowableStressPanel(CheckPanel):
    """Von Mises stress at each point against F_y / Ω (a generic check, no specification)."""

    kind = "allowable stress"
    title = "allowable stress: F_y / Ω"

    def __init__(self) -> None:
        self.factor = NumberField(
            "Ω (safety factor)", CheckSpec.model_fields["factor_of_safety"].default
        )
        note = widgets.HTML(
            f'<span style="{NOTE_STYLE}">Combined (von Mises) stress at every stress point '
            "against F_y / Ω: a generic check, not a clause of a specification.</span>"
        )
        self.box = widgets.VBox([self.factor.box, note])

    def fields(self) -> dict[str, Field]:
        return {"check.factor_of_safety": self.factor}

    def fill(self, spec: CheckSpec) -> None:
        self.factor.set(spec.factor_of_safety)

    def data(self) -> dict[str, Any]:
        return {"factor_of_safety": self.factor.value}


def _number_or_none(field: NumberField) -> float | str | None:
    value = field.value
    return None if value in ("", 0, 0.0) else value


class SpecificationPanel(CheckPanel):
    """The entries shared by the specification checks: combinations, K, deflection limit."""

    combination_options: ClassVar[list[tuple[str, str | None]]] = []
    default_K: ClassVar[float] = 2.0

    def __init__(self) -> None:
        self.combinations = ChoiceField(
            "combinations", self.combination_options, self.combination_options[0][1]
        )
        # Blank: the standard's K for the support case (said on the sheet).
        self.K = NumberField(
            "K (effective length)", None, high=10.0, optional=True, placeholder="from the supports"
        )
        self.deflection = NumberField("deflection L /", 180.0, low=-1e-9, high=10000.0)
        self.extra: dict[str, Field] = {}

    def _box(self, note: str) -> widgets.Widget:
        entries = [field.box for field in self.every_field()]
        return widgets.VBox([*entries, widgets.HTML(f'<span style="{NOTE_STYLE}">{note}</span>')])

    def fields(self) -> dict[str, Field]:
        return {
            "check.combinations": self.combinations,
            "check.K": self.K,
            "check.deflection_limit": self.deflection,
            **self.extra,
        }

    def fill(self, spec: CheckSpec) -> None:
        self.combinations.set(spec.combinations)
        self.K.set(spec.K)
        self.deflection.set(spec.deflection_limit or 0)

    def data(self) -> dict[str, Any]:
        data = {
            "combinations": self.combinations.value,
            "K": self.K.value,
            "deflection_limit": _number_or_none(self.deflection),
        }
        return {key: value for key, value in data.items() if key != "K" or value is not None}


class AiscPanel(SpecificationPanel):
    """AISC 360-22, LRFD or ASD, with ASCE 7 combinations."""

    kind = "AISC 360-22"
    title = "AISC 360-22 (with ASCE 7 combinations)"
    combination_options: ClassVar[list[tuple[str, str | None]]] = [
        ("ASCE 7-22 (for the method)", None),
        ("ASCE 7-16 strength", "ASCE 7-16 strength"),
        ("ASCE 7-16 ASD", "ASCE 7-16 ASD"),
        ("none: loads as given", "none"),
    ]
    default_K = 2.1

    def __init__(self) -> None:
        super().__init__()
        self.method = ChoiceField("method", [("LRFD", "LRFD"), ("ASD", "ASD")], "LRFD")
        # Blank: defaulted on the sheet (1.0, or Eq. F1-1 on the moment diagrams of a
        # member on supports), and labelled so.
        self.Cb = NumberField(
            "C_b", None, low=0.999, high=3.0, optional=True, placeholder="defaulted"
        )
        self.extra = {"check.method": self.method, "check.Cb": self.Cb}
        self.box = self._box(
            "Clause-by-clause member strength; the governing combination is written out. "
            "K and C_b left blank are defaulted from the supports (K = 2.1 for a fixed-free "
            "member, Commentary Table C-A-7.1) and said so on the sheet. "
            "Deflection L/0 leaves the deflection check out."
        )

    def fill(self, spec: CheckSpec) -> None:
        super().fill(spec)
        self.method.set(spec.method)
        self.Cb.set(spec.Cb)

    def data(self) -> dict[str, Any]:
        data = {**super().data(), "method": self.method.value}
        if self.Cb.value is not None:
            data["Cb"] = self.Cb.value
        return data


class EurocodePanel(SpecificationPanel):
    """EN 1993-1-1 with EN 1990 combinations and editable partial factors."""

    kind = "EN 1993-1-1"
    title = "EN 1993-1-1 (with EN 1990 combinations)"
    combination_options: ClassVar[list[tuple[str, str | None]]] = [
        ("EN 1990 Eq. (6.10)", None),
        ("none: loads as given", "none"),
    ]

    def __init__(self) -> None:
        super().__init__()
        self.gamma_M0 = NumberField("γM0", 1.0, low=0.999, high=2.0)
        self.gamma_M1 = NumberField("γM1", 1.0, low=0.999, high=2.0)
        self.extra = {"check.gamma_M0": self.gamma_M0, "check.gamma_M1": self.gamma_M1}
        self.box = self._box(
            "Cross-section resistances and flexural buckling; recommended partial factors "
            "(a National Annex may change them). Load types G, Q, S, W."
        )

    def fill(self, spec: CheckSpec) -> None:
        super().fill(spec)
        # None: the national set's value (the form shows the recommended 1.0).
        self.gamma_M0.set(1.0 if spec.gamma_M0 is None else spec.gamma_M0)
        self.gamma_M1.set(1.0 if spec.gamma_M1 is None else spec.gamma_M1)

    def data(self) -> dict[str, Any]:
        return {**super().data(), "gamma_M0": self.gamma_M0.value, "gamma_M1": self.gamma_M1.value}


CHECK_PANELS: dict[str, type[CheckPanel]] = {
    panel.kind: panel for panel in (AllowableStressPanel, AiscPanel, EurocodePanel)
}


class ExplorePanel:
    """The load-direction sweep and the lightest-section search (``[explore]``)."""

    def __init__(self) -> None:
        self.sweep_load = TextField("sweep the load", placeholder="a load's name; empty: none")
        self.sweep_step = QuantityField("sweep step", "angle", "5 deg")
        families = [("none", ""), *((key, key) for key in FAMILIES)]
        self.lightest_in = ChoiceField("lightest in", families, "")
        self.box = widgets.VBox(
            [
                self.sweep_load.box,
                self.sweep_step.box,
                self.lightest_in.box,
                widgets.HTML(
                    f'<span style="{NOTE_STYLE}">The lightest-section search needs the '
                    "AISC 360-22 check.</span>"
                ),
            ]
        )

    def fields(self) -> dict[str, Field]:
        return {
            "explore.sweep_load": self.sweep_load,
            "explore.sweep_step": self.sweep_step,
            "explore.lightest_in": self.lightest_in,
        }

    def fill(self, spec: ExploreSpec) -> None:
        self.sweep_load.set(spec.sweep_load)
        self.sweep_step.set(spec.sweep_step)
        self.lightest_in.set(spec.lightest_in)

    def data(self) -> dict[str, Any]:
        return {
            "sweep_load": self.sweep_load.value,
            "sweep_step": self.sweep_step.value,
            "lightest_in": self.lightest_in.value,
        }


class CheckChooser:
    """``check.kind`` and the chosen kind's entries; every kind's panel keeps its values."""

    def __init__(self, on_change: Callable[[Any], None]) -> None:
        self.panels = {kind: make() for kind, make in CHECK_PANELS.items()}
        first = next(iter(self.panels))
        self.kind = ChoiceField(
            "check", [(panel.title, kind) for kind, panel in self.panels.items()], first
        )
        self._shown = widgets.VBox()
        self.explore = ExplorePanel()
        explore_title = widgets.HTML("<b>Design exploration</b>")
        self.box = widgets.VBox([self.kind.box, self._shown, explore_title, self.explore.box])
        self.kind.observe(self._show)
        for field in self.every_field():
            field.observe(on_change)
        self._show()

    @property
    def panel(self) -> CheckPanel:
        return self.panels[self.kind.value]

    def _show(self, _change: Any = None) -> None:
        self._shown.children = [self.panel.box]

    def every_field(self) -> list[Field]:
        return [
            self.kind,
            *(f for panel in self.panels.values() for f in panel.every_field()),
            *self.explore.fields().values(),
        ]

    def fill(self, spec: CheckSpec) -> None:
        self.kind.set(spec.kind)
        self.panel.fill(spec)

    def fields(self) -> dict[str, Field]:
        return {"check.kind": self.kind, **self.panel.fields(), **self.explore.fields()}

    def data(self) -> dict[str, Any]:
        return {"kind": self.kind.value, **self.panel.data()}

    def quantity_fields(self) -> list[QuantityField]:
        """Entries with units, converted when the unit system changes."""
        return [self.explore.sweep_step]
