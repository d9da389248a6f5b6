#pragma once
//! \file Slope.hpp
//! A value together with its derivatives, returned by the closure laws that the engine
//! differentiates analytically (friction factors, Nusselt numbers, tabulated properties).

namespace coldtip::models {

//! Value of a function of one argument and its derivative d(value)/d(argument).
struct Slope {
    double value = 0.0;
    double slope = 0.0;
};

//! Value of a function of temperature and density and its two partial derivatives.
struct Slope2 {
    double value = 0.0;
    double d_dT = 0.0;    //!< partial derivative with respect to temperature [unit/K]
    double d_drho = 0.0;  //!< partial derivative with respect to density [unit m^3/kg]
};

} // namespace coldtip::models
