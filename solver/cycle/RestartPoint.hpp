#pragma once
//! \file RestartPoint.hpp
//! A point from which a steady-state solve can be continued along the path it would have
//! taken had it never stopped (--resume; DEVELOPERS.md, "Interrupt and resume").
//!
//! The accelerated solver restarts the integrator (CVodeReInit, with a fresh KLU
//! factorisation) on every corrected start state; from there its path depends only on that
//! state, its period index and the solver's own variables (ShootingCheckpoint). A restart
//! point taken there, at the top of a Newton iteration, therefore gives a continuation that
//! is bit-identical to the uninterrupted run. Before the first Newton step (the warm-up
//! cycles) the restart point is the start itself. Plain integration carries the
//! integrator's history from cycle to cycle, which cannot be saved: its restart point is
//! the end of the last complete cycle, and a resumed plain run restarts the integrator
//! there (an answer within the steady-state tolerance, not bit-identical).

#include <cstddef>
#include <vector>

#include "solver/integrator/CvodeSession.hpp"

namespace coldtip {

//! The accelerated solver's variables at the top of a Newton iteration.
struct ShootingCheckpoint {
    int iteration = 0;                //!< the next Newton iteration; 0: warm-up first
    int cycles_per_map = 0;           //!< k
    double forcing = 0.0;             //!< GMRES relative tolerance of the next solve
    double previous_residual = 0.0;   //!< |F| of the last Newton step (0: none comparable)
    bool tighten = false;
    double accepted_correction = -1.0; //!< >= 0: the last correction met the test [K]
};

struct RestartPoint {
    long period_index = 0;
    std::vector<double> state;        //!< at the start of period `period_index`
    std::size_t history_rows = 0;     //!< cycles of the run's history before this point
    std::size_t newton_steps = 0;     //!< Newton steps with a linear solve before it
    int newton_iterations = 0;        //!< SolverDiagnostics::newton_iterations there
    long cycle_equivalents = 0;       //!< periods integrated before it, sensitivities included
    IntegratorStats work;             //!< integrator effort before it
    double wall_time_s = 0.0;         //!< wall time spent reaching it, over every part of the run
    ShootingCheckpoint shooting;
};

} // namespace coldtip
