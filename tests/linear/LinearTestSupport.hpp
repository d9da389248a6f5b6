#pragma once
//! \file LinearTestSupport.hpp
//! What the linear-analysis tests share: an invented rig (piston -> duct -> buffer) written
//! as a case text, the Rott transmission-line reference evaluated by tests/linear/
//! rott_line.py with /usr/bin/python3 and SciPy, and a converged nonlinear cycle.

#include <cmath>
#include <cstdio>
#include <fmt/format.h>
#include <stdexcept>
#include <string>

#include "solver/components/Machine.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/linear/Comparison.hpp"
#include "solver/linear/LinearAnalysis.hpp"

namespace coldtip::testing {

//! The rig: helium at p_m, 300 K, frequency f; a piston of 10 mm bore and amplitude X whose
//! dead volume equals the buffer; a duct of radius r0 and length l with its wall at 300 K
//! and `cells` cells; an adiabatic buffer of volume V_b. Invented numbers, not a machine.
struct DuctRig {
    double pressure = 1e6;       //!< [Pa]
    double frequency = 50.0;     //!< [Hz]
    double radius = 1e-3;        //!< [m]
    double length = 0.5;         //!< [m]
    double buffer = 50e-6;       //!< [m^3]
    double amplitude = 1e-5;     //!< [m]
    int cells = 40;
    double relative_tolerance = 1e-9;
    bool isothermal_wall = true; //!< false: an adiabatic duct


    std::string caseText() const
    {
        return fmt::format(
            "case: duct-rig\n"
            "gas: {{species: helium, charge_pressure: {} Pa, charge_temperature: 300 K}}\n"
            "frequency: {} Hz\n"
            "drive: {{kind: piston, bore: 10 mm, amplitude: {} m, dead_volume: {} m^3}}\n"
            "components:\n"
            "  - {{name: duct, kind: duct, length: {} m, diameter: {} m, cells: {}{}}}\n"
            "  - {{name: buffer, kind: volume, volume: {} m^3}}\n"
            "solver: {{relative_tolerance: {}, steady: {{method: accelerated, "
            "heat_residual: 1e-6, temperature_tolerance: 1e-6 K}}}}\n"
            "output: {{samples_per_cycle: 64}}\n",
            pressure, frequency, amplitude, buffer, length, 2.0 * radius, cells,
            isothermal_wall ? ", wall: {temperature: 300 K}" : "", buffer,
            relative_tolerance);
    }
    CaseDescription description() const { return input::parseCaseText(caseText(), "duct-rig.yaml"); }
};

//! Output of a command (stdout), throwing if it fails.
inline std::string commandOutput(const std::string& command)
{
    FILE* pipe = popen(command.c_str(), "r");
    if (!pipe) throw std::runtime_error("cannot run " + command);
    std::string out;
    char buffer[256];
    while (fgets(buffer, sizeof buffer, pipe)) out += buffer;
    if (pclose(pipe) != 0) throw std::runtime_error("failed: " + command + "\n" + out);
    return out;
}

//! Rott's lossy transmission line closed by an adiabatic buffer (physics reference §6.6):
//! p(l)/p(0) for the rig at mean density rho, viscosity mu, conductivity k, from SciPy's
//! complex Bessel functions (tests/linear/rott_line.py).
inline std::complex<double> rottRatio(const DuctRig& rig, double rho, double mu, double k,
                                      double cp, double gamma)
{
    const std::string command = fmt::format(
        "/usr/bin/python3 {}/tests/linear/rott_line.py {:.17g} {:.17g} {:.17g} {:.17g} {:.17g} "
        "{:.17g} {:.17g} {:.17g} {:.17g} {:.17g}",
        COLDTIP_SOURCE_DIR, rig.radius, rig.length, rig.buffer, rig.pressure, rho, mu, k, cp,
        gamma, rig.frequency);
    double re = 0.0, im = 0.0;
    if (std::sscanf(commandOutput(command).c_str(), "%lf %lf", &re, &im) != 2)
        throw std::runtime_error("unexpected output of " + command);
    return {re, im};
}

//! A converged nonlinear cycle of the machine at its present drive scale, from the
//! machine's initial state.
struct NonlinearCycle {
    SteadyOutcome outcome;
    CycleIntegrals integrals;
};

inline NonlinearCycle convergedCycle(Machine& machine, const std::vector<double>& y0,
                                     long period = 0)
{
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const CaseDescription& d = machine.description();
    NonlinearCycle c;
    c.outcome = solveSteadyState(runner, period, y0, steadyOptionsFor(d), d.solver.steady.method);
    c.integrals.pv_power_W = c.outcome.metrics.pv_power;
    c.integrals.gross_cooling_W = c.outcome.metrics.gross_cooling;
    c.integrals.converged = c.outcome.converged;
    c.integrals.cycles = static_cast<long>(c.outcome.history.size());
    return c;
}

//! The nonlinear cycle started on the linear solution: y(0) = y_m + Re[y1] (the piston is
//! at its mean volume at t = 0), so that only the nonlinear correction has to settle;
//! `cycles` periods are integrated and the last one is sampled. `change` receives the
//! largest change of the compression-space pressure's first harmonic over the last period
//! relative to its amplitude (the periodicity check).
inline CycleSamples cycleFromLinearStart(Machine& machine, int cycles, double& change)
{
    const std::vector<double> y_m = linearMeanState(machine);
    const LinearSolution s = solveLinear(machine, y_m);
    std::vector<double> y0 = y_m;
    for (std::size_t k = 0; k < y0.size(); ++k) y0[k] += s.state[k].real();
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    runner.start(0, y0);
    const int n = machine.description().output.samples_per_cycle;
    CycleSamples previous, last;
    for (int c = 0; c < cycles; ++c) {
        previous = last;
        last = CycleSamples{};
        runner.runCycle(&last, n);
    }
    const Complex p_last = cycleHarmonics(machine, last, 1).cell_pressure.front();
    const Complex p_prev = cycleHarmonics(machine, previous, 1).cell_pressure.front();
    change = std::abs(p_last - p_prev) / std::abs(p_last);
    return last;
}

} // namespace coldtip::testing
