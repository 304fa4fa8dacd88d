"""The laterally unbraced length Lb and the factor Cb of the AISC 360-22 member procedure.

Each is labelled on the sheet as given or defaulted (and from what). For a
cantilever I-shape, the load height on the section (top flange, shear centre,
bottom flange) and the restraint at the free tip choose an effective length
Lb = k·L from the effective length factors for cantilevers of the SSRC Guide
(:data:`CANTILEVER_FACTORS`), used in Chapter F with Cb = 1.0, as the AISC 360-22
Commentary to Section F1 takes Cb for a cantilever with an unbraced free end.
A given Lb longer than the member, and Cb > 1.0 on a cantilever, are warned of on
the sheet.
"""

from __future__ import annotations

from dataclasses import dataclass

from calcsheet.engine.procedure import Value, Writer
from calcsheet.errors import InputError
from calcsheet.standards.aisc360.inputs import MemberInputs

LOAD_HEIGHTS = ("top flange", "shear centre", "bottom flange")
TIP_RESTRAINTS = ("free", "laterally braced", "torsionally restrained")
_ALIASES = {"shear center": "shear centre"}
SSRC_GUIDE = (
    "SSRC Guide to Stability Design Criteria for Metal Structures, 6th ed. (R. D. Ziemian, "
    "ed., Wiley, 2010), Chapter 5: effective length factors for cantilevers (after Nethercot)"
)
SSRC_REFERENCE = "SSRC Guide (2010), Chapter 5, cantilevers"
COMMENTARY_F1 = "AISC 360-22 Commentary to Section F1"

# Effective length factor k (Lb = k·L) of a cantilever built in at its support
# (restrained laterally, torsionally and against rotation on plan), by the tip's
# restraint and the height of the load: "top flange" (destabilising) or any other
# height (shear centre, bottom flange: the Guide lists one column for "all other
# loading"). Values of the SSRC Guide's table for cantilevers after Nethercot, typed
# from memory (the same values appear in BS 5950-1 Table 14, support case d, from memory).
CANTILEVER_FACTORS = {
    ("free", "top flange"): 1.4,
    ("free", "other"): 0.8,
    ("laterally braced", "top flange"): 1.4,
    ("laterally braced", "other"): 0.7,
    ("torsionally restrained", "top flange"): 0.6,
    ("torsionally restrained", "other"): 0.6,
}
FLANGED_KINDS = ("I",)


@dataclass(frozen=True)
class LateralBracing:
    """What decides Lb and Cb: whether each was given, and the cantilever's inputs.

    ``cantilever``: the member is fixed at one end and free at the other (the member
    sheet's model). ``load_height`` and ``tip_restraint`` are None when not given.
    """

    Lb_given: bool = True
    Cb_given: bool = True
    cantilever: bool = False
    load_height: str | None = None
    tip_restraint: str | None = None
    # An I-shape: the load height matters (top flange loading is destabilising).
    flanged: bool = False
    # How a defaulted Lb or Cb was found, when the caller found it (from the brace
    # points and the moment diagram of a member on supports); "" when not.
    Lb_source: str = ""
    Cb_source: str = ""

    @property
    def uses_table(self) -> bool:
        """Lb defaulted from the cantilever table (a load height or tip restraint given)."""
        return (
            self.cantilever
            and not self.Lb_given
            and (self.load_height is not None or self.tip_restraint is not None)
        )

    @property
    def height(self) -> str:
        """The load height the table is read with (top flange when not given: conservative)."""
        return self.load_height or "top flange"

    @property
    def tip(self) -> str:
        """The tip restraint the table is read with (free when not given: conservative)."""
        return self.tip_restraint or "free"

    @property
    def factor(self) -> float:
        """k of :data:`CANTILEVER_FACTORS` for this height and tip."""
        column = "top flange" if self.height == "top flange" else "other"
        return CANTILEVER_FACTORS[(self.tip, column)]


def load_height_choice(value: str | None, field: str = "check.load_height") -> str | None:
    """One of :data:`LOAD_HEIGHTS` ("shear center" accepted), or None; else InputError."""
    return _choice(value, LOAD_HEIGHTS, field)


def tip_restraint_choice(value: str | None, field: str = "check.tip_restraint") -> str | None:
    """One of :data:`TIP_RESTRAINTS`, or None; else InputError."""
    return _choice(value, TIP_RESTRAINTS, field)


def _choice(value: str | None, choices: tuple[str, ...], field: str) -> str | None:
    if value is None:
        return None
    text = " ".join(str(value).strip().lower().replace("_", " ").split())
    text = _ALIASES.get(text, text)
    if text not in choices:
        raise InputError(field, value, "one of: " + ", ".join(choices))
    return text


def lateral_bracing(
    kind: str,
    *,
    Lb_given: bool,
    Cb_given: bool,
    cantilever: bool,
    load_height: str | None,
    tip_restraint: str | None,
    sources: tuple[str, str] = ("", ""),
) -> LateralBracing:
    """Checked bracing inputs; a load height or tip restraint on a section without
    flanges is an InputError naming the key."""
    height = load_height_choice(load_height)
    tip = tip_restraint_choice(tip_restraint)
    for field, value in (("check.load_height", height), ("check.tip_restraint", tip)):
        if value is not None and kind not in FLANGED_KINDS:
            raise InputError(
                field,
                value,
                "no value for a section without flanges (HSS, round HSS or pipe, angle): "
                "leave it out and give L_b if the unbraced length is not the member length",
                "the cantilever effective lengths by load height and tip restraint are for "
                "I-shapes (flanges)",
            )
    return LateralBracing(
        Lb_given, Cb_given, cantilever, height, tip, kind in FLANGED_KINDS, *sources
    )


def write_bracing_inputs(w: Writer, inputs: MemberInputs, bracing: LateralBracing) -> None:
    """Lb and Cb with their labels (given or defaulted), the cantilever factor and warnings."""
    length = w.unit("length")
    L = w["L"]
    if bracing.uses_table:
        k = w.input(
            "k_LTB",
            bracing.factor,
            _factor_description(bracing),
            reference=SSRC_REFERENCE,
            dimension="dimensionless",
            fixed=(
                "read from the cantilever table by the load height and the tip restraint: "
                "change those, or give L_b"
            ),
        )
        w.step(
            "L_b",
            k * L,
            "Laterally unbraced length: defaulted (from the effective length of a cantilever, k·L)",
            unit=length,
            reference=SSRC_REFERENCE,
        )
        if w.prints:
            w.sheet.add_reference(SSRC_GUIDE)
            w.text(
                "Caution: {L_b} is the effective length of a cantilever built in at its support, "
                f"for a load on the {bracing.height} with the tip {bracing.tip} "
                f"(k = {bracing.factor:g}; the SSRC Guide, Chapter 5, after Nethercot), "
                "used in Chapter F with {C_b} = 1.0. The factors assume full lateral, torsional "
                "and warping restraint at the support; a support that lets the member twist or "
                "move sideways needs a much longer effective length. Give {L_b} to override."
            )
    else:
        source = (
            f"defaulted ({bracing.Lb_source})"
            if bracing.Lb_source
            else "given"
            if bracing.Lb_given
            else "defaulted (from the member length L)"
        )
        w.input(
            "L_b", inputs.L_b, f"Laterally unbraced length: {source}", dimension="length",
            computed=bool(bracing.Lb_source),
        )  # fmt: skip
        if w.prints:
            _warn_length(w, inputs, bracing)
    _write_cb(w, inputs, bracing)


def _factor_description(bracing: LateralBracing) -> str:
    height = bracing.height + ("" if bracing.load_height else ", defaulted")
    tip = bracing.tip + ("" if bracing.tip_restraint else ", defaulted")
    return f"Effective length factor of the cantilever (load on the {height}; tip {tip})"


def _warn_length(w: Writer, inputs: MemberInputs, bracing: LateralBracing) -> None:
    if bracing.Lb_given and not bracing.Lb_source and inputs.L_b > inputs.length:
        w.text(
            "WARNING: the given {L_b} is longer than the member length {L}. Check the input: an "
            "unbraced length longer than the member is an effective length, which Chapter F "
            "does not define."
        )
    if bracing.cantilever and bracing.flanged and not bracing.Lb_given:
        w.text(
            "Caution: on a cantilever, {L_b} = {L} is unconservative for a load applied on the "
            "top flange of an I-shape (the SSRC Guide, Chapter 5, gives effective lengths up to "
            "1.4·{L} for a built-in cantilever with a free tip). Give the load height and the "
            "tip restraint, or {L_b}."
        )


def _write_cb(w: Writer, inputs: MemberInputs, bracing: LateralBracing) -> Value:
    if bracing.Cb_source:
        description = (
            f"Lateral-torsional buckling modification factor: defaulted ({bracing.Cb_source})"
        )
    elif bracing.Cb_given:
        description = "Lateral-torsional buckling modification factor: given"
    elif bracing.cantilever and bracing.tip_restraint not in (None, "free"):
        description = (
            "Lateral-torsional buckling modification factor: defaulted (1.0, the least "
            "Eq. F1-1 gives, with the cantilever's effective length)"
        )
    elif bracing.cantilever:
        description = (
            "Lateral-torsional buckling modification factor: defaulted (1.0 for a cantilever "
            "with an unbraced free end, AISC 360-22 Commentary to Section F1)"
        )
    else:
        description = (
            "Lateral-torsional buckling modification factor: defaulted (1.0, the least "
            "Eq. F1-1 gives)"
        )
    C_b = w.input(
        "C_b",
        inputs.C_b,
        description,
        reference="AISC 360-22 Section F1" + (f"; {COMMENTARY_F1}" if bracing.cantilever else ""),
        dimension="dimensionless",
        computed=bool(bracing.Cb_source),
    )
    if w.prints and bracing.cantilever and inputs.C_b > 1.0:
        w.text(
            f"WARNING: {{C_b}} = {inputs.C_b:g} > 1.0 on a cantilever. The AISC 360-22 "
            "Commentary to Section F1 takes {C_b} = 1.0 for cantilevers with an unbraced free "
            "end; a larger {C_b} needs a justification for this member (bracing of the tip, a "
            "published solution)."
        )
    return C_b
