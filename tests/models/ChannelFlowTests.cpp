// Tube and slot closure laws: friction factors, Nusselt numbers, transition blend.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

#include "models/correlations/Gnielinski.hpp"
#include "models/correlations/OpenTube.hpp"
#include "models/correlations/Slots.hpp"
#include "models/correlations/TubeFriction.hpp"
#include "tests/models/CentralDifference.hpp"
#include "tests/models/PassageChecks.hpp"

using namespace coldtip::models;
using coldtip::models::testing::centralDifference;
using coldtip::models::testing::checkPassageSlopes;

TEST_CASE("tube friction factors match the reference-sheet table at Re 4e3-1e5",
          "[models][correlations]")
{
    // Reference sheet §4.1, smooth tube [C]: Haaland (1983) and Petukhov (1970) columns to
    // their printed four figures; Haaland within 2 % of Colebrook (Haaland 1983).
    struct Row {
        double Re, haaland, petukhov, colebrook;
    };
    const Row rows[] = {{4000, 0.04042, 0.04144, 0.03991},
                        {10000, 0.03089, 0.03148, 0.03088},
                        {100000, 0.01782, 0.01799, 0.01799}};
    for (const Row& r : rows) {
        INFO("Re = " << r.Re);
        CHECK(haalandFriction(r.Re, 0.0).value == Approx(r.haaland).epsilon(3e-4));
        CHECK(petukhovFriction(r.Re).value == Approx(r.petukhov).epsilon(3e-4));
        CHECK(haalandFriction(r.Re, 0.0).value == Approx(r.colebrook).epsilon(0.02));
    }
}

TEST_CASE("Gnielinski Nusselt number matches the reference-sheet table",
          "[models][correlations]")
{
    // Reference sheet §4.1, Pr = 0.67 [C] (Gnielinski 1976 with Petukhov f), 4 figures.
    CHECK(gnielinskiNusselt(4000, 0.67).value == Approx(13.25).epsilon(5e-4));
    CHECK(gnielinskiNusselt(10000, 0.67).value == Approx(29.17).epsilon(5e-4));
    CHECK(gnielinskiNusselt(100000, 0.67).value == Approx(173.7).epsilon(5e-4));
}

TEST_CASE("turbulent tube law slopes match central differences", "[models][correlations]")
{
    for (double Re = 2000.0; Re < 1e6; Re *= 1.7) {
        for (double eps : {0.0, 1e-4, 1e-2}) {
            INFO("Re = " << Re << ", eps/D = " << eps);
            CHECK(haalandFriction(Re, eps).slope ==
                  Approx(centralDifference(
                             [&](double x) { return haalandFriction(x, eps).value; }, Re))
                      .epsilon(1e-6));
        }
        CHECK(petukhovFriction(Re).slope ==
              Approx(centralDifference([](double x) { return petukhovFriction(x).value; },
                                       Re))
                  .epsilon(1e-6));
        CHECK(gnielinskiNusselt(Re, 0.7).slope ==
              Approx(centralDifference(
                         [](double x) { return gnielinskiNusselt(x, 0.7).value; }, Re))
                  .epsilon(1e-6));
    }
}

TEST_CASE("open tube is Hagen-Poiseuille when laminar", "[models][correlations]")
{
    // Hagen-Poiseuille: dp = 128 mu L Q / (pi D^4); through the engine's form
    // dp = (f Re) mu dx mdot / (2 rho A d_h^2) with f Re = 64 (Shah & London 1978).
    const double D = 2e-3;
    const OpenTube tube(D);
    CHECK(tube.porosity() == 1.0);
    CHECK(tube.hydraulicDiameter() == D);
    CHECK(tube.wettedAreaPerVolume() == Approx(4.0 / D));
    const double mu = 2e-5, rho = 5.0, L = 0.1, Q = 1e-6;
    const double A = std::numbers::pi * D * D / 4.0;
    for (double Re : {0.0, 1.0, 500.0, 1999.0}) {
        const Slope fRe = tube.frictionTimesReynolds(Re);
        CHECK(fRe.value == 64.0);
        CHECK(fRe.slope == 0.0);
        const double dp = fRe.value * mu * L * rho * Q / (2.0 * rho * A * D * D);
        CHECK(dp == Approx(128.0 * mu * L * Q / (std::numbers::pi * std::pow(D, 4)))
                        .epsilon(1e-12));
        CHECK(tube.nusselt(Re, 0.67).value == 3.66); // uniform wall temperature
    }
}

TEST_CASE("open tube blends laminar and turbulent laws C1 over Re 2000-4000",
          "[models][correlations]")
{
    const OpenTube tube(2e-3, 1e-3);
    // Fully turbulent above 4000: Haaland with roughness and Gnielinski.
    CHECK(tube.frictionTimesReynolds(1e4).value ==
          Approx(haalandFriction(1e4, 1e-3).value * 1e4));
    CHECK(tube.nusselt(1e4, 0.67).value == Approx(gnielinskiNusselt(1e4, 0.67).value));
    // Slopes agree with central differences everywhere, including inside the band.
    checkPassageSlopes(tube, 1900.0, 4200.0, 1.01, 0.67);
    checkPassageSlopes(tube, 1.0, 1e6, 1.5, 0.67);
    // Value and slope continuous at both ends of the band.
    for (double Re : {2000.0, 4000.0}) {
        const double e = 1e-7;
        CHECK(tube.frictionTimesReynolds(Re - e).value ==
              Approx(tube.frictionTimesReynolds(Re + e).value));
        CHECK(tube.frictionTimesReynolds(Re - e).slope ==
              Approx(tube.frictionTimesReynolds(Re + e).slope).margin(1e-6));
        CHECK(tube.nusselt(Re - e, 0.67).slope ==
              Approx(tube.nusselt(Re + e, 0.67).slope).margin(1e-8));
    }
    CHECK_THROWS(OpenTube(2e-3, 0.0, TransitionRange{3000.0, 2000.0}));
    CHECK_THROWS(OpenTube(-1.0));
}

TEST_CASE("slots have f Re = 96 and Nu = 7.541 when laminar", "[models][correlations]")
{
    // Shah & London (1978): parallel plates, d_h = 2 x gap, f Re = 96, Nu = 7.541 (uniform
    // wall temperature on both walls).
    const Slots slots(0.3, 0.4e-3);
    CHECK(slots.frictionTimesReynolds(100.0).value == 96.0);
    CHECK(slots.nusselt(100.0, 0.67).value == 7.541);
    CHECK(slots.wettedAreaPerVolume() == Approx(4.0 * 0.3 / 0.4e-3));
    CHECK(slots.axialConductionFactor(50.0).value == 1.0);
    // Turbulent: the smooth-tube laws on d_h (common practice).
    CHECK(slots.frictionTimesReynolds(2e4).value ==
          Approx(haalandFriction(2e4, 0.0).value * 2e4));
    CHECK(slots.nusselt(2e4, 0.67).value == Approx(gnielinskiNusselt(2e4, 0.67).value));
    checkPassageSlopes(slots, 10.0, 1e5, 1.07, 0.67);
    CHECK_THROWS(Slots(1.5, 1e-3));
}
