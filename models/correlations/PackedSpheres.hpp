#pragma once
//! \file PackedSpheres.hpp
//! Randomly packed bed of spheres of diameter d_p (regenerator matrix), geometry
//! (common practice): a = 6 (1 - phi) / d_p, d_h = 4 phi / a = 2 phi d_p / (3 (1 - phi)).
//!
//! Friction: S. Ergun, "Fluid flow through packed columns", Chem. Eng. Prog. 48, 89-94
//! (1952) (title from memory), with superficial velocity u_s:
//!   -dp/dx = 150 mu (1-phi)^2 u_s / (phi^3 d_p^2) + 1.75 rho (1-phi) u_s^2 / (phi^3 d_p)
//! Converted exactly to d_h and the pore velocity u = u_s / phi, with
//! -dp/dx = (f Re) mu u / (2 d_h^2) and Re = rho u d_h / mu:
//!   viscous term:  150 mu (1-phi)^2 phi u / (phi^3 d_p^2), and d_p = 3 (1-phi) d_h/(2 phi)
//!                  gives d_p^2 = 9 (1-phi)^2 d_h^2 / (4 phi^2), so the term is
//!                  (600/9) mu u / d_h^2 = (f Re)_1 mu u / (2 d_h^2)  =>  (f Re)_1 = 400/3;
//!   inertial term: 1.75 rho (1-phi) phi^2 u^2 / (phi^3 d_p) = 1.75 rho u^2 2 phi (1-phi)
//!                  / (3 phi (1-phi) d_h) = (3.5/3) rho u^2 / d_h = f_2 rho u^2 / (2 d_h)
//!                  =>  f_2 = 7/3, (f Re)_2 = (7/3) Re.
//!   f Re = 400/3 + (7/3) Re      (independent of phi on these variables)
//! Check: phi = 0.38, d_p = 100 um, mu = 2e-5 Pa s, rho = 4.8 kg/m^3, u_s = 0.1 m/s
//! -> 2.197e5 Pa/m.
//!
//! Heat transfer: N. Wakao, S. Kaguei, "Heat and Mass Transfer in Packed Beds" (1982);
//! N. Wakao, S. Kaguei, T. Funazkri, Chem. Eng. Sci. 34, 325 (1979) (from memory):
//!   Nu_p = h d_p / k = 2 + 1.1 Pr^(1/3) Re_p^0.6,  Re_p = rho u_s d_p / mu (fitted for
//!   about 15 < Re_p < 8500)
//! On d_h and pore velocity: Re_p = Re phi d_p / d_h = 1.5 (1 - phi) Re and
//!   Nu = h d_h / k = Nu_p d_h / d_p = Nu_p 2 phi / (3 (1 - phi)).
//! The slope of Re_p^0.6 is evaluated at max(Re_p, 1e-6) (PowerLaw.hpp).
//! Thermal dispersion is not modelled for sphere beds (factor 1).

#include "models/correlations/FlowPassage.hpp"

namespace coldtip::models {

class PackedSpheres final : public FlowPassage {
public:
    //! Bed of spheres of `sphere_diameter` [m] at `porosity` (0 < phi < 1) [-].
    PackedSpheres(double sphere_diameter, double porosity);
    //! 400/3 + (7/3) Re.
    Slope frictionTimesReynolds(double Re) const override;
    //! Wakao-Kaguei on d_h, slope d/dRe.
    Slope nusselt(double Re, double Pr) const override;

    double sphereDiameter() const { return m_sphereDiameter; }

private:
    double m_sphereDiameter;
};

} // namespace coldtip::models
