#pragma once
//! \file RunSummary.hpp
//! The summary of a run (DESIGN §7): the same keys go to the result file's /summary
//! attributes and to `--json`. Definitions are in solver/cycle/CycleMetrics.hpp.

#include <nlohmann/json.hpp>
#include <string>
#include <vector>

#include "solver/cycle/PeriodicSteadyState.hpp"

namespace coldtip {

struct SummaryValue {
    std::string key;
    double value = 0.0;
};

struct RunSummary {
    std::string case_name;
    std::string status;   //!< converged | not-converged | failed | interrupted | running
    std::string failure;  //!< what failed, if anything
    std::string result_file;
    bool converged = false;
    std::vector<SummaryValue> values; //!< numeric keys, units in their names
};

//! Peak resident memory of this process [MB].
double peakResidentMegabytes();

//! Summary of a steady-state run of `machine`.
RunSummary summarize(const Machine& machine, const SteadyOutcome& outcome,
                     const std::string& status, double wall_time_s);

nlohmann::json toJson(const RunSummary& s);

} // namespace coldtip
