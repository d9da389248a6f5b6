#pragma once
//! \file PowerLaw.hpp
//! Power laws x^p with their slope, made safe at x = 0 for the exponents 0 < p < 1 that the
//! porous-matrix correlations use (Re^0.6, Pe^0.66, Re^0.897), whose true slope is infinite.

#include <algorithm>
#include <cmath>

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! Smallest argument at which the slope of a power law is evaluated [-]. Below it the slope
//! is held at its value there (finite), while the value itself keeps going to 0 exactly.
inline constexpr double kPowerLawSlopeFloor = 1e-6;

//! x^p and d(x^p)/dx for x >= 0 (negative x is treated as 0); the slope uses
//! max(x, kPowerLawSlopeFloor) so that it stays finite as x -> 0.
inline Slope powerLaw(double x, double p)
{
    const double xv = std::max(x, 0.0);
    if (xv >= kPowerLawSlopeFloor) {
        const double v = std::pow(xv, p);
        return {v, p * v / xv};
    }
    return {std::pow(xv, p), p * std::pow(kPowerLawSlopeFloor, p - 1.0)};
}

} // namespace coldtip::models
