#pragma once
//! \file ThermalLink.hpp
//! A conductive link between two lumped solid nodes of the cold head (a strap or a joint
//! between a cold block and the cold exchanger), without heat capacity of its own:
//!
//!   Q_ab = Conductor::heat(T_a, T_b)        (ConductivityIntegral.hpp)             [W]
//!   dT_a/dt -= Q_ab / C_a(T_a),   dT_b/dt += Q_ab / C_b(T_b)
//!
//! The heat flow is internal to the machine; its cycle integral goes to a channel for
//! reports only.

#include "solver/network/Element.hpp"
#include "solver/network/elements/ConductivityIntegral.hpp"

namespace coldtip {

class ThermalLink final : public Element {
public:
    //! From node `a` to node `b`; quadrature channel of Q_ab (-1: none).
    ThermalLink(int a, int b, Conductor conductor, const std::vector<SolidNode>& solids,
                int quad_heat);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

private:
    int m_a, m_b;
    Conductor m_conductor;
    const SolidNode* m_na;
    const SolidNode* m_nb;
    int m_quad_heat;
};

} // namespace coldtip
