// Rott's thermoviscous functions and the Womersley factors against the check values of the
// physics reference (§6.2, §6.5), computed there with SciPy from the published formulas
// (Rott, Z. Angew. Math. Phys. 20, 230, 1969; Womersley, J. Physiol. 127, 553, 1955).
#include <catch2/catch.hpp>

#include <cmath>

#include "models/correlations/RottFunctions.hpp"

using namespace coldtip::models;

TEST_CASE("Rott functions of circular pores and plates match the reference table", "[linear]")
{
    struct Row {
        double x, circ_re, circ_im, plate_re, plate_im;
    };
    // physics reference §6.2, check values [C]
    const Row rows[] = {{0.1, 0.999992, -0.002500, 0.999947, -0.006666},
                        {0.5, 0.994830, -0.062056, 0.967980, -0.160187},
                        {1, 0.925506, -0.224410, 0.677838, -0.406085},
                        {2, 0.536534, -0.369308, 0.248861, -0.263057},
                        {5, 0.200637, -0.179517, 0.100003, -0.100013},
                        {10, 0.100069, -0.094938, 0.050000, -0.050000},
                        {20, 0.050008, -0.048742, 0.025000, -0.025000}};
    for (const Row& r : rows) {
        INFO("x = " << r.x);
        const auto c = rottCircular(r.x).value;
        const auto p = rottPlates(r.x).value;
        CHECK(c.real() == Approx(r.circ_re).margin(1e-6));
        CHECK(c.imag() == Approx(r.circ_im).margin(1e-6));
        CHECK(p.real() == Approx(r.plate_re).margin(1e-6));
        CHECK(p.imag() == Approx(r.plate_im).margin(1e-6));
        // 1 - f computed without cancellation agrees with f
        CHECK(std::abs(oneMinusRottCircular(r.x).value - (1.0 - c)) < 1e-12);
    }
    // The continued fraction (|z| < 40) and the asymptotic series (|z| >= 40) join: the
    // step across |z| = 40 is the slope's share of the 2e-9 relative step and no more.
    const double x_join = 40.0 / std::sqrt(2.0), h = 1e-9 * x_join;
    const auto below = rottCircular(x_join - h), above = rottCircular(x_join + h);
    CHECK(std::abs(above.value - below.value - 2.0 * h * below.slope) < 1e-13);
}

TEST_CASE("Womersley resistance and inertance factors match the reference table", "[linear]")
{
    struct Row {
        double alpha, resistance, inertance;
    };
    // physics reference §6.5 [C]: Z'/(8 mu/(pi R^4)) = i alpha^2/(8 (1 - f_nu))
    const Row rows[] = {{0.5, 1.00005, 1.33332}, {1, 1.00087, 1.33310}, {2, 1.01362, 1.32971},
                        {3, 1.06410, 1.31644},   {5, 1.32236, 1.25396}, {10, 2.17577, 1.13838},
                        {20, 3.92709, 1.07036}};
    for (const Row& r : rows) {
        INFO("alpha = " << r.alpha);
        const double x = r.alpha / std::sqrt(2.0);
        CHECK(womersleyResistanceFactor(x).value == Approx(r.resistance).margin(6e-6));
        CHECK(womersleyInertanceFactor(x).value == Approx(r.inertance).margin(6e-6));
    }
    CHECK(womersleyInertanceFactor(0.0).value == Approx(4.0 / 3.0)); // Poiseuille profile
}

TEST_CASE("slopes of the oscillating-flow factors are the derivatives of their values", "[linear]")
{
    // Central differences (relative step 1e-5) against the analytic slopes the Jacobian uses.
    for (double x : {0.3, 1.0, 3.0, 12.0, 27.0, 29.0, 80.0}) {
        INFO("x = " << x);
        const double h = 1e-5 * x;
        auto check = [&](Slope (*law)(double)) {
            const double fd = (law(x + h).value - law(x - h).value) / (2.0 * h);
            CHECK(law(x).slope == Approx(fd).epsilon(1e-6).margin(1e-9));
        };
        check(womersleyResistanceFactor);
        check(womersleyInertanceFactor);
        check(rottNusselt);
    }
}

TEST_CASE("oscillating Nusselt number has the uniform-heating and thin-layer limits", "[linear]")
{
    // Uniform volumetric heating of a round tube gives Nu = 8 on the mean temperature
    // (from memory: W. M. Kays and M. E. Crawford, "Convective Heat and Mass Transfer",
    // fully developed profile with uniform heat generation); a thin thermal layer gives
    // h = k/(delta_kappa/2)... here Nu = 2 x + 3 (derived in RottFunctions.hpp).
    CHECK(rottNusselt(1e-3).value == Approx(8.0).epsilon(1e-6));
    CHECK(rottNusselt(1000.0).value == Approx(2003.0).epsilon(1e-4));
}
