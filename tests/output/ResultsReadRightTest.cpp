// Results that read as what they are: a test rig has no cooling figures, a machine that heats
// its cold end has no COP, a double-inlet link is placed at its ports with its cycle means
// reported, the /profile and /linear series run along x, a cooldown without the steady check
// has no steady temperature, and `check` prints the figures an engineer checks by hand.
#include <catch2/catch.hpp>

#include <algorithm>
#include <cmath>
#include <nlohmann/json.hpp>
#include <numeric>
#include <regex>

#include "models/correlations/OrificeFlow.hpp"
#include "solver/input/CaseReader.hpp"
#include "solver/output/CooldownResult.hpp"
#include "solver/output/Hdf5File.hpp"
#include "tests/solver/CliSupport.hpp"

using namespace coldtip;
using namespace coldtip::testing;

namespace {

//! Keys of /summary, from its `units` attribute ("key:unit;key:unit;...").
std::vector<std::string> summaryKeys(const Hdf5Reader& r)
{
    std::vector<std::string> keys;
    const std::string units = r.stringAttribute("/summary", "units");
    std::size_t start = 0;
    while (start < units.size()) {
        const std::size_t colon = units.find(':', start), end = units.find(';', start);
        if (colon == std::string::npos || end == std::string::npos) break;
        keys.push_back(units.substr(start, colon - start));
        start = end + 1;
    }
    return keys;
}

bool contains(const std::vector<std::string>& v, const std::string& s)
{
    return std::find(v.begin(), v.end(), s) != v.end();
}

bool nonDecreasing(const std::vector<double>& x)
{
    return std::is_sorted(x.begin(), x.end());
}

//! Index of the last cell of `component` in /grid/cells (names "component[i]").
std::size_t lastCellOf(const std::vector<std::string>& names, const std::string& component)
{
    std::size_t last = names.size();
    for (std::size_t i = 0; i < names.size(); ++i)
        if (names[i].rfind(component + "[", 0) == 0) last = i;
    REQUIRE(last < names.size());
    return last;
}

const char* kCoolingKeys[] = {"cooling_power_W", "gross_cooling_power_W", "cold_conduction_W",
                              "cold_temperature_K", "applied_load_W", "cop", "carnot_fraction"};

} // namespace

TEST_CASE("A test rig's summary has no cooling figures and says it is a rig", "[output]")
{
    TempFolder tmp;
    const std::string rig = COLDTIP_TEST_DATA "/linear/isothermal-rig.yaml";
    const ProcessResult r = runColdtip(tmp, "run " + shellQuoted(rig) +
                                                " --max-cycles 2 --quiet --json -o " +
                                                shellQuoted(tmp.file("rig.h5")));
    INFO(r.err);
    REQUIRE((r.exit_code == 0 || r.exit_code == 2)); // two cycles: not converged, file written
    const nlohmann::json j = nlohmann::json::parse(r.out);
    CHECK(j["machine"] == "test rig");
    REQUIRE(j.contains("notes"));
    CHECK(j["notes"][0].get<std::string>().find("test rig") != std::string::npos);
    for (const char* key : kCoolingKeys) {
        INFO(key);
        CHECK_FALSE(j.contains(key));
    }
    CHECK(j["pv_power_W"].is_number());

    Hdf5Reader h5(tmp.file("rig.h5"));
    CHECK(h5.stringAttribute("/summary", "machine") == "test rig");
    const std::vector<std::string> keys = summaryKeys(h5);
    CHECK(contains(keys, "pv_power_W"));
    for (const char* key : kCoolingKeys) {
        INFO(key);
        CHECK_FALSE(contains(keys, key));
    }
    // the per-cycle history has no cold temperature to show: NaN, not 0 K
    for (double T : h5.doubles("/history/cold_temperature")) CHECK(std::isnan(T));
}

TEST_CASE("A machine that heats its cold end has no COP or fraction of Carnot", "[output]")
{
    // The small orifice tube of the steady-state tests does not refrigerate at 250 K: its
    // regenerator is short (net cooling about -6.5 W at the steady state, see the case).
    TempFolder tmp;
    const std::string file = COLDTIP_TEST_DATA "/steady/small-orifice-tube.yaml";
    const ProcessResult r = runColdtip(tmp, "run " + shellQuoted(file) +
                                                " --max-cycles 5 --quiet --json -o " +
                                                shellQuoted(tmp.file("hot.h5")));
    INFO(r.err);
    REQUIRE((r.exit_code == 0 || r.exit_code == 2));
    const nlohmann::json j = nlohmann::json::parse(r.out);
    CHECK(j["machine"] == "cooler");
    REQUIRE(j["cooling_power_W"].get<double>() < 0.0);
    CHECK_FALSE(j.contains("cop"));
    CHECK_FALSE(j.contains("carnot_fraction"));
    REQUIRE(j.contains("notes"));
    CHECK(j["notes"][0].get<std::string>().find("heats its cold end") != std::string::npos);
    const std::vector<std::string> keys = summaryKeys(Hdf5Reader(tmp.file("hot.h5")));
    CHECK_FALSE(contains(keys, "cop"));
    CHECK_FALSE(contains(keys, "carnot_fraction"));
}

TEST_CASE("A double-inlet link sits at its ports and its cycle means are in the summary",
          "[output]")
{
    TempFolder tmp;
    const std::string file = COLDTIP_TEST_DATA "/solver/cli-valid.yaml";
    const std::string h5path = tmp.file("di.h5");
    const ProcessResult r = runColdtip(
        tmp, "run " + shellQuoted(file) + " --max-cycles 2 --quiet --json -o " + shellQuoted(h5path));
    INFO(r.err);
    REQUIRE((r.exit_code == 0 || r.exit_code == 2));
    const nlohmann::json j = nlohmann::json::parse(r.out);
    REQUIRE(j.contains("links"));
    const nlohmann::json& link = j["links"]["bypass"];
    CHECK(link["from"] == "aftercooler.outlet");
    CHECK(link["to"] == "warm-end.outlet");
    REQUIRE(link["mean_mass_flow_kg_s"].is_number());
    REQUIRE(link["enthalpy_flow_W"].is_number());

    Hdf5Reader h5(h5path);
    // /grid/components: the link from the aftercooler's last cell to the warm end's last cell
    const std::vector<std::string> comps = h5.strings("/grid/components/name");
    const std::size_t k = std::find(comps.begin(), comps.end(), "bypass") - comps.begin();
    REQUIRE(k < comps.size());
    CHECK(h5.strings("/grid/components/kind")[k] == "valve");
    const std::vector<std::string> cells = h5.strings("/grid/cells/name");
    const std::vector<double> xc = h5.doubles("/grid/cells/x");
    const std::size_t a = lastCellOf(cells, "aftercooler"), b = lastCellOf(cells, "warm-end");
    CHECK(h5.doubles("/grid/components/x_start")[k] == xc[a]);
    CHECK(h5.doubles("/grid/components/x_end")[k] == xc[b]);
    CHECK(link["x_from_m"].get<double>() == xc[a]);
    CHECK(link["x_to_m"].get<double>() == xc[b]);

    // The DC mass flow against the orifice law (isentropic nozzle with the case's C_d and
    // diameter, models/correlations/OrificeFlow.hpp) applied here to the stored samples of the
    // two cells: the right cells, the right sign, the right area.
    const CaseDescription d = input::readCaseFile(file);
    REQUIRE(d.links.size() == 1);
    const double area = d.links[0].discharge_coefficient * 0.25 * M_PI *
                        d.links[0].orifice_diameter * d.links[0].orifice_diameter;
    const std::vector<double> p = h5.doubles("/cycle/pressure"), T = h5.doubles("/cycle/gas_temperature");
    const std::size_t nc = cells.size(), n = p.size() / nc;
    const double R = 8.314462618 / 4.002602e-3, gamma = 5.0 / 3.0; // helium, ideal gas
    double mean = 0.0;
    for (std::size_t s = 0; s < n; ++s)
        mean += models::orificeMassFlow(p[s * nc + a], T[s * nc + a], p[s * nc + b],
                                        T[s * nc + b], area, R, gamma)
                    .mdot / n;
    // p and T are stored in full double precision; R and gamma agree with the solver's to
    // 1e-6 or better
    CHECK(link["mean_mass_flow_kg_s"].get<double>() == Approx(mean).epsilon(1e-5).margin(1e-12));

    // The same numbers in the result file, and the link kept out of the path's curve.
    CHECK(h5.doubleAttribute("/summary", "link.bypass.mean_mass_flow_kg_s") ==
          link["mean_mass_flow_kg_s"].get<double>());
    CHECK(h5.doubleAttribute("/summary", "link.bypass.enthalpy_flow_W") ==
          link["enthalpy_flow_W"].get<double>());
    CHECK(h5.strings("/profile/links/name") == std::vector<std::string>{"bypass"});
    CHECK(h5.doubles("/profile/links/enthalpy_flow")[0] == link["enthalpy_flow_W"].get<double>());
    for (const std::string& name : h5.strings("/profile/enthalpy_flow/name"))
        CHECK(name.rfind("bypass", 0) != 0);
}

TEST_CASE("/profile and /linear series are ordered by x, with their rows in /grid", "[output]")
{
    TempFolder tmp;
    const std::string file = COLDTIP_TEST_DATA "/solver/cli-valid.yaml";
    const ProcessResult run = runColdtip(
        tmp, "run " + shellQuoted(file) + " --max-cycles 1 --quiet -o " + shellQuoted(tmp.file("r.h5")));
    REQUIRE((run.exit_code == 0 || run.exit_code == 2));
    Hdf5Reader h5(tmp.file("r.h5"));
    for (const char* series : {"enthalpy_flow", "gas_conduction", "wall_heat", "cells", "faces",
                               "solids"}) {
        INFO(series);
        CHECK(nonDecreasing(h5.doubles(std::string("/profile/") + series + "/x")));
    }
    for (const char* node : {"cells", "faces", "solids"}) {
        INFO(node);
        const std::vector<double> x = h5.doubles(std::string("/profile/") + node + "/x");
        const std::vector<double> grid = h5.doubles(std::string("/grid/") + node + "/x");
        std::vector<double> index = h5.doubles(std::string("/profile/") + node + "/index");
        REQUIRE(index.size() == grid.size());
        for (std::size_t i = 0; i < index.size(); ++i) CHECK(grid[static_cast<std::size_t>(index[i])] == x[i]);
        std::sort(index.begin(), index.end());
        for (std::size_t i = 0; i < index.size(); ++i) CHECK(index[i] == static_cast<double>(i));
    }
    // The grid's faces are not in x order (a junction face is added after its component's own
    // faces), which is why the profile is sorted.
    CHECK_FALSE(nonDecreasing(h5.doubles("/grid/faces/x")));

    const ProcessResult lin =
        runColdtip(tmp, "linear " + shellQuoted(file) + " -o " + shellQuoted(tmp.file("l.h5")));
    REQUIRE(lin.exit_code == 0);
    Hdf5Reader l5(tmp.file("l.h5"));
    CHECK(nonDecreasing(l5.doubles("/linear/cells/x")));
    CHECK(nonDecreasing(l5.doubles("/linear/faces/x")));
    CHECK(l5.doubles("/linear/faces/index").size() == l5.doubles("/linear/faces/x").size());
}

TEST_CASE("A cooldown's summary has a steady cold temperature only when it was checked",
          "[output]")
{
    CooldownOutcome out;
    out.steady_checked = false;
    out.steady_cold_temperature = 0.0;
    auto has = [](const std::vector<SummaryValue>& v, const std::string& key) {
        return std::any_of(v.begin(), v.end(), [&](const SummaryValue& s) { return s.key == key; });
    };
    std::vector<SummaryValue> v = cooldownValues(out);
    CHECK_FALSE(has(v, "steady_cold_temperature_K"));
    CHECK_FALSE(has(v, "steady_difference_K"));
    // no history: no final values either (absent, not 0 K)
    CHECK_FALSE(has(v, "final_cold_temperature_K"));
    out.steady_checked = true;
    out.steady_cold_temperature = 85.7;
    v = cooldownValues(out);
    REQUIRE(has(v, "steady_cold_temperature_K"));
    for (const SummaryValue& s : v)
        if (s.key == "steady_cold_temperature_K") CHECK(s.value == 85.7);
}

TEST_CASE("check prints the demo's porosity, hydraulic diameter and swept volume", "[output]")
{
    TempFolder tmp;
    const std::string demo = COLDTIP_CASES "/ge-spectrometer-85K.yaml";
    const ProcessResult r = runColdtip(tmp, "check " + shellQuoted(demo));
    INFO(r.out << r.err);
    REQUIRE(r.exit_code == 0);
    // Hand calculation (common practice for plain square-woven screens): porosity
    // 1 - pi m d / 4 with m = 400 / 25.4 mm, d = 25 um: 0.69079; hydraulic diameter
    // d phi / (1 - phi) = 55.85 um; gas volume phi pi/4 (24 mm)^2 60 mm = 18.750 cm^3;
    // wetted area 4 V / d_h = 13429 cm^2.
    const double m = 400.0 / 0.0254, dw = 25e-6;
    const double phi = 1.0 - M_PI * m * dw / 4.0, dh = dw * phi / (1.0 - phi);
    const double V = phi * 0.25 * M_PI * 0.024 * 0.024 * 0.060;
    // the hand-check table follows the network table
    const std::size_t table = r.out.find("void [cm3]");
    REQUIRE(table != std::string::npos);
    const std::string figures = r.out.substr(table);
    std::smatch row;
    REQUIRE(std::regex_search(figures, row,
                              std::regex(R"(\nregenerator\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+)\s+(\S+))")));
    CHECK(std::stod(row[1]) == Approx(1e6 * V).epsilon(1e-3));
    CHECK(std::stod(row[2]) == Approx(phi).epsilon(1e-4));
    CHECK(std::stod(row[3]) == Approx(1e3 * dh).epsilon(1e-3));
    CHECK(std::stod(row[4]) == Approx(1e4 * 4.0 * V / dh).epsilon(1e-3));
    // Swept volume 2 A X: bore 22 mm, amplitude 5.5 mm: 4.181 cm^3.
    std::smatch swept;
    REQUIRE(std::regex_search(r.out, swept, std::regex(R"(swept volume 2 A X = (\S+) cm3)")));
    CHECK(std::stod(swept[1]) == Approx(2.0 * 0.25 * M_PI * 0.022 * 0.022 * 5.5e-3 * 1e6).epsilon(1e-3));
    // The pulse tube's r0 / delta_nu: r0 = 5.5 mm; delta_nu = sqrt(2 nu / omega) at 3.1 MPa and
    // the tube's mean initial temperature (85 + 300) / 2 = 192.5 K, helium viscosity there
    // about 15.1 uPa s (from memory of Hurly & Moldover 2000's values: 19.9 uPa s at 300 K,
    // T^0.68 below), rho = p / (R T) = 7.754 kg/m^3: delta_nu = 0.106 mm, r0/delta_nu = 52.
    std::smatch tube;
    REQUIRE(std::regex_search(figures, tube,
                              std::regex(R"(\npulse-tube\s+\S+\s+\S+\s+\S+\s+\S+\s+(\S+)\s+(\S+))")));
    CHECK(std::stod(tube[1]) == Approx(192.5).epsilon(1e-3));
    CHECK(std::stod(tube[2]) == Approx(52.0).epsilon(0.05));
    // The demo's grid is fine enough: no warning.
    CHECK(r.out.find("warning") == std::string::npos);
}

TEST_CASE("check warns about a regenerator grid too coarse for the cooling power", "[output]")
{
    TempFolder tmp;
    std::string text = readText(COLDTIP_CASES "/ge-spectrometer-85K.yaml");
    const std::string from = "diameter: 24 mm\n    cells: 80";
    const std::size_t at = text.find(from);
    REQUIRE(at != std::string::npos);
    text.replace(at, from.size(), "diameter: 24 mm\n    cells: 10");
    const std::string coarse = tmp.write("coarse.yaml", text);
    const ProcessResult r = runColdtip(tmp, "check " + shellQuoted(coarse));
    INFO(r.out << r.err);
    REQUIRE(r.exit_code == 0);
    // 300 K - 85 K = 215 K over 10 cells: 21.5 K per cell, against at most 4 K per cell
    CHECK(r.out.find("warning: regenerator spans 215 K over 10 cells (21.5 K per cell)") !=
          std::string::npos);
    CHECK(r.out.find("at least 54 cells") != std::string::npos);
}
