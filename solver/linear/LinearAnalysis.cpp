#include "solver/linear/LinearAnalysis.hpp"

#include <Eigen/SparseCore>
#include <Eigen/SparseLU>
#include <stdexcept>

#include "solver/linear/OrificePhasors.hpp"

namespace coldtip {

namespace {

//! Holds the piston at a given volume and rate for the linearisation and restores it.
class HeldPiston {
public:
    explicit HeldPiston(MovingBoundary& piston) : m_piston(piston), m_saved(piston) {}
    ~HeldPiston() { m_piston = m_saved; }
    HeldPiston(const HeldPiston&) = delete;
    HeldPiston& operator=(const HeldPiston&) = delete;

    //! At t = 0 the piston then has volume V and rate dV/dt = rate.
    void set(double V, double rate)
    {
        // V(0) = dead + A_p X s and dV/dt(0) = -A_p X s omega: choose s, then dead.
        const double Ax = m_saved.piston_area * m_saved.amplitude;
        m_piston.scale = Ax > 0.0 && m_saved.omega > 0.0 ? -rate / (Ax * m_saved.omega) : 0.0;
        m_piston.dead_volume = V - Ax * m_piston.scale;
    }
    const MovingBoundary& saved() const { return m_saved; }

private:
    MovingBoundary& m_piston;
    MovingBoundary m_saved;
};

} // namespace

std::vector<double> linearMeanState(const Machine& machine,
                                    const std::vector<double>& cell_temperature,
                                    const std::vector<double>& solid_temperature)
{
    const Network& net = machine.network();
    const auto& cells = net.cells();
    const GasProperties& gas = net.gas();
    if (!cell_temperature.empty() && cell_temperature.size() != cells.size())
        throw std::runtime_error("mean temperature profile has " +
                                 std::to_string(cell_temperature.size()) + " cells, the case " +
                                 std::to_string(cells.size()));
    if (!solid_temperature.empty() && solid_temperature.size() != net.solids().size())
        throw std::runtime_error("mean solid temperatures do not fit the case's solid nodes");
    const MovingBoundary& piston = machine.drive().piston();
    auto volumeOf = [&](const GasCell& c) { return c.piston ? piston.meanVolume() : c.volume; };
    auto temperatureOf = [&](std::size_t i) {
        return cell_temperature.empty() ? cells[i].initial_temperature : cell_temperature[i];
    };
    double v_over_t = 0.0;
    for (std::size_t i = 0; i < cells.size(); ++i) v_over_t += volumeOf(cells[i]) / temperatureOf(i);
    const double p_m = machine.chargeMass() * gas.R / v_over_t;
    std::vector<double> y(net.size(), 0.0);
    for (std::size_t i = 0; i < cells.size(); ++i) {
        const double T = temperatureOf(i);
        const double m = p_m * volumeOf(cells[i]) / (gas.R * T);
        y[cells[i].offset] = m;
        y[cells[i].offset + 1] = m * gas.cv * T;
    }
    for (std::size_t k = 0; k < net.solids().size(); ++k)
        y[net.solids()[k].offset] =
            solid_temperature.empty() ? net.solids()[k].initial_temperature : solid_temperature[k];
    return y;
}

LinearSolution solveLinear(Machine& machine, const std::vector<double>& y_m)
{
    Network& net = machine.network();
    const int n = net.size();
    if (static_cast<int>(y_m.size()) != n) throw std::logic_error("mean state does not fit");
    HeldPiston held(machine.drive().piston());
    const MovingBoundary& drive = held.saved();
    const double V_m = drive.meanVolume();
    LinearSolution s;
    s.omega = drive.omega;
    s.piston_area = drive.piston_area;
    // x(t) = X sin(omega t) = Re[-i X e^{i omega t}]
    s.displacement = Complex(0.0, -drive.scale * drive.amplitude);
    s.mean_state = y_m;

    // J at the mean state, the piston at rest at its mean volume.
    held.set(V_m, 0.0);
    const SparsityPattern& pattern = net.pattern();
    std::vector<double> values(pattern.nnz());
    net.jacobian(0.0, y_m, values);

    // dF/dV by central differences, dF/d(dV/dt) by a one-sided difference (F is linear in
    // the rate: only the piston work -p dV/dt sees it).
    std::vector<double> fp(n), fm(n), f_moving(n), f_still(n);
    const double hV = 1e-6 * V_m;
    held.set(V_m + hV, 0.0);
    net.evaluate(0.0, y_m, fp, nullptr);
    held.set(V_m - hV, 0.0);
    net.evaluate(0.0, y_m, fm, nullptr);
    const double hR = 1e-6 * V_m * drive.omega;
    held.set(V_m, 0.0);
    net.evaluate(0.0, y_m, f_still, nullptr);
    held.set(V_m, hR);
    net.evaluate(0.0, y_m, f_moving, nullptr);

    // Gas states only: solid rows and columns are dropped (held temperatures).
    std::vector<int> reduced(n, -1), full;
    for (const GasCell& c : net.cells()) reduced[c.offset] = reduced[c.offset + 1] = 0;
    for (const FlowFace& f : net.faces()) reduced[f.offset] = 0;
    for (int k = 0; k < n; ++k)
        if (reduced[k] == 0) {
            reduced[k] = static_cast<int>(full.size());
            full.push_back(k);
        }
    const int nr = static_cast<int>(full.size());
    const Complex iw(0.0, s.omega);
    std::vector<Eigen::Triplet<Complex>> triplets;
    triplets.reserve(pattern.nnz() + nr);
    for (int r = 0; r < nr; ++r) triplets.emplace_back(r, r, iw);
    for (int col = 0; col < n; ++col) {
        if (reduced[col] < 0) continue;
        for (long slot = pattern.column_starts[col]; slot < pattern.column_starts[col + 1]; ++slot) {
            const int row = static_cast<int>(pattern.row_indices[slot]);
            if (reduced[row] < 0 || values[slot] == 0.0) continue;
            triplets.emplace_back(reduced[row], reduced[col], -values[slot]);
        }
    }
    Eigen::SparseMatrix<Complex> A(nr, nr);
    A.setFromTriplets(triplets.begin(), triplets.end());
    Eigen::VectorXcd rhs(nr);
    for (int r = 0; r < nr; ++r) {
        const int k = full[r];
        const double dF_dV = (fp[k] - fm[k]) / (2.0 * hV);
        const double dF_drate = (f_moving[k] - f_still[k]) / hR;
        rhs[r] = -drive.piston_area * (dF_dV + iw * dF_drate) * s.displacement;
    }
    Eigen::SparseLU<Eigen::SparseMatrix<Complex>> lu;
    lu.analyzePattern(A);
    lu.factorize(A);
    if (lu.info() != Eigen::Success)
        throw std::runtime_error("linear analysis: the system (i omega I - J) is singular: " +
                                 lu.lastErrorMessage());
    // Two steps of iterative refinement: the rows mix kg/s, W and kg/s^2, and one LU
    // solve leaves residuals of 1e-8 relative in the mass balances.
    Eigen::VectorXcd x = lu.solve(rhs);
    for (int step = 0; step < 2; ++step) x += lu.solve(rhs - A * x);
    s.state.assign(n, 0.0);
    for (int r = 0; r < nr; ++r) s.state[full[r]] = x[r];

    // What follows for every cell and face.
    const GasProperties& gas = net.gas();
    const auto& cells = net.cells();
    const std::size_t nc = cells.size();
    s.volume.resize(nc);
    s.p_mean.resize(nc), s.T_mean.resize(nc), s.rho_mean.resize(nc);
    s.pressure.resize(nc), s.temperature.resize(nc), s.density.resize(nc);
    s.volume_change.assign(nc, 0.0);
    for (std::size_t i = 0; i < nc; ++i) {
        const GasCell& c = cells[i];
        const double V = c.piston ? V_m : c.volume;
        const double m = y_m[c.offset], E = y_m[c.offset + 1];
        const Complex m1 = s.state[c.offset], E1 = s.state[c.offset + 1];
        const Complex V1 = c.piston ? -drive.piston_area * s.displacement : Complex(0.0);
        s.volume[i] = V;
        s.volume_change[i] = V1;
        s.p_mean[i] = (gas.gamma - 1.0) * E / V;
        s.T_mean[i] = E / (m * gas.cv);
        s.rho_mean[i] = m / V;
        s.pressure[i] = (gas.gamma - 1.0) * (E1 / V - E * V1 / (V * V));
        s.temperature[i] = (E1 - s.T_mean[i] * gas.cv * m1) / (m * gas.cv);
        s.density[i] = m1 / V - m * V1 / (V * V);
    }
    s.mass_flow.resize(net.faces().size());
    for (std::size_t f = 0; f < net.faces().size(); ++f) s.mass_flow[f] = s.state[net.faces()[f].offset];

    s.mass_residual.assign(nc, 0.0);
    for (std::size_t i = 0; i < nc; ++i) s.mass_residual[i] = iw * s.state[cells[i].offset];
    for (std::size_t f = 0; f < net.faces().size(); ++f) {
        s.mass_residual[net.faces()[f].from] += s.mass_flow[f];
        s.mass_residual[net.faces()[f].to] -= s.mass_flow[f];
    }
    for (const OrificePhasor& o : orificePhasors(net, y_m, s.state)) {
        s.mass_residual[o.orifice.from] += o.mass_flow;
        s.mass_residual[o.orifice.to] -= o.mass_flow;
        s.orifice_flow.push_back(o.mass_flow);
    }
    return s;
}

FirstHarmonics firstHarmonics(const Machine& machine, const LinearSolution& s)
{
    const Complex unit = s.displacement / std::abs(s.displacement);
    auto referred = [&](const std::vector<Complex>& v) {
        std::vector<Complex> r(v.size());
        for (std::size_t i = 0; i < v.size(); ++i) r[i] = v[i] / unit;
        return r;
    };
    FirstHarmonics h;
    h.cell_pressure = referred(s.pressure);
    h.cell_temperature = referred(s.temperature);
    h.cell_density = s.rho_mean;
    h.face_mass_flow = referred(s.mass_flow);
    h.orifice_mass_flow = referred(s.orifice_flow);
    h.piston_volume_flow = Complex(0.0, s.omega) * s.piston_area * s.displacement / unit;
    h.cp = machine.network().gas().cp;
    return h;
}

} // namespace coldtip
