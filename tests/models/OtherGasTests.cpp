// Nitrogen, air, neon and argon transport properties, and the gas registry.
#include <catch2/catch.hpp>

#include <stdexcept>

#include "models/gas/WorkingGas.hpp"

using namespace coldtip::models;

namespace {
constexpr double kMicro = 1e-6;
constexpr double kMilli = 1e-3;
} // namespace

TEST_CASE("gas registry lists helium, nitrogen, neon, argon and air in that order",
          "[models][gas]")
{
    const std::vector<std::string> expected = {"helium", "nitrogen", "neon", "argon",
                                               "air"};
    CHECK(knownGasSpecies() == expected);
    for (const auto& name : expected) {
        CHECK(makeWorkingGas(name)->name() == name);
    }
    CHECK_THROWS_AS(makeWorkingGas("xenon"), std::invalid_argument);
    CHECK_THROWS_WITH(makeWorkingGas("xenon"), Catch::Contains("helium, nitrogen, neon"));
}

TEST_CASE(
    "nitrogen dilute viscosity and conductivity match Lemmon & Jacobsen at 77-300 K",
    "[models][gas]")
{
    // Lemmon & Jacobsen, Int. J. Thermophys. 25, 21 (2004), dilute-gas values as computed
    // in the reference sheet §1.4 [C] (printed to 3-4 figures: 0.2 %).
    struct Row {
        double T, eta, lambda;
    };
    const Row rows[] = {{77.355, 5.365, 7.04},
                        {100, 6.90, 9.28},
                        {200, 12.89, 18.23},
                        {300, 17.88, 25.94}};
    const auto n2 = makeWorkingGas("nitrogen");
    for (const Row& r : rows) {
        INFO("T = " << r.T << " K");
        CHECK(n2->viscosity(r.T, 0.0) == Approx(r.eta * kMicro).epsilon(2e-3));
        CHECK(n2->conductivity(r.T, 0.0) == Approx(r.lambda * kMilli).epsilon(2e-3));
    }
    // Real-gas check point 280 K, 1 MPa, 12.075 kg/m^3 (reference sheet §1.4 [V-code]):
    // mu = 17.0905 uPa s, k = 24.857 mW/(m K); the dilute model omits the residual terms,
    // which add 0.9 % and 1.6 % there.
    CHECK(n2->viscosity(280.0, 12.075) == Approx(17.0905 * kMicro).epsilon(0.012));
    CHECK(n2->conductivity(280.0, 12.075) == Approx(24.857 * kMilli).epsilon(0.02));
    // Ideal diatomic gas: R_s = 296.80 J/(kg K), gamma = 1.4 (reference sheet §1.4).
    CHECK(n2->gasConstant() == Approx(296.80).epsilon(1e-4));
    CHECK(n2->gamma() == Approx(1.4).epsilon(1e-12));
}

TEST_CASE("air viscosity and conductivity match Lemmon & Jacobsen at 300 K",
          "[models][gas]")
{
    // Reference sheet §1.5: dilute formula 18.52 uPa s, 26.35 mW/(m K) [C]; real-gas check
    // point at 101.325 kPa [V-code]: 18.538 uPa s, 26.386 mW/(m K).
    const auto air = makeWorkingGas("air");
    CHECK(air->viscosity(300.0, 1.17695) == Approx(18.52 * kMicro).epsilon(5e-4));
    CHECK(air->conductivity(300.0, 1.17695) == Approx(26.35 * kMilli).epsilon(5e-4));
    CHECK(air->viscosity(300.0, 1.17695) == Approx(18.538 * kMicro).epsilon(2e-3));
    CHECK(air->conductivity(300.0, 1.17695) == Approx(26.386 * kMilli).epsilon(2e-3));
    // R_s = R/M with M = 28.9586 g/mol (Lemmon et al. 2000) is 287.115 J/(kg K) [C]; the
    // sheet's 287.05 belongs to the older M = 28.965 g/mol.
    CHECK(air->gasConstant() == Approx(287.115).epsilon(1e-5));
    CHECK(air->gamma() == Approx(1.4).epsilon(1e-12));
}

TEST_CASE("neon viscosity and conductivity are near Kestin's room-temperature values",
          "[models][gas]")
{
    // Reference sheet §1.6 (from memory of Kestin et al., J. Phys. Chem. Ref. Data 13, 229,
    // 1984): eta(300 K) ~ 31.8 uPa s, lambda(300 K) ~ 49 mW/(m K); Chapman-Enskog with
    // Lennard-Jones parameters is good to a few per cent.
    const auto ne = makeWorkingGas("neon");
    CHECK(ne->viscosity(300.0, 0.0) == Approx(31.8 * kMicro).epsilon(0.03));
    CHECK(ne->conductivity(300.0, 0.0) == Approx(49.0 * kMilli).epsilon(0.03));
    CHECK(ne->gamma() == Approx(5.0 / 3.0).epsilon(1e-12));
    CHECK(ne->molarMass() == Approx(20.1797e-3).epsilon(1e-9));
}

TEST_CASE("argon viscosity and conductivity are near room-temperature literature values",
          "[models][gas]")
{
    // From memory (Kestin et al. 1984): eta(300 K) ~ 22.7 uPa s, lambda ~ 17.8 mW/(m K).
    const auto ar = makeWorkingGas("argon");
    CHECK(ar->viscosity(300.0, 0.0) == Approx(22.7 * kMicro).epsilon(0.03));
    CHECK(ar->conductivity(300.0, 0.0) == Approx(17.8 * kMilli).epsilon(0.03));
    CHECK(ar->gamma() == Approx(5.0 / 3.0).epsilon(1e-12));
}

TEST_CASE("every gas has positive, finite transport properties over its range",
          "[models][gas]")
{
    for (const auto& name : knownGasSpecies()) {
        const auto gas = makeWorkingGas(name);
        INFO(name);
        for (double T = gas->minTemperature(); T <= gas->maxTemperature(); T *= 1.05) {
            CHECK(gas->viscosity(T, 0.0) > 0.0);
            CHECK(gas->conductivity(T, 0.0) > 0.0);
            CHECK(gas->conductivity(T, 0.0) < 1.0);
        }
    }
}
