#pragma once
//! \file Cooldown.hpp
//! The cooldown transient: the whole machine starts at one uniform temperature and runs
//! until the cold end settles (its estimated distance to the periodic steady state is below
//! settle_tolerance) or the time limit; reported are the history of the cold head
//! (CooldownLedger.hpp), the times at which the cold end first reaches given temperatures,
//! and the final state, checked against the periodic steady state.
//!
//! Two methods:
//!   - plain: every cycle integrated (CycleRunner), the reference;
//!   - accelerated: the averaged slow equation of the solid temperatures driven by the
//!     cycle-averaged heat flows of short, re-synchronised full-cycle integrations
//!     (CooldownAveraged.hpp; numerics reference §3, method B).

#include <functional>
#include <string>
#include <vector>

#include "solver/cycle/CooldownLedger.hpp"
#include "solver/cycle/PeriodicSteadyState.hpp"

namespace coldtip {

struct CooldownOptions {
    double start_temperature = 300.0; //!< [K]
    double time_limit = 14400.0;      //!< [s]
    std::vector<double> report_at;    //!< [K]
    double settle_tolerance = 0.05;   //!< [K]
    std::string method = "accelerated";
    double relative_tolerance = 1e-4; //!< accelerated: of the slow equation
    double settle_residual = 1e-3;    //!< accelerated: see CooldownAveraged.hpp
    int max_settle_cycles = 12;       //!< accelerated
    double record_interval = 0.0;     //!< [s] plain: least time between history rows
    bool check_steady = true;         //!< solve the steady state from a settled end state
    SteadyOptions steady;             //!< for that check
};

//! The case's cooldown options; `method` (if not empty) overrides the case's. The start
//! temperature defaults to the reject exchanger's wall temperature (the charge temperature
//! if the reject exchanger has none).
CooldownOptions cooldownOptionsFor(const Machine& machine, const std::string& method = "");

//! The machine at rest at one temperature T [K]: every cell at T and the common pressure
//! that holds the charge, no flow, every solid at T.
std::vector<double> uniformState(const Machine& machine, double T);

//! When the cold end first reached a report temperature (NaN: not reached).
struct CooldownReport {
    double temperature = 0.0; //!< [K]
    double time = 0.0;        //!< [s]
};

struct CooldownOutcome {
    std::string method;
    std::string status; //!< settled | time-limit | failed | interrupted
    std::string failure;
    std::vector<CooldownRow> history;
    std::vector<std::string> body_names, load_names;
    std::vector<CooldownReport> reports;
    std::vector<double> state; //!< at the end (a cycle boundary)
    long period_index = 0;     //!< of that state
    double end_time = 0.0;     //!< [s]
    //! [K] estimated distance of the cold end from its steady state at the end
    double distance_estimate = 0.0;
    double net_cooling_integral = 0.0; //!< [J] integral of the net cooling
    double body_energy_change = 0.0;   //!< [J] sum_b U_b(start) - U_b(end)
    double wall_time_s = 0.0;          //!< of the cooldown integration
    long cycles = 0; //!< periods integrated (accelerated: every short integration)
    IntegratorStats work;
    // accelerated only
    long macro_steps = 0;
    long heat_flow_evaluations = 0;
    long jacobian_evaluations = 0;
    long error_test_failures = 0;
    double largest_settle_change = 0.0; //!< worst accepted settle change, relative
    int unsettled_evaluations = 0;      //!< evaluations that hit max_settle_cycles
    double largest_cold_offset = 0.0;   //!< [K] largest mean offset of the held cold body
    // the check
    bool steady_checked = false;
    SteadyOutcome final_cycle; //!< the steady solution (checked) or the last cycle
    double steady_cold_temperature = 0.0; //!< [K]
    double steady_wall_time_s = 0.0;
};

//! Called with every history row; returning false interrupts the cooldown.
using CooldownCallback = std::function<bool(const CooldownRow&)>;

//! Run the cooldown of `machine` (the accelerated method adds its hold elements to the
//! network, released outside its own integrations).
CooldownOutcome runCooldown(Machine& machine, const CooldownOptions& options,
                            const CooldownCallback& on_row = {});

//! First crossings of report temperatures along a falling temperature history, by linear
//! interpolation between consecutive points.
class ReportClock {
public:
    explicit ReportClock(const std::vector<double>& temperatures);
    //! The history went from (t0, T0) to (t1, T1).
    void add(double t0, double T0, double t1, double T1);
    //! Mark report temperature k as reached at t (found by other means).
    void reached(std::size_t k, double t);
    const std::vector<CooldownReport>& reports() const { return m_reports; }

private:
    std::vector<CooldownReport> m_reports;
};

} // namespace coldtip
