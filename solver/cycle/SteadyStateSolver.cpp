#include "solver/cycle/SteadyStateSolver.hpp"

namespace coldtip {

SteadyOptions steadyOptionsFor(const CaseDescription& d, long max_cycles)
{
    SteadyOptions o;
    o.max_cycles = max_cycles > 0 ? max_cycles : d.solver.steady.max_cycles;
    o.min_cycles = d.solver.steady.min_cycles;
    o.heat_residual = d.solver.steady.heat_residual;
    o.energy_residual = d.solver.steady.energy_residual;
    o.temperature_tolerance = d.solver.steady.temperature_tolerance;
    o.samples_per_cycle = d.output.samples_per_cycle;
    return o;
}

SteadyOutcome solveSteadyState(CycleRunner& runner, long period_index,
                               std::span<const double> y0, const SteadyOptions& options,
                               const std::string& method,
                               const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    return solveSteadyState(runner, freshStart(period_index, y0), options, method, on_cycle);
}

SteadyOutcome solveSteadyState(CycleRunner& runner, const SteadyStart& start,
                               const SteadyOptions& options, const std::string& method,
                               const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    const IntegratorStats before = runner.session().stats();
    SteadyOutcome out =
        method == "plain"
            ? integrateToSteadyState(runner, start, options, on_cycle)
            : shootToSteadyState(runner, start, options, ShootingOptions{}, on_cycle);
    if (method == "plain") out.diagnostics.cycle_equivalents = static_cast<long>(out.history.size());
    out.diagnostics.work = start.diagnostics.work + (runner.session().stats() - before);
    return out;
}

} // namespace coldtip
