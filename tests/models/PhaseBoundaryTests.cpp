// Vapour-pressure curves of the working gases (models/gas/PhaseBoundary.hpp) against their
// normal boiling points, 101.325 kPa by definition.
#include "models/gas/PhaseBoundary.hpp"

#include <catch2/catch.hpp>

using coldtip::models::phaseBoundary;

TEST_CASE("vapour pressure at the normal boiling point is one atmosphere", "[models]")
{
    struct Row {
        const char* species;
        double boiling;    // [K]
        double tolerance;  // relative, on the pressure
    };
    // Nitrogen 77.355 K (Span et al., J. Phys. Chem. Ref. Data 29, 1361, 2000), argon
    // 87.302 K (Tegeler et al., J. Phys. Chem. Ref. Data 28, 779, 1999): their own
    // vapour-pressure equations, to 1e-4. Helium 4.222 K (ITS-90): a point of its line.
    // Neon 27.104 K (from memory): the two-point line through the triple and critical
    // points, within its stated 2 %.
    const Row rows[] = {{"nitrogen", 77.355, 1e-4},
                        {"argon", 87.302, 1e-4},
                        {"helium", 4.222, 1e-9},
                        {"neon", 27.104, 0.02}};
    for (const Row& r : rows) {
        INFO(r.species);
        const auto& b = phaseBoundary(r.species);
        CHECK(b.saturationPressure(r.boiling) == Approx(101325.0).epsilon(r.tolerance));
        const auto t = b.saturationTemperature(101325.0);
        REQUIRE(t);
        CHECK(*t == Approx(r.boiling).epsilon(r.tolerance));
    }
}

TEST_CASE("above the critical pressure there is no saturation temperature", "[models]")
{
    // Critical points: nitrogen 126.192 K, 3.3958 MPa (Span et al. 2000); helium 5.1953 K,
    // 0.22746 MPa (Ortiz-Vega et al., NIST IR 8474, 2023).
    CHECK_FALSE(phaseBoundary("nitrogen").saturationTemperature(3.4e6));
    CHECK_FALSE(phaseBoundary("helium").saturationTemperature(1.6e6));
    // At 2.9 MPa nitrogen boils at 122.92 K (Span et al.'s equation, evaluated separately).
    CHECK(*phaseBoundary("nitrogen").saturationTemperature(2.9e6) ==
          Approx(122.917).margin(0.01));
    CHECK(phaseBoundary("nitrogen").saturationPressure(126.192) == Approx(3.3958e6));
    CHECK_THROWS_AS(phaseBoundary("xenon"), std::invalid_argument);
}
