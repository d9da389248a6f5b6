// The JSON contract of `coldtip linear` and `coldtip compare` (docs/linear-json.md):
// scripts rely on these keys. The physics behind the numbers is checked elsewhere; here a
// PV power from the DFT must agree with the exact cycle integral (common practice: a DFT of
// a smooth periodic signal with 64 samples is exact to the sampling's interpolation error).
#include <catch2/catch.hpp>

#include <nlohmann/json.hpp>

#include "tests/solver/CliSupport.hpp"

using namespace coldtip::testing;

namespace {
const char* kPortKeys[] = {"pressure_amplitude_Pa",     "pressure_phase_deg",
                           "mass_flow_amplitude_kg_s",  "volume_flow_amplitude_m3_s",
                           "flow_phase_deg",            "acoustic_power_W"};

void checkPorts(const nlohmann::json& component)
{
    for (const char* port : {"inlet", "outlet"}) {
        REQUIRE(component.contains(port));
        for (const char* key : kPortKeys) {
            INFO(port << "." << key);
            CHECK(component[port][key].is_number());
        }
    }
}
} // namespace

TEST_CASE("coldtip linear --json prints every component's ports and the summary", "[linear]")
{
    TempFolder tmp;
    const std::string file = COLDTIP_TEST_DATA "/solver/cli-valid.yaml";
    for (const std::string& mode : {std::string(""), std::string(" --lumped")}) {
        INFO("mode" << mode);
        const ProcessResult r = runColdtip(
            tmp, "linear " + shellQuoted(file) + mode + " --json -o " + shellQuoted(tmp.file("l.h5")));
        REQUIRE(r.exit_code == 0);
        const nlohmann::json j = nlohmann::json::parse(r.out);
        for (const char* name : {"drive", "transfer-line", "aftercooler", "regenerator", "cold-end",
                                 "pulse-tube", "warm-end", "inertance", "reservoir", "bypass"}) {
            INFO(name);
            REQUIRE(j["components"].contains(name));
            checkPorts(j["components"][name]);
        }
        for (const char* key : {"gross_cooling_W", "drive_acoustic_power_W", "phase_cold_end_deg",
                                "phase_pulse_tube_warm_end_deg"})
            CHECK(j["summary"][key].is_number());
        if (!mode.empty()) CHECK(j["elements"]["inertance"]["inertance_kg_m4"].get<double>() > 0.0);
        CHECK(std::filesystem::exists(tmp.file("l.h5")));
    }
}

TEST_CASE("coldtip compare --json gives nonlinear, linear and lumped side by side", "[linear]")
{
    TempFolder tmp;
    const std::string file = COLDTIP_TEST_DATA "/linear/isothermal-rig.yaml";
    const ProcessResult r = runColdtip(tmp, "compare " + shellQuoted(file) +
                                                " --amplitudes 0.5,1 --json --quiet -o " +
                                                shellQuoted(tmp.file("c.h5")));
    INFO(r.err);
    REQUIRE(r.exit_code == 0);
    const nlohmann::json j = nlohmann::json::parse(r.out);
    REQUIRE(j["runs"].size() == 2);
    for (const char* name : {"drive", "duct", "store"})
        for (const char* model : {"nonlinear", "linear", "lumped"}) {
            INFO(name << " " << model);
            checkPorts(j["components"][name][model]);
        }
    for (const char* key : {"gross_cooling_W", "pv_power_W", "phase_cold_end_deg",
                            "drive_pressure_amplitude_Pa"}) {
        INFO(key);
        CHECK(j["table"][key]["nonlinear"].is_number());
        CHECK(j["relative_differences"][key]["linear"].is_number());
    }
    CHECK(j["max_p2_over_p1"].is_number());
    CHECK(j["dft_check"]["relative_difference"].get<double>() < 1e-3);
    // At this small amplitude the linear model is the nonlinear one to 1e-3.
    CHECK(std::abs(j["relative_differences"]["drive_pressure_amplitude_Pa"]["linear"].get<double>()) < 1e-3);
}
