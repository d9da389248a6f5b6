#pragma once
//! \file SteadyStateSolver.hpp
//! The periodic steady state by the method the case asks for (solver.steady.method):
//! accelerated (Newton-Krylov shooting, ShootingNewton.hpp) or plain (cycle after cycle,
//! PeriodicSteadyState.hpp). Every command that needs a converged cycle goes through here.

#include <functional>
#include <string>

#include "solver/cycle/PeriodicSteadyState.hpp"
#include "solver/cycle/ShootingNewton.hpp"

namespace coldtip {

//! The case's steady-state controls; max_cycles > 0 overrides the case's limit.
SteadyOptions steadyOptionsFor(const CaseDescription& d, long max_cycles = 0);

//! Integrate to the periodic steady state from (period_index, y0) with `method`
//! ("accelerated" or "plain"); the outcome's diagnostics hold the effort.
SteadyOutcome solveSteadyState(CycleRunner& runner, long period_index,
                               std::span<const double> y0, const SteadyOptions& options,
                               const std::string& method,
                               const std::function<bool(const SteadyOutcome&)>& on_cycle = {});
//! The same, continuing a run from `start` (a restart point read from a result file):
//! cycles, effort and wall time are counted over the whole run.
SteadyOutcome solveSteadyState(CycleRunner& runner, const SteadyStart& start,
                               const SteadyOptions& options, const std::string& method,
                               const std::function<bool(const SteadyOutcome&)>& on_cycle = {});

} // namespace coldtip
