#include "solver/output/CooldownResult.hpp"

#include <H5Cpp.h>
#include <cmath>
#include <filesystem>
#include <fmt/format.h>

#include "solver/output/Hdf5File.hpp"

namespace coldtip {

namespace {

nlohmann::json finite(double v) { return std::isfinite(v) ? nlohmann::json(v) : nlohmann::json(); }

//! The relative mismatch of the energy accounting: integral of the net cooling against the
//! bodies' enthalpy change.
double energyMismatch(const CooldownOutcome& out)
{
    return out.body_energy_change != 0.0
               ? (out.net_cooling_integral - out.body_energy_change) / out.body_energy_change
               : 0.0;
}

std::string unitsOf(const std::string& key)
{
    for (const auto& [suffix, unit] :
         std::vector<std::pair<std::string, std::string>>{{"_K", "K"}, {"_W", "W"}, {"_J", "J"},
                                                          {"_s", "s"}})
        if (key.ends_with(suffix)) return unit;
    return "1";
}

} // namespace

std::vector<SummaryValue> cooldownValues(const CooldownOutcome& out)
{
    const CooldownRow* end = out.history.empty() ? nullptr : &out.history.back();
    // No figure stands for "not computed": without a history there are no final values, and
    // without the steady-state check there is no steady cold temperature (absent, not 0 K).
    const double none = std::nan("");
    std::vector<SummaryValue> v = {
        {"end_time_s", out.end_time},
        {"final_cold_temperature_K", end ? end->cold_temperature : none},
        {"final_net_cooling_W", end ? end->net_cooling : none},
        {"final_cooling_power_W", end ? end->cooling : none},
        {"final_pv_power_W", end ? end->pv_power : none},
        {"distance_estimate_K", out.distance_estimate},
        {"steady_checked", out.steady_checked ? 1.0 : 0.0},
        {"net_cooling_integral_J", out.net_cooling_integral},
        {"body_energy_change_J", out.body_energy_change},
        {"energy_mismatch", energyMismatch(out)},
        {"wall_time_s", out.wall_time_s},
        {"steady_wall_time_s", out.steady_wall_time_s},
        {"cycles", static_cast<double>(out.cycles)},
        {"steps", static_cast<double>(out.work.steps)},
        {"macro_steps", static_cast<double>(out.macro_steps)},
        {"macro_error_test_failures", static_cast<double>(out.error_test_failures)},
        {"heat_flow_evaluations", static_cast<double>(out.heat_flow_evaluations)},
        {"jacobian_evaluations", static_cast<double>(out.jacobian_evaluations)},
        {"largest_settle_change", out.largest_settle_change},
        {"unsettled_evaluations", static_cast<double>(out.unsettled_evaluations)},
        {"largest_cold_offset_K", out.largest_cold_offset},
    };
    if (out.steady_checked) {
        v.push_back({"steady_cold_temperature_K", out.steady_cold_temperature});
        if (end)
            v.push_back({"steady_difference_K", end->cold_temperature - out.steady_cold_temperature});
    }
    // Absent rather than NaN in the JSON and the attributes.
    std::erase_if(v, [](const SummaryValue& s) { return std::isnan(s.value); });
    return v;
}

nlohmann::json cooldownJson(const Machine& machine, const CooldownOutcome& out)
{
    nlohmann::json j;
    j["case"] = machine.description().name;
    j["method"] = out.method;
    j["status"] = out.status;
    if (!out.failure.empty()) j["failure"] = out.failure;
    for (const SummaryValue& v : cooldownValues(out)) j[v.key] = finite(v.value);
    j["report"] = nlohmann::json::array();
    for (const CooldownReport& r : out.reports)
        j["report"].push_back({{"temperature_K", r.temperature}, {"time_s", finite(r.time)}});
    nlohmann::json loads = nlohmann::json::object();
    if (!out.history.empty())
        for (std::size_t k = 0; k < out.load_names.size(); ++k)
            loads[out.load_names[k]] = out.history.back().loads[k];
    j["final_loads_W"] = loads;
    nlohmann::json bodies = nlohmann::json::object();
    if (!out.history.empty())
        for (std::size_t k = 0; k < out.body_names.size(); ++k)
            bodies[out.body_names[k]] = out.history.back().body_temperatures[k];
    j["final_body_temperatures_K"] = bodies;
    return j;
}

void writeCooldownResult(const std::string& path, const Machine& machine,
                         const CooldownOutcome& out, const RunInfo& info)
{
    // The run result of the final cycle with /cooldown added, written as one file and moved
    // into place like every result file (a kill leaves the previous file or this one).
    const SteadyOutcome& last = out.final_cycle;
    RunSummary summary = summarize(machine, last, last.converged ? "converged" : "not-converged",
                                   last.wall_time_s);
    summary.result_file = path;
    writeRunResult(path, machine, last, summary, info, [&](Hdf5Writer& w) {
        auto write = [&](const std::string& name, const std::vector<double>& v, std::size_t cols,
                         const std::string& units) {
            const std::size_t rows = cols > 0 ? v.size() / cols : 0;
            w.write("/cooldown/" + name, v, rows, cols, units);
        };
        std::vector<double> t, Tc, Tb, gross, cooling, net, pv, load, integral;
        for (const CooldownRow& r : out.history) {
            t.push_back(r.time);
            Tc.push_back(r.cold_temperature);
            Tb.insert(Tb.end(), r.body_temperatures.begin(), r.body_temperatures.end());
            gross.push_back(r.gross_cooling);
            cooling.push_back(r.cooling);
            net.push_back(r.net_cooling);
            pv.push_back(r.pv_power);
            load.insert(load.end(), r.loads.begin(), r.loads.end());
            integral.push_back(r.net_cooling_integral);
        }
        write("time", t, 1, "s");
        write("cold_temperature", Tc, 1, "K");
        write("body_temperature", Tb, out.body_names.size(), "K");
        w.writeStrings("/cooldown/body_name", out.body_names);
        write("gross_cooling_power", gross, 1, "W");
        write("cooling_power", cooling, 1, "W");
        write("net_cooling_power", net, 1, "W");
        write("pv_power", pv, 1, "W");
        write("load", load, std::max<std::size_t>(1, out.load_names.size()), "W");
        w.writeStrings("/cooldown/load_name", out.load_names);
        write("net_cooling_integral", integral, 1, "J");
        std::vector<double> report_T, report_t;
        for (const CooldownReport& r : out.reports) {
            report_T.push_back(r.temperature);
            report_t.push_back(r.time);
        }
        write("report_temperature", report_T, 1, "K");
        write("report_time", report_t, 1, "s");
        w.attribute("/cooldown", "method", out.method);
        w.attribute("/cooldown", "status", out.status);
        w.attribute("/cooldown", "failure", out.failure);
        std::string units;
        for (const SummaryValue& v : cooldownValues(out)) {
            w.attribute("/cooldown", v.key, v.value);
            units += v.key + ":" + unitsOf(v.key) + ";";
        }
        w.attribute("/cooldown", "units", units);
    });
}

} // namespace coldtip
