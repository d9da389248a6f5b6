#include "solver/input/KeyTable.hpp"

#include "models/gas/WorkingGas.hpp"
#include "models/solids/SolidMaterial.hpp"

#include <cmath>
#include <fmt/format.h>
#include <stdexcept>

namespace coldtip::input {

namespace {

using D = Dimension;
using V = ValueKind;

// A chainable way to write a KeyEntry on one line.
struct Key {
    KeyEntry e;
    Key(std::string key, ValueKind kind, std::string help)
    {
        e.key = std::move(key);
        e.kind = kind;
        e.help = std::move(help);
    }
    Key& req()
    {
        e.required = true;
        return *this;
    }
    Key& def(std::string value)
    {
        e.defaultValue = std::move(value);
        return *this;
    }
    Key& rule(std::string text)
    {
        e.defaultRule = std::move(text);
        return *this;
    }
    Key& in(Range r)
    {
        e.range = r;
        return *this;
    }
    //! A bare number is refused: the trade's unit is not SI's (`why` says so).
    Key& unit(std::string why)
    {
        e.unitNote = std::move(why);
        return *this;
    }
    Key& of(std::vector<Table> tables)
    {
        e.tables = std::move(tables);
        return *this;
    }
    operator KeyEntry() const { return e; }
};

Key quantity(std::string key, Dimension dimension, Range range, std::string help)
{
    Key k(std::move(key), V::Quantity, std::move(help));
    k.e.dimension = dimension;
    k.e.range = range;
    return k;
}

Key quantities(std::string key, Dimension dimension, Range range, std::string help)
{
    Key k(std::move(key), V::Quantities, std::move(help));
    k.e.dimension = dimension;
    k.e.range = range;
    return k;
}

Key integer(std::string key, Range range, std::string help)
{
    return Key(std::move(key), V::Integer, std::move(help)).in(range);
}

Key oneOf(std::string key, std::vector<std::string> choices, std::string help)
{
    Key k(std::move(key), V::Enum, std::move(help));
    k.e.choices = std::move(choices);
    return k;
}

Key text(std::string key, std::string help)
{
    return Key(std::move(key), V::String, help);
}

Key map(std::string key, std::vector<Table> tables, std::string help)
{
    return Key(std::move(key), V::Map, std::move(help)).of(std::move(tables));
}

// Keys that several tables share, written once.
const Range kPositive = Range::above(0.0);
const Range kFraction = Range::open(0.0, 1.0);

// Plausible ranges of the physical keys: wide enough for every cryocooler and test rig
// (4 K regenerators of lead or rare-earth spheres, small 20 K pulse tubes, 1-10 Hz valved
// tubes, 300 K rigs, laboratory buffers of litres), narrow enough that a slip of unit or
// exponent ("diameter: 1e-30 m", "temperature: 5000 K") is refused at its key instead of
// being integrated for minutes. In SI.
// No regenerative cooler reaches below about 1.5 K (helium-3 as working gas), and the
// helium property tables start at 2.5 K (common practice): a wall at 3e-22 K is a slip.
const Range kTemperature = Range::closed(1.0, 1000.0);     // [K] absolute
const Range kTemperatureDifference = Range::aboveUpTo(0.0, 100.0); // [K] tolerances
const Range kDiameter = Range::closed(1e-6, 10.0);         // [m] bores, wires, spheres
const Range kLength = Range::closed(1e-6, 100.0);          // [m] flow paths, straps
const Range kThickness = Range::closed(1e-6, 1.0);         // [m] walls
const Range kArea = Range::closed(1e-12, 100.0);           // [m^2]
const Range kVolume = Range::closed(1e-12, 100.0);         // [m^3]
const Range kFrequency = Range::closed(1e-3, 1e4);         // [Hz]
const Range kPressure = Range::closed(1e3, 1e8);           // [Pa]
const Range kMass = Range::aboveUpTo(0.0, 1e4);            // [kg]
const Range kMesh = Range::closed(100.0, 1e6);             // [1/m] 2.5 to 25 400 per inch
// Why a bare number is refused for a volume: "dead_volume: 1.5" meant as cm^3 would be
// read as 1.5 m^3, a million times too large and still inside any plausible range.
const char* const kVolumeUnitNote =
    "volumes are written in cm^3 or L in the trade, SI in m^3";

Key nameKey()
{
    return text("name", "unique name (no '.' or whitespace), used by links").req();
}
Key lengthKey()
{
    return quantity("length", D::Length, kLength, "flow length").req();
}
Key diameterKey()
{
    return quantity("diameter", D::Length, kDiameter, "inner (frontal) diameter").req();
}
Key cellsKey(std::string byDefault)
{
    return integer("cells", Range::closed(1, kMaxTotalCells),
                   "number of control volumes (all components together at most " +
                       std::to_string(kMaxTotalCells) + ")")
        .def(byDefault);
}
Key clusteringKey()
{
    return quantity("cell_clustering", D::Dimensionless, Range::closedOpen(0.0, 1.0),
                    "cells crowd towards both ends (0 = uniform, cosine spacing as it -> 1)")
        .def("0.9");
}
Key roughnessKey()
{
    return quantity("roughness", D::Length, Range::atLeast(0.0),
                    "absolute wall roughness")
        .def("0");
}
Key materialKey(std::string help)
{
    return oneOf("material", models::knownSolidMaterials(), std::move(help));
}
Key thicknessKey(std::string help)
{
    return quantity("thickness", D::Length, kThickness, std::move(help)).req();
}
Key temperatureKey(std::string help)
{
    return quantity("temperature", D::Temperature, kTemperature, std::move(help)).req();
}
Key orificeKey()
{
    return quantity("orifice_diameter", D::Length, kDiameter, "bore").req();
}
Key dischargeKey()
{
    return quantity("discharge_coefficient", D::Dimensionless, Range::aboveUpTo(0.0, 1.0),
                    "flow through the bore / ideal flow")
        .def("0.61");
}
Key degradationKey(std::string byDefault)
{
    return quantity("conduction_degradation", D::Dimensionless,
                    Range::aboveUpTo(0.0, 1.0),
                    "matrix axial conduction k_eff / ((1 - porosity) k_solid)")
        .def(std::move(byDefault));
}
Key porosityKey(std::string help)
{
    return quantity("porosity", D::Dimensionless, kFraction, std::move(help));
}
Key ambientKey()
{
    return quantity("ambient_temperature", D::Temperature, kTemperature,
                    "temperature of the warm surroundings")
        .rule("gas.charge_temperature");
}
Key powersKey(std::string help)
{
    return quantities("powers", D::Power, Range{}, std::move(help)).req();
}

std::vector<KeyTable> buildTables()
{
    const std::vector<Table> fills = {Table::Fill, Table::FillSlots, Table::FillScreen,
                                      Table::FillSpheres};
    std::vector<KeyTable> tables = {
        {Table::Case,
         "top level",
         "The keys of the case file itself.",
         {text("case", "name of the case, used in reports and result files").req(),
          text("description", "free text about the case"),
          map("gas", {Table::Gas}, "working gas and its charge").req(),
          quantity("frequency", D::Frequency, kFrequency, "operating frequency").req(),
          map("drive", {Table::Drive}, "what moves the gas").req(),
          Key("components", V::List, "the main flow path, from the drive outward")
              .of({Table::Component})
              .req(),
          Key("links", V::List, "connections across the main path").of({Table::Link}),
          map("solver", {Table::Solver}, "integrator and periodic-steady-state controls"),
          map("output", {Table::Output}, "what the result file holds"),
          map("initial", {Table::Initial}, "initial temperature profile"),
          map("cooldown", {Table::Cooldown}, "the cooldown transient (coldtip cooldown)")}},
        {Table::Gas,
         "gas",
         "Working gas and the charge that fills the machine.",
         {oneOf("species", models::knownGasSpecies(), "working gas").req(),
          quantity("charge_pressure", D::Pressure, kPressure,
                   "pressure when filled at charge_temperature")
              .req(),
          quantity("charge_temperature", D::Temperature, kTemperature,
                   "temperature of the gas when charged")
              .req()}},
        {Table::Drive,
         "drive",
         "Prescribed sinusoidal piston x(t) = amplitude sin(2 pi f t), positive inward.",
         {oneOf("kind", {"piston"}, "type of drive").req(),
          quantity("bore", D::Length, kDiameter, "piston diameter").req(),
          quantity("amplitude", D::Length, kDiameter, "half the stroke").req(),
          quantity("dead_volume", D::Volume, kVolume, "volume at full compression")
              .unit(kVolumeUnitNote)
              .req(),
          map("wall", {Table::DriveWall}, "compression-space wall; absent: adiabatic")}},
        {Table::DriveWall,
         "drive.wall",
         "Film heat exchange in the compression space.",
         {temperatureKey("wall temperature"),
          quantity("heat_transfer_coefficient", D::HeatTransferCoefficient,
                   Range::atLeast(0.0), "film coefficient between gas and wall")
              .req()}},
        {Table::Component,
         "components[i], every kind",
         "Every component has a name and a kind; the kind selects its other keys.",
         {nameKey(),
          oneOf("kind",
                {"duct", "heat-exchanger", "regenerator", "tube", "volume", "orifice"},
                "what the component is")
              .req()}},
        {Table::Duct,
         "components[i] with kind: duct",
         "A plain pipe (transfer line, inertance).",
         {lengthKey(), diameterKey(), cellsKey("").rule("ceil(length / 40 mm)"),
          roughnessKey(),
          map("wall", {Table::DuctWall}, "isothermal wall; absent: adiabatic")}},
        {Table::DuctWall,
         "wall of a duct",
         "A duct wall held at a temperature.",
         {temperatureKey("wall temperature")}},
        {Table::HeatExchanger,
         "components[i] with kind: heat-exchanger",
         "A flow passage with a fill, exchanging heat with its wall.",
         {lengthKey(), diameterKey(), cellsKey("2"),
          map("fill", fills, "what fills the flow passage").req(),
          map("wall", {Table::WallIsothermal, Table::WallLumped},
              "held at a temperature, or a lumped body under a load")
              .req(),
          oneOf("role", {"cold", "reject", "warm"},
                "which exchanger it is; absent: inferred")}},
        {Table::WallIsothermal,
         "wall of a heat exchanger, isothermal form",
         "The wall is held at a fixed temperature.",
         {temperatureKey("wall temperature")}},
        {Table::WallLumped,
         "wall of a heat exchanger, lumped-body form",
         "One solid node of the given mass under an applied load (a cold head); "
         "not together with temperature.",
         {materialKey("body material").req(),
          quantity("mass", D::Mass, kMass, "body mass").req(),
          quantity("load", D::Power, Range{}, "heat applied to the body").def("0"),
          quantity("initial_temperature", D::Temperature, kTemperature,
                   "starting temperature; absent: from the initial profile"),
          Key("bodies", V::List,
              "further lumped bodies of the cold head, each linked to this one or another")
              .of({Table::ColdBody}),
          Key("loads", V::List, "heat loads on the cold head's bodies, each reported "
                                "separately")
              .of({Table::ColdLoad})}},
        {Table::ColdBody,
         "bodies[i] of a lumped heat-exchanger wall",
         "A further lumped body of the cold head (a cold block, a detector mount): one "
         "temperature, heat capacity mass c_p(T) of its material.",
         {nameKey(), materialKey("body material").req(),
          quantity("mass", D::Mass, kMass, "body mass").req(),
          quantity("initial_temperature", D::Temperature, kTemperature,
                   "starting temperature; absent: the exchanger body's"),
          map("link", {Table::BodyLink}, "how it conducts to the rest of the cold head")
              .req()}},
        {Table::BodyLink,
         "link of a cold-head body",
         "A conductor without heat capacity: a joint of constant conductance, or a strap of a "
         "material, length and cross-section, Q = (area/length) integral k dT of the NIST fit.",
         {text("to", "the body it joins: another body's name or the exchanger's; absent: the "
                     "exchanger"),
          quantity("conductance", D::ThermalConductance, kPositive,
                   "constant conductance (a bolted joint); not with material"),
          materialKey("strap material; with length and area"),
          quantity("length", D::Length, kLength, "strap length"),
          quantity("area", D::Area, kArea, "strap cross-section")}},
        {Table::ColdLoad,
         "loads[i] of a lumped heat-exchanger wall, every kind",
         "A heat load on a cold-head body; the kind selects its other keys.",
         {nameKey(),
          oneOf("kind", {"constant", "schedule", "table", "radiation", "support"},
                "what the load is")
              .req(),
          text("on", "the body it heats; absent: the exchanger's body")}},
        {Table::LoadConstant,
         "load with kind: constant",
         "A constant heat load (a detector's dissipation).",
         {quantity("power", D::Power, Range{}, "heat into the body").req()}},
        {Table::LoadSchedule,
         "load with kind: schedule",
         "A load scheduled in the run's time: linear between the points (continuous, its "
         "slope jumps at them), the end values held outside.",
         {quantities("times", D::Time, Range::atLeast(0.0),
                     "times from the start of the run, increasing")
              .req(),
          powersKey("heat into the body at those times")}},
        {Table::LoadTable,
         "load with kind: table",
         "A load tabulated against the body's temperature: linear between the points "
         "(continuous, its slope jumps at them), the end values held outside.",
         {quantities("temperatures", D::Temperature, kTemperature,
                     "body temperatures, increasing")
              .req(),
          powersKey("heat into the body at those temperatures")}},
        {Table::LoadRadiation,
         "load with kind: radiation",
         "Radiation from a surrounding surface at ambient: Q = sigma eps area (T_amb^4 - T^4).",
         {quantity("area", D::Area, kArea, "radiating surface of the body").req(),
          quantity("emissivity", D::Dimensionless, Range::aboveUpTo(0.0, 1.0),
                   "effective emissivity of the bare body")
              .rule("required without mli_emissivity"),
          quantity("mli_emissivity", D::Dimensionless, Range::aboveUpTo(0.0, 1.0),
                   "effective emissivity of a multilayer-insulation blanket; replaces "
                   "emissivity"),
          ambientKey()}},
        {Table::LoadSupport,
         "load with kind: support",
         "Conduction through supports from ambient: Q = count (area/length) integral_T^T_amb "
         "k dT of the NIST fit.",
         {materialKey("support material").req(),
          quantity("length", D::Length, kLength, "support length").req(),
          quantity("area", D::Area, kArea, "cross-section of one support").req(),
          integer("count", Range::atLeast(1), "identical supports in parallel").def("1"),
          ambientKey()}},
        {Table::Regenerator,
         "components[i] with kind: regenerator",
         "A porous matrix that stores heat from one half-cycle to the next.",
         {lengthKey(), diameterKey(), cellsKey("50"), clusteringKey(),
          map("fill", {Table::Fill, Table::FillScreen, Table::FillSpheres},
              "the matrix: screen or spheres, with its material")
              .req(),
          map("housing", {Table::Housing}, "tube around the matrix; absent: none")}},
        {Table::Housing,
         "housing of a regenerator",
         "A tube in parallel with the matrix: it adds conduction and heat capacity.",
         {materialKey("housing material").req(), thicknessKey("wall thickness")}},
        {Table::Tube,
         "components[i] with kind: tube",
         "An open tube with a temperature gradient along it (the pulse tube).",
         {lengthKey(), diameterKey(), cellsKey("50"), clusteringKey(), roughnessKey(),
          map("wall", {Table::TubeWall}, "conducting wall; absent: adiabatic")}},
        {Table::TubeWall,
         "wall of a tube",
         "A wall with one solid node per cell and axial conduction.",
         {materialKey("wall material").req(), thicknessKey("wall thickness")}},
        {Table::Volume,
         "components[i] with kind: volume",
         "A lumped gas volume (reservoir, buffer, compliance).",
         {quantity("volume", D::Volume, kVolume, "gas volume").unit(kVolumeUnitNote).req()}},
        {Table::Orifice,
         "components[i] with kind: orifice",
         "A resistive restriction in the main path.",
         {orificeKey(), dischargeKey()}},
        {Table::Fill,
         "fill, every kind",
         "What fills a heat exchanger or regenerator; the kind selects its other keys.",
         {oneOf("kind", {"slots", "screen", "spheres"}, "type of fill").req()}},
        {Table::FillSlots,
         "fill with kind: slots",
         "Parallel slots or channels.",
         {porosityKey("open fraction of the frontal area").req(),
          quantity("hydraulic_diameter", D::Length, kDiameter,
                   "4 flow area / wetted perimeter; below the passage's diameter")
              .req(),
          materialKey("fin material")}},
        {Table::FillScreen,
         "fill with kind: screen",
         "Stacked square-weave woven screens.",
         {materialKey("screen material; required in a regenerator"),
          quantity("mesh", D::InverseLength, kMesh, "wires per unit length")
              .unit("screens are counted in wires per inch, SI in wires per metre")
              .req(),
          quantity("wire_diameter", D::Length, kDiameter, "wire diameter").req(),
          porosityKey("overrides the porosity computed from mesh and wire")
              .rule("1 - pi mesh wire_diameter / 4, at most " +
                    fmt::format("{:g}", kMaxScreenPorosity)),
          degradationKey("0.1")}},
        {Table::FillSpheres,
         "fill with kind: spheres",
         "A packed bed of spheres.",
         {materialKey("sphere material; required in a regenerator"),
          quantity("sphere_diameter", D::Length, kDiameter, "sphere diameter").req(),
          porosityKey("void fraction of the bed").def("0.38"), degradationKey("0.02")}},
        {Table::Link,
         "links[i]",
         "A valve across the main path (double-inlet bypass).",
         {nameKey(), oneOf("kind", {"valve"}, "type of link").req(),
          Key("between", V::List,
              "the two ports it joins, as component.inlet or component.outlet")
              .req(),
          orificeKey(), dischargeKey()}},
        {Table::Solver,
         "solver",
         "Integrator and periodic-steady-state controls.",
         {quantity("relative_tolerance", D::Dimensionless, Range::closed(1e-12, 1e-3),
                   "integrator relative tolerance")
              .def("1e-6"),
          quantity("absolute_tolerance_scale", D::Dimensionless, kPositive,
                   "multiplies the built-in absolute tolerances")
              .def("1"),
          quantity("mass_flow_tolerance_scale", D::Dimensionless, kPositive,
                   "multiplies, on top, the mass flows' absolute tolerance (relative "
                   "tolerance x drive mass-flow amplitude)")
              .def("1"),
          integer("max_order", Range::closed(1, 5),
                  "highest BDF order (above 2, lightly damped acoustic modes destabilise BDF)")
              .def("2"),
          integer("max_steps_per_cycle", Range::atLeast(10),
                  "integrator steps allowed in one cycle before the run fails")
              .def("100000"),
          map("steady", {Table::Steady}, "when the cycle counts as repeating")}},
        {Table::Steady,
         "solver.steady",
         "Periodic-steady-state test and its limits.",
         {oneOf("method", {"plain", "accelerated"},
                "accelerated: Newton-Krylov shooting; plain: cycle after cycle")
              .def("accelerated"),
          quantity("heat_residual", D::Dimensionless, kFraction,
                   "max |cycle heat of a solid node| / cooling power")
              .def("1e-3"),
          quantity("energy_residual", D::Dimensionless, kFraction,
                   "|energy balance error| / PV power")
              .def("2e-3"),
          quantity("temperature_tolerance", D::TemperatureDifference,
                   kTemperatureDifference,
                   "estimated distance of any temperature from the steady state (a "
                   "difference: 0.05 degC is 0.05 K)")
              .def("0.05 K"),
          integer("max_cycles", Range::atLeast(1), "give up after this many cycles")
              .def("20000"),
          integer("min_cycles", Range::atLeast(1), "never stop before this many cycles")
              .def("5")}},
        {Table::Output,
         "output",
         "What the result file holds.",
         {integer("samples_per_cycle", Range::closed(8, 4096),
                  "samples of the last cycle in the result file")
              .def("96")}},
        {Table::Initial,
         "initial",
         "The initial temperature profile.",
         {quantity(
             "cold_temperature", D::Temperature, kTemperature,
             "cold-end start; absent: the cold exchanger's wall or body temperature")}},
        {Table::Cooldown,
         "cooldown",
         "The cooldown transient of `coldtip cooldown`: from a uniform start until the cold "
         "end settles or the time limit.",
         {quantity("start_temperature", D::Temperature, kTemperature,
                   "uniform temperature of the whole machine at the start")
              .rule("the reject exchanger's wall temperature"),
          quantity("time_limit", D::Time, kPositive, "longest physical time simulated")
              .def("14400 s"),
          quantities("report_at", D::Temperature, kTemperature,
                     "cold-end temperatures whose times are reported"),
          quantity("settle_tolerance", D::TemperatureDifference, kTemperatureDifference,
                   "settled: estimated distance of the cold end from its steady state (a "
                   "difference: 0.1 degF is 0.056 K)")
              .def("0.05 K"),
          oneOf("method", {"accelerated", "plain"},
                "accelerated: averaged slow temperature equation; plain: every cycle")
              .def("accelerated"),
          quantity("relative_tolerance", D::Dimensionless, Range::closed(1e-8, 1e-2),
                   "accelerated: relative tolerance of the slow temperature equation")
              .def("1e-4"),
          quantity("settle_residual", D::Dimensionless, kFraction,
                   "accelerated: cycle-to-cycle change of the averaged heat flows / "
                   "cooling power")
              .def("1e-3"),
          integer("max_settle_cycles", Range::closed(2, 1000),
                  "accelerated: most cycles per averaged heat-flow evaluation")
              .def("12")}},
    };
    for (std::size_t i = 0; i < tables.size(); ++i)
        if (static_cast<std::size_t>(tables[i].id) != i)
            throw std::logic_error("key tables are not in the order of Table");
    return tables;
}

std::string number(double x)
{
    return fmt::format("{:g}", x);
}

std::string valueColumn(const KeyEntry& e)
{
    std::vector<std::string> titles;
    for (Table t : e.tables)
        titles.push_back(keyTable(t).title);
    switch (e.kind) {
    case V::Quantity:
        return describe(e.dimension).siUnit.empty()
                   ? std::string("number")
                   : fmt::format("{} [{}]{}", describe(e.dimension).name,
                                 describe(e.dimension).siUnit,
                                 e.unitNote.empty() ? "" : ", unit required");
    case V::Integer: return "integer";
    case V::String: return "string";
    case V::Enum: return "one of " + joinWords(e.choices, "`");
    case V::Map: return "map: " + joinWords(titles, "");
    case V::List:
        return titles.empty() ? "list of strings" : "list of: " + joinWords(titles, "");
    case V::Quantities:
        return fmt::format("list of {} [{}]", describe(e.dimension).name,
                           describe(e.dimension).siUnit);
    }
    return {};
}

} // namespace

bool Range::contains(double x) const
{
    const bool aboveLo = loIncluded ? x >= lo : x > lo;
    const bool belowHi = hiIncluded ? x <= hi : x < hi;
    return aboveLo && belowHi;
}

bool Range::unbounded() const
{
    return std::isinf(lo) && std::isinf(hi);
}

std::string Range::describe(std::string_view unit, bool integer) const
{
    const std::string suffix = unit.empty() ? std::string() : fmt::format(" {}", unit);
    if (unbounded())
        return {};
    if (std::isinf(hi))
        return fmt::format("{} {}{}", loIncluded ? ">=" : ">", number(lo), suffix);
    if (std::isinf(lo))
        return fmt::format("{} {}{}", hiIncluded ? "<=" : "<", number(hi), suffix);
    if (integer)
        return fmt::format("from {} to {}", number(lo), number(hi));
    return fmt::format("in {}{}, {}{}{}", loIncluded ? "[" : "(", number(lo), number(hi),
                       hiIncluded ? "]" : ")", suffix);
}

const KeyEntry* KeyTable::find(std::string_view key) const
{
    for (const KeyEntry& e : entries)
        if (e.key == key)
            return &e;
    return nullptr;
}

const std::vector<KeyTable>& keyTables()
{
    static const std::vector<KeyTable> tables = buildTables();
    return tables;
}

const KeyTable& keyTable(Table id)
{
    return keyTables().at(static_cast<std::size_t>(id));
}

std::vector<std::string> declaredKeys(const std::vector<Table>& tables)
{
    std::vector<std::string> keys;
    for (Table t : tables)
        for (const KeyEntry& e : keyTable(t).entries)
            keys.push_back(e.key);
    return keys;
}

std::string joinWords(const std::vector<std::string>& words, std::string_view quote)
{
    std::string out;
    for (const std::string& w : words)
        out += fmt::format("{}{}{}{}", out.empty() ? "" : ", ", quote, w, quote);
    return out;
}

std::string expectation(const KeyEntry& e)
{
    const DimensionInfo& d = describe(e.dimension);
    switch (e.kind) {
    case V::Quantity:
        if (e.range.unbounded())
            return expectedQuantity(e.dimension);
        return fmt::format("{} {} {}", d.article, d.name,
                           e.range.describe(d.siUnit, false));
    case V::Integer:
        return e.range.unbounded() ? std::string("an integer")
                                   : "an integer " + e.range.describe("", true);
    case V::String: return "a string";
    case V::Enum: return "one of: " + joinWords(e.choices, "");
    case V::Map: return "a map with keys " + joinWords(declaredKeys(e.tables), "");
    case V::List: return e.tables.empty() ? "a list" : "a list of maps";
    case V::Quantities: {
        KeyEntry one = e;
        one.kind = V::Quantity;
        return "a list, each " + expectation(one);
    }
    }
    return {};
}

std::string keyReferenceMarkdown()
{
    std::string md =
        "## Case-file keys\n\n"
        "A quantity is a bare number in SI units or a string \"<number> <unit>\" (\"20 "
        "mm\", "
        "\"3.1 MPa\", \"27 degC\"); units are read by udunits2. Unknown keys are errors. "
        "Ranges are in SI units.\n\n"
        "A *temperature* is absolute (27 degC is 300.15 K); a *temperature difference* (the "
        "tolerances) converts by the unit's scale only (0.05 degC is 0.05 K, 0.1 degF is "
        "0.056 K). A key marked *unit required* refuses a bare number because its trade "
        "unit is not SI's (screen mesh is counted per inch). A frequency is in Hz: an "
        "angular unit (rad/s) is refused, since udunits2 counts the radian as 1. "
        "udunits2's origin-shift and logarithmic syntax (\"85 K @ 1000\", \"since\", "
        "\"lg(re 1 W)\") is refused. All components together hold at most " +
        std::to_string(kMaxTotalCells) + " cells.\n";
    for (const KeyTable& table : keyTables()) {
        md += fmt::format("\n### {}\n\n{}\n\n", table.title, table.summary);
        md += "| key | value | required | default | allowed | meaning |\n"
              "|---|---|---|---|---|---|\n";
        for (const KeyEntry& e : table.entries) {
            const std::string byDefault = !e.defaultValue.empty()  ? e.defaultValue
                                          : !e.defaultRule.empty() ? e.defaultRule
                                                                   : std::string();
            const bool ranged =
                e.kind == V::Quantity || e.kind == V::Integer || e.kind == V::Quantities;
            md += fmt::format("| `{}` | {} | {} | {} | {} | {} |\n", e.key,
                              valueColumn(e), e.required ? "yes" : "", byDefault,
                              ranged ? e.range.describe(describe(e.dimension).siUnit,
                                                        e.kind == V::Integer)
                                     : std::string(),
                              e.help);
        }
    }
    return md;
}

} // namespace coldtip::input
