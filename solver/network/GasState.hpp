#pragma once
//! \file GasState.hpp
//! Thermodynamic state of the gas in one control volume, from its conserved variables.
//! Ideal gas with constant c_v (internal energy E = m c_v T):
//!   T = E/(m c_v),  p = (gamma - 1) E / V,  rho = m/V,  h = c_p T,
//! with viscosity and conductivity from the working gas's transport table at (T, rho).

#include "models/gas/TransportTable.hpp"
#include "models/gas/WorkingGas.hpp"
#include "solver/network/Dual.hpp"

namespace coldtip {

//! The working gas as the engine sees it: constants plus fast transport tables.
struct GasProperties {
    double R = 0.0;     //!< specific gas constant [J/(kg K)]
    double cp = 0.0;    //!< [J/(kg K)]
    double cv = 0.0;    //!< [J/(kg K)]
    double gamma = 0.0; //!< [-]
    const models::TransportTable* transport = nullptr;
};

template <class S>
struct GasState {
    S m;   //!< mass [kg]
    S E;   //!< internal energy [J]
    double V = 0.0; //!< volume [m^3] (time-dependent for a piston space)
    S T;   //!< temperature [K]
    S p;   //!< pressure [Pa]
    S rho; //!< density [kg/m^3]
    S h;   //!< specific enthalpy [J/kg]
    S mu;  //!< dynamic viscosity [Pa s]
    S k;   //!< thermal conductivity [W/(m K)]
};

template <class S>
GasState<S> gasState(const S& m, const S& E, double V, const GasProperties& gas)
{
    GasState<S> g;
    g.m = m;
    g.E = E;
    g.V = V;
    g.T = E / (m * gas.cv);
    g.p = (gas.gamma - 1.0) * E / V;
    g.rho = m / V;
    g.h = gas.cp * g.T;
    const double T = valueOf(g.T);
    const double rho = valueOf(g.rho);
    const models::TransportTable::Properties t = gas.transport->both(T, rho);
    g.mu = chain(t.viscosity, g.T, g.rho);
    g.k = chain(t.conductivity, g.T, g.rho);
    return g;
}

} // namespace coldtip
