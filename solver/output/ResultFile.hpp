#pragma once
//! \file ResultFile.hpp
//! The result file of a run (layout documented in README.md, "Results"):
//! /case, /grid, /cycle, /history, /profile, /summary, /solver and /state (the state at the
//! end of the last complete cycle, for --resume and warm starts). Units on every dataset.
//! Written whole and moved into place, so a kill leaves the previous complete file.

#include <initializer_list>
#include <functional>
#include <string>

#include "solver/output/RunSummary.hpp"
#include "solver/output/Hdf5File.hpp"

namespace coldtip {

struct RunInfo {
    std::string command_line;
};

//! One per-node dataset of a series along x: its name in the group, values in node order, units.
struct AlongX {
    std::string name;
    const std::vector<double>& values;
    std::string units;
};
//! Writes `group`/x, `group`/index and every series, all ordered by increasing x (stable:
//! equal x keep their node order); index[i] is the node's row in /grid. The /profile and
//! /linear per-node groups are written this way.
void writeAlongX(Hdf5Writer& w, const std::string& group, const std::vector<double>& x,
                 std::initializer_list<AlongX> series);

//! /case: the case text and path, its name, the tool version and the command line.
void writeCaseText(Hdf5Writer& w, const Machine& machine, const RunInfo& info);

//! Written whole, synced and moved into place (Hdf5File.hpp); `more` may add groups before
//! that (the cooldown's). Throws std::runtime_error naming the path if it cannot be written.
void writeRunResult(const std::string& path, const Machine& machine, const SteadyOutcome& outcome,
                    const RunSummary& summary, const RunInfo& info,
                    const std::function<void(Hdf5Writer&)>& more = {});

//! The case a result belongs to: a hash of its text (stored in /state as `case_hash`, with
//! `tool_version`, so that --resume refuses another case's or another version's state).
std::string caseHash(const CaseDescription& d);

//! State saved in a result file: the period index and the state vector at its start.
struct SavedState {
    long period_index = 0;
    std::vector<double> state;
    std::vector<std::string> names;
    //! The restart point with the run's history and diagnostics up to it.
    SteadyStart start;
};
//! Reads /state; throws input::InputError naming the file if it has none, cannot be read,
//! or belongs to another case or tool version (bad input: exit 1).
SavedState readSavedState(const std::string& path, const Machine& machine);

} // namespace coldtip
