#pragma once
//! \file RadiationLoad.hpp
//! Thermal radiation onto a cold body from a surrounding surface at ambient temperature:
//!
//!   Q = sigma eps A (T_amb^4 - T^4),   dQ/dT = -4 sigma eps A T^3                   [W]
//!
//! for a grey body of area A enclosed by a much larger surface (F. P. Incropera & D. P.
//! DeWitt, "Fundamentals of Heat and Mass Transfer", 6th ed. 2007, eq. 1.7), with eps the
//! body's emissivity, or, for a body wrapped in multilayer insulation, the blanket's
//! effective emissivity defined by the same law (R. F. Barron, "Cryogenic Systems", 2nd ed.
//! 1985, ch. 7). sigma = 5.670374419e-8 W/(m^2 K^4) (CODATA 2018).

#include "solver/network/elements/BodyLoad.hpp"

namespace coldtip {

inline constexpr double kStefanBoltzmann = 5.670374419e-8; //!< [W/(m^2 K^4)]

class RadiationLoad final : public LoadLaw {
public:
    //! Area [m^2], effective emissivity [-], surrounding temperature [K].
    RadiationLoad(double area, double emissivity, double ambient_temperature);
    models::Slope heat(double t, double T) const override;
    std::string describe() const override;

private:
    double m_sigma_eps_A;
    double m_ambient;
};

} // namespace coldtip
