// A piston -> duct -> buffer rig at small amplitude against the lossy transmission line built
// from Rott's functions for a circular duct (physics reference §6.2, §6.6: N. Rott, Z. Angew.
// Math. Phys. 20, 230, 1969; G. W. Swift, J. Acoust. Soc. Am. 84, 1145, 1988), evaluated
// with SciPy's complex Bessel functions (tests/linear/rott_line.py): the pressure ratio
// across the duct within 2 % in amplitude and 2 degrees in phase, for r0/delta_nu from 0.5
// to 20, for `coldtip linear` and for the nonlinear model at small amplitude.
#include <catch2/catch.hpp>

#include <cmath>

#include "models/correlations/RottFunctions.hpp"
#include "solver/linear/LinearAnalysis.hpp"
#include "tests/linear/LinearTestSupport.hpp"

using namespace coldtip;

namespace {

//! The rig for r0/delta_nu = x: V_b = 20 V_duct and |Z' l Y_b| = 1/2 (the duct matters, the
//! buffer's compliance dominates the duct's), |p1|/p_m about 1e-3.
testing::DuctRig rigFor(double x, double& rho, double& mu, double& k, const GasProperties*& gas,
                        std::unique_ptr<Machine>& probe)
{
    testing::DuctRig rig;
    probe = std::make_unique<Machine>(rig.description());
    gas = &probe->network().gas();
    const double T = 300.0, w = 2.0 * M_PI * rig.frequency;
    rho = rig.pressure / (gas->R * T);
    mu = gas->transport->viscosity(T, rho).value;
    k = gas->transport->conductivity(T, rho).value;
    rig.radius = x * std::sqrt(2.0 * mu / (rho * w));
    const double A = M_PI * rig.radius * rig.radius;
    const double Z = std::abs(Complex(0.0, w * rho) / (A * (1.0 - models::rottCircular(x).value)));
    rig.length = std::sqrt(0.5 * gas->gamma * rig.pressure / (20.0 * w * A * Z));
    rig.buffer = 20.0 * A * rig.length;
    rig.amplitude = 2e-3 * rig.buffer / (0.25 * M_PI * 1e-4);
    return rig;
}

void checkRatio(const Complex& model, const Complex& reference)
{
    const double amplitude_error = std::abs(model) / std::abs(reference) - 1.0;
    const double phase_error = std::arg(model / reference) * 180.0 / M_PI;
    INFO("|ratio| model " << std::abs(model) << ", Rott " << std::abs(reference)
                          << "; amplitude error " << amplitude_error << ", phase error "
                          << phase_error << " deg");
    CHECK(std::abs(amplitude_error) < 0.02);
    CHECK(std::abs(phase_error) < 2.0);
    WARN("amplitude error " << amplitude_error << ", phase error " << phase_error << " deg");
}

void nonlinearAgainstRott(std::initializer_list<double> ratios)
{
    for (double x : ratios) {
        double rho, mu, k;
        const GasProperties* gas;
        std::unique_ptr<Machine> probe;
        const testing::DuctRig rig = rigFor(x, rho, mu, k, gas, probe);
        Machine machine(rig.description());
        double change = 0.0;
        const CycleSamples samples = testing::cycleFromLinearStart(machine, 3, change);
        const FirstHarmonics h = cycleHarmonics(machine, samples, 1);
        INFO("r0/delta_nu = " << x << ", first harmonic settled to " << change);
        CHECK(change < 1e-3);
        checkRatio(h.cell_pressure.back() / h.cell_pressure.front(),
                   testing::rottRatio(rig, rho, mu, k, gas->cp, gas->gamma));
    }
}

} // namespace

TEST_CASE("linear duct response matches Rott's transmission line", "[linear]")
{
    for (double x : {0.5, 1.0, 2.0, 5.0, 10.0, 20.0}) {
        INFO("r0/delta_nu = " << x);
        double rho, mu, k;
        const GasProperties* gas;
        std::unique_ptr<Machine> probe;
        const testing::DuctRig rig = rigFor(x, rho, mu, k, gas, probe);
        Machine machine(rig.description());
        const LinearSolution s = solveLinear(machine, linearMeanState(machine));
        checkRatio(s.pressure.back() / s.pressure.front(),
                   testing::rottRatio(rig, rho, mu, k, gas->cp, gas->gamma));
    }
}

TEST_CASE("small-amplitude nonlinear duct response matches Rott (narrow ducts)", "[linear]")
{
    nonlinearAgainstRott({0.5, 1.0, 2.0});
}

TEST_CASE("small-amplitude nonlinear duct response matches Rott (wide ducts)", "[linear]")
{
    nonlinearAgainstRott({5.0, 10.0, 20.0});
}
