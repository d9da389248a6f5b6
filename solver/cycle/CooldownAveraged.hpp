#pragma once
//! \file CooldownAveraged.hpp
//! The accelerated cooldown: an averaged slow equation for the temperatures of every solid
//! node (cold-head bodies, regenerator matrix, tube wall), driven by cycle-averaged heat
//! flows from short full-cycle integrations of the whole machine (heterogeneous multiscale
//! method: W. E & B. Engquist, "The heterogeneous multiscale methods", Commun. Math. Sci. 1,
//! 2003; numerics reference §3, method B):
//!
//!   dT_i/dt = Qbar_i(T, t) / C_i(T_i),    C_i = sum_l m_l c_p,l(T_i)                 [K/s]
//!   dE/dt   = -sum_b Qbar_b                 (E: the integral of the net cooling)      [W]
//!
//! Qbar_i is node i's net heat over one cycle of a full integration (gas, flows and solids
//! together) started at the slow temperatures T, with the gas re-synchronised once per macro
//! step: the step's first evaluation starts from the end of the last evaluation of the
//! previous step, each cell's temperature shifted by the change of its own solid (pressure
//! kept, charge restored), and runs until the cycle-averaged heat flows repeat,
//! sum_i |Qbar_i^(j) - Qbar_i^(j-1)| <= settle_residual Q_ref (at least two cycles, at most
//! max_settle_cycles; Q_ref = max(|gross cooling|, 1 % of PV power)); the step's other
//! evaluations (Newton iterations, matrix, retries) start from the same gas and run as many
//! cycles, so that Qbar is a deterministic function of T within the Newton iteration.
//! Meanwhile every solid node is held near T (CooldownHold.hpp, tau = 5 periods), so the
//! heat flows belong to T while the swing of the solids within the cycle is kept;
//! Qbar_i = [U_i(end) - U_i(start)]/T_p + (heat the hold removed)/T_p exactly.
//!
//! The slow equation is stiff (the fine cells at the ends of the regenerator and the tube
//! relax in tens of cycles, the cold head in thousands), so it is integrated by CVODE's BDF
//! (variable order and step) with a dense Newton matrix from finite differences of Qbar:
//! band-coloured (nodes 2B+1 apart perturbed together, B = 8), each perturbed integration
//! started from the same gas as the base one and run for the same number of cycles (so that
//! the differences are those of T alone), and kept for many steps (the matrix varies
//! slowly). The local error test is on the cold-head bodies at relative_tolerance; the
//! other solids follow them within tens of cycles and are tested to 0.25 K absolute.
//! Report temperatures are found by CVODE's root finding on the cold body's temperature.
//!
//! Error control: (1) the slow equation's local error test at relative_tolerance; (2) the
//! settle test above (its worst accepted change and the evaluations that hit the cycle limit
//! are reported); (3) the hold lets a node drift by about tau dT/dt from T during an
//! evaluation (reported as the largest mean offset of the cold body); (4) the end state is
//! checked against the periodic steady state solved from it (Cooldown.hpp). The cold end has
//! settled when the cold body's component of the Newton step to the fixed point of the
//! slow equation, |(J^-1 f)_cold|, with J a fresh finite-difference matrix (formed there,
//! or at most five macro steps before), is below settle_tolerance.

#include "solver/cycle/Cooldown.hpp"

namespace coldtip {

//! The accelerated cooldown from the full state y0 at t = 0.
CooldownOutcome averagedCooldown(Machine& machine, const CooldownOptions& options,
                                 const std::vector<double>& y0, const CooldownCallback& on_row);

} // namespace coldtip
