#pragma once
//! \file ConductivityIntegral.hpp
//! Steady conduction through a conductor without heat capacity of its own (a strap, a rod,
//! a support) between end temperatures T_1 and T_2, by the thermal conductivity integral:
//!
//!   Q = (A/L) integral_{T_1}^{T_2} k(T) dT                                          [W]
//!
//! (Fourier's law q = -k(T) dT/dx integrated along a uniform bar at constant Q; J. W. Ekin,
//! "Experimental Techniques for Low-Temperature Measurements", 2006, §2.2.) The integral is
//! that of the material's NIST-fit table (SolidTable::conductivityIntegral), so its partials
//! are exactly dQ/dT_2 = (A/L) k(T_2), dQ/dT_1 = -(A/L) k(T_1).

#include "models/solids/SolidTable.hpp"
#include "solver/network/Dual.hpp"

namespace coldtip {

//! integral_{T1}^{T2} k dT [W/m] of `material`, with its exact partials when dual.
template <class S>
S conductivityIntegral(const models::SolidTable& material, const S& T1, const S& T2)
{
    const double t1 = valueOf(T1), t2 = valueOf(T2);
    const double value = material.conductivityIntegral(t1, t2);
    return chain(models::Slope{0.0, material.conductivity(t2).value}, T2) -
           chain(models::Slope{0.0, material.conductivity(t1).value}, T1) + value;
}

//! A conductor between two temperatures: a constant conductance G (a bolted or clamped
//! joint, Q = G (T_1 - T_2)) or a bar of a NIST material with the conductance factor A/L.
struct Conductor {
    const models::SolidTable* material = nullptr; //!< null: constant conductance
    double area_over_length = 0.0;                //!< A/L [m]
    double conductance = 0.0;                     //!< G [W/K] without a material
    double count = 1.0;                           //!< identical conductors in parallel

    //! Heat from end 1 at T1 to end 2 at T2 [W].
    template <class S> S heat(const S& T1, const S& T2) const
    {
        if (!material) return count * conductance * (T1 - T2);
        return count * area_over_length * conductivityIntegral(*material, T2, T1);
    }
};

} // namespace coldtip
