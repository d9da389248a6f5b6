// Quantities with units converted to SI through udunits2.

#include "solver/input/UnitConverter.hpp"

#include <catch2/catch.hpp>
#include <string>
#include <thread>
#include <vector>

using coldtip::input::Dimension;
using coldtip::input::UnitConverter;
using coldtip::input::UnitError;

TEST_CASE("quantities convert to SI", "[input]")
{
    struct Row {
        const char* text;
        Dimension dimension;
        double si;
    };
    // Exact by definition: SI prefixes and T/K = t/degC + 273.15 (BIPM, The International
    // System of Units, 9th edition, 2019, sections 2.3.1 and 3); 1 in = 0.0254 m,
    // 1 degF = 5/9 K with -40 degF = -40 degC, 1 bar = 1e5 Pa (NIST SP 811, 2008,
    // appendix B.8).
    const Row rows[] = {
        {"20 mm", Dimension::Length, 0.020},
        {"30 um", Dimension::Length, 30e-6},
        {"1.5 m", Dimension::Length, 1.5},
        {"0.02", Dimension::Length, 0.02},
        {"+2e-3 m", Dimension::Length, 2e-3},
        {"12 mm^2", Dimension::Area, 12e-6},
        {"250 cm^3", Dimension::Volume, 2.5e-4},
        {"1.8 cm^3", Dimension::Volume, 1.8e-6},
        {"3.1 MPa", Dimension::Pressure, 3.1e6},
        {"30 bar", Dimension::Pressure, 3.0e6},
        {"300 K", Dimension::Temperature, 300.0},
        {"27 degC", Dimension::Temperature, 300.15},
        {"-40 degF", Dimension::Temperature, 233.15},
        {"55 Hz", Dimension::Frequency, 55.0},
        {"20 ms", Dimension::Time, 0.020},
        {"0.3 kg", Dimension::Mass, 0.3},
        {"2 W", Dimension::Power, 2.0},
        {"400 in^-1", Dimension::InverseLength, 400.0 / 0.0254},
        {"50 W/(m^2 K)", Dimension::HeatTransferCoefficient, 50.0},
        {"0.61", Dimension::Dimensionless, 0.61},
        {"45 %", Dimension::Dimensionless, 0.45},
    };
    const UnitConverter& units = UnitConverter::instance();
    for (const Row& row : rows) {
        INFO(row.text);
        CHECK(units.parse(row.text, row.dimension).value ==
              Approx(row.si).epsilon(1e-12));
    }
    CHECK(units.parse("400 in^-1", Dimension::InverseLength).value ==
          Approx(15748.03).epsilon(1e-7));
    CHECK(units.parse("0.02", Dimension::Length).unit.empty());
    CHECK(units.parse("27 degC", Dimension::Temperature).unit == "degC");
}

TEST_CASE("quantities of the wrong dimension or form are rejected", "[input]")
{
    const UnitConverter& units = UnitConverter::instance();
    CHECK_THROWS_AS(units.parse("20 kg", Dimension::Length), UnitError);
    CHECK_THROWS_WITH(units.parse("20 kg", Dimension::Length),
                      "the unit 'kg' is a mass, not a length");
    CHECK_THROWS_WITH(units.parse("2 N m", Dimension::Power),
                      Catch::StartsWith("the unit 'N m' is of dimension"));
    CHECK_THROWS_WITH(units.parse("3 blorbs", Dimension::Length),
                      "unknown unit 'blorbs'");
    CHECK_THROWS_WITH(units.parse("mm", Dimension::Length), "'mm' is not a number");
    CHECK_THROWS_WITH(units.parse("+-3 mm", Dimension::Length),
                      "'+-3 mm' is not a number");
    CHECK_THROWS_WITH(units.parse("inf", Dimension::Length),
                      "'inf' is not a finite number");
    CHECK_THROWS_WITH(units.parse("  ", Dimension::Length), "no value given");
    CHECK(coldtip::input::expectedQuantity(Dimension::HeatTransferCoefficient) ==
          "a heat-transfer coefficient in W/(m^2 K), e.g. \"50 W/(m^2 K)\"");
}

TEST_CASE("the unit system is shared safely between threads", "[input]")
{
    std::vector<double> results(8, 0.0);
    std::vector<std::thread> threads;
    for (std::size_t i = 0; i < results.size(); ++i)
        threads.emplace_back([&results, i] {
            for (int k = 0; k < 200; ++k)
                results[i] +=
                    UnitConverter::instance().parse("250 cm^3", Dimension::Volume).value;
        });
    for (std::thread& t : threads)
        t.join();
    for (double r : results)
        CHECK(r == Approx(200 * 2.5e-4));
}
