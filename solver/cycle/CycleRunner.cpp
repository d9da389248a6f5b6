#include "solver/cycle/CycleRunner.hpp"

#include <algorithm>

namespace coldtip {

IntegratorOptions CycleRunner::optionsFor(const Machine& machine)
{
    return optionsFor(machine, machine.description().solver.relative_tolerance);
}

IntegratorOptions CycleRunner::optionsFor(const Machine& machine, double relative_tolerance)
{
    const SolverSpec& s = machine.description().solver;
    IntegratorOptions o;
    o.relative_tolerance = relative_tolerance;
    o.max_order = s.max_order;
    o.absolute_tolerances = machine.network().absoluteTolerances(
        machine.chargeMass(), relative_tolerance,
        machine.massFlowScale() * s.mass_flow_tolerance_scale, s.absolute_tolerance_scale);
    return o;
}

CycleRunner::CycleRunner(Machine& machine, const IntegratorOptions& options)
    : m_machine(machine),
      m_session(machine.network(), options, 0.0, machine.initialState()),
      m_quad_at_start(machine.network().nQuadratures(), 0.0),
      m_max_steps(machine.description().solver.max_steps_per_cycle)
{
}

void CycleRunner::advanceWithin(double t, double t_end, long steps_at_start)
{
    m_session.setMaxSteps(m_max_steps - (m_session.stats().steps - steps_at_start));
    m_session.advance(t, t_end);
}

void CycleRunner::start(long period_index, std::span<const double> y)
{
    m_period = period_index;
    m_session.reinit(period_index * m_machine.period(), y);
    m_quad_at_start.assign(m_machine.network().nQuadratures(), 0.0);
}

CycleRecord CycleRunner::runCycle(CycleSamples* samples, int n_samples)
{
    const double T = m_machine.period();
    CycleRecord r;
    r.t_start = m_period * T;
    r.t_end = (m_period + 1) * T;
    const auto s0 = m_session.state();
    r.start_state.assign(s0.begin(), s0.end());
    const IntegratorStats before = m_session.stats();

    if (samples) {
        samples->time.assign(n_samples, 0.0);
        samples->state.assign(n_samples, {});
        for (int j = 0; j < n_samples; ++j) {
            const double t = r.t_start + j * T / n_samples;
            if (j > 0) advanceWithin(t, r.t_end, before.steps);
            const auto y = m_session.state();
            samples->time[j] = t;
            samples->state[j].assign(y.begin(), y.end());
        }
    }
    advanceWithin(r.t_end, r.t_end, before.steps);

    const std::vector<double>& q = m_session.quadratures();
    r.averages.resize(q.size());
    for (std::size_t i = 0; i < q.size(); ++i) r.averages[i] = (q[i] - m_quad_at_start[i]) / T;
    m_quad_at_start = q;
    const auto y = m_session.state();
    r.end_state.assign(y.begin(), y.end());
    r.work = m_session.stats() - before;
    ++m_period;
    r.cycle = ++m_cycles;
    return r;
}

} // namespace coldtip
