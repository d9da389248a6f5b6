#include "solver/cycle/PeriodicSteadyState.hpp"

#include <chrono>
#include <cmath>
#include <fmt/format.h>

namespace coldtip {

std::vector<std::string> boundaryEnthalpyNames(const Machine& machine)
{
    std::vector<std::string> names;
    for (const ComponentSlice& s : machine.network().components()) {
        names.push_back(s.name + ".inlet");
        names.push_back(s.name + ".outlet");
    }
    return names;
}

std::vector<double> boundaryEnthalpy(const Machine& machine, const std::vector<double>& averages)
{
    std::vector<double> h;
    for (const ComponentSlice& s : machine.network().components()) {
        h.push_back(s.inlet_channel >= 0 ? averages[s.inlet_channel] : 0.0);
        h.push_back(s.outlet_channel >= 0 ? averages[s.outlet_channel] : 0.0);
    }
    return h;
}

bool appendCycle(SteadyOutcome& out, const Machine& machine, CycleRecord record,
                 CycleSamples samples, long period_index, double wall_time_s,
                 DistanceEstimate* distance, const SteadyOptions& options)
{
    HistoryRow row;
    row.cycle = static_cast<long>(out.history.size()) + 1;
    row.time = record.t_end;
    row.metrics = cycleMetrics(machine, record);
    row.metrics.distance_estimate =
        distance ? distance->add(row.metrics.max_temperature_change) : HUGE_VAL;
    row.work = record.work;
    row.boundary_enthalpy = boundaryEnthalpy(machine, record.averages);
    row.wall_time_s = wall_time_s;
    out.history.push_back(row);
    out.metrics = row.metrics;
    out.state = record.end_state;
    out.period_index = period_index;
    out.last = std::move(record);
    out.samples = std::move(samples);
    out.wall_time_s = wall_time_s;
    return steadyStateReached(row.metrics, options, static_cast<long>(out.history.size()));
}

bool steadyStateReached(const CycleMetrics& m, const SteadyOptions& o, long cycles)
{
    return cycles >= o.min_cycles && m.heat_residual <= o.heat_residual &&
           std::abs(m.energy_balance_error) <= o.energy_residual &&
           m.distance_estimate <= o.temperature_tolerance;
}

std::string convergenceShortfall(const CycleMetrics& m, const SteadyOptions& o)
{
    std::string s;
    auto add = [&](const std::string& part) { s += (s.empty() ? "" : "; ") + part; };
    if (!(m.heat_residual <= o.heat_residual))
        add(fmt::format("heat residual {:.3g} of the cooling power at {} (tolerance {:.3g})",
                        m.heat_residual, m.worst_solid, o.heat_residual));
    if (!(std::abs(m.energy_balance_error) <= o.energy_residual))
        add(fmt::format("energy balance error {:.3g} of PV power (tolerance {:.3g})",
                        m.energy_balance_error, o.energy_residual));
    if (!(m.distance_estimate <= o.temperature_tolerance))
        add(std::isfinite(m.distance_estimate)
                ? fmt::format("estimated distance to the steady state {:.3g} K (tolerance {:.3g} K)",
                              m.distance_estimate, o.temperature_tolerance)
                : std::string("temperatures still changing without settling"));
    return s;
}

double DistanceEstimate::add(double change)
{
    m_changes.push_back(change);
    // The decay ratio over the last half of the history: a slow mode (multiplier 0.9999)
    // changes the ratio over ten cycles by less than the cycle-to-cycle noise, so a short
    // span would report it as settled.
    const std::size_t n = m_changes.size();
    const std::size_t span = std::min<std::size_t>(n - 1, std::max<std::size_t>(10, n / 2));
    if (span < 2 || change <= 0.0) return change <= 0.0 ? 0.0 : HUGE_VAL;
    const double before = m_changes[n - 1 - span];
    if (!(before > change)) return HUGE_VAL;
    const double mu = std::pow(change / before, 1.0 / span);
    return change * mu / (1.0 - mu);
}

SteadyOutcome integrateToSteadyState(CycleRunner& runner, long period_index,
                                     std::span<const double> y0, const SteadyOptions& options,
                                     const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    using Clock = std::chrono::steady_clock;
    const auto t0 = Clock::now();
    SteadyOutcome out;
    out.state.assign(y0.begin(), y0.end());
    out.period_index = period_index;
    runner.start(period_index, y0);
    const Machine& machine = runner.machine();
    DistanceEstimate distance;
    for (long n = 1; n <= options.max_cycles; ++n) {
        CycleSamples samples;
        CycleRecord record;
        try {
            record = runner.runCycle(&samples, options.samples_per_cycle);
        } catch (const std::exception& e) {
            out.failed = true;
            out.failure = e.what();
            break;
        }
        out.converged = appendCycle(out, machine, std::move(record), std::move(samples),
                                    runner.periodIndex(),
                                    std::chrono::duration<double>(Clock::now() - t0).count(),
                                    &distance, options);
        if (on_cycle && !on_cycle(out)) break;
        if (out.converged) break;
    }
    out.wall_time_s = std::chrono::duration<double>(Clock::now() - t0).count();
    return out;
}

} // namespace coldtip
