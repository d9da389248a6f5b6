#pragma once
//! \file CycleRunner.hpp
//! Integrates a machine period by period: the stop time is armed exactly at every period
//! boundary (t_n = n T, computed, not accumulated), the cycle integrals are differences of
//! the cumulative CVODES quadratures, and the state can be sampled at equal intervals
//! within the cycle (interpolated by CVODE, which does not change the steps it takes).

#include <vector>

#include "solver/components/Machine.hpp"
#include "solver/integrator/CvodeSession.hpp"

namespace coldtip {

//! States sampled at t_start + j T / n, j = 0 .. n-1 (the first is the cycle's start).
struct CycleSamples {
    std::vector<double> time;               //!< [s]
    std::vector<std::vector<double>> state; //!< one state vector per sample
};

//! What one period produced.
struct CycleRecord {
    long cycle = 0;                  //!< 1-based count of periods integrated
    double t_start = 0.0, t_end = 0.0;
    std::vector<double> averages;    //!< cycle mean of every quadrature channel
    std::vector<double> start_state;
    std::vector<double> end_state;
    IntegratorStats work;            //!< integrator effort within this period
};

class CycleRunner {
public:
    CycleRunner(Machine& machine, const IntegratorOptions& options);

    //! Advance to t within the current cycle, charging its steps to the cycle's budget.
    void advanceWithin(double t, double t_end, long steps_at_start);

    //! Options from the case: tolerances with absolute scales from the machine.
    static IntegratorOptions optionsFor(const Machine& machine);
    //! The same at a given relative tolerance (absolute tolerances follow it).
    static IntegratorOptions optionsFor(const Machine& machine, double relative_tolerance);

    //! (Re)start at period number `period_index` (t = index T) from state y.
    void start(long period_index, std::span<const double> y);
    //! Integrate one period; fill `samples` (n >= 1 samples) if not null.
    CycleRecord runCycle(CycleSamples* samples = nullptr, int n_samples = 0);

    CvodeSession& session() { return m_session; }
    Machine& machine() { return m_machine; }
    long periodIndex() const { return m_period; }

private:
    Machine& m_machine;
    CvodeSession m_session;
    long m_period = 0;   //!< index of the period about to be integrated
    long m_cycles = 0;   //!< periods integrated so far
    std::vector<double> m_quad_at_start;
    long m_max_steps;    //!< integrator steps allowed per cycle
};

} // namespace coldtip
