#include "solver/cli/Commands.hpp"

#include <atomic>
#include <csignal>
#include <fmt/format.h>

#include "solver/input/InputError.hpp"

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
} // namespace

void watchInterrupts()
{
    std::signal(SIGINT, onSignal);
    std::signal(SIGTERM, onSignal);
}

bool interrupted() { return g_interrupted.load(); }

int main(int argc, char** argv)
{
    CLI::App app{"coldtip: time-domain nodal simulator of regenerative cryocoolers"};
    app.require_subcommand(1);
    const CommandContext context{commandLine(argc, argv)};
    Action action;
    addRunCommand(app, action, context);
    addCheckCommand(app, action, context);
    addPlotCommand(app, action, context);
    addKeysCommand(app, action, context);
    addProfileCommand(app, action, context);
    addLinearCommand(app, action, context);
    addCompareCommand(app, action, context);
    addCooldownCommand(app, action, context);
    try {
        app.parse(argc, argv);
    } catch (const CLI::ParseError& e) {
        const int code = app.exit(e);
        return code == 0 ? kExitSuccess : kExitBadInput;
    }
    try {
        return action ? action() : kExitSuccess;
    } catch (const input::InputError& e) {
        fmt::print(stderr, "{}\n", e.what());
        return kExitBadInput;
    } catch (const std::exception& e) {
        fmt::print(stderr, "error: {}\n", e.what());
        return kExitSolverFailure;
    }
}

} // namespace coldtip::cli
