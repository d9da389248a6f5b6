#pragma once
//! \file ResultFile.hpp
//! The result file of a run (layout documented in README.md, "Results"):
//! /case, /grid, /cycle, /history, /profile, /summary, /solver and /state (the state at the
//! end of the last complete cycle, for --resume and warm starts). Units on every dataset.
//! Written whole and moved into place, so a kill leaves the previous complete file.

#include <string>

#include "solver/output/RunSummary.hpp"
#include "solver/output/Hdf5File.hpp"

namespace coldtip {

struct RunInfo {
    std::string command_line;
};

//! Indices that put `x` in increasing order (stable: equal x keep their network order). The
//! /profile and /linear per-node datasets are written in this order, with the node's index in
//! /grid alongside (`index`).
std::vector<long> orderByX(const std::vector<double>& x);
//! v[order[0]], v[order[1]], ...
std::vector<double> permuted(const std::vector<double>& v, const std::vector<long>& order);

//! /case: the case text and path, its name, the tool version and the command line.
void writeCaseText(Hdf5Writer& w, const Machine& machine, const RunInfo& info);

void writeRunResult(const std::string& path, const Machine& machine, const SteadyOutcome& outcome,
                    const RunSummary& summary, const RunInfo& info);

//! State saved in a result file: the period index and the state vector at its start.
struct SavedState {
    long period_index = 0;
    std::vector<double> state;
    std::vector<std::string> names;
};
//! Reads /state; throws std::runtime_error naming the file if it has none or it does not fit.
SavedState readSavedState(const std::string& path, const Machine& machine);

} // namespace coldtip
