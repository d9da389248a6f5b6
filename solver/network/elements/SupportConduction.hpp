#pragma once
//! \file SupportConduction.hpp
//! Heat conducted into a cold body through its supports (rods, tubes, straps to the warm
//! structure) from their warm ends at the ambient temperature:
//!
//!   Q = n (A/L) integral_T^{T_amb} k dT,   dQ/dT = -n (A/L) k(T)                    [W]
//!
//! with the conductivity integral of the support material's NIST fit
//! (ConductivityIntegral.hpp; Ekin 2006, §2.2).

#include "solver/network/elements/BodyLoad.hpp"
#include "solver/network/elements/ConductivityIntegral.hpp"

namespace coldtip {

class SupportConduction final : public LoadLaw {
public:
    //! `count` supports of `material`, cross-section `area` [m^2], length `length` [m],
    //! warm ends at `ambient_temperature` [K].
    SupportConduction(const models::SolidTable& material, double area, double length, int count,
                      double ambient_temperature);
    models::Slope heat(double t, double T) const override;
    std::string describe() const override;

private:
    Conductor m_conductor;
    double m_ambient;
};

} // namespace coldtip
