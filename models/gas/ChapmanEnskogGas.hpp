#pragma once
//! \file ChapmanEnskogGas.hpp
//! Monatomic dilute gas from Chapman-Enskog kinetic theory with a Lennard-Jones (12-6)
//! potential (J. O. Hirschfelder, C. F. Curtiss, R. B. Bird, "Molecular Theory of Gases and
//! Liquids", 1954, Eqs. 8.2-18 and 8.2-31, first approximation; equation numbers from
//! memory):
//!   eta    = (5/16) sqrt(pi m k_B T) / (pi sigma^2 Omega22(T*)),  m = M / N_A, T* = T/(eps/k)
//!   lambda = (15/4) (R/M) eta                       (monatomic: no internal energy)
//!   c_p    = 5 R / (2 M)
//! Reduced collision integral (P. D. Neufeld, A. R. Janzen, R. A. Aziz, "Empirical
//! equations to calculate 16 of the transport collision integrals Omega(l,s)* for the
//! Lennard-Jones (12-6) potential", J. Chem. Phys. 57, 1100, 1972; coefficients from
//! memory, matching an open-source transcription, as reprinted in B. E. Poling, J. M. Prausnitz, J. P. O'Connell, "The Properties
//! of Gases and Liquids", 5th ed., 2001, Eq. 9-4.3), for 0.3 <= T* <= 100:
//!   Omega22 = 1.16145 T*^-0.14874 + 0.52487 exp(-0.77320 T*) + 2.16178 exp(-2.43787 T*)
//! Typical accuracy of this combination for the noble gases: 1-3 % (from memory).
//! Density is ignored (no excess terms).

#include <string>

#include "models/gas/WorkingGas.hpp"

namespace coldtip::models {

//! Lennard-Jones parameters of one monatomic gas.
struct LennardJonesParameters {
    std::string name;
    double molar_mass = 0.0; //!< [kg/mol]
    double sigma = 0.0;      //!< collision diameter [m]
    double epsilon_k = 0.0;  //!< well depth / Boltzmann constant [K]
    double t_min = 0.0;      //!< validity range [K]
    double t_max = 0.0;
};

class ChapmanEnskogGas : public WorkingGas {
public:
    explicit ChapmanEnskogGas(LennardJonesParameters parameters)
        : m_p(std::move(parameters))
    {}
    std::string_view name() const override { return m_p.name; }
    //! M [kg/mol].
    double molarMass() const override { return m_p.molar_mass; }
    //! c_p = 5 R / (2 M) [J/(kg K)].
    double cp() const override { return 2.5 * gasConstant(); }
    //! eta(T) [Pa s] (density ignored).
    double viscosity(double T, double rho) const override;
    //! lambda(T) = 15/4 R_s eta(T) [W/(m K)] (density ignored).
    double conductivity(double T, double rho) const override;
    double minTemperature() const override { return m_p.t_min; }
    double maxTemperature() const override { return m_p.t_max; }

private:
    LennardJonesParameters m_p;
};

} // namespace coldtip::models
