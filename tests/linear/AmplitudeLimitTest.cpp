// Nonlinear -> linear as the amplitude -> 0: the first harmonic of the nonlinear cycle
// differs from the linear solution by terms of second order in the amplitude (the
// quadratic terms of the equations feed the mean and the second harmonic, the cubic ones
// the first: common practice of weakly nonlinear analysis), so the relative difference of
// p1/amplitude falls with the square of the amplitude. The fitted exponent must lie within
// 1.7-2.3.
#include <catch2/catch.hpp>

#include <cmath>

#include "solver/linear/LinearAnalysis.hpp"
#include "tests/linear/LinearTestSupport.hpp"

using namespace coldtip;

TEST_CASE("nonlinear first harmonic approaches the linear one with the amplitude squared",
          "[linear]")
{
    testing::DuctRig rig;
    rig.radius = 1e-3; // r0/delta_nu ~ 3.5
    rig.length = 0.4;
    rig.buffer = 30e-6;
    rig.amplitude = 1e-3;
    const std::vector<double> scales = {1.0, 2.0, 4.0};
    std::vector<double> difference;
    for (double s : scales) {
        Machine machine(rig.description());
        machine.drive().piston().scale = s;
        const LinearSolution lin = solveLinear(machine, linearMeanState(machine));
        double change = 0.0;
        const CycleSamples samples = testing::cycleFromLinearStart(machine, 3, change);
        const FirstHarmonics h = cycleHarmonics(machine, samples, 1);
        const Complex unit = lin.displacement / std::abs(lin.displacement);
        const Complex p_lin = lin.pressure.back() / unit, p_nl = h.cell_pressure.back();
        difference.push_back(std::abs(p_nl - p_lin) / std::abs(p_lin));
        WARN("amplitude x " << s << ": |p1|/p_m " << std::abs(p_lin) / rig.pressure
                            << ", relative first-harmonic difference " << difference.back());
    }
    // Least-squares slope of log(difference) over log(scale).
    double sx = 0, sy = 0, sxx = 0, sxy = 0;
    const double n = static_cast<double>(scales.size());
    for (std::size_t i = 0; i < scales.size(); ++i) {
        const double x = std::log(scales[i]), y = std::log(difference[i]);
        sx += x, sy += y, sxx += x * x, sxy += x * y;
    }
    const double exponent = (n * sxy - sx * sy) / (n * sxx - sx * sx);
    WARN("fitted exponent of the first-harmonic difference: " << exponent);
    CHECK(exponent > 1.7);
    CHECK(exponent < 2.3);
}
