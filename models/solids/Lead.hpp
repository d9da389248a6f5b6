#pragma once
//! \file Lead.hpp
//! Lead (regenerator spheres). LOW CONFIDENCE below room temperature: no NIST fit is
//! available for lead.
//!  - k = 35.3 W/(m K), the room-temperature value (27 C) of the CRC Handbook of Chemistry
//!    and Physics, 97th ed., as quoted by a materials data page, held at all temperatures.
//!    Real lead conducts better when cold (39.7 W/(m K) at 100 K in Incropera & DeWitt,
//!    Table A.1, from memory, and far more below 20 K), so matrix axial conduction is
//!    underestimated at the cold end.
//!  - c_p from the Debye model (DebyeHeatCapacity.hpp) with theta_D = 105 K (C. Kittel,
//!    "Introduction to Solid State Physics", Table of Debye temperatures, from memory),
//!    M = 207.2 g/mol: 7.95 (10 K), 40.9 (20 K), 97.5 (50 K), 119.7 (300 K) J/(kg K).
//!    Real lead is softer than a single-theta Debye solid at 10-20 K (about 20 % more c_p
//!    at 20 K), and above 100 K its c_p exceeds the Debye c_v (130 J/(kg K) at 25 C, CRC).
//! Density 11 350 kg/m^3 (CRC Handbook, 97th ed.). Range 1-300 K.

#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {

class Lead final : public SolidMaterial {
public:
    std::string_view name() const override { return "lead"; }
    //! 11 350 kg/m^3.
    double density() const override { return 11350.0; }
    //! Debye c_v(T) with theta_D = 105 K [J/(kg K)], held outside 1-300 K.
    double specificHeat(double T) const override;
    //! 35.3 W/(m K) at every temperature.
    double conductivity(double /*T*/) const override { return 35.3; }
    double minTemperature() const override { return 1.0; }
    double maxTemperature() const override { return 300.0; }
};

} // namespace coldtip::models
