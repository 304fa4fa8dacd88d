"""One function per formula of elementary beam theory, written for both writers.

Each function is plain arithmetic on its arguments, so it builds a sympy expression
from sheet symbols (the sheet prints it as written) and evaluates numpy arrays (the
searches over load cases); square roots, magnitudes and larger-of go through the
writer ``w`` (:mod:`calcsheet.engine.procedure`). The procedures of
:mod:`calcsheet.mechanics.point_stresses` write their steps with these functions and
the fit of the wall shear in :mod:`calcsheet.mechanics.stresses` evaluates
:func:`transverse_shear` on arrays: each formula is written here once.

Every formula is common practice in mechanics of materials; each docstring states
it. Units must be consistent (for example kip and inch in, ksi out). Signs follow
:mod:`calcsheet.mechanics.statics`: tension positive, moments by the right-hand
rule about the section axes, σ = M_x·y/I_x − M_y·x/I_y when I_xy = 0.
"""

from __future__ import annotations

from collections.abc import Sequence
from typing import TYPE_CHECKING, Any

if TYPE_CHECKING:  # the writer is passed in; mechanics does not import the engine
    from calcsheet.engine.procedure import Writer

# A value: a sheet symbol or expression, a float or a numpy array.
Value = Any
# A decision: a bool (sheet) or a boolean array (arrays).
Flag = Any


def axial_stress(N: Value, A: Value) -> Value:
    """Uniform normal stress of an axial force: σ = N/A."""
    return N / A


def product_determinant(I_x: Value, I_y: Value, I_xy: Value) -> Value:
    """D = I_x·I_y − I_xy², the denominator of the unsymmetric bending and shear formulas."""
    return I_x * I_y - I_xy**2


def bending_stress_x(
    M_x: Value, x: Value, y: Value, I_x: Value, I_y: Value, I_xy: Value | None, D: Value | None
) -> Value:
    """The normal stress of M_x: M_x·(I_y·y − I_xy·x)/D, or M_x·y/I_x when I_xy is ``None``.

    From σ = a + b·x + c·y with ∫σ·y dA = M_x and −∫σ·x dA = M_y (bending about
    centroidal axes that need not be principal); with I_xy = 0 the general form is
    M_x·y/I_x. ``I_xy`` ``None`` (a symmetry axis) writes the short form.
    """
    if I_xy is None:
        return M_x * y / I_x
    return M_x * (I_y * y - I_xy * x) / D


def bending_stress_y(
    M_y: Value, x: Value, y: Value, I_x: Value, I_y: Value, I_xy: Value | None, D: Value | None
) -> Value:
    """The normal stress of M_y: M_y·(I_xy·y − I_x·x)/D, or −M_y·x/I_y when I_xy is ``None``.

    The companion of :func:`bending_stress_x` (right-hand-rule M_y puts −x in tension).
    """
    if I_xy is None:
        return -M_y * x / I_y
    return M_y * (I_xy * y - I_x * x) / D


def transverse_shear(
    V_own: Value,
    V_other: Value,
    Q_own: Value,
    Q_other: Value | None,
    width: Value,
    I_own: Value,
    I_other: Value,
    I_xy: Value | None,
    D: Value | None,
) -> Value:
    """Average transverse shear on a cut of the given width (V·Q/(I·b), unsymmetric form).

    Horizontal cut (τzy, the part above): V_own = V_y, V_other = V_x, Q_own = ∫y dA,
    Q_other = ∫x dA of the part cut off, I_own = I_x, I_other = I_y. Vertical cut
    (τzx, the part to the right): V_own = V_x, V_other = V_y, Q_own = ∫x dA,
    Q_other = ∫y dA, I_own = I_y, I_other = I_x. Then

    τ·b = [(V_own·I_other − V_other·I_xy)·Q_own + (V_other·I_own − V_own·I_xy)·Q_other]/D,

    which with I_xy = 0 is V_own·Q_own/(I_own·b) + V_other·Q_other/(I_other·b)
    (written so when ``I_xy`` is ``None``; ``Q_other`` ``None`` leaves its term out).
    """
    if I_xy is not None:
        return (
            (V_own * I_other - V_other * I_xy) * Q_own + (V_other * I_own - V_own * I_xy) * Q_other
        ) / (D * width)
    if Q_other is None:
        return V_own * Q_own / (I_own * width)
    return V_own * Q_own / (I_own * width) + V_other * Q_other / (I_other * width)


def torsion_stress_round(T: Value, r: Value, J: Value) -> Value:
    """St Venant shear stress of a round bar or tube at radius r: τ = T·r/J."""
    return T * r / J


def torsion_stress_open(T: Value, t: Value, J: Value) -> Value:
    """Thin open wall (and thin rectangle): τ = T·t/J at the wall face, t the wall thickness."""
    return T * t / J


def torsion_stress_closed(T: Value, A_m: Value, t: Value) -> Value:
    """Thin closed wall (Bredt): τ = T/(2·A_m·t), A_m the area inside the wall mid-line."""
    return T / (2 * A_m * t)


def resultant(w: Writer, a: Value, b: Value) -> Value:
    """√(a² + b²): the resultant of two perpendicular components (a point's radius from
    the centroid, the resultant moment or shear of a round section)."""
    return w.root(a**2 + b**2)


def shear_at_point(w: Writer, transverse: Sequence[Value], tau_T: Value, junction: Flag) -> Value:
    """The shear at a point from its transverse terms (one per cut through material) and τ_T.

    Two cuts through the point: τ = √(τzx² + τzy²) + |τ_T|, the transverse
    components added as vectors and the torsional shear by magnitude, because its
    direction along the wall is not tracked (conservative). At a re-entrant corner
    (``junction``) the two cuts cross two different walls, so τzx and τzy are the
    shears of two walls, not two components at one spot; the shear flow turns the
    corner and each wall carries its own (thin-walled open section shear flow,
    common practice, no source): τ = max(|τzx|, |τzy|) + |τ_T|. One cut: |τ| + |τ_T|.
    """
    if len(transverse) == 2:
        first, second = transverse
        return w.choose(
            junction,
            lambda: w.larger(w.absolute(first), w.absolute(second)) + w.absolute(tau_T),
            lambda: w.root(first**2 + second**2) + w.absolute(tau_T),
        )
    if transverse:
        return w.absolute(transverse[0]) + w.absolute(tau_T)
    return w.absolute(tau_T)


def mohr_radius(w: Writer, sigma: Value, tau: Value) -> Value:
    """In-plane maximum shear stress: τ_max = √((σ/2)² + τ²) (radius of Mohr's circle)."""
    return w.root((sigma / 2) ** 2 + tau**2)


def major_principal_stress(sigma: Value, radius_: Value) -> Value:
    """σ1 = σ/2 + √((σ/2)² + τ²) for one normal stress σ and a shear τ (Mohr's circle)."""
    return sigma / 2 + radius_


def minor_principal_stress(sigma: Value, radius_: Value) -> Value:
    """σ2 = σ/2 − √((σ/2)² + τ²) (Mohr's circle)."""
    return sigma / 2 - radius_


def von_mises_stress(w: Writer, sigma: Value, tau: Value) -> Value:
    """Von Mises equivalent stress for one normal stress and one shear: √(σ² + 3·τ²)."""
    return w.root(sigma**2 + 3 * tau**2)
