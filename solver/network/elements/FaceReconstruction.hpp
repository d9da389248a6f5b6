#pragma once
//! \file FaceReconstruction.hpp
//! Second-order upwind-biased (MUSCL) reconstruction of the gas temperature at a face,
//! with the smooth limiter of van Albada, van Leer & Roberts (Astron. Astrophys. 108, 1982):
//!
//!   T_face = T_i + g (x_face - x_i),   g = [(g+^2 + e^2) g- + (g-^2 + e^2) g+] / (g-^2 + g+^2 + 2 e^2)
//!
//! with g-, g+ the one-sided gradients on either side of cell i. First-order donor-cell
//! fluxes carry an artificial axial conduction of about rho c_p A <|u|> dx/2 dT/dx, which in
//! a pulse tube or a regenerator is of the order of the cooling power itself (numerics
//! reference §4.1; measured in DEVELOPERS.md); the limited reconstruction removes it to
//! second order. The limiter is differentiable, so the Jacobian stays continuous. A lumped
//! (well-mixed) volume delivers its own temperature, and a cell without passage neighbours
//! on both sides falls back to first order.

#include "solver/network/Dual.hpp"

namespace coldtip {

//! Smoothing gradient e of the limiter [K/m]: far below the gradients that matter (10^3 K/m
//! in regenerators and pulse tubes), it only rounds the limiter where both sides are flat.
inline constexpr double kLimiterGradientScale = 10.0;

template <class S>
S vanAlbadaSlope(const S& g_minus, const S& g_plus, double e = kLimiterGradientScale)
{
    const double e2 = e * e;
    return ((g_plus * g_plus + e2) * g_minus + (g_minus * g_minus + e2) * g_plus) /
           (g_minus * g_minus + g_plus * g_plus + 2.0 * e2);
}

//! Temperature reconstructed at a face from cell i (temperature T, centre x) towards its
//! neighbour across the face; `far` is the cell on the other side of i (may be absent).
//! Positions in metres; lengths zero mark lumped volumes.
template <class S>
struct ReconstructionCell {
    const S* T = nullptr;
    double x = 0.0;
    bool lumped = false;
};

template <class S>
S reconstructFaceTemperature(const ReconstructionCell<S>& far, const ReconstructionCell<S>& cell,
                             const ReconstructionCell<S>& across, double x_face)
{
    if (cell.lumped || !far.T || far.lumped || across.lumped) return *cell.T;
    const S g_minus = (*cell.T - *far.T) / (cell.x - far.x);
    const S g_plus = (*across.T - *cell.T) / (across.x - cell.x);
    return *cell.T + vanAlbadaSlope(g_minus, g_plus) * (x_face - cell.x);
}

} // namespace coldtip
