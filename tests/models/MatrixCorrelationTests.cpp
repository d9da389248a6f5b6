// Porous-matrix closure laws: woven screens (Gedeon & Wood), sphere beds (Ergun,
// Wakao & Kaguei), matrix axial conduction (Lewis et al.).
#include <catch2/catch.hpp>

#include <cmath>
#include <numbers>

#include "models/correlations/MatrixConduction.hpp"
#include "models/correlations/PackedSpheres.hpp"
#include "models/correlations/WovenScreen.hpp"
#include "tests/models/PassageChecks.hpp"

using namespace coldtip::models;
using coldtip::models::testing::checkPassageSlopes;

namespace {
constexpr double kInch = 0.0254;
} // namespace

TEST_CASE("woven screen geometry matches the reference-sheet screen table",
          "[models][correlations]")
{
    // Reference sheet §3.1 [C] from phi = 1 - pi m d_w/4, a = 4(1-phi)/d_w,
    // d_h = phi d_w/(1-phi) (Kays & London 1964), printed to 3-4 figures.
    struct Row {
        double mesh_per_inch, d_w_um, phi, a, d_h_um;
    };
    const Row rows[] = {{200, 53.3, 0.670, 24737, 108.4},
                        {250, 40.6, 0.686, 30921, 88.8},
                        {325, 35.6, 0.642, 40198, 63.9},
                        {400, 25.4, 0.686, 49474, 55.5},
                        {635, 20.3, 0.601, 78540, 30.6}};
    for (const Row& r : rows) {
        INFO(r.mesh_per_inch << " mesh");
        const WovenScreen s(r.mesh_per_inch / kInch, r.d_w_um * 1e-6);
        CHECK(s.porosity() == Approx(r.phi).margin(6e-4));
        CHECK(s.wettedAreaPerVolume() == Approx(r.a).epsilon(1e-4));
        CHECK(s.hydraulicDiameter() == Approx(r.d_h_um * 1e-6).epsilon(2e-3));
    }
    const WovenScreen measured(400 / kInch, 25.4e-6, 0.70);
    CHECK(measured.porosity() == 0.70);
    CHECK(measured.hydraulicDiameter() == Approx(0.70 * 25.4e-6 / 0.30));
    CHECK_THROWS(WovenScreen(400 / kInch, 25.4e-6, 1.2));
    CHECK_THROWS(WovenScreen(2000 / kInch, 1e-3)); // wires wider than the pitch
}

TEST_CASE("woven screen friction and Nusselt match the Gedeon-Wood check values",
          "[models][correlations]")
{
    // Reference sheet §3.3 [C], Gedeon & Wood (1996) NASA CR-198442, phi = 0.686,
    // Pr = 0.67, printed to 4 figures.
    // The laws are regularised below Re, Pe ~ 1 (PowerLaw.hpp): at Re = 10 (Pe = 6.7) the
    // Nusselt number is 0.6 % above the plain law, from Re = 100 on within 5e-4.
    const WovenScreen s(250 / kInch, 40.6e-6, 0.686);
    const double Re[] = {10, 100, 1000};
    const double f[] = {15.20, 3.101, 1.558};
    const double Nu[] = {2.279, 8.598, 37.48};
    const double tolerance[] = {1e-2, 6e-4, 6e-4};
    for (int i = 0; i < 3; ++i) {
        INFO("Re = " << Re[i]);
        CHECK(s.frictionTimesReynolds(Re[i]).value / Re[i] == Approx(f[i]).epsilon(2e-3));
        CHECK(s.nusselt(Re[i], 0.67).value == Approx(Nu[i]).epsilon(tolerance[i]));
    }
    // At Re = 1, below the range Gedeon & Wood fitted, the regularised law holds.
    CHECK(s.frictionTimesReynolds(1.0).value == Approx(129.0 + 2.91 * std::pow(2.0, 0.4485)));
    // Dispersion 1 + 0.5 Pe^0.66 phi^-2.91 at Pe = 100: 1 + 0.5 * 20.893 * 2.9943 [C].
    CHECK(s.axialConductionFactor(100.0).value ==
          Approx(1.0 + 0.5 * std::pow(100.0, 0.66) * std::pow(0.686, -2.91))
              .epsilon(1e-4));
    CHECK(s.axialConductionFactor(100.0).value == Approx(32.28).epsilon(1e-3));
}

TEST_CASE("woven screen laws are smooth at Re = 0 and their slopes match central "
          "differences",
          "[models][correlations]")
{
    // At zero flow the regularised power laws hold x0^p = 1 (PowerLaw.hpp), slopes zero.
    const WovenScreen s(200 / kInch, 53.3e-6);
    const Slope f0 = s.frictionTimesReynolds(0.0);
    CHECK(f0.value == Approx(129.0 + 2.91));
    CHECK(f0.slope == 0.0);
    CHECK(s.nusselt(0.0, 0.67).value == Approx(1.99 * std::pow(s.porosity(), 1.79)));
    CHECK(s.nusselt(0.0, 0.67).slope == 0.0);
    CHECK(s.axialConductionFactor(0.0).value ==
          Approx(1.0 + 0.5 * std::pow(s.porosity(), -2.91)));
    CHECK(s.axialConductionFactor(0.0).slope == 0.0);
    checkPassageSlopes(s, 0.01, 1e4, 1.9, 0.67);
}

TEST_CASE("packed spheres reproduce Ergun's pressure gradient through f Re on d_h",
          "[models][correlations]")
{
    // Reference sheet §3.4 [C]: Ergun (1952), phi = 0.38, d_p = 100 um, mu = 2e-5 Pa s,
    // rho = 4.8 kg/m^3, u_s = 0.1 m/s -> 2.197e5 Pa/m. Computed here the engine's way:
    // dp/dx = (f Re) mu mdot / (2 rho A_flow d_h^2), mdot = rho u_s A_frontal.
    const double phi = 0.38, dp = 100e-6, mu = 2e-5, rho = 4.8, us = 0.1;
    const PackedSpheres bed(dp, phi);
    CHECK(bed.hydraulicDiameter() == Approx(2.0 * phi * dp / (3.0 * (1.0 - phi))));
    CHECK(bed.wettedAreaPerVolume() == Approx(6.0 * (1.0 - phi) / dp));
    const double A = 1.0;
    const double mdot = rho * us * A;
    const double u = us / phi;
    const double Re = rho * u * bed.hydraulicDiameter() / mu;
    const double dh = bed.hydraulicDiameter();
    const double gradient =
        bed.frictionTimesReynolds(Re).value * mu * mdot / (2.0 * rho * phi * A * dh * dh);
    CHECK(gradient == Approx(2.197e5).epsilon(5e-4));
    // ... and equals Ergun's two terms exactly for any porosity and velocity.
    for (double p : {0.3, 0.45, 0.6}) {
        for (double v : {1e-3, 0.3, 10.0}) {
            const PackedSpheres b(dp, p);
            const double d = b.hydraulicDiameter();
            const double re = rho * (v / p) * d / mu;
            const double g =
                b.frictionTimesReynolds(re).value * mu * (v / p) / (2.0 * d * d);
            const double ergun =
                150.0 * mu * (1 - p) * (1 - p) * v / (p * p * p * dp * dp) +
                1.75 * rho * (1 - p) * v * v / (p * p * p * dp);
            CHECK(g == Approx(ergun).epsilon(1e-12));
        }
    }
    CHECK(bed.frictionTimesReynolds(0.0).value == Approx(400.0 / 3.0));
    CHECK(bed.frictionTimesReynolds(50.0).slope == Approx(7.0 / 3.0));
}

TEST_CASE("packed spheres heat transfer matches the Wakao-Kaguei check value",
          "[models][correlations]")
{
    // Wakao & Kaguei (1982): Nu_p = 2 + 1.1 Pr^(1/3) Re_p^0.6, evaluated by hand at
    // Re_p = 24 (inside the fitted range 15-8500): 2 + 1.1 * 0.87500 * 6.7317 = 8.4793.
    // (Reference sheet §3.4's 3.63 at Re_p = 2.4 is below that range, where the law is
    // regularised: PowerLaw.hpp.)
    const double phi = 0.38;
    const PackedSpheres bed(100e-6, phi);
    const double Re = 24.0 / (1.5 * (1.0 - phi)); // Re_p = Re phi d_p / d_h
    const double Nu_p =
        bed.nusselt(Re, 0.67).value * bed.sphereDiameter() / bed.hydraulicDiameter();
    CHECK(Nu_p == Approx(8.4793).epsilon(2e-3));
    CHECK(bed.nusselt(0.0, 0.67).value ==
          Approx((2.0 + 1.1 * std::cbrt(0.67)) * bed.hydraulicDiameter() / 100e-6));
    CHECK(std::isfinite(bed.nusselt(0.0, 0.67).slope));
    checkPassageSlopes(bed, 0.01, 1e4, 2.3, 0.67);
    CHECK(bed.axialConductionFactor(100.0).value == 1.0);
}

TEST_CASE("matrix axial conduction is F (1 - phi) k_s with F = 0.1 by default",
          "[models][correlations]")
{
    // Lewis, Kuriyama, Kuriyama & Radebaugh (1998): F ~ 0.1-0.2 for stacked screens.
    CHECK(matrixAxialConductivity(15.3, 0.686) == Approx(0.1 * 0.314 * 15.3));
    CHECK(matrixAxialConductivity(15.3, 0.686, 0.2) == Approx(0.2 * 0.314 * 15.3));
}
