#pragma once
//! \file RottFunctions.hpp
//! Rott's thermoviscous functions: the cross-section average of the transverse profile of
//! an oscillating quantity relative to its inviscid (adiabatic) value, for a pore of
//! characteristic size against a penetration depth delta (delta_nu = sqrt(2 mu/(rho omega))
//! for momentum, delta_kappa = sqrt(2 k/(rho c_p omega)) for heat), convention e^{+i omega t}:
//!   circular pore, radius r0:     f = 2 J1(z) / (z J0(z)),   z = (i - 1) r0/delta
//!   parallel plates, half-gap y0: f = tanh(z) / z,           z = (1 + i) y0/delta
//! (N. Rott, "Damped and thermally driven acoustic oscillations in wide and narrow tubes",
//! Z. Angew. Math. Phys. 20, 230, 1969; G. W. Swift, "Thermoacoustic engines", J. Acoust.
//! Soc. Am. 84, 1145, 1988, eqs. for f in circular and parallel-plate pores).
//! From f_nu follow Womersley's effective resistance and inertance per unit length
//! (J. R. Womersley, J. Physiol. 127, 553, 1955), and from f_kappa the real Nusselt number
//! this project uses for oscillating heat exchange at zero mean flow (see below).
//! Every function takes the ratio x = size/delta [-] and returns the slope d/dx as well.

#include <complex>

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! A complex function of a real ratio x and its derivative d/dx.
struct ComplexSlope {
    std::complex<double> value;
    std::complex<double> slope;
};

//! Circular pore: f(x) = 2 J1(z)/(z J0(z)), z = (i - 1) x, x = r0/delta [-].
//! J1/J0 from the backward recurrence of its continued fraction (|z| < 40) or the
//! asymptotic series of the Riccati equation r' = 1 - r/z + r^2 (|z| >= 40); checks:
//! f(1) = 0.925506 - 0.224410i, f(10) = 0.100069 - 0.094938i (physics reference §6.2).
ComplexSlope rottCircular(double x);
//! One minus the circular f, 1 - f = -J2(z)/J0(z), computed without cancellation as x -> 0.
ComplexSlope oneMinusRottCircular(double x);

//! Parallel plates: f(x) = tanh(z)/z, z = (1 + i) x, x = y0/delta [-];
//! f(1) = 0.677838 - 0.406085i (physics reference §6.2).
ComplexSlope rottPlates(double x);

//! Womersley's oscillating-flow resistance per length of a circular tube relative to the
//! Poiseuille value 8 mu/(pi r0^4), x = r0/delta_nu [-]:
//!   R'/R'_Pois = Re[ i alpha^2 / (8 (1 - f_nu)) ],   alpha = sqrt(2) x
//! (Womersley 1955; physics reference §6.5: 1.32236 at alpha = 5, 3.92709 at alpha = 20).
Slope womersleyResistanceFactor(double x);
//! Womersley's inertance per length relative to rho/A, x = r0/delta_nu [-]:
//!   L'/(rho/A) = Re[ 1/(1 - f_nu) ]   (4/3 as x -> 0, 1 as x -> infinity;
//! physics reference §6.5: 1.25396 at alpha = 5).
Slope womersleyInertanceFactor(double x);
//! Both of Womersley's factors at one x = r0/delta_nu, sharing one table lookup.
struct WomersleyFactors {
    Slope resistance;
    Slope inertance;
};
WomersleyFactors womersleyFactors(double x);

//! Nusselt number on the diameter, Nu = h D/k [-], of a real film coefficient whose
//! lumped gas-temperature response comes closest (in the complex plane) to Rott's thermal
//! function f_kappa of a circular tube at zero mean flow, x = r0/delta_kappa [-].
//! A cell with rho c_p dT/dt - dp/dt = h (4/D)(T_w - T) has the response function
//!   f_model = -i s/(1 - i s),   s = 4 h/(D omega rho c_p) = Nu/(2 x^2),
//! which runs over the circle |f - 1/2| = 1/2; s is taken at the point of that circle
//! nearest to f_kappa (radial projection, g = f_kappa - 1/2):
//!   s = -(|g| + Re g)/Im g,   Nu = 2 s x^2.
//! Limits: Nu -> 8 as x -> 0 (uniform volumetric heating of a tube, the exact
//! low-frequency value); Nu -> 2 x + 3 for a thin thermal layer. The compliance and the
//! thermal-relaxation loss then follow Rott's within 10 % of (gamma - 1) f_kappa at
//! x ~ 3 and within 3 % for x < 1 or x > 20 (derived here; DEVELOPERS.md).
Slope rottNusselt(double x);

} // namespace coldtip::models
