#include <filesystem>
#include <fmt/format.h>
#include <sys/wait.h>
#include <unistd.h>

#include "solver/cli/Commands.hpp"
#include "solver/output/OutputFile.hpp"

namespace coldtip::cli {

namespace {

//! The plots are Python (matplotlib, h5py from the distribution, whose interpreter is
//! /usr/bin/python3); the script lives in the source tree's postprocess/.
int plotResult(const std::string& result, const std::string& directory)
{
    // The folder the plots go to (by default the result's own) takes files: checked first.
    checkOutputFolder(directory.empty() ? std::filesystem::path(result).parent_path().string()
                                        : directory);
    const std::string script = std::string(COLDTIP_SOURCE_DIR) + "/postprocess/coldtip_plot.py";
    std::vector<std::string> args = {"/usr/bin/python3", script, result};
    if (!directory.empty()) {
        args.push_back("-o");
        args.push_back(directory);
    }
    std::vector<char*> argv;
    for (auto& a : args) argv.push_back(a.data());
    argv.push_back(nullptr);
    const pid_t pid = fork();
    if (pid == 0) {
        execv(argv[0], argv.data());
        fmt::print(stderr, "error: cannot run {}\n", argv[0]);
        _exit(127);
    }
    int status = 0;
    if (pid < 0 || waitpid(pid, &status, 0) < 0) return kExitSolverFailure;
    return WIFEXITED(status) ? WEXITSTATUS(status) : kExitSolverFailure;
}

} // namespace

void addPlotCommand(CLI::App& app, Action& action, const CommandContext&)
{
    auto result = std::make_shared<std::string>();
    auto directory = std::make_shared<std::string>();
    auto* plot = app.add_subcommand("plot", "draw the standard plots of a result file (PNG)");
    plot->add_option("RESULT", *result, "result file (HDF5)")->required();
    plot->add_option("-o,--output", *directory, "folder for the PNG files (default: next to it)");
    plot->callback([&action, result, directory] {
        action = [result, directory] { return plotResult(*result, *directory); };
    });
}

} // namespace coldtip::cli
