#include "solver/input/UnitConverter.hpp"

#include <udunits2.h>

#include <cctype>
#include <numbers>
#include <charconv>
#include <cmath>
#include <cstdlib>
#include <fmt/format.h>
#include <limits>
#include <vector>

namespace coldtip::input {

namespace {

struct DimensionRow {
    DimensionInfo info;
    const char* udunitsSpelling; // how udunits2 parses the SI unit
};

// Indexed by Dimension; the order must follow the enum.
constexpr DimensionRow kDimensions[nDimensions] = {
    {{"length", "a", "m", "20 mm"}, "m"},
    {{"area", "an", "m^2", "12 mm^2"}, "m^2"},
    {{"volume", "a", "m^3", "250 cm^3"}, "m^3"},
    {{"pressure", "a", "Pa", "3.1 MPa"}, "Pa"},
    {{"temperature", "a", "K", "300 K"}, "K"},
    {{"temperature difference", "a", "K", "0.05 K"}, "K"},
    {{"frequency", "a", "Hz", "55 Hz"}, "Hz"},
    {{"time", "a", "s", "20 ms"}, "s"},
    {{"mass", "a", "kg", "0.3 kg"}, "kg"},
    {{"power", "a", "W", "2 W"}, "W"},
    {{"inverse length", "an", "1/m", "400 in^-1"}, "m^-1"},
    {{"heat-transfer coefficient", "a", "W/(m^2 K)", "50 W/(m^2 K)"}, "W/(m^2 K)"},
    {{"thermal conductance", "a", "W/K", "2 W/K"}, "W/K"},
    {{"number", "a", "", "0.5"}, "1"},
};

std::string_view trim(std::string_view s)
{
    const auto first = s.find_first_not_of(" \t\r\n");
    if (first == std::string_view::npos)
        return {};
    const auto last = s.find_last_not_of(" \t\r\n");
    return s.substr(first, last - first + 1);
}

struct ConverterDeleter {
    void operator()(cv_converter* converter) const { cv_free(converter); }
};

bool isIdentifierByte(char c)
{
    const auto u = static_cast<unsigned char>(c);
    return std::isalpha(u) || c == '_' || u >= 0x80; // UTF-8 bytes: "°", "µ"
}

// The names in a unit's spelling ("rad", "s" in "rad/s"), in order.
std::vector<std::string> identifiers(std::string_view unit)
{
    std::vector<std::string> words;
    for (std::size_t i = 0; i < unit.size();) {
        if (!isIdentifierByte(unit[i])) {
            ++i;
            continue;
        }
        std::size_t end = i;
        while (end < unit.size() &&
               (isIdentifierByte(unit[end]) ||
                std::isdigit(static_cast<unsigned char>(unit[end]))))
            ++end;
        words.emplace_back(unit.substr(i, end - i));
        i = end;
    }
    return words;
}

// udunits2's grammar also shifts a unit's origin ("K @ 1000", "s since 2020-01-01", with
// '@', "after", "from", "since" or "ref") and reads logarithmic units ("lg(re 1 mW)")
// (UDUNITS-2 C API Guide, "Unit Syntax"). A case file means neither: each would move the
// value silently ("85 K @ 1000" is 1085 K). A unit starting with a number is a scale
// factor ("85 1000 K" is 85000 K), never what was meant either.
void refuseUnitSyntax(std::string_view unit)
{
    if (unit.empty())
        return;
    if (unit.find('@') != std::string_view::npos)
        throw UnitError(fmt::format(
            "'{}' shifts the unit's origin ('@' is udunits2's offset syntax: \"85 K @ "
            "1000\" would be 1085 K), which case files do not accept",
            unit));
    for (const std::string& word : identifiers(unit)) {
        std::string lower = word;
        for (char& c : lower)
            c = static_cast<char>(std::tolower(static_cast<unsigned char>(c)));
        if (lower == "since" || lower == "after" || lower == "from" || lower == "ref")
            throw UnitError(fmt::format(
                "'{}' shifts the unit's origin ('{}' is udunits2's offset syntax, as in "
                "timestamps), which case files do not accept",
                unit, word));
        if (lower == "re")
            throw UnitError(fmt::format(
                "'{}' is a logarithmic unit (udunits2's \"lg(re ...)\" syntax), which "
                "case files do not accept",
                unit));
    }
    const auto first = static_cast<unsigned char>(unit.front());
    if (std::isdigit(first) || first == '.' || first == '+' || first == '-')
        throw UnitError(fmt::format(
            "the unit '{}' starts with a number (udunits2 would take it as a scale factor "
            "and multiply the value by it)",
            unit));
}

} // namespace

const DimensionInfo& describe(Dimension dimension)
{
    return kDimensions[static_cast<int>(dimension)].info;
}

std::string expectedQuantity(Dimension dimension)
{
    const DimensionInfo& d = describe(dimension);
    if (d.siUnit.empty())
        return fmt::format("{} {}, e.g. {}", d.article, d.name, d.example);
    return fmt::format("{} {} in {}, e.g. \"{}\"", d.article, d.name, d.siUnit,
                       d.example);
}

void UnitConverter::UnitDeleter::operator()(ut_unit* unit) const
{
    ut_free(unit);
}
void UnitConverter::SystemDeleter::operator()(ut_system* system) const
{
    ut_free_system(system);
}

const UnitConverter& UnitConverter::instance()
{
    static const UnitConverter converter;
    return converter;
}

UnitConverter::UnitConverter()
{
    // udunits2 prints every parse failure to stderr by default; the reader reports them.
    ut_set_error_message_handler(ut_ignore);
    m_system.reset(ut_read_xml(nullptr));
    if (!m_system)
        throw std::runtime_error(
            fmt::format("cannot load the udunits2 unit database (udunits2 status {}); "
                        "set UDUNITS2_XML_PATH to its udunits2.xml",
                        static_cast<int>(ut_get_status())));
    for (int i = 0; i < nDimensions; ++i) {
        m_siUnits[i].reset(
            ut_parse(m_system.get(), kDimensions[i].udunitsSpelling, UT_ASCII));
        if (!m_siUnits[i])
            throw std::logic_error(fmt::format("udunits2 does not know the SI unit '{}'",
                                               kDimensions[i].udunitsSpelling));
    }
}

UnitConverter::~UnitConverter() = default;

const ut_unit* UnitConverter::siUnit(Dimension dimension) const
{
    return m_siUnits[static_cast<int>(dimension)].get();
}

UnitConverter::UnitPtr UnitConverter::parseUnit(std::string_view unit) const
{
    const std::string spelling(trim(unit));
    UnitPtr parsed(ut_parse(m_system.get(), spelling.c_str(), UT_UTF8));
    if (!parsed)
        throw UnitError(fmt::format("unknown unit '{}'", spelling));
    return parsed;
}

bool UnitConverter::sameDimension(const ut_unit* a, const ut_unit* b) const
{
    // ut_are_convertible also holds for reciprocal units (s and Hz, um and 1/m), which
    // udunits2 converts by inverting the value; a quantity of one dimension is never meant
    // as its reciprocal. Same dimension: a / b is dimensionless.
    const UnitPtr ratio(ut_divide(a, b));
    return ratio && ut_are_convertible(ratio.get(), siUnit(Dimension::Dimensionless));
}

std::string UnitConverter::dimensionOf(const ut_unit* unit) const
{
    for (int i = 0; i < nDimensions; ++i)
        if (sameDimension(unit, m_siUnits[i].get()))
            return fmt::format("{} {}", kDimensions[i].info.article,
                               kDimensions[i].info.name);
    char definition[128];
    if (ut_format(unit, definition, sizeof definition, UT_ASCII | UT_DEFINITION) < 0)
        return "of another dimension";
    return fmt::format("of dimension {}", definition);
}

void UnitConverter::refuseAngularUnit(double value, std::string_view unit,
                                      double perSecond) const
{
    // udunits2 counts the radian (and every other angle or ratio) as the number 1 and the
    // revolution and the cycle as 2 pi, so "345.6 rad/s" converts to 345.6 Hz although it
    // is 55.0 Hz (omega = 2 pi f), and "3000 rpm" or "50 cps" to 2 pi times their value in
    // Hz. Refuse any dimensionless name in a frequency's unit, and any name that is itself
    // a frequency but not the hertz.
    const std::string advice = fmt::format(
        "give the frequency in Hz (if '{}' measures an angle, revolutions or cycles, {:g} "
        "{} is {:#.4g} Hz = omega / (2 pi))",
        unit, value, unit, perSecond / (2.0 * std::numbers::pi));
    for (const std::string& word : identifiers(unit)) {
        const UnitPtr part(ut_parse(m_system.get(), word.c_str(), UT_UTF8));
        if (!part)
            continue;
        if (sameDimension(part.get(), siUnit(Dimension::Dimensionless)))
            throw UnitError(fmt::format(
                "'{}' holds '{}', an angle or a ratio that udunits2 counts as a number, so "
                "{:g} {} would be read as {:g} Hz; {}",
                unit, word, value, unit, perSecond, advice));
        const bool hertz = word.ends_with("Hz") || word.ends_with("hertz");
        if (!hertz && sameDimension(part.get(), siUnit(Dimension::Frequency)))
            throw UnitError(fmt::format(
                "'{}' is a rate that udunits2 defines through an angle or a count, not the "
                "hertz, so {:g} {} would be read as {:g} Hz; {}",
                word, value, unit, perSecond, advice));
    }
}

double UnitConverter::toSi(double value, std::string_view unit, Dimension dimension) const
{
    const std::lock_guard lock(m_mutex);
    refuseUnitSyntax(trim(unit));
    const UnitPtr from = parseUnit(unit);
    if (!sameDimension(from.get(), siUnit(dimension)) &&
        ut_are_convertible(from.get(), siUnit(dimension)))
        throw UnitError(fmt::format(
            "the unit '{}' is {}, the reciprocal of {} {}: udunits2 would invert the "
            "value",
            trim(unit), dimensionOf(from.get()), describe(dimension).article,
            describe(dimension).name));
    if (!sameDimension(from.get(), siUnit(dimension)))
        throw UnitError(fmt::format("the unit '{}' is {}, not {} {}", trim(unit),
                                    dimensionOf(from.get()), describe(dimension).article,
                                    describe(dimension).name));
    const std::unique_ptr<cv_converter, ConverterDeleter> converter(
        ut_get_converter(from.get(), const_cast<ut_unit*>(siUnit(dimension))));
    if (!converter)
        throw UnitError(fmt::format("cannot convert '{}' to {}", trim(unit),
                                    describe(dimension).siUnit));
    if (dimension == Dimension::Frequency)
        refuseAngularUnit(value, trim(unit), cv_convert_double(converter.get(), value));
    // A difference keeps the unit's scale and drops its offset: cv(value) - cv(0).
    const double si = dimension == Dimension::TemperatureDifference
                          ? cv_convert_double(converter.get(), value) -
                                cv_convert_double(converter.get(), 0.0)
                          : cv_convert_double(converter.get(), value);
    if (!std::isfinite(si))
        throw UnitError(
            fmt::format("{} {} is not a finite number in SI", value, trim(unit)));
    return si;
}

Quantity UnitConverter::parse(std::string_view text, Dimension dimension) const
{
    const std::string_view written = trim(text);
    if (written.empty())
        throw UnitError("no value given");
    // from_chars rejects a leading '+', which people do write.
    const std::string_view digits = written.front() == '+' ? written.substr(1) : written;
    double value = 0.0;
    const auto [end, ec] =
        std::from_chars(digits.data(), digits.data() + digits.size(), value);
    const bool doubleSign =
        written.front() == '+' && !digits.empty() && digits.front() == '-';
    if (ec == std::errc::result_out_of_range && !doubleSign) {
        // from_chars leaves `value` unset here; strtod tells overflow from underflow.
        const std::string number(digits.data(), end);
        const bool overflow = std::fabs(std::strtod(number.c_str(), nullptr)) > 1.0;
        if (overflow)
            throw UnitError(fmt::format(
                "'{}' is beyond the range of a double (magnitude above {:g})", number,
                std::numeric_limits<double>::max()));
        throw UnitError(fmt::format(
            "'{}' is too small in magnitude for a double (it would round to 0); write 0 "
            "or use a smaller unit",
            number));
    }
    if (ec != std::errc() || doubleSign)
        throw UnitError(fmt::format("'{}' is not a number", written));
    if (!std::isfinite(value))
        throw UnitError(fmt::format("'{}' is not a finite number", written));
    const std::string_view unit =
        trim({end, static_cast<std::size_t>(digits.data() + digits.size() - end)});
    if (unit.empty())
        return {value, {}};
    return {toSi(value, unit, dimension), std::string(unit)};
}

} // namespace coldtip::input
