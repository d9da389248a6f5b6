#include "solver/network/Network.hpp"

#include <algorithm>
#include <cmath>
#include <fmt/format.h>
#include <stdexcept>

namespace coldtip {

int SparsityPattern::slot(int row, int col) const
{
    const auto begin = row_indices.begin() + column_starts.at(col);
    const auto end = row_indices.begin() + column_starts.at(col + 1);
    const auto it = std::lower_bound(begin, end, static_cast<long>(row));
    if (it == end || *it != row)
        throw std::logic_error(fmt::format("entry ({}, {}) is not in the pattern", row, col));
    return static_cast<int>(it - row_indices.begin());
}

Network::Network(GasProperties gas) : m_gas(gas) {}

int Network::addCell(GasCell cell)
{
    if (m_nodes_frozen) throw std::logic_error("Network: nodes added after elements");
    cell.offset = m_n;
    m_state_info.push_back({StateKind::Mass, static_cast<int>(m_cells.size())});
    m_state_info.push_back({StateKind::Energy, static_cast<int>(m_cells.size())});
    m_n += 2;
    m_cells.push_back(std::move(cell));
    return static_cast<int>(m_cells.size()) - 1;
}

int Network::addFace(FlowFace face)
{
    if (m_nodes_frozen) throw std::logic_error("Network: nodes added after elements");
    face.offset = m_n++;
    m_state_info.push_back({StateKind::MassFlow, static_cast<int>(m_faces.size())});
    m_faces.push_back(std::move(face));
    return static_cast<int>(m_faces.size()) - 1;
}

int Network::addSolid(SolidNode node)
{
    if (m_nodes_frozen) throw std::logic_error("Network: nodes added after elements");
    node.offset = m_n++;
    const int index = static_cast<int>(m_solids.size());
    m_state_info.push_back({StateKind::SolidTemperature, index});
    m_solids.push_back(std::move(node));
    return index;
}

int Network::addBoundary(ThermalBoundary boundary)
{
    m_boundaries.push_back(std::move(boundary));
    return static_cast<int>(m_boundaries.size()) - 1;
}

int Network::addComponent(ComponentSlice slice)
{
    m_components.push_back(std::move(slice));
    return static_cast<int>(m_components.size()) - 1;
}

int Network::addQuadrature(QuadratureChannel channel)
{
    m_quad.push_back(std::move(channel));
    return static_cast<int>(m_quad.size()) - 1;
}

void Network::finalize()
{
    m_nodes_frozen = true;
    // Column-wise sets of rows: the union over every element's stencil plus the diagonal
    // (I - gamma J is formed in place, so a missing diagonal would force a new analysis).
    std::vector<std::vector<long>> columns(m_n);
    for (int k = 0; k < m_n; ++k) columns[k].push_back(k);
    for (const auto& e : m_elements)
        for (auto [row, col] : e->stencil().entries()) columns.at(col).push_back(row);
    m_pattern = SparsityPattern{};
    m_pattern.n = m_n;
    m_pattern.column_starts.assign(1, 0);
    for (auto& rows : columns) {
        std::sort(rows.begin(), rows.end());
        rows.erase(std::unique(rows.begin(), rows.end()), rows.end());
        m_pattern.row_indices.insert(m_pattern.row_indices.end(), rows.begin(), rows.end());
        m_pattern.column_starts.push_back(static_cast<long>(m_pattern.row_indices.size()));
    }
    m_pattern.diagonal.resize(m_n);
    for (int k = 0; k < m_n; ++k) m_pattern.diagonal[k] = m_pattern.slot(k, k);
    for (auto& e : m_elements) {
        std::vector<int> slots;
        for (auto [row, col] : e->stencil().entries()) slots.push_back(m_pattern.slot(row, col));
        e->stencil().setSlots(std::move(slots));
    }
    m_gas_states.resize(m_cells.size());
    m_solid_states.resize(m_solids.size());
    m_laminar_tube.resize(m_cells.size());
    m_tube_cells.clear();
    m_drive_omega = driveAngularFrequency(m_cells);
    if (m_drive_omega > 0.0)
        for (std::size_t i = 0; i < m_cells.size(); ++i)
            if (hasTubeMomentumClosure(m_cells[i]))
                m_tube_cells.push_back(static_cast<int>(i));
}

void Network::updateStates(double t, std::span<const double> y, bool tube_closures) const
{
    for (std::size_t i = 0; i < m_cells.size(); ++i) {
        const GasCell& c = m_cells[i];
        m_gas_states[i] = gasState(y[c.offset], y[c.offset + 1], c.volumeAt(t), m_gas);
    }
    for (std::size_t i = 0; i < m_solids.size(); ++i)
        m_solid_states[i] = solidState(y[m_solids[i].offset], m_solids[i]);
    if (tube_closures)
        for (int i : m_tube_cells)
            m_laminar_tube[i] = laminarTubeMomentum(
                m_gas_states[i], m_cells[i].passage->hydraulicDiameter(), m_drive_omega);
}

NetworkView Network::view(double t, std::span<const double> y, bool tube_closures) const
{
    updateStates(t, y, tube_closures);
    NetworkView v;
    v.t = t;
    v.y = y.data();
    v.cells = &m_cells;
    v.solids = &m_solids;
    v.gas = &m_gas_states;
    v.solid = &m_solid_states;
    v.properties = &m_gas;
    v.laminar_tube = tube_closures ? &m_laminar_tube : nullptr;
    v.flow_smoothing = m_flow_smoothing;
    return v;
}

void Network::evaluate(double t, std::span<const double> y, std::span<double> ydot,
                       double* quad) const
{
    const NetworkView v = view(t, y);
    std::fill(ydot.begin(), ydot.end(), 0.0);
    if (quad) std::fill(quad, quad + m_quad.size(), 0.0);
    for (const auto& e : m_elements) e->evaluate(v, ydot.data(), quad);
}

void Network::jacobian(double t, std::span<const double> y, std::span<double> values) const
{
    // Dual-number elements compute the tube closure from their seeded states themselves.
    const NetworkView v = view(t, y, false);
    std::fill(values.begin(), values.end(), 0.0);
    for (const auto& e : m_elements) e->addJacobian(v, values.data());
}

std::string Network::stateName(int k) const
{
    const StateInfo& s = m_state_info.at(k);
    switch (s.kind) {
    case StateKind::Mass: return m_cells[s.node].name + ".m";
    case StateKind::Energy: return m_cells[s.node].name + ".E";
    case StateKind::MassFlow: return m_faces[s.node].name + ".mdot";
    case StateKind::SolidTemperature: return m_solids[s.node].name;
    }
    return "?";
}

std::string Network::describeElementsOf(int k) const
{
    std::string out;
    for (const auto& e : m_elements)
        for (int o = 0; o < e->stencil().nOutputs(); ++o)
            if (e->stencil().output(o) == k) {
                if (!out.empty()) out += "; ";
                out += e->describe();
                break;
            }
    return out;
}

std::vector<double> Network::initialState(double total_mass) const
{
    double v_over_t = 0.0;
    for (const GasCell& c : m_cells) v_over_t += c.volumeAt(0.0) / c.initial_temperature;
    const double p0 = total_mass * m_gas.R / v_over_t;
    std::vector<double> y(m_n, 0.0);
    for (const GasCell& c : m_cells) {
        const double V = c.volumeAt(0.0);
        const double m = p0 * V / (m_gas.R * c.initial_temperature);
        y[c.offset] = m;
        y[c.offset + 1] = m * m_gas.cv * c.initial_temperature;
    }
    for (const SolidNode& s : m_solids) y[s.offset] = s.initial_temperature;
    return y;
}

std::vector<double> Network::absoluteTolerances(double total_mass, double rtol,
                                                double mass_flow_scale, double scale) const
{
    // Each state's noise level is rtol times its own reference magnitude: the initial mass
    // and energy of its cell, a solid's temperature, and for mass flows (which cross zero
    // twice a cycle, so pure relative control would be meaningless) the drive's mass-flow
    // amplitude (SUNDIALS CVODE user guide, "Advice on choosing tolerances"; numerics
    // reference §5.4).
    const std::vector<double> y0 = initialState(total_mass);
    std::vector<double> atol(m_n, 0.0);
    for (const GasCell& c : m_cells) {
        atol[c.offset] = rtol * y0[c.offset];
        atol[c.offset + 1] = rtol * y0[c.offset + 1];
    }
    for (const FlowFace& f : m_faces) atol[f.offset] = rtol * mass_flow_scale;
    for (const SolidNode& s : m_solids) atol[s.offset] = rtol * s.initial_temperature;
    for (double& a : atol) a *= scale;
    return atol;
}

double Network::solidEnergy(int i, double T) const
{
    double U = 0.0;
    for (const SolidLayer& l : m_solids.at(i).layers) U += l.mass * l.material->enthalpy(T);
    return U;
}

double Network::totalMass(std::span<const double> y) const
{
    double m = 0.0;
    for (const GasCell& c : m_cells) m += y[c.offset];
    return m;
}

std::vector<std::string> Network::nonFinite(std::span<const double> ydot, int limit) const
{
    std::vector<std::string> bad;
    for (int k = 0; k < m_n && static_cast<int>(bad.size()) < limit; ++k)
        if (!std::isfinite(ydot[k])) bad.push_back(stateName(k));
    return bad;
}

void Network::checkPhysical(std::span<const double> y) const
{
    for (const GasCell& c : m_cells)
        if (!(y[c.offset] > 0.0) || !(y[c.offset + 1] > 0.0))
            throw RecoverableStateError("non-positive gas mass or energy in " + c.name);
    for (const SolidNode& s : m_solids)
        if (!(y[s.offset] > 0.0))
            throw RecoverableStateError("non-positive temperature of " + s.name);
}

} // namespace coldtip
