#pragma once
//! \file SmoothStep.hpp
//! C1 switch between two laws: the weight goes from 0 to 1 over a band with zero slope at
//! both ends, so a blend (1 - w) a + w b keeps value and first derivative continuous.

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! Cubic smoothstep w(x) on [x0, x1] [-] and dw/dx [1/unit of x]:
//! w = 3 s^2 - 2 s^3, s = (x - x0)/(x1 - x0) clamped to [0, 1]; w' = 0 at both ends
//! (common practice for C1 blending of closure laws). Requires x1 > x0.
inline Slope smoothStep(double x, double x0, double x1)
{
    const double width = x1 - x0;
    const double s = (x - x0) / width;
    if (s <= 0.0) {
        return {0.0, 0.0};
    }
    if (s >= 1.0) {
        return {1.0, 0.0};
    }
    return {s * s * (3.0 - 2.0 * s), 6.0 * s * (1.0 - s) / width};
}

} // namespace coldtip::models
