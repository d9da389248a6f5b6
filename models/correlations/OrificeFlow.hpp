#pragma once
//! \file OrificeFlow.hpp
//! Compressible flow through an orifice or valve, signed, for reversing flow.
//!
//! Isentropic nozzle with discharge coefficient (A. H. Shapiro, "The Dynamics and
//! Thermodynamics of Compressible Fluid Flow", 1953; ISO 5167 for metering practice; from
//! memory), upstream stagnation state (p0, T0), downstream pressure p, r = p / p0:
//!   mdot = C_d A p0 sqrt(2 / (R_s T0)) sqrt(P(r)),
//!   P(r) = gamma/(gamma-1) (r^(2/gamma) - r^((gamma+1)/gamma))
//! choked for r <= r* = (2/(gamma+1))^(gamma/(gamma-1)), where P is held at P(r*) (P has
//! its maximum there, so choking is C1). -> C_d A sqrt(2 rho0 dp) as dp/p0 -> 0.
//! Check (C_d = 0.6, d = 1 mm, p0 = 2 MPa, T0 = 300 K): helium to 1.9 MPa 3.689e-4 kg/s,
//! choked 8.670e-4 kg/s; air 9.880e-4 and 2.199e-3 kg/s.
//!
//! Reversal: the upstream side is the one at higher pressure. Regularisation so that the
//! slope stays finite at dp = 0 and value and slope are continuous through reversal:
//!  1. sqrt(P) is replaced by the odd C1 function g(P): g = sign(P) sqrt|P| for |P| >= eps,
//!     g = (P/sqrt(eps)) (5/4 - P^2/(4 eps^2)) for |P| < eps -- linear in P at leading
//!     order, slope 5/(4 sqrt(eps)) at 0. Since P ~ (p0 - p)/p0 near r = 1, this replaces
//!     the square-root law by a near-linear one for |p_a - p_b| < eps p_up.
//!  2. The upstream state blends from b to a by a C1 smoothstep in
//!     z = 2 (p_a - p_b)/(p_a + p_b) over |z| < eps/2 (both directions vanish at dp = 0,
//!     so the blend only matters for the slope there).
//! eps = relative_band, default 1e-3 (2 kPa at 2 MPa); outside |dp| >= eps p_up the law
//! is the exact isentropic one.

namespace coldtip::models {

//! Mass flow from side a to side b [kg/s] and its partial derivatives.
struct OrificeFlow {
    double mdot = 0.0;
    double d_dpa = 0.0; //!< [kg/(s Pa)]
    double d_dTa = 0.0; //!< [kg/(s K)]
    double d_dpb = 0.0; //!< [kg/(s Pa)]
    double d_dTb = 0.0; //!< [kg/(s K)]
};

//! Default relative regularisation band eps [-].
inline constexpr double kOrificeRelativeBand = 1e-3;

//! Signed mass flow a -> b [kg/s] through an orifice of effective area C_d A
//! (`discharge_area`, m^2) between states (p_a [Pa], T_a [K]) and (p_b, T_b), for a gas of
//! R_s [J/(kg K)] and gamma [-]. Requires positive pressures and temperatures.
OrificeFlow orificeMassFlow(double p_a, double T_a, double p_b, double T_b,
                            double discharge_area, double gas_constant, double gamma,
                            double relative_band = kOrificeRelativeBand);

} // namespace coldtip::models
