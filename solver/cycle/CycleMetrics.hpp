#pragma once
//! \file CycleMetrics.hpp
//! What an engineer reads off one cycle, from its exact cycle integrals:
//!   pv_power        = <-p dV/dt> of the drive                                   [W]
//!   cooling_power   = net heat leaving the cold exchanger's wall or body into the machine
//!                     (gas uptake minus what the regenerator and tube walls conduct in) [W]
//!   gross_cooling   = heat taken up by the gas at the cold exchanger              [W]
//!   reject_heat     = heat into the reject (aftercooler) wall                     [W]
//!   energy_balance_error = (PV power + heat in - heat out) / PV power over the cycle
//!   heat_residual   = max over solid nodes |<net heat>| / Q_ref, Q_ref = max(|gross
//!                     cooling|, 0.01 PV power): zero at the periodic steady state. The
//!                     cycle's net heat into a node is the change of its internal energy
//!                     sum_l m_l h_l(T) over the cycle (NIST c_p integrals), exactly.
//!   cop = cooling/PV, carnot_fraction = cop / (T_c / (T_h - T_c)).
//! Without a cold (reject) exchanger the cold (reject) figures stay 0 here; they are not
//! results then, and the run summary leaves them out (RunSummary.hpp), as it leaves out COP
//! and fraction of Carnot when the net cooling is not positive.

#include <string>
#include <vector>

#include "solver/components/Machine.hpp"
#include "solver/cycle/CycleRunner.hpp"

namespace coldtip {

struct CycleMetrics {
    double pv_power = 0.0;
    double cooling_power = 0.0;
    double gross_cooling = 0.0;
    double cold_conduction = 0.0; //!< solid conduction into the cold wall/body [W]
    double reject_heat = 0.0;
    double external_heat_in = 0.0; //!< sum of heat from outside into the machine [W]
    double applied_load = 0.0;
    double energy_balance_error = 0.0;
    double heat_residual = 0.0;
    std::string worst_solid;      //!< node with the largest residual
    double cold_temperature = 0.0;
    double reject_temperature = 0.0;
    double max_temperature_change = 0.0; //!< max |T(end) - T(start)|, solids and gas [K]
    //! Estimated distance to the periodic steady state [K]: set by the steady-state driver
    //! (geometric extrapolation of the change per cycle, or the last Newton correction).
    double distance_estimate = 0.0;
    double cop = 0.0;
    double carnot_fraction = 0.0;
    double mass_change = 0.0; //!< relative change of total gas mass over the cycle
};

//! Net heat leaving thermal boundary b into the machine, cycle mean [W].
double boundaryHeat(const Machine& machine, const std::vector<double>& averages, int boundary);
//! Temperature of thermal boundary b at a state [K].
double boundaryTemperature(const Machine& machine, std::span<const double> y, int boundary);

//! Temperature of every solid node, then of every gas cell, at a state [K]: the nodes whose
//! change from cycle to cycle measures the distance to the periodic steady state.
std::vector<double> nodeTemperatures(const Network& network, std::span<const double> y);

CycleMetrics cycleMetrics(const Machine& machine, const CycleRecord& record);

} // namespace coldtip
