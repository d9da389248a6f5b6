#include "solver/cycle/CycleMetrics.hpp"

#include <cmath>

namespace coldtip {

double boundaryHeat(const Machine& machine, const std::vector<double>& averages, int boundary)
{
    double q = 0.0;
    const auto& channels = machine.network().quadratures();
    for (std::size_t i = 0; i < channels.size(); ++i)
        if (channels[i].boundary == boundary) q += channels[i].boundary_sign * averages[i];
    return q;
}

double boundaryTemperature(const Machine& machine, std::span<const double> y, int boundary)
{
    if (boundary < 0) return 0.0;
    const ThermalBoundary& b = machine.network().boundaries()[boundary];
    if (b.isothermal) return b.temperature;
    return y[machine.network().solids()[b.solid_node].offset];
}

std::vector<double> nodeTemperatures(const Network& network, std::span<const double> y)
{
    std::vector<double> T;
    T.reserve(network.solids().size() + network.cells().size());
    for (const SolidNode& s : network.solids()) T.push_back(y[s.offset]);
    const double cv = network.gas().cv;
    for (const GasCell& c : network.cells()) T.push_back(y[c.offset + 1] / (y[c.offset] * cv));
    return T;
}

CycleMetrics cycleMetrics(const Machine& machine, const CycleRecord& r)
{
    using K = QuadratureChannel::Kind;
    const Network& net = machine.network();
    const auto& channels = net.quadratures();
    CycleMetrics m;
    const int cold = machine.coldBoundary();
    const int reject = machine.rejectBoundary();
    for (std::size_t i = 0; i < channels.size(); ++i) {
        const QuadratureChannel& c = channels[i];
        const double v = r.averages[i];
        if (c.kind == K::PvWork) m.pv_power += v;
        if (c.kind == K::AppliedLoad) m.applied_load += v;
        if (c.kind != K::PvWork) m.external_heat_in += c.external_sign * v;
        if (cold >= 0 && c.boundary == cold) {
            if (c.kind == K::WallHeat) m.gross_cooling += c.boundary_sign * v;
            if (c.kind == K::SolidConduction) m.cold_conduction -= c.boundary_sign * v;
        }
    }
    m.cooling_power = cold >= 0 ? boundaryHeat(machine, r.averages, cold) : 0.0;
    m.reject_heat = reject >= 0 ? -boundaryHeat(machine, r.averages, reject) : 0.0;
    m.energy_balance_error =
        m.pv_power != 0.0 ? (m.pv_power + m.external_heat_in) / m.pv_power : 0.0;

    const double q_ref = std::max(std::abs(m.gross_cooling), 0.01 * std::abs(m.pv_power));
    for (std::size_t s = 0; s < net.solids().size(); ++s) {
        const int k = net.solids()[s].offset;
        const int i = static_cast<int>(s);
        const double q = std::abs(net.solidEnergy(i, r.end_state[k]) -
                                  net.solidEnergy(i, r.start_state[k])) /
                         (r.t_end - r.t_start);
        const double rel = q_ref > 0.0 ? q / q_ref : q;
        if (rel > m.heat_residual) {
            m.heat_residual = rel;
            m.worst_solid = net.solids()[s].name;
        }
    }
    const std::vector<double> T0 = nodeTemperatures(net, r.start_state);
    const std::vector<double> T1 = nodeTemperatures(net, r.end_state);
    for (std::size_t i = 0; i < T0.size(); ++i)
        m.max_temperature_change = std::max(m.max_temperature_change, std::abs(T1[i] - T0[i]));
    m.cold_temperature = boundaryTemperature(machine, r.end_state, cold);
    m.reject_temperature = boundaryTemperature(machine, r.end_state, reject);
    if (m.pv_power != 0.0) m.cop = m.cooling_power / m.pv_power;
    const double Tc = m.cold_temperature, Th = m.reject_temperature;
    if (Tc > 0.0 && Th > Tc) m.carnot_fraction = m.cop / (Tc / (Th - Tc));
    const double m0 = net.totalMass(r.start_state), m1 = net.totalMass(r.end_state);
    m.mass_change = m0 > 0.0 ? (m1 - m0) / m0 : 0.0;
    return m;
}

} // namespace coldtip
