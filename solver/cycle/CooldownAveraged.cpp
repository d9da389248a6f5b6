#include "solver/cycle/CooldownAveraged.hpp"

#include <Eigen/Dense>

#include "solver/integrator/Interrupt.hpp"
#include <algorithm>
#include <chrono>
#include <cmath>
#include <cstdlib>
#include <exception>
#include <fmt/format.h>
#include <memory>

#include <cvodes/cvodes.h>
#include <nvector/nvector_serial.h>
#include <sundials/sundials_context.h>
#include <sunlinsol/sunlinsol_dense.h>
#include <sunmatrix/sunmatrix_dense.h>

#include "solver/components/PassageComponents.hpp"
#include "solver/cycle/CooldownHold.hpp"
#include "solver/cycle/ShootingNewton.hpp"

namespace coldtip {

namespace {

// tau of the hold [periods]. The hold damps every solid's swing within the cycle by a
// relative 1/(omega tau) (CooldownHold.hpp), and the regenerator's cold-end loss depends on
// that swing. Measured on the small test cold head (steady solver: 99.78 K): the slow
// equation settled at 100.24 K with tau = 5 periods (3 % damping), 99.89 K with 25 and
// 99.79 K with 50, in fewer cycles (8029, 3056, 3889).
constexpr double kHoldPeriods = 50.0;
constexpr int kBand = 8;                 // B of the band colouring
constexpr double kPerturbation = 0.05;   // [K] finite-difference step of a temperature
constexpr int kFirstSettleCycles = 60;   // the first evaluation starts from gas at rest
constexpr double kInitialStepPeriods = 10.0;
constexpr int kNewtonIterations = 8;     // most per macro step (CVODE's default: 3)
constexpr long kConfirmedSteps = 5;      // a settle matrix stays fresh for these steps
constexpr double kFollowerTolerance = 0.25; // [K] absolute, solids outside the cold head

using Clock = std::chrono::steady_clock;

//! A state to start an evaluation from: where an earlier one ended, and the hold
//! temperatures it had.
struct Warm {
    std::vector<double> state;
    std::vector<double> T; //!< [K] per solid node
};

//! One evaluation of the averaged heat flows.
struct Evaluation {
    double t = 0.0;
    std::vector<double> T;     //!< slow temperatures it belongs to [K]
    Warm from;                 //!< where it was lifted from
    std::vector<double> end;   //!< state at its end
    Warm next;                 //!< the start for the next evaluation
    long end_period = 0;
    std::vector<double> Q;     //!< net heat into every solid node over the last cycle [W]
    std::vector<double> f;     //!< dT/dt [K/s]
    CycleRecord last;
    int cycles = 0;
    double change = 0.0;       //!< last settle change, relative to Q_ref
    bool settled = false;
    double cold_offset = 0.0;  //!< mean T - T_hold of the cold body over the last cycle [K]
};

//! The slow equation and everything its evaluations need.
class SlowEquation {
public:
    SlowEquation(Machine& machine, const CooldownOptions& options)
        : m_machine(machine), m_net(machine.network()), m_options(options), m_ledger(machine),
          m_slow(machine.network(), machine.description().gas.charge_pressure,
                 machine.massFlowScale()),
          m_n(static_cast<int>(machine.network().solids().size()))
    {
        // The holds, with their channels, go into the network before any integrator sees
        // it; they only touch diagonal entries, already in the pattern.
        Network& net = machine.network();
        for (int i = 0; i < m_n; ++i) {
            QuadratureChannel q;
            q.name = net.solids()[i].name + ".cooldown_hold";
            q.kind = QuadratureChannel::Kind::SolidConduction;
            q.component = net.solids()[i].component;
            const int channel = net.addQuadrature(q);
            m_holds.push_back(&net.addElement<CooldownHold>(i, net.solids(), channel));
        }
        net.finalize();
        m_runner = std::make_unique<CycleRunner>(machine, CycleRunner::optionsFor(machine));
        mapCellsToSolids();
        for (int i = 0; i < m_n; ++i)
            if (i == m_ledger.bodies().front()) m_cold = i;
    }

    int size() const { return m_n; }
    int coldIndex() const { return m_cold; }
    const CooldownLedger& ledger() const { return m_ledger; }
    CycleRunner& runner() { return *m_runner; }
    const Network& network() const { return m_net; }
    double period() const { return m_machine.period(); }

    //! Heat flows at slow temperatures T and time t, lifted from the end of `from`; a fixed
    //! number of cycles if `cycles` > 0, else until settled.
    Evaluation evaluate(double t, std::span<const double> T, const Warm& from, int cycles = 0,
                        int max_cycles = 0)
    {
        Evaluation e;
        e.t = t;
        e.T.assign(T.begin(), T.end());
        e.from = from;
        std::vector<double> y = lift(from, T);
        const double tau = kHoldPeriods * period();
        struct Release {
            std::vector<CooldownHold*>& holds;
            ~Release()
            {
                for (CooldownHold* h : holds) h->hold(0.0, 0.0);
            }
        } release{m_holds};
        for (int i = 0; i < m_n; ++i) m_holds[i]->hold(T[i], 1.0 / tau);
        const long n0 = std::lround(t / period());
        m_runner->start(n0, y);
        const int limit = cycles > 0 ? cycles : max_cycles > 0 ? max_cycles
                                                               : m_options.max_settle_cycles;
        std::vector<double> previous;
        for (int j = 1; j <= limit; ++j) {
            e.last = m_runner->runCycle();
            ++e.cycles;
            ++m_cycles;
            e.Q = netHeat(e.last);
            if (!previous.empty()) {
                const CycleMetrics m = cycleMetrics(m_machine, e.last);
                const double q_ref =
                    std::max(std::abs(m.gross_cooling), 0.01 * std::abs(m.pv_power));
                double change = 0.0;
                for (int i = 0; i < m_n; ++i) change += std::abs(e.Q[i] - previous[i]);
                e.change = q_ref > 0.0 ? change / q_ref : change;
                e.settled = e.change <= m_options.settle_residual;
                if (cycles <= 0 && e.settled) break;
            }
            previous = e.Q;
        }
        e.end = e.last.end_state;
        e.end_period = m_runner->periodIndex();
        e.next = {e.end, e.T};
        e.f.resize(m_n);
        for (int i = 0; i < m_n; ++i) e.f[i] = e.Q[i] / capacity(i, T[i]);
        const int c = m_holds[m_cold]->channel();
        e.cold_offset = e.last.averages[c] * tau / capacity(m_cold, T[m_cold]);
        return e;
    }

    //! Band-coloured finite differences of f = Qbar/C around `base` into the dense
    //! column-major n x n matrix J (rows and columns of the slow temperatures only).
    Eigen::MatrixXd jacobian(const Evaluation& base)
    {
        Eigen::MatrixXd J = Eigen::MatrixXd::Zero(m_n, m_n);
        const int colours = std::min(m_n, 2 * kBand + 1);
        for (int c = 0; c < colours; ++c) {
            std::vector<double> T = base.T;
            for (int j = c; j < m_n; j += colours) T[j] += kPerturbation;
            const Evaluation p = evaluate(base.t, T, base.from, base.cycles);
            for (int j = c; j < m_n; j += colours)
                for (int i = std::max(0, j - kBand); i <= std::min(m_n - 1, j + kBand); ++i)
                    J(i, j) = (p.f[i] - base.f[i]) / kPerturbation;
        }
        ++m_jacobians;
        return J;
    }

    long cycles() const { return m_cycles; }
    long jacobians() const { return m_jacobians; }

    //! Heat capacity of solid i at T [J/K].
    double capacity(int i, double T) const { return solidState(T, m_net.solids()[i]).C; }

private:
    //! Net heat into every solid over a cycle: the change of its internal energy plus the
    //! heat its hold removed [W].
    std::vector<double> netHeat(const CycleRecord& r) const
    {
        const double Tp = r.t_end - r.t_start;
        std::vector<double> Q(m_n);
        for (int i = 0; i < m_n; ++i) {
            const int k = m_net.solids()[i].offset;
            Q[i] = (m_net.solidEnergy(i, r.end_state[k]) - m_net.solidEnergy(i, r.start_state[k])) /
                       Tp +
                   r.averages[m_holds[i]->channel()];
        }
        return Q;
    }

    //! The state `from` ended in, moved to the slow temperatures T: every solid and every
    //! gas cell shifted by the change of its solid's hold temperature (gas at its own
    //! pressure, the charge restored), so that each solid keeps its offset from the hold and
    //! its phase of the swing within the cycle.
    std::vector<double> lift(const Warm& from, std::span<const double> T) const
    {
        std::vector<double> y = from.state;
        std::vector<double> dx(m_slow.size(), 0.0);
        for (std::size_t c = 0; c < m_cell_solid.size(); ++c)
            if (const int s = m_cell_solid[c]; s >= 0) dx[2 * c + 1] = T[s] - from.T[s];
        const std::size_t first_solid = 2 * m_net.cells().size() + m_net.faces().size();
        for (int i = 0; i < m_n; ++i) dx[first_solid + i] = T[i] - from.T[i];
        m_slow.add(y, dx);
        return y;
    }

    //! The solid node each gas cell exchanges heat with (-1: none or a fixed wall).
    void mapCellsToSolids()
    {
        m_cell_solid.assign(m_net.cells().size(), -1);
        for (const auto& c : m_machine.components()) {
            if (!c->hasCells()) continue;
            const ComponentSlice& s = m_net.components()[c->index()];
            const int cells = s.last_cell - s.first_cell + 1;
            const auto* hx = dynamic_cast<const HeatExchanger*>(c.get());
            for (int k = 0; k < cells; ++k) {
                if (hx && hx->bodyNode() >= 0)
                    m_cell_solid[s.first_cell + k] = hx->bodyNode();
                else if (!hx && s.first_solid >= 0 && s.last_solid - s.first_solid + 1 == cells)
                    m_cell_solid[s.first_cell + k] = s.first_solid + k;
            }
        }
    }

    Machine& m_machine;
    const Network& m_net;
    const CooldownOptions& m_options;
    CooldownLedger m_ledger;
    ShootingVariables m_slow;
    int m_n;
    int m_cold = 0;
    std::vector<CooldownHold*> m_holds;
    std::vector<int> m_cell_solid;
    std::unique_ptr<CycleRunner> m_runner;
    long m_cycles = 0;
    long m_jacobians = 0;
};

// ---- the macro integrator ------------------------------------------------------------------

struct ContextDeleter { void operator()(SUNContext c) const { SUNContext_Free(&c); } };
struct VectorDeleter { void operator()(N_Vector v) const { N_VDestroy(v); } };
struct MatrixDeleter { void operator()(SUNMatrix m) const { SUNMatDestroy(m); } };
struct SolverDeleter { void operator()(SUNLinearSolver s) const { SUNLinSolFree(s); } };
struct CvodeDeleter { void operator()(void* m) const { CVodeFree(&m); } };

//! CVODE on the slow equation, state (T_0 .. T_{n-1}, E).
class MacroIntegrator {
public:
    MacroIntegrator(SlowEquation& slow, const CooldownOptions& options,
                    const std::vector<double>& y0)
        : m_slow(slow), m_options(options), m_n(slow.size())
    {
        // The first evaluation, from the gas at rest, is also the history's first row.
        const auto& solids = slow.network().solids();
        std::vector<double> T0(m_n);
        for (int i = 0; i < m_n; ++i) T0[i] = y0[solids[i].offset];
        m_last = slow.evaluate(0.0, T0, Warm{y0, T0}, 0, kFirstSettleCycles);
        m_warm = m_last.next;
        m_first = m_last;

        SUNContext ctx = nullptr;
        if (SUNContext_Create(nullptr, &ctx) != 0) throw std::runtime_error("SUNContext_Create failed");
        m_context.reset(ctx);
        m_x.reset(N_VNew_Serial(m_n + 1, ctx));
        m_atol.reset(N_VNew_Serial(m_n + 1, ctx));
        double* x = N_VGetArrayPointer(m_x.get());
        double* atol = N_VGetArrayPointer(m_atol.get());
        // The local error test at relative_tolerance is on the cold-head bodies, the slow
        // modes whose errors accumulate; the other solids (matrix, tube wall) follow them
        // within tens of cycles, so their errors do not accumulate and a looser absolute
        // test keeps the settle noise of their heat flows from capping the step.
        const auto& bodies = slow.ledger().bodies();
        for (int i = 0; i < m_n; ++i) {
            x[i] = T0[i];
            const bool body = std::find(bodies.begin(), bodies.end(), i) != bodies.end();
            atol[i] = body ? 1e-3 * options.relative_tolerance * 100.0 : kFollowerTolerance;
        }
        x[m_n] = 0.0;
        atol[m_n] = 1.0; // [J]
        m_matrix.reset(SUNDenseMatrix(m_n + 1, m_n + 1, ctx));
        m_solver.reset(SUNLinSol_Dense(m_x.get(), m_matrix.get(), ctx));
        m_cvode.reset(CVodeCreate(CV_BDF, ctx));
        void* mem = m_cvode.get();
        check(CVodeInit(mem, &MacroIntegrator::rhs, 0.0, m_x.get()), "CVodeInit");
        check(CVodeSetUserData(mem, this), "CVodeSetUserData");
        check(CVodeSVtolerances(mem, options.relative_tolerance, m_atol.get()), "CVodeSVtolerances");
        check(CVodeSetLinearSolver(mem, m_solver.get(), m_matrix.get()), "CVodeSetLinearSolver");
        check(CVodeSetJacFn(mem, &MacroIntegrator::jac), "CVodeSetJacFn");
        check(CVodeSetJacEvalFrequency(mem, 100000), "CVodeSetJacEvalFrequency");
        // A matrix costs 2B+1 evaluations, a Newton iteration one: let an old matrix
        // iterate longer before a convergence failure asks for a new one.
        check(CVodeSetMaxNonlinIters(mem, kNewtonIterations), "CVodeSetMaxNonlinIters");
        check(CVodeSetInitStep(mem, kInitialStepPeriods * slow.period()), "CVodeSetInitStep");
        check(CVodeSetMaxStep(mem, options.time_limit / 50.0), "CVodeSetMaxStep");
        check(CVodeSetMaxNumSteps(mem, 100000), "CVodeSetMaxNumSteps");
        check(CVodeSetStopTime(mem, options.time_limit), "CVodeSetStopTime");
        if (!options.report_at.empty())
            check(CVodeRootInit(mem, static_cast<int>(options.report_at.size()),
                                &MacroIntegrator::roots),
                  "CVodeRootInit");
    }

    //! One internal step; returns false at the stop time. `roots` gets the report
    //! temperatures crossed (their index) when the step ended at a crossing.
    bool step(std::vector<int>& roots)
    {
        roots.clear();
        sunrealtype t = 0.0;
        const int flag = CVode(m_cvode.get(), m_options.time_limit, m_x.get(), &t, CV_ONE_STEP);
        if (m_error) std::rethrow_exception(std::exchange(m_error, nullptr));
        check(flag, "CVode");
        m_t = t;
        nextStep();
        if (flag == CV_ROOT_RETURN) {
            std::vector<int> found(m_options.report_at.size(), 0);
            check(CVodeGetRootInfo(m_cvode.get(), found.data()), "CVodeGetRootInfo");
            for (std::size_t k = 0; k < found.size(); ++k)
                if (found[k] != 0) roots.push_back(static_cast<int>(k));
        }
        return flag != CV_TSTOP_RETURN && m_t < m_options.time_limit;
    }

    double time() const { return m_t; }
    std::span<const double> state() const
    {
        return {N_VGetArrayPointer(m_x.get()), static_cast<std::size_t>(m_n + 1)};
    }
    const Evaluation& last() const { return m_last; }
    const Evaluation& first() const { return m_first; }
    //! An evaluation at the current state (re-synchronised there).
    const Evaluation& evaluateHere()
    {
        m_last = m_slow.evaluate(m_t, state().first(m_n), m_warm);
        nextStep();
        return m_last;
    }
    //! The last finite-difference matrix (empty before the first).
    const Eigen::MatrixXd& lastJacobian() const { return m_J; }
    Eigen::MatrixXd freshJacobian()
    {
        m_J = m_slow.jacobian(m_last);
        return m_J;
    }

    long steps() const { return counter(&CVodeGetNumSteps); }
    long errorTestFailures() const { return counter(&CVodeGetNumErrTestFails); }
    long evaluations() const { return m_evaluations; }
    double worstChange() const { return m_worst_change; }
    int unsettled() const { return m_unsettled; }
    double largestColdOffset() const { return m_cold_offset; }

private:
    //! Every evaluation within one macro step (the Newton iterations, the matrix, retries
    //! after a failed test) starts from the same gas and runs the same number of cycles,
    //! so that Qbar is a deterministic function of T there: the first settles, the rest
    //! repeat its count. Re-synchronising at every call instead would add the settle noise
    //! to every Newton iteration, which then fails to converge and cuts the step.
    Evaluation evaluateInStep(double t, std::span<const double> T)
    {
        Evaluation e = m_slow.evaluate(t, T, m_warm, m_step_cycles);
        if (m_step_cycles == 0) m_step_cycles = e.cycles;
        return e;
    }
    //! The gas of the last evaluation starts the next macro step.
    void nextStep()
    {
        m_warm = m_last.next;
        m_step_cycles = 0;
    }

    long counter(int (*get)(void*, long*)) const
    {
        long v = 0;
        get(m_cvode.get(), &v);
        return v;
    }

    void check(int flag, const char* call) const
    {
        if (flag >= 0) return;
        throw std::runtime_error(fmt::format("slow equation: {} failed with {} at t = {:.6g} s",
                                             call, CVodeGetReturnFlagName(flag), m_t));
    }

    static int rhs(sunrealtype t, N_Vector x, N_Vector xdot, void* self)
    {
        auto* m = static_cast<MacroIntegrator*>(self);
        try {
            const double* xv = N_VGetArrayPointer(x);
            m->m_last = m->evaluateInStep(t, {xv, static_cast<std::size_t>(m->m_n)});
            const Evaluation& e = m->m_last;
            ++m->m_evaluations;
            if (!e.settled) ++m->m_unsettled;
            else m->m_worst_change = std::max(m->m_worst_change, e.change);
            m->m_cold_offset = std::max(m->m_cold_offset, std::abs(e.cold_offset));
            double* d = N_VGetArrayPointer(xdot);
            double net = 0.0;
            for (int i = 0; i < m->m_n; ++i) d[i] = e.f[i];
            for (int b : m->m_slow.ledger().bodies()) net -= e.Q[b];
            d[m->m_n] = net;
            return 0;
        } catch (const IntegratorError&) {
            return 1; // a failed short integration: CVODE retries with a shorter step
        } catch (...) {
            m->m_error = std::current_exception();
            return -1;
        }
    }

    static int jac(sunrealtype t, N_Vector x, N_Vector, SUNMatrix J, void* self, N_Vector,
                   N_Vector, N_Vector)
    {
        auto* m = static_cast<MacroIntegrator*>(self);
        try {
            const std::span<const double> T(N_VGetArrayPointer(x),
                                            static_cast<std::size_t>(m->m_n));
            // CVODE forms the matrix where it last evaluated the right-hand side; if not,
            // evaluate there first (the differences need their base).
            if (m->m_last.t != t || !std::equal(T.begin(), T.end(), m->m_last.T.begin())) {
                m->m_last = m->evaluateInStep(t, T);
            }
            m->m_J = m->m_slow.jacobian(m->m_last);
            SUNMatZero(J);
            for (int j = 0; j < m->m_n; ++j)
                for (int i = 0; i < m->m_n; ++i) SM_ELEMENT_D(J, i, j) = m->m_J(i, j);
            return 0;
        } catch (const IntegratorError&) {
            return 1;
        } catch (...) {
            m->m_error = std::current_exception();
            return -1;
        }
    }

    static int roots(sunrealtype, N_Vector x, sunrealtype* g, void* self)
    {
        auto* m = static_cast<MacroIntegrator*>(self);
        const double Tc = N_VGetArrayPointer(x)[m->m_slow.coldIndex()];
        for (std::size_t k = 0; k < m->m_options.report_at.size(); ++k)
            g[k] = Tc - m->m_options.report_at[k];
        return 0;
    }

    SlowEquation& m_slow;
    const CooldownOptions& m_options;
    int m_n;
    Evaluation m_last, m_first;
    Warm m_warm;          //!< the gas every evaluation of the current macro step starts from
    int m_step_cycles = 0; //!< their cycle count (0: not yet settled in this step)
    Eigen::MatrixXd m_J;
    double m_t = 0.0;
    long m_evaluations = 0;
    double m_worst_change = 0.0;
    int m_unsettled = 0;
    double m_cold_offset = 0.0;
    std::exception_ptr m_error;
    std::unique_ptr<std::remove_pointer_t<SUNContext>, ContextDeleter> m_context;
    std::unique_ptr<std::remove_pointer_t<N_Vector>, VectorDeleter> m_x, m_atol;
    std::unique_ptr<std::remove_pointer_t<SUNMatrix>, MatrixDeleter> m_matrix;
    std::unique_ptr<std::remove_pointer_t<SUNLinearSolver>, SolverDeleter> m_solver;
    std::unique_ptr<void, CvodeDeleter> m_cvode;
};

//! The row of an evaluation at slow state x (T, E).
CooldownRow rowOf(const SlowEquation& slow, double t, std::span<const double> x,
                  const Evaluation& e)
{
    std::vector<double> y = e.end;
    const auto& solids = slow.network().solids();
    for (int i = 0; i < slow.size(); ++i) y[solids[i].offset] = x[i];
    CooldownRow r = slow.ledger().row(t, y, e.last);
    r.net_cooling_integral = x[slow.size()];
    return r;
}

//! |(J^-1 f)_cold|: the cold body's part of the Newton step to the fixed point [K].
double coldDistance(const Eigen::MatrixXd& J, const Evaluation& e, int cold)
{
    if (J.size() == 0) return HUGE_VAL;
    const Eigen::VectorXd f = Eigen::Map<const Eigen::VectorXd>(e.f.data(), e.f.size());
    return std::abs(J.partialPivLu().solve(f)(cold));
}

} // namespace

CooldownOutcome averagedCooldown(Machine& machine, const CooldownOptions& o,
                                 const std::vector<double>& y0, const CooldownCallback& on_row)
{
    const auto t0 = Clock::now();
    CooldownOutcome out;
    out.method = "accelerated";
    out.status = "time-limit";
    out.state = y0; // until a macro step completes (an interruption in the first one)
    SlowEquation slow(machine, o);
    const IntegratorStats before = slow.runner().session().stats();
    ReportClock clock(o.report_at);
    const int cold = slow.coldIndex();
    const double T_start = y0[machine.network().solids()[cold].offset];
    try {
        MacroIntegrator macro(slow, o, y0);
        for (std::size_t k = 0; k < o.report_at.size(); ++k)
            if (T_start <= o.report_at[k]) clock.reached(k, 0.0);
        std::vector<double> x0(macro.state().begin(), macro.state().end());
        out.history.push_back(rowOf(slow, 0.0, x0, macro.first()));
        std::vector<int> roots;
        long confirmed_at = -kConfirmedSteps - 1; // macro step of the last fresh matrix
        bool more = true;
        while (more) {
            try {
                more = macro.step(roots);
            } catch (const Interrupted&) {
                out.status = "interrupted"; // within a macro step: the last complete one is kept
                break;
            }
            for (int k : roots) clock.reached(static_cast<std::size_t>(k), macro.time());
            const CooldownRow row = rowOf(slow, macro.time(), macro.state(), macro.last());
            out.history.push_back(row);
            if (on_row && !on_row(row)) {
                out.status = "interrupted";
                break;
            }
            // Settled: the Newton step to the fixed point, first with the last matrix, then
            // confirmed with a fresh one at a fresh evaluation here.
            // A matrix fresh from a confirmation a few steps back needs no second one: near
            // zero net cooling the noise of the heat flows would otherwise ask for a new
            // matrix (2B+1 evaluations) at every step.
            out.distance_estimate = coldDistance(macro.lastJacobian(), macro.last(), cold);
            if (out.distance_estimate <= o.settle_tolerance) {
                if (macro.steps() - confirmed_at > kConfirmedSteps) {
                    macro.evaluateHere();
                    out.distance_estimate =
                        coldDistance(macro.freshJacobian(), macro.last(), cold);
                    confirmed_at = macro.steps();
                }
                if (out.distance_estimate <= o.settle_tolerance) {
                    out.status = "settled";
                    break;
                }
            }
        }
        const Evaluation& e = macro.last();
        out.state = e.end;
        out.period_index = e.end_period;
        out.end_time = macro.time();
        out.net_cooling_integral = macro.state()[slow.size()];
        out.macro_steps = macro.steps();
        out.error_test_failures = macro.errorTestFailures();
        out.heat_flow_evaluations = macro.evaluations();
        out.largest_settle_change = macro.worstChange();
        out.unsettled_evaluations = macro.unsettled();
        out.largest_cold_offset = macro.largestColdOffset();
    } catch (const Interrupted&) {
        out.status = "interrupted"; // outside a macro step (a settle check, the first one)
    } catch (const std::exception& e) {
        out.status = "failed";
        out.failure = e.what();
    }
    out.jacobian_evaluations = slow.jacobians();
    out.cycles = slow.cycles();
    out.reports = clock.reports();
    if (!out.state.empty())
        out.body_energy_change =
            slow.ledger().bodyEnergy(y0) - slow.ledger().bodyEnergy(out.state);
    out.work = slow.runner().session().stats() - before;
    out.wall_time_s = std::chrono::duration<double>(Clock::now() - t0).count();
    return out;
}

} // namespace coldtip
