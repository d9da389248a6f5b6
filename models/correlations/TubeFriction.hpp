#pragma once
//! \file TubeFriction.hpp
//! Turbulent Darcy friction factors of fully developed flow in a straight tube (Re on the
//! diameter or hydraulic diameter), with df/dRe.

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! Haaland's explicit approximation of the Colebrook equation [-], with roughness:
//!   1/sqrt(f) = -1.8 log10[ (eps/D / 3.7)^1.11 + 6.9/Re ]
//! (S. E. Haaland, "Simple and explicit formulas for the friction factor in turbulent pipe
//! flow", J. Fluids Eng. 105, 89-90, 1983; journal details from memory). Within about 2 %
//! of Colebrook for 4e3 <= Re <= 1e8. Smooth tube: f(1e4) = 0.03089.
Slope haalandFriction(double Re, double relative_roughness);

//! Petukhov / Filonenko smooth-tube friction factor [-]:  f = (0.790 ln Re - 1.64)^-2
//! (B. S. Petukhov, "Heat transfer and friction in turbulent pipe flow with variable
//! physical properties", Adv. Heat Transfer 6, 503-564, 1970; from memory), the form used in
//! Gnielinski (1976), 3e3 <= Re <= 5e6. f(1e4) = 0.03148.
Slope petukhovFriction(double Re);

} // namespace coldtip::models
