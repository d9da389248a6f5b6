// Input that reads but would mislead (issue "nothing misleads and nothing is lost"): each
// class of misreading, run through the coldtip executable on an edit of the demo case
// cases/ge-spectrometer-85K.yaml. A refused case exits with 1, names the file, the line,
// the key and what was expected, and writes nothing; a quantity that is a difference is
// read as one.

#include "solver/input/CaseReader.hpp"
#include "tests/solver/CliSupport.hpp"

#include <catch2/catch.hpp>
#include <chrono>
#include <cmath>
#include <filesystem>
#include <string>
#include <vector>

using namespace coldtip::testing;
using coldtip::input::parseCaseText;

namespace {

constexpr int kBadInput = 1;

struct Misread {
    const char* name;
    std::string from; //!< text of the demo case to replace
    std::string to;
    std::string at;   //!< the error's line holds this text of the edited case
    std::string path; //!< key path the message names
    std::vector<std::string> fragments; //!< each must appear in the message
    std::string until = {}; //!< if given, the replaced text runs from `from` up to it
};

// clang-format off
const std::vector<Misread> kMisreads = {
    // udunits2 counts the radian as 1: 345.6 rad/s would run at 345.6 Hz.
    {"angular frequency", "frequency: 55 Hz", "frequency: 345.6 rad/s",
     "frequency: 345.6 rad/s", "frequency",
     {"'rad/s' holds 'rad'", "would be read as 345.6 Hz", "345.6 rad/s is 55.00 Hz",
      "; expected a frequency in Hz"}},
    // udunits2's offset syntax: "85 K @ 1000" is 1085 K.
    {"offset syntax", "wall: {temperature: 85 K}", "wall: {temperature: \"85 K @ 1000\"}",
     "85 K @ 1000", "components[3].wall.temperature",
     {"shifts the unit's origin", "; expected a temperature in K"}},
    {"shift by 'since'", "charge_temperature: 300 K", "charge_temperature: 300 K since 1",
     "K since 1", "gas.charge_temperature",
     {"'since' is udunits2's offset syntax"}},
    // Screens are counted per inch; a bare 400 would be 400 per metre.
    {"bare mesh number", "mesh: 400 in^-1", "mesh: 400", "mesh: 400",
     "components[2].fill.mesh",
     {"'400' has no unit", "wires per inch", "e.g. \"400 in^-1\""}},
    {"bare volume", "dead_volume: 1.5 cm^3", "dead_volume: 1.5", "dead_volume: 1.5",
     "drive.dead_volume",
     {"'1.5' has no unit", "in cm^3 or L", "e.g. \"250 cm^3\""}},
    {"implausible derived porosity", "mesh: 400 in^-1", "mesh: 400 m^-1", "mesh: 400 m^-1",
     "components[2].fill.mesh",
     {"gives porosity 1 - pi mesh wire_diameter / 4 = 0.992, above 0.95",
      "; expected a mesh in wires per inch"}},
    {"hydraulic diameter larger than the passage",
     "hydraulic_diameter: 0.5 mm}", "hydraulic_diameter: 50 mm}", "hydraulic_diameter: 50 mm",
     "components[3].fill.hydraulic_diameter",
     {"the hydraulic diameter 50 mm is not smaller than the passage's diameter 24 mm"}},
    // A bare 0.2 meant as mm is 0.2 m: inside the diameter range, but the bed's hydraulic
    // diameter 2 phi d / (3 (1 - phi)) = 81.72 mm does not fit in the 24 mm regenerator.
    {"sphere bed wider than its passage",
     "{kind: screen, material: stainless-304, mesh: 400 in^-1, wire_diameter: 25 um}",
     "{kind: spheres, material: lead, sphere_diameter: 0.2}", "sphere_diameter: 0.2",
     "components[2].fill.sphere_diameter",
     {"of 0.2 spheres = 81.72 mm is not smaller than the passage's diameter 24 mm"}},
    {"revolutions per minute", "frequency: 55 Hz", "frequency: 3300 rpm",
     "frequency: 3300 rpm", "frequency",
     {"'rpm' is a rate that udunits2 defines through an angle or a count",
      "3300 rpm is 55.00 Hz"}},
    {"a drive alone", "components:", "components: []\nsolver:", "components: []",
     "components",
     {"no components: a drive alone is not a machine",
      "; expected a list of at least one component"}, "solver:"},
    // Span et al. (2000): nitrogen's saturation temperature at 2.9 MPa is 122.9 K
    // (tests/models/PhaseBoundaryTests.cpp); the cold end at 85 K would hold liquid.
    {"condensing gas", "species: helium, charge_pressure: 3.1 MPa",
     "species: nitrogen, charge_pressure: 2.9 MPa", "temperature: 85 K",
     "components[3].wall.temperature",
     {"nitrogen condenses at the charge pressure 2.9 MPa below 122.",
      "and this is 85 K", "; expected a temperature above 122."}},
    {"5000 K cold wall", "wall: {temperature: 85 K}", "wall: {temperature: 5000 K}",
     "temperature: 5000 K", "components[3].wall.temperature",
     {"5000 K is out of range (too large)", "; expected a temperature in [1, 1000] K"}},
    {"1e5 K charge temperature", "charge_temperature: 300 K", "charge_temperature: 1e5 K",
     "charge_temperature: 1e5 K", "gas.charge_temperature",
     {"1e5 K is out of range (too large)"}},
    {"diameter 1e-30 m", "diameter: 11 mm\n    cells: 80", "diameter: 1e-30 m\n    cells: 80",
     "diameter: 1e-30 m", "components[4].diameter",
     {"1e-30 m is out of range (too small)", "; expected a length in [1e-06, 10] m"}},
    {"a billion cells", "cells: 80\n    fill", "cells: 1e9\n    fill", "cells: 1e9",
     "components[2].cells",
     {"1e9 is out of range (too large)", "; expected an integer from 1 to 20000"}},
    {"cells beyond int", "cells: 80\n    fill", "cells: 2147483648\n    fill",
     "cells: 2147483648", "components[2].cells",
     {"2147483648 is out of range (too large)", "; expected an integer from 1 to 20000"}},
    {"too many cells in all", "cells: 80\n    fill", "cells: 19990\n    fill",
     "cells: 19990", "components[2].cells",
     {"the components hold 20", "cells in all", "'regenerator' has 19990",
      "above the limit of 20000"}},
    {"1e400 Pa", "charge_pressure: 3.1 MPa", "charge_pressure: 1e400 Pa",
     "charge_pressure: 1e400 Pa", "gas.charge_pressure",
     {"'1e400' is beyond the range of a double"}},
    {"a list in a list", "output: {samples_per_cycle: 96}",
     "output: {samples_per_cycle: 96}\ncooldown: {report_at: [200 K, [100 K]]}",
     "report_at:", "cooldown.report_at[1]",
     {"got a list; expected a temperature in [1, 1000] K as each entry of report_at"}},
};
// clang-format on

int lineOf(const std::string& text, std::size_t offset)
{
    return 1 + static_cast<int>(std::count(text.begin(), text.begin() + offset, '\n'));
}

std::string demoCase()
{
    return readText(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
}

std::string edited(const std::string& base, const std::string& from, const std::string& to,
                   const std::string& until = {})
{
    const auto at = base.find(from);
    REQUIRE(at != std::string::npos);
    std::size_t end = at + from.size();
    if (!until.empty()) {
        end = base.find(until, at);
        REQUIRE(end != std::string::npos);
        end += until.size();
    } else {
        REQUIRE(base.find(from, at + 1) == std::string::npos);
    }
    std::string text = base;
    text.replace(at, end - at, to);
    return text;
}

bool onlyCaseIn(const TempFolder& folder)
{
    return std::distance(std::filesystem::directory_iterator(folder.path()),
                         std::filesystem::directory_iterator()) == 1;
}

} // namespace

TEST_CASE("misreadable input is refused with exit 1 at its key, fast, writing nothing",
          "[cli][input]")
{
    const std::string base = demoCase();
    for (const Misread& c : kMisreads) {
        INFO(c.name);
        const std::string text = edited(base, c.from, c.to, c.until);
        const auto located = text.find(c.at);
        REQUIRE(located != std::string::npos);
        TempFolder folder;
        const std::string path = folder.write("case.yaml", text);
        const std::string head =
            path + ":" + std::to_string(lineOf(text, located)) + ":";
        const std::string result = folder.file("X.h5");

        const auto start = std::chrono::steady_clock::now();
        const ProcessResult check = runColdtip(folder, "check " + shellQuoted(path));
        const double seconds =
            std::chrono::duration<double>(std::chrono::steady_clock::now() - start).count();
        INFO("check stderr: " << check.err);
        CHECK(check.exit_code == kBadInput);
        CHECK_THAT(check.err, Catch::StartsWith(head));
        CHECK_THAT(check.err, Catch::Contains(": error: " + c.path + ": "));
        for (const std::string& fragment : c.fragments)
            CHECK_THAT(check.err, Catch::Contains(fragment));
        CHECK(seconds < 10.0); // refused before any work, not after allocating or running

        const ProcessResult run = runColdtip(
            folder, "run " + shellQuoted(path) + " -o " + shellQuoted(result) + " --quiet");
        INFO("run stderr: " << run.err);
        CHECK(run.exit_code == kBadInput);
        CHECK_THAT(run.err, Catch::StartsWith(head));
        CHECK_FALSE(std::filesystem::exists(result));
        CHECK(onlyCaseIn(folder));
    }
}

TEST_CASE("a temperature difference converts by the unit's scale, not as a temperature",
          "[input]")
{
    // 1 degC step = 1 K and 1 degF step = 5/9 K (NIST SP 811, 2008, appendix B.8); a
    // temperature difference has no offset.
    struct Row {
        const char* written;
        double kelvin;
    };
    const Row rows[] = {{"0.05 K", 0.05},      {"0.05 degC", 0.05}, {"0.1 degF", 0.1 * 5.0 / 9.0},
                        {"50 mK", 0.05},       {"0.05", 0.05}};
    const std::string base = demoCase();
    for (const Row& r : rows) {
        INFO(r.written);
        const std::string text =
            edited(base, "temperature_tolerance: 0.05 K",
                   std::string("temperature_tolerance: ") + r.written) +
            "cooldown: {settle_tolerance: " + r.written + "}\n";
        const auto c = parseCaseText(text, "case.yaml");
        CHECK(c.solver.steady.temperature_tolerance == Approx(r.kelvin).epsilon(1e-12));
        CHECK(c.cooldown.settle_tolerance == Approx(r.kelvin).epsilon(1e-12));
    }
    // An absolute temperature keeps its offset (T/K = t/degC + 273.15, BIPM SI brochure).
    const auto c = parseCaseText(
        edited(base, "wall: {temperature: 85 K}", "wall: {temperature: -188.15 degC}"),
        "case.yaml");
    CHECK(c.components[3].wall.temperature == Approx(85.0).epsilon(1e-12));
}

TEST_CASE("a property fit used outside its range is warned about once, on one line",
          "[cli][input]")
{
    // The NIST fit of stainless-304 covers 4-300 K (models/solids/Stainless304.hpp).
    const std::string text =
        edited(demoCase(), "diameter: 3.2 mm,\n     wall: {temperature: 300 K}}",
               "diameter: 3.2 mm,\n     wall: {temperature: 350 K}}");
    TempFolder folder;
    const std::string path = folder.write("case.yaml", text);
    const ProcessResult check = runColdtip(folder, "check " + shellQuoted(path));
    INFO(check.err);
    CHECK(check.exit_code == 0);
    const std::string warning =
        "warning: components[0].wall.temperature: 350 K is outside the 4-300 K range of the "
        "property fit of stainless-304";
    const auto first = check.err.find(warning);
    REQUIRE(first != std::string::npos);
    CHECK(check.err.find("stainless-304", first + warning.size()) == std::string::npos);
    CHECK_THAT(check.err, Catch::StartsWith(path + ":12:"));
}

TEST_CASE("legitimate machines pass coldtip check", "[cli][input]")
{
    std::vector<std::string> cases;
    for (const char* folder : {COLDTIP_CASES, COLDTIP_TEST_DATA})
        for (const auto& entry : std::filesystem::recursive_directory_iterator(folder))
            if (entry.path().extension() == ".yaml" &&
                entry.path().filename() != "empty.yaml")
                cases.push_back(entry.path().string());
    REQUIRE(cases.size() >= 14);
    // Invented variants at the edges of the trade: a 4 K stage on lead spheres under
    // supercritical helium at 1 Hz, a small 20 K tube at 100 Hz, a 300 K rig.
    const std::string demo = demoCase();
    TempFolder folder;
    std::string fourKelvin = edited(demo, "charge_pressure: 3.1 MPa", "charge_pressure: 1.6 MPa");
    fourKelvin = edited(fourKelvin, "frequency: 55 Hz", "frequency: 1 Hz");
    fourKelvin = edited(fourKelvin, "{kind: screen, material: stainless-304, mesh: 400 in^-1, "
                                    "wire_diameter: 25 um}",
                        "{kind: spheres, material: lead, sphere_diameter: 0.2 mm}");
    fourKelvin = edited(fourKelvin, "wall: {temperature: 85 K}", "wall: {temperature: 4.2 K}");
    cases.push_back(folder.write("four-kelvin.yaml", fourKelvin));
    std::string small = edited(demo, "frequency: 55 Hz", "frequency: 100 Hz");
    small = edited(small, "wall: {temperature: 85 K}", "wall: {temperature: 20 K}");
    small = edited(small, "length: 60 mm\n    diameter: 24 mm",
                   "length: 30 mm\n    diameter: 4 mm");
    cases.push_back(folder.write("small-20K.yaml", small));
    cases.push_back(folder.write(
        "rig-300K.yaml", edited(demo, "wall: {temperature: 85 K}", "wall: {temperature: 300 K}")));
    for (const std::string& path : cases) {
        INFO(path);
        const ProcessResult check = runColdtip(folder, "check " + shellQuoted(path));
        INFO(check.err);
        CHECK(check.exit_code == 0);
    }
}
