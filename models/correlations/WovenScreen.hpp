#pragma once
//! \file WovenScreen.hpp
//! Stacked square-weave wire screens (regenerator matrix), oscillating-flow correlations of
//! D. Gedeon and J. G. Wood, "Oscillating-Flow Regenerator Test Rig: Hardware and Theory
//! With Derived Correlations for Screens and Felts", NASA CR-198442 (1996), on d_h and the
//! pore velocity (helium, porosity roughly 0.6-0.8 tested):
//!   f     = 129/Re + 2.91 Re^-0.103        =>  f Re = 129 + 2.91 Re^0.897
//!   Nu    = (1 + 0.99 Pe^0.66) phi^1.79     (Pe = Re Pr)
//!   k_eff,gas / k_gas = 1 + 0.5 Pe^0.66 phi^-2.91   (thermal dispersion)
//! (f as transcribed in two open-source codes; the Nu and dispersion constants are from
//! memory of the report and should be confirmed before relying on more than two figures.)
//! Check (phi = 0.686, Pr = 0.67): f(Re = 10) = 15.20, Nu(Re = 100) = 8.598.
//! Slopes of the Re^0.897, Pe^0.66 terms are evaluated at max(x, 1e-6) (PowerLaw.hpp).
//!
//! Geometry from mesh number m [wires per metre] and wire diameter d_w, layers stacked
//! without nesting, crimp neglected (W. M. Kays and A. L. London, "Compact Heat
//! Exchangers", 1964; from memory):
//!   phi = 1 - pi m d_w / 4,   a = 4 (1 - phi) / d_w,   d_h = phi d_w / (1 - phi)
//! A measured porosity may override phi (a and d_h then follow from it and d_w).

#include <optional>

#include "models/correlations/FlowPassage.hpp"

namespace coldtip::models {

class WovenScreen final : public FlowPassage {
public:
    //! Screens of `mesh` [1/m] and `wire_diameter` [m]; porosity from the geometry unless
    //! given. Throws std::invalid_argument for a porosity outside (0, 1).
    WovenScreen(double mesh, double wire_diameter, std::optional<double> porosity = {});
    //! 129 + 2.91 Re^0.897.
    Slope frictionTimesReynolds(double Re) const override;
    //! (1 + 0.99 Pe^0.66) phi^1.79, slope d/dRe.
    Slope nusselt(double Re, double Pr) const override;
    //! 1 + 0.5 Pe^0.66 phi^-2.91, slope d/dPe.
    Slope axialConductionFactor(double Pe) const override;

    //! phi = 1 - pi m d_w / 4 [-].
    static double geometricPorosity(double mesh, double wire_diameter);

private:
    struct Geometry {
        double wire_diameter;
        double porosity;
    };
    explicit WovenScreen(Geometry g);
    double m_nusseltScale;    // phi^1.79
    double m_dispersionScale; // 0.5 phi^-2.91
};

} // namespace coldtip::models
