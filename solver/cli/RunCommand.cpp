#include <chrono>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>

#include "solver/cli/Commands.hpp"
#include "solver/cli/Progress.hpp"
#include "solver/components/Machine.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/output/OutputFile.hpp"
#include "solver/output/ResultFile.hpp"

namespace coldtip::cli {

namespace {

std::string defaultResultPath(const std::string& case_path)
{
    return std::filesystem::path(case_path).stem().string() + ".h5";
}

struct RunOptions {
    std::string case_path;
    std::string output;
    long max_cycles = 0;
    bool resume = false;
    bool quiet = false;
    bool json = false;
    bool verbose = false;
    double checkpoint_every_s = 30.0;
};

int runCase(const RunOptions& opt, const RunInfo& info)
{
    watchInterrupts();
    const std::string out_path = opt.output.empty() ? defaultResultPath(opt.case_path) : opt.output;
    // Before any work: the result can be written and writing it loses nothing.
    checkOutputFile(out_path, {opt.case_path});
    const CaseDescription d = input::readCaseFile(opt.case_path);
    Machine machine(d);
    SteadyStart start = freshStart(0, machine.initialState());
    if (opt.resume) {
        if (std::filesystem::exists(out_path)) {
            start = readSavedState(out_path, machine).start;
            // A converged result has nothing to continue: solving again from its last cycle
            // would start a new path and give another answer (within the tolerance, but
            // not the one on file).
            if (Hdf5Reader(out_path).stringAttribute("/summary", "status") == "converged") {
                fmt::print(stderr, "note: {} is converged already: nothing to resume, the file "
                                   "is left as it is\n", out_path);
                return kExitSuccess;
            }
            if (!opt.quiet)
                fmt::print(stderr, "resuming from {}: period {}, {} cycles and {:.1f} s so far{}\n",
                           out_path, start.point.period_index, start.point.history_rows,
                           start.point.wall_time_s,
                           start.point.shooting.iteration > 0
                               ? fmt::format(", at Newton iteration {}",
                                             start.point.shooting.iteration)
                               : std::string());
        } else {
            // Said even with --quiet: the user asked to continue something that is not there.
            fmt::print(stderr, "note: {} does not exist: nothing to resume, starting from the "
                               "initial state\n", out_path);
        }
    }

    Progress progress(opt.quiet);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const SteadyOptions o = steadyOptionsFor(d, opt.max_cycles);
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
            // A checkpoint every --checkpoint-every seconds: a killed run leaves its last restart point on disk
            // (RestartPoint.hpp), from which --resume takes the uninterrupted run's path.
            const auto now = std::chrono::steady_clock::now();
            if (now - last_save >= std::chrono::duration<double>(opt.checkpoint_every_s)) {
                save(s, "running");
                last_save = now;
            }
            return !interrupted();
        };
    SteadyOutcome out = solveSteadyState(runner, start, o, d.solver.steady.method, on_cycle);
    const SolverDiagnostics& report = out.diagnostics;
    progress.finish();
    if (opt.verbose)
        for (int i = 0; i < report.newton_iterations; ++i) {
            std::string mu;
            for (auto m : report.floquet[i]) mu += fmt::format(" {:.5f}", std::abs(m));
            progress.note(fmt::format("newton step {}: {} period(s) per map, residual {:.3e} K "
                                      "(RMS), {} GMRES iterations, correction {:.3g} K, "
                                      "dominant Floquet multipliers |mu|:{}",
                                      i + 1, report.periods_per_map[i],
                                      report.newton_residual[i], report.krylov_iterations[i],
                                      report.newton_correction[i], mu));
        }

    const bool stopped = !out.converged && !out.failed && (out.interrupted || interrupted());
    std::string status = out.converged ? "converged" : "not-converged";
    if (!out.converged && !out.failed && !stopped)
        out.failure = fmt::format("no periodic steady state after {} cycles: {}",
                                  out.history.size(), convergenceShortfall(out.metrics, o));
    if (stopped) status = "interrupted";
    if (out.failed) status = "failed";
    const RunSummary summary = save(out, status);
    if (opt.json) std::cout << toJson(summary).dump(2) << std::endl;
    if (out.failed) {
        fmt::print(stderr, "error: solver failure after {} complete cycles: {}\n"
                           "the last complete cycle is in {}\n",
                   out.history.size(), out.failure, out_path);
        return kExitSolverFailure;
    }
    if (stopped) {
        progress.note(fmt::format("{}: interrupted after {} cycles ({:.1f} s); `--resume` "
                                  "continues from {} (period {})",
                                  d.name, out.history.size(), out.wall_time_s, out_path,
                                  out.restart.period_index));
        return kExitInterrupted;
    }
    if (!out.converged) {
        fmt::print(stderr, "error: {}\nthe last cycle is in {} (status not-converged)\n",
                   out.failure, out_path);
        return kExitSolverFailure;
    }
    progress.note(summaryLine(summary));
    return kExitSuccess;
}

} // namespace

void addRunCommand(CLI::App& app, Action& action, const CommandContext& context)
{
    auto opt = std::make_shared<RunOptions>();
    auto* run = app.add_subcommand("run", "integrate a case to its periodic steady state");
    run->add_option("CASE", opt->case_path, "case file (YAML)")->required();
    run->add_option("-o,--output", opt->output, "result file (default: CASE name + .h5)");
    run->add_option("--max-cycles", opt->max_cycles, "stop after this many cycles");
    run->add_flag("--resume", opt->resume, "continue from the state saved in the result file");
    run->add_flag("--quiet", opt->quiet, "no progress on stderr");
    run->add_option("--checkpoint-every", opt->checkpoint_every_s,
                    "seconds between checkpoints written to the result file (default 30; 0: "
                    "after every cycle)")
        ->check(CLI::NonNegativeNumber);
    run->add_flag("--json", opt->json, "print the summary as JSON on stdout");
    run->add_flag("--verbose", opt->verbose,
                  "print every Newton step with the dominant Floquet multipliers");
    run->callback([&action, opt, context] {
        action = [opt, context] { return runCase(*opt, RunInfo{context.command_line}); };
    });
}

} // namespace coldtip::cli
