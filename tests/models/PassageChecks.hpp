#pragma once
// Shared check of a flow passage's slopes against central differences.

#include <catch2/catch.hpp>

#include "models/correlations/FlowPassage.hpp"
#include "tests/models/CentralDifference.hpp"

namespace coldtip::models::testing {

//! f Re, Nu (at Pr) and the dispersion factor: analytic slopes against central differences
//! at Re (= Pe) from `from` to `to` in geometric steps of `factor`.
inline void checkPassageSlopes(const FlowPassage& passage, double from, double to,
                               double factor, double Pr)
{
    for (double x = from; x < to; x *= factor) {
        INFO("Re = Pe = " << x);
        const double dfRe = centralDifference(
            [&](double r) { return passage.frictionTimesReynolds(r).value; }, x);
        const double dNu =
            centralDifference([&](double r) { return passage.nusselt(r, Pr).value; }, x);
        const double dK = centralDifference(
            [&](double r) { return passage.axialConductionFactor(r).value; }, x);
        CHECK(passage.frictionTimesReynolds(x).slope ==
              Approx(dfRe).epsilon(1e-5).margin(1e-9));
        CHECK(passage.nusselt(x, Pr).slope == Approx(dNu).epsilon(1e-5).margin(1e-9));
        CHECK(passage.axialConductionFactor(x).slope ==
              Approx(dK).epsilon(1e-5).margin(1e-9));
    }
}

} // namespace coldtip::models::testing
