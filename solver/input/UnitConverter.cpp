#include "solver/input/UnitConverter.hpp"

#include <udunits2.h>

#include <charconv>
#include <cmath>
#include <fmt/format.h>

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

std::string UnitConverter::dimensionOf(const ut_unit* unit) const
{
    for (int i = 0; i < nDimensions; ++i)
        if (ut_are_convertible(unit, m_siUnits[i].get()))
            return fmt::format("{} {}", kDimensions[i].info.article,
                               kDimensions[i].info.name);
    char definition[128];
    if (ut_format(unit, definition, sizeof definition, UT_ASCII | UT_DEFINITION) < 0)
        return "of another dimension";
    return fmt::format("of dimension {}", definition);
}

double UnitConverter::toSi(double value, std::string_view unit, Dimension dimension) const
{
    const std::lock_guard lock(m_mutex);
    const UnitPtr from = parseUnit(unit);
    if (!ut_are_convertible(from.get(), siUnit(dimension)))
        throw UnitError(fmt::format("the unit '{}' is {}, not {} {}", trim(unit),
                                    dimensionOf(from.get()), describe(dimension).article,
                                    describe(dimension).name));
    const std::unique_ptr<cv_converter, ConverterDeleter> converter(
        ut_get_converter(from.get(), const_cast<ut_unit*>(siUnit(dimension))));
    if (!converter)
        throw UnitError(fmt::format("cannot convert '{}' to {}", trim(unit),
                                    describe(dimension).siUnit));
    const double si = cv_convert_double(converter.get(), value);
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
