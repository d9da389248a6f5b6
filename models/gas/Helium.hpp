#pragma once
//! \file Helium.hpp
//! Helium-4 as an ideal gas with density-dependent transport properties.
//!
//! Thermodynamics: ideal monatomic gas, c_p = 5 R / (2 M) = 5193.2 J/(kg K),
//! M = 4.002602 g/mol (IUPAC; NIST SRD 134 helium-4 page).
//!
//! Viscosity (V. D. Arp, R. D. McCarty, D. G. Friend, "Thermophysical properties of
//! helium-4 from 0.8 to 1500 K with pressures to 2000 MPa", NIST Technical Note 1334,
//! revised 1998 (title from memory); coefficients as transcribed in open-source property
//! code), in
//! ug/(cm s) = 1e-7 Pa s, x = ln T, rho in g/cm^3:
//!   low-T dilute branch   ln eta0_L = -0.135311743/x + 1.00347841 + 1.20654649 x
//!                                     - 0.149564551 x^2 + 0.012520841 x^3
//!   high-T dilute branch  eta0_H = 196 T^0.71938 exp(12.451/T - 295.67/T^2 - 4.1249)
//!   density excess        eta = eta0 + eta0_L (exp(E) - 1),  E = rho B + rho^2 C + rho^3 D
//!                         with B, C, D cubic in x' and 1/x', x' = ln(min(T, 300 K)).
//! TN 1334 switches from the low-T to the high-T branch at 100 K, where they differ by 2 %
//! (9.765 vs 9.568 uPa s; the high-T branch matches Hurly & Moldover 2000). A step would
//! break the solver's Jacobian, so here eta0 = (1 - w) eta0_L + w eta0_H with a C1
//! smoothstep w over 90-110 K (a deliberate deviation of at most 1 % from TN 1334 inside
//! that band; exact outside it). Likewise the corner of min(T, 300 K) is rounded by a
//! quadratic over 280-320 K (changes eta by < 1e-4 at gas densities).
//!
//! Thermal conductivity (B. A. Hands and V. D. Arp, "A correlation of thermal conductivity
//! data for helium", Cryogenics 21(12), 697-703, 1981; coefficients as transcribed in
//! open-source property code), W/(m K), rho in kg/m^3:
//!   lambda0 = 2.7870034e-3 T^0.7034007057 exp(3.739232544/T - 26.20316969/T^2
//!                                             + 59.82252246/T^3 - 49.26397634/T^4)
//!   lambda  = lambda0 + (c1 + c2 T + c3 T^(1/3) + c4 T^(2/3)) rho
//!             + (c5 + c6 T^(1/3) + c7 T^(2/3)) rho^3
//!             + (c8 + c9 T^(1/3) + c10 T^(2/3) + c11/T) rho^2 ln(rho/68)   (Eq. 17)
//! The critical-enhancement term is omitted (it matters only within a few kelvin of the
//! 5.2 K critical point). Against the ab initio dilute values of J. J. Hurly and
//! M. R. Moldover (J. Res. NIST 105, 667, 2000), Hands-Arp lambda0 is -1.6 % at 100 K and
//! 0.0 % at 300 K; below 80 K the two correlations imply an Eucken factor
//! lambda/(15/4 R_s eta) of 0.94-0.96 instead of the kinetic-theory 1.00, i.e. one or both
//! are 2-4 % off there.
//!
//! Range used here: 2.5-1500 K (the published validity limits of both correlations were
//! not re-checked; below about 2.5 K the 1/T^4 term of lambda0 runs away), and densities
//! up to 200 kg/m^3, above the 125-145 kg/m^3 of liquid helium (from memory) and beyond any
//! fluid state of a cryocooler. Above it the excess terms diverge (exp(E) reaches 1e9 at
//! 2.5 K and 400 kg/m^3; lambda turns negative above 500 K and 300 kg/m^3), so both
//! properties are held at 200 kg/m^3.

#include "models/gas/WorkingGas.hpp"

namespace coldtip::models {

class Helium final : public WorkingGas {
public:
    //! "helium".
    std::string_view name() const override { return "helium"; }
    //! M = 4.002602e-3 kg/mol.
    double molarMass() const override { return 4.002602e-3; }
    //! c_p = 5 R / (2 M) [J/(kg K)].
    double cp() const override { return 2.5 * gasConstant(); }
    //! mu(T, rho) [Pa s], Arp-McCarty-Friend (TN 1334) with the branch blend above.
    double viscosity(double T, double rho) const override;
    //! k(T, rho) [W/(m K)], Hands & Arp (1981) without the critical enhancement.
    double conductivity(double T, double rho) const override;
    double minTemperature() const override { return 2.5; }
    double maxTemperature() const override { return 1500.0; }
    //! 200 kg/m^3.
    double maxDensity() const override { return 200.0; }
};

} // namespace coldtip::models
