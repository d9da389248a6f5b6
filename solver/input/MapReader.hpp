#pragma once
//! \file MapReader.hpp
//! Reads one YAML map against its declared keys (KeyTable): rejects unknown and repeated
//! keys, converts each value to SI as its entry says, applies defaults, checks ranges,
//! and throws an InputError that points at the value (or, for a missing key, at the map).
//! Internal to the case reader.

#include "solver/case/CaseDescription.hpp"
#include "solver/input/KeyTable.hpp"

#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>
#include <yaml-cpp/yaml.h>

namespace coldtip::input {

//! The file being read: its name and text (for messages) and the index of key marks the
//! reader fills (CaseDescription::marks).
struct ReadContext {
    std::string file;
    std::string_view text;
    std::map<std::string, SourceMark>* marks = nullptr;

    //! yaml-cpp's 0-based mark as a 1-based SourceMark with `path`.
    SourceMark at(const YAML::Mark& mark, std::string path) const;
    //! Throws the InputError at `where`.
    [[noreturn]] void fail(const SourceMark& where, std::string problem,
                           std::string expected) const;
};

//! A list element with its place ("components[3]").
struct Element {
    YAML::Node node;
    SourceMark mark;
};

//! The text of a scalar node, or an InputError at `where` naming `expected`.
std::string scalarText(const YAML::Node& node, const SourceMark& where,
                       const ReadContext& context, const std::string& expected);

class MapReader {
public:
    enum class UnknownKeys { Reject, Allow };

    //! `node` must be a map (null reads as an empty map) whose keys are declared in one of
    //! `tables`; UnknownKeys::Allow defers that check (to read `kind` first).
    MapReader(const YAML::Node& node, SourceMark mark, const ReadContext& context,
              std::vector<Table> tables, UnknownKeys unknown = UnknownKeys::Reject);

    const SourceMark& mark() const { return m_mark; }
    const ReadContext& context() const { return m_context; }
    bool has(std::string_view key) const;
    //! Where the value of `key` is; the map's own place (with the key's path) if absent.
    SourceMark markOf(std::string_view key) const;
    //! The value of `key` as written (a scalar); "" if absent.
    std::string written(std::string_view key) const;
    //! The declared entry of `key` (std::logic_error if undeclared: a reader bug).
    const KeyEntry& entry(std::string_view key) const;

    //! The value in SI, its default if absent, or an InputError if required and absent.
    //! The plain forms throw std::logic_error for an absent key with neither.
    double quantity(std::string_view key) const;
    std::optional<double> optionalQuantity(std::string_view key) const;
    int integer(std::string_view key) const;
    std::optional<int> optionalInteger(std::string_view key) const;
    std::string text(std::string_view key) const;
    std::optional<std::string> optionalText(std::string_view key) const;
    std::string choice(std::string_view key) const;
    std::optional<std::string> optionalChoice(std::string_view key) const;
    //! A list of quantities in SI (a single value reads as a list of one; absent: empty).
    std::vector<double> quantities(std::string_view key) const;

    //! The map under `key` read against its entry's tables (or `tables`); an empty map at
    //! this map's place if it is absent and not required.
    MapReader map(std::string_view key) const;
    MapReader map(std::string_view key, std::vector<Table> tables,
                  UnknownKeys unknown = UnknownKeys::Reject) const;
    //! The elements of the list under `key` (an absent optional or null list is empty).
    std::vector<Element> list(std::string_view key) const;

    //! InputError "missing required key" for `key` if it is absent; `why` is appended.
    void require(std::string_view key, std::string_view why) const;
    //! InputError at the value of `key` (at the map if absent).
    [[noreturn]] void fail(std::string_view key, std::string problem,
                           std::string expected) const;
    //! InputError at the map itself.
    [[noreturn]] void failHere(std::string problem, std::string expected) const;

private:
    struct Item {
        std::string key;
        YAML::Node value;
        SourceMark mark; //!< the value's place (the key's if the value is null)
    };
    //! A scalar value to convert: as written, or the entry's default.
    struct Scalar {
        std::string text;
        SourceMark mark;
    };

    const Item* item(std::string_view key) const;
    std::string childPath(std::string_view key) const;
    //! The scalar to read for `entry`: given, defaulted, or nothing; InputError if the
    //! value is not a scalar or a required key is absent.
    std::optional<Scalar> scalar(const KeyEntry& entry) const;
    [[noreturn]] void missing(const KeyEntry& entry, std::string_view why) const;
    //! A scalar of `entry` converted to SI and checked against its range.
    double convert(const KeyEntry& entry, const Scalar& s) const;

    const ReadContext& m_context;
    SourceMark m_mark;
    std::vector<Table> m_tables;
    std::vector<Item> m_items;
};

} // namespace coldtip::input
