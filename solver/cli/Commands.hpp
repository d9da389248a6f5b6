#pragma once
//! \file Commands.hpp
//! The command line (DESIGN §5): each command lives in its own file and registers itself
//! with the application. Exit codes: 0 success, 1 bad input (nothing written), 2 solver
//! failure (what was computed is written and named), 3 interrupted (the result file is
//! readable and resumable).

#include <CLI/CLI.hpp>
#include <functional>
#include <string>

namespace coldtip::cli {

inline constexpr int kExitSuccess = 0;
inline constexpr int kExitBadInput = 1;
inline constexpr int kExitSolverFailure = 2;
inline constexpr int kExitInterrupted = 3;

//! What every command may use: the full command line (stored in result files).
struct CommandContext {
    std::string command_line;
};

//! A command adds its subcommand to `app` and sets `action` when it is chosen; the action
//! returns the exit code. Input errors are thrown as input::InputError.
using Action = std::function<int()>;
void addRunCommand(CLI::App& app, Action& action, const CommandContext& context);
void addCheckCommand(CLI::App& app, Action& action, const CommandContext& context);
void addPlotCommand(CLI::App& app, Action& action, const CommandContext& context);
void addKeysCommand(CLI::App& app, Action& action, const CommandContext& context);
void addProfileCommand(CLI::App& app, Action& action, const CommandContext& context);
void addLinearCommand(CLI::App& app, Action& action, const CommandContext& context);
void addCompareCommand(CLI::App& app, Action& action, const CommandContext& context);
void addCooldownCommand(CLI::App& app, Action& action, const CommandContext& context);

//! SIGINT/SIGTERM set a flag that long commands poll between cycles.
void watchInterrupts();
bool interrupted();

int main(int argc, char** argv);

} // namespace coldtip::cli
