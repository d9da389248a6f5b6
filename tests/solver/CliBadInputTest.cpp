// The command line's contract for bad input (DESIGN.md §5): `coldtip check` and
// `coldtip run -o X.h5` exit with code 1, name the file and the line on stderr, and write
// nothing. The case reader's messages are tested in tests/input/; here the whole process,
// including errors found only when the network is assembled.
#include <catch2/catch.hpp>

#include <algorithm>
#include <filesystem>
#include <vector>

#include "tests/solver/CliSupport.hpp"

using namespace coldtip::testing;

namespace {

constexpr int kBadInput = 1;

struct BadCase {
    const char* name;
    std::string from; //!< text of cli-valid.yaml to replace; empty: `to` is the whole file
    std::string to;
    //! Where the error must point: the line holding `at` in the edited text; if `at` is
    //! empty, the line where the edit starts; `line` > 0 overrides both.
    std::string at;
    int line = 0;
};

// clang-format off
const std::vector<BadCase> kBadCases = {
    {"missing key", "length: 100 mm, diameter: 3 mm}", "length: 100 mm}", "", 0},
    {"missing top-level key", "frequency: 50 Hz\n", "", "case: cli-contract", 0},
    {"wrong unit", "bore: 20 mm", "bore: 20 kg", "", 0},
    {"unknown unit", "dead_volume: 1.5 cm^3", "dead_volume: 1.5 cmm^3", "", 0},
    {"not a number", "frequency: 50 Hz", "frequency: fast", "", 0},
    {"negative length", "length: 60 mm", "length: -60 mm", "", 0},
    {"porosity 1.2", "porosity: 0.5,", "porosity: 1.2,", "", 0},
    {"negative temperature", "temperature: 80 K", "temperature: -5 K", "", 0},
    {"unknown key", "wire_diameter: 25 um", "wire_diamter: 25 um", "", 0},
    {"unknown top-level key", "output: {samples_per_cycle: 32}\n",
     "output: {samples_per_cycle: 32}\ncolour: red\n", "colour: red", 0},
    {"duplicate key", "    cells: 10\n    fill: {kind: screen",
     "    cells: 10\n    cells: 12\n    fill: {kind: screen", "cells: 12", 0},
    {"duplicate name", "name: warm-end", "name: aftercooler", "", 0},
    {"dangling link", "warm-end.outlet]", "warmend.outlet]", "", 0},
    {"2.5 cells", "cells: 10\n    fill: {kind: screen", "cells: 2.5\n    fill: {kind: screen",
     "", 0},
    {"unknown species", "species: helium", "species: helum", "", 0},
    {"unknown component kind", "kind: tube", "kind: tub", "", 0},
    {"unknown material", "material: stainless-304", "material: stainless-340", "", 0},
    {"tab indentation", "    kind: regenerator\n", "\tkind: regenerator\n", "", 0},
    // Found only when the network is assembled (solver/components/Machine.cpp).
    {"orifice ending the path", "volume: 250 cm^3}\n",
     "volume: 250 cm^3}\n  - {name: needle, kind: orifice, orifice_diameter: 0.3 mm}\n",
     "name: needle", 0},
    {"two lumped volumes joined", "volume: 250 cm^3}\n",
     "volume: 250 cm^3}\n  - {name: second-buffer, kind: volume, volume: 1 L}\n",
     "name: second-buffer", 0},
    {"not YAML", "", "case: broken\ngas: {species: helium, charge_pressure: 3 MPa\n", "", 3},
    {"a scalar, not a map", "", "just some words\n", "", 1},
    {"empty file", "", "", "", 1},
};
// clang-format on

int lineOf(const std::string& text, std::size_t offset)
{
    return 1 + static_cast<int>(std::count(text.begin(), text.begin() + offset, '\n'));
}

//! The edited text and the line its error must point at.
std::pair<std::string, int> edited(const std::string& base, const BadCase& c)
{
    if (c.from.empty()) return {c.to, c.line};
    const auto at = base.find(c.from);
    REQUIRE(at != std::string::npos);
    REQUIRE(base.find(c.from, at + 1) == std::string::npos);
    std::string text = base;
    text.replace(at, c.from.size(), c.to);
    if (c.line > 0) return {text, c.line};
    if (c.at.empty()) return {text, lineOf(text, at)};
    const auto located = text.find(c.at);
    REQUIRE(located != std::string::npos);
    return {text, lineOf(text, located)};
}

//! Nothing but the case file (and the captured output, already removed) in the folder.
bool onlyCaseIn(const TempFolder& folder)
{
    int n = 0;
    for (const auto& entry : std::filesystem::directory_iterator(folder.path())) {
        (void)entry;
        ++n;
    }
    return n == 1;
}

} // namespace

TEST_CASE("coldtip check and run exit with 1 on bad input, name the line, write nothing",
          "[cli]")
{
    const std::string base = readText(COLDTIP_TEST_DATA "/solver/cli-valid.yaml");
    {
        TempFolder folder;
        const std::string path = folder.write("case.yaml", base);
        REQUIRE(runColdtip(folder, "check " + shellQuoted(path)).exit_code == 0);
    }
    REQUIRE(kBadCases.size() >= 15);
    for (const BadCase& c : kBadCases) {
        INFO(c.name);
        const auto [text, line] = edited(base, c);
        TempFolder folder;
        const std::string path = folder.write("case.yaml", text);
        const std::string head = path + ":" + std::to_string(line) + ":";
        const std::string result = folder.file("X.h5");

        const ProcessResult check = runColdtip(folder, "check " + shellQuoted(path));
        INFO("check stderr: " << check.err);
        CHECK(check.exit_code == kBadInput);
        CHECK_THAT(check.err, Catch::Contains(head));

        const ProcessResult run = runColdtip(
            folder, "run " + shellQuoted(path) + " -o " + shellQuoted(result) + " --quiet");
        INFO("run stderr: " << run.err);
        CHECK(run.exit_code == kBadInput);
        CHECK_THAT(run.err, Catch::Contains(head));
        CHECK_FALSE(std::filesystem::exists(result));
        CHECK_FALSE(std::filesystem::exists(result + ".partial"));
        CHECK(onlyCaseIn(folder));
    }
}

TEST_CASE("coldtip check and run exit with 1 on a missing case file and write nothing",
          "[cli]")
{
    TempFolder folder;
    const std::string path = folder.file("no-such-case.yaml");
    const std::string result = folder.file("X.h5");
    for (const std::string& args :
         {"check " + shellQuoted(path),
          "run " + shellQuoted(path) + " -o " + shellQuoted(result) + " --quiet"}) {
        INFO(args);
        const ProcessResult r = runColdtip(folder, args);
        CHECK(r.exit_code == kBadInput);
        // A file that cannot be opened has no line to point at: the message names the file.
        CHECK_THAT(r.err, Catch::StartsWith(path + ": error: cannot open the case file"));
        CHECK_FALSE(std::filesystem::exists(result));
        CHECK_FALSE(std::filesystem::exists(result + ".partial"));
        CHECK(std::filesystem::is_empty(folder.path()));
    }
}
