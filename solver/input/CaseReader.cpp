#include "solver/input/CaseReader.hpp"

#include "models/correlations/PackedSpheres.hpp"
#include "models/correlations/WovenScreen.hpp"
#include "solver/input/ClosestName.hpp"
#include "solver/input/MapReader.hpp"
#include "solver/input/Plausibility.hpp"

#include <algorithm>
#include <cctype>
#include <cerrno>
#include <cmath>
#include <cstring>
#include <filesystem>
#include <fmt/format.h>
#include <fstream>
#include <iostream>
#include <sstream>
#include <stdexcept>

namespace coldtip::input {

namespace {

using Kind = ComponentSpec::Kind;
using FillKind = FillSpec::Kind;
using Unknown = MapReader::UnknownKeys;

// Ducts get one cell per this length unless `cells` is given [m] (keep in step with the
// rule in KeyTable.cpp).
constexpr double kDuctCellLength = 0.040;

// A `kind` name in the file, the enum it selects and the table of its keys.
template <typename K> struct KindRow {
    const char* name;
    K kind;
    Table table;
};
constexpr KindRow<Kind> kComponentKinds[] = {
    {"duct", Kind::Duct, Table::Duct},
    {"heat-exchanger", Kind::HeatExchanger, Table::HeatExchanger},
    {"regenerator", Kind::Regenerator, Table::Regenerator},
    {"tube", Kind::Tube, Table::Tube},
    {"volume", Kind::Volume, Table::Volume},
    {"orifice", Kind::Orifice, Table::Orifice},
};
constexpr KindRow<ColdLoadSpec::Kind> kLoadKinds[] = {
    {"constant", ColdLoadSpec::Kind::Constant, Table::LoadConstant},
    {"schedule", ColdLoadSpec::Kind::Schedule, Table::LoadSchedule},
    {"table", ColdLoadSpec::Kind::Table, Table::LoadTable},
    {"radiation", ColdLoadSpec::Kind::Radiation, Table::LoadRadiation},
    {"support", ColdLoadSpec::Kind::Support, Table::LoadSupport},
};
constexpr KindRow<FillKind> kFillKinds[] = {
    {"slots", FillKind::Slots, Table::FillSlots},
    {"screen", FillKind::Screen, Table::FillScreen},
    {"spheres", FillKind::Spheres, Table::FillSpheres},
};

// The row of a name that MapReader::choice has already checked against the key table.
template <typename K, std::size_t N>
const KindRow<K>& rowNamed(const KindRow<K> (&rows)[N], std::string_view name)
{
    const auto row = std::find_if(std::begin(rows), std::end(rows),
                                  [&](const KindRow<K>& r) { return name == r.name; });
    if (row == std::end(rows))
        throw std::logic_error(
            fmt::format("kind '{}' is declared but not handled", name));
    return *row;
}

// Names of components and links share one namespace: links and reports refer to them.
class NameBook {
public:
    std::string claim(const MapReader& map)
    {
        const std::string name = map.text("name");
        const auto bad = std::find_if(name.begin(), name.end(), [](char c) {
            return c == '.' || std::isspace(static_cast<unsigned char>(c)) ||
                   std::iscntrl(static_cast<unsigned char>(c));
        });
        if (name.empty() || bad != name.end())
            map.fail("name",
                     name.empty() ? std::string("the name is empty")
                                  : fmt::format("name '{}' contains {}", name,
                                                *bad == '.' ? "'.'" : "whitespace"),
                     "a name without '.' or whitespace, e.g. cold-end");
        const auto first = std::find_if(m_names.begin(), m_names.end(),
                                        [&](const auto& n) { return n.first == name; });
        if (first != m_names.end())
            map.fail("name",
                     fmt::format("duplicate name '{}' (first used by {} at line {})",
                                 name, first->second.path, first->second.line),
                     "a name unique across components and links");
        m_names.emplace_back(name, map.mark());
        return name;
    }

private:
    std::vector<std::pair<std::string, SourceMark>> m_names;
};

GasSpec readGas(const MapReader& m)
{
    GasSpec gas;
    gas.species = m.choice("species");
    gas.charge_pressure = m.quantity("charge_pressure");
    gas.charge_temperature = m.quantity("charge_temperature");
    gas.mark = m.mark();
    return gas;
}

DriveSpec readDrive(const MapReader& m)
{
    DriveSpec drive;
    drive.kind = m.choice("kind");
    drive.bore = m.quantity("bore");
    drive.amplitude = m.quantity("amplitude");
    drive.dead_volume = m.quantity("dead_volume");
    if (m.has("wall")) {
        const MapReader wall = m.map("wall");
        drive.wall = FilmWallSpec{wall.quantity("temperature"),
                                  wall.quantity("heat_transfer_coefficient")};
    }
    drive.mark = m.mark();
    return drive;
}

// The passage keys that ducts, heat exchangers, regenerators and tubes share.
void readPassage(const MapReader& m, ComponentSpec& c)
{
    c.length = m.quantity("length");
    c.diameter = m.quantity("diameter");
    if (const auto cells = m.optionalInteger("cells")) {
        c.cells = *cells;
        return;
    }
    // A small tolerance so that 120 mm in 40 mm cells is 3, not 4.
    const double cells = std::ceil(c.length / kDuctCellLength - 1e-9);
    if (cells > 1e6)
        m.fail(
            "length",
            fmt::format("{} would need {:g} cells of 40 mm", m.written("length"), cells),
            "a length below 40 km, or cells given");
    c.cells = std::max(1, static_cast<int>(cells));
}

// A fill's hydraulic diameter must fit in its passage: a larger one is a slip of unit
// (hydraulic_diameter 50 mm in a 24 mm exchanger) that the correlations would take at face
// value. `key` is the key that set it; `derived` says how, if it was not given.
void checkFitsPassage(const MapReader& m, std::string_view key, double hydraulic_diameter,
                      double diameter, const std::string& derived)
{
    if (hydraulic_diameter < diameter)
        return;
    m.fail(key,
           fmt::format("the hydraulic diameter {}{:.4g} mm is not smaller than the passage's "
                       "diameter {:.4g} mm",
                       derived, hydraulic_diameter * 1e3, diameter * 1e3),
           "a fill whose pores are smaller than the passage (check the units)");
}

FillSpec readFill(const MapReader& component, const KindRow<Kind>& owner, double diameter)
{
    const MapReader selector = component.map("fill", {Table::Fill}, Unknown::Allow);
    const std::string kindName = selector.choice("kind");
    const KindRow<FillKind>& row = rowNamed(kFillKinds, kindName);
    const std::vector<Table>& allowed = component.entry("fill").tables;
    const auto suits = [&](Table t) {
        return std::find(allowed.begin(), allowed.end(), t) != allowed.end();
    };
    if (!suits(row.table)) {
        std::vector<std::string> names;
        for (const KindRow<FillKind>& r : kFillKinds)
            if (suits(r.table))
                names.emplace_back(r.name);
        selector.fail(
            "kind",
            fmt::format("a {} cannot hold a fill of kind '{}'", owner.name, kindName),
            "one of: " + joinWords(names));
    }
    const MapReader m = component.map("fill", {Table::Fill, row.table});
    FillSpec fill;
    fill.kind = row.kind;
    fill.mark = m.mark();
    if (owner.kind == Kind::Regenerator)
        m.require("material", " (a regenerator's matrix needs its material)");
    fill.material = m.optionalChoice("material").value_or("");
    switch (row.kind) {
    case FillKind::Slots:
        fill.porosity = m.quantity("porosity");
        fill.hydraulic_diameter = m.quantity("hydraulic_diameter");
        checkFitsPassage(m, "hydraulic_diameter", fill.hydraulic_diameter, diameter, "");
        break;
    case FillKind::Screen: {
        fill.mesh = m.quantity("mesh");
        fill.wire_diameter = m.quantity("wire_diameter");
        fill.conduction_degradation = m.quantity("conduction_degradation");
        const auto given = m.optionalQuantity("porosity");
        fill.porosity = given.value_or(
            models::WovenScreen::geometricPorosity(fill.mesh, fill.wire_diameter));
        const Range& range = m.entry("porosity").range;
        if (!given && !range.contains(fill.porosity))
            m.fail("mesh",
                   fmt::format("mesh {} with wire_diameter {} gives porosity "
                               "1 - pi mesh wire_diameter / 4 = {:.3g}, not {}",
                               m.written("mesh"), m.written("wire_diameter"),
                               fill.porosity, range.describe("", false)),
                   "a finer wire or a coarser mesh, pi mesh wire_diameter / 4 < 1 "
                   "(e.g. 400 in^-1 with 25 um)");
        if (!given && fill.porosity > kMaxScreenPorosity)
            m.fail("mesh",
                   fmt::format("mesh {} with wire_diameter {} gives porosity "
                               "1 - pi mesh wire_diameter / 4 = {:.3g}, above {:g}: no "
                               "woven screen is that open",
                               m.written("mesh"), m.written("wire_diameter"),
                               fill.porosity, kMaxScreenPorosity),
                   "a mesh in wires per inch, e.g. \"400 in^-1\", and a wire diameter "
                   "in its unit, e.g. \"25 um\" (stacked screens: porosity 0.6-0.8)");
        checkFitsPassage(
            m, "wire_diameter",
            models::WovenScreen(fill.mesh, fill.wire_diameter, fill.porosity)
                .hydraulicDiameter(),
            diameter,
            fmt::format("porosity wire_diameter / (1 - porosity) = {:.3g} x {} / {:.3g} = ",
                        fill.porosity, m.written("wire_diameter"), 1.0 - fill.porosity));
        break;
    }
    case FillKind::Spheres:
        fill.sphere_diameter = m.quantity("sphere_diameter");
        fill.porosity = m.quantity("porosity");
        fill.conduction_degradation = m.quantity("conduction_degradation");
        checkFitsPassage(
            m, "sphere_diameter",
            models::PackedSpheres(fill.sphere_diameter, fill.porosity).hydraulicDiameter(),
            diameter,
            fmt::format("2 porosity sphere_diameter / (3 (1 - porosity)) of {} spheres = ",
                        m.written("sphere_diameter")));
        break;
    case FillKind::Open: break;
    }
    return fill;
}

// The value of `key` in `m`, if given, must name a body of the cold head (`known`, the
// exchanger first).
std::string bodyName(const MapReader& m, std::string_view key,
                     const std::vector<std::string>& known)
{
    const std::string name = m.optionalText(key).value_or("");
    if (name.empty() || std::find(known.begin(), known.end(), name) != known.end())
        return name;
    m.fail(key,
           fmt::format("no body of this cold head is named '{}'{}", name,
                       didYouMean(name, known)),
           "one of: " + joinWords(known));
}

// A conductive link: a conductance, or a strap of material, length and area; not both.
ThermalLinkSpec readLink(const MapReader& body, const std::string& self,
                         const std::vector<std::string>& known)
{
    const MapReader m = body.map("link");
    ThermalLinkSpec link;
    link.mark = m.mark();
    link.to = bodyName(m, "to", known);
    if (link.to == self)
        m.fail("to", fmt::format("body '{}' is linked to itself", self),
               "another body or the exchanger");
    const std::string strapForm = "either {conductance} or {material, length, area}";
    if (m.has("conductance")) {
        for (const char* key : {"material", "length", "area"})
            if (m.has(key))
                m.fail(key,
                       fmt::format("'{}' is a key of a strap, but 'conductance' (line {}) "
                                   "makes the link a joint",
                                   key, m.markOf("conductance").line),
                       strapForm);
        link.conductance = m.quantity("conductance");
        return link;
    }
    if (!m.has("material") && !m.has("length") && !m.has("area"))
        m.failHere("the link has neither a conductance nor a strap", strapForm);
    for (const char* key : {"material", "length", "area"})
        m.require(key, " (a strap needs its material, length and area)");
    link.material = m.choice("material");
    link.length = m.quantity("length");
    link.area = m.quantity("area");
    return link;
}

ColdBodySpec readBody(const Element& element, const ReadContext& context, NameBook& names,
                      const std::vector<std::string>& known)
{
    const MapReader m(element.node, element.mark, context, {Table::ColdBody});
    ColdBodySpec b;
    b.name = names.claim(m);
    b.mark = m.mark();
    b.material = m.choice("material");
    b.mass = m.quantity("mass");
    b.initial_temperature = m.optionalQuantity("initial_temperature").value_or(0.0);
    b.link = readLink(m, b.name, known);
    return b;
}

// Points of a table load: `x` strictly increasing, as many powers as points.
void checkTable(const MapReader& m, std::string_view key, const std::vector<double>& x,
                const std::vector<double>& powers)
{
    if (x.empty())
        m.fail(key, "the table is empty", "a list of at least one value");
    if (powers.size() != x.size())
        m.fail("powers",
               fmt::format("{} powers for {} {}", powers.size(), x.size(), key),
               fmt::format("one power per entry of {}", key));
    for (std::size_t i = 1; i < x.size(); ++i)
        if (!(x[i] > x[i - 1]))
            m.fail(key, fmt::format("entry {} is not above entry {}", i, i - 1),
                   fmt::format("{} in increasing order", key));
}

ColdLoadSpec readLoad(const Element& element, const ReadContext& context, NameBook& names,
                      const std::vector<std::string>& known, double ambient)
{
    const std::string kindName =
        MapReader(element.node, element.mark, context, {Table::ColdLoad}, Unknown::Allow)
            .choice("kind");
    const KindRow<ColdLoadSpec::Kind>& row = rowNamed(kLoadKinds, kindName);
    const MapReader m(element.node, element.mark, context, {Table::ColdLoad, row.table});
    ColdLoadSpec l;
    l.name = names.claim(m);
    l.kind = row.kind;
    l.mark = m.mark();
    l.on = bodyName(m, "on", known);
    using K = ColdLoadSpec::Kind;
    switch (row.kind) {
    case K::Constant: l.power = m.quantity("power"); break;
    case K::Schedule:
        l.times = m.quantities("times");
        l.powers = m.quantities("powers");
        checkTable(m, "times", l.times, l.powers);
        break;
    case K::Table:
        l.temperatures = m.quantities("temperatures");
        l.powers = m.quantities("powers");
        checkTable(m, "temperatures", l.temperatures, l.powers);
        break;
    case K::Radiation:
        l.area = m.quantity("area");
        if (!m.has("emissivity") && !m.has("mli_emissivity"))
            m.failHere("missing required key 'emissivity' (or 'mli_emissivity' for a body "
                       "in multilayer insulation)",
                       "emissivity, mli_emissivity or both (mli_emissivity then counts)");
        l.emissivity = m.optionalQuantity("emissivity").value_or(0.0);
        l.mli_emissivity = m.optionalQuantity("mli_emissivity").value_or(0.0);
        l.ambient_temperature = m.optionalQuantity("ambient_temperature").value_or(ambient);
        break;
    case K::Support:
        l.material = m.choice("material");
        l.length = m.quantity("length");
        l.area = m.quantity("area");
        l.count = m.integer("count");
        l.ambient_temperature = m.optionalQuantity("ambient_temperature").value_or(ambient);
        break;
    }
    return l;
}

// Every body must reach the exchanger by following its link (one link per body): a chain
// that comes back on itself is a group of bodies the machine cannot cool.
void checkBodiesAttached(const MapReader& wall, const std::string& exchanger,
                         const std::vector<ColdBodySpec>& bodies)
{
    for (const ColdBodySpec& start : bodies) {
        std::vector<std::string> chain = {start.name};
        std::string next = start.link.to;
        while (!next.empty() && next != exchanger) {
            const bool loop = std::find(chain.begin(), chain.end(), next) != chain.end();
            chain.push_back(next);
            if (loop) {
                std::string path;
                for (const std::string& name : chain)
                    path += (path.empty() ? "" : " -> ") + name;
                wall.fail("bodies",
                          fmt::format("the links {} form a loop that does not reach the "
                                      "exchanger '{}'",
                                      path, exchanger),
                          "every body linked, directly or through other bodies, to the "
                          "exchanger");
            }
            next = std::find_if(bodies.begin(), bodies.end(), [&](const ColdBodySpec& b) {
                       return b.name == next;
                   })->link.to;
        }
    }
}

// The cold-head part of a lumped wall: bodies with their links, then loads.
void readColdHead(const MapReader& m, const std::string& exchanger, const ReadContext& context,
                  NameBook& names, double ambient, WallSpec& wall)
{
    const std::vector<Element> bodies = m.list("bodies");
    std::vector<std::string> known = {exchanger};
    for (const Element& element : bodies)
        known.push_back(
            MapReader(element.node, element.mark, context, {Table::ColdBody}, Unknown::Allow)
                .text("name"));
    for (const Element& element : bodies)
        wall.bodies.push_back(readBody(element, context, names, known));
    checkBodiesAttached(m, exchanger, wall.bodies);
    for (const Element& element : m.list("loads"))
        wall.loads.push_back(readLoad(element, context, names, known, ambient));
}

// A heat exchanger's wall: held at a temperature, or a lumped body; never both.
WallSpec readExchangerWall(const MapReader& component, const ReadContext& context,
                           NameBook& names, const std::string& exchanger, double ambient)
{
    const MapReader m = component.map("wall");
    WallSpec wall;
    wall.mark = m.mark();
    const KeyTable& lumped = keyTable(Table::WallLumped);
    const auto lumpedKey = std::find_if(lumped.entries.begin(), lumped.entries.end(),
                                        [&](const KeyEntry& e) { return m.has(e.key); });
    const std::string isothermalForm = "{temperature} (isothermal)";
    const std::string lumpedForm =
        fmt::format("{{{}}} (lumped body)", joinWords(declaredKeys({Table::WallLumped})));
    const std::string eitherForm =
        fmt::format("either {} or {}", isothermalForm, lumpedForm);
    if (m.has("temperature") && lumpedKey != lumped.entries.end())
        m.fail(lumpedKey->key,
               fmt::format("'{}' is a key of the lumped-body form, but 'temperature' "
                           "(line {}) makes the wall isothermal",
                           lumpedKey->key, m.markOf("temperature").line),
               eitherForm);
    if (m.has("temperature")) {
        wall.kind = WallSpec::Kind::Isothermal;
        wall.temperature = m.quantity("temperature");
        return wall;
    }
    if (lumpedKey == lumped.entries.end())
        m.failHere("missing required key 'temperature' (or 'material' and 'mass' for a "
                   "lumped body)",
                   eitherForm);
    wall.kind = WallSpec::Kind::LumpedBody;
    wall.material = m.choice("material");
    wall.mass = m.quantity("mass");
    wall.load = m.quantity("load");
    wall.initial_temperature = m.optionalQuantity("initial_temperature").value_or(0.0);
    readColdHead(m, exchanger, context, names, ambient, wall);
    return wall;
}

ComponentSpec readComponent(const Element& element, const ReadContext& context,
                            NameBook& names, double ambient)
{
    const std::string kindName =
        MapReader(element.node, element.mark, context, {Table::Component}, Unknown::Allow)
            .choice("kind");
    const KindRow<Kind>& row = rowNamed(kComponentKinds, kindName);
    const MapReader m(element.node, element.mark, context, {Table::Component, row.table});
    ComponentSpec c;
    c.name = names.claim(m);
    c.kind = row.kind;
    c.mark = m.mark();
    c.wall.mark = m.markOf("wall");
    switch (row.kind) {
    case Kind::Duct:
        readPassage(m, c);
        c.roughness = m.quantity("roughness");
        if (m.has("wall")) {
            c.wall.kind = WallSpec::Kind::Isothermal;
            c.wall.temperature = m.map("wall").quantity("temperature");
        }
        break;
    case Kind::HeatExchanger:
        readPassage(m, c);
        c.fill = readFill(m, row, c.diameter);
        c.wall = readExchangerWall(m, context, names, c.name, ambient);
        c.role = m.optionalChoice("role").value_or("");
        break;
    case Kind::Regenerator:
        readPassage(m, c);
        c.cell_clustering = m.quantity("cell_clustering");
        c.fill = readFill(m, row, c.diameter);
        if (m.has("housing")) {
            const MapReader housing = m.map("housing");
            c.housing =
                HousingSpec{housing.choice("material"), housing.quantity("thickness")};
        }
        break;
    case Kind::Tube:
        readPassage(m, c);
        c.cell_clustering = m.quantity("cell_clustering");
        c.roughness = m.quantity("roughness");
        if (m.has("wall")) {
            const MapReader wall = m.map("wall");
            c.wall.kind = WallSpec::Kind::Conducting;
            c.wall.material = wall.choice("material");
            c.wall.thickness = wall.quantity("thickness");
        }
        break;
    case Kind::Volume: c.volume = m.quantity("volume"); break;
    case Kind::Orifice:
        c.orifice_diameter = m.quantity("orifice_diameter");
        c.discharge_coefficient = m.quantity("discharge_coefficient");
        break;
    }
    return c;
}

PortSpec readPort(const Element& port, const ReadContext& context,
                  const std::vector<ComponentSpec>& components)
{
    const std::string expected = "component.inlet or component.outlet";
    const std::string text = scalarText(port.node, port.mark, context, expected);
    const auto dot = text.find('.');
    if (dot == std::string::npos)
        context.fail(port.mark, fmt::format("'{}' is not a port", text), expected);
    const std::string name = text.substr(0, dot);
    const std::string end = text.substr(dot + 1);
    std::vector<std::string> known;
    for (const ComponentSpec& c : components)
        known.push_back(c.name);
    if (std::find(known.begin(), known.end(), name) == known.end())
        context.fail(
            port.mark,
            fmt::format("no component is named '{}'{}", name, didYouMean(name, known)),
            known.empty() ? std::string("a component listed under components")
                          : "the name of a component: " + joinWords(known));
    const std::vector<std::string> ends = {"inlet", "outlet"};
    if (std::find(ends.begin(), ends.end(), end) == ends.end())
        context.fail(
            port.mark,
            fmt::format("'{}' is not an end of '{}'{}", end, name, didYouMean(end, ends)),
            fmt::format("{}.inlet or {}.outlet", name, name));
    return {name, end == "outlet"};
}

LinkSpec readLink(const Element& element, const ReadContext& context, NameBook& names,
                  const std::vector<ComponentSpec>& components)
{
    const MapReader m(element.node, element.mark, context, {Table::Link});
    LinkSpec link;
    link.name = names.claim(m);
    link.kind = m.choice("kind");
    link.mark = m.mark();
    const std::vector<Element> ports = m.list("between");
    if (ports.size() != 2)
        m.fail("between",
               fmt::format("{} port{} given", ports.size(), ports.size() == 1 ? "" : "s"),
               "a list of exactly two ports, e.g. [aftercooler.outlet, warm-end.outlet]");
    link.from = readPort(ports[0], context, components);
    link.to = readPort(ports[1], context, components);
    if (link.from.component == link.to.component && link.from.outlet == link.to.outlet)
        context.fail(ports[1].mark,
                     fmt::format("'{}' is the same port as {}", ports[1].node.Scalar(),
                                 ports[0].mark.path),
                     "two different ports");
    link.orifice_diameter = m.quantity("orifice_diameter");
    link.discharge_coefficient = m.quantity("discharge_coefficient");
    return link;
}

SolverSpec readSolver(const MapReader& m)
{
    SolverSpec solver;
    solver.relative_tolerance = m.quantity("relative_tolerance");
    solver.absolute_tolerance_scale = m.quantity("absolute_tolerance_scale");
    solver.mass_flow_tolerance_scale = m.quantity("mass_flow_tolerance_scale");
    solver.max_order = m.integer("max_order");
    solver.max_steps_per_cycle = m.integer("max_steps_per_cycle");
    const MapReader steady = m.map("steady");
    solver.steady.method = steady.choice("method");
    solver.steady.heat_residual = steady.quantity("heat_residual");
    solver.steady.energy_residual = steady.quantity("energy_residual");
    solver.steady.temperature_tolerance = steady.quantity("temperature_tolerance");
    solver.steady.max_cycles = steady.integer("max_cycles");
    solver.steady.min_cycles = steady.integer("min_cycles");
    if (solver.steady.min_cycles > solver.steady.max_cycles)
        steady.fail("min_cycles",
                    fmt::format("min_cycles {} is more than max_cycles {}",
                                solver.steady.min_cycles, solver.steady.max_cycles),
                    "min_cycles <= max_cycles");
    return solver;
}

CooldownSpec readCooldown(const MapReader& m)
{
    CooldownSpec cooldown;
    cooldown.mark = m.mark();
    cooldown.start_temperature = m.optionalQuantity("start_temperature").value_or(0.0);
    cooldown.time_limit = m.quantity("time_limit");
    cooldown.report_at = m.quantities("report_at");
    cooldown.settle_tolerance = m.quantity("settle_tolerance");
    cooldown.method = m.choice("method");
    cooldown.relative_tolerance = m.quantity("relative_tolerance");
    cooldown.settle_residual = m.quantity("settle_residual");
    cooldown.max_settle_cycles = m.integer("max_settle_cycles");
    return cooldown;
}

// The single YAML document in `text`, or an InputError for an empty or malformed file.
YAML::Node loadDocument(const std::string& text, const ReadContext& context)
{
    std::vector<std::string> required;
    for (const KeyEntry& e : keyTable(Table::Case).entries)
        if (e.required)
            required.push_back(e.key);
    const std::string expected = "a YAML map with the keys " + joinWords(required);
    if (const auto nul = text.find('\0'); nul != std::string::npos) {
        const auto lineStart = text.rfind('\n', nul);
        const int line =
            1 + static_cast<int>(std::count(text.begin(), text.begin() + nul, '\n'));
        const int column =
            static_cast<int>(nul - (lineStart == std::string::npos ? 0 : lineStart + 1)) +
            1;
        context.fail({context.file, line, column, ""},
                     "the file is not text (it holds a NUL byte)", expected);
    }
    std::vector<YAML::Node> documents;
    try {
        documents = YAML::LoadAll(text);
    } catch (const YAML::Exception& error) {
        context.fail(context.at(error.mark, ""), "not valid YAML: " + error.msg,
                     "a YAML case file (key: value maps, indented with spaces)");
    }
    if (documents.empty())
        context.fail({context.file, 1, 1, ""},
                     "the file is empty (no YAML document in it)", expected);
    if (documents.size() > 1)
        context.fail(context.at(documents[1].Mark(), ""),
                     fmt::format("the file holds {} YAML documents", documents.size()),
                     "one case per file");
    return documents.front();
}

} // namespace

// All components together hold at most kMaxTotalCells cells: the state vector (about four
// states per cell: gas mass and energy, a mass flow, a solid temperature) and the sparse
// Jacobian grow with them. Refused at the component with the most cells.
void checkTotalCells(const MapReader& top, const std::vector<Element>& elements,
                     const std::vector<ComponentSpec>& components)
{
    long total = 0;
    std::size_t largest = 0;
    for (std::size_t i = 0; i < components.size(); ++i) {
        total += components[i].cells;
        if (components[i].cells > components[largest].cells)
            largest = i;
    }
    if (total <= kMaxTotalCells)
        return;
    const ComponentSpec& big = components[largest];
    const std::string path = elements[largest].mark.path + ".cells";
    const auto given = top.context().marks->find(path);
    const SourceMark at = given != top.context().marks->end() ? given->second
                                                              : elements[largest].mark;
    top.context().fail(
        at,
        fmt::format("the components hold {} cells in all (about {} states; '{}' has {}), "
                    "above the limit of {}",
                    total, 4 * total, big.name, big.cells, kMaxTotalCells),
        fmt::format("at most {} cells in all components together", kMaxTotalCells));
}

CaseDescription parseCaseText(const std::string& text, const std::string& pathForMessages)
{
    CaseDescription c;
    c.source_path = pathForMessages;
    c.source_text = text;
    const ReadContext context{pathForMessages, c.source_text, &c.marks};
    const YAML::Node root = loadDocument(c.source_text, context);
    const SourceMark rootMark = root.IsNull() ? SourceMark{pathForMessages, 1, 1, ""}
                                              : context.at(root.Mark(), "");
    const MapReader top(root, rootMark, context, {Table::Case});

    c.name = top.text("case");
    if (c.name.empty())
        top.fail("case", "the case name is empty",
                 "a name for the case, e.g. cooler-80K");
    c.description = top.optionalText("description").value_or("");
    c.gas = readGas(top.map("gas"));
    c.frequency = top.quantity("frequency");
    c.drive = readDrive(top.map("drive"));
    NameBook names;
    const std::vector<Element> components = top.list("components");
    if (components.empty())
        top.fail("components",
                 "no components: a drive alone is not a machine (its gas has nowhere to go "
                 "and nothing to exchange heat with)",
                 "a list of at least one component, e.g. a regenerator, heat exchangers, a "
                 "tube and a volume");
    for (const Element& element : components)
        c.components.push_back(
            readComponent(element, context, names, c.gas.charge_temperature));
    checkTotalCells(top, components, c.components);
    for (const Element& element : top.list("links"))
        c.links.push_back(readLink(element, context, names, c.components));
    c.solver = readSolver(top.map("solver"));
    c.output.samples_per_cycle = top.map("output").integer("samples_per_cycle");
    c.initial.cold_temperature =
        top.map("initial").optionalQuantity("cold_temperature").value_or(0.0);
    c.cooldown = readCooldown(top.map("cooldown"));
    c.warnings = checkPlausible(c);
    return c;
}

CaseDescription readCaseFile(const std::string& path)
{
    const SourceMark noPlace{path, 0, 0, ""};
    const std::string expected = "a readable YAML case file";
    std::error_code ec;
    const auto status = std::filesystem::status(path, ec);
    if (ec && ec != std::errc::no_such_file_or_directory)
        throw InputError(noPlace, "cannot open the case file: " + ec.message(), expected);
    if (!std::filesystem::exists(status))
        throw InputError(noPlace, "cannot open the case file: no such file", expected);
    if (std::filesystem::is_directory(status))
        throw InputError(noPlace, "cannot open the case file: it is a directory",
                         expected);
    std::ifstream in(path, std::ios::binary);
    if (!in)
        throw InputError(
            noPlace, fmt::format("cannot open the case file: {}", std::strerror(errno)),
            expected);
    std::ostringstream text;
    text << in.rdbuf();
    if (in.bad())
        throw InputError(noPlace, "cannot read the case file", expected);
    CaseDescription c = parseCaseText(text.str(), path);
    // What is legitimate but outside a model's published range: one line each, once.
    for (const std::string& line : c.warnings)
        std::cerr << line << '\n';
    return c;
}

} // namespace coldtip::input
