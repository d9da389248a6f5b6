// SolidTable against the materials: accuracy, slopes, integrals, inversion, clamping.
#include <catch2/catch.hpp>

#include <cmath>

#include "models/solids/SolidMaterial.hpp"
#include "models/solids/SolidTable.hpp"
#include "tests/models/CentralDifference.hpp"

using namespace coldtip::models;
using coldtip::models::testing::centralDifference;

namespace {

// Composite Simpson integral of f over [a, b] on a logarithmic substitution-free fine grid.
template <class F> double simpson(F&& f, double a, double b, int n = 20000)
{
    const double h = (b - a) / n;
    double sum = f(a) + f(b);
    for (int i = 1; i < n; ++i) {
        sum += (i % 2 == 1 ? 4.0 : 2.0) * f(a + i * h);
    }
    return sum * h / 3.0;
}

} // namespace

TEST_CASE("solid tables reproduce every material to 1e-4 inside its fits and 0.5 % where "
          "it is held",
          "[models][solids][table]")
{
    // Inside a fit range the spline follows the fit; on the held side of a fit-range end
    // it rounds the corner within one cell (SolidTable.hpp).
    for (const auto& name : knownSolidMaterials()) {
        const auto material = makeSolidMaterial(name);
        const SolidTable table(*material);
        INFO(name);
        CHECK(table.name() == name);
        CHECK(table.density() == material->density());
        double worstFit = 0.0;
        double worstHeld = 0.0;
        for (double T = 1.0; T <= 1000.0; T *= 1.0007) {
            const auto check = [&](double (SolidMaterial::*property)(double) const,
                                   double tabulated) {
                const double y = (*material.*property)(T);
                const bool held = y == (*material.*property)(T * (1.0 + 1e-6)) ||
                                  y == (*material.*property)(T * (1.0 - 1e-6));
                double& worst = held ? worstHeld : worstFit;
                worst = std::max(worst, std::abs(tabulated / y - 1.0));
            };
            check(&SolidMaterial::specificHeat, table.specificHeat(T).value);
            check(&SolidMaterial::conductivity, table.conductivity(T).value);
            CHECK(table.specificHeat(T).value > 0.0);
        }
        CHECK(worstFit < 1e-4);
        CHECK(worstHeld < 5e-3);
    }
}

TEST_CASE("solid table slopes match central differences", "[models][solids][table]")
{
    for (const auto& name : knownSolidMaterials()) {
        const SolidTable table(*makeSolidMaterial(name));
        for (double T = 1.01; T < 1000.0; T *= 1.013) {
            INFO(name << " at T = " << T << " K");
            const Slope cp = table.specificHeat(T);
            const Slope k = table.conductivity(T);
            const double dcp = centralDifference(
                [&](double x) { return table.specificHeat(x).value; }, T);
            const double dk = centralDifference(
                [&](double x) { return table.conductivity(x).value; }, T);
            CHECK(cp.slope == Approx(dcp).epsilon(1e-5).margin(1e-8 * cp.value / T));
            CHECK(k.slope == Approx(dk).epsilon(1e-5).margin(1e-8 * k.value / T));
        }
    }
}

TEST_CASE("solid table enthalpy is the integral of its specific heat",
          "[models][solids][table]")
{
    // Consistency required by the engine: dh/dT = c_p to 1e-6 relative; and h(300 K) -
    // h(4 K) equals the integral of the material's own c_p (Simpson) to 1e-4.
    const auto ss = makeSolidMaterial("stainless-304");
    const SolidTable table(*ss);
    for (double T = 1.2; T < 1000.0; T *= 1.05) {
        INFO("T = " << T << " K");
        const double dh =
            centralDifference([&](double x) { return table.enthalpy(x); }, T, 1e-5);
        CHECK(dh == Approx(table.specificHeat(T).value).epsilon(1e-6));
    }
    const double direct =
        simpson([&](double T) { return ss->specificHeat(T); }, 4.0, 300.0);
    CHECK(table.enthalpy(300.0) - table.enthalpy(4.0) == Approx(direct).epsilon(1e-4));
    // Reference h(0 K) = 0 with c_p held at its 1 K value below 1 K.
    CHECK(table.enthalpy(0.0) == 0.0);
    CHECK(table.enthalpy(0.5) ==
          Approx(0.5 * table.specificHeat(1.0).value).epsilon(1e-12));
    // Above 1000 K the held c_p integrates linearly.
    CHECK(table.enthalpy(1100.0) - table.enthalpy(1000.0) ==
          Approx(100.0 * table.specificHeat(1000.0).value).epsilon(1e-9));
}

TEST_CASE("solid table temperature from enthalpy inverts the enthalpy",
          "[models][solids][table]")
{
    for (const auto& name : knownSolidMaterials()) {
        const SolidTable table(*makeSolidMaterial(name));
        for (double T = 0.3; T < 1500.0; T *= 1.0101) {
            INFO(name << " at T = " << T << " K");
            CHECK(table.temperatureFromEnthalpy(table.enthalpy(T)) ==
                  Approx(T).epsilon(1e-12));
        }
        CHECK(table.temperatureFromEnthalpy(table.enthalpy(2.0)) ==
              Approx(2.0).epsilon(1e-14));
    }
}

TEST_CASE("solid table conductivity integral matches the material's k",
          "[models][solids][table]")
{
    const auto cu = makeSolidMaterial("copper-rrr50");
    const SolidTable table(*cu);
    const double direct =
        simpson([&](double T) { return cu->conductivity(T); }, 4.0, 300.0);
    CHECK(table.conductivityIntegral(4.0, 300.0) == Approx(direct).epsilon(1e-4));
    CHECK(table.conductivityIntegral(300.0, 4.0) == Approx(-direct).epsilon(1e-4));
    CHECK(table.conductivityIntegral(77.0, 77.0) == 0.0);
    const double dK = centralDifference(
        [&](double x) { return table.conductivityIntegral(50.0, x); }, 120.0);
    CHECK(dK == Approx(table.conductivity(120.0).value).epsilon(1e-6));
    // Outside 1-1000 K the held k integrates linearly.
    CHECK(table.conductivityIntegral(1000.0, 1200.0) ==
          Approx(200.0 * table.conductivity(1000.0).value).epsilon(1e-9));
}

TEST_CASE("solid table clamps outside 1-1000 K with zero slope",
          "[models][solids][table]")
{
    const SolidTable table(*makeSolidMaterial("stainless-304"));
    CHECK(table.conductivity(0.5).value == table.conductivity(1.0).value);
    CHECK(table.conductivity(0.5).slope == 0.0);
    CHECK(table.specificHeat(2000.0).value == table.specificHeat(1000.0).value);
    CHECK(table.specificHeat(2000.0).slope == 0.0);
    // The 304 k fit starts at 1 K, so the table's slope there is the fit's.
    CHECK(table.conductivity(1.0 + 1e-9).slope > 0.0);
}

TEST_CASE("solid table is C1 at its nodes", "[models][solids][table]")
{
    // 64 cells per octave from 1 K: 16 + 5 * 16/64 = 17.25 K and 300 K are nodes.
    const SolidTable table(*makeSolidMaterial("copper-rrr100"));
    for (double T : {17.25, 300.0, 4.0}) {
        const double e = 1e-9 * T;
        INFO("T = " << T << " K");
        CHECK(table.conductivity(T - e).value ==
              Approx(table.conductivity(T + e).value).epsilon(1e-8));
        CHECK(table.conductivity(T - e).slope ==
              Approx(table.conductivity(T + e).slope).epsilon(1e-5).margin(1e-9));
        CHECK(table.specificHeat(T - e).slope ==
              Approx(table.specificHeat(T + e).slope).epsilon(1e-5).margin(1e-9));
    }
}
