// Compressible orifice flow: published check values, choking, reversal, slopes.
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

#include "models/correlations/OrificeFlow.hpp"
#include "models/gas/WorkingGas.hpp"

using namespace coldtip::models;

namespace {

// C_d = 0.6, d = 1 mm (reference sheet §5).
const double kArea = 0.6 * std::numbers::pi * 0.25e-6;

double partialByDifference(double p_a, double T_a, double p_b, double T_b, double R,
                           double g, int which)
{
    double x[4] = {p_a, T_a, p_b, T_b};
    const double h = 1e-7 * x[which];
    auto at = [&](double v) {
        double y[4] = {x[0], x[1], x[2], x[3]};
        y[which] = v;
        return orificeMassFlow(y[0], y[1], y[2], y[3], kArea, R, g).mdot;
    };
    return (at(x[which] + h) - at(x[which] - h)) / (2.0 * h);
}

void checkPartials(double p_a, double T_a, double p_b, double T_b, double R, double g)
{
    const OrificeFlow f = orificeMassFlow(p_a, T_a, p_b, T_b, kArea, R, g);
    const double analytic[4] = {f.d_dpa, f.d_dTa, f.d_dpb, f.d_dTb};
    const double dpScale = std::abs(f.d_dpa) + std::abs(f.d_dpb);
    for (int k = 0; k < 4; ++k) {
        INFO("p_a = " << p_a << ", p_b = " << p_b << ", T_a = " << T_a
                      << ", T_b = " << T_b << ", partial " << k);
        const double numeric = partialByDifference(p_a, T_a, p_b, T_b, R, g, k);
        const double margin =
            (k % 2 == 0 ? 1e-6 * dpScale : 1e-6 * std::abs(f.mdot) / T_a);
        CHECK(analytic[k] == Approx(numeric).epsilon(1e-5).margin(margin));
    }
}

} // namespace

TEST_CASE("orifice flow matches the reference-sheet check values for helium and air",
          "[models][correlations]")
{
    // Reference sheet §5 [C] (isentropic nozzle, Shapiro 1953): C_d = 0.6, d = 1 mm,
    // p0 = 2 MPa, T0 = 300 K.
    const double R_he = makeWorkingGas("helium")->gasConstant();
    const double R_air = makeWorkingGas("air")->gasConstant();
    CHECK(orificeMassFlow(2e6, 300, 1.9e6, 300, kArea, R_he, 5.0 / 3.0).mdot ==
          Approx(3.689e-4).epsilon(5e-4));
    CHECK(orificeMassFlow(2e6, 300, 0.5e6, 300, kArea, R_he, 5.0 / 3.0).mdot ==
          Approx(8.670e-4).epsilon(5e-4));
    CHECK(orificeMassFlow(2e6, 300, 1.9e6, 300, kArea, R_air, 1.4).mdot ==
          Approx(9.880e-4).epsilon(5e-4));
    CHECK(orificeMassFlow(2e6, 300, 0.5e6, 300, kArea, R_air, 1.4).mdot ==
          Approx(2.199e-3).epsilon(5e-4));
}

TEST_CASE("orifice flow chokes below the critical pressure ratio",
          "[models][correlations]")
{
    // Reference sheet §5 [C]: gamma = 5/3: r* = 0.48714, choked coefficient 0.72618;
    // gamma = 1.4: r* = 0.52828, 0.68473 (mdot = C_d A p0 coeff / sqrt(R T0)).
    const double R = 2077.26, p0 = 2e6, T0 = 300;
    for (const auto& [g, r_star, coefficient] :
         {std::tuple{5.0 / 3.0, 0.48714, 0.72618}, std::tuple{1.4, 0.52828, 0.68473}}) {
        const double choked = kArea * p0 * coefficient / std::sqrt(R * T0);
        CHECK(orificeMassFlow(p0, T0, 0.3 * p0, T0, kArea, R, g).mdot ==
              Approx(choked).epsilon(1e-4));
        CHECK(orificeMassFlow(p0, T0, (r_star - 1e-4) * p0, T0, kArea, R, g).mdot ==
              Approx(choked).epsilon(1e-4));
        CHECK(orificeMassFlow(p0, T0, 0.3 * p0, T0, kArea, R, g).d_dpb == 0.0);
        CHECK(orificeMassFlow(p0, T0, (r_star + 0.02) * p0, T0, kArea, R, g).mdot <
              choked);
    }
}

TEST_CASE("orifice flow approaches the incompressible law for small pressure differences",
          "[models][correlations]")
{
    // mdot -> C_d A sqrt(2 rho0 dp) as dp/p0 -> 0 (reference sheet §5, from memory).
    const double R = 2077.26, p0 = 2e6, T0 = 300, dp = 0.01 * p0;
    const double rho0 = p0 / (R * T0);
    const double incompressible = kArea * std::sqrt(2.0 * rho0 * dp);
    CHECK(orificeMassFlow(p0, T0, p0 - dp, T0, kArea, R, 5.0 / 3.0).mdot ==
          Approx(incompressible).epsilon(0.005));
}

TEST_CASE("orifice flow is antisymmetric, continuous and finite-sloped through reversal",
          "[models][correlations]")
{
    const double R = 2077.26, g = 5.0 / 3.0, p = 2e6;
    // Upstream side chosen by sign(p_a - p_b): swapping the sides reverses the flow.
    for (double dp : {-1e5, -500.0, 0.0, 30.0, 2e3, 4e5}) {
        const OrificeFlow ab = orificeMassFlow(p + dp, 300, p, 60, kArea, R, g);
        const OrificeFlow ba = orificeMassFlow(p, 60, p + dp, 300, kArea, R, g);
        CHECK(ab.mdot == Approx(-ba.mdot).margin(1e-18));
        CHECK(ab.mdot * dp >= 0.0);
    }
    const OrificeFlow zero = orificeMassFlow(p, 300, p, 60, kArea, R, g);
    CHECK(zero.mdot == 0.0);
    CHECK(std::isfinite(zero.d_dpa));
    CHECK(zero.d_dpa > 0.0);
    CHECK(zero.d_dpb == Approx(-zero.d_dpa));
    // Through the regularisation band (eps = 1e-3, 2 kPa here) and its edges the flow
    // rises monotonically with p_a and never faster than about its slope at dp = 0.
    const double step = 10.0;
    double previous = orificeMassFlow(p - 4e3, 300, p, 60, kArea, R, g).mdot;
    for (double dp = -4e3 + step; dp <= 4e3; dp += step) {
        const double m = orificeMassFlow(p + dp, 300, p, 60, kArea, R, g).mdot;
        CHECK(m > previous);
        CHECK(m - previous < 1.5 * zero.d_dpa * step);
        previous = m;
    }
}

TEST_CASE("orifice flow partial derivatives match central differences",
          "[models][correlations]")
{
    const double R = 2077.26, g = 5.0 / 3.0, p = 2e6;
    const double dps[] = {-1.2e6, -3e5,  -5e3,  -1.9e3, -900.0, -300.0, -1.0, 0.0,
                          1.0,    300.0, 900.0, 1.9e3,  2.1e3,  5e3,    3e5,  1.2e6};
    for (double dp : dps) {
        checkPartials(p + dp, 300.0, p, 70.0, R, g);
        checkPartials(p, 80.0, p + dp, 290.0, R, g);
    }
    // Air, near the choking ratio from both sides.
    checkPartials(2e6, 300.0, 0.52828 * 2e6 * 1.01, 300.0, 287.1, 1.4);
    checkPartials(2e6, 300.0, 0.52828 * 2e6 * 0.99, 300.0, 287.1, 1.4);
}
