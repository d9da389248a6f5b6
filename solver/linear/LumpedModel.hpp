#pragma once
//! \file LumpedModel.hpp
//! The designer's RLC model: one node per component (DESIGN §4, physics reference §6.4),
//! in the volume-flow form p1 = Z U1 at the component's mean density rho, mean pressure
//! p_m and mean viscosity mu:
//!   inertance   L = K rho l / A                 [kg/m^4]   (K = 4/3 for a Poiseuille
//!               profile, r0/delta_nu <= 2 in an open tube; K = 1 otherwise)
//!   compliance  C = V/(gamma p_m)  adiabatic,  C = V/p_m  isothermal     [m^3/Pa]
//!               (isothermal where the gas exchanges heat with a wall or matrix whose
//!               hydraulic radius d_h/4 is below the thermal penetration depth delta_kappa)
//!   resistance  R = (f Re)_0 mu l / (2 A d_h^2)  [Pa s/m^3]  ((f Re)_0 = the passage's law
//!               at zero flow: 64 in a tube, R = 128 mu l/(pi D^4), Hagen-Poiseuille; the
//!               screen or sphere-bed law's viscous limit in a matrix)
//!   orifice     R = rho / (d mdot/d dp) of the orifice law at zero pressure difference
//! (G. W. Swift, "Thermoacoustics: A Unifying Perspective for Some Engines and
//! Refrigerators", ASA 2002, ch. 5; R. Radebaugh et al., "Inertance tube optimization for
//! pulse tube refrigerators", Adv. Cryog. Eng. 51, 59, 2006). Each component is a T section:
//! half its series impedance on either side of its compliance node; links across the path
//! are resistances between the nodes of the cells they join. Cooling estimate: the ideal
//! pulse tube's, the acoustic power leaving the cold exchanger (Radebaugh; physics
//! reference §7.2).

#include <string>
#include <vector>

#include "solver/components/Machine.hpp"
#include "solver/linear/Phasors.hpp"

namespace coldtip {

//! One component's lumped elements (volume-flow form).
struct LumpedElement {
    std::string name, kind;
    double length = 0.0;       //!< [m] (0 for lumped volumes and orifices)
    double flow_area = 0.0;    //!< [m^2]
    double volume = 0.0;       //!< gas volume [m^3]
    double density = 0.0;      //!< mean [kg/m^3]
    double pressure = 0.0;     //!< mean [Pa]
    double viscosity = 0.0;    //!< mean [Pa s]
    double inertance = 0.0;    //!< L [kg/m^4]
    double inertance_factor = 1.0; //!< K [-]
    double compliance = 0.0;   //!< C [m^3/Pa]
    bool isothermal = false;   //!< which compliance law
    double resistance = 0.0;   //!< R [Pa s/m^3]
};

struct LumpedModel {
    std::vector<LumpedElement> elements; //!< one per network component slice
    MachinePhasors phasors;
};

//! Elements from the machine's geometry and the mean state y_m; the ladder solved at the
//! drive frequency for the machine's piston (amplitude scale included).
LumpedModel solveLumped(const Machine& machine, const std::vector<double>& mean_state);

} // namespace coldtip
