// The declared-key tables: ranges, expectations and the Markdown reference.

#include "solver/input/ClosestName.hpp"
#include "solver/input/InputError.hpp"
#include "solver/input/KeyTable.hpp"

#include <catch2/catch.hpp>
#include <string>
#include <vector>

using namespace coldtip::input;

TEST_CASE("the Markdown key reference lists every declared key", "[input]")
{
    const std::string md = keyReferenceMarkdown();
    std::size_t nKeys = 0;
    for (const KeyTable& table : keyTables()) {
        CHECK_THAT(md, Catch::Contains("### " + table.title + "\n"));
        for (const KeyEntry& e : table.entries) {
            INFO(table.title << ": " << e.key);
            CHECK_THAT(md, Catch::Contains("| `" + e.key + "` |"));
            CHECK_FALSE(e.help.empty());
            ++nKeys;
        }
    }
    CHECK(nKeys > 80);
    CHECK_THAT(md, Catch::Contains(
                       "| `wire_diameter` | length [m] | yes |  | in [1e-06, 10] m | "));
    CHECK_THAT(md, Catch::Contains(
                       "| `cells` | integer |  | ceil(length / 40 mm) | from 1 to 20000 |"));
    // A difference and a key whose trade unit is not SI say so in the reference.
    CHECK_THAT(md, Catch::Contains("| `temperature_tolerance` | temperature difference [K] |"));
    CHECK_THAT(md, Catch::Contains("| `settle_tolerance` | temperature difference [K] |"));
    CHECK_THAT(md, Catch::Contains("| `mesh` | inverse length [1/m], unit required | yes |"));
    CHECK_THAT(md, Catch::Contains(
                       "| `samples_per_cycle` | integer |  | 96 | from 8 to 4096 |"));
}

TEST_CASE("every default lies in its range and every map names a table", "[input]")
{
    for (const KeyTable& table : keyTables())
        for (const KeyEntry& e : table.entries) {
            INFO(table.title << ": " << e.key);
            if (e.kind == ValueKind::Map)
                CHECK_FALSE(e.tables.empty());
            if (e.kind == ValueKind::Enum) {
                CHECK_FALSE(e.choices.empty());
                if (!e.defaultValue.empty())
                    CHECK(std::find(e.choices.begin(), e.choices.end(), e.defaultValue) !=
                          e.choices.end());
            }
            if (!e.defaultValue.empty() && e.kind == ValueKind::Quantity)
                CHECK(e.range.contains(
                    UnitConverter::instance().parse(e.defaultValue, e.dimension).value));
            CHECK_FALSE((e.required && !e.defaultValue.empty()));
        }
}

TEST_CASE("ranges and expectations read as the messages say", "[input]")
{
    CHECK(Range::above(0).describe("m", false) == "> 0 m");
    CHECK(Range::atLeast(1).describe("", true) == ">= 1");
    CHECK(Range::open(0, 1).describe("", false) == "in (0, 1)");
    CHECK(Range::aboveUpTo(0, 1).describe("", false) == "in (0, 1]");
    CHECK(Range::closed(8, 4096).describe("", true) == "from 8 to 4096");
    CHECK(Range::open(0, 1).contains(0.5));
    CHECK_FALSE(Range::open(0, 1).contains(1.0));
    CHECK(Range::aboveUpTo(0, 1).contains(1.0));
    CHECK_FALSE(Range::above(0).contains(0.0));
    CHECK(expectation(*keyTable(Table::FillScreen).find("mesh")) ==
          "an inverse length in [100, 1e+06] 1/m");
    CHECK(expectation(*keyTable(Table::Gas).find("charge_temperature")) ==
          "a temperature in [1, 1000] K");
}

TEST_CASE("did-you-mean suggests only close names", "[input]")
{
    const std::vector<std::string> keys = {"length", "diameter", "wire_diameter",
                                           "cells"};
    CHECK(editDistance("wire_diamter", "wire_diameter") == 1);
    CHECK(editDistance("lenght", "length") == 1); // one transposition
    CHECK(editDistance("Cells", "cells") == 0);
    CHECK(closestName("wire_diamter", keys) ==
          std::optional<std::string>("wire_diameter"));
    CHECK(closestName("lenght", keys) == std::optional<std::string>("length"));
    CHECK_FALSE(closestName("colour", keys));
    CHECK_FALSE(closestName("len", keys));
    CHECK(didYouMean("diametr", keys) == " (did you mean 'diameter'?)");
    CHECK(didYouMean("volume", keys).empty());
}

TEST_CASE("an input error prints the place, the key, the line and a caret", "[input]")
{
    const std::string text = "gas:\n  species: helium\n  charge_pressure: 3 MPa\n";
    const InputError e({"c.yaml", 3, 20, "gas.charge_pressure"}, "3 MPa is too much",
                       "a pressure below 2 MPa", text);
    CHECK(
        std::string(e.what()) ==
        "c.yaml:3:20: error: gas.charge_pressure: 3 MPa is too much; expected a pressure "
        "below 2 MPa\n"
        "    3 |   charge_pressure: 3 MPa\n"
        "      |                    ^");
    CHECK(e.problem() == "3 MPa is too much");
    CHECK(e.mark().path == "gas.charge_pressure");

    // The caret counts characters, not bytes, and keeps tabs.
    CHECK(sourceExcerpt("a: \xc2\xb5m\tx: 1\n", 1, 8) == "    1 | a: \xc2\xb5m\tx: 1\n"
                                                         "      |      \t^");
    CHECK(sourceExcerpt("one line", 2, 1).empty());
    const InputError bare({"c.yaml", 0, 0, ""}, "cannot open", "", "");
    CHECK(std::string(bare.what()) == "c.yaml: error: cannot open");
}
