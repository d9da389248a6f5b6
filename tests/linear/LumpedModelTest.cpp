// The lumped (RLC) model against the hand formulas of the physics reference §6.4:
// L = rho l/A, C = V/(gamma p_m), R = 128 mu l/(pi D^4) (G. W. Swift, "Thermoacoustics: A
// Unifying Perspective...", ASA 2002, ch. 5; Hagen-Poiseuille).
#include <catch2/catch.hpp>

#include <cmath>

#include "solver/linear/LinearAnalysis.hpp"
#include "solver/linear/LumpedModel.hpp"
#include "tests/linear/LinearTestSupport.hpp"

using namespace coldtip;

TEST_CASE("lumped elements equal the hand formulas to round-off", "[linear]")
{
    testing::DuctRig rig;
    rig.radius = 2e-3; // r0/delta_nu = 7: wide tube, no Poiseuille factor, adiabatic
    rig.length = 0.6;
    rig.buffer = 80e-6;
    Machine machine(rig.description());
    const std::vector<double> y_m = linearMeanState(machine);
    const LumpedModel lumped = solveLumped(machine, y_m);
    const GasProperties& gas = machine.network().gas();
    const double p_m = rig.pressure, T = 300.0;
    const double rho = p_m / (gas.R * T);
    const double mu = gas.transport->viscosity(T, rho).value;
    const double D = 2.0 * rig.radius, A = 0.25 * M_PI * D * D, l = rig.length;
    const LumpedElement& duct = lumped.elements.at(1);
    const LumpedElement& buffer = lumped.elements.at(2);
    REQUIRE(duct.name == "duct");
    CHECK(duct.inertance_factor == 1.0);
    CHECK(duct.inertance == Approx(rho * l / A).epsilon(1e-12));
    CHECK(duct.resistance == Approx(128.0 * mu * l / (M_PI * std::pow(D, 4))).epsilon(1e-12));
    CHECK_FALSE(duct.isothermal);
    CHECK(duct.compliance == Approx(A * l / (gas.gamma * p_m)).epsilon(1e-12));
    CHECK(buffer.compliance == Approx(rig.buffer / (gas.gamma * p_m)).epsilon(1e-12));
    CHECK(buffer.inertance == 0.0);

    // A narrow duct (r0/delta_nu < 2) carries the Poiseuille factor 4/3 on its inertance.
    rig.radius = 0.2e-3;
    Machine narrow(rig.description());
    const LumpedModel n = solveLumped(narrow, linearMeanState(narrow));
    const double An = M_PI * rig.radius * rig.radius;
    CHECK(n.elements.at(1).inertance_factor == Approx(4.0 / 3.0));
    CHECK(n.elements.at(1).inertance == Approx(4.0 / 3.0 * rho * l / An).epsilon(1e-12));
}
