// The demo case converged to its periodic steady state: energy balance, second law, and the
// grid-refinement study (regenerator and pulse-tube cells halved and doubled together).
// Tagged [slow]: three converged runs (40, 80 and 160 cells; the demo has 80), about three
// minutes on one core (158 s measured at the demo's relative tolerance 1e-5).
#include <catch2/catch.hpp>

#include <cmath>
#include <fmt/format.h>

#include "solver/components/Machine.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/input/CaseReader.hpp"

using namespace coldtip;

namespace {

struct Converged {
    SteadyOutcome outcome;
    double carnot_cop = 0.0;
};

//! The demo with `cells` in its regenerator and pulse tube, converged.
Converged convergedDemo(int cells)
{
    CaseDescription d = input::readCaseFile(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
    for (ComponentSpec& c : d.components)
        if (c.kind == ComponentSpec::Kind::Regenerator || c.kind == ComponentSpec::Kind::Tube)
            c.cells = cells;
    Machine machine(d);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const SteadyOptions options = steadyOptionsFor(d);
    Converged c;
    c.outcome = solveSteadyState(runner, 0, machine.initialState(), options, "accelerated");
    const CycleMetrics& m = c.outcome.metrics;
    c.carnot_cop = m.cold_temperature / (m.reject_temperature - m.cold_temperature);
    return c;
}

//! Energy balance, mass and the second law on one converged demo cycle.
void checkConvergedCycle(const Converged& c)
{
    const CycleMetrics& m = c.outcome.metrics;
    REQUIRE(c.outcome.converged);
    // The energy balance of the converged cycle: (PV power + heat in - heat out)/PV,
    // required within 0.5 % (issue 2); the steady-state test itself asks for 0.2 %.
    CHECK(std::abs(m.energy_balance_error) < 5e-3);
    // Mass is conserved by construction (each face flux leaves one cell, enters the next).
    CHECK(std::abs(m.mass_change) < 1e-10);
    // Second law (Carnot): COP = Q_c / W below T_c / (T_h - T_c).
    CHECK(m.cooling_power > 0.0);
    CHECK(m.cop < c.carnot_cop);
}

} // namespace

// The demo's 80 cells in the regenerator and the pulse tube were chosen by this study: with
// the oscillating-flow heat transfer in the pulse tube (DEVELOPERS.md) doubling 50 -> 100
// cells changed the cooling power by 2.9 %, 80 -> 160 by 1.6 %.
TEST_CASE("converged demo closes its energy balance, stays below Carnot and is "
          "grid-converged within 2 % (regenerator and pulse-tube cells doubled)",
          "[slow][grid][physics]")
{
    const Converged coarse = convergedDemo(40);
    const Converged demo = convergedDemo(80);
    const Converged fine = convergedDemo(160);
    for (const Converged* c : {&coarse, &demo, &fine})
        checkConvergedCycle(*c);
    // Grid refinement (Roache, J. Fluids Eng. 116, 1994: observed order from three grids
    // with refinement ratio 2).
    const double q1 = coarse.outcome.metrics.cooling_power;
    const double q2 = demo.outcome.metrics.cooling_power;
    const double q3 = fine.outcome.metrics.cooling_power;
    const double order = std::log(std::abs((q2 - q1) / (q3 - q2))) / std::log(2.0);
    WARN(fmt::format("cooling power with 40/80/160 cells: {:.4f} / {:.4f} / {:.4f} W; "
                     "observed order {:.2f}; 80 -> 160 changes it by {:.2f} %",
                     q1, q2, q3, order, 100.0 * (q3 - q2) / q2));
    CHECK(std::abs(q3 - q2) / q2 < 0.02);
    CHECK(order > 1.0);
}
