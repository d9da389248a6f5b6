#pragma once
//! \file CooldownLedger.hpp
//! What a cooldown reports of the cold head, from the exact cycle integrals: the bodies
//! (the cold exchanger's own and those linked to it), every load on them, and per cycle
//!   gross_cooling = heat the gas takes up at the cold exchanger                     [W]
//!   cooling       = net heat leaving the exchanger's body into the machine
//!                   (gross cooling less the solid conduction into it, CycleMetrics)   [W]
//!   net_cooling   = cooling - sum of the loads on the cold head
//!                 = -d/dt sum_b U_b(T_b),  U_b = m_b h_b(T_b) (NIST c_p integral)     [W]
//! (links between the bodies are internal and cancel), and the PV power.

#include <span>
#include <string>
#include <vector>

#include "solver/cycle/CycleMetrics.hpp"

namespace coldtip {

//! One point of a cooldown history.
struct CooldownRow {
    double time = 0.0;             //!< [s]
    double cold_temperature = 0.0; //!< [K] the cold exchanger's body
    std::vector<double> body_temperatures; //!< [K] every cold-head body, exchanger first
    double gross_cooling = 0.0;    //!< [W]
    double cooling = 0.0;          //!< [W]
    double net_cooling = 0.0;      //!< [W]
    double pv_power = 0.0;         //!< [W]
    std::vector<double> loads;     //!< [W] every load, in the order of loadNames()
    double net_cooling_integral = 0.0; //!< [J] integral of net_cooling from the start
};

class CooldownLedger {
public:
    //! Throws std::invalid_argument if the cold exchanger is not a lumped body.
    explicit CooldownLedger(const Machine& machine);

    //! Solid nodes of the cold-head bodies, the exchanger's first.
    const std::vector<int>& bodies() const { return m_bodies; }
    std::vector<std::string> bodyNames() const;
    //! Channels of the loads on the cold head and their names.
    const std::vector<int>& loadChannels() const { return m_loads; }
    std::vector<std::string> loadNames() const;

    //! sum_b U_b(T_b) of the bodies at state y [J].
    double bodyEnergy(std::span<const double> y) const;
    //! The row of a cycle at time t [s] (the bodies' temperatures from y).
    CooldownRow row(double t, std::span<const double> y, const CycleRecord& cycle) const;

private:
    const Machine& m_machine;
    std::vector<int> m_bodies;
    std::vector<int> m_loads;
};

} // namespace coldtip
