// TransportTable against the gas models: accuracy, slopes, continuity, clamping.
#include <catch2/catch.hpp>

#include <cmath>
#include <random>
#include <stdexcept>

#include "models/gas/TransportTable.hpp"
#include "models/gas/WorkingGas.hpp"
#include "tests/models/CentralDifference.hpp"

using namespace coldtip::models;
using coldtip::models::testing::centralDifference;

namespace {

// Largest relative deviation of the table from the model at random states.
double worstDeviation(const WorkingGas& gas, const TransportTable& table, int samples)
{
    std::mt19937 rng(11);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    const double ratio = table.maxTemperature() / table.minTemperature();
    double worst = 0.0;
    for (int n = 0; n < samples; ++n) {
        const double T = table.minTemperature() * std::pow(ratio, unit(rng));
        const double rho = table.maxDensity() * unit(rng);
        worst = std::max(
            worst, std::abs(table.viscosity(T, rho).value / gas.viscosity(T, rho) - 1));
        worst = std::max(
            worst,
            std::abs(table.conductivity(T, rho).value / gas.conductivity(T, rho) - 1));
    }
    return worst;
}

} // namespace

TEST_CASE("transport table reproduces every gas model within 0.1 % over its range",
          "[models][gas][table]")
{
    // Requirement of the engine (common practice for tabulated properties): 0.1 %.
    for (const auto& name : knownGasSpecies()) {
        const auto gas = makeWorkingGas(name);
        const TransportTable table(*gas, gas->minTemperature(), gas->maxTemperature(),
                                   200.0);
        INFO(name << ": " << table.temperatureCells() << " x " << table.densityCells()
                  << " cells");
        CHECK(worstDeviation(*gas, table, 50000) < 1e-3);
        CHECK(table.estimatedError() < TransportTable::kTargetError);
    }
}

TEST_CASE("transport table of helium at 3 MPa matches the TN 1334 and Hands-Arp values",
          "[models][gas][table]")
{
    // Reference sheet §1.2, p ~ 3 MPa: 77 K, 18.0 kg/m^3 -> 8.726 uPa s, 65.84 mW/(m K);
    // 30 K, 46.3 kg/m^3 -> 5.433 uPa s, 41.54 mW/(m K) [C from V-code].
    const auto he = makeWorkingGas("helium");
    const TransportTable table(*he, 4.0, 400.0, 120.0);
    CHECK(table.viscosity(77.0, 18.0).value == Approx(8.726e-6).epsilon(1e-3));
    CHECK(table.conductivity(77.0, 18.0).value == Approx(65.84e-3).epsilon(1e-3));
    CHECK(table.viscosity(30.0, 46.3).value == Approx(5.433e-6).epsilon(1e-3));
    CHECK(table.conductivity(30.0, 46.3).value == Approx(41.54e-3).epsilon(1e-3));
}

TEST_CASE("transport table slopes match central differences of the table and the model",
          "[models][gas][table]")
{
    const auto he = makeWorkingGas("helium");
    const TransportTable table(*he, 2.5, 1500.0, 200.0);
    std::mt19937 rng(3);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    for (int n = 0; n < 2000; ++n) {
        const double T = 2.6 * std::pow(1490.0 / 2.6, unit(rng));
        const double rho = 0.5 + 199.0 * unit(rng);
        for (int p = 0; p < 2; ++p) {
            auto at = [&](double Tx, double rx) {
                return p == 0 ? table.viscosity(Tx, rx) : table.conductivity(Tx, rx);
            };
            auto model = [&](double Tx, double rx) {
                return p == 0 ? he->viscosity(Tx, rx) : he->conductivity(Tx, rx);
            };
            const Slope2 s = at(T, rho);
            const double dT =
                centralDifference([&](double x) { return at(x, rho).value; }, T);
            const double dr =
                centralDifference([&](double x) { return at(T, x).value; }, rho);
            INFO("property " << p << " at T = " << T << " K, rho = " << rho);
            // Table against itself: exact up to the difference quotient's round-off.
            CHECK(s.d_dT == Approx(dT).epsilon(1e-5).margin(1e-9 * s.value / T));
            CHECK(s.d_drho == Approx(dr).epsilon(1e-5).margin(1e-9 * s.value / rho));
            // Table against the model: slopes of a 1e-4-accurate spline, to about 1 %.
            const double mT =
                centralDifference([&](double x) { return model(x, rho); }, T, 1e-5);
            const double mr =
                centralDifference([&](double x) { return model(T, x); }, rho, 1e-5);
            CHECK(std::abs(s.d_dT - mT) <= 0.02 * std::abs(mT) + 2e-3 * s.value / T);
            CHECK(std::abs(s.d_drho - mr) <=
                  0.02 * std::abs(mr) + 2e-3 * s.value / 200.0);
        }
    }
}

TEST_CASE("transport table is C1 across cell boundaries", "[models][gas][table]")
{
    // With T_min = 2.5 K and 16 cells per octave, 2.5 * 2^5 * (1 + 3/16) = 95 K is a node;
    // 200 kg/m^3 / 64 cells puts a node at 12.5 kg/m^3.
    const auto he = makeWorkingGas("helium");
    const TransportTable table(*he, 2.5, 1500.0, 200.0);
    REQUIRE(table.densityCells() % 16 == 0);
    const double T = 95.0;
    const double rho = 200.0 / table.densityCells() * 4;
    const double e = 1e-9;
    for (const auto& [a, b] :
         {std::pair{table.viscosity(T - e, rho), table.viscosity(T + e, rho)},
          std::pair{table.conductivity(T, rho - e), table.conductivity(T, rho + e)}}) {
        CHECK(a.value == Approx(b.value).epsilon(1e-9));
        CHECK(a.d_dT == Approx(b.d_dT).epsilon(1e-6));
        CHECK(a.d_drho == Approx(b.d_drho).epsilon(1e-6));
    }
}

TEST_CASE("transport table clamps outside its range with zero slope in the clamped "
          "direction",
          "[models][gas][table]")
{
    const auto he = makeWorkingGas("helium");
    const TransportTable table(*he, 10.0, 400.0, 50.0);
    const Slope2 cold = table.viscosity(5.0, 20.0);
    const Slope2 edge = table.viscosity(10.0, 20.0);
    CHECK(cold.value == edge.value);
    CHECK(cold.d_dT == 0.0);
    CHECK(cold.d_drho == Approx(edge.d_drho));
    const Slope2 dense = table.conductivity(300.0, 80.0);
    CHECK(dense.value == table.conductivity(300.0, 50.0).value);
    CHECK(dense.d_drho == 0.0);
    CHECK(dense.d_dT != 0.0);
    const Slope2 negative = table.conductivity(300.0, -1.0);
    CHECK(negative.value == table.conductivity(300.0, 0.0).value);
    CHECK(negative.d_drho == 0.0);
    const Slope2 hot = table.conductivity(900.0, 10.0);
    CHECK(hot.value == table.conductivity(400.0, 10.0).value);
    CHECK(hot.d_dT == 0.0);
}

TEST_CASE(
    "transport table range is the request intersected with the gas's validity range",
    "[models][gas][table]")
{
    const auto n2 = makeWorkingGas("nitrogen");
    const TransportTable table(*n2, 20.0, 5000.0, 10.0);
    CHECK(table.minTemperature() == n2->minTemperature());
    CHECK(table.maxTemperature() == n2->maxTemperature());
    CHECK(table.viscosity(30.0, 1.0).value ==
          Approx(n2->viscosity(30.0, 1.0)).epsilon(1e-12));
    const auto he = makeWorkingGas("helium");
    const TransportTable dense(*he, 2.0, 1000.0, 385.0);
    CHECK(dense.minTemperature() == he->minTemperature());
    CHECK(dense.maxDensity() == he->maxDensity());
    CHECK(dense.viscosity(4.0, 300.0).value ==
          Approx(he->viscosity(4.0, 300.0)).epsilon(1e-6));
    CHECK(dense.viscosity(4.0, 300.0).d_drho == 0.0);
    CHECK_THROWS_AS(TransportTable(*n2, 5.0, 20.0, 10.0), std::invalid_argument);
    CHECK_THROWS_AS(TransportTable(*n2, 100.0, 300.0, 0.0), std::invalid_argument);
}
