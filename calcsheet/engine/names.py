"""Symbol names: what a calc author may call a quantity, and how the name is typeset.

A name is a base and optional subscripts joined by underscores: ``P``, ``P_x``,
``sigma_max``, ``phi_c``, ``tau_xy``, ``M_z``, ``F_y``. A Greek letter's English
name as base or subscript prints as the letter. The printers of all three
targets read the same :class:`SymbolName`, so they cannot disagree on a name.
"""

from __future__ import annotations

import re
from dataclasses import dataclass
from functools import lru_cache

from calcsheet.errors import DefinitionError

GREEK_LETTERS: dict[str, str] = {
    "alpha": "α",
    "beta": "β",
    "gamma": "γ",
    "delta": "δ",
    "epsilon": "ε",
    "zeta": "ζ",
    "eta": "η",
    "theta": "θ",
    "iota": "ι",
    "kappa": "κ",
    "lambda": "λ",
    "mu": "μ",
    "nu": "ν",
    "xi": "ξ",
    "pi": "π",
    "rho": "ρ",
    "sigma": "σ",
    "tau": "τ",
    "upsilon": "υ",
    "phi": "φ",
    "chi": "χ",
    "psi": "ψ",
    "omega": "ω",
    "Gamma": "Γ",
    "Delta": "Δ",
    "Theta": "Θ",
    "Lambda": "Λ",
    "Xi": "Ξ",
    "Pi": "Π",
    "Sigma": "Σ",
    "Phi": "Φ",
    "Psi": "Ψ",
    "Omega": "Ω",
}

_AXIS_LETTERS = set("xyzuvw")
_NAME = re.compile(r"^[A-Za-z][A-Za-z0-9]*(?:_[A-Za-z0-9]+)*$")
MAX_NAME_LENGTH = 32


@dataclass(frozen=True)
class NamePart:
    """One piece of a name: its text and whether it is a Greek letter's name."""

    text: str

    @property
    def greek(self) -> str | None:
        """The Greek letter this part names, or ``None``."""
        return GREEK_LETTERS.get(self.text)

    @property
    def upright(self) -> bool:
        """Subscript words (max, allow) print upright; letters and axis pairs (xy) italic."""
        if self.greek is not None or len(self.text) == 1 or self.text.isdigit():
            return False
        return not set(self.text) <= _AXIS_LETTERS


@dataclass(frozen=True)
class SymbolName:
    """A validated name split into base and subscripts."""

    name: str
    base: NamePart
    subscripts: tuple[NamePart, ...]


@lru_cache(maxsize=2048)
def parse_symbol_name(name: str) -> SymbolName:
    """Validate and split a symbol name; a bad name raises :class:`DefinitionError`."""
    if not isinstance(name, str) or not _NAME.match(name) or len(name) > MAX_NAME_LENGTH:
        raise DefinitionError(
            f"symbol name {name!r} is not usable: use letters and digits, starting with a "
            f"letter, with subscripts after underscores (P_x, sigma_max), at most "
            f"{MAX_NAME_LENGTH} characters"
        )
    base, *subscripts = name.split("_")
    return SymbolName(name, NamePart(base), tuple(NamePart(part) for part in subscripts))
