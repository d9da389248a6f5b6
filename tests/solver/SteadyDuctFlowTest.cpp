// Steady laminar flow through a long thin duct between two buffers against Hagen-Poiseuille.
// The first buffer starts 1 % above the second and drains through the duct; the flow
// settles within the inertia time rho D^2 / (32 mu) ~ 0.5 ms, while the pressure difference
// decays over V / (G R T) ~ 1 s, so the flow is quasi-steady when compared.
#include <catch2/catch.hpp>

#include <cmath>

#include "tests/solver/SolverTestSupport.hpp"

using namespace coldtip;
using namespace coldtip::testing;

TEST_CASE("laminar duct flow between two buffers matches Hagen-Poiseuille", "[physics]")
{
    const CaseDescription d = rigCase("duct-drain.yaml");
    const ComponentSpec& duct = d.components.at(0);
    const double D = duct.diameter, L = duct.length;
    Machine machine(d);
    const int capillary = componentIndex(machine, "capillary");
    REQUIRE(capillary >= 0);

    // Snapshots after 20 and 100 inertia times (10 ms, 50 ms).
    for (const Snapshot& s : blowDown(machine, 1.01, {0.01, 0.05})) {
        const PassageReading r = readPassage(machine, s, capillary);
        const double Re = 4.0 * r.mdot / (M_PI * D * r.mu);
        INFO("t = " << s.t << " s, dp = " << r.dp << " Pa, mdot = " << r.mdot
                    << " kg/s, Re = " << Re);
        REQUIRE(Re > 10.0);
        REQUIRE(Re < 2000.0);
        REQUIRE(r.T_spread < 0.01 * r.T); // isothermal wall, isothermal flow
        // Hagen (1839), Poiseuille (1840): Q = pi D^4 dp / (128 mu L).
        const double mdot_hp = r.rho * M_PI * std::pow(D, 4) * r.dp / (128.0 * r.mu * L);
        CHECK(r.mdot == Approx(mdot_hp).epsilon(0.01));
    }
}
