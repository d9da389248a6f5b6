#pragma once
//! \file KeyTable.hpp
//! The declared keys of every kind of map in a case file. One table per map kind; each
//! entry says what its value is (a quantity of a dimension, an integer, a string, one of
//! a set of names, a map or a list), whether it is required, its default, its allowed
//! range (in SI) and a one-line help. The same tables drive validation, "did you mean"
//! for unknown keys, and the Markdown key reference in the README.

#include "solver/input/UnitConverter.hpp"

#include <limits>
#include <string>
#include <string_view>
#include <vector>

namespace coldtip::input {

//! What a key's value is (Quantities: a list of quantities of one dimension, each in the
//! entry's range).
enum class ValueKind { Quantity, Integer, String, Enum, Map, List, Quantities };

//! An allowed interval in SI units; each bound is included or left out, an infinite
//! bound is no bound.
struct Range {
    double lo = -std::numeric_limits<double>::infinity();
    double hi = std::numeric_limits<double>::infinity();
    bool loIncluded = true;
    bool hiIncluded = true;

    //! lo < x (or <=) and x < hi (or <=).
    bool contains(double x) const;
    //! True if there is neither bound.
    bool unbounded() const;
    //! "> 0 m", ">= 1", "in (0, 1]", "from 8 to 4096" (integers); "" if unbounded.
    std::string describe(std::string_view unit, bool integer) const;

    static Range above(double lo) { return {lo, Range{}.hi, false, true}; }
    static Range atLeast(double lo) { return {lo, Range{}.hi, true, true}; }
    static Range open(double lo, double hi) { return {lo, hi, false, false}; }
    static Range closed(double lo, double hi) { return {lo, hi, true, true}; }
    static Range closedOpen(double lo, double hi) { return {lo, hi, true, false}; }
    //! (lo, hi]
    static Range aboveUpTo(double lo, double hi) { return {lo, hi, false, true}; }
};

//! The kinds of maps in a case file, one KeyTable each.
enum class Table {
    Case, //!< the top level
    Gas,
    Drive,
    DriveWall,
    Component, //!< the keys every component has (name, kind)
    Duct,
    DuctWall,
    HeatExchanger,
    WallIsothermal, //!< heat-exchanger wall held at a temperature
    WallLumped,     //!< heat-exchanger wall as a lumped body under a load
    ColdBody,       //!< a further body of the cold head
    BodyLink,       //!< its conductive link
    ColdLoad,       //!< the keys every cold-head load has (name, kind, on)
    LoadConstant,
    LoadSchedule,
    LoadTable,
    LoadRadiation,
    LoadSupport,
    Regenerator,
    Housing,
    Tube,
    TubeWall,
    Volume,
    Orifice,
    Fill, //!< the key every fill has (kind)
    FillSlots,
    FillScreen,
    FillSpheres,
    Link,
    Solver,
    Steady,
    Output,
    Initial,
    Cooldown,
};

//! One declared key.
struct KeyEntry {
    std::string key;
    ValueKind kind = ValueKind::String;
    Dimension dimension = Dimension::Dimensionless; //!< quantities
    bool required = false;
    //! The default as it would be written in a case file, read like a given value;
    //! empty: no default (or a computed one, see defaultRule).
    std::string defaultValue;
    //! A default the reader computes ("ceil(length / 40 mm)"), for the reference.
    std::string defaultRule;
    Range range;                      //!< quantities and integers, in SI
    std::vector<std::string> choices; //!< enums
    std::vector<Table> tables;        //!< maps: their table(s); lists: their elements'
    std::string help;
    //! Quantities: why a bare number is refused (the trade's unit is not SI's, so a bare
    //! number is ambiguous); empty: a bare number is taken as SI.
    std::string unitNote;
};

//! Most cells (control volumes) of all components together: the state vector grows with
//! about four states per cell, and past this the run takes hours and the sparse Jacobian
//! gigabytes, so a slip ("cells: 1e9") is refused at once instead of allocated.
inline constexpr int kMaxTotalCells = 20000;

//! Highest screen porosity accepted from mesh and wire diameter: stacked square-weave
//! screens lie between about 0.6 and 0.8 (Gedeon and Wood, NASA CR-198442, 1996); above
//! 0.95 the mesh or the wire was almost surely given in the wrong unit.
inline constexpr double kMaxScreenPorosity = 0.95;

//! The declared keys of one kind of map.
struct KeyTable {
    Table id;
    std::string title;   //!< heading in the reference ("components[i] with kind: duct")
    std::string summary; //!< one sentence for the reference
    std::vector<KeyEntry> entries;

    //! The entry for `key`, or nullptr if it is not declared here.
    const KeyEntry* find(std::string_view key) const;
};

//! The table of one kind of map.
const KeyTable& keyTable(Table id);

//! Every table, in the order the reference lists them (the order of Table).
const std::vector<KeyTable>& keyTables();

//! What a value of `entry` must be: "a length > 0 m", "an integer >= 1",
//! "one of: duct, tube", "a map with keys species, charge_pressure, ...".
std::string expectation(const KeyEntry& entry);

//! The keys declared in `tables`, in order.
std::vector<std::string> declaredKeys(const std::vector<Table>& tables);

//! `words` joined by ", ", each between `quote`s ("a, b" or "`a`, `b`"), for messages.
std::string joinWords(const std::vector<std::string>& words, std::string_view quote = "");

//! The whole key reference as Markdown (one section per table), for the README.
std::string keyReferenceMarkdown();

} // namespace coldtip::input
