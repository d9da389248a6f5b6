#pragma once
//! \file Quadrature.hpp
//! Cycle integrals. Every element registers the integrands it owns (PV work, enthalpy flow
//! through a face, heat through a wall...) as channels; CVODES integrates them as pure
//! quadratures, so cycle averages are exact integrals of the computed solution rather than
//! sums over sampled output. A channel that crosses the machine's boundary (an isothermal
//! wall, an applied load, the piston) carries the sign that turns it into "energy into the
//! machine" for the energy balance.

#include <string>

namespace coldtip {

struct QuadratureChannel {
    enum class Kind {
        PvWork,          //!< work done on the gas by a moving boundary [W]
        EnthalpyFlow,    //!< mdot h through a face, positive downstream [W]
        GasConduction,   //!< axial gas conduction through a junction face, downstream [W]
        WallHeat,        //!< heat from the walls/matrix of one component into its gas [W]
        SolidConduction, //!< heat conducted from a solid end into a neighbour's wall [W]
        AppliedLoad,     //!< heat applied to a body from outside [W]
    };
    std::string name;
    Kind kind = Kind::WallHeat;
    int component = -1;
    double x = 0.0; //!< axial position of the face or cell it belongs to [m]
    //! Thermal boundary (isothermal wall or lumped body) this heat flow leaves, -1 if none.
    int boundary = -1;
    //! +1 or -1: sign that turns the integrand into heat leaving `boundary` into the gas or
    //! the rest of the machine (0 if `boundary` < 0).
    double boundary_sign = 0.0;
    //! True if the integrand is energy entering the machine from outside (work, heat from an
    //! isothermal wall, applied load), with the sign already applied by `external_sign`.
    double external_sign = 0.0;
};

//! A thermal boundary: an isothermal wall (fixed temperature) or a lumped body (a solid node
//! under a load). Cooling power and rejected heat are sums over boundaries.
struct ThermalBoundary {
    std::string name;        //!< component name
    int component = -1;
    bool isothermal = true;
    double temperature = 0.0; //!< [K] isothermal walls
    int solid_node = -1;      //!< lumped bodies
};

} // namespace coldtip
