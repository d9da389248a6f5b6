#pragma once
//! \file RunSummary.hpp
//! The summary of a run: the same keys go to the result file's /summary attributes and to
//! `--json` (layout in README.md, "Results"). Definitions are in
//! solver/cycle/CycleMetrics.hpp.
//!
//! A figure that would mislead is left out rather than written as a number: a machine without
//! a cold heat exchanger (a test rig: piston, duct, volume) has no cooling figures at all, and
//! a machine that heats its cold end has no COP or fraction of Carnot (a note says why).

#include <nlohmann/json.hpp>
#include <string>
#include <vector>

#include "solver/cycle/PeriodicSteadyState.hpp"

namespace coldtip {

struct SummaryValue {
    std::string key;
    double value = 0.0;
};

//! A link across the path (double-inlet valve): where it connects and its cycle means.
struct LinkFlow {
    std::string name;
    std::string from, to;   //!< "component.outlet" / "component.inlet"
    double x_from = 0.0, x_to = 0.0; //!< axial positions of the cells it joins [m]
    //! Cycle-mean (DC) mass flow from `from` to `to` [kg/s]: the mean of the orifice law at
    //! the sampled states of the last cycle (the link holds no state of its own).
    double mean_mass_flow = 0.0;
    //! Cycle-mean enthalpy flow from `from` to `to` [W]: exact cycle integral.
    double enthalpy_flow = 0.0;
};

struct RunSummary {
    std::string case_name;
    std::string status;   //!< converged | not-converged | failed | interrupted | running
    std::string failure;  //!< what failed, if anything
    std::string result_file;
    bool converged = false;
    std::vector<SummaryValue> values; //!< numeric keys, units in their names
    //! "cooler" (it has a cold heat exchanger) or "test rig" (none: no cooling figures).
    std::string machine = "cooler";
    std::vector<LinkFlow> links;
    std::vector<std::string> notes; //!< why a figure is absent, what reads unusually
};

//! Cycle means of every link of the machine over the last cycle of `outcome`.
std::vector<LinkFlow> linkFlows(const Machine& machine, const SteadyOutcome& outcome);

//! One line for the terminal: status, cooling (or that it is a rig), PV power, COP and
//! fraction of Carnot where they mean something, links, balance and residual.
std::string summaryLine(const RunSummary& s);

//! Peak resident memory of this process [MB].
double peakResidentMegabytes();

//! Summary of a steady-state run of `machine`.
RunSummary summarize(const Machine& machine, const SteadyOutcome& outcome,
                     const std::string& status, double wall_time_s);

nlohmann::json toJson(const RunSummary& s);

} // namespace coldtip
