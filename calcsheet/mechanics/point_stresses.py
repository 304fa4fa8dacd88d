"""The stresses at the points of a section, written once for the sheet and for arrays.

:func:`point_stress_procedure` writes, for each stress point, the axial term N/A,
the bending terms (the unsymmetric form with I_xy, or the symmetric form when the
section has a symmetry axis), the transverse shear τzy and τzx on the cuts through
the point (V·Q/(I·b); a cut through no material gives none), the torsion term by
the section's rule (closed Bredt, open T·t_max/J, round T·r/J), the shear at the
point, σ1, σ2, τ_max and the von Mises stress. :func:`round_stress_procedure`
writes a round section by its resultant moment and shear instead (every diameter
is a principal axis). Each formula is a function of :mod:`calcsheet.mechanics.formulas`.

Both run against a writer (:mod:`calcsheet.engine.procedure`):

* on a sheet, once per point, the values are the sheet's symbols and the steps
  are named with the point's number (``sigma_z_3``, ``tau_zy_3``...);
* on arrays (:meth:`calcsheet.mechanics.stresses.StressModel.stresses`), once for
  all points together: point values of shape ``(n_points,)``, internal forces of
  shape ``(n_cases, 1)``, so every step is an ``(n_cases, n_points)`` array. A
  point without a cut has a zero first moment on a unit width there, which gives
  the zero the sheet leaves out.

Open sections with a warping model (I, channel, tee, angle) may be given the twist
at the station (:class:`TwistTerms`: φ′, φ″, φ‴ of the torsion differential
equation, AISC Design Guide 9) and each point its warping values
(:class:`PointWarping`): the point then takes the warping normal stress
σ_w = E·Wn·φ″ into σ, and its torsional shear is the St Venant shear G·t·φ′ of the
wall it lies on plus the warping shear −E·Sw·φ‴/t, both by magnitude (their
directions along the wall are not tracked: conservative), in place of T·t_max/J.
Wn is the mid-line value Design Guide 9 tabulates (see :class:`PointWarping`).

The writers live in the engine; a caller passes one in, so importing
:mod:`calcsheet.mechanics` stays light.
"""

from __future__ import annotations

from collections.abc import Mapping, Sequence
from dataclasses import dataclass, field
from typing import TYPE_CHECKING, Any

from calcsheet.mechanics import formulas

if TYPE_CHECKING:
    from calcsheet.engine.procedure import Writer

# A value in the procedure: a sheet symbol (or expression) or a float / numpy array.
Value = Any
# A decision: a bool (sheet) or a boolean array (arrays).
Flag = Any

FORCE_NAMES = ("N", "V_x", "V_y", "T", "M_x", "M_y")
HORIZONTAL_CUT, VERTICAL_CUT = "zy", "zx"

SHEAR_TEXT = (
    "Shear: {tau_zy} is the average over the horizontal cut through the point and {tau_zx} "
    "the average over the vertical cut ({tau} = {V}·{Q}/({I}·{b}) in its general "
    "unsymmetric form, {Q} of "
    "the part cut off). On an open section a cut is the stretch of material through the "
    "point and Q is of the part that stretch cuts off; a cut that meets no material at the "
    "point (a free face or toe) carries no shear. At a re-entrant corner the two cuts "
    "cross two different walls and the larger of the two is taken. The torsional shear "
    "{tau_T} is added to the transverse shear by magnitude because its direction along the "
    "wall is not tracked (conservative)."
)
COMBINED_TEXT = (
    "At each point: {sigma_1}, {sigma_2} = {sigma}/2 ± √(({sigma}/2)² + {tau}²), "
    "{tau_max} = √(({sigma}/2)² + {tau}²) (shown in the summary table) and the von Mises "
    "stress {sigma_vm} = √({sigma}² + 3·{tau}²) (shown below)."
)
ROUND_FIBRES = (
    ("extreme fibre on the tension side of {M_r}", 1),
    ("extreme fibre on the compression side of {M_r}", -1),
)


@dataclass(frozen=True)
class ForceTerms:
    """The internal forces at the cut as writer values (signs of :mod:`.statics`)."""

    N: Value
    V_x: Value
    V_y: Value
    T: Value
    M_x: Value
    M_y: Value

    @classmethod
    def of(cls, values: Mapping[str, Value]) -> ForceTerms:
        """From a mapping with the keys N, V_x, V_y, T, M_x, M_y."""
        return cls(*(values[name] for name in FORCE_NAMES))


@dataclass(frozen=True)
class SectionTerms:
    """The section's values the stresses use, as writer values.

    ``I_xy`` and ``D`` (= I_x·I_y − I_xy²) are ``None`` for a section with a symmetry
    axis: the symmetric forms are written. ``torsion`` is the kind of the section's
    torsion rule (:mod:`calcsheet.mechanics.torsion`): "closed" uses ``t`` and ``A_m``,
    "open" uses ``t_max``, "round" the radius of each point. ``length_unit`` is the
    unit a sheet shows a point's radius in.
    """

    A: Value
    I_x: Value
    I_y: Value
    J: Value
    torsion: str
    I_xy: Value | None = None
    D: Value | None = None
    t: Value | None = None
    A_m: Value | None = None
    t_max: Value | None = None
    length_unit: str | None = None


@dataclass(frozen=True)
class Cut:
    """A cut through a point: Q of the part cut off about the cut's own axis and the other.

    Horizontal cut (τzy): ``Q_own`` = ∫y dA and ``Q_other`` = ∫x dA of the part above,
    ``width`` b. Vertical cut (τzx): ``Q_own`` = ∫x dA and ``Q_other`` = ∫y dA of the
    part to the right, ``width`` t. ``Q_other`` ``None`` leaves its term out (zero, on
    a section with a symmetry axis).
    """

    Q_own: Value
    Q_other: Value | None
    width: Value


# AISC Design Guide 9 (Torsional Analysis of Structural Steel Members), Chapter 4.
WARPING_REFERENCE = "AISC Design Guide 9, Torsional Analysis of Structural Steel Members"
WARPING_TEXT = (
    "Torsion of the open section with warping: at each point the warping normal stress "
    "{sigma_w} = {E}·{W_n}·φ″ is added to the normal stress, and the torsional shear is the "
    "St Venant shear {tau_t} = {G}·{t_w}·φ′ of the wall through the point plus the warping "
    "shear {tau_w} = −{E}·{S_w}·φ‴/{t_w}, added by magnitude because their directions along "
    "the wall are not tracked (conservative). {W_n} is the normalized warping function on "
    "the wall mid-line at the point and {S_w} the warping statical moment of the part of "
    "the wall cut off beyond it, as AISC Design Guide 9 (Torsional Analysis of Structural "
    "Steel Members) tabulates them."
)


@dataclass(frozen=True)
class TwistTerms:
    """The twist derivatives φ′, φ″, φ‴ at the station with E and G (writer values)."""

    phi_1: Value
    phi_2: Value
    phi_3: Value
    E: Value
    G: Value


@dataclass(frozen=True)
class PointWarping:
    """A point's mid-line warping function Wn, warping statical moment Sw and wall t.

    Wn is the mid-line value (Design Guide 9's W_no at a flange tip, not the value at
    the outer face, which differs by t_f/h_0): the thin-walled theory the twist
    derivatives come from is a mid-line theory, and the tables a checker compares
    with give the mid-line values.
    """

    Wn: Value
    Sw: Value
    t: Value


@dataclass(frozen=True)
class PointTerms:
    """One stress point (a sheet) or all of them (arrays): number, label, x, y, cuts.

    ``cuts`` maps "zy" (the horizontal cut) and "zx" (the vertical cut) to the cuts
    that pass through material at the point; ``junction`` says the point is a
    re-entrant corner where two walls meet.
    """

    number: str
    label: str
    x: Value
    y: Value
    cuts: Mapping[str, Cut]
    junction: Flag = False
    # False: evaluated step by step but not printed (the sheet's table shows it).
    shown: bool = True
    # The warping values at the point (open sections with a warping model), or None.
    warping: PointWarping | None = None


@dataclass(frozen=True)
class RoundTerms:
    """A round section's outside radius, and Q and width of the cut through the centroid."""

    R_o: Value
    Q_0: Value
    b_0: Value


@dataclass
class PointRecord:
    """The values written for one point (or all points, on arrays), by term.

    Terms: sigma_N, sigma_Mx, sigma_My (round: sigma_b), sigma_w (with warping), sigma,
    tau_zy, tau_zx (those of the cuts through material; round: tau_V), tau_t and tau_w
    (with warping), tau_T, tau, sigma_1, sigma_2, tau_max, sigma_vm.
    """

    number: str
    label: str
    terms: dict[str, Value] = field(default_factory=dict)


def point_stress_procedure(
    w: Writer,
    points: Sequence[PointTerms],
    forces: ForceTerms,
    section: SectionTerms,
    twist: TwistTerms | None = None,
) -> list[PointRecord]:
    """The stresses at every point (module docstring); one record per point given.

    Steps: ``sigma_N`` and, for closed and open sections, ``tau_T`` once; per point
    n ``sigma_Mx_n``, ``sigma_My_n``, ``sigma_w_n`` (with ``twist``), ``sigma_z_n``,
    ``tau_zy_n``/``tau_zx_n`` (the cuts through material), ``r_n`` and ``tau_T_n``
    (round), ``tau_t_n``, ``tau_w_n`` and ``tau_T_n`` (with ``twist``), ``tau_n``, then
    :func:`combined_stress_procedure`. With ``twist`` every point must carry its
    :class:`PointWarping`: the warping stresses of Design Guide 9 replace T·t_max/J.
    """
    stress = w.unit("stress")
    w.heading("Stresses at the points of the section")
    w.text(SHEAR_TEXT)
    if twist is not None:
        w.text(WARPING_TEXT)
    w.text(COMBINED_TEXT)
    sigma_N = w.step(
        "sigma_N",
        formulas.axial_stress(forces.N, section.A),
        "Axial term, {N}/{A} (same at every point)",
        unit=stress,
    )
    tau_T_common = None if twist is not None else _common_torsion(w, forces.T, section, stress)
    records = []
    outer = w
    for point in points:
        w = outer if point.shown else outer.quietly()
        n = point.number
        record = PointRecord(n, point.label)
        w.heading(f"Point {n}: {point.label}", level=2)
        sigma_Mx, sigma_My = _bending_terms(w, point, forces, section, stress)
        normal = sigma_N + sigma_Mx + sigma_My
        warping = point.warping if twist is not None else None
        if twist is not None and warping is None:
            raise ValueError(f"point {n} has no warping values for the twist given")
        if twist is not None and warping is not None:
            sigma_w = w.step(
                f"sigma_w_{n}",
                twist.E * warping.Wn * twist.phi_2,
                "Warping normal stress, {E}·{W_n}·φ″",
                unit=stress,
                reference=WARPING_REFERENCE,
            )
            normal = normal + sigma_w
            record.terms["sigma_w"] = sigma_w
        sigma = w.step(f"sigma_z_{n}", normal, "Normal stress (sum)", unit=stress)
        record.terms.update(sigma_N=sigma_N, sigma_Mx=sigma_Mx, sigma_My=sigma_My, sigma=sigma)
        transverse = []
        for cut_name, cut in point.cuts.items():
            term = _shear_term(w, cut_name, n, cut, forces, section, stress)
            transverse.append(term)
            record.terms[f"tau_{cut_name}"] = term
        if twist is not None and warping is not None:
            tau_T = _warping_shear(w, n, warping, twist, record, stress)
        elif tau_T_common is None:  # round: τ = T·r/J at the point's radius
            r = w.step(
                f"r_{n}",
                formulas.resultant(w, point.x, point.y),
                "Radius of the point",
                unit=section.length_unit,
            )
            tau_T = w.step(
                f"tau_T_{n}",
                formulas.torsion_stress_round(forces.T, r, section.J),
                "Torsion, {T}·{r}/{J}",
                unit=stress,
            )
        else:
            tau_T = tau_T_common
        record.terms["tau_T"] = tau_T
        record.terms["tau"] = w.step(
            f"tau_{n}",
            formulas.shear_at_point(w, transverse, tau_T, point.junction),
            "Shear stress at the point",
            unit=stress,
        )
        combined_stress_procedure(w, record)
        records.append(record)
    return records


def _warping_shear(
    w: Writer,
    n: str,
    warping: PointWarping,
    twist: TwistTerms,
    record: PointRecord,
    stress: str | None,
) -> Value:
    """St Venant shear G·t·φ′ and warping shear −E·Sw·φ‴/t at a point, and their sum.

    AISC Design Guide 9, Torsional Analysis of Structural Steel Members, Section 4.1
    (τ_t = G·t·θ′, τ_ws = −E·Sw·θ‴/t; section numbers from memory). The two are added
    by magnitude: their directions along the wall are not tracked (conservative).
    """
    tau_t = w.step(
        f"tau_t_{n}",
        twist.G * warping.t * twist.phi_1,
        "St Venant shear of the wall, {G}·{t_w}·φ′",
        unit=stress,
        reference=WARPING_REFERENCE,
    )
    tau_w = w.step(
        f"tau_w_{n}",
        -twist.E * warping.Sw * twist.phi_3 / warping.t,
        "Warping shear, −{E}·{S_w}·φ‴/{t_w}",
        unit=stress,
        reference=WARPING_REFERENCE,
    )
    record.terms.update(tau_t=tau_t, tau_w=tau_w)
    return w.step(
        f"tau_T_{n}",
        w.absolute(tau_t) + w.absolute(tau_w),
        "Torsional shear, |{tau_t}| + |{tau_w}|",
        unit=stress,
    )


def _common_torsion(w: Writer, T: Value, section: SectionTerms, stress: str | None) -> Value:
    """τ_T of a closed or open section (the same at every point); ``None`` for a round one."""
    if section.torsion == "closed":
        return w.step(
            "tau_T",
            formulas.torsion_stress_closed(T, section.A_m, section.t),
            "Torsion, {T}/(2·{A_m}·{t})",
            unit=stress,
        )
    if section.torsion == "open":
        return w.step(
            "tau_T",
            formulas.torsion_stress_open(T, section.t_max, section.J),
            "Torsion, {T}·{t_max}/{J}",
            unit=stress,
        )
    return None


def _bending_terms(
    w: Writer, point: PointTerms, forces: ForceTerms, section: SectionTerms, stress: str | None
) -> tuple[Value, Value]:
    n, x, y = point.number, point.x, point.y
    inertia = (section.I_x, section.I_y, section.I_xy, section.D)
    sigma_Mx = w.step(
        f"sigma_Mx_{n}",
        formulas.bending_stress_x(forces.M_x, x, y, *inertia),
        "Term from {M_x}",
        unit=stress,
    )
    sigma_My = w.step(
        f"sigma_My_{n}",
        formulas.bending_stress_y(forces.M_y, x, y, *inertia),
        "Term from {M_y}",
        unit=stress,
    )
    return sigma_Mx, sigma_My


def _shear_term(
    w: Writer,
    cut_name: str,
    n: str,
    cut: Cut,
    forces: ForceTerms,
    section: SectionTerms,
    stress: str | None,
) -> Value:
    """τzy (horizontal cut, part above) or τzx (vertical cut, part to the right)."""
    if cut_name == HORIZONTAL_CUT:
        where = "horizontal cut, part above"
        V_own, V_other, I_own, I_other = forces.V_y, forces.V_x, section.I_x, section.I_y
    else:
        where = "vertical cut, part to the right"
        V_own, V_other, I_own, I_other = forces.V_x, forces.V_y, section.I_y, section.I_x
    expr = formulas.transverse_shear(
        V_own, V_other, cut.Q_own, cut.Q_other, cut.width, I_own, I_other, section.I_xy, section.D
    )
    description = f"Transverse shear on the {where} ({{V}}·{{Q}}/({{I}}·{{b}}))"
    return w.step(f"tau_{cut_name}_{n}", expr, description, unit=stress)


def combined_stress_procedure(w: Writer, record: PointRecord) -> None:
    """Principal stresses and maximum shear (table only), and the von Mises stress.

    Plane stress at a point of a member (σ along the axis, τ on the cross-section):
    σ1,2 = σ/2 ± √((σ/2)² + τ²), τ_max = √((σ/2)² + τ²), σ_vm = √(σ² + 3·τ²)
    (Mohr's circle and the von Mises criterion, common practice, no source).
    """
    n, stress = record.number, w.unit("stress")
    sigma, tau = record.terms["sigma"], record.terms["tau"]
    radius = formulas.mohr_radius(w, sigma, tau)
    record.terms["sigma_1"] = w.step(
        f"sigma_1_{n}",
        formulas.major_principal_stress(sigma, radius),
        "Major principal stress",
        unit=stress,
        shown=False,
    )
    record.terms["sigma_2"] = w.step(
        f"sigma_2_{n}",
        formulas.minor_principal_stress(sigma, radius),
        "Minor principal stress",
        unit=stress,
        shown=False,
    )
    record.terms["tau_max"] = w.step(
        f"tau_max_{n}", radius, "Maximum in-plane shear stress", unit=stress, shown=False
    )
    record.terms["sigma_vm"] = w.step(
        f"sigma_vm_{n}", formulas.von_mises_stress(w, sigma, tau), "Von Mises stress", unit=stress
    )


def round_stress_procedure(
    w: Writer, forces: ForceTerms, section: SectionTerms, round_terms: RoundTerms
) -> list[PointRecord]:
    """The two extreme fibres of a round section, by the resultant moment and shear.

    Every diameter of a round section is a principal axis, so the bending stress
    peaks at the two ends of the diameter normal to the resultant moment,
    σ = N/A ± M_r·R_o/I with M_r = √(M_x² + M_y²); the transverse shear peaks on the
    neutral axis of the resultant shear V_res = √(V_x² + V_y²): τ_V = V_res·Q_0/(I·b_0);
    torsion τ_T = T·R_o/J; both fibres take τ = τ_V + |τ_T| (the largest shear,
    wherever it acts: conservative). Steps ``M_r``, ``V_res``, ``sigma_N``, ``sigma_b``,
    ``tau_V``, ``tau_T``, ``tau``, then ``sigma_z_1``/``sigma_z_2`` and
    :func:`combined_stress_procedure` for the fibres 1 (tension side) and 2.
    """
    stress = w.unit("stress")
    R_o, I = round_terms.R_o, section.I_x
    M_r = w.step("M_r", formulas.resultant(w, forces.M_x, forces.M_y), "Resultant bending moment")
    V_r = w.step(
        "V_res", formulas.resultant(w, forces.V_x, forces.V_y), "Resultant transverse shear"
    )
    sigma_N = w.step(
        "sigma_N", formulas.axial_stress(forces.N, section.A), "Axial term, {N}/{A}", unit=stress
    )
    # Bending about the diameter normal to M_r (a principal axis), at the fibre y = R_o.
    sigma_b = w.step(
        "sigma_b",
        formulas.bending_stress_x(M_r, 0, R_o, I, I, None, None),
        "Bending term at the extreme fibre",
        unit=stress,
    )
    # V_r·Q_0/(I·b_0): the shear along the resultant on the cut through the centroid.
    tau_V = w.step(
        "tau_V",
        formulas.transverse_shear(V_r, 0, round_terms.Q_0, None, round_terms.b_0, I, I, None, None),
        "Transverse shear, largest",
        unit=stress,
    )
    tau_T = w.step(
        "tau_T",
        formulas.torsion_stress_round(forces.T, R_o, section.J),
        "Torsion at the outside radius, {T}·{R_o}/{J}",
        unit=stress,
    )
    # One transverse term: |τ_V| + |τ_T| (τ_V is not negative).
    tau = w.step(
        "tau",
        formulas.shear_at_point(w, [tau_V], tau_T, False),
        "Shear stress taken at both fibres",
        unit=stress,
    )
    records = []
    for index, (label, sign) in enumerate(ROUND_FIBRES, start=1):
        n = str(index)
        w.heading(f"Point {n}: {label}", level=2)
        expr = sigma_N + sigma_b if sign > 0 else sigma_N - sigma_b
        sigma = w.step(f"sigma_z_{n}", expr, "Normal stress (sum)", unit=stress)
        record = PointRecord(n, label)
        record.terms.update(
            sigma_N=sigma_N, sigma_b=sigma_b, sigma=sigma, tau_V=tau_V, tau_T=tau_T, tau=tau
        )
        combined_stress_procedure(w, record)
        records.append(record)
    return records
