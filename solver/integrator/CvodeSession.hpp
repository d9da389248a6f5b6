#pragma once
//! \file CvodeSession.hpp
//! One CVODES integration of a network: BDF with Newton iterations, KLU on the network's
//! fixed sparsity pattern and the network's exact Jacobian. The network's cycle integrands
//! are integrated as accumulator states appended to the state vector: the right-hand side
//! computes them with the fluxes at no extra cost (a CVODES pure quadrature would cost one
//! more network evaluation per step), their Jacobian rows are left empty (each Newton
//! iterate then carries the integrand of the previous one, an error below the Newton
//! tolerance), and the error weights exclude them from the error test and the Newton
//! convergence test exactly as errconQ = false would, while keeping the weighted norms of
//! the physical states what they would be without them. Every SUNDIALS object is owned by a
//! unique_ptr with its destroy function, created in dependency order with the context first
//! so that it is destroyed last; every return code is checked.
//!
//! Exceptions thrown by the network inside a callback never cross into C: the callback
//! stores them and returns +1 (a RecoverableStateError, e.g. a negative mass in a trial
//! step: CVODE retries with a smaller step) or -1 (anything else); they are rethrown with
//! their type after CVODE returns (as deal.II's SUNDIALS wrappers do). A stop request
//! (Interrupt.hpp) is checked on every right-hand side and Jacobian evaluation and leaves
//! the same way, as an Interrupted exception: a run stops within one step.

#include <exception>
#include <memory>
#include <span>
#include <stdexcept>
#include <string>
#include <vector>

#include <cvodes/cvodes.h>
#include <nvector/nvector_serial.h>
#include <sundials/sundials_context.h>
#include <sunlinsol/sunlinsol_klu.h>
#include <sunmatrix/sunmatrix_sparse.h>

#include "solver/network/Network.hpp"

namespace coldtip {

//! A CVODE failure: the flag, the time, CVODE's own message and the states that carried the
//! largest weighted local error when it happened (by name).
class IntegratorError : public std::runtime_error {
public:
    IntegratorError(const std::string& what, int flag, double t,
                    std::vector<std::string> worst_states)
        : std::runtime_error(what), m_flag(flag), m_t(t), m_worst(std::move(worst_states))
    {
    }
    int flag() const { return m_flag; }
    double time() const { return m_t; }
    const std::vector<std::string>& worstStates() const { return m_worst; }

private:
    int m_flag;
    double m_t;
    std::vector<std::string> m_worst;
};

struct IntegratorOptions {
    double relative_tolerance = 1e-6;
    std::vector<double> absolute_tolerances; //!< one per state
    int max_order = 5;
    long max_steps_per_call = 200000;
    double initial_step = 0.0; //!< 0: let CVODE estimate it
};

//! Counters accumulated over the whole session (CVodeReInit resets CVODE's own).
struct IntegratorStats {
    long steps = 0;
    long rhs_evaluations = 0;      //!< including quadrature right-hand sides
    long jacobian_evaluations = 0;
    long linear_setups = 0;
    long error_test_failures = 0;
    long nonlinear_iterations = 0;
    long nonlinear_failures = 0;
};

//! Effort between two snapshots of the counters.
inline IntegratorStats operator-(const IntegratorStats& a, const IntegratorStats& b)
{
    return {a.steps - b.steps,
            a.rhs_evaluations - b.rhs_evaluations,
            a.jacobian_evaluations - b.jacobian_evaluations,
            a.linear_setups - b.linear_setups,
            a.error_test_failures - b.error_test_failures,
            a.nonlinear_iterations - b.nonlinear_iterations,
            a.nonlinear_failures - b.nonlinear_failures};
}

//! Effort of two parts added (a resumed run's parts).
inline IntegratorStats operator+(const IntegratorStats& a, const IntegratorStats& b)
{
    return {a.steps + b.steps,
            a.rhs_evaluations + b.rhs_evaluations,
            a.jacobian_evaluations + b.jacobian_evaluations,
            a.linear_setups + b.linear_setups,
            a.error_test_failures + b.error_test_failures,
            a.nonlinear_iterations + b.nonlinear_iterations,
            a.nonlinear_failures + b.nonlinear_failures};
}

class CvodeSession {
public:
    CvodeSession(const Network& network, const IntegratorOptions& options, double t0,
                 std::span<const double> y0);
    ~CvodeSession();
    CvodeSession(const CvodeSession&) = delete;
    CvodeSession& operator=(const CvodeSession&) = delete;

    //! Restart from (t0, y0): history, order and quadratures are reset.
    void reinit(double t0, std::span<const double> y0);
    //! Integrate to `t_out` without stepping past `t_stop` (>= t_out); returns the time
    //! reached (== t_out). Throws IntegratorError, or rethrows a callback's exception.
    double advance(double t_out, double t_stop);

    //! State at the last return time.
    std::span<const double> state() const;
    double time() const { return m_t; }
    //! Cumulative quadratures since the last (re)initialisation, at the last return time.
    const std::vector<double>& quadratures();
    //! Counters so far, including those of earlier (re)initialisations.
    IntegratorStats stats() const;
    //! Last step size taken [s].
    double lastStep() const;
    //! Steps CVODE may take within the next advance() calls (CV_TOO_MUCH_WORK beyond).
    void setMaxSteps(long steps);

    //! Carry one forward sensitivity s = dy/dy0 along the next integration (call after
    //! reinit), starting from direction s0 (physical states only). CVODES integrates it with
    //! the staggered corrector on the same steps as the state and outside the error test, so
    //! s is the exact derivative of the discrete map actually computed (numerics reference
    //! §5.11); its right-hand side J s comes from a difference quotient of the network.
    void startSensitivity(std::span<const double> s0);
    //! The sensitivity at the last return time (physical states).
    std::vector<double> sensitivity();
    //! Stop carrying the sensitivity (plain integration again).
    void stopSensitivity();

    const Network& network() const { return m_network; }

private:
    static int rhs(sunrealtype t, N_Vector y, N_Vector ydot, void* self);
    static int errorWeights(N_Vector y, N_Vector ewt, void* self);
    static int jacobian(sunrealtype t, N_Vector y, N_Vector fy, SUNMatrix J, void* self,
                        N_Vector, N_Vector, N_Vector);
    static void errorHandler(int code, const char* module, const char* function, char* msg,
                             void* self);
    //! Throw IntegratorError for a failed call, or rethrow a stored callback exception.
    void check(int flag, const char* call);
public:
    std::vector<std::string> worstStates(int limit) const;
private:
    void addCountersTo(IntegratorStats& s) const;
    int callbackFailure(std::exception_ptr e, bool recoverable);

    struct ContextDeleter { void operator()(SUNContext c) const { SUNContext_Free(&c); } };
    struct VectorDeleter { void operator()(N_Vector v) const { N_VDestroy(v); } };
    struct MatrixDeleter { void operator()(SUNMatrix m) const { SUNMatDestroy(m); } };
    struct SolverDeleter { void operator()(SUNLinearSolver s) const { SUNLinSolFree(s); } };
    struct CvodeDeleter { void operator()(void* m) const { CVodeFree(&m); } };

    const Network& m_network;
    IntegratorOptions m_options;
    // Declaration order is destruction order reversed: the context dies last.
    std::unique_ptr<std::remove_pointer_t<SUNContext>, ContextDeleter> m_context;
    std::unique_ptr<std::remove_pointer_t<N_Vector>, VectorDeleter> m_y, m_sens;
    std::unique_ptr<std::remove_pointer_t<SUNMatrix>, MatrixDeleter> m_matrix;
    std::unique_ptr<std::remove_pointer_t<SUNLinearSolver>, SolverDeleter> m_solver;
    std::unique_ptr<void, CvodeDeleter> m_cvode;

    int m_n = 0;                     //!< physical states
    int m_nq = 0;                    //!< accumulators
    std::vector<long> m_column_starts, m_row_indices; //!< pattern with the accumulators' diagonal
    std::vector<double> m_quad_values;
    std::exception_ptr m_callback_error;
    std::string m_last_message;
    double m_t = 0.0;
    IntegratorStats m_previous; //!< counters of earlier (re)initialisations
    bool m_sens_initialised = false;
    bool m_sens_active = false;
    // The difference-quotient sensitivity right-hand side wants a parameter it can perturb;
    // the network does not read it, so the quotient is the pure state direction J s.
    double m_dummy_parameter = 1.0;
    double m_dummy_scale = 1.0;
    int m_dummy_list = 0;
};

} // namespace coldtip
