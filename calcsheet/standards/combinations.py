"""Load combinations: ASCE 7-22 / 7-16 (strength and allowable stress) and EN 1990 Eq. (6.10).

Load types (:data:`LOAD_TYPES`): ASCE 7 uses D, L, Lr, S, R, W and E; EN 1990 uses
G (permanent), Q (imposed), S (snow) and W (wind). :func:`combinations` lists the
basic combinations of a standard for the types present; :func:`combination_rules_text`
says in words how many were made and by which rules; :func:`user_combinations`
checks combinations an engineer writes; :func:`combine_numeric` applies factors
to forces by load type (vectorised) and :func:`envelope` finds the governing
combination of every measure.

Rules of the automatic list
---------------------------
* ASCE 7 2.3.1 / 2.4.1 require the effects of one or more loads not acting to be
  investigated: every companion variable load of a basic combination is taken both
  acting and not acting ("(Lr or S or R)" gives one combination per type present and
  one without any of them). Dead load always acts.
* Each combination has principal types (1.6L in 1.2D + 1.6L + 0.5S, W in 0.9D + 1.0W);
  it is skipped when no principal type has a load. D + 0.75L + 0.75(Lr or S or R)
  (ASD 4) has two principal groups, and at least one of them acts.
* EN 1990 Eq. (6.10), or Eq. (6.10a) and (6.10b) on request: each variable action leads
  in turn; each accompanying variable action is taken at γQ·ψ0 and also omitted (a
  favourable variable action takes γQ = 0, Table A1.2(B)); permanent actions at
  γG,sup = 1.35 and γG,inf = 1.00.
* With ``reverse_lateral``, wind (W) and earthquake (E) act both as given and reversed.
* Combinations that end with the same factors as an earlier one are listed once, and
  the count is bounded by :data:`MAX_COMBINATIONS`.

Seismic combinations (ASCE 7 2.3.6, 2.4.5) take E as the horizontal effect E_h and
fold the vertical effect E_v = 0.2·S_DS·D (ASCE 7 12.4.2.2) into the factor on D,
so ``S_DS`` is needed when E is present.

The factors are quoted from memory (see each reference) and should be read
against the standards when the project is reviewed.
"""

from __future__ import annotations

import itertools
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
PERMANENT_TYPES = ("D", "G")  # always acting: never left out of a combination
LATERAL_TYPES = ("W", "E")  # reversed too when the job asks (``reverse_lateral``)

# The most combinations one call may give. The largest sets the tables below can make
# are far smaller (all seven ASCE 7 types, both senses: 45 strength, 44 ASD; all four
# EN 1990 types with Eq. 6.10a/b and both senses: 63); the bound guards later tables.
MAX_COMBINATIONS = 300

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
# ψ0 of snow by site, EN 1990 Table A1.1 (from memory); the keys are our own names.
SNOW_SITES: dict[str, float] = {
    "H <= 1000 m": PSI0_SNOW,
    "H > 1000 m": PSI0_SNOW_HIGH,
    "Nordic": PSI0_SNOW_HIGH,  # Finland, Iceland, Norway, Sweden
}
_SNOW_SITE_WORDS = {
    "H <= 1000 m": "site at altitude H ≤ 1000 m",
    "H > 1000 m": "site at altitude H > 1000 m",
    "Nordic": "Finland, Iceland, Norway, Sweden",
}
# EN 1990 Table A1.2(B), set B (STR/GEO), recommended values (from memory).
GAMMA_G_SUP = 1.35
GAMMA_G_INF = 1.00
GAMMA_Q = 1.5
XI = 0.85  # reduction of unfavourable permanent actions in Eq. (6.10b), recommended
EN1990_EXPRESSIONS = ("6.10", "6.10a/b")


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
        """The combination as written: ``1.2D + 1.6L + 0.5S``, ``0.9D − W``."""
        pieces = []
        for load_type, value in self.factors.items():
            number = f"{abs(value):g}"
            term = f"{'' if number == '1' else number}{load_type}"
            if value < 0:
                pieces.append(f"− {term}" if pieces else f"−{term}")
            else:
                pieces.append(f"+ {term}" if pieces else term)
        return " ".join(pieces) if pieces else "0"


# --- tables of the standards -------------------------------------------------------------------


@dataclass(frozen=True)
class _Template:
    """A basic combination before expansion: groups of alternatives, some principal.

    A group lists alternative terms (type, factor), e.g. 0.5(Lr or S or R). A group
    of permanent types always acts; any other group may also not act. At least one
    ``principal`` group acts in every combination made from the template.
    """

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
    """ASCE 7 2.3.1 combinations 1-5 and 2.3.6 combinations 6-7 (factors from memory)."""
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
    """ASCE 7 2.4.1 combinations 1-7 and 2.4.5 combinations 8-10 (factors from memory)."""
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


def _types(
    types_present: Iterable[str], standard: str, load_names: Mapping[str, Sequence[str]] | None
) -> tuple[str, ...]:
    allowed = EN_TYPES if standard == EN_1990 else ASCE_TYPES
    present = []
    for load_type in types_present:
        if load_type not in allowed:
            names = [str(name) for name in (load_names or {}).get(load_type, ())]
            listed = ", ".join(repr(name) for name in names)
            problem = f"the type of load{'s' if len(names) > 1 else ''} {listed}" if names else ""
            raise InputError(
                "load type", load_type, f"for {standard}: one of {', '.join(allowed)}", problem
            )
        if load_type not in present:
            present.append(load_type)
    return tuple(present)


@dataclass(frozen=True)
class _Options:
    """The checked options of a combination set (see :func:`combinations`)."""

    S_DS: float | None
    imposed_category: str
    psi0: Mapping[str, float]  # ψ0 of Q, S and W in use (EN 1990)
    psi0_given: tuple[str, ...]  # the types whose ψ0 the caller gave
    reverse_lateral: bool
    en1990_expression: str
    snow_site: str


def _options(
    name: str,
    *,
    S_DS: float | None,
    imposed_category: str,
    psi0: Mapping[str, float] | None,
    reverse_lateral: bool,
    en1990_expression: str,
    snow_site: str,
    present: Sequence[str],
) -> _Options:
    if not isinstance(reverse_lateral, bool):
        raise InputError("reverse_lateral", reverse_lateral, "true or false")
    expression = str(en1990_expression).strip().replace(" ", "")
    expression = {"6.10a/6.10b": "6.10a/b", "6.10a,6.10b": "6.10a/b"}.get(expression, expression)
    if expression not in EN1990_EXPRESSIONS:
        raise InputError(
            "en1990_expression",
            en1990_expression,
            '"6.10" (EN 1990 Eq. 6.10) or "6.10a/b" (the less favourable of Eq. 6.10a and 6.10b)',
        )
    site = " ".join(str(snow_site).split())
    if site not in SNOW_SITES:
        raise InputError("snow_site", snow_site, f"one of {', '.join(map(repr, SNOW_SITES))}")
    category = str(imposed_category).strip().upper()
    if category not in PSI0_IMPOSED:
        raise InputError(
            "imposed_category",
            imposed_category,
            f"a category of EN 1990 Table A1.1: one of {', '.join(PSI0_IMPOSED)}",
        )
    if name != EN_1990 and psi0:
        raise InputError("psi0", dict(psi0), f"nothing for {name} (ψ0 belongs to EN 1990)")
    psi = {"Q": PSI0_IMPOSED[category], "S": SNOW_SITES[site], "W": PSI0_WIND}
    for load_type, value in (psi0 or {}).items():
        if load_type not in psi:
            raise InputError("psi0", load_type, "ψ0 of Q, S or W")
        try:
            number = float(value)
        except (TypeError, ValueError):
            number = math.nan
        if not (math.isfinite(number) and 0.0 <= number <= 1.0):
            raise InputError(f"psi0.{load_type}", value, "a factor ψ0 from 0 to 1")
        psi[load_type] = number
    if name != EN_1990 and "E" in present:
        bad = S_DS is None
        if not bad:
            try:
                bad = not (math.isfinite(float(S_DS)) and float(S_DS) >= 0)
            except (TypeError, ValueError):
                bad = True
        if bad:
            raise InputError(
                "S_DS",
                S_DS,
                "the design spectral acceleration S_DS (ASCE 7 11.4.5), a number ≥ 0",
                "E is present and E_v = 0.2·S_DS·D (12.4.2.2) enters the factor on D",
            )
    return _Options(
        S_DS=None if S_DS is None else float(S_DS),
        imposed_category=category,
        psi0=MappingProxyType(psi),
        psi0_given=tuple(psi0 or ()),
        reverse_lateral=reverse_lateral,
        en1990_expression=expression,
        snow_site=site,
    )


# --- the automatic list ------------------------------------------------------------------------


def combinations(
    standard: str,
    types_present: Iterable[str],
    *,
    S_DS: float | None = None,
    imposed_category: str = "A",
    psi0: Mapping[str, float] | None = None,
    reverse_lateral: bool = False,
    en1990_expression: str = "6.10",
    snow_site: str = "H <= 1000 m",
    load_names: Mapping[str, Sequence[str]] | None = None,
    max_count: int = MAX_COMBINATIONS,
) -> list[Combination]:
    """The basic combinations of ``standard`` for the load types that have loads.

    ``standard`` is one of :data:`STANDARDS` (case-insensitive; "ASCE 7-22 LRFD"
    and "EN 1990" are accepted too). ``S_DS`` (ASCE 7 11.4.5) is needed when E is
    present. ``reverse_lateral`` adds W and E reversed (−1 times their factor).
    For EN 1990: ``en1990_expression`` is "6.10" or "6.10a/b"; ``imposed_category``
    (A–H, Table A1.1) gives ψ0 of Q and ``snow_site`` (a key of :data:`SNOW_SITES`)
    ψ0 of S; ``psi0`` overrides ψ0 of Q, S or W (e.g. ``{"S": 0.7}``).
    ``load_names`` (type -> names of the loads of that type) lets an unknown type
    be reported with the loads that have it. Raises :class:`InputError` naming
    the key for an unknown type or option, an empty set or more than ``max_count``.
    """
    name = _standard(standard)
    present = _types(types_present, name, load_names)
    options = _options(
        name,
        S_DS=S_DS,
        imposed_category=imposed_category,
        psi0=psi0,
        reverse_lateral=reverse_lateral,
        en1990_expression=en1990_expression,
        snow_site=snow_site,
        present=present,
    )
    if name == EN_1990:
        made = _en_1990(present, options)
    else:
        made = [
            combo for template in _TEMPLATES[name] for combo in _expand(template, present, options)
        ]
    result = _distinct(made)
    if not result:
        raise InputError(
            "load types",
            ", ".join(present) or "none",
            f"loads of a type that {name} combines: "
            + ", ".join(EN_TYPES if name == EN_1990 else ASCE_TYPES),
            "no combination applies",
        )
    if len(result) > max_count:
        raise InputError(
            "reverse_lateral" if reverse_lateral else "load types",
            reverse_lateral if reverse_lateral else ", ".join(present),
            f"a set of at most {max_count} combinations (these give {len(result)}): "
            "fewer load types" + (", or reverse_lateral = false" if reverse_lateral else ""),
        )
    return result


def _distinct(made: Iterable[Combination]) -> list[Combination]:
    """The combinations in order, each set of factors once (the first name kept)."""
    seen: set[frozenset[tuple[str, float]]] = set()
    result = []
    for combo in made:
        key = frozenset(combo.factors.items())
        if key not in seen:
            seen.add(key)
            result.append(combo)
    return result


def _senses(term: tuple[str, float | str], options: _Options) -> list[tuple[str, float | str]]:
    """A term as given, and reversed for wind and earthquake when the job asks."""
    load_type, value = term
    if options.reverse_lateral and load_type in LATERAL_TYPES and isinstance(value, float):
        return [term, (load_type, -value)]
    return [term]


def _expand(template: _Template, present: Sequence[str], options: _Options) -> list[Combination]:
    """Every combination of one template: each variable group acting or not (ASCE 7 2.3.1)."""
    choices: list[list[tuple[tuple[str, float | str], ...]]] = []
    principal_at: list[int] = []  # positions in ``choices`` of the principal groups
    for index, group in enumerate(template.groups):
        available = [
            sense for term in group if term[0] in present for sense in _senses(term, options)
        ]
        if not available:
            continue
        acting: list[tuple[tuple[str, float | str], ...]] = [(term,) for term in available]
        permanent = all(load_type in PERMANENT_TYPES for load_type, _ in group)
        if index in template.principal:
            principal_at.append(len(choices))
        choices.append(acting if permanent else [*acting, ()])
    if not principal_at:
        return []
    result = []
    for choice in itertools.product(*choices):
        if not any(choice[at] for at in principal_at):
            continue  # no principal load acts: another template covers it
        factors = {
            load_type: _resolve_factor(value, options.S_DS)
            for option in choice
            for load_type, value in option
        }
        factors = {key: value for key, value in factors.items() if value != 0.0}
        if not factors:
            continue
        combo = Combination("", MappingProxyType(factors), template.reference)
        name = f"{template.reference} ({template.number}): {combo.text()}"
        result.append(Combination(name, combo.factors, template.reference))
    return result


def _resolve_factor(value: float | str, S_DS: float | None) -> float:
    if isinstance(value, float):
        return value
    base, rest = float(value[:3]), value[3:]
    # "1.2+0.2SDS" -> 1.2 + 0.2·S_DS (E_v of ASCE 7 12.4.2.2 acting with or against D)
    sign = 1.0 if rest[0] == "+" else -1.0
    coefficient = float(rest[1:].removesuffix("SDS"))
    return round(base + sign * coefficient * float(S_DS or 0.0), 12)


def _en_1990(present: Sequence[str], options: _Options) -> list[Combination]:
    """EN 1990 Eq. (6.10) or Eq. (6.10a) and (6.10b), Table A1.2(B) (set B, STR/GEO)."""
    variables = [load_type for load_type in ("Q", "S", "W") if load_type in present]
    permanent = "G" in present
    result: list[Combination] = []
    if options.en1990_expression == "6.10":
        if permanent:
            result.append(_en_combination("6.10", "", {"G": GAMMA_G_SUP}))
        result += _en_leading("6.10", GAMMA_G_SUP, variables, permanent, options)
        return result
    # Eq. (6.10a): permanent actions and every variable action at its combination value.
    for gamma_G in (GAMMA_G_SUP, GAMMA_G_INF):
        for factors in _en_accompanying({"G": gamma_G} if permanent else {}, variables, options):
            if set(factors) == {"G"} and gamma_G != GAMMA_G_SUP:
                continue  # permanent actions alone: 1.35G only
            result.append(_en_combination("6.10a", "", factors))
    # Eq. (6.10b): ξ·γG,sup on unfavourable permanent actions, one variable action leading.
    result += _en_leading("6.10b", round(XI * GAMMA_G_SUP, 12), variables, permanent, options)
    return result


def _en_leading(
    expression: str,
    gamma_G_sup: float,
    variables: Sequence[str],
    permanent: bool,
    options: _Options,
) -> list[Combination]:
    """Each variable action leading at γQ = 1.5, the others at γQ·ψ0 or omitted."""
    result = []
    for leading in variables:
        # Imposed loads on roofs (category H) are not combined with snow or wind
        # (EN 1991-1-1 3.3.2(1), from memory).
        roof_leading = leading == "Q" and options.imposed_category == "H"
        others = [] if roof_leading else [other for other in variables if other != leading]
        for gamma_G in (gamma_G_sup, GAMMA_G_INF):
            for sense in _senses((leading, GAMMA_Q), options):
                start = {"G": gamma_G} if permanent else {}
                start[leading] = float(sense[1])
                for factors in _en_accompanying(start, others, options):
                    result.append(_en_combination(expression, leading, factors))
    return result


def _en_accompanying(
    start: dict[str, float], others: Sequence[str], options: _Options
) -> list[dict[str, float]]:
    """``start`` with each accompanying action at γQ·ψ0 (either sense if asked) or omitted.

    A favourable variable action takes γQ = 0 (EN 1990 Table A1.2(B)), so each one
    is also left out. The sets with every action acting come first.
    """
    result = [dict(start)]
    for other in others:
        factor = round(GAMMA_Q * options.psi0[other], 12)
        if factor == 0.0:
            continue
        senses = [value for _, value in _senses((other, factor), options)]
        result = [{**factors, other: value} for factors in result for value in senses] + result
    return result


def _en_combination(expression: str, leading: str, factors: dict[str, float]) -> Combination:
    reference = f"EN 1990 Eq. ({expression}), Table A1.2(B)"
    combo = Combination("", MappingProxyType(factors), reference)
    role = f", {leading} leading" if leading else ""
    return Combination(
        f"EN 1990 Eq. ({expression}){role}: {combo.text()}", combo.factors, reference
    )


# --- the rules in words, for the sheet ---------------------------------------------------------


def combination_rules_text(
    standard: str,
    types_present: Iterable[str],
    *,
    S_DS: float | None = None,
    imposed_category: str = "A",
    psi0: Mapping[str, float] | None = None,
    reverse_lateral: bool = False,
    en1990_expression: str = "6.10",
    snow_site: str = "H <= 1000 m",
    load_names: Mapping[str, Sequence[str]] | None = None,
) -> str:
    """How many combinations :func:`combinations` gives, and by which rules, in words.

    Takes the same arguments; the text cites the clauses it applies, for a sheet.
    """
    types = list(types_present)
    combos = combinations(
        standard,
        types,
        S_DS=S_DS,
        imposed_category=imposed_category,
        psi0=psi0,
        reverse_lateral=reverse_lateral,
        en1990_expression=en1990_expression,
        snow_site=snow_site,
        load_names=load_names,
    )
    name = _standard(standard)
    present = _types(types, name, load_names)
    options = _options(
        name,
        S_DS=S_DS,
        imposed_category=imposed_category,
        psi0=psi0,
        reverse_lateral=reverse_lateral,
        en1990_expression=en1990_expression,
        snow_site=snow_site,
        present=present,
    )
    count = f"{len(combos)} load combination{'s' if len(combos) != 1 else ''}"
    loads = f"for the load types {', '.join(present)}"
    if name == EN_1990:
        return f"{count} of EN 1990:2002 {loads}. " + _en_rules(present, options)
    edition = " ".join(name.split()[:2])  # "ASCE 7-22"
    return f"{count} of {edition} {loads}. " + _asce_rules(name, present, options)


def _sense_words(options: _Options, lateral: str) -> str:
    verb = "act" if lateral.endswith("s") else "acts"
    if options.reverse_lateral:
        return f"{lateral} {verb} both as given and reversed (−1 times the factor)."
    return f"{lateral} {verb} in the sense given."


def _asce_rules(name: str, present: Sequence[str], options: _Options) -> str:
    edition = name.split(" ")[1]
    strength = name.endswith("strength")
    basic, seismic = ("2.3.1", "2.3.6") if strength else ("2.4.1", "2.4.5")
    design = "strength design" if strength else "allowable stress design"
    text = f"Basic combinations of ASCE {edition} {basic} ({design})"
    if "E" in present:
        text += (
            f" and {seismic} (with seismic load effects; E is the horizontal effect E_h and "
            f"the vertical effect E_v = 0.2·S_DS·D of 12.4.2.2 enters the factor on D, "
            f"S_DS = {options.S_DS:g})"
        )
    text += (
        f". As {basic} requires the effects of one or more loads not acting to be "
        "investigated, each variable load other than the principal one is taken both "
        "acting and not acting; dead load always acts; a combination whose principal "
        "load has no load in this job is not listed; repeated sets of factors are listed once. "
    )
    lateral = [{"W": "wind", "E": "earthquake"}[t] for t in LATERAL_TYPES if t in present]
    if lateral:
        words = " and ".join(lateral).capitalize() + (" loads" if len(lateral) > 1 else " load")
        text += _sense_words(options, words)
    return text.strip()


def _en_rules(present: Sequence[str], options: _Options) -> str:
    if options.en1990_expression == "6.10":
        text = (
            "Fundamental combinations of Eq. (6.10) with the partial factors of Table A1.2(B) "
            f"(set B): permanent actions at γG,sup = {GAMMA_G_SUP:.2f} and, where favourable, "
            f"γG,inf = {GAMMA_G_INF:.2f}; each variable action leading in turn at "
            f"γQ = {GAMMA_Q:.2f}, the others accompanying at γQ·ψ0."
        )
    else:
        text = (
            "Fundamental combinations of Eq. (6.10a) and Eq. (6.10b), the less favourable "
            "governing, with the partial factors of Table A1.2(B) (set B): Eq. (6.10a) "
            f"with permanent actions at γG,sup = {GAMMA_G_SUP:.2f} (γG,inf = {GAMMA_G_INF:.2f} "
            "where favourable) and every variable action at γQ·ψ0; Eq. (6.10b) with "
            f"ξ·γG,sup = {XI:g}·{GAMMA_G_SUP:.2f} (γG,inf = {GAMMA_G_INF:.2f} where "
            f"favourable) and each variable action leading in turn at γQ = {GAMMA_Q:.2f}, "
            "the others at γQ·ψ0."
        )
    text += (
        " A favourable variable action takes γQ = 0 (Table A1.2(B)), so each accompanying "
        "variable action is also omitted; repeated sets of factors are listed once."
    )
    psi_words = []
    for load_type in ("Q", "S", "W"):
        if load_type not in present:
            continue
        value = options.psi0[load_type]
        if load_type in options.psi0_given:
            source = "given for this job"
        elif load_type == "Q":
            source = f"Table A1.1, imposed load category {options.imposed_category}"
        elif load_type == "S":
            source = f"Table A1.1, snow, {_SNOW_SITE_WORDS[options.snow_site]}"
        else:
            source = "Table A1.1, wind"
        psi_words.append(f"ψ0 = {value:g} for {load_type} ({source})")
    if psi_words:
        text += " " + "; ".join(psi_words) + "."
    if "Q" in present and options.imposed_category == "H":
        text += (
            " Imposed loads on roofs (category H) are not combined with snow or wind "
            "(EN 1991-1-1 3.3.2(1))."
        )
    if "W" in present:
        text += " " + _sense_words(options, "Wind actions")
    return text


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
