#pragma once
//! \file LemmonJacobsenGas.hpp
//! Dilute-gas transport of nitrogen-like gases after E. W. Lemmon and R. T. Jacobsen,
//! "Viscosity and thermal conductivity equations for nitrogen, oxygen, argon, and air",
//! Int. J. Thermophys. 25, 21-69 (2004) (journal and title from memory; coefficients as
//! transcribed in three open-source property codes), Eqs. for the dilute-gas parts only:
//!   eta0 [uPa s] = 0.0266958 sqrt(M T) / (sigma^2 Omega(T*)),  M in g/mol, sigma in nm,
//!                  T* = T / (eps/k)
//!   ln Omega = 0.431 - 0.4623 ln T* + 0.08406 (ln T*)^2 + 0.005341 (ln T*)^3
//!              - 0.00331 (ln T*)^4
//!   lambda0 [mW/(m K)] = N1 eta0/(1 uPa s) + N2 tau^t2 + N3 tau^t3,  tau = T_c / T
//! The residual (density) and critical-enhancement terms of the paper are not included:
//! at 1 MPa and 280 K nitrogen they add 0.9 % to eta and 1.6 % to lambda.
//! Ideal diatomic gas: c_p = 7 R / (2 M) (equipartition, vibration frozen; common practice).

#include <string>

#include "models/gas/WorkingGas.hpp"

namespace coldtip::models {

//! Coefficients of one gas in the Lemmon-Jacobsen dilute-gas form.
struct LemmonJacobsenCoefficients {
    std::string name;
    double molar_mass = 0.0; //!< [kg/mol]
    double sigma = 0.0;      //!< Lennard-Jones size [nm]
    double epsilon_k = 0.0;  //!< Lennard-Jones energy / Boltzmann constant [K]
    double t_reducing = 0.0; //!< T_c used in tau [K]
    double n1 = 0.0, n2 = 0.0, t2 = 0.0, n3 = 0.0, t3 = 0.0; //!< lambda0 terms
    double t_min = 0.0;                                      //!< validity range [K]
    double t_max = 0.0;
};

class LemmonJacobsenGas : public WorkingGas {
public:
    explicit LemmonJacobsenGas(LemmonJacobsenCoefficients coefficients)
        : m_c(std::move(coefficients))
    {}
    std::string_view name() const override { return m_c.name; }
    //! M [kg/mol].
    double molarMass() const override { return m_c.molar_mass; }
    //! c_p = 7 R / (2 M) [J/(kg K)].
    double cp() const override { return 3.5 * gasConstant(); }
    //! eta0(T) [Pa s] (density ignored).
    double viscosity(double T, double rho) const override;
    //! lambda0(T) [W/(m K)] (density ignored).
    double conductivity(double T, double rho) const override;
    double minTemperature() const override { return m_c.t_min; }
    double maxTemperature() const override { return m_c.t_max; }

private:
    double diluteViscosityMicro(double T) const;
    LemmonJacobsenCoefficients m_c;
};

} // namespace coldtip::models
