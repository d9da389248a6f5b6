#include "solver/cli/Commands.hpp"

#include <CLI/CLI.hpp>
#include <atomic>
#include <chrono>
#include <csignal>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>

#include "solver/cli/Progress.hpp"
#include "solver/components/Machine.hpp"
#include "solver/cycle/PeriodicSteadyState.hpp"
#include "solver/cycle/ShootingNewton.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/output/ResultFile.hpp"

namespace coldtip::cli {

namespace {

std::atomic<bool> g_interrupted{false};
extern "C" void onSignal(int) { g_interrupted = true; }

std::string commandLine(int argc, char** argv)
{
    std::string s;
    for (int i = 0; i < argc; ++i) s += (i ? " " : "") + std::string(argv[i]);
    return s;
}

std::string defaultResultPath(const std::string& case_path)
{
    return std::filesystem::path(case_path).stem().string() + ".h5";
}

SteadyOptions steadyOptions(const CaseDescription& d, long max_cycles)
{
    SteadyOptions o;
    o.max_cycles = max_cycles > 0 ? max_cycles : d.solver.steady.max_cycles;
    o.min_cycles = d.solver.steady.min_cycles;
    o.heat_residual = d.solver.steady.heat_residual;
    o.energy_residual = d.solver.steady.energy_residual;
    o.temperature_tolerance = d.solver.steady.temperature_tolerance;
    o.samples_per_cycle = d.output.samples_per_cycle;
    return o;
}

struct RunOptions {
    std::string case_path;
    std::string output;
    long max_cycles = 0;
    bool resume = false;
    bool quiet = false;
    bool json = false;
};

int runCommand(const RunOptions& opt, const RunInfo& info)
{
    const CaseDescription d = input::readCaseFile(opt.case_path);
    Machine machine(d);
    const std::string out_path = opt.output.empty() ? defaultResultPath(opt.case_path) : opt.output;
    long period = 0;
    std::vector<double> y0 = machine.initialState();
    if (opt.resume && std::filesystem::exists(out_path)) {
        SavedState saved = readSavedState(out_path, machine);
        period = saved.period_index;
        y0 = std::move(saved.state);
    }

    Progress progress(opt.quiet);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const SteadyOptions o = steadyOptions(d, opt.max_cycles);
    std::signal(SIGINT, onSignal);
    std::signal(SIGTERM, onSignal);
    auto last_save = std::chrono::steady_clock::now();
    auto save = [&](const SteadyOutcome& s, const std::string& status) {
        RunSummary summary = summarize(machine, s, status, s.wall_time_s);
        summary.result_file = out_path;
        writeRunResult(out_path, machine, s, summary, info);
        return summary;
    };
    auto on_cycle = [&](const SteadyOutcome& s) {
            const CycleMetrics& m = s.metrics;
            progress.cycle(s.history.back().cycle, m.cold_temperature, m.cooling_power,
                           m.heat_residual, o.heat_residual, s.wall_time_s);
            // A checkpoint every 30 s: a killed run leaves the last complete cycle on disk.
            const auto now = std::chrono::steady_clock::now();
            if (now - last_save > std::chrono::seconds(30)) {
                save(s, "running");
                last_save = now;
            }
            return !g_interrupted.load();
        };
    ShootingReport report;
    SteadyOutcome out = d.solver.steady.method == "accelerated"
                            ? shootToSteadyState(runner, period, y0, o, ShootingOptions{}, report,
                                                 on_cycle)
                            : integrateToSteadyState(runner, period, y0, o, on_cycle);
    progress.finish();
    if (d.solver.steady.method == "accelerated")
        for (int i = 0; i < report.newton_iterations; ++i) {
            std::string mu;
            for (auto m : report.floquet[i].multipliers) mu += fmt::format(" {:.5f}", std::abs(m));
            progress.note(fmt::format("newton {}: residual {:.3e} K, {} krylov, |mu|{}", i + 1,
                                      report.residual_norm[i], report.krylov_iterations[i], mu));
        }

    std::string status = out.converged ? "converged" : "max-cycles";
    if (g_interrupted) status = "interrupted";
    if (out.failed) status = "failed";
    const RunSummary summary = save(out, status);
    if (opt.json) std::cout << toJson(summary).dump(2) << std::endl;
    if (out.failed) {
        fmt::print(stderr, "error: solver failure after {} complete cycles: {}\n"
                           "the last complete cycle is in {}\n",
                   out.history.size(), out.failure, out_path);
        return kExitSolverFailure;
    }
    const CycleMetrics& m = out.metrics;
    progress.note(fmt::format(
        "{}: {} after {} cycles ({:.1f} s): cooling {:.3f} W at {:.2f} K, PV {:.3f} W, "
        "COP {:.4f}, {:.1f} % of Carnot, energy balance {:+.2e}, residual {:.2e}; wrote {}",
        d.name, status, out.history.size(), out.wall_time_s, m.cooling_power,
        m.cold_temperature, m.pv_power, m.cop, 100.0 * m.carnot_fraction,
        m.energy_balance_error, m.heat_residual, out_path));
    if (g_interrupted) return kExitInterrupted;
    return kExitSuccess;
}

int checkCommand(const std::string& case_path)
{
    const CaseDescription d = input::readCaseFile(case_path);
    Machine machine(d);
    const Network& net = machine.network();
    fmt::print("case {}: {} gas at {:.4g} MPa, {:.4g} Hz\n", d.name, d.gas.species,
               d.gas.charge_pressure * 1e-6, d.frequency);
    fmt::print("{:<18} {:<15} {:>6} {:>6} {:>6} {:>9} {:>9}  {}\n", "component", "kind", "cells",
               "faces", "solids", "x0 [mm]", "x1 [mm]", "thermal boundary");
    for (int k = 0; k < static_cast<int>(net.components().size()); ++k) {
        const ComponentSlice& s = net.components()[k];
        int faces = 0;
        for (const FlowFace& f : net.faces()) faces += f.component == k;
        const int cells = s.first_cell >= 0 ? s.last_cell - s.first_cell + 1 : 0;
        const int solids = s.first_solid >= 0 ? s.last_solid - s.first_solid + 1 : 0;
        std::string boundary = "-";
        if (s.boundary >= 0) {
            const ThermalBoundary& b = net.boundaries()[s.boundary];
            boundary = b.isothermal ? fmt::format("wall at {:.2f} K", b.temperature)
                                    : "lumped body " + net.solids()[b.solid_node].name;
        }
        std::string role;
        if (k == machine.coldComponent()) role = " (cold)";
        if (k == machine.rejectComponent()) role = " (reject)";
        if (k == machine.warmComponent()) role = " (warm)";
        fmt::print("{:<18} {:<15} {:>6} {:>6} {:>6} {:>9.1f} {:>9.1f}  {}{}\n", s.name, s.kind,
                   cells, faces, solids, 1e3 * s.x_start, 1e3 * s.x_end, boundary, role);
    }
    for (const LinkSpec& l : d.links)
        fmt::print("link {}: {} between {}.{} and {}.{}, orifice {:.3g} mm\n", l.name, l.kind,
                   l.from.component, l.from.outlet ? "outlet" : "inlet", l.to.component,
                   l.to.outlet ? "outlet" : "inlet", 1e3 * l.orifice_diameter);
    fmt::print("network: {} cells, {} faces, {} solid nodes, {} states, {} Jacobian "
               "non-zeros, {} cycle integrals; charge {:.4g} g\n",
               net.cells().size(), net.faces().size(), net.solids().size(), net.size(),
               net.pattern().nnz(), net.nQuadratures(), 1e3 * machine.chargeMass());
    return kExitSuccess;
}

} // namespace

int main(int argc, char** argv)
{
    CLI::App app{"coldtip: time-domain nodal simulator of regenerative cryocoolers"};
    app.require_subcommand(1);
    RunOptions run_opt;
    auto* run = app.add_subcommand("run", "integrate a case to its periodic steady state");
    run->add_option("CASE", run_opt.case_path, "case file (YAML)")->required();
    run->add_option("-o,--output", run_opt.output, "result file (default: CASE name + .h5)");
    run->add_option("--max-cycles", run_opt.max_cycles, "stop after this many cycles");
    run->add_flag("--resume", run_opt.resume, "continue from the state saved in the result file");
    run->add_flag("--quiet", run_opt.quiet, "no progress on stderr");
    run->add_flag("--json", run_opt.json, "print the summary as JSON on stdout");

    std::string check_path;
    auto* check = app.add_subcommand("check", "validate a case and print its network");
    check->add_option("CASE", check_path, "case file (YAML)")->required();

    try {
        app.parse(argc, argv);
    } catch (const CLI::ParseError& e) {
        const int code = app.exit(e);
        return code == 0 ? kExitSuccess : kExitBadInput;
    }
    try {
        if (*run) return runCommand(run_opt, RunInfo{commandLine(argc, argv)});
        if (*check) return checkCommand(check_path);
    } catch (const input::InputError& e) {
        fmt::print(stderr, "{}\n", e.what());
        return kExitBadInput;
    } catch (const std::exception& e) {
        fmt::print(stderr, "error: {}\n", e.what());
        return kExitSolverFailure;
    }
    return kExitSuccess;
}

} // namespace coldtip::cli
