#include <chrono>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>
#include <sstream>

#include "solver/cli/Commands.hpp"
#include "solver/cli/Progress.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/linear/Comparison.hpp"
#include "solver/output/LinearResult.hpp"
#include "solver/output/OutputFile.hpp"

namespace coldtip::cli {

namespace {

struct CompareOptions {
    std::string input;
    std::string output;
    std::string amplitudes;
    bool json = false;
    bool quiet = false;
};

std::vector<double> parseAmplitudes(const std::string& text)
{
    std::vector<double> out;
    std::stringstream s(text);
    std::string item;
    while (std::getline(s, item, ',')) {
        std::size_t used = 0;
        double v = 0.0;
        try {
            v = std::stod(item, &used);
        } catch (const std::exception&) {
            used = 0;
        }
        if (used == 0 || !(v > 0.0))
            throw CLI::ValidationError("--amplitudes", "'" + item + "' is not a positive number");
        out.push_back(v);
    }
    return out;
}

//! The sampled last cycle and its exact integrals, stored in a run's result file.
struct StoredCycle {
    CycleSamples samples;
    CycleIntegrals integrals;
};

StoredCycle readStoredCycle(const std::string& path, const Machine& machine)
{
    Hdf5Reader r(path);
    const Network& net = machine.network();
    const GasProperties& gas = net.gas();
    StoredCycle c;
    c.samples.time = r.doubles("/cycle/time");
    const std::vector<double> p = r.doubles("/cycle/pressure"), T = r.doubles("/cycle/gas_temperature"),
                              m = r.doubles("/cycle/mass_flow"), Ts = r.doubles("/cycle/solid_temperature");
    const std::size_t n = c.samples.time.size(), nc = net.cells().size(), nf = net.faces().size(),
                      ns = net.solids().size();
    if (p.size() != n * nc || m.size() != n * nf || Ts.size() != n * ns)
        throw std::runtime_error(path + ": its /cycle does not fit the case's network");
    for (std::size_t j = 0; j < n; ++j) {
        std::vector<double> y(net.size(), 0.0);
        for (std::size_t i = 0; i < nc; ++i) {
            const GasCell& cell = net.cells()[i];
            const double V = cell.volumeAt(c.samples.time[j]);
            const double mass = p[j * nc + i] * V / (gas.R * T[j * nc + i]);
            y[cell.offset] = mass;
            y[cell.offset + 1] = mass * gas.cv * T[j * nc + i];
        }
        for (std::size_t f = 0; f < nf; ++f) y[net.faces()[f].offset] = m[j * nf + f];
        for (std::size_t k = 0; k < ns; ++k) y[net.solids()[k].offset] = Ts[j * ns + k];
        c.samples.state.push_back(std::move(y));
    }
    c.integrals.pv_power_W = r.doubleAttribute("/summary", "pv_power_W");
    c.integrals.gross_cooling_W = r.doubles("/history/gross_cooling_power").back();
    c.integrals.converged = r.stringAttribute("/summary", "status") == "converged";
    c.integrals.cycles = static_cast<long>(r.doubles("/history/time").size());
    c.integrals.wall_time_s = r.doubleAttribute("/summary", "wall_time_s");
    return c;
}

void printTable(const AmplitudeComparison& a)
{
    fmt::print("drive amplitude x {:.3g}: {} after {} cycles; |p2|/|p1| <= {:.4f}, |p3|/|p1| <= "
               "{:.4f}; PV power exact {:.4f} W, from the DFT {:.4f} W ({:.1e})\n",
               a.scale, a.integrals.converged ? "converged" : "NOT converged", a.integrals.cycles,
               a.max_p2_over_p1, a.max_p3_over_p1, a.integrals.pv_power_W, a.pv_power_dft_W,
               a.dft_check);
    fmt::print("{:<32} {:>13} {:>13} {:>13} {:>10} {:>10}\n", "quantity", "nonlinear", "linear",
               "lumped", "lin diff", "lump diff");
    for (const ComparedQuantity& q : a.table) {
        auto d = [&](double v) {
            return q.phase ? fmt::format("{:+.2f} deg", v) : fmt::format("{:+.2f} %", 100.0 * v);
        };
        fmt::print("{:<32} {:>13.5g} {:>13.5g} {:>13.5g} {:>10} {:>10}\n", q.key, q.nonlinear,
                   q.linear, q.lumped, d(q.linear_difference), d(q.lumped_difference));
    }
}

int runCompare(const CompareOptions& opt, const RunInfo& info)
{
    const bool from_result = opt.input.ends_with(".h5");
    watchInterrupts();
    const std::string out_path = opt.output.empty()
        ? std::filesystem::path(opt.input).stem().string() + "-compare.h5"
        : opt.output;
    checkOutputFile(out_path, {opt.input});
    CaseDescription d;
    if (from_result) {
        Hdf5Reader r(opt.input);
        d = input::parseCaseText(r.stringAttribute("/case", "text"), r.stringAttribute("/case", "path"));
    } else {
        d = input::readCaseFile(opt.input);
    }
    Machine machine(d);
    std::vector<double> scales = opt.amplitudes.empty() ? std::vector<double>{1.0}
                                                        : parseAmplitudes(opt.amplitudes);
    Comparison comparison;
    comparison.case_name = d.name;
    comparison.frequency_Hz = d.frequency;
    Progress progress(opt.quiet);
    std::vector<double> y0 = machine.initialState();
    long period = 0;
    for (double scale : scales) {
        machine.drive().piston().scale = scale;
        if (from_result && scale == 1.0) {
            const StoredCycle stored = readStoredCycle(opt.input, machine);
            comparison.amplitudes.push_back(compareCycle(machine, stored.samples, stored.integrals));
            continue;
        }
        CycleRunner runner(machine, CycleRunner::optionsFor(machine));
        const SteadyOptions o = steadyOptionsFor(d);
        const SteadyOutcome out = solveSteadyState(
            runner, period, y0, o, d.solver.steady.method, [&](const SteadyOutcome& s) {
                const CycleMetrics& m = s.metrics;
                progress.cycle(s.history.back().cycle, m.cold_temperature, m.cooling_power,
                               m.heat_residual, o.heat_residual, s.wall_time_s);
                return !interrupted();
            });
        progress.finish();
        if (out.interrupted || interrupted()) {
            progress.note("interrupted: nothing written (a comparison is not resumed)");
            return kExitInterrupted;
        }
        if (out.failed || out.samples.time.empty()) {
            fmt::print(stderr, "error: nonlinear run at amplitude x {} failed: {}\n", scale, out.failure);
            return kExitSolverFailure;
        }
        CycleIntegrals integrals;
        integrals.pv_power_W = out.metrics.pv_power;
        integrals.gross_cooling_W = out.metrics.gross_cooling;
        integrals.converged = out.converged;
        integrals.cycles = static_cast<long>(out.history.size());
        integrals.wall_time_s = out.wall_time_s;
        comparison.amplitudes.push_back(compareCycle(machine, out.samples, integrals));
        y0 = out.state; // warm start for the next amplitude
        period = out.period_index;

    }
    machine.drive().piston().scale = 1.0;

    Hdf5Writer w(out_path);
    writeCaseAttributes(w, machine, info);
    writeComparison(w, comparison);
    w.commit();
    if (opt.json) {
        nlohmann::json j = toJson(comparison);
        j["result_file"] = out_path;
        std::cout << j.dump(2) << std::endl;
    } else {
        for (const AmplitudeComparison& a : comparison.amplitudes) printTable(a);
    }
    if (!opt.quiet) progress.note("wrote " + out_path);
    return kExitSuccess;
}

} // namespace

void addCompareCommand(CLI::App& app, Action& action, const CommandContext& context)
{
    auto opt = std::make_shared<CompareOptions>();
    auto* cmd = app.add_subcommand("compare", "nonlinear cycle against the linear and lumped models");
    cmd->add_option("INPUT", opt->input, "case file (YAML) or a run's result file (.h5)")->required();
    cmd->add_option("-o,--output", opt->output, "result file (default: INPUT name + -compare.h5)");
    cmd->add_option("--amplitudes", opt->amplitudes,
                    "drive amplitude multipliers, comma separated (e.g. 0.25,0.5,1,1.5)");
    cmd->add_flag("--json", opt->json, "print the comparison as JSON on stdout");
    cmd->add_flag("--quiet", opt->quiet, "no progress on stderr");
    cmd->callback([&action, opt, context] {
        action = [opt, context] { return runCompare(*opt, RunInfo{context.command_line}); };
    });
}

} // namespace coldtip::cli
