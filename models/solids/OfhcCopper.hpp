#pragma once
//! \file OfhcCopper.hpp
//! OFHC copper, NIST cryogenic fits (NistCryogenicFit.hpp):
//!   c_p (log-polynomial), a..h = -1.91844, -0.15973, 8.61013, -18.996, 21.9661, -12.7328,
//!        3.54322, -0.3797; 4-300 K
//!   k (rational in sqrt(T)), 4-300 K, for residual-resistance ratio RRR = 50, 100, 150:
//!     RRR  50: 1.8743, -0.41538, -0.6018, 0.13294, 0.26426, -0.0219, -0.051276, 0.0014871,
//!              0.003723
//!     RRR 100: 2.2154, -0.47461, -0.88068, 0.13871, 0.29505, -0.02043, -0.04831, 0.001281,
//!              0.003207
//!     RRR 150: 2.3797, -0.4918, -0.98615, 0.13942, 0.30475, -0.019713, -0.046897,
//!              0.0011969, 0.0029988
//! Check: k(20 K) = 1368 (RRR 50), 2423 (RRR 100) W/(m K); c_p(77 K) = 195.9 J/(kg K).
//! Density 8960 kg/m^3 (as coded with the NIST fits; pure Cu 8933 in Incropera & DeWitt
//! Table A.1, from memory).

#include <string>

#include "models/solids/NistCryogenicFit.hpp"
#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {

class OfhcCopper final : public SolidMaterial {
public:
    //! Copper of residual-resistance ratio `rrr` (50, 100 or 150; otherwise throws
    //! std::invalid_argument), listed under `name`.
    OfhcCopper(std::string name, int rrr);
    std::string_view name() const override { return m_name; }
    //! 8960 kg/m^3.
    double density() const override { return 8960.0; }
    //! c_p(T) [J/(kg K)], NIST fit, held outside 4-300 K (independent of RRR).
    double specificHeat(double T) const override { return kSpecificHeat(T); }
    //! k(T) [W/(m K)], NIST rational fit for the RRR, held outside 4-300 K.
    double conductivity(double T) const override { return m_conductivity(T); }
    double minTemperature() const override { return 4.0; }
    double maxTemperature() const override { return 300.0; }

private:
    static constexpr NistLogPolynomial kSpecificHeat{
        {-1.91844, -0.15973, 8.61013, -18.996, 21.9661, -12.7328, 3.54322, -0.3797, 0.0},
        4.0,
        300.0};
    std::string m_name;
    NistCopperRational m_conductivity;
};

} // namespace coldtip::models
