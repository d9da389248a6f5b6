#include "solver/cycle/PeriodicSteadyState.hpp"

#include "solver/integrator/Interrupt.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>
#include <fmt/format.h>
#include <utility>

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
        distance ? distance->add(nodeTemperatures(machine.network(), record.end_state))
                 : HUGE_VAL;
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

std::vector<double> DistanceEstimate::drift(std::size_t block) const
{
    const std::vector<double>& a = m_means[block - 1];
    const std::vector<double>& b = m_means[block];
    std::vector<double> d(a.size());
    for (std::size_t i = 0; i < a.size(); ++i)
        d[i] = (b[i] - a[i]) / static_cast<double>(m_block_cycles);
    return d;
}

double DistanceEstimate::add(std::span<const double> temperatures)
{
    ++m_cycles;
    if (m_sum.empty()) m_sum.assign(temperatures.size(), 0.0);
    for (std::size_t i = 0; i < m_sum.size(); ++i) m_sum[i] += temperatures[i];
    if (++m_in_block < m_block_cycles) return m_estimate;

    for (double& v : m_sum) v /= static_cast<double>(m_block_cycles);
    m_means.push_back(std::exchange(m_sum, std::vector<double>(m_sum.size(), 0.0)));
    m_in_block = 0;
    if (m_means.size() == kMaxBlocks) {
        for (std::size_t j = 0; j < kMaxBlocks / 2; ++j) {
            std::vector<double>& merged = m_means[j];
            merged = m_means[2 * j];
            for (std::size_t i = 0; i < merged.size(); ++i)
                merged[i] = 0.5 * (merged[i] + m_means[2 * j + 1][i]);
        }
        m_means.resize(kMaxBlocks / 2);
        m_block_cycles *= 2;
    }

    // The decay ratio over the last half of the history (at least ten cycles): a slow mode
    // (multiplier 0.9999) changes the ratio over ten cycles by less than the noise, so a
    // short span would report it as settled.
    const std::size_t n = m_means.size();
    if (n < 3) return m_estimate = HUGE_VAL;
    const std::vector<double> now = drift(n - 1);
    double largest = 0.0;
    for (double d : now) largest = std::max(largest, std::abs(d));
    if (largest <= 0.0) return m_estimate = 0.0;
    const std::size_t min_span = (10 + m_block_cycles - 1) / m_block_cycles;
    const std::size_t span = std::min(n - 2, std::max(min_span, (m_cycles / 2) / m_block_cycles));
    const std::vector<double> before = drift(n - 1 - span);
    // The decay ratio over the span. By default the largest drift now over the largest then
    // (robust to jitter, which is uncorrelated from block to block). When the nodes that
    // drift now (at least a tenth of the largest) drifted the same way then (cosine >= 0.9:
    // one mode carries both), the drift then is projected on the drift now instead: the
    // ratio is that mode's own, even if a faster mode, since decayed, dominated other nodes
    // then (a ratio of the largest drifts would mix the two and underestimate the distance;
    // tests/solver/DistanceEstimateTest.cpp).
    double largest_before = 0.0;
    for (double d : before) largest_before = std::max(largest_before, std::abs(d));
    double ratio = largest / largest_before;
    double nn = 0.0, bb = 0.0, nb = 0.0;
    for (std::size_t i = 0; i < now.size(); ++i) {
        if (std::abs(now[i]) < kSignificantDrift * largest) continue;
        nn += now[i] * now[i];
        bb += before[i] * before[i];
        nb += now[i] * before[i];
    }
    // The projection is a weighted harmonic mean of the nodes' own ratios, so it is never
    // allowed below the largest-drift ratio: a node that does not decay still blocks.
    if (nb > 0.0 && nb >= kCoherentDrift * std::sqrt(nn) * std::sqrt(bb))
        ratio = std::max(ratio, nn / nb);
    if (!(ratio < 1.0)) return m_estimate = HUGE_VAL;
    // For one mode, T_n = T_inf + A mu^n, the remainder A mu^n at the end of the last block
    // is this multiple of the drift between its mean and the one before (B cycles each); at
    // B = 1 it is the familiar mu / (1 - mu).
    const double B = static_cast<double>(m_block_cycles);
    const double mu = std::pow(ratio, 1.0 / (static_cast<double>(span) * B));
    if (!(mu < 1.0)) return m_estimate = HUGE_VAL; // a ratio within rounding of 1
    const double muB = std::pow(mu, B);
    return m_estimate = largest * B * B * (1.0 - mu) * muB * muB / (mu * (1.0 - muB) * (1.0 - muB));
}

SteadyStart freshStart(long period_index, std::span<const double> y0)
{
    SteadyStart s;
    s.point.period_index = period_index;
    s.point.state.assign(y0.begin(), y0.end());
    return s;
}

SteadyOutcome outcomeAt(const SteadyStart& start)
{
    SteadyOutcome out;
    out.history = start.history;
    out.diagnostics = start.diagnostics;
    out.state = start.point.state;
    out.period_index = start.point.period_index;
    out.restart = start.point;
    if (!out.history.empty()) out.metrics = out.history.back().metrics;
    out.wall_time_s = start.point.wall_time_s;
    return out;
}

SteadyOutcome integrateToSteadyState(CycleRunner& runner, long period_index,
                                     std::span<const double> y0, const SteadyOptions& options,
                                     const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    return integrateToSteadyState(runner, freshStart(period_index, y0), options, on_cycle);
}

SteadyOutcome integrateToSteadyState(CycleRunner& runner, const SteadyStart& start,
                                     const SteadyOptions& options,
                                     const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    using Clock = std::chrono::steady_clock;
    const auto t0 = Clock::now();
    const IntegratorStats stats0 = runner.session().stats();
    auto elapsed = [&] {
        return start.point.wall_time_s + std::chrono::duration<double>(Clock::now() - t0).count();
    };
    SteadyOutcome out = outcomeAt(start);
    const Machine& machine = runner.machine();
    DistanceEstimate distance;
    try {
        runner.start(out.period_index, out.state);
        // Counted over the whole run, like the history.
        for (long n = static_cast<long>(out.history.size()) + 1; n <= options.max_cycles; ++n) {
            CycleSamples samples;
            CycleRecord record = runner.runCycle(&samples, options.samples_per_cycle);
            out.converged = appendCycle(out, machine, std::move(record), std::move(samples),
                                        runner.periodIndex(), elapsed(), &distance, options);
            // Every cycle end is a restart point (the integrator restarted there).
            RestartPoint& p = out.restart;
            p.period_index = out.period_index;
            p.state = out.state;
            p.history_rows = out.history.size();
            p.work = start.point.work + (runner.session().stats() - stats0);
            p.wall_time_s = out.wall_time_s;
            if (on_cycle && !on_cycle(out)) {
                out.interrupted = true;
                break;
            }
            if (out.converged) break;
        }
    } catch (const Interrupted&) {
        out.interrupted = true;
    } catch (const std::exception& e) {
        out.failed = true;
        out.failure = e.what();
    }
    out.wall_time_s = elapsed();
    return out;
}

} // namespace coldtip
