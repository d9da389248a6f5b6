#pragma once
//! \file Commands.hpp
//! The command line (DESIGN §5): run, check, and the commands later issues add. Exit codes:
//! 0 success, 1 bad input (nothing written), 2 solver failure (what was computed is written
//! and named), 3 interrupted (the result file is readable and resumable).

namespace coldtip::cli {

inline constexpr int kExitSuccess = 0;
inline constexpr int kExitBadInput = 1;
inline constexpr int kExitSolverFailure = 2;
inline constexpr int kExitInterrupted = 3;

int main(int argc, char** argv);

} // namespace coldtip::cli
