// A valid case file read into SI: tests/data/input/valid.yaml and edits of it.

#include "solver/input/CaseReader.hpp"

#include <catch2/catch.hpp>
#include <fstream>
#include <sstream>
#include <string>

using namespace coldtip;
using coldtip::input::parseCaseText;
using coldtip::input::readCaseFile;

namespace {

const std::string kValidPath = COLDTIP_TEST_DATA "/input/valid.yaml";

std::string validText()
{
    std::ifstream in(kValidPath, std::ios::binary);
    std::ostringstream text;
    text << in.rdbuf();
    return text.str();
}

// valid.yaml with its one occurrence of `from` replaced by `to`.
std::string validWith(const std::string& from, const std::string& to)
{
    std::string text = validText();
    const auto at = text.find(from);
    REQUIRE(at != std::string::npos);
    return text.replace(at, from.size(), to);
}

} // namespace

TEST_CASE("a valid case file is read into SI units", "[input]")
{
    const CaseDescription c = readCaseFile(kValidPath);

    CHECK(c.name == "spectrometer-cooler-85K");
    CHECK(c.description ==
          "inline inertance pulse tube, helium, double inlet, 85 K cold end");
    CHECK(c.source_path == kValidPath);
    CHECK(c.source_text == validText());

    CHECK(c.gas.species == "helium");
    CHECK(c.gas.charge_pressure == Approx(3.0e6));
    // 27 degC = 300.15 K: T/K = t/degC + 273.15 (BIPM, The International System of Units,
    // 9th edition, 2019, section 2.3.1).
    CHECK(c.gas.charge_temperature == Approx(300.15).epsilon(1e-12));
    CHECK(c.gas.mark.line == 6);
    CHECK(c.gas.mark.column == 6);
    CHECK(c.gas.mark.path == "gas");
    CHECK(c.frequency == Approx(55.0));

    CHECK(c.drive.kind == "piston");
    CHECK(c.drive.bore == Approx(0.024));
    CHECK(c.drive.amplitude == Approx(4.2e-3));
    CHECK(c.drive.dead_volume == Approx(1.8e-6));
    REQUIRE(c.drive.wall);
    CHECK(c.drive.wall->temperature == Approx(300.0));
    CHECK(c.drive.wall->heat_transfer_coefficient == Approx(50.0));
    CHECK(c.drive.mark.line == 9);

    REQUIRE(c.components.size() == 8);
    const ComponentSpec& line = c.components[0];
    CHECK(line.name == "transfer-line");
    CHECK(line.kind == ComponentSpec::Kind::Duct);
    CHECK(line.length == Approx(0.120));
    CHECK(line.diameter == Approx(3.5e-3));
    CHECK(line.cells == 3); // ceil(120 mm / 40 mm), exactly 3 despite rounding
    CHECK(line.roughness == 0.0);
    CHECK(line.wall.kind == WallSpec::Kind::Adiabatic);
    CHECK(line.mark.line == 15);
    CHECK(line.mark.column == 5);
    CHECK(line.mark.path == "components[0]");

    const ComponentSpec& aftercooler = c.components[1];
    CHECK(aftercooler.kind == ComponentSpec::Kind::HeatExchanger);
    CHECK(aftercooler.role == "reject");
    CHECK(aftercooler.cells == 2);
    CHECK(aftercooler.fill.kind == FillSpec::Kind::Slots);
    CHECK(aftercooler.fill.porosity == Approx(0.42));
    CHECK(aftercooler.fill.hydraulic_diameter == Approx(0.5e-3));
    CHECK(aftercooler.fill.material == "copper");
    CHECK(aftercooler.wall.kind == WallSpec::Kind::Isothermal);
    CHECK(aftercooler.wall.temperature == Approx(300.0));
    CHECK(aftercooler.mark.line == 16);
    CHECK(aftercooler.wall.mark.line == 22);
    CHECK(aftercooler.wall.mark.path == "components[1].wall");

    const ComponentSpec& regenerator = c.components[2];
    CHECK(regenerator.kind == ComponentSpec::Kind::Regenerator);
    CHECK(regenerator.cells == 40);
    CHECK(regenerator.fill.kind == FillSpec::Kind::Screen);
    CHECK(regenerator.fill.material == "stainless-304");
    // 400 per inch with 1 in = 0.0254 m exactly (NIST SP 811, 2008, appendix B.8).
    CHECK(regenerator.fill.mesh == Approx(15748.03).epsilon(1e-7));
    CHECK(regenerator.fill.wire_diameter == Approx(25.4e-6));
    // 400 mesh, 25.4 um wire: porosity 0.686 (Kays & London, "Compact Heat Exchangers",
    // 1964, via the reference sheet physics.md table 3.1).
    CHECK(regenerator.fill.porosity == Approx(0.686).epsilon(1e-3));
    CHECK(regenerator.fill.conduction_degradation == Approx(0.1));
    CHECK(regenerator.fill.mark.line == 28);
    CHECK(regenerator.fill.mark.column == 11);
    CHECK(regenerator.fill.mark.path == "components[2].fill");
    REQUIRE(regenerator.housing);
    CHECK(regenerator.housing->material == "stainless-304");
    CHECK(regenerator.housing->thickness == Approx(0.35e-3));

    const ComponentSpec& coldEnd = c.components[3];
    CHECK(coldEnd.role == "cold");
    CHECK(coldEnd.wall.kind == WallSpec::Kind::Isothermal);
    CHECK(coldEnd.wall.temperature == Approx(85.0));
    CHECK(coldEnd.fill.material.empty());

    const ComponentSpec& tube = c.components[4];
    CHECK(tube.kind == ComponentSpec::Kind::Tube);
    CHECK(tube.cells == 40);
    CHECK(tube.wall.kind == WallSpec::Kind::Conducting);
    CHECK(tube.wall.material == "stainless-304");
    CHECK(tube.wall.thickness == Approx(0.2e-3));

    const ComponentSpec& inertance = c.components[6];
    CHECK(inertance.length == Approx(1.5));
    CHECK(inertance.cells == 38); // ceil(1.5 m / 40 mm) = ceil(37.5)
    CHECK(inertance.roughness == Approx(30e-6));

    const ComponentSpec& reservoir = c.components[7];
    CHECK(reservoir.kind == ComponentSpec::Kind::Volume);
    CHECK(reservoir.volume == Approx(2.5e-4));

    REQUIRE(c.links.size() == 1);
    const LinkSpec& bypass = c.links[0];
    CHECK(bypass.name == "bypass");
    CHECK(bypass.kind == "valve");
    CHECK(bypass.from.component == "aftercooler");
    CHECK(bypass.from.outlet);
    CHECK(bypass.to.component == "warm-end");
    CHECK(bypass.to.outlet);
    CHECK(bypass.orifice_diameter == Approx(0.25e-3));
    CHECK(bypass.discharge_coefficient == Approx(0.61));
    CHECK(bypass.mark.line == 53);

    CHECK(c.solver.relative_tolerance == Approx(1e-7));
    CHECK(c.solver.absolute_tolerance_scale == Approx(1.0));
    CHECK(c.solver.max_order == 2);
    CHECK(c.solver.max_steps_per_cycle == 100000);
    CHECK(c.solver.steady.method == "accelerated");
    CHECK(c.solver.steady.heat_residual == Approx(1e-3));
    CHECK(c.solver.steady.energy_residual == Approx(2e-3));
    CHECK(c.solver.steady.max_cycles == 5000);
    CHECK(c.solver.steady.min_cycles == 5);
    CHECK(c.output.samples_per_cycle == 128);
    CHECK(c.initial.cold_temperature == Approx(300.0));

    // Every value given in the file has its place, for errors found after reading.
    const SourceMark& wire = c.marks.at("components[2].fill.wire_diameter");
    CHECK(wire.line == 28);
    CHECK(wire.column == 83);
    CHECK(c.marks.at("links[0].between[1]").column == 35);
    CHECK(c.marks.at("solver.steady.max_cycles").line == 59);
}

TEST_CASE("absent optional sections take their defaults", "[input]")
{
    std::string text = validWith("solver:\n  relative_tolerance: 1e-7\n"
                                 "  steady: {method: accelerated, heat_residual: 1e-3, "
                                 "max_cycles: 5000}\noutput: {samples_per_cycle: 128}\n"
                                 "initial: {cold_temperature: 300 K}\n",
                                 "");
    const CaseDescription c = parseCaseText(text, "defaults.yaml");
    CHECK(c.solver.relative_tolerance == Approx(1e-6));
    CHECK(c.solver.steady.method == "accelerated");
    CHECK(c.solver.steady.max_cycles == 20000);
    CHECK(c.solver.steady.min_cycles == 5);
    CHECK(c.output.samples_per_cycle == 96);
    CHECK(c.initial.cold_temperature == 0.0);
    CHECK(c.source_path == "defaults.yaml");
}

TEST_CASE("the other wall, fill and component forms", "[input]")
{
    SECTION("a lumped cold body under a load")
    {
        const CaseDescription c =
            parseCaseText(validWith("wall: {temperature: 85 K}",
                                    "wall: {material: copper, mass: 0.3 kg, load: 2 W, "
                                    "initial_temperature: 27 degC}"),
                          "lumped.yaml");
        const WallSpec& wall = c.components[3].wall;
        CHECK(wall.kind == WallSpec::Kind::LumpedBody);
        CHECK(wall.material == "copper");
        CHECK(wall.mass == Approx(0.3));
        CHECK(wall.load == Approx(2.0));
        CHECK(wall.initial_temperature == Approx(300.15));
    }
    SECTION("a packed bed of spheres takes its default porosity and degradation")
    {
        const CaseDescription c = parseCaseText(
            validWith("fill: {kind: screen, material: stainless-304, mesh: 400 in^-1, "
                      "wire_diameter: 25.4 um}",
                      "fill: {kind: spheres, material: lead, sphere_diameter: 0.2 mm}"),
            "spheres.yaml");
        const FillSpec& fill = c.components[2].fill;
        CHECK(fill.kind == FillSpec::Kind::Spheres);
        CHECK(fill.sphere_diameter == Approx(2e-4));
        CHECK(fill.porosity == Approx(0.38));
        CHECK(fill.conduction_degradation == Approx(0.02));
    }
    SECTION("a screen porosity given overrides the computed one")
    {
        const CaseDescription c =
            parseCaseText(validWith("wire_diameter: 25.4 um}",
                                    "wire_diameter: 25.4 um, porosity: 0.7}"),
                          "screen.yaml");
        CHECK(c.components[2].fill.porosity == Approx(0.7));
    }
    SECTION("an orifice and an isothermal duct; links may be absent")
    {
        std::string text =
            validWith("  - {name: reservoir, kind: volume, volume: 250 cm^3}",
                      "  - {name: restriction, kind: orifice, orifice_diameter: 0.8 mm}\n"
                      "  - {name: reservoir, kind: duct, length: 10 mm, diameter: 20 mm, "
                      "wall: {temperature: 300 K}}");
        text = text.substr(0, text.find("links:")) + text.substr(text.find("solver:"));
        const CaseDescription c = parseCaseText(text, "orifice.yaml");
        REQUIRE(c.components.size() == 9);
        CHECK(c.components[7].kind == ComponentSpec::Kind::Orifice);
        CHECK(c.components[7].orifice_diameter == Approx(0.8e-3));
        CHECK(c.components[7].discharge_coefficient == Approx(0.61));
        CHECK(c.components[8].cells == 1); // a duct shorter than 40 mm keeps one cell
        CHECK(c.components[8].wall.kind == WallSpec::Kind::Isothermal);
        CHECK(c.links.empty());
    }
    SECTION("a whole number written as a real is an integer")
    {
        const CaseDescription c = parseCaseText(
            validWith("max_cycles: 5000}", "max_cycles: 2e4}"), "real.yaml");
        CHECK(c.solver.steady.max_cycles == 20000);
    }
    SECTION("an empty component list is refused: a drive alone is no machine")
    {
        std::string text = validText();
        text = text.substr(0, text.find("components:")) + "components: []\n" +
               text.substr(text.find("solver:"));
        CHECK_THROWS_WITH(parseCaseText(text, "empty-path.yaml"),
                          Catch::StartsWith("empty-path.yaml:14:13: error: components: no "
                                            "components: a drive alone is not a machine"));
    }
}
