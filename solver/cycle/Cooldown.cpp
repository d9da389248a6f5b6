#include "solver/cycle/Cooldown.hpp"

#include <algorithm>
#include <chrono>
#include <cmath>
#include <limits>

#include "solver/cycle/CooldownAveraged.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/integrator/Interrupt.hpp"

namespace coldtip {

CooldownOptions cooldownOptionsFor(const Machine& machine, const std::string& method)
{
    const CaseDescription& d = machine.description();
    const CooldownSpec& c = d.cooldown;
    CooldownOptions o;
    const int reject = machine.rejectBoundary();
    const bool fixed = reject >= 0 && machine.network().boundaries()[reject].isothermal;
    o.start_temperature = c.start_temperature > 0.0 ? c.start_temperature
                          : fixed ? machine.network().boundaries()[reject].temperature
                                  : d.gas.charge_temperature;
    o.time_limit = c.time_limit;
    o.report_at = c.report_at;
    o.settle_tolerance = c.settle_tolerance;
    o.method = method.empty() ? c.method : method;
    o.relative_tolerance = c.relative_tolerance;
    o.settle_residual = c.settle_residual;
    o.max_settle_cycles = c.max_settle_cycles;
    // About 20 000 rows over the time limit, never more than one per cycle.
    o.record_interval = std::max(machine.period(), c.time_limit / 20000.0);
    o.steady = steadyOptionsFor(d);
    return o;
}

std::vector<double> uniformState(const Machine& machine, double T)
{
    const Network& net = machine.network();
    std::vector<double> y = machine.initialState();
    double volume = 0.0;
    for (const GasCell& c : net.cells()) volume += c.volumeAt(0.0);
    for (const GasCell& c : net.cells()) {
        const double m = machine.chargeMass() * c.volumeAt(0.0) / volume;
        y[c.offset] = m;
        y[c.offset + 1] = m * net.gas().cv * T;
    }
    for (const FlowFace& f : net.faces()) y[f.offset] = 0.0;
    for (const SolidNode& s : net.solids()) y[s.offset] = T;
    return y;
}

ReportClock::ReportClock(const std::vector<double>& temperatures)
{
    for (double T : temperatures)
        m_reports.push_back({T, std::numeric_limits<double>::quiet_NaN()});
}

void ReportClock::add(double t0, double T0, double t1, double T1)
{
    for (CooldownReport& r : m_reports) {
        if (!std::isnan(r.time)) continue;
        if (T0 <= r.temperature) r.time = t0; // reached at (or before) the start
        else if (T1 <= r.temperature) r.time = t0 + (t1 - t0) * (T0 - r.temperature) / (T0 - T1);
    }
}

void ReportClock::reached(std::size_t k, double t)
{
    if (std::isnan(m_reports.at(k).time)) m_reports[k].time = t;
}

namespace {

using Clock = std::chrono::steady_clock;
double secondsSince(Clock::time_point t0)
{
    return std::chrono::duration<double>(Clock::now() - t0).count();
}

//! Every cycle integrated from y0. Settled when the geometric extrapolation of the cold
//! end's drift per cycle (DistanceEstimate) is below the tolerance.
CooldownOutcome plainCooldown(Machine& machine, const CooldownOptions& o,
                              const std::vector<double>& y0, const CooldownCallback& on_row)
{
    const auto t0 = Clock::now();
    const CooldownLedger ledger(machine);
    CooldownOutcome out;
    out.method = "plain";
    out.status = "time-limit";
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const IntegratorStats before = runner.session().stats();
    runner.start(0, y0);
    ReportClock clock(o.report_at);
    DistanceEstimate distance;
    const int cold = machine.network().solids()[ledger.bodies().front()].offset;
    double energy = 0.0, last_recorded = -HUGE_VAL;
    out.state = y0;
    try {
        while (true) {
            const CycleRecord r = runner.runCycle();
            ++out.cycles;
            CooldownRow row = ledger.row(r.t_end, r.end_state, r);
            energy += row.net_cooling * (r.t_end - r.t_start);
            row.net_cooling_integral = energy;
            clock.add(r.t_start, r.start_state[cold], r.t_end, r.end_state[cold]);
            out.distance_estimate = distance.add(std::span(&r.end_state[cold], 1));
            out.state = r.end_state;
            out.period_index = runner.periodIndex();
            out.end_time = r.t_end;
            const bool settled = out.distance_estimate <= o.settle_tolerance &&
                                 out.cycles >= o.steady.min_cycles;
            const bool last = settled || r.t_end >= o.time_limit - 0.5 * machine.period();
            if (out.history.empty()) {
                CooldownRow first = ledger.row(0.0, y0, r);
                first.net_cooling_integral = 0.0;
                out.history.push_back(first);
            }
            if (last || r.t_end - last_recorded >= o.record_interval) {
                out.history.push_back(row);
                last_recorded = r.t_end;
                if (on_row && !on_row(row)) {
                    out.status = "interrupted";
                    break;
                }
            }
            if (settled) out.status = "settled";
            if (last) break;
        }
    } catch (const Interrupted&) {
        out.status = "interrupted"; // within a cycle: the last complete one is kept
    } catch (const std::exception& e) {
        out.status = "failed";
        out.failure = e.what();
    }
    out.reports = clock.reports();
    out.net_cooling_integral = energy;
    out.body_energy_change = ledger.bodyEnergy(y0) - ledger.bodyEnergy(out.state);
    out.work = runner.session().stats() - before;
    out.wall_time_s = secondsSince(t0);
    return out;
}

//! The steady-state check integrates at a relative tolerance of at most 1e-6: its test asks
//! for a cycle heat residual of every solid below 1e-3 of the cooling power, and at 1e-5 the
//! integrator's cycle-to-cycle scatter alone keeps a cold block's residual near 2e-3 (the
//! loaded demo, 10,000 cycles watched).
IntegratorOptions steadyCheckOptions(const Machine& machine)
{
    constexpr double kSteadyCheckTolerance = 1e-6;
    return CycleRunner::optionsFor(
        machine,
        std::min(machine.description().solver.relative_tolerance, kSteadyCheckTolerance));
}

} // namespace

CooldownOutcome runCooldown(Machine& machine, const CooldownOptions& o,
                            const CooldownCallback& on_row)
{
    const std::vector<double> y0 = uniformState(machine, o.start_temperature);
    CooldownOutcome out = o.method == "plain" ? plainCooldown(machine, o, y0, on_row)
                                              : averagedCooldown(machine, o, y0, on_row);
    const CooldownLedger ledger(machine);
    out.body_names = ledger.bodyNames();
    out.load_names = ledger.loadNames();
    if (out.status == "failed" || out.status == "interrupted") return out;
    // The end state against the periodic steady state: solved from it when the cold end
    // has settled, otherwise one plain cycle to show where the run stopped.
    const auto t0 = Clock::now();
    CycleRunner runner(machine, steadyCheckOptions(machine));
    out.steady_checked = o.check_steady && out.status == "settled";
    SteadyOptions once = o.steady;
    once.max_cycles = 1;
    once.min_cycles = 1;
    out.final_cycle =
        out.steady_checked
            ? solveSteadyState(runner, out.period_index, out.state, o.steady, "accelerated")
            : integrateToSteadyState(runner, out.period_index, out.state, once, {});
    out.steady_cold_temperature = out.final_cycle.metrics.cold_temperature;
    out.steady_wall_time_s = secondsSince(t0);
    if (out.final_cycle.interrupted) out.status = "interrupted";
    if (out.final_cycle.failed) {
        out.status = "failed";
        out.failure = "the steady-state check failed: " + out.final_cycle.failure;
    }
    return out;
}

} // namespace coldtip
