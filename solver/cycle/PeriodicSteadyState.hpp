#pragma once
//! \file PeriodicSteadyState.hpp
//! Cycle-by-cycle integration to the periodic steady state, with a stopping test that does
//! not lie: a small change per cycle is not convergence (the distance to the steady state is
//! that change times the slowest thermal time constant in cycles; numerics reference §1).
//! The cycle is converged when
//!   - every solid node's cycle-integrated net heat is small against the cooling power
//!     (heat_residual, CycleMetrics), and
//!   - the machine's energy balance closes (|energy_balance_error| <= energy_residual), and
//!   - the estimated distance to the steady state is below temperature_tolerance: the
//!     first two can hold while a slow mode (a thin tube wall of small heat capacity, with a
//!     time constant of 10^4 cycles) is still tens of kelvin away,
//! after at least min_cycles periods. Plain integration estimates the distance by
//! geometric extrapolation of the largest drift per cycle d_n (between block means of the
//! node temperatures, DistanceEstimate) with the decay ratio mu over the last half of the
//! history, d_n mu / (1 - mu) (Aitken's delta-squared idea; the dominant-eigenvalue method
//! of Crowe & Nishio, AIChE J. 1975).

#include <cmath>
#include <complex>
#include <span>
#include <functional>
#include <string>
#include <vector>

#include "solver/cycle/CycleMetrics.hpp"
#include "solver/cycle/CycleRunner.hpp"
#include "solver/cycle/RestartPoint.hpp"

namespace coldtip {

struct SteadyOptions {
    long max_cycles = 20000;
    long min_cycles = 5;
    double heat_residual = 1e-3;
    double energy_residual = 2e-3;
    double temperature_tolerance = 0.05; //!< [K] estimated distance to the steady state
    int samples_per_cycle = 96;
};


//! One row of the per-cycle history.
struct HistoryRow {
    long cycle = 0;
    double time = 0.0;      //!< end of the cycle [s]
    CycleMetrics metrics;
    IntegratorStats work;
    std::vector<double> boundary_enthalpy; //!< cycle-mean enthalpy flow per component boundary [W]
    double wall_time_s = 0.0;
};

//! Distance to the steady state from the drift of node temperatures per cycle.
//!
//! The end-of-cycle temperatures jitter by the integrator's error (at rtol 1e-5 the gas at
//! the pulse tube's cold end by ~0.01 K from one cycle to the next) while the slow modes
//! drift by microkelvin per cycle: the drift is measured between means over blocks of
//! cycles, whose jitter falls as the blocks grow. Blocks start one cycle long (so a short
//! run is judged cycle by cycle) and double, pairwise merged, whenever kMaxBlocks are full:
//! the blocks span between a half and the whole history, in bounded memory.
class DistanceEstimate {
public:
    //! Add the node temperatures at the end of a cycle [K]; returns the estimated distance
    //! [K] (infinite until the drift decays geometrically; held between completed blocks).
    double add(std::span<const double> temperatures);

private:
    static constexpr std::size_t kMaxBlocks = 32;
    //! Nodes drifting at least this fraction of the largest drift take part in the projection.
    static constexpr double kSignificantDrift = 0.1;
    //! Cosine between the drifts now and then above which one mode is taken to carry both.
    static constexpr double kCoherentDrift = 0.9;
    //! Drift per cycle of every node between the means of blocks block - 1 and block [K].
    std::vector<double> drift(std::size_t block) const;

    std::size_t m_block_cycles = 1;
    std::size_t m_cycles = 0;
    std::size_t m_in_block = 0;
    std::vector<double> m_sum;
    std::vector<std::vector<double>> m_means;
    double m_estimate = HUGE_VAL;
};

//! How the steady state was reached: effort, and the accelerator's own diagnostics.
struct SolverDiagnostics {
    long cycle_equivalents = 0;  //!< every period integrated, sensitivity periods included
    IntegratorStats work;        //!< integrator effort over the whole solve
    int newton_iterations = 0;
    std::vector<double> newton_residual;   //!< RMS of G(x) - x per Newton step [K]
    std::vector<int> krylov_iterations;    //!< GMRES iterations per Newton step
    std::vector<double> newton_correction; //!< largest |dx| per Newton step [K]
    std::vector<int> periods_per_map;      //!< k of each Newton step
    //! Dominant Floquet multipliers per Newton step (largest modulus first).
    std::vector<std::vector<std::complex<double>>> floquet;
};

struct SteadyOutcome {
    bool converged = false;
    bool failed = false;
    bool interrupted = false;         //!< stopped by a request (Interrupt.hpp or on_cycle)
    std::string failure;              //!< what stopped the integration, if it failed
    std::vector<HistoryRow> history;
    CycleRecord last;                 //!< the last complete cycle
    CycleSamples samples;             //!< that cycle, sampled
    CycleMetrics metrics;             //!< of that cycle
    std::vector<double> state;        //!< state at the end of the last complete cycle
    long period_index = 0;            //!< period index at that state
    double wall_time_s = 0.0;         //!< over every part of a resumed run
    SolverDiagnostics diagnostics;
    //! The latest point a continuation can start from along the same path (RestartPoint.hpp).
    RestartPoint restart;
};

//! Where a solve starts: a restart point, and for a resumed run the history and
//! diagnostics up to it (the outcome then counts cycles, effort and wall time over the
//! whole run).
struct SteadyStart {
    RestartPoint point;
    std::vector<HistoryRow> history;
    SolverDiagnostics diagnostics;
};

//! A fresh start from (period_index, y0).
SteadyStart freshStart(long period_index, std::span<const double> y0);
//! The outcome of a solve that has done nothing yet beyond `start`.
SteadyOutcome outcomeAt(const SteadyStart& start);

//! Cycle-mean enthalpy flow at every component boundary, in the order of
//! boundaryEnthalpyNames().
std::vector<double> boundaryEnthalpy(const Machine& machine, const std::vector<double>& averages);
std::vector<std::string> boundaryEnthalpyNames(const Machine& machine);

//! Append one integrated cycle to the outcome: its history row (with the given distance
//! estimate; +inf: use the change per cycle extrapolated by `distance`), the last cycle,
//! the state; returns whether it passes the convergence test.
bool appendCycle(SteadyOutcome& out, const Machine& machine, CycleRecord record,
                 CycleSamples samples, long period_index, double wall_time_s,
                 DistanceEstimate* distance, const SteadyOptions& options);

//! The convergence test on one cycle's metrics.
bool steadyStateReached(const CycleMetrics& m, const SteadyOptions& o, long cycles);
//! Which parts of the test a cycle fails, in words ("" if none).
std::string convergenceShortfall(const CycleMetrics& m, const SteadyOptions& o);

//! Integrate period after period from (period_index, y0) until converged, failed or
//! max_cycles. `on_cycle` (may be empty) sees the outcome after every cycle (progress,
//! checkpoints); returning false from it stops the run (interrupted).
SteadyOutcome integrateToSteadyState(CycleRunner& runner, long period_index,
                                     std::span<const double> y0, const SteadyOptions& options,
                                     const std::function<bool(const SteadyOutcome&)>& on_cycle);
//! The same, continuing a run from `start`.
SteadyOutcome integrateToSteadyState(CycleRunner& runner, const SteadyStart& start,
                                     const SteadyOptions& options,
                                     const std::function<bool(const SteadyOutcome&)>& on_cycle);

} // namespace coldtip
