#pragma once
//! \file MomentumFace.hpp
//! The momentum equation of one face of the staggered grid and the transport it carries.
//! The face's control volume spans the downstream half of cell a and the upstream half of
//! cell b (staggered MAC arrangement, Harlow & Welch 1965; Patankar 1980 ch. 6):
//!
//!   L dmdot/dt = p_a - p_b - dp_a - dp_b,        L = sum_h K_L,h (l_h / A_h) [1/m]
//!   dp_h = (f Re)_h mu_h l_h mdot / (2 rho_h A_h d_h^2)                      [Pa]
//!
//! K_L = 1 except in open tubes driven at a frequency, where K_L and f Re follow the
//! oscillating-flow closure of PassageLaws.hpp (Womersley below the Stokes-layer
//! transition, quasi-steady above): L then depends on the state, and the rate
//! (p_a - p_b - dp)/L is differentiated as a whole, so the Jacobian stays exact.
//!
//! (Darcy friction f = (f Re)/Re on the hydraulic diameter d_h and pore velocity
//! mdot/(rho A_h); l_h = half the cell length, A_h its flow area.) The convective momentum
//! flux rho u^2 is dropped (low Mach number, u <= 40 m/s against c ~ 1000 m/s in helium):
//! along a passage it changes little from cell to cell, and at an area change the omitted
//! term is of the order of the dynamic pressure, a few kPa against pressure amplitudes of
//! hundreds of kPa (DEVELOPERS.md, "Momentum").
//!
//! Mass and energy cross the face conservatively (each flux is added to one cell and taken
//! from the other): mass flux mdot, enthalpy flux by smoothed upwinding of the face
//! enthalpies reconstructed from either side (FaceReconstruction.hpp),
//!   H = mdot+ h_L + mdot- h_R,  mdot+ = (mdot + sqrt(mdot^2 + eps^2))/2,
//! and axial gas conduction through the two halves in series,
//!   Q = (T_a - T_b) / sum_h l_h / (k_h F_h(Pe_h) A_h),
//! with F the passage's thermal-dispersion factor (1 for plain channels).

#include "solver/network/Element.hpp"
#include "solver/network/elements/PassageLaws.hpp"

namespace coldtip {

class MomentumFace final : public Element {
public:
    //! `face` indexes the network's faces; `before` is the cell upstream of face.from and
    //! `after` the cell downstream of face.to (-1 if none), for the reconstruction;
    //! quadrature channels for the enthalpy flow and the gas conduction (-1: none).
    MomentumFace(const FlowFace& face, int face_index, int before, int after,
                 const std::vector<GasCell>& cells, int quad_enthalpy, int quad_conduction);

    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

    //! Geometric inertance coefficient sum l_h/A_h [1/m] (mdot form), before K_L.
    double inertance() const { return m_inertance; }
    //! Critical Stokes-layer Reynolds number of the oscillating-flow transition [-].
    void setCriticalStokesReynolds(double re) { m_oscillating.critical_re_delta = re; }

    //! Rates of (m_a, E_a, m_b, E_b, mdot) and the face's enthalpy flow and conduction.
    template <class S>
    struct Result {
        S rate[5];
        S enthalpy_flow;
        S conduction;
    };
    //! `before`, `after` may be null (no such cell).
    template <class S>
    Result<S> compute(const GasState<S>* before, const GasState<S>& a, const GasState<S>& b,
                      const GasState<S>* after, const S& mdot, const NetworkView& v) const;

private:
    FlowFace m_face;
    int m_index;
    int m_before, m_after;
    const GasCell* m_a;
    const GasCell* m_b;
    const GasCell* m_before_cell = nullptr;
    const GasCell* m_after_cell = nullptr;
    double m_inertance = 0.0;
    OscillatingFlow m_oscillating;
    bool m_tube_a = false, m_tube_b = false; //!< half cells with the oscillating closure
    int m_quad_h, m_quad_q;
};

} // namespace coldtip
