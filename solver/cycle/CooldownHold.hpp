#pragma once
//! \file CooldownHold.hpp
//! Holds a solid node near a prescribed temperature during the short full-cycle
//! integrations of the accelerated cooldown (CooldownAveraged.hpp), so that the cycle-averaged
//! heat flows belong to that temperature (numerics reference §3, method B: "hold T_s
//! frozen"). A weak relaxation, not a clamp:
//!
//!   dT/dt += -(T - T_hold) / tau                                                  [K/s]
//!
//! with tau tens of periods: the node's drift over the cycle is held back while its swing
//! within the cycle (period T_p << tau) is kept to a relative amplitude of
//! 1/sqrt(1 + (T_p/(2 pi tau))^2) and a phase lead of T_p/(2 pi tau) (first-order response);
//! that lead biases the regenerator's loss, hence tens of periods, not a few.
//! The heat the hold removes, C(T) (T - T_hold)/tau, is integrated in its own channel, so
//! the node's physical net heat over a cycle is exactly
//!   Q = [U(T_end) - U(T_start)] / T_p + <C (T - T_hold)/tau>.
//! With 1/tau = 0 the element does nothing (plain integration).

#include "solver/network/Element.hpp"

namespace coldtip {

class CooldownHold final : public Element {
public:
    //! On solid node `solid`; channel of the heat removed.
    CooldownHold(int solid, const std::vector<SolidNode>& solids, int quad_heat);
    std::string describe() const override;
    void evaluate(const NetworkView& v, double* ydot, double* quad) const override;
    void addJacobian(const NetworkView& v, double* values) const override;

    //! Hold at T_hold [K] with rate 1/tau [1/s]; rate 0 releases the node.
    void hold(double T_hold, double rate)
    {
        m_T_hold = T_hold;
        m_rate = rate;
    }
    int channel() const { return m_quad_heat; }
    int solid() const { return m_solid; }

private:
    int m_solid;
    const SolidNode* m_s;
    int m_quad_heat;
    double m_T_hold = 0.0;
    double m_rate = 0.0;
};

} // namespace coldtip
