#include "solver/input/Plausibility.hpp"

#include "models/gas/PhaseBoundary.hpp"
#include "models/gas/WorkingGas.hpp"
#include "models/solids/SolidMaterial.hpp"
#include "solver/input/InputError.hpp"

#include <algorithm>
#include <fmt/format.h>
#include <map>

namespace coldtip::input {

namespace {

// Porosities of stacked screens the screen correlations were measured on (Gedeon and Wood,
// NASA CR-198442, 1996: "roughly 0.6-0.8", see models/correlations/WovenScreen.hpp).
constexpr double kScreenPorosityTested[2] = {0.6, 0.8};

// A solid's property fit is held at the end of its range; within this fraction of the end
// (300 K rigs at "27 degC" = 300.15 K) the hold is not worth a warning.
constexpr double kFitRangeSlack = 0.01;

// A temperature given in the case, with the key that gave it.
struct GivenTemperature {
    double value; // [K]
    std::string path;
};

SourceMark markOf(const CaseDescription& c, const std::string& path)
{
    const auto found = c.marks.find(path);
    return found != c.marks.end() ? found->second : SourceMark{c.source_path, 0, 0, path};
}

std::string warning(const CaseDescription& c, const std::string& path, std::string text)
{
    const SourceMark m = markOf(c, path);
    std::string place = m.file;
    if (m.line > 0)
        place += fmt::format(":{}:{}", m.line, m.column);
    return fmt::format("{}: warning: {}: {}", place, path, text);
}

// Every temperature of the case that the gas meets: the charge, the walls, the starts.
std::vector<GivenTemperature> gasTemperatures(const CaseDescription& c)
{
    std::vector<GivenTemperature> t = {
        {c.gas.charge_temperature, "gas.charge_temperature"}};
    if (c.drive.wall)
        t.push_back({c.drive.wall->temperature, "drive.wall.temperature"});
    for (std::size_t i = 0; i < c.components.size(); ++i) {
        const WallSpec& wall = c.components[i].wall;
        const std::string at = fmt::format("components[{}].wall", i);
        if (wall.kind == WallSpec::Kind::Isothermal)
            t.push_back({wall.temperature, at + ".temperature"});
        if (wall.kind == WallSpec::Kind::LumpedBody && wall.initial_temperature > 0.0)
            t.push_back({wall.initial_temperature, at + ".initial_temperature"});
    }
    if (c.initial.cold_temperature > 0.0)
        t.push_back({c.initial.cold_temperature, "initial.cold_temperature"});
    if (c.cooldown.start_temperature > 0.0)
        t.push_back({c.cooldown.start_temperature, "cooldown.start_temperature"});
    return t;
}

void checkPhase(const CaseDescription& c, const std::vector<GivenTemperature>& given,
                std::vector<std::string>& warnings)
{
    const models::PhaseBoundary& phase = models::phaseBoundary(c.gas.species);
    const double p = c.gas.charge_pressure;
    const std::string& gas = c.gas.species;
    const auto fail = [&](const GivenTemperature& t, std::string problem,
                          std::string expected) {
        throw InputError(markOf(c, t.path), std::move(problem), std::move(expected),
                         c.source_text);
    };
    for (const GivenTemperature& t : given) {
        if (t.value < phase.triple_temperature)
            fail(t,
                 fmt::format("{} freezes below its triple point {:g} K, and this is {:g} K; "
                             "coldtip's gas models are ideal gases",
                             gas, phase.triple_temperature, t.value),
                 fmt::format("a temperature above {:g} K for {}, or another working gas",
                             phase.triple_temperature, gas));
        const auto saturation = phase.saturationTemperature(p);
        if (saturation && t.value < *saturation)
            fail(t,
                 fmt::format("{} condenses at the charge pressure {:.4g} MPa below {:.4g} K "
                             "(its saturation temperature, from {}), and this is {:g} K; "
                             "coldtip's gas models are ideal gases",
                             gas, p * 1e-6, *saturation, phase.source, t.value),
                 fmt::format("a temperature above {:.4g} K for {} at {:.4g} MPa, a "
                             "charge_pressure below {:.3g} MPa ({}'s vapour pressure at "
                             "{:g} K), or another working gas",
                             *saturation, gas, p * 1e-6,
                             phase.saturationPressure(t.value) * 1e-6, gas, t.value));
    }
    const auto coldest = std::min_element(
        given.begin(), given.end(),
        [](const GivenTemperature& a, const GivenTemperature& b) { return a.value < b.value; });
    if (coldest != given.end() && coldest->value < phase.critical_temperature)
        warnings.push_back(warning(
            c, coldest->path,
            fmt::format("{:g} K is below {}'s critical temperature {:g} K: at {:.4g} MPa "
                        "the gas departs from the ideal gas coldtip models (real-gas effects "
                        "are left out)",
                        coldest->value, gas, phase.critical_temperature, p * 1e-6)));
}

void checkGasRange(const CaseDescription& c, const std::vector<GivenTemperature>& given,
                   std::vector<std::string>& warnings)
{
    const auto gas = models::makeWorkingGas(c.gas.species);
    for (const GivenTemperature& t : given)
        if (t.value < gas->minTemperature() || t.value > gas->maxTemperature()) {
            warnings.push_back(warning(
                c, t.path,
                fmt::format("{:g} K is outside {}'s transport-property range {:g}-{:g} K; "
                            "the properties are held at the end of the range",
                            t.value, c.gas.species, gas->minTemperature(),
                            gas->maxTemperature())));
            return; // once
        }
}

// Each solid material in use, with the key that names it (its first use).
std::map<std::string, std::string> materialsInUse(const CaseDescription& c)
{
    std::map<std::string, std::string> used;
    const auto use = [&](const std::string& material, std::string path) {
        if (!material.empty())
            used.emplace(material, std::move(path));
    };
    for (std::size_t i = 0; i < c.components.size(); ++i) {
        const ComponentSpec& k = c.components[i];
        const std::string at = fmt::format("components[{}]", i);
        use(k.fill.material, at + ".fill.material");
        if (k.housing)
            use(k.housing->material, at + ".housing.material");
        use(k.wall.material, at + ".wall.material");
        for (std::size_t b = 0; b < k.wall.bodies.size(); ++b) {
            const std::string body = fmt::format("{}.wall.bodies[{}]", at, b);
            use(k.wall.bodies[b].material, body + ".material");
            use(k.wall.bodies[b].link.material, body + ".link.material");
        }
        for (std::size_t l = 0; l < k.wall.loads.size(); ++l)
            use(k.wall.loads[l].material, fmt::format("{}.wall.loads[{}].material", at, l));
    }
    return used;
}

void checkSolidRanges(const CaseDescription& c, std::vector<GivenTemperature> given,
                      std::vector<std::string>& warnings)
{
    for (std::size_t i = 0; i < c.components.size(); ++i)
        for (std::size_t b = 0; b < c.components[i].wall.bodies.size(); ++b)
            if (c.components[i].wall.bodies[b].initial_temperature > 0.0)
                given.push_back({c.components[i].wall.bodies[b].initial_temperature,
                                 fmt::format("components[{}].wall.bodies[{}]."
                                             "initial_temperature",
                                             i, b)});
    for (const auto& [material, path] : materialsInUse(c)) {
        const auto solid = models::makeSolidMaterial(material);
        for (const GivenTemperature& t : given)
            if (t.value < solid->minTemperature() * (1.0 - kFitRangeSlack) ||
                t.value > solid->maxTemperature() * (1.0 + kFitRangeSlack)) {
                warnings.push_back(warning(
                    c, t.path,
                    fmt::format("{:g} K is outside the {:g}-{:g} K range of the property "
                                "fit of {} (used at {}); its properties are held at the "
                                "end of the range",
                                t.value, solid->minTemperature(), solid->maxTemperature(),
                                material, path)));
                break; // once per material
            }
    }
}

void checkScreenPorosity(const CaseDescription& c, std::vector<std::string>& warnings)
{
    for (std::size_t i = 0; i < c.components.size(); ++i) {
        const FillSpec& fill = c.components[i].fill;
        if (fill.kind != FillSpec::Kind::Screen)
            continue;
        if (fill.porosity < kScreenPorosityTested[0] ||
            fill.porosity > kScreenPorosityTested[1])
            warnings.push_back(warning(
                c, fmt::format("components[{}].fill", i),
                fmt::format("screen porosity {:.3g} is outside {:g}-{:g}, the range the "
                            "screen correlations were measured on (Gedeon and Wood 1996)",
                            fill.porosity, kScreenPorosityTested[0],
                            kScreenPorosityTested[1])));
    }
}

} // namespace

std::vector<std::string> checkPlausible(const CaseDescription& c)
{
    std::vector<std::string> warnings;
    const std::vector<GivenTemperature> given = gasTemperatures(c);
    checkPhase(c, given, warnings);
    checkGasRange(c, given, warnings);
    checkSolidRanges(c, given, warnings);
    checkScreenPorosity(c, warnings);
    return warnings;
}

} // namespace coldtip::input
