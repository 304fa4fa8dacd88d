"""National choices of the Eurocodes as one named set, and the values a job overrides.

EN 1990 and EN 1993-1-1 leave some values to each country's National Annex: the
partial factors γM0, γM1, γM2 (EN 1993-1-1 6.1(1)), the combination factors ψ0,
ψ1, ψ2 (EN 1990 A1.2.2, Table A1.1) and the choice between Eq. (6.10) and
Eq. (6.10a)/(6.10b) (EN 1990 6.4.3.2(3)). A :class:`NationalParameters` holds one
such set under a name; :data:`NATIONAL_SETS` lists the sets a job may choose by
name. Only the values the standards recommend in their notes are carried (no
National Annex is reproduced here); a job overrides any single value instead, and
:func:`national_choices` says for each value whether it is the set's or overridden,
so the sheet can list it.

The recommended values below were typed from memory of EN 1990:2002+A1:2005
Table A1.1 and EN 1993-1-1:2005 6.1(1) Note 2B; the ψ0 values equal those of
:mod:`calcsheet.standards.combinations`, which builds the combinations (a test
keeps the two equal).
"""

from __future__ import annotations

import difflib
import math
from collections.abc import Mapping
from dataclasses import dataclass
from types import MappingProxyType

from calcsheet.errors import InputError

RECOMMENDED = "EN recommended values"
# The band a partial factor of a resistance may take here: National Annexes set γM
# between 1.0 and about 1.25 (common practice, no source); beyond 0.8..2.0 a value is a
# typing slip rather than a national choice.
GAMMA_RANGE = (0.8, 2.0)
EXPRESSIONS = ("6.10", "6.10a/b")


@dataclass(frozen=True)
class Psi:
    """ψ0, ψ1, ψ2 of one variable action (EN 1990 Table A1.1)."""

    psi0: float
    psi1: float
    psi2: float


@dataclass(frozen=True)
class NationalParameters:
    """One named set of national choices for EN 1990 and EN 1993-1-1."""

    name: str
    # What the set is, as the sheet cites it.
    source: str
    gamma_M0: float
    gamma_M1: float
    gamma_M2: float
    gamma_reference: str
    # ψ factors by imposed-load category (A-H), by snow site (the keys of
    # combinations.SNOW_SITES) and of wind.
    psi_imposed: Mapping[str, Psi]
    psi_snow: Mapping[str, Psi]
    psi_wind: Psi
    psi_reference: str
    en1990_expression: str
    expression_reference: str


# EN 1990:2002+A1:2005 Table A1.1, recommended values (from memory).
_PSI_IMPOSED = {
    "A": Psi(0.7, 0.5, 0.3),  # domestic, residential areas
    "B": Psi(0.7, 0.5, 0.3),  # office areas
    "C": Psi(0.7, 0.7, 0.6),  # congregation areas
    "D": Psi(0.7, 0.7, 0.6),  # shopping areas
    "E": Psi(1.0, 0.9, 0.8),  # storage areas
    "F": Psi(0.7, 0.7, 0.6),  # traffic area, vehicle weight <= 30 kN
    "G": Psi(0.7, 0.5, 0.3),  # traffic area, 30 kN < vehicle weight <= 160 kN
    "H": Psi(0.0, 0.0, 0.0),  # roofs
}
_PSI_SNOW = {
    "H <= 1000 m": Psi(0.5, 0.2, 0.0),  # remainder of CEN member states, H <= 1000 m a.s.l.
    "H > 1000 m": Psi(0.7, 0.5, 0.2),  # remainder of CEN member states, H > 1000 m a.s.l.
    "Nordic": Psi(0.7, 0.5, 0.2),  # Finland, Iceland, Norway, Sweden
}
_PSI_WIND = Psi(0.6, 0.2, 0.0)
_SNOW_SITE_WORDS = {
    "H <= 1000 m": "site at altitude H ≤ 1000 m",
    "H > 1000 m": "site at altitude H > 1000 m",
    "Nordic": "Finland, Iceland, Norway, Sweden",
}

EN_RECOMMENDED = NationalParameters(
    name=RECOMMENDED,
    source="the values recommended in the notes of EN 1990:2002+A1:2005 and "
    "EN 1993-1-1:2005 (no National Annex applied)",
    # EN 1993-1-1:2005 6.1(1) Note 2B (from memory).
    gamma_M0=1.00,
    gamma_M1=1.00,
    gamma_M2=1.25,
    gamma_reference="EN 1993-1-1 6.1(1) Note 2B",
    psi_imposed=MappingProxyType(_PSI_IMPOSED),
    psi_snow=MappingProxyType(_PSI_SNOW),
    psi_wind=_PSI_WIND,
    psi_reference="EN 1990 Table A1.1",
    # EN 1990 6.4.3.2(3) leaves the choice of (6.10) or (6.10a)/(6.10b) to the National
    # Annex; the note gives no preference, so the single expression is the default here.
    en1990_expression="6.10",
    expression_reference="EN 1990 6.4.3.2(3)",
)

NATIONAL_SETS: Mapping[str, NationalParameters] = MappingProxyType({RECOMMENDED: EN_RECOMMENDED})


def national_set(name: str, field: str = "check national_annex") -> NationalParameters:
    """The set called ``name``; an unknown name is refused naming the known ones."""
    found = NATIONAL_SETS.get(str(name).strip())
    if found is not None:
        return found
    by_fold = {known.casefold(): known for known in NATIONAL_SETS}
    if str(name).strip().casefold() in by_fold:
        return NATIONAL_SETS[by_fold[str(name).strip().casefold()]]
    close = difflib.get_close_matches(str(name), list(NATIONAL_SETS), n=1, cutoff=0.4)
    known = ", ".join(f'"{known}"' for known in NATIONAL_SETS)
    hint = f'; did you mean "{close[0]}"?' if close else ""
    raise InputError(
        field,
        name,
        f"the name of a set of national choices: {known}; give single values "
        "(gamma_M0, gamma_M1, gamma_M2, psi0, en1990_expression) to override them",
        f"no such set{hint}",
    )


def checked_gamma(name: str, value: float | None) -> float | None:
    """A partial factor a job gives (None: the set's), refused outside :data:`GAMMA_RANGE`."""
    if value is None:
        return None
    try:
        number = float(value)
    except (TypeError, ValueError):
        number = math.nan
    low, high = GAMMA_RANGE
    if not (math.isfinite(number) and low <= number <= high):
        raise InputError(f"check {name}", value, f"a partial factor from {low:g} to {high:g}")
    return number


@dataclass(frozen=True)
class NationalValue:
    """One national choice as the job uses it: the set's value and the value in use."""

    label: str  # as the sheet prints it: "γM0", "ψ0, ψ1, ψ2 of wind"
    value: str  # the value in use, as printed
    set_value: str  # the set's value, as printed
    reference: str

    @property
    def overridden(self) -> bool:
        return self.value != self.set_value


@dataclass(frozen=True)
class NationalChoices:
    """The values in use: a set, with the job's overrides applied."""

    parameters: NationalParameters
    gamma_M0: float
    gamma_M1: float
    gamma_M2: float
    en1990_expression: str
    values: tuple[NationalValue, ...]

    @property
    def overridden(self) -> tuple[NationalValue, ...]:
        return tuple(value for value in self.values if value.overridden)

    def basis_lines(self, combinations: bool = True) -> list[str]:
        """Each value, and whether it is the set's or overridden, for the design basis
        (without ``combinations``: the partial factors of the resistances only)."""
        name = self.parameters.name
        lines = []
        for item in self.values:
            if not combinations and not item.label.startswith("γM"):
                continue
            if item.overridden:
                lines.append(
                    f"{item.label} = {item.value}: overridden for this job "
                    f"({name}: {item.set_value}, {item.reference})."
                )
            else:
                lines.append(f"{item.label} = {item.value}: {name} ({item.reference}).")
        return lines


def _number(value: float) -> str:
    return f"{value:.2f}"


def _psi(values: Psi) -> str:
    return f"{values.psi0:g}, {values.psi1:g}, {values.psi2:g}"


def national_choices(
    name: str = RECOMMENDED,
    *,
    gamma_M0: float | None = None,
    gamma_M1: float | None = None,
    gamma_M2: float | None = None,
    en1990_expression: str | None = None,
    psi0: Mapping[str, float] | None = None,
    imposed_category: str = "A",
    snow_site: str = "H <= 1000 m",
) -> NationalChoices:
    """The set ``name`` with single values overridden (``None``: the set's value).

    ``psi0`` overrides ψ0 of Q, S or W; ψ1 and ψ2 are listed as the set gives them
    (the ultimate limit state combinations use ψ0 only). ``imposed_category`` and
    ``snow_site`` pick the rows of Table A1.1 that apply.
    """
    chosen = national_set(name)
    given = {
        "gamma_M0": checked_gamma("gamma_M0", gamma_M0),
        "gamma_M1": checked_gamma("gamma_M1", gamma_M1),
        "gamma_M2": checked_gamma("gamma_M2", gamma_M2),
    }
    gammas = {
        key: value if value is not None else getattr(chosen, key) for key, value in given.items()
    }
    expression = chosen.en1990_expression
    if en1990_expression is not None:
        expression = str(en1990_expression).strip().replace(" ", "")
        expression = {"6.10a/6.10b": "6.10a/b", "6.10a,6.10b": "6.10a/b"}.get(
            expression, expression
        )
    if expression not in EXPRESSIONS:
        raise InputError(
            "check en1990_expression",
            en1990_expression,
            '"6.10" (EN 1990 Eq. 6.10) or "6.10a/b" (the less favourable of Eq. 6.10a and 6.10b)',
        )
    values = [
        NationalValue(
            label, _number(gammas[key]), _number(getattr(chosen, key)), chosen.gamma_reference
        )
        for key, label in (("gamma_M0", "γM0"), ("gamma_M1", "γM1"), ("gamma_M2", "γM2"))
    ]
    values.append(
        NationalValue(
            "Expression for the fundamental combinations",
            f"Eq. ({expression})",
            f"Eq. ({chosen.en1990_expression})",
            chosen.expression_reference,
        )
    )
    category = str(imposed_category).strip().upper()
    rows = (
        ("Q", f"imposed loads, category {category}", chosen.psi_imposed.get(category)),
        (
            "S",
            f"snow, {_SNOW_SITE_WORDS.get(snow_site, snow_site)}",
            chosen.psi_snow.get(snow_site),
        ),
        ("W", "wind", chosen.psi_wind),
    )
    for load_type, words, psi in rows:
        if psi is None:
            continue  # an unknown category or site: the combinations refuse it by its key
        in_use = psi
        if psi0 and load_type in psi0:
            in_use = Psi(float(psi0[load_type]), psi.psi1, psi.psi2)
        values.append(
            NationalValue(
                f"ψ0, ψ1, ψ2 of {words} ({load_type})",
                _psi(in_use),
                _psi(psi),
                chosen.psi_reference,
            )
        )
    return NationalChoices(
        parameters=chosen,
        gamma_M0=gammas["gamma_M0"],
        gamma_M1=gammas["gamma_M1"],
        gamma_M2=gammas["gamma_M2"],
        en1990_expression=expression,
        values=tuple(values),
    )


__all__ = [
    "EN_RECOMMENDED",
    "GAMMA_RANGE",
    "NATIONAL_SETS",
    "RECOMMENDED",
    "NationalChoices",
    "NationalParameters",
    "NationalValue",
    "Psi",
    "checked_gamma",
    "national_choices",
    "national_set",
]
