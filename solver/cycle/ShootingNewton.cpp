#include "solver/cycle/ShootingNewton.hpp"

#include <Eigen/Dense>
#include <algorithm>
#include <chrono>
#include <cmath>

#include "solver/integrator/Interrupt.hpp"

namespace coldtip {

ShootingVariables::ShootingVariables(const Network& network, double charge_pressure,
                                     double mass_flow_scale)
    : m_network(network),
      m_n(static_cast<int>(2 * network.cells().size() + network.faces().size() +
                           network.solids().size())),
      m_p_unit(charge_pressure / kReferenceTemperature),
      m_mdot_unit(mass_flow_scale / kReferenceTemperature)
{
}

std::vector<double> ShootingVariables::extract(std::span<const double> y) const
{
    const GasProperties& gas = m_network.gas();
    std::vector<double> x;
    x.reserve(m_n);
    for (const GasCell& c : m_network.cells()) {
        x.push_back((gas.gamma - 1.0) * y[c.offset + 1] / c.volumeAt(0.0) / m_p_unit);
        x.push_back(y[c.offset + 1] / (y[c.offset] * gas.cv));
    }
    for (const FlowFace& f : m_network.faces()) x.push_back(y[f.offset] / m_mdot_unit);
    for (const SolidNode& s : m_network.solids()) x.push_back(y[s.offset]);
    return x;
}

void ShootingVariables::add(std::vector<double>& y, const std::vector<double>& dx) const
{
    // New pressure and temperature per cell give m = p V/(R T), E = p V c_v/R; one common
    // factor on every m and E then restores the charge (mass is a constraint, not an
    // unknown: the map has a unit multiplier along it).
    const GasProperties& gas = m_network.gas();
    const double mass = m_network.totalMass(y);
    std::size_t i = 0;
    for (const GasCell& c : m_network.cells()) {
        const double V = c.volumeAt(0.0);
        const double p = (gas.gamma - 1.0) * y[c.offset + 1] / V;
        const double T = y[c.offset + 1] / (y[c.offset] * gas.cv);
        const double p_new = std::max(p + dx[i++] * m_p_unit, 0.5 * p);
        const double T_new = std::max(T + dx[i++], 0.5 * T);
        y[c.offset] = p_new * V / (gas.R * T_new);
        y[c.offset + 1] = p_new * V * gas.cv / gas.R;
    }
    const double f = mass / m_network.totalMass(y);
    for (const GasCell& c : m_network.cells()) {
        y[c.offset] *= f;
        y[c.offset + 1] *= f;
    }
    for (const FlowFace& face : m_network.faces()) y[face.offset] += dx[i++] * m_mdot_unit;
    for (const SolidNode& s : m_network.solids()) y[s.offset] += dx[i++];
}

std::vector<double> ShootingVariables::liftDirection(std::span<const double> y,
                                                     const std::vector<double>& v) const
{
    const GasProperties& gas = m_network.gas();
    std::vector<double> d(y.size(), 0.0);
    double dm_total = 0.0, mass = 0.0;
    std::size_t i = 0;
    for (const GasCell& c : m_network.cells()) {
        const double V = c.volumeAt(0.0);
        const double m = y[c.offset], E = y[c.offset + 1];
        const double p = (gas.gamma - 1.0) * E / V, T = E / (m * gas.cv);
        const double dp = v[i++] * m_p_unit, dT = v[i++];
        d[c.offset] = m * (dp / p - dT / T);
        d[c.offset + 1] = E * dp / p;
        dm_total += d[c.offset];
        mass += m;
    }
    for (const GasCell& c : m_network.cells()) {
        d[c.offset] -= y[c.offset] * dm_total / mass;
        d[c.offset + 1] -= y[c.offset + 1] * dm_total / mass;
    }
    for (const FlowFace& f : m_network.faces()) d[f.offset] = v[i++] * m_mdot_unit;
    for (const SolidNode& s : m_network.solids()) d[s.offset] = v[i++];
    return d;
}

std::vector<double> ShootingVariables::extractDirection(std::span<const double> y,
                                                        std::span<const double> s) const
{
    const GasProperties& gas = m_network.gas();
    std::vector<double> dx;
    dx.reserve(m_n);
    for (const GasCell& c : m_network.cells()) {
        const double m = y[c.offset], E = y[c.offset + 1];
        dx.push_back((gas.gamma - 1.0) * s[c.offset + 1] / c.volumeAt(0.0) / m_p_unit);
        dx.push_back((s[c.offset + 1] - E / m * s[c.offset]) / (m * gas.cv));
    }
    for (const FlowFace& f : m_network.faces()) dx.push_back(s[f.offset] / m_mdot_unit);
    for (const SolidNode& sn : m_network.solids()) dx.push_back(s[sn.offset]);
    return dx;
}

namespace {

using Vec = Eigen::VectorXd;

Vec toEigen(const std::vector<double>& v) { return Eigen::Map<const Vec>(v.data(), v.size()); }
std::vector<double> toStd(const Vec& v) { return {v.data(), v.data() + v.size()}; }
double rms(const Vec& v) { return v.size() ? v.norm() / std::sqrt(double(v.size())) : 0.0; }

//! Unrestarted GMRES with modified Gram-Schmidt for A x = b, A given as a product; also
//! returns the Arnoldi Hessenberg matrix for the eigenvalue estimates.
struct GmresResult {
    Vec x;
    int iterations = 0;
    Eigen::MatrixXd hessenberg;
};

GmresResult gmres(const std::function<Vec(const Vec&)>& apply, const Vec& b, int max_iter,
                  double rel_tol)
{
    const int n = static_cast<int>(b.size());
    const int m = std::min(max_iter, n);
    const double beta = b.norm();
    GmresResult r;
    r.x = Vec::Zero(n);
    if (beta == 0.0) return r;
    Eigen::MatrixXd V(n, m + 1), H = Eigen::MatrixXd::Zero(m + 1, m);
    V.col(0) = b / beta;
    int k = 0;
    for (; k < m; ++k) {
        Vec w = apply(V.col(k));
        for (int i = 0; i <= k; ++i) {
            H(i, k) = w.dot(V.col(i));
            w -= H(i, k) * V.col(i);
        }
        H(k + 1, k) = w.norm();
        if (H(k + 1, k) > 1e-14 * beta) V.col(k + 1) = w / H(k + 1, k);
        // Recompute the residual from the small least-squares problem (cheap at this size).
        const Eigen::MatrixXd Hs = H.topLeftCorner(k + 2, k + 1);
        Vec rhs = Vec::Zero(k + 2);
        rhs(0) = beta;
        const Vec y = Hs.colPivHouseholderQr().solve(rhs);
        const double res = (rhs - Hs * y).norm();
        r.iterations = k + 1;
        if (res <= rel_tol * beta || H(k + 1, k) <= 1e-14 * beta) {
            r.x = V.leftCols(k + 1) * y;
            r.hessenberg = H.topLeftCorner(k + 1, k + 1);
            return r;
        }
    }
    const Eigen::MatrixXd Hs = H.topLeftCorner(m + 1, m);
    Vec rhs = Vec::Zero(m + 1);
    rhs(0) = beta;
    const Vec y = Hs.colPivHouseholderQr().solve(rhs);
    r.x = V.leftCols(m) * y;
    r.hessenberg = H.topLeftCorner(m, m);
    return r;
}

std::vector<std::complex<double>> multipliersOf(const Eigen::MatrixXd& H, int k, int keep)
{
    std::vector<std::complex<double>> mu;
    if (H.rows() == 0) return mu;
    Eigen::EigenSolver<Eigen::MatrixXd> es(H, false);
    for (int i = 0; i < es.eigenvalues().size(); ++i)
        mu.push_back(std::pow(1.0 - es.eigenvalues()(i), 1.0 / k));
    std::sort(mu.begin(), mu.end(),
              [](auto a, auto b) { return std::abs(a) > std::abs(b); });
    if (static_cast<int>(mu.size()) > keep) mu.resize(keep);
    return mu;
}

} // namespace

SteadyOutcome shootToSteadyState(CycleRunner& runner, long period_index,
                                 std::span<const double> y0, const SteadyOptions& options,
                                 const ShootingOptions& shooting,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    return shootToSteadyState(runner, freshStart(period_index, y0), options, shooting, on_cycle);
}

SteadyOutcome shootToSteadyState(CycleRunner& runner, const SteadyStart& start,
                                 const SteadyOptions& options, const ShootingOptions& shooting,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    using Clock = std::chrono::steady_clock;
    const auto t0 = Clock::now();
    const IntegratorStats stats0 = runner.session().stats();
    auto elapsed = [&] {
        return start.point.wall_time_s + std::chrono::duration<double>(Clock::now() - t0).count();
    };
    const Machine& machine = runner.machine();
    const ShootingVariables slow(machine.network(), machine.description().gas.charge_pressure,
                                 machine.massFlowScale());
    SteadyOutcome out = outcomeAt(start);
    SolverDiagnostics& report = out.diagnostics;
    bool stop = false;

    // One plain cycle of the base trajectory: recorded, tested, reported. During warm-up the
    // distance to the steady state is extrapolated from the change per cycle; in the Newton
    // phase it is the Newton correction, known only after the linear solve.
    DistanceEstimate extrapolation;
    bool newton_phase = false;
    auto plainCycle = [&]() {
        CycleSamples samples;
        CycleRecord record = runner.runCycle(&samples, options.samples_per_cycle);
        ++report.cycle_equivalents;
        out.converged = appendCycle(out, machine, std::move(record), std::move(samples),
                                    runner.periodIndex(), elapsed(),
                                    newton_phase ? nullptr : &extrapolation, options);
        if (on_cycle && !on_cycle(out)) stop = out.interrupted = true;
        return out.converged || stop ||
               static_cast<long>(out.history.size()) >= options.max_cycles;
    };
    auto fail = [&](const std::exception& e) {
        out.failed = true;
        out.failure = e.what();
        out.wall_time_s = elapsed();
        return out;
    };
    // The integrator was just (re)started on out.state: a continuation from here with these
    // variables follows the same path (RestartPoint.hpp).
    auto markRestart = [&](const ShootingCheckpoint& c) {
        RestartPoint& p = out.restart;
        p.period_index = out.period_index;
        p.state = out.state;
        p.history_rows = out.history.size();
        p.newton_steps = report.newton_residual.size();
        p.newton_iterations = report.newton_iterations;
        p.cycle_equivalents = report.cycle_equivalents;
        p.work = start.point.work + (runner.session().stats() - stats0);
        p.wall_time_s = elapsed();
        p.shooting = c;
    };
    const ShootingCheckpoint& resumed = start.point.shooting;

    try {
        runner.start(out.period_index, out.state);
        int k = shooting.cycles_per_map;
        double forcing = shooting.max_forcing;
        double previous_residual = 0.0;
        bool tighten = false;
        double accepted_correction = -1.0; // >= 0: the last correction met the test
        int first_iteration = 1;
        if (resumed.iteration > 0) {
            k = resumed.cycles_per_map;
            forcing = resumed.forcing;
            previous_residual = resumed.previous_residual;
            tighten = resumed.tighten;
            accepted_correction = resumed.accepted_correction;
            first_iteration = resumed.iteration;
        } else {
            markRestart({});
            for (int w = 0; w < shooting.warmup_cycles; ++w)
                if (plainCycle()) return out;
        }
        newton_phase = true;
        for (int it = first_iteration; it <= shooting.max_newton || accepted_correction >= 0.0;
             ++it) {
            const long n0 = runner.periodIndex();
            const std::vector<double> y_start = out.state;
            const Vec x = toEigen(slow.extract(y_start));
            for (int j = 0; j < k; ++j)
                if (plainCycle()) return out;
            const std::vector<double> y_end = out.state;
            const long n_end = runner.periodIndex();
            const Vec g = toEigen(slow.extract(y_end));
            if (accepted_correction >= 0.0) {
                // The cycles from the corrected start are the answer; their distance to the
                // steady state is at most the correction just applied (a conservative figure:
                // Newton leaves less), and plain cycles do not move the slow modes. A small
                // machine's energy balance scatters from cycle to cycle about its tolerance:
                // like plain integration, take the first cycle that passes, within 2k.
                for (int extra = 0;; ++extra) {
                    out.metrics.distance_estimate = accepted_correction;
                    out.history.back().metrics.distance_estimate = accepted_correction;
                    out.converged = steadyStateReached(out.metrics, options,
                                                       static_cast<long>(out.history.size()));
                    if (out.converged) {
                        if (on_cycle && !on_cycle(out)) stop = out.interrupted = true;
                        return out;
                    }
                    if (extra == 2 * k) break;
                    if (plainCycle()) return out;
                }
                accepted_correction = -1.0;
                continue; // a new base from here
            }
            const Vec F = g - x;
            report.newton_residual.push_back(rms(F));
            const double residual = F.norm();
            // Near the answer a tight solve is one whose correction may judge it.
            const double tight = k == shooting.settle_cycles_per_map ? shooting.trusted_forcing
                                                                     : shooting.krylov_tolerance;
            if (previous_residual > 0.0) {
                // Eisenstat-Walker while the outer iteration converges well. Where it stalls
                // (at the integrator's noise floor, or far from the fixed point) a loose
                // solve gives a useless step: solve tightly instead.
                const double ratio = residual / previous_residual;
                forcing = ratio < 0.5 && !tighten
                              ? std::clamp(0.9 * ratio * ratio, shooting.krylov_tolerance,
                                           shooting.max_forcing)
                              : tight;
            }
            previous_residual = residual;

            // Directional derivative of the k-period map from the same start state, carried
            // as a forward sensitivity along a re-integration of the base trajectory.
            auto apply = [&](const Vec& v) -> Vec {
                runner.start(n0, y_start);
                runner.session().startSensitivity(slow.liftDirection(y_start, toStd(v)));
                for (int j = 0; j < k; ++j) runner.runCycle();
                report.cycle_equivalents += k;
                const std::vector<double> s = runner.session().sensitivity();
                const Vec Mv = toEigen(slow.extractDirection(runner.session().state(), s));
                runner.session().stopSensitivity();
                return v - Mv;
            };
            GmresResult sol = gmres(apply, F, shooting.max_krylov, forcing);
            report.krylov_iterations.push_back(sol.iterations);
            report.floquet.push_back(multipliersOf(sol.hessenberg, k, 6));
            report.newton_iterations = it;
            Vec dx = sol.x;
            const double largest = dx.cwiseAbs().maxCoeff();
            report.newton_correction.push_back(largest);
            report.periods_per_map.push_back(k);
            // The Newton correction estimates how far the base cycles are from the fixed
            // point. A correction from a loose linear solve underestimates the distance along
            // the slow modes by up to 1/(1 - mu): it may not declare convergence. The heat
            // and energy tests are judged on the cycles from the corrected start.
            out.metrics.distance_estimate = largest;
            out.history.back().metrics.distance_estimate = largest;
            const bool reached = largest <= options.temperature_tolerance;
            // Near the answer the slow part of one period's residual is below the defect of
            // a restarted integration: only a map of settle_cycles_per_map periods may judge.
            const bool settled_map = k == shooting.settle_cycles_per_map;
            // The correction met the test: apply it, and let the base cycles from the
            // corrected start be the answer (the uncorrected ones sit a full correction away
            // along the slow modes).
            if (reached && settled_map && forcing <= shooting.trusted_forcing)
                accepted_correction = largest;
            tighten = reached && settled_map && accepted_correction < 0.0;
            if (!settled_map &&
                largest <= shooting.settle_below_tolerances * options.temperature_tolerance) {
                // Close to the answer: the next correction should be one that may judge it.
                k = shooting.settle_cycles_per_map;
                forcing = shooting.trusted_forcing;
                previous_residual = 0.0; // a k-period residual is not comparable with the last
            }
            if (largest > shooting.max_step_K) dx *= shooting.max_step_K / largest;
            // New start: the end of the base cycles, its slow part moved to x + dx.
            std::vector<double> y_next = y_end;
            slow.add(y_next, toStd(x + dx - g));
            runner.start(n_end, y_next);
            out.state = y_next;
            out.period_index = n_end;
            markRestart({it + 1, k, forcing, previous_residual, tighten, accepted_correction});
            if (stop) return out;
        }
        // Newton budget spent: finish with plain cycles up to the cycle limit, the distance
        // extrapolated from these cycles alone (what a resumed run can reproduce).
        newton_phase = false;
        extrapolation = DistanceEstimate{};
        while (static_cast<long>(out.history.size()) < options.max_cycles)
            if (plainCycle()) return out;
    } catch (const Interrupted&) {
        out.interrupted = true;
    } catch (const std::exception& e) {
        return fail(e);
    }
    out.wall_time_s = elapsed();
    return out;
}

} // namespace coldtip
