#pragma once
//! \file Stainless304.hpp
//! AISI 304 stainless steel, NIST cryogenic fits (NistCryogenicFit.hpp, log-polynomial):
//!   k:   a..i = -1.4087, 1.3982, 0.2543, -0.6260, 0.2334, 0.4256, -0.4658, 0.1650,
//!        -0.0199; 1-300 K (also used for 304L and 316)
//!   c_p: a..h = 22.0061, -127.5528, 303.6470, -381.0098, 274.0328, -112.9212, 24.7593,
//!        -2.239153; 4-300 K
//! Check: k(77 K) = 7.921 W/(m K), c_p(77 K) = 204.5 J/(kg K).
//! Density 7900 kg/m^3 (F. P. Incropera, D. P. DeWitt, "Fundamentals of Heat and Mass
//! Transfer", Table A.1; from memory).

#include "models/solids/NistCryogenicFit.hpp"
#include "models/solids/SolidMaterial.hpp"

namespace coldtip::models {

class Stainless304 final : public SolidMaterial {
public:
    std::string_view name() const override { return "stainless-304"; }
    //! 7900 kg/m^3.
    double density() const override { return 7900.0; }
    //! c_p(T) [J/(kg K)], NIST fit, held outside 4-300 K.
    double specificHeat(double T) const override { return kSpecificHeat(T); }
    //! k(T) [W/(m K)], NIST fit, held outside 1-300 K.
    double conductivity(double T) const override { return kConductivity(T); }
    double minTemperature() const override { return 4.0; }
    double maxTemperature() const override { return 300.0; }

private:
    static constexpr NistLogPolynomial kConductivity{
        {-1.4087, 1.3982, 0.2543, -0.6260, 0.2334, 0.4256, -0.4658, 0.1650, -0.0199},
        1.0,
        300.0};
    static constexpr NistLogPolynomial kSpecificHeat{{22.0061, -127.5528, 303.6470,
                                                      -381.0098, 274.0328, -112.9212,
                                                      24.7593, -2.239153, 0.0},
                                                     4.0,
                                                     300.0};
};

} // namespace coldtip::models
