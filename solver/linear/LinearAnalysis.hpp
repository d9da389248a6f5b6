#pragma once
//! \file LinearAnalysis.hpp
//! Frequency-domain analysis of the very network the time integrator solves (DESIGN §4):
//! the discretised equations dy/dt = F(y, V, dV/dt) are linearised about the zero-flow mean
//! state y_m (uniform mean pressure, a given temperature profile, no flow, the piston at its
//! mean volume and at rest), and the response to the piston displacement x(t) =
//! Re[x1 e^{i omega t}] solves
//!
//!   (i omega I - J) y1 = B x1,   J = dF/dy (Network::jacobian, exact),
//!   B = dF/dx = -A_p (dF/dV + i omega dF/d(dV/dt))          (V = V_m - A_p x)
//!
//! with Eigen's sparse LU in complex arithmetic. Solid temperatures are held at their mean
//! values (their rows and columns are dropped): a matrix or wall node stores 10^2-10^3 times
//! the heat of the gas it touches, so its temperature swing at the drive frequency is
//! that much smaller than the gas's (DEVELOPERS.md). dF/dV and dF/d(dV/dt) come from
//! central differences of the right-hand side in the piston volume (step 1e-6 V_m; F is
//! smooth and, in dV/dt, linear), the rest of J from the dual-number partials.
//! The cycle integrals (quadratures) are not part of the state and play no role.

#include <complex>
#include <vector>

#include "solver/components/Machine.hpp"
#include "solver/linear/Phasors.hpp"

namespace coldtip {

//! The zero-flow mean state: gas cells at temperatures `cell_temperature` [K] (one per
//! cell), solids at `solid_temperature` [K] (one per solid node), uniform pressure
//! p_m = M R / sum(V_i/T_i) for the machine's charge M, no flow, the piston volume at its
//! mean. Empty vectors take the case's initial profile.
std::vector<double> linearMeanState(const Machine& machine,
                                    const std::vector<double>& cell_temperature = {},
                                    const std::vector<double>& solid_temperature = {});

//! First-order response of every state to the drive, and what follows from it.
struct LinearSolution {
    double omega = 0.0;              //!< [rad/s]
    Complex displacement;            //!< piston displacement phasor x1 [m]
    double piston_area = 0.0;        //!< [m^2]
    std::vector<double> mean_state;  //!< y_m
    std::vector<Complex> state;      //!< y1 (zero on solid rows)
    // per cell
    std::vector<double> volume;      //!< mean volume [m^3]
    std::vector<double> p_mean, T_mean, rho_mean; //!< [Pa], [K], [kg/m^3]
    std::vector<Complex> pressure, temperature, density; //!< p1, T1, rho1
    std::vector<Complex> volume_change; //!< V1 (the compression space only) [m^3]
    // per face (FlowFace order)
    std::vector<Complex> mass_flow;  //!< mdot1 [kg/s]
    //! Residual of the linear mass balance per cell, i omega m1 - (sum in - sum out) of
    //! mdot1 over faces and orifices [kg/s] (round-off for a correct solve).
    std::vector<Complex> mass_residual;
    std::vector<Complex> orifice_flow; //!< mdot1 per OrificeLink, element order [kg/s]
};

//! Solve the linear problem at the machine's drive (amplitude scale included) about the
//! mean state y_m. The piston is restored afterwards.
LinearSolution solveLinear(Machine& machine, const std::vector<double>& mean_state);

//! The solution's first harmonics referred to the piston displacement (phase 0 when the
//! piston is fully in), for the port phasors of Phasors.hpp.
FirstHarmonics firstHarmonics(const Machine& machine, const LinearSolution& s);

} // namespace coldtip
