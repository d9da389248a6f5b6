// Steady flow through a bed of woven screens (a regenerator between two buffers, its matrix
// uniform at 300 K) against the Gedeon & Wood screen friction factor, evaluated here by hand
// from the geometry. The first buffer starts above the second and drains through the bed;
// the flow settles within 2 rho d_h^2 / (f Re mu) ~ 10 us, the pressure difference decays
// over ~0.1 s, so the flow is quasi-steady when compared.
#include <catch2/catch.hpp>

#include <cmath>

#include "tests/solver/SolverTestSupport.hpp"

using namespace coldtip;
using namespace coldtip::testing;

TEST_CASE("pressure drop of a screen bed matches the Gedeon & Wood friction factor",
          "[physics]")
{
    const CaseDescription d = rigCase("screen-drain.yaml");
    const ComponentSpec& bed = d.components.at(0);
    // Square-weave screens, layers not nested (Kays & London, "Compact Heat Exchangers",
    // 1964): phi = 1 - pi m d_w / 4, d_h = phi d_w / (1 - phi).
    const double phi = 1.0 - M_PI * bed.fill.mesh * bed.fill.wire_diameter / 4.0;
    const double dh = phi * bed.fill.wire_diameter / (1.0 - phi);
    const double A_flow = phi * 0.25 * M_PI * bed.diameter * bed.diameter;
    REQUIRE(phi == Approx(0.670).margin(0.001)); // physics.md §3.1 table, 200 mesh
    REQUIRE(dh == Approx(108.4e-6).epsilon(0.002));

    Machine machine(d);
    const int screens = componentIndex(machine, "screen-bed");
    REQUIRE(screens >= 0);

    // Two blow-downs, from 10 % and 1 % above the far buffer: Re ~ 100 and ~ 15.
    double Re_low = 1e300, Re_high = 0.0;
    for (double factor : {1.10, 1.01}) {
        for (const Snapshot& s : blowDown(machine, factor, {0.005, 0.02})) {
            const PassageReading r = readPassage(machine, s, screens);
            // Re on d_h and the pore velocity (Gedeon & Wood 1996).
            const double Re = r.mdot * dh / (A_flow * r.mu);
            Re_low = std::min(Re_low, Re);
            Re_high = std::max(Re_high, Re);
            // D. Gedeon and J. G. Wood, NASA CR-198442 (1996), woven screens:
            // f = 129/Re + 2.91 Re^-0.103 (Darcy), dp = f (L / d_h) rho u^2 / 2.
            const double f = 129.0 / Re + 2.91 * std::pow(Re, -0.103);
            const double u = r.mdot / (r.rho * A_flow);
            const double dp_gw = f * bed.length / dh * 0.5 * r.rho * u * u;
            INFO("start " << factor << " x p, t = " << s.t << " s, Re = " << Re << ", f = "
                          << f << ", dp = " << r.dp << " Pa, Gedeon & Wood " << dp_gw
                          << " Pa");
            REQUIRE(Re >= 10.0);
            REQUIRE(r.T_spread < 0.01 * r.T); // the matrix holds the gas near 300 K
            CHECK(r.dp == Approx(dp_gw).epsilon(0.02));
        }
    }
    // The range asked for: Re of order 10 to 100.
    CHECK(Re_low < 30.0);
    CHECK(Re_high > 60.0);
}
