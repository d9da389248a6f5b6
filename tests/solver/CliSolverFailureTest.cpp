// The command line's contract for a solver failure (DESIGN.md §5, STYLE.md §4 item 8): a
// run that the integrator cannot finish exits with code 2, names the failure on stderr by
// time and by the states (and so the components) that carried the largest local error, and
// still leaves a readable result file that says it failed.
#include <catch2/catch.hpp>

#include <filesystem>

#include "solver/components/Machine.hpp"
#include "solver/cycle/CycleRunner.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/output/Hdf5File.hpp"
#include "tests/solver/CliSupport.hpp"

using namespace coldtip;
using namespace coldtip::testing;

namespace {

//! The demo cooler with a budget of 20 integrator steps per cycle (it needs ~1500).
std::string starvedDemoText()
{
    std::string text = readText(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
    const std::string solver = "solver:\n";
    const auto at = text.find(solver);
    REQUIRE(at != std::string::npos);
    text.insert(at + solver.size(), "  max_steps_per_cycle: 20\n");
    return text;
}

} // namespace

TEST_CASE("the integrator error of a starved cycle names the states with the largest error",
          "[cli]")
{
    const CaseDescription d = input::parseCaseText(starvedDemoText(), "starved.yaml");
    Machine machine(d);
    CycleRunner runner(machine, CycleRunner::optionsFor(machine));
    runner.start(0, machine.initialState());
    try {
        runner.runCycle();
        FAIL("the cycle finished within 20 steps");
    } catch (const IntegratorError& e) {
        INFO(e.what());
        CHECK(e.flag() == CV_TOO_MUCH_WORK);
        CHECK(e.time() > 0.0);
        REQUIRE_FALSE(e.worstStates().empty());
        std::string worst;
        for (const std::string& s : e.worstStates()) worst += s + "; ";
        INFO("worst states: " << worst);
        bool names_component = false;
        for (const ComponentSpec& c : d.components)
            names_component = names_component || worst.find(c.name + "[") != std::string::npos;
        CHECK(names_component);
    }
}

TEST_CASE("a run that runs out of integrator steps exits with 2 and leaves a readable file",
          "[cli]")
{
    const std::string text = starvedDemoText();
    const CaseDescription d = input::parseCaseText(text, "starved.yaml");
    REQUIRE(d.solver.max_steps_per_cycle == 20);

    TempFolder folder;
    const std::string path = folder.write("starved.yaml", text);
    const std::string result = folder.file("starved.h5");
    const ProcessResult r = runColdtip(
        folder, "run " + shellQuoted(path) + " -o " + shellQuoted(result) + " --quiet");
    INFO("stderr: " << r.err);
    CHECK(r.exit_code == 2);
    CHECK_THAT(r.err, Catch::Contains("CV_TOO_MUCH_WORK"));
    CHECK_THAT(r.err, Catch::Contains("t = "));
    // The failure names where it happened: a state of one of the case's components.
    bool names_component = false;
    for (const ComponentSpec& c : d.components)
        names_component = names_component || r.err.find(c.name + "[") != std::string::npos;
    CHECK(names_component);

    REQUIRE(std::filesystem::exists(result));
    CHECK_FALSE(std::filesystem::exists(result + ".partial"));
    const Hdf5Reader file(result);
    CHECK(file.stringAttribute("/summary", "status") == "failed");
    CHECK_THAT(file.stringAttribute("/summary", "failure"), Catch::Contains("CV_TOO_MUCH_WORK"));
    CHECK(file.exists("/case"));
}
