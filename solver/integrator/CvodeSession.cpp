#include "solver/integrator/CvodeSession.hpp"

#include "solver/integrator/Interrupt.hpp"
#include "solver/integrator/SerialKernels.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <numeric>
#include <cstdlib>
#include <utility>

namespace coldtip {

namespace {

//! The text of a SUNDIALS flag name, which CVodeGet*ReturnFlagName allocates with malloc
//! and leaves to the caller to free (CVODES user guide, v6.4, "CVodeGetReturnFlagName").
std::string flagName(char* name)
{
    std::string text = name ? name : "unknown flag";
    std::free(name);
    return text;
}
std::span<const double> viewOf(N_Vector v)
{
    return {N_VGetArrayPointer(v), static_cast<std::size_t>(N_VGetLength(v))};
}
std::span<double> mutableViewOf(N_Vector v)
{
    return {N_VGetArrayPointer(v), static_cast<std::size_t>(N_VGetLength(v))};
}
} // namespace

CvodeSession::CvodeSession(const Network& network, const IntegratorOptions& options, double t0,
                           std::span<const double> y0)
    : m_network(network), m_options(options), m_n(network.size()),
      m_nq(network.nQuadratures()), m_t(t0)
{
    if (static_cast<int>(y0.size()) != m_n ||
        static_cast<int>(options.absolute_tolerances.size()) != m_n)
        throw std::invalid_argument("CvodeSession: state or tolerance vector of wrong size");
    const sunindextype n = m_n + m_nq;

    SUNContext ctx = nullptr;
    if (SUNContext_Create(nullptr, &ctx) != 0 || !ctx)
        throw IntegratorError("SUNContext_Create failed", -1, t0, {});
    m_context.reset(ctx);
    m_y.reset(N_VNew_Serial(n, ctx));
    if (!m_y) throw IntegratorError("N_VNew_Serial failed", -1, t0, {});
    installSerialKernels(m_y.get());
    N_VConst(0.0, m_y.get());
    std::copy(y0.begin(), y0.end(), N_VGetArrayPointer(m_y.get()));

    // The network's pattern plus a diagonal entry for every accumulator.
    const SparsityPattern& p = network.pattern();
    m_column_starts = p.column_starts;
    m_row_indices = p.row_indices;
    for (int k = 0; k < m_nq; ++k) {
        m_row_indices.push_back(m_n + k);
        m_column_starts.push_back(static_cast<long>(m_row_indices.size()));
    }
    const sunindextype nnz = static_cast<sunindextype>(m_row_indices.size());
    m_matrix.reset(SUNSparseMatrix(n, n, nnz, CSC_MAT, ctx));
    if (!m_matrix) throw IntegratorError("SUNSparseMatrix failed", -1, t0, {});
    installSparseKernels(m_matrix.get());
    m_solver.reset(SUNLinSol_KLU(m_y.get(), m_matrix.get(), ctx));
    if (!m_solver) throw IntegratorError("SUNLinSol_KLU failed", -1, t0, {});

    m_cvode.reset(CVodeCreate(CV_BDF, ctx));
    if (!m_cvode) throw IntegratorError("CVodeCreate failed", -1, t0, {});
    void* mem = m_cvode.get();
    check(CVodeSetErrHandlerFn(mem, &CvodeSession::errorHandler, this), "CVodeSetErrHandlerFn");
    check(CVodeInit(mem, &CvodeSession::rhs, t0, m_y.get()), "CVodeInit");
    check(CVodeSetUserData(mem, this), "CVodeSetUserData");
    check(CVodeWFtolerances(mem, &CvodeSession::errorWeights), "CVodeWFtolerances");
    check(CVodeSetLinearSolver(mem, m_solver.get(), m_matrix.get()), "CVodeSetLinearSolver");
    check(CVodeSetJacFn(mem, &CvodeSession::jacobian), "CVodeSetJacFn");
    check(CVodeSetMaxOrd(mem, options.max_order), "CVodeSetMaxOrd");
    check(CVodeSetMaxNumSteps(mem, options.max_steps_per_call), "CVodeSetMaxNumSteps");
    if (options.initial_step > 0.0)
        check(CVodeSetInitStep(mem, options.initial_step), "CVodeSetInitStep");
    m_quad_values.assign(m_nq, 0.0);
}

CvodeSession::~CvodeSession() = default;

void CvodeSession::reinit(double t0, std::span<const double> y0)
{
    stopSensitivity();
    addCountersTo(m_previous);
    N_VConst(0.0, m_y.get());
    std::copy(y0.begin(), y0.end(), N_VGetArrayPointer(m_y.get()));
    check(CVodeReInit(m_cvode.get(), t0, m_y.get()), "CVodeReInit");
    m_t = t0;
}

double CvodeSession::advance(double t_out, double t_stop)
{
    void* mem = m_cvode.get();
    check(CVodeSetStopTime(mem, t_stop), "CVodeSetStopTime");
    sunrealtype t_reached = m_t;
    const int flag = CVode(mem, t_out, m_y.get(), &t_reached, CV_NORMAL);
    // In 6.4, tout == tstop returns CV_SUCCESS (stop time left armed); tout past tstop
    // returns CV_TSTOP_RETURN. Both are success; the stop time is re-armed every call.
    if (flag < 0) check(flag, "CVode");
    if (m_callback_error) std::rethrow_exception(std::exchange(m_callback_error, nullptr));
    m_t = t_reached;
    return m_t;
}

std::span<const double> CvodeSession::state() const
{
    return viewOf(m_y.get()).first(static_cast<std::size_t>(m_n));
}

const std::vector<double>& CvodeSession::quadratures()
{
    const double* y = N_VGetArrayPointer(m_y.get());
    std::copy(y + m_n, y + m_n + m_nq, m_quad_values.begin());
    return m_quad_values;
}

void CvodeSession::addCountersTo(IntegratorStats& s) const
{
    void* mem = m_cvode.get();
    long v = 0;
    if (CVodeGetNumSteps(mem, &v) == CV_SUCCESS) s.steps += v;
    if (CVodeGetNumRhsEvals(mem, &v) == CV_SUCCESS) s.rhs_evaluations += v;
    if (m_sens_initialised && CVodeGetNumRhsEvalsSens(mem, &v) == CV_SUCCESS)
        s.rhs_evaluations += v;
    if (CVodeGetNumJacEvals(mem, &v) == CV_SUCCESS) s.jacobian_evaluations += v;
    if (CVodeGetNumLinSolvSetups(mem, &v) == CV_SUCCESS) s.linear_setups += v;
    if (CVodeGetNumErrTestFails(mem, &v) == CV_SUCCESS) s.error_test_failures += v;
    if (CVodeGetNumNonlinSolvIters(mem, &v) == CV_SUCCESS) s.nonlinear_iterations += v;
    if (CVodeGetNumNonlinSolvConvFails(mem, &v) == CV_SUCCESS) s.nonlinear_failures += v;
}

IntegratorStats CvodeSession::stats() const
{
    IntegratorStats s = m_previous;
    addCountersTo(s);
    return s;
}

void CvodeSession::setMaxSteps(long steps)
{
    check(CVodeSetMaxNumSteps(m_cvode.get(), std::max(1L, steps)), "CVodeSetMaxNumSteps");
}

void CvodeSession::startSensitivity(std::span<const double> s0)
{
    void* mem = m_cvode.get();
    if (!m_sens) m_sens.reset(N_VClone(m_y.get()));
    N_VConst(0.0, m_sens.get());
    std::copy(s0.begin(), s0.end(), N_VGetArrayPointer(m_sens.get()));
    N_Vector vs[1] = {m_sens.get()};
    if (!m_sens_initialised) {
        check(CVodeSensInit(mem, 1, CV_STAGGERED, nullptr, vs), "CVodeSensInit");
        check(CVodeSetSensParams(mem, &m_dummy_parameter, &m_dummy_scale, &m_dummy_list),
              "CVodeSetSensParams");
        check(CVodeSensEEtolerances(mem), "CVodeSensEEtolerances");
        check(CVodeSetSensErrCon(mem, SUNFALSE), "CVodeSetSensErrCon");
        check(CVodeSetSensDQMethod(mem, CV_FORWARD, 0.0), "CVodeSetSensDQMethod");
        m_sens_initialised = true;
    } else {
        check(CVodeSensReInit(mem, CV_STAGGERED, vs), "CVodeSensReInit");
    }
    m_sens_active = true;
}

std::vector<double> CvodeSession::sensitivity()
{
    sunrealtype t = 0.0;
    N_Vector vs[1] = {m_sens.get()};
    check(CVodeGetSens(m_cvode.get(), &t, vs), "CVodeGetSens");
    const double* d = N_VGetArrayPointer(m_sens.get());
    return {d, d + m_n};
}

void CvodeSession::stopSensitivity()
{
    if (m_sens_active) check(CVodeSensToggleOff(m_cvode.get()), "CVodeSensToggleOff");
    m_sens_active = false;
}

double CvodeSession::lastStep() const
{
    sunrealtype h = 0.0;
    CVodeGetLastStep(m_cvode.get(), &h);
    return h;
}

std::vector<std::string> CvodeSession::worstStates(int limit) const
{
    const sunindextype n = m_n;
    N_Vector w = N_VClone(m_y.get());
    N_Vector e = N_VClone(m_y.get());
    std::vector<std::string> out;
    if (w && e && CVodeGetErrWeights(m_cvode.get(), w) == CV_SUCCESS &&
        CVodeGetEstLocalErrors(m_cvode.get(), e) == CV_SUCCESS) {
        const double* wd = N_VGetArrayPointer(w);
        const double* ed = N_VGetArrayPointer(e);
        std::vector<int> order(n);
        std::iota(order.begin(), order.end(), 0);
        auto size = [&](int k) { return std::abs(wd[k] * ed[k]); };
        const int m = std::min<int>(limit, static_cast<int>(n));
        std::partial_sort(order.begin(), order.begin() + m, order.end(),
                          [&](int a, int b) { return size(a) > size(b); });
        for (int i = 0; i < m && size(order[i]) > 0.0; ++i)
            out.push_back(fmt::format("{} (weighted error {:.3g})",
                                      m_network.stateName(order[i]), size(order[i])));
    }
    if (w) N_VDestroy(w);
    if (e) N_VDestroy(e);
    return out;
}

void CvodeSession::check(int flag, const char* call)
{
    if (flag >= 0) return;
    if (m_callback_error) std::rethrow_exception(std::exchange(m_callback_error, nullptr));
    sunrealtype t = m_t;
    if (m_cvode) CVodeGetCurrentTime(m_cvode.get(), &t);
    std::string what = fmt::format("{} failed with {} at t = {:.9g} s", call,
                                   flagName(CVodeGetReturnFlagName(flag)), t);
    if (!m_last_message.empty()) what += ": " + m_last_message;
    if (flag == CV_LSETUP_FAIL || flag == CV_LSOLVE_FAIL) {
        long lsflag = 0;
        if (CVodeGetLastLinFlag(m_cvode.get(), &lsflag) == CV_SUCCESS)
            what += fmt::format(" (linear solver: {})",
                                flagName(CVodeGetLinReturnFlagName(lsflag)));
    }
    std::vector<std::string> worst;
    if (m_cvode && flag != CV_MEM_NULL) worst = worstStates(10);
    if (!worst.empty()) {
        what += "; largest local errors in";
        for (std::size_t i = 0; i < std::min<std::size_t>(worst.size(), 5); ++i)
            what += (i ? ", " : " ") + worst[i];
    }
    throw IntegratorError(what, flag, t, std::move(worst));
}

int CvodeSession::callbackFailure(std::exception_ptr e, bool recoverable)
{
    if (recoverable) return 1;
    m_callback_error = e;
    return -1;
}

int CvodeSession::rhs(sunrealtype t, N_Vector y, N_Vector ydot, void* self)
{
    auto* s = static_cast<CvodeSession*>(self);
    try {
        throwIfInterrupted();
        const auto yv = viewOf(y).first(static_cast<std::size_t>(s->m_n));
        s->m_network.checkPhysical(yv);
        const auto rates = mutableViewOf(ydot);
        s->m_network.evaluate(t, yv, rates.first(static_cast<std::size_t>(s->m_n)),
                              rates.data() + s->m_n);
        for (double r : rates)
            if (!std::isfinite(r)) return 1; // e.g. a property outside its range: cut the step
        return 0;
    } catch (const RecoverableStateError&) {
        return s->callbackFailure(std::current_exception(), true);
    } catch (...) {
        return s->callbackFailure(std::current_exception(), false);
    }
}

int CvodeSession::errorWeights(N_Vector y, N_Vector ewt, void* self)
{
    // w_i = 1/(rtol |y_i| + atol_i) for the physical states, scaled by sqrt(N/n) so that a
    // WRMS norm over all N entries equals the norm over the n physical ones; accumulators
    // get weight zero (out of the error and convergence tests, like errconQ = false).
    auto* s = static_cast<CvodeSession*>(self);
    const double* yv = N_VGetArrayPointer(y);
    double* w = N_VGetArrayPointer(ewt);
    const double rtol = s->m_options.relative_tolerance;
    const double scale = std::sqrt(static_cast<double>(s->m_n + s->m_nq) / s->m_n);
    const auto& atol = s->m_options.absolute_tolerances;
    for (int i = 0; i < s->m_n; ++i) w[i] = scale / (rtol * std::abs(yv[i]) + atol[i]);
    for (int i = s->m_n; i < s->m_n + s->m_nq; ++i) w[i] = 0.0;
    return 0;
}

int CvodeSession::jacobian(sunrealtype t, N_Vector y, N_Vector, SUNMatrix J, void* self,
                           N_Vector, N_Vector, N_Vector)
{
    auto* s = static_cast<CvodeSession*>(self);
    try {
        throwIfInterrupted();
        // CVODE zeroes the whole matrix, index arrays included, before calling us: the
        // cached pattern goes back in, then the values by slot.
        const SparsityPattern& p = s->m_network.pattern();
        sunindextype* starts = SUNSparseMatrix_IndexPointers(J);
        sunindextype* rows = SUNSparseMatrix_IndexValues(J);
        std::copy(s->m_column_starts.begin(), s->m_column_starts.end(), starts);
        std::copy(s->m_row_indices.begin(), s->m_row_indices.end(), rows);
        double* data = SUNSparseMatrix_Data(J);
        std::span<double> values(data, static_cast<std::size_t>(p.nnz()));
        s->m_network.jacobian(t, viewOf(y).first(static_cast<std::size_t>(s->m_n)), values);
        std::fill(data + p.nnz(), data + s->m_row_indices.size(), 0.0);
        return 0;
    } catch (const RecoverableStateError&) {
        return s->callbackFailure(std::current_exception(), true);
    } catch (...) {
        return s->callbackFailure(std::current_exception(), false);
    }
}

void CvodeSession::errorHandler(int, const char* module, const char* function, char* msg,
                                void* self)
{
    auto* s = static_cast<CvodeSession*>(self);
    s->m_last_message = fmt::format("{} ({}: {})", msg ? msg : "", module ? module : "",
                                    function ? function : "");
}

} // namespace coldtip
