#pragma once
//! \file UnitConverter.hpp
//! Quantities in case files: a bare number is taken as SI, a string "<number> <unit>"
//! ("20 mm", "3.1 MPa", "27 degC") is converted to SI through the udunits2 library
//! (Unidata, "UDUNITS-2 C API Guide", version 2.2). Units are converted here, at the edge,
//! to a stated dimension; nothing past the case reader sees a unit.

#include <array>
#include <memory>
#include <mutex>
#include <stdexcept>
#include <string>
#include <string_view>

// udunits2's opaque types, so that only UnitConverter.cpp includes <udunits2.h>.
union ut_unit;
struct ut_system;

namespace coldtip::input {

//! The physical dimensions a case-file quantity can have (the order is that of the table in
//! UnitConverter.cpp).
enum class Dimension {
    Length,        //!< [m]
    Area,          //!< [m^2]
    Volume,        //!< [m^3]
    Pressure,      //!< [Pa]
    Temperature,   //!< [K] absolute; "degC" and "degF" convert with their offset
    //! [K] a difference of temperatures (a tolerance): converted by the unit's scale only,
    //! so that 0.05 degC is 0.05 K and 0.1 degF is 0.0556 K, not 273.2 K or 255.4 K
    TemperatureDifference,
    Frequency,     //!< [Hz]
    Time,          //!< [s]
    Mass,          //!< [kg]
    Power,         //!< [W]
    InverseLength, //!< [1/m] screen mesh number
    HeatTransferCoefficient, //!< [W/(m^2 K)]
    ThermalConductance,      //!< [W/K]
    Dimensionless,           //!< [-]
};

//! Number of Dimension values.
inline constexpr int nDimensions = static_cast<int>(Dimension::Dimensionless) + 1;

//! How a dimension is named to the user.
struct DimensionInfo {
    std::string_view name;    //!< "length"
    std::string_view article; //!< "a" or "an"
    std::string_view
        siUnit; //!< SI unit as shown to users ("W/(m^2 K)"; "" if dimensionless)
    std::string_view example; //!< a quantity as a user would write it ("20 mm")
};

//! Name, SI unit and an example of `dimension`.
const DimensionInfo& describe(Dimension dimension);

//! "a length in m, e.g. "20 mm"": what a quantity of `dimension` must look like.
std::string expectedQuantity(Dimension dimension);

//! A quantity that cannot be read: an unknown unit, the wrong dimension, not a number.
//! Carries what was wrong only; the case reader adds the place and the expectation.
class UnitError : public std::runtime_error {
public:
    using std::runtime_error::runtime_error;
};

//! A quantity converted to SI, with the unit it was written in.
struct Quantity {
    double value = 0.0; //!< [SI unit of the dimension]
    std::string unit;   //!< as written; empty: a bare number, taken as SI
};

//! The process-wide udunits2 unit system. Loaded once, on first use (thread-safe); every
//! conversion holds a lock because udunits2's unit parser keeps global state.
class UnitConverter {
public:
    //! The single instance; throws std::runtime_error if the udunits2 XML database cannot
    //! be loaded (an installation fault, not bad input; UDUNITS2_XML_PATH overrides the path).
    static const UnitConverter& instance();

    //! `text` as written in a case file ("20 mm", "1e-3", "27 degC") in the SI unit of
    //! `dimension`: value_SI = cv(value) with cv the udunits2 converter unit -> SI unit
    //! (affine for temperatures; cv(value) - cv(0) for a temperature difference). A bare
    //! number is SI. Refused (UnitError): udunits2's origin-shift and logarithmic syntax
    //! ("85 K @ 1000", "s since 2020-01-01", "lg(re 1 W)"), a unit that starts with a
    //! number ("85 1000 K"), an angular unit for a frequency ("rad/s", "rpm": udunits2
    //! counts the radian as 1, so it would read 345.6 rad/s as 345.6 Hz), and numbers
    //! beyond the range of a double.
    Quantity parse(std::string_view text, Dimension dimension) const;

    //! `value` in `unit` converted to the SI unit of `dimension`. Throws UnitError.
    double toSi(double value, std::string_view unit, Dimension dimension) const;

    UnitConverter(const UnitConverter&) = delete;
    UnitConverter& operator=(const UnitConverter&) = delete;
    ~UnitConverter();

private:
    UnitConverter();

    struct UnitDeleter {
        void operator()(ut_unit* unit) const;
    };
    struct SystemDeleter {
        void operator()(ut_system* system) const;
    };
    using UnitPtr = std::unique_ptr<ut_unit, UnitDeleter>;

    //! The parsed unit, or UnitError naming it; caller holds m_mutex.
    UnitPtr parseUnit(std::string_view unit) const;
    //! "a mass" if `unit` has one of the known dimensions, else its SI definition.
    std::string dimensionOf(const ut_unit* unit) const;
    const ut_unit* siUnit(Dimension dimension) const;
    //! True if `a` and `b` have one dimension (not merely convertible: udunits2 also
    //! converts a unit to its reciprocal, inverting the value).
    bool sameDimension(const ut_unit* a, const ut_unit* b) const;
    //! UnitError if a name in `unit` (a frequency's) is dimensionless ("rad" in "rad/s")
    //! or a frequency other than the hertz ("rpm", "cps": udunits2 counts a revolution as
    //! 2 pi); `perSecond` is `value` as udunits2 converts it. Caller holds m_mutex.
    void refuseAngularUnit(double value, std::string_view unit, double perSecond) const;

    // Declared first so that it is destroyed last, after the units that belong to it.
    std::unique_ptr<ut_system, SystemDeleter> m_system;
    std::array<UnitPtr, nDimensions> m_siUnits; //!< indexed by Dimension
    mutable std::mutex m_mutex;
};

} // namespace coldtip::input
