"""The form's entries: a box to type in, and a message under it that says what is wrong.

Every entry is checked the way the job file is (quantities through
:func:`calcsheet.units.parse_quantity` with the entry's dimension), so the message
beside a box says what the command line would say about that key.
"""

from __future__ import annotations

import html
from collections.abc import Callable
from typing import Any

import ipywidgets as widgets
import pint

from calcsheet.errors import InputError
from calcsheet.units import format_number, parse_quantity, unit_system

BAD_BACKGROUND = "#fdeaea"
MESSAGE_STYLE = "color:#9b1c1c;font-size:0.88em;line-height:1.25;white-space:normal;"
LABEL_WIDTH = "9em"


def problem_text(error: InputError) -> str:
    """What to show beside a box: the problem and what is expected, without the field name."""
    if error.problem:
        return f"{error.problem}; expected {error.expected}"
    return f"expected {error.expected}"


def quantity_text(quantity: pint.Quantity, dimension: str, system: str) -> str:
    """``quantity`` in the unit system's unit for ``dimension``, rounded as sheets print.

    The number takes the sheet's own rounding (three significant figures, four when
    the leading digit is 1), so 48 in becomes "1219 mm" and 50 ksi "345 MPa".
    """
    preferred = unit_system(system).preferred.get(dimension)
    if preferred is None:
        return f"{format_number(float(quantity.magnitude)).plain()} {quantity.units:~}".strip()
    value = float(quantity.to(preferred).magnitude)
    return f"{format_number(value).plain()} {preferred.replace('**', '^')}"


def convert_text(text: str, dimension: str, system: str) -> str:
    """An entry in another unit system; text that does not parse (or has no unit) stays."""
    if not text.strip() or dimension not in unit_system(system).preferred:
        return text
    try:
        quantity = parse_quantity(text, field="value", dimension=dimension)
    except InputError:
        return text
    return quantity_text(quantity, dimension, system)


def _text_box(label: str, value: str, placeholder: str, width: str, label_width: str) -> Any:
    return widgets.Text(
        value=value,
        description=label,
        placeholder=placeholder,
        style={"description_width": label_width},
        layout=widgets.Layout(width=width),
    )


class Field:
    """One entry: ``widget`` holds what a user types, ``message`` says what is wrong with it."""

    def __init__(self, label: str, widget: Any) -> None:
        self.label = label
        self.widget = widget
        # Under the box, taking no room until there is something to say.
        self.message = widgets.HTML(layout=widgets.Layout(display="none"))
        if widget is None:
            self.box: widgets.Widget = self.message
        else:
            self.message.layout.max_width = widget.layout.width
            self.box = widgets.VBox([widget, self.message], layout=widgets.Layout(margin="0"))
        self.problem: str | None = None

    @property
    def value(self) -> Any:
        """The entry as the job file takes it (text is stripped)."""
        value = self.widget.value
        return value.strip() if isinstance(value, str) else value

    @property
    def shown(self) -> Any:
        """What the box shows (after a switch of units, a rounded conversion of the value)."""
        return self.widget.value

    def set(self, value: Any) -> None:
        """Put a value in the box exactly as a user would (observers run)."""
        self.widget.value = value

    def observe(self, callback: Callable[[Any], None]) -> None:
        """Call ``callback`` whenever the entry changes."""
        self.widget.observe(callback, names="value")

    def check(self) -> str | None:
        """The problem with the entry taken on its own, or ``None``."""
        return None

    def show_problem(self, text: str | None) -> None:
        """Mark the entry (tinted box and a message under it); ``None`` clears the mark."""
        self.problem = text
        marked = text is not None
        style = getattr(self.widget, "style", None)
        if style is not None and "background" in style.keys:
            wanted = BAD_BACKGROUND if marked else None
            if style.background != wanted:
                style.background = wanted
        shown = f'<div style="{MESSAGE_STYLE}">⚠ {html.escape(text)}</div>' if marked else ""
        if self.message.value != shown:
            self.message.value = shown
            self.message.layout.display = None if marked else "none"


class MessageSlot(Field):
    """A place for messages about a whole group (a load row, the list of loads, the form)."""

    def __init__(self, label: str) -> None:
        super().__init__(label, None)

    @property
    def value(self) -> Any:
        return None

    def set(self, value: Any) -> None:
        raise KeyError(f"{self.label} is not an entry; set one of its fields")

    def observe(self, callback: Callable[[Any], None]) -> None:
        return None


class TextField(Field):
    """Free text: names, dates, descriptions."""

    def __init__(
        self,
        label: str,
        value: str = "",
        *,
        placeholder: str = "",
        width: str = "30em",
        label_width: str = LABEL_WIDTH,
    ) -> None:
        super().__init__(label, _text_box(label, value, placeholder, width, label_width))


class QuantityField(Field):
    """A number with its unit ("6.5 kip"), checked for ``dimension``; converts US <-> SI."""

    def __init__(
        self,
        label: str,
        dimension: str,
        value: str = "",
        *,
        optional: bool = False,
        placeholder: str = "",
        width: str = "17em",
        label_width: str = LABEL_WIDTH,
    ) -> None:
        super().__init__(label, _text_box(label, value, placeholder, width, label_width))
        self.dimension = dimension
        self.optional = optional
        # While the box shows an entry converted to the other unit system: (the system it
        # was typed in, the text as typed, the text shown). The calc and Save use the
        # typed text, and every conversion starts from it, so switching US/SI any number
        # of times rounds nothing the calc uses; only what is shown is rounded. Typing
        # in the box (the shown text changes) makes the new text the typed one.
        self._typed: tuple[str, str, str] | None = None

    def _text(self) -> str:
        """The entry's text as typed (not the rounded conversion the box may show)."""
        shown = self.widget.value
        if self._typed is not None and self._typed[2] == shown:
            return self._typed[1]
        return shown

    @property
    def value(self) -> Any:
        """The entry as the job file takes it: as typed, never the rounded conversion shown."""
        return self._text().strip()

    def set(self, value: Any) -> None:
        self._typed = None
        super().set(value)

    def check(self) -> str | None:
        text = self.value
        if not text and self.optional:
            return None
        try:
            parse_quantity(text, field=self.label, dimension=self.dimension)
        except InputError as error:
            return problem_text(error)
        return None

    def _converted(self, text: str, system: str) -> str:
        return convert_text(text, self.dimension, system)

    def convert(self, old: str, new: str) -> None:
        """Show the entry in the ``new`` system's unit, rounded; the typed value is kept.

        Back in the system it was typed in, the entry shows exactly as typed.
        """
        shown = self.widget.value
        if self._typed is not None and self._typed[2] == shown:
            system, typed = self._typed[0], self._typed[1]
        else:
            system, typed = old, shown
        converted = typed if system == new else self._converted(typed, new)
        self._typed = (system, typed, converted) if converted != typed else None
        self.widget.value = converted


class ListQuantityField(QuantityField):
    """Several quantities of one dimension in one box, separated by commas ("0 in, 24 in")."""

    @property
    def value(self) -> list[str]:
        return [part.strip() for part in self._text().split(",") if part.strip()]

    def set(self, value: Any) -> None:
        text = ", ".join(value) if isinstance(value, (list, tuple)) else str(value)
        super().set(text)

    def check(self) -> str | None:
        parts = self.value
        if not parts:
            if self.optional:  # an empty list: none (brace points, support positions)
                return None
            return f"give at least one {self.dimension}, such as '0 in'"
        for number, text in enumerate(parts, start=1):
            try:
                parse_quantity(text, field=self.label, dimension=self.dimension)
            except InputError as error:
                return f"entry {number} ({text!r}): {problem_text(error)}"
        return None

    def _converted(self, text: str, system: str) -> str:
        return ", ".join(
            convert_text(part.strip(), self.dimension, system) for part in text.split(",")
        )


class NumberField(Field):
    """A plain number (a factor of safety), above ``low`` and at most ``high``.

    ``optional``: a blank box is no value (None): the sheet defaults it and says from
    what; ``placeholder`` says so in the empty box.
    """

    def __init__(
        self,
        label: str,
        value: float | None,
        *,
        low: float = 0.0,
        high: float = 100.0,
        optional: bool = False,
        placeholder: str = "",
    ) -> None:
        shown = "" if value is None else f"{value:g}"
        super().__init__(label, _text_box(label, shown, placeholder, "17em", LABEL_WIDTH))
        self.low, self.high = low, high
        self.optional = optional

    @property
    def value(self) -> float | str | None:
        """The number, or the text as typed when it is not one (the job check reports it);
        None for a blank optional box."""
        text = self.widget.value.strip()
        if not text and self.optional:
            return None
        try:
            return float(parse_quantity(text, field=self.label, dimension="dimensionless").m)
        except InputError:
            return text

    def set(self, value: Any) -> None:
        if value is None:
            self.widget.value = ""
            return
        self.widget.value = f"{value:g}" if isinstance(value, (int, float)) else str(value)

    def check(self) -> str | None:
        if self.optional and not self.widget.value.strip():
            return None
        try:
            number = parse_quantity(
                self.widget.value, field=self.label, dimension="dimensionless"
            ).m
        except InputError as error:
            return problem_text(error)
        if not self.low < number <= self.high:
            return f"expected a number above {self.low:g} and at most {self.high:g}"
        return None


class ChoiceField(Field):
    """One of a list. A value not in the list (read from a job file) is added, so it is kept."""

    def __init__(
        self,
        label: str,
        options: list[tuple[str, Any]],
        value: Any,
        *,
        width: str = "30em",
        label_width: str = LABEL_WIDTH,
    ) -> None:
        box = widgets.Dropdown(
            options=options,
            description=label,
            style={"description_width": label_width},
            layout=widgets.Layout(width=width),
        )
        super().__init__(label, box)
        self.set(value)

    def set(self, value: Any) -> None:
        if value not in [option[1] for option in self.widget.options]:
            self.widget.options = [*self.widget.options, (str(value), value)]
        self.widget.value = value


class ComboField(Field):
    """Text with suggestions that narrow as one types (a shape designation, a load type)."""

    def __init__(
        self,
        label: str,
        options: list[str],
        value: str = "",
        *,
        placeholder: str = "",
        width: str = "30em",
        label_width: str = LABEL_WIDTH,
    ) -> None:
        box = widgets.Combobox(
            options=options,
            value=value,
            ensure_option=False,
            description=label,
            placeholder=placeholder,
            style={"description_width": label_width},
            layout=widgets.Layout(width=width),
        )
        super().__init__(label, box)


class ToggleField(Field):
    """A choice among a few, all in view (unit system, how a load's direction is given)."""

    def __init__(
        self, label: str, options: list[str], value: str, *, label_width: str = LABEL_WIDTH
    ) -> None:
        box = widgets.ToggleButtons(
            options=options,
            value=value,
            description=label,
            style={"description_width": label_width, "button_width": "auto"},
        )
        super().__init__(label, box)


class CheckField(Field):
    """Yes or no, as a tick box (self-weight included)."""

    def __init__(self, label: str, value: bool, *, width: str = "30em") -> None:
        box = widgets.Checkbox(
            value=value, description=label, indent=False, layout=widgets.Layout(width=width)
        )
        super().__init__(label, box)


class ManyChoiceField(Field):
    """Any of a few options, one checkbox each; the value is the ticked ones, in list order."""

    def __init__(self, label: str, options: list[str], value: list[str]) -> None:
        self.options = options
        # The value lives in one (hidden) widget so that set_value and observers treat
        # this entry like any other; the checkboxes only mirror it.
        holder = widgets.SelectMultiple(options=options, value=tuple(value))
        super().__init__(label, holder)
        self.boxes = [
            widgets.Checkbox(
                value=option in value,
                description=option,
                indent=False,
                layout=widgets.Layout(width="5em"),
            )
            for option in options
        ]
        title = widgets.Label(label, layout=widgets.Layout(width=LABEL_WIDTH))
        self.box = widgets.VBox([widgets.HBox([title, *self.boxes]), self.message])
        for box in self.boxes:
            box.observe(self._ticked, names="value")
        holder.observe(self._chosen, names="value")

    @property
    def value(self) -> list[str]:
        return list(self.widget.value)

    def set(self, value: Any) -> None:
        self.widget.value = tuple(option for option in self.options if option in value)

    def _ticked(self, _change: Any) -> None:
        self.set([box.description for box in self.boxes if box.value])

    def _chosen(self, _change: Any) -> None:
        for box in self.boxes:
            ticked = box.description in self.widget.value
            if box.value != ticked:
                box.value = ticked

    def check(self) -> str | None:
        return None if self.value else "tick at least one"
