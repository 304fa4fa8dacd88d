"""Tables of rows with add and remove buttons: loads, couples, distributed loads, revisions.

A row's fields are named by their job-file key inside the row ("magnitude", "z");
the list prefixes them with the row's place ("loads[0].magnitude"), so a problem
the job check reports at a key path lands beside the box it names.
"""

from __future__ import annotations

from collections.abc import Callable
from typing import Any, Protocol

import ipywidgets as widgets

from calcsheet.job.schema import DistributedSpec, LoadSpec, MomentSpec, RevisionSpec
from calcsheet.standards.combinations import LOAD_TYPES
from calcsheet.widgets.fields import (
    ChoiceField,
    ComboField,
    Field,
    MessageSlot,
    QuantityField,
    TextField,
    ToggleField,
)

POLAR = "magnitude + angle"
COMPONENTS = "components"
UNIFORM = "uniform"
LINEAR = "start to end"
AXES = ["+x", "-x", "+y", "-y", "+z", "-z"]
ROW_LABEL = "5.5em"
ROW_BOX = "15em"
ROW_STYLE = widgets.Layout(
    border="1px solid #d0d4da", padding="0.3em 0.5em", margin="0 0 0.4em 0", width="auto"
)


class Row(Protocol):
    """What the list needs of a row."""

    box: widgets.Widget
    remove: widgets.Button
    slot: MessageSlot

    def fields(self) -> dict[str, Field]: ...

    def every_field(self) -> list[Field]: ...

    def quantity_fields(self) -> list[QuantityField]: ...

    def data(self) -> dict[str, Any]: ...


def _wrap(*boxes: widgets.Widget) -> widgets.HBox:
    return widgets.HBox(list(boxes), layout=widgets.Layout(flex_flow="row wrap"))


def _remove_button(what: str) -> widgets.Button:
    return widgets.Button(
        description="Remove",
        tooltip=f"Remove this {what}",
        icon="trash",
        layout=widgets.Layout(width="7em"),
    )


def _length(label: str, value: str) -> QuantityField:
    return QuantityField(label, "length", value, width=ROW_BOX, label_width=ROW_LABEL)


def _force(label: str, value: str) -> QuantityField:
    return QuantityField(label, "force", value, width=ROW_BOX, label_width=ROW_LABEL)


def _moment(label: str, value: str) -> QuantityField:
    return QuantityField(label, "moment", value, width=ROW_BOX, label_width=ROW_LABEL)


class LoadRow:
    """A point load: its name and type, its direction (two ways), where it acts."""

    def __init__(self, spec: LoadSpec) -> None:
        self.name = TextField("name", spec.name, width="20em", label_width=ROW_LABEL)
        self.type = ComboField("type", list(LOAD_TYPES), spec.type, width="10em", label_width="3em")
        self.type.widget.tooltip = "; ".join(f"{key}: {text}" for key, text in LOAD_TYPES.items())
        polar = spec.components is None
        self.direction = ToggleField(
            "given as", [POLAR, COMPONENTS], POLAR if polar else COMPONENTS, label_width=ROW_LABEL
        )
        self.magnitude = _force("magnitude", spec.magnitude or "")
        self.angle = QuantityField(
            "angle", "angle", spec.angle or "", width=ROW_BOX, label_width=ROW_LABEL
        )
        axes = [(axis, axis) for axis in AXES]
        self.from_axis = ChoiceField(
            "from", axes, spec.from_axis, width="10em", label_width=ROW_LABEL
        )
        self.toward_axis = ChoiceField(
            "toward", axes, spec.toward_axis, width="10em", label_width=ROW_LABEL
        )
        components = spec.components or ["0 kip", "0 kip", "0 kip"]
        self.components = [
            _force(f"F{axis}", text) for axis, text in zip("xyz", components, strict=True)
        ]
        self.z = _length("z", spec.z)
        self.ex = _length("ex", spec.ex)
        self.ey = _length("ey", spec.ey)
        self.remove = _remove_button("load")
        self.slot = MessageSlot("this load")
        self._polar_box = _wrap(
            self.magnitude.box, self.angle.box, self.from_axis.box, self.toward_axis.box
        )
        self._components_box = _wrap(*(field.box for field in self.components))
        self._direction_box = widgets.VBox()
        self.box = widgets.VBox(
            [
                _wrap(self.name.box, self.type.box, self.remove),
                self.direction.box,
                self._direction_box,
                _wrap(self.z.box, self.ex.box, self.ey.box),
                self.slot.box,
            ],
            layout=ROW_STYLE,
        )
        self.direction.observe(self._show_direction)
        self._show_direction()

    def _show_direction(self, _change: Any = None) -> None:
        polar = self.direction.value == POLAR
        self._direction_box.children = [self._polar_box if polar else self._components_box]

    def fields(self) -> dict[str, Field]:
        fields: dict[str, Field] = {
            "name": self.name,
            "type": self.type,
            "direction": self.direction,
            "z": self.z,
        }
        if self.direction.value == POLAR:
            fields |= {
                "magnitude": self.magnitude,
                "angle": self.angle,
                "from_axis": self.from_axis,
                "toward_axis": self.toward_axis,
            }
        else:
            fields |= {f"components[{i}]": field for i, field in enumerate(self.components)}
        return fields | {"ex": self.ex, "ey": self.ey}

    def every_field(self) -> list[Field]:
        """Every entry, shown or not (the hidden way of giving the direction keeps its values)."""
        return [
            self.name,
            self.type,
            self.direction,
            self.magnitude,
            self.angle,
            self.from_axis,
            self.toward_axis,
            *self.components,
            self.z,
            self.ex,
            self.ey,
        ]

    def quantity_fields(self) -> list[QuantityField]:
        """Every box holding a quantity, shown or not: all follow a change of units."""
        return [self.magnitude, *self.components, self.z, self.ex, self.ey]

    def data(self) -> dict[str, Any]:
        data: dict[str, Any] = {"name": self.name.value, "type": self.type.value, "z": self.z.value}
        if self.direction.value == POLAR:
            data |= {
                "magnitude": self.magnitude.value,
                "angle": self.angle.value,
                "from_axis": self.from_axis.value,
                "toward_axis": self.toward_axis.value,
            }
        else:
            data["components"] = [field.value for field in self.components]
            # Written only when not the default, so a components load reads cleanly.
            defaults = LoadSpec.model_fields
            for key in ("from_axis", "toward_axis"):
                value = getattr(self, key).value
                if value != defaults[key].default:
                    data[key] = value
        return data | {"ex": self.ex.value, "ey": self.ey.value}


class MomentRow:
    """A concentrated couple: name, type, where, and its components about x, y and z."""

    def __init__(self, spec: MomentSpec) -> None:
        self.name = TextField("name", spec.name, width="20em", label_width=ROW_LABEL)
        self.type = ComboField("type", list(LOAD_TYPES), spec.type, width="10em", label_width="3em")
        self.z = _length("z", spec.z)
        self.Mx = _moment("Mx", spec.Mx)
        self.My = _moment("My", spec.My)
        self.Mz = _moment("Mz", spec.Mz)
        self.remove = _remove_button("couple")
        self.slot = MessageSlot("this couple")
        self.box = widgets.VBox(
            [
                _wrap(self.name.box, self.type.box, self.remove),
                _wrap(self.Mx.box, self.My.box, self.Mz.box),
                _wrap(self.z.box),
                self.slot.box,
            ],
            layout=ROW_STYLE,
        )

    def fields(self) -> dict[str, Field]:
        return {
            "name": self.name,
            "type": self.type,
            "z": self.z,
            "Mx": self.Mx,
            "My": self.My,
            "Mz": self.Mz,
        }

    def every_field(self) -> list[Field]:
        return list(self.fields().values())

    def quantity_fields(self) -> list[QuantityField]:
        return [self.z, self.Mx, self.My, self.Mz]

    def data(self) -> dict[str, Any]:
        return {key: field.value for key, field in self.fields().items()}


def _line_load(label: str, value: str) -> QuantityField:
    return QuantityField(label, "force per length", value, width=ROW_BOX, label_width=ROW_LABEL)


class DistributedRow:
    """A distributed load: name and type, from z_start to z_end, (qx, qy, qz) at each end.

    "uniform" gives q at the start only (the job file's q_end left out); "start to
    end" shows q at the end too, the load varying linearly between.
    """

    def __init__(self, spec: DistributedSpec) -> None:
        self.name = TextField("name", spec.name, width="20em", label_width=ROW_LABEL)
        self.type = ComboField("type", list(LOAD_TYPES), spec.type, width="10em", label_width="3em")
        self.type.widget.tooltip = "; ".join(f"{key}: {text}" for key, text in LOAD_TYPES.items())
        self.z_start = _length("z start", spec.z_start)
        self.z_end = _length("z end", spec.z_end)
        self.varies = ToggleField(
            "q is",
            [UNIFORM, LINEAR],
            UNIFORM if spec.q_end is None else LINEAR,
            label_width=ROW_LABEL,
        )
        self.q_start = [
            _line_load(f"q{axis}", text) for axis, text in zip("xyz", spec.q_start, strict=True)
        ]
        ends = spec.q_end if spec.q_end is not None else spec.q_start
        self.q_end = [
            _line_load(f"q{axis} end", text) for axis, text in zip("xyz", ends, strict=True)
        ]
        self.ex = _length("ex", spec.ex)
        self.ey = _length("ey", spec.ey)
        self.remove = _remove_button("distributed load")
        self.slot = MessageSlot("this distributed load")
        self._end_box = _wrap(*(field.box for field in self.q_end))
        self._shown_end = widgets.VBox()
        self.box = widgets.VBox(
            [
                _wrap(self.name.box, self.type.box, self.remove),
                _wrap(self.z_start.box, self.z_end.box),
                self.varies.box,
                _wrap(*(field.box for field in self.q_start)),
                self._shown_end,
                _wrap(self.ex.box, self.ey.box),
                self.slot.box,
            ],
            layout=ROW_STYLE,
        )
        self.varies.observe(self._show_end)
        self._show_end()

    def _show_end(self, _change: Any = None) -> None:
        self._shown_end.children = [self._end_box] if self.varies.value == LINEAR else []

    def fields(self) -> dict[str, Field]:
        fields: dict[str, Field] = {
            "name": self.name,
            "type": self.type,
            "z_start": self.z_start,
            "z_end": self.z_end,
            "varies": self.varies,
        }
        fields |= {f"q_start[{i}]": field for i, field in enumerate(self.q_start)}
        if self.varies.value == LINEAR:
            fields |= {f"q_end[{i}]": field for i, field in enumerate(self.q_end)}
        return fields | {"ex": self.ex, "ey": self.ey}

    def every_field(self) -> list[Field]:
        """Every entry, shown or not (the hidden end values keep theirs)."""
        return [
            self.name,
            self.type,
            self.z_start,
            self.z_end,
            self.varies,
            *self.q_start,
            *self.q_end,
            self.ex,
            self.ey,
        ]

    def quantity_fields(self) -> list[QuantityField]:
        return [self.z_start, self.z_end, *self.q_start, *self.q_end, self.ex, self.ey]

    def data(self) -> dict[str, Any]:
        data: dict[str, Any] = {
            "name": self.name.value,
            "type": self.type.value,
            "z_start": self.z_start.value,
            "z_end": self.z_end.value,
            "q_start": [field.value for field in self.q_start],
        }
        if self.varies.value == LINEAR:
            data["q_end"] = [field.value for field in self.q_end]
        return data | {"ex": self.ex.value, "ey": self.ey.value}


class RevisionRow:
    """One line of the revision log."""

    def __init__(self, spec: RevisionSpec) -> None:
        self.mark = TextField("mark", spec.mark, width="10em", label_width="3em")
        self.date = TextField(
            "date", spec.date, placeholder="YYYY-MM-DD", width="13em", label_width="3em"
        )
        self.by = TextField("by", spec.by, width="14em", label_width="2em")
        self.description = TextField(
            "changes",
            spec.description,
            placeholder="what this issue changes",
            width="40em",
            label_width="5em",
        )
        self.remove = _remove_button("revision")
        self.slot = MessageSlot("this revision")
        self.box = widgets.VBox(
            [
                _wrap(self.mark.box, self.date.box, self.by.box, self.remove),
                self.description.box,
                self.slot.box,
            ],
            layout=ROW_STYLE,
        )

    def fields(self) -> dict[str, Field]:
        return {
            "mark": self.mark,
            "date": self.date,
            "description": self.description,
            "by": self.by,
        }

    def every_field(self) -> list[Field]:
        return list(self.fields().values())

    def quantity_fields(self) -> list[QuantityField]:
        return []

    def data(self) -> dict[str, Any]:
        return {key: field.value for key, field in self.fields().items()}


class RowList:
    """Rows of one kind under a title, with an add button; ``key`` is the job file's list."""

    def __init__(
        self,
        key: str,
        title: str,
        make_row: Callable[[Any], Any],
        new_spec: Callable[[int], Any],
        on_change: Callable[[Any], None],
        *,
        add_label: str | None = None,
    ) -> None:
        self.key = key
        self.make_row = make_row
        self.new_spec = new_spec
        self.on_change = on_change
        self.rows: list[Any] = []
        self.slot = MessageSlot(title)
        self._rows_box = widgets.VBox()
        parts: list[widgets.Widget] = [
            widgets.HTML(f"<b>{title}</b>"),
            self._rows_box,
            self.slot.box,
        ]
        if add_label is not None:
            self.add_button = widgets.Button(
                description=add_label, icon="plus", layout=widgets.Layout(width="auto")
            )
            self.add_button.on_click(lambda _button: self.add())
            parts.append(self.add_button)
        self.box = widgets.VBox(parts)

    def fill(self, specs: list[Any]) -> None:
        """Replace every row by rows for ``specs`` (without telling the form: it is filling)."""
        self.rows = [self._made(spec) for spec in specs]
        self._rows_box.children = [row.box for row in self.rows]

    def add(self, spec: Any = None) -> Any:
        """Append a row (a new one with sensible entries when ``spec`` is None)."""
        row = self._made(spec if spec is not None else self.new_spec(len(self.rows)))
        self.rows.append(row)
        self._rows_box.children = [*self._rows_box.children, row.box]
        self.on_change(None)
        return row

    def remove(self, row: Any) -> None:
        """Take a row out; the rows after it move up (and their key paths with them)."""
        self.rows.remove(row)
        self._rows_box.children = [item.box for item in self.rows]
        self.on_change(None)

    def _made(self, spec: Any) -> Any:
        row = self.make_row(spec)
        for field in row.every_field():
            field.observe(self.on_change)
        row.remove.on_click(lambda _button, row=row: self.remove(row))
        return row

    def fields(self) -> dict[str, Field]:
        """Every field, keyed by its full key path; ``loads[0]`` is the row's own message."""
        found: dict[str, Field] = {self.key: self.slot}
        for index, row in enumerate(self.rows):
            prefix = f"{self.key}[{index}]"
            found[prefix] = row.slot
            found |= {f"{prefix}.{name}": field for name, field in row.fields().items()}
        return found

    def quantity_fields(self) -> list[Any]:
        return [field for row in self.rows for field in row.quantity_fields()]

    def data(self) -> list[dict[str, Any]]:
        return [row.data() for row in self.rows]
