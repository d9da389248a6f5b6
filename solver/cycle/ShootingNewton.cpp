#include "solver/cycle/ShootingNewton.hpp"

#include <Eigen/Dense>
#include <algorithm>
#include <chrono>
#include <cmath>

namespace coldtip {

SlowSubspace::SlowSubspace(const Network& network)
    : m_network(network),
      m_n(static_cast<int>(network.cells().size() + network.solids().size()))
{
}

std::vector<double> SlowSubspace::extract(std::span<const double> y) const
{
    std::vector<double> x;
    x.reserve(m_n);
    const double cv = m_network.gas().cv;
    for (const GasCell& c : m_network.cells()) x.push_back(y[c.offset + 1] / (y[c.offset] * cv));
    for (const SolidNode& s : m_network.solids()) x.push_back(y[s.offset]);
    return x;
}

void SlowSubspace::add(std::vector<double>& y, const std::vector<double>& dx, double scale) const
{
    // Gas: change T at the cell's own pressure (E = p V c_v / R stays, the mass moves), then
    // scale every cell's m and E by one factor to restore the charge. A change at fixed
    // mass would change the pressure cell by cell and start violent acoustic transients.
    const double cv = m_network.gas().cv;
    const double mass = m_network.totalMass(y);
    std::size_t i = 0;
    for (const GasCell& c : m_network.cells()) {
        const double T = y[c.offset + 1] / (y[c.offset] * cv);
        const double T_new = std::max(T + scale * dx[i++], 0.5 * T);
        y[c.offset] *= T / T_new;
    }
    const double f = mass / m_network.totalMass(y);
    for (const GasCell& c : m_network.cells()) {
        y[c.offset] *= f;
        y[c.offset + 1] *= f;
    }
    for (const SolidNode& s : m_network.solids()) y[s.offset] += scale * dx[i++];
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
    Eigen::MatrixXd basis;    //!< V_k (n x k)
    Eigen::MatrixXd products; //!< A V_k (n x k)
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
    Eigen::MatrixXd V(n, m + 1), H = Eigen::MatrixXd::Zero(m + 1, m), AV(n, m);
    V.col(0) = b / beta;
    int k = 0;
    for (; k < m; ++k) {
        Vec w = apply(V.col(k));
        AV.col(k) = w;
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
            r.basis = V.leftCols(k + 1);
            r.products = AV.leftCols(k + 1);
            return r;
        }
    }
    const Eigen::MatrixXd Hs = H.topLeftCorner(m + 1, m);
    Vec rhs = Vec::Zero(m + 1);
    rhs(0) = beta;
    const Vec y = Hs.colPivHouseholderQr().solve(rhs);
    r.x = V.leftCols(m) * y;
    r.hessenberg = H.topLeftCorner(m, m);
    r.basis = V.leftCols(m);
    r.products = AV.leftCols(m);
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
                                 const ShootingOptions& shooting, ShootingReport& report,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle)
{
    using Clock = std::chrono::steady_clock;
    const auto t0 = Clock::now();
    const Machine& machine = runner.machine();
    const SlowSubspace slow(machine.network());
    SteadyOutcome out;
    out.state.assign(y0.begin(), y0.end());
    out.period_index = period_index;
    bool stop = false;

    // One plain cycle of the base trajectory: recorded, tested, reported.
    auto plainCycle = [&]() {
        CycleSamples samples;
        CycleRecord record = runner.runCycle(&samples, options.samples_per_cycle);
        ++report.cycle_equivalents;
        HistoryRow row;
        row.cycle = static_cast<long>(out.history.size()) + 1;
        row.time = record.t_end;
        row.metrics = cycleMetrics(machine, record);
        row.work = record.work;
        row.boundary_enthalpy = boundaryEnthalpy(machine, record.averages);
        row.wall_time_s = std::chrono::duration<double>(Clock::now() - t0).count();
        out.history.push_back(row);
        out.metrics = row.metrics;
        out.state = record.end_state;
        out.period_index = runner.periodIndex();
        out.last = std::move(record);
        out.samples = std::move(samples);
        out.wall_time_s = row.wall_time_s;
        out.converged =
            steadyStateReached(row.metrics, options, static_cast<long>(out.history.size()));
        if (on_cycle && !on_cycle(out)) stop = true;
        return out.converged || stop;
    };
    auto fail = [&](const std::exception& e) {
        out.failed = true;
        out.failure = e.what();
        out.wall_time_s = std::chrono::duration<double>(Clock::now() - t0).count();
        return out;
    };

    try {
        runner.start(period_index, y0);
        for (int w = 0; w < shooting.warmup_cycles; ++w)
            if (plainCycle()) return out;
        const int k = shooting.cycles_per_map;
        Eigen::MatrixXd recycled_basis, recycled_products;
        for (int it = 1; it <= shooting.max_newton; ++it) {
            const long n0 = runner.periodIndex();
            const std::vector<double> y_start = out.state;
            const Vec x = toEigen(slow.extract(y_start));
            for (int j = 0; j < k; ++j)
                if (plainCycle()) return out;
            const std::vector<double> y_end = out.state;
            const long n_end = runner.periodIndex();
            const Vec g = toEigen(slow.extract(y_end));
            const Vec F = g - x;
            report.residual_norm.push_back(rms(F));

            // Directional derivative of the k-period map from the same start state.
            const double eps = shooting.perturbation_K * std::sqrt(double(x.size()));
            auto apply = [&](const Vec& v) -> Vec {
                std::vector<double> y = y_start;
                slow.add(y, toStd(v), eps);
                runner.start(n0, y);
                for (int j = 0; j < k; ++j) runner.runCycle();
                report.cycle_equivalents += k;
                const Vec gv = toEigen(slow.extract(runner.session().state()));
                return v - (gv - g) / eps;
            };
            // Recycle the last Newton step's Krylov basis: its stored products approximate
            // the current operator (which changes slowly), so the least-squares solution in
            // that subspace is a good first guess; one fresh product measures its true
            // residual and GMRES corrects what is left.
            Vec guess = Vec::Zero(x.size());
            Vec rhs = F;
            if (recycled_basis.cols() > 0) {
                const Vec y = recycled_products.colPivHouseholderQr().solve(F);
                guess = recycled_basis * y;
                rhs = F - apply(guess);
            }
            const double tolerance = shooting.krylov_tolerance * F.norm() / std::max(rhs.norm(), 1e-300);
            GmresResult sol = gmres(apply, rhs, shooting.max_krylov, std::min(tolerance, 1.0));
            sol.x += guess;
            report.krylov_iterations.push_back(sol.iterations);
            report.floquet.push_back({it, multipliersOf(sol.hessenberg, k, 6)});
            report.newton_iterations = it;
            if (sol.basis.cols() > 0) {
                if (recycled_basis.cols() > 0 && recycled_basis.cols() + sol.basis.cols() <= x.size()) {
                    Eigen::MatrixXd B(x.size(), recycled_basis.cols() + sol.basis.cols());
                    Eigen::MatrixXd P(x.size(), B.cols());
                    B << recycled_basis, sol.basis;
                    P << recycled_products, sol.products;
                    recycled_basis = B.rightCols(std::min<long>(B.cols(), shooting.max_krylov));
                    recycled_products = P.rightCols(recycled_basis.cols());
                } else {
                    recycled_basis = sol.basis;
                    recycled_products = sol.products;
                }
            }

            Vec dx = sol.x;
            const double largest = dx.cwiseAbs().maxCoeff();
            if (largest > shooting.max_step_K) dx *= shooting.max_step_K / largest;
            // New start: the end of the base cycles, its slow part moved to x + dx.
            std::vector<double> y_next = y_end;
            slow.add(y_next, toStd(x + dx - g));
            runner.start(n_end, y_next);
            out.state = y_next;
            out.period_index = n_end;
            if (stop) return out;
        }
        // Newton budget spent: finish with plain cycles up to the cycle limit.
        while (static_cast<long>(out.history.size()) < options.max_cycles)
            if (plainCycle()) return out;
    } catch (const std::exception& e) {
        return fail(e);
    }
    out.wall_time_s = std::chrono::duration<double>(Clock::now() - t0).count();
    return out;
}

} // namespace coldtip
