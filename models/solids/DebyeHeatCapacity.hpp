#pragma once
//! \file DebyeHeatCapacity.hpp
//! Lattice heat capacity of the Debye model (P. Debye, "Zur Theorie der spezifischen
//! Waermen", Ann. Phys. 39, 789, 1912; C. Kittel, "Introduction to Solid State Physics",
//! ch. 5, from memory):
//!   c_v = 9 (R/M) (T/theta)^3 integral_0^(theta/T) x^4 e^x / (e^x - 1)^2 dx
//! -> 3R/M (Dulong-Petit) for T >> theta, (12 pi^4 / 5)(R/M)(T/theta)^3 for T << theta.

namespace coldtip::models {

//! c_v [J/(kg K)] of a Debye solid of Debye temperature theta [K] and molar mass M
//! [kg/mol] at T [K] (T > 0).
double debyeHeatCapacity(double T, double theta, double molar_mass);

} // namespace coldtip::models
