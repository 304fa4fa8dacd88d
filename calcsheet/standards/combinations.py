"""Load combinations: ASCE 7-22 / 7-16 (strength and allowable stress) and EN 1990 Eq. (6.10).

Load types (:data:`LOAD_TYPES`): ASCE 7 uses D, L, Lr, S, R, W and E; EN 1990 uses
G (permanent), Q (imposed), S (snow) and W (wind). :func:`combinations` lists the
basic combinations of a standard for the types present; :func:`user_combinations`
checks combinations an engineer writes; :func:`combine_numeric` applies factors
to forces by load type (vectorised) and :func:`envelope` finds the governing
combination of every measure.

Rules of the automatic list
---------------------------
* "(Lr or S or R)" and "(L or 0.5W)" expand to one combination per type present.
* Each combination has principal types (1.6L in 1.2D + 1.6L + 0.5S, W in 0.9D + 1.0W);
  it is skipped when a principal type has no load. A companion type with no load
  contributes nothing and drops out.
* Combinations that end with the same factors as an earlier one are listed once.
* Every variable load is taken as acting (unfavourable). Dead load appears both at
  its upper and lower factors where the standard gives both.

Seismic combinations (ASCE 7 2.3.6, 2.4.5) take E as the horizontal effect E_h and
fold the vertical effect E_v = 0.2·S_DS·D (ASCE 7 12.4.2.2) into the factor on D,
so ``S_DS`` is needed when E is present.

The factors are quoted from memory (see each reference) and should be read
against the standards when the project is reviewed.
"""

from __future__ import annotations

import math
from collections.abc import Iterable, Mapping, Sequence
from dataclasses import dataclass, field
from types import MappingProxyType

import numpy as np
from numpy.typing import ArrayLike, NDArray

from calcsheet.errors import InputError

LOAD_TYPES: dict[str, str] = {
    "D": "dead load (ASCE 7)",
    "L": "live load (ASCE 7)",
    "Lr": "roof live load (ASCE 7)",
    "S": "snow load (ASCE 7; EN 1990 variable action)",
    "R": "rain load (ASCE 7)",
    "W": "wind load (ASCE 7; EN 1990 variable action)",
    "E": "earthquake, horizontal effect E_h (ASCE 7); E_v goes into the factor on D",
    "G": "permanent action (EN 1990)",
    "Q": "imposed load (EN 1990), of a category of EN 1990 Table A1.1",
}

ASCE_TYPES = ("D", "L", "Lr", "S", "R", "W", "E")
EN_TYPES = ("G", "Q", "S", "W")

# EN 1990 Table A1.1, ψ0 (from memory).
PSI0_IMPOSED: dict[str, float] = {
    "A": 0.7,  # domestic, residential
    "B": 0.7,  # offices
    "C": 0.7,  # congregation areas
    "D": 0.7,  # shopping
    "E": 1.0,  # storage
    "F": 0.7,  # traffic, vehicle weight <= 30 kN
    "G": 0.7,  # traffic, 30 kN < vehicle weight <= 160 kN
    "H": 0.0,  # roofs
}
PSI0_SNOW = 0.5  # sites at altitude H <= 1000 m a.s.l. outside the Nordic countries
PSI0_SNOW_HIGH = 0.7  # Finland, Iceland, Norway, Sweden, and H > 1000 m a.s.l.
PSI0_WIND = 0.6
# EN 1990 Table A1.2(B), set B (STR/GEO), recommended values (from memory).
GAMMA_G_SUP = 1.35
GAMMA_G_INF = 1.00
GAMMA_Q = 1.5


@dataclass(frozen=True)
class Combination:
    """A load combination: factors by load type (types not named have factor 0)."""

    name: str
    factors: Mapping[str, float]
    reference: str = ""

    def factor(self, load_type: str) -> float:
        """The factor on ``load_type`` (0 when the combination does not name it)."""
        return float(self.factors.get(load_type, 0.0))

    def text(self) -> str:
        """The combination as written: ``1.2D + 1.6L + 0.5S``."""
        pieces = []
        for load_type, value in self.factors.items():
            number = f"{value:g}"
            term = f"{'' if number == '1' else number}{load_type}"
            pieces.append(term if not pieces or value < 0 else f"+ {term}")
        return " ".join(pieces).replace("-", "− ") if pieces else "0"


# --- tables of the standards -------------------------------------------------------------------


@dataclass(frozen=True)
class _Template:
    """A basic combination before expansion: groups of alternatives, some principal."""

    number: str
    groups: tuple[tuple[tuple[str, float | str], ...], ...]
    principal: tuple[int, ...]
    reference: str


def _t(number: str, reference: str, principal: tuple[int, ...], *groups) -> _Template:
    return _Template(number, tuple(tuple(group) for group in groups), principal, reference)


# Factors given as text are functions of S_DS, resolved in :func:`_resolve_factor`.
_EV_UP, _EV_DOWN = "1.2+0.2SDS", "0.9-0.2SDS"
_ASD_EV_UP, _ASD_EV_9, _ASD_EV_DOWN = "1.0+0.14SDS", "1.0+0.105SDS", "0.6-0.14SDS"


def _asce_strength(edition: str, snow_2: float, snow_3: float, snow_seismic: float):
    ref = f"ASCE 7-{edition} 2.3.1"
    seismic = f"ASCE 7-{edition} 2.3.6"
    companions = (("Lr", 0.5), ("S", snow_2), ("R", 0.5))
    return (
        _t("1", ref, (0,), [("D", 1.4)]),
        _t("2", ref, (1,), [("D", 1.2)], [("L", 1.6)], companions),
        _t("3", ref, (1,), [("D", 1.2)], [("Lr", 1.6), ("S", snow_3), ("R", 1.6)],
           [("L", 1.0), ("W", 0.5)]),
        _t("4", ref, (1,), [("D", 1.2)], [("W", 1.0)], [("L", 1.0)], companions),
        _t("5", ref, (1,), [("D", 0.9)], [("W", 1.0)]),
        _t("6", seismic, (1,), [("D", _EV_UP)], [("E", 1.0)], [("L", 1.0)],
           [("S", snow_seismic)]),
        _t("7", seismic, (1,), [("D", _EV_DOWN)], [("E", 1.0)]),
    )  # fmt: skip


def _asce_allowable(edition: str, snow: float, snow_seismic: float):
    ref = f"ASCE 7-{edition} 2.4.1"
    seismic = f"ASCE 7-{edition} 2.4.5"
    roof = (("Lr", 1.0), ("S", snow), ("R", 1.0))
    roof_75 = tuple((name, 0.75 * value) for name, value in roof)
    return (
        _t("1", ref, (0,), [("D", 1.0)]),
        _t("2", ref, (1,), [("D", 1.0)], [("L", 1.0)]),
        _t("3", ref, (1,), [("D", 1.0)], roof),
        _t("4", ref, (1, 2), [("D", 1.0)], [("L", 0.75)], roof_75),
        _t("5", ref, (1,), [("D", 1.0)], [("W", 0.6)]),
        _t("6", ref, (1,), [("D", 1.0)], [("W", 0.75 * 0.6)], [("L", 0.75)], roof_75),
        _t("7", ref, (1,), [("D", 0.6)], [("W", 0.6)]),
        _t("8", seismic, (1,), [("D", _ASD_EV_UP)], [("E", 0.7)]),
        _t("9", seismic, (1,), [("D", _ASD_EV_9)], [("E", 0.525)], [("L", 0.75)],
           [("S", snow_seismic)]),
        _t("10", seismic, (1,), [("D", _ASD_EV_DOWN)], [("E", 0.7)]),
    )  # fmt: skip


# ASCE 7-22 made ground snow loads strength-level: S is factored 1.0 where it is the
# principal load (7-16: 1.6) and 0.7S enters the ASD combinations (STRUCTURE magazine
# articles on ASCE 7-22 snow loads say so). The companion factor 0.3S (7-16: 0.5S) and
# the seismic companions 0.15S (LRFD) and 0.75·0.7S (ASD) are from memory: verify.
_TEMPLATES: dict[str, tuple[_Template, ...]] = {
    "ASCE 7-22 strength": _asce_strength("22", 0.3, 1.0, 0.15),
    "ASCE 7-22 ASD": _asce_allowable("22", 0.7, 0.75 * 0.7),
    "ASCE 7-16 strength": _asce_strength("16", 0.5, 1.6, 0.2),
    "ASCE 7-16 ASD": _asce_allowable("16", 1.0, 0.75),
}
EN_1990 = "EN 1990 Eq. (6.10)"
STANDARDS: tuple[str, ...] = (*_TEMPLATES, EN_1990)
_ALIASES = {
    "ASCE 7-22 LRFD": "ASCE 7-22 strength",
    "ASCE 7-16 LRFD": "ASCE 7-16 strength",
    "EN 1990": EN_1990,
    "EN 1990 6.10": EN_1990,
}


def _standard(name: str) -> str:
    wanted = " ".join(str(name).split()).casefold()
    for candidate in (*STANDARDS, *_ALIASES):
        if candidate.casefold() == wanted:
            return _ALIASES.get(candidate, candidate)
    raise InputError("standard", name, f"one of: {', '.join(STANDARDS)}")


def _types(types_present: Iterable[str], standard: str) -> tuple[str, ...]:
    allowed = EN_TYPES if standard == EN_1990 else ASCE_TYPES
    present = []
    for load_type in types_present:
        if load_type not in allowed:
            raise InputError("load type", load_type, f"for {standard}: one of {', '.join(allowed)}")
        if load_type not in present:
            present.append(load_type)
    return tuple(present)


# --- the automatic list ------------------------------------------------------------------------


def combinations(
    standard: str,
    types_present: Iterable[str],
    *,
    S_DS: float | None = None,
    imposed_category: str = "A",
    psi0: Mapping[str, float] | None = None,
) -> list[Combination]:
    """The basic combinations of ``standard`` for the load types that have loads.

    ``standard`` is one of :data:`STANDARDS` (case-insensitive; "ASCE 7-22 LRFD"
    and "EN 1990" are accepted too). ``S_DS`` (ASCE 7 11.4.5) is needed when E is
    present. For EN 1990, ``imposed_category`` (A–H, Table A1.1) gives ψ0 of Q,
    and ``psi0`` overrides ψ0 of Q, S or W (e.g. ``{"S": 0.7}`` above 1000 m).
    """
    name = _standard(standard)
    present = _types(types_present, name)
    if name == EN_1990:
        return _en_1990(present, imposed_category, psi0)
    if psi0 is not None:
        raise InputError("psi0", dict(psi0), f"nothing for {name} (ψ0 belongs to EN 1990)")
    bad_S_DS = S_DS is None or not (math.isfinite(float(S_DS)) and float(S_DS) >= 0)
    if "E" in present and bad_S_DS:
        raise InputError(
            "S_DS",
            S_DS,
            "the design spectral acceleration S_DS (ASCE 7 11.4.5), a number ≥ 0",
            "E is present and E_v = 0.2·S_DS·D (12.4.2.2) enters the factor on D",
        )
    result: list[Combination] = []
    for template in _TEMPLATES[name]:
        for combo in _expand(template, present, S_DS):
            if all(dict(combo.factors) != dict(other.factors) for other in result):
                result.append(combo)
    return result


def _expand(template: _Template, present: Sequence[str], S_DS: float | None) -> list[Combination]:
    options: list[list[tuple[str, float | str]]] = []
    for index, group in enumerate(template.groups):
        available = [term for term in group if term[0] in present]
        if not available:
            if index in template.principal:
                return []
            continue
        options.append(available)
    result = []
    for choice in _product(options):
        factors = {load_type: _resolve_factor(value, S_DS) for load_type, value in choice}
        factors = {key: value for key, value in factors.items() if value != 0.0}
        combo = Combination("", MappingProxyType(factors), template.reference)
        name = f"{template.reference} ({template.number}): {combo.text()}"
        result.append(Combination(name, combo.factors, template.reference))
    return result


def _product(options: list[list[tuple[str, float | str]]]) -> list[list[tuple[str, float | str]]]:
    result: list[list[tuple[str, float | str]]] = [[]]
    for group in options:
        result = [[*chosen, term] for chosen in result for term in group]
    return result


def _resolve_factor(value: float | str, S_DS: float | None) -> float:
    if isinstance(value, float):
        return value
    base, rest = float(value[:3]), value[3:]
    # "1.2+0.2SDS" -> 1.2 + 0.2·S_DS (E_v of ASCE 7 12.4.2.2 acting with or against D)
    sign = 1.0 if rest[0] == "+" else -1.0
    coefficient = float(rest[1:].removesuffix("SDS"))
    return round(base + sign * coefficient * float(S_DS or 0.0), 12)


def _en_1990(
    present: Sequence[str], category: str, psi0: Mapping[str, float] | None
) -> list[Combination]:
    key = str(category).strip().upper()
    if key not in PSI0_IMPOSED:
        raise InputError("imposed_category", category, f"one of {', '.join(PSI0_IMPOSED)}")
    psi = {"Q": PSI0_IMPOSED[key], "S": PSI0_SNOW, "W": PSI0_WIND}
    for load_type, value in (psi0 or {}).items():
        if load_type not in psi:
            raise InputError("psi0", load_type, "ψ0 of Q, S or W")
        number = float(value)
        if not 0.0 <= number <= 1.0:
            raise InputError(f"psi0 {load_type}", value, "a factor from 0 to 1")
        psi[load_type] = number
    variables = [load_type for load_type in ("Q", "S", "W") if load_type in present]
    reference = f"{EN_1990}, Table A1.2(B)"
    templates: list[tuple[str, dict[str, float]]] = []
    if "G" in present:
        templates.append(("", {"G": GAMMA_G_SUP}))
    for leading in variables:
        for gamma_G in (GAMMA_G_SUP, GAMMA_G_INF):
            factors = {"G": gamma_G} if "G" in present else {}
            factors[leading] = GAMMA_Q
            # Imposed loads on roofs (category H) are not combined with snow or wind
            # (EN 1990 A1.2.1(3), from memory).
            roof_leading = leading == "Q" and key == "H"
            for other in variables:
                if other == leading or roof_leading:
                    continue
                factor = round(GAMMA_Q * psi[other], 12)
                if factor != 0.0:
                    factors[other] = factor
            templates.append((leading, factors))
    result: list[Combination] = []
    for leading, factors in templates:
        if any(factors == dict(other.factors) for other in result):
            continue
        combo = Combination("", MappingProxyType(factors), reference)
        role = f", {leading} leading" if leading else ""
        result.append(Combination(f"{EN_1990}{role}: {combo.text()}", combo.factors, reference))
    return result


# --- combinations written by the engineer ------------------------------------------------------


def user_combinations(
    spec: Mapping[str, Mapping[str, float]], types_present: Iterable[str]
) -> list[Combination]:
    """Combinations given as ``{name: {type: factor}}``, checked against the loads present.

    A combination naming a type that no load has raises :class:`InputError` naming
    the combination and listing the types present (a typo, or a load forgotten).
    """
    present = tuple(dict.fromkeys(types_present))
    listed = ", ".join(present) or "none"
    result = []
    for name, factors in spec.items():
        field_name = f"combination {name!r}"
        if not factors:
            raise InputError(field_name, dict(factors), "at least one load type with a factor")
        checked: dict[str, float] = {}
        for load_type, value in factors.items():
            if load_type not in LOAD_TYPES:
                raise InputError(field_name, load_type, f"load types among {', '.join(LOAD_TYPES)}")
            if load_type not in present:
                raise InputError(
                    field_name, load_type, f"a load type present: {listed}", "no load has this type"
                )
            number = float(value)
            if not math.isfinite(number):
                raise InputError(f"{field_name} factor on {load_type}", value, "a finite number")
            checked[load_type] = number
        result.append(Combination(str(name), MappingProxyType(checked), "given"))
    return result


# --- numbers ------------------------------------------------------------------------------------


def factor_matrix(combos: Sequence[Combination], types: Sequence[str]) -> NDArray[np.float64]:
    """Factors as an array (n_combos, n_types), columns in the order of ``types``."""
    order = list(types)
    for combo in combos:
        missing = [load_type for load_type in combo.factors if load_type not in order]
        if missing:
            raise InputError(
                f"combination {combo.name!r}",
                ", ".join(missing),
                f"load types among those given: {', '.join(order) or 'none'}",
            )
    return np.array([[combo.factor(t) for t in order] for combo in combos], dtype=float).reshape(
        len(combos), len(order)
    )


def combine_numeric(
    forces_by_type: ArrayLike, combos: Sequence[Combination], types: Sequence[str]
) -> NDArray[np.float64]:
    """Factored sums of forces: (n_types, ..., k) by type in -> (n_combos, ..., k) out.

    ``types`` names the first axis of ``forces_by_type`` (for example the six
    internal forces (N, Vx, Vy, T, Mx, My) at many stations for each load type).
    """
    forces = np.asarray(forces_by_type, dtype=float)
    if forces.ndim == 0 or forces.shape[0] != len(types):
        raise InputError(
            "forces_by_type",
            f"shape {forces.shape}",
            f"a first axis of {len(types)} (one entry per type in {list(types)})",
        )
    return np.tensordot(factor_matrix(combos, types), forces, axes=(1, 0))


@dataclass(frozen=True)
class Envelope:
    """Extremes over combinations of every measure, and which combination gives each.

    ``governing`` is the index of the combination with the largest magnitude.
    """

    maximum: NDArray[np.float64]
    minimum: NDArray[np.float64]
    max_index: NDArray[np.intp]
    min_index: NDArray[np.intp]
    governing: NDArray[np.intp]
    extreme: NDArray[np.float64] = field(repr=False)

    def names(self, combos: Sequence[Combination], which: str = "governing") -> NDArray[np.str_]:
        """The names of the governing (or "max" / "min") combinations, shaped like a measure."""
        index = {"governing": self.governing, "max": self.max_index, "min": self.min_index}
        if which not in index:
            raise InputError("which", which, "'governing', 'max' or 'min'")
        labels = np.array([combo.name for combo in combos], dtype=object)
        return labels[index[which]].astype(str)


def envelope(combined: ArrayLike) -> Envelope:
    """Envelope over the first axis (combinations) of :func:`combine_numeric`'s result."""
    values = np.asarray(combined, dtype=float)
    if values.ndim == 0 or values.shape[0] == 0:
        raise InputError("combined", f"shape {values.shape}", "at least one combination")
    governing = np.argmax(np.abs(values), axis=0)
    return Envelope(
        maximum=values.max(axis=0),
        minimum=values.min(axis=0),
        max_index=np.argmax(values, axis=0),
        min_index=np.argmin(values, axis=0),
        governing=governing,
        extreme=np.take_along_axis(values, governing[np.newaxis, ...], axis=0)[0],
    )
