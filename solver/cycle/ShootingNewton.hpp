#pragma once
//! \file ShootingNewton.hpp
//! Periodic steady state in tens of cycles: matrix-free Newton-Krylov shooting on the slow
//! part of the k-period map (Aprille & Trick, Proc. IEEE 60, 1972; Telichevesky, Kundert &
//! White, Proc. DAC 1995; the reduced-dimension variant of Andersen, Thomsen & Carlsen,
//! Simul. Model. Pract. Theory 15, 2007). See numerics reference §2.2.
//!
//! Unknowns x: the whole state in scaled coordinates (ShootingVariables): the slow modes
//! (matrix, walls, the pulse tube's gas) need Newton, the fast ones would relax by
//! themselves, but leaving them out of the update makes every Newton step kick them and
//! their transient then floors the residual. The total charge is held fixed (the map has a
//! unit multiplier along it, which would make the Newton matrix singular). With G the state
//! after k periods,
//!
//!   solve  (I - M) dx = G(x) - x   by GMRES,   M v = dG/dx v,
//!
//! each product costing k periods from the same start state carrying one CVODES forward
//! sensitivity: the exact derivative of the discrete map actually computed, on the base
//! trajectory's own steps. (A finite difference of two adaptive integrations differs by
//! their step sequences; near the solution that noise swamps the slow modes, whose
//! eigenvalues of I - M are about k T/tau ~ 1e-3, and Newton stalls.) The step is clipped to
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
    int cycles_per_map = 1;     //!< k: periods per evaluation of the map, far from the answer
    //! k once the Newton correction is below settle_below_tolerances x temperature_tolerance.
    //! Each evaluation of the map restarts the integrator on a corrected state and carries a
    //! defect of its own, about 1e-4 K per solid node and period at rtol 1e-5; (I - M)^-1
    //! amplifies it by 1/(1 - mu^k) along the slowest mode (mu ~ 0.99985 on the fixed-
    //! temperature demo), where the signal k (1 - mu) d grows with k. Measured on that demo
    //! against a plain run continued 19,000 cycles past its own stop (largest solid
    //! difference): one period per map 0.035-0.072 K (four runs); four 0.026 K from ambient
    //! and 0.039 K from a start 0.066 K off; eight 0.010 K (57 s) and 0.017 K from that start.
    //! Plain integration: about 1050 s.
    int settle_cycles_per_map = 8;
    double settle_below_tolerances = 20.0; //!< switch to settle maps below this many tolerances
    int warmup_cycles = 10;     //!< plain cycles before the first Newton step
    int max_newton = 15;        //!< outer iterations
    int max_krylov = 120;       //!< GMRES iterations per Newton step (no restart)
    //! Relative GMRES residual: the Eisenstat-Walker forcing term (choice 2,
    //! eta_k = 0.9 (|F_k|/|F_k-1|)^2, safeguarded; S. C. Eisenstat and H. F. Walker, SIAM J.
    //! Sci. Comput. 17, 16, 1996), bounded to [krylov_tolerance, max_forcing]. Solving each
    //! Newton step to 1e-3 spent ~90 sensitivity periods per step where the outer iteration
    //! itself only gains a factor of ten.
    double krylov_tolerance = 1e-3;
    double max_forcing = 0.1;
    //! Loosest linear solve whose Newton correction may declare the steady state reached.
    //! The residual is dominated by the gas states' end-of-period scatter (about 5e-3 K RMS
    //! over some 800 unknowns); a slow-mode error of one tolerance shows in it as only
    //! k (1 - mu) 0.05 K ~ 6e-5, so a solve to 1e-2 (as first used) never resolved it and
    //! accepted states 0.07 K off with a correction of 0.04 K.
    double trusted_forcing = 1e-4;
    double max_step_K = 30.0;       //!< largest temperature change of one Newton step [K]
};

//! The shooting unknowns: every state in scaled coordinates of about one kelvin per unit,
//! (p_i, T_i) per gas cell in place of (m_i, E_i), mdot per face, T per solid node; with the
//! charge restored after every change, so the total mass never moves.
class ShootingVariables {
public:
    //! Pressure unit p_charge/300 and mass-flow unit mdot_scale/300 per "kelvin".
    ShootingVariables(const Network& network, double charge_pressure, double mass_flow_scale);
    int size() const { return m_n; }
    std::vector<double> extract(std::span<const double> y) const;
    //! y += lift(dx), with the charge restored by one common factor on every m and E.
    void add(std::vector<double>& y, const std::vector<double>& dx) const;
    //! The state direction d lift(y, eps v)/d eps at eps = 0 (the linearised lift).
    std::vector<double> liftDirection(std::span<const double> y, const std::vector<double>& v) const;
    //! The scaled direction of a state direction s at y (the linearised extract).
    std::vector<double> extractDirection(std::span<const double> y, std::span<const double> s) const;

private:
    static constexpr double kReferenceTemperature = 300.0;
    const Network& m_network;
    int m_n = 0;
    double m_p_unit, m_mdot_unit;
};

//! Newton-Krylov shooting from (period_index, y0); the outcome's history holds the plain
//! cycles of the base trajectory, its diagnostics the Newton steps and the Floquet
//! estimates. `on_cycle` as for integrateToSteadyState (returning false interrupts).
SteadyOutcome shootToSteadyState(CycleRunner& runner, long period_index,
                                 std::span<const double> y0, const SteadyOptions& options,
                                 const ShootingOptions& shooting,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle);
//! The same, continuing a run from `start`: from a restart point inside the Newton phase it
//! takes the path the uninterrupted run took (RestartPoint.hpp). The outcome's `restart` is
//! the latest such point.
SteadyOutcome shootToSteadyState(CycleRunner& runner, const SteadyStart& start,
                                 const SteadyOptions& options, const ShootingOptions& shooting,
                                 const std::function<bool(const SteadyOutcome&)>& on_cycle);

} // namespace coldtip
