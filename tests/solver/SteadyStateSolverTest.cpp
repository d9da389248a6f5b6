// The accelerated periodic-steady-state solver (Newton-Krylov shooting) gives the answer of
// plain cycle-by-cycle integration, warm-starts in a few outer iterations, and never passes
// an unconverged cycle off as converged. Two small invented machines whose slow modes decay
// within a few thousand cycles, so that plain integration is affordable (about 40 s each).
#include <catch2/catch.hpp>

#include <cmath>
#include <cstdio>
#include <fmt/format.h>
#include <fstream>
#include <sstream>
#include <sys/wait.h>

#include "solver/components/Machine.hpp"
#include "solver/cycle/ShootingNewton.hpp"
#include "solver/cycle/SteadyStateSolver.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/output/Hdf5File.hpp"

using namespace coldtip;

namespace {

struct Solved {
    SteadyOptions options;
    SteadyOutcome outcome;
    std::vector<double> solid_temperatures;
};

Solved solve(const std::string& file, const std::string& method)
{
    const CaseDescription d = input::readCaseFile(std::string(COLDTIP_TEST_DATA) + "/steady/" + file);
    Machine machine(d);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    Solved s;
    s.options = steadyOptionsFor(d);
    s.outcome = solveSteadyState(runner, 0, machine.initialState(), s.options, method);
    for (const SolidNode& n : machine.network().solids())
        s.solid_temperatures.push_back(s.outcome.state[n.offset]);
    return s;
}

void compare(const std::string& file)
{
    const Solved plain = solve(file, "plain");
    const Solved fast = solve(file, "accelerated");
    REQUIRE(plain.outcome.converged);
    REQUIRE(fast.outcome.converged);
    const CycleMetrics& p = plain.outcome.metrics;
    const CycleMetrics& a = fast.outcome.metrics;
    INFO(fmt::format("{}: cooling {:.6f} W plain, {:.6f} W accelerated; cycles {} against {}",
                     file, p.cooling_power, a.cooling_power, plain.outcome.diagnostics.cycle_equivalents,
                     fast.outcome.diagnostics.cycle_equivalents));
    CHECK(std::abs(a.cooling_power - p.cooling_power) <= 5e-3 * std::abs(p.cooling_power));
    CHECK(std::abs(a.cold_temperature - p.cold_temperature) <= 0.1);
    double worst = 0.0;
    for (std::size_t i = 0; i < plain.solid_temperatures.size(); ++i)
        worst = std::max(worst, std::abs(plain.solid_temperatures[i] - fast.solid_temperatures[i]));
    INFO("largest solid temperature difference " << worst << " K");
    CHECK(worst <= 0.05);
    // Far fewer periods integrated, sensitivity periods included.
    CHECK(fast.outcome.diagnostics.cycle_equivalents * 10 <
          plain.outcome.diagnostics.cycle_equivalents);
    // Only a correction from a settle map (several periods, tight solve) judges the answer,
    // and the distance reported is that correction, within the tolerance.
    const SolverDiagnostics& dg = fast.outcome.diagnostics;
    REQUIRE_FALSE(dg.periods_per_map.empty());
    CHECK(dg.periods_per_map.back() == ShootingOptions{}.settle_cycles_per_map);
    CHECK(a.distance_estimate == dg.newton_correction.back());
    CHECK(a.distance_estimate <= fast.options.temperature_tolerance);
}

} // namespace

TEST_CASE("accelerated and plain steady states agree on a small regenerator", "[steady]")
{
    compare("small-regenerator.yaml");
}

TEST_CASE("accelerated and plain steady states agree on a small orifice pulse tube", "[steady]")
{
    compare("small-orifice-tube.yaml");
}

TEST_CASE("a warm start from a converged state converges in at most 3 outer iterations",
          "[steady]")
{
    const CaseDescription d = input::readCaseFile(COLDTIP_TEST_DATA "/steady/small-regenerator.yaml");
    Machine machine(d);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    const SteadyOptions options = steadyOptionsFor(d);
    const SteadyOutcome cold = solveSteadyState(runner, 0, machine.initialState(), options,
                                                "accelerated");
    REQUIRE(cold.converged);
    // A sweep's next variant: a slightly different frequency, started from this state.
    CaseDescription variant = d;
    variant.frequency *= 1.02;
    Machine next(variant);
    CycleRunner next_runner(next, CycleRunner::optionsFor(next));
    const SteadyOutcome warm = solveSteadyState(next_runner, 0, cold.state, options, "accelerated");
    REQUIRE(warm.converged);
    INFO("outer (Newton) iterations: cold start " << cold.diagnostics.newton_iterations
                                                  << ", warm start "
                                                  << warm.diagnostics.newton_iterations);
    CHECK(warm.diagnostics.newton_iterations <= 3);
    CHECK(warm.diagnostics.cycle_equivalents < cold.diagnostics.cycle_equivalents);
}

TEST_CASE("a run that does not reach the steady state exits 2 and names the cause", "[steady][cli]")
{
    const std::string out = "steady-unconverged-test.h5";
    std::remove(out.c_str());
    const std::string cmd = fmt::format(
        "{} run {}/steady/small-regenerator.yaml -o {} --max-cycles 4 --quiet 2> steady-err.txt",
        COLDTIP_EXE, COLDTIP_TEST_DATA, out);
    const int status = std::system(cmd.c_str());
    REQUIRE(WIFEXITED(status));
    CHECK(WEXITSTATUS(status) == 2);
    std::ifstream err("steady-err.txt");
    std::stringstream text;
    text << err.rdbuf();
    CHECK_THAT(text.str(), Catch::Contains("no periodic steady state after 4 cycles"));
    CHECK_THAT(text.str(), Catch::Contains("heat residual"));
    Hdf5Reader result(out);
    CHECK(result.stringAttribute("/summary", "status") == "not-converged");
    std::remove(out.c_str());
    std::remove("steady-err.txt");
}
