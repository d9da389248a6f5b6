#pragma once
//! \file CooldownResult.hpp
//! The result of `coldtip cooldown`: the run result of the final cycle (ResultFile.hpp: the
//! steady state solved from the settled end, or the last cycle) and the /cooldown group:
//!   time [s], cold_temperature [K], body_temperature [K] (rows x bodies, body_name),
//!   gross_cooling_power, cooling_power, net_cooling_power, pv_power [W],
//!   load [W] (rows x loads, load_name), net_cooling_integral [J],
//!   report_temperature [K], report_time [s] (NaN: not reached),
//! and attributes: method, status, effort, the energy check and the steady-state check.
//! Written whole and moved into place like every result file.

#include <nlohmann/json.hpp>
#include <string>

#include "solver/cycle/Cooldown.hpp"
#include "solver/output/ResultFile.hpp"

namespace coldtip {

//! The cooldown's scalar results by key (units in the names), for /cooldown and --json.
std::vector<SummaryValue> cooldownValues(const CooldownOutcome& out);

//! The cooldown summary: the values, the report times and the final loads.
nlohmann::json cooldownJson(const Machine& machine, const CooldownOutcome& out);

void writeCooldownResult(const std::string& path, const Machine& machine,
                         const CooldownOutcome& out, const RunInfo& info);

} // namespace coldtip
