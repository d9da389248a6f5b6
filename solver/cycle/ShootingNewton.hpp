#pragma once
//! \file ShootingNewton.hpp
//! Periodic steady state in tens of cycles: matrix-free Newton-Krylov shooting on the slow
//! part of the k-period map (Aprille & Trick, Proc. IEEE 60, 1972; Telichevesky, Kundert &
//! White, Proc. DAC 1995; the reduced-dimension variant of Andersen, Thomsen & Carlsen,
//! Simul. Model. Pract. Theory 15, 2007). See numerics reference §2.2.
//!
//! Slow variables x (all in kelvin): every solid node's temperature and every gas cell's
//! temperature T = E/(m c_v), moved at the cell's own pressure (SlowSubspace::add). Pressure
//! and mass flows are left to the integration: they relax within a few cycles, and the
//! total charge is held fixed (the map has a unit multiplier along the charge, which would
//! make the Newton matrix singular). With G the slow part of the state after k periods,
//!
//!   solve  (I - M) dx = G(x) - x   by GMRES,   M v = [G(x + eps v) - G(x)] / eps,
//!
//! each product costing k periods from the same start state. The step is clipped to
//! max_step_K. The eigenvalues of the Arnoldi Hessenberg matrix approximate those of I - M,
//! which gives the dominant Floquet multipliers mu = (1 - lambda)^(1/k) (the slowest modes).
//! Convergence is judged on a plain cycle with the same test as plain integration
//! (PeriodicSteadyState.hpp), never on the Newton residual alone.

#include <complex>
#include <functional>
#include <vector>

#include "solver/cycle/PeriodicSteadyState.hpp"

namespace coldtip {

struct ShootingOptions {
    int cycles_per_map = 2;     //!< k: periods per evaluation of the map
    int warmup_cycles = 10;     //!< plain cycles before the first Newton step
    int max_newton = 15;        //!< outer iterations
    int max_krylov = 40;        //!< GMRES iterations per Newton step (no restart)
    double krylov_tolerance = 0.1; //!< relative GMRES residual (inexact Newton)
    double perturbation_K = 0.08;   //!< RMS finite-difference step per slow variable [K]
    double max_step_K = 30.0;       //!< largest temperature change of one Newton step [K]
};

//! Dominant Floquet multipliers estimated along the way (complex, largest modulus first).
struct FloquetEstimate {
    int newton_iteration = 0;
    std::vector<std::complex<double>> multipliers;
};

struct ShootingReport {
    int newton_iterations = 0;
    long cycle_equivalents = 0;       //!< every period integrated, products included
    std::vector<double> residual_norm; //!< |G(x) - x| (RMS, K) per Newton iteration
    std::vector<int> krylov_iterations;
    std::vector<FloquetEstimate> floquet;
};

//! Scaled slow variables of a network's state (kelvin).
class SlowSubspace {
public:
    explicit SlowSubspace(const Network& network);
    int size() const { return m_n; }
    std::vector<double> extract(std::span<const double> y) const;
    //! y += lift(dx): gas temperatures change by dx at their own pressure (the charge is
    //! restored by one common factor), solid temperatures by dx.
    void add(std::vector<double>& y, const std::vector<double>& dx, double scale = 1.0) const;

private:
    const Network& m_network;
    int m_n = 0;
};

//! Newton-Krylov shooting from (period_index, y0); the outcome's history holds the plain
//! cycles of the base trajectory, `report` the solver's own diagnostics. `on_cycle` as for
//! integrateToSteadyState (returning false interrupts).
SteadyOutcome shootToSteadyState(CycleRunner& runner, long period_index,
                                 std::span<const double> y0, const SteadyOptions& options,
                                 const ShootingOptions& shooting, ShootingReport& report,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle);

} // namespace coldtip
