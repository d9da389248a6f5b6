#pragma once
//! \file Gnielinski.hpp
//! Turbulent and transitional Nusselt number of fully developed tube flow.

#include "models/numeric/Slope.hpp"

namespace coldtip::models {

//! Gnielinski's correlation [-] and dNu/dRe at fixed Pr, with the Petukhov smooth-tube f:
//!   Nu = (f/8)(Re - 1000) Pr / (1 + 12.7 sqrt(f/8) (Pr^(2/3) - 1))
//! (V. Gnielinski, "New equations for heat and mass transfer in turbulent pipe and channel
//! flow", Int. Chem. Eng. 16, 359-368, 1976), stated for 3e3 <= Re <= 5e6,
//! 0.5 <= Pr <= 2000. Nu(1e4, 0.67) = 29.17. Negative below Re = 1000: use it only in the
//! turbulent part of a blend.
Slope gnielinskiNusselt(double Re, double Pr);

} // namespace coldtip::models
