#pragma once
//! \file FlowPassage.hpp
//! Closure laws of one kind of flow passage (open tube, slots, screen matrix, sphere bed),
//! all expressed on the hydraulic diameter d_h and the pore (interstitial) velocity
//! u = mdot / (rho phi A_frontal):
//!   Re = rho |u| d_h / mu,   Pe = Re Pr,   Nu = h d_h / k_gas,
//!   Darcy f: dp/dx = -f rho u |u| / (2 d_h)  =>  dp = (f Re) mu dx mdot / (2 rho A_flow d_h^2)
//! with A_flow = phi A_frontal. The engine evaluates the pressure drop in the last form,
//! which stays linear in mdot as Re -> 0; that is why f Re is the interface.
//! Every law returns its value and its slope with respect to its argument, finite for all
//! Re >= 0 (a negative Re is treated as 0).

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

class FlowPassage {
public:
    virtual ~FlowPassage() = default;

    //! Porosity phi = void volume / total volume [-] (1 for an open tube).
    double porosity() const { return m_porosity; }
    //! Hydraulic diameter d_h = 4 (flow area) / (wetted perimeter) [m].
    double hydraulicDiameter() const { return m_hydraulicDiameter; }
    //! Wetted area per unit of total (frontal) volume [1/m]: a = 4 phi / d_h.
    double wettedAreaPerVolume() const { return 4.0 * m_porosity / m_hydraulicDiameter; }

    //! Darcy friction factor times Reynolds number, f Re [-], and d(f Re)/dRe.
    virtual Slope frictionTimesReynolds(double Re) const = 0;
    //! Nusselt number on d_h [-] and dNu/dRe at fixed Pr.
    virtual Slope nusselt(double Re, double Pr) const = 0;
    //! Thermal-dispersion factor k_eff,gas / k_gas [-] and its slope d/dPe; 1 for plain
    //! channels.
    virtual Slope axialConductionFactor(double /*Pe*/) const { return {1.0, 0.0}; }

protected:
    //! Throws std::invalid_argument unless 0 < porosity <= 1 and hydraulic_diameter > 0.
    FlowPassage(double porosity, double hydraulic_diameter);

private:
    double m_porosity;
    double m_hydraulicDiameter;
};

} // namespace coldtip::models
