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

TEST_CASE("udunits2 syntax that would silently move a value is refused", "[input]")
{
    const UnitConverter& units = UnitConverter::instance();
    // Origin shifts and logarithmic units (UDUNITS-2 C API Guide, "Unit Syntax").
    CHECK_THROWS_WITH(units.parse("85 K @ 1000", Dimension::Temperature),
                      Catch::Contains("shifts the unit's origin ('@'"));
    for (const char* shifted : {"85 K since 1000", "85 K after 10", "85 K from 10",
                                "85 K ref 10", "20 s since 2020-01-01T00:00:00"})
        CHECK_THROWS_WITH(units.parse(shifted, Dimension::Temperature),
                          Catch::Contains("is udunits2's offset syntax"));
    CHECK_THROWS_WITH(units.parse("3 lg(re 1 W)", Dimension::Power),
                      Catch::Contains("is a logarithmic unit"));
    // A number in front of the unit is a scale factor: "85 1000 K" would be 85 000 K.
    CHECK_THROWS_WITH(units.parse("85 1000 K", Dimension::Temperature),
                      Catch::Contains("starts with a number"));
    // udunits2 counts the radian as 1; omega = 2 pi f: 345.6 rad/s is 55.00 Hz.
    CHECK_THROWS_WITH(units.parse("345.6 rad/s", Dimension::Frequency),
                      Catch::Contains("would be read as 345.6 Hz") &&
                          Catch::Contains("345.6 rad/s is 55.00 Hz"));
    CHECK_THROWS_WITH(units.parse("20000 degree/s", Dimension::Frequency),
                      Catch::Contains("'degree'"));
    // udunits2 defines rpm and cps through a revolution of 2 pi: 3000 rpm is 50 Hz, not
    // 314.2 Hz.
    CHECK_THROWS_WITH(units.parse("3000 rpm", Dimension::Frequency),
                      Catch::Contains("would be read as 314.159 Hz") &&
                          Catch::Contains("3000 rpm is 50.00 Hz"));
    CHECK_THROWS_WITH(units.parse("55 cps", Dimension::Frequency),
                      Catch::Contains("55 cps is 55.00 Hz"));
    CHECK(units.parse("55 Hz", Dimension::Frequency).value == 55.0);
    CHECK(units.parse("3300 min^-1", Dimension::Frequency).value == Approx(55.0));
    CHECK(units.parse("0.055 kHz", Dimension::Frequency).value == Approx(55.0));
    // udunits2 converts a unit to its reciprocal by inverting the value: "20 ms" would be
    // a frequency of 50 Hz, "25 um" a mesh of 40 000 per metre.
    CHECK_THROWS_WITH(units.parse("20 ms", Dimension::Frequency),
                      "the unit 'ms' is a time, the reciprocal of a frequency: udunits2 "
                      "would invert the value");
    CHECK_THROWS_WITH(units.parse("25 um", Dimension::InverseLength),
                      Catch::Contains("the reciprocal of an inverse length"));
    // Beyond a double: the message says so instead of "not a number".
    CHECK_THROWS_WITH(units.parse("1e400 Pa", Dimension::Pressure),
                      "'1e400' is beyond the range of a double (magnitude above "
                      "1.79769e+308)");
    CHECK_THROWS_WITH(units.parse("-1e400", Dimension::Pressure),
                      Catch::Contains("beyond the range of a double"));
    CHECK_THROWS_WITH(units.parse("1e-400 m", Dimension::Length),
                      Catch::Contains("too small in magnitude for a double"));
}

TEST_CASE("a temperature difference has no offset", "[input]")
{
    // A step of 1 degC is 1 K, of 1 degF 5/9 K (NIST SP 811, 2008, appendix B.8).
    const UnitConverter& units = UnitConverter::instance();
    CHECK(units.parse("0.05 degC", Dimension::TemperatureDifference).value ==
          Approx(0.05).epsilon(1e-12));
    CHECK(units.parse("0.1 degF", Dimension::TemperatureDifference).value ==
          Approx(0.1 * 5.0 / 9.0).epsilon(1e-12));
    CHECK(units.parse("50 mK", Dimension::TemperatureDifference).value ==
          Approx(0.05).epsilon(1e-12));
    CHECK(units.parse("0.05 degC", Dimension::Temperature).value ==
          Approx(273.2).epsilon(1e-12));
    CHECK_THROWS_WITH(units.parse("0.05 m", Dimension::TemperatureDifference),
                      "the unit 'm' is a length, not a temperature difference");
}
