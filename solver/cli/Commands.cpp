#include "solver/cli/Commands.hpp"

#include <H5Cpp.h>
#include <csignal>
#include <fmt/format.h>
#include <new>
#include <yaml-cpp/exceptions.h>

#include "solver/input/InputError.hpp"
#include "solver/integrator/Interrupt.hpp"

namespace coldtip::cli {

namespace {
extern "C" void onSignal(int) { requestInterrupt(); }

std::string commandLine(int argc, char** argv)
{
    std::string s;
    for (int i = 0; i < argc; ++i) s += (i ? " " : "") + std::string(argv[i]);
    return s;
}
} // namespace

void watchInterrupts()
{
    // sigaction without SA_RESTART semantics questions: the handler only sets a flag, which
    // the integration checks on every right-hand side (Interrupt.hpp).
    struct sigaction action {};
    action.sa_handler = onSignal;
    sigemptyset(&action.sa_mask);
    sigaction(SIGINT, &action, nullptr);
    sigaction(SIGTERM, &action, nullptr);
}

bool interrupted() { return interruptRequested(); }

namespace {

//! Every exception ends here as a message and an exit code, never as an abort: input
//! errors 1, an interruption 3, anything else (HDF5, memory, a library's own) 2.
int runAction(const Action& action)
{
    try {
        return action ? action() : kExitSuccess;
    } catch (const input::InputError& e) {
        fmt::print(stderr, "{}\n", e.what());
        return kExitBadInput;
    } catch (const Interrupted& e) {
        fmt::print(stderr, "{}\n", e.what());
        return kExitInterrupted;
    } catch (const YAML::Exception& e) {
        fmt::print(stderr, "error: reading YAML: {}\n", e.what());
        return kExitBadInput;
    } catch (const std::bad_alloc&) {
        fmt::print(stderr, "error: out of memory\n");
        return kExitSolverFailure;
    } catch (const std::exception& e) {
        fmt::print(stderr, "error: {}\n", e.what());
        return kExitSolverFailure;
    } catch (const H5::Exception& e) {
        fmt::print(stderr, "error: HDF5: {}: {}\n", e.getFuncName(), e.getDetailMsg());
        return kExitSolverFailure;
    } catch (...) {
        fmt::print(stderr, "error: an unknown exception ended the command\n");
        return kExitSolverFailure;
    }
}

} // namespace

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
    } catch (...) {
        return runAction([] () -> int { throw; });
    }
    return runAction(action);
}

} // namespace coldtip::cli
