#include <chrono>
#include <cmath>
#include <filesystem>
#include <fmt/format.h>
#include <iostream>

#include "solver/cli/Commands.hpp"
#include "solver/cli/Progress.hpp"
#include "solver/components/Machine.hpp"
#include "solver/cycle/Cooldown.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/input/InputError.hpp"
#include "solver/output/CooldownResult.hpp"
#include "solver/output/OutputFile.hpp"

namespace coldtip::cli {

namespace {

struct CooldownCliOptions {
    std::string case_path;
    std::string output;
    bool json = false;
    bool plain = false;
    bool quiet = false;
};

//! A cooldown needs a cold head to cool: the cold exchanger's wall as a lumped body.
void requireColdBody(const Machine& machine)
{
    const int cold = machine.coldComponent();
    const CaseDescription& d = machine.description();
    if (cold < 0)
        throw input::InputError({d.source_path, 1, 1, "components"},
                                "the case has no cold heat exchanger to cool down",
                                "a heat exchanger after the first regenerator (or role: cold)",
                                d.source_text);
    const ComponentSpec& spec = machine.components()[cold]->spec();
    if (spec.wall.kind != WallSpec::Kind::LumpedBody)
        throw input::InputError(spec.wall.mark,
                                "the cold exchanger '" + spec.name +
                                    "' is held at a fixed temperature, so nothing cools down",
                                "its wall as a lumped body, {material, mass, ...}",
                                d.source_text);
}

int runCooldownCommand(const CooldownCliOptions& opt, const RunInfo& info)
{
    watchInterrupts();
    const std::string out_path =
        opt.output.empty() ? std::filesystem::path(opt.case_path).stem().string() + ".h5"
                           : opt.output;
    checkOutputFile(out_path, {opt.case_path});
    const CaseDescription d = input::readCaseFile(opt.case_path);
    Machine machine(d);
    requireColdBody(machine);
    const CooldownOptions o = cooldownOptionsFor(machine, opt.plain ? "plain" : "");
    Progress progress(opt.quiet);
    progress.note(fmt::format("{}: cooldown ({}) from {:.2f} K, at most {:.0f} s", d.name,
                              o.method, o.start_temperature, o.time_limit));
    const auto t0 = std::chrono::steady_clock::now();
    auto last_note = t0;
    auto on_row = [&](const CooldownRow& r) {
        const auto now = std::chrono::steady_clock::now();
        if (now - last_note > std::chrono::seconds(10)) {
            progress.note(fmt::format("  t = {:8.1f} s  T_cold = {:7.2f} K  net cooling {:7.3f} W"
                                      "  ({:.0f} s)",
                                      r.time, r.cold_temperature, r.net_cooling,
                                      std::chrono::duration<double>(now - t0).count()));
            last_note = now;
        }
        return !interrupted();
    };
    CooldownOutcome out = runCooldown(machine, o, on_row);
    // An interrupted cooldown leaves its file even before its first row (exit 3: readable).
    if (!out.final_cycle.history.empty() || !out.history.empty() || out.status == "interrupted") {
        if (out.final_cycle.history.empty()) out.final_cycle.state = out.state;
        writeCooldownResult(out_path, machine, out, info);
    }
    if (opt.json) std::cout << cooldownJson(machine, out).dump(2) << std::endl;
    std::string reports;
    for (const CooldownReport& r : out.reports)
        reports += std::isnan(r.time) ? fmt::format(", {:g} K not reached", r.temperature)
                                      : fmt::format(", {:g} K at {:.1f} s", r.temperature, r.time);
    const double Tc = out.history.empty() ? 0.0 : out.history.back().cold_temperature;
    progress.note(fmt::format(
        "{}: {} ({}) at {:.1f} s: cold end {:.3f} K{}{}; {} cycles in {:.1f} s; wrote {}",
        d.name, out.status, out.method, out.end_time, Tc, reports,
        out.steady_checked ? fmt::format("; steady state {:.3f} K", out.steady_cold_temperature)
                           : std::string(),
        out.cycles, out.wall_time_s, out_path));
    if (out.status == "failed") {
        fmt::print(stderr, "error: cooldown failed: {}\n", out.failure);
        return kExitSolverFailure;
    }
    if (out.status == "interrupted") return kExitInterrupted;
    return kExitSuccess;
}

} // namespace

void addCooldownCommand(CLI::App& app, Action& action, const CommandContext& context)
{
    auto opt = std::make_shared<CooldownCliOptions>();
    auto* cmd = app.add_subcommand(
        "cooldown", "the cooldown transient from a uniform start until the cold end settles");
    cmd->add_option("CASE", opt->case_path, "case file (YAML)")->required();
    cmd->add_option("-o,--output", opt->output, "result file (default: CASE name + .h5)");
    cmd->add_flag("--json", opt->json, "print the summary as JSON on stdout");
    cmd->add_flag("--plain", opt->plain, "integrate every cycle (no acceleration)");
    cmd->add_flag("--quiet", opt->quiet, "no progress on stderr");
    cmd->callback([&action, opt, context] {
        action = [opt, context] {
            return runCooldownCommand(*opt, RunInfo{context.command_line});
        };
    });
}

} // namespace coldtip::cli
