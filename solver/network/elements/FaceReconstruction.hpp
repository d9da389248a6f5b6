#pragma once
//! \file FaceReconstruction.hpp
//! Upwind-biased reconstruction of the gas temperature at a face from the cell on its
//! upwind side: the third-order kappa = 1/3 scheme (van Leer 1979, "Towards the ultimate
//! conservative difference scheme V", J. Comput. Phys. 32; the MUSCL kappa family),
//!
//!   T_face = T_i + s (x_face - x_i),   s = (g- + 2 g+)/3 * P,
//!   P = (1 + tanh(c q)) / 2,   q = g- g+ / (g-^2 + g+^2 + e^2),   c = 20,
//!
//! with g-, g+ the one-sided gradients on either side of cell i. The switch P turns the
//! slope off only at a local extremum of the cell values (q < 0), so that no new extremum
//! is made; wherever the profile is monotone (q > 0.15, i.e. g+/g- between 1/6 and 6) it is
//! 1 to within 3e-3, and near q = 1/2 (a straight profile) to within 1e-8, so the scheme
//! keeps its order in the steep, strongly curved profiles of regenerator and pulse-tube
//! ends. (A C2 switch, cheaper, was measured to cost 13 % more integrator steps: its jumps
//! in the third derivative upset the BDF error estimates.)
//! (A classic limiter such as van Albada's, Astron. Astrophys. 108, 1982, also clips
//! there; measured on the demo: twice the grid dependence of cooling power.) Everything is
//! differentiable, so the Jacobian stays continuous.
//!
//! First-order donor-cell fluxes carry an artificial axial conduction of about
//! rho c_p A <|u|> dx/2 dT/dx, which in a pulse tube or a regenerator is of the order of the
//! cooling power itself (numerics reference §4.1; measured in DEVELOPERS.md). A lumped
//! (well-mixed) volume delivers its own temperature; at a component boundary each side
//! extrapolates its own gradient (the temperature is continuous there, its gradient is not).

#include <cmath>
#include "solver/network/Dual.hpp"

namespace coldtip {

//! Smoothing gradient e of the sensor [K/m]: far below the gradients that matter (10^3 K/m
//! in regenerators and pulse tubes), it only rounds the sensor where both sides are flat.
inline constexpr double kLimiterGradientScale = 10.0;
//! Sharpness c of the extremum switch.
inline constexpr double kExtremumSwitch = 20.0;

template <class S>
S limitedSlope(const S& g_minus, const S& g_plus)
{
    using std::tanh;
    const double e2 = kLimiterGradientScale * kLimiterGradientScale;
    const S q = g_minus * g_plus / (g_minus * g_minus + g_plus * g_plus + e2);
    const S kappa = (g_minus + 2.0 * g_plus) / 3.0;
    // Most faces sit on smooth monotone profiles, q near 1/2, where the switch is 1 to
    // within 2e-8 (tanh(9) = 1 - 3e-8): skip the transcendental function there.
    if (valueOf(q) > 0.45) return kappa;
    return kappa * (0.5 * (1.0 + tanh(kExtremumSwitch * q)));
}

//! Temperature reconstructed at a face from cell i (temperature T, centre x) towards its
//! neighbour across the face; `far` is the cell on the other side of i (may be absent).
//! Positions in metres; lengths zero mark lumped volumes.
template <class S>
struct ReconstructionCell {
    const S* T = nullptr;
    double x = 0.0;
    bool lumped = false;
    int component = -1;
};

template <class S>
S reconstructFaceTemperature(const ReconstructionCell<S>& far, const ReconstructionCell<S>& cell,
                             const ReconstructionCell<S>& across, double x_face)
{
    if (cell.lumped || !far.T || far.lumped || far.component != cell.component)
        return *cell.T;
    const S g_minus = (*cell.T - *far.T) / (cell.x - far.x);
    // At a component boundary the temperature is continuous but its gradient is not (a
    // regenerator's steep profile meets a heat exchanger's flat one): a limiter would take
    // the corner for a discontinuity and fall back to first order exactly where the profile
    // is steepest. Each side extrapolates its own gradient instead.
    if (across.lumped || across.component != cell.component)
        return *cell.T + g_minus * (x_face - cell.x);
    const S g_plus = (*across.T - *cell.T) / (across.x - cell.x);
    return *cell.T + limitedSlope(g_minus, g_plus) * (x_face - cell.x);
}

} // namespace coldtip
