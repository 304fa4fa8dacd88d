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
from calcsheet.standards.national import NATIONAL_SETS, RECOMMENDED
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


# Where the load acts on the section, for lateral-torsional buckling (AISC cantilevers and
# EN 1993-1-1 M_cr); "default" leaves the key out, so the standard's default holds.
LOAD_HEIGHT_OPTIONS: list[tuple[str, str | None]] = [
    ("default (shear centre)", None),
    ("top flange", "top flange"),
    ("shear centre", "shear centre"),
    ("bottom flange", "bottom flange"),
]


def _given(data: dict[str, Any]) -> dict[str, Any]:
    """The entries given; a blank (None) leaves the key out of the job file."""
    return {key: value for key, value in data.items() if value is not None}


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
        self.load_height = ChoiceField("load height", LOAD_HEIGHT_OPTIONS, None)
        self.tip_restraint = ChoiceField(
            "tip restraint",
            [
                ("default (free)", None),
                ("free", "free"),
                ("laterally braced", "laterally braced"),
                ("torsionally restrained", "torsionally restrained"),
            ],
            None,
        )
        self.extra = {
            "check.method": self.method,
            "check.Cb": self.Cb,
            "check.load_height": self.load_height,
            "check.tip_restraint": self.tip_restraint,
        }
        self.box = self._box(
            "Clause-by-clause member strength; the governing combination is written out. "
            "K and C_b left blank are defaulted from the supports (K = 2.1 for a fixed-free "
            "member, Commentary Table C-A-7.1) and said so on the sheet. Load height and tip "
            "restraint set the unbraced length of a cantilever I-shape. "
            "Deflection L/0 leaves the deflection check out."
        )

    def fill(self, spec: CheckSpec) -> None:
        super().fill(spec)
        self.method.set(spec.method)
        self.Cb.set(spec.Cb)
        self.load_height.set(spec.load_height)
        self.tip_restraint.set(spec.tip_restraint)

    def data(self) -> dict[str, Any]:
        data = {**super().data(), "method": self.method.value, "Cb": self.Cb.value}
        data["load_height"] = self.load_height.value
        data["tip_restraint"] = self.tip_restraint.value
        return _given(data)


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
        self.national_annex = ChoiceField(
            "national choices", [(name, name) for name in NATIONAL_SETS], RECOMMENDED
        )
        # Blank: the national set's value (the sheet's design basis lists it).
        self.gammas = {
            name: NumberField(
                label, None, low=0.799, high=2.0, optional=True, placeholder="the set's value"
            )
            for name, label in (("gamma_M0", "γM0"), ("gamma_M1", "γM1"), ("gamma_M2", "γM2"))
        }
        self.ltb_method = ChoiceField(
            "LTB (6.3.2)",
            [
                ("by the section (6.3.2.3 rolled, else 6.3.2.2)", None),
                ("6.3.2.2 general case", "6.3.2.2"),
                ("6.3.2.3 rolled or equivalent welded", "6.3.2.3"),
            ],
            None,
        )
        self.interaction_method = ChoiceField(
            "interaction (6.3.3)", [("Annex B k factors", "B"), ("Annex A k factors", "A")], "B"
        )
        self.load_height = ChoiceField("load height", LOAD_HEIGHT_OPTIONS, None)
        self.extra = {
            "check.national_annex": self.national_annex,
            **{f"check.{name}": field for name, field in self.gammas.items()},
            "check.ltb_method": self.ltb_method,
            "check.interaction_method": self.interaction_method,
            "check.load_height": self.load_height,
        }
        self.box = self._box(
            "Cross-section resistances, flexural and lateral-torsional buckling and member "
            "interaction. Partial factors left blank take the national set's values (the "
            "recommended ones unless a set is chosen). Load types G, Q, S, W."
        )

    def fill(self, spec: CheckSpec) -> None:
        super().fill(spec)
        self.national_annex.set(spec.national_annex)
        for name, field in self.gammas.items():
            field.set(getattr(spec, name))
        self.ltb_method.set(spec.ltb_method)
        self.interaction_method.set(spec.interaction_method)
        self.load_height.set(spec.load_height)

    def data(self) -> dict[str, Any]:
        data = {**super().data(), "national_annex": self.national_annex.value}
        data |= {name: field.value for name, field in self.gammas.items()}
        data["ltb_method"] = self.ltb_method.value
        data["interaction_method"] = self.interaction_method.value
        data["load_height"] = self.load_height.value
        return _given(data)


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
                    f'<span style="{NOTE_STYLE}">The lightest-section search needs a '
                    "specification check: AISC 360-22 (any family) or EN 1993-1-1 (the EN "
                    "families: IPE, HEA, HEB, HEM, SHS, RHS, CHS and the cold-formed "
                    "SHS_CF, RHS_CF, CHS_CF).</span>"
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
