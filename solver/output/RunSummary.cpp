#include "solver/output/RunSummary.hpp"

#include <algorithm>
#include <cmath>
#include <fstream>

namespace coldtip {

double peakResidentMegabytes()
{
    // VmHWM: the peak resident set size of this process (proc(5)).
    std::ifstream status("/proc/self/status");
    std::string line;
    while (std::getline(status, line))
        if (line.rfind("VmHWM:", 0) == 0) return std::stod(line.substr(6)) / 1024.0;
    return 0.0;
}

RunSummary summarize(const Machine& machine, const SteadyOutcome& out, const std::string& status,
                     double wall_time_s)
{
    RunSummary s;
    s.case_name = machine.description().name;
    s.status = status;
    s.failure = out.failure;
    s.converged = out.converged;
    const CycleMetrics& m = out.metrics;
    // Pressure ratio of the compression space over the last cycle (sampled).
    double p_max = 0.0, p_min = 0.0;
    const Network& net = machine.network();
    const GasCell& cs = net.cells()[machine.drive().inletCell()];
    for (std::size_t j = 0; j < out.samples.time.size(); ++j) {
        const double p = (net.gas().gamma - 1.0) * out.samples.state[j][cs.offset + 1] /
                         cs.volumeAt(out.samples.time[j]);
        p_max = j == 0 ? p : std::max(p_max, p);
        p_min = j == 0 ? p : std::min(p_min, p);
    }
    // Effort per period integrated: for the accelerated solver the periods carrying a
    // sensitivity count as cycles too (cycle equivalents).
    const SolverDiagnostics& dg = out.diagnostics;
    const double cycles = static_cast<double>(out.history.size());
    const double equivalents =
        dg.cycle_equivalents > 0 ? static_cast<double>(dg.cycle_equivalents) : cycles;
    const double per = equivalents > 0 ? 1.0 / equivalents : 0.0;
    s.values = {
        {"cooling_power_W", m.cooling_power},
        {"gross_cooling_power_W", m.gross_cooling},
        {"cold_conduction_W", m.cold_conduction},
        {"cold_temperature_K", m.cold_temperature},
        {"reject_temperature_K", m.reject_temperature},
        {"reject_heat_W", m.reject_heat},
        {"pv_power_W", m.pv_power},
        {"applied_load_W", m.applied_load},
        {"cop", m.cop},
        {"carnot_fraction", m.carnot_fraction},
        {"pressure_ratio", p_min > 0.0 ? p_max / p_min : 0.0},
        {"frequency_Hz", machine.frequency()},
        {"charge_pressure_Pa", machine.description().gas.charge_pressure},
        {"cycles", cycles},
        {"cycle_equivalents", equivalents},
        {"newton_iterations", static_cast<double>(dg.newton_iterations)},
        {"converged", out.converged ? 1.0 : 0.0},
        {"energy_balance_error", m.energy_balance_error},
        {"steady_residual", m.heat_residual},
        {"max_temperature_change_K", m.max_temperature_change},
        {"mass_change", m.mass_change},
        {"wall_time_s", wall_time_s},
        {"cycles_per_s", wall_time_s > 0.0 ? equivalents / wall_time_s : 0.0},
        {"steps_per_cycle", dg.work.steps * per},
        {"rhs_per_cycle", dg.work.rhs_evaluations * per},
        {"jac_per_cycle", dg.work.jacobian_evaluations * per},
        {"peak_rss_MB", peakResidentMegabytes()},
        {"distance_estimate_K", m.distance_estimate},
    };
    return s;
}

nlohmann::json toJson(const RunSummary& s)
{
    nlohmann::json j;
    j["case"] = s.case_name;
    j["status"] = s.status;
    if (!s.failure.empty()) j["failure"] = s.failure;
    if (!s.result_file.empty()) j["result_file"] = s.result_file;
    for (const SummaryValue& v : s.values) {
        if (v.key == "converged")
            j[v.key] = v.value != 0.0;
        else if (v.key == "cycles" || v.key == "cycle_equivalents" ||
                 v.key == "newton_iterations")
            j[v.key] = static_cast<long>(v.value);
        else
            j[v.key] = std::isfinite(v.value) ? nlohmann::json(v.value) : nlohmann::json(nullptr);
    }
    return j;
}

} // namespace coldtip
