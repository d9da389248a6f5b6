#include <chrono>
#include <fmt/format.h>
#include <iostream>
#include <nlohmann/json.hpp>

#include "solver/cli/Commands.hpp"
#include "solver/components/Machine.hpp"
#include "solver/cycle/CycleRunner.hpp"
#include "solver/input/CaseReader.hpp"

namespace coldtip::cli {

namespace {

//! The hot path on its own: the network's right-hand side (with and without the cycle
//! integrands) and Jacobian at a mid-cycle state of the case, timed over many repetitions.
//! Run under `valgrind --tool=callgrind` for instruction counts that do not depend on the
//! load of a shared machine (scripts/bench --profile).
int profileCase(const std::string& path, int repetitions)
{
    const CaseDescription d = input::readCaseFile(path);
    Machine machine(d);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    runner.runCycle();
    const double t = runner.session().advance(1.3 * machine.period(), 2.0 * machine.period());
    const std::vector<double> y(runner.session().state().begin(), runner.session().state().end());
    const Network& net = machine.network();
    std::vector<double> ydot(net.size()), quad(net.nQuadratures()), jac(net.pattern().nnz());
    auto time = [&](auto&& f, int n) {
        const auto t0 = std::chrono::steady_clock::now();
        for (int i = 0; i < n; ++i) f();
        return std::chrono::duration<double, std::micro>(std::chrono::steady_clock::now() - t0)
                   .count() / n;
    };
    nlohmann::json j;
    j["case"] = d.name;
    j["states"] = net.size();
    j["repetitions"] = repetitions;
    j["rhs_us"] = time([&] { net.evaluate(t, y, ydot, nullptr); }, repetitions);
    j["rhs_with_integrals_us"] = time([&] { net.evaluate(t, y, ydot, quad.data()); }, repetitions);
    j["jacobian_us"] = time([&] { net.jacobian(t, y, jac); }, std::max(1, repetitions / 5));
    std::cout << j.dump() << std::endl;
    return kExitSuccess;
}

} // namespace

void addProfileCommand(CLI::App& app, Action& action, const CommandContext&)
{
    auto path = std::make_shared<std::string>();
    auto repetitions = std::make_shared<int>(1000);
    auto* profile = app.add_subcommand("profile", "time the right-hand side and the Jacobian of a case");
    profile->add_option("CASE", *path, "case file (YAML)")->required();
    profile->add_option("-n,--repetitions", *repetitions, "evaluations to time");
    profile->callback([&action, path, repetitions] {
        action = [path, repetitions] { return profileCase(*path, *repetitions); };
    });
}

} // namespace coldtip::cli
