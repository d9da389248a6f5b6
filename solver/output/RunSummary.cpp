#include "solver/output/RunSummary.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <fstream>

#include "solver/cycle/Harmonics.hpp"
#include "solver/linear/OrificePhasors.hpp"
#include "solver/network/GasState.hpp"

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

std::vector<LinkFlow> linkFlows(const Machine& machine, const SteadyOutcome& out)
{
    const Network& net = machine.network();
    const std::vector<OrificeOnPath> orifices = networkOrifices(net);
    std::vector<LinkFlow> links;
    for (const LinkSpec& spec : machine.description().links) {
        LinkFlow l;
        l.name = spec.name;
        l.from = spec.from.component + (spec.from.outlet ? ".outlet" : ".inlet");
        l.to = spec.to.component + (spec.to.outlet ? ".outlet" : ".inlet");
        int slice = -1;
        for (std::size_t k = 0; k < net.components().size(); ++k)
            if (net.components()[k].kind == "valve" && net.components()[k].name == spec.name)
                slice = static_cast<int>(k);
        if (slice < 0) continue;
        const ComponentSlice& s = net.components()[slice];
        l.x_from = s.x_start;
        l.x_to = s.x_end;
        const int h = s.inlet_channel;
        l.enthalpy_flow = h >= 0 && static_cast<std::size_t>(h) < out.last.averages.size()
                              ? out.last.averages[h]
                              : std::nan("");
        // The link's orifice element: the one joining the two port cells.
        auto cellOf = [&](const PortSpec& port) {
            for (const ComponentSlice& c : net.components())
                if (c.name == port.component && c.kind != "valve")
                    return port.outlet ? c.last_cell : c.first_cell;
            return -1;
        };
        const int a = cellOf(spec.from), b = cellOf(spec.to);
        const OrificeOnPath* o = nullptr;
        for (const OrificeOnPath& c : orifices)
            if (c.from == a && c.to == b) o = &c;
        l.mean_mass_flow = std::nan("");
        if (o && !out.samples.time.empty()) {
            std::vector<double> mdot;
            for (std::size_t j = 0; j < out.samples.time.size(); ++j) {
                const std::vector<double>& y = out.samples.state[j];
                auto gasOf = [&](int i) {
                    const GasCell& c = net.cells()[i];
                    return gasState(y[c.offset], y[c.offset + 1], c.volumeAt(out.samples.time[j]),
                                    net.gas());
                };
                mdot.push_back(orificeFlow(net, *o, gasOf(o->from), gasOf(o->to)));
            }
            l.mean_mass_flow = cycleMean(mdot);
        }
        links.push_back(l);
    }
    return links;
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
    // Cooling figures only for a machine with a cold heat exchanger; COP and fraction of
    // Carnot only where they are the efficiency of a cooler (net cooling > 0, T_h > T_c).
    const bool cooler = machine.coldComponent() >= 0;
    s.machine = cooler ? "cooler" : "test rig";
    if (cooler) {
        s.values = {
            {"cooling_power_W", m.cooling_power},
            {"gross_cooling_power_W", m.gross_cooling},
            {"cold_conduction_W", m.cold_conduction},
            {"cold_temperature_K", m.cold_temperature},
        };
    } else {
        s.notes.push_back("test rig: the machine has no cold heat exchanger, so it has no "
                          "cooling power, COP or fraction of Carnot");
    }
    if (machine.rejectComponent() >= 0) {
        s.values.push_back({"reject_temperature_K", m.reject_temperature});
        s.values.push_back({"reject_heat_W", m.reject_heat});
    }
    s.values.push_back({"pv_power_W", m.pv_power});
    if (cooler) s.values.push_back({"applied_load_W", m.applied_load});
    const bool refrigerates = cooler && m.cooling_power > 0.0 && m.pv_power > 0.0;
    if (refrigerates) {
        s.values.push_back({"cop", m.cop});
        // Carnot's COP T_c / (T_h - T_c) needs a reject temperature above the cold one.
        if (m.reject_temperature > m.cold_temperature && m.cold_temperature > 0.0)
            s.values.push_back({"carnot_fraction", m.carnot_fraction});
    } else if (cooler && !(m.cooling_power > 0.0) && !out.history.empty()) {
        s.notes.push_back(fmt::format(
            "the machine heats its cold end: it puts {:.4g} W into the cold exchanger (net "
            "cooling {:.4g} W), so it has no COP or fraction of Carnot",
            -m.cooling_power, m.cooling_power));
    }
    s.links = linkFlows(machine, out);
    const std::vector<SummaryValue> rest = {
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
    s.values.insert(s.values.end(), rest.begin(), rest.end());
    return s;
}

std::string summaryLine(const RunSummary& s)
{
    auto value = [&](const std::string& key) {
        for (const SummaryValue& v : s.values)
            if (v.key == key) return v.value;
        return std::nan("");
    };
    std::string line = fmt::format("{}: {} after {:.0f} cycles ({:.1f} s): ", s.case_name, s.status,
                                   value("cycles"), value("wall_time_s"));
    if (s.machine == "cooler")
        line += fmt::format("cooling {:.3f} W at {:.2f} K, ", value("cooling_power_W"),
                            value("cold_temperature_K"));
    else
        line += "test rig (no cold heat exchanger), ";
    line += fmt::format("PV {:.3f} W", value("pv_power_W"));
    if (std::isfinite(value("cop"))) line += fmt::format(", COP {:.4f}", value("cop"));
    if (std::isfinite(value("carnot_fraction")))
        line += fmt::format(", {:.1f} % of Carnot", 100.0 * value("carnot_fraction"));
    for (const LinkFlow& l : s.links)
        line += fmt::format(", link {} {} -> {}: mean mass flow {:.4g} g/s, enthalpy flow {:.4g} W",
                            l.name, l.from, l.to, 1e3 * l.mean_mass_flow, l.enthalpy_flow);
    line += fmt::format(", energy balance {:+.2e}, residual {:.2e}", value("energy_balance_error"),
                        value("steady_residual"));
    if (!s.result_file.empty()) line += "; wrote " + s.result_file;
    for (const std::string& n : s.notes) line += "\nnote: " + n;
    return line;
}

nlohmann::json toJson(const RunSummary& s)
{
    nlohmann::json j;
    j["case"] = s.case_name;
    j["status"] = s.status;
    if (!s.failure.empty()) j["failure"] = s.failure;
    if (!s.result_file.empty()) j["result_file"] = s.result_file;
    j["machine"] = s.machine;
    if (!s.notes.empty()) j["notes"] = s.notes;
    auto number = [](double v) { return std::isfinite(v) ? nlohmann::json(v) : nlohmann::json(nullptr); };
    if (!s.links.empty()) {
        nlohmann::json links = nlohmann::json::object();
        for (const LinkFlow& l : s.links)
            links[l.name] = {{"from", l.from},
                             {"to", l.to},
                             {"x_from_m", l.x_from},
                             {"x_to_m", l.x_to},
                             {"mean_mass_flow_kg_s", number(l.mean_mass_flow)},
                             {"enthalpy_flow_W", number(l.enthalpy_flow)}};
        j["links"] = links;
    }
    for (const SummaryValue& v : s.values) {
        if (v.key == "converged")
            j[v.key] = v.value != 0.0;
        else if (v.key == "cycles" || v.key == "cycle_equivalents" ||
                 v.key == "newton_iterations")
            j[v.key] = static_cast<long>(v.value);
        else
            j[v.key] = number(v.value);
    }
    return j;
}

} // namespace coldtip
