// Malformed case files: every error names the exact line and column, the key path and
// what was expected (STYLE.md §4 item 9). Each case edits one spot of
// tests/data/input/valid.yaml.

#include "solver/input/CaseReader.hpp"

#include <catch2/catch.hpp>
#include <fmt/format.h>
#include <fstream>
#include <sstream>
#include <string>
#include <vector>

using coldtip::input::InputError;
using coldtip::input::parseCaseText;
using coldtip::input::readCaseFile;

namespace {

std::string validText()
{
    std::ifstream in(COLDTIP_TEST_DATA "/input/valid.yaml", std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

struct Malformed {
    const char* name;
    std::string from; //!< text of valid.yaml to replace; empty: `to` is the whole file
    std::string to;
    int line;
    int column;
    std::string path;
    std::vector<std::string> fragments; //!< each must appear in the message
};

// Lines and columns are 1-based, as printed; they refer to valid.yaml after the edit.
// clang-format off
const std::vector<Malformed> kMalformed = {
    {"missing key",
     "length: 120 mm, diameter: 3.5 mm}", "length: 120 mm}",
     15, 5, "components[0].diameter",
     {"missing required key 'diameter'",
      "; expected a length in [1e-06, 10] m"}},
    {"missing top-level key",
     "frequency: 55 Hz\n", "",
     4, 1, "frequency",
     {"missing required key 'frequency'",
      "; expected a frequency in [0.001, 10000] Hz"}},
    {"wrong dimension",
     "bore: 24 mm", "bore: 24 kg",
     10, 9, "drive.bore",
     {"the unit 'kg' is a mass, not a length",
      "; expected a length in m, e.g. \"20 mm\""}},
    {"unknown unit",
     "dead_volume: 1.8 cm^3", "dead_volume: 1.8 cmm^3",
     12, 16, "drive.dead_volume",
     {"unknown unit 'cmm^3'",
      "; expected a volume in m^3, e.g. \"250 cm^3\""}},
    {"not a number",
     "frequency: 55 Hz", "frequency: fast",
     7, 12, "frequency",
     {"'fast' is not a number",
      "; expected a frequency in Hz, e.g. \"55 Hz\""}},
    {"negative length",
     "length: 60 mm", "length: -60 mm",
     39, 13, "components[4].length",
     {"-60 mm (= -0.06 m) is out of range (too small)",
      "; expected a length in [1e-06, 100] m"}},
    {"porosity 1.2",
     "porosity: 0.42", "porosity: 1.2",
     21, 35, "components[1].fill.porosity",
     {"1.2 is out of range",
      "; expected a number in (0, 1)"}},
    {"unknown key with did-you-mean",
     "wire_diameter: 25.4 um", "wire_diamter: 25.4 um",
     28, 68, "components[2].fill.wire_diamter",
     {"unknown key 'wire_diamter' (did you mean 'wire_diameter'?)",
      "; expected one of: kind, material, mesh, wire_diameter, porosity, "
      "conduction_degradation"}},
    {"unknown key, nothing close",
     "initial: {cold_temperature: 300 K}\n",
     "initial: {cold_temperature: 300 K}\ncolour: red\n",
     62, 1, "colour",
     {"unknown key 'colour'; expected one of: case, description, gas, frequency"}},
    {"duplicate key",
     "    cells: 40\n    fill: {kind: screen",
     "    cells: 40\n    cells: 30\n    fill: {kind: screen",
     28, 5, "components[2].cells",
     {"duplicate key 'cells' (first at line 27)",
      "; expected each key once in a map"}},
    {"duplicate name",
     "name: warm-end", "name: aftercooler",
     43, 11, "components[5].name",
     {"duplicate name 'aftercooler' (first used by components[1] at line 16)",
      "; expected a name unique across components and links"}},
    {"name with a dot",
     "name: pulse-tube", "name: pulse.tube",
     37, 11, "components[4].name",
     {"name 'pulse.tube' contains '.'",
      "; expected a name without '.' or whitespace"}},
    {"dangling link",
     "warm-end.outlet]", "warmend.outlet]",
     55, 35, "links[0].between[1]",
     {"no component is named 'warmend' (did you mean 'warm-end'?)",
      "; expected the name of a component: transfer-line, aftercooler,"}},
    {"link to the same port twice",
     "[aftercooler.outlet, warm-end.outlet]", "[warm-end.outlet, warm-end.outlet]",
     55, 32, "links[0].between[1]",
     {"'warm-end.outlet' is the same port as links[0].between[0]",
      "; expected two different ports"}},
    {"link with three ports",
     "warm-end.outlet]", "warm-end.outlet, cold-end.inlet]",
     55, 14, "links[0].between",
     {"3 ports given",
      "; expected a list of exactly two ports"}},
    {"misspelt port end",
     "warm-end.outlet]", "warm-end.outlt]",
     55, 35, "links[0].between[1]",
     {"'outlt' is not an end of 'warm-end' (did you mean 'outlet'?)",
      "; expected warm-end.inlet or warm-end.outlet"}},
    {"not YAML",
     "", "case: broken\ngas: {species: helium, charge_pressure: 3 MPa\n",
     3, 1, "",
     {"not valid YAML: end of map flow not found",
      "; expected a YAML case file"}},
    {"tab indentation",
     "  kind: piston\n", "\tkind: piston\n",
     9, 6, "",
     {"not valid YAML",
      "indented with spaces"}},
    {"empty file",
     "", "",
     1, 1, "",
     {"the file is empty",
      "; expected a YAML map with the keys case, gas, frequency, drive, components"}},
    {"a scalar instead of a case",
     "", "just some words\n",
     1, 1, "",
     {"got 'just some words'",
      "; expected a map with keys case, description, gas"}},
    {"two documents",
     "initial: {cold_temperature: 300 K}\n",
     "initial: {cold_temperature: 300 K}\n---\ncase: another\n",
     63, 1, "",
     {"the file holds 2 YAML documents",
      "; expected one case per file"}},
    {"cells not a number",
     "cells: 40\n    fill: {kind: screen", "cells: 40 cells\n    fill: {kind: screen",
     27, 12, "components[2].cells",
     {"'40 cells' is not an integer",
      "; expected an integer from 1 to 20000"}},
    {"2.5 cells",
     "cells: 40\n    fill: {kind: screen", "cells: 2.5\n    fill: {kind: screen",
     27, 12, "components[2].cells",
     {"2.5 is not an integer",
      "; expected an integer from 1 to 20000"}},
    {"temperature -5 K",
     "wall: {temperature: 85 K}", "wall: {temperature: -5 K}",
     36, 25, "components[3].wall.temperature",
     {"-5 K is out of range",
      "; expected a temperature in [1, 1000] K"}},
    {"degC converted before the range check",
     "charge_temperature: 27 degC", "charge_temperature: -300 degC",
     6, 68, "gas.charge_temperature",
     {"-300 degC (= -26.85 K) is out of range",
      "; expected a temperature in [1, 1000] K"}},
    {"bad material",
     "material: stainless-304, mesh", "material: stainless-340, mesh",
     28, 36, "components[2].fill.material",
     {"unknown material 'stainless-340' (did you mean 'stainless-304'?)",
      "; expected one of: stainless-304, copper"}},
    {"bad species",
     "species: helium", "species: helum",
     6, 16, "gas.species",
     {"unknown species 'helum' (did you mean 'helium'?)",
      "; expected one of: helium"}},
    {"mesh and wire give porosity <= 0",
     "wire_diameter: 25.4 um", "wire_diameter: 0.1 mm",
     28, 57, "components[2].fill.mesh",
     {"mesh 400 in^-1 with wire_diameter 0.1 mm gives porosity 1 - pi mesh "
      "wire_diameter / 4 = -0.237, not in (0, 1)",
      "; expected a finer wire or a coarser mesh"}},
    {"both wall forms",
     "wall: {temperature: 85 K}", "wall: {temperature: 85 K, mass: 0.3 kg}",
     36, 37, "components[3].wall.mass",
     {"'mass' is a key of the lumped-body form, but 'temperature' (line 36) makes the "
      "wall isothermal",
      "; expected either {temperature} (isothermal) or {material, mass, load, "
      "initial_temperature, bodies, loads} (lumped body)"}},
    {"wall of neither form",
     "wall: {temperature: 85 K}", "wall: {}",
     36, 11, "components[3].wall",
     {"missing required key 'temperature' (or 'material' and 'mass' for a lumped body)",
      "; expected either {temperature} (isothermal)"}},
    {"lumped body without mass",
     "wall: {temperature: 85 K}", "wall: {material: copper, load: 2 W}",
     36, 11, "components[3].wall.mass",
     {"missing required key 'mass'",
      "; expected a mass in (0, 10000] kg"}},
    {"list where a map is expected",
     "gas: {species: helium, charge_pressure: 3 MPa, charge_temperature: 27 degC}",
     "gas: [helium, 3 MPa, 300 K]",
     6, 6, "gas",
     {"got a list",
      "; expected a map with keys species, charge_pressure, charge_temperature"}},
    {"map where a quantity is expected",
     "bore: 24 mm", "bore: {value: 24}",
     10, 9, "drive.bore",
     {"got a map",
      "; expected a length in [1e-06, 10] m"}},
    {"unknown component kind",
     "kind: tube", "kind: tub",
     38, 11, "components[4].kind",
     {"unknown kind 'tub' (did you mean 'tube'?)",
      "; expected one of: duct, heat-exchanger, regenerator, tube, volume, orifice"}},
    {"slots in a regenerator",
     "fill: {kind: screen", "fill: {kind: slots",
     28, 18, "components[2].fill.kind",
     {"a regenerator cannot hold a fill of kind 'slots'",
      "; expected one of: screen, spheres"}},
    {"regenerator fill without material",
     "material: stainless-304, mesh", "mesh",
     28, 11, "components[2].fill.material",
     {"missing required key 'material' (a regenerator's matrix needs its material)",
      "; expected one of: stainless-304"}},
    {"too few samples",
     "samples_per_cycle: 128", "samples_per_cycle: 4",
     60, 29, "output.samples_per_cycle",
     {"4 is out of range",
      "; expected an integer from 8 to 4096"}},
    {"tolerance out of range",
     "relative_tolerance: 1e-7", "relative_tolerance: 0.1",
     58, 23, "solver.relative_tolerance",
     {"0.1 is out of range",
      "; expected a number in [1e-12, 0.001]"}},
    {"min_cycles above max_cycles",
     "max_cycles: 5000}", "max_cycles: 5000, min_cycles: 6000}",
     59, 84, "solver.steady.min_cycles",
     {"min_cycles 6000 is more than max_cycles 5000",
      "; expected min_cycles <= max_cycles"}},
};
// clang-format on

std::string edited(const std::string& base, const Malformed& c)
{
    if (c.from.empty())
        return c.to;
    const auto at = base.find(c.from);
    REQUIRE(at != std::string::npos);
    REQUIRE(base.find(c.from, at + 1) == std::string::npos);
    std::string text = base;
    text.replace(at, c.from.size(), c.to);
    return text;
}

} // namespace

TEST_CASE("malformed case files point at the line, the key and the expectation",
          "[input]")
{
    const std::string base = validText();
    REQUIRE_NOTHROW(parseCaseText(base, "case.yaml"));
    for (const Malformed& c : kMalformed) {
        INFO(c.name);
        const std::string text = edited(base, c);
        try {
            parseCaseText(text, "case.yaml");
            FAIL_CHECK("accepted");
        } catch (const InputError& e) {
            const std::string message = e.what();
            INFO(message);
            CHECK(e.mark().file == "case.yaml");
            CHECK(e.mark().line == c.line);
            CHECK(e.mark().column == c.column);
            CHECK(e.mark().path == c.path);
            const std::string head =
                c.path.empty() ? fmt::format("case.yaml:{}:{}: error: ", c.line, c.column)
                               : fmt::format("case.yaml:{}:{}: error: {}: ", c.line,
                                             c.column, c.path);
            CHECK_THAT(message, Catch::StartsWith(head));
            for (const std::string& fragment : c.fragments)
                CHECK_THAT(message, Catch::Contains(fragment));
            // The excerpt: the offending line, then a caret under the column.
            std::vector<std::string> lines;
            std::istringstream in(message);
            for (std::string l; std::getline(in, l);)
                lines.push_back(l);
            const std::size_t newlines = std::count(text.begin(), text.end(), '\n');
            if (static_cast<std::size_t>(c.line) <= newlines) {
                REQUIRE(lines.size() == 3);
                const auto bar = lines[1].find(" | ");
                REQUIRE(bar != std::string::npos);
                CHECK(lines[2].find('^') ==
                      bar + 3 + static_cast<std::size_t>(c.column) - 1);
            }
        }
    }
}

TEST_CASE("files that are missing, empty or not YAML are input errors", "[input]")
{
    SECTION("missing file")
    {
        const std::string path = COLDTIP_TEST_DATA "/input/no-such-case.yaml";
        try {
            readCaseFile(path);
            FAIL("accepted");
        } catch (const InputError& e) {
            CHECK(e.mark().line == 0);
            CHECK(std::string(e.what()) ==
                  path + ": error: cannot open the case file: no such file; "
                         "expected a readable YAML case file");
        }
    }
    SECTION("a directory")
    {
        CHECK_THROWS_WITH(
            readCaseFile(COLDTIP_TEST_DATA "/input"),
            Catch::Contains("cannot open the case file: it is a directory"));
    }
    SECTION("empty file")
    {
        const std::string path = COLDTIP_TEST_DATA "/input/empty.yaml";
        CHECK_THROWS_WITH(readCaseFile(path),
                          Catch::StartsWith(path + ":1:1: error: the file is empty"));
    }
    SECTION("an XML file")
    {
        const std::string path = COLDTIP_TEST_DATA "/input/not-yaml.xml";
        CHECK_THROWS_WITH(readCaseFile(path),
                          Catch::StartsWith(path + ":1:1: error: got '<?xml version=") &&
                              Catch::Contains("; expected a map with keys case,"));
    }
    SECTION("a binary file")
    {
        CHECK_THROWS_WITH(parseCaseText(std::string("case: x\nga\0s", 12), "b.yaml"),
                          Catch::StartsWith("b.yaml:2:3: error: the file is not text"));
    }
}
