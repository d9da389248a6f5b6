#pragma once
//! \file MatrixConduction.hpp
//! Axial conduction through the solid of a stacked-screen or sphere matrix. Point contacts
//! between layers make it far smaller than the series value (1 - phi) k_s:
//!   k_eff = F (1 - phi) k_s
//! with a measured degradation factor F of order 0.1-0.2 for stainless and phosphor-bronze
//! screens (M. A. Lewis, T. Kuriyama, F. Kuriyama, R. Radebaugh, "Measurement of heat
//! conduction through stacked screens", Adv. Cryog. Eng. 43, 1611, 1998; from memory).
//! Sphere beds have even smaller F. F is an input; default 0.1.

namespace coldtip::models {

//! Default degradation factor F [-].
inline constexpr double kDefaultConductionDegradation = 0.1;

//! Effective axial conductivity of the matrix solid per unit of total cross-section
//! [W/(m K)]: F (1 - phi) k_s, from k_s [W/(m K)], porosity phi [-] and F [-]. The engine
//! multiplies its dk_s/dT by the same factor F (1 - phi).
inline double matrixAxialConductivity(double k_solid, double porosity,
                                      double degradation = kDefaultConductionDegradation)
{
    return degradation * (1.0 - porosity) * k_solid;
}

} // namespace coldtip::models
