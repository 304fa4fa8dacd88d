"""The AISC 360-22 member checks on arrays: many sections by many load combinations at once.

The procedure is the sheet's own, :func:`~calcsheet.standards.aisc360.member.aisc_member_procedure`,
run by an :class:`~calcsheet.engine.procedure.ArrayWriter`: every clause is
evaluated with :meth:`Clause.numeric` in SI base units (m, N, Pa) and every
decision the sheet settles from its values (classification, which equations
apply) is taken per element with ``numpy.where``. Section values have shape
``(n, 1)`` and demands shape ``(m,)``, so each check gives an ``(n, m)`` array.

A section outside the scope of the checks (see :func:`scope_problem`) gets an
infinite utilization, so a search never picks it.
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass

import numpy as np
import pint

from calcsheet.engine.procedure import ArrayWriter
from calcsheet.errors import InputError
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360.factors import design_method
from calcsheet.standards.aisc360.inputs import A992, Steel, parse_member_inputs
from calcsheet.standards.aisc360.member_lengths import lateral_bracing
from calcsheet.standards.aisc360.member_torsion import PointStressDemands
from calcsheet.standards.aisc360.second_order import K_FIXED_FREE
from calcsheet.standards.aisc360.section_data import SectionTable

Arrays = Mapping[str, np.ndarray]


@dataclass(frozen=True)
class DemandArrays:
    """Required strengths of ``m`` load combinations, SI base units (N, N·m), shape ``(m,)``.

    Same meaning and signs as :class:`~calcsheet.standards.aisc360.member.Demands`:
    P_r axial (tension positive), M_rx and M_ry moments about x and y, V_rx and V_ry
    shears along x and y; optional: T_r the torque (N·m) and ``stresses`` the largest
    and smallest normal stress and the largest shear stress over the section's points
    (Pa), each ``(m,)``.
    """

    P_r: np.ndarray
    M_rx: np.ndarray
    M_ry: np.ndarray
    V_rx: np.ndarray
    V_ry: np.ndarray
    T_r: np.ndarray | None = None
    stresses: PointStressDemands | None = None

    @classmethod
    def from_quantities(
        cls,
        P_r: pint.Quantity,
        M_rx: pint.Quantity,
        M_ry: pint.Quantity,
        V_rx: pint.Quantity,
        V_ry: pint.Quantity,
        T_r: pint.Quantity | None = None,
        stresses: tuple[pint.Quantity, pint.Quantity, pint.Quantity] | None = None,
    ) -> DemandArrays:
        """From pint quantities (scalars or arrays) in any force, moment and stress units.

        ``stresses``: (largest normal, smallest normal, largest shear) stress.
        """
        rows = [
            ("P_r", P_r, "N"),
            ("M_rx", M_rx, "N*m"),
            ("M_ry", M_ry, "N*m"),
            ("V_rx", V_rx, "N"),
            ("V_ry", V_ry, "N"),
        ]
        if T_r is not None:
            rows.append(("T_r", T_r, "N*m"))
        if stresses is not None:
            names = ("sigma_max", "sigma_min", "tau_max")
            rows += [(name, value, "Pa") for name, value in zip(names, stresses, strict=True)]
        converted = []
        for name, value, unit in rows:
            try:
                converted.append(np.atleast_1d(np.asarray(value.to(unit).m, dtype=float)))
            except (AttributeError, pint.DimensionalityError):
                raise InputError(
                    f"demand {name}", value, f"a quantity convertible to {unit}"
                ) from None
        arrays = np.broadcast_arrays(*converted)
        torque = arrays[5] if T_r is not None else None
        points = PointStressDemands(*arrays[-3:]) if stresses is not None else None
        return cls(*arrays[:5], T_r=torque, stresses=points)


def scope_problem(kind: str, values: Arrays, E: float, F_y: float) -> tuple[np.ndarray, str]:
    """Sections outside what the checks cover: a boolean mask and the reason in words."""
    if kind == "I":
        lam_w = _i_web_ratio(values)
        too_slender = lam_w > b4.I_WEB_FLEXURE.lambda_p.numeric(E, F_y)
        return too_slender, "noncompact or slender web in flexure (AISC 360-22 F4, F5 not covered)"
    if kind == "HSS_RECT":
        limit = b4.HSS_WEB_FLEXURE.lambda_r.numeric(E, F_y)
        lam_b, lam_h = _hss_ratios(values)
        return (lam_b > limit) | (lam_h > limit), "slender HSS web in flexure (F7.3(b) not covered)"
    if kind == "HSS_ROUND":
        lam = b4.width_thickness_ratio.numeric(values["D"], values["t"])
        return lam >= 0.45 * E / F_y, "D/t ≥ 0.45E/Fy: outside AISC 360-22 F8 and E7.2"
    return np.zeros(np.shape(values["A_g"]), dtype=bool), ""


def _i_web_ratio(v: Arrays) -> np.ndarray:
    h = b4.rolled_web_height.numeric(v["d"], v["k_des"])
    return b4.width_thickness_ratio.numeric(h, v["t_w"])


def _hss_ratios(v: Arrays) -> tuple[np.ndarray, np.ndarray]:
    b = b4.hss_flat_width.numeric(v["B"], v["t"])
    h = b4.hss_flat_width.numeric(v["H"], v["t"])
    return b4.width_thickness_ratio.numeric(b, v["t"]), b4.width_thickness_ratio.numeric(h, v["t"])


def aisc_checks_numeric(
    table: SectionTable,
    demands: DemandArrays,
    *,
    method: str,
    material: Steel = A992,
    length: pint.Quantity | str,
    K: float | str = K_FIXED_FREE,
    Lb: pint.Quantity | str | None = None,
    Cb: float | str | None = None,
    Cm: float | str = 1.0,
    second_order: bool = True,
    cantilever: bool = True,
    load_height: str | None = None,
    tip_restraint: str | None = None,
    bracing_sources: tuple[str, str] = ("", ""),
) -> dict[str, np.ndarray]:
    """The utilization of each check of :func:`write_aisc_checks`, as ``(n, m)`` arrays.

    Keys are those of the sheet's checks (see
    :data:`~calcsheet.standards.aisc360.member.CHECK_TITLES`); sections outside the
    scope of the checks get ``inf`` in every check, and so does a value that is not
    a number.
    """
    from calcsheet.standards.aisc360.member import aisc_member_procedure

    chosen = design_method(method)
    p = parse_member_inputs(material, length, K, Lb, 1.0 if Cb is None else Cb, Cm)
    bracing = lateral_bracing(
        table.kind,
        Lb_given=Lb is not None,
        Cb_given=Cb is not None,
        cantilever=cantilever,
        load_height=load_height,
        tip_restraint=tip_restraint,
        sources=bracing_sources,
    )
    w = ArrayWriter(method=chosen)
    with np.errstate(divide="ignore", invalid="ignore", over="ignore"):
        aisc_member_procedure(
            w, table.kind, dict(table.values), p, demands, second_order, bracing=bracing
        )
    E, F_y = float(p.E.to("Pa").m), float(p.F_y.to("Pa").m)
    outside, _ = scope_problem(table.kind, table.values, E, F_y)
    shape = np.broadcast_shapes(np.shape(table.values["A_g"]), np.shape(demands.P_r))
    return {
        name: np.where(
            outside | ~np.isfinite(np.broadcast_to(ratio, shape)),
            np.inf,
            np.broadcast_to(ratio, shape),
        )
        for name, ratio in w.checks.items()
    }


def aisc_utilization_numeric(
    table: SectionTable,
    demands: DemandArrays,
    *,
    method: str,
    material: Steel = A992,
    length: pint.Quantity | str,
    K: float | str = K_FIXED_FREE,
    Lb: pint.Quantity | str | None = None,
    Cb: float | str | None = None,
    Cm: float | str = 1.0,
    second_order: bool = True,
) -> np.ndarray:
    """The governing utilization of each section over all checks and load combinations.

    Shape ``(n,)``, in the order of ``table.names``; ``inf`` for a section outside
    the scope of the checks. Same arguments as :func:`aisc_checks_numeric`.
    """
    checks = aisc_checks_numeric(
        table,
        demands,
        method=method,
        material=material,
        length=length,
        K=K,
        Lb=Lb,
        Cb=Cb,
        Cm=Cm,
        second_order=second_order,
    )
    return np.max(np.stack(list(checks.values())), axis=(0, 2))
