#include "solver/cli/Progress.hpp"

#include <cmath>
#include <fmt/format.h>
#include <unistd.h>

namespace coldtip::cli {

Progress::Progress(bool quiet) : m_enabled(!quiet && isatty(STDERR_FILENO)), m_quiet(quiet) {}

void Progress::cycle(long cycle, double Tc, double Qc, double residual, double target,
                     double elapsed_s)
{
    if (!m_enabled) return;
    const auto now = std::chrono::steady_clock::now();
    if (m_printed && now - m_last < std::chrono::milliseconds(300)) return;
    // Residuals decay geometrically near the periodic steady state: extrapolate the rate
    // since the last report to the target.
    std::string eta = "?";
    if (m_last_cycle > 0 && residual > target && residual < m_last_residual && m_last_residual > 0) {
        const double per_cycle = std::log(residual / m_last_residual) / (cycle - m_last_cycle);
        const double cycles_left = std::log(target / residual) / per_cycle;
        const double s_per_cycle = (elapsed_s - m_last_elapsed) / (cycle - m_last_cycle);
        eta = fmt::format("{:.0f} s", cycles_left * s_per_cycle);
    }
    fmt::print(stderr, "\rcycle {:7d}  T_cold {:8.3f} K  Q_cold {:9.4f} W  residual {:9.2e}  "
                       "left {:>8s}   ",
               cycle, Tc, Qc, residual, eta);
    std::fflush(stderr);
    m_printed = true;
    m_last = now;
    m_last_cycle = cycle;
    m_last_residual = residual;
    m_last_elapsed = elapsed_s;
}

void Progress::note(const std::string& text)
{
    if (m_quiet) return;
    finish();
    fmt::print(stderr, "{}\n", text);
}

void Progress::finish()
{
    if (m_printed) fmt::print(stderr, "\n");
    m_printed = false;
}

} // namespace coldtip::cli
