// Numerical building blocks of the property tables and closure laws.
#include <catch2/catch.hpp>

#include <cmath>
#include <random>

#include "models/numeric/CubicHermite.hpp"
#include "models/numeric/OctaveGrid.hpp"
#include "models/numeric/PowerLaw.hpp"
#include "models/numeric/SmoothStep.hpp"
#include "tests/models/CentralDifference.hpp"

using namespace coldtip::models;
using coldtip::models::testing::centralDifference;

TEST_CASE("octave grid has equal cells per octave and finds the cell of any x",
          "[models][numeric]")
{
    const OctaveGrid grid(2.5, 1500.0, 16);
    CHECK(grid.minimum() == 2.5);
    CHECK(grid.maximum() == 1500.0);
    CHECK(grid.node(16) == 5.0);
    CHECK(grid.node(17) == Approx(5.0 * (1.0 + 1.0 / 16.0)));
    std::mt19937 rng(5);
    std::uniform_real_distribution<double> unit(0.0, 1.0);
    for (int n = 0; n < 100000; ++n) {
        const double x = 2.5 * std::pow(600.0, unit(rng));
        const int i = grid.cell(x);
        REQUIRE(i >= 0);
        REQUIRE(i < grid.cellCount());
        CHECK(grid.node(i) <= x * (1.0 + 1e-15));
        CHECK(x <= grid.node(i + 1) * (1.0 + 1e-15));
    }
    CHECK(grid.cell(2.5) == 0);
    CHECK(grid.cell(1500.0) == grid.cellCount() - 1);
}

TEST_CASE("octave grid shortens or merges its last cell to end exactly at x_max",
          "[models][numeric]")
{
    // 1..10 with 4 cells per octave: regular nodes ..., 8, 10, 12; 10 is a node.
    const OctaveGrid exact(1.0, 10.0, 4);
    CHECK(exact.node(exact.cellCount() - 1) == 8.0);
    // 1..10.2: the sliver 10..10.2 is merged into the cell 8..10.2.
    const OctaveGrid merged(1.0, 10.2, 4);
    CHECK(merged.node(merged.cellCount() - 1) == 8.0);
    CHECK(merged.maximum() == 10.2);
    CHECK(merged.cell(10.1) == merged.cellCount() - 1);
    // 1..11: the cell 10..12 is cut at 11.
    const OctaveGrid cut(1.0, 11.0, 4);
    CHECK(cut.node(cut.cellCount() - 1) == 10.0);
    CHECK(cut.cell(10.5) == cut.cellCount() - 1);
    CHECK_THROWS(OctaveGrid(0.0, 1.0, 4));
}

TEST_CASE("cubic Hermite cells interpolate value and slope and integrate exactly",
          "[models][numeric]")
{
    const Cubic p = Cubic::hermite(1.0, 3.0, 0.5, -2.0);
    CHECK(p.value(0.0) == 1.0);
    CHECK(p.value(1.0) == Approx(3.0));
    CHECK(p.slope(0.0) == 0.5);
    CHECK(p.slope(1.0) == Approx(-2.0));
    // integral_0^1 = (f0 + f1)/2 + (d0 - d1)/12 (de Boor 1978).
    CHECK(p.integral(1.0) == Approx(2.0 + 2.5 / 12.0));
    CHECK(centralDifference([&](double t) { return p.integral(t); }, 0.3) ==
          Approx(p.value(0.3)));

    HermiteCorners d;
    d.f[0][0] = 1.0;
    d.f[1][0] = 2.0;
    d.f[0][1] = 3.0;
    d.f[1][1] = 5.0;
    d.ft[0][0] = 0.1;
    d.fu[1][1] = -0.4;
    d.ftu[0][1] = 0.7;
    const auto a = bicubicHermite(d);
    auto patch = [&](double t, double u) {
        double sum = 0.0;
        for (int i = 0; i < 4; ++i) {
            for (int j = 0; j < 4; ++j) {
                sum += a[static_cast<std::size_t>(4 * i + j)] * std::pow(t, i) *
                       std::pow(u, j);
            }
        }
        return sum;
    };
    CHECK(patch(0, 0) == Approx(1.0));
    CHECK(patch(1, 1) == Approx(5.0));
    CHECK(patch(0, 1) == Approx(3.0));
    CHECK(centralDifference([&](double t) { return patch(t, 0.0); }, 0.0) ==
          Approx(0.1).margin(1e-8));
    CHECK(centralDifference([&](double u) { return patch(1.0, u); }, 1.0) ==
          Approx(-0.4).margin(1e-8));
}

TEST_CASE("smoothstep is C1 with zero slope at both ends", "[models][numeric]")
{
    CHECK(smoothStep(1.0, 2.0, 4.0).value == 0.0);
    CHECK(smoothStep(5.0, 2.0, 4.0).value == 1.0);
    CHECK(smoothStep(3.0, 2.0, 4.0).value == 0.5);
    CHECK(smoothStep(2.0 + 1e-9, 2.0, 4.0).slope == Approx(0.0).margin(1e-8));
    for (double x = 2.05; x < 4.0; x += 0.1) {
        CHECK(smoothStep(x, 2.0, 4.0).slope ==
              Approx(centralDifference(
                  [](double y) { return smoothStep(y, 2.0, 4.0).value; }, x)));
    }
}

TEST_CASE("regularised power law is smooth at zero and follows x^p above a few x0",
          "[models][numeric]")
{
    // Analytic at zero: value x0^p, slope 0; symmetric in x.
    CHECK(powerLaw(0.0, 0.66).value == Approx(std::pow(kPowerLawRegularisation, 0.66)));
    CHECK(powerLaw(0.0, 0.66).slope == 0.0);
    CHECK(powerLaw(-3.0, 0.66).value == Approx(powerLaw(3.0, 0.66).value));
    // Within 1 % of the plain law from 6 x0 up (the header's claim), exact far above.
    for (double x = 6.0; x < 1e4; x *= 1.7)
        CHECK(powerLaw(x, 0.66).value == Approx(std::pow(x, 0.66)).epsilon(0.01));
    CHECK(powerLaw(1e4, 0.897).value == Approx(std::pow(1e4, 0.897)).epsilon(1e-8));
    for (double x = 1e-4; x < 1e4; x *= 3.1) {
        CHECK(powerLaw(x, 0.6).slope ==
              Approx(centralDifference([](double y) { return powerLaw(y, 0.6).value; }, x))
                  .margin(1e-6));
    }
}
