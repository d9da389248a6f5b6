#pragma once
//! \file PhaseBoundary.hpp
//! Where a working gas stops being a gas: its critical point, its triple point and its
//! vapour-pressure curve between them. coldtip's gases are ideal gases with gas transport
//! properties, so a machine whose gas would condense or freeze at its charge pressure has
//! no meaning for them; the case reader refuses it with these data.
//!
//! Vapour pressure in Wagner's form (W. Wagner, Cryogenics 13, 470, 1973):
//!   ln(p_sat / p_c) = (T_c / T) sum_i a_i tau^e_i,   tau = 1 - T / T_c.
//! Where only two points of the curve are at hand, the one-term form a_1 tau is the
//! Clausius-Clapeyron line ln p = A - B/T through the critical point and that point.

#include <array>
#include <optional>
#include <string>
#include <string_view>

namespace coldtip::models {

struct PhaseBoundary {
    std::string_view species;     //!< as in case files
    double critical_temperature;  //!< T_c [K]
    double critical_pressure;     //!< p_c [Pa]
    //! T_t [K], below which the condensed phase is solid; 0: none (helium-4 stays liquid
    //! under its vapour pressure)
    double triple_temperature;
    std::array<double, 4> a;      //!< Wagner coefficients [-]
    std::array<double, 4> e;      //!< their exponents of tau [-]
    std::string_view source;      //!< where the curve comes from, for messages

    //! p_sat(T) [Pa] for T < T_c (p_c at and above T_c).
    double saturationPressure(double T) const;
    //! T_sat(p) [K] for p < p_c: below it the gas condenses (not below the triple point:
    //! under the triple-point pressure the gas freezes there); none for p >= p_c.
    std::optional<double> saturationTemperature(double p) const;
};

//! The phase boundary of `species`; std::invalid_argument for an unknown name.
const PhaseBoundary& phaseBoundary(std::string_view species);

} // namespace coldtip::models
