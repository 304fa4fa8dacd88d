"""One function per formula of elementary beam theory (numbers or numpy arrays in, same out).

Every formula is common practice in mechanics of materials; each docstring states
it. Units must be consistent (for example kip and inch in, ksi out). Signs follow
:mod:`calcsheet.mechanics.statics`: tension positive, moments by the right-hand
rule about the section axes, σ = Mx·y/Ix − My·x/Iy when Ixy = 0.
"""

from __future__ import annotations

import numpy as np
from numpy.typing import ArrayLike, NDArray

Array = NDArray[np.float64]


def axial_stress(N: ArrayLike, A: float) -> Array:
    """Uniform normal stress of an axial force: σ = N / A."""
    return np.asarray(N, dtype=float) / A


def product_determinant(Ix: float, Iy: float, Ixy: float) -> float:
    """D = Ix·Iy − Ixy², the denominator of the unsymmetric bending formula."""
    return Ix * Iy - Ixy * Ixy


def bending_stress(
    Mx: ArrayLike, My: ArrayLike, x: ArrayLike, y: ArrayLike, Ix: float, Iy: float, Ixy: float
) -> Array:
    """Normal stress of biaxial bending about centroidal (not necessarily principal) axes.

    σ = [(Mx·Iy + My·Ixy)·y − (My·Ix + Mx·Ixy)·x] / (Ix·Iy − Ixy²), which for
    Ixy = 0 reduces to σ = Mx·y/Ix − My·x/Iy (right-hand-rule moments). It follows
    from σ = a + b·x + c·y with ∫σ·y dA = Mx and −∫σ·x dA = My.
    """
    D = product_determinant(Ix, Iy, Ixy)
    Mx, My = np.asarray(Mx, dtype=float), np.asarray(My, dtype=float)
    return ((Mx * Iy + My * Ixy) * np.asarray(y) - (My * Ix + Mx * Ixy) * np.asarray(x)) / D


def shear_flow_stress(
    Vx: ArrayLike,
    Vy: ArrayLike,
    Q_about_x: ArrayLike,
    Q_about_y: ArrayLike,
    width: ArrayLike,
    Ix: float,
    Iy: float,
    Ixy: float,
) -> Array:
    """Average transverse shear stress on a cut of the given width (Jourawski, unsymmetric form).

    τ = [(Vy·Iy − Vx·Ixy)·Q_x + (Vx·Ix − Vy·Ixy)·Q_y] / ((Ix·Iy − Ixy²)·b), where
    Q_x = ∫y dA and Q_y = ∫x dA over the part cut off. With Ixy = 0 and a
    symmetric cut-off part this is the familiar τ = V·Q/(I·b). Where the cut
    crosses no material (b = 0, at a free edge) the shear stress is zero.
    """
    D = product_determinant(Ix, Iy, Ixy)
    Vx, Vy = np.asarray(Vx, dtype=float), np.asarray(Vy, dtype=float)
    numerator = (Vy * Iy - Vx * Ixy) * np.asarray(Q_about_x) + (Vx * Ix - Vy * Ixy) * np.asarray(
        Q_about_y
    )
    width = np.asarray(width, dtype=float)
    safe = np.where(width > 0, width, 1.0)
    return np.where(width > 0, numerator / (D * safe), 0.0)


def torsion_stress_round(T: ArrayLike, r: ArrayLike, J: float) -> Array:
    """St Venant shear stress of a round bar or tube: τ = T·r / J."""
    return np.asarray(T, dtype=float) * np.asarray(r) / J


def torsion_stress_open(T: ArrayLike, t: float, J: float) -> Array:
    """Thin open wall (and thin rectangle): τ = T·t / J at the wall face, t the wall thickness."""
    return np.asarray(T, dtype=float) * t / J


def torsion_stress_closed(T: ArrayLike, A_m: float, t: float) -> Array:
    """Thin closed wall (Bredt): τ = T / (2·A_m·t), A_m the area inside the wall mid-line."""
    return np.asarray(T, dtype=float) / (2.0 * A_m * t)


def combined_shear(tau_zx: ArrayLike, tau_zy: ArrayLike, tau_torsion: ArrayLike) -> Array:
    """Shear at a point: τ = √(τzx² + τzy²) + |τ_T|.

    The transverse components are added as vectors; the torsional shear is added
    by magnitude because its direction along the wall is not tracked (conservative).
    """
    return np.hypot(tau_zx, tau_zy) + np.abs(tau_torsion)


def junction_shear(tau_zx: ArrayLike, tau_zy: ArrayLike, tau_torsion: ArrayLike) -> Array:
    """Shear at a re-entrant corner where two walls meet: τ = max(|τzx|, |τzy|) + |τ_T|.

    There the horizontal and the vertical cut cross two different walls, so τzx and
    τzy are the shears of two walls, not two components at one spot; the shear flow
    turns the corner and each wall carries its own (thin-walled open section shear
    flow, common practice, no source). The larger is taken.
    """
    return np.maximum(np.abs(tau_zx), np.abs(tau_zy)) + np.abs(tau_torsion)


def principal_stresses(sigma: ArrayLike, tau: ArrayLike) -> tuple[Array, Array]:
    """σ1,2 = σ/2 ± √((σ/2)² + τ²) for a plane state with one normal stress σ and shear τ."""
    sigma = np.asarray(sigma, dtype=float)
    radius = max_shear_stress(sigma, tau)
    return sigma / 2.0 + radius, sigma / 2.0 - radius


def max_shear_stress(sigma: ArrayLike, tau: ArrayLike) -> Array:
    """In-plane maximum shear stress: τ_max = √((σ/2)² + τ²) (radius of Mohr's circle)."""
    return np.hypot(np.asarray(sigma, dtype=float) / 2.0, tau)


def von_mises_stress(sigma: ArrayLike, tau: ArrayLike) -> Array:
    """Von Mises equivalent stress for one normal stress and one shear: √(σ² + 3·τ²)."""
    sigma = np.asarray(sigma, dtype=float)
    return np.sqrt(sigma * sigma + 3.0 * np.asarray(tau, dtype=float) ** 2)
