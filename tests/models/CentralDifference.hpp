#pragma once
// Helpers shared by the model tests: central differences to check analytic slopes.

#include <cmath>

namespace coldtip::models::testing {

//! (f(x + h) - f(x - h)) / (2 h), h relative to |x| (absolute near 0).
template <class F> double centralDifference(F&& f, double x, double relative_step = 1e-6)
{
    const double h = relative_step * std::max(std::abs(x), 1e-3);
    return (f(x + h) - f(x - h)) / (2.0 * h);
}

//! |a - b| <= tol (|b| + floor): relative comparison that tolerates b ~ 0.
inline bool closeRelative(double a, double b, double tol, double floor = 0.0)
{
    return std::abs(a - b) <= tol * (std::abs(b) + floor);
}

} // namespace coldtip::models::testing
