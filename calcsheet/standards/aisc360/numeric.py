"""The AISC 360-22 member checks on arrays: many sections by many load combinations at once.

Every formula is a :class:`Clause` evaluated with :meth:`Clause.numeric`, the same
objects the sheet prints, in SI base units (m, N, Pa). Section values have shape
``(n, 1)`` and demands shape ``(m,)``, so each check gives an ``(n, m)`` array.
Where the sheet takes a decision when it is built (classification, which
equations apply), the numeric path takes it per section with ``numpy.where``; the
clauses' own ``Piecewise`` branches are evaluated as on the sheet.

A section outside the scope of the checks (see :func:`scope_problem`) gets an
infinite utilization, so a search never picks it.
"""

from __future__ import annotations

from collections.abc import Mapping
from dataclasses import dataclass

import numpy as np
import pint

from calcsheet.errors import InputError
from calcsheet.standards.aisc360 import classification as b4
from calcsheet.standards.aisc360 import combined, compression, flexure, shear, tension
from calcsheet.standards.aisc360 import second_order as appendix8
from calcsheet.standards.aisc360.factors import (
    COMPRESSION,
    FLEXURE,
    SHEAR,
    SHEAR_ROLLED_I_WEB,
    TENSILE_YIELDING,
    design_method,
)
from calcsheet.standards.aisc360.inputs import A992, MemberInputs, Steel, parse_member_inputs
from calcsheet.standards.aisc360.second_order import K_FIXED_FREE
from calcsheet.standards.aisc360.section_data import SectionTable

Arrays = Mapping[str, np.ndarray]
CHECKS = ("axial", "flexure_x", "flexure_y", "shear_x", "shear_y", "combined")


@dataclass(frozen=True)
class DemandArrays:
    """Required strengths of ``m`` load combinations, SI base units (N, N·m), shape ``(m,)``.

    Same meaning and signs as :class:`~calcsheet.standards.aisc360.member.Demands`:
    P_r axial (tension positive), M_rx and M_ry moments about x and y, V_rx and V_ry
    shears along x and y.
    """

    P_r: np.ndarray
    M_rx: np.ndarray
    M_ry: np.ndarray
    V_rx: np.ndarray
    V_ry: np.ndarray

    @classmethod
    def from_quantities(
        cls,
        P_r: pint.Quantity,
        M_rx: pint.Quantity,
        M_ry: pint.Quantity,
        V_rx: pint.Quantity,
        V_ry: pint.Quantity,
    ) -> DemandArrays:
        """From pint quantities (scalars or arrays) in any force and moment units."""
        converted = []
        for name, value, unit in (
            ("P_r", P_r, "N"),
            ("M_rx", M_rx, "N*m"),
            ("M_ry", M_ry, "N*m"),
            ("V_rx", V_rx, "N"),
            ("V_ry", V_ry, "N"),
        ):
            try:
                converted.append(np.atleast_1d(np.asarray(value.to(unit).m, dtype=float)))
            except (AttributeError, pint.DimensionalityError):
                raise InputError(
                    f"demand {name}", value, f"a quantity convertible to {unit}"
                ) from None
        return cls(*np.broadcast_arrays(*converted))


def _stresses(inputs: MemberInputs) -> tuple[float, float, float]:
    """E, G and Fy in Pa."""
    return (
        float(inputs.E.to("Pa").m),
        float(inputs.G.to("Pa").m),
        float(inputs.F_y.to("Pa").m),
    )


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


def _not_compact(lam: np.ndarray, limits: b4.ElementLimits, E: float, F_y: float) -> np.ndarray:
    return lam > limits.lambda_p.numeric(E, F_y)


def _tension(v: Arrays, F_y: float, method: str) -> np.ndarray:
    return tension.tensile_yielding.numeric(F_y, v["A_g"]) * TENSILE_YIELDING.multiplier(method)


def _critical_stress(
    E: float, F_y: float, L_c: float, r: np.ndarray, F_e_other: np.ndarray | None = None
) -> np.ndarray:
    F_e = compression.elastic_buckling_stress.numeric(E, L_c, r)
    if F_e_other is not None:
        F_e = np.minimum(F_e, F_e_other)
    return compression.critical_stress.numeric(F_y, F_e)


def _effective_width(
    case: str,
    b: np.ndarray,
    lam: np.ndarray,
    lam_r: float,
    F_y: float,
    F_cr: np.ndarray,
) -> np.ndarray:
    F_el = compression.LOCAL_BUCKLING_STRESS[case].numeric(lam_r, lam, F_y)
    return compression.EFFECTIVE_WIDTH[case].numeric(b, lam, lam_r, F_y, F_cr, F_el)


def _i_shape(v: Arrays, p: MemberInputs, method: str) -> dict[str, np.ndarray]:
    E, G, F_y = _stresses(p)
    L, L_b = p.length.to("m").m, p.L_b.to("m").m
    b = b4.half_flange_width.numeric(v["b_f"])
    lam_f = b4.width_thickness_ratio.numeric(b, v["t_f"])
    h = b4.rolled_web_height.numeric(v["d"], v["k_des"])
    lam_w = b4.width_thickness_ratio.numeric(h, v["t_w"])
    lam_rf_c = b4.I_FLANGE_COMPRESSION.lambda_r.numeric(E, F_y)
    lam_rw_c = b4.I_WEB_COMPRESSION.lambda_r.numeric(E, F_y)
    lam_pf = b4.I_FLANGE_FLEXURE.lambda_p.numeric(E, F_y)
    lam_rf = b4.I_FLANGE_FLEXURE.lambda_r.numeric(E, F_y)

    L_c = compression.effective_length.numeric(p.K, L)
    F_e_z = compression.torsional_buckling_stress.numeric(
        E, v["C_w"], L_c, G, v["J"], v["I_x"], v["I_y"]
    )
    F_cr = _critical_stress(E, F_y, L_c, v["r_y"], F_e_z)
    # E7 with full widths where elements are not slender: the same as E3-1.
    b_e = _effective_width("c", b, lam_f, lam_rf_c, F_y, F_cr)
    h_e = _effective_width("a", h, lam_w, lam_rw_c, F_y, F_cr)
    A_e = compression.effective_area_i_shape.numeric(v["A_g"], h, h_e, v["t_w"], b, b_e, v["t_f"])
    P_n_c = compression.nominal_compressive_strength_slender.numeric(F_cr, A_e)

    M_p = flexure.plastic_moment.numeric(F_y, v["Z_x"])
    r_ts = flexure.effective_radius.numeric(v["I_y"], v["C_w"], v["S_x"])
    h_o = flexure.flange_centroid_distance.numeric(v["d"], v["t_f"])
    c = 1.0
    L_p = flexure.limiting_length_yielding.numeric(v["r_y"], E, F_y)
    L_r = flexure.limiting_length_inelastic.numeric(r_ts, E, F_y, v["J"], c, v["S_x"], h_o)
    F_cr_b = flexure.ltb_critical_stress.numeric(p.C_b, E, L_b, r_ts, v["J"], c, v["S_x"], h_o)
    M_ltb = flexure.ltb_moment.numeric(M_p, p.C_b, F_y, v["S_x"], L_b, L_p, L_r, F_cr_b)
    k_c = flexure.flange_buckling_coefficient.numeric(lam_w)
    M_flb = flexure.flange_local_buckling.numeric(M_p, F_y, v["S_x"], lam_f, lam_pf, lam_rf, E, k_c)
    noncompact = lam_f > lam_pf
    M_n_x = np.where(noncompact, np.minimum(M_ltb, M_flb), M_ltb)

    M_p_y = flexure.minor_axis_plastic_moment.numeric(F_y, v["Z_y"], v["S_y"])
    M_flb_y = flexure.minor_axis_flange_local_buckling.numeric(
        M_p_y, F_y, v["S_y"], lam_f, lam_pf, lam_rf, E
    )
    M_n_y = np.where(noncompact, np.minimum(M_p_y, M_flb_y), M_p_y)

    rolled = lam_w <= shear.rolled_web_shear_limit.numeric(E, F_y)
    C_v1 = shear.web_shear_coefficient.numeric(lam_w, shear.KV_UNSTIFFENED_WEB, E, F_y)
    A_w = shear.web_area.numeric(v["d"], v["t_w"])
    V_n_y = shear.web_shear_strength.numeric(F_y, A_w, C_v1)
    factor_v = np.where(rolled, SHEAR_ROLLED_I_WEB.multiplier(method), SHEAR.multiplier(method))
    C_v2_f = shear.shear_buckling_coefficient.numeric(lam_f, shear.KV_FLANGE_OR_LEG, E, F_y)
    V_n_x = shear.weak_axis_shear_strength.numeric(F_y, v["b_f"], v["t_f"], C_v2_f)
    return {
        "P_c_t": _tension(v, F_y, method),
        "P_c_c": P_n_c * COMPRESSION.multiplier(method),
        "M_c_x": M_n_x * FLEXURE.multiplier(method),
        "M_c_y": M_n_y * FLEXURE.multiplier(method),
        "V_c_x": V_n_x * SHEAR.multiplier(method),
        "V_c_y": V_n_y * factor_v,
        "I_x": v["I_x"],
        "I_y": v["I_y"],
    }


def _rectangular_hss(v: Arrays, p: MemberInputs, method: str) -> dict[str, np.ndarray]:
    E, _, F_y = _stresses(p)
    L, L_b, t = p.length.to("m").m, p.L_b.to("m").m, v["t"]
    b = b4.hss_flat_width.numeric(v["B"], t)
    h = b4.hss_flat_width.numeric(v["H"], t)
    lam_b = b4.width_thickness_ratio.numeric(b, t)
    lam_h = b4.width_thickness_ratio.numeric(h, t)
    lam_r_c = b4.HSS_WALL_COMPRESSION.lambda_r.numeric(E, F_y)
    lam_rf = b4.HSS_FLANGE_FLEXURE.lambda_r.numeric(E, F_y)

    L_c = compression.effective_length.numeric(p.K, L)
    F_cr = _critical_stress(E, F_y, L_c, np.minimum(v["r_x"], v["r_y"]))
    b_e = _effective_width("b", b, lam_b, lam_r_c, F_y, F_cr)
    h_e = _effective_width("b", h, lam_h, lam_r_c, F_y, F_cr)
    A_e = compression.effective_area_box.numeric(v["A_g"], h, h_e, b, b_e, t)
    P_n_c = compression.nominal_compressive_strength_slender.numeric(F_cr, A_e)

    M_n = {}
    for axis, other, depth, width, lam_fl, lam_web, flat in (
        ("x", "y", "H", "B", lam_b, lam_h, b),
        ("y", "x", "B", "H", lam_h, lam_b, h),
    ):
        S, Z, I = v[f"S_{axis}"], v[f"Z_{axis}"], v[f"I_{axis}"]
        M_p = flexure.hss_plastic_moment.numeric(F_y, Z)
        b_e = flexure.hss_effective_flange_width.numeric(t, E, F_y, lam_fl, flat)
        S_e = flexure.hss_effective_section_modulus.numeric(I, v["A_g"], v[depth], t, flat, b_e)
        M_flb = flexure.hss_flange_local_buckling.numeric(M_p, F_y, S, lam_fl, lam_rf, E, S_e)
        M_wlb = flexure.hss_web_local_buckling.numeric(M_p, F_y, S, lam_web, E)
        r_other = v[f"r_{other}"]
        L_p = flexure.hss_limiting_length_yielding.numeric(E, r_other, v["J"], v["A_g"], M_p)
        L_r = flexure.hss_limiting_length_inelastic.numeric(E, r_other, v["J"], v["A_g"], F_y, S)
        M_ltb = flexure.hss_ltb_moment.numeric(
            M_p, p.C_b, F_y, S, L_b, L_p, L_r, E, v["J"], v["A_g"], r_other
        )
        strength = M_p
        strength = np.where(
            _not_compact(lam_fl, b4.HSS_FLANGE_FLEXURE, E, F_y),
            np.minimum(strength, M_flb),
            strength,
        )
        strength = np.where(
            _not_compact(lam_web, b4.HSS_WEB_FLEXURE, E, F_y), np.minimum(strength, M_wlb), strength
        )
        M_n[axis] = np.where(v[depth] > v[width], np.minimum(strength, M_ltb), strength)

    V_n = {}
    for axis, flat, lam in (("y", h, lam_h), ("x", b, lam_b)):
        A_w = shear.hss_web_area.numeric(flat, t)
        C_v2 = shear.shear_buckling_coefficient.numeric(lam, shear.KV_HSS, E, F_y)
        V_n[axis] = shear.hss_shear_strength.numeric(F_y, A_w, C_v2)
    return {
        "P_c_t": _tension(v, F_y, method),
        "P_c_c": P_n_c * COMPRESSION.multiplier(method),
        "M_c_x": M_n["x"] * FLEXURE.multiplier(method),
        "M_c_y": M_n["y"] * FLEXURE.multiplier(method),
        "V_c_x": V_n["x"] * SHEAR.multiplier(method),
        "V_c_y": V_n["y"] * SHEAR.multiplier(method),
        "I_x": v["I_x"],
        "I_y": v["I_y"],
    }


def _round_hss(v: Arrays, p: MemberInputs, method: str) -> dict[str, np.ndarray]:
    E, _, F_y = _stresses(p)
    L = p.length.to("m").m
    lam = b4.width_thickness_ratio.numeric(v["D"], v["t"])
    L_c = compression.effective_length.numeric(p.K, L)
    F_cr = _critical_stress(E, F_y, L_c, v["r"])
    A_e = compression.effective_area_round.numeric(E, F_y, lam, v["A_g"])
    P_n_c = compression.nominal_compressive_strength_slender.numeric(F_cr, A_e)
    M_c = flexure.round_hss_flexure.numeric(E, F_y, lam, v["Z"], v["S"]) * FLEXURE.multiplier(
        method
    )
    # L_v: the member length (a cantilever), as on the sheet.
    F_cr_v = shear.round_hss_shear_stress.numeric(E, F_y, L, v["D"], lam)
    V_c = shear.round_hss_shear_strength.numeric(F_cr_v, v["A_g"]) * SHEAR.multiplier(method)
    return {
        "P_c_t": _tension(v, F_y, method),
        "P_c_c": P_n_c * COMPRESSION.multiplier(method),
        "M_c_x": M_c,
        "M_c_y": M_c,
        "V_c_x": V_c,
        "V_c_y": V_c,
        "I_x": v["I"],
        "I_y": v["I"],
    }


def _single_angle(v: Arrays, p: MemberInputs, method: str) -> dict[str, np.ndarray]:
    E, _, F_y = _stresses(p)
    L, L_b, b, t = p.length.to("m").m, p.L_b.to("m").m, v["b"], v["t"]
    lam = b4.width_thickness_ratio.numeric(b, t)
    lam_r_c = b4.ANGLE_LEG_COMPRESSION.lambda_r.numeric(E, F_y)
    lam_rL = b4.ANGLE_LEG_FLEXURE.lambda_r.numeric(E, F_y)
    L_c = compression.effective_length.numeric(p.K, L)
    F_cr = _critical_stress(E, F_y, L_c, v["r_z"])
    b_e = _effective_width("c", b, lam, lam_r_c, F_y, F_cr)
    A_e = compression.effective_area_angle.numeric(v["A_g"], b, b_e, b, b_e, t)
    P_n_c = compression.nominal_compressive_strength_slender.numeric(F_cr, A_e)
    not_compact = _not_compact(lam, b4.ANGLE_LEG_FLEXURE, E, F_y)
    M_n = {}
    for axis in ("x", "y"):
        S = v[f"S_{axis}"]
        M_y = flexure.angle_yield_moment.numeric(F_y, S)
        M_yield = flexure.angle_yielding.numeric(M_y)
        M_cr = flexure.angle_elastic_ltb_moment.numeric(E, b, t, p.C_b, L_b)
        M_ltb = flexure.angle_ltb.numeric(flexure.angle_yield_moment_ltb.numeric(M_y), M_cr)
        M_llb = flexure.angle_leg_local_buckling.numeric(F_y, S, lam, lam_rL, E)
        strength = np.minimum(M_yield, M_ltb)
        M_n[axis] = np.where(not_compact, np.minimum(strength, M_llb), strength)
    C_v2 = shear.shear_buckling_coefficient.numeric(lam, shear.KV_FLANGE_OR_LEG, E, F_y)
    V_c = shear.angle_shear_strength.numeric(F_y, b, t, C_v2) * SHEAR.multiplier(method)
    return {
        "P_c_t": _tension(v, F_y, method),
        "P_c_c": P_n_c * COMPRESSION.multiplier(method),
        "M_c_x": M_n["x"] * FLEXURE.multiplier(method),
        "M_c_y": M_n["y"] * FLEXURE.multiplier(method),
        "V_c_x": V_c,
        "V_c_y": V_c,
        "I_x": v["I_x"],
        "I_y": v["I_y"],
    }


_KINDS = {"I": _i_shape, "HSS_RECT": _rectangular_hss, "HSS_ROUND": _round_hss, "L": _single_angle}


def aisc_checks_numeric(
    table: SectionTable,
    demands: DemandArrays,
    *,
    method: str,
    material: Steel = A992,
    length: pint.Quantity | str,
    K: float | str = K_FIXED_FREE,
    Lb: pint.Quantity | str | None = None,
    Cb: float | str = 1.0,
    Cm: float | str = 1.0,
    second_order: bool = True,
) -> dict[str, np.ndarray]:
    """The utilization of each check of :func:`write_aisc_checks`, as ``(n, m)`` arrays.

    Keys are :data:`CHECKS`; sections outside the scope of the checks get ``inf``
    in every check, and a member that buckles under P_r (α·|P_r| >= Pe1) gets
    ``inf`` in the combined check.
    """
    chosen = design_method(method)
    p = parse_member_inputs(material, length, K, Lb, Cb, Cm)
    E, _, F_y = _stresses(p)
    strengths = _KINDS[table.kind](table.values, p, chosen)
    P_r, M_rx, M_ry = demands.P_r, demands.M_rx, demands.M_ry
    with np.errstate(divide="ignore", invalid="ignore"):
        P_c = np.where(P_r >= 0, strengths["P_c_t"], strengths["P_c_c"])
        if second_order:
            alpha = appendix8.amplification_alpha(chosen)
            L = p.length.to("m").m
            for name, I in (("x", strengths["I_x"]), ("y", strengths["I_y"])):
                P_e1 = appendix8.euler_load.numeric(E * I, p.K, L)
                B_1 = appendix8.b1_multiplier.numeric(p.C_m, alpha, P_r, P_e1)
                if name == "x":
                    M_rx = B_1 * M_rx
                else:
                    M_ry = B_1 * M_ry
        if table.kind == "L":
            eta = combined.h2_interaction.numeric(
                np.abs(P_r), P_c, np.abs(M_rx), strengths["M_c_x"], np.abs(M_ry), strengths["M_c_y"]
            )
        else:
            eta = combined.h1_interaction.numeric(
                np.abs(P_r), P_c, np.abs(M_rx), strengths["M_c_x"], np.abs(M_ry), strengths["M_c_y"]
            )
        results = {
            "axial": np.abs(P_r) / P_c,
            "flexure_x": np.abs(M_rx) / strengths["M_c_x"],
            "flexure_y": np.abs(M_ry) / strengths["M_c_y"],
            "combined": eta,
        }
        if table.kind == "HSS_ROUND":
            V_r = shear.resultant_shear.numeric(demands.V_rx, demands.V_ry)
            results["shear_x"] = results["shear_y"] = V_r / strengths["V_c_x"]
        else:
            results["shear_x"] = np.abs(demands.V_rx) / strengths["V_c_x"]
            results["shear_y"] = np.abs(demands.V_ry) / strengths["V_c_y"]
    outside, _ = scope_problem(table.kind, table.values, E, F_y)
    shape = np.broadcast_shapes(np.shape(table.values["A_g"]), np.shape(P_r))
    return {
        name: np.where(
            outside | ~np.isfinite(results[name]), np.inf, np.broadcast_to(results[name], shape)
        )
        for name in CHECKS
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
    Cb: float | str = 1.0,
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
    return np.max(np.stack([checks[name] for name in CHECKS]), axis=(0, 2))
